import type { Command } from 'commander';
import { UsageError } from '../errors/KindredError.ts';
import { didYouMean } from '../query/didYouMean.ts';

/** One HTTP query parameter taken from a command-line option of the same name without its dashes. */
export interface ParameterSpec {
  /** `pool-level` for `--pool-level`. */
  readonly name: string;
  /** The key commander stores the value under (`poolLevel`). */
  readonly attribute: string;
  /** A flag such as `--exact`: takes true/false/1/0 or no value. */
  readonly flag: boolean;
  /** The option's own parser from the CLI (undefined: the text is taken as it is). */
  readonly parse: ((value: string) => unknown) | undefined;
  readonly defaultValue: unknown;
}

/** The parameters an endpoint takes: a command's long options (minus those that make no sense over HTTP) and extras. */
export interface ParameterSet {
  readonly specs: ReadonlyMap<string, ParameterSpec>;
  /** Parameters that are not options, e.g. the positional `player` (plain text, one value). */
  readonly extra: readonly string[];
}

/**
 * The parameters of a CLI command, read from its commander definition, so that the HTTP API and the
 * CLI share one list of names, one set of defaults and the same parse functions.
 */
export function commandParameters(cmd: Command, exclude: readonly string[], extra: readonly string[] = []): ParameterSet {
  const specs = new Map<string, ParameterSpec>();
  for (const opt of cmd.options) {
    const long = opt.long;
    if (long === undefined || !long.startsWith('--')) continue;
    const name = long.slice(2);
    if (exclude.includes(name) || opt.negate) continue;
    const parseArg = opt.parseArg;
    specs.set(name, {
      name,
      attribute: opt.attributeName(),
      flag: opt.isBoolean(),
      parse: parseArg === undefined ? undefined : (value: string): unknown => parseArg<unknown>(value, undefined),
      defaultValue: opt.defaultValue,
    });
  }
  return { specs, extra };
}

/** Longest value a parameter may have (a want profile of every dimension fits easily). */
export const MAX_PARAMETER_LENGTH = 2000;

export interface ParsedParameters {
  /** What commander would hand the command's action: defaults, then the given options parsed. */
  readonly options: Record<string, unknown>;
  readonly extra: ReadonlyMap<string, string>;
}

const FLAG_VALUES: ReadonlyMap<string, boolean> = new Map([
  ['', true],
  ['true', true],
  ['1', true],
  ['false', false],
  ['0', false],
]);

/**
 * Checks and parses a query string against a parameter set: every name must be known, given once
 * and non-empty (flags may be empty); values go through the CLI's parse functions. Any problem is a
 * UsageError naming the parameter, the value and what was expected.
 */
export function parseParameters(query: URLSearchParams, set: ParameterSet): ParsedParameters {
  const options: Record<string, unknown> = {};
  for (const spec of set.specs.values()) if (spec.defaultValue !== undefined) options[spec.attribute] = spec.defaultValue;
  const extra = new Map<string, string>();
  const seen = new Set<string>();
  const known = [...set.extra, ...set.specs.keys()];
  for (const [name, value] of query) {
    if (seen.has(name)) throw new UsageError(`parameter ${name} is given more than once`, { parameter: name });
    seen.add(name);
    if (value.length > MAX_PARAMETER_LENGTH) {
      throw new UsageError(`parameter ${name} is ${value.length} characters long (at most ${MAX_PARAMETER_LENGTH})`, { parameter: name });
    }
    const spec = set.specs.get(name);
    if (spec === undefined && !set.extra.includes(name)) {
      const guess = didYouMean(name, known);
      throw new UsageError(`unknown parameter "${name}"${guess ? ` (did you mean ${guess}?)` : ''}; known: ${known.join(', ')}`, { parameter: name });
    }
    if (spec?.flag) {
      const flag = FLAG_VALUES.get(value.trim().toLowerCase());
      if (flag === undefined) throw new UsageError(`parameter ${name}: expected true or false, got "${value}"`, { parameter: name, value });
      options[spec.attribute] = flag;
      continue;
    }
    if (value.trim() === '') throw new UsageError(`parameter ${name} needs a value`, { parameter: name });
    if (spec === undefined) {
      extra.set(name, value);
      continue;
    }
    try {
      options[spec.attribute] = spec.parse ? spec.parse(value) : value;
    } catch (e) {
      const why = e instanceof Error ? e.message : String(e);
      throw new UsageError(`parameter ${name}: ${why}`, { parameter: name, value });
    }
  }
  return { options, extra };
}
