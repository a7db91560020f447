// Hand-written equivalents of the builtin split patterns for text in the Basic
// Multilingual Plane. Skipping the regex engine (and its match arrays) speeds counting
// up: on ASCII, measured with scripts/bench-tokens.mjs on Brown (one process per case,
// shared machine), o200k_base 51.8 MB/s against 36.5 MB/s with the regex alone; repeated
// gpt2 runs 42-55 against 29-40. The first version of these splitters handled ASCII only
// and left every piece that touched another character to a sticky regex; in a CPU profile
// of token counting over the 40 MB bench corpus (o200k_base; a third of it Hindi, Arabic,
// Russian and French) that regex's calls were 28 % of the time. With the whole BMP here,
// warm counting with pieces over that corpus took 0.70x the CPU time (median of 10 rounds,
// both versions alternating in one process, same token totals), and 1.07x on its ASCII
// documents alone, within the machine's noise: the price of a 64 KB class table and the
// surrogate checks.
//
// Each function returns the end of the piece the pattern would match at `p`, or -1 when
// deciding needs a character outside the BMP (a surrogate: the caller then lets the regex
// match this one piece and carries on). Every position of a text starts a match of these
// patterns (their alternatives cover every character) and none looks behind, so the pieces
// from any match boundary on are the same whichever of the two produced the earlier ones.
//
// The Unicode properties the patterns name (\p{L}, \p{N}, o200k_base's two case classes,
// \s) are read from the engine's own regular expressions when the table is first used,
// so the splitters follow whatever Unicode version the regex follows on this Node.
// test/measure/tokens-split.test.ts checks the table against those regexes code unit by
// code unit, and the splitters against the regexes on corpora and on random strings.

/** Returns the end of the piece starting at `p`, or -1 if a character outside the BMP is involved. */
export type PieceSplitter = (text: string, p: number) => number;

// Bits of a code unit's class; 0 is "past the end of the text".
/** \p{L} */
const LETTER = 1;
/** \p{N} */
const NUMBER = 2;
/** \s */
const SPACE = 4;
/** o200k_base's [\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}] */
const UPPERISH = 8;
/** o200k_base's [\p{Ll}\p{Lm}\p{Lo}\p{M}] */
const LOWERISH = 16;
/** [^\s\p{L}\p{N}]: punctuation, symbols, controls, marks (a surrogate is left out) */
const OTHER = 32;
/** [^\r\n\p{L}\p{N}], the optional prefix of letters (a surrogate is left out) */
const PREFIX = 64;
/** A surrogate: the splitters cannot decide, the regex can. */
const SURROGATE = 128;

const APOSTROPHE = 0x27;
const SPACE_UNIT = 0x20;
const SLASH = 0x2f;

let table: Uint8Array | undefined;

/** Returns the class of every BMP code unit, built on first use from the engine's own property escapes (15-25 ms, once per thread). */
export function unitClasses(): Uint8Array {
  if (table) return table;
  const classes = new Uint8Array(0x10000);
  // Every code unit once, surrogates replaced by NUL (whose class is set apart) so that
  // the string has no pairs and a match index is the code unit itself.
  // Written as little-endian bytes, so the decode is right whatever the machine's byte order.
  const units = new Uint8Array(0x20000);
  for (let u = 0; u < 0x10000; u++) {
    if (u >= 0xd800 && u <= 0xdfff) continue;
    units[2 * u] = u & 0xff;
    units[2 * u + 1] = u >>> 8;
  }
  const all = new TextDecoder('utf-16le').decode(units);
  const mark = (source: string, bit: number): void => {
    for (const m of all.matchAll(new RegExp(`(?:${source})+`, 'gu'))) {
      for (let u = m.index, end = m.index + m[0].length; u < end; u++) classes[u] = (classes[u] as number) | bit;
    }
  };
  mark(String.raw`\p{L}`, LETTER);
  mark(String.raw`\p{N}`, NUMBER);
  mark(String.raw`\s`, SPACE);
  mark(String.raw`[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]`, UPPERISH);
  mark(String.raw`[\p{Ll}\p{Lm}\p{Lo}\p{M}]`, LOWERISH);
  for (let u = 0; u < 0x10000; u++) {
    if (u >= 0xd800 && u <= 0xdfff) {
      classes[u] = SURROGATE;
      continue;
    }
    const c = classes[u] as number;
    if ((c & (LETTER | NUMBER | SPACE)) === 0) classes[u] = c | OTHER;
    if ((c & (LETTER | NUMBER)) === 0 && u !== 0x0a && u !== 0x0d) classes[u] = (classes[u] as number) | PREFIX;
  }
  return (table = classes);
}

/** The class of text[i], 0 past its end. */
function classAt(C: Uint8Array, text: string, i: number): number {
  return i < text.length ? (C[text.charCodeAt(i)] as number) : 0;
}

