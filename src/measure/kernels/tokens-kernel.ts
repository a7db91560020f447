// The token counter's WebAssembly kernel (tokens.c): splits a text under a builtin pattern,
// looks its pieces up in a per-counter cache in the kernel's memory (calling back into
// TypeScript for the pieces the cache lacks), runs the byte-pair merges of those pieces, and
// counts each word's tokens alone for fertility; it also builds the builtins' rank tables. One
// instance per thread, made on first use; every counter of the thread shares it and holds a cache
// of its own there.
import { instantiateKernel, type KernelMemory } from './instance.js';
import { WASM_BASE64 } from './tokens.generated.js';

interface TokensExports {
  setClasses(classes: number): void;
  stoppedAt(): number;
  tokens(): number;
  pieceEnd(text: number, n: number, p: number, pattern: number): number;
  countPieces(text: number, n: number, from: number, pattern: number, first: number, ends: number, counts: number, slots: number, keys: number, mask: number): number;
  wordTokens(text: number, n: number, words: number, offsets: number, pieces: number, ends: number, counts: number, pattern: number, slots: number, keys: number, mask: number, left: number): number;
  continuedWords(): number;
  leftWords(): number;
  mergeCount(text: number, start: number, end: number, table: number): number;
  scanBuiltinRanks(text: number, n: number): number;
  scannedBytes(): number;
  fillBuiltinRanks(text: number, n: number, table: number): number;
}

/** A rank table's header words and size in bytes, for its token count and token bytes (ranks.ts lays it out). */
export type RankLayout = (count: number, arenaBytes: number) => { header: Int32Array; bytes: number };

/** What buildRanks made: the table, or why there is none (the text is damaged, or token `duplicate` is listed twice). */
export type BuiltRanks = { table: SharedArrayBuffer } | { damaged: true } | { duplicate: number };

/** The kernel's numbers for the builtin split patterns. */
export const KERNEL_PATTERN = { gpt2: 0, cl100k_base: 1, o200k_base: 2 } as const;
export type KernelPattern = (typeof KERNEL_PATTERN)[keyof typeof KERNEL_PATTERN];

/**
 * Longest text the kernel is given, in UTF-16 units (a longer one is counted in TypeScript):
 * the text, its pieces and its words' offsets are in the kernel's memory, which is never given
 * back, so this bounds them at about 5 MB a thread.
 */
export const MAX_KERNEL_UNITS = 1 << 18;
/** Longest piece the kernel merges, in UTF-16 units (MAX_MERGE_UNITS in tokens.c): at most 510 bytes, under bpe.ts's HEAP_MERGE_BYTES, so that bpe.ts merges every longer piece with its heap. */
export const MAX_MERGE_UNITS = 170;
/** Units of a key its cache holds (KEY_UNITS in tokens.c). */
const KEY_UNITS = 16;

/** Counts a piece text[start, end) of the loaded text that the cache lacks (hash: FNV-1a of its units). */
export type PieceResolver = (start: number, end: number, hash: number) => number;

/** A counter's cache in the kernel's memory: direct-mapped, `entries` a power of two. */
export interface KernelCache {
  slots: number;
  keys: number;
  mask: number;
}

/** What wordTokens found: the words' tokens, those of two tokens or more, and the words left to the caller (indices, a view valid until the next load). */
export interface KernelWordTokens {
  wordTokens: number;
  continuedWords: number;
  left: Int32Array;
}

export class TokenKernel {
  private readonly kernel: TokensExports & KernelMemory;
  /** Capacity of the per-text buffers, in units of text. */
  private units = 0;
  private textAt = 0;
  private endsAt = 0;
  private countsAt = 0;
  private offsetsAt = 0;
  private leftAt = 0;
  /** Length of the loaded text. */
  private n = 0;
  private buffer: ArrayBuffer | null = null;
  private readonly rankTables = new WeakMap<SharedArrayBuffer, number>();
  private resolver: PieceResolver = () => {
    throw new Error('token kernel: no text is being counted');
  };
  /** Ends and counts of the loaded text's pieces (views, one entry per unit; valid until the next load). */
  ends = new Int32Array(0);
  counts = new Int32Array(0);
  private offsets = new Int32Array(0);

  constructor(classes: Uint8Array) {
    this.kernel = instantiateKernel<TokensExports>(WASM_BASE64, {
      resolve: (start: number, end: number, hash: number) => this.resolver(start, end, hash),
    });
    this.kernel.setClasses(this.kernel.place(classes));
  }

  /** Returns where a rank table (ranks.ts's layout, in a SharedArrayBuffer) is in the kernel's memory, copying it there the first time. Call it before load(): the copy may grow the memory. */
  placeRanks(buffer: SharedArrayBuffer): number {
    let at = this.rankTables.get(buffer);
    if (at === undefined) {
      at = this.kernel.place(new Uint8Array(buffer));
      this.rankTables.set(buffer, at);
    }
    return at;
  }

