import type { Column } from './HeaderColumns.ts';
import type { AtMostCheck, ColumnSpec, ColumnTable, RecordOf } from './ColumnSpec.ts';
import type { RosterLookups } from './RosterLookups.ts';
import type { PercentWatch, TableContext } from './readTable.ts';
import type { RosterFile } from './fileColumns.ts';

/** A row's cells read into record fields (not yet known to be a clean record). */
export type RowFields = Record<string, unknown>;

export interface Located {
  readonly spec: ColumnSpec;
  readonly col: Column;
  readonly allowed: ReadonlySet<string> | undefined;
  readonly watch: PercentWatch | undefined;
}

/**
 * Reads the cells of a row into record fields as a file's column table says
 * (each column by its kind, measurements within their plausible range),
 * runs the table's consistency checks, and turns a clean row into its typed
 * record. One reader per file; the columns are located once from the header.
 */
export class RecordReader<T extends ColumnTable> {
  private readonly located: readonly Located[];
  private readonly numbers: (number | undefined)[];
  private readonly checks: readonly { readonly at: Column; readonly lhs: readonly number[]; readonly rhs: number; readonly check: AtMostCheck }[];
  /** In a season file, the choice column that is part of the season key (fielding's position), if any. */
  readonly part: Located | undefined;
  /** The key cells of the row last read ('' or NaN when unreadable; team and part undefined when empty). */
  playerId = '';
  season = Number.NaN;
  level = '';
  team: string | undefined = undefined;
  partValue: string | undefined = undefined;
  private readonly fieldNames: readonly string[];
  private readonly seasonCol: Column | undefined;
  private readonly present: readonly boolean[];
  /**
   * Each team seen to its one-team list: a roster holds millions of records, and one shared string and
   * list per team instead of one per record is a large part of the roster's memory.
   */
  private readonly teamLists = new Map<string, { readonly team: string; readonly list: readonly string[] }>();

  constructor(
    private readonly table: T,
    private readonly ctx: TableContext<RosterFile>,
    private readonly lookups: RosterLookups | undefined,
    checks: readonly AtMostCheck[] = [],
  ) {
    this.located = table.map((spec) => {
      const col = ctx.header.col(spec.csv);
      const allowed = spec.values === undefined ? undefined : new Set([...spec.values, ...(spec.skipped ?? [])]);
      const watch = spec.kind === 'percent' ? ctx.watchPercent(col) : undefined;
      return { spec, col, allowed, watch };
    });
    this.part = table.some((s) => s.kind === 'season') ? this.located.find((l) => l.spec.kind === 'choice') : undefined;
    this.numbers = new Array<number | undefined>(table.length);
    this.seasonCol = this.located.find((l) => l.spec.kind === 'season')?.col;
    this.fieldNames = table.map((spec) => spec.field);
    this.present = table.map((spec) => spec.required || spec.kind === 'team');
    const indexOf = (csv: string): number => {
      const i = table.findIndex((s) => s.csv === csv);
      if (i < 0) throw new RangeError(`check names ${csv}, a column the table lacks`);
      return i;
    };
    this.checks = checks.map((check) => ({
      at: this.colAt(indexOf(check.at)),
      lhs: check.sum.map(indexOf),
      rhs: indexOf(check.atMost),
      check,
    }));
  }

  /** Reads every column of the current row (`ctx.row` started on it) and runs the checks. */
  read(line: number): RowFields {
    const { row } = this.ctx;
    const out: RowFields = {};
    this.team = undefined;
    this.partValue = undefined;
    for (let i = 0; i < this.located.length; i++) {
      const l = this.located[i];
      if (l === undefined) continue;
      const value = this.cell(l, line);
      this.numbers[i] = typeof value === 'number' ? value : undefined;
      if (value !== undefined) out[l.spec.field] = value;
    }
    if (this.lookups !== undefined && this.seasonCol !== undefined) this.lookups.bornBefore(row, this.playerId, this.season, this.seasonCol);
    for (const c of this.checks) {
      let lhs = 0;
      let known = true;
      for (const i of c.lhs) {
        const v = this.numbers[i];
        if (v === undefined) known = false;
        else lhs += v;
      }
      if (known) row.atMost(c.at, c.check.sum.join(' + '), lhs, c.check.atMost, this.numbers[c.rhs]);
    }
    return out;
  }

