import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { MatchResult } from '../jobs/MatchResult.ts';

/** A match as CSV: one row per dimension, with the target, the candidate, his likeness and percentile on every row. */
export function matchCsv(result: MatchResult, header = true): string {
  const q = result.query;
  const c = result.candidate;
  const head = [
    'target_player_id', 'target_season', 'target_level', 'player_id', 'name', 'season', 'level', 'sample', 'sample_unit', 'ip', 'likeness', 'coverage', 'rank', 'percentile',
    'dimension', 'target', 'target_grade', 'candidate', 'candidate_grade', 'share', 'missing',
  ];
  const rows = c.dimensions.map((d) => [
    q.player_id ?? '', q.season ?? '', q.level ?? '', c.player_id, c.name, c.season, c.level, c.sample, c.sample_unit, c.ip ?? '', c.likeness, c.coverage, c.rank, c.percentile ?? '',
    d.name, d.target ?? '', d.target_grade ?? '', d.comp ?? '', d.comp_grade ?? '', Number(d.share.toFixed(4)), String(d.missing),
  ]);
  return stringifyCsv(header ? [head, ...rows] : rows);
}
