// Joins the duplicate indexes of many shards into one account of exact and near duplicates,
// as if all documents had been scanned in one pass: shards in the order given (the caller
// sorts them by path), documents within a shard in ordinal order.
//
// Definitions (corpus order = that order):
// - exact duplicate: its exact normal form (see normalizeForExact) appeared earlier;
// - near duplicate: not an exact duplicate, and an earlier document that is not an exact copy
//   of it shares an LSH band with it and verifies: estimated Jaccard ≥ threshold. Only the
//   first document of each exact class takes part in near detection; its exact copies count
//   as exact. exactDocs and nearDocs are therefore disjoint, and their sum is the number of
//   documents a deduplication would drop.
// - a document with fewer words than one shingle is one shingle made of all its words (so it
//   is a near copy only of documents with the same words in the same order); a document with
//   no words (only punctuation or symbols) takes part in exact detection only (wordlessDocs);
//   one whose normal form is empty takes part in neither (emptyDocs).
// - near clusters are the trees of "verified against this earlier document" links, each rooted
//   at a document that is not a near duplicate; so every copy listed is one counted near
//   duplicate. (Connected components of all verified pairs would chain documents through
//   intermediates, A ~ B ~ C with A ≁ C, and cluster sizes would no longer add up to the count.)
//
// Memory: the join keeps, per document, 1 byte of flags and 4 of links (its exact class's first
// document, or for such a first document the earlier one it is a near copy of), and 12 bytes of
// working arrays: the high hash halves, sort order and sort scratch in the exact stage (low halves
// are read from the blobs, only within runs of equal high halves); band key, order and scratch in
// the band passes; tree roots and cluster sizes after them. 17 bytes per document beyond the
// input blobs (74 bytes per document at the defaults) in every stage. Band keys are computed one band at a
// time and grouped by a radix sort rather than kept in maps. Work is bounded by
// maxBucketComparisons per document per band; buckets larger than that are counted in
// statistics.cappedBuckets.
import { jaccardFromAgreement, lshBands, signatureBits } from './lsh.js';
import {
  EXACT_BYTES,
  KIND_EMPTY,
  KIND_FULL,
  KIND_WORDLESS,
  incompatibility,
  parseIndex,
  readLocationRecords,
  type IndexLayout,
} from './format.js';
import { checkOptions } from './builder.js';
import type {
  AgainstExisting,
  DocumentLocation,
  DuplicateCluster,
  DuplicateCopy,
  DuplicateFindings,
  DuplicateTally,
  JoinOptions,
} from './types.js';

/** Clusters listed by default: enough for a report's table, far fewer than a corpus can have. */
const DEFAULT_MAX_CLUSTERS = 20;
/** Copies listed per cluster by default. */
const DEFAULT_MAX_COPIES = 10;
/**
 * Earlier members of a band bucket each document is compared with, nearest first. Real
 * buckets are tiny (unrelated documents collide in a band with probability ~2^−32); large ones
 * come from boilerplate repeated with small changes, where the nearest earlier copies match.
 */
const DEFAULT_MAX_BUCKET_COMPARISONS = 64;

// Per-document flag bits.
const KIND_MASK = 3;
const IN_NEW_SHARD = 1 << 2;
const CLASS_HAS_NEW = 1 << 3; // on a class's first document: some member is in a new shard
const CLASS_HAS_EXISTING = 1 << 4; // ... some member is in an existing shard
const NEAR = 1 << 5; // verified against an earlier document
const NEAR_EXISTING = 1 << 6; // on a class's first document: verified against a class with an existing member
const PARTICIPANT = 1 << 7; // first document of its exact class, with words: takes part in near detection

/** A shard's index that cannot be joined: which shard and why. */
export class DuplicateIndexError extends Error {
  readonly shard: string;
  readonly reason: string;
  constructor(shard: string, reason: string) {
    super(`duplicate index of ${shard}: ${reason}`);
    this.name = 'DuplicateIndexError';
    this.shard = shard;
    this.reason = reason;
  }
}

