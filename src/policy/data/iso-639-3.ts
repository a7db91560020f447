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
  for (const row of ISO_639_3_ROWS.split('\n')) {
    const [iso6393, iso6392B, iso6391, scope, name] = row.split('|') as [string, string, string, keyof typeof SCOPES, string];
    const language: IsoLanguage = { iso6393, scope: SCOPES[scope], name };
    if (iso6392B) language.iso6392B = iso6392B;
    if (iso6391) language.iso6391 = iso6391;
    out.push(language);
  }
  return (languages = out);
}

/** The codes looked up by their 639-3, 639-1 and 639-2/B codes (B only where it differs) and lower-cased names (the first of a name). */
export interface IsoTables {
  by3: Map<string, IsoLanguage>;
  by1: Map<string, IsoLanguage>;
  by2B: Map<string, IsoLanguage>;
  byName: Map<string, IsoLanguage>;
}

let tables: IsoTables | undefined;

/** Returns the lookup tables over the code table, built once (the policy's language keys and the documents' declared tags use them). */
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
