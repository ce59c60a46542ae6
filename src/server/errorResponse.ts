import { KindredError, QueryError, StoreError, UsageError } from '../errors/KindredError.ts';
import { ParameterError, type ParameterNamer } from '../errors/ParameterError.ts';
import { HttpError, type ApiErrorCode } from './HttpError.ts';
import { WorkerAnswerError } from './pool/WorkerAnswerError.ts';

export interface ErrorResponse {
  readonly status: number;
  readonly body: { readonly error: { readonly code: ApiErrorCode; readonly message: string; readonly parameter?: string } };
  readonly headers: Readonly<Record<string, string>>;
  /** True when the error is not one the server expects (logged with its stack, never sent). */
  readonly unexpected: boolean;
  /** What the server log should say about it (a store that cannot be read: the full reason, paths included). */
  readonly logLine?: string;
}

/** How the API names a parameter: by its plain name, as in the query string. */
export const HTTP_NAMES: ParameterNamer = (p) => p;

/** A parameter error in the API's words: `parameter k: expected ...`, other parameters by their plain names. */
export function apiMessage(e: ParameterError): string {
  return e.prefixed ? `parameter ${e.parameter}: ${e.detail(HTTP_NAMES)}` : e.detail(HTTP_NAMES);
}

/** What a client is told when the store cannot be read (the reason, with its paths, goes only to the log). */
function storeMessage(e: StoreError): string {
  switch (e.code) {
    case 'kindred.store.missing':
      return 'the store is missing or incomplete: build it, then reload';
    case 'kindred.store.version':
      return 'the store was written by another version of Kindred: rebuild it, then reload';
    case 'kindred.store.writeFailed':
      return 'the store could not be written';
    default:
      return 'the store failed its checks (a file is damaged, or changed while it was read): rebuild it or try the reload again';
  }
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
 * The status and body for anything thrown while answering: usage errors are 400 (a parameter's named
 * plainly), unknown players 404, a store that cannot be read 503 (in general words: no paths), HTTP
 * refusals their own status; an error thrown in an answer worker what the worker made of it (the same). Anything else is a 500 whose message says nothing about the inside (no stack, no path).
 */
export function errorResponse(e: unknown): ErrorResponse {
  const make = (status: number, code: ApiErrorCode, message: string, headers: Readonly<Record<string, string>> = {}, unexpected = false): ErrorResponse => ({
    status,
    body: { error: { code, message } },
    headers,
    unexpected,
  });
  if (e instanceof WorkerAnswerError) return e.response;
  if (e instanceof HttpError && e.code === 'kindred.http.aborted') return { ...make(e.status, e.code, e.message, e.headers), logLine: e.message };
  if (e instanceof HttpError) return make(e.status, e.code, e.message, e.headers);
  if (e instanceof ParameterError) return { ...make(400, e.code, apiMessage(e)), body: { error: { code: e.code, message: apiMessage(e), parameter: e.parameter } } };
  if (e instanceof UsageError) return make(400, e.code, e.message);
  if (e instanceof QueryError) return make(queryStatus(e), e.code, e.message);
  if (e instanceof StoreError) return { ...make(503, e.code, storeMessage(e)), logLine: e.message };
  if (e instanceof KindredError) return make(400, e.code, e.message);
  return make(500, 'kindred.http.internal', 'internal error while answering the request (see the server log)', {}, true);
}
