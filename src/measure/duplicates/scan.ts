// Code-unit scanners over prepared text (NFC, lowercased): word hashes for shingles and
// n-grams, and the exact-duplicate normalization with its 64-bit hash. One lookup table
// classifies every UTF-16 code unit of the Basic Multilingual Plane; astral code points
// (rare) ask the regular-expression engine.
//
// A word is a maximal run of letters, marks and digits (General Category L*, M*, N*), so
// Devanagari vowel signs and viramas (Mn/Mc) stay inside their word while punctuation,
// symbols and spaces separate words.
//
// Measured on Brown paragraphs (scripts/bench-duplicates.mjs, one run): this fused scan — NFC,
// lowercase, exact hash and word hashes together — 132 MB/s; a `/\s+/g` whitespace collapse
// alone 92 MB/s and a `/[\p{L}\p{M}\p{N}]+/gu` matchAll alone 111 MB/s. One table-driven pass
// over the code units does the work of both.
//
// DocumentScanner's pass runs in a WebAssembly kernel (kernels/duplicates.c, the same arithmetic
// unit for unit) for texts up to MAX_SCAN_UNITS long, here for longer ones. Measured against this
// file's loop alone, in alternating pairs of one-thread `sluice check --no-cache` runs on the
// 40 MB bench corpus (shared 2-core machine; same reports): the duplicates-only policy took
// 0.94× the CPU time (medians of 5 pairs), the pass itself 0.47× in a CPU profile (299 → 142 ms).
import * as hash from './hash.js';
import { MAX_SCAN_UNITS, scanKernel, type KernelWords, type ScanKernel } from '../kernels/duplicates-kernel.js';

// Module-local copies: some loaders (tsx, vitest) turn imported bindings into getter calls,
// which made the scan loops ~5× slower when measured.
const mix32 = hash.mix32;
const mix32b = hash.mix32b;
const finishExact = hash.finishExact;
const hex64 = hash.hex64;
const EXACT_BASIS_1 = hash.EXACT_BASIS_1;
const EXACT_BASIS_2 = hash.EXACT_BASIS_2;
const EXACT_PRIME_1 = hash.EXACT_PRIME_1;
const EXACT_PRIME_2 = hash.EXACT_PRIME_2;

const WORD_CHAR = /^[\p{L}\p{M}\p{N}]$/u;
const PUNCT_CHAR = /^\p{P}$/u;
const SPACE_CHAR = /^\s$/u;
const CLASS_RUNS: Array<[RegExp, number]> = [
  [/[\p{L}\p{M}\p{N}]+/gu, 1],
  [/\s+/gu, 3],
  [/\p{P}+/gu, 4],
];

// Code-unit classes.
const OTHER = 0; // symbols, controls, unassigned: kept by the exact normalization, separate words
const WORD = 1;
const HIGH_SURROGATE = 2;
const SPACE = 3; // JavaScript's \s (Unicode White_Space, line terminators and U+FEFF)
const PUNCT = 4; // General Category P*

let table: Uint8Array | undefined;

/** Returns the class of every BMP code unit, built once (about 15 ms) from the engine's Unicode tables. */
function classTable(): Uint8Array {
  if (table) return table;
  const t = new Uint8Array(65536);
  const units = new Uint16Array(65536);
  for (let c = 0; c < 65536; c++) units[c] = c >= 0xd800 && c < 0xe000 ? 0 : c;
  let all = '';
  // fromCharCode on slices: one 65536-argument call can overflow the stack.
  for (let c = 0; c < 65536; c += 4096) all += String.fromCharCode(...units.subarray(c, c + 4096));
  for (const [re, cls] of CLASS_RUNS) {
    for (const m of all.matchAll(re)) {
      for (let i = m.index, end = m.index + m[0].length; i < end; i++) t[i] = cls;
    }
  }
  for (let c = 0xd800; c < 0xdc00; c++) t[c] = HIGH_SURROGATE;
  for (let c = 0xdc00; c < 0xe000; c++) t[c] = OTHER;
  table = t;
  return t;
}

