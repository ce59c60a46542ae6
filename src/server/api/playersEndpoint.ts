import { UsageError } from '../../errors/KindredError.ts';
import type { Bats, Position, Throws } from '../../ingest/types.ts';
import type { PositionGroup } from '../../profiles/positionGroup.ts';
import { searchPlayers } from '../../query/resolvePlayer.ts';
import * as parse from '../../cli/parseOptions.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import { parseParameters, type ParameterSet } from '../commandParameters.ts';
import type { Endpoint } from '../Endpoint.ts';

/** Most suggestions one request may ask for. */
export const MAX_PLAYERS_LIMIT = 50;

export interface PlayerSeason {
  readonly season: number;
  readonly level: string;
  readonly position: Position;
  readonly group: PositionGroup;
}

export interface PlayerHit {
  readonly player_id: string;
  readonly name: string;
  readonly birth_date: string | null;
  readonly bats: Bats | null;
  readonly throws: Throws | null;
  /** His profiled player-seasons, latest first. */
  readonly seasons: readonly PlayerSeason[];
}

const PLAYERS_PARAMETERS: ParameterSet = {
  specs: new Map([
    ['q', { name: 'q', attribute: 'q', flag: false, parse: undefined, defaultValue: undefined }],
    ['limit', { name: 'limit', attribute: 'limit', flag: false, parse: parse.positiveInt, defaultValue: 10 }],
  ]),
  extra: [],
};

/** `GET /api/players?q=part-of-a-name[&limit=N]`: players whose name (or id) matches, with their profiled seasons. */
export function answerPlayers(loaded: LoadedStore, query: URLSearchParams): { players: PlayerHit[] } {
  const { options } = parseParameters(query, PLAYERS_PARAMETERS);
  const q = options.q;
  if (typeof q !== 'string') throw new UsageError('parameter q is required: part of a player name or an id', { parameter: 'q' });
  const limit = typeof options.limit === 'number' ? options.limit : 10;
  if (limit > MAX_PLAYERS_LIMIT) throw new UsageError(`parameter limit: at most ${MAX_PLAYERS_LIMIT}, got ${limit}`, { parameter: 'limit' });
  const store = loaded.store;
  const players = searchPlayers(store, q, limit).map((i): PlayerHit => {
    const p = store.players[i];
    const seasons = loaded.rowsOf(i).map(({ group, row }): PlayerSeason => {
      const g = store.groups.get(group);
      return {
        season: g?.season[row] ?? 0,
        level: store.levels[g?.level[row] ?? -1] ?? '',
        position: g?.position[row] ?? 'DH',
        group,
      };
    });
    seasons.sort((a, b) => b.season - a.season || store.levels.indexOf(b.level) - store.levels.indexOf(a.level));
    return {
      player_id: p?.playerId ?? '',
      name: p?.name ?? '',
      birth_date: p?.birthDate ?? null,
      bats: p?.bats ?? null,
      throws: p?.throws ?? null,
      seasons,
    };
  });
  return { players };
}

export const playersEndpoint: Endpoint = {
  methods: ['GET'],
  cacheable: false,
  answer: ({ holder, query }) => answerPlayers(holder.current, query),
};
