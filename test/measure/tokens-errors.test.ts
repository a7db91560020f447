// A tokenizer that cannot be used is a TokenizerError naming the file (and line, for
// rank files); a text that cannot be encoded is a TokenizerError naming the tokenizer,
// never a partial count.
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import gpt2Ranks from 'js-tiktoken/ranks/gpt2';
import { describe, expect, it } from 'vitest';
import { loadTokenizer, TokenizerError } from '../../src/measure/tokens/index.js';
import type { TokenizerSpec } from '../../src/policy/types.js';

const dir = mkdtempSync(join(tmpdir(), 'sluice-bad-'));

function file(name: string, content: string | Buffer): TokenizerSpec & { kind: 'file' } {
  const absPath = join(dir, name);
  writeFileSync(absPath, content);
  const format = name.endsWith('.json') ? 'tokenizer.json' : 'tiktoken';
  return { kind: 'file', file: `tok/${name}`, absPath, format };
}

/** The first `n` lines of GPT-2's ranks as a rank file (`<base64> <rank>`). */
function rankLines(n: number): string[] {
  const [, first, ...tokens] = gpt2Ranks.bpe_ranks.split('\n')[0]!.split(' ');
  return tokens.slice(0, n).map((t, i) => `${t} ${Number(first) + i}`);
}

async function loadError(spec: TokenizerSpec): Promise<TokenizerError> {
  try {
    await loadTokenizer(spec);
  } catch (e) {
    expect(e).toBeInstanceOf(TokenizerError);
    expect((e as TokenizerError).stage).toBe('load');
    return e as TokenizerError;
  }
  throw new Error('expected loadTokenizer to fail');
}

describe('loading errors', () => {
  it('malformed tokenizer.json: bad JSON, not an object, no model, unknown model type, unknown component', async () => {
    expect((await loadError(file('broken.json', '{"model": {'))).message).toMatch(/^tok\/broken\.json: not valid JSON/);
    expect((await loadError(file('list.json', '[1, 2]'))).message).toMatch(/^tok\/list\.json: .*JSON object/);
    expect((await loadError(file('nomodel.json', '{"normalizer": null}'))).message).toMatch(/^tok\/nomodel\.json: no "model"/);
    const wordLevel = JSON.stringify({ model: { type: 'WordLevel', vocab: { a: 0 }, unk_token: 'a' } });
    expect((await loadError(file('wordlevel.json', wordLevel))).message).toMatch(/^tok\/wordlevel\.json: unknown model type "WordLevel"/);
    const badNormalizer = JSON.stringify({
      normalizer: { type: 'Frobnicate' },
      model: { type: 'WordPiece', vocab: { '[UNK]': 0, a: 1 }, unk_token: '[UNK]', continuing_subword_prefix: '##' },
    });
    expect((await loadError(file('norm.json', badNormalizer))).message).toMatch(/^tok\/norm\.json: cannot build the tokenizer: .*Frobnicate/);
    expect((await loadError(file('latin1.json', Buffer.from([0x7b, 0xe9, 0x7d])))).message).toMatch(/^tok\/latin1\.json: not valid UTF-8/);
  });

  it('truncated rank file: names the file and the line', async () => {
    const lines = rankLines(300);
    lines[299] = lines[299]!.split(' ')[0]!.slice(0, 3); // cut mid-token, rank lost
    const e = await loadError(file('cut.tiktoken', lines.join('\n')));
    expect(e.file).toBe('tok/cut.tiktoken');
    expect(e.line).toBe(300);
    expect(e.message).toMatch(/^tok\/cut\.tiktoken:300: /);
  });

  it('bad rank lines: not base64, bad rank, duplicate token, empty line inside', async () => {
    const lines = rankLines(260);
    const variants: [string, number, RegExp][] = [
      [[...lines.slice(0, 9), 'SGVsbG8* 9', ...lines.slice(10)].join('\n'), 10, /not base64/],
      [[...lines.slice(0, 4), `${lines[4]!.split(' ')[0]} five`, ...lines.slice(5)].join('\n'), 5, /not a non-negative integer/],
      [[...lines, lines[0]!.replace(/ \d+$/, ' 999')].join('\n'), 261, /listed twice/],
      [[...lines.slice(0, 7), '', ...lines.slice(7)].join('\n'), 8, /empty line/],
    ];
    for (const [content, line, why] of variants) {
      const e = await loadError(file(`bad${line}.tiktoken`, content));
      expect(e.line).toBe(line);
      expect(e.message).toMatch(why);
    }
  });

  it('a rank file without all 256 single bytes (cut at a line boundary) is refused', async () => {
    const e = await loadError(file('short.tiktoken', rankLines(100).join('\n') + '\n'));
    expect(e.message).toMatch(/^tok\/short\.tiktoken: rank table lacks 156 of the 256 single-byte tokens/);
  });

  it('a split pattern that is not a regular expression', async () => {
    const spec = { ...file('ok.tiktoken', rankLines(256).join('\n')), pattern: '(unclosed' };
    expect((await loadError(spec)).message).toMatch(/^tok\/ok\.tiktoken: split pattern is not a valid regular expression/);
  });

  it('unknown builtin: names it and lists the builtins', async () => {
    const e = await loadError({ kind: 'builtin', name: 'o300k_base' as 'gpt2' });
    expect(e.message).toBe('o300k_base: unknown builtin tokenizer; the builtins are gpt2, r50k_base, p50k_base, cl100k_base, o200k_base');
  });

  it('missing file: names the file as the policy wrote it and where it was looked for', async () => {
    const e = await loadError({ kind: 'file', file: 'tok/absent.json', absPath: join(dir, 'absent.json'), format: 'tokenizer.json' });
    expect(e.message).toBe(`tok/absent.json: no such file (${join(dir, 'absent.json')})`);
  });
});

describe('encoding errors', () => {
  // A text whose characters cannot be read stands in for a library failure mid-text.
  const poisoned = {
    length: 5,
    charCodeAt: () => {
      throw new Error('unreadable');
    },
    includes: () => {
      throw new Error('unreadable');
    },
  } as unknown as string;

  it('propagate as a TokenizerError naming the tokenizer, stage count, never a partial count', async () => {
    const gpt2 = await loadTokenizer({ kind: 'builtin', name: 'gpt2' });
    expect(() => gpt2.count(poisoned)).toThrow(TokenizerError);
    // Through the token kernel the text fails where it is copied into the kernel's memory.
    expect(() => gpt2.count(poisoned)).toThrow(/^gpt2: cannot encode text: argument must be a string$/);
    const spec = file('wp.json', JSON.stringify({ model: { type: 'WordPiece', vocab: { '[UNK]': 0, a: 1 }, unk_token: '[UNK]', continuing_subword_prefix: '##' }, pre_tokenizer: { type: 'WhitespaceSplit' } }));
    const wp = await loadTokenizer(spec);
    try {
      wp.count(poisoned);
      throw new Error('expected a failure');
    } catch (e) {
      expect(e).toBeInstanceOf(TokenizerError);
      expect((e as TokenizerError).stage).toBe('count');
      expect((e as TokenizerError).message).toMatch(/^tok\/wp\.json: cannot encode text/);
    }
  });
});
