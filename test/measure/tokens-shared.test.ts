// The shared-memory table of piece counts (src/measure/tokens/shared-counts.ts) on its own:
// lookups by text range, a full table, and the owner check. Its use by counters is checked
// against js-tiktoken in tokens-tiktoken.test.ts, and across threads in test/core/shared-counts.test.ts.
import { describe, expect, it } from 'vitest';
import { hashRange, MAX_CACHED_PIECE_LENGTH } from '../../src/measure/tokens/cache.js';
import { SharedPieceCounts } from '../../src/measure/tokens/shared-counts.js';

const add = (t: SharedPieceCounts, text: string, start: number, end: number, n: number): boolean => t.add(text, start, end, hashRange(text, start, end), n);
const find = (t: SharedPieceCounts, text: string, start = 0, end = text.length): number => t.find(text, start, end, hashRange(text, start, end));

describe('SharedPieceCounts', () => {
  it('finds a piece by its range in any text, and only that piece', () => {
    const t = SharedPieceCounts.create('builtin:test');
    expect(add(t, 'the  काम  done', 4, 8, 3)).toBe(true); // " काम"
    expect(find(t, ' काम')).toBe(3);
    expect(find(t, 'xx काम yy', 2, 6)).toBe(3);
    expect(find(t, ' काम ')).toBe(-1); // longer
    expect(find(t, ' का')).toBe(-1); // shorter
    expect(find(t, ' कान')).toBe(-1); // same length, other text
    expect(t.size).toBe(1);
  });

  it('tells apart pieces whose hashes collide', () => {
    const t = SharedPieceCounts.create('builtin:test', 8);
    // The same hash passed for two different pieces: the keys, not the hashes, decide.
    expect(t.add('alpha', 0, 5, 42, 1)).toBe(true);
    expect(t.add('omega', 0, 5, 42, 2)).toBe(true);
    expect(t.find('alpha', 0, 5, 42)).toBe(1);
    expect(t.find('omega', 0, 5, 42)).toBe(2);
    expect(t.find('gamma', 0, 5, 42)).toBe(-1);
  });

  it('refuses pieces once full, and pieces longer than the cached length, keeping what it holds', () => {
    const t = SharedPieceCounts.create('builtin:test', 3);
    const words = ['one', 'two', 'three', 'four'];
    expect(words.map((w, i) => add(t, w, 0, w.length, i + 1))).toEqual([true, true, true, false]);
    expect(words.map((w) => find(t, w))).toEqual([1, 2, 3, -1]);
    const long = 'x'.repeat(MAX_CACHED_PIECE_LENGTH + 1);
    expect(add(SharedPieceCounts.create('builtin:test'), long, 0, long.length, 5)).toBe(false);
    expect(t.size).toBe(3);
  });

  it('is attached only by the tokenizer it was made for, and then shows what was added before', () => {
    const t = SharedPieceCounts.create('builtin:o200k_base');
    add(t, ' newsroom', 0, 9, 2);
    expect(SharedPieceCounts.attach(t.buffer, 'builtin:gpt2')).toBeNull();
    expect(SharedPieceCounts.attach(new SharedArrayBuffer(64), 'builtin:o200k_base')).toBeNull();
    const same = SharedPieceCounts.attach(t.buffer, 'builtin:o200k_base');
    expect(same).not.toBeNull();
    expect(find(same!, ' newsroom')).toBe(2);
    add(same!, ' desk', 0, 5, 1);
    expect(find(t, ' desk')).toBe(1);
  });

  it('rejects a capacity that is not a positive integer', () => {
    expect(() => SharedPieceCounts.create('x', 0)).toThrow(/capacity/);
    expect(() => SharedPieceCounts.create('x', 1.5)).toThrow(/capacity/);
  });
});

describe('SharedPieceCounts across threads', () => {
  it('loses no piece and gives no wrong count while four threads add and look up pieces in the same slots at once', async () => {
    const { Worker } = await import('node:worker_threads');
    // The workers hash keys to one of 16 values (test/fixtures/threads/shared-counts-worker.ts), so all
    // of them probe one cluster of slots and claim its free slots at the same moments.
    const keys: string[] = [];
    for (let i = 0; i < 4_000; i++) keys.push(`k${(i * 7919).toString(36)}${'x'.repeat(i % 5)}`);
    expect(new Set(keys).size).toBe(keys.length);
    const threads = 4;
    const table = SharedPieceCounts.create('builtin:stress', keys.length);
    const script = new URL('../fixtures/threads/shared-counts-worker.mjs', import.meta.url);
    const results = await Promise.all(
      Array.from(
        { length: threads },
        (_, index) =>
          new Promise<{ wrong: number; found: number; refused: number }>((resolve, reject) => {
            const w = new Worker(script, { workerData: { buffer: table.buffer, owner: 'builtin:stress', keys, index, threads } });
            w.once('message', resolve);
            w.once('error', reject);
          }),
      ),
    );
    expect(results.map((r) => r.wrong)).toEqual([0, 0, 0, 0]);
    expect(results.map((r) => r.refused)).toEqual([0, 0, 0, 0]);
    // The threads saw each other's pieces (how much they overlapped in time is up to the scheduler:
    // a race the protocol mishandles shows only when they do, which on two or more cores is most runs).
    expect(results.reduce((n, r) => n + r.found, 0)).toBeGreaterThan(keys.length);
    // Every key, added once by one thread, is there with its count.
    const countOf = (key: string): number => (hashRange(key, 0, key.length) >>> 0) % 1000;
    const weakHash = (k: string): number => (hashRange(k, 0, k.length) >>> 0) % 16;
    expect(keys.filter((k) => table.find(k, 0, k.length, weakHash(k)) !== countOf(k))).toEqual([]);
    expect(table.size).toBe(keys.length);
  }, 60_000);
});
