import { rename, rm, writeFile, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { KindredError } from '../errors/KindredError.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { BACKTEST_FILE, BACKTEST_FORMAT, BACKTEST_VERSION, backtestFileSchema, type BacktestFile, type KindSummary } from './backtestFile.ts';
import { DEFAULT_CALIBRATION, type CalibrationChoice, type FittedCalibration } from './calibrateForecast.ts';
import { fitSelectedCalibration } from './selectCalibration.ts';
import { collectForecasts } from './collectForecasts.ts';
import { DEFAULT_PROSPECT_OPTIONS, type ProspectOptions } from '../jobs/findProspectComps.ts';
import type { Outcomes } from './Outcomes.ts';
import { runBacktest, type BacktestResult, type KindBacktest, type WithInterval } from './runBacktest.ts';
import type { OutcomeKind } from './CompOutcome.ts';

export interface StoreBacktestOptions {
  readonly prospect?: ProspectOptions;
  readonly cuts?: readonly number[];
  readonly groups?: readonly PositionGroup[];
  readonly calibration?: CalibrationChoice;
  /** Targets per season and position group (default 40). */
  readonly perSeason?: number;
  readonly minTraining?: number;
  readonly rounds?: number;
}

export interface StoreBacktest {
  readonly result: BacktestResult;
  /** The calibration fitted on every forecast whose truth the roster holds, per kind. */
  readonly fitted: ReadonlyMap<OutcomeKind, FittedCalibration>;
  readonly file: BacktestFile;
}

const num = (x: number): number | null => (Number.isFinite(x) ? Number(x.toFixed(4)) : null);
const iv = (w: WithInterval): { value: number | null; low: number | null; high: number | null } => ({ value: num(w.value), low: num(w.low), high: num(w.high) });

export function kindSummary(k: KindBacktest): KindSummary {
  return {
    kind: k.kind,
    targets: k.targets,
    reached_share: num(k.reachedShare),
    brier: { calibrated: num(k.brier.calibrated), comps: num(k.brier.comps), matched: num(k.brier.matched), level_age: num(k.brier.levelAge) },
    skill_vs_level_age: iv(k.skillVsLevelAge),
    skill_vs_matched: iv(k.skillVsMatched),
    reliability: num(k.murphy.reliability),
    resolution: num(k.murphy.resolution),
    uncertainty: num(k.murphy.uncertainty),
    reliability_bins: k.murphy.bins.map((b) => ({ lo: b.lo, hi: b.hi, n: b.n, forecast: Number(b.meanForecast.toFixed(4)), observed: Number(b.observed.toFixed(4)) })),
    spearman_peak: iv(k.spearman),
    peak_targets: k.peakTargets,
    peak_coverage: iv(k.peakCoverage),
    peak_coverage_before_adjustment: num(k.peakCoverageRaw),
    seasons_coverage: iv(k.seasonsCoverage),
    cuts: k.cuts.map((c) => ({ ...c, features: [...c.features] })),
  };
}

/**
 * Backtests the prospect outlook on a store (collectForecasts, then runBacktest) and fits the
 * calibration `kindred prospect` applies: on every forecast of the roster whose follow-up is complete.
 * Only forecasts from seasons firstSeason + horizon (the first with complete-window comps) to
 * lastSeason - horizon (the last with a known truth) are made.
 */
export function backtestStore(store: ProfileStore, outcomes: Outcomes, options: StoreBacktestOptions = {}): StoreBacktest {
  const started = performance.now();
  const prospect = options.prospect ?? DEFAULT_PROSPECT_OPTIONS;
  const horizon = prospect.horizon;
  const choice = options.calibration ?? DEFAULT_CALIBRATION;
  const rows = collectForecasts(store, outcomes, {
    prospect,
    perSeason: options.perSeason ?? 40,
    seasons: [outcomes.firstSeason + horizon, outcomes.lastSeason - horizon],
    ...(options.groups ? { groups: options.groups } : {}),
  });
  const result = runBacktest(rows, outcomes.lastSeason, {
    horizon, calibration: choice,
    ...(options.cuts ? { cuts: options.cuts } : {}),
    ...(options.minTraining !== undefined ? { minTraining: options.minTraining } : {}),
    ...(options.rounds !== undefined ? { rounds: options.rounds } : {}),
  });
  const fitted = new Map<OutcomeKind, FittedCalibration>();
  for (const kind of ['hitter', 'pitcher'] as const) {
    const mine = rows.filter((r) => r.kind === kind && r.truth !== null);
    if (mine.length >= (options.minTraining ?? 100)) fitted.set(kind, fitSelectedCalibration(mine, choice, horizon));
  }
  const file: BacktestFile = {
    format: BACKTEST_FORMAT,
    version: BACKTEST_VERSION,
    store_created_at: store.opened.manifest.createdAt,
    horizon,
    k: prospect.comps.k,
    calibration: { method: choice.method, features: [...choice.features], shrink: choice.shrink, alpha: choice.alpha, peak: choice.peak, peak_features: [...choice.peakFeatures], ridge: choice.ridge, peak_ridge: choice.peakRidge },
    cuts: [...result.cuts],
    too_short: result.tooShort,
    seconds: Number(((performance.now() - started) / 1000).toFixed(1)),
    kinds: result.kinds.map(kindSummary),
    fitted: [...fitted].map(([kind, f]) => ({
      kind,
      training: f.training,
      features: [...f.choice.features],
      ridge: f.choice.ridge,
      peak: f.choice.peak,
      peak_features: [...f.choice.peakFeatures],
      peak_ridge: f.choice.peakRidge,
      coefficients: f.logistic ? [...f.logistic.coefficients] : null,
      overall: f.overall,
      peak_widening: Number.isFinite(f.peakWidening) ? f.peakWidening : null,
      peak_scores: f.peakScores,
      seasons_widening: Number.isFinite(f.seasonsWidening) ? f.seasonsWidening : null,
      seasons_scores: f.seasonsScores,
      peak_model: f.peakModel ? [...f.peakModel.coefficients] : null,
      peak_residual: Number.isFinite(f.peakResidual[0]) && Number.isFinite(f.peakResidual[1]) ? [f.peakResidual[0], f.peakResidual[1]] : null,
      overall_peak: f.overallPeak,
      sample_centre: [...f.sampleCentre],
      season_sample_centre: [...f.seasonSampleCentre],
      age_centre: [...f.ageCentre],
      profile_dims: [...f.profileDims],
    })),
  };
  return { result, fitted, file };
}

/** Writes backtest.json into the store folder (temporary file, then rename). */
export async function writeBacktestFile(storeDir: string, file: BacktestFile): Promise<void> {
  const target = join(storeDir, BACKTEST_FILE);
  const temp = join(storeDir, `.${BACKTEST_FILE}.${process.pid}.tmp`);
  try {
    await writeFile(temp, JSON.stringify(file));
    await rename(temp, target);
  } catch (cause) {
    await rm(temp, { force: true });
    throw new KindredError('kindred.store.writeFailed', `cannot write ${target}: ${String(cause)}`, { file: target });
  }
}

/** The store's backtest.json when present, well-formed and from this build of the store; otherwise null with the reason. */
export async function readBacktestFile(store: ProfileStore): Promise<{ file: BacktestFile | null; reason: string | null }> {
  let text: string;
  try {
    text = await readFile(join(store.opened.dir, BACKTEST_FILE), 'utf8');
  } catch {
    return { file: null, reason: 'no backtest stored with this store (kindred build stores one; kindred backtest runs one)' };
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    return { file: null, reason: `${BACKTEST_FILE} is not valid JSON; rebuild the store` };
  }
  const parsed = backtestFileSchema.safeParse(value);
  if (!parsed.success) return { file: null, reason: `${BACKTEST_FILE} has an unexpected format or version; rebuild the store` };
  if (parsed.data.store_created_at !== store.opened.manifest.createdAt) return { file: null, reason: `${BACKTEST_FILE} belongs to another build of this store; rebuild it` };
  return { file: parsed.data, reason: null };
}

/** The fitted calibration of one kind back from the file. */
export function fittedFromFile(file: BacktestFile, kind: OutcomeKind): FittedCalibration | null {
  const f = file.fitted.find((x) => x.kind === kind);
  if (!f) return null;
  const cal = file.calibration;
  const choice: CalibrationChoice = {
    method: cal.method, features: [...f.features], shrink: cal.shrink, alpha: cal.alpha, peak: f.peak, peakFeatures: [...f.peak_features], ridge: f.ridge, peakRidge: f.peak_ridge,
  };
  return {
    choice,
    training: f.training,
    logistic: f.coefficients ? { coefficients: f.coefficients, iterations: 0 } : null,
    isotonic: null,
    peakWidening: f.peak_widening ?? Infinity,
    peakScores: f.peak_scores,
    seasonsWidening: f.seasons_widening ?? Infinity,
    seasonsScores: f.seasons_scores,
    peakModel: f.peak_model ? { coefficients: f.peak_model } : null,
    peakResidual: f.peak_residual ?? [NaN, NaN],
    overall: f.overall,
    overallPeak: f.overall_peak,
    sampleCentre: new Map(f.sample_centre),
    seasonSampleCentre: new Map(f.season_sample_centre),
    ageCentre: new Map(f.age_centre),
    profileDims: f.profile_dims,
  };
}
