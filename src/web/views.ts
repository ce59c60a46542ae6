import type { DimensionInfo } from '../request/apiContract.ts';
import type { PoolReachDefaults, StoreInfo } from '../request/apiContract.ts';
import { fetchCheaper, fetchComps, fetchMatch, fetchProspect } from './api.ts';
import { h } from './dom.ts';
import { inPageWords } from './pageMessage.ts';
import { frontierChartSpec } from './frontierChartSpec.ts';
import { outcomeChartSpec, peakMeasure, peakOf } from './outcomeChartSpec.ts';
import type { CheaperComp, MatchCandidate, ProspectComp } from '../request/apiContract.ts';
import type { Comp } from '../request/apiContract.ts';
import type { FiltersForm } from './filtersForm.ts';
import type { PlayerPicker } from './playerPicker.ts';
import type { ResultsPanel } from './resultsPanel.ts';
import type { TargetBuilder } from './targetBuilder.ts';
import { formatCount, formatDecimal, formatPercent, formatSigned, formatUsd, formatWhole } from '../text/numberFormats.ts';

/** What every view can use: the shared controls and results panel, and the store's summary. */
export interface ViewContext {
  readonly first: PlayerPicker;
  readonly second: PlayerPicker;
  readonly builder: TargetBuilder;
  readonly filters: FiltersForm;
  readonly results: ResultsPanel;
  readonly dimsByGroup: ReadonlyMap<string, readonly DimensionInfo[]>;
  readonly info: StoreInfo;
}

/** One job of the page: its tab, which controls it shows, and how it runs. */
export interface ViewDef {
  readonly id: string;
  readonly label: string;
  readonly intro: string;
  readonly runLabel: string;
  readonly idle: string;
  readonly usesFilters: boolean;
  /** The number of comps the job starts with (the CLI's default for it). */
  readonly defaultK: number;
  /** The least coverage the form shows (and so sends) for this job: the server's default for it. */
  readonly minCoverageOf: (info: StoreInfo) => number;
  /** The pool's reach the form shows (and so sends) for this job; undefined for a job with a pool of its own. */
  readonly poolReachOf: (info: StoreInfo) => PoolReachDefaults | undefined;
  sections(ctx: ViewContext): HTMLElement[];
  run(ctx: ViewContext): Promise<void>;
}

/** `player`, `season`, `level`, `position` of the chosen player and season (empty when no player is chosen). */
export function playerParams(picker: PlayerPicker, prefix = ''): URLSearchParams {
  const p = new URLSearchParams();
  const chosen = picker.chosen();
  if (!chosen) return p;
  p.set(`${prefix}player`, chosen.player_id);
  const [season, level, position] = picker.seasonChoice().split('|');
  if (season) p.set(`${prefix}season`, season);
  if (level) p.set(`${prefix}level`, level);
  if (position) p.set(`${prefix}position`, position);
  return p;
}

const merge = (...parts: URLSearchParams[]): URLSearchParams => {
  const out = new URLSearchParams();
  for (const p of parts) for (const [k, v] of p) out.set(k, v);
  return out;
};

function needPlayer(picker: PlayerPicker): void {
  if (!picker.chosen()) throw new Error('Choose a player first: type part of a name and pick one of the suggestions.');
}

const compsView: ViewDef = {
  id: 'comps',
  label: 'Comps',
  intro: 'The player-seasons most like one player-season, from the pool you set.',
  runLabel: 'Find comps',
  idle: 'Choose a player and a season, then Find comps.',
  usesFilters: true,
  defaultK: 10,
  minCoverageOf: (info) => info.min_coverage.comps,
  poolReachOf: (info) => info.pool_reach.comps,
  sections: (ctx) => [ctx.first.element],
  async run(ctx) {
    needPlayer(ctx.first);
    const result = await fetchComps('/api/comps', merge(playerParams(ctx.first), ctx.filters.params()));
    await ctx.results.show(result, ctx.dimsByGroup.get(result.query.group) ?? [], { poolChoice: ctx.filters.choice() });
  },
};

