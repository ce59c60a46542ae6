import { describe, expect, it } from 'vitest';
import { cellText } from '../../src/sim/cellText.ts';
import { simulateLeague } from '../../src/sim/simulateLeague.ts';
import { LEVEL_TOP, SIM_LEVELS } from '../../src/sim/levelTable.ts';
import { H_POWER, P_STUFF } from '../../src/sim/talentNames.ts';
import { SMALL_OPTIONS, smallLeague } from './smallLeague.ts';
import { UsageError } from '../../src/errors/KindredError.ts';

const league = smallLeague();

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] ?? Number.NaN;
}

/** Pearson correlation of two equal-length samples. */
function correlation(xs: readonly number[], ys: readonly number[]): number {
  const n = xs.length;
  const mx = xs.reduce((a, b) => a + b, 0) / n;
  const my = ys.reduce((a, b) => a + b, 0) / n;
  let sxy = 0, sxx = 0, syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = (xs[i] ?? 0) - mx, dy = (ys[i] ?? 0) - my;
    sxy += dx * dy; sxx += dx * dx; syy += dy * dy;
  }
  return sxy / Math.sqrt(sxx * syy);
}

/** Age on June 30 of the season (common practice for baseball ages). */
function ageOnJune30(birth: string, season: number): number {
  const [y, m] = birth.split('-').map(Number);
  return season - (y ?? 0) - ((m ?? 0) > 6 ? 1 : 0);
}

