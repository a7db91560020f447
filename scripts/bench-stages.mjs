// Where a full check's measuring time goes: every document of the bench corpus is read
// into memory once, then each per-document analyzer of the full policy runs over all of
// them on its own (language + script + encoding + words, tokens, duplicates,
// contamination), the duplicate index and contamination together as a scan runs them
// (dup+cont), then all of them together as a shard scan runs them. One thread, in this
// process, no start-up, no reading: the rates are of the analyzers alone, so the single
// stages add up (as time per MB) to the measuring part of `npm run bench`'s full-check row.
//
//   node --import tsx scripts/bench-stages.mjs [--mb 40] [--rounds 3] [--only tokens,...]
//
// MB are UTF-8 bytes of document text. Each stage keeps its fastest round; rounds
// interleave the stages, so a noisy moment on the shared machine hits one round of each.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildBenchCorpus, writeBenchPolicies } from './bench-corpus.mjs';
import { prepareAnalyzers } from '../src/core/analyzers.ts';
import { loadPolicy } from '../src/policy/index.ts';
import { discoverShards, readShard } from '../src/read/index.ts';
import { HASH_SPACE } from '../src/results/sample.ts';
import { measureBatch } from '../src/results/scan.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const argv = process.argv.slice(2);
const option = (name, fallback) => {
  const i = argv.indexOf(`--${name}`);
  return i < 0 ? fallback : argv[i + 1];
};
const mb = Number(option('mb', 40));
const rounds = Number(option('rounds', 3));
const only = option('only', '') ? new Set(option('only', '').split(',')) : null;

const dir = path.join(ROOT, 'bench-out', `corpus-${mb}mb-seed1`);
const manifest = buildBenchCorpus({ dir, mb });
const policies = writeBenchPolicies(dir, manifest);
const loaded = await loadPolicy(policies.full);
if (!loaded.ok) throw new Error(loaded.problems.map((p) => p.message).join('\n'));
const prepared = await prepareAnalyzers(loaded.policy);
const { analyzers, scan } = prepared;

const docs = [];
const found = await discoverShards(loaded.policy.root, loaded.policy.corpus);
for (const ref of found.shards) await readShard(ref, scan.read, (doc) => docs.push(doc));
let bytes = 0;
for (const d of docs) bytes += Buffer.byteLength(d.text);
process.stdout.write(`${docs.length} documents, ${(bytes / 1e6).toFixed(1)} MB of text, ${found.shards.length} shards\n`);

let sink = 0;
const stages = {
  measure: () => {
    for (const d of docs) sink += analyzers.measure(d).words;
  },
  tokens: () => {
    for (const d of docs) sink += analyzers.tokens(d.text).main.tokens;
  },
  duplicates: () => {
    const b = analyzers.duplicates();
    let ordinal = 0;
    for (const d of docs) b.add({ ordinal: ordinal++, line: d.line, language: 0, text: d.text });
    sink += b.takePart().documents ?? 0;
  },
  contamination: () => {
    for (const d of docs) sink += analyzers.contamination(d.text) ? 1 : 0;
  },
  // The two per-document passes over the same text, in the order a shard scan runs them
  // (ShardFold.offer), without the other analyzers' time around them.
  'dup+cont': () => {
    const b = analyzers.duplicates();
    let ordinal = 0;
    for (const d of docs) {
      b.add({ ordinal: ordinal++, line: d.line, language: 0, text: d.text });
      sink += analyzers.contamination(d.text) ? 1 : 0;
    }
    sink += b.takePart().documents ?? 0;
  },
  all: () => {
    const batch = { lines: docs.map((d) => d.line), texts: docs.map((d) => d.text), declared: docs.map((d) => d.declaredLanguage ?? null), cutoff: HASH_SPACE };
    sink += measureBatch(batch, scan, analyzers).measured;
  },
};

const best = {};
for (let r = 0; r < rounds; r++) {
  for (const [name, run] of Object.entries(stages)) {
    if (only && !only.has(name)) continue;
    const t0 = process.hrtime.bigint();
    run();
    const s = Number(process.hrtime.bigint() - t0) / 1e9;
    best[name] = Math.min(best[name] ?? Infinity, s);
  }
}
let sum = 0;
for (const [name, s] of Object.entries(best)) {
  if (name !== 'all' && name !== 'dup+cont') sum += s;
  process.stdout.write(`${name.padEnd(14)} ${s.toFixed(2).padStart(6)} s ${(bytes / 1e6 / s).toFixed(1).padStart(7)} MB/s  ${((s * 1e9) / bytes).toFixed(1).padStart(6)} ns/byte\n`);
}
if (!only) process.stdout.write(`${'sum of stages'.padEnd(14)} ${sum.toFixed(2).padStart(6)} s ${(bytes / 1e6 / sum).toFixed(1).padStart(7)} MB/s\n`);
if (sink === -1) process.stdout.write('\n');
