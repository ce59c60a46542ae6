import { conformalQuantile, rangeScore } from '../stats/conformalQuantile.ts';
import type { RawForecast, Spread } from './collectForecasts.ts';
import { fitLogistic, logisticProbability, type LogisticFit } from '../stats/fitLogistic.ts';
import { applyIsotonicMap, fitIsotonicMap, type IsotonicMap } from '../stats/isotonicRegression.ts';

/**
 * Inputs of the reached-the-top-level model (project choices, decided by bench/outlook.bench.ts), each
 * measured against the level-and-age base rate b, which is the model's offset (its log-odds enter with
 * coefficient 1, so with no evidence the forecast is the base rate known at the cut):
 * - comps: logit(shrunk comps' share) - logit(b);
 * - matched: logit(matched base rate) - logit(b) (0 unless the pool has a band or path);
 * - sample: log(1 + PA or BF) minus its mean at that level in the training forecasts (playing time).
 */
export type CalibrationFeature = 'comps' | 'matched' | 'sample';

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
}

export const DEFAULT_CALIBRATION: CalibrationChoice = { method: 'logistic', features: ['comps', 'sample'], shrink: 5, alpha: 0.2 };

/** Training forecasts need a level-and-age base rate resting on at least this many player-seasons. */
export const MIN_BASE_PLAYERS = 20;

/** A fitted calibration for one kind of player (hitters or pitchers), from forecasts whose truth is known. */
export interface FittedCalibration {
  readonly choice: CalibrationChoice;
  readonly training: number;
  readonly logistic: LogisticFit | null;
  readonly isotonic: IsotonicMap | null;
  /** Conformal widening of the peak range and of the top-level seasons range (conformalQuantile, CQR score). */
  readonly peakWidening: number;
  readonly peakScores: number;
  readonly seasonsWidening: number;
  readonly seasonsScores: number;
  /** Overall share reached in training (used when a forecast has no base rate at all). */
  readonly overall: number;
  /** Mean log(1 + sample) by level index in training (the centre of the sample feature). */
  readonly sampleCentre: ReadonlyMap<number, number>;
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

function featuresOf(r: RawForecast, c: CalibrationChoice, overall: number, centre: ReadonlyMap<number, number>): number[] {
  const anchor = anchorOf(r, overall);
  return c.features.map((f) => {
    switch (f) {
      case 'comps': return logit(shrunkShare(r, c.shrink, overall)) - anchor;
      case 'matched': return logit(baseShare(r, overall)) - anchor;
      case 'sample': return Math.log1p(r.sample) - (centre.get(r.level) ?? Math.log1p(r.sample));
    }
  });
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

/**
 * Fits the calibration on forecasts with a known truth (all of one kind): the probability map on the
 * features, and the conformal widening of the ranges from the same forecasts' scores (the ranges are
 * not fitted, so these scores are out-of-sample for them).
 */
export function fitCalibration(rows: readonly RawForecast[], choice: CalibrationChoice = DEFAULT_CALIBRATION): FittedCalibration {
  const known = rows.filter((r) => r.truth !== null && r.levelAge.n >= MIN_BASE_PLAYERS);
  const overall = known.length > 0 ? known.filter((r) => r.truth?.reached).length / known.length : 0.5;
  const y = known.map((r) => r.truth?.reached === true);
  const sums = new Map<number, { s: number; n: number }>();
  for (const r of known) {
    const e = sums.get(r.level) ?? { s: 0, n: 0 };
    e.s += Math.log1p(r.sample);
    e.n++;
    sums.set(r.level, e);
  }
  const sampleCentre = new Map([...sums].map(([level, e]) => [level, e.s / e.n]));
  let logistic: LogisticFit | null = null;
  let isotonic: IsotonicMap | null = null;
  if (known.length > 0) {
    if (choice.method === 'logistic') {
      logistic = fitLogistic(known.map((r) => featuresOf(r, choice, overall, sampleCentre)), y, {
        ridge: 2, penaliseIntercept: true, offsets: known.map((r) => anchorOf(r, overall)),
      });
    } else isotonic = fitIsotonicMap(known.map((r) => shrunkShare(r, choice.shrink, overall)), y.map((v) => (v ? 1 : 0)));
  }
  const peakScores: number[] = [], seasonScores: number[] = [];
  for (const r of known) {
    const { peak, seasons } = rawRanges(r, choice.shrink);
    const t = r.truth;
    if (t === null) continue;
    if (t.peak !== null && Number.isFinite(peak.p10)) peakScores.push(rangeScore(t.peak, peak.p10, peak.p90));
    if (Number.isFinite(seasons.p10)) seasonScores.push(rangeScore(t.seasons, seasons.p10, seasons.p90));
  }
  return {
    choice,
    training: known.length,
    logistic,
    isotonic,
    peakWidening: conformalQuantile(peakScores, choice.alpha),
    peakScores: peakScores.length,
    seasonsWidening: conformalQuantile(seasonScores, choice.alpha),
    seasonsScores: seasonScores.length,
    overall,
    sampleCentre,
  };
}

/** The calibrated forecast of one prospect-season: the probability from the fitted map, the ranges widened (or narrowed) by the conformal quantile. */
export function calibrateForecast(fit: FittedCalibration, r: RawForecast, horizon: number): CalibratedForecast {
  const c = fit.choice;
  let reached: number;
  if (fit.logistic) reached = logisticProbability(fit.logistic, featuresOf(r, c, fit.overall, fit.sampleCentre), anchorOf(r, fit.overall));
  else if (fit.isotonic) reached = applyIsotonicMap(fit.isotonic, shrunkShare(r, c.shrink, fit.overall));
  else reached = shrunkShare(r, c.shrink, fit.overall);
  const { peak, seasons } = rawRanges(r, c.shrink);
  const widen = (s: Spread, q: number, lo: number, hi: number): Spread => {
    if (!Number.isFinite(s.p10) || !Number.isFinite(q)) return { ...s, p10: NaN, p90: NaN };
    return { n: s.n, p10: Math.max(lo, Math.min(s.p50, s.p10 - q)), p50: s.p50, p90: Math.min(hi, Math.max(s.p50, s.p90 + q)) };
  };
  return {
    reached,
    peak: widen(peak, fit.peakWidening, -Infinity, Infinity),
    seasons: widen(seasons, fit.seasonsWidening, 0, horizon),
  };
}
