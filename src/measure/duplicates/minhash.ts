// MinHash signatures of word-shingle sets.
//
// Scheme: a "fill" sketch after Dahlgaard, Knudsen and Thorup (2017, "Fast Similarity
// Sketching"), finished by optimal densification (Shrivastava, 2017, "Optimal Densification
// for Fast and Accurate Minwise Hashing"). Round t hashes every shingle once to one of the k
// bins; a bin keeps the smallest value of the first round that reached it. After FILL_ROUNDS
// rounds, each still-empty bin copies the first filled bin along a probe sequence fixed per
// bin. Each bin's value is then the minimum, under one random order, of the placements of the
// union of two sets that reach it (directly or through the same probe), so two sets agree in a
// bin with probability exactly their Jaccard similarity: the MinHash property (Broder, 1997).
// Cost: about min(n·FILL_ROUNDS, n + k·ln k) hashes per document instead of n·k.
//
// Chosen by measurement (scripts/bench-duplicates.mjs, one run, alternatives interleaved,
// Brown paragraphs, k = 128, 5-word shingles; MB/s of scan + sketch, ratio to the naive loop):
//   naive: string shingles in a Set, 128 universal hash functions     8.7 MB/s   1.0×
//   k independent Math.imul hash functions over shingle hashes       17.1 MB/s   2.0×
//   one-permutation hashing + optimal densification (1 round)         55.3 MB/s   6.3×
//   fill sketch, 8 rounds + densification (this)                      61.2 MB/s   7.0×
//   fill sketch, rounds until every bin is filled                     53.6 MB/s   6.2×
// (sketch alone: 4.0, 3.3 and 4.1 µs per paragraph for the last three; the machine is shared,
// so runs differ by ±30 % while the order stays). Variance of the
// estimate relative to √(J(1−J)/k), J = 0.8, sets of 5 / 10 / 20 / 40 / 80 / 160 / 400 shingles:
//   one-permutation hashing   1.50 1.37 1.32 1.30 1.08 0.87 0.78
//   8 rounds (this)           1.24 1.00 0.80 0.59 0.51 0.54 0.70
//   until filled              0.52 0.50 0.50 0.52 0.51 0.56 0.69
// Half of Brown's paragraphs have fewer than 50 shingles, where plain one-permutation hashing
// has 30 % more variance than k-permutation MinHash; 8 rounds keep the theoretical standard error an
// upper bound from 10 shingles up (the fill rounds' bins are negatively correlated, like
// sampling without replacement) and ran fastest.
//
// Word hashes that the duplicate kernel's scan left in its memory are sketched there too
// (kernels/duplicates.c, step for step; test/measure/duplicates-kernel.test.ts compares the
// signatures): in a CPU profile of the duplicates-only check of the 40 MB bench corpus, 108 ms
// against 174 ms for sketch and fill here in the run before (same report).
import * as hash from './hash.js';
import { madeScanKernel, type KernelSketcher } from '../kernels/duplicates-kernel.js';

// A module-local copy: some loaders turn imported bindings into getter calls.
const mix32b = hash.mix32b;

/** Base of the polynomial rolling hash over word hashes (odd, so multiplication is invertible mod 2^32). */
const ROLL_BASE = 0x2545f491;
/**
 * Placement rounds before the remaining empty bins are densified. Filling every bin by rounds
 * alone takes ~k·ln k placements (~700 at k = 128) even for a 10-word document; 8 rounds fill
 * all bins of documents over ~90 shingles and leave densification a few percent of the bins
 * of most others (figures above).
 */
const FILL_ROUNDS = 8;
/** Precomputed densification probes per bin; more are computed on demand (needed only when under ~1/8 of the bins are filled). */
const PROBE_TABLE = 32;
/** Fill rounds the kernel takes (an int32); more (Infinity, for experiments) are run here. */
const MAX_KERNEL_ROUNDS = 0x7fffffff;
/** The bin of a hash is taken from its high 16 bits, so k is at most 65535 (the header's two bytes agree). */
const MAX_HASHES = 65535;

