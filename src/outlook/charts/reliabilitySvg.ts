import type { TopLevelSpec } from 'vega-lite';
import { CHART_STYLE } from '../../embed/charts/chartStyle.ts';
import { renderVegaLite } from '../../embed/charts/renderVegaLite.ts';
import type { KindSummary } from '../backtestFile.ts';

/**
 * Reliability chart of the backtest as SVG: in each forecast bin (tenths), the mean forecast
 * reached-the-top-level probability (x) against the share that did reach it (y), points sized by the
 * number of forecasts, with the diagonal of perfect calibration (dashed). Murphy (1973): the squared
 * gaps to the diagonal, weighted by the counts, are the reliability term.
 *
 * @example
 * await reliabilitySvg(summary, 'Hitters'); // '<svg ...'
 */
export function reliabilitySvg(k: KindSummary, title: string): Promise<string> {
  const values = k.reliability_bins.map((b) => ({ forecast: b.forecast, observed: b.observed, n: b.n }));
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: `${title}: forecast against realised share (reached the top level)`, font: CHART_STYLE.font },
    width: CHART_STYLE.width,
    height: CHART_STYLE.width,
    config: { font: CHART_STYLE.font, view: { stroke: null } },
    layer: [
      {
        data: { values: [{ x: 0, y: 0 }, { x: 1, y: 1 }] },
        mark: { type: 'line', color: CHART_STYLE.secondary, strokeDash: [6, 4] },
        encoding: {
          x: { field: 'x', type: 'quantitative', title: 'forecast probability (bin mean)', scale: { domain: [0, 1] } },
          y: { field: 'y', type: 'quantitative', title: 'share that reached it', scale: { domain: [0, 1] } },
        },
      },
      {
        data: { values },
        layer: [
          { mark: { type: 'line', color: CHART_STYLE.primary }, encoding: { x: { field: 'forecast', type: 'quantitative' }, y: { field: 'observed', type: 'quantitative' } } },
          {
            mark: { type: 'circle', color: CHART_STYLE.primary, opacity: 0.8 },
            encoding: {
              x: { field: 'forecast', type: 'quantitative' },
              y: { field: 'observed', type: 'quantitative' },
              size: { field: 'n', type: 'quantitative', title: 'forecasts', legend: { orient: 'bottom-right' } },
            },
          },
        ],
      },
    ],
  };
  return renderVegaLite(spec);
}
