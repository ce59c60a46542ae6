import { Command, InvalidArgumentError } from 'commander';
import cliProgress from 'cli-progress';
import type { CliIo } from '../CliIo.ts';
import { buildStore, DEFAULT_BUILD_WINDOWS, type BuildSummary } from '../../pipeline/buildStore.ts';
import { MAX_WINDOW } from '../../request/valueParsers.ts';
import { loadColumnMap } from '../../ingest/loadColumnMap.ts';
import { DEFAULT_STORE } from '../../request/parameters.ts';
import { z } from 'zod';
import { UsageError } from '../../errors/KindredError.ts';
import { addEmbedOptions, embedSettingsFrom } from './embedOptions.ts';
import { storeBacktest } from './storeBacktest.ts';

const buildOptionsSchema = z.object({
  store: z.string(),
  lenient: z.boolean(),
  columns: z.string().optional(),
  rejects: z.string().optional(),
  embed: z.enum(['none', 'pca', 'autoencoder']),
  seed: z.number(),
  pcaVariance: z.number(),
  objective: z.enum(['reconstruct', 'cross-season']),
  hidden: z.array(z.number()).optional(),
  latent: z.union([z.number(), z.literal('search')]),
  activation: z.enum(['tanh', 'relu', 'identity']),
  learningRate: z.number(),
  batch: z.number(),
  maxEpochs: z.number(),
  patience: z.number(),
  minDelta: z.number(),
  l2: z.number(),
  l1: z.number(),
  dropout: z.number(),
  valFraction: z.number(),
  margin: z.number(),
  searchRows: z.number(),
  embedInput: z.enum(['z', 'weighted']),
  drivers: z.number(),
  backtest: z.boolean(),
  windows: z.array(z.number()).optional(),
});

/** `--windows`: a comma list of window sizes, each a whole number from 1 to MAX_WINDOW. */
function windowList(value: string): number[] {
  const parts = value.split(',').map((p) => p.trim());
  const sizes = parts.map(Number);
  if (parts.some((p) => !/^\d+$/.test(p)) || sizes.some((n) => n < 1 || n > MAX_WINDOW)) {
    throw new InvalidArgumentError(`expected window sizes from 1 to ${MAX_WINDOW} separated by commas, e.g. 1,3, got "${value}"`);
  }
  return sizes;
}

/** The build summary: rows read and rejected per file, profiles per group, time. */
export function formatBuildSummary(s: BuildSummary): string {
  const lines = [`Store written to ${s.storeDir} in ${s.seconds.toFixed(1)} s`];
  const files = Object.entries(s.rowsRead).map(([f, n]) => `${f} ${n.toLocaleString('en-US')}`);
  lines.push(`Rows read: ${files.join(', ')}`);
  lines.push(`Rows rejected: ${s.rejected.toLocaleString('en-US')}${s.rejectsPath ? ` (every one with its reason in ${s.rejectsPath})` : ''}`);
  const groups = Object.entries(s.profiles).map(([g, n]) => `${g} ${n.toLocaleString('en-US')}`);
  lines.push(`Profiles: ${groups.join(', ')}`);
  for (const [size, counts] of Object.entries(s.windows ?? {})) {
    lines.push(`Profiles over ${size} seasons: ${Object.entries(counts).map(([g, n]) => `${g} ${n.toLocaleString('en-US')}`).join(', ')}`);
  }
  for (const notice of s.notices) lines.push(`Note: ${notice}`);
  const k = s.skipped;
  if (s.embedding) {
    const sizes = Object.entries(s.embedding.groups).map(([g, e]) => `${g} ${e.dim} (${e.seconds.toFixed(1)} s)`);
    lines.push(`Embedding: ${s.embedding.space}, code size per group ${sizes.join(', ')}; charts in ${s.embedding.chartsDir}`);
  }
  lines.push(
    `Not profiled: ${k.hittersBelowMinimum.toLocaleString('en-US')} hitter seasons under the PA minimum, ${k.pitchersBelowMinimum.toLocaleString('en-US')} pitcher seasons under the BF minimum, ${k.pitchersBatting.toLocaleString('en-US')} pitchers' batting lines`,
  );
  return lines.join('\n') + '\n';
}

export function buildCommand(io: CliIo): Command {
  const cmd = new Command('build')
    .description('read a roster folder of CSV files and write a store of profiles and indexes')
    .argument('<roster-dir>', 'folder with players.csv, batting.csv, fielding.csv, pitching.csv, contracts.csv')
    .option('--store <dir>', 'store folder to write (replaced only when the build succeeds)', DEFAULT_STORE)
    .option('--lenient', 'skip bad rows (each written with its reason to a rejects file) instead of stopping', false)
    .option('--columns <map.json>', 'map your export\u2019s file and column names to the canonical ones')
    .option('--rejects <file>', 'where --lenient writes skipped rows (default <store>.rejects.csv)')
    .option('--no-backtest', 'skip the backtest of the prospect outlook (then shown uncalibrated)')
    .option('--windows <list>', `profiles over windows of these many seasons, for queries with --window N, e.g. 1,3 (1: single seasons, always built; default ${DEFAULT_BUILD_WINDOWS.join(',')})`, windowList);
  return addEmbedOptions(cmd).action(async (rosterDir: string, raw: unknown) => {
      const parsed = buildOptionsSchema.safeParse(raw);
      if (!parsed.success) throw new UsageError(`bad build options: ${parsed.error.issues[0]?.message ?? ''}`);
      const o = parsed.data;
      const columnMap = o.columns !== undefined ? await loadColumnMap(o.columns) : undefined;
      const bar = io.isTTY
        ? new cliProgress.SingleBar(
            { format: ' {stage} [{bar}] {value}', stream: process.stderr, hideCursor: true, clearOnComplete: true },
            cliProgress.Presets.shades_classic,
          )
        : null;
      bar?.start(1, 0, { stage: 'reading' });
      let lastStage = '';
      try {
        const summary = await buildStore(rosterDir, o.store, {
          lenient: o.lenient,
          ...(columnMap ? { columnMap } : {}),
          ...(o.rejects !== undefined ? { rejectsPath: o.rejects } : {}),
          embed: embedSettingsFrom(o),
          ...(o.windows !== undefined ? { windows: o.windows } : {}),
          onProgress: (stage, done, total) => {
            if (bar) {
              bar.setTotal(Math.max(total, done, 1));
              bar.update(done, { stage });
            } else if (stage !== lastStage && !stage.startsWith('reading')) {
              io.stderr.write(`${stage}...\n`);
            }
            lastStage = stage;
          },
        });
        bar?.stop();
        io.stderr.write(formatBuildSummary(summary));
        if (o.backtest) await storeBacktest(o.store, io);
      } finally {
        bar?.stop();
      }
    });
}