/** Returns the class of the astral code point whose surrogates start at `i` (the caller checked the pair). */
function astralClass(text: string, i: number): number {
  return classOfAstral(text.slice(i, i + 2));
}

/** Returns the class of an astral code point (the kernel's call back). */
function astralClassOf(codePoint: number): number {
  return classOfAstral(String.fromCodePoint(codePoint));
}

/** Returns the class of an astral code point, given as its string. */
function classOfAstral(cp: string): number {
  if (WORD_CHAR.test(cp)) return WORD;
  if (PUNCT_CHAR.test(cp)) return PUNCT;
  if (SPACE_CHAR.test(cp)) return SPACE;
  return OTHER;
}

/** Returns `text` in the form both scanners expect: Unicode NFC, then `toLowerCase()` (the locale-independent default case mapping; close to, but not exactly, Unicode case folding: `ß` stays `ß`). */
export function prepareText(text: string): string {
  // The duplicate index and the evaluation overlap both prepare each document, one after the other.
  if (text === lastRaw) return lastPrepared;
  const prepared = text.normalize('NFC').toLowerCase();
  lastRaw = text;
  lastPrepared = prepared;
  return prepared;
}
let lastRaw: string | null = null;
let lastPrepared = '';

/** Growable buffers of word hashes; `lane2` is filled only when the buffer was made with two lanes. */
export interface WordBuffer {
  lane1: Int32Array;
  lane2: Int32Array | null;
}

/** Returns an empty word buffer with one lane (near duplicates) or two (64-bit n-grams for contamination). */
export function wordBuffer(lanes: 1 | 2, capacity = 1024): WordBuffer {
  return { lane1: new Int32Array(capacity), lane2: lanes === 2 ? new Int32Array(capacity) : null };
}

function grow(buf: WordBuffer): void {
  const l1 = new Int32Array(buf.lane1.length * 2);
  l1.set(buf.lane1);
  buf.lane1 = l1;
  if (buf.lane2) {
    const l2 = new Int32Array(buf.lane2.length * 2);
    l2.set(buf.lane2);
    buf.lane2 = l2;
  }
}

/** Returns the number of words in `prepared` (see prepareText), writing one hash per word, in order, into `buf`. */
export function hashWords(prepared: string, buf: WordBuffer): number {
  const t = classTable();
  const two = buf.lane2 !== null;
  const n = prepared.length;
  let count = 0;
  let inWord = false;
  let h1 = 0;
  let h2 = 0;
  let len = 0;
  for (let i = 0; i < n; i++) {
    const c = prepared.charCodeAt(i);
    let cls = t[c]!;
    let c2 = -1;
    if (cls === HIGH_SURROGATE) {
      const lo = i + 1 < n ? prepared.charCodeAt(i + 1) : 0;
      if (lo >= 0xdc00 && lo < 0xe000) {
        cls = astralClass(prepared, i);
        c2 = lo;
        i++;
      } else {
        cls = OTHER;
      }
    }
    if (cls === WORD) {
      if (!inWord) {
        inWord = true;
        h1 = 0x811c9dc5;
        h2 = 0x050c5d1f;
        len = 0;
      }
      // FNV-1a per code unit in lane 1; another odd multiplier in lane 2; finalized below.
      h1 = Math.imul(h1 ^ c, 0x01000193);
      if (two) h2 = Math.imul(h2 ^ c, 0x2c1b3c6d);
      len++;
      if (c2 >= 0) {
        h1 = Math.imul(h1 ^ c2, 0x01000193);
        if (two) h2 = Math.imul(h2 ^ c2, 0x2c1b3c6d);
        len++;
        continue;
      }
      // The rest of a run of BMP word units in a tight loop, as in DocumentScanner.scan
      // (measured the same way: 0.89× and 0.93×).
      const from = i;
      while (i + 1 < n) {
        const d = prepared.charCodeAt(i + 1);
        if (t[d] !== WORD) break;
        h1 = Math.imul(h1 ^ d, 0x01000193);
        if (two) h2 = Math.imul(h2 ^ d, 0x2c1b3c6d);
        i++;
      }
      len += i - from;
    } else if (inWord) {
      inWord = false;
      if (count === buf.lane1.length) grow(buf);
      buf.lane1[count] = mix32(h1 ^ len);
      if (two) buf.lane2![count] = mix32b(h2 + len);
      count++;
    }
  }
  if (inWord) {
    if (count === buf.lane1.length) grow(buf);
    buf.lane1[count] = mix32(h1 ^ len);
    if (two) buf.lane2![count] = mix32b(h2 + len);
    count++;
  }
  return count;
}

