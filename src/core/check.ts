// The core both front ends call: policy file in, report out. It wires the
// stages together (policy → read → measure → results → judge) and does the I/O
// at the edges; every figure is computed inside the stages.
import { buildReport } from '../judge/report.js';
import type { Report } from '../judge/types.js';
import { formatPolicyKeyProblem, formatProblem, loadPolicy } from '../policy/index.js';
import type { Policy } from '../policy/types.js';
import { discoverShards, textSizeHint } from '../read/index.js';
import type { Discovery, ShardRef, SkippedFile } from '../read/types.js';
import { ResultCache } from '../results/cache.js';
import type { CorpusResult } from '../results/corpus.js';
import { contentIdOf, measureBatch, scanShard, scanShardInBatches, type BatchPlan } from '../results/scan.js';
import { mergeShardResults } from '../results/tally.js';
import type { ShardResult } from '../results/types.js';
import { AnalyzerSetupError, prepareAnalyzers, readEvaluation, type EvaluationSet, type PreparedAnalyzers } from './analyzers.js';
import { existsSync, opendirSync, realpathSync } from 'node:fs';
import path from 'node:path';
import {
  canRunWorkers,
  defaultWorkers,
  maxWorkers,
  dropPrestartedWorker,
  measureInPool,
  startWorker,
  takePrestartedWorker,
  throwIfFaultInjected,
  workOf,
  type StartedWorker,
  type WorkerInit,
} from './pool.js';

/** Cache look-ups in flight at once: enough to hide file-system latency, few enough to keep memory flat. */
const CACHE_LOOKUPS_AT_ONCE = 16;

/**
 * Compressed bytes of unmeasured shards that justify one more worker thread by default: about 8 MB
 * of text. Chosen when that was over a second of measuring, against a worker's start (about 0.3 s,
 * overlapped with the main thread's own loading) and its cold token cache; since the measure
 * stage's WebAssembly kernels it is about half a second, and a thread's start measured 0.5 s of CPU
 * (docs/benchmark.md, fifth session), so on a shared 2-core machine two threads on the 9 MB bench
 * corpus gave 0.92-1.22x one. Left as it is: on a machine whose cores do not slow each other down
 * the second thread still pays, and a demo-sized corpus stays on one thread.
 */
const WORK_PER_WORKER_BYTES = 2 * 1024 * 1024;

/**
 * A shard holding less text than this is never split into batches: handing its text across threads
 * would cost more than its tail. Measured on the 40 MB bench corpus (2 workers; means of 3 rounds
 * alternating the cases): splitting its largest shards (over a quarter of a worker's share) took the
 * full check from 1.37× to 1.48× one worker, so the share rule does the choosing and this floor stays low.
 */
const MIN_SPLIT_BYTES = 4 * 1024 * 1024;

/**
 * Batches of a split shard: about 256 K characters of text each (some 50 ms of measuring: long enough
 * that handing one over is a small cost, short enough that the main thread, which reads nothing while it
 * measures one, leaves the workers waiting little), and at most eight per thread out at once, so the
 * reader holds a few MB of text whatever the shard's size.
 */
const BATCH_CHARS = 1 << 18;
const BATCHES_IN_FLIGHT_PER_THREAD = 8;

/**
 * Returns the shards worth splitting across `workers` threads: those larger than a quarter of a
 * thread's fair share, whose tail would otherwise leave the other threads idle (one 50 GB shard
 * among small ones, say). What is split changes the time a run takes, never its results.
 */
export function shardsToSplit(shards: readonly ShardRef[], workers: number, minBytes = MIN_SPLIT_BYTES): Set<ShardRef> {
  if (workers <= 1) return new Set();
  const total = shards.reduce((n, r) => n + workOf(r), 0);
  const limit = Math.max(minBytes, total / (workers * 4));
  return new Set(shards.filter((r) => workOf(r) >= limit));
}

/**
 * Returns the shards, of those a pooled run measures whole, to measure last and in batches shared by
 * all threads: the `workers` smallest. Threads finish their last whole shards up to one shard's
 * measuring apart, and a thread with no whole shard left would wait for the others; batches of the
 * tail fill that wait, so the threads end within a batch of each other. (In a CPU profile of a
 * two-thread full check on the bench corpus, 11 shards of 3–5 MB of text, the main thread waited a
 * quarter of a second for the worker's last shard before joining.)
 */
