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

  it('with `apart` N pairs windows N seasons apart, which share no season, and not the overlapping neighbours', () => {
    // 3000 players, rows at 2020, 2021 and 2025: the 2021 row repeats the 2020 row's noise (as overlapping
    // windows share their seasons), the 2025 row has noise of its own; skill and noise of equal variance,
    // so the reliability of independent samples is 0.5 while neighbours correlate about 1 (classical test theory)
    const rnd = lcg(5);
    const players = 3000;
    const z = new Float64Array(players * 3);
    const player: number[] = [];
    const season: number[] = [];
    for (let p = 0; p < players; p++) {
      const skill = rnd();
      const shared = rnd();
      [skill + shared, skill + shared, skill + rnd()].forEach((v, k) => {
        z[p * 3 + k] = v;
        player.push(p);
        season.push([2020, 2021, 2025][k] as number);
      });
    }
    expect(reliability(z, players * 3, 1, player, season)[0]).toBeGreaterThan(0.95);
    expect(reliability(z, players * 3, 1, player, season, 30, 0.3, 5)[0]).toBeCloseTo(0.5, 1);
  });

  it('pairs only seasons of the same player one season apart, whatever the row order', () => {
    const z = Float64Array.from([1, 5, 2, 9]);
    // rows: player 0 in 2020 and 2022 (not a pair), player 1 in 2020 and 2021
    const rel = reliability(z, 4, 1, [0, 0, 1, 1], [2020, 2022, 2021, 2020], 1, 0.3);
    // only one pair: correlation undefined -> fallback
    expect(rel[0]).toBe(0.3);
  });
});
