import { describe, expect, it } from 'vitest';
import { summariseOutlook, peakSummaryOf } from '../../src/outlook/summariseOutlook.ts';
import type { HitterOutcome } from '../../src/outlook/CompOutcome.ts';
import { weightedQuantiles } from '../../src/stats/quantile.ts';

const outcome = (top: number, peak: number | null): HitterOutcome => ({
  kind: 'hitter',
  window: [2011, 2016],
  seasons_observed: 6,
  censored: false,
  reached_top_level: top > 0,
  first_top_level_season: top > 0 ? 2013 : null,
  top_level_seasons: top,
  peak_season: peak === null ? null : 2014,
  peak_ops_plus: peak,
});

describe('summariseOutlook(items, kind)', () => {
  const items = [
    { weight: 90, outcome: outcome(4, 120) },
    { weight: 80, outcome: outcome(2, null) }, // reached, never 300 PA
    { weight: 60, outcome: outcome(0, null) },
    { weight: 50, outcome: outcome(5, 95) },
    { weight: 0, outcome: outcome(6, 150) }, // no weight: left out
  ];
  const s = summariseOutlook(items, 'hitter');

  it('weighs the share who reached the top level by likeness: (90 + 80 + 50) / 280', () => {
    expect(s.reached_top_level).toBeCloseTo(220 / 280, 3);
  });

  it('draws the peak distribution from the qualifying comps only, with their weights', () => {
    const peak = peakSummaryOf(s);
    expect(peak.n).toBe(2);
    const [p10, p50, p90] = weightedQuantiles([120, 95], [90, 50], [0.1, 0.5, 0.9]);
    expect(peak.p10).toBeCloseTo(p10 ?? NaN, 1);
    expect(peak.p50).toBeCloseTo(p50 ?? NaN, 1);
    expect(peak.p90).toBeCloseTo(p90 ?? NaN, 1);
    expect('peak_ops_plus' in s).toBe(true);
  });

  it('counts top-level seasons over every comp, 0 for those who did not reach: mean (360 + 160 + 0 + 250) / 280', () => {
    expect(s.top_level_seasons.n).toBe(4);
    expect(s.top_level_seasons.mean).toBeCloseTo(770 / 280, 2);
  });

  it('gives nulls and zero counts without comps', () => {
    const empty = summariseOutlook([], 'pitcher');
    expect(empty.reached_top_level).toBeNull();
    expect(peakSummaryOf(empty)).toEqual({ n: 0, p10: null, p50: null, p90: null });
    expect('peak_fip_minus' in empty).toBe(true);
  });
});
