// A faster scorer over franc's own trigram profiles that gives the same label as
// `franc(text, { only, minLength })`. franc follows Cavnar and Trenkle (1994,
// "N-Gram-Based Text Categorization"): it takes the script whose expression matches
// most characters of the first 2048 UTF-16 units, and for a script shared by several
// languages sums, over the distinct trigrams of the cleaned sample, the distance
// |count − rank − 1| to each language's ranked profile (300 for a trigram missing
// from it); the smallest sum wins, the first in franc's data order on a tie.
//
// Why not call franc (scripts/bench-measure.mjs, Brown paragraphs, one run, this
// machine class): franc with `only` runs at 1.8–2.2 MB/s with 2 candidates and
// 0.8 MB/s with the 24 Latin candidates, and its trigram step alone (trigram-utils
// `asTuples`: string slices into an object dictionary, then a sort) runs at 2.8 MB/s,
// i.e. it is most of franc's time; its script step (30 regular expressions over the
// sample) runs at 34 MB/s. Here the sample is cleaned and its trigrams counted in one
// pass over the text, in typed arrays by interned trigram id (found by direct index for
// a–z and space, hashed otherwise), the profiles are inverted over those ids so that all
// candidates are scored in one pass, and the script is picked with a generated table
// (scripts/gen-franc-scripts.mjs), or not at all for an ASCII sample. Same integer
// arithmetic, so the labels are equal (a test checks this on UDHR and Brown); it runs
// at 27–33 MB/s with 24 candidates and ~70 MB/s on Hindi with 3 (30–40x and 15x franc).
//
// Judging from a shorter prefix than franc's 2048 units was the other option; it was
// not needed for the measurer's goal (15 MB/s on English; measured 19–23 MB/s whole)
// and would give other labels than franc on long documents.
import { data } from 'franc/data.js';
import { FRANC_CLASS_MASKS, FRANC_EXPRESSIONS, FRANC_RANGE_CLASSES, FRANC_RANGE_STARTS } from './data/franc-scripts.generated.js';
import { lazyRangeTable } from './range-table.js';

/** franc's sample: the first 2048 UTF-16 units are enough to tell languages apart. */
export const MAX_LENGTH = 2048;
/** franc's default minimum text length (UTF-16 units) below which it answers `und`. */
export const MIN_LENGTH = 10;
/** franc's distance for a trigram that a language's profile lacks. */
const MAX_DIFFERENCE = 300;

/**
 * Trigrams of `a`–`z` and space (27^3 of them; a third of franc's 14,856 distinct
 * trigrams, and nearly all of an English sample's) are looked up by direct index
 * rather than hashed: measured on Brown paragraphs, hashing every trigram made
 * counting the largest cost of labelling.
 */
const DIRECT = 27 * 27 * 27;

const UND = 'und';

// ---- franc's script choice -------------------------------------------------------

const francTable = lazyRangeTable(FRANC_RANGE_STARTS, FRANC_RANGE_CLASSES);

/** Returns the BMP part of the franc expression-class table, expanded on first use. */
function francClasses(): Uint8Array {
  return francTable().bmp;
}

/** Returns the franc expression class of a supplementary-plane code point. */
function astralFrancClass(cp: number): number {
  return francTable().astral(cp);
}

const classCounts = new Int32Array(FRANC_CLASS_MASKS.length);
const expressionCounts = new Int32Array(FRANC_EXPRESSIONS.length);
/** Per class: the expressions that match it (bits of its mask). */
const CLASS_EXPRESSIONS: readonly number[][] = FRANC_CLASS_MASKS.map((mask) =>
  FRANC_EXPRESSIONS.map((_, e) => e).filter((e) => (mask & (1 << e)) !== 0),
);

