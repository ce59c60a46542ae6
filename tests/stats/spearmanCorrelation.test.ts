import { describe, expect, it } from 'vitest';
import { similarity } from 'ml-distance';
import { averageRanks } from '../../src/stats/averageRanks.ts';
import { spearmanCorrelation } from '../../src/stats/spearmanCorrelation.ts';

describe('spearmanCorrelation(x, y)', () => {
  it('gives the doc example: 0.8 for one swapped pair of four', () => {
    // 1 - 6 * 2 / (4 * 15) = 0.8 (closed form without ties, by hand)
    expect(spearmanCorrelation([1, 2, 3, 4], [10, 30, 20, 40])).toBeCloseTo(0.8, 12);
  });

  it('reproduces the IQ and television example of Wikipedia, "Spearman\'s rank correlation coefficient": -29/165', () => {
    // From memory; checked by hand: sum d^2 = 194, rho = 1 - 6 * 194 / (10 * 99) = -0.17575...
    const iq = [106, 100, 86, 101, 99, 103, 97, 113, 112, 110];
    const tv = [7, 27, 2, 50, 28, 29, 20, 12, 6, 17];
    expect(spearmanCorrelation(iq, tv)).toBeCloseTo(-29 / 165, 12);
  });

  it('equals the Pearson correlation of the averaged ranks from ml-distance, with ties', () => {
    const x = [3, 1, 4, 1, 5, 9, 2, 6, 5, 3, 5];
    const y = [2, 7, 1, 8, 2, 8, 1, 8, 2, 8, 4];
    expect(spearmanCorrelation(x, y)).toBeCloseTo(similarity.pearson(averageRanks(x), averageRanks(y)), 10);
  });

  it('is 1 for any increasing relation and -1 for any decreasing one', () => {
    const x = [0.1, 0.5, 2, 3, 10];
    expect(spearmanCorrelation(x, x.map((v) => Math.exp(v)))).toBeCloseTo(1, 12);
    expect(spearmanCorrelation(x, x.map((v) => -v * v * v))).toBeCloseTo(-1, 12);
  });

  it('leaves out pairs with a NaN and returns NaN for a constant side or fewer than 2 pairs', () => {
    expect(spearmanCorrelation([1, 2, NaN, 3], [1, 2, 5, 3])).toBeCloseTo(1, 12);
    expect(spearmanCorrelation([1, 1, 1], [1, 2, 3])).toBeNaN();
    expect(spearmanCorrelation([1], [2])).toBeNaN();
  });
});
