import http, { type IncomingMessage, type ServerResponse } from 'node:http';
import { fileURLToPath } from 'node:url';
import { allowedHosts } from './allowedHosts.ts';
import { checkRequestSource } from './checkRequestSource.ts';
import { errorResponse } from './errorResponse.ts';
import { HttpError } from './HttpError.ts';
import { readBody } from './readBody.ts';
import { SECURITY_HEADERS } from './securityHeaders.ts';
import { loadStaticFiles, type StaticFile } from './staticFiles.ts';
import { StoreHolder, type StoreLoader } from './StoreHolder.ts';
import type { LoadedStore } from './LoadedStore.ts';
import { JsonText, type Endpoint } from './Endpoint.ts';
import { API_ENDPOINTS } from './apiEndpoints.ts';
import { cacheKey } from './AnswerCache.ts';
import { TurnQueue } from './TurnQueue.ts';
import { AnswerPool, type PoolAnswer } from './pool/AnswerPool.ts';
import { storeAnswerText } from './storeAnswerText.ts';
import { KindredError } from '../errors/KindredError.ts';

/** Where `npm run build:web` writes the page. */
export const DEFAULT_WEB_ROOT = fileURLToPath(new URL('../web/dist', import.meta.url));

export interface ServerLimits {
  /** node:http maxHeaderSize: request line plus headers (431 above it). */
  readonly maxHeaderBytes: number;
  /** Request body cap (413 above it). */
  readonly maxBodyBytes: number;
  /** node:http headersTimeout: time to receive the whole header block (408 after it). */
  readonly headersTimeoutMs: number;
  /** node:http requestTimeout: time to receive the whole request. */
  readonly requestTimeoutMs: number;
  readonly keepAliveTimeoutMs: number;
  /**
   * Socket inactivity before the server closes it (node:http server.timeout): also a connection that
   * never sends a request, which headersTimeout does not close.
   */
  readonly idleTimeoutMs: number;
  /** Open connections at most (node:http maxConnections); sockets above it are closed at once. */
  readonly maxConnections: number;
}

export const DEFAULT_LIMITS: ServerLimits = {
  maxHeaderBytes: 16 * 1024,
  maxBodyBytes: 64 * 1024,
  headersTimeoutMs: 10_000,
  requestTimeoutMs: 30_000,
  keepAliveTimeoutMs: 5_000,
  idleTimeoutMs: 30_000,
  maxConnections: 512,
};

export interface ServerOptions {
  readonly storeDir: string;
  /** Default 127.0.0.1: only this machine. */
  readonly host?: string;
  /** Default 8080; 0 picks a free port. */
  readonly port?: number;
  /** Folder of the built page (default DEFAULT_WEB_ROOT). */
  readonly webRoot?: string;
  readonly limits?: Partial<ServerLimits>;
  /** Where unexpected failures are logged with their stack (default: stderr). */
  readonly log?: (line: string) => void;
  readonly loadStore?: StoreLoader;
  /** Answers of comps-like queries kept per loaded store (default DEFAULT_CACHE_ENTRIES; 0: none). */
  readonly cacheEntries?: number;
  /**
   * Worker threads computing uncached answers of store endpoints (AnswerPool), each with its own copy
   * of the store; 0 (the default here): computed on the server's thread, between connections.
   */
  readonly workers?: number;
}

/** `kindred serve --workers` by default (measured in bench/serve.bench.ts; see README). */
export const DEFAULT_WORKERS = 1;

/** An answer is about 20 KB; the cache is also bounded in bytes (AnswerCache's DEFAULT_CACHE_BYTES). */
export const DEFAULT_CACHE_ENTRIES = 1000;

export interface RunningServer {
  readonly server: http.Server;
  /** e.g. `http://127.0.0.1:8080/` */
  readonly url: string;
  readonly holder: StoreHolder;
  /** The answer workers, when the server has any. */
  readonly pool: AnswerPool | undefined;
  /** Same as POST /api/reload. */
  readonly reload: () => Promise<LoadedStore>;
  /** Stops listening and ends every open connection. */
  readonly close: () => Promise<void>;
}

/**
 * The Kindred HTTP server: the JSON API over a loaded store and the bundled page, on node:http.
 * Loads the store before listening (a bad store fails here, not at the first request).
 */
