import { QueryError, UsageError } from '../errors/KindredError.ts';
import type { Position } from '../ingest/types.ts';
import { fromGrade } from '../stats/fromGrade.ts';
import type { StoredGroup, ProfileStore } from './ProfileStore.ts';
import type { Target } from './Target.ts';
import { groupOf } from '../profiles/positionGroup.ts';
import { didYouMean } from './didYouMean.ts';

export interface WantOptions {
  readonly position: Position;
  /** Season and level whose league the natural units are read against (default: the latest, highest). */
  readonly season?: number;
  readonly level?: string;
}

/**
 * A hand-built target from `name=value,...`: a value in the dimension's natural units (`obp=.360`,
 * `pop_2b_s=1.90`) or a grade on the 20 to 80 scale with a trailing g (`obp=60g`). Natural units are
 * turned into z-scores against the given season and level (by default the latest season at the highest
 * level that has the dimension). Only the given dimensions count in the distance.
 */
export function parseWant(store: ProfileStore, text: string, options: WantOptions): Target {
  const group = groupOf(options.position);
  const g = store.groups.get(group);
  if (!g) throw new QueryError('kindred.query.emptyPool', `the store has no ${group} profiles`, { group });
  const z = new Float64Array(g.d).fill(NaN);
  const raw = new Float64Array(g.d).fill(NaN);
  const parts = text.split(',').map((s) => s.trim()).filter((s) => s.length > 0);
  if (parts.length === 0) throw new UsageError('--want needs at least one name=value, e.g. --want "obp=.360,k_pct=.18"');
  for (const part of parts) {
    const m = /^([a-z0-9_]+)\s*=\s*(-?(?:\d+\.?\d*|\.\d+))(g?)$/i.exec(part);
    if (!m) throw new UsageError(`--want: "${part}" is not name=value (expected e.g. obp=.360 or obp=60g)`, { value: part });
    const name = (m[1] as string).toLowerCase();
    const j = g.dims.findIndex((d) => d.name === name);
    if (j < 0) {
      const names = g.dims.map((d) => d.name);
      const guess = didYouMean(name, names);
      throw new UsageError(
        `--want: ${group} profiles have no dimension "${name}"${guess ? ` (did you mean ${guess}?)` : ''}; known: ${names.join(', ')}`,
        { value: name },
      );
    }
    const dim = g.dims[j];
    if (!dim) continue;
    const value = Number(m[2]);
    const stats = referenceStratum(store, g, dim.name, dim.scope === 'group' ? group : options.position, options);
    if (m[3]) {
      if (value < 20 || value > 80) throw new UsageError(`--want: grade ${value} for ${name} is off the 20 to 80 scale`, { value: part });
      z[j] = fromGrade(value, dim.direction);
      raw[j] = stats.mean + (z[j] as number) * stats.sd;
    } else {
      raw[j] = value;
      z[j] = stats.sd > 0 ? (value - stats.mean) / stats.sd : 0;
    }
  }
  return {
    kind: 'want',
    group,
    position: options.position,
    player: -1,
    row: -1,
    season: null,
    level: null,
    age: null,
    z,
    raw,
  };
}

function referenceStratum(
  store: ProfileStore,
  g: StoredGroup,
  dim: string,
  scope: string,
  options: WantOptions,
): { mean: number; sd: number } {
  const strata = g.strata.get(dim);
  let best: { season: number; level: number; mean: number; sd: number } | undefined;
  for (const [key, s] of strata ?? []) {
    const [seasonText, level, sc] = key.split('|');
    if (sc !== scope || level === undefined || !(s.sd >= 0)) continue;
    const season = Number(seasonText);
    if (options.season !== undefined && season !== options.season) continue;
    if (options.level !== undefined && level !== options.level) continue;
    const li = store.levels.indexOf(level);
    if (!best || season > best.season || (season === best.season && li > best.level)) best = { season, level: li, mean: s.mean, sd: s.sd };
  }
  if (!best) {
    throw new QueryError(
      'kindred.query.badTarget',
      `no league figures for ${dim} (${scope}${options.season !== undefined ? `, ${options.season}` : ''}${options.level ? `, ${options.level}` : ''}) to read --want values against`,
      { value: dim },
    );
  }
  return best;
}
