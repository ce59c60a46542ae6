/**
 * `players.bin` in the store: the level names, every player (id, name, birth date, bats, throws) in
 * store order (rows refer to players by that index) and the contracts, as a columns file
 * (src/store/columnsFile.ts), so that opening a store reads it without parsing any JSON.
 * Written by encodePlayersFile, read by decodePlayersFile.
 *
 * Columns: `level` (strings); `player_id`, `name`, `birth_date` (strings, '' when unknown), `bats`
 * (u8: 0 unknown, then BATS order L R S), `throws` (u8: 0 unknown, then THROWS order L R);
 * `contract_player` (i32 store index), `contract_season` (i32), `contract_salary` (f64, USD);
 * every player's profile rows, so that a player's seasons are found without reading every group:
 * `rows_start` (i32, one more than the players: player i's rows are entries rows_start[i] to
 * rows_start[i + 1] - 1), `rows_group` (u8, index in POSITION_GROUPS), `rows_row` (i32, row in that group),
 * in POSITION_GROUPS order and row order; and the same for the profiles over windows of N >= 2 seasons
 * (`rows_w<N>_start`, `rows_w<N>_group`, `rows_w<N>_row`, rows of the groups `<G>.w<N>`), so that a
 * query over windows finds a player's windows without reading every group's windows either.
 */
