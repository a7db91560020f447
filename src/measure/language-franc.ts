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
// The counting and scoring loops now run as WebAssembly (kernels/franc.c), over the same
// tables laid out in the kernel's memory: over the bench corpus's 33,658 documents with 37
// candidates, 8 alternating rounds in one process (CPU time, shared 2-core machine,
// 2026-12-02), the labeller took 0.59–0.68x the time of the same loops in TypeScript, with
// the same labels. In scripts/bench-measure.mjs (one run, 2026-12-02 12:10 UTC) it runs at
// 61 MB/s on Brown paragraphs with 24 candidates and 148 MB/s on UDHR Hindi with 3: 53x and
// 30x franc.
//
// Judging from a shorter prefix than franc's 2048 units was the other option; it was
// not needed for the measurer's goal (15 MB/s on English; measured 19–23 MB/s whole)
// and would give other labels than franc on long documents.
import { data } from 'franc/data.js';
import { FRANC_CLASS_MASKS, FRANC_EXPRESSIONS, FRANC_RANGE_CLASSES, FRANC_RANGE_STARTS } from './data/franc-scripts.generated.js';
import { francKernel, type FrancKernel } from './kernels/franc-kernel.js';
import { lazyRangeTable } from './range-table.js';

/** franc's sample: the first 2048 UTF-16 units are enough to tell languages apart (kernels/franc.c: MAX_SAMPLE, the same). */
export const MAX_LENGTH = 2048;
/** franc's default minimum text length (UTF-16 units) below which it answers `und`. */
export const MIN_LENGTH = 10;

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

/** Counts the first `end` units of `text` by franc's expression class into classCounts, surrogate pairs by code point. */
function countClassesByCodePoint(table: Uint8Array, text: string, end: number): void {
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
}

/** Where the kernel holds franc's class table and its class counts, once placed. */
let classesAt = -1;
let classCountsAt = 0;

/**
 * Returns the index in FRANC_EXPRESSIONS of the script franc picks for the first `end` units
 * of `text`, and its match count. The sample must be the one countTrigrams has just written
 * into the kernel: the kernel counts classes over it, unless it holds a surrogate.
 */
function topExpression(kernel: FrancKernel, text: string, end: number): { expression: number; count: number } {
  const table = francClasses();
  if (classesAt < 0) {
    classesAt = kernel.place(table);
    classCountsAt = kernel.allocate(4 * classCounts.length);
  }
  if (kernel.countClasses(textAt, end, classesAt, classCountsAt, classCounts.length) === 0) {
    classCounts.set(new Int32Array(kernel.memory.buffer, classCountsAt, classCounts.length));
  } else countClassesByCodePoint(table, text, end);
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

/** The intern table's hash; kernels/franc.c computes the same one to look trigrams up, so change both together. */
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

/** Returns whether a profile is trigrams of three UTF-16 units joined by `|`, none holding NUL (countTrigrams' sentinel) or `|`. */
function isTrigramList(model: string): boolean {
  if (model.length % 4 !== 3) return false;
  for (let i = 0; i < model.length; i++) {
    const c = model.charCodeAt(i);
    if (i % 4 === 3 ? c !== 0x7c : c === 0 || c === 0x7c) return false;
  }
  return true;
}

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
      if (!isTrigramList(model)) throw new Error(`franc data: the profile of ${language} is not trigrams of three units joined by |`);
      for (let i = 0; i < model.length; i += 4) if (directIndex(model.charCodeAt(i), model.charCodeAt(i + 1), model.charCodeAt(i + 2)) < 0) hashed++;
    }
    profiles.set(script, models);
  }
  // At most half full even if no two profiles shared a trigram.
  internBits = Math.ceil(Math.log2(hashed * 2));
  internTable = new Int32Array(2 << internBits);
  for (const models of profiles.values()) {
    for (const model of models.values()) {
      // Stepping over the string, not split('|'): 48,900 trigram strings made twice were two thirds of
      // this on a fresh thread (a loop over franc's data alone: 12-17 ms with split, 4-8 ms so).
      for (let i = 0; i < model.length; i += 4) internedId((model.charCodeAt(i) << 16) | model.charCodeAt(i + 1), model.charCodeAt(i + 2), true);
    }
  }
  if (internCount >= 0x7fff) throw new Error('franc data: too many trigrams for the 16-bit ids of internTable and directId');
  placeTables();
}

