import { describe, expect, it } from 'vitest';
import { attributionSpreadSvg } from '../../../src/embed/charts/attributionSpreadSvg.ts';

describe('attributionSpreadSvg', () => {
  it('renders one row per dimension, sorted by mean |attribution| (largest first), in one hue', async () => {
    const rows: { dimension: string; attribution: number }[] = [];
    for (let i = 0; i < 50; i++) {
      rows.push({ dimension: 'obp', attribution: 0.1 + (i % 5) * 0.01 });
      rows.push({ dimension: 'iso', attribution: -0.6 + (i % 7) * 0.02 });
      rows.push({ dimension: 'pop_2b_s', attribution: 0.3 });
    }
    const svg = await attributionSpreadSvg(rows);
    expect(svg.startsWith('<svg')).toBe(true);
    const labels = ['iso', 'pop_2b_s', 'obp'].map((name) => svg.indexOf(`>${name}</text>`));
    for (const at of labels) expect(at).toBeGreaterThan(0);
    expect(labels).toEqual([...labels].sort((a, b) => a - b)); // drawn top to bottom in that order
    const colours = new Set((svg.match(/(fill|stroke)="#[0-9a-fA-F]{6}"/g) ?? []).map((m) => m.slice(-8, -1).toLowerCase()));
    expect([...colours].filter((c) => !['#0072b2', '#333333', '#666666', '#888888', '#dddddd', '#000000', '#ffffff'].includes(c))).toEqual([]);
  });
});
