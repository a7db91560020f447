// Bad input gets a clear message naming the file, line or key, and loses no
// count: a typo'd policy, a missing field, no matching shards, a truncated .gz,
// a non-UTF-8 file declared UTF-8, a 50 MB single line, a binary file.
import { randomBytes } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import { REPO, corpus, ENGLISH, HINDI, policyYaml, sluice } from './helpers.js';

const lines = (n: number, text: string): string => Array.from({ length: n }, (_, i) => JSON.stringify({ text: `${text} (${i})` })).join('\n') + '\n';

describe('a policy that cannot be judged exits 2 with the file, line and key', () => {
  it('names a misspelt key and suggests the right one', () => {
    const root = corpus({ 'p.yaml': policyYaml().replace('tolerance', 'tolerence'), 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/p\.yaml:\d+:\d+: rules\.mix\.tolerence: .*did you mean `tolerance`/);
    expect(r.stdout).toBe('');
  });

  it('names a missing required field', () => {
    const root = corpus({ 'p.yaml': policyYaml().replace('  include: ["data/**/*"]\n', '  text: text\n'), 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/p\.yaml:\d+:\d+: corpus.*include/);
  });

  it('says so once, before reading, when Node.js runs without WebAssembly (--jitless)', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')], { env: { NODE_OPTIONS: '--jitless' } });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/without WebAssembly \(started with --jitless\?\)/);
    expect(r.stdout).toBe('');
  });

  it('says when no shard matched', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'other/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    // Line and column of the value in policyYaml(): `  include: ["data/**/*"]` is line 5.
    expect(r.stderr).toContain('p.yaml:5:12: corpus.include: no shards matched (data/**/*)');
  });

  it('stops on an evaluation line that is not an item, naming it, instead of checking for fewer items', () => {
    // The copy in the shard would be found if the item were read: with it dropped, the check passed.
    const item = 'Which ward of the district opened the first night school for bus drivers this winter, beside the old depot?';
    const rule = '  contamination: { eval: ["evals/*.jsonl"], ngram: 13, max-docs: 0 }\n';
    const evalLines = `${JSON.stringify({ text: item }).replace(/}$/, ',}')}\n${JSON.stringify({ id: 2 })}\n\n`;
    const root = corpus({ 'p.yaml': policyYaml(rule), 'data/a.jsonl': lines(3, `${ENGLISH} ${item}`), 'evals/q.jsonl': evalLines });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('evals/q.jsonl: 2 lines of this evaluation file are not an item the contamination check can use: line 1 (invalid-json: ');
    expect(r.stderr).toContain('line 2 (missing-text: ');
    expect(r.stdout).toBe('');
    // The same file without the broken lines: the copy is found (exit 1, the rule fails).
    writeFileSync(join(root, 'evals/q.jsonl'), `${JSON.stringify({ text: item })}\n`);
    expect(sluice(['check', join(root, 'p.yaml')]).status).toBe(1);
  });

  it('fails a corpus with no document, even when no rule limits rejected lines', () => {
    // Every line rejected and no rules.input.max-rejected: the other rules have nothing to judge.
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': `not json\n${JSON.stringify({ body: ENGLISH })}\n\n` });
    const r = sluice(['check', join(root, 'p.yaml'), '--json', join(root, 'r.json')]);
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('no documents: all 3 lines read are empty or rejected');
    const report = JSON.parse(readFileSync(join(root, 'r.json'), 'utf8'));
    expect(report.verdict).toBe('fail');
  });

  it('says where an encoding that lines cannot be split in is written', () => {
    const root = corpus({ 'p.yaml': policyYaml().replace('  include: ["data/**/*"]\n', '  include: ["data/**/*"]\n  encodings: { "data/*.txt": utf-16le }\n'), 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/p\.yaml:6:\d+: corpus\.encodings\["data\/\*\.txt"\]: encoding `utf-16le` does not keep ASCII bytes/);
  });

  it('says where the tokenizer is written when its file cannot be used', () => {
    const root = corpus({ 'p.yaml': policyYaml('tokenizer: { file: tok.json }\n'), 'tok.json': 'not a tokenizer\n', 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/p\.yaml:11:12: tokenizer: tok\.json: not valid JSON/);
  });

  it('says where the evaluation glob is written when it matches no file', () => {
    const rule = '  contamination: { eval: ["evals/*.jsonl"], ngram: 13, max-docs: 0 }\n';
    const root = corpus({ 'p.yaml': policyYaml(rule), 'data/a.jsonl': lines(3, ENGLISH), 'eval/a.jsonl': lines(2, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('p.yaml:11:26: rules.contamination.eval: (evals/*.jsonl) matched no evaluation files');
    expect(r.stdout).toBe('');
  });

  it('says when the policy file does not exist', () => {
    const r = sluice(['check', '/nonexistent/policy.yaml']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain('/nonexistent/policy.yaml');
  });
});

describe('broken shards are findings, and the scan goes on', () => {
  it('reports a truncated .gz with what was read before the break, and judges the rest', () => {
    const whole = gzipSync(Buffer.from(lines(2000, ENGLISH)));
    const root = corpus({
      'p.yaml': policyYaml(),
      'data/cut.jsonl.gz': whole.subarray(0, Math.floor(whole.length / 2)),
      'data/good.jsonl': lines(10, HINDI),
    });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache'], { json: true });
    expect(r.status).toBe(1);
    const rep = r.report!;
    const cut = rep.shards.find((s) => s.path === 'data/cut.jsonl.gz')!;
    expect(cut.broken?.message).toMatch(/unexpected end of file/i);
    expect(cut.docs).toBeGreaterThan(0);
    expect(cut.docs).toBeLessThan(2000);
    expect(cut.docs + cut.empty + cut.rejected).toBe(cut.lines);
    expect(rep.shards.find((s) => s.path === 'data/good.jsonl')!.docs).toBe(10);
    const input = rep.rules.find((o) => o.rule === 'input' && o.verdict === 'fail')!;
    expect(input.locations[0]!.path).toBe('data/cut.jsonl.gz');
    expect(r.stdout).toContain('data/cut.jsonl.gz');
  });

  it('rejects invalid UTF-8 lines with their line numbers, keeping the others', () => {
    const bad = Buffer.concat([Buffer.from(lines(2, ENGLISH)), Buffer.from('{"text": "caf'), Buffer.from([0xe9]), Buffer.from('"}\n'), Buffer.from(lines(2, ENGLISH))]);
    const root = corpus({ 'p.yaml': policyYaml(), 'data/latin1.jsonl': bad });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache'], { json: true });
    const s = r.report!.shards[0]!;
    expect(s).toMatchObject({ lines: 5, docs: 4, rejected: 1 });
    expect(s.rejections[0]).toMatchObject({ line: 3, reason: 'invalid-encoding' });
  });

  it('names where lines were rejected in the terminal and Markdown views, with no rule judging rejections', () => {
    const bad = Buffer.concat([Buffer.from(lines(2, ENGLISH)), Buffer.from('[1, 2]\n{"text": 5}\n'), Buffer.from(lines(2, HINDI)), Buffer.from('{"body": "x"}\n{"text": "cut\n')]);
    const root = corpus({ 'p.yaml': policyYaml(), 'data/mixed.jsonl': bad });
    const md = join(root, 'report.md');
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color', '--markdown', md]);
    expect(r.status).toBe(0);
    // The first three in the terminal, and how many more there are.
    expect(r.stdout).toContain('at data/mixed.jsonl:3  not-an-object: the line parses to an array, not an object');
    expect(r.stdout).toContain('at data/mixed.jsonl:4  non-string-text:');
    expect(r.stdout).toContain('at data/mixed.jsonl:7  missing-text:');
    expect(r.stdout).not.toContain('mixed.jsonl:8');
    expect(r.stdout).toContain('and 1 more rejected line');
    // All four in the Markdown.
    const markdown = readFileSync(md, 'utf8');
    for (const line of [3, 4, 7, 8]) expect(markdown).toContain(`- rejected: \`data/mixed.jsonl:${line}\``);
  });

  it('lists rejected lines once when a failing input rule already shows them', () => {
    const root = corpus({ 'p.yaml': policyYaml('  input: { max-rejected: 0 }\n'), 'data/a.jsonl': `${lines(3, ENGLISH)}[1]\n` });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color']);
    expect(r.status).toBe(1);
    expect(r.stdout.match(/data\/a\.jsonl:4/g)).toHaveLength(1);
  });

  it('rejects a 50 MB single line without losing the lines around it', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/.keep': '' });
    const big = Buffer.alloc(50 * 1024 * 1024, 0x61);
    writeFileSync(join(root, 'data', 'huge.jsonl'), Buffer.concat([Buffer.from(lines(1, ENGLISH)), Buffer.from('{"text": "'), big, Buffer.from('"}\n'), Buffer.from(lines(1, HINDI))]), { flag: 'w' });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache'], { json: true });
    const s = r.report!.shards[0]!;
    expect(s).toMatchObject({ lines: 3, docs: 2, rejected: 1 });
    expect(s.rejections[0]).toMatchObject({ line: 2, reason: 'line-too-long' });
    expect(r.report!.input.rejected.byReason).toEqual({ 'line-too-long': 1 });
  });

  it('counts a binary file matched by a glob as rejected lines, not documents', () => {
    const noise = randomBytes(64 * 1024);
    noise[100] = 0; // at least one NUL
    const root = corpus({ 'p.yaml': policyYaml(), 'data/blob.jsonl': noise, 'data/ok.jsonl': lines(4, ENGLISH), 'data/picture.png': noise });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache'], { json: true });
    const rep = r.report!;
    const blob = rep.shards.find((s) => s.path === 'data/blob.jsonl')!;
    expect(blob.docs).toBe(0);
    expect(blob.rejected).toBe(blob.lines - blob.empty);
    expect(blob.lines).toBeGreaterThan(0);
    // A file the globs match but no reader handles is listed, and the report says it is incomplete.
    expect(rep.input.skipped).toEqual([expect.objectContaining({ path: 'data/picture.png', reason: 'unsupported-format' })]);
    expect(rep.rules.find((o) => o.rule === 'input')!.verdict).toBe('fail');
  });
});

describe('the command line', () => {
  it('prints help and exits 0', () => {
    const r = sluice(['--help']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('sluice check');
  });

  it('exits 2 with no command at all, so a CI step that forgot it does not pass the gate', () => {
    const r = sluice([]);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('no command given');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('exits 2 on an unknown command, with a one-line reason', () => {
    const r = sluice(['chek']);
    expect(r.status).toBe(2);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('gives the same report from the cache as from a fresh scan', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(20, ENGLISH), 'data/b.jsonl': lines(20, HINDI) });
    const cacheDir = join(root, '.cache');
    const first = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cacheDir], { json: true }).report!;
    const second = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cacheDir], { json: true }).report!;
    expect(first.timing.cacheHits).toBe(0);
    expect(second.timing.cacheHits).toBe(2);
    const strip = (r: typeof first) => ({ ...r, timing: null, shards: r.shards.map((s) => ({ ...s, fromCache: null })) });
    expect(strip(second)).toEqual(strip(first));
  });
});

describe('a damaged cache entry', () => {
  it('is measured again instead of failing the duplicate join', async () => {
    const { readdirSync, readFileSync: read, writeFileSync: write } = await import('node:fs');
    const root = corpus({
      'p.yaml': policyYaml('  duplicates: { max-exact: 0.5 }\n'),
      'data/a.jsonl': lines(20, ENGLISH),
      'data/b.jsonl': lines(20, HINDI),
    });
    const cacheDir = join(root, '.cache');
    const first = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cacheDir], { json: true }).report!;
    const entry = join(cacheDir, readdirSync(cacheDir)[0]!);
    const stored = JSON.parse(read(entry, 'utf8'));
    // Flip bytes in the middle of the stored duplicate index.
    const blob = Buffer.from(stored.duplicateIndex, 'base64');
    const mid = Math.floor(blob.length / 2);
    blob[mid] = blob[mid]! ^ 0xff;
    write(entry, JSON.stringify({ ...stored, duplicateIndex: blob.toString('base64') }));
    const second = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cacheDir], { json: true });
    expect(second.status).toBe(0);
    expect(second.report!.timing).toMatchObject({ cacheHits: 1, cacheMisses: 1 });
    expect(second.report!.duplicates).toEqual(first.duplicates);
  });

  it('is measured again when a field is missing, its index is gone or its lines do not add up', async () => {
    const { readdirSync, readFileSync: read, writeFileSync: write } = await import('node:fs');
    const root = corpus({
      'p.yaml': policyYaml('  duplicates: { max-exact: 0.5 }\n'),
      'data/a.jsonl': lines(20, ENGLISH) + lines(20, ENGLISH),
      'data/b.jsonl': lines(20, HINDI),
    });
    const cacheDir = join(root, '.cache');
    const first = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cacheDir], { json: true }).report!;
    const damages: Array<(e: Record<string, unknown>) => void> = [
      (e) => delete e.languages,
      (e) => delete e.duplicateIndex,
      (e) => ((e.read as { lines: number }).lines = 999),
    ];
    for (const damage of damages) {
      for (const f of readdirSync(cacheDir)) {
        const stored = JSON.parse(read(join(cacheDir, f), 'utf8'));
        damage(stored);
        write(join(cacheDir, f), JSON.stringify(stored));
      }
      const again = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cacheDir], { json: true });
      expect(again.stderr).not.toContain('error');
      expect(again.report!.timing).toMatchObject({ cacheHits: 0, cacheMisses: 2 });
      expect(again.report!.input).toEqual(first.input);
      expect(again.report!.duplicates).toEqual(first.duplicates);
    }
  });
});

