import { readdir, rm } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { plausibleRange } from '../../src/ingest/fileColumns.ts';
import { readCsv, smallLeague, writeToTemp } from './smallLeague.ts';

const league = smallLeague();
let dir = '';
let files: Record<string, number> = {};
const tables: Record<string, { header: string[]; rows: Record<string, string>[]; text: string }> = {};
const LEVELS = ['Entry', 'Low', 'Mid', 'High', 'Elite', 'Top'];
const TRACKED = new Set(['High', 'Elite', 'Top']);
const last = league.options.lastSeason;

beforeAll(async () => {
  ({ dir, files } = await writeToTemp(league));
  for (const f of ['levels.csv', 'players.csv', 'batting.csv', 'fielding.csv', 'pitching.csv', 'contracts.csv']) {
    tables[f] = await readCsv(dir, f);
  }
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

function rowsOf(file: string): Record<string, string>[] {
  return tables[file]?.rows ?? [];
}

/** A written count: a whole number, never negative. */
function count(row: Record<string, string>, col: string): number {
  const v = row[col] ?? '';
  expect(v, `${col} in ${JSON.stringify(row)}`).toMatch(/^\d+$/);
  return Number(v);
}

const THIRDS = /^\d+\.[012]$/; // thirds notation (common practice): .0, .1 or .2 only
const outs = (text: string): number => {
  const [w, t] = text.split('.');
  return Number(w) * 3 + Number(t);
};

describe('writeLeagueCsv(league, dir)', () => {
  it('writes every file with the canonical header and reports the data rows written', async () => {
    expect(tables['levels.csv']?.header).toEqual(['level']);
    expect(rowsOf('levels.csv').map((r) => r['level'])).toEqual(LEVELS);
    expect(tables['players.csv']?.header).toEqual(['player_id', 'name', 'birth_date', 'bats', 'throws']);
    expect(tables['batting.csv']?.header.join(',')).toBe(
      'player_id,season,level,team,G,PA,AB,H,2B,3B,HR,BB,IBB,HBP,SF,SO,SB,CS,bbe,ev_avg_mph,ev_p90_mph,la_avg_deg,hard_hit_pct,la_band_pct,run_speed_ft_s');
    expect(tables['fielding.csv']?.header.join(',')).toBe(
      'player_id,season,level,team,pos,G,inn,PO,A,E,arm_mph,pop_2b_s,exchange_s,sb_against,cs_caught');
    expect(tables['pitching.csv']?.header.join(',')).toBe(
      'player_id,season,level,team,G,GS,IP,BF,H,HR,BB,HBP,SO,ER,fb_mph,fb_spin_rpm,whiff_pct,gb_pct');
    expect(tables['contracts.csv']?.header).toEqual(['player_id', 'season', 'salary_usd']);
    for (const [f, n] of Object.entries(files)) expect(rowsOf(f).length, f).toBe(n);
    expect(files['batting.csv']).toBe(league.batting.length);
    const left = (await readdir(dir)).filter((f) => f.endsWith('.tmp'));
    expect(left).toEqual([]);
  });

  it('writes players with unique ids, ISO dates and L/R/S handedness', () => {
    const ids = new Set<string>();
    for (const p of rowsOf('players.csv')) {
      expect(p['player_id']).toMatch(/^p\d{6,}$/);
      expect(ids.has(p['player_id'] ?? '')).toBe(false);
      ids.add(p['player_id'] ?? '');
      expect(p['name']).toMatch(/^[A-Z][a-z]+ [A-Z][a-z]+$/);
      const d = new Date(`${p['birth_date'] ?? ''}T00:00:00Z`);
      expect(d.toISOString().slice(0, 10)).toBe(p['birth_date']);
      expect(['L', 'R', 'S']).toContain(p['bats']);
      expect(['L', 'R']).toContain(p['throws']);
    }
    for (const f of ['batting.csv', 'fielding.csv', 'pitching.csv', 'contracts.csv']) {
      for (const r of rowsOf(f)) expect(ids.has(r['player_id'] ?? '')).toBe(true);
    }
  });

  it('keeps every batting row consistent (PA >= AB+BB+HBP+SF, H <= AB, 2B+3B+HR <= H, IBB <= BB, SO <= AB, bbe <= AB-SO)', () => {
    for (const r of rowsOf('batting.csv')) {
      expect(LEVELS).toContain(r['level']);
      const [PA, AB, H, D, T, HR, BB, IBB, HBP, SF, SO] = ['PA', 'AB', 'H', '2B', '3B', 'HR', 'BB', 'IBB', 'HBP', 'SF', 'SO'].map((c) => count(r, c));
      expect(PA).toBeGreaterThanOrEqual((AB ?? 0) + (BB ?? 0) + (HBP ?? 0) + (SF ?? 0));
      expect(H).toBeLessThanOrEqual(AB ?? 0);
      expect((D ?? 0) + (T ?? 0) + (HR ?? 0)).toBeLessThanOrEqual(H ?? 0);
      expect(IBB).toBeLessThanOrEqual(BB ?? 0);
      expect(SO).toBeLessThanOrEqual(AB ?? 0);
      count(r, 'G'); count(r, 'SB'); count(r, 'CS');
      if (r['bbe'] !== '') expect(count(r, 'bbe')).toBeLessThanOrEqual((AB ?? 0) - (SO ?? 0));
      if (r['ev_avg_mph'] !== '') expect(Number(r['ev_p90_mph'])).toBeGreaterThan(Number(r['ev_avg_mph']));
      for (const pct of ['hard_hit_pct', 'la_band_pct']) {
        if (r[pct] !== '') {
          expect(Number(r[pct])).toBeGreaterThanOrEqual(0);
          expect(Number(r[pct])).toBeLessThanOrEqual(100);
        }
      }
      for (const m of ['ev_avg_mph', 'ev_p90_mph', 'la_avg_deg', 'run_speed_ft_s'] as const) {
        if (r[m] === '') continue;
        expect(Number(r[m])).toBeGreaterThanOrEqual(plausibleRange('batting.csv', m).min);
        expect(Number(r[m])).toBeLessThanOrEqual(plausibleRange('batting.csv', m).max);
      }
    }
  });

  it('keeps every fielding row consistent (thirds notation, catcher-only columns, cs_caught <= sb_against)', () => {
    for (const r of rowsOf('fielding.csv')) {
      expect(['C', '1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF']).toContain(r['pos']);
      expect(r['inn']).toMatch(THIRDS);
      expect(count(r, 'G')).toBeGreaterThanOrEqual(1);
      count(r, 'PO'); count(r, 'A'); count(r, 'E');
      if (r['pos'] === 'C') {
        expect(count(r, 'cs_caught')).toBeLessThanOrEqual(count(r, 'sb_against'));
        if (r['pop_2b_s'] !== '') {
          expect(Number(r['pop_2b_s'])).toBeGreaterThanOrEqual(plausibleRange('fielding.csv', 'pop_2b_s').min);
          expect(Number(r['pop_2b_s'])).toBeLessThanOrEqual(plausibleRange('fielding.csv', 'pop_2b_s').max);
          expect(Number(r['exchange_s'])).toBeLessThan(Number(r['pop_2b_s']));
        }
      } else {
        for (const c of ['pop_2b_s', 'exchange_s', 'sb_against', 'cs_caught']) expect(r[c]).toBe('');
      }
      if (r['arm_mph'] !== '') {
        expect(Number(r['arm_mph'])).toBeGreaterThanOrEqual(plausibleRange('fielding.csv', 'arm_mph').min);
        expect(Number(r['arm_mph'])).toBeLessThanOrEqual(plausibleRange('fielding.csv', 'arm_mph').max);
      }
    }
  });

  it('keeps every pitching row consistent (GS <= G, H <= BF, HR <= H, thirds notation, percent 0..100)', () => {
    let starters = 0, relievers = 0;
    for (const r of rowsOf('pitching.csv')) {
      const G = count(r, 'G'), GS = count(r, 'GS'), BF = count(r, 'BF'), H = count(r, 'H'), HR = count(r, 'HR');
      expect(GS).toBeLessThanOrEqual(G);
      expect(H).toBeLessThanOrEqual(BF);
      expect(HR).toBeLessThanOrEqual(H);
      expect(r['IP']).toMatch(THIRDS);
      expect(outs(r['IP'] ?? '')).toBeLessThanOrEqual(BF);
      count(r, 'BB'); count(r, 'HBP'); count(r, 'SO'); count(r, 'ER');
      if (GS === 0) relievers++;
      if (GS >= G - 4 && GS > 0) starters++;
      for (const pct of ['whiff_pct', 'gb_pct']) {
        if (r[pct] === '') continue;
        expect(Number(r[pct])).toBeGreaterThanOrEqual(0);
        expect(Number(r[pct])).toBeLessThanOrEqual(100);
      }
      for (const m of ['fb_mph', 'fb_spin_rpm'] as const) {
        if (r[m] === '') continue;
        expect(Number(r[m])).toBeGreaterThanOrEqual(plausibleRange('pitching.csv', m).min);
        expect(Number(r[m])).toBeLessThanOrEqual(plausibleRange('pitching.csv', m).max);
      }
    }
    expect(starters).toBeGreaterThan(100);
    expect(relievers).toBeGreaterThan(100);
  });

  it('leaves measurements missing (empty, never 0) before their first season and below High, and fills them later', () => {
    const from = league.options.measuredFrom;
    const checks: [string, string, number, boolean][] = [
      ['batting.csv', 'ev_avg_mph', from.battedBall, true],
      ['batting.csv', 'bbe', from.battedBall, true],
      ['batting.csv', 'run_speed_ft_s', from.sprint, true],
      ['fielding.csv', 'arm_mph', from.arm, true],
      ['fielding.csv', 'pop_2b_s', from.catcherTiming, true],
      ['pitching.csv', 'fb_mph', from.pitchTracking, true],
      ['pitching.csv', 'whiff_pct', from.pitchTracking, true],
      ['pitching.csv', 'gb_pct', from.groundball, false],
    ];
    for (const [file, col, first, trackedOnly] of checks) {
      let filled = 0;
      for (const r of rowsOf(file)) {
        const measurable = Number(r['season']) >= first && (!trackedOnly || TRACKED.has(r['level'] ?? ''));
        if (!measurable) expect(r[col], `${file} ${col} ${JSON.stringify(r)}`).toBe('');
        else if (r[col] !== '') filled++;
      }
      expect(filled, `${file} ${col}`).toBeGreaterThan(10);
    }
    expect(from.battedBall).toBe(last - 9);
  });

  it('includes split seasons, second positions, DH-only hitters and top-level contracts', () => {
    const stints = new Map<string, Set<string>>();
    const levels = new Map<string, Set<string>>();
    for (const r of rowsOf('batting.csv')) {
      const k = `${r['player_id']}|${r['season']}`;
      const kl = `${k}|${r['level']}`;
      if (!stints.has(kl)) stints.set(kl, new Set());
      stints.get(kl)?.add(r['team'] ?? '');
      if (!levels.has(k)) levels.set(k, new Set());
      levels.get(k)?.add(r['level'] ?? '');
    }
    expect([...stints.values()].filter((s) => s.size > 1).length).toBeGreaterThan(5);
    expect([...levels.values()].filter((s) => s.size > 1).length).toBeGreaterThan(5);
    const positions = new Map<string, Set<string>>();
    for (const r of rowsOf('fielding.csv')) {
      const k = `${r['player_id']}|${r['season']}`;
      if (!positions.has(k)) positions.set(k, new Set());
      positions.get(k)?.add(r['pos'] ?? '');
    }
    expect([...positions.values()].filter((s) => s.size > 1).length).toBeGreaterThan(20);
    const fielded = new Set(rowsOf('fielding.csv').map((r) => r['player_id']));
    const hitters = new Set(rowsOf('batting.csv').map((r) => r['player_id']));
    expect([...hitters].filter((h) => !fielded.has(h)).length).toBeGreaterThan(5);

    const topSeasons = new Set(rowsOf('batting.csv').concat(rowsOf('pitching.csv')).filter((r) => r['level'] === 'Top').map((r) => `${r['player_id']}|${r['season']}`));
    const salaries = rowsOf('contracts.csv').map((r) => {
      expect(topSeasons.has(`${r['player_id']}|${r['season']}`)).toBe(true);
      return count(r, 'salary_usd');
    }).sort((a, b) => a - b);
    expect(salaries.length).toBeGreaterThan(0.8 * topSeasons.size);
    expect(salaries.length).toBeLessThan(topSeasons.size);
    // A wide spread: the top decile earns several times the median.
    const at = (q: number): number => salaries[Math.floor(q * (salaries.length - 1))] ?? 0;
    expect(at(0.9)).toBeGreaterThan(3 * at(0.5));
  });

  it('writes byte-identical files for the same seed', async () => {
    const again = await writeToTemp(smallLeague());
    try {
      for (const f of ['players.csv', 'batting.csv', 'fielding.csv', 'pitching.csv', 'contracts.csv']) {
        const other = await readCsv(again.dir, f);
        expect(other.text === tables[f]?.text, f).toBe(true);
      }
    } finally {
      await rm(again.dir, { recursive: true, force: true });
    }
  });
});
