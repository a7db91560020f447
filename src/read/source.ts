// A shard's raw bytes, decompressed, handed on chunk by chunk with backpressure. A
// corrupt or truncated stream or an I/O error ends the flow with an error value, never
// a throw; an error thrown by the consumer is the consumer's and is thrown on.
import { createReadStream } from 'node:fs';
import { open, stat } from 'node:fs/promises';
import path from 'node:path';
import { Readable } from 'node:stream';
import { createGunzip, type Gunzip } from 'node:zlib';
import type { ShardRef } from './types.js';
import type { XXHashAPI } from 'xxhash-wasm';
import { ZstdFrameReader, xxhashApi } from './zstd-frames.js';

/** Bytes per read from disk: large enough that per-chunk costs vanish next to per-line work, small enough to stay cache-friendly. */
const READ_CHUNK_BYTES = 256 * 1024;

/**
 * Bytes per read of a zstd file. fzstd hands out a whole read's output at once, and `pace` is asked
 * between reads, so a read's size times the compression ratio is what can pile up before a slower
 * consumer gets a say: 64 KiB keeps that near a megabyte for text (ratios of 3–20).
 */
const ZSTD_READ_CHUNK_BYTES = 64 * 1024;

/** Returns the read size for a shard's raw bytes. */
export function readChunkBytes(ref: Pick<ShardRef, 'compression'>): number {
  return ref.compression === 'zstd' ? ZSTD_READ_CHUNK_BYTES : READ_CHUNK_BYTES;
}

/** Bytes per gunzip output chunk: zlib's default of 16 KiB costs a thread-pool round trip per 16 KiB (scripts/bench-read.mjs, runs minutes apart: ~96 MB/s at 16 KiB, ~245 MB/s at 128 KiB). */
const GUNZIP_CHUNK_BYTES = 128 * 1024;

/** What a pump read: raw bytes consumed, and the break when the stream did not reach its end. */
export interface PumpResult {
  compressedBytes: number;
  error?: string;
}

/**
 * Returns about how many bytes a shard decompresses to, from what the file itself states, to order and
 * share out work (never for a figure): a gzip file's trailer gives its last member's size (RFC 1952,
 * ISIZE: modulo 2^32, so a member over 4 GiB or a multi-member file reads low, and then the size on disk
 * is taken if larger); anything else, or a file that cannot be read, gives its size on disk.
 */
export async function textSizeHint(ref: ShardRef): Promise<number> {
  if (ref.compression !== 'gzip' || ref.open !== undefined || ref.sizeBytes < 18) return ref.sizeBytes;
  let handle;
  try {
    handle = await open(ref.absPath, 'r');
    const tail = Buffer.alloc(4);
    const { bytesRead } = await handle.read(tail, 0, 4, ref.sizeBytes - 4);
    return bytesRead === 4 ? Math.max(tail.readUInt32LE(0), ref.sizeBytes) : ref.sizeBytes;
  } catch {
    return ref.sizeBytes;
  } finally {
    await handle?.close();
  }
}

/** Called between raw chunks; a promise it returns holds the next read back until it settles (backpressure from a slower consumer). */
export type Pace = () => Promise<void> | undefined;

/**
 * A Git LFS pointer file begins with this line, and the whole file is under 1024 bytes (Git LFS
 * specification, "The Pointer"). A repository that keeps its shards in LFS and was checked out
 * without the LFS objects, or a base commit's shards read from git, hold pointers instead of data.
 */
const LFS_POINTER_START = 'version https://git-lfs.github.com/spec/v1\n';
const LFS_POINTER_MAX_BYTES = 1024;

function isLfsPointer(bytes: Buffer): boolean {
  return bytes.length < LFS_POINTER_MAX_BYTES && bytes.subarray(0, LFS_POINTER_START.length).equals(Buffer.from(LFS_POINTER_START));
}

