// The final job of a fan-out: `sluice scan --partition I/N` jobs measure the head's shards, and
// the Action, given their parts, takes those results instead of measuring, then compares with
// base and comments exactly as a one-job run does.
import { spawnSync } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PARTIAL_FORMAT, PARTIAL_VERSION, partialFromJson } from '../../src/results/partition.js';
import { fakeGitHub, newsroomRepo, policyYaml, runBundle, stories, type FakeGitHub, type Repo } from './harness.js';

const BIN = path.resolve('bin/sluice.js');

/** Runs `sluice scan` for each partition of `count` in the repository, writing parts/part-I.json (outside the corpus). */
function scanParts(repo: Repo, count: number): void {
  mkdirSync(path.join(repo.dir, 'parts'), { recursive: true });
  for (let i = 1; i <= count; i++) {
    const r = spawnSync(process.execPath, [BIN, 'scan', '--policy', 'policies/newsroom.yaml', '--partition', `${i}/${count}`, '--out', `parts/part-${i}.json`, '--no-cache'], {
      cwd: repo.dir,
      encoding: 'utf8',
      env: { ...process.env, NO_COLOR: '1' },
    });
    expect(r.status, r.stderr).toBe(0);
  }
}

/** A report without its timing, which differs from run to run, and without which shards came from the cache (here: from the parts). */
function judged(report: Record<string, unknown>): Record<string, unknown> {
  const { timing: _timing, ...rest } = report;
  return JSON.parse(JSON.stringify(rest, (k, v: unknown) => (k === 'fromCache' ? undefined : v))) as Record<string, unknown>;
}

/** A repository with a base commit and a pull request on top that adds a Hindi shard, a copy of an English one and changes another. */
function pullRequestRepo(): { repo: Repo; base: string; head: string } {
  const { repo, base } = newsroomRepo(3, policyYaml({ duplicates: true }));
  repo.write('data/hin/hin-new.jsonl', stories('hin', 10, 1700));
  repo.write('data/eng/eng-copy.jsonl', stories('eng', 10, 1));
  repo.write('data/eng/eng-002.jsonl', stories('eng', 12, 2));
  return { repo, base, head: repo.commit('Desk: new Hindi stories, a re-filed English shard') };
}

describe('the Action given the parts of a partitioned scan', () => {
  let api: FakeGitHub;
  beforeAll(async () => {
    api = await fakeGitHub();
  });
  afterAll(() => api.close());

  it('takes every head shard from the parts and gives the report and comment a one-job run gives', async () => {
    const { repo, base, head } = pullRequestRepo();
    const pr = { number: 61, baseSha: base, headSha: head };
    const alone = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { comment: 'always' } });
    expect(alone.code, alone.stdout).toBe(0);
    const aloneComment = api.comments.at(-1)!.body;
    api.comments.length = 0;

    scanParts(repo, 3);
    const fanned = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { comment: 'always', parts: 'parts/part-*.json' } });
    expect(fanned.code, fanned.stdout).toBe(0);
    // 8 shards at head, all from the parts: nothing at head is read again.
    expect(fanned.stdout).toContain('sluice newsroom: took 8 shard results from 3 parts');
    expect(fanned.report.timing.cacheMisses).toBe(0);
    expect(fanned.report.timing.cacheHits).toBe(8);
    expect(judged(fanned.report)).toEqual(judged(alone.report));
    expect(fanned.summary).toBe(alone.summary);
    expect(api.comments.at(-1)!.body).toBe(aloneComment);
    expect(fanned.outputs['verdict']).toBe(alone.outputs['verdict']);
  });

  it('refuses parts scanned on another commit, naming the part and the shard', async () => {
    const { repo, base } = pullRequestRepo();
    scanParts(repo, 2);
    // The desk edits a shard after the scan jobs ran: this job's checkout has other bytes there.
    repo.write('data/hin/hin-000.jsonl', stories('hin', 11, 1000));
    const head = repo.commit('Desk: one more story');
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 62, baseSha: base, headSha: head }, inputs: { parts: 'parts/part-*.json' } });
    expect(run.code).not.toBe(0);
    expect(run.stdout).toMatch(/part-[12]\.json: data\/hin\/hin-000\.jsonl was scanned as git blob [0-9a-f]{12}, and this checkout has [0-9a-f]{12}: run the scan jobs and this job on the same commit/);
    expect(run.outputs['verdict']).toBeUndefined();
  });

  it('refuses an incomplete set of parts and parts of another policy, and patterns that match nothing', async () => {
    const { repo, base, head } = pullRequestRepo();
    const pr = { number: 63, baseSha: base, headSha: head };
    scanParts(repo, 3);
    const some = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { parts: 'parts/part-[12].json' } });
    expect(some.code).not.toBe(0);
    expect(some.stdout).toContain('partition 3/3 missing: the report would not cover the corpus');

    const none = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { parts: 'artifacts/*.json' } });
    expect(none.code).not.toBe(0);
    expect(none.stdout).toContain("input `parts`: no file matches `artifacts/*.json`");

    // The policy changes what is measured (near-duplicate threshold) after the scan.
    repo.write('policies/newsroom.yaml', policyYaml({ duplicates: true }).replace('threshold: 0.8', 'threshold: 0.7'));
    const other = await runBundle({ repo, event: 'pull_request', api, pr: { ...pr, headSha: repo.commit('Stricter near duplicates') }, inputs: { parts: 'parts/part-*.json' } });
    expect(other.code).not.toBe(0);
    expect(other.stdout).toContain('input `parts`: none of the 3 part files was measured under');
  });

  it('measures here a shard whose part names no git blob (scanned outside a git work tree)', async () => {
    const { repo, base, head } = pullRequestRepo();
    scanParts(repo, 2);
    // The same parts with their blob ids removed, as a scan outside git writes them.
    for (const i of [1, 2]) {
      const file = path.join(repo.dir, 'parts', `part-${i}.json`);
      const partial = JSON.parse(readFileSync(file, 'utf8')) as { blobs?: unknown };
      expect(partial.blobs).toBeDefined();
      delete partial.blobs;
      writeFileSync(file, JSON.stringify(partial));
    }
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 64, baseSha: base, headSha: head }, inputs: { parts: 'parts/part-*.json' } });
    expect(run.code, run.stdout).toBe(0);
    expect(run.stdout).toContain('took 0 shard results from 2 parts; 8 left to measure here');
    expect(run.report.timing.cacheMisses).toBe(8);
  });
});

