// Evaluation-set contamination: does a training text contain an n-word span of any held-out
// evaluation item? The 13-gram overlap test follows Brown et al. (2020), "Language Models are
// Few-Shot Learners", appendix C. Words are those of the near-duplicate stage (letters, marks
// and digits, after NFC and lowercasing), so punctuation and case differences still match.
// Each n-gram is hashed to 64 bits (two 32-bit lanes); with a million eval n-grams and a
// billion training n-grams, a false match by hash collision has probability ~5e-5 in all.
//
// An eval item shorter than n words is kept as one gram of all its words: a training text
// overlaps it when it contains the whole item as a run of words. (Dropping such items would
// hide contamination of short-answer sets; a very short item — one or two words — will match
// ordinary text, so the index counts them in `shortItems` for the report to show.) An item with
// no words at all cannot overlap anything and is counted in `emptyItems`.
//
// The document's words are hashed in the duplicate kernel's scan (the duplicate index's, in a
// full check, or one of this module's own), and the windows are searched there (kernels/duplicates.c, step for step as below,
// over a copy of the index's table): in a CPU profile of the full check of the 40 MB bench
// corpus, 73 ms against 127 ms for findContamination here in the run before (same report).
import { createHash } from 'node:crypto';
import * as hash from './hash.js';
import { DocumentScanner, hashWords, prepareText, sharedWords, wordBuffer } from './scan.js';
import { MAX_SCAN_UNITS, madeScanKernel } from '../kernels/duplicates-kernel.js';

// Module-local copies (see scan.ts: some loaders make imported bindings getters).
const mix32 = hash.mix32;
const mix32b = hash.mix32b;

/** Default n of the overlap test: 13 words, after Brown et al. (2020). */
export const DEFAULT_NGRAM = 13;
/** Rolling-hash bases of the two lanes (odd, so each step is invertible mod 2^32). */
const BASE_1 = 0x2545f491;
const BASE_2 = 0x5851f42d;
/** The table is kept at most half full, so a probe ends after ~2 slots on average. */
const LOAD = 0.5;
/**
 * Prefilter bits per gram: a bitmap of the grams' first-lane hashes sits in front of the table,
 * so a training n-gram absent from the eval set (nearly all of them) costs one load from a
 * small array, and neither its second lane nor the table (three arrays, 768 KiB for the bench
 * eval set) is touched. At 16 to 32 bits per gram (rounded up to a power of two) at most 1 in 16
 * absent grams passes; the bench eval set's 25,313 grams set 4.8 % of 2^19 bits (64 KiB).
 * Measured as an in-process A/B of findContamination with and without the filter over the 40 MB
 * bench corpus (CPU time, best of 6 rounds, both orders, shared 2-core machine): the
 * contamination stage alone 0.90× and 0.84×, with the duplicate index (dup+cont) 0.85× and 0.92×.
 */
const FILTER_BITS_PER_GRAM = 16;
/** The bitmap stays within 2^MAX_FILTER_LOG bits (2 MiB): a larger eval set lets more grams through, with the same answers. */
const MAX_FILTER_LOG = 24;
/** Bump when tokenization or hashing changes, so cached results keyed by the index id are not reused. */
const INDEX_VERSION = 2;

/** An evaluation item: the eval file (as reports name it), the 1-based line, and its text. */
export interface EvalItem {
  file: string;
  line: number;
  text: string;
}

/** An index of the n-grams of a set of evaluation items. */
export interface EvalIndex {
  /** 16 hex digits identifying the index's contents (evalSetId of its items and n): a cache key for results per eval set. */
  readonly id: string;
  readonly ngram: number;
  readonly items: number;
  /** Distinct n-grams (and whole short items) in the index. */
  readonly grams: number;
  /** Items shorter than n words, each indexed as one gram of all its words. */
  readonly shortItems: number;
  /** Items without a single word: they can overlap nothing. */
  readonly emptyItems: number;
  /** Lengths (in words) of grams in the index, longest first: n, then any shorter item lengths. */
  readonly lengths: readonly number[];
  /**
   * @internal open-addressing table: two key lanes and the first item holding each gram (slot
   * from the low bits of lane 1), and a bitmap prefilter over the high bits of lane 1 (bit
   * `lane1 >>> filterShift` is set for every gram in the table).
   */
  readonly table: { lane1: Int32Array; lane2: Int32Array; item: Int32Array; mask: number; filter: Int32Array; filterShift: number };
  /** @internal where each item came from. */
  readonly sources: ReadonlyArray<{ file: string; line: number }>;
}

