// Folding per-document measures into per-shard tallies, and tallies into corpus
// totals. Pure functions: the same documents give the same tallies in any split.
import type { AnomalyKind } from '../policy/types.js';
import type { DocumentMeasure } from '../measure/types.js';
import {
  ANOMALY_KINDS,
  PURITY_BINS,
  SAMPLES_PER_KIND,
  type LanguageTally,
  type LineSample,
  type ShardResult,
  type TokenTally,
} from './types.js';

/** Returns an empty language tally. */
export function emptyLanguageTally(): LanguageTally {
  return {
    docs: 0,
    bytes: 0,
    chars: 0,
    words: 0,
    purityDocs: 0,
    scriptChars: 0,
    expectedScriptChars: 0,
    purityHistogram: new Array<number>(PURITY_BINS).fill(0),
  };
}

/** Returns an empty token tally. */
export function emptyTokenTally(): TokenTally {
  return { tokens: 0, unknown: 0, wordTokens: 0, continuedWords: 0 };
}

/** Returns the purity histogram bin of a purity in [0, 1]. */
export function purityBin(purity: number): number {
  return Math.min(PURITY_BINS - 1, Math.max(0, Math.floor(purity * 100 + 1e-9)));
}

/** Returns the bit mask of the anomaly kinds present in a document (0 when clean). */
export function anomalyMask(anomalies: Record<AnomalyKind, number>): number {
  let mask = 0;
  ANOMALY_KINDS.forEach((kind, i) => {
    if ((anomalies[kind] ?? 0) > 0) mask |= 1 << i;
  });
  return mask;
}

/** Returns the anomaly kinds in a mask. */
export function kindsOfMask(mask: number): AnomalyKind[] {
  return ANOMALY_KINDS.filter((_, i) => (mask & (1 << i)) !== 0);
}

/** Returns the mask of a list of anomaly kinds. */
export function maskOfKinds(kinds: readonly AnomalyKind[]): number {
  return kinds.reduce((m, k) => m | (1 << ANOMALY_KINDS.indexOf(k)), 0);
}

/** Tokens measured for one document, under the main tokenizer and the baseline. */
export interface DocumentTokens {
  main?: { tokens: number; unknown: number; wordTokens: number; continuedWords: number };
  baseline?: { tokens: number; unknown: number; wordTokens: number; continuedWords: number };
}

/** A tally's contents as plain data: what a batch measured on another thread sends back. */
export interface TallyState {
  languages: Record<string, LanguageTally>;
  scripts: Record<string, number>;
  anomalyMasks: Record<string, number>;
  anomalyDocs: Record<AnomalyKind, number>;
  declared: Record<string, Record<string, number>>;
  impure: Array<LineSample & { language: string; purity: number }>;
  anomalous: Array<LineSample & { kinds: AnomalyKind[] }>;
  mismatch: Array<LineSample & { declared: string; detected: string }>;
}

/** Accumulates one shard's documents; `finish` hands back the tallies. */
export class ShardTally {
  readonly languages: Record<string, LanguageTally> = {};
  readonly scripts: Record<string, number> = {};
  readonly anomalyMasks: Record<string, number> = {};
  readonly anomalyDocs = Object.fromEntries(ANOMALY_KINDS.map((k) => [k, 0])) as Record<AnomalyKind, number>;
  readonly declared: Record<string, Record<string, number>> = {};
  readonly impure: Array<LineSample & { language: string; purity: number }> = [];
  readonly anomalous: Array<LineSample & { kinds: AnomalyKind[] }> = [];
  readonly mismatch: Array<LineSample & { declared: string; detected: string }> = [];

  constructor(languageKeys: readonly string[]) {
    for (const key of [...languageKeys, 'other', 'und']) this.languages[key] = emptyLanguageTally();
  }

  private lang(key: string): LanguageTally {
    let t = this.languages[key];
    if (!t) this.languages[key] = t = emptyLanguageTally();
    return t;
  }

