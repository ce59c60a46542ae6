import { describe, expect, it } from 'vitest';
import { round, roundOrNull } from '../../src/stats/round.ts';

// Reference: ECMAScript Number.prototype.toFixed (ECMA-262): the decimal nearest the binary value;
// values worked by hand.
describe('round(x, digits)', () => {
  it('gives the doc examples: 0.1 + 0.2 at 3 digits is 0.3, 2 / 3 at 1 digit is 0.7', () => {
    expect(round(0.1 + 0.2, 3)).toBe(0.3);
    expect(round(2 / 3, 1)).toBe(0.7);
  });
  it('rounds the binary value: 1.005 is stored just under 1.005, so two digits give 1', () => {
    expect(round(1.005, 2)).toBe(1);
  });
});

describe('roundOrNull(x, digits)', () => {
  it('gives null for NaN and the infinities, the rounded value otherwise', () => {
    expect(roundOrNull(NaN, 3)).toBeNull();
    expect(roundOrNull(Infinity, 3)).toBeNull();
    expect(roundOrNull(0.12345, 3)).toBe(0.123);
  });
});
