import { codeDistance2 } from './codeDistance2.ts';
import { missingAwareDistance } from './missingAwareDistance.ts';
import type { PreparedQuery } from './prepareQuery.ts';
import type { QuerySpace } from './QuerySpace.ts';

/** A pool row scored against the target. */
export interface ScoredRow {
  readonly row: number;
  /** Squared distance: missing-aware in the input space, between codes in a learned space. */
  readonly d2: number;
  /** Share of the target's weight the row also has (always from the input space). */
  readonly coverage: number;
}

/**
 * One row's distance to the target: missingAwareDistance over the weighted dimensions both have, or
 * in a learned space the Euclidean distance between codes (coverage still from the input space).
 */
export function scoreRow(q: PreparedQuery, row: number, space: QuerySpace): ScoredRow {
  const g = q.group;
  const p = missingAwareDistance(q.target.z, g.z, row * g.d, q.weights, q.targetWeight, q.missing);
  if (space) return { row, d2: codeDistance2(space.targetCode, space.embedding.codes, row * space.embedding.dim), coverage: p.coverage };
  return { row, d2: p.d2, coverage: p.coverage };
}

/**
 * scoreRow for many rows of one query: the same rows, distances and coverages, with the group's
 * matrix and the query's fields read once for all of them.
 */
export function scoreRows(q: PreparedQuery, rows: readonly number[], space: QuerySpace): ScoredRow[] {
  const g = q.group;
  const z = g.z;
  const d = g.d;
  const target = q.target.z;
  const weights = q.weights;
  const wT = q.targetWeight;
  const out = new Array<ScoredRow>(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i] ?? -1;
    const p = missingAwareDistance(target, z, row * d, weights, wT, q.missing);
    out[i] = space
      ? { row, d2: codeDistance2(space.targetCode, space.embedding.codes, row * space.embedding.dim), coverage: p.coverage }
      : { row, d2: p.d2, coverage: p.coverage };
  }
  return out;
}
