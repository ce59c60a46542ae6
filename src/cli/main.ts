import { Command, CommanderError } from 'commander';
import type { CliIo } from './CliIo.ts';
import { KindredError } from '../errors/KindredError.ts';
import { InputError, formatIssue } from '../errors/InputError.ts';
import { ParameterError } from '../errors/ParameterError.ts';
import { CLI_NAMES } from './requestOptions.ts';
import { buildCommand } from './commands/buildCommand.ts';
import { compsCommand } from './commands/compsCommand.ts';
import { dimsCommand } from './commands/dimsCommand.ts';
import { demoCommand } from './commands/demoCommand.ts';
import { embeddingCommand } from './commands/embeddingCommand.ts';
import { serveCommand } from './commands/serveCommand.ts';
import { prospectCommand } from './commands/prospectCommand.ts';
import { cheaperCommand } from './commands/cheaperCommand.ts';
import { matchCommand } from './commands/matchCommand.ts';
import { backtestCommand } from './commands/backtestCommand.ts';
import { TERMINAL_COLUMNS } from '../report/terminalColumns.ts';

/** Most input problems printed one per line before "and N more". */
const MAX_ISSUES_SHOWN = 50;

/**
 * Runs the CLI in-process and returns the exit code: 0 success, 1 bad input or a failed query,
 * 2 bad usage. Never calls process.exit; results go to io.stdout, messages to io.stderr.
 */
export async function main(argv: readonly string[], io: CliIo): Promise<number> {
  let exitCode = 0;
  const program = new Command('kindred')
    .description('Comparable players from your own season-level data')
    .version('0.1.0')
    .exitOverride()
    .showSuggestionAfterError(true)
    .configureOutput({ writeOut: (s) => io.stdout.write(s), writeErr: (s) => io.stderr.write(s) })
    .configureHelp({ helpWidth: TERMINAL_COLUMNS });
  const setExit = (code: number): void => {
    exitCode = code;
  };
  const commands = [buildCommand(io), compsCommand(io, setExit), dimsCommand(io), demoCommand(io), serveCommand(io), embeddingCommand(io), prospectCommand(io, setExit), cheaperCommand(io, setExit), matchCommand(io, setExit), backtestCommand(io)];
  for (const c of commands) {
    // help is wrapped at the width every table keeps to, whatever the terminal (or none, when piped)
    c.exitOverride().configureOutput({ writeOut: (s) => io.stdout.write(s), writeErr: (s) => io.stderr.write(s) }).configureHelp({ helpWidth: TERMINAL_COLUMNS });
    program.addCommand(c);
  }
  try {
    await program.parseAsync([...argv], { from: 'user' });
    return exitCode;
  } catch (e) {
    return report(e, io);
  }
}

function report(e: unknown, io: CliIo): number {
  if (e instanceof CommanderError) {
    if (e.code === 'commander.helpDisplayed' || e.code === 'commander.version' || e.code === 'commander.help') return 0;
    return 2;
  }
  if (e instanceof InputError) {
    const shown = e.issues.slice(0, MAX_ISSUES_SHOWN).map(formatIssue);
    const more = e.issues.length > MAX_ISSUES_SHOWN ? [`... and ${e.issues.length - MAX_ISSUES_SHOWN} more`] : [];
    io.stderr.write(`kindred: bad input (${e.issues.length} problem${e.issues.length === 1 ? '' : 's'}); nothing was written\n${[...shown, ...more].join('\n')}\n`);
    return e.exitCode;
  }
  if (e instanceof ParameterError) {
    io.stderr.write(`kindred: ${e.render(CLI_NAMES)} [${e.code}]\n`);
    return e.exitCode;
  }
  if (e instanceof KindredError) {
    const candidates = e.context['candidates'];
    const rows = Array.isArray(candidates) ? candidates.map((c) => `  ${c}\n`).join('') : '';
    io.stderr.write(`kindred: ${e.message} [${e.code}]\n${rows}`);
    return e.exitCode;
  }
  io.stderr.write(`kindred: unexpected failure: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}\n`);
  return 1;
}
