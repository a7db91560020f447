import { describe, expect, it } from 'vitest';
import iconv from 'iconv-lite';
import { firstInvalidUtf8, isLineSplittableEncoding, shardKindOf } from '../../src/read/index.js';
import { LineSplitter } from '../../src/read/lines.js';
import { accountedLines, memoryShard, readAll } from './helpers.js';

/** A small deterministic generator (LCG), so that any failure can be replayed. */
function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 2 ** 32;
}

describe('firstInvalidUtf8', () => {
  // Source: The Unicode Standard, chapter 3, Table 3-7 "Well-Formed UTF-8 Byte Sequences".
  const wellFormed: number[][] = [
    [0x24], // U+0024
    [0xc2, 0xa2], // U+00A2
    [0xe0, 0xa4, 0xb9], // U+0939 DEVANAGARI LETTER HA
    [0xed, 0x9f, 0xbf], // U+D7FF, last before the surrogates
    [0xee, 0x80, 0x80], // U+E000
    [0xf0, 0x90, 0x80, 0x80], // U+10000
    [0xf4, 0x8f, 0xbf, 0xbf], // U+10FFFF
  ];
  const illFormed: [number[], number][] = [
    [[0x80], 0], // lone continuation byte
    [[0xc0, 0xaf], 0], // overlong "/"
    [[0xc1, 0xbf], 0], // overlong
    [[0xe0, 0x80, 0xaf], 0], // overlong three-byte form
    [[0xed, 0xa0, 0x80], 0], // U+D800, a surrogate
    [[0xf0, 0x80, 0x80, 0xaf], 0], // overlong four-byte form
    [[0xf4, 0x90, 0x80, 0x80], 0], // above U+10FFFF
    [[0xf5, 0x80, 0x80, 0x80], 0], // F5..FF never appear
    [[0x61, 0x62, 0xe2, 0x82], 2], // cut off by the end
    [[0x61, 0xc3, 0x28], 1], // second byte out of range
  ];

  it('accepts the well-formed sequences of Table 3-7 and rejects the ill-formed ones at their first byte', () => {
    for (const seq of wellFormed) expect(firstInvalidUtf8(Uint8Array.from(seq)), seq.join(' ')).toBe(-1);
    for (const [seq, at] of illFormed) expect(firstInvalidUtf8(Uint8Array.from(seq)), seq.join(' ')).toBe(at);
  });

  it('agrees with the WHATWG TextDecoder on random bytes: valid iff fatal decoding succeeds, offset where U+FFFD first appears', () => {
    // Reference: the WHATWG Encoding Standard's UTF-8 decoder, as Node's TextDecoder implements it.
    const fatal = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });
    const lenient = new TextDecoder('utf-8', { ignoreBOM: true });
    const random = lcg(7);
    // Bytes drawn mostly from lead and continuation ranges, so that both outcomes are common.
    const pool = [0x41, 0x7a, 0x80, 0x8f, 0x90, 0x9f, 0xa0, 0xbf, 0xc2, 0xdf, 0xe0, 0xe1, 0xed, 0xef, 0xf0, 0xf4, 0xf5, 0xc0];
    let valid = 0;
    for (let trial = 0; trial < 4000; trial++) {
      const bytes = Uint8Array.from({ length: 1 + Math.floor(random() * 8) }, () => pool[Math.floor(random() * pool.length)]!);
      const at = firstInvalidUtf8(bytes);
      let decodes = true;
      try {
        fatal.decode(bytes);
      } catch {
        decodes = false;
      }
      expect(at === -1, Array.from(bytes).join(' ')).toBe(decodes);
      if (at === -1) {
        valid++;
        continue;
      }
      // The valid prefix decodes on its own, and the lenient decoder puts its first U+FFFD right after it.
      const prefix = fatal.decode(bytes.subarray(0, at));
      expect(lenient.decode(bytes).indexOf('\uFFFD'), Array.from(bytes).join(' ')).toBe(prefix.length);
    }
    expect(valid).toBeGreaterThan(50);
  });
});