interface ShardIndex {
  shard: string;
  blob: Uint8Array;
  layout: IndexLayout;
  start: number; // global id of its first document
}

// Number of equal 4-bit values in a byte of XORed signatures (0, 1 or 2).
/**
 * One link per document, in one array: -1 for an empty document; for an exact copy, the first
 * document of its class (an earlier id); for a first document, its own id, or, once it is found to
 * be a near copy of an earlier document j, NEAR_LINK_BASE − j (≤ −2).
 */
const NEAR_LINK_BASE = -2;

/** Returns the first document of g's exact class, or -1 for an empty document. */
function linkRep(link: Int32Array, g: number): number {
  const l = link[g]!;
  return l >= 0 ? l : l <= NEAR_LINK_BASE ? g : -1;
}

/** Returns the earlier document g is a near copy of, or -1. */
function linkNear(link: Int32Array, g: number): number {
  const l = link[g]!;
  return l <= NEAR_LINK_BASE ? NEAR_LINK_BASE - l : -1;
}

const EQUAL_NIBBLES = new Uint8Array(256);
for (let x = 0; x < 256; x++) EQUAL_NIBBLES[x] = ((x & 15) === 0 ? 1 : 0) + ((x >>> 4) === 0 ? 1 : 0);

/** Returns the exact and near duplicates across all shards' indexes, as one scan over them in the given order would find them. Throws DuplicateIndexError for an index that is unreadable or built with other parameters. */
export function joinDuplicates(shards: Array<{ shard: string; index: Uint8Array }>, opts: JoinOptions): DuplicateFindings {
  const options = checkOptions(opts);
  const maxClusters = opts.maxClusters ?? DEFAULT_MAX_CLUSTERS;
  const maxCopies = opts.maxCopies ?? DEFAULT_MAX_COPIES;
  const cap = opts.maxBucketComparisons ?? DEFAULT_MAX_BUCKET_COMPARISONS;
  for (const [name, v] of [['maxClusters', maxClusters], ['maxCopies', maxCopies], ['maxBucketComparisons', cap]] as const) {
    if (!Number.isInteger(v) || v < 0) throw new RangeError(`joinDuplicates: ${name} must be a non-negative integer, got ${v}`);
  }
  const { bands, rows } = lshBands(options.threshold, options.hashes);
  const bits = signatureBits(rows);
  const k = options.hashes;

  // Parse and check every index first: one bad shard stops the join before any work.
  const indexes: ShardIndex[] = [];
  const seen = new Set<string>();
  let total = 0;
  let indexBytes = 0;
  for (const { shard, index } of shards) {
    if (seen.has(shard)) throw new DuplicateIndexError(shard, 'shard listed twice');
    seen.add(shard);
    const parsed = parseIndex(index);
    if (!parsed.ok) throw new DuplicateIndexError(shard, parsed.reason);
    const why = incompatibility(parsed.layout, options);
    if (why) throw new DuplicateIndexError(shard, why);
    indexes.push({ shard, blob: index, layout: parsed.layout, start: total });
    total += parsed.layout.documents;
    indexBytes += index.length;
  }
  const n = total;
  const starts = new Int32Array(indexes.length + 1);
  indexes.forEach((s, i) => (starts[i] = s.start));
  starts[indexes.length] = n;

  const newNames = new Set(opts.newShards ?? []);
  const trackExisting = opts.newShards !== undefined;
  const isNew = indexes.map((s) => newNames.has(s.shard));

  // Pass 1: kinds (and a check that every location stream is well formed).
  const flags = new Uint8Array(n);
  indexes.forEach((s, si) => {
    const newBit = isNew[si] ? IN_NEW_SHARD : 0;
    readLocations(s, (i, _line, _language, kind) => {
      flags[s.start + i] = kind | newBit;
    });
  });

  // Exact classes: sort documents by their 64-bit hash, the first of each run is the class.
  const views = indexes.map((s) => new DataView(s.blob.buffer, s.blob.byteOffset, s.blob.byteLength));
  const hi = new Int32Array(n);
  indexes.forEach((s, si) => {
    const view = views[si]!;
    for (let i = 0, at = s.layout.exactOffset; i < s.layout.documents; i++, at += EXACT_BYTES) hi[s.start + i] = view.getInt32(at, true);
  });
  /** The low half of document g's exact hash, read from its shard's blob. */
  const loOf = (g: number): number => {
    const si = shardOf(starts, g);
    const s = indexes[si]!;
    return views[si]!.getInt32(s.layout.exactOffset + (g - s.start) * EXACT_BYTES + 4, true);
  };
  const order = new Int32Array(n);
  const scratch = new Int32Array(n);
  const counts = new Int32Array(65536);
  radixSort(hi, n, order, scratch, counts);
  // Links (see linkRep, linkNear): -1 for a document outside both stages (empty), else its exact
  // class's first document; the band passes later turn a first document's own id into its near link.
  const link = new Int32Array(n).fill(-1);
  for (let p = 0; p < n; ) {
    let q = p + 1;
    const h = hi[order[p]!]!;
    while (q < n && hi[order[q]!]! === h) q++;
    // Within a run of equal high halves, group by the low half, keeping corpus order.
    let members: ArrayLike<number> = order.subarray(p, q);
    let lows: ArrayLike<number> | null = null;
    if (q - p > 1) {
      const l = Array.from(members, loOf);
      if (l.some((v) => v !== l[0])) {
        const sorted = Array.from(members, (g, x) => [l[x]!, g] as const).sort((a, b) => a[0] - b[0] || a[1] - b[1]);
        members = sorted.map((e) => e[1]);
        lows = sorted.map((e) => e[0]);
      } else lows = l;
    }
    for (let x = 0; x < members.length; ) {
      let y = x + 1;
      if (lows) while (y < members.length && lows[y] === lows[x]) y++;
      let first = -1;
      for (let z = x; z < y; z++) {
        const g = members[z]!;
        if ((flags[g]! & KIND_MASK) === KIND_EMPTY) continue;
        if (first < 0) first = g;
        link[g] = first;
        flags[first] = flags[first]! | (flags[g]! & IN_NEW_SHARD ? CLASS_HAS_NEW : CLASS_HAS_EXISTING);
      }
      x = y;
    }
    p = q;
  }
  const workingExact = flags.byteLength + hi.byteLength + order.byteLength + scratch.byteLength + link.byteLength + counts.byteLength;
  // Three n-sized buffers live on after the exact stage: band keys, then cluster bookkeeping.
  const bufA = hi.buffer;
  const bufB = order.buffer;
  const bufC = scratch.buffer;

  // Near detection over the first document of each exact class that has words. Band keys are
  // kept for every document (0 for the others, never 0 for participants), so sort positions are
  // global ids and no list of participants is needed.
  for (let g = 0; g < n; g++) if (link[g] === g && (flags[g]! & KIND_MASK) === KIND_FULL) flags[g] = flags[g]! | PARTICIPANT;
  // The exact stage's arrays are reused: hash halves become band keys and sort buffers.
  const keys = hi;
  const sig = new SignatureReader(indexes, starts, k, bits);
  let comparedPairs = 0;
  let verifiedPairs = 0;
  let cappedBuckets = 0;
  const threshold = options.threshold;
  for (let band = 0; band < bands; band++) {
    sig.bandKeys(flags, band * rows, rows, keys);
    radixSort(keys, n, order, scratch, counts);
    for (let p = 0; p < n; ) {
      let q = p + 1;
      const key = keys[order[p]!]!;
      while (q < n && keys[order[q]!]! === key) q++;
      if (key === 0 || q - p === 1) {
        p = q; // documents outside near detection, or a bucket of one
        continue;
      }
      if (q - p > cap + 1) cappedBuckets++;
      for (let x = p + 1; x < q; x++) {
        const i = order[x]!;
        const fi = flags[i]!;
        if (fi & NEAR && !(trackExisting && fi & (CLASS_HAS_EXISTING | CLASS_HAS_NEW))) continue;
        const stop = Math.max(p, x - cap);
        for (let y = x - 1; y >= stop; y--) {
          const j = order[y]!;
          const f = flags[i]!;
          const fj = flags[j]!;
          const needNear = (f & NEAR) === 0;
          const wantI = trackExisting && wantsExisting(f) && (fj & CLASS_HAS_EXISTING) !== 0;
          const wantJ = trackExisting && wantsExisting(fj) && (f & CLASS_HAS_EXISTING) !== 0;
          if (!needNear && !wantI && !wantJ) {
            if (!trackExisting) break;
            continue;
          }
          comparedPairs++;
          if (sig.jaccard(i, j) < threshold) continue;
          verifiedPairs++;
          if (needNear) {
            flags[i] = flags[i]! | NEAR;
            link[i] = NEAR_LINK_BASE - j;
          }
          if (wantI) flags[i] = flags[i]! | NEAR_EXISTING;
          if (wantJ) flags[j] = flags[j]! | NEAR_EXISTING;
        }
      }
      p = q;
    }
  }
  const workingBytes = Math.max(
    workingExact,
    flags.byteLength + link.byteLength + bufA.byteLength + bufB.byteLength + bufC.byteLength + counts.byteLength,
  );

  // Roots of the near trees (links always point earlier, so one forward pass), then sizes.
  const rootOf = new Int32Array(bufA, 0, n);
  const nearSize = new Int32Array(bufB, 0, n).fill(0);
  const exactSize = new Int32Array(bufC, 0, n).fill(0);
  for (let g = 0; g < n; g++) {
    const r = linkRep(link, g);
    if (r >= 0) exactSize[r] = exactSize[r]! + 1;
    if (r === g && (flags[g]! & KIND_MASK) === KIND_FULL) {
      const j = linkNear(link, g);
      rootOf[g] = j < 0 ? g : rootOf[j]!;
      nearSize[rootOf[g]!] = nearSize[rootOf[g]!]! + 1;
    } else {
      rootOf[g] = -1;
    }
  }

  // Tallies, by shard and by language, in one pass over the location streams.
  const tallyOf = (): DuplicateTally => ({ docs: 0, emptyDocs: 0, wordlessDocs: 0, exactDocs: 0, nearDocs: 0 });
  const totalTally = tallyOf();
  const perShard: Array<{ shard: string } & DuplicateTally> = [];
  const perLanguage = new Map<number, DuplicateTally>();
  const against: AgainstExisting | undefined = trackExisting
    ? {
        newShards: [...newNames],
        unknownShards: [...newNames].filter((s) => !seen.has(s)),
        docs: 0,
        exactDocs: 0,
        nearDocs: 0,
        withinExactDocs: 0,
        withinNearDocs: 0,
        perShard: [],
      }
    : undefined;
  // PARTICIPANT is not read after the band passes: the tally reuses the bit on a class's first
  // document to mark that it has met one of the class's new members.
  const SEEN_NEW = PARTICIPANT;
  if (against) for (let g = 0; g < n; g++) flags[g] = flags[g]! & ~SEEN_NEW;
  indexes.forEach((s, si) => {
    const st = tallyOf();
    const ag = { shard: s.shard, docs: 0, exactDocs: 0, nearDocs: 0, withinExactDocs: 0, withinNearDocs: 0 };
    readLocations(s, (i, _line, language, kind) => {
      const g = s.start + i;
      let lt = perLanguage.get(language);
      if (!lt) perLanguage.set(language, (lt = tallyOf()));
      const r = linkRep(link, g);
      const exact = r >= 0 && r !== g;
      const near = !exact && r === g && (flags[g]! & NEAR) !== 0;
      count(st, kind, exact, near);
      count(lt, kind, exact, near);
      count(totalTally, kind, exact, near);
      if (against && isNew[si]) {
        ag.docs++;
        if (r >= 0) {
          const fr = flags[r]!;
          if (fr & CLASS_HAS_EXISTING) ag.exactDocs++;
          else if (fr & NEAR_EXISTING) ag.nearDocs++;
          // A class of new documents only, met in corpus order, so its first document r comes first.
          else if (fr & SEEN_NEW) ag.withinExactDocs++;
          else {
            flags[r] = fr | SEEN_NEW;
            // Verified against an earlier class, which has no existing member (else NEAR_EXISTING would be set): a near copy within the change.
            if (r === g && (fr & NEAR) !== 0) ag.withinNearDocs++;
          }
        }
      }
    });
    perShard.push({ shard: s.shard, ...st });
    if (against && isNew[si]) {
      against.perShard.push(ag);
      against.docs += ag.docs;
      against.exactDocs += ag.exactDocs;
      against.nearDocs += ag.nearDocs;
      against.withinExactDocs += ag.withinExactDocs;
      against.withinNearDocs += ag.withinNearDocs;
    }
  });

  // Largest clusters: a bounded selection over every cluster, then their members.
  let exactClusters = 0;
  let nearClusters = 0;
  const top = new TopClusters(maxClusters);
  for (let g = 0; g < n; g++) {
    if (exactSize[g]! >= 2) {
      exactClusters++;
      top.offer(g, exactSize[g]!, 'exact');
    }
    if (nearSize[g]! >= 2) {
      nearClusters++;
      top.offer(g, nearSize[g]!, 'near');
    }
  }
  const chosen = top.sorted();
  const exactSlot = new Map<number, number>();
  const nearSlot = new Map<number, number>();
  chosen.forEach((c, idx) => (c.kind === 'exact' ? exactSlot : nearSlot).set(c.first, idx));
  const copies: number[][] = chosen.map(() => []);
  for (let g = 0; g < n; g++) {
    const r = linkRep(link, g);
    if (r >= 0 && r !== g) {
      const slot = exactSlot.get(r);
      if (slot !== undefined && copies[slot]!.length < maxCopies) copies[slot]!.push(g);
    }
    const t = rootOf[g]!;
    if (t >= 0 && t !== g) {
      const slot = nearSlot.get(t);
      if (slot !== undefined && copies[slot]!.length < maxCopies) copies[slot]!.push(g);
    }
  }
  const wanted = new Set<number>();
  chosen.forEach((c, idx) => {
    wanted.add(c.first);
    for (const g of copies[idx]!) {
      wanted.add(g);
      if (c.kind === 'near') wanted.add(linkNear(link, g));
    }
  });
  const where = locate(indexes, starts, wanted);
  const clusters: DuplicateCluster[] = chosen.map((c, idx) => ({
    kind: c.kind,
    first: where.get(c.first)!,
    size: c.size,
    copies: copies[idx]!.map((g): DuplicateCopy => {
      const at = where.get(g)!;
      if (c.kind === 'exact') return { ...at };
      const of = linkNear(link, g);
      return { ...at, jaccard: round4(sig.jaccard(g, of)), of: where.get(of)! };
    }),
    copiesOmitted: c.size - 1 - copies[idx]!.length,
  }));

  return {
    options,
    total: totalTally,
    exactDocs: totalTally.exactDocs,
    nearDocs: totalTally.nearDocs,
    perShard,
    perLanguage: [...perLanguage].sort((a, b) => a[0] - b[0]).map(([language, t]) => ({ language, ...t })),
    clusters,
    exactClusters,
    nearClusters,
    clustersOmitted: exactClusters + nearClusters - clusters.length,
    ...(against ? { againstExisting: against } : {}),
    statistics: {
      bands,
      rows,
      signatureBits: bits,
      comparedPairs,
      verifiedPairs,
      cappedBuckets,
      workingBytes,
      workingBytesPerDocument: n ? round4(workingBytes / n) : 0,
      indexBytes,
      indexBytesPerDocument: n ? round4(indexBytes / n) : 0,
    },
  };
}

