import { randomBytes } from 'node:crypto';
import { rename, unlink, writeFile } from 'node:fs/promises';
import { stringify } from 'csv-stringify/sync';
import { stringifyCsv } from '../text/stringifyCsv.ts';
import { KindredError } from '../errors/KindredError.ts';
import type { RejectedRow } from './Roster.ts';

export const REJECTS_HEADER = ['file', 'line', 'column', 'field', 'value', 'code', 'expected', 'raw_row'] as const;

/**
 * Writes the rows left out under --lenient as CSV, one line per reason:
 * file, line, column, field, value, code, expected, raw_row (the row's cells
 * re-joined as one CSV line; a long row's first cells only, a last cell saying
 * how many more it had). Text cells that a spreadsheet would run as a
 * formula get an apostrophe first (see safeCsvCell). Written to a temp file,
 * then renamed.
 */
export async function writeRejects(path: string, rejected: readonly RejectedRow[]): Promise<void> {
  const records: string[][] = [[...REJECTS_HEADER]];
  for (const row of rejected) {
    const cut = row.rawCells > row.raw.length ? [`... ${row.rawCells - row.raw.length} more cells not kept`] : [];
    const raw = stringify([[...row.raw, ...cut]], { eof: false });
    for (const issue of row.issues) {
      records.push([
        issue.file, String(issue.line), String(issue.column), issue.field, issue.value, issue.code, issue.expected, raw,
      ]);
    }
  }
  const text = stringifyCsv(records);
  const temp = `${path}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
  try {
    await writeFile(temp, text, 'utf8');
    await rename(temp, path);
  } catch (cause) {
    await unlink(temp).catch(() => undefined);
    throw new KindredError('kindred.store.writeFailed', `${path}: cannot write the rejected rows (${String(cause)})`, { path });
  }
}
