import { ParameterError } from '../../errors/ParameterError.ts';
import { searchPlayers } from '../../query/resolvePlayer.ts';
import type { PlayerHit, PlayerSeason } from '../../request/apiContract.ts';
import { readRequest } from '../../request/readRequest.ts';
import type { LoadedStore } from '../LoadedStore.ts';
import type { StoreEndpoint } from '../Endpoint.ts';

export type { PlayerHit, PlayerSeason } from '../../request/apiContract.ts';

/** `GET /api/players?q=part-of-a-name[&limit=N]`: players whose name (or id) matches, with their profiled seasons. */
export function answerPlayers(loaded: LoadedStore, query: URLSearchParams): { players: PlayerHit[] } {
  const req = readRequest('players', 'http', query);
  const q = req.get('q');
  if (q === undefined) throw new ParameterError('q', 'is required: part of a player name or an id');
  const limit = req.need('limit');
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

export const playersEndpoint: StoreEndpoint = {
  methods: ['GET'],
  cacheable: true,
  answer: answerPlayers,
};
