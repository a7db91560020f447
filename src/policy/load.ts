// Reading a policy from disk: the file itself, the default root (nearest `.git`
// ancestor), and the files the policy names, which must exist before a run
// starts rather than fail halfway through it.
import { readFile, stat } from 'node:fs/promises';
import path from 'node:path';
import type { PolicyProblem, PolicyResult } from './types.js';
import { formatPath } from './format.js';
import { parsePolicyDetailed } from './parse.js';

/** Returns the nearest directory at or above `dir` that contains a `.git` entry (directory or file, as in worktrees), or undefined. */
export async function nearestGitRoot(dir: string): Promise<string | undefined> {
  let at = path.resolve(dir);
  for (;;) {
    try {
      await stat(path.join(at, '.git'));
      return at;
    } catch {
      // not here; go up
    }
    const up = path.dirname(at);
    if (up === at) return undefined;
    at = up;
  }
}

/** Returns what a stat of a path says: a file, a directory, or missing (with the reason). */
async function kindOfPath(p: string): Promise<'file' | 'dir' | { missing: string }> {
  try {
    const s = await stat(p);
    return s.isDirectory() ? 'dir' : 'file';
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return { missing: code === 'ENOENT' ? 'does not exist' : `cannot be read (${code ?? (e as Error).message})` };
  }
}

/** Returns the typed policy read from a YAML file, or every problem found in it, including files it names that are missing. */
export async function loadPolicy(file: string, overrides: { root?: string } = {}): Promise<PolicyResult> {
  const absFile = path.resolve(file);
  let text: string;
  try {
    text = await readFile(absFile, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a directory' : (e as Error).message;
    return { ok: false, problems: [{ file, path: '', message: `cannot read the policy file: ${why}` }], warnings: [] };
  }

  const policyDir = path.dirname(absFile);
  const defaultRoot = (await nearestGitRoot(policyDir)) ?? policyDir;
  const parsed = parsePolicyDetailed(text, file, { ...overrides, defaultRoot });
  if (!parsed.result.ok) return parsed.result;
  const { policy, warnings } = parsed.result;

  const problems: PolicyProblem[] = [];
  const rootKind = await kindOfPath(policy.root);
  if (rootKind !== 'dir') {
    const why = rootKind === 'file' ? 'is a file, not a directory' : rootKind.missing;
    if (overrides.root !== undefined) {
      problems.push({ file, path: 'root', message: `the root given in place of the policy's (${policy.root}) ${why}` });
    } else {
      const at = parsed.locate(['root'], 'value');
      problems.push({ file, line: at.line, column: at.column, path: 'root', message: `the root directory ${policy.root} ${why}` });
    }
  }

  for (const ref of parsed.files) {
    const kind = await kindOfPath(ref.absPath);
    if (kind === 'file') continue;
    const why = kind === 'dir' ? 'is a directory, not a file' : kind.missing;
    problems.push({
      file,
      line: ref.position.line,
      column: ref.position.column,
      path: formatPath(ref.path),
      message: `${ref.what} \`${ref.file}\` ${why} (looked for ${ref.absPath}; paths are relative to the root)`,
    });
  }

  if (problems.length > 0) return { ok: false, problems, warnings };
  return parsed.result;
}
