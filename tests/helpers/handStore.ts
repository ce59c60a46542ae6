/** A hand-made roster of three outfielders and three starting pitchers (one invented season and level), built into a store. */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { DEFAULT_STANDARDISE } from '../../src/profiles/standardiseByStratum.ts';
import { scratchDir } from './scratchDir.ts';

export const HAND_ROSTER: Record<string, string> = {
  'levels.csv': 'level\nHigh\nTop\n',
  'players.csv': [
    'player_id,name,birth_date',
    'h1,Arlo Fenwick,2000-04-01',
    'h2,Bram Ostley,2000-05-01',
    'h3,Cass Dunmore,2000-06-01',
    'p1,Dov Harrow,1999-04-01',
    'p2,Eli Marsk,1999-05-01',
    'p3,Fen Quill,1999-06-01',
  ].join('\n'),
  'batting.csv': [
    'player_id,season,level,PA,AB,H,2B,3B,HR,BB,HBP,SF,SO,SB,CS,bbe,ev_avg_mph',
    'h1,2024,High,500,440,120,25,2,15,50,5,5,100,10,5,330,90.0',
    'h2,2024,High,400,360,90,20,1,8,30,6,4,90,20,4,260,87.0',
    'h3,2024,High,300,270,81,10,3,4,24,2,4,45,2,2,210,88.5',
  ].join('\n'),
  'fielding.csv': [
    'player_id,season,level,pos,inn,PO,A,E',
    'h1,2024,High,LF,900.0,180,8,3',
    'h2,2024,High,CF,800.0,220,5,2',
    'h3,2024,High,RF,600.0,120,9,4',
  ].join('\n'),
  'pitching.csv': [
    'player_id,season,level,G,GS,IP,BF,H,HR,BB,HBP,SO,ER',
    'p1,2024,High,25,25,150.0,620,130,15,45,5,160,60',
    'p2,2024,High,22,22,120.0,510,115,12,40,4,110,55',
    'p3,2024,High,18,18,90.0,390,95,11,35,3,70,50',
  ].join('\n'),
};

/** The hand-made roster written as CSV files, built (sample minimums 30 PA / 30 BF) and loaded. */
export async function handStore(): Promise<ProfileStore> {
  const dir = await scratchDir('kindred-hand-roster-');
  const roster = join(dir, 'roster');
  await mkdir(roster);
  for (const [name, text] of Object.entries(HAND_ROSTER)) await writeFile(join(roster, name), `${text}\n`);
  await buildStore(roster, join(dir, 'store'), {
    lenient: false,
    profile: { minimums: { minPa: 30, minBf: 30 }, standardise: DEFAULT_STANDARDISE },
  });
  return openProfileStore(join(dir, 'store'));
}
