import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, realpathSync, rmSync, symlinkSync, linkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import iconv from 'iconv-lite';
import type { CorpusSpec } from '../../src/policy/types.js';
import { discoverShards, readShard } from '../../src/read/index.js';
import type { Discovery, RawDocument } from '../../src/read/index.js';

const corpus = (over: Partial<CorpusSpec> = {}): CorpusSpec => ({
  include: ['data/**/*'],
  exclude: [],
  text: 'text',
  encodings: [],
  maxLineBytes: 1 << 20,
  ...over,
});

let top: string;
let root: string;

function put(rel: string, content: string | Buffer = '{"text":"x"}\n'): void {
  const abs = path.join(root, rel);
  mkdirSync(path.dirname(abs), { recursive: true });
  writeFileSync(abs, content);
}

beforeAll(() => {
  top = mkdtempSync(path.join(tmpdir(), 'sluice-discover-'));
  root = path.join(top, 'newsroom');
  // Written out of order, to see the result sorted.
  put('data/hi/wire-b.jsonl');
  put('data/en/wire-a.jsonl');
  put('data/en/Wire-C.jsonl');
  put('data/en/archive.jsonl.gz', gzipSync('{"text":"archived"}\n'));
  put('data/en/notes.txt.zst', Buffer.alloc(0));
  put('data/en/legacy.ndjson.zstd', Buffer.alloc(0));
  put('data/en/table.parquet', 'PAR1');
  put('data/en/dump.json.gz', gzipSync('[]'));
  put('data/en/README', 'no extension');
  put('data/ar/bulletin.jsonl', iconv.encode('{"text":"مرحبا بالعالم"}\n', 'windows-1256'));
  put('data/ar/old/bulletin.jsonl', iconv.encode('{"text":"سلام"}\n', 'iso-8859-6'));
  put('data/tmp/scratch.jsonl');
  put('store/kept-outside-globs.jsonl', '{"text":"through a link"}\n');
  put('other/ignored.jsonl');
  // Outside the root entirely.
  mkdirSync(path.join(top, 'elsewhere', 'dir'), { recursive: true });
  writeFileSync(path.join(top, 'elsewhere', 'secret.jsonl'), '{"text":"must not be read"}\n');
  writeFileSync(path.join(top, 'elsewhere', 'dir', 'more.jsonl'), '{"text":"must not be listed"}\n');
  symlinkSync(path.join(top, 'elsewhere', 'secret.jsonl'), path.join(root, 'data/en/escape.jsonl'));
  symlinkSync(path.join(top, 'elsewhere', 'dir'), path.join(root, 'data/outside-dir'));
  // Inside the root: a link to a file no glob names, a link to a file that is matched anyway, a directory link, a loop.
  symlinkSync('../../store/kept-outside-globs.jsonl', path.join(root, 'data/hi/alias.jsonl'));
  symlinkSync('wire-b.jsonl', path.join(root, 'data/hi/again.jsonl'));
  symlinkSync('hi', path.join(root, 'data/hindi'));
  symlinkSync('..', path.join(root, 'data/en/up'));
  symlinkSync('missing-target.jsonl', path.join(root, 'data/en/dangling.jsonl'));
  linkSync(path.join(root, 'data/en/wire-a.jsonl'), path.join(root, 'data/en/wire-hardlink.jsonl'));
});

afterAll(() => rmSync(top, { recursive: true, force: true }));

