import { IndexError } from '../errors/KindredError.ts';

/**
 * Checks that a query vector has `dim` entries, each a number that stays finite as a 32-bit float
 * (the native index stores float32: 1e39 would become Infinity there).
 * Throws IndexError `kindred.index.badVector` naming the first bad position and its value.
 *
 * @example
 * checkVector([0, 1], 2, 'query'); // passes
 * checkVector([0, NaN], 2, 'query'); // throws: query: dimension 1 is NaN (expected a finite number)
 */
export function checkVector(vector: ArrayLike<unknown>, dim: number, what: string): void {
  if (vector.length !== dim) {
    throw new IndexError(
      'kindred.index.badVector',
      `${what}: has ${vector.length} values (expected ${dim}, the index dimension)`,
      { what, length: vector.length, expected: dim },
    );
  }
  for (let j = 0; j < dim; j++) {
    const value: unknown = vector[j];
    if (typeof value !== 'number' || !Number.isFinite(Math.fround(value))) {
      throw new IndexError(
        'kindred.index.badVector',
        `${what}: dimension ${j} is ${String(value)} (expected a finite number within float32 range)`,
        { what, dimension: j, value: String(value) },
      );
    }
  }
}

/**
 * Checks a row-major matrix of `dim`-wide rows: dim an integer >= 1, length a multiple of dim,
 * every value finite as float32. Reports the first bad row and dimension.
 */
export function checkRows(vectors: Float32Array, dim: number): number {
  if (!Number.isInteger(dim) || dim < 1) {
    throw new IndexError('kindred.index.badVector', `dimension ${dim} is invalid (expected an integer >= 1)`, { dim });
  }
  if (vectors.length % dim !== 0) {
    throw new IndexError(
      'kindred.index.badVector',
      `${vectors.length} values do not split into rows of ${dim} (expected a multiple of ${dim})`,
      { length: vectors.length, dim },
    );
  }
  const count = vectors.length / dim;
  for (let i = 0; i < vectors.length; i++) {
    const value = vectors[i];
    if (value === undefined || !Number.isFinite(value)) {
      const row = Math.floor(i / dim);
      throw new IndexError(
        'kindred.index.badVector',
        `row ${row}, dimension ${i - row * dim} is ${String(value)} (expected a finite number)`,
        { row, dimension: i - row * dim, value: String(value) },
      );
    }
  }
  return count;
}
