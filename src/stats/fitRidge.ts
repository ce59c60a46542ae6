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
  // The normal equations are summed in plain arrays (row-major), in the same order as element by element,
  // and handed to ml-matrix once: get/set per product cost about 0.05 s per 4,000 x 16 fit.
  const a = new Float64Array(d * d);
  const b = new Float64Array(d);
  const v = new Float64Array(d);
  x.forEach((row, i) => {
    v[0] = 1;
    for (let p = 1; p < d; p++) v[p] = row[p - 1] as number;
    const yi = y[i] as number;
    for (let p = 0; p < d; p++) {
      const vp = v[p] as number;
      b[p] = (b[p] as number) + vp * yi;
      for (let q = 0; q < d; q++) a[p * d + q] = (a[p * d + q] as number) + vp * (v[q] as number);
    }
  });
  for (let p = 1; p < d; p++) a[p * d + p] = (a[p * d + p] as number) + ridge;
  // a tiny jitter keeps a rank-deficient system (a constant feature) solvable
  for (let p = 0; p < d; p++) a[p * d + p] = (a[p * d + p] as number) + 1e-9;
  const matrix = new Matrix(Array.from({ length: d }, (_, p) => Array.from(a.subarray(p * d, (p + 1) * d))));
  const column = Matrix.columnVector(Array.from(b));
  const solved = new CholeskyDecomposition(matrix).solve(column);
  return { coefficients: solved.getColumn(0) };
}

/** The fitted value b0 + b.x. */
export function ridgePrediction(fit: RidgeFit, x: readonly number[]): number {
  const c = fit.coefficients;
  let s = c[0] as number;
  for (let j = 0; j < x.length; j++) s += (c[j + 1] as number) * (x[j] as number);
  return s;
}
