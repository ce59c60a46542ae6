import { defaultOf, type ParameterKey, type RequestValues } from './parameters.ts';
import type { JobName } from './jobs.ts';

/** The parsed parameters of one request for one job; a value not given reads as the job's default. */
export class JobRequest {
  readonly job: JobName;
  readonly #given: Partial<RequestValues>;

  constructor(job: JobName, given: Partial<RequestValues>) {
    this.job = job;
    this.#given = given;
  }

  /** True when the request gave the parameter (a default does not count). */
  has(key: ParameterKey): boolean {
    return this.#given[key] !== undefined;
  }

  /** The value given, else the job's default, else undefined. */
  get<K extends ParameterKey>(key: K): RequestValues[K] | undefined {
    return this.#given[key] ?? defaultOf(key, this.job);
  }

  /** The value of a parameter that has a default for this job. */
  need<K extends ParameterKey>(key: K): RequestValues[K] {
    const value = this.get(key);
    if (value === undefined) throw new RangeError(`internal: parameter ${key} has no default for ${this.job}`);
    return value;
  }

  /** The same request with some values replaced (a batch line's player, season and level); undefined keeps the value. */
  with(changes: { readonly [K in ParameterKey]?: RequestValues[K] | undefined }): JobRequest {
    const next: Partial<RequestValues> = { ...this.#given };
    for (const key of Object.keys(changes)) copy(next, changes, key);
    return new JobRequest(this.job, next);
  }
}

type Changes = { readonly [K in ParameterKey]?: RequestValues[K] | undefined };

function copy(into: Partial<RequestValues>, from: Changes, key: string): void {
  if (isKey(key, from)) assign(into, key, from[key]);
}

function isKey(key: string, from: Changes): key is ParameterKey {
  return Object.hasOwn(from, key);
}

function assign<K extends ParameterKey>(into: Partial<RequestValues>, key: K, value: RequestValues[K] | undefined): void {
  if (value !== undefined) into[key] = value;
}
