// From the policy's plain YAML value to the typed Policy: defaults filled in,
// names resolved, and every rule that a schema cannot express (codes, scripts,
// sums, cross-references between sections) checked. The value may not match the
// schema (its problems are reported separately), so every read here is guarded
// and a wrong-typed entry is skipped rather than trusted.
import path from 'node:path';
import iconv from 'iconv-lite';
import { isLineSplittableEncoding } from './encodings.js';
import type { KeyPath } from './format.js';
import type {
  AnomalyKind,
  ContaminationRule,
  CorpusSpec,
  DuplicatesRule,
  EncodingOverride,
  EncodingRule,
  FertilityRule,
  InputRule,
  LanguageSpec,
  MixRule,
  MixUnit,
  Policy,
  RuleName,
  Rules,
  SamplingSpec,
  ScriptRule,
  Severity,
  TokenizerSpec,
} from './types.js';
import { DEFAULT_SCRIPTS } from './data/default-scripts.js';
import { resolveLanguageKey } from './languages.js';
import { lookUpScript } from './scripts.js';
import { didYouMean, nearest } from './suggest.js';

// Defaults. schemas/policy.schema.json shows the same values to editors; test/policy/schema.test.ts keeps the two equal.

/** Lines longer than this are rejected unbuffered: 8 MiB holds any real document while bounding memory per line. */
export const DEFAULT_MAX_LINE_BYTES = 8 * 1024 * 1024;
/** Fewer letters than this and a text is `und`: short texts are unreliable for every detector (field notes); 20 is a rule of thumb (common practice). */
export const DEFAULT_MIN_CHARS = 20;
/** Default mix tolerance: 3 points, tight enough to see a PR that moves the mix, loose enough for shard-to-shard noise (common practice). */
export const DEFAULT_TOLERANCE = 0.03;
/** Default script purity threshold and impure-document share (common practice). */
export const DEFAULT_MIN_PURITY = 0.9;
export const DEFAULT_MAX_IMPURE_DOCS = 0.02;
/** Anomalies forbidden by default; zero-width is left out because joiners (ZWJ/ZWNJ) are correct spelling in Indic and Persian text. */
export const DEFAULT_FORBID: readonly AnomalyKind[] = ['replacement-char', 'control-chars', 'bidi-controls', 'mojibake'];
/** Near-duplicate defaults: Jaccard 0.8 over word 5-grams with 128 MinHash functions (standard error ≤ 0.045 at any J). */
export const DEFAULT_NEAR = { threshold: 0.8, shingle: 5, hashes: 128 } as const;
/** Contamination n-gram length: 13 words, the overlap test of Brown et al. (2020), appendix C. */
export const DEFAULT_NGRAM = 13;

/** Targets may exceed 1 by this much before it counts: room for decimal rounding such as 0.1 + 0.2. */
const SUM_EPSILON = 1e-9;
/** A tolerance this large lets almost any share pass. */
const LOOSE_TOLERANCE = 0.5;
/** Below this many characters a detector cannot tell languages apart at all (franc gives up under 10). */
const MIN_SENSIBLE_MIN_CHARS = 10;
/** N-grams shorter than this match common phrases, not copied evaluation items (common practice). */
const MIN_SENSIBLE_NGRAM = 8;
/** A near-duplicate threshold below this groups documents that merely share a topic. */
const LOOSE_NEAR_THRESHOLD = 0.5;

/** The builtin tokenizer encodings shipped in js-tiktoken that sluice accepts. */
export const BUILTIN_TOKENIZERS = ['gpt2', 'r50k_base', 'p50k_base', 'cl100k_base', 'o200k_base'] as const;
type BuiltinName = (typeof BUILTIN_TOKENIZERS)[number];

const RULE_NAMES: readonly RuleName[] = ['input', 'mix', 'script', 'encoding', 'fertility', 'duplicates', 'contamination'];
const MIX_UNITS: readonly MixUnit[] = ['docs', 'bytes', 'chars', 'words', 'tokens'];
const ANOMALY_KINDS: readonly AnomalyKind[] = ['replacement-char', 'control-chars', 'bidi-controls', 'zero-width', 'private-use', 'mojibake'];

