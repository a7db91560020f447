// Builds one shard's duplicate index: per document its line, language, exact hash and a
// reduced-width MinHash signature, in the binary layout described in format.ts.
import { Sketcher } from './minhash.js';
import { DocumentScanner, prepareText } from './scan.js';
import {
  EXACT_BYTES,
  FORMAT_VERSION,
  HEADER_BYTES,
  KIND_EMPTY,
  KIND_FULL,
  KIND_WORDLESS,
  MAGIC,
  bitsFor,
  checksum32,
  readLocationRecords,
  signatureBytes,
} from './format.js';
import type { DuplicatesRule } from '../../policy/types.js';
import type { DuplicateOptions, IndexedDocument } from './types.js';

/** Largest shingle the header can carry (one byte). */
const MAX_SHINGLE = 255;
/** Largest signature the header can carry (two bytes). */
const MAX_HASHES = 65535;
/** Languages are small integers; this bound keeps the location record at most 4 bytes for them. */
const MAX_LANGUAGE = (1 << 24) - 1;

/** Returns `opts` checked, or throws a RangeError naming the offending option. */
export function checkOptions(opts: DuplicateOptions): DuplicateOptions {
  const { shingle, hashes, threshold, punctuation } = opts;
  if (!Number.isInteger(shingle) || shingle < 1 || shingle > MAX_SHINGLE) {
    throw new RangeError(`duplicates: shingle must be an integer from 1 to ${MAX_SHINGLE} words, got ${shingle}`);
  }
  if (!Number.isInteger(hashes) || hashes < 1 || hashes > MAX_HASHES) {
    throw new RangeError(`duplicates: hashes must be an integer from 1 to ${MAX_HASHES}, got ${hashes}`);
  }
  if (typeof threshold !== 'number' || !(threshold > 0 && threshold <= 1)) {
    throw new RangeError(`duplicates: threshold must be a number in (0, 1], got ${threshold}`);
  }
  if (punctuation !== 'keep' && punctuation !== 'strip') {
    throw new RangeError(`duplicates: punctuation must be 'keep' or 'strip', got ${String(punctuation)}`);
  }
  return { shingle, hashes, threshold, punctuation };
}

/** Returns the index options a policy's `rules.duplicates` asks for. */
export function duplicateOptionsFrom(rule: DuplicatesRule): DuplicateOptions {
  return checkOptions({ shingle: rule.near.shingle, hashes: rule.near.hashes, threshold: rule.near.threshold, punctuation: rule.punctuation });
}

/** Largest page of a builder's columns: big enough that pages are few, small enough that freeing them leaves no large holes. */
const MAX_PAGE_BYTES = 1 << 20;

/**
 * A growing byte column kept in pages (doubling from a small first page up to 1 MiB, then 1 MiB
 * each) rather than one array copied on every doubling: a shard's transient arrays are then small
 * and alike, so the memory they free is taken again by the next shard's instead of being left as
 * holes between the long-lived index blobs. Measured with scripts/bench-memory.mjs (one run each,
 * 2 million documents in 20 shards): 308 MB peak RSS with doubling arrays, 288 MB with them but
 * glibc told to map every large block on its own (MALLOC_MMAP_THRESHOLD_), 297 MB with pages.
 * Pages hold whole records (`record` bytes each), so a record never straddles two pages.
 */
class Pages {
  private readonly full: Uint8Array[] = [];
  private fullBytes = 0;
  private nextPage: number;
  /** The page being written, and the write position in it. */
  data: Uint8Array;
  at = 0;

  constructor(private readonly record: number, firstRecords: number) {
    this.data = new Uint8Array(record * firstRecords);
    this.nextPage = this.data.length * 2;
  }

  /** Makes room for `bytes` contiguous bytes at data[at]. */
  reserve(bytes: number): void {
    if (this.at + bytes <= this.data.length) return;
    if (this.at > 0) {
      this.full.push(this.data.subarray(0, this.at));
      this.fullBytes += this.at;
    }
    const size = Math.max(bytes, this.record * Math.max(1, Math.floor(Math.min(this.nextPage, MAX_PAGE_BYTES) / this.record)));
    this.nextPage = Math.min(this.nextPage * 2, MAX_PAGE_BYTES);
    this.data = new Uint8Array(size);
    this.at = 0;
  }

  /** Bytes written in all. */
  get length(): number {
    return this.fullBytes + this.at;
  }

  /** Appends whole records, page by page. */
  append(src: Uint8Array): void {
    for (let from = 0; from < src.length; ) {
      let room = Math.floor((this.data.length - this.at) / this.record) * this.record;
      if (room === 0) {
        this.reserve(this.record);
        room = Math.floor((this.data.length - this.at) / this.record) * this.record;
      }
      const n = Math.min(room, src.length - from);
      this.data.set(src.subarray(from, from + n), this.at);
      this.at += n;
      from += n;
    }
  }

