import { bootstrapInterval } from '../stats/bootstrapInterval.ts';
import { brierScore } from '../stats/brierScore.ts';
import { calibrateForecast, DEFAULT_CALIBRATION, MIN_BASE_PLAYERS, type CalibrationChoice, type CalibrationFeature, type FittedCalibration } from './calibrateForecast.ts';
import { fitSelectedCalibration } from './selectCalibration.ts';
import type { RawForecast } from './collectForecasts.ts';
import { intervalCoverage } from '../stats/intervalCoverage.ts';
import { murphyDecomposition, type MurphyBin } from '../stats/murphyDecomposition.ts';
import { spearmanCorrelation } from '../stats/spearmanCorrelation.ts';
import type { OutcomeKind } from './CompOutcome.ts';

export interface BacktestOptions {
  readonly horizon: number;
  /** Cut seasons (default: every season with enough training forecasts and a complete follow-up). */
  readonly cuts?: readonly number[];
  readonly calibration?: CalibrationChoice;
  /** Fewest training forecasts (with a known truth) a cut needs (default 100). */
  readonly minTraining?: number;
  /** Bootstrap rounds for the skill interval (default 500). */
  readonly rounds?: number;
}

/** A figure with its 95% percentile-bootstrap interval. */
export interface WithInterval {
  readonly value: number;
  readonly low: number;
  readonly high: number;
}

export interface CutCount {
  readonly cut: number;
  readonly training: number;
  readonly targets: number;
  readonly reached: number;
  /** The features of the probability map and the peak model the cut's calibration used (chosen on its training forecasts). */
  readonly features: readonly CalibrationFeature[];
  readonly peak: CalibrationChoice['peak'];
}

/** One forecast scored at its cut: what the calibrated outlook said and what happened. */
export interface ScoredForecast {
  readonly cut: number;
  readonly reachedForecast: number;
  readonly compsShare: number;
  readonly matchedShare: number;
  readonly levelAgeShare: number;
  readonly reached: boolean;
  readonly peak: number | null;
  readonly peakP10: number;
  readonly peakP50: number;
  readonly peakP90: number;
  readonly rawPeakP10: number;
  readonly rawPeakP90: number;
  readonly seasons: number;
  readonly seasonsP10: number;
  readonly seasonsP90: number;
}

export interface KindBacktest {
  readonly kind: OutcomeKind;
  readonly targets: number;
  readonly reachedShare: number;
  readonly brier: { readonly calibrated: number; readonly comps: number; readonly matched: number; readonly levelAge: number };
  /** 1 - BS / BS of the level-and-age base rate, with a bootstrap interval over targets. */
  readonly skillVsLevelAge: WithInterval;
  /** 1 - BS / BS of the matched base rate (same pool rules as the comps). */
  readonly skillVsMatched: WithInterval;
  readonly murphy: { readonly reliability: number; readonly resolution: number; readonly uncertainty: number; readonly bins: readonly MurphyBin[] };
  /** Spearman of the peak p50 with the realised peak (targets who had a qualifying top-level season). */
  readonly spearman: WithInterval;
  readonly peakTargets: number;
  /** Share of realised peaks inside the adjusted p10-p90, and inside the comps' own (before adjustment). */
  readonly peakCoverage: WithInterval;
  readonly peakCoverageRaw: number;
  readonly seasonsCoverage: WithInterval;
  readonly cuts: readonly CutCount[];
  readonly scored: readonly ScoredForecast[];
}

export interface BacktestResult {
  readonly horizon: number;
  readonly cuts: readonly number[];
  readonly calibration: CalibrationChoice;
  readonly kinds: readonly KindBacktest[];
  /** Why no cut could be scored (a roster too short), when none was. */
  readonly tooShort: string | null;
}

const KINDS: readonly OutcomeKind[] = ['hitter', 'pitcher'];

/**
 * Training rows for a cut: forecasts made at seasons whose whole follow-up had been played by the cut,
 * with a level-and-age base rate of their own (MIN_BASE_PLAYERS earlier player-seasons).
 */