/**
 * Returns 16 hex digits naming an evaluation set as an index of n-grams would be built from
 * it: the index version, n, and every item's file, line and text, in order (SHA-256). It
 * needs no word pass, so a run whose shards all come from the cache can key them without
 * building the index.
 */
export function evalSetId(items: readonly EvalItem[], ngram = DEFAULT_NGRAM): string {
  const h = createHash('sha256');
  h.update(`sluice eval index v${INDEX_VERSION} n=${ngram} items=${items.length}\0`);
  for (const item of items) h.update(`${item.file}\0${item.line}\0${item.text}\0`);
  return h.digest('hex').slice(0, 16);
}

/** Returns an index of every n-word span (and every whole item shorter than n words) of the evaluation items; a gram in several items maps to the first. */
export function buildEvalIndex(items: EvalItem[], ngram = DEFAULT_NGRAM): EvalIndex {
  if (!Number.isInteger(ngram) || ngram < 1) throw new RangeError(`contamination: ngram must be a positive integer, got ${ngram}`);
  const buf = wordBuffer(2);
  const grams: Array<{ l1: Int32Array; l2: Int32Array; count: number }> = [];
  const lengths = new Set<number>();
  let total = 0;
  let shortItems = 0;
  let emptyItems = 0;
  items.forEach((item, idx) => {
    if (typeof item?.text !== 'string') throw new TypeError(`contamination: item ${idx} (${item?.file}:${item?.line}) has no text`);
    const words = hashWords(prepareText(item.text), buf);
    if (words === 0) {
      emptyItems++;
      grams.push({ l1: new Int32Array(0), l2: new Int32Array(0), count: 0 });
      return;
    }
    const m = Math.min(ngram, words);
    if (words < ngram) shortItems++;
    lengths.add(m);
    const count = words - m + 1;
    const l1 = new Int32Array(count);
    const l2 = new Int32Array(count);
    rollGrams(buf.lane1, buf.lane2!, words, m, l1, l2);
    grams.push({ l1, l2, count });
    total += count;
  });

  let size = 16;
  while (size * LOAD < total) size *= 2;
  const lane1 = new Int32Array(size);
  const lane2 = new Int32Array(size);
  const item = new Int32Array(size).fill(-1);
  const mask = size - 1;
  let filterLog = 5;
  while (filterLog < MAX_FILTER_LOG && 2 ** filterLog < total * FILTER_BITS_PER_GRAM) filterLog++;
  const filter = new Int32Array(2 ** (filterLog - 5));
  const filterShift = 32 - filterLog;
  let distinct = 0;
  grams.forEach((g, idx) => {
    for (let i = 0; i < g.count; i++) {
      const a = g.l1[i]!;
      const b = g.l2[i]!;
      const bit = a >>> filterShift;
      filter[bit >>> 5]! |= 1 << (bit & 31);
      let slot = a & mask;
      while (item[slot]! >= 0 && !(lane1[slot] === a && lane2[slot] === b)) slot = (slot + 1) & mask;
      if (item[slot]! < 0) {
        lane1[slot] = a;
        lane2[slot] = b;
        item[slot] = idx;
        distinct++;
      }
    }
  });
  return {
    id: evalSetId(items, ngram),
    ngram,
    items: items.length,
    grams: distinct,
    shortItems,
    emptyItems,
    lengths: [...lengths].sort((a, b) => b - a),
    table: { lane1, lane2, item, mask, filter, filterShift },
    sources: items.map((it) => ({ file: it.file, line: it.line })),
  };
}

/** base^(m − 1) mod 2^32: the weight of a window's first word, taken out as the window slides on. */
function topPower(base: number, m: number): number {
  let top = 1;
  for (let j = 1; j < m; j++) top = Math.imul(top, base);
  return top;
}

/** The polynomial hash mod 2^32 of the m word hashes words[from, from + m) in one lane. */
function windowHash(words: Int32Array, from: number, m: number, base: number): number {
  let h = 0;
  for (let j = from; j < from + m; j++) h = (Math.imul(h, base) + words[j]!) | 0;
  return h;
}

/** The next window's hash: `h` without its first word `out` (weighed by `top`), times the base, plus the new word `next`. */
function slide(h: number, out: number, next: number, top: number, base: number): number {
  return (Math.imul((h - Math.imul(out, top)) | 0, base) + next) | 0;
}

