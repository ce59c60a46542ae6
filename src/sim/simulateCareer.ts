/**
 * One player's whole professional career, season by season, before any stat
 * line is drawn: who he is (kind, handedness, position or role, peak talents,
 * birth date), his true talents each season, and where he played.
 *
 * Career model (invented, plausible):
 * - Entry at ages 17 to 23 (on June 30): the youngest at Entry, college-age
 *   players at Low or, if already good enough, Mid.
 * - Talent each season = peak talent + age curve (scaled by the player's own
 *   development speed) + a slow random walk (sd 0.06 a year per talent).
 * - A season's showing is the current value plus noise (sd 0.3). A showing
 *   above the next level's bar earns a promotion for next season, a strong
 *   one sometimes a mid-season promotion (two levels in one season); a poor
 *   one can mean a demotion. Release is likelier the further the showing
 *   falls below the level's bar and the older the player is for the level;
 *   top-level players retire more often from 33 on, all by 41.
 * - Regulars (value clearly above the level's bar) get most of a full
 *   season's playing time, others a part; some seasons are cut by injury.
 * - About 4% of stints are split by a mid-season move to another club.
 */
import type { Bats, Throws } from '../ingest/Roster.ts';
import { ageOffset } from './ageCurve.ts';
import { choosePosition, secondaryPosition, type HitterPosition } from './choosePosition.ts';
import { drawHitterTalents, drawPitcherTalents } from './drawTalents.ts';
import { simLadder, type SimLadder } from './simLadder.ts';
import { hitterValue, pitcherValue } from './playerValue.ts';
import type { SeededRandom } from '../random/SeededRandom.ts';
import { HITTER_CURVES, PITCHER_CURVES } from './talentCurves.ts';
import { H_GLOVE, H_SPEED, HITTER_TALENTS, P_STAMINA, PITCHER_TALENTS, type SimKind } from './talentNames.ts';
import type { FieldPosition } from '../ingest/Roster.ts';

export interface CareerStint {
  readonly level: number;
  /** Club index within the level (0 .. teamsPerLevel-1). */
  readonly club: number;
  /** Share of a full season's playing time. */
  readonly share: number;
}

export interface CareerSeason {
  readonly season: number;
  readonly age: number;
  /** True talents this season (aged), in TALENT_NAMES[kind] order. */
  readonly talents: Float64Array;
  readonly value: number;
  readonly stints: readonly CareerStint[];
  /** Hitters: primary position (DH for no fielding); pitchers: SP or RP. */
  readonly position: HitterPosition | 'SP' | 'RP';
  /** A position also covered this season, if any. */
  readonly secondary: FieldPosition | null;
  readonly regular: boolean;
}

export interface Career {
  readonly kind: SimKind;
  readonly bats: Bats;
  readonly throws: Throws;
  readonly birthDate: string;
  readonly entrySeason: number;
  readonly entryAge: number;
  readonly peak: Float64Array;
  /** Overall value of the peak talents at the entry position or role. */
  readonly peakValue: number;
  readonly seasons: readonly CareerSeason[];
  /** Still playing after the last simulated season (a censored career). */
  readonly active: boolean;
}

/** What drives movement on the ladder; the defaults are those of the demo league. */
export interface CareerRules {
  readonly ladder: SimLadder;
  /** How far above the next level's bar a season's showing must be for a promotion (default 0.05). */
  readonly promotionMargin: number;
  /** Chance that a showing good enough earns the promotion (default 1: always). */
  readonly promotionChance: number;
  /** Standard deviation of a season's showing around the player's true value (default 0.3). */
  readonly showingNoise: number;
}

export const DEFAULT_CAREER_RULES: CareerRules = { ladder: simLadder(), promotionMargin: 0.05, promotionChance: 1, showingNoise: 0.3 };

const ENTRY_AGES = [17, 18, 19, 20, 21, 22, 23] as const;
const ENTRY_WEIGHTS = [0.12, 0.25, 0.1, 0.1, 0.26, 0.13, 0.04] as const;
const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31] as const;
const WALK_SD = 0.06;
const LAST_AGE = 41;
/** Value an Entry player is measured against (Entry itself has no bar). */
const RK_FLOOR = -1.7;

