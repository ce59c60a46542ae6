import { findProspectComps, type ProspectOptions } from '../jobs/findProspectComps.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import type { ProspectResult } from '../jobs/ProspectResult.ts';
import { windowView } from '../query/windowView.ts';
import { requestWindow } from './requestWindow.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { compsOptionsFrom } from './compsOptionsFrom.ts';
import type { JobRequest } from './JobRequest.ts';
import type { Target } from '../query/Target.ts';
import { targetFrom } from './targetFrom.ts';
import { calibrateOutlook } from '../outlook/calibrateOutlook.ts';
import type { BacktestFile } from '../outlook/backtestFile.ts';

export function prospectOptionsFrom(req: JobRequest, store: ProfileStore, target: Target): ProspectOptions {
  return { comps: compsOptionsFrom(req, store, target), horizon: req.need('horizon'), path: req.need('path'), includeCensored: req.need('includeCensored') };
}

/** What a prospect answer is calibrated with: the store's backtest, or why there is none. */
export type StoredBacktest = { readonly file: BacktestFile | null; readonly reason: string | null };

/**
 * The prospect job: earlier players at his level and age, and what became of them, with the outlook
 * calibrated on the roster's own history when the store holds a matching backtest (calibrateOutlook).
 * The calibrated outlook rests on as many comps as the backtest used, whatever `--k` lists: when they
 * differ, the comps are found a second time with the backtest's number.
 */
export function answerProspect(stored: ProfileStore, outcomes: Outcomes, req: JobRequest, backtest: StoredBacktest): ProspectResult {
  const store = windowView(stored, requestWindow(req, stored));
  const target = targetFrom(store, req);
  const options = prospectOptionsFrom(req, store, target);
  const result = findProspectComps(store, outcomes, target, options);
  const k = backtest.file?.k ?? options.comps.k;
  const asBacktested = k === options.comps.k ? result : findProspectComps(store, outcomes, target, { ...options, comps: { ...options.comps, k } });
  return calibrateOutlook(store, outcomes, target, result, asBacktested.outlook, options, backtest);
}
