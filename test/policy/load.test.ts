// loadPolicy adds to the pure parser only what needs the file system: reading
// the file, finding the default root (the nearest `.git` ancestor), and checking
// that the files the policy names exist.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { loadPolicy, nearestGitRoot, parsePolicyText, formatProblem } from '../../src/policy/index.js';

let base: string;

const POLICY = `version: 1
corpus: { include: "data/**/*.jsonl" }
languages: { hin: {}, eng: {} }
tokenizer: { file: tok/tokenizer.json }
rules:
  fertility:
    word-lists: { eng: lists/eng.txt }
`;

beforeAll(async () => {
  base = await mkdtemp(path.join(os.tmpdir(), 'sluice-policy-'));
});
afterAll(async () => {
  await rm(base, { recursive: true, force: true });
});

/** Writes files under a fresh directory and returns its path. */
async function tree(name: string, files: Record<string, string>): Promise<string> {
  const dir = path.join(base, name);
  for (const [rel, text] of Object.entries(files)) {
    await mkdir(path.dirname(path.join(dir, rel)), { recursive: true });
    await writeFile(path.join(dir, rel), text);
  }
  return dir;
}

describe('loadPolicy', () => {
  it('a missing policy file is a problem naming it', async () => {
    const r = await loadPolicy(path.join(base, 'nope.yaml'));
    expect(r.ok).toBe(false);
    expect(!r.ok && formatProblem(r.problems[0]!)).toBe(`${path.join(base, 'nope.yaml')}: cannot read the policy file: no such file`);
  });

  it('the default root is the nearest ancestor holding `.git`, and named files are found there', async () => {
    const repo = await tree('repo', {
      '.git/HEAD': 'ref: refs/heads/main\n',
      'policies/newsroom.yaml': POLICY,
      'tok/tokenizer.json': '{}',
      'lists/eng.txt': 'headline\n',
    });
    const r = await loadPolicy(path.join(repo, 'policies/newsroom.yaml'));
    if (!r.ok) throw new Error(r.problems.map(formatProblem).join('\n'));
    expect(r.policy.root).toBe(repo);
    expect(r.policy.tokenizer).toMatchObject({ kind: 'file', absPath: path.join(repo, 'tok/tokenizer.json'), format: 'tokenizer.json' });
    expect(r.policy.rules.fertility?.wordLists.eng?.absPath).toBe(path.join(repo, 'lists/eng.txt'));
  });

  it('a `.git` file (as in a worktree) marks the root too', async () => {
    const wt = await tree('worktree', { '.git': 'gitdir: /elsewhere\n', 'sub/dir/x.txt': '' });
    expect(await nearestGitRoot(path.join(wt, 'sub/dir'))).toBe(wt);
  });

  it('files the policy names must exist: each missing one is a problem at its key', async () => {
    const repo = await tree('missing', { '.git/HEAD': '', 'policies/newsroom.yaml': POLICY, 'lists/eng.txt/keep': '' });
    const r = await loadPolicy(path.join(repo, 'policies/newsroom.yaml'));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map((p) => [p.path, p.line, p.column])).toEqual([
      ['tokenizer.file', 4, 20],
      ['rules.fertility.word-lists.eng', 7, 24],
    ]);
    expect(r.problems[0]!.message).toContain('does not exist');
    expect(r.problems[1]!.message).toContain('is a directory');
  });

  it('the pure parser accepts the same policy without looking at the disk', () => {
    expect(parsePolicyText(POLICY, path.join(base, 'no-such-dir/newsroom.yaml')).ok).toBe(true);
  });

  it('a root given as an override wins over `root:`, and must be a directory', async () => {
    const repo = await tree('override', {
      'p.yaml': 'version: 1\nroot: nowhere\ncorpus: { include: x }\nlanguages: { eng: {} }\n',
      'corpus/.keep': '',
    });
    const bad = await loadPolicy(path.join(repo, 'p.yaml'));
    expect(!bad.ok && bad.problems.map((p) => [p.path, p.line, p.column])).toEqual([['root', 2, 7]]);
    const good = await loadPolicy(path.join(repo, 'p.yaml'), { root: path.join(repo, 'corpus') });
    expect(good.ok && good.policy.root).toBe(path.join(repo, 'corpus'));
    const missing = await loadPolicy(path.join(repo, 'p.yaml'), { root: path.join(repo, 'gone') });
    expect(!missing.ok && missing.problems[0]!.message).toContain('does not exist');
  });
});