function drawEntryAge(rng: SeededRandom): number {
  let u = rng.next();
  for (let i = 0; i < ENTRY_AGES.length; i++) {
    u -= ENTRY_WEIGHTS[i] ?? 0;
    if (u < 0) return ENTRY_AGES[i] ?? 21;
  }
  return 21;
}

/** The bar a player at `level` is measured against: the rookie level has none (RK_FLOOR). */
function barOf(ladder: SimLadder, level: number): number {
  return ladder.base[level] === 0 ? RK_FLOOR : (ladder.bar[level] ?? 0);
}

/** Entry level: the youngest start at the bottom, older entrants where their value fits (rows of the default table). */
function entryLevel(ladder: SimLadder, entryAge: number, value: number): number {
  const defaultBar = simLadder().bar;
  let row = 0;
  if ((entryAge >= 19 && value > (defaultBar[1] ?? 0) - 0.2) || entryAge >= 21) row = 1;
  if (entryAge >= 21 && value > (defaultBar[2] ?? 0)) row = 2;
  let level = 0;
  for (let l = 0; l < ladder.base.length; l++) if ((ladder.base[l] ?? 99) <= row) level = l;
  return level;
}

function drawBats(rng: SeededRandom, throws: Throws): Bats {
  const u = rng.next();
  if (throws === 'R') return u < 0.75 ? 'R' : u < 0.9 ? 'L' : 'S';
  return u < 0.82 ? 'L' : u < 0.9 ? 'R' : 'S';
}

/** Later in a career some players slide to an easier position. */
function slidePosition(rng: SeededRandom, pos: HitterPosition, age: number, t: Float64Array): HitterPosition {
  if (age < 28) return pos;
  const declining = (t[H_SPEED] ?? 0) + (t[H_GLOVE] ?? 0) < 0;
  if (!declining || !rng.chance(0.12)) return pos;
  switch (pos) {
    case 'SS': return rng.chance(0.5) ? '3B' : '2B';
    case 'CF': return rng.chance(0.5) ? 'LF' : 'RF';
    case '2B': case '3B': return '1B';
    case 'LF': case 'RF': return rng.chance(0.5) ? '1B' : 'DH';
    case '1B': return rng.chance(0.3) ? 'DH' : '1B';
    case 'C': return age >= 31 && rng.chance(0.4) ? '1B' : 'C';
    case 'DH': return 'DH';
  }
}

