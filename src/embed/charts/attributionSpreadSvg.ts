import type { TopLevelSpec } from 'vega-lite';
import { CHART_STYLE } from './chartStyle.ts';
import { renderVegaLite } from './renderVegaLite.ts';

export interface AttributionRow {
  readonly dimension: string;
  readonly attribution: number;
}

/**
 * Spread of attributions per dimension over many queries, as SVG: one row per dimension, sorted by
 * mean |attribution| (largest on top), a light strip of every value, a box from the first to the third
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
      { mark: { type: 'rule', color: CHART_STYLE.reference }, encoding: { x: { datum: 0, type: 'quantitative' } } },
      { mark: { type: 'tick', color: CHART_STYLE.primary, opacity: 0.25, thickness: 1, size: 12 }, encoding: { x, y } },
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
