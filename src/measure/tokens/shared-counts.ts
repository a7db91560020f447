// Per-piece token counts in shared memory, so that every thread of a pooled run reads the
// counts any of them has worked out. Without it each worker warms a cache of its own: the
// threads of a run see much the same pieces (a language's frequent words are in every
// shard), so each paid for the same byte-pair merges again. In one CPU profile of a
// two-thread full check on the 40 MB bench corpus the merges (bytePairCount) took 1.0 s
// of CPU against 0.5 s on one thread, about a tenth of all the extra work the second
// thread brought.
//
// The table only grows: entries are never removed, so a reader needs no lock. A thread
// that misses works the count out and publishes it: it reserves an entry and room for the
// key with Atomics.add, writes them, and then claims a slot with compareExchange; a
// reader finds the slot with Atomics.load, which orders its reads of the entry after the
// writer's. Two threads adding the same piece at once both succeed, one entry unreached.
// When the table is full, counters keep further pieces in their own bounded cache
// (cache.ts), so a corpus whose vocabulary drifts (one language after another) still hits.
//
// A table is made for one tokenizer and records that tokenizer's id: a counter refuses a
// table made for another, since a wrong count there would be a wrong report.

import { MAX_CACHED_PIECE_LENGTH } from './cache.js';
import { ownerHashes } from './ranks.js';

/** Default entries: Brown's million words give about 57k distinct o200k pieces; four times that leaves room for a few languages. Slots are twice as many (half full at most); keys average 8 units. About 13 MB in all. */
export const DEFAULT_SHARED_ENTRIES = 1 << 18;
/** UTF-16 units of key storage per entry, on average. */
const UNITS_PER_ENTRY = 16;

// Header words.
const MAGIC = 0;
const OWNER_1 = 1;
const OWNER_2 = 2;
const USED = 3;
const UNITS_USED = 4;
const CAPACITY = 5;
const SLOT_BITS = 6;
const UNITS = 7;
const HEADER_WORDS = 8;
const MAGIC_VALUE = 0x736c4331;
/** Words per entry: key hash, key offset in the arena, key length << 16 | token count. */
const ENTRY_WORDS = 3;

/** A grow-only table of piece → token count in a SharedArrayBuffer, for one tokenizer. */
export class SharedPieceCounts {
  private readonly header: Int32Array;
  private readonly slots: Int32Array;
  private readonly entries: Int32Array;
  private readonly arena: Uint16Array;
  private readonly mask: number;
  private readonly capacity: number;
  private readonly units: number;

  private constructor(readonly buffer: SharedArrayBuffer) {
    const header = new Int32Array(buffer, 0, HEADER_WORDS);
    this.header = header;
    this.capacity = header[CAPACITY]!;
    this.units = header[UNITS]!;
    const slotCount = 1 << header[SLOT_BITS]!;
    this.mask = slotCount - 1;
    let at = HEADER_WORDS * 4;
    this.slots = new Int32Array(buffer, at, slotCount);
    at += slotCount * 4;
    this.entries = new Int32Array(buffer, at, this.capacity * ENTRY_WORDS);
    at += this.capacity * ENTRY_WORDS * 4;
    this.arena = new Uint16Array(buffer, at, this.units);
  }

  /** Returns an empty table for the tokenizer `owner` holding up to `capacity` pieces (at least 1). */
  static create(owner: string, capacity: number = DEFAULT_SHARED_ENTRIES): SharedPieceCounts {
    if (!(Number.isInteger(capacity) && capacity >= 1)) throw new RangeError(`shared count table: capacity must be a positive integer, got ${capacity}`);
    let bits = 1;
    while (1 << bits < capacity * 2) bits++;
    const units = capacity * UNITS_PER_ENTRY;
    const bytes = HEADER_WORDS * 4 + (1 << bits) * 4 + capacity * ENTRY_WORDS * 4 + units * 2;
    const buffer = new SharedArrayBuffer(bytes);
    const header = new Int32Array(buffer, 0, HEADER_WORDS);
    const [a, b] = ownerHashes(owner);
    header[OWNER_1] = a;
    header[OWNER_2] = b;
    header[CAPACITY] = capacity;
    header[SLOT_BITS] = bits;
    header[UNITS] = units;
    header[MAGIC] = MAGIC_VALUE;
    return new SharedPieceCounts(buffer);
  }

  /** Returns the table in `buffer` when it was made for the tokenizer `owner`, else null. */
  static attach(buffer: SharedArrayBuffer, owner: string): SharedPieceCounts | null {
    if (!(buffer instanceof SharedArrayBuffer) || buffer.byteLength < HEADER_WORDS * 4) return null;
    const header = new Int32Array(buffer, 0, HEADER_WORDS);
    const [a, b] = ownerHashes(owner);
    if (header[MAGIC] !== MAGIC_VALUE || header[OWNER_1] !== a || header[OWNER_2] !== b) return null;
    return new SharedPieceCounts(buffer);
  }

  /** Returns the count of text[start, end) (its hash as from hashRange), or -1 when no thread has added it. */
  find(text: string, start: number, end: number, hash: number): number {
    const { slots, entries, arena, mask } = this;
    const length = end - start;
    for (let i = hash & mask; ; i = (i + 1) & mask) {
      const v = Atomics.load(slots, i);
      if (v === 0) return -1;
      const e = (v - 1) * ENTRY_WORDS;
      if (entries[e] !== hash) continue;
      const meta = entries[e + 2]!;
      if (meta >>> 16 !== length) continue;
      let at = entries[e + 1]!;
      let k = start;
      while (k < end && arena[at] === text.charCodeAt(k)) {
        at++;
        k++;
      }
      if (k === end) return meta & 0xffff;
    }
  }

  /** Adds the count of text[start, end); returns false when the table is full (or the piece too long to keep). */
  add(text: string, start: number, end: number, hash: number, count: number): boolean {
    const length = end - start;
    if (length > MAX_CACHED_PIECE_LENGTH || count > 0xffff || count < 0) return false;
    const header = this.header;
    if (Atomics.load(header, USED) >= this.capacity || Atomics.load(header, UNITS_USED) + length > this.units) return false;
    const entry = Atomics.add(header, USED, 1);
    if (entry >= this.capacity) return false;
    const at = Atomics.add(header, UNITS_USED, length);
    if (at + length > this.units) return false;
    const { slots, entries, arena, mask } = this;
    for (let k = 0; k < length; k++) arena[at + k] = text.charCodeAt(start + k);
    const e = entry * ENTRY_WORDS;
    entries[e] = hash;
    entries[e + 1] = at;
    entries[e + 2] = (length << 16) | count;
    // Slots outnumber entries two to one, so a free slot is always found.
    for (let i = hash & mask; ; i = (i + 1) & mask) {
      const prev = Atomics.compareExchange(slots, i, 0, entry + 1);
      if (prev === 0) return true;
      // Another thread may have just added the same piece: then it is there already.
      const p = (prev - 1) * ENTRY_WORDS;
      if (entries[p] === hash && entries[p + 2]! >>> 16 === length) {
        let o = entries[p + 1]!;
        let k = start;
        while (k < end && arena[o] === text.charCodeAt(k)) {
          o++;
          k++;
        }
        if (k === end) return true;
      }
    }
  }

  /** Entries added so far, by every thread (at most the capacity). */
  get size(): number {
    return Math.min(Atomics.load(this.header, USED), this.capacity);
  }
}
