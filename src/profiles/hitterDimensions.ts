/**
 * The hitters' dimensions: plate discipline, contact, power, batted-ball quality, running, fielding
 * and, for catchers, throwing. Each rate names the formula module in src/stats it follows; the
 * numerator and denominator here are that formula's (checked in tests/profiles/hitterDimensions.test.ts).
 */
import type { HitterLine } from './HitterLine.ts';
import type { Dimension } from './Dimension.ts';
import { STABILISATION } from '../stats/stabilisation.ts';
import { totalBases } from '../stats/totalBases.ts';

type D = Dimension<HitterLine>;

/** Range factor is regressed by adding 300 league-average innings (900 outs): a project choice. */
const RANGE_STABILISATION_OUTS = 900;

const HITTERS = ['C', 'IF', 'OF', 'DH'] as const;
const FIELDERS = ['IF', 'OF'] as const;
const CATCHERS = ['C'] as const;

const tb = (l: HitterLine): number => {
  const b = l.batting;
  return totalBases(b.H, b.doubles, b.triples, b.HR);
};
const k = (rate: keyof typeof STABILISATION): number => STABILISATION[rate].sample;
/** Balls in play for BABIP: AB - SO - HR + SF. */
const bip = (l: HitterLine): number => l.batting.AB - l.batting.SO - l.batting.HR + l.batting.SF;
/** Times on first (singles, walks, hit-by-pitches): opportunities to steal (common practice approximation). */
const timesOnFirst = (l: HitterLine): number => {
  const b = l.batting;
  return b.H - b.doubles - b.triples - b.HR + b.BB + b.HBP;
};
const bbe = (l: HitterLine): number | undefined => l.batting.bbe;
const sbAttempts = (l: HitterLine): number | undefined =>
  l.batting.SB === undefined || l.batting.CS === undefined ? undefined : l.batting.SB + l.batting.CS;

