/**
 * Shared look of the embedding charts: one neutral dark blue and a mid grey from the Okabe-Ito
 * colour-blind-safe palette (Okabe and Ito 2008, "Color Universal Design"), told apart by line style
 * as well as hue, so they survive grey-scale printing.
 */
export const CHART_STYLE = {
  /** Okabe-Ito blue. */
  primary: '#0072B2',
  /** Neutral grey. */
  secondary: '#666666',
  /** Reference lines (zero, chosen epoch). */
  reference: '#333333',
  font: 'sans-serif',
  width: 480,
} as const;
