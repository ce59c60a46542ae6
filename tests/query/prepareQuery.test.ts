/**
 * The query pieces on the hand-made roster of tests/helpers/handStore.ts (three outfielders): the
 * prepared pool and weights, a described comp, and the errors every job shares.
 *
 * Sources: the missing-aware distance d^2 = sum_S w (t - c)^2 * W_T / W_S over the dimensions both
 * have (a project choice after Gower 1971's available-case distance, src/query/missingAwareDistance.ts)
 * and likeness 100 exp(-d^2 / 2W) (a project choice, src/query/likeness.ts), worked here from the
 * stored z-scores.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { KindredError } from '../../src/errors/KindredError.ts';
import { describeComp } from '../../src/query/describeComp.ts';
import { echoPool, echoQuery } from '../../src/query/echoQuery.ts';
import { DEFAULT_COMPS_OPTIONS } from '../../src/query/findComps.ts';
import { playerTarget } from '../../src/query/playerTarget.ts';
import { prepareQuery } from '../../src/query/prepareQuery.ts';
import { coreImputerOf } from '../../src/query/coreImputerOf.ts';
import { missingRuleOf } from '../../src/query/missingRuleOf.ts';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { scoreRow } from '../../src/query/scoreRow.ts';
import type { Target } from '../../src/query/Target.ts';
import { handStore } from '../helpers/handStore.ts';

let store: ProfileStore;
let g: StoredGroup;
let target: Target;
const rowOf = (id: string): number => Array.from(g.player).findIndex((p) => store.players[p]?.playerId === id);

beforeAll(async () => {
  store = await handStore();
  const of = store.groups.get('OF');
  if (!of) throw new Error('no OF group');
  g = of;
  target = playerTarget(store, { group: 'OF', row: rowOf('h1') });
}, 60_000);

describe('prepareQuery(store, target, settings)', () => {
  it('leaves the target\u2019s own player out of the pool and weighs only what he has', () => {
    const q = prepareQuery(store, target, DEFAULT_COMPS_OPTIONS);
    expect(q.eligible).toBe(2);
    expect(q.mask[rowOf('h1')]).toBe(0);
    expect(q.mask[rowOf('h2')]).toBe(1);
    let wT = 0;
    target.z.forEach((z, j) => {
      if (!Number.isNaN(z)) wT += q.weights[j] ?? 0;
    });
    expect(q.targetWeight).toBeCloseTo(wT, 12);
    expect(q.defaultMetric).toBe(true);
  });

  it('gives every dimension weight 1 with the plain weighting', () => {
    const q = prepareQuery(store, target, { ...DEFAULT_COMPS_OPTIONS, weighting: 'plain' });
    expect(Array.from(q.weights).every((w) => w === 1)).toBe(true);
    expect(q.defaultMetric).toBe(false);
  });

  it('reads `impute` as the imputation lines of the queried group (coreImputerOf), the default rule as missingRuleOf', () => {
    const q = prepareQuery(store, target, { ...DEFAULT_COMPS_OPTIONS, missing: 'impute' });
    expect(typeof q.missing === 'object' ? q.missing.impute : null).toBe(coreImputerOf(g));
    expect(prepareQuery(store, target, { ...DEFAULT_COMPS_OPTIONS, missing: 'rescale' }).missing).toBe('rescale');
    expect(prepareQuery(store, target, DEFAULT_COMPS_OPTIONS).missing).toEqual(missingRuleOf(g));
  });

  it('refuses a group the store does not have (kindred.query.emptyPool)', () => {
    const catcher: Target = { ...target, group: 'C', position: 'C' };
    expect(() => prepareQuery(store, catcher, DEFAULT_COMPS_OPTIONS)).toThrow(expect.objectContaining({ code: 'kindred.query.emptyPool' }));
  });

  it('refuses a target with no value on any weighted dimension (kindred.query.badTarget)', () => {
    const empty: Target = { ...target, kind: 'want', player: -1, row: -1, z: new Float64Array(g.d).fill(NaN) };
    let error: unknown;
    try {
      prepareQuery(store, empty, DEFAULT_COMPS_OPTIONS);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(KindredError);
    expect(error instanceof KindredError ? error.code : '').toBe('kindred.query.badTarget');
  });
});

describe('describeComp(q, scored, rank, settings)', () => {
  it('reports the distance, coverage and likeness worked from the stored z-scores', () => {
    const q = prepareQuery(store, target, { ...DEFAULT_COMPS_OPTIONS, weighting: 'plain' });
    const row = rowOf('h2');
    let sum = 0;
    let shared = 0;
    let wT = 0;
    for (let j = 0; j < g.d; j++) {
      const t = target.z[j] ?? NaN;
      const c = g.z[row * g.d + j] ?? NaN;
      if (Number.isNaN(t)) continue;
      wT += 1;
      if (Number.isNaN(c)) continue;
      sum += (t - c) ** 2;
      shared += 1;
    }
    const d2 = (sum * wT) / shared;
    const comp = describeComp(q, scoreRow(q, row, null), 1, { space: null, attributions: false });
    expect(comp.player_id).toBe('h2');
    expect(comp.season).toBe(2024);
    expect(comp.level).toBe('High');
    expect(comp.position).toBe('CF');
    expect(comp.distance).toBeCloseTo(Math.sqrt(d2), 4);
    expect(comp.coverage).toBeCloseTo(shared / wT, 3);
    expect(comp.likeness).toBeCloseTo(100 * Math.exp(-d2 / (2 * wT)), 1);
  });

  it('echoes the query and the pool', () => {
    const q = prepareQuery(store, target, DEFAULT_COMPS_OPTIONS);
    const echo = echoQuery(q, 5, 'exact', 'input');
    expect(echo).toMatchObject({ kind: 'player', player_id: 'h1', season: 2024, level: 'High', group: 'OF', k: 5, method: 'exact', space: 'input' });
    expect(echo.profile['obp']).toBeCloseTo(175 / 500, 3);
    expect(echoPool(q)).toMatchObject({ group_size: 3, eligible: 2, filters: {} });
  });
});
