import { isPitcherGroup, type PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { playerTarget } from '../query/playerTarget.ts';
import { brierScore } from '../stats/brierScore.ts';
import { findProspectComps, type ProspectOptions } from '../jobs/findProspectComps.ts';
import { intervalCoverage } from '../stats/intervalCoverage.ts';
import { peakOf, type Outcomes } from './Outcomes.ts';
import { spearmanCorrelation } from '../stats/spearmanCorrelation.ts';
import { peakSummaryOf } from './summariseOutlook.ts';
import type { OutcomeKind } from './CompOutcome.ts';
import type { OutlookFigures } from './Outlook.ts';

export interface EvaluateOptions {
  readonly prospect: ProspectOptions;
  /** Groups to draw targets from (default: every group in the store). */
  readonly groups?: readonly PositionGroup[];
  /** At most this many targets, spread over the candidates (default: all). */
  readonly maxTargets?: number;
  /** Targets need at least this many seasons of history before them (default: the horizon). */
  readonly minHistory?: number;
}

/** Forecast against truth for one kind of figure, comps and base rate side by side. */
export interface FigureCheck {
  /** Targets with both a forecast and a truth. */
  readonly n: number;
  readonly comps: number;
  readonly baseline: number;
}

export interface KindEvaluation {
  readonly targets: number;
  /** Brier score of reached_top_level (lower is better). */
  readonly brier: FigureCheck;
  /** Share reached among the targets (the truth). */
  readonly reachedShare: number;
  /** Share of true peaks inside the forecast p10 to p90 (targets whose truth has a qualifying season). */
  readonly peakCoverage: FigureCheck;
  /** Spearman correlation of the forecast peak p50 with the true peak. */
  readonly peakSpearman: FigureCheck;
  /** Share of true top-level season counts inside the forecast p10 to p90. */
  readonly seasonsCoverage: FigureCheck;
  /** Spearman correlation of the forecast mean top-level seasons with the true count. */
  readonly seasonsSpearman: FigureCheck;
}

export interface OutlookEvaluation {
  readonly hitter: KindEvaluation;
  readonly pitcher: KindEvaluation;
  /** Candidate targets skipped because no comp had a complete window. */
  readonly withoutComps: number;
}

interface Row {
  readonly kind: OutcomeKind;
  readonly comps: OutlookFigures;
  readonly baseline: OutlookFigures;
  readonly reached: boolean;
  readonly peak: number;
  readonly seasons: number;
}

const nan = (x: number | null): number => (x === null ? NaN : x);

/**
 * The honesty check of the outlook: each target is a minor-league player-season s whose own follow-up
 * (s + 1 .. s + horizon) is complete in the data; it is forecast from comps with outcomes cut off at s
 * (asOf = s: only comp seasons up to s - horizon, whose windows ended by s, as a club would have had),
 * and the forecast is compared with what the target then did. The same is done with the level-and-age
 * base rate (the pool's unweighted figures). With a path of N seasons, only targets with the N - 1
 * seasons before theirs profiled in the group qualify. One target per player: a fixed pseudo-random choice among
 * his qualifying seasons (Knuth's multiplicative hash of the player index), so players with long
 * minor-league careers do not count more.
 */
export function evaluateOutlook(store: ProfileStore, outcomes: Outcomes, options: EvaluateOptions): OutlookEvaluation {
  const horizon = options.prospect.horizon;
  const minHistory = options.minHistory ?? horizon;
  const top = store.levels.indexOf(outcomes.topLevel);
  const candidates: { group: PositionGroup; row: number }[] = [];
  for (const [group, g] of store.groups) {
    if (options.groups && !options.groups.includes(group)) continue;
    const seasonsOf = new Set<string>();
    for (let i = 0; i < g.n; i++) seasonsOf.add(`${g.player[i]}|${g.season[i]}`);
    const hasPath = (player: number, season: number): boolean => {
      for (let j = 1; j < options.prospect.path; j++) if (!seasonsOf.has(`${player}|${season - j}`)) return false;
      return true;
    };
    const byPlayer = new Map<number, number[]>();
    for (let i = 0; i < g.n; i++) {
      const s = g.season[i] as number;
      if (g.level[i] === top || Number.isNaN(g.age[i] as number) || !hasPath(g.player[i] as number, s)) continue;
      if (s + horizon > outcomes.lastSeason || s - minHistory < outcomes.firstSeason) continue;
      const p = g.player[i] as number;
      const list = byPlayer.get(p);
      if (list) list.push(i);
      else byPlayer.set(p, [i]);
    }
    for (const [p, rows] of byPlayer) candidates.push({ group, row: rows[((p + 1) * 2654435761) % 4294967296 % rows.length] as number });
  }
  const step = options.maxTargets !== undefined && candidates.length > options.maxTargets ? candidates.length / options.maxTargets : 1;
  const rows: Row[] = [];
  let withoutComps = 0;
  for (let t = 0; t < candidates.length; t += step) {
    const c = candidates[Math.floor(t)];
    if (!c) continue;
    const target = playerTarget(store, c);
    const season = target.season as number;
    const result = findProspectComps(store, outcomes, target, { ...options.prospect, asOf: season, includeCensored: false });
    if (result.outlook.comps_used === 0) {
      withoutComps++;
      continue;
    }
    const kind: OutcomeKind = isPitcherGroup(c.group) ? 'pitcher' : 'hitter';
    const truth = outcomes.futureOf(target.player, kind, season, horizon);
    rows.push({ kind, comps: result.outlook, baseline: result.outlook.baseline, reached: truth.reached_top_level, peak: nan(peakOf(truth)), seasons: truth.top_level_seasons });
  }
  return { hitter: summarise(rows.filter((r) => r.kind === 'hitter')), pitcher: summarise(rows.filter((r) => r.kind === 'pitcher')), withoutComps };
}

function summarise(rows: readonly Row[]): KindEvaluation {
  const reached = rows.map((r) => r.reached);
  const forecast = (pick: (r: Row) => OutlookFigures): number[] => rows.map((r) => nan(pick(r).reached_top_level));
  const check = (f: (figures: OutlookFigures, r: Row) => number, truthOf: (r: Row) => number, use: (a: number[], b: number[]) => number): FigureCheck => {
    const subset = rows.filter((r) => !Number.isNaN(truthOf(r)) && !Number.isNaN(f(r.comps, r)) && !Number.isNaN(f(r.baseline, r)));
    const truth = subset.map(truthOf);
    return {
      n: subset.length,
      comps: use(subset.map((r) => f(r.comps, r)), truth),
      baseline: use(subset.map((r) => f(r.baseline, r)), truth),
    };
  };
  const coverage = (lo: (f: OutlookFigures) => number, hi: (f: OutlookFigures) => number, truthOf: (r: Row) => number): FigureCheck => {
    const subset = rows.filter((r) => !Number.isNaN(truthOf(r)) && !Number.isNaN(lo(r.comps)) && !Number.isNaN(lo(r.baseline)));
    const truth = subset.map(truthOf);
    return {
      n: subset.length,
      comps: intervalCoverage(truth, subset.map((r) => lo(r.comps)), subset.map((r) => hi(r.comps))),
      baseline: intervalCoverage(truth, subset.map((r) => lo(r.baseline)), subset.map((r) => hi(r.baseline))),
    };
  };
  const peak = (r: Row): number => r.peak;
  const seasons = (r: Row): number => r.seasons;
  return {
    targets: rows.length,
    brier: { n: rows.length, comps: brierScore(forecast((r) => r.comps), reached), baseline: brierScore(forecast((r) => r.baseline), reached) },
    reachedShare: rows.length > 0 ? reached.filter(Boolean).length / rows.length : NaN,
    peakCoverage: coverage((f) => nan(peakSummaryOf(f).p10), (f) => nan(peakSummaryOf(f).p90), peak),
    peakSpearman: check((f) => nan(peakSummaryOf(f).p50), peak, spearmanCorrelation),
    seasonsCoverage: coverage((f) => nan(f.top_level_seasons.p10), (f) => nan(f.top_level_seasons.p90), seasons),
    seasonsSpearman: check((f) => nan(f.top_level_seasons.mean), seasons, spearmanCorrelation),
  };
}
