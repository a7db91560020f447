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

  /** Appends a piece ending at `end` that counts `count` tokens. */
  push(end: number, count: number): void {
    if (this.length === this.ends.length) {
      const ends = new Int32Array(this.length * 2);
      ends.set(this.ends);
      this.ends = ends;
      const counts = new Int32Array(this.length * 2);
      counts.set(this.counts);
      this.counts = counts;
    }
    this.ends[this.length] = end;
    this.counts[this.length] = count;
    this.length++;
  }
}
