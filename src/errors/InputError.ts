import { KindredError, type ErrorCode } from './KindredError.ts';

/** One problem found in an input file, located to the cell. */
export interface InputIssue {
  readonly code: ErrorCode;
  /** File name as given (e.g. `batting.csv`). */
  readonly file: string;
  /** 1-based line in the file (the header is line 1). */
  readonly line: number;
  /** 1-based column; 0 when the problem concerns the whole row or file. */
  readonly column: number;
  /** The column's name in the canonical format, or '' for a whole row. */
  readonly field: string;
  /** The offending value as read (may be ''). */
  readonly value: string;
  /** What was expected instead, in words. */
  readonly expected: string;
}

/**
 * `batting.csv:12:7: H "130": expected H <= AB [...]`; the line and column
 * only when known (`players.csv: ...` for a whole file).
 */
export function formatIssue(issue: InputIssue): string {
  const where = issue.line <= 0 ? issue.file : `${issue.file}:${issue.line}:${issue.column}`;
  const what = issue.field ? `${issue.field} ${JSON.stringify(issue.value)}` : JSON.stringify(issue.value);
  return `${where}: ${what}: expected ${issue.expected} [${issue.code}]`;
}

/** Bad input data. Carries every issue found, not only the first. */
export class InputError extends KindredError {
  readonly issues: readonly InputIssue[];

  constructor(issues: readonly InputIssue[], summary?: string) {
    const first = issues[0];
    const head = summary ?? (first ? formatIssue(first) : 'bad input');
    const more = issues.length > 1 ? ` (and ${issues.length - 1} more problem${issues.length > 2 ? 's' : ''})` : '';
    super(first?.code ?? 'kindred.input.badValue', head + more, { issues: issues.length });
    this.issues = issues;
  }
}
