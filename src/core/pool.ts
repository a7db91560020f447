// Shards measured in parallel on worker threads. Each worker loads the same policy
// and analyzers and measures whole shards; results come back in any order and are
// sorted by path afterwards, so the report is the same whatever the worker count.
// A worker that throws or dies fails the run with the shard it was measuring.
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { ShardRef } from '../read/types.js';
import type { ShardResult } from '../results/types.js';

/** What a worker needs to rebuild the analyzers the main thread has. */
export interface WorkerInit {
  role: 'sluice-shard-worker';
  policyFile: string;
  root?: string;
  settingsId: string;
}

export type ToWorker = { type: 'scan'; id: number; ref: ShardRef } | { type: 'close' };
export type FromWorker =
  | { type: 'ready'; settingsId: string }
  | { type: 'result'; id: number; result: ShardResult }
  | { type: 'error'; id: number | null; message: string };

/** A shard that could not be measured: the run fails with its path. */
export class ShardFailure extends Error {
  override name = 'ShardFailure';
  constructor(
    readonly shard: string,
    message: string,
  ) {
    super(`${shard}: ${message}`);
  }
}

/** Throws when the tests of failure during a pooled run name this shard (SLUICE_FAULT_SHARD), wherever it is measured. */
export function throwIfFaultInjected(path: string): void {
  if (process.env.SLUICE_FAULT_SHARD && path === process.env.SLUICE_FAULT_SHARD) throw new Error('injected fault (SLUICE_FAULT_SHARD)');
}

/** Returns the default worker count: the cores this process may use. */
export function defaultWorkers(): number {
  return availableParallelism();
}

/** Returns whether a script can be started as a worker (a built bundle, not TypeScript source). */
export function canRunWorkers(entry: string | URL | undefined): entry is string | URL {
  if (!entry) return false;
  const path = typeof entry === 'string' && !entry.startsWith('file:') ? entry : fileURLToPath(entry);
  return path.endsWith('.js') && existsSync(path);
}

/** Measures shards on `workers` threads started from `entry`; calls `onResult` as each finishes. Rejects with ShardFailure on the first failure. */
export async function measureInPool(
  refs: readonly ShardRef[],
  init: WorkerInit,
  entry: string | URL,
  workers: number,
  onResult: (r: ShardResult) => void,
  /** Measures a shard in this thread: the main thread then takes shards from the same queue, so `workers` threads do the work with one fewer start-up and heap. */
  here?: (ref: ShardRef) => Promise<ShardResult>,
): Promise<void> {
  // Largest shards first: the last shard to finish is then a small one, so workers end together.
  const queue = refs.map((ref, id) => ({ ref, id })).sort((a, b) => b.ref.sizeBytes - a.ref.sizeBytes || a.id - b.id);
  const count = Math.max(1, Math.min(workers, queue.length));
  let failed: ShardFailure | undefined;
  const all: Promise<void>[] = [];
  if (here) {
    all.push(
      (async () => {
        for (let item = queue.shift(); item && !failed; item = queue.shift()) {
          try {
            onResult(await here(item.ref));
          } catch (err) {
            failed ??= new ShardFailure(item.ref.path, `measuring failed: ${(err as Error).message}`);
            throw failed;
          }
          // Let the workers' messages in between shards.
          await new Promise((r) => setImmediate(r));
        }
      })(),
    );
  }
  for (let w = here ? 1 : 0; w < count; w++) {
    all.push(
      new Promise<void>((resolve, reject) => {
        const worker = new Worker(typeof entry === 'string' && entry.startsWith('file:') ? new URL(entry) : entry, { workerData: init });
        let current: { ref: ShardRef; id: number } | undefined;
        let done = false;
        const finish = (err?: Error): void => {
          if (done) return;
          done = true;
          void worker.terminate();
          if (err) {
            failed ??= err instanceof ShardFailure ? err : new ShardFailure(current?.ref.path ?? '(starting a worker)', err.message);
            reject(failed);
          } else resolve();
        };
        const next = (): void => {
          if (failed) return finish();
          current = queue.shift();
          if (!current) {
            worker.postMessage({ type: 'close' } satisfies ToWorker);
            return finish();
          }
          // Only plain data crosses threads: a ref that reads from elsewhere (open()) is measured in the main thread instead.
          const { open: _open, ...ref } = current.ref;
          worker.postMessage({ type: 'scan', id: current.id, ref } satisfies ToWorker);
        };
        worker.on('message', (msg: FromWorker) => {
          if (msg.type === 'ready') {
            if (msg.settingsId !== init.settingsId) return finish(new Error(`worker measured under other settings (${msg.settingsId} ≠ ${init.settingsId})`));
            return next();
          }
          if (msg.type === 'result') {
            onResult(msg.result);
            return next();
          }
          finish(new ShardFailure(current?.ref.path ?? '(starting a worker)', `measuring failed in a worker: ${msg.message}`));
        });
        worker.on('error', (err) => finish(new ShardFailure(current?.ref.path ?? '(starting a worker)', `worker crashed: ${err.message}`)));
        worker.on('exit', (code) => {
          if (!done) finish(new ShardFailure(current?.ref.path ?? '(starting a worker)', `worker exited with code ${code} before finishing`));
        });
      }),
    );
  }
  const settled = await Promise.allSettled(all);
  if (failed) throw failed;
  const rejected = settled.find((s): s is PromiseRejectedResult => s.status === 'rejected');
  if (rejected) throw rejected.reason;
}
