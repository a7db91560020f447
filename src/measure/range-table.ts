// Code point → small-integer lookup tables, expanded from generated ranges: a direct
// array for the BMP (one load per character in the hot loops) and a binary search
// over the few ranges beyond it. Used for the Script property and franc's script classes.

export interface RangeTable {
  /** Value of every BMP code point (index = code point). */
  bmp: Uint8Array;
  /** Value of a code point outside the BMP. */
  astral(cp: number): number;
}

/** Returns a function that builds the table of ranges (`starts[i]` up to the next start has `values[i]`) on first use. */
export function lazyRangeTable(starts: readonly number[], values: readonly number[]): () => RangeTable {
  let table: RangeTable | undefined;
  return () => (table ??= rangeTable(starts, values));
}

function rangeTable(starts: readonly number[], values: readonly number[]): RangeTable {
  const bmp = new Uint8Array(0x10000);
  const astralStartList: number[] = [];
  const astralValueList: number[] = [];
  for (let r = 0; r < starts.length; r++) {
    const start = starts[r] as number;
    const end = starts[r + 1] ?? 0x110000;
    const value = values[r] as number;
    if (start < 0x10000) bmp.fill(value, start, Math.min(end, 0x10000));
    if (end > 0x10000) {
      astralStartList.push(Math.max(start, 0x10000));
      astralValueList.push(value);
    }
  }
  const astralStarts = Int32Array.from(astralStartList);
  const astralValues = Uint8Array.from(astralValueList);
  return {
    bmp,
    astral(cp) {
      let lo = 0;
      let hi = astralStarts.length - 1;
      while (lo < hi) {
        const midpoint = (lo + hi + 1) >> 1;
        if ((astralStarts[midpoint] as number) <= cp) lo = midpoint;
        else hi = midpoint - 1;
      }
      return astralValues[lo] as number;
    },
  };
}