describe('output and cache paths', () => {
  it('are refused before the run when the report could not be written or would overwrite an input', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(3, ENGLISH) });
    const cases: Array<[string[], string]> = [
      [['--json', join(root, 'data')], `--json ${join(root, 'data')}: is a directory`],
      [['--markdown', '/nonexistent-dir/r.md'], '--markdown /nonexistent-dir/r.md: /nonexistent-dir does not exist'],
      [['--json', join(root, 'p.yaml')], 'is an input of this run; the report would overwrite it'],
      [['--cache-dir', join(root, 'p.yaml')], 'is a file, not a directory'],
    ];
    for (const [args, message] of cases) {
      const r = sluice(['check', join(root, 'p.yaml'), ...args]);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain(message);
      expect(r.stderr).not.toContain('internal error');
      expect(r.stdout).toBe(''); // refused before anything was measured
    }
    expect(readFileSync(join(root, 'p.yaml'), 'utf8')).toBe(policyYaml());
    // A shard, known only once the globs are listed: refused before it is read.
    const shard = join(root, 'data/a.jsonl');
    for (const args of [['check', join(root, 'p.yaml'), '--json', shard], ['scan', '--policy', join(root, 'p.yaml'), '--partition', '1/1', '--out', shard]]) {
      const r = sluice(args);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain(`${shard}: is the shard data/a.jsonl; the report would overwrite it`);
    }
    expect(readFileSync(shard, 'utf8')).toBe(lines(3, ENGLISH));
    const scan = sluice(['scan', '--policy', join(root, 'p.yaml'), '--partition', '1/1', '--out', join(root, 'data')]);
    expect(scan.status).toBe(2);
    expect(scan.stderr).toContain('--out');
  });

  it('a cache that cannot be written is said once, and the run still judges', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(3, ENGLISH), 'data/b.jsonl': lines(3, HINDI) });
    const r = sluice(['check', join(root, 'p.yaml'), '--cache-dir', '/dev/null/cache'], { json: true });
    expect(r.status).toBe(0);
    expect(r.stderr.match(/cannot write the cache in \/dev\/null\/cache/g)).toHaveLength(1);
    expect(r.report!.input.docs).toBe(6);
  });

  it('--workers far above the cores is capped at twice the cores, with a warning', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(3, ENGLISH), 'data/b.jsonl': lines(3, HINDI) });
    const r = sluice(['check', join(root, 'p.yaml'), '--workers', '1000', '--split-mb', '0'], { json: true });
    expect(r.status).toBe(0);
    expect(r.stderr).toContain(`--workers 1000: measuring on ${2 * availableParallelism()} threads`);
    expect(r.report!.input.docs).toBe(6);
  });

  it('a cache directory that cannot be made under /proc is said once, instead of the run hanging', () => {
    // Node 20's recursive mkdir retries such a path forever (its parent exists, and refuses it with ENOENT).
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml'), '--cache-dir', '/proc/sluice-cache-test'], { json: true });
    expect(r.status).toBe(0);
    expect(r.stderr).toContain('cannot write the cache in /proc/sluice-cache-test');
    expect(r.report!.input.docs).toBe(3);
  });

  it('two policies of one name get a report file each', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'q.yaml': policyYaml(), 'data/a.jsonl': lines(3, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml'), join(root, 'q.yaml'), '--json', join(root, 'r.json')]);
    expect(r.status).toBe(0);
    expect(JSON.parse(readFileSync(join(root, 'r.t.json'), 'utf8')).policy.name).toBe('t');
    expect(JSON.parse(readFileSync(join(root, 'r.t-2.json'), 'utf8')).policy.name).toBe('t');
  });
});

