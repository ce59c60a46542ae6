import type { Comp, CompsResult } from '../request/apiContract.ts';
import type { DimensionInfo } from '../request/apiContract.ts';
import { fetchMap } from './api.ts';
import { h } from './dom.ts';
import { download, toCsv } from './exportTable.ts';
import { compsCsvRecords } from '../report/compsCsvRecords.ts';
import { formatCount, formatPercent, formatWhole } from '../text/numberFormats.ts';
import type { CsvValue } from '../text/stringifyCsv.ts';
import { gradeChartSpec } from './gradeChartSpec.ts';
import { poolMapSpec, type Highlight } from './poolMapSpec.ts';
import { renderChart } from './renderChart.ts';
import type { TopLevelSpec } from 'vega-lite';

/** A column the table shows and exports beside the common ones (salary, outcome...). */
export interface ExtraColumn {
  readonly title: string;
  /** Its column in the CSV download (snake_case, as the CLI's CSV names it). */
  readonly csv: string;
  /** The value as exported (CSV) and, unless `shown` says otherwise, as shown. */
  readonly value: (comp: Comp, index: number) => string | number | boolean | null;
  readonly shown?: (value: string | number | boolean) => string;
}

/** What a view adds to the common results: columns, a sentence, its own chart, the answer to export. */
export interface ShowOptions {
  readonly extra?: readonly ExtraColumn[];
  /** The API's answer as it came (exported as JSON); default the result shown. */
  readonly raw?: unknown;
  readonly note?: string;
  /** How the pool was chosen, in words (the form's rules), shown under the pool's rules. */
  readonly poolChoice?: string | undefined;
  /** The first line of the summary (default: how many comps for whom). */
  readonly headline?: string;
  readonly chart?: { readonly title: string; readonly spec: TopLevelSpec; readonly label: string };
}

export interface ResultsPanel {
  readonly element: HTMLElement;
  show(result: CompsResult, dims: readonly DimensionInfo[], options?: ShowOptions): Promise<void>;
  clear(message: string): void;
}


