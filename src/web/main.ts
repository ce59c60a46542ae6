import type { DimensionInfo } from '../request/apiContract.ts';
import { fetchInfo, getJson } from './api.ts';
import { pageMessage } from './pageMessage.ts';
import { byId, h } from './dom.ts';
import { filtersForm } from './filtersForm.ts';
import { playerPicker } from './playerPicker.ts';
import { resultsPanel } from './resultsPanel.ts';
import { targetBuilder } from './targetBuilder.ts';
import { VIEWS, type ViewContext } from './views.ts';

/** Dimensions of every position group, for labels. */
async function fetchAllDims(): Promise<ReadonlyMap<string, readonly DimensionInfo[]>> {
  const v = await getJson('/api/dims');
  const out = new Map<string, readonly DimensionInfo[]>();
  if (typeof v === 'object' && v !== null) {
    for (const [group, list] of Object.entries(v)) {
      if (Array.isArray(list)) out.set(group, list.filter((d): d is DimensionInfo => typeof d === 'object' && d !== null && 'name' in d && 'label' in d));
    }
  }
  return out;
}

async function start(): Promise<void> {
  const [info, dimsByGroup] = await Promise.all([fetchInfo(), fetchAllDims()]);
  const storeInfo = byId('store-info', HTMLParagraphElement);
  const groupsText = Object.entries(info.groups)
    .map(([g, v]) => `${g} ${v?.n.toLocaleString('en-US') ?? 0}`)
    .join(' · ');
  storeInfo.textContent = `store: ${groupsText} player-seasons, ${info.seasons.from ?? ''}-${info.seasons.to ?? ''}`;

  const form = byId('controls', HTMLFormElement);
  const runButton = byId('run', HTMLButtonElement);
  const intro = byId('view-intro', HTMLParagraphElement);
  const targetSlot = byId('target-slot', HTMLDivElement);
  const filtersSlot = byId('filters-slot', HTMLDivElement);
  const tabs = byId('tabs', HTMLElement);

  const first = playerPicker('player', 'Player', () => {});
  const second = playerPicker('other', 'Versus', () => {});
  const builder = targetBuilder();
  const filters = filtersForm(info);
  filtersSlot.append(filters.element);
  let view = VIEWS[0];
  const results = resultsPanel(() => `kindred-${view?.id ?? 'comps'}`);
  byId('results-slot', HTMLDivElement).append(results.element);
  results.clear('Choose a player (or build a target) and run the job.');

  const ctx: ViewContext = { first, second, builder, filters, results, dimsByGroup, info };

  const select = (id: string): void => {
    const next = VIEWS.find((v) => v.id === id) ?? VIEWS[0];
    if (!next) return;
    view = next;
    for (const b of Array.from(tabs.querySelectorAll('button'))) b.setAttribute('aria-selected', String(b.dataset.view === id));
    intro.textContent = next.intro;
    runButton.textContent = next.runLabel;
    targetSlot.replaceChildren(...next.sections(ctx));
    filtersSlot.hidden = !next.usesFilters;
    filters.setDefaults(next.defaultK, next.minCoverageOf(info), next.poolReachOf(info));
    results.clear(next.idle);
  };
  tabs.replaceChildren(
    ...VIEWS.map((v) => {
      const b = h('button', { type: 'button', role: 'tab', 'data-view': v.id, 'aria-selected': 'false' }, v.label);
      b.addEventListener('click', () => select(v.id));
      return b;
    }),
  );
  select(VIEWS[0]?.id ?? 'comps');

  form.addEventListener('submit', (ev) => {
    ev.preventDefault();
    const v = view;
    if (!v) return;
    runButton.disabled = true;
    results.clear('Working...');
    v.run(ctx)
      .catch((e: unknown) => {
        results.clear(pageMessage(e));
        results.element.querySelector('.message')?.classList.add('error');
      })
      .finally(() => {
        runButton.disabled = false;
      });
  });
  document.body.dataset.ready = 'true';
}

start().catch((e: unknown) => {
  document.body.append(h('p', { class: 'message error' }, `The page could not start: ${pageMessage(e)}`));
});
