import { describe, expect, it } from 'vitest';
import { parseThirds } from '../../src/ingest/parseThirds.ts';

// Thirds notation for innings (common practice): the digit after the point counts outs (0, 1 or 2).
describe('parseThirds(text)', () => {
  it('reads "6.2" as 6 innings and 2 outs = 20 outs', () => {
    expect(parseThirds('6.2')).toBe(20);
  });
  it('reads "6" and "6.0" as 18 outs and "6.1" as 19', () => {
    expect(parseThirds('6')).toBe(18);
    expect(parseThirds('6.0')).toBe(18);
    expect(parseThirds('6.1')).toBe(19);
  });
  it('reads "0.1" as one out and "200.2" as 602 outs', () => {
    expect(parseThirds('0.1')).toBe(1);
    expect(parseThirds('200.2')).toBe(602);
  });
  it('refuses "6.3", "6.25", "-1", "6.", ".2", "6.5", "abc" and ""', () => {
    for (const text of ['6.3', '6.25', '-1', '6.', '.2', '6.5', 'abc', '', '6.2.1', '1e2']) {
      expect(parseThirds(text), text).toBeNull();
    }
  });
  it('accepts surrounding spaces', () => {
    expect(parseThirds(' 7.1 ')).toBe(22);
  });
});