describe('discoverShards', () => {
  let found: Discovery;
  beforeAll(async () => {
    found = await discoverShards(root, corpus({ exclude: ['data/tmp/**'], subset: 'data/{subset}/**' }));
  });

  it('returns the matched shards sorted by path (code-unit order), minus the excluded', () => {
    const paths = found.shards.map((s) => s.path);
    expect(paths).toEqual([
      'data/ar/bulletin.jsonl',
      'data/ar/old/bulletin.jsonl',
      'data/en/Wire-C.jsonl',
      'data/en/archive.jsonl.gz',
      'data/en/legacy.ndjson.zstd',
      'data/en/notes.txt.zst',
      'data/en/wire-a.jsonl',
      'data/hi/alias.jsonl',
      'data/hi/wire-b.jsonl',
    ]);
    expect([...paths].sort()).toEqual(paths);
    expect(paths.some((p) => p.startsWith('data/tmp/') || p.startsWith('other/'))).toBe(false);
  });

  it('takes format and compression from the extension', () => {
    const kinds = Object.fromEntries(found.shards.map((s) => [s.path, `${s.format}/${s.compression}`]));
    expect(kinds['data/en/archive.jsonl.gz']).toBe('jsonl/gzip');
    expect(kinds['data/en/notes.txt.zst']).toBe('txt/zstd');
    expect(kinds['data/en/legacy.ndjson.zstd']).toBe('jsonl/zstd');
    expect(kinds['data/en/wire-a.jsonl']).toBe('jsonl/none');
  });

  it('skips unsupported extensions with a reason that names the extension', () => {
    const unsupported = found.skipped.filter((s) => s.reason === 'unsupported-format');
    expect(unsupported.map((s) => s.path)).toEqual(['data/en/README', 'data/en/dump.json.gz', 'data/en/table.parquet']);
    expect(unsupported.find((s) => s.path.endsWith('.parquet'))!.detail).toMatch(/`\.parquet`/);
    expect(unsupported.find((s) => s.path.endsWith('.json.gz'))!.detail).toMatch(/`\.json\.gz`/);
    expect(unsupported.find((s) => s.path.endsWith('README'))!.detail).toMatch(/no extension/);
  });

  it('does not read or list through a link whose real path is outside the root', () => {
    const outside = found.skipped.filter((s) => s.reason === 'link-outside-root');
    expect(outside.map((s) => s.path)).toEqual(['data/en/escape.jsonl', 'data/outside-dir']);
    expect(found.shards.some((s) => s.path.includes('outside-dir') || s.absPath.includes('elsewhere'))).toBe(false);
  });

  it('reads a link inside the root, at its real path', () => {
    const alias = found.shards.find((s) => s.path === 'data/hi/alias.jsonl')!;
    expect(alias.absPath).toBe(realpathSync(path.join(root, 'store/kept-outside-globs.jsonl')));
  });

  it('reads a file reached under several paths once, under the path with no link in it', () => {
    const same = found.skipped.filter((s) => s.reason === 'same-file');
    expect(same.map((s) => [s.path, s.detail])).toEqual([
      ['data/en/wire-hardlink.jsonl', 'the same file as data/en/wire-a.jsonl, which is read'],
      ['data/hi/again.jsonl', 'the same file as data/hi/wire-b.jsonl, which is read'],
      ['data/hindi/again.jsonl', 'the same file as data/hi/wire-b.jsonl, which is read'],
      ['data/hindi/alias.jsonl', 'the same file as data/hi/alias.jsonl, which is read'],
      ['data/hindi/wire-b.jsonl', 'the same file as data/hi/wire-b.jsonl, which is read'],
    ]);
  });

  it('does not walk into a directory link back to an ancestor (a loop)', () => {
    expect(found.skipped.filter((s) => s.reason === 'link-loop').map((s) => s.path)).toEqual(['data/en/up']);
    expect(found.skipped.some((s) => s.path.startsWith('data/en/up/'))).toBe(false);
  });

  it('matches nothing, silently, through a glob whose directory is not there, and reports a directory link to nowhere', async () => {
    const gone = path.join(top, 'gone-dir');
    symlinkSync(gone, path.join(root, 'dangling-dir'));
    try {
      const d = await discoverShards(root, corpus({ include: ['data/en/*.jsonl', 'archive/*.jsonl', 'archive/**/*.jsonl', 'dangling-dir/*.jsonl'] }));
      expect(d.shards.map((s) => s.path)).toContain('data/en/wire-a.jsonl');
      expect(d.skipped.filter((s) => s.path.startsWith('archive'))).toEqual([]);
      expect(d.skipped.find((s) => s.path === 'dangling-dir')?.reason).toBe('unreadable');
    } finally {
      rmSync(path.join(root, 'dangling-dir'));
    }
  });

  it('reports a dangling link as unreadable', () => {
    expect(found.skipped.find((s) => s.path === 'data/en/dangling.jsonl')?.reason).toBe('unreadable');
  });

  it('takes the subset from the {subset} segment of the path', () => {
    const subsets = Object.fromEntries(found.shards.map((s) => [s.path, s.subset]));
    expect(subsets['data/ar/old/bulletin.jsonl']).toBe('ar');
    expect(subsets['data/en/wire-a.jsonl']).toBe('en');
    expect(subsets['data/hi/alias.jsonl']).toBe('hi');
  });

  it('gives the size on disk', () => {
    const gz = found.shards.find((s) => s.path === 'data/en/archive.jsonl.gz')!;
    expect(gz.sizeBytes).toBe(gzipSync('{"text":"archived"}\n').length);
  });

  it('applies a subset pattern with wildcards and text around the placeholder; paths that do not match get none', async () => {
    const { shards } = await discoverShards(root, corpus({ include: ['data/**/*.jsonl'], subset: '**/{subset}/bulletin.jsonl' }));
    const subsets = Object.fromEntries(shards.map((s) => [s.path, s.subset]));
    expect(subsets['data/ar/bulletin.jsonl']).toBe('ar');
    expect(subsets['data/ar/old/bulletin.jsonl']).toBe('old');
    expect(subsets['data/en/wire-a.jsonl']).toBeUndefined();
    const wire = await discoverShards(root, corpus({ include: ['data/**/*.jsonl'], subset: 'data/*/wire-{subset}.jsonl' }));
    expect(Object.fromEntries(wire.shards.map((s) => [s.path, s.subset]))).toMatchObject({ 'data/en/wire-a.jsonl': 'a', 'data/hi/wire-b.jsonl': 'b' });
  });

  it('uses the encoding of the first override glob that matches, utf-8 otherwise', async () => {
    const { shards } = await discoverShards(
      root,
      corpus({
        include: ['data/ar/**/*.jsonl', 'data/en/wire-a.jsonl'],
        encodings: [
          { glob: 'data/ar/old/**', encoding: 'iso-8859-6' },
          { glob: 'data/ar/**', encoding: 'windows-1256' },
        ],
      }),
    );
    expect(shards.map((s) => [s.path, s.encoding])).toEqual([
      ['data/ar/bulletin.jsonl', 'windows-1256'],
      ['data/ar/old/bulletin.jsonl', 'iso-8859-6'],
      ['data/en/wire-a.jsonl', 'utf-8'],
    ]);
    const texts: RawDocument[] = [];
    for (const shard of shards) await readShard(shard, { textField: 'text', maxLineBytes: 1 << 20, maxSamples: 5 }, (d) => texts.push(d));
    expect(texts.map((d) => d.text)).toEqual(['مرحبا بالعالم', 'سلام', 'x']);
  });

  it('throws on an encoding iconv-lite does not know, naming the glob and the encoding', async () => {
    await expect(discoverShards(root, corpus({ encodings: [{ glob: 'data/ar/**', encoding: 'windows-9999' }] }))).rejects.toThrow(/data\/ar\/\*\*.*windows-9999/);
  });

  it('throws on an encoding whose bytes cannot be split into lines at 0x0A (UTF-16)', async () => {
    await expect(discoverShards(root, corpus({ encodings: [{ glob: 'data/**', encoding: 'utf-16le' }] }))).rejects.toThrow(/utf-16le.*convert/);
  });

  it('throws naming a root that does not exist, or is not a directory', async () => {
    const missing = path.join(top, 'no-such-root');
    await expect(discoverShards(missing, corpus())).rejects.toThrow(missing);
    await expect(discoverShards(path.join(root, 'data/en/wire-a.jsonl'), corpus())).rejects.toThrow(/not a directory/);
  });

  it('throws on a glob that leaves the root', async () => {
    await expect(discoverShards(root, corpus({ include: ['../elsewhere/*.jsonl'] }))).rejects.toThrow(/leaves the root/);
    await expect(discoverShards(root, corpus({ include: ['/etc/*'] }))).rejects.toThrow(/leaves the root/);
  });

  it('throws on a subset pattern without exactly one {subset}', async () => {
    await expect(discoverShards(root, corpus({ subset: 'data/**' }))).rejects.toThrow(/exactly once/);
  });

  it('reports a FIFO matched by a glob as not a file, without opening it', async () => {
    const fifo = path.join(root, 'data/en/pipe.jsonl');
    try {
      execFileSync('mkfifo', [fifo]);
    } catch {
      return; // no mkfifo on this system: nothing to check
    }
    try {
      const { skipped } = await discoverShards(root, corpus({ include: ['data/en/*.jsonl'] }));
      expect(skipped.find((s) => s.path === 'data/en/pipe.jsonl')).toMatchObject({ reason: 'not-a-file', detail: expect.stringMatching(/FIFO/) });
    } finally {
      rmSync(fifo);
    }
  });

  it('lists a root given as a symlink, with paths relative to it', async () => {
    const linkedRoot = path.join(top, 'root-link');
    symlinkSync(root, linkedRoot);
    const { shards, skipped } = await discoverShards(linkedRoot, corpus({ include: ['data/hi/*.jsonl'] }));
    expect(shards.map((s) => s.path)).toEqual(['data/hi/alias.jsonl', 'data/hi/wire-b.jsonl']);
    expect(skipped.map((s) => [s.path, s.reason])).toEqual([['data/hi/again.jsonl', 'same-file']]);
  });
});
