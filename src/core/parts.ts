// The final step of a fan-out (the Action's `parts` input, `sluice check --parts`): the shard
// results that the scan jobs (`scan --partition I/N`) measured are taken instead of measuring the
// corpus again, and the run then judges, compares with base and comments as a one-job run would.
// A part's result is taken for a shard only when the part names the same git blob as this
// checkout has at that path, so a result never stands for other bytes; a shard without one is
// measured here. The results go into the result cache, where the measuring steps look first.
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ConfigError, loadPolicyOrThrow, prepareOrThrow, type CheckOptions } from './check.js';
import { cleanBlobs, gitTopLevel, rootInRepo } from './compare.js';
import { checkPartialSet, readPartialFile, type ReadPart } from './partition.js';
import type { Policy } from '../policy/types.js';
import { ResultCache } from '../results/cache.js';

/** Returns the part files the patterns (relative to `workspace`) match, read; throws ConfigError when none matches, naming the option or input (`what`) that gave them. */
export async function readParts(patterns: readonly string[], workspace: string, what: string): Promise<ReadPart[]> {
  // Imported on use, as discovery does: the workers load this bundle too and never list files.
  const { default: fg } = await import('fast-glob');
  const files = (await fg([...patterns], { cwd: workspace, absolute: true, onlyFiles: true, dot: true })).sort();
  if (files.length === 0) {
    throw new ConfigError(`${what}: no file matches ${patterns.map((p) => `\`${p}\``).join(', ')} in ${workspace}; bring the scan jobs' part files there first`);
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

/** Returns the line that says what a policy took from the parts, for the front ends' logs. */
export function seededLine(policyName: string, s: Seeded): string {
  const left = s.notTaken > 0 ? `; ${s.notTaken} left to measure here (no git blob in the part, or the file differs from the index here)` : '';
  return `sluice ${policyName}: took ${s.taken} shard results from ${s.parts} parts${left}`;
}

/**
 * Puts the results of the parts measured under this policy's settings into the result cache,
 * keyed by this checkout's blob ids, where the measuring steps look first. Throws ConfigError when
 * no part was measured under the policy's settings, when those parts are not one complete set,
 * or when a part names another blob than this checkout has at the same path (the scan jobs ran
 * on another commit).
 */
export async function seedFromParts(policy: Policy, parts: readonly ReadPart[], top: string, rootRel: string, cacheDir: string, what: string): Promise<Seeded> {
  const { settingsId } = await prepareOrThrow(policy);
  const mine = parts.filter((p) => p.partial.settingsId === settingsId);
  if (mine.length === 0) {
    const names = [...new Set(parts.map((p) => p.partial.policy))].join(', ');
    throw new ConfigError(
      `${what}: none of the ${parts.length} part files was measured under ${policy.file} as it is now (they are of ${names}): ` +
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

/** A run's options with its result cache seeded from parts, what each policy took, and the clean-up of a scratch cache made for it. */
export interface SeededRun {
  options: CheckOptions;
  seeded: Array<{ policy: string; seeded: Seeded }>;
  dispose: () => Promise<void>;
}

/**
 * Seeds the result cache of a run from the part files `patterns` match, for each of its policies
 * (`sluice check --parts`), in a scratch cache when the run has none; throws ConfigError when a
 * policy's corpus is not in a git work tree, or as seedFromParts does.
 */
export async function seedRunFromParts(opts: CheckOptions, patterns: readonly string[], what: string): Promise<SeededRun> {
  const parts = await readParts(patterns, opts.cwd ?? process.cwd(), what);
  const scratch = opts.cacheDir === null ? await mkdtemp(path.join(tmpdir(), 'sluice-parts-')) : null;
  const dispose = async (): Promise<void> => {
    if (scratch !== null) await rm(scratch, { recursive: true, force: true });
  };
  const cacheDir = scratch ?? opts.cacheDir!;
  const seeded: SeededRun['seeded'] = [];
  try {
    for (const file of opts.policies) {
      // Loaded again by the run itself, which says its warnings: none here.
      const policy = await loadPolicyOrThrow(file, opts.root);
      const top = await gitTopLevel(policy.root);
      if (top === null) throw new ConfigError(`${what} needs the corpus in a git work tree (results are matched to shards by git blob id), and ${policy.root} of ${policy.file} is not in one`);
      seeded.push({ policy: policy.name, seeded: await seedFromParts(policy, parts, top, await rootInRepo(top, policy), cacheDir, what) });
    }
  } catch (err) {
    await dispose();
    throw err;
  }
  return { options: { ...opts, cacheDir }, seeded, dispose };
}
