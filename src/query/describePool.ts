import { isPitcherGroup, type PositionGroup } from '../profiles/positionGroup.ts';
import type { SampleFloor } from './poolDefaults.ts';
import type { PoolFilter } from './PoolFilter.ts';

/**
 * The pool's rules in words, as the table header and the page state them (no option names):
 * positions, levels, seasons, ages, hands and the playing-time floor with what it was scaled to.
 *
 * @example
 * describePool({ positions: ['SS'], levels: ['AA', 'AAA'], minSample: 250 }, { unit: 'PA', min: 250, share: 0.5, target_sample: 500, target_sample_from: 'target' }, 'IF');
 * // => "SS; at AA, AAA; 250 PA or more (50% of the target\u2019s 500)"
 */
export function describePool(f: PoolFilter, floor: SampleFloor | null, group: PositionGroup): string {
  const parts: string[] = [];
  parts.push(f.positions ? f.positions.join(', ') : `every ${group} position`);
  parts.push(f.levels ? `at ${f.levels.join(', ')}` : 'every level');
  const seasons = span(f.seasonFrom, f.seasonTo);
  if (seasons !== null) parts.push(f.seasonFrom === f.seasonTo ? `season ${seasons}` : `seasons ${seasons}`);
  const ages = span(f.ageMin, f.ageMax);
  if (ages !== null) parts.push(f.ageMin === f.ageMax ? `age ${ages}` : `ages ${ages}`);
  if (f.bats) parts.push(`bats ${f.bats.join('/')}`);
  if (f.throws) parts.push(`throws ${f.throws.join('/')}`);
  const unit = isPitcherGroup(group) ? 'BF' : 'PA';
  if (f.minSample !== undefined) {
    const of = floor ? ` (${Math.round(floor.share * 100)}% of ${floor.target_sample_from === 'target' ? 'the target\u2019s' : 'a typical season\u2019s'} ${floor.target_sample})` : '';
    parts.push(`${f.minSample} ${unit} or more${of}`);
  } else parts.push(`any ${unit}`);
  return parts.join('; ');
}

/** A range in words: "2015-2020", "from 2015", "to 2020", "2018" (null when open at both ends). */
function span(from: number | undefined, to: number | undefined): string | null {
  if (from === undefined && to === undefined) return null;
  if (from === undefined) return `to ${to ?? ''}`;
  if (to === undefined) return `from ${from}`;
  return from === to ? String(from) : `${from}-${to}`;
}