/** Returns the words of a raw text as strings, by the same rule as hashWords (for tests and reports; not the hot path). */
export function wordsOf(text: string): string[] {
  return prepareText(text).match(/[\p{L}\p{M}\p{N}]+/gu) ?? [];
}

/**
 * Returns the exact-duplicate normal form of a raw text: NFC, toLowerCase, punctuation
 * (General Category P*) deleted when `punctuation` is `strip`, runs of whitespace (JavaScript
 * `\s`) collapsed to one space, leading and trailing whitespace removed. Symbols are kept.
 * The scanner hashes exactly this string (hashString64 of it) without building it; this
 * version exists for tests and reports.
 */
export function normalizeForExact(text: string, punctuation: 'keep' | 'strip'): string {
  let s = prepareText(text);
  if (punctuation === 'strip') s = s.replace(/\p{P}/gu, '');
  return s.replace(/\s+/gu, ' ').trim();
}

/**
 * The two-lane word hashes of the last text a two-lane DocumentScanner scanned, so that
 * findContamination, called next on the same document (see ShardFold.offer), does not hash its
 * words again. Keyed by the prepared string, like prepareText: the hashes are a function of its
 * contents alone, so any later text with equal contents may use them. The lanes are the
 * scanner's own buffers; it clears the memo before writing to them again.
 * The second lane costs the scan one multiplication per word unit; the pass it saves was a
 * sixth of both stages' time. Measured with scripts/bench-stages.mjs (40 MB bench corpus,
 * best of 3 rounds, alternating runs with the code before, shared 2-core machine): dup+cont
 * 0.76 and 0.77 s before, 0.60 s after (the second run after was lost to load, 1.01 s); an
 * in-process A/B of the two versions over the same documents, CPU time, best of 6 rounds,
 * both orders: 0.83× and 0.88×. The duplicates stage alone, now scanning two lanes, within noise.
 */
const shared = {
  prepared: null as string | null,
  owner: null as DocumentScanner | null,
};

/** Word hashes of one text in both lanes, as hashWords with two lanes writes them: lane1/lane2[0 .. count). */
export interface SharedWords {
  readonly lane1: Int32Array;
  readonly lane2: Int32Array;
  readonly count: number;
}

/** Returns the word hashes of `prepared` when a two-lane scanner's last scan was of equal text, else null. Valid until that scanner scans again. */
export function sharedWords(prepared: string): SharedWords | null {
  const owner = shared.owner;
  if (shared.prepared !== prepared || owner === null) return null;
  return { lane1: owner.words, lane2: owner.words2!, count: owner.wordCount };
}

/** Returns this thread's duplicate kernel (kernels/duplicates.c), made on first use with the scan's class table. */
export function duplicateKernel(): ScanKernel {
  return scanKernel(classTable, astralClassOf);
}

/** Result of scanning one document: its exact hash and word hashes (buffers reused between calls). */
export class DocumentScanner {
  /** Code units of the exact normal form (0: empty document). */
  exactLength = 0;
  /** The 64-bit exact hash as two unsigned 32-bit lanes. */
  exactHigh = 0;
  exactLow = 0;
  /** Words found; their hashes are words[0 .. wordCount), valid until the next scan (see the words getter). */
  wordCount = 0;
  /** The buffers of a scan in TypeScript. */
  private ownWords: Int32Array = new Int32Array(1024);
  private ownWords2: Int32Array | null;
  /** The buffers of a scan in the kernel (kernels/duplicates.c), made on the first scan; null when this scanner does not use it. */
  private kernelWords: KernelWords | null | undefined;
  /** Whether the last scan ran in the kernel (its words are in the kernel's memory). */
  private inKernel = false;
  private readonly lanes: 1 | 2;

