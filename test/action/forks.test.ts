// A pull request from a fork: the workflow token is read-only and commenting
// answers 403 (GitHub docs, "Automatic token authentication", permissions for
// forked repositories). The run still judges, warns once and writes the summary;
// the exit status follows the verdict, not the 403.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { annotationLines, fakeGitHub, newsroomRepo, policyYaml, runBundle, stories, type FakeGitHub } from './harness.js';

describe('a token that cannot comment', () => {
  let api: FakeGitHub;
  beforeAll(async () => {
    api = await fakeGitHub();
    api.denyWrites = 403;
  });
  afterAll(() => api.close());

  it('judges, warns once, writes the summary and exits 0 on a pass', async () => {
    const { repo, base } = newsroomRepo(2);
    repo.write('data/eng/eng-001.jsonl', stories('eng', 10, 31));
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 21, baseSha: base, headSha: repo.commit('From a fork') } });
    expect(run.code, run.stderr).toBe(0);
    expect(api.requests.map((r) => r.method)).toEqual(['GET', 'POST']);
    const warnings = annotationLines(run.stdout, 'warning');
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatch(/could not comment on pull request #21 \(403: .*fork/);
    expect(run.summary).toContain('## ✅ sluice · newsroom: PASS');
    expect(run.outputs['verdict']).toBe('pass');
  });

  it('exits 1 on a failing verdict, from the verdict', async () => {
    const { repo, base } = newsroomRepo(1, policyYaml());
    for (let i = 0; i < 4; i++) repo.write(`data/eng/fork-${i}.jsonl`, stories('eng', 10, 40 + i));
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 22, baseSha: base, headSha: repo.commit('Skewed fork') } });
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(/^::error::sluice newsroom: FAIL/m);
    expect(annotationLines(run.stdout, 'warning').filter((l) => l.includes('could not comment'))).toHaveLength(1);
    expect(run.summary).toContain('FAIL');
  });
});
