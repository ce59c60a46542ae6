/**
 * Writes a simulated league as a roster folder in the canonical CSV format:
 * levels.csv, players.csv, batting.csv, fielding.csv, pitching.csv and
 * contracts.csv (header row first, comma-separated, '' for missing). Each
 * file is streamed to a temporary name in the folder and renamed into place
 * when complete, so a reader never sees a half-written file.
 *
 * @example
 * const { files } = await writeLeagueCsv(league, '/tmp/roster');
 * files['batting.csv']; // => number of data rows written
 */
import { createWriteStream } from 'node:fs';
import { mkdir, rename, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { KindredError } from '../errors/KindredError.ts';
import { cellText } from './cellText.ts';
import type { ColumnTable } from './ColumnTable.ts';
import type { SimLeague } from './simTypes.ts';

const CHUNK_CHARS = 1 << 20;

export async function writeLeagueCsv(league: SimLeague, dir: string): Promise<{ files: Record<string, number> }> {
  try {
    await mkdir(dir, { recursive: true });
  } catch (cause) {
    throw new KindredError('kindred.store.writeFailed', `cannot create folder ${dir}: ${String(cause)}`, { dir });
  }
  const files: Record<string, number> = {};
  const p = league.players;
  files['levels.csv'] = await writeLines(dir, 'levels.csv', 'level', league.levels.length, (i) => league.levels[i] ?? '');
  files['players.csv'] = await writeLines(dir, 'players.csv', 'player_id,name,birth_date,bats,throws', p.count, (i) =>
    `${p.ids[i] ?? ''},${p.names[i] ?? ''},${p.birthDates[i] ?? ''},${p.bats[i] ?? ''},${p.throws[i] ?? ''}`);
  files['batting.csv'] = await writeTable(league, dir, 'batting.csv', league.batting);
  files['fielding.csv'] = await writeTable(league, dir, 'fielding.csv', league.fielding);
  files['pitching.csv'] = await writeTable(league, dir, 'pitching.csv', league.pitching);
  files['contracts.csv'] = await writeTable(league, dir, 'contracts.csv', league.contracts);
  return { files };
}

function writeTable(league: SimLeague, dir: string, name: string, table: ColumnTable): Promise<number> {
  const header = table.columns.map((c) => c.name).join(',');
  const width = table.width;
  const cells: string[] = new Array<string>(width);
  return writeLines(dir, name, header, table.length, (row) => {
    for (let c = 0; c < width; c++) cells[c] = cellText(league, table, row, c);
    return cells.join(',');
  });
}

async function writeLines(dir: string, name: string, header: string, count: number, line: (i: number) => string): Promise<number> {
  const target = join(dir, name);
  const temp = join(dir, `.${name}.${process.pid}.tmp`);
  const out = createWriteStream(temp, { encoding: 'utf8' });
  const failed = new Promise<never>((_, reject) => out.once('error', reject));
  failed.catch(() => undefined);
  const write = async (text: string): Promise<void> => {
    if (!out.write(text)) await Promise.race([new Promise<void>((resolve) => out.once('drain', () => resolve())), failed]);
  };
  try {
    let buffer = header + '\n';
    for (let i = 0; i < count; i++) {
      buffer += line(i) + '\n';
      if (buffer.length >= CHUNK_CHARS) {
        await write(buffer);
        buffer = '';
      }
    }
    await write(buffer);
    await Promise.race([new Promise<void>((resolve) => out.end(() => resolve())), failed]);
    await rename(temp, target);
  } catch (cause) {
    out.destroy();
    await rm(temp, { force: true });
    throw new KindredError('kindred.store.writeFailed', `cannot write ${target}: ${String(cause)}`, { file: target });
  }
  return count;
}
