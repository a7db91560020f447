// Cross-shard duplicates: join every shard's index blob and turn the findings
// into the summary the judge reads, with languages and shards by name.
import { DuplicateIndexError, joinDuplicates, type DuplicateFindings, type DuplicateOptions } from '../measure/duplicates/index.js';
import type { DuplicateSummary } from './corpus.js';
import type { ShardResult } from './types.js';

/** Clusters listed in a report; the counts stay complete. */
export const CLUSTERS_LISTED = 20;

/** Returns the joined duplicate findings over the shards' indexes (in path order), optionally with some shards taken as new; DuplicateIndexError for a shard without one, whose documents the join would miss. */
export function joinShardIndexes(shards: readonly ShardResult[], options: DuplicateOptions, newShards?: string[]): DuplicateFindings {
  const without = shards.find((s) => s.duplicateIndex === undefined);
  if (without) throw new DuplicateIndexError(without.path, 'its result carries no duplicate index, though duplicates are measured');
  return joinDuplicates(
    shards.map((s) => ({ shard: s.path, index: s.duplicateIndex! })),
    { ...options, maxClusters: CLUSTERS_LISTED, ...(newShards ? { newShards } : {}) },
  );
}

/** Returns the judge's view of duplicate findings; `languageKeys` maps the index's small-int languages back to policy keys. */
export function summarizeDuplicates(f: DuplicateFindings, languageKeys: readonly string[]): DuplicateSummary {
  const langName = (i: number): string => languageKeys[i] ?? 'other';
  const byLanguage: DuplicateSummary['byLanguage'] = {};
  for (const l of f.perLanguage) {
    const row = (byLanguage[langName(l.language)] ??= { docs: 0, exactDocs: 0, nearDocs: 0 });
    row.docs += l.docs;
    row.exactDocs += l.exactDocs;
    row.nearDocs += l.nearDocs;
  }
  const byShard: DuplicateSummary['byShard'] = {};
  for (const s of f.perShard) byShard[s.shard] = { docs: s.docs, exactDocs: s.exactDocs, nearDocs: s.nearDocs };
  return {
    docs: f.total.docs,
    exactDocs: f.exactDocs,
    nearDocs: f.nearDocs,
    tooShortDocs: f.total.emptyDocs + f.total.wordlessDocs,
    byLanguage,
    byShard,
    clusters: f.clusters.map((c) => ({
      kind: c.kind,
      first: { path: c.first.shard, line: c.first.line },
      copies: c.copies.map((x) => ({ path: x.shard, line: x.line, ...(x.jaccard !== undefined ? { jaccard: Math.round(x.jaccard * 1000) / 1000 } : {}) })),
      size: c.size,
    })),
    parameters: {
      shingle: f.options.shingle,
      hashes: f.options.hashes,
      bands: f.statistics.bands,
      rows: f.statistics.rows,
      threshold: f.options.threshold,
    },
  };
}
