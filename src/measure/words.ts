// Word-like segments by Unicode word boundaries (UAX #29), as Intl.Segmenter with
// `granularity: 'word'` reports them through `isWordLike`.
//
// Intl.Segmenter runs at only 2.4–3.5 MB/s on Brown paragraphs on this machine class
// (scripts/bench-measure.mjs; it also slows down on long strings), too slow for the
// whole measurer's goal of 15 MB/s; the fast path runs at 100–160 MB/s on the same
// paragraphs (40x, one run) and 200–400 MB/s on Hindi. So texts made only of characters
// whose rules are implemented here (letters, digits and punctuation of the scripts that
// separate words with spaces or punctuation: Latin, Cyrillic, Greek, Arabic, Hebrew,
// Devanagari and the other Indic scripts, ...) are segmented by a state machine over a
// generated Word_Break table. Any other text — Thai, Lao, Khmer, Myanmar (dictionary
// segmentation), Han, Hiragana, Katakana, Hangul, emoji, regional indicators, any
// character outside the Basic Multilingual Plane, or one the running engine does not
// assign — goes to Intl.Segmenter as a whole. Tests prove both give the same segments
// (on Node 20 with ICU 78, Unicode 17, the version of the generated table).
import { WORD_BREAK_RANGE_STARTS, WORD_BREAK_RANGE_VALUES } from './data/word-break.generated.js';

// Classes of the generated table (scripts/gen-word-break.mjs).
const OTHER = 0;
const ALETTER = 1;
const HEBREW_LETTER = 2;
const NUMERIC = 3;
const EXTEND_NUM_LET = 4;
const MID_LETTER = 5;
const MID_NUM = 6;
const MID_NUM_LET = 7;
const SINGLE_QUOTE = 8;
const DOUBLE_QUOTE = 9;
/** Extend, Format and ZWJ: ignored inside a word (WB4). */
const IGNORABLE = 10;
const NEEDS_SEGMENTER = 11;
const CLASS_MASK = 15;
const EXTENDED_PICTOGRAPHIC = 16;
const ZWJ = 0x200d;

// States of the scanner.
const OUT = 0; // between words
const IN = 1; // inside a word
const PENDING = 2; // inside a word, after a MidLetter/MidNum/quote that joins only if the right character follows (WB6/7, WB7b/c, WB11/12)

/** Locale of the reference segmenter: the root rules, whatever the process locale (some locales tailor word breaks). */
const SEGMENTER_LOCALE = 'und';

let segmenter: Intl.Segmenter | undefined;
let classes: Uint8Array | undefined;

/** Returns the Word_Break class table of the BMP, built on first use. */
function classTable(): Uint8Array {
  if (classes) return classes;
  const table = new Uint8Array(0x10000);
  for (let r = 0; r < WORD_BREAK_RANGE_STARTS.length; r++) {
    const end = WORD_BREAK_RANGE_STARTS[r + 1] ?? 0x10000;
    table.fill(WORD_BREAK_RANGE_VALUES[r] as number, WORD_BREAK_RANGE_STARTS[r] as number, end);
  }
  // The table is Unicode 17; an engine with older Unicode data treats characters it
  // does not assign as Other, so those go to Intl.Segmenter rather than guessing.
  let probe = '';
  for (let cp = 0; cp < 0x10000; cp++) {
    const cls = (table[cp] as number) & CLASS_MASK;
    if (cls !== OTHER && cls !== NEEDS_SEGMENTER) probe += String.fromCharCode(cp);
  }
  for (const m of probe.matchAll(/\P{Assigned}/gu)) {
    const cp = m[0].charCodeAt(0);
    table[cp] = ((table[cp] as number) & ~CLASS_MASK) | NEEDS_SEGMENTER;
  }
  classes = table;
  return table;
}

/** Returns the shared root-locale word segmenter. */
function wordSegmenter(): Intl.Segmenter {
  segmenter ??= new Intl.Segmenter(SEGMENTER_LOCALE, { granularity: 'word' });
  return segmenter;
}

// Offsets of the words found by a fast-path run, kept until the run is known not to
// need the segmenter, so that forEachWord never reports a partial result.
let offsets = new Int32Array(1024);

