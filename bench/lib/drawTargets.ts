/**
 * Bench targets drawn uniformly: player-seasons from all rows of every group (tracked or not, so in
 * proportion to how a club's history is made up), and hand-built `--want` profiles of 2 to 6
 * dimensions (the values of a drawn player-season on those dimensions), each with its coverage class.
 */
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import type { Target } from '../../src/query/Target.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

/** Coverage classes, by the share of the group's default weight the target has. */
export const COVERAGE_CLASSES = ['every dimension', 'most (>= 75% of weight)', 'part (< 75%, e.g. untracked)', 'want, 2-6 dimensions'] as const;
export type CoverageClass = (typeof COVERAGE_CLASSES)[number];

export interface DrawnTarget {
  readonly target: Target;
  readonly coverage: CoverageClass;
}

/** `count` targets: a share `wantShare` of them `--want` profiles, the rest player-seasons, all uniform. */
export function drawTargets(store: ProfileStore, count: number, wantShare: number, seed: number): DrawnTarget[] {
  const rng = new SeededRandom(seed);
  const groups = [...store.groups.entries()];
  const total = groups.reduce((a, [, g]) => a + g.n, 0);
  const pick = (): { group: PositionGroup; row: number } => {
    let at = rng.int(total);
    for (const [group, g] of groups) {
      if (at < g.n) return { group, row: at };
      at -= g.n;
    }
    throw new RangeError('empty store');
  };
  const out: DrawnTarget[] = [];
  while (out.length < count) {
    const at = pick();
    const g = store.groups.get(at.group);
    if (!g) continue;
    const t = playerTarget(store, at);
    if (rng.next() < wantShare) {
      const have = [...t.z.keys()].filter((j) => !Number.isNaN(t.z[j] as number) && (g.redundancy[j] as number) > 0);
      const size = Math.min(have.length, 2 + rng.int(5));
      if (size < 2) continue;
      const chosen = new Set<number>();
      while (chosen.size < size) chosen.add(have[rng.int(have.length)] as number);
      const z = t.z.map((v, j) => (chosen.has(j) ? v : NaN));
      const raw = t.raw.map((v, j) => (chosen.has(j) ? v : NaN));
      out.push({
        target: { ...t, kind: 'want', player: -1, row: -1, season: null, level: null, age: null, z, raw },
        coverage: 'want, 2-6 dimensions',
      });
      continue;
    }
    let have = 0;
    let all = 0;
    for (let j = 0; j < g.d; j++) {
      all += g.redundancy[j] as number;
      if (!Number.isNaN(t.z[j] as number)) have += g.redundancy[j] as number;
    }
    const share = have / all;
    out.push({ target: t, coverage: share >= 1 - 1e-9 ? 'every dimension' : share >= 0.75 ? 'most (>= 75% of weight)' : 'part (< 75%, e.g. untracked)' });
  }
  return out;
}
