#!/usr/bin/env node
// Writes the demo corpus of the invented Hindi–English newsroom "Sangam Samachar"
// (Nadipur) into data/ and evals/ next to this file: clean Hindi and English
// shards, plus a pull request's incoming shards that each break one rule on
// purpose. Deterministic (seeded PRNG, fixed gzip settings): two runs give
// byte-identical files. Plain Node, no dependencies.
//
//   node generate.mjs           write the corpus
//   node generate.mjs --check   write it, then print shard sizes and the checks
//                               (pairwise 5-gram Jaccard, planted duplicates,
//                               leaked eval item, rejected lines, determinism)
import { createHash } from 'node:crypto';
import { mkdirSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { gzipSync } from 'node:zlib';

import * as EN from './material/english.mjs';
import { EVAL_ITEMS, LEAKED_EVAL_ID } from './material/evals.mjs';
import * as HI from './material/hindi.mjs';
import { FIRST_NAMES, SURNAMES, VILLAGES, WARDS } from './material/names.mjs';
import * as RO from './material/romanised.mjs';

// ---- Tuning constants -------------------------------------------------------

// Any fixed number; changing it gives a different but equally valid corpus.
const SEED = 20261201;
// Clean shards. The target mix is 40 % Hindi / 60 % English in o200k_base tokens.
// On this material o200k_base spends 1.58 tokens per Hindi word and 1.31 per
// English word (measured with js-tiktoken, see README.md), and a Hindi story runs
// a little longer, so 2 × 213 Hindi and 3 × 300 English stories give 40/60.
// Tune these two numbers to move the clean mix. Each shard has its own random
// stream, so other shards keep their stories, except where the similarity guard
// below redraws one, and dupes-00, which copies english-00.
const HINDI_DOCS_PER_SHARD = 213;
const ENGLISH_DOCS_PER_SHARD = 300;
// Incoming English large enough to push English far past 60 % + 5 points.
const ENGLISH_03_DOCS = 900;
// Incoming broken shards: a few dozen documents each is plenty to trip a rule.
const ROMANISED_DOCS = 80;
const MOJIBAKE_DOCS_PER_LANGUAGE = 24;
// Copies of english-00: about 2 % exact and 4 % near copies of all documents,
// clearly above the policy's 1 % and 3 % whatever the denominator.
const DUPES_EXACT = 50;
const DUPES_NEAR = 110;
const DUPES_NEW = 40;
// A near copy is kept only when its word 5-gram Jaccard with the original is at
// least this: comfortably above the policy's near-duplicate threshold (0.8), so
// MinHash estimation error (about 0.03 at 128 hashes) cannot hide it.
const NEAR_COPY_MIN_JACCARD = 0.85;
const NEAR_COPY_MIN_WORDS = 70;
// Edits tried per story before moving on to the next one.
const NEAR_COPY_ATTEMPTS = 5;
// Documents of 3–8 sentences, as the brief for short news items asks.
const MIN_SENTENCES = 3;
const MAX_SENTENCES = 8;
// Share of stories that open with a dateline, as printed copy often does.
const DATELINE_CHANCE = 0.5;
// Share of civic stories that end with a stock closing line.
const CLOSING_CHANCE = 0.35;
// A new story is drawn again while its word 5-gram Jaccard with an earlier story
// of the same language reaches this, so that unrelated stories stay well below
// the 0.5 the demo promises (and far below the policy's near-duplicate 0.8).
const MAX_JACCARD_UNRELATED = 0.4;
// Draws per story before giving up; at these corpus sizes a redraw is rare.
const MAX_DRAWS = 50;
// Where the leaked eval item sits in english-03 (0-based document index).
const LEAK_DOC_INDEX = 417;
// Word n-gram sizes of the checks: 5 for near duplicates, 13 for contamination
// (the overlap test of Brown et al., 2020, appendix C).
const SHINGLE = 5;
const CONTAMINATION_NGRAM = 13;
// Random pairs sampled per language for the Jaccard spot check.
const RANDOM_PAIRS = 20000;

// Months (1–12) a scene or topic belongs to, so that a story's dateline fits what
// it reports; a scene's entry wins over its topic's, and what is not listed can
// happen in any month.
const SEASONS = {
  heat: [4, 5, 6], cold: [12, 1], rain: [1, 2, 3], monsoon: [7, 8, 9],
  school: [4, 5], dengue: [8, 9, 10, 11], mela: [1, 2], diwali: [10, 11],
  chhath: [10, 11], holi: [3], festive: [10, 11], station: [10, 11],
};

const HERE = dirname(fileURLToPath(import.meta.url));

// ---- Seeded randomness ------------------------------------------------------

/** Returns a PRNG (mulberry32) giving floats in [0, 1) from a 32-bit seed. */
function mulberry32(seed) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Returns a random source for one named stream (one per shard), so that resizing one shard barely touches the others. */
function streamFor(name) {
  const digest = createHash('sha256').update(`${SEED}:${name}`).digest();
  const next = mulberry32(digest.readUInt32LE(0));
  return {
    float: next,
    int: (lo, hi) => lo + Math.floor(next() * (hi - lo + 1)),
    pick: (list) => list[Math.floor(next() * list.length)],
    chance: (p) => next() < p,
    /** Returns `count` distinct items of `list`, in random order. */
    sample(list, count) {
      const copy = list.slice();
      for (let i = copy.length - 1; i > 0; i--) {
        const j = Math.floor(next() * (i + 1));
        [copy[i], copy[j]] = [copy[j], copy[i]];
      }
      return copy.slice(0, count);
    },
  };
}

// ---- Filling sentence patterns -----------------------------------------------

const LANGUAGES = {
  hi: { ...HI, script: 'hi' },
  en: { ...EN, script: 'en' },
  ro: {
    CITY: EN.CITY, RIVER: EN.RIVER, WEEKDAYS: RO.WEEKDAYS, MONTHS: EN.MONTHS,
    CROPS: RO.CROPS, VEGETABLES: RO.VEGETABLES, TEAM_SUFFIXES: RO.TEAM_SUFFIXES,
    SCHOOL_PATTERNS: [], script: 'en',
  },
};

/** Returns a person's full name in the given script, e.g. "आरती केसरानी" or "Aarti Kesrani". */
function nameOf(person, script) {
  return `${person.first[script]} ${person.surname[script]}`;
}

/** Returns an invented person not yet named in this story, optionally of a given gender. */
function newPerson(ctx, rng, gender) {
  const firsts = gender ? FIRST_NAMES.filter((f) => f.g === gender) : FIRST_NAMES;
  for (;;) {
    const p = { first: rng.pick(firsts), surname: rng.pick(SURNAMES) };
    const key = nameOf(p, 'en');
    if (!ctx.named.has(key)) { ctx.named.add(key); return p; }
  }
}

/** Returns the slot values one document keeps throughout (its wards, day, month, ...), the month drawn from `months` (1–12) when given. */
function documentContext(rng, lang, months) {
  const L = LANGUAGES[lang];
  const s = L.script;
  const [ward, ward2, ward3, ward4] = rng.sample(WARDS, 4);
  const [village, village2] = rng.sample(VILLAGES, 2);
  const monthIndex = months ? rng.pick(months) - 1 : rng.int(0, 11);
  const ctx = {
    city: L.CITY,
    river: L.RIVER,
    ward: ward[s], ward2: ward2[s],
    village: village[s], village2: village2[s],
    named: new Set(),
    team: `${ward3[s]} ${rng.pick(L.TEAM_SUFFIXES)}`,
    team2: `${ward4[s]} ${rng.pick(L.TEAM_SUFFIXES)}`,
    crop: rng.pick(L.CROPS),
    veg: rng.pick(L.VEGETABLES),
    weekday: rng.pick(L.WEEKDAYS),
    month: L.MONTHS[monthIndex],
    later: L.MONTHS[(monthIndex + rng.int(1, 3)) % 12],
    year: String(rng.int(2019, 2026)),
    day: String(rng.int(1, 28)),
  };
  if (L.SCHOOL_PATTERNS.length > 0) ctx.school = fill(rng.pick(L.SCHOOL_PATTERNS), ctx, rng, lang);
  return ctx;
}

/** Returns a number drawn from a slot argument "a-b" or "a-b:step", with one decimal for `f`. */
function numberFor(kind, arg, rng) {
  const m = /^([\d.]+)-([\d.]+)(?::(\d+))?$/.exec(arg ?? '');
  if (!m) throw new Error(`bad number slot {${kind}:${arg}}`);
  const lo = Number(m[1]);
  const hi = Number(m[2]);
  if (kind === 'f') return (lo + rng.float() * (hi - lo)).toFixed(1);
  const step = Number(m[3] ?? 1);
  return String(Math.round(rng.int(Math.ceil(lo / step), Math.floor(hi / step)) * step));
}

/** Returns a pattern with its [a|b] choices made and its {slots} filled. */
function fill(pattern, ctx, rng, lang) {
  const chosen = pattern.replace(/\[([^\]]+)\]/g, (_, options) => rng.pick(options.split('|')));
  return chosen.replace(/\{(\w+)(?::([^}]*))?\}/g, (whole, slot, arg) => {
    if (slot === 'n' || slot === 'f') return numberFor(slot, arg, rng);
    if (slot === 'person') return nameOf(newPerson(ctx, rng), LANGUAGES[lang].script);
    if (slot === 'girl') return nameOf(newPerson(ctx, rng, 'f'), LANGUAGES[lang].script);
    if (slot === 'student') {
      const p = newPerson(ctx, rng);
      const name = nameOf(p, LANGUAGES[lang].script);
      return lang === 'hi' ? `${p.first.g === 'f' ? 'छात्रा' : 'छात्र'} ${name}` : name;
    }
    if (!(slot in ctx)) throw new Error(`unknown slot ${whole} in: ${pattern}`);
    return ctx[slot];
  });
}

