// Assembles the report: figures, rule outcomes, input accounting, per-shard and
// per-subset tables. The single place where the data model of a run is built.
import { relative } from 'node:path';
import type { Policy } from '../policy/types.js';
import type { CorpusResult } from '../results/corpus.js';
import { languageFigures, ratio } from './figures.js';
import { judgeRules, overallVerdict } from './rules.js';
import type { Report, ShardFigures } from './types.js';

export { TOOL_VERSION } from '../version.js';
import { TOOL_VERSION } from '../version.js';

/** Returns the report of one policy over one corpus result. */
export function buildReport(policy: Policy, corpus: CorpusResult, cwd: string = process.cwd()): Report {
  const languages = languageFigures(policy, corpus);
  const rules = judgeRules(policy, corpus, languages);
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
  return report;
}

function headlineOf(verdict: Report['verdict'], rules: Report['rules']): string {
  const failing = rules.filter((r) => r.verdict === 'fail');
  const warning = rules.filter((r) => r.verdict === 'warn');
  const names = (list: typeof rules): string => [...new Set(list.map((r) => (r.scope === 'corpus' ? r.rule : `${r.rule} (${r.scope.replace(/^language:/, '')})`)))].join(', ');
  if (verdict === 'fail') return `FAIL: ${failing.length} rule${failing.length === 1 ? '' : 's'} at error severity failed: ${names(failing)}`;
  if (verdict === 'warn') return `PASS with warnings: ${names(warning)}`;
  return `PASS: all ${rules.length} judged rules hold`;
}
