// Locality-sensitive hashing by bands over MinHash signatures (Leskovec, Rajaraman and
// Ullman, "Mining of Massive Datasets", ch. 3): with b bands of r rows, a pair whose rows
// agree with probability p becomes a candidate with probability 1 − (1 − p^r)^b.

/**
 * Weight of missed pairs against false candidates when choosing bands. A false candidate
 * costs one signature comparison (every candidate is verified); a missed pair is a duplicate
 * lost for good. 9 : 1 puts the steep part of the S-curve just below the threshold: at the
 * default threshold 0.8 with 128 hashes, pairs at the threshold become candidates ~90 % of the
 * time and pairs 0.05 above it ~98 %.
 */
const MISS_WEIGHT = 0.9;
/** Integration steps of the weighted-area criterion (midpoint rule; the areas change by < 1e-4 beyond this). */
const STEPS = 200;
/** Information per band key: random (unrelated) documents collide in a band with probability ≈ 2^−32, as with a 32-bit key. */
const BAND_KEY_BITS = 32;
/** Widths a stored signature value may have, in bits. */
const WIDTHS = [4, 8, 16, 32] as const;

export type SignatureBits = (typeof WIDTHS)[number];

/** Returns the probability that a pair whose rows agree with probability `p` shares at least one of `bands` bands of `rows` rows. */
export function candidateProbability(p: number, bands: number, rows: number): number {
  return 1 - Math.pow(1 - Math.pow(p, rows), bands);
}

/** Returns the bits kept per signature value when bands have `rows` rows: the narrowest width whose r values carry at least 32 bits. */
export function signatureBits(rows: number): SignatureBits {
  for (const w of WIDTHS) if (w * rows >= BAND_KEY_BITS) return w;
  return 32;
}

/** Returns the probability that two w-bit values agree when the full values agree with probability `s` (Li and König, 2010, b-bit minwise hashing, for sparse sets: accidental agreement 2^−w). */
export function rowAgreement(s: number, bits: number): number {
  if (bits >= 32) return s;
  const c = Math.pow(2, -bits);
  return s + (1 - s) * c;
}

/**
 * Returns the bands and rows (bands · rows ≤ hashes) that minimize
 * 0.1 · ∫₀ᵗ P(s) ds + 0.9 · ∫ₜ¹ (1 − P(s)) ds, P being the candidate probability of the stored
 * (reduced-width) rows: the false-candidate area weighed against the missed-pair area.
 * The plain rule of thumb, (1/b)^(1/r) ≈ threshold, ignores that candidates are verified and
 * picks curves that miss a third of the pairs at the threshold.
 */
export function lshBands(threshold: number, hashes: number): { bands: number; rows: number } {
  if (!(threshold > 0 && threshold <= 1)) throw new RangeError(`threshold must be in (0, 1], got ${threshold}`);
  if (!Number.isInteger(hashes) || hashes < 1) throw new RangeError(`hashes must be a positive integer, got ${hashes}`);
  const key = `${threshold}/${hashes}`;
  const known = chosen.get(key);
  if (known) return { ...known };
  let best = { bands: 1, rows: hashes };
  let bestCost = Infinity;
  const h = 1 / STEPS;
  // Per step s: q = rowAgreement(s)^rows once per row count, and miss = (1 − q)^bands kept
  // by one multiply per band count, where candidateProbability would take two powers per
  // step and pair: the search took 20–80 ms at 64–256 hashes that way, on every thread.
  const q = new Float64Array(STEPS);
  const miss = new Float64Array(STEPS);
  for (let rows = 1; rows <= hashes; rows++) {
    const bits = signatureBits(rows);
    for (let i = 0; i < STEPS; i++) {
      q[i] = Math.pow(rowAgreement((i + 0.5) * h, bits), rows);
      miss[i] = 1;
    }
    for (let bands = 1; bands * rows <= hashes; bands++) {
      let falseArea = 0;
      let missArea = 0;
      for (let i = 0; i < STEPS; i++) {
        const m = (miss[i] as number) * (1 - (q[i] as number));
        miss[i] = m;
        if ((i + 0.5) * h < threshold) falseArea += (1 - m) * h;
        else missArea += m * h;
      }
      const cost = (1 - MISS_WEIGHT) * falseArea + MISS_WEIGHT * missArea;
      // Ties (rare) go to fewer bands: each band is one pass of the join.
      if (cost < bestCost - 1e-12) {
        bestCost = cost;
        best = { bands, rows };
      }
    }
  }
  chosen.set(key, best);
  return { ...best };
}

/** Choices already made: every shard asks again. */
const chosen = new Map<string, { bands: number; rows: number }>();

/** Returns the Jaccard estimate from the share of agreeing w-bit values, corrected for accidental agreement (Li and König, 2010) and clamped to [0, 1]. */
export function jaccardFromAgreement(agreeing: number, hashes: number, bits: number): number {
  const p = agreeing / hashes;
  if (bits >= 32) return p;
  const c = Math.pow(2, -bits);
  const j = (p - c) / (1 - c);
  return j < 0 ? 0 : j > 1 ? 1 : j;
}
