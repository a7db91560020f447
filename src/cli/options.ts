// The one place that turns command-line arguments into the typed options the
// core takes. Nothing else in the CLI reads argv.
import { parseArgs } from 'node:util';

export const USAGE = `sluice: a merge gate for the quality of multilingual training corpora

Usage:
  sluice check [--policy] FILE [FILE...] [options]   measure the corpus a policy names and judge it
  sluice scan --policy FILE --partition I/N --out PART.json [options]
                                                     measure partition I of N of the shards (one runner's share)
  sluice merge PART.json [PART.json...] --policy FILE [options]
                                                     merge every partition's result, join duplicates across them, judge

Options for check:
  -p, --policy FILE      policy file (YAML); repeat for several; positional files work too
      --json FILE        write the JSON report (schemas/report.schema.json) to FILE
      --markdown FILE    write the Markdown report to FILE
      --root DIR         judge the shards under DIR instead of the policy's root
      --base REF         also measure the corpus as git commit REF has it (a branch, tag or commit)
                         and compare: shards changed, mix shift, fertility change, duplicates the
                         change adds, rules that changed verdict (terminal and --markdown); the
                         verdict is the working tree's
      --comparison-json FILE   with --base, write the comparison as JSON to FILE
      --parts PATTERN    take each shard's result from the part files of \`sluice scan --partition\`
                         jobs that PATTERN matches (repeat for several), where the part names the
                         git blob this checkout has at its path; the rest are measured here
      --cache-dir DIR    where per-shard results are cached by content (default .sluice-cache)
      --no-cache         measure every shard again
      --workers N        threads measuring shards (default: one per 2 MB of compressed shards
                         to measure, up to the available cores)
      --split-mb N       with several workers, a shard holding at least N MB of text (and over a
                         quarter of a worker's share) is read once and measured in batches by all
                         of them (default 4; the results are the same either way, only the time changes)
      --color / --no-color   force colour on or off (default: on for a terminal, off when NO_COLOR is set)
  -q, --quiet            print only the verdict line
  -h, --help             this text
  -v, --version          the version

Exit status: 0 the gate passes (warnings allowed), 1 a rule at error severity failed,
2 the run could not be judged (bad policy, no shards matched, unreadable root).
`;

export interface CheckCliOptions {
  command: 'check';
  policies: string[];
  json?: string;
  markdown?: string;
  root?: string;
  cacheDir: string | null;
  color: boolean;
  quiet: boolean;
  workers?: number;
  /** Bytes of text (decompressed) from which a shard may be split into batches across the workers. */
  minSplitBytes?: number;
  /** A git ref to compare the working tree's corpus with. */
  base?: string;
  comparisonJson?: string;
  /** Patterns of part files whose shard results are taken instead of measuring. */
  parts?: string[];
}

export interface ScanCliOptions {
  command: 'scan';
  policy: string;
  partition: { index: number; count: number };
  out: string;
  root?: string;
  cacheDir: string | null;
  workers?: number;
  minSplitBytes?: number;
}

export interface MergeCliOptions extends Omit<CheckCliOptions, 'command' | 'policies' | 'base' | 'comparisonJson' | 'parts'> {
  command: 'merge';
  policy: string;
  parts: string[];
}

export type CliCommand = CheckCliOptions | ScanCliOptions | MergeCliOptions | { command: 'help' } | { command: 'version' };

/** An argument the CLI cannot use: exit code 2 with this message. */
export class UsageError extends Error {
  override name = 'UsageError';
}

