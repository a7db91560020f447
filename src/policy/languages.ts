// Language keys as a policy writes them (ISO 639-1 `hi`, ISO 639-3 `hin`,
// BCP 47 `hi-IN` / `sr-Latn` / `zh-yue`) resolved to ISO 639-3 codes, with the
// detector labels each one covers.
import { parse as parseBcp47 } from 'bcp-47';
import { isoLanguageOf, isoTables, type IsoLanguage } from './data/iso-639-3.js';
import { MACROLANGUAGE_MEMBERS } from './data/macrolanguages.js';
import { lookUpScript } from './scripts.js';
import { didYouMean, nearest } from './suggest.js';

/** Keys that name the two buckets every report has besides the policy's languages. */
export const RESERVED_LANGUAGE_KEYS: Readonly<Record<string, string>> = {
  other: 'text in languages the policy does not list',
  und: 'text too short or unclear to label',
};

/** How the messages say what a language key may be. */
const NOT_A_CODE = 'is not a language code; write ISO 639-1 (`hi`), ISO 639-3 (`hin`) or a BCP 47 tag (`hi-IN`, `sr-Latn`)';

/** A language key that resolved. */
export interface ResolvedLanguage {
  ok: true;
  iso6393: string;
  /** English name from ISO 639-3 (`Hindi`). */
  name: string;
  /** The code itself and, for a macrolanguage, its member languages. */
  covers: string[];
  /** Unicode long names from a BCP 47 script subtag (`sr-Latn` → Latin), when the key has one. */
  subtagScripts?: readonly string[];
  /** The script subtag as written, for messages. */
  scriptSubtag?: string;
}

/** A language key that did not resolve, with the reason. */
export interface UnresolvedLanguage {
  ok: false;
  message: string;
  suggestion?: string;
}

/** Returns the macrolanguage members of a code (empty for an individual language). */
export function membersOf(code: string): readonly string[] {
  return Object.hasOwn(MACROLANGUAGE_MEMBERS, code) ? MACROLANGUAGE_MEMBERS[code]! : [];
}

/** Returns a resolved language for an ISO 639-3 entry. */
function resolvedOf(lang: IsoLanguage): ResolvedLanguage | UnresolvedLanguage {
  if (lang.scope === 'special') {
    return { ok: false, message: `\`${lang.iso6393}\` is a special ISO 639 code (${lang.name}), not a language` };
  }
  return { ok: true, iso6393: lang.iso6393, name: lang.name, covers: [lang.iso6393, ...membersOf(lang.iso6393)] };
}

/** Returns the suggestion for a key that is not a code: the code of a language it names, or a near name. */
function suggestionForName(key: string): string | undefined {
  const { byName } = isoTables();
  const exact = byName.get(key.toLowerCase());
  if (exact) return didYouMean(exact.iso6393);
  if (key.length < 4) return undefined;
  const near = nearest(key, byName.keys());
  const lang = near === undefined ? undefined : byName.get(near);
  return lang ? `did you mean \`${lang.iso6393}\` (${lang.name})?` : undefined;
}

/** Returns a 2- or 3-letter primary language subtag resolved, or why not. */
function resolvePrimary(code: string, written: string): ResolvedLanguage | UnresolvedLanguage {
  const lower = code.toLowerCase();
  if (lower.length === 2) {
    const lang = isoLanguageOf(lower, 1);
    if (lang) return resolvedOf(lang);
    return { ok: false, message: `\`${written}\` is not an ISO 639-1 code` };
  }
  if (lower.length === 3) {
    const lang = isoLanguageOf(lower, 3);
    if (lang) return resolvedOf(lang);
    const bib = isoLanguageOf(lower, '2B');
    if (bib) {
      return {
        ok: false,
        message: `\`${written}\` is an ISO 639-2/B code (${bib.name}); keys use ISO 639-3 codes`,
        suggestion: didYouMean(bib.iso6393),
      };
    }
    return { ok: false, message: `\`${written}\` is not an ISO 639-3 code` };
  }
  return { ok: false, message: `\`${written}\` ${NOT_A_CODE}` };
}

/** Returns what a policy language key stands for: its ISO 639-3 code, the labels it covers and any script its tag names; or why it is not a language. */
export function resolveLanguageKey(key: string): ResolvedLanguage | UnresolvedLanguage {
  const lower = key.toLowerCase();
  const reserved = Object.hasOwn(RESERVED_LANGUAGE_KEYS, lower) ? RESERVED_LANGUAGE_KEYS[lower] : undefined;
  if (reserved) {
    return { ok: false, message: `\`${key}\` is reserved: reports use it for ${reserved}` };
  }
  if (/^[A-Za-z]{2,3}$/.test(key)) {
    const r = resolvePrimary(key, key);
    if (!r.ok && !r.suggestion) {
      const s = suggestionForName(key);
      if (s) return { ...r, suggestion: s };
    }
    return r;
  }

  // BCP 47 (RFC 5646). Warnings from the parser mean the tag is malformed.
  let malformed: string | undefined;
  const tag = parseBcp47(key, {
    normalize: true,
    warning: (reason) => {
      malformed ??= reason;
    },
  });
  // An extended language subtag is the language itself: `zh-yue` is Cantonese (RFC 5646, 2.2.2).
  const primary = tag.extendedLanguageSubtags[0] ?? tag.language;
  if (malformed || !primary) {
    const s = suggestionForName(key);
    return {
      ok: false,
      message: `\`${key}\` ${NOT_A_CODE}`,
      ...(s ? { suggestion: s } : {}),
    };
  }
  const r = resolvePrimary(primary, primary);
  if (!r.ok) {
    const suggestion = r.suggestion ?? suggestionForName(primary);
    const message = primary === key ? r.message : `${r.message} (in \`${key}\`)`;
    return { ok: false, message, ...(suggestion ? { suggestion } : {}) };
  }
  if (tag.script) {
    const s = lookUpScript(tag.script);
    if (!s.ok) {
      return { ok: false, message: `script subtag \`${tag.script}\` in \`${key}\`: ${s.message}`, ...(s.suggestion ? { suggestion: s.suggestion } : {}) };
    }
    return { ...r, subtagScripts: s.scripts, scriptSubtag: tag.script };
  }
  return r;
}