describe('simulateLeague(options)', () => {
  it('sizes the league near targetPlayerSeasons', () => {
    expect(league.truth.length).toBeGreaterThan(0.8 * 6000);
    expect(league.truth.length).toBeLessThan(1.2 * 6000);
  });

  it('is a pure function of the seed: the same seed gives identical tables', () => {
    const again = simulateLeague(SMALL_OPTIONS);
    expect(again.players.names).toEqual(league.players.names);
    for (const key of ['batting', 'fielding', 'pitching', 'contracts'] as const) {
      const a = league[key], b = again[key];
      expect(b.length).toBe(a.length);
      for (let r = 0; r < a.length; r += 7) for (let c = 0; c < a.width; c++) expect(Object.is(b.get(r, c), a.get(r, c))).toBe(true);
    }
  });

  it('gives a different league for a different seed', () => {
    const other = simulateLeague({ ...SMALL_OPTIONS, seed: SMALL_OPTIONS.seed + 1 });
    expect(other.players.names.slice(0, 50)).not.toEqual(league.players.names.slice(0, 50));
    expect(other.batting.length).not.toBe(league.batting.length);
  });

  it('has one truth row per player-season with a stat row at each level it lists', () => {
    const seen = new Set<string>();
    for (const t of [league.batting, league.pitching]) {
      for (let r = 0; r < t.length; r++) seen.add(`${t.get(r, 0)}|${t.get(r, 1)}|${t.get(r, 2)}`);
    }
    let listed = 0;
    const keys = new Set<string>();
    for (let r = 0; r < league.truth.length; r++) {
      const p = league.truth.playerIndex(r), s = league.truth.season(r);
      const key = `${p}|${s}`;
      expect(keys.has(key)).toBe(false);
      keys.add(key);
      for (let lv = 0; lv < SIM_LEVELS.length; lv++) {
        if ((league.truth.levelMask(r) & (1 << lv)) === 0) continue;
        listed++;
        expect(seen.has(`${p}|${s}|${lv}`)).toBe(true);
      }
    }
    expect(listed).toBe(seen.size);
  });

  it('finds a player-season by id and season, with talents named per kind', () => {
    const r = 123;
    const found = league.truth.find(league.players.ids[league.truth.playerIndex(r)] ?? '', league.truth.season(r));
    expect(found).toBeDefined();
    expect(found?.talents.length).toBe(league.truth.talentNames[found?.kind ?? 'hitter'].length);
    expect(league.truth.find('p999999', 2010)).toBeUndefined();
  });

  it('puts ages on June 30 in plausible ranges that rise with the level (common practice, from memory)', () => {
    const byLevel: number[][] = SIM_LEVELS.map(() => []);
    for (let r = 0; r < league.batting.length; r++) {
      const p = league.batting.get(r, 0);
      const age = ageOnJune30(league.players.birthDates[p] ?? '', league.batting.get(r, 1));
      byLevel[league.batting.get(r, 2)]?.push(age);
    }
    for (const ages of byLevel) {
      expect(Math.min(...ages)).toBeGreaterThanOrEqual(16);
      expect(Math.max(...ages)).toBeLessThanOrEqual(42);
    }
    const medians = byLevel.map(median);
    expect(medians[0]).toBeGreaterThanOrEqual(18);
    expect(medians[0]).toBeLessThanOrEqual(21);
    expect(medians[LEVEL_TOP]).toBeGreaterThanOrEqual(26);
    expect(medians[LEVEL_TOP]).toBeLessThanOrEqual(31);
    for (let i = 1; i < medians.length; i++) expect(medians[i] ?? 0).toBeGreaterThanOrEqual(medians[i - 1] ?? 0);
  });

  it('truth ages agree with birth dates', () => {
    for (let r = 0; r < league.truth.length; r += 5) {
      const birth = league.players.birthDates[league.truth.playerIndex(r)] ?? '';
      expect(league.truth.age(r)).toBe(ageOnJune30(birth, league.truth.season(r)));
    }
  });

  it('lets only some entrants reach the top level, the more talented ones', () => {
    let entrants = 0, reached = 0;
    for (let i = 0; i < league.players.count; i++) {
      const entry = league.players.entrySeason[i] ?? 0;
      if (entry < 2003 || entry > 2012) continue; // careers that started and mostly ended in the window
      entrants++;
      if (league.players.highestLevel[i] === LEVEL_TOP) reached++;
    }
    expect(reached / entrants).toBeGreaterThan(0.05);
    expect(reached / entrants).toBeLessThan(0.3);
    // Players at the top level have higher true talent than players at Rk.
    const mean = (lv: number, k: number, kind: 'hitter' | 'pitcher'): number => {
      let s = 0, n = 0;
      const out = new Float64Array(7);
      for (let r = 0; r < league.truth.length; r++) {
        if (league.truth.kind(r) !== kind || league.truth.topLevel(r) !== lv) continue;
        s += league.truth.talentsInto(r, out)[k] ?? 0;
        n++;
      }
      return s / n;
    };
    expect(mean(LEVEL_TOP, H_POWER, 'hitter')).toBeGreaterThan(mean(0, H_POWER, 'hitter') + 0.5);
    expect(mean(LEVEL_TOP, P_STUFF, 'pitcher')).toBeGreaterThan(mean(0, P_STUFF, 'pitcher') + 0.5);
  });

  it('gives players who reach the top level a higher true ceiling (peakValue) than those who do not', () => {
    let topSum = 0, topN = 0, restSum = 0, restN = 0;
    for (let i = 0; i < league.players.count; i++) {
      const v = league.players.peakValue[i] ?? 0;
      if (league.players.highestLevel[i] === LEVEL_TOP) { topSum += v; topN++; } else { restSum += v; restN++; }
    }
    expect(topSum / topN).toBeGreaterThan(restSum / restN + 0.8);
  });

  it('names as truth position the fielding position a hitter played most that season (DH when he did not field)', () => {
    const games = new Map<string, Map<string, number>>();
    const f = league.fielding;
    for (let r = 0; r < f.length; r++) {
      const key = `${f.get(r, 0)}|${f.get(r, 1)}`;
      const byPos = games.get(key) ?? new Map<string, number>();
      const pos = cellText(league, f, r, f.columnIndex('pos'));
      byPos.set(pos, (byPos.get(pos) ?? 0) + f.get(r, f.columnIndex('G')));
      games.set(key, byPos);
    }
    let checked = 0, agree = 0, dhFielding = 0, dh = 0;
    for (let r = 0; r < league.truth.length; r++) {
      if (league.truth.kind(r) !== 'hitter') continue;
      const byPos = games.get(`${league.truth.playerIndex(r)}|${league.truth.season(r)}`);
      const pos = league.truth.position(r);
      if (pos === 'DH') {
        dh++;
        if (byPos !== undefined) dhFielding++;
        continue;
      }
      checked++;
      const most = byPos === undefined ? '' : [...byPos.entries()].sort((a, b) => b[1] - a[1])[0]?.[0];
      if (most === pos) agree++;
    }
    expect(agree / checked).toBeGreaterThan(0.97);
    expect(dh).toBeGreaterThan(0);
    expect(dhFielding).toBeLessThan(dh); // most DH seasons have no fielding row; some cover a little 1B or LF
  });

  it('leaves some careers in progress at the last season (censored)', () => {
    const active = league.players.active.reduce((a, b) => a + b, 0);
    expect(active).toBeGreaterThan(0);
    expect(active).toBeLessThan(league.players.count);
  });

  it('ties ISO and exit velocity to true power across top-level player-seasons (model invariant)', () => {
    const b = league.batting;
    const iso: number[] = [], ev: number[] = [], powerIso: number[] = [], powerEv: number[] = [];
    const out = new Float64Array(7);
    for (let r = 0; r < b.length; r++) {
      if (b.get(r, b.columnIndex('PA')) < 300) continue;
      const t = league.truth.find(cellText(league, b, r, 0), b.get(r, 1));
      if (t === undefined) continue;
      const ab = b.get(r, b.columnIndex('AB'));
      const xb = b.get(r, b.columnIndex('2B')) + 2 * b.get(r, b.columnIndex('3B')) + 3 * b.get(r, b.columnIndex('HR'));
      out.set(t.talents);
      iso.push(xb / ab);
      powerIso.push(out[H_POWER] ?? 0);
      const e = b.get(r, b.columnIndex('ev_avg_mph'));
      if (!Number.isNaN(e)) {
        ev.push(e);
        powerEv.push(out[H_POWER] ?? 0);
      }
    }
    expect(correlation(powerIso, iso)).toBeGreaterThan(0.5);
    expect(correlation(powerEv, ev)).toBeGreaterThan(0.7);
  });

  it('refuses bad options with a UsageError', () => {
    expect(() => simulateLeague({ seed: 1, firstSeason: 2010, lastSeason: 2005 })).toThrow(UsageError);
    expect(() => simulateLeague({ seed: 1.5, firstSeason: 2003, lastSeason: 2005 })).toThrow(UsageError);
    expect(() => simulateLeague({ seed: 1, firstSeason: 2003, lastSeason: 2005, trackedFromLevel: 'X' })).toThrow(UsageError);
    expect(() => simulateLeague({ seed: 1, firstSeason: 2003, lastSeason: 2005, minorLevels: 7 })).toThrow(UsageError);
    expect(() => simulateLeague({ seed: 1, firstSeason: 2003, lastSeason: 2005, promotionChance: 0 })).toThrow(UsageError);
    expect(() => simulateLeague({ seed: 1, firstSeason: 2003, lastSeason: 2005, eraDrift: Number.NaN })).toThrow(UsageError);
  });
});