export function trainingFor(rows: readonly RawForecast[], cut: number, horizon: number): RawForecast[] {
  return rows.filter((r) => r.season + horizon <= cut && r.truth !== null && r.levelAge.n >= MIN_BASE_PLAYERS);
}

/** Cut seasons that can be scored: a complete follow-up after the cut and enough training before it. */
export function defaultCuts(rows: readonly RawForecast[], horizon: number, minTraining: number, lastSeason: number): number[] {
  const seasons = [...new Set(rows.map((r) => r.season))].sort((a, b) => a - b);
  const present = KINDS.filter((k) => rows.some((r) => r.kind === k));
  return seasons.filter((c) => c + horizon <= lastSeason && present.length > 0 && present.every((k) => trainingFor(rows.filter((r) => r.kind === k), c, horizon).length >= minTraining));
}

/**
 * The rolling-origin backtest (Tashman 2000, "Out-of-sample tests of forecasting accuracy", IJF 16):
 * at each cut season C, the calibration is fitted on forecasts made at seasons t <= C - horizon (whose
 * truth was known by C), and applied to the prospects of season C, forecast as of C (collectForecasts:
 * nothing after C enters them); their truth (C + 1 .. C + horizon) scores the cut. Figures pool the cuts.
 */
export function runBacktest(rows: readonly RawForecast[], lastSeason: number, options: BacktestOptions): BacktestResult {
  const horizon = options.horizon;
  const choice = options.calibration ?? DEFAULT_CALIBRATION;
  const minTraining = options.minTraining ?? 100;
  const cuts = options.cuts ?? defaultCuts(rows, horizon, minTraining, lastSeason);
  const kinds: KindBacktest[] = [];
  for (const kind of KINDS) {
    const mine = rows.filter((r) => r.kind === kind);
    const scored: ScoredForecast[] = [];
    const counts: CutCount[] = [];
    for (const cut of cuts) {
      if (cut + horizon > lastSeason) continue;
      const training = trainingFor(mine, cut, horizon);
      if (training.length < minTraining) continue;
      const fit = fitSelectedCalibration(training, choice, horizon);
      const targets = mine.filter((r) => r.season === cut && r.truth !== null);
      let reached = 0;
      for (const r of targets) {
        const t = r.truth;
        if (t === null) continue;
        if (t.reached) reached++;
        scored.push(scoreOne(fit, r, cut, horizon));
      }
      counts.push({ cut, training: training.length, targets: targets.length, reached, features: fit.choice.features, peak: fit.choice.peak });
    }
    if (scored.length > 0) kinds.push(summariseKind(kind, scored, counts, options.rounds ?? 500));
  }
  const tooShort = kinds.length === 0
    ? `no cut season could be scored: a cut needs ${minTraining} earlier prospect forecasts of each kind whose ${horizon}-season follow-up had ended (each with ${MIN_BASE_PLAYERS} earlier player-seasons at its level and age), and its own ${horizon} seasons of follow-up in the data (data ${rows.length > 0 ? Math.min(...rows.map((r) => r.season)) : '-'}-${lastSeason})`
    : null;
  return { horizon, cuts: [...new Set(kinds.flatMap((k) => k.cuts.map((c) => c.cut)))].sort((a, b) => a - b), calibration: choice, kinds, tooShort };
}

function scoreOne(fit: FittedCalibration, r: RawForecast, cut: number, horizon: number): ScoredForecast {
  const c = calibrateForecast(fit, r, horizon);
  const t = r.truth;
  if (t === null) throw new RangeError('internal: scoring a forecast without truth');
  const rawLo = Number.isFinite(r.comps.peak.p10) ? r.comps.peak.p10 : r.matched.peak.p10;
  const rawHi = Number.isFinite(r.comps.peak.p90) ? r.comps.peak.p90 : r.matched.peak.p90;
  return {
    cut,
    reachedForecast: c.reached,
    compsShare: Number.isFinite(r.comps.share) ? r.comps.share : r.matched.share,
    matchedShare: r.matched.share,
    levelAgeShare: r.levelAge.share,
    reached: t.reached,
    peak: t.peak,
    peakP10: c.peak.p10, peakP50: c.peak.p50, peakP90: c.peak.p90,
    rawPeakP10: rawLo, rawPeakP90: rawHi,
    seasons: t.seasons, seasonsP10: c.seasons.p10, seasonsP90: c.seasons.p90,
  };
}

