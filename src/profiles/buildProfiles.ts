import type { Roster } from '../ingest/Roster.ts';
import type { Dimension, DimensionInfo, LeagueContext } from './Dimension.ts';
import { describeDimension } from './Dimension.ts';
import { assembleSeasons, DEFAULT_MINIMUMS, PROFILE_KINDS, type AssembledSeasons, type ProfileKind, type SampleMinimums, type SeasonMeta } from './assembleSeasons.ts';
import { measureDimensions, type MeasuredColumn } from './measureDimensions.ts';
import { DEFAULT_SHRINKAGE, type ShrinkageOptions, type ShrinkageUsed } from './shrinkage.ts';
import { standardiseByStratum, DEFAULT_STANDARDISE, type StandardiseOptions, type StratumStats } from './standardiseByStratum.ts';
import { defaultWeights } from './defaultWeights.ts';
import { groupOf, POSITION_GROUPS, type PositionGroup } from './positionGroup.ts';
import { HITTER_DIMENSIONS } from './hitterDimensions.ts';
import { PITCHER_DIMENSIONS } from './pitcherDimensions.ts';
import { leagueFip } from '../stats/leagueFip.ts';
import type { PitchingSeason } from '../ingest/Roster.ts';
import { windowKey, windowRoster, type WindowRoster } from './windowRoster.ts';
import { JoinedKeys } from './JoinedKeys.ts';

/** The profiles of one position group, row-major n x d. */
export interface GroupProfiles {
  readonly group: PositionGroup;
  readonly dims: readonly DimensionInfo[];
  readonly meta: readonly SeasonMeta[];
  /** Observed values in natural units (NaN = missing). */
  readonly raw: Float32Array;
  /** Standardised regressed values (NaN = missing). */
  readonly z: Float32Array;
  /** Per dimension, stratum key `${season}|${level}|${group or position}` to its stats. */
  readonly strata: ReadonlyMap<string, ReadonlyMap<string, StratumStats>>;
  /** Season-to-season reliability per dimension (see reliability). */
  readonly reliability: Float64Array;
  /**
   * Default weight per dimension: its family's share (DEFAULT_FAMILY_SHARES) divided within the family
   * by reliability and redundancy (see familyWeights, redundancyWeights); sums to 1.
   */
  readonly redundancy: Float64Array;
  /** Per dimension, league stratum key (`${season}|${level}`, plus `|${position}` for fielding) to the k used. */
  readonly shrinkage: ReadonlyMap<string, ReadonlyMap<string, ShrinkageUsed>>;
  /** Present on profiles over several seasons (buildWindowProfiles): the window and each row's first season. */
  readonly window?: WindowSpans;
}

/** The seasons a group's window rows span: row r holds seasons first[r] to its season (meta[r].season). */
export interface WindowSpans {
  /** Seasons per window (at least 2). */
  readonly size: number;
  readonly first: Int32Array;
}

export interface ProfileOptions {
  readonly minimums: SampleMinimums;
  readonly standardise: StandardiseOptions;
  /** Fitted or fixed regression constants (default DEFAULT_SHRINKAGE). */
  readonly shrinkage?: ShrinkageOptions;
  /** Recency weight per season back inside a window (windowRoster; default 1: every season by its events). */
  readonly windowDecay?: number;
  /** The window profiles' default weights: their own (default, DEFAULT_WINDOW_WEIGHTS) or the single seasons'. */
  readonly windowWeights?: 'single' | 'window';
  /** The window profiles' regression constants (default DEFAULT_WINDOW_SHRINKAGE: fitted). */
  readonly windowShrinkage?: ShrinkageOptions;
}

