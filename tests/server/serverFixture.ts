/** Shared by the server tests: a demo store in a temp folder, a tiny page, and a raw HTTP client. */
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { request as httpRequest } from 'node:http';
import { connect } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildStore, type BuildOptions } from '../../src/pipeline/buildStore.ts';
import { DEMO_ROSTER } from '../../src/cli/commands/demoCommand.ts';

export async function tempDir(prefix: string): Promise<{ dir: string; remove: () => Promise<void> }> {
  const dir = await mkdtemp(join(tmpdir(), prefix));
  return { dir, remove: () => rm(dir, { recursive: true, force: true }) };
}

/** Builds the bundled invented league into `storeDir`. */
export async function buildDemoStore(storeDir: string, options: Partial<BuildOptions> = {}): Promise<void> {
  await buildStore(DEMO_ROSTER, storeDir, { lenient: false, ...options });
}

/** A stand-in page: index.html and one asset, to test static serving without a vite build. */
export async function writeTinyPage(dir: string): Promise<void> {
  await mkdir(join(dir, 'assets'), { recursive: true });
  await writeFile(join(dir, 'index.html'), '<!doctype html><title>tiny</title><script type="module" src="/assets/app-1.js"></script>');
  await writeFile(join(dir, 'assets', 'app-1.js'), 'console.log("tiny page");\n');
}

export interface RawResponse {
  readonly status: number;
  readonly headers: Readonly<Record<string, string | string[] | undefined>>;
  readonly text: string;
}

/** An HTTP request with exactly the headers given (node:http adds only Host unless one is set). */
export function send(
  url: string,
  path: string,
  init: { method?: string; headers?: Record<string, string>; body?: string | Buffer } = {},
): Promise<RawResponse> {
  const u = new URL(url);
  return new Promise((resolve, reject) => {
    const req = httpRequest(
      { host: u.hostname, port: u.port, path, method: init.method ?? 'GET', headers: init.headers ?? {}, agent: false },
      (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text: Buffer.concat(chunks).toString('utf8') }));
        res.on('error', reject);
      },
    );
    req.on('error', reject);
    if (init.body !== undefined) req.write(init.body);
    req.end();
  });
}

/** The parsed JSON body of a response, or the error of a non-JSON body. */
export function json(r: RawResponse): unknown {
  return JSON.parse(r.text) as unknown;
}

/** The error body's code and message (fails the test when the body is not an error body). */
export function errorOf(r: RawResponse): { code: string; message: string } {
  const v = json(r);
  if (typeof v !== 'object' || v === null || !('error' in v)) throw new Error(`not an error body: ${r.text.slice(0, 200)}`);
  const e = v.error;
  if (typeof e !== 'object' || e === null || !('code' in e) || !('message' in e) || typeof e.code !== 'string' || typeof e.message !== 'string') {
    throw new Error(`bad error body: ${r.text.slice(0, 200)}`);
  }
  return { code: e.code, message: e.message };
}

/**
 * Writes raw bytes on a fresh TCP connection and collects everything the server sends until it
 * closes the connection or `waitMs` passes.
 */
export function rawExchange(url: string, bytes: string, waitMs: number): Promise<{ text: string; closed: boolean; ms: number }> {
  const u = new URL(url);
  const started = performance.now();
  return new Promise((resolve, reject) => {
    const socket = connect(Number(u.port), u.hostname);
    let text = '';
    let done = false;
    const finish = (closed: boolean): void => {
      if (done) return;
      done = true;
      clearTimeout(timer);
      socket.destroy();
      resolve({ text, closed, ms: performance.now() - started });
    };
    const timer = setTimeout(() => finish(false), waitMs);
    socket.on('data', (c: Buffer) => (text += c.toString('utf8')));
    socket.on('close', () => finish(true));
    socket.on('error', (e) => (done ? undefined : reject(e)));
    socket.write(bytes);
  });
}