describe('simulateLeague(options) with league parameters varied', () => {
  const base = { seed: 777, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: 5000 } as const;
  const plain = simulateLeague(base);

  /** Share of players whose highest level is the top one. */
  const reachedTop = (l: ReturnType<typeof simulateLeague>): number => {
    let n = 0;
    for (let i = 0; i < l.players.count; i++) if (l.players.highestLevel[i] === l.levels.length - 1) n++;
    return n / l.players.count;
  };

  /** League strikeout rate (SO / PA) of the top-level batting rows in a season range. */
  const topKRate = (l: ReturnType<typeof simulateLeague>, from: number, to: number): number => {
    const b = l.batting, iS = b.columnIndex('season'), iL = b.columnIndex('level'), iPA = b.columnIndex('PA'), iSO = b.columnIndex('SO');
    if (iS < 0 || iL < 0) throw new Error('batting table without season or level');
    let pa = 0, so = 0;
    for (let r = 0; r < b.length; r++) {
      const s = b.get(r, iS);
      if (b.get(r, iL) !== l.levels.length - 1 || s < from || s > to) continue;
      pa += b.get(r, iPA);
      so += b.get(r, iSO);
    }
    return so / pa;
  };

  it('uses the shorter ladder for 3 or 4 minor levels, in levels and in every stat row', () => {
    const short = simulateLeague({ ...base, minorLevels: 3 });
    expect(short.levels).toEqual(['Low', 'High', 'Elite', 'Top']);
    let maxLevel = 0;
    for (let r = 0; r < short.batting.length; r++) maxLevel = Math.max(maxLevel, short.batting.get(r, short.batting.columnIndex('level')));
    expect(maxLevel).toBe(3);
    expect(reachedTop(short)).toBeGreaterThan(0.05);
  });

  it('promotes fewer players to the top level with a higher promotion margin and a promotion chance below 1', () => {
    const hard = simulateLeague({ ...base, promotionMargin: 0.4, promotionChance: 0.6 });
    expect(reachedTop(hard)).toBeLessThan(0.8 * reachedTop(plain));
  });

  it('raises the top-level strikeout rate over the years with a positive era drift, and not without', () => {
    const drift = simulateLeague({ ...base, eraDrift: 0.04 });
    expect(topKRate(drift, 2021, 2026) - topKRate(drift, 2003, 2008)).toBeGreaterThan(0.03);
    expect(Math.abs(topKRate(plain, 2021, 2026) - topKRate(plain, 2003, 2008))).toBeLessThan(0.015);
  });

  it('records no minor-league stat line before minorsRecordedFrom, but top-level lines from the first season', () => {
    const late = simulateLeague({ ...base, minorsRecordedFrom: 2012 });
    const b = late.batting, iS = b.columnIndex('season'), iL = b.columnIndex('level');
    let earlyMinor = 0, earlyTop = 0;
    for (let r = 0; r < b.length; r++) {
      if (b.get(r, iS) >= 2012) continue;
      if (b.get(r, iL) === late.levels.length - 1) earlyTop++;
      else earlyMinor++;
    }
    expect(earlyMinor).toBe(0);
    expect(earlyTop).toBeGreaterThan(50);
  });

  it('makes stat lines follow true talent less closely with more form noise (ISO against true power)', () => {
    const isoPowerCorrelation = (l: ReturnType<typeof simulateLeague>): number => {
      const b = l.batting, iS = b.columnIndex('season'), iPA = b.columnIndex('PA');
      const xs: number[] = [], ys: number[] = [];
      for (let r = 0; r < b.length; r++) {
        const pa = b.get(r, iPA);
        if (pa < 300) continue;
        const t = l.truth.find(cellText(l, b, r, 0), b.get(r, iS));
        if (!t) continue;
        const ab = b.get(r, b.columnIndex('AB'));
        const tb = b.get(r, b.columnIndex('2B')) + 2 * b.get(r, b.columnIndex('3B')) + 3 * b.get(r, b.columnIndex('HR'));
        xs.push(t.talents[H_POWER] ?? 0);
        ys.push(tb / ab);
      }
      return correlation(xs, ys);
    };
    const noisy = simulateLeague({ ...base, statNoise: 0.6 });
    expect(isoPowerCorrelation(noisy)).toBeLessThan(isoPowerCorrelation(plain) - 0.05);
  });
});

