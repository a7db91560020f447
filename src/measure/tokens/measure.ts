// Running-text token measures of one document: tokens of the whole text, and per word
// the tokens of the word alone, from which fertility and the proportion of continued
// words (Rust et al., 2021) are folded.

import type { FertilityFigures, ForEachWord, TokenCounter, TokenMeasure } from './types.js';

const SPACE = 0x20;

/**
 * Returns the token measure of a text. Each word is counted with the one space before it
 * when the text has one (U+0020 only): that is how a word occurs mid-sentence, and
 * byte-level vocabularies store " word" and "word" as different tokens.
 */
export function measureTokens(counter: TokenCounter, text: string, forEachWord: ForEachWord): TokenMeasure {
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
