import { describe, expect, it } from 'vitest';
import { codeDistance2 } from '../../src/query/codeDistance2.ts';

describe('codeDistance2(code, codes, offset)', () => {
  it('is the squared Euclidean distance to the code at the offset (3-4-5 triangle)', () => {
    expect(codeDistance2(Float64Array.of(0, 0), Float64Array.of(9, 9, 3, 4), 2)).toBe(25);
    expect(codeDistance2(Float64Array.of(9, 9), Float64Array.of(9, 9, 3, 4), 0)).toBe(0);
  });
});
