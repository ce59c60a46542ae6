import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { CompsResult } from '../query/CompsResult.ts';

/**
 * The comps as CSV, one row per comp: identity (with `--window N`, the first season of the target's and
 * each comp's window before its last), playing time (PA or BF, and IP for pitchers), likeness, distance, coverage, alike and apart
 * (semicolon-separated), then each dimension's comp value, grade and share.
 */
export function compsCsv(result: CompsResult, header = true): string {
  const dimNames = result.comps[0]?.dimensions.map((d) => d.name) ?? Object.keys(result.pool.weights);
  const windowed = result.query.window !== undefined;
  const head = [
    'target_player_id', ...(windowed ? ['target_first_season'] : []), 'target_season', 'target_level',
    'rank', 'player_id', 'name', ...(windowed ? ['first_season'] : []), 'season', 'level', 'position', 'age', 'sample', 'sample_unit', 'ip', 'likeness', 'distance', 'coverage', 'alike', 'apart',
    ...dimNames.flatMap((n) => [n, `${n}_grade`, `${n}_share`]),
  ];
  const rows = result.comps.map((c) => [
    result.query.player_id ?? '', ...(windowed ? [result.query.seasons?.[0] ?? ''] : []), result.query.season ?? '', result.query.level ?? '',
    c.rank, c.player_id, c.name, ...(windowed ? [c.seasons?.[0] ?? c.season] : []), c.season, c.level, c.position, c.age ?? '', c.sample, c.sample_unit, c.ip ?? '', c.likeness, c.distance, c.coverage,
    c.alike.join(';'), c.apart.join(';'),
    ...c.dimensions.flatMap((d) => [d.comp ?? '', d.comp_grade ?? '', Number(d.share.toFixed(4))]),
  ]);
  return stringifyCsv(header ? [head, ...rows] : rows);
}
