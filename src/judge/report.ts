// Assembles the report: figures, rule outcomes, input accounting, per-shard and
// per-subset tables. The single place where the data model of a run is built.
import { relative } from 'node:path';
import type { Policy } from '../policy/types.js';
import type { CorpusResult } from '../results/corpus.js';
import { describeSampling, scaleShardResult } from '../results/sample.js';
import { mergeShardResults } from '../results/tally.js';
import { SampledCorpus, intervalFrom } from './estimates.js';
import { languageFigures, ratio } from './figures.js';
import { CONFIDENCE, INTERVAL_METHODS, type IntervalMethod } from './intervals.js';
import { judgeRules, overallVerdict } from './rules.js';
import type { LanguageFigures, LanguageIntervals, Report, SamplingFigures, ShardFigures } from './types.js';

export { TOOL_VERSION } from '../version.js';
import { TOOL_VERSION } from '../version.js';

/** Returns the report of one policy over one corpus result. */
export function buildReport(policy: Policy, measured: CorpusResult, cwd: string = process.cwd()): Report {
  // On a sample, every figure is computed from the shards' tallies scaled to whole-shard
  // estimates (the stratified ratio estimator), and the rules judge their intervals.
  const isSampled = measured.shards.some((s) => s.sample);
  const sampled = isSampled ? new SampledCorpus(measured.shards) : undefined;
  let corpus = measured;
  if (isSampled) {
    const shards = measured.shards.map(scaleShardResult);
    corpus = { ...measured, shards, tally: mergeShardResults(shards, policy.languages.map((l) => l.key)) };
  }
  const languages = languageFigures(policy, corpus);
  const rules = judgeRules(policy, corpus, languages, sampled);
  if (sampled) addLanguageIntervals(policy, languages, sampled, corpus.tokenizer !== undefined);
  const verdict = overallVerdict(rules);
  const mixUnit = policy.rules.mix?.unit ?? (corpus.tokenizer ? 'tokens' : 'words');

  const totals: Report['totals'] = { docs: 0, bytes: 0, chars: 0, words: 0 };
  for (const f of Object.values(languages)) {
    totals.docs += f.docs;
    totals.bytes += f.bytes;
    totals.chars += f.chars;
    totals.words += f.words;
    if (f.tokens !== undefined) totals.tokens = (totals.tokens ?? 0) + f.tokens;
  }

  const shards: ShardFigures[] = corpus.shards.map((s) => {
    const fig: ShardFigures = {
      path: s.path,
      lines: s.read.lines,
      docs: s.read.docs,
      empty: s.read.empty,
      rejected: s.read.rejected.count,
      bytes: s.read.bytes,
      languages: Object.fromEntries(Object.entries(s.languages).filter(([, t]) => t.docs > 0).map(([k, t]) => [k, t.docs])),
      rejections: s.read.rejected.samples,
      fromCache: corpus.cached.has(s.path),
    };
    if (s.subset !== undefined) fig.subset = s.subset;
    if (corpus.tokenizer) fig.tokens = Object.values(s.languages).reduce((n, t) => n + (t.tokens?.tokens ?? 0), 0);
    if (s.read.broken) fig.broken = s.read.broken;
    if (s.sample) fig.measuredDocs = s.sample.docs;
    return fig;
  });

  const subsets: Report['subsets'] = {};
  for (const s of corpus.shards) {
    const key = s.subset ?? '(none)';
    const sub = (subsets[key] ??= { docs: 0, bytes: 0, words: 0, languages: {} });
    for (const [lang, t] of Object.entries(s.languages)) {
      if (t.docs === 0) continue;
      sub.docs += t.docs;
      sub.bytes += t.bytes;
      sub.words += t.words;
      if (t.tokens) sub.tokens = (sub.tokens ?? 0) + t.tokens.tokens;
      sub.languages[lang] = (sub.languages[lang] ?? 0) + t.docs;
    }
  }

  const report: Report = {
    report: 'sluice',
    version: 1,
    tool: { name: 'sluice', version: TOOL_VERSION },
    policy: { name: policy.name, file: relative(cwd, policy.file) || policy.file, root: relative(cwd, policy.root) || '.' },
    verdict,
    headline: headlineOf(verdict, rules),
    mixUnit,
    totals,
    languages,
    scripts: corpus.tally.scripts,
    subsets,
    rules,
    input: {
      shards: corpus.shards.length,
      lines: corpus.tally.input.lines,
      docs: corpus.tally.input.docs,
      docLines: corpus.tally.input.docLines,
      empty: corpus.tally.input.empty,
      rejected: { count: corpus.tally.input.rejected, byReason: corpus.tally.input.byReason },
      skipped: corpus.skipped,
      broken: corpus.shards.filter((s) => s.read.broken).map((s) => ({ path: s.path, ...s.read.broken! })),
    },
    shards,
    timing: {
      elapsedMs: corpus.elapsedMs,
      megabytesPerSecond: Math.round((corpus.tally.input.bytes / 1e6 / Math.max(corpus.elapsedMs, 1)) * 1000 * 10) / 10,
      cacheHits: corpus.cached.size,
      cacheMisses: corpus.shards.length - corpus.cached.size,
    },
  };

  if (corpus.tokenizer) {
    report.tokenizer = { main: corpus.tokenizer.label };
    if (corpus.baseline) {
      report.tokenizer.baseline = corpus.baseline.label;
      if (sampled) {
        const intervals: NonNullable<NonNullable<Report['tokenizer']>['mixUnderBaselineIntervals']> = {};
        for (const [k, t] of Object.entries(corpus.tally.languages)) {
          if (t.docs === 0) continue;
          const iv = intervalFrom(sampled.share(k, 'baseline'), 'wilson-linearized');
          if (iv) intervals[k] = iv;
        }
        report.tokenizer.mixUnderBaselineIntervals = intervals;
      }
      const baseTotal = Object.values(corpus.tally.languages).reduce((n, t) => n + (t.baseline?.tokens ?? 0), 0);
      const under: Record<string, number> = {};
      const shift: Record<string, number> = {};
      for (const [k, t] of Object.entries(corpus.tally.languages)) {
        if (t.docs === 0) continue;
        under[k] = ratio(t.baseline?.tokens ?? 0, baseTotal) ?? 0;
        shift[k] = ((languages[k]?.share.tokens ?? 0) - under[k]) * 100;
      }
      report.tokenizer.mixUnderBaseline = under;
      report.tokenizer.mixShiftPoints = shift;
    }
  }

  if (corpus.duplicates) {
    const d = corpus.duplicates;
    const bySubset: Record<string, { docs: number; exactDocs: number; nearDocs: number }> = {};
    for (const s of corpus.shards) {
      const row = d.byShard[s.path];
      if (!row) continue;
      const sub = (bySubset[s.subset ?? '(none)'] ??= { docs: 0, exactDocs: 0, nearDocs: 0 });
      sub.docs += row.docs;
      sub.exactDocs += row.exactDocs;
      sub.nearDocs += row.nearDocs;
    }
    report.duplicates = {
      exactDocs: d.exactDocs,
      exactRate: ratio(d.exactDocs, d.docs) ?? 0,
      nearDocs: d.nearDocs,
      nearRate: ratio(d.nearDocs, d.docs) ?? 0,
      tooShortDocs: d.tooShortDocs,
      byLanguage: d.byLanguage,
      bySubset,
      byShard: d.byShard,
      clusters: d.clusters,
      parameters: d.parameters,
    };
  }

  if (corpus.contamination) {
    report.contamination = {
      docs: corpus.shards.reduce((s, r) => s + (r.contamination?.docs ?? 0), 0),
      ngram: corpus.contamination.ngram,
      evalFiles: corpus.contamination.evalFiles,
      evalItems: corpus.contamination.evalItems,
      samples: corpus.shards.flatMap((s) => (s.contamination?.samples ?? []).map((x) => ({ path: s.path, line: x.line, detail: `${x.evalFile}:${x.evalLine}` }))),
    };
  }
  if (isSampled) {
    report.sampling = samplingFigures(policy, measured, report);
    roundEstimates(report);
  }
  return report;
}

