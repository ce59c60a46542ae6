import { mkdtemp, rm } from 'node:fs/promises';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { readRoster, type ColumnMap } from '../ingest/readRoster.ts';
import type { Roster } from '../ingest/Roster.ts';
import { windowRoster, type WindowRoster } from '../profiles/windowRoster.ts';
import { writeRejects } from '../ingest/writeRejects.ts';
import { buildKindProfiles, profileWindowRoster, DEFAULT_PROFILE_OPTIONS, type GroupProfiles, type ProfileOptions, type ProfileSet } from '../profiles/buildProfiles.ts';
import type { GroupFile } from '../store/groupFile.ts';
import { encodeGroupFiles, type GroupIndexes } from '../store/encodeGroupFiles.ts';
import { encodePlayersFile, playerIndexOf } from '../store/playersFile.ts';
import { encodeOutcomesFile } from '../store/outcomesFile.ts';
import { chartsFolderOf, groupEmbeddingFileNames, groupFileNames, OUTCOMES_FILE, PLAYERS_FILE } from '../store/storeFileNames.ts';
import { sha256Hex } from '../store/sha256Hex.ts';
import { IndexBuildPool } from './IndexBuildPool.ts';
import type { IndexParams } from '../ann/IndexParams.ts';
import { StoreWriter } from '../store/writeStore.ts';
import { checkStoreTarget, cleanLeftovers, lockStore } from '../store/storeTarget.ts';
import { partitionByCoverage, type CoveragePartition } from '../ann/partitionByCoverage.ts';
import { NARROW_INDEX_MIN, narrowRows, scansWider, type NarrowIndexMin } from '../ann/narrowRows.ts';
import { partitionVector } from '../ann/partitionVector.ts';
import { POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileKind } from '../profiles/assembleSeasons.ts';
import { resolveEmbedSettings, type EmbedSettingsInput } from './EmbedSettings.ts';
import { embedProfiles, MIN_EMBED_ROWS, settingsRecord, type EmbeddedGroup } from './embedProfiles.ts';
import { stageCharts } from './stageCharts.ts';
import { collectGarbage } from './collectGarbage.ts';
import { computeOutcomes } from '../outlook/computeOutcomes.ts';
import { DEFAULT_WINDOW } from '../query/defaultWindow.ts';

/** The windows (in seasons) a build makes profiles over when none are asked for: single seasons and the comps' default window. */
export const DEFAULT_BUILD_WINDOWS: readonly number[] = [1, DEFAULT_WINDOW];

/**
 * HNSW parameters of a build. efConstruction 40 (was 100): at 200,000 player-seasons the build took 24 s
 * of CPU instead of 40 and recall@10 against `--exact` stayed 1.000 in every coverage class (bench core;
 * efConstruction 24 gave the same recall for little more time saved); see the README bench figures for 1,000,000.
 */
export const DEFAULT_INDEX_PARAMS: IndexParams = { M: 16, efConstruction: 40, ef: 128, seed: 100 };

export interface BuildOptions {
  readonly lenient: boolean;
  readonly columnMap?: ColumnMap;
  /** Where --lenient writes the skipped rows (default: beside the store, `<store>.rejects.csv`). */
  readonly rejectsPath?: string;
  readonly profile?: ProfileOptions;
  readonly index?: IndexParams;
  /** The learned embedding to rank comps in (default none: the weighted input space). */
  readonly embed?: EmbedSettingsInput;
  /**
   * The windows to build profiles over, in seasons (default DEFAULT_BUILD_WINDOWS: 1 and 3). Each N >= 2 adds every
   * group's profiles over windows of N seasons (buildWindowProfiles), in the input space, as group
   * `<G>.w<N>`; queries reach them with `--window N`. 1 is always built.
   */
  readonly windows?: readonly number[];
  /**
   * Worker threads that build the HNSW indexes (default: the machine's cores); 1 builds them in this
   * thread. The store is byte for byte the same either way.
   */
  readonly threads?: number;
  /** When a coverage partition gets a narrow index (default NARROW_INDEX_MIN; tests lower it for small leagues). */
  readonly narrowMin?: NarrowIndexMin;
  readonly onProgress?: (stage: string, done: number, total: number) => void;
}

