// The franc labeller's WebAssembly kernel (franc.c), instantiated once per thread on first use.
import { WASM_BASE64 } from './franc.generated.js';
import { instantiateKernel, type KernelMemory } from './instance.js';

interface FrancExports {
  setTables(folded: number, directId: number, internTable: number, internBits: number, idTally: number, distinctIds: number, ids: number): void;
  sampleFlags(): number;
  countTrigrams(text: number, end: number): number;
  countCleaned(cleaned: number, n: number): number;
  countClasses(text: number, end: number, classes: number, counts: number, n: number): number;
  nearestDense(distinct: number, rowOf: number, rows: number, stride: number, k: number, distances: number): number;
}

export type FrancKernel = FrancExports & KernelMemory;

let kernel: FrancKernel | undefined;

/** Returns this thread's kernel, instantiating it on first use. */
export function francKernel(): FrancKernel {
  return (kernel ??= instantiateKernel<FrancExports>(WASM_BASE64));
}
