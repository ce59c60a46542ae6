import { mkdir, rename, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import { KindredError } from '../../errors/KindredError.ts';
import { ParameterError } from '../../errors/ParameterError.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import { answerBacktest } from '../../request/answerBacktest.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { reliabilitySvg } from '../../outlook/charts/reliabilitySvg.ts';
import { coverageSvg } from '../../outlook/charts/coverageSvg.ts';
import { backtestTable } from '../../report/backtestTable.ts';

/**
 * `kindred backtest`: replays the prospect outlook at past cut seasons of the store's roster with only
 * what was known at each cut, and prints how it fared (src/request/answerBacktest.ts, the same answer
 * as `GET /api/backtest`). `--charts <dir>` also writes the reliability and coverage charts as SVG.
 * Options come from the request table (src/request/parameters.ts).
 */
export function backtestCommand(io: CliIo): Command {
  const cmd = new Command('backtest').description('replay prospect outlooks at past seasons with only what was known then, and score them');
  addRequestOptions(cmd, 'backtest');
  return cmd.action(async () => {
    const req = requestFrom(cmd, 'backtest');
    const format = req.need('format');
    if (format === 'csv') throw new ParameterError('format', 'expected table or json, got "csv"', { context: { value: format } });
    const store = await openProfileStore(req.need('store'));
    const file = answerBacktest(store, store.outcomes(), req);
    const charts = req.get('charts');
    if (charts !== undefined) await writeCharts(charts, file.kinds);
    if (format === 'json') io.stdout.write(JSON.stringify(file, null, 2) + '\n');
    else io.stdout.write(backtestTable(file, file.kinds.map((k) => k.kind)));
  });
}

async function writeCharts(dir: string, kinds: Parameters<typeof reliabilitySvg>[0][]): Promise<void> {
  try {
    await mkdir(dir, { recursive: true });
    for (const k of kinds) {
      const who = k.kind === 'hitter' ? 'Hitters' : 'Pitchers';
      const charts: [string, string][] = [
        [`reliability-${k.kind}s.svg`, await reliabilitySvg(k, who)],
        [`coverage-${k.kind}s.svg`, await coverageSvg(k, who, k.kind === 'hitter' ? 'peak OPS+' : 'best FIP-')],
      ];
      for (const [name, svg] of charts) {
        const temp = join(dir, `.${name}.${process.pid}.tmp`);
        await writeFile(temp, svg);
        await rename(temp, join(dir, name));
      }
    }
  } catch (cause) {
    if (cause instanceof KindredError) throw cause;
    throw new KindredError('kindred.store.writeFailed', `cannot write charts into ${dir}: ${String(cause)}`, { dir });
  }
}
