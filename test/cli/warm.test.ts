// A run whose shards all come from the cache loads as little as it can (the tokenizer's ranks
// module, franc's profiles and the evaluation index only when a document is measured), and
// still gives every figure that needs no document: dictionary fertility over a word list is
// counted at the end of the run, with the tokenizer loaded then. Word list: the first 400
// lines of the hunspell en dictionary (npm dictionary-en).
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { corpus, ENGLISH, HINDI, policyYaml, REPO, sluice } from './helpers.js';

const lines = (n: number, text: string): string => Array.from({ length: n }, (_, i) => JSON.stringify({ text: `${text} (${i})` })).join('\n') + '\n';

describe('a run served wholly from the cache', () => {
  it('gives the same report as the run that filled the cache, dictionary fertility included', () => {
    const dic = readFileSync(join(REPO, 'node_modules/dictionary-en/index.dic'), 'utf8').split('\n').slice(0, 400).join('\n');
    const root = corpus({
      'p.yaml': policyYaml('  fertility: { word-lists: { eng: words/en.dic } }\ntokenizer: { builtin: o200k_base }\n'),
      'data/a.jsonl': lines(5, ENGLISH) + lines(5, HINDI),
      'data/b.jsonl': lines(3, ENGLISH),
      'words/en.dic': dic,
    });
    const cache = mkdtempSync(join(tmpdir(), 'sluice-warm-'));
    const cold = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cache], { json: true });
    const warm = sluice(['check', join(root, 'p.yaml'), '--cache-dir', cache], { json: true });
    expect(cold.status, cold.stderr).toBe(0);
    expect(warm.status, warm.stderr).toBe(0);
    expect(warm.report!.shards.every((s) => s.fromCache)).toBe(true);
    const dictionary = (r: typeof warm) => r.report!.languages.eng?.fertility?.dictionary;
    // The .dic's first line is its entry count; the other 399 lines are entries.
    expect(dictionary(cold)).toMatchObject({ entries: 399, list: 'words/en.dic' });
    expect(dictionary(warm)).toEqual(dictionary(cold));
    const same = (r: typeof warm) => JSON.stringify({ ...r.report!, timing: null, shards: r.report!.shards.map((s) => ({ ...s, fromCache: null })) });
    expect(same(warm)).toBe(same(cold));
  });
});
