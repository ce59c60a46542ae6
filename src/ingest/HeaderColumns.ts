import type { InputIssue } from '../errors/InputError.ts';
import { findControlCharacter, showControlCharacters } from '../text/controlCharacters.ts';
import { columnSpec, type RosterFile } from './fileColumns.ts';
import { controlExpected } from './RowReader.ts';

/** A canonical column located in a file's header (`index` -1 when the optional column is absent). */
export interface Column<N extends string = string> {
  readonly name: N;
  /** 0-based index into a row's cells, -1 when absent. */
  readonly index: number;
  readonly required: boolean;
}

/**
 * Locates canonical columns in a header, through the club's column names when
 * a column map renames them. Reports a wrong delimiter, duplicate header
 * names and missing required columns, and lists the columns it ignores. A
 * column found only under an earlier name of its own (`formerly`) is read,
 * with a notice giving the new name.
 */
export class HeaderColumns<F extends RosterFile> {
  readonly issues: InputIssue[] = [];
  /** One line per column read under an earlier name of its own (ColumnSpec.formerly). */
  readonly notices: string[] = [];
  private readonly positions = new Map<string, number>();
  private readonly used = new Set<number>();
  private readonly header: readonly string[];

  constructor(
    private readonly canonicalFile: F,
    private readonly fileName: string,
    header: readonly string[],
    private readonly renames: Readonly<Record<string, string>>,
  ) {
    this.header = header.map((h) => h.trim());
    const only = this.header[0];
    if (this.header.length === 1 && only !== undefined && !only.includes(',') && /[;\t|]/.test(only)) {
      this.issues.push(this.headerIssue('kindred.input.wrongDelimiter', 0, '', only,
        'comma-separated columns (this header holds a ";", tab or "|" but no comma)'));
      return;
    }
    this.header.forEach((name, i) => {
      if (name === '') return;
      if (findControlCharacter(name) >= 0) {
        this.issues.push(this.headerIssue('kindred.input.controlCharacter', i + 1, '', showControlCharacters(name), controlExpected(name)));
        return;
      }
      const first = this.positions.get(name);
      if (first === undefined) {
        this.positions.set(name, i);
      } else {
        this.issues.push(this.headerIssue('kindred.input.duplicateColumn', i + 1, name, name,
          `each column name once (also column ${first + 1})`));
      }
    });
  }

  /** Locates a canonical column of the file's table; a required one that is absent is reported. */
  col(name: string): Column {
    const spec = columnSpec(this.canonicalFile, name);
    if (spec === undefined) throw new RangeError(`${this.canonicalFile} has no column ${name}`);
    const { required } = spec;
    const club = this.renames[name];
    let index = this.positions.get(club ?? name) ?? -1;
    if (index < 0 && club === undefined) {
      const former = (spec.formerly ?? []).find((f) => this.positions.has(f));
      if (former !== undefined) {
        index = this.positions.get(former) ?? -1;
        this.notices.push(`${this.fileName}: column ${former} read as ${name}, its new name (rename the column to ${name})`);
      }
    }
    if (index >= 0) {
      this.used.add(index);
    } else if (required && this.issues.every((i) => i.code !== 'kindred.input.wrongDelimiter')) {
      const expected = club === undefined
        ? `a column named ${name}`
        : `a column named "${club}" (the column map's name for ${name})`;
      this.issues.push(this.headerIssue('kindred.input.missingColumn', 0, name, club ?? name, expected));
    }
    return { name, index, required };
  }

  /** Header names no canonical column was read from (after all `col` calls). */
  ignored(): string[] {
    return this.header.filter((h, i) => h !== '' && !this.used.has(i));
  }

  get width(): number {
    return this.header.length;
  }

  private headerIssue(code: InputIssue['code'], column: number, field: string, value: string, expected: string): InputIssue {
    return { code, file: this.fileName, line: 1, column, field, value, expected };
  }
}
