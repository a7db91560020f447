// One run of the Action: judge each policy (against base on a pull request, the
// whole corpus otherwise), write the reports, the job summary, the PR comment and
// the file annotations, keep the shard cache, and say whether the step fails.
import { createHash } from 'node:crypto';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { ConfigError, loadPolicyOrThrow, measureCorpus, repeatSuffixes, type CheckOptions } from '../core/check.js';
import { maxWorkers } from '../core/pool.js';
import { baseMemoKey, compareWithBase, git, gitTopLevel, resolveCommit, rootInRepo, workingTreeKeys, writeBaseMemo } from '../core/compare.js';
import type { Comparison } from '../judge/comparison.js';
import { buildReport } from '../judge/report.js';
import type { Report, Verdict } from '../judge/types.js';
import type { Policy } from '../policy/types.js';
import { renderJson } from '../render/json.js';
import { makeDirectory } from '../results/cache.js';
import { contentIdOf } from '../results/scan.js';
import { TOOL_VERSION } from '../version.js';
import { annotationsOf, capAnnotations, type Annotation } from './annotations.js';
import { readParts, seededLine, seedFromParts } from '../core/parts.js';
import { scanPartition } from '../core/partition.js';
import { partialToJson } from '../results/partition.js';
import { pruneResults, restoreResults, saveResults } from './cache.js';
import { upsertComment } from './comment.js';
import type { ActionSettings } from './inputs.js';
import { commentBody, commentMarker, renderActionMarkdown, summaryBody } from './markdown.js';
import type { ActionIO } from './runner.js';
import { writeSummary } from './summary.js';
import { codePath, escapeMarkdown } from '../render/escape.js';

/** Bump when the layout of the saved cache changes, so old entries are not restored. */
const CACHE_LAYOUT = 1;

export interface ActionOutcome {
  verdict: Verdict;
  /** The message the step fails with, or null when it passes under `fail-on`. */
  failure: string | null;
  /** Paths of the JSON reports, one per policy. */
  reports: string[];
}

interface Judged {
  policy: Policy;
  report: Report;
  comparison: Comparison | null;
  /** Policy root relative to the repository top (for annotations and links). */
  rootRel: string;
  baseBlobReads: number;
}

const RANK: Record<Verdict, number> = { pass: 0, warn: 1, fail: 2 };

/** Returns a file-name-safe form of a policy name. */
function fileNameOf(name: string): string {
  return name.replace(/[^A-Za-z0-9._-]/g, '_') || 'policy';
}

function ruleNames(reports: Report[], verdict: Verdict): string {
  const names = new Set<string>();
  for (const r of reports) for (const o of r.rules) if (o.verdict === verdict) names.add(o.scope === 'corpus' ? o.rule : `${o.rule}:${o.scope.replace(/^language:/, '')}`);
  return [...names].join(',');
}

/** Returns the failure message under `fail-on`, or null. */
export function failureOf(failOn: ActionSettings['failOn'], reports: Report[]): string | null {
  if (failOn === 'never') return null;
  const failing = reports.filter((r) => r.verdict === 'fail' || (failOn === 'warn' && r.verdict === 'warn'));
  if (failing.length === 0) return null;
  return failing.map((r) => `sluice ${r.policy.name}: ${r.headline}`).join('\n');
}

