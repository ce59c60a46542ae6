import { narrowRows } from '../ann/narrowRows.ts';
import { GuardedIndex } from '../ann/GuardedIndex.ts';
import type { IndexMeta } from '../ann/IndexParams.ts';
import type { Position } from '../ingest/Roster.ts';
import { POSITIONS, type PositionGroup } from '../profiles/positionGroup.ts';
import type { StratumStats } from '../profiles/standardiseByStratum.ts';
import type { ShrinkageUsed } from '../profiles/shrinkage.ts';
import { decodeColumns } from './columnsFile.ts';
import { bytesToFloat32 } from './float32Bytes.ts';
import { groupFileSchema } from './groupFile.ts';
import type { OpenStore } from './openStore.ts';
import { corruptFile, parseStoreJson } from './parseStoreJson.ts';
import type { StoredGroup, StoredPartition } from './ProfileStore.ts';
import { readGroupEmbedding } from './readGroupEmbedding.ts';
import { groupEmbeddingFileNames, groupFileNames } from './storeFileNames.ts';

/** A value computed on the first call and kept (a failed first call is tried again on the next). */
export function once<T>(compute: () => T): () => T {
  let kept: { readonly value: T } | undefined;
  return () => (kept ??= { value: compute() }).value;
}

/**
 * Reads one position group from a store (the counterpart of encodeGroupFiles). Now: parses the JSON
 * part and the rows (`group-<G>.rows.bin`), checks that every column, weight list and partition agrees
 * with its row and dimension counts, that it names the group its file name says (so files swapped
 * between groups are refused), that the raw and standardised matrices and the embedding's files are
 * the ones it names by sha256 (so files of the same size, such as the two matrices, cannot be swapped),
 * that its player and level references are in range, and reads the embedding when there is one. On first use (a getter): the raw and standardised matrices (`raw`,
 * `z`, sizes checked) and each index (`index`, `partitions[i].index`, checked by GuardedIndex.load
 * before the native reader sees it). Every file is verified against the manifest when read, once.
 * Any mismatch is StoreError `kindred.store.corrupt`, thrown by the call or getter that reads the file.
 */
