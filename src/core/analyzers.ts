// Builds the per-document analyzers a policy asks for (measurer, tokenizers,
// duplicate index, evaluation overlap), the identity of those settings for the
// cache, and the cross-shard step that runs once every shard is measured.
import { relative } from 'node:path';
import { createMeasurer, forEachWord, kernelUnavailable, wordOffsets } from '../measure/index.js';
import { buildEvalIndex, duplicateOptionsFrom, DuplicateIndexBuilder, evalSetId, findContamination, type EvalIndex, type EvalItem } from '../measure/duplicates/index.js';
import { dictionaryFertility, loadTokenizer, measureTokens, readWordList, TokenizerError, type SharedTokenizerTables, type TokenCounter } from '../measure/tokens/index.js';
import { formatPolicyKeyProblem } from '../policy/index.js';
import type { Policy } from '../policy/types.js';
import { discoverShards, readShard } from '../read/index.js';
import type { ReadOptions } from '../read/types.js';
import { settingsIdOf } from '../results/cache.js';
import type { CorpusResult } from '../results/corpus.js';
import { joinShardIndexes, summarizeDuplicates } from '../results/duplicates.js';
import { UNSAMPLED_LANGUAGE } from '../results/sample.js';
import type { ScanAnalyzers, ScanSettings } from '../results/scan.js';
import type { DocumentTokens } from '../results/tally.js';
import { RESULT_SCHEMA } from '../results/types.js';
import { TOOL_VERSION } from '../version.js';

/** Rejection samples kept per shard. */
const REJECTION_SAMPLES = 10;

export interface PreparedAnalyzers {
  settingsId: string;
  scan: ScanSettings;
  analyzers: ScanAnalyzers;
  /** Adds the cross-shard figures (duplicates, dictionary fertility, tokenizer labels) to a measured corpus. */
  finish(corpus: CorpusResult, newShards?: string[]): Promise<void>;
  /** The tokenizers' tables of piece counts in shared memory, for the workers of a pooled run to adopt. */
  sharedCounts(): SharedCountTables;
  /** Uses another thread's tables (from sharedCounts of the same policy) from now on. */
  adoptCounts(tables: SharedCountTables): void;
  /** Loads what the analyzers deferred (with `deferTokenizerData`); await it before the first document is measured. */
  ready(): Promise<void>;
  /** The evaluation set as read (contamination on), for the workers of a pooled run: see PrepareOptions.evaluation. */
  evaluation?: EvaluationSet;
  /**
   * Builds the tables the analyzers otherwise build at their first document (franc's profiles,
   * the character class tables, the evaluation index) by measuring a short text and discarding
   * the result. A worker calls it while it waits for the main thread's tokenizer tables; the
   * token counters are left alone, since they would build rank tables of their own.
   */
  warmUp(): void;
}

/** The text warmUp measures: plain Latin-script prose, which every analyzer accepts. */
const WARM_UP_TEXT = 'A worker measures this sentence once, before its first shard, and keeps nothing of it.';

/** The evaluation items of a policy's contamination rule and the files they came from. */
export interface EvaluationSet {
  items: EvalItem[];
  files: string[];
}

export interface PrepareOptions {
  /**
   * Defer importing a builtin tokenizer's ranks module to `ready()`: a run whose shards all come
   * from the cache never imports it (about 30 ms of a warm run that takes half a second).
   */
  deferTokenizerData?: boolean;
  /**
   * The evaluation set another thread has read for this policy (readEvaluation): used as
   * given instead of listing and reading the files again (see WorkerInit in pool.ts).
   */
  evaluation?: EvaluationSet;
}

/** Per tokenizer of a policy, its tables in shared memory: piece counts and ranks (see measure/tokens/shared-counts.ts, ranks.ts). */
export interface SharedCountTables {
  main?: SharedTokenizerTables;
  baseline?: SharedTokenizerTables;
}

/** Returns the read options a policy implies. */
export function readOptionsOf(policy: Policy): ReadOptions {
  const opts: ReadOptions = { textField: policy.corpus.text, maxLineBytes: policy.corpus.maxLineBytes, maxSamples: REJECTION_SAMPLES };
  if (policy.corpus.declaredLanguage !== undefined) opts.declaredLanguageField = policy.corpus.declaredLanguage;
  return opts;
}

/** A setting that cannot be used (tokenizer or evaluation files unreadable): the run cannot be judged. */
export class AnalyzerSetupError extends Error {
  override name = 'AnalyzerSetupError';
}

