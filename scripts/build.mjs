// Builds the committed bundles in dist/: cli.js (the CLI, dependencies bundled but for the
// tokenizers' rank data) and index.js with dist/chunks/ (the GitHub Action: self-contained, as
// runners need).
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
  // Self-contained (runners have no node_modules), with what only some runs need split into
  // dist/chunks/, loaded on first use: the builtin tokenizers' rank data (about 6 MB, each run
  // needs one at most, and only when it measures a document), the Hugging Face tokenizer
  // library and the file lister. One file held all of them: its start took 227 against 204 ms
  // (`node dist/index.js` with no inputs, medians of 12 alternating runs). The chunks' names
  // carry a hash of their content, so the old ones are removed first.
  fs.rmSync('dist/chunks', { recursive: true, force: true });
  await build({ ...common, entryPoints: { index: 'src/action/main.ts' }, outdir: 'dist', splitting: true, chunkNames: 'chunks/[name]-[hash]' });
}
