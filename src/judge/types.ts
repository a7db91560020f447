// The report: one data model that every view (terminal, Markdown, JSON, PR
// comment) renders. No view computes a figure; they all come from here.
import type { MixUnit, RuleName, Severity } from '../policy/types.js';
import type { Rejection, SkippedFile } from '../read/types.js';
import type { Interval, IntervalMethod } from './intervals.js';

export type { Interval, IntervalMethod } from './intervals.js';

export type Verdict = 'pass' | 'warn' | 'fail';

/**
 * A rule's verdict: `uncertain` when, on a sample, the figure's confidence interval straddles the limit;
 * `unjudged` when there is nothing to work the figure out from (a listed language with no documents,
 * or none with letters or words). Neither blocks the merge; the headline names both.
 */
export type RuleVerdict = Verdict | 'uncertain' | 'unjudged';

/** A sampling setting as the policy spells it, ready to paste. */
export type SamplingSetting = { 'docs-per-shard': number } | { fraction: number };

/** Confidence intervals of a language's figures, present only when the report is made from a sample. */
export interface LanguageIntervals {
  /** Of each share in `share`. */
  share: Partial<Record<MixUnit, Interval>>;
  purity?: Interval;
  /** Of impureDocs ÷ purityDocs. */
  impureDocs?: Interval;
  /** Of mismatchDocs ÷ declaredDocs. */
  mismatchDocs?: Interval;
  /** Of fertility.fertility and fertility.continuedWords, under the main tokenizer. */
  fertility?: Interval;
  continuedWords?: Interval;
}

/** How a sampled report was made; absent when every document was measured. */
export interface SamplingFigures {
  method: 'fraction' | 'docs-per-shard';
  /** The policy's setting. */
  setting: number;
  /** Documents measured, of all documents read. */
  measuredDocs: number;
  docs: number;
  /** Shards whose every document was measured. */
  completeShards: number;
  confidence: number;
  /** Each interval method used, spelled out. */
  methods: Partial<Record<IntervalMethod, string>>;
  /** Figures computed over every document, not the sample (so exact, without intervals). */
  everyDocument: string[];
}

/** Shares of the corpus, each over all documents of the corpus (other and und included). */
export interface Shares {
  docs: number;
  bytes: number;
  chars: number;
  words: number;
  tokens?: number;
}

export interface TokenFigures {
  tokenizer: string;
  tokens: number;
  /** Subword tokens per word, each word tokenized as it occurs (Rust et al., 2021). */
  fertility: number | null;
  /** Share of words split into two or more tokens (Rust et al., 2021). */
  continuedWords: number | null;
  tokensPerWord: number | null;
  charsPerToken: number | null;
  bytesPerToken: number | null;
  /** Share of tokens that are the unknown token; null when the vocabulary has none. */
  unknownRate: number | null;
  /** Dictionary fertility over the policy's word list for this language, if one is set. */
  dictionary?: { entries: number; fertility: number; continuedWords: number; list: string };
}

export interface LanguageFigures {
  /** As written in the policy, or `other` / `und`. */
  key: string;
  target?: number;
  docs: number;
  bytes: number;
  chars: number;
  words: number;
  tokens?: number;
  share: Shares;
  /** Script characters in the language's own scripts ÷ all script characters, over documents judged against this language. */
  purity: number | null;
  /** Documents whose purity was judged against this language (declared, else detected). */
  purityDocs: number;
  /** Of those, documents below the script rule's minimum purity (when the policy sets one). */
  impureDocs?: number;
  /** Documents that declare this language, and how many of them the detector labels otherwise. */
  declaredDocs?: number;
  mismatchDocs?: number;
  /** declared → detected counts, for documents declaring this language. */
  detectedAs?: Record<string, number>;
  fertility?: TokenFigures;
  baseline?: TokenFigures;
  /** On a sample: the counts above are estimates for the whole corpus, and these are the intervals of its shares and rates. */
  intervals?: LanguageIntervals;
}

