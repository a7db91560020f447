// File annotations: shard-level findings shown beside the file in the PR's diff
// and on the checks page. GitHub shows at most 10 of each kind per step, so the
// rest are counted, not emitted.
import path from 'node:path';
import type { Report } from '../judge/types.js';

/** Annotations of one kind GitHub shows per step; more are dropped by GitHub unseen. */
export const ANNOTATIONS_PER_KIND = 10;

export interface Annotation {
  kind: 'error' | 'warning';
  /** Path relative to the repository top, as the checks API needs it. */
  file: string;
  line?: number;
  title: string;
  message: string;
}

/** Returns the located findings of a report as annotations, findings in `changed` shards first. */
export function annotationsOf(report: Report, rootRel: string, changed: ReadonlySet<string>): Annotation[] {
  const out: Array<Annotation & { changed: boolean }> = [];
  for (const r of report.rules) {
    // Only findings: an `uncertain` outcome (a sample too small to tell) names no file at fault.
    if (r.verdict !== 'fail' && r.verdict !== 'warn') continue;
    for (const loc of r.locations) {
      const a: Annotation & { changed: boolean } = {
        kind: r.verdict === 'fail' ? 'error' : 'warning',
        file: rootRel === '' ? loc.path : path.posix.join(rootRel, loc.path),
        title: `sluice ${report.policy.name}: ${r.rule}${r.scope === 'corpus' ? '' : ` (${r.scope.replace(/^language:/, '')})`}`,
        message: loc.detail ? `${r.message}: ${loc.detail}` : r.message,
        changed: changed.has(loc.path),
      };
      if (loc.line !== undefined) a.line = loc.line;
      out.push(a);
    }
  }
  // Stable: within each group the report's order (failing rules first) stays.
  return [...out.filter((a) => a.changed), ...out.filter((a) => !a.changed)].map(({ changed: _c, ...a }) => a);
}

/** Returns the annotations GitHub will show (at most 10 of each kind, less those `spent` on other messages of the step) and how many of each kind are left out. */
export function capAnnotations(all: Annotation[], spent: { error: number; warning: number } = { error: 0, warning: 0 }): { shown: Annotation[]; omitted: { error: number; warning: number } } {
  const shown: Annotation[] = [];
  const omitted = { error: 0, warning: 0 };
  const used = { ...spent };
  for (const a of all) {
    if (used[a.kind] < ANNOTATIONS_PER_KIND) {
      used[a.kind] += 1;
      shown.push(a);
    } else omitted[a.kind] += 1;
  }
  return { shown, omitted };
}
