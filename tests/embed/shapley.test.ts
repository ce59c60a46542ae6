import { describe, expect, it } from 'vitest';
import { exactShapley, permutationShapley, type CoalitionValue } from '../../src/embed/shapley.ts';

/** Weighted majority game [quota; w_1, ..., w_n]: v(S) = 1 when the weights in S reach the quota. */
function weightedMajority(quota: number, weights: readonly number[]): CoalitionValue {
  return (c) => {
    let s = 0;
    weights.forEach((w, i) => (s += c[i] ? w : 0));
    return s >= quota ? 1 : 0;
  };
}

/** A smooth non-additive game: v(S) = (sum of weights in S)^2. */
function squaredSum(weights: readonly number[]): CoalitionValue {
  return (c) => {
    let s = 0;
    weights.forEach((w, i) => (s += c[i] ? w : 0));
    return s * s;
  };
}

const sum = (a: Float64Array): number => a.reduce((s, v) => s + v, 0);

describe('exactShapley', () => {
  it('exactShapley(n, v) is efficient: the values sum to v(all) - v(empty)', () => {
    // Property of the Shapley value (Shapley 1953, efficiency axiom).
    const v: CoalitionValue = (c) => 3 + squaredSum([1, 2, 0.5, 4, 3])(c) + (c[0] && c[3] ? 7 : 0);
    const phi = exactShapley(5, v);
    expect(sum(phi)).toBeCloseTo(v(new Uint8Array(5).fill(1)) - v(new Uint8Array(5)), 10);
  });

  it('gives symmetric players equal values and a dummy player 0 (Shapley 1953, symmetry and null-player axioms)', () => {
    // Players 1 and 2 have equal weight (symmetric); player 4 has weight 0 (a dummy).
    const phi = exactShapley(5, weightedMajority(6, [4, 2, 2, 3, 0]));
    expect(phi[1]).toBeCloseTo(phi[2] ?? NaN, 14);
    expect(phi[4]).toBe(0);
    expect(sum(phi)).toBeCloseTo(1, 12);
  });

  it('solves the glove game: one left glove, two right gloves => (2/3, 1/6, 1/6)', () => {
    // Classic textbook example; values from memory, and checkable by hand over the 3! = 6 orders:
    // the left-glove holder completes a pair in 4 of the 6 orders (whenever a right glove is already in).
    const phi = exactShapley(3, (c) => (c[0] && (c[1] || c[2]) ? 1 : 0));
    expect(phi[0]).toBeCloseTo(2 / 3, 14);
    expect(phi[1]).toBeCloseTo(1 / 6, 14);
    expect(phi[2]).toBeCloseTo(1 / 6, 14);
  });

  it('matches the published closed form of the airport game (Littlechild and Owen 1973)', () => {
    // Source: Littlechild and Owen 1973, "A simple expression for the Shapley value in a special case",
    // Management Science 20(3): with runway costs c1 <= c2 <= c3 and v(S) = max cost in S, player i pays
    // sum over k <= i of (c_k - c_{k-1}) / (number of players needing at least c_k).
    // Costs 6, 12, 30: phi = (6/3, 6/3 + 6/2, 6/3 + 6/2 + 18/1) = (2, 5, 23).
    const costs = [6, 12, 30];
    const phi = exactShapley(3, (c) => Math.max(0, ...costs.filter((_, i) => c[i])));
    expect(Array.from(phi).map((p) => Number(p.toFixed(12)))).toEqual([2, 5, 23]);
  });

  it('handles 16 players (65,536 coalitions), each coalition evaluated once', () => {
    let calls = 0;
    const weights = Array.from({ length: 16 }, (_, i) => i + 1);
    const game = weightedMajority(69, weights);
    const phi = exactShapley(16, (c) => {
      calls++;
      return game(c);
    });
    expect(calls).toBe(65536);
    expect(sum(phi)).toBeCloseTo(1, 10);
    for (let i = 1; i < 16; i++) expect(phi[i] ?? 0).toBeGreaterThanOrEqual((phi[i - 1] ?? 0) - 1e-12); // more weight, more power
  });

  it('refuses more players than it can enumerate', () => {
    expect(() => exactShapley(21, () => 0)).toThrow(/n 21/);
  });
});

describe('permutationShapley', () => {
  const weights = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
  const games: [string, CoalitionValue][] = [
    ['weighted majority [28; 1..10]', weightedMajority(28, weights)],
    ['squared sum of 1..10', squaredSum(weights)],
  ];
  for (const [name, game] of games) {
    it(`converges to the exact values within 4 stated standard errors on a 10-player game (${name})`, () => {
      const exact = exactShapley(10, game);
      const est = permutationShapley(10, game, { samples: 4000, seed: 7 });
      for (let i = 0; i < 10; i++) {
        const err = Math.abs((est.values[i] ?? NaN) - (exact[i] ?? NaN));
        expect(err).toBeLessThanOrEqual(4 * (est.standardError[i] ?? 0) + 1e-12);
      }
      // efficiency holds for every walked order, hence for the estimate
      expect(sum(est.values)).toBeCloseTo(sum(exact), 8);
    });
  }

  it('its standard error shrinks like 1 / sqrt(samples), for plain and antithetic sampling', () => {
    const game = weightedMajority(28, weights);
    for (const antithetic of [true, false]) {
      const small = permutationShapley(10, game, { samples: 1000, seed: 3, antithetic });
      const big = permutationShapley(10, game, { samples: 16000, seed: 3, antithetic });
      const ratio = (big.standardError[5] ?? 0) / (small.standardError[5] ?? 1);
      expect(ratio).toBeGreaterThan(0.25 * 0.8);
      expect(ratio).toBeLessThan(0.25 * 1.2);
    }
  });

  it('is deterministic for a seed', () => {
    const game = squaredSum(weights);
    expect(permutationShapley(10, game, { samples: 50, seed: 1 })).toEqual(permutationShapley(10, game, { samples: 50, seed: 1 }));
  });
});