/** Adds one document to a tally. */
function count(t: DuplicateTally, kind: number, exact: boolean, near: boolean): void {
  t.docs++;
  if (kind === KIND_EMPTY) t.emptyDocs++;
  if (kind === KIND_WORDLESS) t.wordlessDocs++;
  if (exact) t.exactDocs++;
  if (near) t.nearDocs++;
}

/** True when a class's flags say it has a member in a new shard, none in an existing one, and no near copy in an existing shard found yet. */
function wantsExisting(f: number): boolean {
  return (f & (CLASS_HAS_NEW | CLASS_HAS_EXISTING | NEAR_EXISTING)) === CLASS_HAS_NEW;
}

function round4(x: number): number {
  return Math.round(x * 1e4) / 1e4;
}

/** Calls `visit(i, line, language, kind)` for every document of a shard's location stream, or throws DuplicateIndexError when the stream is malformed. */
function readLocations(s: ShardIndex, visit: (i: number, line: number, language: number, kind: number) => void): void {
  const start = s.layout.streamOffset;
  readLocationRecords(
    s.blob,
    start,
    start + s.layout.streamBytes,
    s.layout.documents,
    (i, line, tag) => {
      const kind = tag % 4;
      if (kind > KIND_FULL) throw new DuplicateIndexError(s.shard, `corrupt: unknown document kind ${kind}`);
      visit(i, line, Math.floor(tag / 4), kind);
    },
    (reason) => {
      throw new DuplicateIndexError(s.shard, `corrupt: ${reason}`);
    },
  );
}

