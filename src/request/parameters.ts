import type { Bats, Position, Throws } from '../ingest/Roster.ts';
import { DEFAULT_PROSPECT_OPTIONS } from '../jobs/findProspectComps.ts';
import { DEFAULT_COMPS_OPTIONS } from '../query/findComps.ts';
import { CHEAPER_REACH, DEFAULT_REACH } from '../query/poolDefaults.ts';
import { DEFAULT_WINDOW } from '../query/defaultWindow.ts';
import { isWeightPreset, WEIGHT_PRESETS, type WeightPreset } from '../query/weightPresets.ts';
import { POSITION_GROUPS, type PositionGroup } from '../profiles/positionGroup.ts';
import { BadValue } from './BadValue.ts';
import { COMPS_JOBS, type JobName } from './jobs.ts';
import * as v from './valueParsers.ts';

/** Store folder used when none is given. */
export const DEFAULT_STORE = '.kindred-store';

/** Most players one suggestion request may ask for. */
export const MAX_PLAYERS_LIMIT = 50;

/** The type of each parameter's value, by its key (the table below is checked against it). */
export interface RequestValues {
  store: string;
  player: string;
  candidate: string;
  season: number;
  level: string;
  position: Position;
  want: string;
  batch: string;
  window: number;
  seasonB: number;
  levelB: string;
  poolLevel: string[];
  poolSeason: { from?: number; to?: number };
  age: { min?: number; max?: number };
  bats: Bats[];
  throws: Throws[];
  poolPosition: Position[];
  adjacent: boolean;
  levelSpan: number;
  sampleFloor: number;
  recent: number;
  k: number;
  preset: WeightPreset;
  weights: Map<string, number>;
  weighting: 'redundancy' | 'plain';
  minCoverage: number;
  exact: boolean;
  allSeasons: boolean;
  format: v.OutputFormat;
  horizon: number;
  path: number;
  includeCensored: boolean;
  maxSalary: number;
  maxShare: number;
  q: string;
  limit: number;
  group: GroupChoice;
  cuts: number[];
  charts: string;
}

/** A position group, or every group of one kind (`hitters`, `pitchers`). */
export type GroupChoice = PositionGroup | 'hitters' | 'pitchers';

export type ParameterKey = keyof RequestValues;

/**
 * One request parameter: its name (the same on the command line, as `--name`, and in a query
 * string), how its text is read, its default, its help, which jobs take it and on which front ends.
 * Help may refer to other parameters as `{name}`; each front end spells them its own way.
 */
export interface Parameter<T> {
  readonly name: string;
  /** What the value is, for help (`levels` gives `--pool-level <levels>`); absent for a switch, which takes no value. */
  readonly value?: string;
  readonly help: string;
  /** Help for one job where it says something else. */
  readonly helpFor?: Partial<Record<JobName, string>>;
  readonly parse: (text: string) => T;
  readonly default?: T;
  /** The default for one job where it differs. */
  readonly defaultFor?: Partial<Record<JobName, T>>;
  readonly jobs: readonly JobName[];
  /** `cli`: files and output formats, no query (store, batch, format); `http`: only over HTTP. Default both. */
  readonly only?: 'cli' | 'http';
  /** Given as a command-line argument rather than an option (`kindred comps <player>`). */
  readonly positional?: true;
}

const TARGET_JOBS = COMPS_JOBS;
const WANT_JOBS = ['comps', 'cheaper', 'match'] as const satisfies readonly JobName[];

function preset(value: string): WeightPreset {
  if (!isWeightPreset(value)) throw new BadValue(`unknown preset "${value}"; known: ${Object.keys(WEIGHT_PRESETS).join(', ')}`);
  return value;
}

function groupChoice(value: string): GroupChoice {
  const word = value.trim().toLowerCase();
  if (word === 'hitters' || word === 'pitchers') return word;
  const g = POSITION_GROUPS.find((x) => x === value.trim().toUpperCase());
  if (g === undefined) throw new BadValue(`expected a position group (${POSITION_GROUPS.join(', ')}), or hitters or pitchers where every group of a kind will do, got "${value}"`);
  return g;
}

/**
 * Every request parameter of every job: the one list from which the command-line options and the
 * HTTP query parameters are made.
 */
