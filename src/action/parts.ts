// The `parts` input: the final job of a fan-out takes the shard results that the scan jobs
// (`sluice scan --partition I/N`) measured, instead of measuring the corpus again, and then
// judges, compares with base and comments as a one-job run would. A part's result is taken for
// a shard only when the part names the same git blob as this checkout has at that path, so a
// result never stands for other bytes; a shard without one is measured here.
import { ConfigError, prepareOrThrow } from '../core/check.js';
import { cleanBlobs } from '../core/compare.js';
import { checkPartialSet, readPartialFile } from '../core/partition.js';
import type { Policy } from '../policy/types.js';
import { ResultCache } from '../results/cache.js';
import type { Partial } from '../results/partition.js';

/** A part file as read, with its path as the input's patterns found it. */
export type ReadPart = { file: string; partial: Partial };

/** Returns the part files the input's patterns (one per line, relative to the workspace) match, read; throws ConfigError when none matches. */
export async function readParts(patterns: readonly string[], workspace: string): Promise<ReadPart[]> {
  // Imported on use, as discovery does: the workers load this bundle too and never list files.
  const { default: fg } = await import('fast-glob');
  const files = (await fg([...patterns], { cwd: workspace, absolute: true, onlyFiles: true, dot: true })).sort();
  if (files.length === 0) {
    throw new ConfigError(`input \`parts\`: no file matches ${patterns.map((p) => `\`${p}\``).join(', ')} in ${workspace}; download the scan jobs' artifacts there first (actions/download-artifact)`);
  }
  const parts: ReadPart[] = [];
  for (const file of files) parts.push(await readPartialFile(file));
  return parts;
}

/** What seeding found: results taken, and results left to measure here (the part names no blob, or this checkout's file differs from the index). */
export interface Seeded {
  parts: number;
  taken: number;
  notTaken: number;
}

/**
 * Puts the results of the parts measured under this policy's settings into the result cache,
 * keyed by this checkout's blob ids, where the measuring steps look first. Throws ConfigError when
 * no part was measured under the policy's settings, when those parts are not one complete set,
 * or when a part names another blob than this checkout has at the same path (the scan jobs ran
 * on another commit).
 */
export async function seedFromParts(policy: Policy, parts: readonly ReadPart[], top: string, rootRel: string, cacheDir: string): Promise<Seeded> {
  const { settingsId } = await prepareOrThrow(policy);
  const mine = parts.filter((p) => p.partial.settingsId === settingsId);
  if (mine.length === 0) {
    const names = [...new Set(parts.map((p) => p.partial.policy))].join(', ');
    throw new ConfigError(
      `input \`parts\`: none of the ${parts.length} part files was measured under ${policy.file} as it is now (they are of ${names}): ` +
        'run `sluice scan --partition` with this policy and sluice version',
    );
  }
  const set = checkPartialSet(mine, policy, settingsId);
  const here = await cleanBlobs(top, rootRel);
  const cache = new ResultCache(cacheDir);
  let taken = 0;
  let notTaken = 0;
  for (const { file, partial } of set.parts) {
    for (const result of partial.results) {
      const scanned = partial.blobs?.[result.path];
      const blob = here.get(result.path);
      if (scanned !== undefined && blob !== undefined && scanned !== blob) {
        throw new ConfigError(
          `${file}: ${result.path} was scanned as git blob ${scanned.slice(0, 12)}, and this checkout has ${blob.slice(0, 12)}: ` +
            'run the scan jobs and this job on the same commit',
        );
      }
      if (scanned === undefined || blob === undefined || result.read.broken) {
        notTaken++;
        continue;
      }
      await cache.put({ ...result, contentId: blob });
      taken++;
    }
  }
  return { parts: set.parts.length, taken, notTaken };
}
