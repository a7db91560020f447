// A zstd stream decompressed frame by frame, with each frame's content checked. fzstd decodes the
// blocks but skips a frame's Content_Checksum without verifying it, so damage that still parses
// would reach the line checks as plausible bytes. Here the frame structure (RFC 8878 §3.1) is
// walked over the compressed bytes as they stream in, each frame goes to a decompressor of its
// own, ending exactly at the frame's end, and what it decompressed to is held to the frame's
// Frame_Content_Size and to the low 32 bits of its XXH64 (seed 0), when the frame carries them.
import { Decompress } from 'fzstd';
import xxhash, { type XXHash, type XXHashAPI } from 'xxhash-wasm';

/** RFC 8878 §3.1.1: Magic_Number of a zstd frame, read little-endian. */
const ZSTD_MAGIC = 0xfd2fb528;
/** RFC 8878 §3.1.2: skippable frames carry magic numbers 0x184D2A50 to 0x184D2A5F. */
const SKIPPABLE_MAGIC_MASK = 0xfffffff0;
const SKIPPABLE_MAGIC = 0x184d2a50;
/** RFC 8878 §3.1.1.2: Block_Maximum_Size is at most 128 KiB, for every block type. */
const MAX_BLOCK_BYTES = 128 * 1024;
/** Largest window decoded: 128 MiB, the zstd tool's default limit for decompression (its --memory; from memory, zstd 1.5 man page). */
const MAX_WINDOW_BYTES = 128 * 2 ** 20;

let hashing: Promise<XXHashAPI> | undefined;

/** The XXH64 engine, instantiated once per thread on first use (its WebAssembly module compiles asynchronously). */
export function xxhashApi(): Promise<XXHashAPI> {
  hashing ??= xxhash().catch((error: unknown) => {
    hashing = undefined;
    throw error;
  });
  return hashing;
}

// What the walker is reading: a small field collected into `field` (magic number, frame header
// descriptor, rest of the header, block header, checksum, skippable frame's size), or bytes it
// passes over (a block's content, a skippable frame's data).
const MAGIC = 0;
const DESCRIPTOR = 1;
const HEADER = 2;
const BLOCK_HEADER = 3;
const BLOCK = 4;
const CHECKSUM = 5;
const SKIP_SIZE = 6;
const SKIP = 7;

/** One zstd frame being decompressed: its own fzstd decompressor, the bytes it gave, their running XXH64. */
interface Frame {
  number: number;
  decompressor: Decompress;
  hasChecksum: boolean;
  lastBlock: boolean;
  contentSize: number | undefined;
  produced: number;
  hash: XXHash<bigint> | undefined;
}

/**
 * Decompresses a stream of zstd frames pushed chunk by chunk, handing the output to `write` as it
 * is decoded (synchronously, from inside `push`: fzstd's Decompress calls its callback from inside
 * its own push). `push` and `end` return why the stream is broken, or undefined; after a break
 * nothing more is read. An error thrown by `write` is thrown on, as it is.
 */
export class ZstdFrameReader {
  private stage = MAGIC;
  private readonly field = new Uint8Array(16);
  private have = 0;
  private need = 4;
  /** Bytes of a block's content or a skippable frame's data still to come. */
  private left = 0;
  /** Frames begun, skippable ones included: the current frame's number, from 1. */
  private frames = 0;
  /** Offset in the file of the chunk being walked. */
  private offset = 0;
  private frame: Frame | undefined;
  private broken: string | undefined;
  private consumerError: { error: unknown } | undefined;

  constructor(
    private readonly api: XXHashAPI,
    private readonly write: (data: Uint8Array) => void,
  ) {}

