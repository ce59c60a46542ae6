import { UsageError } from '../errors/KindredError.ts';
import type { Encoder } from './embeddedDistanceGame.ts';

/**
 * An encoder that multiplies each input dimension by a fixed scale before the model sees it:
 * encode(x) = inner(x * scale), NaN kept (the model then feeds it as 0, the stratum mean, as before).
 * Used to embed the weighted profiles sqrt(w_j) z_j while queries and attributions keep speaking z.
 *
 * @example
 * scaledEncoder((x) => x, Float64Array.of(2, 0.5))(Float64Array.of(1, NaN)); // => [2, NaN]
 */
export function scaledEncoder(inner: Encoder, scale: Float64Array): Encoder {
  const d = scale.length;
  return (x: Float64Array): Float64Array => {
    if (x.length !== d) throw new UsageError(`scaled encoder: vector of length ${x.length} (expected ${d})`);
    const y = new Float64Array(d);
    for (let j = 0; j < d; j++) y[j] = (x[j] ?? NaN) * (scale[j] ?? 1);
    return inner(y);
  };
}
