import type { DimensionInfo } from '../profiles/Dimension.ts';
import { dimensionsOf } from '../profiles/buildProfiles.ts';
import { groupOf, POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import type { JobRequest } from './JobRequest.ts';

/** The dims job: the dimensions of every position group, or of the request's position's group (no store needed). */
export function answerDims(req: JobRequest): Partial<Record<PositionGroup, readonly DimensionInfo[]>> {
  const position = req.get('position');
  const groups = position === undefined ? POSITION_GROUPS : [groupOf(position)];
  return Object.fromEntries(groups.map((g) => [g, dimensionsOf(g)]));
}
