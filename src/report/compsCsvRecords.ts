import type { CsvValue } from '../text/stringifyCsv.ts';
import type { Comp, CompsResult } from '../query/CompsResult.ts';

/** A column a job adds to the comps CSV (salary, outcome...): its snake_case name and its value. */
export interface CsvExtraColumn<C extends Comp = Comp> {
  readonly name: string;
  readonly value: (comp: C, index: number) => CsvValue;
}

/**
 * The comps as CSV records, header first, in the one convention of every Kindred CSV (CLI and page):
 * snake_case column names; identity (with `--window N`, the first season of the target's and each
 * comp's window before its last), playing time (PA or BF, and IP in thirds for pitchers), likeness, distance, coverage, the job's
 * own columns, alike and apart (dimension names joined by ";"), then each dimension's comp value,
 * grade and share; numbers as in the JSON answer, flags as true or false, empty when unknown.
 */
export function compsCsvRecords<C extends Comp>(
  result: Pick<CompsResult, 'query' | 'pool'> & { readonly comps: readonly C[] },
  extra: readonly CsvExtraColumn<C>[] = [],
): CsvValue[][] {
  const dimNames = result.comps[0]?.dimensions.map((d) => d.name) ?? Object.keys(result.pool.weights);
  const windowed = result.query.window !== undefined;
  const head = [
    'target_player_id', ...(windowed ? ['target_first_season'] : []), 'target_season', 'target_level',
    'rank', 'player_id', 'name', ...(windowed ? ['first_season'] : []), 'season', 'level', 'position', 'age', 'sample', 'sample_unit', 'ip', 'likeness', 'distance', 'coverage',
    ...extra.map((x) => x.name), 'alike', 'apart',
    ...dimNames.flatMap((n) => [n, `${n}_grade`, `${n}_share`]),
  ];
  const rows = result.comps.map((c, i): CsvValue[] => [
    result.query.player_id ?? '', ...(windowed ? [result.query.seasons?.[0] ?? ''] : []), result.query.season ?? '', result.query.level ?? '',
    c.rank, c.player_id, c.name, ...(windowed ? [c.seasons?.[0] ?? c.season] : []), c.season, c.level, c.position, c.age ?? '', c.sample, c.sample_unit, c.ip ?? '', c.likeness, c.distance, c.coverage,
    ...extra.map((x) => x.value(c, i)), c.alike.join(';'), c.apart.join(';'),
    ...c.dimensions.flatMap((d) => [d.comp ?? '', d.comp_grade ?? '', Number(d.share.toFixed(4))]),
  ]);
  return [head, ...rows];
}
