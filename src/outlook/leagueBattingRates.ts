import type { BattingSeason } from '../ingest/Roster.ts';
import { onBasePercentage } from '../stats/onBasePercentage.ts';
import { sluggingPercentage } from '../stats/sluggingPercentage.ts';
import { pooledRate } from '../stats/Rate.ts';

export interface LeagueBattingRates {
  readonly OBP: number;
  readonly SLG: number;
  readonly PA: number;
}

/**
 * A league's on-base and slugging percentages from the sum of its batting lines (not the mean of the
 * players' rates): lgOBP = sum(H + BB + HBP) / sum(AB + BB + HBP + SF), lgSLG = sum(TB) / sum(AB).
 *
 * Source: common practice: league rates for OPS+ are the league's totals put through the rule 9.21
 * formulas (src/stats/onBasePercentage.ts, sluggingPercentage.ts) pooled by src/stats/Rate.ts.
 * Units: fractions; NaN when the lines hold no at-bat.
 *
 * @example
 * leagueBattingRates([a, b]); // a: 100 AB, 30 H, 10 BB; b: 100 AB, 20 H, 0 BB (no HBP, SF, extra bases)
 * // => OBP 60 / 210 = 0.2857..., SLG 50 / 200 = 0.25
 */
export function leagueBattingRates(lines: readonly BattingSeason[]): LeagueBattingRates {
  let PA = 0;
  for (const b of lines) PA += b.PA;
  return { OBP: pooledRate(onBasePercentage, lines), SLG: pooledRate(sluggingPercentage, lines), PA };
}