/** Lists and reads the evaluation files of a policy's contamination rule (undefined without the rule); AnalyzerSetupError when none match or one cannot be read. */
export async function readEvaluation(policy: Policy): Promise<EvaluationSet | undefined> {
  const rule = policy.rules.contamination;
  if (!rule) return undefined;
  const found = await discoverShards(policy.root, { ...policy.corpus, include: rule.eval, exclude: [] });
  if (found.shards.length === 0) {
    throw new AnalyzerSetupError(formatPolicyKeyProblem(policy, 'rules.contamination.eval', `(${rule.eval.join(', ')}) matched no evaluation files under ${policy.root}`));
  }
  const read = readOptionsOf(policy);
  const items: EvalItem[] = [];
  for (const ref of found.shards) {
    const account = await readShard(ref, read, (doc) => items.push({ file: ref.path, line: doc.line, text: doc.text }));
    if (account.broken) throw new AnalyzerSetupError(`${ref.path}: evaluation file could not be read to its end: ${account.broken.message}`);
    // An evaluation item that cannot be read is one whose copies the check would not look for:
    // the run cannot say the corpus is clean of the set, so it stops, naming the lines.
    if (account.rejected.count > 0) {
      const first = account.rejected.samples
        .slice(0, 3)
        .map((r) => `line ${r.line} (${r.reason}: ${r.detail})`)
        .join('; ');
      const more = account.rejected.count > 3 ? `, and ${account.rejected.count - 3} more` : '';
      throw new AnalyzerSetupError(
        `${ref.path}: ${account.rejected.count === 1 ? '1 line of this evaluation file is' : `${account.rejected.count} lines of this evaluation file are`} not an item the contamination check can use: ${first}${more}`,
      );
    }
  }
  return { items, files: found.shards.map((s) => s.path) };
}

