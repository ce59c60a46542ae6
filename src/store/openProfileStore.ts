import { StoreError } from '../errors/KindredError.ts';
import { Outcomes } from '../outlook/Outcomes.ts';
import { POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import { decodeOutcomesFile } from './outcomesFile.ts';
import { openStore } from './openStore.ts';
import { decodePlayersFile } from './playersFile.ts';
import type { ProfileStore, StoredGroup, StoredPlayer } from './ProfileStore.ts';
import { readGroup } from './readGroup.ts';
import { groupFileNames, OUTCOMES_FILE, PLAYERS_FILE } from './storeFileNames.ts';

/**
 * Opens a store for queries: the manifest and every checksum are verified by openStore before any
 * file is parsed or any index is handed to the native reader; then the players, every position group
 * (with its embedding and indexes) and the outcomes' text are read. The outcomes are decoded on the
 * first `outcomes()` call.
 */
export async function openProfileStore(dir: string): Promise<ProfileStore> {
  const store = await openStore(dir);
  const pf = decodePlayersFile(await store.readText(PLAYERS_FILE), `${dir}/${PLAYERS_FILE}`);
  const players: StoredPlayer[] = pf.players.map((p) => ({
    playerId: p.player_id,
    name: p.name,
    birthDate: p.birth_date,
    bats: p.bats,
    throws: p.throws,
  }));
  const playerById = new Map(players.map((p, i) => [p.playerId, i]));
  const salaries = new Map<number, Map<number, number>>();
  for (const [idx, season, salary] of pf.contracts) {
    let m = salaries.get(idx);
    if (!m) salaries.set(idx, (m = new Map()));
    m.set(season, salary);
  }
  const groups = new Map<PositionGroup, StoredGroup>();
  for (const group of POSITION_GROUPS) {
    if (groupFileNames(group).json in store.manifest.files) groups.set(group, await readGroup(store, group, { players: players.length, levels: pf.levels.length }));
  }
  const outcomesText = OUTCOMES_FILE in store.manifest.files ? await store.readText(OUTCOMES_FILE) : null;
  let outcomes: Outcomes | undefined;
  return {
    dir,
    opened: store,
    params: store.manifest.params,
    levels: pf.levels,
    players,
    playerById,
    salaries,
    groups,
    outcomes(): Outcomes {
      if (outcomes) return outcomes;
      if (outcomesText === null) {
        throw new StoreError('kindred.store.missing', `store at ${store.dir} has no ${OUTCOMES_FILE} (built by an older kindred); rebuild it with kindred build`, {
          dir: store.dir,
          file: OUTCOMES_FILE,
        });
      }
      const where = `${store.dir}/${OUTCOMES_FILE}`;
      outcomes = new Outcomes(decodeOutcomesFile(outcomesText, where), playerById, where);
      return outcomes;
    },
  };
}
