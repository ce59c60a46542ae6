/**
 * Comps quality and training time of the ranking spaces (none = weighted input space, pca,
 * autoencoder) on simulated leagues, where the true talents are known:
 *   node --import tsx bench/embedQuality.bench.ts [playerSeasons] [spaces] [timingRows]
 * e.g. `... 30000 none,pca,autoencoder 100000`. Quality is the shared figure of bench/lib/compsQuality.ts:
 * mean true-talent distance from each target to its top 10 comps over the same for the 10 truly nearest
 * players of its pool (1.00 is perfect, lower is better), by level and by target sample size (PA or BF).
 * Timing: the build's embedding step per group, and (with timingRows) one group of about that many
 * profiles from a larger league, embedded alone.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { simulateLeague } from '../src/sim/simulateLeague.ts';
import { writeLeagueCsv } from '../src/sim/writeLeagueCsv.ts';
import { buildStore } from '../src/pipeline/buildStore.ts';
import { openProfileStore } from '../src/store/openProfileStore.ts';
import { DEFAULT_COMPS_OPTIONS, findComps } from '../src/query/findComps.ts';
import { playerTarget } from '../src/query/playerTarget.ts';
import type { ProfileStore } from '../src/store/ProfileStore.ts';
import { readRoster } from '../src/ingest/readRoster.ts';
import { buildProfiles } from '../src/profiles/buildProfiles.ts';
import { embedProfiles } from '../src/pipeline/embedProfiles.ts';
import { resolveEmbedSettings, type EmbedMethod, type EmbedSettingsInput } from '../src/pipeline/EmbedSettings.ts';
import type { PositionGroup } from '../src/profiles/positionGroup.ts';
import { compsQuality } from './lib/compsQuality.ts';

const GROUPS: PositionGroup[] = ['C', 'IF', 'OF', 'SP', 'RP'];
const SAMPLES: readonly (readonly [string, readonly [number, number] | undefined])[] = [
  ['any', undefined],
  ['low', [30, 200]],
  ['medium', [200, 400]],
  ['high', [400, 10_000]],
];

/**
 * A space to compare: `none`, `pca` or `autoencoder`, optionally `-z` (fitted on plain z instead of the
 * weighted profiles). Extra settings from the environment as JSON: KINDRED_BENCH_SETTINGS for every
 * embedding (e.g. '{"pcaVariance":0.8}'), KINDRED_BENCH_AE for the autoencoder (e.g. '{"latent":6}').
 */
type Variant = string;

function methodOf(v: Variant): EmbedMethod {
  const m = v.replace(/-z$/, '');
  return m === 'pca' || m === 'autoencoder' ? m : 'none';
}

function settingsFor(v: Variant): EmbedSettingsInput {
  const method = methodOf(v);
  const extra = method === 'autoencoder' && process.env.KINDRED_BENCH_AE ? (JSON.parse(process.env.KINDRED_BENCH_AE) as Record<string, unknown>) : {};
  const top = method !== 'none' && process.env.KINDRED_BENCH_SETTINGS ? (JSON.parse(process.env.KINDRED_BENCH_SETTINGS) as Record<string, unknown>) : {};
  return { method, input: v.endsWith('-z') ? 'z' : 'weighted', seed: 1, ...top, ...(method === 'autoencoder' ? { autoencoder: extra } : {}) };
}

