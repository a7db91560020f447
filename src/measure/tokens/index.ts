// The tokens stage: load a tokenizer, count tokens exactly and fast, and measure
// running-text and dictionary fertility.
export { loadTokenizer, type LoadOptions } from './load.js';
export { TokenizerError, type TokenizerErrorStage } from './errors.js';
export { measureTokens, addTokenMeasures, emptyTokenMeasure, fertilityOf } from './measure.js';
export { dictionaryFertility, readWordList, WordListError, type DictionaryFertility } from './dictionary.js';
export { BUILTIN_NAMES, DEFAULT_RANK_FILE_PATTERN, type BuiltinName } from './patterns.js';
export type { CacheStats, FertilityFigures, ForEachWord, SharedTokenizerTables, TokenCounter, TokenMeasure, TokenizerKind, WordOffsets } from './types.js';
