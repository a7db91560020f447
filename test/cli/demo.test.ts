// The README's promise: the demo's pull request fails the gate for the planted
// reasons and says where; the clean corpus passes; the JSON report follows its
// published schema.
import { Ajv2020 } from 'ajv/dist/2020.js';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import type { Report } from '../../src/judge/types.js';
import { REPO, sluice, type CliRun } from './helpers.js';

let failing: CliRun;
let clean: CliRun;

beforeAll(() => {
  failing = sluice(['check', 'examples/newsroom/policies/newsroom.yaml', '--no-cache'], { json: true });
  clean = sluice(['check', 'examples/newsroom/policies/newsroom-clean.yaml', '--no-cache'], { json: true });
}, 120_000);

const failed = (r: Report) => r.rules.filter((o) => o.verdict === 'fail');

describe('the newsroom demo', () => {
  it('fails the pull request with exit 1', () => {
    expect(failing.status).toBe(1);
    expect(failing.report?.verdict).toBe('fail');
  });

  it('names each planted problem with its rule and location', () => {
    const r = failing.report!;
    const f = failed(r);
    // The skewing shard pushes English past 60 % ± 5 points of tokens.
    expect(f.some((o) => o.rule === 'mix' && o.scope === 'language:eng' && o.measured! > 0.65)).toBe(true);
    // Shares off target are signed as the views sign shifts: + above, − (U+2212) below.
    expect(f.find((o) => o.rule === 'mix' && o.scope === 'language:eng')!.message).toMatch(/\(\+\d+\.\d points\)$/);
    expect(f.find((o) => o.rule === 'mix' && o.scope === 'language:hin')!.message).toMatch(/\(\u2212\d+\.\d points\)$/);
    // Romanised Hindi filed under Hindi: impure against Devanagari, and detected as something else.
    const script = f.find((o) => o.rule === 'script' && o.scope === 'language:hin');
    expect(script).toBeDefined();
    expect(script!.locations.some((l) => l.path.includes('romanised-00') || l.path.includes('mojibake-00'))).toBe(true);
    expect(r.languages.hin!.mismatchDocs).toBeGreaterThanOrEqual(80);
    // Mojibake and invisible controls.
    const enc = f.find((o) => o.rule === 'encoding');
    expect(enc?.locations[0]?.path).toBe('data/incoming/mojibake-00.jsonl.gz');
    // Exact and near copies of english-00 in dupes-00 (the generator plants 50 and 110).
    expect(r.duplicates?.exactDocs).toBe(50);
    expect(r.duplicates?.nearDocs).toBeGreaterThanOrEqual(105);
    expect(f.filter((o) => o.rule === 'duplicates')).toHaveLength(2);
    // The leaked evaluation item, with both locations.
    const leak = f.find((o) => o.rule === 'contamination');
    expect(leak?.locations[0]).toMatchObject({ path: 'data/incoming/english-03.jsonl.gz', line: 420 });
    expect(leak?.locations[0]?.detail).toContain('evals/headlines-qa.jsonl:4');
    // The broken lines, by reason, with file:line.
    expect(r.input.rejected.byReason).toEqual({ 'invalid-json': 4, 'missing-text': 1 });
    // And the terminal says so.
    expect(failing.stdout).toMatch(/FAIL contamination/);
    expect(failing.stdout).toContain('data/incoming/english-03.jsonl.gz:782');
    expect(failing.stdout).toContain('1 training document shares a 13-word sequence with an evaluation item');
  });

  it('shows what switching from gpt2 to o200k_base does to Hindi', () => {
    const hin = failing.report!.languages.hin!;
    expect(hin.fertility!.tokenizer).toBe('o200k_base');
    expect(hin.baseline!.tokenizer).toBe('gpt2');
    // GPT-2's byte-level vocabulary splits Devanagari into many more pieces (measured on UDHR Hindi on this machine class: ~8.3).
    expect(hin.baseline!.fertility!).toBeGreaterThan(3 * hin.fertility!.fertility!);
    expect(clean.report!.tokenizer!.mixShiftPoints!.hin).toBeLessThan(-10);
    // The fall is written with the minus sign the shifts use (U+2212), in the message and the terminal's column alike.
    const regression = clean.report!.rules.find((o) => o.rule === 'fertility' && o.scope === 'language:hin' && o.message.includes(' vs '));
    expect(regression?.message).toMatch(/ vs 7\.\d{3} under gpt2 \(\u2212\d+\.\d %; limit \+5\.0 %\)$/);
    expect(clean.stdout).toMatch(/fertility +hin +\u2212\d+\.\d % limit 5\.0 %/);
    expect(clean.stdout).not.toMatch(/-\d+\.\d %/);
  });

  it('passes the clean corpus with exit 0', () => {
    expect(clean.status).toBe(0);
    expect(clean.report?.verdict).toBe('pass');
    expect(failed(clean.report!)).toEqual([]);
  });

  it('accounts for every line read', () => {
    for (const r of [failing.report!, clean.report!]) {
      expect(r.input.docLines + r.input.empty + r.input.rejected.count).toBe(r.input.lines);
      for (const s of r.shards) expect(s.docs + s.empty + s.rejected).toBe(s.lines);
    }
  });

  it('writes JSON reports that validate against schemas/report.schema.json', () => {
    const schema = JSON.parse(readFileSync(join(REPO, 'schemas/report.schema.json'), 'utf8'));
    const ajv = new Ajv2020({ strict: true, allErrors: true });
    const validate = ajv.compile(schema);
    for (const r of [failing.report, clean.report]) {
      const ok = validate(r);
      expect(validate.errors ?? []).toEqual([]);
      expect(ok).toBe(true);
    }
  });
});
