/**
 * A build worker thread (started by IndexBuildPool): builds each HNSW index it is sent with
 * GuardedIndex (same parameters, seed and insertion order as a build in the main thread, so the same
 * bytes) and saves it where the job says, then answers with the job's id.
 */
import { parentPort } from 'node:worker_threads';
import { GuardedIndex } from '../ann/GuardedIndex.ts';
import { KindredError } from '../errors/KindredError.ts';
import { isIndexJob, type IndexJobDone } from './indexJob.ts';

const port = parentPort;
if (port) {
  port.on('message', (job: unknown) => {
    if (!isIndexJob(job)) {
      port.postMessage({ id: -1, error: { code: 'kindred.index.native', message: 'a build worker received a malformed job' } } satisfies IndexJobDone);
      return;
    }
    let done: IndexJobDone;
    try {
      GuardedIndex.build(job.vectors, job.dim, job.params).save(job.path);
      done = { id: job.id, error: null };
    } catch (error) {
      done = {
        id: job.id,
        error: { code: error instanceof KindredError ? error.code : 'kindred.index.native', message: error instanceof Error ? error.message : String(error) },
      };
    }
    port.postMessage(done);
  });
}
