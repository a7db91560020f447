// The policy parser's promises: a valid policy becomes a typed Policy with its
// defaults filled in; anything wrong becomes a problem naming the line, column
// and key path, with a suggestion where one is near.
import { describe, expect, it } from 'vitest';
import path from 'node:path';
import { parsePolicyText, formatProblem } from '../../src/policy/index.js';
import type { Policy, PolicyProblem, PolicyResult } from '../../src/policy/types.js';

const FILE = 'policies/newsroom.yaml';

/** A minimal valid policy, extended per test. */
const BASE = `version: 1
corpus:
  include: "data/**/*.jsonl.gz"
languages:
  hin: { target: 0.4 }
  eng: { target: 0.6 }
`;

function ok(text: string): { policy: Policy; warnings: PolicyProblem[] } {
  const r = parsePolicyText(text, FILE, { defaultRoot: '/corpus' });
  if (!r.ok) throw new Error(`expected a valid policy, got:\n${r.problems.map(formatProblem).join('\n')}`);
  return r;
}

function problems(text: string): PolicyProblem[] {
  const r: PolicyResult = parsePolicyText(text, FILE, { defaultRoot: '/corpus' });
  if (r.ok) throw new Error('expected problems, the policy was accepted');
  return r.problems;
}

/** Returns the single problem at a key path. */
function at(list: PolicyProblem[], keyPath: string): PolicyProblem {
  const found = list.filter((p) => p.path === keyPath);
  if (found.length !== 1) throw new Error(`expected one problem at ${keyPath}, got:\n${list.map(formatProblem).join('\n')}`);
  return found[0]!;
}

describe('a valid policy', () => {
  it('becomes a typed Policy with defaults filled in', () => {
    const { policy, warnings } = ok(BASE);
    // The one warning: targets are set but no mix rule judges them.
    expect(warnings.map((w) => w.path)).toEqual(['languages']);
    expect(policy.version).toBe(1);
    expect(policy.name).toBe('newsroom'); // the file name without extension
    expect(policy.file).toBe(path.resolve(FILE));
    expect(policy.root).toBe(path.resolve('/corpus'));
    expect(policy.corpus).toEqual({
      include: ['data/**/*.jsonl.gz'], // a single string is accepted as a list of one
      exclude: [],
      text: 'text',
      encodings: [],
      maxLineBytes: 8 * 1024 * 1024,
    });
    expect(policy.detection).toEqual({ minChars: 20 });
    expect(policy.rules).toEqual({ input: { maxBrokenShards: 0 } }); // input is always judged
    expect(policy.severity).toEqual({});
    expect(policy.tokenizer).toBeUndefined();
    expect(policy.languages.map((l) => [l.key, l.iso6393, l.scripts, l.target])).toEqual([
      ['hin', 'hin', ['Devanagari'], 0.4],
      ['eng', 'eng', ['Latin'], 0.6],
    ]);
  });

  it('fills the defaults of each rule it lists', () => {
    const { policy } = ok(`${BASE}tokenizer: { builtin: o200k_base }
rules:
  mix: {}
  script: {}
  encoding: {}
  duplicates: { max-exact: 0.01 }
  contamination: { eval: "evals/*.jsonl" }
  fertility: { max: { hin: 2.2 } }
`);
    expect(policy.rules.mix).toEqual({ unit: 'tokens', tolerance: 0.03 }); // tokens: a tokenizer is set
    expect(policy.rules.script).toEqual({ minPurity: 0.9, maxImpureDocs: 0.02 });
    expect(policy.rules.encoding).toEqual({ maxAnomalousDocs: 0, forbid: ['replacement-char', 'control-chars', 'bidi-controls', 'mojibake'] });
    expect(policy.rules.duplicates).toEqual({ maxExact: 0.01, near: { threshold: 0.8, shingle: 5, hashes: 128 }, punctuation: 'keep' });
    // 13-grams: the overlap test of Brown et al. (2020), "Language Models are Few-Shot Learners", appendix C.
    expect(policy.rules.contamination).toEqual({ eval: ['evals/*.jsonl'], ngram: 13, maxDocs: 0 });
    expect(policy.rules.fertility).toEqual({ max: { hin: 2.2 }, maxContinued: {}, wordLists: {} });
    expect(policy.tokenizer).toEqual({ kind: 'builtin', name: 'o200k_base' });
  });

  it('counts the mix in words when no tokenizer is set', () => {
    expect(ok(`${BASE}rules: { mix: { tolerance: 0.05 } }\n`).policy.rules.mix).toEqual({ unit: 'words', tolerance: 0.05 });
  });

  it('resolves root against the policy directory, and a given root overrides it', () => {
    const text = `${BASE}root: ..\n`;
    expect(ok(text).policy.root).toBe(path.resolve(path.dirname(FILE), '..'));
    const r = parsePolicyText(text, FILE, { root: '/elsewhere' });
    expect(r.ok && r.policy.root).toBe(path.resolve('/elsewhere'));
  });

  it('infers a tokenizer file format from its name and resolves it against the root', () => {
    const { policy } = ok(`${BASE}root: .
tokenizer: { file: tok/tokenizer.json }
baseline: { file: tok/old.tiktoken, pattern: cl100k_base }
`);
    const root = path.resolve(path.dirname(FILE));
    expect(policy.tokenizer).toEqual({ kind: 'file', file: 'tok/tokenizer.json', absPath: path.join(root, 'tok/tokenizer.json'), format: 'tokenizer.json' });
    expect(policy.baseline).toEqual({ kind: 'file', file: 'tok/old.tiktoken', absPath: path.join(root, 'tok/old.tiktoken'), format: 'tiktoken', pattern: 'cl100k_base' });
  });

  it('reads sampling, severity and encodings', () => {
    const { policy } = ok(`${BASE}sampling: { fraction: 0.02 }
severity: { input: warn }
corpus:
  include: [a/*.txt]
  encodings: { "legacy/**/*.txt": windows-1256 }
`.replace(/^corpus:\n {2}include: "data\/\*\*\/\*\.jsonl\.gz"\n/m, ''));
    expect(policy.sampling).toEqual({ fraction: 0.02 });
    expect(policy.severity).toEqual({ input: 'warn' });
    expect(policy.corpus.encodings).toEqual([{ glob: 'legacy/**/*.txt', encoding: 'windows-1256' }]);
  });
});