/** Returns the outcome of the run; throws ConfigError when a policy cannot be judged. */
export async function runAction(s: ActionSettings, io: ActionIO): Promise<ActionOutcome> {
  const spent = { error: 0, warning: 0 };
  const warn = (m: string): void => {
    spent.warning += 1;
    io.warning(m);
  };
  const policies: Policy[] = [];
  for (const file of s.policies) policies.push(await loadPolicyOrThrow(file, undefined, (m) => warn(`sluice: ${m}`)));

  const top = await gitTopLevel(s.workspace);
  const pr = s.pullRequest;
  const baseRef = s.base ?? pr?.baseSha ?? null;
  let base: { commit: string; label: string } | null = null;
  if (baseRef !== null) {
    if (!top) throw new ConfigError(`a base comparison needs a git checkout, and ${s.workspace} is not in a git work tree`);
    const commit = await resolveCommit(top, baseRef);
    base = { commit, label: s.base ?? pr?.baseRef ?? commit.slice(0, 7) };
  }
  if (s.eventName === 'pull_request_target' && top && pr) {
    const head = (await git(top, ['rev-parse', 'HEAD']).catch(() => '')).trim();
    if (head === pr.headSha) {
      warn('sluice: this pull_request_target run has the pull request\'s head checked out: its files run with a write token and the repository\'s secrets. Use the pull_request event (see the Action\'s documentation).');
    }
  }

  // The cache directory: kept between runs when asked, else a scratch one so base and head still share results within the run.
  const policyHash = createHash('sha256').update(TOOL_VERSION);
  for (const p of policies) policyHash.update(p.file).update('\0').update(await readFile(p.file));
  const keyPrefix = `sluice-results-${CACHE_LAYOUT}-${s.runnerOs}-`;
  // A partition's scan job keeps a cache of its own share (the other jobs keep theirs).
  const share = s.partition ? `part${s.partition.index}of${s.partition.count}-` : '';
  const cacheKey = `${keyPrefix}${policyHash.digest('hex').slice(0, 16)}-${share}${s.sha || 'local'}`;
  const cacheDir = s.cache ? s.cacheDir : await mkdtemp(path.join(tmpdir(), 'sluice-results-'));
  await makeDirectory(cacheDir);
  // A limit changed in the policy does not change what is measured: fall back to any entry (results carry their own settings id).
  const restored = s.cache ? await restoreResults(cacheDir, cacheKey, [cacheKey.slice(0, cacheKey.lastIndexOf('-') + 1), keyPrefix], io.info, warn) : undefined;

  // Shard results the scan jobs of a fan-out measured, put where the measuring steps look first.
  const parts = s.parts.length > 0 ? await readParts(s.parts, s.workspace, 'input `parts`') : null;
  if (parts && !top) throw new ConfigError(`input \`parts\` needs a git checkout (results are matched to shards by git blob id), and ${s.workspace} is not in a git work tree`);

  const usedKeys = new Set<string>();
  const usedSettings = new Set<string>();
  const check: CheckOptions = {
    policies: [],
    cacheDir,
    cwd: s.workspace,
    onWarning: (m) => warn(`sluice: ${m}`),
    ...(s.workerEntry ? { workerEntry: s.workerEntry } : {}),
    ...(s.workers !== null ? { workers: s.workers } : {}),
  };
  if (s.workers !== null && s.workers > maxWorkers()) warn(`sluice: input \`workers\` is ${s.workers}: measuring on ${maxWorkers()} threads, twice this runner's cores`);
  // A policy's working-tree shards keyed by blob id where git knows them (else by their bytes), each key recorded as used.
  const keysOf = async (policy: Policy): Promise<{ rootRel: string | null; contentKey: NonNullable<CheckOptions['contentKey']> }> => {
    const rootRel = top ? await rootInRepo(top, policy).catch(() => null) : null;
    const keyOf = top && rootRel !== null ? await workingTreeKeys(top, rootRel) : contentIdOf;
    return {
      rootRel,
      contentKey: async (ref) => {
        const k = await keyOf(ref);
        usedKeys.add(k);
        return k;
      },
    };
  };
  // Keeps the results this run used (and saves them when it measured something or restored another entry), or drops a scratch cache.
  const keepCache = async (measured: boolean, dropped: string): Promise<void> => {
    if (!s.cache) {
      await rm(cacheDir, { recursive: true, force: true });
      return;
    }
    const removed = await pruneResults(cacheDir, usedSettings, usedKeys);
    if (removed > 0) io.info(`sluice: dropped ${removed} cached results ${dropped}`);
    if (measured || restored !== cacheKey) await saveResults(cacheDir, cacheKey, io.info, warn);
  };
  const judged: Judged[] = [];
  await makeDirectory(s.reportDir);
  // One file stem per policy; two policies with one name get -2, -3, ...
  const suffixes = repeatSuffixes(policies.map((p) => p.name));
  const stems = policies.map((p, i) => path.join(s.reportDir, `${fileNameOf(p.name)}${suffixes[i]}`));

  if (s.partition) {
    // A scan job of a matrix: measure this share of each policy's shards and write the part; the final job judges.
    const { index, count } = s.partition;
    const written: string[] = [];
    const lines: string[] = [];
    let measured = false;
    for (const [i, policy] of policies.entries()) {
      const file = `${stems[i]!}.part-${index}-of-${count}.json`;
      await io.group(`sluice: ${policy.name}, partition ${index}/${count}`, async () => {
        const { contentKey } = await keysOf(policy);
        const { partial, fromCache } = await scanPartition(policy.file, index, count, { ...check, contentKey });
        usedSettings.add(partial.settingsId);
        await writeFile(file, partialToJson(partial));
        const docs = partial.results.reduce((n, r) => n + r.read.docs, 0);
        if (fromCache < partial.results.length) measured = true;
        io.info(`sluice ${policy.name}: partition ${index}/${count}: ${partial.results.length} of ${partial.shardsInCorpus} shards, ${docs} documents, ${fromCache} from cache → ${file}`);
        lines.push(`| ${escapeMarkdown(policy.name)} | ${partial.results.length} of ${partial.shardsInCorpus} | ${docs.toLocaleString('en-US')} | ${fromCache} | ${codePath(path.basename(file))} |`);
      });
      written.push(file);
    }
    await keepCache(measured, 'outside this partition');
    const summary = [`## sluice: partition ${index}/${count} scanned`, '', 'This job measures its share of the shards and judges nothing: the job given all parts (input `parts`) judges and comments.', '', '| policy | shards | documents | from cache | part |', '|---|---:|---:|---:|---|', ...lines].join('\n');
    if (!(await writeSummary(s.summaryFile, summary))) io.info('sluice: no GITHUB_STEP_SUMMARY for the partition summary');
    io.setOutput('parts', written.join('\n'));
    io.setOutput('verdict', '');
    return { verdict: 'pass', failure: null, reports: [] };
  }
  for (const [i, policy] of policies.entries()) {
    const stem = stems[i]!;
    judged.push(
      await io.group(`sluice: ${policy.name}`, async () => {
        if (parts && top) {
          io.info(seededLine(policy.name, await seedFromParts(policy, parts, top, await rootInRepo(top, policy), cacheDir, 'input `parts`')));
        }
        let j: Judged;
        if (base && top) {
          const r = await compareWithBase(policy, { check, top, baseCommit: base.commit, baseLabel: base.label, onKey: (k) => usedKeys.add(k) });
          for (const side of [r.head, r.base]) for (const sh of side?.corpus?.shards ?? []) usedSettings.add(sh.settingsId);
          j = { policy, report: r.head.report, comparison: r.comparison, rootRel: await rootInRepo(top, policy), baseBlobReads: r.baseBlobReads };
          await writeFile(`${stem}.base.json`, r.base ? renderJson(r.base.report) : 'null\n');
          await writeFile(`${stem}.comparison.json`, `${JSON.stringify(r.comparison, null, 2)}\n`);
        } else {
          const { rootRel, contentKey } = await keysOf(policy);
          const corpus = await measureCorpus(policy, { ...check, contentKey });
          for (const sh of corpus.shards) usedSettings.add(sh.settingsId);
          const settingsId = corpus.shards[0]?.settingsId;
          const report = buildReport(policy, corpus, s.workspace);
          // A judged commit is remembered, so pull requests based on it need not judge it again.
          if (top && settingsId && s.sha) {
            const key = await baseMemoKey(policy, settingsId, await resolveCommit(top, 'HEAD'));
            usedKeys.add(key);
            await writeBaseMemo(cacheDir, settingsId, key, report, corpus);
          }
          j = { policy, report, comparison: null, rootRel: rootRel ?? path.relative(s.workspace, policy.root).split(path.sep).join('/'), baseBlobReads: 0 };
        }
        const t = j.report.timing;
        io.info(`${j.report.headline}`);
        io.info(`measured ${t.cacheMisses} of ${j.report.input.shards} shards, ${t.cacheHits} from cache${j.comparison ? `; ${j.baseBlobReads} base shards read from git` : ''}`);
        return j;
      }),
    );
  }

  // Reports on disk: one JSON per policy (the output), plus its Markdown.
  const reportPaths: string[] = [];
  const markdowns: string[] = [];
  const annotations: Annotation[] = [];
  let commentWarned = false;
  for (const [i, j] of judged.entries()) {
    const stem = stems[i]!;
    await writeFile(`${stem}.json`, renderJson(j.report));
    reportPaths.push(`${stem}.json`);

    const headSha = pr?.headSha || s.sha;
    const linkBase =
      s.repository && headSha
        ? `${s.serverUrl}/${s.repository.owner}/${s.repository.repo}/blob/${headSha}${j.rootRel ? `/${j.rootRel.split('/').map(encodeURIComponent).join('/')}` : ''}`
        : undefined;
    const markdown = renderActionMarkdown(j.report, j.comparison, linkBase ? { linkBase } : {});
    await writeFile(`${stem}.md`, markdown);
    markdowns.push(markdown);

    const changed = new Set((j.comparison?.changes ?? []).filter((c) => c.status !== 'deleted').map((c) => c.path));
    annotations.push(...annotationsOf(j.report, j.rootRel, changed));

    if (pr && s.repository && s.comment !== 'never') {
      const c = j.comparison;
      const create =
        s.comment === 'always' ||
        (s.comment === 'on-failure' && j.report.verdict === 'fail') ||
        (s.comment === 'on-change' && (j.report.verdict !== 'pass' || (c !== null && (c.changes.length > 0 || c.flipped.length > 0))));
      if (!s.token) {
        if (!commentWarned) warn('sluice: no `github-token`: the pull request comment is skipped; the verdict and the job summary are unaffected');
        commentWarned = true;
        continue;
      }
      const outcome = await upsertComment({ apiUrl: s.apiUrl, token: s.token, owner: s.repository.owner, repo: s.repository.repo, issue: pr.number }, commentMarker(j.policy.name), commentBody(j.policy.name, markdown), create);
      if (outcome.action === 'failed') {
        if (!commentWarned) {
          const why = outcome.status === 403 || outcome.status === 404
            ? 'the token may not write to pull requests (a pull request from a fork gets a read-only token; see the permissions in the documentation)'
            : 'the GitHub API refused';
          warn(`sluice: could not comment on pull request #${pr.number} (${outcome.status ?? 'no response'}: ${outcome.message}): ${why}. The verdict and the job summary are unaffected.`);
        }
        commentWarned = true;
      } else if (outcome.action === 'not-needed') io.info(`sluice ${j.policy.name}: no comment needed (comment: ${s.comment})`);
      else io.info(`sluice ${j.policy.name}: comment ${outcome.action}: ${outcome.url}`);
    }
  }

  if (!(await writeSummary(s.summaryFile, summaryBody(markdowns)))) io.info('sluice: no GITHUB_STEP_SUMMARY; the Markdown report is in the report directory');

  const reports = judged.map((j) => j.report);
  const failure = failureOf(s.failOn, reports);
  // setFailed adds an error annotation of its own.
  const { shown, omitted } = capAnnotations(annotations, { error: spent.error + (failure ? 1 : 0), warning: spent.warning });
  for (const a of shown) io.annotate(a);
  if (omitted.error + omitted.warning > 0) {
    io.info(`sluice: ${omitted.error} more error and ${omitted.warning} more warning findings are not annotated (GitHub shows 10 of each per step); all are in the report`);
  }

  await keepCache(reports.some((r) => r.timing.cacheMisses > 0) || judged.some((j) => j.baseBlobReads > 0), 'no longer in the corpus');

  const verdict = reports.reduce<Verdict>((v, r) => (RANK[r.verdict] > RANK[v] ? r.verdict : v), 'pass');
  io.setOutput('verdict', verdict);
  io.setOutput('report', reportPaths.join('\n'));
  io.setOutput('failed-rules', ruleNames(reports, 'fail'));
  io.setOutput('warned-rules', ruleNames(reports, 'warn'));
  return { verdict, failure, reports: reportPaths };
}
