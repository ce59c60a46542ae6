import type { ProspectResult } from '../jobs/ProspectResult.ts';
import type { QuantileSummary } from '../outlook/Outlook.ts';
import { peakSummaryOf } from '../outlook/summariseOutlook.ts';
import { seasonSpan } from './seasonSpan.ts';
import { plainTable } from './plainTable.ts';
import { playingTimeCells, playingTimeHeads } from './playingTime.ts';

const pct = (x: number | null): string => (x === null ? '-' : `${Math.round(x * 100)}%`);
const num = (x: number | null, digits = 0): string => (x === null ? '-' : x.toFixed(digits));
const range = (q: QuantileSummary, digits = 0): string => (q.n === 0 ? '-' : `${num(q.p10, digits)} / ${num(q.p50, digits)} / ${num(q.p90, digits)}`);

const signed = (x: number | null): string => (x === null ? '-' : `${x >= 0 ? '+' : ''}${x.toFixed(2)}`);
const span = (lo: number | null, hi: number | null): string => (lo === null || hi === null ? '' : ` (95% ${signed(lo)} to ${signed(hi)})`);

/** The calibrated outlook and, beside it, how outlooks like this did in the roster's backtest; or why there is none. */
function calibratedLines(result: ProspectResult, peakLabel: string): string[] {
  const c = result.outlook.calibrated;
  if (!c) return [`Calibrated outlook: none (${result.outlook.calibration_note ?? 'no backtest'})`];
  const b = c.backtest;
  const tri = (q: { p10: number | null; p50: number | null; p90: number | null }, d = 0): string => `${num(q.p10, d)} / ${num(q.p50, d)} / ${num(q.p90, d)}`;
  const cov = (x: number | null): string => (x === null ? '-' : `${Math.round(x * 100)}%`);
  return [
    `Calibrated on this roster's history: reached the top level ${pct(c.reached_top_level)}`,
    `  ${peakLabel} p10 / p50 / p90 ${tri(c.peak)} (such ranges held ${cov(c.peak.coverage)} in the backtest; nominal 80%)`,
    `  top-level seasons p10 / p50 / p90 ${tri(c.top_level_seasons)} (held ${cov(c.top_level_seasons.coverage)})`,
    `On this roster, ${result.query.group === 'SP' || result.query.group === 'RP' ? 'pitcher' : 'hitter'} outlooks replayed at ${b.cuts[0] ?? '-'}-${b.cuts[b.cuts.length - 1] ?? '-'} (${b.targets.toLocaleString('en-US')} prospects, ${pct(b.reached_share)} reached the top level):`,
    `  Brier skill against the level-and-age base rate ${signed(b.skill_vs_level_age.value)}${span(b.skill_vs_level_age.low, b.skill_vs_level_age.high)};` +
      ` Spearman of p50 with the realised ${peakLabel} ${num(b.spearman_peak.value, 2)}`,
    `  How: ${c.method}.`,
  ];
}

/**
 * The prospect comps as a terminal table within 100 columns: the target and pool rules, the comps
 * with what each did next, then the outlook beside the level-and-age base rate.
 */
