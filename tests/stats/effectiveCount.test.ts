import { describe, expect, it } from 'vitest';
import { effectiveCount } from '../../src/stats/effectiveCount.ts';

// Reference: Kish (1965), n_eff = (sum w)^2 / sum w^2; worked by hand.
describe('effectiveCount(weights)', () => {
  it('is n for equal weights and (3 + 1)^2 / (9 + 1) = 1.6 for weights 3 and 1', () => {
    expect(effectiveCount([2, 2, 2, 2])).toBe(4);
    expect(effectiveCount([3, 1])).toBeCloseTo(1.6, 12);
    expect(effectiveCount([])).toBe(0);
  });
});
