/**
 * Colours of the page and its charts, from the Okabe-Ito palette (Okabe & Ito, "Color Universal
 * Design", 2002/2008), chosen to stay distinct under the common colour-vision deficiencies.
 * Blue and orange carry the two sides of every comparison; green and vermillion mark alike and apart.
 */
export const PALETTE = {
  /** Okabe-Ito blue: the target. */
  target: '#0072B2',
  /** Okabe-Ito orange: the comp. */
  comp: '#E69F00',
  /** Okabe-Ito bluish green: dimensions that match. */
  alike: '#009E73',
  /** Okabe-Ito vermillion: dimensions that differ most. */
  apart: '#D55E00',
  /** Okabe-Ito sky blue: secondary highlights. */
  sky: '#56B4E9',
  /** Neutral grey for the rest of the pool and guides. */
  pool: '#9A9A9A',
  ink: '#1F2328',
} as const;
