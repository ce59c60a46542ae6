import { describe, expect, it } from 'vitest';
import { toGrade } from '../../src/stats/toGrade.ts';

// Reference: common practice 20-80 scouting scale, 50 + 10 z (higher is better) or 50 - 10 z
// (lower is better), clamped to 20..80; values worked by hand.
describe('toGrade(z, direction)', () => {
  it('gives the doc examples: z 1.26 is 63 higher-is-better, 37 lower-is-better; z 4 clamps to 80', () => {
    expect(toGrade(1.26, 'higher')).toBe(63);
    expect(toGrade(1.26, 'lower')).toBe(37);
    expect(toGrade(4, 'higher')).toBe(80);
  });
  it('puts average at 50 and one standard deviation at 10 points', () => {
    expect(toGrade(0, 'higher')).toBe(50);
    expect(toGrade(0, 'lower')).toBe(50);
    expect(toGrade(-1, 'higher')).toBe(40);
    expect(toGrade(-2, 'lower')).toBe(70);
  });
  it('rounds to the nearest integer, halves up', () => {
    expect(toGrade(0.25, 'higher')).toBe(53); // 52.5 -> 53
    expect(toGrade(0.24, 'higher')).toBe(52); // 52.4 -> 52
  });
  it('clamps to 20..80 at both ends', () => {
    expect(toGrade(-3.5, 'higher')).toBe(20);
    expect(toGrade(3.5, 'lower')).toBe(20);
    expect(toGrade(-9, 'lower')).toBe(80);
  });
  it('grades a neither-way measurement (a style) like a higher-is-better one', () => {
    expect(toGrade(1.26, 'neither')).toBe(63);
  });
  it('returns NaN for a missing z', () => {
    expect(toGrade(NaN, 'higher')).toBeNaN();
  });
});
