// Counters for tiktoken-style vocabularies (js-tiktoken builtins and rank files).
//
// js-tiktoken's encode splits the text with the pattern regex and BPE-encodes each
// match on its own, so count(text) = Σ count(match) exactly; the per-match count is
// cached. For the builtin patterns a hand-written splitter (split.ts) finds the
// matches in the BMP and the regex takes over for each piece that touches a
// character outside it. Special-token strings in the text count as ordinary text, like
// `encode(text, [], [])`: corpus text that happens to contain "<|endoftext|>" is text.
//
// countWithPieces (builtin patterns only) also records the pieces, so that a word whose
// span (with its leading space) is exactly one piece takes that piece's count. Why that
// equals splitting the word alone: the span holds a non-space character, so the
// alternative that matched it comes before the builtins' only lookahead (`\s+(?!\S)`),
// and without lookaround or anchors the first successful backtracking path depends only
// on the characters it reads, all inside the span; so the span alone splits into that
// one piece. A user's pattern may have lookaround, so rank files with one are measured
// word by word. test/measure/tokens-fertility.test.ts compares both on Brown and UDHR.
//
// For the builtin patterns the split and the lookup of each piece's count run in a WebAssembly
// kernel (kernels/tokens.c) with a cache of its own per counter; the pieces it lacks come back
// here (`resolve`). Measured against the TypeScript splitter and front cache it replaced, in
// alternating pairs of one-thread `sluice check --no-cache` runs on the 40 MB bench corpus
// (shared 2-core machine; same reports): the tokenizer-only policy 0.81× the wall time and
// 0.83× the CPU time (3 pairs), the full check 0.87× and 0.90× (4 pairs).

import { splitCl100k, splitGpt2, splitO200k, unitClasses, type PieceSplitter } from './split.js';
import { KERNEL_PATTERN, MAX_KERNEL_UNITS, MAX_MERGE_UNITS, tokenKernel, type KernelCache, type KernelPattern, type KernelWordTokens } from '../kernels/tokens-kernel.js';
import { bytePairCount } from './bpe.js';
import { hashRange, MAX_CACHED_PIECE_LENGTH, PieceCache } from './cache.js';
import { SharedPieceCounts } from './shared-counts.js';
import { TokenizerError } from './errors.js';
import { BUILTIN_PATTERNS } from './patterns.js';
import type { RankTable } from './ranks.js';
import type { PieceList } from './pieces.js';
import type { TokenCounter, TokenMeasure } from './types.js';

export interface RankCounterOptions {
  id: string;
  label: string;
  ranks: RankTable;
  /** The split regex source, compiled with flags `gu` as js-tiktoken does. */
  pattern: string;
  generationSize?: number;
  /** Use the hand-written splitter when the pattern is a builtin's (default true; off to measure the regex alone). */
  splitter?: boolean;
  /** Split and look up in the WebAssembly kernel when the pattern is a builtin's (default true; off to measure the TypeScript path). */
  kernel?: boolean;
  /** Entries of the counter's cache in the kernel (a power of two; default KERNEL_CACHE_ENTRIES; tests make it small). */
  kernelCacheEntries?: number;
  /** The shared table of piece counts to use first (another thread's, or one made by the caller); default: a new one of DEFAULT_SHARED_ENTRIES; null: none. */
  shared?: SharedPieceCounts | null;
}

/** Entries of a counter's front cache (a power of two), and the longest key it keeps, in UTF-16 units. */
const FRONT_ENTRIES = 16384;
const FRONT_MASK = FRONT_ENTRIES - 1;
const FRONT_UNITS = 8;

/** Entries of a counter's cache in the token kernel (a power of two; 40 bytes each). */
const KERNEL_CACHE_ENTRIES = 65536;

/** Returns the kernel's number for a builtin pattern, or null. */
function kernelPatternFor(pattern: string): KernelPattern | null {
  if (pattern === BUILTIN_PATTERNS.gpt2) return KERNEL_PATTERN.gpt2;
  if (pattern === BUILTIN_PATTERNS.cl100k_base) return KERNEL_PATTERN.cl100k_base;
  if (pattern === BUILTIN_PATTERNS.o200k_base) return KERNEL_PATTERN.o200k_base;
  return null;
}

