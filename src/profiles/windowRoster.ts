import type { ColumnTable, RecordOf } from '../ingest/ColumnSpec.ts';
import { BATTING_COLUMNS } from '../ingest/battingColumns.ts';
import { combineStints } from '../ingest/combineStints.ts';
import { FIELDING_COLUMNS } from '../ingest/fieldingColumns.ts';
import { PITCHING_COLUMNS } from '../ingest/pitchingColumns.ts';
import type { Roster } from '../ingest/Roster.ts';

/** The roster of window-N lines and, per line, the first season its window holds. */
export interface WindowRoster {
  readonly window: number;
  /** The roster with every batting, fielding and pitching line replaced by its window's line. */
  readonly roster: Roster;
  /** First season a window line holds, by `windowKey(playerId, season, level)` of its last season. */
  readonly firstSeason: ReadonlyMap<string, number>;
}

/** Key of a window line: the player, the window's last season and its level. */
export const windowKey = (playerId: string, season: number, level: string): string => `${playerId}\u0000${season}\u0000${level}`;

/**
 * A player's profile over his last `window` seasons (project choice): for each of his lines at season s
 * and level L, his lines at the same level L in seasons s - window + 1 to s (calendar seasons, so a
 * season he missed still counts in the N; never a season after s) are combined as the stints of one
 * season are (combineStints over the file's column table): counts and innings summed, timed
 * measurements averaged weighted by their events (exit velocity by batted-ball events, pop time by
 * stolen-base attempts, fastball velocity by batters faced, ...). The window line keeps the key of its
 * last season, so its age is taken at that season and it is compared with the league of that season and
 * level; the rates are recomputed and regressed on the combined counts by the profiles as for any line.
 * Fielding lines combine per position. Recency weights: a season a seasons before the window's last
 * counts decay^a of its events (counts and measurement weights; combineStints' scale); the default 1
 * counts every season by its events (bench/qualityVariants.bench.ts measures others). `window` 1 returns
 * the roster unchanged.
 *
 * @example
 * // batting of p1 at Top: 2025 PA 300, H 80, BB 30; 2026 PA 200, H 50, BB 10
 * // windowRoster(roster, 2): p1 2026 Top PA 500, H 130, BB 40, first season 2025; p1 2025 Top unchanged
 */
export function windowRoster(roster: Roster, window: number, decay = 1): WindowRoster {
  if (!Number.isInteger(window) || window < 1) throw new RangeError(`window must be a whole number of seasons of at least 1 (got ${window})`);
  const firstSeason = new Map<string, number>();
  if (window === 1) {
    for (const list of [roster.batting, roster.pitching, roster.fielding]) {
      for (const l of list) firstSeason.set(windowKey(l.playerId, l.season, l.level), l.season);
    }
    return { window, roster, firstSeason };
  }
  const note = (playerId: string, season: number, level: string, first: number): void => {
    const key = windowKey(playerId, season, level);
    firstSeason.set(key, Math.min(firstSeason.get(key) ?? first, first));
  };
  const batting = combineWindows(BATTING_COLUMNS, roster.batting, window, decay, (l) => `${l.playerId}\u0000${l.level}`, note);
  const pitching = combineWindows(PITCHING_COLUMNS, roster.pitching, window, decay, (l) => `${l.playerId}\u0000${l.level}`, note);
  const fielding = combineWindows(FIELDING_COLUMNS, roster.fielding, window, decay, (l) => `${l.playerId}\u0000${l.level}\u0000${l.pos}`, () => {});
  return { window, roster: { ...roster, batting, pitching, fielding }, firstSeason };
}

interface SeasonLine {
  readonly playerId: string;
  readonly season: number;
  readonly level: string;
}

/**
 * Every line replaced by the combination of the lines of its series (same `seriesOf`) in the window
 * ending at its season: the last season first, so the combined line keeps its key.
 */
function combineWindows<T extends ColumnTable>(
  table: T,
  lines: readonly RecordOf<T>[],
  window: number,
  decay: number,
  seriesOf: (l: RecordOf<T> & SeasonLine) => string,
  note: (playerId: string, season: number, level: string, first: number) => void,
): RecordOf<T>[] {
  const typed = lines.filter(isSeasonLine);
  const series = new Map<string, (RecordOf<T> & SeasonLine)[]>();
  /** Each line's series (its index in `typed`), so that its key is made once. */
  const seriesAt = new Array<(RecordOf<T> & SeasonLine)[]>(typed.length);
  typed.forEach((l, i) => {
    const key = seriesOf(l);
    let list = series.get(key);
    if (!list) series.set(key, (list = []));
    list.push(l);
    seriesAt[i] = list;
  });
  for (const list of series.values()) list.sort((a, b) => b.season - a.season);
  return typed.map((l, i) => {
    const held: (RecordOf<T> & SeasonLine)[] = [];
    const scale: number[] = [];
    let first = l.season;
    for (const o of seriesAt[i] ?? [l]) {
      if (o.season > l.season || o.season <= l.season - window) continue;
      held.push(o);
      scale.push(decay ** (l.season - o.season));
      if (o.season < first) first = o.season;
    }
    note(l.playerId, l.season, l.level, first);
    return held.length === 1 ? l : combineStints(table, held, decay === 1 ? undefined : scale);
  });
}

function isSeasonLine<R>(l: R): l is R & SeasonLine {
  if (typeof l !== 'object' || l === null) return false;
  return 'playerId' in l && typeof l.playerId === 'string' && 'season' in l && typeof l.season === 'number' && 'level' in l && typeof l.level === 'string';
}
