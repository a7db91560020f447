// Many runners: `scan --partition I/N` measures the shards whose path hashes to
// partition I and writes a partial result; `merge` checks that the parts belong
// together and cover every partition once, then joins duplicates across all of
// them and judges — the same report a single machine would give.
import { readFile } from 'node:fs/promises';
import { DuplicateIndexError } from '../measure/duplicates/index.js';
import { buildReport } from '../judge/report.js';
import type { Report } from '../judge/types.js';
import type { Policy } from '../policy/types.js';
import { partitionOf, PARTIAL_FORMAT, PARTIAL_VERSION, partialFromJson, type Partial } from '../results/partition.js';
import type { ShardResult } from '../results/types.js';
import type { SkippedFile } from '../read/types.js';
import { assembleCorpus, ConfigError, discoverOrThrow, loadPolicyOrThrow, measureShards, prepareOrThrow, refuseOutputsAmongShards, type CheckOptions } from './check.js';
import { cleanBlobs, gitTopLevel, rootInRepo } from './compare.js';

/** A partition scanned: its partial result, and how many of its shards came from the cache. */
export interface ScannedPartition {
  partial: Partial;
  fromCache: number;
}

/** Returns the partial result of partition `index` of `count` (1-based). */
export async function scanPartition(policyFile: string, index: number, count: number, opts: Omit<CheckOptions, 'policies'>): Promise<ScannedPartition> {
  if (!Number.isInteger(count) || count < 1 || !Number.isInteger(index) || index < 1 || index > count) {
    throw new ConfigError(`--partition must be I/N with 1 ≤ I ≤ N, got ${index}/${count}`);
  }
  const started = performance.now();
  const policy = await loadPolicyOrThrow(policyFile, opts.root, opts.onWarning);
  const discovery = await discoverOrThrow(policy);
  refuseOutputsAmongShards(discovery.shards, opts.outputs);
  const mine = discovery.shards.filter((s) => partitionOf(s.path, count) === index);
  const prepared = await prepareOrThrow(policy);
  const { results, cached } = await measureShards(policy, mine, prepared, { ...opts, policies: [policyFile] }, started);
  results.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const blobs = await blobsOf(policy, results, opts.onWarning);
  const partial: Partial = {
    format: PARTIAL_FORMAT,
    version: PARTIAL_VERSION,
    policy: policy.name,
    settingsId: prepared.settingsId,
    partition: { index, count },
    shardsInCorpus: discovery.shards.length,
    results,
    skipped: discovery.skipped.filter((s) => partitionOf(s.path, count) === index),
    ...(blobs ? { blobs } : {}),
  };
  return { partial, fromCache: cached.size };
}

/**
 * Returns the git blob id of each measured shard whose file is as the index has it, when the root
 * is in a git work tree; undefined outside one, or (with a warning) when git cannot list the index:
 * the ids only spare a later job reading the shards again.
 */
async function blobsOf(policy: Policy, results: readonly ShardResult[], onWarning?: (m: string) => void): Promise<Record<string, string> | undefined> {
  const top = await gitTopLevel(policy.root);
  if (top === null) return undefined;
  let clean: Map<string, string>;
  try {
    clean = await cleanBlobs(top, await rootInRepo(top, policy));
  } catch (err) {
    onWarning?.(`the part records no git blob ids (${(err as Error).message}); a job given it as \`parts\` measures its shards again`);
    return undefined;
  }
  const out: Record<string, string> = {};
  for (const r of results) {
    const blob = clean.get(r.path);
    if (blob !== undefined) out[r.path] = blob;
  }
  return out;
}

/** A part file as read, with the path it was read from. */
export interface ReadPart {
  file: string;
  partial: Partial;
}

/** The parts of one complete partitioned scan, checked to belong together. */
export interface PartialSet {
  parts: readonly ReadPart[];
  results: ShardResult[];
  skipped: SkippedFile[];
}

/** Reads one partial result file; throws ConfigError naming it when it cannot be read or is not a partial. */
export async function readPartialFile(file: string): Promise<ReadPart> {
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (err) {
    throw new ConfigError(`${file}: cannot read: ${(err as Error).message}`);
  }
  const parsed = partialFromJson(text);
  if (!parsed.ok) throw new ConfigError(`${file}: ${parsed.reason}`);
  return { file, partial: parsed.partial };
}

/**
 * Returns read parts as one set; throws ConfigError naming the file when one was measured under
 * other settings than `settingsId` (those `policy` gives now), or when the parts are not exactly
 * one of each partition of one corpus.
 */
export function checkPartialSet(parts: readonly ReadPart[], policy: { file: string }, settingsId: string): PartialSet {
  if (parts.length === 0) throw new ConfigError('merge: no partial result files given');
  for (const { file, partial } of parts) {
    if (partial.settingsId !== settingsId) {
      throw new ConfigError(`${file}: measured under other settings (${partial.settingsId}) than ${policy.file} gives now (${settingsId}): scan it again with this policy and sluice version`);
    }
  }
  const count = parts[0]!.partial.partition.count;
  const seen = new Map<number, string>();
  for (const { file, partial } of parts) {
    if (partial.partition.count !== count) throw new ConfigError(`${file}: partition ${partial.partition.index}/${partial.partition.count}, but ${parts[0]!.file} is one of ${count}`);
    const other = seen.get(partial.partition.index);
    if (other) throw new ConfigError(`${file}: partition ${partial.partition.index}/${count} given twice (also ${other})`);
    seen.set(partial.partition.index, file);
  }
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !seen.has(i));
  if (missing.length) throw new ConfigError(`merge: partition${missing.length > 1 ? 's' : ''} ${missing.map((i) => `${i}/${count}`).join(', ')} missing: the report would not cover the corpus`);
  const shardsInCorpus = new Set(parts.map((p) => p.partial.shardsInCorpus));
  const results: ShardResult[] = parts.flatMap((p) => p.partial.results);
  const skipped: SkippedFile[] = parts.flatMap((p) => p.partial.skipped).sort((a, b) => (a.path < b.path ? -1 : 1));
  if (shardsInCorpus.size > 1) throw new ConfigError(`merge: the parts saw different corpora (${[...shardsInCorpus].join(' vs ')} shards): scan all partitions of the same commit`);
  if (results.length !== [...shardsInCorpus][0]) throw new ConfigError(`merge: the parts hold ${results.length} shards, the corpus has ${[...shardsInCorpus][0]}`);
  return { parts, results, skipped };
}

/** Returns the report of a policy over the merged partial results; throws ConfigError when the parts are not one complete set measured under this policy. */
export async function mergePartials(policyFile: string, partFiles: string[], opts: Omit<CheckOptions, 'policies'>): Promise<Report> {
  const started = performance.now();
  const policy = await loadPolicyOrThrow(policyFile, opts.root, opts.onWarning);
  const prepared = await prepareOrThrow(policy);
  const read: ReadPart[] = [];
  for (const file of partFiles) read.push(await readPartialFile(file));
  const { parts, results, skipped } = checkPartialSet(read, policy, prepared.settingsId);
  let corpus;
  try {
    corpus = await assembleCorpus(policy, prepared, results, new Set(), skipped, opts.newShards, started);
  } catch (err) {
    if (!(err instanceof DuplicateIndexError)) throw err;
    // Named with the part that holds the shard: that part is the one to scan again.
    const holder = parts.find((p) => p.partial.results.some((r) => r.path === err.shard));
    throw new ConfigError(`${holder ? `${holder.file}: ` : ''}${err.message}: scan that partition again`);
  }
  return buildReport(policy, corpus, opts.cwd);
}
