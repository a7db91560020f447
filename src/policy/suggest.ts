// "Did you mean" for policy keys and values: the nearest candidate by
// Damerau–Levenshtein distance (optimal string alignment: insertions, deletions,
// substitutions and swaps of neighbours each cost one).

/** Largest distance ever suggested: beyond two edits a "suggestion" is mostly noise. */
const MAX_DISTANCE = 2;

/** Prefix matches count only from this length: shorter prefixes match too much. */
const MIN_PREFIX_LENGTH = 4;

/** Keys of at most this length get one edit only, so `max` does not suggest `map`-like strangers. */
const SHORT_KEY_LENGTH = 4;

/** Returns the optimal-string-alignment distance between two strings. */
export function editDistance(a: string, b: string): number {
  if (a === b) return 0;
  const m = a.length;
  const n = b.length;
  // Three rolling rows: the swap rule looks two rows back.
  let prev2 = new Array<number>(n + 1).fill(0);
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  let cur = new Array<number>(n + 1).fill(0);
  for (let i = 1; i <= m; i++) {
    cur[0] = i;
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) {
        d = Math.min(d, prev2[j - 2]! + 1);
      }
      cur[j] = d;
    }
    [prev2, prev, cur] = [prev, cur, prev2];
  }
  return prev[n]!;
}

/** Returns the form a key is compared in: lower case, without `-` and `_`, so `maxOther` and `max_other` meet `max-other`. */
function folded(s: string): string {
  return s.toLowerCase().replace(/[-_\s]/g, '');
}

/** Returns the letters of a string in sorted order. */
function sortedLetters(s: string): string {
  return [...s].sort().join('');
}

/** Returns the candidate closest to `input` when it is near enough to be a likely typo, else undefined. */
export function nearest(input: string, candidates: Iterable<string>): string | undefined {
  const list = [...candidates];
  const want = folded(input);
  const wantLetters = sortedLetters(want);
  let best: string | undefined;
  let bestDistance = Infinity;
  let bestSameLetters = false;
  for (const candidate of list) {
    if (candidate === input) continue;
    const f = folded(candidate);
    const d = editDistance(want, f);
    const limit = candidate.length <= SHORT_KEY_LENGTH ? 1 : MAX_DISTANCE;
    if (d > limit) continue;
    // On a tie, a candidate with the same letters (a swap) beats a substitution: `1265` → `1256`, not `1255`.
    const sameLetters = sortedLetters(f) === wantLetters;
    if (d < bestDistance || (d === bestDistance && sameLetters && !bestSameLetters)) {
      best = candidate;
      bestDistance = d;
      bestSameLetters = sameLetters;
    }
  }
  if (best !== undefined) return best;
  // No near spelling: a candidate that starts the input, or that the input starts (`warning` → `warn`), is the next best guess.
  for (const candidate of list) {
    const f = folded(candidate);
    if (f.length >= MIN_PREFIX_LENGTH && want.length >= MIN_PREFIX_LENGTH && (want.startsWith(f) || f.startsWith(want))) return candidate;
  }
  return undefined;
}

/** Returns the suggestion text the problem list shows, e.g. "did you mean `tolerance`?". */
export function didYouMean(candidate: string): string {
  return `did you mean \`${candidate}\`?`;
}
