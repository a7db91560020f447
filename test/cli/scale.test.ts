// All cores and many runners: the report is the same whatever the worker count,
// a partitioned scan merged equals one scan, and a failure inside a worker fails
// the run with the shard named instead of leaving the shard out.
import { cpSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Report } from '../../src/judge/types.js';
import { REPO, sluice } from './helpers.js';

const POLICY = 'examples/newsroom/policies/newsroom.yaml';
const comparable = (r: Report): string => JSON.stringify({ ...r, timing: null });
let single: Report;

beforeAll(() => {
  single = sluice(['check', POLICY, '--no-cache', '--workers', '1'], { json: true }).report!;
}, 120_000);

describe('worker threads', () => {
  it('give a byte-identical report with 1 and 4 workers (timing aside)', () => {
    const pooled = sluice(['check', POLICY, '--no-cache', '--workers', '4'], { json: true });
    expect(pooled.status).toBe(1);
    expect(comparable(pooled.report!)).toBe(comparable(single));
  });

  it('fail the run, naming the shard, when a worker throws', () => {
    const out = mkdtempSync(join(tmpdir(), 'sluice-fault-'));
    const r = sluice(['check', POLICY, '--no-cache', '--workers', '2', '--json', join(out, 'r.json')], {
      env: { SLUICE_FAULT_SHARD: 'data/english/english-01.jsonl.gz' },
    });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('data/english/english-01.jsonl.gz');
    expect(existsSync(join(out, 'r.json'))).toBe(false);
  });
});

describe('workers started while the main thread loads the policy', () => {
  it('are stopped, and the run ends with exit 2 naming the problem, when loading fails', () => {
    // The demo's shards without its evaluation files: rules.contamination.eval matches nothing.
    const root = mkdtempSync(join(tmpdir(), 'sluice-no-evals-'));
    cpSync(join(REPO, 'examples/newsroom/data'), join(root, 'data'), { recursive: true });
    // A worker left running would keep the process alive past the test's time limit.
    const r = sluice(['check', POLICY, '--root', root, '--no-cache', '--workers', '3']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('rules.contamination.eval');
  });
});

describe('one large shard', () => {
  // The whole demo corpus as one shard: gzip members one after another, as `cat a.gz b.gz` makes.
  let root: string;
  beforeAll(() => {
    root = mkdtempSync(join(tmpdir(), 'sluice-one-shard-'));
    mkdirSync(join(root, 'data', 'all'), { recursive: true });
    cpSync(join(REPO, 'examples/newsroom/evals'), join(root, 'evals'), { recursive: true });
    const data = join(REPO, 'examples/newsroom/data');
    const members = readdirSync(data, { recursive: true, encoding: 'utf8' })
      .filter((f) => f.endsWith('.jsonl.gz'))
      .sort()
      .map((f) => readFileSync(join(data, f)));
    writeFileSync(join(root, 'data', 'all', 'all-00.jsonl.gz'), Buffer.concat(members));
  });

  it('is measured in batches across workers, with the report of one worker (timing aside)', () => {
    const one = sluice(['check', POLICY, '--root', root, '--no-cache', '--workers', '1'], { json: true });
    expect(one.report!.input.shards).toBe(1);
    const split = sluice(['check', POLICY, '--root', root, '--no-cache', '--workers', '4', '--split-mb', '0'], { json: true });
    expect(split.status).toBe(one.status);
    expect(comparable(split.report!)).toBe(comparable(one.report!));
    // The same documents as the demo's shards one by one: the split lost nothing.
    expect(one.report!.input.docs).toBe(single.input.docs);
  });

  it('fails the run, naming the shard, when a worker throws on one of its batches', () => {
    const out = mkdtempSync(join(tmpdir(), 'sluice-fault-'));
    const r = sluice(['check', POLICY, '--root', root, '--no-cache', '--workers', '2', '--split-mb', '0', '--json', join(out, 'r.json')], {
      env: { SLUICE_FAULT_SHARD: 'data/all/all-00.jsonl.gz' },
    });
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('data/all/all-00.jsonl.gz');
    expect(existsSync(join(out, 'r.json'))).toBe(false);
  });
});

describe('partitioned scans', () => {
  it('merge into the same report as one scan', () => {
    const dir = mkdtempSync(join(tmpdir(), 'sluice-parts-'));
    const parts = [1, 2, 3].map((i) => join(dir, `part-${i}.json`));
    let shards = 0;
    parts.forEach((out, i) => {
      const r = sluice(['scan', '--policy', POLICY, '--partition', `${i + 1}/3`, '--out', out, '--no-cache']);
      expect(r.status).toBe(0);
      shards += Number(/: (\d+) of \d+ shards/.exec(r.stdout)![1]);
    });
    expect(shards).toBe(single.input.shards);
    const merged = sluice(['merge', ...parts, '--policy', POLICY], { json: true });
    expect(merged.status).toBe(1);
    expect(comparable(merged.report!)).toBe(comparable(single));
  });

  it('refuse to merge when a partition is missing', () => {
    const dir = mkdtempSync(join(tmpdir(), 'sluice-parts-'));
    const out = join(dir, 'part-1.json');
    sluice(['scan', '--policy', POLICY, '--partition', '1/2', '--out', out, '--no-cache']);
    const r = sluice(['merge', out, '--policy', POLICY]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('partition 2/2 missing');
  });
});
