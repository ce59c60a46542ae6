import { describe, expect, it } from 'vitest';
import { Command } from 'commander';
import * as parse from '../../src/cli/parseOptions.ts';
import { commandParameters, parseParameters } from '../../src/server/commandParameters.ts';
import { COMPS_PARAMETERS } from '../../src/server/api/compsEndpoint.ts';
import { compsCommand } from '../../src/cli/commands/compsCommand.ts';
import { captureIo } from '../../src/server/captureIo.ts';

const sample = (): Command =>
  new Command('x')
    .option('--store <dir>', 'store', 'here')
    .option('--pool-level <levels>', 'levels', parse.list)
    .option('--k <n>', 'k', parse.positiveInt, 10)
    .option('--exact', 'exact', false)
    .option('--no-color', 'negated flags are not parameters')
    .option('--level <level>', 'plain text');

describe('commandParameters(cmd, exclude, extra)', () => {
  it('lists the long options without dashes, minus the excluded and negated ones', () => {
    const set = commandParameters(sample(), ['store'], ['player']);
    expect([...set.specs.keys()]).toEqual(['pool-level', 'k', 'exact', 'level']);
    expect(set.specs.get('pool-level')?.attribute).toBe('poolLevel');
    expect(set.specs.get('exact')?.flag).toBe(true);
    expect(set.specs.get('k')?.defaultValue).toBe(10);
    expect(set.extra).toEqual(['player']);
  });
  it('gives /api/comps every option of `kindred comps` except store, batch and format', () => {
    const cliNames = compsCommand(captureIo().io, () => {}).options.map((o) => o.long?.slice(2));
    expect([...COMPS_PARAMETERS.specs.keys()].sort()).toEqual(cliNames.filter((n) => n !== 'store' && n !== 'batch' && n !== 'format').sort());
  });
});

describe('parseParameters(query, set)', () => {
  const set = commandParameters(sample(), ['store'], ['player']);
  it('starts from the defaults and parses each value with the option\'s own parser', () => {
    const { options, extra } = parseParameters(new URLSearchParams('pool-level=AA,%20AAA&k=3&exact=&player=p1'), set);
    expect(options).toEqual({ poolLevel: ['AA', 'AAA'], k: 3, exact: true });
    expect(extra.get('player')).toBe('p1');
    expect(parseParameters(new URLSearchParams(''), set).options).toEqual({ k: 10, exact: false });
  });
  it('reads flags as true/false/1/0 and refuses anything else', () => {
    expect(parseParameters(new URLSearchParams('exact=0'), set).options.exact).toBe(false);
    expect(parseParameters(new URLSearchParams('exact=TRUE'), set).options.exact).toBe(true);
    expect(() => parseParameters(new URLSearchParams('exact=yes'), set)).toThrow(/parameter exact: expected true or false, got "yes"/);
    expect(() => parseParameters(new URLSearchParams('exact=constructor'), set)).toThrow(/expected true or false/);
  });
  it('refuses unknown, repeated, empty and excluded parameters with a UsageError', () => {
    expect(() => parseParameters(new URLSearchParams('kk=1'), set)).toThrow(/unknown parameter "kk" \(did you mean k\?\)/);
    expect(() => parseParameters(new URLSearchParams('k=1&k=2'), set)).toThrow(/given more than once/);
    expect(() => parseParameters(new URLSearchParams('level='), set)).toThrow(/needs a value/);
    expect(() => parseParameters(new URLSearchParams('store=x'), set)).toThrow(/unknown parameter "store"/);
    expect(() => parseParameters(new URLSearchParams('k=-1'), set)).toThrow(expect.objectContaining({ code: 'kindred.usage.badOption', message: expect.stringMatching(/^parameter k: expected a whole number/) }));
  });
});
