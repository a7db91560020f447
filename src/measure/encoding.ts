// Encoding anomalies in decoded text: characters that mean the bytes were damaged,
// mis-decoded or tampered with. Counted per document; the judge decides which kinds
// a policy forbids.
//
// Decisions:
// - Bidirectional controls are the embeddings, overrides and isolates U+202A–U+202E
//   and U+2066–U+2069, the characters that reorder runs of text ("Trojan Source",
//   Boucher and Anderson 2021, CVE-2021-42574). The marks U+200E LRM, U+200F RLM and
//   U+061C ALM start no embedding, cannot reorder a run, and are ordinary punctuation
//   aids in Arabic, Hebrew and Persian text, so they are not anomalies: they are
//   counted apart, under MarkCounts.directionMarks.
// - Zero-width: U+200B ZERO WIDTH SPACE, U+2060 WORD JOINER, and U+FEFF anywhere but
//   at the very start (there it is a byte-order mark). U+200C ZWNJ and U+200D ZWJ are
//   part of Persian, Urdu and Indic orthography and of emoji sequences, so they are
//   counted apart, under MarkCounts.joiners.
// - An unpaired surrogate (possible in a JS string, e.g. from a JSON escape) counts
//   as replacement-char: it cannot be written in UTF-8 and becomes U+FFFD.
// - Mojibake: UTF-8 bytes decoded as windows-1252 or ISO 8859-1. Runs of characters
//   are mapped back to those bytes and counted when they form a valid multi-byte UTF-8
//   sequence (one count per sequence, i.e. per original character). See countMojibake
//   for the guards against false positives in Latin-1 languages.
import iconv from 'iconv-lite';
import type { AnomalyKind } from '../policy/types.js';
import type { AnomalyCounts, MarkCounts } from './types.js';

/** Every anomaly kind, in report order. */
export const ANOMALY_KINDS: readonly AnomalyKind[] = [
  'replacement-char',
  'control-chars',
  'bidi-controls',
  'zero-width',
  'private-use',
  'mojibake',
];

/** First and last character (as Latin-1 code points) that can stand for a UTF-8 lead byte of a multi-byte sequence. */
export const MOJIBAKE_LEAD_FIRST = 0xc2;
export const MOJIBAKE_LEAD_LAST = 0xf4;

// Decoded code points that a lone 2-byte sequence may not stand for: an É, Ê, Ë or ß
// followed by a quote, dash or symbol in real French, Portuguese or German text
// ("É…", "groß«") spells a valid sequence, and the characters it would decode to —
// Latin Extended-B's tail, IPA letters and modifier letters U+0240–U+02FF, N'Ko
// U+07C0–U+07FF — are rare as mojibake sources. (Combining marks U+0300–U+036F stay:
// decomposed Vietnamese turns into "aÌ€" for "à".)
const IMPLAUSIBLE_2_BYTE: ReadonlyArray<readonly [number, number]> = [
  [0x0240, 0x02ff],
  [0x07c0, 0x07ff],
];

/** U+00D7 MULTIPLICATION SIGN: a 2-byte lead, but typeset next to a no-break space in real text ("2 × 3"). */
const MULTIPLICATION_SIGN = 0xd7;

/** Stands for U+FFFD in the byte map: a decoder that had no character for 0x81, 0x8D, 0x8F, 0x90 or 0x9D (windows-1252 leaves them undefined). */
const LOST_BYTE = 0x100;
const UNMAPPED = -1;

/** Returns a new record with every anomaly kind at zero. */
export function emptyAnomalyCounts(): AnomalyCounts {
  return {
    'replacement-char': 0,
    'control-chars': 0,
    'bidi-controls': 0,
    'zero-width': 0,
    'private-use': 0,
    mojibake: 0,
  };
}

/** Returns a new record with every informational mark count at zero. */
export function emptyMarkCounts(): MarkCounts {
  return { joiners: 0, directionMarks: 0 };
}