/** Length of a contraction at i (`'s 't 're 've 'm 'll 'd`), 0 if none; lower-case only unless caseless. */
function contraction(text: string, i: number, caseless: boolean): number {
  if (text.charCodeAt(i) !== APOSTROPHE) return 0;
  let a = text.charCodeAt(i + 1);
  let b = text.charCodeAt(i + 2);
  if (caseless) {
    if (a >= 0x41 && a <= 0x5a) a += 0x20;
    if (b >= 0x41 && b <= 0x5a) b += 0x20;
  }
  if (a === 0x73 || a === 0x74 || a === 0x6d || a === 0x64) return 2; // s t m d
  if ((a === 0x72 && b === 0x65) || (a === 0x76 && b === 0x65) || (a === 0x6c && b === 0x6c)) return 3; // re ve ll
  return 0;
}

/** End of a run of units with a bit of `mask` from i, or -1 if the run stops at a surrogate (it may be one more). */
function run(C: Uint8Array, text: string, i: number, mask: number): number {
  const n = text.length;
  while (i < n) {
    const c = C[text.charCodeAt(i)] as number;
    if ((c & mask) === 0) return (c & SURROGATE) === 0 ? i : -1;
    i++;
  }
  return i;
}

/** End of the run of `\s` from i (a surrogate is never white space, so this needs no regex). */
function spaceRun(C: Uint8Array, text: string, i: number): number {
  const n = text.length;
  while (i < n && ((C[text.charCodeAt(i)] as number) & SPACE) !== 0) i++;
  return i;
}

/** End after any `\r`, `\n` (and `/` when `slash`) from i. */
function trailing(text: string, i: number, slash: boolean): number {
  for (;;) {
    const c = text.charCodeAt(i);
    if (c === 0x0a || c === 0x0d || (slash && c === SLASH)) i++;
    else return i;
  }
}

/** `\p{N}{1,3}` from p (text[p] is a number), or -1 when a surrogate comes within the three (a digit outside the BMP could be one). */
function digits(C: Uint8Array, text: string, p: number): number {
  let e = p + 1;
  while (e < p + 3) {
    const d = classAt(C, text, e);
    if ((d & NUMBER) === 0) return (d & SURROGATE) === 0 ? e : -1;
    e++;
  }
  return e;
}

/**
 * ` ?[^\s\p{L}\p{N}]+` from p (whose class is c), then any `\r`, `\n` (and `/` when
 * `slash`, as o200k_base has it): the end, -1 at a surrogate, -2 when neither form matches.
 */
function punctuation(C: Uint8Array, text: string, p: number, c: number, slash: boolean): number {
  let s = -1;
  if (text.charCodeAt(p) === SPACE_UNIT) {
    const d = classAt(C, text, p + 1);
    if ((d & SURROGATE) !== 0) return -1;
    if ((d & OTHER) !== 0) s = p + 1;
  }
  if (s < 0 && (c & OTHER) !== 0) s = p;
  if (s < 0) return -2;
  const o = run(C, text, s, OTHER);
  return o < 0 ? -1 : trailing(text, o, slash);
}

/**
 * A whitespace run p..q (`\s*[\r\n]+`, `\s+(?!\S)`, `\s+`) as cl100k_base and o200k_base
 * split it, given that no letter-prefix or punctuation alternative applies.
 */
function spaceRunWithNewlines(C: Uint8Array, text: string, p: number, q: number): number {
  // \s*[\r\n]+ takes the run up to and including its last newline.
  for (let i = q - 1; i >= p; i--) {
    const u = text.charCodeAt(i);
    if (u === 0x0a || u === 0x0d) return i + 1;
  }
  // \s+(?!\S): the whole run at the end of the text, else all but its last character.
  if (q === text.length || q - p === 1) return q;
  return q - 1;
}

/** Returns the end of the piece at p under the gpt2 / r50k_base / p50k_base pattern, or -1 (see the top of the file). */
export const splitGpt2: PieceSplitter = (text, p) => {
  const C = unitClasses();
  const c = C[text.charCodeAt(p)] as number;
  if ((c & SURROGATE) !== 0) return -1;
  if (text.charCodeAt(p) === APOSTROPHE) {
    const len = contraction(text, p, false);
    if (len > 0) return p + len;
  }
  // ` ?\p{L}+| ?\p{N}+| ?[^\s\p{L}\p{N}]+`
  let s = p;
  let k = c;
  if (text.charCodeAt(p) === SPACE_UNIT) {
    const d = classAt(C, text, p + 1);
    if ((d & SURROGATE) !== 0) return -1;
    if ((d & (LETTER | NUMBER | OTHER)) !== 0) {
      s = p + 1;
      k = d;
    }
  }
  if ((k & LETTER) !== 0) return run(C, text, s, LETTER);
  if ((k & NUMBER) !== 0) return run(C, text, s, NUMBER);
  if ((k & OTHER) !== 0) return run(C, text, s, OTHER);
  // Whitespace: \s+(?!\S) leaves the last character of a run before non-space; \s+ takes a lone one.
  const q = spaceRun(C, text, p);
  if (q === text.length || q - p === 1) return q;
  return q - 1;
};

