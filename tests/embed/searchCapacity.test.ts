import { describe, expect, it } from 'vitest';
import { searchCapacity } from '../../src/embed/searchCapacity.ts';
import { inventedProfiles } from './helpers.ts';

describe('searchCapacity', () => {
  const data = inventedProfiles(600, 10, { factors: 4, noise: 0.2, seed: 3 });
  const steps = [
    { latent: 1, hidden: [4] },
    { latent: 2, hidden: [8] },
    { latent: 4, hidden: [12] },
    { latent: 6, hidden: [16] },
  ];

  it('grows while the best validation loss improves by the margin and keeps the last step that did', () => {
    const result = searchCapacity(data, { steps, margin: 0.05, maxEpochs: 40, batchSize: 64, learningRate: 5e-3, seed: 2 });
    const chosen = result.rows.filter((r) => r.chosen);
    expect(chosen).toHaveLength(1);
    expect(result.rows[result.chosen]?.chosen).toBe(true);
    expect(result.histories).toHaveLength(result.rows.length);
    // the rule, step by step
    let best = result.rows[0]?.valLoss ?? NaN;
    for (let i = 1; i < result.rows.length; i++) {
      const val = result.rows[i]?.valLoss ?? NaN;
      const improved = (best - val) / best >= 0.05;
      if (i < result.rows.length - 1) expect(improved).toBe(true);
      if (improved) best = val;
    }
    const lastTried = result.rows.length - 1;
    if (lastTried > result.chosen) expect(lastTried).toBe(result.chosen + 1); // stopped at the first step that did not pay
    expect(result.model.latent).toBe(result.rows[result.chosen]?.latent);
  });

  it('with a margin no step can meet, keeps the first (smallest) network after trying the second', () => {
    const result = searchCapacity(data, { steps, margin: 2, maxEpochs: 5, seed: 2 });
    expect(result.chosen).toBe(0);
    expect(result.rows).toHaveLength(2);
  });
});
