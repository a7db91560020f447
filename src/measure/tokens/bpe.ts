// Token count of one pre-tokenized piece under byte-level BPE with a rank table: the
// same merge rule as js-tiktoken (and OpenAI's tiktoken) — repeatedly merge the adjacent
// pair whose concatenation has the lowest rank, leftmost first on ties — so the count
// equals the length of js-tiktoken's encode of that piece.
//
// Written here rather than calling js-tiktoken because the library has no per-piece
// entry point: encode(piece) rebuilds its split and special-token regexes on every call
// and keys its ranks by comma-joined bytes. Measured with scripts/bench-tokens.mjs on the
// 54,526 distinct o200k pieces of Brown (one run): js-tiktoken encode(piece) 14.1 µs a
// piece, a string-keyed version of this function 3.3 µs (x4.3), same totals. Every cache
// miss pays this.
//
// The piece is encoded to UTF-8 into a reused byte array and every merge looks its byte
// range up in the rank table (ranks.ts) directly: no string per piece or per candidate
// pair. The first round of pairs (two bytes each) is read from the table's 64k direct
// index, and the part arrays are reused typed arrays shifted with copyWithin. On the
// 56,939 distinct o200k pieces of the 40 MB bench corpus (5 alternating rounds in one
// process, shared 2-core machine under load): 1.8-3.5 µs a piece, against 8.3-10.1 µs for
// the string-keyed version with its UTF-8 conversion through Buffer; same totals.
//
// A piece of a text the token kernel holds (kernels/tokens.c) is merged there instead, step for
// step as here, over a copy of the rank table in the kernel's memory; this function merges the
// rest (texts the kernel does not take, pieces over its MAX_MERGE_UNITS). In a CPU profile of a
// one-thread tokenizer-only check of the 40 MB bench corpus the merges took 105 ms in the kernel
// against 254 ms here in the run before (same report).

import { NO_RANK, type RankTable } from './ranks.js';

// Scratch arrays, grown for long pieces: bytes of the piece; starts[i] is where part i
// begins, pairRank[i] the rank of part i joined with part i+1.
let bytes = new Uint8Array(1024);
let starts = new Int32Array(1024);
let pairRank = new Float64Array(1024);

/** Writes the UTF-8 bytes of text[start, end) into the scratch array (a lone surrogate as U+FFFD, as TextEncoder does) and returns their count. */
function encodeUtf8(text: string, start: number, end: number): number {
  if ((end - start) * 3 > bytes.length) {
    bytes = new Uint8Array((end - start) * 3 * 2);
    starts = new Int32Array(bytes.length + 1);
    pairRank = new Float64Array(bytes.length + 1);
  }
  const out = bytes;
  let n = 0;
  for (let i = start; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) out[n++] = c;
    else if (c < 0x800) {
      out[n++] = 0xc0 | (c >> 6);
      out[n++] = 0x80 | (c & 0x3f);
    } else if (c < 0xd800 || c > 0xdfff) {
      out[n++] = 0xe0 | (c >> 12);
      out[n++] = 0x80 | ((c >> 6) & 0x3f);
      out[n++] = 0x80 | (c & 0x3f);
    } else {
      const low = i + 1 < end ? text.charCodeAt(i + 1) : 0;
      if (c <= 0xdbff && low >= 0xdc00 && low <= 0xdfff) {
        const cp = ((c - 0xd800) << 10) + (low - 0xdc00) + 0x10000;
        out[n++] = 0xf0 | (cp >> 18);
        out[n++] = 0x80 | ((cp >> 12) & 0x3f);
        out[n++] = 0x80 | ((cp >> 6) & 0x3f);
        out[n++] = 0x80 | (cp & 0x3f);
        i++;
      } else {
        out[n++] = 0xef;
        out[n++] = 0xbf;
        out[n++] = 0xbd;
      }
    }
  }
  return n;
}

/**
 * Bytes from which a piece is merged with a heap of its pairs instead of a scan of them all per
 * merge. The scan costs O(n²) in the piece's bytes: measured here, one o200k_base piece of
 * 20,000 letters took 0.30 s and of 40,000 1.33 s, so a document holding one long run of letters
 * (a DNA sequence, a run of a repeated letter) could stall a check for hours. The heap gives the
 * same merges (lowest rank first, leftmost on ties) in O(n log n); short pieces, nearly all of
 * them, keep the scan, which is faster there.
 */
export const HEAP_MERGE_BYTES = 512;

/** Returns the number of BPE tokens of the piece text[start, end). */
export function bytePairCount(text: string, start: number, end: number, ranks: RankTable): number {
  const n = encodeUtf8(text, start, end);
  const b = bytes;
  // js-tiktoken (like tiktoken) looks the whole piece up first: a piece that is a token
  // is one token even when the merges would not reach it.
  if (n <= 1) return n;
  if (ranks.rank(b, 0, n) !== NO_RANK) return 1;
  if (n >= HEAP_MERGE_BYTES) return heapMergeCount(b, n, ranks);
  return scanMergeCount(b, n, ranks);
}

