import type { ProfileStore } from '../store/ProfileStore.ts';
import type { JobRequest } from './JobRequest.ts';

/**
 * The profile window a request reads: the one it asks for ({window}; a window the store lacks is then
 * refused by windowView), else the job's default (DEFAULT_WINDOW for comps and match, 1 for the others)
 * when the store holds it, else single seasons, so a store built without windows answers as before.
 * A store built with a learned embedding (`kindred build --embed`) answers single seasons unless asked:
 * windows are profiled in the input space only, and its comps are ranked in the space it was built for.
 *
 * @example
 * requestWindow(new JobRequest('comps', {}), storeBuiltWith1And3); // => 3
 * requestWindow(new JobRequest('comps', {}), storeBuiltWith1Only); // => 1
 */
export function requestWindow(req: JobRequest, store: ProfileStore): number {
  const window = req.need('window');
  if (req.has('window') || window === 1) return window;
  const learned = store.params['space'] !== undefined && store.params['space'] !== 'input';
  return !learned && store.windows.has(window) ? window : 1;
}
