import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { StoreInfo } from '../server/api/infoEndpoint.ts';
import { fetchComps } from './api.ts';
import type { FiltersForm } from './filtersForm.ts';
import type { PlayerPicker } from './playerPicker.ts';
import type { ResultsPanel } from './resultsPanel.ts';
import type { TargetBuilder } from './targetBuilder.ts';

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
  sections: (ctx) => [ctx.first.element],
  async run(ctx) {
    needPlayer(ctx.first);
    const result = await fetchComps('/api/comps', merge(playerParams(ctx.first), ctx.filters.params()));
    await ctx.results.show(result, ctx.dimsByGroup.get(result.query.group) ?? []);
  },
};

const targetView: ViewDef = {
  id: 'target',
  label: 'Build a target',
  intro: 'Describe the player you are looking for, dimension by dimension, and get the closest real player-seasons.',
  runLabel: 'Find comps for this profile',
  idle: 'Tick a few dimensions and set their grades, then run.',
  usesFilters: true,
  sections: (ctx) => [ctx.builder.element],
  async run(ctx) {
    const want = ctx.builder.want();
    if (want === '') throw new Error('Tick at least one dimension and set its grade or value.');
    const result = await fetchComps('/api/comps', merge(new URLSearchParams({ want, position: ctx.builder.position() }), ctx.filters.params()));
    await ctx.results.show(result, ctx.builder.dims());
  },
};

/** The page's jobs in tab order. */
export const VIEWS: readonly ViewDef[] = [compsView, targetView];
