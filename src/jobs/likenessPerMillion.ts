/**
 * Likeness per million US dollars of salary: how much of the target's profile a comp offers per
 * million paid. A project measure for ranking a shortlist by value; it is not a price.
 * Units: likeness points (0 to 100) per USD 1,000,000; higher is better value.
 * Returns NaN for a salary of 0 or less.
 *
 * @example
 * likenessPerMillion(80, 2_500_000); // => 32
 */
export function likenessPerMillion(likeness: number, salaryUsd: number): number {
  return salaryUsd > 0 ? likeness / (salaryUsd / 1_000_000) : NaN;
}
