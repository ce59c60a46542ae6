import { describe, expect, it } from 'vitest';
import { closerFirst, rankScored, type RowColumns } from '../../src/query/rankScored.ts';

function group(players: number[], seasons: number[]): RowColumns {
  return { player: Int32Array.from(players), season: Int32Array.from(seasons) };
}

// Worked by hand: rows 0..4 of players 1, 1, 2, 3, 3 in seasons 2020, 2021, 2021, 2019, 2022.
const g = group([1, 1, 2, 3, 3], [2020, 2021, 2021, 2019, 2022]);
const scored = [
  { row: 0, d2: 4, coverage: 1 },
  { row: 1, d2: 1, coverage: 1 },
  { row: 2, d2: 2, coverage: 1 },
  { row: 3, d2: 2, coverage: 1 },
  { row: 4, d2: 9, coverage: 0.2 },
];

describe('rankScored(group, scored, settings)', () => {
  it('keeps each player once, at his closest season, closest first', () => {
    const ranked = rankScored(g, scored, { k: 10, allSeasons: false, minCoverage: 0.5 });
    // player 1 at row 1 (d2 1); players 2 and 3 tie at d2 2: the later season (2021, row 2) first
    expect(ranked.map((s) => s.row)).toEqual([1, 2, 3]);
  });
  it('keeps every season with allSeasons, and only the k first', () => {
    expect(rankScored(g, scored, { k: 3, allSeasons: true, minCoverage: 0.5 }).map((s) => s.row)).toEqual([1, 2, 3]);
    expect(rankScored(g, scored, { k: 10, allSeasons: true, minCoverage: 0 }).map((s) => s.row)).toEqual([1, 2, 3, 0, 4]);
  });
  it('leaves out rows under the coverage floor or at no finite distance', () => {
    const more = [...scored, { row: 0, d2: Infinity, coverage: 1 }];
    expect(rankScored(g, more, { k: 10, allSeasons: true, minCoverage: 0.5 }).map((s) => s.row)).toEqual([1, 2, 3, 0]);
  });
  it('orders equal distances by the later season (closerFirst)', () => {
    const before = closerFirst(g);
    expect(before({ row: 2, d2: 2, coverage: 1 }, { row: 3, d2: 2, coverage: 1 })).toBeLessThan(0);
    expect(before({ row: 0, d2: 1, coverage: 1 }, { row: 2, d2: 2, coverage: 1 })).toBeLessThan(0);
  });
});
