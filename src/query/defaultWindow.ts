/**
 * The profile window (in seasons) comps and match use when none is asked for and the store holds it:
 * 5, chosen by the quality bench (bench/qualityCases.bench.ts; figures in docs/jobs.md): over the four
 * standard leagues, windows of 5 seasons came closer to the true-talent ideal than windows of 3 for
 * top-level starters and relievers in every league and for hitters on the mean and in three leagues of
 * four (the fourth 0.003 behind), and found more planted twins in every league; windows of 4, 6, 8 and
 * 12 were no better on the whole (README "Bench figures").
 * `kindred build` makes windows of this size by default (DEFAULT_BUILD_WINDOWS); `--window 1` keeps
 * single-season comps. Prospect (whose outlook the backtest calibrates on single seasons) and cheaper
 * (priced by one season's salary) keep single seasons unless asked.
 */
export const DEFAULT_WINDOW = 5;
