import { PLAYERS_COLUMNS } from './playersColumns.ts';
import { RecordReader } from './RecordReader.ts';
import { KeyLines } from './RosterLookups.ts';
import { readTable, type TableOptions } from './readTable.ts';
import type { Player } from './Roster.ts';

export interface PlayersRead {
  readonly players: ReadonlyMap<string, Player>;
  /** player_id -> line of each player row that was rejected (lenient mode). */
  readonly rejectedAt: ReadonlyMap<string, number>;
  readonly fileName: string;
  readonly rows: number;
  readonly ignored: readonly string[];
  /** False when players.csv could not be read through: season rows are then not checked against it. */
  readonly readable: boolean;
}

/** Reads players.csv as its column table says (playersColumns.ts); one row per player_id. */
export async function readPlayers(options: TableOptions): Promise<PlayersRead> {
  const players = new Map<string, Player>();
  const rejectedAt = new Map<string, number>();
  const keys = new KeyLines('player_id');
  const read = await readTable(options, 'players.csv', (ctx) => {
    const reader = new RecordReader(PLAYERS_COLUMNS, ctx, undefined);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const fields = reader.read(line);
      const playerId = typeof fields['playerId'] === 'string' ? fields['playerId'] : '';
      if (playerId !== '') keys.check(row, playerId, playerId);
      if (!ctx.settle()) {
        if (playerId !== '' && !players.has(playerId)) rejectedAt.set(playerId, line);
        return;
      }
      players.set(playerId, reader.record(fields));
    };
  });
  return { players, rejectedAt, fileName: read.fileName, rows: read.rows, ignored: read.ignored, readable: read.readable };
}
