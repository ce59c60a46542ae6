import { conformalQuantile, rangeScore } from '../stats/conformalQuantile.ts';
import type { RawForecast, Spread } from './collectForecasts.ts';
import { fitLogistic, logisticProbability, type LogisticFit } from '../stats/fitLogistic.ts';
import { fitRidge, ridgePrediction, type RidgeFit } from '../stats/fitRidge.ts';
import { applyIsotonicMap, fitIsotonicMap, type IsotonicMap } from '../stats/isotonicRegression.ts';

/**
 * Inputs of the reached-the-top-level model and of the peak model (project choices, decided by
 * bench/outlook.bench.ts). The reach model's offset is the log-odds of the level-and-age base rate b
 * (coefficient 1: with no evidence the forecast is the base rate known at the cut); the peak model's is
 * the matched base rate's peak p50.
 * - comps: reach: logit(shrunk comps' share) - logit(b); peak: the comps' and base rate's blended p50 minus the base rate's p50;
 * - matched: reach: logit(matched base rate) - logit(b) (0 unless the pool has a band or path); peak: unused (0);
 * - sample: log(1 + PA or BF) minus its mean at that level in the training forecasts (playing time);
 * - age: age minus the mean age at that level in the training forecasts (young for the level);
 * - path: two 0/1 terms, at the same level the season before (repeating it), and without a profile the season before;
 * - profile: his own standardised profile, one term per dimension (missing: 0, the stratum mean).
 */
export type CalibrationFeature = 'comps' | 'matched' | 'sample' | 'seasonSample' | 'climb' | 'age' | 'path' | 'profile';

export interface CalibrationChoice {
  /** Map of the features to a probability: a fitted logistic (Platt 1999) or, on the comps feature alone, PAV isotonic (Zadrozny and Elkan 2002). */
  readonly method: 'logistic' | 'isotonic';
  readonly features: readonly CalibrationFeature[];
  /**
   * Prior weight m of the matched base rate in the comps' share: (n_eff s + m b) / (n_eff + m), with n_eff
   * Kish's effective number of comps; also the weight of the matched base rate's range against the comps'.
   */
  readonly shrink: number;
  /** Nominal miscoverage of the ranges (0.2: p10 to p90). */
  readonly alpha: number;
  /**
   * The peak's p50 and range: `blend`, the comps' and base rate's p10 / p50 / p90 blended and widened by
   * split conformal (CQR score); `scaled`, the same with the score divided by the blended range's width
   * (locally weighted conformal, Lei et al. 2018 section 5.2), so the widening grows with the range; `regression`, a ridge regression of the realised peak on `peakFeatures`
   * with the base rate's p50 as offset, its range from cross-fitted residual quantiles (split conformal).
   */
  readonly peak: 'blend' | 'scaled' | 'regression';
  readonly peakFeatures: readonly CalibrationFeature[];
  /** Ridge penalty of the probability map on its slopes (features are on a unit-ish scale). */
  readonly ridge: number;
  /** Ridge penalty of the `regression` peak model on its slopes. */
  readonly peakRidge: number;
  /**
   * Probability maps to choose from on each roster (selectCalibration: fitted on the earlier training
   * seasons, scored on the later ones); empty or absent: `features` and `ridge` as given.
   */
  readonly candidates?: readonly CalibrationCandidate[];
  /** Peak models to choose from the same way (scored by the mean absolute error of the p50); empty or absent: as given. */
  readonly peakCandidates?: readonly PeakCandidate[];
}

/** One candidate probability map: the logistic's features and its ridge. */
export interface CalibrationCandidate {
  readonly features: readonly CalibrationFeature[];
  readonly ridge: number;
}

/** One candidate peak model. */
export interface PeakCandidate {
  readonly peak: CalibrationChoice['peak'];
  readonly peakFeatures: readonly CalibrationFeature[];
  readonly peakRidge: number;
}

/**
 * The default (bench/outlook.bench.ts, docs/jobs.md): on each roster, the probability map is chosen
 * between the comps' share and playing time alone and the same with his own profile (ridge 40 or 100),
 * and the peak between the blended ranges and a ridge regression on comps and profile, by how each did
 * on that roster's later training seasons (selectCalibration). `features`, `ridge` and `peak` name the
 * first candidates, used when a roster is too short to choose.
 */
