// Which documents a sampled scan measures, and the sums a sampled shard keeps so the
// judge can put a confidence interval on every figure.
//
// Documents are picked by a hash of their raw text, never by position: the same text is
// picked on every run, in every shard it sits in, on both sides of a comparison, and
// exact copies are picked together. `fraction` measures the documents whose hash lies
// below fraction × 2^53 (one pass). `docs-per-shard: N` measures the N documents with the
// smallest hashes; finding the N-th smallest needs one extra read of the shard, which is
// cheap next to measuring (reading runs at hundreds of MB/s, measuring with a tokenizer
// at a few: see test/sampling/bench-sampling.mjs). Keeping the N smallest seen so far in
// one pass would measure about N·(1 + ln(shardDocs/N)) documents to keep N (3.3× the work
// at 50,000 documents and N = 5,000), or hold N texts in memory.
//
// Given how many documents of a shard were picked, the picked set is a simple random
// sample of the shard's texts (the hash is a pseudo-random function of the text), so
// the judge treats shards as strata of a stratified sample.
import { createHash } from 'node:crypto';
import type { SamplingSpec } from '../policy/types.js';
import type { DocumentMeasure } from '../measure/types.js';
import type { DocumentTokens } from './tally.js';
import type { LanguageMoments, LanguageTally, ShardResult, ShardSample, TokenTally } from './types.js';

/** Document hashes are integers in [0, HASH_SPACE): 53 bits, exact in a double. */
export const HASH_SPACE = 2 ** 53;

/** Key of the duplicate-index language of documents not measured (their language is not known). */
export const UNSAMPLED_LANGUAGE = 'unsampled';

/**
 * Returns the 53-bit hash of a document's raw text (the first 53 bits of SHA-256 of its UTF-8).
 * Node's SHA-256 ran at ~270 MB/s on 2 KB Brown documents here, as fast as a hand-written
 * 53-bit multiply-xorshift hash (~210 MB/s), so the library's better-mixed hash is used.
 * `seed` exists for simulations (another seed, another sample); policies always use 0.
 */
export function documentHash(text: string, seed = 0): number {
  const h = createHash('sha256');
  if (seed !== 0) h.update(`${seed}\u0000`);
  const d = h.update(text, 'utf8').digest();
  return d.readUInt32BE(0) * 0x20_0000 + (d.readUInt32BE(4) >>> 11);
}

/** Returns the largest hash a `fraction` sample measures (a document is measured when its hash is at most this; -1 measures none). */
export function fractionCutoff(fraction: number): number {
  return Math.ceil(fraction * HASH_SPACE) - 1;
}

/** Keeps the `k` smallest hashes seen (with repeats), in a max-heap. */
export class SmallestHashes {
  private readonly heap: number[] = [];
  constructor(readonly k: number) {}

  /** Offers one document's hash. */
  add(hash: number): void {
    const h = this.heap;
    if (h.length < this.k) {
      h.push(hash);
      let i = h.length - 1;
      while (i > 0) {
        const p = (i - 1) >> 1;
        if (h[p]! >= h[i]!) break;
        [h[p], h[i]] = [h[i]!, h[p]!];
        i = p;
      }
      return;
    }
    if (hash >= h[0]!) return;
    h[0] = hash;
    let i = 0;
    for (;;) {
      const l = 2 * i + 1;
      const r = l + 1;
      let m = i;
      if (l < h.length && h[l]! > h[m]!) m = l;
      if (r < h.length && h[r]! > h[m]!) m = r;
      if (m === i) break;
      [h[m], h[i]] = [h[i]!, h[m]!];
      i = m;
    }
  }

  /**
   * Returns the cutoff: the k-th smallest hash, or HASH_SPACE when fewer than k were seen (all are measured).
   * Copies of one text share a hash, so a cutoff on a repeated hash measures every copy: a few more than k.
   */
  cutoff(): number {
    return this.heap.length < this.k ? HASH_SPACE : this.heap[0]!;
  }
}

/** Returns the method name of a sampling setting and its value. */
export function describeSampling(spec: SamplingSpec): { method: ShardSample['method']; setting: number } {
  return 'fraction' in spec ? { method: 'fraction', setting: spec.fraction } : { method: 'docs-per-shard', setting: spec.docsPerShard };
}

/** Returns moments with every sum at zero. */
export function emptyMoments(): LanguageMoments {
  return {
    bytes2: 0,
    chars2: 0,
    words2: 0,
    tokens2: 0,
    baselineTokens2: 0,
    wordTokens2: 0,
    wordTokensWords: 0,
    continued2: 0,
    continuedWords: 0,
    baselineWordTokens2: 0,
    wordTokensBaseline: 0,
    expected2: 0,
    scriptChars2: 0,
    expectedScriptChars: 0,
  };
}

/** Accumulates the second-order sums of a shard's measured documents, per language. */
/** The fields of LanguageMoments, in their order. */
const MOMENT_FIELDS = Object.keys(emptyMoments()) as Array<keyof LanguageMoments>;
const LIMB = 2 ** 32;

/**
 * Exact running sums of a shard's moments, per key: each field as two limbs (multiples of 2^32,
 * remainder), so sums stay exact far past 2^53 and come out the same however the documents were
 * split into batches and in what order the batches' sums were added (floats would differ in the
 * last bits once a sum passed 2^53). Plain data, so it crosses threads.
 */
export type MomentSums = Record<string, number[]>;

export class MomentTally {
  private readonly sums: MomentSums = {};

  private of(key: string): number[] {
    return (this.sums[key] ??= new Array<number>(MOMENT_FIELDS.length * 2).fill(0));
  }

