/**
 * Squared Euclidean distance between a code and the code stored at `offset` in `codes` (same length
 * as `code`): the embedded distance of comps, squared (ranking by it equals ranking by the distance).
 *
 * @example
 * codeDistance2(Float64Array.of(0, 0), Float64Array.of(9, 9, 3, 4), 2); // => 25
 */
export function codeDistance2(code: Float64Array, codes: Float64Array, offset: number): number {
  let s = 0;
  for (let q = 0; q < code.length; q++) {
    const e = (code[q] ?? 0) - (codes[offset + q] ?? 0);
    s += e * e;
  }
  return s;
}
