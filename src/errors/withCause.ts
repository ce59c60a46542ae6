/** Attaches the underlying error as `cause` (ES2022 Error.cause) and returns the error, for `throw withCause(...)`. */
export function withCause<E extends Error>(error: E, cause: unknown): E {
  Object.defineProperty(error, 'cause', { value: cause, enumerable: false, writable: true, configurable: true });
  return error;
}
