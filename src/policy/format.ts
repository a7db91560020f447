// How policy problems are written for people: one line each, in the
// `file:line:col: key.path: message` form that editors and CI logs turn into links.
import type { Policy, PolicyProblem, PositionedKey } from './types.js';

/** A key path as segments: map keys are strings, list positions numbers. */
export type KeyPath = readonly (string | number)[];

/** Keys that can be written after a dot without quoting. */
const PLAIN_KEY = /^[A-Za-z0-9_$-]+$/;

/** Returns a key path as people read it: `rules.mix.tolerance`, `corpus.include[1]`, `corpus.encodings["legacy/*.txt"]`. */
export function formatPath(path: KeyPath): string {
  let out = '';
  for (const seg of path) {
    if (typeof seg === 'number') out += `[${seg}]`;
    else if (PLAIN_KEY.test(seg)) out += out === '' ? seg : `.${seg}`;
    else out += `[${JSON.stringify(seg)}]`;
  }
  return out;
}

/** Returns one line about a key of a loaded policy, `file:line:col: key: message`, its position left out when the policy does not have it. */
export function formatPolicyKeyProblem(policy: Policy, key: PositionedKey, message: string): string {
  const at = policy.positions?.[key];
  return formatProblem({ file: policy.file, ...(at ? { line: at.line, column: at.column } : {}), path: key, message });
}

/** Returns one line: `file:line:col: key.path: message (did you mean `x`?)`; parts that are unknown are left out. */
export function formatProblem(p: PolicyProblem): string {
  let where = p.file;
  if (p.line !== undefined) {
    where += `:${p.line}`;
    if (p.column !== undefined) where += `:${p.column}`;
  }
  const key = p.path ? ` ${p.path}:` : '';
  const hint = p.suggestion ? ` (${p.suggestion})` : '';
  // One line, whatever a library put in the message.
  return `${where}:${key} ${p.message}${hint}`.replace(/\s*\n\s*/g, ' ');
}
