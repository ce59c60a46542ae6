import type { PoolReachDefaults, StoreInfo } from '../request/apiContract.ts';
import { h } from './dom.ts';
import { DEFAULT_WINDOW } from '../query/defaultWindow.ts';

export interface FiltersForm {
  readonly element: HTMLElement;
  /** The pool, weighting, k and min coverage as API parameters: every value the form shows is sent (filters left empty are not). */
  params(): URLSearchParams;
  /**
   * Sets the number of comps, the least coverage and the pool's reach shown (each job has its own
   * defaults); without a reach (prospect comps, whose pool is their own) the reach controls are hidden and not sent.
   */
  setDefaults(k: number, minCoverage: number, reach: PoolReachDefaults | undefined): void;
  /** How the pool is chosen, in words, from what the form shows (undefined when the job chooses its own pool). */
  choice(): string | undefined;
}

/** A choice of a select: its value as sent, its words as shown. */
const option = (value: string, words: string): HTMLOptionElement => h('option', { value }, words);

const LEVEL_SPANS: readonly [string, string][] = [['0', 'his level only'], ['1', 'within one level of his'], ['2', 'within two levels of his'], ['all', 'any level']];
const RECENT: readonly [string, string][] = [['1', 'his season only'], ['2', 'his and the one before'], ['3', 'his and the 2 before'], ['5', 'his and the 4 before'], ['10', 'his and the 9 before'], ['all', 'any season']];
const wordsOf = (list: readonly [string, string][], value: string): string => list.find(([v]) => v === value)?.[1] ?? value;
/** A reach as the select sends it (null: no limit). */
const reachValue = (n: number | null): string => (n === null ? 'all' : String(n));

const checkboxes = (name: string, values: readonly string[]): HTMLElement =>
  h(
    'span',
    { class: 'checks', role: 'group', 'aria-label': name },
    ...values.map((v) => h('label', { class: 'check' }, h('input', { type: 'checkbox', name, value: v }), v)),
  );

const range = (id: string, label: string, min: number, max: number): HTMLElement =>
  h(
    'div',
    { class: 'field range' },
    h('span', { class: 'field-label' }, label),
    h('input', { id: `${id}-from`, type: 'number', min: String(min), max: String(max), placeholder: 'from', 'aria-label': `${label} from` }),
    h('span', {}, 'to'),
    h('input', { id: `${id}-to`, type: 'number', min: String(min), max: String(max), placeholder: 'to', 'aria-label': `${label} to` }),
  );