/** A file the policy names, to be checked for existence by loadPolicy. */
export interface FileReference {
  path: KeyPath;
  /** What the file is, for the message (`tokenizer file`, `word list`). */
  what: string;
  file: string;
  absPath: string;
}

/** Where the builder reports what it finds. */
export interface BuildSink {
  problem(path: KeyPath, message: string, opts?: { part?: 'key' | 'value'; suggestion?: string }): void;
  warning(path: KeyPath, message: string, opts?: { part?: 'key' | 'value'; suggestion?: string }): void;
}

/** Settings that come from outside the policy text. */
export interface BuildOptions {
  /** Absolute path of the policy file. */
  file: string;
  /** Absolute root that overrides the policy's `root:` key. */
  root?: string;
  /** Absolute root used when neither the override nor `root:` sets one. */
  defaultRoot?: string;
}

type Obj = Record<string, unknown>;

function asObj(v: unknown): Obj | undefined {
  return v !== null && typeof v === 'object' && !Array.isArray(v) ? (v as Obj) : undefined;
}
function asNum(v: unknown): number | undefined {
  return typeof v === 'number' && Number.isFinite(v) ? v : undefined;
}
function asStr(v: unknown): string | undefined {
  return typeof v === 'string' && v.length > 0 ? v : undefined;
}
/** A glob list written as a single string or a list; wrong-typed entries are dropped (the schema reports them). */
function asStrList(v: unknown): string[] | undefined {
  if (typeof v === 'string') return v.length > 0 ? [v] : [];
  if (Array.isArray(v)) return v.filter((x): x is string => typeof x === 'string' && x.length > 0);
  return undefined;
}
function fmt(n: number): string {
  return String(Math.round(n * 1e6) / 1e6);
}

/** Returns the typed policy built from a plain YAML value, reporting what is wrong through `sink`, and the files it names. */
export function buildPolicy(value: unknown, opts: BuildOptions, sink: BuildSink): { policy: Policy; files: FileReference[] } {
  const raw = asObj(value) ?? {};
  const files: FileReference[] = [];
  const policyDir = path.dirname(opts.file);

  const writtenRoot = asStr(raw.root);
  const root = opts.root ?? (writtenRoot !== undefined ? path.resolve(policyDir, writtenRoot) : (opts.defaultRoot ?? policyDir));

  const corpus = buildCorpus(asObj(raw.corpus) ?? {}, sink);
  const tokenizer = buildTokenizer(raw.tokenizer, ['tokenizer'], root, files, sink);
  const baseline = buildTokenizer(raw.baseline, ['baseline'], root, files, sink);
  if (raw.baseline !== undefined && raw.tokenizer === undefined) {
    sink.problem(['baseline'], 'a baseline is compared against the `tokenizer`, which is not set', { part: 'key' });
  }
  if (tokenizer && baseline && JSON.stringify(tokenizer) === JSON.stringify(baseline)) {
    sink.warning(['baseline'], 'the baseline is the same tokenizer as `tokenizer`, so every comparison is even', { part: 'key' });
  }

  const languages = buildLanguages(raw.languages, sink);
  const detection = { minChars: asNum(asObj(raw.detection)?.['min-chars']) ?? DEFAULT_MIN_CHARS };
  if (detection.minChars < MIN_SENSIBLE_MIN_CHARS) {
    sink.warning(['detection', 'min-chars'], `texts of fewer than ${MIN_SENSIBLE_MIN_CHARS} letters cannot be told apart by language; ${detection.minChars} lets guesses count`);
  }
  const sampling = buildSampling(raw.sampling);
  const rules = buildRules(asObj(raw.rules) ?? {}, { languages, tokenizerSet: raw.tokenizer !== undefined, root, files, sink });
  const severity = buildSeverity(asObj(raw.severity) ?? {}, rules, sink);

  const policy: Policy = {
    version: 1,
    file: opts.file,
    name: asStr(raw.name) ?? path.parse(opts.file).name,
    root,
    corpus,
    languages,
    detection,
    rules,
    severity,
    ...(tokenizer ? { tokenizer } : {}),
    ...(baseline ? { baseline } : {}),
    ...(sampling ? { sampling } : {}),
  };
  return { policy, files };
}

