// Finds the shards a policy's globs name under its root, and says why each other
// matched path is not read. Nothing outside the root is read or listed.
//
// Links: fast-glob follows symbolic links, but directory listings go through `listDirectory`
// below, which refuses (and records) a directory whose real path is outside the real root or
// that is a link back to a directory the walk is already inside (a loop). Each matched file is
// resolved to its real path: outside the root it is skipped as `link-outside-root`. A file
// reached under two paths (two links, or a hard link) is read once, under the path that has
// no link in it when there is one, else under the first path in sort order; the other paths are
// skipped as `same-file`, naming the path that is read.
import { lstat, realpath, stat } from 'node:fs/promises';
import { readdir, type Stats } from 'node:fs';
import path from 'node:path';
import type { CorpusSpec } from '../policy/types.js';
import { pathClassifier, shardKindOf } from './classify.js';
import type { Discovery, ShardRef, SkippedFile } from './types.js';

/** Files resolved at a time: enough to hide syscall latency, few enough not to exhaust file handles. */
const RESOLVE_CONCURRENCY = 64;

interface Found {
  rel: string;
  real: string;
  stats: Stats;
  /** The path names the file itself, with no link on the way. */
  direct: boolean;
}

/** Returns the shards under `root` that the corpus globs match, sorted by path, and the matched paths that are not read, with reasons; throws when the root cannot be read or the corpus names an unknown encoding. */
export async function discoverShards(root: string, corpus: CorpusSpec): Promise<Discovery> {
  const classify = pathClassifier(corpus);
  for (const pattern of [...corpus.include, ...corpus.exclude]) checkPatternStaysInside(pattern);
  const absRoot = path.resolve(root);
  const realRoot = await readableRoot(absRoot);

  const skipped: SkippedFile[] = [];
  const lister = directoryLister(absRoot, realRoot, skipped);
  // Imported here, not at the top: the pool's workers load this bundle too and never list files, and
  // fast-glob with its dependencies took 22-36 ms to import on a fresh thread (two runs).
  const { default: fg } = await import('fast-glob');
  let entries: string[];
  try {
    entries = await fg(corpus.include, {
      cwd: absRoot,
      ignore: corpus.exclude,
      // dot stays false (fast-glob's default): hidden files and directories (.git, .cache) match only when a glob names them.
      onlyFiles: false, // keep FIFOs and broken links, to report them rather than drop them silently
      markDirectories: true,
      followSymbolicLinks: true,
      fs: { readdir: lister },
    });
  } catch (error) {
    throw new Error(`cannot list the corpus under ${absRoot}: ${messageOf(error)}`);
  }
  entries.sort(byCodeUnits);

  const found: Found[] = [];
  await forEachLimited(entries, RESOLVE_CONCURRENCY, async (rel) => {
    if (rel.endsWith('/')) {
      const dir = rel.slice(0, -1);
      // A directory is a container, walked into; it only needs a word when it is named like a shard.
      if (!('unsupported' in shardKindOf(dir))) skipped.push({ path: dir, reason: 'not-a-file', detail: 'a directory, named like a shard' });
      return;
    }
    const abs = path.join(absRoot, rel);
    let real: string;
    try {
      real = await realpath(abs);
    } catch (error) {
      skipped.push({ path: rel, reason: 'unreadable', detail: `cannot resolve (a broken link?): ${messageOf(error)}` });
      return;
    }
    if (!isInside(realRoot, real)) {
      skipped.push({ path: rel, reason: 'link-outside-root', detail: `resolves to ${real}, outside the root ${realRoot}` });
      return;
    }
    let stats: Stats;
    try {
      stats = await stat(real);
    } catch (error) {
      skipped.push({ path: rel, reason: 'unreadable', detail: messageOf(error) });
      return;
    }
    if (!stats.isFile()) {
      skipped.push({ path: rel, reason: 'not-a-file', detail: `not a regular file (${fileType(stats)})` });
      return;
    }
    found.push({ rel, real, stats, direct: toPosix(path.relative(realRoot, real)) === rel });
  });

  const shards: ShardRef[] = [];
  for (const file of chooseOnePathPerFile(found, skipped)) {
    const kind = classify(file.rel);
    if (!kind.supported) {
      skipped.push({ path: file.rel, reason: 'unsupported-format', detail: kind.detail });
      continue;
    }
    const shard: ShardRef = {
      path: file.rel,
      absPath: file.real,
      format: kind.format,
      compression: kind.compression,
      encoding: kind.encoding,
      sizeBytes: file.stats.size,
    };
    if (kind.subset !== undefined) shard.subset = kind.subset;
    shards.push(shard);
  }
  shards.sort((a, b) => byCodeUnits(a.path, b.path));
  skipped.sort((a, b) => byCodeUnits(a.path, b.path) || byCodeUnits(a.reason, b.reason));
  return { shards, skipped };
}

/** Keeps one path per file (device + inode), recording the others as `same-file`. */
function chooseOnePathPerFile(found: Found[], skipped: SkippedFile[]): Found[] {
  const byFile = new Map<string, Found[]>();
  for (const file of found) {
    const key = `${file.stats.dev}:${file.stats.ino}`;
    const group = byFile.get(key);
    if (group === undefined) byFile.set(key, [file]);
    else group.push(file);
  }
  const kept: Found[] = [];
  for (const group of byFile.values()) {
    group.sort((a, b) => Number(b.direct) - Number(a.direct) || byCodeUnits(a.rel, b.rel));
    const [first, ...others] = group as [Found, ...Found[]];
    kept.push(first);
    for (const other of others) skipped.push({ path: other.rel, reason: 'same-file', detail: `the same file as ${first.rel}, which is read` });
  }
  return kept;
}

