import { describe, expect, it } from 'vitest';
import { alikeApart } from '../../src/query/alikeApart.ts';

describe('alikeApart(grades, importance, size)', () => {
  it('follows the worked example of its doc comment (OBP 72 vs 45 apart, K% 54 vs 52 alike)', () => {
    const share = [0.51, 0.01, 0.3];
    const r = alikeApart({ targetGrade: [72, 54, 60], compGrade: [45, 52, 48], importance: () => 1, size: (j) => share[j] ?? 0 });
    expect(r).toEqual({ alike: [1], apart: [0, 2] });
  });

  it('lists at most three of each, skips dimensions without both grades, and leaves 6 to 9 point gaps out of both', () => {
    const r = alikeApart({
      targetGrade: [50, 50, 50, 50, 50, null, 50, 50, 50, 50],
      compGrade: [50, 51, 52, 53, 56, 50, 59, 70, 75, 80],
      importance: (j) => 10 - j,
      size: (j) => j,
    });
    expect(r.alike).toEqual([0, 1, 2]);
    expect(r.apart).toEqual([9, 8, 7]);
  });
});