/** Returns the location of each wanted global document id, reading only the shards that hold one. */
function locate(indexes: ShardIndex[], starts: Int32Array, wanted: Set<number>): Map<number, DocumentLocation> {
  const out = new Map<number, DocumentLocation>();
  const byShard = new Map<number, Set<number>>();
  for (const g of wanted) {
    const si = shardOf(starts, g);
    let set = byShard.get(si);
    if (!set) byShard.set(si, (set = new Set()));
    set.add(g);
  }
  for (const [si, set] of byShard) {
    const s = indexes[si]!;
    readLocations(s, (i, line, language) => {
      const g = s.start + i;
      if (set.has(g)) out.set(g, { shard: s.shard, line, language });
    });
  }
  return out;
}

/** Returns the index of the shard holding global document `g` (binary search over shard starts). */
function shardOf(starts: Int32Array, g: number): number {
  let a = 0;
  let b = starts.length - 2;
  while (a < b) {
    const mid = (a + b + 1) >>> 1;
    if (starts[mid]! <= g) a = mid;
    else b = mid - 1;
  }
  // Skip empty shards that share the start.
  while (a + 1 < starts.length - 1 && starts[a + 1]! <= g) a++;
  return a;
}

/** Sorts positions 0..n−1 by keys[position] (as unsigned 32-bit), stably, into `out`: two 16-bit counting passes. */
function radixSort(keys: Int32Array, n: number, out: Int32Array, scratch: Int32Array, counts: Int32Array): void {
  counts.fill(0);
  for (let i = 0; i < n; i++) counts[keys[i]! & 0xffff]!++;
  let sum = 0;
  for (let d = 0; d < 65536; d++) {
    const c = counts[d]!;
    counts[d] = sum;
    sum += c;
  }
  for (let i = 0; i < n; i++) scratch[counts[keys[i]! & 0xffff]!++] = i;
  counts.fill(0);
  for (let i = 0; i < n; i++) counts[keys[i]! >>> 16]!++;
  sum = 0;
  for (let d = 0; d < 65536; d++) {
    const c = counts[d]!;
    counts[d] = sum;
    sum += c;
  }
  for (let p = 0; p < n; p++) {
    const i = scratch[p]!;
    out[counts[keys[i]! >>> 16]!++] = i;
  }
}

