/**
 * An answer worker (a worker thread of the answer pool, AnswerPool): opens each store build the server
 * asks for from the store folder, lazily as the server does (the players now, a group when first
 * asked for), and answers store endpoints from the build each request names, with the same code as
 * the server's own thread (storeAnswerText). A build whose manifest is not the one the server opened
 * (the folder was rebuilt in between) is refused, so a worker never answers from another build.
 */
import { parentPort } from 'node:worker_threads';
import { KindredError, StoreError } from '../../errors/KindredError.ts';
import { API_ENDPOINTS } from '../apiEndpoints.ts';
import { errorResponse } from '../errorResponse.ts';
import { LoadedStore } from '../LoadedStore.ts';
import { loadServedStore } from '../loadServedStore.ts';
import { storeAnswerText } from '../storeAnswerText.ts';
import type { FromWorker, OpenFailure, PoolStore, ToWorker, WorkerFailure } from './poolMessages.ts';

const port = parentPort;
if (!port) throw new Error('answerWorker.ts runs only as a worker thread (see AnswerPool)');

/** The builds this worker has open, by generation. */
const stores = new Map<number, LoadedStore>();
/** The build opened last: its unchanged groups are taken over by the next open. */
let latest: LoadedStore | undefined;

const send = (m: FromWorker): void => port.postMessage(m);

function failureOf(e: unknown): WorkerFailure {
  return { response: errorResponse(e), detail: e instanceof Error ? (e.stack ?? e.message) : String(e) };
}

function openFailureOf(e: unknown): OpenFailure {
  if (e instanceof KindredError) return { code: e.code, message: e.message, context: e.context };
  return { code: null, message: e instanceof Error ? (e.stack ?? e.message) : String(e), context: {} };
}

async function open(store: PoolStore): Promise<void> {
  const served = await loadServedStore(store.dir, latest?.store);
  if (JSON.stringify(served.store.opened.manifest) !== store.manifest) {
    throw new StoreError('kindred.store.corrupt', `${store.dir} changed between the server's open and an answer thread's; try the reload again when the build is done`, { dir: store.dir });
  }
  const loaded = new LoadedStore(served, store.generation, 0, new Date(store.loadedAt));
  stores.set(store.generation, loaded);
  latest = loaded;
}

async function answer(id: number, generation: number, path: string, query: string): Promise<void> {
  const endpoint = API_ENDPOINTS.get(path);
  const loaded = stores.get(generation);
  if (!endpoint?.cacheable) throw new RangeError(`${path} is not answered by the answer pool`);
  if (!loaded) throw new RangeError(`this answer thread has no store of generation ${generation}`);
  send({ type: 'answered', id, text: await storeAnswerText(endpoint, loaded, new URLSearchParams(query)) });
}

port.on('message', (m: ToWorker) => {
  switch (m.type) {
    case 'open':
      open(m.store).then(
        () => send({ type: 'opened', generation: m.store.generation }),
        (e: unknown) => send({ type: 'openFailed', generation: m.store.generation, failure: openFailureOf(e) }),
      );
      return;
    case 'retire':
      stores.delete(m.generation);
      return;
    case 'answer':
      answer(m.id, m.generation, m.path, m.query).catch((e: unknown) => send({ type: 'failed', id: m.id, failure: failureOf(e) }));
      return;
  }
});
