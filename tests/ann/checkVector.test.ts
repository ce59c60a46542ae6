import { describe, expect, it } from 'vitest';
import { checkRows, checkVector } from '../../src/ann/checkVector.ts';

describe('checkVector(vector, dim, what)', () => {
  it('accepts a finite vector of the right length', () => {
    expect(() => checkVector([0, -1.5, 3e38], 3, 'query')).not.toThrow();
  });
  it('names the length found and expected', () => {
    expect(() => checkVector([1, 2], 3, 'query')).toThrow('query: has 2 values (expected 3, the index dimension)');
  });
  it('names the first bad dimension: NaN, Infinity, a value beyond float32 range, a non-number', () => {
    expect(() => checkVector([0, NaN], 2, 'query')).toThrow(/dimension 1 is NaN/);
    expect(() => checkVector([-Infinity, 0], 2, 'query')).toThrow(/dimension 0 is -Infinity/);
    expect(() => checkVector([0, 1e39], 2, 'query')).toThrow(/dimension 1 is 1e\+39/);
    expect(() => checkVector(['1', 2], 2, 'query')).toThrow(/dimension 0 is 1/);
  });
});

describe('checkRows(vectors, dim)', () => {
  it('returns the row count', () => {
    expect(checkRows(new Float32Array(12), 4)).toBe(3);
  });
  it('refuses a bad dimension, a ragged length and reports the first bad row and dimension', () => {
    expect(() => checkRows(new Float32Array(4), 0)).toThrow(/dimension 0 is invalid/);
    expect(() => checkRows(new Float32Array(4), 1.5)).toThrow(/dimension 1.5 is invalid/);
    expect(() => checkRows(new Float32Array(5), 2)).toThrow(/5 values do not split into rows of 2/);
    expect(() => checkRows(new Float32Array([0, 0, 0, 0, 0, Infinity]), 2)).toThrow('row 2, dimension 1 is Infinity');
  });
});
