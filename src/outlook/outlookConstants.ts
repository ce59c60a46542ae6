/**
 * The constants of the outlook, in one table with their sources.
 */
export const OUTLOOK_CONSTANTS = {
  /**
   * Plate appearances for a top-level season to count towards a hitter's peak OPS+. Common practice
   * (from memory): a regular's season is about 600 PA, and 300 is the usual half-season cut for a
   * "real" season in career summaries.
   */
  minPaForPeak: 300,
  /** Innings pitched (as outs: 50 IP) for a top-level season to count towards a pitcher's best FIP-. Common practice (from memory). */
  minOutsForPeak: 150,
  /** Seasons after the comp's season that the outlook follows by default. Project choice. */
  defaultHorizon: 6,
  /** Comps may be this many years younger or older than the target (age on June 30). Project choice. */
  ageWindow: 1,
  /** Quantiles reported for the outlook distributions. Project choice: a central 80% range and the median. */
  quantiles: [0.1, 0.5, 0.9] as const,
} as const;
