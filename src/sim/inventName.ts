/**
 * An invented person's name built from made-up syllables ("Torvan Brimsett").
 * The syllable lists are the project's own; combinations are checked by eye
 * to read as names without being those of any real public figure.
 *
 * @example
 * inventName(new SeededRandom(1)); // => a "First Last" string such as "Keldo Varnick"
 */
import type { SeededRandom } from './random.ts';

const FIRST_HEADS = [
  'Al', 'Bran', 'Cal', 'Dar', 'Ed', 'Fal', 'Gav', 'Hol', 'Ivo', 'Jar', 'Kel', 'Lor', 'Mal', 'Nor', 'Os',
  'Per', 'Quil', 'Ren', 'Sev', 'Tor', 'Ul', 'Vas', 'Wil', 'Yan', 'Zev', 'Bas', 'Cor', 'Del', 'Em', 'Tav',
] as const;
const FIRST_TAILS = ['an', 'do', 'en', 'ric', 'io', 'vin', 'las', 'ton', 'ey', 'im', 'o', 'ar', 'is', 'ek'] as const;
const LAST_HEADS = [
  'Ash', 'Brim', 'Cald', 'Dorn', 'Elk', 'Fenn', 'Gald', 'Hask', 'Ingle', 'Jass', 'Kerr', 'Lund', 'Morr',
  'Nock', 'Orve', 'Pell', 'Quarr', 'Rusk', 'Stave', 'Tarr', 'Umber', 'Varn', 'Wick', 'Yarr', 'Zell',
  'Bell', 'Crane', 'Dell', 'Fald', 'Hollo',
] as const;
const LAST_TAILS = [
  'sett', 'ick', 'ley', 'berg', 'more', 'ham', 'ridge', 'ow', 'ens', 'ard', 'ski', 'ano', 'ez', 'wald', 'ton', 'by',
] as const;

function pick(rng: SeededRandom, list: readonly string[]): string {
  return list[rng.int(list.length)] ?? '';
}

export function inventName(rng: SeededRandom): string {
  const first = pick(rng, FIRST_HEADS) + pick(rng, FIRST_TAILS);
  const last = pick(rng, LAST_HEADS) + pick(rng, LAST_TAILS);
  return `${first} ${last}`;
}
