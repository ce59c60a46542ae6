/**
 * Logistic regression by Newton-Raphson (iteratively reweighted least squares) with a small ridge
 * penalty on the slopes, used to map forecast features to a calibrated probability.
 *
 * Source: the maximum-likelihood fit of P(y = 1 | x) = 1 / (1 + exp(-(b0 + b.x))) by Newton's method
 * (McCullagh and Nelder, Generalized Linear Models, 2nd ed., 1989, section 4.4); as a calibration map
 * of a score, Platt (1999), "Probabilistic outputs for support vector machines and comparisons to
 * regularized likelihood methods". At the optimum the score equations sum (y_i - p_i) x_ij = ridge b_j
 * hold (and sum (y_i - p_i) = 0 for the intercept).
 * Optional case weights. Stops when the largest step is below 1e-10 or after 100 iterations.
 *
 * @example
 * // one 0/1 feature: the fit returns each group's observed log-odds
 * fitLogistic([[0], [0], [0], [0], [1], [1], [1], [1]], [1, 0, 0, 0, 1, 1, 1, 0].map(Boolean), { ridge: 0 });
 * // => { coefficients: [log(1/3), log(3) - log(1/3)] }
 */
export interface LogisticFit {
  /** Intercept first, then one slope per feature. */
  readonly coefficients: readonly number[];
  readonly iterations: number;
}

export interface LogisticOptions {
  /** Penalty lambda sum b_j^2 / 2 on the slopes (not the intercept); default 1e-3. */
  readonly ridge?: number;
  readonly weights?: readonly number[];
  /** A known term added to each row's linear predictor (an offset, as in a GLM); default none. */
  readonly offsets?: readonly number[];
  /** Penalise the intercept too, shrinking it toward 0 (default false). */
  readonly penaliseIntercept?: boolean;
}

export function logisticProbability(fit: LogisticFit, x: readonly number[], offset = 0): number {
  const c = fit.coefficients;
  let eta = (c[0] as number) + offset;
  for (let j = 0; j < x.length; j++) eta += (c[j + 1] as number) * (x[j] as number);
  return 1 / (1 + Math.exp(-eta));
}

export function fitLogistic(x: readonly (readonly number[])[], y: readonly boolean[], options: LogisticOptions = {}): LogisticFit {
  if (x.length !== y.length) throw new RangeError(`fitLogistic: ${x.length} rows but ${y.length} outcomes`);
  const ridge = options.ridge ?? 1e-3;
  const d = (x[0]?.length ?? 0) + 1;
  const beta = new Float64Array(d);
  let iterations = 0;
  for (; iterations < 100; iterations++) {
    const g = new Float64Array(d);
    const h = new Float64Array(d * d);
    for (let i = 0; i < x.length; i++) {
      const row = x[i] as readonly number[];
      const wi = options.weights ? (options.weights[i] as number) : 1;
      let eta = (beta[0] as number) + (options.offsets ? (options.offsets[i] as number) : 0);
      for (let j = 1; j < d; j++) eta += (beta[j] as number) * (row[j - 1] as number);
      const p = 1 / (1 + Math.exp(-eta));
      const r = ((y[i] ? 1 : 0) - p) * wi;
      const v = p * (1 - p) * wi;
      for (let a = 0; a < d; a++) {
        const xa = a === 0 ? 1 : (row[a - 1] as number);
        g[a] = (g[a] as number) + r * xa;
        for (let b = 0; b <= a; b++) {
          const xb = b === 0 ? 1 : (row[b - 1] as number);
          h[a * d + b] = (h[a * d + b] as number) + v * xa * xb;
        }
      }
    }
    for (let a = options.penaliseIntercept ? 0 : 1; a < d; a++) {
      g[a] = (g[a] as number) - ridge * (beta[a] as number);
      h[a * d + a] = (h[a * d + a] as number) + ridge;
    }
    for (let a = 0; a < d; a++) for (let b = a + 1; b < d; b++) h[a * d + b] = h[b * d + a] as number;
    const step = solveSymmetric(h, g, d);
    let biggest = 0;
    for (let a = 0; a < d; a++) {
      beta[a] = (beta[a] as number) + (step[a] as number);
      biggest = Math.max(biggest, Math.abs(step[a] as number));
    }
    if (!(biggest > 1e-10)) break;
  }
  return { coefficients: Array.from(beta), iterations: iterations + 1 };
}

/** Solves H s = g for a symmetric positive-definite H (Cholesky); a tiny jitter guards a singular H. */
function solveSymmetric(h: Float64Array, g: Float64Array, d: number): Float64Array {
  const l = new Float64Array(d * d);
  for (let i = 0; i < d; i++) {
    for (let j = 0; j <= i; j++) {
      let s = h[i * d + j] as number;
      for (let k = 0; k < j; k++) s -= (l[i * d + k] as number) * (l[j * d + k] as number);
      if (i === j) l[i * d + i] = Math.sqrt(Math.max(s, 1e-12));
      else l[i * d + j] = s / (l[j * d + j] as number);
    }
  }
  const z = new Float64Array(d);
  for (let i = 0; i < d; i++) {
    let s = g[i] as number;
    for (let k = 0; k < i; k++) s -= (l[i * d + k] as number) * (z[k] as number);
    z[i] = s / (l[i * d + i] as number);
  }
  const out = new Float64Array(d);
  for (let i = d - 1; i >= 0; i--) {
    let s = z[i] as number;
    for (let k = i + 1; k < d; k++) s -= (l[k * d + i] as number) * (out[k] as number);
    out[i] = s / (l[i * d + i] as number);
  }
  return out;
}