/** Returns the sha256 oid a Git LFS pointer names, or undefined when the bytes are no pointer. */
function lfsPointerOid(bytes: Buffer): string | undefined {
  if (!isLfsPointer(bytes)) return undefined;
  return /^oid sha256:([0-9a-f]{64})$/m.exec(bytes.toString('latin1'))?.[1];
}

/** The first bytes of a stream, held (at most LFS_POINTER_MAX_BYTES' worth, in the chunks they came in), and the rest of it. */
interface HeldStart {
  held: Buffer[];
  /** The stream ended within the held bytes: they are all of it. */
  ended: boolean;
  rest: AsyncIterator<Buffer>;
}

/** Reads up to the pointer limit's worth of a stream's first chunks; a read error is thrown. */
async function holdStart(source: Readable): Promise<HeldStart> {
  const rest = source[Symbol.asyncIterator]() as AsyncIterator<Buffer>;
  const held: Buffer[] = [];
  let heldBytes = 0;
  while (heldBytes < LFS_POINTER_MAX_BYTES) {
    const next = await rest.next();
    if (next.done) return { held, ended: true, rest };
    held.push(next.value);
    heldBytes += next.value.length;
  }
  return { held, ended: false, rest };
}

/** The held chunks, then the rest of the stream. */
async function* restOf(start: HeldStart): AsyncGenerator<Buffer> {
  yield* start.held;
  if (start.ended) return;
  for (let next = await start.rest.next(); !next.done; next = await start.rest.next()) yield next.value;
}

async function isFile(p: string): Promise<boolean> {
  try {
    return (await stat(p)).isFile();
  } catch {
    return false;
  }
}

/** Returns why a small file's bytes are a Git LFS pointer rather than a shard, or undefined. */
export function lfsPointerProblem(bytes: Buffer): string | undefined {
  if (!isLfsPointer(bytes)) return undefined;
  const oid = lfsPointerOid(bytes);
  const size = /^size (\d+)$/m.exec(bytes.toString('latin1'))?.[1];
  const what = oid ? ` (object ${oid.slice(0, 12)}…${size ? `, ${Number(size).toLocaleString('en-US')} bytes` : ''})` : '';
  return `a Git LFS pointer${what}, not the shard itself: fetch the LFS objects first (git lfs pull, or actions/checkout with lfs: true; for a base commit's shards, git lfs fetch origin <commit>)`;
}

/** Streams the shard's decompressed bytes into `write` and returns the raw byte count and, when the stream broke, why. */
export async function pumpShard(ref: ShardRef, write: (chunk: Buffer) => void, pace?: Pace): Promise<PumpResult> {
  let source: Readable;
  try {
    source = ref.open?.() ?? createReadStream(ref.absPath, { highWaterMark: readChunkBytes(ref) });
  } catch (error) {
    return { compressedBytes: 0, error: `cannot open: ${messageOf(error)}` };
  }
  // Only a file small enough to be a Git LFS pointer is looked at first. Its first bytes (at most the
  // pointer limit's worth, should the file have grown since it was listed) are held, then streamed on
  // in the chunks they came in, followed by the rest.
  if (ref.sizeBytes < LFS_POINTER_MAX_BYTES) {
    let start: HeldStart;
    try {
      start = await holdStart(source);
    } catch (error) {
      return { compressedBytes: 0, error: `read failed: ${messageOf(error)}` };
    }
    const whole = start.ended ? Buffer.concat(start.held) : undefined;
    const lfs = whole === undefined ? undefined : lfsPointerProblem(whole);
    if (lfs !== undefined) {
      // Read from git (a base commit's shard): the object, when the clone's LFS store has it (objects at aa/bb/<oid>, as Git LFS keeps them).
      const oid = lfsPointerOid(whole!)!;
      const object = ref.lfsObjects === undefined || oid === undefined ? undefined : path.join(ref.lfsObjects, oid.slice(0, 2), oid.slice(2, 4), oid);
      if (object === undefined || !(await isFile(object))) return { compressedBytes: 0, error: lfs };
      source = createReadStream(object, { highWaterMark: readChunkBytes(ref) });
    } else source = Readable.from(restOf(start));
  }
  switch (ref.compression) {
    case 'none':
      return pumpPlain(source, write, pace);
    case 'gzip':
      return pumpGzip(source, write, pace);
    case 'zstd':
      return pumpZstd(source, write, pace);
  }
}

