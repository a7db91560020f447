// Which legacy encodings a corpus may declare: those whose lines the reader can split at byte 0x0A.
import iconv from 'iconv-lite';

/** Returns true when iconv-lite knows the encoding and it keeps ASCII bytes as they are, so lines can be split at byte 0x0A. */
export function isLineSplittableEncoding(encoding: string): boolean {
  if (!iconv.encodingExists(encoding)) return false;
  // UTF-16/32 put NUL bytes around every ASCII character; splitting such bytes at 0x0A would cut characters in half.
  const probe = iconv.encode('a\n{', encoding, { addBOM: false });
  return probe.length === 3 && probe[0] === 0x61 && probe[1] === 0x0a && probe[2] === 0x7b;
}