/** Returns the sentence with its first letter in upper case (English copy). */
function capitalised(sentence) {
  return sentence.charAt(0).toUpperCase() + sentence.slice(1);
}

/** Returns one news story (text, topic, desk, slot values), unlike every earlier story of its language. */
function newsStory(rng, lang, topicName) {
  for (let draw = 0; draw < MAX_DRAWS; draw++) {
    const story = draftStory(rng, lang, topicName);
    if (guards[lang].admit(story.text)) return story;
  }
  throw new Error(`no ${lang} story unlike the earlier ones after ${MAX_DRAWS} draws: add sentence patterns`);
}

/** Returns a pattern split into its scene tags and its text: "#heat,cold text" → { scenes: ['heat', 'cold'], text }. */
function parsePattern(pattern) {
  const m = /^#([\w,]+) /.exec(pattern);
  return m ? { scenes: m[1].split(','), text: pattern.slice(m[0].length) } : { scenes: [], text: pattern };
}

// Topics with their patterns parsed once.
const PARSED_TOPICS = Object.fromEntries(['hi', 'en'].map((lang) => [lang, LANGUAGES[lang].TOPICS.map((t) => ({
  ...t, leads: t.leads.map(parsePattern), body: t.body.map(parsePattern),
}))]));

/** Returns one candidate news story in Hindi (`hi`) or English (`en`). */
function draftStory(rng, lang, topicName) {
  const L = LANGUAGES[lang];
  const topics = PARSED_TOPICS[lang];
  const topic = topicName ? topics.find((t) => t.topic === topicName) : rng.pick(topics);
  const lead = rng.pick(topic.leads);
  const season = lead.scenes.map((x) => SEASONS[x]).find(Boolean) ?? SEASONS[topic.topic];
  const ctx = documentContext(rng, lang, season);
  // Keep to the lead's scene: untagged body sentences fit every scene.
  const fitting = topic.body.filter((b) => b.scenes.length === 0 || b.scenes.some((x) => lead.scenes.includes(x)));
  const count = rng.int(MIN_SENTENCES, MAX_SENTENCES);
  const closing = topic.closings === true && count > MIN_SENTENCES && rng.chance(CLOSING_CHANCE);
  const bodyCount = Math.min(count - 1 - (closing ? 1 : 0), fitting.length);
  const patterns = [lead.text, ...rng.sample(fitting, bodyCount).map((b) => b.text)];
  if (closing) patterns.push(rng.pick(L.CLOSINGS));
  let sentences = patterns.map((p) => fill(p, ctx, rng, lang));
  if (lang === 'en') sentences = sentences.map(capitalised);
  if (rng.chance(DATELINE_CHANCE)) sentences[0] = `${fill(L.DATELINE, ctx, rng, lang)} ${sentences[0]}`;
  return { text: sentences.join(' ').normalize('NFC'), topic: topic.topic, desk: topic.desk, ctx };
}

