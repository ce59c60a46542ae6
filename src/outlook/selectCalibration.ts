/**
 * Chooses, on one roster, between candidate probability maps (feature sets and ridges of the logistic)
 * and between candidate peak models, by how they would have done on that roster's own later history:
 * the training forecasts (all with a known truth at the cut) are split by season, each candidate is
 * fitted on the earlier seasons and scored on the later ones (maps by Brier score, peak models by the
 * mean absolute error of the p50 against the realised peak), and the best is kept (rules in `best`;
 * a time-ordered hold-out, Tashman 2000). Nothing after the cut enters:
 * the rows are the cut's training forecasts only.
 *
 * Why: a map with his own profile helps on leagues whose stat lines carry the signal and hurts on
 * the noisiest ones (bench/outlook.bench.ts); letting each roster's own history choose keeps the
 * better one in both.
 *
 * @example
 * // candidates [plain, with profile]: fitted on seasons up to 2012, scored on 2013-2014
 * selectCalibration(training, { ...DEFAULT_CALIBRATION }).features; // => ['comps', 'sample'] or [..., 'profile']
 */
import type { RawForecast } from './collectForecasts.ts';
import { calibrateForecast, fitCalibration, type CalibrationCandidate, type CalibrationChoice, type FittedCalibration, type PeakCandidate } from './calibrateForecast.ts';

/** Share of the training seasons (the latest) held out to score the candidates. */
export const HOLD_OUT_SHARE = 1 / 3;
/** Fewest forecasts on each side of the split for a choice to be made (else the first candidate). */
export const MIN_SELECTION_ROWS = 80;
/** Fewest held-out forecasts with a realised peak for the peak model to be chosen (else the first). */
export const MIN_PEAK_ROWS = 20;

/** The choice with the candidates that scored best on the roster's later training seasons (no candidates: the choice itself). */
export function selectCalibration(rows: readonly RawForecast[], choice: CalibrationChoice, horizon: number): CalibrationChoice {
  const reachList = choice.candidates ?? [];
  const peakList = choice.peakCandidates ?? [];
  const firstReach = reachList[0], firstPeak = peakList[0];
  const settle = (reach: CalibrationCandidate | undefined, peak: PeakCandidate | undefined): CalibrationChoice => ({
    ...choice, ...(reach ?? {}), ...(peak ?? {}), candidates: [], peakCandidates: [],
  });
  if (reachList.length < 2 && peakList.length < 2) return settle(firstReach, firstPeak);
  const known = rows.filter((r) => r.truth !== null);
  const seasons = [...new Set(known.map((r) => r.season))].sort((a, b) => a - b);
  const split = seasons[Math.floor(seasons.length * (1 - HOLD_OUT_SHARE))];
  const fitRows = split === undefined ? [] : known.filter((r) => r.season < split);
  const heldOut = split === undefined ? [] : known.filter((r) => r.season >= split);
  if (fitRows.length < MIN_SELECTION_ROWS || heldOut.length < MIN_SELECTION_ROWS) return settle(firstReach, firstPeak);
  const reach = best(reachList, 'lowest', (c) => {
    const fit = fitCalibration(fitRows, settle(c, firstPeak));
    return heldOut.map((r) => (calibrateForecast(fit, r, horizon).reached - (r.truth?.reached === true ? 1 : 0)) ** 2);
  });
  const withPeak = heldOut.filter((r) => r.truth?.peak !== null && r.truth?.peak !== undefined);
  const peak = withPeak.length < MIN_PEAK_ROWS ? firstPeak : best(peakList, 'oneStandardError', (c) => {
    const fit = fitCalibration(fitRows, settle(firstReach, c));
    return withPeak.map((r) => Math.abs(calibrateForecast(fit, r, horizon).peak.p50 - (r.truth?.peak ?? NaN)));
  });
  return settle(reach, peak);
}

/**
 * The candidate with the lowest mean loss on the held-out rows (`lowest`), or (`oneStandardError`) the
 * first, simplest candidate unless another beats it by more than one standard error of the paired
 * differences (the one-standard-error rule, Hastie, Tibshirani and Friedman, The Elements of
 * Statistical Learning, 2009, section 7.10). A candidate with a non-finite loss is never kept.
 * Which rule for which model was decided by bench/outlook.bench.ts: `lowest` for the probability map
 * (the rule with one standard error kept the plain map where his profile helped), one standard error
 * for the peak (with `lowest`, one league's hitters lost 0.2 of Spearman).
 */
function best<T extends object>(list: readonly T[], rule: 'lowest' | 'oneStandardError', losses: (c: T) => number[]): T | undefined {
  const first = list[0];
  if (first === undefined || list.length < 2) return first;
  const base = losses(first);
  let kept = first, lowest = 0;
  for (const c of list.slice(1)) {
    const l = losses(c);
    const d = base.map((b, i) => b - (l[i] ?? NaN));
    if (d.length < 2 || !d.every(Number.isFinite)) continue;
    const mean = d.reduce((a, x) => a + x, 0) / d.length;
    const se = Math.sqrt(d.reduce((a, x) => a + (x - mean) ** 2, 0) / (d.length - 1) / d.length);
    if (mean > (rule === 'oneStandardError' ? se : 0) && mean > lowest) {
      kept = c;
      lowest = mean;
    }
  }
  return kept;
}

/** fitCalibration with the candidate selectCalibration keeps (the fit's `choice` names it). */
export function fitSelectedCalibration(rows: readonly RawForecast[], choice: CalibrationChoice, horizon: number): FittedCalibration {
  return fitCalibration(rows, selectCalibration(rows, choice, horizon));
}