/** Returns the index in FRANC_EXPRESSIONS of the script franc picks for the first `end` units of `text`, and its match count. */
function topExpression(text: string, end: number): { expression: number; count: number } {
  const table = francClasses();
  classCounts.fill(0);
  for (let i = 0; i < end; i++) {
    const unit = text.charCodeAt(i);
    if (unit >= 0xd800 && unit <= 0xdbff && i + 1 < end) {
      const low = text.charCodeAt(i + 1);
      if (low >= 0xdc00 && low <= 0xdfff) {
        const cls = astralFrancClass(((unit - 0xd800) << 10) + (low - 0xdc00) + 0x10000);
        classCounts[cls] = (classCounts[cls] as number) + 1;
        i++;
        continue;
      }
    }
    const cls = table[unit] as number;
    classCounts[cls] = (classCounts[cls] as number) + 1;
  }
  expressionCounts.fill(0);
  for (let c = 1; c < classCounts.length; c++) {
    const n = classCounts[c] as number;
    if (n === 0) continue;
    for (const e of CLASS_EXPRESSIONS[c] as number[]) expressionCounts[e] = (expressionCounts[e] as number) + n;
  }
  // franc keeps the first expression on a tie (it starts from -1, so with no match at all the first one, with 0).
  let best = 0;
  for (let e = 1; e < expressionCounts.length; e++) if ((expressionCounts[e] as number) > (expressionCounts[best] as number)) best = e;
  return { expression: best, count: expressionCounts[best] as number };
}

const LATIN = FRANC_EXPRESSIONS.indexOf('Latin');
/** Whether the generated table says what the ASCII shortcut assumes: ASCII letters match exactly the Latin expression, other ASCII none. */
const ASCII_SHORTCUT = ((): boolean => {
  const table = francClasses();
  for (let u = 0; u < 0x80; u++) {
    const isLetter = ((u | 0x20) - 0x61) >>> 0 < 26;
    const mask = FRANC_CLASS_MASKS[table[u] as number] as number;
    if (mask !== (isLetter ? 1 << LATIN : 0)) return false;
  }
  return LATIN > 0;
})();

// ---- trigram profiles --------------------------------------------------------------

/**
 * Interned ids of the trigrams of every profile (14,856 distinct in franc 6.2.0). A
 * trigram of `a`–`z` and space is found by direct index (directId); any other one in
 * an open-addressing table with both halves of a slot side by side, one cache line
 * per probe: at 2 × slot its first two units (hi), at 2 × slot + 1 its third unit
 * (lo) | (id + 1) << 16, 0 for an empty slot.
 */
let internBits = 0;
let internTable: Int32Array = new Int32Array(0);
let internCount = 0;
/** Per script group of franc's data (`Latin`, `Cyrillic`, ...): its languages, in franc's order. */
const groupLanguages = new Map<string, string[]>();
/** Per script group, per language: the profile as franc's data writes it (a language may have one in two groups: `srp` in Latin and Cyrillic). */
const profiles = new Map<string, Map<string, string>>();

function hash(hi: number, lo: number, bits: number): number {
  return (Math.imul(hi, 0x9e3779b1) ^ Math.imul(lo + 0x7f4a7c15, 0x85ebca77)) >>> (32 - bits);
}

/** Returns the interned id of a trigram, adding it when `add`; -1 when absent and not added. */
function internedId(hi: number, lo: number, add: boolean): number {
  const direct = directIndex(hi >>> 16, hi & 0xffff, lo);
  if (direct >= 0) {
    if (add && directId[direct] === -1) directId[direct] = internCount++;
    return directId[direct] as number;
  }
  const id = hashedId(hi, lo);
  if (id >= 0 || !add) return id;
  const mask = (1 << internBits) - 1;
  let slot = hash(hi, lo, internBits);
  while (internTable[2 * slot + 1] !== 0) slot = (slot + 1) & mask;
  internTable[2 * slot] = hi;
  internTable[2 * slot + 1] = lo | ((internCount + 1) << 16);
  return internCount++;
}

/** Returns the interned id of a trigram that is not all `a`–`z` and space, or -1 when no profile has it. */
function hashedId(hi: number, lo: number): number {
  const mask = (1 << internBits) - 1;
  let slot = hash(hi, lo, internBits);
  for (;;) {
    const second = internTable[2 * slot + 1] as number;
    if (second === 0) return -1;
    if ((second & 0xffff) === lo && internTable[2 * slot] === hi) return (second >>> 16) - 1;
    slot = (slot + 1) & mask;
  }
}

