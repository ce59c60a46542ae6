import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import type { Roster } from '../../src/ingest/Roster.ts';
import { windowKey, windowRoster } from '../../src/profiles/windowRoster.ts';
import { buildProfiles, buildWindowProfiles } from '../../src/profiles/buildProfiles.ts';
import { DEFAULT_STANDARDISE } from '../../src/profiles/standardiseByStratum.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

/**
 * A hand-made two-season roster (invented players): h1 at AA in 2024 and 2025 (and 2026, and Top in 2025),
 * h2 and h3 at AA both seasons; p1 to p3 starting pitchers at AA both seasons.
 */
const FILES: Record<string, string> = {
  'levels.csv': 'level\nAA\nTop\n',
  'players.csv': ['player_id,name,birth_date', 'h1,Arlo Fenwick,2000-04-01', 'h2,Bram Ostley,2000-05-01', 'h3,Cass Dunmore,2000-06-01',
    'p1,Dov Harrow,1999-04-01', 'p2,Eli Marsk,1999-05-01', 'p3,Fen Quill,1999-06-01'].join('\n'),
  'batting.csv': [
    'player_id,season,level,PA,AB,H,2B,3B,HR,BB,HBP,SF,SO,SB,CS,bbe,ev_avg_mph',
    'h1,2024,AA,500,440,120,25,2,15,50,5,5,100,10,5,330,90.0',
    'h1,2025,AA,400,360,90,20,1,8,30,6,4,90,20,4,260,87.0',
    'h1,2026,AA,300,270,81,10,3,4,24,2,4,45,2,2,210,88.5',
    'h1,2025,Top,100,90,20,4,0,2,8,1,1,30,1,1,60,85.0',
    'h2,2024,AA,400,360,90,20,1,8,30,6,4,90,20,4,260,87.0',
    'h2,2025,AA,420,380,100,21,1,9,31,5,4,80,18,5,270,87.5',
    'h3,2024,AA,300,270,81,10,3,4,24,2,4,45,2,2,210,88.5',
    'h3,2025,AA,310,280,70,12,2,5,25,1,4,60,3,1,220,88.0',
  ].join('\n'),
  'fielding.csv': [
    'player_id,season,level,pos,inn,PO,A,E',
    'h1,2024,AA,LF,900.0,180,8,3', 'h1,2025,AA,LF,800.1,150,6,1', 'h1,2026,AA,LF,600.0,120,9,4', 'h1,2025,Top,LF,200.0,40,1,1',
    'h2,2024,AA,CF,800.0,220,5,2', 'h2,2025,AA,CF,820.0,210,6,3',
    'h3,2024,AA,RF,600.0,120,9,4', 'h3,2025,AA,RF,650.0,125,8,2',
  ].join('\n'),
  'pitching.csv': [
    'player_id,season,level,G,GS,IP,BF,H,HR,BB,HBP,SO,ER,fb_mph',
    'p1,2024,AA,25,25,150.0,620,130,15,45,5,160,60,94.0',
    'p1,2025,AA,20,20,100.1,380,90,9,30,3,100,40,95.0',
    'p2,2024,AA,22,22,120.0,510,115,12,40,4,110,55,92.0',
    'p2,2025,AA,21,21,118.0,500,110,11,38,4,115,50,92.5',
    'p3,2024,AA,18,18,90.0,390,95,11,35,3,70,50,90.0',
    'p3,2025,AA,19,19,95.0,400,96,10,34,3,75,48,90.5',
  ].join('\n'),
};

let roster: Roster;

beforeAll(async () => {
  const dir = await scratchDir('kindred-window-roster-');
  await mkdir(join(dir, 'roster'));
  for (const [name, text] of Object.entries(FILES)) await writeFile(join(dir, 'roster', name), `${text}\n`);
  roster = await readRoster(join(dir, 'roster'), { lenient: false });
});

const battingOf = (r: Roster, id: string, season: number, level = 'AA') => {
  const b = r.batting.find((x) => x.playerId === id && x.season === season && x.level === level);
  if (!b) throw new Error(`no batting for ${id} ${season} ${level}`);
  return b;
};

