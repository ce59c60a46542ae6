import type { GroupProfiles } from '../profiles/buildProfiles.ts';
import { float32ToBytes } from './float32Bytes.ts';
import type { GroupFile } from './groupFile.ts';
import { sha256Hex } from './sha256Hex.ts';
import { groupFileNames } from './storeFileNames.ts';

/** What the build adds to a group's profiles: the indexes it saved beside them. */
export interface GroupIndexes {
  /** The index over all rows (codes of a learned space); null in the input space. */
  readonly index: GroupFile['index'];
  /** Input space: the coverage partitions and their index metadata. */
  readonly partitions: GroupFile['partitions'];
  /** The learned space's kind and code size, when comps are ranked in one. */
  readonly embedding?: GroupFile['embedding'];
}

/**
 * The files of one position group (JSON part, raw and standardised matrices), by store file name;
 * the counterpart of readGroup. Rows refer to players and levels by store index (`playerIndex`, `levels`).
 */
export function encodeGroupFiles(
  g: GroupProfiles,
  playerIndex: ReadonlyMap<string, number>,
  levels: readonly string[],
  indexes: GroupIndexes,
): Map<string, Uint8Array | string> {
  const names = groupFileNames(g.group);
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
    rows: {
      player: g.meta.map((m) => playerIndex.get(m.playerId) ?? -1),
      season: g.meta.map((m) => m.season),
      level: g.meta.map((m) => levelIdx.get(m.level) ?? -1),
      position: g.meta.map((m) => m.position),
      age: g.meta.map((m) => m.age),
      sample: g.meta.map((m) => m.sample),
      outs: g.meta.map((m) => m.outs),
      teams: g.meta.map((m) => m.teams.join('/')),
    },
    strata,
    shrinkage,
    index: indexes.index,
    partitions: indexes.partitions,
    ...(indexes.embedding ? { embedding: indexes.embedding } : {}),
  };
  return new Map<string, Uint8Array | string>([
    [names.raw, raw],
    [names.z, z],
    [names.json, JSON.stringify(file)],
  ]);
}
