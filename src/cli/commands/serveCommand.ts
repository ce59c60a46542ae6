import { Command, InvalidArgumentError } from 'commander';
import type { CliIo } from '../CliIo.ts';
import { DEFAULT_STORE } from '../../request/parameters.ts';
import { createServer, DEFAULT_CACHE_ENTRIES, DEFAULT_WORKERS } from '../../server/createServer.ts';
import { positiveInt } from '../../request/valueParsers.ts';
import { cliParser } from '../requestOptions.ts';
import { servingLine } from '../../server/servingUrl.ts';

/** A TCP port: 0 (any free port) to 65535. */
export function port(value: string): number {
  const n = Number(value);
  if (!/^\d{1,5}$/.test(value.trim()) || n > 65535) throw new InvalidArgumentError(`expected a port from 0 to 65535, got "${value}"`);
  return n;
}

/** 0 or a positive whole number of cached answers. */
export function cacheSize(value: string): number {
  return value.trim() === '0' ? 0 : cliParser(positiveInt)(value);
}

/** Answer workers: 0 (answers computed on the server's thread) up to MAX_WORKERS. */
export function workerCount(value: string): number {
  const n = value.trim() === '0' ? 0 : cliParser(positiveInt)(value);
  if (n > MAX_WORKERS) throw new InvalidArgumentError(`expected at most ${MAX_WORKERS} answer workers (each holds its own copy of the store), got "${value}"`);
  return n;
}

/** Most answer workers (a project choice: each holds a copy of the store, and more than the cores only queue). */
export const MAX_WORKERS = 16;

export interface ServeSignals {
  /** Registers a handler; returns a function that removes it. */
  on(signal: 'SIGHUP' | 'SIGINT' | 'SIGTERM', handler: () => void): () => void;
  /**
   * Calls `handler` once if the server was started by npm exec (`npx kindred serve`) and that npm
   * process ends: npm does not pass a signal on to the command it started, so `kill <npx pid>` would
   * otherwise leave the server running and holding its port. Returns a function that stops watching.
   */
  onLauncherGone(handler: () => void): () => void;
}

/** How often the server checks that the npm process that started it is still there. */
const LAUNCHER_CHECK_MS = 500;

const processSignals: ServeSignals = {
  on(signal, handler) {
    process.on(signal, handler);
    return () => process.off(signal, handler);
  },
  onLauncherGone(handler) {
    if (process.env.npm_command !== 'exec') return () => {};
    const parent = process.ppid;
    const timer = setInterval(() => {
      if (process.ppid === parent) return;
      clearInterval(timer);
      handler();
    }, LAUNCHER_CHECK_MS);
    timer.unref();
    return () => clearInterval(timer);
  },
};

/**
 * `kindred serve`: the page and the JSON API over one loaded store, until SIGINT or SIGTERM.
 * SIGHUP reloads the store (as POST /api/reload does); a failed reload keeps the old store.
 */
export function serveCommand(io: CliIo, signals: ServeSignals = processSignals): Command {
  return new Command('serve')
    .description('serve a local web page and a JSON API for comps over a store')
    .option('--store <dir>', 'store folder made by kindred build', DEFAULT_STORE)
    .option('--port <n>', 'TCP port (0: any free port)', port, 8080)
    .option('--host <address>', 'address to listen on (anything but loopback exposes the store to the network)', '127.0.0.1')
    .option('--cache <n>', 'answers kept in memory per loaded store (0: none)', cacheSize, DEFAULT_CACHE_ENTRIES)
    .option('--workers <n>', 'threads computing answers, each with its own copy of the store (0: on the server\'s thread)', workerCount, DEFAULT_WORKERS)
    .action(async (raw: { store: string; port: number; host: string; cache: number; workers: number }) => {
      const running = await createServer({
        storeDir: raw.store,
        port: raw.port,
        host: raw.host,
        cacheEntries: raw.cache,
        workers: raw.workers,
        log: (line) => io.stderr.write(line + '\n'),
      });
      io.stdout.write(servingLine(running.url, raw.store));
      io.stderr.write('Ctrl-C stops; SIGHUP or POST /api/reload reloads the store after a rebuild.\n');
      await new Promise<void>((resolve) => {
        const offs: (() => void)[] = [];
        const stop = (): void => {
          for (const off of offs) off();
          running.close().then(resolve, resolve);
        };
        offs.push(
          signals.on('SIGHUP', () => {
            running.reload().then(
              (loaded) => io.stderr.write(`reloaded ${raw.store} (generation ${loaded.generation})\n`),
              (e: unknown) => io.stderr.write(`reload failed, still serving the previous store: ${e instanceof Error ? e.message : String(e)}\n`),
            );
          }),
          signals.on('SIGINT', stop),
          signals.on('SIGTERM', stop),
          signals.onLauncherGone(() => {
            io.stderr.write('the npm process that started the server has ended: stopping\n');
            stop();
          }),
        );
      });
      io.stderr.write('stopped\n');
    });
}
