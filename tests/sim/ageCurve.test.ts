import { describe, expect, it } from 'vitest';
import { ageOffset } from '../../src/sim/ageCurve.ts';

const curve = { peak: 27, plateau: 3, growth: 0.12, decline: 0.06, accel: 0.01 };

describe('ageOffset(curve, age, development)', () => {
  it('grows linearly before the peak (worked example: 6 years early at 0.12 a year is -0.72)', () => {
    expect(ageOffset(curve, 21, 1)).toBeCloseTo(-0.72, 10);
    expect(ageOffset(curve, 21, 1.5)).toBeCloseTo(-1.08, 10);
  });

  it('is flat on the plateau', () => {
    expect(ageOffset(curve, 27, 1)).toBe(0);
    expect(ageOffset(curve, 30, 1)).toBe(0);
  });

  it('declines with an accelerating slope afterwards (worked example: 3 years past is -(0.18 + 0.09))', () => {
    expect(ageOffset(curve, 33, 1)).toBeCloseTo(-0.27, 10);
    const step1 = ageOffset(curve, 34, 1) - ageOffset(curve, 33, 1);
    const step2 = ageOffset(curve, 37, 1) - ageOffset(curve, 36, 1);
    expect(step2).toBeLessThan(step1);
  });
});
