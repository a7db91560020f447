// Base against head: the corpus as a git commit had it and as the working tree has
// it, measured under one policy (head's), with every shard keyed by its git blob id
// so an unchanged shard is measured once and its result reused for both sides.
// Git is plumbing here (ls-tree, ls-files, status, cat-file, diff): nothing is
// checked out or changed, and the base side is read from blob streams.
import { execFile, spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdtemp, readFile, realpath, rename, rm, writeFile } from 'node:fs/promises';
import { makeDirectory } from '../results/cache.js';
import { tmpdir } from 'node:os';
import { pipeline } from 'node:stream/promises';
import path from 'node:path';
import type { Readable } from 'node:stream';
import picomatch from 'picomatch';
import { buildReport } from '../judge/report.js';
import type { Report } from '../judge/types.js';
import type { Policy } from '../policy/types.js';
import { pathClassifier } from '../read/index.js';
import type { ShardRef } from '../read/types.js';
import type { CorpusResult } from '../results/corpus.js';
import { contentIdOf } from '../results/scan.js';
import { ConfigError, discoverOrThrow, loadPolicyOrThrow, measureCorpus, prepareOrThrow, type CheckOptions } from './check.js';
import { compareReports, shardChanges, type Comparison, type ShardChange } from '../judge/comparison.js';

/** Largest git output read at once: ls-tree of a few hundred thousand shards is tens of MB. */
const GIT_MAX_BUFFER_BYTES = 1024 * 1024 * 1024;

/** Regular-file modes in git trees; links (120000) and submodules (160000) name no shard bytes. */
const FILE_MODES = new Set(['100644', '100755']);

/** A shard as it is in one commit. */
export interface BaseShard {
  /** Path relative to the policy root, as reports show it. */
  path: string;
  /** Path relative to the repository's top level, as git names it. */
  gitPath: string;
  blob: string;
  sizeBytes: number;
}

/** One side of a run, as measured. */
export interface Side {
  report: Report;
  /** Absent when the side's report came from the base memo (see baseMemoKey) rather than from measuring. */
  corpus?: CorpusResult;
}

/** What is kept of a judged commit so that a later comparison against it measures nothing: its report and documents per shard. */
interface BaseMemo {
  report: Report;
  docs: Record<string, number>;
}

/**
 * Returns the memo key of a policy's report at a commit. The key covers the policy's text and
 * the settings id (tokenizers, evaluation sets, sluice version), so a memo is reused only for
 * the same judgement; it is stored beside the shard results (`<settingsId>-<key>.json`).
 */
export async function baseMemoKey(policy: Policy, settingsId: string, commit: string): Promise<string> {
  const text = await readFile(policy.file, 'utf8');
  return `base${createHash('sha256').update(`${text}\0${settingsId}\0${commit}`).digest('hex').slice(0, 32)}`;
}

/** Returns the memo of a judged commit, if one is stored. */
async function readBaseMemo(cacheDir: string, settingsId: string, key: string): Promise<BaseMemo | undefined> {
  try {
    return JSON.parse(await readFile(path.join(cacheDir, `${settingsId}-${key}.json`), 'utf8')) as BaseMemo;
  } catch {
    return undefined;
  }
}

/** Stores the memo of a judged commit: a push to the default branch writes it, and pull requests against that commit read it. */
export async function writeBaseMemo(cacheDir: string, settingsId: string, key: string, report: Report, corpus: CorpusResult): Promise<void> {
  const memo: BaseMemo = { report, docs: Object.fromEntries(corpus.shards.map((s) => [s.path, s.read.docs])) };
  await makeDirectory(cacheDir);
  const file = path.join(cacheDir, `${settingsId}-${key}.json`);
  await writeFile(`${file}.tmp`, JSON.stringify(memo));
  await rename(`${file}.tmp`, file);
}

export interface CompareResult {
  head: Side;
  /** Null when the base commit has no shard the policy covers. */
  base: Side | null;
  comparison: Comparison;
  /** Base blobs streamed from git (shards measured at base rather than taken from the cache). */
  baseBlobReads: number;
}

