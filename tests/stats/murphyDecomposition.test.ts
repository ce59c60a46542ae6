import { describe, expect, it } from 'vitest';
import { brierScore } from '../../src/stats/brierScore.ts';
import { murphyDecomposition } from '../../src/stats/murphyDecomposition.ts';

// Reference: Murphy (1973), BS = REL - RES + UNC when forecasts are grouped by their values; the
// figures below are worked by hand from the definitions (also in Wilks, Statistical Methods in the
// Atmospheric Sciences, "algebraic decomposition of the Brier score").
describe('murphyDecomposition(forecasts, outcomes, bins)', () => {
  it('splits a worked example exactly: 0.2 five times (1 happened), 0.8 five times (4 happened)', () => {
    const f = [0.2, 0.2, 0.2, 0.2, 0.2, 0.8, 0.8, 0.8, 0.8, 0.8];
    const o = [1, 0, 0, 0, 0, 1, 1, 1, 1, 0].map(Boolean);
    const m = murphyDecomposition(f, o);
    // BS: each group (0.8^2 + 4 * 0.2^2) / 5 = 0.16; REL 0 (each group's frequency equals its forecast);
    // RES = 0.5 (0.2 - 0.5)^2 + 0.5 (0.8 - 0.5)^2 = 0.09; UNC = 0.5 * 0.5 = 0.25; 0 - 0.09 + 0.25 = 0.16.
    expect(m.brier).toBeCloseTo(0.16, 12);
    expect(m.reliability).toBeCloseTo(0, 12);
    expect(m.resolution).toBeCloseTo(0.09, 12);
    expect(m.uncertainty).toBeCloseTo(0.25, 12);
    expect(m.within).toBeCloseTo(0, 12);
  });

  it('charges a miscalibrated forecast in reliability: always 0.9 when 3 of 10 happen', () => {
    const o = [1, 1, 1, 0, 0, 0, 0, 0, 0, 0].map(Boolean);
    const m = murphyDecomposition(o.map(() => 0.9), o);
    // REL = (0.9 - 0.3)^2 = 0.36, RES = 0, UNC = 0.21, BS = 0.57 (= (3 * 0.01 + 7 * 0.81) / 10)
    expect(m.reliability).toBeCloseTo(0.36, 12);
    expect(m.resolution).toBeCloseTo(0, 12);
    expect(m.brier).toBeCloseTo(0.57, 12);
  });

  it('keeps BS = REL - RES + UNC + within when a bin holds several forecast values, and agrees with brierScore', () => {
    const f = [0.11, 0.15, 0.42, 0.47, 0.45, 0.93, 0.97];
    const o = [false, true, false, true, true, true, true];
    const m = murphyDecomposition(f, o);
    expect(m.brier).toBeCloseTo(brierScore(f, o), 12);
    expect(m.reliability - m.resolution + m.uncertainty + m.within).toBeCloseTo(m.brier, 12);
    expect(m.bins.map((b) => b.n)).toEqual([2, 3, 2]);
  });
});