export async function runEmbedQuality(playerSeasons: number, spaces: readonly Variant[], seed = 7): Promise<string[]> {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-embed-quality-'));
  const lines: string[] = [];
  try {
    const league = simulateLeague({ seed, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: playerSeasons });
    await writeLeagueCsv(league, join(dir, 'roster'));
    const results = new Map<Variant, Map<string, { ratio: number; targets: number }>>();
    for (const space of spaces) {
      const storeDir = join(dir, `store-${space}`);
      const started = performance.now();
      const summary = await buildStore(join(dir, 'roster'), storeDir, { lenient: false, embed: settingsFor(space) });
      const store = await openProfileStore(storeDir);
      if (summary.embedding) {
        const per = Object.entries(summary.embedding.groups).map(([g, e]) => `${g} ${e.dim} ${e.seconds.toFixed(1)} s`);
        lines.push(`${space}: build ${summary.seconds.toFixed(1)} s; code size and embedding time per group: ${per.join(', ')}`);
      } else {
        lines.push(`${space}: build ${summary.seconds.toFixed(1)} s`);
      }
      const cells = new Map<string, { ratio: number; targets: number }>();
      for (const level of ['High', 'Top']) {
        for (const [label, range] of SAMPLES) {
          const r = compsQuality(store, league.truth, {
            groups: GROUPS,
            level,
            targetsPerGroup: 60,
            k: 10,
            seed,
            compsOptions: { ...DEFAULT_COMPS_OPTIONS, exact: true, attributions: false },
            ...(range ? { sampleRange: range } : {}),
          });
          cells.set(`${level}|${label}`, { ratio: r.ratio, targets: r.targets });
        }
      }
      results.set(space, cells);
      lines.push(`  ${latency(store)}`);
      lines.push(`  queries ${((performance.now() - started) / 1000 - summary.seconds).toFixed(1)} s`);
    }
    lines.push(`comps quality, ${playerSeasons.toLocaleString('en-US')} simulated player-seasons, seed ${seed} (ratio to the ideal; 1.00 is perfect, lower is better)`);
    lines.push(`level  sample   targets  ${spaces.map((s) => s.padStart(11)).join(' ')}`);
    for (const level of ['High', 'Top']) {
      for (const [label] of SAMPLES) {
        const key = `${level}|${label}`;
        const targets = results.get(spaces[0] ?? '')?.get(key)?.targets ?? 0;
        const cells = spaces.map((s) => (results.get(s)?.get(key)?.ratio ?? NaN).toFixed(3).padStart(11));
        lines.push(`${level.padEnd(6)} ${label.padEnd(8)} ${String(targets).padStart(7)}  ${cells.join(' ')}`);
      }
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
  return lines;
}

/** Query latency with the default options (index when the pool is large, attributions on): p50 and p90 over 60 targets. */
function latency(store: ProfileStore): string {
  const times: number[] = [];
  const methods = new Set<string>();
  let sampled = 0;
  let comps = 0;
  let worstError = 0;
  for (const group of GROUPS) {
    const g = store.groups.get(group);
    if (!g) continue;
    for (let i = 0; i < 12; i++) {
      const row = Math.floor(((i + 0.5) / 12) * g.n);
      const target = playerTarget(store, { group, row });
      const t = performance.now();
      const r = findComps(store, target, DEFAULT_COMPS_OPTIONS);
      times.push(performance.now() - t);
      methods.add(r.query.method);
      for (const c of r.comps) {
        comps++;
        if ('attribution_method' in c && c.attribution_method === 'sampled' && 'attribution_error' in c && typeof c.attribution_error === 'number') {
          sampled++;
          worstError = Math.max(worstError, c.attribution_error / Math.max(c.attribution_total ?? 1, 1e-9));
        }
      }
    }
  }
  times.sort((a, b) => a - b);
  const q = (p: number): number => times[Math.min(times.length - 1, Math.floor(p * times.length))] ?? NaN;
  return `query latency (k 10, ${[...methods].join('/')}): p50 ${q(0.5).toFixed(1)} ms, p90 ${q(0.9).toFixed(1)} ms; ${sampled} of ${comps} comps with sampled attributions, largest standard error ${(worstError * 100).toFixed(2)}% of the comp's distance`;
}

/** Embedding time of the largest hitter group of a league of about `rows` / 0.29 player-seasons. */
export async function runEmbedTiming(rows: number, spaces: readonly Variant[], seed = 7): Promise<string[]> {
  const dir = await mkdtemp(join(tmpdir(), 'kindred-embed-timing-'));
  const lines: string[] = [];
  try {
    const league = simulateLeague({ seed, firstSeason: 2003, lastSeason: 2026, targetPlayerSeasons: Math.round(rows / 0.29) });
    await writeLeagueCsv(league, join(dir, 'roster'));
    const profiles = buildProfiles(await readRoster(join(dir, 'roster'), { lenient: false }));
    const g = profiles.groups.get('IF');
    if (!g) return ['no IF group'];
    for (const space of spaces.filter((s) => methodOf(s) !== 'none')) {
      const e = await embedProfiles(g, resolveEmbedSettings(settingsFor(space)));
      const n = g.meta.length;
      lines.push(
        `${space}: IF group ${n.toLocaleString('en-US')} rows x ${g.dims.length} dims -> ${e.dim}: embedding step ${e.seconds.toFixed(1)} s (${((e.seconds * 100_000) / n).toFixed(1)} s per 100,000 rows)`,
      );
    }
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const n = Number(process.argv[2] ?? 30_000);
  const spaces = (process.argv[3] ?? 'none,pca,autoencoder').split(',');
  for (const line of await runEmbedQuality(n, spaces)) console.log(line);
  const timingRows = Number(process.argv[4] ?? 0);
  if (timingRows > 0) for (const line of await runEmbedTiming(timingRows, spaces)) console.log(line);
}
