// The one place that turns command-line arguments into the typed options the
// core takes. Nothing else in the CLI reads argv.
import { parseArgs } from 'node:util';

export const USAGE = `sluice: a merge gate for the quality of multilingual training corpora

Usage:
  sluice check [--policy] FILE [FILE...] [options]   measure the corpus a policy names and judge it

Options for check:
  -p, --policy FILE      policy file (YAML); repeat for several; positional files work too
      --json FILE        write the JSON report (schemas/report.schema.json) to FILE
      --markdown FILE    write the Markdown report to FILE
      --root DIR         judge the shards under DIR instead of the policy's root
      --cache-dir DIR    where per-shard results are cached by content (default .sluice-cache)
      --no-cache         measure every shard again
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
}

export type CliCommand = CheckCliOptions | { command: 'help' } | { command: 'version' };

/** An argument the CLI cannot use: exit code 2 with this message. */
export class UsageError extends Error {
  override name = 'UsageError';
}

/** Returns the command the arguments ask for. */
export function parseCli(argv: string[], env: NodeJS.ProcessEnv, isTTY: boolean): CliCommand {
  const [command, ...rest] = argv;
  if (command === undefined || command === '-h' || command === '--help' || command === 'help') return { command: 'help' };
  if (command === '-v' || command === '--version') return { command: 'version' };
  if (command !== 'check') throw new UsageError(`unknown command \`${command}\`; try \`sluice --help\``);
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
      },
    });
  } catch (err) {
    throw new UsageError(`${(err as Error).message}; try \`sluice --help\``);
  }
  const v = parsed.values;
  if (v.help) return { command: 'help' };
  const policies = [...(v.policy ?? []), ...parsed.positionals];
  if (policies.length === 0) throw new UsageError('no policy file given; usage: sluice check --policy policies/main.yaml');
  const color = v['no-color'] ? false : v.color ? true : isTTY && !('NO_COLOR' in env && env.NO_COLOR !== '');
  const out: CheckCliOptions = {
    command: 'check',
    policies,
    cacheDir: v['no-cache'] ? null : (v['cache-dir'] ?? '.sluice-cache'),
    color,
    quiet: v.quiet ?? false,
  };
  if (v.json !== undefined) out.json = v.json;
  if (v.markdown !== undefined) out.markdown = v.markdown;
  if (v.root !== undefined) out.root = v.root;
  return out;
}
