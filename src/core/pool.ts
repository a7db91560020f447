// Shards measured in parallel on worker threads. Each worker builds the same analyzers
// from the main thread's policy and measures whole shards, or batches of a large shard that the main
// thread reads and hands out (so one big shard does not leave the other cores idle);
// results come back in any order and are sorted by path afterwards, and batches are
// absorbed in reading order, so the report is the same whatever the worker count.
// A worker that throws or dies fails the run with the shard it was measuring.
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { ShardRef } from '../read/types.js';
import type { Policy } from '../policy/types.js';
import type { EvaluationSet, SharedCountTables } from './analyzers.js';
import type { BatchResult, DocumentBatch } from '../results/scan.js';
import type { ShardResult } from '../results/types.js';

/** What a worker needs to rebuild the analyzers the main thread has. */
export interface WorkerInit {
  role: 'sluice-shard-worker';
  /**
   * The policy as the main thread built it (plain data), and the evaluation set it read: the
   * worker builds its analyzers from these instead of loading and listing the files again, so
   * every thread measures under the same settings even if the files change meanwhile. In a
   * profile of a two-thread check, loading the policy took 86 ms of the worker's start-up (YAML,
   * the schema check, the ISO 639 tables) and listing the evaluation files 19 ms; a check of a
   * 15-document corpus on 2 workers took 1,020 ms of CPU against 1,090 ms before (medians of 15
   * alternating runs).
   */
  policy: Policy;
  evaluation?: EvaluationSet;
  /** The main thread's settings identity: the worker's must come out the same. */
  settingsId: string;
}

export type ToWorker =
  | { type: 'scan'; id: number; ref: ShardRef }
  | { type: 'batch'; id: number; path: string; batch: DocumentBatch }
  /** Sent first, once a worker is ready: the main thread's tables of token counts, for the worker to fill and read too. */
  | { type: 'share'; tables: SharedCountTables }
  /** To a worker started before the policy was known (see takePrestartedWorker): what to load. */
  | { type: 'init'; init: WorkerInit }
  | { type: 'close' };
export type FromWorker =
  | { type: 'ready'; settingsId: string }
  | { type: 'result'; id: number; result: ShardResult }
  | { type: 'batch-result'; id: number; result: BatchResult }
  | { type: 'progress'; id: number; bytes: number }
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

/** Returns the work a shard is expected to be: the bytes it decompresses to when known, else its size on disk. */
export function workOf(ref: ShardRef): number {
  return ref.textBytesHint ?? ref.sizeBytes;
}

/**
 * Returns the most threads a run measures on: twice the cores. Threads beyond the cores only take
 * turns on them, and each holds its own analyzers (about 70-150 MB with a tokenizer), so a count
 * given by mistake (`--workers 1000`) would exhaust memory rather than finish sooner.
 */