/** Returns the direct-index symbol of a unit: 0 for space, 1–26 for `a`–`z`, -1 otherwise. */
function symbolOf(unit: number): number {
  return unit === 0x20 ? 0 : (unit - 0x61) >>> 0 < 26 ? unit - 0x60 : -1;
}

/** Returns the index in the direct tables of a trigram of `a`–`z` and space, or -1. */
function directIndex(a: number, b: number, c: number): number {
  const x = symbolOf(a);
  const y = symbolOf(b);
  const z = symbolOf(c);
  return (x | y | z) < 0 ? -1 : (x * 27 + y) * 27 + z;
}

/** Interned id of each direct-index trigram, -1 when in no profile (16 bits: half the cache lines of the hot loop's look-ups). */
const directId = new Int16Array(DIRECT).fill(-1);

/** Interns every trigram of franc's data, once. */
function loadProfiles(): void {
  if (internBits > 0) return;
  let hashed = 0;
  for (const script in data) {
    const languages = data[script] as Record<string, string>;
    groupLanguages.set(script, Object.keys(languages));
    const models = new Map<string, string>();
    for (const language in languages) {
      const model = languages[language] as string;
      models.set(language, model);
      for (const t of model.split('|')) if (directIndex(t.charCodeAt(0), t.charCodeAt(1), t.charCodeAt(2)) < 0) hashed++;
    }
    profiles.set(script, models);
  }
  // At most half full even if no two profiles shared a trigram.
  internBits = Math.ceil(Math.log2(hashed * 2));
  internTable = new Int32Array(2 << internBits);
  for (const models of profiles.values()) {
    for (const model of models.values()) {
      for (const t of model.split('|')) {
        if (t.includes('\0')) throw new Error('franc data: a trigram with NUL, which countTrigrams uses as a sentinel');
        internedId((t.charCodeAt(0) << 16) | t.charCodeAt(1), t.charCodeAt(2), true);
      }
    }
  }
  if (internCount >= 0x7fff) throw new Error('franc data: too many trigrams for the 16-bit ids of internTable and directId');
  idTally = new Uint16Array(internCount);
}

/**
 * The profiles of some languages of one group, inverted: for each interned trigram,
 * which of the languages have it and at what rank (compressed sparse rows). A text's
 * distance to every language is then 300 per distinct trigram, corrected by
 * |count − rank − 1| − 300 for each language that has the trigram: one pass over the
 * text's trigrams instead of one per language.
 */
interface InvertedProfiles {
  languages: string[];
  /** Entries of trigram id t: offsets[t] .. offsets[t + 1]. */
  offsets: Int32Array;
  /** Per entry: language index << 16 | (rank + 1), one load per entry in the hot loop. */
  entries: Int32Array;
}

/** Returns the inverted profiles of `languages` (all in `group`). */
function invert(group: string, languages: string[]): InvertedProfiles {
  const models = profiles.get(group) as Map<string, string>;
  const perLanguage = languages.map((language) => {
    const rankOf = new Map<number, number>();
    const model = (models.get(language) as string).split('|');
    // franc builds `{trigram: index}` from the last entry down, so a repeated trigram keeps its first index.
    for (let r = model.length - 1; r >= 0; r--) {
      const t = model[r] as string;
      rankOf.set(internedId((t.charCodeAt(0) << 16) | t.charCodeAt(1), t.charCodeAt(2), false), r);
    }
    return rankOf;
  });
  const offsets = new Int32Array(internCount + 1);
  for (const rankOf of perLanguage) for (const id of rankOf.keys()) offsets[id + 1] = (offsets[id + 1] as number) + 1;
  for (let t = 0; t < internCount; t++) offsets[t + 1] = (offsets[t + 1] as number) + (offsets[t] as number);
  const fill = offsets.slice(0, internCount);
  const entries = new Int32Array(offsets[internCount] as number);
  perLanguage.forEach((rankOf, l) => {
    for (const [id, rank] of rankOf) {
      const at = fill[id] as number;
      fill[id] = at + 1;
      entries[at] = (l << 16) | (rank + 1);
    }
  });
  return { languages, offsets, entries };
}

