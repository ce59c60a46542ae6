import { Command, InvalidArgumentError } from 'commander';
import { z } from 'zod';
import type { CliIo } from '../CliIo.ts';
import * as parse from '../parseOptions.ts';
import { DEFAULT_STORE } from '../defaults.ts';
import { addPoolOptions } from './compsOptions.ts';
import { compsOptionsFrom, parseQueryOptions, type QueryOptions } from './queryOptions.ts';
import { runBatch, targetFrom } from './compsCommand.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { loadProfileStore } from '../../query/loadProfileStore.ts';
import type { ProfileStore } from '../../query/ProfileStore.ts';
import { DEFAULT_SALARY_LIMIT, findCheaperComps, type SalaryLimit } from '../../outlook/findCheaperComps.ts';
import type { CheaperResult } from '../../outlook/types.ts';
import { cheaperTable } from '../../report/cheaperTable.ts';
import { cheaperCsv } from '../../report/cheaperCsv.ts';

/** "2500000", "2,500,000" or "2.5e6": an amount in US dollars, 0 or more. */
export function usdAmount(value: string): number {
  const text = value.trim().replace(/^\$/, '');
  const plain = /^\d{1,3}(,\d{3})+$/.test(text) ? text.replace(/,/g, '') : text;
  const n = Number(plain);
  if (plain === '' || !Number.isFinite(n) || n < 0 || !/^[\d.e+]+$/i.test(plain)) {
    throw new InvalidArgumentError(`expected an amount in US dollars such as 2500000 or 2,500,000, got "${value}"`);
  }
  return n;
}

const cheaperOptionsSchema = z.object({ maxSalary: z.number().nonnegative().optional(), maxShare: z.number().optional(), want: z.string().optional() });

/** Writes one cheaper-comps result in the chosen format. */
export function writeCheaper(io: CliIo, store: ProfileStore, result: CheaperResult, format: QueryOptions['format']): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(cheaperCsv(result, store.groups.get(result.query.group)?.dims ?? []));
  else io.stdout.write(cheaperTable(result));
}

export function cheaperCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('cheaper')
    .description('comps who do what an expensive player does, for less: known salaries under a limit, value frontier marked')
    .argument('[player]', 'player id or (part of a) name')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--season <year>', 'the target season (default: his latest)', parse.season)
    .option('--level <level>', 'the target level (default: his highest that season)')
    .option('--position <pos>', 'position of a --want profile, or which profile of a two-way player', parse.position)
    .option('--want <profile>', 'hand-built target (needs --max-salary), e.g. "obp=.360,iso=.200"')
    .option('--max-salary <usd>', 'comps paid at most this many US dollars in their season', usdAmount)
    .option('--max-share <share>', 'comps paid at most this share of the target\u2019s salary (default 0.5)', parse.fraction)
    .option('--batch <file>', 'CSV of targets (player_id, season, level): one JSON line per target');
  addPoolOptions(cmd);
  cmd.action(async (player: string | undefined, raw: unknown) => {
    const o = parseQueryOptions(raw);
    const parsed = cheaperOptionsSchema.safeParse(raw);
    if (!parsed.success) throw new UsageError(`option --${parsed.error.issues[0]?.path.join('.') ?? '?'}: ${parsed.error.issues[0]?.message ?? 'invalid'}`);
    const { maxSalary, maxShare, want } = parsed.data;
    if (maxSalary !== undefined && maxShare !== undefined) throw new UsageError('give either --max-salary or --max-share, not both');
    const limit: SalaryLimit =
      maxSalary !== undefined ? { kind: 'max-salary', usd: maxSalary } : maxShare !== undefined ? { kind: 'max-share', share: maxShare } : DEFAULT_SALARY_LIMIT;
    const store = await loadProfileStore(o.store);
    const options = { comps: compsOptionsFrom(o, store), limit };
    if (o.batch !== undefined) {
      if (player !== undefined || want !== undefined) throw new UsageError('--batch takes its targets from the file: give no player or --want');
      setExit(
        await runBatch(io, o.batch, (playerId, season, level) =>
          findCheaperComps(store, targetFrom(store, playerId, { ...o, ...(season !== undefined ? { season } : {}), ...(level !== undefined ? { level } : {}) }), options),
        ),
      );
      return;
    }
    writeCheaper(io, store, findCheaperComps(store, targetFrom(store, player, { ...o, want }), options), o.format);
  });
  return cmd;
}
