import { ParameterError } from '../errors/ParameterError.ts';
import { DEFAULT_SALARY_LIMIT, findCheaperComps, type CheaperOptions, type SalaryLimit } from '../jobs/findCheaperComps.ts';
import type { CheaperResult } from '../jobs/CheaperResult.ts';
import { windowView } from '../query/windowView.ts';
import { requestWindow } from './requestWindow.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { compsOptionsFrom } from './compsOptionsFrom.ts';
import type { JobRequest } from './JobRequest.ts';
import type { Target } from '../query/Target.ts';
import { targetFrom } from './targetFrom.ts';

export function cheaperOptionsFrom(req: JobRequest, store: ProfileStore, target: Target): CheaperOptions {
  const maxSalary = req.get('maxSalary');
  const maxShare = req.get('maxShare');
  if (maxSalary !== undefined && maxShare !== undefined) {
    throw new ParameterError('max-share', (n) => `give either ${n('max-salary')} or ${n('max-share')}, not both`, { prefixed: false });
  }
  const limit: SalaryLimit =
    maxSalary !== undefined ? { kind: 'max-salary', usd: maxSalary } : maxShare !== undefined ? { kind: 'max-share', share: maxShare } : DEFAULT_SALARY_LIMIT;
  return { comps: compsOptionsFrom(req, store, target), limit };
}

/** The cheaper job: comps with a known salary under the limit, the value frontier marked. */
export function answerCheaper(stored: ProfileStore, req: JobRequest): CheaperResult {
  const store = windowView(stored, requestWindow(req, stored));
  const target = targetFrom(store, req);
  return findCheaperComps(store, target, cheaperOptionsFrom(req, store, target));
}
