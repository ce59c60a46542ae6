import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import * as parse from '../parseOptions.ts';
import { addPoolOptions } from './compsOptions.ts';
import { compsOptionsFrom, parseQueryOptions, type QueryOptions } from './queryOptions.ts';
import { readTargets } from './readTargets.ts';
import { loadProfileStore } from '../../query/loadProfileStore.ts';
import type { ProfileStore } from '../../query/ProfileStore.ts';
import { resolvePlayer } from '../../query/resolvePlayer.ts';
import { selectTargetRow } from '../../query/selectTargetRow.ts';
import { playerTarget } from '../../query/playerTarget.ts';
import { parseWant } from '../../query/parseWant.ts';
import { findComps } from '../../query/findComps.ts';
import type { Target } from '../../query/Target.ts';
import type { CompsResult } from '../../query/types.ts';
import { compsTable } from '../../report/compsTable.ts';
import { compsCsv } from '../../report/compsCsv.ts';
import { KindredError, UsageError } from '../../errors/KindredError.ts';
import { DEFAULT_STORE } from '../defaults.ts';

/** The target of a query from the command line: a player (id or name) or a --want profile. */
export function targetFrom(store: ProfileStore, player: string | undefined, o: QueryOptions & { want?: string | undefined }): Target {
  if (o.want !== undefined) {
    if (player !== undefined) throw new UsageError('give either a player or --want, not both');
    if (o.position === undefined) throw new UsageError('--want needs --position (C, 1B, 2B, 3B, SS, LF, CF, RF, DH, SP or RP)');
    return parseWant(store, o.want, {
      position: o.position,
      ...(o.season !== undefined ? { season: o.season } : {}),
      ...(o.level !== undefined ? { level: o.level } : {}),
    });
  }
  if (player === undefined) throw new UsageError('name a player (id or name), or give --want with --position, or --batch', {}, 'kindred.usage.missingArgument');
  const idx = resolvePlayer(store, player);
  const row = selectTargetRow(store, idx, {
    ...(o.season !== undefined ? { season: o.season } : {}),
    ...(o.level !== undefined ? { level: o.level } : {}),
    ...(o.position !== undefined ? { position: o.position } : {}),
  });
  return playerTarget(store, row);
}

/** Writes one result in the chosen format. */
export function writeResult(io: CliIo, store: ProfileStore, result: CompsResult, format: QueryOptions['format'], csvHeader = true): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(compsCsv(result, csvHeader));
  else io.stdout.write(compsTable(result, store.groups.get(result.query.group)?.dims ?? []));
}

/**
 * Runs a batch: one JSON object per line, in the order given; a target that fails gives a line with
 * its error and the batch goes on. Returns the exit code (1 if any target failed).
 */
export async function runBatch(
  io: CliIo,
  path: string,
  answer: (playerId: string, season: number | undefined, level: string | undefined) => unknown,
): Promise<number> {
  const targets = await readTargets(path);
  let failed = 0;
  for (const t of targets) {
    try {
      io.stdout.write(JSON.stringify(answer(t.playerId, t.season, t.level)) + '\n');
    } catch (e) {
      if (!(e instanceof KindredError)) throw e;
      failed++;
      io.stdout.write(JSON.stringify({ query: { player_id: t.playerId, season: t.season ?? null, level: t.level ?? null, line: t.line }, error: { code: e.code, message: e.message } }) + '\n');
    }
  }
  if (failed > 0) io.stderr.write(`${failed} of ${targets.length} targets failed (see their error lines)\n`);
  return failed > 0 ? 1 : 0;
}

export function compsCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('comps')
    .description('ranked comparable players for a player-season or a hand-built profile')
    .argument('[player]', 'player id or (part of a) name')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--season <year>', 'the target season (default: his latest)', parse.season)
    .option('--level <level>', 'the target level (default: his highest that season)')
    .option('--position <pos>', 'position of a --want profile, or which profile of a two-way player', parse.position)
    .option('--want <profile>', 'hand-built target, e.g. "pop_2b_s=1.90,obp=.360" or "obp=60g" (grades)')
    .option('--batch <file>', 'CSV of targets (player_id, season, level): one JSON line per target');
  addPoolOptions(cmd);
  cmd.action(async (player: string | undefined, raw: unknown) => {
    const o = parseQueryOptions(raw);
    const want = typeof raw === 'object' && raw !== null && 'want' in raw && typeof raw.want === 'string' ? raw.want : undefined;
    const store = await loadProfileStore(o.store);
    const options = compsOptionsFrom(o, store);
    if (o.batch !== undefined) {
      if (player !== undefined || want !== undefined) throw new UsageError('--batch takes its targets from the file: give no player or --want');
      setExit(
        await runBatch(io, o.batch, (playerId, season, level) => {
          const target = targetFrom(store, playerId, { ...o, ...(season !== undefined ? { season } : {}), ...(level !== undefined ? { level } : {}) });
          return findComps(store, target, options);
        }),
      );
      return;
    }
    const target = targetFrom(store, player, { ...o, want });
    writeResult(io, store, findComps(store, target, options), o.format);
  });
  return cmd;
}
