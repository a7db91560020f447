// The threads of a pooled run share one table of per-piece token counts per tokenizer
// (src/measure/tokens/shared-counts.ts): what one thread works out, the others read.
// Counts themselves are checked against js-tiktoken in test/measure/tokens-tiktoken.test.ts;
// here, that the workers really fill the main thread's table, and that the report does not
// depend on who filled it.
import { join, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { discoverOrThrow, loadPolicyOrThrow, measureShards, prepareOrThrow } from '../../src/core/check.js';
import { loadTokenizer } from '../../src/measure/tokens/index.js';
import { readShard } from '../../src/read/index.js';
import { storedShardResult } from '../../src/results/serialize.js';
import type { ShardResult } from '../../src/results/types.js';

const REPO = resolve(__dirname, '..', '..');
const POLICY = join(REPO, 'examples/newsroom/policies/newsroom.yaml');
// The built bundle doubles as the worker script (test/global-setup.ts builds it).
const ENTRY = join(REPO, 'dist', 'cli.js');

const comparable = (results: ShardResult[]): string =>
  JSON.stringify([...results].sort((a, b) => (a.path < b.path ? -1 : 1)).map((r) => ({ ...storedShardResult(r), elapsedMs: 0 })));

describe('token counts shared between the threads of a pooled run', () => {
  it('are filled by the workers too: afterwards a counter adopting the table works out no piece of the corpus itself', async () => {
    const policy = await loadPolicyOrThrow(POLICY);
    const { shards } = await discoverOrThrow(policy);
    expect(shards.length).toBeGreaterThan(3);

    const pooledPrepared = await prepareOrThrow(policy);
    const pooled = await measureShards(policy, shards, pooledPrepared, { policies: [POLICY], cacheDir: null, workers: 4, workerEntry: ENTRY });
    const tables = pooledPrepared.sharedCounts();
    expect(tables.main?.counts).toBeInstanceOf(SharedArrayBuffer);
    expect(tables.baseline?.counts).toBeInstanceOf(SharedArrayBuffer);

    // Whole shards are spread over four threads, so the main thread measured only some of them: the
    // table holds the pieces of the others only if the workers wrote into it.
    for (const [role, spec] of [['main', policy.tokenizer!], ['baseline', policy.baseline!]] as const) {
      const counter = await loadTokenizer(spec);
      expect(counter.adoptTables!(tables[role]!)).toBe(true);
      for (const ref of shards) {
        await readShard(ref, pooledPrepared.scan.read, (doc) => counter.count(doc.text));
      }
      expect(counter.cacheStats().misses).toBe(0);
      expect(counter.cacheStats().hits).toBeGreaterThan(1000);
    }

    // And the results equal one thread's.
    const one = await measureShards(policy, shards, await prepareOrThrow(policy), { policies: [POLICY], cacheDir: null, workers: 1 });
    expect(comparable(pooled.results)).toBe(comparable(one.results));
  });

  it('are refused by a policy whose tokenizer differs: each counter keeps its own table', async () => {
    const policy = await loadPolicyOrThrow(POLICY);
    const a = await prepareOrThrow(policy);
    const b = await prepareOrThrow({ ...policy, tokenizer: policy.baseline!, baseline: policy.tokenizer! });
    await a.ready();
    await b.ready();
    const mine = b.sharedCounts();
    b.adoptCounts(a.sharedCounts());
    // Roles swapped: main of a is o200k_base, main of b is gpt2, so neither table is taken.
    expect(b.sharedCounts().main!.counts).toBe(mine.main!.counts);
    expect(b.sharedCounts().baseline!.counts).toBe(mine.baseline!.counts);
    expect(b.sharedCounts().main!.counts).not.toBe(a.sharedCounts().main!.counts);
    expect(b.sharedCounts().main!.ranks).not.toBe(a.sharedCounts().main!.ranks);
  });

  it('come from a tokenizer whose ranks module a run loads only when it measures something', async () => {
    const policy = await loadPolicyOrThrow(POLICY);
    const prepared = await prepareOrThrow(policy);
    // Before ready(), nothing has imported the builtin's ranks: a count would be a caller's bug, and says so.
    expect(() => prepared.analyzers.tokens!('A flood warning was issued for the river.')).toThrow(/ready\(\) was not awaited/);
    expect(() => prepared.sharedCounts()).toThrow(/ready\(\) was not awaited/);
    await prepared.ready();
    const eager = await loadTokenizer(policy.tokenizer!);
    const text = 'A flood warning was issued for the river. नदी का जलस्तर बढ़ा।';
    expect(prepared.analyzers.tokens!(text).main!.tokens).toBe(eager.count(text).tokens);
    expect(prepared.sharedCounts().main?.counts).toBeInstanceOf(SharedArrayBuffer);
  });
});
