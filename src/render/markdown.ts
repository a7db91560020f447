// The Markdown view: the verdict first, the rules that fail, then the figures
// in collapsed sections. Used for --markdown, the job summary and the PR comment.
import type { Report, RuleOutcome } from '../judge/types.js';
import { bar } from './bars.js';
import { codePath, escapeMarkdown as esc } from './escape.js';
import { bytes, count, counted, firstRejections, fixed, inUnit, limitOf, percent, points } from './format.js';

export interface MarkdownOptions {
  /** Links file:line locations to this URL prefix (e.g. a blob URL at the PR's head commit). */
  linkBase?: string;
  /** Extra sections placed right after the rules (the PR comment's comparison against base). */
  before?: string;
  /** Largest number of rows in per-shard tables. */
  maxShardRows?: number;
}

const ICON: Record<RuleOutcome['verdict'], string> = { pass: '✅', warn: '⚠️', fail: '❌', uncertain: '❔', unjudged: '⚪' };

/** Returns the report as GitHub-flavoured Markdown. */
/** Rejected lines listed in the input section. */
const MAX_REJECTIONS_LISTED = 10;

export function renderMarkdown(report: Report, opts: MarkdownOptions = {}): string {
  const out: string[] = [];
  const loc = (path: string, line?: number): string => {
    const text = codePath(line === undefined ? path : `${path}:${line}`);
    if (!opts.linkBase) return text;
    const href = `${opts.linkBase}/${path.split('/').map((seg) => encodeURIComponent(seg).replace(/[()'!*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)).join('/')}${line !== undefined ? `#L${line}` : ''}`;
    return `[${text}](${href})`;
  };

  out.push(`## ${ICON[report.verdict]} sluice · ${esc(report.policy.name)}: ${report.verdict.toUpperCase()}`);
  out.push('');
  out.push(`**${esc(report.headline)}**`);
  out.push('');
  const est = report.totals.estimated ? '≈' : '';
  out.push(
    `${counted(report.totals.docs, 'document')} in ${counted(report.input.shards, 'shard')}, ${est}${bytes(report.totals.bytes)} of text` +
      (report.totals.tokens !== undefined ? `, ${est}${count(report.totals.tokens)} tokens (${esc(report.tokenizer?.main ?? '')})` : '') +
      `; policy ${codePath(report.policy.file)}.`,
  );
  out.push('');
  if (report.sampling) {
    const s = report.sampling;
    out.push(
      `**Sampled:** ${count(s.measuredDocs)} of ${count(s.docs)} documents measured (\`${s.method}: ${s.setting}\`; ${count(s.completeShards)} of ${count(report.input.shards)} shards in full). ` +
        `Sizes and shares are estimates; a rule fails only when its whole ${Math.round(s.confidence * 100)} % interval is past the limit, and is ❔ uncertain when the interval straddles it. ` +
        `Computed over every document: ${s.everyDocument.join(', ')}.`,
    );
    out.push('');
    for (const [m, text] of Object.entries(s.methods)) out.push(`- \`${m}\`: ${esc(text)}`);
    out.push('');
  }

  // Findings first, then what could not be judged, then what holds.
  const notPassing = report.rules.filter((r) => r.verdict !== 'pass' && r.verdict !== 'unjudged');
  const ordered = [...notPassing, ...report.rules.filter((r) => r.verdict === 'unjudged'), ...report.rules.filter((r) => r.verdict === 'pass')];
  const withCi = report.sampling !== undefined;
  out.push(`| | rule | scope | measured |${withCi ? ' 95 % interval |' : ''} limit | finding |`);
  out.push(`|---|---|---|---:|${withCi ? '---:|' : ''}---:|---|`);
  for (const r of ordered) {
    const ci = withCi ? ` ${r.interval ? `${inUnit(r.interval.low, r.unit)} – ${inUnit(r.interval.high, r.unit)}` : r.measured === null ? '–' : 'exact'} |` : '';
    out.push(`| ${ICON[r.verdict]} | ${r.rule}${r.severity === 'warn' ? ' (warn)' : ''} | ${esc(r.scope.replace(/^language:/, ''))} | ${inUnit(r.measured, r.unit)} |${ci} ${limitOf(r)} | ${esc(r.message)} |`);
  }
  out.push('');
  for (const r of notPassing) {
    if (r.locations.length === 0) continue;
    out.push(`<details><summary>${ICON[r.verdict]} ${r.rule} · ${esc(r.scope)}: where</summary>`);
    out.push('');
    for (const l of r.locations) out.push(`- ${loc(l.path, l.line)}${l.detail ? `: ${esc(l.detail)}` : ''}`);
    out.push('');
    out.push('</details>');
    out.push('');
  }
  if (opts.before) out.push(opts.before, '');

  // Mix
  const unit = report.mixUnit;
  out.push(`<details open><summary>Language mix (by ${unit})</summary>`);
  out.push('');
  out.push(`| language | target | share of ${unit} |${withCi ? ' 95 % interval |' : ''} | docs | words${report.totals.tokens !== undefined ? ' | tokens' : ''} | purity |`);
  out.push(`|---|---:|---:|${withCi ? '---:|' : ''}---|---:|---:|${report.totals.tokens !== undefined ? '---:|' : ''}---:|`);
  for (const f of Object.values(report.languages)) {
    if (f.docs === 0 && f.target === undefined) continue;
    const share = f.share[unit] ?? 0;
    out.push(
      `| ${esc(f.key)} | ${percent(f.target)} | ${percent(share)} |${withCi ? ` ${f.intervals?.share[unit] ? `${percent(f.intervals.share[unit]!.low)} – ${percent(f.intervals.share[unit]!.high)}` : '–'} |` : ''} ${bar(share, 16)} | ${count(f.docs)} | ${count(f.words)}${report.totals.tokens !== undefined ? ` | ${count(f.tokens ?? 0)}` : ''} | ${percent(f.purity)} |`,
    );
  }
  out.push('');
  out.push('</details>');
  out.push('');

  const declared = Object.values(report.languages).filter((f) => f.declaredDocs);
  if (declared.length) {
    out.push('<details><summary>Declared vs detected language</summary>');
    out.push('');
    out.push('| declared | documents | detected otherwise | detected as |');
    out.push('|---|---:|---:|---|');
    for (const f of declared) {
      const as = Object.entries(f.detectedAs ?? {}).sort((a, b) => b[1] - a[1]).map(([k, n]) => `${esc(k)} ${count(n)}`).join(', ');
      out.push(`| ${esc(f.key)} | ${count(f.declaredDocs)} | ${percent((f.mismatchDocs ?? 0) / (f.declaredDocs ?? 1))} | ${as} |`);
    }
    out.push('');
    out.push('</details>');
    out.push('');
  }

  // Tokenizer
  const withFertility = Object.values(report.languages).filter((f) => f.fertility && f.docs > 0);
  if (withFertility.length > 0) {
    const hasBase = withFertility.some((f) => f.baseline);
    out.push(`<details><summary>Tokenizer: ${esc(report.tokenizer?.main ?? '')}${hasBase ? ` vs ${esc(report.tokenizer?.baseline ?? '')}` : ''}</summary>`);
    out.push('');
    out.push(`| language | fertility | continued words | tokens/word | chars/token | bytes/token | dictionary fertility${hasBase ? ' | baseline fertility | change | mix shift' : ''} |`);
    out.push(`|---|---:|---:|---:|---:|---:|---:|${hasBase ? '---:|---:|---:|' : ''}`);
    for (const f of withFertility) {
      const t = f.fertility!;
      const b = f.baseline;
      const change = b?.fertility && t.fertility ? t.fertility / b.fertility - 1 : null;
      out.push(
        `| ${esc(f.key)} | ${fixed(t.fertility, 3)} | ${percent(t.continuedWords)} | ${fixed(t.tokensPerWord, 3)} | ${fixed(t.charsPerToken, 2)} | ${fixed(t.bytesPerToken, 2)} | ${t.dictionary ? fixed(t.dictionary.fertility, 3) : '–'}` +
          (hasBase ? ` | ${fixed(b?.fertility, 3)} | ${change === null ? '–' : `${change >= 0 ? '+' : ''}${percent(change)}`} | ${points(report.tokenizer?.mixShiftPoints?.[f.key])}` : '') +
          ' |',
      );
    }
    out.push('');
    out.push('</details>');
    out.push('');
  }

  // Duplicates
  if (report.duplicates) {
    const d = report.duplicates;
    out.push(`<details><summary>Duplicates: ${count(d.exactDocs)} exact (${percent(d.exactRate)}), ${count(d.nearDocs)} near (${percent(d.nearRate)})</summary>`);
    out.push('');
    out.push(`MinHash over word ${d.parameters.shingle}-grams, ${d.parameters.hashes} hashes, ${d.parameters.bands} bands × ${d.parameters.rows} rows, Jaccard ≥ ${d.parameters.threshold}.`);
    out.push('');
    for (const c of d.clusters.slice(0, 10)) {
      out.push(`- ${c.kind} ×${c.size}: first ${loc(c.first.path, c.first.line)}; copies ${c.copies.slice(0, 5).map((x) => `${loc(x.path, x.line)}${x.jaccard !== undefined ? ` (J≈${x.jaccard.toFixed(2)})` : ''}`).join(', ')}${c.copies.length > 5 ? ` and ${c.copies.length - 5} more` : ''}`);
    }
    out.push('');
    out.push('</details>');
    out.push('');
  }
  if (report.contamination) {
    const c = report.contamination;
    out.push(`<details><summary>Evaluation overlap: ${counted(c.docs, 'training document')} ${c.docs === 1 ? 'shares' : 'share'} a ${c.ngram}-word sequence with ${counted(c.evalItems, 'evaluation item')}</summary>`);
    out.push('');
    for (const s of c.samples) out.push(`- ${loc(s.path, s.line)} overlaps ${codePath(s.detail ?? '')}`);
    out.push('');
    out.push('</details>');
    out.push('');
  }

  // Input
  const i = report.input;
  out.push(`<details><summary>Input: ${counted(i.lines, 'line')} = ${count(i.docLines)} in documents + ${count(i.empty)} empty + ${count(i.rejected.count)} rejected</summary>`);
  out.push('');
  const reasons = Object.entries(i.rejected.byReason);
  if (reasons.length) out.push(`Rejected by reason: ${reasons.map(([r, n]) => `${r} ${count(n)}`).join(', ')}.`, '');
  for (const b of i.broken) out.push(`- broken: ${loc(b.path)} after line ${b.afterLine}: ${esc(b.message)}`);
  const rejections = firstRejections(report, MAX_REJECTIONS_LISTED);
  for (const r of rejections.shown) out.push(`- rejected: ${loc(r.path, r.line)} ${r.reason}: ${esc(r.detail)}`);
  if (rejections.more > 0) out.push(`- …and ${counted(rejections.more, 'more rejected line')} (each shard's first ones are in the JSON report)`);
  for (const s of i.skipped) out.push(`- skipped: ${codePath(s.path)} (${s.reason}): ${esc(s.detail)}`);
  const maxRows = opts.maxShardRows ?? 50;
  out.push('');
  out.push('| shard | subset | lines | docs | empty | rejected | languages |');
  out.push('|---|---|---:|---:|---:|---:|---|');
  for (const s of report.shards.slice(0, maxRows)) {
    out.push(`| ${loc(s.path)} | ${esc(s.subset ?? '')} | ${count(s.lines)} | ${count(s.docs)} | ${count(s.empty)} | ${count(s.rejected)} | ${esc(Object.entries(s.languages).map(([k, n]) => `${k} ${n}`).join(', '))} |`);
  }
  if (report.shards.length > maxRows) out.push('', `…and ${report.shards.length - maxRows} more shards (all are in the JSON report).`);
  out.push('');
  out.push('</details>');
  out.push('');
  out.push('<sub>sluice does not judge licences, personal data or toxicity: a pass is not a clearance.</sub>');
  return `${out.join('\n')}\n`;
}
