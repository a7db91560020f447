// One shard in, one ShardResult out: read it, measure every document, fold the
// measures into tallies. The analyzers come in ready-made, so this module knows
// what to count, not how each figure is computed.
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { PassThrough, type Readable } from 'node:stream';
import type { DocumentMeasure } from '../measure/types.js';
import type { SamplingSpec } from '../policy/types.js';
import { readShard } from '../read/index.js';
import type { RawDocument, ReadOptions, ShardRef } from '../read/types.js';
import { describeSampling, documentHash, fractionCutoff, HASH_SPACE, MomentTally, SmallestHashes } from './sample.js';
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
  /** Measure only a deterministic sample of documents (see sample.ts); duplicates and contamination still see every document. */
  sampling?: SamplingSpec;
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

  // Under sampling, a document is measured when its text hash is at most the cutoff. For
  // docs-per-shard the cutoff is the N-th smallest hash, found by a first, reading-only pass.
  const sampling = settings.sampling;
  let cutoff = HASH_SPACE;
  if (sampling) {
    if ('fraction' in sampling) cutoff = fractionCutoff(sampling.fraction);
    else {
      const smallest = new SmallestHashes(sampling.docsPerShard);
      await readShard(ref, settings.read, (doc) => smallest.add(documentHash(doc.text)));
      cutoff = smallest.cutoff();
    }
  }
  const moments = sampling ? new MomentTally() : undefined;
  // Duplicate-index language of a document not measured: past `other`, named UNSAMPLED_LANGUAGE by the summary.
  const unsampledIndex = otherIndex + 1;
  let measured = 0;
  let offered = 0;
  // While nothing falls under a fraction's cutoff, the smallest-hash document so far, so a small shard still has one measured.
  let fallback: { doc: RawDocument; hash: number } | undefined;

  const measureOne = (doc: RawDocument): DocumentMeasure => {
    const m = analyzers.measure(doc);
    const tokens = analyzers.tokens?.(doc.text);
    tally.add(doc.line, m, tokens);
    moments?.add(m, tokens);
    measured += 1;
    return m;
  };

  let ordinal = 0;
  let failure: { line: number; message: string } | undefined;
  const account = await readShard(tapped, settings.read, (doc) => {
    if (failure) return;
    try {
      let language = unsampledIndex;
      const hash = sampling ? documentHash(doc.text) : 0;
      if (!sampling || hash <= cutoff) {
        const m = measureOne(doc);
        language = languageIndex.get(m.language) ?? otherIndex;
        fallback = undefined;
      } else if (measured === 0 && (!fallback || hash < fallback.hash)) {
        fallback = { doc, hash };
      }
      dup?.add({ ordinal, line: doc.line, language, text: doc.text });
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
      offered += 1;
    } catch (err) {
      failure = { line: doc.line, message: `measuring failed at line ${doc.line}: ${(err as Error).message}` };
    }
  });
  let usedFallback = false;
  if (sampling && measured === 0 && fallback && !failure) {
    try {
      measureOne(fallback.doc);
      usedFallback = true;
    } catch (err) {
      failure = { line: fallback.doc.line, message: `measuring failed at line ${fallback.doc.line}: ${(err as Error).message}` };
    }
  }
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
  if (sampling && moments) {
    result.sample = { ...describeSampling(sampling), docs: measured, of: offered, cutoff, moments: moments.moments };
    if (usedFallback) result.sample.fallback = true;
  }
  return result;
}
