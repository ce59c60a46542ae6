import { mkdir, rename, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Command } from 'commander';
import type { CliIo } from '../CliIo.ts';
import * as parse from '../../request/valueParsers.ts';
import { DEFAULT_STORE } from '../../request/parameters.ts';
import { KindredError, UsageError } from '../../errors/KindredError.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import { backtestStore } from '../../outlook/backtestStore.ts';
import { DEFAULT_PROSPECT_OPTIONS } from '../../jobs/findProspectComps.ts';
import { reliabilitySvg } from '../../outlook/charts/reliabilitySvg.ts';
import { coverageSvg } from '../../outlook/charts/coverageSvg.ts';
import { backtestTable } from '../../report/backtestTable.ts';
import { isPitcherGroup, POSITION_GROUPS } from '../../profiles/positionGroup.ts';

function cutsOf(value: string): number[] {
  let cuts: number[];
  try {
    cuts = parse.list(value).map((v) => parse.season(v));
  } catch (e) {
    throw new UsageError(`--cuts ${JSON.stringify(value)}: ${e instanceof Error ? e.message : String(e)}`, { value });
  }
  if (cuts.length === 0) throw new UsageError(`--cuts ${JSON.stringify(value)}: expected seasons, e.g. 2014,2016,2018`, { value });
  return [...new Set(cuts)].sort((a, b) => a - b);
}

function groupOf(value: string): 'hitters' | 'pitchers' {
  if (value === 'hitters' || value === 'pitchers') return value;
  throw new UsageError(`--group ${JSON.stringify(value)}: expected hitters or pitchers`, { value });
}

/**
 * `kindred backtest`: replays the prospect outlook at past cut seasons of the store's roster with only
 * what was known at each cut, and prints how it fared (src/outlook/runBacktest.ts). `--charts <dir>`
 * also writes the reliability and coverage charts as SVG.
 */
export function backtestCommand(io: CliIo): Command {
  return new Command('backtest')
    .description('replay prospect outlooks at past seasons with only what was known then, and score them')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--cuts <seasons>', 'cut seasons, comma-separated (default: every season that can be scored)', cutsOf)
    .option('--group <which>', 'hitters or pitchers (default: both)', groupOf)
    .option('--format <format>', 'table or json', parse.format, 'table')
    .option('--charts <dir>', 'also write reliability and coverage charts (SVG) into this folder')
    .action(async (raw: { store: string; cuts?: number[]; group?: 'hitters' | 'pitchers'; format: string; charts?: string }) => {
      if (raw.format === 'csv') throw new UsageError('--format csv: expected table or json');
      const store = await openProfileStore(raw.store);
      const outcomes = store.outcomes();
      const groups = raw.group === undefined ? undefined : POSITION_GROUPS.filter((g) => isPitcherGroup(g) === (raw.group === 'pitchers'));
      const { file } = backtestStore(store, outcomes, {
        prospect: DEFAULT_PROSPECT_OPTIONS,
        ...(raw.cuts ? { cuts: raw.cuts } : {}),
        ...(groups ? { groups } : {}),
      });
      const kinds = raw.group === 'hitters' ? (['hitter'] as const) : raw.group === 'pitchers' ? (['pitcher'] as const) : (['hitter', 'pitcher'] as const);
      if (raw.charts !== undefined) await writeCharts(raw.charts, file.kinds.filter((k) => (kinds as readonly string[]).includes(k.kind)));
      if (raw.format === 'json') io.stdout.write(JSON.stringify({ ...file, kinds: file.kinds.filter((k) => (kinds as readonly string[]).includes(k.kind)) }, null, 2) + '\n');
      else io.stdout.write(backtestTable(file, kinds));
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
