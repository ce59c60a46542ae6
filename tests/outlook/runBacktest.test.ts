import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import { decodeOutcomesFile as parseOutcomesFile } from '../../src/store/outcomesFile.ts';
import { Outcomes } from '../../src/outlook/Outcomes.ts';
import { OUTCOMES_FILE } from '../../src/store/storeFileNames.ts';
import { collectForecasts, type RawForecast } from '../../src/outlook/collectForecasts.ts';
import { runBacktest, trainingFor } from '../../src/outlook/runBacktest.ts';
import { DEFAULT_PROSPECT_OPTIONS } from '../../src/jobs/findProspectComps.ts';
import { buildSimStore, type SimStore } from './simStore.ts';

// Rolling origin (Tashman 2000): nothing after a cut may influence that cut's forecasts. A top-level
// season planted after the cut changes the roster's outcomes, but not what the backtest said at the cut.
const CUT = 2020;
let sim: SimStore;
let store: ProfileStore;
let outcomes: Outcomes;
let planted: Outcomes;
let plantedId = '';

beforeAll(async () => {
  sim = await buildSimStore();
  store = await openProfileStore(sim.storeDir);
  outcomes = store.outcomes();
  const file = parseOutcomesFile(await store.opened.readText(OUTCOMES_FILE), OUTCOMES_FILE);
  // A hitter who was a prospect before the cut and never reached the top level gets a star season after it.
  const g = store.groups.get('IF');
  if (!g) throw new Error('no IF group');
  const reachedIds = new Set(file.batting.map((b) => b[0]));
  for (let i = 0; i < g.n && plantedId === ''; i++) {
    const id = store.players[g.player[i] ?? -1]?.playerId ?? '';
    if ((g.season[i] ?? 0) === CUT - 6 && !reachedIds.has(id)) plantedId = id;
  }
  planted = new Outcomes({ ...file, batting: [...file.batting, [plantedId, CUT + 1, 620, 175]] }, store.playerById);
});
afterAll(() => sim.remove());

const withoutTruth = (rows: readonly RawForecast[]): unknown[] => rows.map(({ truth: _truth, ...rest }) => rest);

describe('collectForecasts and runBacktest (rolling origin)', () => {
  it('a planted top-level season after the cut changes the outcomes but no forecast made up to the cut, nor the cut\'s calibrated forecasts', () => {
    expect(plantedId).not.toBe('');
    const p = store.playerById.get(plantedId) ?? -1;
    // the plant is real: seen from the end of the data, the player now reached the top level
    expect(outcomes.futureOf(p, 'hitter', CUT - 2, 6).reached_top_level).toBe(false);
    expect(planted.futureOf(p, 'hitter', CUT - 2, 6).reached_top_level).toBe(true);
    const options = { prospect: DEFAULT_PROSPECT_OPTIONS, groups: ['IF'] as const, perSeason: 40, seasons: [2009, CUT] as const };
    const before = collectForecasts(store, outcomes, options);
    const after = collectForecasts(store, planted, options);
    expect(withoutTruth(after)).toEqual(withoutTruth(before));
    // the training rows of the cut (follow-up over by the cut) carry the same truth too
    expect(trainingFor(after, CUT, 6).map((r) => r.truth)).toEqual(trainingFor(before, CUT, 6).map((r) => r.truth));
    const a = runBacktest(before, outcomes.lastSeason, { horizon: 6, cuts: [CUT], minTraining: 15, rounds: 20 });
    const b = runBacktest(after, planted.lastSeason, { horizon: 6, cuts: [CUT], minTraining: 15, rounds: 20 });
    const forecasts = (r: typeof a): number[] => r.kinds.flatMap((k) => k.scored.map((s) => s.reachedForecast));
    expect(forecasts(a).length).toBeGreaterThan(10);
    expect(forecasts(b)).toEqual(forecasts(a));
  });

  it('says plainly when a roster is too short for any cut', () => {
    const rows = collectForecasts(store, outcomes, { prospect: DEFAULT_PROSPECT_OPTIONS, groups: ['SP'], perSeason: 10, seasons: [2009, 2012] });
    const r = runBacktest(rows, outcomes.lastSeason, { horizon: 6, minTraining: 100 });
    expect(r.kinds).toEqual([]);
    expect(r.tooShort).toMatch(/no cut season could be scored/);
  });
});