export function prospectTable(result: ProspectResult): string {
  const q = result.query;
  const o = result.outlook;
  const r = result.pool.rules;
  const hitter = 'peak_ops_plus' in o;
  const peakLabel = hitter ? 'Peak OPS+' : 'Best FIP-';
  const lines: string[] = [];
  lines.push(`Prospect comps for ${q.name ?? ''} (${q.player_id ?? ''}), ${seasonSpan(q)} ${q.level ?? ''} ${q.position}${q.age !== null ? `, age ${q.age}` : ''}`);
  for (const w of result.warnings ?? []) lines.push(`Note: ${w}`);
  if (q.path_seasons > 1) lines.push(`Path matched: ${q.path.map((s) => `${s.season} ${s.level}${s.age !== null ? ` (${s.age})` : ''}`).reverse().join(' -> ')}`);
  lines.push(
    `Pool: ${result.pool.eligible.toLocaleString('en-US')} ${q.group} player-seasons at ${r.level}, ages ${r.age_min}-${r.age_max}, before ${r.seasons_before}` +
      ` (${result.pool.complete_window.toLocaleString('en-US')} with ${o.horizon_seasons} seasons of follow-up, ${result.pool.censored.toLocaleString('en-US')} censored)`,
  );
  lines.push('');
  if (result.comps.length === 0) {
    lines.push('No comps: nobody earlier at this level and age shares enough of the profile (see --min-coverage, --path).');
  } else {
    const time = playingTimeHeads(result.comps[0]?.sample_unit ?? 'PA');
    const t = plainTable(
      ['#', 'Player', 'Season', 'Lvl', 'Age', ...time, 'Like', 'Cov', 'First top', 'Top yrs', peakLabel],
      ['right', 'left', 'left', 'left', 'right', ...time.map(() => 'right' as const), 'right', 'right', 'right', 'right', 'right'],
      [4, time.length > 1 ? 16 : 22, 7, 6, 4, ...time.map(() => 6), 5, 5, 10, 8, 10],
    );
    for (const c of result.comps) {
      const peak = c.outcome.kind === 'hitter' ? c.outcome.peak_ops_plus : c.outcome.peak_fip_minus;
      t.push([
        `${c.rank}${c.censored ? '*' : ''}`,
        `${c.name} (${c.player_id})`,
        seasonSpan(c),
        c.level,
        c.age === null ? '-' : String(c.age),
        ...playingTimeCells(c),
        c.likeness.toFixed(0),
        `${Math.round(c.coverage * 100)}%`,
        c.outcome.first_top_level_season === null ? '-' : String(c.outcome.first_top_level_season),
        String(c.outcome.top_level_seasons),
        num(peak),
      ]);
    }
    lines.push(t.toString());
    if (result.comps.some((c) => c.censored)) lines.push('* follow-up incomplete (censored): listed, not in the outlook');
  }
  lines.push('');
  lines.push(`Outlook: what the ${o.comps_used} comps did in the next ${o.horizon_seasons} seasons (data to ${o.as_of_season}), weighted by likeness`);
  if (o.comps_censored > 0) {
    lines.push(`${o.comps_censored} closer player${o.comps_censored === 1 ? '' : 's'} left out: follow-up runs past ${o.as_of_season}${q.include_censored ? '' : ' (--include-censored lists them)'}`);
  }
  const b = o.baseline;
  const peak = peakSummaryOf(o);
  const basePeak = peakSummaryOf(b);
  const t = plainTable(['', 'Comps', `Base rate (${b.player_seasons.toLocaleString('en-US')} player-seasons)`], ['left', 'right', 'right'], [30, 18, 36]);
  t.push(['Reached the top level', pct(o.reached_top_level), pct(b.reached_top_level)]);
  t.push([`${peakLabel} (${hitter ? '300+ PA' : '50+ IP'}), players`, String(peak.n), String(basePeak.n)]);
  t.push(['  p10 / p50 / p90', range(peak), range(basePeak)]);
  t.push(['Top-level seasons, mean', num(o.top_level_seasons.mean, 1), num(b.top_level_seasons.mean, 1)]);
  t.push(['  p10 / p50 / p90', range(o.top_level_seasons), range(b.top_level_seasons)]);
  lines.push(t.toString());
  lines.push(
    hitter
      ? 'Peak OPS+: best OPS+ in a top-level season of 300+ PA, against that season of this roster (no park factor; 100 average).'
      : 'Best FIP-: lowest FIP- in a top-level season of 50+ IP, against that season of this roster (no park factor; 100 average, lower better).',
  );
  lines.push('Top level: the highest level the roster declares (levels.csv). First top: first top-level season.');
  lines.push('Base rate: every earlier player-season at this level and age with a complete follow-up, unweighted.');
  lines.push('');
  lines.push(...calibratedLines(result, peakLabel));
  lines.push('Comps describe what earlier players did, not what this one will do.');
  return lines.join('\n') + '\n';
}