describe('legacy code pages', () => {
  // Values quoted from memory of the Unicode Consortium's mapping files
  // MAPPINGS/VENDORS/MICSFT/WINDOWS/CP1256.TXT and MAPPINGS/ISO8859/8859-6.TXT; each is also checked against iconv-lite below.
  const CP1256: [number, number][] = [
    [0x80, 0x20ac], // EURO SIGN
    [0x81, 0x067e], // ARABIC LETTER PEH
    [0x8d, 0x0686], // ARABIC LETTER TCHEH
    [0x90, 0x06af], // ARABIC LETTER GAF
    [0xa1, 0x060c], // ARABIC COMMA
    [0xba, 0x061b], // ARABIC SEMICOLON
    [0xbf, 0x061f], // ARABIC QUESTION MARK
    [0xc1, 0x0621], // ARABIC LETTER HAMZA
    [0xc7, 0x0627], // ARABIC LETTER ALEF
    [0xc8, 0x0628], // ARABIC LETTER BEH
    [0xd7, 0x00d7], // MULTIPLICATION SIGN
    [0xdf, 0x0643], // ARABIC LETTER KAF
    [0xe0, 0x00e0], // LATIN SMALL LETTER A WITH GRAVE
    [0xe1, 0x0644], // ARABIC LETTER LAM
    [0xe3, 0x0645], // ARABIC LETTER MEEM
    [0xed, 0x064a], // ARABIC LETTER YEH
  ];
  const ISO_8859_6: [number, number][] = [
    [0xa0, 0x00a0], // NO-BREAK SPACE
    [0xa4, 0x00a4], // CURRENCY SIGN
    [0xac, 0x060c], // ARABIC COMMA
    [0xbb, 0x061b], // ARABIC SEMICOLON
    [0xbf, 0x061f], // ARABIC QUESTION MARK
    [0xc1, 0x0621], // ARABIC LETTER HAMZA
    [0xc7, 0x0627], // ARABIC LETTER ALEF
    [0xc8, 0x0628], // ARABIC LETTER BEH
    [0xda, 0x063a], // ARABIC LETTER GHAIN
    [0xe0, 0x0640], // ARABIC TATWEEL
    [0xe1, 0x0641], // ARABIC LETTER FEH
    [0xe4, 0x0644], // ARABIC LETTER LAM
    [0xea, 0x064a], // ARABIC LETTER YEH
    [0xf2, 0x0652], // ARABIC SUKUN
  ];
  /** Bytes 8859-6.TXT leaves undefined (from memory of the same file). */
  const ISO_8859_6_UNDEFINED = [0xa1, 0xa5, 0xab, 0xae, 0xba, 0xbc, 0xc0, 0xdb, 0xdf, 0xf3, 0xff];

  for (const [encoding, table] of [['windows-1256', CP1256], ['iso-8859-6', ISO_8859_6]] as const) {
    it(`decodes ${encoding} shards (JSONL and text) to the code points of the published table`, async () => {
      const raw = Buffer.from(table.map(([b]) => b));
      const expected = String.fromCodePoint(...table.map(([, cp]) => cp));
      // Cross-check: iconv-lite agrees with the table, byte by byte.
      for (const [b, cp] of table) expect(iconv.decode(Buffer.from([b]), encoding).codePointAt(0), `${encoding} 0x${b.toString(16)}`).toBe(cp);

      const jsonl = Buffer.concat([Buffer.from('{"text":"'), raw, Buffer.from('"}\n')]);
      const fromJsonl = await readAll(memoryShard(jsonl, { encoding, chunkBytes: 5 }));
      expect(fromJsonl.docs.map((d) => d.text)).toEqual([expected]);

      const text = Buffer.concat([raw, Buffer.from('\r\n\r\n'), raw]);
      const fromText = await readAll(memoryShard(text, { format: 'txt', encoding }));
      expect(fromText.docs.map((d) => d.text)).toEqual([expected, expected]);
      expect(fromText.account).toMatchObject({ lines: 3, empty: 1, docLines: 2 });
    });
  }

  it('rejects bytes that ISO-8859-6 leaves undefined, naming the offset, rather than writing U+FFFD', async () => {
    for (const b of ISO_8859_6_UNDEFINED) expect(iconv.decode(Buffer.from([b]), 'iso-8859-6')).toBe('\uFFFD');
    const line = Buffer.from([0xc7, 0xc8, 0x20, ISO_8859_6_UNDEFINED[0]!, 0xc7, 0x0a]);
    const { account, docs } = await readAll(memoryShard(line, { format: 'txt', encoding: 'iso-8859-6' }));
    expect(docs).toEqual([]);
    expect(account.rejected.samples).toEqual([{ line: 1, reason: 'invalid-encoding', detail: expect.stringMatching(/not valid iso-8859-6 at byte 3 of the line/) }]);
  });

  it('decodes KOI8-R and rejects NUL bytes in a legacy shard as binary', async () => {
    // From memory of RFC 1489 (KOI8-R): 0xC1 is U+0430 CYRILLIC SMALL LETTER A, 0xE1 is U+0410 CAPITAL A, 0xD1 is U+044F YA.
    const shard = Buffer.from([0xe1, 0xc1, 0xd1, 0x0a, 0x41, 0x00, 0x42, 0x0a]);
    const { account, docs } = await readAll(memoryShard(shard, { format: 'txt', encoding: 'koi8-r' }));
    expect(docs.map((d) => d.text)).toEqual(['\u0410\u0430\u044f']);
    expect(account.rejected.byReason).toEqual({ binary: 1 });
    expect(accountedLines(account)).toBe(account.lines);
  });

  it('accepts encodings that keep ASCII bytes (so lines split at 0x0A), and refuses UTF-16', () => {
    expect(isLineSplittableEncoding('windows-1256')).toBe(true);
    expect(isLineSplittableEncoding('shift_jis')).toBe(true); // Shift_JIS trail bytes are 0x40 and above (common knowledge, from memory)
    expect(isLineSplittableEncoding('utf-16le')).toBe(false);
    expect(isLineSplittableEncoding('utf-16')).toBe(false);
    expect(isLineSplittableEncoding('no-such-encoding')).toBe(false);
  });
});

