import { describe, expect, it } from 'vitest';
import { pathDistance, pathTargetSteps } from '../../src/jobs/pathDistance.ts';
import { missingAwareDistance, targetWeight } from '../../src/query/missingAwareDistance.ts';
import { likeness } from '../../src/query/likeness.ts';

const w = Float64Array.of(1, 1);

describe('pathDistance(target, z, offsets, weights)', () => {
  it('gives the doc example: two steps 1 apart each => d2 2, W 4, likeness 77.9', () => {
    const steps = pathTargetSteps([Float64Array.of(0, 0), Float64Array.of(0, 0)], w);
    const z = Float32Array.of(1, 0, 0, 1);
    const p = pathDistance(steps, z, [0, 2], w);
    expect(p.d2).toBeCloseTo(2, 12);
    expect(p.weight).toBe(4);
    expect(likeness(Math.sqrt(p.d2), p.weight)).toBeCloseTo(100 * Math.exp(-2 / 8), 10);
  });

  it('with one step is the missing-aware distance of that season', () => {
    const t = Float64Array.of(0.5, NaN, -1);
    const weights = Float64Array.of(1, 2, 0.5);
    const z = Float32Array.of(1, 3, NaN);
    const p = pathDistance(pathTargetSteps([t], weights), z, [0], weights);
    const single = missingAwareDistance(t, z, 0, weights, targetWeight(t, weights));
    expect(p.d2).toBeCloseTo(single.d2, 12);
    expect(p.coverage).toBeCloseTo(single.coverage, 12);
  });

  it('weighs each season by the target\u2019s weight in it for the coverage', () => {
    // step 1: target has both dims (W 2), candidate both; step 2: target both, candidate only the first (S 1)
    const steps = pathTargetSteps([Float64Array.of(0, 0), Float64Array.of(0, 0)], w);
    const z = Float32Array.of(0, 0, 0, NaN);
    expect(pathDistance(steps, z, [0, 2], w).coverage).toBeCloseTo(3 / 4, 12);
  });

  it('makes the whole trajectory incomparable when one season shares nothing', () => {
    const steps = pathTargetSteps([Float64Array.of(0, 0), Float64Array.of(0, NaN)], w);
    const z = Float32Array.of(0, 0, NaN, 1);
    const p = pathDistance(steps, z, [0, 2], w);
    expect(p.d2).toBe(Infinity);
    expect(p.coverage).toBe(0);
  });
});
