// `sluice check --base REF`: the working tree's corpus judged and compared with a git commit,
// by the same core the Action uses on a pull request (the comparison JSON is the same).
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { fakeGitHub, newsroomRepo, policyYaml, runBundle, stories } from '../action/harness.js';
import { sluice } from './helpers.js';

/** A repository with a base commit on main and a branch that adds, edits and renames shards. */
function branchRepo(): ReturnType<typeof newsroomRepo> & { head: string } {
  const { repo, base } = newsroomRepo(3, policyYaml({ duplicates: true }));
  repo.git('checkout', '-q', '-b', 'desk/update');
  repo.write('data/hin/hin-new.jsonl', stories('hin', 10, 1700));
  repo.write('data/eng/eng-copy.jsonl', stories('eng', 10, 1));
  repo.write('data/eng/eng-002.jsonl', stories('eng', 12, 2));
  repo.git('mv', 'data/hin/hin-001.jsonl', 'data/hin/hin-renamed.jsonl');
  return { repo, base, head: repo.commit('Desk: new and re-filed stories') };
}

/** The comparison's JSON Schema, compiled strictly (schemas/comparison.schema.json, JSON Schema 2020-12). */
const validComparison = new Ajv2020({ strict: true, allowUnionTypes: true, allErrors: true }).compile(JSON.parse(readFileSync('schemas/comparison.schema.json', 'utf8')) as object);

const withoutTiming = (r: object): string => JSON.stringify({ ...r, timing: null }, (k, v: unknown) => (k === 'fromCache' ? undefined : v));

