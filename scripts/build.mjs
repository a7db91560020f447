// Builds the committed bundles in dist/: cli.js (the CLI, dependencies bundled but for the
// tokenizers' rank data) and index.js (the GitHub Action: one self-contained file, as runners need).
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

// The CLI bundles its dependencies too, all but the builtin tokenizers' rank modules (a few MB
// each, imported only when a policy names one): one file to load instead of some hundred
// resolved and read from node_modules, on the main thread and again on every worker
// (`sluice --version`: 111 against 133 ms, medians of 12 alternating runs).
await build({ ...common, entryPoints: ['src/cli/main.ts'], outfile: 'dist/cli.js', external: ['js-tiktoken/ranks/*'] });
if (process.argv.includes('--cli-only')) process.exit(0);
const fs = await import('node:fs');
if (fs.existsSync('src/action/main.ts')) {
  await build({ ...common, entryPoints: ['src/action/main.ts'], outfile: 'dist/index.js' });
}
