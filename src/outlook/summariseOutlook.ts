import { OUTLOOK_CONSTANTS } from './outlookConstants.ts';
import { roundOrNull } from '../stats/round.ts';
import { peakOf } from './Outcomes.ts';
import type { CompOutcome, OutcomeKind } from './CompOutcome.ts';
import type { OutlookFigures, QuantileSummary, SeasonsSummary } from './Outlook.ts';
import { weightedQuantiles } from '../stats/quantile.ts';

export interface WeightedOutcome {
  readonly weight: number;
  readonly outcome: CompOutcome;
}


function quantileSummary(values: readonly number[], weights: readonly number[], digits: number): QuantileSummary {
  const [p10, p50, p90] = weightedQuantiles(values, weights, OUTLOOK_CONSTANTS.quantiles);
  return { n: values.length, p10: roundOrNull(p10 ?? NaN, digits), p50: roundOrNull(p50 ?? NaN, digits), p90: roundOrNull(p90 ?? NaN, digits) };
}

/**
 * What a weighted set of players did next (each weight is a comp's likeness, or 1 for a base rate):
 * - reached_top_level: sum of the weights of those with a top-level season in the window / sum of all weights;
 * - peak OPS+ (hitters) or best FIP- (pitchers): weighted p10, p50, p90 (weightedQuantile, midpoint rule)
 *   over those who had a qualifying top-level season (300 PA, 50 IP), with the same weights;
 * - top_level_seasons: weighted mean and quantiles over everyone (0 for those who did not reach).
 * Censored outcomes must be left out by the caller.
 */
export function summariseOutlook(items: readonly WeightedOutcome[], kind: OutcomeKind): OutlookFigures {
  let total = 0;
  let reached = 0;
  let seasonSum = 0;
  const peaks: number[] = [];
  const peakWeights: number[] = [];
  const seasons: number[] = [];
  const seasonWeights: number[] = [];
  for (const { weight, outcome } of items) {
    if (!(weight > 0)) continue;
    total += weight;
    if (outcome.reached_top_level) reached += weight;
    seasonSum += weight * outcome.top_level_seasons;
    seasons.push(outcome.top_level_seasons);
    seasonWeights.push(weight);
    const peak = peakOf(outcome);
    if (peak !== null) {
      peaks.push(peak);
      peakWeights.push(weight);
    }
  }
  const topLevelSeasons: SeasonsSummary = { ...quantileSummary(seasons, seasonWeights, 1), mean: total > 0 ? roundOrNull(seasonSum / total, 2) : null };
  const peak = quantileSummary(peaks, peakWeights, 1);
  const base = { reached_top_level: total > 0 ? roundOrNull(reached / total, 3) : null, top_level_seasons: topLevelSeasons };
  return kind === 'hitter' ? { ...base, peak_ops_plus: peak } : { ...base, peak_fip_minus: peak };
}

/** The peak distribution of a summary whatever its kind. */
export function peakSummaryOf(f: OutlookFigures): QuantileSummary {
  return 'peak_ops_plus' in f ? f.peak_ops_plus : f.peak_fip_minus;
}
