/**
 * Stores built with a learned embedding, end to end through the CLI in-process (main(argv, io)):
 * a small simulated league (src/sim, invented data), tiny trainings, comps in the embedded space.
 * The checks are invariants (Shapley efficiency, checksums, determinism), not reference values.
 */
import { mkdtemp, readFile, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../../src/sim/writeLeagueCsv.ts';
import { openProfileStore } from '../../src/store/openProfileStore.ts';
import type { CompsResult } from '../../src/query/CompsResult.ts';
import { runCli } from '../helpers/runCli.ts';

let dir = '';
let roster = '';
let target = '';
/** Quick settings: few epochs, a small driver sample. */
const QUICK = ['--max-epochs', '4', '--patience', '2', '--drivers', '8', '--seed', '5'];

interface AttributedJson {
  readonly distance: number;
  readonly likeness: number;
  readonly attribution_total?: number;
  readonly attribution_error?: number;
  readonly attribution_method?: string;
  readonly dimensions: readonly { readonly name: string; readonly attribution?: number; readonly missing: boolean }[];
  readonly alike: readonly string[];
  readonly apart: readonly string[];
}

async function comps(store: string, ...extra: string[]): Promise<CompsResult & { comps: readonly AttributedJson[] }> {
  const r = await runCli('comps', target, '--store', store, '--format', 'json', '--k', '8', ...extra);
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as CompsResult & { comps: readonly AttributedJson[] };
}

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'kindred-embedded-'));
  roster = join(dir, 'roster');
  const league = simulateLeague({ seed: 4242, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 8000 });
  await writeLeagueCsv(league, roster);
  for (const space of ['pca', 'autoencoder']) {
    const r = await runCli('build', roster, '--store', join(dir, space), '--embed', space, ...QUICK);
    expect(r.code, r.stderr).toBe(0);
  }
  // an infielder with a full recent profile: tracking dimensions present, so more than 12 in play
  const store = await openProfileStore(join(dir, 'pca'));
  const g = store.groups.get('IF');
  if (!g) throw new Error('no IF group in the test league');
  let best = 0;
  for (let i = 0; i < g.n; i++) if ((g.sample[i] ?? 0) > (g.sample[best] ?? 0) && (g.season[i] ?? 0) === 2026) best = i;
  target = store.players[g.player[best] ?? 0]?.playerId ?? '';
}, 240_000);

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('kindred build --embed', () => {
  it.each(['pca', 'autoencoder'])('a %s store answers comps in its embedded space, likeness 0 to 100 and falling with distance', async (space) => {
    const r = await comps(join(dir, space));
    expect(r.query.space).toBe(space);
    expect(r.comps.length).toBe(8);
    const distances = r.comps.map((c) => c.distance);
    expect(distances).toEqual([...distances].sort((a, b) => a - b));
    const likeness = r.comps.map((c) => c.likeness);
    for (const l of likeness) expect(l).toBeGreaterThanOrEqual(0);
    for (const l of likeness) expect(l).toBeLessThanOrEqual(100);
    expect(likeness).toEqual([...likeness].sort((a, b) => b - a));
  });

  it.each(['pca', 'autoencoder'])('every %s comp has attributions that add up to attribution_total (Shapley efficiency)', async (space) => {
    const r = await comps(join(dir, space));
    for (const c of r.comps) {
      expect(c.attribution_total).toBeDefined();
      const sum = c.dimensions.reduce((a, d) => a + (d.attribution ?? NaN), 0);
      expect(sum).toBeCloseTo(c.attribution_total ?? NaN, 9);
      for (const d of c.dimensions) if (d.missing) expect(d.attribution).toBe(0);
      expect(['exact', 'sampled']).toContain(c.attribution_method);
      if (c.attribution_method === 'exact') expect(c.attribution_error).toBe(0);
      else expect(c.attribution_error).toBeGreaterThan(0);
      for (const name of [...c.alike, ...c.apart]) expect(c.dimensions.find((d) => d.name === name)?.missing).toBe(false);
      expect(c.alike.filter((n) => c.apart.includes(n))).toEqual([]);
    }
  });

  it('the attribution total equals the embedded distance when both players have the same dimensions', async () => {
    const r = await comps(join(dir, 'pca'));
    const same = r.comps.filter((c) => c.dimensions.every((d) => !d.missing));
    for (const c of same) expect(c.attribution_total ?? NaN).toBeCloseTo(c.distance, 3);
  });

  it('falls back to the input space for a custom weighting, and says so', async () => {
    const r = await comps(join(dir, 'pca'), '--preset', 'power');
    expect(r.query.space).toBe('input');
    expect(r.comps[0]?.attribution_total).toBeUndefined();
  });

  it('builds the same comps twice from the same seed', async () => {
    const again = join(dir, 'autoencoder-again');
    const b = await runCli('build', roster, '--store', again, '--embed', 'autoencoder', ...QUICK);
    expect(b.code, b.stderr).toBe(0);
    const first = await comps(join(dir, 'autoencoder'));
    const second = await comps(again);
    expect(second.comps).toEqual(first.comps);
    const model = 'group-IF.model.json';
    expect(await readFile(join(again, model), 'utf8')).toBe(await readFile(join(dir, 'autoencoder', model), 'utf8'));
  }, 180_000); // a full build: over 60 s once under a full suite with a bench beside it on 2 cores

  it('refuses a store whose model JSON was changed after the build (checksum)', async () => {
    const copy = join(dir, 'tampered');
    const b = await runCli('build', roster, '--store', copy, '--embed', 'pca', ...QUICK);
    expect(b.code, b.stderr).toBe(0);
    const file = join(copy, 'group-IF.model.json');
    const text = await readFile(file, 'utf8');
    // one digit of one weight changed: same length, still valid JSON, a different model
    const at = text.slice(text.indexOf('"components":[')).search(/[0-9]/) + text.indexOf('"components":[');
    const digit = text[at] === '1' ? '2' : '1';
    await writeFile(file, text.slice(0, at) + digit + text.slice(at + 1));
    expect(await readFile(file, 'utf8')).not.toBe(text);
    const r = await runCli('comps', target, '--store', copy, '--format', 'json');
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/group-IF\.model\.json has sha256 [0-9a-f]{64} \(expected [0-9a-f]{64}/);
    expect(r.stderr).toContain('[kindred.store.corrupt]');
  }, 180_000);

  it('writes the learning curve and drivers charts beside the store, and `kindred embedding` lists them', async () => {
    const store = join(dir, 'autoencoder');
    const r = await runCli('embedding', '--store', store, '--format', 'json');
    expect(r.code, r.stderr).toBe(0);
    const report = JSON.parse(r.stdout) as { space: string; groups: { group: string; space: string; chosen_size: number; search: { chosen: boolean; size: number }[]; charts: { learning: string | null; drivers: string | null } }[] };
    expect(report.space).toBe('autoencoder');
    const g = report.groups.find((x) => x.group === 'IF');
    expect(g?.space).toBe('autoencoder');
    expect(g?.search.filter((s) => s.chosen).map((s) => s.size)).toEqual([g?.chosen_size]);
    expect(g?.charts.learning).toBe(`${store}.charts/IF-learning.svg`);
    expect(g?.charts.drivers).toBe(`${store}.charts/IF-drivers.svg`);
    for (const path of [g?.charts.learning, g?.charts.drivers]) {
      expect((await readFile(path ?? '', 'utf8')).startsWith('<svg')).toBe(true);
    }
    const table = await runCli('embedding', '--store', store);
    expect(table.stdout).toContain('IF: autoencoder');
    expect(table.stdout).toContain(`${store}.charts/IF-drivers.svg`);
  });

  it('a rebuild without an embedding answers in the input space and removes the old charts', async () => {
    const store = join(dir, 'rebuilt');
    expect((await runCli('build', roster, '--store', store, '--embed', 'pca', ...QUICK)).code).toBe(0);
    expect((await stat(`${store}.charts`)).isDirectory()).toBe(true);
    const again = await runCli('build', roster, '--store', store, '--embed', 'none');
    expect(again.code, again.stderr).toBe(0);
    await expect(stat(`${store}.charts`)).rejects.toThrow();
    const r = await comps(store);
    expect(r.query.space).toBe('input');
  }, 180_000);

  it('--objective cross-season (linear: --hidden none --activation identity) trains on pairs of seasons, records it, and answers with attributions that add up', async () => {
    const store = join(dir, 'cross-season');
    const b = await runCli('build', roster, '--store', store, '--embed', 'autoencoder', '--objective', 'cross-season', '--hidden', 'none', '--activation', 'identity', '--latent', '4', ...QUICK);
    expect(b.code, b.stderr).toBe(0);
    const summary = JSON.parse(await readFile(join(store, 'group-IF.embedding.json'), 'utf8')) as { search: { rule: string }; training: { settings: { autoencoder: { objective: string } } } };
    expect(summary.search.rule).toMatch(/^cross-season objective \(\d+ pairs: a row and the same player's nearest other season\); fixed latent size 4; code distances made the decoder's \(isometric code\)$/);
    expect(summary.training.settings.autoencoder.objective).toBe('cross-season');
    const model = JSON.parse(await readFile(join(store, 'group-IF.model.json'), 'utf8')) as { hidden: number[]; layers: unknown[] };
    expect([model.hidden, model.layers.length]).toEqual([[], 2]);
    const r = await comps(store);
    expect(r.query.space).toBe('autoencoder');
    for (const c of r.comps) expect(c.dimensions.reduce((a, d) => a + (d.attribution ?? NaN), 0)).toBeCloseTo(c.attribution_total ?? NaN, 9);
    const bad = await runCli('build', roster, '--store', join(dir, 'y'), '--embed', 'autoencoder', '--objective', 'talent');
    expect(bad.code).toBe(2);
    expect(bad.stderr).toContain('expected reconstruct or cross-season');
  }, 180_000);

  it('refuses an unknown space with a usage error (exit code 2)', async () => {
    const r = await runCli('build', roster, '--store', join(dir, 'x'), '--embed', 'umap');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('expected none, pca, autoencoder');
  });
});
