import { describe, expect, it } from 'vitest';
import { BATTING_CHECKS } from '../../src/ingest/battingColumns.ts';
import type { AtMostCheck, ColumnTable } from '../../src/ingest/ColumnSpec.ts';
import { FIELDING_CHECKS } from '../../src/ingest/fieldingColumns.ts';
import { columnsOf, FILE_COLUMNS, isRequiredColumn, plausibleRange, ROSTER_FILES, tableOf } from '../../src/ingest/fileColumns.ts';
import { PITCHING_CHECKS } from '../../src/ingest/pitchingColumns.ts';

const SEASON_FILES = [
  ['batting.csv', BATTING_CHECKS],
  ['fielding.csv', FIELDING_CHECKS],
  ['pitching.csv', PITCHING_CHECKS],
] as const satisfies readonly (readonly [keyof typeof FILE_COLUMNS, readonly AtMostCheck[]])[];

function weightFields(table: ColumnTable): string[] {
  return table.flatMap((s) => {
    if (s.combine === undefined || s.combine === 'sum') return [];
    return [s.combine.mean, s.combine.fallback].flatMap((w) => (w === undefined ? [] : typeof w === 'string' ? [w] : [w.field, ...w.minus]));
  });
}

describe('the column tables (one per roster file)', () => {
  it('name each CSV column and each record field once per file', () => {
    for (const file of ROSTER_FILES) {
      const table = tableOf(file);
      expect(new Set(table.map((s) => s.csv)).size, file).toBe(table.length);
      expect(new Set(table.map((s) => s.field)).size, file).toBe(table.length);
    }
  });
  it('give every season file a player, season, level and team column, and every value column a combine rule', () => {
    for (const [file] of SEASON_FILES) {
      const table = tableOf(file);
      for (const kind of ['player', 'season', 'level', 'team']) expect(table.filter((s) => s.kind === kind), `${file} ${kind}`).toHaveLength(1);
      const values = table.filter((s) => ['count', 'thirds', 'measure', 'percent'].includes(s.kind));
      for (const s of values) expect(s.combine, `${file} ${s.csv}`).toBeDefined();
    }
  });
  it('weight means only by count or thirds fields of the same file, the fallback a required one', () => {
    for (const [file] of SEASON_FILES) {
      const table = tableOf(file);
      for (const f of weightFields(table)) {
        const spec = table.find((s) => s.field === f);
        expect(spec?.kind === 'count' || spec?.kind === 'thirds', `${file} weight ${f}`).toBe(true);
      }
      for (const s of table) {
        if (s.combine === undefined || s.combine === 'sum' || s.combine.fallback === undefined) continue;
        const fb = s.combine.fallback;
        const name = typeof fb === 'string' ? fb : fb.field;
        expect(table.find((t) => t.field === name)?.required, `${file} ${s.csv} fallback`).toBe(true);
      }
    }
  });
  it('give a plausible range (min < max) to every measure and check only columns the file has', () => {
    for (const [file, checks] of SEASON_FILES) {
      for (const s of tableOf(file)) {
        if (s.kind !== 'measure') continue;
        const r = plausibleRange(file, s.csv);
        expect(r.min, `${file} ${s.csv}`).toBeLessThan(r.max);
      }
      const names = new Set(columnsOf(file));
      for (const c of checks) for (const n of [c.at, c.atMost, ...c.sum]) expect(names.has(n), `${file} check ${n}`).toBe(true);
    }
  });
  it('list required columns first (the order messages use): batting.csv starts player_id, season, level, PA', () => {
    expect(columnsOf('batting.csv').slice(0, 4)).toEqual(['player_id', 'season', 'level', 'PA']);
    expect(isRequiredColumn('batting.csv', 'PA')).toBe(true);
    expect(isRequiredColumn('batting.csv', 'team')).toBe(false);
    expect(() => plausibleRange('batting.csv', 'PA')).toThrow(/no measured column PA/);
  });
});
