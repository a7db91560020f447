// Builds the committed bundles in dist/: cli.js (dependencies left to node_modules)
// and index.js (the GitHub Action: one self-contained file, as runners need).
import { build } from 'esbuild';

const common = {
  bundle: true,
  platform: 'node',
  target: 'node20',
  format: 'esm',
  legalComments: 'none',
  logLevel: 'warning',
  // Bundled CommonJS dependencies call require(); give ESM output one.
  banner: { js: "import { createRequire as __sluiceCreateRequire } from 'node:module'; const require = __sluiceCreateRequire(import.meta.url);" },
};

await build({ ...common, entryPoints: ['src/cli/main.ts'], outfile: 'dist/cli.js', packages: 'external' });
if (process.argv.includes('--cli-only')) process.exit(0);
const fs = await import('node:fs');
if (fs.existsSync('src/action/main.ts')) {
  await build({ ...common, entryPoints: ['src/action/main.ts'], outfile: 'dist/index.js' });
}
