import type { CliIo } from '../CliIo.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import { backtestStore, writeBacktestFile } from '../../outlook/backtestStore.ts';
import { formatPercent, formatSigned } from '../../text/numberFormats.ts';

/**
 * After a build: backtests the prospect outlook on the new store and keeps the summary and the fitted
 * calibration in its backtest.json (read by kindred prospect and the page), with one line on stderr.
 */
export async function storeBacktest(storeDir: string, io: CliIo): Promise<void> {
  io.stderr.write('backtesting the prospect outlook...\n');
  const store = await openProfileStore(storeDir);
  const outcomes = store.outcomes();
  const { file } = backtestStore(store, outcomes);
  await writeBacktestFile(storeDir, file);
  if (file.too_short) {
    io.stderr.write(`Backtest: this roster is too short (${file.too_short}); outlooks are shown uncalibrated\n`);
    return;
  }
  const part = file.kinds.map((k) => `${k.kind}s skill ${formatSigned(k.skill_vs_level_age.value, 2)} vs the level-and-age base rate, peak ranges held ${formatPercent(k.peak_coverage.value)}`);
  io.stderr.write(`Backtest (cuts ${file.cuts.join(', ')}, ${file.seconds} s): ${part.join('; ')}; kindred backtest shows it all\n`);
}
