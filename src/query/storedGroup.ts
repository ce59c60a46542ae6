import { QueryError } from '../errors/KindredError.ts';
import type { PositionGroup } from '../profiles/positionGroup.ts';
import type { ProfileStore, StoredGroup } from '../store/ProfileStore.ts';

/**
 * A position group of the store, or the query error every job gives when the store has none
 * (`kindred.query.emptyPool`).
 */
export function storedGroup(store: ProfileStore, group: PositionGroup): StoredGroup {
  const g = store.groups.get(group);
  if (!g) throw new QueryError('kindred.query.emptyPool', `the store has no ${group} profiles`, { group });
  return g;
}