const targetView: ViewDef = {
  id: 'target',
  label: 'Build a target',
  intro: 'Describe the player you are looking for, dimension by dimension, and get the closest real player-seasons.',
  runLabel: 'Find comps for this profile',
  idle: 'Tick a few dimensions and set their grades, then run.',
  usesFilters: true,
  defaultK: 10,
  minCoverageOf: (info) => info.min_coverage.comps,
  poolReachOf: (info) => info.pool_reach.comps,
  sections: (ctx) => [ctx.builder.element],
  async run(ctx) {
    const want = ctx.builder.want();
    if (want === '') throw new Error('Tick at least one dimension and set its grade or value.');
    const result = await fetchComps('/api/comps', merge(new URLSearchParams({ want, position: ctx.builder.position() }), ctx.filters.params()));
    await ctx.results.show(result, ctx.builder.dims(), { poolChoice: ctx.filters.choice() });
  },
};

/** A small labelled number or text input. */
function input(id: string, label: string, attrs: Readonly<Record<string, string>>): { field: HTMLElement; el: HTMLInputElement } {
  const el = h('input', { id, ...attrs });
  return { el, field: h('div', { class: 'field' }, h('label', { for: id, class: 'field-label' }, label), el) };
}

const horizon = input('opt-horizon', 'Follow-up', { type: 'number', min: '1', max: '15', value: '6', title: 'seasons after each comp season' });
const path = input('opt-path', 'Seasons matched', { type: 'number', min: '1', max: '5', value: '1', title: 'his last N seasons, aligned by age' });
const censored = h('input', { id: 'opt-include-censored', type: 'checkbox' });
const outlookBox = h(
  'fieldset',
  { class: 'outlook' },
  h('legend', {}, 'Outlook'),
  horizon.field,
  path.field,
  h('div', { class: 'field' }, h('label', { class: 'check' }, censored, 'also list comps whose follow-up is not over')),
);

/** A flag as the page shows it (the CSV keeps true or false). */
const shownFlag = (v: string | number | boolean): string => (v === true ? 'yes' : v === false ? 'no' : String(v));
const isProspectComp = (c: Comp): c is ProspectComp => 'outcome' in c && 'censored' in c;
const prospectOf = (c: Comp): ProspectComp | undefined => (isProspectComp(c) ? c : undefined);

