/**
 * Filters and weights checked by their effect on the answer, not by agreement between two callers of
 * the same code: every comp satisfies each pool filter (and the filter removes someone), each
 * --weights multiplier scales exactly the weight it names, a preset moves the comps toward its skills,
 * and --weighting plain weighs every dimension alike (plain z-scores, common practice).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { rm } from 'node:fs/promises';
import { runCli } from '../helpers/runCli.ts';
import { simStore, type SimStore } from '../helpers/simStore.ts';
import type { CompsResult } from '../../src/query/CompsResult.ts';
import type { PositionGroup } from '../../src/profiles/positionGroup.ts';
import { WEIGHT_PRESETS } from '../../src/query/weightPresets.ts';

let s: SimStore;

interface Who {
  readonly id: string;
  readonly season: number;
  readonly level: string;
}

/** Player-seasons of a group with every dimension, spread over the group. */
function targets(group: PositionGroup, count: number): Who[] {
  const g = s.store.groups.get(group);
  if (!g) throw new Error(`no ${group} group`);
  const full: number[] = [];
  for (let r = 0; r < g.n; r++) if (g.z.subarray(r * g.d, (r + 1) * g.d).every((v) => !Number.isNaN(v))) full.push(r);
  return Array.from({ length: count }, (_, i) => {
    const r = full[Math.floor(((i + 0.5) * full.length) / count)] as number;
    return { id: s.store.players[g.player[r] as number]?.playerId ?? '', season: g.season[r] as number, level: s.store.levels[g.level[r] as number] ?? '' };
  });
}

async function comps(who: Who, ...args: string[]): Promise<CompsResult> {
  const r = await runCli('comps', who.id, '--season', String(who.season), '--level', who.level, '--store', s.storeDir, '--format', 'json', ...args);
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.stdout) as CompsResult;
}

const player = (id: string) => s.store.players.find((p) => p.playerId === id);

beforeAll(async () => {
  s = await simStore();
});
afterAll(async () => {
  await rm(s.dir, { recursive: true, force: true });
});

describe('pool filters, by their effect', () => {
  it('--pool-level: every comp is at a named level, and the pool shrinks', async () => {
    const [who] = targets('IF', 1);
    if (!who) throw new Error('no target');
    const levels = s.store.levels.slice(-2);
    const r = await comps(who, '--pool-level', levels.join(','));
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) expect(levels).toContain(c.level);
    expect(r.pool.eligible).toBeLessThan((await comps(who, '--level-span', 'all')).pool.eligible);
  });

  it('--pool-season: every comp season is inside the range', async () => {
    const [who] = targets('OF', 1);
    if (!who) throw new Error('no target');
    const from = who.season - 4;
    const to = who.season - 1;
    const r = await comps(who, '--pool-season', `${from}-${to}`);
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) expect(c.season >= from && c.season <= to, `${c.player_id} ${c.season}`).toBe(true);
    expect(r.pool.eligible).toBeLessThan((await comps(who)).pool.eligible);
  });

  it('--age: every comp is inside the age range', async () => {
    const [who] = targets('IF', 1);
    if (!who) throw new Error('no target');
    const r = await comps(who, '--age', '22-25');
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) expect(c.age !== null && c.age >= 22 && c.age <= 25, `${c.player_id} age ${c.age}`).toBe(true);
  });

  it('--bats and --throws: every comp bats and throws as asked', async () => {
    const [who] = targets('OF', 1);
    if (!who) throw new Error('no target');
    const lefties = await comps(who, '--bats', 'L');
    expect(lefties.comps.length).toBeGreaterThan(0);
    for (const c of lefties.comps) expect(player(c.player_id)?.bats, c.player_id).toBe('L');
    const [arm] = targets('SP', 1);
    if (!arm) throw new Error('no pitcher');
    const righties = await comps(arm, '--throws', 'R');
    expect(righties.comps.length).toBeGreaterThan(0);
    for (const c of righties.comps) expect(player(c.player_id)?.throws, c.player_id).toBe('R');
  });

  it('--pool-position: every comp played a named position', async () => {
    const [who] = targets('IF', 1);
    if (!who) throw new Error('no target');
    const r = await comps(who, '--pool-position', 'SS,2B');
    expect(r.comps.length).toBeGreaterThan(0);
    for (const c of r.comps) expect(['SS', '2B']).toContain(c.position);
  });

  it('never lists the target player, and lists each comp player once', async () => {
    for (const who of targets('C', 3)) {
      const r = await comps(who);
      const ids = r.comps.map((c) => c.player_id);
      expect(ids).not.toContain(who.id);
      expect(new Set(ids).size).toBe(ids.length);
    }
  });
});

