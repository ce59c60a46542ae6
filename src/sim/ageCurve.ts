/**
 * Age curve of one talent: the offset (in talent standard deviations) of a
 * player's talent at a given age from his peak talent.
 *
 * Shape (common practice, "from memory": hitters and pitchers improve into
 * their mid to late twenties, plateau for a few years, then decline with an
 * accelerating slope): linear growth of `growth` per year below `peak`
 * (scaled by the player's own development speed), flat from `peak` to
 * `peak + plateau`, then a decline of `decline` per year growing by
 * `accel` per year squared.
 *
 * @example
 * ageOffset({ peak: 27, plateau: 3, growth: 0.12, decline: 0.06, accel: 0.01 }, 21, 1); // => -0.72
 * ageOffset({ peak: 27, plateau: 3, growth: 0.12, decline: 0.06, accel: 0.01 }, 33, 1); // => -0.27
 */
export interface AgeCurve {
  readonly peak: number;
  readonly plateau: number;
  readonly growth: number;
  readonly decline: number;
  readonly accel: number;
}

export function ageOffset(curve: AgeCurve, age: number, development: number): number {
  if (age < curve.peak) return -curve.growth * development * (curve.peak - age);
  const past = age - curve.peak - curve.plateau;
  if (past <= 0) return 0;
  return -(curve.decline * past + curve.accel * past * past);
}