/** Returns one story of the romanised feed (Hindi sentences in Latin letters), unlike the earlier ones. */
function romanisedStory(rng) {
  for (let draw = 0; draw < MAX_DRAWS; draw++) {
    const ctx = documentContext(rng, 'ro');
    const count = rng.int(MIN_SENTENCES + 1, MAX_SENTENCES);
    const text = rng.sample(RO.SENTENCES, count).map((p) => capitalised(fill(p, ctx, rng, 'ro'))).join(' ');
    if (guards.ro.admit(text)) return text;
  }
  throw new Error(`no romanised story unlike the earlier ones after ${MAX_DRAWS} draws`);
}

/** Returns the lower-cased words of a text split at spaces and punctuation: a quick stand-in for UAX #29 while generating. */
function quickWordsOf(text) {
  return text.toLowerCase().split(/[\s.,:;!?“”"‘’'()।-]+/u).filter(Boolean);
}

// Remembers the shingle sets of the stories drawn so far, per language.
class SimilarityGuard {
  postings = new Map();
  sizes = [];
  rejected = 0;

  /** Returns true, and remembers the text, when it is unlike every text admitted before. */
  admit(text) {
    const set = shinglesOf(quickWordsOf(text));
    const shared = new Map();
    for (const sh of set) for (const j of this.postings.get(sh) ?? []) shared.set(j, (shared.get(j) ?? 0) + 1);
    for (const [j, n] of shared) {
      if (n / (set.size + this.sizes[j] - n) >= MAX_JACCARD_UNRELATED) { this.rejected++; return false; }
    }
    const id = this.sizes.push(set.size) - 1;
    for (const sh of set) {
      let p = this.postings.get(sh);
      if (!p) this.postings.set(sh, (p = []));
      p.push(id);
    }
    return true;
  }
}

// One guard per language, made afresh for each build.
let guards;

// ---- Mojibake and invisible characters ----------------------------------------

// windows-1252 bytes 0x80–0x9F. The five bytes the code page leaves undefined
// (0x81, 0x8D, 0x8F, 0x90, 0x9D) are absent here and decode to the C1 control of
// the same value, as the WHATWG Encoding Standard's decoder does. Every other
// byte decodes to the code point of the same value (Latin-1).
const WINDOWS_1252_HIGH = new Map([
  [0x80, 0x20ac], [0x82, 0x201a], [0x83, 0x0192], [0x84, 0x201e], [0x85, 0x2026],
  [0x86, 0x2020], [0x87, 0x2021], [0x88, 0x02c6], [0x89, 0x2030], [0x8a, 0x0160],
  [0x8b, 0x2039], [0x8c, 0x0152], [0x8e, 0x017d], [0x91, 0x2018], [0x92, 0x2019],
  [0x93, 0x201c], [0x94, 0x201d], [0x95, 0x2022], [0x96, 0x2013], [0x97, 0x2014],
  [0x98, 0x02dc], [0x99, 0x2122], [0x9a, 0x0161], [0x9b, 0x203a], [0x9c, 0x0153],
  [0x9e, 0x017e], [0x9f, 0x0178],
]);

/** Returns the text the bytes read as under windows-1252. */
function decodeWindows1252(bytes) {
  let out = '';
  for (const b of bytes) out += String.fromCodePoint(WINDOWS_1252_HIGH.get(b) ?? b);
  return out;
}

/** Returns the text after a UTF-8 → windows-1252 → UTF-8 round trip ("नदी" → "à¤¨à¤¦à¥€"). */
function mojibakeOf(text) {
  return decodeWindows1252(Buffer.from(text, 'utf8'));
}

// English copy only turns to mojibake where it has non-ASCII characters, so the
// legacy export's stories carry typographic quotes and the rupee sign.
const ENGLISH_QUOTES = [
  '“We have done what we could before the rains,” said {person}.',
  '“Nobody told us it would take this long,” said {person} of {ward}.',
  '“The numbers are better than last year’s,” said {person}.',
  '“We will keep at it until every lane is done,” said {person}.',
];

/** Returns an English story in typographic form: rupee sign, curly quotes, a quotation. */
function typographicStory(rng) {
  const story = newsStory(rng, 'en');
  const quote = fill(rng.pick(ENGLISH_QUOTES), story.ctx, rng, 'en');
  return { ...story, text: `${story.text.replace(/\bRs (?=\d)/g, '₹')} ${quote}` };
}

const RLO = '\u202E'; // RIGHT-TO-LEFT OVERRIDE
const PDF = '\u202C'; // POP DIRECTIONAL FORMATTING
const ZWSP = '\u200B'; // ZERO WIDTH SPACE

/** Returns the text with a right-to-left override wrapped around its first number, so the digits display reversed. */
function withBidiOverride(text) {
  return text.replace(/\d[\d,.]*/, (n) => `${RLO}${n}${PDF}`);
}

/** Returns the text with a zero-width space inside its first long word. */
function withZeroWidthSpace(text) {
  return text.replace(/[\p{L}\p{M}]{6,}/u, (w) => `${w.slice(0, 3)}${ZWSP}${w.slice(3)}`);
}

// ---- Shards -----------------------------------------------------------------

/** Returns a JSONL record line for one document. */
function record(id, text, lang, source) {
  return JSON.stringify({ id, text, lang, source });
}

const pad = (i) => String(i).padStart(5, '0');

/** Returns the clean shards: Hindi and English archive copy. */
function cleanShards() {
  const shards = [];
  for (const [subset, lang, names, perShard] of [
    ['hindi', 'hi', ['hindi-00', 'hindi-01'], HINDI_DOCS_PER_SHARD],
    ['english', 'en', ['english-00', 'english-01', 'english-02'], ENGLISH_DOCS_PER_SHARD],
  ]) {
    for (const name of names) {
      const rng = streamFor(name);
      const docs = [];
      for (let i = 0; i < perShard; i++) {
        const story = newsStory(rng, lang);
        docs.push({ id: `${name}-${pad(i)}`, text: story.text, lang, source: `sangam-samachar/${lang}/${story.desk}` });
      }
      shards.push({ path: `data/${subset}/${name}.jsonl.gz`, docs, extraLines: [] });
    }
  }
  return shards;
}

/** Returns the romanised shard: Hindi in Latin letters, declared as `hi`. */
function romanisedShard() {
  const rng = streamFor('romanised-00');
  const docs = [];
  for (let i = 0; i < ROMANISED_DOCS; i++) {
    docs.push({ id: `romanised-00-${pad(i)}`, text: romanisedStory(rng), lang: 'hi', source: 'transliteration-feed' });
  }
  return { path: 'data/incoming/romanised-00.jsonl.gz', docs, extraLines: [] };
}

/** Returns the mojibake shard (legacy CMS export) with a few invisible-character documents. */
function mojibakeShard() {
  const rng = streamFor('mojibake-00');
  const docs = [];
  const source = 'legacy-cms-export';
  for (let i = 0; i < MOJIBAKE_DOCS_PER_LANGUAGE; i++) {
    docs.push({ text: mojibakeOf(newsStory(rng, 'hi').text), lang: 'hi', source, planted: 'mojibake' });
    docs.push({ text: mojibakeOf(typographicStory(rng).text), lang: 'en', source, planted: 'mojibake' });
  }
  // Correctly encoded stories that carry invisible controls (Trojan Source style).
  docs.push({ text: withBidiOverride(newsStory(rng, 'hi', 'market').text), lang: 'hi', source, planted: 'bidi-controls' });
  docs.push({ text: withBidiOverride(newsStory(rng, 'en', 'council').text), lang: 'en', source, planted: 'bidi-controls' });
  docs.push({ text: withZeroWidthSpace(newsStory(rng, 'hi', 'roads').text), lang: 'hi', source, planted: 'zero-width' });
  docs.push({ text: withZeroWidthSpace(newsStory(rng, 'en', 'health').text), lang: 'en', source, planted: 'zero-width' });
  docs.forEach((d, i) => { d.id = `mojibake-00-${pad(i)}`; });
  return { path: 'data/incoming/mojibake-00.jsonl.gz', docs, extraLines: [] };
}

/** Returns the large English batch that skews the mix, with the leaked eval item and the broken lines. */
function english03Shard() {
  const rng = streamFor('english-03');
  const docs = [];
  const leaked = EVAL_ITEMS.find((e) => e.id === LEAKED_EVAL_ID);
  for (let i = 0; i < ENGLISH_03_DOCS; i++) {
    const story = newsStory(rng, 'en', i === LEAK_DOC_INDEX ? 'festival' : undefined);
    let text = story.text;
    let planted;
    if (i === LEAK_DOC_INDEX) {
      // The whole eval item, word for word, after the story's first sentence.
      const cut = text.indexOf('. ') + 1;
      text = `${text.slice(0, cut)} From our readers’ quiz: ${leaked.text}${text.slice(cut)}`;
      planted = `contamination:${leaked.id}`;
    }
    docs.push({ id: `english-03-${pad(i)}`, text, lang: 'en', source: 'partner-wire', planted });
  }
  // Lines that are not documents: inserted before the given 0-based record index.
  const truncated = record(`english-03-${pad(ENGLISH_03_DOCS)}`, newsStory(rng, 'en').text, 'en', 'partner-wire');
  const python = newsStory(rng, 'en').text.replace(/'/g, '’');
  const glued = [newsStory(rng, 'en'), newsStory(rng, 'en')]
    .map((s, k) => record(`english-03-${pad(ENGLISH_03_DOCS + 1 + k)}`, s.text, 'en', 'partner-wire')).join('');
  const extraLines = [
    { before: 137, line: truncated.slice(0, Math.floor(truncated.length * 0.6)), planted: 'invalid-json (truncated record)' },
    { before: 288, line: `{'id': 'english-03-${pad(ENGLISH_03_DOCS + 3)}', 'text': '${python}', 'lang': 'en'}`, planted: 'invalid-json (single quotes)' },
    { before: 529, line: glued, planted: 'invalid-json (two records on one line)' },
    { before: 611, line: `{"id": "english-03-${pad(ENGLISH_03_DOCS + 4)}", "text": ${JSON.stringify(newsStory(rng, 'en').text)}, "lang": "en", "score": NaN}`, planted: 'invalid-json (NaN)' },
    { before: 777, line: JSON.stringify({ id: `english-03-${pad(ENGLISH_03_DOCS + 5)}`, body: newsStory(rng, 'en').text, lang: 'en', source: 'partner-wire' }), planted: 'missing-text (field is "body")' },
  ];
  return { path: 'data/incoming/english-03.jsonl.gz', docs, extraLines };
}

/** Returns the text with its spacing changed (doubled spaces, a tab, padding) but the same words. */
function respaced(text, variant) {
  if (variant % 2 === 0) return `  ${text.replace(/\. /g, '.  ')}\n`;
  return text.replace(/, /g, ',\t').replace(/ (?=\S)/, '   ');
}

// Small edits that keep a story nearly the same: words a sub-editor adds or drops.
const NEAR_EDIT_WORDS = ['also', 'now', 'again', 'reportedly', 'still', 'finally'];

/** Returns the story with one or two words changed: a number moved, a word inserted or dropped. */
function nearCopyOf(text, rng) {
  const words = text.split(' ');
  const edits = rng.int(1, 2);
  for (let e = 0; e < edits; e++) {
    const numbers = words.map((w, i) => (/^\d+[,.]?$/.test(w) ? i : -1)).filter((i) => i >= 0);
    const kind = rng.int(0, 2);
    if (kind === 0 && numbers.length > 0) {
      const i = rng.pick(numbers);
      words[i] = words[i].replace(/^\d+/, (n) => String(Number(n) + rng.int(1, 9)));
    } else if (kind === 1) {
      words.splice(rng.int(1, words.length - 1), 0, rng.pick(NEAR_EDIT_WORDS));
    } else {
      words.splice(rng.int(1, words.length - 2), 1);
    }
  }
  return words.join(' ');
}

/** Returns the duplicates shard: exact and near copies of english-00, plus new stories. */
function dupesShard(english00) {
  const rng = streamFor('dupes-00');
  const pool = rng.sample(english00.docs.map((d, i) => ({ ...d, line: i + 1, words: wordsOf(d.text).length })), english00.docs.length);
  // One edit costs a story of n words about 10 of its n − 4 shingles, so only
  // stories of 70 words or more can take an edit and stay above the threshold.
  const long = pool.filter((d) => d.words >= NEAR_COPY_MIN_WORDS);
  const nearOrigins = long.slice(0, DUPES_NEAR + 20); // 20 spare, for stories no edit keeps above the threshold
  const exactOrigins = pool.filter((d) => !nearOrigins.includes(d)).slice(0, DUPES_EXACT);
  if (exactOrigins.length < DUPES_EXACT) throw new Error('english-00 is too small for the planted copies');
  const docs = [];
  for (let k = 0; k < DUPES_EXACT; k++) {
    const orig = exactOrigins[k];
    const variant = k % 4;
    const text = variant === 0 ? orig.text
      : variant === 1 ? respaced(orig.text, k)
        : variant === 2 ? orig.text.toLowerCase()
          : respaced(orig.text.toUpperCase(), k);
    const how = ['verbatim', 'whitespace', 'lower case', 'upper case and whitespace'][variant];
    docs.push({ text, lang: 'en', source: 'web-scrape', planted: `exact copy (${how}) of data/english/english-00.jsonl.gz:${orig.line}`, orig });
  }
  let near = 0;
  for (const orig of nearOrigins) {
    if (near === DUPES_NEAR) break;
    const shingles = shinglesOf(wordsOf(orig.text));
    for (let attempt = 0; attempt < NEAR_COPY_ATTEMPTS; attempt++) {
      const text = nearCopyOf(orig.text, rng);
      const j = jaccard(shingles, shinglesOf(wordsOf(text)));
      if (j < NEAR_COPY_MIN_JACCARD || j === 1) continue;
      docs.push({ text, lang: 'en', source: 'web-scrape', planted: `near copy (J=${j.toFixed(3)}) of data/english/english-00.jsonl.gz:${orig.line}`, orig, jaccard: j });
      near++;
      break;
    }
  }
  for (let k = 0; k < DUPES_NEW; k++) docs.push({ text: newsStory(rng, 'en').text, lang: 'en', source: 'web-scrape' });
  const shuffled = rng.sample(docs, docs.length);
  shuffled.forEach((d, i) => { d.id = `dupes-00-${pad(i)}`; });
  return { path: 'data/incoming/dupes-00.jsonl.gz', docs: shuffled, extraLines: [] };
}

/** Returns the shards (documents, lines, planted problems) and every file as { path, bytes }, without writing anything. */
function buildCorpus() {
  guards = { hi: new SimilarityGuard(), en: new SimilarityGuard(), ro: new SimilarityGuard() };
  const clean = cleanShards();
  const english00 = clean.find((s) => s.path.endsWith('english-00.jsonl.gz'));
  const incoming = [romanisedShard(), mojibakeShard(), english03Shard(), dupesShard(english00)];
  const shards = [...clean, ...incoming];
  for (const shard of shards) {
    const lines = shard.docs.map((d) => record(d.id, d.text, d.lang, d.source));
    // Insert from the back so earlier positions stay put, then note final line numbers.
    const extras = shard.extraLines.slice().sort((a, b) => b.before - a.before);
    for (const x of extras) lines.splice(x.before, 0, x.line);
    shard.lines = lines;
    const lineOf = new Map(lines.map((l, i) => [l, i + 1]));
    for (const x of shard.extraLines) x.lineNumber = lineOf.get(x.line);
    shard.docs.forEach((d) => { d.line = lineOf.get(record(d.id, d.text, d.lang, d.source)); });
    shard.text = `${lines.join('\n')}\n`;
    // Fixed level and no file name or time in the header: the output depends on the text only.
    shard.bytes = gzipSync(Buffer.from(shard.text, 'utf8'), { level: 9 });
  }
  const evals = `${EVAL_ITEMS.map((e) => JSON.stringify({ id: e.id, text: e.text })).join('\n')}\n`;
  const files = [
    ...shards.map((s) => ({ path: s.path, bytes: s.bytes })),
    { path: 'evals/headlines-qa.jsonl', bytes: Buffer.from(evals, 'utf8') },
  ];
  return { shards, files };
}

/** Writes the files under this folder's data/ and evals/, replacing what was there. */
function writeCorpus(files) {
  for (const dir of ['data', 'evals']) rmSync(join(HERE, dir), { recursive: true, force: true });
  for (const f of files) {
    const abs = join(HERE, f.path);
    mkdirSync(dirname(abs), { recursive: true });
    writeFileSync(abs, f.bytes);
  }
}

// ---- Checks -------------------------------------------------------------------

const SEGMENTER = new Intl.Segmenter('und', { granularity: 'word' });

/** Returns the lower-cased words of a text (UAX #29 word-like segments). */
function wordsOf(text) {
  const out = [];
  for (const s of SEGMENTER.segment(text.toLowerCase())) if (s.isWordLike) out.push(s.segment);
  return out;
}

/** Returns the set of word n-grams (joined by spaces); a text shorter than n gives one n-gram of all its words. */
function shinglesOf(words, n = SHINGLE) {
  const set = new Set();
  if (words.length < n) { set.add(words.join(' ')); return set; }
  for (let i = 0; i + n <= words.length; i++) set.add(words.slice(i, i + n).join(' '));
  return set;
}

/** Returns |A ∩ B| / |A ∪ B|. */
function jaccard(a, b) {
  let shared = 0;
  for (const x of a) if (b.has(x)) shared++;
  return shared / (a.size + b.size - shared);
}

/** Returns the highest Jaccard over all pairs of the given shingle sets and how many pairs reach each bound. */
function allPairsJaccard(sets, bounds) {
  // Inverted index: only pairs that share a shingle are ever compared.
  const postings = new Map();
  sets.forEach((set, i) => { for (const s of set) { let p = postings.get(s); if (!p) postings.set(s, (p = [])); p.push(i); } });
  const shared = new Int32Array(sets.length);
  let max = 0;
  let argmax = null;
  const atLeast = bounds.map(() => 0);
  for (let i = 0; i < sets.length; i++) {
    const touched = [];
    for (const s of sets[i]) {
      for (const j of postings.get(s)) {
        if (j <= i) continue;
        if (shared[j] === 0) touched.push(j);
        shared[j]++;
      }
    }
    for (const j of touched) {
      const J = shared[j] / (sets[i].size + sets[j].size - shared[j]);
      if (J > max) { max = J; argmax = [i, j]; }
      bounds.forEach((b, k) => { if (J >= b) atLeast[k]++; });
      shared[j] = 0;
    }
  }
  return { max, argmax, atLeast };
}

const FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\u200B-\u200D\u2060\uFEFF\u202A-\u202E\u2066-\u2069\uFFFD]/u;

/** Prints the shard sizes and every check; returns false when a check fails. */
function check(shards, files) {
  let ok = true;
  const fail = (msg) => { ok = false; console.log(`  FAIL ${msg}`); };
  const rel = (p) => relative(process.cwd(), join(HERE, p)) || p;

  const patterns = (L) => L.TOPICS.reduce((n, t) => n + t.leads.length + t.body.length, 0) + L.CLOSINGS.length;
  console.log(`Sentence patterns: Hindi ${patterns(HI)}, English ${patterns(EN)}, romanised Hindi ${RO.SENTENCES.length}; ${HI.TOPICS.length} topics\n`);
  console.log('Shards (words: UAX #29 word-like segments; bytes: UTF-8 after gunzip / on disk)');
  const stats = shards.map((s) => {
    const words = s.docs.reduce((n, d) => n + wordsOf(d.text).length, 0);
    return { path: s.path, docs: s.docs.length, lines: s.lines.length, words, bytes: Buffer.byteLength(s.text), gz: s.bytes.length };
  });
  console.log(`  ${'shard'.padEnd(40)} ${'lines'.padStart(6)} ${'docs'.padStart(6)} ${'words'.padStart(8)} ${'bytes'.padStart(9)} ${'gz'.padStart(8)}`);
  for (const x of stats) {
    console.log(`  ${x.path.padEnd(40)} ${String(x.lines).padStart(6)} ${String(x.docs).padStart(6)} ${String(x.words).padStart(8)} ${String(x.bytes).padStart(9)} ${String(x.gz).padStart(8)}`);
  }

  // Token mix from word counts, at the o200k_base fertility measured on this material.
  const TOKENS_PER_WORD = { hi: 1.58, en: 1.31 };
  const mix = (filter) => {
    const t = { hi: 0, en: 0 };
    for (const s of shards.filter(filter)) for (const d of s.docs) t[d.lang] += wordsOf(d.text).length * TOKENS_PER_WORD[d.lang];
    return t.hi / (t.hi + t.en);
  };
  const isClean = (s) => !s.path.startsWith('data/incoming/');
  console.log(`\nEstimated Hindi share of o200k tokens (words × 1.58 vs × 1.31): clean ${(mix(isClean) * 100).toFixed(1)} %, with incoming ${(mix(() => true) * 100).toFixed(1)} % (by declared lang)`);

  // Pairwise similarity of documents that are meant to be unrelated.
  const planted = (d) => d.planted && !d.planted.startsWith('contamination');
  const unrelated = shards.flatMap((s) => s.docs.filter((d) => !planted(d)).map((d) => ({ ...d, shard: s.path })));
  const sets = unrelated.map((d) => shinglesOf(wordsOf(d.text)));
  console.log(`\nWord ${SHINGLE}-gram Jaccard between unrelated documents (${unrelated.length} docs, planted copies left out)`);
  for (const lang of ['hi', 'en']) {
    const idx = unrelated.map((d, i) => (d.lang === lang ? i : -1)).filter((i) => i >= 0);
    const rng = streamFor(`check-pairs-${lang}`);
    let max = 0; let over = 0;
    for (let k = 0; k < RANDOM_PAIRS; k++) {
      const [a, b] = rng.sample(idx, 2);
      const J = jaccard(sets[a], sets[b]);
      if (J > max) max = J;
      if (J > 0.5) over++;
    }
    console.log(`  ${lang}: ${RANDOM_PAIRS} random pairs: max ${max.toFixed(3)}, pairs > 0.5: ${over}`);
  }
  const all = allPairsJaccard(sets, [0.3, 0.5, 0.8]);
  const [ia, ib] = all.argmax;
  console.log(`  all ${(sets.length * (sets.length - 1) / 2).toLocaleString('en')} pairs: max ${all.max.toFixed(3)} (${unrelated[ia].id} ~ ${unrelated[ib].id}); pairs ≥ 0.3: ${all.atLeast[0]}, ≥ 0.5: ${all.atLeast[1]}, ≥ 0.8: ${all.atLeast[2]}`);
  console.log(`  stories redrawn while generating because they were too like an earlier one: ${Object.entries(guards).map(([k, g]) => `${k} ${g.rejected}`).join(', ')}`);
  if (all.atLeast[1] > 0) fail('unrelated documents with Jaccard ≥ 0.5');

  // Planted duplicates.
  const dupes = shards.find((s) => s.path.endsWith('dupes-00.jsonl.gz'));
  const exact = dupes.docs.filter((d) => d.planted?.startsWith('exact'));
  const nearDocs = dupes.docs.filter((d) => d.planted?.startsWith('near'));
  const norm = (t) => t.toLowerCase().replace(/\s+/g, ' ').trim();
  const exactOk = exact.filter((d) => norm(d.text) === norm(d.orig.text)).length;
  const byteEqual = exact.filter((d) => d.text === d.orig.text).length;
  const js = nearDocs.map((d) => d.jaccard);
  console.log(`\nPlanted duplicates in ${dupes.path}`);
  console.log(`  exact copies: ${exact.length} (${byteEqual} byte-identical, ${exact.length - byteEqual} differing only in whitespace/case; ${exactOk} equal after lower-casing and collapsing whitespace)`);
  console.log(`  near copies: ${nearDocs.length}, word ${SHINGLE}-gram Jaccard with the original: min ${Math.min(...js).toFixed(3)}, max ${Math.max(...js).toFixed(3)}`);
  if (exactOk !== exact.length) fail('an exact copy differs after normalisation');
  if (nearDocs.length !== DUPES_NEAR) fail(`only ${nearDocs.length} near copies could be made`);
  const allDocs = shards.reduce((n, s) => n + s.docs.length, 0);
  console.log(`  share of all ${allDocs} documents: exact ${(exact.length / allDocs * 100).toFixed(2)} %, near ${(nearDocs.length / allDocs * 100).toFixed(2)} %`);

  // Contamination: every eval item's 13-grams against every training document.
  console.log(`\nEval items sharing a word ${CONTAMINATION_NGRAM}-gram with a training document`);
  const docGrams = shards.flatMap((s) => s.docs.map((d) => ({ where: `${s.path}:${d.line} (${d.id})`, grams: shinglesOf(wordsOf(d.text), CONTAMINATION_NGRAM) })));
  for (const item of EVAL_ITEMS) {
    const words = wordsOf(item.text);
    if (words.length < CONTAMINATION_NGRAM) fail(`${item.id} has only ${words.length} words`);
    const grams = shinglesOf(words, CONTAMINATION_NGRAM);
    const hits = docGrams.filter((d) => [...grams].some((g) => d.grams.has(g)));
    const expected = item.id === LEAKED_EVAL_ID ? 1 : 0;
    if (hits.length > 0 || expected) console.log(`  ${item.id} (${words.length} words): ${hits.map((h) => h.where).join(', ') || 'none'}`);
    if (hits.length !== expected) fail(`${item.id} found in ${hits.length} documents, expected ${expected}`);
    if (expected && hits.length === 1 && !hits[0].where.startsWith('data/incoming/english-03')) fail('leak is in the wrong shard');
  }
  console.log(`  (${EVAL_ITEMS.length} items checked; all others: none)`);

  // Lines that must be rejected.
  const totalLines = shards.reduce((n, s) => n + s.lines.length, 0);
  const rejected = shards.flatMap((s) => s.extraLines.map((x) => ({ ...x, path: s.path })));
  console.log(`\nLines that are not documents (${rejected.length} of ${totalLines} lines = ${(rejected.length / totalLines * 100).toFixed(2)} %)`);
  for (const x of rejected) {
    let parsed;
    try { parsed = JSON.parse(x.line); } catch { parsed = undefined; }
    const actual = parsed === undefined ? 'invalid-json' : typeof parsed.text !== 'string' ? 'missing-text' : 'VALID';
    console.log(`  ${x.path}:${x.lineNumber}  ${x.planted}  → JSON.parse says ${actual}`);
    if (!x.planted.startsWith(actual)) fail(`line ${x.lineNumber} parses as ${actual}`);
  }
  if (rejected.length / totalLines <= 0.001) fail('rejected share is not above the policy limit 0.001');

  // Encoding: clean text has nothing forbidden; each planted document has its anomaly.
  const cleanDocs = shards.filter(isClean).flatMap((s) => s.docs);
  const dirty = shards.flatMap((s) => s.docs.filter((d) => !d.planted?.match(/^(mojibake|bidi|zero)/) && FORBIDDEN.test(d.text)).map((d) => d.id));
  const moj = shards.flatMap((s) => s.docs.filter((d) => d.planted === 'mojibake'));
  const mojMarked = moj.filter((d) => /[ÃÂàâ][\u0080-\u00BF\u0152-\u2122]/u.test(d.text)).length;
  const invisible = shards.flatMap((s) => s.docs.filter((d) => /^(bidi|zero)/.test(d.planted ?? '')).map((d) => `${s.path}:${d.line} ${d.planted}`));
  console.log(`\nEncoding`);
  console.log(`  documents outside the planted ones with a control, bidi, zero-width or U+FFFD character: ${dirty.length}${dirty.length ? ` (${dirty.slice(0, 5).join(', ')})` : ''}`);
  console.log(`  mojibake documents: ${moj.length}, of which showing the Ã/à + continuation-byte pattern: ${mojMarked}`);
  for (const line of invisible) console.log(`  ${line}`);
  if (dirty.length) fail('unplanted documents carry forbidden characters');
  if (mojMarked !== moj.length) fail('a mojibake document shows no mojibake');
  // Fixed points of the windows-1252 table (WHATWG Encoding Standard, index-windows-1252)
  // and two well-known mojibake forms. Node's own TextDecoder('windows-1252') cannot be
  // the reference here: from Node 20.18.3 it decodes 0x80–0x9F as Latin-1 (nodejs/node#60888).
  const fixedPoints = [[0x80, 0x20ac], [0x81, 0x81], [0x8d, 0x8d], [0x92, 0x2019], [0x99, 0x2122], [0x9d, 0x9d], [0x9f, 0x178], [0xa0, 0xa0], [0xe0, 0xe0]];
  const wrong = fixedPoints.filter(([b, cp]) => decodeWindows1252([b]).codePointAt(0) !== cp);
  const samples = [['é', 'Ã©'], ['नदी', 'à¤¨à¤¦à¥€']].filter(([from, to]) => mojibakeOf(from) !== to);
  console.log(`  windows-1252 table: ${fixedPoints.length - wrong.length} of ${fixedPoints.length} fixed points right; "é" → "${mojibakeOf('é')}", "नदी" → "${mojibakeOf('नदी')}"`);
  if (wrong.length || samples.length) fail('windows-1252 table or mojibake round trip is wrong');

  // Script: clean Hindi letters are Devanagari, clean English letters are Latin.
  const impure = cleanDocs.filter((d) => {
    const letters = d.text.match(/\p{L}/gu) ?? [];
    const own = letters.filter((c) => (d.lang === 'hi' ? /\p{Script=Devanagari}/u : /\p{Script=Latin}/u).test(c)).length;
    return own / letters.length < 0.99;
  });
  console.log(`\nScript: clean documents with under 99 % of letters in their language's script: ${impure.length}`);
  if (impure.length) fail('impure clean documents');

  // Determinism: a second build in the same process gives the same bytes.
  const again = buildCorpus().files;
  const digest = (fs) => createHash('sha256').update(fs.map((f) => `${f.path}\0`).join('')).update(Buffer.concat(fs.map((f) => f.bytes))).digest('hex');
  const same = digest(files) === digest(again);
  console.log(`\nDeterminism: second build ${same ? 'byte-identical' : 'DIFFERS'} (sha256 ${digest(files).slice(0, 16)}…)`);
  if (!same) fail('two builds differ');

  const leak = shards.flatMap((s) => s.docs.filter((d) => d.planted?.startsWith('contamination')).map((d) => `${rel(s.path)}:${d.line} (${d.id})`));
  console.log(`\nLeaked eval item ${LEAKED_EVAL_ID}: ${leak.join(', ')}`);
  console.log(ok ? '\nAll checks passed.' : '\nSome checks FAILED.');
  return ok;
}

// ---- Main ---------------------------------------------------------------------

const started = process.hrtime.bigint();
const { shards, files } = buildCorpus();
writeCorpus(files);
const ms = Number(process.hrtime.bigint() - started) / 1e6;
console.log(`Wrote ${files.length} files under ${relative(process.cwd(), HERE) || '.'} in ${ms.toFixed(0)} ms.`);
if (process.argv.includes('--check')) {
  console.log('');
  if (!check(shards, files)) process.exitCode = 1;
}