/** Returns problems with one glob: globs are relative to the root and stay inside it. */
function checkGlob(glob: string, at: KeyPath, sink: BuildSink): void {
  if (path.isAbsolute(glob) || /^[A-Za-z]:[\\/]/.test(glob)) {
    sink.problem(at, `\`${glob}\` is an absolute path; globs are relative to the root`);
  } else if (/(^|\/)\.\.(\/|$)/.test(glob)) {
    sink.problem(at, `\`${glob}\` leaves the root; set \`root\` higher instead`);
  } else if (glob.startsWith('!')) {
    sink.problem(at, `\`${glob}\` starts with \`!\`; list files to leave out under \`corpus.exclude\``);
  }
}

/** Returns the glob list at a key, checked; [] when absent. */
function globList(v: unknown, at: KeyPath, sink: BuildSink): string[] {
  const list = asStrList(v) ?? [];
  const single = typeof v === 'string';
  list.forEach((g, i) => checkGlob(g, single ? at : [...at, i], sink));
  return list;
}

/** Returns whether a dot path has no empty parts (`a.b`, not `a..b` or `.a`). */
function isDotPath(s: string): boolean {
  return s.split('.').every((part) => part.length > 0);
}

function buildCorpus(c: Obj, sink: BuildSink): CorpusSpec {
  const at = (k: string): KeyPath => ['corpus', k];
  const include = globList(c.include, at('include'), sink);
  const exclude = globList(c.exclude, at('exclude'), sink);
  const text = asStr(c.text) ?? 'text';
  if (!isDotPath(text)) sink.problem(at('text'), `\`${text}\` is not a dot path such as \`text\` or \`meta.body\``);
  const declared = asStr(c['declared-language']);
  if (declared !== undefined && !isDotPath(declared)) {
    sink.problem(at('declared-language'), `\`${declared}\` is not a dot path such as \`lang\` or \`meta.lang\``);
  }
  const subset = asStr(c.subset);
  if (subset !== undefined) {
    const count = subset.split('{subset}').length - 1;
    if (count !== 1) {
      sink.problem(at('subset'), `must contain \`{subset}\` exactly once, found ${count === 0 ? 'none' : `${count} times`}`, {
        ...(count === 0 ? { suggestion: 'for example `data/{subset}/**`' } : {}),
      });
    }
  }
  const encodings: EncodingOverride[] = [];
  for (const [glob, enc] of Object.entries(asObj(c.encodings) ?? {})) {
    const where: KeyPath = ['corpus', 'encodings', glob];
    checkGlob(glob, where, sink);
    if (typeof enc !== 'string' || enc.length === 0) continue;
    if (!iconv.encodingExists(enc)) {
      sink.problem(where, `unknown encoding \`${enc}\` (encoding names are those iconv-lite knows, e.g. \`windows-1256\`)`, {
        ...encodingSuggestion(enc),
      });
      continue;
    }
    if (!isLineSplittableEncoding(enc)) {
      sink.problem(where, `encoding \`${enc}\` does not keep ASCII bytes as they are, and sluice splits lines at byte 0x0A: convert such shards to UTF-8`);
      continue;
    }
    encodings.push({ glob, encoding: enc });
  }
  return {
    include,
    exclude,
    text,
    ...(declared !== undefined ? { declaredLanguage: declared } : {}),
    ...(subset !== undefined ? { subset } : {}),
    encodings,
    maxLineBytes: asNum(c['max-line-bytes']) ?? DEFAULT_MAX_LINE_BYTES,
  };
}

/** Returns a "did you mean" for an encoding name among those iconv-lite has loaded. */
function encodingSuggestion(enc: string): { suggestion?: string } {
  // iconv-lite keys its table by canonical names (`windows1256`): compare in that form.
  const canonical = enc.toLowerCase().replace(/[^a-z0-9]/g, '');
  const names = Object.keys(iconv.encodings ?? {}).filter((k) => !k.startsWith('_') && !/^\d+$/.test(k));
  const near = nearest(canonical, names);
  return near ? { suggestion: didYouMean(near) } : {};
}

