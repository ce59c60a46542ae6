import { describe, expect, it } from 'vitest';
import { battingLine } from '../../src/sim/battingLine.ts';
import { BATTING_COLUMNS, columnAt } from '../../src/sim/fileSchemas.ts';
import { LEVEL_TOP } from '../../src/sim/levelTable.ts';
import { SeededRandom } from '../../src/random/SeededRandom.ts';
import { H_CONTACT, H_EYE, H_POWER, HITTER_TALENTS } from '../../src/sim/talentNames.ts';

const col = (name: string): number => columnAt(BATTING_COLUMNS, name);

/** Mean ISO, EV, hard-hit%, K% and BB% over many 600-PA lines of one talent vector. */
function average(set: (t: Float64Array) => void, seed: number) {
  const rng = new SeededRandom(seed);
  const t = new Float64Array(HITTER_TALENTS.length).fill(0.5);
  set(t);
  const row = new Float64Array(BATTING_COLUMNS.length);
  const sums = { iso: 0, ev: 0, hard: 0, k: 0, bb: 0 };
  const n = 300;
  for (let i = 0; i < n; i++) {
    battingLine(rng, t, LEVEL_TOP, 600, 150, true, true, row);
    const ab = row[col('AB')] ?? 0;
    const tb = (row[col('H')] ?? 0) + (row[col('2B')] ?? 0) + 2 * (row[col('3B')] ?? 0) + 3 * (row[col('HR')] ?? 0);
    sums.iso += (tb - (row[col('H')] ?? 0)) / ab;
    sums.ev += row[col('ev_avg_mph')] ?? 0;
    sums.hard += row[col('hard_hit_pct')] ?? 0;
    sums.k += (row[col('SO')] ?? 0) / 600;
    sums.bb += (row[col('BB')] ?? 0) / 600;
  }
  return { iso: sums.iso / n, ev: sums.ev / n, hard: sums.hard / n, k: sums.k / n, bb: sums.bb / n };
}

describe('battingLine(rng, talents, level, pa, ...)', () => {
  it('gives more power talent a higher ISO, exit velocity and hard-hit rate on average (model invariant)', () => {
    const weak = average((t) => { t[H_POWER] = -0.5; }, 1);
    const strong = average((t) => { t[H_POWER] = 1.5; }, 2);
    expect(strong.iso).toBeGreaterThan(weak.iso + 0.04);
    expect(strong.ev).toBeGreaterThan(weak.ev + 2);
    expect(strong.hard).toBeGreaterThan(weak.hard + 5);
  });

  it('gives more contact fewer strikeouts and more eye more walks on average (model invariant)', () => {
    const base = average(() => undefined, 3);
    const contact = average((t) => { t[H_CONTACT] = 2; }, 4);
    const eye = average((t) => { t[H_EYE] = 2; }, 5);
    expect(contact.k).toBeLessThan(base.k - 0.03);
    expect(eye.bb).toBeGreaterThan(base.bb + 0.02);
  });

  it('keeps every count consistent (PA >= AB+BB+HBP+SF, H <= AB, XBH <= H, IBB <= BB, bbe <= AB-SO)', () => {
    const rng = new SeededRandom(9);
    const row = new Float64Array(BATTING_COLUMNS.length);
    for (let i = 0; i < 2000; i++) {
      const t = Float64Array.from(HITTER_TALENTS, () => 2 * rng.normal());
      const pa = 1 + rng.int(700);
      battingLine(rng, t, rng.int(6), pa, Math.ceil(pa / 4), true, true, row);
      const g = (n: string): number => row[col(n)] ?? Number.NaN;
      expect(g('AB') + g('BB') + g('HBP') + g('SF')).toBeLessThanOrEqual(pa);
      expect(g('H')).toBeLessThanOrEqual(g('AB'));
      expect(g('2B') + g('3B') + g('HR')).toBeLessThanOrEqual(g('H'));
      expect(g('IBB')).toBeLessThanOrEqual(g('BB'));
      expect(g('SO')).toBeLessThanOrEqual(g('AB'));
      expect(g('bbe')).toBeLessThanOrEqual(g('AB') - g('SO'));
      if (g('bbe') > 0) expect(g('ev_p90_mph')).toBeGreaterThan(g('ev_avg_mph'));
    }
  });
});
