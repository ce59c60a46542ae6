/**
 * Weighted mean of a measurement over a player's stints, using only the
 * stints that have the value: sum(w * v) / sum(w).
 *
 * Each stint gives a preferred weight (e.g. batted-ball events) and a
 * fallback weight (e.g. plate appearances). The preferred weights are used
 * when every stint with the value has one and they sum above zero; otherwise
 * the fallback weights; when those sum to zero too, the plain mean.
 *
 * @example
 * const m = new WeightedMean();
 * m.add(90, 100, 0); m.add(84, 50, 0);
 * m.value(); // => (90 * 100 + 84 * 50) / 150 = 88
 */
export class WeightedMean {
  private sum = 0;
  private count = 0;
  private preferredSum = 0;
  private preferredWeight = 0;
  private fallbackSum = 0;
  private fallbackWeight = 0;
  private allPreferred = true;

  add(value: number, preferred: number | undefined, fallback: number): void {
    this.sum += value;
    this.count += 1;
    if (preferred === undefined) {
      this.allPreferred = false;
    } else {
      this.preferredSum += value * preferred;
      this.preferredWeight += preferred;
    }
    this.fallbackSum += value * fallback;
    this.fallbackWeight += fallback;
  }

  /** The mean, or undefined when no stint had the value. */
  value(): number | undefined {
    if (this.count === 0) return undefined;
    if (this.count === 1) return this.sum;
    if (this.allPreferred && this.preferredWeight > 0) return this.preferredSum / this.preferredWeight;
    if (this.fallbackWeight > 0) return this.fallbackSum / this.fallbackWeight;
    return this.sum / this.count;
  }
}

/** Sum of an optional count over stints: unknown as soon as one stint lacks it. */
export function addCount(total: number | undefined, value: number | undefined): number | undefined {
  return total === undefined || value === undefined ? undefined : total + value;
}
