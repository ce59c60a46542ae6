import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { ProfileStore } from '../../src/store/ProfileStore.ts';
import type { Outcomes } from '../../src/outlook/Outcomes.ts';
import { evaluateOutlook, type OutlookEvaluation } from '../../src/outlook/evaluateOutlook.ts';
import { DEFAULT_PROSPECT_OPTIONS } from '../../src/jobs/findProspectComps.ts';
import { buildSimStore, type SimStore } from './simStore.ts';

// The honesty check on a small simulated league (the bigger one is bench/outlook.bench.ts): prospects
// whose own follow-up is in the data are forecast from comps with outcomes cut off at their season.
let sim: SimStore;
let store: ProfileStore;
let outcomes: Outcomes;
let ev: OutlookEvaluation;

beforeAll(async () => {
  sim = await buildSimStore();
  store = await openProfileStore(sim.storeDir);
  outcomes = store.outcomes();
  ev = evaluateOutlook(store, outcomes, { prospect: DEFAULT_PROSPECT_OPTIONS });
  const line = (k: string, e: OutlookEvaluation['hitter']): string =>
    `${k}: ${e.targets} targets, Brier ${e.brier.comps.toFixed(4)} (base rate ${e.brier.baseline.toFixed(4)}), p10-p90 coverage ${e.peakCoverage.comps.toFixed(2)} of ${e.peakCoverage.n}, Spearman p50 ${e.peakSpearman.comps.toFixed(2)} (${e.peakSpearman.baseline.toFixed(2)}), top-level seasons ${e.seasonsSpearman.comps.toFixed(2)} (${e.seasonsSpearman.baseline.toFixed(2)})`;
  console.log(`honesty check, small league\n${line('hitters', ev.hitter)}\n${line('pitchers', ev.pitcher)}`);
});
afterAll(() => sim.remove());

describe('evaluateOutlook(store, outcomes, options)', () => {
  it('forecasts hundreds of held-out prospects, nearly all of them with comps', () => {
    expect(ev.hitter.targets).toBeGreaterThan(200);
    expect(ev.pitcher.targets).toBeGreaterThan(100);
    // a prospect whom no earlier player resembles more than chance (likeness 100 / e) gets no comps: under one in ten
    expect(ev.withoutComps).toBeLessThan(0.1 * (ev.hitter.targets + ev.pitcher.targets));
  });

  it('beats a single league-wide rate on the Brier score of reaching the top level', () => {
    for (const e of [ev.hitter, ev.pitcher]) {
      const climatology = e.reachedShare * (1 - e.reachedShare); // Brier of always forecasting the overall share
      expect(e.brier.comps).toBeLessThan(climatology);
    }
  });

  it('orders the prospects: top-level seasons forecast and truth are clearly rank-correlated', () => {
    expect(ev.hitter.seasonsSpearman.comps).toBeGreaterThan(0.3);
    expect(ev.pitcher.seasonsSpearman.comps).toBeGreaterThan(0.3);
  });

  it('gives p10 to p90 ranges that hold the true top-level seasons count most of the time', () => {
    expect(ev.hitter.seasonsCoverage.comps).toBeGreaterThan(0.7);
    expect(ev.pitcher.seasonsCoverage.comps).toBeGreaterThan(0.7);
    expect(ev.hitter.peakCoverage.n).toBeGreaterThan(10);
  });
});
