// The Unicode Script property (UAX #24) of code points, and script profiles of texts:
// characters counted per script, with Common, Inherited and Unknown left out because
// they belong to no language (digits, punctuation, combining marks shared by scripts).
import { SCRIPT_CODES, SCRIPT_NAMES, SCRIPT_RANGE_IDS, SCRIPT_RANGE_STARTS } from './data/scripts.generated.js';
import { lazyRangeTable } from './range-table.js';

export { SCRIPT_CODES, SCRIPT_NAMES };

/** Script ids of the values that belong to no language: they are not counted. */
export const UNKNOWN_ID = 0;
export const COMMON_ID = 1;
export const INHERITED_ID = 2;
/** Ids below this are Unknown, Common and Inherited. */
export const FIRST_COUNTED_ID = 3;

const scriptTable = lazyRangeTable(SCRIPT_RANGE_STARTS, SCRIPT_RANGE_IDS);

/** Returns the Script id of every BMP code point (index = code point), expanded from the generated ranges on first use. */
export function bmpScriptIds(): Uint8Array {
  return scriptTable().bmp;
}

/** Returns the Script id of a code point outside the BMP, by binary search over the generated ranges. */
export function astralScriptId(cp: number): number {
  return scriptTable().astral(cp);
}

/** Returns the Script id of any code point. */
export function scriptIdOf(cp: number): number {
  return cp < 0x10000 ? (bmpScriptIds()[cp] as number) : astralScriptId(cp);
}

/** Returns the long Unicode name of a code point's Script value (`Devanagari`, `Common`, `Unknown`). */
export function scriptOf(cp: number): string {
  return SCRIPT_NAMES[scriptIdOf(cp)] as string;
}

/** Returns the characters of `text` counted per script (long names), Common, Inherited and Unknown left out. */
export function scriptProfile(text: string): Record<string, number> {
  const counts = new Int32Array(SCRIPT_NAMES.length);
  const table = bmpScriptIds();
  for (let i = 0; i < text.length; i++) {
    const unit = text.charCodeAt(i);
    let id: number;
    if (unit >= 0xd800 && unit <= 0xdbff && i + 1 < text.length) {
      const low = text.charCodeAt(i + 1);
      if (low >= 0xdc00 && low <= 0xdfff) {
        id = astralScriptId(((unit - 0xd800) << 10) + (low - 0xdc00) + 0x10000);
        i++;
      } else id = table[unit] as number;
    } else id = table[unit] as number;
    counts[id] = (counts[id] as number) + 1;
  }
  return profileFromCounts(counts);
}

/** Returns the per-script record of a count array indexed by script id, leaving out zero counts and the ids that belong to no language. */
export function profileFromCounts(counts: Int32Array): Record<string, number> {
  const profile: Record<string, number> = {};
  for (let id = FIRST_COUNTED_ID; id < counts.length; id++) {
    const n = counts[id] as number;
    if (n > 0) profile[SCRIPT_NAMES[id] as string] = n;
  }
  return profile;
}

/** Returns the script with the most characters in a profile (the first in Unicode-name order on a tie), or null when the profile is empty. */
export function dominantScriptOf(profile: Readonly<Record<string, number>>): string | null {
  let best: string | null = null;
  let bestCount = 0;
  for (const name in profile) {
    const n = profile[name] as number;
    if (n > bestCount || (n === bestCount && best !== null && name < best)) {
      best = name;
      bestCount = n;
    }
  }
  return best;
}

/** Returns the share of a profile's characters that are in `expected` scripts, or null when the profile has no characters. */
export function purityOf(profile: Readonly<Record<string, number>>, expected: readonly string[]): number | null {
  let total = 0;
  let own = 0;
  for (const name in profile) {
    const n = profile[name] as number;
    total += n;
    if (expected.includes(name)) own += n;
  }
  return total === 0 ? null : own / total;
}