  /** Walks one chunk of the compressed stream, feeding each zstd frame's bytes to its decompressor. */
  push(chunk: Uint8Array): string | undefined {
    if (this.broken !== undefined) return this.broken;
    const field = this.field;
    const end = chunk.length;
    let pos = 0;
    // Where the current zstd frame's bytes start in this chunk (-1: not in a zstd frame).
    let span = this.frame === undefined ? -1 : 0;
    while (pos < end) {
      if (this.stage === BLOCK || this.stage === SKIP) {
        const n = Math.min(this.left, end - pos);
        pos += n;
        this.left -= n;
        if (this.left > 0) break;
        if (this.passed()) {
          const error = this.endFrame(chunk.subarray(span, pos));
          if (error !== undefined) return this.fail(error);
          span = -1;
        }
        continue;
      }
      while (this.have < this.need && pos < end) field[this.have++] = chunk[pos++]!;
      if (this.have < this.need) break;
      this.have = 0;
      switch (this.stage) {
        case MAGIC: {
          const magic = readU32(field, 0);
          this.frames++;
          if (magic === ZSTD_MAGIC) {
            this.frame = this.startFrame();
            if (pos >= 4) span = pos - 4;
            else {
              // The magic number began in the chunk before: hand the decompressor all four bytes.
              const error = this.feed(field.slice(0, 4), false);
              if (error !== undefined) return this.fail(error);
              span = pos;
            }
            this.expect(DESCRIPTOR, 1);
          } else if ((magic & SKIPPABLE_MAGIC_MASK) >>> 0 === SKIPPABLE_MAGIC) {
            this.expect(SKIP_SIZE, 4);
          } else {
            const at = this.offset + pos - 4;
            return this.fail(
              `invalid zstd data: frame ${this.frames}, at byte ${at}, starts with ${hex32(magic)}, which is neither a zstd frame's magic number (0xFD2FB528) nor a skippable frame's (0x184D2A50 to 0x184D2A5F)`,
            );
          }
          break;
        }
        case DESCRIPTOR: {
          // RFC 8878 §3.1.1.1.1: Frame_Content_Size_flag (bits 7-6), Single_Segment_flag (5),
          // Reserved_bit (3), Content_Checksum_flag (2), Dictionary_ID_flag (1-0).
          const d = field[0]!;
          if (d & 0x08) return this.fail(this.flush(chunk, span, pos) ?? `invalid zstd data: frame ${this.frames}'s header has its reserved bit set`);
          const frame = this.frame!;
          frame.hasChecksum = (d & 0x04) !== 0;
          if (frame.hasChecksum) frame.hash = this.api.create64(0n);
          // Then Window_Descriptor (absent in a single segment), Dictionary_ID and Frame_Content_Size,
          // collected after the descriptor in `field`.
          const singleSegment = (d >> 5) & 1;
          this.expect(HEADER, 1 + (singleSegment ? 0 : 1) + DID_BYTES[d & 3]! + fcsBytes(d));
          this.have = 1;
          break;
        }
        case HEADER: {
          const d = field[0]!;
          const singleSegment = (d >> 5) & 1;
          const didBytes = DID_BYTES[d & 3]!;
          let at = singleSegment ? 1 : 2;
          const dictionary = readLE(field, at, didBytes);
          at += didBytes;
          if (dictionary !== 0) {
            return this.fail(
              this.flush(chunk, span, pos) ?? `frame ${this.frames} was compressed with a dictionary (Dictionary_ID ${dictionary}), which cannot be read without it`,
            );
          }
          const sizeBytes = fcsBytes(d);
          if (sizeBytes > 0) this.frame!.contentSize = readLE(field, at, sizeBytes) + (sizeBytes === 2 ? 256 : 0);
          // RFC 8878 §3.1.1.1.2: the window is 2^(10 + Exponent) plus Mantissa eighths of that, or
          // the content size in a single segment. The decompressor allocates it whole, so a damaged
          // header could ask for gigabytes: refused before this frame's bytes reach it.
          const w = field[1]!;
          const window = singleSegment ? (this.frame!.contentSize ?? 0) : 2 ** (10 + (w >> 3)) * (1 + (w & 7) / 8);
          if (window > MAX_WINDOW_BYTES) {
            return this.fail(
              `frame ${this.frames} needs a window of ${(window / 2 ** 20).toFixed(0)} MiB, more than the ${MAX_WINDOW_BYTES / 2 ** 20} MiB sluice decodes (as the zstd tool does without --long or --memory); recompress the shard without --long, or the header is damaged`,
            );
          }
          this.expect(BLOCK_HEADER, 3);
          break;
        }
        case BLOCK_HEADER: {
          // RFC 8878 §3.1.1.2: Last_Block (bit 0), Block_Type (bits 1-2), Block_Size (bits 3-23).
          const h = field[0]! | (field[1]! << 8) | (field[2]! << 16);
          const type = (h >> 1) & 3;
          const size = h >>> 3;
          this.frame!.lastBlock = (h & 1) === 1;
          if (type === 3) return this.fail(this.flush(chunk, span, pos) ?? `invalid zstd data: frame ${this.frames} has a block of the reserved type`);
          if (size > MAX_BLOCK_BYTES) {
            return this.fail(this.flush(chunk, span, pos) ?? `invalid zstd data: frame ${this.frames} has a block of ${size} bytes, over the 128 KiB limit`);
          }
          // Raw and compressed blocks are followed by Block_Size bytes, an RLE block by one byte.
          this.stage = BLOCK;
          this.left = type === 1 ? 1 : size;
          if (this.left === 0 && this.passed()) {
            const error = this.endFrame(chunk.subarray(span, pos));
            if (error !== undefined) return this.fail(error);
            span = -1;
          }
          break;
        }
        case CHECKSUM: {
          const error = this.endFrame(chunk.subarray(span, pos));
          if (error !== undefined) return this.fail(error);
          span = -1;
          break;
        }
        case SKIP_SIZE:
          this.stage = SKIP;
          this.left = readU32(field, 0);
          if (this.left === 0) this.passed();
          break;
      }
    }
    if (span >= 0 && span < end) {
      const error = this.feed(chunk.subarray(span), false);
      if (error !== undefined) return this.fail(error);
    }
    this.offset += end;
    return undefined;
  }

