// The part of the WebAssembly JavaScript interface the kernels use. Node 20 has all of it;
// its type package (@types/node 20) does not declare it, and the DOM library would bring
// in much else.
declare namespace WebAssembly {
  class Module {
    constructor(bytes: Uint8Array);
  }
  class Instance {
    constructor(module: Module, imports: Record<string, Record<string, unknown>>);
    readonly exports: Record<string, unknown>;
  }
  class Memory {
    readonly buffer: ArrayBuffer;
    grow(pages: number): number;
  }
  class Global {
    readonly value: unknown;
  }
}
