import { describe, expect, it } from 'vitest';
import { crossSeasonPairs } from '../../src/embed/crossSeasonPairs.ts';

// Invented rows, 2 dimensions: player a in 2020, 2021 (two levels) and 2023; player b once; player c twice
// with no dimension in common.
const x = Float64Array.from([
  1, 2, // 0 a 2020
  3, 4, // 1 a 2021
  5, 6, // 2 a 2021 (other level)
  7, 8, // 3 a 2023
  9, 10, // 4 b 2022
  11, NaN, // 5 c 2020
  NaN, 12, // 6 c 2021
]);
const groups = ['a', 'a', 'a', 'a', 'b', 'c', 'c'];
const seasons = [2020, 2021, 2021, 2023, 2022, 2020, 2021];

describe('crossSeasonPairs(data, seasons)', () => {
  const p = crossSeasonPairs({ x, n: 7, d: 2, groups }, seasons);

  it('pairs each row with every row of the same player at his nearest other season before and after (worked by hand)', () => {
    // 0 -> 1, 2 (2021 is the next); 1 -> 0 (2020), 3 (2023; 2022 is missing, so the next he has);
    // 2 -> 0, 3; 3 -> 1, 2 (2021); b has one season; c's rows share no dimension.
    expect(Array.from(p.source)).toEqual([0, 0, 1, 1, 2, 2, 3, 3]);
    expect(Array.from(p.partner)).toEqual([1, 2, 0, 3, 0, 3, 1, 2]);
    expect(p.n).toBe(8);
    expect(p.groups).toEqual(Array(8).fill('a'));
  });

  it('x holds the row, y its partner, so a pair and its reverse both appear', () => {
    expect(Array.from(p.x.subarray(0, 4))).toEqual([1, 2, 1, 2]);
    expect(Array.from(p.y.subarray(0, 4))).toEqual([3, 4, 5, 6]);
    expect(Array.from(p.x.subarray(2 * 2, 3 * 2))).toEqual([3, 4]);
    expect(Array.from(p.y.subarray(2 * 2, 3 * 2))).toEqual([1, 2]);
  });

  it('refuses seasons of the wrong length', () => {
    expect(() => crossSeasonPairs({ x, n: 7, d: 2, groups }, [2020])).toThrow(/7/);
  });
});
