import { KindredError } from '../errors/KindredError.ts';
import type { Target } from '../query/Target.ts';
import { windowView } from '../query/windowView.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { JobRequest } from './JobRequest.ts';
import { requestWindow } from './requestWindow.ts';
import { targetFrom } from './targetFrom.ts';

/**
 * The store view a request reads (requestWindow) and its target in it. A window the job chose by
 * default gives way to single seasons when the target's season has no window of its own (a season
 * at a position his window profile does not hold, say a starter's one season in relief): the season
 * the user asked for is answered rather than refused. A window asked for is never changed.
 *
 * @example
 * // store with windows 1 and 3; p001292's 2021 RP season has no 3-season RP window
 * windowedTarget(stored, req).store.window; // => undefined (single seasons)
 */
export function windowedTarget(stored: ProfileStore, req: JobRequest): { store: ProfileStore; target: Target } {
  const window = requestWindow(req, stored);
  const store = windowView(stored, window);
  try {
    return { store, target: targetFrom(store, req) };
  } catch (error) {
    if (window === 1 || req.has('window') || !(error instanceof KindredError) || error.code !== 'kindred.query.noSeason') throw error;
    const single = windowView(stored, 1);
    return { store: single, target: targetFrom(single, req) };
  }
}
