/**
 * `kindred serve` started as its own process (as a user would start it, `--port 0`), warmed with one
 * request, then loaded by autocannon cycling over `paths`; the server is stopped afterwards.
 * Shared by the serve and core benches.
 */
import { spawn } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import { servingUrl } from '../../src/server/servingUrl.ts';

const kindred = join(fileURLToPath(new URL('../..', import.meta.url)), 'bin', 'kindred.js');

export interface ServeLoad {
  readonly storeDir: string;
  /** Extra `kindred serve` arguments, e.g. `['--cache', '0']`. */
  readonly serveArgs: readonly string[];
  readonly paths: readonly string[];
  readonly connections: number;
  readonly seconds: number;
  /**
   * Ask every path once before the load, 4 at a time (default: only the first): on a large store the
   * first answers from a group wait for the group to be read, in each answer worker.
   */
  readonly warmAll?: boolean;
  /** Something to do beside the load (e.g. reloads), started once the server answers; returns its stop. */
  readonly beside?: (url: string) => () => Promise<void>;
}

/** The server's memory after the load (Linux: /proc/<pid>/status; undefined elsewhere), in MiB. */
export interface ServerMemory {
  /** Resident set size at the end of the load. */
  readonly rssMiB: number | undefined;
  /** Peak resident set size since the server started (VmHWM). */
  readonly peakMiB: number | undefined;
}

export type ServeResult = Awaited<ReturnType<typeof autocannon>> & { readonly memory: ServerMemory };

async function memoryOf(pid: number | undefined): Promise<ServerMemory> {
  const status = pid === undefined ? '' : await readFile(`/proc/${pid}/status`, 'utf8').catch(() => '');
  const kib = (field: string): number | undefined => {
    const m = new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(status);
    return m?.[1] === undefined ? undefined : Math.round(Number(m[1]) / 1024);
  };
  return { rssMiB: kib('VmRSS'), peakMiB: kib('VmHWM') };
}

export async function serveUnderLoad(load: ServeLoad): Promise<ServeResult> {
  const args = [kindred, 'serve', '--store', load.storeDir, '--port', '0', ...load.serveArgs];
  const child = spawn(process.execPath, args, { stdio: ['ignore', 'pipe', 'ignore'] });
  const url = await servingUrl(child);
  try {
    let next = 0;
    const warm = await fetch(new URL(load.paths[0] ?? '/api/info', url));
    if (warm.status !== 200) throw new Error(`warm-up answered ${warm.status}`);
    await warm.arrayBuffer();
    if (load.warmAll) {
      let at = 0;
      await Promise.all(
        Array.from({ length: 4 }, async () => {
          while (at < load.paths.length) await (await fetch(new URL(load.paths[at++] ?? '/api/info', url))).arrayBuffer();
        }),
      );
    }
    const stop = load.beside?.(url);
    try {
      const result = await autocannon({
        url,
        connections: load.connections,
        duration: load.seconds,
        requests: [{ setupRequest: (req) => ({ ...req, path: load.paths[next++ % load.paths.length] ?? '/api/info' }) }],
      });
      return { ...result, memory: await memoryOf(child.pid) };
    } finally {
      await stop?.();
    }
  } finally {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
  }
}
