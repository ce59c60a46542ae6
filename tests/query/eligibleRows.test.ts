/**
 * eligibleRows(store, group, filter, excluded) checked filter by filter on eight hand-made rows whose
 * attributes are written out below: each expected mask is read off the table by hand from the
 * filter's definition (PoolFilter: every bound inclusive; unknown age, bats or throws fails a filter
 * on it; the excluded players' rows never count).
 */
import { describe, expect, it } from 'vitest';
import { eligibleRows, hasEligibleRow, type PoolRows, type PoolStore } from '../../src/query/eligibleRows.ts';
import type { PoolFilter } from '../../src/query/PoolFilter.ts';
import type { Position } from '../../src/ingest/Roster.ts';

const LEVELS = ['Low', 'High', 'Top'];
// row: player, season, level, age, position, PA
const ROWS: readonly [number, number, string, number, Position, number][] = [
  [0, 2020, 'Low', 21, 'SS', 120], // row 0
  [0, 2021, 'High', 22, 'SS', 540], // row 1
  [1, 2020, 'High', 24, '2B', 300], // row 2
  [1, 2022, 'Top', 26, '2B', 299], // row 3
  [2, 2021, 'Top', 29, '3B', 610], // row 4
  [3, 2019, 'Top', Number.NaN, 'SS', 45], // row 5: no birth date
  [4, 2022, 'Low', 20, 'CF', 300], // row 6
  [4, 2023, 'High', 21, 'CF', 480], // row 7
];
const store: PoolStore = {
  levels: LEVELS,
  players: [
    { bats: 'L', throws: 'R' },
    { bats: 'R', throws: 'R' },
    { bats: 'S', throws: 'L' },
    { bats: null, throws: null },
    { bats: 'L', throws: 'L' },
  ],
};
const group: PoolRows = {
  n: ROWS.length,
  player: Int32Array.from(ROWS.map((r) => r[0])),
  season: Int32Array.from(ROWS.map((r) => r[1])),
  level: Int32Array.from(ROWS.map((r) => LEVELS.indexOf(r[2]))),
  age: Float64Array.from(ROWS.map((r) => r[3])),
  position: ROWS.map((r) => r[4]),
  sample: Int32Array.from(ROWS.map((r) => r[5])),
};

/** The rows the pool keeps, as indices. */
const kept = (filter: PoolFilter, excluded: readonly number[] = []): number[] => {
  const { mask, count } = eligibleRows(store, group, filter, new Set(excluded));
  const rows = [...mask].flatMap((m, i) => (m === 1 ? [i] : []));
  expect(count, 'count is the number of rows kept').toBe(rows.length);
  expect(hasEligibleRow(store, group, filter, new Set(excluded)), 'hasEligibleRow is whether any row is kept').toBe(rows.length > 0);
  return rows;
};

describe('eligibleRows(store, group, filter, excluded)', () => {
  it('keeps every row without a filter, and leaves out every row of an excluded player', () => {
    expect(kept({})).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    expect(kept({}, [1, 4])).toEqual([0, 1, 4, 5]);
    expect(kept({}, [0, 1, 2, 3, 4])).toEqual([]);
  });
  it('an excluded player is left out under any filter, one or several excluded', () => {
    expect(kept({ positions: ['SS'] }, [0])).toEqual([5]);
    expect(kept({ positions: ['SS'] }, [0, 3])).toEqual([]);
    expect(kept({ levels: ['Top'], seasonFrom: 2021 }, [1])).toEqual([4]);
  });
  it('levels: only rows at the listed levels', () => {
    expect(kept({ levels: ['Top'] })).toEqual([3, 4, 5]);
    expect(kept({ levels: ['Low', 'High'] })).toEqual([0, 1, 2, 6, 7]);
  });
  it('seasonFrom and seasonTo: inclusive bounds, each alone or both', () => {
    expect(kept({ seasonFrom: 2022 })).toEqual([3, 6, 7]);
    expect(kept({ seasonTo: 2020 })).toEqual([0, 2, 5]);
    expect(kept({ seasonFrom: 2021, seasonTo: 2021 })).toEqual([1, 4]);
  });
  it('ageMin and ageMax: inclusive bounds; a row without an age fails either', () => {
    expect(kept({ ageMin: 24 })).toEqual([2, 3, 4]);
    expect(kept({ ageMax: 21 })).toEqual([0, 6, 7]);
    expect(kept({ ageMin: 21, ageMax: 22 })).toEqual([0, 1, 7]);
    expect(kept({ ageMin: 0 })).not.toContain(5);
  });
  it('bats and throws: the player\u2019s hands; an unknown hand fails the filter', () => {
    expect(kept({ bats: ['L'] })).toEqual([0, 1, 6, 7]);
    expect(kept({ bats: ['R', 'S'] })).toEqual([2, 3, 4]);
    expect(kept({ throws: ['L'] })).toEqual([4, 6, 7]);
    expect(kept({ bats: ['L'], throws: ['R'] })).toEqual([0, 1]);
  });
  it('positions: only rows at the listed positions', () => {
    expect(kept({ positions: ['SS'] })).toEqual([0, 1, 5]);
    expect(kept({ positions: ['2B', '3B'] })).toEqual([2, 3, 4]);
  });
  it('minSample: playing time at least the floor (300 PA keeps 300, leaves out 299)', () => {
    expect(kept({ minSample: 300 })).toEqual([1, 2, 4, 6, 7]);
    expect(kept({ minSample: 0 })).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });
  it('include: a row-by-row rule on top of the others', () => {
    expect(kept({ include: (row) => row % 2 === 0 })).toEqual([0, 2, 4, 6]);
    expect(kept({ positions: ['SS'], include: (row) => row !== 0 })).toEqual([1, 5]);
  });
  it('levels with positions (only the rows at those levels and positions are tested): both must hold, a level the store lacks keeps nothing', () => {
    expect(kept({ levels: ['Top'], positions: ['SS', '3B'] })).toEqual([4, 5]);
    expect(kept({ levels: ['Low', 'High'], positions: ['CF'], minSample: 400 })).toEqual([7]);
    expect(kept({ levels: ['Low', 'High'], positions: ['SS'] }, [0])).toEqual([]);
    expect(kept({ levels: ['Nowhere'], positions: ['SS'] })).toEqual([]);
    expect(kept({ levels: ['High'], positions: ['SS'] }), 'asked again of the same group').toEqual([1]);
  });
  it('every filter at once: a row must pass all of them, excluded players still out', () => {
    const all: PoolFilter = { levels: ['High', 'Top'], seasonFrom: 2020, seasonTo: 2022, ageMin: 22, ageMax: 30, bats: ['L', 'R'], positions: ['SS', '2B'] };
    expect(kept(all)).toEqual([1, 2, 3]);
    expect(kept(all, [0])).toEqual([2, 3]);
  });
});