/** A readdir for fast-glob that does not list directories outside the root or loops back into the walk. */
/** Returns whether anything (a link to nowhere included) is at a path. */
async function exists(p: string): Promise<boolean> {
  try {
    await lstat(p);
    return true;
  } catch {
    return false;
  }
}

function directoryLister(absRoot: string, realRoot: string, skipped: SkippedFile[]) {
  const realOf = new Map<string, Promise<string>>();
  const resolve = (dir: string): Promise<string> => {
    let real = realOf.get(dir);
    if (real === undefined) {
      real = realpath(dir);
      realOf.set(dir, real);
    }
    return real;
  };

  const list = async (dir: string): Promise<'list' | 'skip'> => {
    const rel = toPosix(path.relative(absRoot, dir));
    let real: string;
    try {
      real = await resolve(dir);
    } catch (error) {
      // A glob's fixed part naming a directory that is not there (`archive/*.jsonl` with no
      // archive/) matches nothing, as a glob naming a file that is not there does; a path that
      // is there but cannot be resolved (a link to nowhere, no permission) is reported.
      if ((error as NodeJS.ErrnoException).code === 'ENOENT' && !(await exists(dir))) return 'skip';
      skipped.push({ path: rel, reason: 'unreadable', detail: `cannot resolve the directory: ${messageOf(error)}` });
      return 'skip';
    }
    if (!isInside(realRoot, real)) {
      skipped.push({ path: rel, reason: 'link-outside-root', detail: `directory resolves to ${real}, outside the root ${realRoot}; not followed` });
      return 'skip';
    }
    // A loop: the directory is (really) one of the directories on the way to it.
    for (let up = path.dirname(dir); isInside(absRoot, up) && up !== dir; up = path.dirname(up)) {
      if ((await resolve(up).catch(() => '')) === real) {
        skipped.push({ path: rel, reason: 'link-loop', detail: `links back to ${toPosix(path.relative(absRoot, up)) || '.'}, which the walk is inside; not followed` });
        return 'skip';
      }
      if (up === absRoot) break;
    }
    return 'list';
  };

  // fast-glob calls readdir(dir, { withFileTypes: true }, callback); the two-argument form is served too.
  const lister = (dir: string, optionsOrCallback: unknown, maybeCallback?: unknown): void => {
    const callback = (typeof optionsOrCallback === 'function' ? optionsOrCallback : maybeCallback) as (error: NodeJS.ErrnoException | null, entries: unknown[]) => void;
    const options = typeof optionsOrCallback === 'function' ? {} : (optionsOrCallback as { withFileTypes: true });
    list(dir).then(
      (decision) => {
        if (decision === 'skip') return callback(null, []);
        readdir(dir, options, (error: NodeJS.ErrnoException | null, entries: unknown[]) => {
          if (error === null) return callback(null, entries);
          // fast-glob passes over a directory that vanished; anything else is recorded and the walk goes on.
          if (error.code !== 'ENOENT') skipped.push({ path: toPosix(path.relative(absRoot, dir)), reason: 'unreadable', detail: `cannot list the directory: ${error.message}` });
          callback(null, []);
        });
      },
      (error: unknown) => callback(error as NodeJS.ErrnoException, []),
    );
  };
  // Both call forms are handled above; TypeScript cannot check an implementation against readdir's overloads.
  return lister as unknown as typeof readdir;
}

/** Returns the real path of the root; throws an Error naming the root when it is missing, not a directory or not readable. */
async function readableRoot(absRoot: string): Promise<string> {
  let real: string;
  let stats: Stats;
  try {
    real = await realpath(absRoot);
    stats = await stat(real);
  } catch (error) {
    throw new Error(`corpus root ${absRoot} cannot be read: ${messageOf(error)}`);
  }
  if (!stats.isDirectory()) throw new Error(`corpus root ${absRoot} is not a directory`);
  await new Promise<void>((resolve, reject) =>
    readdir(real, (error) => (error === null ? resolve() : reject(new Error(`corpus root ${absRoot} cannot be listed: ${error.message}`)))),
  );
  return real;
}

/** Throws when a glob is absolute or climbs out of the root with `..`. */
function checkPatternStaysInside(pattern: string): void {
  const body = pattern.startsWith('!') ? pattern.slice(1) : pattern;
  if (path.posix.isAbsolute(body) || path.win32.isAbsolute(body) || body.split('/').includes('..')) {
    throw new Error(`corpus glob \`${pattern}\` leaves the root; globs are relative to the root and may not use \`..\` or absolute paths`);
  }
}

function isInside(root: string, candidate: string): boolean {
  return candidate === root || candidate.startsWith(root.endsWith(path.sep) ? root : root + path.sep);
}

function fileType(stats: Stats): string {
  if (stats.isDirectory()) return 'a directory';
  if (stats.isFIFO()) return 'a FIFO';
  if (stats.isSocket()) return 'a socket';
  if (stats.isCharacterDevice() || stats.isBlockDevice()) return 'a device';
  return 'not a regular file';
}

function toPosix(p: string): string {
  return p.split(path.sep).join('/');
}

/** Plain code-unit order: the same on every machine, unlike localeCompare. */
function byCodeUnits(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

async function forEachLimited<T>(items: T[], limit: number, task: (item: T) => Promise<void>): Promise<void> {
  let next = 0;
  const worker = async (): Promise<void> => {
    while (next < items.length) await task(items[next++]!);
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
