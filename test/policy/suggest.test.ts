// "Did you mean": the edit distance behind it and when it speaks up.
import { describe, expect, it } from 'vitest';
import { editDistance, nearest } from '../../src/policy/suggest.js';

describe('editDistance (optimal string alignment)', () => {
  it('matches the textbook values', () => {
    // Levenshtein's classic example: kitten → sitting takes 3 edits (from memory; any algorithms text).
    expect(editDistance('kitten', 'sitting')).toBe(3);
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('flaw', 'lawn')).toBe(2);
    // Damerau (1964): a swap of neighbours is one edit, not two.
    expect(editDistance('tolerence', 'tolerance')).toBe(1);
    expect(editDistance('langauges', 'languages')).toBe(1);
    // Optimal string alignment edits each substring once, so `ca` → `abc` is 3 (unrestricted Damerau–Levenshtein gives 2).
    expect(editDistance('ca', 'abc')).toBe(3);
  });
});

describe('nearest', () => {
  const keys = ['unit', 'tolerance', 'max-other', 'max-und'];

  it('suggests a key one or two edits away', () => {
    expect(nearest('tolerence', keys)).toBe('tolerance');
    expect(nearest('max-othr', keys)).toBe('max-other');
  });

  it('meets camelCase and snake_case spellings', () => {
    expect(nearest('maxOther', keys)).toBe('max-other');
    expect(nearest('max_und', keys)).toBe('max-und');
  });

  it('stays quiet when nothing is close', () => {
    expect(nearest('threshold', keys)).toBeUndefined();
    expect(nearest('unix', ['mix'])).toBeUndefined(); // short keys get one edit only
  });

  it('falls back to a prefix: `warning` → `warn`', () => {
    expect(nearest('warning', ['error', 'warn'])).toBe('warn');
  });
});
