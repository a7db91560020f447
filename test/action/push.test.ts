// Outside a pull request (push, schedule, workflow_dispatch): the whole corpus is
// judged, the summary written, and no comment posted.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fakeGitHub, newsroomRepo, runBundle, type FakeGitHub } from './harness.js';

describe('a push to the default branch', () => {
  let api: FakeGitHub;
  beforeAll(async () => {
    api = await fakeGitHub();
  });
  afterAll(() => api.close());

  it('judges the whole corpus, writes the summary and calls no API', async () => {
    const { repo, base } = newsroomRepo(2);
    const run = await runBundle({ repo, event: 'push', api, pr: { number: 0, baseSha: base, headSha: base } });
    expect(run.code, run.stdout + run.stderr).toBe(0);
    expect(api.requests).toHaveLength(0);
    expect(run.summary).toContain('## ✅ sluice · newsroom: PASS');
    expect(run.summary).toContain('40 documents in 4 shards');
    expect(run.summary).not.toContain('Against base');
    expect(run.outputs['verdict']).toBe('pass');
    expect(run.report.timing.cacheMisses).toBe(4);
    // No cache service in this environment (no ACTIONS_CACHE_URL / ACTIONS_RESULTS_URL): skipped, not failed.
    expect(run.stdout).toContain('no GitHub cache service on this runner');
    expect(run.stdout).not.toContain('::warning');
  });
});
