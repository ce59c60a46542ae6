import { z } from 'zod';
import { matchCommand } from '../../cli/commands/matchCommand.ts';
import { targetFrom } from '../../cli/commands/compsCommand.ts';
import { compsOptionsFrom, parseQueryOptions } from '../../cli/commands/queryOptions.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { matchPlayers } from '../../outlook/matchPlayers.ts';
import type { MatchResult } from '../../outlook/types.ts';
import type { ProfileStore } from '../../query/ProfileStore.ts';
import { resolvePlayer } from '../../query/resolvePlayer.ts';
import { captureIo } from '../captureIo.ts';
import { commandParameters, parseParameters } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';
import { NOT_OVER_HTTP } from './compsEndpoint.ts';

/**
 * The parameters of /api/match: the options of `kindred match` and its two players, `player` (the
 * target, player-a; left out with want) and `candidate` (player-b).
 */
export const MATCH_PARAMETERS = commandParameters(matchCommand(captureIo().io, () => {}), NOT_OVER_HTTP, ['player', 'candidate']);

const matchSchema = z.object({ want: z.string().optional(), seasonB: z.number().int().optional(), levelB: z.string().optional() });

/**
 * `GET /api/match?player=A&candidate=B...`: what `kindred match A B ... --format json` prints (with
 * want: `kindred match --want ... B`): likeness, percentile in the pool and every dimension.
 */
export function answerMatch(store: ProfileStore, query: URLSearchParams): MatchResult {
  const { options, extra } = parseParameters(query, MATCH_PARAMETERS);
  const o = parseQueryOptions({ ...options, store: store.dir, format: 'json' });
  const p = matchSchema.safeParse(options);
  if (!p.success) throw new UsageError(`parameter ${p.error.issues[0]?.path.join('.') ?? '?'}: ${p.error.issues[0]?.message ?? 'invalid'}`);
  const { want, seasonB, levelB } = p.data;
  const comps = compsOptionsFrom(o, store);
  if (want !== undefined && extra.has('player')) throw new UsageError('give either a player or --want, not both');
  const target = targetFrom(store, want !== undefined ? undefined : extra.get('player'), { ...o, want });
  if (levelB !== undefined && !store.levels.includes(levelB)) {
    throw new UsageError(`--level-b: unknown level "${levelB}"; the store's levels: ${store.levels.join(', ')}`, { value: levelB });
  }
  const b = extra.get('candidate');
  if (b === undefined) throw new UsageError('name the candidate: parameter candidate (player-b)', {}, 'kindred.usage.missingArgument');
  return matchPlayers(store, target, resolvePlayer(store, b), {
    comps,
    candidate: { ...(seasonB !== undefined ? { season: seasonB } : {}), ...(levelB !== undefined ? { level: levelB } : {}) },
  });
}

export const matchEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: ({ holder, query }) => answerMatch(holder.current.store, query),
};
