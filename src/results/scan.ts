// One shard in, one ShardResult out: read it, measure every document, fold the
// measures into tallies. The analyzers come in ready-made, so this module knows
// what to count, not how each figure is computed.
//
// A large shard can also be measured in batches on several threads (scanShardInBatches):
// one thread reads it and hands out runs of consecutive documents; each batch comes back
// as the fold of its documents (measureBatch), and the folds are absorbed in reading order.
// Every figure is an integer sum or a first-N / lowest-N list, so absorbing the batches in
// order gives the same result, byte for byte, as measuring the documents one by one.
import { createHash, type Hash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { PassThrough, type Readable } from 'node:stream';
import type { DocumentMeasure } from '../measure/types.js';
import type { DuplicateIndexPart } from '../measure/duplicates/index.js';
import type { SamplingSpec } from '../policy/types.js';
import { readChunkBytes, readShard } from '../read/index.js';
import type { RawDocument, ReadAccount, ReadOptions, ShardRef } from '../read/types.js';
import { describeSampling, documentHash, fractionCutoff, HASH_SPACE, MomentTally, SmallestHashes, type MomentSums } from './sample.js';
import { ShardTally, type DocumentTokens, type TallyState } from './tally.js';
import { RESULT_SCHEMA, SAMPLES_PER_KIND, type LanguageMoments, type ShardResult } from './types.js';


/** A per-shard duplicate-index builder, as the scan uses it. */
export interface ScanDuplicateBuilder {
  add(doc: { ordinal: number; line: number; language: number; text: string }): void;
  finish(): Uint8Array;
  /** The documents added so far, for another builder's addPart (batches measured elsewhere). */
  takePart(): DuplicateIndexPart;
  addPart(part: DuplicateIndexPart): void;
}

/** The per-document analyzers a scan runs; optional ones are off when absent. */
export interface ScanAnalyzers {
  /** Language, script, encoding, words: always on. */
  measure(doc: { text: string; declaredLanguage?: string }): DocumentMeasure;
  /** Token counts under the policy's tokenizer (and baseline). */
  tokens?(text: string): DocumentTokens;
  /** A fresh per-shard duplicate-index builder. */
  duplicates?(): ScanDuplicateBuilder;
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

/** Consecutive documents of one shard, as its reader handed them on: the unit of work of a batched scan. Plain data, so it crosses threads. */
export interface DocumentBatch {
  lines: number[];
  texts: string[];
  /** The declared-language value of each document, or null. */
  declared: Array<string | null>;
  /** Under sampling, documents whose text hash is at most this are measured (HASH_SPACE: all). */
  cutoff: number;
}

type ContaminationTally = { docs: number; samples: Array<{ line: number; evalFile: string; evalLine: number }> };

/** The fold of one batch's documents, to be absorbed in reading order (plain data, so it crosses threads). */
export interface BatchResult {
  tally: TallyState;
  moments?: MomentSums;
  duplicates?: DuplicateIndexPart;
  contamination?: ContaminationTally;
  measured: number;
  offered: number;
  /** Under sampling, when none of the batch's documents was measured: the one with the smallest hash (the first on a tie). */
  fallback?: { doc: RawDocument; hash: number };
  /** The first document an analyzer failed on; documents after it were not looked at. */
  failure?: { line: number; message: string };
}

/** Returns the sha256 (hex) of a shard's raw bytes. */
export async function contentIdOf(ref: ShardRef): Promise<string> {
  const hash = createHash('sha256');
  const stream: Readable = ref.open?.() ?? createReadStream(ref.absPath);
  for await (const chunk of stream) hash.update(chunk as Buffer);
  return hash.digest('hex');
}

/**
 * The running fold of a shard's documents: tallies, sampling sums, duplicate index and evaluation
 * overlaps. Documents come in one by one (`offer`) or as folds of batches (`absorb`), in reading order.
 */
class ShardFold {
  readonly tally: ShardTally;
  readonly moments: MomentTally | undefined;
  readonly dup: ScanDuplicateBuilder | undefined;
  readonly contamination: ContaminationTally | undefined;
  private readonly languageIndex: Map<string, number>;
  private readonly otherIndex: number;
  /** Duplicate-index language of a document not measured: past `other`, named UNSAMPLED_LANGUAGE by the summary. */
  private readonly unsampledIndex: number;
  measured = 0;
  offered = 0;
  private ordinal = 0;
  /** While nothing falls under a fraction's cutoff, the smallest-hash document so far, so a small shard still has one measured. */
  fallback: { doc: RawDocument; hash: number } | undefined;
  failure: { line: number; message: string } | undefined;

  constructor(
    private readonly settings: ScanSettings,
    private readonly analyzers: ScanAnalyzers,
    private readonly cutoff: number,
  ) {
    this.tally = new ShardTally(settings.languageKeys);
    this.moments = settings.sampling ? new MomentTally() : undefined;
    this.dup = analyzers.duplicates?.();
    this.contamination = analyzers.contamination ? { docs: 0, samples: [] } : undefined;
    this.languageIndex = new Map(settings.languageKeys.map((k, i) => [k, i] as const));
    this.otherIndex = settings.languageKeys.length;
    this.unsampledIndex = this.otherIndex + 1;
  }

  /** Measures one document into the tallies. */
  measureOne(doc: RawDocument): DocumentMeasure {
    const m = this.analyzers.measure(doc);
    const tokens = this.analyzers.tokens?.(doc.text);
    this.tally.add(doc.line, m, tokens);
    this.moments?.add(m, tokens);
    this.measured += 1;
    return m;
  }

  /** Folds in the next document; after a failure, documents are ignored. */
  offer(doc: RawDocument): void {
    if (this.failure) return;
    try {
      const sampling = this.settings.sampling;
      let language = this.unsampledIndex;
      const hash = sampling ? documentHash(doc.text) : 0;
      if (!sampling || hash <= this.cutoff) {
        const m = this.measureOne(doc);
        language = this.languageIndex.get(m.language) ?? this.otherIndex;
        this.fallback = undefined;
      } else if (this.measured === 0 && (!this.fallback || hash < this.fallback.hash)) {
        this.fallback = { doc, hash };
      }
      this.dup?.add({ ordinal: this.ordinal, line: doc.line, language, text: doc.text });
      if (this.contamination) {
        const hit = this.analyzers.contamination!(doc.text);
        if (hit) {
          this.contamination.docs += 1;
          if (this.contamination.samples.length < SAMPLES_PER_KIND) {
            this.contamination.samples.push({ line: doc.line, evalFile: hit.file, evalLine: hit.line });
          }
        }
      }
      this.ordinal += 1;
      this.offered += 1;
    } catch (err) {
      this.failure = { line: doc.line, message: `measuring failed at line ${doc.line}: ${(err as Error).message}` };
    }
  }

  /** Returns this fold as a batch result (the fold cannot be used afterwards). */
  toBatch(): BatchResult {
    const out: BatchResult = { tally: this.tally.state(), measured: this.measured, offered: this.offered };
    if (this.moments) out.moments = this.moments.state();
    if (this.dup) out.duplicates = this.dup.takePart();
    if (this.contamination) out.contamination = this.contamination;
    if (this.fallback && this.measured === 0) out.fallback = this.fallback;
    if (this.failure) out.failure = this.failure;
    return out;
  }

  /** Folds in the next batch's result, as if its documents had been offered here one by one. */
  absorb(b: BatchResult): void {
    if (this.failure) return;
    this.tally.absorb(b.tally);
    if (this.moments && b.moments) this.moments.absorb(b.moments);
    if (this.dup && b.duplicates) this.dup.addPart(b.duplicates);
    if (this.contamination && b.contamination) {
      this.contamination.docs += b.contamination.docs;
      for (const s of b.contamination.samples) {
        if (this.contamination.samples.length < SAMPLES_PER_KIND) this.contamination.samples.push(s);
      }
    }
    if (this.settings.sampling && this.measured === 0) {
      if (b.measured > 0) this.fallback = undefined;
      else if (b.fallback && (!this.fallback || b.fallback.hash < this.fallback.hash)) this.fallback = b.fallback;
    }
    this.measured += b.measured;
    this.offered += b.offered;
    this.ordinal += b.offered;
    if (b.failure) this.failure = b.failure;
  }

  /** Returns the shard's result over everything folded in, with the reader's account of its lines. */
  finish(ref: ShardRef, account: ReadAccount, contentId: string, started: number): ShardResult {
    const sampling = this.settings.sampling;
    let usedFallback = false;
    if (sampling && this.measured === 0 && this.fallback && !this.failure) {
      const doc = this.fallback.doc;
      try {
        this.measureOne(doc);
        usedFallback = true;
      } catch (err) {
        this.failure = { line: doc.line, message: `measuring failed at line ${doc.line}: ${(err as Error).message}` };
      }
    }
    if (this.failure && !account.broken) account.broken = { afterLine: this.failure.line - 1, message: this.failure.message };

    const tally = this.tally;
    const result: ShardResult = {
      schema: RESULT_SCHEMA,
      path: ref.path,
      format: ref.format,
      compression: ref.compression,
      encoding: ref.encoding,
      sizeBytes: ref.sizeBytes,
      contentId,
      settingsId: this.settings.settingsId,
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
    if (this.dup) result.duplicateIndex = this.dup.finish();
    if (this.contamination) result.contamination = this.contamination;
    if (sampling && this.moments) {
      result.sample = { ...describeSampling(sampling), docs: this.measured, of: this.offered, cutoff: this.cutoff, moments: this.moments.moments };
      if (usedFallback) result.sample.fallback = true;
    }
    return result;
  }
}

/** Returns a ref whose raw bytes also go through `hash` as they are read, so the cache key costs no second pass. */
function hashedWhileRead(ref: ShardRef, hash: Hash): ShardRef {
  return {
    ...ref,
    open: () => {
      const source = ref.open?.() ?? createReadStream(ref.absPath, { highWaterMark: readChunkBytes(ref) });
      const tap = new PassThrough();
      source.on('data', (chunk: Buffer) => hash.update(chunk));
      source.on('error', (err: Error) => tap.destroy(err));
      source.pipe(tap);
      return tap;
    },
  };
}

/**
 * Returns the sampling cutoff of a shard: every document when the policy does not sample; for a
 * fraction, fixed by it; for docs-per-shard, the N-th smallest text hash, found by a reading-only pass.
 */
async function cutoffOf(ref: ShardRef, settings: ScanSettings): Promise<number> {
  const sampling = settings.sampling;
  if (!sampling) return HASH_SPACE;
  if ('fraction' in sampling) return fractionCutoff(sampling.fraction);
  const smallest = new SmallestHashes(sampling.docsPerShard);
  await readShard(ref, settings.read, (doc) => smallest.add(documentHash(doc.text)));
  return smallest.cutoff();
}

/**
 * Returns the measured result of one shard; a failure inside an analyzer marks the shard broken rather than
 * throwing. `onRead` is told the decompressed bytes read so far, between raw chunks (for progress).
 */
export async function scanShard(ref: ShardRef, settings: ScanSettings, analyzers: ScanAnalyzers, onRead?: (bytes: number) => void): Promise<ShardResult> {
  const started = performance.now();
  const cutoff = await cutoffOf(ref, settings);
  const fold = new ShardFold(settings, analyzers, cutoff);
  const hash = createHash('sha256');
  const pace = onRead
    ? (bytes: number): undefined => {
        onRead(bytes);
        return undefined;
      }
    : undefined;
  const account = await readShard(hashedWhileRead(ref, hash), settings.read, (doc) => fold.offer(doc), pace);
  return fold.finish(ref, account, hash.digest('hex'), started);
}

/** Returns the fold of one batch of a shard's documents (on whichever thread measures it). */
export function measureBatch(batch: DocumentBatch, settings: ScanSettings, analyzers: ScanAnalyzers): BatchResult {
  const fold = new ShardFold(settings, analyzers, batch.cutoff);
  const { lines, texts, declared } = batch;
  for (let i = 0; i < texts.length; i++) {
    const doc: RawDocument = { line: lines[i]!, lineEnd: lines[i]!, text: texts[i]! };
    const d = declared[i];
    if (d !== null && d !== undefined) doc.declaredLanguage = d;
    fold.offer(doc);
    if (fold.failure) break;
  }
  return fold.toBatch();
}

/** How a batched scan cuts and paces its batches. */
export interface BatchPlan {
  /** A batch is handed out once its texts reach this many UTF-16 units. */
  batchChars: number;
  /** At most this many batches handed out and not yet absorbed; reading waits beyond it, so memory stays bounded. */
  inFlight: number;
  /** Told the decompressed bytes read so far, between raw chunks (for progress on a long shard). */
  onRead?: (bytes: number) => void;
}

/**
 * Returns the measured result of one shard, read here and measured in batches by `measure`
 * (which may run them on other threads, in any order). The result equals scanShard's.
 * A rejected batch (a thread that died) rejects the scan; a failure inside an analyzer marks
 * the shard broken, as scanShard does.
 */
export async function scanShardInBatches(
  ref: ShardRef,
  settings: ScanSettings,
  analyzers: ScanAnalyzers,
  measure: (batch: DocumentBatch) => Promise<BatchResult>,
  plan: BatchPlan,
): Promise<ShardResult> {
  const started = performance.now();
  const cutoff = await cutoffOf(ref, settings);
  const fold = new ShardFold(settings, analyzers, cutoff);
  const hash = createHash('sha256');

  // Batches in reading order; each settles into `done`, and the run of settled ones at the front is absorbed.
  const pending: Array<Promise<void>> = [];
  const done = new Map<number, BatchResult>();
  let handedOut = 0;
  let absorbed = 0;
  let failed: { error: unknown } | undefined;
  const absorbReady = (): void => {
    for (let r = done.get(absorbed); r !== undefined; r = done.get(absorbed)) {
      done.delete(absorbed);
      fold.absorb(r);
      absorbed += 1;
    }
  };
  const handOut = (batch: DocumentBatch): void => {
    const index = handedOut++;
    pending[index] = measure(batch).then(
      (r) => {
        done.set(index, r);
        absorbReady();
      },
      (error: unknown) => {
        failed ??= { error };
      },
    );
  };

  let batch: DocumentBatch = { lines: [], texts: [], declared: [], cutoff };
  let chars = 0;
  const flush = (): void => {
    if (batch.texts.length === 0) return;
    handOut(batch);
    batch = { lines: [], texts: [], declared: [], cutoff };
    chars = 0;
  };
  const account = await readShard(
    hashedWhileRead(ref, hash),
    settings.read,
    (doc) => {
      // Once a batch has failed, nothing after it is absorbed: stop handing out work, keep counting lines.
      if (fold.failure || failed) return;
      batch.lines.push(doc.line);
      batch.texts.push(doc.text);
      batch.declared.push(doc.declaredLanguage ?? null);
      chars += doc.text.length;
      if (chars >= plan.batchChars) flush();
    },
    (bytes) => {
      plan.onRead?.(bytes);
      if (failed) throw (failed as { error: unknown }).error;
      // Wait for the oldest batch not yet absorbed once too many are out.
      if (handedOut - absorbed < plan.inFlight) return undefined;
      return pending[absorbed];
    },
  );
  flush();
  await Promise.all(pending);
  if (failed) throw (failed as { error: unknown }).error;
  absorbReady();
  if (absorbed !== handedOut) throw new Error(`${ref.path}: ${handedOut - absorbed} of ${handedOut} batches were not absorbed`);
  return fold.finish(ref, account, hash.digest('hex'), started);
}
