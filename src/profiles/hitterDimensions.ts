/**
 * The hitters' dimensions: plate discipline, contact, power, batted-ball quality, running, fielding
 * and, for catchers, throwing. Each rate is a rate of src/stats (numerator and denominator written
 * once there); the store-level values are checked by hand in tests/profiles/dimensionValues.test.ts.
 */
import type { BattingSeason } from '../ingest/Roster.ts';
import type { HitterLine } from './HitterLine.ts';
import type { Dimension } from './Dimension.ts';
import { rateMeasure, rateSource } from './rateMeasure.ts';
import { STABILISATION } from '../stats/stabilisation.ts';
import { strikeoutRate } from '../stats/strikeoutRate.ts';
import { walkRate } from '../stats/walkRate.ts';
import { battingAverage } from '../stats/battingAverage.ts';
import { onBasePercentage } from '../stats/onBasePercentage.ts';
import { sluggingPercentage } from '../stats/sluggingPercentage.ts';
import { isolatedPower } from '../stats/isolatedPower.ts';
import { homeRunRate } from '../stats/homeRunRate.ts';
import { babip } from '../stats/babip.ts';
import { stolenBaseAttemptRate } from '../stats/stolenBaseAttemptRate.ts';
import { stolenBaseSuccess } from '../stats/stolenBaseSuccess.ts';
import { rangeFactor } from '../stats/rangeFactor.ts';
import { assistRate } from '../stats/assistRate.ts';
import { fieldingPercentage } from '../stats/fieldingPercentage.ts';
import { caughtStealingRate } from '../stats/caughtStealingRate.ts';

type D = Dimension<HitterLine>;

/** Range factor is regressed by adding 300 league-average innings (900 outs): a project choice. */
const RANGE_STABILISATION_OUTS = 900;
/**
 * Outfield assists per nine innings are regressed by adding 900 league-average innings (2,700 outs): a
 * project choice (an outfielder makes a handful of assists a season); on the four bench leagues 2,700
 * beat 900 and 0 (docs/jobs.md, "Why hitters' comps miss arm, speed and glove").
 */
const ASSIST_STABILISATION_OUTS = 2700;

const HITTERS = ['C', 'IF', 'OF', 'DH'] as const;
const FIELDERS = ['IF', 'OF'] as const;
const CATCHERS = ['C'] as const;
const OUTFIELDERS = ['OF'] as const;

const k = (rate: keyof typeof STABILISATION): number => STABILISATION[rate].sample;
const batting = (l: HitterLine): BattingSeason => l.batting;
const fielding = (l: HitterLine): HitterLine['fielding'] => l.fielding;
const bbe = (l: HitterLine): number | undefined => l.batting.bbe;

function hasSteals(b: BattingSeason): b is BattingSeason & { readonly SB: number; readonly CS: number } {
  return b.SB !== undefined && b.CS !== undefined;
}
/** The batting line when it carries both steal columns (SB and CS). */
const steals = (l: HitterLine): (BattingSeason & { readonly SB: number; readonly CS: number }) | undefined =>
  hasSteals(l.batting) ? l.batting : undefined;
/** Steal attempts against a catcher and runners he caught, when the fielding row has both. */
const stealsAgainst = (l: HitterLine): { readonly csCaught: number; readonly sbAgainst: number } | undefined => {
  const f = l.fielding;
  return f?.csCaught === undefined || f.sbAgainst === undefined ? undefined : { csCaught: f.csCaught, sbAgainst: f.sbAgainst };
};

