import { describe, expect, it } from 'vitest';
import { userWeights, presetsFor, WEIGHT_PRESETS } from '../../src/query/weightPresets.ts';
import { dimensionsOf } from '../../src/profiles/buildProfiles.ts';
import { familyTotals } from '../../src/profiles/familyWeights.ts';
import { PRODUCTION_FAMILIES } from '../../src/profiles/skillFamily.ts';
import { UsageError } from '../../src/errors/KindredError.ts';

/** Default weights of one unit per family, spread evenly over its dimensions, at the default shares. */
function defaults(group: 'IF' | 'RP'): Float64Array {
  const dims = dimensionsOf(group);
  const balanced = userWeights(dims, 'balanced', new Map());
  expect(Array.from(balanced).every((m) => Math.abs(m - 1) < 1e-12)).toBe(true);
  return Float64Array.from(dims, () => 1);
}

describe('userWeights(dims, preset, overrides)', () => {
  it('balanced changes nothing; every preset sums to 1 over its families', () => {
    defaults('IF');
    for (const shares of Object.values(WEIGHT_PRESETS)) {
      const total = Object.values(shares).reduce((a: number, b: number) => a + b, 0);
      expect([1, 2]).toContain(Math.round(total)); // balanced holds both kinds' families
    }
  });

  it('bat moves the bat families to 90% of a shortstop\u2019s weight', () => {
    const dims = dimensionsOf('IF');
    // stored default weights: family share divided evenly within the family
    const base = dims.map((d) => d.family);
    const counts = new Map<string, number>();
    for (const f of base) counts.set(f, (counts.get(f) ?? 0) + 1);
    const shares: Record<string, number> = { discipline: 0.2, contact: 0.15, power: 0.25, running: 0.12, fielding: 0.14, throwing: 0.14 };
    const stored = Float64Array.from(dims, (d) => (shares[d.family] ?? 0) / (counts.get(d.family) ?? 1));
    const m = userWeights(dims, 'bat', new Map());
    const w = Float64Array.from(stored, (s, j) => s * (m[j] as number));
    const totals = familyTotals(base, w);
    const bat = PRODUCTION_FAMILIES.reduce((a, f) => a + (totals.get(f) ?? 0), 0);
    expect(bat).toBeCloseTo(0.9, 9);
  });

  it('applies a per-dimension override on top of the preset', () => {
    const dims = dimensionsOf('IF');
    const j = dims.findIndex((d) => d.name === 'obp');
    expect(userWeights(dims, 'balanced', new Map([['obp', 3]]))[j]).toBe(3);
  });

  it('refuses a pitcher preset on hitters and names the presets that apply', () => {
    const dims = dimensionsOf('C');
    expect(() => userWeights(dims, 'stuff', new Map())).toThrow(UsageError);
    expect(() => userWeights(dims, 'stuff', new Map())).toThrow(/balanced, bat, glove, power, speed/);
    expect(presetsFor(dimensionsOf('SP'))).toEqual(['balanced', 'results', 'stuff', 'command']);
  });
});
