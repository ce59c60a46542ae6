import { describe, expect, it } from 'vitest';
import * as stats from '../../src/stats/index.ts';

describe('stats index', () => {
  it('re-exports every formula and helper', () => {
    const names = [
      'ageOnJune30', 'babip', 'babipAgainst', 'battingAverage', 'caughtStealingRate', 'era',
      'fieldingPercentage', 'fip', 'fipConstant', 'fipMinus', 'fromGrade', 'homeRunRate', 'isolatedPower',
      'mean', 'onBasePercentage', 'ops', 'opsPlus', 'pitcherHomeRunRate', 'pitcherStrikeoutRate',
      'pitcherWalkRate', 'rangeFactor', 'regressAverageToMean', 'regressToMean', 'sampleStandardDeviation',
      'sluggingPercentage', 'stabilisationSample', 'stolenBaseAttemptRate', 'stolenBaseSuccess',
      'strikeoutRate', 'toGrade', 'totalBases', 'walkRate', 'whip', 'zScore',
    ];
    for (const name of names) expect(typeof (stats as Record<string, unknown>)[name], name).toBe('function');
    expect(stats.STABILISATION.walkRate.sample).toBe(120);
  });
});
