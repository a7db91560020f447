// A large shard measured in batches on several threads must give the result of measuring it
// document by document: same tallies, same located examples, same duplicate index bytes, same
// sampling sums and the same broken account when an analyzer fails. Checked on every shard of
// the demo corpus (invented newsroom data with mojibake, romanised Hindi, duplicates and a
// leaked evaluation item), with batches of one document and of a few thousand characters,
// settling in a shuffled order as results from other threads do.
import { mkdtempSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gunzipSync } from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareAnalyzers, type PreparedAnalyzers } from '../../src/core/analyzers.js';
import { DuplicateIndexBuilder } from '../../src/measure/duplicates/index.js';
import { loadPolicy } from '../../src/policy/index.js';
import type { Policy, SamplingSpec } from '../../src/policy/types.js';
import { discoverShards, readShard } from '../../src/read/index.js';
import type { ShardRef } from '../../src/read/types.js';
import { measureBatch, scanShard, scanShardInBatches, type BatchResult, type DocumentBatch, type ScanAnalyzers } from '../../src/results/scan.js';
import { storedShardResult } from '../../src/results/serialize.js';
import type { ShardResult } from '../../src/results/types.js';
import { generator as xorshift } from '../fixtures/prng.js';

const POLICY = 'examples/newsroom/policies/newsroom.yaml';

let policy: Policy;
let shards: ShardRef[];

beforeAll(async () => {
  const loaded = await loadPolicy(POLICY);
  if (!loaded.ok) throw new Error(JSON.stringify(loaded.problems));
  policy = loaded.policy;
  shards = (await discoverShards(policy.root, policy.corpus)).shards;
}, 60_000);

/** The result as stored (the duplicate index as base64), timing aside. */
function comparable(r: ShardResult): string {
  return JSON.stringify({ ...storedShardResult(r), elapsedMs: 0 });
}

/**
 * Returns a batch measurer whose results settle in a shuffled order (as results from several threads
 * do): each call waits until `hold` more batches have been handed out, or until reading has paused.
 */
function shuffledMeasurer(prepared: PreparedAnalyzers, analyzers: ScanAnalyzers, seed: number): (b: DocumentBatch) => Promise<BatchResult> {
  const rand = xorshift(seed);
  return (batch) => {
    const result = measureBatch(batch, prepared.scan, analyzers);
    return new Promise((resolve) => {
      let turns = Math.floor(rand() * 4);
      const step = (): void => (turns-- <= 0 ? resolve(result) : void setImmediate(step));
      step();
    });
  };
}

async function bothWays(sampling: SamplingSpec | undefined, batchChars: number, wrap: (a: ScanAnalyzers) => ScanAnalyzers = (a) => a): Promise<void> {
  const p: Policy = sampling ? { ...policy, sampling } : policy;
  const prepared = await prepareAnalyzers(p);
  const analyzers = wrap(prepared.analyzers);
  for (const [i, ref] of shards.entries()) {
    const one = await scanShard(ref, prepared.scan, analyzers);
    const batched = await scanShardInBatches(ref, prepared.scan, analyzers, shuffledMeasurer(prepared, analyzers, i + 1), { batchChars, inFlight: 3 });
    expect(comparable(batched), ref.path).toBe(comparable(one));
  }
}

