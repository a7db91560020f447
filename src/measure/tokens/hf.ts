// Counters for Hugging Face `tokenizer.json` files, through @huggingface/tokenizers.
//
// The library's encode, for each section between added tokens: normalizes the whole
// section, splits it by the pre-tokenizer, and hands the pieces to the model, which
// encodes every piece on its own (BPE, WordPiece and Unigram all loop over pieces) and
// then, if the model fuses unknowns, merges runs of adjacent unknown tokens. Every
// pre-tokenizer stage maps each piece independently (`pre_tokenize` is a flat map), so
// once the first splitting stage has run on the whole text, the rest of the pipeline
// is a pure function of each piece: its result is cached per piece. Unknown fusion
// across piece boundaries is redone here from each piece's first and last token.
//
// The fast path runs the library's own components (normalizer, added-token splitter,
// pre-tokenizer stages, model) in the library's order; only the glue is mirrored. Where
// the pipeline has no splitting stage (e.g. a lone Metaspace, which this library keeps
// as one piece) or a post-processor that changes tokens even without special tokens,
// every text goes through the library's whole-text encode and `exactFastPath` is false.

import * as hf from '@huggingface/tokenizers';
import { PieceCache } from './cache.js';
import { TokenizerError } from './errors.js';
import type { CacheStats, TokenCounter, TokenizerKind } from './types.js';

// The library's internals this module relies on (version pinned in package.json).
interface LibStage {
  pre_tokenize(text: string | string[], options?: { section_index?: number }): string[];
}
interface LibModel {
  (tokens: string[]): string[];
  tokens_to_ids: Map<string, number>;
  unk_token_id?: number;
  fuse_unk: boolean;
}
interface LibAddedToken {
  id: number;
  lstrip: boolean;
  rstrip: boolean;
}
interface LibTokenizer {
  normalizer: ((text: string) => string) | null;
  pre_tokenizer: (LibStage & { tokenizers?: (LibStage | null)[] }) | null;
  model: LibModel;
  post_processor: ((tokens: string[], pair: null, addSpecial: boolean) => { tokens: string[] }) | null;
  splitter_unnormalized: { split(text: string): string[] };
  splitter_normalized: { split(text: string): string[] };
  added_tokens_map: Map<string, LibAddedToken>;
  remove_space?: boolean;
  do_lowercase_and_remove_accent?: boolean;
  encode(text: string, options: { add_special_tokens: boolean }): { ids: (number | undefined)[] };
}

/** What one piece costs once it has gone through the rest of the pipeline and the model. */
interface PieceCount {
  tokens: number;
  unknown: number;
  /** Whether the first / last token is one the model's unknown fusion would merge. */
  firstFusable: boolean;
  lastFusable: boolean;
  firstUnknown: boolean;
  lastUnknown: boolean;
}

// The package's type declarations re-export without file extensions, which NodeNext
// resolution cannot follow; the classes are there at run time.
type AnyClass = abstract new (...args: never[]) => unknown;
const { BPE, ByteLevelPreTokenizer, MetaspacePreTokenizer, ReplacePreTokenizer, SequencePreTokenizer, Unigram, WordPiece } =
  hf as unknown as Record<
    'BPE' | 'ByteLevelPreTokenizer' | 'MetaspacePreTokenizer' | 'ReplacePreTokenizer' | 'SequencePreTokenizer' | 'Unigram' | 'WordPiece',
    AnyClass
  >;
const { Tokenizer } = hf;

const REQUIRED_KEYS = ['normalizer', 'pre_tokenizer', 'post_processor', 'decoder'] as const;

