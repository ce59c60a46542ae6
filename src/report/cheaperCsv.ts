import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { CheaperComp, CheaperResult } from '../jobs/CheaperResult.ts';
import { compsCsvRecords, type CsvExtraColumn } from './compsCsvRecords.ts';

/** The cheaper comps' own CSV columns: salary as a whole number of US dollars, the value score, likeness per $1M, the frontier flags. */
export const CHEAPER_CSV_COLUMNS: readonly CsvExtraColumn<CheaperComp>[] = [
  { name: 'salary_usd', value: (c) => Math.round(c.salary_usd) },
  { name: 'value_score', value: (c) => c.value_score },
  { name: 'likeness_per_million', value: (c) => c.likeness_per_million },
  { name: 'frontier', value: (c) => c.frontier },
  { name: 'above_likeness_floor', value: (c) => c.above_likeness_floor },
];

/** The cheaper comps as CSV in the comps convention (compsCsvRecords), with the salary columns. */
export function cheaperCsv(result: CheaperResult, header = true): string {
  const records = compsCsvRecords(result, CHEAPER_CSV_COLUMNS);
  return stringifyCsv(header ? records : records.slice(1));
}
