// Shared by the Action tests: a temporary git repository holding a small corpus,
// a loopback HTTP server standing in for GitHub's REST API, and a runner that
// starts the built dist/index.js with the environment a GitHub runner gives it.
import { execFileSync, spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';

export const BUNDLE = path.resolve('dist/index.js');

// ---- Invented newsroom text (Sangam Samachar, Nadipur) ----------------------

const EN_WORDS = (
  'the ward council in Nadipur met on Monday to discuss the new bridge over the Sarjani river while farmers from nearby villages ' +
  'asked for better prices for wheat and paddy at the market the school board announced that the annual sports day will be held ' +
  'next month and the cricket club of the old city won its third match of the season after a long rain delay residents complained ' +
  'about water supply in the eastern wards and officials promised repairs before the festival the hospital opened a new clinic'
).split(' ');
const HI_WORDS = (
  'नदीपुर के वार्ड परिषद ने सोमवार को सरजनी नदी पर नए पुल के बारे में चर्चा की और आसपास के गांवों से आए किसानों ने मंडी में गेहूं और धान के ' +
  'बेहतर दाम मांगे स्कूल बोर्ड ने घोषणा की कि वार्षिक खेल दिवस अगले महीने होगा और पुराने शहर के क्रिकेट क्लब ने बारिश के बाद सत्र का तीसरा मैच ' +
  'जीता पूर्वी वार्डों के निवासियों ने पानी की आपूर्ति की शिकायत की और अधिकारियों ने त्योहार से पहले मरम्मत का वादा किया अस्पताल ने नया क्लिनिक खोला'
).split(' ');

/** A deterministic PRNG (mulberry32), so fixtures are the same on every run. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Returns `n` JSONL lines of invented stories in one language, different for each seed. */
export function stories(lang: 'eng' | 'hin', n: number, seed: number, words = 40): string {
  const rand = prng(seed);
  const pool = lang === 'eng' ? EN_WORDS : HI_WORDS;
  const lines: string[] = [];
  for (let i = 0; i < n; i++) {
    const text = Array.from({ length: words }, () => pool[Math.floor(rand() * pool.length)]!).join(' ');
    lines.push(JSON.stringify({ text: `${text} ${lang === 'eng' ? 'story' : 'खबर'} ${seed}-${i}.`, lang }));
  }
  return `${lines.join('\n')}\n`;
}

// ---- A git repository -------------------------------------------------------

export interface Repo {
  dir: string;
  write(rel: string, text: string): void;
  /** Commits everything and returns the commit id. */
  commit(message: string): string;
  git(...args: string[]): string;
}

/** Returns a fresh git repository in a temporary directory. */
export function makeRepo(): Repo {
  const dir = mkdtempSync(path.join(tmpdir(), 'sluice-action-'));
  const git = (...args: string[]): string => execFileSync('git', args, { cwd: dir, encoding: 'utf8', env: { ...process.env, GIT_CONFIG_NOSYSTEM: '1' } });
  git('init', '-q', '-b', 'main');
  git('config', 'user.email', 'desk@sangam.invalid');
  git('config', 'user.name', 'Sangam Desk');
  git('config', 'commit.gpgsign', 'false');
  return {
    dir,
    write(rel, text) {
      mkdirSync(path.dirname(path.join(dir, rel)), { recursive: true });
      writeFileSync(path.join(dir, rel), text);
    },
    commit(message) {
      git('add', '-A');
      git('commit', '-q', '--allow-empty', '-m', message);
      return git('rev-parse', 'HEAD').trim();
    },
    git,
  };
}

/** A policy for the test corpus: Hindi and English, mix by words, no tokenizer (fast). */
export function policyYaml(opts: { mixSeverity?: 'error' | 'warn'; duplicates?: boolean; extraRules?: string } = {}): string {
  return [
    'version: 1',
    'name: newsroom',
    'corpus:',
    '  include: ["data/**/*.jsonl"]',
    '  text: text',
    '  declared-language: lang',
    'languages:',
    '  hin: { scripts: [Devanagari], target: 0.5 }',
    '  eng: { scripts: [Latin], target: 0.5 }',
    'rules:',
    '  input: { max-rejected: 0.0, max-broken-shards: 0 }',
    '  mix: { unit: words, tolerance: 0.1 }',
    '  encoding: { max-anomalous-docs: 0.0, forbid: [bidi-controls, replacement-char, control-chars] }',
    ...(opts.duplicates ? ['  duplicates: { max-exact: 0.5, near: { threshold: 0.8, max: 0.5 } }'] : []),
    ...(opts.extraRules ? [opts.extraRules] : []),
    'severity:',
    `  mix: ${opts.mixSeverity ?? 'error'}`,
    '',
  ].join('\n');
}

// ---- A stand-in for GitHub's REST API ----------------------------------------

export interface RecordedRequest {
  method: string;
  url: string;
  body: unknown;
  authorization: string | undefined;
}

export interface FakeGitHub {
  url: string;
  requests: RecordedRequest[];
  comments: Array<{ id: number; body: string; user: { type: string } }>;
  /** HTTP status to answer creating and editing comments with, instead of success. */
  denyWrites: number | null;
  close(): Promise<void>;
}

/** Returns a loopback HTTP server answering the issue-comment calls the Action makes, recording each. */
export async function fakeGitHub(): Promise<FakeGitHub> {
  const state: FakeGitHub = { url: '', requests: [], comments: [], denyWrites: null, close: async () => {} };
  let nextId = 1000;
  const send = (res: ServerResponse, status: number, body: unknown): void => {
    res.writeHead(status, { 'content-type': 'application/json' });
    res.end(JSON.stringify(body));
  };
  const server = createServer((req: IncomingMessage, res: ServerResponse) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => {
      const raw = Buffer.concat(chunks).toString();
      const body = raw ? (JSON.parse(raw) as { body?: string }) : null;
      state.requests.push({ method: req.method!, url: req.url!, body, authorization: req.headers.authorization });
      const url = new URL(req.url!, 'http://x');
      const list = /^\/repos\/([^/]+)\/([^/]+)\/issues\/(\d+)\/comments$/.exec(url.pathname);
      const edit = /^\/repos\/([^/]+)\/([^/]+)\/issues\/comments\/(\d+)$/.exec(url.pathname);
      const shown = (c: FakeGitHub['comments'][number]) => ({ ...c, html_url: `https://github.invalid/c/${c.id}` });
      if (list && req.method === 'GET') return send(res, 200, state.comments.map(shown));
      if ((list && req.method === 'POST') || (edit && req.method === 'PATCH')) {
        if (state.denyWrites !== null) return send(res, state.denyWrites, { message: 'Resource not accessible by integration' });
        if (list) {
          const c = { id: nextId++, body: body!.body!, user: { type: 'Bot' } };
          state.comments.push(c);
          return send(res, 201, shown(c));
        }
        const c = state.comments.find((x) => x.id === Number(edit![3]));
        if (!c) return send(res, 404, { message: 'Not Found' });
        c.body = body!.body!;
        return send(res, 200, shown(c));
      }
      send(res, 404, { message: 'Not Found' });
    });
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  state.url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  state.close = () => new Promise<void>((resolve) => server.close(() => resolve()));
  return state;
}

// ---- Running the Action ------------------------------------------------------

export interface RunResult {
  code: number | null;
  stdout: string;
  stderr: string;
  outputs: Record<string, string>;
  summary: string;
  /** The JSON report of the (first) policy. */
  report: { verdict: string; timing: { cacheHits: number; cacheMisses: number }; [k: string]: unknown };
  reportDir: string;
}

export interface RunOptions {
  repo: Repo;
  event: 'pull_request' | 'push';
  inputs?: Record<string, string>;
  api?: FakeGitHub;
  /** Directory RUNNER_TEMP points at (the shard cache lives there); a fresh one when omitted. */
  runnerTemp?: string;
  pr?: { number: number; baseSha: string; headSha: string };
}

/** Runs dist/index.js as the runner would, and returns its exit status, log, outputs, summary and report. */
export async function runBundle(o: RunOptions): Promise<RunResult> {
  const work = mkdtempSync(path.join(tmpdir(), 'sluice-runner-'));
  const eventPath = path.join(work, 'event.json');
  const outputFile = path.join(work, 'output');
  const summaryFile = path.join(work, 'summary.md');
  writeFileSync(outputFile, '');
  writeFileSync(summaryFile, '');
  const headSha = o.repo.git('rev-parse', 'HEAD').trim();
  const payload =
    o.event === 'pull_request'
      ? { number: o.pr!.number, pull_request: { number: o.pr!.number, base: { sha: o.pr!.baseSha, ref: 'main' }, head: { sha: o.pr!.headSha, ref: 'desk/update' } } }
      : { ref: 'refs/heads/main', after: headSha };
  writeFileSync(eventPath, JSON.stringify(payload));
  const reportDir = path.join(work, 'report');
  const inputs = { policy: 'policies/newsroom.yaml', 'github-token': 'test-token', 'report-dir': reportDir, ...o.inputs };
  const env: NodeJS.ProcessEnv = {
    PATH: process.env['PATH'],
    HOME: process.env['HOME'],
    GITHUB_ACTIONS: 'true',
    GITHUB_EVENT_NAME: o.event,
    GITHUB_EVENT_PATH: eventPath,
    GITHUB_REPOSITORY: 'sangam/newsroom-corpus',
    GITHUB_SHA: headSha,
    GITHUB_WORKSPACE: o.repo.dir,
    GITHUB_SERVER_URL: 'https://github.invalid',
    GITHUB_API_URL: o.api?.url ?? 'http://127.0.0.1:9',
    GITHUB_OUTPUT: outputFile,
    GITHUB_STEP_SUMMARY: summaryFile,
    RUNNER_TEMP: o.runnerTemp ?? mkdtempSync(path.join(tmpdir(), 'sluice-temp-')),
    RUNNER_OS: 'Linux',
  };
  // The runner's contract: INPUT_ + the name upper-cased, dashes kept.
  for (const [k, v] of Object.entries(inputs)) env[`INPUT_${k.toUpperCase()}`] = v;
  const child = spawn(process.execPath, [BUNDLE], { cwd: o.repo.dir, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (c: Buffer) => (stdout += c.toString()));
  child.stderr.on('data', (c: Buffer) => (stderr += c.toString()));
  const code = await new Promise<number | null>((resolve) => child.on('close', resolve));
  let report: RunResult['report'];
  try {
    report = JSON.parse(readFileSync(path.join(reportDir, 'newsroom.json'), 'utf8')) as RunResult['report'];
  } catch {
    report = { verdict: 'none', timing: { cacheHits: -1, cacheMisses: -1 } };
  }
  return { code, stdout, stderr, outputs: parseOutputs(readFileSync(outputFile, 'utf8')), summary: readFileSync(summaryFile, 'utf8'), report, reportDir };
}

/** Returns the outputs written to GITHUB_OUTPUT (`name<<delimiter` blocks, as @actions/core writes them). */
export function parseOutputs(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const m = /^([^<=]+)<<(.+)$/.exec(lines[i]!);
    if (!m) continue;
    const end = lines.indexOf(m[2]!, i + 1);
    out[m[1]!] = lines.slice(i + 1, end).join('\n');
    i = end;
  }
  return out;
}

/** Returns a repository whose first commit holds the policy and `shardsPerLanguage` Hindi and English shards of 10 stories each. */
export function newsroomRepo(shardsPerLanguage = 3, policy = policyYaml()): { repo: Repo; base: string } {
  const repo = makeRepo();
  repo.write('policies/newsroom.yaml', policy);
  for (let i = 0; i < shardsPerLanguage; i++) {
    repo.write(`data/eng/eng-${String(i).padStart(3, '0')}.jsonl`, stories('eng', 10, i));
    repo.write(`data/hin/hin-${String(i).padStart(3, '0')}.jsonl`, stories('hin', 10, 1000 + i));
  }
  return { repo, base: repo.commit('Archive as of the base branch') };
}

/** Annotation commands (`::error file=…::`) in a runner log. */
export function annotationLines(stdout: string, kind: 'error' | 'warning'): string[] {
  return stdout.split('\n').filter((l) => l.startsWith(`::${kind} `) || l.startsWith(`::${kind}::`));
}