/** Returns the command the arguments ask for. */
export function parseCli(argv: string[], env: NodeJS.ProcessEnv, isTTY: boolean): CliCommand {
  const [command, ...rest] = argv;
  // No command at all is a usage error, not a request for help: in a CI step, a gate that
  // exits 0 without judging anything would pass the merge unnoticed.
  if (command === undefined) throw new UsageError('no command given: use `sluice check`, `sluice scan` or `sluice merge`; try `sluice --help`');
  if (command === '-h' || command === '--help' || command === 'help') return { command: 'help' };
  if (command === '-v' || command === '--version') return { command: 'version' };
  if (command !== 'check' && command !== 'scan' && command !== 'merge') throw new UsageError(`unknown command \`${command}\`; try \`sluice --help\``);
  let parsed;
  try {
    parsed = parseArgs({
      args: rest,
      allowPositionals: true,
      options: {
        policy: { type: 'string', short: 'p', multiple: true },
        json: { type: 'string' },
        markdown: { type: 'string' },
        root: { type: 'string' },
        'cache-dir': { type: 'string' },
        'no-cache': { type: 'boolean' },
        color: { type: 'boolean' },
        'no-color': { type: 'boolean' },
        quiet: { type: 'boolean', short: 'q' },
        help: { type: 'boolean', short: 'h' },
        workers: { type: 'string' },
        'split-mb': { type: 'string' },
        partition: { type: 'string' },
        out: { type: 'string' },
        base: { type: 'string' },
        'comparison-json': { type: 'string' },
        parts: { type: 'string', multiple: true },
      },
    });
  } catch (err) {
    throw new UsageError(`${(err as Error).message}; try \`sluice --help\``);
  }
  const v = parsed.values;
  if (v.help) return { command: 'help' };
  let workers: number | undefined;
  if (v.workers !== undefined) {
    workers = Number(v.workers);
    if (!Number.isInteger(workers) || workers < 1) throw new UsageError(`--workers takes a whole number of at least 1, got \`${v.workers}\``);
  }
  let minSplitBytes: number | undefined;
  if (v['split-mb'] !== undefined) {
    const mb = Number(v['split-mb']);
    if (!Number.isFinite(mb) || mb < 0 || v['split-mb'].trim() === '') throw new UsageError(`--split-mb takes a number of MB of at least 0, got \`${v['split-mb']}\``);
    minSplitBytes = Math.round(mb * 1024 * 1024);
  }
  const cacheDir = v['no-cache'] ? null : (v['cache-dir'] ?? '.sluice-cache');
  const color = v['no-color'] ? false : v.color ? true : isTTY && !('NO_COLOR' in env && env.NO_COLOR !== '');
  if (command !== 'check' && (v.base !== undefined || v['comparison-json'] !== undefined || v.parts !== undefined)) {
    throw new UsageError(`--base, --comparison-json and --parts are options of \`sluice check\`, not of \`sluice ${command}\`${command === 'merge' ? ' (merge takes the part files as its arguments)' : ''}`);
  }
  if (command === 'scan') {
    const m = /^(\d+)\/(\d+)$/.exec(v.partition ?? '');
    if (!m) throw new UsageError('scan needs --partition I/N, e.g. --partition 1/8');
    const [index, count] = [Number(m[1]), Number(m[2])];
    if (count < 1 || index < 1 || index > count) throw new UsageError(`--partition ${v.partition}: I must be between 1 and N`);
    if (!v.out) throw new UsageError('scan needs --out FILE for the partial result');
    const policy = [...(v.policy ?? []), ...parsed.positionals];
    if (policy.length !== 1) throw new UsageError('scan takes exactly one --policy');
    const out: ScanCliOptions = { command: 'scan', policy: policy[0]!, partition: { index, count }, out: v.out, cacheDir };
    if (v.root !== undefined) out.root = v.root;
    if (workers !== undefined) out.workers = workers;
    if (minSplitBytes !== undefined) out.minSplitBytes = minSplitBytes;
    return out;
  }
  if (command === 'merge') {
    if (!v.policy || v.policy.length !== 1) throw new UsageError('merge takes exactly one --policy and the partial files as arguments');
    if (parsed.positionals.length === 0) throw new UsageError('merge needs the partial result files written by `sluice scan --partition`');
    const out: MergeCliOptions = { command: 'merge', policy: v.policy[0]!, parts: parsed.positionals, cacheDir, color, quiet: v.quiet ?? false };
    if (v.json !== undefined) out.json = v.json;
    if (v.markdown !== undefined) out.markdown = v.markdown;
    if (v.root !== undefined) out.root = v.root;
    return out;
  }
  const policies = [...(v.policy ?? []), ...parsed.positionals];
  if (policies.length === 0) throw new UsageError('no policy file given; usage: sluice check --policy policies/main.yaml');
  const out: CheckCliOptions = { command: 'check', policies, cacheDir, color, quiet: v.quiet ?? false };
  if (workers !== undefined) out.workers = workers;
  if (minSplitBytes !== undefined) out.minSplitBytes = minSplitBytes;
  if (v.json !== undefined) out.json = v.json;
  if (v.markdown !== undefined) out.markdown = v.markdown;
  if (v.root !== undefined) out.root = v.root;
  if (v['comparison-json'] !== undefined && v.base === undefined) throw new UsageError('--comparison-json needs --base REF: the comparison is with a base commit');
  if (v.base !== undefined) {
    if (v.base.trim() === '' || v.base.startsWith('-')) throw new UsageError(`--base takes a git ref (a branch, tag or commit), got \`${v.base}\``);
    out.base = v.base;
  }
  if (v['comparison-json'] !== undefined) out.comparisonJson = v['comparison-json'];
  if (v.parts !== undefined) out.parts = v.parts;
  return out;
}
