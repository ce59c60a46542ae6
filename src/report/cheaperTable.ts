import type { CheaperResult } from '../jobs/CheaperResult.ts';
import { formatCount, formatDecimal, formatUsd, formatWhole } from '../text/numberFormats.ts';
import { seasonSpan } from './seasonSpan.ts';
import { wrapText } from './wrapText.ts';
import { plainTable } from './plainTable.ts';
import { playingTimeCells, playingTimeHeads } from './playingTime.ts';

/** The cheaper comps as a terminal table within 100 columns, value-frontier comps marked. */
export function cheaperTable(result: CheaperResult): string {
  const q = result.query;
  const s = result.pool.salary;
  const lines: string[] = [];
  const who = q.kind === 'player' ? `${q.name ?? ''} (${q.player_id ?? ''}), ${seasonSpan(q)} ${q.level ?? ''} ${q.position}${q.age !== null ? `, age ${q.age}` : ''}` : `hand-built ${q.position} profile`;
  lines.push(...wrapText(`Cheaper comps for ${who}; salary ${formatUsd(s.target_salary_usd)}`));
  const rule = s.rule === 'max-share' && s.share !== null ? `${Math.round(s.share * 100)}% of his salary` : '--max-salary';
  lines.push(...wrapText(`Pool: ${formatCount(s.under_limit)} ${q.group} player-seasons paid up to ${formatUsd(s.limit_usd)} (${rule})`));
  lines.push(...wrapText(`Pool rules: ${result.pool.summary}`));
  lines.push(
    ...wrapText(`Left out: ${s.over_limit.toLocaleString('en-US')} paid more, ${s.without_salary.toLocaleString('en-US')} without a known salary (${s.without_salary_players.toLocaleString('en-US')} players)`),
  );
  lines.push('');
  if (result.comps.length === 0) {
    lines.push(...wrapText('No comps under the limit share enough of the profile (see --max-salary, --max-share, --min-coverage).'));
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
      String(c.rank), `${c.name}\n${c.player_id}`, seasonSpan(c), c.level, c.position, ...playingTimeCells(c), formatWhole(c.likeness),
      formatUsd(c.salary_usd), formatDecimal(c.value_score, 1), c.frontier ? 'yes' : c.above_likeness_floor ? '' : 'low',
    ]);
  }
  lines.push(t.toString());
  lines.push(
    ...wrapText(
      'Front: on the value frontier (every comp listed above him, more alike, is paid more); low: likeness at or ' +
        `below ${formatWhole(s.likeness_floor)} (no more alike than two unrelated players), never on the frontier.`,
    ),
  );
  lines.push(...wrapText(`Value: 0-100, likeness beyond chance times the share of ${formatUsd(s.value_reference_usd)} saved (see docs/jobs.md).`));
  lines.push(...wrapText('Salaries are as paid in their own seasons (not adjusted between seasons).'));
  return lines.join('\n').split('\n').map((l) => l.trimEnd()).join('\n') + '\n';
}
