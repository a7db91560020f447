// The interval arithmetic behind sampled reports: Wilson's interval against published
// worked examples, coverage by simulation (a deterministic PRNG), the stratified ratio
// estimator against its textbook special cases, and the sample size that settles a rule.
import { describe, expect, it } from 'vitest';
import {
  intervalAtScale,
  intervalOf,
  placeInterval,
  ratioEstimate,
  scaleToSettle,
  wilsonInterval,
  type Stratum,
} from '../../src/judge/intervals.js';

/** Returns a seeded generator of floats in [0, 1) (mulberry32, a common small PRNG). */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Returns k distinct indices out of n, uniformly (partial Fisher–Yates). */
function srs(n: number, k: number, rand: () => number): number[] {
  const idx = Array.from({ length: n }, (_, i) => i);
  for (let i = 0; i < k; i++) {
    const j = i + Math.floor(rand() * (n - i));
    [idx[i], idx[j]] = [idx[j]!, idx[i]!];
  }
  return idx.slice(0, k);
}

describe('the Wilson score interval', () => {
  // Newcombe (1998), "Two-sided confidence intervals for the single proportion: comparison of
  // seven methods", Statistics in Medicine 17:857–872, Table I, method 3 (score interval without
  // continuity correction). The four bounds pairs are quoted from memory of that table; the
  // formula reproducing all of them to four decimals is the check that the memory is right.
  it.each([
    [81, 263, 0.2553, 0.3662],
    [15, 148, 0.0624, 0.1605],
    [0, 20, 0.0, 0.1611],
    [1, 29, 0.0061, 0.1718],
  ])('gives Newcombe’s bounds for %i/%i', (x, n, low, high) => {
    const w = wilsonInterval(x / n, n);
    expect(w.low).toBeCloseTo(low, 4);
    expect(w.high).toBeCloseTo(high, 4);
  });

  it('covers the true proportion about 95 % of the time (simulation, 4,000 binomial draws per case)', () => {
    const rand = prng(20261201);
    for (const [p, n] of [[0.5, 50], [0.2, 100], [0.05, 300], [0.02, 1000]] as const) {
      let covered = 0;
      const trials = 4000;
      for (let t = 0; t < trials; t++) {
        let x = 0;
        for (let i = 0; i < n; i++) if (rand() < p) x += 1;
        const w = wilsonInterval(x / n, n);
        if (w.low <= p && p <= w.high) covered += 1;
      }
      // Wilson's coverage oscillates around the nominal level with n and p (Newcombe, 1998;
      // Brown, Cai and DasGupta, 2001): within 2.5 points of 95 % at these sizes.
      expect(Math.abs(covered / trials - 0.95)).toBeLessThan(0.025);
    }
  });

  it('is the point itself with nothing left to sample, and [0, 1] with nothing sampled', () => {
    expect(wilsonInterval(0.3, Infinity)).toEqual({ low: 0.3, high: 0.3 });
    expect(wilsonInterval(0, 0)).toEqual({ low: 0, high: 1 });
  });
});

