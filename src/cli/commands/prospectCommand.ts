import { Command } from 'commander';
import { z } from 'zod';
import type { CliIo } from '../CliIo.ts';
import * as parse from '../parseOptions.ts';
import { DEFAULT_STORE } from '../defaults.ts';
import { addPoolOptions } from './compsOptions.ts';
import { compsOptionsFrom, parseQueryOptions, type QueryOptions } from './queryOptions.ts';
import { runBatch, targetFrom } from './compsCommand.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { loadProfileStore } from '../../query/loadProfileStore.ts';
import { loadOutcomes } from '../../outlook/loadOutcomes.ts';
import { DEFAULT_PROSPECT_OPTIONS, findProspectComps, type ProspectOptions } from '../../outlook/findProspectComps.ts';
import type { ProspectResult } from '../../outlook/types.ts';
import { prospectTable } from '../../report/prospectTable.ts';
import { prospectCsv } from '../../report/prospectCsv.ts';

const prospectOptionsSchema = z.object({
  horizon: z.number().int().positive(),
  path: z.number().int().positive(),
  includeCensored: z.boolean(),
});

/** Writes one prospect result in the chosen format. */
export function writeProspect(io: CliIo, result: ProspectResult, format: QueryOptions['format']): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(prospectCsv(result));
  else io.stdout.write(prospectTable(result));
}

/**
 * Sets an option's default after addPoolOptions declared it (a command whose natural default differs):
 * both the value commander starts from and the default shown in --help.
 */
export function overrideDefault(cmd: Command, long: string, value: number): void {
  const option = cmd.options.find((o) => o.long === long);
  if (!option) throw new RangeError(`internal: no option ${long}`);
  option.default(value);
  cmd.setOptionValueWithSource(option.attributeName(), value, 'default');
}

export function prospectCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('prospect')
    .description('historical comps for a prospect: earlier players at his level and age, and what became of them')
    .argument('[player]', 'player id or (part of a) name')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--season <year>', 'the target season (default: his latest)', parse.season)
    .option('--level <level>', 'the target level (default: his highest that season)')
    .option('--position <pos>', 'which profile of a two-way player', parse.position)
    .option('--batch <file>', 'CSV of targets (player_id, season, level): one JSON line per target')
    .option('--horizon <n>', 'seasons of follow-up after each comp season', parse.positiveInt, DEFAULT_PROSPECT_OPTIONS.horizon)
    .option('--path <n>', 'match his last N seasons, each aligned by age, at the same levels', parse.positiveInt, 1)
    .option('--include-censored', 'also list comps whose follow-up is incomplete (never in the outlook)', false);
  addPoolOptions(cmd);
  overrideDefault(cmd, '--k', DEFAULT_PROSPECT_OPTIONS.comps.k);
  overrideDefault(cmd, '--min-coverage', DEFAULT_PROSPECT_OPTIONS.comps.minCoverage);
  cmd.action(async (player: string | undefined, raw: unknown) => {
    const o = parseQueryOptions(raw);
    const parsed = prospectOptionsSchema.safeParse(raw);
    if (!parsed.success) throw new UsageError(`option --${parsed.error.issues[0]?.path.join('.') ?? '?'}: ${parsed.error.issues[0]?.message ?? 'invalid'}`);
    const store = await loadProfileStore(o.store);
    const outcomes = await loadOutcomes(o.store, store);
    const options: ProspectOptions = {
      comps: compsOptionsFrom(o, store),
      horizon: parsed.data.horizon,
      path: parsed.data.path,
      includeCensored: parsed.data.includeCensored,
    };
    if (o.batch !== undefined) {
      if (player !== undefined) throw new UsageError('--batch takes its targets from the file: give no player');
      setExit(
        await runBatch(io, o.batch, (playerId, season, level) =>
          findProspectComps(store, outcomes, targetFrom(store, playerId, { ...o, ...(season !== undefined ? { season } : {}), ...(level !== undefined ? { level } : {}) }), options),
        ),
      );
      return;
    }
    writeProspect(io, findProspectComps(store, outcomes, targetFrom(store, player, o), options), o.format);
  });
  return cmd;
}
