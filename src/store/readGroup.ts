import { GuardedIndex } from '../ann/GuardedIndex.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { StratumStats } from '../profiles/standardiseByStratum.ts';
import type { ShrinkageUsed } from '../profiles/shrinkage.ts';
import { bytesToFloat32 } from './float32Bytes.ts';
import { groupFileSchema } from './groupFile.ts';
import type { OpenStore } from './openStore.ts';
import { corruptFile, parseStoreJson } from './parseStoreJson.ts';
import type { StoredGroup, StoredPartition } from './ProfileStore.ts';
import { readGroupEmbedding } from './readGroupEmbedding.ts';
import { groupEmbeddingFileNames, groupFileNames } from './storeFileNames.ts';

/**
 * Reads one position group from a verified store (the counterpart of encodeGroupFiles): parses the
 * JSON part, checks that every column, matrix, weight list and partition agrees with its row and
 * dimension counts, that it names the group its file name says (so files swapped between groups are
 * refused), that the raw and standardised matrices and the embedding's files are the ones it names by
 * sha256 (so files of the same size, such as the two matrices, cannot be swapped) and that its player and level references are in range, reads the embedding when there is one and loads the indexes (each checked by
 * GuardedIndex.load before the native reader sees it). Any mismatch is StoreError `kindred.store.corrupt`.
 */
export async function readGroup(
  store: OpenStore,
  group: PositionGroup,
  refs: { readonly players: number; readonly levels: number },
): Promise<StoredGroup> {
  const names = groupFileNames(group);
  const where = `${store.dir}/${names.json}`;
  const bad = (what: string): Error => corruptFile(where, what);
  const gf = parseStoreJson(await store.readText(names.json), groupFileSchema, where);
  if (gf.group !== group) throw bad(`holds group ${gf.group} (expected ${group}; files swapped?)`);
  const d = gf.dims.length;
  const outside = (values: readonly number[], below: number): number => values.findIndex((v) => v >= below);
  const badPlayer = outside(gf.rows.player, refs.players);
  if (badPlayer >= 0) throw bad(`row ${badPlayer} names player ${gf.rows.player[badPlayer]} (the store has ${refs.players})`);
  const badLevel = outside(gf.rows.level, refs.levels);
  if (badLevel >= 0) throw bad(`row ${badLevel} names level ${gf.rows.level[badLevel]} (the store has ${refs.levels})`);
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
  const raw = bytesToFloat32(await store.readBytes(names.raw));
  const z = bytesToFloat32(await store.readBytes(names.z));
  const lengths = [gf.rows.player, gf.rows.season, gf.rows.level, gf.rows.position, gf.rows.age, gf.rows.sample, gf.rows.outs, gf.rows.teams].map((a) => a.length);
  if (raw.length !== gf.n * d || z.length !== gf.n * d || lengths.some((l) => l !== gf.n) || gf.redundancy.length !== d || gf.reliability.length !== d) {
    throw bad(`sizes do not match (${gf.n} rows x ${d} dimensions)`);
  }
  const embedding = gf.embedding
    ? await readGroupEmbedding(store, group, { space: gf.embedding.space, dim: gf.embedding.dim, d, n: gf.n, dims: gf.dims.map((x) => x.name) })
    : undefined;
  let index: GuardedIndex | null = null;
  if (embedding) {
    if (!gf.index || gf.index.dim !== embedding.dim || gf.index.count !== gf.n) throw bad('index metadata does not match the codes');
    index = GuardedIndex.load(store.path(names.index), gf.index);
  }
  const partitions: StoredPartition[] = [];
  let covered = 0;
  for (const [i, p] of gf.partitions.entries()) {
    if (p.dims.some((j) => j >= d) || p.rows.some((r) => r >= gf.n)) throw bad(`partition ${i} points past the profiles`);
    if (p.index && (p.index.dim !== p.dims.length || p.index.count !== p.rows.length)) throw bad(`partition ${i} index metadata does not match`);
    covered += p.rows.length;
    partitions.push({
      dims: Int32Array.from(p.dims),
      rows: Int32Array.from(p.rows),
      index: p.index ? GuardedIndex.load(store.path(names.partitionIndex(i)), p.index) : null,
    });
  }
  if (!embedding && covered !== gf.n) throw bad(`partitions hold ${covered} of ${gf.n} rows`);
  const strata = new Map<string, Map<string, StratumStats>>();
  for (const [dim, list] of Object.entries(gf.strata)) {
    strata.set(dim, new Map(list.map(([key, mean, sd, n, from, to]) => [key, { mean, sd, n, seasons: [from, to] as const }])));
  }
  const shrinkage = new Map<string, Map<string, ShrinkageUsed>>();
  for (const [dim, list] of Object.entries(gf.shrinkage)) {
    shrinkage.set(dim, new Map(list.map(([key, k, table, source, players]) => [key, { k, table, source, players }])));
  }
  return {
    group,
    dims: gf.dims,
    d,
    n: gf.n,
    redundancy: Float64Array.from(gf.redundancy),
    reliability: Float64Array.from(gf.reliability),
    player: Int32Array.from(gf.rows.player),
    season: Int32Array.from(gf.rows.season),
    level: Int32Array.from(gf.rows.level),
    position: gf.rows.position,
    age: Float64Array.from(gf.rows.age, (a) => (a === null ? NaN : a)),
    sample: Int32Array.from(gf.rows.sample),
    outs: Float64Array.from(gf.rows.outs, (o) => (o === null ? NaN : o)),
    teams: gf.rows.teams,
    raw,
    z,
    strata,
    shrinkage,
    index,
    partitions,
    ...(embedding ? { embedding } : {}),
  };
}