/** The merges of b[0, n) by scanning every pair for the lowest rank before each merge. */
function scanMergeCount(b: Uint8Array, n: number, ranks: RankTable): number {
  const pairs = ranks.pairs;
  const s = starts;
  const pr = pairRank;
  for (let i = 0; i <= n; i++) s[i] = i;
  for (let i = 0; i < n - 1; i++) pr[i] = pairs[(b[i]! << 8) | b[i + 1]!]!;
  let parts = n;
  while (parts > 1) {
    let best = NO_RANK;
    let at = -1;
    for (let i = 0; i < parts - 1; i++) {
      const r = pr[i]!;
      if (r < best) {
        best = r;
        at = i;
      }
    }
    if (at < 0) break;
    // Merge part `at` with part `at + 1`.
    s.copyWithin(at + 1, at + 2, parts + 1);
    pr.copyWithin(at, at + 1, parts - 1);
    parts--;
    if (at < parts - 1) pr[at] = ranks.rank(b, s[at]!, s[at + 2]!);
    if (at > 0) pr[at - 1] = ranks.rank(b, s[at - 1]!, s[at + 1]!);
  }
  return parts;
}

// The heap's arrays, grown for long pieces: per part (by its first byte) the next part's first
// byte (n past the last) and the previous one's (-1 before the first, -2 once merged away); per
// pair pushed, its rank, its left part, and the right part and end it had when pushed (to tell
// stale pairs); and the heap itself, of pair numbers.
let nextPart = new Int32Array(0);
let prevPart = new Int32Array(0);
let pairRankOf = new Float64Array(0);
let pairLeft = new Int32Array(0);
let pairMid = new Int32Array(0);
let pairEnd = new Int32Array(0);
let heap = new Int32Array(0);

/**
 * The merges of b[0, n) with a binary heap of pairs ordered by rank, then by the left part's
 * first byte (the leftmost on ties, as the scan takes it). A merge joins part i with the next one
 * and pushes the two pairs it changes; a pair whose parts have changed since it was pushed is
 * skipped when it comes up. Same result as scanMergeCount (test/measure/tokens-kernel.test.ts).
 */
function heapMergeCount(b: Uint8Array, n: number, ranks: RankTable): number {
  if (nextPart.length < n + 1) {
    nextPart = new Int32Array(n + 1);
    prevPart = new Int32Array(n + 1);
    // n − 1 pairs to start with, at most two more per merge, and at most n − 1 merges.
    pairRankOf = new Float64Array(3 * n);
    pairLeft = new Int32Array(3 * n);
    pairMid = new Int32Array(3 * n);
    pairEnd = new Int32Array(3 * n);
    heap = new Int32Array(3 * n);
  }
  const next = nextPart;
  const prev = prevPart;
  const rank = pairRankOf;
  const left = pairLeft;
  const h = heap;
  let pairs = 0;
  let size = 0;
  // Whether pair x comes before pair y: lower rank, or the same rank further left.
  const before = (x: number, y: number): boolean => rank[x]! < rank[y]! || (rank[x] === rank[y] && left[x]! < left[y]!);
  const push = (r: number, i: number, j: number, k: number): void => {
    if (r === NO_RANK) return; // a pair that is no token never merges
    const e = pairs++;
    rank[e] = r;
    left[e] = i;
    pairMid[e] = j;
    pairEnd[e] = k;
    let at = size++;
    while (at > 0) {
      const up = (at - 1) >> 1;
      if (!before(e, h[up]!)) break;
      h[at] = h[up]!;
      at = up;
    }
    h[at] = e;
  };
  const pop = (): number => {
    const top = h[0]!;
    const last = h[--size]!;
    let at = 0;
    for (;;) {
      const l = 2 * at + 1;
      if (l >= size) break;
      const c = l + 1 < size && before(h[l + 1]!, h[l]!) ? l + 1 : l;
      if (!before(h[c]!, last)) break;
      h[at] = h[c]!;
      at = c;
    }
    if (size > 0) h[at] = last;
    return top;
  };

  for (let i = 0; i < n; i++) {
    next[i] = i + 1;
    prev[i] = i - 1;
  }
  for (let i = 0; i + 1 < n; i++) push(ranks.pairs[(b[i]! << 8) | b[i + 1]!]!, i, i + 1, i + 2);
  let parts = n;
  while (size > 0) {
    const e = pop();
    const i = left[e]!;
    const j = pairMid[e]!;
    const k = pairEnd[e]!;
    // Stale: part i is gone, or its right part or that part's end moved.
    if (prev[i] === -2 || next[i] !== j || next[j] !== k) continue;
    // Merge part i with part j; j is gone.
    next[i] = k;
    if (k < n) prev[k] = i;
    prev[j] = -2;
    parts--;
    if (k < n) push(ranks.rank(b, i, next[k]!), i, k, next[k]!);
    const p = prev[i]!;
    if (p >= 0) push(ranks.rank(b, p, k), p, i, k);
  }
  return parts;
}
