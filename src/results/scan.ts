// One shard in, one ShardResult out: read it, measure every document, fold the
// measures into tallies. The analyzers come in ready-made, so this module knows
// what to count, not how each figure is computed.
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { PassThrough, type Readable } from 'node:stream';
import type { DocumentMeasure } from '../measure/types.js';
import { readShard } from '../read/index.js';
import type { ReadOptions, ShardRef } from '../read/types.js';
import { ShardTally, type DocumentTokens } from './tally.js';
import { RESULT_SCHEMA, SAMPLES_PER_KIND, type ShardResult } from './types.js';

/** Read buffer for shard files: large reads keep the floor fast (the read stage measured 256 KiB best). */
const READ_CHUNK_BYTES = 256 * 1024;

/** The per-document analyzers a scan runs; optional ones are off when absent. */
export interface ScanAnalyzers {
  /** Language, script, encoding, words: always on. */
  measure(doc: { text: string; declaredLanguage?: string }): DocumentMeasure;
  /** Token counts under the policy's tokenizer (and baseline). */
  tokens?(text: string): DocumentTokens;
  /** A fresh per-shard duplicate-index builder. */
  duplicates?(): { add(doc: { ordinal: number; line: number; language: number; text: string }): void; finish(): Uint8Array };
  /** The evaluation item a text overlaps, if any. */
  contamination?(text: string): { file: string; line: number } | null;
}

export interface ScanSettings {
  read: ReadOptions;
  /** Policy language keys, in policy order (the duplicate index stores their position). */
  languageKeys: readonly string[];
  settingsId: string;
}

/** Returns the sha256 (hex) of a shard's raw bytes. */
export async function contentIdOf(ref: ShardRef): Promise<string> {
  const hash = createHash('sha256');
  const stream: Readable = ref.open?.() ?? createReadStream(ref.absPath);
  for await (const chunk of stream) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/** Returns the measured result of one shard; a failure inside an analyzer marks the shard broken rather than throwing. */
export async function scanShard(ref: ShardRef, settings: ScanSettings, analyzers: ScanAnalyzers): Promise<ShardResult> {
  const started = performance.now();
  const tally = new ShardTally(settings.languageKeys);
  const dup = analyzers.duplicates?.();
  const languageIndex = new Map(settings.languageKeys.map((k, i) => [k, i] as const));
  const otherIndex = settings.languageKeys.length;
  const contamination = analyzers.contamination ? { docs: 0, samples: [] as Array<{ line: number; evalFile: string; evalLine: number }> } : undefined;

  // Hash the raw bytes while they are read, so the cache key costs no second pass.
  const hash = createHash('sha256');
  const tapped: ShardRef = {
    ...ref,
    open: () => {
      const source = ref.open?.() ?? createReadStream(ref.absPath, { highWaterMark: READ_CHUNK_BYTES });
      const tap = new PassThrough();
      source.on('data', (chunk: Buffer) => hash.update(chunk));
      source.on('error', (err: Error) => tap.destroy(err));
      source.pipe(tap);
      return tap;
    },
  };

  let ordinal = 0;
  let failure: { line: number; message: string } | undefined;
  const account = await readShard(tapped, settings.read, (doc) => {
    if (failure) return;
    try {
      const m = analyzers.measure(doc);
      const tokens = analyzers.tokens?.(doc.text);
      tally.add(doc.line, m, tokens);
      dup?.add({ ordinal, line: doc.line, language: languageIndex.get(m.language) ?? otherIndex, text: doc.text });
      if (contamination) {
        const hit = analyzers.contamination!(doc.text);
        if (hit) {
          contamination.docs += 1;
          if (contamination.samples.length < SAMPLES_PER_KIND) {
            contamination.samples.push({ line: doc.line, evalFile: hit.file, evalLine: hit.line });
          }
        }
      }
      ordinal += 1;
    } catch (err) {
      failure = { line: doc.line, message: `measuring failed at line ${doc.line}: ${(err as Error).message}` };
    }
  });
  if (failure && !account.broken) account.broken = { afterLine: failure.line - 1, message: failure.message };

  const result: ShardResult = {
    schema: RESULT_SCHEMA,
    path: ref.path,
    format: ref.format,
    compression: ref.compression,
    encoding: ref.encoding,
    sizeBytes: ref.sizeBytes,
    contentId: hash.digest('hex'),
    settingsId: settings.settingsId,
    read: account,
    languages: tally.languages,
    scripts: tally.scripts,
    anomalyMasks: tally.anomalyMasks,
    anomalyDocs: tally.anomalyDocs,
    declared: tally.declared,
    samples: { impure: tally.impure, anomalous: tally.anomalous, mismatch: tally.mismatch },
    elapsedMs: Math.round(performance.now() - started),
  };
  if (ref.subset !== undefined) result.subset = ref.subset;
  if (dup) result.duplicateIndex = dup.finish();
  if (contamination) result.contamination = contamination;
  return result;
}
