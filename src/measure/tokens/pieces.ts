// The pre-token pieces of one counted text, recorded so that measureTokens can take a
// word's count from the piece that spans exactly the same characters instead of
// counting the word again (see TokenCounter.countWithPieces).

/** Initial capacity; the arrays double when a long document needs more. */
const INITIAL_PIECES = 4096;

/** Piece ends and token counts of one text, in order; piece k spans [ends[k-1] (0 for k = 0), ends[k]). */
export class PieceList {
  ends = new Int32Array(INITIAL_PIECES);
  counts = new Int32Array(INITIAL_PIECES);
  length = 0;

  /** Forgets the pieces of the previous text. */
  reset(): void {
    this.length = 0;
  }

  /** Appends the first `n` pieces of two arrays of ends and counts. */
  append(ends: Int32Array, counts: Int32Array, n: number): void {
    this.reserve(this.length + n);
    this.ends.set(ends.subarray(0, n), this.length);
    this.counts.set(counts.subarray(0, n), this.length);
    this.length += n;
  }

  /** Appends a piece ending at `end` that counts `count` tokens. */
  push(end: number, count: number): void {
    if (this.length === this.ends.length) this.reserve(this.length + 1);
    this.ends[this.length] = end;
    this.counts[this.length] = count;
    this.length++;
  }

  /** Doubles the arrays until they hold `pieces`, keeping what they hold. */
  private reserve(pieces: number): void {
    let capacity = this.ends.length;
    while (capacity < pieces) capacity *= 2;
    if (capacity === this.ends.length) return;
    const ends = new Int32Array(capacity);
    ends.set(this.ends.subarray(0, this.length));
    this.ends = ends;
    const counts = new Int32Array(capacity);
    counts.set(this.counts.subarray(0, this.length));
    this.counts = counts;
  }
}