/** Returns a TokenCounter for a parsed tokenizer.json; throws a TokenizerError naming `file` when the library cannot build it. */
export function createJsonCounter(
  json: unknown,
  file: string,
  id: string,
  generationSize?: number,
): TokenCounter {
  if (json === null || typeof json !== 'object' || Array.isArray(json)) {
    throw new TokenizerError('load', file, 'a tokenizer.json must hold a JSON object');
  }
  const config = { ...(json as Record<string, unknown>) };
  const model = config.model as Record<string, unknown> | undefined;
  if (model === null || typeof model !== 'object' || Array.isArray(model)) {
    throw new TokenizerError('load', file, 'no "model" object: not a tokenizer.json');
  }
  if (model.type !== undefined && !['BPE', 'WordPiece', 'Unigram'].includes(model.type as string)) {
    throw new TokenizerError(
      'load',
      file,
      `unknown model type ${JSON.stringify(model.type)} (sluice reads BPE, WordPiece and Unigram)`,
    );
  }
  // Keys that only matter for decoding or are empty in hand-made files: the library insists on them.
  for (const key of REQUIRED_KEYS) if (!(key in config)) config[key] = null;
  if (!('added_tokens' in config)) config.added_tokens = [];
  if (!Array.isArray(config.added_tokens)) throw new TokenizerError('load', file, '"added_tokens" must be a list');

  let tokenizer: hf.Tokenizer;
  try {
    tokenizer = new Tokenizer(config, {});
  } catch (cause) {
    throw new TokenizerError('load', file, `cannot build the tokenizer: ${(cause as Error).message}`, { cause });
  }
  const lib = tokenizer as unknown as LibTokenizer;
  const kind = kindOf(lib.model);
  if (kind === null) {
    throw new TokenizerError('load', file, 'the model is neither BPE, WordPiece nor Unigram');
  }
  const unknownId = lib.model.unk_token_id ?? null;
  const plan = planFastPath(lib);

  const idOf = (token: string): number | undefined =>
    lib.added_tokens_map.get(token)?.id ?? lib.model.tokens_to_ids.get(token) ?? lib.model.unk_token_id;
  const isUnknown = (token: string): boolean => {
    const tokenId = idOf(token);
    return tokenId === undefined || tokenId === unknownId;
  };
  // The library's fuse test: a token is fusable when its id (model vocabulary only) is the unknown id.
  const isFusable = (token: string): boolean =>
    (lib.model.tokens_to_ids.get(token) ?? lib.model.unk_token_id) === lib.model.unk_token_id;

  const wholeText = (text: string): { tokens: number; unknown: number } => {
    const ids = lib.encode(text, { add_special_tokens: false }).ids;
    let unknown = 0;
    for (const tokenId of ids) if (tokenId === undefined || tokenId === unknownId) unknown++;
    return { tokens: ids.length, unknown };
  };

  let countText = wholeText;
  let stats = (): CacheStats => ({ hits: 0, misses: 0, evictions: 0, entries: 0 });

  if (plan !== null) {
    const cache = new PieceCache<PieceCount>(generationSize);
    // Pieces of the first section get their own cache when a later stage treats that section differently.
    const firstSectionCache = plan.dependsOnSection ? new PieceCache<PieceCount>(generationSize) : cache;
    stats = () => {
      const a = cache.stats();
      if (firstSectionCache === cache) return a;
      const b = firstSectionCache.stats();
      return { hits: a.hits + b.hits, misses: a.misses + b.misses, evictions: a.evictions + b.evictions, entries: a.entries + b.entries };
    };
    const fuse = lib.model.fuse_unk;

    const pieceCount = (piece: string, sectionIndex: number): PieceCount => {
      const store = sectionIndex === 0 ? firstSectionCache : cache;
      const cached = store.get(piece);
      if (cached !== undefined) return cached;
      let parts = [piece];
      for (const stage of plan.rest) parts = stage.pre_tokenize(parts, { section_index: sectionIndex });
      const out = lib.model(parts);
      let unknown = 0;
      for (const token of out) if (isUnknown(token)) unknown++;
      const first = out[0];
      const last = out[out.length - 1];
      const result: PieceCount = {
        tokens: out.length,
        unknown,
        firstFusable: first !== undefined && isFusable(first),
        lastFusable: last !== undefined && isFusable(last),
        firstUnknown: first !== undefined && isUnknown(first),
        lastUnknown: last !== undefined && isUnknown(last),
      };
      store.set(piece, result);
      return result;
    };

    const countSubsection = (text: string, sectionIndex: number, total: { tokens: number; unknown: number }): void => {
      const options = { section_index: sectionIndex };
      let parts = [text];
      for (const stage of plan.head) parts = stage.pre_tokenize(parts, options);
      const pieces = plan.split(parts, options);
      let previous: PieceCount | null = null;
      for (const piece of pieces) {
        const c = pieceCount(piece, sectionIndex);
        if (c.tokens === 0) continue;
        total.tokens += c.tokens;
        total.unknown += c.unknown;
        // The model merges a run of unknown tokens into one, also across piece boundaries.
        if (fuse && previous !== null && previous.lastFusable && c.firstFusable) {
          total.tokens--;
          // Assumed: the merged token is unknown when both halves were (it is, unless it spells an added token, which the added-token split has already removed).
          if (previous.lastUnknown && c.firstUnknown) total.unknown--;
        }
        previous = c;
      }
    };

    countText = (text: string) => {
      const total = { tokens: 0, unknown: 0 };
      const sections = splitAdded(lib.splitter_unnormalized, lib.added_tokens_map, text);
      for (let i = 0; i < sections.length; i++) {
        const section = sections[i]!;
        if (section.length === 0) continue;
        if (lib.added_tokens_map.has(section)) {
          total.tokens++;
          if (isUnknown(section)) total.unknown++;
          continue;
        }
        const normalized = lib.normalizer === null ? section : lib.normalizer(section);
        if (normalized.length === 0) continue;
        const subsections = splitAdded(lib.splitter_normalized, lib.added_tokens_map, normalized);
        for (const sub of subsections) {
          if (sub.length === 0) continue;
          if (lib.added_tokens_map.has(sub)) {
            total.tokens++;
            if (isUnknown(sub)) total.unknown++;
            continue;
          }
          countSubsection(sub, i, total);
        }
      }
      return total;
    };
  }

  const guarded = (text: string): { tokens: number; unknown: number } => {
    try {
      return countText(text);
    } catch (cause) {
      throw new TokenizerError('count', file, `cannot encode text: ${(cause as Error).message}`, { cause });
    }
  };
  const words = new PieceCache<number>(generationSize);

  return {
    id,
    label: file,
    kind,
    unknownTokenId: unknownId,
    exactFastPath: plan !== null,
    count: guarded,
    countPiece: (piece) => {
      const cached = words.get(piece);
      if (cached !== undefined) return cached;
      const n = guarded(piece).tokens;
      words.set(piece, n);
      return n;
    },
    cacheStats: () => stats(),
  };
}

