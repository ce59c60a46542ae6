import { describe, expect, it } from 'vitest';
import { valueScore } from '../../src/jobs/valueScore.ts';
import { likenessPerMillion } from '../../src/jobs/likenessPerMillion.ts';

describe('valueScore(likeness, salary, reference)', () => {
  it('does not let the minimum salary alone win: a likeness-37 comp at $500k scores below a likeness-95 comp at $6.4M', () => {
    // the case that likeness per $1M got wrong (74 against 14.9)
    expect(likenessPerMillion(37, 500_000)).toBeGreaterThan(likenessPerMillion(95, 6_400_000));
    expect(valueScore(37, 500_000, 12_800_000)).toBeLessThan(valueScore(95, 6_400_000, 12_800_000));
  });

  it('gives the worked examples: 100 (L - 100/e) / (100 - 100/e) times the share saved', () => {
    // computed by hand: (95 - 36.788) / 63.212 = 0.9209; half of $12.8M saved: 46.05
    expect(valueScore(95, 6_400_000, 12_800_000)).toBeCloseTo(46.05, 2);
    expect(valueScore(37, 500_000, 12_800_000)).toBeCloseTo(0.3224, 3);
    expect(valueScore(100, 1, 1e9)).toBeCloseTo(100, 4);
  });

  it('is 0 for a comp no more alike than two unrelated players, and for one paid the reference or more', () => {
    expect(valueScore(100 / Math.E, 500_000, 12_800_000)).toBe(0);
    expect(valueScore(20, 500_000, 12_800_000)).toBe(0);
    expect(valueScore(90, 12_800_000, 12_800_000)).toBe(0);
    expect(valueScore(90, 20_000_000, 12_800_000)).toBe(0);
  });

  it('is NaN without a positive salary or reference', () => {
    expect(valueScore(80, 0, 1e6)).toBeNaN();
    expect(valueScore(80, 1e6, 0)).toBeNaN();
  });
});
