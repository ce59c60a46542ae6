/**
 * The seasons a row stands for, as tables show them: its season, or with `--window N` the first and
 * last season of its window (`2021-23`, the last cut to its final two digits when the century is the
 * same; one season alone when the window holds only it).
 *
 * @example
 * seasonSpan({ season: 2023, seasons: [2021, 2023] }); // => '2021-23'
 * seasonSpan({ season: 2023 }); // => '2023'
 */
export function seasonSpan(row: { readonly season: number | null; readonly seasons?: readonly [number, number] }): string {
  if (row.season === null) return '-';
  if (!row.seasons || row.seasons[0] === row.seasons[1]) return String(row.season);
  const [first, last] = row.seasons;
  const sameCentury = Math.floor(first / 100) === Math.floor(last / 100);
  return `${first}-${sameCentury ? String(last % 100).padStart(2, '0') : last}`;
}
