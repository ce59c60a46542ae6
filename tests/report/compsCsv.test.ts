import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import type { CompsResult } from '../../src/query/CompsResult.ts';
import { compsCsv } from '../../src/report/compsCsv.ts';

const result: CompsResult = {
  query: {
    kind: 'player', player_id: '=p1', name: 'Ann Example', season: 2021, level: 'AA', position: 'C', group: 'C',
    age: 23, profile: { obp: 0.35 }, k: 1, method: 'exact', space: 'input',
  },
  pool: { group_size: 2, eligible: 1, filters: {}, weights: { obp: 1 }, preset: 'balanced', family_shares: { discipline: 1 }, sample_floor: null, summary: 'C' },
  comps: [{
    rank: 1, player_id: 'p2', name: '=HYPERLINK("http://example.invalid","click")', season: 2020, level: '+AA',
    position: 'C', age: 24, sample: 410, sample_unit: 'PA', ip: null, likeness: 90, distance: 0.4, coverage: 1, alike: ['obp'], apart: [],
    dimensions: [{ name: 'obp', target: 0.35, comp: 0.34, target_grade: 55, comp_grade: 54, share: 1, missing: false }],
  }],
};

describe('compsCsv(result)', () => {
  it('writes names and ids that begin with = + - @ as text, apostrophe first (OWASP CSV injection guidance)', () => {
    const rows: string[][] = parse(compsCsv(result));
    const head = rows[0] ?? [];
    const row = rows[1] ?? [];
    expect(row[head.indexOf('name')]).toBe('\'=HYPERLINK("http://example.invalid","click")');
    expect(row[head.indexOf('level')]).toBe("'+AA");
    expect(row[head.indexOf('target_player_id')]).toBe("'=p1");
    expect(row[head.indexOf('obp')]).toBe('0.34');
  });
});