/**
 * Window profiles weigh their dimensions by their own reliability, measured between a player's windows
 * that share no season (reliability with `apart` = the window size), and the redundancy among window
 * rows: a dimension's noise shrinks at its own pace as seasons are added (a rate of rare events gains
 * more than a timed measurement), which the single seasons' weights do not see. And their rates are
 * regressed with k fitted to the roster's window lines (empirical Bayes, shrinkageFor), the table as the
 * fallback: k of the table is a per-season figure, while a window's spread of true talent differs.
 * Together, on the four bench leagues (bench/qualityVariants.bench.ts, windows of 5): hitters 1.312 ->
 * 1.300, better in every league, the bat's gap the same on the mean (1.72); SP 1.497 -> 1.490, RP
 * 1.665 -> 1.650; either alone was not better everywhere (docs/jobs.md). Single seasons keep the table.
 */
export const DEFAULT_WINDOW_WEIGHTS = 'window';
export const DEFAULT_WINDOW_SHRINKAGE: ShrinkageOptions = { ...DEFAULT_SHRINKAGE, fit: true };

export const DEFAULT_PROFILE_OPTIONS: ProfileOptions = {
  minimums: DEFAULT_MINIMUMS,
  standardise: DEFAULT_STANDARDISE,
  shrinkage: DEFAULT_SHRINKAGE,
};

export interface ProfileSet {
  readonly groups: ReadonlyMap<PositionGroup, GroupProfiles>;
  readonly skipped: AssembledSeasons['skipped'];
}

export function dimensionsOf(group: PositionGroup): readonly DimensionInfo[] {
  return dimensionDefs(group).map(describeDimension);
}

function dimensionDefs(group: PositionGroup): readonly Dimension<never>[] {
  const all: readonly Dimension<never>[] = group === 'SP' || group === 'RP' ? PITCHER_DIMENSIONS : HITTER_DIMENSIONS;
  return all.filter((d) => d.groups.includes(group));
}

/**
 * From a checked roster to standardised profiles per position group:
 * assemble seasons, measure and regress each dimension against its league (season and level),
 * standardise within season, level and group (or position), and weigh redundancy.
 */
export function buildProfiles(roster: Roster, options: ProfileOptions = DEFAULT_PROFILE_OPTIONS): ProfileSet {
  return profileRoster(roster, options, new Map(), PROFILE_KINDS);
}

/**
 * buildProfiles for the groups of some kinds only (hitters: C, IF, OF, DH; pitchers: SP, RP), each the same
 * as buildProfiles makes it: hitters and pitchers are measured against leagues of their own kind, so the
 * build can profile the pitchers, hand their groups on, then profile the hitters.
 */
export function buildKindProfiles(roster: Roster, options: ProfileOptions, kinds: readonly ProfileKind[]): ProfileSet {
  return profileRoster(roster, options, new Map(), kinds);
}

/** Default weights taken as given for some groups instead of computed from their profiles. */
type GivenWeights = ReadonlyMap<PositionGroup, Pick<GroupProfiles, 'reliability' | 'redundancy'>>;