/**
 * The profiles of some languages of one group, inverted: for each interned trigram,
 * the rank each language gives it, in one row per trigram that any of them has. A text's
 * distance to every language is then 300 per distinct trigram, corrected by
 * |count − rank − 1| − 300 for each language that has the trigram: one pass over the
 * text's trigrams instead of one per language, eight languages per vector operation.
 * Measured against the compressed sparse rows this replaced (one entry per language that
 * has a trigram, scored one at a time): labelling took 0.82x the CPU time over the bench
 * corpus (37 candidates, 8 alternating rounds in one process, same labels).
 */
interface InvertedProfiles {
  languages: string[];
  /** Where the kernel holds, per interned trigram id, its row (0: a row of zeros, for a trigram none of the languages has). */
  rowOfAt: number;
  /** Where the kernel holds the rows: row r, language l at r * stride + l, holds rank + 1 of the trigram in l's profile, or 0. */
  rowsAt: number;
  /** Row length: the number of languages rounded up to 8 (one 128-bit vector of 16-bit ranks). */
  stride: number;
}

/** Returns the inverted profiles of `languages` (all in `group`). */
function invert(group: string, languages: string[]): InvertedProfiles {
  // The kernel's memory is never given back, so each candidate set of a group is laid out
  // once per thread and shared by every labeller made for it.
  const key = `${group}\0${languages.join(',')}`;
  const known = invertedSets.get(key);
  if (known) return known;
  const inverted = invertAnew(group, languages);
  invertedSets.set(key, inverted);
  return inverted;
}

const invertedSets = new Map<string, InvertedProfiles>();