import { BATS, THROWS } from '../ingest/playersColumns.ts';
import type { Bats, Roster, Throws } from '../ingest/Roster.ts';
import { POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import { decodeColumns, encodeColumns, type ColumnInput } from './columnsFile.ts';
import { corruptFile } from './parseStoreJson.ts';
import type { StoredPlayer } from './ProfileStore.ts';

/** What players.bin holds, decoded. */
export interface PlayersFile {
  readonly levels: readonly string[];
  readonly players: readonly StoredPlayer[];
  readonly contracts: { readonly player: Int32Array; readonly season: Int32Array; readonly salary: Float64Array };
  /** Each player's profile rows (see the columns above). */
  readonly rows: PlayerRows;
  /** Each player's rows over windows of N >= 2 seasons, by N. */
  readonly windowRows: ReadonlyMap<number, PlayerRows>;
}

/** Player i's profile rows are entries start[i] to start[i + 1] - 1: the group (index in POSITION_GROUPS) and the row in it. */
export interface PlayerRows {
  readonly start: Int32Array;
  readonly group: Uint8Array;
  readonly row: Int32Array;
}

/** The rows of a store's groups (single seasons, or windows of one size): per group, each row's player store index. */
type GroupRows = ReadonlyMap<PositionGroup, ArrayLike<number>>;

/** Player ids in store order, and each one's store index. */
export function playerIndexOf(roster: Roster): ReadonlyMap<string, number> {
  const index = new Map<string, number>();
  for (const p of roster.players.values()) index.set(p.playerId, index.size);
  return index;
}

/**
 * The players file of a roster whose players have the store indices of playerIndexOf, with the rows
 * of each group (each row's player store index, in row order), and of each group over windows by window size.
 */
export function encodePlayersFile(roster: Roster, groups: GroupRows, windows: ReadonlyMap<number, GroupRows> = new Map()): Uint8Array {
  const playerIndex = playerIndexOf(roster);
  const ids: string[] = [];
  const names: string[] = [];
  const births: string[] = [];
  const bats: number[] = [];
  const throws: number[] = [];
  for (const p of roster.players.values()) {
    ids.push(p.playerId);
    names.push(p.name);
    births.push(p.birthDate ?? '');
    bats.push(p.bats ? BATS.indexOf(p.bats) + 1 : 0);
    throws.push(p.throws ? THROWS.indexOf(p.throws) + 1 : 0);
  }
  const cPlayer: number[] = [];
  const cSeason: number[] = [];
  const cSalary: number[] = [];
  for (const c of roster.contracts) {
    const idx = playerIndex.get(c.playerId);
    if (idx === undefined) continue;
    cPlayer.push(idx);
    cSeason.push(c.season);
    cSalary.push(c.salaryUsd);
  }
  return encodeColumns([
    { name: 'level', type: 'strings', values: [...roster.levels] },
    { name: 'player_id', type: 'strings', values: ids },
    { name: 'name', type: 'strings', values: names },
    { name: 'birth_date', type: 'strings', values: births },
    { name: 'bats', type: 'u8', values: bats },
    { name: 'throws', type: 'u8', values: throws },
    { name: 'contract_player', type: 'i32', values: cPlayer },
    { name: 'contract_season', type: 'i32', values: cSeason },
    { name: 'contract_salary', type: 'f64', values: cSalary },
    ...rowColumns('rows', ids.length, groups),
    ...[...windows].sort(([a], [b]) => a - b).flatMap(([size, rows]) => rowColumns(`rows_w${size}`, ids.length, rows)),
  ]);
}

/** The three columns `<prefix>_start`, `<prefix>_group`, `<prefix>_row` of every player's rows in `groups`. */
function rowColumns(prefix: string, players: number, groups: GroupRows): ColumnInput[] {
  const counts = new Int32Array(players + 1);
  for (const group of POSITION_GROUPS) {
    const rows = groups.get(group);
    for (let r = 0; r < (rows?.length ?? 0); r++) {
      const p = rows?.[r] ?? -1;
      if (p >= 0 && p < players) counts[p + 1] = (counts[p + 1] ?? 0) + 1;
    }
  }
  const start = new Int32Array(players + 1);
  for (let i = 0; i < players; i++) start[i + 1] = (start[i] ?? 0) + (counts[i + 1] ?? 0);
  const total = start[players] ?? 0;
  const group = new Uint8Array(total);
  const row = new Int32Array(total);
  const next = start.slice(0, players);
  POSITION_GROUPS.forEach((name, gi) => {
    const rows = groups.get(name);
    for (let r = 0; r < (rows?.length ?? 0); r++) {
      const p = rows?.[r] ?? -1;
      if (!(p >= 0 && p < players)) continue;
      const at = next[p] ?? 0;
      next[p] = at + 1;
      group[at] = gi;
      row[at] = r;
    }
  });
  return [
    { name: `${prefix}_start`, type: 'i32', values: start },
    { name: `${prefix}_group`, type: 'u8', values: group },
    { name: `${prefix}_row`, type: 'i32', values: row },
  ];
}

/**
 * Decodes and checks players.bin (`where` names it in errors: StoreError `kindred.store.corrupt`),
 * with the rows over each of `windows` (the window sizes the manifest lists; each must be there).
 */
export function decodePlayersFile(bytes: Uint8Array, where: string, windows: readonly number[] = []): PlayersFile {
  const bad = (what: string): Error => corruptFile(where, what);
  const cols = decodeColumns(bytes, where);
  const levels = cols.strings('level');
  const ids = cols.strings('player_id');
  const n = ids.length;
  const names = cols.strings('name', n);
  const births = cols.strings('birth_date', n);
  const bats = cols.u8('bats', n);
  const throws = cols.u8('throws', n);
  const players = new Array<StoredPlayer>(n);
  for (let i = 0; i < n; i++) {
    const b = bats[i] ?? 0;
    const t = throws[i] ?? 0;
    const batsValue: Bats | null = b === 0 ? null : (BATS[b - 1] ?? null);
    const throwsValue: Throws | null = t === 0 ? null : (THROWS[t - 1] ?? null);
    if ((b !== 0 && batsValue === null) || (t !== 0 && throwsValue === null)) throw bad(`player ${i} has bats code ${b}, throws code ${t} (expected 0 to ${BATS.length} and 0 to ${THROWS.length})`);
    const birth = births[i] ?? '';
    players[i] = { playerId: ids[i] ?? '', name: names[i] ?? '', birthDate: birth === '' ? null : birth, bats: batsValue, throws: throwsValue };
  }
  const player = cols.i32('contract_player');
  const season = cols.i32('contract_season', player.length);
  const salary = cols.f64('contract_salary', player.length);
  for (let i = 0; i < player.length; i++) {
    const p = player[i] ?? -1;
    if (p < 0 || p >= n) throw bad(`contract ${i} names player ${p} (the store has ${n})`);
    if (!Number.isFinite(salary[i] ?? NaN)) throw bad(`contract ${i} has salary ${salary[i]} (expected a finite number)`);
  }
  const rowsOf = (prefix: string): PlayerRows => {
    const start = cols.i32(`${prefix}_start`, n + 1);
    const total = start[n] ?? 0;
    const group = cols.u8(`${prefix}_group`, total);
    const row = cols.i32(`${prefix}_row`, total);
    for (let i = 0; i < n; i++) {
      if ((start[i] ?? 0) > (start[i + 1] ?? 0) || (start[0] ?? 0) !== 0) throw bad(`${prefix}_start of player ${i} runs backwards`);
    }
    for (let i = 0; i < total; i++) {
      if ((group[i] ?? POSITION_GROUPS.length) >= POSITION_GROUPS.length || (row[i] ?? -1) < 0) throw bad(`${prefix} entry ${i} names group ${group[i]} row ${row[i]}`);
    }
    return { start, group, row };
  };
  const rows = rowsOf('rows');
  const windowRows = new Map(windows.map((size) => [size, rowsOf(`rows_w${size}`)] as const));
  return { levels, players, contracts: { player, season, salary }, rows, windowRows };
}
