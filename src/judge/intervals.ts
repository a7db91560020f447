// Confidence intervals for figures estimated from a sample of documents.
//
// The sample is stratified by shard: every shard is read, and within each shard the
// measured documents are a simple random sample of its texts (picked by text hash; see
// src/results/sample.ts). Every figure is a ratio of two corpus totals, R = Y / X, over
// per-document values y and x: a share of documents (y = 1 for documents of a language,
// x = 1), a share of tokens (y = the document's tokens if it is of that language, x = its
// tokens), purity (expected-script characters over script characters), fertility
// (word tokens over words). The estimate weights each shard's measured sums by
// shardDocs / measuredDocs (the stratified ratio estimator).
//
// Its variance is linearized (the delta method; Cochran, "Sampling Techniques", 3rd ed.,
// 1977, ch. 6, ratio estimates in stratified samples): with d = y − R·x per document,
//   Var(R) ≈ Σ_shards N² (1 − n/N) / n · mean(d²) / X²,
// where a document is the unit: its tokens, words or bytes move together, so a
// token-weighted share is as uncertain as its documents make it, not as a count of
// independent tokens would suggest. Deviations are taken about the corpus-wide R rather
// than each shard's own mean: that keeps the between-shard part in the variance, which is
// conservative when shards differ and means a shard whose sampled documents happen to
// agree (all Hindi) still carries uncertainty for the ones not measured. A shard measured
// in full contributes nothing (the finite-population factor 1 − n/N is 0).
//
// Shares are given as Wilson score intervals (Wilson, 1927) at the effective sample size
// R(1 − R) / Var(R), which stay inside [0, 1] and behave near 0 and 1; for documents
// this is Wilson's interval on the sampled proportion, with the shards' weights. Ratios
// that are not shares (fertility) get the normal interval R ± z·√Var(R).
//
// Why not a bootstrap over shards: every shard is in the sample, so which shards exist
// is not a source of error; resampling them would measure how much shards differ (wide
// intervals for a corpus of one Hindi and one English shard whose mix is in fact known
// almost exactly) and would give no width at all for a corpus of one shard.

/** Confidence level of every interval. */
export const CONFIDENCE = 0.95;

/** Two-sided standard normal quantile for CONFIDENCE (Φ⁻¹(0.975)). */
export const Z_95 = 1.959963984540054;

/** How an interval was made; the report spells each out in `sampling.methods`. */
export type IntervalMethod = 'wilson' | 'wilson-linearized' | 'linearized-normal';

/** What each interval method is, in the words the report and README use. */
export const INTERVAL_METHODS: Record<IntervalMethod, string> = {
  wilson:
    'Wilson score interval (Wilson, 1927) for a share of documents, at the effective sample size of the shard-stratified sample (documents weighted by shard documents ÷ measured documents).',
  'wilson-linearized':
    'Wilson score interval at the effective sample size R(1−R)/Var(R) of a linearized (delta-method) variance of the stratified ratio estimator: documents are the sampled units, each a cluster of its tokens, words, bytes or characters; shards are strata, with finite-population correction.',
  'linearized-normal':
    'Normal interval R ± 1.96·√Var(R) from the same linearized variance, for ratios that are not shares (fertility).',
};

/** A confidence interval at CONFIDENCE. */
export interface Interval {
  low: number;
  high: number;
  method: IntervalMethod;
}

/** One shard's sums for a ratio Y / X: documents in the shard (N) and measured (n), and Σy, Σx, Σy², Σx², Σxy over the measured ones. */
export interface Stratum {
  N: number;
  n: number;
  y: number;
  x: number;
  yy: number;
  xx: number;
  xy: number;
}

/** A ratio estimated from a stratified sample, with what its interval and the sample size that settles it need. */
export interface RatioEstimate {
  /** The estimate, or null when no measured document has x > 0. */
  estimate: number | null;
  /** Linearized variance of the estimate (0 when every shard was measured in full). */
  variance: number;
  /** Effective sample size for a share (Infinity when nothing was left unmeasured). */
  effectiveN: number;
  strata: readonly Stratum[];
}

/** Returns the Wilson score interval for a proportion p observed over n trials (n may be fractional or Infinity). */
export function wilsonInterval(p: number, n: number, z: number = Z_95): { low: number; high: number } {
  if (n === Infinity) return { low: p, high: p };
  if (!(n > 0)) return { low: 0, high: 1 };
  const z2 = z * z;
  const denom = 1 + z2 / n;
  const center = (p + z2 / (2 * n)) / denom;
  const half = (z / denom) * Math.sqrt(Math.max(0, (p * (1 - p)) / n + z2 / (4 * n * n)));
  // At p = 0 or 1 the bound is p itself; keep it exact rather than off by rounding.
  return { low: p === 0 ? 0 : Math.max(0, center - half), high: p === 1 ? 1 : Math.min(1, center + half) };
}