/** buildProfiles of `kinds`, with the default weights of the groups in `given` taken from there (not computed). */
function profileRoster(roster: Roster, options: ProfileOptions, given: GivenWeights, kinds: readonly ProfileKind[], apart = 1): ProfileSet {
  const seasons = assembleSeasons(roster, options.minimums, kinds);
  // the strata's keys, one string each (not one per line)
  const keys = new JoinedKeys();
  const groups = new Map<PositionGroup, GroupProfiles>();

  const hitterLines = seasons.hitters.map((h) => h.line);
  const hitterMeta = seasons.hitters.map((h) => h.meta);
  const noLeague: LeagueContext = { fipConstant: NaN };
  const hitterCols = measureDimensions(HITTER_DIMENSIONS, {
    lines: hitterLines,
    leagueKey: (i, scope) => leagueKey(keys, hitterMeta[i] as SeasonMeta, scope),
    league: () => noLeague,
    eraOf: (i, scope) => eraOf(hitterMeta[i] as SeasonMeta, scope),
    shrinkage: options.shrinkage ?? DEFAULT_SHRINKAGE,
  });

  const pitcherLines = seasons.pitchers.map((p) => p.line);
  const pitcherMeta = seasons.pitchers.map((p) => p.meta);
  const constants = kinds.includes('pitchers') ? fipConstants(roster) : new Map<string, number>();
  const pitcherCols = measureDimensions(PITCHER_DIMENSIONS, {
    lines: pitcherLines,
    leagueKey: (i, scope) => leagueKey(keys, pitcherMeta[i] as SeasonMeta, scope),
    league: (i) => {
      const m = pitcherMeta[i] as SeasonMeta;
      return { fipConstant: constants.get(keys.of(m.season, m.level)) ?? NaN };
    },
    eraOf: (i, scope) => eraOf(pitcherMeta[i] as SeasonMeta, scope),
    shrinkage: options.shrinkage ?? DEFAULT_SHRINKAGE,
  });

  for (const group of POSITION_GROUPS) {
    const pitcher = group === 'SP' || group === 'RP';
    if (!kinds.includes(pitcher ? 'pitchers' : 'hitters')) continue;
    const meta = pitcher ? pitcherMeta : hitterMeta;
    const cols = pitcher ? pitcherCols : hitterCols;
    const rows: number[] = [];
    for (let i = 0; i < meta.length; i++) if (groupOf((meta[i] as SeasonMeta).position) === group) rows.push(i);
    if (rows.length === 0) continue;
    groups.set(group, assembleGroup(group, rows, meta, cols, options.standardise, given.get(group), apart, keys));
  }
  return { groups, skipped: seasons.skipped };
}

/**
 * Profiles over windows of `window` seasons (windowRoster: each line combined with the same player's
 * lines at its level in the seasons before it), built by the same steps as buildProfiles: the rates
 * recomputed and regressed on the combined counts, standardised among the windows ending at the same
 * season and level; the rates regressed with options.windowShrinkage (default fitted k) and the default
 * weights the windows' own, with reliability between windows that share no season (overlapping windows
 * share their seasons' noise, so their season-to-season correlation would overstate it), or with
 * windowWeights 'single' those of the single seasons (`single`); see DEFAULT_WINDOW_WEIGHTS.
 * `window` 1 is buildProfiles itself.
 */
export function buildWindowProfiles(
  roster: Roster,
  options: ProfileOptions,
  window: number,
  single: { readonly groups: ReadonlyMap<PositionGroup, Pick<GroupProfiles, 'reliability' | 'redundancy'>> },
): ProfileSet {
  if (window === 1) return buildProfiles(roster, options);
  return profileWindowRoster(windowRoster(roster, window, options.windowDecay), options, single);
}

/**
 * buildWindowProfiles on a roster already combined into windows (windowRoster), so that a caller can let
 * the roster of single seasons go before the window profiles are built (the build does, for its last window);
 * with `kinds`, only the groups of those kinds (as buildKindProfiles).
 */
export function profileWindowRoster(
  wr: WindowRoster,
  options: ProfileOptions,
  single: { readonly groups: ReadonlyMap<PositionGroup, Pick<GroupProfiles, 'reliability' | 'redundancy'>> },
  kinds: readonly ProfileKind[] = PROFILE_KINDS,
): ProfileSet {
  const window = wr.window;
  if (window === 1) return profileRoster(wr.roster, options, new Map(), kinds);
  const own = (options.windowWeights ?? DEFAULT_WINDOW_WEIGHTS) === 'window';
  const windowOptions: ProfileOptions = { ...options, shrinkage: options.windowShrinkage ?? DEFAULT_WINDOW_SHRINKAGE };
  // with the single seasons' weights taken as they are, the windows' own are not computed
  const built = own ? profileRoster(wr.roster, windowOptions, new Map(), kinds, window) : profileRoster(wr.roster, windowOptions, single.groups, kinds);
  const groups = new Map<PositionGroup, GroupProfiles>();
  for (const [group, g] of built.groups) {
    const first = Int32Array.from(g.meta, (m) => wr.firstSeason.get(windowKey(m.playerId, m.season, m.level)) ?? m.season);
    groups.set(group, { ...g, window: { size: window, first } });
  }
  return { groups, skipped: built.skipped };
}

