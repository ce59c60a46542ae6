import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { CompsResult } from '../query/CompsResult.ts';

/**
 * The comps as CSV, one row per comp: identity, playing time (PA or BF, and IP for pitchers), likeness, distance, coverage, alike and apart
 * (semicolon-separated), then each dimension's comp value, grade and share.
 */
export function compsCsv(result: CompsResult, header = true): string {
  const dimNames = result.comps[0]?.dimensions.map((d) => d.name) ?? Object.keys(result.pool.weights);
  const head = [
    'target_player_id', 'target_season', 'target_level',
    'rank', 'player_id', 'name', 'season', 'level', 'position', 'age', 'sample', 'sample_unit', 'ip', 'likeness', 'distance', 'coverage', 'alike', 'apart',
    ...dimNames.flatMap((n) => [n, `${n}_grade`, `${n}_share`]),
  ];
  const rows = result.comps.map((c) => [
    result.query.player_id ?? '', result.query.season ?? '', result.query.level ?? '',
    c.rank, c.player_id, c.name, c.season, c.level, c.position, c.age ?? '', c.sample, c.sample_unit, c.ip ?? '', c.likeness, c.distance, c.coverage,
    c.alike.join(';'), c.apart.join(';'),
    ...c.dimensions.flatMap((d) => [d.comp ?? '', d.comp_grade ?? '', Number(d.share.toFixed(4))]),
  ]);
  return stringifyCsv(header ? [head, ...rows] : rows);
}
