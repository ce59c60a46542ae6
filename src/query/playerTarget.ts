import type { ProfileStore } from '../store/ProfileStore.ts';
import { storedGroup } from './storedGroup.ts';
import { valueAt } from './valueAt.ts';
import type { Target } from './Target.ts';
import type { TargetRow } from './selectTargetRow.ts';

/** The target for an existing player-season row. */
export function playerTarget(store: ProfileStore, at: TargetRow): Target {
  const g = storedGroup(store, at.group);
  const off = at.row * g.d;
  const age = valueAt(g.age, at.row);
  return {
    kind: 'player',
    group: at.group,
    position: g.position[at.row] ?? 'DH',
    player: valueAt(g.player, at.row),
    row: at.row,
    season: valueAt(g.season, at.row),
    level: store.levels[valueAt(g.level, at.row)] ?? null,
    age: Number.isNaN(age) ? null : age,
    z: Float64Array.from(g.z.subarray(off, off + g.d)),
    raw: Float64Array.from(g.raw.subarray(off, off + g.d)),
  };
}
