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
//
// The measurer's other per-character counts (Unicode Script, UTF-8 bytes, code points,
// encoding anomalies and marks) ride on the same pass (measureText): one table of the
// BMP holds each character's Script id, UTF-8 length, encoding flags and Word_Break
// class, so a character costs one load of the text and one of the table. Where the
// word rules stop, the rest of the text is counted by a plain character loop and the
// words come from Intl.Segmenter as before. Against the two separate passes it replaced
// (the measurer's character scan, then the word scan), in-process A/B of CPU time over the
// 40 MB bench corpus's documents, shared 2-core machine: the two passes' work 0.67× and
// 0.78× (best of 8 rounds each, A first and B first), 0.49× (chunks of 400 documents
// interleaved, order alternating per chunk, median of 8 rounds; this includes the kept
// offsets without a copy, below); the whole measurer, language included, 0.82–0.92× and 0.86×.
//
// The pass runs in a WebAssembly kernel (kernels/words.c, the same state machine over the same
// table) for texts up to MAX_WORD_UNITS long, and here for longer ones. Against this file's loop
// alone, in alternating pairs of one-thread `sluice check --no-cache` runs of the language, script
// and encoding policy on the 40 MB bench corpus (shared 2-core machine; same reports): 0.85× the
// CPU time (medians of 4 pairs).
import { WORD_BREAK_RANGE_STARTS, WORD_BREAK_RANGE_VALUES } from './data/word-break.generated.js';
import { anomalyOf, countMojibake, emptyAnomalyCounts, emptyMarkCounts, markOf, MOJIBAKE_LEAD_FIRST, MOJIBAKE_LEAD_LAST, needsCloserLook } from './encoding.js';
import { astralScriptId, bmpScriptIds, SCRIPT_NAMES } from './script.js';
import type { AnomalyCounts, MarkCounts } from './types.js';
import { MAX_WORD_UNITS, wordKernel } from './kernels/words-kernel.js';

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

// Bits of the one pass's per-character table (characterInfo), built at first use from
// the generated Script and Word_Break tables and encoding.ts's closer-look rule.
const SCRIPT_BITS = 0xff; // Script id (index into SCRIPT_NAMES)
const UTF8_SHIFT = 8; // bits 8–9: UTF-8 bytes, 1–3 (a lone surrogate 3, as U+FFFD)
const CLOSER_LOOK = 1 << 10; // an anomaly or informational mark: encoding.ts decides which
const MOJIBAKE_LEAD = 1 << 11; // a character that can stand for a UTF-8 lead byte
const CLASS_SHIFT = 12; // bits 12–16: the Word_Break class, with EXTENDED_PICTOGRAPHIC
/** The class bits and CLOSER_LOOK: what decides whether a character continues a run of a word's letters. */
const RUN_MASK = (31 << CLASS_SHIFT) | CLOSER_LOOK;
const IGNORABLE_RUN = IGNORABLE << CLASS_SHIFT;

let infoTable: Uint32Array | undefined;

/** Returns, per BMP code unit, its Script id, UTF-8 length, encoding flags and Word_Break class, built on first use. */
function characterInfo(): Uint32Array {
  if (infoTable) return infoTable;
  const scripts = bmpScriptIds();
  const words = classTable();
  const table = new Uint32Array(0x10000);
  for (let cp = 0; cp < 0x10000; cp++) {
    const lead = cp >= MOJIBAKE_LEAD_FIRST && cp <= MOJIBAKE_LEAD_LAST;
    table[cp] =
      (scripts[cp] as number) |
      ((cp < 0x80 ? 1 : cp < 0x800 ? 2 : 3) << UTF8_SHIFT) |
      (lead ? MOJIBAKE_LEAD : needsCloserLook(cp) ? CLOSER_LOOK : 0) |
      ((words[cp] as number) << CLASS_SHIFT);
  }
  infoTable = table;
  return table;
}

/** What the one pass counts besides words, for one text at a time (measureText resets it). */
export class CharacterTally {
  /** Characters per Script id (index into SCRIPT_NAMES), Common, Inherited and Unknown included. */
  readonly counts = new Int32Array(SCRIPT_NAMES.length);
  /** UTF-8 bytes of the text (an unpaired surrogate as the 3 bytes of U+FFFD, as Buffer.byteLength counts it). */
  bytes = 0;
  /** Code points. */
  chars = 0;
  /** A new record per text: the measurer hands it on. */
  anomalies: AnomalyCounts = emptyAnomalyCounts();
  marks: MarkCounts = emptyMarkCounts();
}

