import type { TopLevelSpec } from 'vega-lite';

/**
 * Renders a Vega-Lite spec to an SVG string: compile to Vega, parse, headless view (renderer 'none').
 * vega and vega-lite are loaded on first use: they take about 0.4 s to load, and most commands draw nothing.
 *
 * @example
 * await renderVegaLite({ data: { values: [{ a: 1 }] }, mark: 'point', encoding: { x: { field: 'a', type: 'quantitative' } } });
 * // => '<svg ...'
 */
export async function renderVegaLite(spec: TopLevelSpec): Promise<string> {
  const [vega, { compile }] = await Promise.all([import('vega'), import('vega-lite')]);
  const compiled = compile(spec).spec;
  const view = new vega.View(vega.parse(compiled), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