/** Returns the analyzers of a policy, ready to scan shards. */
export async function prepareAnalyzers(policy: Policy, options: PrepareOptions = {}): Promise<PreparedAnalyzers> {
  // Said once, before any shard is read, rather than as every shard failing on its first line.
  const unavailable = kernelUnavailable();
  if (unavailable) throw new AnalyzerSetupError(unavailable);
  const measure = createMeasurer({ languages: policy.languages, detection: policy.detection });
  const read = readOptionsOf(policy);

  let main: TokenCounter | undefined;
  let baseline: TokenCounter | undefined;
  const load = { deferBuiltin: options.deferTokenizerData === true };
  try {
    if (policy.tokenizer) main = await loadTokenizer(policy.tokenizer, load);
  } catch (err) {
    throw new AnalyzerSetupError(formatPolicyKeyProblem(policy, 'tokenizer', (err as Error).message));
  }
  try {
    if (policy.baseline) baseline = await loadTokenizer(policy.baseline, load);
  } catch (err) {
    throw new AnalyzerSetupError(formatPolicyKeyProblem(policy, 'baseline', (err as Error).message));
  }

  const dupRule = policy.rules.duplicates;
  const dupOptions = dupRule ? duplicateOptionsFrom(dupRule) : undefined;

  // The evaluation items are read now (their content keys the cache), and indexed at the first
  // document checked against them: a run whose shards all come from the cache never builds the
  // index (on the bench corpus, about a tenth of such a run's time, more for larger eval sets).
  const contamination = policy.rules.contamination;
  const evaluation = contamination ? (options.evaluation ?? (await readEvaluation(policy))) : undefined;
  const evalItems = evaluation?.items;
  const evalId = contamination && evalItems ? evalSetId(evalItems, contamination.ngram) : undefined;

  const settingsId = settingsIdOf({
    tool: TOOL_VERSION,
    schema: RESULT_SCHEMA,
    languages: policy.languages.map((l) => ({ key: l.key, covers: l.covers, scripts: l.scripts })),
    detection: policy.detection,
    read: { text: read.textField, declared: read.declaredLanguageField ?? null, maxLineBytes: read.maxLineBytes },
    tokenizer: main?.id ?? null,
    baseline: baseline?.id ?? null,
    duplicates: dupOptions ?? null,
    eval: evalId ?? null,
    // Only when set, so results measured without sampling keep their cache key.
    ...(policy.sampling ? { sampling: policy.sampling } : {}),
  });

  const analyzers: ScanAnalyzers = { measure };
  if (main) {
    const m = main;
    const b = baseline;
    analyzers.tokens = (text: string): DocumentTokens => {
      const out: DocumentTokens = { main: measureTokens(m, text, forEachWord, wordOffsets) };
      if (b) out.baseline = measureTokens(b, text, forEachWord, wordOffsets);
      return out;
    };
  }
  // With contamination on, the scan checks each document right after indexing it: one word pass serves both.
  if (dupOptions) analyzers.duplicates = () => new DuplicateIndexBuilder(dupOptions, { words: evalItems !== undefined });
  if (evalItems && policy.rules.contamination) {
    const items = evalItems;
    const ngram = policy.rules.contamination.ngram;
    let index: EvalIndex | undefined;
    analyzers.contamination = (text: string) => findContamination((index ??= buildEvalIndex(items, ngram)), text);
  }

  const counters = { main, baseline };
  let loaded: Promise<void> | undefined;
  const ready = (): Promise<void> =>
    (loaded ??= (async () => {
      try {
        await main?.ready?.();
      } catch (err) {
        throw new AnalyzerSetupError(formatPolicyKeyProblem(policy, 'tokenizer', (err as Error).message));
      }
      try {
        await baseline?.ready?.();
      } catch (err) {
        throw new AnalyzerSetupError(formatPolicyKeyProblem(policy, 'baseline', (err as Error).message));
      }
    })());
  return {
    ready,
    sharedCounts() {
      const tables: SharedCountTables = {};
      for (const role of ['main', 'baseline'] as const) {
        try {
          const table = counters[role]?.shareTables?.();
          if (table) tables[role] = table;
        } catch (err) {
          // A rank table that cannot be built fails each thread's first count, where the shard
          // being measured is marked broken as before; sharing just leaves that tokenizer out.
          if (!(err instanceof TokenizerError)) throw err;
        }
      }
      return tables;
    },
    adoptCounts(tables) {
      for (const role of ['main', 'baseline'] as const) {
        const table = tables[role];
        // A table made for another tokenizer is refused by the counter, which keeps its own.
        if (table) counters[role]?.adoptTables?.(table);
      }
    },
    settingsId,
    ...(evaluation ? { evaluation } : {}),
    warmUp() {
      analyzers.measure({ text: WARM_UP_TEXT });
      analyzers.duplicates?.().add({ ordinal: 0, line: 1, language: 0, text: WARM_UP_TEXT });
      analyzers.contamination?.(WARM_UP_TEXT);
    },
    scan: { read, languageKeys: policy.languages.map((l) => l.key), settingsId, ...(policy.sampling ? { sampling: policy.sampling } : {}) },
    analyzers,
    async finish(corpus, newShards) {
      if (main) corpus.tokenizer = { label: main.label, hasUnknown: main.unknownTokenId !== null };
      if (baseline) corpus.baseline = { label: baseline.label, hasUnknown: baseline.unknownTokenId !== null };
      const lists = policy.rules.fertility?.wordLists ?? {};
      if (main && Object.keys(lists).length > 0) {
        await ready();
        corpus.dictionary = {};
        for (const [key, list] of Object.entries(lists)) {
          let words: string[];
          try {
            words = await readWordList(list.absPath);
          } catch (err) {
            throw new AnalyzerSetupError(`${policy.file}: rules.fertility.word-lists.${key}: ${(err as Error).message}`);
          }
          const shown = relative(policy.root, list.absPath) || list.file;
          const m = dictionaryFertility(main, words);
          const entry: NonNullable<CorpusResult['dictionary']>[string] = { main: { list: shown, ...m } };
          if (baseline) entry.baseline = { list: shown, ...dictionaryFertility(baseline, words) };
          corpus.dictionary[key] = entry;
        }
      }
      if (dupOptions) {
        const findings = joinShardIndexes(corpus.shards, dupOptions, newShards);
        const keys = policy.languages.map((l) => l.key);
        // Under sampling, documents not measured have no language: the scan files them past `other`.
        corpus.duplicates = summarizeDuplicates(findings, policy.sampling ? [...keys, 'other', UNSAMPLED_LANGUAGE] : keys);
        if (findings.againstExisting) corpus.duplicatesAgainstExisting = findings.againstExisting;
      }
      if (evaluation && policy.rules.contamination) {
        corpus.contamination = { ngram: policy.rules.contamination.ngram, evalFiles: evaluation.files, evalItems: evaluation.items.length };
      }
    },
  };
}