  /** Says whether the stream ended where a frame may end. */
  end(): string | undefined {
    if (this.broken !== undefined) return this.broken;
    if (this.frames === 0 && this.have === 0) return this.fail('unexpected end of file (no frame)');
    if (this.stage === MAGIC && this.have === 0) return undefined;
    if (this.stage === MAGIC) {
      return this.fail(`unexpected end of file: ${this.have} byte${this.have === 1 ? '' : 's'} after frame ${this.frames}, too few for another frame`);
    }
    return this.fail(`unexpected end of file: the file ends inside frame ${this.frames}`);
  }

  /** After a block's content or a skippable frame's data, sets what comes next; true when that ends a frame with no checksum. */
  private passed(): boolean {
    if (this.stage === SKIP) this.expect(MAGIC, 4);
    else if (!this.frame!.lastBlock) this.expect(BLOCK_HEADER, 3);
    else if (this.frame!.hasChecksum) this.expect(CHECKSUM, 4);
    else return true;
    return false;
  }

  private expect(stage: number, need: number): void {
    this.stage = stage;
    this.need = need;
    this.have = 0;
  }

  private fail(error: string): string {
    this.broken = error;
    this.frame = undefined;
    return error;
  }

  /** On a fault found at `pos`, hands the decompressor the frame's bytes before it, so what they decode to is counted; returns its own error if it fails first. */
  private flush(chunk: Uint8Array, span: number, pos: number): string | undefined {
    return span >= 0 && pos > span ? this.feed(chunk.subarray(span, pos), false) : undefined;
  }

  private startFrame(): Frame {
    const frame: Frame = {
      number: this.frames,
      decompressor: new Decompress((data) => {
        if (data.length === 0) return;
        frame.produced += data.length;
        frame.hash?.update(data);
        try {
          this.write(data);
        } catch (error) {
          this.consumerError = { error };
          throw error;
        }
      }),
      hasChecksum: false,
      lastBlock: false,
      contentSize: undefined,
      produced: 0,
      hash: undefined,
    };
    return frame;
  }

  /** Pushes bytes of the current frame to its decompressor; returns its error, prefixed with the frame's number. */
  private feed(bytes: Uint8Array, final: boolean): string | undefined {
    const frame = this.frame!;
    try {
      frame.decompressor.push(bytes, final);
      return undefined;
    } catch (error) {
      if (this.consumerError !== undefined) throw this.consumerError.error;
      return `frame ${frame.number}: ${error instanceof Error ? error.message : String(error)}`;
    }
  }

  /** Ends the current frame with its last bytes, then holds its output to the frame's content size and checksum. */
  private endFrame(last: Uint8Array): string | undefined {
    const frame = this.frame!;
    const error = this.feed(last, true);
    this.frame = undefined;
    this.expect(MAGIC, 4);
    if (error !== undefined) return error;
    if (frame.contentSize !== undefined && frame.produced !== frame.contentSize) {
      return `frame ${frame.number} decompresses to ${frame.produced} bytes, but its header gives ${frame.contentSize} (Frame_Content_Size): the data is damaged`;
    }
    if (frame.hash !== undefined) {
      const stored = readU32(this.field, 0);
      const actual = Number(frame.hash.digest() & 0xffffffffn);
      if (actual !== stored) {
        return `frame ${frame.number} fails its content checksum (the frame stores ${hex32(stored)}, its decompressed data hashes to ${hex32(actual)}): the data is damaged`;
      }
    }
    return undefined;
  }
}

/** RFC 8878 §3.1.1.1.1: bytes of Dictionary_ID by Dictionary_ID_flag. */
const DID_BYTES = [0, 1, 2, 4];

/** Bytes of Frame_Content_Size given a Frame_Header_Descriptor: by its flag, 0 meaning 1 byte in a single segment, else none. */
function fcsBytes(descriptor: number): number {
  const flag = descriptor >> 6;
  return flag === 0 ? (descriptor >> 5) & 1 : 1 << flag;
}

function readU32(bytes: Uint8Array, at: number): number {
  return (bytes[at]! | (bytes[at + 1]! << 8) | (bytes[at + 2]! << 16) | (bytes[at + 3]! << 24)) >>> 0;
}

/** A little-endian unsigned field of 0 to 8 bytes (exact up to 2^53). */
function readLE(bytes: Uint8Array, at: number, n: number): number {
  let value = 0;
  for (let i = n - 1; i >= 0; i--) value = value * 256 + bytes[at + i]!;
  return value;
}

function hex32(value: number): string {
  return `0x${value.toString(16).toUpperCase().padStart(8, '0')}`;
}