describe('a damaged partial result', () => {
  it('is refused by merge, naming the part file and what is wrong', async () => {
    const { readFileSync: read, writeFileSync: write } = await import('node:fs');
    const root = corpus({ 'p.yaml': policyYaml('  duplicates: { max-exact: 0.5 }\n'), 'data/a.jsonl': lines(20, ENGLISH), 'data/b.jsonl': lines(20, HINDI) });
    const part = join(root, 'part-1.json');
    expect(sluice(['scan', '--policy', join(root, 'p.yaml'), '--partition', '1/1', '--out', part, '--no-cache']).status).toBe(0);
    const good = read(part, 'utf8');
    const cases: Array<[(r: Record<string, unknown>) => void, string]> = [
      [(r) => delete r.languages, 'is damaged: `languages` is missing'],
      [(r) => ((r.read as { lines: number }).lines = 5000), 'is damaged: its lines do not add up'],
      [(r) => delete r.duplicateIndex, 'carries no duplicate index'],
    ];
    for (const [damage, message] of cases) {
      const p = JSON.parse(good);
      damage(p.results[0]);
      write(part, JSON.stringify(p));
      const r = sluice(['merge', part, '--policy', join(root, 'p.yaml')]);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain(part);
      expect(r.stderr).toContain(message);
      expect(r.stderr).not.toContain('internal error');
    }
  });
});