describe('the blob ids a part carries', () => {
  const part = (blobs: unknown): string => JSON.stringify({ format: PARTIAL_FORMAT, version: PARTIAL_VERSION, policy: 'newsroom', settingsId: 's', partition: { index: 1, count: 1 }, shardsInCorpus: 0, results: [], skipped: [], blobs });

  it('are git object ids (40 hex digits, or 64 in a SHA-256 repository) by shard path', () => {
    expect(partialFromJson(part({ 'data/a.jsonl': 'e69de29bb2d1d6434b8b29ae775ad8c2e48c5391' })).ok).toBe(true);
    expect(partialFromJson(part({ 'data/a.jsonl': '473a0f4c3be8a93681a267e3b1e9a7dcda1185436fe141f7749120a303721813' })).ok).toBe(true);
    expect(partialFromJson(part({ 'data/a.jsonl': 'E69DE29B' }))).toEqual({ ok: false, reason: '`blobs` holds no git blob id for data/a.jsonl' });
    expect(partialFromJson(part(['e69de29bb2d1d6434b8b29ae775ad8c2e48c5391']))).toEqual({ ok: false, reason: '`blobs` is not an object of paths and git blob ids' });
  });
});

describe('the Action as a scan job of a matrix (input `partition`)', () => {
  let api: FakeGitHub;
  beforeAll(async () => {
    api = await fakeGitHub();
  });
  afterAll(() => api.close());

  it('writes its part and judges nothing; the final job given all parts reports as a one-job run', async () => {
    const { repo, base, head } = pullRequestRepo();
    const pr = { number: 65, baseSha: base, headSha: head };
    const alone = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { comment: 'never' } });
    expect(alone.code, alone.stdout).toBe(0);

    mkdirSync(path.join(repo.dir, 'artifacts'), { recursive: true });
    // Each scan job on a runner of its own (RUNNER_TEMP holds the shard cache).
    const temps = [1, 2].map(() => mkdtempSync(path.join(tmpdir(), 'sluice-scan-job-')));
    let shards = 0;
    for (const i of [1, 2]) {
      const job = await runBundle({ repo, event: 'pull_request', api, pr, runnerTemp: temps[i - 1]!, inputs: { partition: `${i}/2` } });
      expect(job.code, job.stdout + job.stderr).toBe(0);
      expect(job.outputs['verdict']).toBe('');
      expect(job.summary).toContain(`## sluice: partition ${i}/2 scanned`);
      expect(job.summary).toMatch(new RegExp(`\\| newsroom \\| \\d+ of 8 \\| \\d+ \\| 0 \\| \`newsroom\\.part-${i}-of-2\\.json\` \\|`));
      const written = job.outputs['parts']!;
      expect(path.basename(written)).toBe(`newsroom.part-${i}-of-2.json`);
      const m = new RegExp(`partition ${i}/2: (\\d+) of 8 shards, \\d+ documents, 0 from cache`).exec(job.stdout);
      expect(m, job.stdout).not.toBeNull();
      shards += Number(m![1]);
      copyFileSync(written, path.join(repo.dir, 'artifacts', path.basename(written)));
    }
    expect(shards).toBe(8);
    // A scan job posts nothing: no comment, no summary of a verdict.
    expect(api.requests).toHaveLength(0);

    // Run again on the same runner's cache: the share is taken from it, nothing measured.
    const again = await runBundle({ repo, event: 'pull_request', api, pr, runnerTemp: temps[0]!, inputs: { partition: '1/2' } });
    expect(again.stdout).toMatch(/partition 1\/2: (\d+) of 8 shards, \d+ documents, \1 from cache/);

    const fanned = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { comment: 'never', parts: 'artifacts/*.json' } });
    expect(fanned.code, fanned.stdout).toBe(0);
    expect(fanned.stdout).toContain('took 8 shard results from 2 parts');
    expect(judged(fanned.report)).toEqual(judged(alone.report));
    expect(fanned.summary).toBe(alone.summary);
  });

  it('names the input when `partition` is not I/N, or comes with `parts`', async () => {
    const { repo, base, head } = pullRequestRepo();
    const pr = { number: 66, baseSha: base, headSha: head };
    for (const bad of ['0/2', '3/2', 'two', '1/0']) {
      const run = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { partition: bad } });
      expect(run.code, bad).not.toBe(0);
      expect(run.stdout, bad).toContain(`input \`partition\`: \`${bad}\` is not I/N with 1 ≤ I ≤ N`);
    }
    const both = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { partition: '1/2', parts: 'artifacts/*.json' } });
    expect(both.code).not.toBe(0);
    expect(both.stdout).toContain('inputs `partition` and `parts` go to different jobs');
  });
});
