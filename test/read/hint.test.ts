// The size hint that orders and shares out work among threads: read from the shard's own
// gzip trailer (RFC 1952: ISIZE, the input size modulo 2^32), checked against node:zlib's
// output as the reference; it never feeds a figure, so a wrong hint only costs time.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { textSizeHint } from '../../src/read/index.js';
import type { Compression, ShardRef } from '../../src/read/types.js';

const dir = mkdtempSync(join(tmpdir(), 'sluice-hint-'));
function shard(name: string, bytes: Buffer, compression: Compression): ShardRef {
  const absPath = join(dir, name);
  writeFileSync(absPath, bytes);
  return { path: name, absPath, format: 'jsonl', compression, encoding: 'utf-8', sizeBytes: bytes.length };
}
const text = Buffer.from(Array.from({ length: 5000 }, (_, i) => JSON.stringify({ text: `desk note ${i % 7}` })).join('\n'));

describe('the text size hint', () => {
  it('is the uncompressed size a gzip file states in its trailer', async () => {
    const gz = gzipSync(text);
    expect(gz.length).toBeLessThan(text.length / 5);
    expect(await textSizeHint(shard('a.jsonl.gz', gz, 'gzip'))).toBe(text.length);
  });

  it('is at least the size on disk for a multi-member file, whose trailer states only its last member', async () => {
    const tiny = gzipSync(Buffer.from('{"text":"x"}\n'));
    const both = Buffer.concat([gzipSync(text), tiny]);
    expect(await textSizeHint(shard('b.jsonl.gz', both, 'gzip'))).toBe(both.length);
  });

  it('is the size on disk for plain files and for a file too short to hold a trailer', async () => {
    expect(await textSizeHint(shard('c.jsonl', text, 'none'))).toBe(text.length);
    expect(await textSizeHint(shard('d.jsonl.gz', Buffer.from('not gzip'), 'gzip'))).toBe(8);
  });
});