  /**
   * `lanes` 2 also hashes each word in contamination's second lane and leaves both lanes for
   * sharedWords: one pass then serves the duplicate index and the contamination check.
   * `kernel` false scans in TypeScript only (the tests compare the two).
   */
  constructor(lanes: 1 | 2 = 1, kernel = true) {
    this.ownWords2 = lanes === 2 ? new Int32Array(1024) : null;
    this.lanes = lanes;
    if (!kernel) this.kernelWords = null;
  }

  /** The word hashes of the last scan. A view of the kernel's memory is made again when that memory has grown since (which detaches views), so it is always readable. */
  get words(): Int32Array {
    return this.inKernel ? duplicateKernel().views(this.kernelWords!).lane1 : this.ownWords;
  }

  /** Second-lane word hashes (as hashWords' lane2), filled only by a two-lane scanner. */
  get words2(): Int32Array | null {
    return this.inKernel ? duplicateKernel().views(this.kernelWords!).lane2 : this.ownWords2;
  }

  /**
   * Scans `prepared` (see prepareText) once, computing both the exact hash of its normal form
   * (see normalizeForExact; punctuation deleted when `strip`) and one hash per word: in the
   * kernel, or here for a text longer than it takes.
   */
  scan(prepared: string, strip: boolean): void {
    if (shared.owner === this) shared.prepared = null;
    if (this.kernelWords === null || prepared.length > MAX_SCAN_UNITS) {
      this.scanHere(prepared, strip);
      this.inKernel = false;
    } else {
      const kernel = duplicateKernel();
      const into = (this.kernelWords ??= kernel.words(this.lanes));
      this.wordCount = kernel.scan(prepared, strip, into);
      this.inKernel = true;
      this.exactLength = kernel.exactLength();
      this.exactHigh = kernel.exactHigh();
      this.exactLow = kernel.exactLow();
    }
    if (this.lanes === 2) {
      shared.prepared = prepared;
      shared.owner = this;
    }
  }

