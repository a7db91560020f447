// The Action's entry point: settings from the runner, the run, and the single
// boundary where an error becomes a failed step. The same bundle is the script
// of the worker threads that measure shards.
import * as core from '@actions/core';
import { ConfigError } from '../core/check.js';
import { ShardFailure } from '../core/pool.js';
import { isShardWorker, runShardWorker } from '../core/worker.js';
import { settingsFromEnv } from './inputs.js';
import { runAction } from './run.js';
import { runnerIO } from './runner.js';

async function run(): Promise<void> {
  try {
    const outcome = await runAction({ ...settingsFromEnv(process.env), workerEntry: import.meta.url }, runnerIO());
    if (outcome.failure) core.setFailed(outcome.failure);
  } catch (err) {
    const known = err instanceof ConfigError || err instanceof ShardFailure;
    core.setFailed(known ? `sluice: ${(err as Error).message}` : `sluice: internal error: ${(err as Error).stack ?? String(err)}`);
  }
}

// No top-level await, for the reason given at the end of cli/main.ts: this bundle is also the
// workers' script, and a worker terminated while an async module's body runs aborts the process.
if (isShardWorker()) void runShardWorker();
else void run();
