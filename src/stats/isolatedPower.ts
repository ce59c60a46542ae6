/**
 * Isolated power (ISO): extra bases per at-bat, i.e. slugging minus batting average.
 *
 * Source: common practice: ISO = SLG - AVG = (TB - H) / AB.
 * Units: extra bases per at-bat, from 0 to 3; higher is better.
 * Returns NaN when AB is 0.
 *
 * @param TB total bases
 * @param H hits
 * @param AB official at-bats
 * @example
 * isolatedPower(246, 150, 500); // => 96 / 500 = 0.192
 */
export function isolatedPower(TB: number, H: number, AB: number): number {
  return AB === 0 ? NaN : (TB - H) / AB;
}
