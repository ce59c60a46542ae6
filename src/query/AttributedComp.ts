import type { Comp } from './CompsResult.ts';

/**
 * A comp answered in a learned space (the fields are added to the JSON contract of Comp):
 * `attribution_total` (the distance the dimensions' `attribution` values add up to),
 * `attribution_method` ('exact' Shapley values, or 'sampled' by permutations) and
 * `attribution_error`, the largest standard error among the comp's sampled values (0 when exact;
 * each value lies within 3 standard errors of its exact Shapley value with probability about 0.997).
 */
export interface AttributedComp extends Comp {
  readonly attribution_total: number;
  readonly attribution_method: 'exact' | 'sampled';
  readonly attribution_error: number;
}
