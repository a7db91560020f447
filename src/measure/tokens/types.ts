// The contract of the tokens stage: a loaded tokenizer that counts tokens, and what
// one document's text measures in it. Fertility figures are folded from these sums.

import type { PieceList } from './pieces.js';

/** Hit and miss counts of a counter's piece cache, for benchmarks and tests. */
export interface CacheStats {
  hits: number;
  misses: number;
  /** How many times the young generation was retired (entries not used since are dropped). */
  evictions: number;
  /** Entries held now, both generations. */
  entries: number;
}

/** The tokenizer families sluice loads. */
export type TokenizerKind = 'tiktoken' | 'bpe' | 'wordpiece' | 'unigram';

/** A rank counter's state in shared memory: the piece counts every thread fills (shared-counts.ts) and the rank table (ranks.ts); null where it keeps none. */
export interface SharedTokenizerTables {
  counts: SharedArrayBuffer | null;
  ranks: SharedArrayBuffer | null;
}

export interface TokenCounter {
  /** Stable identity for caches: `builtin:<name>`, or the format and sha256 of the file content (and split pattern, for rank files). */
  id: string;
  /** For reports: the builtin name (`o200k_base`) or the file as the policy wrote it. */
  label: string;
  kind: TokenizerKind;
  /** Id of the tokenizer's unknown token, or null when it has none (byte-level vocabularies). */
  unknownTokenId: number | null;
  /**
   * True when counts are sums of cached per-piece counts (proven equal to the library's
   * whole-text encode); false when every text goes through the library's encode.
   */
  exactFastPath: boolean;
  /**
   * Tokens of the whole text, exactly as many as the library's encode returns with no special
   * tokens added, and how many of them are the unknown token. Throws a TokenizerError (stage
   * `count`) naming the tokenizer if the library cannot encode the text: never a partial count.
   */
  count(text: string): { tokens: number; unknown: number };
  /** Tokens of one word as it occurs in text, e.g. `" काम"` with its leading space. */
  countPiece(piece: string): number;
  /**
   * Returns the same as count(text) and records each pre-token piece (end and tokens) in
   * `pieces`. Present only where a piece that is a whole word span (with its leading
   * space) provably counts the same as countPiece of that span, so measureTokens may
   * reuse it; absent counters are measured word by word.
   */
  countWithPieces?(text: string, pieces: PieceList): { tokens: number; unknown: number };
  /**
   * measureTokens' figures for a text given its words (start and end of each, in order, as
   * words.ts's wordOffsets gives them): the same as counting with pieces and then each word
   * alone, done in one go where the counter can (the token kernel); null where it cannot, and
   * the caller measures it the other way.
   */
  measureWords?(text: string, offsets: Int32Array): TokenMeasure | null;
  cacheStats(): CacheStats;
  /** The tables in shared memory this counter works from, for other threads' counters of the same tokenizer to adopt (rank counters only). */
  shareTables?(): SharedTokenizerTables;
  /** Uses another thread's tables (from shareTables) from now on; false, and nothing changes, when they were made for another tokenizer. */
  adoptTables?(tables: SharedTokenizerTables): boolean;
  /** For a counter loaded with `deferBuiltin`: loads what counting needs; every count before it settles throws. Absent: ready from the start. */
  ready?(): Promise<void>;
}

/** What one text measures in one tokenizer; all fields are sums, so measures add up. */
export interface TokenMeasure {
  /** Tokens of the whole text. */
  tokens: number;
  /** Of those, unknown tokens. */
  unknown: number;
  /** Word-like segments (UAX #29). */
  words: number;
  /** Σ over words of the tokens of the word alone (with its preceding space). */
  wordTokens: number;
  /** Words of two or more tokens. */
  continuedWords: number;
}

/** Fertility figures of a summed TokenMeasure; null where there are no words. */
export interface FertilityFigures {
  /** Subword tokens per word (Rust et al., 2021): wordTokens / words. */
  fertility: number | null;
  /** Share of words split into two or more tokens (same paper): continuedWords / words. */
  continued: number | null;
  /** Tokens of the running text per word: tokens / words (a compression figure). */
  tokensPerWord: number | null;
}

/** Segments a text into words, calling back with each word-like segment's UTF-16 offsets. */
export type ForEachWord = (text: string, cb: (start: number, end: number) => void) => void;

/** Returns a text's word-like segments as [start, end) UTF-16 offsets, two per word in order, or null when it cannot (the caller then uses a ForEachWord); the caller only reads them, and before it segments any other text. */
export type WordOffsets = (text: string) => Int32Array | null;
