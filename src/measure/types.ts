// What the measure stage computes for one document. Pure data: the results stage
// folds these into per-shard tallies.
import type { AnomalyKind } from '../policy/types.js';

export type AnomalyCounts = Record<AnomalyKind, number>;

/** Invisible characters that are legitimate in some orthographies, counted for information only (never an anomaly). */
export interface MarkCounts {
  /** U+200C ZERO WIDTH NON-JOINER and U+200D ZERO WIDTH JOINER (Persian, Urdu, Indic scripts, emoji sequences). */
  joiners: number;
  /** U+200E LEFT-TO-RIGHT MARK, U+200F RIGHT-TO-LEFT MARK, U+061C ARABIC LETTER MARK. */
  directionMarks: number;
}

export interface DocumentMeasure {
  /** UTF-8 bytes of the text. */
  bytes: number;
  /** Unicode code points. */
  chars: number;
  /** Word-like segments by UAX #29 (Intl.Segmenter, granularity word). */
  words: number;
  /** Characters per Unicode Script (long names), Common, Inherited and Unknown excluded. */
  scripts: Record<string, number>;
  /** Script with the most characters, or null when the text has none. */
  dominantScript: string | null;
  /** Detector label, ISO 639-3 (`hin`, `arb`), or `und`. */
  detected: string;
  /** Policy language key the document counts under, or `other` / `und`. */
  language: string;
  /** The declared language mapped to a policy key (or `other`), when the shard declares one. */
  declared?: string;
  /** Share of script characters in the expected scripts of the document's language (declared if given, else detected); null when it has no script characters or its language is other/und. */
  purity: number | null;
  anomalies: AnomalyCounts;
  /** Informational counts of joiners and direction marks; the measurer always sets it. */
  marks?: MarkCounts;
}