describe('simulateLeague(options) with planted twins (twinShare)', () => {
  const base = { seed: 515, firstSeason: 2008, lastSeason: 2026, targetPlayerSeasons: 4000 } as const;
  const plain = simulateLeague(base);
  const twinned = simulateLeague({ ...base, twinShare: 0.5 });
  const tw = twinned.players.twinOf;
  /** The twinned league's players that are not a planted copy, in order: the plain league's players. */
  const originals = Array.from({ length: twinned.players.count }, (_, i) => i).filter((i) => (tw[i] as number) < 0 || (tw[i] as number) > i);

  it('plants no twins by default', () => {
    expect(plain.players.twinOf.every((t) => t === -1)).toBe(true);
  });

  it('pairs twins both ways, each right after his original, only among players with a top-level season', () => {
    const pairs = originals.filter((i) => (tw[i] as number) > i);
    expect(pairs.length).toBeGreaterThan(20);
    for (const a of pairs) {
      expect(tw[a]).toBe(a + 1);
      expect(tw[a + 1]).toBe(a);
      expect(twinned.players.highestLevel[a]).toBe(twinned.levels.length - 1);
    }
    // about half of the top-level careers (binomial, n = the players reaching the top level)
    const reached = originals.filter((i) => twinned.players.highestLevel[i] === twinned.levels.length - 1).length;
    expect(pairs.length / reached).toBeGreaterThan(0.35);
    expect(pairs.length / reached).toBeLessThan(0.65);
  });

  it('leaves every other player as in the league without twins: same players, same stat lines', () => {
    expect(originals.length).toBe(plain.players.count);
    expect(originals.map((i) => twinned.players.names[i])).toEqual(plain.players.names);
    const newIndex = new Map(originals.map((i, j) => [i, j]));
    for (const key of ['batting', 'pitching'] as const) {
      const a = plain[key];
      const b = twinned[key];
      const kept: number[] = [];
      for (let r = 0; r < b.length; r++) if (newIndex.has(b.get(r, 0))) kept.push(r);
      expect(kept.length).toBe(a.length);
      for (let r = 0; r < a.length; r += 5) {
        const rb = kept[r] as number;
        expect(newIndex.get(b.get(rb, 0))).toBe(a.get(r, 0));
        for (let c = 1; c < a.width; c++) expect(Object.is(b.get(rb, c), a.get(r, c))).toBe(true);
      }
    }
  });

  it('gives a twin the same true talents, age and levels every season, and stat lines of his own luck', () => {
    const pairs = originals.filter((i) => (tw[i] as number) > i);
    let seasons = 0;
    let differ = 0;
    for (const a of pairs) {
      const ra = twinned.truth.rowsOf(a);
      const rb = twinned.truth.rowsOf(a + 1);
      expect(rb.count).toBe(ra.count);
      for (let k = 0; k < ra.count; k++) {
        const x = twinned.truth.at(ra.first + k);
        const y = twinned.truth.at(rb.first + k);
        expect([y.season, y.age, y.levels, y.position]).toEqual([x.season, x.age, x.levels, x.position]);
        expect([...y.talents]).toEqual([...x.talents]);
      }
      expect(twinned.players.birthDates[a + 1]).toBe(twinned.players.birthDates[a]);
    }
    // batting lines: same PA per stint (the same playing time), hits drawn apart
    const b = twinned.batting;
    const iPA = b.columnIndex('PA');
    const iH = b.columnIndex('H');
    const lines = new Map<string, [number, number]>();
    for (let r = 0; r < b.length; r++) lines.set(`${b.get(r, 0)}|${b.get(r, 1)}|${b.get(r, 2)}|${b.get(r, 3)}`, [b.get(r, iPA), b.get(r, iH)]);
    for (const a of pairs) {
      for (const [key, [pa, h]] of lines) {
        const [p, ...rest] = key.split('|');
        if (Number(p) !== a) continue;
        const other = lines.get([a + 1, ...rest].join('|'));
        if (!other) continue;
        seasons++;
        expect(other[0]).toBe(pa);
        if (other[1] !== h) differ++;
      }
    }
    expect(seasons).toBeGreaterThan(20);
    expect(differ / seasons).toBeGreaterThan(0.8);
  });

  it('refuses a twin share outside 0 to 1', () => {
    expect(() => simulateLeague({ ...base, twinShare: 1.5 })).toThrow(UsageError);
  });
});
