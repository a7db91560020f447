// `sluice` on the command line: parse arguments, call the core, print, exit.
import { statSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import path from 'node:path';
import { ConfigError, repeatSuffixes, runCheck, type CheckOptions, type Progress } from '../core/check.js';
import { GitError, runCheckAgainstBase } from '../core/compare.js';
import { seededLine, seedRunFromParts } from '../core/parts.js';
import { mergePartials, scanPartition } from '../core/partition.js';
import { maxWorkers, ShardFailure } from '../core/pool.js';
import { isShardWorker, runShardWorker } from '../core/worker.js';
import type { Comparison } from '../judge/comparison.js';
import type { Report } from '../judge/types.js';
import { partialToJson } from '../results/partition.js';
import { TOOL_VERSION } from '../judge/report.js';
import { renderComparisonTerminal, renderMarkdownWithComparison } from '../render/comparison.js';
import { renderJson } from '../render/json.js';
import { renderMarkdown } from '../render/markdown.js';
import { renderTerminal } from '../render/terminal.js';
import { parseCli, USAGE, UsageError, type CheckCliOptions, type MergeCliOptions, type ScanCliOptions } from './options.js';

async function check(opts: CheckCliOptions): Promise<number> {
  const progress = progressPrinter();
  let options: CheckOptions = {
    policies: opts.policies,
    cacheDir: opts.cacheDir,
    ...(opts.root !== undefined ? { root: opts.root } : {}),
    onProgress: progress.update,
    onWarning: (m) => process.stderr.write(`warning: ${m}\n`),
    workerEntry: import.meta.url,
    ...(opts.workers !== undefined ? { workers: opts.workers } : {}),
    ...(opts.minSplitBytes !== undefined ? { minSplitBytes: opts.minSplitBytes } : {}),
    outputs: outputsOf([['--json', opts.json], ['--markdown', opts.markdown], ['--comparison-json', opts.comparisonJson]]),
  };
  let dispose = async (): Promise<void> => {};
  if (opts.parts !== undefined) {
    const seeded = await seedRunFromParts(options, opts.parts, '--parts');
    ({ options, dispose } = seeded);
    for (const { policy, seeded: s } of seeded.seeded) process.stderr.write(`${seededLine(policy, s)}\n`);
  }
  try {
    if (opts.base !== undefined) {
      const judged = await runCheckAgainstBase(options, opts.base);
      progress.clear();
      return await emit(judged, opts);
    }
    const reports = await runCheck(options);
    progress.clear();
    return await emit(reports.map((report) => ({ report, comparison: null })), opts);
  } finally {
    await dispose();
  }
}

async function scan(opts: ScanCliOptions): Promise<number> {
  const progress = progressPrinter();
  const { partial, fromCache } = await scanPartition(opts.policy, opts.partition.index, opts.partition.count, {
    cacheDir: opts.cacheDir,
    ...(opts.root !== undefined ? { root: opts.root } : {}),
    ...(opts.workers !== undefined ? { workers: opts.workers } : {}),
    ...(opts.minSplitBytes !== undefined ? { minSplitBytes: opts.minSplitBytes } : {}),
    onProgress: progress.update,
    onWarning: (m) => process.stderr.write(`warning: ${m}\n`),
    workerEntry: import.meta.url,
    outputs: outputsOf([['--out', opts.out]]),
  });
  progress.clear();
  await writeOutput('--out', opts.out, partialToJson(partial));
  const docs = partial.results.reduce((n, r) => n + r.read.docs, 0);
  process.stdout.write(`partition ${opts.partition.index}/${opts.partition.count}: ${partial.results.length} of ${partial.shardsInCorpus} shards, ${docs} documents${fromCache > 0 ? `, ${fromCache} from cache` : ''} → ${opts.out}\n`);
  return 0;
}

async function merge(opts: MergeCliOptions): Promise<number> {
  const report = await mergePartials(opts.policy, opts.parts, {
    cacheDir: null,
    ...(opts.root !== undefined ? { root: opts.root } : {}),
    onWarning: (m) => process.stderr.write(`warning: ${m}\n`),
  });
  return emit([{ report, comparison: null }], opts);
}

async function emit(judged: Array<{ report: Report; comparison: Comparison | null; baseShardsRead?: number }>, opts: Pick<CheckCliOptions, 'quiet' | 'color' | 'json' | 'markdown' | 'comparisonJson'>): Promise<number> {
  const reports = judged.map((j) => j.report);
  for (const { report, comparison, baseShardsRead } of judged) {
    if (opts.quiet) process.stdout.write(`${report.headline}${comparison ? ` (against base ${comparison.base.label}: ${comparison.verdict.base ?? 'no shards'} → ${comparison.verdict.head})` : ''}\n`);
    else {
      const against = comparison ? `\n${renderComparisonTerminal(comparison, { color: opts.color, ...(baseShardsRead !== undefined ? { baseShardsRead } : {}) })}` : '';
      process.stdout.write(renderTerminal(report, { color: opts.color }) + against);
    }
  }
  const single = reports.length === 1;
  // One file per policy, named by the policy's name; two policies of one name get -2, -3, ... rather than one file.
  const suffixes = repeatSuffixes(reports.map((r) => r.policy.name));
  const names = reports.map((r, i) => `${r.policy.name}${suffixes[i]}`);
  const suffixed = (file: string, name: string): string => (single ? file : file.replace(/(\.[^./]+)?$/, (ext) => `.${name}${ext}`));
  for (const [i, report] of reports.entries()) {
    if (opts.json) await writeOutput('--json', suffixed(opts.json, names[i]!), renderJson(report));
    const comparison = judged[i]!.comparison;
    if (opts.markdown) await writeOutput('--markdown', suffixed(opts.markdown, names[i]!), comparison ? renderMarkdownWithComparison(report, comparison) : renderMarkdown(report));
    if (opts.comparisonJson && comparison) await writeOutput('--comparison-json', suffixed(opts.comparisonJson, names[i]!), `${JSON.stringify(comparison, null, 2)}\n`);
  }
  return reports.some((r) => r.verdict === 'fail') ? 1 : 0;
}

/** The output options given, as the core checks them against the shards. */
function outputsOf(options: Array<[string, string | undefined]>): Array<{ option: string; file: string }> {
  return options.flatMap(([option, file]) => (file === undefined ? [] : [{ option, file }]));
}

/** Says when --workers asks for more threads than a run starts (the core caps them: see maxWorkers). */
function warnOfWorkers(workers: number | undefined): void {
  const most = maxWorkers();
  if (workers !== undefined && workers > most) process.stderr.write(`warning: --workers ${workers}: measuring on ${most} threads, twice this machine's cores; more would only take turns on them, each with its own memory\n`);
}

/** Writes a report or partial result where an option says, or says which option's path could not be written. */
async function writeOutput(option: string, file: string, text: string): Promise<void> {
  try {
    await writeFile(file, text);
  } catch (err) {
    throw new UsageError(`${option} ${file}: cannot write it: ${(err as Error).message}`);
  }
}

/**
 * Refuses, before anything is read, output paths that could not be written at the end of a long
 * run (a directory, a directory that is not there) or that would overwrite an input of the run (the
 * policy, a part file), and a cache directory that is a file.
 */
function checkPaths(outputs: Array<[string, string | undefined]>, policies: readonly string[], cacheDir: string | null): void {
  const kind = (p: string): 'dir' | 'file' | 'none' => {
    try {
      return statSync(p).isDirectory() ? 'dir' : 'file';
    } catch {
      return 'none';
    }
  };
  const policyFiles = new Set(policies.map((p) => path.resolve(p)));
  for (const [option, file] of outputs) {
    if (file === undefined) continue;
    if (kind(file) === 'dir') throw new UsageError(`${option} ${file}: is a directory; give a file name to write to`);
    const parent = path.dirname(path.resolve(file));
    const parentKind = kind(parent);
    if (parentKind !== 'dir') throw new UsageError(`${option} ${file}: ${parent} ${parentKind === 'none' ? 'does not exist' : 'is not a directory'}`);
    if (policyFiles.has(path.resolve(file))) throw new UsageError(`${option} ${file}: is an input of this run; the report would overwrite it`);
  }
  if (cacheDir !== null && kind(cacheDir) === 'file') throw new UsageError(`--cache-dir ${cacheDir}: is a file, not a directory`);
}

// Progress on stderr, only on a terminal and only once a scan has run a second.
function progressPrinter(): { update: (p: Progress) => void; clear: () => void } {
  const tty = process.stderr.isTTY === true;
  let last = 0;
  let shown = false;
  return {
    update(p) {
      if (!tty || p.elapsedMs < 1000 || p.elapsedMs - last < 200) return;
      last = p.elapsedMs;
      shown = true;
      const rate = p.bytes / 1e6 / (p.elapsedMs / 1000);
      process.stderr.write(`\r\u001b[K${p.policy}: ${p.shardsDone}/${p.shards} shards, ${(p.bytes / 1e6).toFixed(1)} MB read, ${rate.toFixed(1)} MB/s`);
    },
    clear() {
      if (shown) process.stderr.write('\r\u001b[K');
    },
  };
}

async function main(): Promise<number> {
  try {
    const cmd = parseCli(process.argv.slice(2), process.env, process.stdout.isTTY === true);
    if (cmd.command === 'help') {
      process.stdout.write(USAGE);
      return 0;
    }
    if (cmd.command === 'version') {
      process.stdout.write(`${TOOL_VERSION}\n`);
      return 0;
    }
    if (cmd.command === 'scan') {
      checkPaths([['--out', cmd.out]], [cmd.policy], cmd.cacheDir);
      warnOfWorkers(cmd.workers);
      return await scan(cmd);
    }
    if (cmd.command === 'merge') {
      checkPaths([['--json', cmd.json], ['--markdown', cmd.markdown]], [cmd.policy, ...cmd.parts], null);
      return await merge(cmd);
    }
    checkPaths([['--json', cmd.json], ['--markdown', cmd.markdown], ['--comparison-json', cmd.comparisonJson]], cmd.policies, cmd.cacheDir);
    warnOfWorkers(cmd.workers);
    return await check(cmd);
  } catch (err) {
    if (err instanceof UsageError || err instanceof ConfigError || err instanceof ShardFailure || err instanceof GitError) {
      process.stderr.write(`sluice: ${err.message}\n`);
      return 2;
    }
    process.stderr.write(`sluice: internal error: ${(err as Error).stack ?? String(err)}\n`);
    return 2;
  }
}

// The same bundle serves as the worker threads' script. No top-level await: a module that
// has one is evaluated as an async module, and a worker terminated while V8 runs such a
// module's body aborts the whole process (Node 20: "Check failed: (location_) != nullptr"
// in SourceTextModule::ExecuteAsyncModule). The pool terminates workers that are still
// loading when a run needs fewer threads than it started, so the body must stay synchronous;
// test/core/worker-terminate.test.ts terminates loading workers at staggered moments.
if (isShardWorker()) void runShardWorker();
else
  void main().then(
    (code) => {
      process.exitCode = code;
    },
    (err: unknown) => {
      process.stderr.write(`sluice: internal error: ${(err as Error)?.stack ?? String(err)}\n`);
      process.exitCode = 2;
    },
  );
