/** Help of the program and of every command: within 100 columns and without trailing spaces, however it is read (piped here). */
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';
import { terminalLines } from '../helpers/terminalLayout.ts';

const COMMANDS = ['build', 'comps', 'dims', 'demo', 'serve', 'embedding', 'prospect', 'cheaper', 'match', 'backtest'];

describe('kindred --help', () => {
  it('wraps the list of commands within 100 columns (a description once ran to 146)', async () => {
    const out = await runCli('--help');
    expect(out.code).toBe(0);
    const lines = terminalLines(out.stdout);
    for (const c of COMMANDS) expect(lines.some((l) => l.startsWith(`  ${c} `))).toBe(true);
  });

  it.each(COMMANDS)('wraps the help of %s within 100 columns', async (command) => {
    const out = await runCli(command, '--help');
    expect(out.code).toBe(0);
    expect(terminalLines(out.stdout).length).toBeGreaterThan(3);
  });
});
