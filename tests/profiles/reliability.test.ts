import { describe, expect, it } from 'vitest';
import { reliability } from '../../src/profiles/reliability.ts';

/** Numerical Recipes' 32-bit linear congruential generator, as uniform noise in [-0.5, 0.5). */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32 - 0.5;
  };
}

describe('reliability(z, n, d, player, season)', () => {
  it('is the correlation of consecutive seasons: skill variance / (skill + noise variance) (classical test theory)', () => {
    // 3000 players x 2 seasons; column 0 = skill + noise of equal variance (reliability 0.5), column 1 pure noise.
    const rnd = lcg(11);
    const players = 3000;
    const z = new Float64Array(players * 2 * 2);
    const player: number[] = [];
    const season: number[] = [];
    for (let p = 0; p < players; p++) {
      const skill = rnd();
      for (let s = 0; s < 2; s++) {
        const row = p * 2 + s;
        z[row * 2] = skill + rnd();
        z[row * 2 + 1] = rnd();
        player.push(p);
        season.push(2020 + s);
      }
    }
    const rel = reliability(z, players * 2, 2, player, season);
    expect(rel[0]).toBeCloseTo(0.5, 1);
    expect(rel[1]).toBeLessThan(0.1);
  });

  it('pairs only seasons of the same player one season apart, whatever the row order', () => {
    const z = Float64Array.from([1, 5, 2, 9]);
    // rows: player 0 in 2020 and 2022 (not a pair), player 1 in 2020 and 2021
    const rel = reliability(z, 4, 1, [0, 0, 1, 1], [2020, 2022, 2021, 2020], 1, 0.3);
    // only one pair: correlation undefined -> fallback
    expect(rel[0]).toBe(0.3);
  });
});
