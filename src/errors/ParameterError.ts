import { UsageError, type ErrorCode, type ErrorContext } from './KindredError.ts';

/**
 * How a front end spells a request parameter: `--pool-level` on the command line, `pool-level` in
 * an HTTP query string or on the page.
 */
export type ParameterNamer = (parameter: string) => string;

/** The parameter's own name, as the HTTP API and the page use it. */
export const PLAIN_NAMES: ParameterNamer = (parameter) => parameter;

/** The words of a refusal, given how the front end names parameters (so a sentence can refer to others). */
export type ParameterWords = string | ((name: ParameterNamer) => string);

export interface ParameterErrorOptions {
  readonly context?: ErrorContext;
  readonly code?: ErrorCode;
  /** False when the words are a whole sentence, not something said about the parameter (no "name: " before them). */
  readonly prefixed?: boolean;
}

/**
 * A usage error about one request parameter (exit code 2, HTTP 400), worded in no front end's
 * spelling: the parameter is named through a ParameterNamer when the error is shown. `message` uses
 * the plain names; the CLI shows `render(name => '--' + name)`.
 *
 * @example
 * new ParameterError('k', 'expected a whole number of 1 or more, got "0"').render((p) => `--${p}`);
 * // => '--k: expected a whole number of 1 or more, got "0"'
 */
export class ParameterError extends UsageError {
  readonly parameter: string;
  readonly prefixed: boolean;
  readonly #words: (name: ParameterNamer) => string;

  constructor(parameter: string, words: ParameterWords, options: ParameterErrorOptions = {}) {
    const say = typeof words === 'string' ? (): string => words : words;
    const prefixed = options.prefixed ?? true;
    super(prefixed ? `${parameter}: ${say(PLAIN_NAMES)}` : say(PLAIN_NAMES), { parameter, ...options.context }, options.code);
    this.parameter = parameter;
    this.prefixed = prefixed;
    this.#words = say;
  }

  /** What is wrong, without the parameter's name in front. */
  detail(name: ParameterNamer = PLAIN_NAMES): string {
    return this.#words(name);
  }

  /** The whole message with parameters spelled as the front end spells them. */
  render(name: ParameterNamer): string {
    return this.prefixed ? `${name(this.parameter)}: ${this.#words(name)}` : this.#words(name);
  }
}
