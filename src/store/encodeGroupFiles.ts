import type { GroupProfiles } from '../profiles/buildProfiles.ts';
import { POSITIONS } from '../profiles/positionGroup.ts';
import { encodeColumns } from './columnsFile.ts';
import { float32ToBytes } from './float32Bytes.ts';
import type { GroupFile } from './groupFile.ts';
import { sha256Hex } from './sha256Hex.ts';
import { groupFileNames } from './storeFileNames.ts';

/** What the build adds to a group's profiles: the indexes it saved beside them. */
export interface GroupIndexes {
  /** The index over all rows (codes of a learned space); null in the input space. */
  readonly index: GroupFile['index'];
  /** Input space: the coverage partitions (dimensions, group rows) and their index metadata. */
  readonly partitions: readonly {
    readonly dims: readonly number[];
    readonly rows: ArrayLike<number>;
    readonly index: GroupFile['index'];
    /** The narrow index over the wider partitions' rows on these dimensions (src/ann/narrowRows.ts). */
    readonly narrow: GroupFile['index'];
  }[];
  /** The learned space's kind and code size, when comps are ranked in one. */
  readonly embedding?: GroupFile['embedding'];
}

/**
 * The files of one position group (JSON part, rows, raw and standardised matrices), by store file name;
 * the counterpart of readGroup. Rows refer to players and levels by store index (`playerIndex`, `levels`).
 */
export function encodeGroupFiles(
  g: GroupProfiles,
  playerIndex: ReadonlyMap<string, number>,
  levels: readonly string[],
  indexes: GroupIndexes,
): Map<string, Uint8Array | string> {
  const names = groupFileNames(g.group, g.window?.size ?? 1);
  const levelIdx = new Map(levels.map((l, i) => [l, i]));
  const strata: GroupFile['strata'] = {};
  for (const [dim, map] of g.strata) {
    // A stratum with a single value has no spread (sd NaN): it standardises nothing, so it is not kept.
    strata[dim] = [...map]
      .filter(([, s]) => Number.isFinite(s.mean) && Number.isFinite(s.sd))
      .map(([key, s]) => [key, s.mean, s.sd, s.n, s.seasons[0], s.seasons[1]]);
  }
  const shrinkage: GroupFile['shrinkage'] = {};
  for (const [dim, map] of g.shrinkage) {
    if (map.size > 0) shrinkage[dim] = [...map].map(([key, s]) => [key, s.k, s.table, s.source, s.players]);
  }
  const raw = float32ToBytes(g.raw);
  const z = float32ToBytes(g.z);
  const file: GroupFile = {
    group: g.group,
    n: g.meta.length,
    matrices: { raw: sha256Hex(raw), z: sha256Hex(z) },
    dims: [...g.dims],
    redundancy: [...g.redundancy],
    reliability: [...g.reliability],
    strata,
    shrinkage,
    index: indexes.index,
    partitions: indexes.partitions.map((p) => ({ dims: [...p.dims], rows: p.rows.length, index: p.index, narrow: p.narrow })),
    ...(indexes.embedding ? { embedding: indexes.embedding } : {}),
    ...(g.window ? { window: { size: g.window.size, first: [...g.window.first] } } : {}),
  };
  const teamNames: string[] = [];
  const teamIdx = new Map<string, number>();
  const team = g.meta.map((m) => {
    const key = m.teams.join('/');
    let i = teamIdx.get(key);
    if (i === undefined) {
      i = teamNames.length;
      teamIdx.set(key, i);
      teamNames.push(key);
    }
    return i;
  });
  const partitionRows: number[] = [];
  for (const p of indexes.partitions) for (let i = 0; i < p.rows.length; i++) partitionRows.push(p.rows[i] ?? 0);
  const rows = encodeColumns([
    { name: 'player', type: 'i32', values: g.meta.map((m) => playerIndex.get(m.playerId) ?? -1) },
    { name: 'season', type: 'i32', values: g.meta.map((m) => m.season) },
    { name: 'level', type: 'i32', values: g.meta.map((m) => levelIdx.get(m.level) ?? -1) },
    { name: 'position', type: 'u8', values: g.meta.map((m) => POSITIONS.indexOf(m.position)) },
    { name: 'age', type: 'f64', values: g.meta.map((m) => m.age ?? NaN) },
    { name: 'sample', type: 'i32', values: g.meta.map((m) => m.sample) },
    { name: 'outs', type: 'f64', values: g.meta.map((m) => m.outs ?? NaN) },
    { name: 'team', type: 'i32', values: team },
    { name: 'team_name', type: 'strings', values: teamNames },
    { name: 'partition_rows', type: 'i32', values: partitionRows },
  ]);
  return new Map<string, Uint8Array | string>([
    [names.raw, raw],
    [names.z, z],
    [names.rows, rows],
    [names.json, JSON.stringify(file)],
  ]);
}