  /** Adds one document's measures, with its line for located samples. */
  add(line: number, m: DocumentMeasure, tokens?: DocumentTokens): void {
    const t = this.lang(m.language);
    t.docs += 1;
    t.bytes += m.bytes;
    t.chars += m.chars;
    t.words += m.words;
    if (tokens?.main) addTokens((t.tokens ??= emptyTokenTally()), tokens.main);
    if (tokens?.baseline) addTokens((t.baseline ??= emptyTokenTally()), tokens.baseline);

    let scriptChars = 0;
    for (const [script, n] of Object.entries(m.scripts)) {
      this.scripts[script] = (this.scripts[script] ?? 0) + n;
      scriptChars += n;
    }
    if (m.purity !== null) {
      const basis = this.lang(m.declared !== undefined && m.declared !== 'other' ? m.declared : m.language);
      basis.purityDocs += 1;
      basis.scriptChars += scriptChars;
      basis.expectedScriptChars += Math.round(m.purity * scriptChars);
      basis.purityHistogram[purityBin(m.purity)]! += 1;
      // Most documents are not among the lowest few: describe their scripts only when kept.
      const list = this.impure;
      if (list.length < SAMPLES_PER_KIND || m.purity < list[list.length - 1]!.purity) {
        keepLowest(list, { line, language: m.declared ?? m.language, purity: m.purity, detail: describeScripts(m.scripts) });
      }
    }

    const mask = anomalyMask(m.anomalies);
    if (mask !== 0) {
      this.anomalyMasks[mask] = (this.anomalyMasks[mask] ?? 0) + 1;
      const kinds = kindsOfMask(mask);
      for (const k of kinds) this.anomalyDocs[k] += 1;
      if (this.anomalous.length < SAMPLES_PER_KIND) {
        this.anomalous.push({ line, kinds, detail: kinds.map((k) => `${k} ×${m.anomalies[k]}`).join(', ') });
      }
    }

    if (m.declared !== undefined) {
      const row = (this.declared[m.declared] ??= {});
      row[m.language] = (row[m.language] ?? 0) + 1;
      if (m.declared !== m.language && m.language !== 'und' && this.mismatch.length < SAMPLES_PER_KIND) {
        this.mismatch.push({ line, declared: m.declared, detected: m.language, detail: `detector label ${m.detected}` });
      }
    }
  }

  /** Returns the tally's contents as plain data (shared, not copied). */
  state(): TallyState {
    const { languages, scripts, anomalyMasks, anomalyDocs, declared, impure, anomalous, mismatch } = this;
    return { languages, scripts, anomalyMasks, anomalyDocs, declared, impure, anomalous, mismatch };
  }

  /**
   * Adds the tally of the documents that follow this one's (a batch measured elsewhere): the sums
   * add, new keys come after the ones already seen, and the example lists keep what adding each
   * document here would have kept (the first N by line; for impure, the N lowest by purity, then line).
   */
  absorb(o: TallyState): void {
    for (const [key, t] of Object.entries(o.languages)) this.languages[key] = addLanguageTallies(this.lang(key), t);
    addCounts(this.scripts, o.scripts);
    addCounts(this.anomalyMasks, o.anomalyMasks);
    addCounts(this.anomalyDocs, o.anomalyDocs);
    for (const [d, row] of Object.entries(o.declared)) addCounts((this.declared[d] ??= {}), row);
    for (const item of o.impure) keepLowest(this.impure, item);
    for (const item of o.anomalous) if (this.anomalous.length < SAMPLES_PER_KIND) this.anomalous.push(item);
    for (const item of o.mismatch) if (this.mismatch.length < SAMPLES_PER_KIND) this.mismatch.push(item);
  }
}

function addTokens(into: TokenTally, d: TokenTally): void {
  into.tokens += d.tokens;
  into.unknown += d.unknown;
  into.wordTokens += d.wordTokens;
  into.continuedWords += d.continuedWords;
}

// Keeps the SAMPLES_PER_KIND lowest-purity documents (ties: earliest line), so the
// report can show the worst ones whatever minimum the policy sets.
function keepLowest<T extends { purity: number; line: number }>(list: T[], item: T): void {
  if (list.length >= SAMPLES_PER_KIND && item.purity >= list[list.length - 1]!.purity) return;
  list.push(item);
  list.sort((a, b) => a.purity - b.purity || a.line - b.line);
  if (list.length > SAMPLES_PER_KIND) list.pop();
}

