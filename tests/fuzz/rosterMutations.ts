/**
 * Mutations of a roster folder (the CSV files a club exports) and of column maps, for the fuzz suite:
 * cells set to bad or hostile values, rows deleted, repeated or made ragged, headers edited, files cut,
 * emptied, deleted or re-encoded (UTF-16 with and without a byte order mark, Latin-1, invalid UTF-8,
 * CRLF, NUL bytes), and column maps that rename a column correctly, point two columns at one, name a
 * missing file or are not JSON. Works on whatever files the folder holds. A build of any of these must
 * end with exit 0, 1 or 2, never a crash or a hang, and leave no half-written store behind.
 */
import { copyFileSync, existsSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { SeededRandom } from '../../src/random/SeededRandom.ts';

export interface RosterMutant {
  readonly what: string;
  /** Extra `kindred build` arguments (--lenient, --columns <file>). */
  readonly args: readonly string[];
  readonly changed: readonly string[];
}

/** Values a careless or hostile export might hold in a cell. */
export const BAD_CELLS: readonly string[] = [
  '', ' ', 'NaN', 'nan', 'Infinity', '-Infinity', '-1', '-0', '0', '1e309', '1e-309', '9'.repeat(40), '0x10', '007', ' 12 ', '12.', '.5', '1,5',
  'abc', 'null', 'TRUE', '"', '""', "'", '=HYPERLINK("http://x","y")', '+cmd|/c calc', '@SUM(A1)', '-2+3', '\t=1', '\u001b[2J\u001b]0;x\u0007',
  '\u202eevil', '\u0000', 'é', '\uFEFF1', '2090-01-01', '0001-01-01', '1999-02-30', '9999', '1800', '2026', 'Top', 'Elite', 'ZZZ', 'SS', 'XX', 'L', 'S', 'Q',
  'x'.repeat(20_000), '12\n34', '1;2',
];

function pick<T>(rng: SeededRandom, list: readonly T[]): T {
  return list[rng.int(list.length)] as T;
}

/** Quotes a cell when it needs it, as a spreadsheet export would (RFC 4180). */
function quoted(cell: string): string {
  return /[",\r\n]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell;
}

export class RosterMutator {
  readonly #base: string;
  readonly #work: string;
  readonly #mapPath: string;
  readonly #files: readonly string[];

  /** `work` must start as a copy of `base`; column maps are written to `mapPath`. */
  constructor(base: string, work: string, mapPath: string) {
    this.#base = base;
    this.#work = work;
    this.#mapPath = mapPath;
    this.#files = readdirSync(base).filter((n) => n.endsWith('.csv')).sort();
  }

  restore(mutant: RosterMutant): void {
    for (const name of mutant.changed) {
      const from = join(this.#base, name);
      const to = join(this.#work, name);
      if (existsSync(from)) copyFileSync(from, to);
      else rmSync(to, { force: true });
    }
    rmSync(this.#mapPath, { force: true });
  }

  mutate(rng: SeededRandom): RosterMutant {
    const edits: string[] = [];
    const changed = new Set<string>();
    const args: string[] = [];
    const count = 1 + (rng.chance(0.3) ? rng.int(4) : 0);
    for (let i = 0; i < count; i++) {
      const file = pick(rng, this.#files);
      edits.push(this.#edit(rng, file, args));
      changed.add(file);
    }
    if (rng.chance(0.3)) args.push('--lenient');
    return { what: edits.join('; '), args, changed: [...changed] };
  }

  #edit(rng: SeededRandom, file: string, args: string[]): string {
    const path = join(this.#work, file);
    if (!existsSync(path)) return `${file} (deleted by an earlier edit)`;
    const text = readFileSync(path, 'utf8');
    const lines = text.split('\n');
    const body = lines.length > 1 ? lines.length - 1 : 1; // the last line is empty (a final newline)
    const row = 1 + rng.int(Math.max(1, body - 1));
    const cells = (lines[row] ?? '').split(',');
    const header = (lines[0] ?? '').split(',');
    const write = (next: string[]): void => writeFileSync(path, next.join('\n'));
    const op = rng.int(100);
    if (op < 35) {
      const col = rng.int(Math.max(1, cells.length));
      const value = pick(rng, BAD_CELLS);
      cells[col] = quoted(value);
      lines[row] = cells.join(',');
      write(lines);
      return `${file} line ${row + 1} column ${header[col] ?? col + 1} set to ${JSON.stringify(value.length > 30 ? `${value.slice(0, 30)}...` : value)}`;
    }
    if (op < 42) {
      lines.splice(row, 1);
      write(lines);
      return `${file} line ${row + 1} deleted`;
    }
    if (op < 50) {
      lines.splice(row, 0, lines[row] ?? '');
      write(lines);
      return `${file} line ${row + 1} repeated`;
    }
    if (op < 56) {
      if (rng.chance(0.5)) cells.push(...Array.from({ length: 1 + rng.int(3) }, () => 'x'));
      else cells.splice(rng.int(Math.max(1, cells.length)), 1);
      lines[row] = cells.join(',');
      write(lines);
      return `${file} line ${row + 1} made ragged (${cells.length} cells for ${header.length} columns)`;
    }
    if (op < 64) {
      const col = rng.int(header.length);
      const kind = rng.int(4);
      const old = header[col] ?? '';
      if (kind === 0) header[col] = old.toUpperCase() === old ? old.toLowerCase() : old.toUpperCase();
      else if (kind === 1) header[col] = header[(col + 1) % header.length] ?? old;
      else if (kind === 2) header.splice(col, 1);
      else header.push('extra_column');
      lines[0] = header.join(',');
      write(lines);
      return `${file} header: ${['case of', 'repeat of the next column over', 'removal of', 'extra column after'][kind]} ${old}`;
    }
    if (op < 70) {
      const bytes = readFileSync(path);
      const length = rng.int(bytes.length + 1);
      writeFileSync(path, bytes.subarray(0, length));
      return `${file} cut to ${length} of ${bytes.length} bytes`;
    }
    if (op < 73) {
      writeFileSync(path, '');
      return `${file} emptied`;
    }
    if (op < 76) {
      rmSync(path, { force: true });
      return `${file} deleted`;
    }
    if (op < 86) {
      const kind = rng.int(7);
      const bytes = readFileSync(path);
      if (kind === 0) writeFileSync(path, Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, 'utf16le')]));
      else if (kind === 1) writeFileSync(path, Buffer.from(text, 'utf16le'));
      else if (kind === 2) writeFileSync(path, Buffer.from(text.replace(/a/, 'é'), 'latin1'));
      else if (kind === 3) {
        const at = rng.int(bytes.length);
        writeFileSync(path, Buffer.concat([bytes.subarray(0, at), Buffer.from([0xc3, 0x28, 0xff]), bytes.subarray(at)]));
      } else if (kind === 4) writeFileSync(path, text.replace(/\n/g, '\r\n'));
      else if (kind === 5) writeFileSync(path, Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), bytes]));
      else {
        const at = rng.int(bytes.length);
        writeFileSync(path, Buffer.concat([bytes.subarray(0, at), Buffer.from([0]), bytes.subarray(at)]));
      }
      return `${file} ${['as UTF-16LE with a byte order mark', 'as UTF-16LE without a byte order mark', 'as Latin-1', 'with invalid UTF-8 bytes', 'with CRLF line ends', 'with a UTF-8 byte order mark', 'with a NUL byte'][kind]}`;
    }
    if (op < 92) {
      const bytes = readFileSync(path);
      for (let i = 0; i < 1 + rng.int(6); i++) {
        const at = rng.int(Math.max(1, bytes.length));
        if (bytes.length > 0) bytes[at] = (bytes[at] ?? 0) ^ (1 << rng.int(8));
      }
      writeFileSync(path, bytes);
      return `${file} bits flipped`;
    }
    return this.#columnMap(rng, file, header, lines, args);
  }

  /** A column map, with the roster edited to match it (a correct rename) or not (a bad map). */
  #columnMap(rng: SeededRandom, file: string, header: string[], lines: string[], args: string[]): string {
    args.push('--columns', this.#mapPath);
    const col = rng.int(header.length);
    const canonical = header[col] ?? 'x';
    const other = header[(col + 1 + rng.int(Math.max(1, header.length - 1))) % header.length] ?? canonical;
    const kind = rng.int(6);
    if (kind === 0) {
      header[col] = `club_${canonical}`;
      lines[0] = header.join(',');
      writeFileSync(join(this.#work, file), lines.join('\n'));
      writeFileSync(this.#mapPath, JSON.stringify({ columns: { [file]: { [canonical]: `club_${canonical}` } } }));
      return `column map renames ${file} ${canonical} to club_${canonical} (roster renamed to match)`;
    }
    if (kind === 1) {
      writeFileSync(this.#mapPath, JSON.stringify({ columns: { [file]: { [canonical]: other } } }));
      return `column map points ${file} ${canonical} at ${other}`;
    }
    if (kind === 2) {
      writeFileSync(this.#mapPath, JSON.stringify({ files: { [file]: `missing_${file}` } }));
      return `column map names a missing file for ${file}`;
    }
    if (kind === 3) {
      writeFileSync(this.#mapPath, pick(rng, ['{', '[]', 'null', '"x"', '{"columns":[]}', '{"files":{"x.csv":"y"}}', '\uFEFF{}', '{"columns":{"batting.csv":{"SO":""}}}']));
      return `column map that is not a usable map`;
    }
    if (kind === 4) {
      writeFileSync(this.#mapPath, JSON.stringify({ columns: { [file]: { [canonical]: pick(rng, BAD_CELLS) } } }));
      return `column map sends ${file} ${canonical} to an odd name`;
    }
    writeFileSync(this.#mapPath, JSON.stringify({ files: { [file]: pick(rng, this.#files) } }));
    return `column map reads ${file} from another roster file`;
  }
}