// The methods a report's intervals use, in the order the README lists them.
const METHOD_ORDER: readonly IntervalMethod[] = ['wilson', 'wilson-linearized', 'linearized-normal'];

function samplingFigures(policy: Policy, measured: CorpusResult, report: Report): SamplingFigures {
  const first = measured.shards.find((s) => s.sample)!.sample!;
  const { method, setting } = policy.sampling ? describeSampling(policy.sampling) : first;
  const used = new Set<IntervalMethod>();
  for (const r of report.rules) if (r.interval) used.add(r.interval.method);
  for (const f of Object.values(report.languages)) {
    const iv = f.intervals;
    if (!iv) continue;
    for (const x of [...Object.values(iv.share), iv.purity, iv.impureDocs, iv.mismatchDocs, iv.fertility, iv.continuedWords]) if (x) used.add(x.method);
  }
  const everyDocument = ['input lines'];
  if (measured.duplicates) everyDocument.push('duplicates');
  if (measured.contamination) everyDocument.push('contamination');
  return {
    method,
    setting,
    measuredDocs: measured.shards.reduce((n, s) => n + (s.sample ? s.sample.docs : s.read.docs), 0),
    docs: measured.tally.input.docs,
    completeShards: measured.shards.filter((s) => !s.sample || s.sample.docs >= s.sample.of).length,
    confidence: CONFIDENCE,
    methods: Object.fromEntries(METHOD_ORDER.filter((m) => used.has(m)).map((m) => [m, INTERVAL_METHODS[m]])),
    everyDocument,
  };
}

