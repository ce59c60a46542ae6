import Table from 'cli-table3';
import type { DimensionInfo } from '../profiles/Dimension.ts';
import type { CompsResult } from '../query/CompsResult.ts';
import { formatValue } from './formatValue.ts';
import { playingTimeCells, playingTimeHeads } from './playingTime.ts';
import { seasonSpan } from './seasonSpan.ts';
import { wrapText } from './wrapText.ts';

const PLAIN = {
  top: '', 'top-mid': '', 'top-left': '', 'top-right': '',
  bottom: '', 'bottom-mid': '', 'bottom-left': '', 'bottom-right': '',
  left: '', 'left-mid': '', mid: '', 'mid-mid': '',
  right: '', 'right-mid': '', middle: ' ', 
};

/** A one-line description of the query target. */
export function describeTarget(result: CompsResult): string {
  const q = result.query;
  const who = q.kind === 'player' ? `${q.name} (${q.player_id}), ${seasonSpan(q)} ${q.level} ${q.position}${q.age !== null ? `, age ${q.age}` : ''}` : `hand-built ${q.position} profile`;
  const rows = q.window === undefined ? 'player-seasons' : `windows of ${q.window} seasons`;
  const pool = `${result.pool.eligible.toLocaleString('en-US')} of ${result.pool.group_size.toLocaleString('en-US')} ${q.group} ${rows} in the pool`;
  const windows = q.window === undefined ? '' : `\nWindows: each player's last ${q.window} seasons at a level, events added up (--window 1: single seasons)`;
  return `Comps for ${who}\n${pool}; ${q.method === 'hnsw' ? 'HNSW candidates, exact re-rank' : 'exact scan'}; ${q.space} space${windows}\n${q.space_note ? `${wrapText(`Note: ranked in the input space: ${q.space_note}.`).join('\n')}\n` : ''}Pool: ${result.pool.summary}\n${describeShares(result)}`;
}

/** The weight of each skill family in one line, e.g. `Weights (balanced): discipline 20%, contact 15%, ...`. */
export function describeShares(result: CompsResult): string {
  const shares = Object.entries(result.pool.family_shares).map(([f, s]) => `${f} ${Math.round(s * 100)}%`);
  return `Weights (${result.pool.preset}): ${shares.join(', ')}`;
}

/**
 * The comps as a terminal table that fits 100 columns: the ranked list, then the grades of the
 * target and the top five comps on each dimension (20 to 80, higher is better).
 */
export function compsTable(result: CompsResult, dims: readonly DimensionInfo[]): string {
  const lines: string[] = [describeTarget(result), ''];
  if (result.comps.length === 0) {
    lines.push('No comps: the pool is empty after the filters, or no player shares enough of the profile (see --min-coverage).');
    return lines.join('\n') + '\n';
  }
  const time = playingTimeHeads(result.comps[0]?.sample_unit ?? 'PA');
  const list = new Table({
    head: ['#', 'Player', 'Season', 'Lvl', 'Pos', 'Age', ...time, 'Like', 'Cov', 'Alike / apart'],
    chars: PLAIN,
    style: { head: [], border: [], 'padding-left': 0, 'padding-right': 1 },
    colAligns: ['right', 'left', 'left', 'left', 'left', 'right', ...time.map(() => 'right' as const), 'right', 'right', 'left'],
    // a window's seasons (2019-21) take 7 characters and the cell's padding one more
    colWidths: [3, 20, result.comps.some((c) => c.seasons !== undefined) ? 8 : 7, 6, 4, 4, ...time.map(() => 6), 5, 5, time.length > 1 ? 24 : 30],
    wordWrap: true,
  });
  const byName = new Map(dims.map((d) => [d.name, d]));
  const labels = (names: readonly string[]): string => names.map((n) => byName.get(n)?.label ?? n).join(', ') || '-';
  for (const c of result.comps) {
    list.push([
      String(c.rank),
      `${c.name}\n${c.player_id}`,
      seasonSpan(c),
      c.level,
      c.position,
      c.age === null ? '-' : String(c.age),
      ...playingTimeCells(c),
      c.likeness.toFixed(0),
      `${Math.round(c.coverage * 100)}%`,
      `= ${labels(c.alike)}\n\u2260 ${labels(c.apart)}`,
    ]);
  }
  lines.push(list.toString(), '');
  const top = result.comps.slice(0, 5);
  const grid = new Table({
    head: ['Dimension', 'Target', ...top.map((c) => `#${c.rank}`)],
    chars: PLAIN,
    style: { head: [], border: [], 'padding-left': 0, 'padding-right': 1 },
    colAligns: ['left', 'right', ...top.map(() => 'right' as const)],
    colWidths: [15, 12, ...top.map(() => 12)],
  });
  const first = result.comps[0];
  for (const [j, detail] of (first?.dimensions ?? []).entries()) {
    const dim = byName.get(detail.name);
    if (!dim) continue;
    const cell = (v: number | null, g: number | null): string => (v === null ? '-' : `${formatValue(v, dim)} ${g === null ? '' : `(${g})`}`.trim());
    if (detail.target === null && top.every((c) => c.dimensions[j]?.comp === null)) continue;
    grid.push([
      dim.label,
      cell(detail.target, detail.target_grade),
      ...top.map((c) => {
        const x = c.dimensions[j];
        return x ? cell(x.comp, x.comp_grade) : '-';
      }),
    ]);
  }
  lines.push('Values as observed; (grades) 20 to 80 from regressed values, higher is better', grid.toString());
  lines.push('Like: likeness 0-100 (100 identical, about 37 for two unrelated players).');
  lines.push('Cov: share of the target\u2019s weighted profile that the comp has data for.');
  return lines.join('\n').split('\n').map((l) => l.trimEnd()).join('\n') + '\n';
}
