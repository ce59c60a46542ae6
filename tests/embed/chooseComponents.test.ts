import { describe, expect, it } from 'vitest';
import { chooseComponents } from '../../src/embed/chooseComponents.ts';

describe('chooseComponents', () => {
  it('chooseComponents(shares, 0.9) returns the fewest leading components reaching 90%', () => {
    expect(chooseComponents([0.5, 0.3, 0.15, 0.05], 0.9)).toBe(3);
    expect(chooseComponents([0.95, 0.05], 0.9)).toBe(1);
  });

  it('accepts raw eigenvalues, and counts reaching the threshold exactly as enough', () => {
    // Standardised iris eigenvalues (from memory, see fitPcaEmbedding.test.ts): 72.96% + 22.85% = 95.8% >= 90%.
    expect(chooseComponents([2.918, 0.914, 0.147, 0.021], 0.9)).toBe(2);
    expect(chooseComponents([6, 3, 1], 0.9)).toBe(2);
  });

  it('refuses a threshold outside (0, 1]', () => {
    expect(() => chooseComponents([1], 1.5)).toThrow(/threshold 1.5/);
  });
});
