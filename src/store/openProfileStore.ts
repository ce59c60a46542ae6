import { z } from 'zod';
import { StoreError } from '../errors/KindredError.ts';
import { Outcomes } from '../outlook/Outcomes.ts';
import { POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import { decodeOutcomesFile } from './outcomesFile.ts';
import { openStore, type OpenStore } from './openStore.ts';
import type { FileEntry, Manifest } from './manifest.ts';
import { decodePlayersFile, type PlayerRows } from './playersFile.ts';
import { corruptFile } from './parseStoreJson.ts';
import type { ProfileStore, StoredGroup, StoredPlayer, StoredRowRef } from './ProfileStore.ts';
import { once, readGroup } from './readGroup.ts';
import { groupFileNames, OUTCOMES_FILE, PLAYERS_FILE } from './storeFileNames.ts';

/** How much of a store is read at open. */
export interface OpenProfileOptions {
  /**
   * `lazy` (the default): the manifest and the players now, every position group (rows, matrices,
   * indexes) when it is first asked for, the outcomes on the first `outcomes()`.
   * `eager`: all of it now, so that any damaged file is refused by the open itself.
   */
  readonly load?: 'lazy' | 'eager';
  /**
   * A store opened before from the same folder (a server's reload): each group it has read already
   * is taken over instead of read again when the new manifest lists every file of that group, and
   * the players file and the build parameters, with the same size and sha256 as the old one (the
   * bytes the old store verified are then the bytes the new manifest names). Any other group is read
   * from the new files, verified when first read, as without `reuse`.
   */
  readonly reuse?: ProfileStore;
}

/**
 * Opens a store for queries. The manifest is checked and every listed file is opened with its size
 * checked (openStore with `verify: 'read'`); the players table is read now. Each file's sha256 is
 * verified when the file is first read, before it is parsed or handed to the native index reader, and
 * each is read once: all of a group's files (rows, matrices, indexes) when the group is first asked
 * for (`groups.get`, or iterating `groups`), the outcomes on the first `outcomes()`. A file
 * damaged after the open is refused by the call that first reads it, with the same StoreError
 * (`kindred.store.corrupt`) as at open. Reads go to the files as opened, so a rebuild swapping a new
 * store folder in meanwhile is never mixed in. With `load: 'eager'` every part is read at open.
 */
export async function openProfileStore(dir: string, options: OpenProfileOptions = {}): Promise<ProfileStore> {
  const store = await openStore(dir, { verify: 'read' });
  try {
    const profile = profileStoreOf(dir, store, options.reuse);
    if (options.load === 'eager') touchAll(profile);
    return profile;
  } catch (error) {
    store.close();
    throw error;
  }
}

function profileStoreOf(dir: string, store: OpenStore, reuse: ProfileStore | undefined): ProfileStore {
  const playersWhere = `${store.dir}/${PLAYERS_FILE}`;
  const windowSizes = storedWindows(store.manifest.params);
  const pf = decodePlayersFile(store.readBytesSync(PLAYERS_FILE), playersWhere, windowSizes);
  const players: readonly StoredPlayer[] = pf.players;
  const playerById = new Map<string, number>();
  players.forEach((p, i) => playerById.set(p.playerId, i));
  const salaries = once((): ReadonlyMap<number, ReadonlyMap<number, number>> => {
    const out = new Map<number, Map<number, number>>();
    const { player, season, salary } = pf.contracts;
    for (let i = 0; i < player.length; i++) {
      const idx = player[i] ?? -1;
      let m = out.get(idx);
      if (!m) out.set(idx, (m = new Map()));
      m.set(season[i] ?? 0, salary[i] ?? 0);
    }
    return out;
  });
  const refs = { players: players.length, levels: pf.levels.length };
  // taken now, so the new store holds the old one's groups but not the old store itself
  const carried = (from: ReadonlyMap<PositionGroup, StoredGroup> | undefined): ReadonlyMap<PositionGroup, StoredGroup> => {
    const out = new Map<PositionGroup, StoredGroup>();
    if (!reuse || !(from instanceof LazyGroups)) return out;
    for (const group of POSITION_GROUPS) {
      const g = from.loaded(group);
      if (g && sameGroupFiles(reuse.opened.manifest, store.manifest, group)) out.set(group, g);
    }
    return out;
  };
  const groups = new LazyGroups(
    POSITION_GROUPS.filter((g) => groupFileNames(g).json in store.manifest.files),
    (group) => checkPlayerRows(readWholeGroup(readGroup(store, group, refs)), group, pf.rows, playersWhere),
    carried(reuse?.groups),
  );
  const windows = new Map<number, ReadonlyMap<PositionGroup, StoredGroup>>();
  for (const size of windowSizes) {
    const rows = pf.windowRows.get(size);
    windows.set(size, new LazyGroups(
      POSITION_GROUPS.filter((g) => groupFileNames(g, size).json in store.manifest.files),
      (group) => {
        const g = readWholeGroup(readGroup(store, group, refs, size));
        return rows ? checkPlayerRows(g, group, rows, playersWhere, size) : g;
      },
      carried(reuse?.windows.get(size)),
    ));
  }
  const outcomes = once((): Outcomes => {
    if (!(OUTCOMES_FILE in store.manifest.files)) {
      throw new StoreError('kindred.store.missing', `store at ${store.dir} has no ${OUTCOMES_FILE} (built by an older kindred); rebuild it with kindred build`, {
        dir: store.dir,
        file: OUTCOMES_FILE,
      });
    }
    const where = `${store.dir}/${OUTCOMES_FILE}`;
    return new Outcomes(decodeOutcomesFile(store.readTextSync(OUTCOMES_FILE), where), playerById, where);
  });
  return {
    dir,
    opened: store,
    params: store.manifest.params,
    levels: pf.levels,
    players,
    playerById,
    rowsOf: (p: number): readonly StoredRowRef[] => rowRefs(pf.rows, p),
    rowsOfWindow(size: number, p: number): readonly StoredRowRef[] {
      const rows = pf.windowRows.get(size);
      return rows ? rowRefs(rows, p) : [];
    },
    get salaries() {
      return salaries();
    },
    groups,
    windows,
    outcomes,
  };
}

/** Player p's entries in a players-file row list, as row references (checked when their group is read: checkPlayerRows). */
function rowRefs(rows: PlayerRows, p: number): StoredRowRef[] {
  const out: StoredRowRef[] = [];
  for (let i = rows.start[p] ?? 0; i < (rows.start[p + 1] ?? 0); i++) {
    const name = POSITION_GROUPS[rows.group[i] ?? -1];
    if (name !== undefined) out.push({ group: name, row: rows.row[i] ?? -1 });
  }
  return out;
}

/**
 * Checks, when a group is read, that every entry the players file lists for it names a row of the
 * group that belongs to that player (so a player's rows are found from the players file alone,
 * without reading his groups first, and a players file that disagrees with a group is refused by the
 * read of that group). Returns the group.
 */
function checkPlayerRows(g: StoredGroup, group: PositionGroup, rows: PlayerRows, where: string, window = 1): StoredGroup {
  const gi = POSITION_GROUPS.indexOf(group);
  const players = rows.start.length - 1;
  const name = window === 1 ? group : `${group}.w${window}`;
  for (let p = 0; p < players; p++) {
    for (let i = rows.start[p] ?? 0; i < (rows.start[p + 1] ?? 0); i++) {
      if (rows.group[i] !== gi) continue;
      const r = rows.row[i] ?? -1;
      if (r >= g.n || g.player[r] !== p) throw corruptFile(where, `lists row ${r} of group ${name} for player ${p}, which the group does not hold`);
    }
  }
  return g;
}

/**
 * Whether a group read from the store of manifest `old` holds exactly what manifest `now` lists: the
 * same build parameters, the same players file and the same files named `group-<G>.*` (every window
 * and the learned space included, so the test errs towards reading again), each of the same size and sha256.
 */
function sameGroupFiles(old: Manifest, now: Manifest, group: PositionGroup): boolean {
  const same = (a: FileEntry | undefined, b: FileEntry | undefined): boolean => a !== undefined && b !== undefined && a.sha256 === b.sha256 && a.bytes === b.bytes;
  if (JSON.stringify(old.params) !== JSON.stringify(now.params)) return false;
  if (!same(old.files[PLAYERS_FILE], now.files[PLAYERS_FILE])) return false;
  const prefix = `group-${group}.`;
  const names = new Set([...Object.keys(old.files), ...Object.keys(now.files)].filter((name) => name.startsWith(prefix)));
  for (const name of names) if (!same(old.files[name], now.files[name])) return false;
  return names.size > 0;
}

/**
 * Reads the rest of a group now: its matrices and every index. A group is read whole when it is first
 * asked for, so any damaged file of it is refused then, whichever of its parts the query would use.
 */
function readWholeGroup(g: StoredGroup): StoredGroup {
  void g.raw;
  void g.z;
  void g.index;
  for (const p of g.partitions) void p.index;
  return g;
}

/** Reads every part of an opened store now (the eager open): every group and the outcomes. */
function touchAll(profile: ProfileStore): void {
  for (const g of profile.groups.values()) void g.n;
  for (const sized of profile.windows.values()) for (const g of sized.values()) void g.n;
  if (OUTCOMES_FILE in profile.opened.manifest.files) profile.outcomes();
}

/**
 * The position groups of a store, each read on first access (`get`, or iteration, which reads them
 * all in POSITION_GROUPS order). `has`, `size` and `keys` answer from the manifest without reading.
 */
class LazyGroups implements ReadonlyMap<PositionGroup, StoredGroup> {
  readonly #order: readonly PositionGroup[];
  readonly #read: (group: PositionGroup) => StoredGroup;
  readonly #loaded = new Map<PositionGroup, StoredGroup>();

  /** `carried`: groups read before with the same files (openProfileStore's `reuse`), taken instead of read. */
  constructor(order: readonly PositionGroup[], read: (group: PositionGroup) => StoredGroup, carried: ReadonlyMap<PositionGroup, StoredGroup> = new Map()) {
    this.#order = order;
    this.#read = read;
    for (const [group, g] of carried) if (order.includes(group)) this.#loaded.set(group, g);
  }

  /** The group when it has been read (or taken over) already, without reading it. */
  loaded(key: PositionGroup): StoredGroup | undefined {
    return this.#loaded.get(key);
  }

  get size(): number {
    return this.#order.length;
  }

  has(key: PositionGroup): boolean {
    return this.#order.includes(key);
  }

  get(key: PositionGroup): StoredGroup | undefined {
    const loaded = this.#loaded.get(key);
    if (loaded) return loaded;
    if (!this.has(key)) return undefined;
    const g = this.#read(key);
    this.#loaded.set(key, g);
    return g;
  }

  #at(key: PositionGroup): StoredGroup {
    const g = this.get(key);
    if (!g) throw new Error(`unreachable: group ${key} is listed but not read`);
    return g;
  }

  *entries(): MapIterator<[PositionGroup, StoredGroup]> {
    for (const key of this.#order) yield [key, this.#at(key)];
  }

  *keys(): MapIterator<PositionGroup> {
    yield* this.#order;
  }

  *values(): MapIterator<StoredGroup> {
    for (const key of this.#order) yield this.#at(key);
  }

  [Symbol.iterator](): MapIterator<[PositionGroup, StoredGroup]> {
    return this.entries();
  }

  forEach(callback: (value: StoredGroup, key: PositionGroup, map: ReadonlyMap<PositionGroup, StoredGroup>) => void): void {
    for (const [key, value] of this.entries()) callback(value, key, this);
  }
}

/** The window sizes (N >= 2) a manifest's `params.windows` lists. */
function storedWindows(params: Readonly<Record<string, unknown>>): number[] {
  const parsed = windowsParamSchema.safeParse(params['windows']);
  return parsed.success ? Object.keys(parsed.data).map(Number).filter((n) => n >= 2).sort((a, b) => a - b) : [];
}

/** `params.windows` of a manifest: per window size, the rows per group. */
const windowsParamSchema = z.record(z.string().regex(/^[1-9][0-9]*$/), z.record(z.string(), z.number()));
