import type { BacktestFile, KindSummary } from '../outlook/backtestFile.ts';
import { TERMINAL_COLUMNS } from './terminalColumns.ts';
import { wrapText } from './wrapText.ts';

/** A line wrapped within 100 columns, its leading spaces kept on every part. */
function wrapKeepingIndent(line: string): string[] {
  const lead = /^ */.exec(line)?.[0] ?? '';
  return wrapText(line.slice(lead.length), '  ', TERMINAL_COLUMNS - lead.length).map((part) => lead + part);
}

const f = (x: number | null, digits = 3): string => (x === null ? '-' : x.toFixed(digits));
const iv = (w: { value: number | null; low: number | null; high: number | null }, digits = 2): string =>
  `${f(w.value, digits)} (95% ${f(w.low, digits)} to ${f(w.high, digits)})`;

/** A probability map and peak model in words: what moves the outlook away from the base rate. */
export function mapInWords(features: readonly string[], peak: string): string {
  const words: Record<string, string> = { comps: "comps' share", sample: 'playing time', seasonSample: 'playing time', climb: 'promotion in the season', age: 'age for the level', path: 'level path', profile: 'his own profile' };
  const parts = [...new Set(features.map((f) => words[f] ?? f))];
  return `${parts.join(', ') || 'base rate only'}; peak ${peak === 'regression' ? 'by regression on comps and profile' : "from the comps' and base rate's ranges"}`;
}

function kindLines(k: KindSummary, coverage: string, kept: BacktestFile['fitted'][number] | undefined): string[] {
  const who = k.kind === 'hitter' ? 'Hitters' : 'Pitchers';
  const peak = k.kind === 'hitter' ? 'peak OPS+' : 'best FIP-';
  return [
    `${who}: ${k.targets.toLocaleString('en-US')} prospect forecasts at the cuts, ${f(k.reached_share === null ? null : 100 * k.reached_share, 0)}% reached the top level within the follow-up`,
    `  Reached the top level, Brier score: calibrated ${f(k.brier.calibrated, 4)}, comps' share ${f(k.brier.comps, 4)}, level-and-age base rate ${f(k.brier.level_age, 4)}`,
    `  Skill against the level-and-age base rate ${iv(k.skill_vs_level_age, 3)}; against the matched base rate ${iv(k.skill_vs_matched, 3)}`,
    `  Murphy (1973): reliability ${f(k.reliability, 4)} (lower is better), resolution ${f(k.resolution, 4)} (higher is better), uncertainty ${f(k.uncertainty, 4)}`,
    `  Spearman of the ${peak} range's middle with the realised one (${k.peak_targets} who had one) ${iv(k.spearman_peak)}`,
    `  The ${coverage} range of the ${peak} held the realised one ${iv(k.peak_coverage)} of the time (the comps' own range: ${f(k.peak_coverage_before_adjustment, 2)})`,
    `  The ${coverage} range of top-level seasons held the count ${iv(k.seasons_coverage)} of the time`,
    `  Per cut (season: training forecasts / scored prospects / reached): ${k.cuts.map((c) => `${c.cut}: ${c.training}/${c.targets}/${c.reached}`).join(', ')}`,
    `  Chosen at each cut on its own earlier seasons: ${k.cuts.map((c) => `${c.cut}: ${mapInWords(c.features, c.peak)}`).join('; ')}`,
    ...(kept ? [`  Kept for new outlooks (fitted on all ${kept.training.toLocaleString('en-US')} forecasts with a known follow-up): ${mapInWords(kept.features, kept.peak)}`] : []),
  ];
}

/**
 * The backtest of the prospect outlook as terminal text: per kind, the Brier score and its skill with
 * bootstrap intervals, the Murphy terms, rank correlation and coverage, and the counts per cut; or,
 * for a roster too short, why no cut could be scored.
 */
export function backtestTable(file: BacktestFile, kinds: readonly ('hitter' | 'pitcher')[]): string {
  const lines: string[] = [];
  lines.push(`Backtest of the prospect outlook on this roster: replayed at cut seasons ${file.cuts.length > 0 ? file.cuts.join(', ') : '(none)'}, ${file.horizon} seasons of follow-up, k ${file.k}`);
  lines.push(
    'At each cut, only what was known then: comps from earlier seasons with their follow-up over, the calibration fitted on ' +
      `forecasts whose follow-up had ended by the cut. Probability: ${file.calibration.method} map; ranges: split conformal to ${Math.round(100 * (1 - file.calibration.alpha))}%.`,
  );
  lines.push('');
  if (file.too_short) {
    lines.push(`This roster is too short for a backtest: ${file.too_short}.`);
    return lines.flatMap((l) => (l === '' ? [l] : wrapKeepingIndent(l))).join('\n') + '\n';
  }
  for (const k of file.kinds.filter((x) => kinds.includes(x.kind))) lines.push(...kindLines(k, `${Math.round(100 * (1 - file.calibration.alpha))}%`, file.fitted.find((x) => x.kind === k.kind)), '');
  lines.push('Skill: 1 - Brier / Brier of the reference (0: no better; above 0: better). Intervals: percentile bootstrap over forecasts.');
  lines.push('These figures describe how outlooks did for earlier players of this roster, not what any one prospect will do.');
  lines.push(`(${file.seconds} s)`);
  return lines.flatMap((l) => (l === '' ? [l] : wrapKeepingIndent(l))).join('\n') + '\n';
}
