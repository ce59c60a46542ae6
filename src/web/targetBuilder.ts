import type { DimensionInfo } from '../request/apiContract.ts';
import { fetchDims } from './api.ts';
import { h } from './dom.ts';

const POSITIONS = ['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'DH', 'SP', 'RP'];

export interface TargetBuilder {
  readonly element: HTMLElement;
  position(): string;
  dims(): readonly DimensionInfo[];
  /** The `want` parameter: `name=60g` for a grade, `name=.360` for a value in natural units; '' when nothing is set. */
  want(): string;
}

/**
 * "Build a target": a position, then per dimension a switch, a 20-80 grade slider and an optional
 * value in natural units (which wins over the grade when given).
 */
export function targetBuilder(): TargetBuilder {
  const position = h('select', { id: 'want-position' }, ...POSITIONS.map((p) => h('option', { value: p }, p)));
  const rows = h('div', { class: 'want-rows', id: 'want-rows' });
  const element = h(
    'fieldset',
    { class: 'want' },
    h('legend', {}, 'Target profile'),
    h('div', { class: 'field' }, h('label', { for: position.id, class: 'field-label' }, 'Position'), position),
    h('p', { class: 'hint' }, 'Tick the dimensions you care about; set a grade (50 is average, 60 above, 70 plus) or type a value in its own units.'),
    rows,
  );
  let dims: readonly DimensionInfo[] = [];
  // Each change of position starts a load; only the latest one may draw its rows, so a slow answer for
  // the position shown before cannot replace (and wipe) the rows of the one chosen since.
  let latest = 0;

  async function load(): Promise<void> {
    const mine = ++latest;
    const wanted = position.value;
    const loaded = await fetchDims(wanted);
    if (mine !== latest) return;
    dims = loaded;
    rows.dataset['position'] = wanted;
    rows.replaceChildren(
      ...dims.map((d) => {
        const use = h('input', { type: 'checkbox', id: `want-use-${d.name}`, 'data-dim': d.name, class: 'want-use' });
        const grade = h('input', { type: 'range', min: '20', max: '80', step: '5', value: '50', id: `want-grade-${d.name}`, 'aria-label': `${d.label} grade` });
        const shown = h('output', { for: grade.id, class: 'grade-value' }, '50');
        const natural = h('input', { type: 'text', inputmode: 'decimal', id: `want-value-${d.name}`, placeholder: 'value', title: d.unit, 'aria-label': `${d.label} in ${d.unit}`, class: 'want-value' });
        grade.addEventListener('input', () => {
          shown.textContent = grade.value;
          use.checked = true;
        });
        natural.addEventListener('input', () => {
          if (natural.value.trim() !== '') use.checked = true;
        });
        const better = d.direction === 'higher' ? 'higher is better' : d.direction === 'lower' ? 'lower is better' : 'neither way is better';
        return h(
          'div',
          { class: 'want-row', title: `${d.meaning} (${better})` },
          h('label', { class: 'check', for: use.id }, use, d.label),
          grade,
          shown,
          natural,
        );
      }),
    );
  }
  position.addEventListener('change', () => void load());
  void load();

  return {
    element,
    position: () => position.value,
    dims: () => dims,
    want(): string {
      const parts: string[] = [];
      for (const d of dims) {
        const use = rows.querySelector(`#want-use-${d.name}`);
        if (!(use instanceof HTMLInputElement) || !use.checked) continue;
        const natural = rows.querySelector(`#want-value-${d.name}`);
        const grade = rows.querySelector(`#want-grade-${d.name}`);
        const v = natural instanceof HTMLInputElement ? natural.value.trim() : '';
        if (v !== '') parts.push(`${d.name}=${v}`);
        else if (grade instanceof HTMLInputElement) parts.push(`${d.name}=${grade.value}g`);
      }
      return parts.join(',');
    },
  };
}
