/**
 * One pitching line (a pitcher's stint at one level) from his true talents.
 *
 * Model (invented, plausible): batters faced follow from the outs recorded
 * and the rate of reaching base; strikeouts (stuff, velocity, spin), walks
 * (control), hit batters, home runs (fewer for groundballers and good stuff)
 * and hits on balls in play are chained binomials. Earned runs are a
 * linear-weights style estimate of the events with overdispersed noise.
 * Outcome rates get the level shift; the fastball's speed and spin are
 * physical (talent only). Whiff% is a binomial share of swings; GB% a
 * binomial share of batted balls. `era` (default 0) adds to stuff (more
 * strikeouts when positive, at every level alike), the pitching side of the
 * simulator's eraDrift. Centre: a typical top-level pitcher gives
 * K% ~22, BB% ~8, HR/BF ~3%, ERA ~4.2, FB ~93.5 mph, spin ~2290 rpm, whiff
 * ~25%, GB ~43% (common practice, from memory).
 *
 * @example
 * // 540 outs (180 IP) by a typical starter: about 770 BF, 170 SO, 62 BB, 84 ER.
 * pitchingLine(rng, talents, LEVEL_TOP, 30, 30, 540, false, true, true, row);
 */
import { PITCHING_COLUMNS, columnAt } from './fileSchemas.ts';
import { LEVEL_SHIFT } from './levelTable.ts';
import { logistic, logit } from './logistic.ts';
import type { SeededRandom } from '../random/SeededRandom.ts';
import { P_CONTROL, P_GROUNDBALL, P_SPIN, P_STUFF, P_VELOCITY } from './talentNames.ts';

/** Mean talent of a top-level pitcher (outcome rates are centred there). */
export const TOP_PITCH_CENTRE = { stuff: 1.2, control: 0.75, groundball: 0.1, velocity: 0.6, spin: 0.25 } as const;

const C = (name: string): number => columnAt(PITCHING_COLUMNS, name);
const iG = C('G'), iGS = C('GS'), iIP = C('IP'), iBF = C('BF'), iH = C('H'), iHR = C('HR'), iBB = C('BB');
const iHBP = C('HBP'), iSO = C('SO'), iER = C('ER'), iFB = C('fb_mph'), iSPIN = C('fb_spin_rpm');
const iWHIFF = C('whiff_pct'), iGB = C('gb_pct');

const PITCHER_SHIFT_SCALE = 1.5;
const L_SO = logit(0.22), L_BB = logit(0.08), L_HR = logit(0.03), L_BABIP = logit(0.292);
const L_WHIFF = logit(0.25), L_GB = logit(0.43);

export function pitchingLine(
  rng: SeededRandom,
  t: Float64Array,
  /** Row of the default level table (levelTable.ts), for the opposition shift. */
  level: number,
  games: number,
  starts: number,
  outs: number,
  reliever: boolean,
  tracking: boolean,
  groundball: boolean,
  row: Float64Array,
  era = 0,
): void {
  // Pitchers climb the ladder further below the top level's talent than hitters, so their shift is larger.
  const shift = PITCHER_SHIFT_SCALE * (LEVEL_SHIFT[level] ?? 0);
  const stuff = (t[P_STUFF] ?? 0) - TOP_PITCH_CENTRE.stuff + (era !== 0 ? era : 0);
  const control = (t[P_CONTROL] ?? 0) - TOP_PITCH_CENTRE.control;
  const gb = (t[P_GROUNDBALL] ?? 0) - TOP_PITCH_CENTRE.groundball;
  const velo = (t[P_VELOCITY] ?? 0) - TOP_PITCH_CENTRE.velocity;
  const spin = (t[P_SPIN] ?? 0) - TOP_PITCH_CENTRE.spin;
  const xs = stuff + shift, xc = control + shift, xg = gb;
  // Relievers throw harder and miss more bats in short stints (common practice).
  const relief = reliever ? 0.25 : 0;

  const pSO = logistic(L_SO + 0.33 * (xs + relief) + 0.1 * velo + 0.06 * spin);
  const pBB = logistic(L_BB - 0.32 * xc);
  const pHBP = 0.009;
  const pHR = logistic(L_HR - 0.2 * xg - 0.13 * xs - 0.1 * shift);
  const babip = logistic(L_BABIP - 0.05 * xs - 0.02 * xg);
  const onBase = pBB + pHBP + pHR + (1 - pSO - pBB - pHBP - pHR) * babip;
  // About 2.5% of batters faced add an out on the bases (double plays, runners caught).
  const BF = Math.max(outs, Math.round(outs / (1 - onBase + 0.025)));
  const SO = rng.binomial(BF, pSO);
  const BB = rng.binomial(BF - SO, pBB / (1 - pSO));
  const HBP = rng.binomial(BF - SO - BB, pHBP / (1 - pSO - pBB));
  const rest = BF - SO - BB - HBP;
  const HR = rng.binomial(rest, pHR / (1 - pSO - pBB - pHBP));
  const bip = rest - HR;
  const hitsInPlay = rng.binomial(bip, babip);
  const H = hitsInPlay + HR;
  const expected = Math.max(0, 0.3 * hitsInPlay + 1.3 * HR + 0.2 * (BB + HBP) - 0.05 * SO);
  const ER = Math.max(HR, Math.round(expected + Math.sqrt(1.6 * Math.max(expected, 0.5)) * rng.normal()));

  row[iG] = games;
  row[iGS] = starts;
  row[iIP] = outs;
  row[iBF] = BF;
  row[iH] = H;
  row[iHR] = HR;
  row[iBB] = BB;
  row[iHBP] = HBP;
  row[iSO] = SO;
  row[iER] = ER;
  const nan = Number.NaN;
  if (tracking) {
    const pitches = Math.max(1, Math.round(BF * 3.9));
    const fastballs = Math.max(1, Math.round(pitches * 0.5));
    row[iFB] = 93.5 + 2.2 * velo + (reliever ? 1.0 : 0) + (1.2 / Math.sqrt(fastballs)) * rng.normal();
    row[iSPIN] = Math.round(2290 + 120 * spin + 20 * velo + (90 / Math.sqrt(fastballs)) * rng.normal());
    const swings = Math.max(1, Math.round(pitches * 0.47));
    row[iWHIFF] = (100 * rng.binomial(swings, logistic(L_WHIFF + 0.3 * (xs + relief) + 0.1 * velo + 0.08 * spin))) / swings;
  } else {
    row[iFB] = nan; row[iSPIN] = nan; row[iWHIFF] = nan;
  }
  const batted = bip + HR;
  row[iGB] = groundball && batted > 0 ? (100 * rng.binomial(batted, logistic(L_GB + 0.45 * xg))) / batted : nan;
}
