import { ParameterError } from '../errors/ParameterError.ts';
import { didYouMean } from '../query/didYouMean.ts';
import { BadValue } from './BadValue.ts';
import { JobRequest } from './JobRequest.ts';
import { PARAMETERS, parametersOf, type ParameterKey, type RequestValues } from './parameters.ts';
import type { JobName } from './jobs.ts';

/** Longest value a parameter may have (a want profile of every dimension fits easily). */
export const MAX_PARAMETER_LENGTH = 2000;

/**
 * Reads the parameters of one request for a job from (name, text) pairs, as a query string or the
 * command line gave them: every name must be one the job takes on that front end, given once, no
 * longer than MAX_PARAMETER_LENGTH and non-empty (a switch may be empty); each value goes through
 * its parser. Any problem is a ParameterError naming the parameter, the value and what was expected.
 */
export function readRequest(job: JobName, front: 'cli' | 'http', pairs: Iterable<readonly [string, string]>): JobRequest {
  const keys = parametersOf(job, front);
  const byName = new Map<string, ParameterKey>(keys.map((k) => [PARAMETERS[k].name, k]));
  const given: Partial<RequestValues> = {};
  const seen = new Set<string>();
  for (const [name, text] of pairs) {
    const key = byName.get(name);
    if (key === undefined) {
      const known = [...byName.keys()];
      const guess = didYouMean(name, known);
      throw new ParameterError(name, `unknown parameter "${name}"${guess ? ` (did you mean ${guess}?)` : ''}; known: ${known.join(', ')}`, {
        prefixed: false,
        context: guess ? { candidates: [guess] } : {},
      });
    }
    if (seen.has(name)) throw new ParameterError(name, 'given more than once');
    seen.add(name);
    if (text.length > MAX_PARAMETER_LENGTH) throw new ParameterError(name, `${text.length} characters long (at most ${MAX_PARAMETER_LENGTH})`);
    const isSwitch = PARAMETERS[key].value === undefined && PARAMETERS[key].positional === undefined;
    if (!isSwitch && text.trim() === '') throw new ParameterError(name, 'needs a value');
    readOne(given, key, text);
  }
  return new JobRequest(job, given);
}

function readOne<K extends ParameterKey>(given: Partial<RequestValues>, key: K, text: string): void {
  try {
    given[key] = PARAMETERS[key].parse(text);
  } catch (e) {
    if (e instanceof BadValue) throw new ParameterError(PARAMETERS[key].name, e.message, { context: { value: text } });
    throw e;
  }
}

/** Refuses any parameter at all (an endpoint that takes none). */
export function noParameters(pairs: Iterable<readonly [string, string]>): void {
  for (const [name] of pairs) throw new ParameterError(name, `unknown parameter "${name}"; this takes no parameters`, { prefixed: false });
}
