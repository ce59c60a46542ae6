import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { runBatch } from './runBatch.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { windowedTarget } from '../../request/windowedTarget.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import type { ProfileStore } from '../../store/ProfileStore.ts';
import { resolvePlayer } from '../../query/resolvePlayer.ts';
import { matchPlayers } from '../../jobs/matchPlayers.ts';
import type { MatchResult } from '../../jobs/MatchResult.ts';
import { matchTable } from '../../report/matchTable.ts';
import { matchCsv } from '../../report/matchCsv.ts';
import { answerMatch, matchOptionsFrom } from '../../request/answerMatch.ts';
import { helpOf } from '../../request/parameters.ts';
import type { OutputFormat } from '../../request/valueParsers.ts';

/** Writes one match in the chosen format. */
export function writeMatch(io: CliIo, store: ProfileStore, result: MatchResult, format: OutputFormat): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(matchCsv(result));
  else io.stdout.write(matchTable(result, store.groups.get(result.query.group)?.dims ?? []));
}

export function matchCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('match')
    .description('one candidate against a target: likeness, percentile in the pool, every dimension with grades')
    .argument('[player-a]', helpOf('player', 'match'))
    .argument('[player-b]', helpOf('candidate', 'match'));
  addRequestOptions(cmd, 'match');
  cmd.action(async (first: string | undefined, second: string | undefined) => {
    const withWant = cmd.getOptionValue('want') !== undefined;
    if (withWant && second !== undefined) throw new UsageError('with --want give only the candidate (player-b)');
    const req = requestFrom(cmd, 'match', withWant ? { candidate: first } : { player: first, candidate: second });
    const stored = await openProfileStore(req.need('store'));
    const format = req.need('format');
    const batch = req.get('batch');
    if (batch !== undefined) {
      if (req.has('candidate')) throw new UsageError('--batch takes the candidates from the file: give only the target');
      const { store, target } = windowedTarget(stored, req);
      const options = matchOptionsFrom(req, store, target);
      setExit(
        await runBatch(
          io, batch, format,
          (t) => matchPlayers(store, target, resolvePlayer(store, t.playerId), {
            ...options,
            candidate: { ...(t.season !== undefined ? { season: t.season } : {}), ...(t.level !== undefined ? { level: t.level } : {}) },
          }),
          (r) => matchCsv(r),
        ),
      );
      return;
    }
    writeMatch(io, stored, answerMatch(stored, req), format);
  });
  return cmd;
}