function buildTokenizer(v: unknown, at: KeyPath, root: string, files: FileReference[], sink: BuildSink): TokenizerSpec | undefined {
  const t = asObj(v);
  if (!t) return undefined;
  const builtin = asStr(t.builtin);
  if (builtin !== undefined) {
    return (BUILTIN_TOKENIZERS as readonly string[]).includes(builtin) ? { kind: 'builtin', name: builtin as BuiltinName } : undefined;
  }
  const file = asStr(t.file);
  if (file === undefined) return undefined;
  const written = asStr(t.format);
  let format: 'tokenizer.json' | 'tiktoken' | undefined;
  if (written === 'tokenizer.json' || written === 'tiktoken') format = written;
  else if (written === undefined) {
    if (/\.json$/i.test(file)) format = 'tokenizer.json';
    else if (/\.tiktoken$/i.test(file)) format = 'tiktoken';
    else {
      sink.problem([...at, 'file'], `cannot tell the format of \`${file}\` from its name (.json or .tiktoken)`, {
        suggestion: 'set `format: tokenizer.json` or `format: tiktoken`',
      });
      return undefined;
    }
  } else return undefined;

  const pattern = asStr(t.pattern);
  if (format === 'tokenizer.json' && pattern !== undefined) {
    sink.problem([...at, 'pattern'], '`pattern` is only used with tiktoken rank files; a tokenizer.json carries its own pre-tokenizer', { part: 'key' });
  }
  if (format === 'tiktoken') {
    if (pattern === undefined) {
      sink.problem([...at, 'file'], 'tiktoken rank files carry no split pattern; set `pattern` to a builtin whose pattern to use (e.g. `cl100k_base`) or to a regular expression', { part: 'key' });
    } else if (!(BUILTIN_TOKENIZERS as readonly string[]).includes(pattern)) {
      try {
        new RegExp(pattern, 'gu');
      } catch (e) {
        const near = nearest(pattern, BUILTIN_TOKENIZERS);
        sink.problem([...at, 'pattern'], `neither a builtin name nor a valid regular expression: ${(e as Error).message}`, {
          ...(near ? { suggestion: didYouMean(near) } : {}),
        });
      }
    }
  }
  const absPath = path.resolve(root, file);
  files.push({ path: [...at, 'file'], what: 'tokenizer file', file, absPath });
  return { kind: 'file', file, absPath, format, ...(format === 'tiktoken' && pattern !== undefined ? { pattern } : {}) };
}

