/**
 * A player's overall value in talent units (about standard normal among
 * professionals at their peak), the quantity that drives promotion,
 * playing time, release and salary. A weighted sum of talents divided by
 * its standard deviation under independent unit talents (an approximation;
 * the built-in correlations move it a little). Invented weights: hitting
 * carries most of a hitter's value, defence counts more at the demanding
 * positions; for pitchers, stuff and control dominate.
 *
 * @example
 * hitterValue(new Float64Array([0, 0, 0, 0, 0, 0, 0]), 'SS'); // => 0
 */
import type { FieldPosition } from '../ingest/Roster.ts';
import {
  H_ARM, H_CONTACT, H_CTHROW, H_EYE, H_GLOVE, H_POWER, H_SPEED,
  P_CONTROL, P_GROUNDBALL, P_SPIN, P_STAMINA, P_STUFF, P_VELOCITY,
} from './talentNames.ts';

/** Weight of defence in value, by position (DH none). */
const DEFENCE_WEIGHT: Readonly<Record<FieldPosition | 'DH', number>> = {
  C: 0.45, SS: 0.4, CF: 0.35, '2B': 0.3, '3B': 0.25, RF: 0.2, LF: 0.12, '1B': 0.05, DH: 0,
};

export function hitterValue(t: Float64Array, pos: FieldPosition | 'DH'): number {
  const bat = 0.32 * (t[H_CONTACT] ?? 0) + 0.42 * (t[H_POWER] ?? 0) + 0.28 * (t[H_EYE] ?? 0) + 0.12 * (t[H_SPEED] ?? 0);
  const w = DEFENCE_WEIGHT[pos];
  const field = pos === 'C'
    ? 0.5 * (t[H_CTHROW] ?? 0) + 0.3 * (t[H_GLOVE] ?? 0) + 0.2 * (t[H_ARM] ?? 0)
    : 0.65 * (t[H_GLOVE] ?? 0) + 0.35 * (t[H_ARM] ?? 0);
  // sd of bat part ~0.61, of field part ~0.74
  return (bat + w * field) / Math.sqrt(0.3716 + w * w * 0.55);
}

export function pitcherValue(t: Float64Array, starter: boolean): number {
  const v = 0.45 * (t[P_STUFF] ?? 0) + 0.35 * (t[P_CONTROL] ?? 0) + 0.12 * (t[P_GROUNDBALL] ?? 0) +
    0.15 * (t[P_VELOCITY] ?? 0) + 0.06 * (t[P_SPIN] ?? 0) + (starter ? 0.1 * (t[P_STAMINA] ?? 0) : 0);
  return v / 0.62;
}
