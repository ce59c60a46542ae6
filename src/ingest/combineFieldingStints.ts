import { WeightedMean, addCount } from './WeightedMean.ts';
import type { FieldingSeason } from './types.ts';

type Writable<T> = { -readonly [K in keyof T]: T[K] };

/**
 * Combines the fielding stints of one player, season, level and position
 * (file order): counts and outs summed (an optional count is unknown when a
 * stint lacks it); arm_mph weighted by innings (outs); pop_2b_s and
 * exchange_s weighted by sb_against, by innings when a stint with the value
 * lacks sb_against. A weighted mean uses only the stints that have the value.
 *
 * @example
 * // stint 1: 601 outs, arm 80; stint 2: 302 outs, arm 83
 * // => outs 903, armMph (80*601 + 83*302) / 903 = 81.003...
 */
export function combineFieldingStints(stints: readonly FieldingSeason[]): FieldingSeason {
  const [first, ...rest] = stints;
  if (first === undefined) throw new RangeError('combineFieldingStints needs at least one stint');
  const out: Writable<FieldingSeason> = {
    playerId: first.playerId, season: first.season, level: first.level, pos: first.pos, teams: [],
    outs: first.outs, PO: first.PO, A: first.A, E: first.E,
  };
  let { G, sbAgainst, csCaught } = first;
  const teams: string[] = [...first.teams];
  for (const s of rest) {
    for (const t of s.teams) if (!teams.includes(t)) teams.push(t);
    out.outs += s.outs;
    out.PO += s.PO;
    out.A += s.A;
    out.E += s.E;
    G = addCount(G, s.G);
    sbAgainst = addCount(sbAgainst, s.sbAgainst);
    csCaught = addCount(csCaught, s.csCaught);
  }
  out.teams = teams;
  if (G !== undefined) out.G = G;
  if (sbAgainst !== undefined) out.sbAgainst = sbAgainst;
  if (csCaught !== undefined) out.csCaught = csCaught;
  const arm = new WeightedMean();
  const pop = new WeightedMean();
  const exchange = new WeightedMean();
  for (const s of stints) {
    if (s.armMph !== undefined) arm.add(s.armMph, s.outs, s.outs);
    if (s.pop2bS !== undefined) pop.add(s.pop2bS, s.sbAgainst, s.outs);
    if (s.exchangeS !== undefined) exchange.add(s.exchangeS, s.sbAgainst, s.outs);
  }
  const armMph = arm.value();
  const pop2bS = pop.value();
  const exchangeS = exchange.value();
  if (armMph !== undefined) out.armMph = armMph;
  if (pop2bS !== undefined) out.pop2bS = pop2bS;
  if (exchangeS !== undefined) out.exchangeS = exchangeS;
  return out;
}
