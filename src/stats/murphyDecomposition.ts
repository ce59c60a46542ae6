/**
 * Murphy's decomposition of the Brier score into reliability, resolution and uncertainty.
 *
 * Source: Murphy (1973), "A new vector partition of the probability score", Journal of Applied
 * Meteorology 12(4); also Wilks, Statistical Methods in the Atmospheric Sciences, section on the
 * algebraic decomposition of the Brier score. With the forecasts grouped into bins k of n_k forecasts,
 * mean forecast f_k and observed frequency o_k, and o the overall frequency:
 *   REL = (1/N) sum n_k (f_k - o_k)^2      (lower is better: forecasts say what happens)
 *   RES = (1/N) sum n_k (o_k - o)^2        (higher is better: forecasts tell cases apart)
 *   UNC = o (1 - o)
 *   BS  = REL - RES + UNC                   exactly when every bin holds one forecast value;
 * with wider bins the identity is off by the within-bin spread of the forecasts (reported as `within`,
 * so that BS = REL - RES + UNC + within always holds).
 * Bins: `bins` equal-width bins on 0..1 (default 10), forecast 1 in the last.
 * Pairs with a NaN forecast are left out.
 *
 * @example
 * // five 0.2 forecasts (one happened) and five 0.8 (four happened):
 * murphyDecomposition([.2,.2,.2,.2,.2,.8,.8,.8,.8,.8], [1,0,0,0,0,1,1,1,1,0].map(Boolean));
 * // => { brier: 0.16, reliability: 0, resolution: 0.09, uncertainty: 0.25, within: 0, ... }
 */
export interface MurphyBin {
  readonly lo: number;
  readonly hi: number;
  readonly n: number;
  readonly meanForecast: number;
  readonly observed: number;
}

export interface MurphyDecomposition {
  readonly n: number;
  readonly brier: number;
  readonly reliability: number;
  readonly resolution: number;
  readonly uncertainty: number;
  /** BS - (REL - RES + UNC): 0 when each bin holds a single forecast value. */
  readonly within: number;
  readonly base: number;
  /** Non-empty bins, low to high (the points of a reliability chart). */
  readonly bins: readonly MurphyBin[];
}

export function murphyDecomposition(forecasts: readonly number[], outcomes: readonly boolean[], bins = 10): MurphyDecomposition {
  if (forecasts.length !== outcomes.length) throw new RangeError(`murphyDecomposition: ${forecasts.length} forecasts but ${outcomes.length} outcomes`);
  if (!Number.isInteger(bins) || bins < 1) throw new RangeError(`murphyDecomposition: bins ${bins}: expected a positive integer`);
  const count = new Float64Array(bins), sumF = new Float64Array(bins), sumO = new Float64Array(bins);
  let n = 0, hits = 0, sq = 0;
  for (let i = 0; i < forecasts.length; i++) {
    const f = forecasts[i] as number;
    if (Number.isNaN(f)) continue;
    const o = outcomes[i] ? 1 : 0;
    const k = Math.min(bins - 1, Math.max(0, Math.floor(f * bins)));
    count[k] = (count[k] ?? 0) + 1;
    sumF[k] = (sumF[k] ?? 0) + f;
    sumO[k] = (sumO[k] ?? 0) + o;
    n++;
    hits += o;
    sq += (f - o) * (f - o);
  }
  if (n === 0) return { n, brier: NaN, reliability: NaN, resolution: NaN, uncertainty: NaN, within: NaN, base: NaN, bins: [] };
  const base = hits / n;
  let rel = 0, res = 0;
  const out: MurphyBin[] = [];
  for (let k = 0; k < bins; k++) {
    const nk = count[k] as number;
    if (nk === 0) continue;
    const fk = (sumF[k] as number) / nk, ok = (sumO[k] as number) / nk;
    rel += nk * (fk - ok) * (fk - ok);
    res += nk * (ok - base) * (ok - base);
    out.push({ lo: k / bins, hi: (k + 1) / bins, n: nk, meanForecast: fk, observed: ok });
  }
  const brier = sq / n, reliability = rel / n, resolution = res / n, uncertainty = base * (1 - base);
  return { n, brier, reliability, resolution, uncertainty, within: brier - (reliability - resolution + uncertainty), base, bins: out };
}
