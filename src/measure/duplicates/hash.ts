// 32-bit mixing primitives. Everything is Math.imul arithmetic on 32-bit halves so the
// hot loops never touch BigInt; a 64-bit value is carried as two independent lanes.

/** Returns `h` passed through the MurmurHash3 finalizer (a bijection on 32 bits with full avalanche), as a signed 32-bit integer. */
export function mix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return h ^ (h >>> 16);
}

/** Returns a second 32-bit finalizer, independent of mix32 (constants of the "lowbias32" mixer), as a signed 32-bit integer. */
export function mix32b(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x7feb352d);
  h ^= h >>> 15;
  h = Math.imul(h, 0x846ca68b);
  return h ^ (h >>> 16);
}

// Hot loops use the signed forms: in V8 an unsigned result above 2^31 is not a small integer,
// and a call that is not inlined must box it as a heap number.

/** Returns mix32(h) as an unsigned 32-bit integer. */
export function fmix32(h: number): number {
  return mix32(h) >>> 0;
}

/** Returns mix32b(h) as an unsigned 32-bit integer. */
export function fmix32b(h: number): number {
  return mix32b(h) >>> 0;
}

// The 64-bit string hash: two FNV-1a-style lanes, one step per UTF-16 code unit, then the
// length and a cross-mixed finalization. Lane 1 uses FNV's 32-bit offset basis and prime;
// lane 2 another basis and MurmurHash2's multiplier. Both multipliers are odd, so every step is
// a bijection of the lane state and the lanes drift apart from the first code unit.
export const EXACT_BASIS_1 = 0x811c9dc5 | 0;
export const EXACT_BASIS_2 = 0x6c62272e | 0;
export const EXACT_PRIME_1 = 0x01000193;
export const EXACT_PRIME_2 = 0x5bd1e995;

/** Writes the finalized 64-bit hash of the lanes to `out.exactHigh` and `out.exactLow` (unsigned). */
export function finishExact(h1: number, h2: number, length: number, out: { exactHigh: number; exactLow: number }): void {
  h1 ^= length;
  h2 = (h2 + length) | 0;
  h1 = (h1 + h2) | 0;
  h2 = (h2 + h1) | 0;
  h1 = mix32(h1);
  h2 = mix32b(h2);
  h1 = (h1 + h2) | 0;
  h2 = (h2 + h1) | 0;
  out.exactHigh = h1 >>> 0;
  out.exactLow = h2 >>> 0;
}

/** Returns the 64-bit hash of a string's UTF-16 code units as 16 hex digits (the exact-duplicate hash of an already normalized text). */
export function hashString64(s: string): string {
  let h1 = EXACT_BASIS_1;
  let h2 = EXACT_BASIS_2;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, EXACT_PRIME_1);
    h2 = Math.imul(h2 ^ c, EXACT_PRIME_2);
  }
  const out = { exactHigh: 0, exactLow: 0 };
  finishExact(h1, h2, s.length, out);
  return hex64(out.exactHigh, out.exactLow);
}

/** Returns a 64-bit value as 16 lowercase hex digits (high lane first). */
export function hex64(hi: number, lo: number): string {
  return (hi >>> 0).toString(16).padStart(8, '0') + (lo >>> 0).toString(16).padStart(8, '0');
}