/** Returns the anomaly kind a single code point (or unpaired surrogate) is, mojibake aside, or null; `atStart` says whether it is the text's first character. */
export function anomalyOf(cp: number, atStart: boolean): AnomalyKind | null {
  if (cp < 0x20) return cp === 0x09 || cp === 0x0a || cp === 0x0d ? null : 'control-chars';
  if (cp < 0x7f) return null;
  if (cp <= 0x9f) return 'control-chars'; // DEL and the C1 controls
  if (cp < 0x200b) return null;
  if (cp === 0x200b || cp === 0x2060) return 'zero-width';
  if ((cp >= 0x202a && cp <= 0x202e) || (cp >= 0x2066 && cp <= 0x2069)) return 'bidi-controls';
  // Reached only unpaired (a pair is one supplementary code point): UTF-8 cannot hold
  // it, and an encoder writes U+FFFD in its place.
  if (cp >= 0xd800 && cp <= 0xdfff) return 'replacement-char';
  if (cp >= 0xe000 && cp <= 0xf8ff) return 'private-use';
  if (cp === 0xfeff) return atStart ? null : 'zero-width';
  if (cp === 0xfffd) return 'replacement-char';
  if ((cp >= 0xf0000 && cp <= 0xffffd) || (cp >= 0x100000 && cp <= 0x10fffd)) return 'private-use';
  return null;
}

/** Returns which informational mark a code point is (joiners: ZWNJ, ZWJ; directionMarks: LRM, RLM, ALM), or null. */
export function markOf(cp: number): keyof MarkCounts | null {
  if (cp === 0x200c || cp === 0x200d) return 'joiners';
  if (cp === 0x200e || cp === 0x200f || cp === 0x061c) return 'directionMarks';
  return null;
}

/** Returns whether a BMP code point needs a closer look in the measuring pass: an anomaly, a mark, or a possible mojibake lead character. */
export function needsCloserLook(cp: number): boolean {
  return (
    anomalyOf(cp, false) !== null ||
    markOf(cp) !== null ||
    (cp >= MOJIBAKE_LEAD_FIRST && cp <= MOJIBAKE_LEAD_LAST)
  );
}

let byteMap: Int16Array | undefined;

/** Returns, per BMP code point, the windows-1252 / ISO 8859-1 byte (0x80–0xFF) it decodes from, LOST_BYTE for U+FFFD, or UNMAPPED. */
function bytesOfChars(): Int16Array {
  if (byteMap) return byteMap;
  const map = new Int16Array(0x10000).fill(UNMAPPED);
  // ISO 8859-1 maps bytes 0x80–0xFF to U+0080–U+00FF.
  for (let b = 0x80; b <= 0xff; b++) map[b] = b;
  // windows-1252 puts punctuation and letters at 0x80–0x9F. Taken from iconv-lite,
  // not TextDecoder: Node 20's TextDecoder('windows-1252') decodes as ISO 8859-1
  // (measured here: byte 0x93 gives U+0093, not U+201C).
  const cp1252 = iconv.decode(Buffer.from(Array.from({ length: 32 }, (_, k) => 0x80 + k)), 'windows-1252');
  for (let k = 0; k < cp1252.length; k++) {
    const cp = cp1252.charCodeAt(k);
    if (cp !== 0xfffd) map[cp] = 0x80 + k; // its five undefined bytes come out as U+FFFD
  }
  map[0xfffd] = LOST_BYTE;
  byteMap = map;
  return map;
}

const assigned = /^\p{Assigned}$/u;
const letter = /^\p{L}$/u;
const punctuationOrSpace = /^[\p{P}\p{Zs}]$/u;

/** Returns whether a character is an upper-case letter (it has a lower-case form and is its own upper case). */
function isUpper(ch: string): boolean {
  return ch !== ch.toLowerCase() && ch === ch.toUpperCase();
}

/**
 * Returns whether a valid sequence standing alone (no other sequence directly before or
 * after it) counts as mojibake. Alone, real text can spell one by accident:
 * - 2 bytes: an accented capital after another capital ("PERÚ»"), or decoding to an
 *   unassigned or implausible character, or the multiplication sign;
 * - 3 or 4 bytes: an accented small letter followed only by letters (Sámi "ášš",
 *   "âžž": š and ž are windows-1252 bytes 9A and 9E), or only by punctuation and
 *   spaces that end the word (French "été…»", "voilà\u00A0»").
 * Real lone mojibake ("donâ€™t", "cafÃ©", Hindi "à¤µ") mixes symbols with letters.
 */
