// Partial results of a partitioned scan: each runner measures a deterministic
// 1/N of the shards and writes them here; a final job merges the parts. Parts
// carry the settings id so that parts measured under other settings never mix.
import { createHash } from 'node:crypto';
import type { SkippedFile } from '../read/types.js';
import { shardResultFromStored, storedShardResult } from './serialize.js';
import type { ShardResult } from './types.js';

export const PARTIAL_FORMAT = 'sluice-partial';
export const PARTIAL_VERSION = 1;

/** A git object id: SHA-1, or SHA-256 in a repository of that object format. */
const GIT_OBJECT_ID = /^(?:[0-9a-f]{40}|[0-9a-f]{64})$/;

/** Returns the 1-based partition of a shard path among `count`: a hash of the path, so a shard stays in its partition as others are added. */
export function partitionOf(path: string, count: number): number {
  const h = createHash('sha256').update(path).digest();
  return (h.readUInt32BE(0) % count) + 1;
}

export interface Partial {
  format: typeof PARTIAL_FORMAT;
  version: typeof PARTIAL_VERSION;
  policy: string;
  settingsId: string;
  partition: { index: number; count: number };
  /** Shards discovery found in the whole corpus, and in this partition. */
  shardsInCorpus: number;
  results: ShardResult[];
  skipped: SkippedFile[];
  /**
   * The git blob id of each measured shard whose file was as the index had it, by path; absent
   * when the scan ran outside a git work tree. A job with the same blob at a path can take the
   * shard's result as measured (the Action's `parts` input) without reading the file again.
   */
  blobs?: Record<string, string>;
}

/** Returns a partial as JSON text. */
export function partialToJson(p: Partial): string {
  return JSON.stringify({ ...p, results: p.results.map(storedShardResult) });
}

/** Returns a partial parsed from JSON text, or a reason it is not one. */
export function partialFromJson(text: string): { ok: true; partial: Partial } | { ok: false; reason: string } {
  let v: Record<string, unknown>;
  try {
    v = JSON.parse(text) as Record<string, unknown>;
  } catch (err) {
    return { ok: false, reason: `not JSON: ${(err as Error).message}` };
  }
  if (v.format !== PARTIAL_FORMAT) return { ok: false, reason: 'not a sluice partial result (written by `sluice scan --partition`)' };
  if (v.version !== PARTIAL_VERSION) return { ok: false, reason: `partial format version ${String(v.version)}, this sluice reads ${PARTIAL_VERSION}` };
  const results: ShardResult[] = [];
  for (const r of (v.results as unknown[]) ?? []) {
    const parsed = shardResultFromStored(r);
    if ('otherSchema' in parsed) return { ok: false, reason: 'holds a shard result of another result schema (written by another sluice version)' };
    if ('damaged' in parsed) {
      const where = typeof (r as { path?: unknown }).path === 'string' ? `the result of ${(r as { path: string }).path}` : `shard result ${results.length + 1}`;
      return { ok: false, reason: `${where} is damaged: ${parsed.damaged}` };
    }
    results.push(parsed.result);
  }
  if (v.blobs !== undefined) {
    const blobs = v.blobs as Record<string, unknown> | null;
    const bad = typeof blobs !== 'object' || blobs === null || Array.isArray(blobs) ? '' : Object.entries(blobs).find(([, b]) => typeof b !== 'string' || !GIT_OBJECT_ID.test(b))?.[0];
    if (bad !== undefined) return { ok: false, reason: bad === '' ? '`blobs` is not an object of paths and git blob ids' : `\`blobs\` holds no git blob id for ${bad}` };
  }
  return { ok: true, partial: { ...(v as unknown as Partial), results } };
}
