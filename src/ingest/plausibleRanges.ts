/**
 * Plausible ranges of the measured columns, in the units of the input files.
 *
 * These are project choices, not published limits: bounds of physical
 * plausibility for a professional player, from common practice (a pop time
 * under 1.5 s or a fastball over 110 mph is a data error, not a talent).
 * A value outside its range is refused with `kindred.input.outOfRange`.
 * Percent columns are checked separately (0 to 100).
 */
export const PLAUSIBLE_RANGES = {
  /** Catcher's pop time to second base, seconds. */
  pop_2b_s: { min: 1.5, max: 3.0, unit: 's' },
  /** Catcher's exchange (glove to release), seconds. */
  exchange_s: { min: 0.4, max: 1.5, unit: 's' },
  /** Average exit velocity, mph. */
  ev_avg_mph: { min: 40, max: 120, unit: 'mph' },
  /** 90th percentile exit velocity, mph (also checked to be >= ev_avg_mph). */
  ev_p90_mph: { min: 40, max: 125, unit: 'mph' },
  /** Average launch angle, degrees. */
  la_avg_deg: { min: -90, max: 90, unit: 'deg' },
  /** Sprint speed, feet per second. */
  sprint_ft_s: { min: 15, max: 35, unit: 'ft/s' },
  /** Fielder's throwing velocity, mph. */
  arm_mph: { min: 40, max: 110, unit: 'mph' },
  /** Average fastball velocity, mph. */
  fb_mph: { min: 60, max: 110, unit: 'mph' },
  /** Average fastball spin rate, rpm. */
  fb_spin_rpm: { min: 500, max: 4000, unit: 'rpm' },
} as const satisfies Readonly<Record<string, PlausibleRange>>;

export interface PlausibleRange {
  readonly min: number;
  readonly max: number;
  readonly unit: string;
}

export type MeasuredColumn = keyof typeof PLAUSIBLE_RANGES;
