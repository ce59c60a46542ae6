import { Command } from 'commander';
import Table from 'cli-table3';
import type { CliIo } from '../CliIo.ts';
import * as parse from '../parseOptions.ts';
import { dimensionsOf } from '../../profiles/buildProfiles.ts';
import { groupOf, POSITION_GROUPS } from '../../profiles/positionGroup.ts';

/** `kindred dims`: the dimensions of each position group with units, direction and meaning (no store needed). */
export function dimsCommand(io: CliIo): Command {
  return new Command('dims')
    .description('list the profile dimensions with units, direction and meaning')
    .option('--position <pos>', 'only the group of this position (C, 1B, ..., DH, SP, RP)', parse.position)
    .option('--format <format>', 'table or json', parse.format, 'table')
    .action((raw: { position?: string; format: string }) => {
      const position = raw.position === undefined ? undefined : parse.position(raw.position);
      const groups = position === undefined ? POSITION_GROUPS : [groupOf(position)];
      if (raw.format === 'json') {
        io.stdout.write(JSON.stringify(Object.fromEntries(groups.map((g) => [g, dimensionsOf(g)])), null, 2) + '\n');
        return;
      }
      for (const g of groups) {
        const t = new Table({
          head: ['Dimension', 'Unit', 'Better', 'Meaning'],
          colWidths: [16, 22, 8, 50],
          wordWrap: true,
          style: { head: [], border: [] },
        });
        for (const d of dimensionsOf(g)) t.push([d.name, d.unit, d.direction, d.meaning]);
        io.stdout.write(`${g} (${g === 'IF' ? '1B, 2B, 3B, SS' : g === 'OF' ? 'LF, CF, RF' : g})\n${t.toString()}\n\n`);
      }
    });
}