function addLanguageIntervals(policy: Policy, languages: Record<string, LanguageFigures>, sampled: SampledCorpus, hasTokens: boolean): void {
  for (const f of Object.values(languages)) {
    const iv: LanguageIntervals = { share: {} };
    for (const unit of ['docs', 'bytes', 'chars', 'words', ...(hasTokens ? (['tokens'] as const) : [])] as const) {
      const x = intervalFrom(sampled.share(f.key, unit), unit === 'docs' ? 'wilson' : 'wilson-linearized');
      if (x) iv.share[unit] = x;
    }
    const purity = intervalFrom(sampled.purity(f.key), 'wilson-linearized');
    if (purity) iv.purity = purity;
    if (policy.rules.script && f.purityDocs > 0) {
      const x = intervalFrom(sampled.impure(f.key, policy.rules.script.minPurity), 'wilson');
      if (x) iv.impureDocs = x;
    }
    if (f.declaredDocs) {
      const x = intervalFrom(sampled.mismatch(f.key), 'wilson');
      if (x) iv.mismatchDocs = x;
    }
    if (f.fertility) {
      const fert = intervalFrom(sampled.perWord(f.key, 'fertility'), 'linearized-normal');
      const cont = intervalFrom(sampled.perWord(f.key, 'continued'), 'wilson-linearized');
      if (fert) iv.fertility = fert;
      if (cont) iv.continuedWords = cont;
    }
    f.intervals = iv;
  }
}

// Estimated counts are fractional; the report shows them as whole numbers (the shares keep full precision).
function roundEstimates(report: Report): void {
  const r = Math.round;
  const t = report.totals;
  t.docs = r(t.docs);
  t.bytes = r(t.bytes);
  t.chars = r(t.chars);
  t.words = r(t.words);
  if (t.tokens !== undefined) t.tokens = r(t.tokens);
  t.estimated = true;
  for (const f of Object.values(report.languages)) {
    f.docs = r(f.docs);
    f.bytes = r(f.bytes);
    f.chars = r(f.chars);
    f.words = r(f.words);
    if (f.tokens !== undefined) f.tokens = r(f.tokens);
    f.purityDocs = r(f.purityDocs);
    if (f.impureDocs !== undefined) f.impureDocs = r(f.impureDocs);
    if (f.declaredDocs !== undefined) f.declaredDocs = r(f.declaredDocs);
    if (f.mismatchDocs !== undefined) f.mismatchDocs = r(f.mismatchDocs);
    if (f.detectedAs) f.detectedAs = Object.fromEntries(Object.entries(f.detectedAs).map(([k, n]) => [k, r(n)]));
    for (const tf of [f.fertility, f.baseline]) if (tf) tf.tokens = r(tf.tokens);
  }
  for (const k of Object.keys(report.scripts)) report.scripts[k] = r(report.scripts[k]!);
  for (const s of Object.values(report.subsets)) {
    s.docs = r(s.docs);
    s.bytes = r(s.bytes);
    s.words = r(s.words);
    if (s.tokens !== undefined) s.tokens = r(s.tokens);
    for (const k of Object.keys(s.languages)) s.languages[k] = r(s.languages[k]!);
  }
  for (const s of report.shards) {
    for (const k of Object.keys(s.languages)) s.languages[k] = r(s.languages[k]!);
    if (s.tokens !== undefined) s.tokens = r(s.tokens);
  }
}

function headlineOf(verdict: Report['verdict'], rules: Report['rules']): string {
  const failing = rules.filter((r) => r.verdict === 'fail');
  const warning = rules.filter((r) => r.verdict === 'warn');
  const uncertain = rules.filter((r) => r.verdict === 'uncertain');
  const unjudged = rules.filter((r) => r.verdict === 'unjudged');
  const judged = rules.length - unjudged.length;
  const names = (list: typeof rules): string => [...new Set(list.map((r) => (r.scope === 'corpus' ? r.rule : `${r.rule} (${r.scope.replace(/^language:/, '')})`)))].join(', ');
  // Only a sample has uncertain rules, and only a listed language without documents (or without letters or words) unjudged ones; without either the headline reads as it always has.
  const notes = [
    ...(uncertain.length ? [`${uncertain.length} rule${uncertain.length === 1 ? '' : 's'} uncertain on the sample (a larger sample settles ${uncertain.length === 1 ? 'it' : 'them'}): ${names(uncertain)}`] : []),
    ...(unjudged.length ? [`${unjudged.length} check${unjudged.length === 1 ? '' : 's'} not judged, with nothing to measure: ${names(unjudged)}`] : []),
  ];
  const after = notes.map((n) => `; ${n}`).join('');
  if (verdict === 'fail') return `FAIL: ${failing.length} check${failing.length === 1 ? '' : 's'} at error severity failed: ${names(failing)}${after}`;
  if (verdict === 'warn') {
    if (warning.length === 0) return `PASS with warnings: ${notes.join('; ')}`;
    return `PASS with warnings: ${names(warning)}${after}`;
  }
  return `${judged === 1 ? 'PASS: the one judged check holds' : `PASS: all ${judged} judged checks hold`}${after}`;
}