function invertAnew(group: string, languages: string[]): InvertedProfiles {
  const models = profiles.get(group) as Map<string, string>;
  const perLanguage = languages.map((language) => {
    const rankOf = new Map<number, number>();
    const model = (models.get(language) as string).split('|');
    // The kernel keeps ranks in 16-bit lanes.
    if (model.length >= 0x7fff) throw new Error(`franc data: the profile of ${language} is too long for the kernel's 16-bit ranks`);
    // franc builds `{trigram: index}` from the last entry down, so a repeated trigram keeps its first index.
    for (let r = model.length - 1; r >= 0; r--) {
      const t = model[r] as string;
      rankOf.set(internedId((t.charCodeAt(0) << 16) | t.charCodeAt(1), t.charCodeAt(2), false), r);
    }
    return rankOf;
  });
  const stride = Math.max(8, Math.ceil(languages.length / 8) * 8);
  const rowOf = new Int32Array(internCount);
  let rowCount = 1;
  for (const rankOf of perLanguage) for (const id of rankOf.keys()) if (rowOf[id] === 0) rowOf[id] = rowCount++;
  const rows = new Int16Array(rowCount * stride);
  perLanguage.forEach((rankOf, l) => {
    for (const [id, rank] of rankOf) rows[(rowOf[id] as number) * stride + l] = rank + 1;
  });
  const kernel = francKernel();
  return { languages, rowOfAt: kernel.place(rowOf), rowsAt: kernel.place(rows), stride };
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

// Per-call scratch, in the kernel's memory. Trigrams are counted by interned id, so only
// trigrams that some profile has are counted at all: any other one costs every language
// the same 300, which cannot change which language is nearest (nor a tie), so it is left
// out. Counting and scoring run in the kernel (kernels/franc.c), and so does the count of
// characters by franc's script class unless the sample holds a surrogate; cleaning a text
// that needs care stays here.
//
// Per id, its count in this call (a sample has at most 2 × 2048 + 2 trigrams, within 16
// bits); the kernel sets the ids the previous call counted back to 0 before the next one
// counts.
const SCRATCH_UNITS = MAX_LENGTH * 2 + 2;

/** Where the kernel's per-call buffers are: the sample's units, and the cleaned sample of a text that needs care. */
let textAt = 0;
let cleanedAt = 0;
/** Views of those buffers, made again when the kernel's memory has grown (which detaches them). */
let viewsOf: ArrayBuffer | undefined;
let cleaned: Uint16Array = new Uint16Array(0);

/** Returns the kernel with current views of its per-call buffers. */
function kernelWithViews(): FrancKernel {
  const kernel = francKernel();
  const buffer = kernel.memory.buffer;
  if (buffer !== viewsOf) {
    viewsOf = buffer;
    cleaned = new Uint16Array(buffer, cleanedAt, SCRATCH_UNITS);
  }
  return kernel;
}

/** Where the kernel sums the distances (one per language), shared by every labeller of this thread: room for k at least. */
let distancesAt = 0;
let distancesRoom = 0;
function distancesFor(k: number): number {
  if (k > distancesRoom) {
    distancesAt = francKernel().allocate(4 * k);
    distancesRoom = k;
  }
  return distancesAt;
}

/** Lays the interned tables and the per-call buffers out in the kernel's memory, once. */
function placeTables(): void {
  const kernel = francKernel();
  const foldedAt = kernel.place(cleaningTable());
  const directAt = kernel.place(directId);
  const internAt = kernel.place(internTable);
  // One slot more than there are ids: the kernel counts trigrams no profile has there.
  const tallyAt = kernel.allocate((internCount + 1) * 2);
  const distinctAt = kernel.allocate(SCRATCH_UNITS * 4);
  textAt = kernel.allocate(MAX_LENGTH * 2);
  cleanedAt = kernel.allocate(SCRATCH_UNITS * 2);
  new Uint16Array(kernel.memory.buffer, tallyAt, internCount + 1).fill(0);
  kernel.setTables(foldedAt, directAt, internAt, internBits, tallyAt, distinctAt, internCount);
}

/**
 * Counts the profile trigrams of `' ' + clean(sample) + ' '` (trigram-utils: U+0021–U+0040
 * runs and white space collapse to one space, trimmed, lower-cased): returns how many
 * distinct ones there are, their ids and counts left in the kernel for scoring.
 *
 * The kernel cleans and counts in one pass and gives up (-1) at the first unit that needs
 * care; such a text is cleaned here first. Measured before the kernel, in this language:
 * cleaning into a buffer and counting in a per-call hash table took 1.07x the labelling
 * time of the one pass, and the one-word tally, the one folded table, 16-bit counts and
 * 16-bit direct ids each took a few per cent off (medians of 8 alternating rounds).
 */
function countTrigrams(kernel: FrancKernel, text: string, end: number): number {
  kernel.writeUtf16(textAt, text, end);
  const distinct = kernel.countTrigrams(textAt, end);
  if (distinct >= 0) {
    const flags = kernel.sampleFlags();
    sampleIsAscii = (flags & 1) !== 0;
    sampleHasAsciiLetter = (flags & 2) !== 0;
    return distinct;
  }
  const n = clean(text, end);
  return kernel.countCleaned(cleanedAt, n);
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
  const distances = distancesFor(Math.max(8, ...groups.map((g) => g?.stride ?? 0)));

  const label = (text: string): string => {
    if (!text || text.length < minLength) return UND;
    const end = Math.min(text.length, MAX_LENGTH);
    // Cleaning first tells whether the sample is ASCII; then franc's script is Latin if
    // it has an ASCII letter (no other expression matches ASCII), and the per-character
    // script count is skipped — most of English text's labelling time otherwise.
    const kernel = kernelWithViews();
    const distinct = countTrigrams(kernel, text, end);
    const top =
      sampleIsAscii && ASCII_SHORTCUT
        ? { expression: sampleHasAsciiLetter ? LATIN : 0, count: sampleHasAsciiLetter ? 1 : 0 }
        : topExpression(kernel, text, end);
    const name = FRANC_EXPRESSIONS[top.expression] as string;
    const group = groups[top.expression];
    if (!group) return top.count === 0 || !(anything || allowed.has(name)) ? UND : name;
    const k = group.languages.length;
    if (k === 0) return UND;
    // Each language's distance less the 300 per distinct trigram that all are charged alike, summed in the kernel.
    const best = kernel.nearestDense(distinct, group.rowOfAt, group.rowsAt, group.stride, k, distances);
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
