#!/usr/bin/env node
// The CLI lives in the committed bundle so that `npx sluice` needs no build step.
//
// A check or scan that may measure on several threads starts one worker thread before the
// bundle loads, so that the worker loads its copy alongside this thread rather than after it;
// the pool takes it or stops it (takePrestartedWorker in src/core/pool.ts). It waits,
// unreferenced, for the policy to load.
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';

const args = process.argv.slice(2);
const oneThread = args.some((a, i) => a === '--workers=1' || (a === '--workers' && args[i + 1] === '1'));
if ((args[0] === 'check' || args[0] === 'scan') && !oneThread && availableParallelism() > 1) {
  const worker = new Worker(new URL('../dist/cli.js', import.meta.url), { workerData: { role: 'sluice-shard-worker', pending: true } });
  const held = [];
  worker.on('message', (m) => held.push(['message', m]));
  worker.on('error', (e) => held.push(['error', e]));
  worker.on('exit', (code) => held.push(['exit', code]));
  worker.unref(); // after the listeners: adding a 'message' listener refs the worker again
  globalThis[Symbol.for('sluice.prestarted-worker')] = { worker, held };
}
await import('../dist/cli.js');