export function maxWorkers(): number {
  return 2 * availableParallelism();
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

type WorkerEvents = { message: (m: FromWorker) => void; error: (e: Error) => void; exit: (code: number) => void };

/**
 * A worker thread started ahead of its use (while the main thread loads the tokenizers and looks up
 * the cache, the worker loads its own), keeping what it says until someone listens.
 */
export interface StartedWorker {
  worker: Worker;
  listen(handlers: WorkerEvents): void;
}

/** Starts a worker from `entry`; its first message (ready, or an error) waits for `listen`. */
export function startWorker(entry: string | URL, init: WorkerInit): StartedWorker {
  const worker = new Worker(typeof entry === 'string' && entry.startsWith('file:') ? new URL(entry) : entry, { workerData: init });
  return holdEvents(worker, []);
}

type WorkerEvent = ['message', FromWorker] | ['error', Error] | ['exit', number];

/** Returns a worker whose events (after `earlier`, ones already seen) wait for `listen`. */
function holdEvents(worker: Worker, earlier: WorkerEvent[]): StartedWorker {
  const held: WorkerEvent[] = [...earlier];
  let handlers: WorkerEvents | undefined;
  const deliver = (event: WorkerEvent): void => {
    if (!handlers) {
      held.push(event);
      return;
    }
    if (event[0] === 'message') handlers.message(event[1]);
    else if (event[0] === 'error') handlers.error(event[1]);
    else handlers.exit(event[1]);
  };
  worker.on('message', (m: FromWorker) => deliver(['message', m]));
  worker.on('error', (e: Error) => deliver(['error', e]));
  worker.on('exit', (code: number) => deliver(['exit', code]));
  return {
    worker,
    listen(h) {
      handlers = h;
      for (const event of held.splice(0)) deliver(event);
    },
  };
}

/**
 * Where the command-line entry (bin/sluice.js) leaves the worker it starts before loading the
 * bundle, for a check or scan that may measure on several threads: the worker then loads its
 * copy of the bundle alongside this thread rather than after it (in a CPU profile of a two-thread
 * full check on the bench corpus, a worker started once the main thread had loaded was ready
 * about 0.8 s into the run, against 0.36 s for a worker started alone). It waits, unreferenced,
 * for an `init` message; the events it gave meanwhile are in `held`.
 */
const PRESTARTED = Symbol.for('sluice.prestarted-worker');
type Prestarted = { worker: Worker; held: WorkerEvent[] };

/** Takes the worker bin/sluice.js started, if it is still there: tells it what to load and returns it. */
export function takePrestartedWorker(init: WorkerInit): StartedWorker | null {
  const slot = globalThis as { [PRESTARTED]?: Prestarted };
  const pre = slot[PRESTARTED];
  if (!pre) return null;
  delete slot[PRESTARTED];
  const { worker, held } = pre;
  for (const kind of ['message', 'error', 'exit'] as const) worker.removeAllListeners(kind);
  const started = holdEvents(worker, held);
  worker.ref();
  worker.postMessage({ type: 'init', init } satisfies ToWorker);
  return started;
}

/** Stops the worker bin/sluice.js started when nothing took it (a run on one thread, or all from the cache). */
export function dropPrestartedWorker(): void {
  const slot = globalThis as { [PRESTARTED]?: Prestarted };
  const pre = slot[PRESTARTED];
  if (!pre) return;
  delete slot[PRESTARTED];
  void pre.worker.terminate();
}

/** The shards of a pooled run: measured whole by one thread each, or read here and measured in batches by all. */
export interface PoolWork {
  whole: readonly ShardRef[];
  split: readonly ShardRef[];
  /** Read here and measured in batches by all once every whole shard has been taken, so that threads end together (see tailShards in check.ts). */
  tail?: readonly ShardRef[];
}

/** How the main thread takes part: it measures whole shards and batches like a worker, and reads the split shards. */
export interface HereMeasurer {
  shard(ref: ShardRef): Promise<ShardResult>;
  /** Told the bytes a worker has read so far of the whole shard it is measuring. */
  reading?(path: string, bytes: number): void;
  batch(ref: ShardRef, batch: DocumentBatch): BatchResult;
  /** Reads a split shard here, handing each batch to `measure` (which settles when some thread has measured it). */
  split(ref: ShardRef, measure: (batch: DocumentBatch) => Promise<BatchResult>): Promise<ShardResult>;
}

type ShardTask = { kind: 'shard'; ref: ShardRef; id: number };
type BatchTask = { kind: 'batch'; ref: ShardRef; batch: DocumentBatch; resolve: (r: BatchResult) => void; reject: (e: Error) => void };
type Task = ShardTask | BatchTask;

/** Returns the buffers of a batch result that can move to another thread instead of being copied. */
export function transferablesOf(r: BatchResult): ArrayBuffer[] {
  const d = r.duplicates;
  return d ? [d.exact.buffer as ArrayBuffer, d.signatures.buffer as ArrayBuffer, d.stream.buffer as ArrayBuffer] : [];
}

/**
 * Measures shards on `workers` threads (this one included) started from `entry`, or taken from `started`
 * (workers started earlier; those not needed are stopped); calls `onResult` as each shard finishes.
 * Every worker is handed `shared` (this thread's token-count tables) before its first task.
 * Rejects with ShardFailure, naming the shard, on the first failure.
 */
export async function measureInPool(
  work: PoolWork,
  init: WorkerInit,
  entry: string | URL,
  workers: number,
  onResult: (r: ShardResult) => void,
  here: HereMeasurer,
  started: StartedWorker[] = [],
  shared: SharedCountTables = {},
): Promise<void> {
  // Largest shards first (by the text they hold: repetitive text compresses far better than other
  // text, so size on disk misleads): the last shard to finish is then a small one, so workers end together.
  const shardQueue: ShardTask[] = work.whole
    .map((ref, id) => ({ kind: 'shard' as const, ref, id }))
    .sort((a, b) => workOf(b.ref) - workOf(a.ref) || a.id - b.id);
  const batchQueue: BatchTask[] = [];
  const tail = work.tail ?? [];
  let producing = work.split.length > 0 || tail.length > 0;
  const threads = Math.max(1, Math.min(workers, shardQueue.length + (producing ? workers : 0)));
  // Called once every whole shard has been handed out (or the run failed): the tail is read then.
  let onWholeTaken: Array<() => void> = [];
  const wholeTaken = (): Promise<void> =>
    shardQueue.length === 0 || failed ? Promise.resolve() : new Promise((resolve) => onWholeTaken.push(resolve));
  const tellWholeTaken = (): void => {
    const w = onWholeTaken;
    onWholeTaken = [];
    for (const f of w) f();
  };
  let failed: ShardFailure | undefined;
  let nextId = shardQueue.length;
  // Threads with nothing to take yet, woken when a batch comes, reading ends or the run fails.
  let waiters: Array<() => void> = [];
  const wake = (): void => {
    const w = waiters;
    waiters = [];
    for (const f of w) f();
  };
  const fail = (err: ShardFailure): ShardFailure => {
    failed ??= err;
    for (const t of batchQueue.splice(0)) t.reject(failed);
    wake();
    tellWholeTaken();
    return failed;
  };
  /**
   * Returns the next task for a thread, 'wait' when batches may still come, or null when all is handed out.
   * Batches go first (they hold text in memory). While it is still reading, the main thread takes a batch
   * only when two per worker are left queued: it reads nothing while it measures, and the workers must
   * not run dry meanwhile.
   */
  const take = (main: boolean): Task | 'wait' | null => {
    if (failed) return null;
    if (batchQueue.length > 0 && (!main || !producing || batchQueue.length > 2 * (threads - 1))) return batchQueue.shift()!;
    if (shardQueue.length > 0) {
      const task = shardQueue.shift()!;
      if (shardQueue.length === 0) tellWholeTaken();
      return task;
    }
    return producing || batchQueue.length > 0 ? 'wait' : null;
  };
  const all: Promise<void>[] = [];

  // The reader of split shards, one at a time, largest first; then of the tail, once the whole shards are all taken.
  if (producing) {
    all.push(
      (async () => {
        const largestFirst = (refs: readonly ShardRef[]): ShardRef[] => [...refs].sort((a, b) => workOf(b) - workOf(a) || (a.path < b.path ? -1 : 1));
        const split = largestFirst(work.split);
        try {
          for (const [i, ref] of [...split, ...largestFirst(tail)].entries()) {
            if (i === split.length) await wholeTaken();
            if (failed) break;
            let result: ShardResult;
            try {
              result = await here.split(
                ref,
                (batch) =>
                  new Promise<BatchResult>((resolve, reject) => {
                    if (failed) return reject(failed);
                    batchQueue.push({ kind: 'batch', ref, batch, resolve, reject });
                    wake();
                  }),
              );
            } catch (err) {
              throw fail(err instanceof ShardFailure ? err : new ShardFailure(ref.path, `measuring failed: ${(err as Error).message}`));
            }
            onResult(result);
          }
        } finally {
          producing = false;
          wake();
        }
      })(),
    );
  }

  // This thread takes tasks from the same queues as the workers.
  all.push(
    (async () => {
      for (;;) {
        const task = take(true);
        if (task === null) return;
        if (task === 'wait') {
          await new Promise<void>((r) => waiters.push(r));
          continue;
        }
        try {
          if (task.kind === 'shard') onResult(await here.shard(task.ref));
          else task.resolve(here.batch(task.ref, task.batch));
        } catch (err) {
          const failure = fail(new ShardFailure(task.ref.path, `measuring failed: ${(err as Error).message}`));
          if (task.kind === 'batch') task.reject(failure);
          throw failure;
        }
        // Let the workers' messages and the reader in between tasks.
        await new Promise((r) => setImmediate(r));
      }
    })(),
  );

  const spare = started.splice(0);
  for (const unused of spare.splice(Math.max(0, threads - 1))) void unused.worker.terminate();
  for (let w = 1; w < threads; w++) {
    const thread = spare.shift() ?? takePrestartedWorker(init) ?? startWorker(entry, init);
    all.push(
      new Promise<void>((resolve, reject) => {
        const worker = thread.worker;
        // Tasks sent and not yet answered, oldest first (a worker answers in order). A worker busy with a
        // batch gets the next batch ahead, so it need not wait for this thread to read its answer, which
        // waits while this thread measures a batch of its own.
        const current: Task[] = [];
        let done = false;
        let ready = false;
        const finish = (err?: ShardFailure): void => {
          if (done) return;
          done = true;
          void worker.terminate();
          if (err) {
            const failure = fail(err);
            for (const t of current.splice(0)) if (t.kind === 'batch') t.reject(failure);
            reject(failure);
          } else resolve();
        };
        const where = (): string => current[0]?.ref.path ?? '(starting a worker)';
        const send = (task: Task): void => {
          current.push(task);
          if (task.kind === 'batch') {
            worker.postMessage({ type: 'batch', id: nextId++, path: task.ref.path, batch: task.batch } satisfies ToWorker);
            return;
          }
          // Only plain data crosses threads (a ref that reads from elsewhere, with open(), is never pooled).
          const { open: _open, ...ref } = task.ref;
          worker.postMessage({ type: 'scan', id: task.id, ref } satisfies ToWorker);
        };
        const next = (): void => {
          if (done || !ready) return;
          if (current.length === 0) {
            const task = take(false);
            if (task === 'wait') {
              waiters.push(next);
              return;
            }
            if (task === null) {
              worker.postMessage({ type: 'close' } satisfies ToWorker);
              return finish();
            }
            send(task);
          }
          // One batch ahead, never a whole shard (that would undo the largest-first order).
          if (current.length === 1 && current[0]!.kind === 'batch' && batchQueue.length > 0 && !failed) send(batchQueue.shift()!);
        };
        const message = (msg: FromWorker): void => {
          if (msg.type === 'ready') {
            if (msg.settingsId !== init.settingsId) return finish(new ShardFailure(where(), `worker measured under other settings (${msg.settingsId} ≠ ${init.settingsId})`));
            ready = true;
            if (shared.main || shared.baseline) worker.postMessage({ type: 'share', tables: shared } satisfies ToWorker);
            return next();
          }
          const answered = current[0];
          if (msg.type === 'progress') {
            if (answered?.kind === 'shard') here.reading?.(answered.ref.path, msg.bytes);
            return;
          }
          if (msg.type === 'result' && answered?.kind === 'shard') {
            current.shift();
            onResult(msg.result);
            return next();
          }
          if (msg.type === 'batch-result' && answered?.kind === 'batch') {
            current.shift();
            answered.resolve(msg.result);
            return next();
          }
          const what = msg.type === 'error' ? msg.message : `unexpected ${msg.type} message`;
          finish(new ShardFailure(where(), `measuring failed in a worker: ${what}`));
        };
        thread.listen({
          message,
          error: (err) => finish(new ShardFailure(where(), `worker crashed: ${err.message}`)),
          exit: (code) => {
            if (!done) finish(new ShardFailure(where(), `worker exited with code ${code} before finishing`));
          },
        });
      }),
    );
  }
  const settled = await Promise.allSettled(all);
  if (failed) throw failed;
  const rejected = settled.find((s): s is PromiseRejectedResult => s.status === 'rejected');
  if (rejected) throw rejected.reason;
}
