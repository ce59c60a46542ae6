import { KeyLines } from './RosterLookups.ts';
import { readTable, type TableOptions } from './readTable.ts';
import type { Bats, Player, Throws } from './types.ts';

const BATS: ReadonlySet<Bats> = new Set<Bats>(['L', 'R', 'S']);
const THROWS: ReadonlySet<Throws> = new Set<Throws>(['L', 'R']);

export interface PlayersRead {
  readonly players: ReadonlyMap<string, Player>;
  /** player_id -> line of each player row that was rejected (lenient mode). */
  readonly rejectedAt: ReadonlyMap<string, number>;
  readonly fileName: string;
  readonly rows: number;
  readonly ignored: readonly string[];
}

/** Reads players.csv: player_id, name; optional birth_date (YYYY-MM-DD), bats (L/R/S), throws (L/R). */
export async function readPlayers(options: TableOptions): Promise<PlayersRead> {
  const players = new Map<string, Player>();
  const rejectedAt = new Map<string, number>();
  const keys = new KeyLines('player_id');
  const read = await readTable(options, 'players.csv', (ctx) => {
    const h = ctx.header;
    const c = {
      playerId: h.col('player_id'),
      name: h.col('name'),
      birthDate: h.col('birth_date'),
      bats: h.col('bats'),
      throws: h.col('throws'),
    };
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const playerId = row.text(c.playerId);
      const name = row.text(c.name);
      const birthDate = row.dateOpt(c.birthDate);
      const bats = row.oneOf(c.bats, BATS, 'bats L, R or S');
      const throws = row.oneOf(c.throws, THROWS, 'throws L or R');
      if (playerId !== '') keys.check(row, playerId, playerId);
      if (!ctx.settle()) {
        if (playerId !== '' && !players.has(playerId)) rejectedAt.set(playerId, line);
        return;
      }
      players.set(playerId, {
        playerId,
        name,
        ...(birthDate === undefined ? {} : { birthDate }),
        ...(bats === undefined ? {} : { bats }),
        ...(throws === undefined ? {} : { throws }),
      });
    };
  });
  return { players, rejectedAt, fileName: read.fileName, rows: read.rows, ignored: read.ignored };
}