/** Git failed: a message naming the command and what git said. */
export class GitError extends Error {
  override name = 'GitError';
}

/** Returns git's standard output for a command run in `cwd`; throws GitError with git's message. */
export function git(cwd: string, args: string[]): Promise<string> {
  return new Promise((resolve, reject) => {
    execFile('git', args, { cwd, maxBuffer: GIT_MAX_BUFFER_BYTES, encoding: 'utf8' }, (err, stdout, stderr) => {
      if (err) reject(new GitError(`git ${args.join(' ')}: ${(stderr || err.message).trim()}`));
      else resolve(stdout);
    });
  });
}

/** Returns the top level of the git work tree containing `dir`, or null when it is not in one. */
export async function gitTopLevel(dir: string): Promise<string | null> {
  try {
    return await realpath((await git(dir, ['rev-parse', '--show-toplevel'])).trim());
  } catch {
    return null;
  }
}

/** Returns the full commit id a ref names; throws ConfigError saying how to make it available. */
export async function resolveCommit(top: string, ref: string): Promise<string> {
  try {
    return (await git(top, ['rev-parse', '--verify', '--quiet', `${ref}^{commit}`])).trim();
  } catch {
    throw new ConfigError(
      `base \`${ref}\` is not a commit in this clone; check out with enough history to contain it ` +
        '(actions/checkout with `fetch-depth: 0`, or fetch the base ref before running sluice)',
    );
  }
}

/** Returns the policy root relative to the repository top (`''` when they are the same); throws ConfigError when the root is outside the repository. */
export async function rootInRepo(top: string, policy: Policy): Promise<string> {
  const rel = path.relative(top, await realpath(policy.root)).split(path.sep).join('/');
  if (rel === '..' || rel.startsWith('../') || path.isAbsolute(rel)) {
    throw new ConfigError(`${policy.file}: root ${policy.root} is outside the git repository ${top}; a base comparison needs the corpus in the repository`);
  }
  return rel;
}

/** Returns a matcher of policy-root-relative paths by corpus.include/exclude, with the same hidden-file rule as discovery (dot files only when a glob names them). */
export function corpusMatcher(policy: Policy): (relPath: string) => boolean {
  const include = picomatch(policy.corpus.include, { dot: false });
  const exclude = policy.corpus.exclude.length ? picomatch(policy.corpus.exclude, { dot: false }) : () => false;
  return (p) => include(p) && !exclude(p);
}

/** Returns the shards the policy covers in a commit, read from the tree without a checkout. */
export async function listCommitShards(top: string, commit: string, policy: Policy, rootRel: string): Promise<BaseShard[]> {
  const out = await git(top, ['ls-tree', '-r', '-l', '-z', '--full-tree', commit, '--', rootRel === '' ? '.' : rootRel]);
  const matches = corpusMatcher(policy);
  const shards: BaseShard[] = [];
  for (const entry of out.split('\0')) {
    if (!entry) continue;
    const tab = entry.indexOf('\t');
    const [mode, type, blob, size] = entry.slice(0, tab).split(/ +/);
    const gitPath = entry.slice(tab + 1);
    if (type !== 'blob' || !FILE_MODES.has(mode ?? '')) continue;
    const rel = rootRel === '' ? gitPath : gitPath.slice(rootRel.length + 1);
    if (!matches(rel)) continue;
    shards.push({ path: rel, gitPath, blob: blob!, sizeBytes: Number(size) });
  }
  return shards.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
}

