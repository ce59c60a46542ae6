import { copyFile, mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildStore } from '../../src/pipeline/buildStore.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { collectForecasts, type RawForecast } from '../../src/outlook/collectForecasts.ts';
import { groupAsOf } from '../../src/outlook/groupAsOf.ts';
import { fitCalibration, calibrateForecast } from '../../src/outlook/calibrateForecast.ts';
import { trainingFor } from '../../src/outlook/runBacktest.ts';
import { DEFAULT_PROSPECT_OPTIONS } from '../../src/jobs/findProspectComps.ts';
import { buildSimStore, type SimStore } from './simStore.ts';

// Rolling origin (Tashman 2000, "Out-of-sample tests of forecasting accuracy"): a forecast made at season t
// may use only what was known at the end of t. Here the same league is built twice, once from its roster cut
// at CUT and once with every later row planted back (the real future: later seasons, promotions, top-level
// lines). The standardisation of profiles and their default weights are made from the whole store at build
// time, so without the per-season replay (groupAsOf) the planted rows would move every earlier forecast.
const CUT = 2018;
let sim: SimStore;
let full: ProfileStore;
let cut: ProfileStore;

async function writeCutRoster(from: string, to: string, last: number): Promise<void> {
  await mkdir(to, { recursive: true });
  for (const file of ['players.csv', 'levels.csv']) await copyFile(join(from, file), join(to, file));
  for (const file of ['batting.csv', 'pitching.csv', 'fielding.csv', 'contracts.csv']) {
    const [head, ...lines] = (await readFile(join(from, file), 'utf8')).split('\n');
    const col = (head ?? '').split(',').indexOf('season');
    const kept = lines.filter((l) => l !== '' && Number(l.split(',')[col]) <= last);
    await writeFile(join(to, file), [head, ...kept].join('\n') + '\n');
  }
}

beforeAll(async () => {
  sim = await buildSimStore();
  full = await openProfileStore(sim.storeDir);
  await writeCutRoster(sim.rosterDir, join(sim.dir, 'cut-roster'), CUT);
  await buildStore(join(sim.dir, 'cut-roster'), join(sim.dir, 'cut-store'), { lenient: false });
  cut = await openProfileStore(join(sim.dir, 'cut-store'));
}, 120_000);
afterAll(() => sim.remove());

/** A forecast without its truth, keyed by player id and season, its figures to 6 decimals (float32 profiles). */
function comparable(store: ProfileStore, rows: readonly RawForecast[]): Map<string, unknown> {
  const r6 = (x: number): number | null => (Number.isFinite(x) ? Math.round(x * 1e6) / 1e6 : null);
  return new Map(rows.map((r) => [
    `${store.players[r.player]?.playerId}|${r.season}|${r.group}`,
    {
      level: r.level, age: r.age, sample: r.sample, used: r.comps.used, effective: r6(r.comps.effective), share: r6(r.comps.share),
      peak: [r.comps.peak.n, r6(r.comps.peak.p10), r6(r.comps.peak.p50), r6(r.comps.peak.p90)],
      seasons: [r.comps.seasons.n, r6(r.comps.seasons.p10), r6(r.comps.seasons.p90)],
      matched: [r.matched.n, r6(r.matched.share)], levelAge: [r.levelAge.n, r6(r.levelAge.share)],
    },
  ]));
}

describe('groupAsOf (the profiles as built at a past season)', () => {
  it('at the last season gives back the stored profiles and weights', () => {
    const g = full.groups.get('IF');
    if (!g) throw new Error('no IF group');
    const last = Math.max(...g.season);
    const v = groupAsOf(full, g, last);
    let worst = 0;
    for (let i = 0; i < g.z.length; i++) {
      const a = g.z[i] as number, b = v.z[i] as number;
      expect(Number.isNaN(a)).toBe(Number.isNaN(b));
      if (!Number.isNaN(a)) worst = Math.max(worst, Math.abs(a - b));
    }
    expect(worst).toBeLessThan(1e-4);
    for (let j = 0; j < g.d; j++) expect(v.redundancy[j]).toBeCloseTo(g.redundancy[j] as number, 5);
  });

  it('leaves out every later row: a row after the season has no profile', () => {
    const g = full.groups.get('SP');
    if (!g) throw new Error('no SP group');
    const v = groupAsOf(full, g, CUT);
    for (let r = 0; r < g.n; r++) if ((g.season[r] as number) > CUT) expect(Number.isNaN(v.z[r * g.d] as number)).toBe(true);
  });

  it('planted future rows change no forecast made up to the cut, nor the calibrated forecasts at the cut (hitters and pitchers)', () => {
    const options = { prospect: DEFAULT_PROSPECT_OPTIONS, groups: ['IF', 'SP'] as const, perSeason: 12, seasons: [2010, CUT] as const };
    const before = collectForecasts(cut, cut.outcomes(), options);
    const after = collectForecasts(full, full.outcomes(), options);
    expect(before.length).toBeGreaterThan(150);
    // the plant is real: the full store knows what followed the cut, the cut one does not
    expect(after.filter((r) => r.season === CUT && r.truth !== null).length).toBeGreaterThan(0);
    expect(before.filter((r) => r.season === CUT && r.truth !== null).length).toBe(0);
    expect(comparable(full, after)).toEqual(comparable(cut, before));
    for (const kind of ['hitter', 'pitcher'] as const) {
      const fitOf = (rows: readonly RawForecast[]) => fitCalibration(trainingFor(rows.filter((r) => r.kind === kind), CUT, 6));
      const at = (rows: readonly RawForecast[]) => rows.filter((r) => r.kind === kind && r.season === CUT);
      const a = at(before).map((r) => calibrateForecast(fitOf(before), r, 6).reached);
      const b = at(after).map((r) => calibrateForecast(fitOf(after), r, 6).reached);
      expect(a.length).toBeGreaterThan(5);
      expect(b.map((x) => x.toFixed(6))).toEqual(a.map((x) => x.toFixed(6)));
    }
  }, 120_000);
});
