import { parse, View } from 'vega';
import { expressionInterpreter } from 'vega-interpreter';
import { compile, type TopLevelSpec } from 'vega-lite';

const views = new WeakMap<HTMLElement, View>();

/**
 * Draws a vega-lite spec into an element as SVG (replacing what was drawn there before).
 * Everything runs in the page: vega and vega-lite are bundled, nothing is fetched. Chart expressions
 * are parsed to a syntax tree and run by vega-interpreter instead of being compiled with `Function`,
 * so the page works under a Content-Security-Policy without 'unsafe-eval'.
 */
export async function renderChart(container: HTMLElement, spec: TopLevelSpec, ariaLabel: string): Promise<void> {
  views.get(container)?.finalize();
  container.replaceChildren();
  const view = new View(parse(compile(spec).spec, undefined, { ast: true }), {
    renderer: 'svg',
    container,
    hover: true,
    logLevel: 1,
    expr: expressionInterpreter,
  });
  views.set(container, view);
  await view.runAsync();
  container.querySelector('svg')?.setAttribute('aria-label', ariaLabel);
}
