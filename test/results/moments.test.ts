// The sampling moments (sums of squares and cross products of per-document counts) are kept
// exactly, so a shard's figures are the same however its documents were split into batches,
// even once a sum passes 2^53, where adding floats in another order would change the last bits.
// BigInt arithmetic is the reference for the exact sums.
import { describe, expect, it } from 'vitest';
import type { DocumentMeasure } from '../../src/measure/types.js';
import { MomentTally } from '../../src/results/sample.js';
import { generator } from '../fixtures/prng.js';

/** A measured document of `bytes` bytes (the other counts follow from it), in English. */
function doc(bytes: number): DocumentMeasure {
  return {
    bytes,
    chars: bytes,
    words: Math.floor(bytes / 6),
    scripts: { Latin: bytes },
    dominantScript: 'Latin',
    detected: 'eng',
    language: 'eng',
    purity: 1,
    anomalies: { 'replacement-char': 0, 'control-chars': 0, 'bidi-controls': 0, 'zero-width': 0, 'private-use': 0, mojibake: 0 },
    marks: {},
  } as unknown as DocumentMeasure;
}

describe('sampling moments', () => {
  it('are exact past 2^53 and equal whatever the batches, where float sums in another order differ', () => {
    const rand = generator(11);
    // Documents of up to 90 MB: each square below 2^53, their sum far above it.
    const sizes = Array.from({ length: 400 }, () => 1 + Math.floor(rand() * 90e6));
    const exact = sizes.reduce((n, b) => n + BigInt(b) * BigInt(b), 0n);
    expect(exact > 2n ** 53n).toBe(true);

    const whole = new MomentTally();
    for (const b of sizes) whole.add(doc(b));
    expect(whole.moments.eng!.bytes2).toBe(Number(exact));

    for (const cut of [1, 7, 133, 399]) {
      const first = new MomentTally();
      const second = new MomentTally();
      sizes.slice(0, cut).forEach((b) => first.add(doc(b)));
      sizes.slice(cut).forEach((b) => second.add(doc(b)));
      const joined = new MomentTally();
      joined.absorb(first.state());
      joined.absorb(second.state());
      expect(JSON.stringify(joined.moments), `cut at ${cut}`).toBe(JSON.stringify(whole.moments));
    }

    // What floats would have done: the same squares summed in two orders.
    const forward = sizes.reduce((n, b) => n + b * b, 0);
    const backward = [...sizes].reverse().reduce((n, b) => n + b * b, 0);
    expect(forward === backward && forward === Number(exact)).toBe(false);
  });
});
