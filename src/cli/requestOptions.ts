import { InvalidArgumentError, Option, type Command } from 'commander';
import type { ParameterNamer } from '../errors/ParameterError.ts';
import { BadValue } from '../request/BadValue.ts';
import type { JobName } from '../request/jobs.ts';
import type { JobRequest } from '../request/JobRequest.ts';
import { defaultOf, helpOf, PARAMETERS, parametersOf, spell, type ParameterKey } from '../request/parameters.ts';
import { readRequest } from '../request/readRequest.ts';

/** How the command line spells a parameter: `--pool-level`; the positional ones by their name. */
export const CLI_NAMES: ParameterNamer = (p) => (p === 'player' || p === 'candidate' ? p : `--${p}`);

/** A request parser as commander wants it: BadValue becomes InvalidArgumentError (commander names the option, exit 2). */
export function cliParser<T>(parse: (text: string) => T): (text: string) => T {
  return (text) => {
    try {
      return parse(text);
    } catch (e) {
      if (e instanceof BadValue) throw new InvalidArgumentError(e.message);
      throw e;
    }
  };
}

/** Keeps the option's text as typed after checking that it parses (so commander reports a bad value at once). */
function checkedText<K extends ParameterKey>(key: K): (text: string) => string {
  const parse = cliParser<unknown>(PARAMETERS[key].parse);
  return (text) => {
    parse(text);
    return text;
  };
}

/** Commander's own rendering of a default, so help reads as it does for any commander option. */
function shownDefault(value: unknown): string {
  if (value instanceof Map || value === undefined) return '';
  return ` (default: ${JSON.stringify(value)})`;
}

/** The commander options of a job, made from the request table: every parameter the job takes on the command line. */
export function addRequestOptions(cmd: Command, job: JobName): Command {
  for (const key of parametersOf(job, 'cli')) {
    const p = PARAMETERS[key];
    if (p.positional) continue;
    const flags = p.value === undefined ? `--${p.name}` : `--${p.name} <${p.value}>`;
    const option = new Option(flags, spell(helpOf(key, job), CLI_NAMES) + shownDefault(defaultOf(key, job)));
    if (p.value !== undefined) option.argParser(checkedText(key));
    cmd.addOption(option);
  }
  return cmd;
}

/**
 * The job request of a command's invocation: the options given (as typed) and the positional
 * arguments, read by the request layer exactly as a query string is.
 */
export function requestFrom(cmd: Command, job: JobName, positional: Partial<Record<'player' | 'candidate', string | undefined>> = {}): JobRequest {
  const pairs: [string, string][] = [];
  for (const key of parametersOf(job, 'cli')) {
    const p = PARAMETERS[key];
    const given = p.positional ? positionalOf(positional, key) : cmd.getOptionValue(attributeOf(p.name));
    if (given === undefined) continue;
    pairs.push([p.name, typeof given === 'string' ? given : '']);
  }
  return readRequest(job, 'cli', pairs);
}

function positionalOf(positional: Partial<Record<'player' | 'candidate', string | undefined>>, key: ParameterKey): string | undefined {
  return key === 'player' || key === 'candidate' ? positional[key] : undefined;
}

/** The key commander keeps an option's value under: `pool-level` is `poolLevel`. */
function attributeOf(name: string): string {
  return name.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}
