// Documents longer than the WebAssembly kernels take (the token kernel 2^18 UTF-16 units, the
// measurer's and the duplicate index's 2^20) are measured in TypeScript. A whole check over a
// shard holding such documents next to ordinary ones must count them as it counts the others:
// tokens as js-tiktoken's encode (the reference library), words as Intl.Segmenter, and the long
// documents found again as exact duplicates and as copies of an evaluation item.
import { Tiktoken } from 'js-tiktoken/lite';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import { describe, expect, it } from 'vitest';
import { MAX_SCAN_UNITS } from '../../src/measure/kernels/duplicates-kernel.js';
import { MAX_KERNEL_UNITS } from '../../src/measure/kernels/tokens-kernel.js';
import { MAX_WORD_UNITS } from '../../src/measure/kernels/words-kernel.js';
import { corpus, ENGLISH, HINDI, sluice } from './helpers.js';

const segmenter = new Intl.Segmenter('und', { granularity: 'word' });
/** Word-like segments of a text by Intl.Segmenter, counted as they come (a long text makes millions). */
function wordsOf(text: string): number {
  let n = 0;
  for (const s of segmenter.segment(text)) if (s.isWordLike) n++;
  return n;
}

describe('documents past the kernels’ length limits', () => {
  it('are counted, deduplicated and checked for contamination like any other document', () => {
    // An evaluation item whose words are planted in the longest document.
    const item = 'the night desk filed a correction about the river levels at the eastern bridge before dawn';
    const paragraph = `${ENGLISH} ${HINDI} `;
    const middle = paragraph.repeat(Math.ceil((MAX_KERNEL_UNITS + 5_000) / paragraph.length)); // past the token kernel only
    const longest = `${paragraph.repeat(Math.ceil((Math.max(MAX_WORD_UNITS, MAX_SCAN_UNITS) + 5_000) / paragraph.length))}${item}.`; // past every kernel
    expect(middle.length).toBeGreaterThan(MAX_KERNEL_UNITS);
    expect(middle.length).toBeLessThan(Math.min(MAX_WORD_UNITS, MAX_SCAN_UNITS));
    expect(longest.length).toBeGreaterThan(Math.max(MAX_WORD_UNITS, MAX_SCAN_UNITS));
    const texts = [ENGLISH, HINDI, middle, longest, longest, `${ENGLISH} A short one, with 😀 in it.`];
    const root = corpus({
      'data/mixed.jsonl': texts.map((text) => JSON.stringify({ text })).join('\n') + '\n',
      'evals/held-out.jsonl': `${JSON.stringify({ text: item })}\n`,
      'policy.yaml': `version: 1
name: long
root: .
corpus:
  include: ["data/**/*"]
  max-line-bytes: 16777216
languages:
  eng: { scripts: [Latin], target: 0.5 }
  hin: { scripts: [Devanagari], target: 0.5 }
tokenizer: { builtin: o200k_base }
rules:
  mix: { unit: tokens, tolerance: 0.05 }
  duplicates: { max-exact: 1, near: { threshold: 0.8, max: 1 } }
  contamination: { eval: ["evals/*.jsonl"], ngram: 13, max-docs: 10 }
`,
    });
    const run = sluice(['check', 'policy.yaml', '--no-cache', '--workers', '1'], { cwd: root, json: true });
    expect(run.stderr).not.toMatch(/error|warning/i);
    const report = run.report!;
    expect(report.input.docs).toBe(texts.length);
    expect(report.input.rejected.count).toBe(0);
    const reference = new Tiktoken(o200kRanks);
    expect(report.totals.tokens).toBe(texts.reduce((n, t) => n + reference.encode(t, [], []).length, 0));
    // Intl.Segmenter slows down badly on long strings (over a minute for 2^18 units here), so the
    // long documents' words are counted per repetition: a space ends each paragraph, and UAX #29
    // always breaks on both sides of a space, so the counts add up.
    const repeats = (text: string): number => Math.floor(text.length / paragraph.length);
    const wordsWanted =
      wordsOf(ENGLISH) + wordsOf(HINDI) + wordsOf(texts[5]!) + wordsOf(paragraph) * repeats(middle) + 2 * (wordsOf(paragraph) * repeats(longest) + wordsOf(`${item}.`));
    expect(middle).toBe(paragraph.repeat(repeats(middle)));
    expect(report.totals.words).toBe(wordsWanted);
    expect(report.totals.bytes).toBe(texts.reduce((n, t) => n + Buffer.byteLength(t), 0));
    // The longest document twice: one exact duplicate; both copies hold the evaluation item.
    expect(report.duplicates!.exactDocs).toBe(1);
    expect(report.contamination!.docs).toBe(2);
  }, 120_000);
});
