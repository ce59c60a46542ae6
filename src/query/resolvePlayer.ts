import { QueryError } from '../errors/KindredError.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { editDistance } from './didYouMean.ts';

const fold = (s: string): string => s.normalize('NFD').replace(/\p{Diacritic}/gu, '').toLowerCase().trim();

/**
 * A player by id or by name: an exact id, else an exact name (accents and case ignored), else every
 * name containing the text. No match or several matches are a QueryError whose `candidates` (rows of
 * a short table: id, name, birth date) are the near names or the first matches; the CLI prints them one a line.
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
  if (hits.length === 0) {
    const near = nearNames(store, wanted, MAX_CANDIDATES);
    const hint = near.length > 0 ? '; did you mean one of these? (pass his id)' : '';
    throw new QueryError('kindred.query.unknownPlayer', `no player matches "${text}"${hint}`, {
      value: text,
      candidates: candidateRows(store, near),
    });
  }
  const shown = hits.slice(0, MAX_CANDIDATES);
  const more = hits.length > shown.length ? ` (${shown.length} shown)` : '';
  throw new QueryError('kindred.query.ambiguousPlayer', `"${text}" matches ${hits.length} players; pass a player id${more}`, {
    value: text,
    candidates: candidateRows(store, shown),
  });
}

/** Most candidates an unknown or ambiguous name lists. */
export const MAX_CANDIDATES = 12;

/**
 * Players whose name is near the text: a name word containing a word of the text (3 letters or more),
 * or within the edit distance didYouMean allows (a third of the word's length: "Varnsk" finds
 * "Varnosk"), closest first, then by name.
 */
function nearNames(store: ProfileStore, wanted: string, limit: number): number[] {
  const words = wanted.split(/\s+/).filter((w) => w.length >= 3);
  const scored: { i: number; d: number; name: string }[] = [];
  store.players.forEach((p, i) => {
    const nameWords = fold(p.name).split(/\s+/);
    let best = Infinity;
    for (const w of words) {
      const allowed = Math.max(1, Math.floor(w.length / 3));
      for (const n of nameWords) {
        const d = n.includes(w) ? 0 : editDistance(w, n);
        if (d <= allowed) best = Math.min(best, d);
      }
    }
    if (best < Infinity) scored.push({ i, d: best, name: p.name });
  });
  scored.sort((a, b) => a.d - b.d || a.name.localeCompare(b.name));
  return scored.slice(0, limit).map((x) => x.i);
}

/** The candidates as rows of a short table: id, name and birth date in aligned columns. */
function candidateRows(store: ProfileStore, players: readonly number[]): string[] {
  const rows = players.map((i) => store.players[i]).filter((p) => p !== undefined);
  const idWidth = Math.max(0, ...rows.map((p) => p.playerId.length));
  const nameWidth = Math.max(0, ...rows.map((p) => p.name.length));
  return rows.map((p) => `${p.playerId.padEnd(idWidth)}  ${p.birthDate ? `${p.name.padEnd(nameWidth)}  born ${p.birthDate}` : p.name}`);
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
