import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { runBatch } from './runBatch.ts';
import { windowView } from '../../query/windowView.ts';
import { requestWindow } from '../../request/requestWindow.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import type { ProfileStore } from '../../store/ProfileStore.ts';
import type { CompsResult } from '../../query/CompsResult.ts';
import { compsTable } from '../../report/compsTable.ts';
import { compsCsv } from '../../report/compsCsv.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { answerComps } from '../../request/answerComps.ts';
import { helpOf } from '../../request/parameters.ts';
import type { OutputFormat } from '../../request/valueParsers.ts';

/** Writes one result in the chosen format. */
export function writeResult(io: CliIo, store: ProfileStore, result: CompsResult, format: OutputFormat, csvHeader = true): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(compsCsv(result, csvHeader));
  else io.stdout.write(compsTable(result, store.groups.get(result.query.group)?.dims ?? []));
}

export function compsCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('comps')
    .description('ranked comparable players for a player-season or a hand-built profile')
    .argument('[player]', helpOf('player', 'comps'));
  addRequestOptions(cmd, 'comps');
  cmd.action(async (player: string | undefined) => {
    const req = requestFrom(cmd, 'comps', { player });
    const stored = await openProfileStore(req.need('store'));
    const store = windowView(stored, requestWindow(req, stored));
    const format = req.need('format');
    const batch = req.get('batch');
    if (batch !== undefined) {
      if (player !== undefined || req.has('want')) throw new UsageError('--batch takes its targets from the file: give no player or --want');
      setExit(await runBatch(io, batch, format, (t) => answerComps(stored, req.with({ player: t.playerId, season: t.season, level: t.level })), (r) => compsCsv(r)));
      return;
    }
    writeResult(io, store, answerComps(stored, req), format);
  });
  return cmd;
}
