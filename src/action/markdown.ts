// The PR comment and job summary: the report's Markdown view with the comparison
// against base placed after the rules (render/comparison.ts), fitted to GitHub's size
// limits by cutting whole sections.
import type { Comparison } from '../judge/comparison.js';
import type { Report } from '../judge/types.js';
import { renderMarkdownWithComparison } from '../render/comparison.js';

/** GitHub rejects an issue comment body longer than this many characters. */
export const COMMENT_MAX_CHARS = 65_536;

/** GitHub takes at most 1 MiB of job summary per step. */
export const SUMMARY_MAX_BYTES = 1024 * 1024;

/** Returns the hidden line that identifies the comment of one policy, so later runs edit it instead of adding another. */
export function commentMarker(policyName: string): string {
  // Only a safe alphabet goes into the HTML comment, so a policy name cannot close it.
  return `<!-- sluice:comment policy=${policyName.replace(/[^A-Za-z0-9._-]/g, '_')} -->`;
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
  return renderMarkdownWithComparison(report, comparison, opts);
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
