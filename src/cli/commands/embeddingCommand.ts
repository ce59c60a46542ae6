import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { Command, InvalidArgumentError } from 'commander';
import Table from 'cli-table3';
import type { CliIo } from '../CliIo.ts';
import { DEFAULT_STORE } from '../../request/parameters.ts';
import { openProfileStore } from '../../store/openProfileStore.ts';
import type { ProfileStore } from '../../store/ProfileStore.ts';
import { chartsFolderOf } from '../../store/storeFileNames.ts';
import type { EmbeddingSearchRow } from '../../store/groupEmbeddingFile.ts';
import type { PositionGroup } from '../../profiles/positionGroup.ts';

/** What `kindred embedding --format json` prints for one group. */
export interface EmbeddingReport {
  readonly group: PositionGroup;
  readonly space: 'input' | 'pca' | 'autoencoder';
  readonly d: number;
  /** Code size (null for the input space). */
  readonly chosen_size: number | null;
  readonly rule: string | null;
  readonly search: readonly EmbeddingSearchRow[];
  readonly pair_scale: number | null;
  readonly training_seconds: number | null;
  /** Dimensions by mean |attribution| over the build's sample of comps, largest first. */
  readonly drivers: readonly { readonly name: string; readonly mean_abs: number; readonly median: number; readonly q1: number; readonly q3: number }[];
  /** Absolute chart paths (null when not drawn or no longer on disk). */
  readonly charts: { readonly learning: string | null; readonly drivers: string | null };
}

/** The embedding of every group of a loaded store, as reports. */
export function embeddingReports(store: ProfileStore): EmbeddingReport[] {
  const chartsDir = chartsFolderOf(resolve(store.dir));
  const chart = (name: string | null): string | null => {
    if (name === null) return null;
    const path = join(chartsDir, name);
    return existsSync(path) ? path : null;
  };
  return [...store.groups.values()].map((g) => {
    const e = g.embedding;
    if (!e) {
      return { group: g.group, space: 'input', d: g.d, chosen_size: null, rule: null, search: [], pair_scale: null, training_seconds: null, drivers: [], charts: { learning: null, drivers: null } };
    }
    const s = e.summary;
    return {
      group: g.group,
      space: e.space,
      d: g.d,
      chosen_size: s.search.chosen_size,
      rule: s.search.rule,
      search: s.search.rows,
      pair_scale: s.pair_scale,
      training_seconds: s.training.seconds,
      drivers: [...s.drivers.dims]
        .sort((a, b) => b.mean_abs - a.mean_abs || a.name.localeCompare(b.name))
        .map((x) => ({ name: x.name, mean_abs: x.mean_abs, median: x.median, q1: x.q1, q3: x.q3 })),
      charts: { learning: chart(s.charts.learning), drivers: chart(s.charts.drivers) },
    };
  });
}

const num = (x: number | null, digits: number): string => (x === null ? '-' : x.toFixed(digits));

/** One group's report as text: the search table, the choice, the top drivers and the chart paths. */
export function embeddingText(r: EmbeddingReport): string {
  const label = `${r.group}: ${r.space === 'input' ? 'input space (no embedding; comps use the weighted standardised profiles)' : `${r.space}, ${r.d} dimensions -> ${r.chosen_size}`}`;
  if (r.space === 'input') return `${label}\n`;
  const pca = r.space === 'pca';
  const t = new Table({
    head: pca ? ['Size', 'Variance', 'Train loss', 'Val loss', ''] : ['Size', 'Hidden', 'Epochs', 'Train loss', 'Val loss', ''],
    style: { head: [], border: [], compact: true },
  });
  for (const row of r.search) {
    const mark = row.chosen ? 'chosen' : '';
    if (pca) t.push([String(row.size), num(row.explained, 3), num(row.train_loss, 4), num(row.val_loss, 4), mark]);
    else t.push([String(row.size), row.hidden.join(',') || '-', row.epochs === null ? '-' : String(row.epochs), num(row.train_loss, 4), num(row.val_loss, 4), mark]);
  }
  const top = r.drivers.slice(0, 5).map((x) => `${x.name} ${x.mean_abs.toFixed(3)}`).join(', ');
  return [
    label,
    `  rule: ${r.rule ?? '-'}`,
    `  fitted in ${num(r.training_seconds, 1)} s; likeness scale s = ${num(r.pair_scale, 4)}`,
    t.toString(),
    `  drivers (mean |attribution|): ${top || '-'}`,
    `  learning curve: ${r.charts.learning ?? '-'}`,
    `  drivers chart: ${r.charts.drivers ?? '-'}`,
    '',
  ].join('\n');
}

function format(value: string): 'table' | 'json' {
  if (value !== 'table' && value !== 'json') throw new InvalidArgumentError(`expected table or json, got "${value}"`);
  return value;
}

/** `kindred embedding`: per group, the space, the size search, the chosen size and the chart paths. */
export function embeddingCommand(io: CliIo): Command {
  return new Command('embedding')
    .description('show the learned embedding of a store: space, size search, chosen size, what drives comps, charts')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--format <format>', 'table or json', format, 'table')
    .action(async (raw: { store: string; format: 'table' | 'json' }) => {
      const store = await openProfileStore(raw.store);
      const reports = embeddingReports(store);
      if (raw.format === 'json') {
        io.stdout.write(JSON.stringify({ store: resolve(store.dir), space: store.params.space ?? 'input', groups: reports }, null, 2) + '\n');
        return;
      }
      io.stdout.write(reports.map(embeddingText).join('\n'));
    });
}