describe('problems name the line, column and key path', () => {
  it('a typo in a key: the nearest valid key at that level is suggested', () => {
    const list = problems(`${BASE}rules:
  mix: { tolerence: 0.03 }
`);
    const p = at(list, 'rules.mix.tolerence');
    expect([p.line, p.column]).toEqual([8, 10]);
    expect(p.message).toContain('unknown key `tolerence`');
    expect(p.suggestion).toBe('did you mean `tolerance`?');
    expect(formatProblem(p)).toBe('policies/newsroom.yaml:8:10: rules.mix.tolerence: unknown key `tolerence` (did you mean `tolerance`?)');
  });

  it('a typo in a top-level key', () => {
    const p = at(problems(BASE.replace('languages:', 'languges:')), 'languges');
    expect([p.line, p.column]).toEqual([4, 1]);
    expect(p.suggestion).toBe('did you mean `languages`?');
  });

  it('camelCase keys point to their kebab-case spelling', () => {
    const p = at(problems(`${BASE}detection: { minChars: 10 }\n`), 'detection.minChars');
    expect(p.suggestion).toBe('did you mean `min-chars`?');
  });

  it('a key at the wrong level says where it belongs', () => {
    const p = at(problems(`${BASE}rules: { tolerance: 0.03 }\n`), 'rules.tolerance');
    expect(p.suggestion).toBe('`tolerance` belongs under `rules.mix`');
  });

  it('reports every problem, not only the first', () => {
    const list = problems(`${BASE}rules:
  mix: { tolerence: 0.03, unit: token }
  script: { min-purity: 1.5 }
severity: { scripts: warn }
`);
    expect(list.map((p) => p.path)).toEqual(['rules.mix.tolerence', 'rules.mix.unit', 'rules.script.min-purity', 'severity.scripts']);
    expect(at(list, 'rules.mix.unit').suggestion).toBe('did you mean `tokens`?');
    expect(at(list, 'severity.scripts').suggestion).toBe('did you mean `script`?');
  });

  it('wrong types say what was expected and what was found', () => {
    const list = problems(`version: 1
corpus:
  include: 42
  max-line-bytes: "8 MiB"
languages:
  hin: { target: "40%" }
  eng: { scripts: Latin }
rules: [mix]
`);
    expect(at(list, 'corpus.include').message).toBe('must be a string or a list, not the number 42');
    expect(at(list, 'corpus.max-line-bytes').message).toBe('must be a whole number, not the text `8 MiB`');
    const target = at(list, 'languages.hin.target');
    expect([target.line, target.column]).toEqual([6, 18]);
    expect(target.suggestion).toBe('write shares as fractions: `0.4`');
    expect(at(list, 'languages.eng.scripts').suggestion).toBe('write a list: `[Latin]`');
    expect(at(list, 'rules').message).toBe('must be a mapping, not a list');
  });

  it('a share written as a percentage is out of range, with a hint', () => {
    const p = at(problems(BASE.replace('target: 0.4', 'target: 40')), 'languages.hin.target');
    expect(p.message).toBe('must be ≤ 1, not 40');
    expect(p.suggestion).toContain('`0.4`');
  });

  it('missing required keys are named', () => {
    const list = problems('name: newsroom\n');
    expect(list.map((p) => p.path).sort()).toEqual(['corpus', 'languages', 'version']);
    expect(at(list, 'corpus').message).toBe('missing required key `corpus`');
    const inner = at(problems('version: 1\ncorpus: { text: body }\nlanguages: { eng: {} }\n'), 'corpus.include');
    expect([inner.line, inner.column]).toEqual([2, 1]); // at the mapping that lacks it
  });

  it('a key without a value is reported at the key', () => {
    const p = at(problems('version: 1\ncorpus:\n  include:\nlanguages: { eng: {} }\n'), 'corpus.include');
    expect([p.line, p.column]).toEqual([3, 3]);
    expect(p.message).toBe('must be a string or a list, not nothing');
  });

  it('a YAML syntax error has its line', () => {
    const list = problems('version: 1\ncorpus:\n  include: "data/*.jsonl\nlanguages: { eng: {} }\n');
    expect(list).toHaveLength(1);
    expect(list[0]!.message).toMatch(/^YAML syntax: /);
    expect(list[0]!.line).toBeGreaterThanOrEqual(3);
    const tabs = problems('version: 1\ncorpus:\n\tinclude: a\n');
    expect(tabs[0]!.line).toBe(3);
  });

  it('a duplicate key is a problem that names the first occurrence', () => {
    const list = problems(`${BASE}  hin: { target: 0.3 }\n`);
    const p = at(list, 'languages.hin');
    expect([p.line, p.column]).toEqual([7, 3]);
    expect(p.message).toContain('first set on line 5');
  });

  it('an empty file or a non-mapping is a problem', () => {
    expect(problems('')[0]!.message).toContain('empty');
    expect(problems('# only a comment\n')[0]!.message).toContain('empty');
    expect(problems('- a\n- b\n')[0]!.message).toContain('must be a mapping');
  });

  it('version 2 means a newer sluice, and nothing else is judged', () => {
    const list = problems('version: 2\nsomething-new: true\n');
    expect(list).toHaveLength(1);
    expect(list[0]).toMatchObject({ path: 'version', line: 1, column: 10 });
    expect(list[0]!.message).toContain('written for a newer sluice');
    expect(at(problems(BASE.replace('version: 1', 'version: 0')), 'version').message).toBe('must be 1, not the number 0');
    expect(at(problems(BASE.replace('version: 1', 'version: "1"')), 'version').suggestion).toBe('write it without quotes: `1`');
  });
});

