// The terminal view: the verdict, each judged rule with where it failed, and the
// mix table. Colour only when asked (a TTY without NO_COLOR).
import type { Report, RuleOutcome } from '../judge/types.js';
import { bar } from './bars.js';
import { bytes, count, counted, firstRejections, fixed, inUnit, limitOf, percent, points, where } from './format.js';

export interface TerminalOptions {
  color: boolean;
  /** Locations listed per failing rule. */
  maxLocations?: number;
}

type Paint = (s: string) => string;

/** Returns the report as plain text for a terminal, with ANSI colour when `color` is set. */
export function renderTerminal(report: Report, opts: TerminalOptions): string {
  const c = (code: number): Paint => (s) => (opts.color ? `\u001b[${code}m${s}\u001b[0m` : s);
  const red = c(31), green = c(32), yellow = c(33), dim = c(2), bold = c(1);
  const paint: Record<RuleOutcome['verdict'], Paint> = { pass: green, warn: yellow, fail: red, uncertain: yellow, unjudged: dim };
  const mark: Record<RuleOutcome['verdict'], string> = { pass: 'ok  ', warn: 'WARN', fail: 'FAIL', uncertain: '??  ', unjudged: '--  ' };
  const est = report.totals.estimated ? '≈' : '';
  const lines: string[] = [];

  lines.push(`${bold(`sluice · ${clean(report.policy.name)}`)}  ${paint[report.verdict](bold(report.verdict.toUpperCase()))}`);
  lines.push(paint[report.verdict](report.headline));
  lines.push(
    dim(
      `${counted(report.totals.docs, 'document')}, ${counted(report.input.shards, 'shard')}, ${est}${bytes(report.totals.bytes)} of text` +
        (report.totals.tokens !== undefined ? `, ${est}${count(report.totals.tokens)} tokens (${report.tokenizer?.main})` : '') +
        ` · policy ${report.policy.file}`,
    ),
  );
  if (report.sampling) lines.push(dim(samplingLine(report)));
  lines.push('');

  const maxLoc = opts.maxLocations ?? 5;
  const ordered = [...report.rules].sort((a, b) => rank(a) - rank(b));
  for (const r of ordered) {
    const scope = r.scope.replace(/^language:/, '');
    lines.push(
      `${paint[r.verdict](mark[r.verdict])} ${r.rule.padEnd(13)} ${clean(scope).padEnd(10)} ${inUnit(r.measured, r.unit).padStart(9)} ${dim('limit')} ${limitOf(r).padEnd(13)} ${r.verdict === 'pass' ? dim(clean(r.message)) : clean(r.message)}`,
    );
    if (r.verdict !== 'pass') {
      for (const l of r.locations.slice(0, maxLoc)) lines.push(`       ${dim('at')} ${clean(where(l))}${l.detail ? dim(`  ${clean(l.detail)}`) : ''}`);
      if (r.locations.length > maxLoc) lines.push(dim(`       …${r.locations.length - maxLoc} more locations in the JSON and Markdown reports`));
    }
  }
  lines.push('');

  const unit = report.mixUnit;
  const hasTokens = report.totals.tokens !== undefined;
  lines.push(bold(`Language mix by ${unit}`) + (report.sampling ? dim(`  (estimated; share ${Math.round(report.sampling.confidence * 100)} % interval after it)`) : ''));
  lines.push(dim(`  ${'language'.padEnd(9)} ${'target'.padStart(7)} ${'share'.padStart(7)}  ${''.padEnd(20)} ${'docs'.padStart(8)} ${'words'.padStart(10)}${hasTokens ? ` ${'tokens'.padStart(10)}` : ''} ${'purity'.padStart(7)}`));
  for (const f of Object.values(report.languages)) {
    if (f.docs === 0 && f.target === undefined) continue;
    const share = f.share[unit] ?? 0;
    lines.push(
      `  ${clean(f.key).padEnd(9)} ${percent(f.target).padStart(7)} ${percent(share).padStart(7)}  ${bar(share, 20).padEnd(20)} ${count(f.docs).padStart(8)} ${count(f.words).padStart(10)}${hasTokens ? ` ${count(f.tokens ?? 0).padStart(10)}` : ''} ${percent(f.purity).padStart(7)}` +
        (f.intervals?.share[unit] ? dim(`  ${percent(f.intervals.share[unit]!.low)} – ${percent(f.intervals.share[unit]!.high)}`) : ''),
    );
  }

  const declared = Object.values(report.languages).filter((f) => f.declaredDocs);
  if (declared.length) {
    lines.push('');
    lines.push(bold('Declared vs detected language'));
    for (const f of declared) {
      const as = Object.entries(f.detectedAs ?? {}).sort((a, b) => b[1] - a[1]).map(([k, n]) => `${clean(k)} ${count(n)}`).join(', ');
      lines.push(`  ${clean(f.key).padEnd(9)} ${count(f.declaredDocs).padStart(7)} declared, ${percent((f.mismatchDocs ?? 0) / (f.declaredDocs ?? 1)).padStart(7)} detected otherwise ${dim(`(${as})`)}`);
    }
  }

  const fert = Object.values(report.languages).filter((f) => f.fertility && f.docs > 0);
  if (fert.length) {
    lines.push('');
    const base = report.tokenizer?.baseline;
    lines.push(bold(`Fertility (subword tokens per word) under ${report.tokenizer?.main}${base ? ` vs ${base}` : ''}`));
    for (const f of fert) {
      const t = f.fertility!;
      const b = f.baseline;
      lines.push(
        `  ${clean(f.key).padEnd(9)} ${fixed(t.fertility, 3).padStart(6)}  continued ${percent(t.continuedWords).padStart(7)}  chars/token ${fixed(t.charsPerToken, 2).padStart(5)}` +
          (t.dictionary ? `  dictionary ${fixed(t.dictionary.fertility, 3)}` : '') +
          (b ? dim(`  ${base}: ${fixed(b.fertility, 3)}, mix shift ${points(report.tokenizer?.mixShiftPoints?.[f.key])}`) : ''),
      );
    }
  }

  if (report.duplicates) {
    const d = report.duplicates;
    lines.push('');
    lines.push(bold('Duplicates') + dim(`  exact ${count(d.exactDocs)} (${percent(d.exactRate)}), near ${count(d.nearDocs)} (${percent(d.nearRate)}), Jaccard ≥ ${d.parameters.threshold}`));
    for (const cl of d.clusters.slice(0, 5)) {
      lines.push(`  ${cl.kind.padEnd(5)} ×${String(cl.size).padEnd(3)} ${clean(where(cl.first))} ${dim('→')} ${cl.copies.slice(0, 3).map((x) => clean(where(x))).join(', ')}${cl.copies.length > 3 ? dim(` +${cl.copies.length - 3}`) : ''}`);
    }
  }
  if (report.contamination && report.contamination.docs > 0) {
    lines.push('');
    lines.push(bold('Evaluation overlap') + dim(`  ${counted(report.contamination.docs, 'training document')} ${report.contamination.docs === 1 ? 'shares' : 'share'} a ${report.contamination.ngram}-word sequence with an evaluation item`));
    for (const s of report.contamination.samples.slice(0, 5)) lines.push(`  ${clean(where(s))} ${dim('overlaps')} ${clean(s.detail ?? '')}`);
  }

  const i = report.input;
  lines.push('');
  lines.push(
    dim(
      `Input: ${counted(i.lines, 'line')} = ${count(i.docLines)} in ${counted(i.docs, 'document')} + ${count(i.empty)} empty + ${count(i.rejected.count)} rejected` +
        (Object.keys(i.rejected.byReason).length ? ` (${Object.entries(i.rejected.byReason).map(([k, n]) => `${k} ${n}`).join(', ')})` : '') +
        (i.skipped.length ? `; ${counted(i.skipped.length, 'file')} skipped` : '') +
        (i.broken.length ? `; ${counted(i.broken.length, 'shard')} broken` : ''),
    ),
  );
  // Where lines were rejected, unless a failing input rule has shown where above: the first few, in shard order.
  const shownAbove = report.rules.some((r) => r.rule === 'input' && r.unit === 'share' && r.verdict !== 'pass' && r.locations.length > 0);
  const rejections = shownAbove ? { shown: [], more: 0 } : firstRejections(report, MAX_REJECTIONS_SHOWN);
  for (const r of rejections.shown) lines.push(`       ${dim('at')} ${clean(where(r))}${dim(`  ${r.reason}: ${clean(r.detail)}`)}`);
  if (rejections.more > 0) lines.push(dim(`       and ${counted(rejections.more, 'more rejected line')} (every shard's first ones are in the JSON report)`));
  lines.push(dim(`${fixed(report.timing.megabytesPerSecond, 1)} MB/s, ${report.timing.elapsedMs} ms, ${counted(report.timing.cacheHits, 'shard')} from cache`));
  return `${lines.join('\n')}\n`;
}

/** Rejected lines the terminal view lists under the input line. */
const MAX_REJECTIONS_SHOWN = 3;

function rank(r: RuleOutcome): number {
  return r.verdict === 'fail' ? 0 : r.verdict === 'warn' ? 1 : r.verdict === 'uncertain' ? 2 : r.verdict === 'unjudged' ? 3 : 4;
}

/** Returns the line saying what a sampled report measured and how its intervals are made. */
export function samplingLine(report: Report): string {
  const s = report.sampling!;
  return (
    `Sample: ${count(s.measuredDocs)} of ${count(s.docs)} documents measured (${s.method} ${s.setting}; ${count(s.completeShards)} of ${count(report.input.shards)} shards in full); ` +
    `sizes and shares are estimates with ${Math.round(s.confidence * 100)} % intervals (${Object.keys(s.methods).join(', ')}); ${s.everyDocument.join(', ')} over every document`
  );
}

// Data and file names may hold terminal escapes or bidi controls; show them as code points.
/** Returns text from the data with control and bidirectional characters written as U+XXXX, so it cannot move the cursor or reorder the line. */
export function clean(s: string): string {
  return s.replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/g, (ch) => `U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`);
}
