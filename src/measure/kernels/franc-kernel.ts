// The franc labeller's WebAssembly kernel (franc.c): instantiated once per thread, on
// first use, with a bump allocator over its memory for the tables the labeller lays out.
import { WASM_BASE64 } from './franc.generated.js';

interface FrancExports {
  memory: WebAssembly.Memory;
  __heap_base: WebAssembly.Global;
  setTables(folded: number, directId: number, internTable: number, internBits: number, idTally: number, distinctIds: number): void;
  sampleFlags(): number;
  countTrigrams(text: number, end: number): number;
  countCleaned(cleaned: number, n: number): number;
  countClasses(text: number, end: number, classes: number, counts: number, n: number): number;
  nearestDense(distinct: number, rowOf: number, rows: number, stride: number, k: number, distances: number): number;
}

export interface FrancKernel extends FrancExports {
  /** Reserves `bytes` (16-byte aligned, as the vector loads like) and returns their address; the memory grows as needed, which detaches views made before. */
  allocate(bytes: number): number;
  /** Copies a typed array into newly reserved memory and returns its address. */
  place(array: Uint8Array | Uint16Array | Int16Array | Int32Array): number;
}

let kernel: FrancKernel | undefined;

/** Why the kernel cannot run in this process, or null when it can: Node.js without WebAssembly (started with --jitless, say). */
export function kernelUnavailable(): string | null {
  return typeof WebAssembly === 'undefined'
    ? 'this Node.js runs without WebAssembly (started with --jitless?), and the language labeller runs as a WebAssembly kernel: run sluice without that flag'
    : null;
}

/** Returns this thread's kernel, instantiating it on first use (synchronously: the module is 4 KB). */
export function francKernel(): FrancKernel {
  if (kernel) return kernel;
  const unavailable = kernelUnavailable();
  if (unavailable) throw new Error(unavailable);
  const module = new WebAssembly.Module(Buffer.from(WASM_BASE64, 'base64'));
  const exports = new WebAssembly.Instance(module, {}).exports as unknown as FrancExports;
  const memory = exports.memory;
  let top = ((exports.__heap_base.value as number) + 15) & ~15;
  const allocate = (bytes: number): number => {
    const at = top;
    top = (top + bytes + 15) & ~15;
    const missing = top - memory.buffer.byteLength;
    if (missing > 0) memory.grow(Math.ceil(missing / 65536));
    return at;
  };
  const place = (array: Uint8Array | Uint16Array | Int16Array | Int32Array): number => {
    const at = allocate(array.byteLength);
    new Uint8Array(memory.buffer, at, array.byteLength).set(new Uint8Array(array.buffer, array.byteOffset, array.byteLength));
    return at;
  };
  kernel = Object.assign(Object.create(null) as FrancExports, exports, { allocate, place }) as FrancKernel;
  return kernel;
}