/** Reads reduced-width signatures straight from the shards' blobs. */
class SignatureReader {
  private readonly blobs: Uint8Array[];
  private readonly offsets: number[];
  private readonly bytes: number;
  private lastShard = 0;

  constructor(
    indexes: ShardIndex[],
    private readonly starts: Int32Array,
    private readonly k: number,
    private readonly bits: number,
  ) {
    this.blobs = indexes.map((s) => s.blob);
    this.offsets = indexes.map((s) => s.layout.signatureOffset);
    this.bytes = indexes[0]?.layout.signatureBytes ?? 0;
  }

  /** Returns [blob, byte offset] of global document g's signature. */
  private find(g: number): number {
    const st = this.starts;
    let s = this.lastShard;
    if (!(st[s]! <= g && g < st[s + 1]!)) s = this.lastShard = shardOf(st, g);
    return s;
  }

  /** Returns the estimated Jaccard similarity of two documents from their stored values. */
  jaccard(a: number, b: number): number {
    const sa = this.find(a);
    const oa = this.offsets[sa]! + (a - this.starts[sa]!) * this.bytes;
    const sb = this.find(b);
    const ob = this.offsets[sb]! + (b - this.starts[sb]!) * this.bytes;
    const same = agreement(this.blobs[sa]!, oa, this.blobs[sb]!, ob, this.bytes, this.k, this.bits);
    return jaccardFromAgreement(same, this.k, this.bits);
  }

