/**
 * Three outfielders and three starting pitchers of one invented season and level, written as roster
 * CSV files, built into a store and read back (tests/helpers/handStore.ts): the stored raw,
 * regressed and standardised values against the formulas worked by hand.
 *
 * Sources: Official Baseball Rules, "Determining Percentage Records" (OBP, SLG, ERA; rule number
 * from memory); common practice for K%, FIP and its league constant (from memory), for regression to
 * the mean as a weighted average with k league-average events, (x + k * league) / (n + k), and for the
 * z-score with the sample standard deviation (n - 1).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import type { ProfileStore, StoredGroup } from '../../src/store/ProfileStore.ts';
import { handStore } from '../helpers/handStore.ts';

let store: ProfileStore;

beforeAll(async () => {
  store = await handStore();
}, 60_000);

/** raw and z of one player's row for one dimension, and the dimension's stratum figures. */
function cell(groupName: 'OF' | 'SP', playerId: string, dim: string): { raw: number; z: number; mean: number; sd: number } {
  const g: StoredGroup | undefined = store.groups.get(groupName);
  if (!g) throw new Error(`no group ${groupName}`);
  const j = g.dims.findIndex((d) => d.name === dim);
  const r = Array.from(g.player).findIndex((p) => store.players[p]?.playerId === playerId);
  expect(j, dim).toBeGreaterThanOrEqual(0);
  expect(r, playerId).toBeGreaterThanOrEqual(0);
  const stratum = g.strata.get(dim)?.get(`2024|High|${groupName}`);
  return { raw: g.raw[r * g.d + j] ?? NaN, z: g.z[r * g.d + j] ?? NaN, mean: stratum?.mean ?? NaN, sd: stratum?.sd ?? NaN };
}

/** Mean and sample standard deviation (n - 1) of three values, as in any statistics textbook. */
function meanSd(xs: readonly [number, number, number]): { mean: number; sd: number } {
  const mean = (xs[0] + xs[1] + xs[2]) / 3;
  const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / 2);
  return { mean, sd };
}

function expectColumn(
  group: 'OF' | 'SP',
  dim: string,
  ids: readonly [string, string, string],
  raw: readonly [number, number, number],
  regressed: readonly [number, number, number],
): void {
  const { mean, sd } = meanSd(regressed);
  ids.forEach((id, i) => {
    const c = cell(group, id, dim);
    expect(c.raw, `${dim} raw ${id}`).toBeCloseTo(raw[i] ?? NaN, 5);
    expect(c.z, `${dim} z ${id}`).toBeCloseTo(((regressed[i] ?? NaN) - mean) / sd, 4);
    expect(c.mean, `${dim} stratum mean`).toBeCloseTo(mean, 6);
    expect(c.sd, `${dim} stratum sd`).toBeCloseTo(sd, 6);
  });
}

const HITTERS = ['h1', 'h2', 'h3'] as const;

describe('hitter dimensions stored from a hand-made roster', () => {
  it('stores OBP (H + BB + HBP) / (AB + BB + HBP + SF), regressed by 460 PA toward the league 408 / 1200', () => {
    // on base 175, 126, 107 in 500, 400, 300; league .340
    const lg = 408 / 1200;
    expectColumn('OF', 'obp', HITTERS, [175 / 500, 126 / 400, 107 / 300], [
      (175 + 460 * lg) / (500 + 460),
      (126 + 460 * lg) / (400 + 460),
      (107 + 460 * lg) / (300 + 460),
    ]);
  });

  it('stores SLG TB / AB with TB = H + 2B + 2 3B + 3 HR, regressed by 320 AB toward the league 439 / 1070', () => {
    // TB: 120 + 25 + 4 + 45 = 194; 90 + 20 + 2 + 24 = 136; 81 + 10 + 6 + 12 = 109
    const lg = 439 / 1070;
    expectColumn('OF', 'slg', HITTERS, [194 / 440, 136 / 360, 109 / 270], [
      (194 + 320 * lg) / (440 + 320),
      (136 + 320 * lg) / (360 + 320),
      (109 + 320 * lg) / (270 + 320),
    ]);
  });

  it('stores K% SO / PA, regressed by 60 PA toward the league 235 / 1200', () => {
    const lg = 235 / 1200;
    expectColumn('OF', 'k_pct', HITTERS, [100 / 500, 90 / 400, 45 / 300], [
      (100 + 60 * lg) / (500 + 60),
      (90 + 60 * lg) / (400 + 60),
      (45 + 60 * lg) / (300 + 60),
    ]);
  });

  it('stores average exit velocity as measured, regressed by 50 BBE toward the BBE-weighted league mean', () => {
    // league (90 * 330 + 87 * 260 + 88.5 * 210) / 800 = 70905 / 800 = 88.63125
    const lg = 70905 / 800;
    expectColumn('OF', 'ev_avg_mph', HITTERS, [90, 87, 88.5], [
      (90 * 330 + 50 * lg) / (330 + 50),
      (87 * 260 + 50 * lg) / (260 + 50),
      (88.5 * 210 + 50 * lg) / (210 + 50),
    ]);
  });

  it('stores the steal attempt rate (SB + CS) / (1B + BB + HBP) unregressed', () => {
    // singles 120 - 42 = 78, 90 - 29 = 61, 81 - 17 = 64
    expectColumn('OF', 'sb_att_rate', HITTERS, [15 / 133, 24 / 97, 4 / 90], [15 / 133, 24 / 97, 4 / 90]);
  });
});

describe('pitcher dimensions stored from a hand-made roster', () => {
  const PITCHERS = ['p1', 'p2', 'p3'] as const;

  it('stores raw FIP with the league constant: lgERA 9 * 165 / 360 = 4.125 minus (494 + 396 - 680) / 360', () => {
    // league: outs 1080 (360 IP), ER 165, HR 38, BB 120, HBP 12, SO 340
    const C = 4.125 - 210 / 360;
    const raw: [number, number, number] = [
      (13 * 15 + 3 * 50 - 2 * 160) / 150 + C,
      (13 * 12 + 3 * 44 - 2 * 110) / 120 + C,
      (13 * 11 + 3 * 38 - 2 * 70) / 90 + C,
    ];
    PITCHERS.forEach((id, i) => expect(cell('SP', id, 'fip').raw, id).toBeCloseTo(raw[i] ?? NaN, 4));
    // the league's own FIP equals its ERA: innings-weighted raw FIP is 4.125
    expect((150 * raw[0] + 120 * raw[1] + 90 * raw[2]) / 360).toBeCloseTo(4.125, 10);
  });

  it('stores K% SO / BF, regressed by 70 BF toward the league 340 / 1520', () => {
    const lg = 340 / 1520;
    expectColumn('SP', 'k_pct', PITCHERS, [160 / 620, 110 / 510, 70 / 390], [
      (160 + 70 * lg) / (620 + 70),
      (110 + 70 * lg) / (510 + 70),
      (70 + 70 * lg) / (390 + 70),
    ]);
  });
});
