// Running-text token measures of one document: tokens of the whole text, and per word
// the tokens of the word alone, from which fertility and the proportion of continued
// words (Rust et al., 2021) are folded.

import { PieceList } from './pieces.js';
import type { FertilityFigures, ForEachWord, TokenCounter, TokenMeasure, WordOffsets } from './types.js';

const SPACE = 0x20;

/**
 * Returns the token measure of a text. A counter that measures words itself (measureWords: the
 * token kernel, which matches words to pieces and splits the others alone in one call) does so
 * when the words' offsets are at hand; in a CPU profile of the tokenizer-only check of the 40 MB
 * bench corpus this walk then took 35 ms in the kernel, against 119 ms in measureByOffsets (same report). Each word is counted with the one space before it
 * when the text has one (U+0020 only): that is how a word occurs mid-sentence, and
 * byte-level vocabularies store " word" and "word" as different tokens. `wordOffsets`, when
 * given, must report the same words as `forEachWord` (as words.ts's pair do).
 */
export function measureTokens(counter: TokenCounter, text: string, forEachWord: ForEachWord, wordOffsets?: WordOffsets): TokenMeasure {
  if (counter.countWithPieces !== undefined) {
    const offsets = wordOffsets?.(text) ?? null;
    const measured = offsets === null ? null : (counter.measureWords?.(text, offsets) ?? null);
    if (measured !== null) return measured;
    return offsets === null ? measureByPieces(counter, text, forEachWord) : measureByOffsets(counter, text, offsets);
  }
  const { tokens, unknown } = counter.count(text);
  let words = 0;
  let wordTokens = 0;
  let continuedWords = 0;
  forEachWord(text, (start, end) => {
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE ? start - 1 : start;
    const n = counter.countPiece(text.slice(from, end));
    words++;
    wordTokens += n;
    if (n >= 2) continuedWords++;
  });
  return { tokens, unknown, words, wordTokens, continuedWords };
}

// Reused between documents: measureTokens is not re-entered (forEachWord's callback only counts).
const scratch = new PieceList();

/**
 * measureTokens for a counter that records its pieces: a word whose span is exactly one
 * piece takes that piece's count (see countWithPieces), any other word is counted alone.
 * Gives the same figures as the word-by-word path (test/measure/tokens-pieces.test.ts).
 * Measured with scripts/bench-tokens.mjs (o200k_base, warm caches, one run each, shared
 * machine): Brown 19.2 MB/s against 11.9 word by word, 18,003 of 1,022,235 words still
 * counted alone; UDHR Hindi 33.8 against 31.3. The full check on the 10 MB bench corpus
 * went from 3.6-3.9 to 4.4-5.0 MB/s (3 alternating runs) with this and the ranks/BPE changes together.
 */
function measureByPieces(counter: TokenCounter, text: string, forEachWord: ForEachWord): TokenMeasure {
  const pieces = scratch;
  const { tokens, unknown } = counter.countWithPieces!(text, pieces);
  const { ends, counts, length } = pieces;
  let words = 0;
  let wordTokens = 0;
  let continuedWords = 0;
  // k: the first piece that ends after the current word's start; words come in text order.
  let k = 0;
  let last = 0;
  forEachWord(text, (start, end) => {
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE ? start - 1 : start;
    if (from < last) k = 0;
    last = from;
    while (k < length && ends[k]! <= from) k++;
    const n =
      k < length && ends[k] === end && (k === 0 ? 0 : ends[k - 1]!) === from
        ? counts[k]!
        : counter.countPiece(text.slice(from, end));
    words++;
    wordTokens += n;
    if (n >= 2) continuedWords++;
  });
  return { tokens, unknown, words, wordTokens, continuedWords };
}

/**
 * measureByPieces over the words' offsets (two per word, as wordOffsets returns them): the same
 * walk as a loop instead of a callback per word, whose call site in forEachWord serves every
 * analyzer and so is not inlined. In-process A/B against the callback walk (CPU time, warm
 * o200k_base counting with fertility over the 40 MB bench corpus, words memoized by countWords
 * as in the full check, best of 6 rounds in both orders, shared 2-core machine): 0.92× and
 * 0.91× (0.90× and 0.88× without countWords' own time); without the memo 0.96×. In separate
 * processes alternating with the front-cache-only code the medians were level (1.215 s
 * against 1.22 s): the machine's noise there was larger than the gain.
 */
function measureByOffsets(counter: TokenCounter, text: string, offsets: Int32Array): TokenMeasure {
  const pieces = scratch;
  const { tokens, unknown } = counter.countWithPieces!(text, pieces);
  const { ends, counts, length } = pieces;
  const words = offsets.length >> 1;
  let wordTokens = 0;
  let continuedWords = 0;
  // k: the first piece that ends after the current word's start; words come in text order.
  let k = 0;
  for (let w = 0; w < words; w++) {
    const start = offsets[w * 2]!;
    const end = offsets[w * 2 + 1]!;
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE ? start - 1 : start;
    while (k < length && ends[k]! <= from) k++;
    const n =
      k < length && ends[k] === end && (k === 0 ? 0 : ends[k - 1]!) === from
        ? counts[k]!
        : counter.countPiece(text.slice(from, end));
    wordTokens += n;
    if (n >= 2) continuedWords++;
  }
  return { tokens, unknown, words, wordTokens, continuedWords };
}

/** Returns a measure with all zeros, the identity of addTokenMeasures. */
export function emptyTokenMeasure(): TokenMeasure {
  return { tokens: 0, unknown: 0, words: 0, wordTokens: 0, continuedWords: 0 };
}

/** Returns the sum of two measures. */
export function addTokenMeasures(a: TokenMeasure, b: TokenMeasure): TokenMeasure {
  return {
    tokens: a.tokens + b.tokens,
    unknown: a.unknown + b.unknown,
    words: a.words + b.words,
    wordTokens: a.wordTokens + b.wordTokens,
    continuedWords: a.continuedWords + b.continuedWords,
  };
}

/** Returns fertility, continued-word share and tokens per word of a summed measure (null without words). */
export function fertilityOf(m: TokenMeasure): FertilityFigures {
  if (m.words === 0) return { fertility: null, continued: null, tokensPerWord: null };
  return {
    fertility: m.wordTokens / m.words,
    continued: m.continuedWords / m.words,
    tokensPerWord: m.tokens / m.words,
  };
}
