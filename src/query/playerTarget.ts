import type { ProfileStore } from './ProfileStore.ts';
import type { Target } from './Target.ts';
import type { TargetRow } from './selectTargetRow.ts';

/** The target for an existing player-season row. */
export function playerTarget(store: ProfileStore, at: TargetRow): Target {
  const g = store.groups.get(at.group);
  if (!g) throw new RangeError(`no group ${at.group}`);
  const off = at.row * g.d;
  const age = g.age[at.row] as number;
  return {
    kind: 'player',
    group: at.group,
    position: g.position[at.row] ?? 'DH',
    player: g.player[at.row] as number,
    row: at.row,
    season: g.season[at.row] as number,
    level: store.levels[g.level[at.row] as number] ?? null,
    age: Number.isNaN(age) ? null : age,
    z: Float64Array.from(g.z.subarray(off, off + g.d)),
    raw: Float64Array.from(g.raw.subarray(off, off + g.d)),
  };
}