describe('sluice check --base', () => {
  it('compares the working tree with the base commit, as the Action compares a pull request', async () => {
    const { repo, base, head } = branchRepo();
    const out = mkdtempSync(path.join(tmpdir(), 'sluice-base-'));
    const files = { json: path.join(out, 'r.json'), md: path.join(out, 'r.md'), cmp: path.join(out, 'c.json') };
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--json', files.json, '--markdown', files.md, '--comparison-json', files.cmp, '--no-cache'], { cwd: repo.dir });
    expect(run.status, run.stderr).toBe(0);
    expect(run.stdout).toMatch(/Against base main \([0-9a-f]{7}\) {2}PASS → PASS/);
    expect(run.stdout).toContain('shards 6 → 8 (+2): 2 added, 1 modified, 1 renamed');
    expect(run.stdout).toMatch(/renamed +data\/hin\/hin-renamed\.jsonl {2}renamed from data\/hin\/hin-001\.jsonl, documents 10 → 10/);
    // Of the six base shards only eng-002's old version is read: the others, the renamed one too, have the head's blob.
    expect(run.stdout).toContain('1 of 6 base shards read from git; the others have the head\'s bytes and were measured once');
    // eng-copy.jsonl is a copy of eng-001.jsonl, which is already in the corpus.
    expect(run.stdout).toContain('duplicates the change adds against the rest: 10 exact, 0 near of 32 new documents');

    const comparison = JSON.parse(readFileSync(files.cmp, 'utf8')) as { base: { commit: string }; changes: Array<{ status: string; path: string; from?: string }> };
    expect(comparison.base.commit).toBe(base);
    expect(comparison.changes.map((c) => [c.status, c.path, c.from ?? ''])).toEqual([
      ['modified', 'data/eng/eng-002.jsonl', ''],
      ['added', 'data/eng/eng-copy.jsonl', ''],
      ['added', 'data/hin/hin-new.jsonl', ''],
      ['renamed', 'data/hin/hin-renamed.jsonl', 'data/hin/hin-001.jsonl'],
    ]);
    expect(readFileSync(files.md, 'utf8')).toContain('### Against base `main`');

    // The report is the working tree's, as a check without --base gives it.
    const plain = sluice(['check', 'policies/newsroom.yaml', '--no-cache'], { cwd: repo.dir, json: true });
    expect(withoutTiming(JSON.parse(readFileSync(files.json, 'utf8')) as object)).toBe(withoutTiming(plain.report!));

    // And the comparison is the one the Action writes for the same pull request.
    const api = await fakeGitHub();
    const action = await runBundle({ repo, event: 'pull_request', api, pr: { number: 71, baseSha: base, headSha: head }, inputs: { comment: 'never' } });
    await api.close();
    expect(action.code, action.stdout).toBe(0);
    const fromAction = JSON.parse(readFileSync(path.join(action.reportDir, 'newsroom.comparison.json'), 'utf8')) as { base: { label: string } };
    expect({ ...fromAction, base: { ...fromAction.base, label: 'main' } }).toEqual(comparison);
    // Both validate against the schema the README points to.
    for (const c of [comparison, fromAction]) expect(validComparison(c), JSON.stringify(validComparison.errors)).toBe(true);
  });

  it('fails the run (exit 1) on the working tree\'s verdict, whatever the base had', () => {
    const { repo } = newsroomRepo(2);
    repo.git('checkout', '-q', '-b', 'desk/english');
    for (let i = 0; i < 4; i++) repo.write(`data/eng/extra-${i}.jsonl`, stories('eng', 10, 300 + i));
    repo.commit('Desk: a batch of English');
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache'], { cwd: repo.dir });
    expect(run.status).toBe(1);
    expect(run.stdout).toMatch(/Against base main \([0-9a-f]{7}\) {2}PASS → FAIL/);
    expect(run.stdout).toMatch(/mix · hin: PASS → FAIL/);
    const quiet = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache', '--quiet'], { cwd: repo.dir });
    expect(quiet.status).toBe(1);
    expect(quiet.stdout).toMatch(/^FAIL: .* \(against base main: pass → fail\)\n$/);
  });

  it('says why it cannot compare: a ref that is no commit, a corpus outside git, options that need --base', () => {
    const { repo } = newsroomRepo(1);
    const noRef = sluice(['check', 'policies/newsroom.yaml', '--base', 'no-such-branch', '--no-cache'], { cwd: repo.dir });
    expect(noRef.status).toBe(2);
    expect(noRef.stderr).toContain('base `no-such-branch` is not a commit in this clone');

    // The same kind of corpus, outside any git work tree.
    const outside = mkdtempSync(path.join(tmpdir(), 'sluice-nogit-'));
    mkdirSync(path.join(outside, 'policies'));
    mkdirSync(path.join(outside, 'data', 'eng'), { recursive: true });
    writeFileSync(path.join(outside, 'policies', 'newsroom.yaml'), policyYaml());
    writeFileSync(path.join(outside, 'data', 'eng', 'eng-000.jsonl'), stories('eng', 10, 0));
    const noGit = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache'], { cwd: outside });
    expect(noGit.status).toBe(2);
    expect(noGit.stderr).toMatch(/--base main: the corpus of .*newsroom\.yaml .* is not in a git work tree/);

    const needsBase = sluice(['check', 'policies/newsroom.yaml', '--comparison-json', 'c.json'], { cwd: repo.dir });
    expect(needsBase.status).toBe(2);
    expect(needsBase.stderr).toContain('--comparison-json needs --base REF');
    const notScan = sluice(['scan', '--policy', 'policies/newsroom.yaml', '--partition', '1/1', '--out', 'p.json', '--base', 'main'], { cwd: repo.dir });
    expect(notScan.status).toBe(2);
    expect(notScan.stderr).toContain('--base, --comparison-json and --parts are options of `sluice check`, not of `sluice scan`');
  });
});