/** Returns the stratified ratio estimate of Σy / Σx with its linearized variance; `scale` multiplies every shard's measured count (capped at its size), for asking what a larger sample would give. */
export function ratioEstimate(strata: readonly Stratum[], scale = 1): RatioEstimate {
  let Y = 0;
  let X = 0;
  for (const s of strata) {
    if (s.n <= 0) continue;
    const w = s.N / s.n;
    Y += w * s.y;
    X += w * s.x;
  }
  if (!(X > 0)) return { estimate: null, variance: 0, effectiveN: 0, strata };
  const R = Y / X;
  let v = 0;
  // Kish's effective size for a share at 0 or 1, where R(1 − R) is 0: (Σ w·x)² / Σ w²(1 − f)·x².
  let kish = 0;
  for (const s of strata) {
    if (s.n <= 0 || s.n >= s.N) continue;
    const n = Math.min(s.N, s.n * scale);
    const f = n / s.N;
    if (f >= 1) continue;
    const meanD2 = Math.max(0, s.yy - 2 * R * s.xy + R * R * s.xx) / s.n;
    v += ((s.N * s.N * (1 - f)) / n) * meanD2;
    kish += ((s.N * s.N * (1 - f)) / n) * (s.xx / s.n);
  }
  const variance = v / (X * X);
  let effectiveN: number;
  if (R > 0 && R < 1 && variance > 0) effectiveN = (R * (1 - R)) / variance;
  else effectiveN = kish > 0 ? (X * X) / kish : Infinity;
  return { estimate: R, variance, effectiveN, strata };
}

/** Returns the interval of an estimate: Wilson at the effective size for shares, the normal interval for other ratios. */
export function intervalOf(e: RatioEstimate, method: IntervalMethod, offset = 0): Interval | undefined {
  if (e.estimate === null) return undefined;
  if (method === 'linearized-normal') {
    const half = Z_95 * Math.sqrt(e.variance);
    return { low: e.estimate - half + offset, high: e.estimate + half + offset, method };
  }
  const w = wilsonInterval(Math.min(1, Math.max(0, e.estimate)), e.effectiveN);
  return { low: w.low + offset, high: w.high + offset, method };
}

/** Returns the interval an estimate would have with every shard's measured count multiplied by `scale`. */
export function intervalAtScale(strata: readonly Stratum[], method: IntervalMethod, scale: number, offset = 0): Interval | undefined {
  return intervalOf(ratioEstimate(strata, scale), method, offset);
}

/** The limit a figure is judged against: at most `high`, or within [low, high]. */
export type Bounds = { low?: number; high: number };

/** Where an interval lies against the bounds: inside, outside, or across one of them. */
export function placeInterval(iv: { low: number; high: number }, bounds: Bounds, eps = 1e-12): 'inside' | 'outside' | 'straddles' {
  const lo = bounds.low ?? -Infinity;
  if (iv.low >= lo - eps && iv.high <= bounds.high + eps) return 'inside';
  if (iv.high < lo - eps || iv.low > bounds.high + eps) return 'outside';
  return 'straddles';
}

/**
 * Returns how much larger the sample must be (a factor on every shard's measured count, at least 1)
 * for the interval to clear the bounds (moved towards the estimate by `margin` of their distance)
 * if the estimate stayed where it is, found by bisection on the
 * same variance formula. The largest factor measures every document (a census, no interval), which
 * settles any estimate; null only when there is no estimate at all.
 */
export function scaleToSettle(strata: readonly Stratum[], method: IntervalMethod, bounds: Bounds, offset = 0, margin = 0): number | null {
  const full = Math.max(1, ...strata.filter((s) => s.n > 0).map((s) => s.N / s.n));
  const e = ratioEstimate(strata).estimate;
  if (e === null) return null;
  // With a margin, the bounds move towards the estimate by that share of their distance, so the
  // interval must clear them with room for the estimate to move as more documents are measured.
  const toward = (b: number): number => b + margin * (e + offset - b);
  const target: Bounds = { high: toward(bounds.high), ...(bounds.low !== undefined ? { low: toward(bounds.low) } : {}) };
  const settled = (scale: number): boolean => {
    const iv = intervalAtScale(strata, method, scale, offset);
    return iv !== undefined && (scale >= full ? placeInterval(iv, bounds) !== 'straddles' : placeInterval(iv, target) !== 'straddles');
  };
  if (settled(1)) return 1;
  if (!settled(full)) return null;
  let lo = 1;
  let hi = full;
  // 40 halvings pin the factor far below the rounding of the suggested setting.
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (settled(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

/** Returns the measured documents a sample scaled by `scale` would hold (each shard capped at its size). */
export function docsAtScale(strata: readonly Stratum[], scale: number): number {
  let docs = 0;
  for (const s of strata) if (s.n > 0) docs += Math.min(s.N, Math.ceil(s.n * scale));
  return docs;
}
