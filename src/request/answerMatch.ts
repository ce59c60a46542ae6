import { windowedTarget } from './windowedTarget.ts';
import { ParameterError } from '../errors/ParameterError.ts';
import { matchPlayers, type MatchOptions } from '../jobs/matchPlayers.ts';
import type { MatchResult } from '../jobs/MatchResult.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { resolvePlayer } from '../query/resolvePlayer.ts';
import { compsOptionsFrom } from './compsOptionsFrom.ts';
import type { JobRequest } from './JobRequest.ts';
import type { Target } from '../query/Target.ts';

/** The match options of a request: the pool and weighting, and the candidate's season and level if given. */
export function matchOptionsFrom(req: JobRequest, store: ProfileStore, target: Target): MatchOptions {
  const season = req.get('seasonB');
  const level = req.get('levelB');
  if (level !== undefined && !store.levels.includes(level)) {
    throw new ParameterError('level-b', `unknown level "${level}"; the store's levels: ${store.levels.join(', ')}`, { context: { value: level } });
  }
  return { comps: compsOptionsFrom(req, store, target), candidate: { ...(season !== undefined ? { season } : {}), ...(level !== undefined ? { level } : {}) } };
}

/** The match job: one candidate against the target, likeness, percentile in the pool and every dimension. */
export function answerMatch(stored: ProfileStore, req: JobRequest): MatchResult {
  const { store, target } = windowedTarget(stored, req);
  const options = matchOptionsFrom(req, store, target);
  const candidate = req.get('candidate');
  if (candidate === undefined) {
    throw new ParameterError('candidate', 'name the candidate to compare with the target (an id or a name)', { code: 'kindred.usage.missingArgument', prefixed: false });
  }
  return matchPlayers(store, target, resolvePlayer(store, candidate), options);
}
