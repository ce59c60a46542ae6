import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';
import { buildSimStore, type SimStore } from '../outlook/simStore.ts';
import { storeBacktest } from '../../src/cli/commands/storeBacktest.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';

let sim: SimStore;
let charts: string;
let prospectId = '';

beforeAll(async () => {
  sim = await buildSimStore();
  charts = await mkdtemp(join(tmpdir(), 'kindred-charts-'));
  const store = await openProfileStore(sim.storeDir);
  const g = store.groups.get('IF');
  const aa = store.levels.indexOf('High');
  for (let i = 0; g && i < g.n && prospectId === ''; i++) if (g.season[i] === 2026 && g.level[i] === aa && !Number.isNaN(g.age[i] ?? NaN)) prospectId = store.players[g.player[i] ?? -1]?.playerId ?? '';
}, 300_000);
afterAll(async () => {
  await sim.remove();
  await rm(charts, { recursive: true, force: true });
});

describe('kindred backtest', () => {
  it('prints the replay as JSON with skill, Murphy terms, coverage and counts per cut, and writes the SVG charts', async () => {
    const out = await runCli('backtest', '--store', sim.storeDir, '--format', 'json', '--charts', charts);
    expect(out.code).toBe(0);
    const json: unknown = JSON.parse(out.stdout);
    expect(json).toMatchObject({ format: 'kindred-backtest', horizon: 6 });
    const file = json as { kinds: { kind: string; skill_vs_level_age: { value: number }; reliability: number; cuts: unknown[] }[]; too_short: string | null };
    expect(file.too_short).toBeNull();
    expect(file.kinds.map((k) => k.kind)).toEqual(['hitter', 'pitcher']);
    for (const k of file.kinds) {
      expect(Number.isFinite(k.skill_vs_level_age.value)).toBe(true);
      expect(k.reliability).toBeGreaterThanOrEqual(0);
      expect(k.cuts.length).toBeGreaterThan(0);
    }
    const svgs = (await readdir(charts)).sort();
    expect(svgs).toEqual(['coverage-hitters.svg', 'coverage-pitchers.svg', 'reliability-hitters.svg', 'reliability-pitchers.svg']);
  }, 300_000);

  it('keeps to one group with --group and says plainly when the chosen cuts cannot be scored', async () => {
    const out = await runCli('backtest', '--store', sim.storeDir, '--group', 'pitchers', '--cuts', '2005');
    expect(out.code).toBe(0);
    expect(out.stdout).toMatch(/too short for a backtest/);
    expect((await runCli('backtest', '--store', sim.storeDir, '--group', 'catchers')).code).toBe(2);
    expect((await runCli('backtest', '--store', sim.storeDir, '--cuts', 'soon')).code).toBe(2);
  }, 300_000);

  it('prospect: no calibrated outlook before the backtest is stored, one after, with the backtest figures beside it', async () => {
    expect(prospectId).not.toBe('');
    const before = JSON.parse((await runCli('prospect', prospectId, '--store', sim.storeDir, '--format', 'json')).stdout) as { outlook: { calibrated: unknown; calibration_note: string } };
    expect(before.outlook.calibrated).toBeNull();
    expect(before.outlook.calibration_note).toMatch(/no backtest stored/);
    await storeBacktest(sim.storeDir, { stdout: { write: () => true }, stderr: { write: () => true }, isTTY: false });
    const after = await runCli('prospect', prospectId, '--store', sim.storeDir, '--format', 'json');
    const json = JSON.parse(after.stdout) as { outlook: { calibrated: { reached_top_level: number; backtest: { cuts: number[] }; method: string } | null } };
    expect(json.outlook.calibrated?.reached_top_level).toBeGreaterThan(0);
    expect(json.outlook.calibrated?.reached_top_level).toBeLessThan(1);
    expect(json.outlook.calibrated?.backtest.cuts.length).toBeGreaterThan(0);
    expect(json.outlook.calibrated?.method).toMatch(/split conformal/);
    const table = await runCli('prospect', prospectId, '--store', sim.storeDir);
    expect(table.stdout).toMatch(/Replay: [\d,]+ hitter prospects, \d+% reached the top level/);
    expect(table.stdout).toMatch(/not what this one will do/);
    // fewer comps listed than the backtest used: still calibrated, on the backtest's number of comps, and the same
    const five = JSON.parse((await runCli('prospect', prospectId, '--store', sim.storeDir, '--k', '5', '--format', 'json')).stdout) as typeof json & { comps: unknown[] };
    expect(five.comps).toHaveLength(5);
    expect(five.outlook.calibrated?.reached_top_level).toBe(json.outlook.calibrated?.reached_top_level);
    expect(five.outlook.calibrated?.method).toMatch(/of his 25 closest comps/);
    // another horizon than the backtest's: shown uncalibrated, with the reason
    const other = JSON.parse((await runCli('prospect', prospectId, '--store', sim.storeDir, '--horizon', '4', '--format', 'json')).stdout) as { outlook: { calibrated: unknown; calibration_note: string } };
    expect(other.outlook.calibrated).toBeNull();
    expect(other.outlook.calibration_note).toMatch(/--horizon 6/);
  }, 300_000);
});
