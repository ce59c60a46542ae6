/**
 * `players.json` in the store: the level names, every player (id, name, birth date, bats, throws) in
 * store order (rows refer to players by that index) and the contracts. Written by encodePlayersFile,
 * read by decodePlayersFile.
 */
import { z } from 'zod';
import type { Roster } from '../ingest/Roster.ts';
import { parseStoreJson } from './parseStoreJson.ts';

export const playersFileSchema = z.strictObject({
  levels: z.array(z.string()),
  players: z.array(
    z.strictObject({
      player_id: z.string(),
      name: z.string(),
      birth_date: z.string().nullable(),
      bats: z.enum(['L', 'R', 'S']).nullable(),
      throws: z.enum(['L', 'R']).nullable(),
    }),
  ),
  /** [player index, season, salary in USD] */
  contracts: z.array(z.tuple([z.number().int(), z.number().int(), z.number()])),
});

export type PlayersFile = z.infer<typeof playersFileSchema>;

/** The players file of a roster, and each player's store index by id (in roster order). */
export function encodePlayersFile(roster: Roster): { readonly text: string; readonly playerIndex: ReadonlyMap<string, number> } {
  const playerIndex = new Map<string, number>();
  const players: PlayersFile['players'] = [];
  for (const p of roster.players.values()) {
    playerIndex.set(p.playerId, players.length);
    players.push({ player_id: p.playerId, name: p.name, birth_date: p.birthDate ?? null, bats: p.bats ?? null, throws: p.throws ?? null });
  }
  const contracts: PlayersFile['contracts'] = [];
  for (const c of roster.contracts) {
    const idx = playerIndex.get(c.playerId);
    if (idx !== undefined) contracts.push([idx, c.season, c.salaryUsd]);
  }
  const file: PlayersFile = { levels: [...roster.levels], players, contracts };
  return { text: JSON.stringify(file), playerIndex };
}

/** Parses and checks players.json (`where` names it in errors: StoreError `kindred.store.corrupt`). */
export function decodePlayersFile(text: string, where: string): PlayersFile {
  return parseStoreJson(text, playersFileSchema, where);
}