describe('windowRoster(roster, 2): a line with the same player\u2019s line at its level the season before', () => {
  it('adds up the counts of h1 2024 and 2025 at AA (500 + 400 PA, 120 + 90 H, 50 + 30 BB, ...) and keeps the 2025 key', () => {
    const b = battingOf(windowRoster(roster, 2).roster, 'h1', 2025);
    expect([b.season, b.level, b.PA, b.AB, b.H, b.doubles, b.triples, b.HR, b.BB, b.HBP, b.SF, b.SO, b.SB, b.CS, b.bbe]).toEqual(
      [2025, 'AA', 900, 800, 210, 45, 3, 23, 80, 11, 9, 190, 30, 9, 590],
    );
  });
  it('weights a timed measurement by its events: exit velocity by batted-ball events, (90.0 * 330 + 87.0 * 260) / 590', () => {
    expect(battingOf(windowRoster(roster, 2).roster, 'h1', 2025).evAvgMph).toBeCloseTo((90 * 330 + 87 * 260) / 590, 10);
  });
  it('sums the pitchers\u2019 outs (150.0 + 100.1 innings = 751 outs) and weights fastball velocity by batters faced', () => {
    const p = windowRoster(roster, 2).roster.pitching.find((x) => x.playerId === 'p1' && x.season === 2025);
    expect(p?.outs).toBe(450 + 301);
    expect(p?.BF).toBe(1000);
    expect(p?.fbMph).toBeCloseTo((94 * 620 + 95 * 380) / 1000, 10);
  });
  it('combines fielding per position: h1 LF at AA, 900.0 + 800.1 innings = 5101 outs, 180 + 150 PO', () => {
    const f = windowRoster(roster, 2).roster.fielding.find((x) => x.playerId === 'h1' && x.season === 2025 && x.level === 'AA');
    expect([f?.outs, f?.PO, f?.A, f?.E]).toEqual([2700 + 2401, 330, 14, 4]);
  });
  it('never includes a season after the target season: the 2024 window holds 2024 alone, the 2025 window not 2026', () => {
    const w = windowRoster(roster, 3);
    expect(battingOf(w.roster, 'h1', 2024)).toEqual(battingOf(roster, 'h1', 2024));
    expect(battingOf(w.roster, 'h1', 2025).PA).toBe(900);
    expect(battingOf(w.roster, 'h1', 2026).PA).toBe(1200);
    expect(w.firstSeason.get(windowKey('h1', 2024, 'AA'))).toBe(2024);
    expect(w.firstSeason.get(windowKey('h1', 2025, 'AA'))).toBe(2024);
    expect(w.firstSeason.get(windowKey('h1', 2026, 'AA'))).toBe(2024);
  });
  it('keeps other levels apart: h1\u2019s 2025 Top line stays his Top season alone', () => {
    expect(battingOf(windowRoster(roster, 2).roster, 'h1', 2025, 'Top')).toEqual(battingOf(roster, 'h1', 2025, 'Top'));
  });
  it('with recency weights counts a season a seasons back at decay^a of its events: h1 2026 over 3 seasons at 0.5', () => {
    // hand-worked: PA 300 + 0.5 * 400 + 0.25 * 500 = 625, H 81 + 45 + 30 = 156, bbe 210 + 130 + 82.5 = 422.5
    // rounded to 423, triples 3 + 0.5 + 0.5 = 4; exit velocity weighted by the weighted batted-ball events:
    // (88.5 * 210 + 87.0 * 130 + 90.0 * 82.5) / 422.5
    const b = battingOf(windowRoster(roster, 3, 0.5).roster, 'h1', 2026);
    expect([b.PA, b.H, b.bbe, b.triples]).toEqual([625, 156, 423, 4]);
    expect(b.evAvgMph).toBeCloseTo((88.5 * 210 + 87 * 130 + 90 * 82.5) / 422.5, 10);
    expect(battingOf(windowRoster(roster, 3, 1).roster, 'h1', 2026).PA).toBe(1200);
  });
  it('leaves the roster as it is with window 1, and refuses a window below 1', () => {
    expect(windowRoster(roster, 1).roster).toBe(roster);
    expect(() => windowRoster(roster, 0)).toThrow(RangeError);
  });
});

describe('buildWindowProfiles(roster, options, 2, single)', () => {
  const options = { minimums: { minPa: 30, minBf: 30 }, standardise: DEFAULT_STANDARDISE };
  it('recomputes OBP on the combined counts (Official Baseball Rules: (H + BB + HBP) / (AB + BB + HBP + SF)), not as the mean of the two seasons', () => {
    const single = buildProfiles(roster, options);
    const of = buildWindowProfiles(roster, options, 2, single).groups.get('OF');
    if (!of) throw new Error('no OF window profiles');
    const row = of.meta.findIndex((m) => m.playerId === 'h1' && m.season === 2025 && m.level === 'AA');
    const j = of.dims.findIndex((d) => d.name === 'obp');
    // hand-worked: (210 + 80 + 11) / (800 + 80 + 11 + 9) = 301 / 900; the seasons alone are 175 / 500 and 126 / 400
    expect(of.raw[row * of.dims.length + j]).toBeCloseTo(301 / 900, 6);
    expect(301 / 900).not.toBeCloseTo((175 / 500 + 126 / 400) / 2, 3);
    expect(of.meta[row]?.sample).toBe(900);
    expect(of.window?.size).toBe(2);
    expect(of.window?.first[row]).toBe(2024);
  });
  it('takes the age at the window\u2019s last season (June 30, 2025 for h1, born 2000-04-01: 25)', () => {
    const single = buildProfiles(roster, options);
    const of = buildWindowProfiles(roster, options, 2, single).groups.get('OF');
    expect(of?.meta.find((m) => m.playerId === 'h1' && m.season === 2025 && m.level === 'AA')?.age).toBe(25);
  });
  it('keeps the single seasons\u2019 default weights when asked (windowWeights single), and window 1 is the single seasons themselves', () => {
    const single = buildProfiles(roster, options);
    const w = buildWindowProfiles(roster, { ...options, windowWeights: 'single' }, 2, single);
    expect(w.groups.get('SP')?.redundancy).toBe(single.groups.get('SP')?.redundancy);
    expect(buildWindowProfiles(roster, options, 2, single).groups.get('SP')?.redundancy).not.toBe(single.groups.get('SP')?.redundancy);
    expect(buildWindowProfiles(roster, options, 1, single)).toEqual(single);
  });
});
