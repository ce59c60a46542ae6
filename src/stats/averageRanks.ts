/**
 * Ranks 1..n with ties given the average of the ranks they span ("fractional ranking").
 *
 * Source: common practice, the tie rule of Spearman's rank correlation (Wikipedia, "Ranking",
 * section "Fractional ranking (1 2.5 2.5 4 ranking)", https://en.wikipedia.org/wiki/Ranking).
 * Cost: O(n log n).
 *
 * @example
 * averageRanks([10, 20, 20, 30]); // => [1, 2.5, 2.5, 4]
 */
export function averageRanks(values: readonly number[]): number[] {
  const order = values.map((_, i) => i).sort((a, b) => (values[a] as number) - (values[b] as number));
  const ranks = new Array<number>(values.length).fill(0);
  let i = 0;
  while (i < order.length) {
    let j = i;
    while (j + 1 < order.length && values[order[j + 1] as number] === values[order[i] as number]) j++;
    const rank = (i + j) / 2 + 1;
    for (let t = i; t <= j; t++) ranks[order[t] as number] = rank;
    i = j + 1;
  }
  return ranks;
}
