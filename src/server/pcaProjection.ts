import { PCA } from 'ml-pca';

export interface Projection2d {
  readonly x: readonly number[];
  readonly y: readonly number[];
  /** Share of the total variance carried by each axis (0 to 1). */
  readonly explained: readonly [number, number];
}

/**
 * Rows projected on their first two principal components (Pearson 1901; Jolliffe, "Principal
 * Component Analysis", 2nd ed. 2002, ch. 1): the data are centred, not scaled, and decomposed by
 * ml-pca (SVD). Axis signs are arbitrary, as in any PCA. Fewer than two rows or columns give zeros.
 * Cost: one SVD of the n x d matrix.
 *
 * @example
 * // (2, 2), (-2, -2), (1, -1), (-1, 1): the first axis is the diagonal, with 16 of the 20 units of variance.
 * pcaProjection([[2, 2], [-2, -2], [1, -1], [-1, 1]]).explained; // => [0.8, 0.2]
 */
export function pcaProjection(rows: readonly (readonly number[])[]): Projection2d {
  const n = rows.length;
  const d = rows[0]?.length ?? 0;
  if (n < 2 || d < 2) return { x: rows.map(() => 0), y: rows.map(() => 0), explained: [0, 0] };
  const data = rows.map((r) => [...r]);
  const pca = new PCA(data, { center: true, scale: false });
  const proj = pca.predict(data, { nComponents: 2 });
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < n; i++) {
    x.push(proj.get(i, 0));
    y.push(proj.get(i, 1));
  }
  const shares = pca.getExplainedVariance();
  return { x, y, explained: [shares[0] ?? 0, shares[1] ?? 0] };
}
