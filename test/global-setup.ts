// Tests that run the CLI or the Action run the built bundles in dist/, as users do;
// build them once before the suite so they always match the source.
import { execFileSync } from 'node:child_process';

export default function setup(): void {
  execFileSync(process.execPath, ['scripts/build.mjs'], { stdio: 'inherit' });
}
