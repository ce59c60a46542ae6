import { describe, expect, it } from 'vitest';
import { csvCell, toCsv } from '../../src/web/exportTable.ts';
import { compsCsv } from '../../src/report/compsCsv.ts';
import { compsCsvRecords } from '../../src/report/compsCsvRecords.ts';
import { stringifyCsv } from '../../src/text/stringifyCsv.ts';
import type { CompsResult } from '../../src/query/CompsResult.ts';

describe('toCsv(records) for the page download', () => {
  it('quotes as RFC 4180 and writes formula-like text as text (OWASP CSV injection guidance)', () => {
    expect(toCsv([['name', 'HR'], ['@SUM(A1)', 12], ['a,b', -3]])).toBe("name,HR\n'@SUM(A1),12\n\"a,b\",-3\n");
    expect(csvCell('=1+1')).toBe("'=1+1");
    expect(csvCell(null)).toBe('');
  });
  it('writes the comps exactly as the CLI does (csv-stringify, the reference writer), values and flags included', () => {
    const result: CompsResult = {
      query: { kind: 'player', player_id: 'p1', name: 'Ann Example', season: 2021, level: 'High', position: 'C', group: 'C', age: 23, profile: { obp: 0.35 }, k: 1, method: 'exact', space: 'input' },
      pool: { group_size: 2, eligible: 1, filters: {}, weights: { obp: 1, k_pct: 1 }, preset: 'balanced', family_shares: { discipline: 1 }, sample_floor: null, summary: 'C' },
      comps: [{
        rank: 1, player_id: 'p2', name: 'Lee "Ace" Doe, Jr.', season: 2020, level: 'High', position: 'C', age: null, sample: 410, sample_unit: 'PA', ip: null,
        likeness: 90.3, distance: 0.4, coverage: 1, alike: ['obp', 'k_pct'], apart: [],
        dimensions: [
          { name: 'obp', target: 0.35, comp: 0.34, target_grade: 55, comp_grade: 54, share: 0.25, missing: false },
          { name: 'k_pct', target: 0.2, comp: null, target_grade: 50, comp_grade: null, share: 0, missing: true },
        ],
      }],
    };
    const page = toCsv(compsCsvRecords(result));
    expect(page).toBe(compsCsv(result));
    const flagged = [{ name: 'frontier', value: () => true }, { name: 'censored', value: () => false }];
    expect(toCsv(compsCsvRecords(result, flagged))).toBe(stringifyCsv(compsCsvRecords(result, flagged)));
    expect(page.split('\n')[1]).toContain(',obp;k_pct,,0.34,54,0.25,,,0');
  });
});
