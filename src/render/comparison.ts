// The comparison against base as people read it: Markdown (the PR comment, the job summary,
// `sluice check --base --markdown`) and the terminal. A view: every figure comes from the
// comparison (judge/comparison.ts).
import type { Comparison, ShardChange } from '../judge/comparison.js';
import type { Report, RuleVerdict } from '../judge/types.js';
import { bar } from './bars.js';
import { codePath, escapeMarkdown as esc } from './escape.js';
import { count, counted, fixed, percent, points, signedPercent } from './format.js';
import { renderMarkdown } from './markdown.js';
import { clean } from './terminal.js';

/** Rows of the changed-shards table; the JSON report has them all. */
const MAX_CHANGE_ROWS = 50;

/** Width of the mix bars, in cells: two fit side by side in a comment column. */
const BAR_CELLS = 12;

const ICON: Record<RuleVerdict | 'none', string> = { pass: '✅', warn: '⚠️', fail: '❌', uncertain: '❔', unjudged: '⚪', none: '➖' };

/** Returns a path segment percent-encoded, parentheses and quotes included, so it cannot end a Markdown link destination early. */
function urlSegment(segment: string): string {
  return encodeURIComponent(segment).replace(/[!'()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
}

function linkTo(p: string, linkBase: string | undefined, text = codePath(p)): string {
  if (!linkBase) return text;
  return `[${text}](${linkBase}/${p.split('/').map(urlSegment).join('/')})`;
}

function signed(n: number | null): string {
  if (n === null) return '–';
  return n > 0 ? `+${count(n)}` : n < 0 ? `−${count(-n)}` : '±0';
}

function rowOf(label: string, d: { base: number | null; head: number | null }): string {
  return `| ${label} | ${count(d.base)} | ${count(d.head)} | ${d.base === null || d.head === null ? '–' : signed(d.head - d.base)} |`;
}

function changeCounts(changes: ShardChange[]): string {
  const by = (s: ShardChange['status']): number => changes.filter((c) => c.status === s).length;
  const parts = (['added', 'modified', 'renamed', 'deleted'] as const).filter((s) => by(s) > 0).map((s) => `${by(s)} ${s}`);
  return parts.length ? parts.join(', ') : 'no shard changed';
}

/** Returns `; N exact, M near repeats within the change` for counts that have any, else nothing. */
function repeatsWithin(c: { withinExactDocs: number; withinNearDocs: number }): string {
  return c.withinExactDocs + c.withinNearDocs > 0 ? `; ${count(c.withinExactDocs)} exact, ${count(c.withinNearDocs)} near repeats within the change` : '';
}

/** True when a new shard holds copies: of the rest of the corpus, or of documents the change adds. */
function hasCopies(s: NonNullable<Comparison['addedDuplicates']>['perShard'][number]): boolean {
  return s.exactDocs + s.nearDocs + s.withinExactDocs + s.withinNearDocs > 0;
}

/** Returns the comparison against base as Markdown: a compact table, then collapsed sections. */
export function renderComparison(c: Comparison, opts: { linkBase?: string } = {}): string {
  const out: string[] = [];
  const baseName = `${codePath(c.base.label)}${c.base.label.startsWith(c.base.commit.slice(0, 7)) ? '' : ` (${codePath(c.base.commit.slice(0, 7))})`}`;
  out.push(`### Against base ${baseName}`, '');
  if (c.verdict.base === null) out.push(`The base has no shard this policy covers: every shard is new.`, '');
  out.push('| | base | head | change |', '|---|---:|---:|---:|');
  out.push(`| verdict | ${c.verdict.base === null ? '–' : `${ICON[c.verdict.base]} ${c.verdict.base}`} | ${ICON[c.verdict.head]} ${c.verdict.head} | |`);
  out.push(`| shards | ${count(c.shards.base)} | ${count(c.shards.head)} | ${changeCounts(c.changes)} |`);
  out.push(rowOf('documents', c.docs), rowOf('words', c.words));
  if (c.tokens.head !== null || c.tokens.base !== null) out.push(rowOf('tokens', c.tokens));
  for (const l of c.languages) {
    out.push(`| ${esc(l.key)}: share of ${c.mixUnit} | ${percent(l.share.base)} | ${percent(l.share.head)} | ${points(l.shiftPoints)} |`);
  }
  if (c.addedDuplicates) {
    const d = c.addedDuplicates;
    const within = repeatsWithin(d);
    out.push(`| duplicates the change adds against the rest | | | ${count(d.exactDocs)} exact, ${count(d.nearDocs)} near of ${count(d.docs)} new documents${within} |`);
  }
  out.push('');
  if (c.flipped.length > 0) {
    out.push('**Rules that changed:**', '');
    for (const f of c.flipped) {
      out.push(`- ${ICON[f.to]} ${esc(f.rule)} · ${esc(f.scope.replace(/^language:/, ''))}: ${f.from} → ${f.to}${f.to !== 'none' ? ` (${esc(f.message)})` : ''}`);
    }
    out.push('');
  } else if (c.verdict.base !== null) {
    out.push('No rule changed its verdict.', '');
  }

  out.push(`<details><summary>Mix against base (share of ${c.mixUnit})</summary>`, '');
  out.push('| language | target | base | head | shift | base | head |', '|---|---:|---:|---:|---:|---|---|');
  for (const l of c.languages) {
    out.push(`| ${esc(l.key)} | ${percent(l.target)} | ${percent(l.share.base)} | ${percent(l.share.head)} | ${points(l.shiftPoints)} | ${bar(l.share.base ?? 0, BAR_CELLS)} | ${bar(l.share.head ?? 0, BAR_CELLS)} |`);
  }
  out.push('', '</details>', '');

  const withFertility = c.languages.filter((l) => l.fertility.base !== null || l.fertility.head !== null);
  if (withFertility.length > 0) {
    out.push('<details><summary>Fertility against base (tokens per word, running text)</summary>', '');
    out.push('| language | base | head | change |', '|---|---:|---:|---:|');
    for (const l of withFertility) {
      out.push(`| ${esc(l.key)} | ${fixed(l.fertility.base, 3)} | ${fixed(l.fertility.head, 3)} | ${signedPercent(l.fertilityChange)} |`);
    }
    out.push('', '</details>', '');
  }

  if (c.changes.length > 0) {
    out.push(`<details><summary>Changed shards: ${changeCounts(c.changes)}</summary>`, '');
    out.push('| change | shard | docs at base | docs at head |', '|---|---|---:|---:|');
    for (const ch of c.changes.slice(0, MAX_CHANGE_ROWS)) {
      const what = ch.status === 'renamed' ? `renamed from ${codePath(ch.from ?? '')}${ch.edited ? ' and edited' : ''}` : ch.status;
      const shown = ch.status === 'deleted' ? codePath(ch.path) : linkTo(ch.path, opts.linkBase);
      out.push(`| ${what} | ${shown} | ${count(ch.docs.base)} | ${count(ch.docs.head)} |`);
    }
    if (c.changes.length > MAX_CHANGE_ROWS) out.push('', `…and ${c.changes.length - MAX_CHANGE_ROWS} more (all are in the comparison JSON).`);
    out.push('', '</details>', '');
  }

  if (c.addedDuplicates && c.addedDuplicates.perShard.some(hasCopies)) {
    out.push(`<details><summary>Duplicates added against the rest of the corpus</summary>`, '');
    out.push('| new or changed shard | documents | exact copies of existing | near copies of existing | repeats within the change (exact, near) |', '|---|---:|---:|---:|---:|');
    for (const s of c.addedDuplicates.perShard.filter(hasCopies).slice(0, MAX_CHANGE_ROWS)) {
      out.push(`| ${linkTo(s.shard, opts.linkBase)} | ${count(s.docs)} | ${count(s.exactDocs)} | ${count(s.nearDocs)} | ${count(s.withinExactDocs)}, ${count(s.withinNearDocs)} |`);
    }
    out.push('', '</details>', '');
  }
  return out.join('\n').trimEnd();
}

/** Returns the report's Markdown with the comparison against base after the rules (none: the report alone). */
export function renderMarkdownWithComparison(report: Report, comparison: Comparison | null, opts: { linkBase?: string } = {}): string {
  const before = comparison ? renderComparison(comparison, opts) : undefined;
  return renderMarkdown(report, { ...(opts.linkBase ? { linkBase: opts.linkBase } : {}), ...(before ? { before } : {}) });
}

/** Changed shards the terminal view lists; the comparison JSON has them all. */
const TERMINAL_CHANGE_ROWS = 10;

/** Returns the comparison against base as plain text for a terminal, after the report's own view; ANSI colour when `color` is set. */
export function renderComparisonTerminal(c: Comparison, opts: { color: boolean; baseShardsRead?: number }): string {
  const paintOf = (code: number) => (s: string): string => (opts.color ? `\u001b[${code}m${s}\u001b[0m` : s);
  const bold = paintOf(1), dim = paintOf(2);
  const byVerdict: Record<RuleVerdict | 'none', (s: string) => string> = { pass: paintOf(32), warn: paintOf(33), fail: paintOf(31), uncertain: paintOf(33), unjudged: dim, none: dim };
  const verdict = (v: RuleVerdict | 'none'): string => byVerdict[v](v === 'none' ? 'none' : v.toUpperCase());
  const lines: string[] = [];
  const label = clean(c.base.label);
  lines.push(`${bold(`Against base ${label}`)}${label.startsWith(c.base.commit.slice(0, 7)) ? '' : dim(` (${c.base.commit.slice(0, 7)})`)}  ${c.verdict.base === null ? dim('no shard at base') : verdict(c.verdict.base)} ${dim('→')} ${verdict(c.verdict.head)}`);
  if (c.verdict.base === null) lines.push(dim('  the base has no shard this policy covers: every shard is new'));
  const delta = (d: { base: number | null; head: number | null }): string => `${count(d.base)} → ${count(d.head)}${d.base === null || d.head === null ? '' : dim(` (${signed(d.head - d.base)})`)}`;
  lines.push(`  shards ${delta(c.shards)}: ${changeCounts(c.changes)}`);
  lines.push(`  documents ${delta(c.docs)}, words ${delta(c.words)}${c.tokens.head !== null || c.tokens.base !== null ? `, tokens ${delta(c.tokens)}` : ''}`);
  if (c.languages.length > 0) {
    const shares = `share of ${c.mixUnit}`;
    lines.push(dim(`  ${''.padEnd(9)} ${shares.padEnd(33)}   fertility (tokens per word)`));
    lines.push(dim(`  ${'language'.padEnd(9)} ${'target'.padStart(7)} ${'base'.padStart(7)} ${'head'.padStart(7)} ${'shift'.padStart(9)}   ${'base'.padStart(7)} ${'head'.padStart(7)} ${'change'.padStart(8)}`));
    for (const l of c.languages) {
      lines.push(
        `  ${clean(l.key).padEnd(9)} ${percent(l.target).padStart(7)} ${percent(l.share.base).padStart(7)} ${percent(l.share.head).padStart(7)} ${points(l.shiftPoints).padStart(9)}   ${fixed(l.fertility.base, 3).padStart(7)} ${fixed(l.fertility.head, 3).padStart(7)} ${signedPercent(l.fertilityChange).padStart(8)}`,
      );
    }
  }
  if (c.addedDuplicates) {
    const d = c.addedDuplicates;
    const within = repeatsWithin(d);
    lines.push(`  duplicates the change adds against the rest: ${count(d.exactDocs)} exact, ${count(d.nearDocs)} near of ${count(d.docs)} new documents${within}`);
    for (const s of d.perShard.filter(hasCopies).slice(0, TERMINAL_CHANGE_ROWS)) {
      const repeats = repeatsWithin(s);
      lines.push(`    ${clean(s.shard)} ${dim(`${count(s.exactDocs)} exact, ${count(s.nearDocs)} near of ${count(s.docs)}${repeats}`)}`);
    }
  }
  if (c.flipped.length > 0) {
    lines.push('  rules that changed:');
    for (const f of c.flipped) {
      lines.push(`    ${f.rule} · ${clean(f.scope.replace(/^language:/, ''))}: ${verdict(f.from)} ${dim('→')} ${verdict(f.to)}${f.to !== 'none' ? dim(`  ${clean(f.message)}`) : ''}`);
    }
  } else if (c.verdict.base !== null) lines.push(dim('  no rule changed its verdict'));
  if (c.changes.length > 0) {
    lines.push('  changed shards:');
    for (const ch of c.changes.slice(0, TERMINAL_CHANGE_ROWS)) {
      const what = ch.status === 'renamed' ? `renamed from ${clean(ch.from ?? '')}${ch.edited ? ' and edited' : ''}` : ch.status;
      lines.push(`    ${ch.status.padEnd(8)} ${clean(ch.path)}${dim(`  ${ch.status === 'renamed' ? `${what}, ` : ''}documents ${count(ch.docs.base)} → ${count(ch.docs.head)}`)}`);
    }
    if (c.changes.length > TERMINAL_CHANGE_ROWS) lines.push(dim(`    …and ${c.changes.length - TERMINAL_CHANGE_ROWS} more (all are in the comparison JSON)`));
  }
  if (opts.baseShardsRead !== undefined && c.shards.base !== null) {
    lines.push(dim(`  ${count(opts.baseShardsRead)} of ${counted(c.shards.base, 'base shard')} read from git; the others have the head's bytes and were measured once`));
  }
  return `${lines.join('\n')}\n`;
}
