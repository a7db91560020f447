// The estimator and the banding against their published theory: MinHash agreement estimates
// Jaccard similarity with standard error √(J(1−J)/k) (Broder, 1997, "On the resemblance and
// containment of documents"); keeping b bits per value adds accidental agreement 2^−b, which
// the estimator corrects at a known cost in variance (Li and König, 2010, "b-Bit Minwise
// Hashing"); a pair whose rows agree with probability p shares a band with probability
// 1 − (1 − p^r)^b (Leskovec, Rajaraman and Ullman, "Mining of Massive Datasets", ch. 3).
//
// Sets with an exact Jaccard similarity are built as documents of distinct invented words with
// 1-word shingles, so each word is one shingle and the sets are known exactly; the estimates go
// through the real builder and the stored (reduced-width) signatures the join reads.
import { describe, expect, it } from 'vitest';
import { generator } from '../fixtures/prng.js';
import {
  DuplicateIndexBuilder,
  bandKeysOf,
  candidateProbability,
  estimateJaccard,
  inspectIndex,
  lshBands,
  rowAgreement,
  signatureBits,
} from '../../src/measure/duplicates/index.js';

/** Returns a fresh invented word (letters only, so the scanner keeps it whole). */
function wordMaker(rand: () => number): () => string {
  const letters = 'abcdefghijklmnopqrstuvwxyz';
  let serial = 0;
  return () => {
    let w = '';
    for (let n = serial++; ; n = Math.floor(n / 26)) {
      w += letters[n % 26];
      if (n < 26) break;
    }
    for (let i = 0; i < 4; i++) w += letters[Math.floor(rand() * 26)];
    return w;
  };
}

/** Returns a pair of 1-shingle documents whose word sets have union `u` and Jaccard exactly round(j·u)/u. */
function pairWithJaccard(u: number, j: number, word: () => string, rand: () => number): { a: string; b: string; jaccard: number } {
  const shared = Math.round(j * u);
  const rest = u - shared;
  const onlyA = Math.floor(rest / 2);
  const common = Array.from({ length: shared }, word);
  const a = [...common, ...Array.from({ length: onlyA }, word)];
  const b = [...common, ...Array.from({ length: rest - onlyA }, word)];
  // Word order is irrelevant to 1-word shingles; shuffle anyway so nothing relies on it.
  for (const list of [a, b]) {
    for (let i = list.length - 1; i > 0; i--) {
      const k = Math.floor(rand() * (i + 1));
      [list[i], list[k]] = [list[k]!, list[i]!];
    }
  }
  return { a: a.join(' '), b: b.join(' '), jaccard: shared / u };
}

function indexOf(texts: string[], threshold: number, hashes = 128): Uint8Array {
  const b = new DuplicateIndexBuilder({ shingle: 1, hashes, threshold, punctuation: 'keep' });
  texts.forEach((text, i) => b.add({ ordinal: i, line: i + 1, language: 0, text }));
  return b.finish();
}

describe('MinHash estimate of Jaccard similarity (Broder 1997; b-bit correction, Li and König 2010)', () => {
  const k = 128;
  const threshold = 0.8; // the default: 4-bit stored values
  const bits = signatureBits(lshBands(threshold, k).rows);
  const c = Math.pow(2, -bits);

  for (const j of [0.2, 0.5, 0.8, 0.9]) {
    for (const u of [20, 50, 200, 1000]) {
      it(`J = ${j}, union of ${u} shingles: unbiased, and outside 3 standard errors as rarely as theory says`, () => {
        const rand = generator(Math.round(j * 1000) * 7919 + u);
        const word = wordMaker(rand);
        const pairs = u >= 1000 ? 150 : 400;
        const texts: string[] = [];
        let truth = 0;
        for (let p = 0; p < pairs; p++) {
          const pair = pairWithJaccard(u, j, word, rand);
          texts.push(pair.a, pair.b);
          truth = pair.jaccard;
        }
        const blob = indexOf(texts, threshold);
        expect(inspectIndex(blob)).toMatchObject({ ok: true, header: { signatureBits: bits, documents: 2 * pairs } });
        // Standard error at the stored width: P_b = C + (1 − C)J agreements, Ĵ = (P̂ − C)/(1 − C),
        // so SE(Ĵ) = √(P_b(1 − P_b)/k) / (1 − C) (Li and König 2010, for sparse sets).
        const pb = c + (1 - c) * truth;
        const se = Math.sqrt((pb * (1 - pb)) / k) / (1 - c);
        let sumError = 0;
        let outside = 0;
        for (let p = 0; p < pairs; p++) {
          const est = estimateJaccard(blob, 2 * p, blob, 2 * p + 1);
          sumError += est - truth;
          if (Math.abs(est - truth) > 3 * se) outside++;
        }
        const meanError = sumError / pairs;
        // Unbiased: the mean of `pairs` estimates lies within 4 standard errors of the mean.
        expect(Math.abs(meanError)).toBeLessThan((4 * se) / Math.sqrt(pairs));
        // A normal estimate falls outside 3 SE 0.27 % of the time; allow sampling slack on top
        // (binomial: 0.27 % of 400 is ~1 pair).
        expect(outside / pairs).toBeLessThanOrEqual(0.0027 + 3 * Math.sqrt(0.0027 / pairs) + 1 / pairs);
      });
    }
  }

  it('identical sets estimate 1, disjoint sets estimate about 0', () => {
    const rand = generator(99);
    const word = wordMaker(rand);
    const texts: string[] = [];
    for (let p = 0; p < 50; p++) {
      const a = Array.from({ length: 60 }, word).join(' ');
      texts.push(a, a.split(' ').reverse().join(' '));
      texts.push(Array.from({ length: 60 }, word).join(' '), Array.from({ length: 60 }, word).join(' '));
    }
    const blob = indexOf(texts, threshold);
    for (let p = 0; p < 50; p++) {
      expect(estimateJaccard(blob, 4 * p, blob, 4 * p + 1)).toBe(1);
      // Disjoint: only accidental 4-bit agreement (1/16 of values), corrected to about 0.
      expect(estimateJaccard(blob, 4 * p + 2, blob, 4 * p + 3)).toBeLessThan(0.12);
    }
  });
});

