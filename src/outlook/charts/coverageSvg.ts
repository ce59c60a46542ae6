import type { TopLevelSpec } from 'vega-lite';
import { CHART_STYLE } from '../../embed/charts/chartStyle.ts';
import { renderVegaLite } from '../../embed/charts/renderVegaLite.ts';
import type { KindSummary } from '../backtestFile.ts';

/**
 * Coverage chart of the backtest as SVG: for the peak range and the top-level seasons range, the share
 * of realised values inside the p10-p90 range (bars, with their 95% bootstrap interval as a rule), against
 * the nominal 0.80 (dashed), and the peak range's coverage before the conformal adjustment.
 *
 * @example
 * await coverageSvg(summary, 'Hitters', 'peak OPS+'); // '<svg ...'
 */
export function coverageSvg(k: KindSummary, title: string, peakName: string): Promise<string> {
  const values = [
    { range: `${peakName}, adjusted`, coverage: k.peak_coverage.value, low: k.peak_coverage.low, high: k.peak_coverage.high },
    { range: `${peakName}, comps' own`, coverage: k.peak_coverage_before_adjustment, low: null, high: null },
    { range: 'top-level seasons, adjusted', coverage: k.seasons_coverage.value, low: k.seasons_coverage.low, high: k.seasons_coverage.high },
  ].filter((v) => v.coverage !== null);
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: `${title}: share of realised values inside p10-p90`, font: CHART_STYLE.font },
    width: CHART_STYLE.width,
    height: 160,
    config: { font: CHART_STYLE.font, view: { stroke: null } },
    layer: [
      {
        data: { values },
        mark: { type: 'bar', color: CHART_STYLE.primary, height: 18 },
        encoding: {
          y: { field: 'range', type: 'nominal', title: null, sort: null },
          x: { field: 'coverage', type: 'quantitative', title: 'coverage (nominal 0.80)', scale: { domain: [0, 1] } },
        },
      },
      {
        data: { values: values.filter((v) => v.low !== null) },
        mark: { type: 'rule', color: CHART_STYLE.reference, strokeWidth: 2 },
        encoding: { y: { field: 'range', type: 'nominal', sort: null }, x: { field: 'low', type: 'quantitative' }, x2: { field: 'high' } },
      },
      {
        data: { values: [{ nominal: 0.8 }] },
        mark: { type: 'rule', color: CHART_STYLE.secondary, strokeDash: [6, 4] },
        encoding: { x: { field: 'nominal', type: 'quantitative' } },
      },
    ],
  };
  return renderVegaLite(spec);
}
