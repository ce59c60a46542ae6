import type { ColumnTable, RecordOf, StintWeight } from './ColumnSpec.ts';
import { isRecordOf, type RowFields } from './RecordReader.ts';
import { WeightedMean, addCount } from './WeightedMean.ts';

/**
 * Combines the stints of one player-season (same key, file order) as the
 * file's column table says: key columns from the first stint, the teams of
 * all stints (each once, in order), `sum` columns summed (an optional count
 * is unknown when a stint lacks it), `mean` columns weighted by their weight,
 * by the fallback when a stint with the value lacks that weight (see
 * WeightedMean). A weighted mean uses only the stints that have the value.
 * With `scale` (one factor per stint; windowRoster's recency weights), each stint's counts and mean weights
 * are multiplied by its factor first (a stint at 0.5 counts as half its events), each summed count rounded to
 * a whole number.
 *
 * @example
 * // batting, stint 1: PA 120, bbe 80, ev_avg 88.5; stint 2: PA 60, bbe 40, ev_avg 85.5
 * // => PA 180, bbe 120, evAvgMph (88.5*80 + 85.5*40) / 120 = 87.5
 */
export function combineStints<T extends ColumnTable>(table: T, stints: readonly RecordOf<T>[], scale?: readonly number[]): RecordOf<T> {
  const rows: readonly RowFields[] = stints;
  const by = (i: number): number => scale?.[i] ?? 1;
  const first = rows[0];
  if (first === undefined) throw new RangeError('combineStints needs at least one stint');
  const out: RowFields = {};
  for (const spec of table) {
    const { field } = spec;
    if (spec.kind === 'team') {
      const teams: string[] = [];
      for (const s of rows) for (const t of textsAt(s, field)) if (!teams.includes(t)) teams.push(t);
      out[field] = teams;
    } else if (spec.combine === undefined) {
      out[field] = first[field];
    } else if (spec.combine === 'sum') {
      let total = scaled(numberAt(first, field), by(0));
      for (let i = 1; i < rows.length; i++) {
        const s = rows[i];
        if (s !== undefined) total = addCount(total, scaled(numberAt(s, field), by(i)));
      }
      // scaled counts are rounded once summed: every count stays a whole number of events (as the store keeps them)
      if (total !== undefined) out[field] = scale ? Math.round(total) : total;
    } else {
      const { mean, fallback } = spec.combine;
      const m = new WeightedMean();
      rows.forEach((s, i) => {
        const v = numberAt(s, field);
        if (v !== undefined) m.add(v, scaled(weightOf(s, mean), by(i)), (scaled(weightOf(s, fallback ?? mean), by(i))) ?? 0);
      });
      const value = m.value();
      if (value !== undefined) out[field] = value;
    }
  }
  const shape = shapeOf(table);
  if (!isRecordOf(table, out, shape.names, shape.present)) throw new TypeError('combined stints do not fit the column table');
  return out;
}

/** Each table's field names and which fields a record must have (isRecordOf's arguments), made once per table. */
const shapes = new WeakMap<ColumnTable, { readonly names: readonly string[]; readonly present: readonly boolean[] }>();

function shapeOf(table: ColumnTable): { readonly names: readonly string[]; readonly present: readonly boolean[] } {
  let shape = shapes.get(table);
  if (!shape) shapes.set(table, (shape = { names: table.map((s) => s.field), present: table.map((s) => s.required || s.kind === 'team') }));
  return shape;
}

function scaled(v: number | undefined, by: number): number | undefined {
  return v === undefined || by === 1 ? v : v * by;
}

function numberAt(s: RowFields, field: string): number | undefined {
  const v = s[field];
  return typeof v === 'number' ? v : undefined;
}

function textsAt(s: RowFields, field: string): readonly string[] {
  const v = s[field];
  return Array.isArray(v) ? v.filter((t): t is string => typeof t === 'string') : [];
}

/** A stint's weight; undefined when a field it needs is unknown. */
function weightOf(s: RowFields, weight: StintWeight): number | undefined {
  if (typeof weight === 'string') return numberAt(s, weight);
  let w = numberAt(s, weight.field);
  for (const f of weight.minus) {
    const v = numberAt(s, f);
    w = w === undefined || v === undefined ? undefined : w - v;
  }
  return w;
}
