// action.yml is the Action's contract with the runner: every input and output
// documented with a default, the same table in README.md, and the defaults
// the settings fall back to equal to the ones action.yml declares.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import YAML from 'yaml';
import { settingsFromEnv } from '../../src/action/inputs.js';

interface ActionYml {
  inputs: Record<string, { description: string; default: string }>;
  outputs: Record<string, { description: string }>;
  runs: { using: string; main: string };
}
const action = YAML.parse(readFileSync('action.yml', 'utf8')) as ActionYml;
const docs = readFileSync('README.md', 'utf8');

describe('action.yml', () => {
  it('runs the bundle on node24 (GitHub-hosted runners; node20 is deprecated)', () => {
    expect(action.runs).toEqual({ using: 'node24', main: 'dist/index.js' });
  });

  it('documents every input with a description and a default, and README.md lists the same', () => {
    expect(Object.keys(action.inputs)).toEqual(['policy', 'github-token', 'base', 'comment', 'fail-on', 'report-dir', 'cache', 'workers', 'partition', 'parts']);
    for (const [name, input] of Object.entries(action.inputs)) {
      expect(input.description.length, name).toBeGreaterThan(20);
      expect(typeof input.default, name).toBe('string');
      const row = docs.split('\n').find((l) => l.startsWith(`| \`${name}\` |`));
      expect(row, name).toBeDefined();
      expect(row!.split(' | ')[1], name).toBe(input.default === '' ? '*(empty)*' : `\`${input.default}\``);
    }
  });

  it('documents every output the run sets', () => {
    expect(Object.keys(action.outputs)).toEqual(['verdict', 'report', 'failed-rules', 'warned-rules', 'parts']);
    for (const name of Object.keys(action.outputs)) expect(docs).toContain(`| \`${name}\` |`);
  });

  it('falls back to the defaults action.yml declares when the runner passes an input empty', () => {
    const workspace = path.resolve('/tmp/ws');
    const withDefaults: NodeJS.ProcessEnv = { GITHUB_WORKSPACE: workspace };
    for (const [name, input] of Object.entries(action.inputs)) if (name !== 'github-token') withDefaults[`INPUT_${name.toUpperCase()}`] = input.default;
    const empty = settingsFromEnv({ GITHUB_WORKSPACE: workspace });
    const declared = settingsFromEnv(withDefaults);
    expect(empty).toEqual(declared);
    expect(declared).toMatchObject({ policies: [path.join(workspace, 'sluice.yaml')], comment: 'on-change', failOn: 'error', cache: true, base: null, reportDir: path.join(workspace, 'sluice-report'), workers: null });
  });

  it('takes a worker count, and names the input when it is not a whole number of at least 1', () => {
    expect(settingsFromEnv({ GITHUB_WORKSPACE: '/tmp/ws', INPUT_WORKERS: ' 3 ' }).workers).toBe(3);
    for (const bad of ['0', '2.5', 'four', '-1']) {
      expect(() => settingsFromEnv({ GITHUB_WORKSPACE: '/tmp/ws', INPUT_WORKERS: bad }), bad).toThrow(/input `workers`/);
    }
  });
});
