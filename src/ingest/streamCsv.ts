import { createReadStream } from 'node:fs';
import { parse, type CsvError } from 'csv-parse';
import type { InputIssue } from '../errors/InputError.ts';
import { EncodingProblem, Utf8Check } from './Utf8Check.ts';

/** Longest record accepted (bytes): bounds memory on an unterminated quote. */
export const MAX_RECORD_BYTES = 1 << 20;

export interface CsvSink {
  /** The header (line 1). Return false to stop reading the file (its header is unusable). */
  header(cells: readonly string[]): boolean;
  /** A data record and the line it starts on (1-based). */
  record(cells: readonly string[], line: number): void;
}

/**
 * Streams a comma-separated file into a sink: records as arrays of strings
 * (no casting), BOM dropped, empty lines skipped, ragged rows passed on for
 * the caller to report. Resolves with the number of data records, or with a
 * `kindred.input.csvSyntax` issue when the file cannot be parsed further, or
 * a `kindred.input.badEncoding` issue (one, with its line) when the file is
 * not UTF-8 (see Utf8Check).
 */
export function streamCsv(path: string, fileName: string, sink: CsvSink): Promise<{ rows: number; syntax?: InputIssue }> {
  return new Promise((resolve, reject) => {
    const parser = parse({
      bom: true,
      delimiter: ',',
      columns: false,
      relax_column_count: true,
      // Empty lines come through as [""] and are skipped below, so that lines can be counted
      // without the parser's per-record info objects (about 13% of the reading time).
      skip_empty_lines: false,
      max_record_size: MAX_RECORD_BYTES,
    });
    const input = createReadStream(path);
    const check = new Utf8Check();
    let rows = 0;
    let seenHeader = false;
    let stopped = false;
    let nextLine = 1;
    const finish = (syntax?: InputIssue): void => {
      if (stopped) return;
      stopped = true;
      input.destroy();
      check.destroy();
      parser.destroy();
      resolve(syntax === undefined ? { rows } : { rows, syntax });
    };
    check.on('error', (err) => {
      if (err instanceof EncodingProblem) {
        finish({ code: 'kindred.input.badEncoding', file: fileName, line: err.line, column: 0, field: '', value: err.value, expected: err.expected });
      } else if (!stopped) {
        stopped = true;
        input.destroy();
        parser.destroy();
        reject(err);
      }
    });
    input.on('error', (err) => {
      if (!stopped) {
        stopped = true;
        parser.destroy();
        reject(err);
      }
    });
    parser.on('readable', () => {
      try {
        let record: string[] | null;
        while (!stopped && (record = parser.read()) !== null) {
          const line = nextLine;
          nextLine += 1;
          for (const cell of record) if (cell.includes('\n')) nextLine += countNewlines(cell);
          if (record.length === 1 && record[0] === '') continue;
          if (!seenHeader) {
            seenHeader = true;
            if (!sink.header(record)) finish();
            continue;
          }
          rows += 1;
          sink.record(record, line);
        }
      } catch (err) {
        stopped = true;
        input.destroy();
        parser.destroy();
        reject(err);
      }
    });
    parser.on('error', (err: CsvError) => {
      const line = typeof err.lines === 'number' ? err.lines : nextLine;
      finish({
        code: 'kindred.input.csvSyntax',
        file: fileName,
        line,
        column: typeof err.column === 'number' ? err.column + 1 : 0,
        field: '',
        value: err.code,
        expected: `well-formed CSV (${err.message})`,
      });
    });
    parser.on('end', () => {
      if (!seenHeader) {
        finish({ code: 'kindred.input.badHeader', file: fileName, line: 1, column: 0, field: '', value: '',
          expected: 'a header line naming the columns (the file is empty)' });
      } else {
        finish();
      }
    });
    input.pipe(check).pipe(parser);
  });
}

function countNewlines(text: string): number {
  let n = 0;
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) n += 1;
  return n;
}
