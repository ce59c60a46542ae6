import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { MatchResult } from '../jobs/MatchResult.ts';
import { formatValue } from './formatValue.ts';
import { seasonSpan } from './seasonSpan.ts';
import { plainTable } from './plainTable.ts';
import { wrapText } from './wrapText.ts';
import { formatCount, formatPercent, formatWhole } from '../text/numberFormats.ts';

/** One candidate against a target as a terminal table: likeness, pool standing, then every dimension. */
export function matchTable(result: MatchResult, dims: readonly DimensionInfo[]): string {
  const q = result.query;
  const c = result.candidate;
  const lines: string[] = [];
  const target = q.kind === 'player' ? `${q.name ?? ''} (${q.player_id ?? ''}), ${seasonSpan(q)} ${q.level ?? ''} ${q.position}` : `hand-built ${q.position} profile`;
  const time = c.ip === null ? `${formatCount(c.sample)} ${c.sample_unit}` : `${formatCount(c.sample)} ${c.sample_unit}, ${c.ip} IP`;
  lines.push(...wrapText(`${c.name} (${c.player_id}), ${seasonSpan(c)} ${c.level} ${c.position}${c.age !== null ? `, age ${c.age}` : ''}; ${time}`));
  lines.push(...wrapText(`against ${target}`));
  lines.push('');
  lines.push(...wrapText(`Likeness ${formatWhole(c.likeness)} (100 identical, about 37 unrelated); ${formatPercent(c.coverage)} of the target profile compared`));
  const standing =
    c.percentile === null
      ? 'the pool is empty after the filters'
      : `rank ${c.rank.toLocaleString('en-US')} of ${(c.pool_players + 1).toLocaleString('en-US')} players, more alike than ${c.percentile.toFixed(1)}% of the others`;
  lines.push(...wrapText(`In the pool: ${standing}${c.in_pool ? '' : ' (his season is outside the pool filters)'}`));
  lines.push(...wrapText('(each player at his closest season; players sharing less than --min-coverage of the profile are not counted)'));
  if (result.closest) lines.push(...wrapText(`Closest in the pool: ${result.closest.name} (${result.closest.player_id}), ${result.closest.season} ${result.closest.level}, likeness ${formatWhole(result.closest.likeness)}`));
  lines.push('');
  const byName = new Map(dims.map((d) => [d.name, d]));
  const t = plainTable(['Dimension', 'Target', 'Candidate', 'Share'], ['left', 'right', 'right', 'right'], [18, 14, 14, 8]);
  for (const d of c.dimensions) {
    const dim = byName.get(d.name);
    const fmt = (v: number | null, grade: number | null): string => (v === null ? '-' : `${dim ? formatValue(v, dim) : String(v)}${grade === null ? '' : ` (${grade})`}`);
    if (d.target === null && d.comp === null) continue;
    t.push([dim?.label ?? d.name, fmt(d.target, d.target_grade), fmt(d.comp, d.comp_grade), d.missing ? 'n/a' : formatPercent(d.share)]);
  }
  lines.push('Values as observed; (grades) 20 to 80 from regressed values, higher is better', t.toString());
  const label = (names: readonly string[]): string => names.map((n) => byName.get(n)?.label ?? n).join(', ') || '-';
  lines.push(...wrapText(`Alike: ${label(c.alike)}. Apart: ${label(c.apart)}.`));
  lines.push(...wrapText('Share: part of the distance from that dimension; n/a where one side has no value.'));
  return lines.join('\n').split('\n').map((l) => l.trimEnd()).join('\n') + '\n';
}
