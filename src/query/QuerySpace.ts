import type { StoredEmbedding } from '../store/StoredEmbedding.ts';
import type { PreparedQuery } from './prepareQuery.ts';

/** The learned space a query ranks in, with the target's code; null when it ranks in the input space. */
export type QuerySpace = { readonly embedding: StoredEmbedding; readonly targetCode: Float64Array } | null;

/**
 * The space a query is answered in: the group's learned space when the store has one, `space` is not
 * `input` and the weighting is the default one (a learned space cannot take per-dimension weights);
 * otherwise the input space (null).
 */
export function querySpace(q: PreparedQuery, space: 'store' | 'input' | undefined): QuerySpace {
  const embedding = q.group.embedding;
  if (!embedding || space === 'input' || !q.defaultMetric) return null;
  return { embedding, targetCode: embedding.encode(q.target.z) };
}
