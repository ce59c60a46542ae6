import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { readRoster } from '../../src/ingest/readRoster.ts';
import type { Roster } from '../../src/ingest/Roster.ts';
import { assembleSeasons } from '../../src/profiles/assembleSeasons.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

/**
 * A hand-made roster (invented players) for the rules of assembleSeasons (project rules, written in its
 * doc comment): a season's position is the fielding position with the most innings at that season and
 * level, ties to the more demanding position (C, SS, 2B, CF, 3B, RF, LF, 1B); no fielding row makes a DH;
 * SP when at least half the games are starts; a player batting and pitching at one level is a hitter
 * too only when his PA reach his BF.
 */
const FILES: Record<string, string> = {
  'levels.csv': 'level\nAA\nTop\n',
  'players.csv': ['player_id,name,birth_date', 'h1,Arlo Fenwick,2000-04-01', 'h2,Bram Ostley,2000-08-01', 'h3,Cass Dunmore,2000-06-01',
    'w1,Dov Harrow,1999-04-01', 'w2,Eli Marsk,1999-05-01'].join('\n'),
  'batting.csv': [
    'player_id,season,level,PA,AB,H,2B,3B,HR,BB,HBP,SF,SO',
    'h1,2024,AA,500,440,120,25,2,15,50,5,5,100',
    'h1,2025,AA,400,360,90,20,1,8,30,6,4,90',
    'h1,2025,Top,100,90,20,4,0,2,8,1,1,30',
    'h2,2025,AA,420,380,100,21,1,9,31,5,4,80',
    'h3,2025,AA,310,280,70,12,2,5,25,1,4,60',
    'h3,2026,AA,20,18,4,1,0,0,2,0,0,5',
    'w1,2025,AA,100,90,25,5,0,3,8,1,1,20',
    'w2,2025,AA,300,270,75,12,1,6,25,2,3,50',
  ].join('\n'),
  'fielding.csv': [
    'player_id,season,level,pos,inn,PO,A,E',
    // h1 2024 AA: 1B has the most innings; his 2025 rows and his Top row must not count for 2024
    'h1,2024,AA,LF,300.0,60,2,1', 'h1,2024,AA,1B,700.0,600,40,4',
    'h1,2025,AA,LF,800.1,150,6,1', 'h1,2025,AA,1B,100.0,90,5,1', 'h1,2025,Top,SS,200.0,40,60,3',
    // h2 2025 AA: SS and 2B tie on innings: SS, the more demanding position
    'h2,2025,AA,2B,500.0,100,150,5', 'h2,2025,AA,SS,500.0,90,160,6',
    'w2,2025,AA,RF,400.0,80,4,2',
  ].join('\n'),
  'pitching.csv': [
    'player_id,season,level,G,GS,IP,BF,H,HR,BB,HBP,SO,ER',
    // w1: BF 620 above his 100 PA, a pitcher batting; w2: BF 250 below his 300 PA, a true two-way season
    'w1,2025,AA,25,25,150.0,620,130,15,45,5,160,60',
    'w2,2025,AA,30,14,60.0,250,60,6,20,2,50,25',
  ].join('\n'),
};

let roster: Roster;

beforeAll(async () => {
  const dir = await scratchDir('kindred-assemble-');
  await mkdir(join(dir, 'roster'));
  for (const [name, text] of Object.entries(FILES)) await writeFile(join(dir, 'roster', name), `${text}\n`);
  roster = await readRoster(join(dir, 'roster'), { lenient: false });
});

const hitter = (id: string, season: number, level = 'AA') => assembleSeasons(roster).hitters.find((h) => h.meta.playerId === id && h.meta.season === season && h.meta.level === level);

describe('assembleSeasons(roster, minimums)', () => {
  it('takes the position with the most innings at that season and level only (h1: 1B in 2024, LF in 2025 at AA, SS at Top)', () => {
    expect(hitter('h1', 2024)?.meta.position).toBe('1B');
    expect(hitter('h1', 2024)?.line.fielding?.outs).toBe(2100);
    expect(hitter('h1', 2025)?.meta.position).toBe('LF');
    expect(hitter('h1', 2025, 'Top')?.meta.position).toBe('SS');
  });

  it('breaks a tie on innings by the more demanding position (SS before 2B), and makes a hitter without fielding a DH', () => {
    expect(hitter('h2', 2025)?.meta.position).toBe('SS');
    expect(hitter('h3', 2025)?.meta.position).toBe('DH');
    expect(hitter('h3', 2025)?.line.fielding).toBeUndefined();
  });

  it('skips a pitcher batting (BF 620 > PA 100) and keeps a two-way season as hitter and pitcher (PA 300 >= BF 250)', () => {
    const a = assembleSeasons(roster);
    expect(a.hitters.some((h) => h.meta.playerId === 'w1')).toBe(false);
    expect(a.skipped.pitchersBatting).toBe(1);
    expect(hitter('w2', 2025)?.meta.position).toBe('RF');
    expect(a.pitchers.map((p) => [p.meta.playerId, p.meta.position])).toEqual([['w1', 'SP'], ['w2', 'RP']]);
  });

  it('leaves out seasons under the minimum (h3 2026: 20 PA under 30), and takes the age on June 30 (h2, born 2000-08-01: 24 in 2025)', () => {
    const a = assembleSeasons(roster, { minPa: 30, minBf: 30 });
    expect(a.skipped.hittersBelowMinimum).toBe(1);
    expect(hitter('h3', 2026)).toBeUndefined();
    expect(hitter('h2', 2025)?.meta.age).toBe(24);
  });

  it('assembles only the kinds asked for, with the other kind empty and its skipped counts 0', () => {
    const pitchers = assembleSeasons(roster, undefined, ['pitchers']);
    expect(pitchers.hitters).toEqual([]);
    expect(pitchers.pitchers).toHaveLength(2);
    expect(pitchers.skipped).toEqual({ hittersBelowMinimum: 0, pitchersBelowMinimum: 0, pitchersBatting: 0 });
    const hitters = assembleSeasons(roster, undefined, ['hitters']);
    expect(hitters.pitchers).toEqual([]);
    expect(hitters.skipped.pitchersBatting).toBe(1);
  });
});
