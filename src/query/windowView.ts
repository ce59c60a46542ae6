import { QueryError } from '../errors/KindredError.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore, StoredGroup, StoredRowRef } from '../store/ProfileStore.ts';

/**
 * The store as a query over windows of `window` seasons sees it: the same players, levels, salaries and
 * outcomes, with every position group replaced by its profiles over windows (built with
 * `kindred build --windows`), so each job finds targets, pools and comps among windows unchanged: a
 * player's window ending at the asked season is compared with other players' windows ending at any
 * season. `window` 1 is the store itself (single seasons). A window the store was not built with is
 * QueryError `kindred.query.noWindow`, naming the windows it has.
 *
 * @example
 * windowView(store, 3).groups.get('IF')?.window?.size; // => 3 (a store built with --windows 1,3)
 *
 * One view per store and window, made on first use and kept as long as the store (a server answers
 * every request from it: gathering each player's rows anew took a pass over every group per answer).
 */
export function windowView(store: ProfileStore, window: number): ProfileStore {
  if (window === 1) return store;
  let views = VIEWS.get(store);
  if (!views) VIEWS.set(store, (views = new Map()));
  const kept = views.get(window);
  if (kept) return kept;
  const view = makeView(store, window);
  views.set(window, view);
  return view;
}

/** The views made so far, per store (dropped with the store). */
const VIEWS = new WeakMap<ProfileStore, Map<number, ProfileStore>>();

function makeView(store: ProfileStore, window: number): ProfileStore {
  const groups = store.windows.get(window);
  if (!groups) {
    const have = [1, ...store.windows.keys()].sort((a, b) => a - b);
    const built = have.join(', ');
    // the command line's list takes no spaces (one shell word): --windows 1,2,3
    const rebuild = [...have, window].sort((a, b) => a - b).join(',');
    throw new QueryError('kindred.query.noWindow', `the store holds no profiles over ${window} seasons (it has windows of ${built}); rebuild it with kindred build --windows ${rebuild}`, {
      window,
      built,
    });
  }
  return {
    dir: store.dir,
    opened: store.opened,
    params: store.params,
    levels: store.levels,
    players: store.players,
    playerById: store.playerById,
    get salaries() {
      return store.salaries;
    },
    rowsOf: (player: number): readonly StoredRowRef[] => store.rowsOfWindow(window, player),
    rowsOfWindow: (size: number, player: number): readonly StoredRowRef[] => store.rowsOfWindow(size, player),
    groups,
    windows: store.windows,
    outcomes: () => store.outcomes(),
  };
}
