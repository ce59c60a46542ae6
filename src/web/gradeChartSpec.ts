import type { TopLevelSpec } from 'vega-lite';
import type { Comp } from '../request/apiContract.ts';
import { PALETTE } from './palette.ts';

/** Width of the grade axis in pixels (the alike/apart tags sit to its right). */
const CHART_WIDTH = 360;
/** The 20-80 scouting scale, drawn whole. */
const GRADE_SCALE = { domain: [20, 80], zero: false, nice: false };

export interface GradeRow {
  readonly dimension: string;
  readonly side: string;
  readonly grade: number;
  readonly natural: string;
  readonly mark: string;
}

/** Label of a dimension for the chart (its short label when known). */
export type LabelOf = (name: string) => string;

/**
 * Rows of the grade chart: the target's and the comp's 20-80 grade on every dimension both have,
 * and a mark (alike, apart or none) per dimension.
 */
export function gradeRows(comp: Comp, targetName: string, labelOf: LabelOf): GradeRow[] {
  const rows: GradeRow[] = [];
  for (const d of comp.dimensions) {
    if (d.target_grade === null || d.comp_grade === null) continue;
    const mark = comp.alike.includes(d.name) ? 'alike' : comp.apart.includes(d.name) ? 'apart' : '';
    const dimension = labelOf(d.name);
    rows.push({ dimension, side: targetName, grade: d.target_grade, natural: d.target === null ? '' : String(d.target), mark });
    rows.push({ dimension, side: comp.name, grade: d.comp_grade, natural: d.comp === null ? '' : String(d.comp), mark });
  }
  return rows;
}

/**
 * A dot plot of grades per dimension: one row per dimension, the target in blue and the comp in
 * orange on the 20-80 scale, joined by a grey bar; a green "alike" or vermillion "apart" tag on the
 * right; a guide at 50 (average).
 */
export function gradeChartSpec(comp: Comp, targetName: string, labelOf: LabelOf): TopLevelSpec {
  const rows = gradeRows(comp, targetName, labelOf);
  const order = [...new Set(rows.map((r) => r.dimension))];
  const y = { field: 'dimension', type: 'nominal' as const, sort: order, title: null };
  return {
    width: CHART_WIDTH,
    height: { step: 18 },
    data: { values: rows },
    config: { view: { stroke: null }, axis: { labelFontSize: 11, titleFontSize: 11 }, legend: { orient: 'bottom', labelFontSize: 11 } },
    layer: [
      {
        mark: { type: 'rule', color: PALETTE.pool, strokeDash: [3, 3] },
        encoding: { x: { datum: 50, type: 'quantitative', scale: GRADE_SCALE } },
      },
      {
        mark: { type: 'rule', color: '#C8C8C8', strokeWidth: 3 },
        encoding: {
          y,
          x: { aggregate: 'min', field: 'grade', type: 'quantitative', scale: GRADE_SCALE },
          x2: { aggregate: 'max', field: 'grade' },
        },
      },
      {
        mark: { type: 'point', filled: true, size: 80, opacity: 1 },
        encoding: {
          y,
          x: { field: 'grade', type: 'quantitative', scale: GRADE_SCALE, axis: { values: [20, 30, 40, 50, 60, 70, 80] }, title: 'grade (20-80)' },
          color: { field: 'side', type: 'nominal', scale: { domain: [targetName, comp.name], range: [PALETTE.target, PALETTE.comp] }, title: null },
          shape: { field: 'side', type: 'nominal', scale: { domain: [targetName, comp.name], range: ['circle', 'diamond'] }, title: null },
          tooltip: [
            { field: 'side', title: 'player' },
            { field: 'dimension' },
            { field: 'grade' },
            { field: 'natural', title: 'value' },
          ],
        },
      },
      {
        transform: [{ filter: { and: [{ field: 'mark', oneOf: ['alike', 'apart'] }, { field: 'side', equal: targetName }] } }],
        mark: { type: 'text', align: 'left', fontSize: 11, fontWeight: 'bold' },
        encoding: {
          y,
          x: { value: CHART_WIDTH + 8 },
          text: { field: 'mark' },
          color: { condition: { test: "datum.mark == 'alike'", value: PALETTE.alike }, value: PALETTE.apart },
        },
      },
    ],
  };
}
