// Which policy language a document counts under. Script first: the document's dominant
// script selects the candidates — the policy languages that list the script plus the
// major languages written in it (language-candidates.ts) — and franc's trigram method
// chooses among them (language-franc.ts gives franc's labels, faster). A label that a
// policy language covers counts as that language; any other label counts as `other`,
// so text in an unlisted language is not forced into a listed one; a text with too
// few letters, or one the detector cannot label, is `und`.
import { parse } from 'bcp-47';
import type { DetectionSpec, LanguageSpec } from '../policy/types.js';
import { MAJOR_LANGUAGES } from './language-candidates.js';
import { createFrancLabeller, francLanguages, MAX_LENGTH, type FrancLabeller } from './language-franc.js';
import { dominantScriptOf, scriptProfile } from './script.js';
import { isoLanguageOf } from '../policy/data/iso-639-3.js';
import { MACROLANGUAGE_MEMBERS } from '../policy/data/macrolanguages.js';

/** Label for text in a language the policy does not list. */
export const OTHER = 'other';
/** Label for text too short or unclear to label. */
export const UNDETERMINED = 'und';

/** How a document's language was decided. */
export interface LanguageDecision {
  /** Detector label, ISO 639-3, or `und`. */
  detected: string;
  /** Policy key, `other` or `und`. */
  language: string;
}

export interface LanguageDetector {
  /**
   * Returns the detected label and the policy key of `text`, given its dominant script
   * and its count of letters (characters of any script other than Common, Inherited,
   * Unknown).
   */
  detect(text: string, dominantScript: string | null, letters: number): LanguageDecision;
  /** Returns the policy key a declared language (`hi`, `hin`, `hi-IN`, `hi_IN`, a policy key) maps to, or `other`. */
  declared(value: string): string;
  /** Returns the scripts a policy key expects, or undefined for `other`, `und` and unknown keys. */
  scriptsOf(key: string): readonly string[] | undefined;
}

/** A way to label texts of one dominant script: one language directly, a labeller, or nothing known. */
type Route = { direct: string } | { labeller: FrancLabeller } | null;

/** Returns the ISO 639-3 code of an ISO 639-1 (`hi`), 639-2/B (`fre`) or 639-3 (`hin`) code, lower-cased; undefined when it is none. */
export function iso6393Of(code: string): string | undefined {
  const c = code.toLowerCase();
  if (c.length === 2) return isoLanguageOf(c, 1)?.iso6393;
  if (c.length === 3) return isoLanguageOf(c, '2B')?.iso6393 ?? c;
  return undefined;
}

/** Returns a detector for the policy's languages. */
export function createLanguageDetector(languages: readonly LanguageSpec[], detection: DetectionSpec): LanguageDetector {
  // Label (ISO 639-3) -> policy key; the first language listed wins when two cover a code.
  const keyOfLabel = new Map<string, string>();
  for (const spec of languages) {
    for (const code of [spec.iso6393, ...spec.covers]) if (!keyOfLabel.has(code)) keyOfLabel.set(code, spec.key);
  }
  // A shard may declare a macrolanguage (`ar`, `zh`) where the policy lists one member (`arb`, `cmn`):
  // the declaration then means that member, when exactly one policy language is a member.
  const keyOfMacrolanguage = new Map<string, string>();
  for (const [macro, members] of Object.entries(MACROLANGUAGE_MEMBERS)) {
    const keys = new Set(members.map((m) => keyOfLabel.get(m)).filter((k): k is string => k !== undefined));
    if (keys.size === 1 && !keyOfLabel.has(macro)) keyOfMacrolanguage.set(macro, [...keys][0]!);
  }
  const scriptsOfKey = new Map(languages.map((spec) => [spec.key, spec.scripts]));
  const keyOfLowerKey = new Map(languages.map((spec) => [spec.key.toLowerCase(), spec.key]));
  const routes = new Map<string, Route>();
  // franc's profiles are loaded at the first document that needs a label: a run whose shards
  // all come from the cache labels none (loading them was a tenth of such a run's time).
  let francKnows: Set<string> | undefined;
  const declaredCache = new Map<string, string>();

  const routeOf = (script: string): Route => {
    const cached = routes.get(script);
    if (cached !== undefined) return cached;
    const listing = languages.filter((spec) => spec.scripts.includes(script));
    const candidates = new Set(MAJOR_LANGUAGES[script] ?? []);
    for (const spec of listing) for (const code of [spec.iso6393, ...spec.covers]) candidates.add(code);
    const known = (francKnows ??= new Set(francLanguages()));
    const labellable = [...candidates].filter((code) => known.has(code));
    let route: Route = null;
    // The letter count is checked before; the labeller itself imposes no minimum length.
    if (labellable.length > 1) route = { labeller: createFrancLabeller(labellable, 1) };
    // Where the detector knows at most one candidate the script decides: the policy's
    // language for it if it lists one (Assamese in Bengali script, Odia), else the major one.
    else if (listing.length > 0) route = { direct: (listing[0] as LanguageSpec).iso6393 };
    else if (candidates.size > 0) route = { direct: labellable[0] ?? ([...candidates][0] as string) };
    routes.set(script, route);
    return route;
  };

  const labelWith = (route: Route, text: string): string =>
    route === null ? UNDETERMINED : 'direct' in route ? route.direct : route.labeller(text);

  const decide = (detected: string): LanguageDecision => ({
    detected,
    language: detected === UNDETERMINED ? UNDETERMINED : (keyOfLabel.get(detected) ?? OTHER),
  });

  return {
    detect(text, dominantScript, letters) {
      if (dominantScript === null || letters < detection.minChars) return { detected: UNDETERMINED, language: UNDETERMINED };
      const route = routeOf(dominantScript);
      // A script no policy language uses and no major language is known for: certainly
      // not a listed language, though the detector cannot name it.
      if (route === null) return { detected: UNDETERMINED, language: OTHER };
      let detected = labelWith(route, text);
      if (detected === UNDETERMINED && text.length > MAX_LENGTH) {
        // franc judges the first 2048 units only; when their script differs from the
        // whole text's, route by theirs.
        const sampleScript = dominantScriptOf(scriptProfile(text.slice(0, MAX_LENGTH)));
        if (sampleScript !== null && sampleScript !== dominantScript) detected = labelWith(routeOf(sampleScript), text);
      }
      return decide(detected);
    },

    declared(value) {
      const cached = declaredCache.get(value);
      if (cached !== undefined) return cached;
      const trimmed = value.trim();
      let key = keyOfLowerKey.get(trimmed.toLowerCase());
      if (key === undefined) {
        const subtag = parse(trimmed.replace(/_/g, '-'), { forgiving: true }).language;
        const code = subtag ? iso6393Of(subtag) : undefined;
        key = (code && (keyOfLabel.get(code) ?? keyOfMacrolanguage.get(code))) || OTHER;
      }
      if (declaredCache.size < 10_000) declaredCache.set(value, key);
      return key;
    },

    scriptsOf(key) {
      return scriptsOfKey.get(key);
    },
  };
}
