// The Action's entry point: settings from the runner, the run, and the single
// boundary where an error becomes a failed step.
import * as core from '@actions/core';
import { ConfigError } from '../core/check.js';
import { settingsFromEnv } from './inputs.js';
import { runAction } from './run.js';
import { runnerIO } from './runner.js';

try {
  const outcome = await runAction(settingsFromEnv(process.env), runnerIO());
  if (outcome.failure) core.setFailed(outcome.failure);
} catch (err) {
  core.setFailed(err instanceof ConfigError ? `sluice: ${err.message}` : `sluice: internal error: ${(err as Error).stack ?? String(err)}`);
}