export const HITTER_DIMENSIONS: readonly D[] = [
  {
    name: 'k_pct', label: 'K%', unit: 'fraction of PA', direction: 'lower', skill: 'contact',
    meaning: 'Strikeouts per plate appearance.', source: 'src/stats/strikeoutRate.ts (SO / PA)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.batting.SO, denominator: (l) => l.batting.PA, stabilisation: k('strikeoutRate') },
  },
  {
    name: 'bb_pct', label: 'BB%', unit: 'fraction of PA', direction: 'higher', skill: 'discipline',
    meaning: 'Walks per plate appearance.', source: 'src/stats/walkRate.ts (BB / PA)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.batting.BB, denominator: (l) => l.batting.PA, stabilisation: k('walkRate') },
  },
  {
    name: 'avg', label: 'AVG', unit: 'hits per AB', direction: 'higher', skill: 'contact',
    meaning: 'Batting average: hits per at-bat.', source: 'src/stats/battingAverage.ts (Official Baseball Rules)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.batting.H, denominator: (l) => l.batting.AB, stabilisation: k('battingAverage') },
  },
  {
    name: 'obp', label: 'OBP', unit: 'fraction', direction: 'higher', skill: 'on-base',
    meaning: 'On-base percentage: (H + BB + HBP) / (AB + BB + HBP + SF).',
    source: 'src/stats/onBasePercentage.ts (Official Baseball Rules)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: {
      kind: 'rate',
      numerator: (l) => l.batting.H + l.batting.BB + l.batting.HBP,
      denominator: (l) => l.batting.AB + l.batting.BB + l.batting.HBP + l.batting.SF,
      stabilisation: k('onBasePercentage'),
    },
  },
  {
    name: 'slg', label: 'SLG', unit: 'bases per AB', direction: 'higher', skill: 'power',
    meaning: 'Slugging percentage: total bases per at-bat.', source: 'src/stats/sluggingPercentage.ts (Official Baseball Rules)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: tb, denominator: (l) => l.batting.AB, stabilisation: k('sluggingPercentage') },
  },
  {
    name: 'iso', label: 'ISO', unit: 'extra bases per AB', direction: 'higher', skill: 'power',
    meaning: 'Isolated power: extra bases per at-bat (SLG - AVG).', source: 'src/stats/isolatedPower.ts (common practice)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => tb(l) - l.batting.H, denominator: (l) => l.batting.AB, stabilisation: k('isolatedPower') },
  },
  {
    name: 'hr_pct', label: 'HR%', unit: 'fraction of PA', direction: 'higher', skill: 'power',
    meaning: 'Home runs per plate appearance.', source: 'src/stats/homeRunRate.ts (HR / PA)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.batting.HR, denominator: (l) => l.batting.PA, stabilisation: k('homeRunRate') },
  },
  {
    name: 'babip', label: 'BABIP', unit: 'hits per ball in play', direction: 'higher', skill: 'contact',
    meaning: 'Batting average on balls in play: (H - HR) / (AB - SO - HR + SF).', source: 'src/stats/babip.ts (common practice)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.batting.H - l.batting.HR, denominator: bip, stabilisation: k('babip') },
  },
  {
    name: 'ev_avg_mph', label: 'EV avg', unit: 'mph', direction: 'higher', skill: 'power',
    meaning: 'Average exit velocity of batted balls.', source: 'batting.csv ev_avg_mph, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.evAvgMph, events: bbe, stabilisation: k('evAvgMph') },
  },
  {
    name: 'ev_p90_mph', label: 'EV p90', unit: 'mph', direction: 'higher', skill: 'power',
    meaning: '90th percentile exit velocity: how hard his best contact is.', source: 'batting.csv ev_p90_mph, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.evP90Mph, events: bbe, stabilisation: k('evP90Mph') },
  },
  {
    name: 'la_avg_deg', label: 'LA avg', unit: 'degrees', direction: 'neither', skill: 'batted-ball shape',
    meaning: 'Average launch angle: ground-ball hitter (low) or fly-ball hitter (high).', source: 'batting.csv la_avg_deg, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.laAvgDeg, events: bbe, stabilisation: k('laAvgDeg') },
  },
  {
    name: 'hard_hit_pct', label: 'Hard-hit%', unit: 'percent of BBE', direction: 'higher', skill: 'power',
    meaning: 'Share of batted balls hit hard (0 to 100).', source: 'batting.csv hard_hit_pct, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.hardHitPct, events: bbe, stabilisation: k('hardHitPct') },
  },
  {
    name: 'sweet_spot_pct', label: 'Sweet-spot%', unit: 'percent of BBE', direction: 'higher', skill: 'batted-ball shape',
    meaning: 'Share of batted balls in the productive launch-angle band (0 to 100).', source: 'batting.csv sweet_spot_pct, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.sweetSpotPct, events: bbe, stabilisation: k('sweetSpotPct') },
  },
  {
    name: 'sprint_ft_s', label: 'Sprint', unit: 'ft/s', direction: 'higher', skill: 'speed',
    meaning: 'Sprint speed on his fastest runs (a timed measurement, not regressed).', source: 'batting.csv sprint_ft_s',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.sprintFtS, events: (l) => l.batting.PA, stabilisation: 0 },
  },
  {
    name: 'sb_att_rate', label: 'SB att', unit: 'attempts per time on first', direction: 'higher', skill: 'speed',
    meaning: 'Steal attempts per time on first base (singles, walks, HBP): how often he runs.',
    source: 'src/stats/stolenBaseAttemptRate.ts (common practice approximation)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: sbAttempts, denominator: (l) => (sbAttempts(l) === undefined ? undefined : timesOnFirst(l)), stabilisation: 0 },
  },
  {
    name: 'sb_success', label: 'SB%', unit: 'fraction of attempts', direction: 'higher', skill: 'speed',
    meaning: 'Stolen-base success rate: SB / (SB + CS).', source: 'src/stats/stolenBaseSuccess.ts (common practice)',
    groups: HITTERS, scope: 'group', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.batting.SB, denominator: sbAttempts, stabilisation: k('stolenBaseSuccess') },
  },
  {
    name: 'range_factor', label: 'RF/9', unit: 'plays per 9 innings', direction: 'higher', skill: 'fielding range',
    meaning: 'Range factor at his primary position: 9 * (PO + A) / innings, compared with the same position only.',
    source: 'src/stats/rangeFactor.ts (common practice)',
    groups: FIELDERS, scope: 'position', digits: 2,
    measure: {
      kind: 'rate',
      numerator: (l) => (l.fielding ? 27 * (l.fielding.PO + l.fielding.A) : undefined),
      denominator: (l) => l.fielding?.outs,
      stabilisation: RANGE_STABILISATION_OUTS,
    },
  },
  {
    name: 'fielding_pct', label: 'Fld%', unit: 'fraction of chances', direction: 'higher', skill: 'fielding hands',
    meaning: 'Fielding percentage at his primary position: (PO + A) / (PO + A + E).',
    source: 'src/stats/fieldingPercentage.ts (Official Baseball Rules)',
    groups: [...FIELDERS, ...CATCHERS], scope: 'position', digits: 3,
    measure: {
      kind: 'rate',
      numerator: (l) => (l.fielding ? l.fielding.PO + l.fielding.A : undefined),
      denominator: (l) => (l.fielding ? l.fielding.PO + l.fielding.A + l.fielding.E : undefined),
      stabilisation: k('fieldingPercentage'),
    },
  },
  {
    name: 'arm_mph', label: 'Arm', unit: 'mph', direction: 'higher', skill: 'arm',
    meaning: 'Average velocity of his competitive throws (a measurement, not regressed).', source: 'fielding.csv arm_mph, weighted by innings',
    groups: [...FIELDERS, ...CATCHERS], scope: 'position', digits: 1,
    measure: { kind: 'mean', value: (l) => l.fielding?.armMph, events: (l) => l.fielding?.outs, stabilisation: 0 },
  },
  {
    name: 'pop_2b_s', label: 'Pop 2B', unit: 's', direction: 'lower', skill: 'catcher throwing',
    meaning: 'Pop time to second base: glove to the fielder\u2019s glove on steal attempts (lower is better).',
    source: 'fielding.csv pop_2b_s, weighted by sb_against',
    groups: CATCHERS, scope: 'position', digits: 2,
    measure: { kind: 'mean', value: (l) => l.fielding?.pop2bS, events: (l) => l.fielding?.sbAgainst, stabilisation: 0 },
  },
  {
    name: 'exchange_s', label: 'Exchange', unit: 's', direction: 'lower', skill: 'catcher throwing',
    meaning: 'Exchange time: catch to release on steal attempts (lower is better).', source: 'fielding.csv exchange_s, weighted by sb_against',
    groups: CATCHERS, scope: 'position', digits: 2,
    measure: { kind: 'mean', value: (l) => l.fielding?.exchangeS, events: (l) => l.fielding?.sbAgainst, stabilisation: 0 },
  },
  {
    name: 'cs_pct', label: 'CS%', unit: 'fraction of attempts', direction: 'higher', skill: 'catcher throwing',
    meaning: 'Caught-stealing rate: runners thrown out per steal attempt against him.', source: 'src/stats/caughtStealingRate.ts (common practice)',
    groups: CATCHERS, scope: 'position', digits: 3,
    measure: { kind: 'rate', numerator: (l) => l.fielding?.csCaught, denominator: (l) => l.fielding?.sbAgainst, stabilisation: k('caughtStealingRate') },
  },
];
