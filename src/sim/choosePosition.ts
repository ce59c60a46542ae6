/**
 * Position of a non-catcher from his peak talents: a softmax over
 * position utilities (invented weights following common practice: SS and CF
 * need range and speed, 3B and RF an arm, 1B and DH take the weakest
 * gloves). Left-handed throwers do not play 2B, 3B or SS. Also a secondary
 * position a player covers now and then.
 *
 * @example
 * // A fast, rangy, strong-armed player is most often a shortstop or centre fielder.
 * choosePosition(rng, talents, 'R');
 */
import type { FieldPosition, Throws } from '../ingest/Roster.ts';
import type { SeededRandom } from '../random/SeededRandom.ts';
import { H_ARM, H_GLOVE, H_POWER, H_SPEED } from './talentNames.ts';

export type HitterPosition = FieldPosition | 'DH';

const CHOICES: readonly HitterPosition[] = ['1B', '2B', '3B', 'SS', 'LF', 'CF', 'RF', 'DH'];
const RIGHT_ONLY: ReadonlySet<HitterPosition> = new Set<HitterPosition>(['2B', '3B', 'SS']);

function utility(pos: HitterPosition, g: number, s: number, a: number, p: number): number {
  switch (pos) {
    case 'SS': return 1.3 * g + 0.6 * s + 0.6 * a - 0.3 * p - 0.2;
    case 'CF': return 1.2 * s + 0.7 * g + 0.2 * a - 0.2 * p - 0.3;
    case '2B': return 0.9 * g + 0.4 * s - 0.2 * a - 0.2 * p + 0.35;
    case '3B': return 0.9 * a + 0.5 * g - 0.3 * s + 0.2 * p + 0.3;
    case 'RF': return 0.9 * a + 0.3 * s + 0.3 * p;
    case 'LF': return 0.2 * s - 0.3 * a + 0.3 * p - 0.1 * g;
    case '1B': return -0.9 * g - 0.5 * s + 0.6 * p - 0.45;
    case 'DH': return -1.2 * g - 0.8 * s - 0.6 * a + 0.6 * p - 1.6;
    case 'C': return -Infinity;
  }
}

export function choosePosition(rng: SeededRandom, t: Float64Array, throws: Throws): HitterPosition {
  const g = t[H_GLOVE] ?? 0, s = t[H_SPEED] ?? 0, a = t[H_ARM] ?? 0, p = t[H_POWER] ?? 0;
  const weights: number[] = [];
  let total = 0;
  for (const pos of CHOICES) {
    const w = throws === 'L' && RIGHT_ONLY.has(pos) ? 0 : Math.exp(1.8 * utility(pos, g, s, a, p));
    weights.push(w);
    total += w;
  }
  let u = rng.next() * total;
  for (let i = 0; i < CHOICES.length; i++) {
    u -= weights[i] ?? 0;
    if (u < 0) return CHOICES[i] ?? 'LF';
  }
  return 'LF';
}

/** Positions a player at `pos` most plausibly covers as a second position. */
const NEIGHBOURS: Readonly<Record<HitterPosition, readonly FieldPosition[]>> = {
  C: ['1B'],
  '1B': ['LF', '3B', 'RF'],
  '2B': ['SS', '3B', '1B'],
  '3B': ['1B', '2B', 'SS'],
  SS: ['2B', '3B'],
  LF: ['RF', '1B', 'CF'],
  CF: ['LF', 'RF'],
  RF: ['LF', '1B', 'CF'],
  DH: ['1B', 'LF'],
};

export function secondaryPosition(rng: SeededRandom, primary: HitterPosition, throws: Throws): FieldPosition {
  const options = NEIGHBOURS[primary].filter((p) => !(throws === 'L' && RIGHT_ONLY.has(p)));
  return options[rng.int(options.length)] ?? '1B';
}
