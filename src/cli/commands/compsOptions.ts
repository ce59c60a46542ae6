import type { Command } from 'commander';
import * as parse from '../parseOptions.ts';

/** The pool, weighting and output options shared by every comps-like command. */
export function addPoolOptions(cmd: Command): Command {
  return cmd
    .option('--pool-level <levels>', 'comps only from these levels, e.g. AA,AAA', parse.list)
    .option('--pool-season <range>', 'comps only from these seasons, e.g. 2015-2020 or 2018', parse.seasonRange)
    .option('--age <range>', 'comps only at these ages (June 30), e.g. 21-24', parse.ageRange)
    .option('--bats <hands>', 'comps only batting L, R or S (comma list)', parse.bats)
    .option('--throws <hands>', 'comps only throwing L or R (comma list)', parse.throws)
    .option('--pool-position <positions>', 'comps only at these positions, e.g. SS,2B', parse.positions)
    .option('--k <n>', 'number of comps', parse.positiveInt, 10)
    .option('--preset <name>', 'weighting preset: balanced, bat, glove, power, speed, stuff, command', 'balanced')
    .option('--weights <list>', 'per-dimension multipliers, e.g. obp=2,sprint_ft_s=0', parse.weightOverrides)
    .option('--weighting <scheme>', 'redundancy (default: repeated skills weigh less) or plain z-scores', 'redundancy')
    .option('--min-coverage <share>', 'least share of the target profile a comp must have (0 to 1)', parse.fraction, 0.5)
    .option('--exact', 'scan the whole pool instead of asking the index', false)
    .option('--all-seasons', 'allow several seasons of one comp player', false)
    .option('--format <format>', 'table, json or csv', parse.format, 'table');
}
