import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import { backtestStore } from '../../src/outlook/backtestStore.ts';
import type { BacktestResult } from '../../src/outlook/runBacktest.ts';
import { buildSimStore, type SimStore } from './simStore.ts';

// The honest skill check: the calibrated probability against the level-and-age base rate (the same pool
// rules, the rate known at each cut; not an in-sample constant), replayed by rolling origin on a league
// of 15,000 player-seasons (the simulator's defaults). Reference figures: Brier (1950) and its skill
// score 1 - BS / BS_ref; the interval is a percentile bootstrap (Efron and Tibshirani 1993).
let sim: SimStore;
let result: BacktestResult;

beforeAll(async () => {
  sim = await buildSimStore({ seed: 101, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 15000 });
  const store = await openProfileStore(sim.storeDir);
  const outcomes = store.outcomes();
  result = backtestStore(store, outcomes, { perSeason: 60, rounds: 200 }).result;
  for (const k of result.kinds) {
    console.log(`${k.kind}: cov [${k.peakCoverage.low.toFixed(2)}, ${k.peakCoverage.high.toFixed(2)}] n ${k.peakTargets} ${k.targets} at cuts ${result.cuts.join(',')}, Brier ${k.brier.calibrated.toFixed(4)} vs level-and-age ${k.brier.levelAge.toFixed(4)}, skill ${k.skillVsLevelAge.value.toFixed(3)} [${k.skillVsLevelAge.low.toFixed(3)}, ${k.skillVsLevelAge.high.toFixed(3)}], raw comps' share ${k.brier.comps.toFixed(4)}, REL ${k.murphy.reliability.toFixed(4)}, peak coverage ${k.peakCoverage.value.toFixed(2)}`);
  }
}, 600_000);
afterAll(() => sim.remove());

describe('backtestStore on a league large enough for the sign to be stable', () => {
  it('scores hundreds of hitters and pitchers at several cuts', () => {
    expect(result.cuts.length).toBeGreaterThanOrEqual(3);
    for (const kind of ['hitter', 'pitcher'] as const) expect(result.kinds.find((k) => k.kind === kind)?.targets ?? 0).toBeGreaterThan(300);
  });

  it('hitters and pitchers: the calibrated probability beats the level-and-age base rate (skill and its 95% interval above 0)', () => {
    for (const kind of ['hitter', 'pitcher'] as const) {
      const k = result.kinds.find((x) => x.kind === kind);
      expect(k?.skillVsLevelAge.value ?? -1, kind).toBeGreaterThan(0);
      expect(k?.skillVsLevelAge.low ?? -1, kind).toBeGreaterThan(0);
    }
  });

  it('both: calibration keeps the forecasts reliable (Murphy reliability under 0.015)', () => {
    for (const k of result.kinds) expect(k.murphy.reliability).toBeLessThan(0.015);
  });

  it('pitchers: the peak ranges hold their nominal 80% (the bootstrap interval of the coverage contains 0.8)', () => {
    const p = result.kinds.find((k) => k.kind === 'pitcher');
    expect(p?.peakCoverage.low ?? 1).toBeLessThan(0.8);
    expect(p?.peakCoverage.high ?? 0).toBeGreaterThan(0.8);
  });

  it('hitters: the peak ranges cover less than their nominal 80% on this league (a known gap, docs/jobs.md), but more than half', () => {
    const h = result.kinds.find((k) => k.kind === 'hitter');
    expect(h?.peakCoverage.value ?? 0).toBeGreaterThan(0.5);
    expect(h?.peakCoverage.value ?? 1).toBeLessThan(0.8);
  });
});
