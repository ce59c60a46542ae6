import { describe, expect, it } from 'vitest';
import { rateOf } from '../../src/stats/Rate.ts';
import { stolenBaseAttemptRate } from '../../src/stats/stolenBaseAttemptRate.ts';

// Reference: common practice approximation, (SB + CS) / (1B + BB + HBP); values worked by hand.
describe('stolenBaseAttemptRate: { SB, CS, H, doubles, triples, HR, BB, HBP }', () => {
  it('gives the doc example: 40 attempts in 97 singles + 60 BB + 3 HBP = 160 times on first is .250', () => {
    const line = { SB: 30, CS: 10, H: 130, doubles: 25, triples: 3, HR: 5, BB: 60, HBP: 3 };
    expect(rateOf(stolenBaseAttemptRate, line)).toBeCloseTo(0.25, 12);
  });
  it('counts singles only among the hits: a double or a homer puts nobody on first', () => {
    // 12 H of which 2 doubles: 10 singles + 4 BB + 1 HBP = 15; 3 attempts is .200
    expect(rateOf(stolenBaseAttemptRate, { SB: 2, CS: 1, H: 12, doubles: 2, triples: 0, HR: 0, BB: 4, HBP: 1 })).toBeCloseTo(0.2, 12);
  });
  it('returns NaN when the batter never reached first', () => {
    expect(rateOf(stolenBaseAttemptRate, { SB: 0, CS: 0, H: 1, doubles: 0, triples: 0, HR: 1, BB: 0, HBP: 0 })).toBeNaN();
  });
});
