/**
 * One batting line (a player's stint at one level) drawn from his true
 * talents that season.
 *
 * Model (invented, plausible): each plate-appearance outcome has a
 * log-odds rate moved by talents, drawn as chained binomials, so the noise
 * of a rate shrinks with the sample (binomial-style). Several stats load on
 * one talent on purpose: walks and IBB on eye (and power); strikeouts on
 * contact (and eye); home runs, doubles, exit velocity, 90th-percentile exit
 * velocity, hard-hit rate and launch angle on power; triples, steals and
 * run speed on speed. Outcome rates use the talent plus the level shift
 * (weaker opposition at lower levels); physical measurements (exit velocity,
 * run speed) use the talent alone. Batted-ball averages carry noise
 * sd / sqrt(bbe).
 * `era` (talent units, default 0) moves the league's run environment: more
 * power and less contact when positive (more home runs and strikeouts), at
 * every level alike; the simulator's eraDrift option sets it by season.
 * Centre: a talent at TOP_CENTRE (a typical top-level regular) gives
 * top-level rates near OBP .320, K% 22, BB% 8.5, HR/PA 3%, EV 88.5 mph,
 * hard contact 39%, run speed 27 ft/s (common practice, from memory).
 *
 * @example
 * // 600 PA by a typical top-level regular: about 130 SO, 50 BB, 150 H, 18 HR.
 * battingLine(rng, talents, LEVEL_TOP, 600, 150, true, true, row);
 */
import { BATTING_COLUMNS, columnAt } from './fileSchemas.ts';
import { LEVEL_SHIFT } from './levelTable.ts';
import { logistic, logit } from './logistic.ts';
import type { SeededRandom } from '../random/SeededRandom.ts';
import { H_CONTACT, H_EYE, H_POWER, H_SPEED } from './talentNames.ts';

/** Mean talent of a top-level regular (outcome rates are centred there). */
export const TOP_CENTRE = { contact: 0.6, power: 0.8, eye: 0.65, speed: 0.1 } as const;

const C = (name: string): number => columnAt(BATTING_COLUMNS, name);
const iG = C('G'), iPA = C('PA'), iAB = C('AB'), iH = C('H'), i2B = C('2B'), i3B = C('3B'), iHR = C('HR');
const iBB = C('BB'), iIBB = C('IBB'), iHBP = C('HBP'), iSF = C('SF'), iSO = C('SO'), iSB = C('SB'), iCS = C('CS');
const iBBE = C('bbe'), iEV = C('ev_avg_mph'), iEV90 = C('ev_p90_mph'), iLA = C('la_avg_deg');
const iHARD = C('hard_hit_pct'), iSWEET = C('la_band_pct'), iSPRINT = C('run_speed_ft_s');

const L_BB = logit(0.085), L_SO = logit(0.22), L_HR = logit(0.043), L_BABIP = logit(0.295);
const L_3B = logit(0.022), L_2B = logit(0.21), L_IBB = logit(0.04);
const L_ATTEMPT = logit(0.07), L_STEAL = logit(0.74), L_HARD = logit(0.39), L_SWEET = logit(0.33);

/** Per batted ball spread of exit velocity (mph) and launch angle (degrees). */
const EV_SD = 14, LA_SD = 26;

