import { QueryError } from '../errors/KindredError.ts';
import { eligibleRows } from '../query/eligibleRows.ts';
import { explainComp } from '../query/explainComp.ts';
import { effectiveWeights, findCompsWithRows, type CompsOptions } from '../query/findComps.ts';
import { likeness } from '../query/likeness.ts';
import { missingAwareDistance, targetWeight } from '../query/missingAwareDistance.ts';
import type { ProfileStore } from '../query/ProfileStore.ts';
import type { Target } from '../query/Target.ts';
import { closestSeasonRow, type SeasonChoice } from './closestSeasonRow.ts';
import { poolPercentile } from './poolPercentile.ts';
import type { MatchResult } from './types.ts';

export interface MatchOptions {
  readonly comps: CompsOptions;
  /** Which season of the candidate (default: his season closest to the target's). */
  readonly candidate: SeasonChoice;
}

const round = (x: number, digits: number): number => Number(x.toFixed(digits));

/**
 * One candidate against a target: his likeness to it (same distance and weights as comps), the full
 * per-dimension breakdown (explainComp), his rank and percentile in the pool (poolPercentile), and
 * the closest pool player for reference, all in the input space (the per-dimension breakdown is
 * defined there; a store's learned space is not used). The candidate is compared at one season in the
 * target's position group (closestSeasonRow), whether or not that season passes the pool filters.
 */
export function matchPlayers(store: ProfileStore, target: Target, candidate: number, options: MatchOptions): MatchResult {
  const g = store.groups.get(target.group);
  if (!g) throw new QueryError('kindred.query.emptyPool', `the store has no ${target.group} profiles`, { group: target.group });
  const row = closestSeasonRow(store, g, candidate, target.season, options.candidate);
  if (row === target.row) {
    throw new QueryError('kindred.query.badTarget', 'the candidate season is the target season itself: choose another with --season-b', { player_id: store.players[candidate]?.playerId ?? '' });
  }
  const reference = findCompsWithRows(store, target, { ...options.comps, space: 'input', k: 1 });
  const weights = effectiveWeights(g, options.comps);
  const wT = targetWeight(target.z, weights);
  const pair = missingAwareDistance(target.z, g.z, row * g.d, weights, wT);
  if (!Number.isFinite(pair.d2)) {
    const p = store.players[candidate];
    throw new QueryError('kindred.query.badTarget', `${p?.playerId ?? ''} ${p?.name ?? ''} in ${g.season[row]} shares no weighted dimension with the target: nothing to compare`, {
      player_id: p?.playerId ?? '',
    });
  }
  const standing = poolPercentile(store, g, target.z, target.player, candidate, pair.d2, weights, options.comps.filter, options.comps.minCoverage);
  const ex = explainComp(g.dims, weights, target.z, target.raw, g.z, g.raw, row * g.d);
  const inPool = eligibleRows(store, g, options.comps.filter, new Set(target.player >= 0 ? [target.player] : [])).mask[row] === 1;
  const player = store.players[candidate];
  const age = g.age[row] as number;
  const distance = Math.sqrt(pair.d2);
  return {
    query: reference.result.query,
    pool: reference.result.pool,
    candidate: {
      rank: standing.moreAlike + 1,
      player_id: player?.playerId ?? '',
      name: player?.name ?? '',
      season: g.season[row] as number,
      level: store.levels[g.level[row] as number] ?? '',
      position: g.position[row] ?? 'DH',
      age: Number.isNaN(age) ? null : age,
      likeness: round(likeness(distance, wT), 1),
      distance: round(distance, 4),
      coverage: round(pair.coverage, 3),
      dimensions: ex.dimensions,
      alike: ex.alike,
      apart: ex.apart,
      percentile: Number.isNaN(standing.percentile) ? null : round(standing.percentile, 1),
      pool_players: standing.players,
      more_alike: standing.moreAlike,
      less_alike: standing.lessAlike,
      in_pool: inPool,
    },
    closest: reference.result.comps[0] ?? null,
  };
}
