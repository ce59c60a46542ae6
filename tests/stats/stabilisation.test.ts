import { describe, expect, it } from 'vitest';
import { STABILISATION, stabilisationSample, type StabilisationRate } from '../../src/stats/stabilisation.ts';
import { regressToMean } from '../../src/stats/regressToMean.ts';

/** Checks of the table against what public baseball analysis finds, not against its own values. */
const sample = (rate: StabilisationRate): number => stabilisationSample(rate).sample;

describe('stabilisationSample(rate)', () => {
  it('orders the batting rates as public analysis does: strikeouts settle first, then walks, OBP later, batting average and BABIP last', () => {
    // common practice (from memory): rates driven by the batter alone (K%, BB%) settle within a few
    // hundred PA; rates that depend on where balls in play land take most of a career
    expect(sample('strikeoutRate')).toBeLessThan(sample('walkRate'));
    expect(sample('walkRate')).toBeLessThan(sample('onBasePercentage'));
    expect(sample('isolatedPower')).toBeLessThan(sample('sluggingPercentage'));
    for (const slow of ['battingAverage', 'babip'] as const) {
      for (const fast of ['strikeoutRate', 'walkRate', 'homeRunRate', 'isolatedPower', 'sluggingPercentage', 'onBasePercentage'] as const) {
        expect(sample(slow), `${slow} after ${fast}`).toBeGreaterThan(sample(fast));
      }
    }
  });

  it('makes BABIP against the slowest pitching rate: pitchers control balls in play least (McCracken 2001)', () => {
    // McCracken, "Pitching and Defense: How Much Control Do Hurlers Have?" (2001): year-to-year BABIP
    // allowed barely repeats, unlike strikeouts, walks and home runs
    for (const other of ['pitcherStrikeoutRate', 'pitcherWalkRate', 'gbPct', 'pitcherHomeRunRate'] as const) {
      expect(sample('babipAgainst'), other).toBeGreaterThan(sample(other));
    }
    expect(sample('pitcherStrikeoutRate')).toBeLessThan(sample('pitcherWalkRate'));
  });

  it('counts each rate in the denominator of its formula (K% and BB% per PA, SLG and ISO per AB, BABIP per ball in play, pitching per batter faced)', () => {
    // the rates' definitions: K% = SO / PA, SLG = TB / AB, ISO = SLG - AVG, BABIP = (H - HR) / (AB - SO - HR + SF)
    const units: [StabilisationRate, string][] = [
      ['strikeoutRate', 'PA'],
      ['walkRate', 'PA'],
      ['onBasePercentage', 'PA'],
      ['sluggingPercentage', 'AB'],
      ['isolatedPower', 'AB'],
      ['battingAverage', 'AB'],
      ['babip', 'BIP'],
      ['babipAgainst', 'BIP'],
      ['pitcherStrikeoutRate', 'BF'],
      ['pitcherWalkRate', 'BF'],
    ];
    for (const [rate, unit] of units) expect(stabilisationSample(rate).unit, rate).toBe(unit);
  });

  it('marks every entry as recalled from memory or a project choice, with a positive sample', () => {
    for (const [rate, entry] of Object.entries(STABILISATION)) {
      expect(entry.sample, rate).toBeGreaterThan(0);
      expect(['from memory', 'project choice'], rate).toContain(entry.source);
    }
  });

  it('is the sample at which regression to the mean keeps half of what is observed (the meaning of a stabilisation point)', () => {
    // with k the stabilisation sample, (successes + k m) / (n + k) at n = k trials is halfway between
    // the observed rate x = successes / n and the league rate m
    const k = sample('walkRate');
    expect(regressToMean(0.2 * k, k, 0.08, k)).toBeCloseTo(0.14, 12);
  });
});
