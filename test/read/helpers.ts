// Shared by the read tests: shards made in memory, fed in chosen chunk sizes.
import { Readable } from 'node:stream';
import { readShard } from '../../src/read/index.js';
import type { Compression, RawDocument, ReadAccount, ReadOptions, ShardFormat, ShardRef } from '../../src/read/index.js';

export const OPTIONS: ReadOptions = { textField: 'text', declaredLanguageField: 'lang', maxLineBytes: 1024, maxSamples: 100 };

/** A shard whose raw bytes come from memory, split into chunks of `chunkBytes` (whole buffer when omitted). */
export function memoryShard(
  bytes: Buffer,
  opts: { format?: ShardFormat; compression?: Compression; encoding?: string; chunkBytes?: number; path?: string } = {},
): ShardRef {
  const { format = 'jsonl', compression = 'none', encoding = 'utf-8', chunkBytes, path = `mem.${format}` } = opts;
  return {
    path,
    absPath: `/nonexistent/${path}`,
    format,
    compression,
    encoding,
    sizeBytes: bytes.length,
    open: () => Readable.from(chunked(bytes, chunkBytes ?? Math.max(1, bytes.length))),
  };
}

function* chunked(bytes: Buffer, size: number): Generator<Buffer> {
  for (let i = 0; i < bytes.length; i += size) yield bytes.subarray(i, i + size);
}

/** Reads a shard and returns its account and documents. */
export async function readAll(ref: ShardRef, opts: Partial<ReadOptions> = {}): Promise<{ account: ReadAccount; docs: RawDocument[] }> {
  const docs: RawDocument[] = [];
  const account = await readShard(ref, { ...OPTIONS, ...opts }, (doc) => docs.push(doc));
  return { account, docs };
}

/** The invariant every account keeps, as a checkable sum. */
export function accountedLines(account: ReadAccount): number {
  return account.docLines + account.empty + account.rejected.count;
}

/** Lines in a byte buffer counted independently of the reader: newlines, plus a final line without one. */
export function countLines(bytes: Buffer): number {
  let lines = 0;
  for (const b of bytes) if (b === 0x0a) lines++;
  return bytes.length > 0 && bytes[bytes.length - 1] !== 0x0a ? lines + 1 : lines;
}