/** The pool filters (levels, seasons, ages, bats, throws), k, weighting preset, per-dimension weights. */
export function filtersForm(info: StoreInfo): FiltersForm {
  const k = h('input', { id: 'opt-k', type: 'number', min: '1', max: '100', value: '10' });
  const preset = h('select', { id: 'opt-preset', title: 'which skill families count most' }, ...info.presets.map((p) => h('option', { value: p }, p)));
  const adjacent = h('input', { id: 'opt-adjacent', type: 'checkbox' });
  const levelSpan = h('select', { id: 'opt-level-span' }, ...LEVEL_SPANS.map(([v, w]) => option(v, w)));
  const sampleFloor = h('input', { id: 'opt-sample-floor', type: 'number', min: '0', max: '1', step: '0.05', value: '0.5', title: 'least PA or BF of a comp season, as a share of his' });
  const recent = h('select', { id: 'opt-recent' }, ...RECENT.map(([v, w]) => option(v, w)));
  const reachBox = h(
    'div',
    { class: 'reach', id: 'pool-reach' },
    h('div', { class: 'field' }, h('span', { class: 'field-label' }, 'Positions'), h('label', { class: 'check' }, adjacent, 'also the positions next to his')),
    h('div', { class: 'field' }, h('label', { for: levelSpan.id, class: 'field-label' }, 'Levels around his'), levelSpan),
    h('div', { class: 'field' }, h('label', { for: sampleFloor.id, class: 'field-label' }, 'Least playing time'), sampleFloor, h('span', { class: 'unit' }, 'of his PA or BF')),
    h('div', { class: 'field' }, h('label', { for: recent.id, class: 'field-label' }, 'Seasons back'), recent),
    h('p', { class: 'hint' }, 'Levels ticked or seasons typed below replace these rules.'),
  );
  const weights = h('input', { id: 'opt-weights', type: 'text', placeholder: 'e.g. obp=2,run_speed_ft_s=0', spellcheck: 'false' });
  const coverage = h('input', { id: 'opt-min-coverage', type: 'number', min: '0', max: '1', step: '0.05', value: '0.5' });
  const allSeasons = h('input', { id: 'opt-all-seasons', type: 'checkbox' });
  const window = h('input', { id: 'opt-window', type: 'number', min: '1', max: '5', value: '', placeholder: 'default', title: `profiles over his last N seasons at a level (empty: the job\u2019s default, ${DEFAULT_WINDOW} seasons for comps when the store has them; 1: single seasons)` });
  const element = h(
    'fieldset',
    { class: 'filters' },
    h('legend', {}, 'Pool and weights'),
    reachBox,
    h('div', { class: 'field' }, h('span', { class: 'field-label' }, 'Levels'), checkboxes('pool-level', info.levels)),
    range('opt-seasons', 'Seasons', info.seasons.from ?? 1900, info.seasons.to ?? 2100),
    range('opt-age', 'Age', 15, 50),
    h('div', { class: 'field' }, h('span', { class: 'field-label' }, 'Bats'), checkboxes('bats', ['L', 'R', 'S'])),
    h('div', { class: 'field' }, h('span', { class: 'field-label' }, 'Throws'), checkboxes('throws', ['L', 'R'])),
    h('div', { class: 'field' }, h('label', { for: k.id, class: 'field-label' }, 'Comps (k)'), k),
    h('div', { class: 'field' }, h('label', { for: preset.id, class: 'field-label' }, 'Emphasis'), preset),
    h('div', { class: 'field' }, h('label', { for: weights.id, class: 'field-label' }, 'Weights'), weights),
    h('div', { class: 'field' }, h('label', { for: coverage.id, class: 'field-label' }, 'Min coverage'), coverage),
    h('div', { class: 'field' }, h('label', { class: 'check' }, allSeasons, 'several seasons of one player')),
    h('div', { class: 'field' }, h('label', { for: window.id, class: 'field-label' }, 'Seasons per profile'), window),
  );
  const value = (id: string): string => {
    const el = element.querySelector(`#${id}`);
    return el instanceof HTMLInputElement ? el.value.trim() : '';
  };
  const checked = (name: string): string[] =>
    Array.from(element.querySelectorAll(`input[name="${name}"]`)).filter((el): el is HTMLInputElement => el instanceof HTMLInputElement && el.checked).map((el) => el.value);
  const span = (from: string, to: string): string => (from || to ? `${from}-${to}` : '');

  return {
    element,
    params(): URLSearchParams {
      const p = new URLSearchParams();
      const set = (name: string, v: string): void => {
        if (v !== '') p.set(name, v);
      };
      set('pool-level', checked('pool-level').join(','));
      set('pool-season', span(value('opt-seasons-from'), value('opt-seasons-to')));
      set('age', span(value('opt-age-from'), value('opt-age-to')));
      set('bats', checked('bats').join(','));
      set('throws', checked('throws').join(','));
      set('k', k.value.trim());
      set('preset', preset.value);
      set('weights', weights.value.trim());
      set('min-coverage', coverage.value.trim());
      if (allSeasons.checked) p.set('all-seasons', 'true');
      set('window', window.value.trim());
      if (!reachBox.hidden) {
        p.set('adjacent', String(adjacent.checked));
        set('level-span', levelSpan.value);
        set('sample-floor', sampleFloor.value.trim());
        set('recent', recent.value);
      }
      return p;
    },
    setDefaults(value: number, minCoverage: number, reach: PoolReachDefaults | undefined): void {
      k.value = String(value);
      coverage.value = String(minCoverage);
      reachBox.hidden = reach === undefined;
      if (!reach) return;
      adjacent.checked = reach.adjacent;
      levelSpan.value = reachValue(reach.level_span);
      sampleFloor.value = String(reach.sample_floor);
      recent.value = reachValue(reach.recent);
    },
    choice(): string | undefined {
      if (reachBox.hidden) return undefined;
      const floor = Number(sampleFloor.value);
      const parts = [
        `positions: ${adjacent.checked ? 'his and the ones next to it' : 'his'}`,
        `levels: ${checked('pool-level').length > 0 ? 'the ones ticked' : wordsOf(LEVEL_SPANS, levelSpan.value)}`,
        `seasons: ${value('opt-seasons-from') || value('opt-seasons-to') ? 'the ones typed' : wordsOf(RECENT, recent.value)}`,
        `playing time: ${sampleFloor.value.trim() === '' || floor === 0 ? 'any' : `at least ${Math.round(floor * 100)}% of his`}`,
      ];
      return `Chosen by: ${parts.join('; ')}.`;
    },
  };
}
