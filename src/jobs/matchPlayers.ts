import { QueryError } from '../errors/KindredError.ts';
import { compsOf, type CompsOptions } from '../query/findComps.ts';
import { describeComp } from '../query/describeComp.ts';
import { echoPool } from '../query/echoQuery.ts';
import { prepareQuery } from '../query/prepareQuery.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { scoreRow } from '../query/scoreRow.ts';
import { storedGroup } from '../query/storedGroup.ts';
import type { Target } from '../query/Target.ts';
import { valueAt } from '../query/valueAt.ts';
import { round } from '../stats/round.ts';
import { mostAlikeRow, type SeasonChoice } from './mostAlikeRow.ts';
import { poolPercentile } from './poolPercentile.ts';
import type { MatchResult } from './MatchResult.ts';

export interface MatchOptions {
  readonly comps: CompsOptions;
  /** Which season of the candidate (default: his season most alike the target's). */
  readonly candidate: SeasonChoice;
}

/**
 * One candidate against a target: his likeness to it (same distance and weights as comps), the full
 * per-dimension breakdown (describeComp), his rank and percentile in the pool (poolPercentile), and
 * the closest other pool player for reference (the first comp who is not the candidate), all in the
 * input space (the per-dimension breakdown is defined there; a store's learned space is not used).
 * The candidate is compared at the season asked, or at his season most alike the target in the
 * target's position group (mostAlikeRow), whether or not that season passes the pool filters.
 */
export function matchPlayers(store: ProfileStore, target: Target, candidate: number, options: MatchOptions): MatchResult {
  const g = storedGroup(store, target.group);
  const q = prepareQuery(store, target, options.comps);
  const row = mostAlikeRow(store, g, candidate, options.candidate, (r) => (r === target.row ? Infinity : scoreRow(q, r, null).d2));
  if (row === target.row) {
    throw new QueryError('kindred.query.badTarget', 'the candidate season is the target season itself: choose another season of the candidate', { player_id: store.players[candidate]?.playerId ?? '' });
  }
  const callerInclude = options.comps.filter.include;
  const others = { ...options.comps.filter, include: (r: number): boolean => g.player[r] !== candidate && (callerInclude === undefined || callerInclude(r)) };
  const reference = compsOf(prepareQuery(store, target, { ...options.comps, filter: others }), { ...options.comps, space: 'input', k: 1 });
  const pair = scoreRow(q, row, null);
  if (!Number.isFinite(pair.d2)) {
    const p = store.players[candidate];
    throw new QueryError('kindred.query.badTarget', `${p?.playerId ?? ''} ${p?.name ?? ''} in ${valueAt(g.season, row)} shares no weighted dimension with the target: nothing to compare`, {
      player_id: p?.playerId ?? '',
    });
  }
  const standing = poolPercentile(store, g, target.z, target.player, candidate, pair.d2, q.weights, options.comps.filter, options.comps.minCoverage, q.missing);
  return {
    query: reference.result.query,
    pool: echoPool(q),
    candidate: {
      ...describeComp(q, pair, standing.moreAlike + 1, { space: null, attributions: false }),
      percentile: Number.isNaN(standing.percentile) ? null : round(standing.percentile, 1),
      pool_players: standing.players,
      more_alike: standing.moreAlike,
      less_alike: standing.lessAlike,
      in_pool: q.mask[row] === 1,
    },
    closest: reference.result.comps[0] ?? null,
  };
}
