import type { TopLevelSpec } from 'vega-lite';
import type { CheaperResult } from '../request/apiContract.ts';
import { PALETTE } from './palette.ts';

/**
 * Salary against likeness for the cheaper comps: each comp a dot, those on the value frontier (no
 * listed comp both at least as alike and at most as expensive) orange and joined by a line, the
 * others hollow blue; the salary limit as a dashed guide.
 */
export function frontierChartSpec(r: CheaperResult): TopLevelSpec {
  const points = r.comps.map((c) => ({ name: c.name, season: c.season, salary: c.salary_usd / 1e6, likeness: c.likeness, frontier: c.frontier ? 'on the frontier' : 'off the frontier' }));
  const x = { field: 'salary', type: 'quantitative' as const, title: 'salary that season (USD millions)', scale: { zero: true } };
  const y = { field: 'likeness', type: 'quantitative' as const, title: 'likeness (0-100)', scale: { zero: false }, axis: { format: 'd', tickMinStep: 1 } };
  return {
    width: 380,
    height: 240,
    config: { view: { stroke: '#DDDDDD' }, axis: { labelFontSize: 10, titleFontSize: 11 }, legend: { orient: 'bottom', labelFontSize: 11 } },
    layer: [
      {
        data: { values: [{ limit: r.pool.salary.limit_usd / 1e6 }] },
        mark: { type: 'rule', strokeDash: [4, 3], color: PALETTE.pool },
        encoding: { x: { field: 'limit', type: 'quantitative' }, tooltip: [{ field: 'limit', title: 'limit (USD millions)' }] },
      },
      {
        data: { values: points },
        transform: [{ filter: "datum.frontier == 'on the frontier'" }],
        mark: { type: 'line', color: PALETTE.comp, strokeWidth: 1.5 },
        encoding: { x, y, order: { field: 'salary' } },
      },
      {
        data: { values: points },
        mark: { type: 'point', size: 70, strokeWidth: 1.5 },
        encoding: {
          x,
          y,
          color: { field: 'frontier', type: 'nominal', scale: { domain: ['on the frontier', 'off the frontier'], range: [PALETTE.comp, PALETTE.target] }, title: null },
          shape: { field: 'frontier', type: 'nominal', scale: { domain: ['on the frontier', 'off the frontier'], range: ['diamond', 'circle'] }, title: null },
          fill: { field: 'frontier', type: 'nominal', scale: { domain: ['on the frontier', 'off the frontier'], range: [PALETTE.comp, 'transparent'] }, legend: null },
          tooltip: [{ field: 'name' }, { field: 'season' }, { field: 'salary', title: 'salary (USD millions)', format: '.2f' }, { field: 'likeness', format: '.0f' }],
        },
      },
    ],
  };
}