export const DEFAULT_CALIBRATION: CalibrationChoice = {
  method: 'logistic', features: ['comps', 'sample'], shrink: 5, alpha: 0.2, peak: 'blend', peakFeatures: ['comps'], ridge: 2, peakRidge: 40,
  candidates: [
    { features: ['comps', 'sample'], ridge: 2 },
    { features: ['comps', 'sample', 'profile'], ridge: 40 },
    { features: ['comps', 'sample', 'profile'], ridge: 100 },
  ],
  peakCandidates: [
    { peak: 'blend', peakFeatures: ['comps'], peakRidge: 40 },
    { peak: 'regression', peakFeatures: ['comps', 'profile'], peakRidge: 40 },
  ],
};

/** Training forecasts need a level-and-age base rate resting on at least this many player-seasons. */
export const MIN_BASE_PLAYERS = 20;

/** Folds of the cross-fitted peak residuals. */
const FOLDS = 5;

/** A fitted calibration for one kind of player (hitters or pitchers), from forecasts whose truth is known. */
export interface FittedCalibration {
  readonly choice: CalibrationChoice;
  readonly training: number;
  readonly logistic: LogisticFit | null;
  readonly isotonic: IsotonicMap | null;
  /** Conformal widening of the blended peak range (CQR score; `blend`), and of the top-level seasons range. */
  readonly peakWidening: number;
  readonly peakScores: number;
  readonly seasonsWidening: number;
  readonly seasonsScores: number;
  /** `regression`: the peak model, and the residual quantiles added to its fit for p10 and p90. */
  readonly peakModel: RidgeFit | null;
  readonly peakResidual: readonly [number, number];
  /** Overall share reached and mean realised peak in training (when a forecast has no base rate at all). */
  readonly overall: number;
  readonly overallPeak: number;
  /** Means by level index in training: log(1 + sample), and age (the centres of those features). */
  readonly sampleCentre: ReadonlyMap<number, number>;
  readonly seasonSampleCentre: ReadonlyMap<number, number>;
  readonly ageCentre: ReadonlyMap<number, number>;
  /** Dimension names of the profile feature, in order. */
  readonly profileDims: readonly string[];
}

export interface CalibratedForecast {
  readonly reached: number;
  readonly peak: Spread;
  readonly seasons: Spread;
}

const clip = (p: number): number => Math.min(0.99, Math.max(0.01, p));
const logit = (p: number): number => Math.log(clip(p) / (1 - clip(p)));
const finiteOr = (x: number, fallback: number): number => (Number.isFinite(x) ? x : fallback);

/** The matched base rate's share, else the level-and-age one, else the overall share. */
function baseShare(r: RawForecast, overall: number): number {
  return finiteOr(r.matched.share, finiteOr(r.levelAge.share, overall));
}

/** The comps' share shrunk toward the matched base rate by the effective number of comps. */
export function shrunkShare(r: RawForecast, shrink: number, overall: number): number {
  const b = baseShare(r, overall);
  if (!Number.isFinite(r.comps.share) || !(r.comps.effective > 0)) return b;
  return (r.comps.effective * r.comps.share + shrink * b) / (r.comps.effective + shrink);
}

/** The offset: log-odds of the level-and-age base rate (else the matched one, else the overall share). */
function anchorOf(r: RawForecast, overall: number): number {
  return logit(finiteOr(r.levelAge.share, baseShare(r, overall)));
}

/** The peak model's offset: the matched base rate's p50, else the training mean. */
function peakAnchorOf(r: RawForecast, overallPeak: number): number {
  return finiteOr(r.matched.peak.p50, overallPeak);
}

/** What the features are centred on: the part of a fitted calibration that featuresOf reads. */
type Centres = Pick<FittedCalibration, 'overall' | 'overallPeak' | 'sampleCentre' | 'seasonSampleCentre' | 'ageCentre' | 'profileDims'>;

function featuresOf(r: RawForecast, features: readonly CalibrationFeature[], target: 'reach' | 'peak', c: CalibrationChoice, k: Centres): number[] {
  const out: number[] = [];
  for (const f of features) {
    switch (f) {
      case 'comps':
        if (target === 'reach') out.push(logit(shrunkShare(r, c.shrink, k.overall)) - anchorOf(r, k.overall));
        else out.push(finiteOr(rawRanges(r, c.shrink).peak.p50 - peakAnchorOf(r, k.overallPeak), 0));
        break;
      case 'matched': out.push(target === 'reach' ? logit(baseShare(r, k.overall)) - anchorOf(r, k.overall) : 0); break;
      case 'sample': out.push(Math.log1p(r.sample) - (k.sampleCentre.get(r.level) ?? Math.log1p(r.sample))); break;
      case 'seasonSample': out.push(Math.log1p(r.seasonSample) - (k.seasonSampleCentre.get(r.level) ?? Math.log1p(r.seasonSample))); break;
      case 'climb': out.push(r.climbed ? 1 : 0); break;
      case 'age': out.push(finiteOr(r.age - (k.ageCentre.get(r.level) ?? r.age), 0)); break;
      case 'path': out.push(r.levelBefore === r.level ? 1 : 0, r.levelBefore < 0 ? 1 : 0); break;
      case 'profile': for (const name of k.profileDims) out.push(finiteOr(r.profile[name] ?? NaN, 0)); break;
    }
  }
  return out;
}

