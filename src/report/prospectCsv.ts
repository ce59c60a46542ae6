import { stringifyCsv } from '../text/stringifyCsv.ts';
import type { ProspectResult } from '../jobs/ProspectResult.ts';

/**
 * The prospect comps as CSV, one row per comp: the target, the comp's identity and likeness, then what
 * he did next (censored flag, window, reached the top level, first top-level season, top-level seasons, peak).
 */
export function prospectCsv(result: ProspectResult, header = true): string {
  const peakName = 'peak_ops_plus' in result.outlook ? 'peak_ops_plus' : 'peak_fip_minus';
  const head = [
    'target_player_id', 'target_season', 'target_level',
    'rank', 'player_id', 'name', 'season', 'level', 'position', 'age', 'sample', 'sample_unit', 'ip', 'likeness', 'distance', 'coverage', 'alike', 'apart',
    'censored', 'window_from', 'window_to', 'seasons_observed', 'reached_top_level', 'first_top_level_season', 'top_level_seasons', peakName, 'peak_season',
  ];
  const q = result.query;
  const rows = result.comps.map((c) => {
    const o = c.outcome;
    return [
      q.player_id ?? '', q.season ?? '', q.level ?? '',
      c.rank, c.player_id, c.name, c.season, c.level, c.position, c.age ?? '', c.sample, c.sample_unit, c.ip ?? '', c.likeness, c.distance, c.coverage, c.alike.join(';'), c.apart.join(';'),
      String(c.censored), o.window[0], o.window[1], o.seasons_observed, String(o.reached_top_level), o.first_top_level_season ?? '', o.top_level_seasons,
      (o.kind === 'hitter' ? o.peak_ops_plus : o.peak_fip_minus) ?? '', o.peak_season ?? '',
    ];
  });
  return stringifyCsv(header ? [head, ...rows] : rows);
}
