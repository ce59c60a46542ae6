import { InputError, formatIssue, type InputIssue } from '../errors/InputError.ts';
import type { RejectedRow } from './Roster.ts';

/** How many issues a strict read keeps before it only counts them. */
export const ISSUE_CAP = 200;

/** Cells of a rejected row kept for the rejects file (the rest only counted): bounds memory on ragged rows. */
export const REJECTED_CELLS_KEPT = 64;
/** Characters kept of each cell of a rejected row. */
export const REJECTED_CELL_CHARS = 256;

/**
 * Collects what is wrong with a roster. File-level problems (a missing file or
 * column, a wrong delimiter, a percent column in fractions) always fail the
 * read. Row problems fail it in strict mode; in lenient mode the row is left
 * out and listed in `rejected` with all its reasons.
 */
export class IssueLog {
  readonly lenient: boolean;
  readonly rejected: RejectedRow[] = [];
  /** What was read but deserves a line (a column under its former name), in words. */
  readonly notices: string[] = [];
  private readonly kept: InputIssue[] = [];
  private total = 0;

  constructor(lenient: boolean) {
    this.lenient = lenient;
  }

  /** Something read as asked that the user should hear about (never fails the read). */
  notice(line: string): void {
    this.notices.push(line);
  }

  /** A problem that concerns a whole file or column: fails the read in both modes. */
  fileProblem(issue: InputIssue): void {
    this.count(issue);
  }

  /** Every problem found in one data row. */
  rowProblems(file: string, line: number, raw: readonly string[], issues: readonly InputIssue[]): void {
    if (this.lenient) {
      this.rejected.push({ file, line, raw: keptPrefix(raw), rawCells: raw.length, issues: [...issues] });
      return;
    }
    for (const issue of issues) this.count(issue);
  }

  get failed(): boolean {
    return this.total > 0;
  }

  /** Throws one InputError carrying the issues kept (the first {@link ISSUE_CAP}) when anything failed. */
  throwIfFailed(): void {
    const first = this.kept[0];
    if (first === undefined) return;
    if (this.total <= this.kept.length) throw new InputError(this.kept);
    const summary =
      `${this.total} problems in the roster, the first ${this.kept.length} listed ` +
      `(${this.total - this.kept.length} more not listed); first: ${formatIssue(first)}`;
    throw new InputError(this.kept, summary);
  }

  private count(issue: InputIssue): void {
    this.total += 1;
    if (this.kept.length < ISSUE_CAP) this.kept.push(issue);
  }
}

/**
 * The first cells of a rejected row, each cut to its first characters, as
 * fresh strings (a slice could keep a huge parent cell alive).
 */
function keptPrefix(raw: readonly string[]): string[] {
  const kept = raw.length > REJECTED_CELLS_KEPT ? raw.slice(0, REJECTED_CELLS_KEPT) : [...raw];
  for (let i = 0; i < kept.length; i++) {
    const cell = kept[i] ?? '';
    if (cell.length > REJECTED_CELL_CHARS) kept[i] = Buffer.from(cell.slice(0, REJECTED_CELL_CHARS), 'utf8').toString('utf8');
  }
  return kept;
}