/** The comps' and the matched base rate's spreads blended, weight n / (n + shrink) on the comps. */
function blend(comps: Spread, base: Spread, shrink: number): Spread {
  const okC = Number.isFinite(comps.p50), okB = Number.isFinite(base.p50);
  if (!okC && !okB) return { n: 0, p10: NaN, p50: NaN, p90: NaN };
  if (!okC) return base;
  if (!okB) return comps;
  const w = comps.n / (comps.n + shrink);
  const mix = (a: number, b: number): number => w * a + (1 - w) * b;
  return { n: comps.n, p10: mix(comps.p10, base.p10), p50: mix(comps.p50, base.p50), p90: mix(comps.p90, base.p90) };
}

function rawRanges(r: RawForecast, shrink: number): { peak: Spread; seasons: Spread } {
  return { peak: blend(r.comps.peak, r.matched.peak, shrink), seasons: blend(r.comps.seasons, r.matched.seasons, shrink) };
}

/** A range's width for the scaled score, at least 1 (a point range still gets a widening). */
const widthOf = (s: Spread): number => Math.max(1, s.p90 - s.p10);

const meanBy = (rows: readonly RawForecast[], value: (r: RawForecast) => number): Map<number, number> => {
  const sums = new Map<number, { s: number; n: number }>();
  for (const r of rows) {
    const v = value(r);
    if (!Number.isFinite(v)) continue;
    const e = sums.get(r.level) ?? { s: 0, n: 0 };
    e.s += v;
    e.n++;
    sums.set(r.level, e);
  }
  return new Map([...sums].map(([level, e]) => [level, e.s / e.n]));
};

/**
 * Fits the calibration on forecasts with a known truth (all of one kind): the probability map on the
 * features, the peak model, and the conformal adjustment of the ranges (from scores the ranges were not
 * fitted on: the blended ranges are not fitted at all; the regression's residuals are cross-fitted).
 */
