// Which shards a pooled run splits into batches: those too large to leave to one thread, and the
// smallest few, measured last by all threads so that they end together. Either way the results are
// those of one thread (test/cli/scale.test.ts compares 1 and 4 workers byte for byte).
import { describe, expect, it } from 'vitest';
import { shardsToSplit, tailShards } from '../../src/core/check.js';
import type { ShardRef } from '../../src/read/types.js';

const shard = (path: string, mb: number): ShardRef =>
  ({ path, absPath: `/corpus/${path}`, format: 'jsonl', compression: 'gzip', sizeBytes: mb * 1e6, textBytesHint: mb * 4e6 }) as ShardRef;

describe('the shards a pooled run measures in batches', () => {
  const shards = [shard('a', 5), shard('b', 1), shard('c', 3), shard('d', 1), shard('e', 2)];

  it('leaves the tail to all threads: the smallest shards, one per thread, by the text they hold', () => {
    expect([...tailShards(shards, 2)].map((r) => r.path).sort()).toEqual(['b', 'd']);
    expect([...tailShards(shards, 3)].map((r) => r.path).sort()).toEqual(['b', 'd', 'e']);
    // Equal sizes: by path, so the choice does not depend on the listing's order.
    expect([...tailShards([shard('y', 1), shard('x', 1), shard('z', 1)], 2)].map((r) => r.path).sort()).toEqual(['x', 'y']);
  });

  it('splits nothing on one thread', () => {
    expect(tailShards(shards, 1).size).toBe(0);
    expect(shardsToSplit(shards, 1, 0).size).toBe(0);
  });

  it('splits a shard holding over a quarter of a thread’s share, from the minimum size on', () => {
    // 12 MB on disk, 48 MB of text; two threads: a quarter share is 6 MB of text.
    expect([...shardsToSplit(shards, 2, 0)].map((r) => r.path).sort()).toEqual(['a', 'c', 'e']);
    expect([...shardsToSplit(shards, 2, 10e6)].map((r) => r.path).sort()).toEqual(['a', 'c']);
  });
});
