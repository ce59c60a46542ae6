/**
 * The learned embeddings against the input space on the standard varied leagues (bench/leagues.ts):
 *   node --import tsx bench/embedLeagueQuality.bench.ts [playerSeasons] [variants] [leagues] [targetsPerGroup] [league names]
 * e.g. `... 20000 autoencoder,cross-season,cross-season-linear 4 40` (also run by `npm run bench -- quality`).
 * Each league is built once per space: the input space (`none`, the reference) and every variant:
 * - `autoencoder`: the plain autoencoder (reconstructs each profile), capacity search;
 * - `cross-season`: the autoencoder trained to give back the same player's nearest other season
 *   (isometric code, search margin 0.005);
 * - `cross-season-linear`: the same objective with no hidden layer and identity activation (a linear
 *   encoder and decoder: a reduced-rank regression of one season on the other, fitted by gradient);
 * - `pca`.
 * At every level of the league's ladder, quality is the shared figure of bench/lib/compsQuality.ts (mean
 * true-talent distance to the top 10 comps over the same for the 10 truly nearest players; 1.00 is perfect)
 * over `targetsPerGroup` targets per group (C, IF, OF, SP, RP), pool = group and level, exact search.
 * Reported: per level and variant, the variant's figure over the input space's (below 1 = better comps),
 * across leagues as mean, sd [min-max], and how many leagues meet the aim (<= 0.95).
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS } from '../src/query/findComps.ts';
import type { EmbedSettingsInput } from '../src/pipeline/EmbedSettings.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';
import { compsQuality } from './lib/compsQuality.ts';
import { benchLeagues } from './leagues.ts';

const GROUPS: PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
/** The aim of issue-level quality: a learned space earns its place at <= 0.95 x the input space's figure. */
const AIM = 0.95;

/** Build settings of each space compared. */
export const VARIANTS: Readonly<Record<string, EmbedSettingsInput>> = {
  // more variants to try, as JSON from the environment: KINDRED_BENCH_VARIANTS='{"name": {...settings}}'
  ...(process.env.KINDRED_BENCH_VARIANTS ? (JSON.parse(process.env.KINDRED_BENCH_VARIANTS) as Record<string, EmbedSettingsInput>) : {}),
  none: { method: 'none' },
  pca: { method: 'pca', seed: 1 },
  autoencoder: { method: 'autoencoder', seed: 1 },
  // the cross-season spaces with the search margin they were measured with (docs/embedding.md)
  'cross-season': { method: 'autoencoder', seed: 1, autoencoder: { objective: 'cross-season', margin: 0.005 } },
  'cross-season-linear': { method: 'autoencoder', seed: 1, autoencoder: { objective: 'cross-season', hidden: [], activation: 'identity', margin: 0.005 } },
};

interface Cell {
  readonly ratio: number;
  readonly targets: number;
}

