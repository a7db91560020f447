// The measure stage: per-document measurements (size, words, scripts, encoding
// anomalies, language). The tokens and duplicates analyzers live in their own folders.
export { createMeasurer, type MeasurableDocument, type MeasurerSettings } from './document.js';
export { ANOMALY_KINDS, countAnomalies, countMojibake, emptyAnomalyCounts, emptyMarkCounts } from './encoding.js';
export { createLanguageDetector, iso6393Of, OTHER, UNDETERMINED, type LanguageDecision, type LanguageDetector } from './language.js';
export { createFrancLabeller, francLabel, type FrancLabeller } from './language-franc.js';
export { kernelUnavailable } from './kernels/instance.js';
export { MAJOR_LANGUAGES } from './language-candidates.js';
export { dominantScriptOf, purityOf, SCRIPT_CODES, SCRIPT_NAMES, scriptOf, scriptProfile } from './script.js';
export { countWords, countWordsWithSegmenter, forEachWord, needsSegmenter, wordOffsets } from './words.js';
export type { AnomalyCounts, DocumentMeasure, MarkCounts } from './types.js';
