// The comparison of one policy's report at base and at head: which shards changed, how each
// language's share and fertility moved, and which rules changed their verdict. Pure: the
// front ends' git plumbing (core/compare.ts) supplies the two reports and the shards' keys.
import type { CorpusResult } from '../results/corpus.js';
import type { Report, RuleVerdict, Verdict } from './types.js';

/** What a pull request did to one shard. */
export interface ShardChange {
  status: 'added' | 'modified' | 'deleted' | 'renamed';
  /** Path at head (at base for a deleted shard), relative to the policy root. */
  path: string;
  /** Path at base, for a renamed shard. */
  from?: string;
  /** A renamed shard whose bytes also changed. */
  edited?: boolean;
  docs: { base: number | null; head: number | null };
}

/** How a figure moved from base to head. */
export interface Delta {
  base: number | null;
  head: number | null;
}

export interface LanguageDelta {
  key: string;
  target?: number;
  /** Share of the mix unit, 0..1. */
  share: Delta;
  /** head − base, in percentage points. */
  shiftPoints: number | null;
  /** Running-text fertility under the policy's tokenizer. */
  fertility: Delta;
  /** head ÷ base − 1. */
  fertilityChange: number | null;
}

export interface RuleFlip {
  rule: string;
  scope: string;
  /** `none` when the rule had no outcome on that side (a shard-scoped rule of a new shard). */
  from: RuleVerdict | 'none';
  to: RuleVerdict | 'none';
  message: string;
}

/** The comparison of one policy's report at base and at head; a view renders it, computing nothing. */
export interface Comparison {
  base: { commit: string; label: string };
  mixUnit: string;
  changes: ShardChange[];
  /** Totals over the corpus. */
  shards: Delta;
  docs: Delta;
  words: Delta;
  tokens: Delta;
  languages: LanguageDelta[];
  verdict: { base: Verdict | null; head: Verdict };
  flipped: RuleFlip[];
  /** Duplicates the head's new and changed shards add against the rest of the corpus. */
  addedDuplicates?: NonNullable<CorpusResult['duplicatesAgainstExisting']>;
}

/** Returns the shard changes from the content keys on each side (path → key), pairing deletions with additions as renames when git or equal bytes say so; document counts are looked up in `docs` when given. */
export function shardChanges(
  base: Map<string, string>,
  head: Map<string, string>,
  gitRenames: Map<string, string>,
  docs: { base: Map<string, number>; head: Map<string, number> } = { base: new Map(), head: new Map() },
): ShardChange[] {
  const changes: ShardChange[] = [];
  const added = [...head.keys()].filter((p) => !base.has(p));
  const deleted = new Set([...base.keys()].filter((p) => !head.has(p)));
  const deletedByKey = new Map<string, string>();
  for (const p of deleted) deletedByKey.set(base.get(p)!, p);
  const d = (b: string | undefined, h: string | undefined): ShardChange['docs'] => ({ base: b === undefined ? null : (docs.base.get(b) ?? null), head: h === undefined ? null : (docs.head.get(h) ?? null) });
  for (const p of added) {
    const from = [gitRenames.get(p), deletedByKey.get(head.get(p)!)].find((f) => f !== undefined && deleted.has(f));
    if (from !== undefined) {
      deleted.delete(from);
      changes.push({ status: 'renamed', path: p, from, edited: base.get(from) !== head.get(p), docs: d(from, p) });
    } else changes.push({ status: 'added', path: p, docs: d(undefined, p) });
  }
  for (const [p, key] of head) if (base.has(p) && base.get(p) !== key) changes.push({ status: 'modified', path: p, docs: d(p, p) });
  for (const p of deleted) changes.push({ status: 'deleted', path: p, docs: d(p, undefined) });
  return changes.sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
}

/** Returns the figures of base and head side by side, and the rules whose verdict changed. */
export function compareReports(base: Report | null, head: Report, commit: string, label: string, changes: ShardChange[], addedDuplicates?: Comparison['addedDuplicates']): Comparison {
  const unit = head.mixUnit;
  const keys = [...new Set([...Object.keys(head.languages), ...Object.keys(base?.languages ?? {})])];
  const languages: LanguageDelta[] = [];
  for (const key of keys) {
    const h = head.languages[key];
    const b = base?.languages[key];
    if (!h?.docs && !b?.docs && h?.target === undefined) continue;
    const share = { base: b ? (b.share[unit] ?? null) : base ? 0 : null, head: h ? (h.share[unit] ?? null) : 0 };
    const fertility = { base: b?.fertility?.fertility ?? null, head: h?.fertility?.fertility ?? null };
    const row: LanguageDelta = {
      key,
      share,
      shiftPoints: share.base !== null && share.head !== null ? (share.head - share.base) * 100 : null,
      fertility,
      fertilityChange: fertility.base && fertility.head !== null ? fertility.head / fertility.base - 1 : null,
    };
    const target = h?.target ?? b?.target;
    if (target !== undefined) row.target = target;
    languages.push(row);
  }

  const id = (r: { rule: string; scope: string }): string => `${r.rule}\u0000${r.scope}`;
  const baseRules = new Map<string, RuleVerdict>();
  // A rule may have several outcomes per scope (input: broken and rejected); the worst stands for the pair.
  const RANK: Record<RuleVerdict, number> = { pass: 0, unjudged: 1, uncertain: 2, warn: 3, fail: 4 };
  const worst = (a: RuleVerdict | undefined, b: RuleVerdict): RuleVerdict => (a !== undefined && RANK[a] > RANK[b] ? a : b);
  // A rule over the change itself (scope `change`) has an outcome only at head, where there is a change: it never flips.
  const overBoth = (r: { scope: string }): boolean => r.scope !== 'change';
  for (const r of (base?.rules ?? []).filter(overBoth)) baseRules.set(id(r), worst(baseRules.get(id(r)), r.verdict));
  const headRules = new Map<string, { verdict: RuleVerdict; message: string; rule: string; scope: string }>();
  for (const r of head.rules.filter(overBoth)) {
    const prev = headRules.get(id(r));
    const verdict = worst(prev?.verdict, r.verdict);
    headRules.set(id(r), { verdict, message: prev && prev.verdict === verdict ? prev.message : r.message, rule: r.rule, scope: r.scope });
  }
  const flipped: RuleFlip[] = [];
  if (base) {
    for (const [k, h] of headRules) {
      const from = baseRules.get(k) ?? 'none';
      if (from !== h.verdict) flipped.push({ rule: h.rule, scope: h.scope, from, to: h.verdict, message: h.message });
    }
    for (const r of base.rules.filter(overBoth)) {
      if (!headRules.has(id(r)) && r.verdict !== 'pass' && !flipped.some((f) => id(f) === id(r))) flipped.push({ rule: r.rule, scope: r.scope, from: baseRules.get(id(r))!, to: 'none', message: r.message });
    }
  }

  const comparison: Comparison = {
    base: { commit, label },
    mixUnit: unit,
    changes,
    shards: { base: base?.input.shards ?? null, head: head.input.shards },
    docs: { base: base?.totals.docs ?? null, head: head.totals.docs },
    words: { base: base?.totals.words ?? null, head: head.totals.words },
    tokens: { base: base?.totals.tokens ?? null, head: head.totals.tokens ?? null },
    languages,
    verdict: { base: base?.verdict ?? null, head: head.verdict },
    flipped,
  };
  if (addedDuplicates) comparison.addedDuplicates = addedDuplicates;
  return comparison;
}
