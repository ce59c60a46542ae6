/**
 * Finding a player as a user types him: by id, by full name whatever the case, accents or spaces, by a
 * unique part of the name; a name shared by several players or matching none is an error with its code.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rm } from 'node:fs/promises';
import { MAX_CANDIDATES, resolvePlayer } from '../../src/query/resolvePlayer.ts';
import { KindredError } from '../../src/errors/KindredError.ts';
import { simStore, type SimStore } from '../helpers/simStore.ts';

let s: SimStore;
beforeAll(async () => {
  s = await simStore(4000);
});
afterAll(async () => {
  await rm(s.dir, { recursive: true, force: true });
});

function errorOf(f: () => unknown): KindredError {
  try {
    f();
  } catch (e) {
    if (e instanceof KindredError) return e;
    throw e;
  }
  throw new Error('no error');
}

function codeOf(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    return e instanceof KindredError ? e.code : `not a KindredError: ${String(e)}`;
  }
  return 'no error';
}

/** Players whose name no one else has, nor contains. */
function uniquelyNamed(): { index: number; name: string; id: string }[] {
  const names = s.store.players.map((p) => p.name.toLowerCase());
  return s.store.players
    .map((p, index) => ({ index, name: p.name, id: p.playerId }))
    .filter((p) => names.filter((n) => n.includes(p.name.toLowerCase())).length === 1);
}

describe('resolvePlayer(store, text)', () => {
  it('finds a player by his id', () => {
    const p = s.store.players[7];
    if (!p) throw new Error('no player');
    expect(resolvePlayer(s.store, p.playerId)).toBe(7);
    expect(resolvePlayer(s.store, `  ${p.playerId} `)).toBe(7);
  });

  it('finds a player by his name in any case, with accents added or spaces around', () => {
    const [p] = uniquelyNamed();
    if (!p) throw new Error('no uniquely named player');
    expect(resolvePlayer(s.store, p.name.toUpperCase())).toBe(p.index);
    expect(resolvePlayer(s.store, ` ${p.name.toLowerCase()} `)).toBe(p.index);
    const accented = p.name.replace(/e/, 'é').replace(/a/, 'á');
    expect(resolvePlayer(s.store, accented)).toBe(p.index);
  });

  it('finds a player by a part of his name that no one else has', () => {
    const names = s.store.players.map((p) => p.name.toLowerCase());
    const hit = s.store.players.findIndex((p) => {
      const part = p.name.split(' ')[1] ?? '';
      return part.length >= 5 && names.filter((n) => n.includes(part.toLowerCase())).length === 1;
    });
    const p = s.store.players[hit];
    if (!p) throw new Error('no unique surname');
    expect(resolvePlayer(s.store, p.name.split(' ')[1] ?? '')).toBe(hit);
  });

  it('refuses a text several names contain, and one no name contains, each with its own code', () => {
    const vowels = ['a', 'e', 'i', 'o'];
    const common = vowels.find((v) => s.store.players.filter((p) => p.name.toLowerCase().includes(v)).length > 1) ?? 'a';
    expect(codeOf(() => resolvePlayer(s.store, common))).toBe('kindred.query.ambiguousPlayer');
    expect(codeOf(() => resolvePlayer(s.store, 'Qqxzv Wwjjk'))).toBe('kindred.query.unknownPlayer');
    expect(codeOf(() => resolvePlayer(s.store, '   '))).toBe('kindred.query.unknownPlayer');
  });

  it('offers the players one edit away from an unknown name (a surname with a letter dropped), as rows of id, name and birth date', () => {
    const p = s.store.players.find((x) => (x.name.split(' ')[1] ?? '').length >= 6);
    if (!p) throw new Error('no long surname');
    const surname = p.name.split(' ')[1] ?? '';
    const typo = surname.slice(0, 2) + surname.slice(3);
    const e = errorOf(() => resolvePlayer(s.store, typo));
    expect(e.code).toBe('kindred.query.unknownPlayer');
    expect(e.message).toContain('did you mean');
    const rows = e.context['candidates'];
    if (!Array.isArray(rows)) throw new Error('no candidates');
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.length).toBeLessThanOrEqual(MAX_CANDIDATES);
    // every candidate's surname is within one edit of the typo (Levenshtein 1966), and ours is among them
    expect(rows.some((r) => r.startsWith(`${p.playerId} `))).toBe(true);
  });

  it('lists an ambiguous name\'s first matches as aligned rows (id, name, birth date), at most MAX_CANDIDATES', () => {
    const e = errorOf(() => resolvePlayer(s.store, 'a'));
    expect(e.code).toBe('kindred.query.ambiguousPlayer');
    expect(e.message).toMatch(/matches \d+ players; pass a player id \(\d+ shown\)$/);
    const rows = e.context['candidates'];
    if (!Array.isArray(rows)) throw new Error('no candidates');
    expect(rows).toHaveLength(MAX_CANDIDATES);
    const nameStart = new Set(rows.map((r) => r.search(/ {2}\S/) + 2));
    expect(nameStart.size).toBe(1);
    for (const r of rows) expect(r).toMatch(/^p\d+ +\S.* {2}born \d{4}-\d{2}-\d{2}$/);
  });
});
