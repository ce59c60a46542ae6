import type { CliIo } from '../CliIo.ts';
import { KindredError } from '../../errors/KindredError.ts';
import { ParameterError } from '../../errors/ParameterError.ts';
import type { OutputFormat } from '../../request/valueParsers.ts';
import { CLI_NAMES } from '../requestOptions.ts';
import { readTargets } from './readTargets.ts';

/** One batch line's target. */
export interface BatchLine {
  readonly playerId: string;
  readonly season: number | undefined;
  readonly level: string | undefined;
}

/**
 * Runs a batch in the order given. JSON (the default, and with `--format json`): one object per
 * line, a target that fails gives a line with its error. CSV (`--format csv`): each result's rows
 * under one header (repeated only when the columns change, e.g. from hitters to pitchers), a target
 * that fails is reported on stderr with its line. The batch goes on past failures; the exit code is 1
 * if any target failed.
 */
export async function runBatch<R>(
  io: CliIo,
  path: string,
  format: OutputFormat,
  answer: (line: BatchLine) => R,
  csv: (result: R) => string,
): Promise<number> {
  const targets = await readTargets(path);
  let failed = 0;
  let header: string | undefined;
  for (const t of targets) {
    try {
      const result = answer(t);
      if (format !== 'csv') {
        io.stdout.write(JSON.stringify(result) + '\n');
        continue;
      }
      const text = csv(result);
      const cut = text.indexOf('\n');
      const head = cut < 0 ? text : text.slice(0, cut);
      io.stdout.write(head === header ? text.slice(cut + 1) : text);
      header = head;
    } catch (e) {
      if (!(e instanceof KindredError)) throw e;
      failed++;
      const message = e instanceof ParameterError ? e.render(CLI_NAMES) : e.message;
      if (format === 'csv') io.stderr.write(`${path}:${t.line}: ${t.playerId}: ${message} [${e.code}]\n`);
      else io.stdout.write(JSON.stringify({ query: { player_id: t.playerId, season: t.season ?? null, level: t.level ?? null, line: t.line }, error: { code: e.code, message } }) + '\n');
    }
  }
  if (failed > 0) io.stderr.write(`${failed} of ${targets.length} targets failed (see their error lines)\n`);
  return failed > 0 ? 1 : 0;
}
