// Shards that only the main thread can open (the Action reads the base tree's shards from git) are
// read there and measured in batches by the workers: the results are those of one thread, and a
// failure inside a worker still fails the run with the shard named.
import { cpSync, createReadStream, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { discoverOrThrow, loadPolicyOrThrow, measureShards, prepareOrThrow, type CheckOptions } from '../../src/core/check.js';
import { ShardFailure } from '../../src/core/pool.js';
import type { ShardRef } from '../../src/read/types.js';
import { storedShardResult } from '../../src/results/serialize.js';
import type { ShardResult } from '../../src/results/types.js';

const REPO = resolve(__dirname, '..', '..');
const POLICY = join(REPO, 'examples/newsroom/policies/newsroom.yaml');
// The built bundle doubles as the worker script (test/global-setup.ts builds it).
const ENTRY = join(REPO, 'dist', 'cli.js');

/** The results as stored (duplicate indexes as base64), in path order, timing aside. */
const comparable = (results: ShardResult[]): string =>
  JSON.stringify([...results].sort((a, b) => (a.path < b.path ? -1 : 1)).map((r) => ({ ...storedShardResult(r), elapsedMs: 0 })));

async function setUp(): Promise<{ run: (opts: Partial<CheckOptions>) => Promise<ShardResult[]> }> {
  const policy = await loadPolicyOrThrow(POLICY);
  const prepared = await prepareOrThrow(policy);
  const { shards } = await discoverOrThrow(policy);
  // As the Action's base tree gives them: each shard opened by a function, not by a path a worker could read.
  const refs: ShardRef[] = shards.map((r) => ({ ...r, absPath: `(blob) ${r.path}`, open: () => createReadStream(r.absPath) }));
  return { run: async (opts) => (await measureShards(policy, refs, prepared, { policies: [POLICY], cacheDir: null, ...opts })).results };
}

describe('shards only the main thread can open', () => {
  afterEach(() => {
    delete process.env.SLUICE_FAULT_SHARD;
  });

  it('are measured in batches by the workers, with the results of one thread', async () => {
    const { run } = await setUp();
    const one = await run({ workers: 1 });
    const pooled = await run({ workers: 3, workerEntry: ENTRY });
    expect(pooled.length).toBe(one.length);
    expect(comparable(pooled)).toBe(comparable(one));
  });

  it('fail the run with the shard named when a worker fails on one of their batches', async () => {
    const { run } = await setUp();
    // Only the pooled path checks for injected faults: a ShardFailure here shows the batches went to the pool.
    process.env.SLUICE_FAULT_SHARD = 'data/english/english-01.jsonl.gz';
    const failure = await run({ workers: 2, workerEntry: ENTRY }).then(
      () => null,
      (e: unknown) => e,
    );
    expect(failure).toBeInstanceOf(ShardFailure);
    expect((failure as ShardFailure).shard).toBe('data/english/english-01.jsonl.gz');
  });

  it('report progress while a shard is read, not only when it ends, up to the bytes of all shards', async () => {
    const { run } = await setUp();
    const seen: Array<{ bytes: number; shardsDone: number }> = [];
    const results = await run({ workers: 1, onProgress: (p) => seen.push({ bytes: p.bytes, shardsDone: p.shardsDone }) });
    const total = results.reduce((n, r) => n + r.read.bytes, 0);
    // Updates between a shard's chunks as well as one per finished shard.
    expect(seen.length).toBeGreaterThan(results.length);
    expect(seen.every((p, i) => i === 0 || p.bytes >= seen[i - 1]!.bytes)).toBe(true);
    expect(seen.at(-1)).toEqual({ bytes: total, shardsDone: results.length });
  });
});

describe('the workers of a pooled run', () => {
  it('measure under the policy and evaluation set the main thread loaded, not the files as they are later', async () => {
    // The workers are handed the main thread's policy and evaluation items; they no longer read
    // either from disk. So a policy file and an evaluation file that change (here: become
    // unreadable YAML and an empty file) after the run has loaded them change nothing, and every
    // thread measures under the same settings.
    // A copy of the demo: its data, its policy, and an evaluation file of our own.
    const dir = mkdtempSync(join(tmpdir(), 'sluice-worker-policy-'));
    cpSync(join(REPO, 'examples/newsroom/data'), join(dir, 'data'), { recursive: true });
    mkdirSync(join(dir, 'policies'));
    mkdirSync(join(dir, 'evals'));
    const evalFile = join(dir, 'evals', 'quiz.jsonl');
    writeFileSync(evalFile, `${JSON.stringify({ text: 'an evaluation item that no story of the newsroom repeats, kept for this test only' })}\n`);
    const file = join(dir, 'policies', 'policy.yaml');
    writeFileSync(file, readFileSync(POLICY, 'utf8'));
    try {
      const policy = await loadPolicyOrThrow(file);
      expect(policy.rules.contamination).toBeDefined();
      const prepared = await prepareOrThrow(policy);
      expect(prepared.evaluation?.items).toHaveLength(1);
      const { shards } = await discoverOrThrow(policy);
      const one = (await measureShards(policy, shards, prepared, { policies: [file], cacheDir: null, workers: 1 })).results;
      writeFileSync(file, 'version: [this is no longer a policy\n');
      writeFileSync(evalFile, '');
      const pooled = (await measureShards(policy, shards, prepared, { policies: [file], cacheDir: null, workers: 3, workerEntry: ENTRY })).results;
      expect(pooled.length).toBe(one.length);
      expect(comparable(pooled)).toBe(comparable(one));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