/** Returns the hand-written splitter equivalent to a pattern, or null when there is none. */
export function splitterFor(pattern: string): PieceSplitter | null {
  if (pattern === BUILTIN_PATTERNS.gpt2) return splitGpt2;
  if (pattern === BUILTIN_PATTERNS.cl100k_base) return splitCl100k;
  if (pattern === BUILTIN_PATTERNS.o200k_base) return splitO200k;
  return null;
}

/** Returns a TokenCounter over a rank table and split pattern, with a per-piece cache. */
export function createRankCounter(options: RankCounterOptions): TokenCounter {
  const { ranks, label } = options;
  const split = new RegExp(options.pattern, 'gu');
  const sticky = new RegExp(options.pattern, 'guy');
  const splitter = options.splitter === false ? null : splitterFor(options.pattern);
  // Pieces are looked up in the shared table first (filled by every thread of a pooled run),
  // then, once that is full, in this thread's own bounded cache.
  let shared = options.shared === undefined ? SharedPieceCounts.create(options.id) : options.shared;
  let sharedHits = 0;
  const cache = new PieceCache<number>(options.generationSize);
  const words = new PieceCache<number>(options.generationSize);
  const builtinPattern = (Object.values(BUILTIN_PATTERNS) as string[]).includes(options.pattern);

  // The front cache: direct-mapped, this thread's own, for pieces of up to FRONT_UNITS units.
  // Entry i is frontSlots[2i] = length << 16 | count (0: empty) and frontSlots[2i + 1] = hash,
  // its key in frontKeys[i * FRONT_UNITS, ...). A hit costs one slot and one short key, both
  // in a table small enough to stay in the core's cache, where the shared table's probe
  // touches two lines of 16 MB shared with other threads. A miss overwrites the entry. On the
  // 40 MB bench corpus (o200k_base, 11.6 M piece lookups a pass) 16,384 entries answer 82 % of
  // lookups (4,096: 75 %, 65,536: 85 %, no faster than 16,384 in an in-process A/B). Measured,
  // CPU time of warm token counting with fertility, one process per run, 6 runs alternating with
  // the code before, shared 2-core machine with another benchmark running: median 1.22 s against
  // 1.33 s (0.92×), best 1.14 s against 1.12 s; the machine's noise is about ±15 %. The whole
  // measure pass of the full policy (measureBatch as bench-stages' `all`, CPU time, best of 3
  // rounds, 3 processes of each alternating): 3.64 s median with this and the offsets walk of
  // measure.ts against 4.37 s before both (0.91×, 0.84×, 0.82× pairwise) and 3.72 s with the walk alone.
  const frontSlots = new Int32Array(FRONT_ENTRIES * 2);
  const frontKeys = new Uint16Array(FRONT_ENTRIES * FRONT_UNITS);
  let frontHits = 0;

  const countRange = (text: string, start: number, end: number): number => {
    const length = end - start;
    if (length > MAX_CACHED_PIECE_LENGTH) return bytePairCount(text, start, end, ranks);
    const hash = hashRange(text, start, end);
    if (length <= FRONT_UNITS) {
      const f = hash & FRONT_MASK;
      const meta = frontSlots[f * 2]!;
      if (meta >>> 16 === length && frontSlots[f * 2 + 1] === hash) {
        let at = f * FRONT_UNITS;
        let k = start;
        while (k < end && frontKeys[at] === text.charCodeAt(k)) {
          at++;
          k++;
        }
        if (k === end) {
          frontHits++;
          return meta & 0xffff;
        }
      }
      const n = lookUp(text, start, end, hash);
      frontSlots[f * 2] = (length << 16) | n;
      frontSlots[f * 2 + 1] = hash;
      const at = f * FRONT_UNITS;
      for (let k = 0; k < length; k++) frontKeys[at + k] = text.charCodeAt(start + k);
      return n;
    }
    return lookUp(text, start, end, hash);
  };

  const lookUp = (text: string, start: number, end: number, hash: number, merge = bytePairCount): number => {
    if (shared !== null) {
      const known = shared.find(text, start, end, hash);
      if (known >= 0) {
        sharedHits++;
        return known;
      }
    }
    const cached = cache.find(text, start, end, hash);
    if (cached !== undefined) return cached;
    const n = merge(text, start, end, ranks);
    if (shared === null || !shared.add(text, start, end, hash, n)) cache.add(text.slice(start, end), hash, n);
    return n;
  };

  // Every match of the regex from lastIndex `from` on, as String.prototype.matchAll gives them.
  const countByRegex = (text: string, from: number, pieces: PieceList | null): number => {
    let tokens = 0;
    split.lastIndex = from;
    let m: RegExpExecArray | null;
    while ((m = split.exec(text)) !== null) {
      const length = m[0].length;
      if (length === 0) {
        // As matchAll does: step over one code point after an empty match.
        const code = text.charCodeAt(split.lastIndex);
        split.lastIndex += code >= 0xd800 && code <= 0xdbff ? 2 : 1;
        continue;
      }
      const n = countRange(text, m.index, m.index + length);
      tokens += n;
      pieces?.push(m.index + length, n);
    }
    return tokens;
  };

  // The kernel (kernels/tokens.c) splits and looks pieces up in its own cache; what that
  // cache lacks comes back here, to the shared table, this thread's cache and the merges.
  const kernelPattern = splitter === null || options.kernel === false ? null : kernelPatternFor(options.pattern);
  let kernelCache: KernelCache | null = null;
  let kernelPieces = 0;
  let counting = '';
  let kernelResolved = 0;
  // The merges of a piece of the text the kernel holds, run there (a piece too long for it here).
  let ranksAt = 0;
  const mergeInKernel = (text: string, start: number, end: number): number =>
    end - start <= MAX_MERGE_UNITS ? tokenKernel(unitClasses).merge(start, end, ranksAt) : bytePairCount(text, start, end, ranks);
  const resolve = (start: number, end: number, hash: number): number => {
    kernelResolved++;
    return end - start > MAX_CACHED_PIECE_LENGTH ? mergeInKernel(counting, start, end) : lookUp(counting, start, end, hash, mergeInKernel);
  };

  // The end of the piece the pattern matches at p, or -1 (then countByRegex takes the rest).
  // Sticky test() instead of exec: the same match (the builtin patterns match at every
  // position, never empty) without a match array and substring per piece.
  const regexPieceEnd = (text: string, p: number): number => {
    sticky.lastIndex = p;
    return sticky.test(text) && sticky.lastIndex > p ? sticky.lastIndex : -1;
  };

  // The pieces of text[p, ...) one at a time, by the TypeScript splitter.
  const countFrom = (text: string, p: number, pieces: PieceList | null): number => {
    let tokens = 0;
    const n = text.length;
    while (p < n) {
      let e = splitter!(text, p);
      if (e < 0) e = regexPieceEnd(text, p);
      if (e < 0) return tokens + countByRegex(text, p, pieces);
      const c = countRange(text, p, e);
      tokens += c;
      pieces?.push(e, c);
      p = e;
    }
    return tokens;
  };

  // Pieces of the text the kernel counted last, all in its buffers (-1: not all of them are).
  let piecesInKernel = -1;

  const countByKernel = (text: string, pieces: PieceList | null): number => {
    const kernel = tokenKernel(unitClasses);
    if (kernelCache === null) {
      // Both laid out once, before the first load: laying out may grow the kernel's memory.
      kernelCache = kernel.createCache(options.kernelCacheEntries ?? KERNEL_CACHE_ENTRIES);
      ranksAt = kernel.placeRanks(ranks.buffer);
    }
    counting = text;
    piecesInKernel = -1;
    kernel.load(text, resolve);
    let tokens = 0;
    const n = text.length;
    let p = 0;
    let k = 0;
    let byRegex = 0;
    while (p < n) {
      k = kernel.count(p, k, kernelPattern!, kernelCache);
      tokens += kernel.tokens();
      p = kernel.stoppedAt();
      if (p >= n) break;
      // The kernel stopped before a surrogate: the regex decides this one piece.
      const e = regexPieceEnd(text, p);
      if (e < 0) {
        kernelPieces += k - byRegex;
        pieces?.append(kernel.ends, kernel.counts, k);
        return tokens + countByRegex(text, p, pieces);
      }
      const c = countRange(text, p, e);
      kernel.ends[k] = e;
      kernel.counts[k] = c;
      k++;
      byRegex++;
      tokens += c;
      p = e;
    }
    kernelPieces += k - byRegex;
    pieces?.append(kernel.ends, kernel.counts, k);
    piecesInKernel = k;
    return tokens;
  };

  // measureTokens' figures of a text given its words' offsets, the words counted in the kernel
  // over the pieces it just found; null when the kernel does not take the text.
  const measureWords = (text: string, offsets: Int32Array): TokenMeasure | null => {
    if (text.length > MAX_KERNEL_UNITS) return null;
    const tokens = guarded(text);
    if (piecesInKernel < 0) return null;
    let got: KernelWordTokens;
    try {
      got = tokenKernel(unitClasses).wordTokens(offsets, piecesInKernel, kernelPattern!, kernelCache!);
    } catch (cause) {
      throw new TokenizerError('count', label, `cannot encode text: ${(cause as Error).message}`, { cause });
    }
    let { wordTokens, continuedWords } = got;
    // Words the kernel could not split alone (a surrogate is involved), as measure.ts counts them.
    for (const w of got.left.slice()) {
      const start = offsets[w * 2]!;
      const from = start > 0 && text.charCodeAt(start - 1) === 0x20 ? start - 1 : start;
      const c = countPiece(text.slice(from, offsets[w * 2 + 1]!));
      wordTokens += c;
      if (c >= 2) continuedWords++;
    }
    return { tokens, unknown: 0, words: offsets.length >> 1, wordTokens, continuedWords };
  };

  const countText = (text: string, pieces: PieceList | null): number => {
    if (splitter === null) return countByRegex(text, 0, pieces);
    if (kernelPattern !== null && text.length <= MAX_KERNEL_UNITS) return countByKernel(text, pieces);
    return countFrom(text, 0, pieces);
  };

  const countPiece = (piece: string): number => {
    const cached = words.get(piece);
    if (cached !== undefined) return cached;
    const n = guarded(piece);
    words.set(piece, n);
    return n;
  };

  const guarded = (text: string, pieces: PieceList | null = null): number => {
    try {
      return countText(text, pieces);
    } catch (cause) {
      throw new TokenizerError('count', label, `cannot encode text: ${(cause as Error).message}`, { cause });
    }
  };

  return {
    id: options.id,
    label,
    kind: 'tiktoken',
    unknownTokenId: null,
    exactFastPath: true,
    count: (text) => ({ tokens: guarded(text), unknown: 0 }),
    countPiece,
    ...(kernelPattern !== null ? { measureWords } : {}),
    ...(builtinPattern
      ? {
          countWithPieces: (text: string, pieces: PieceList) => {
            pieces.reset();
            return { tokens: guarded(text, pieces), unknown: 0 };
          },
        }
      : {}),
    cacheStats: () => {
      const own = cache.stats();
      // A piece the kernel resolved through lookUp is counted there, as a hit or a miss.
      const kernelHits = kernelPieces - kernelResolved;
      return { ...own, hits: own.hits + sharedHits + frontHits + kernelHits, entries: own.entries + (shared?.size ?? 0) };
    },
    shareTables: () => ({ counts: shared?.buffer ?? null, ranks: ranks.buffer }),
    adoptTables: (tables) => {
      // The rank table is this counter's already; only the counts can still change hands.
      const table = tables.counts === null ? null : SharedPieceCounts.attach(tables.counts, options.id);
      if (table === null) return false;
      shared = table;
      return true;
    },
  };
}