function describeScripts(scripts: Record<string, number>): string {
  const total = Object.values(scripts).reduce((a, b) => a + b, 0);
  return Object.entries(scripts)
    .sort((a, b) => b[1] - a[1])
    .slice(0, 3)
    .map(([s, n]) => `${s} ${Math.round((100 * n) / total)}%`)
    .join(', ');
}

/** Returns the sum of two language tallies. */
export function addLanguageTallies(a: LanguageTally, b: LanguageTally): LanguageTally {
  const out: LanguageTally = {
    docs: a.docs + b.docs,
    bytes: a.bytes + b.bytes,
    chars: a.chars + b.chars,
    words: a.words + b.words,
    purityDocs: a.purityDocs + b.purityDocs,
    scriptChars: a.scriptChars + b.scriptChars,
    expectedScriptChars: a.expectedScriptChars + b.expectedScriptChars,
    purityHistogram: a.purityHistogram.map((n, i) => n + (b.purityHistogram[i] ?? 0)),
  };
  if (a.tokens || b.tokens) out.tokens = sumTokens(a.tokens, b.tokens);
  if (a.baseline || b.baseline) out.baseline = sumTokens(a.baseline, b.baseline);
  return out;
}

function sumTokens(a: TokenTally | undefined, b: TokenTally | undefined): TokenTally {
  const out = emptyTokenTally();
  if (a) addTokens(out, a);
  if (b) addTokens(out, b);
  return out;
}

/** Corpus-wide sums over a set of shard results. */
export interface CorpusTally {
  shards: number;
  languages: Record<string, LanguageTally>;
  scripts: Record<string, number>;
  anomalyMasks: Record<string, number>;
  anomalyDocs: Record<AnomalyKind, number>;
  declared: Record<string, Record<string, number>>;
  input: {
    lines: number;
    docs: number;
    docLines: number;
    empty: number;
    rejected: number;
    byReason: Record<string, number>;
    bytes: number;
    compressedBytes: number;
  };
}

/** Returns the sum of shard results, grouped by nothing (see `groupShards` for subsets). */
export function mergeShardResults(results: readonly ShardResult[], languageKeys: readonly string[]): CorpusTally {
  const languages: Record<string, LanguageTally> = {};
  for (const key of [...languageKeys, 'other', 'und']) languages[key] = emptyLanguageTally();
  const out: CorpusTally = {
    shards: results.length,
    languages,
    scripts: {},
    anomalyMasks: {},
    anomalyDocs: Object.fromEntries(ANOMALY_KINDS.map((k) => [k, 0])) as Record<AnomalyKind, number>,
    declared: {},
    input: { lines: 0, docs: 0, docLines: 0, empty: 0, rejected: 0, byReason: {}, bytes: 0, compressedBytes: 0 },
  };
  for (const r of results) {
    for (const [k, t] of Object.entries(r.languages)) {
      out.languages[k] = addLanguageTallies(out.languages[k] ?? emptyLanguageTally(), t);
    }
    addCounts(out.scripts, r.scripts);
    addCounts(out.anomalyMasks, r.anomalyMasks);
    addCounts(out.anomalyDocs, r.anomalyDocs);
    for (const [d, row] of Object.entries(r.declared)) addCounts((out.declared[d] ??= {}), row);
    const i = out.input;
    i.lines += r.read.lines;
    i.docs += r.read.docs;
    i.docLines += r.read.docLines;
    i.empty += r.read.empty;
    i.rejected += r.read.rejected.count;
    addCounts(i.byReason, r.read.rejected.byReason as Record<string, number>);
    i.bytes += r.read.bytes;
    i.compressedBytes += r.read.compressedBytes;
  }
  return out;
}

function addCounts(into: Record<string, number>, from: Record<string, number | undefined>): void {
  for (const [k, n] of Object.entries(from)) into[k] = (into[k] ?? 0) + (n ?? 0);
}