describe('sluice check --parts', () => {
  it('takes the scan jobs\' results instead of measuring, and compares with base as one run does', () => {
    const { repo } = branchRepo();
    for (const i of [1, 2]) {
      const scan = sluice(['scan', '--policy', 'policies/newsroom.yaml', '--partition', `${i}/2`, '--out', `part-${i}.json`, '--no-cache'], { cwd: repo.dir });
      expect(scan.status, scan.stderr).toBe(0);
    }
    const out = mkdtempSync(path.join(tmpdir(), 'sluice-parts-cli-'));
    const one = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache', '--comparison-json', path.join(out, 'one.json')], { cwd: repo.dir, json: true });
    const fanned = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache', '--parts', 'part-*.json', '--comparison-json', path.join(out, 'fanned.json')], { cwd: repo.dir, json: true });
    expect(fanned.status, fanned.stderr).toBe(one.status);
    expect(fanned.stderr).toContain('sluice newsroom: took 8 shard results from 2 parts');
    // Nothing at head measured: every head shard came from the parts (through the run's scratch cache).
    expect(fanned.report!.timing.cacheMisses).toBe(0);
    expect(withoutTiming(fanned.report!)).toBe(withoutTiming(one.report!));
    expect(readFileSync(path.join(out, 'fanned.json'), 'utf8')).toBe(readFileSync(path.join(out, 'one.json'), 'utf8'));
  });

  it('is refused by merge and scan, and says when no file matches', () => {
    const { repo } = newsroomRepo(1);
    const merge = sluice(['merge', 'p.json', '--policy', 'policies/newsroom.yaml', '--parts', 'p.json'], { cwd: repo.dir });
    expect(merge.status).toBe(2);
    expect(merge.stderr).toContain('merge takes the part files as its arguments');
    const none = sluice(['check', 'policies/newsroom.yaml', '--parts', 'artifacts/*.json', '--no-cache'], { cwd: repo.dir });
    expect(none.status).toBe(2);
    expect(none.stderr).toContain('--parts: no file matches `artifacts/*.json`');
  });
});

describe('rules.duplicates.max-added: the copies a change adds, not diluted by the corpus', () => {
  const withMaxAdded = (limit: number): string => policyYaml({ duplicates: true }).replace('max: 0.5 } }', `max: 0.5 }, max-added: ${limit} }`);

  it('fails a change whose new documents copy the corpus past the limit, though the corpus-wide rates pass', () => {
    const { repo } = newsroomRepo(3, withMaxAdded(0.3));
    repo.git('checkout', '-q', '-b', 'desk/update');
    repo.write('data/hin/hin-new.jsonl', stories('hin', 10, 1700));
    repo.write('data/eng/eng-copy.jsonl', stories('eng', 10, 1)); // a copy of eng-001.jsonl
    repo.write('data/eng/eng-002.jsonl', stories('eng', 12, 2));
    repo.commit('Desk: new stories and a re-filed English shard');
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache'], { cwd: repo.dir, json: true });
    expect(run.status).toBe(1);
    const added = run.report!.rules.find((r) => r.rule === 'duplicates' && r.scope === 'change')!;
    // 10 of the 32 documents in the added and modified shards are copies of eng-001.jsonl: 31.25 %.
    expect(added).toMatchObject({ verdict: 'fail', measured: 10 / 32, limit: 0.3 });
    expect(added.message).toBe('10 of the 32 documents the change adds are copies: 10 of the rest of the corpus (10 exact, 0 near), 0 of documents the change adds itself (0 exact, 0 near); 31.3 %; limit 30.0 %');
    expect(added.locations).toEqual([{ path: 'data/eng/eng-copy.jsonl', detail: 'of its 10 documents, 10 exact and 0 near copies of the rest of the corpus, 0 exact and 0 near repeats of documents the change adds' }]);
    // The corpus-wide exact rate (10 of 72 documents) is under its limit of 50 %.
    expect(run.report!.rules.find((r) => r.rule === 'duplicates' && r.scope === 'corpus' && r.message.includes('exact'))!.verdict).toBe('pass');
    expect(run.report!.headline).toBe('FAIL: 1 check at error severity failed: duplicates (change)');
    // It exists only at head, so it is not listed among the rules that changed against base.
    expect(run.stdout).toContain('no rule changed its verdict');
  });

  it('counts a shard that repeats its own stories, with no copy of the corpus at all', () => {
    const { repo } = newsroomRepo(3, withMaxAdded(0.3));
    repo.git('checkout', '-q', '-b', 'desk/scrape');
    // A scraper that fetched the same four new stories five times over, one shard, plus a clean one.
    const four = stories('eng', 4, 900);
    repo.write('data/eng/scrape-000.jsonl', four.repeat(5));
    repo.write('data/hin/hin-new.jsonl', stories('hin', 10, 1900));
    repo.commit('Desk: a scrape');
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache'], { cwd: repo.dir, json: true });
    expect(run.status).toBe(1);
    const added = run.report!.rules.find((r) => r.scope === 'change')!;
    // 16 of the 30 new documents repeat one of the four stories: 53.3 %.
    expect(added).toMatchObject({ verdict: 'fail', measured: 16 / 30 });
    expect(added.message).toContain('16 of the 30 documents the change adds are copies: 0 of the rest of the corpus (0 exact, 0 near), 16 of documents the change adds itself (16 exact, 0 near)');
    expect(run.stdout).toContain('duplicates the change adds against the rest: 0 exact, 0 near of 30 new documents; 16 exact, 0 near repeats within the change');
  });

  it('passes under a higher limit, and is listed as not judged without a base', () => {
    const { repo } = newsroomRepo(2, withMaxAdded(0.5));
    const plain = sluice(['check', 'policies/newsroom.yaml', '--no-cache'], { cwd: repo.dir, json: true });
    expect(plain.status).toBe(0);
    const rule = plain.report!.rules.find((r) => r.scope === 'change')!;
    expect(rule).toMatchObject({ rule: 'duplicates', verdict: 'unjudged', measured: null, limit: 0.5 });
    expect(rule.message).toContain('not judged: no change to judge');
    expect(plain.report!.headline).toContain('1 check not judged, with nothing to measure: duplicates (change)');
    repo.git('checkout', '-q', '-b', 'desk/more');
    repo.write('data/eng/eng-copy.jsonl', stories('eng', 10, 1));
    repo.write('data/hin/hin-new.jsonl', stories('hin', 10, 1800));
    repo.commit('Desk: more');
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache'], { cwd: repo.dir, json: true });
    expect(run.status, run.stderr).toBe(0);
    expect(run.report!.rules.find((r) => r.scope === 'change')).toMatchObject({ verdict: 'pass', measured: 0.5, limit: 0.5 });
  });
});

