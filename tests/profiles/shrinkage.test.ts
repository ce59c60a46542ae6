import { describe, expect, it } from 'vitest';
import { shrinkageFor, type ShrinkageOptions } from '../../src/profiles/shrinkage.ts';
import { measureDimensions } from '../../src/profiles/measureDimensions.ts';
import { rateMeasure } from '../../src/profiles/rateMeasure.ts';
import type { Dimension } from '../../src/profiles/Dimension.ts';
import type { Rate } from '../../src/stats/Rate.ts';

const fit: ShrinkageOptions = { fit: true, minPlayers: 4, tableScale: 1, eraSeasons: 1 };
const worked = [{ successes: [1, 3, 5, 7], trials: [10, 10, 10, 10] }];

describe('shrinkageFor(era samples, league rate, table sample, binomial, options)', () => {
  it('fits k by the beta-binomial method of moments (hand-worked: 1, 3, 5, 7 of 10 gives k = 4.0625)', () => {
    const used = shrinkageFor(worked, 0.4, 60, true, fit);
    expect(used).toMatchObject({ table: 60, source: 'fitted', players: 4 });
    expect(used.k).toBeCloseTo(4.0625, 9);
  });

  it('takes k at the stratum own league rate: p(1 - p) / σ² - 1 with σ² = 0.0474074', () => {
    expect(shrinkageFor(worked, 0.2, 60, true, fit).k).toBeCloseTo(0.16 / 0.0474074 - 1, 4);
  });

  it('keeps the table k below the player threshold, without talent spread, for non-binomial rates, or when fitting is off', () => {
    expect(shrinkageFor([{ successes: [1, 3, 5], trials: [10, 10, 10] }], 0.3, 60, true, fit)).toMatchObject({ k: 60, source: 'table', players: 3 });
    expect(shrinkageFor([{ successes: [5, 5, 5, 5], trials: [10, 10, 10, 10] }], 0.5, 60, true, fit)).toMatchObject({ k: 60, source: 'table' });
    expect(shrinkageFor(worked, 0.4, 60, false, fit).source).toBe('table');
    expect(shrinkageFor(worked, 0.4, 60, true, { ...fit, fit: false }).source).toBe('table');
  });

  it('scales the table sample by tableScale (3/7: the sample where reliability n / (n + k) reaches 0.7)', () => {
    const used = shrinkageFor([], 0.3, 70, true, { ...fit, tableScale: 3 / 7 });
    expect(used.k).toBeCloseTo(30, 12);
    // check: with k = 30, reliability at n = 70 is 70 / 100 = 0.7
    expect(70 / (70 + used.k)).toBeCloseTo(0.7, 12);
  });
});

interface Line { readonly s: number; readonly n: number; readonly season: number; readonly level: string }
const share: Rate<Line> = { name: 'share', formula: 's / n', source: 'test', numerator: (l) => l.s, denominator: (l) => l.n };
const dim: Dimension<Line> = {
  name: 'share', label: 'Share', unit: 'share', direction: 'higher', meaning: 'test', source: 'test', skill: 'test',
  family: 'discipline', groups: ['IF'], scope: 'group', digits: 3, measure: rateMeasure(share, (l: Line) => l, 60),
};

describe('measureDimensions with fitted shrinkage', () => {
  const lines: Line[] = [
    ...[1, 3, 5, 7].map((s) => ({ s, n: 10, season: 2020, level: 'A' })),
    ...[2, 4, 6, 8].map((s) => ({ s, n: 10, season: 2021, level: 'A' })),
    { s: 2, n: 10, season: 2020, level: 'B' },
    { s: 6, n: 10, season: 2020, level: 'B' },
  ];
  const measure = (eraSeasons: number) =>
    measureDimensions([dim], {
      lines,
      leagueKey: (i) => `${(lines[i] as Line).season}|${(lines[i] as Line).level}`,
      eraOf: (i) => ({ key: (lines[i] as Line).level, season: (lines[i] as Line).season }),
      league: () => ({ fipConstant: NaN }),
      shrinkage: { ...fit, eraSeasons },
    }).get('share');

  it('regresses each season with its own fitted k (regressToMean, common practice); a thin level keeps the table k', () => {
    const col = measure(0);
    expect(col?.shrinkage.get('2020|A')?.source).toBe('fitted');
    expect(col?.shrinkage.get('2020|A')?.k).toBeCloseTo(4.0625, 9);
    expect(col?.shrinkage.get('2020|B')).toMatchObject({ k: 60, source: 'table' });
    expect(col?.regressed[0]).toBeCloseTo((1 + 4.0625 * 0.4) / 14.0625, 12);
    expect(col?.regressed[8]).toBeCloseTo((2 + 60 * 0.4) / 70, 12);
  });

  it('pools an era about each season own mean: 2020 and 2021 (means 0.4 and 0.5) give σ² = (1.28 + 1.25) / 54', () => {
    // within 2020: S = 10 · 0.2 = 2, noise 3 · 0.24 = 0.72; 2021: S = 2, noise 3 · 0.25 = 0.75; each denominator 40 - 10 - 3 = 27
    const sigma2 = (1.28 + 1.25) / 54;
    const col = measure(1);
    expect(col?.shrinkage.get('2020|A')?.k).toBeCloseTo(0.24 / sigma2 - 1, 9);
    expect(col?.shrinkage.get('2021|A')?.k).toBeCloseTo(0.25 / sigma2 - 1, 9);
    expect(col?.shrinkage.get('2021|A')?.players).toBe(8);
  });
});
