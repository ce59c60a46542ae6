import type { TopLevelSpec } from 'vega-lite';
import type { LearningHistory } from '../trainAutoencoder.ts';
import { CHART_STYLE } from './chartStyle.ts';
import { renderVegaLite } from './renderVegaLite.ts';

/**
 * Learning curve as SVG: training and validation loss per epoch (solid blue = validation, dashed grey =
 * training), a vertical rule and label at the kept epoch.
 *
 * @example
 * await learningCurveSvg(result.history, result.bestEpoch, 'Autoencoder, latent 4'); // '<svg ...'
 */
export function learningCurveSvg(history: LearningHistory, bestEpoch: number, title: string): Promise<string> {
  const values: { epoch: number; loss: number; series: string }[] = [];
  history.train.forEach((loss, i) => values.push({ epoch: i + 1, loss, series: 'training' }));
  history.val.forEach((loss, i) => values.push({ epoch: i + 1, loss, series: 'validation' }));
  const best = history.val[bestEpoch - 1];
  const late = bestEpoch > Math.max(history.train.length, history.val.length) / 2;
  const spec: TopLevelSpec = {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title: { text: title, font: CHART_STYLE.font },
    width: CHART_STYLE.width,
    height: 260,
    config: { font: CHART_STYLE.font, view: { stroke: null } },
    layer: [
      {
        data: { values },
        mark: { type: 'line', strokeWidth: 2 },
        encoding: {
          x: { field: 'epoch', type: 'quantitative', title: 'epoch', axis: { tickMinStep: 1 } },
          y: { field: 'loss', type: 'quantitative', title: 'reconstruction MSE (present entries)', scale: { zero: false } },
          color: {
            field: 'series',
            type: 'nominal',
            title: null,
            scale: { domain: ['validation', 'training'], range: [CHART_STYLE.primary, CHART_STYLE.secondary] },
            legend: { orient: 'top', direction: 'horizontal' },
          },
          strokeDash: {
            field: 'series',
            type: 'nominal',
            scale: { domain: ['validation', 'training'], range: [[1, 0], [6, 4]] },
          },
        },
      },
      {
        data: { values: [{ epoch: bestEpoch, label: `kept: epoch ${bestEpoch}${best === undefined ? '' : `, val ${best.toPrecision(4)}`}` }] },
        layer: [
          { mark: { type: 'rule', color: CHART_STYLE.reference, strokeDash: [2, 2] }, encoding: { x: { field: 'epoch', type: 'quantitative' } } },
          {
            // the label sits on the side of the rule with more room, so it never runs off the chart
            mark: { type: 'text', align: late ? 'right' : 'left', baseline: 'top', dx: late ? -4 : 4, dy: 4, y: 0, color: CHART_STYLE.reference },
            encoding: { x: { field: 'epoch', type: 'quantitative' }, text: { field: 'label', type: 'nominal' } },
          },
        ],
      },
    ],
  };
  return renderVegaLite(spec);
}