export function tailShards(whole: readonly ShardRef[], workers: number): Set<ShardRef> {
  if (workers <= 1) return new Set();
  const smallestFirst = [...whole].sort((a, b) => workOf(a) - workOf(b) || (a.path < b.path ? -1 : 1));
  return new Set(smallestFirst.slice(0, workers));
}

/** Returns `fn` of every item, in the items' order, with at most `limit` calls in flight (small file reads: overlapped, memory flat). */
async function mapAtMost<T, R>(items: readonly T[], limit: number, fn: (item: T) => Promise<R>): Promise<R[]> {
  const out: R[] = new Array(items.length);
  let next = 0;
  const run = async (): Promise<void> => {
    for (let i = next++; i < items.length; i = next++) out[i] = await fn(items[i]!);
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, run));
  return out;
}

/** Returns the shards with the text each holds estimated from its own metadata (a few bytes read per shard), to share out work. */
function withTextHints(refs: readonly ShardRef[]): Promise<ShardRef[]> {
  return mapAtMost(refs, CACHE_LOOKUPS_AT_ONCE, async (ref) => ({ ...ref, textBytesHint: await textSizeHint(ref) }));
}

/** A run that cannot be judged (bad policy, no shards, unreadable root): exit code 2. */
export class ConfigError extends Error {
  override name = 'ConfigError';
}

export interface Progress {
  policy: string;
  shardsDone: number;
  shards: number;
  /** Uncompressed bytes read so far. */
  bytes: number;
  elapsedMs: number;
}

export interface CheckOptions {
  /** Policy files to judge, each on its own. */
  policies: string[];
  /** Directory of cached shard results, or null for none. */
  cacheDir: string | null;
  /** Override the policy root (mainly for tests and the Action's base tree). */
  root?: string;
  onProgress?: (p: Progress) => void;
  /** Called with each policy's warnings (dubious but valid settings). */
  onWarning?: (message: string) => void;
  /** Where relative paths in the report are relative to. */
  cwd?: string;
  /** Returns the content half of a shard's cache key without measuring it (default: sha256 of its raw bytes; the Action uses git blob ids). */
  contentKey?: (ref: ShardRef) => Promise<string>;
  /** Shards taken as new: duplicates they add against the other shards are reported separately. */
  newShards?: string[];
  /** Files the caller will write when the run ends (reports, a partial result): a run whose shards include one of them stops before reading, rather than overwrite a shard. */
  outputs?: readonly { option: string; file: string }[];
  /** Threads measuring shards (default: one per WORK_PER_WORKER_BYTES of compressed shards to measure, up to the available cores); 1 measures in this thread. */
  workers?: number;
  /** The built script workers start from (the front end's own bundle, import.meta.url); without one, shards are measured in this thread. */
  workerEntry?: string | URL;
  /** Shards holding at least this many bytes of text (decompressed) may be split into batches across the workers (default 4 MiB; the tests lower it). */
  minSplitBytes?: number;
}

/** Returns the loaded policy, or throws ConfigError listing every problem with file, line and key. */
export async function loadPolicyOrThrow(file: string, root?: string, onWarning?: (m: string) => void): Promise<Policy> {
  const loaded = await loadPolicy(file, root !== undefined ? { root } : undefined);
  if (!loaded.ok) {
    throw new ConfigError(loaded.problems.map(formatProblem).join('\n'));
  }
  for (const w of loaded.warnings) onWarning?.(formatProblem(w));
  return loaded.policy;
}

/** Returns the shards a policy names, or throws ConfigError when the root cannot be read or nothing matched. */
export async function discoverOrThrow(policy: Policy): Promise<Discovery> {
  let discovery;
  try {
    discovery = await discoverShards(policy.root, policy.corpus);
  } catch (err) {
    // The message names its key (corpus.subset, corpus.encodings) or the root it could not list.
    throw new ConfigError(`${policy.file}: ${(err as Error).message}`);
  }
  if (discovery.shards.length === 0) throw noShards(policy, discovery.skipped);
  return discovery;
}

