import { createRequire as __sluiceCreateRequire } from 'node:module'; const require = __sluiceCreateRequire(import.meta.url);

// src/measure/tokens/errors.ts
var TokenizerError = class extends Error {
  name = "TokenizerError";
  stage;
  /** The tokenizer file (as given), or the builtin name. */
  file;
  /** 1-based line of a rank file, when the problem is on one line. */
  line;
  constructor(stage, file, message, options = {}) {
    const where = options.line === void 0 ? file : `${file}:${options.line}`;
    super(`${where}: ${message}`, options.cause === void 0 ? void 0 : { cause: options.cause });
    this.stage = stage;
    this.file = file;
    if (options.line !== void 0) this.line = options.line;
  }
};

// src/measure/tokens/cache.ts
var DEFAULT_GENERATION_SIZE = 65536;
var MAX_CACHED_PIECE_LENGTH = 128;
var EMPTY = -1;
function hashRange(text, start, end) {
  let h = 2166136261 | 0;
  for (let i = start; i < end; i++) h = Math.imul(h ^ text.charCodeAt(i), 16777619);
  return h;
}
var Generation = class {
  constructor(capacity) {
    this.capacity = capacity;
    let size = 1;
    while (size < capacity * 2) size *= 2;
    this.mask = size - 1;
    this.slots = new Int32Array(size).fill(EMPTY);
    this.hashes = new Int32Array(size);
  }
  capacity;
  mask;
  slots;
  hashes;
  keys = [];
  values = [];
  find(text, start, end, hash) {
    const { slots, hashes, keys, mask } = this;
    const length = end - start;
    for (let i = hash & mask; ; i = i + 1 & mask) {
      const id = slots[i];
      if (id === EMPTY) return void 0;
      if (hashes[i] === hash) {
        const key = keys[id];
        if (key.length === length && text.startsWith(key, start)) return this.values[id];
      }
    }
  }
  add(key, hash, value) {
    const { slots, mask } = this;
    let i = hash & mask;
    while (slots[i] !== EMPTY) i = i + 1 & mask;
    slots[i] = this.keys.length;
    this.hashes[i] = hash;
    this.keys.push(key);
    this.values.push(value);
  }
  get size() {
    return this.keys.length;
  }
  clear() {
    this.slots.fill(EMPTY);
    this.keys = [];
    this.values = [];
  }
};
var PieceCache = class {
  young;
  old;
  hits = 0;
  misses = 0;
  evictions = 0;
  constructor(generationSize = DEFAULT_GENERATION_SIZE) {
    if (!(generationSize >= 1)) throw new RangeError(`cache generation size must be at least 1, got ${generationSize}`);
    this.young = new Generation(generationSize);
    this.old = new Generation(generationSize);
  }
  /** Returns the cached value of text[start, end) with its hash, or undefined (a miss, counted). */
  find(text, start, end, hash) {
    let value = this.young.find(text, start, end, hash);
    if (value !== void 0) {
      this.hits++;
      return value;
    }
    value = this.old.find(text, start, end, hash);
    if (value !== void 0) {
      this.hits++;
      this.add(text.slice(start, end), hash, value);
      return value;
    }
    this.misses++;
    return void 0;
  }
  /** Returns the cached value of a whole string, or undefined. */
  get(key) {
    return this.find(key, 0, key.length, hashRange(key, 0, key.length));
  }
  /** Stores a value under a key (hash as from hashRange), retiring the young generation when full. */
  add(key, hash, value) {
    if (key.length > MAX_CACHED_PIECE_LENGTH) return;
    this.young.add(key, hash, value);
    if (this.young.size >= this.young.capacity) {
      const retired = this.old;
      this.old = this.young;
      retired.clear();
      this.young = retired;
      this.evictions++;
    }
  }
  /** Stores a value under a whole string. */
  set(key, value) {
    this.add(key, hashRange(key, 0, key.length), value);
  }
  /** Returns hit, miss and eviction counts and the entries held. */
  stats() {
    return { hits: this.hits, misses: this.misses, evictions: this.evictions, entries: this.young.size + this.old.size };
  }
};

export {
  TokenizerError,
  MAX_CACHED_PIECE_LENGTH,
  hashRange,
  PieceCache
};
