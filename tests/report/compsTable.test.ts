/**
 * The comps table and CSV as a reader gets them, checked against their layout (README "Quick start"):
 * at most 100 columns, no trailing spaces, the columns # Player Season Lvl Pos Age Like Cov "Alike / apart"
 * in that order with each value under its heading, the player id on the line below, a grid with one
 * row per dimension and one column per comp; and every value the same as in the JSON answer.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rm } from 'node:fs/promises';
import { parse } from 'csv-parse/sync';
import { runCli } from '../helpers/runCli.ts';
import { simStore, type SimStore } from '../helpers/simStore.ts';
import type { CompsResult } from '../../src/query/CompsResult.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';

/** The table's headings; the playing-time column says PA for hitters and BF for pitchers. */
const headingsFor = (unit: string): string[] => ['#', 'Player', 'Season', 'Lvl', 'Pos', 'Age', ...(unit === 'BF' ? ['BF', 'IP'] : ['PA']), 'Like', 'Cov', 'Alike / apart'];
let s: SimStore;

function someTarget(group: PositionGroup): string[] {
  const g = s.store.groups.get(group);
  if (!g) throw new Error(`no ${group}`);
  const r = Math.floor(g.n / 2);
  return [s.store.players[g.player[r] as number]?.playerId ?? '', '--season', String(g.season[r]), '--level', s.store.levels[g.level[r] as number] ?? ''];
}

beforeAll(async () => {
  s = await simStore();
});
afterAll(async () => {
  await rm(s.dir, { recursive: true, force: true });
});

describe.each(['C', 'IF', 'OF', 'SP', 'RP'] as const)('comps table for a %s target', (group) => {
  it('fits 100 columns without trailing spaces and puts each value of the answer under its heading', async () => {
    const args = [...someTarget(group), '--store', s.storeDir, '--k', '5'];
    const table = await runCli('comps', ...args);
    const answer = JSON.parse((await runCli('comps', ...args, '--format', 'json')).stdout) as CompsResult;
    expect(table.code).toBe(0);
    const lines = table.stdout.split('\n');
    for (const line of lines) {
      expect(line.length, line).toBeLessThanOrEqual(100);
      expect(line, 'trailing space').not.toMatch(/\s$/);
    }
    const h = lines.findIndex((l) => l.trimStart().startsWith('#  Player'));
    expect(h).toBeGreaterThan(0);
    const head = lines[h] ?? '';
    const HEADINGS = headingsFor(answer.comps[0]?.sample_unit ?? 'PA');
    const at = HEADINGS.map((t) => head.indexOf(t));
    expect(at.every((x, i) => x >= 0 && (i === 0 || x > (at[i - 1] ?? 0))), `headings in order: ${head}`).toBe(true);
    answer.comps.forEach((c, i) => {
      const row = lines[h + 1 + 2 * i] ?? '';
      const idLine = lines[h + 2 + 2 * i] ?? '';
      // right-aligned numbers end where their heading ends
      const end = (k: number): number => (at[k] ?? 0) + (HEADINGS[k] ?? '').length;
      const cell = (k: number): string => row.slice(end(k - 1), end(k)).trim();
      expect(row.slice(0, at[1]).trim()).toBe(String(c.rank));
      expect(row.slice(at[1], at[2]).trim()).toBe(c.name);
      // the default profiles are windows of 5 seasons: a window that spans seasons reads 2019-21 (README "Profiles over several seasons")
      const span = c.seasons && c.seasons[0] !== c.seasons[1] ? `${c.seasons[0]}-${String(c.seasons[1]).slice(2)}` : String(c.season);
      expect(row.slice(at[2], at[3]).trim()).toBe(span);
      expect(row.slice(at[3], at[4]).trim()).toBe(c.level);
      expect(row.slice(at[4], at[5]).trim()).toBe(c.position);
      expect(cell(5)).toBe(c.age === null ? '-' : String(c.age));
      expect(cell(6)).toBe(String(c.sample));
      // pitchers: innings pitched in thirds notation (common practice: 150.1 is 150 1/3) beside BF
      const ip = c.sample_unit === 'BF' ? 1 : 0;
      if (ip) expect(cell(7)).toMatch(/^\d+\.[012]$/);
      if (ip) expect(cell(7)).toBe(c.ip);
      expect(cell(7 + ip)).toBe(String(Math.round(c.likeness)));
      expect(cell(8 + ip)).toBe(`${Math.round(100 * c.coverage)}%`);
      expect(idLine.trim().startsWith(c.player_id)).toBe(true);
    });
    const grid = lines.findIndex((l) => l.startsWith('Dimension'));
    expect(grid).toBeGreaterThan(h);
    expect((lines[grid] ?? '').split(/\s+/)).toEqual(['Dimension', 'Target', ...answer.comps.map((c) => `#${c.rank}`)]);
    // one row per dimension that the target or one of the comps has
    const shown = Object.keys(answer.pool.weights).filter((n) => n in answer.query.profile || answer.comps.some((c) => c.dimensions.some((d) => d.name === n && d.comp !== null)));
    const dimCount = shown.length;
    const gridRows = lines.slice(grid + 1, grid + 1 + dimCount);
    expect(gridRows).toHaveLength(dimCount);
    for (const r of gridRows) expect(r.trim().split(/\s{2,}/).length, r).toBeGreaterThanOrEqual(2);
    expect(lines[grid + 1 + dimCount]?.startsWith('Like:'), 'the key follows the grid').toBe(true);
  });

  it('writes the same comps as CSV: one row per comp, values as in the JSON answer', async () => {
    const args = [...someTarget(group), '--store', s.storeDir, '--k', '5'];
    const csv = await runCli('comps', ...args, '--format', 'csv');
    const answer = JSON.parse((await runCli('comps', ...args, '--format', 'json')).stdout) as CompsResult;
    const rows = parse(csv.stdout, { columns: true }) as Record<string, string>[];
    expect(rows).toHaveLength(answer.comps.length);
    rows.forEach((r, i) => {
      const c = answer.comps[i];
      if (!c) throw new Error('missing comp');
      expect([r['rank'], r['player_id'], r['season'], r['level'], r['position']]).toEqual([String(c.rank), c.player_id, String(c.season), c.level, c.position]);
      expect(Number(r['likeness'])).toBeCloseTo(c.likeness, 6);
      expect(Number(r['distance'])).toBeCloseTo(c.distance, 6);
    });
  });
});