function noShards(policy: Policy, skipped: readonly SkippedFile[]): ConfigError {
  return new ConfigError(
    formatPolicyKeyProblem(
      policy,
      'corpus.include',
      `no shards matched (${policy.corpus.include.join(', ')}) under ${policy.root}` +
        (skipped.length ? `; ${skipped.length === 1 ? '1 path matched but was' : `${skipped.length} paths matched but were`} skipped, e.g. ${skipped[0]!.path} (${skipped[0]!.reason})` : ''),
    ),
  );
}

/** Runs a step of setting analyzers up; a setting that cannot be used (AnalyzerSetupError) becomes a ConfigError. */
async function setupOrThrow<T>(step: () => Promise<T>): Promise<T> {
  try {
    return await step();
  } catch (err) {
    if (err instanceof AnalyzerSetupError) throw new ConfigError(err.message);
    throw err;
  }
}

/** Returns the analyzers of a policy, or throws ConfigError when a tokenizer or evaluation file cannot be used. */
export async function prepareOrThrow(policy: Policy, evaluation?: EvaluationSet): Promise<PreparedAnalyzers> {
  return setupOrThrow(() => prepareAnalyzers(policy, { deferTokenizerData: true, ...(evaluation ? { evaluation } : {}) }));
}

/**
 * Returns the measured corpus of one policy: every shard's result, cached by content where possible.
 * A caller that measures the same policy twice (the Action's head and base) passes the discovery
 * and the prepared analyzers in, so neither the tree walk nor the tokenizer load is repeated.
 */
export async function measureCorpus(
  policy: Policy,
  opts: CheckOptions,
  given: { discovery?: Discovery; prepared?: PreparedAnalyzers } = {},
): Promise<CorpusResult> {
  const started = performance.now();
  const discovery = given.discovery ?? (await discoverOrThrow(policy));
  if (discovery.shards.length === 0) throw noShards(policy, discovery.skipped);
  refuseOutputsAmongShards(discovery.shards, opts.outputs);
  // Workers load the bundle and build their analyzers themselves (about half a second each): when
  // the run will need them and no cache can spare the work, they start now, alongside this
  // thread's own loading, with the policy and the evaluation set this thread has read.
  const early: StartedWorker[] = [];
  const entry = opts.workerEntry;
  let evaluation: EvaluationSet | undefined;
  if (!given.prepared && canRunWorkers(entry) && !(opts.cacheDir !== null && holdsAnything(opts.cacheDir))) {
    const threads = threadsFor(discovery.shards, opts);
    if (threads > 1) {
      evaluation = await setupOrThrow(() => readEvaluation(policy));
      const init = workerInitOf(policy, 'not yet known', evaluation);
      for (let w = 1; w < threads; w++) early.push(takePrestartedWorker(init) ?? startWorker(entry, init));
    }
  }
  try {
    const prepared = given.prepared ?? (await prepareOrThrow(policy, evaluation));
    const { results, cached } = await measureShards(policy, discovery.shards, prepared, opts, started, early);
    return await assembleCorpus(policy, prepared, results, cached, discovery.skipped, opts.newShards, started);
  } finally {
    for (const w of early) void w.worker.terminate();
  }
}

/** Throws ConfigError when an output file the caller will write is one of the shards (by resolved path). */
export function refuseOutputsAmongShards(shards: readonly ShardRef[], outputs: CheckOptions['outputs']): void {
  if (!outputs?.length) return;
  const real = (p: string): string => {
    try {
      return realpathSync(p);
    } catch {
      return path.resolve(p);
    }
  };
  const byPath = new Map(shards.map((s) => [real(s.absPath), s.path]));
  for (const { option, file } of outputs) {
    const shard = byPath.get(real(file));
    if (shard !== undefined) throw new ConfigError(`${option} ${file}: is the shard ${shard}; the report would overwrite it`);
  }
}

/** Returns whether a directory exists and has an entry (one is read, however many it holds). */
function holdsAnything(dir: string): boolean {
  if (!existsSync(dir)) return false;
  try {
    const d = opendirSync(dir);
    try {
      return d.readSync() !== null;
    } finally {
      d.closeSync();
    }
  } catch {
    return true; // unreadable: the cache will say why; start no workers on a guess
  }
}

