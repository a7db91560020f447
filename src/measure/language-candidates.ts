// The languages a detector chooses among for a text, by its dominant script. Besides
// the policy's own languages, the major languages written in the script are always
// candidates, so that text in a language the policy does not list is labelled as that
// language (and counted as `other`) instead of being forced into a listed one. Codes
// are ISO 639-3, as franc labels them (franc says `npi` for Nepali, `zlm` for Malay).
//
// Kept short on purpose: every candidate costs detection time, and franc over all of
// its ~187 languages mislabels English as Scots (`sco`) in ~9 % of Brown paragraphs
// (measured on this machine class), so minor languages close to a major one stay out.

/** Major languages written in each script (Unicode long names), most-used first. */
export const MAJOR_LANGUAGES: Readonly<Record<string, readonly string[]>> = {
  // Latin: the most-used Latin-script languages with a franc profile.
  Latin: [
    'eng', 'spa', 'fra', 'deu', 'por', 'ita', 'nld', 'pol', 'tur', 'vie', 'ind', 'zlm',
    'ron', 'ces', 'hun', 'swe', 'fin', 'dan', 'hrv', 'slk', 'swh', 'tgl', 'cat',
  ],
  Devanagari: ['hin', 'mar', 'npi'],
  Arabic: ['arb', 'urd', 'pes', 'pbu'],
  Cyrillic: ['rus', 'ukr', 'bel', 'bul', 'srp', 'mkd', 'kaz'],
  Hebrew: ['heb', 'ydd'],
  Ethiopic: ['amh', 'tir'],
  Han: ['cmn', 'jpn'],
  // Scripts written by one major language: labelled directly, without a detector.
  Hiragana: ['jpn'],
  Katakana: ['jpn'],
  Hangul: ['kor'],
  Greek: ['ell'],
  Thai: ['tha'],
  Lao: ['lao'],
  Khmer: ['khm'],
  Myanmar: ['mya'],
  Georgian: ['kat'],
  Armenian: ['hye'],
  Bengali: ['ben'],
  Gurmukhi: ['pan'],
  Gujarati: ['guj'],
  Oriya: ['ory'],
  Tamil: ['tam'],
  Telugu: ['tel'],
  Kannada: ['kan'],
  Malayalam: ['mal'],
  Sinhala: ['sin'],
  Tibetan: ['bod'],
  Thaana: ['div'],
  Ol_Chiki: ['sat'],
  Tifinagh: ['zgh'],
  Yi: ['iii'],
  Javanese: ['jav'],
};
