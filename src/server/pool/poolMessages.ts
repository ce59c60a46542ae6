import type { ErrorCode, ErrorContext } from '../../errors/KindredError.ts';
import type { ErrorResponse } from '../errorResponse.ts';

/** A store build as the pool names it: the server's generation, its folder, its manifest (as JSON text) and when the server loaded it. */
export interface PoolStore {
  readonly generation: number;
  readonly dir: string;
  readonly manifest: string;
  /** ISO time: `/api/info` tells it (a worker's copy says when the server loaded the store, not when the worker did). */
  readonly loadedAt: string;
}

/** What the server's thread asks a worker. */
export type ToWorker =
  /** Open this build (the previous one's unchanged groups taken over); answered `opened` or `openFailed`. */
  | { readonly type: 'open'; readonly store: PoolStore }
  /** Forget a build: no answer will be asked of it again. */
  | { readonly type: 'retire'; readonly generation: number }
  /** Answer `path?query` from build `generation`; answered `answered` or `failed` with the same id. */
  | { readonly type: 'answer'; readonly id: number; readonly generation: number; readonly path: string; readonly query: string };

/** What a worker tells the server's thread. */
export type FromWorker =
  | { readonly type: 'opened'; readonly generation: number }
  | { readonly type: 'openFailed'; readonly generation: number; readonly failure: OpenFailure }
  | { readonly type: 'answered'; readonly id: number; readonly text: string }
  | { readonly type: 'failed'; readonly id: number; readonly failure: WorkerFailure };

/** An error thrown in a worker, as the server answers it (errorResponse there), with the worker's log text. */
export interface WorkerFailure {
  readonly response: ErrorResponse;
  /** The error's message and stack, for the server log. */
  readonly detail: string;
}

/** Why a worker could not open a store: the Kindred error's code, message and context (null code: another error). */
export interface OpenFailure {
  readonly code: ErrorCode | null;
  readonly message: string;
  readonly context: ErrorContext;
}
