import type { PoolFilter } from './PoolFilter.ts';
import { familyTotals } from '../profiles/familyWeights.ts';
import type { PreparedQuery } from './prepareQuery.ts';
import { round } from '../stats/round.ts';
import { valueAt } from './valueAt.ts';
import type { PoolEcho, QueryEcho } from './CompsResult.ts';
import { describePool } from './describePool.ts';

/** The query as the JSON echoes it: the target, its profile in natural units, k, method and space. */
export function echoQuery(q: PreparedQuery, k: number, method: QueryEcho['method'], space: QueryEcho['space']): QueryEcho {
  const { store, group: g, target: t } = q;
  const profile: Record<string, number> = {};
  g.dims.forEach((d, j) => {
    const v = t.raw[j] ?? NaN;
    if (!Number.isNaN(v) && !Number.isNaN(t.z[j] ?? NaN)) profile[d.name] = Number(v.toFixed(d.digits + 1));
  });
  const player = t.player >= 0 ? store.players[t.player] : undefined;
  return {
    kind: t.kind,
    player_id: player?.playerId ?? null,
    name: player?.name ?? null,
    season: t.season,
    ...(g.window ? { window: g.window.size } : {}),
    ...(g.window && t.row >= 0 ? { seasons: [valueAt(g.window.first, t.row), valueAt(g.season, t.row)] as const } : {}),
    level: t.level,
    position: t.position,
    group: t.group,
    age: t.age,
    profile,
    k,
    method,
    space,
  };
}

/** The pool as the JSON echoes it: group size, rows left after the filters, the filters, the weights and the family shares. */
export function echoPool(q: PreparedQuery): PoolEcho {
  return {
    group_size: q.group.n,
    eligible: q.eligible,
    filters: filterEcho(q.filter),
    weights: Object.fromEntries(q.group.dims.map((d, j) => [d.name, round(q.weights[j] ?? NaN, 4)])),
    preset: q.preset,
    family_shares: Object.fromEntries([...familyTotals(q.group.dims.map((d) => d.family), q.weights)].map(([f, s]) => [f, round(s, 3)])),
    sample_floor: q.sampleFloor,
    summary: describePool(q.filter, q.sampleFloor, q.group.group),
  };
}

function filterEcho(f: PoolFilter): Record<string, string | number | readonly string[]> {
  const out: Record<string, string | number | readonly string[]> = {};
  if (f.levels) out.levels = f.levels;
  if (f.seasonFrom !== undefined) out.season_from = f.seasonFrom;
  if (f.seasonTo !== undefined) out.season_to = f.seasonTo;
  if (f.ageMin !== undefined) out.age_min = f.ageMin;
  if (f.ageMax !== undefined) out.age_max = f.ageMax;
  if (f.bats) out.bats = f.bats;
  if (f.throws) out.throws = f.throws;
  if (f.positions) out.positions = f.positions;
  if (f.minSample !== undefined) out.min_sample = f.minSample;
  return out;
}
