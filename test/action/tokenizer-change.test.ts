// A pull request that edits the tokenizer file: the base branch's version becomes
// the baseline, so fertility is compared across the change and `max-regression`
// is judged against the tokenizer the corpus had before.
import { describe, expect, it } from 'vitest';
import { fakeGitHub, newsroomRepo, policyYaml, runBundle } from './harness.js';

// A tiktoken-style rank file (base64 token + rank per line): the 256 single bytes, then,
// for each word, every prefix of " word" so that BPE can build it one byte at a time.
function rankFile(words: string[]): string {
  const tokens: Buffer[] = Array.from({ length: 256 }, (_, b) => Buffer.from([b]));
  const seen = new Set(tokens.map((t) => t.toString('latin1')));
  for (const w of words) {
    const bytes = Buffer.from(` ${w}`, 'utf8');
    for (let k = 2; k <= bytes.length; k++) {
      const t = bytes.subarray(0, k);
      if (!seen.has(t.toString('latin1'))) {
        seen.add(t.toString('latin1'));
        tokens.push(Buffer.from(t));
      }
    }
  }
  return `${tokens.map((t, rank) => `${t.toString('base64')} ${rank}`).join('\n')}\n`;
}

const POLICY = policyYaml({ extraRules: '  fertility: { max-regression: 0.03 }' }).replace(
  'rules:',
  'tokenizer: { file: tok/newsroom.tiktoken, format: tiktoken, pattern: gpt2 }\nrules:',
);
// Words of the harness's English stories (a sample: enough to change fertility a lot).
const COMMON = ['the', 'council', 'ward', 'market', 'river', 'new', 'road', 'school', 'water', 'story'];

describe('a pull request that changes the tokenizer file', () => {
  // On one thread, and on two: the workers are handed the policy with the base tokenizer in it
  // (a file written from git for this run), so they measure the baseline as this thread does.
  it.each([['1'], ['2']])('is compared with the base branch tokenizer and fails when fertility rises (workers: %s)', async (workers) => {
    const api = await fakeGitHub();
    const { repo } = newsroomRepo(2, POLICY);
    repo.write('tok/newsroom.tiktoken', rankFile(COMMON));
    const base = repo.commit('Tokenizer with merges for common words');
    // The PR drops every merge: each word costs as many tokens as it has bytes.
    repo.write('tok/newsroom.tiktoken', rankFile([]));
    const head = repo.commit('Tokenizer without merges');
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 61, baseSha: base, headSha: head }, inputs: { workers, cache: 'false' } });
    expect(run.code, run.stdout).toBe(1);
    const eng = (run.report as unknown as { languages: Record<string, { fertility: { tokenizer: string; fertility: number }; baseline: { tokenizer: string; fertility: number } }> }).languages.eng!;
    expect(eng.baseline.tokenizer).toMatch(/^tok\/newsroom\.tiktoken at /);
    expect(eng.fertility.fertility).toBeGreaterThan(eng.baseline.fertility);
    const failed = (run.report as unknown as { rules: Array<{ rule: string; verdict: string; scope: string }> }).rules.filter((r) => r.verdict === 'fail');
    expect(failed.map((r) => `${r.rule} ${r.scope}`)).toContain('fertility language:eng');
    await api.close();
  });

  it('leaves a policy alone when the tokenizer file did not change', async () => {
    const api = await fakeGitHub();
    const { repo } = newsroomRepo(2, POLICY);
    repo.write('tok/newsroom.tiktoken', rankFile(COMMON));
    const base = repo.commit('Tokenizer');
    repo.write('data/eng/eng-009.jsonl', '{"text": "the council met by the river", "lang": "en"}\n');
    const head = repo.commit('One more shard');
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 62, baseSha: base, headSha: head } });
    expect(run.code, run.stdout).toBe(0);
    expect((run.report as unknown as { languages: Record<string, { baseline?: unknown }> }).languages.eng!.baseline).toBeUndefined();
    await api.close();
  });
});
