// The measurer's WebAssembly kernel (words.c): one instance per thread, made on first use,
// with the per-character table placed in its memory once. A text is copied in, scanned, and
// its word offsets and script counts read back through views.
import { instantiateKernel, type KernelMemory } from './instance.js';
import { WASM_BASE64 } from './words.generated.js';

interface WordsExports {
  setInfo(info: number): void;
  stoppedAt(): number;
  bytes(): number;
  flags(): number;
  scanWords(text: number, n: number, record: number, out: number, counts: number, scripts: number): number;
}

/**
 * Longest text the kernel is given, in UTF-16 units (a longer one is scanned in TypeScript): the
 * text and its offsets are in the kernel's memory, which is never given back, so this bounds
 * them at 2 MB and 4 MB a thread.
 */
export const MAX_WORD_UNITS = 1 << 20;

export class WordKernel {
  private readonly kernel: WordsExports & KernelMemory;
  private textAt = 0;
  private outAt = 0;
  private units = 0;
  private readonly countsAt: number;
  private buffer: ArrayBuffer | null = null;
  /** Word offsets of the last scan with `record` (two per word), and characters per Script id; views valid until the next scan. */
  offsets = new Int32Array(0);
  counts = new Int32Array(0);

  constructor(
    info: Uint32Array,
    private readonly scripts: number,
    closerLook: (unit: number, at: number) => void,
  ) {
    this.kernel = instantiateKernel<WordsExports>(WASM_BASE64, { closerLook });
    this.kernel.setInfo(this.kernel.place(new Uint8Array(info.buffer, info.byteOffset, info.byteLength)));
    this.countsAt = this.kernel.allocate(scripts * 4);
  }

  /** Scans a text (at most MAX_WORD_UNITS long): the word count, or -1 where the word rules stop (stoppedAt()). */
  scan(text: string, record: boolean): number {
    const n = text.length;
    if (n > this.units) {
      this.units = Math.max(n, this.units * 2, 4096);
      this.textAt = this.kernel.allocate(this.units * 2);
      this.outAt = this.kernel.allocate((this.units + 2) * 4);
    }
    const buffer = this.kernel.memory.buffer;
    if (buffer !== this.buffer) {
      this.buffer = buffer;
      this.counts = new Int32Array(buffer, this.countsAt, this.scripts);
    }
    if (this.offsets.buffer !== buffer || this.offsets.byteOffset !== this.outAt) this.offsets = new Int32Array(buffer, this.outAt, this.units + 2);
    this.kernel.writeUtf16(this.textAt, text);
    return this.kernel.scanWords(this.textAt, n, record ? 1 : 0, this.outAt, this.countsAt, this.scripts);
  }

  /** Where the last scan's word rules stopped (its counts cover the text before it). */
  stoppedAt(): number {
    return this.kernel.stoppedAt();
  }

  /** UTF-8 bytes of the characters the last scan counted. */
  bytes(): number {
    return this.kernel.bytes() >>> 0;
  }

  /** OR of their table entries. */
  flags(): number {
    return this.kernel.flags() >>> 0;
  }
}

let kernel: WordKernel | undefined;

/** Returns this thread's word kernel, made on first use. */
export function wordKernel(info: () => Uint32Array, scripts: number, closerLook: (unit: number, at: number) => void): WordKernel {
  return (kernel ??= new WordKernel(info(), scripts, closerLook));
}