export function readGroup(
  store: OpenStore,
  group: PositionGroup,
  refs: { readonly players: number; readonly levels: number },
  window = 1,
): StoredGroup {
  const names = groupFileNames(group, window);
  const where = `${store.dir}/${names.json}`;
  const bad = (what: string): Error => corruptFile(where, what);
  const gf = parseStoreJson(store.readTextSync(names.json), groupFileSchema, where);
  if (gf.group !== group) throw bad(`holds group ${gf.group} (expected ${group}; files swapped?)`);
  if ((gf.window?.size ?? 1) !== window) throw bad(`holds windows of ${gf.window?.size ?? 1} seasons (expected ${window}; files swapped?)`);
  const d = gf.dims.length;
  const n = gf.n;
  if (gf.redundancy.length !== d || gf.reliability.length !== d) throw bad(`sizes do not match (${n} rows x ${d} dimensions)`);

  const named = (name: string, sha256: string): void => {
    const listed = store.manifest.files[name]?.sha256;
    if (listed !== sha256) throw bad(`names ${name} with sha256 ${sha256}, but the store holds ${listed ?? 'no such file'} (files swapped?)`);
  };
  named(names.raw, gf.matrices.raw);
  named(names.z, gf.matrices.z);
  if (gf.embedding) {
    const files = groupEmbeddingFileNames(group);
    named(files.summary, gf.embedding.sha256.summary);
    named(files.model, gf.embedding.sha256.model);
    named(files.codes, gf.embedding.sha256.codes);
  }

  const rowsWhere = `${store.dir}/${names.rows}`;
  const badRow = (what: string): Error => corruptFile(rowsWhere, what);
  const cols = decodeColumns(store.readBytesSync(names.rows), rowsWhere);
  const player = cols.i32('player', n);
  const season = cols.i32('season', n);
  const level = cols.i32('level', n);
  const positionCode = cols.u8('position', n);
  const age = cols.f64('age', n);
  const sample = cols.i32('sample', n);
  if (gf.window) {
    const { size, first } = gf.window;
    const outsideWindow = first.findIndex((f, r) => !(f <= (season[r] ?? -Infinity) && f > (season[r] ?? Infinity) - size));
    if (first.length !== n || outsideWindow >= 0) throw bad(`window row ${outsideWindow} does not end at its season within ${size} seasons`);
  }
  const outs = cols.f64('outs', n);
  const team = cols.i32('team', n);
  const teamNames = cols.strings('team_name');
  const partitionRows = cols.i32('partition_rows');
  const position = new Array<Position>(n);
  const teams = new Array<string>(n);
  for (let i = 0; i < n; i++) {
    const p = player[i] ?? -1;
    if (p < 0 || p >= refs.players) throw badRow(`row ${i} names player ${p} (the store has ${refs.players})`);
    const l = level[i] ?? -1;
    if (l < 0 || l >= refs.levels) throw badRow(`row ${i} names level ${l} (the store has ${refs.levels})`);
    const pos = POSITIONS[positionCode[i] ?? POSITIONS.length];
    if (pos === undefined) throw badRow(`row ${i} has position code ${positionCode[i]} (expected 0 to ${POSITIONS.length - 1})`);
    position[i] = pos;
    const t = teamNames[team[i] ?? -1];
    if (t === undefined) throw badRow(`row ${i} names team list ${team[i]} (the file has ${teamNames.length})`);
    teams[i] = t;
    const a = age[i] ?? NaN;
    const s = sample[i] ?? -1;
    if (!(Number.isNaN(a) || Number.isInteger(a)) || s < 0) throw badRow(`row ${i} has age ${a}, sample ${s} (expected a whole age or none, a sample of 0 or more)`);
    const o = outs[i] ?? NaN;
    if (!(Number.isNaN(o) || (Number.isInteger(o) && o >= 0))) throw badRow(`row ${i} has ${o} outs (expected a whole number of 0 or more, or none)`);
  }

  const embedding = gf.embedding
    ? readGroupEmbedding(store, group, { space: gf.embedding.space, dim: gf.embedding.dim, d, n, dims: gf.dims.map((x) => x.name) })
    : undefined;
  const loadIndex = (file: string, meta: IndexMeta): GuardedIndex => {
    const bytes = store.readBytesSync(file);
    return store.withVerifiedPath(file, bytes, (path) => GuardedIndex.load(path, meta, bytes));
  };
  let index: () => GuardedIndex | null = () => null;
  if (embedding) {
    const meta = gf.index;
    if (!meta || meta.dim !== embedding.dim || meta.count !== n) throw bad('index metadata does not match the codes');
    index = once(() => loadIndex(names.index, meta));
  }
  const shapes: { dims: Int32Array; rows: Int32Array }[] = [];
  let covered = 0;
  for (const [i, p] of gf.partitions.entries()) {
    if (covered + p.rows > partitionRows.length) throw bad(`partition ${i} holds more rows than ${names.rows} lists`);
    const rows = partitionRows.subarray(covered, covered + p.rows);
    if (p.dims.some((j) => j >= d) || rows.some((r) => r < 0 || r >= n)) throw bad(`partition ${i} points past the profiles`);
    const meta = p.index;
    if (meta && (meta.dim !== p.dims.length || meta.count !== p.rows)) throw bad(`partition ${i} index metadata does not match`);
    covered += p.rows;
    shapes.push({ dims: Int32Array.from(p.dims), rows });
  }
  if (covered !== partitionRows.length) throw bad(`partitions hold ${covered} rows, ${names.rows} lists ${partitionRows.length}`);
  if (!embedding && covered !== n) throw bad(`partitions hold ${covered} of ${n} rows`);
  const partitions: StoredPartition[] = gf.partitions.map((p, i) => {
    const shape = shapes[i] ?? { dims: new Int32Array(0), rows: new Int32Array(0) };
    const meta = p.index;
    const partIndex = meta ? once(() => loadIndex(names.partitionIndex(i), meta)) : () => null;
    const wide = p.narrow;
    let narrow: StoredPartition['narrow'] = null;
    if (wide) {
      const rows = narrowRows(shapes, i);
      if (wide.dim !== p.dims.length || wide.count !== rows.length) {
        throw bad(`partition ${i} narrow index metadata does not match (${wide.count} rows of ${wide.dim} dimensions, expected ${rows.length} of ${p.dims.length})`);
      }
      const narrowIndex = once(() => loadIndex(names.narrowIndex(i), wide));
      narrow = {
        rows,
        get index() {
          return narrowIndex();
        },
      };
    }
    return {
      ...shape,
      get index() {
        return partIndex();
      },
      narrow,
    };
  });
  const strata = new Map<string, Map<string, StratumStats>>();
  for (const [dim, list] of Object.entries(gf.strata)) {
    strata.set(dim, new Map(list.map(([key, mean, sd, count, from, to]) => [key, { mean, sd, n: count, seasons: [from, to] as const }])));
  }
  const shrinkage = new Map<string, Map<string, ShrinkageUsed>>();
  for (const [dim, list] of Object.entries(gf.shrinkage)) {
    shrinkage.set(dim, new Map(list.map(([key, k, table, source, players]) => [key, { k, table, source, players }])));
  }
  const matrix = (file: string): (() => Float32Array) =>
    once(() => {
      const values = bytesToFloat32(store.readBytesSync(file));
      if (values.length !== n * d) throw corruptFile(`${store.dir}/${file}`, `holds ${values.length} values (expected ${n} rows x ${d} dimensions)`);
      return values;
    });
  const raw = matrix(names.raw);
  const z = matrix(names.z);
  return {
    group,
    dims: gf.dims,
    d,
    n,
    redundancy: Float64Array.from(gf.redundancy),
    reliability: Float64Array.from(gf.reliability),
    player,
    season,
    level,
    position,
    age,
    sample,
    outs,
    teams,
    get raw() {
      return raw();
    },
    get z() {
      return z();
    },
    strata,
    shrinkage,
    get index() {
      return index();
    },
    partitions,
    ...(embedding ? { embedding } : {}),
    ...(gf.window ? { window: { size: gf.window.size, first: Int32Array.from(gf.window.first) } } : {}),
  };
}