/** Writes the two-lane hash of every m-word window of the words w1/w2[0 .. count) into l1/l2 (count − m + 1 of them). */
function rollGrams(w1: Int32Array, w2: Int32Array, count: number, m: number, l1: Int32Array, l2: Int32Array): void {
  const top1 = topPower(BASE_1, m);
  const top2 = topPower(BASE_2, m);
  let h1 = windowHash(w1, 0, m, BASE_1);
  let h2 = windowHash(w2, 0, m, BASE_2);
  // The window length is mixed in, so a short item's gram cannot equal a window of another length.
  l1[0] = mix32(h1 ^ m);
  l2[0] = mix32b(h2 + m);
  for (let i = 1; i + m <= count; i++) {
    h1 = slide(h1, w1[i - 1]!, w1[i + m - 1]!, top1, BASE_1);
    h2 = slide(h2, w2[i - 1]!, w2[i + m - 1]!, top2, BASE_2);
    l1[i] = mix32(h1 ^ m);
    l2[i] = mix32b(h2 + m);
  }
}

const scratch = { buf: wordBuffer(2), scanner: null as DocumentScanner | null };

/**
 * Returns the file and line of the first evaluation item (in the index's order) that `text` overlaps by an n-word span or a whole short item, or null.
 * `kernel` false searches in TypeScript only (the tests compare the two).
 */
export function findContamination(index: EvalIndex, text: string, kernel = true): { file: string; line: number } | null {
  const prepared = prepareText(text);
  // In a full check the duplicate index has just scanned this text with two lanes (see
  // DocumentScanner); without one (contamination without duplicates), a scanner of its own does.
  let done = sharedWords(prepared);
  if (done === null && kernel && prepared.length <= MAX_SCAN_UNITS) {
    (scratch.scanner ??= new DocumentScanner(2)).scan(prepared, false);
    done = sharedWords(prepared);
  }
  // Words in the duplicate kernel's memory are searched there (kernels/duplicates.c, step for step as below).
  const made = kernel ? madeScanKernel() : undefined;
  if (done !== null && made !== undefined && made.holds(done.lane1)) {
    const w1At = done.lane1.byteOffset; // before placing the table, which may grow the memory and detach the views
    const w2At = done.lane2.byteOffset;
    const table = made.placeEval(index.table);
    let found = -1;
    for (const m of index.lengths) {
      found = made.firstOverlap(w1At, w2At, done.count, m, table, found);
      if (found === 0) break;
    }
    return found < 0 ? null : { ...index.sources[found]! };
  }
  let w1: Int32Array;
  let w2: Int32Array;
  let words: number;
  if (done !== null) {
    w1 = done.lane1;
    w2 = done.lane2;
    words = done.count;
  } else {
    const buf = scratch.buf;
    words = hashWords(prepared, buf);
    w1 = buf.lane1;
    w2 = buf.lane2!;
  }
  const { lane1, lane2, item, mask, filter, filterShift } = index.table;
  let best = -1;
  for (const m of index.lengths) {
    if (words < m) continue;
    // The window hashes of rollGrams, computed as the windows slide. Lane 1 goes through the
    // prefilter first; lane 2 is brought up to date only for the few windows that pass it
    // (rolled on from the previous window when that one passed too, else summed afresh:
    // the same value, since both are the polynomial mod 2^32).
    const top1 = topPower(BASE_1, m);
    const top2 = topPower(BASE_2, m);
    let h1 = windowHash(w1, 0, m, BASE_1);
    let h2 = 0;
    let h2at = -2; // the window h2 belongs to
    for (let i = 0; i + m <= words; i++) {
      if (i > 0) h1 = slide(h1, w1[i - 1]!, w1[i + m - 1]!, top1, BASE_1);
      const a = mix32(h1 ^ m);
      const bit = a >>> filterShift;
      if ((filter[bit >>> 5]! & (1 << (bit & 31))) === 0) continue;
      h2 = h2at === i - 1 ? slide(h2, w2[i - 1]!, w2[i + m - 1]!, top2, BASE_2) : windowHash(w2, i, m, BASE_2);
      h2at = i;
      const b = mix32b(h2 + m);
      let slot = a & mask;
      for (;;) {
        const it = item[slot]!;
        if (it < 0) break;
        if (lane1[slot] === a && lane2[slot] === b) {
          if (best < 0 || it < best) best = it;
          break;
        }
        slot = (slot + 1) & mask;
      }
      if (best === 0) break;
    }
    if (best === 0) break;
  }
  return best < 0 ? null : { ...index.sources[best]! };
}
