// Per-piece token counts in shared memory, so that every thread of a pooled run reads the
// counts any of them has worked out. Without it each worker warms a cache of its own: the
// threads of a run see much the same pieces (a language's frequent words are in every
// shard), so each paid for the same byte-pair merges again. In one CPU profile of a
// two-thread full check on the 40 MB bench corpus the merges (bytePairCount) took 1.0 s
// of CPU against 0.5 s on one thread, about a tenth of all the extra work the second
// thread brought.
//
// The table only grows: entries are never removed, so a reader needs no lock. Each slot
// holds its entry in place (key length and count, key hash, where the key's units are in
// the arena), so a probe reads one slot and then the key. A thread that misses works the
// count out and publishes it: it reserves room for the key with Atomics.add and writes it,
// claims a free slot by compareExchange on the slot's first word (marking it busy), fills
// the slot, and only then stores the first word with Atomics.store; a reader loads that
// word with Atomics.load, which orders its reads of the slot and key after the writer's. A
// reader passes over a busy slot: at worst it works out a count another thread is about to
// publish, and adds it again (both entries hold the same count). When the table is full,
// counters keep further pieces in their own bounded cache (cache.ts), so a corpus whose
// vocabulary drifts (one language after another) still hits.
//
// A table is made for one tokenizer and records that tokenizer's id: a counter refuses a
// table made for another, since a wrong count there would be a wrong report.

import { MAX_CACHED_PIECE_LENGTH } from './cache.js';
import { ownedBy, stampOwner } from './ranks.js';

/** Default entries: Brown's million words give about 57k distinct o200k pieces; four times that leaves room for a few languages. Slots are twice as many (half full at most); keys average 8 units. About 16 MB in all, touched only as entries are added. */
export const DEFAULT_SHARED_ENTRIES = 1 << 18;
/** UTF-16 units of key storage per entry, on average. */
const UNITS_PER_ENTRY = 16;

// Header words after the owner's (see stampOwner in ranks.ts).
const USED = 3;
const UNITS_USED = 4;
const CAPACITY = 5;
const SLOT_BITS = 6;
const UNITS = 7;
const HEADER_WORDS = 8;
const MAGIC_VALUE = 0x736c4331;
/** Words per slot: key length << 16 | token count (0: free, BUSY: being filled), key hash, key offset in the arena, unused. */
const SLOT_WORDS = 4;
const BUSY = -1;

/** A grow-only table of piece → token count in a SharedArrayBuffer, for one tokenizer. */
export class SharedPieceCounts {
  private readonly header: Int32Array;
  private readonly slots: Int32Array;
  private readonly arena: Uint16Array;
  /** Slot count − 1. */
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
    this.slots = new Int32Array(buffer, at, slotCount * SLOT_WORDS);
    at += slotCount * SLOT_WORDS * 4;
    this.arena = new Uint16Array(buffer, at, this.units);
  }

  /** Returns an empty table for the tokenizer `owner` holding up to `capacity` pieces (at least 1). */
  static create(owner: string, capacity: number = DEFAULT_SHARED_ENTRIES): SharedPieceCounts {
    if (!(Number.isInteger(capacity) && capacity >= 1)) throw new RangeError(`shared count table: capacity must be a positive integer, got ${capacity}`);
    let bits = 1;
    while (1 << bits < capacity * 2) bits++;
    const units = capacity * UNITS_PER_ENTRY;
    const bytes = HEADER_WORDS * 4 + (1 << bits) * SLOT_WORDS * 4 + units * 2;
    const buffer = new SharedArrayBuffer(bytes);
    const header = new Int32Array(buffer, 0, HEADER_WORDS);
    header[CAPACITY] = capacity;
    header[SLOT_BITS] = bits;
    header[UNITS] = units;
    stampOwner(header, owner, MAGIC_VALUE);
    return new SharedPieceCounts(buffer);
  }

  /** Returns the table in `buffer` when it was made for the tokenizer `owner`, else null. */
  static attach(buffer: SharedArrayBuffer, owner: string): SharedPieceCounts | null {
    return ownedBy(buffer, owner, MAGIC_VALUE, HEADER_WORDS) ? new SharedPieceCounts(buffer) : null;
  }

  /** Returns the count of text[start, end) (its hash as from hashRange), or -1 when no thread has added it. */
  find(text: string, start: number, end: number, hash: number): number {
    const { slots, arena, mask } = this;
    const length = end - start;
    for (let i = hash & mask; ; i = (i + 1) & mask) {
      const s = i * SLOT_WORDS;
      const meta = Atomics.load(slots, s);
      if (meta === 0) return -1;
      if (meta >>> 16 !== length || slots[s + 1] !== hash) continue; // BUSY has length 0xffff
      let at = slots[s + 2]!;
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
    if (length < 1 || length > MAX_CACHED_PIECE_LENGTH || count > 0xffff || count < 0) return false;
    const header = this.header;
    if (Atomics.load(header, USED) >= this.capacity || Atomics.load(header, UNITS_USED) + length > this.units) return false;
    if (Atomics.add(header, USED, 1) >= this.capacity) return false;
    const at = Atomics.add(header, UNITS_USED, length);
    if (at + length > this.units) return false;
    const { slots, arena, mask } = this;
    for (let k = 0; k < length; k++) arena[at + k] = text.charCodeAt(start + k);
    // Slots outnumber entries two to one, so a free slot is always found.
    for (let i = hash & mask; ; i = (i + 1) & mask) {
      const s = i * SLOT_WORDS;
      if (Atomics.compareExchange(slots, s, 0, BUSY) !== 0) continue;
      slots[s + 1] = hash;
      slots[s + 2] = at;
      Atomics.store(slots, s, (length << 16) | count);
      return true;
    }
  }

  /** Entries added so far, by every thread (at most the capacity). */
  get size(): number {
    return Math.min(Atomics.load(this.header, USED), this.capacity);
  }
}
