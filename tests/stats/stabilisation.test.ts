import { describe, expect, it } from 'vitest';
import { STABILISATION, stabilisationSample, type StabilisationRate } from '../../src/stats/stabilisation.ts';

describe('stabilisationSample(rate)', () => {
  // Reference values: from memory (approximate values circulating in public baseball analysis).
  it.each<[StabilisationRate, number, string]>([
    ['strikeoutRate', 60, 'PA'],
    ['walkRate', 120, 'PA'],
    ['homeRunRate', 170, 'PA'],
    ['onBasePercentage', 460, 'PA'],
    ['sluggingPercentage', 320, 'AB'],
    ['isolatedPower', 160, 'AB'],
    ['battingAverage', 910, 'AB'],
    ['babip', 820, 'BIP'],
    ['pitcherStrikeoutRate', 70, 'BF'],
    ['pitcherWalkRate', 170, 'BF'],
    ['gbPct', 70, 'BIP'],
    ['pitcherHomeRunRate', 1300, 'BF'],
    ['babipAgainst', 2000, 'BIP'],
    ['evAvgMph', 50, 'BBE'],
    ['hardHitPct', 80, 'BBE'],
  ])('gives %s as %i %s, marked from memory', (rate, sample, unit) => {
    const entry = stabilisationSample(rate);
    expect(entry).toEqual({ sample, unit, source: 'from memory' });
  });

  it('marks every other entry as a project choice with a positive sample', () => {
    for (const [rate, entry] of Object.entries(STABILISATION)) {
      expect(entry.sample, rate).toBeGreaterThan(0);
      expect(['from memory', 'project choice'], rate).toContain(entry.source);
    }
    expect(stabilisationSample('caughtStealingRate').source).toBe('project choice');
    expect(stabilisationSample('fieldingPercentage').unit).toBe('chances');
  });
});