/**
 * Scans `text` with the UAX #29 word rules the fast path implements. Returns the number
 * of word-like segments, or -1 when the text needs Intl.Segmenter. With `record`, the
 * segments' [start, end) UTF-16 offsets are left in `offsets`.
 */
function scan(text: string, record: boolean): number {
  const table = classTable();
  const n = text.length;
  let count = 0;
  let state = OUT;
  let start = 0; // first unit of the current word
  let end = 0; // end of the word so far (after its last letter/digit and what WB4 attaches)
  let coreEnd = 0; // end of the word's last letter, digit or ExtendNumLet itself
  let midAt = 0; // end of the pending Mid character itself
  let midEnd = 0; // end of the pending Mid character and what WB4 attaches to it
  let last = OTHER; // class of the last letter/digit/ExtendNumLet of the word
  let mid = OTHER; // class of the pending Mid character
  let hasCore = false; // the word holds a letter or digit
  let connectors = 0; // ExtendNumLet characters in the word

  for (let i = 0; i < n; i++) {
    let cls = table[text.charCodeAt(i)] as number;
    if (cls >= NEEDS_SEGMENTER) {
      // WB3c (ZWJ × Extended_Pictographic) is not implemented: emoji sequences go to the segmenter.
      if ((cls & EXTENDED_PICTOGRAPHIC) !== 0 && i > 0 && text.charCodeAt(i - 1) === ZWJ) return -1;
      cls &= CLASS_MASK;
      if (cls === NEEDS_SEGMENTER) return -1;
    }

    if (state === IN) {
      if (cls === IGNORABLE) {
        end = i + 1; // WB4
        continue;
      }
      if (cls >= ALETTER && cls <= EXTEND_NUM_LET) {
        // WB5, WB8, WB9, WB10, WB13a, WB13b: letters, digits and connectors join each other.
        if (cls === EXTEND_NUM_LET) connectors++;
        else hasCore = true;
        last = cls;
        end = coreEnd = i + 1;
        continue;
      }
      const letterBefore = last === ALETTER || last === HEBREW_LETTER;
      if (
        (cls === MID_LETTER && letterBefore) || // WB6
        ((cls === MID_NUM_LET || cls === SINGLE_QUOTE) && (letterBefore || last === NUMERIC)) || // WB6, WB12, WB7a
        (cls === MID_NUM && last === NUMERIC) || // WB12
        (cls === DOUBLE_QUOTE && last === HEBREW_LETTER) // WB7b
      ) {
        state = PENDING;
        mid = cls;
        midAt = midEnd = i + 1;
        continue;
      }
      count = emit(record, count, start, end, wordLike(last, hasCore, connectors, end > coreEnd));
      state = OUT;
      continue; // a Mid or Other character never starts a word
    }

    if (state === PENDING) {
      if (cls === IGNORABLE) {
        midEnd = i + 1; // WB4
        continue;
      }
      const letter = cls === ALETTER || cls === HEBREW_LETTER;
      if (
        (letter && (last === ALETTER || last === HEBREW_LETTER) && mid !== MID_NUM && mid !== DOUBLE_QUOTE) || // WB7
        (cls === HEBREW_LETTER && last === HEBREW_LETTER && mid === DOUBLE_QUOTE) || // WB7c
        (cls === NUMERIC && last === NUMERIC && mid !== MID_LETTER && mid !== DOUBLE_QUOTE) // WB11
      ) {
        hasCore = true;
        last = cls;
        end = coreEnd = i + 1;
        state = IN;
        continue;
      }
      // Not joined: the word ends before the Mid character (this character is then
      // looked at afresh), except that WB7a keeps a single quote after a Hebrew letter.
      count = endPending(record, count, start, end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors);
      state = OUT;
    }

    if (cls >= ALETTER && cls <= EXTEND_NUM_LET) {
      state = IN;
      start = i;
      end = coreEnd = i + 1;
      last = cls;
      hasCore = cls !== EXTEND_NUM_LET;
      connectors = cls === EXTEND_NUM_LET ? 1 : 0;
    }
  }

  if (state === IN) count = emit(record, count, start, end, wordLike(last, hasCore, connectors, end > coreEnd));
  else if (state === PENDING) {
    count = endPending(record, count, start, end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors);
  }
  return count;
}

