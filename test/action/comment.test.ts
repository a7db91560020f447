// The PR comment: one per policy, created once and edited in place; its content
// leads with the verdict, then what changed against base. Run against the built
// bundle with the runner's environment contract and a stand-in REST API.
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fakeGitHub, newsroomRepo, runBundle, stories, type FakeGitHub, type Repo, type RunResult } from './harness.js';

describe('the pull request comment', () => {
  let api: FakeGitHub;
  let repo: Repo;
  let base: string;
  let first: RunResult;
  let head: string;

  beforeAll(async () => {
    api = await fakeGitHub();
    ({ repo, base } = newsroomRepo(3));
    // The PR: one English shard rewritten, one Hindi shard added, one renamed.
    repo.write('data/eng/eng-001.jsonl', stories('eng', 12, 77));
    repo.write('data/hin/hin-new.jsonl', stories('hin', 10, 2000));
    repo.git('mv', 'data/eng/eng-002.jsonl', 'data/eng/eng-moved.jsonl');
    head = repo.commit('Desk update');
    first = await runBundle({ repo, event: 'pull_request', api, pr: { number: 7, baseSha: base, headSha: head } });
  });
  afterAll(() => api.close());

  it('posts one comment that leads with the verdict, then the comparison against base', () => {
    expect(first.code, first.stdout + first.stderr).toBe(0);
    const posts = api.requests.filter((r) => r.method === 'POST');
    expect(posts).toHaveLength(1);
    expect(posts[0]!.url).toBe('/repos/sangam/newsroom-corpus/issues/7/comments');
    // @actions/github sends the token as `token <value>`.
    expect(posts[0]!.authorization).toBe('token test-token');
    const body = api.comments[0]!.body;
    const lines = body.split('\n');
    expect(lines[0]).toBe('<!-- sluice:comment policy=newsroom -->');
    expect(lines[1]).toMatch(/^## ✅ sluice · newsroom: PASS$/);
    const against = body.indexOf('### Against base `main`');
    expect(against).toBeGreaterThan(body.indexOf('| ✅ | mix |'));
    expect(against).toBeLessThan(body.indexOf('<details open><summary>Language mix'));
    expect(body).toContain('| shards | 6 | 7 | 1 added, 1 modified, 1 renamed |');
    expect(body).toContain('| documents | 60 | 72 | +12 |');
    expect(body).toMatch(/\| renamed from `data\/eng\/eng-002\.jsonl` \| \[`data\/eng\/eng-moved\.jsonl`\]\(https:\/\/github\.invalid\/sangam\/newsroom-corpus\/blob\/[0-9a-f]{40}\/data\/eng\/eng-moved\.jsonl\) \| 10 \| 10 \|/);
    // Links point at the PR's head commit, not at the merge commit the runner checked out.
    expect(body).toContain(`/blob/${head}/data/eng/eng-001.jsonl`);
    // Mix shift per language, in points: Hindi 30/60 docs → 40/72 (word counts per story are fixed at 42).
    expect(body).toMatch(/\| hin: share of words \| 50\.0 % \| 55\.\d % \| \+5\.\d pt \|/);
  });

  it('writes the same content to the job summary, and the outputs', () => {
    expect(first.summary).toContain('## ✅ sluice · newsroom: PASS');
    expect(first.summary).toContain('### Against base `main`');
    expect(first.outputs['verdict']).toBe('pass');
    expect(first.outputs['failed-rules']).toBe('');
    expect(first.outputs['report']).toMatch(/newsroom\.json$/);
    const report = JSON.parse(readFileSync(first.outputs['report']!, 'utf8')) as { verdict: string; shards: unknown[] };
    expect(report.verdict).toBe('pass');
    expect(report.shards).toHaveLength(7);
    const comparison = JSON.parse(readFileSync(first.outputs['report']!.replace(/\.json$/, '.comparison.json'), 'utf8')) as { changes: Array<{ status: string; path: string }> };
    expect(comparison.changes.map((c) => `${c.status} ${c.path}`)).toEqual(['modified data/eng/eng-001.jsonl', 'renamed data/eng/eng-moved.jsonl', 'added data/hin/hin-new.jsonl']);
  });

  it('edits that comment on the next push instead of adding one, and leaves it alone when nothing changed', async () => {
    const id = api.comments[0]!.id;
    repo.write('data/eng/eng-000.jsonl', stories('eng', 14, 78));
    const second = repo.commit('Desk update, take two');
    const before = api.requests.length;
    const run2 = await runBundle({ repo, event: 'pull_request', api, pr: { number: 7, baseSha: base, headSha: second } });
    expect(run2.code, run2.stdout).toBe(0);
    const sent = api.requests.slice(before);
    expect(sent.map((r) => r.method)).toEqual(['GET', 'PATCH']);
    expect(sent[1]!.url).toBe(`/repos/sangam/newsroom-corpus/issues/comments/${id}`);
    expect(api.comments).toHaveLength(1);
    expect(api.comments[0]!.body).toContain(`/blob/${second}/`);
    expect(api.comments[0]!.body).toContain('2 modified');

    const before3 = api.requests.length;
    const run3 = await runBundle({ repo, event: 'pull_request', api, pr: { number: 7, baseSha: base, headSha: second } });
    expect(run3.code).toBe(0);
    expect(api.requests.slice(before3).map((r) => r.method)).toEqual(['GET']);
  });

  it('finds its comment by the marker, not by its author', async () => {
    const other = await fakeGitHub();
    // A comment a person wrote, and one from an earlier sluice run posted under another account.
    other.comments.push({ id: 1, body: 'Looks good to me', user: { type: 'User' } });
    other.comments.push({ id: 2, body: '<!-- sluice:comment policy=newsroom -->\nold', user: { type: 'User' } });
    const run = await runBundle({ repo, event: 'pull_request', api: other, pr: { number: 7, baseSha: base, headSha: head } });
    expect(run.code).toBe(0);
    expect(other.requests.map((r) => `${r.method} ${r.url}`)).toEqual([
      'GET /repos/sangam/newsroom-corpus/issues/7/comments?per_page=100',
      'PATCH /repos/sangam/newsroom-corpus/issues/comments/2',
    ]);
    expect(other.comments[0]!.body).toBe('Looks good to me');
    await other.close();
  });

  it('posts nothing for a passing PR that changes no shard under comment: on-change, and always posts under comment: always', async () => {
    const quiet = await fakeGitHub();
    const { repo: r2, base: b2 } = newsroomRepo(1);
    r2.write('README.md', 'Notes from the desk.\n');
    const h2 = r2.commit('Docs only');
    const onChange = await runBundle({ repo: r2, event: 'pull_request', api: quiet, pr: { number: 9, baseSha: b2, headSha: h2 } });
    expect(onChange.code).toBe(0);
    expect(quiet.requests.map((r) => r.method)).toEqual(['GET']);
    expect(onChange.summary).toContain('| no shard changed |');
    const always = await runBundle({ repo: r2, event: 'pull_request', api: quiet, inputs: { comment: 'always' }, pr: { number: 9, baseSha: b2, headSha: h2 } });
    expect(always.code).toBe(0);
    expect(quiet.requests.map((r) => r.method)).toEqual(['GET', 'GET', 'POST']);
    const never = await runBundle({ repo: r2, event: 'pull_request', api: quiet, inputs: { comment: 'never' }, pr: { number: 9, baseSha: b2, headSha: h2 } });
    expect(never.code).toBe(0);
    expect(quiet.requests).toHaveLength(3);
    await quiet.close();
  });
});