// ---- cleaning and counting ---------------------------------------------------------

/**
 * Per BMP unit, what cleaning makes of it, in one load: 0x20 for a separator (U+0021–U+0040
 * or JS white space), 0 for a unit that needs care (no single-unit lower case, a
 * surrogate, Σ, or NUL itself), else its one-unit lower case.
 */
let foldedUnit: Uint16Array | undefined;
const SEPARATOR = 0x20;
const CARE = 0;
const CAPITAL_SIGMA = 0x03a3;

/** Builds the cleaning table from the engine's own `\s` and toLowerCase, so it matches trigram-utils' regular expressions exactly. */
function cleaningTable(): Uint16Array {
  if (foldedUnit) return foldedUnit;
  const folded = new Uint16Array(0x10000); // CARE unless set
  const space = /\s/;
  for (let u = 1; u < 0x10000; u++) {
    if (u >= 0xd800 && u <= 0xdfff) continue;
    const ch = String.fromCharCode(u);
    if ((u >= 0x21 && u <= 0x40) || space.test(ch)) {
      folded[u] = SEPARATOR;
      continue;
    }
    const lowered = ch.toLowerCase();
    // A lower case that reads as SEPARATOR or CARE (none in V8's tables) would go the careful way.
    if (lowered.length === 1 && u !== CAPITAL_SIGMA && lowered !== ' ' && lowered !== '\0') folded[u] = lowered.charCodeAt(0);
  }
  return (foldedUnit = folded);
}

// Per-call scratch. Trigrams are counted by interned id, so only trigrams that some
// profile has are counted at all: any other one costs every language the same 300,
// which cannot change which language is nearest (nor a tie), so it is left out.
//
// Per id, its count in this call (a sample has at most 2 × 2048 + 2 trigrams, within 16
// bits); the ids the previous call counted are set back to 0 before the next one counts.
let idTally: Uint16Array = new Uint16Array(0);
/** The profile trigrams of the sample, by interned id, in order of first sight. */
const distinctIds = new Int32Array(MAX_LENGTH * 2 + 2);
/** How many of distinctIds the last count filled (their tallies are still set). */
let counted = 0;
/** The cleaned sample, written only for a text that needs care (countCarefully). */
const cleaned = new Uint16Array(MAX_LENGTH * 2 + 2);

/** Starts a new count: sets the tallies of the previous one back to 0. */
function nextCount(): void {
  for (let d = 0; d < counted; d++) idTally[distinctIds[d] as number] = 0;
  counted = 0;
}

/**
 * Counts the trigram (a, b, c) of the cleaned sample, whose direct-index symbols are
 * sa, sb, sc, when a profile has it; returns the new number of distinct ids.
 */
function tally(a: number, b: number, c: number, sa: number, sb: number, sc: number, distinct: number): number {
  const id = (sa | sb | sc) >= 0 ? (directId[(sa * 27 + sb) * 27 + sc] as number) : hashedId((a << 16) | b, c);
  if (id < 0) return distinct;
  const n = idTally[id] as number;
  idTally[id] = n + 1;
  if (n !== 0) return distinct;
  distinctIds[distinct] = id;
  return distinct + 1;
}

/**
 * Counts the profile trigrams of `' ' + clean(sample) + ' '` (trigram-utils: U+0021–U+0040
 * runs and white space collapse to one space, trimmed, lower-cased) while cleaning, with
 * no cleaned copy: returns how many distinct ones there are (their ids in distinctIds,
 * counts in idTally), or -1 at the first unit that needs care (countCarefully then).
 *
 * Measured with the labellers of the bench corpus's scripts over its 33,658 documents
 * (40 MB bench corpus, CPU time, 8 alternating rounds of two copies in one process,
 * shared 2-core machine): cleaning into a buffer, then counting every trigram in a
 * per-call hash table and interning the distinct ones took 1.07x the labelling time of
 * this one pass; the one-word tally then took 0.93–0.95x the counting time of separate
 * stamp and count arrays, and the one folded table 0.93–0.95x that of a kind table and
 * a lower-case table. All three together: 0.80–0.84x the labelling time. Later, 16-bit
 * counts set back through the list of counted ids (instead of a 32-bit stamp-and-count
 * word) and 16-bit direct ids took 0.93x the labelling time (medians of 8 rounds, both
 * orders, 37 candidates over the same corpus, same labels).
 */
