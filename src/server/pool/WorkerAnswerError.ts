import type { ErrorResponse } from '../errorResponse.ts';
import type { WorkerFailure } from './poolMessages.ts';

/**
 * An error thrown while an answer worker computed an answer or opened a store, carried to the server's
 * thread as the worker's errorResponse (the same status and body the server's thread would have
 * given) with the worker's stack in `stack`, for the log.
 */
export class WorkerAnswerError extends Error {
  readonly response: ErrorResponse;

  constructor(failure: WorkerFailure) {
    super(failure.response.logLine ?? failure.response.body.error.message);
    this.name = 'WorkerAnswerError';
    this.response = failure.response;
    this.stack = failure.detail;
  }
}
