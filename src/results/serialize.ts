// Shard results as stored JSON (cache entries, partial results of a partitioned
// scan): the same object, with the duplicate-index blob as base64.
import { RESULT_SCHEMA, type ShardResult } from './types.js';

type StoredShardResult = Omit<ShardResult, 'duplicateIndex'> & { duplicateIndex?: string };

/** Returns a shard result as a JSON-able object. */
export function storedShardResult(r: ShardResult): StoredShardResult {
  const { duplicateIndex, ...rest } = r;
  return duplicateIndex ? { ...rest, duplicateIndex: Buffer.from(duplicateIndex).toString('base64') } : rest;
}

const isCount = (x: unknown): x is number => typeof x === 'number' && Number.isInteger(x) && x >= 0;
const isMap = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

/**
 * Returns what is wrong with a stored shard result of this schema, or null: a field missing or
 * of the wrong kind, or a line account that does not add up. Stored results come from files
 * (cache entries, other runners' partial results) that may have been cut short or edited; one
 * that fails this is measured again or refused, never summed into a report.
 */
function storedResultProblem(value: unknown): string | null {
  if (!isMap(value)) return 'not an object';
  for (const key of ['path', 'contentId', 'settingsId', 'format', 'compression', 'encoding'] as const) {
    if (typeof value[key] !== 'string') return `\`${key}\` is missing or not a string`;
  }
  const read = value.read;
  if (!isMap(read)) return '`read` is missing';
  for (const key of ['lines', 'docs', 'docLines', 'empty', 'bytes', 'compressedBytes'] as const) {
    if (!isCount(read[key])) return `\`read.${key}\` is missing or not a count`;
  }
  const rejected = read.rejected;
  if (!isMap(rejected) || !isCount(rejected.count) || !isMap(rejected.byReason) || !Array.isArray(rejected.samples)) return '`read.rejected` is missing or incomplete';
  const { lines, docs, docLines, empty } = read as Record<string, number>;
  if (docLines! + empty! + (rejected.count as number) !== lines) {
    return `its lines do not add up: ${docLines} in documents + ${empty} empty + ${rejected.count as number} rejected ≠ ${lines} read`;
  }
  if (docs! > docLines!) return `it has more documents (${docs}) than lines in documents (${docLines})`;
  const byReason = Object.values(rejected.byReason);
  if (!byReason.every(isCount) || byReason.reduce((a: number, b) => a + (b as number), 0) !== rejected.count) return 'its rejected lines by reason do not add up to their count';
  for (const key of ['languages', 'scripts', 'anomalyMasks', 'anomalyDocs', 'declared'] as const) {
    if (!isMap(value[key])) return `\`${key}\` is missing`;
  }
  for (const [lang, tally] of Object.entries(value.languages as Record<string, unknown>)) {
    if (!isMap(tally) || !isCount(tally.docs)) return `\`languages.${lang}\` is incomplete`;
  }
  const samples = value.samples;
  if (!isMap(samples) || !Array.isArray(samples.impure) || !Array.isArray(samples.anomalous) || !Array.isArray(samples.mismatch)) return '`samples` is missing or incomplete';
  if (value.duplicateIndex !== undefined && typeof value.duplicateIndex !== 'string') return '`duplicateIndex` is not base64 text';
  return null;
}

/** Returns a shard result from its stored form; `otherSchema` when another result schema stored it, `damaged` (why) when it is of this schema but fails storedResultProblem. */
export function shardResultFromStored(value: unknown): { result: ShardResult } | { otherSchema: true } | { damaged: string } {
  if ((value as { schema?: unknown } | null)?.schema !== RESULT_SCHEMA) return { otherSchema: true };
  const problem = storedResultProblem(value);
  if (problem !== null) return { damaged: problem };
  const { duplicateIndex, ...rest } = value as StoredShardResult;
  return { result: duplicateIndex ? { ...rest, duplicateIndex: new Uint8Array(Buffer.from(duplicateIndex, 'base64')) } : rest };
}