function leagueKey(keys: JoinedKeys, m: SeasonMeta, scope: 'group' | 'position'): string {
  return scope === 'group' ? keys.of(m.season, m.level) : keys.of3(m.season, m.level, m.position);
}

/** The era a line's k is fitted over: its level (and position for fielding), around its season. */
function eraOf(m: SeasonMeta, scope: 'group' | 'position'): { key: string; season: number } {
  return { key: scope === 'group' ? m.level : `${m.level}|${m.position}`, season: m.season };
}

function assembleGroup(
  group: PositionGroup,
  rows: readonly number[],
  allMeta: readonly SeasonMeta[],
  cols: ReadonlyMap<string, MeasuredColumn>,
  standardise: StandardiseOptions,
  given: Pick<GroupProfiles, 'reliability' | 'redundancy'> | undefined,
  apart: number,
  keys: JoinedKeys,
): GroupProfiles {
  const dims = dimensionsOf(group);
  const n = rows.length;
  const d = dims.length;
  const meta = rows.map((i) => allMeta[i] as SeasonMeta);
  const raw = new Float32Array(n * d);
  const z = new Float32Array(n * d);
  // the weights' input, only when they are computed here
  const z64 = given ? null : new Float64Array(n * d);
  const strata = new Map<string, ReadonlyMap<string, StratumStats>>();
  const shrinkage = new Map<string, ReadonlyMap<string, ShrinkageUsed>>();
  const seen = new Set<string>();
  for (const m of meta) seen.add(keys.of(m.season, m.level)).add(keys.of3(m.season, m.level, m.position));
  // each row's standardisation base per scope (level and group, or level and position), made once
  const basesByScope = new Map<Dimension<never>['scope'], readonly string[]>();
  const basesOf = (scope: Dimension<never>['scope']): readonly string[] => {
    let bases = basesByScope.get(scope);
    if (!bases) basesByScope.set(scope, (bases = meta.map((m) => (scope === 'group' ? keys.of(m.level, group) : keys.of(m.level, m.position)))));
    return bases;
  };
  dims.forEach((dim, j) => {
    const col = cols.get(dim.name);
    if (!col) throw new Error(`internal: dimension ${dim.name} was not measured`);
    shrinkage.set(dim.name, new Map([...col.shrinkage].filter(([key]) => seen.has(key))));
    const values = new Float64Array(n);
    for (let r = 0; r < n; r++) {
      const src = rows[r] as number;
      values[r] = col.regressed[src] as number;
      raw[r * d + j] = col.raw[src] as number;
    }
    const bases = basesOf(dim.scope);
    const st = standardiseByStratum(values, (r) => (meta[r] as SeasonMeta).season, (r) => bases[r] as string, standardise);
    for (let r = 0; r < n; r++) {
      const v = st.z[r] as number;
      z[r * d + j] = v;
      if (z64) z64[r * d + j] = v;
    }
    strata.set(dim.name, st.strata);
  });
  const ids = new Map<string, number>();
  const playerNumber = (id: string): number => ids.get(id) ?? ids.set(id, ids.size).size - 1;
  const w = z64 ? defaultWeights(z64, n, d, meta.map((m) => playerNumber(m.playerId)), meta.map((m) => m.season), dims.map((dim) => dim.family), apart) : given;
  if (!w) throw new Error(`internal: no default weights for ${group}`);
  return { group, dims, meta, raw, z, strata, reliability: w.reliability, redundancy: w.redundancy, shrinkage };
}

/** FIP constant of every season and level, from that league's lines (src/stats/leagueFip.ts). */
function fipConstants(roster: Roster): Map<string, number> {
  const leagues = new Map<string, PitchingSeason[]>();
  for (const p of roster.pitching) {
    const key = `${p.season}|${p.level}`;
    const lines = leagues.get(key);
    if (lines) lines.push(p);
    else leagues.set(key, [p]);
  }
  const out = new Map<string, number>();
  for (const [key, lines] of leagues) out.set(key, leagueFip(lines).constant);
  return out;
}
