// Shard results as stored JSON (cache entries, partial results of a partitioned
// scan): the same object, with the duplicate-index blob as base64.
import { RESULT_SCHEMA, type ShardResult } from './types.js';

type StoredShardResult = Omit<ShardResult, 'duplicateIndex'> & { duplicateIndex?: string };

/** Returns a shard result as a JSON-able object. */
export function storedShardResult(r: ShardResult): StoredShardResult {
  const { duplicateIndex, ...rest } = r;
  return duplicateIndex ? { ...rest, duplicateIndex: Buffer.from(duplicateIndex).toString('base64') } : rest;
}

/** Returns a shard result from its stored form, or undefined when it was stored by another result schema. */
export function shardResultFromStored(value: unknown): ShardResult | undefined {
  const v = value as StoredShardResult | null;
  if (!v || typeof v !== 'object' || v.schema !== RESULT_SCHEMA) return undefined;
  const { duplicateIndex, ...rest } = v;
  return duplicateIndex ? { ...rest, duplicateIndex: new Uint8Array(Buffer.from(duplicateIndex, 'base64')) } : rest;
}