describe('weights, by their effect', () => {
  /** (a'/b') / (a/b) with each share known to +-5e-5 (printed to four decimals): the interval it may be in. */
  function ratioBounds(a: number, b: number, a2: number, b2: number): [number, number] {
    const h = 5e-5;
    return [((a2 - h) / (b2 + h)) / ((a + h) / (b - h)), ((a2 + h) / (b2 - h)) / ((a - h) / (b + h))];
  }

  it('--weights name=2 doubles that dimension\'s weight against every other, which keep theirs', async () => {
    const [who] = targets('IF', 1);
    if (!who) throw new Error('no target');
    const before = (await comps(who)).pool.weights;
    const big = Object.entries(before).filter(([, w]) => w > 0.03).map(([n]) => n);
    const named = big[0];
    if (!named || big.length < 3) throw new Error('too few weighty dimensions');
    const after = (await comps(who, '--weights', `${named}=2`)).pool.weights;
    for (const other of big.slice(1)) {
      const [lo, hi] = ratioBounds(before[named] ?? NaN, before[other] ?? NaN, after[named] ?? NaN, after[other] ?? NaN);
      expect(lo <= 2 && 2 <= hi, `${named} against ${other}: ${lo}..${hi}`).toBe(true);
    }
    for (let i = 1; i + 1 < big.length; i++) {
      const a = big[i] as string;
      const b = big[i + 1] as string;
      const [lo, hi] = ratioBounds(before[a] ?? NaN, before[b] ?? NaN, after[a] ?? NaN, after[b] ?? NaN);
      expect(lo <= 1 && 1 <= hi, `${a} against ${b}: ${lo}..${hi}`).toBe(true);
    }
  });

  it('--weights name=0 takes that dimension out of every comp\'s distance', async () => {
    const [who] = targets('OF', 1);
    if (!who) throw new Error('no target');
    const weights = (await comps(who)).pool.weights;
    const named = Object.entries(weights).sort((a, b) => b[1] - a[1])[0]?.[0] ?? '';
    const r = await comps(who, '--weights', `${named}=0`);
    expect(r.pool.weights[named]).toBe(0);
    for (const c of r.comps) expect(c.dimensions.find((d) => d.name === named)?.share ?? 0).toBe(0);
  });

  it('--weighting plain weighs every dimension alike', async () => {
    const [who] = targets('SP', 1);
    if (!who) throw new Error('no target');
    const w = Object.values((await comps(who, '--weighting', 'plain')).pool.weights);
    expect(w.length).toBeGreaterThan(3);
    for (const x of w) expect(x).toBe(w[0]);
  });

  /** Mean grade gap between target and comp over the dimensions of the given families, over all comps. */
  function gapOn(results: readonly CompsResult[], families: ReadonlySet<string>, familyOf: ReadonlyMap<string, string>): number {
    let sum = 0;
    let n = 0;
    for (const r of results) {
      for (const c of r.comps) {
        for (const d of c.dimensions) {
          if (!families.has(familyOf.get(d.name) ?? '') || d.target_grade === null || d.comp_grade === null) continue;
          sum += Math.abs(d.target_grade - d.comp_grade);
          n++;
        }
      }
    }
    return sum / n;
  }

  it.each(['glove', 'bat'] as const)('--preset %s brings the comps closer on the skill families it gives more than the default (exact scan, 8 infielders)', async (preset) => {
    const dims = JSON.parse((await runCli('dims', '--position', 'SS', '--format', 'json')).stdout) as Record<string, { name: string; family: string }[]>;
    const familyOf = new Map(Object.values(dims).flat().map((d) => [d.name, d.family]));
    const shares: Readonly<Record<string, number>> = WEIGHT_PRESETS[preset];
    const balanced: Readonly<Record<string, number>> = WEIGHT_PRESETS.balanced;
    const up = new Set(Object.keys(shares).filter((f) => (shares[f] ?? 0) > (balanced[f] ?? 0)));
    expect(up.size).toBeGreaterThan(0);
    const who = targets('IF', 8);
    const plainDefault = await Promise.all(who.map((w) => comps(w, '--exact')));
    const weighted = await Promise.all(who.map((w) => comps(w, '--exact', '--preset', preset)));
    expect(gapOn(weighted, up, familyOf)).toBeLessThan(gapOn(plainDefault, up, familyOf));
  });
});
