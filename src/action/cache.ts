// Keeps the shard result cache between runs with GitHub's cache service. Skipped
// cleanly when the service is absent (a local run, another CI); a cache failure
// is only a warning, since it costs time, never correctness.
import * as actionsCache from '@actions/cache';
import { readdir, rm } from 'node:fs/promises';
import path from 'node:path';

export type CacheLog = (message: string) => void;

/** Returns true when the runner offers GitHub's cache service. */
export function cacheServiceAvailable(): boolean {
  return actionsCache.isFeatureAvailable();
}

/** Returns the key a cache entry was restored from, or undefined when none matched or the service is absent. */
export async function restoreResults(dir: string, key: string, restoreKeys: string[], log: CacheLog, warn: CacheLog): Promise<string | undefined> {
  if (!cacheServiceAvailable()) {
    log('sluice: no GitHub cache service on this runner; shard results are not kept between runs');
    return undefined;
  }
  try {
    const hit = await actionsCache.restoreCache([dir], key, restoreKeys);
    log(hit ? `sluice: restored shard results from cache ${hit}` : 'sluice: no cached shard results yet');
    return hit;
  } catch (err) {
    warn(`sluice: could not restore cached shard results: ${(err as Error).message}`);
    return undefined;
  }
}

/** Saves the results directory under `key`; returns false when skipped or when the service refused (an entry with that key already exists). */
export async function saveResults(dir: string, key: string, log: CacheLog, warn: CacheLog): Promise<boolean> {
  if (!cacheServiceAvailable()) return false;
  try {
    const id = await actionsCache.saveCache([dir], key);
    if (id === -1) {
      log(`sluice: cache ${key} was not saved (it may already exist)`);
      return false;
    }
    log(`sluice: saved shard results as cache ${key}`);
    return true;
  } catch (err) {
    warn(`sluice: could not save shard results: ${(err as Error).message}`);
    return false;
  }
}

/** Removes cached results whose settings or content key were not used in this run (old settings, shards that left the corpus), so the saved cache stays the size of the corpus; returns how many were removed. */
export async function pruneResults(dir: string, usedSettings: ReadonlySet<string>, usedKeys: ReadonlySet<string>): Promise<number> {
  let names: string[];
  try {
    names = await readdir(dir);
  } catch {
    return 0;
  }
  let removed = 0;
  for (const name of names) {
    // Entries are `<settingsId>-<contentKey>.json` (results/cache.ts); the settings id has no dash.
    const m = /^([^-]+)-(.+)\.json$/.exec(name);
    if (m && usedSettings.has(m[1]!) && usedKeys.has(m[2]!)) continue;
    await rm(path.join(dir, name), { force: true });
    removed += 1;
  }
  return removed;
}
