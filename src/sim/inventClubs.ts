/**
 * Invented club names, `perLevel` clubs for each level, each a made-up town
 * plus a nickname ("Harrowmere Otters"). Names are unique across the league.
 *
 * @example
 * inventClubs(new SeededRandom(1), 6, 2).length; // => 12, level-major order
 */
import type { SeededRandom } from '../random/SeededRandom.ts';

const TOWN_HEADS = [
  'Harrow', 'Copper', 'Ash', 'Bright', 'Cinder', 'Dun', 'Elder', 'Fern', 'Gull', 'Hollow', 'Iron', 'Juniper',
  'Kettle', 'Lark', 'Marsh', 'North', 'Oak', 'Pine', 'Quarry', 'Raven', 'Salt', 'Thistle', 'Upper', 'Vale',
  'Willow', 'Yew', 'Stone', 'River', 'Moss', 'Flint',
] as const;
const TOWN_TAILS = [
  'mere', 'ford', 'field', 'haven', 'bury', 'wick', 'port', 'dale', 'crest', 'gate', 'brook', 'moor', 'ton',
] as const;
const NICKNAMES = [
  'Otters', 'Herons', 'Foxes', 'Badgers', 'Comets', 'Lanterns', 'Millers', 'Pilots', 'Stags', 'Owls', 'Wasps',
  'Rovers', 'Tinkers', 'Gales', 'Beacons', 'Ferrymen', 'Hollers', 'Kestrels', 'Bison', 'Quarrymen', 'Sparks',
  'Thunder Moths', 'Iron Geese', 'Lynxes', 'Marmots', 'Ospreys', 'Drifters', 'Wardens', 'Salamanders', 'Hares',
] as const;

export function inventClubs(rng: SeededRandom, levels: number, perLevel: number): string[] {
  const used = new Set<string>();
  const out: string[] = [];
  const total = levels * perLevel;
  let attempts = 0;
  while (out.length < total) {
    attempts++;
    const town = (TOWN_HEADS[rng.int(TOWN_HEADS.length)] ?? '') + (TOWN_TAILS[rng.int(TOWN_TAILS.length)] ?? '');
    const nick = NICKNAMES[rng.int(NICKNAMES.length)] ?? '';
    // After many clashes (a very large league) a number keeps names unique.
    const name = attempts > total * 20 ? `${town} ${nick} ${out.length + 1}` : `${town} ${nick}`;
    if (used.has(name)) continue;
    used.add(name);
    out.push(name);
  }
  return out;
}
