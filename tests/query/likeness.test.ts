import { describe, expect, it } from 'vitest';
import { likeness } from '../../src/query/likeness.ts';

describe('likeness(distance, W)', () => {
  it('is 100 for an identical profile and 100/e when d^2 = 2W (the doc comment example)', () => {
    expect(likeness(0, 5)).toBe(100);
    expect(likeness(Math.sqrt(10), 5)).toBeCloseTo(100 / Math.E, 10);
  });

  it('falls strictly as the distance grows and stays within 0..100', () => {
    let prev = Infinity;
    for (let d = 0; d < 20; d += 0.5) {
      const l = likeness(d, 8);
      expect(l).toBeLessThan(prev);
      expect(l).toBeGreaterThanOrEqual(0);
      expect(l).toBeLessThanOrEqual(100);
      prev = l;
    }
  });

  it('is 0 for an infinite distance or no weight', () => {
    expect(likeness(Infinity, 3)).toBe(0);
    expect(likeness(1, 0)).toBe(0);
  });
});
