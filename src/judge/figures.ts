// Figures derived from the corpus result: shares, purity, fertility. The rules
// and every view read these; nothing downstream divides counts again.
import type { MixUnit, Policy } from '../policy/types.js';
import type { CorpusResult, TokenizerInfo } from '../results/corpus.js';
import type { LanguageTally, TokenTally } from '../results/types.js';
import type { LanguageFigures, Shares, TokenFigures } from './types.js';

/** Returns a ÷ b, or null when b is 0. */
export function ratio(a: number, b: number): number | null {
  return b === 0 ? null : a / b;
}

/** Returns the amount of a language tally in a mix unit (tokens: under the main tokenizer). */
export function amountIn(t: LanguageTally, unit: MixUnit): number {
  switch (unit) {
    case 'docs':
      return t.docs;
    case 'bytes':
      return t.bytes;
    case 'chars':
      return t.chars;
    case 'words':
      return t.words;
    case 'tokens':
      return t.tokens?.tokens ?? 0;
  }
}

/** Returns the number of documents with purity below `minPurity`, from a 1 %-bin histogram. */
export function docsBelowPurity(histogram: readonly number[], minPurity: number): number {
  // Bin i holds purities in [i/100, (i+1)/100); the minimum is judged at 1 % resolution.
  const firstPure = Math.floor(minPurity * 100 + 1e-9);
  let n = 0;
  for (let i = 0; i < firstPure && i < histogram.length; i++) n += histogram[i]!;
  return n;
}

/** Returns fertility and compression figures of a language under one tokenizer. */
export function tokenFigures(t: LanguageTally, tokens: TokenTally, tokenizer: TokenizerInfo): TokenFigures {
  return {
    tokenizer: tokenizer.label,
    tokens: tokens.tokens,
    fertility: ratio(tokens.wordTokens, t.words),
    continuedWords: ratio(tokens.continuedWords, t.words),
    tokensPerWord: ratio(tokens.tokens, t.words),
    charsPerToken: ratio(t.chars, tokens.tokens),
    bytesPerToken: ratio(t.bytes, tokens.tokens),
    unknownRate: tokenizer.hasUnknown ? ratio(tokens.unknown, tokens.tokens) : null,
  };
}

/** Returns per-language figures (policy languages in policy order, then other and und). */
export function languageFigures(policy: Policy, corpus: CorpusResult): Record<string, LanguageFigures> {
  const keys = [...policy.languages.map((l) => l.key), 'other', 'und'];
  const langs = corpus.tally.languages;
  const total = (unit: MixUnit): number => keys.reduce((s, k) => s + (langs[k] ? amountIn(langs[k], unit) : 0), 0);
  const totals = { docs: total('docs'), bytes: total('bytes'), chars: total('chars'), words: total('words'), tokens: total('tokens') };
  const out: Record<string, LanguageFigures> = {};
  for (const key of keys) {
    const t = langs[key];
    if (!t) continue;
    const share: Shares = {
      docs: ratio(t.docs, totals.docs) ?? 0,
      bytes: ratio(t.bytes, totals.bytes) ?? 0,
      chars: ratio(t.chars, totals.chars) ?? 0,
      words: ratio(t.words, totals.words) ?? 0,
    };
    if (corpus.tokenizer) share.tokens = ratio(t.tokens?.tokens ?? 0, totals.tokens) ?? 0;
    const spec = policy.languages.find((l) => l.key === key);
    const f: LanguageFigures = {
      key,
      docs: t.docs,
      bytes: t.bytes,
      chars: t.chars,
      words: t.words,
      share,
      purity: ratio(t.expectedScriptChars, t.scriptChars),
      purityDocs: t.purityDocs,
    };
    if (spec?.target !== undefined) f.target = spec.target;
    if (policy.rules.script) f.impureDocs = docsBelowPurity(t.purityHistogram, policy.rules.script.minPurity);
    const declaredRow = corpus.tally.declared[key];
    if (declaredRow) {
      const declaredDocs = Object.values(declaredRow).reduce((a, b) => a + b, 0);
      f.declaredDocs = declaredDocs;
      f.mismatchDocs = declaredDocs - (declaredRow[key] ?? 0) - (declaredRow['und'] ?? 0);
      f.detectedAs = declaredRow;
    }
    if (corpus.tokenizer && t.tokens) {
      f.tokens = t.tokens.tokens;
      f.fertility = tokenFigures(t, t.tokens, corpus.tokenizer);
      const dict = corpus.dictionary?.[key];
      if (dict) f.fertility.dictionary = { entries: dict.main.entries, fertility: dict.main.fertility, continuedWords: dict.main.continued, list: dict.main.list };
    }
    if (corpus.baseline && t.baseline) {
      f.baseline = tokenFigures(t, t.baseline, corpus.baseline);
      const dict = corpus.dictionary?.[key]?.baseline;
      if (dict) f.baseline.dictionary = { entries: dict.entries, fertility: dict.fertility, continuedWords: dict.continued, list: dict.list };
    }
    out[key] = f;
  }
  return out;
}
