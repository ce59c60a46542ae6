import { describe, expect, it } from 'vitest';
import { stolenBaseAttemptRate } from '../../src/stats/stolenBaseAttemptRate.ts';

// Reference: common practice approximation, (SB + CS) / (1B + BB + HBP); values worked by hand.
describe('stolenBaseAttemptRate(SB, CS, singles, BB, HBP)', () => {
  it('gives the doc example: 40 attempts in 160 times on first is .250', () => {
    expect(stolenBaseAttemptRate(30, 10, 97, 60, 3)).toBeCloseTo(0.25, 12);
  });
  it('counts hit-by-pitches as opportunities: 3 attempts over 10 + 4 + 1 = 15 is .200', () => {
    expect(stolenBaseAttemptRate(2, 1, 10, 4, 1)).toBeCloseTo(0.2, 12);
  });
  it('returns NaN when the batter never reached first', () => {
    expect(stolenBaseAttemptRate(0, 0, 0, 0, 0)).toBeNaN();
  });
});
