// Split patterns of the tiktoken builtins, as js-tiktoken 1.0.21 ships them (its
// `pat_str`, compiled with flags `gu`). Kept here so a rank file can name a builtin's
// pattern without loading that builtin's ranks; test/measure/tokens-load.test.ts checks
// that they still equal the package's.

/** Names of the tiktoken encodings that ship inside js-tiktoken. */
export type BuiltinName = 'gpt2' | 'r50k_base' | 'p50k_base' | 'cl100k_base' | 'o200k_base';

export const BUILTIN_NAMES: readonly BuiltinName[] = ['gpt2', 'r50k_base', 'p50k_base', 'cl100k_base', 'o200k_base'];

const GPT2 = String.raw`'s|'t|'re|'ve|'m|'ll|'d| ?\p{L}+| ?\p{N}+| ?[^\s\p{L}\p{N}]+|\s+(?!\S)|\s+`;
const CL100K = String.raw`('s|'S|'t|'T|'re|'rE|'Re|'RE|'ve|'vE|'Ve|'VE|'m|'M|'ll|'lL|'Ll|'LL|'d|'D)|[^\r\n\p{L}\p{N}]?\p{L}+|\p{N}{1,3}| ?[^\s\p{L}\p{N}]+[\r\n]*|\s*[\r\n]+|\s+(?!\S)|\s+`;
const O200K_CONTRACTION = String.raw`('s|'S|'t|'T|'re|'rE|'Re|'RE|'ve|'vE|'Ve|'VE|'m|'M|'ll|'lL|'Ll|'LL|'d|'D)?`;
const O200K =
  String.raw`[^\r\n\p{L}\p{N}]?[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]*[\p{Ll}\p{Lm}\p{Lo}\p{M}]+` +
  O200K_CONTRACTION +
  String.raw`|[^\r\n\p{L}\p{N}]?[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]+[\p{Ll}\p{Lm}\p{Lo}\p{M}]*` +
  O200K_CONTRACTION +
  String.raw`|\p{N}{1,3}| ?[^\s\p{L}\p{N}]+[\r\n/]*|\s*[\r\n]+|\s+(?!\S)|\s+`;

/** Split pattern of each builtin encoding. */
export const BUILTIN_PATTERNS: Readonly<Record<BuiltinName, string>> = {
  gpt2: GPT2,
  r50k_base: GPT2,
  p50k_base: GPT2,
  cl100k_base: CL100K,
  o200k_base: O200K,
};

/**
 * Pattern for a rank file whose policy names none: cl100k_base's, the split most
 * tiktoken-format vocabularies outside OpenAI reuse (from memory: Llama 3's pattern is
 * the same expression). A policy can name any builtin's pattern or give a regex.
 */
export const DEFAULT_RANK_FILE_PATTERN: BuiltinName = 'cl100k_base';

/** Returns whether a string names a builtin encoding. */
export function isBuiltinName(name: string): name is BuiltinName {
  return (BUILTIN_NAMES as readonly string[]).includes(name);
}
