// Fitting the comment and the summary to GitHub's limits: a comment body holds at
// most 65,536 characters and a job summary at most 1 MiB per step (GitHub docs,
// as quoted in FIELD-NOTES). Cuts are whole sections, never mid-table, and say so.
import { describe, expect, it } from 'vitest';
import { COMMENT_MAX_CHARS, SUMMARY_MAX_BYTES, commentBody, commentMarker, fitMarkdown, summaryBody } from '../../src/action/markdown.js';
import { capAnnotations, type Annotation } from '../../src/action/annotations.js';
import { inputOf } from '../../src/action/inputs.js';

function table(rows: number, cell: string): string {
  return ['| a | b |', '|---|---|', ...Array.from({ length: rows }, (_, i) => `| ${i} | ${cell} |`)].join('\n');
}

/** A report-shaped Markdown: headline, a rules table, then collapsed sections of growing size. */
function bigMarkdown(sectionRows: number, firstRows = sectionRows): string {
  return [
    '## ❌ sluice · newsroom: FAIL',
    '',
    '**FAIL: mix (hin)**',
    '',
    table(5, 'rule'),
    '',
    '<details open><summary>Language mix (by words)</summary>',
    '',
    table(10, 'mix'),
    '',
    '</details>',
    '',
    '<details><summary>Duplicates: 3 exact</summary>',
    '',
    table(firstRows, 'x'.repeat(60)),
    '',
    '</details>',
    '',
    '<details><summary>Input: 100 lines</summary>',
    '',
    table(sectionRows, 'y'.repeat(60)),
    '',
    '</details>',
    '',
  ].join('\n');
}

describe('fitting Markdown to a limit', () => {
  it('leaves Markdown under the limit as it is', () => {
    const md = bigMarkdown(10);
    expect(fitMarkdown(md, 100_000, (s) => s.length, 'the limit', '')).toBe(md);
  });

  it('cuts whole collapsed sections from the end and names them', () => {
    const md = bigMarkdown(1200, 300);
    const body = commentBody('newsroom', md);
    expect(md.length).toBeGreaterThan(COMMENT_MAX_CHARS);
    expect(body.length).toBeLessThanOrEqual(COMMENT_MAX_CHARS);
    expect(body.startsWith(`${commentMarker('newsroom')}\n## ❌ sluice · newsroom: FAIL`)).toBe(true);
    // The last section went first; the one before stayed, whole.
    expect(body).not.toContain('<summary>Input: 100 lines</summary>');
    expect(body).toContain('<summary>Duplicates: 3 exact</summary>');
    expect(body.split('\n').filter((l) => l.includes('x'.repeat(60)))).toHaveLength(300);
    expect(body).toContain("> ✂️ Cut to fit GitHub's 65,536-character comment limit: “Input: 100 lines”.");
    // Every <details> opened is closed.
    expect(body.split('<details').length).toBe(body.split('</details>').length);
  });

  it('never cuts inside a table: with no section left, whole paragraphs go', () => {
    const md = [`## FAIL`, '', '**FAIL: everything**', '', table(3000, 'z'.repeat(30)), '', 'closing words', ''].join('\n');
    const fitted = fitMarkdown(md, 50_000, (s) => s.length, 'the limit', 'See the JSON report.');
    expect(fitted.length).toBeLessThanOrEqual(50_000);
    expect(fitted).toContain('**FAIL: everything**');
    expect(fitted).not.toContain('| a | b |');
    expect(fitted).toContain('Cut to fit the limit: the rest of the report. See the JSON report.');
  });

  it('fits each policy of the job summary into its share of 1 MiB, counted in UTF-8 bytes', () => {
    // Devanagari is 3 bytes a character in UTF-8: a limit in characters would let this through.
    const hindi = bigMarkdown(8000).replace(/x/g, 'क');
    expect(Buffer.byteLength(hindi)).toBeGreaterThan(SUMMARY_MAX_BYTES / 2);
    const summary = summaryBody([hindi, hindi]);
    expect(Buffer.byteLength(summary)).toBeLessThanOrEqual(SUMMARY_MAX_BYTES);
    expect(summary).toContain('the 1 MiB job summary limit');
  });
});

describe('the comment marker', () => {
  it('keeps a policy name from closing the HTML comment', () => {
    expect(commentMarker('news --> <b>room</b>')).toBe('<!-- sluice:comment policy=news_--___b_room__b_ -->');
    expect(commentMarker('news --> <b>room</b>').match(/-->/g)).toHaveLength(1);
  });
});

describe('annotations', () => {
  it('shows at most 10 of each kind per step, less those spent elsewhere, and counts the rest', () => {
    const mk = (kind: Annotation['kind'], i: number): Annotation => ({ kind, file: `data/s${i}.jsonl`, line: i, title: 't', message: 'm' });
    const all = [...Array.from({ length: 14 }, (_, i) => mk('error', i)), ...Array.from({ length: 3 }, (_, i) => mk('warning', i))];
    const { shown, omitted } = capAnnotations(all, { error: 1, warning: 0 });
    expect(shown.filter((a) => a.kind === 'error')).toHaveLength(9);
    expect(shown.filter((a) => a.kind === 'warning')).toHaveLength(3);
    expect(omitted).toEqual({ error: 5, warning: 0 });
    expect(shown[0]!.file).toBe('data/s0.jsonl');
  });
});

describe('inputs', () => {
  it('reads inputs as the runner names them: INPUT_ + upper case, dashes kept, spaces as underscores', () => {
    // The runner's contract, as @actions/core's getInput implements it.
    const env = { 'INPUT_GITHUB-TOKEN': ' t0k ', 'INPUT_FAIL-ON': 'warn', INPUT_MY_INPUT: 'x' };
    expect(inputOf(env, 'github-token')).toBe('t0k');
    expect(inputOf(env, 'fail-on')).toBe('warn');
    expect(inputOf(env, 'my input')).toBe('x');
    expect(inputOf(env, 'base')).toBe('');
  });
});
