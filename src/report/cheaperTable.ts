import type { CheaperResult } from '../jobs/CheaperResult.ts';
import { formatUsd } from './formatUsd.ts';
import { seasonSpan } from './seasonSpan.ts';
import { plainTable } from './plainTable.ts';
import { playingTimeCells, playingTimeHeads } from './playingTime.ts';

/** The cheaper comps as a terminal table within 100 columns, value-frontier comps marked. */
export function cheaperTable(result: CheaperResult): string {
  const q = result.query;
  const s = result.pool.salary;
  const lines: string[] = [];
  const who = q.kind === 'player' ? `${q.name ?? ''} (${q.player_id ?? ''}), ${seasonSpan(q)} ${q.level ?? ''} ${q.position}${q.age !== null ? `, age ${q.age}` : ''}` : `hand-built ${q.position} profile`;
  lines.push(`Cheaper comps for ${who}; salary ${formatUsd(s.target_salary_usd)}`);
  const rule = s.rule === 'max-share' && s.share !== null ? `${Math.round(s.share * 100)}% of his salary` : '--max-salary';
  lines.push(`Pool: ${s.under_limit.toLocaleString('en-US')} ${q.group} player-seasons paid up to ${formatUsd(s.limit_usd)} (${rule})`);
  lines.push(`Pool rules: ${result.pool.summary}`);
  lines.push(
    `Left out: ${s.over_limit.toLocaleString('en-US')} paid more, ${s.without_salary.toLocaleString('en-US')} without a known salary (${s.without_salary_players.toLocaleString('en-US')} players)`,
  );
  lines.push('');
  if (result.comps.length === 0) {
    lines.push('No comps under the limit share enough of the profile (see --max-salary, --max-share, --min-coverage).');
    return lines.join('\n') + '\n';
  }
  const time = playingTimeHeads(result.comps[0]?.sample_unit ?? 'PA');
  const t = plainTable(
    ['#', 'Player', 'Season', 'Lvl', 'Pos', ...time, 'Like', 'Salary', 'Value', 'Front'],
    ['right', 'left', 'left', 'left', 'left', ...time.map(() => 'right' as const), 'right', 'right', 'right', 'left'],
    [4, time.length > 1 ? 21 : 27, 7, 6, 4, ...time.map(() => 6), 5, 14, 9, 6],
  );
  for (const c of result.comps) {
    t.push([
      String(c.rank), `${c.name} (${c.player_id})`, seasonSpan(c), c.level, c.position, ...playingTimeCells(c), c.likeness.toFixed(0),
      formatUsd(c.salary_usd), c.value_score === null ? '-' : c.value_score.toFixed(1), c.frontier ? 'yes' : c.above_likeness_floor ? '' : 'low',
    ]);
  }
  lines.push(t.toString());
  lines.push('Front: on the value frontier (every comp listed above him, more alike, is paid more); low: likeness at or');
  lines.push(`below ${s.likeness_floor.toFixed(0)} (no more alike than two unrelated players), never on the frontier.`);
  lines.push(`Value: 0-100, likeness beyond chance times the share of ${formatUsd(s.value_reference_usd)} saved (see docs/jobs.md).`);
  lines.push('Salaries are as paid in their own seasons (not adjusted between seasons).');
  return lines.join('\n') + '\n';
}
