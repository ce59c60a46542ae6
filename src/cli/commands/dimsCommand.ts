import { Command } from 'commander';
import Table from 'cli-table3';
import type { CliIo } from '../CliIo.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { answerDims } from '../../request/answerDims.ts';
import type { DimensionInfo } from '../../profiles/Dimension.ts';
import { DEFAULT_FAMILY_SHARES, presentShares } from '../../profiles/skillFamily.ts';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { openProfileStore } from '../../store/openProfileStore.ts';
import type { ProfileStore } from '../../store/ProfileStore.ts';
import { fittedShrinkage } from '../../query/fittedShrinkage.ts';
import { KindredError } from '../../errors/KindredError.ts';
import { MANIFEST_NAME } from '../../store/manifest.ts';
import type { PositionGroup } from '../../profiles/positionGroup.ts';

/** One line per skill family: its default share of the weight and its dimensions. */
function familyLines(dims: readonly DimensionInfo[]): string[] {
  const shares = presentShares(DEFAULT_FAMILY_SHARES, dims.map((d) => d.family));
  return [
    'Skill families (default share of the weight): dimensions',
    ...[...shares].map(([f, s]) => `  ${f} (${Math.round(s * 100)}%): ${dims.filter((d) => d.family === f).map((d) => d.name).join(', ')}`),
  ];
}

/** The store whose fitted k to show, when the folder holds one; a store that cannot be read is named on stderr and left out. */
async function storeIfAny(io: CliIo, dir: string): Promise<ProfileStore | undefined> {
  if (!existsSync(join(dir, MANIFEST_NAME))) return undefined;
  try {
    return await openProfileStore(dir);
  } catch (error) {
    if (!(error instanceof KindredError)) throw error;
    io.stderr.write(`fitted k not shown: ${error.message}\n`);
    return undefined;
  }
}

/** The k cells of a dimension: the table's, and the median fitted in the store with the share of strata fitted. */
function kCells(store: ProfileStore | undefined, group: string, d: DimensionInfo): [string, string] {
  const table = d.stabilisation > 0 ? String(Math.round(d.stabilisation)) : '-';
  const g = store?.groups.get(group as PositionGroup);
  if (!g || d.stabilisation <= 0) return [table, '-'];
  const s = fittedShrinkage(g, d.name);
  if (s.fittedStrata === 0) return [table, 'table'];
  return [table, `${Math.round(s.fittedK)} ${Math.round((100 * s.fittedStrata) / s.strata)}%`];
}

/**
 * `kindred dims`: the dimensions of each position group with labels (accepted wherever names are), units,
 * direction and meaning (no store needed); with a store, the regression constant k fitted to its roster
 * beside the table's.
 */
export function dimsCommand(io: CliIo): Command {
  const cmd = new Command('dims').description('list the profile dimensions with units, direction and meaning');
  addRequestOptions(cmd, 'dims');
  return cmd.action(async () => {
    const req = requestFrom(cmd, 'dims');
    const dims = answerDims(req);
    if (req.need('format') === 'json') {
      io.stdout.write(JSON.stringify(dims, null, 2) + '\n');
      return;
    }
    const store = await storeIfAny(io, req.need('store'));
    for (const [g, list] of Object.entries(dims)) {
      const t = new Table({
        head: ['Dimension', 'Label', 'Unit', 'Better', 'k table', 'k fitted', 'Meaning'],
        colWidths: [16, 15, 14, 8, 9, 10, 20],
        wordWrap: true,
        style: { head: [], border: [] },
      });
      for (const d of list) t.push([d.name, d.label, d.unit, d.direction, ...kCells(store, g, d), d.meaning]);
      io.stdout.write(`${g} (${g === 'IF' ? '1B, 2B, 3B, SS' : g === 'OF' ? 'LF, CF, RF' : g})\n${t.toString()}\n${familyLines(list).join('\n')}\n\n`);
    }
    io.stdout.write(
      'k: league-average events added before a rate is regressed (- = not regressed).\n' +
        'k table: the fixed table (src/stats/stabilisation.ts).\n' +
        (store
          ? 'k fitted: median k fitted to the roster of that store over its league strata\n' +
            '(season and level) and the share of strata fitted; "table" = all kept the table k.\n'
          : 'k fitted: build a store (or pass --store) to see the k fitted to your roster.\n'),
    );
  });
}
