// The whole corpus as the judge sees it: every shard's result, what was skipped,
// and the figures that only exist across shards (duplicates, dictionary fertility).
import type { AgainstExisting } from '../measure/duplicates/index.js';
import type { SkippedFile } from '../read/types.js';
import type { CorpusTally } from './tally.js';
import type { ShardResult } from './types.js';

export interface TokenizerInfo {
  label: string;
  hasUnknown: boolean;
}

export interface DictionaryResult {
  list: string;
  entries: number;
  tokens: number;
  fertility: number;
  continued: number;
}

/** Cross-shard duplicate figures, in the shape the judge reads (see duplicates.ts for how they are made). */
export interface DuplicateSummary {
  exactDocs: number;
  nearDocs: number;
  docs: number;
  tooShortDocs: number;
  byLanguage: Record<string, { docs: number; exactDocs: number; nearDocs: number }>;
  byShard: Record<string, { docs: number; exactDocs: number; nearDocs: number }>;
  clusters: Array<{
    kind: 'exact' | 'near';
    first: { path: string; line: number };
    copies: Array<{ path: string; line: number; jaccard?: number }>;
    size: number;
  }>;
  parameters: { shingle: number; hashes: number; bands: number; rows: number; threshold: number };
}

export interface CorpusResult {
  /** Sorted by path. */
  shards: ShardResult[];
  /** Paths whose result came from the cache. */
  cached: Set<string>;
  skipped: SkippedFile[];
  tally: CorpusTally;
  tokenizer?: TokenizerInfo;
  baseline?: TokenizerInfo;
  /** Per language key: dictionary fertility under the main tokenizer and the baseline. */
  dictionary?: Record<string, { main: DictionaryResult; baseline?: DictionaryResult }>;
  duplicates?: DuplicateSummary;
  /** When some shards were taken as new: the duplicates they add against the rest. */
  duplicatesAgainstExisting?: AgainstExisting;
  contamination?: { ngram: number; evalFiles: string[]; evalItems: number };
  elapsedMs: number;
}
