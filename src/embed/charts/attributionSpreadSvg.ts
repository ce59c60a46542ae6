import type { TopLevelSpec } from 'vega-lite';
import { CHART_STYLE } from './chartStyle.ts';
import { renderVegaLite } from './renderVegaLite.ts';

export interface AttributionRow {
  readonly dimension: string;
  readonly attribution: number;
}

/** Most strip marks per dimension: beyond it the strip shows evenly spaced order statistics. */
export const MAX_STRIP_PER_DIMENSION = 80;

/**
 * Up to `max` values standing for a sorted list: all of them when few, else the order statistics at
 * ranks round(i (n - 1) / (max - 1)), i = 0..max-1 (so the minimum, the maximum and the shape stay).
 *
 * @example
 * thinSorted([1, 2, 3, 4, 5], 3); // => [1, 3, 5]
 */
export function thinSorted(sorted: readonly number[], max: number): number[] {
  if (sorted.length <= max) return [...sorted];
  const out: number[] = [];
  for (let i = 0; i < max; i++) out.push(sorted[Math.round((i * (sorted.length - 1)) / (max - 1))] ?? NaN);
  return out;
}

/**
 * Spread of attributions per dimension over many queries, as SVG: one row per dimension, sorted by
 * mean |attribution| (largest on top), a light strip of the values (at most MAX_STRIP_PER_DIMENSION a
 * dimension, evenly spaced order statistics beyond that, to keep the file small), a box from the first to the third
 * quartile with whiskers to the extremes and a dark median tick (in the box hue when the box has no
width), all in one neutral hue; a rule at 0.
 * No colour encodes a value, so it reads the same for every kind of colour vision.
 *
 * @example
 * await attributionSpreadSvg([{ dimension: 'obp', attribution: 0.4 }, { dimension: 'iso', attribution: -0.1 }]);
 */
export function attributionSpreadSvg(rows: readonly AttributionRow[]): Promise<string> {
  const totals = new Map<string, { sum: number; count: number }>();
  for (const r of rows) {
    const t = totals.get(r.dimension) ?? { sum: 0, count: 0 };
    t.sum += Math.abs(r.attribution);
    t.count++;
    totals.set(r.dimension, t);
  }
  const order = [...totals.entries()]
    .map(([dimension, t]) => ({ dimension, mean: t.sum / t.count }))
    .sort((a, b) => b.mean - a.mean || a.dimension.localeCompare(b.dimension))
    .map((e) => e.dimension);
  const values = rows.map((r) => ({ dimension: r.dimension, attribution: r.attribution }));
  const byDimension = new Map<string, number[]>();
  for (const r of rows) {
    const list = byDimension.get(r.dimension) ?? [];
    list.push(r.attribution);
    byDimension.set(r.dimension, list);
  }
  const strip = [...byDimension].flatMap(([dimension, list]) =>
    thinSorted([...list].sort((a, b) => a - b), MAX_STRIP_PER_DIMENSION).map((attribution) => ({ dimension, attribution })),
  );
  const y = { field: 'dimension', type: 'nominal', sort: order, title: null } as const;
  const x = { field: 'attribution', type: 'quantitative', title: 'attribution (embedded-distance units)' } as const;
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: 'Attribution per dimension across queries', subtitle: 'sorted by mean |attribution|; box = quartiles, tick = median', font: CHART_STYLE.font },
    width: CHART_STYLE.width,
    height: { step: 22 },
    config: { font: CHART_STYLE.font, view: { stroke: null }, mark: { color: CHART_STYLE.primary }, boxplot: { box: { color: CHART_STYLE.primary } } },
    data: { values },
    layer: [
      { data: { values: [{}] }, mark: { type: 'rule', color: CHART_STYLE.reference }, encoding: { x: { datum: 0, type: 'quantitative' } } },
      { data: { values: strip }, mark: { type: 'tick', color: CHART_STYLE.primary, opacity: 0.25, thickness: 1, size: 12 }, encoding: { x, y } },
      {
        mark: {
          type: 'boxplot',
          extent: 'min-max',
          size: 10,
          box: { color: CHART_STYLE.primary, opacity: 0.35 },
          median: { color: CHART_STYLE.reference, size: 16, thickness: 2, opacity: 1 },
          rule: { color: CHART_STYLE.primary },
        },
        encoding: { x, y },
      },
    ],
  };
  return renderVegaLite(spec);
}
