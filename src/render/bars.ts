// Small horizontal bars drawn with block characters: they render the same in a
// terminal, a job summary and a PR comment, with no image or script.

const FULL = '█';
const PARTIAL = ['', '▏', '▎', '▍', '▌', '▋', '▊', '▉'];

/** Returns a bar `width` cells wide at full scale for a value in [0, 1]. */
export function bar(value: number, width = 20): string {
  const cells = Math.max(0, Math.min(1, value)) * width;
  const whole = Math.floor(cells);
  const eighth = Math.round((cells - whole) * 8);
  return FULL.repeat(whole) + (eighth === 8 ? FULL : PARTIAL[eighth]!);
}
