import { describe, expect, it } from 'vitest';
import { explainEmbeddedComp } from '../../src/query/explainEmbeddedComp.ts';
import type { Explanation } from '../../src/query/explainComp.ts';
import type { DimensionInfo } from '../../src/profiles/Dimension.ts';
import type { DistanceAttribution } from '../../src/embed/attributeDistance.ts';

const dim = (name: string): DimensionInfo => ({
  name,
  label: name,
  unit: '',
  direction: 'higher',
  meaning: '',
  source: '',
  skill: name,
  family: 'power',
  scope: 'group',
  digits: 3,
  stabilisation: 0,
});

function explanation(names: string[], missing: string[] = []): Explanation {
  return {
    dimensions: names.map((name) => ({ name, target: 0, comp: 0, target_grade: 50, comp_grade: 50, share: 1 / names.length, missing: missing.includes(name) })),
    alike: ['input-space'],
    apart: ['input-space'],
  };
}

function attribution(values: number[]): DistanceAttribution {
  return { values: Float64Array.from(values), standardError: new Float64Array(values.length), total: values.reduce((a, b) => a + b, 0), method: 'exact', players: values.length };
}

describe('explainEmbeddedComp(ex, attribution, drivers, dims)', () => {
  it('follows the worked example of its doc comment', () => {
    const names = ['obp', 'iso', 'k_pct'];
    const r = explainEmbeddedComp(explanation(names), attribution([0.01, 0.6, 0.02]), Float64Array.of(0.5, 0.4, 0.1), names.map(dim));
    expect(r.apart).toEqual(['iso']);
    expect(r.alike).toEqual(['obp', 'k_pct']);
    expect(r.dimensions.map((d) => d.attribution)).toEqual([0.01, 0.6, 0.02]);
    expect(r.dimensions.map((d) => d.share)).toEqual([1 / 3, 1 / 3, 1 / 3]); // input-space breakdown kept
  });

  it('never lists a missing dimension, and keeps alike and apart apart', () => {
    const names = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'];
    const r = explainEmbeddedComp(
      explanation(names, ['b']),
      attribution([0.5, 0, 0.3, -0.05, 0.01, 0.02, 0.4, 0.001]),
      Float64Array.of(1, 1, 0.9, 0.8, 0.7, 0.2, 0.1, 0.05),
      names.map(dim),
    );
    expect(r.apart).toEqual(['a', 'g', 'c']); // above the even share 1.181 / 7 = 0.169, largest first
    expect(r.alike).toEqual(['e', 'd', 'h']); // heavier half {a, c, d, e} less apart: e (0.01), d (|-0.05|); then the calmest other, h (0.001)
    expect([...r.alike, ...r.apart]).not.toContain('b');
  });
});