/** Returns what a worker needs to rebuild this policy's analyzers. */
function workerInitOf(policy: Policy, settingsId: string, evaluation: EvaluationSet | undefined): WorkerInit {
  const init: WorkerInit = { role: 'sluice-shard-worker', policy, settingsId };
  if (evaluation) init.evaluation = evaluation;
  return init;
}

/**
 * Returns the threads that measure these (poolable) shards: the --workers count, or by default one per
 * WORK_PER_WORKER_BYTES on disk up to the cores (each worker loads the
 * tokenizers); 1 when there is nothing to spread (a single shard too small to split).
 */
function threadsFor(shards: readonly ShardRef[], opts: CheckOptions): number {
  const diskBytes = shards.reduce((n, r) => n + r.sizeBytes, 0);
  const workers = opts.workers !== undefined ? Math.min(opts.workers, maxWorkers()) : Math.min(defaultWorkers(), Math.max(1, Math.floor(diskBytes / WORK_PER_WORKER_BYTES)));
  if (workers <= 1) return 1;
  // One shard is worth spreading only in batches: when it is large, or when only this thread can open it anyway.
  return shards.length > 1 || shards.some((r) => r.open !== undefined) || shardsToSplit(shards, workers, opts.minSplitBytes).size > 0 ? workers : 1;
}

/** Returns the corpus result of measured shards: sorted, summed, with the cross-shard figures added. */
export async function assembleCorpus(
  policy: Policy,
  prepared: PreparedAnalyzers,
  results: ShardResult[],
  cached: Set<string>,
  skipped: SkippedFile[],
  newShards: string[] | undefined,
  started: number,
): Promise<CorpusResult> {
  results.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const corpus: CorpusResult = {
    shards: results,
    cached,
    skipped,
    tally: mergeShardResults(results, policy.languages.map((l) => l.key)),
    elapsedMs: 0,
  };
  await prepared.finish(corpus, newShards);
  corpus.elapsedMs = Math.round(performance.now() - started);
  return corpus;
}