export async function runEmbedLeagueQuality(playerSeasons: number, variants: readonly string[], leagueCount: number, targetsPerGroup: number, only?: readonly string[]): Promise<string[]> {
  const unknown = variants.filter((v) => !(v in VARIANTS));
  if (unknown.length > 0) throw new Error(`unknown variant ${unknown.join(', ')}; known: ${Object.keys(VARIANTS).join(', ')}`);
  const spaces = ['none', ...variants.filter((v) => v !== 'none')];
  const leagues = benchLeagues(playerSeasons).filter((l) => !only || only.includes(l.name)).slice(0, leagueCount);
  // cells[league][space][level]
  const cells: Map<string, Cell>[][] = [];
  const levelsOf: string[][] = [];
  const timing: string[] = [];
  for (const spec of leagues) {
    const dir = await mkdtemp(join(tmpdir(), `kindred-embed-league-${spec.name}-`));
    const perSpace: Map<string, Cell>[] = [];
    try {
      const league = simulateLeague(spec.options);
      await writeLeagueCsv(league, join(dir, 'roster'));
      for (const space of spaces) {
        const storeDir = join(dir, `store-${space}`);
        const summary = await buildStore(join(dir, 'roster'), storeDir, { lenient: false, embed: VARIANTS[space] ?? { method: 'none' } });
        const store = await openProfileStore(storeDir);
        if (space === 'none') levelsOf.push([...store.levels]);
        if (summary.embedding) {
          const per = Object.entries(summary.embedding.groups).map(([g, e]) => `${g} ${e.dim}`);
          timing.push(`${spec.name} ${space}: build ${summary.seconds.toFixed(0)} s, code sizes ${per.join(', ')}`);
        }
        const byLevel = new Map<string, Cell>();
        for (const level of store.levels) {
          const q = compsQuality(store, league.truth, {
            groups: GROUPS, level, targetsPerGroup, k: 10, seed: spec.options.seed,
            compsOptions: { ...DEFAULT_COMPS_OPTIONS, exact: true, attributions: false },
          });
          byLevel.set(level, { ratio: q.ratio, targets: q.targets });
        }
        perSpace.push(byLevel);
        console.error(`${spec.name} ${space}: ${[...byLevel].map(([l, c]) => `${l} ${c.ratio.toFixed(3)} (${c.targets})`).join(', ')}`);
        await rm(storeDir, { recursive: true, force: true });
      }
    } finally {
      await rm(dir, { recursive: true, force: true });
    }
    cells.push(perSpace);
  }
  const levels = [...new Set(levelsOf.flat())];
  const order = (l: string): number => Math.max(...levelsOf.map((ls) => ls.indexOf(l)));
  levels.sort((a, b) => order(a) - order(b));
  const lines: string[] = [];
  lines.push(`learned spaces against the input space on ${leagues.length} leagues (${leagues.map((l) => l.name).join(', ')}), ~${playerSeasons.toLocaleString('en-US')} player-seasons x size each, ${targetsPerGroup} targets per group and level`);
  lines.push(`figure = the space's comps-quality ratio over the input space's at the same level and league (below 1 = better comps; aim <= ${AIM})`);
  lines.push(`across leagues: mean, sd [min-max], leagues meeting the aim`);
  lines.push(`${'level'.padEnd(7)}${spaces.slice(1).map((s) => s.padStart(40)).join('')}`);
  for (const level of levels) {
    const row = spaces.slice(1).map((space, v) => {
      const rel: number[] = [];
      cells.forEach((perSpace) => {
        const base = perSpace[0]?.get(level);
        const mine = perSpace[v + 1]?.get(level);
        if (base && mine && base.targets > 0 && mine.targets > 0) rel.push(mine.ratio / base.ratio);
      });
      if (rel.length === 0) return '-'.padStart(40);
      const mean = rel.reduce((a, b) => a + b, 0) / rel.length;
      const sd = Math.sqrt(rel.reduce((a, b) => a + (b - mean) ** 2, 0) / Math.max(1, rel.length - 1));
      const met = rel.filter((r) => r <= AIM).length;
      return `${mean.toFixed(3)} sd ${sd.toFixed(3)} [${Math.min(...rel).toFixed(3)}-${Math.max(...rel).toFixed(3)}] ${met}/${rel.length}`.padStart(40);
    });
    lines.push(`${level.padEnd(7)}${row.join('')}`);
  }
  lines.push('per league, comps-quality ratio to the ideal (input space first, then each space):');
  leagues.forEach((spec, l) => {
    for (const level of levelsOf[l] ?? []) {
      const figures = spaces.map((_, s) => cells[l]?.[s]?.get(level)).map((c) => (c && c.targets > 0 ? c.ratio.toFixed(3) : '-').padStart(8));
      lines.push(`  ${spec.name.padEnd(9)}${level.padEnd(7)}${figures.join('')}   (${cells[l]?.[0]?.get(level)?.targets ?? 0} targets)`);
    }
  });
  lines.push(...timing);
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 20000);
  const variants = (process.argv[3] ?? 'autoencoder,cross-season,cross-season-linear').split(',');
  const l = Number(process.argv[4] ?? 4);
  const t = Number(process.argv[5] ?? 40);
  const only = process.argv[6]?.split(',');
  for (const line of await runEmbedLeagueQuality(n, variants, l, t, only)) console.log(line);
}
