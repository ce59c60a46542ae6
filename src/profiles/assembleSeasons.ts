import type { FieldingSeason, PitchingSeason, Position, Roster } from '../ingest/Roster.ts';
import type { HitterLine } from './HitterLine.ts';
import { ageOnJune30 } from '../stats/ageOnJune30.ts';

/** Minimum samples for a season to get a profile (build parameters). */
export interface SampleMinimums {
  /** Plate appearances for a hitter profile. */
  readonly minPa: number;
  /** Batters faced for a pitcher profile. */
  readonly minBf: number;
}

export const DEFAULT_MINIMUMS: SampleMinimums = { minPa: 30, minBf: 30 };

export interface SeasonMeta {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
  readonly position: Position;
  /** Age on June 30 of the season; null without a birth date. */
  readonly age: number | null;
  /** Plate appearances (hitters) or batters faced (pitchers). */
  readonly sample: number;
  /** Outs recorded (innings pitched in thirds) for a pitcher season; null for a hitter season. */
  readonly outs: number | null;
  readonly teams: readonly string[];
}

export interface AssembledSeasons {
  readonly hitters: readonly { readonly meta: SeasonMeta; readonly line: HitterLine }[];
  readonly pitchers: readonly { readonly meta: SeasonMeta; readonly line: PitchingSeason }[];
  /** Seasons left without a profile, by reason; reported in the build summary, never silent. */
  readonly skipped: { readonly hittersBelowMinimum: number; readonly pitchersBelowMinimum: number; readonly pitchersBatting: number };
}

/** The lines a profile kind is made of: hitters (batting and fielding) or pitchers (pitching). */
export type ProfileKind = 'hitters' | 'pitchers';

export const PROFILE_KINDS: readonly ProfileKind[] = ['hitters', 'pitchers'];

const FIELD_ORDER = ['C', 'SS', '2B', 'CF', '3B', 'RF', 'LF', '1B'];

/**
 * Turns the roster's lines into one hitter line and/or one pitcher line per player, season and level
 * (only those of `kinds`: the other kind's lines are left empty and its skipped counts 0).
 * - A season's position is the fielding position with the most innings (ties: the more demanding
 *   position first, C, SS, 2B, CF, 3B, RF, LF, 1B); a hitter with no fielding row is DH.
 * - A pitcher is SP when at least half his games are starts, RP otherwise.
 * - A player with both lines at one level is profiled as a pitcher, and also as a hitter only when his
 *   plate appearances reach his batters faced (a true two-way season).
 */
export function assembleSeasons(roster: Roster, minimums: SampleMinimums = DEFAULT_MINIMUMS, kinds: readonly ProfileKind[] = PROFILE_KINDS): AssembledSeasons {
  const withHitters = kinds.includes('hitters');
  // each player's fielding rows and pitching lines in file order, found by his id (one shared string, its
  // hash computed once) and then by season and level among his few lines, instead of by a key string made per line
  const fieldingOf = new Map<string, FieldingSeason[]>();
  for (const f of withHitters ? roster.fielding : []) {
    const list = fieldingOf.get(f.playerId);
    if (list) list.push(f);
    else fieldingOf.set(f.playerId, [f]);
  }
  const pitchingOf = new Map<string, PitchingSeason[]>();
  for (const p of withHitters ? roster.pitching : []) {
    const list = pitchingOf.get(p.playerId);
    if (list) list.push(p);
    else pitchingOf.set(p.playerId, [p]);
  }

  const ageOf = (playerId: string, season: number): number | null => {
    const birth = roster.players.get(playerId)?.birthDate;
    return birth === undefined ? null : ageOnJune30(birth, season);
  };

  const hitters: { meta: SeasonMeta; line: HitterLine }[] = [];
  let hittersBelowMinimum = 0;
  let pitchersBatting = 0;
  for (const b of withHitters ? roster.batting : []) {
    if (b.PA < minimums.minPa) {
      hittersBelowMinimum++;
      continue;
    }
    const pitching = lastAt(pitchingOf.get(b.playerId), b.season, b.level);
    if (pitching && pitching.BF > b.PA) {
      pitchersBatting++;
      continue;
    }
    const primary = primaryPosition(fieldingOf.get(b.playerId), b.season, b.level);
    hitters.push({
      meta: {
        playerId: b.playerId,
        season: b.season,
        level: b.level,
        position: primary?.pos ?? 'DH',
        age: ageOf(b.playerId, b.season),
        sample: b.PA,
        outs: null,
        teams: b.teams,
      },
      line: { batting: b, fielding: primary },
    });
  }

  const pitchers: { meta: SeasonMeta; line: PitchingSeason }[] = [];
  let pitchersBelowMinimum = 0;
  for (const p of kinds.includes('pitchers') ? roster.pitching : []) {
    if (p.BF < minimums.minBf) {
      pitchersBelowMinimum++;
      continue;
    }
    pitchers.push({
      meta: {
        playerId: p.playerId,
        season: p.season,
        level: p.level,
        position: 2 * p.GS >= p.G ? 'SP' : 'RP',
        age: ageOf(p.playerId, p.season),
        sample: p.BF,
        outs: p.outs,
        teams: p.teams,
      },
      line: p,
    });
  }
  return { hitters, pitchers, skipped: { hittersBelowMinimum, pitchersBelowMinimum, pitchersBatting } };
}

/** The last of a player's lines at this season and level (a season's stints are combined: at most one). */
function lastAt(lines: readonly PitchingSeason[] | undefined, season: number, level: string): PitchingSeason | undefined {
  let found: PitchingSeason | undefined;
  for (const p of lines ?? []) if (p.season === season && p.level === level) found = p;
  return found;
}

/** Of a player's fielding rows, the primary position's at this season and level (see assembleSeasons). */
function primaryPosition(rows: readonly FieldingSeason[] | undefined, season: number, level: string): FieldingSeason | undefined {
  let best: FieldingSeason | undefined;
  for (const row of rows ?? []) {
    if (row.season !== season || row.level !== level) continue;
    if (
      best === undefined ||
      row.outs > best.outs ||
      (row.outs === best.outs && FIELD_ORDER.indexOf(row.pos) < FIELD_ORDER.indexOf(best.pos))
    ) {
      best = row;
    }
  }
  return best;
}
