import { isPitcherGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { Target } from '../query/Target.ts';
import type { BacktestFile } from './backtestFile.ts';
import { fittedFromFile } from './backtestStore.ts';
import { calibrateForecast } from './calibrateForecast.ts';
import { rawForecastOf, rowOutcomes } from './collectForecasts.ts';
import type { ProspectOptions } from '../jobs/findProspectComps.ts';
import type { Outcomes } from './Outcomes.ts';
import type { CalibratedOutlook, Outlook } from './Outlook.ts';
import type { ProspectResult } from '../jobs/ProspectResult.ts';
import { OUTLOOK_CONSTANTS } from './outlookConstants.ts';

const r1 = (x: number): number | null => (Number.isFinite(x) ? Number(x.toFixed(1)) : null);

/** Cached per loaded group: whether each row's player reached the top level in its complete window. */
const cache = new WeakMap<object, Float64Array>();

/** The settings a stored backtest was made with must be those of the query for its calibration to apply; else why not. */
function mismatch(file: BacktestFile, options: ProspectOptions): string | null {
  if (file.horizon !== options.horizon) return `the backtest used --horizon ${file.horizon}`;
  if (options.path !== 1) return 'the backtest matched single seasons (no --path)';
  const f = options.comps.filter;
  if (f.bats || f.throws || f.positions || f.seasonFrom !== undefined || f.seasonTo !== undefined || f.ageMin !== undefined || f.ageMax !== undefined) return 'the backtest used no pool filters';
  return null;
}

/**
 * Adds `outlook.calibrated` to a prospect result: the stored calibration of his kind (kindred build's
 * backtest, fitted on every forecast of the roster with a known follow-up) applied to `asBacktested`,
 * the outlook from as many comps as the backtest used (the result's own when its `k` is the same), with
 * the backtest figures of his kind beside it. When the store has no usable backtest, or it was made with
 * other settings, `calibrated` is null and `calibration_note` says why.
 */
export function calibrateOutlook(
  store: ProfileStore, outcomes: Outcomes, target: Target, result: ProspectResult, asBacktested: Outlook, options: ProspectOptions,
  backtest: { file: BacktestFile | null; reason: string | null },
): ProspectResult {
  const none = (note: string): ProspectResult => ({ ...result, outlook: { ...result.outlook, calibrated: null, calibration_note: note } });
  const file = backtest.file;
  if (!file) return none(backtest.reason ?? 'no backtest stored');
  const kind = isPitcherGroup(target.group) ? 'pitcher' : 'hitter';
  if (file.too_short) return none(`on this roster, no backtest was possible: ${file.too_short}`);
  const why = mismatch(file, options);
  if (why) return none(`calibration not applied: ${why}`);
  const fit = fittedFromFile(file, kind);
  const summary = file.kinds.find((k) => k.kind === kind);
  if (!fit || !summary) return none(`on this roster, too few ${kind} forecasts with a known follow-up to calibrate`);
  const g = store.groups.get(target.group);
  if (!g || target.row < 0) return none('calibration needs a player-season target');
  let reached = cache.get(g);
  if (!reached) {
    reached = rowOutcomes(g, outcomes, kind, options.horizon);
    cache.set(g, reached);
  }
  const raw = rawForecastOf(g, target.group, target.row, asBacktested, outcomes, options.horizon, reached);
  const c = calibrateForecast(fit, raw, options.horizon);
  const peakName = kind === 'hitter' ? 'peak OPS+' : 'best FIP-';
  const central = Math.round(100 * (OUTLOOK_CONSTANTS.quantiles[2] - OUTLOOK_CONSTANTS.quantiles[0]));
  const calibrated: CalibratedOutlook = {
    method:
      `pool: his level, age +/- 1, earlier seasons (playing time is not a pool band: on the benched leagues a band of x2 did not help); ` +
      `probability: logistic map (Platt 1999) starting from the level-and-age base rate, moved by the comps' share shrunk toward it ` +
      `(prior weight ${fit.choice.shrink} against ${asBacktested.comps_effective} effective of his ${file.k} closest comps) and by his playing time for his level (log ${kind === 'hitter' ? 'PA' : 'BF'})` +
      (fit.choice.features.includes('profile')
        ? `, and by his own standardised profile (one term per dimension, ridge ${fit.choice.ridge}: chosen over the map without it by how both did on this roster's later seasons), `
        : ', ') +
      `fitted on ${fit.training.toLocaleString('en-US')} earlier forecasts of this roster; ranges: ` +
      (fit.choice.peak === 'regression'
        ? `${peakName} by a ridge regression on the comps' ${peakName} and his own profile (chosen over the comps' range by how both did on this roster's later seasons), its range from cross-fitted residuals; top-level seasons from the comps' and base rate's central ${central}%; both `
        : `the comps' and base rate's central ${central}% of ${peakName} and top-level seasons `) +
      `adjusted by split conformal prediction (Lei et al. 2018) to ${Math.round((1 - fit.choice.alpha) * 100)}% coverage`,
    reached_top_level: Number(c.reached.toFixed(3)),
    range_coverage: Number((1 - fit.choice.alpha).toFixed(3)),
    peak: { p10: r1(c.peak.p10), p50: r1(c.peak.p50), p90: r1(c.peak.p90), coverage: summary.peak_coverage.value },
    top_level_seasons: { p10: r1(c.seasons.p10), p50: r1(c.seasons.p50), p90: r1(c.seasons.p90), coverage: summary.seasons_coverage.value },
    backtest: {
      cuts: file.cuts,
      targets: summary.targets,
      reached_share: summary.reached_share,
      brier: summary.brier.calibrated,
      skill_vs_level_age: summary.skill_vs_level_age,
      reliability: summary.reliability,
      resolution: summary.resolution,
      spearman_peak: summary.spearman_peak,
      peak_coverage: summary.peak_coverage,
      seasons_coverage: summary.seasons_coverage,
    },
  };
  return { ...result, outlook: { ...result.outlook, calibrated, calibration_note: null } };
}