/** The results of any comps-like job: summary, table, grade chart of the chosen comp, pool map, exports. */
export function resultsPanel(fileStem: () => string): ResultsPanel {
  const summary = h('div', { class: 'summary', id: 'summary' });
  const csvButton = h('button', { type: 'button', id: 'export-csv', disabled: '' }, 'Download CSV');
  const jsonButton = h('button', { type: 'button', id: 'export-json', disabled: '' }, 'Download JSON');
  const table = h('table', { class: 'comps', id: 'comps-table' });
  const gradeTitle = h('figcaption', {}, 'Grades by dimension');
  const gradeChart = h('div', { class: 'chart', id: 'grade-chart' });
  const mapChart = h('div', { class: 'chart', id: 'map-chart' });
  const extraTitle = h('figcaption', {});
  const extraChartBox = h('div', { class: 'chart', id: 'extra-chart' });
  const extraChart = h('figure', { class: 'extra', hidden: '' }, extraTitle, extraChartBox);
  // hidden until an answer is drawn: no caption above an empty chart (the landing page, after an error)
  const charts = h(
    'div',
    { class: 'charts', hidden: '' },
    h('figure', {}, gradeTitle, gradeChart),
    h('figure', {}, h('figcaption', {}, 'The pool on its two main axes (PCA of the z-scores)'), mapChart),
  );
  const element = h(
    'section',
    { class: 'results', 'aria-live': 'polite' },
    summary,
    h('div', { class: 'toolbar' }, csvButton, jsonButton),
    h('div', { class: 'table-wrap' }, table),
    extraChart,
    charts,
  );
  let current: { result: CompsResult; extra: readonly ExtraColumn[]; raw: unknown } | null = null;


  csvButton.addEventListener('click', () => {
    if (!current) return;
    const { result, extra } = current;
    const columns = extra.map((x) => ({ name: x.csv, value: (c: Comp, i: number): CsvValue => x.value(c, i) }));
    download(`${fileStem()}.csv`, 'text/csv', toCsv(compsCsvRecords(result, columns)));
  });
  jsonButton.addEventListener('click', () => {
    if (!current) return;
    download(`${fileStem()}.json`, 'application/json', JSON.stringify(current.raw, null, 2) + '\n');
  });

  const targetLabel = (r: CompsResult): string => r.query.name ?? 'target profile';

  async function selectComp(result: CompsResult, dims: readonly DimensionInfo[], index: number): Promise<void> {
    const comp = result.comps[index];
    if (!comp) return;
    for (const [i, tr] of Array.from(table.querySelectorAll('tbody tr')).entries()) tr.classList.toggle('selected', i === index);
    gradeTitle.textContent = `Grades: ${targetLabel(result)} and ${comp.name} (${comp.season} ${comp.level})`;
    const label = (name: string): string => dims.find((d) => d.name === name)?.label ?? name;
    await renderChart(gradeChart, gradeChartSpec(comp, targetLabel(result), label), `grades of ${targetLabel(result)} and ${comp.name} by dimension`);
  }

  return {
    element,
    clear(message: string): void {
      current = null;
      summary.replaceChildren(h('p', { class: 'message' }, message));
      table.replaceChildren();
      gradeChart.replaceChildren();
      gradeTitle.textContent = 'Grades by dimension';
      mapChart.replaceChildren();
      extraChartBox.replaceChildren();
      extraTitle.textContent = '';
      extraChart.hidden = true;
      charts.hidden = true;
      csvButton.disabled = true;
      jsonButton.disabled = true;
    },
    async show(result, dims, options = {}): Promise<void> {
      const extra = options.extra ?? [];
      current = { result, extra, raw: options.raw ?? result };
      const q = result.query;
      const who = q.kind === 'player' ? `${q.name ?? ''} (${q.player_id ?? ''}), ${q.season ?? ''} ${q.level ?? ''}, ${q.position}` : `a hand-built ${q.position} profile`;
      summary.replaceChildren(
        options.headline !== undefined ? h('p', {}, h('strong', {}, options.headline)) : h('p', {}, h('strong', {}, `${formatCount(result.comps.length)} ${result.comps.length === 1 ? 'comp' : 'comps'}`), ` for ${who}`),
        h('p', { class: 'meta' }, `${formatCount(result.pool.eligible)} of ${formatCount(result.pool.group_size)} ${q.group} player-seasons in the pool · searched ${q.method === 'hnsw' ? 'with the index' : 'exactly'}`),
        h('p', { class: 'meta', id: 'pool-rules' }, `Pool: ${result.pool.summary}`),
        ...(q.space_note ? [h('p', { class: 'meta' }, `Comps ranked in the input space: ${q.space_note}.`)] : []),
        ...(options.poolChoice ? [h('p', { class: 'meta', id: 'pool-choice' }, options.poolChoice)] : []),
        ...(options.note ? [h('p', { class: 'note', id: 'result-note' }, options.note)] : []),
      );
      const pitchers = result.comps[0]?.sample_unit === 'BF';
      const head = h('tr', {}, ...['#', 'Name', 'Season', 'Level', 'Pos', 'Age', ...(pitchers ? ['BF', 'IP'] : ['PA']), 'Likeness', 'Coverage', ...extra.map((c) => c.title), 'Alike', 'Apart'].map((t) => h('th', { scope: 'col' }, t)));
      const label = (name: string): string => dims.find((d) => d.name === name)?.label ?? name;
      const body = result.comps.map((c, i) => {
        const bar = h('span', { class: 'bar' });
        bar.style.width = `${Math.max(0, Math.min(100, c.likeness))}%`;
        const tr = h(
          'tr',
          { tabindex: '0' },
          h('td', { class: 'num' }, String(c.rank)),
          h('td', {}, c.name),
          h('td', { class: 'num' }, String(c.season)),
          h('td', {}, c.level),
          h('td', {}, c.position),
          h('td', { class: 'num' }, c.age === null ? '—' : String(c.age)),
          h('td', { class: 'num' }, formatCount(c.sample)),
          ...(pitchers ? [h('td', { class: 'num' }, c.ip ?? '—')] : []),
          h('td', { class: 'num likeness' }, h('span', { class: 'bar-track' }, bar), formatWhole(c.likeness)),
          h('td', { class: 'num' }, formatPercent(c.coverage)),
          ...extra.map((x) => {
            const v = x.value(c, i);
            return h('td', { class: typeof v === 'number' ? 'num' : '' }, v === null ? '—' : x.shown ? x.shown(v) : String(v));
          }),
          h('td', { class: 'alike' }, c.alike.map(label).join(', ')),
          h('td', { class: 'apart' }, c.apart.map(label).join(', ')),
        );
        const pick = (): void => void selectComp(result, dims, i);
        tr.addEventListener('click', pick);
        tr.addEventListener('keydown', (ev) => {
          if (ev.key === 'Enter' || ev.key === ' ') {
            ev.preventDefault();
            pick();
          }
        });
        return tr;
      });
      // each cell names its column, for the narrow layout where a row reflows as a card (style.css)
      const titles = Array.from(head.children).map((th) => th.textContent ?? '');
      for (const tr of body) for (const [j, td] of Array.from(tr.children).entries()) td.setAttribute('data-label', titles[j] ?? '');
      table.replaceChildren(h('thead', {}, head), h('tbody', {}, ...body));
      if (result.comps.length === 0) table.append(h('tbody', {}, h('tr', {}, h('td', { colspan: String(head.children.length) }, 'No comp passes the filters.'))));
      csvButton.disabled = false;
      jsonButton.disabled = false;
      const highlights: Highlight[] = result.comps.map((c) => ({ playerId: c.player_id, season: c.season, level: c.level, role: 'comp', rank: c.rank }));
      if (q.kind === 'player' && q.player_id !== null && q.season !== null && q.level !== null) {
        highlights.push({ playerId: q.player_id, season: q.season, level: q.level, role: 'target', rank: null });
      }
      charts.hidden = false;
      const drawMap = fetchMap(q.group).then((map) => renderChart(mapChart, poolMapSpec(map, highlights), `map of the ${q.group} pool with the target and comps`));
      const chart = options.chart;
      const drawExtra = chart
        ? renderChart(extraChartBox, chart.spec, chart.label).then(() => {
            extraTitle.textContent = chart.title;
            extraChart.hidden = false;
          })
        : Promise.resolve();
      await Promise.all([selectComp(result, dims, 0), drawMap, drawExtra]);
    },
  };
}
