import { findProspectComps, type ProspectOptions } from '../outlook/findProspectComps.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import type { ProspectResult } from '../outlook/types.ts';
import type { ProfileStore } from '../query/ProfileStore.ts';
import { compsOptionsFrom } from './compsOptionsFrom.ts';
import type { JobRequest } from './JobRequest.ts';
import { targetFrom } from './targetFrom.ts';

export function prospectOptionsFrom(req: JobRequest, store: ProfileStore): ProspectOptions {
  return { comps: compsOptionsFrom(req, store), horizon: req.need('horizon'), path: req.need('path'), includeCensored: req.need('includeCensored') };
}

/** The prospect job: earlier players at his level and age, and what became of them. */
export function answerProspect(store: ProfileStore, outcomes: Outcomes, req: JobRequest): ProspectResult {
  const options = prospectOptionsFrom(req, store);
  return findProspectComps(store, outcomes, targetFrom(store, req), options);
}