function kindOf(model: unknown): TokenizerKind | null {
  if (model instanceof BPE) return 'bpe';
  if (model instanceof WordPiece) return 'wordpiece';
  if (model instanceof Unigram) return 'unigram';
  return null;
}

/**
 * The library's added-token split (a trie scan over every character) and its lstrip /
 * rstrip handling, skipped when no added token can start in the text.
 */
function splitAdded(
  splitter: { split(text: string): string[] },
  added: Map<string, LibAddedToken>,
  text: string,
): string[] {
  const trie = (splitter as unknown as { trie: Record<string, unknown> }).trie;
  let any = false;
  for (const first in trie) {
    if (text.includes(first)) {
      any = true;
      break;
    }
  }
  if (!any) return text.length === 0 ? [] : [text];
  const sections = splitter.split(text);
  sections.forEach((section, i) => {
    const token = added.get(section);
    if (token === undefined) return;
    if (token.lstrip && i > 0) sections[i - 1] = sections[i - 1]!.trimEnd();
    if (token.rstrip && i < sections.length - 1) sections[i + 1] = sections[i + 1]!.trimStart();
  });
  return sections;
}

interface FastPathPlan {
  /** Stages before the first splitting one: each turns one text into one text. */
  head: LibStage[];
  /** The first splitting stage, applied to the whole (sub)section. */
  split: (parts: string[], options: { section_index: number }) => string[];
  /** Stages after it, applied to each piece on a cache miss. */
  rest: LibStage[];
  /** A later stage looks at the section index (Metaspace with prepend_scheme "first"). */
  dependsOnSection: boolean;
}

/** Stage types that always return exactly one piece for one input. */
function isSingleOutput(stage: LibStage): boolean {
  if (stage instanceof ByteLevelPreTokenizer) return (stage as unknown as { use_regex: boolean }).use_regex === false;
  return stage instanceof MetaspacePreTokenizer || stage instanceof ReplacePreTokenizer;
}

function planFastPath(lib: LibTokenizer): FastPathPlan | null {
  if (lib.remove_space === true || lib.do_lowercase_and_remove_accent === true) return null;
  if (lib.post_processor !== null) {
    // Without special tokens the usual post-processors hand the tokens on unchanged; check it.
    const probe = ['a', 'b', 'c'];
    let out: unknown;
    try {
      out = lib.post_processor([...probe], null, false).tokens;
    } catch {
      return null;
    }
    if (!Array.isArray(out) || out.length !== probe.length || out.some((t, i) => t !== probe[i])) return null;
  }
  if (lib.pre_tokenizer === null) return null;
  const stages: LibStage[] = [];
  const flatten = (stage: LibStage & { tokenizers?: (LibStage | null)[] }): void => {
    if (stage instanceof SequencePreTokenizer) {
      for (const inner of stage.tokenizers ?? []) if (inner !== null) flatten(inner);
    } else {
      stages.push(stage);
    }
  };
  flatten(lib.pre_tokenizer);
  const k = stages.findIndex((stage) => !isSingleOutput(stage));
  if (k < 0) return null;
  const splitter = stages[k]!;
  let rest = stages.slice(k + 1);
  let split: FastPathPlan['split'] = (parts, options) => splitter.pre_tokenize(parts, options);
  if (splitter instanceof ByteLevelPreTokenizer) {
    // ByteLevel with its regex both splits and maps to byte characters: split here (as the
    // library does) and leave the mapping to a regex-free copy run per piece, so the cache
    // is keyed by the text piece and the mapping runs only on misses.
    const bl = splitter as unknown as { add_prefix_space: boolean; pattern: RegExp; config: Record<string, unknown> };
    const mapper = new (ByteLevelPreTokenizer as unknown as new (config: object) => LibStage)({ ...bl.config, use_regex: false, add_prefix_space: false });
    split = (parts) =>
      parts.flatMap((text) => {
        const t = bl.add_prefix_space && !text.startsWith(' ') ? ' ' + text : text;
        return t.match(bl.pattern) ?? [];
      });
    rest = [mapper, ...rest];
  }
  const dependsOnSection = rest.some(
    (stage) => stage instanceof MetaspacePreTokenizer && (stage as unknown as { prepend_scheme?: string }).prepend_scheme === 'first',
  );
  return { head: stages.slice(0, k), split, rest, dependsOnSection };
}
