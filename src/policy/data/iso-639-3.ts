// The ISO 639-3 code table (iso-639-3.generated.ts, from the iso-639-3 package), parsed on first use.
import { ISO_639_3_ROWS } from './iso-639-3.generated.js';

/** One ISO 639-3 code, with the ISO 639-2/B and 639-1 codes of the same language where it has them. */
export interface IsoLanguage {
  iso6393: string;
  iso6392B?: string;
  iso6391?: string;
  scope: 'individual' | 'macrolanguage' | 'special';
  /** English reference name (`Hindi`). */
  name: string;
}

const SCOPES = { i: 'individual', m: 'macrolanguage', s: 'special' } as const;

let languages: readonly IsoLanguage[] | undefined;

/** Returns every ISO 639-3 code, in the table's order (by code). */
export function isoLanguages(): readonly IsoLanguage[] {
  if (languages) return languages;
  const out: IsoLanguage[] = [];
  for (const row of ISO_639_3_ROWS.split('\n')) out.push(rowOf(row));
  return (languages = out);
}

/**
 * Returns the entry of a lower-case ISO 639-3 (`part: 3`), 639-1 (`1`) or 639-2/B (`'2B'`, only where it
 * differs from the 639-3 code) code, or undefined. Looks the code up in the table's text instead of
 * building maps of all 7,900 rows: policy keys and declared tags need a handful of codes, and the maps
 * took 10-17 ms of every thread's start (CPU profiles of a 20-document full check). Each answer is kept.
 */
export function isoLanguageOf(code: string, part: 3 | 1 | '2B'): IsoLanguage | undefined {
  // Only letters of the code's length are looked for (and kept): at most 26³ answers per part, however many distinct tags a corpus declares.
  if (code.length !== (part === 1 ? 2 : 3) || !/^[a-z]+$/.test(code)) return undefined;
  const memo = part === 3 ? by3 : part === 1 ? by1 : by2B;
  const known = memo.get(code);
  if (known !== undefined || memo.has(code)) return known;
  const found = findRow(code, part);
  memo.set(code, found);
  return found;
}

const by3 = new Map<string, IsoLanguage | undefined>();
const by1 = new Map<string, IsoLanguage | undefined>();
const by2B = new Map<string, IsoLanguage | undefined>();

// Rows are `<639-3>|<639-2/B>|<639-1>|<scope>|<name>`: a 639-3 code starts a line; `|xx|` with two
// letters can only be a 639-1 field (the scope is one letter, the other codes three, names hold no
// `|`); `|xxx|` right after a line's first three letters is its 639-2/B field.
function findRow(code: string, part: 3 | 1 | '2B'): IsoLanguage | undefined {
  const rows = ISO_639_3_ROWS;
  if (part === 3) {
    if (rows.startsWith(`${code}|`)) return rowAt(0);
    const i = rows.indexOf(`\n${code}|`);
    return i < 0 ? undefined : rowAt(i + 1);
  }
  for (let i = rows.indexOf(`|${code}|`); i >= 0; i = rows.indexOf(`|${code}|`, i + 1)) {
    const start = rows.lastIndexOf('\n', i) + 1;
    // The 639-1 field follows `xxx||` (no 639-2/B code) or `xxx|yyy|`; the 639-2/B field follows `xxx`.
    if (part === 1 ? i === start + 4 || i === start + 7 : i === start + 3) {
      const lang = rowAt(start);
      if (part === '2B' && lang.iso6392B === lang.iso6393) return undefined;
      return lang;
    }
  }
  return undefined;
}

function rowAt(start: number): IsoLanguage {
  const end = ISO_639_3_ROWS.indexOf('\n', start);
  return rowOf(ISO_639_3_ROWS.slice(start, end < 0 ? undefined : end));
}

function rowOf(row: string): IsoLanguage {
  const [iso6393, iso6392B, iso6391, scope, name] = row.split('|') as [string, string, string, keyof typeof SCOPES, string];
  const language: IsoLanguage = { iso6393, scope: SCOPES[scope], name };
  if (iso6392B) language.iso6392B = iso6392B;
  if (iso6391) language.iso6391 = iso6391;
  return language;
}

/** The codes looked up by their 639-3, 639-1 and 639-2/B codes (B only where it differs) and lower-cased names (the first of a name). */
export interface IsoTables {
  by3: Map<string, IsoLanguage>;
  by1: Map<string, IsoLanguage>;
  by2B: Map<string, IsoLanguage>;
  byName: Map<string, IsoLanguage>;
}

let tables: IsoTables | undefined;

/** Returns the lookup tables over the whole code table, built once: for suggestions among the names (isoLanguageOf finds one code without them). */
export function isoTables(): IsoTables {
  if (tables) return tables;
  const t: IsoTables = { by3: new Map(), by1: new Map(), by2B: new Map(), byName: new Map() };
  for (const lang of isoLanguages()) {
    t.by3.set(lang.iso6393, lang);
    if (lang.iso6391) t.by1.set(lang.iso6391, lang);
    if (lang.iso6392B && lang.iso6392B !== lang.iso6393) t.by2B.set(lang.iso6392B, lang);
    const name = lang.name.toLowerCase();
    if (!t.byName.has(name)) t.byName.set(name, lang);
  }
  return (tables = t);
}