  /** Writes into keys[g] the band key (values [first, first + rows)) of every document taking part in near detection, and 0 into the others'. */
  bandKeys(flags: Uint8Array, first: number, rows: number, keys: Int32Array): void {
    const bits = this.bits;
    const nb = this.bytes;
    for (let s = 0; s < this.blobs.length; s++) {
      const blob = this.blobs[s]!;
      const end = this.starts[s + 1]!;
      for (let g = this.starts[s]!, off = this.offsets[s]!; g < end; g++, off += nb) {
        keys[g] = flags[g]! & PARTICIPANT ? bandKey(blob, off, bits, first, rows) || 1 : 0;
      }
    }
  }
}

/** Returns how many of the k stored `bits`-bit values agree between the signatures at a[oa] and b[ob] (each `bytes` long). */
function agreement(a: Uint8Array, oa: number, b: Uint8Array, ob: number, bytes: number, k: number, bits: number): number {
  let same = 0;
  if (bits === 4) {
    for (let i = 0; i < bytes; i++) same += EQUAL_NIBBLES[a[oa + i]! ^ b[ob + i]!]!;
    if (k % 2 === 1) same--; // the unused top nibble of the last byte is 0 in both
  } else {
    const w = bits / 8;
    for (let i = 0; i < bytes; i += w) {
      let eq = true;
      for (let j = 0; j < w; j++) if (a[oa + i + j] !== b[ob + i + j]) eq = false;
      if (eq) same++;
    }
  }
  return same;
}

