// The demo: generate the invented newsroom corpus, run the gate on the pull
// request that breaks its policy (it must fail), then on the clean corpus (it
// must pass). Exits 0 when both behave as expected.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const run = (args) => spawnSync(process.execPath, args, { cwd: root, stdio: 'inherit' }).status;

if (run(['examples/newsroom/generate.mjs']) !== 0) process.exit(1);

console.log('\n$ sluice check examples/newsroom/policies/newsroom.yaml   # the pull request, with its planted problems\n');
const failing = run(['bin/sluice.js', 'check', 'examples/newsroom/policies/newsroom.yaml', '--no-cache', '--markdown', 'examples/newsroom/report.md', '--json', 'examples/newsroom/report.json']);

console.log('\n$ sluice check examples/newsroom/policies/newsroom-clean.yaml   # the corpus without the incoming shards\n');
const passing = run(['bin/sluice.js', 'check', 'examples/newsroom/policies/newsroom-clean.yaml', '--no-cache']);

console.log(
  `\nThe pull request ${failing === 1 ? 'fails the gate (exit 1), as planted' : `exited ${failing}, but should fail with exit 1`}; ` +
    `the clean corpus ${passing === 0 ? 'passes (exit 0)' : `exited ${passing}, but should pass`}.` +
    '\nReports of the failing run: examples/newsroom/report.md and report.json.',
);
process.exit(failing === 1 && passing === 0 ? 0 : 1);
