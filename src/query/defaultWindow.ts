/**
 * The profile window (in seasons) comps and match use when none is asked for and the store holds it:
 * 3, chosen by the quality bench (bench/qualityCases.bench.ts; figures in docs/jobs.md): over the four
 * standard leagues, windows of 3 seasons came closer to the true-talent ideal than single seasons for
 * top-level hitters, starters and relievers in every league, and found more planted twins in every league.
 * `kindred build` makes windows of this size by default (DEFAULT_BUILD_WINDOWS); `--window 1` keeps
 * single-season comps. Prospect (whose outlook the backtest calibrates on single seasons) and cheaper
 * (priced by one season's salary) keep single seasons unless asked.
 */
export const DEFAULT_WINDOW = 3;