  varint(v: number): void {
    this.reserve(10);
    const d = this.data;
    while (v >= 0x80) {
      d[this.at++] = (v % 0x80) | 0x80;
      v = Math.floor(v / 0x80);
    }
    d[this.at++] = v;
  }

  /** Copies everything written into `dest` at `offset`. */
  copyTo(dest: Uint8Array, offset: number): void {
    let at = offset;
    for (const page of this.full) {
      dest.set(page, at);
      at += page.length;
    }
    dest.set(this.data.subarray(0, this.at), at);
  }

  /** Returns everything written as one array of its own. */
  toArray(): Uint8Array {
    const out = new Uint8Array(this.length);
    this.copyTo(out, 0);
    return out;
  }
}

/**
 * A run of consecutive documents indexed by another builder (on another thread): its columns as
 * they would sit in a blob, and its location stream written from line 0. `addPart` appends it
 * so that the finished blob is byte for byte the one that adding each document would give.
 */
export interface DuplicateIndexPart {
  /** The options the part was built with (punctuation/shingle/hashes/bits): only a builder with the same ones takes it. */
  built: string;
  documents: number;
  exact: Uint8Array;
  signatures: Uint8Array;
  stream: Uint8Array;
}

/** Collects one shard's documents and returns its duplicate index blob. */
export class DuplicateIndexBuilder {
  readonly options: DuplicateOptions;
  readonly signatureBits: number;
  private readonly sigBytes: number;
  private readonly sketcher: Sketcher;
  private readonly scanner: DocumentScanner;
  private readonly exact: Pages;
  private readonly signatures: Pages;
  private readonly stream: Pages;
  private documents = 0;
  private lastOrdinal = -1;
  private lastLine = 0;
  private finished = false;

  /**
   * `share.words`: the caller checks each document for contamination right after adding it
   * (findContamination on the same text), so the scan also hashes the words in contamination's
   * second lane and leaves them for it (see sharedWords); the index is the same either way.
   */
  constructor(opts: DuplicateOptions, share: { words?: boolean } = {}) {
    this.options = checkOptions(opts);
    this.scanner = new DocumentScanner(share.words ? 2 : 1);
    this.signatureBits = bitsFor(this.options);
    this.sigBytes = signatureBytes(this.options.hashes, this.signatureBits);
    this.sketcher = new Sketcher(this.options.shingle, this.options.hashes);
    this.exact = new Pages(EXACT_BYTES, 64);
    this.signatures = new Pages(this.sigBytes, 64);
    this.stream = new Pages(1, 256);
  }

  /** Indexes one document; documents must come in increasing ordinal order. */
  add(doc: IndexedDocument): void {
    if (this.finished) throw new Error('DuplicateIndexBuilder: add() after finish()');
    const { ordinal, line, language, text } = doc;
    if (!Number.isInteger(ordinal) || ordinal <= this.lastOrdinal) {
      throw new RangeError(`DuplicateIndexBuilder: ordinal ${ordinal} after ${this.lastOrdinal}; documents must be added in increasing ordinal order`);
    }
    if (!Number.isInteger(line) || line < 0) throw new RangeError(`DuplicateIndexBuilder: line must be a non-negative integer, got ${line} (ordinal ${ordinal})`);
    if (!Number.isInteger(language) || language < 0 || language > MAX_LANGUAGE) {
      throw new RangeError(`DuplicateIndexBuilder: language must be an integer from 0 to ${MAX_LANGUAGE}, got ${language} (ordinal ${ordinal})`);
    }
    if (typeof text !== 'string') throw new TypeError(`DuplicateIndexBuilder: text must be a string (ordinal ${ordinal})`);
    this.lastOrdinal = ordinal;

    const prepared = prepareText(text);
    const exact = this.exact;
    exact.reserve(EXACT_BYTES);
    const sigs = this.signatures;
    sigs.reserve(this.sigBytes);
    const sc = this.scanner;
    sc.scan(prepared, this.options.punctuation === 'strip');
    let kind = KIND_EMPTY;
    if (sc.exactLength > 0) {
      writeU32(exact.data, exact.at, sc.exactHigh);
      writeU32(exact.data, exact.at + 4, sc.exactLow);
      const count = sc.wordCount;
      if (count > 0) {
        this.sketcher.sketch(sc.words, count);
        packSignature(this.sketcher.values, this.signatureBits, sigs.data, sigs.at);
        kind = KIND_FULL;
      } else {
        sigs.data.fill(0, sigs.at, sigs.at + this.sigBytes);
        kind = KIND_WORDLESS;
      }
    } else {
      exact.data.fill(0, exact.at, exact.at + EXACT_BYTES);
      sigs.data.fill(0, sigs.at, sigs.at + this.sigBytes);
    }
    exact.at += EXACT_BYTES;
    sigs.at += this.sigBytes;
    this.writeLocation(line, language * 4 + kind);
    this.documents++;
  }

