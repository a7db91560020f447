// The worker side of the pool: build the policy's analyzers once, from the policy and
// evaluation set the main thread sends, then measure
// each shard, or batch of a shard's documents, the main thread sends. Started from the same bundle as the front end.
import { parentPort, workerData, isMainThread } from 'node:worker_threads';
import { measureBatch, scanShard } from '../results/scan.js';
import { prepareAnalyzers } from './analyzers.js';
import { throwIfFaultInjected, transferablesOf, type FromWorker, type ToWorker, type WorkerInit } from './pool.js';

/** A worker measuring a whole shard tells the main thread how far it has read every this many bytes. */
const PROGRESS_STEP_BYTES = 8 * 1024 * 1024;

/** Returns whether this thread was started by the pool (the front end then runs `runShardWorker` instead of its main). */
export function isShardWorker(): boolean {
  return !isMainThread && (workerData as WorkerInit | undefined)?.role === 'sluice-shard-worker';
}

/** Returns this worker's init: its workerData, or for a worker started before the policy was known (bin/sluice.js), the `init` message it waits for. */
async function initOf(port: NonNullable<typeof parentPort>): Promise<WorkerInit> {
  const given = workerData as WorkerInit | { role: 'sluice-shard-worker'; pending: true };
  if (!('pending' in given)) return given;
  return new Promise((resolve) => {
    const first = (msg: ToWorker): void => {
      if (msg.type !== 'init') return; // nothing else is sent before it
      port.off('message', first);
      resolve(msg.init);
    };
    port.on('message', first);
  });
}

/** Serves scan requests until told to close. */
export async function runShardWorker(): Promise<void> {
  const port = parentPort!;
  const init = await initOf(port);
  const post = (m: FromWorker): void => port.postMessage(m);
  try {
    const prepared = await prepareAnalyzers(init.policy, init.evaluation ? { evaluation: init.evaluation } : {});
    port.on('message', (msg: ToWorker) => {
      if (msg.type === 'close') {
        port.close();
        return;
      }
      if (msg.type === 'share') {
        prepared.adoptCounts(msg.tables);
        return;
      }
      if (msg.type === 'init') return; // taken by initOf; never sent twice
      if (msg.type === 'batch') {
        try {
          throwIfFaultInjected(msg.path);
          const result = measureBatch(msg.batch, prepared.scan, prepared.analyzers);
          port.postMessage({ type: 'batch-result', id: msg.id, result } satisfies FromWorker, transferablesOf(result));
        } catch (err) {
          post({ type: 'error', id: msg.id, message: (err as Error).message });
        }
        return;
      }
      void (async () => {
        try {
          throwIfFaultInjected(msg.ref.path);
          let told = 0;
          const result = await scanShard(msg.ref, prepared.scan, prepared.analyzers, (bytes) => {
            if (bytes - told < PROGRESS_STEP_BYTES) return;
            told = bytes;
            post({ type: 'progress', id: msg.id, bytes });
          });
          post({ type: 'result', id: msg.id, result });
        } catch (err) {
          post({ type: 'error', id: msg.id, message: (err as Error).message });
        }
      })();
    });
    post({ type: 'ready', settingsId: prepared.settingsId });
    // The main thread sends the tokenizer tables and the first task once it has built its own
    // tables: in a profile of a two-thread check, about 110 ms after this, which the worker spent
    // idle before building its own tables at its first document. Build them meanwhile (40 MB bench
    // corpus on 2 workers: 1,919 ms against 1,963 ms wall, medians of 12 alternating runs). A
    // failure here would recur on that document, where it names the shard.
    try {
      prepared.warmUp();
    } catch {
      // measured again, and reported, with the first shard
    }
  } catch (err) {
    post({ type: 'error', id: null, message: (err as Error).message });
  }
}
