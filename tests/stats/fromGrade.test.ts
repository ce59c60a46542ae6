import { describe, expect, it } from 'vitest';
import { fromGrade } from '../../src/stats/fromGrade.ts';
import { toGrade } from '../../src/stats/toGrade.ts';

// Reference: common practice 20-80 scouting scale, z = (grade - 50) / 10, sign flipped for
// lower-is-better; values worked by hand.
describe('fromGrade(grade, direction)', () => {
  it('gives the doc example: 65 is z 1.5 higher-is-better and -1.5 lower-is-better', () => {
    expect(fromGrade(65, 'higher')).toBeCloseTo(1.5, 12);
    expect(fromGrade(65, 'lower')).toBeCloseTo(-1.5, 12);
  });
  it('reads a neither-way grade like a higher-is-better one', () => {
    expect(fromGrade(65, 'neither')).toBeCloseTo(1.5, 12);
  });
  it('does not clamp: a grade of 90 is z 4', () => {
    expect(fromGrade(90, 'higher')).toBeCloseTo(4, 12);
  });
  it('inverts toGrade on whole grades inside the scale', () => {
    for (let g = 20; g <= 80; g += 5) {
      expect(toGrade(fromGrade(g, 'higher'), 'higher')).toBe(g);
      expect(toGrade(fromGrade(g, 'lower'), 'lower')).toBe(g);
    }
  });
});