/**
 * `[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]*[\p{Ll}\p{Lm}\p{Lo}\p{M}]+` from s, as the regex
 * backtracks: the upper-ish run as far as it goes, then the lower-ish run after it;
 * failing that, the run given back to its last lower-ish unit. -1 when a surrogate is
 * read, -2 when there is no match.
 */
function upperThenLower(C: Uint8Array, text: string, s: number): number {
  const u = run(C, text, s, UPPERISH);
  if (u < 0) return -1;
  const next = classAt(C, text, u);
  if ((next & LOWERISH) !== 0) return run(C, text, u, LOWERISH);
  if ((next & SURROGATE) !== 0) return -1;
  for (let j = u - 1; j >= s; j--) if (((C[text.charCodeAt(j)] as number) & LOWERISH) !== 0) return j + 1;
  return -2;
}

/** `[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]+[\p{Ll}\p{Lm}\p{Lo}\p{M}]*` from s: -1 at a surrogate, -2 when text[s] is not upper-ish. */
function upperAndLower(C: Uint8Array, text: string, s: number): number {
  const first = classAt(C, text, s);
  if ((first & UPPERISH) === 0) return (first & SURROGATE) === 0 ? -2 : -1;
  const u = run(C, text, s, UPPERISH);
  return u < 0 ? -1 : run(C, text, u, LOWERISH);
}

/** The first two alternatives of o200k_base from p, prefix first: the end with any contraction, -1 at a surrogate, -2 when neither matches. */
function o200kWord(C: Uint8Array, text: string, p: number, prefixed: boolean, letterish: boolean): number {
  let e = -2;
  if (prefixed) e = upperThenLower(C, text, p + 1);
  if (e === -2 && letterish) e = upperThenLower(C, text, p);
  if (e === -2 && prefixed) e = upperAndLower(C, text, p + 1);
  if (e === -2 && letterish) e = upperAndLower(C, text, p);
  return e < 0 ? e : e + contraction(text, e, true);
}

/** Returns the end of the piece at p under o200k_base's pattern (patterns.ts), or -1. */
export const splitO200k: PieceSplitter = (text, p) => {
  const C = unitClasses();
  const c = C[text.charCodeAt(p)] as number;
  if ((c & SURROGATE) !== 0) return -1;
  const letterish = (c & (UPPERISH | LOWERISH)) !== 0;
  if (letterish && (c & PREFIX) === 0) {
    // A letter: one of the first two alternatives matches (every letter is upper- or lower-ish).
    const e = o200kWord(C, text, p, false, true);
    return e < 0 ? -1 : e;
  }
  if ((c & NUMBER) !== 0) return digits(C, text, p);
  if ((c & PREFIX) !== 0) {
    // [^\r\n\p{L}\p{N}]? before letters; a mark may also start the letters itself.
    const e = o200kWord(C, text, p, true, letterish);
    if (e !== -2) return e;
    // ` ?[^\s\p{L}\p{N}]+[\r\n/]*`
    const o = punctuation(C, text, p, c, true);
    if (o !== -2) return o;
  }
  // Whitespace.
  return spaceRunWithNewlines(C, text, p, spaceRun(C, text, p));
};

/** Returns the end of the piece at p under cl100k_base's pattern (patterns.ts), or -1. */
export const splitCl100k: PieceSplitter = (text, p) => {
  const C = unitClasses();
  const c = C[text.charCodeAt(p)] as number;
  if ((c & SURROGATE) !== 0) return -1;
  if (text.charCodeAt(p) === APOSTROPHE) {
    const len = contraction(text, p, true);
    if (len > 0) return p + len;
  }
  if ((c & LETTER) !== 0) return run(C, text, p, LETTER);
  if ((c & NUMBER) !== 0) return digits(C, text, p);
  if ((c & PREFIX) !== 0) {
    // [^\r\n\p{L}\p{N}]?\p{L}+
    const d = classAt(C, text, p + 1);
    if ((d & SURROGATE) !== 0) return -1;
    if ((d & LETTER) !== 0) return run(C, text, p + 1, LETTER);
    // ` ?[^\s\p{L}\p{N}]+[\r\n]*`
    const o = punctuation(C, text, p, c, false);
    if (o !== -2) return o;
  }
  return spaceRunWithNewlines(C, text, p, spaceRun(C, text, p));
};
