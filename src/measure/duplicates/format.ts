// Binary layout of a shard's duplicate index (all integers little-endian):
//
//   header, 32 bytes
//     0  4  magic "SLDX"
//     4  1  format version (1)
//     5  1  punctuation: 0 keep, 1 strip
//     6  1  shingle, words
//     7  1  signature bits w (4, 8, 16 or 32)
//     8  2  hashes k
//    10  2  reserved, 0
//    12  4  threshold the index was built for (float32, informational)
//    16  4  documents n
//    20  4  bytes of the location stream
//    24  4  checksum of everything after the header
//    28  4  reserved, 0
//   exact hashes: n × 8 bytes (high lane, low lane), 0 for empty documents
//   signatures:   n × ⌈k·w/8⌉ bytes, value i in bits [i·w, i·w + w), 0 for documents without words
//   locations:    per document, varint(zigzag(line − previous line)) then varint(language · 4 + kind),
//                 kind 0 = empty, 1 = words-less (exact only), 2 = full
//
// Columns of fixed width let the join read document i's signature at a computed offset;
// varints keep lines and languages at ~2 bytes. At the defaults (k = 128, w = 4) a document
// costs 8 + 64 + ~2 = ~74 bytes (measured on Brown paragraphs: 74.0).
//
// Width: w is the narrowest of 4, 8, 16, 32 bits whose r values (the rows of one band) carry at
// least 32 bits, so band keys derived from stored values collide for unrelated documents no
// more often than 32-bit keys would, and no band key needs storing. Accuracy at w bits (b-bit
// minwise hashing, Li and König, 2010): unequal values agree by accident with probability
// C = 2^−w, the estimate is Ĵ = (P̂ − C)/(1 − C) and its standard error
// √(P(1 − P)/k)/(1 − C) with P = C + (1 − C)·J. At k = 128, J = 0.8: 0.0368 at 4 bits against
// 0.0354 at full width (+4 %); at J = 0.9: 0.0275 against 0.0265.
import { fmix32 } from './hash.js';
import { lshBands, signatureBits } from './lsh.js';
import type { DuplicateIndexHeader, DuplicateOptions } from './types.js';

export const MAGIC = [0x53, 0x4c, 0x44, 0x58] as const; // "SLDX"
/** Bump when the layout or any hash seed changes: old blobs then fail with a clear message instead of matching wrongly. */
export const FORMAT_VERSION = 1;
export const HEADER_BYTES = 32;
export const EXACT_BYTES = 8;

export const KIND_EMPTY = 0;
export const KIND_WORDLESS = 1;
export const KIND_FULL = 2;

/**
 * Reads `documents` location records from bytes[start, end) (the layout above), calling `visit` with
 * each document's position, line and tag (language · 4 + kind). `fail` is called with what is wrong
 * when the records do not fill the range exactly; it must throw.
 */
export function readLocationRecords(
  bytes: Uint8Array,
  start: number,
  end: number,
  documents: number,
  visit: (i: number, line: number, tag: number) => void,
  fail: (reason: string) => never,
): void {
  let at = start;
  let line = 0;
  const varint = (): number => {
    let v = 0;
    let scale = 1;
    for (let shift = 0; shift < 49; shift += 7) {
      if (at >= end) fail('location stream ends inside a record');
      const byte = bytes[at++]!;
      v += (byte & 0x7f) * scale;
      if (byte < 0x80) return v;
      scale *= 0x80;
    }
    return fail('over-long number in the location stream');
  };
  for (let i = 0; i < documents; i++) {
    const z = varint();
    line += z % 2 === 0 ? z / 2 : -(z + 1) / 2;
    visit(i, line, varint());
  }
  if (at !== end) fail(`${end - at} bytes left after the last location record`);
}

/** Returns the bytes one signature takes at `hashes` values of `bits` bits. */
export function signatureBytes(hashes: number, bits: number): number {
  return Math.ceil((hashes * bits) / 8);
}

/** Returns the bits per stored signature value for the given options (set by the rows of the chosen bands). */
export function bitsFor(opts: Pick<DuplicateOptions, 'threshold' | 'hashes'>): number {
  return signatureBits(lshBands(opts.threshold, opts.hashes).rows);
}

/**
 * Returns the bytes one document adds to an index blob: the fixed columns plus the typical
 * location record (2 bytes: a line delta below 64 and a language below 32; at most 10 more
 * for a jump of millions of lines or a large language number).
 */
export function bytesPerDocument(opts: Pick<DuplicateOptions, 'threshold' | 'hashes'>): number {
  return EXACT_BYTES + signatureBytes(opts.hashes, bitsFor(opts)) + 2;
}

/** Returns a 32-bit checksum of `bytes[start, end)` (Murmur3-style, four bytes per step). */
export function checksum32(bytes: Uint8Array, start: number, end: number): number {
  let h = 0x2f0b3c1d ^ (end - start);
  let i = start;
  for (; i + 3 < end; i += 4) {
    let k = bytes[i]! | (bytes[i + 1]! << 8) | (bytes[i + 2]! << 16) | (bytes[i + 3]! << 24);
    k = Math.imul(k, 0xcc9e2d51);
    k = (k << 15) | (k >>> 17);
    h ^= Math.imul(k, 0x1b873593);
    h = (h << 13) | (h >>> 19);
    h = (Math.imul(h, 5) + 0xe6546b64) | 0;
  }
  let k = 0;
  for (let s = 0; i < end; i++, s += 8) k |= bytes[i]! << s;
  h ^= Math.imul(k, 0xcc9e2d51);
  return fmix32(h);
}