describe('LSH banding: candidate rate follows 1 − (1 − p^r)^b (Leskovec, Rajaraman, Ullman, ch. 3)', () => {
  for (const threshold of [0.8, 0.5]) {
    const k = 128;
    const { bands, rows } = lshBands(threshold, k);
    const bits = signatureBits(rows);
    it(`threshold ${threshold}: ${bands} bands × ${rows} rows at ${bits} bits, measured rate within 4 binomial SE`, () => {
      const rand = generator(Math.round(threshold * 100));
      const word = wordMaker(rand);
      const pairs = 600;
      for (const s of [0.5, 0.6, 0.7, 0.8, 0.85, 0.9, 0.95]) {
        const texts: string[] = [];
        const truths: number[] = [];
        for (let p = 0; p < pairs; p++) {
          // Documents of 40–400 shingles, as in real corpora; round(s·u)/u is the exact truth.
          const u = 40 + Math.floor(rand() * 361);
          const pair = pairWithJaccard(u, s, word, rand);
          texts.push(pair.a, pair.b);
          truths.push(pair.jaccard);
        }
        const blob = indexOf(texts, threshold);
        let candidates = 0;
        let expected = 0;
        for (let p = 0; p < pairs; p++) {
          const ka = bandKeysOf(blob, 2 * p, bands, rows);
          const kb = bandKeysOf(blob, 2 * p + 1, bands, rows);
          if (ka.some((key, band) => key === kb[band])) candidates++;
          // Stored rows agree with probability s + (1 − s)·2^−bits (b-bit MinHash, Li and König 2010).
          expected += candidateProbability(rowAgreement(truths[p]!, bits), bands, rows);
        }
        const rate = candidates / pairs;
        const mean = expected / pairs;
        const se = Math.sqrt((mean * (1 - mean)) / pairs);
        expect(Math.abs(rate - mean), `s = ${s}: measured ${rate}, theory ${mean.toFixed(4)}`).toBeLessThanOrEqual(4 * se + 1 / pairs);
      }
    });
  }

  it('places the steep part of the S-curve at the threshold, leaning towards recall', () => {
    for (const threshold of [0.5, 0.7, 0.8, 0.9]) {
      for (const k of [64, 128, 256]) {
        const { bands, rows } = lshBands(threshold, k);
        expect(bands * rows).toBeLessThanOrEqual(k);
        const bits = signatureBits(rows);
        const p = (s: number) => candidateProbability(rowAgreement(s, bits), bands, rows);
        // The rule of thumb (1/b)^(1/r) ≈ threshold (MMDS ch. 3), shifted down by the 9:1
        // weighting of misses over false candidates: never above the threshold, and at most
        // 0.15 below it (the shift is largest at low thresholds, where r is small).
        const knee = Math.pow(1 / bands, 1 / rows);
        expect(knee).toBeLessThanOrEqual(threshold + 0.01);
        expect(knee).toBeGreaterThan(threshold - 0.15);
        expect(p(Math.min(1, threshold + 0.05))).toBeGreaterThan(0.92);
        expect(p(threshold - 0.3)).toBeLessThan(0.25);
      }
    }
  });

  it('rejects thresholds and hash counts outside their range', () => {
    expect(() => lshBands(0, 128)).toThrow(/threshold/);
    expect(() => lshBands(1.2, 128)).toThrow(/threshold/);
    expect(() => lshBands(0.8, 0)).toThrow(/hashes/);
  });
});
