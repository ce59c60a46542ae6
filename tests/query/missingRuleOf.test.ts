import { describe, expect, it } from 'vitest';
import { missingRuleOf, prospectMissingRuleOf } from '../../src/query/missingRuleOf.ts';
import { missingAwareDistance } from '../../src/query/missingAwareDistance.ts';

// A dimension the target has and the comp lacks (hand-worked): target z [1, 2], comp [1, missing],
// weights [1, 1]. Rescaled: only the first is shared, d^2 = 0 * W_T / W_S = 0. At its expected gap:
// an unknown standardised value has mean 0 and variance 1, so E(t - c)^2 = t^2 + 1 = 5, d^2 = 0 + 5.
describe('missingRuleOf (the default rule for a dimension the comp lacks)', () => {
  it('counts it at its expected gap for pitchers and at its imputed gap for hitters', () => {
    const z = new Float32Array([0, 1, 1, NaN]);
    expect(missingRuleOf({ group: 'SP', z, n: 2, d: 2 })).toBe('expected');
    expect(missingRuleOf({ group: 'RP', z, n: 2, d: 2 })).toBe('expected');
    for (const group of ['C', 'IF', 'OF', 'DH'] as const) {
      const rule = missingRuleOf({ group, z, n: 2, d: 2 });
      expect(typeof rule === 'object' && Array.from(rule.impute.core)).toEqual([0]);
    }
  });

  it('keeps the rule the outlook was backtested with for prospect comps: expected for pitchers, rescaled for hitters', () => {
    expect(prospectMissingRuleOf('SP')).toBe('expected');
    for (const g of ['C', 'IF', 'OF', 'DH'] as const) expect(prospectMissingRuleOf(g)).toBe('rescale');
  });

  it('so an untracked comp no longer looks as close as a tracked one (worked example)', () => {
    const target = new Float64Array([1, 2]);
    const untracked = new Float64Array([1, NaN]);
    const weights = new Float64Array([1, 1]);
    expect(missingAwareDistance(target, untracked, 0, weights, 2, 'rescale').d2).toBeCloseTo(0, 12);
    expect(missingAwareDistance(target, untracked, 0, weights, 2, 'expected').d2).toBeCloseTo(5, 12);
  });
});
