// Number and text formatting shared by the views. Formatting only: every figure
// is already in the report.

import type { Report } from '../judge/types.js';

/** Formats a share (0..1) as a percentage with one decimal (a negative change with U+2212, as points are signed), or an en dash for none. */
export function percent(x: number | null | undefined): string {
  return x === null || x === undefined ? '–' : `${(x * 100).toFixed(1).replace(/^-(?=0\.0$)/, '').replace(/^-/, '\u2212')} %`;
}

/** Formats a count with thin grouping (12,345). */
export function count(n: number | null | undefined): string {
  return n === null || n === undefined ? '–' : n.toLocaleString('en-US');
}

/** Formats a count and a noun, plural unless the count is 1 ("1 shard", "2,046 shards"). */
export function counted(n: number, noun: string, plural = `${noun}s`): string {
  return `${count(n)} ${n === 1 ? noun : plural}`;
}

/** Formats a ratio with a fixed number of decimals. */
export function fixed(x: number | null | undefined, digits = 2): string {
  return x === null || x === undefined ? '–' : x.toFixed(digits);
}

/** Formats a signed difference in percentage points. */
export function points(x: number | null | undefined): string {
  if (x === null || x === undefined) return '–';
  const r = Math.round(x * 10) / 10;
  return `${r > 0 ? '+' : r < 0 ? '−' : '±'}${Math.abs(r).toFixed(1)} pt`;
}

/** Formats a signed relative change (0.012 → +1.2 %), U+2212 for a fall and ± for none at one decimal, or an en dash for none. */
export function signedPercent(x: number | null | undefined): string {
  if (x === null || x === undefined) return '–';
  const r = Math.round(x * 1000) / 10;
  return `${r > 0 ? '+' : r < 0 ? '−' : '±'}${Math.abs(r).toFixed(1)} %`;
}

/** Formats bytes in SI units. */
export function bytes(n: number): string {
  if (n < 1e3) return `${n} B`;
  if (n < 1e6) return `${(n / 1e3).toFixed(1)} kB`;
  if (n < 1e9) return `${(n / 1e6).toFixed(1)} MB`;
  return `${(n / 1e9).toFixed(2)} GB`;
}

/** Formats a rule's measured value or limit in its unit. */
export function inUnit(x: number | null, unit: 'share' | 'count' | 'ratio' | 'points'): string {
  if (x === null) return '–';
  if (unit === 'share') return percent(x);
  if (unit === 'count') return count(x);
  if (unit === 'points') return points(x);
  return fixed(x, 3);
}

/** Formats a rule's limit, with its tolerance where it has one (40.0 % ±5.0). */
export function limitOf(r: { limit: number | null; unit: 'share' | 'count' | 'ratio' | 'points'; tolerance?: number }): string {
  const base = inUnit(r.limit, r.unit);
  return r.tolerance === undefined ? base : `${base} ±${(r.tolerance * 100).toFixed(1)}`;
}

/** Returns a location as path:line. */
export function where(loc: { path: string; line?: number }): string {
  return loc.line === undefined ? loc.path : `${loc.path}:${loc.line}`;
}

/** The first `limit` rejected lines of a report, in shard order, with how many more were rejected (some beyond each shard's kept samples). */
export function firstRejections(report: Report, limit: number): { shown: Array<{ path: string; line: number; reason: string; detail: string }>; more: number } {
  const shown: Array<{ path: string; line: number; reason: string; detail: string }> = [];
  for (const s of report.shards) {
    for (const r of s.rejections) {
      if (shown.length >= limit) break;
      shown.push({ path: s.path, line: r.line, reason: r.reason, detail: r.detail });
    }
    if (shown.length >= limit) break;
  }
  return { shown, more: report.input.rejected.count - shown.length };
}
