import type { ProspectResult } from '../jobs/ProspectResult.ts';
import type { CalibratedOutlook } from '../outlook/Outlook.ts';
import { OUTLOOK_CONSTANTS } from '../outlook/outlookConstants.ts';
import { peakSummaryOf } from '../outlook/summariseOutlook.ts';
import { formatCount, formatDecimal, formatPercent, formatSigned, formatWhole } from '../text/numberFormats.ts';
import { seasonSpan } from './seasonSpan.ts';
import { plainTable } from './plainTable.ts';
import { playingTimeCells, playingTimeHeads } from './playingTime.ts';
import { wrapText } from './wrapText.ts';

/** The stated coverage of every outlook range: the central share between the low and high quantiles (80%). */
export const RANGE_COVERAGE = OUTLOOK_CONSTANTS.quantiles[2] - OUTLOOK_CONSTANTS.quantiles[0];

/** A range as "low to high", a dash when either end is unknown. */
export function rangeText(low: number | null, high: number | null, format: (x: number | null) => string): string {
  return low === null || high === null ? '-' : `${format(low)} to ${format(high)}`;
}

/** The calibrated outlook as ranges with their stated coverage and what the replay showed; or why there is none. */
function calibratedLines(c: CalibratedOutlook | null | undefined, note: string | null | undefined, peakLabel: string, kind: string): string[] {
  if (!c) return wrapText(`Calibrated outlook: none (${note ?? 'no backtest'}).`);
  const b = c.backtest;
  const stated = formatPercent(c.range_coverage);
  const cuts = b.cuts.length === 0 ? '-' : `${b.cuts[0] ?? ''}-${b.cuts[b.cuts.length - 1] ?? ''}`;
  const t = plainTable(['', 'Calibrated', `Replayed at ${cuts}, the range held`], ['left', 'right', 'right'], [26, 14, 40]);
  t.push(['Reached the top level', formatPercent(c.reached_top_level), '']);
  t.push([peakLabel, rangeText(c.peak.p10, c.peak.p90, formatWhole), `${formatPercent(b.peak_coverage.value)} of realised values`]);
  t.push(['Top-level seasons', rangeText(c.top_level_seasons.p10, c.top_level_seasons.p90, formatWhole), `${formatPercent(b.seasons_coverage.value)} of realised counts`]);
  const skill = b.skill_vs_level_age;
  return [
    `Calibrated on this roster's history: each range is meant to hold ${stated} of outcomes.`,
    t.toString(),
    ...wrapText(
      `Replay: ${formatCount(b.targets)} ${kind} prospects, ${formatPercent(b.reached_share)} reached the top level; Brier skill against ` +
        `the level-and-age base rate ${formatSigned(skill.value, 2)} (95% ${formatSigned(skill.low, 2)} to ${formatSigned(skill.high, 2)}); ` +
        `Spearman of the range's middle with the realised ${peakLabel} ${formatDecimal(b.spearman_peak.value, 2)}.`,
    ),
    ...wrapText(`How: ${c.method}.`, '  '),
  ];
}

/**
 * The prospect comps as terminal text within 100 columns: the target and pool rules, the comps with
 * what each did next, what the comps did beside the level-and-age base rate as ranges with their
 * coverage, then the outlook calibrated on the roster's history.
 */
