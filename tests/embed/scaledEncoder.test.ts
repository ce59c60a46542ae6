import { describe, expect, it } from 'vitest';
import { scaledEncoder } from '../../src/embed/scaledEncoder.ts';
import { UsageError } from '../../src/errors/KindredError.ts';

describe('scaledEncoder(inner, scale)', () => {
  it('multiplies each dimension before the inner encoder and keeps NaN', () => {
    const seen: number[][] = [];
    const e = scaledEncoder((x) => (seen.push(Array.from(x)), Float64Array.of(x[0] ?? 0)), Float64Array.of(2, 0.5));
    expect(Array.from(e(Float64Array.of(3, NaN)))).toEqual([6]);
    expect(seen[0]?.[1]).toBeNaN();
  });

  it('does not change its argument and refuses another length', () => {
    const e = scaledEncoder((x) => x, Float64Array.of(2, 2));
    const x = Float64Array.of(1, 1);
    e(x);
    expect(Array.from(x)).toEqual([1, 1]);
    expect(() => e(Float64Array.of(1))).toThrow(UsageError);
  });
});
