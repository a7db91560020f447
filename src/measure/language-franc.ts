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
// sample) runs at 34 MB/s. Here the sample is cleaned into a code-unit buffer in one
// pass, trigrams are counted in typed arrays (by direct index for a–z and space,
// hashed otherwise), the profiles are inverted over interned trigram ids so that all
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

/** Counting table: 2^13 slots, at most half full with the ≤ 2 × 2048 + 2 trigrams of a sample. */
const SLOT_BITS = 13;
const SLOTS = 1 << SLOT_BITS;
/**
 * Trigrams of `a`–`z` and space (27^3 of them; a third of franc's 14,856 distinct
 * trigrams, and nearly all of an English sample's) are counted and looked up by
 * direct index rather than hashed: measured on Brown paragraphs, hashing every
 * trigram made counting the largest cost of labelling.
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

/** Interned trigrams of every profile: open addressing over (first two units, third unit). */
let internBits = 0;
let internHi: Int32Array = new Int32Array(0);
let internLo: Int32Array = new Int32Array(0);
let internId: Int32Array = new Int32Array(0);
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
  if (!add) {
    const direct = directIndex(hi >>> 16, hi & 0xffff, lo);
    if (direct >= 0) return directId[direct] as number;
  }
  return hashedId(hi, lo, add);
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

/** Interned id of each direct-index trigram, -1 when in no profile. */
const directId = new Int32Array(DIRECT).fill(-1);

function hashedId(hi: number, lo: number, add: boolean): number {
  const mask = (1 << internBits) - 1;
  let slot = hash(hi, lo, internBits);
  for (;;) {
    const id = internId[slot] as number;
    if (id < 0) break;
    if (internHi[slot] === hi && internLo[slot] === lo) return id;
    slot = (slot + 1) & mask;
  }
  if (!add) return -1;
  internHi[slot] = hi;
  internLo[slot] = lo;
  internId[slot] = internCount;
  return internCount++;
}

