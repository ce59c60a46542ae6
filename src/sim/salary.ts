/**
 * An invented top-level salary in thousands of US dollars.
 *
 * Shape (common practice, from memory: young players earn near a league
 * minimum, pay rises through a middle band of service years and is set by
 * value once a player has six or more top-level seasons): a minimum that
 * grows 3.5% a year from $300k in 2003; service 0-2 earns the minimum plus a
 * little; service 3-5 earns the minimum times a value- and service-driven
 * multiplier; service 6+ earns a market multiplier exponential in value
 * above the top-level bar. Lognormal noise throughout; capped at $45M.
 *
 * @example
 * salaryThousands(rng, 2003, 0, 1.0); // => about 300 to 375 ($300k to $375k)
 */
import type { SeededRandom } from '../random/SeededRandom.ts';
import { LEVEL_BAR, LEVEL_TOP } from './levelTable.ts';

export function leagueMinimumThousands(season: number): number {
  return Math.round(300 * Math.pow(1.035, season - 2003));
}

export function salaryThousands(rng: SeededRandom, season: number, service: number, value: number): number {
  const min = leagueMinimumThousands(season);
  const above = value - (LEVEL_BAR[LEVEL_TOP] ?? 1);
  let pay: number;
  if (service < 3) {
    pay = min * (1 + 0.25 * rng.next());
  } else if (service < 6) {
    pay = min * Math.exp(0.5 + 0.35 * (service - 3) + 1.0 * Math.max(-0.5, above) + 0.3 * rng.normal());
  } else {
    pay = min * Math.exp(1.3 + 1.5 * Math.max(-0.6, above) + 0.5 * rng.normal());
  }
  return Math.min(45000, Math.max(min, Math.round(pay)));
}
