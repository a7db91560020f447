// Tests that run the CLI or the Action run the built bundles in dist/, as users do;
// build them once before the suite so they always match the source. The demo
// corpus is generated here too, once, so tests running in parallel never see it
// half-written.
import { execFileSync } from 'node:child_process';

export default function setup(): void {
  execFileSync(process.execPath, ['scripts/build.mjs'], { stdio: 'inherit' });
  execFileSync(process.execPath, ['examples/newsroom/generate.mjs'], { stdio: 'ignore' });
}