function countTrigrams(text: string, end: number): number {
  const folded = cleaningTable();
  nextCount();
  let distinct = 0;
  // The last two cleaned units and their symbols. A NUL stands before the leading space:
  // no profile has a trigram with NUL (loadProfiles checks), so (NUL, space, first unit) counts nothing.
  let a = 0;
  let sa = -1;
  let b = 0x20;
  let sb = 0;
  let pendingSpace = false;
  let started = false;
  let units = 0;
  let letter = false;
  for (let i = 0; i < end; i++) {
    const unit = text.charCodeAt(i);
    units |= unit;
    if (!letter) letter = ((unit | 0x20) - 0x61) >>> 0 < 26;
    const c = folded[unit] as number;
    if (c === SEPARATOR) {
      pendingSpace = started;
      continue;
    }
    if (c === CARE) {
      counted = distinct; // set back by the careful count's nextCount
      return -1;
    }
    if (pendingSpace) {
      distinct = tally(a, b, 0x20, sa, sb, 0, distinct);
      a = b;
      sa = sb;
      b = 0x20;
      sb = 0;
      pendingSpace = false;
    }
    const sc = symbolOf(c);
    distinct = tally(a, b, c, sa, sb, sc, distinct);
    a = b;
    sa = sb;
    b = c;
    sb = sc;
    started = true;
  }
  distinct = tally(a, b, 0x20, sa, sb, 0, distinct);
  counted = distinct;
  sampleIsAscii = units < 0x80;
  sampleHasAsciiLetter = letter;
  return distinct;
}

/** Counts as countTrigrams does, for a text with a unit that needs care: cleaned into a buffer first. */
function countCarefully(text: string, end: number): number {
  const n = clean(text, end);
  nextCount();
  let distinct = 0;
  for (let p = 0; p + 2 < n; p++) {
    const a = cleaned[p] as number;
    const b = cleaned[p + 1] as number;
    const c = cleaned[p + 2] as number;
    distinct = tally(a, b, c, symbolOf(a), symbolOf(b), symbolOf(c), distinct);
  }
  counted = distinct;
  return distinct;
}

/** Writes `' ' + clean(sample) + ' '` into `cleaned`, lower-casing units that need care too, and returns its length. */
function clean(text: string, end: number): number {
  const folded = cleaningTable();
  let n = 0;
  cleaned[n++] = 0x20;
  let pendingSpace = false;
  let units = 0;
  let letter = false;
  for (let i = 0; i < end; i++) {
    const unit = text.charCodeAt(i);
    units |= unit;
    if (!letter) letter = ((unit | 0x20) - 0x61) >>> 0 < 26;
    const f = folded[unit] as number;
    if (f === SEPARATOR) {
      pendingSpace = n > 1;
      continue;
    }
    if (pendingSpace) {
      cleaned[n++] = 0x20;
      pendingSpace = false;
    }
    if (f !== CARE) {
      cleaned[n++] = f;
      continue;
    }
    if (unit === CAPITAL_SIGMA) {
      sampleIsAscii = false;
      return cleanNatively(text, end); // final sigma depends on context
    }
    let piece: string;
    if (unit >= 0xd800 && unit <= 0xdbff && i + 1 < end && (text.charCodeAt(i + 1) & 0xfc00) === 0xdc00) {
      piece = text.slice(i, i + 2).toLowerCase();
      i++;
    } else piece = (unit & 0xf800) === 0xd800 ? String.fromCharCode(unit) : String.fromCharCode(unit).toLowerCase();
    for (let k = 0; k < piece.length; k++) cleaned[n++] = piece.charCodeAt(k);
  }
  cleaned[n++] = 0x20;
  sampleIsAscii = units < 0x80;
  sampleHasAsciiLetter = letter;
  return n;
}

/** Set by clean(): the sample was all ASCII, and it held an ASCII letter. */
let sampleIsAscii = false;
let sampleHasAsciiLetter = false;

