// The per-document measurer: size, words, script profile, encoding anomalies and
// language of one document. Pure and synchronous; the results stage folds its output
// into per-shard tallies.
//
// Script counts, anomalies, UTF-8 bytes and code points come from one pass over the
// text with one table lookup per character; words from a second, equally cheap pass
// (words.ts); the language last, from the dominant script (language.ts).
import type { DetectionSpec, LanguageSpec } from '../policy/types.js';
import { anomalyOf, emptyAnomalyCounts, emptyMarkCounts, countMojibake, markOf, MOJIBAKE_LEAD_FIRST, MOJIBAKE_LEAD_LAST, needsCloserLook } from './encoding.js';
import { createLanguageDetector, OTHER, UNDETERMINED } from './language.js';
import { astralScriptId, bmpScriptIds, FIRST_COUNTED_ID, SCRIPT_NAMES } from './script.js';
import type { AnomalyCounts, DocumentMeasure, MarkCounts } from './types.js';
import { countWords } from './words.js';

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

/** Bits of the per-character table: the low byte is the Script id. */
const SCRIPT_MASK = 0xff;
/** The character is an anomaly, an informational mark or a possible mojibake lead: look closer. */
const CLOSER_LOOK = 0x100;

let characterTable: Uint16Array | undefined;

/** Returns, per BMP code point, its Script id and whether it needs a closer look, built on first use. */
function characters(): Uint16Array {
  if (characterTable) return characterTable;
  const scripts = bmpScriptIds();
  const table = new Uint16Array(0x10000);
  for (let cp = 0; cp < 0x10000; cp++) table[cp] = (scripts[cp] as number) | (needsCloserLook(cp) ? CLOSER_LOOK : 0);
  characterTable = table;
  return table;
}

interface Pass {
  bytes: number;
  chars: number;
  anomalies: AnomalyCounts;
  marks: MarkCounts;
}

/** One pass over `text`: per-script counts into `counts` (zeroed first), and bytes, code points, anomalies and marks. */
function scanCharacters(text: string, counts: Int32Array): Pass {
  const table = characters();
  counts.fill(0);
  const anomalies = emptyAnomalyCounts();
  const marks = emptyMarkCounts();
  const n = text.length;
  let bytes = 0;
  let pairs = 0;
  let leads = false;
  for (let i = 0; i < n; i++) {
    const unit = text.charCodeAt(i);
    if (unit >= 0xd800 && unit <= 0xdbff && i + 1 < n) {
      const low = text.charCodeAt(i + 1);
      if (low >= 0xdc00 && low <= 0xdfff) {
        const cp = ((unit - 0xd800) << 10) + (low - 0xdc00) + 0x10000;
        const id = astralScriptId(cp);
        counts[id] = (counts[id] as number) + 1;
        if (cp >= 0xf0000) {
          const kind = anomalyOf(cp, false); // planes 15 and 16 are private use
          if (kind !== null) anomalies[kind]++;
        }
        bytes += 4;
        pairs++;
        i++;
        continue;
      }
    }
    // An unpaired surrogate is written as U+FFFD (3 bytes), as Buffer.byteLength counts it.
    bytes += unit < 0x80 ? 1 : unit < 0x800 ? 2 : 3;
    const info = table[unit] as number;
    const id = info & SCRIPT_MASK;
    counts[id] = (counts[id] as number) + 1;
    if ((info & CLOSER_LOOK) !== 0) {
      const kind = anomalyOf(unit, i === 0);
      if (kind !== null) anomalies[kind]++;
      const mark = markOf(unit);
      if (mark !== null) marks[mark]++;
      if (unit >= MOJIBAKE_LEAD_FIRST && unit <= MOJIBAKE_LEAD_LAST) leads = true;
    }
  }
  // Only text with a character that can stand for a UTF-8 lead byte can hold mojibake.
  if (leads) anomalies.mojibake = countMojibake(text);
  return { bytes, chars: n - pairs, anomalies, marks };
}

/** Returns a function that measures one document against the policy's languages and detection settings. */
export function createMeasurer(settings: MeasurerSettings): (doc: MeasurableDocument) => DocumentMeasure {
  const detector = createLanguageDetector(settings.languages, settings.detection);
  const counts = new Int32Array(SCRIPT_NAMES.length);

  return (doc) => {
    const { text } = doc;
    const pass = scanCharacters(text, counts);

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
      words: countWords(text),
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