/**
 * Returns whether ICU marks a finished segment word-like (measured against Intl.Segmenter):
 * it must hold a letter or digit, or at least two ExtendNumLet characters (`__` is
 * word-like, a lone `_` is not); and a segment whose last letter-like character is an
 * ExtendNumLet followed by Extend/Format characters (`a_` + U+0301) is not.
 */
function wordLike(last: number, hasCore: boolean, connectors: number, trailingIgnorables: boolean): boolean {
  if (!hasCore && connectors < 2) return false;
  return !(last === EXTEND_NUM_LET && trailingIgnorables);
}

/** Ends a word whose pending Mid character did not join it; returns the new count. */
function endPending(
  record: boolean,
  count: number,
  start: number,
  end: number,
  coreEnd: number,
  midAt: number,
  midEnd: number,
  last: number,
  mid: number,
  hasCore: boolean,
  connectors: number,
): number {
  // WB7a: the quote stays with the Hebrew letter; like a trailing ExtendNumLet, the
  // segment is not word-like when Extend/Format characters follow the quote.
  if (last === HEBREW_LETTER && mid === SINGLE_QUOTE) return emit(record, count, start, midEnd, midEnd === midAt);
  return emit(record, count, start, end, wordLike(last, hasCore, connectors, end > coreEnd));
}

/** Counts a finished segment if it is word-like and records its offsets; returns the new count. */
function emit(record: boolean, count: number, start: number, end: number, isWordLike: boolean): number {
  if (!isWordLike) return count;
  if (record) {
    if (offsets.length < (count + 1) * 2) {
      const grown = new Int32Array(offsets.length * 2);
      grown.set(offsets);
      offsets = grown;
    }
    offsets[count * 2] = start;
    offsets[count * 2 + 1] = end;
  }
  return count + 1;
}

/** Returns the number of word-like segments Intl.Segmenter finds in `text` (the reference the fast path must equal). */
export function countWordsWithSegmenter(text: string): number {
  let count = 0;
  for (const s of wordSegmenter().segment(text)) if (s.isWordLike) count++;
  return count;
}

// The word offsets of the last text counted: the measurer counts a document's words, then the
// tokenizer's fertility walks the same words; keeping the offsets saves that second scan (about
// 4 % of a full check's time on the bench corpus, where words were scanned twice per document).
let memoText: string | null = null;
let memoCount = 0;
let memoOffsets: Int32Array = new Int32Array(0);

/** Returns the number of word-like segments in `text` by UAX #29 word boundaries, the same count Intl.Segmenter gives. */
export function countWords(text: string): number {
  const fast = scan(text, true);
  if (fast < 0) {
    memoText = null;
    return countWordsWithSegmenter(text);
  }
  // A copy of its own: a caller of forEachWord may count other texts from inside its callback.
  memoOffsets = offsets.slice(0, fast * 2);
  memoCount = fast;
  memoText = text;
  return fast;
}

/** Calls `onWord` with the UTF-16 [start, end) offsets of each word-like segment of `text`, in order; returns nothing. */
export function forEachWord(text: string, onWord: (start: number, end: number) => void): void {
  let found: Int32Array;
  let fast: number;
  if (memoText !== null && text === memoText) {
    found = memoOffsets;
    fast = memoCount;
  } else {
    fast = scan(text, true);
    // Copy out first: `onWord` may itself segment text and reuse the buffer.
    found = fast >= 0 ? offsets.slice(0, fast * 2) : offsets;
  }
  if (fast >= 0) {
    for (let w = 0; w < fast; w++) onWord(found[w * 2] as number, found[w * 2 + 1] as number);
    return;
  }
  for (const s of wordSegmenter().segment(text)) {
    if (s.isWordLike) onWord(s.index, s.index + s.segment.length);
  }
}

/**
 * Returns the words of `text` as [start, end) UTF-16 offsets, two per word in order (the same
 * words forEachWord reports), or null when the text needs Intl.Segmenter. The offsets of the
 * text countWords last counted are the memo's own, shared: the caller must not write to them.
 */
export function wordOffsets(text: string): Int32Array | null {
  if (memoText !== null && text === memoText) return memoOffsets;
  const fast = scan(text, true);
  return fast < 0 ? null : offsets.slice(0, fast * 2);
}

/** Returns whether `text` is outside the fast path and is segmented by Intl.Segmenter. */
export function needsSegmenter(text: string): boolean {
  return scan(text, false) < 0;
}
