// Runs the built CLI (dist/cli.js through bin/sluice.js) as users do, and reads
// what it wrote.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { Report } from '../../src/judge/types.js';

export const REPO = resolve(__dirname, '..', '..');
export const BIN = join(REPO, 'bin', 'sluice.js');

export interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
  report?: Report;
}

/** Runs `sluice` with arguments; with `json`, adds --json and parses the report. */
export function sluice(args: string[], opts: { cwd?: string; json?: boolean; env?: NodeJS.ProcessEnv } = {}): CliRun {
  const dir = mkdtempSync(join(tmpdir(), 'sluice-out-'));
  const jsonFile = join(dir, 'report.json');
  const full = opts.json ? [...args, '--json', jsonFile] : args;
  const r = spawnSync(process.execPath, [BIN, ...full], {
    cwd: opts.cwd ?? REPO,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', ...opts.env },
    maxBuffer: 64 * 1024 * 1024,
  });
  const run: CliRun = { status: r.status, stdout: r.stdout, stderr: r.stderr };
  if (opts.json) {
    try {
      run.report = JSON.parse(readFileSync(jsonFile, 'utf8')) as Report;
    } catch {
      // no report written (exit 2): the caller asserts on status and stderr
    }
  }
  return run;
}

/** Makes a temporary corpus directory with the given files (strings, Buffers; `.gz` names given as plain text are gzipped). */
export function corpus(files: Record<string, string | Buffer>): string {
  const root = mkdtempSync(join(tmpdir(), 'sluice-corpus-'));
  for (const [name, content] of Object.entries(files)) {
    const path = join(root, name);
    mkdirSync(dirname(path), { recursive: true });
    const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
    writeFileSync(path, name.endsWith('.gz') && typeof content === 'string' ? gzipSync(bytes) : bytes);
  }
  return root;
}

/** A small policy over `data/**` with English and Hindi, as YAML text. */
export function policyYaml(extra = ''): string {
  return `version: 1
name: t
root: .
corpus:
  include: ["data/**/*"]
languages:
  eng: { scripts: [Latin], target: 0.5 }
  hin: { scripts: [Devanagari], target: 0.5 }
rules:
  mix: { unit: words, tolerance: 0.5 }
${extra}`;
}

export const ENGLISH = 'The district council met on Monday to approve a new budget for the roads and the public library.';
export const HINDI = 'नगर परिषद ने सोमवार को सड़कों और सार्वजनिक पुस्तकालय के लिए नए बजट को मंज़ूरी दी।';
