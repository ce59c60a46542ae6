import { describe, expect, it } from 'vitest';
import { computeOutcomes } from '../../src/outlook/computeOutcomes.ts';
import { outcomesFileSchema } from '../../src/store/outcomesFile.ts';
import { fipMinus } from '../../src/stats/fipMinus.ts';
import { opsPlus } from '../../src/stats/opsPlus.ts';
import { bat, pitch, roster } from './rosterLines.ts';

const r = roster(
  [
    bat('h1', 2020, 'Top', { PA: 600, AB: 530, H: 160, doubles: 35, triples: 3, HR: 28, BB: 55, HBP: 8, SF: 7 }),
    bat('h2', 2020, 'Top', { PA: 400, AB: 370, H: 90, doubles: 15, HR: 8, BB: 25, HBP: 2, SF: 3 }),
    bat('h3', 2020, 'AA', { PA: 500, AB: 450, H: 150, HR: 30, BB: 50 }),
    bat('h3', 2018, 'A', { PA: 300, AB: 280, H: 80 }),
  ],
  [
    pitch('p1', 2020, 'Top', { outs: 540, BF: 780, ER: 70, HR: 18, BB: 45, HBP: 5, SO: 190 }),
    pitch('p2', 2020, 'Top', { outs: 180, BF: 270, ER: 35, HR: 10, BB: 30, HBP: 3, SO: 40 }),
    pitch('p3', 2021, 'AA', { outs: 300, BF: 420, ER: 30 }),
  ],
);

describe('computeOutcomes(roster)', () => {
  const out = computeOutcomes(r);

  it('writes a file that its own schema accepts, with format tag and version', () => {
    expect(outcomesFileSchema.safeParse(out).success).toBe(true);
    expect(out.format).toBe('kindred-outcomes');
  });

  it('takes the last of roster.levels as the top level and keeps only its lines', () => {
    expect(out.top_level).toBe('Top');
    expect(out.batting.map((b) => b[0]).sort()).toEqual(['h1', 'h2']);
    expect(out.pitching.map((p) => p[0]).sort()).toEqual(['p1', 'p2']);
  });

  it('spans the first and last season with any line at any level', () => {
    expect(out.first_season).toBe(2018);
    expect(out.last_season).toBe(2021);
  });

  it('gives OPS+ from src/stats/opsPlus.ts against the top level\u2019s summed totals of that season', () => {
    // league totals by hand: H 250, BB 80, HBP 10, AB 900, SF 10; TB = 250 + 50 + 6 + 108 = 414
    // lgOBP = (250 + 80 + 10) / (900 + 80 + 10 + 10) = 340 / 1000; lgSLG = 414 / 900
    const lgOBP = 340 / 1000;
    const lgSLG = 414 / 900;
    // h1: OBP (160 + 55 + 8) / (530 + 55 + 8 + 7) = 223 / 600; TB 160 + 35 + 6 + 84 = 285
    const h1 = opsPlus(223 / 600, 285 / 530, lgOBP, lgSLG);
    const row = out.batting.find((b) => b[0] === 'h1');
    expect(row?.[2]).toBe(600);
    expect(row?.[3]).toBeCloseTo(h1, 2);
    expect(out.league[0]?.[1]).toBeCloseTo(lgOBP, 6);
  });

  it('gives FIP- from src/stats/fipMinus.ts with the season\u2019s FIP constant, the league at 100', () => {
    // league totals by hand: ER 105, outs 720, HR 28, BB 75, HBP 8, SO 230
    // lgERA = 27 * 105 / 720 = 3.9375; C = 3.9375 - (13 * 28 + 3 * 83 - 2 * 230) / 240 = 3.9375 - 0.6375 = 3.3
    // p1: FIP = (13 * 18 + 3 * 50 - 2 * 190) / 180 + 3.3 = 4 / 180 + 3.3; lgFIP = lgERA
    const p1 = fipMinus(4 / 180 + 3.3, 3.9375);
    const row = out.pitching.find((p) => p[0] === 'p1');
    expect(row?.[2]).toBe(540);
    expect(row?.[3]).toBe(780);
    expect(row?.[4]).toBeCloseTo(p1, 2);
    // the innings-weighted mean of FIP- over the league is 100 (FIP is linear in the counts per inning)
    const p2 = out.pitching.find((p) => p[0] === 'p2')?.[4] ?? NaN;
    expect((540 * (row?.[4] ?? NaN) + 180 * p2) / 720).toBeCloseTo(100, 1);
  });
});
