/**
 * Running sums for the Pearson correlation coefficient of paired values (Pearson 1895):
 * r = (n Σxy − Σx Σy) / sqrt((n Σx² − (Σx)²)(n Σy² − (Σy)²)), here in the equivalent centred form.
 *
 * @example
 * const s = new PearsonSums();
 * [[1, 2], [2, 4], [3, 7]].forEach(([x, y]) => s.add(x, y));
 * s.correlation(); // => 0.9934
 */
export class PearsonSums {
  private count = 0;
  private sx = 0;
  private sy = 0;
  private sxx = 0;
  private syy = 0;
  private sxy = 0;

  add(x: number, y: number): void {
    this.count++;
    this.sx += x;
    this.sy += y;
    this.sxx += x * x;
    this.syy += y * y;
    this.sxy += x * y;
  }

  /** Pairs added. */
  get n(): number {
    return this.count;
  }

  /** The correlation, or NaN when either side has no spread (or fewer than two pairs). */
  correlation(): number {
    const n = this.count;
    const cov = this.sxy - (this.sx * this.sy) / n;
    const vx = this.sxx - (this.sx * this.sx) / n;
    const vy = this.syy - (this.sy * this.sy) / n;
    return n > 1 && vx > 0 && vy > 0 ? cov / Math.sqrt(vx * vy) : NaN;
  }
}
