import { UsageError } from '../errors/KindredError.ts';
import { checkEmbedData, type EmbedData } from './EmbedData.ts';

/**
 * The training pairs of the cross-season objective: for every row, one pair per row of the same player
 * (`data.groups`) at his nearest other season before and his nearest other season after (any level),
 * x = the row, y = that other row. Trained to give back y from x, an encoder can only profit from what a
 * player carries from one season to the next (his talent, as far as it persists), not from one season's
 * luck, which the other season does not share. A pair is dropped when x and y share no present dimension
 * (it would add nothing to the loss). Pairs are listed in row order, then partner order; a player with a
 * single season gives none. Cost O(n log n).
 *
 * @example
 * // player a in 2020, 2021 and 2023; player b once
 * const p = crossSeasonPairs({ x, n: 4, d, groups: ['a', 'a', 'a', 'b'] }, [2020, 2021, 2023, 2021]);
 * p.n; // => 4: 2020->2021, 2021->2020, 2021->2023, 2023->2021
 * p.groups; // => ['a', 'a', 'a', 'a']
 */
export function crossSeasonPairs(data: EmbedData, seasons: ArrayLike<number>): EmbedData & { readonly y: Float64Array; readonly source: Int32Array; readonly partner: Int32Array } {
  checkEmbedData(data);
  const { n, d, x, groups } = data;
  if (seasons.length !== n) throw new UsageError(`crossSeasonPairs: ${seasons.length} seasons (expected one per row, ${n})`);
  const rowsOf = new Map<string, number[]>();
  for (let i = 0; i < n; i++) {
    const g = groups[i] ?? '';
    const rows = rowsOf.get(g);
    if (rows) rows.push(i);
    else rowsOf.set(g, [i]);
  }
  const source: number[] = [];
  const partner: number[] = [];
  const sharesADimension = (a: number, b: number): boolean => {
    for (let j = 0; j < d; j++) if (!Number.isNaN(x[a * d + j] ?? NaN) && !Number.isNaN(x[b * d + j] ?? NaN)) return true;
    return false;
  };
  for (let i = 0; i < n; i++) {
    const rows = rowsOf.get(groups[i] ?? '') ?? [];
    const season = seasons[i] ?? 0;
    let before = -Infinity;
    let after = Infinity;
    for (const r of rows) {
      const s = seasons[r] ?? 0;
      if (s < season && s > before) before = s;
      if (s > season && s < after) after = s;
    }
    for (const r of rows) {
      const s = seasons[r] ?? 0;
      if ((s === before || s === after) && sharesADimension(i, r)) {
        source.push(i);
        partner.push(r);
      }
    }
  }
  const m = source.length;
  const px = new Float64Array(m * d);
  const py = new Float64Array(m * d);
  const pg: string[] = [];
  for (let p = 0; p < m; p++) {
    const i = source[p] ?? 0;
    const r = partner[p] ?? 0;
    px.set(x.subarray(i * d, (i + 1) * d), p * d);
    py.set(x.subarray(r * d, (r + 1) * d), p * d);
    pg.push(groups[i] ?? '');
  }
  return { x: px, y: py, n: m, d, groups: pg, source: Int32Array.from(source), partner: Int32Array.from(partner) };
}
