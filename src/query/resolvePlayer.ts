import { QueryError } from '../errors/KindredError.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';

const fold = (s: string): string => s.normalize('NFD').replace(/\p{Diacritic}/gu, '').toLowerCase().trim();

/**
 * A player by id or by name: an exact id, else an exact name (accents and case ignored), else every
 * name containing the text. No match or several matches are a QueryError that lists candidates.
 * @returns the player's index in the store
 */
export function resolvePlayer(store: ProfileStore, text: string): number {
  const byId = store.playerById.get(text.trim());
  if (byId !== undefined) return byId;
  const wanted = fold(text);
  if (wanted.length === 0) throw new QueryError('kindred.query.unknownPlayer', 'no player given: pass a player id or a name');
  const exact: number[] = [];
  const partial: number[] = [];
  store.players.forEach((p, i) => {
    const name = fold(p.name);
    if (name === wanted) exact.push(i);
    else if (name.includes(wanted)) partial.push(i);
  });
  const hits = exact.length > 0 ? exact : partial;
  const only = hits[0];
  if (hits.length === 1 && only !== undefined) return only;
  const describe = (i: number): string => {
    const p = store.players[i];
    return p ? `${p.playerId} ${p.name}${p.birthDate ? ` (born ${p.birthDate})` : ''}` : String(i);
  };
  if (hits.length === 0) {
    const words = wanted.split(/\s+/).filter((w) => w.length >= 3);
    const near: number[] = [];
    store.players.forEach((p, i) => {
      if (near.length < 8 && words.some((w) => fold(p.name).includes(w))) near.push(i);
    });
    const hint = near.length > 0 ? `; players with part of that name: ${near.map(describe).join('; ')}` : '';
    throw new QueryError('kindred.query.unknownPlayer', `no player matches "${text}"${hint}`, {
      value: text,
      candidates: near.map(describe),
    });
  }
  const shown = hits.slice(0, 12).map(describe);
  throw new QueryError(
    'kindred.query.ambiguousPlayer',
    `"${text}" matches ${hits.length} players; pass a player id: ${shown.join('; ')}${hits.length > 12 ? '; ...' : ''}`,
    { value: text, candidates: shown },
  );
}

/** Up to `limit` players whose name contains the text (for suggestions as you type). */
export function searchPlayers(store: ProfileStore, text: string, limit = 10): number[] {
  const wanted = fold(text);
  if (wanted.length === 0) return [];
  const starts: number[] = [];
  const contains: number[] = [];
  store.players.forEach((p, i) => {
    const name = fold(p.name);
    if (p.playerId === text.trim() || name.startsWith(wanted) || name.split(/\s+/).some((w) => w.startsWith(wanted))) starts.push(i);
    else if (name.includes(wanted)) contains.push(i);
  });
  return [...starts, ...contains].slice(0, limit);
}