export interface BuildSummary {
  readonly storeDir: string;
  readonly rowsRead: Readonly<Record<string, number>>;
  readonly rejected: number;
  readonly rejectsPath: string | null;
  /** Position groups the roster's files leave empty, in words (Roster.notices). */
  readonly notices: readonly string[];
  readonly profiles: Readonly<Partial<Record<PositionGroup, number>>>;
  /** Profiles over windows of N >= 2 seasons, per N and group (absent when only single seasons were built). */
  readonly windows?: Readonly<Record<string, Readonly<Partial<Record<PositionGroup, number>>>>>;
  readonly skipped: ProfileSet['skipped'];
  readonly seconds: number;
  /** The ranking space, and per embedded group its code size and fitting time (absent for the input space). */
  readonly embedding?: {
    readonly space: 'pca' | 'autoencoder';
    readonly groups: Readonly<Partial<Record<PositionGroup, { readonly dim: number; readonly seconds: number }>>>;
    readonly chartsDir: string;
  };
}

/**
 * Reads a roster folder, builds the profiles and HNSW indexes per position group (one per coverage
 * pattern in the input space, one on the codes of a learned space), and writes the
 * store (temporary folder, then renamed into place). On bad input in strict mode nothing is written and
 * an existing store is left as it was. Before any work the target is checked (checkStoreTarget: parent
 * folder, no symbolic link, only a Kindred store is replaced), the store's build lock is taken
 * (`<store>.lock`, one build at a time) and what killed builds left beside it is removed.
 */
export async function buildStore(rosterDir: string, storeDir: string, options: BuildOptions): Promise<BuildSummary> {
  await checkStoreTarget(storeDir);
  const lock = await lockStore(storeDir);
  try {
    await cleanLeftovers(storeDir);
    return await buildLocked(rosterDir, storeDir, options);
  } finally {
    await lock.release();
  }
}

/** What the build keeps of the roster once every group is handed to `writeGroups` (the roster itself is then let go). */
interface ReadRoster {
  readonly skipped: ProfileSet['skipped'];
  /** How many window sizes (N >= 2) were built. */
  readonly windows: number;
  readonly rowsRead: BuildSummary['rowsRead'];
  readonly rejected: number;
  readonly rejectsPath: string | null;
  readonly notices: BuildSummary['notices'];
}

/** Writes a set of groups (single seasons, window 1, or windows of `size` seasons), deleting each from `groups` once written. */
type WriteGroups = (groups: Map<PositionGroup, GroupProfiles>, size: number, playerIndex: ReadonlyMap<string, number>, levels: readonly string[]) => Promise<void>;

/**
 * Reads the roster, writes its rejects, builds the single-season profiles and hands them to
 * `writeGroups` (which starts their index builds in the worker threads), the pitchers' groups before the
 * hitters are profiled, writes the outcomes file,
 * then builds the profiles over each window while those indexes build, and hands them over too; last
 * the players file. The roster's season lines (the build's largest object) are let go once the last
 * window's lines are combined, and only the summary leaves the function.
 */