/** Counts the anomaly and mark a character flagged CLOSER_LOOK is, if any; `at` is its offset. */
function closerLook(unit: number, at: number, anomalies: AnomalyCounts, marks: MarkCounts): void {
  const kind = anomalyOf(unit, at === 0);
  if (kind !== null) anomalies[kind]++;
  const mark = markOf(unit);
  if (mark !== null) marks[mark]++;
}

/**
 * Counts the characters of `text` from `from` on into `tally` (without words): the part of
 * the one pass after the word rules stopped. `bytes` and `flags` (the OR of the table
 * entries seen) carry what the pass counted before `from`, which had no surrogate pair.
 */
function countCharactersFrom(text: string, from: number, tally: CharacterTally, bytes: number, flags: number): void {
  const table = characterInfo();
  const { counts, anomalies, marks } = tally;
  const n = text.length;
  let pairs = 0;
  for (let i = from; i < n; i++) {
    const unit = text.charCodeAt(i);
    if (unit >= 0xd800 && unit <= 0xdbff && i + 1 < n) {
      const low = text.charCodeAt(i + 1);
      if (low >= 0xdc00 && low <= 0xdfff) {
        const cp = ((unit - 0xd800) << 10) + (low - 0xdc00) + 0x10000;
        const id = astralScriptId(cp);
        counts[id] = (counts[id] as number) + 1;
        if (cp >= 0xf0000) {
          const kind = anomalyOf(cp, false); // planes 15 and 16 are private use
          if (kind !== null) anomalies[kind]++;
        }
        bytes += 4;
        pairs++;
        i++;
        continue;
      }
    }
    const info = table[unit] as number;
    const id = info & SCRIPT_BITS;
    counts[id] = (counts[id] as number) + 1;
    bytes += (info >>> UTF8_SHIFT) & 3;
    flags |= info;
    if ((info & CLOSER_LOOK) !== 0) closerLook(unit, i, anomalies, marks);
  }
  finishTally(text, tally, bytes, n - pairs, flags);
}

function finishTally(text: string, tally: CharacterTally, bytes: number, chars: number, flags: number): void {
  tally.bytes = bytes;
  tally.chars = chars;
  // Only text with a character that can stand for a UTF-8 lead byte can hold mojibake.
  if ((flags & MOJIBAKE_LEAD) !== 0) tally.anomalies.mojibake = countMojibake(text);
}

/** Where scan counts characters when its caller wants words only. */
const unusedTally = new CharacterTally();

// Offsets of the words found by a fast-path run, kept until the run is known not to
// need the segmenter, so that forEachWord never reports a partial result.
let offsets: Int32Array = new Int32Array(1024);

/**
 * Scans `text` with the UAX #29 word rules the fast path implements. Returns the number
 * of word-like segments, or -1 when the text needs Intl.Segmenter. With `record`, the
 * segments' [start, end) UTF-16 offsets are left in `offsets`. With a `tally` (reset by
 * the caller), the text's characters are counted into it, all of them also when the
 * word rules stop early; without one, the counts go to a scratch tally nobody reads.
 */
function scan(text: string, record: boolean, tally: CharacterTally | null): number {
  return kernelOn && text.length <= MAX_WORD_UNITS ? scanByKernel(text, record, tally) : scanHere(text, record, tally);
}

/** Whether scan uses the kernel (kernels/words.c); the tests compare it with the TypeScript scan. */
let kernelOn = true;

/** Makes scan use the kernel or not, for the tests that compare the two. */
export function useWordKernel(on: boolean): void {
  kernelOn = on;
}

/** The tally the kernel's closer-look call back counts into, during a scan. */
let closerInto: CharacterTally = unusedTally;
const closerLookInKernel = (unit: number, at: number): void => closerLook(unit, at, closerInto.anomalies, closerInto.marks);