describe('sluice check --base on a corpus kept in Git LFS', () => {
  // A shard as Git LFS commits it: a pointer (Git LFS specification, "The Pointer") in the
  // commit, the bytes in the clone's LFS store at .git/lfs/objects/<aa>/<bb>/<oid>.
  function lfsRepo(withObject: boolean): ReturnType<typeof newsroomRepo>['repo'] {
    const { repo } = newsroomRepo(1);
    const shards = { 'data/eng/eng-lfs.jsonl': stories('eng', 10, 4242), 'data/hin/hin-lfs.jsonl': stories('hin', 10, 4343) };
    for (const [file, text] of Object.entries(shards)) {
      const oid = createHash('sha256').update(text).digest('hex');
      repo.write(file, `version https://git-lfs.github.com/spec/v1\noid sha256:${oid}\nsize ${Buffer.byteLength(text)}\n`);
      if (withObject) repo.write(`.git/lfs/objects/${oid.slice(0, 2)}/${oid.slice(2, 4)}/${oid}`, text);
    }
    repo.commit('Desk: two shards in LFS');
    // The working tree as an LFS checkout leaves it: the bytes, where the commit has the pointers.
    for (const [file, text] of Object.entries(shards)) repo.write(file, text);
    return repo;
  }

  it('reads a base shard that is an LFS pointer from the local LFS store', () => {
    const repo = lfsRepo(true);
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'HEAD', '--no-cache', '--comparison-json', 'cmp.json'], { cwd: repo.dir, json: true });
    expect(run.status, run.stdout + run.stderr).toBe(0);
    expect(run.stdout).not.toContain('Git LFS pointer');
    const cmp = JSON.parse(readFileSync(path.join(repo.dir, 'cmp.json'), 'utf8')) as { docs: { base: number; head: number }; verdict: { base: string } };
    // The same 40 documents on both sides: the base read the objects, not the pointers' three lines.
    expect(cmp.docs).toEqual({ base: 40, head: 40 });
    expect(cmp.verdict.base).toBe('pass');
  });

  it('says what a base pointer is when the clone lacks its object', () => {
    const repo = lfsRepo(false);
    const run = sluice(['check', 'policies/newsroom.yaml', '--base', 'HEAD', '--no-cache', '--comparison-json', 'cmp.json'], { cwd: repo.dir });
    expect(run.status).toBe(0);
    const cmp = JSON.parse(readFileSync(path.join(repo.dir, 'cmp.json'), 'utf8')) as { verdict: { base: string }; flipped: Array<{ rule: string; from: string; message: string }> };
    expect(cmp.verdict.base).toBe('fail');
    expect(cmp.flipped.find((f) => f.rule === 'input')).toMatchObject({ from: 'fail' });
  });
});
