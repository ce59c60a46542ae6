import { UsageError } from '../errors/KindredError.ts';
import type { CoalitionValue } from './shapley.ts';

/** Maps a profile (length d, NaN allowed) to a new code array; must not keep its argument (callers reuse it). */
export type Encoder = (x: Float64Array) => Float64Array;

function euclidean(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let q = 0; q < a.length; q++) {
    const e = (a[q] ?? 0) - (b[q] ?? 0);
    s += e * e;
  }
  return Math.sqrt(s);
}

/**
 * The comp-attribution game over the d dimensions (players). Coalition S takes the comp's values on
 * S and the target's elsewhere: v(S) = || encode(mix_S) - encode(target) || (Euclidean in the code
 * space). So v(empty) = 0 and v(all) = the embedded distance, and Shapley values of this game split
 * that distance among the dimensions (the "interventional" baseline-mix game, common practice in
 * attribution, e.g. Lundberg and Lee 2017; the mix rule is our own choice).
 * A dimension missing on either side always takes the target's value, so it is a dummy player
 * (attribution 0); then v(all) is the distance to the comp with those dimensions copied from the
 * target, which equals ||encode(comp) - encode(target)|| whenever nothing is missing.
 * A dimension where target and comp are equal is also a dummy.
 *
 * @example
 * const v = embeddedDistanceGame((x) => x, Float64Array.of(0, 0), Float64Array.of(3, 4));
 * v(Uint8Array.of(1, 1)); // => 5
 */
export function embeddedDistanceGame(encode: Encoder, target: Float64Array, comp: Float64Array): CoalitionValue {
  if (target.length !== comp.length) {
    throw new UsageError(`embeddedDistanceGame: target has ${target.length} dimensions, comp ${comp.length} (expected the same)`);
  }
  const d = target.length;
  const base = encode(target);
  const usable = new Uint8Array(d);
  for (let j = 0; j < d; j++) usable[j] = Number.isNaN(target[j] ?? NaN) || Number.isNaN(comp[j] ?? NaN) ? 0 : 1;
  const mix = new Float64Array(d);
  return (coalition: Uint8Array): number => {
    if (coalition.length !== d) throw new UsageError(`embeddedDistanceGame: coalition of ${coalition.length} (expected ${d})`);
    mix.set(target);
    for (let j = 0; j < d; j++) if (coalition[j] && usable[j]) mix[j] = comp[j] ?? NaN;
    return euclidean(encode(mix), base);
  };
}
