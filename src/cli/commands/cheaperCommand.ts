import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { runBatch } from './runBatch.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { windowView } from '../../query/windowView.ts';
import { requestWindow } from '../../request/requestWindow.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import type { ProfileStore } from '../../store/ProfileStore.ts';
import type { CheaperResult } from '../../jobs/CheaperResult.ts';
import { cheaperTable } from '../../report/cheaperTable.ts';
import { cheaperCsv } from '../../report/cheaperCsv.ts';
import { answerCheaper } from '../../request/answerCheaper.ts';
import { helpOf } from '../../request/parameters.ts';
import type { OutputFormat } from '../../request/valueParsers.ts';

/** Writes one cheaper-comps result in the chosen format. */
export function writeCheaper(io: CliIo, store: ProfileStore, result: CheaperResult, format: OutputFormat): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(cheaperCsv(result));
  else io.stdout.write(cheaperTable(result));
}

export function cheaperCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('cheaper')
    .description('comps who do what an expensive player does, for less: known salaries under a limit, value frontier marked')
    .argument('[player]', helpOf('player', 'cheaper'));
  addRequestOptions(cmd, 'cheaper');
  cmd.action(async (player: string | undefined) => {
    const req = requestFrom(cmd, 'cheaper', { player });
    const stored = await openProfileStore(req.need('store'));
    const store = windowView(stored, requestWindow(req, stored));
    const format = req.need('format');
    const batch = req.get('batch');
    if (batch !== undefined) {
      if (player !== undefined || req.has('want')) throw new UsageError('--batch takes its targets from the file: give no player or --want');
      setExit(
        await runBatch(
          io, batch, format,
          (t) => answerCheaper(store, req.with({ player: t.playerId, season: t.season, level: t.level })),
          (r) => cheaperCsv(r),
        ),
      );
      return;
    }
    writeCheaper(io, store, answerCheaper(store, req), format);
  });
  return cmd;
}
