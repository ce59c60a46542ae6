import { describe, expect, it } from 'vitest';
import { fitRidge, ridgePrediction } from '../../src/stats/fitRidge.ts';

// Anscombe (1973), "Graphs in statistical analysis", The American Statistician 27(1): each of the four data
// sets has the least-squares line y = 3.00 + 0.500 x (the values of set I and the line, from memory).
const X1 = [10, 8, 13, 9, 11, 14, 6, 4, 12, 7, 5];
const Y1 = [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68];

describe('fitRidge (Hoerl and Kennard 1970; ordinary least squares at ridge 0)', () => {
  it('finds Anscombe\'s line y = 3.00 + 0.500 x on his first data set', () => {
    const fit = fitRidge(X1.map((x) => [x]), Y1, 0);
    expect(fit.coefficients[0]).toBeCloseTo(3.0001, 3);
    expect(fit.coefficients[1]).toBeCloseTo(0.5001, 3);
    expect(ridgePrediction(fit, [10])).toBeCloseTo(8.0, 2);
  });

  it('shrinks the slope by the penalty: b = Sxy / (Sxx + ridge) for one centred feature (normal equations)', () => {
    // Anscombe I: x mean 9, Sxx = 110, Sxy = 55.01 (so b = 0.5001 at ridge 0)
    const fit = fitRidge(X1.map((x) => [x]), Y1, 10);
    expect(fit.coefficients[1]).toBeCloseTo(55.01 / 120, 3);
  });

  it('refuses a negative penalty and mismatched lengths', () => {
    expect(() => fitRidge([[1]], [1], -1)).toThrow(RangeError);
    expect(() => fitRidge([[1], [2]], [1], 0)).toThrow(RangeError);
  });
});
