import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { runBatch } from './runBatch.ts';
import { UsageError } from '../../errors/KindredError.ts';
import { windowView } from '../../query/windowView.ts';
import { requestWindow } from '../../request/requestWindow.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import type { ProspectResult } from '../../jobs/ProspectResult.ts';
import { readBacktestFile } from '../../outlook/backtestStore.ts';
import { prospectTable } from '../../report/prospectTable.ts';
import { prospectCsv } from '../../report/prospectCsv.ts';
import { answerProspect } from '../../request/answerProspect.ts';
import { helpOf } from '../../request/parameters.ts';
import type { OutputFormat } from '../../request/valueParsers.ts';

/** Writes one prospect result in the chosen format. */
export function writeProspect(io: CliIo, result: ProspectResult, format: OutputFormat): void {
  if (format === 'json') io.stdout.write(JSON.stringify(result, null, 2) + '\n');
  else if (format === 'csv') io.stdout.write(prospectCsv(result));
  else io.stdout.write(prospectTable(result));
}

export function prospectCommand(io: CliIo, setExit: (code: number) => void): Command {
  const cmd = new Command('prospect')
    .description('historical comps for a prospect: earlier players at his level and age, and what became of them')
    .argument('[player]', helpOf('player', 'prospect'));
  addRequestOptions(cmd, 'prospect');
  cmd.action(async (player: string | undefined) => {
    const req = requestFrom(cmd, 'prospect', { player });
    const stored = await openProfileStore(req.need('store'));
    const store = windowView(stored, requestWindow(req, stored));
    const outcomes = store.outcomes();
    const backtest = await readBacktestFile(store);
    const format = req.need('format');
    const batch = req.get('batch');
    if (batch !== undefined) {
      if (player !== undefined) throw new UsageError('--batch takes its targets from the file: give no player');
      setExit(
        await runBatch(
          io, batch, format,
          (t) => answerProspect(store, outcomes, req.with({ player: t.playerId, season: t.season, level: t.level }), backtest),
          (r) => prospectCsv(r),
        ),
      );
      return;
    }
    writeProspect(io, answerProspect(store, outcomes, req, backtest), format);
  });
  return cmd;
}
