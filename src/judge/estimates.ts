// The strata (per-shard sums) behind each figure of a sampled report, read from the
// shards' measured tallies and second-order sums; intervals.ts turns them into intervals.
import type { MixUnit } from '../policy/types.js';
import { emptyMoments } from '../results/sample.js';
import type { LanguageMoments, LanguageTally, ShardResult } from '../results/types.js';
import { amountIn, docsBelowPurity } from './figures.js';
import { intervalOf, ratioEstimate, type Interval, type IntervalMethod, type Stratum } from './intervals.js';

/** Per-document values of one shard, summed: what a stratum is built from. */
type Sums = Omit<Stratum, 'N' | 'n'>;

/** A sampled corpus as the judge sees it: the shards' raw (measured, unscaled) results. */
export class SampledCorpus {
  constructor(readonly shards: readonly ShardResult[]) {}

  private strata(sums: (r: ShardResult) => Sums): Stratum[] {
    return this.shards.map((r) => {
      const n = r.sample ? r.sample.docs : measuredDocsOf(r);
      const N = r.sample ? r.sample.of : n;
      return { N, n, ...sums(r) };
    });
  }

  /** Returns the strata of a language's share of the corpus in a unit (tokens: under the main tokenizer; `baseline`: under the baseline). */
  share(key: string, unit: MixUnit | 'baseline'): Stratum[] {
    return this.strata((r) => {
      let x = 0;
      let xx = 0;
      for (const [k, t] of Object.entries(r.languages)) {
        x += amount(t, unit);
        xx += amount2(t, r.sample?.moments[k], unit);
      }
      const t = r.languages[key];
      const y = t ? amount(t, unit) : 0;
      const yy = t ? amount2(t, r.sample?.moments[key], unit) : 0;
      return { y, x, yy, xx, xy: yy };
    });
  }

  /** Returns the strata of a language's purity (expected-script characters ÷ script characters). */
  purity(key: string): Stratum[] {
    return this.strata((r) => {
      const t = r.languages[key];
      const m = r.sample?.moments[key] ?? emptyMoments();
      return { y: t?.expectedScriptChars ?? 0, x: t?.scriptChars ?? 0, yy: m.expected2, xx: m.scriptChars2, xy: m.expectedScriptChars };
    });
  }

  /** Returns the strata of the share of a language's purity-judged documents below `minPurity`. */
  impure(key: string, minPurity: number): Stratum[] {
    return this.strata((r) => {
      const t = r.languages[key];
      return indicator(t ? docsBelowPurity(t.purityHistogram, minPurity) : 0, t?.purityDocs ?? 0);
    });
  }

  /** Returns the strata of the share of documents declaring `key` that the detector labels otherwise. */
  mismatch(key: string): Stratum[] {
    return this.strata((r) => {
      const row = r.declared[key] ?? {};
      const declared = Object.values(row).reduce((a, b) => a + b, 0);
      return indicator(declared - (row[key] ?? 0) - (row['und'] ?? 0), declared);
    });
  }

  /** Returns the strata of the share of documents with an anomaly in the mask. */
  anomalous(forbidMask: number): Stratum[] {
    return this.strata((r) => {
      let docs = 0;
      for (const [mask, n] of Object.entries(r.anomalyMasks)) if ((Number(mask) & forbidMask) !== 0) docs += n;
      return indicator(docs, measuredDocsOf(r));
    });
  }

  /** Returns the strata of a language's fertility (word tokens ÷ words) or continued words (continued ÷ words) under the main tokenizer. */
  perWord(key: string, what: 'fertility' | 'continued'): Stratum[] {
    return this.strata((r) => {
      const t = r.languages[key];
      const m = r.sample?.moments[key] ?? emptyMoments();
      if (what === 'fertility') return { y: t?.tokens?.wordTokens ?? 0, x: t?.words ?? 0, yy: m.wordTokens2, xx: m.words2, xy: m.wordTokensWords };
      return { y: t?.tokens?.continuedWords ?? 0, x: t?.words ?? 0, yy: m.continued2, xx: m.words2, xy: m.continuedWords };
    });
  }

  /** Returns the strata of a language's word tokens under the main tokenizer ÷ under the baseline (fertility ratio). */
  againstBaseline(key: string): Stratum[] {
    return this.strata((r) => {
      const t = r.languages[key];
      const m = r.sample?.moments[key] ?? emptyMoments();
      return { y: t?.tokens?.wordTokens ?? 0, x: t?.baseline?.wordTokens ?? 0, yy: m.wordTokens2, xx: m.baselineWordTokens2, xy: m.wordTokensBaseline };
    });
  }

  /** Returns the strata of any document count (x = 1 per measured document): what the sample size is counted in. */
  documents(): Stratum[] {
    return this.strata((r) => indicator(0, measuredDocsOf(r)));
  }
}

/** Returns the interval of the ratio behind some strata, or undefined when it has no denominator. */
export function intervalFrom(strata: readonly Stratum[], method: IntervalMethod, offset = 0): Interval | undefined {
  return intervalOf(ratioEstimate(strata), method, offset);
}

function measuredDocsOf(r: ShardResult): number {
  return Object.values(r.languages).reduce((s, t) => s + t.docs, 0);
}

// Sums of a 0/1 value y within a 0/1 domain x: squares equal the values.
function indicator(y: number, x: number): Sums {
  return { y, x, yy: y, xx: x, xy: y };
}

function amount(t: LanguageTally, unit: MixUnit | 'baseline'): number {
  return unit === 'baseline' ? (t.baseline?.tokens ?? 0) : amountIn(t, unit);
}

function amount2(t: LanguageTally, m: LanguageMoments | undefined, unit: MixUnit | 'baseline'): number {
  if (unit === 'docs') return t.docs;
  if (!m) return 0;
  switch (unit) {
    case 'bytes':
      return m.bytes2;
    case 'chars':
      return m.chars2;
    case 'words':
      return m.words2;
    case 'tokens':
      return m.tokens2;
    case 'baseline':
      return m.baselineTokens2;
  }
}
