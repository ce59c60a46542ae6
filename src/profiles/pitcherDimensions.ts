/**
 * The pitchers' dimensions (starters and relievers alike; each group is standardised on its own).
 * Each rate is a rate of src/stats (numerator and denominator written once there); the store-level
 * values are checked by hand in tests/profiles/dimensionValues.test.ts.
 */
import type { PitchingSeason } from '../ingest/Roster.ts';
import type { Dimension } from './Dimension.ts';
import { rateMeasure, rateSource } from './rateMeasure.ts';
import { STABILISATION } from '../stats/stabilisation.ts';
import { fip } from '../stats/fip.ts';
import { pitcherStrikeoutRate } from '../stats/pitcherStrikeoutRate.ts';
import { pitcherWalkRate } from '../stats/pitcherWalkRate.ts';
import { pitcherHomeRunRate } from '../stats/pitcherHomeRunRate.ts';
import { babipAgainst } from '../stats/babipAgainst.ts';
import { inningsPerGame } from '../stats/inningsPerGame.ts';

type D = Dimension<PitchingSeason>;

const PITCHERS = ['SP', 'RP'] as const;
const k = (rate: keyof typeof STABILISATION): number => STABILISATION[rate].sample;
const line = (p: PitchingSeason): PitchingSeason => p;
/** Balls in play against (the denominator of src/stats/babipAgainst.ts): events behind GB%. */
const bipAgainst = (p: PitchingSeason): number => babipAgainst.denominator(p);

export const PITCHER_DIMENSIONS: readonly D[] = [
  {
    name: 'k_pct', label: 'K%', unit: 'fraction of BF', direction: 'higher', skill: 'stuff', family: 'missing bats',
    meaning: 'Strikeouts per batter faced.', source: rateSource(pitcherStrikeoutRate),
    groups: PITCHERS, scope: 'group', digits: 3,
    measure: rateMeasure(pitcherStrikeoutRate, line, k('pitcherStrikeoutRate')),
  },
  {
    name: 'bb_pct', label: 'BB%', unit: 'fraction of BF', direction: 'lower', skill: 'control', family: 'command',
    meaning: 'Walks per batter faced.', source: rateSource(pitcherWalkRate),
    groups: PITCHERS, scope: 'group', digits: 3,
    measure: rateMeasure(pitcherWalkRate, line, k('pitcherWalkRate')),
  },
  {
    name: 'hr_pct', label: 'HR%', unit: 'fraction of BF', direction: 'lower', skill: 'contact allowed', family: 'contact allowed',
    meaning: 'Home runs allowed per batter faced.', source: rateSource(pitcherHomeRunRate),
    groups: PITCHERS, scope: 'group', digits: 3,
    measure: rateMeasure(pitcherHomeRunRate, line, k('pitcherHomeRunRate')),
  },
  {
    name: 'babip_against', label: 'BABIP', unit: 'hits per ball in play', direction: 'lower', skill: 'contact allowed', family: 'contact allowed',
    meaning: 'Hits allowed per ball in play (H - HR) / (BF - SO - BB - HBP - HR).', source: rateSource(babipAgainst),
    groups: PITCHERS, scope: 'group', digits: 3,
    measure: rateMeasure(babipAgainst, line, k('babipAgainst')),
  },
  {
    name: 'fip', label: 'FIP', unit: 'runs per 9 IP', direction: 'lower', skill: 'run prevention', family: 'contact allowed',
    meaning: 'Fielding-independent pitching on the ERA scale, from regressed K, BB+HBP and HR rates.',
    source: 'src/stats/fip.ts with the season-and-level constant from src/stats/fipConstant.ts',
    groups: PITCHERS, scope: 'group', digits: 2,
    measure: {
      kind: 'derived',
      raw: (p, league) => fip(p, league.fipConstant),
      regressed: (p, r, league) => {
        const kr = r.get('k_pct');
        const bb = r.get('bb_pct');
        const hr = r.get('hr_pct');
        if (kr === undefined || bb === undefined || hr === undefined || p.outs === 0) return undefined;
        // Rates per BF times BF give regressed counts; HBP is taken as observed.
        return fip({ HR: hr * p.BF, BB: bb * p.BF, HBP: p.HBP, SO: kr * p.BF, outs: p.outs }, league.fipConstant);
      },
    },
  },
  {
    name: 'gb_pct', label: 'GB%', unit: 'percent of balls in play', direction: 'higher', skill: 'ground balls', family: 'contact allowed',
    meaning: 'Share of balls in play hit on the ground (0 to 100).', source: 'pitching.csv gb_pct, weighted by balls in play',
    groups: PITCHERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (p) => p.gbPct, events: bipAgainst, stabilisation: k('gbPct') },
  },
  {
    name: 'whiff_pct', label: 'Swing-miss%', unit: 'percent of swings', direction: 'higher', skill: 'stuff', family: 'missing bats',
    meaning: 'Swings and misses per swing (0 to 100).', source: 'pitching.csv whiff_pct, weighted by BF',
    groups: PITCHERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (p) => p.whiffPct, events: (p) => p.BF, stabilisation: k('whiffPct') },
  },
  {
    name: 'fb_mph', label: 'Fastball velo', unit: 'mph', direction: 'higher', skill: 'velocity', family: 'stuff',
    meaning: 'Average fastball velocity (a measurement, not regressed).', source: 'pitching.csv fb_mph, weighted by BF',
    groups: PITCHERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (p) => p.fbMph, events: (p) => p.BF, stabilisation: 0 },
  },
  {
    name: 'fb_spin_rpm', label: 'Fastball spin', unit: 'rpm', direction: 'higher', skill: 'velocity', family: 'stuff',
    meaning: 'Average fastball spin rate (a measurement, not regressed).', source: 'pitching.csv fb_spin_rpm, weighted by BF',
    groups: PITCHERS, scope: 'group', digits: 0,
    measure: { kind: 'mean', value: (p) => p.fbSpinRpm, events: (p) => p.BF, stabilisation: 0 },
  },
  {
    name: 'ip_per_g', label: 'IP/G', unit: 'innings per game', direction: 'neither', skill: 'workload', family: 'workload',
    meaning: 'Innings per appearance: how long he works each time out.', source: rateSource(inningsPerGame),
    groups: PITCHERS, scope: 'group', digits: 2,
    measure: rateMeasure(inningsPerGame, line, 0, false),
  },
];
