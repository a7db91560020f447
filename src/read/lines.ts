// Splits a stream of decompressed chunks into lines at the byte level, keeping at most
// one line's worth of bytes (bounded by maxLineBytes) between chunks: a longer line is
// counted and skipped to its newline without being kept.

const NEWLINE = 0x0a;
const CARRIAGE_RETURN = 0x0d;

/** Receives each line in order. Offsets are absolute byte offsets in the decompressed stream. */
export interface LineSink {
  /** A complete line: bytes buf[start, end), without its "\n", a trailing "\r", or (first line) a UTF-8 BOM. */
  line(buf: Buffer, start: number, end: number, clean: boolean, offset: number): void;
  /** A line longer than the limit, skipped unread; `bytes` is its length without the "\n". */
  tooLong(bytes: number, offset: number): void;
}

export interface SplitterOptions {
  maxLineBytes: number;
  /** Drop EF BB BF at the very start of the stream (UTF-8 shards). */
  stripBom: boolean;
  /** Checks a block of several whole lines at once; true means each of its lines may skip the per-line checks (`clean`). */
  blockIsClean: (block: Buffer) => boolean;
}

/** Byte-level line splitter; feed it chunks with write(), then call end() once the stream is complete. */
export class LineSplitter {
  private readonly max: number;
  /** Pieces of the unfinished line carried over from earlier chunks (copies, so the producer may reuse its buffers). */
  private parts: Buffer[] = [];
  private carried = 0;
  /** Bytes of the too-long line being skipped, or -1 when not skipping. */
  private skipped = -1;
  /** Absolute offset where the carried or skipped line starts. */
  private lineOffset = 0;
  /** Absolute offset of the next chunk's first byte. */
  private offset = 0;

  constructor(
    private readonly sink: LineSink,
    private readonly options: SplitterOptions,
  ) {
    this.max = options.maxLineBytes;
  }

  /** Returns the bytes fed so far (the decompressed size). */
  get bytes(): number {
    return this.offset;
  }

  /** Returns the bytes of an unfinished line held or skipped (what a broken stream cuts off). */
  get pendingBytes(): number {
    return this.skipped >= 0 ? this.skipped : this.carried;
  }

  /** Splits one chunk, handing every line it completes to the sink. */
  write(chunk: Buffer): void {
    const n = chunk.length;
    if (n === 0) return;
    let pos = 0;
    if (this.skipped >= 0) {
      const nl = chunk.indexOf(NEWLINE);
      if (nl === -1) {
        this.skipped += n;
        this.offset += n;
        return;
      }
      this.sink.tooLong(this.skipped + nl, this.lineOffset);
      this.skipped = -1;
      pos = nl + 1;
    } else if (this.carried > 0) {
      const nl = chunk.indexOf(NEWLINE);
      if (nl === -1) {
        if (this.carried + n > this.max) this.startSkipping(this.carried + n);
        else this.carry(Buffer.from(chunk));
        this.offset += n;
        return;
      }
      const length = this.carried + nl;
      if (length > this.max) {
        this.sink.tooLong(length, this.lineOffset);
      } else {
        this.parts.push(chunk.subarray(0, nl));
        const line = Buffer.concat(this.parts, length);
        this.emit(line, 0, length, false, this.lineOffset);
      }
      this.parts = [];
      this.carried = 0;
      pos = nl + 1;
    }

    const last = chunk.lastIndexOf(NEWLINE);
    if (last >= pos) {
      // One check over the whole block of complete lines; per-line checks only run when it fails.
      const clean = this.options.blockIsClean(chunk.subarray(pos, last));
      const base = this.offset;
      let start = pos;
      while (start <= last) {
        const nl = chunk.indexOf(NEWLINE, start);
        if (nl - start > this.max) this.sink.tooLong(nl - start, base + start);
        else this.emit(chunk, start, nl, clean, base + start);
        start = nl + 1;
      }
      pos = last + 1;
    }

    if (pos < n) {
      this.lineOffset = this.offset + pos;
      if (n - pos > this.max) this.startSkipping(n - pos);
      else this.carry(Buffer.from(chunk.subarray(pos)));
    }
    this.offset += n;
  }

  /** Hands on the final line when the stream did not end with a newline. */
  end(): void {
    if (this.skipped >= 0) {
      this.sink.tooLong(this.skipped, this.lineOffset);
      this.skipped = -1;
    } else if (this.carried > 0) {
      const line = Buffer.concat(this.parts, this.carried);
      this.parts = [];
      this.carried = 0;
      this.emit(line, 0, line.length, false, this.lineOffset);
    }
  }

  private carry(piece: Buffer): void {
    this.parts.push(piece);
    this.carried += piece.length;
  }

  private startSkipping(bytes: number): void {
    this.parts = [];
    this.carried = 0;
    this.skipped = bytes;
  }

  private emit(buf: Buffer, start: number, end: number, clean: boolean, offset: number): void {
    if (end > start && buf[end - 1] === CARRIAGE_RETURN) end--;
    if (offset === 0 && this.options.stripBom && end - start >= 3 && buf[start] === 0xef && buf[start + 1] === 0xbb && buf[start + 2] === 0xbf) {
      start += 3;
    }
    this.sink.line(buf, start, end, clean, offset);
  }
}