  /** The typed record of a clean row; throws when the fields do not fit the table (a programming error). */
  record(fields: RowFields): RecordOf<T> {
    if (!isRecordOf(this.table, fields, this.fieldNames, this.present)) throw new TypeError(`${this.ctx.fileName}: row fields do not fit the column table`);
    return fields;
  }

  private colAt(i: number): Column {
    const l = this.located[i];
    if (l === undefined) throw new RangeError(`no column ${i}`);
    return l.col;
  }

  private cell(l: Located, line: number): unknown {
    const { row } = this.ctx;
    const { spec, col } = l;
    switch (spec.kind) {
      case 'player':
        this.playerId = this.lookups === undefined ? row.text(col) : this.lookups.player(row, col);
        return this.playerId;
      case 'season':
        this.season = this.lookups === undefined ? row.season(col) : this.lookups.season(row, col);
        return this.season;
      case 'level':
        this.level = this.lookups === undefined ? row.text(col) : this.lookups.level(row, col);
        return this.level;
      case 'team': {
        const team = row.textOpt(col);
        if (team === undefined) {
          this.team = undefined;
          return [];
        }
        let kept = this.teamLists.get(team);
        if (kept === undefined) {
          kept = { team, list: [team] };
          this.teamLists.set(team, kept);
        }
        this.team = kept.team;
        return kept.list;
      }
      case 'choice': {
        const v = row.oneOf(col, l.allowed ?? new Set<string>(), spec.expected ?? `one of ${(spec.values ?? []).join(', ')}`);
        if (l === this.part) this.partValue = v;
        return v;
      }
      case 'count':
        return spec.required ? row.count(col) : row.countOpt(col);
      case 'thirds':
        return row.thirds(col);
      case 'measure': {
        const range = spec.range ?? { min: -Infinity, max: Infinity, unit: '' };
        const v = row.numberOpt(col, range.min, range.max, `a plausible value in ${range.unit}`);
        return spec.required ? (v ?? Number.NaN) : v;
      }
      case 'percent': {
        const v = row.percent(col);
        l.watch?.see(v, line);
        return spec.required ? (v ?? Number.NaN) : v;
      }
      case 'money': {
        const v = row.numberOpt(col, 0, Infinity, spec.expected ?? 'an amount, 0 or more');
        return spec.required ? (v ?? Number.NaN) : v;
      }
      case 'text':
        return spec.required ? row.text(col) : row.textOpt(col);
      case 'date':
        return row.dateOpt(col);
    }
  }
}

/**
 * True when `fields` holds a record of the table: every required column (and
 * the teams) present with a value of its kind, every optional one absent or
 * of its kind, choices among their values. The one place where read fields
 * become a typed record: checked, not assumed.
 */
export function isRecordOf<T extends ColumnTable>(
  table: T,
  fields: RowFields,
  names: readonly string[] = table.map((s) => s.field),
  present: readonly boolean[] = table.map((s) => s.required || s.kind === 'team'),
): fields is RowFields & RecordOf<T> {
  for (let i = 0; i < table.length; i++) {
    const spec = table[i];
    const v = fields[names[i] ?? ''];
    if (spec === undefined) return false;
    if (v === undefined) {
      if (present[i] === true) return false;
      continue;
    }
    switch (spec.kind) {
      case 'team':
        if (!Array.isArray(v)) return false;
        break;
      case 'choice':
        if (typeof v !== 'string' || !(spec.values ?? []).includes(v)) return false;
        break;
      case 'player': case 'level': case 'text': case 'date':
        if (typeof v !== 'string') return false;
        break;
      default:
        if (typeof v !== 'number') return false;
    }
  }
  return true;
}