export const HITTER_DIMENSIONS: readonly D[] = [
  {
    name: 'k_pct', label: 'K%', unit: 'fraction of PA', direction: 'lower', skill: 'contact', family: 'discipline',
    meaning: 'Strikeouts per plate appearance.', source: rateSource(strikeoutRate),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(strikeoutRate, batting, k('strikeoutRate')),
  },
  {
    name: 'bb_pct', label: 'BB%', unit: 'fraction of PA', direction: 'higher', skill: 'discipline', family: 'discipline',
    meaning: 'Walks per plate appearance.', source: rateSource(walkRate),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(walkRate, batting, k('walkRate')),
  },
  {
    name: 'avg', label: 'AVG', unit: 'hits per AB', direction: 'higher', skill: 'contact', family: 'contact',
    meaning: 'Batting average: hits per at-bat.', source: rateSource(battingAverage),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(battingAverage, batting, k('battingAverage')),
  },
  {
    name: 'obp', label: 'OBP', unit: 'fraction', direction: 'higher', skill: 'on-base', family: 'discipline',
    meaning: 'On-base percentage: (H + BB + HBP) / (AB + BB + HBP + SF).',
    source: rateSource(onBasePercentage),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(onBasePercentage, batting, k('onBasePercentage')),
  },
  {
    name: 'slg', label: 'SLG', unit: 'bases per AB', direction: 'higher', skill: 'power', family: 'power',
    meaning: 'Slugging percentage: total bases per at-bat.', source: rateSource(sluggingPercentage),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(sluggingPercentage, batting, k('sluggingPercentage'), false),
  },
  {
    name: 'iso', label: 'ISO', unit: 'extra bases per AB', direction: 'higher', skill: 'power', family: 'power',
    meaning: 'Isolated power: extra bases per at-bat (SLG - AVG).', source: rateSource(isolatedPower),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(isolatedPower, batting, k('isolatedPower'), false),
  },
  {
    name: 'hr_pct', label: 'HR%', unit: 'fraction of PA', direction: 'higher', skill: 'power', family: 'power',
    meaning: 'Home runs per plate appearance.', source: rateSource(homeRunRate),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(homeRunRate, batting, k('homeRunRate')),
  },
  {
    name: 'babip', label: 'BABIP', unit: 'hits per ball in play', direction: 'higher', skill: 'contact', family: 'contact',
    meaning: 'Batting average on balls in play: (H - HR) / (AB - SO - HR + SF).', source: rateSource(babip),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(babip, batting, k('babip')),
  },
  {
    name: 'ev_avg_mph', label: 'Exit velo', unit: 'mph', direction: 'higher', skill: 'power', family: 'power',
    meaning: 'Average exit velocity of batted balls.', source: 'batting.csv ev_avg_mph, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.evAvgMph, events: bbe, stabilisation: k('evAvgMph') },
  },
  {
    name: 'ev_p90_mph', label: 'Exit velo p90', unit: 'mph', direction: 'higher', skill: 'power', family: 'power',
    meaning: '90th percentile exit velocity: how hard his best contact is.', source: 'batting.csv ev_p90_mph, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.evP90Mph, events: bbe, stabilisation: k('evP90Mph') },
  },
  {
    name: 'la_avg_deg', label: 'Launch angle', unit: 'degrees', direction: 'neither', skill: 'batted-ball shape', family: 'power',
    meaning: 'Average launch angle: ground-ball hitter (low) or fly-ball hitter (high).', source: 'batting.csv la_avg_deg, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.laAvgDeg, events: bbe, stabilisation: k('laAvgDeg') },
  },
  {
    name: 'hard_hit_pct', label: 'Hard contact%', unit: 'percent of BBE', direction: 'higher', skill: 'power', family: 'power',
    meaning: 'Share of batted balls hit hard (0 to 100).', source: 'batting.csv hard_hit_pct, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.hardHitPct, events: bbe, stabilisation: k('hardHitPct') },
  },
  {
    name: 'la_band_pct', label: 'LA band%', unit: 'percent of BBE', direction: 'higher', skill: 'batted-ball shape', family: 'power',
    meaning: 'Share of batted balls in the productive launch-angle band (0 to 100).', source: 'batting.csv la_band_pct, weighted by bbe',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.laBandPct, events: bbe, stabilisation: k('laBandPct') },
  },
  {
    name: 'run_speed_ft_s', label: 'Run speed', unit: 'ft/s', direction: 'higher', skill: 'speed', family: 'running',
    meaning: 'Running speed on his fastest runs (a timed measurement, not regressed).', source: 'batting.csv run_speed_ft_s',
    groups: HITTERS, scope: 'group', digits: 1,
    measure: { kind: 'mean', value: (l) => l.batting.runSpeedFtS, events: (l) => l.batting.PA, stabilisation: 0 },
  },
  {
    name: 'sb_att_rate', label: 'SB att', unit: 'attempts per time on first', direction: 'higher', skill: 'speed', family: 'running',
    meaning: 'Steal attempts per time on first base (singles, walks, HBP): how often he runs.',
    source: rateSource(stolenBaseAttemptRate),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(stolenBaseAttemptRate, steals, 0),
  },
  {
    name: 'sb_success', label: 'SB%', unit: 'fraction of attempts', direction: 'higher', skill: 'speed', family: 'running',
    meaning: 'Stolen-base success rate: SB / (SB + CS).', source: rateSource(stolenBaseSuccess),
    groups: HITTERS, scope: 'group', digits: 3,
    measure: rateMeasure(stolenBaseSuccess, steals, k('stolenBaseSuccess')),
  },
  {
    name: 'range_factor', label: 'RF/9', unit: 'plays per 9 innings', direction: 'higher', skill: 'fielding range', family: 'fielding',
    meaning: 'Range factor at his primary position: 9 * (PO + A) / innings, compared with the same position only.',
    source: rateSource(rangeFactor),
    groups: FIELDERS, scope: 'position', digits: 2,
    measure: rateMeasure(rangeFactor, fielding, RANGE_STABILISATION_OUTS, false),
  },
  {
    name: 'fielding_pct', label: 'Fld%', unit: 'fraction of chances', direction: 'higher', skill: 'fielding hands', family: 'fielding',
    meaning: 'Fielding percentage at his primary position: (PO + A) / (PO + A + E).',
    source: rateSource(fieldingPercentage),
    groups: [...FIELDERS, ...CATCHERS], scope: 'position', digits: 3,
    measure: rateMeasure(fieldingPercentage, fielding, k('fieldingPercentage')),
  },
  {
    name: 'arm_mph', label: 'Arm strength', unit: 'mph', direction: 'higher', skill: 'arm', family: 'throwing',
    meaning: 'Average velocity of his competitive throws (a measurement, not regressed).', source: 'fielding.csv arm_mph, weighted by innings',
    groups: [...FIELDERS, ...CATCHERS], scope: 'position', digits: 1,
    measure: { kind: 'mean', value: (l) => l.fielding?.armMph, events: (l) => l.fielding?.outs, stabilisation: 0 },
  },
  {
    name: 'of_assist_rate', label: 'OF assists/9', unit: 'assists per 9 innings', direction: 'higher', skill: 'arm', family: 'throwing',
    meaning: 'Outfield assists per nine innings at his primary position: runners his throws retired, compared with the same position only.',
    source: rateSource(assistRate),
    groups: OUTFIELDERS, scope: 'position', digits: 3,
    measure: rateMeasure(assistRate, fielding, ASSIST_STABILISATION_OUTS, false),
  },
  {
    name: 'pop_2b_s', label: 'Pop time', unit: 's', direction: 'lower', skill: 'catcher throwing', family: 'throwing',
    meaning: 'Pop time to second base: glove to the fielder\u2019s glove on steal attempts (lower is better).',
    source: 'fielding.csv pop_2b_s, weighted by sb_against',
    groups: CATCHERS, scope: 'position', digits: 2,
    measure: { kind: 'mean', value: (l) => l.fielding?.pop2bS, events: (l) => l.fielding?.sbAgainst, stabilisation: 0 },
  },
  {
    name: 'exchange_s', label: 'Transfer time', unit: 's', direction: 'lower', skill: 'catcher throwing', family: 'throwing',
    meaning: 'Transfer time: catch to release on steal attempts (lower is better).', source: 'fielding.csv exchange_s, weighted by sb_against',
    groups: CATCHERS, scope: 'position', digits: 2,
    measure: { kind: 'mean', value: (l) => l.fielding?.exchangeS, events: (l) => l.fielding?.sbAgainst, stabilisation: 0 },
  },
  {
    name: 'cs_pct', label: 'CS%', unit: 'fraction of attempts', direction: 'higher', skill: 'catcher throwing', family: 'throwing',
    meaning: 'Caught-stealing rate: runners thrown out per steal attempt against him.', source: rateSource(caughtStealingRate),
    groups: CATCHERS, scope: 'position', digits: 3,
    measure: rateMeasure(caughtStealingRate, stealsAgainst, k('caughtStealingRate')),
  },
];