describe('a shard measured in batches', () => {
  it('gives the document-by-document result on every demo shard, in batches of ~4,000 characters', async () => {
    await bothWays(undefined, 4000);
  });

  it('gives it with one document per batch', async () => {
    await bothWays(undefined, 1);
  });

  it('gives it under sampling by fraction and by documents per shard', async () => {
    await bothWays({ fraction: 0.3 }, 3000);
    await bothWays({ docsPerShard: 7 }, 3000);
  });

  it('gives it when no document falls under the sampling cutoff (the smallest-hash document is measured)', async () => {
    await bothWays({ fraction: 1e-12 }, 2000);
  });

  it('stops at the same line as one by one when an analyzer throws, and marks the shard broken there', async () => {
    // The 9th document of every shard makes the analyzer throw.
    const prepared = await prepareAnalyzers(policy);
    const poisoned = new Set<string>();
    for (const ref of shards) {
      let n = 0;
      await readShard(ref, prepared.scan.read, (doc) => {
        if (++n === 9) poisoned.add(doc.text);
      });
    }
    const wrap = (a: ScanAnalyzers): ScanAnalyzers => ({
      ...a,
      measure: (doc) => {
        if (poisoned.has(doc.text)) throw new Error('poisoned document');
        return a.measure(doc);
      },
    });
    await bothWays(undefined, 2500, wrap);
    const one = await scanShard(shards[0]!, prepared.scan, wrap(prepared.analyzers));
    expect(one.read.broken?.message).toContain('poisoned document');
  });

  it('gives it on a shard cut short and on a plain-text shard of paragraphs', async () => {
    const prepared = await prepareAnalyzers(policy);
    const dir = mkdtempSync(join(tmpdir(), 'sluice-batches-'));
    const big = shards.reduce((a, b) => (a.sizeBytes >= b.sizeBytes ? a : b));
    const bytes = readFileSync(big.absPath);
    // The gzip stream cut at 70 %: the reader counts what came before the break and marks the shard broken.
    const cut = join(dir, 'cut.jsonl.gz');
    writeFileSync(cut, bytes.subarray(0, Math.floor(bytes.length * 0.7)));
    // The same stories as plain text, a paragraph each, with a line that is not valid UTF-8 among them.
    const stories = gunzipSync(bytes)
      .toString('utf8')
      .split('\n')
      .flatMap((l) => {
        try {
          const text = (JSON.parse(l) as { text?: unknown }).text;
          return typeof text === 'string' && text.trim() ? [text.replace(/\s*\n\s*/g, ' ')] : [];
        } catch {
          return []; // the demo's planted broken lines
        }
      });
    const txt = join(dir, 'stories.txt');
    writeFileSync(txt, Buffer.concat([Buffer.from(stories.slice(0, 20).join('\n\n') + '\n\n'), Buffer.from([0xc3, 0x28, 0x0a]), Buffer.from(stories.slice(20).join('\n\n'))]));
    const refs: ShardRef[] = [
      { ...big, path: 'cut.jsonl.gz', absPath: cut, sizeBytes: statSync(cut).size },
      { ...big, path: 'stories.txt', absPath: txt, format: 'txt', compression: 'none', sizeBytes: statSync(txt).size },
    ];
    for (const [i, ref] of refs.entries()) {
      const one = await scanShard(ref, prepared.scan, prepared.analyzers);
      const batched = await scanShardInBatches(ref, prepared.scan, prepared.analyzers, shuffledMeasurer(prepared, prepared.analyzers, 40 + i), { batchChars: 3000, inFlight: 4 });
      expect(comparable(batched), ref.path).toBe(comparable(one));
    }
    const cutResult = await scanShard(refs[0]!, prepared.scan, prepared.analyzers);
    expect(cutResult.read.broken).toBeDefined();
    const txtResult = await scanShard(refs[1]!, prepared.scan, prepared.analyzers);
    expect(txtResult.read.rejected.byReason['invalid-encoding']).toBe(1);
    expect(txtResult.read.docs).toBe(stories.length);
  });

  it('tells the bytes read so far as it goes, ending at the decompressed size of the shard', async () => {
    const prepared = await prepareAnalyzers(policy);
    const big = shards.reduce((a, b) => (a.sizeBytes >= b.sizeBytes ? a : b));
    const seen: number[] = [];
    const r = await scanShardInBatches(big, prepared.scan, prepared.analyzers, (b) => Promise.resolve(measureBatch(b, prepared.scan, prepared.analyzers)), {
      batchChars: 2000,
      inFlight: 2,
      onRead: (bytes) => seen.push(bytes),
    });
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.every((b, i) => i === 0 || b >= seen[i - 1]!)).toBe(true);
    expect(seen.at(-1)).toBe(r.read.bytes);
  });

  it('rejects, instead of leaving documents out, when a batch is lost (a thread died)', async () => {
    const prepared = await prepareAnalyzers(policy);
    let calls = 0;
    const dying = (batch: DocumentBatch): Promise<BatchResult> =>
      ++calls === 3 ? Promise.reject(new Error('worker exited with code 1')) : Promise.resolve(measureBatch(batch, prepared.scan, prepared.analyzers));
    const big = shards.reduce((a, b) => (a.sizeBytes >= b.sizeBytes ? a : b));
    await expect(scanShardInBatches(big, prepared.scan, prepared.analyzers, dying, { batchChars: 500, inFlight: 2 })).rejects.toThrow('worker exited with code 1');
    expect(calls).toBeGreaterThanOrEqual(3);
  });
});

describe('duplicate index parts', () => {
  it('append to the blob that adding each document gives, lines jumping back and forth included', () => {
    const options = { shingle: 5, hashes: 128, threshold: 0.8, punctuation: 'keep' as const };
    const rand = xorshift(7);
    const docs = Array.from({ length: 60 }, (_, i) => ({
      ordinal: i,
      // Lines as a text shard's paragraphs give them, with large jumps.
      line: 1 + i * 3 + (i % 7 === 0 ? 100_000 : 0) + Math.floor(rand() * 2),
      language: i % 4,
      text: i % 9 === 0 ? '' : `story ${i % 13} of the city desk on the river ward budget, filed ${i % 5} times`,
    }));
    docs.sort((a, b) => a.line - b.line).forEach((d, i) => (d.ordinal = i));
    const whole = new DuplicateIndexBuilder(options);
    for (const d of docs) whole.add(d);
    const joined = new DuplicateIndexBuilder(options);
    for (const [from, to] of [[0, 1], [1, 17], [17, 17], [17, 60]] as const) {
      const part = new DuplicateIndexBuilder(options);
      for (const d of docs.slice(from, to)) part.add({ ...d, ordinal: d.ordinal - from });
      joined.addPart(part.takePart());
    }
    expect(Buffer.from(joined.finish()).equals(Buffer.from(whole.finish()))).toBe(true);
  });

  it('refuse a part built with other options', () => {
    const part = new DuplicateIndexBuilder({ shingle: 5, hashes: 64, threshold: 0.8, punctuation: 'keep' });
    part.add({ ordinal: 0, line: 1, language: 0, text: 'a short story of the city desk' });
    const into = new DuplicateIndexBuilder({ shingle: 5, hashes: 128, threshold: 0.8, punctuation: 'keep' });
    expect(() => into.addPart(part.takePart())).toThrow(/other options/);
  });
});
