// Loads the tokenizer a policy names, from js-tiktoken's builtins or a file, with no
// network. Every failure is a TokenizerError naming the file (and line, for rank files).

import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import type { TokenizerSpec } from '../../policy/types.js';
import { TokenizerError } from './errors.js';
import { BUILTIN_NAMES, BUILTIN_PATTERNS, DEFAULT_RANK_FILE_PATTERN, isBuiltinName, type BuiltinName } from './patterns.js';
import { buildBuiltinRanks, parseRankFile, RankTable } from './ranks.js';
import { DEFAULT_SHARED_ENTRIES, SharedPieceCounts } from './shared-counts.js';
import { createRankCounter } from './tiktoken.js';
import type { SharedTokenizerTables, TokenCounter } from './types.js';

export interface LoadOptions {
  /** Entries per cache generation (see cache.ts); tests make it small to force eviction. */
  cacheGenerationSize?: number;
  /** Entries of the table of piece counts that threads share (shared-counts.ts; default DEFAULT_SHARED_ENTRIES); 0: none, each counter keeps only its own cache. */
  sharedEntries?: number;
  /**
   * For a builtin: import its ranks module (a few MB of JavaScript, about 30 ms to compile) only
   * when `ready()` is called, not now. A run whose shards all come from the cache then never
   * imports it; the caller must await `ready()` before the first count.
   */
  deferBuiltin?: boolean;
}

/** Loads the builtin ranks module of an encoding (each is a few MB of JavaScript, so only on demand). */
async function importBuiltin(name: BuiltinName): Promise<{ pat_str: string; bpe_ranks: string }> {
  switch (name) {
    case 'gpt2':
      return (await import('js-tiktoken/ranks/gpt2')).default;
    case 'r50k_base':
      return (await import('js-tiktoken/ranks/r50k_base')).default;
    case 'p50k_base':
      return (await import('js-tiktoken/ranks/p50k_base')).default;
    case 'cl100k_base':
      return (await import('js-tiktoken/ranks/cl100k_base')).default;
    case 'o200k_base':
      return (await import('js-tiktoken/ranks/o200k_base')).default;
  }
}