function buildLanguages(v: unknown, sink: BuildSink): LanguageSpec[] {
  const out: LanguageSpec[] = [];
  const entries = Object.entries(asObj(v) ?? {});
  for (const [key, rawSpec] of entries) {
    const at: KeyPath = ['languages', key];
    const spec = asObj(rawSpec) ?? {};
    const r = resolveLanguageKey(key);
    if (!r.ok) {
      sink.problem(at, r.message, { part: 'key', ...(r.suggestion ? { suggestion: r.suggestion } : {}) });
      continue;
    }
    const scripts: string[] = [];
    const writtenScripts = Array.isArray(spec.scripts) ? spec.scripts : undefined;
    writtenScripts?.forEach((s, i) => {
      if (typeof s !== 'string' || s.length === 0) return;
      const found = lookUpScript(s);
      if (!found.ok) {
        sink.problem([...at, 'scripts', i], found.message, found.suggestion ? { suggestion: found.suggestion } : {});
        return;
      }
      for (const long of found.scripts) if (!scripts.includes(long)) scripts.push(long);
    });
    if (writtenScripts === undefined) {
      const fallback = r.subtagScripts ?? (Object.hasOwn(DEFAULT_SCRIPTS, r.iso6393) ? DEFAULT_SCRIPTS[r.iso6393] : undefined);
      if (fallback) scripts.push(...fallback);
      else {
        sink.problem(at, `no default script for \`${r.iso6393}\` (${r.name}); list its scripts, e.g. \`scripts: [Latin]\``, { part: 'key' });
      }
    } else if (r.subtagScripts && scripts.length > 0 && !r.subtagScripts.every((s) => scripts.includes(s))) {
      sink.warning([...at, 'scripts'], `the key says \`${r.scriptSubtag}\` (${r.subtagScripts.join(', ')}) but \`scripts\` lists ${scripts.join(', ')}; \`scripts\` is used`);
    }
    const target = asNum(spec.target);
    out.push({
      key,
      iso6393: r.iso6393,
      name: r.name,
      covers: r.covers,
      scripts,
      ...(target !== undefined ? { target } : {}),
    });
  }

  // A detected label must count under one key only.
  for (let j = 0; j < out.length; j++) {
    for (let i = 0; i < j; i++) {
      const a = out[i]!;
      const b = out[j]!;
      const shared = b.covers.filter((c) => a.covers.includes(c));
      if (shared.length === 0) continue;
      const same = a.iso6393 === b.iso6393;
      sink.problem(
        ['languages', b.key],
        same
          ? `\`${b.key}\` and \`${a.key}\` are the same language (\`${a.iso6393}\`); list it once${b.key.includes('-') || a.key.includes('-') ? ', with all its scripts under `scripts`' : ''}`
          : `\`${b.key}\` overlaps \`${a.key}\`: both cover ${shared.map((c) => `\`${c}\``).join(', ')}, so a detected label could count under either; keep one`,
        { part: 'key' },
      );
    }
  }

  const withTargets = out.filter((l) => l.target !== undefined);
  const sum = withTargets.reduce((s, l) => s + l.target!, 0);
  if (sum > 1 + SUM_EPSILON) {
    sink.problem(['languages'], `targets sum to ${fmt(sum)} (${withTargets.map((l) => `${l.key} ${fmt(l.target!)}`).join(' + ')}); they may add up to at most 1`, { part: 'key' });
  }
  return out;
}

function buildSampling(v: unknown): SamplingSpec | undefined {
  const s = asObj(v);
  if (!s) return undefined;
  const docs = asNum(s['docs-per-shard']);
  if (docs !== undefined) return { docsPerShard: docs };
  const fraction = asNum(s.fraction);
  if (fraction !== undefined) return { fraction };
  return undefined;
}

interface RulesContext {
  languages: LanguageSpec[];
  tokenizerSet: boolean;
  root: string;
  files: FileReference[];
  sink: BuildSink;
}

function buildRules(r: Obj, ctx: RulesContext): Rules {
  const { sink } = ctx;
  const input = asObj(r.input) ?? {};
  const rules: Rules = {
    input: {
      ...(asNum(input['max-rejected']) !== undefined ? { maxRejected: asNum(input['max-rejected'])! } : {}),
      maxBrokenShards: asNum(input['max-broken-shards']) ?? 0,
    } satisfies InputRule,
  };
  if (rules.input.maxRejected !== undefined && rules.input.maxRejected >= LOOSE_TOLERANCE) {
    sink.warning(['rules', 'input', 'max-rejected'], `${fmt(rules.input.maxRejected)} lets half the input or more be rejected`);
  }

  const mix = asObj(r.mix);
  if (mix) rules.mix = buildMix(mix, ctx);
  else if (ctx.languages.some((l) => l.target !== undefined)) {
    sink.warning(['languages'], 'targets are set but there is no `rules.mix`, so they are not judged', { part: 'key' });
  }

  const script = asObj(r.script);
  if (script) {
    rules.script = {
      minPurity: asNum(script['min-purity']) ?? DEFAULT_MIN_PURITY,
      maxImpureDocs: asNum(script['max-impure-docs']) ?? DEFAULT_MAX_IMPURE_DOCS,
    } satisfies ScriptRule;
  }

  const encoding = asObj(r.encoding);
  if (encoding) {
    const forbid = Array.isArray(encoding.forbid)
      ? encoding.forbid.filter((k): k is AnomalyKind => (ANOMALY_KINDS as readonly unknown[]).includes(k))
      : [...DEFAULT_FORBID];
    if (Array.isArray(encoding.forbid) && encoding.forbid.length === 0) {
      sink.warning(['rules', 'encoding', 'forbid'], 'forbids nothing, so the encoding rule can never fail');
    }
    rules.encoding = { maxAnomalousDocs: asNum(encoding['max-anomalous-docs']) ?? 0, forbid: [...new Set(forbid)] } satisfies EncodingRule;
  }

  const fertility = asObj(r.fertility);
  if (fertility) rules.fertility = buildFertility(fertility, ctx);

  const dup = asObj(r.duplicates);
  if (dup) {
    const near = asObj(dup.near) ?? {};
    const nearMax = asNum(near.max);
    const rule: DuplicatesRule = {
      ...(asNum(dup['max-exact']) !== undefined ? { maxExact: asNum(dup['max-exact'])! } : {}),
      ...(asNum(dup['max-added']) !== undefined ? { maxAdded: asNum(dup['max-added'])! } : {}),
      near: {
        threshold: asNum(near.threshold) ?? DEFAULT_NEAR.threshold,
        ...(nearMax !== undefined ? { max: nearMax } : {}),
        shingle: asNum(near.shingle) ?? DEFAULT_NEAR.shingle,
        hashes: asNum(near.hashes) ?? DEFAULT_NEAR.hashes,
      },
      punctuation: dup.punctuation === 'strip' ? 'strip' : 'keep',
    };
    if (rule.maxExact === undefined && rule.near.max === undefined && rule.maxAdded === undefined) {
      sink.warning(['rules', 'duplicates'], 'sets none of `max-exact`, `near.max` and `max-added`, so it only reports', { part: 'key' });
    }
    if (rule.near.threshold < LOOSE_NEAR_THRESHOLD) {
      sink.warning(['rules', 'duplicates', 'near', 'threshold'], `${fmt(rule.near.threshold)} counts documents that share little text as near duplicates`);
    }
    rules.duplicates = rule;
  }

  const cont = asObj(r.contamination);
  if (cont) {
    const rule: ContaminationRule = {
      eval: globList(cont.eval, ['rules', 'contamination', 'eval'], sink),
      ngram: asNum(cont.ngram) ?? DEFAULT_NGRAM,
      maxDocs: asNum(cont['max-docs']) ?? 0,
    };
    if (rule.ngram < MIN_SENSIBLE_NGRAM) {
      sink.warning(['rules', 'contamination', 'ngram'], `${rule.ngram}-grams match common phrases, not only copied evaluation text; ${DEFAULT_NGRAM} is the usual length`);
    }
    rules.contamination = rule;
  }
  return rules;
}

function buildMix(mix: Obj, ctx: RulesContext): MixRule {
  const { sink, languages } = ctx;
  const writtenUnit = asStr(mix.unit);
  const unit: MixUnit =
    writtenUnit !== undefined && (MIX_UNITS as readonly string[]).includes(writtenUnit)
      ? (writtenUnit as MixUnit)
      : ctx.tokenizerSet
        ? 'tokens'
        : 'words';
  if (unit === 'tokens' && !ctx.tokenizerSet) {
    sink.problem(['rules', 'mix', 'unit'], 'counting the mix in `tokens` needs a `tokenizer`', {
      suggestion: 'set `tokenizer: { builtin: o200k_base }` (or your own), or use `unit: words`',
    });
  }
  const tolerance = asNum(mix.tolerance) ?? DEFAULT_TOLERANCE;
  const maxOther = asNum(mix['max-other']);
  const maxUnd = asNum(mix['max-und']);
  const rule: MixRule = {
    unit,
    tolerance,
    ...(maxOther !== undefined ? { maxOther } : {}),
    ...(maxUnd !== undefined ? { maxUndetermined: maxUnd } : {}),
  };

  const withTargets = languages.filter((l) => l.target !== undefined);
  if (withTargets.length === 0 && languages.length > 0) {
    sink.problem(['rules', 'mix'], 'the mix rule needs a `target` on at least one language under `languages`', { part: 'key' });
  }
  if (tolerance >= LOOSE_TOLERANCE) {
    sink.warning(['rules', 'mix', 'tolerance'], `${fmt(tolerance)} lets almost any share pass`);
  }
  // When every language has a target, the shares that can pass, plus other and und, must be able to reach the whole corpus.
  if (withTargets.length > 0 && withTargets.length === languages.length && maxOther !== undefined) {
    const sum = withTargets.reduce((s, l) => s + l.target!, 0);
    const room = sum + tolerance * withTargets.length + maxOther + (maxUnd ?? 0);
    if (room < 1 - SUM_EPSILON) {
      sink.warning(
        ['rules', 'mix', 'max-other'],
        `targets sum to ${fmt(sum)}: with tolerance ${fmt(tolerance)} per language and max-other ${fmt(maxOther)}${maxUnd !== undefined ? ` and max-und ${fmt(maxUnd)}` : ''} only ${fmt(room)} of the corpus can be accounted for` +
          (maxUnd !== undefined ? ', so the mix rule cannot pass' : `; the other ${fmt(1 - room)} would have to be \`und\``),
      );
    }
  }
  return rule;
}

