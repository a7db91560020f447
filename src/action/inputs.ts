// The one place that knows how the runner hands the Action its inputs and context
// (INPUT_* variables, GITHUB_* variables, the event payload file) and turns them
// into a typed settings object. Everything else takes these plain values.
import { readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ConfigError } from '../core/check.js';

export type CommentMode = 'always' | 'on-change' | 'on-failure' | 'never';
export type FailOn = 'error' | 'warn' | 'never';

const COMMENT_MODES: readonly CommentMode[] = ['always', 'on-change', 'on-failure', 'never'];
const FAIL_ON: readonly FailOn[] = ['error', 'warn', 'never'];

/** GitHub's public API, used when the runner does not say otherwise (GitHub Enterprise sets GITHUB_API_URL). */
const DEFAULT_API_URL = 'https://api.github.com';
const DEFAULT_SERVER_URL = 'https://github.com';

export interface PullRequestContext {
  number: number;
  baseSha: string;
  baseRef: string;
  headSha: string;
}

export interface ActionSettings {
  /** Policy files, absolute. */
  policies: string[];
  /** The bundle worker threads start from (the entry point's own file); shards are measured in this thread without it. */
  workerEntry?: string;
  /** The `workers` input: threads measuring shards, or null for the default (by the work, up to the cores). */
  workers: number | null;
  token: string;
  /** The `base` input, when set: a ref or commit to compare against instead of the PR's base. */
  base: string | null;
  comment: CommentMode;
  failOn: FailOn;
  /** The `partition` input (`I/N`): scan that share of the shards and write a partial result per policy instead of judging; null: judge. */
  partition: { index: number; count: number } | null;
  /** The `parts` input: patterns (relative to the workspace) of partial results from `sluice scan --partition` jobs whose shard results are taken instead of measuring; empty: measure here. */
  parts: string[];
  /** Absolute directory the JSON and Markdown reports are written to. */
  reportDir: string;
  cache: boolean;
  /** The checked-out repository (GITHUB_WORKSPACE); report paths are relative to it. */
  workspace: string;
  eventName: string;
  /** Set on pull_request and pull_request_target events. */
  pullRequest: PullRequestContext | null;
  repository: { owner: string; repo: string } | null;
  sha: string;
  serverUrl: string;
  apiUrl: string;
  /** Where the persistent result cache lives on the runner. */
  cacheDir: string;
  /** The job summary file, if the runner provides one. */
  summaryFile: string | null;
  /** Runner OS, part of the cache key (paths differ between systems). */
  runnerOs: string;
}

/** Returns the value of an Action input as the runner passes it (INPUT_ + the name upper-cased, spaces as underscores, dashes kept), trimmed. */
export function inputOf(env: NodeJS.ProcessEnv, name: string): string {
  return (env[`INPUT_${name.replace(/ /g, '_').toUpperCase()}`] ?? '').trim();
}

function oneOf<T extends string>(env: NodeJS.ProcessEnv, name: string, allowed: readonly T[], fallback: T): T {
  const value = inputOf(env, name) || fallback;
  if (!(allowed as readonly string[]).includes(value)) {
    throw new ConfigError(`input \`${name}\`: \`${value}\` is not one of ${allowed.map((a) => `\`${a}\``).join(', ')}`);
  }
  return value as T;
}

function booleanInput(env: NodeJS.ProcessEnv, name: string, fallback: boolean): boolean {
  const value = inputOf(env, name).toLowerCase();
  if (value === '') return fallback;
  // The spellings YAML 1.2 core schema takes as booleans, as @actions/core's getBooleanInput does.
  if (value === 'true') return true;
  if (value === 'false') return false;
  throw new ConfigError(`input \`${name}\`: \`${inputOf(env, name)}\` is not \`true\` or \`false\``);
}

function partitionInput(env: NodeJS.ProcessEnv): { index: number; count: number } | null {
  const value = inputOf(env, 'partition');
  if (value === '') return null;
  const m = /^(\d+)\s*\/\s*(\d+)$/.exec(value);
  const [index, count] = m ? [Number(m[1]), Number(m[2])] : [0, 0];
  if (!m || count < 1 || index < 1 || index > count) throw new ConfigError(`input \`partition\`: \`${value}\` is not I/N with 1 ≤ I ≤ N (e.g. \`3/8\`, from a matrix)`);
  return { index, count };
}

