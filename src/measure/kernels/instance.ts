// Instantiating a WebAssembly kernel: once per thread, synchronously (the modules are a
// few KB), with a bump allocator over its memory for the tables and buffers its caller
// lays out there. Memory is never given back; callers reserve what they reuse.

/** What every kernel exports besides its own functions. */
interface KernelBase {
  memory: WebAssembly.Memory;
  __heap_base: WebAssembly.Global;
}

export interface KernelMemory {
  memory: WebAssembly.Memory;
  /** Reserves `bytes` (16-byte aligned, as the vector loads like) and returns their address; the memory grows as needed, which detaches views made before. */
  allocate(bytes: number): number;
  /** Copies a typed array into newly reserved memory and returns its address. */
  place(array: Uint8Array | Uint16Array | Int16Array | Int32Array): number;
  /** Writes the first `units` UTF-16 units of a text (all of it by default) at `at`, little-endian as the kernels read them. */
  writeUtf16(at: number, text: string, units?: number): void;
}

/** Why the kernels cannot run in this process, or null when they can: Node.js without WebAssembly (started with --jitless, say). */
export function kernelUnavailable(): string | null {
  return typeof WebAssembly === 'undefined'
    ? 'this Node.js runs without WebAssembly (started with --jitless?), and the language labeller and token counter run as WebAssembly kernels: run sluice without that flag'
    : null;
}

/** Instantiates a kernel from its base64 binary with the given imports (module "env"). */
export function instantiateKernel<E extends object>(base64: string, env: Record<string, unknown> = {}): E & KernelMemory {
  const unavailable = kernelUnavailable();
  if (unavailable) throw new Error(unavailable);
  const module = new WebAssembly.Module(Buffer.from(base64, 'base64'));
  const exports = new WebAssembly.Instance(module, { env }).exports as unknown as E & KernelBase;
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
  // A Buffer over the memory for Buffer.write's native UTF-16 copy, made again when the memory has grown.
  let bytes = Buffer.from(memory.buffer);
  const writeUtf16 = (at: number, text: string, units = text.length): void => {
    if (bytes.buffer !== memory.buffer) bytes = Buffer.from(memory.buffer);
    bytes.write(text, at, units * 2, 'utf16le');
  };
  return Object.assign(Object.create(null) as E & KernelMemory, exports, { allocate, place, writeUtf16 });
}