/** scan in the kernel: the same words and counts, the word offsets copied out to `offsets`. */
function scanByKernel(text: string, record: boolean, tally: CharacterTally | null): number {
  const kernel = wordKernel(characterInfo, SCRIPT_NAMES.length, closerLookInKernel);
  closerInto = tally ?? unusedTally;
  const count = kernel.scan(text, record);
  if (tally !== null) tally.counts.set(kernel.counts);
  if (count < 0) {
    if (tally !== null) countCharactersFrom(text, kernel.stoppedAt(), tally, kernel.bytes(), kernel.flags());
    return -1;
  }
  if (record) {
    if (offsets.length < count * 2) offsets = new Int32Array(Math.max(1024, count * 4));
    offsets.set(kernel.offsets.subarray(0, count * 2));
  }
  if (tally !== null) finishTally(text, tally, kernel.bytes(), text.length, kernel.flags());
  return count;
}

/** scan in TypeScript, for a text longer than the kernel takes (the kernel's reference in the tests). */
function scanHere(text: string, record: boolean, tally: CharacterTally | null): number {
  const table = characterInfo();
  const into = tally ?? unusedTally;
  const { counts, anomalies, marks } = into;
  const n = text.length;
  let out = offsets; // a local: see put
  let bytes = 0;
  let flags = 0; // OR of the table entries seen: whether a mojibake lead occurred
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
    const unit = text.charCodeAt(i);
    const info = table[unit] as number;
    let cls = info >>> CLASS_SHIFT;
    if (cls >= NEEDS_SEGMENTER) {
      // WB3c (ZWJ × Extended_Pictographic) is not implemented: emoji sequences go to the segmenter.
      if ((cls & EXTENDED_PICTOGRAPHIC) !== 0 && i > 0 && text.charCodeAt(i - 1) === ZWJ) return stop(text, i, tally, bytes, flags, out);
      cls &= CLASS_MASK;
      if (cls === NEEDS_SEGMENTER) return stop(text, i, tally, bytes, flags, out);
    }
    const id = info & SCRIPT_BITS;
    counts[id] = (counts[id] as number) + 1;
    bytes += (info >>> UTF8_SHIFT) & 3;
    flags |= info;
    if ((info & CLOSER_LOOK) !== 0) closerLook(unit, i, anomalies, marks);

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
        if (cls === EXTEND_NUM_LET) continue;
      } else {
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
        if (wordLike(last, hasCore, connectors, end > coreEnd)) {
          if (record) out = put(out, count, start, end);
          count++;
        }
        state = OUT;
        continue; // a Mid or Other character never starts a word
      }
    } else {
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
        } else {
          // Not joined: the word ends before the Mid character (this character is then
          // looked at afresh), except that WB7a keeps a single quote after a Hebrew letter.
          const e = pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors);
          if (e >= 0) {
            if (record) out = put(out, count, start, e);
            count++;
          }
          state = OUT;
        }
      }
      if (state === OUT) {
        if (cls < ALETTER || cls > EXTEND_NUM_LET) continue;
        state = IN;
        start = i;
        end = coreEnd = i + 1;
        last = cls;
        hasCore = cls !== EXTEND_NUM_LET;
        connectors = cls === EXTEND_NUM_LET ? 1 : 0;
        if (cls === EXTEND_NUM_LET) continue;
      }
    }

    // Here the word's last character is a letter or digit (`last`) at i. The rest of a run
    // of characters of that same class and of Extend/Format characters (WB4) — most of any
    // text — in a loop of its own: such a character only moves the word's end (coreEnd
    // matters only while `last` is ExtendNumLet); one that needs a closer look leaves the loop.
    const same = last << CLASS_SHIFT;
    while (i + 1 < n) {
      const next = table[text.charCodeAt(i + 1)] as number;
      const run = next & RUN_MASK;
      if (run !== same && run !== IGNORABLE_RUN) break;
      const nextId = next & SCRIPT_BITS;
      counts[nextId] = (counts[nextId] as number) + 1;
      bytes += (next >>> UTF8_SHIFT) & 3;
      flags |= next;
      i++;
    }
    end = i + 1;
  }

  const e = state === IN ? (wordLike(last, hasCore, connectors, end > coreEnd) ? end : -1) : state === PENDING ? pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors) : -1;
  if (e >= 0) {
    if (record) out = put(out, count, start, e);
    count++;
  }
  offsets = out;
  if (tally !== null) finishTally(text, tally, bytes, n, flags);
  return count;
}

