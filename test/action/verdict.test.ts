// Exit status and outputs from the verdict under each `fail-on`, file annotations
// capped as GitHub caps them, and configuration errors that always fail the step.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { annotationLines, fakeGitHub, newsroomRepo, policyYaml, runBundle, stories, type FakeGitHub } from './harness.js';

/** A PR that adds four English shards to three and three: English goes to 70 % of words, 20 points off a 50 % target with 10 points tolerance. */
function skewingPr(mixSeverity: 'error' | 'warn'): { repo: ReturnType<typeof newsroomRepo>['repo']; pr: { number: number; baseSha: string; headSha: string } } {
  const { repo, base } = newsroomRepo(3, policyYaml({ mixSeverity }));
  for (let i = 0; i < 4; i++) repo.write(`data/eng/wire-${i}.jsonl`, stories('eng', 10, 500 + i));
  return { repo, pr: { number: 11, baseSha: base, headSha: repo.commit('Wire copy') } };
}

describe('exit status and outputs', () => {
  let api: FakeGitHub;
  beforeAll(async () => {
    api = await fakeGitHub();
  });
  afterAll(() => api.close());

  it('passes a PR within the policy', async () => {
    const { repo, base } = newsroomRepo(2);
    repo.write('data/hin/hin-009.jsonl', stories('hin', 10, 909));
    repo.write('data/eng/eng-009.jsonl', stories('eng', 10, 9));
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 10, baseSha: base, headSha: repo.commit('Balanced') } });
    expect(run.code, run.stdout).toBe(0);
    expect(run.outputs['verdict']).toBe('pass');
    expect(run.stdout).not.toContain('::error');
  });

  it('warns without failing under fail-on: error when only a warn-severity rule fails, and fails under fail-on: warn', async () => {
    const { repo, pr } = skewingPr('warn');
    const run = await runBundle({ repo, event: 'pull_request', api, pr });
    expect(run.code, run.stdout).toBe(0);
    expect(run.outputs['verdict']).toBe('warn');
    expect(run.outputs['warned-rules']).toBe('mix:hin,mix:eng');
    expect(run.outputs['failed-rules']).toBe('');
    expect(run.report.verdict).toBe('warn');

    const strict = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { 'fail-on': 'warn' } });
    expect(strict.code).toBe(1);
    expect(strict.stdout).toMatch(/^::error::sluice newsroom: PASS with warnings: mix \(hin\), mix \(eng\)$/m);
  });

  it('fails under fail-on: error when an error-severity rule fails, names the flipped rules, and never fails under fail-on: never', async () => {
    const { repo, pr } = skewingPr('error');
    const run = await runBundle({ repo, event: 'pull_request', api, pr });
    expect(run.code).toBe(1);
    expect(run.outputs['verdict']).toBe('fail');
    expect(run.outputs['failed-rules']).toBe('mix:hin,mix:eng');
    expect(run.stdout).toMatch(/^::error::sluice newsroom: FAIL/m);
    expect(run.summary).toContain('**Rules that changed:**');
    expect(run.summary).toMatch(/- ❌ mix · eng: pass → fail/);
    expect(run.summary).toMatch(/\| eng: share of words \| 50\.0 % \| 70\.0 % \| \+20\.0 pt \|/);

    const lenient = await runBundle({ repo, event: 'pull_request', api, pr, inputs: { 'fail-on': 'never' } });
    expect(lenient.code).toBe(0);
    expect(lenient.outputs['verdict']).toBe('fail');
  });

  it('annotates located findings on their files, at most 10 per kind per step, and counts the rest', async () => {
    const { repo, base } = newsroomRepo(2);
    // Three shards, each with 6 lines that are not JSON and 6 stories with a right-to-left override (U+202E): 36 located findings.
    for (let s = 0; s < 3; s++) {
      const good = stories('eng', 6, 700 + s).trimEnd().split('\n');
      const bidi = stories('eng', 6, 800 + s).trimEnd().split('\n').map((l) => l.replace('the', 'the \u202E'));
      const broken = Array.from({ length: 6 }, (_, i) => `{"text": "unterminated ${i}`);
      repo.write(`data/eng/feed-${s}.jsonl`, `${[...good, ...bidi, ...broken].join('\n')}\n`);
    }
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 12, baseSha: base, headSha: repo.commit('Feed import') } });
    expect(run.code).toBe(1);
    const errors = annotationLines(run.stdout, 'error');
    // GitHub shows 10 error annotations per step (FIELD-NOTES, GitHub docs); setFailed takes one of them.
    expect(errors).toHaveLength(10);
    const located = errors.filter((l) => l.includes('file='));
    expect(located).toHaveLength(9);
    // The runner's command format: properties escaped (`:` → %3A, `%` → %25), then the message.
    expect(located[0]).toMatch(/^::error title=sluice newsroom%3A (input|encoding),file=data\/eng\/feed-\d\.jsonl,line=\d+::/);
    // The rules list at most 10 locations each (input, encoding): 20 located findings, 9 shown.
    expect(run.stdout).toContain('sluice: 11 more error and 0 more warning findings are not annotated');
  });

  it('fails with the policy problem when the policy cannot be judged, whatever fail-on says', async () => {
    const { repo, base } = newsroomRepo(1, policyYaml().replace('tolerance: 0.1', 'tolerence: 0.1'));
    const run = await runBundle({ repo, event: 'pull_request', api, inputs: { 'fail-on': 'never' }, pr: { number: 13, baseSha: base, headSha: base } });
    expect(run.code).toBe(1);
    expect(run.stdout).toMatch(/^::error::sluice: .*newsroom\.yaml.*rules\.mix/m);
    expect(run.stdout).toContain('tolerance');
  });

  it('fails naming the input when an input has a value it does not take', async () => {
    const { repo, base } = newsroomRepo(1);
    const run = await runBundle({ repo, event: 'push', api, inputs: { 'fail-on': 'sometimes' }, pr: { number: 0, baseSha: base, headSha: base } });
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('::error::sluice: input `fail-on`: `sometimes` is not one of `error`, `warn`, `never`');
  });

  it('fails saying what to check out when the base commit is not in the clone', async () => {
    const { repo } = newsroomRepo(1);
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 14, baseSha: 'f'.repeat(40), headSha: repo.git('rev-parse', 'HEAD').trim() } });
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('fetch-depth: 0');
  });
});
