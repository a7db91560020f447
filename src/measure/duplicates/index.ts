// Exact and near duplicates (per-shard index blobs, joined across shards) and
// evaluation-set contamination. Pure functions: no I/O.
export type {
  AgainstExisting,
  DocumentLocation,
  DuplicateCluster,
  DuplicateCopy,
  DuplicateFindings,
  DuplicateIndexHeader,
  DuplicateOptions,
  DuplicateTally,
  IndexedDocument,
  JoinOptions,
  JoinStatistics,
} from './types.js';
export { DuplicateIndexBuilder, checkOptions, duplicateOptionsFrom, type DuplicateIndexPart } from './builder.js';
export { joinDuplicates, estimateJaccard, bandKeysOf, DuplicateIndexError } from './join.js';
export { bytesPerDocument, inspectIndex, FORMAT_VERSION } from './format.js';
export { lshBands, candidateProbability, rowAgreement, signatureBits, jaccardFromAgreement } from './lsh.js';
export { Sketcher, signatureAgreement } from './minhash.js';
export { exactHash, normalizeForExact, prepareText, wordsOf } from './scan.js';
export { buildEvalIndex, evalSetId, findContamination, DEFAULT_NGRAM, type EvalIndex, type EvalItem } from './contamination.js';