export function battingLine(
  rng: SeededRandom,
  t: Float64Array,
  /** Row of the default level table (levelTable.ts), for the opposition shift. */
  level: number,
  pa: number,
  games: number,
  battedBall: boolean,
  sprint: boolean,
  row: Float64Array,
  era = 0,
): void {
  const shift = LEVEL_SHIFT[level] ?? 0;
  let contact = (t[H_CONTACT] ?? 0) - TOP_CENTRE.contact;
  let power = (t[H_POWER] ?? 0) - TOP_CENTRE.power;
  if (era !== 0) {
    contact -= era;
    power += era;
  }
  const eye = (t[H_EYE] ?? 0) - TOP_CENTRE.eye;
  const speed = (t[H_SPEED] ?? 0) - TOP_CENTRE.speed;
  const xc = contact + shift, xp = power + shift, xe = eye + shift, xs = speed + shift * 0.5;

  const pBB = logistic(L_BB + 0.32 * xe + 0.08 * xp - 0.05 * xc);
  const pHBP = 0.01;
  const pSF = 0.007;
  const pSH = 0.003 + 0.003 * Math.max(0, speed);
  const BB = rng.binomial(pa, pBB);
  let rest = pa - BB;
  const HBP = rng.binomial(rest, pHBP / (1 - pBB));
  rest -= HBP;
  const SF = rng.binomial(rest, pSF / (1 - pBB - pHBP));
  rest -= SF;
  const SH = rng.binomial(rest, pSH);
  const AB = rest - SH;
  const pSO = logistic(L_SO - 0.33 * xc + 0.1 * xp - 0.12 * xe);
  const SO = rng.binomial(AB, pSO / (1 - pBB - pHBP - pSF));
  const contactBalls = AB - SO;
  const HR = rng.binomial(contactBalls, logistic(L_HR + 0.55 * xp + 0.05 * xc));
  const bip = contactBalls - HR;
  const hitsInPlay = rng.binomial(bip, logistic(L_BABIP + 0.11 * xc + 0.06 * xs + 0.03 * xp));
  const triples = rng.binomial(hitsInPlay, logistic(L_3B + 0.6 * speed));
  const doubles = rng.binomial(hitsInPlay - triples, logistic(L_2B + 0.17 * xp + 0.05 * xs));
  const singles = hitsInPlay - triples - doubles;
  const IBB = rng.binomial(BB, logistic(L_IBB + 0.6 * power + (level >= 3 ? 0.3 : -0.3)));
  const chances = singles + BB + HBP + Math.round(0.2 * doubles);
  const attempts = rng.binomial(chances, logistic(L_ATTEMPT + 1.0 * speed));
  const SB = rng.binomial(attempts, logistic(L_STEAL + 0.5 * speed + 0.2 * shift));

  row[iG] = games;
  row[iPA] = pa;
  row[iAB] = AB;
  row[iH] = hitsInPlay + HR;
  row[i2B] = doubles;
  row[i3B] = triples;
  row[iHR] = HR;
  row[iBB] = BB;
  row[iIBB] = IBB;
  row[iHBP] = HBP;
  row[iSF] = SF;
  row[iSO] = SO;
  row[iSB] = SB;
  row[iCS] = attempts - SB;

  const nan = Number.NaN;
  if (battedBall) {
    const bbe = rng.binomial(contactBalls, 0.97);
    row[iBBE] = bbe;
    if (bbe > 0) {
      const root = Math.sqrt(bbe);
      const ev = 88.5 + 2.1 * power + 0.4 * contact + (EV_SD / root) * rng.normal();
      const p90 = Math.max(ev + 1, ev + 13.5 + 0.9 * power - 0.3 * contact + (5 / root) * rng.normal());
      row[iEV] = ev;
      row[iEV90] = p90;
      row[iLA] = 12.5 + 2.4 * power - 1.0 * speed + (LA_SD / root) * rng.normal();
      row[iHARD] = (100 * rng.binomial(bbe, logistic(L_HARD + 0.45 * power + 0.12 * contact))) / bbe;
      row[iSWEET] = (100 * rng.binomial(bbe, logistic(L_SWEET + 0.15 * contact + 0.05 * power))) / bbe;
    } else {
      row[iEV] = nan; row[iEV90] = nan; row[iLA] = nan; row[iHARD] = nan; row[iSWEET] = nan;
    }
  } else {
    row[iBBE] = nan; row[iEV] = nan; row[iEV90] = nan; row[iLA] = nan; row[iHARD] = nan; row[iSWEET] = nan;
  }
  // Run speed needs enough competitive runs; noise shrinks with the runs seen.
  row[iSPRINT] = sprint && pa >= 25 ? 27.0 + 1.25 * speed + (0.9 / Math.sqrt(Math.min(60, pa / 8))) * rng.normal() : nan;
}
