/** A small simulated league shared by the sim tests, written once per test file. */
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { parse } from 'csv-parse/sync';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import type { SimLeague, SimOptions } from '../../src/sim/simTypes.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { scratchDir } from '../helpers/scratchDir.ts';

export const SMALL_OPTIONS: SimOptions = { seed: 12345, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 6000 };

export function smallLeague(options: SimOptions = SMALL_OPTIONS): SimLeague {
  return simulateLeague(options);
}

export async function writeToTemp(league: SimLeague): Promise<{ dir: string; files: Record<string, number> }> {
  const dir = await scratchDir('kindred-sim-');
  const { files } = await writeLeagueCsv(league, dir);
  return { dir, files };
}

/** A written file as header plus rows of named cells. */
export async function readCsv(dir: string, name: string): Promise<{ header: string[]; rows: Record<string, string>[]; text: string }> {
  const text = await readFile(join(dir, name), 'utf8');
  const records: string[][] = parse(text, { bom: true });
  const header = records[0] ?? [];
  const rows = records.slice(1).map((r) => Object.fromEntries(header.map((h, i) => [h, r[i] ?? ''])));
  return { header, rows, text };
}
