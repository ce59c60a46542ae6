import { CONTRACTS_COLUMNS } from './contractsColumns.ts';
import { RecordReader } from './RecordReader.ts';
import { KeyLines, type RosterLookups } from './RosterLookups.ts';
import { readTable, type TableOptions, type TableRead } from './readTable.ts';
import type { Contract } from './Roster.ts';

/** Reads contracts.csv (optional) as its column table says (contractsColumns.ts); one row per player and season. */
export async function readContracts(
  options: TableOptions,
  lookups: RosterLookups,
): Promise<TableRead & { readonly contracts: Contract[] }> {
  const contracts: Contract[] = [];
  const keys = new KeyLines('player and season');
  const read = await readTable(options, 'contracts.csv', (ctx) => {
    const reader = new RecordReader(CONTRACTS_COLUMNS, ctx, lookups);
    return (cells, line) => {
      const { row } = ctx;
      row.start(line, cells);
      const fields = reader.read(line);
      const { playerId, season } = fields;
      if (typeof playerId === 'string' && playerId !== '' && typeof season === 'number' && !Number.isNaN(season)) {
        keys.check(row, `${playerId}\u0000${season}`, `${playerId} ${season}`);
      }
      if (ctx.settle()) contracts.push(reader.record(fields));
    };
  });
  return { ...read, contracts };
}
