import { describe, expect, it } from 'vitest';
import { totalBases } from '../../src/stats/totalBases.ts';

// Reference: Official Baseball Rules, total bases = 1B + 2*2B + 3*3B + 4*HR; values worked by hand.
describe('totalBases({ H, doubles, triples, HR })', () => {
  it('gives the doc example: 150 H, 30 2B, 3 3B, 20 HR is 246 bases', () => {
    expect(totalBases({ H: 150, doubles: 30, triples: 3, HR: 20 })).toBe(246);
  });
  it('agrees with the singles form 1B + 2*2B + 3*3B + 4*HR', () => {
    // 97 singles + 2*30 + 3*3 + 4*20 = 97 + 60 + 9 + 80 = 246
    const singles = 150 - 30 - 3 - 20;
    expect(totalBases({ H: 150, doubles: 30, triples: 3, HR: 20 })).toBe(singles + 2 * 30 + 3 * 3 + 4 * 20);
  });
  it('counts one base per single and four per home run', () => {
    expect(totalBases({ H: 5, doubles: 0, triples: 0, HR: 0 })).toBe(5);
    expect(totalBases({ H: 1, doubles: 0, triples: 0, HR: 1 })).toBe(4);
    expect(totalBases({ H: 1, doubles: 0, triples: 1, HR: 0 })).toBe(3);
  });
});
