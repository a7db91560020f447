// The per-document measurer: size, words, script profile, encoding anomalies and
// language of one document. Pure and synchronous; the results stage folds its output
// into per-shard tallies.
//
// Words, script counts, anomalies, UTF-8 bytes and code points come from one pass over
// the text with one table lookup per character (words.ts measureText); the language
// last, from the dominant script (language.ts).
import type { DetectionSpec, LanguageSpec } from '../policy/types.js';
import { createLanguageDetector, OTHER, UNDETERMINED } from './language.js';
import { FIRST_COUNTED_ID, SCRIPT_NAMES } from './script.js';
import type { DocumentMeasure } from './types.js';
import { CharacterTally, measureText } from './words.js';

/** What the measurer needs from the policy. */
export interface MeasurerSettings {
  languages: LanguageSpec[];
  detection: DetectionSpec;
}

/** One document as the read stage hands it on (only what the measurer looks at). */
export interface MeasurableDocument {
  text: string;
  declaredLanguage?: string;
}

/** Returns a function that measures one document against the policy's languages and detection settings. */
export function createMeasurer(settings: MeasurerSettings): (doc: MeasurableDocument) => DocumentMeasure {
  const detector = createLanguageDetector(settings.languages, settings.detection);
  const pass = new CharacterTally();
  const { counts } = pass;

  return (doc) => {
    const { text } = doc;
    const words = measureText(text, pass);

    const scripts: Record<string, number> = {};
    let letters = 0;
    let dominant = 0;
    for (let id = FIRST_COUNTED_ID; id < counts.length; id++) {
      const n = counts[id] as number;
      if (n === 0) continue;
      scripts[SCRIPT_NAMES[id] as string] = n;
      letters += n;
      // Ids follow the names' order, so a tie keeps the first name, as dominantScriptOf does.
      if (dominant === 0 || n > (counts[dominant] as number)) dominant = id;
    }
    const dominantScript = letters === 0 ? null : (SCRIPT_NAMES[dominant] as string);

    const { detected, language } = detector.detect(text, dominantScript, letters);
    const declared = doc.declaredLanguage === undefined ? undefined : detector.declared(doc.declaredLanguage);

    // Purity is judged against the declared language when it is a policy language, so
    // that romanised Hindi filed under Hindi shows up as impure.
    const expected = declared !== undefined && declared !== OTHER ? declared : language;
    let purity: number | null = null;
    const expectedScripts = expected === OTHER || expected === UNDETERMINED ? undefined : detector.scriptsOf(expected);
    if (expectedScripts !== undefined && letters > 0) {
      let own = 0;
      for (const name of expectedScripts) own += scripts[name] ?? 0;
      purity = own / letters;
    }

    const measure: DocumentMeasure = {
      bytes: pass.bytes,
      chars: pass.chars,
      words,
      scripts,
      dominantScript,
      detected,
      language,
      purity,
      anomalies: pass.anomalies,
      marks: pass.marks,
    };
    if (declared !== undefined) measure.declared = declared;
    return measure;
  };
}
