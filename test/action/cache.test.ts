// Unchanged shards are not read again: results are cached by git blob id and
// shared by base and head. A PR touching 1 of 20 shards measures that one shard
// at head (and its base version only when the cache does not have it yet).
import { mkdtempSync, readdirSync, readFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { fakeGitHub, newsroomRepo, policyYaml, runBundle, stories } from './harness.js';

const SHARDS_PER_LANGUAGE = 10;

function baseReport(dir: string): { timing: { cacheHits: number; cacheMisses: number } } {
  return JSON.parse(readFileSync(path.join(dir, 'newsroom.base.json'), 'utf8')) as { timing: { cacheHits: number; cacheMisses: number } };
}

describe('the shard result cache', () => {
  it('reads only the changed shard when the cache is warm from the default branch', async () => {
    const api = await fakeGitHub();
    const runnerTemp = mkdtempSync(path.join(tmpdir(), 'sluice-temp-'));
    const { repo, base } = newsroomRepo(SHARDS_PER_LANGUAGE);

    // The push to main that came before the PR fills the cache.
    const push = await runBundle({ repo, event: 'push', api, runnerTemp, pr: { number: 0, baseSha: base, headSha: base } });
    expect(push.code).toBe(0);
    expect(push.report.timing.cacheMisses).toBe(2 * SHARDS_PER_LANGUAGE);

    repo.write('data/eng/eng-004.jsonl', stories('eng', 11, 4444));
    const head = repo.commit('Rewrite one shard');
    const pr = await runBundle({ repo, event: 'pull_request', api, runnerTemp, pr: { number: 41, baseSha: base, headSha: head } });
    expect(pr.code, pr.stdout).toBe(0);
    expect(pr.report.timing).toMatchObject({ cacheMisses: 1, cacheHits: 2 * SHARDS_PER_LANGUAGE - 1 });
    // The base commit was judged by the push: its report is reused as it was, nothing at base is measured again.
    expect(baseReport(pr.reportDir)).toEqual(push.report);
    expect(pr.stdout).toContain(`measured 1 of ${2 * SHARDS_PER_LANGUAGE} shards, ${2 * SHARDS_PER_LANGUAGE - 1} from cache; 0 base shards read from git`);
    // The cache holds the corpus at head, the one base version that differs, and the judged base commit's memo: nothing else.
    expect(readdirSync(path.join(runnerTemp, 'sluice-results'))).toHaveLength(2 * SHARDS_PER_LANGUAGE + 2);
    await api.close();
  });

  it('reads every head shard once and only the changed shard at base when the cache is cold', async () => {
    const api = await fakeGitHub();
    const { repo, base } = newsroomRepo(SHARDS_PER_LANGUAGE);
    repo.write('data/hin/hin-007.jsonl', stories('hin', 9, 7777));
    const head = repo.commit('Rewrite one Hindi shard');
    const pr = await runBundle({ repo, event: 'pull_request', api, pr: { number: 42, baseSha: base, headSha: head } });
    expect(pr.code).toBe(0);
    expect(pr.report.timing.cacheMisses).toBe(2 * SHARDS_PER_LANGUAGE);
    expect(baseReport(pr.reportDir).timing).toMatchObject({ cacheMisses: 1, cacheHits: 2 * SHARDS_PER_LANGUAGE - 1 });
    expect(pr.stdout).toContain('1 base shards read from git');
    await api.close();
  });

  it('keeps nothing between runs with cache: false, and still shares results between base and head', async () => {
    const api = await fakeGitHub();
    const runnerTemp = mkdtempSync(path.join(tmpdir(), 'sluice-temp-'));
    const { repo, base } = newsroomRepo(2, policyYaml());
    repo.write('data/eng/eng-001.jsonl', stories('eng', 10, 91));
    const head = repo.commit('One change');
    for (let i = 0; i < 2; i++) {
      const run = await runBundle({ repo, event: 'pull_request', api, runnerTemp, inputs: { cache: 'false' }, pr: { number: 43, baseSha: base, headSha: head } });
      expect(run.code).toBe(0);
      expect(run.report.timing.cacheMisses).toBe(4);
      expect(baseReport(run.reportDir).timing.cacheMisses).toBe(1);
    }
    expect(existsSync(path.join(runnerTemp, 'sluice-results'))).toBe(false);
    await api.close();
  });

  it('takes an uncommitted change in the working tree as head, not the committed bytes', async () => {
    const api = await fakeGitHub();
    const runnerTemp = mkdtempSync(path.join(tmpdir(), 'sluice-temp-'));
    const { repo, base } = newsroomRepo(2);
    await runBundle({ repo, event: 'push', api, runnerTemp, pr: { number: 0, baseSha: base, headSha: base } });
    // A workflow step rewrote a shard after checkout: its blob id in the index no longer names its bytes.
    repo.write('data/hin/hin-000.jsonl', stories('hin', 3, 3030));
    const run = await runBundle({ repo, event: 'push', api, runnerTemp, pr: { number: 0, baseSha: base, headSha: base } });
    expect(run.report.timing).toMatchObject({ cacheMisses: 1, cacheHits: 3 });
    expect(run.summary).toContain('33 documents in 4 shards');
    await api.close();
  });
});