describe('languages', () => {
  it('`other` and `und` are reserved', () => {
    const list = problems(`${BASE}  other: {}\n  und: {}\n`);
    expect(at(list, 'languages.other').message).toContain('reserved');
    expect(at(list, 'languages.und').message).toContain('reserved');
  });

  it('an unknown script gets a suggestion; Common is refused', () => {
    const list = problems(`${BASE}  mar: { scripts: [Devanagri, Zyyy] }\n`);
    const p = at(list, 'languages.mar.scripts[0]');
    expect([p.line, p.column]).toEqual([7, 20]);
    expect(p.suggestion).toBe('did you mean `Devanagari`?');
    expect(at(list, 'languages.mar.scripts[1]').message).toContain('Common');
  });

  it('ISO 15924 codes and loose spellings normalize to Unicode long names', () => {
    const { policy } = ok(`version: 1
corpus: { include: x }
languages:
  hi: { scripts: [Deva] }
  ja: { scripts: [Jpan] }
  it: { scripts: [old italic, latn] }
`);
    expect(policy.languages.map((l) => l.scripts)).toEqual([['Devanagari'], ['Han', 'Hiragana', 'Katakana'], ['Old_Italic', 'Latin']]);
  });

  it('a BCP 47 script subtag sets the scripts', () => {
    const { policy } = ok('version: 1\ncorpus: { include: x }\nlanguages: { sr-Latn: {} }\n');
    expect(policy.languages[0]).toMatchObject({ key: 'sr-Latn', iso6393: 'srp', scripts: ['Latin'] });
  });

  it('a language entry with nothing after the colon takes the defaults', () => {
    const { policy } = ok('version: 1\ncorpus: { include: x }\nlanguages:\n  hin:\n  eng:\n');
    expect(policy.languages.map((l) => [l.key, l.scripts])).toEqual([['hin', ['Devanagari']], ['eng', ['Latin']]]);
    expect(at(problems('version: 1\ncorpus: { include: x }\nlanguages:\n  eng: 0.6\n'), 'languages.eng').suggestion).toBe('write `eng: { target: 0.6 }`');
  });

  it('a language without a default script asks for `scripts`', () => {
    const p = at(problems(`${BASE}  srp: {}\n`), 'languages.srp');
    expect(p.message).toContain('`scripts:');
  });

  it('two keys for the same or overlapping languages are a problem', () => {
    expect(at(problems(`${BASE}  hi: {}\n`), 'languages.hi').message).toContain('same language (`hin`)');
    const p = at(problems('version: 1\ncorpus: { include: x }\nlanguages: { ar: {}, arb: {} }\n'), 'languages.arb');
    expect(p.message).toContain('both cover `arb`');
  });

  it('targets summing above 1 are a problem that gives the sum', () => {
    const p = at(problems(BASE.replace('target: 0.6', 'target: 0.7')), 'languages');
    expect(p.message).toContain('targets sum to 1.1');
    // 0.1 + 0.2 + 0.7 is 1.0000000000000002 in floating point: within the allowance.
    ok('version: 1\ncorpus: { include: x }\nlanguages: { hin: { target: 0.1 }, eng: { target: 0.2 }, fra: { target: 0.7 } }\n');
  });
});

