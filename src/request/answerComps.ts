import { findComps } from '../query/findComps.ts';
import { windowView } from '../query/windowView.ts';
import { requestWindow } from './requestWindow.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { CompsResult } from '../query/CompsResult.ts';
import { compsOptionsFrom } from './compsOptionsFrom.ts';
import type { JobRequest } from './JobRequest.ts';
import { targetFrom } from './targetFrom.ts';

/** The comps job: ranked comps for the request's target in its pool. */
export function answerComps(stored: ProfileStore, req: JobRequest): CompsResult {
  const store = windowView(stored, requestWindow(req, stored));
  const target = targetFrom(store, req);
  return findComps(store, target, compsOptionsFrom(req, store, target));
}
