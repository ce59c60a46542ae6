import type { ErrorCode } from '../errors/KindredError.ts';

/** Codes of refusals made by the HTTP layer itself (the query layer's codes are in ErrorCode). */
export type HttpErrorCode =
  | 'kindred.http.badHost'
  | 'kindred.http.misdirected'
  | 'kindred.http.foreignOrigin'
  | 'kindred.http.notFound'
  | 'kindred.http.badPath'
  | 'kindred.http.methodNotAllowed'
  | 'kindred.http.bodyTooLarge'
  | 'kindred.http.aborted'
  | 'kindred.http.pageNotBuilt'
  | 'kindred.http.workerFailed'
  | 'kindred.http.internal';

/** Every code an API error body may carry. */
export type ApiErrorCode = ErrorCode | HttpErrorCode;

/** A refusal with its HTTP status, answered as `{error: {code, message}}`. */
export class HttpError extends Error {
  readonly status: number;
  readonly code: HttpErrorCode;
  readonly headers: Readonly<Record<string, string>>;

  constructor(status: number, code: HttpErrorCode, message: string, headers: Readonly<Record<string, string>> = {}) {
    super(message);
    this.name = 'HttpError';
    this.status = status;
    this.code = code;
    this.headers = headers;
  }
}
