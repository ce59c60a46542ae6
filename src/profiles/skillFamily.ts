/**
 * Skill families: every dimension belongs to one, and the default weighting gives each family a share
 * of the whole (reliability and redundancy then divide a family's share among its dimensions, see
 * familyWeights.ts). Production carries most of it: for position players the bat (discipline, contact,
 * power) holds 60%, for pitchers the results (missing bats, command, contact allowed) hold 60%.
 * The shares are a project choice, benched on simulated leagues against the whole-group weighting
 * (bench/compsQuality.bench.ts; figures in the README).
 */
export const HITTER_FAMILIES = ['discipline', 'contact', 'power', 'running', 'fielding', 'throwing'] as const;
export const PITCHER_FAMILIES = ['missing bats', 'command', 'contact allowed', 'stuff', 'workload'] as const;
export const SKILL_FAMILIES = [...HITTER_FAMILIES, ...PITCHER_FAMILIES] as const;

export type SkillFamily = (typeof SKILL_FAMILIES)[number];

/** Families that make up the bat (position players) and the results (pitchers). */
export const PRODUCTION_FAMILIES: readonly SkillFamily[] = ['discipline', 'contact', 'power', 'missing bats', 'command', 'contact allowed'];

/** One line an analyst reads: what each family holds. */
export const FAMILY_MEANING: Readonly<Record<SkillFamily, string>> = {
  discipline: 'plate discipline: strikeouts, walks, on-base',
  contact: 'contact: batting average, hits on balls in play',
  power: 'power and batted ball: slugging, home runs, how hard and at what angle he hits',
  running: 'running: speed, steal attempts and success',
  fielding: 'fielding: range and sure hands at his position',
  throwing: 'throwing: arm strength, outfield assists; for catchers pop time, exchange, runners caught',
  'missing bats': 'missing bats: strikeouts, swings and misses',
  command: 'command: walks',
  'contact allowed': 'contact allowed: home runs, hits on balls in play, ground balls, FIP',
  stuff: 'stuff measurements: fastball velocity and spin',
  workload: 'workload: innings per appearance',
};

/** Family shares (each table sums to 1; a group's missing families are left out and the rest rescaled). */
export type FamilyShares = Readonly<Partial<Record<SkillFamily, number>>>;

/** The default: position players 60% to the bat, pitchers 60% to results. */
export const DEFAULT_FAMILY_SHARES: FamilyShares = {
  discipline: 0.2,
  contact: 0.15,
  power: 0.25,
  running: 0.12,
  fielding: 0.14,
  throwing: 0.14,
  'missing bats': 0.25,
  command: 0.2,
  'contact allowed': 0.15,
  stuff: 0.25,
  workload: 0.15,
};

/**
 * The shares of the families present in a group, rescaled to sum to 1 (a DH has no fielding or
 * throwing; his bat and running share the whole).
 *
 * @example
 * presentShares(DEFAULT_FAMILY_SHARES, ['discipline', 'running']) // => { discipline: 0.625, running: 0.375 }
 */
export function presentShares(shares: FamilyShares, present: Iterable<SkillFamily>): Map<SkillFamily, number> {
  const out = new Map<SkillFamily, number>();
  let total = 0;
  for (const f of present) {
    if (out.has(f)) continue;
    const s = shares[f] ?? 0;
    out.set(f, s);
    total += s;
  }
  for (const [f, s] of out) out.set(f, total > 0 ? s / total : 0);
  return out;
}
