import { describe, expect, it } from 'vitest';
import { BATTING_COLUMNS } from '../../src/ingest/battingColumns.ts';
import { combineStints } from '../../src/ingest/combineStints.ts';
import { FIELDING_COLUMNS } from '../../src/ingest/fieldingColumns.ts';
import { PITCHING_COLUMNS } from '../../src/ingest/pitchingColumns.ts';
import type { BattingSeason, FieldingSeason, PitchingSeason } from '../../src/ingest/Roster.ts';

const key = { playerId: 'p1', season: 2021, level: 'AA' } as const;
const bat = { ...key, AB: 0, H: 0, doubles: 0, triples: 0, HR: 0, BB: 0, HBP: 0, SF: 0, SO: 0 } as const;

describe('combineStints(BATTING_COLUMNS, stints)', () => {
  it('weights ev_avg by bbe: (88.5*80 + 85.5*40) / 120 = 87.5, and lists both teams', () => {
    const a: BattingSeason = { ...bat, teams: ['T1'], PA: 120, bbe: 80, evAvgMph: 88.5 };
    const b: BattingSeason = { ...bat, teams: ['T2'], PA: 60, bbe: 40, evAvgMph: 85.5 };
    const out = combineStints(BATTING_COLUMNS, [a, b]);
    expect(out.evAvgMph).toBeCloseTo(87.5, 12);
    expect(out.PA).toBe(180);
    expect(out.bbe).toBe(120);
    expect(out.teams).toEqual(['T1', 'T2']);
  });
  it('weights by PA when a stint with the value lacks bbe, and leaves bbe unknown', () => {
    const a: BattingSeason = { ...bat, teams: ['T1'], PA: 100, bbe: 70, evAvgMph: 90 };
    const b: BattingSeason = { ...bat, teams: ['T2'], PA: 300, evAvgMph: 86 };
    const out = combineStints(BATTING_COLUMNS, [a, b]);
    // (90*100 + 86*300) / 400 = 87
    expect(out.evAvgMph).toBeCloseTo(87, 12);
    expect('bbe' in out).toBe(false);
  });
  it('uses only the stints that have a value and leaves absent what no stint has', () => {
    const a: BattingSeason = { ...bat, teams: ['T1'], PA: 100, runSpeedFtS: 27 };
    const b: BattingSeason = { ...bat, teams: ['T2'], PA: 300 };
    const out = combineStints(BATTING_COLUMNS, [a, b]);
    expect(out.runSpeedFtS).toBe(27);
    expect('laAvgDeg' in out).toBe(false);
  });
});

describe('combineStints(FIELDING_COLUMNS, stints)', () => {
  it('weights arm by outs: (80*601 + 83*302) / 903 and pop time by sb_against', () => {
    const base = { ...key, pos: 'C', PO: 0, A: 0, E: 0 } as const;
    const a: FieldingSeason = { ...base, teams: ['T1'], outs: 601, armMph: 80, pop2bS: 1.95, sbAgainst: 40 };
    const b: FieldingSeason = { ...base, teams: ['T2'], outs: 302, armMph: 83, pop2bS: 2.05, sbAgainst: 20 };
    const out = combineStints(FIELDING_COLUMNS, [a, b]);
    expect(out.armMph).toBeCloseTo(73146 / 903, 12);
    expect(out.pop2bS).toBeCloseTo(119 / 60, 12);
    expect(out.outs).toBe(903);
  });
});

describe('combineStints(PITCHING_COLUMNS, stints)', () => {
  it('weights gb_pct by balls in play: (45*216 + 40*54) / 270 = 44 and fb_mph by BF', () => {
    const base = { ...key, G: 1, GS: 0, outs: 3, H: 0, HR: 0, ER: 0 } as const;
    const a: PitchingSeason = { ...base, teams: ['T1'], BF: 340, SO: 90, BB: 30, HBP: 4, gbPct: 45, fbMph: 93.5 };
    const b: PitchingSeason = { ...base, teams: ['T2'], BF: 90, SO: 25, BB: 10, HBP: 1, gbPct: 40, fbMph: 95 };
    const out = combineStints(PITCHING_COLUMNS, [a, b]);
    expect(out.gbPct).toBeCloseTo(44, 12);
    expect(out.fbMph).toBeCloseTo(40340 / 430, 12);
    expect(out.G).toBe(2);
  });
});