function summariseKind(kind: OutcomeKind, scored: readonly ScoredForecast[], cuts: readonly CutCount[], rounds: number): KindBacktest {
  // The level-and-age base rate can be missing (no earlier player at that level and age): the matched one, then the overall share, stand in.
  const overall = scored.filter((s) => s.reached).length / scored.length;
  const la = scored.map((s) => (Number.isFinite(s.levelAgeShare) ? s.levelAgeShare : Number.isFinite(s.matchedShare) ? s.matchedShare : overall));
  const matched = scored.map((s, i) => (Number.isFinite(s.matchedShare) ? s.matchedShare : (la[i] as number)));
  const comps = scored.map((s, i) => (Number.isFinite(s.compsShare) ? s.compsShare : (matched[i] as number)));
  const cal = scored.map((s) => s.reachedForecast);
  const y = scored.map((s) => s.reached);
  const pick = <T>(xs: readonly T[], idx: readonly number[]): T[] => idx.map((i) => xs[i] as T);
  const skill = (ref: readonly number[]) => (idx: readonly number[]): number => {
    const yy = pick(y, idx);
    return 1 - brierScore(pick(cal, idx), yy) / brierScore(pick(ref, idx), yy);
  };
  const all = scored.map((_, i) => i);
  const withCi = (value: number, stat: (idx: readonly number[]) => number, n: number): WithInterval => {
    const [low, high] = bootstrapInterval(n, stat, { rounds, seed: 7 });
    return { value, low, high };
  };
  const peakRows = scored.filter((s) => s.peak !== null && Number.isFinite(s.peakP50));
  const peakTruth = peakRows.map((s) => s.peak as number);
  const spearman = (idx: readonly number[]): number => spearmanCorrelation(pick(peakRows.map((s) => s.peakP50), idx), pick(peakTruth, idx));
  const cover = (rowsOf: readonly ScoredForecast[], truth: (s: ScoredForecast) => number, lo: (s: ScoredForecast) => number, hi: (s: ScoredForecast) => number) =>
    (idx: readonly number[]): number => intervalCoverage(pick(rowsOf, idx).map(truth), pick(rowsOf, idx).map(lo), pick(rowsOf, idx).map(hi));
  const peakCover = cover(peakRows, (s) => s.peak as number, (s) => s.peakP10, (s) => s.peakP90);
  const seasonRows = scored.filter((s) => Number.isFinite(s.seasonsP10));
  const seasonCover = cover(seasonRows, (s) => s.seasons, (s) => s.seasonsP10, (s) => s.seasonsP90);
  const peakIdx = peakRows.map((_, i) => i);
  const seasonIdx = seasonRows.map((_, i) => i);
  const m = murphyDecomposition(cal, y);
  return {
    kind,
    targets: scored.length,
    reachedShare: overall,
    brier: { calibrated: brierScore(cal, y), comps: brierScore(comps, y), matched: brierScore(matched, y), levelAge: brierScore(la, y) },
    skillVsLevelAge: withCi(skill(la)(all), skill(la), all.length),
    skillVsMatched: withCi(skill(matched)(all), skill(matched), all.length),
    murphy: { reliability: m.reliability, resolution: m.resolution, uncertainty: m.uncertainty, bins: m.bins },
    spearman: withCi(spearman(peakIdx), spearman, peakIdx.length),
    peakTargets: peakRows.length,
    peakCoverage: withCi(peakCover(peakIdx), peakCover, peakIdx.length),
    peakCoverageRaw: intervalCoverage(peakTruth, peakRows.map((s) => s.rawPeakP10), peakRows.map((s) => s.rawPeakP90)),
    seasonsCoverage: withCi(seasonCover(seasonIdx), seasonCover, seasonIdx.length),
    cuts,
    scored,
  };
}
