import { describe, expect, it } from 'vitest';
import { learningCurveSvg } from '../../../src/embed/charts/learningCurveSvg.ts';

describe('learningCurveSvg', () => {
  it('renders an SVG with both series, the title and the kept epoch marked', async () => {
    const svg = await learningCurveSvg({ train: [1, 0.8, 0.6, 0.55, 0.5], val: [1.1, 0.9, 0.7, 0.72, 0.75] }, 3, 'Latent 4 curve');
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('Latent 4 curve');
    expect(svg).toContain('training');
    expect(svg).toContain('validation');
    expect(svg).toContain('kept: epoch 3, val 0.7000');
  });
});
