// Shard results cached by content: the key is the shard's raw-bytes hash plus the
// identity of the measurement settings, so a changed policy or tokenizer never
// reuses a stale result, and an unchanged shard is never measured twice.
import { createHash } from 'node:crypto';
import { mkdir, readFile, rename, stat, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { inspectIndex } from '../measure/duplicates/index.js';
import { shardResultFromStored, storedShardResult } from './serialize.js';
import type { ShardResult } from './types.js';

/** Returns a stable id for a JSON-able settings object (sha256 of its canonical JSON, 16 hex digits). */
export function settingsIdOf(settings: unknown): string {
  return createHash('sha256').update(canonicalJson(settings)).digest('hex').slice(0, 16);
}

/** Returns JSON with object keys sorted, so equal settings give equal text. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) => {
    if (v && typeof v === 'object' && !Array.isArray(v)) {
      return Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
    }
    return v;
  });
}

/**
 * Makes a directory and any missing parents, one level at a time. `mkdir` with `recursive` never
 * settles on a path whose parent exists but refuses it with ENOENT (a path under /proc: Node 20
 * retries it forever); here the second refusal is thrown.
 */
export async function makeDirectory(dir: string): Promise<void> {
  try {
    await mkdir(dir);
    return;
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EEXIST' && (await stat(dir)).isDirectory()) return;
    if (code !== 'ENOENT' || dirname(dir) === dir) throw error;
  }
  await makeDirectory(dirname(dir));
  try {
    await mkdir(dir);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST' || !(await stat(dir)).isDirectory()) throw error;
  }
}

/** A directory of cached shard results. */
export class ResultCache {
  hits = 0;
  misses = 0;
  /** needsDuplicateIndex: the settings measure duplicates, so an entry without its shard's index is not whole. */
  constructor(
    readonly dir: string,
    private readonly needsDuplicateIndex = false,
  ) {}

  private file(contentId: string, settingsId: string): string {
    return join(this.dir, `${settingsId}-${contentId}.json`);
  }

  /** Returns the cached result for this content under these settings, or undefined. */
  async get(contentId: string, settingsId: string, at: { path: string; subset?: string; encoding: string; format: string }): Promise<ShardResult | undefined> {
    try {
      const stored = shardResultFromStored(JSON.parse(await readFile(this.file(contentId, settingsId), 'utf8')));
      // An entry of another schema, or cut short or edited by hand, is measured again rather than summed.
      const r = 'result' in stored ? stored.result : undefined;
      // The same bytes decoded with another encoding or format are another result.
      if (!r || r.contentId !== contentId || r.settingsId !== settingsId || r.encoding !== at.encoding || r.format !== at.format) {
        this.misses += 1;
        return undefined;
      }
      this.hits += 1;
      // The same bytes may sit at another path (a rename): report them where they are now.
      // A damaged duplicate index would make the cross-shard join fail: measure the shard again instead.
      if (r.duplicateIndex ? !inspectIndex(r.duplicateIndex).ok : this.needsDuplicateIndex) {
        this.misses += 1;
        return undefined;
      }
      const moved: ShardResult = { ...r, path: at.path };
      if (at.subset === undefined) delete moved.subset;
      else moved.subset = at.subset;
      return moved;
    } catch {
      this.misses += 1;
      return undefined;
    }
  }

  /** Stores a result; broken shards are never cached, so they are read again next time. */
  async put(result: ShardResult): Promise<void> {
    if (result.read.broken) return;
    await makeDirectory(this.dir);
    const target = this.file(result.contentId, result.settingsId);
    const tmp = `${target}.${process.pid}.tmp`;
    await writeFile(tmp, JSON.stringify(storedShardResult(result)));
    await rename(tmp, target);
  }
}