/** Returns a stream of a blob's bytes from `git cat-file`; a git failure destroys the stream with git's message. */
export function blobStream(top: string, blob: string): Readable {
  const child = spawn('git', ['cat-file', 'blob', blob], { cwd: top, stdio: ['ignore', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (c: Buffer) => (stderr += c.toString()));
  child.on('close', (code) => {
    if (code !== 0) child.stdout.destroy(new GitError(`git cat-file blob ${blob}: ${stderr.trim() || `exit ${code}`}`));
  });
  child.on('error', (err) => child.stdout.destroy(err));
  return child.stdout;
}

/** Returns where the clone keeps its Git LFS objects (`<git dir>/lfs/objects`), or undefined when git cannot say. */
async function lfsObjectsDir(top: string): Promise<string | undefined> {
  try {
    return path.resolve(top, (await git(top, ['rev-parse', '--git-common-dir'])).trim(), 'lfs', 'objects');
  } catch {
    return undefined;
  }
}

/** Returns ShardRefs for base shards, classified by the policy's path rules and read from git; `onRead` is called each time a blob is opened; `lfsObjects`: where LFS pointers' objects are looked up. */
export function baseShardRefs(top: string, commit: string, policy: Policy, shards: BaseShard[], onRead?: () => void, lfsObjects?: string): ShardRef[] {
  const classify = pathClassifier(policy.corpus);
  const refs: ShardRef[] = [];
  for (const s of shards) {
    const c = classify(s.path);
    // An extension sluice does not read: discovery reports such files at head; at base they only matter as a change.
    if (!c.supported) continue;
    const ref: ShardRef = {
      path: s.path,
      absPath: `${commit.slice(0, 12)}:${s.gitPath}`,
      format: c.format,
      compression: c.compression,
      encoding: c.encoding,
      sizeBytes: s.sizeBytes,
      open: () => {
        onRead?.();
        return blobStream(top, s.blob);
      },
    };
    // A shard kept in Git LFS is a pointer in the commit: the reader takes the object when the clone has it.
    if (lfsObjects !== undefined) ref.lfsObjects = lfsObjects;
    if (c.subset !== undefined) ref.subset = c.subset;
    refs.push(ref);
  }
  return refs;
}

/** Returns the content key of working-tree shards: the index's blob id when the file is as the index has it, else sha256 of its bytes. */
export async function workingTreeKeys(top: string, rootRel: string): Promise<(ref: ShardRef) => Promise<string>> {
  const blobs = await cleanBlobs(top, rootRel);
  return async (ref) => blobs.get(ref.path) ?? (await contentIdOf(ref));
}

/**
 * Returns the git blob id of each file under the policy root (`rootRel`, from the repository's
 * top) that is as the index has it, keyed by its path relative to the root; a file changed in the
 * work tree, untracked or in a merge conflict has none.
 */
export async function cleanBlobs(top: string, rootRel: string): Promise<Map<string, string>> {
  const scope = rootRel === '' ? '.' : rootRel;
  const [staged, status] = await Promise.all([
    git(top, ['ls-files', '-s', '-z', '--full-name', '--', scope]),
    // status refreshes stat data first, so a touched but unchanged file is not taken as changed.
    git(top, ['status', '--porcelain=v1', '-z', '--untracked-files=all', '--no-renames', '--', scope]),
  ]);
  const blobs = new Map<string, string>();
  for (const entry of staged.split('\0')) {
    if (!entry) continue;
    const tab = entry.indexOf('\t');
    const [mode, blob, stage] = entry.slice(0, tab).split(' ');
    if (stage === '0' && FILE_MODES.has(mode ?? '')) blobs.set(entry.slice(tab + 1), blob!);
  }
  for (const entry of status.split('\0')) {
    if (entry.length < 4) continue;
    // XY path: Y is the work tree against the index; `??` is untracked.
    if (entry[1] !== ' ' || entry.startsWith('??')) blobs.delete(entry.slice(3));
  }
  const out = new Map<string, string>();
  const prefix = rootRel === '' ? '' : `${rootRel}/`;
  for (const [gitPath, blob] of blobs) if (gitPath.startsWith(prefix)) out.set(gitPath.slice(prefix.length), blob);
  return out;
}

/** Returns each base→head rename git finds (similarity, not only equal bytes), as policy-root-relative paths. */
async function renamesBetween(top: string, commit: string, rootRel: string): Promise<Map<string, string>> {
  const out = await git(top, ['diff', '--name-status', '-z', '-M', '--no-ext-diff', commit, 'HEAD', '--', rootRel === '' ? '.' : rootRel]);
  const parts = out.split('\0');
  const renames = new Map<string, string>();
  const strip = (p: string): string => (rootRel === '' ? p : p.slice(rootRel.length + 1));
  for (let i = 0; i < parts.length; ) {
    const status = parts[i] ?? '';
    if (!status) break;
    if (status.startsWith('R') || status.startsWith('C')) {
      if (status.startsWith('R')) renames.set(strip(parts[i + 2]!), strip(parts[i + 1]!));
      i += 3;
    } else i += 2;
  }
  return renames;
}

export interface CompareOptions {
  /** Options for measuring (cache directory, warnings, cwd); contentKey and newShards are set here. */
  check: CheckOptions;
  /** Repository top level (from gitTopLevel). */
  top: string;
  /** Full base commit id (from resolveCommit). */
  baseCommit: string;
  /** How the base is named to readers (`main`, or a short commit id). */
  baseLabel: string;
  /** Called with every content key used, head and base, so a persistent cache can drop the rest. */
  onKey?: (key: string) => void;
}

/**
 * Returns the policy with the base commit's version of its tokenizer file as the baseline, when
 * the pull request changed that file and the policy names no baseline of its own: fertility and
 * the token-weighted mix are then compared across the tokenizer change, and `max-regression`
 * is judged against the base branch's tokenizer. Returns the policy unchanged otherwise.
 */
export async function withBaseTokenizer(policy: Policy, top: string, baseCommit: string, baseLabel: string): Promise<Policy> {
  const tok = policy.tokenizer;
  if (!tok || tok.kind !== 'file' || policy.baseline) return policy;
  const rel = path.relative(top, await realpath(tok.absPath).catch(() => tok.absPath)).split(path.sep).join('/');
  if (rel.startsWith('..')) return policy;
  let baseBlob: string;
  let headBlob: string;
  try {
    baseBlob = (await git(top, ['rev-parse', `${baseCommit}:${rel}`])).trim();
    headBlob = (await git(top, ['hash-object', '--', rel])).trim();
  } catch {
    return policy; // the file is new in this PR: there is no base tokenizer to compare with
  }
  if (baseBlob === headBlob) return policy;
  const dir = await mkdtemp(path.join(tmpdir(), 'sluice-base-tokenizer-'));
  const file = path.join(dir, path.basename(rel));
  await pipeline(blobStream(top, baseBlob), createWriteStream(file));
  const baseline: NonNullable<Policy['baseline']> = { ...tok, file: `${tok.file} at ${baseLabel}`, absPath: file };
  return { ...policy, baseline };
}

/** Returns the policy's report at head (the working tree) and at a base commit, and their comparison; unchanged shards are measured once. */
export async function compareWithBase(givenPolicy: Policy, opts: CompareOptions): Promise<CompareResult> {
  // Worker threads are handed this policy as it is (base tokenizer included), not its file.
  const policy = await withBaseTokenizer(givenPolicy, opts.top, opts.baseCommit, opts.baseLabel);
  const rootRel = await rootInRepo(opts.top, policy);
  const [headKeyOf, baseShards, renames] = await Promise.all([
    workingTreeKeys(opts.top, rootRel),
    listCommitShards(opts.top, opts.baseCommit, policy, rootRel),
    renamesBetween(opts.top, opts.baseCommit, rootRel),
  ]);

  const discovery = await discoverOrThrow(policy);
  // Head and base are measured under the same analyzers: load the tokenizers and evaluation sets once.
  const prepared = await prepareOrThrow(policy);
  const headKeys = new Map<string, string>();
  for (const ref of discovery.shards) headKeys.set(ref.path, await headKeyOf(ref));
  const baseKeys = new Map(baseShards.map((s) => [s.path, s.blob] as const));
  for (const k of [...headKeys.values(), ...baseKeys.values()]) opts.onKey?.(k);

  // New to the corpus: added, changed and edited-while-renamed shards (a pure rename adds nothing; a copy at a new path does).
  const isNew = (c: ShardChange): boolean => c.status === 'added' || c.status === 'modified' || (c.status === 'renamed' && c.edited === true);
  const newShards = shardChanges(baseKeys, headKeys, renames).filter(isNew).map((c) => c.path);

  const headCorpus = await measureCorpus(policy, { ...opts.check, contentKey: async (ref) => headKeys.get(ref.path) ?? headKeyOf(ref), newShards }, { discovery, prepared });
  const headReport = buildReport(policy, headCorpus, opts.check.cwd);

  let base: Side | null = null;
  let baseDocs = new Map<string, number>();
  let baseBlobReads = 0;
  const refs = baseShardRefs(opts.top, opts.baseCommit, policy, baseShards, () => (baseBlobReads += 1), await lfsObjectsDir(opts.top));
  if (refs.length > 0) {
    // The base was judged before (a push to the default branch, or an earlier run of this PR) under the same
    // policy and settings: reuse that judgement, so the run costs what the PR changed, not the corpus size.
    const { settingsId } = prepared;
    const memoKey = opts.check.cacheDir ? await baseMemoKey(policy, settingsId, opts.baseCommit) : undefined;
    if (memoKey) opts.onKey?.(memoKey);
    const memo = memoKey ? await readBaseMemo(opts.check.cacheDir!, settingsId, memoKey) : undefined;
    if (memo) {
      base = { report: memo.report };
      baseDocs = new Map(Object.entries(memo.docs));
    } else {
      const { newShards: _unused, ...baseCheck } = opts.check;
      const corpus = await measureCorpus(policy, { ...baseCheck, contentKey: async (ref) => baseKeys.get(ref.path)! }, { discovery: { shards: refs, skipped: discovery.skipped }, prepared });
      base = { corpus, report: buildReport(policy, corpus, opts.check.cwd) };
      baseDocs = new Map(corpus.shards.map((s) => [s.path, s.read.docs] as const));
      if (memoKey) await writeBaseMemo(opts.check.cacheDir!, settingsId, memoKey, base.report, corpus);
    }
  }

  const docsOf = (corpus: CorpusResult | undefined): Map<string, number> => new Map((corpus?.shards ?? []).map((s) => [s.path, s.read.docs] as const));
  const changes = shardChanges(baseKeys, headKeys, renames, { base: baseDocs, head: docsOf(headCorpus) });

  const comparison = compareReports(base?.report ?? null, headReport, opts.baseCommit, opts.baseLabel, changes, headCorpus.duplicatesAgainstExisting);
  return { head: { report: headReport, corpus: headCorpus }, base, comparison, baseBlobReads };
}

/** One policy judged at head and compared with a base commit (`sluice check --base`). */
export interface JudgedAgainstBase {
  report: Report;
  comparison: Comparison;
  /** Base shards read from git; the others had the head's bytes (or the base's judgement was remembered) and were not read again. */
  baseShardsRead: number;
}

/**
 * Returns each policy's report of the working tree and its comparison with the commit `baseRef`
 * names, as the Action makes them on a pull request; throws ConfigError when a policy's corpus is
 * not in a git work tree or the ref is not a commit there.
 */
export async function runCheckAgainstBase(opts: CheckOptions, baseRef: string): Promise<JudgedAgainstBase[]> {
  const out: JudgedAgainstBase[] = [];
  // Without a cache (--no-cache), a scratch one for this run: a shard unchanged since base is still measured once for both sides.
  const scratch = opts.cacheDir === null ? await mkdtemp(path.join(tmpdir(), 'sluice-compare-')) : null;
  const check: CheckOptions = scratch === null ? opts : { ...opts, cacheDir: scratch };
  try {
    for (const file of opts.policies) {
      const policy = await loadPolicyOrThrow(file, opts.root, opts.onWarning);
      const top = await gitTopLevel(policy.root);
      if (top === null) throw new ConfigError(`--base ${baseRef}: the corpus of ${policy.file} (${policy.root}) is not in a git work tree, so it has no base to compare with`);
      const commit = await resolveCommit(top, baseRef);
      const r = await compareWithBase(policy, { check, top, baseCommit: commit, baseLabel: baseRef });
      out.push({ report: r.head.report, comparison: r.comparison, baseShardsRead: r.baseBlobReads });
    }
  } finally {
    if (scratch !== null) await rm(scratch, { recursive: true, force: true });
  }
  return out;
}
