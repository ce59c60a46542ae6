import { openStore } from '../store/openStore.ts';
import { bytesToFloat32 } from '../store/float32Bytes.ts';
import { GuardedIndex } from '../index/GuardedIndex.ts';
import { StoreError } from '../errors/KindredError.ts';
import { groupFileNames, groupFileSchema, playersFileSchema } from '../profiles/groupFile.ts';
import { POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import type { StratumStats } from '../profiles/standardiseByStratum.ts';
import type { ProfileStore, StoredGroup, StoredPartition, StoredPlayer } from './ProfileStore.ts';
import type { z } from 'zod';
import { loadGroupEmbedding } from './loadGroupEmbedding.ts';

function parseJson<T>(text: string, schema: z.ZodType<T>, dir: string, name: string): T {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    throw new StoreError('kindred.store.corrupt', `${dir}/${name}: not valid JSON (${e instanceof Error ? e.message : String(e)}); rebuild the store`, { file: name });
  }
  const parsed = schema.safeParse(value);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new StoreError(
      'kindred.store.corrupt',
      `${dir}/${name}: unexpected content at ${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'invalid'}; rebuild the store`,
      { file: name },
    );
  }
  return parsed.data;
}

/**
 * Opens a store for queries: the manifest and every checksum are verified by openStore before any
 * file is parsed or any index is handed to the native reader.
 */
export async function loadProfileStore(dir: string): Promise<ProfileStore> {
  const store = await openStore(dir);
  const pf = parseJson(await store.readText('players.json'), playersFileSchema, dir, 'players.json');
  const players: StoredPlayer[] = pf.players.map((p) => ({
    playerId: p.player_id,
    name: p.name,
    birthDate: p.birth_date,
    bats: p.bats,
    throws: p.throws,
  }));
  const playerById = new Map(players.map((p, i) => [p.playerId, i]));
  const salaries = new Map<number, Map<number, number>>();
  for (const [idx, season, salary] of pf.contracts) {
    let m = salaries.get(idx);
    if (!m) salaries.set(idx, (m = new Map()));
    m.set(season, salary);
  }
  const groups = new Map<PositionGroup, StoredGroup>();
  for (const group of POSITION_GROUPS) {
    const names = groupFileNames(group);
    if (!(names.json in store.manifest.files)) continue;
    const gf = parseJson(await store.readText(names.json), groupFileSchema, dir, names.json);
    const d = gf.dims.length;
    const raw = bytesToFloat32(await store.readBytes(names.raw));
    const zz = bytesToFloat32(await store.readBytes(names.z));
    const lengths = [gf.rows.player, gf.rows.season, gf.rows.level, gf.rows.position, gf.rows.age, gf.rows.sample, gf.rows.teams].map((a) => a.length);
    if (raw.length !== gf.n * d || zz.length !== gf.n * d || lengths.some((l) => l !== gf.n) || gf.redundancy.length !== d || gf.reliability.length !== d) {
      throw new StoreError('kindred.store.corrupt', `${dir}/${names.json}: sizes do not match (${gf.n} rows x ${d} dimensions); rebuild the store`, { file: names.json });
    }
    const embedding = gf.embedding
      ? await loadGroupEmbedding(store, group, { space: gf.embedding.space, dim: gf.embedding.dim, d, n: gf.n, dims: gf.dims.map((x) => x.name) })
      : undefined;
    const bad = (what: string): StoreError =>
      new StoreError('kindred.store.corrupt', `${dir}/${names.json}: ${what}; rebuild the store`, { file: names.json });
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
    groups.set(group, {
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
      teams: gf.rows.teams,
      raw,
      z: zz,
      strata,
      index,
      partitions,
      ...(embedding ? { embedding } : {}),
    });
  }
  return { dir, opened: store, params: store.manifest.params, levels: pf.levels, players, playerById, salaries, groups };
}