/** Ends a scan whose word rules stopped at `at`: counts the rest of the characters into `tally`, if any; returns -1. */
function stop(text: string, at: number, tally: CharacterTally | null, bytes: number, flags: number, out: Int32Array): number {
  offsets = out;
  if (tally !== null) countCharactersFrom(text, at, tally, bytes, flags);
  return -1;
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

/** Returns the end of a word whose pending Mid character did not join it, or -1 when the word is not word-like. */
function pendingEnd(
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
  if (last === HEBREW_LETTER && mid === SINGLE_QUOTE) return midEnd === midAt ? midEnd : -1;
  return wordLike(last, hasCore, connectors, end > coreEnd) ? end : -1;
}

/**
 * Records the offsets of word `count` in `out`; returns `out`, or a longer copy of it when it was full.
 * The scan passes its buffer in and out rather than use the module's `offsets`, which costs a
 * context load per word: in-process A/B of measureText, CPU time, 40 MB bench corpus, chunks of
 * 400 documents interleaved in alternating order, median of 8 rounds, shared 2-core machine:
 * 0.975× and 0.965× (two runs).
 */
function put(out: Int32Array, count: number, start: number, end: number): Int32Array {
  if (out.length < (count + 1) * 2) {
    const grown = new Int32Array(Math.max(1024, out.length * 2)); // a memo copy may be short
    grown.set(out);
    out = grown;
  }
  out[count * 2] = start;
  out[count * 2 + 1] = end;
  return out;
}

/** Returns the number of word-like segments Intl.Segmenter finds in `text` in one call (the reference the fast path and segmenterWords must equal). */
export function countWordsWithSegmenter(text: string): number {
  let count = 0;
  for (const s of wordSegmenter().segment(text)) if (s.isWordLike) count++;
  return count;
}

/**
 * Units of text handed to Intl.Segmenter at once. Its word iterator slows down badly on long
 * strings: on this machine class, 13 ms for 10,000 units of mixed English, Chinese and emoji,
 * 104 ms for 40,000 and 9.4 s for 80,000 (one run each); 267,247 units of English and Hindi took
 * 70 s. So a long text is cut into pieces of about this size at points where the word rules break
 * whatever surrounds them (see isSafeCut), and the pieces are segmented one by one.
 */
export const SEGMENTER_PIECE_UNITS = 8192;

/**
 * The longest piece handed to Intl.Segmenter. The slowdown is a cliff at 2^16 units, whatever the
 * script, once the string has many segments: Chinese from UDHR without punctuation took 183 ms for
 * 65,000 units and 5.0 s for 65,600; 100,000 units took 4.8 s of Thai without spaces, 9.4 s of
 * emoji, 12.5 s of kana, 8.4 s of "abc😀" repeated, and 2 ms of one 100,000-letter word (one run
 * each, Node 20, this machine class). A piece is kept well below the cliff.
 */
export const SEGMENTER_MAX_UNITS = 49152;

/**
 * Context either side of a forced cut that the cut is chosen in (see forcedCut): the word rules
 * look a few characters around a point, and the dictionary segmentation of Chinese, Japanese and
 * Thai settles on the same words well within this distance.
 */
const FORCED_CUT_CONTEXT = 512;

/**
 * Whether UAX #29 breaks between text[p − 1] and text[p] whatever comes before and after, so that
 * the words of text[0, p) and of text[p, …) segmented apart are those of the whole. text[p] is
 * never white space (WB3d), Extend, Format or ZWJ (WB4 would attach it to the left) or a
 * surrogate; and text[p − 1] is
 * - a space (WSegSpace), a line feed (WB3a) or U+3002 IDEOGRAPHIC FULL STOP (Other): no rule
 *   joins them to what follows or looks through them (WB6, WB7, WB7b/c, WB11, WB12 need a
 *   letter, digit or Mid character there; WB3c a ZWJ; WB15/16 a regional indicator); or
 * - one of the ideographic comma and the fullwidth comma, semicolon, exclamation and question
 *   marks (Other or MidNum), when text[p] is no letter, digit or connector, so that WB6/7 and
 *   WB11/12 cannot join across them; or their ASCII forms or the colon (MidNum, MidNumLet,
 *   MidLetter, Other) before a Han ideograph or kana: the text of a language written without
 *   spaces, whose sentences may run long without a full stop.
 * test/measure/words.test.ts compares cut and whole segmentation on random strings.
 */
function isSafeCut(text: string, p: number): boolean {
  const unit = text.charCodeAt(p);
  if (unit >= 0xd800 && unit <= 0xdfff) return false;
  if (/\s/.test(text[p]!)) return false;
  const cls = (classTable()[unit] as number) & CLASS_MASK;
  if (cls === IGNORABLE) return false;
  const before = text.charCodeAt(p - 1);
  if (before === 0x20 || before === 0x0a || before === 0x3002) return true;
  if (before === 0x3001 || before === 0xff0c || before === 0xff1b || before === 0xff01 || before === 0xff1f) {
    // 、，；！？
    return cls !== ALETTER && cls !== HEBREW_LETTER && cls !== NUMERIC && cls !== EXTEND_NUM_LET;
  }
  if (before === 0x2e || before === 0x2c || before === 0x3b || before === 0x21 || before === 0x3f || before === 0x3a) {
    // . , ; ! ? : before a Han ideograph or kana only: ICU counts the letters of Thai, Lao, Khmer
    // and Myanmar as letters here (WB6/7 join them across . and :), and its table here does not
    // tell them from Han.
    return (unit >= 0x3040 && unit <= 0x30ff) || (unit >= 0x3400 && unit <= 0x4dbf) || (unit >= 0x4e00 && unit <= 0x9fff) || (unit >= 0xf900 && unit <= 0xfaff);
  }
  return false;
}

/**
 * Returns where to cut a text that has no safe cut (isSafeCut) for too long, at or after `target`:
 * the first boundary that Intl.Segmenter puts at least FORCED_CUT_CONTEXT units inside a window of
 * the text around it, or the text's length when no window up to the end has one (one long
 * segment, which the segmenter takes quickly). Unlike a safe cut this relies on the segmentation
 * at a point not depending on text further away than that context: true of the word rules but for
 * a run of regional indicators or of Extend and Format characters that long, and of the dictionary
 * segmentation of Chinese, Japanese and Thai on the texts of the tests (UDHR without punctuation,
 * kana, emoji). Where it failed, a word at the cut would be counted as two or two as one.
 */
function forcedCut(text: string, target: number): number {
  const n = text.length;
  for (let at = target; at + FORCED_CUT_CONTEXT < n; at += FORCED_CUT_CONTEXT) {
    const from = Math.max(0, at - FORCED_CUT_CONTEXT);
    const to = Math.min(n, at + 2 * FORCED_CUT_CONTEXT);
    for (const s of wordSegmenter().segment(text.slice(from, to))) {
      const b = from + s.index;
      if (b < at) continue;
      if (b + FORCED_CUT_CONTEXT > to) break;
      return b;
    }
  }
  return n;
}

/**
 * Calls `onWord` with the [start, end) offsets of each word-like segment Intl.Segmenter finds in
 * `text`, segmenting a long text in pieces of about `pieceUnits` cut where the word rules always
 * break (the same words as one call; the tests make the pieces tiny to prove it). A piece is never
 * longer than `maxPieceUnits` unless it is one long segment: where a text has no safe cut for that
 * long, it is cut at a boundary the segmenter finds around the point (forcedCut).
 */
export function segmenterWords(
  text: string,
  onWord: (start: number, end: number) => void,
  pieceUnits = SEGMENTER_PIECE_UNITS,
  maxPieceUnits = SEGMENTER_MAX_UNITS,
): void {
  const n = text.length;
  let from = 0;
  while (from < n) {
    let cut = n;
    if (n - from > pieceUnits) {
      const last = Math.min(n, from + maxPieceUnits);
      for (let p = from + pieceUnits; p < last; p++) {
        if (isSafeCut(text, p)) {
          cut = p;
          break;
        }
      }
      // No safe cut there (cut is still n: no space, newline or ideographic punctuation): cut where
      // the segmenter breaks, ending the piece within maxPieceUnits when it can.
      if (cut === n && n - from > maxPieceUnits) cut = forcedCut(text, Math.max(from + 1, from + maxPieceUnits - 2 * FORCED_CUT_CONTEXT));
    }
    const piece = from === 0 && cut === n ? text : text.slice(from, cut);
    for (const s of wordSegmenter().segment(piece)) if (s.isWordLike) onWord(from + s.index, from + s.index + s.segment.length);
    from = cut;
  }
}

/** Returns the number of word-like segments in `text` by segmenterWords. */
function countSegmenterWords(text: string): number {
  let count = 0;
  segmenterWords(text, () => {
    count++;
  });
  return count;
}

// The word offsets of the last text counted: the measurer counts a document's words, then the
// tokenizer's fertility walks the same words; keeping the offsets saves that second scan (about
// 4 % of a full check's time on the bench corpus, where words were scanned twice per document).
let memoText: string | null = null;
let memoCount = 0;
let memoOffsets: Int32Array = new Int32Array(1024);
/** forEachWord walks of memoOffsets under way: a callback may count other texts meanwhile. */
let memoWalks = 0;

/** Returns the number of word-like segments in `text` by UAX #29 word boundaries, the same count Intl.Segmenter gives. */
export function countWords(text: string): number {
  return wordsOf(text, scan(text, true, null));
}

/**
 * Returns the number of word-like segments in `text`, as countWords, and counts its
 * characters into `tally` (reset first): per Script, UTF-8 bytes, code points, encoding
 * anomalies (mojibake included) and marks, as encoding.ts defines them. One pass.
 */
export function measureText(text: string, tally: CharacterTally): number {
  tally.counts.fill(0);
  tally.anomalies = emptyAnomalyCounts();
  tally.marks = emptyMarkCounts();
  return wordsOf(text, scan(text, true, tally));
}

/** Returns the word count of a text that scan found `fast` words in (-1: ask Intl.Segmenter), and keeps its offsets for forEachWord. */
function wordsOf(text: string, fast: number): number {
  if (fast < 0) {
    memoText = null;
    return countSegmenterWords(text);
  }
  if (memoWalks === 0) {
    // The scan's buffer becomes the memo and the old memo the next scan's buffer: no copy and
    // no new array per text. The copy and its allocation were 0.09 s per round of the measure
    // stage on the 40 MB bench corpus (5 % of it, CPU profile); without them measureText takes
    // 0.91× (in-process A/B, CPU time, chunks of 400 documents interleaved in alternating
    // order, median of 8 rounds, shared 2-core machine).
    const spare = memoOffsets;
    memoOffsets = offsets;
    offsets = spare;
  } else {
    // Counted from inside a forEachWord callback: the memo being walked must stay as it is.
    memoOffsets = offsets.slice(0, fast * 2);
  }
  memoCount = fast;
  memoText = text;
  return fast;
}

/** Calls `onWord` with the UTF-16 [start, end) offsets of each word-like segment of `text`, in order; returns nothing. */
export function forEachWord(text: string, onWord: (start: number, end: number) => void): void {
  if (memoText !== null && text === memoText) {
    const found = memoOffsets;
    const fast = memoCount;
    memoWalks++;
    try {
      for (let w = 0; w < fast; w++) onWord(found[w * 2] as number, found[w * 2 + 1] as number);
    } finally {
      memoWalks--;
    }
    return;
  }
  const fast = scan(text, true, null);
  if (fast >= 0) {
    // Copy out first: `onWord` may itself segment text and reuse the buffer.
    const found = offsets.slice(0, fast * 2);
    for (let w = 0; w < fast; w++) onWord(found[w * 2] as number, found[w * 2 + 1] as number);
    return;
  }
  segmenterWords(text, onWord);
}

/**
 * Returns the words of `text` as [start, end) UTF-16 offsets, two per word in order (the same
 * words forEachWord reports), or null when the text needs Intl.Segmenter. For the text last
 * counted (countWords, measureText) they are a view of the memo, no copy: the caller reads them
 * before counting the words of any other text (the next count reuses the memo's buffer) and
 * never writes to them.
 */
export function wordOffsets(text: string): Int32Array | null {
  if (memoText !== null && text === memoText) return memoOffsets.subarray(0, memoCount * 2);
  const fast = scan(text, true, null);
  return fast < 0 ? null : offsets.slice(0, fast * 2);
}

/** Returns whether `text` is outside the fast path and is segmented by Intl.Segmenter. */
export function needsSegmenter(text: string): boolean {
  return scan(text, false, null) < 0;
}
