import { describe, expect, it } from 'vitest';
import { logistic, logit } from '../../src/sim/logistic.ts';

describe('logistic(x) and logit(p)', () => {
  it('logistic(0) is 1/2 and logistic(ln 3) is 3/4 (1 / (1 + e^-x))', () => {
    expect(logistic(0)).toBe(0.5);
    expect(logistic(Math.log(3))).toBeCloseTo(0.75, 12);
  });

  it('logit inverts logistic', () => {
    for (const p of [0.01, 0.22, 0.5, 0.9]) expect(logistic(logit(p))).toBeCloseTo(p, 12);
  });
});
