// Base against head: which shards a PR adds, changes, renames or deletes, and the
// duplicates it adds against the corpus already there.
import { describe, expect, it } from 'vitest';
import { shardChanges } from '../../src/judge/comparison.js';
import { fakeGitHub, newsroomRepo, policyYaml, runBundle, stories } from './harness.js';

describe('shard changes', () => {
  const base = new Map([['a.jsonl', 'k1'], ['b.jsonl', 'k2'], ['c.jsonl', 'k3'], ['d.jsonl', 'k4'], ['e.jsonl', 'k5']]);
  const head = new Map([['a.jsonl', 'k1'], ['b.jsonl', 'k2x'], ['c2.jsonl', 'k3'], ['d2.jsonl', 'k4x'], ['f.jsonl', 'k6'], ['g.jsonl', 'k1']]);

  it('names each kind of change, pairing renames by equal bytes and by git', () => {
    const changes = shardChanges(base, head, new Map([['d2.jsonl', 'd.jsonl']]));
    expect(changes.map((c) => [c.status, c.path, c.from ?? '', c.edited ?? ''])).toEqual([
      ['modified', 'b.jsonl', '', ''],
      ['renamed', 'c2.jsonl', 'c.jsonl', false],
      ['renamed', 'd2.jsonl', 'd.jsonl', true],
      ['deleted', 'e.jsonl', '', ''],
      ['added', 'f.jsonl', '', ''],
      // A copy of a shard that is still there is an addition, not a rename.
      ['added', 'g.jsonl', '', ''],
    ]);
  });
});

describe('duplicates a PR adds', () => {
  it('reports documents of new shards that copy the existing corpus', async () => {
    const api = await fakeGitHub();
    const { repo, base } = newsroomRepo(2, policyYaml({ duplicates: true }));
    // A re-scrape of an English shard already in the archive, under a new name.
    repo.write('data/eng/rescrape.jsonl', stories('eng', 10, 0));
    repo.write('data/hin/hin-fresh.jsonl', stories('hin', 10, 1500));
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 51, baseSha: base, headSha: repo.commit('Re-scrape') } });
    expect(run.code, run.stdout).toBe(0);
    expect(run.summary).toContain('| duplicates the change adds against the rest | | | 10 exact, 0 near of 20 new documents |');
    expect(run.summary).toMatch(/\| \[`data\/eng\/rescrape\.jsonl`\]\([^)]*\) \| 10 \| 10 \| 0 \|/);
    await api.close();
  });
});