export function prospectTable(result: ProspectResult): string {
  const q = result.query;
  const o = result.outlook;
  const r = result.pool.rules;
  const hitter = 'peak_ops_plus' in o;
  const peakLabel = hitter ? 'Peak OPS+' : 'Best FIP-';
  const stated = formatPercent(RANGE_COVERAGE);
  const lines: string[] = [];
  lines.push(...wrapText(`Prospect comps for ${q.name ?? ''} (${q.player_id ?? ''}), ${seasonSpan(q)} ${q.level ?? ''} ${q.position}${q.age !== null ? `, age ${q.age}` : ''}`));
  for (const w of result.warnings ?? []) lines.push(...wrapText(`Note: ${w}`));
  if (q.path_seasons > 1) lines.push(...wrapText(`Path matched: ${q.path.map((s) => `${s.season} ${s.level}${s.age !== null ? ` (${s.age})` : ''}`).reverse().join(' -> ')}`));
  lines.push(
    ...wrapText(
      `Pool: ${formatCount(result.pool.eligible)} ${q.group} player-seasons at ${r.level} (every comp's level), ages ${r.age_min}-${r.age_max}, before ${r.seasons_before}` +
        ` (${formatCount(result.pool.complete_window)} with ${o.horizon_seasons} seasons of follow-up, ${formatCount(result.pool.censored)} censored)`,
    ),
  );
  lines.push(...wrapText(`Pool rules: ${result.pool.summary}`));
  lines.push('');
  if (result.comps.length === 0) {
    lines.push(...wrapText('No comps: nobody earlier at this level and age shares enough of the profile (see --min-coverage, --path).'));
  } else {
    const time = playingTimeHeads(result.comps[0]?.sample_unit ?? 'PA');
    const t = plainTable(
      ['#', 'Player', 'Season', 'Age', ...time, 'Like', 'Cov', 'First top', 'Top yrs', peakLabel],
      ['right', 'left', 'left', 'right', ...time.map(() => 'right' as const), 'right', 'right', 'right', 'right', 'right'],
      [4, time.length > 1 ? 23 : 29, 7, 4, ...time.map(() => 6), 5, 5, 10, 8, 10],
    );
    for (const c of result.comps) {
      const peak = c.outcome.kind === 'hitter' ? c.outcome.peak_ops_plus : c.outcome.peak_fip_minus;
      t.push([
        `${c.rank}${c.censored ? '*' : ''}`,
        `${c.name}\n${c.player_id}`,
        seasonSpan(c),
        c.age === null ? '-' : String(c.age),
        ...playingTimeCells(c),
        formatWhole(c.likeness),
        formatPercent(c.coverage),
        c.outcome.first_top_level_season === null ? '-' : String(c.outcome.first_top_level_season),
        String(c.outcome.top_level_seasons),
        formatWhole(peak),
      ]);
    }
    lines.push(t.toString());
    if (result.comps.some((c) => c.censored)) lines.push('* follow-up incomplete (censored): listed, not in the outlook');
  }
  lines.push('');
  const b = o.baseline;
  lines.push(
    ...wrapText(
      `What the ${o.comps_used} comps did in the ${o.horizon_seasons} seasons after theirs (data to ${o.as_of_season}), weighted by likeness,` +
        ` beside the base rate of ${formatCount(b.player_seasons)} earlier player-seasons at this level and age:`,
    ),
  );
  if (o.comps_censored > 0) {
    lines.push(...wrapText(`${o.comps_censored} closer player${o.comps_censored === 1 ? '' : 's'} left out: follow-up runs past ${o.as_of_season}${q.include_censored ? '' : ' (--include-censored lists them)'}`));
  }
  const peak = peakSummaryOf(o);
  const basePeak = peakSummaryOf(b);
  const t = plainTable(['', 'Comps', 'Base rate'], ['left', 'right', 'right'], [40, 16, 16]);
  t.push(['Reached the top level', formatPercent(o.reached_top_level), formatPercent(b.reached_top_level)]);
  t.push(['Top-level seasons, mean', formatDecimal(o.top_level_seasons.mean, 1), formatDecimal(b.top_level_seasons.mean, 1)]);
  t.push([`  middle ${stated} of players`, rangeText(o.top_level_seasons.p10, o.top_level_seasons.p90, formatWhole), rangeText(b.top_level_seasons.p10, b.top_level_seasons.p90, formatWhole)]);
  t.push([`${peakLabel} (${hitter ? '300+ PA' : '50+ IP'}), players with one`, formatCount(peak.n), formatCount(basePeak.n)]);
  t.push([`  middle ${stated} of them`, rangeText(peak.p10, peak.p90, formatWhole), rangeText(basePeak.p10, basePeak.p90, formatWhole)]);
  lines.push(t.toString());
  lines.push(
    ...wrapText(
      hitter
        ? 'Peak OPS+: best OPS+ in a top-level season of 300+ PA, against that season of this roster (no park factor; 100 average).'
        : 'Best FIP-: lowest FIP- in a top-level season of 50+ IP, against that season of this roster (no park factor; 100 average, lower better).',
    ),
  );
  lines.push(...wrapText('Top level: the highest level the roster declares (levels.csv). First top: first top-level season. Cov: share of the profile compared.'));
  lines.push(...wrapText('Base rate: every earlier player-season at this level and age with a complete follow-up, unweighted.'));
  lines.push('');
  lines.push(...calibratedLines(o.calibrated, o.calibration_note, peakLabel, hitter ? 'hitter' : 'pitcher'));
  lines.push('Comps describe what earlier players did, not what this one will do.');
  return lines.join('\n').split('\n').map((l) => l.trimEnd()).join('\n') + '\n';
}
