/**
 * Age curves per talent (see ageOffset), in the order of HITTER_TALENTS and
 * PITCHER_TALENTS. Invented figures with the commonly described shapes
 * ("from memory"): speed peaks early and fades first, power and discipline
 * peak later, velocity fades from the late twenties, control keeps improving.
 */
import type { AgeCurve } from './ageCurve.ts';

export const HITTER_CURVES: readonly AgeCurve[] = [
  { peak: 27, plateau: 3, growth: 0.12, decline: 0.06, accel: 0.012 }, // contact
  { peak: 28, plateau: 3, growth: 0.13, decline: 0.07, accel: 0.012 }, // power
  { peak: 29, plateau: 4, growth: 0.09, decline: 0.03, accel: 0.008 }, // eye
  { peak: 24, plateau: 2, growth: 0.07, decline: 0.07, accel: 0.006 }, // speed
  { peak: 26, plateau: 3, growth: 0.09, decline: 0.06, accel: 0.010 }, // glove
  { peak: 26, plateau: 3, growth: 0.08, decline: 0.06, accel: 0.010 }, // arm
  { peak: 27, plateau: 4, growth: 0.10, decline: 0.05, accel: 0.010 }, // catcherThrow
];

export const PITCHER_CURVES: readonly AgeCurve[] = [
  { peak: 26, plateau: 3, growth: 0.12, decline: 0.07, accel: 0.012 }, // stuff
  { peak: 29, plateau: 4, growth: 0.12, decline: 0.03, accel: 0.008 }, // control
  { peak: 25, plateau: 8, growth: 0.02, decline: 0.02, accel: 0.002 }, // groundball
  { peak: 25, plateau: 3, growth: 0.10, decline: 0.09, accel: 0.010 }, // velocity
  { peak: 25, plateau: 5, growth: 0.04, decline: 0.03, accel: 0.004 }, // spin
  { peak: 27, plateau: 4, growth: 0.08, decline: 0.06, accel: 0.010 }, // stamina
];
