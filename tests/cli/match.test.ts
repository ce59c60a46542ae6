import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parse } from 'csv-parse/sync';
import { runCli } from '../helpers/runCli.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';
import { matchResultSchema } from '../outlook/outlookContract.ts';
import { compsResultSchema } from './compsContract.ts';

let sim: SimStore;
let store: string;
let target = '';
let first = { id: '', season: 0 };
let tenth = { id: '', season: 0 };
let hitter = '';
let second = '';

beforeAll(async () => {
  sim = await buildSimStore();
  store = sim.storeDir;
  const { openProfileStore } = await import('../../src/store/openProfileStore.ts');
  const s = await openProfileStore(store);
  const g = s.groups.get('SP');
  const top = s.levels.indexOf('Top');
  for (let i = 0; g && i < g.n; i++) if (g.level[i] === top) target = s.players[g.player[i] as number]?.playerId ?? '';
  hitter = s.players[s.groups.get('OF')?.player[0] ?? 0]?.playerId ?? '';
  const comps = compsResultSchema.parse(JSON.parse((await runCli('comps', target, '--store', store, '--format', 'json', '--k', '10', '--exact')).stdout));
  first = { id: comps.comps[0]?.player_id ?? '', season: comps.comps[0]?.season ?? 0 };
  tenth = { id: comps.comps[9]?.player_id ?? '', season: comps.comps[9]?.season ?? 0 };
  second = comps.comps[1]?.player_id ?? '';
});
afterAll(() => sim.remove());

const json = async (...args: string[]): Promise<ReturnType<typeof matchResultSchema.parse>> => {
  const out = await runCli('match', ...args, '--store', store, '--format', 'json');
  expect(out.stderr).toBe('');
  expect(out.code).toBe(0);
  return matchResultSchema.parse(JSON.parse(out.stdout));
};

describe('kindred match <player-a> <player-b>', () => {
  it('ranks the top comp first and the tenth tenth, with the percentile of the pool they beat', async () => {
    const a = await json(target, first.id, '--season-b', String(first.season), '--exact');
    expect(a.query.player_id).toBe(target);
    expect(a.candidate).toMatchObject({ player_id: first.id, season: first.season, rank: 1, more_alike: 0 });
    const b = await json(target, tenth.id, '--season-b', String(tenth.season), '--exact');
    expect(b.candidate.rank).toBe(10);
    expect(b.candidate.percentile).toBeCloseTo((100 * b.candidate.less_alike) / b.candidate.pool_players, 1);
    expect(b.candidate.percentile ?? 0).toBeLessThan(a.candidate.percentile ?? 0);
    // the closest other player: the second comp, never the candidate himself
    expect(a.closest?.player_id).toBe(second);
    expect(b.closest?.player_id).toBe(first.id);
  });

  it('prints the likeness, the standing and every dimension with grades', async () => {
    const out = await runCli('match', target, tenth.id, '--store', store);
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/^.* \(p\d+\), \d{4}(-\d{2})? \w+ (SP|RP)/);
    expect(out.stdout).toMatch(/Likeness \d+ /);
    expect(out.stdout).toMatch(/In the pool: rank [\d,]+ of [\d,]+ players, more alike than [\d.]+% of the others/);
    expect(out.stdout).toMatch(/K% +\.\d{3} \(\d{2}\) +\.\d{3} \(\d{2}\)/);
  });

  it('--want with --position stands in for player-a', async () => {
    const r = await json('--want', 'k_pct=.28,bb_pct=.07', '--position', 'SP', first.id);
    expect(r.query.kind).toBe('want');
    expect(r.candidate.coverage).toBe(1);
    expect(r.candidate.dimensions.filter((d) => !d.missing).map((d) => d.name).sort()).toEqual(['bb_pct', 'k_pct']);
  });

  it('--format csv gives one row per dimension', async () => {
    const out = await runCli('match', target, first.id, '--store', store, '--format', 'csv');
    const rows: string[][] = parse(out.stdout);
    expect(rows[0]).toEqual(expect.arrayContaining(['dimension', 'target_grade', 'candidate_grade', 'share', 'percentile']));
    expect(rows.length).toBeGreaterThan(5);
  });

  it('--batch compares each candidate of the file with the one target', async () => {
    const file = join(sim.dir, 'candidates.csv');
    await writeFile(file, `player_id,season\n${first.id},${first.season}\n${hitter},\n`);
    const out = await runCli('match', target, '--batch', file, '--store', store);
    const lines = out.stdout.trim().split('\n').map((l) => JSON.parse(l) as { candidate?: { rank: number }; error?: { code: string } });
    expect(lines[0]?.candidate?.rank).toBe(1);
    expect(lines[1]?.error?.code).toBe('kindred.query.noSeason'); // an outfielder has no SP profile
    expect(out.code).toBe(1);
  });

  it('exits 2 without a candidate or with --want and two players, 1 for an unknown candidate', async () => {
    expect((await runCli('match', target, '--store', store)).code).toBe(2);
    expect((await runCli('match', '--want', 'k_pct=.28', '--position', 'SP', target, first.id, '--store', store)).code).toBe(2);
    expect((await runCli('match', target, first.id, '--store', store, '--level-b', 'ZZ')).code).toBe(2);
    const unknown = await runCli('match', target, 'Nobody Atall', '--store', store);
    expect(unknown.code).toBe(1);
    expect(unknown.stderr).toMatch(/kindred\.query\.unknownPlayer/);
  });
});
