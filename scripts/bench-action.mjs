#!/usr/bin/env node
// Benchmark (not a test): the same one-shard pull request against a corpus and
// against one 10× larger, each with a warm shard cache (a push to main ran first),
// timing dist/index.js as a runner starts it. With the cache doing its job, the
// PR's cost should barely grow with the corpus: goal < 1.5×.
//
//   node scripts/build.mjs && node scripts/bench-action.mjs [shards=40] [docsPerShard=200]
import { execFileSync, spawnSync } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

const SMALL_SHARDS = Number(process.argv[2] ?? 40);
const DOCS_PER_SHARD = Number(process.argv[3] ?? 200);
// Runs per size; the median is reported, since the machine is shared and noisy.
const REPEATS = 3;
const BUNDLE = path.resolve('dist/index.js');

const WORDS = 'the ward council in Nadipur met on Monday to discuss the new bridge over the Sarjani river while farmers asked for better prices at the market'.split(' ');
const HINDI = 'नदीपुर के वार्ड परिषद ने सोमवार को सरजनी नदी पर नए पुल के बारे में चर्चा की और किसानों ने मंडी में बेहतर दाम मांगे'.split(' ');

function shard(pool, lang, seed) {
  let x = seed * 2654435761 >>> 0;
  const next = () => ((x = (Math.imul(x ^ (x >>> 15), 2246822507) + 0x9e3779b9) >>> 0) / 4294967296);
  const lines = [];
  for (let i = 0; i < DOCS_PER_SHARD; i++) {
    const text = Array.from({ length: 60 }, () => pool[Math.floor(next() * pool.length)]).join(' ');
    lines.push(JSON.stringify({ text: `${text} ${seed}-${i}`, lang }));
  }
  return `${lines.join('\n')}\n`;
}

const POLICY = `version: 1
name: newsroom
corpus:
  include: ["data/**/*.jsonl"]
  text: text
  declared-language: lang
languages:
  hin: { scripts: [Devanagari], target: 0.5 }
  eng: { scripts: [Latin], target: 0.5 }
rules:
  mix: { unit: words, tolerance: 0.2 }
  encoding: { max-anomalous-docs: 0.0, forbid: [bidi-controls, replacement-char] }
  duplicates: { max-exact: 0.5, near: { threshold: 0.8, max: 0.5 } }
`;

function run(dir, event, runnerTemp, base, head) {
  const work = mkdtempSync(path.join(tmpdir(), 'sluice-bench-run-'));
  const eventPath = path.join(work, 'event.json');
  writeFileSync(eventPath, JSON.stringify(event === 'push' ? { ref: 'refs/heads/main' } : { number: 1, pull_request: { number: 1, base: { sha: base, ref: 'main' }, head: { sha: head } } }));
  const env = {
    PATH: process.env.PATH, HOME: process.env.HOME,
    GITHUB_EVENT_NAME: event, GITHUB_EVENT_PATH: eventPath, GITHUB_REPOSITORY: 'sangam/newsroom-corpus', GITHUB_SHA: head,
    GITHUB_WORKSPACE: dir, GITHUB_OUTPUT: path.join(work, 'out'), GITHUB_STEP_SUMMARY: path.join(work, 'summary'), RUNNER_TEMP: runnerTemp,
    INPUT_POLICY: 'sluice.yaml', INPUT_COMMENT: 'never', 'INPUT_REPORT-DIR': path.join(work, 'report'), 'INPUT_FAIL-ON': 'never',
  };
  writeFileSync(env.GITHUB_OUTPUT, '');
  const t0 = performance.now();
  const r = spawnSync(process.execPath, [BUNDLE], { cwd: dir, env, encoding: 'utf8' });
  const ms = performance.now() - t0;
  if (r.status !== 0) throw new Error(`run failed: ${r.stdout}\n${r.stderr}`);
  return { ms, log: r.stdout };
}

function prOn(shards) {
  const dir = mkdtempSync(path.join(tmpdir(), 'sluice-bench-'));
  const git = (...a) => execFileSync('git', a, { cwd: dir, encoding: 'utf8' });
  git('init', '-q', '-b', 'main');
  git('config', 'user.email', 'desk@sangam.invalid');
  git('config', 'user.name', 'Desk');
  writeFileSync(path.join(dir, 'sluice.yaml'), POLICY);
  mkdirSync(path.join(dir, 'data/eng'), { recursive: true });
  mkdirSync(path.join(dir, 'data/hin'), { recursive: true });
  for (let i = 0; i < shards / 2; i++) {
    writeFileSync(path.join(dir, `data/eng/${i}.jsonl`), shard(WORDS, 'eng', i + 1));
    writeFileSync(path.join(dir, `data/hin/${i}.jsonl`), shard(HINDI, 'hin', 100000 + i));
  }
  git('add', '-A');
  git('commit', '-q', '-m', 'base');
  const base = git('rev-parse', 'HEAD').trim();
  const runnerTemp = mkdtempSync(path.join(tmpdir(), 'sluice-bench-temp-'));
  const warm = run(dir, 'push', runnerTemp, base, base);
  writeFileSync(path.join(dir, 'data/eng/0.jsonl'), shard(WORDS, 'eng', 777));
  git('commit', '-qam', 'one shard');
  const head = git('rev-parse', 'HEAD').trim();
  const times = [];
  let log = '';
  for (let i = 0; i < REPEATS; i++) {
    // Each repeat starts from the cache as the push left it, so each measures the changed shard.
    const temp = mkdtempSync(path.join(tmpdir(), 'sluice-bench-temp-'));
    cpSync(runnerTemp, temp, { recursive: true });
    const r = run(dir, 'pull_request', temp, base, head);
    times.push(r.ms);
    log = r.log;
  }
  times.sort((a, b) => a - b);
  return { warmMs: warm.ms, prMs: times[Math.floor(times.length / 2)], measured: /measured .*/.exec(log)?.[0] };
}

const small = prOn(SMALL_SHARDS);
const large = prOn(SMALL_SHARDS * 10);
const mb = (n) => ((n * DOCS_PER_SHARD * 60 * 6) / 1e6).toFixed(1);
console.log(`corpus ${SMALL_SHARDS} shards (~${mb(SMALL_SHARDS)} MB): cold full run ${small.warmMs.toFixed(0)} ms; PR with warm cache ${small.prMs.toFixed(0)} ms (${small.measured})`);
console.log(`corpus ${SMALL_SHARDS * 10} shards (~${mb(SMALL_SHARDS * 10)} MB): cold full run ${large.warmMs.toFixed(0)} ms; PR with warm cache ${large.prMs.toFixed(0)} ms (${large.measured})`);
console.log(`PR time ratio, 10× corpus / 1×: ${(large.prMs / small.prMs).toFixed(2)}× (goal < 1.5×); full-run ratio ${(large.warmMs / small.warmMs).toFixed(2)}×`);
