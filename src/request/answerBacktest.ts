import type { BacktestFile } from '../outlook/backtestFile.ts';
import { backtestStore } from '../outlook/backtestStore.ts';
import type { Outcomes } from '../outlook/Outcomes.ts';
import { DEFAULT_PROSPECT_OPTIONS } from '../jobs/findProspectComps.ts';
import { isPitcherGroup, POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import type { JobRequest } from './JobRequest.ts';
import type { GroupChoice } from './parameters.ts';

/** The position groups a `group` choice stands for (every group without one). */
export function groupsOf(choice: GroupChoice | undefined): readonly PositionGroup[] {
  if (choice === undefined) return POSITION_GROUPS;
  if (choice === 'hitters' || choice === 'pitchers') return POSITION_GROUPS.filter((g) => isPitcherGroup(g) === (choice === 'pitchers'));
  return [choice];
}

/**
 * The backtest job: the prospect outlook replayed at the request's cut seasons (default: every season
 * that can be scored) for the request's groups, with only what was known at each cut (backtestStore);
 * the answer is what `kindred build` stores as backtest.json, with the kinds asked for.
 */
export function answerBacktest(store: ProfileStore, outcomes: Outcomes, req: JobRequest): BacktestFile {
  const groups = groupsOf(req.get('group'));
  const cuts = req.get('cuts');
  const { file } = backtestStore(store, outcomes, {
    prospect: DEFAULT_PROSPECT_OPTIONS,
    ...(cuts ? { cuts } : {}),
    ...(req.get('group') !== undefined ? { groups } : {}),
  });
  const kinds = new Set(groups.map((g) => (isPitcherGroup(g) ? 'pitcher' : 'hitter')));
  return { ...file, kinds: file.kinds.filter((k) => kinds.has(k.kind)) };
}
