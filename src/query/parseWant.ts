import { QueryError } from '../errors/KindredError.ts';
import type { Position } from '../ingest/Roster.ts';
import { fromGrade } from '../stats/fromGrade.ts';
import type { StoredGroup, ProfileStore } from '../store/ProfileStore.ts';
import type { Target } from './Target.ts';
import { groupOf } from '../profiles/positionGroup.ts';
import { dimensionSuggestions, findDimension, suggestionHint } from './findDimension.ts';
import { ParameterError } from '../errors/ParameterError.ts';
import { measuredRange } from '../ingest/fileColumns.ts';

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
  if (parts.length === 0) throw new ParameterError('want', 'needs at least one name=value, e.g. "obp=.360,k_pct=.18"');
  for (const part of parts) {
    const m = /^([^=]+?)\s*=\s*(-?(?:\d+\.?\d*|\.\d+))(g?)$/i.exec(part);
    if (!m) throw new ParameterError('want', `"${part}" is not name=value (expected e.g. obp=.360 or obp=60g)`, { context: { value: part } });
    const typed = (m[1] as string).trim();
    const j = findDimension(g.dims, typed);
    const dim = g.dims[j];
    if (!dim) {
      const names = g.dims.map((d) => d.name);
      throw new ParameterError('want', `${group} profiles have no dimension "${typed}"${suggestionHint(dimensionSuggestions(g.dims, typed))}; known: ${names.join(', ')}`, {
        context: { value: typed },
      });
    }
    if (!Number.isNaN(raw[j] as number)) throw new ParameterError('want', `${dim.name} is given more than once in "${text}"; give each dimension once`, { context: { value: dim.name } });
    const value = Number(m[2]);
    if (!Number.isFinite(value)) throw new ParameterError('want', `"${part}": the number is too large to read`, { context: { value: part } });
    const stats = referenceStratum(store, g, dim.name, dim.scope === 'group' ? group : options.position, options);
    if (m[3]) {
      if (value < 20 || value > 80) throw new ParameterError('want', `grade ${value} for ${dim.name} is off the 20 to 80 scale`, { context: { value: part } });
      z[j] = fromGrade(value, dim.direction);
      raw[j] = stats.mean + (z[j] as number) * stats.sd;
    } else {
      const range = plausibleWant(g, j, dim.name, stats);
      if (value < range.min || value > range.max) {
        const show = (x: number): string => x.toFixed(dim.digits).replace(/^0\./, '.').replace(/^-0\./, '-.');
        throw new ParameterError('want', `${dim.name}=${m[2] as string} is not a plausible value: expected ${show(range.min)} to ${show(range.max)} ${dim.unit} (${range.why}), or a grade such as ${dim.name}=60g`, {
          context: { value: part },
        });
      }
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

/** Standard deviations from the reference league mean beyond which a --want value is taken for a typing error (project choice: the 20 to 80 scale spans 3). */
export const WANT_MAX_SD = 5;

/**
 * The values a hand-built target may take for a dimension: the measured column's plausible range when
 * the dimension is one (the roster's column tables, the same bounds the roster is checked against),
 * else the reference league mean plus or minus WANT_MAX_SD standard deviations, not below 0 when the
 * store holds no negative value of it.
 */
function plausibleWant(g: StoredGroup, j: number, name: string, stats: { mean: number; sd: number }): { min: number; max: number; why: string } {
  const r = measuredRange(name);
  if (r !== undefined) {
    return { min: r.min, max: r.max, why: 'the plausible range of the measurement' };
  }
  if (!(stats.sd > 0)) return { min: -Infinity, max: Infinity, why: '' };
  let negative = false;
  for (let i = 0; i < g.n && !negative; i++) negative = (g.raw[i * g.d + j] as number) < 0;
  const low = stats.mean - WANT_MAX_SD * stats.sd;
  return { min: negative ? low : Math.max(0, low), max: stats.mean + WANT_MAX_SD * stats.sd, why: `within ${WANT_MAX_SD} standard deviations of the league mean` };
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
      `no league figures for ${dim} (${scope}${options.season !== undefined ? `, ${options.season}` : ''}${options.level ? `, ${options.level}` : ''}) to read hand-built values against`,
      { value: dim },
    );
  }
  return best;
}