/** Interns every trigram of franc's data, once. */
function loadProfiles(): void {
  if (internBits > 0) return;
  let total = 0;
  for (const script in data) {
    const languages = data[script] as Record<string, string>;
    groupLanguages.set(script, Object.keys(languages));
    const models = new Map<string, string>();
    for (const language in languages) {
      const model = languages[language] as string;
      models.set(language, model);
      total += model.split('|').length;
    }
    profiles.set(script, models);
  }
  internBits = Math.ceil(Math.log2(total * 2));
  internHi = new Int32Array(1 << internBits);
  internLo = new Int32Array(1 << internBits);
  internId = new Int32Array(1 << internBits).fill(-1);
  for (const models of profiles.values()) {
    for (const model of models.values()) {
      for (const t of model.split('|')) {
        const id = internedId((t.charCodeAt(0) << 16) | t.charCodeAt(1), t.charCodeAt(2), true);
        const direct = directIndex(t.charCodeAt(0), t.charCodeAt(1), t.charCodeAt(2));
        if (direct >= 0) directId[direct] = id;
      }
    }
  }
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

/** Per BMP unit: 0 keep, 1 separator (U+0021–U+0040 or JS white space), 2 needs care (no single-unit lower case, or a surrogate, or Σ). */
let unitKind: Uint8Array | undefined;
/** Per BMP unit: its lower case when that is one unit. */
let lowerUnit: Uint16Array | undefined;
const KEEP = 0;
const SEPARATOR = 1;
const CARE = 2;
const CAPITAL_SIGMA = 0x03a3;

/** Builds the cleaning tables from the engine's own `\s` and toLowerCase, so they match trigram-utils' regular expressions exactly. */
function cleaningTables(): void {
  if (unitKind) return;
  const kinds = new Uint8Array(0x10000);
  const lower = new Uint16Array(0x10000);
  const space = /\s/;
  for (let u = 0; u < 0x10000; u++) {
    if (u >= 0xd800 && u <= 0xdfff) {
      kinds[u] = CARE;
      continue;
    }
    const ch = String.fromCharCode(u);
    if ((u >= 0x21 && u <= 0x40) || space.test(ch)) {
      kinds[u] = SEPARATOR;
      continue;
    }
    const lowered = ch.toLowerCase();
    if (lowered.length !== 1 || u === CAPITAL_SIGMA) kinds[u] = CARE;
    else lower[u] = lowered.charCodeAt(0);
  }
  unitKind = kinds;
  lowerUnit = lower;
}

// Per-call scratch: cleaned sample, counting table, distinct trigrams.
const cleaned = new Uint16Array(MAX_LENGTH * 2 + 2);
const slotHi = new Int32Array(SLOTS);
const slotLo = new Int32Array(SLOTS);
const slotCount = new Int32Array(SLOTS);
const slotStamp = new Int32Array(SLOTS);
let stamp = 0;
const distinctIds = new Int32Array(MAX_LENGTH * 2 + 2);
const distinctCounts = new Int32Array(MAX_LENGTH * 2 + 2);

/**
 * Writes `' ' + clean(sample) + ' '` into `cleaned` (trigram-utils: U+0021–U+0040 runs
 * and white space collapse to one space, trimmed, lower-cased) and returns its length.
 */
function clean(text: string, end: number): number {
  cleaningTables();
  const kinds = unitKind as Uint8Array;
  const lower = lowerUnit as Uint16Array;
  let n = 0;
  cleaned[n++] = 0x20;
  let pendingSpace = false;
  let units = 0;
  let letter = false;
  for (let i = 0; i < end; i++) {
    const unit = text.charCodeAt(i);
    units |= unit;
    if (!letter) letter = ((unit | 0x20) - 0x61) >>> 0 < 26;
    const kind = kinds[unit] as number;
    if (kind === SEPARATOR) {
      pendingSpace = n > 1;
      continue;
    }
    if (pendingSpace) {
      cleaned[n++] = 0x20;
      pendingSpace = false;
    }
    if (kind === KEEP) {
      cleaned[n++] = lower[unit] as number;
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

const directStamp = new Int32Array(DIRECT);
const directCount = new Int32Array(DIRECT);

/** Counts the trigrams of `cleaned[0, n)` and returns how many distinct ones there are, their interned ids (-1: in no profile) and counts left in distinctIds / distinctCounts. */
function countTrigrams(n: number): number {
  stamp++;
  if (stamp === 0x7fffffff) {
    slotStamp.fill(0);
    directStamp.fill(0);
    stamp = 1;
  }
  let distinct = 0;
  const mask = SLOTS - 1;
  // Direct-index trigrams are marked by a negative entry (-1 - index) until the end.
  // The direct index is rolled along: symbols (space 0, a–z 1–26) of the last three units.
  let s1 = symbolOf(cleaned[0] as number);
  let s2 = symbolOf(cleaned[1] as number);
  for (let p = 0; p + 2 < n; p++) {
    const c = cleaned[p + 2] as number;
    const s0 = s1;
    s1 = s2;
    s2 = symbolOf(c);
    if ((s0 | s1 | s2) >= 0) {
      const direct = (s0 * 27 + s1) * 27 + s2;
      if (directStamp[direct] !== stamp) {
        directStamp[direct] = stamp;
        directCount[direct] = 1;
        distinctIds[distinct++] = -1 - direct;
      } else directCount[direct] = (directCount[direct] as number) + 1;
      continue;
    }
    const hi = ((cleaned[p] as number) << 16) | (cleaned[p + 1] as number);
    let slot = hash(hi, c, SLOT_BITS);
    for (;;) {
      if (slotStamp[slot] !== stamp) {
        slotStamp[slot] = stamp;
        slotHi[slot] = hi;
        slotLo[slot] = c;
        slotCount[slot] = 1;
        distinctIds[distinct++] = slot;
        break;
      }
      if (slotHi[slot] === hi && slotLo[slot] === c) {
        slotCount[slot] = (slotCount[slot] as number) + 1;
        break;
      }
      slot = (slot + 1) & mask;
    }
  }
  for (let d = 0; d < distinct; d++) {
    const entry = distinctIds[d] as number;
    if (entry < 0) {
      distinctCounts[d] = directCount[-1 - entry] as number;
      distinctIds[d] = directId[-1 - entry] as number;
    } else {
      distinctCounts[d] = slotCount[entry] as number;
      distinctIds[d] = hashedId(slotHi[entry] as number, slotLo[entry] as number, false);
    }
  }
  return distinct;
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
  // Sums stay below (2 × 2048 + 2) × 300 < 2^31.
  const distances = new Int32Array(Math.max(1, ...groups.map((g) => g?.languages.length ?? 0)));

  const label = (text: string): string => {
    if (!text || text.length < minLength) return UND;
    const end = Math.min(text.length, MAX_LENGTH);
    // Cleaning first tells whether the sample is ASCII; then franc's script is Latin if
    // it has an ASCII letter (no other expression matches ASCII), and the per-character
    // script count is skipped — most of English text's labelling time otherwise.
    const n = clean(text, end);
    const top =
      sampleIsAscii && ASCII_SHORTCUT
        ? { expression: sampleHasAsciiLetter ? LATIN : 0, count: sampleHasAsciiLetter ? 1 : 0 }
        : topExpression(text, end);
    const name = FRANC_EXPRESSIONS[top.expression] as string;
    const group = groups[top.expression];
    if (!group) return top.count === 0 || !(anything || allowed.has(name)) ? UND : name;
    const k = group.languages.length;
    if (k === 0) return UND;

    const distinct = countTrigrams(n);
    distances.fill(distinct * MAX_DIFFERENCE, 0, k);
    const { offsets, entries } = group;
    for (let d = 0; d < distinct; d++) {
      const id = distinctIds[d] as number;
      if (id < 0) continue;
      const count = distinctCounts[d] as number;
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
