import { describe, expect, it } from 'vitest';
import { WeightedMean, addCount } from '../../src/ingest/WeightedMean.ts';

describe('WeightedMean', () => {
  it('weights by the preferred weights when every stint has one: (90*100 + 84*50) / 150 = 88', () => {
    const m = new WeightedMean();
    m.add(90, 100, 1);
    m.add(84, 50, 1);
    expect(m.value()).toBeCloseTo(88, 12);
  });
  it('falls back to the fallback weights when a stint lacks the preferred one: (90*300 + 84*100) / 400 = 88.5', () => {
    const m = new WeightedMean();
    m.add(90, 100, 300);
    m.add(84, undefined, 100);
    expect(m.value()).toBeCloseTo(88.5, 12);
  });
  it('gives the plain mean when all weights are zero, the value of a single stint, and undefined for none', () => {
    const m = new WeightedMean();
    m.add(40, 0, 0);
    m.add(50, 0, 0);
    expect(m.value()).toBe(45);
    const one = new WeightedMean();
    one.add(7, 0, 0);
    expect(one.value()).toBe(7);
    expect(new WeightedMean().value()).toBeUndefined();
  });
});

describe('addCount(total, value)', () => {
  it('sums known counts and is unknown once a stint lacks the count', () => {
    expect(addCount(3, 4)).toBe(7);
    expect(addCount(3, undefined)).toBeUndefined();
    expect(addCount(undefined, 4)).toBeUndefined();
  });
});
