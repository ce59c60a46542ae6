import { describe, expect, it } from 'vitest';
import { computeOutcomes } from '../../src/outlook/computeOutcomes.ts';
import { Outcomes, peakOf } from '../../src/outlook/Outcomes.ts';
import { StoreError } from '../../src/errors/KindredError.ts';
import { bat, pitch, roster } from './rosterLines.ts';

const lg = (id: string, season: number): ReturnType<typeof bat> => bat(id, season, 'Top', { PA: 600, AB: 540, H: 140, doubles: 25, HR: 15, BB: 55 });
const r = roster(
  [
    bat('h', 2010, 'AA', { PA: 500, AB: 450, H: 130 }),
    bat('h', 2012, 'Top', { PA: 299, AB: 260, H: 100, HR: 20, BB: 35 }), // a great season just under 300 PA
    bat('h', 2013, 'Top', { PA: 450, AB: 400, H: 110, HR: 12, BB: 45 }),
    bat('h', 2015, 'Top', { PA: 620, AB: 560, H: 170, HR: 25, BB: 55 }),
    bat('h', 2017, 'Top', { PA: 620, AB: 540, H: 200, HR: 40, BB: 70 }), // outside a 6-season window from 2010
    ...[2011, 2012, 2013, 2014, 2015, 2016, 2017, 2018].map((s) => lg('x', s)),
  ],
  [
    pitch('p', 2011, 'Top', { outs: 149, BF: 200, ER: 5, SO: 60 }), // excellent, just under 50 IP
    pitch('p', 2012, 'Top', { outs: 180, BF: 260, ER: 30, HR: 8, BB: 20, SO: 40 }),
    pitch('p', 2013, 'Top', { outs: 400, BF: 560, ER: 40, HR: 8, BB: 20, SO: 120 }),
    pitch('y', 2011, 'Top', { outs: 1500, BF: 2100, ER: 200, HR: 50, BB: 150, SO: 350 }),
    pitch('y', 2012, 'Top', { outs: 1500, BF: 2100, ER: 200, HR: 50, BB: 150, SO: 350 }),
    pitch('y', 2013, 'Top', { outs: 1500, BF: 2100, ER: 200, HR: 50, BB: 150, SO: 350 }),
  ],
);
const file = computeOutcomes(r);
const index = new Map([...r.players.keys()].map((id, i) => [id, i]));
const outcomes = new Outcomes(file, index);
const h = index.get('h') as number;
const p = index.get('p') as number;
const opsOf = (season: number): number => file.batting.find((b) => b[0] === 'h' && b[1] === season)?.[3] ?? NaN;
const fipOf = (season: number): number => file.pitching.find((b) => b[0] === 'p' && b[1] === season)?.[4] ?? NaN;

describe('Outcomes.futureOf(player, kind, season, horizon, asOf)', () => {
  it('follows seasons season+1 .. season+horizon and counts the top-level seasons in them', () => {
    const o = outcomes.futureOf(h, 'hitter', 2010, 6);
    expect(o.window).toEqual([2011, 2016]);
    expect(o.reached_top_level).toBe(true);
    expect(o.first_top_level_season).toBe(2012);
    expect(o.top_level_seasons).toBe(3);
  });

  it('gives the first top-level season as it was, even when he was already there in his comp season (not the season after)', () => {
    // h reached the top level in 2012: from his 2012 season, the window starts in 2013 but he arrived in 2012
    expect(outcomes.futureOf(h, 'hitter', 2012, 3).first_top_level_season).toBe(2012);
    expect(outcomes.futureOf(h, 'hitter', 2013, 3).first_top_level_season).toBe(2012);
    // nothing after the last season seen counts
    expect(outcomes.futureOf(h, 'hitter', 2010, 1, 2011).first_top_level_season).toBeNull();
  });

  it('takes the best OPS+ among seasons of at least 300 PA only', () => {
    const o = outcomes.futureOf(h, 'hitter', 2010, 6);
    expect(opsOf(2012)).toBeGreaterThan(opsOf(2015)); // the 299-PA season was the best one
    expect(peakOf(o)).toBeCloseTo(Math.max(opsOf(2013), opsOf(2015)), 6);
    expect(o.peak_season).toBe(2015);
  });

  it('takes the lowest FIP- among seasons of at least 50 IP (150 outs) for pitchers', () => {
    const o = outcomes.futureOf(p, 'pitcher', 2010, 6);
    expect(fipOf(2011)).toBeLessThan(fipOf(2013));
    expect(peakOf(o)).toBeCloseTo(Math.min(fipOf(2012), fipOf(2013)), 6);
    expect(o.kind).toBe('pitcher');
  });

  it('is censored when the window runs past asOf, and uses nothing after asOf', () => {
    const o = outcomes.futureOf(h, 'hitter', 2010, 6, 2013);
    expect(o.censored).toBe(true);
    expect(o.seasons_observed).toBe(3);
    expect(o.top_level_seasons).toBe(2);
    expect(peakOf(o)).toBeCloseTo(opsOf(2013), 6);
    expect(outcomes.futureOf(h, 'hitter', 2010, 6).censored).toBe(false); // the data run to 2018
  });

  it('says no top level and no peak for a player with no top-level line', () => {
    const o = outcomes.futureOf(h, 'pitcher', 2010, 6);
    expect(o.reached_top_level).toBe(false);
    expect(o.first_top_level_season).toBeNull();
    expect(peakOf(o)).toBeNull();
  });

  it('refuses a file naming a player the store does not have', () => {
    expect(() => new Outcomes(file, new Map())).toThrow(StoreError);
  });
});