export const PARAMETERS: { readonly [K in ParameterKey]: Parameter<RequestValues[K]> } = {
  store: {
    name: 'store', value: 'dir', help: 'store folder made by kindred build', parse: v.text, default: DEFAULT_STORE, jobs: [...TARGET_JOBS, 'dims', 'backtest'], only: 'cli',
    helpFor: { dims: 'store whose fitted regression constants to show beside the table (when the folder holds one)' },
  },
  player: {
    name: 'player', help: 'player id or (part of a) name', parse: v.text, jobs: TARGET_JOBS, positional: true,
    helpFor: { match: 'the target: player id or (part of a) name (leave out with {want})' },
  },
  candidate: { name: 'candidate', help: 'the candidate: player id or (part of a) name', parse: v.text, jobs: ['match'], positional: true },
  season: { name: 'season', value: 'year', help: 'the target season (default: his latest)', parse: v.season, jobs: TARGET_JOBS },
  level: { name: 'level', value: 'level', help: 'the target level (default: his highest that season)', parse: v.text, jobs: TARGET_JOBS },
  position: {
    name: 'position', value: 'pos', help: 'position of a {want} profile, or which profile of a two-way player', parse: v.position, jobs: [...TARGET_JOBS, 'dims'],
    helpFor: { prospect: 'which profile of a two-way player', dims: 'only the group of this position (C, 1B, ..., DH, SP, RP)' },
  },
  want: {
    name: 'want', value: 'profile', help: 'hand-built target, e.g. "pop_2b_s=1.90,obp=.360" or "obp=60g" (grades)', parse: v.text, jobs: WANT_JOBS,
    helpFor: { cheaper: 'hand-built target (needs {max-salary}), e.g. "obp=.360,iso=.200"', match: 'hand-built target in place of player-a, e.g. "pop_2b_s=1.90,obp=.330"' },
  },
  batch: {
    name: 'batch', value: 'file', help: 'CSV of targets (player_id, season, level): one JSON line per target (CSV rows with {format} csv)', parse: v.text, jobs: TARGET_JOBS, only: 'cli',
    helpFor: { match: 'CSV of candidates (player_id, season, level) against the one target: one JSON line each (CSV rows with {format} csv)' },
  },
  window: {
    name: 'window', value: 'n', parse: v.wholeUpTo(v.MAX_WINDOW), default: 1, defaultFor: { comps: DEFAULT_WINDOW, match: DEFAULT_WINDOW }, jobs: TARGET_JOBS,
    help: `profiles over his last N seasons at the level (events added up), compared with other players\u2019 windows of N seasons ending at any season; 1: single seasons (a store holds the windows kindred build --windows made; comps and match default to ${DEFAULT_WINDOW} when the store has it, else 1)`,
  },
  seasonB: { name: 'season-b', value: 'year', help: 'the candidate season (default: his season most alike the target)', parse: v.season, jobs: ['match'] },
  levelB: { name: 'level-b', value: 'level', help: 'the candidate level (default: his highest that season)', parse: v.text, jobs: ['match'] },
  horizon: { name: 'horizon', value: 'n', help: 'seasons of follow-up after each comp season', parse: v.positiveInt, default: DEFAULT_PROSPECT_OPTIONS.horizon, jobs: ['prospect'] },
  path: { name: 'path', help: 'match his last N seasons, each aligned by age, at the same levels', value: 'n', parse: v.positiveInt, default: DEFAULT_PROSPECT_OPTIONS.path, jobs: ['prospect'] },
  includeCensored: {
    name: 'include-censored', help: 'also list comps whose follow-up is incomplete (never in the outlook)', parse: v.flag, default: DEFAULT_PROSPECT_OPTIONS.includeCensored, jobs: ['prospect'],
  },
  maxSalary: { name: 'max-salary', value: 'usd', help: 'comps paid at most this many US dollars in their season', parse: v.usdAmount, jobs: ['cheaper'] },
  maxShare: { name: 'max-share', value: 'share', help: 'comps paid at most this share of the target\u2019s salary (default 0.5)', parse: v.fraction, jobs: ['cheaper'] },
  poolLevel: { name: 'pool-level', value: 'levels', help: 'comps only from these levels, e.g. AA,AAA', parse: v.list, jobs: TARGET_JOBS },
  poolSeason: { name: 'pool-season', value: 'range', help: 'comps only from these seasons, e.g. 2015-2020 or 2018', parse: v.seasonRange, jobs: TARGET_JOBS },
  age: { name: 'age', value: 'range', help: 'comps only at these ages (June 30), e.g. 21-24', parse: v.ageRange, jobs: TARGET_JOBS },
  bats: { name: 'bats', value: 'hands', help: 'comps only batting L, R or S (comma list)', parse: v.bats, jobs: TARGET_JOBS },
  throws: { name: 'throws', value: 'hands', help: 'comps only throwing L or R (comma list)', parse: v.throws, jobs: TARGET_JOBS },
  poolPosition: { name: 'pool-position', value: 'positions', help: 'comps only at these positions, e.g. SS,2B (default: the target\u2019s own)', parse: v.positions, jobs: TARGET_JOBS },
  adjacent: {
    name: 'adjacent', help: 'also comps at the positions next to the target\u2019s (SS: 2B and 3B; see docs/jobs.md)', parse: v.flag, default: DEFAULT_REACH.adjacent, jobs: ['comps', 'cheaper', 'match'],
  },
  levelSpan: {
    name: 'level-span', value: 'n', help: 'comps from levels within n of the target\u2019s (0: his own; all: any level); {pool-level} replaces it', parse: v.reach,
    default: DEFAULT_REACH.levelSpan, defaultFor: { cheaper: CHEAPER_REACH.levelSpan }, jobs: ['comps', 'cheaper', 'match'],
  },
  sampleFloor: {
    name: 'sample-floor', value: 'share', help: 'least playing time of a comp (PA or BF) as a share of the target\u2019s (0: none)', parse: v.fraction,
    default: DEFAULT_REACH.sampleShare, jobs: ['comps', 'cheaper', 'match'],
  },
  recent: {
    name: 'recent', value: 'n', help: 'comps only from the target\u2019s season and the n - 1 before it (all: any season); {pool-season} replaces it', parse: v.reach,
    defaultFor: { cheaper: CHEAPER_REACH.recentSeasons }, jobs: ['comps', 'cheaper', 'match'],
  },
  k: {
    name: 'k', value: 'n', help: `number of comps (at most ${v.MAX_K})`, parse: v.wholeUpTo(v.MAX_K), default: DEFAULT_COMPS_OPTIONS.k,
    defaultFor: { prospect: DEFAULT_PROSPECT_OPTIONS.comps.k }, jobs: TARGET_JOBS,
  },
  preset: {
    name: 'preset', value: 'name', help: `skill-family shares: ${Object.keys(WEIGHT_PRESETS).join(', ')} (bat, glove, power, speed for hitters; results, stuff, command for pitchers)`, parse: preset, default: DEFAULT_COMPS_OPTIONS.preset, jobs: TARGET_JOBS,
  },
  weights: {
    name: 'weights', value: 'list', help: 'per-dimension multipliers by name or label, e.g. obp=2,run_speed_ft_s=0', parse: v.weightOverrides, jobs: TARGET_JOBS,
  },
  weighting: {
    name: 'weighting', value: 'scheme', help: 'redundancy (default: family shares, repeated skills weigh less) or plain z-scores', parse: v.oneOf(['redundancy', 'plain']),
    default: DEFAULT_COMPS_OPTIONS.weighting, jobs: TARGET_JOBS,
  },
  minCoverage: {
    name: 'min-coverage', value: 'share', help: 'least share of the target profile a comp must have (0 to 1)', parse: v.fraction, default: DEFAULT_COMPS_OPTIONS.minCoverage,
    defaultFor: { prospect: DEFAULT_PROSPECT_OPTIONS.comps.minCoverage }, jobs: TARGET_JOBS,
  },
  exact: { name: 'exact', help: 'scan the whole pool instead of asking the index', parse: v.flag, default: DEFAULT_COMPS_OPTIONS.exact, jobs: TARGET_JOBS },
  allSeasons: { name: 'all-seasons', help: 'allow several seasons of one comp player', parse: v.flag, default: DEFAULT_COMPS_OPTIONS.allSeasons, jobs: TARGET_JOBS },
  format: {
    name: 'format', value: 'format', help: 'table, json or csv', parse: v.format, default: 'table', jobs: [...TARGET_JOBS, 'dims', 'backtest'], only: 'cli',
    helpFor: { dims: 'table or json', backtest: 'table or json' },
  },
  q: { name: 'q', value: 'text', help: 'part of a player name or an id', parse: v.text, jobs: ['players'], only: 'http' },
  limit: { name: 'limit', value: 'n', help: 'most players to suggest', parse: v.wholeUpTo(MAX_PLAYERS_LIMIT), default: 10, jobs: ['players'], only: 'http' },
  group: {
    name: 'group', value: 'group', help: `position group (${POSITION_GROUPS.join(', ')})`, parse: groupChoice, jobs: ['map', 'backtest'],
    helpFor: { backtest: `hitters, pitchers or one position group (${POSITION_GROUPS.join(', ')}) (default: every group)` },
  },
  cuts: { name: 'cuts', value: 'seasons', help: 'cut seasons, comma-separated (default: every season that can be scored)', parse: v.seasons, jobs: ['backtest'] },
  charts: { name: 'charts', value: 'dir', help: 'also write reliability and coverage charts (SVG) into this folder', parse: v.text, jobs: ['backtest'], only: 'cli' },
};

/** The keys of the table, in its order. */
export const PARAMETER_KEYS: readonly ParameterKey[] = Object.keys(PARAMETERS).filter((k): k is ParameterKey => Object.hasOwn(PARAMETERS, k));

/** Spells `{name}` references in help text through a front end's namer. */
export function spell(text: string, name: (parameter: string) => string): string {
  return text.replace(/\{([a-z][a-z0-9-]*)\}/g, (_, p: string) => name(p));
}

/** The parameters a job takes on a front end, in table order. */
export function parametersOf(job: JobName, front: 'cli' | 'http'): ParameterKey[] {
  return PARAMETER_KEYS.filter((key) => {
    const p = PARAMETERS[key];
    return p.jobs.includes(job) && (p.only === undefined || p.only === front);
  });
}

/** A parameter's default for a job, if it has one. */
export function defaultOf<K extends ParameterKey>(key: K, job: JobName): RequestValues[K] | undefined {
  const p: Parameter<RequestValues[K]> = PARAMETERS[key];
  return p.defaultFor?.[job] ?? p.default;
}

/** A parameter's help for a job. */
export function helpOf(key: ParameterKey, job: JobName): string {
  const p = PARAMETERS[key];
  return p.helpFor?.[job] ?? p.help;
}
