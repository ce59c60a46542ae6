import type { IndexParams } from '../ann/IndexParams.ts';

/** One HNSW index to build and save: the message a build worker thread receives. */
export interface IndexJob {
  readonly id: number;
  /** Row-major vectors, `dim` wide; label i is row i, inserted in label order. */
  readonly vectors: Float32Array;
  readonly dim: number;
  readonly params: IndexParams;
  /** Where the index file is saved (temp file, verified, renamed). */
  readonly path: string;
}

/** A worker's answer: the job's id, and the error's code and message when it failed. */
export interface IndexJobDone {
  readonly id: number;
  readonly error: { readonly code: string; readonly message: string } | null;
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null;
const isInteger = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v);

/** Checks a message received by a worker (messages cross a thread boundary untyped). */
export function isIndexJob(v: unknown): v is IndexJob {
  if (!isRecord(v) || !isInteger(v.id) || !(v.vectors instanceof Float32Array) || !isInteger(v.dim) || typeof v.path !== 'string') return false;
  const p = v.params;
  return isRecord(p) && isInteger(p.M) && isInteger(p.efConstruction) && isInteger(p.ef) && isInteger(p.seed);
}

/** Checks a message received back from a worker. */
export function isIndexJobDone(v: unknown): v is IndexJobDone {
  if (!isRecord(v) || !isInteger(v.id)) return false;
  const e = v.error;
  return e === null || (isRecord(e) && typeof e.code === 'string' && typeof e.message === 'string');
}
