import type { TopLevelSpec } from 'vega-lite';
import type { ProspectResult } from '../request/apiContract.ts';
import { PALETTE } from './palette.ts';

/** The peak measure of a prospect result: OPS+ (hitters, higher is better) or FIP- (pitchers, lower is better). */
export function peakMeasure(r: ProspectResult): { key: 'peak_ops_plus' | 'peak_fip_minus'; label: string } {
  return 'peak_ops_plus' in r.outlook ? { key: 'peak_ops_plus', label: 'peak OPS+' } : { key: 'peak_fip_minus', label: 'best FIP-' };
}

/** A comp's peak value (null when he had no qualifying top-level season). */
export function peakOf(c: ProspectResult['comps'][number]): number | null {
  return c.outcome.kind === 'hitter' ? c.outcome.peak_ops_plus : c.outcome.peak_fip_minus;
}

/**
 * How the outcome chart states its range: the band between the 10th and 90th percentiles holds the
 * middle 80% of the values (8 in 10), the tick is the median.
 */
export const OUTCOME_RANGE_WORDS = 'band: where the middle 8 in 10 of them fell; tick: the middle one';

/**
 * What became of the comps: left, the share who reached the top level in the window, the comps
 * (weighted by likeness) against the base rate of every player-season at that level and age; right,
 * each comp's peak value as a dot, with the band holding the middle 80% of the comps' and of the
 * base rate's values (10th to 90th percentile) and a tick at the median.
 */
export function outcomeChartSpec(r: ProspectResult): TopLevelSpec {
  const m = peakMeasure(r);
  const o = r.outlook;
  const compsPeak = m.key === 'peak_ops_plus' && 'peak_ops_plus' in o ? o.peak_ops_plus : 'peak_fip_minus' in o ? o.peak_fip_minus : null;
  const b = o.baseline;
  const basePeak = m.key === 'peak_ops_plus' && 'peak_ops_plus' in b ? b.peak_ops_plus : 'peak_fip_minus' in b ? b.peak_fip_minus : null;
  const reached = [
    { who: 'comps', share: o.reached_top_level ?? 0 },
    { who: 'base rate', share: b.reached_top_level ?? 0 },
  ];
  const dots = r.comps
    .filter((c) => !c.censored)
    .map((c) => ({ who: 'comps', value: peakOf(c), name: c.name, season: c.season }))
    .filter((d) => d.value !== null);
  const spans = [
    { who: 'comps', p10: compsPeak?.p10 ?? null, p50: compsPeak?.p50 ?? null, p90: compsPeak?.p90 ?? null },
    { who: 'base rate', p10: basePeak?.p10 ?? null, p50: basePeak?.p50 ?? null, p90: basePeak?.p90 ?? null },
  ].filter((s) => s.p50 !== null);
  const colour = { field: 'who', type: 'nominal' as const, scale: { domain: ['comps', 'base rate'], range: [PALETTE.target, PALETTE.pool] }, legend: null };
  const y = { field: 'who', type: 'nominal' as const, sort: ['comps', 'base rate'], title: null };
  return {
    config: { view: { stroke: null }, axis: { labelFontSize: 11, titleFontSize: 11 } },
    hconcat: [
      {
        width: 200,
        height: { step: 26 },
        title: { text: `reached the top level within ${o.horizon_seasons} seasons`, fontSize: 11, anchor: 'start' },
        data: { values: reached },
        layer: [
          {
            mark: { type: 'bar', height: 16 },
            encoding: {
              y,
              x: { field: 'share', type: 'quantitative', scale: { domain: [0, 1] }, axis: { format: '.0%', values: [0, 0.25, 0.5, 0.75, 1] }, title: null },
              color: colour,
              tooltip: [{ field: 'who' }, { field: 'share', format: '.1%' }],
            },
          },
          {
            mark: { type: 'text', align: 'left', dx: 4, fontSize: 11 },
            encoding: { y, x: { field: 'share', type: 'quantitative' }, text: { field: 'share', format: '.0%' } },
          },
        ],
      },
      {
        width: 300,
        height: { step: 26 },
        title: { text: `${m.label} of those who qualified`, subtitle: OUTCOME_RANGE_WORDS, fontSize: 11, subtitleFontSize: 10, anchor: 'start' },
        layer: [
          {
            data: { values: spans },
            mark: { type: 'rule', strokeWidth: 6, opacity: 0.35 },
            encoding: { y, x: { field: 'p10', type: 'quantitative', title: m.label, scale: { zero: false } }, x2: { field: 'p90' }, color: colour },
          },
          {
            data: { values: spans },
            mark: { type: 'tick', thickness: 2, size: 18 },
            encoding: { y, x: { field: 'p50', type: 'quantitative' }, color: colour, tooltip: [{ field: 'who' }, { field: 'p10', title: 'low end of the band' }, { field: 'p50', title: 'middle' }, { field: 'p90', title: 'high end of the band' }] },
          },
          {
            data: { values: dots },
            mark: { type: 'point', shape: 'diamond', filled: true, size: 50, color: PALETTE.comp, opacity: 0.9 },
            encoding: { y, x: { field: 'value', type: 'quantitative' }, tooltip: [{ field: 'name' }, { field: 'season' }, { field: 'value', title: m.label }] },
          },
        ],
      },
    ],
  };
}
