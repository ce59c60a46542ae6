/**
 * `backtest.json` in a store folder: the latest backtest of the prospect outlook on this roster (its
 * figures, per kind) and the calibration fitted on all of the roster's known history, which
 * `kindred prospect` applies. Written by `kindred build` right after the store (temporary file, then
 * rename), outside the checksummed manifest, and tied to it by the manifest's `createdAt`: a file from
 * another build is ignored. Carries a format tag and version checked on load.
 */
import { z } from 'zod';

export { BACKTEST_FILE } from '../store/storeFileNames.ts';
export const BACKTEST_FORMAT = 'kindred-backtest';
export const BACKTEST_VERSION = 3;

const feature = z.enum(['comps', 'matched', 'sample', 'seasonSample', 'climb', 'age', 'path', 'profile']);
const interval = z.strictObject({ value: z.number().nullable(), low: z.number().nullable(), high: z.number().nullable() });

export const kindSummarySchema = z.strictObject({
  kind: z.enum(['hitter', 'pitcher']),
  targets: z.number().int(),
  reached_share: z.number().nullable(),
  brier: z.strictObject({ calibrated: z.number().nullable(), comps: z.number().nullable(), matched: z.number().nullable(), level_age: z.number().nullable() }),
  skill_vs_level_age: interval,
  skill_vs_matched: interval,
  reliability: z.number().nullable(),
  resolution: z.number().nullable(),
  uncertainty: z.number().nullable(),
  reliability_bins: z.array(z.strictObject({ lo: z.number(), hi: z.number(), n: z.number().int(), forecast: z.number(), observed: z.number() })),
  spearman_peak: interval,
  peak_targets: z.number().int(),
  peak_coverage: interval,
  peak_coverage_before_adjustment: z.number().nullable(),
  seasons_coverage: interval,
  cuts: z.array(z.strictObject({ cut: z.number().int(), training: z.number().int(), targets: z.number().int(), reached: z.number().int(), features: z.array(feature), peak: z.enum(['blend', 'scaled', 'regression']) })),
});

export const fittedSchema = z.strictObject({
  kind: z.enum(['hitter', 'pitcher']),
  training: z.number().int(),
  /** The probability map and peak model kept for this kind (chosen among the calibration's candidates). */
  features: z.array(feature),
  ridge: z.number(),
  peak: z.enum(['blend', 'scaled', 'regression']),
  peak_features: z.array(feature),
  peak_ridge: z.number(),
  coefficients: z.array(z.number()).nullable(),
  overall: z.number(),
  peak_widening: z.number().nullable(),
  peak_scores: z.number().int(),
  seasons_widening: z.number().nullable(),
  seasons_scores: z.number().int(),
  /** The peak regression's coefficients (intercept first) and the residual quantiles of its p10 and p90; null with the blend. */
  peak_model: z.array(z.number()).nullable(),
  peak_residual: z.tuple([z.number(), z.number()]).nullable(),
  overall_peak: z.number(),
  /** [level index, mean log(1 + sample)] and [level index, mean age] of the training forecasts. */
  sample_centre: z.array(z.tuple([z.number().int(), z.number()])),
  /** [level index, mean log(1 + PA or BF over all his levels that season)]. */
  season_sample_centre: z.array(z.tuple([z.number().int(), z.number()])),
  age_centre: z.array(z.tuple([z.number().int(), z.number()])),
  profile_dims: z.array(z.string()),
});

export const backtestFileSchema = z.strictObject({
  format: z.literal(BACKTEST_FORMAT),
  version: z.literal(BACKTEST_VERSION),
  store_created_at: z.string(),
  horizon: z.number().int(),
  k: z.number().int(),
  calibration: z.strictObject({
    method: z.enum(['logistic', 'isotonic']),
    features: z.array(feature),
    shrink: z.number(),
    alpha: z.number(),
    peak: z.enum(['blend', 'scaled', 'regression']),
    peak_features: z.array(feature),
    ridge: z.number(),
    peak_ridge: z.number(),
  }),
  cuts: z.array(z.number().int()),
  too_short: z.string().nullable(),
  seconds: z.number(),
  kinds: z.array(kindSummarySchema),
  fitted: z.array(fittedSchema),
});

export type BacktestFile = z.infer<typeof backtestFileSchema>;
export type KindSummary = z.infer<typeof kindSummarySchema>;