/** Returns the band key of the signature at blob[off]: a 32-bit hash of its values [first, first + rows). */
function bandKey(blob: Uint8Array, off: number, bits: number, first: number, rows: number): number {
  let h = 0x3c6ef372 ^ first;
  for (let v = first; v < first + rows; v++) {
    let x: number;
    if (bits === 4) x = (blob[off + (v >>> 1)]! >>> ((v & 1) << 2)) & 15;
    else if (bits === 8) x = blob[off + v]!;
    else if (bits === 16) x = blob[off + 2 * v]! | (blob[off + 2 * v + 1]! << 8);
    else x = blob[off + 4 * v]! | (blob[off + 4 * v + 1]! << 8) | (blob[off + 4 * v + 2]! << 16) | (blob[off + 4 * v + 3]! << 24);
    h = Math.imul(h ^ x, 0x01000193);
    h = (h << 13) | (h >>> 19);
  }
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return h ^ (h >>> 16);
}

/** Returns a blob's layout, or throws DuplicateIndexError naming `label`. */
function layoutOf(blob: Uint8Array, label: string): IndexLayout {
  const r = parseIndex(blob);
  if (!r.ok) throw new DuplicateIndexError(label, r.reason);
  return r.layout;
}

/** Returns the estimated Jaccard similarity of document `i` of blob `a` and document `j` of blob `b`, from their stored signatures (0 when either has no words): what the join's verification computes. */
export function estimateJaccard(a: Uint8Array, i: number, b: Uint8Array, j: number): number {
  const la = layoutOf(a, 'first index');
  const lb = layoutOf(b, 'second index');
  if (la.hashes !== lb.hashes || la.signatureBits !== lb.signatureBits || la.shingle !== lb.shingle) {
    throw new DuplicateIndexError('second index', `built with other parameters than the first (${lb.shingle}/${lb.hashes}/${lb.signatureBits} against ${la.shingle}/${la.hashes}/${la.signatureBits})`);
  }
  for (const [l, x, label] of [[la, i, 'first'], [lb, j, 'second']] as const) {
    if (!Number.isInteger(x) || x < 0 || x >= l.documents) throw new RangeError(`estimateJaccard: document ${x} is not in the ${label} index (${l.documents} documents)`);
  }
  if (kindAt(a, la, i) !== KIND_FULL || kindAt(b, lb, j) !== KIND_FULL) return 0;
  const same = agreement(a, la.signatureOffset + i * la.signatureBytes, b, lb.signatureOffset + j * lb.signatureBytes, la.signatureBytes, la.hashes, la.signatureBits);
  return jaccardFromAgreement(same, la.hashes, la.signatureBits);
}

