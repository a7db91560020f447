// `sluice` on the command line: parse arguments, call the core, print, exit.
import { writeFile } from 'node:fs/promises';
import { ConfigError, runCheck, type Progress } from '../core/check.js';
import { TOOL_VERSION } from '../judge/report.js';
import { renderJson } from '../render/json.js';
import { renderMarkdown } from '../render/markdown.js';
import { renderTerminal } from '../render/terminal.js';
import { parseCli, USAGE, UsageError, type CheckCliOptions } from './options.js';

async function check(opts: CheckCliOptions): Promise<number> {
  const progress = progressPrinter();
  const reports = await runCheck({
    policies: opts.policies,
    cacheDir: opts.cacheDir,
    ...(opts.root !== undefined ? { root: opts.root } : {}),
    onProgress: progress.update,
    onWarning: (m) => process.stderr.write(`warning: ${m}\n`),
  });
  progress.clear();
  for (const report of reports) {
    process.stdout.write(opts.quiet ? `${report.headline}\n` : renderTerminal(report, { color: opts.color }));
  }
  const single = reports.length === 1;
  const suffixed = (file: string, name: string): string => (single ? file : file.replace(/(\.[^./]+)?$/, (ext) => `.${name}${ext}`));
  for (const report of reports) {
    if (opts.json) await writeFile(suffixed(opts.json, report.policy.name), renderJson(report));
    if (opts.markdown) await writeFile(suffixed(opts.markdown, report.policy.name), renderMarkdown(report));
  }
  return reports.some((r) => r.verdict === 'fail') ? 1 : 0;
}

// Progress on stderr, only on a terminal and only once a scan has run a second.
function progressPrinter(): { update: (p: Progress) => void; clear: () => void } {
  const tty = process.stderr.isTTY === true;
  let last = 0;
  let shown = false;
  return {
    update(p) {
      if (!tty || p.elapsedMs < 1000 || p.elapsedMs - last < 200) return;
      last = p.elapsedMs;
      shown = true;
      const rate = p.bytes / 1e6 / (p.elapsedMs / 1000);
      process.stderr.write(`\r\u001b[K${p.policy}: ${p.shardsDone}/${p.shards} shards, ${(p.bytes / 1e6).toFixed(1)} MB read, ${rate.toFixed(1)} MB/s`);
    },
    clear() {
      if (shown) process.stderr.write('\r\u001b[K');
    },
  };
}

async function main(): Promise<number> {
  try {
    const cmd = parseCli(process.argv.slice(2), process.env, process.stdout.isTTY === true);
    if (cmd.command === 'help') {
      process.stdout.write(USAGE);
      return 0;
    }
    if (cmd.command === 'version') {
      process.stdout.write(`${TOOL_VERSION}\n`);
      return 0;
    }
    return await check(cmd);
  } catch (err) {
    if (err instanceof UsageError || err instanceof ConfigError) {
      process.stderr.write(`sluice: ${err.message}\n`);
      return 2;
    }
    process.stderr.write(`sluice: internal error: ${(err as Error).stack ?? String(err)}\n`);
    return 2;
  }
}

process.exitCode = await main();