export function fitCalibration(rows: readonly RawForecast[], choice: CalibrationChoice = DEFAULT_CALIBRATION): FittedCalibration {
  const known = rows.filter((r) => r.truth !== null && r.levelAge.n >= MIN_BASE_PLAYERS);
  const overall = known.length > 0 ? known.filter((r) => r.truth?.reached).length / known.length : 0.5;
  const peaks = known.filter((r) => r.truth?.peak !== null && r.truth?.peak !== undefined);
  const overallPeak = peaks.length > 0 ? peaks.reduce((a, r) => a + (r.truth?.peak ?? 0), 0) / peaks.length : 100;
  const uses = (f: CalibrationFeature): boolean => choice.features.includes(f) || (choice.peak === 'regression' && choice.peakFeatures.includes(f));
  const centres: Centres = {
    overall, overallPeak,
    sampleCentre: meanBy(known, (r) => Math.log1p(r.sample)),
    seasonSampleCentre: meanBy(known, (r) => Math.log1p(r.seasonSample)),
    ageCentre: meanBy(known, (r) => r.age),
    profileDims: uses('profile') ? [...new Set(known.flatMap((r) => Object.keys(r.profile)))].sort() : [],
  };
  const y = known.map((r) => r.truth?.reached === true);
  let logistic: LogisticFit | null = null;
  let isotonic: IsotonicMap | null = null;
  if (known.length > 0) {
    if (choice.method === 'logistic') {
      logistic = fitLogistic(known.map((r) => featuresOf(r, choice.features, 'reach', choice, centres)), y, {
        ridge: choice.ridge, penaliseIntercept: true, offsets: known.map((r) => anchorOf(r, overall)),
      });
    } else isotonic = fitIsotonicMap(known.map((r) => shrunkShare(r, choice.shrink, overall)), y.map((v) => (v ? 1 : 0)));
  }
  const peakScores: number[] = [], seasonScores: number[] = [];
  for (const r of known) {
    const { peak, seasons } = rawRanges(r, choice.shrink);
    const t = r.truth;
    if (t === null) continue;
    if (t.peak !== null && Number.isFinite(peak.p10)) peakScores.push(rangeScore(t.peak, peak.p10, peak.p90) / (choice.peak === 'scaled' ? widthOf(peak) : 1));
    if (Number.isFinite(seasons.p10)) seasonScores.push(rangeScore(t.seasons, seasons.p10, seasons.p90));
  }
  let peakModel: RidgeFit | null = null;
  let peakResidual: readonly [number, number] = [NaN, NaN];
  if (choice.peak === 'regression' && peaks.length > 0) {
    const xs = peaks.map((r) => featuresOf(r, choice.peakFeatures, 'peak', choice, centres));
    const ys = peaks.map((r) => (r.truth?.peak ?? 0) - peakAnchorOf(r, overallPeak));
    peakModel = fitRidge(xs, ys, choice.peakRidge);
    // cross-fitted residuals (each row's from a fit without its fold), so the quantiles are out of sample
    const residuals: number[] = [];
    for (let fold = 0; fold < FOLDS; fold++) {
      const inFold = (i: number): boolean => i % FOLDS === fold;
      const train = xs.map((_, i) => i).filter((i) => !inFold(i));
      if (train.length === 0) continue;
      const m = fitRidge(train.map((i) => xs[i] as number[]), train.map((i) => ys[i] as number), choice.peakRidge);
      xs.forEach((x, i) => { if (inFold(i)) residuals.push((ys[i] as number) - ridgePrediction(m, x)); });
    }
    // two one-sided split-conformal quantiles at alpha / 2 each (Lei et al. 2018; Romano et al. 2019, asymmetric form)
    peakResidual = [-conformalQuantile(residuals.map((e) => -e), choice.alpha / 2), conformalQuantile(residuals, choice.alpha / 2)];
  }
  return {
    choice,
    training: known.length,
    logistic,
    isotonic,
    peakWidening: conformalQuantile(peakScores, choice.alpha),
    peakScores: choice.peak === 'regression' ? peaks.length : peakScores.length,
    seasonsWidening: conformalQuantile(seasonScores, choice.alpha),
    seasonsScores: seasonScores.length,
    peakModel,
    peakResidual,
    overall,
    overallPeak,
    sampleCentre: centres.sampleCentre,
    seasonSampleCentre: centres.seasonSampleCentre,
    ageCentre: centres.ageCentre,
    profileDims: centres.profileDims,
  };
}

/** The calibrated forecast of one prospect-season: the probability from the fitted map, the peak from its model, the ranges adjusted to their coverage. */
export function calibrateForecast(fit: FittedCalibration, r: RawForecast, horizon: number): CalibratedForecast {
  const c = fit.choice;
  let reached: number;
  if (fit.logistic) reached = logisticProbability(fit.logistic, featuresOf(r, c.features, 'reach', c, fit), anchorOf(r, fit.overall));
  else if (fit.isotonic) reached = applyIsotonicMap(fit.isotonic, shrunkShare(r, c.shrink, fit.overall));
  else reached = shrunkShare(r, c.shrink, fit.overall);
  const { peak, seasons } = rawRanges(r, c.shrink);
  const widen = (s: Spread, q: number, lo: number, hi: number): Spread => {
    if (!Number.isFinite(s.p10) || !Number.isFinite(q)) return { ...s, p10: NaN, p90: NaN };
    return { n: s.n, p10: Math.max(lo, Math.min(s.p50, s.p10 - q)), p50: s.p50, p90: Math.min(hi, Math.max(s.p50, s.p90 + q)) };
  };
  let peakOut: Spread;
  if (c.peak === 'regression' && fit.peakModel) {
    const p50 = peakAnchorOf(r, fit.overallPeak) + ridgePrediction(fit.peakModel, featuresOf(r, c.peakFeatures, 'peak', c, fit));
    const [lo, hi] = fit.peakResidual;
    peakOut = Number.isFinite(lo) && Number.isFinite(hi)
      ? { n: peak.n, p10: p50 + Math.min(0, lo), p50, p90: p50 + Math.max(0, hi) }
      : { n: peak.n, p10: NaN, p50, p90: NaN };
  } else peakOut = widen(peak, fit.peakWidening * (c.peak === 'scaled' && Number.isFinite(peak.p10) ? widthOf(peak) : 1), -Infinity, Infinity);
  return { reached, peak: peakOut, seasons: widen(seasons, fit.seasonsWidening, 0, horizon) };
}
