import { describe, expect, it } from 'vitest';
import { SCAN_ROWS, fitCoreImputer, lineValue, type CoreImputer } from '../../src/query/fitCoreImputer.ts';
import { missingAwareDistance } from '../../src/query/missingAwareDistance.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

// Anscombe (1973), "Graphs in statistical analysis", The American Statistician 27(1), first data set:
// least squares y = 3.00 + 0.500 x with a residual sum of squares of about 13.76 (published figures,
// from memory).
const X = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const Y = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];

/** Rows [x, y], plus one row without y so that y is not a core column (1 of 12 missing). */
function anscombe(): Float64Array {
  return Float64Array.from([...X.flatMap((x, i) => [x, Y[i] as number]), 9, NaN]);
}

/** Column 1's line is y = 0.8 x + e with var(e) = 0.36: slope and residual variance within 0.04 (over 4 standard errors). */
function expectSlopeAndNoise(imp: CoreImputer): void {
  expect(imp.lines[1]?.[1]).toBeGreaterThan(0.8 - 0.04);
  expect(imp.lines[1]?.[1]).toBeLessThan(0.8 + 0.04);
  expect(imp.residual[1]).toBeGreaterThan(0.36 - 0.04);
  expect(imp.residual[1]).toBeLessThan(0.36 + 0.04);
}

describe('fitCoreImputer (lines from the dimensions every profile has)', () => {
  it('fits the published least-squares line and residual variance of Anscombe\u2019s first set', () => {
    const imp = fitCoreImputer(anscombe(), 12, 2, { ridge: 0, minRows: 5 });
    expect(Array.from(imp.core)).toEqual([0]);
    expect(imp.lines[0]).toBeNull();
    const line = imp.lines[1];
    expect(line?.[0]).toBeCloseTo(3.0, 2);
    expect(line?.[1]).toBeCloseTo(0.5, 3);
    expect((imp.residual[1] as number) * 11).toBeCloseTo(13.76, 1);
  });

  it('fits the same line when rows without any profile are added (a group seen as of an earlier season)', () => {
    // Anscombe's first set again, followed by 12 rows with no value at all: without the rule the x column
    // would be missing in half the rows, not core, and no line would be fitted
    const padded = Float64Array.from([...anscombe(), ...new Array<number>(24).fill(NaN)]);
    const imp = fitCoreImputer(padded, 24, 2, { ridge: 0, minRows: 5 });
    expect(Array.from(imp.core)).toEqual([0]);
    expect(imp.lines[1]?.[0]).toBeCloseTo(3.0, 2);
    expect(imp.lines[1]?.[1]).toBeCloseTo(0.5, 3);
  });

  it('leaves a dimension present in too few rows without a line (residual 1)', () => {
    const imp = fitCoreImputer(anscombe(), 12, 2, { ridge: 0 });
    expect(imp.lines[1]).toBeNull();
    expect(imp.residual[1]).toBe(1);
  });

  it('recovers a known slope and noise variance on simulated data within a few standard errors', () => {
    // y = 0.8 x + e, x ~ N(0, 1), e ~ N(0, 0.6^2), a tenth of y missing: se(slope) = 0.6 / sqrt(n) = 0.009
    const rng = new SeededRandom(7);
    const n = 4000;
    const z = new Float64Array(2 * n);
    for (let r = 0; r < n; r++) {
      const x = rng.normal();
      z[2 * r] = x;
      z[2 * r + 1] = r % 10 === 0 ? NaN : 0.8 * x + 0.6 * rng.normal();
    }
    const imp = fitCoreImputer(z, n, 2);
    expectSlopeAndNoise(imp);
  });

  it('fits a group larger than SCAN_ROWS from rows at an even stride, with the same slope, noise and core', () => {
    // the same model at 150,000 rows (4 times SCAN_ROWS); the second half of the rows has y missing a third
    // of the time, so a sample taken from the first rows alone would misjudge which columns are core
    const rng = new SeededRandom(11);
    const n = 150_000;
    const z = new Float64Array(3 * n);
    for (let r = 0; r < n; r++) {
      const x = rng.normal();
      z[3 * r] = x;
      z[3 * r + 1] = r >= n / 2 && r % 3 === 0 ? NaN : 0.8 * x + 0.6 * rng.normal();
      z[3 * r + 2] = r % 500 === 0 ? NaN : rng.normal();
    }
    expect(n).toBeGreaterThan(SCAN_ROWS);
    const imp = fitCoreImputer(z, n, 3);
    // column 1 misses a sixth of its values (not core), column 2 one in 500 (core)
    expect(Array.from(imp.core)).toEqual([0, 2]);
    expectSlopeAndNoise(imp);
  });

  it('reads a line at a row of the full matrix or on the core values alone, a missing core value as 0', () => {
    const line = Float64Array.from([1, 2, -1]);
    expect(lineValue(line, [9, 3, 9, 4], 0, Int32Array.from([1, 3]))).toBe(1 + 6 - 4);
    expect(lineValue(line, [3, NaN], 0, null)).toBe(7);
  });
});

describe('missingAwareDistance with imputed values (worked example)', () => {
  it('counts a dimension the comp lacks at (t - c^)^2 + s^2, c^ read off his core values', () => {
    // target [2, 1], comp [2, missing], weights [1, 1]: c^ = 3.00 + 0.500 * 2 = 4, s^2 = 13.76 / 11,
    // d^2 = (0 + (1 - 4)^2 + s^2) * W_T / (W_S + W_imputed) = 9 + s^2 with W_T = 2; coverage still 1 / 2
    const imp = fitCoreImputer(anscombe(), 12, 2, { ridge: 0, minRows: 5 });
    const s2 = imp.residual[1] as number;
    const p = missingAwareDistance(Float64Array.from([2, 1]), Float64Array.from([2, NaN]), 0, Float64Array.from([1, 1]), 2, { impute: imp });
    expect(p.d2).toBeCloseTo(9 + s2, 2);
    expect(p.d2).toBeCloseTo(9 + 13.76 / 11, 1);
    expect(p.coverage).toBe(0.5);
    // the plain expected gap would assume the stratum mean: 1^2 + 1 = 2, far from the comp his power shows
    expect(missingAwareDistance(Float64Array.from([2, 1]), Float64Array.from([2, NaN]), 0, Float64Array.from([1, 1]), 2, 'expected').d2).toBeCloseTo(2, 12);
  });
});
