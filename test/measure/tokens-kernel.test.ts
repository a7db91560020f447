// Token counting through the WebAssembly kernel (src/measure/kernels/tokens.c): its cache
// of piece counts, long texts, texts the kernel hands back, and failures mid-text. The
// reference is js-tiktoken's own encode; the kernel's splitters are held to the patterns in
// tokens-split.test.ts.
import { Tiktoken } from 'js-tiktoken/lite';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import { beforeAll, describe, expect, it } from 'vitest';
import { MAX_KERNEL_UNITS, MAX_MERGE_UNITS } from '../../src/measure/kernels/tokens-kernel.js';
import { hashRange } from '../../src/measure/tokens/cache.js';
import { PieceList } from '../../src/measure/tokens/pieces.js';
import { parseBuiltinRanks, type RankTable } from '../../src/measure/tokens/ranks.js';
import { SharedPieceCounts } from '../../src/measure/tokens/shared-counts.js';
import { createRankCounter, type RankCounterOptions } from '../../src/measure/tokens/tiktoken.js';
import { BUILTIN_PATTERNS } from '../../src/measure/tokens/patterns.js';
import { TokenizerError } from '../../src/measure/tokens/errors.js';
import { generator } from '../fixtures/prng.js';
import { brownSample, EDGE_TEXTS, UDHR_SCRIPTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

const ID = 'builtin:o200k_base';
let ranks: RankTable;
let reference: Tiktoken;

beforeAll(() => {
  ranks = parseBuiltinRanks(o200kRanks.bpe_ranks, 'o200k_base', ID);
  reference = new Tiktoken(o200kRanks);
});

/** An o200k_base counter with no shared table and small caches of its own, so that the kernel's cache answers what it can. */
const counterWith = (options: Partial<RankCounterOptions> = {}) =>
  createRankCounter({ id: ID, label: 'o200k_base', ranks, pattern: BUILTIN_PATTERNS.o200k_base, shared: null, generationSize: 64, ...options });

const encoded = (text: string): number => reference.encode(text, [], []).length;

/** Pieces of a text as a counter records them: [end, count] pairs. */
function piecesOf(counter: ReturnType<typeof counterWith>, text: string): number[][] {
  const list = new PieceList();
  counter.countWithPieces!(text, list);
  return Array.from({ length: list.length }, (_, k) => [list.ends[k]!, list.counts[k]!]);
}

describe('token counting in the kernel', () => {
  it('counts exactly as js-tiktoken encodes, with a cache of 4 entries whose every slot is overwritten again and again', () => {
    const tiny = counterWith({ kernelCacheEntries: 4 });
    const texts = [...brownSample(40), ...UDHR_SCRIPTS.flatMap((code) => udhrParagraphs(code).slice(0, 20)), ...EDGE_TEXTS];
    expect(texts.length).toBeGreaterThan(300);
    for (let round = 0; round < 2; round++) {
      expect(texts.filter((t) => tiny.count(t).tokens !== encoded(t)).map((t) => t.slice(0, 40))).toEqual([]);
    }
    expect(tiny.cacheStats().hits).toBeGreaterThan(0);
  });

  it('tells apart two pieces of the same length and the same 32-bit hash (keys, not hashes, decide)', () => {
    // A birthday search over random " xxxxxx" pieces (one o200k_base piece each) for two
    // with the same FNV-1a hash and different token counts; about 2^16 draws give a collision.
    const next = generator(7);
    const seen = new Map<number, string>();
    let pair: [string, string] | null = null;
    for (let i = 0; i < 2_000_000 && pair === null; i++) {
      let piece = ' ';
      for (let j = 0; j < 6; j++) piece += String.fromCharCode(0x61 + Math.floor(next() * 26));
      const hash = hashRange(piece, 0, piece.length);
      const other = seen.get(hash);
      if (other !== undefined && other !== piece && encoded(other) !== encoded(piece)) pair = [other, piece];
      else seen.set(hash, piece);
    }
    expect(pair).not.toBeNull();
    const [a, b] = pair!;
    expect(hashRange(a, 0, a.length)).toBe(hashRange(b, 0, b.length));
    // One entry: both pieces land in it, one after the other.
    const single = counterWith({ kernelCacheEntries: 1 });
    for (const text of [a, b, a, a, b, b, `${a}${b}${a}`]) expect(single.count(text).tokens).toBe(encoded(text));
  });

  it('records the same pieces as the TypeScript path for a long text with characters outside the BMP along it', () => {
    const withKernel = counterWith();
    const without = counterWith({ kernel: false });
    const parts = brownSample(10).slice(0, 420);
    // Emoji and an astral letter make the kernel stop and hand one piece to the regex.
    const text = parts.join(' 😀 ').replace(/the /g, 'the 𝐀 ');
    expect(text.length).toBeLessThanOrEqual(MAX_KERNEL_UNITS);
    const pieces = piecesOf(withKernel, text);
    expect(pieces.length).toBeGreaterThan(20_000);
    expect(pieces).toEqual(piecesOf(without, text));
    expect(withKernel.count(text).tokens).toBe(encoded(text));
  });

  it(`counts a text longer than the kernel takes (${MAX_KERNEL_UNITS} units) in TypeScript, exactly`, () => {
    const counter = counterWith();
    const text = 'मौसम विभाग ने शाम को बारिश की चेतावनी दी। The desk filed at nine. '.repeat(Math.ceil((MAX_KERNEL_UNITS + 10) / 66));
    expect(text.length).toBeGreaterThan(MAX_KERNEL_UNITS);
    expect(counter.count(text).tokens).toBe(encoded(text));
  });

  it('fails a count whose look-up throws mid-text with a TokenizerError, and counts exactly afterwards', () => {
    // A shared table that fails when armed stands in for any failure inside the kernel's call back.
    let armed = false;
    const table = SharedPieceCounts.create(ID);
    const failing = Object.create(table, {
      find: {
        value(text: string, start: number, end: number, hash: number): number {
          if (armed) throw new Error('count table unreadable');
          return table.find(text, start, end, hash);
        },
      },
    }) as SharedPieceCounts;
    const counter = counterWith({ shared: failing });
    const first = 'The evening bulletin led with the monsoon.';
    expect(counter.count(first).tokens).toBe(encoded(first));
    armed = true;
    // Pieces the kernel's cache has not seen are looked up; the first of them throws inside the call back.
    const second = `${first} Zanzibarian quixotically flummoxed`;
    expect(() => counter.count(second)).toThrow(TokenizerError);
    expect(() => counter.count(second)).toThrow(/^o200k_base: cannot encode text: count table unreadable$/);
    armed = false;
    expect(counter.count(second).tokens).toBe(encoded(second));
    expect(counter.count(first).tokens).toBe(encoded(first));
  });

  it(`merges pieces just inside and past the kernel's limit (${MAX_MERGE_UNITS} units), and long ones with a heap, exactly as js-tiktoken does`, () => {
    const counter = counterWith();
    const letters = (n: number, alphabet: string, seed: number): string => {
      const next = generator(seed);
      let s = '';
      for (let i = 0; i < n; i++) s += alphabet[Math.floor(next() * alphabet.length)];
      return s;
    };
    // One piece each: runs of lowercase letters (a DNA-like alphabet merges deeply), of Devanagari
    // letters and marks, and of one letter; around the kernel's limit, around bpe.ts's
    // HEAP_MERGE_BYTES (512), and far past both.
    const pieces = [
      letters(MAX_MERGE_UNITS - 1, 'acgt', 1),
      letters(MAX_MERGE_UNITS + 1, 'acgt', 2),
      letters(511, 'acgt', 3),
      letters(512, 'acgt', 4),
      letters(513, 'qwertyuiopasdfghjklzxcvbnm', 5),
      letters(2500, 'acgt', 6),
      ` ${letters(2500, 'abcdefghij', 7)}`,
      letters(800, 'कमलनयनअ', 8),
      'a'.repeat(3000),
    ];
    for (const text of pieces) expect(counter.count(text).tokens).toBe(encoded(text));
  });

  it('counts a piece of 400,000 letters (the scan of every pair would take hours), the same on a second call and with a word after it', () => {
    const counter = counterWith();
    // js-tiktoken's own merges scan every pair too, so it cannot be the reference at this length;
    // the heap's exactness is checked against it above. Here: a count at all, within bounds, the
    // same again (the piece is too long to be cached), and adding up with a word after it.
    const text = 'acgt'.repeat(100_000);
    const tokens = counter.count(text).tokens;
    expect(tokens).toBeGreaterThan(0);
    expect(tokens).toBeLessThanOrEqual(text.length);
    expect(counter.count(text).tokens).toBe(tokens);
    expect(counter.count(`${text} end`).tokens).toBe(tokens + encoded(' end'));
  });



  it('measures words as counting each word alone does (measure.ts), also words holding characters outside the BMP', () => {
    const counter = counterWith();
    const texts = [
      ...brownSample(40).slice(0, 200),
      ...UDHR_SCRIPTS.flatMap((code) => udhrParagraphs(code).slice(0, 10)),
      // Astral letters inside words: the kernel leaves those words to countPiece.
      'The 𝐀𝐁𝐂 desk and the 𐐀𐐨 bureau filed at 𝟗 tonight; मौसम 𝐀विभाग',
      ...EDGE_TEXTS,
    ];
    const segmenter = new Intl.Segmenter('und', { granularity: 'word' });
    let left = 0;
    for (const text of texts) {
      const offsets: number[] = [];
      for (const s of segmenter.segment(text)) if (s.isWordLike) offsets.push(s.index, s.index + s.segment.length);
      const got = counter.measureWords!(text, Int32Array.from(offsets));
      expect(got).not.toBeNull();
      // The definition: the whole text's tokens, and each word with the one space before it alone.
      let wordTokens = 0;
      let continuedWords = 0;
      for (let w = 0; w < offsets.length; w += 2) {
        const start = offsets[w]!;
        const from = start > 0 && text[start - 1] === ' ' ? start - 1 : start;
        const n = encoded(text.slice(from, offsets[w + 1]));
        wordTokens += n;
        if (n >= 2) continuedWords++;
        if (/[\ud800-\udfff]/.test(text.slice(from, offsets[w + 1]))) left++;
      }
      expect(got).toEqual({ tokens: encoded(text), unknown: 0, words: offsets.length / 2, wordTokens, continuedWords });
    }
    expect(left).toBeGreaterThan(3);
  });
});
