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

function explanation(names: string[], missing: string[] = [], grades: [number, number][] = []): Explanation {
  return {
    dimensions: names.map((name, j) => ({
      name, target: 0, comp: 0, target_grade: grades[j]?.[0] ?? 50, comp_grade: grades[j]?.[1] ?? 50, share: 1 / names.length, missing: missing.includes(name),
    })),
    alike: ['input-space'],
    apart: ['input-space'],
  };
}

function attribution(values: number[]): DistanceAttribution {
  return { values: Float64Array.from(values), standardError: new Float64Array(values.length), total: values.reduce((a, b) => a + b, 0), method: 'exact', players: values.length };
}

describe('explainEmbeddedComp(ex, attribution, drivers, dims)', () => {
  it('follows the worked example of its doc comment', () => {
    const names = ['obp', 'iso'];
    const r = explainEmbeddedComp(explanation(names, [], [[60, 61], [70, 45]]), attribution([0.01, 0.6]), Float64Array.of(0.5, 0.4), names.map(dim));
    expect(r.apart).toEqual(['iso']);
    expect(r.alike).toEqual(['obp']);
    expect(r.dimensions.map((d) => d.attribution)).toEqual([0.01, 0.6]);
    expect(r.dimensions.map((d) => d.share)).toEqual([0.5, 0.5]); // input-space breakdown kept
  });

  it('never lists a missing dimension, and never calls a wide grade gap alike or a narrow one apart', () => {
    const names = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'];
    const grades: [number, number][] = [[70, 40], [50, 50], [60, 48], [52, 50], [50, 51], [50, 55], [45, 66], [40, 46]];
    const r = explainEmbeddedComp(
      explanation(names, ['b'], grades),
      // f has a large attribution but a gap of 5: it is alike by the grid, not apart
      attribution([0.5, 0, 0.3, -0.05, 0.01, 0.45, 0.4, 0.001]),
      Float64Array.of(1, 1, 0.9, 0.8, 0.7, 0.2, 0.1, 0.05),
      names.map(dim),
    );
    expect(r.apart).toEqual(['a', 'g', 'c']); // gaps 30, 21, 12; largest attribution first
    expect(r.alike).toEqual(['d', 'e', 'f']); // gaps 2, 1, 5; heaviest driver first; h (gap 6) in neither
    expect([...r.alike, ...r.apart]).not.toContain('b');
  });
});
