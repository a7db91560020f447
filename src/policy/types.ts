// The validated, typed form of a policy file. Everything downstream reads this,
// never the raw YAML. Keys are camelCase here; the YAML uses kebab-case.

/** Severity a rule is judged at; `error` blocks the merge, `warn` only reports. */
export type Severity = 'error' | 'warn';

/** Names of the rules a policy may list under `rules:`. */
export type RuleName =
  | 'input'
  | 'mix'
  | 'script'
  | 'encoding'
  | 'fertility'
  | 'duplicates'
  | 'contamination';

/** Unit a language's share of the corpus is counted in. */
export type MixUnit = 'docs' | 'bytes' | 'chars' | 'words' | 'tokens';

/** Kinds of encoding anomaly the measure stage counts per document. */
export type AnomalyKind =
  | 'replacement-char'
  | 'control-chars'
  | 'bidi-controls'
  | 'zero-width'
  | 'private-use'
  | 'mojibake';

export interface LanguageSpec {
  /** The key exactly as written in the policy (`hin`, `hi`, `en-IN`, `ar`). Reports use it. */
  key: string;
  /** ISO 639-3 code the key resolves to (`hi` → `hin`, `ar` → `ara`). */
  iso6393: string;
  /** English name of the language from ISO 639-3 (`Hindi`), for reports. */
  name?: string;
  /** ISO 639-3 codes a detector label may carry for this language: the code itself plus, for a macrolanguage, its members (`ara` covers `arb`). */
  covers: string[];
  /** Unicode Script property values (long names, e.g. `Devanagari`) that count as this language's own. */
  scripts: string[];
  /** Target share of the mix, 0..1, if the policy sets one. */
  target?: number;
}

export interface EncodingOverride {
  /** Glob relative to the root, matched against a shard's path. */
  glob: string;
  /** iconv-lite encoding name, as written (`windows-1256`). */
  encoding: string;
}

export interface CorpusSpec {
  include: string[];
  exclude: string[];
  /** Dot path of the text field in JSONL records. */
  text: string;
  /** Dot path of a declared-language field in JSONL records, if the shards carry one. */
  declaredLanguage?: string;
  /** Pattern with one `{subset}` placeholder, matched against shard paths. */
  subset?: string;
  encodings: EncodingOverride[];
  /** Lines longer than this (bytes, after decompression) are rejected, not buffered. */
  maxLineBytes: number;
}

export interface DetectionSpec {
  /** Texts with fewer letters than this are labelled `und` (too short to judge). */
  minChars: number;
}

export interface InputRule {
  /** Highest share of input lines that may be rejected (invalid JSON, bad encoding, ...). */
  maxRejected?: number;
  /** How many shards may be unreadable or broken (corrupt compression, truncation). Default 0. */
  maxBrokenShards: number;
}

export interface MixRule {
  unit: MixUnit;
  /** Allowed absolute distance between a language's share and its target (0.03 = 3 points). */
  tolerance: number;
  /** Highest share for text in languages the policy does not list (`other`). */
  maxOther?: number;
  /** Highest share for text too short or unclear to label (`und`). */
  maxUndetermined?: number;
}

export interface ScriptRule {
  /** A document whose purity is below this is impure. */
  minPurity: number;
  /** Highest share of impure documents, per language. */
  maxImpureDocs: number;
}

export interface EncodingRule {
  /** Highest share of documents with any forbidden anomaly. */
  maxAnomalousDocs: number;
  /** Anomaly kinds that make a document anomalous. */
  forbid: AnomalyKind[];
}

/** Judge on a deterministic sample of documents (picked by document hash). */
export type SamplingSpec = { docsPerShard: number } | { fraction: number };

export interface FertilityRule {
  /** Per language key: highest running-text fertility (subword tokens per word). */
  max: Record<string, number>;
  /** Highest relative rise of fertility against the base branch or the baseline tokenizer. */
  maxRegression?: number;
  /** Per language key: highest share of continued words. */
  maxContinued: Record<string, number>;
  /** Per language key: word list (one entry a line, or a hunspell .dic) for dictionary fertility. */
  wordLists: Record<string, { file: string; absPath: string }>;
}

export interface NearDuplicateSpec {
  threshold: number;
  max?: number;
  shingle: number;
  hashes: number;
}

export interface DuplicatesRule {
  maxExact?: number;
  /** Highest share of the documents a change adds that copy the rest of the corpus or repeat one another (exactly or nearly); judged only against a base. */
  maxAdded?: number;
  near: NearDuplicateSpec;
  /** Exact-duplicate normalization: punctuation kept (default) or stripped. */
  punctuation: 'keep' | 'strip';
}

export interface ContaminationRule {
  eval: string[];
  ngram: number;
  maxDocs: number;
}

export interface Rules {
  input: InputRule;
  mix?: MixRule;
  script?: ScriptRule;
  encoding?: EncodingRule;
  fertility?: FertilityRule;
  duplicates?: DuplicatesRule;
  contamination?: ContaminationRule;
}

/** A tokenizer named by the policy: a file (tokenizer.json or tiktoken ranks) or a builtin encoding. */
export type TokenizerSpec =
  | {
      kind: 'file';
      /** As written in the policy, relative to the policy root. */
      file: string;
      absPath: string;
      /** `tokenizer.json` (Hugging Face format) or `tiktoken` (base64 token + rank per line). */
      format: 'tokenizer.json' | 'tiktoken';
      /** For tiktoken rank files, which carry no split pattern: the builtin whose pattern to use, or a regex. */
      pattern?: string;
    }
  | { kind: 'builtin'; name: 'gpt2' | 'r50k_base' | 'p50k_base' | 'cl100k_base' | 'o200k_base' };

/** Keys whose values are checked against the files only when a run starts, and so are named with their position there. */
export type PositionedKey = 'corpus.include' | 'rules.contamination.eval' | 'tokenizer' | 'baseline';

export interface Policy {
  version: 1;
  /** Absolute path of the policy file. */
  file: string;
  /** Name shown in reports (policy key `name`, default the file name without extension). */
  name: string;
  /** Absolute directory all globs are relative to. */
  root: string;
  corpus: CorpusSpec;
  languages: LanguageSpec[];
  detection: DetectionSpec;
  rules: Rules;
  /** Severity per rule; a rule not listed here is `error`. */
  severity: Partial<Record<RuleName, Severity>>;
  tokenizer?: TokenizerSpec;
  baseline?: TokenizerSpec;
  sampling?: SamplingSpec;
  /** Where the values of those keys are written in the policy file (1-based line and column), when it was read from YAML. */
  positions?: Partial<Record<PositionedKey, { line: number; column: number }>>;
}

/** A policy that cannot be judged: file, 1-based line and column, key path, and a suggestion. */
export interface PolicyProblem {
  file: string;
  line?: number;
  column?: number;
  /** Key path in the YAML, e.g. `rules.mix.tolerance`. */
  path: string;
  message: string;
  /** "did you mean `tolerance`?" when a key is close to a valid one. */
  suggestion?: string;
}

/** What loading a policy gives: the typed policy and any warnings, or every problem that stops it being judged. */
export type PolicyResult =
  | { ok: true; policy: Policy; warnings: PolicyProblem[] }
  | { ok: false; problems: PolicyProblem[]; warnings: PolicyProblem[] };