const prospectView: ViewDef = {
  id: 'prospect',
  label: 'Prospect outlook',
  intro: 'Earlier players at his level and age who looked like him, and what became of them at the top level.',
  runLabel: 'Show the outlook',
  idle: 'Choose a prospect and a season, then Show the outlook.',
  usesFilters: true,
  defaultK: 25,
  minCoverageOf: (info) => info.min_coverage.prospect,
  poolReachOf: () => undefined,
  sections: (ctx) => [ctx.first.element, outlookBox],
  async run(ctx) {
    needPlayer(ctx.first);
    const p = merge(playerParams(ctx.first), ctx.filters.params());
    if (horizon.el.value.trim() !== '') p.set('horizon', horizon.el.value.trim());
    if (path.el.value.trim() !== '') p.set('path', path.el.value.trim());
    if (censored.checked) p.set('include-censored', 'true');
    const result = await fetchProspect(p);
    const m = peakMeasure(result);
    const o = result.outlook;
    const pct = formatPercent;
    const c = o.calibrated;
    const bt = c?.backtest;
    const calibrated = c && bt
      ? ` Calibrated on this roster's history: ${pct(c.reached_top_level)} reach the top level; ${m.label} ${c.peak.p10 === null || c.peak.p90 === null ? 'unknown' : `${formatWhole(c.peak.p10)} to ${formatWhole(c.peak.p90)}`}, a range meant to hold ${pct(c.range_coverage)} of outcomes. Replayed at ${bt.cuts[0] ?? ''}-${bt.cuts[bt.cuts.length - 1] ?? ''}, such ranges held ${pct(c.peak.coverage)} of realised values, with a Brier skill of ${formatSigned(bt.skill_vs_level_age.value, 2)} against the level-and-age base rate.`
      : ` No calibrated outlook: ${inPageWords(o.calibration_note ?? 'no replay of this roster\u2019s history stored')}.`;
    const warned = (result.warnings ?? []).map((w) => `${w} `).join('');
    const note = `${warned}Outlook over ${o.horizon_seasons} seasons from ${o.comps_used} comps (${o.comps_censored} left out, follow-up not over): ${pct(o.reached_top_level)} reached the top level, against a base rate of ${pct(o.baseline.reached_top_level)} for ${formatCount(o.baseline.player_seasons)} player-seasons at that level and age.${calibrated} A record of similar players, not a forecast of this one.`;
    await ctx.results.show(result, ctx.dimsByGroup.get(result.query.group) ?? [], {
      note,
      extra: [
        { title: 'Reached top level', csv: 'reached_top_level', value: (c) => prospectOf(c)?.outcome.reached_top_level ?? null, shown: shownFlag },
        { title: 'Top-level seasons', csv: 'top_level_seasons', value: (c) => prospectOf(c)?.outcome.top_level_seasons ?? null },
        { title: m.label.charAt(0).toUpperCase() + m.label.slice(1), csv: 'peak_ops_plus' in result.outlook ? 'peak_ops_plus' : 'peak_fip_minus', value: (c) => { const pc = prospectOf(c); return pc ? peakOf(pc) : null; }, shown: (v) => (typeof v === 'number' ? formatWhole(v) : String(v)) },
        { title: 'Follow-up over', csv: 'censored', value: (c) => prospectOf(c)?.censored ?? null, shown: (v) => shownFlag(v === false) },
      ],
      chart: { title: 'What became of the comps', spec: outcomeChartSpec(result), label: 'outcome distribution of the comps against the base rate' },
    });
  },
};

const maxSalary = input('opt-max-salary', 'Max salary', { type: 'text', inputmode: 'numeric', placeholder: 'USD, e.g. 2,000,000' });
const maxShare = input('opt-max-share', 'or share', { type: 'number', min: '0', max: '1', step: '0.05', placeholder: '0.5', title: 'share of his salary' });
const salaryBox = h('fieldset', { class: 'salary' }, h('legend', {}, 'Salary limit'), maxSalary.field, maxShare.field, h('p', { class: 'hint' }, 'Leave both empty for half his salary.'));
const isCheaperComp = (c: Comp): c is CheaperComp => 'salary_usd' in c && 'frontier' in c;
const cheaperOf = (c: Comp): CheaperComp | undefined => (isCheaperComp(c) ? c : undefined);
const usd = formatUsd;

