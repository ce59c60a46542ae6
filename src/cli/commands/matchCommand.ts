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
import type { ProfileStore } from '../../query/ProfileStore.ts';
import { resolvePlayer } from '../../query/resolvePlayer.ts';
import { matchPlayers } from '../../outlook/matchPlayers.ts';
import type { MatchResult } from '../../outlook/types.ts';
import { matchTable } from '../../report/matchTable.ts';
import { matchCsv } from '../../report/matchCsv.ts';

const matchOptionsSchema = z.object({ want: z.string().optional(), seasonB: z.number().int().optional(), levelB: z.string().optional() });

/** Writes one match in the chosen format. */
export function writeMatch(io: CliIo, store: ProfileStore, result: MatchResult, format: QueryOptions['format']): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(matchCsv(result));
  else io.stdout.write(matchTable(result, store.groups.get(result.query.group)?.dims ?? []));
}

export function matchCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('match')
    .description('one candidate against a target: likeness, percentile in the pool, every dimension with grades')
    .argument('[player-a]', 'the target: player id or (part of a) name (leave out with --want)')
    .argument('[player-b]', 'the candidate: player id or (part of a) name')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--season <year>', 'the target season (default: his latest)', parse.season)
    .option('--level <level>', 'the target level (default: his highest that season)')
    .option('--position <pos>', 'position of a --want profile, or which profile of a two-way player', parse.position)
    .option('--want <profile>', 'hand-built target in place of player-a, e.g. "pop_2b_s=1.90,obp=.330"')
    .option('--season-b <year>', 'the candidate season (default: his closest to the target season)', parse.season)
    .option('--level-b <level>', 'the candidate level (default: his highest that season)')
    .option('--batch <file>', 'CSV of candidates (player_id, season, level) against the one target: one JSON line each');
  addPoolOptions(cmd);
  cmd.action(async (first: string | undefined, second: string | undefined, raw: unknown) => {
    const o = parseQueryOptions(raw);
    const parsed = matchOptionsSchema.safeParse(raw);
    if (!parsed.success) throw new UsageError(`option --${parsed.error.issues[0]?.path.join('.') ?? '?'}: ${parsed.error.issues[0]?.message ?? 'invalid'}`);
    const { want, seasonB, levelB } = parsed.data;
    const a = want !== undefined ? undefined : first;
    const b = want !== undefined ? first : second;
    if (want !== undefined && second !== undefined) throw new UsageError('with --want give only the candidate (player-b)');
    const store = await loadProfileStore(o.store);
    const comps = compsOptionsFrom(o, store);
    const target = targetFrom(store, a, { ...o, want });
    const check = (level: string | undefined): void => {
      if (level !== undefined && !store.levels.includes(level)) throw new UsageError(`--level-b: unknown level "${level}"; the store's levels: ${store.levels.join(', ')}`, { value: level });
    };
    check(levelB);
    if (o.batch !== undefined) {
      if (b !== undefined) throw new UsageError('--batch takes the candidates from the file: give only the target');
      setExit(
        await runBatch(io, o.batch, (playerId, season, level) =>
          matchPlayers(store, target, resolvePlayer(store, playerId), {
            comps,
            candidate: { ...(season !== undefined ? { season } : {}), ...(level !== undefined ? { level } : {}) },
          }),
        ),
      );
      return;
    }
    if (b === undefined) throw new UsageError('name the candidate (player-b): kindred match <player-a> <player-b>', {}, 'kindred.usage.missingArgument');
    const result = matchPlayers(store, target, resolvePlayer(store, b), {
      comps,
      candidate: { ...(seasonB !== undefined ? { season: seasonB } : {}), ...(levelB !== undefined ? { level: levelB } : {}) },
    });
    writeMatch(io, store, result, o.format);
  });
  return cmd;
}
