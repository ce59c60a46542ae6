import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { CheaperResult } from '../jobs/CheaperResult.ts';
import type { DimensionInfo } from '../profiles/Dimension.ts';

/**
 * The cheaper comps as a shortlist to hand out: readable column names, salary as a plain whole number
 * of US dollars (no symbol or separators, so spreadsheets read it as a number), alike and apart by the
 * dimensions' labels.
 */
export function cheaperCsv(result: CheaperResult, dims: readonly DimensionInfo[], header = true): string {
  const q = result.query;
  const byName = new Map(dims.map((d) => [d.name, d.label]));
  const labels = (names: readonly string[]): string => names.map((n) => byName.get(n) ?? n).join(', ');
  const head = [
    'For player', 'For player ID', 'For season', 'Rank', 'Player', 'Player ID', 'Season', 'Level', 'Position', 'Age', 'Playing time', 'Playing time unit', 'IP',
    'Likeness (0-100)', 'Salary (USD)', 'Value score (0-100)', 'Value frontier', 'Alike on', 'Apart on',
  ];
  const rows = result.comps.map((c) => [
    q.name ?? 'hand-built profile', q.player_id ?? '', q.season ?? '',
    c.rank, c.name, c.player_id, c.season, c.level, c.position, c.age ?? '', c.sample, c.sample_unit, c.ip ?? '',
    c.likeness.toFixed(1), String(Math.round(c.salary_usd)), c.value_score === null ? '' : c.value_score.toFixed(1), c.frontier ? 'yes' : 'no',
    labels(c.alike), labels(c.apart),
  ]);
  return stringifyCsv(header ? [head, ...rows] : rows);
}