describe('rules', () => {
  it('a mix rule needs a target', () => {
    const p = at(problems('version: 1\ncorpus: { include: x }\nlanguages: { eng: {} }\nrules: { mix: {} }\n'), 'rules.mix');
    expect(p.message).toContain('needs a `target`');
  });

  it('`tokens` needs a tokenizer', () => {
    const p = at(problems(`${BASE}rules: { mix: { unit: tokens } }\n`), 'rules.mix.unit');
    expect(p.message).toContain('needs a `tokenizer`');
  });

  it('fertility needs a tokenizer, and its keys must be policy language keys', () => {
    const list = problems(`${BASE}rules:
  fertility:
    max: { hi: 2.2, eng: 1.3 }
    word-lists: { fra: lists/fr.txt }
`);
    expect(at(list, 'rules.fertility').message).toContain('no `tokenizer`');
    const hi = at(list, 'rules.fertility.max.hi');
    expect([hi.line, hi.column]).toEqual([9, 12]);
    expect(hi.suggestion).toBe('did you mean `hin`?'); // `hi` is Hindi, written `hin` in this policy
    expect(at(list, 'rules.fertility.word-lists.fra').message).toContain('not a language of this policy');
  });

  it('near-duplicate and contamination settings stay in range', () => {
    const list = problems(`${BASE}rules:
  duplicates: { near: { threshold: 1, shingle: 0, hashes: 8 } }
  contamination: { eval: [], ngram: 0, max-docs: 0.5 }
`);
    expect(at(list, 'rules.duplicates.near.threshold').message).toBe('must be < 1, not 1');
    expect(at(list, 'rules.duplicates.near.shingle').message).toBe('must be ≥ 1, not 0');
    expect(at(list, 'rules.duplicates.near.hashes').message).toBe('must be ≥ 16, not 8');
    expect(at(list, 'rules.contamination.eval').message).toBe('must not be an empty list');
    expect(at(list, 'rules.contamination.ngram').message).toBe('must be ≥ 1, not 0');
    expect(at(list, 'rules.contamination.max-docs').message).toBe('must be a whole number, not the number 0.5');
  });

  it('severity keys are rule names with error or warn', () => {
    const list = problems(`${BASE}severity: { mixx: warn, input: warning }\n`);
    expect(at(list, 'severity.mixx').suggestion).toBe('did you mean `mix`?');
    expect(at(list, 'severity.input').suggestion).toBe('did you mean `warn`?');
  });
});

