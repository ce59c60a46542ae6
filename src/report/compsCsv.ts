import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { CompsResult } from '../query/CompsResult.ts';
import { compsCsvRecords } from './compsCsvRecords.ts';

/** The comps as CSV text (see compsCsvRecords), with or without the header. */
export function compsCsv(result: CompsResult, header = true): string {
  const records = compsCsvRecords(result);
  return stringifyCsv(header ? records : records.slice(1));
}