  /**
   * Builds the rank table of a js-tiktoken builtin from its `bpe_ranks` text (ASCII) as
   * ranks.ts's parseBuiltinRanks does, byte for byte, and copies it out to a SharedArrayBuffer
   * that placeRanks then finds already placed. The text stays in the kernel's memory (this runs
   * once a thread, for the main tokenizer and the baseline at most).
   */
  buildRanks(text: string, layout: RankLayout): BuiltRanks {
    const n = text.length;
    if (Buffer.byteLength(text, 'utf8') !== n) return { damaged: true };
    // The text and a newline after it, which the kernel's loops stop at instead of checking the length.
    const textAt = this.kernel.allocate(n + 1);
    const bytes = Buffer.from(this.kernel.memory.buffer, textAt, n + 1);
    bytes.write(text, 'latin1');
    bytes[n] = 0x0a;
    const count = this.kernel.scanBuiltinRanks(textAt, n);
    if (count < 0) return { damaged: true };
    const { header, bytes: size } = layout(count, this.kernel.scannedBytes());
    const at = this.kernel.allocate(size);
    const memory = this.kernel.memory.buffer;
    new Int32Array(memory, at, header.length).set(header);
    const result = this.kernel.fillBuiltinRanks(textAt, n, at);
    if (result === -2) return { damaged: true };
    if (result >= 0) return { duplicate: result };
    const table = new SharedArrayBuffer(size);
    new Uint8Array(table).set(new Uint8Array(memory, at, size));
    this.rankTables.set(table, at);
    return { table };
  }

  /** The byte-pair token count of the loaded text's [start, end) (at most MAX_MERGE_UNITS units) under the rank table placed at `ranks`. */
  merge(start: number, end: number, ranks: number): number {
    return this.kernel.mergeCount(this.textAt, start, end, ranks);
  }

  /** Reserves a cache of `entries` (a power of two) in the kernel's memory, empty. Call it before load(). */
  createCache(entries: number): KernelCache {
    if (!(entries >= 1 && (entries & (entries - 1)) === 0)) throw new RangeError(`token kernel cache: entries must be a power of two, got ${entries}`);
    const slots = this.kernel.allocate(entries * 8);
    const keys = this.kernel.allocate(entries * KEY_UNITS * 2);
    new Uint8Array(this.kernel.memory.buffer, slots, entries * 8).fill(0);
    return { slots, keys, mask: entries - 1 };
  }

  /** Copies a text (at most MAX_KERNEL_UNITS long) into the kernel's memory; the resolver counts the pieces of it that the caches lack. */
  load(text: string, resolver: PieceResolver): void {
    const n = text.length;
    if (n + 2 > this.units) {
      // A piece and a word offset per unit at most (a word takes a unit and ends before another).
      this.units = Math.max(n + 2, this.units * 2, 4096);
      this.textAt = this.kernel.allocate(this.units * 2);
      this.endsAt = this.kernel.allocate(this.units * 4);
      this.countsAt = this.kernel.allocate(this.units * 4);
      this.offsetsAt = this.kernel.allocate(this.units * 4);
      this.leftAt = this.kernel.allocate(this.units * 2);
      this.buffer = null;
    }
    const buffer = this.kernel.memory.buffer;
    if (buffer !== this.buffer) {
      this.buffer = buffer;
      this.ends = new Int32Array(buffer, this.endsAt, this.units);
      this.counts = new Int32Array(buffer, this.countsAt, this.units);
      this.offsets = new Int32Array(buffer, this.offsetsAt, this.units);
    }
    this.kernel.writeUtf16(this.textAt, text);
    this.n = n;
    this.resolver = resolver;
  }

  /** Splits the loaded text from `from` under a pattern, writing pieces at ends/counts[first, ...); returns the index after the last one written. */
  count(from: number, first: number, pattern: KernelPattern, cache: KernelCache): number {
    return this.kernel.countPieces(this.textAt, this.n, from, pattern, first, this.endsAt, this.countsAt, cache.slots, cache.keys, cache.mask);
  }

  /** Where the last count() stopped: the text's length, or a piece the kernel cannot decide (a surrogate is involved). */
  stoppedAt(): number {
    return this.kernel.stoppedAt();
  }

  /** Tokens of the pieces the last count() wrote. */
  tokens(): number {
    return this.kernel.tokens();
  }

  /** The tokens of each word of the loaded text alone (`offsets`: start and end of each word, in order), given its `pieces` pieces in ends/counts. */
  wordTokens(offsets: Int32Array, pieces: number, pattern: KernelPattern, cache: KernelCache): KernelWordTokens {
    const words = offsets.length >> 1;
    this.offsets.set(offsets);
    const wordTokens = this.kernel.wordTokens(this.textAt, this.n, words, this.offsetsAt, pieces, this.endsAt, this.countsAt, pattern, cache.slots, cache.keys, cache.mask, this.leftAt);
    const left = new Int32Array(this.kernel.memory.buffer, this.leftAt, this.kernel.leftWords());
    return { wordTokens, continuedWords: this.kernel.continuedWords(), left };
  }

  /** The end of the piece at p of the loaded text, or -1 when a surrogate is involved (for the tests). */
  pieceEnd(p: number, pattern: KernelPattern): number {
    return this.kernel.pieceEnd(this.textAt, this.n, p, pattern);
  }
}

let kernel: TokenKernel | undefined;

/** Returns this thread's token kernel, made on first use with the splitters' class table. */
export function tokenKernel(classes: () => Uint8Array): TokenKernel {
  return (kernel ??= new TokenKernel(classes()));
}