export interface Location {
  path: string;
  line?: number;
  detail?: string;
}

export interface RuleOutcome {
  rule: RuleName;
  /** What the figure is computed over: `corpus`, `language:hin`, `shard:data/x.jsonl.gz`. */
  scope: string;
  measured: number | null;
  limit: number | null;
  /** For limits of the form target ± tolerance (mix): the tolerance, in the same unit. */
  tolerance?: number;
  /** How to read measured and limit: share (0..1), count, ratio. */
  unit: 'share' | 'count' | 'ratio' | 'points';
  severity: Severity;
  verdict: RuleVerdict;
  message: string;
  locations: Location[];
  /** On a sample: the confidence interval of `measured`. */
  interval?: Interval;
  /** When `uncertain`: the measured documents at which the interval would clear the limit by half the estimate's distance to it if the estimate stayed put, and the policy setting that gives about that many (null: only measuring every document settles it). */
  settle?: { docs: number; sampling: SamplingSetting | null };
}

export interface ShardFigures {
  path: string;
  subset?: string;
  lines: number;
  docs: number;
  empty: number;
  rejected: number;
  bytes: number;
  /** Documents per detected language. */
  languages: Record<string, number>;
  tokens?: number;
  broken?: { afterLine: number; message: string };
  rejections: Rejection[];
  fromCache: boolean;
  /** On a sample: documents measured in this shard (its languages and tokens are estimates scaled from them). */
  measuredDocs?: number;
}

export interface DuplicateCluster {
  kind: 'exact' | 'near';
  first: Location;
  copies: Array<Location & { jaccard?: number }>;
  size: number;
}

export interface DuplicateFigures {
  exactDocs: number;
  exactRate: number;
  nearDocs: number;
  nearRate: number;
  /** Documents too short for one shingle: exact duplicates still counted, near not judged. */
  tooShortDocs: number;
  byLanguage: Record<string, { docs: number; exactDocs: number; nearDocs: number }>;
  bySubset: Record<string, { docs: number; exactDocs: number; nearDocs: number }>;
  byShard: Record<string, { docs: number; exactDocs: number; nearDocs: number }>;
  clusters: DuplicateCluster[];
  parameters: { shingle: number; hashes: number; bands: number; rows: number; threshold: number };
}

export interface ContaminationFigures {
  docs: number;
  ngram: number;
  evalFiles: string[];
  evalItems: number;
  samples: Location[];
}

export interface Report {
  report: 'sluice';
  version: 1;
  tool: { name: 'sluice'; version: string };
  policy: { name: string; file: string; root: string };
  verdict: Verdict;
  /** One line saying the verdict and why. */
  headline: string;
  mixUnit: MixUnit;
  /** Sizes of the corpus; on a sample, all but `docs` are estimates (`estimated` is then set). */
  totals: { docs: number; bytes: number; chars: number; words: number; tokens?: number; estimated?: true };
  languages: Record<string, LanguageFigures>;
  scripts: Record<string, number>;
  subsets: Record<string, { docs: number; bytes: number; words: number; tokens?: number; languages: Record<string, number> }>;
  rules: RuleOutcome[];
  input: {
    shards: number;
    lines: number;
    docs: number;
    docLines: number;
    empty: number;
    rejected: { count: number; byReason: Record<string, number> };
    skipped: SkippedFile[];
    broken: Array<{ path: string; afterLine: number; message: string }>;
  };
  shards: ShardFigures[];
  tokenizer?: { main: string; baseline?: string; mixUnderBaseline?: Record<string, number>; mixShiftPoints?: Record<string, number>; mixUnderBaselineIntervals?: Record<string, Interval> };
  /** Present when the policy samples: what was measured and how the intervals are made. */
  sampling?: SamplingFigures;
  duplicates?: DuplicateFigures;
  contamination?: ContaminationFigures;
  /** Not part of any judgement; left out when reports are compared. */
  timing: { elapsedMs: number; megabytesPerSecond: number; cacheHits: number; cacheMisses: number };
}
