import { findComps } from '../query/findComps.ts';
import { windowedTarget } from './windowedTarget.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { CompsResult } from '../query/CompsResult.ts';
import { compsOptionsFrom } from './compsOptionsFrom.ts';
import type { JobRequest } from './JobRequest.ts';

/** The comps job: ranked comps for the request's target in its pool. */
export function answerComps(stored: ProfileStore, req: JobRequest): CompsResult {
  const { store, target } = windowedTarget(stored, req);
  return findComps(store, target, compsOptionsFrom(req, store, target));
}
