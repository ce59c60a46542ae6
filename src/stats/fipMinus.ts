/**
 * League-relative FIP (FIP-): a pitcher's FIP as a percentage of the league's, league average = 100.
 *
 * Source: common practice: FIP- = 100 * FIP / lgFIP. No park factor is applied here (the usual published
 * form adjusts for the park first); this is FIP- against the league as given.
 * Units: index points, league average = 100; lower is better (90 is 10% better than average).
 * Returns NaN when lgFIP is 0.
 *
 * @example
 * fipMinus(3.6, 4); // => 90
 */
export function fipMinus(FIP: number, lgFIP: number): number {
  return lgFIP === 0 ? NaN : (100 * FIP) / lgFIP;
}
