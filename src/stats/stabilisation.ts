/**
 * Stabilisation samples: for each rate, the sample k (in its own unit of events) at which about half of
 * what is observed is the player's own skill, used as k in `regressToMean` / `regressAverageToMean`.
 *
 * Source: entries marked "from memory" are approximate values that circulate in public baseball
 * analysis, recalled without a source to hand; entries marked "project choice" are Kindred's own
 * settings where no recalled value exists. Treat all of them as rough (tens of percent).
 *
 * What the samples mean (from memory, unverified): the figures in circulation are commonly recalled as
 * the samples at which split-half reliability reaches about 0.7, not 0.5. With reliability
 * r(n) = n / (n + k), r(N) = 0.7 gives k = N (1 - 0.7) / 0.7 = 3N/7 (about 0.43 N); taken as k, they are
 * 7/3 times too large, and a player with n = N keeps half his distance from the mean instead of 70%
 * (e.g. K%: N = 60 PA would mean k = 26). Kindred keeps them as k: on the standard
 * bench leagues, k = 3N/7 (ShrinkageOptions.tableScale) and k fitted to the roster
 * (src/profiles/shrinkage.ts) did not beat k = N in every league (README, "Bench figures"), since
 * standardising within season and level undoes most of a common rescaling of k.
 */

/** Unit of events a stabilisation sample is counted in. */
export type StabilisationUnit = 'PA' | 'AB' | 'BIP' | 'BF' | 'BBE' | 'attempts' | 'chances';

export interface StabilisationEntry {
  /** The sample k, in `unit` events. */
  readonly sample: number;
  readonly unit: StabilisationUnit;
  readonly source: 'from memory' | 'project choice';
}

/** The rates Kindred regresses, named after their formula modules (or profile fields). */
export type StabilisationRate =
  // batting
  | 'strikeoutRate'
  | 'walkRate'
  | 'homeRunRate'
  | 'onBasePercentage'
  | 'sluggingPercentage'
  | 'isolatedPower'
  | 'battingAverage'
  | 'babip'
  | 'evAvgMph'
  | 'hardHitPct'
  | 'evP90Mph'
  | 'laAvgDeg'
  | 'laBandPct'
  | 'stolenBaseSuccess'
  // pitching
  | 'pitcherStrikeoutRate'
  | 'pitcherWalkRate'
  | 'gbPct'
  | 'pitcherHomeRunRate'
  | 'babipAgainst'
  | 'whiffPct'
  // fielding
  | 'caughtStealingRate'
  | 'fieldingPercentage';

export const STABILISATION: Readonly<Record<StabilisationRate, StabilisationEntry>> = {
  strikeoutRate: { sample: 60, unit: 'PA', source: 'from memory' },
  walkRate: { sample: 120, unit: 'PA', source: 'from memory' },
  homeRunRate: { sample: 170, unit: 'PA', source: 'from memory' },
  onBasePercentage: { sample: 460, unit: 'PA', source: 'from memory' },
  sluggingPercentage: { sample: 320, unit: 'AB', source: 'from memory' },
  isolatedPower: { sample: 160, unit: 'AB', source: 'from memory' },
  battingAverage: { sample: 910, unit: 'AB', source: 'from memory' },
  babip: { sample: 820, unit: 'BIP', source: 'from memory' },
  evAvgMph: { sample: 50, unit: 'BBE', source: 'from memory' },
  hardHitPct: { sample: 80, unit: 'BBE', source: 'from memory' },
  evP90Mph: { sample: 50, unit: 'BBE', source: 'project choice' },
  laAvgDeg: { sample: 60, unit: 'BBE', source: 'project choice' },
  laBandPct: { sample: 100, unit: 'BBE', source: 'project choice' },
  stolenBaseSuccess: { sample: 40, unit: 'attempts', source: 'project choice' },
  pitcherStrikeoutRate: { sample: 70, unit: 'BF', source: 'from memory' },
  pitcherWalkRate: { sample: 170, unit: 'BF', source: 'from memory' },
  gbPct: { sample: 70, unit: 'BIP', source: 'from memory' },
  pitcherHomeRunRate: { sample: 1300, unit: 'BF', source: 'from memory' },
  babipAgainst: { sample: 2000, unit: 'BIP', source: 'from memory' },
  whiffPct: { sample: 100, unit: 'BF', source: 'project choice' },
  caughtStealingRate: { sample: 60, unit: 'attempts', source: 'project choice' },
  fieldingPercentage: { sample: 400, unit: 'chances', source: 'project choice' },
};

/**
 * The stabilisation entry of a rate.
 *
 * @example
 * stabilisationSample('strikeoutRate'); // => { sample: 60, unit: 'PA', source: 'from memory' }
 */
export function stabilisationSample(rate: StabilisationRate): StabilisationEntry {
  return STABILISATION[rate];
}
