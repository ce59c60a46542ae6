import { describe, expect, it } from 'vitest';
import { familyTotals, familyWeights } from '../../src/profiles/familyWeights.ts';
import { DEFAULT_FAMILY_SHARES, HITTER_FAMILIES, PITCHER_FAMILIES, PRODUCTION_FAMILIES, presentShares } from '../../src/profiles/skillFamily.ts';
import { HITTER_DIMENSIONS } from '../../src/profiles/hitterDimensions.ts';
import { PITCHER_DIMENSIONS } from '../../src/profiles/pitcherDimensions.ts';

describe('familyWeights(families, within, shares)', () => {
  it('divides each family share by the within-family weights (the doc example)', () => {
    const w = familyWeights(['power', 'power', 'running'], [1, 3, 2], { power: 0.6, running: 0.4 });
    expect(Array.from(w).map((x) => Number(x.toFixed(6)))).toEqual([0.15, 0.45, 0.4]);
  });

  it('rescales the shares over the families present (a DH has no fielding or throwing)', () => {
    const w = familyWeights(['discipline', 'running'], [1, 1], DEFAULT_FAMILY_SHARES);
    expect(w[0]).toBeCloseTo(0.2 / 0.32, 9);
    expect(w[1]).toBeCloseTo(0.12 / 0.32, 9);
  });

  it('gives a family whose within-family weights are all 0 nothing, and the weights still sum to its absence', () => {
    const w = familyWeights(['power', 'running'], [0, 1], { power: 0.5, running: 0.5 });
    expect(Array.from(w)).toEqual([0, 0.5]);
  });
});

describe('familyTotals(families, weights)', () => {
  it('sums the weights per family as shares of the total (the doc example)', () => {
    expect([...familyTotals(['power', 'power', 'running'], [1, 1, 2])]).toEqual([['power', 0.5], ['running', 0.5]]);
  });
});

describe('the default family shares (project choice)', () => {
  const sum = (fs: readonly string[]): number => fs.reduce((a, f) => a + (presentShares(DEFAULT_FAMILY_SHARES, HITTER_FAMILIES).get(f as never) ?? 0), 0);
  it('give position players at least half to the bat and pitchers at least half to results', () => {
    const bat = PRODUCTION_FAMILIES.filter((f) => (HITTER_FAMILIES as readonly string[]).includes(f));
    expect(sum(bat)).toBeGreaterThanOrEqual(0.5);
    const hitters = presentShares(DEFAULT_FAMILY_SHARES, HITTER_FAMILIES);
    expect([...hitters.values()].reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
    const pitchers = presentShares(DEFAULT_FAMILY_SHARES, PITCHER_FAMILIES);
    const results = PRODUCTION_FAMILIES.reduce((a, f) => a + (pitchers.get(f) ?? 0), 0);
    expect(results).toBeGreaterThanOrEqual(0.5);
  });

  it('put every hitter dimension in a hitter family and every pitcher dimension in a pitcher family', () => {
    for (const d of HITTER_DIMENSIONS) expect(HITTER_FAMILIES as readonly string[]).toContain(d.family);
    for (const d of PITCHER_DIMENSIONS) expect(PITCHER_FAMILIES as readonly string[]).toContain(d.family);
  });
});
