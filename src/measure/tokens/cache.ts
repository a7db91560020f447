// A bounded cache of per-piece token counts. Pieces of text repeat with a Zipf
// distribution, so a small cache answers almost every lookup; it must stay bounded
// because a corpus has an unbounded tail of distinct pieces.
//
// Keys are ranges of a text, hashed here and compared in place with startsWith, so a
// lookup allocates nothing. A Map keyed by freshly sliced strings was the bottleneck of
// warm counting: measured with scripts/bench-tokens.mjs on Brown's o200k pieces (one
// run), the regex split alone took 55 ns a piece, 209 ns with Map.get(piece) and 155 ns
// with this table's find(range).
//
// Two generations instead of clear-on-full: clearing drops the frequent head of the
// distribution along with the tail and forces a burst of misses; here an entry survives
// a retirement if it is used again during the next generation.

import type { CacheStats } from './types.js';

/** Entries per generation: Brown's million words give about 55k distinct pieces, so 2^16 holds a language's head with room; two generations of short keys stay near 15 MB. */
export const DEFAULT_GENERATION_SIZE = 65_536;

/** Pieces longer than this are counted but not cached: they rarely repeat and would cost memory. */
export const MAX_CACHED_PIECE_LENGTH = 128;

const EMPTY = -1;

/** Returns a 32-bit FNV-1a hash of the UTF-16 code units of text[start, end). */
export function hashRange(text: string, start: number, end: number): number {
  let h = 0x811c9dc5 | 0;
  for (let i = start; i < end; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return h;
}

/** One generation: open addressing with linear probing, at most half full. */
class Generation<V> {
  readonly mask: number;
  readonly slots: Int32Array;
  readonly hashes: Int32Array;
  keys: string[] = [];
  values: V[] = [];

  constructor(readonly capacity: number) {
    let size = 1;
    while (size < capacity * 2) size *= 2;
    this.mask = size - 1;
    this.slots = new Int32Array(size).fill(EMPTY);
    this.hashes = new Int32Array(size);
  }

  find(text: string, start: number, end: number, hash: number): V | undefined {
    const { slots, hashes, keys, mask } = this;
    const length = end - start;
    for (let i = hash & mask; ; i = (i + 1) & mask) {
      const id = slots[i]!;
      if (id === EMPTY) return undefined;
      if (hashes[i] === hash) {
        const key = keys[id]!;
        if (key.length === length && text.startsWith(key, start)) return this.values[id];
      }
    }
  }

  add(key: string, hash: number, value: V): void {
    const { slots, mask } = this;
    let i = hash & mask;
    while (slots[i] !== EMPTY) i = (i + 1) & mask;
    slots[i] = this.keys.length;
    this.hashes[i] = hash;
    this.keys.push(key);
    this.values.push(value);
  }

  get size(): number {
    return this.keys.length;
  }

  clear(): void {
    this.slots.fill(EMPTY);
    this.keys = [];
    this.values = [];
  }
}

/** A two-generation cache from text pieces to values, bounded to two generations of entries. */
export class PieceCache<V> {
  private young: Generation<V>;
  private old: Generation<V>;
  private hits = 0;
  private misses = 0;
  private evictions = 0;

  constructor(generationSize: number = DEFAULT_GENERATION_SIZE) {
    if (!(generationSize >= 1)) throw new RangeError(`cache generation size must be at least 1, got ${generationSize}`);
    this.young = new Generation<V>(generationSize);
    this.old = new Generation<V>(generationSize);
  }

  /** Returns the cached value of text[start, end) with its hash, or undefined (a miss, counted). */
  find(text: string, start: number, end: number, hash: number): V | undefined {
    let value = this.young.find(text, start, end, hash);
    if (value !== undefined) {
      this.hits++;
      return value;
    }
    value = this.old.find(text, start, end, hash);
    if (value !== undefined) {
      this.hits++;
      this.add(text.slice(start, end), hash, value);
      return value;
    }
    this.misses++;
    return undefined;
  }

  /** Returns the cached value of a whole string, or undefined. */
  get(key: string): V | undefined {
    return this.find(key, 0, key.length, hashRange(key, 0, key.length));
  }

  /** Stores a value under a key (hash as from hashRange), retiring the young generation when full. */
  add(key: string, hash: number, value: V): void {
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
  set(key: string, value: V): void {
    this.add(key, hashRange(key, 0, key.length), value);
  }

  /** Returns hit, miss and eviction counts and the entries held. */
  stats(): CacheStats {
    return { hits: this.hits, misses: this.misses, evictions: this.evictions, entries: this.young.size + this.old.size };
  }
}
