/**
 * The page's chart specs, built from real API answers on the demo store, validated in Node against
 * the chart library's own JSON schema (vega-lite's build/vega-lite-schema.json, checked with ajv),
 * then compiled by vega-lite and drawn by vega to SVG.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { Ajv } from 'ajv';
import { compile, type TopLevelSpec } from 'vega-lite';
import * as vega from 'vega';
import { createServer, type RunningServer } from '../../src/server/createServer.ts';
import type { CompsResult } from '../../src/query/CompsResult.ts';
import type { CheaperResult } from '../../src/jobs/CheaperResult.ts';
import type { ProspectResult } from '../../src/jobs/ProspectResult.ts';
import type { PoolMap } from '../../src/server/poolMap.ts';
import { gradeChartSpec } from '../../src/web/gradeChartSpec.ts';
import { OUTCOME_RANGE_WORDS, outcomeChartSpec } from '../../src/web/outcomeChartSpec.ts';
import { frontierChartSpec } from '../../src/web/frontierChartSpec.ts';
import { poolMapSpec } from '../../src/web/poolMapSpec.ts';
import { buildDemoStore, tempDir } from '../server/serverFixture.ts';

const require = createRequire(import.meta.url);
let srv: RunningServer;
let remove: () => Promise<void> = async () => {};
let validate: (spec: unknown) => string[];

async function get<T>(path: string): Promise<T> {
  const r = await fetch(new URL(path, srv.url));
  expect(r.status, path).toBe(200);
  return (await r.json()) as T;
}

async function drawn(spec: TopLevelSpec): Promise<string> {
  const view = new vega.View(vega.parse(compile(spec).spec), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}

beforeAll(async () => {
  const t = await tempDir('kindred-specs-');
  remove = t.remove;
  const storeDir = join(t.dir, 'store');
  await buildDemoStore(storeDir);
  srv = await createServer({ storeDir, port: 0 });
  // the schema ships in the package but is not in its exports: find it beside the package's main file
  const schemaFile = join(dirname(require.resolve('vega-lite')), 'vega-lite-schema.json');
  const schema = JSON.parse(await readFile(schemaFile, 'utf8')) as object;
  const ajv = new Ajv({ strict: false, allErrors: true });
  const check = ajv.compile(schema);
  validate = (spec) => (check(spec) ? [] : (check.errors ?? []).map((e) => `${e.instancePath} ${e.message ?? ''}`));
});

afterAll(async () => {
  await srv?.close();
  await remove();
});

describe('chart specs of the page', () => {
  it('the schema check can fail: a spec with an unknown mark is refused', () => {
    expect(validate({ data: { values: [] }, mark: 'not-a-mark' }).length).toBeGreaterThan(0);
  });

  it('grade chart and pool map of a comps answer are valid vega-lite and draw', async () => {
    const r = await get<CompsResult>('/api/comps?player=p001574');
    const comp = r.comps[0];
    if (!comp) throw new Error('no comp');
    const grade = gradeChartSpec(comp, r.query.name ?? 'target', (n) => n);
    expect(validate(grade)).toEqual([]);
    expect(await drawn(grade)).toContain('<svg');
    const map = await get<PoolMap>(`/api/map?group=${r.query.group}`);
    const highlights = r.comps.map((c) => ({ playerId: c.player_id, season: c.season, level: c.level, role: 'comp' as const, rank: c.rank }));
    const mapSpec = poolMapSpec(map, highlights);
    expect(validate(mapSpec)).toEqual([]);
    expect(await drawn(mapSpec)).toContain('<svg');
  });

  it('outcome chart of a prospect answer is valid vega-lite and draws', async () => {
    const r = await get<ProspectResult>('/api/prospect?player=p000002');
    const spec = outcomeChartSpec(r);
    expect(validate(spec)).toEqual([]);
    const svg = await drawn(spec);
    expect(svg).toContain('<svg');
    // the range is stated as a band with its coverage in words, not as a table of percentiles
    expect(svg).toContain(OUTCOME_RANGE_WORDS);
    expect(svg).not.toMatch(/p10|p90|percentile/i);
  });

  it('value frontier chart of a cheaper answer is valid vega-lite and draws', async () => {
    const r = await get<CheaperResult>('/api/cheaper?want=obp%3D60g%2Ciso%3D55g&position=2B&max-salary=1500000');
    const spec = frontierChartSpec(r);
    expect(validate(spec)).toEqual([]);
    expect(await drawn(spec)).toContain('<svg');
  });

  it('value frontier chart labels likeness in whole numbers, even for one comp (no "60.400000")', async () => {
    const r = await get<CheaperResult>('/api/cheaper?want=obp%3D60g%2Ciso%3D55g&position=2B&max-salary=1500000');
    const one: CheaperResult = { ...r, comps: r.comps.slice(0, 1).map((c) => ({ ...c, likeness: 60.4 })) };
    const labels = [...(await drawn(frontierChartSpec(one))).matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1] ?? '');
    expect(labels.filter((t) => /^\d+\.\d{3,}$/.test(t))).toEqual([]);
  });
});