describe('a corpus of one shard and one line', () => {
  it('is counted in the singular: 1 document, 1 shard, 1 line', () => {
    const root = corpus({ 'p.yaml': policyYaml(), 'data/a.jsonl': lines(1, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color'], { json: true });
    expect(r.report?.input.lines).toBe(1);
    expect(r.stdout).toMatch(/^1 document, 1 shard, /m);
    expect(r.stdout).toContain('the one shard read to the end');
    expect(r.stdout).toMatch(/^Input: 1 line = 1 in 1 document \+ 0 empty \+ 0 rejected/m);
    expect(r.stdout).toContain(', 0 shards from cache');
  });

  it('with no rules but input, says that its one check holds', () => {
    const policy = 'version: 1\nroot: .\ncorpus:\n  include: ["data/**/*"]\nlanguages:\n  eng:\n';
    const root = corpus({ 'p.yaml': policy, 'data/a.jsonl': lines(1, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color'], { json: true });
    expect(r.status).toBe(0);
    expect(r.report?.rules.map((o) => o.rule)).toEqual(['input']);
    expect(r.stdout).toContain('PASS: the one judged check holds');
  });
});

describe('a check with nothing to measure is listed as not judged, never left out', () => {
  // Before, a listed language without documents dropped out of the script and fertility rules:
  // the headline counted fewer checks and nothing said that two of them had not been judged.
  const rules = '  script: { min-purity: 0.9, max-impure-docs: 0.02 }\n  fertility: { max: { eng: 2.5, hin: 3.5 } }\ntokenizer: { builtin: o200k_base }\n';

  it('a listed language with no documents: its script and fertility checks are unjudged, and the headline names them', () => {
    const root = corpus({ 'p.yaml': policyYaml(rules), 'data/a.jsonl': lines(4, ENGLISH) });
    const md = join(root, 'report.md');
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color', '--markdown', md], { json: true });
    expect(r.status).toBe(0);
    const hin = r.report!.rules.filter((o) => o.scope === 'language:hin' && o.rule !== 'mix');
    expect(hin.map((o) => [o.rule, o.verdict, o.measured])).toEqual([
      ['script', 'unjudged', null],
      ['fertility', 'unjudged', null],
    ]);
    expect(hin.every((o) => o.message === 'not judged: no hin documents')).toBe(true);
    // The English checks are judged as before.
    expect(r.report!.rules.filter((o) => o.scope === 'language:eng').map((o) => o.verdict)).toEqual(['pass', 'pass', 'pass']);
    const judged = r.report!.rules.length - 2;
    expect(r.report!.verdict).toBe('pass');
    expect(r.report!.headline).toBe(`PASS: all ${judged} judged checks hold; 2 checks not judged, with nothing to measure: script (hin), fertility (hin)`);
    expect(r.stdout).toMatch(/^-- +script +hin +– limit .*not judged: no hin documents$/m);
    expect(readFileSync(md, 'utf8')).toMatch(/^\| ⚪ \| script \| hin \| – \|.*\| not judged: no hin documents \|$/m);
    const validate = new Ajv2020({ strict: true, allErrors: true }).compile(JSON.parse(readFileSync(join(REPO, 'schemas/report.schema.json'), 'utf8')));
    validate(r.report);
    expect(validate.errors ?? []).toEqual([]);
  });

  it('on a sample, says the sample holds none of the language', () => {
    const root = corpus({ 'p.yaml': policyYaml(`${rules}sampling: { docs-per-shard: 2 }\n`), 'data/a.jsonl': lines(6, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color'], { json: true });
    expect(r.status).toBe(0);
    expect(r.report!.rules.filter((o) => o.verdict === 'unjudged').map((o) => `${o.rule}: ${o.message}`)).toEqual([
      'script: not judged: no hin documents in the sample',
      'fertility: not judged: no hin documents in the sample',
    ]);
  });

  it('an unjudged check beside a failing one: the failure decides the verdict, the headline names both', () => {
    const root = corpus({ 'p.yaml': policyYaml(rules.replace('eng: 2.5', 'eng: 0.5')), 'data/a.jsonl': lines(4, ENGLISH) });
    const r = sluice(['check', join(root, 'p.yaml'), '--no-cache', '--no-color'], { json: true });
    expect(r.status).toBe(1);
    expect(r.report!.headline).toBe('FAIL: 1 check at error severity failed: fertility (eng); 2 checks not judged, with nothing to measure: script (hin), fertility (hin)');
  });
});
