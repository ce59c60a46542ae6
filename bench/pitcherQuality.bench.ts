/**
 * Why starting pitchers' comps are further from the ideal than hitters', measured: on the standard varied
 * leagues (bench/leagues.ts), for the quality cases (bench/lib/caseQuality.ts, default pool rules), it
 * prints each pitcher dimension's family, reliability and default weight; the ratio for targets with
 * every dimension (tracked seasons) and without (seasons before pitch tracking); per true talent the
 * mean squared gap to the comps against the gap to the 10 truly nearest (which talents the comps miss);
 * and the ratio under weight variants (per-dimension multipliers on the default weights).
 * `node --import tsx bench/pitcherQuality.bench.ts [playerSeasons] [targetsPerCase] [leagues] [windows] [variant,...]`
 * (the variants by name, e.g. "missing left out"; the default is always run)
 * (also run by `npm run bench -- quality`).
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, type CompsOptions } from '../src/query/findComps.ts';
import { windowView } from '../src/query/windowView.ts';
import { chooseTargets, QUALITY_CASES, scoreCases } from './lib/caseQuality.ts';
import { benchLeagues } from './leagues.ts';

/** Weight variants: per-dimension multipliers on the default weights (absent: 1). */
export const ALL_VARIANTS: readonly { readonly name: string; readonly options: Partial<CompsOptions> }[] = [
  { name: 'default', options: {} },
  { name: 'no babip, no fip', options: { weightOverrides: new Map([['babip_against', 0], ['fip', 0]]) } },
  { name: 'gb x3', options: { weightOverrides: new Map([['gb_pct', 3]]) } },
  { name: 'workload x2', options: { weightOverrides: new Map([['ip_per_g', 2]]) } },
  { name: 'min coverage 0.7', options: { minCoverage: 0.7 } },
  { name: 'min coverage 0.9', options: { minCoverage: 0.9 } },
  { name: 'missing at expected gap', options: { missing: 'expected' } },
];

const median = (xs: readonly number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length === 0 ? NaN : ((s[Math.floor((s.length - 1) / 2)] as number) + (s[Math.ceil((s.length - 1) / 2)] as number)) / 2;
};
const mean = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
const sd = (xs: readonly number[]): number => Math.sqrt(xs.reduce((a, x) => a + (x - mean(xs)) ** 2, 0) / Math.max(1, xs.length - 1));

export async function runPitcherQuality(
  playerSeasons: number, targetsPerCase: number, leagueCount: number, windows: readonly number[], only?: readonly string[],
): Promise<string[]> {
  const leagues = benchLeagues(playerSeasons).slice(0, leagueCount);
  const VARIANTS = ALL_VARIANTS.filter((v, i) => i === 0 || !only || only.includes(v.name));
  const lines: string[] = [];
  // byVariant[variant][window][case] = per-league medians
  const byVariant = VARIANTS.map(() => windows.map(() => QUALITY_CASES.map(() => [] as number[])));
  for (const spec of leagues) {
    const dir = await mkdtemp(join(tmpdir(), `kindred-pitchers-${spec.name}-`));
    try {
      const league = simulateLeague(spec.options);
      await writeLeagueCsv(league, join(dir, 'roster'));
      const storeDir = join(dir, 'store');
      await buildStore(join(dir, 'roster'), storeDir, { lenient: false, windows });
      const store = await openProfileStore(storeDir);
      const chosen = chooseTargets(store, league, targetsPerCase, 0, spec.options.seed);
      lines.push(`== ${spec.name}`);
      for (const group of ['SP', 'IF'] as const) {
        const g = store.groups.get(group);
        if (!g) continue;
        const total = g.redundancy.reduce((a, b) => a + b, 0);
        lines.push(`${group} dimensions (family, reliability, default weight share): ${g.dims.map((d, j) => `${d.name} ${d.family} ${(g.reliability[j] as number).toFixed(2)} ${((g.redundancy[j] as number) / total).toFixed(3)}`).join('; ')}`);
      }
      for (const [w, window] of windows.entries()) {
        const view = windowView(store, window);
        for (const [v, variant] of VARIANTS.entries()) {
          const s = scoreCases(view, league, chosen, { compsOptions: { ...DEFAULT_COMPS_OPTIONS, ...variant.options } });
          for (const [c] of QUALITY_CASES.entries()) (byVariant[v] as number[][][])[w]?.[c]?.push(s.median[c] as number);
          if (v > 0) continue;
          for (const [c, kase] of QUALITY_CASES.entries()) {
            const cov = s.byCoverage[c];
            const gaps = s.talentGaps[c];
            if (!cov || !gaps) continue;
            lines.push(
              `window ${window} ${kase.name}: median ${(s.median[c] as number).toFixed(3)}; full coverage ${median(cov.full).toFixed(3)} (${cov.full.length}), partial ${median(cov.partial).toFixed(3)} (${cov.partial.length})`,
            );
            lines.push(`  talent gap\u00b2 comps/ideal: ${gaps.names.map((n, j) => `${n} ${(gaps.comps[j] as number).toFixed(2)}/${(gaps.ideal[j] as number).toFixed(2)}`).join(', ')}`);
          }
        }
      }
      console.error(lines.slice(-20).join('\n'));
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
  }
  lines.push('', `median ratio per league, mean ± sd over ${leagues.length} leagues (${leagues.map((l) => l.name).join(', ')}); per league in brackets`);
  for (const [w, window] of windows.entries()) {
    for (const [c, kase] of QUALITY_CASES.entries()) {
      lines.push(`window ${window} ${kase.name}:`);
      for (const [v, variant] of VARIANTS.entries()) {
        const xs = (byVariant[v] as number[][][])[w]?.[c] ?? [];
        const base = (byVariant[0] as number[][][])[w]?.[c] ?? [];
        const better = xs.filter((x, l) => x < (base[l] ?? NaN)).length;
        lines.push(`  ${variant.name.padEnd(24)} ${mean(xs).toFixed(3)} ± ${sd(xs).toFixed(3)} [${xs.map((x) => x.toFixed(3)).join(' ')}]${v > 0 ? ` better than default in ${better}/${xs.length}` : ''}`);
      }
    }
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30000);
  const t = Number(process.argv[3] ?? 120);
  const l = Number(process.argv[4] ?? 4);
  const windows = (process.argv[5] ?? '1,3').split(',').map(Number);
  const only = process.argv[6]?.split(',');
  for (const line of await runPitcherQuality(n, t, l, windows, only)) console.log(line);
}