function countsAlone(text: string, start: number, length: number, cp: number): boolean {
  if (length === 2) {
    if (text.charCodeAt(start) === MULTIPLICATION_SIGN) return false;
    if (start > 0 && isUpper(text[start - 1] as string)) return false;
    for (const [lo, hi] of IMPLAUSIBLE_2_BYTE) if (cp >= lo && cp <= hi) return false;
    return assigned.test(String.fromCodePoint(cp));
  }
  let letters = 0;
  let punctuation = 0;
  for (let k = 1; k < length; k++) {
    const ch = text[start + k] as string;
    if (letter.test(ch)) letters++;
    else if (punctuationOrSpace.test(ch)) punctuation++;
  }
  if (letters === length - 1) return false;
  // Punctuation closes a word; inside one (Vietnamese "viá»‡c" for "việc") it does not.
  if (punctuation === length - 1 && !letter.test(text[start + length] ?? ' ')) return false;
  return assigned.test(String.fromCodePoint(cp));
}

interface Sequence {
  start: number;
  end: number;
  /** Whether it would count with no other sequence next to it. */
  alone: boolean;
}

/**
 * Returns the number of UTF-8 multi-byte sequences in `text` that were decoded as
 * windows-1252 or ISO 8859-1 ("Ã©" for "é", "à¤®" for "म", "Ø§" for "ا"): characters
 * that map back to a lead byte C2–F4 followed by the right number of continuation
 * bytes 80–BF (with the first-continuation limits of RFC 3629 for E0, ED, F0, F4).
 * Sequences next to other sequences (Arabic, Cyrillic, Indic text: whole words) always
 * count, also when a U+FFFD stands for a byte the decoder had no character for; a
 * sequence standing alone counts only under the guards of countsAlone, so that
 * legitimate Latin-1 text (French, German, Portuguese, Icelandic, Sámi) is not flagged.
 */
export function countMojibake(text: string): number {
  const map = bytesOfChars();
  const found: Sequence[] = [];
  const n = text.length;
  for (let i = 0; i < n; i++) {
    const lead = map[text.charCodeAt(i)] as number;
    if (lead < MOJIBAKE_LEAD_FIRST || lead > MOJIBAKE_LEAD_LAST) continue;
    const length = lead < 0xe0 ? 2 : lead < 0xf0 ? 3 : 4;
    if (i + length > n) continue;
    // RFC 3629: the first continuation byte is narrowed after E0, ED, F0 and F4
    // (no overlong forms, no surrogates, nothing above U+10FFFF).
    const lo = lead === 0xe0 ? 0xa0 : lead === 0xf0 ? 0x90 : 0x80;
    const hi = lead === 0xed ? 0x9f : lead === 0xf4 ? 0x8f : 0xbf;
    let cp = lead & (length === 2 ? 0x1f : length === 3 ? 0x0f : 0x07);
    let lossy = false;
    let valid = true;
    for (let k = 1; k < length; k++) {
      const b = map[text.charCodeAt(i + k)] as number;
      const first = k === 1;
      if (b === LOST_BYTE) {
        // One of 0x81, 0x8D, 0x8F, 0x90, 0x9D; possible unless the lead needs A0+ next.
        if (first && lo > 0x9d) {
          valid = false;
          break;
        }
        lossy = true;
        cp = cp << 6;
      } else if (b >= (first ? lo : 0x80) && b <= (first ? hi : 0xbf)) {
        cp = (cp << 6) | (b & 0x3f);
      } else {
        valid = false;
        break;
      }
    }
    if (!valid) continue;
    found.push({ start: i, end: i + length, alone: !lossy && countsAlone(text, i, length, cp) });
    i += length - 1;
  }

  let count = 0;
  for (let s = 0; s < found.length; s++) {
    const seq = found[s] as Sequence;
    const joined = found[s - 1]?.end === seq.start || found[s + 1]?.start === seq.end;
    if (joined || seq.alone) count++;
  }
  return count;
}

/** Returns the anomalies and informational marks of `text`, counted per kind (mojibake included). */
export function countAnomalies(text: string): { anomalies: AnomalyCounts; marks: MarkCounts } {
  const anomalies = emptyAnomalyCounts();
  const marks = emptyMarkCounts();
  let leads = false;
  let index = 0;
  for (const ch of text) {
    const cp = ch.codePointAt(0) as number;
    const kind = anomalyOf(cp, index === 0);
    if (kind !== null) anomalies[kind]++;
    const mark = markOf(cp);
    if (mark !== null) marks[mark]++;
    if (cp >= MOJIBAKE_LEAD_FIRST && cp <= MOJIBAKE_LEAD_LAST) leads = true;
    index += ch.length;
  }
  if (leads) anomalies.mojibake = countMojibake(text);
  return { anomalies, marks };
}