  /** The scan in TypeScript: one fused pass, as duplicates.c makes it; classifying each code unit once is most of the cost. */
  private scanHere(prepared: string, strip: boolean): void {
    const t = classTable();
    let words = this.ownWords;
    let words2 = this.ownWords2;
    const two = words2 !== null;
    let count = 0;
    let inWord = false;
    let wh = 0;
    let wh2 = 0;
    let wlen = 0;
    // Exact hash: two FNV-1a lanes with different primes, one step per normalized code unit,
    // finalized together (see hashString64). Per-unit steps are injective, so texts of equal
    // length that differ in one code unit never collide.
    let h1 = EXACT_BASIS_1;
    let h2 = EXACT_BASIS_2;
    let emitted = 0;
    let space = false; // whitespace seen since the last emitted unit
    const n = prepared.length;
    for (let i = 0; i < n; i++) {
      const c = prepared.charCodeAt(i);
      let cls = t[c]!;
      let lo = -1;
      if (cls === HIGH_SURROGATE) {
        const next = i + 1 < n ? prepared.charCodeAt(i + 1) : 0;
        if (next >= 0xdc00 && next < 0xe000) {
          cls = astralClass(prepared, i);
          lo = next;
          i++;
        } else {
          cls = OTHER;
        }
      }
      if (cls === WORD) {
        if (!inWord) {
          inWord = true;
          wh = 0x811c9dc5 | 0;
          wh2 = 0x050c5d1f;
          wlen = 0;
        }
        if (space) {
          if (emitted > 0) {
            h1 = Math.imul(h1 ^ 0x20, EXACT_PRIME_1);
            h2 = Math.imul(h2 ^ 0x20, EXACT_PRIME_2);
            emitted++;
          }
          space = false;
        }
        // The lanes of hashWords: FNV-1a, and another odd multiplier; a word unit is always
        // part of the exact normal form too.
        wh = Math.imul(wh ^ c, 0x01000193);
        if (two) wh2 = Math.imul(wh2 ^ c, 0x2c1b3c6d);
        h1 = Math.imul(h1 ^ c, EXACT_PRIME_1);
        h2 = Math.imul(h2 ^ c, EXACT_PRIME_2);
        if (lo >= 0) {
          wh = Math.imul(wh ^ lo, 0x01000193);
          if (two) wh2 = Math.imul(wh2 ^ lo, 0x2c1b3c6d);
          h1 = Math.imul(h1 ^ lo, EXACT_PRIME_1);
          h2 = Math.imul(h2 ^ lo, EXACT_PRIME_2);
          wlen += 2;
          emitted += 2;
          continue;
        }
        // The rest of a run of BMP word units (most of any text) in a loop of its own, which
        // tests one class and carries no word or whitespace state. Measured as an in-process A/B
        // of the scan with and without it over the prepared texts of the 40 MB bench corpus
        // (scripts/bench-stages.mjs's documents; CPU time, best of 12 rounds, both orders, shared
        // 2-core machine): one lane 0.75× and 0.80×, two lanes 0.81× and 0.75×.
        const from = i;
        while (i + 1 < n) {
          const d = prepared.charCodeAt(i + 1);
          if (t[d] !== WORD) break;
          wh = Math.imul(wh ^ d, 0x01000193);
          if (two) wh2 = Math.imul(wh2 ^ d, 0x2c1b3c6d);
          h1 = Math.imul(h1 ^ d, EXACT_PRIME_1);
          h2 = Math.imul(h2 ^ d, EXACT_PRIME_2);
          i++;
        }
        wlen += i - from + 1;
        emitted += i - from + 1;
        continue;
      } else {
        if (inWord) {
          inWord = false;
          if (count === words.length) {
            words = doubled(words);
            if (two) words2 = doubled(words2!);
          }
          if (two) words2![count] = mix32b(wh2 + wlen);
          words[count++] = mix32(wh ^ wlen);
        }
        if (cls === SPACE) {
          space = true;
          continue;
        }
        if (strip && cls === PUNCT) continue;
      }
      if (space) {
        // One space stands for the whole whitespace run, never at the start.
        if (emitted > 0) {
          h1 = Math.imul(h1 ^ 0x20, EXACT_PRIME_1);
          h2 = Math.imul(h2 ^ 0x20, EXACT_PRIME_2);
          emitted++;
        }
        space = false;
      }
      h1 = Math.imul(h1 ^ c, EXACT_PRIME_1);
      h2 = Math.imul(h2 ^ c, EXACT_PRIME_2);
      emitted++;
      if (lo >= 0) {
        h1 = Math.imul(h1 ^ lo, EXACT_PRIME_1);
        h2 = Math.imul(h2 ^ lo, EXACT_PRIME_2);
        emitted++;
      }
    }
    if (inWord) {
      if (count === words.length) {
        words = doubled(words);
        if (two) words2 = doubled(words2!);
      }
      if (two) words2![count] = mix32b(wh2 + wlen);
      words[count++] = mix32(wh ^ wlen);
    }
    finishExact(h1, h2, emitted, this);
    this.ownWords = words;
    this.ownWords2 = words2;
    this.wordCount = count;
    this.exactLength = emitted;
  }
}

function doubled(a: Int32Array): Int32Array {
  const w = new Int32Array(a.length * 2);
  w.set(a);
  return w;
}

const oneOff = new DocumentScanner();

/** Returns the 64-bit exact hash of a raw text's normal form (see normalizeForExact) as 16 hex digits, or null when the normal form is empty. */
export function exactHash(text: string, punctuation: 'keep' | 'strip'): string | null {
  oneOff.scan(prepareText(text), punctuation === 'strip');
  if (oneOff.exactLength === 0) return null;
  return hex64(oneOff.exactHigh, oneOff.exactLow);
}