/** Returns the band keys of document `i` of a blob for `bands` bands of `rows` rows (what the join groups candidates by). */
export function bandKeysOf(blob: Uint8Array, i: number, bands: number, rows: number): Int32Array {
  const l = layoutOf(blob, 'index');
  if (bands * rows > l.hashes) throw new RangeError(`bandKeysOf: ${bands} bands of ${rows} rows exceed the ${l.hashes} stored values`);
  if (!Number.isInteger(i) || i < 0 || i >= l.documents) throw new RangeError(`bandKeysOf: document ${i} is not in the index (${l.documents} documents)`);
  const out = new Int32Array(bands);
  const off = l.signatureOffset + i * l.signatureBytes;
  for (let band = 0; band < bands; band++) out[band] = bandKey(blob, off, l.signatureBits, band * rows, rows);
  return out;
}

function kindAt(blob: Uint8Array, layout: IndexLayout, i: number): number {
  let kind = -1;
  readLocations({ shard: 'index', blob, layout, start: 0 }, (x, _l, _g, k) => {
    if (x === i) kind = k;
  });
  return kind;
}

/** Keeps the `limit` largest clusters offered (ties: earliest first document, exact before near). */
class TopClusters {
  private items: Array<{ first: number; size: number; kind: 'exact' | 'near' }> = [];
  constructor(private readonly limit: number) {}

  offer(first: number, size: number, kind: 'exact' | 'near'): void {
    if (this.limit === 0) return;
    this.items.push({ first, size, kind });
    // Cut back to the limit whenever twice as many have gathered: O(clusters · log limit).
    if (this.items.length >= 2 * this.limit && this.items.length >= 1024) this.cut();
  }

  sorted(): Array<{ first: number; size: number; kind: 'exact' | 'near' }> {
    this.cut();
    return this.items;
  }

  private cut(): void {
    this.items.sort((a, b) => b.size - a.size || a.first - b.first || (a.kind === b.kind ? 0 : a.kind === 'exact' ? -1 : 1));
    if (this.items.length > this.limit) this.items.length = this.limit;
  }
}
