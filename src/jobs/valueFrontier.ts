/**
 * The value frontier of a list of comps: those that no other comp beats on both likeness and salary,
 * i.e. the Pareto-optimal set for "more alike" and "cheaper". Comp i is off the frontier when some
 * comp j has likeness_j >= likeness_i and salary_j <= salary_i, with at least one of the two strict.
 * Equal pairs do not beat each other, so both stay on the frontier.
 *
 * Source: Pareto optimality (common practice; e.g. Wikipedia, "Pareto front",
 * https://en.wikipedia.org/wiki/Pareto_front). Cost: O(n^2), for the short lists of a query.
 *
 * @example
 * valueFrontier([90, 80, 70], [5e6, 1e6, 2e6]); // => [true, true, false] (the 70 costs more than the 80)
 */
export function valueFrontier(likeness: readonly number[], salary: readonly number[]): boolean[] {
  if (likeness.length !== salary.length) throw new RangeError(`valueFrontier: ${likeness.length} likenesses but ${salary.length} salaries`);
  return likeness.map((li, i) => {
    const si = salary[i] as number;
    for (let j = 0; j < likeness.length; j++) {
      if (j === i) continue;
      const lj = likeness[j] as number;
      const sj = salary[j] as number;
      if (lj >= li && sj <= si && (lj > li || sj < si)) return false;
    }
    return true;
  });
}