export function simulateCareer(
  rng: SeededRandom,
  entrySeason: number,
  lastSeason: number,
  teamsPerLevel: number,
  pitcherShare: number,
  rules: CareerRules = DEFAULT_CAREER_RULES,
): Career {
  const { ladder, promotionMargin, promotionChance, showingNoise } = rules;
  const top = ladder.top;
  const bar = (level: number): number => barOf(ladder, level);
  const kind: SimKind = rng.chance(pitcherShare) ? 'pitcher' : 'hitter';
  const width = kind === 'hitter' ? HITTER_TALENTS.length : PITCHER_TALENTS.length;
  const peak = new Float64Array(width);
  if (kind === 'hitter') drawHitterTalents(rng, peak);
  else drawPitcherTalents(rng, peak);
  const curves = kind === 'hitter' ? HITTER_CURVES : PITCHER_CURVES;
  const development = Math.exp(0.25 * rng.normal());

  const entryAge = drawEntryAge(rng);
  const month = 1 + rng.int(12);
  const day = 1 + rng.int(DAYS_IN_MONTH[month - 1] ?? 28);
  const lateBirthday = month > 6; // after June 30: not yet a year older on June 30
  const birthYear = entrySeason - entryAge - (lateBirthday ? 1 : 0);
  const birthDate = `${birthYear}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;

  const throws: Throws = rng.chance(kind === 'pitcher' ? 0.28 : 0.22) ? 'L' : 'R';
  const bats = drawBats(rng, throws);

  let position: HitterPosition | 'SP' | 'RP';
  let secondary: FieldPosition | null = null;
  if (kind === 'hitter') {
    position = throws === 'R' && rng.chance(0.14) ? 'C' : choosePosition(rng, peak, throws);
    if (rng.chance(0.35)) secondary = secondaryPosition(rng, position, throws);
  } else {
    position = (peak[P_STAMINA] ?? 0) + 0.6 * rng.normal() > -0.15 ? 'SP' : 'RP';
  }

  const valueNow = (t: Float64Array): number =>
    kind === 'hitter'
      ? hitterValue(t, position === 'SP' || position === 'RP' ? 'DH' : position)
      : pitcherValue(t, position === 'SP');

  const peakValue = valueNow(peak);
  const walk = new Float64Array(width);
  const seasons: CareerSeason[] = [];
  let level = 0;
  let club = rng.int(teamsPerLevel);
  let active = true;
  for (let season = entrySeason; season <= lastSeason; season++) {
    const age = season - birthYear - (lateBirthday ? 1 : 0);
    const talents = new Float64Array(width);
    for (let k = 0; k < width; k++) {
      const curve = curves[k];
      talents[k] = (peak[k] ?? 0) + (curve ? ageOffset(curve, age, development) : 0) + (walk[k] ?? 0);
      walk[k] = (walk[k] ?? 0) + WALK_SD * rng.normal();
    }
    if (kind === 'hitter' && position !== 'SP' && position !== 'RP') position = slidePosition(rng, position, age, talents);
    const value = valueNow(talents);
    if (season === entrySeason) {
      level = entryLevel(ladder, entryAge, value);
    }
    const showing = value + showingNoise * rng.normal();
    const regular = value - bar(level) + 0.3 * rng.normal() > 0.15;
    let share = regular ? rng.uniform(0.75, 1.05) : rng.uniform(0.15, 0.65);
    if (rng.chance(0.1)) share *= rng.uniform(0.15, 0.7);

    const stints: CareerStint[] = [];
    const push = (lv: number, cl: number, sh: number): void => {
      if (rng.chance(0.04) && sh > 0.2) {
        const first = rng.uniform(0.3, 0.7);
        const other = (cl + 1 + rng.int(Math.max(1, teamsPerLevel - 1))) % teamsPerLevel;
        stints.push({ level: lv, club: cl, share: sh * first });
        stints.push({ level: lv, club: other, share: sh * (1 - first) });
        club = other;
      } else {
        stints.push({ level: lv, club: cl, share: sh });
      }
    };
    if (level < top && season > entrySeason && showing > bar(level + 1) + 0.35 && rng.chance(0.45)) {
      const first = rng.uniform(0.3, 0.7);
      push(level, club, share * first);
      level++;
      club = rng.int(teamsPerLevel);
      push(level, club, share * (1 - first));
    } else {
      push(level, club, share);
    }
    seasons.push({ season, age, talents, value, stints, position, secondary: secondaryThisSeason(rng, secondary, position), regular });

    // Next season: retire or release, then promotion or demotion.
    const gap = bar(level) - showing;
    const old = Math.max(0, age - (ladder.typicalAge[level] ?? 27) - 1);
    let leave = 1 / (1 + Math.exp(3.2 - 2.0 * gap - 0.8 * old));
    if (level === top) leave = (age >= 33 ? 0.12 + 0.07 * (age - 33) : 0.02) + (gap > 0.6 ? 0.2 : 0);
    if (age >= LAST_AGE) {
      active = false;
      break;
    }
    if (season === lastSeason) break;
    if (rng.chance(leave)) {
      active = false;
      break;
    }
    const before = level;
    if (level < top && showing > bar(level + 1) + promotionMargin && (promotionChance >= 1 || rng.chance(promotionChance))) level++;
    else if (level > 0 && gap > 0.45 && rng.chance(level === top ? 0.75 : 0.35)) level--;
    if (level !== before || !rng.chance(0.85)) club = rng.int(teamsPerLevel);
    if (kind === 'pitcher' && position === 'SP' && (ladder.base[level] ?? 0) >= 3 && gap > 0 && rng.chance(0.25)) position = 'RP';
  }
  return { kind, bats, throws, birthDate, entrySeason, entryAge, peak, peakValue, seasons, active };
}

function secondaryThisSeason(
  rng: SeededRandom,
  secondary: FieldPosition | null,
  position: HitterPosition | 'SP' | 'RP',
): FieldPosition | null {
  return secondary !== null && secondary !== position && rng.chance(0.65) ? secondary : null;
}
