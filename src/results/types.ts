// Per-shard results: everything the judge needs, folded from per-document
// measures. Plain JSON-able data, so results can be cached by content, written
// by one machine and merged on another.
import type { AnomalyKind } from '../policy/types.js';
import type { Compression, ReadAccount, ShardFormat } from '../read/types.js';

/** Bump when the shape or meaning of a stored result changes; older cache entries are then ignored. */
export const RESULT_SCHEMA = 1;

/** Purity histogram resolution: bin i holds documents with floor(purity × 100) = i (bin 100 is purity 1). */
export const PURITY_BINS = 101;

/** How many located examples of each kind a shard keeps for the report. */
export const SAMPLES_PER_KIND = 5;

/** Token figures under one tokenizer. */
export interface TokenTally {
  tokens: number;
  unknown: number;
  /** Σ tokens of each word as it occurs in the text (the fertility numerator). */
  wordTokens: number;
  /** Words split into two or more tokens. */
  continuedWords: number;
}

export interface LanguageTally {
  /** Documents detected as this language, and their size. The mix is computed from these. */
  docs: number;
  bytes: number;
  chars: number;
  words: number;
  tokens?: TokenTally;
  baseline?: TokenTally;
  /**
   * Purity figures count documents whose purity is judged against this language:
   * the declared language when the document declares one, else the detected one.
   */
  purityDocs: number;
  scriptChars: number;
  expectedScriptChars: number;
  purityHistogram: number[];
}

/** A located example for the report: the shard's path is implied by the shard result. */
export interface LineSample {
  line: number;
  detail: string;
}

export interface ShardResult {
  schema: typeof RESULT_SCHEMA;
  path: string;
  subset?: string;
  format: ShardFormat;
  compression: Compression;
  encoding: string;
  sizeBytes: number;
  /** sha256 of the raw bytes on disk: the cache key's content half. */
  contentId: string;
  /** Identity of the measurement settings the result was computed under: the cache key's other half. */
  settingsId: string;
  read: ReadAccount;
  /** Keyed by policy language key, plus `other` and `und`. */
  languages: Record<string, LanguageTally>;
  /** Script characters per Unicode Script, over the whole shard. */
  scripts: Record<string, number>;
  /** Documents with at least one anomaly, counted per exact set of kinds (bit mask over ANOMALY_KINDS) so any `forbid` list can be judged later. */
  anomalyMasks: Record<string, number>;
  /** Documents with at least one anomaly of each kind. */
  anomalyDocs: Record<AnomalyKind, number>;
  /** declared key → detected key → documents, for documents that declare a language. */
  declared: Record<string, Record<string, number>>;
  samples: {
    /** Documents below the purity the policy sets as a minimum, lowest purity first. */
    impure: Array<LineSample & { language: string; purity: number }>;
    anomalous: Array<LineSample & { kinds: AnomalyKind[] }>;
    mismatch: Array<LineSample & { declared: string; detected: string }>;
  };
  /** The shard's duplicate-index blob, when duplicates are measured (base64 in stored JSON: see serialize.ts). */
  duplicateIndex?: Uint8Array;
  /** Training documents that overlap an evaluation item. */
  contamination?: { docs: number; samples: Array<{ line: number; evalFile: string; evalLine: number }> };
  /** Present when the policy samples: which documents were measured, and the sums the judge's intervals need. Without it every document was measured. */
  sample?: ShardSample;
  /** Wall time spent measuring, for progress and benchmarks; not part of any judgement. */
  elapsedMs: number;
}

/**
 * Second-order sums over a shard's measured documents, per language key (as in `languages`), for
 * the variance of ratio estimates. Each is Σ over documents of the product named; the purity
 * sums (`expected2`, `scriptChars2`, `expectedScriptChars`) are keyed by the purity basis.
 */
export interface LanguageMoments {
  bytes2: number;
  chars2: number;
  words2: number;
  tokens2: number;
  baselineTokens2: number;
  /** Σ wordTokens², Σ wordTokens·words: fertility. */
  wordTokens2: number;
  wordTokensWords: number;
  /** Σ continuedWords², Σ continuedWords·words: continued words. */
  continued2: number;
  continuedWords: number;
  /** Σ baseline wordTokens², Σ wordTokens·baseline wordTokens: fertility against the baseline. */
  baselineWordTokens2: number;
  wordTokensBaseline: number;
  /** Σ expected-script chars², Σ script chars², Σ expected·script chars: purity. */
  expected2: number;
  scriptChars2: number;
  expectedScriptChars: number;
}

/** How a sampled shard was measured. Tallies (languages, scripts, anomalies, declared, samples) cover the measured documents only; `read` still covers every line. */
export interface ShardSample {
  method: 'fraction' | 'docs-per-shard';
  /** The policy's setting: the fraction, or documents per shard. */
  setting: number;
  /** Documents measured. */
  docs: number;
  /** Documents the shard handed on (before a measuring failure, if one stopped it): the stratum size. */
  of: number;
  /** A document was measured when its text hash was at most this (see sample.ts). */
  cutoff: number;
  /** True when no document fell under the cutoff and the one with the smallest hash was measured instead, so every shard with documents has one measured. */
  fallback?: true;
  moments: Record<string, LanguageMoments>;
}

/** Every anomaly kind, in the order of the bit masks in `anomalyMasks`. */
export { ANOMALY_KINDS } from '../measure/encoding.js';