async function readAndProfile(rosterDir: string, storeDir: string, options: BuildOptions, progress: ProgressFn, writer: StoreWriter, writeGroups: WriteGroups): Promise<ReadRoster> {
  let roster: Roster | null = await readRoster(rosterDir, {
    lenient: options.lenient,
    ...(options.columnMap ? { columnMap: options.columnMap } : {}),
    onProgress: (file, rows) => progress(`reading ${file}`, rows, 0),
  });
  let rejectsPath: string | null = null;
  if (roster.rejected.length > 0) {
    rejectsPath = options.rejectsPath ?? `${storeDir.replace(/\/+$/, '')}.rejects.csv`;
    await writeRejects(rejectsPath, roster.rejected);
  }
  const summary: Omit<ReadRoster, 'skipped' | 'windows'> = { rowsRead: roster.rowsRead, rejected: roster.rejected.length, rejectsPath, notices: roster.notices };
  const playerIndex = playerIndexOf(roster);
  const levels = [...roster.levels];
  progress('profiles', 0, 1);
  const profileOptions = options.profile ?? DEFAULT_PROFILE_OPTIONS;
  /**
   * Profiles the pitchers and writes their groups (their indexes start building in the workers), then
   * the hitters (measured against leagues of their own kind, so each kind is what one pass over both
   * makes); `release` is called once the last kind is profiled. Keeps each group's rows and weights.
   */
  const profileAndWrite = async (profile: (kind: ProfileKind) => ProfileSet, size: number, release: () => void): Promise<ProfiledKinds> => {
    const rows = new Map<PositionGroup, Int32Array>();
    const weights = new Map<PositionGroup, { reliability: Float64Array; redundancy: Float64Array }>();
    let skipped: ProfileSet['skipped'] = { hittersBelowMinimum: 0, pitchersBelowMinimum: 0, pitchersBatting: 0 };
    for (const kind of ['pitchers', 'hitters'] as const) {
      const set = profileSet(profile(kind), playerIndex);
      if (kind === 'hitters') release();
      for (const [group, g] of set.groups) weights.set(group, { reliability: g.reliability, redundancy: g.redundancy });
      for (const [group, r] of set.rows) rows.set(group, r);
      skipped = {
        hittersBelowMinimum: skipped.hittersBelowMinimum + set.skipped.hittersBelowMinimum,
        pitchersBelowMinimum: skipped.pitchersBelowMinimum + set.skipped.pitchersBelowMinimum,
        pitchersBatting: skipped.pitchersBatting + set.skipped.pitchersBatting,
      };
      await writeGroups(set.groups, size, playerIndex, levels);
    }
    const ordered = new Map<PositionGroup, Int32Array>();
    for (const group of POSITION_GROUPS) {
      const r = rows.get(group);
      if (r) ordered.set(group, r);
    }
    return { rows: ordered, weights, skipped };
  };
  const single = await profileAndWrite((kind) => {
    if (!roster) throw new Error('internal: the roster was let go before the single seasons');
    return buildKindProfiles(roster, profileOptions, [kind]);
  }, 1, () => {});
  // the single seasons' default weights, for windows built with windowWeights 'single' (by default they weigh their own): only those are kept of the single profiles
  const weights = { groups: single.weights };
  // The outcomes are the last use of the roster's season lines, and the players file needs none of them
  // (players, contracts and levels only): both are taken now, so that the lines can go before the last window's profiles.
  await writer.add(OUTCOMES_FILE, encodeOutcomesFile(computeOutcomes(roster)));
  const people: Roster = { ...roster, batting: [], fielding: [], pitching: [] };
  const windowSizes = [...new Set(options.windows ?? DEFAULT_BUILD_WINDOWS)].filter((n) => n !== 1).sort((a, b) => a - b);
  const windowRows = new Map<number, ReadonlyMap<PositionGroup, Int32Array>>();
  for (const size of windowSizes) {
    progress(`profiles over ${size} seasons`, 0, 1);
    if (!roster) throw new Error('internal: the roster was let go before its last window');
    let combined: WindowRoster | null = windowRoster(roster, size, profileOptions.windowDecay);
    if (size === windowSizes[windowSizes.length - 1]) {
      // after the last window's lines are combined, nothing needs the single seasons' lines: they are
      // collected now, before the window profiles allocate (V8 would keep them until the heap grows)
      roster = null;
      collectGarbage();
    }
    const profiled = await profileAndWrite((kind) => {
      if (!combined) throw new Error('internal: the window lines were let go before their profiles');
      return profileWindowRoster(combined, profileOptions, weights, [kind]);
    }, size, () => {
      combined = null; // the window lines are garbage once profiled, before the last groups are written
    });
    windowRows.set(size, profiled.rows);
  }
  await writer.add(PLAYERS_FILE, encodePlayersFile(people, single.rows, windowRows));
  return { ...summary, skipped: single.skipped, windows: windowSizes.length };
}

/** What profileAndWrite keeps of a set of groups once they are written. */
interface ProfiledKinds {
  /** Each group's rows as player store indices, in POSITION_GROUPS order. */
  readonly rows: ReadonlyMap<PositionGroup, Int32Array>;
  readonly weights: ReadonlyMap<PositionGroup, { readonly reliability: Float64Array; readonly redundancy: Float64Array }>;
  readonly skipped: ProfileSet['skipped'];
}

/**
 * A profile set's groups in a map of their own (writeGroups deletes each once written, so that it can be
 * collected: nothing else may hold the set), and each group's rows as player store indices (for the players file).
 */
function profileSet(set: ProfileSet, playerIndex: ReadonlyMap<string, number>): { groups: Map<PositionGroup, GroupProfiles>; rows: Map<PositionGroup, Int32Array>; skipped: ProfileSet['skipped'] } {
  const rows = new Map([...set.groups].map(([group, g]) => [group, Int32Array.from(g.meta, (m) => playerIndex.get(m.playerId) ?? -1)]));
  return { groups: new Map(set.groups), rows, skipped: set.skipped };
}

