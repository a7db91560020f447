// Many runners: `scan --partition I/N` measures the shards whose path hashes to
// partition I and writes a partial result; `merge` checks that the parts belong
// together and cover every partition once, then joins duplicates across all of
// them and judges — the same report a single machine would give.
import { readFile } from 'node:fs/promises';
import { DuplicateIndexError } from '../measure/duplicates/index.js';
import { buildReport } from '../judge/report.js';
import type { Report } from '../judge/types.js';
import { partitionOf, PARTIAL_FORMAT, PARTIAL_VERSION, partialFromJson, type Partial } from '../results/partition.js';
import type { ShardResult } from '../results/types.js';
import type { SkippedFile } from '../read/types.js';
import { assembleCorpus, ConfigError, discoverOrThrow, loadPolicyOrThrow, measureShards, prepareOrThrow, refuseOutputsAmongShards, type CheckOptions } from './check.js';

/** Returns the partial result of partition `index` of `count` (1-based). */
export async function scanPartition(policyFile: string, index: number, count: number, opts: Omit<CheckOptions, 'policies'>): Promise<Partial> {
  if (!Number.isInteger(count) || count < 1 || !Number.isInteger(index) || index < 1 || index > count) {
    throw new ConfigError(`--partition must be I/N with 1 ≤ I ≤ N, got ${index}/${count}`);
  }
  const started = performance.now();
  const policy = await loadPolicyOrThrow(policyFile, opts.root, opts.onWarning);
  const discovery = await discoverOrThrow(policy);
  refuseOutputsAmongShards(discovery.shards, opts.outputs);
  const mine = discovery.shards.filter((s) => partitionOf(s.path, count) === index);
  const prepared = await prepareOrThrow(policy);
  const { results } = await measureShards(policy, mine, prepared, { ...opts, policies: [policyFile] }, started);
  results.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  return {
    format: PARTIAL_FORMAT,
    version: PARTIAL_VERSION,
    policy: policy.name,
    settingsId: prepared.settingsId,
    partition: { index, count },
    shardsInCorpus: discovery.shards.length,
    results,
    skipped: discovery.skipped.filter((s) => partitionOf(s.path, count) === index),
  };
}

/** Returns the report of a policy over the merged partial results; throws ConfigError when the parts are not one complete set measured under this policy. */
export async function mergePartials(policyFile: string, partFiles: string[], opts: Omit<CheckOptions, 'policies'>): Promise<Report> {
  const started = performance.now();
  const policy = await loadPolicyOrThrow(policyFile, opts.root, opts.onWarning);
  const prepared = await prepareOrThrow(policy);
  if (partFiles.length === 0) throw new ConfigError('merge: no partial result files given');
  const parts: Array<{ file: string; partial: Partial }> = [];
  for (const file of partFiles) {
    let text: string;
    try {
      text = await readFile(file, 'utf8');
    } catch (err) {
      throw new ConfigError(`${file}: cannot read: ${(err as Error).message}`);
    }
    const parsed = partialFromJson(text);
    if (!parsed.ok) throw new ConfigError(`${file}: ${parsed.reason}`);
    if (parsed.partial.settingsId !== prepared.settingsId) {
      throw new ConfigError(`${file}: measured under other settings (${parsed.partial.settingsId}) than ${policy.file} gives now (${prepared.settingsId}): scan it again with this policy and sluice version`);
    }
    parts.push({ file, partial: parsed.partial });
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
