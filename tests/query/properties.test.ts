/**
 * Property tests (fast-check) of the invariants a user relies on, over many generated inputs:
 * likeness falls as distance grows; the missing-aware distance is symmetric on the dimensions both
 * sides have; and on a simulated league, for random targets: the distance shares of each comp sum to
 * 1, no comp is the target player, each comp player appears once, and the index answers as the exact scan.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { rm } from 'node:fs/promises';
import { likeness } from '../../src/query/likeness.ts';
import { missingAwareDistance, targetWeight } from '../../src/query/missingAwareDistance.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../../src/query/findComps.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';
import { simStore, type SimStore } from '../helpers/simStore.ts';

const GROUPS: readonly PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
let s: SimStore;

beforeAll(async () => {
  s = await simStore();
});
afterAll(async () => {
  await rm(s.dir, { recursive: true, force: true });
});

describe('likeness(distance, totalWeight)', () => {
  it('never rises as the distance grows, and stays within 0 to 100', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 50, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), (a, b, w) => {
        const [near, far] = a <= b ? [a, b] : [b, a];
        const ln = likeness(near, w);
        const lf = likeness(far, w);
        expect(lf).toBeLessThanOrEqual(ln);
        expect(ln).toBeLessThanOrEqual(100);
        expect(lf).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});

describe('missingAwareDistance', () => {
  const value = fc.oneof({ weight: 4, arbitrary: fc.double({ min: -4, max: 4, noNaN: true }) }, { weight: 1, arbitrary: fc.constant(Number.NaN) });
  const pair = fc.integer({ min: 1, max: 12 }).chain((d) =>
    fc.tuple(fc.array(value, { minLength: d, maxLength: d }), fc.array(value, { minLength: d, maxLength: d }), fc.array(fc.double({ min: 0.01, max: 3, noNaN: true }), { minLength: d, maxLength: d })),
  );

  it('is symmetric on the shared dimensions: the weighted sum over them is the same either way round', () => {
    fc.assert(
      fc.property(pair, ([a, b, w]) => {
        const x = Float64Array.from(a);
        const y = Float64Array.from(b);
        const weights = Float64Array.from(w);
        const xy = missingAwareDistance(x, y, 0, weights, targetWeight(x, weights));
        const yx = missingAwareDistance(y, x, 0, weights, targetWeight(y, weights));
        if (xy.coverage === 0) {
          expect(yx.coverage).toBe(0);
          return;
        }
        // d2 * coverage = sum over shared dimensions of w (x - y)^2
        expect(xy.d2 * xy.coverage).toBeCloseTo(yx.d2 * yx.coverage, 9);
        // with the same dimensions present on both sides, the distance itself is symmetric
        if (a.every((v, j) => Number.isNaN(v) === Number.isNaN(b[j] ?? NaN))) expect(xy.d2).toBeCloseTo(yx.d2, 9);
      }),
    );
  });
});

describe('comps on a simulated league, for random targets', () => {
  const target = fc.record({ group: fc.constantFrom(...GROUPS), at: fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }) });
  const rowOf = (group: PositionGroup, at: number): number => Math.floor(at * (s.store.groups.get(group)?.n ?? 0));

  it('lists no comp who is the target player, each comp player once, and distance shares summing to 1', () => {
    fc.assert(
      fc.property(target, ({ group, at }) => {
        const t = playerTarget(s.store, { group, row: rowOf(group, at) });
        const r = findComps(s.store, t, DEFAULT_COMPS_OPTIONS);
        const ids = r.comps.map((c) => c.player_id);
        expect(ids).not.toContain(r.query.player_id);
        expect(new Set(ids).size).toBe(ids.length);
        for (const c of r.comps) {
          if (c.distance === 0) continue;
          const sum = c.dimensions.reduce((a, d) => a + d.share, 0);
          expect(sum, `${c.player_id} shares`).toBeCloseTo(1, 6);
        }
      }),
      { numRuns: 40 },
    );
  });

  it('answers with the index as with the exact scan (same players, same order)', () => {
    fc.assert(
      fc.property(target, ({ group, at }) => {
        const t = playerTarget(s.store, { group, row: rowOf(group, at) });
        const fast = findComps(s.store, t, DEFAULT_COMPS_OPTIONS);
        const exact = findComps(s.store, t, { ...DEFAULT_COMPS_OPTIONS, exact: true });
        expect(fast.comps.map((c) => c.player_id)).toEqual(exact.comps.map((c) => c.player_id));
      }),
      { numRuns: 40 },
    );
  });
});