describe('shardKindOf', () => {
  it('reads the format and compression from the last one or two extensions, case-insensitively', () => {
    expect(shardKindOf('a/b.jsonl')).toEqual({ format: 'jsonl', compression: 'none' });
    expect(shardKindOf('a/b.NDJSON.GZ')).toEqual({ format: 'jsonl', compression: 'gzip' });
    expect(shardKindOf('a/b.txt.zstd')).toEqual({ format: 'txt', compression: 'zstd' });
    expect(shardKindOf('a/b.v2.jsonl.zst')).toEqual({ format: 'jsonl', compression: 'zstd' });
    expect(shardKindOf('a/b.json')).toEqual({ unsupported: '.json' });
    expect(shardKindOf('a/b.gz')).toEqual({ unsupported: '.gz' });
    expect(shardKindOf('a/b.csv.gz')).toEqual({ unsupported: '.csv.gz' });
    expect(shardKindOf('a.dir/README')).toEqual({ unsupported: '' });
  });
});

describe('LineSplitter', () => {
  it('splits like String.prototype.split on "\\n" (minus a final empty piece), stripping one "\\r", whatever the chunking', () => {
    const random = lcg(99);
    const alphabet = ['a', 'é', 'न', '\n', '\n', '\r', ' ', '😀'];
    for (let trial = 0; trial < 300; trial++) {
      const text = Array.from({ length: Math.floor(random() * 60) }, () => alphabet[Math.floor(random() * alphabet.length)]).join('');
      const bytes = Buffer.from(text);
      const expected = text.split('\n').map((l) => l.replace(/\r$/, ''));
      if (text.endsWith('\n') || text === '') expected.pop();

      const got: string[] = [];
      const splitter = new LineSplitter(
        { line: (buf, s, e) => got.push(buf.toString('utf8', s, e)), tooLong: () => got.push('<too long>') },
        { maxLineBytes: 1000, stripBom: true, blockIsClean: () => true },
      );
      for (let i = 0; i < bytes.length; ) {
        const size = 1 + Math.floor(random() * 9);
        splitter.write(bytes.subarray(i, i + size));
        i += size;
      }
      splitter.end();
      expect(got, JSON.stringify(text)).toEqual(expected);
      expect(splitter.bytes).toBe(bytes.length);
    }
  });

  it('reports every line longer than the limit with its exact length, at any chunking', () => {
    const random = lcg(3);
    for (let trial = 0; trial < 200; trial++) {
      const lengths = Array.from({ length: 1 + Math.floor(random() * 6) }, () => Math.floor(random() * 30));
      const bytes = Buffer.from(lengths.map((n) => 'q'.repeat(n)).join('\n'));
      const got: [string, number][] = [];
      const splitter = new LineSplitter(
        { line: (_b, s, e) => got.push(['line', e - s]), tooLong: (n) => got.push(['long', n]) },
        { maxLineBytes: 10, stripBom: false, blockIsClean: () => true },
      );
      for (let i = 0; i < bytes.length; ) {
        const size = 1 + Math.floor(random() * 12);
        splitter.write(bytes.subarray(i, i + size));
        i += size;
      }
      splitter.end();
      const expected = lengths.map((n): [string, number] => [n > 10 ? 'long' : 'line', n]);
      if (bytes.length === 0 || bytes[bytes.length - 1] === 0x0a) expected.pop();
      expect(got, lengths.join(',')).toEqual(expected);
    }
  });
});
