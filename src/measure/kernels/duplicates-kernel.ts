// The duplicate index's WebAssembly kernel (duplicates.c): the scan of a prepared document, the
// MinHash sketch of its words and the contamination search over them. One instance per thread,
// made on first use. Each scanner reserves its own word buffers in the kernel's memory, each
// sketcher its tables, each evaluation index a copy of its table; the text being scanned is
// copied into one buffer they all use.
import { instantiateKernel, type KernelMemory } from './instance.js';
import { WASM_BASE64 } from './duplicates.generated.js';

interface DuplicatesExports {
  setClasses(classes: number): void;
  exactLength(): number;
  exactHigh(): number;
  exactLow(): number;
  scanPrepared(text: number, n: number, strip: number, two: number, words: number, words2: number): number;
  sketch(words: number, count: number, sketcher: number): number;
  firstOverlap(w1: number, w2: number, words: number, m: number, table: number, best: number): number;
}

/** An evaluation index's table as contamination.ts builds it. */
export interface EvalTableArrays {
  lane1: Int32Array;
  lane2: Int32Array;
  item: Int32Array;
  mask: number;
  filter: Int32Array;
  filterShift: number;
}

/** A MinHash sketcher's settings and tables in the kernel's memory (the Sketcher struct of duplicates.c). */
export interface KernelSketcher {
  at: number;
  valuesAt: number;
  hashes: number;
}

/**
 * Longest text the kernel is given, in UTF-16 units (a longer one is scanned in TypeScript): the
 * text and a word buffer of half its length are in the kernel's memory, which is never given
 * back, so this bounds them at 2 MB and 2 MB a lane, a thread.
 */
export const MAX_SCAN_UNITS = 1 << 20;

/** A scanner's word buffers in the kernel's memory, with views of them. */
export interface KernelWords {
  capacity: number;
  at1: number;
  at2: number;
  lane1: Int32Array;
  lane2: Int32Array | null;
  buffer: ArrayBuffer | null;
}

export class ScanKernel {
  private readonly kernel: DuplicatesExports & KernelMemory;
  private textAt = 0;
  private textUnits = 0;
  private readonly evalTables = new WeakMap<EvalTableArrays, number>();

  constructor(classes: Uint8Array, astralClass: (codePoint: number) => number) {
    this.kernel = instantiateKernel<DuplicatesExports>(WASM_BASE64, { astralClass });
    this.kernel.setClasses(this.kernel.place(classes));
  }

  /** Returns empty word buffers (one lane or two). */
  words(lanes: 1 | 2): KernelWords {
    return { capacity: 0, at1: 0, at2: lanes === 2 ? 0 : -1, lane1: new Int32Array(0), lane2: lanes === 2 ? new Int32Array(0) : null, buffer: null };
  }

  /**
   * Scans `text` (prepared, at most MAX_SCAN_UNITS long) into the word buffers and returns its word
   * count; exactLength(), exactHigh() and exactLow() then give its exact hash. The views in `into`
   * are made again here when the memory has grown (see views()).
   */
  scan(text: string, strip: boolean, into: KernelWords): number {
    const n = text.length;
    if (n > this.textUnits) {
      this.textUnits = Math.max(n, this.textUnits * 2, 4096);
      this.textAt = this.kernel.allocate(this.textUnits * 2);
    }
    const needed = (n >> 1) + 1;
    if (needed > into.capacity) {
      into.capacity = Math.max(needed, into.capacity * 2, 1024);
      into.at1 = this.kernel.allocate(into.capacity * 4);
      if (into.at2 >= 0) into.at2 = this.kernel.allocate(into.capacity * 4);
      into.buffer = null;
    }
    this.views(into);
    this.kernel.writeUtf16(this.textAt, text);
    return this.kernel.scanPrepared(this.textAt, n, strip ? 1 : 0, into.at2 >= 0 ? 1 : 0, into.at1, into.at2 >= 0 ? into.at2 : 0);
  }

  /** Returns `into` with views of its buffers in the kernel's memory as it is now (made again when it has grown, which detaches views). */
  views(into: KernelWords): KernelWords {
    const buffer = this.kernel.memory.buffer;
    if (into.buffer !== buffer) {
      into.buffer = buffer;
      into.lane1 = new Int32Array(buffer, into.at1, into.capacity);
      if (into.at2 >= 0) into.lane2 = new Int32Array(buffer, into.at2, into.capacity);
    }
    return into;
  }

  /** Whether a view is of this kernel's memory (word hashes a scan left there). */
  holds(view: Int32Array): boolean {
    return view.buffer === this.kernel.memory.buffer;
  }

  /** Lays a MinHash sketcher's settings and tables out in the kernel's memory (fill rounds: at most 2^31 − 1). */
  sketcher(shingle: number, hashes: number, fillRounds: number, lengthSeed: Int32Array, probes: Int32Array): KernelSketcher {
    const seedAt = this.kernel.place(lengthSeed);
    const probesAt = this.kernel.place(probes);
    const valuesAt = this.kernel.allocate(hashes * 4);
    const roundsAt = this.kernel.allocate(hashes * 4);
    const at = this.kernel.place(Int32Array.of(shingle, hashes, fillRounds, seedAt, probesAt, valuesAt, roundsAt));
    return { at, valuesAt, hashes };
  }

  /** Sketches the `count` word hashes at `wordsAt` in this memory (count ≥ 1, from a scan here) into `values`; returns the shingle count. */
  sketch(wordsAt: number, count: number, sketcher: KernelSketcher, values: Int32Array): number {
    const shingles = this.kernel.sketch(wordsAt, count, sketcher.at);
    values.set(new Int32Array(this.kernel.memory.buffer, sketcher.valuesAt, sketcher.hashes));
    return shingles;
  }

  /** Returns where an evaluation index's table is in the kernel's memory, copying it there the first time (which may grow the memory and detach views). */
  placeEval(table: EvalTableArrays): number {
    let at = this.evalTables.get(table);
    if (at === undefined) {
      const k = this.kernel;
      const lane1 = k.place(table.lane1);
      const lane2 = k.place(table.lane2);
      const item = k.place(table.item);
      const filter = k.place(table.filter);
      at = k.place(Int32Array.of(table.mask, table.filterShift, lane1, lane2, item, filter));
      this.evalTables.set(table, at);
    }
    return at;
  }

  /** The first item of the table placed at `table` holding an m-word window of the words at w1At, w2At (two lanes, in this memory), or `best` when lower (-1: none). */
  firstOverlap(w1At: number, w2At: number, words: number, m: number, table: number, best: number): number {
    return this.kernel.firstOverlap(w1At, w2At, words, m, table, best);
  }

  /** The last scan's exact normal form: its length in code units and its 64-bit hash as two unsigned lanes. */
  exactLength(): number {
    return this.kernel.exactLength() >>> 0;
  }

  exactHigh(): number {
    return this.kernel.exactHigh() >>> 0;
  }

  exactLow(): number {
    return this.kernel.exactLow() >>> 0;
  }
}

let kernel: ScanKernel | undefined;

/** Returns this thread's scan kernel when one has been made, else undefined (then no view is of its memory). */
export function madeScanKernel(): ScanKernel | undefined {
  return kernel;
}

/** Returns this thread's scan kernel, made on first use with the scan's class table and its astral classifier. */
export function scanKernel(classes: () => Uint8Array, astralClass: (codePoint: number) => number): ScanKernel {
  return (kernel ??= new ScanKernel(classes(), astralClass));
}
