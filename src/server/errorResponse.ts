import { InvalidArgumentError } from 'commander';
import { KindredError, QueryError, StoreError, UsageError } from '../errors/KindredError.ts';
import { HttpError, type ApiErrorCode } from './HttpError.ts';

export interface ErrorResponse {
  readonly status: number;
  readonly body: { readonly error: { readonly code: ApiErrorCode; readonly message: string } };
  readonly headers: Readonly<Record<string, string>>;
  /** True when the error is not one the server expects (logged with its stack, never sent). */
  readonly unexpected: boolean;
}

/** HTTP status of each query error: an unknown player or player-season is 404, other refusals 400. */
function queryStatus(e: QueryError): number {
  switch (e.code) {
    case 'kindred.query.unknownPlayer':
    case 'kindred.query.noSeason':
      return 404;
    case 'kindred.query.emptyPool':
      return 422;
    default:
      return 400;
  }
}

/**
 * The status and body for anything thrown while answering: usage errors (and commander's option
 * parse errors) are 400, unknown players 404, a store that cannot be read 503, HTTP refusals their own
 * status. Anything else is a 500 whose message says nothing about the inside (no stack, no path).
 */
export function errorResponse(e: unknown): ErrorResponse {
  const make = (status: number, code: ApiErrorCode, message: string, headers: Readonly<Record<string, string>> = {}, unexpected = false): ErrorResponse => ({
    status,
    body: { error: { code, message } },
    headers,
    unexpected,
  });
  if (e instanceof HttpError) return make(e.status, e.code, e.message, e.headers);
  if (e instanceof UsageError) return make(400, e.code, e.message);
  if (e instanceof InvalidArgumentError) return make(400, 'kindred.usage.badOption', e.message);
  if (e instanceof QueryError) return make(queryStatus(e), e.code, e.message);
  if (e instanceof StoreError) return make(503, e.code, e.message);
  if (e instanceof KindredError) return make(400, e.code, e.message);
  return make(500, 'kindred.http.internal', 'internal error while answering the request (see the server log)', {}, true);
}