/** Computes MinHash signatures with fixed parameters, reusing its buffers between documents (not reentrant). */
export class Sketcher {
  readonly shingle: number;
  readonly hashes: number;
  /** The last signature: one 32-bit value per bin, valid until the next call. */
  readonly values: Int32Array;
  private readonly rounds: Int32Array;
  private shingles: Int32Array;
  private readonly lengthSeed: Int32Array;
  private readonly fillRounds: number;
  /** This sketcher's tables in the duplicate kernel's memory, laid out on its first sketch there. */
  private inKernel: KernelSketcher | undefined;

  /** `fillRounds` is for experiments (scripts/bench-duplicates.mjs): 1 is plain one-permutation hashing with densification, Infinity fills every bin by rounds. Signatures are comparable only at equal values. */
  constructor(shingle: number, hashes: number, fillRounds = FILL_ROUNDS) {
    if (!Number.isInteger(hashes) || hashes < 1 || hashes > MAX_HASHES) throw new RangeError(`hashes must be an integer from 1 to ${MAX_HASHES}, got ${hashes}`);
    if (!Number.isInteger(shingle) || shingle < 1) throw new RangeError(`shingle must be a positive integer, got ${shingle}`);
    if (!(fillRounds >= 1)) throw new RangeError(`fillRounds must be at least 1, got ${fillRounds}`);
    this.shingle = shingle;
    this.hashes = hashes;
    this.fillRounds = fillRounds;
    this.values = new Int32Array(hashes);
    this.rounds = new Int32Array(hashes);
    this.shingles = new Int32Array(1024);
    // A seed per shingle length keeps a short document's single shingle (all its words) apart
    // from shingles of other lengths.
    this.lengthSeed = new Int32Array(shingle + 1);
    for (let m = 0; m <= shingle; m++) this.lengthSeed[m] = mix32b(0x632be5ab + m);
  }

  /**
   * Returns the number of shingles of a document given its word hashes (0 when it has no words,
   * and then `values` is untouched), leaving its signature in `values`. A document with fewer
   * words than one shingle gets one shingle made of all its words.
   */
  sketch(words: Int32Array, count: number): number {
    if (count === 0) return 0;
    // Word hashes a scan left in the duplicate kernel's memory are sketched there
    // (kernels/duplicates.c, step for step as below).
    const kernel = madeScanKernel();
    if (kernel !== undefined && this.fillRounds <= MAX_KERNEL_ROUNDS && kernel.holds(words)) {
      const at = words.byteOffset; // before laying the tables out, which may grow the memory and detach `words`
      this.inKernel ??= kernel.sketcher(this.shingle, this.hashes, this.fillRounds, this.lengthSeed, this.probes());
      return kernel.sketch(at, count, this.inKernel, this.values);
    }
    const n = this.shingle;
    const m = count < n ? count : n;
    const shingleCount = count < n ? 1 : count - n + 1;
    if (this.shingles.length < shingleCount) this.shingles = new Int32Array(shingleCount * 2);
    const sh = this.shingles;
    // Polynomial rolling hash H = Σ w[i+j]·B^(m−1−j) (mod 2^32): each shingle costs O(1).
    let top = 1; // B^(m−1)
    for (let j = 1; j < m; j++) top = Math.imul(top, ROLL_BASE);
    let h = 0;
    for (let j = 0; j < m; j++) h = (Math.imul(h, ROLL_BASE) + words[j]!) | 0;
    const seed = this.lengthSeed[m]!;
    sh[0] = mix(h ^ seed);
    for (let i = 1; i < shingleCount; i++) {
      h = (Math.imul((h - Math.imul(words[i - 1]!, top)) | 0, ROLL_BASE) + words[i + m - 1]!) | 0;
      sh[i] = mix(h ^ seed);
    }
    this.fill(sh, shingleCount);
    return shingleCount;
  }