type ProgressFn = NonNullable<BuildOptions['onProgress']>;

async function buildLocked(rosterDir: string, storeDir: string, options: BuildOptions): Promise<BuildSummary> {
  const started = performance.now();
  const progress: ProgressFn = options.onProgress ?? (() => {});
  const indexParams = options.index ?? DEFAULT_INDEX_PARAMS;
  const counts: Partial<Record<PositionGroup, number>> = {};
  const windowCounts: Record<string, Partial<Record<PositionGroup, number>>> = {};
  const embed = resolveEmbedSettings(options.embed ?? {});
  const charts = new Map<string, string>();
  const embedded: Partial<Record<PositionGroup, { dim: number; seconds: number }>> = {};
  // Files go to the store's temp folder as they are made, so the build never holds them all.
  const writer = await StoreWriter.begin(storeDir);
  const scratch = await mkdtemp(join(tmpdir(), 'kindred-index-'));
  const pool = new IndexBuildPool(options.threads ?? availableParallelism());
  /** Index builds in flight; each writes its file into the store when saved. */
  const indexFiles: Promise<void>[] = [];
  /** Index builds of the groups being written, handed to the pool together (largest first) once their files are written. */
  const batch: { name: string; vectors: Float32Array; dim: number }[] = [];
  const indexFile = (name: string, vectors: Float32Array, dim: number): void => {
    batch.push({ name, vectors, dim });
  };
  /** Hands the batch to the pool, largest first, so that the workers' queues come out even. */
  const startBatch = (): void => {
    for (const { name, vectors, dim } of batch.splice(0).sort((a, b) => b.vectors.length - a.vectors.length)) {
      const built = pool.build(vectors, dim, indexParams, join(scratch, name)).then(async (bytes) => {
        await writer.add(name, bytes);
        await rm(join(scratch, name), { force: true });
      });
      built.catch(() => {}); // awaited below; a failure must not go unhandled while the build goes on
      indexFiles.push(built);
    }
  };
  /** Writes each group's files and hands its index vectors to the pool; each group is dropped once written. */
  const writeGroups: WriteGroups = async (pending, size, playerIndex, levels) => {
    let done = 0;
    for (const [group, g] of pending) {
      const names = groupFileNames(group, size);
      const label = size === 1 ? group : `${group} over ${size} seasons`;
      let e: EmbeddedGroup | null = null;
      if (size === 1 && embed.method !== 'none' && g.meta.length >= MIN_EMBED_ROWS && g.dims.length >= 2) {
        progress(`embedding ${label}`, done, pending.size);
        e = await embedProfiles(g, embed);
        for (const [name, content] of e.files) await writer.add(name, content);
        for (const [name, svg] of e.charts) charts.set(name, svg);
        embedded[group] = { dim: e.dim, seconds: e.seconds };
      }
      progress(`index ${label}`, done, pending.size);
      let mainIndex: GroupFile['index'] = null;
      const partitions: GroupIndexes['partitions'][number][] = [];
      if (e) {
        indexFile(names.index, e.vectors, e.dim);
        mainIndex = { ...indexParams, dim: e.dim, count: g.meta.length };
      } else {
        const sqrtW = Float64Array.from(g.redundancy, Math.sqrt);
        const parts = partitionByCoverage(g.z, g.meta.length, g.dims.length);
        for (const [i, part] of parts.entries()) {
          let meta: GroupFile['index'] = null;
          let narrow: GroupFile['index'] = null;
          if (part.rows.length >= PARTITION_INDEX_MIN_ROWS) {
            indexFile(names.partitionIndex(i), partitionVectors(g.z, g.dims.length, part, sqrtW), part.dims.length);
            meta = { ...indexParams, dim: part.dims.length, count: part.rows.length };
          }
          // this coverage's targets meet the wider partitions' rows in one index instead of scans of them
          const wide = { dims: part.dims, rows: narrowRows(parts, i) };
          const min = options.narrowMin ?? NARROW_INDEX_MIN;
          if (part.rows.length >= min.targets && wide.rows.length >= min.rows && scansWider(parts, i, g.redundancy)) {
            indexFile(names.narrowIndex(i), partitionVectors(g.z, g.dims.length, wide, sqrtW), part.dims.length);
            narrow = { ...indexParams, dim: part.dims.length, count: wide.rows.length };
          }
          partitions.push({ dims: [...part.dims], rows: part.rows, index: meta, narrow });
        }
      }
      const groupFiles = encodeGroupFiles(g, playerIndex, levels, {
        index: mainIndex,
        partitions,
        ...(e ? { embedding: { space: e.space, dim: e.dim, sha256: embeddingChecksums(group, e.files) } } : {}),
      });
      for (const [name, content] of groupFiles) await writer.add(name, content);
      if (size === 1) counts[group] = g.meta.length;
      else (windowCounts[String(size)] ??= {})[group] = g.meta.length;
      pending.delete(group);
      done++;
    }
    startBatch();
  };
  let read: ReadRoster;
  try {
    read = await readAndProfile(rosterDir, storeDir, options, progress, writer, writeGroups);
    // the parsed roster is garbage now: collect it before waiting for the indexes (their files are read back into this heap)
    collectGarbage();
    progress('index', 0, 1);
    await Promise.all(indexFiles);
    progress('writing store', 0, 1);
    const staged = await stageCharts(chartsFolderOf(storeDir), charts);
    try {
      await writer.commit({
        roster: rosterDir,
        lenient: options.lenient,
        profile: options.profile ?? DEFAULT_PROFILE_OPTIONS,
        index: indexParams,
        space: embed.method === 'none' ? 'input' : embed.method,
        ...(embed.method === 'none' ? {} : { embedding: settingsRecord(embed) }),
        groups: inGroupOrder(counts),
        ...(read.windows > 0 ? { windows: windowsInGroupOrder(windowCounts) } : {}),
      });
    } catch (error) {
      await staged.discard();
      throw error;
    }
    await staged.commit();
  } catch (error) {
    await Promise.allSettled(indexFiles);
    await writer.abort();
    throw error;
  } finally {
    await pool.close();
    await rm(scratch, { recursive: true, force: true });
  }
  return {
    storeDir,
    rowsRead: read.rowsRead,
    rejected: read.rejected,
    rejectsPath: read.rejectsPath,
    notices: read.notices,
    profiles: inGroupOrder(counts),
    ...(Object.keys(windowCounts).length > 0 ? { windows: windowsInGroupOrder(windowCounts) } : {}),
    skipped: read.skipped,
    seconds: (performance.now() - started) / 1000,
    ...(embed.method === 'none' ? {} : { embedding: { space: embed.method, groups: embedded, chartsDir: chartsFolderOf(storeDir) } }),
  };
}