/** Returns a per-language map whose keys must be policy language keys; unknown keys are problems. */
function perLanguage<T>(v: unknown, at: KeyPath, ctx: RulesContext, read: (x: unknown, key: string) => T | undefined): Record<string, T> {
  const out: Record<string, T> = {};
  const keys = ctx.languages.map((l) => l.key);
  for (const [key, x] of Object.entries(asObj(v) ?? {})) {
    if (!keys.includes(key)) {
      // Same language written another way (`hi` for `hin`)? Point at the key as the policy writes it.
      const r = resolveLanguageKey(key);
      const same = r.ok ? ctx.languages.find((l) => l.iso6393 === r.iso6393 || l.covers.includes(r.iso6393)) : undefined;
      const near = same?.key ?? nearest(key, keys);
      ctx.sink.problem([...at, key], `\`${key}\` is not a language of this policy (keys under \`languages\`: ${keys.map((k) => `\`${k}\``).join(', ') || 'none'})`, {
        part: 'key',
        ...(near ? { suggestion: didYouMean(near) } : {}),
      });
      continue;
    }
    const value = read(x, key);
    if (value !== undefined) out[key] = value;
  }
  return out;
}

function buildFertility(f: Obj, ctx: RulesContext): FertilityRule {
  const at: KeyPath = ['rules', 'fertility'];
  if (!ctx.tokenizerSet) {
    ctx.sink.problem(at, 'fertility is measured with the model\'s tokenizer, and no `tokenizer` is set', {
      part: 'key',
      suggestion: 'set `tokenizer: { builtin: o200k_base }` or `tokenizer: { file: ... }`',
    });
  }
  const max = perLanguage(f.max, [...at, 'max'], ctx, (x) => asNum(x));
  for (const [key, m] of Object.entries(max)) {
    if (m < 1) {
      ctx.sink.warning([...at, 'max', key], `${fmt(m)} tokens per word: every word is at least one token unless the tokenizer has multi-word tokens, so this likely always fails`);
    }
  }
  const maxContinued = perLanguage(f['max-continued'], [...at, 'max-continued'], ctx, (x) => asNum(x));
  const wordLists = perLanguage(f['word-lists'], [...at, 'word-lists'], ctx, (x, key) => {
    const file = asStr(x);
    if (file === undefined) return undefined;
    const absPath = path.resolve(ctx.root, file);
    ctx.files.push({ path: [...at, 'word-lists', key], what: 'word list', file, absPath });
    return { file, absPath };
  });
  const maxRegression = asNum(f['max-regression']);
  if (Object.keys(max).length === 0 && Object.keys(maxContinued).length === 0 && maxRegression === undefined) {
    ctx.sink.warning(at, 'sets no limit (`max`, `max-continued` or `max-regression`), so it only reports', { part: 'key' });
  }
  return { max, ...(maxRegression !== undefined ? { maxRegression } : {}), maxContinued, wordLists };
}

function buildSeverity(s: Obj, rules: Rules, sinkTo: BuildSink): Partial<Record<RuleName, Severity>> {
  const out: Partial<Record<RuleName, Severity>> = {};
  for (const [name, level] of Object.entries(s)) {
    if (!(RULE_NAMES as readonly string[]).includes(name) || (level !== 'error' && level !== 'warn')) continue;
    out[name as RuleName] = level;
    if (rules[name as RuleName] === undefined) {
      sinkTo.warning(['severity', name], `sets a severity for \`${name}\`, which is not under \`rules\``, { part: 'key' });
    }
  }
  return out;
}
