// Bytes of one line to text, strictly: a line with NUL bytes is binary, a line with
// bytes its encoding does not define is rejected, never patched with U+FFFD.
import { isUtf8 } from 'node:buffer';
import iconv from 'iconv-lite';

/** Why a line's bytes could not be turned into text, and where in the line (byte offset). */
export interface LineFault {
  reason: 'binary' | 'invalid-encoding';
  /** 0-based byte offset in the line of the first NUL byte, or of the first byte that is not valid in the encoding. */
  at: number;
}

/** Turns the bytes buf[start, end) of one line into text. `clean` promises the bytes were already checked (valid and NUL-free) as part of a larger block. */
export type LineDecoder = (buf: Buffer, start: number, end: number, clean: boolean) => string | LineFault;

/** Returns the 0-based offset of the first byte that does not start a well-formed UTF-8 sequence (Unicode Standard, Table 3-7), or -1 when all bytes are well-formed. */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  const n = bytes.length;
  let i = 0;
  while (i < n) {
    const b = bytes[i]!;
    if (b < 0x80) {
      i++;
      continue;
    }
    // Range of the second byte and number of continuation bytes, by lead byte.
    let lo = 0x80;
    let hi = 0xbf;
    let need: number;
    if (b >= 0xc2 && b <= 0xdf) need = 1;
    else if (b === 0xe0) (need = 2), (lo = 0xa0);
    else if (b === 0xed) (need = 2), (hi = 0x9f); // no surrogates
    else if (b >= 0xe1 && b <= 0xef) need = 2;
    else if (b === 0xf0) (need = 3), (lo = 0x90);
    else if (b === 0xf4) (need = 3), (hi = 0x8f); // nothing above U+10FFFF
    else if (b >= 0xf1 && b <= 0xf3) need = 3;
    else return i; // 0x80..0xC1 (continuation or overlong lead) or 0xF5..0xFF
    if (i + need >= n) return i; // sequence cut off by the end of the line
    const b1 = bytes[i + 1]!;
    if (b1 < lo || b1 > hi) return i;
    for (let k = 2; k <= need; k++) {
      const bk = bytes[i + k]!;
      if (bk < 0x80 || bk > 0xbf) return i;
    }
    i += need + 1;
  }
  return -1;
}

/** Returns the decoder of one line's bytes for an encoding (UTF-8 natively, any other through iconv-lite). */
export function lineDecoder(encoding: string): LineDecoder {
  return isUtf8Name(encoding) ? decodeUtf8Line : legacyLineDecoder(encoding);
}

/** Returns true when the encoding name means UTF-8 (`utf-8`, `UTF8`, `utf_8`). */
export function isUtf8Name(encoding: string): boolean {
  return encoding.toLowerCase().replace(/[^a-z0-9]/g, '') === 'utf8';
}

function decodeUtf8Line(buf: Buffer, start: number, end: number, clean: boolean): string | LineFault {
  if (clean) return buf.toString('utf8', start, end);
  const line = buf.subarray(start, end);
  const nul = line.indexOf(0);
  if (nul !== -1) return { reason: 'binary', at: nul };
  if (!isUtf8(line)) return { reason: 'invalid-encoding', at: firstInvalidUtf8(line) };
  return line.toString('utf8');
}

function legacyLineDecoder(encoding: string): LineDecoder {
  return (buf, start, end, clean) => {
    const line = buf.subarray(start, end);
    if (!clean) {
      const nul = line.indexOf(0);
      if (nul !== -1) return { reason: 'binary', at: nul };
    }
    const text = iconv.decode(line, encoding, { stripBOM: false });
    // iconv-lite writes U+FFFD for a byte the code page leaves undefined (0x81 in windows-1252, 0xA1 in ISO-8859-6).
    // A legacy encoding that could carry U+FFFD itself (gb18030) would be misread here; no corpus is expected to.
    if (!text.includes('\uFFFD')) return text;
    return { reason: 'invalid-encoding', at: firstUndecodableByte(line, encoding) };
  };
}

/** Offset of the byte whose decoding first yields U+FFFD; exact for single-byte code pages, the last byte of the bad sequence for multi-byte ones. */
function firstUndecodableByte(line: Buffer, encoding: string): number {
  const decoder = iconv.getDecoder(encoding, { stripBOM: false });
  for (let i = 0; i < line.length; i++) {
    if (decoder.write(line.subarray(i, i + 1)).includes('\uFFFD')) return i;
  }
  return Math.max(0, line.length - 1);
}