/** Counts per group with the groups in POSITION_GROUPS order (the pitchers' groups are written first). */
function inGroupOrder(counts: Readonly<Partial<Record<PositionGroup, number>>>): Partial<Record<PositionGroup, number>> {
  const out: Partial<Record<PositionGroup, number>> = {};
  for (const group of POSITION_GROUPS) {
    const n = counts[group];
    if (n !== undefined) out[group] = n;
  }
  return out;
}

function windowsInGroupOrder(windows: Readonly<Record<string, Readonly<Partial<Record<PositionGroup, number>>>>>): Record<string, Partial<Record<PositionGroup, number>>> {
  return Object.fromEntries(Object.entries(windows).map(([size, counts]) => [size, inGroupOrder(counts)]));
}

/** sha256 of a group's three embedding files, for its group file (src/store/groupFile.ts). */
function embeddingChecksums(group: string, files: ReadonlyMap<string, string | Uint8Array>): { summary: string; model: string; codes: string } {
  const names = groupEmbeddingFileNames(group);
  const sha = (name: string): string => {
    const content = files.get(name);
    if (content === undefined) throw new Error(`internal: the embedding of ${group} has no ${name}`);
    return sha256Hex(typeof content === 'string' ? new TextEncoder().encode(content) : content);
  };
  return { summary: sha(names.summary), model: sha(names.model), codes: sha(names.codes) };
}

/** A partition with fewer rows is scanned at query time instead of indexed (scanning is as fast, and exact). */
export const PARTITION_INDEX_MIN_ROWS = 2000;

/** A partition's index vectors, one partitionVector per row. */
export function partitionVectors(z: Float32Array, d: number, part: Pick<CoveragePartition, 'dims' | 'rows'>, sqrtW: Float64Array): Float32Array {
  const width = part.dims.length;
  const out = new Float32Array(part.rows.length * width);
  part.rows.forEach((row, r) => partitionVector(z, row * d, part.dims, sqrtW, out, r * width));
  return out;
}
