import { describe, expect, it } from 'vitest';
import type { Command } from 'commander';
import { compsCommand } from '../../src/cli/commands/compsCommand.ts';
import { prospectCommand } from '../../src/cli/commands/prospectCommand.ts';
import { cheaperCommand } from '../../src/cli/commands/cheaperCommand.ts';
import { matchCommand } from '../../src/cli/commands/matchCommand.ts';
import { dimsCommand } from '../../src/cli/commands/dimsCommand.ts';
import { backtestCommand } from '../../src/cli/commands/backtestCommand.ts';
import { JOBS, type JobName } from '../../src/request/jobs.ts';
import { defaultOf, PARAMETER_KEYS, PARAMETERS, parametersOf } from '../../src/request/parameters.ts';
import { captureIo } from '../helpers/captureIo.ts';

const io = captureIo().io;
const commands: [JobName, Command][] = [
  ['comps', compsCommand(io, () => {})],
  ['prospect', prospectCommand(io, () => {})],
  ['cheaper', cheaperCommand(io, () => {})],
  ['match', matchCommand(io, () => {})],
  ['dims', dimsCommand(io)],
  ['backtest', backtestCommand(io)],
];

describe('the request table', () => {
  it.each(commands)('gives `kindred %s` exactly the options the table lists for it on the command line', (job, cmd) => {
    const options = cmd.options.map((o) => o.long);
    const table = parametersOf(job, 'cli').filter((k) => !PARAMETERS[k].positional).map((k) => `--${PARAMETERS[k].name}`);
    expect(options).toEqual(table);
  });
  it('keeps files and output formats off HTTP: no job takes store, batch or format over HTTP', () => {
    for (const job of JOBS) {
      const names = parametersOf(job, 'http').map((k) => PARAMETERS[k].name);
      expect(names).not.toContain('store');
      expect(names).not.toContain('batch');
      expect(names).not.toContain('format');
    }
    expect(parametersOf('comps', 'http').map((k) => PARAMETERS[k].name)).toContain('player');
  });
  it('has one name per parameter and a default that its own parser accepts back', () => {
    const names = PARAMETER_KEYS.map((k) => PARAMETERS[k].name);
    expect(new Set(names).size).toBe(names.length);
    for (const key of PARAMETER_KEYS) {
      for (const job of PARAMETERS[key].jobs) {
        const d = defaultOf(key, job);
        if (d === undefined || typeof d === 'object') continue;
        expect(PARAMETERS[key].parse(String(d)), `${key} for ${job}`).toEqual(d);
      }
    }
  });
  it('shows each default in the help, as commander does', () => {
    const help = commands[1]?.[1].helpInformation() ?? '';
    expect(help).toMatch(/--k <n>\s+number of comps \(at most 1000\) \(default: 25\)/);
    expect(help).toMatch(/--store <dir>\s+store folder made by kindred\s+build\s+\(default:\s+".kindred-store"\)/);
  });
});