describe('corpus', () => {
  it('encoding names are checked with iconv-lite', () => {
    const p = at(
      problems(BASE.replace('include: "data/**/*.jsonl.gz"', 'include: x\n  encodings: { "legacy/*.txt": windows-1265 }')),
      'corpus.encodings["legacy/*.txt"]',
    );
    expect(p.message).toContain('unknown encoding `windows-1265`');
    expect(p.suggestion).toBe('did you mean `windows1256`?');
  });

  it('subset needs exactly one placeholder; globs stay inside the root', () => {
    const list = problems(BASE.replace('include: "data/**/*.jsonl.gz"', 'include: [/data/*.gz, ../x/*.gz, ""]\n  subset: "data/{subset}/{subset}"'));
    expect(at(list, 'corpus.subset').message).toContain('exactly once');
    expect(at(list, 'corpus.include[0]').message).toContain('absolute');
    expect(at(list, 'corpus.include[1]').message).toContain('leaves the root');
    expect(at(list, 'corpus.include[2]').message).toBe('must not be empty');
  });

  it('tokenizer alternatives are exclusive, and tiktoken ranks need a pattern', () => {
    const list = problems(`${BASE}tokenizer: { builtin: gpt2, file: t.json }
baseline: { file: ranks.tiktoken }
sampling: { docs-per-shard: 10, fraction: 0.1 }
`);
    expect(at(list, 'tokenizer.file').message).toBe('set either `builtin` or `file`, not both');
    expect(at(list, 'baseline.file').message).toContain('set `pattern`');
    expect(at(list, 'sampling.fraction').message).toBe('set either `docs-per-shard` or `fraction`, not both');
    expect(at(problems(`${BASE}tokenizer: {}\n`), 'tokenizer').message).toBe('must not be empty; set `builtin` or `file`');
  });
});

describe('warnings for settings that parse but are dubious', () => {
  it('targets that cannot add up with max-other, and a loose tolerance', () => {
    const { warnings } = ok(`version: 1
corpus: { include: x }
languages: { hin: { target: 0.3 }, eng: { target: 0.4 } }
rules: { mix: { max-other: 0.02, max-und: 0.05, tolerance: 0.03 } }
`);
    expect(warnings.map((w) => w.path)).toEqual(['rules.mix.max-other']);
    expect(warnings[0]!.message).toContain('targets sum to 0.7');
    expect(warnings[0]!.message).toContain('cannot pass');
    const loose = ok(`${BASE}rules: { mix: { tolerance: 0.5 } }\n`).warnings;
    expect(loose.map((w) => w.path)).toEqual(['rules.mix.tolerance']);
  });

  it('targets with no mix rule, and a severity for a rule not configured', () => {
    const { warnings } = ok(`${BASE}severity: { script: warn }\n`);
    expect(warnings.map((w) => w.path)).toEqual(['languages', 'severity.script']);
  });
});

describe('formatProblem', () => {
  it('writes file:line:col: path: message (suggestion), leaving out what is unknown', () => {
    expect(formatProblem({ file: 'p.yaml', line: 3, column: 7, path: 'rules.mix', message: 'bad', suggestion: 'did you mean `x`?' })).toBe(
      'p.yaml:3:7: rules.mix: bad (did you mean `x`?)',
    );
    expect(formatProblem({ file: 'p.yaml', path: '', message: 'cannot read the policy file: no such file' })).toBe(
      'p.yaml: cannot read the policy file: no such file',
    );
  });
});