describe('the stratified ratio estimator', () => {
  it('reduces to Wilson with the finite-population correction for a share of documents in one shard', () => {
    // Cochran (1977) §3.2: Var(p) = (1 − f) p(1 − p) / n for a simple random sample with f = n / N.
    const N = 1000;
    const n = 100;
    const y = 23;
    const e = ratioEstimate([{ N, n, y, x: n, yy: y, xx: n, xy: y }]);
    expect(e.estimate).toBeCloseTo(0.23, 12);
    expect(e.variance).toBeCloseTo(((1 - n / N) * 0.23 * 0.77) / n, 12);
    const w = wilsonInterval(0.23, n / (1 - n / N));
    const iv = intervalOf(e, 'wilson')!;
    expect(iv.low).toBeCloseTo(w.low, 12);
    expect(iv.high).toBeCloseTo(w.high, 12);
  });

  it('weights shards by their documents over measured documents, and a shard measured in full adds no variance', () => {
    // 10 of 1,000 in shard A are Hindi... A: 50 measured, 5 Hindi; B: 200 of 200 measured, 100 Hindi.
    const a: Stratum = { N: 1000, n: 50, y: 5, x: 50, yy: 5, xx: 50, xy: 5 };
    const b: Stratum = { N: 200, n: 200, y: 100, x: 200, yy: 100, xx: 200, xy: 100 };
    const e = ratioEstimate([a, b]);
    expect(e.estimate).toBeCloseTo((1000 * 0.1 + 100) / 1200, 12);
    // Only A's sampling adds variance: N_A²(1 − f_A)/n_A · mean(d²) / X², deviations about the overall R.
    const R = e.estimate!;
    const meanD2 = (5 - 2 * R * 5 + R * R * 50) / 50;
    expect(e.variance).toBeCloseTo(((1000 * 1000 * (1 - 0.05)) / 50) * meanD2 / (1200 * 1200), 12);
    expect(ratioEstimate([b]).variance).toBe(0);
    expect(intervalOf(ratioEstimate([b]), 'wilson')).toMatchObject({ low: 0.5, high: 0.5 });
  });

  it('covers a token-weighted share at least 95 % of the time when documents within a shard are alike (simulation)', () => {
    // A corpus of 8 shards, each mostly one language with its own document lengths: the
    // situation where counting tokens as independent would be far too confident.
    const rand = prng(7);
    const shards = Array.from({ length: 8 }, (_, h) => {
      const hindiShare = h % 2 === 0 ? 0.9 : 0.1;
      const meanTokens = 200 + 300 * h;
      return Array.from({ length: 2000 }, () => {
        const tokens = Math.max(1, Math.round(meanTokens * -Math.log(1 - rand())));
        return { tokens, hindi: rand() < hindiShare };
      });
    });
    let Y = 0;
    let X = 0;
    for (const s of shards) for (const d of s) { X += d.tokens; if (d.hindi) Y += d.tokens; }
    const truth = Y / X;
    let covered = 0;
    let naiveCovered = 0;
    const trials = 600;
    for (let t = 0; t < trials; t++) {
      const strata: Stratum[] = shards.map((docs) => {
        const st: Stratum = { N: docs.length, n: 60, y: 0, x: 0, yy: 0, xx: 0, xy: 0 };
        for (const i of srs(docs.length, 60, rand)) {
          const d = docs[i]!;
          const y = d.hindi ? d.tokens : 0;
          st.y += y; st.x += d.tokens; st.yy += y * y; st.xx += d.tokens * d.tokens; st.xy += y * d.tokens;
        }
        return st;
      });
      const iv = intervalOf(ratioEstimate(strata), 'wilson-linearized')!;
      if (iv.low <= truth && truth <= iv.high) covered += 1;
      // What treating every sampled token as an independent draw would claim.
      const tokens = strata.reduce((s, x) => s + x.x, 0);
      const naive = wilsonInterval(ratioEstimate(strata).estimate!, tokens);
      if (naive.low <= truth && truth <= naive.high) naiveCovered += 1;
    }
    expect(covered / trials).toBeGreaterThanOrEqual(0.94);
    // The token-counting interval is badly overconfident on the same draws.
    expect(naiveCovered / trials).toBeLessThan(0.5);
  });
});

describe('the sample size that settles a rule', () => {
  const strata: Stratum[] = [
    { N: 5000, n: 100, y: 30, x: 100, yy: 30, xx: 100, xy: 30 },
    { N: 5000, n: 100, y: 34, x: 100, yy: 34, xx: 100, xy: 34 },
  ];

  it('is the smallest scale whose interval clears the limit, if the estimate stays put', () => {
    // Estimate 0.32 against a limit of 0.35: the interval at 200 documents straddles it.
    const bounds = { high: 0.35 };
    expect(placeInterval(intervalOf(ratioEstimate(strata), 'wilson')!, bounds)).toBe('straddles');
    const scale = scaleToSettle(strata, 'wilson', bounds)!;
    expect(scale).toBeGreaterThan(1);
    expect(placeInterval(intervalAtScale(strata, 'wilson', scale, 0)!, bounds)).toBe('inside');
    expect(placeInterval(intervalAtScale(strata, 'wilson', scale * 0.98, 0)!, bounds)).toBe('straddles');
    // The half-width shrinks as 1/√n: the distance is 0.03, the half-width at n = 200 about 0.064,
    // so about (0.064/0.03)² ≈ 4.6 times the sample, a little less with the finite-population correction.
    expect(scale).toBeGreaterThan(3);
    expect(scale).toBeLessThan(5.5);
  });

  it('needs every document when the estimate sits on the limit', () => {
    // 50 = 5,000 / 100: every document of both shards; the census then judges the limit itself.
    expect(scaleToSettle(strata, 'wilson', { high: 0.32 })).toBe(50);
  });
});
