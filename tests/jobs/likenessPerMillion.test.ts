import { describe, expect, it } from 'vitest';
import { likenessPerMillion } from '../../src/jobs/likenessPerMillion.ts';

describe('likenessPerMillion(likeness, salaryUsd)', () => {
  it('gives the doc example: 80 for USD 2.5M is 32 per million', () => {
    expect(likenessPerMillion(80, 2_500_000)).toBeCloseTo(32, 12);
  });
  it('halves when the salary doubles', () => {
    expect(likenessPerMillion(60, 2_000_000)).toBeCloseTo(likenessPerMillion(60, 1_000_000) / 2, 12);
  });
  it('returns NaN for a salary of 0', () => {
    expect(likenessPerMillion(60, 0)).toBeNaN();
  });
});
