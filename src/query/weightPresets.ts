import { UsageError } from '../errors/KindredError.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import { DEFAULT_FAMILY_SHARES, presentShares, type FamilyShares } from '../profiles/skillFamily.ts';

/**
 * Named weightings as family shares (skillFamily.ts): a preset gives each skill family its share of
 * the whole, and the reliability and redundancy weighting still divides each share among the
 * family's dimensions. `balanced` is the default shares. Hitter presets do not apply to pitchers and
 * pitcher presets not to hitters. Project choice: `bat` gives the bat 90%, `results` gives results 90%.
 */
export const WEIGHT_PRESETS = {
  balanced: DEFAULT_FAMILY_SHARES,
  bat: { discipline: 0.3, contact: 0.25, power: 0.35, running: 0.04, fielding: 0.03, throwing: 0.03 },
  glove: { discipline: 0.07, contact: 0.06, power: 0.07, running: 0.15, fielding: 0.35, throwing: 0.3 },
  power: { discipline: 0.15, contact: 0.1, power: 0.5, running: 0.09, fielding: 0.08, throwing: 0.08 },
  speed: { discipline: 0.12, contact: 0.12, power: 0.12, running: 0.44, fielding: 0.1, throwing: 0.1 },
  results: { 'missing bats': 0.35, command: 0.3, 'contact allowed': 0.25, stuff: 0.05, workload: 0.05 },
  stuff: { 'missing bats': 0.3, command: 0.1, 'contact allowed': 0.05, stuff: 0.5, workload: 0.05 },
  command: { 'missing bats': 0.15, command: 0.4, 'contact allowed': 0.25, stuff: 0.1, workload: 0.1 },
} as const satisfies Record<string, FamilyShares>;

export type WeightPreset = keyof typeof WEIGHT_PRESETS;

export function isWeightPreset(name: string): name is WeightPreset {
  return Object.hasOwn(WEIGHT_PRESETS, name);
}

/** The presets that apply to a group with these dimensions (balanced, and those naming its families). */
export function presetsFor(dims: readonly DimensionInfo[]): WeightPreset[] {
  const families = new Set(dims.map((d) => d.family));
  return (Object.keys(WEIGHT_PRESETS) as WeightPreset[]).filter((p) => Object.keys(WEIGHT_PRESETS[p]).some((f) => families.has(f as DimensionInfo['family'])));
}

/**
 * Multiplier per dimension on the stored default weights (which carry the default family shares):
 * the preset's share of the dimension's family over the default share (both rescaled over the
 * group's families), times a per-dimension override when one is given.
 * Throws a UsageError when the preset names none of the group's families (a pitcher preset on hitters).
 *
 * @example
 * // `bat` on a shortstop: each bat dimension weighs 1.5 times its default, fielding 0.03 / 0.14 of it
 */
export function userWeights(
  dims: readonly DimensionInfo[],
  preset: WeightPreset,
  overrides: ReadonlyMap<string, number>,
): Float64Array {
  const families = dims.map((d) => d.family);
  const base = presentShares(DEFAULT_FAMILY_SHARES, families);
  const wanted = presentShares(WEIGHT_PRESETS[preset], families);
  if (![...wanted.values()].some((s) => s > 0)) {
    throw new UsageError(`--preset: ${preset} does not apply to these players; presets for them: ${presetsFor(dims).join(', ')}`, { value: preset });
  }
  return Float64Array.from(dims, (d) => {
    const b = base.get(d.family) ?? 0;
    const multiplier = b > 0 ? (wanted.get(d.family) ?? 0) / b : 0;
    return multiplier * (overrides.get(d.name) ?? 1);
  });
}