/** The same cleaning with trigram-utils' own string operations, for the rare text that needs context to lower-case. */
function cleanNatively(text: string, end: number): number {
  const value = ` ${text.slice(0, end).replace(/[\u0021-\u0040]+/g, ' ').replace(/\s+/g, ' ').trim().toLowerCase()} `;
  for (let k = 0; k < value.length; k++) cleaned[k] = value.charCodeAt(k);
  return value.length;
}

// ---- the labeller ----------------------------------------------------------------

/** A candidate set prepared once, for labelling many texts. */
export interface FrancLabeller {
  /** Returns the label franc would give `text` with `{ only, minLength }`: an ISO 639-3 code or `und`. */
  (text: string): string;
  /** The candidates, as given. */
  readonly only: readonly string[];
}

/** Returns a labeller equal to `franc(text, { only, minLength })`, with the candidates' profiles prepared once. */
export function createFrancLabeller(only: readonly string[], minLength: number = MIN_LENGTH): FrancLabeller {
  loadProfiles();
  const allowed = new Set(only);
  const anything = allowed.size === 0;
  // Per expression: the allowed languages of its trigram group (franc's order),
  // inverted, or null for an expression that names one language.
  const groups = FRANC_EXPRESSIONS.map((expression) => {
    const languages = groupLanguages.get(expression);
    if (!languages) return null;
    return invert(expression, languages.filter((l) => anything || allowed.has(l)));
  });
  // Sums stay within ±(2 × 2048 + 2)^2 < 2^31.
  const distances = new Int32Array(Math.max(1, ...groups.map((g) => g?.languages.length ?? 0)));

  const label = (text: string): string => {
    if (!text || text.length < minLength) return UND;
    const end = Math.min(text.length, MAX_LENGTH);
    // Cleaning first tells whether the sample is ASCII; then franc's script is Latin if
    // it has an ASCII letter (no other expression matches ASCII), and the per-character
    // script count is skipped — most of English text's labelling time otherwise.
    const fast = countTrigrams(text, end);
    const distinct = fast >= 0 ? fast : countCarefully(text, end);
    const top =
      sampleIsAscii && ASCII_SHORTCUT
        ? { expression: sampleHasAsciiLetter ? LATIN : 0, count: sampleHasAsciiLetter ? 1 : 0 }
        : topExpression(text, end);
    const name = FRANC_EXPRESSIONS[top.expression] as string;
    const group = groups[top.expression];
    if (!group) return top.count === 0 || !(anything || allowed.has(name)) ? UND : name;
    const k = group.languages.length;
    if (k === 0) return UND;

    // Each language's distance less the 300 per distinct trigram that all are charged alike.
    distances.fill(0, 0, k);
    const { offsets, entries } = group;
    for (let d = 0; d < distinct; d++) {
      const id = distinctIds[d] as number;
      const count = idTally[id] as number;
      const last = offsets[id + 1] as number;
      for (let e = offsets[id] as number; e < last; e++) {
        const entry = entries[e] as number;
        const difference = count - (entry & 0xffff); // count − rank − 1
        const l = entry >>> 16;
        distances[l] = (distances[l] as number) + (difference < 0 ? -difference : difference) - MAX_DIFFERENCE;
      }
    }
    let best = 0;
    for (let l = 1; l < k; l++) if ((distances[l] as number) < (distances[best] as number)) best = l;
    return group.languages[best] as string;
  };
  return Object.assign(label, { only: [...only] });
}

/** Returns the same label as `franc(text, { only, minLength })`; prepare a labeller with createFrancLabeller when labelling many texts. */
export function francLabel(text: string, only: readonly string[], minLength: number = MIN_LENGTH): string {
  return createFrancLabeller(only, minLength)(text);
}

/** Returns every language franc's trigram data holds a profile for, and each single-language script expression's code. */
export function francLanguages(): string[] {
  loadProfiles();
  const single = FRANC_EXPRESSIONS.filter((e) => !groupLanguages.has(e));
  return [...new Set([...[...groupLanguages.values()].flat(), ...single])];
}