/** Returns a TokenCounter for the tokenizer a policy names; throws a TokenizerError (stage `load`) naming the file when it cannot. */
export async function loadTokenizer(spec: TokenizerSpec, options: LoadOptions = {}): Promise<TokenCounter> {
  const generationSize = options.cacheGenerationSize;
  const sharedEntries = options.sharedEntries ?? DEFAULT_SHARED_ENTRIES;
  const sharedTable = (id: string): SharedPieceCounts | null => (sharedEntries > 0 ? SharedPieceCounts.create(id, sharedEntries) : null);
  if (spec.kind === 'builtin') {
    const name: string = spec.name;
    if (!isBuiltinName(name)) {
      throw new TokenizerError('load', name, `unknown builtin tokenizer; the builtins are ${BUILTIN_NAMES.join(', ')}`);
    }
    let data: { pat_str: string; bpe_ranks: string } | undefined = options.deferBuiltin ? undefined : await importBuiltin(name);
    // The rank table is parsed on first use: a run whose shards all come from the cache never
    // counts a token, and parsing o200k_base took about an eighth of such a run's time (one CPU
    // profile of a warm-cache `sluice check` on the bench corpus). The data is the package's own, so a
    // damaged table, the one failure deferred by this, is not expected.
    const id = `builtin:${name}`;
    const counter = lazyCounter(
      id,
      name,
      () => sharedTable(id),
      (shared, ranks) => {
        if (ranks === null && data === undefined) {
          // Not a TokenizerError: a bug of the caller, never a shard's fault (callers that file a
          // TokenizerError against the shard being measured must not swallow this).
          throw new Error(`internal error: ${name}: the ranks were not loaded before the first count (ready() was not awaited)`);
        }
        return createRankCounter({
          id,
          label: name,
          ranks: ranks ?? buildBuiltinRanks(data!.bpe_ranks, name, id),
          // The same string as the module's pat_str (test/measure/tokens-split.test.ts checks it).
          pattern: BUILTIN_PATTERNS[name],
          shared,
          ...(generationSize === undefined ? {} : { generationSize }),
        });
      },
    );
    if (!options.deferBuiltin) return counter;
    return {
      ...counter,
      ready: async () => {
        data ??= await importBuiltin(name);
      },
    };
  }

  let bytes: Buffer;
  try {
    bytes = await readFile(spec.absPath);
  } catch (cause) {
    const code = (cause as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? `no such file (${spec.absPath})` : `cannot read ${spec.absPath}: ${(cause as Error).message}`;
    throw new TokenizerError('load', spec.file, why, { cause });
  }
  const digest = createHash('sha256').update(bytes).digest('hex');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch (cause) {
    throw new TokenizerError('load', spec.file, 'not valid UTF-8', { cause });
  }

  if (spec.format === 'tiktoken') {
    const { pattern, patternId } = resolvePattern(spec.pattern, spec.file);
    const id = `tiktoken:sha256:${digest}:pattern:${patternId}`;
    return createRankCounter({
      id,
      label: spec.file,
      ranks: parseRankFile(text, spec.file, id),
      pattern,
      shared: sharedTable(id),
      ...(generationSize === undefined ? {} : { generationSize }),
    });
  }
  if (spec.format === 'tokenizer.json') {
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch (cause) {
      throw new TokenizerError('load', spec.file, `not valid JSON: ${(cause as Error).message}`, { cause });
    }
    // Imported here, not at the top: only a policy naming a tokenizer.json needs the library,
    // and loading it cost every run about 10 ms of start-up (and as much on every worker).
    const { createJsonCounter } = await import('./hf.js');
    return createJsonCounter(json, spec.file, `tokenizer.json:sha256:${digest}`, generationSize);
  }
  throw new TokenizerError('load', spec.file, `unknown tokenizer format ${JSON.stringify(spec.format)} (expected tokenizer.json or tiktoken)`);
}

/** A rank file's split pattern: a builtin's name, a regex source, or the default. */
function resolvePattern(pattern: string | undefined, file: string): { pattern: string; patternId: string } {
  const name = pattern ?? DEFAULT_RANK_FILE_PATTERN;
  if (isBuiltinName(name)) return { pattern: BUILTIN_PATTERNS[name], patternId: name };
  try {
    new RegExp(name, 'gu');
  } catch (cause) {
    throw new TokenizerError('load', file, `split pattern is not a valid regular expression: ${(cause as Error).message}`, { cause });
  }
  return { pattern: name, patternId: `sha256:${createHash('sha256').update(name).digest('hex').slice(0, 16)}` };
}

/**
 * Returns a byte-level rank counter (no unknown token, exact fast path, pieces recorded) that is
 * built by `make` when first asked to count. Its shared table of piece counts exists from the
 * start (made by `newTable`, or adopted from another thread), so other threads can be handed it
 * before this one has counted anything; a rank table adopted before then saves the parse.
 */
function lazyCounter(
  id: string,
  label: string,
  newTable: () => SharedPieceCounts | null,
  make: (shared: SharedPieceCounts | null, ranks: RankTable | null) => TokenCounter,
): TokenCounter {
  let real: TokenCounter | undefined;
  let table: SharedPieceCounts | null | undefined;
  let adoptedRanks: RankTable | null = null;
  const tableOf = (): SharedPieceCounts | null => (table === undefined ? (table = newTable()) : table);
  const get = (): TokenCounter => (real ??= make(tableOf(), adoptedRanks));
  return {
    id,
    label,
    kind: 'tiktoken',
    unknownTokenId: null,
    exactFastPath: true,
    count: (text) => get().count(text),
    countPiece: (piece) => get().countPiece(piece),
    countWithPieces: (text, pieces) => get().countWithPieces!(text, pieces),
    measureWords: (text, offsets) => get().measureWords?.(text, offsets) ?? null,
    cacheStats: () => (real ? real.cacheStats() : { hits: 0, misses: 0, evictions: 0, entries: 0 }),
    // Handing the tables out builds the counter: a thread that shares is about to count anyway,
    // and the others then take its rank table instead of parsing their own.
    shareTables: () => get().shareTables!(),
    adoptTables: (tables: SharedTokenizerTables) => {
      if (real) return real.adoptTables!(tables);
      const counts = tables.counts === null ? null : SharedPieceCounts.attach(tables.counts, id);
      const ranks = tables.ranks === null ? null : RankTable.attach(tables.ranks, id);
      if (counts === null || ranks === null) return false;
      table = counts;
      adoptedRanks = ranks;
      return true;
    },
  };
}
