/**
 * An invented person's name built from made-up syllables ("Torvan Brimsett").
 * The syllable lists are the project's own; combinations are checked by eye
 * to read as names without being those of any real public figure.
 *
 * @example
 * inventName(new SeededRandom(1)); // => a "First Last" string such as "Keldo Varnovar"
 */
import type { SeededRandom } from '../random/SeededRandom.ts';

const FIRST_HEADS = [
  'Al', 'Bran', 'Cal', 'Dar', 'Ed', 'Fal', 'Gav', 'Hol', 'Ivo', 'Jar', 'Kel', 'Lor', 'Mal', 'Nor', 'Os',
  'Per', 'Quil', 'Ren', 'Sev', 'Tor', 'Ul', 'Vas', 'Wil', 'Yan', 'Zev', 'Bas', 'Cor', 'Del', 'Em', 'Tav',
] as const;
const FIRST_TAILS = ['an', 'do', 'en', 'ric', 'io', 'vin', 'las', 'ton', 'ey', 'im', 'o', 'ar', 'is', 'ek'] as const;
const LAST_HEADS = [
  'Ash', 'Brim', 'Cald', 'Dorn', 'Elk', 'Fenn', 'Gald', 'Hask', 'Ingl', 'Jas', 'Kerr', 'Lund', 'Morr',
  'Nock', 'Orv', 'Pell', 'Quarr', 'Rusk', 'Stav', 'Tarr', 'Umber', 'Varn', 'Wick', 'Yarr', 'Zell',
  'Bell', 'Cran', 'Dell', 'Fald', 'Holl',
] as const;
// Tails chosen so the surnames read as invented rather than as common real surnames.
const LAST_TAILS = [
  'sett', 'vane', 'oll', 'ast', 'ovar', 'ume', 'adine', 'eck', 'isk', 'orne', 'ivet', 'indel', 'osk', 'ane', 'eski', 'ach',
] as const;

function pick(rng: SeededRandom, list: readonly string[]): string {
  return list[rng.int(list.length)] ?? '';
}

export function inventName(rng: SeededRandom): string {
  const first = pick(rng, FIRST_HEADS) + pick(rng, FIRST_TAILS);
  const last = pick(rng, LAST_HEADS) + pick(rng, LAST_TAILS);
  return `${first} ${last}`;
}