const cheaperView: ViewDef = {
  id: 'cheaper',
  label: 'Cheaper comps',
  intro: 'Players who did what he does, paid less that season; the value frontier (no one more alike for less) is marked.',
  runLabel: 'Find cheaper comps',
  idle: 'Choose a player and a salary limit, then Find cheaper comps.',
  usesFilters: true,
  defaultK: 10,
  minCoverageOf: (info) => info.min_coverage.cheaper,
  poolReachOf: (info) => info.pool_reach.cheaper,
  sections: (ctx) => [ctx.first.element, salaryBox],
  async run(ctx) {
    needPlayer(ctx.first);
    const p = merge(playerParams(ctx.first), ctx.filters.params());
    if (maxSalary.el.value.trim() !== '') p.set('max-salary', maxSalary.el.value.trim());
    if (maxShare.el.value.trim() !== '') p.set('max-share', maxShare.el.value.trim());
    const result = await fetchCheaper(p);
    const s = result.pool.salary;
    const note = `Salary limit ${usd(s.limit_usd)}${s.target_salary_usd !== null ? ` (his salary ${usd(s.target_salary_usd)})` : ''}: ${formatCount(s.under_limit)} player-seasons under it, ${formatCount(s.over_limit)} over, ${formatCount(s.without_salary)} without a known salary.`;
    await ctx.results.show(result, ctx.dimsByGroup.get(result.query.group) ?? [], {
      note,
      poolChoice: ctx.filters.choice(),
      extra: [
        { title: 'Salary (USD)', csv: 'salary_usd', value: (c) => cheaperOf(c)?.salary_usd ?? null, shown: (v) => (typeof v === 'number' ? usd(v) : String(v)) },
        { title: 'Value (0-100)', csv: 'value_score', value: (c) => cheaperOf(c)?.value_score ?? null, shown: (v) => (typeof v === 'number' ? formatDecimal(v, 1) : String(v)) },
        { title: 'On the frontier', csv: 'frontier', value: (c) => cheaperOf(c)?.frontier ?? null, shown: shownFlag },
      ],
      chart: { title: 'Likeness against salary (the value frontier joined)', spec: frontierChartSpec(result), label: 'likeness against salary of the cheaper comps' },
    });
  },
};

const isCandidate = (c: Comp): c is MatchCandidate => 'percentile' in c && 'in_pool' in c;
const candidateOf = (c: Comp): MatchCandidate | undefined => (isCandidate(c) ? c : undefined);

const matchView: ViewDef = {
  id: 'match',
  label: 'One-to-one',
  intro: 'One candidate against one target: how alike, dimension by dimension, and where he stands among the pool.',
  runLabel: 'Compare',
  idle: 'Choose the target and the candidate, then Compare.',
  usesFilters: true,
  defaultK: 10,
  minCoverageOf: (info) => info.min_coverage.match,
  poolReachOf: (info) => info.pool_reach.match,
  sections: (ctx) => [ctx.first.element, ctx.second.element],
  async run(ctx) {
    needPlayer(ctx.first);
    const other = ctx.second.chosen();
    if (!other) throw new Error('Choose the candidate too (the Versus box).');
    const p = merge(playerParams(ctx.first), ctx.filters.params());
    p.set('candidate', other.player_id);
    const [season, level] = ctx.second.seasonChoice().split('|');
    if (season) p.set('season-b', season);
    if (level) p.set('level-b', level);
    const result = await fetchMatch(p);
    const c = result.candidate;
    const comps: Comp[] = [c, ...(result.closest && result.closest.player_id !== c.player_id ? [result.closest] : [])];
    const note = `${c.name} (${c.season} ${c.level}) is ${formatWhole(c.likeness)} alike: more alike than ${c.percentile === null ? 'n/a' : `${formatWhole(c.percentile)}%`} of the pool's ${formatCount(c.pool_players)} players${c.in_pool ? '' : ' (his season is outside the pool filters)'}.${result.closest ? ` The closest in the pool is ${result.closest.name} (${formatWhole(result.closest.likeness)}).` : ''}`;
    await ctx.results.show({ query: result.query, pool: result.pool, comps }, ctx.dimsByGroup.get(result.query.group) ?? [], {
      raw: result,
      headline: `${result.query.name ?? 'The target profile'} against ${c.name}`,
      note,
      poolChoice: ctx.filters.choice(),
      extra: [
        { title: 'Role', csv: 'role', value: (x) => (candidateOf(x) ? 'candidate' : 'closest in pool') },
        { title: 'More alike than', csv: 'percentile', value: (x) => candidateOf(x)?.percentile ?? null, shown: (v) => (typeof v === 'number' ? `${formatWhole(v)}% of the pool` : String(v)) },
      ],
    });
  },
};

/** The page's jobs in tab order. */
export const VIEWS: readonly ViewDef[] = [compsView, targetView, prospectView, cheaperView, matchView];