  /** Adds a non-negative integer (a product of counts, exact below 2^53) to field `f` of `s`. */
  private static put(s: number[], f: number, v: number): void {
    const high = Math.floor(v / LIMB);
    MomentTally.addLimbs(s, f, high, v - high * LIMB);
  }

  /** Adds `hi` · 2^32 + `lo` (lo below 2^32) to field `f` of `s`, carrying into the high limb. */
  private static addLimbs(s: number[], f: number, hi: number, lo: number): void {
    let h = s[2 * f]! + hi;
    let l = s[2 * f + 1]! + lo;
    if (l >= LIMB) {
      h += 1;
      l -= LIMB;
    }
    s[2 * f] = h;
    s[2 * f + 1] = l;
  }

  /** The sums as moments (each rounded once, from its exact value). */
  get moments(): Record<string, LanguageMoments> {
    const out: Record<string, LanguageMoments> = {};
    for (const [key, s] of Object.entries(this.sums)) {
      const m = emptyMoments();
      MOMENT_FIELDS.forEach((field, f) => (m[field] = s[2 * f]! * LIMB + s[2 * f + 1]!));
      out[key] = m;
    }
    return out;
  }

  /** The exact sums, for a batch measured elsewhere to hand back. */
  state(): MomentSums {
    return this.sums;
  }

  /** Adds the sums of the documents that follow (a batch measured elsewhere); new keys come after the ones already seen. */
  absorb(o: MomentSums): void {
    for (const [key, s] of Object.entries(o)) {
      const into = this.of(key);
      for (let f = 0; f < MOMENT_FIELDS.length; f++) MomentTally.addLimbs(into, f, s[2 * f]!, s[2 * f + 1]!);
    }
  }

  /** Adds one measured document; the keys match ShardTally's (detected language; purity basis for the script sums). */
  add(m: DocumentMeasure, tokens?: DocumentTokens): void {
    const put = MomentTally.put;
    const t = this.of(m.language);
    put(t, F.bytes2, m.bytes * m.bytes);
    put(t, F.chars2, m.chars * m.chars);
    put(t, F.words2, m.words * m.words);
    const main = tokens?.main;
    const base = tokens?.baseline;
    if (main) {
      put(t, F.tokens2, main.tokens * main.tokens);
      put(t, F.wordTokens2, main.wordTokens * main.wordTokens);
      put(t, F.wordTokensWords, main.wordTokens * m.words);
      put(t, F.continued2, main.continuedWords * main.continuedWords);
      put(t, F.continuedWords, main.continuedWords * m.words);
    }
    if (base) {
      put(t, F.baselineTokens2, base.tokens * base.tokens);
      put(t, F.baselineWordTokens2, base.wordTokens * base.wordTokens);
      if (main) put(t, F.wordTokensBaseline, main.wordTokens * base.wordTokens);
    }
    if (m.purity !== null) {
      let scriptChars = 0;
      for (const n of Object.values(m.scripts)) scriptChars += n;
      const expected = Math.round(m.purity * scriptChars);
      const b = this.of(m.declared !== undefined && m.declared !== 'other' ? m.declared : m.language);
      put(b, F.expected2, expected * expected);
      put(b, F.scriptChars2, scriptChars * scriptChars);
      put(b, F.expectedScriptChars, expected * scriptChars);
    }
  }
}

/** Index of each moment field in MOMENT_FIELDS. */
const F = Object.fromEntries(MOMENT_FIELDS.map((f, i) => [f, i])) as Record<keyof LanguageMoments, number>;

/** Returns the weight that scales a shard's measured sums to the whole shard: documents ÷ measured documents (1 when not sampled). */
export function shardWeight(r: ShardResult): number {
  if (!r.sample) return 1;
  return r.sample.docs > 0 ? r.sample.of / r.sample.docs : 0;
}

/** Returns a copy of a shard result whose tallies are scaled to estimates for the whole shard (fractional counts); `read` and located samples stay as they are. */
export function scaleShardResult(r: ShardResult): ShardResult {
  const w = shardWeight(r);
  if (!r.sample || w === 1) return r;
  const scaleTokens = (t: TokenTally | undefined): TokenTally | undefined =>
    t && { tokens: t.tokens * w, unknown: t.unknown * w, wordTokens: t.wordTokens * w, continuedWords: t.continuedWords * w };
  const scaleCounts = <K extends string>(c: Record<K, number>): Record<K, number> =>
    Object.fromEntries(Object.entries(c).map(([k, n]) => [k, (n as number) * w])) as Record<K, number>;
  const languages: Record<string, LanguageTally> = {};
  for (const [k, t] of Object.entries(r.languages)) {
    const s: LanguageTally = {
      docs: t.docs * w,
      bytes: t.bytes * w,
      chars: t.chars * w,
      words: t.words * w,
      purityDocs: t.purityDocs * w,
      scriptChars: t.scriptChars * w,
      expectedScriptChars: t.expectedScriptChars * w,
      purityHistogram: t.purityHistogram.map((n) => n * w),
    };
    const tokens = scaleTokens(t.tokens);
    const baseline = scaleTokens(t.baseline);
    if (tokens) s.tokens = tokens;
    if (baseline) s.baseline = baseline;
    languages[k] = s;
  }
  return {
    ...r,
    languages,
    scripts: scaleCounts(r.scripts),
    anomalyMasks: scaleCounts(r.anomalyMasks),
    anomalyDocs: scaleCounts(r.anomalyDocs),
    declared: Object.fromEntries(Object.entries(r.declared).map(([d, row]) => [d, scaleCounts(row)])),
  };
}