/** Returns every shard's result: from the cache where the content was measured before, else measured (on worker threads when there are several shards to do). */
export async function measureShards(
  policy: Policy,
  shards: readonly ShardRef[],
  prepared: PreparedAnalyzers,
  opts: CheckOptions,
  started = performance.now(),
  /** Workers started earlier for this run (taken when the pool needs them; the caller stops any left). */
  early: StartedWorker[] = [],
): Promise<{ results: ShardResult[]; cached: Set<string> }> {
  const cache = opts.cacheDir ? new ResultCache(opts.cacheDir, prepared.analyzers.duplicates !== undefined) : null;
  const results: ShardResult[] = [];
  const cached = new Set<string>();
  const keys = new Map<string, string>();
  let bytes = 0;
  // Bytes read so far of shards not finished yet (here, in batches or in a worker): a long shard shows progress before it ends.
  const reading = new Map<string, number>();
  const report = (): void => {
    let inFlight = 0;
    for (const b of reading.values()) inFlight += b;
    opts.onProgress?.({ policy: policy.name, shardsDone: results.length, shards: shards.length, bytes: bytes + inFlight, elapsedMs: performance.now() - started });
  };
  const readingAt = (path: string, b: number): void => {
    reading.set(path, b);
    if (opts.onProgress) report();
  };
  const done = (r: ShardResult): void => {
    results.push(r);
    bytes += r.read.bytes;
    reading.delete(r.path);
    report();
  };

  const todo: ShardRef[] = [];
  if (!cache) todo.push(...shards);
  else {
    // Cache look-ups are small file reads: overlap them, so a PR over a large corpus does not
    // wait for hundreds of reads in a row. Results keep the shards' order.
    const lookups = await mapAtMost(shards, CACHE_LOOKUPS_AT_ONCE, async (ref) => {
      const contentId = await (opts.contentKey ?? contentIdOf)(ref);
      keys.set(ref.path, contentId);
      return cache.get(contentId, prepared.settingsId, ref);
    });
    shards.forEach((ref, i) => {
      const hit = lookups[i];
      if (hit) {
        cached.add(ref.path);
        done(hit);
      } else todo.push(ref);
    });
  }

  // Something is measured here: the tokenizer's ranks module, deferred so that a run served
  // wholly from the cache never imports it, is needed now.
  if (todo.length > 0) await setupOrThrow(() => prepared.ready());

  // A cache that cannot be written costs the next run time, not this run its report: said once, then left alone.
  let cacheWritable = true;
  const store = async (r: ShardResult): Promise<void> => {
    const key = keys.get(r.path);
    if (!cache || !key || !cacheWritable) return;
    try {
      await cache.put({ ...r, contentId: key });
    } catch (err) {
      cacheWritable = false;
      opts.onWarning?.(`cannot write the cache in ${cache.dir} (${(err as Error).message}); this run's results are not cached`);
    }
  };
  // Told the bytes read so far of a shard measured in this thread, when progress is shown.
  const progressOf = (ref: ShardRef): ((b: number) => void) | undefined => (opts.onProgress ? (b) => readingAt(ref.path, b) : undefined);
  const workers = threadsFor(todo, opts);
  if (workers > 1 && canRunWorkers(opts.workerEntry)) {
    // Shards that only this thread can open (git blobs, in the Action's base tree) are never sent whole
    // to a worker: this thread reads them and the workers measure their batches.
    const files = await withTextHints(todo.filter((r) => r.open === undefined));
    const split = shardsToSplit(files, workers, opts.minSplitBytes);
    const whole = files.filter((r) => !split.has(r));
    const tail = tailShards(whole, workers);
    const init = workerInitOf(policy, prepared.settingsId, prepared.evaluation);
    const pending: Promise<void>[] = [];
    const plan: BatchPlan = { batchChars: BATCH_CHARS, inFlight: BATCHES_IN_FLIGHT_PER_THREAD * workers };
    await measureInPool(
      {
        whole: whole.filter((r) => !tail.has(r)),
        split: [...files.filter((r) => split.has(r)), ...todo.filter((r) => r.open !== undefined)],
        tail: whole.filter((r) => tail.has(r)),
      },
      init,
      opts.workerEntry,
      workers,
      (r) => {
        done(r);
        pending.push(store(r));
      },
      {
        shard: (ref) => {
          throwIfFaultInjected(ref.path);
          return scanShard(ref, prepared.scan, prepared.analyzers, progressOf(ref));
        },
        reading: readingAt,
        batch: (ref, batch) => {
          throwIfFaultInjected(ref.path);
          return measureBatch(batch, prepared.scan, prepared.analyzers);
        },
        split: (ref, measure) =>
          scanShardInBatches(ref, prepared.scan, prepared.analyzers, measure, {
            ...plan,
            onRead: (b) => readingAt(ref.path, b),
          }),
      },
      early,
      prepared.sharedCounts(),
    );
    // The pool takes the worker bin/sluice.js started when it needs one; when it did not, stop it.
    dropPrestartedWorker();
    await Promise.all(pending);
  } else {
    // One thread does it all: a worker the command line started ahead is not needed.
    dropPrestartedWorker();
    for (const ref of todo) {
      const r = await scanShard(ref, prepared.scan, prepared.analyzers, progressOf(ref));
      done(r);
      await store(r);
    }
  }
  return { results, cached };
}

/** Returns one report per policy file. */
/** Returns, per name, the suffix that keeps its output file apart from earlier ones of the same name: '' the first time, then -2, -3, ... */
export function repeatSuffixes(names: readonly string[]): string[] {
  const seen = new Map<string, number>();
  return names.map((name) => {
    const n = (seen.get(name) ?? 0) + 1;
    seen.set(name, n);
    return n === 1 ? '' : `-${n}`;
  });
}

export async function runCheck(opts: CheckOptions): Promise<Report[]> {
  const reports: Report[] = [];
  for (const file of opts.policies) {
    const policy = await loadPolicyOrThrow(file, opts.root, opts.onWarning);
    const corpus = await measureCorpus(policy, opts);
    reports.push(buildReport(policy, corpus, opts.cwd));
  }
  return reports;
}
