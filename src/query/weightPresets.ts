import type { DimensionInfo } from '../profiles/Dimension.ts';

/**
 * Named weightings by skill, multiplied into the redundancy weights. `balanced` changes nothing.
 * Skills are those declared with each dimension (see `kindred dims`).
 */
export const WEIGHT_PRESETS = {
  balanced: {},
  bat: { contact: 1.5, discipline: 1.5, 'on-base': 1.5, power: 1.5, 'batted-ball shape': 1.5, speed: 0.5, 'fielding range': 0.5, 'fielding hands': 0.5, arm: 0.5, 'catcher throwing': 0.5 },
  glove: { 'fielding range': 2, 'fielding hands': 2, arm: 2, 'catcher throwing': 2, speed: 1.5 },
  power: { power: 2, 'batted-ball shape': 1.5 },
  speed: { speed: 2 },
  stuff: { stuff: 2, velocity: 2 },
  command: { control: 2, 'contact allowed': 1.5, 'ground balls': 1.5 },
} as const satisfies Record<string, Readonly<Record<string, number>>>;

export type WeightPreset = keyof typeof WEIGHT_PRESETS;

export function isWeightPreset(name: string): name is WeightPreset {
  return Object.hasOwn(WEIGHT_PRESETS, name);
}

/** Multiplier per dimension from a preset and per-dimension overrides (override wins). */
export function userWeights(
  dims: readonly DimensionInfo[],
  preset: WeightPreset,
  overrides: ReadonlyMap<string, number>,
): Float64Array {
  const bySkill: Readonly<Record<string, number>> = WEIGHT_PRESETS[preset];
  return Float64Array.from(dims, (d) => overrides.get(d.name) ?? bySkill[d.skill] ?? 1);
}
