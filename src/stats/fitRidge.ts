import { CholeskyDecomposition, Matrix } from 'ml-matrix';

/**
 * Linear least squares with a ridge penalty on the slopes (not the intercept): minimises
 * sum (y_i - b0 - b.x_i)^2 + ridge sum b_j^2 by the normal equations (X'X + ridge D) b = X'y, D the
 * identity without its intercept entry, solved by Cholesky (ml-matrix).
 *
 * Source: Hoerl and Kennard (1970), "Ridge regression: biased estimation for nonorthogonal problems",
 * Technometrics 12(1); with ridge 0 this is ordinary least squares.
 *
 * @example
 * // Anscombe's (1973) first data set: y = 3.00 + 0.500 x
 * fitRidge([[10], [8], [13], [9], [11], [14], [6], [4], [12], [7], [5]],
 *          [8.04, 6.95, 7.58, 8.81, 8.33, 9.96, 7.24, 4.26, 10.84, 4.82, 5.68], 0).coefficients; // => [3.0001, 0.5001]
 */
export interface RidgeFit {
  /** Intercept first, then one slope per feature. */
  readonly coefficients: readonly number[];
}

export function fitRidge(x: readonly (readonly number[])[], y: readonly number[], ridge: number): RidgeFit {
  if (x.length !== y.length) throw new RangeError(`fitRidge: ${x.length} rows but ${y.length} values`);
  if (!(ridge >= 0)) throw new RangeError(`fitRidge: ridge ${ridge}: expected 0 or more`);
  const d = (x[0]?.length ?? 0) + 1;
  const a = Matrix.zeros(d, d);
  const b = Matrix.zeros(d, 1);
  x.forEach((row, i) => {
    const v = [1, ...row];
    for (let p = 0; p < d; p++) {
      b.set(p, 0, b.get(p, 0) + (v[p] as number) * (y[i] as number));
      for (let q = 0; q < d; q++) a.set(p, q, a.get(p, q) + (v[p] as number) * (v[q] as number));
    }
  });
  for (let p = 1; p < d; p++) a.set(p, p, a.get(p, p) + ridge);
  // a tiny jitter keeps a rank-deficient system (a constant feature) solvable
  for (let p = 0; p < d; p++) a.set(p, p, a.get(p, p) + 1e-9);
  const solved = new CholeskyDecomposition(a).solve(b);
  return { coefficients: solved.getColumn(0) };
}

/** The fitted value b0 + b.x. */
export function ridgePrediction(fit: RidgeFit, x: readonly number[]): number {
  const c = fit.coefficients;
  let s = c[0] as number;
  for (let j = 0; j < x.length; j++) s += (c[j + 1] as number) * (x[j] as number);
  return s;
}
