import { Command } from 'commander';
import Table from 'cli-table3';
import type { CliIo } from '../CliIo.ts';
import { addRequestOptions, requestFrom } from '../requestOptions.ts';
import { answerDims } from '../../request/answerDims.ts';
import type { DimensionInfo } from '../../profiles/Dimension.ts';
import { DEFAULT_FAMILY_SHARES, presentShares } from '../../profiles/skillFamily.ts';

/** One line per skill family: its default share of the weight and its dimensions. */
function familyLines(dims: readonly DimensionInfo[]): string[] {
  const shares = presentShares(DEFAULT_FAMILY_SHARES, dims.map((d) => d.family));
  return [
    'Skill families (default share of the weight): dimensions',
    ...[...shares].map(([f, s]) => `  ${f} (${Math.round(s * 100)}%): ${dims.filter((d) => d.family === f).map((d) => d.name).join(', ')}`),
  ];
}

/** `kindred dims`: the dimensions of each position group with labels (accepted wherever names are), units, direction and meaning (no store needed). */
export function dimsCommand(io: CliIo): Command {
  const cmd = new Command('dims').description('list the profile dimensions with units, direction and meaning');
  addRequestOptions(cmd, 'dims');
  return cmd.action(() => {
    const req = requestFrom(cmd, 'dims');
    const dims = answerDims(req);
    if (req.need('format') === 'json') {
      io.stdout.write(JSON.stringify(dims, null, 2) + '\n');
      return;
    }
    for (const [g, list] of Object.entries(dims)) {
      const t = new Table({
        head: ['Dimension', 'Label', 'Unit', 'Better', 'Meaning'],
        colWidths: [15, 12, 17, 8, 40],
        wordWrap: true,
        style: { head: [], border: [] },
      });
      for (const d of list) t.push([d.name, d.label, d.unit, d.direction, d.meaning]);
      io.stdout.write(`${g} (${g === 'IF' ? '1B, 2B, 3B, SS' : g === 'OF' ? 'LF, CF, RF' : g})\n${t.toString()}\n${familyLines(list).join('\n')}\n\n`);
    }
  });
}
