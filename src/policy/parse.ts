// Policy text → typed Policy or the full list of problems, without touching the
// file system (loadPolicy adds the reads). Order of checks: YAML syntax, then the
// version (a newer format is not judged by older rules), then the schema and the
// semantic checks together, so one run reports everything that is wrong.
import path from 'node:path';
import type { Policy, PolicyProblem, PolicyResult } from './types.js';
import { formatPath, type KeyPath } from './format.js';
import { readPolicyYaml, type PolicyDocument, type Position } from './yaml-doc.js';
import { checkAgainstSchema, kindOf } from './schema-check.js';
import { buildPolicy, type FileReference } from './build.js';

/** The policy format this sluice reads. */
export const POLICY_VERSION = 1;

/** Settings for parsePolicyText that come from outside the policy text. */
export interface ParseOptions {
  /** Root directory that overrides the policy's `root:` key (e.g. from the command line); relative to the working directory. */
  root?: string;
  /** Root to use when neither `root` nor the policy's `root:` key sets one. loadPolicy passes the nearest `.git` ancestor. Default: the policy file's directory. */
  defaultRoot?: string;
}

/** A parse result with what loadPolicy needs for its file checks. */
export interface DetailedParse {
  result: PolicyResult;
  /** Files the policy names (tokenizers, word lists), with their positions; empty when parsing failed. */
  files: (FileReference & { position: Position })[];
  /** Returns the position of a key path, for problems found after parsing. */
  locate: PolicyDocument['locate'];
}

/** Returns problems sorted by position, duplicates dropped. */
function sorted(list: PolicyProblem[]): PolicyProblem[] {
  const seen = new Set<string>();
  return list
    .filter((p) => {
      const id = `${p.line}:${p.column}:${p.path}:${p.message}`;
      if (seen.has(id)) return false;
      seen.add(id);
      return true;
    })
    .sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
}

/** Returns the typed policy parsed from YAML text, or every problem found in it; `file` names the policy in messages and sets its directory. */
export function parsePolicyText(text: string, file: string, opts: ParseOptions = {}): PolicyResult {
  return parsePolicyDetailed(text, file, opts).result;
}

/** Returns parsePolicyText's result together with the files the policy names and a way to locate keys. */
export function parsePolicyDetailed(text: string, file: string, opts: ParseOptions = {}): DetailedParse {
  const doc = readPolicyYaml(text);
  const problems: PolicyProblem[] = [];
  const warnings: PolicyProblem[] = [];
  const make = (at: KeyPath, position: Position, message: string, suggestion?: string): PolicyProblem => ({
    file,
    line: position.line,
    column: position.column,
    path: formatPath(at),
    message,
    ...(suggestion ? { suggestion } : {}),
  });
  const failed = (): DetailedParse => ({
    result: { ok: false, problems: sorted(problems), warnings: sorted(warnings) },
    files: [],
    locate: doc.locate,
  });

  for (const w of doc.warnings) warnings.push(make(w.path, w.position, w.message));
  for (const e of doc.errors) problems.push(make(e.path, e.position, `YAML syntax: ${e.message}`));
  if (problems.length > 0) return failed();
  for (const d of doc.duplicates) problems.push(make(d.path, d.position, d.message));

  const value = doc.value;
  if (value === null || value === undefined) {
    problems.push(make([], { line: 1, column: 1 }, 'the policy is empty; it needs at least `version`, `corpus` and `languages`'));
    return failed();
  }
  if (typeof value !== 'object' || Array.isArray(value)) {
    problems.push(make([], doc.locate([]), `the policy must be a mapping of keys (version, corpus, languages, ...), not ${kindOf(value)}`));
    return failed();
  }

  const version = (value as Record<string, unknown>).version;
  if (typeof version === 'number' && Number.isInteger(version) && version > POLICY_VERSION) {
    problems.push(
      make(['version'], doc.locate(['version']), `this policy is written for a newer sluice (policy version ${version}); this sluice reads version ${POLICY_VERSION}`, 'upgrade sluice'),
    );
    return failed();
  }

  for (const issue of checkAgainstSchema(value)) {
    problems.push(make(issue.path, doc.locate(issue.path, issue.part), issue.message, issue.suggestion));
  }

  const absFile = path.resolve(file);
  const built = buildPolicy(
    value,
    {
      file: absFile,
      ...(opts.root !== undefined ? { root: path.resolve(opts.root) } : {}),
      ...(opts.defaultRoot !== undefined ? { defaultRoot: path.resolve(opts.defaultRoot) } : {}),
    },
    {
      problem: (at, message, o = {}) => problems.push(make(at, doc.locate(at, o.part ?? 'value'), message, o.suggestion)),
      warning: (at, message, o = {}) => warnings.push(make(at, doc.locate(at, o.part ?? 'value'), message, o.suggestion)),
    },
  );
  if (problems.length > 0) return failed();

  const policy: Policy = built.policy;
  policy.positions = { 'corpus.include': doc.locate(['corpus', 'include'], 'value') };
  if (policy.rules.contamination) policy.positions['rules.contamination.eval'] = doc.locate(['rules', 'contamination', 'eval'], 'value');
  if (policy.tokenizer) policy.positions.tokenizer = doc.locate(['tokenizer'], 'value');
  if (policy.baseline) policy.positions.baseline = doc.locate(['baseline'], 'value');
  return {
    result: { ok: true, policy, warnings: sorted(warnings) },
    files: built.files.map((f) => ({ ...f, position: doc.locate(f.path, 'value') })),
    locate: doc.locate,
  };
}
