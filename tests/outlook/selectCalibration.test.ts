import { describe, expect, it } from 'vitest';
import type { RawForecast } from '../../src/outlook/collectForecasts.ts';
import { DEFAULT_CALIBRATION, type CalibrationChoice } from '../../src/outlook/calibrateForecast.ts';
import { fitSelectedCalibration, selectCalibration } from '../../src/outlook/selectCalibration.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';

// Synthetic forecasts (simulation, not reference data): the truth follows a logistic in one profile
// dimension `x` with the base rate 0.2 as offset; the comps' share carries no signal. A map that uses
// the profile must win on the held-out later seasons when `x` drives the truth, and the plain map when
// `x` is noise. The candidates are the two the default offers.
const NAN_SPREAD = { n: 0, p10: NaN, p50: NaN, p90: NaN };
function forecasts(signal: number, seed: number): RawForecast[] {
  const rng = new SeededRandom(seed);
  const out: RawForecast[] = [];
  for (let season = 2000; season < 2012; season++) {
    for (let i = 0; i < 60; i++) {
      const x = rng.normal();
      const p = 1 / (1 + Math.exp(-(Math.log(0.2 / 0.8) + signal * x)));
      out.push({
        kind: 'hitter', group: 'IF', player: season * 100 + i, row: out.length, season, level: 2, age: 21, sample: 400,
        levelBefore: 1, climbed: false, seasonSample: 400, profile: { x },
        comps: { used: 25, effective: 20, share: 0.2, peak: NAN_SPREAD, seasons: NAN_SPREAD },
        matched: { n: 300, share: 0.2, peak: NAN_SPREAD, seasons: NAN_SPREAD },
        levelAge: { n: 300, share: 0.2 },
        truth: { reached: rng.uniform(0, 1) < p, peak: null, seasons: 0 },
      });
    }
  }
  return out;
}
const CHOICE: CalibrationChoice = {
  ...DEFAULT_CALIBRATION,
  candidates: [{ features: ['comps', 'sample'], ridge: 2 }, { features: ['comps', 'sample', 'profile'], ridge: 100 }],
};

describe('selectCalibration (time-ordered hold-out on the roster\'s own training forecasts)', () => {
  it('keeps the map with his profile when the profile drives what happened', () => {
    expect(selectCalibration(forecasts(1.5, 1), CHOICE, 6).features).toContain('profile');
  });

  it('keeps the plain map when the profile is noise', () => {
    const chosen = [1, 2, 3].map((seed) => selectCalibration(forecasts(0, seed), CHOICE, 6).features.includes('profile'));
    expect(chosen.filter(Boolean).length).toBeLessThanOrEqual(1);
  });

  it('falls back to the first candidate when either side of the split would be too thin', () => {
    const few = forecasts(1.5, 4).filter((r) => r.row % 10 === 0);
    expect(selectCalibration(few, CHOICE, 6).features).toEqual(['comps', 'sample']);
  });

  it('the fit names the map it kept, and a choice without candidates is used as given', () => {
    const rows = forecasts(1.5, 5);
    expect(fitSelectedCalibration(rows, CHOICE, 6).choice.features).toContain('profile');
    const plain = { ...DEFAULT_CALIBRATION, candidates: [] };
    expect(fitSelectedCalibration(rows, plain, 6).choice.features).toEqual(DEFAULT_CALIBRATION.features);
  });
});
