// The demo: generate the invented newsroom corpus, run the gate on the pull
// request that breaks its policy (it must fail), then on the clean corpus (it
// must pass), then on the pull request as a branch of a scratch git repository,
// compared with its base branch. Exits 0 when all three behave as expected.
import { spawnSync } from 'node:child_process';
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { fileURLToPath } from 'node:url';
import { dirname, join } from 'node:path';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const run = (args) => spawnSync(process.execPath, args, { cwd: root, stdio: 'inherit' }).status;

if (run(['examples/newsroom/generate.mjs']) !== 0) process.exit(1);

console.log('\n$ sluice check examples/newsroom/policies/newsroom.yaml   # the pull request, with its planted problems\n');
const failing = run(['bin/sluice.js', 'check', 'examples/newsroom/policies/newsroom.yaml', '--no-cache', '--markdown', 'examples/newsroom/report.md', '--json', 'examples/newsroom/report.json']);

console.log('\n$ sluice check examples/newsroom/policies/newsroom-clean.yaml   # the corpus without the incoming shards\n');
const passing = run(['bin/sluice.js', 'check', 'examples/newsroom/policies/newsroom-clean.yaml', '--no-cache']);

// The archive committed on `main`, the pull request's shards on a branch: what the Action sees on a pull request.
console.log('\n$ sluice check policies/newsroom.yaml --base main   # in a scratch git repository: main holds the archive, a branch adds data/incoming/\n');
const compared = againstBase();

console.log(
  `\nThe pull request ${failing === 1 ? 'fails the gate (exit 1), as planted' : `exited ${failing}, but should fail with exit 1`}; ` +
    `the clean corpus ${passing === 0 ? 'passes (exit 0)' : `exited ${passing}, but should pass`}.` +
    (compared === null ? ' (git is not installed: the comparison with a base branch was skipped)' : compared === 1 ? ' Against main, its branch fails too (exit 1).' : ` Against main, its branch exited ${compared}, but should fail with exit 1.`) +
    '\nReports of the failing run: examples/newsroom/report.md and report.json; the comparison of the branch with main: examples/newsroom/comparison.md.',
);
process.exit(failing === 1 && passing === 0 && (compared === null || compared === 1) ? 0 : 1);

/** Runs the gate on the pull request as a branch of a scratch repository against its main; returns the exit status, or null without git. */
function againstBase() {
  if (spawnSync('git', ['--version'], { stdio: 'ignore' }).status !== 0) return null;
  const repo = mkdtempSync(join(tmpdir(), 'sluice-demo-'));
  const env = { ...process.env, GIT_CONFIG_NOSYSTEM: '1', GIT_AUTHOR_NAME: 'Sangam Desk', GIT_AUTHOR_EMAIL: 'desk@sangam.invalid', GIT_COMMITTER_NAME: 'Sangam Desk', GIT_COMMITTER_EMAIL: 'desk@sangam.invalid' };
  const git = (...args) => spawnSync('git', ['-c', 'commit.gpgsign=false', ...args], { cwd: repo, env, stdio: 'ignore' }).status === 0;
  try {
    const demo = join(root, 'examples', 'newsroom');
    for (const dir of ['policies', 'evals', 'data']) cpSync(join(demo, dir), join(repo, dir), { recursive: true, filter: (p) => !p.includes(join('data', 'incoming')) });
    if (!(git('init', '-q', '-b', 'main') && git('add', '-A') && git('commit', '-q', '-m', 'The archive'))) return null;
    cpSync(join(demo, 'data', 'incoming'), join(repo, 'data', 'incoming'), { recursive: true });
    if (!(git('checkout', '-q', '-b', 'desk/incoming') && git('add', '-A') && git('commit', '-q', '-m', 'Desk: this week\'s incoming shards'))) return null;
    const status = spawnSync(process.execPath, [join(root, 'bin', 'sluice.js'), 'check', 'policies/newsroom.yaml', '--base', 'main', '--no-cache', '--markdown', join(demo, 'comparison.md')], { cwd: repo, stdio: ['ignore', 'pipe', 'inherit'], encoding: 'utf8' });
    // The report itself is the one above: show only the comparison.
    const out = status.stdout ?? '';
    const at = out.indexOf('Against base');
    process.stdout.write(at >= 0 ? out.slice(at) : out);
    return status.status;
  } finally {
    rmSync(repo, { recursive: true, force: true });
  }
}