async function pumpPlain(source: Readable, write: (chunk: Buffer) => void, pace?: Pace): Promise<PumpResult> {
  let compressedBytes = 0;
  const error = await drain(
    source,
    (chunk) => {
      compressedBytes += chunk.length;
      write(chunk);
    },
    pace,
  );
  return error === undefined ? { compressedBytes } : { compressedBytes, error: `read failed: ${error}` };
}

async function pumpGzip(source: Readable, write: (chunk: Buffer) => void, pace?: Pace): Promise<PumpResult> {
  // createGunzip reads concatenated members (multi-member files, as `cat a.gz b.gz` makes) and reports a
  // stream cut short as "unexpected end of file".
  const gunzip = createGunzip({ chunkSize: GUNZIP_CHUNK_BYTES });
  // Which failed first: a read error is handed on to gunzip (where the iteration below sees it), and the
  // message says which it was.
  let failedFirst: 'read' | 'gzip' | undefined;
  source.on('error', () => (failedFirst ??= 'read'));
  gunzip.on('error', () => (failedFirst ??= 'gzip'));
  const fed = feedGzip(source, gunzip);
  const error = await drain(gunzip, write, pace);
  await fed;
  // bytesWritten: compressed bytes taken in by the engine.
  const compressedBytes = gunzip.bytesWritten;
  if (error === undefined) return { compressedBytes };
  return { compressedBytes, error: failedFirst === 'read' ? `read failed: ${error}` : `gzip: ${error}` };
}

/** Bytes of a gzip member's trailer: CRC-32 and length of the uncompressed data (RFC 1952, 2.3). */
const GZIP_TRAILER_BYTES = 8;

/**
 * Writes a gzip stream into gunzip with its last 8 bytes held back, writes those on their own, and
 * ends gunzip only once they are taken in; never throws (a read error destroys gunzip with it).
 *
 * zlib hands on a write's partly filled output buffer only when the write completes, so the write
 * that faults loses what it decompressed and had not handed on: up to one 128 KiB output chunk. And
 * a write still queued when the stream is ended is decompressed as the finishing one, which is the
 * write that faults on a stream cut short. So no write of text is the finishing one here (that is an
 * empty write after the last), and a trailer whose CRC-32 or length does not match the data faults
 * in a write of its own: in both cases every line before the fault is counted.
 */
async function feedGzip(source: Readable, gunzip: Gunzip): Promise<void> {
  let held: Buffer = Buffer.alloc(0);
  try {
    for await (const chunk of source as AsyncIterable<Buffer | string>) {
      if (gunzip.destroyed) break; // leaving the loop destroys the source
      const bytes = typeof chunk === 'string' ? Buffer.from(chunk) : chunk;
      const all = held.length === 0 ? bytes : Buffer.concat([held, bytes]);
      if (all.length <= GZIP_TRAILER_BYTES) {
        held = all;
        continue;
      }
      held = Buffer.from(all.subarray(all.length - GZIP_TRAILER_BYTES));
      if (!gunzip.write(all.subarray(0, all.length - GZIP_TRAILER_BYTES))) await drainedOrClosed(gunzip);
    }
  } catch (error) {
    gunzip.destroy(error instanceof Error ? error : new Error(String(error)));
    return;
  }
  if (gunzip.destroyed) return;
  if (held.length > 0) await closedOr(gunzip, (settle) => gunzip.write(held, settle));
  if (!gunzip.destroyed) gunzip.end();
}

