// The read stage: find a policy's shards, and read each to documents with an account of every line.
export { discoverShards } from './discover.js';
export { readShard, emptyAccount, type ReadPace } from './shard.js';
export { readChunkBytes, textSizeHint } from './source.js';
export { pathClassifier, shardKindOf, subsetExtractor, DEFAULT_ENCODING } from './classify.js';
// The policy stage refuses other encodings first, with their position; the reader checks again for corpora built without it.
export { isLineSplittableEncoding } from '../policy/encodings.js';
export type { PathClass, ShardKind } from './classify.js';
export { firstInvalidUtf8 } from './decode.js';
export type * from './types.js';
