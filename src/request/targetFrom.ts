import { ParameterError } from '../errors/ParameterError.ts';
import { parseWant } from '../query/parseWant.ts';
import { playerTarget } from '../query/playerTarget.ts';
import type { ProfileStore } from '../store/ProfileStore.ts';
import { resolvePlayer } from '../query/resolvePlayer.ts';
import { selectTargetRow } from '../query/selectTargetRow.ts';
import type { Target } from '../query/Target.ts';
import { POSITIONS } from '../profiles/positionGroup.ts';
import type { JobRequest } from './JobRequest.ts';
import { checkAgainstStore } from './compsOptionsFrom.ts';

/** The target of a request: a player (id or name, with season, level and position) or a want profile. */
export function targetFrom(store: ProfileStore, req: JobRequest): Target {
  checkAgainstStore(req, store);
  const want = req.get('want');
  const player = req.get('player');
  const season = req.get('season');
  const level = req.get('level');
  const position = req.get('position');
  if (want !== undefined) {
    if (player !== undefined) throw new ParameterError('want', (n) => `give either a player or ${n('want')}, not both`, { prefixed: false });
    if (position === undefined) {
      throw new ParameterError('position', (n) => `${n('want')} needs ${n('position')} (${POSITIONS.slice(0, -1).join(', ')} or ${POSITIONS[POSITIONS.length - 1] ?? ''})`, {
        prefixed: false,
      });
    }
    return parseWant(store, want, { position, ...(season !== undefined ? { season } : {}), ...(level !== undefined ? { level } : {}) });
  }
  if (player === undefined) {
    throw new ParameterError('player', (n) => `name a player (id or name), or give ${n('want')} with ${n('position')}`, {
      prefixed: false,
      code: 'kindred.usage.missingArgument',
    });
  }
  const row = selectTargetRow(store, resolvePlayer(store, player), {
    ...(season !== undefined ? { season } : {}),
    ...(level !== undefined ? { level } : {}),
    ...(position !== undefined ? { position } : {}),
  });
  return playerTarget(store, row);
}
