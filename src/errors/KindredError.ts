/**
 * The one error hierarchy of Kindred. Every error carries a stable `code`
 * (never reworded once published) and the exit code the CLI maps it to:
 * 1 for bad input or a failed query, 2 for bad usage.
 */
export type ErrorCode =
  // input data
  | 'kindred.input.badHeader'
  | 'kindred.input.missingColumn'
  | 'kindred.input.duplicateColumn'
  | 'kindred.input.raggedRow'
  | 'kindred.input.wrongDelimiter'
  | 'kindred.input.bom'
  | 'kindred.input.csvSyntax'
  | 'kindred.input.notNumeric'
  | 'kindred.input.notInteger'
  | 'kindred.input.negative'
  | 'kindred.input.outOfRange'
  | 'kindred.input.badThirds'
  | 'kindred.input.percentLooksLikeFraction'
  | 'kindred.input.inconsistent'
  | 'kindred.input.duplicateKey'
  | 'kindred.input.unknownPlayer'
  | 'kindred.input.badValue'
  | 'kindred.input.badDate'
  | 'kindred.input.missingFile'
  | 'kindred.input.badColumnMap'
  | 'kindred.input.rejected'
  | 'kindred.input.badEncoding'
  | 'kindred.input.controlCharacter'
  | 'kindred.input.nothingLeft'
  // store
  | 'kindred.store.missing'
  | 'kindred.store.corrupt'
  | 'kindred.store.version'
  | 'kindred.store.writeFailed'
  | 'kindred.store.locked'
  // index
  | 'kindred.index.badVector'
  | 'kindred.index.badLabel'
  | 'kindred.index.native'
  // query
  | 'kindred.query.unknownPlayer'
  | 'kindred.query.ambiguousPlayer'
  | 'kindred.query.noSeason'
  | 'kindred.query.unknownDimension'
  | 'kindred.query.emptyPool'
  | 'kindred.query.badTarget'
  | 'kindred.query.noWindow'
  // serving
  | 'kindred.serve.portInUse'
  | 'kindred.serve.listenFailed'
  // usage
  | 'kindred.usage.badOption'
  | 'kindred.usage.missingArgument';

export interface ErrorContext {
  readonly [key: string]: string | number | boolean | readonly string[] | undefined;
}

export class KindredError extends Error {
  readonly code: ErrorCode;
  readonly exitCode: 1 | 2;
  readonly context: ErrorContext;

  constructor(code: ErrorCode, message: string, context: ErrorContext = {}, exitCode: 1 | 2 = 1) {
    super(message);
    this.name = new.target.name;
    this.code = code;
    this.exitCode = exitCode;
    this.context = context;
  }
}

/** Bad usage of the command line or the library API: exit code 2. */
export class UsageError extends KindredError {
  constructor(message: string, context: ErrorContext = {}, code: ErrorCode = 'kindred.usage.badOption') {
    super(code, message, context, 2);
  }
}

/** A store that is missing, corrupt or of another format version. */
export class StoreError extends KindredError {}

/** A query that cannot be answered (unknown or ambiguous player, empty pool). */
export class QueryError extends KindredError {}

/** A refused call into the native index (bad vector, bad label, native failure). */
export class IndexError extends KindredError {}
