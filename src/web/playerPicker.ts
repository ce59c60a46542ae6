import type { PlayerHit } from '../request/apiContract.ts';
import { fetchPlayers } from './api.ts';
import { h } from './dom.ts';

/** Wait after the last key before asking the server (ms). */
const TYPING_PAUSE_MS = 120;

export interface PlayerPicker {
  readonly element: HTMLElement;
  /** The chosen player, or null. */
  chosen(): PlayerHit | null;
  /** `season|level|position` of the chosen profile, or '' for his latest. */
  seasonChoice(): string;
  /** Chooses a player as if picked from the suggestions. */
  choose(p: PlayerHit): void;
}

/**
 * A name box with suggestions from /api/players as you type (arrow keys, Enter or a click choose),
 * and a season list filled with the chosen player's profiled seasons.
 */
export function playerPicker(idPrefix: string, label: string, onChange: () => void): PlayerPicker {
  const input = h('input', {
    id: `${idPrefix}-input`,
    type: 'search',
    autocomplete: 'off',
    placeholder: 'part of a name, or an id',
    role: 'combobox',
    'aria-autocomplete': 'list',
    'aria-expanded': 'false',
    'aria-controls': `${idPrefix}-suggestions`,
  });
  const list = h('ul', { id: `${idPrefix}-suggestions`, class: 'suggestions', role: 'listbox', hidden: '' });
  const season = h('select', { id: `${idPrefix}-season`, disabled: '' }, h('option', { value: '' }, 'latest season'));
  const element = h(
    'div',
    { class: 'picker' },
    h('label', { for: input.id }, label),
    h('div', { class: 'combo' }, input, list),
    h('label', { for: season.id }, 'Season'),
    season,
  );
  let hits: readonly PlayerHit[] = [];
  let active = -1;
  let chosen: PlayerHit | null = null;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let asked = 0;

  const close = (): void => {
    list.hidden = true;
    input.setAttribute('aria-expanded', 'false');
    active = -1;
  };
  const show = (): void => {
    list.replaceChildren(
      ...hits.map((p, i) => {
        const latest = p.seasons[0];
        const li = h(
          'li',
          { role: 'option', id: `${idPrefix}-opt-${i}`, 'aria-selected': String(i === active) },
          h('span', { class: 'name' }, p.name),
          h('span', { class: 'meta' }, `${p.player_id}${latest ? ` · ${latest.position} · ${latest.season} ${latest.level}` : ' · no profile'}`),
        );
        li.addEventListener('mousedown', (ev) => {
          ev.preventDefault();
          choose(p);
        });
        return li;
      }),
    );
    if (hits.length === 0) list.append(h('li', { class: 'empty' }, 'no player matches'));
    list.hidden = false;
    input.setAttribute('aria-expanded', 'true');
    if (active >= 0) input.setAttribute('aria-activedescendant', `${idPrefix}-opt-${active}`);
    else input.removeAttribute('aria-activedescendant');
  };
  const choose = (p: PlayerHit): void => {
    chosen = p;
    input.value = p.name;
    season.replaceChildren(
      ...p.seasons.map((s, i) => h('option', { value: `${s.season}|${s.level}|${s.position}`, ...(i === 0 ? { selected: '' } : {}) }, `${s.season} · ${s.level} · ${s.position}`)),
    );
    if (p.seasons.length === 0) season.append(h('option', { value: '' }, 'no profiled season'));
    season.disabled = p.seasons.length === 0;
    close();
    onChange();
  };

  input.addEventListener('input', () => {
    chosen = null;
    clearTimeout(timer);
    const q = input.value.trim();
    if (q.length < 2) {
      close();
      return;
    }
    timer = setTimeout(() => {
      const ticket = ++asked;
      fetchPlayers(q, 12).then(
        (found) => {
          if (ticket !== asked) return;
          hits = found;
          active = -1;
          show();
        },
        () => close(),
      );
    }, TYPING_PAUSE_MS);
  });
  input.addEventListener('keydown', (ev) => {
    if (list.hidden || hits.length === 0) return;
    if (ev.key === 'ArrowDown' || ev.key === 'ArrowUp') {
      ev.preventDefault();
      active = (active + (ev.key === 'ArrowDown' ? 1 : hits.length - 1)) % hits.length;
      show();
    } else if (ev.key === 'Enter') {
      const p = hits[active >= 0 ? active : 0];
      if (p) {
        ev.preventDefault();
        choose(p);
      }
    } else if (ev.key === 'Escape') close();
  });
  input.addEventListener('blur', () => setTimeout(close, 100));
  season.addEventListener('change', onChange);

  return { element, chosen: () => chosen, seasonChoice: () => season.value, choose };
}
