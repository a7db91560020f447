// The PR comment and job summary: the report's Markdown view with the comparison
// against base placed after the rules, fitted to GitHub's size limits by cutting
// whole sections. A view: every figure comes from the report or the comparison.
import type { Comparison, ShardChange } from '../core/compare.js';
import type { Report, RuleVerdict } from '../judge/types.js';
import { bar } from '../render/bars.js';
import { codePath, escapeMarkdown as esc } from '../render/escape.js';
import { count, fixed, percent, points } from '../render/format.js';
import { renderMarkdown } from '../render/markdown.js';

/** GitHub rejects an issue comment body longer than this many characters. */
export const COMMENT_MAX_CHARS = 65_536;

/** GitHub takes at most 1 MiB of job summary per step. */
export const SUMMARY_MAX_BYTES = 1024 * 1024;

/** Rows of the changed-shards table; the JSON report has them all. */
const MAX_CHANGE_ROWS = 50;

/** Width of the mix bars, in cells: two fit side by side in a comment column. */
const BAR_CELLS = 12;

const ICON: Record<RuleVerdict | 'none', string> = { pass: '✅', warn: '⚠️', fail: '❌', uncertain: '❔', unjudged: '⚪', none: '➖' };

/** Returns the hidden line that identifies the comment of one policy, so later runs edit it instead of adding another. */
export function commentMarker(policyName: string): string {
  // Only a safe alphabet goes into the HTML comment, so a policy name cannot close it.
  return `<!-- sluice:comment policy=${policyName.replace(/[^A-Za-z0-9._-]/g, '_')} -->`;
}

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
    out.push(`| duplicates the change adds against the rest | | | ${count(d.exactDocs)} exact, ${count(d.nearDocs)} near of ${count(d.docs)} new documents |`);
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
      out.push(`| ${esc(l.key)} | ${fixed(l.fertility.base, 3)} | ${fixed(l.fertility.head, 3)} | ${l.fertilityChange === null ? '–' : `${l.fertilityChange >= 0 ? '+' : '−'}${percent(Math.abs(l.fertilityChange))}`} |`);
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

  if (c.addedDuplicates && c.addedDuplicates.perShard.some((s) => s.exactDocs + s.nearDocs > 0)) {
    out.push(`<details><summary>Duplicates added against the rest of the corpus</summary>`, '');
    out.push('| new or changed shard | documents | exact copies of existing | near copies of existing |', '|---|---:|---:|---:|');
    for (const s of c.addedDuplicates.perShard.filter((x) => x.exactDocs + x.nearDocs > 0).slice(0, MAX_CHANGE_ROWS)) {
      out.push(`| ${linkTo(s.shard, opts.linkBase)} | ${count(s.docs)} | ${count(s.exactDocs)} | ${count(s.nearDocs)} |`);
    }
    out.push('', '</details>', '');
  }
  return out.join('\n').trimEnd();
}

interface Block {
  text: string;
  /** The summary line of a collapsed section, when the block is one. */
  section?: string;
}

function blocksOf(markdown: string): Block[] {
  const blocks: Block[] = [];
  const lines = markdown.split('\n');
  let plain: string[] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.startsWith('<details')) {
      const end = lines.findIndex((l, j) => j > i && l.startsWith('</details>'));
      if (end !== -1) {
        if (plain.length) blocks.push({ text: plain.join('\n') });
        plain = [];
        const title = /<summary>(.*?)<\/summary>/.exec(line)?.[1] ?? 'a section';
        blocks.push({ text: lines.slice(i, end + 1).join('\n'), section: title });
        i = end;
        continue;
      }
    }
    plain.push(line);
  }
  if (plain.length) blocks.push({ text: plain.join('\n') });
  return blocks;
}

/** Returns the Markdown cut to fit `limit` (as measured by `sizeOf`) by dropping whole collapsed sections from the end, then whole paragraphs or tables, with a note saying what was cut. */
export function fitMarkdown(markdown: string, limit: number, sizeOf: (s: string) => number, limitName: string, fullReport: string): string {
  if (sizeOf(markdown) <= limit) return markdown;
  let blocks = blocksOf(markdown);
  const cut: string[] = [];
  const note = (): string => (cut.length ? `\n\n> ✂️ Cut to fit ${limitName}: ${cut.join('; ')}. ${fullReport}\n` : '');
  const text = (): string => `${blocks.map((b) => b.text).join('\n').trimEnd()}${note()}`;
  while (sizeOf(text()) > limit) {
    const last = blocks.map((b) => b.section !== undefined).lastIndexOf(true);
    if (last !== -1) {
      cut.unshift(`“${blocks[last]!.section!}”`);
      blocks = blocks.filter((_, i) => i !== last);
      continue;
    }
    // No collapsed section left: drop whole paragraphs (a table is one paragraph) from the end, keeping the verdict line.
    const paragraphs = blocks.map((b) => b.text).join('\n').split(/\n{2,}/);
    if (paragraphs.length <= 2) {
      return `${paragraphs.slice(0, 2).join('\n\n').slice(0, Math.max(0, limit - 200))}\n\n> ✂️ Cut to fit ${limitName}. ${fullReport}\n`;
    }
    paragraphs.pop();
    if (!cut.includes('the rest of the report')) cut.push('the rest of the report');
    blocks = [{ text: paragraphs.join('\n\n') }];
  }
  return text();
}

/** Returns the body of one policy's PR comment or summary section: the report's Markdown with the comparison after the rules. */
export function renderActionMarkdown(report: Report, comparison: Comparison | null, opts: { linkBase?: string }): string {
  const before = comparison ? renderComparison(comparison, opts) : undefined;
  return renderMarkdown(report, { ...(opts.linkBase ? { linkBase: opts.linkBase } : {}), ...(before ? { before } : {}) });
}

/** Returns the comment body: the hidden marker and the Markdown, fitted to GitHub's comment limit. */
export function commentBody(policyName: string, markdown: string): string {
  const marker = commentMarker(policyName);
  const fitted = fitMarkdown(markdown, COMMENT_MAX_CHARS - marker.length - 1, (s) => s.length, "GitHub's 65,536-character comment limit", 'The full report is in the job summary and the JSON report.');
  return `${marker}\n${fitted}`;
}

/** Returns the job summary of all policies, each fitted to its share of the 1 MiB limit. */
export function summaryBody(markdowns: string[]): string {
  // A margin for the separators and for the runner's own framing.
  const each = Math.floor((SUMMARY_MAX_BYTES - 4096) / Math.max(1, markdowns.length));
  return markdowns.map((m) => fitMarkdown(m, each, (s) => Buffer.byteLength(s), 'the 1 MiB job summary limit', 'The full report is in the JSON report.')).join('\n\n---\n\n');
}
