import { ParameterError } from '../errors/ParameterError.ts';
import { eligibleRows } from '../query/eligibleRows.ts';
import { findCompsWithRows, type CompsOptions } from '../query/findComps.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';
import { storedGroup } from '../query/storedGroup.ts';
import type { Target } from '../query/Target.ts';
import { valueAt } from '../query/valueAt.ts';
import { round, roundOrNull } from '../stats/round.ts';
import { UNRELATED_LIKENESS } from '../query/likeness.ts';
import { valueScore } from './valueScore.ts';
import { likenessPerMillion } from './likenessPerMillion.ts';
import type { CheaperComp, CheaperResult } from './CheaperResult.ts';
import { valueFrontier } from './valueFrontier.ts';

/** The salary limit: an amount in USD, or a share of the target's salary in his season. */
export type SalaryLimit = { readonly kind: 'max-salary'; readonly usd: number } | { readonly kind: 'max-share'; readonly share: number };

export interface CheaperOptions {
  readonly comps: CompsOptions;
  readonly limit: SalaryLimit;
}

/** The default limit when none is given: half the target's salary. Project choice. */
export const DEFAULT_SALARY_LIMIT: SalaryLimit = { kind: 'max-share', share: 0.5 };

/** Salary of a player-season from the store (contracts.csv), or undefined. */
export function salaryOf(store: ProfileStore, player: number, season: number): number | undefined {
  return store.salaries.get(player)?.get(season);
}

/** A row's salary (its player in its season), or undefined. */
function rowSalary(store: ProfileStore, g: StoredGroup, row: number): number | undefined {
  return salaryOf(store, valueAt(g.player, row), valueAt(g.season, row));
}

/**
 * Comps who do what the target does for less: the pool is the usual one restricted to player-seasons
 * with a known salary (contracts.csv, one salary per player and season, whatever the level) at or under
 * the limit. Player-seasons without a salary are left out and counted, as are those over the limit.
 * Each comp carries its salary, its value score (valueScore: likeness beyond chance times the share of
 * the target's salary saved), its likeness per million USD (kept for old readers; it rewards the
 * minimum salary) and whether it is on the value frontier among the listed comps above the likeness
 * floor (UNRELATED_LIKENESS; valueFrontier, with the comps' rank as the measure of likeness: no comp
 * ranked above him is paid as little or less). The default pool (CHEAPER_REACH, set by the request
 * layer) is his level and his season with the two before it.
 */
export function findCheaperComps(store: ProfileStore, target: Target, options: CheaperOptions): CheaperResult {
  const g = storedGroup(store, target.group);
  const targetSalary = target.player >= 0 && target.season !== null ? salaryOf(store, target.player, target.season) : undefined;
  const limitUsd = salaryLimitUsd(store, target, options.limit, targetSalary);
  const counts = salaryCounts(store, g, target, options, limitUsd);
  const callerInclude = options.comps.filter.include;
  const underLimit = (row: number): boolean => {
    const salary = rowSalary(store, g, row);
    return salary !== undefined && salary <= limitUsd && (callerInclude === undefined || callerInclude(row));
  };
  const found = findCompsWithRows(store, target, { ...options.comps, filter: { ...options.comps.filter, include: underLimit } });

  // "More alike" is the comps' own order (exact distance, whichever space ranked them): the rounded
  // likeness would tie comps that the ranking tells apart.
  // The frontier is drawn among the comps above the likeness floor only: a comp no more alike than
  // chance is no alternative, however cheap.
  const salaries = found.rows.map((row) => rowSalary(store, g, row) ?? NaN);
  const above = found.result.comps.map((c) => c.likeness > UNRELATED_LIKENESS);
  const kept = found.result.comps.flatMap((c, i) => (above[i] ? [i] : []));
  const onFrontier = valueFrontier(kept.map((i) => -(found.result.comps[i]?.rank ?? 0)), kept.map((i) => salaries[i] ?? NaN));
  const frontier = new Set(kept.filter((_, j) => onFrontier[j] === true));
  const referenceUsd = targetSalary ?? limitUsd;
  const comps: CheaperComp[] = found.result.comps.map((c, i) => ({
    ...c,
    salary_usd: salaries[i] ?? NaN,
    likeness_per_million: round(likenessPerMillion(c.likeness, salaries[i] ?? NaN), 2),
    value_score: roundOrNull(valueScore(c.likeness, salaries[i] ?? NaN, referenceUsd), 1),
    above_likeness_floor: above[i] === true,
    frontier: frontier.has(i),
  }));
  return {
    query: found.result.query,
    pool: {
      ...found.result.pool,
      salary: {
        rule: options.limit.kind,
        limit_usd: Math.round(limitUsd),
        share: options.limit.kind === 'max-share' ? options.limit.share : null,
        target_salary_usd: targetSalary ?? null,
        under_limit: found.result.pool.eligible,
        ...counts,
        likeness_floor: round(UNRELATED_LIKENESS, 1),
        value_reference_usd: Math.round(referenceUsd),
      },
    },
    comps,
  };
}

/** The limit in USD: as given, or the share of the target's salary (a usage error without one). */
function salaryLimitUsd(store: ProfileStore, target: Target, limit: SalaryLimit, targetSalary: number | undefined): number {
  if (limit.kind === 'max-salary') {
    if (!(limit.usd >= 0)) throw new ParameterError('max-salary', `expected an amount in USD, 0 or more, got ${limit.usd}`, { context: { value: limit.usd } });
    return limit.usd;
  }
  const share = limit.share;
  if (!(share > 0)) throw new ParameterError('max-share', `expected a share above 0, e.g. 0.5, got ${share}`, { context: { value: share } });
  if (targetSalary === undefined) {
    const p = target.player >= 0 ? store.players[target.player] : undefined;
    const who = p ? `${p.playerId} ${p.name} has no salary in ${target.season ?? '?'} (contracts.csv)` : 'a hand-built profile has no salary';
    throw new ParameterError('max-share', (n) => `${n('max-share')} needs the target's salary, but ${who}; give ${n('max-salary')} USD instead`, {
      prefixed: false,
      context: { player_id: p?.playerId ?? '' },
    });
  }
  return share * targetSalary;
}

/** Pool rows (before the salary rule) over the limit, and without a salary (rows and players). */
function salaryCounts(store: ProfileStore, g: StoredGroup, target: Target, options: CheaperOptions, limitUsd: number) {
  const exclude = new Set<number>(target.player >= 0 ? [target.player] : []);
  const before = eligibleRows(store, g, options.comps.filter, exclude);
  let over = 0;
  let without = 0;
  const withoutPlayers = new Set<number>();
  for (let i = 0; i < g.n; i++) {
    if (before.mask[i] !== 1) continue;
    const salary = rowSalary(store, g, i);
    if (salary === undefined) {
      without++;
      withoutPlayers.add(valueAt(g.player, i));
    } else if (salary > limitUsd) over++;
  }
  return { over_limit: over, without_salary: without, without_salary_players: withoutPlayers.size };
}