/** Settles when a writable may take more, or is closed. */
function drainedOrClosed(stream: Gunzip): Promise<void> {
  return closedOr(stream, (settle) => stream.once('drain', settle));
}

/** Settles when `start` calls back, or when the stream closes first (a failed stream may never call back). */
function closedOr(stream: Gunzip, start: (settle: () => void) => void): Promise<void> {
  return new Promise((resolve) => {
    if (stream.destroyed) {
      resolve();
      return;
    }
    const settle = (): void => {
      stream.off('close', settle);
      resolve();
    };
    stream.on('close', settle);
    start(settle);
  });
}

/**
 * zstd: the frames are walked and decompressed one by one (zstd-frames.ts), each held to its
 * Frame_Content_Size and to its Content_Checksum (the low 32 bits of the XXH64 of its content),
 * which fzstd alone skips; a frame written without a checksum (Content_Checksum_flag 0, libzstd's
 * default, not the zstd command line's) cannot be verified, and damage that still decodes passes
 * there. A file with no frame at all is broken, as an empty .gz is. As with gzip, a frame's lines
 * are handed on as they are decoded, so those before a fault, its own included, are counted.
 * The checks cost no time that shows: on a 54 MB JSONL file of Brown paragraphs (`zstd -3`, 18 MB),
 * one frame, 144 against 134 MB/s with fzstd alone (medians of 12 alternating runs in one process,
 * pairs 0.90x to 1.29x); split into 55 frames, 134 against 138 MB/s (8 runs). XXH64 itself hashes
 * 2 to 7 GB/s there, against the decoder's 150.
 */
async function pumpZstd(source: Readable, write: (chunk: Buffer) => void, pace?: Pace): Promise<PumpResult> {
  let api: XXHashAPI;
  try {
    api = await xxhashApi();
  } catch (error) {
    source.destroy();
    throw error;
  }
  let compressedBytes = 0;
  // Output is handed on block by block (at most 128 KiB each) from inside push(), so a highly
  // compressed chunk never piles up in memory.
  const reader = new ZstdFrameReader(api, (data) => write(Buffer.from(data.buffer, data.byteOffset, data.byteLength)));
  let broken: string | undefined;
  const readError = await drain(
    source,
    (chunk) => {
      compressedBytes += chunk.length;
      broken = reader.push(chunk);
      if (broken !== undefined) throw new StopSignal();
    },
    pace,
  );
  if (readError !== undefined) return { compressedBytes, error: `read failed: ${readError}` };
  // A stream cut at a block or frame edge, or before any frame, shows only at its end.
  broken ??= reader.end();
  return broken === undefined ? { compressedBytes } : { compressedBytes, error: `zstd: ${broken}` };
}

/** Thrown by a drain body to stop reading without it counting as the consumer's error. */
class StopSignal extends Error {}

/** Feeds every chunk to `body` (waiting on `pace` after each); returns the stream's error message, or undefined when it ended normally. Errors thrown by `body` or `pace` are thrown on, after closing the stream. */
async function drain(stream: Readable, body: (chunk: Buffer) => void, pace?: Pace): Promise<string | undefined> {
  const iterator = stream[Symbol.asyncIterator]() as AsyncIterator<Buffer | string>;
  for (;;) {
    let step: IteratorResult<Buffer | string>;
    try {
      step = await iterator.next();
    } catch (error) {
      return messageOf(error);
    }
    if (step.done) return undefined;
    try {
      // A stream from ref.open() in string mode still gives bytes.
      body(typeof step.value === 'string' ? Buffer.from(step.value) : step.value);
    } catch (error) {
      stream.destroy();
      if (error instanceof StopSignal) return undefined;
      throw error;
    }
    if (pace) {
      try {
        const wait = pace();
        if (wait !== undefined) await wait;
      } catch (error) {
        stream.destroy();
        throw error;
      }
    }
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