function workersInput(env: NodeJS.ProcessEnv): number | null {
  const value = inputOf(env, 'workers');
  if (value === '') return null;
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1) throw new ConfigError(`input \`workers\`: \`${value}\` is not a whole number of at least 1 (leave it empty for the default)`);
  return n;
}

/** Returns the pull request the event is about, or null for other events; throws ConfigError when a PR event's payload lacks what a comparison needs. */
export function pullRequestOf(eventName: string, payload: unknown): PullRequestContext | null {
  if (eventName !== 'pull_request' && eventName !== 'pull_request_target') return null;
  const pr = (payload as { pull_request?: Record<string, unknown> } | null)?.pull_request;
  const base = pr?.['base'] as { sha?: unknown; ref?: unknown } | undefined;
  const head = pr?.['head'] as { sha?: unknown } | undefined;
  const number = pr?.['number'] ?? (payload as { number?: unknown } | null)?.number;
  if (typeof number !== 'number' || typeof base?.sha !== 'string' || typeof head?.sha !== 'string') {
    throw new ConfigError(`the ${eventName} event payload has no pull_request.number, pull_request.base.sha and pull_request.head.sha`);
  }
  return { number, baseSha: base.sha, baseRef: typeof base.ref === 'string' ? base.ref : base.sha.slice(0, 7), headSha: head.sha };
}

/** Returns the Action's settings from the runner's environment; throws ConfigError naming the input or variable that is wrong. */
export function settingsFromEnv(env: NodeJS.ProcessEnv): ActionSettings {
  const workspace = path.resolve(env['GITHUB_WORKSPACE'] || process.cwd());
  const policies = (inputOf(env, 'policy') || 'sluice.yaml')
    .split(/\r?\n/)
    .map((p) => p.trim())
    .filter((p) => p !== '')
    .map((p) => path.resolve(workspace, p));
  if (policies.length === 0) throw new ConfigError('input `policy`: no policy file given');

  const eventName = env['GITHUB_EVENT_NAME'] ?? '';
  let payload: unknown = null;
  const eventPath = env['GITHUB_EVENT_PATH'];
  if (eventPath) {
    try {
      payload = JSON.parse(readFileSync(eventPath, 'utf8'));
    } catch (err) {
      throw new ConfigError(`GITHUB_EVENT_PATH ${eventPath}: cannot read the event payload: ${(err as Error).message}`);
    }
  }

  if (inputOf(env, 'partition') !== '' && inputOf(env, 'parts') !== '') {
    throw new ConfigError('inputs `partition` and `parts` go to different jobs: the scan jobs of a matrix take `partition`, the final job that judges takes their `parts`');
  }

  const [owner, repo] = (env['GITHUB_REPOSITORY'] ?? '').split('/');
  const runnerTemp = env['RUNNER_TEMP'] || tmpdir();
  return {
    policies,
    token: inputOf(env, 'github-token'),
    base: inputOf(env, 'base') || null,
    comment: oneOf(env, 'comment', COMMENT_MODES, 'on-change'),
    failOn: oneOf(env, 'fail-on', FAIL_ON, 'error'),
    partition: partitionInput(env),
    parts: inputOf(env, 'parts')
      .split(/\r?\n/)
      .map((p) => p.trim())
      .filter((p) => p !== ''),
    reportDir: path.resolve(workspace, inputOf(env, 'report-dir') || 'sluice-report'),
    cache: booleanInput(env, 'cache', true),
    workers: workersInput(env),
    workspace,
    eventName,
    pullRequest: pullRequestOf(eventName, payload),
    repository: owner && repo ? { owner, repo } : null,
    sha: env['GITHUB_SHA'] ?? '',
    serverUrl: (env['GITHUB_SERVER_URL'] || DEFAULT_SERVER_URL).replace(/\/+$/, ''),
    apiUrl: (env['GITHUB_API_URL'] || DEFAULT_API_URL).replace(/\/+$/, ''),
    cacheDir: path.join(runnerTemp, 'sluice-results'),
    summaryFile: env['GITHUB_STEP_SUMMARY'] || null,
    runnerOs: env['RUNNER_OS'] ?? process.platform,
  };
}