export async function createServer(options: ServerOptions): Promise<RunningServer> {
  const limits: ServerLimits = { ...DEFAULT_LIMITS, ...options.limits };
  const log = options.log ?? ((line: string) => process.stderr.write(line + '\n'));
  const holder = await StoreHolder.open(options.storeDir, options.loadStore, options.cacheEntries ?? DEFAULT_CACHE_ENTRIES);
  const files = await loadStaticFiles(options.webRoot ?? DEFAULT_WEB_ROOT);
  let hosts: ReadonlySet<string> = new Set();
  /** Uncached answers are computed here, a slice at a time, so that a burst never starves new connections. */
  const turns = new TurnQueue();
  /** An uncached answer on this thread, from the store current when its turn comes. */
  const inThread = (path: string, query: string): Promise<PoolAnswer> =>
    turns.run<PoolAnswer>(() => {
      const endpoint = API_ENDPOINTS.get(path);
      if (!endpoint?.cacheable) throw new RangeError(`${path} is not a store endpoint`);
      const loaded = holder.current;
      const text = storeAnswerText(endpoint, loaded, new URLSearchParams(query));
      return typeof text === 'string' ? { text, generation: loaded.generation } : text.then((t) => ({ text: t, generation: loaded.generation }));
    });
  const workers = options.workers ?? 0;
  const pool = workers > 0 ? await AnswerPool.start(workers, holder.current, holder.dir, inThread, log) : undefined;
  if (pool) holder.attach(pool);

  /**
   * A store endpoint's answer: from the current store's cache, else computed (by a worker or here) and
   * kept only in the cache of the store it was computed from, and only while that store is current.
   */
  async function storeAnswer(path: string, query: string): Promise<JsonText> {
    const key = cacheKey(path, new URLSearchParams(query));
    const hit = holder.current.answers.get(key);
    if (hit !== undefined) return new JsonText(hit);
    const fresh = await (pool ? pool.run(path, query) : inThread(path, query));
    const loaded = holder.current;
    if (loaded.generation === fresh.generation) loaded.answers.set(key, fresh.text);
    return new JsonText(fresh.text);
  }

  const server = http.createServer(
    {
      maxHeaderSize: limits.maxHeaderBytes,
      headersTimeout: limits.headersTimeoutMs,
      requestTimeout: limits.requestTimeoutMs,
      keepAliveTimeout: limits.keepAliveTimeoutMs,
      connectionsCheckingInterval: Math.max(50, Math.min(1000, Math.floor(limits.headersTimeoutMs / 4))),
    },
    (req, res) => {
      handle(req, res).catch((e: unknown) => {
        log(`kindred serve: failed to answer ${req.method ?? '?'} ${req.url ?? '?'}: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
        if (!res.headersSent) res.writeHead(500).end();
        else res.destroy();
      });
    },
  );
  server.maxHeadersCount = 100;
  server.maxConnections = limits.maxConnections;
  server.timeout = limits.idleTimeoutMs;

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    for (const [k, v] of Object.entries(SECURITY_HEADERS)) res.setHeader(k, v);
    const method = req.method ?? 'GET';
    try {
      checkRequestSource(req, hosts);
      const target = req.url ?? '';
      if (!target.startsWith('/')) throw new HttpError(400, 'kindred.http.badPath', 'expected a request path starting with /');
      const q = target.indexOf('?');
      const path = q < 0 ? target : target.slice(0, q);
      const query = new URLSearchParams(q < 0 ? '' : target.slice(q + 1));
      await readBody(req, limits.maxBodyBytes);
      const endpoint: Endpoint | undefined = API_ENDPOINTS.get(path);
      if (endpoint) {
        const allowed: readonly string[] = endpoint.methods;
        const ok = allowed.includes(method) || (method === 'HEAD' && allowed.includes('GET'));
        if (!ok) throw new HttpError(405, 'kindred.http.methodNotAllowed', `${path} takes ${allowed.join(', ')}, not ${method}`, { Allow: allowed.join(', ') });
        if (!endpoint.cacheable) {
          const out = await endpoint.answer({ holder, query, storeAnswer });
          sendJson(res, method, 200, out instanceof JsonText ? out.text : JSON.stringify(out));
          return;
        }
        sendJson(res, method, 200, (await storeAnswer(path, q < 0 ? '' : target.slice(q + 1))).text);
        return;
      }
      if (path.startsWith('/api/')) throw new HttpError(404, 'kindred.http.notFound', `no endpoint ${path}; known: ${[...API_ENDPOINTS.keys()].join(', ')}`);
      if (method !== 'GET' && method !== 'HEAD') throw new HttpError(405, 'kindred.http.methodNotAllowed', `the page takes GET, not ${method}`, { Allow: 'GET, HEAD' });
      if (!files) throw new HttpError(503, 'kindred.http.pageNotBuilt', 'the page is not built: run `npm run build:web` (the JSON API under /api/ works without it)');
      const file = files.get(path);
      if (!file) throw new HttpError(404, 'kindred.http.notFound', `no file ${path}`);
      sendFile(res, method, file);
    } catch (e) {
      const r = errorResponse(e);
      if (r.unexpected) log(`kindred serve: ${method} ${req.url ?? ''}: ${e instanceof Error ? (e.stack ?? e.message) : String(e)}`);
      else if (r.logLine !== undefined) log(`kindred serve: ${method} ${path0(req.url)}: ${r.logLine}`);
      for (const [k, v] of Object.entries(r.headers)) res.setHeader(k, v);
      if (!req.complete) res.setHeader('Connection', 'close');
      sendJson(res, method, r.status, JSON.stringify(r.body));
    }
  }

  try {
    await new Promise<void>((resolve, reject) => {
      const failed = (e: Error): void => reject(listenError(e, options.host ?? '127.0.0.1', options.port ?? 8080));
      server.once('error', failed);
      server.listen(options.port ?? 8080, options.host ?? '127.0.0.1', () => {
        server.off('error', failed);
        resolve();
      });
    });
  } catch (e) {
    await pool?.close();
    throw e;
  }
  const address = server.address();
  if (address === null || typeof address === 'string') throw new RangeError('the server is not listening on a TCP port');
  const host = options.host ?? '127.0.0.1';
  hosts = allowedHosts(host, address.port);
  const urlHost = address.family === 'IPv6' ? `[${address.address}]` : address.address;
  const url = `http://${host === '0.0.0.0' || host === '::' ? '127.0.0.1' : urlHost}:${address.port}/`;

  return {
    server,
    url,
    holder,
    pool,
    reload: () => holder.reload(),
    close: async () => {
      await new Promise<void>((resolve, reject) => {
        server.close((e) => (e ? reject(e) : resolve()));
        server.closeAllConnections();
      });
      await pool?.close();
    },
  };
}

/** Why the server could not listen, in one line (a port in use is the usual case). */
function listenError(e: Error, host: string, port: number): Error {
  const code = 'code' in e ? e.code : undefined;
  const where = `${host.includes(':') ? `[${host}]` : host}:${port}`;
  if (code === 'EADDRINUSE') return new KindredError('kindred.serve.portInUse', `${where} is already in use (another server is listening there): choose another port`, { host, port });
  if (code === 'EACCES') return new KindredError('kindred.serve.listenFailed', `not allowed to listen on ${where} (ports below 1024 need privileges): choose another port`, { host, port });
  if (code === 'EADDRNOTAVAIL' || code === 'ENOTFOUND') return new KindredError('kindred.serve.listenFailed', `cannot listen on ${where}: ${host} is not an address of this machine`, { host, port });
  return e;
}

/** The path of a request target, without its query string (for log lines). */
function path0(target: string | undefined): string {
  const t = target ?? '';
  const q = t.indexOf('?');
  return q < 0 ? t : t.slice(0, q);
}

function sendJson(res: ServerResponse, method: string, status: number, text: string): void {
  res.writeHead(status, {
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(text),
    'Cache-Control': 'no-store',
  });
  res.end(method === 'HEAD' ? undefined : text);
}

function sendFile(res: ServerResponse, method: string, file: StaticFile): void {
  res.writeHead(200, {
    'Content-Type': file.type,
    'Content-Length': file.body.length,
    'Cache-Control': file.immutable ? 'public, max-age=31536000, immutable' : 'no-cache',
  });
  res.end(method === 'HEAD' ? undefined : file.body);
}