/** A parsed header and where each column starts. */
export interface IndexLayout extends DuplicateIndexHeader {
  exactOffset: number;
  signatureOffset: number;
  signatureBytes: number;
  streamOffset: number;
  streamBytes: number;
}

/**
 * Blobs whose checksum this thread has verified: a cached shard's index is checked when the
 * cache hands it out and would be checked again by the join; the second pass over every
 * blob was about a twentieth of a warm-cache run. Blobs are never written after they are
 * built or read, and a changed copy is another object, so it is checked again.
 */
const verified = new WeakSet<Uint8Array>();

/** Returns the layout of a blob, or the reason it is not a readable duplicate index (wrong magic, other version, truncated, checksum mismatch). */
export function parseIndex(blob: Uint8Array, verifyChecksum = true): { ok: true; layout: IndexLayout } | { ok: false; reason: string } {
  if (!(blob instanceof Uint8Array)) return { ok: false, reason: 'not a byte array' };
  if (blob.length < HEADER_BYTES) return { ok: false, reason: `truncated: ${blob.length} bytes, shorter than the ${HEADER_BYTES}-byte header` };
  for (let i = 0; i < 4; i++) {
    if (blob[i] !== MAGIC[i]) return { ok: false, reason: 'not a duplicate index (bad magic bytes)' };
  }
  const view = new DataView(blob.buffer, blob.byteOffset, blob.byteLength);
  const version = view.getUint8(4);
  if (version !== FORMAT_VERSION) return { ok: false, reason: `format version ${version}, this build reads version ${FORMAT_VERSION}` };
  const punct = view.getUint8(5);
  const shingle = view.getUint8(6);
  const bits = view.getUint8(7);
  const hashes = view.getUint16(8, true);
  const threshold = view.getFloat32(12, true);
  const documents = view.getUint32(16, true);
  const streamBytes = view.getUint32(20, true);
  const checksum = view.getUint32(24, true);
  if (punct > 1 || shingle < 1 || hashes < 1 || ![4, 8, 16, 32].includes(bits)) {
    return { ok: false, reason: 'corrupt header (parameters out of range)' };
  }
  const sigBytes = signatureBytes(hashes, bits);
  const exactOffset = HEADER_BYTES;
  const signatureOffset = exactOffset + documents * EXACT_BYTES;
  const streamOffset = signatureOffset + documents * sigBytes;
  const expected = streamOffset + streamBytes;
  if (blob.length !== expected) {
    return {
      ok: false,
      reason: blob.length < expected
        ? `truncated: ${blob.length} bytes, the header announces ${expected} for ${documents} documents`
        : `${blob.length - expected} unexpected bytes after the ${expected} the header announces`,
    };
  }
  if (verifyChecksum && !verified.has(blob)) {
    if (checksum32(blob, HEADER_BYTES, blob.length) !== checksum) return { ok: false, reason: 'corrupt: checksum mismatch' };
    verified.add(blob);
  }
  return {
    ok: true,
    layout: {
      formatVersion: version,
      shingle,
      hashes,
      signatureBits: bits,
      punctuation: punct === 1 ? 'strip' : 'keep',
      threshold,
      documents,
      bytes: blob.length,
      exactOffset,
      signatureOffset,
      signatureBytes: sigBytes,
      streamOffset,
      streamBytes,
    },
  };
}

/** Returns why an index built with `header` cannot be joined with `opts`, or null when it can. */
export function incompatibility(header: DuplicateIndexHeader, opts: DuplicateOptions): string | null {
  if (header.shingle !== opts.shingle) return `built with ${header.shingle}-word shingles, joined with ${opts.shingle}`;
  if (header.hashes !== opts.hashes) return `built with ${header.hashes} hashes, joined with ${opts.hashes}`;
  if (header.punctuation !== opts.punctuation) return `built with punctuation '${header.punctuation}', joined with '${opts.punctuation}'`;
  const bits = bitsFor(opts);
  if (header.signatureBits !== bits) {
    return `built for threshold ${round(header.threshold)} (${header.signatureBits}-bit values), joined at threshold ${opts.threshold}, which needs ${bits}-bit values`;
  }
  return null;
}

function round(x: number): number {
  return Math.round(x * 1e6) / 1e6;
}

/** Returns the public header of a blob, or the reason it cannot be read (for callers that treat a bad cached index as a cache miss). */
export function inspectIndex(blob: Uint8Array): { ok: true; header: DuplicateIndexHeader } | { ok: false; reason: string } {
  const r = parseIndex(blob);
  if (!r.ok) return r;
  const { formatVersion, shingle, hashes, signatureBits: bits, punctuation, threshold, documents, bytes } = r.layout;
  return { ok: true, header: { formatVersion, shingle, hashes, signatureBits: bits, punctuation, threshold, documents, bytes } };
}
