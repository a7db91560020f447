// Types of the duplicate and contamination measures: options, the per-shard index header,
// and the findings of a join over many shards' indexes.

/** Parameters a duplicate index is built and joined with (the policy's `rules.duplicates`). */
export interface DuplicateOptions {
  /** Words per shingle (policy `near.shingle`, default 5). */
  shingle: number;
  /** MinHash values per signature (policy `near.hashes`, default 128). */
  hashes: number;
  /** Estimated Jaccard similarity at or above which two documents are near duplicates (policy `near.threshold`). */
  threshold: number;
  /** Exact-duplicate normalization: punctuation kept or stripped. */
  punctuation: 'keep' | 'strip';
}

/** One document handed to the index builder. */
export interface IndexedDocument {
  /** 0-based index of the document within its shard; strictly increasing across add() calls. */
  ordinal: number;
  /** 1-based line where the document starts. */
  line: number;
  /** Small non-negative integer naming the document's language (the caller's index into the policy's language list). */
  language: number;
  text: string;
}

/** What a duplicate index blob says about itself. */
export interface DuplicateIndexHeader {
  formatVersion: number;
  shingle: number;
  hashes: number;
  /** Bits kept per signature value (b-bit MinHash). */
  signatureBits: number;
  punctuation: 'keep' | 'strip';
  /** Threshold the index was built for (float32; informational: the blob depends on it only through signatureBits). */
  threshold: number;
  documents: number;
  /** Size of the whole blob, bytes. */
  bytes: number;
}

/** A document's place in the corpus. */
export interface DocumentLocation {
  shard: string;
  /** 1-based line where the document starts. */
  line: number;
  language: number;
}

/** A later document that repeats an earlier one. */
export interface DuplicateCopy extends DocumentLocation {
  /** Near copies only: estimated Jaccard similarity with `of`, the earlier document it was verified against. */
  jaccard?: number;
  of?: DocumentLocation;
}

/**
 * A group of documents that repeat the first one. Exact: every copy has the first one's
 * normalized text. Near: each copy was verified against an earlier member (a tree of
 * "matched earlier copy" links rooted at `first`), so every copy is one counted near duplicate.
 */
export interface DuplicateCluster {
  kind: 'exact' | 'near';
  first: DocumentLocation;
  /** Documents in the cluster, the first included (complete, even when `copies` is cut). */
  size: number;
  /** Copies in corpus order, at most `maxCopies` of them. */
  copies: DuplicateCopy[];
  /** Copies not listed. */
  copiesOmitted: number;
}

/** Counts over a set of documents. exactDocs and nearDocs are disjoint: a document is counted once, exact first. */
export interface DuplicateTally {
  /** Documents indexed. */
  docs: number;
  /** Documents whose normal form is empty: in neither exact nor near detection. */
  emptyDocs: number;
  /** Documents without a single word (only punctuation or symbols): in exact detection only. */
  wordlessDocs: number;
  /** Documents whose normalized text appeared earlier in corpus order. */
  exactDocs: number;
  /** Documents, not exact duplicates, with a verified near copy earlier in corpus order. */
  nearDocs: number;
}

/** Duplicates that a set of new shards adds against the rest (the existing corpus), in any order. */
export interface AgainstExisting {
  /** The shards taken as new, as given (names that matched no shard are in `unknownShards`). */
  newShards: string[];
  unknownShards: string[];
  /** Documents in the new shards. */
  docs: number;
  /** New documents whose normalized text occurs in an existing shard. */
  exactDocs: number;
  /** New documents, not exact, with a verified near copy in an existing shard. */
  nearDocs: number;
  /**
   * New documents with no copy in an existing shard that repeat an earlier new document (in corpus
   * order): exactly, or nearly (their exact class verified against an earlier class of new
   * documents only). Every group of copies within the change counts all but its first member.
   */
  withinExactDocs: number;
  withinNearDocs: number;
  perShard: Array<{ shard: string; docs: number; exactDocs: number; nearDocs: number; withinExactDocs: number; withinNearDocs: number }>;
}

/** Work done by the join and where it was bounded. */
export interface JoinStatistics {
  bands: number;
  rows: number;
  signatureBits: number;
  /** Document pairs whose signatures were compared. */
  comparedPairs: number;
  /** Compared pairs whose estimated Jaccard reached the threshold. */
  verifiedPairs: number;
  /** Band buckets larger than maxBucketComparisons + 1: in them each document was compared with only its nearest earlier members, so a near copy further back can be missed. */
  cappedBuckets: number;
  /** Bytes held by the join's own arrays at their peak, and per document (the input blobs not included). */
  workingBytes: number;
  workingBytesPerDocument: number;
  /** Bytes of the input blobs, and per document. */
  indexBytes: number;
  indexBytesPerDocument: number;
}

export interface DuplicateFindings {
  options: DuplicateOptions;
  total: DuplicateTally;
  /** Same as total.exactDocs and total.nearDocs. */
  exactDocs: number;
  nearDocs: number;
  perShard: Array<{ shard: string } & DuplicateTally>;
  /** By the caller's small-int language, ascending. */
  perLanguage: Array<{ language: number } & DuplicateTally>;
  /** Exact and near clusters with at least one copy, largest first (ties: earliest first), at most `maxClusters`. */
  clusters: DuplicateCluster[];
  exactClusters: number;
  nearClusters: number;
  clustersOmitted: number;
  /** Present when the join was told which shards are new. */
  againstExisting?: AgainstExisting;
  statistics: JoinStatistics;
}

/** Options of joinDuplicates. */
export interface JoinOptions extends DuplicateOptions {
  /** Shards (by name) whose documents are checked against all other shards. */
  newShards?: string[];
  /** Clusters listed (default 20); counts stay complete. */
  maxClusters?: number;
  /** Copies listed per cluster (default 10). */
  maxCopies?: number;
  /** Earlier bucket members each document is compared with, per band (default 64). */
  maxBucketComparisons?: number;
}