  /** Returns `values` filled with the signature of a set given as `count` 32-bit hashes in `set` (duplicates allowed; count ≥ 1). */
  fill(set: Int32Array, count: number): Int32Array {
    const k = this.hashes;
    const val = this.values;
    const rnd = this.rounds;
    rnd.fill(-1);
    let empty = k;
    // Bin = high 16 bits scaled to k (k ≤ 65535, so the product fits 32 bits). Values compare
    // as signed integers: any fixed total order serves MinHash, and int32 keeps V8 off doubles.
    // Round 0 uses the element hashes as they are (already mixed).
    for (let i = 0; i < count; i++) {
      const x = set[i]!;
      const b = Math.imul(x >>> 16, k) >>> 16;
      const r = rnd[b]!;
      if (r < 0) {
        rnd[b] = 0;
        val[b] = x;
        empty--;
      } else if (x < val[b]!) {
        val[b] = x;
      }
    }
    const rounds = this.fillRounds;
    for (let t = 1; empty > 0 && t < rounds; t++) {
      const ts = Math.imul(t, 0x9e3779b1);
      for (let i = 0; i < count; i++) {
        const x = mix(set[i]! ^ ts);
        const b = Math.imul(x >>> 16, k) >>> 16;
        const r = rnd[b]!;
        if (r < 0) {
          rnd[b] = t;
          val[b] = x;
          empty--;
        } else if (r === t && x < val[b]!) {
          val[b] = x;
        }
      }
    }
    // A bin's value is its winner's hash in the winning round, so two sets agree in a bin when
    // the same (shingle, round) won it, and otherwise only by a 2^−32 coincidence. The winner is
    // decided by its high bits; its low bits, which reduced-width signatures keep, stay uniform.
    if (empty > 0) this.densify();
    return val;
  }

  /**
   * Fills each still-empty bin with the value of the first filled bin along a probe sequence
   * that depends only on the bin (optimal densification, Shrivastava 2017): two sets copy from
   * the same bin exactly when it is the first one filled in both, so agreement stays ∝ Jaccard.
   */
  private densify(): void {
    const k = this.hashes;
    const val = this.values;
    const rnd = this.rounds;
    const probes = this.probes();
    for (let i = 0; i < k; i++) {
      if (rnd[i]! >= 0) continue;
      let from = -1;
      for (let a = 0; a < PROBE_TABLE; a++) {
        const j = probes[i * PROBE_TABLE + a]!;
        if (rnd[j]! >= 0) {
          from = j;
          break;
        }
      }
      for (let a = PROBE_TABLE; from < 0; a++) {
        const j = probeBin(i, a, k);
        if (rnd[j]! >= 0) from = j;
      }
      val[i] = val[from]!;
    }
  }

  private probeTable: Int32Array | undefined;

  /** Returns the first PROBE_TABLE probes of every bin, computed once per sketcher. */
  private probes(): Int32Array {
    if (this.probeTable) return this.probeTable;
    const k = this.hashes;
    const t = new Int32Array(k * PROBE_TABLE);
    for (let i = 0; i < k; i++) for (let a = 0; a < PROBE_TABLE; a++) t[i * PROBE_TABLE + a] = probeBin(i, a, k);
    this.probeTable = t;
    return t;
  }
}

/** Returns the bin probed at `attempt` for empty bin `bin` (never `bin` itself, which is empty). */
function probeBin(bin: number, attempt: number, k: number): number {
  const x = mix(Math.imul(bin + 1, 0x9e3779b1) ^ Math.imul(attempt + 1, 0x85ebca77) ^ 0x27d4eb2f);
  return Math.imul(x >>> 16, k) >>> 16;
}

/** MurmurHash3's finalizer as a signed 32-bit integer (the hot loops stay in int32). */
function mix(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return h ^ (h >>> 16);
}

/** Returns the fraction of positions at which two full-width signatures agree (the MinHash estimate of Jaccard similarity). */
export function signatureAgreement(a: Int32Array, b: Int32Array): number {
  if (a.length !== b.length) throw new RangeError(`signatures of different lengths: ${a.length} and ${b.length}`);
  let same = 0;
  for (let i = 0; i < a.length; i++) if (a[i] === b[i]) same++;
  return same / a.length;
}
