/**
 * One fielding line (a player's games at one position in one stint).
 *
 * Model (invented, plausible, rates per nine innings from common practice,
 * from memory): putouts and assists are Poisson counts around a position's
 * typical rate, scaled up by range (glove, and speed in the outfield);
 * errors are Poisson around chances times an error rate that falls with
 * glove. Arm velocity is a position base plus arm talent. Catchers also get
 * stolen-base attempts against (fewer against a good thrower), runners
 * caught (binomial, rate rising with catcherThrow and arm), pop time
 * (about 1.95 s for a typical catcher) and exchange time, both falling with
 * catcherThrow; noise shrinks with the throws seen.
 *
 * @example
 * // 120 games at SS by an average glove: about 1000 innings, 180 PO, 330 A, 14 E.
 * fieldingLine(rng, talents, 'SS', 120, true, true, false, row);
 */
import type { FieldPosition } from '../ingest/Roster.ts';
import { FIELDING_COLUMNS, columnAt } from './fileSchemas.ts';
import { logistic, logit } from './logistic.ts';
import type { SeededRandom } from '../random/SeededRandom.ts';
import { H_ARM, H_CTHROW, H_GLOVE, H_SPEED } from './talentNames.ts';

const C = (name: string): number => columnAt(FIELDING_COLUMNS, name);
const iG = C('G'), iINN = C('inn'), iPO = C('PO'), iA = C('A'), iE = C('E'), iARM = C('arm_mph');
const iPOP = C('pop_2b_s'), iEXCH = C('exchange_s'), iSBA = C('sb_against'), iCS = C('cs_caught');

interface PositionRates {
  readonly po9: number;
  readonly a9: number;
  readonly error: number;
  readonly arm: number;
  readonly outfield: boolean;
}

const RATES: Readonly<Record<FieldPosition, PositionRates>> = {
  C: { po9: 7.6, a9: 0.7, error: 0.007, arm: 80, outfield: false },
  '1B': { po9: 8.4, a9: 0.65, error: 0.005, arm: 79, outfield: false },
  '2B': { po9: 1.9, a9: 2.9, error: 0.014, arm: 80, outfield: false },
  '3B': { po9: 0.75, a9: 2.0, error: 0.04, arm: 84, outfield: false },
  SS: { po9: 1.6, a9: 2.9, error: 0.027, arm: 85, outfield: false },
  LF: { po9: 1.9, a9: 0.05, error: 0.016, arm: 85, outfield: true },
  CF: { po9: 2.6, a9: 0.06, error: 0.012, arm: 87, outfield: true },
  RF: { po9: 2.0, a9: 0.07, error: 0.017, arm: 89, outfield: true },
};

const L_CAUGHT = logit(0.25);

export function fieldingLine(
  rng: SeededRandom,
  t: Float64Array,
  pos: FieldPosition,
  games: number,
  regular: boolean,
  armMeasured: boolean,
  catcherTiming: boolean,
  row: Float64Array,
): void {
  const rates = RATES[pos];
  const glove = t[H_GLOVE] ?? 0, speed = t[H_SPEED] ?? 0, arm = t[H_ARM] ?? 0, cthrow = t[H_CTHROW] ?? 0;
  const inningsPerGame = regular ? rng.uniform(7.6, 8.9) : rng.uniform(4.5, 8.0);
  const outs = Math.max(1, Math.round(games * inningsPerGame * 3));
  const nine = outs / 27;
  const range = Math.exp(0.08 * glove + (rates.outfield ? 0.08 : 0.03) * speed);
  const PO = rng.poisson(nine * rates.po9 * range);
  const A = rng.poisson(nine * rates.a9 * range * (rates.outfield ? Math.exp(0.3 * arm) : 1));
  const E = rng.poisson((PO + A) * rates.error * Math.exp(-0.35 * glove));
  row[iG] = games;
  row[iINN] = outs;
  row[iPO] = PO;
  row[iA] = A;
  row[iE] = E;
  const nan = Number.NaN;
  row[iARM] = armMeasured && games >= 5 ? rates.arm + 3.5 * arm + 0.8 * rng.normal() : nan;
  if (pos === 'C') {
    const attempts = rng.poisson(nine * 0.8 * Math.exp(-0.2 * cthrow));
    row[iSBA] = attempts;
    row[iCS] = rng.binomial(attempts, logistic(L_CAUGHT + 0.35 * cthrow + 0.15 * arm));
    const throwsSeen = Math.max(1, attempts);
    const timed = catcherTiming && attempts >= 3;
    row[iPOP] = timed ? Math.min(2.4, Math.max(1.7, 1.95 - 0.07 * cthrow - 0.03 * arm + (0.08 / Math.sqrt(throwsSeen)) * rng.normal())) : nan;
    row[iEXCH] = timed ? Math.min(0.95, Math.max(0.55, 0.72 - 0.045 * cthrow + (0.05 / Math.sqrt(throwsSeen)) * rng.normal())) : nan;
  } else {
    row[iSBA] = nan; row[iCS] = nan; row[iPOP] = nan; row[iEXCH] = nan;
  }
}