  /**
   * Returns the documents added so far as a part for another builder's `addPart`; this builder
   * cannot be used afterwards. The part's arrays are its own (transferable to another thread).
   */
  takePart(): DuplicateIndexPart {
    if (this.finished) throw new Error('DuplicateIndexBuilder: takePart() after finish()');
    this.finished = true;
    return {
      built: this.builtWith(),
      documents: this.documents,
      exact: this.exact.toArray(),
      signatures: this.signatures.toArray(),
      stream: this.stream.toArray(),
    };
  }

  /** Appends a part taken from a builder with the same options, as if its documents had been added here one by one. */
  addPart(part: DuplicateIndexPart): void {
    if (this.finished) throw new Error('DuplicateIndexBuilder: addPart() after finish()');
    const { documents, exact, signatures, stream } = part;
    if (part.built !== this.builtWith()) throw new RangeError(`DuplicateIndexBuilder: a part built with other options (${part.built}) than this index (${this.builtWith()})`);
    if (exact.length !== documents * EXACT_BYTES || signatures.length !== documents * this.sigBytes) {
      throw new RangeError(`DuplicateIndexBuilder: a part of ${documents} documents has ${exact.length} exact and ${signatures.length} signature bytes`);
    }
    this.exact.append(exact);
    this.signatures.append(signatures);
    // The part's lines are deltas from line 0: decode each and write it again relative to this builder's last line.
    readLocationRecords(
      stream,
      0,
      stream.length,
      documents,
      (_i, line, tag) => this.writeLocation(line, tag),
      (reason) => {
        throw new RangeError(`DuplicateIndexBuilder: a part's ${reason}`);
      },
    );
    this.documents += documents;
    this.lastOrdinal += documents;
  }

  /** Writes a document's location record: its line as a zigzag delta from the previous one, then its tag (language · 4 + kind). */
  private writeLocation(line: number, tag: number): void {
    const delta = line - this.lastLine;
    this.lastLine = line;
    this.stream.varint(delta >= 0 ? delta * 2 : -delta * 2 - 1);
    this.stream.varint(tag);
  }

  private builtWith(): string {
    const o = this.options;
    return `${o.punctuation}/${o.shingle}/${o.hashes}/${this.signatureBits}`;
  }

  /** Returns the number of documents added so far. */
  get size(): number {
    return this.documents;
  }

  /** Returns the index blob; the builder cannot be used afterwards. */
  finish(): Uint8Array {
    if (this.finished) throw new Error('DuplicateIndexBuilder: finish() called twice');
    this.finished = true;
    const n = this.documents;
    const total = HEADER_BYTES + this.exact.length + this.signatures.length + this.stream.length;
    const blob = new Uint8Array(total);
    const view = new DataView(blob.buffer);
    for (let i = 0; i < 4; i++) blob[i] = MAGIC[i]!;
    view.setUint8(4, FORMAT_VERSION);
    view.setUint8(5, this.options.punctuation === 'strip' ? 1 : 0);
    view.setUint8(6, this.options.shingle);
    view.setUint8(7, this.signatureBits);
    view.setUint16(8, this.options.hashes, true);
    view.setFloat32(12, this.options.threshold, true);
    view.setUint32(16, n, true);
    view.setUint32(20, this.stream.length, true);
    let at = HEADER_BYTES;
    this.exact.copyTo(blob, at);
    at += this.exact.length;
    this.signatures.copyTo(blob, at);
    at += this.signatures.length;
    this.stream.copyTo(blob, at);
    view.setUint32(24, checksum32(blob, HEADER_BYTES, total), true);
    return blob;
  }
}

function writeU32(d: Uint8Array, at: number, v: number): void {
  d[at] = v & 0xff;
  d[at + 1] = (v >>> 8) & 0xff;
  d[at + 2] = (v >>> 16) & 0xff;
  d[at + 3] = v >>> 24;
}

/** Writes the low `bits` bits of each value, packed little-endian, at `d[at]`. */
export function packSignature(values: Int32Array, bits: number, d: Uint8Array, at: number): void {
  const k = values.length;
  if (bits === 4) {
    let i = 0;
    for (; i + 1 < k; i += 2) d[at++] = (values[i]! & 15) | ((values[i + 1]! & 15) << 4);
    if (i < k) d[at] = values[i]! & 15;
  } else if (bits === 8) {
    for (let i = 0; i < k; i++) d[at + i] = values[i]! & 0xff;
  } else if (bits === 16) {
    for (let i = 0; i < k; i++) {
      const v = values[i]!;
      d[at + 2 * i] = v & 0xff;
      d[at + 2 * i + 1] = (v >>> 8) & 0xff;
    }
  } else {
    for (let i = 0; i < k; i++) writeU32(d, at + 4 * i, values[i]!);
  }
}
