/**
 * The profile window (in seasons) comps, prospect, cheaper and match use when none is asked for, chosen
 * by the quality bench (bench/qualityCases.bench.ts, figures in docs/jobs.md).
 */
export const DEFAULT_WINDOW = 1;
