import { createRequire as __sluiceCreateRequire } from 'node:module'; const require = __sluiceCreateRequire(import.meta.url);

// src/cli/main.ts
import { writeFile as writeFile2 } from "node:fs/promises";

// src/judge/report.ts
import { relative } from "node:path";

// src/results/sample.ts
import { createHash } from "node:crypto";
var HASH_SPACE = 2 ** 53;
var UNSAMPLED_LANGUAGE = "unsampled";
function documentHash(text, seed = 0) {
  const h = createHash("sha256");
  if (seed !== 0) h.update(`${seed}\0`);
  const d = h.update(text, "utf8").digest();
  return d.readUInt32BE(0) * 2097152 + (d.readUInt32BE(4) >>> 11);
}
function fractionCutoff(fraction) {
  return Math.ceil(fraction * HASH_SPACE) - 1;
}
var SmallestHashes = class {
  constructor(k) {
    this.k = k;
  }
  k;
  heap = [];
  /** Offers one document's hash. */
  add(hash2) {
    const h = this.heap;
    if (h.length < this.k) {
      h.push(hash2);
      let i2 = h.length - 1;
      while (i2 > 0) {
        const p = i2 - 1 >> 1;
        if (h[p] >= h[i2]) break;
        [h[p], h[i2]] = [h[i2], h[p]];
        i2 = p;
      }
      return;
    }
    if (hash2 >= h[0]) return;
    h[0] = hash2;
    let i = 0;
    for (; ; ) {
      const l = 2 * i + 1;
      const r = l + 1;
      let m = i;
      if (l < h.length && h[l] > h[m]) m = l;
      if (r < h.length && h[r] > h[m]) m = r;
      if (m === i) break;
      [h[m], h[i]] = [h[i], h[m]];
      i = m;
    }
  }
  /**
   * Returns the cutoff: the k-th smallest hash, or HASH_SPACE when fewer than k were seen (all are measured).
   * Copies of one text share a hash, so a cutoff on a repeated hash measures every copy: a few more than k.
   */
  cutoff() {
    return this.heap.length < this.k ? HASH_SPACE : this.heap[0];
  }
};
function describeSampling(spec) {
  return "fraction" in spec ? { method: "fraction", setting: spec.fraction } : { method: "docs-per-shard", setting: spec.docsPerShard };
}
function emptyMoments() {
  return {
    bytes2: 0,
    chars2: 0,
    words2: 0,
    tokens2: 0,
    baselineTokens2: 0,
    wordTokens2: 0,
    wordTokensWords: 0,
    continued2: 0,
    continuedWords: 0,
    baselineWordTokens2: 0,
    wordTokensBaseline: 0,
    expected2: 0,
    scriptChars2: 0,
    expectedScriptChars: 0
  };
}
var MOMENT_FIELDS = Object.keys(emptyMoments());
var LIMB = 2 ** 32;
var MomentTally = class _MomentTally {
  sums = {};
  of(key) {
    return this.sums[key] ??= new Array(MOMENT_FIELDS.length * 2).fill(0);
  }
  /** Adds a non-negative integer (a product of counts, exact below 2^53) to field `f` of `s`. */
  static put(s, f, v) {
    const high = Math.floor(v / LIMB);
    _MomentTally.addLimbs(s, f, high, v - high * LIMB);
  }
  /** Adds `hi` · 2^32 + `lo` (lo below 2^32) to field `f` of `s`, carrying into the high limb. */
  static addLimbs(s, f, hi, lo) {
    let h = s[2 * f] + hi;
    let l = s[2 * f + 1] + lo;
    if (l >= LIMB) {
      h += 1;
      l -= LIMB;
    }
    s[2 * f] = h;
    s[2 * f + 1] = l;
  }
  /** The sums as moments (each rounded once, from its exact value). */
  get moments() {
    const out = {};
    for (const [key, s] of Object.entries(this.sums)) {
      const m = emptyMoments();
      MOMENT_FIELDS.forEach((field, f) => m[field] = s[2 * f] * LIMB + s[2 * f + 1]);
      out[key] = m;
    }
    return out;
  }
  /** The exact sums, for a batch measured elsewhere to hand back. */
  state() {
    return this.sums;
  }
  /** Adds the sums of the documents that follow (a batch measured elsewhere); new keys come after the ones already seen. */
  absorb(o) {
    for (const [key, s] of Object.entries(o)) {
      const into = this.of(key);
      for (let f = 0; f < MOMENT_FIELDS.length; f++) _MomentTally.addLimbs(into, f, s[2 * f], s[2 * f + 1]);
    }
  }
  /** Adds one measured document; the keys match ShardTally's (detected language; purity basis for the script sums). */
  add(m, tokens) {
    const put2 = _MomentTally.put;
    const t = this.of(m.language);
    put2(t, F.bytes2, m.bytes * m.bytes);
    put2(t, F.chars2, m.chars * m.chars);
    put2(t, F.words2, m.words * m.words);
    const main2 = tokens?.main;
    const base = tokens?.baseline;
    if (main2) {
      put2(t, F.tokens2, main2.tokens * main2.tokens);
      put2(t, F.wordTokens2, main2.wordTokens * main2.wordTokens);
      put2(t, F.wordTokensWords, main2.wordTokens * m.words);
      put2(t, F.continued2, main2.continuedWords * main2.continuedWords);
      put2(t, F.continuedWords, main2.continuedWords * m.words);
    }
    if (base) {
      put2(t, F.baselineTokens2, base.tokens * base.tokens);
      put2(t, F.baselineWordTokens2, base.wordTokens * base.wordTokens);
      if (main2) put2(t, F.wordTokensBaseline, main2.wordTokens * base.wordTokens);
    }
    if (m.purity !== null) {
      let scriptChars = 0;
      for (const n of Object.values(m.scripts)) scriptChars += n;
      const expected = Math.round(m.purity * scriptChars);
      const b = this.of(m.declared !== void 0 && m.declared !== "other" ? m.declared : m.language);
      put2(b, F.expected2, expected * expected);
      put2(b, F.scriptChars2, scriptChars * scriptChars);
      put2(b, F.expectedScriptChars, expected * scriptChars);
    }
  }
};
var F = Object.fromEntries(MOMENT_FIELDS.map((f, i) => [f, i]));
function shardWeight(r) {
  if (!r.sample) return 1;
  return r.sample.docs > 0 ? r.sample.of / r.sample.docs : 0;
}
function scaleShardResult(r) {
  const w = shardWeight(r);
  if (!r.sample || w === 1) return r;
  const scaleTokens = (t) => t && { tokens: t.tokens * w, unknown: t.unknown * w, wordTokens: t.wordTokens * w, continuedWords: t.continuedWords * w };
  const scaleCounts = (c) => Object.fromEntries(Object.entries(c).map(([k, n]) => [k, n * w]));
  const languages2 = {};
  for (const [k, t] of Object.entries(r.languages)) {
    const s = {
      docs: t.docs * w,
      bytes: t.bytes * w,
      chars: t.chars * w,
      words: t.words * w,
      purityDocs: t.purityDocs * w,
      scriptChars: t.scriptChars * w,
      expectedScriptChars: t.expectedScriptChars * w,
      purityHistogram: t.purityHistogram.map((n) => n * w)
    };
    const tokens = scaleTokens(t.tokens);
    const baseline = scaleTokens(t.baseline);
    if (tokens) s.tokens = tokens;
    if (baseline) s.baseline = baseline;
    languages2[k] = s;
  }
  return {
    ...r,
    languages: languages2,
    scripts: scaleCounts(r.scripts),
    anomalyMasks: scaleCounts(r.anomalyMasks),
    anomalyDocs: scaleCounts(r.anomalyDocs),
    declared: Object.fromEntries(Object.entries(r.declared).map(([d, row]) => [d, scaleCounts(row)]))
  };
}

// src/measure/encoding.ts
import iconv from "iconv-lite";
var ANOMALY_KINDS = [
  "replacement-char",
  "control-chars",
  "bidi-controls",
  "zero-width",
  "private-use",
  "mojibake"
];
var MOJIBAKE_LEAD_FIRST = 194;
var MOJIBAKE_LEAD_LAST = 244;
var IMPLAUSIBLE_2_BYTE = [
  [576, 767],
  [1984, 2047]
];
var MULTIPLICATION_SIGN = 215;
var LOST_BYTE = 256;
var UNMAPPED = -1;
function emptyAnomalyCounts() {
  return {
    "replacement-char": 0,
    "control-chars": 0,
    "bidi-controls": 0,
    "zero-width": 0,
    "private-use": 0,
    mojibake: 0
  };
}
function emptyMarkCounts() {
  return { joiners: 0, directionMarks: 0 };
}
function anomalyOf(cp, atStart) {
  if (cp < 32) return cp === 9 || cp === 10 || cp === 13 ? null : "control-chars";
  if (cp < 127) return null;
  if (cp <= 159) return "control-chars";
  if (cp < 8203) return null;
  if (cp === 8203 || cp === 8288) return "zero-width";
  if (cp >= 8234 && cp <= 8238 || cp >= 8294 && cp <= 8297) return "bidi-controls";
  if (cp >= 55296 && cp <= 57343) return "replacement-char";
  if (cp >= 57344 && cp <= 63743) return "private-use";
  if (cp === 65279) return atStart ? null : "zero-width";
  if (cp === 65533) return "replacement-char";
  if (cp >= 983040 && cp <= 1048573 || cp >= 1048576 && cp <= 1114109) return "private-use";
  return null;
}
function markOf(cp) {
  if (cp === 8204 || cp === 8205) return "joiners";
  if (cp === 8206 || cp === 8207 || cp === 1564) return "directionMarks";
  return null;
}
function needsCloserLook(cp) {
  return anomalyOf(cp, false) !== null || markOf(cp) !== null || cp >= MOJIBAKE_LEAD_FIRST && cp <= MOJIBAKE_LEAD_LAST;
}
var byteMap;
function bytesOfChars() {
  if (byteMap) return byteMap;
  const map = new Int16Array(65536).fill(UNMAPPED);
  for (let b = 128; b <= 255; b++) map[b] = b;
  const cp1252 = iconv.decode(Buffer.from(Array.from({ length: 32 }, (_, k) => 128 + k)), "windows-1252");
  for (let k = 0; k < cp1252.length; k++) {
    const cp = cp1252.charCodeAt(k);
    if (cp !== 65533) map[cp] = 128 + k;
  }
  map[65533] = LOST_BYTE;
  byteMap = map;
  return map;
}
var assigned = new RegExp("^\\p{Assigned}$", "u");
var letter = new RegExp("^\\p{L}$", "u");
var punctuationOrSpace = /^[\p{P}\p{Zs}]$/u;
function isUpper(ch) {
  return ch !== ch.toLowerCase() && ch === ch.toUpperCase();
}
function countsAlone(text, start, length, cp) {
  if (length === 2) {
    if (text.charCodeAt(start) === MULTIPLICATION_SIGN) return false;
    if (start > 0 && isUpper(text[start - 1])) return false;
    for (const [lo, hi] of IMPLAUSIBLE_2_BYTE) if (cp >= lo && cp <= hi) return false;
    return assigned.test(String.fromCodePoint(cp));
  }
  let letters = 0;
  let punctuation2 = 0;
  for (let k = 1; k < length; k++) {
    const ch = text[start + k];
    if (letter.test(ch)) letters++;
    else if (punctuationOrSpace.test(ch)) punctuation2++;
  }
  if (letters === length - 1) return false;
  if (punctuation2 === length - 1 && !letter.test(text[start + length] ?? " ")) return false;
  return assigned.test(String.fromCodePoint(cp));
}
function countMojibake(text) {
  const map = bytesOfChars();
  const found = [];
  const n = text.length;
  for (let i = 0; i < n; i++) {
    const lead = map[text.charCodeAt(i)];
    if (lead < MOJIBAKE_LEAD_FIRST || lead > MOJIBAKE_LEAD_LAST) continue;
    const length = lead < 224 ? 2 : lead < 240 ? 3 : 4;
    if (i + length > n) continue;
    const lo = lead === 224 ? 160 : lead === 240 ? 144 : 128;
    const hi = lead === 237 ? 159 : lead === 244 ? 143 : 191;
    let cp = lead & (length === 2 ? 31 : length === 3 ? 15 : 7);
    let lossy = false;
    let valid = true;
    for (let k = 1; k < length; k++) {
      const b = map[text.charCodeAt(i + k)];
      const first = k === 1;
      if (b === LOST_BYTE) {
        if (first && lo > 157) {
          valid = false;
          break;
        }
        lossy = true;
        cp = cp << 6;
      } else if (b >= (first ? lo : 128) && b <= (first ? hi : 191)) {
        cp = cp << 6 | b & 63;
      } else {
        valid = false;
        break;
      }
    }
    if (!valid) continue;
    found.push({ start: i, end: i + length, alone: !lossy && countsAlone(text, i, length, cp) });
    i += length - 1;
  }
  let count3 = 0;
  for (let s = 0; s < found.length; s++) {
    const seq = found[s];
    const joined = found[s - 1]?.end === seq.start || found[s + 1]?.start === seq.end;
    if (joined || seq.alone) count3++;
  }
  return count3;
}

// src/results/types.ts
var RESULT_SCHEMA = 1;
var PURITY_BINS = 101;
var SAMPLES_PER_KIND = 5;

// src/results/tally.ts
function emptyLanguageTally() {
  return {
    docs: 0,
    bytes: 0,
    chars: 0,
    words: 0,
    purityDocs: 0,
    scriptChars: 0,
    expectedScriptChars: 0,
    purityHistogram: new Array(PURITY_BINS).fill(0)
  };
}
function emptyTokenTally() {
  return { tokens: 0, unknown: 0, wordTokens: 0, continuedWords: 0 };
}
function purityBin(purity) {
  return Math.min(PURITY_BINS - 1, Math.max(0, Math.floor(purity * 100 + 1e-9)));
}
function anomalyMask(anomalies) {
  let mask = 0;
  ANOMALY_KINDS.forEach((kind, i) => {
    if ((anomalies[kind] ?? 0) > 0) mask |= 1 << i;
  });
  return mask;
}
function kindsOfMask(mask) {
  return ANOMALY_KINDS.filter((_, i) => (mask & 1 << i) !== 0);
}
function maskOfKinds(kinds) {
  return kinds.reduce((m, k) => m | 1 << ANOMALY_KINDS.indexOf(k), 0);
}
var ShardTally = class {
  languages = {};
  scripts = {};
  anomalyMasks = {};
  anomalyDocs = Object.fromEntries(ANOMALY_KINDS.map((k) => [k, 0]));
  declared = {};
  impure = [];
  anomalous = [];
  mismatch = [];
  constructor(languageKeys) {
    for (const key of [...languageKeys, "other", "und"]) this.languages[key] = emptyLanguageTally();
  }
  lang(key) {
    let t = this.languages[key];
    if (!t) this.languages[key] = t = emptyLanguageTally();
    return t;
  }
  /** Adds one document's measures, with its line for located samples. */
  add(line, m, tokens) {
    const t = this.lang(m.language);
    t.docs += 1;
    t.bytes += m.bytes;
    t.chars += m.chars;
    t.words += m.words;
    if (tokens?.main) addTokens(t.tokens ??= emptyTokenTally(), tokens.main);
    if (tokens?.baseline) addTokens(t.baseline ??= emptyTokenTally(), tokens.baseline);
    let scriptChars = 0;
    for (const [script, n] of Object.entries(m.scripts)) {
      this.scripts[script] = (this.scripts[script] ?? 0) + n;
      scriptChars += n;
    }
    if (m.purity !== null) {
      const basis = this.lang(m.declared !== void 0 && m.declared !== "other" ? m.declared : m.language);
      basis.purityDocs += 1;
      basis.scriptChars += scriptChars;
      basis.expectedScriptChars += Math.round(m.purity * scriptChars);
      basis.purityHistogram[purityBin(m.purity)] += 1;
      const list = this.impure;
      if (list.length < SAMPLES_PER_KIND || m.purity < list[list.length - 1].purity) {
        keepLowest(list, { line, language: m.declared ?? m.language, purity: m.purity, detail: describeScripts(m.scripts) });
      }
    }
    const mask = anomalyMask(m.anomalies);
    if (mask !== 0) {
      this.anomalyMasks[mask] = (this.anomalyMasks[mask] ?? 0) + 1;
      const kinds = kindsOfMask(mask);
      for (const k of kinds) this.anomalyDocs[k] += 1;
      if (this.anomalous.length < SAMPLES_PER_KIND) {
        this.anomalous.push({ line, kinds, detail: kinds.map((k) => `${k} \xD7${m.anomalies[k]}`).join(", ") });
      }
    }
    if (m.declared !== void 0) {
      const row = this.declared[m.declared] ??= {};
      row[m.language] = (row[m.language] ?? 0) + 1;
      if (m.declared !== m.language && m.language !== "und" && this.mismatch.length < SAMPLES_PER_KIND) {
        this.mismatch.push({ line, declared: m.declared, detected: m.language, detail: `detector label ${m.detected}` });
      }
    }
  }
  /** Returns the tally's contents as plain data (shared, not copied). */
  state() {
    const { languages: languages2, scripts, anomalyMasks, anomalyDocs, declared, impure, anomalous, mismatch } = this;
    return { languages: languages2, scripts, anomalyMasks, anomalyDocs, declared, impure, anomalous, mismatch };
  }
  /**
   * Adds the tally of the documents that follow this one's (a batch measured elsewhere): the sums
   * add, new keys come after the ones already seen, and the example lists keep what adding each
   * document here would have kept (the first N by line; for impure, the N lowest by purity, then line).
   */
  absorb(o) {
    for (const [key, t] of Object.entries(o.languages)) this.languages[key] = addLanguageTallies(this.lang(key), t);
    addCounts(this.scripts, o.scripts);
    addCounts(this.anomalyMasks, o.anomalyMasks);
    addCounts(this.anomalyDocs, o.anomalyDocs);
    for (const [d, row] of Object.entries(o.declared)) addCounts(this.declared[d] ??= {}, row);
    for (const item of o.impure) keepLowest(this.impure, item);
    for (const item of o.anomalous) if (this.anomalous.length < SAMPLES_PER_KIND) this.anomalous.push(item);
    for (const item of o.mismatch) if (this.mismatch.length < SAMPLES_PER_KIND) this.mismatch.push(item);
  }
};
function addTokens(into, d) {
  into.tokens += d.tokens;
  into.unknown += d.unknown;
  into.wordTokens += d.wordTokens;
  into.continuedWords += d.continuedWords;
}
function keepLowest(list, item) {
  if (list.length >= SAMPLES_PER_KIND && item.purity >= list[list.length - 1].purity) return;
  list.push(item);
  list.sort((a, b) => a.purity - b.purity || a.line - b.line);
  if (list.length > SAMPLES_PER_KIND) list.pop();
}
function describeScripts(scripts) {
  const total = Object.values(scripts).reduce((a, b) => a + b, 0);
  return Object.entries(scripts).sort((a, b) => b[1] - a[1]).slice(0, 3).map(([s, n]) => `${s} ${Math.round(100 * n / total)}%`).join(", ");
}
function addLanguageTallies(a, b) {
  const out = {
    docs: a.docs + b.docs,
    bytes: a.bytes + b.bytes,
    chars: a.chars + b.chars,
    words: a.words + b.words,
    purityDocs: a.purityDocs + b.purityDocs,
    scriptChars: a.scriptChars + b.scriptChars,
    expectedScriptChars: a.expectedScriptChars + b.expectedScriptChars,
    purityHistogram: a.purityHistogram.map((n, i) => n + (b.purityHistogram[i] ?? 0))
  };
  if (a.tokens || b.tokens) out.tokens = sumTokens(a.tokens, b.tokens);
  if (a.baseline || b.baseline) out.baseline = sumTokens(a.baseline, b.baseline);
  return out;
}
function sumTokens(a, b) {
  const out = emptyTokenTally();
  if (a) addTokens(out, a);
  if (b) addTokens(out, b);
  return out;
}
function mergeShardResults(results, languageKeys) {
  const languages2 = {};
  for (const key of [...languageKeys, "other", "und"]) languages2[key] = emptyLanguageTally();
  const out = {
    shards: results.length,
    languages: languages2,
    scripts: {},
    anomalyMasks: {},
    anomalyDocs: Object.fromEntries(ANOMALY_KINDS.map((k) => [k, 0])),
    declared: {},
    input: { lines: 0, docs: 0, docLines: 0, empty: 0, rejected: 0, byReason: {}, bytes: 0, compressedBytes: 0 }
  };
  for (const r of results) {
    for (const [k, t] of Object.entries(r.languages)) {
      out.languages[k] = addLanguageTallies(out.languages[k] ?? emptyLanguageTally(), t);
    }
    addCounts(out.scripts, r.scripts);
    addCounts(out.anomalyMasks, r.anomalyMasks);
    addCounts(out.anomalyDocs, r.anomalyDocs);
    for (const [d, row] of Object.entries(r.declared)) addCounts(out.declared[d] ??= {}, row);
    const i = out.input;
    i.lines += r.read.lines;
    i.docs += r.read.docs;
    i.docLines += r.read.docLines;
    i.empty += r.read.empty;
    i.rejected += r.read.rejected.count;
    addCounts(i.byReason, r.read.rejected.byReason);
    i.bytes += r.read.bytes;
    i.compressedBytes += r.read.compressedBytes;
  }
  return out;
}
function addCounts(into, from) {
  for (const [k, n] of Object.entries(from)) into[k] = (into[k] ?? 0) + (n ?? 0);
}

// src/judge/figures.ts
function ratio(a, b) {
  return b === 0 ? null : a / b;
}
function amountIn(t, unit) {
  switch (unit) {
    case "docs":
      return t.docs;
    case "bytes":
      return t.bytes;
    case "chars":
      return t.chars;
    case "words":
      return t.words;
    case "tokens":
      return t.tokens?.tokens ?? 0;
  }
}
function docsBelowPurity(histogram, minPurity) {
  const firstPure = Math.floor(minPurity * 100 + 1e-9);
  let n = 0;
  for (let i = 0; i < firstPure && i < histogram.length; i++) n += histogram[i];
  return n;
}
function tokenFigures(t, tokens, tokenizer) {
  return {
    tokenizer: tokenizer.label,
    tokens: tokens.tokens,
    fertility: ratio(tokens.wordTokens, t.words),
    continuedWords: ratio(tokens.continuedWords, t.words),
    tokensPerWord: ratio(tokens.tokens, t.words),
    charsPerToken: ratio(t.chars, tokens.tokens),
    bytesPerToken: ratio(t.bytes, tokens.tokens),
    unknownRate: tokenizer.hasUnknown ? ratio(tokens.unknown, tokens.tokens) : null
  };
}
function languageFigures(policy, corpus) {
  const keys = [...policy.languages.map((l) => l.key), "other", "und"];
  const langs = corpus.tally.languages;
  const total = (unit) => keys.reduce((s, k) => s + (langs[k] ? amountIn(langs[k], unit) : 0), 0);
  const totals = { docs: total("docs"), bytes: total("bytes"), chars: total("chars"), words: total("words"), tokens: total("tokens") };
  const out = {};
  for (const key of keys) {
    const t = langs[key];
    if (!t) continue;
    const share = {
      docs: ratio(t.docs, totals.docs) ?? 0,
      bytes: ratio(t.bytes, totals.bytes) ?? 0,
      chars: ratio(t.chars, totals.chars) ?? 0,
      words: ratio(t.words, totals.words) ?? 0
    };
    if (corpus.tokenizer) share.tokens = ratio(t.tokens?.tokens ?? 0, totals.tokens) ?? 0;
    const spec = policy.languages.find((l) => l.key === key);
    const f = {
      key,
      docs: t.docs,
      bytes: t.bytes,
      chars: t.chars,
      words: t.words,
      share,
      purity: ratio(t.expectedScriptChars, t.scriptChars),
      purityDocs: t.purityDocs
    };
    if (spec?.target !== void 0) f.target = spec.target;
    if (policy.rules.script) f.impureDocs = docsBelowPurity(t.purityHistogram, policy.rules.script.minPurity);
    const declaredRow = corpus.tally.declared[key];
    if (declaredRow) {
      const declaredDocs = Object.values(declaredRow).reduce((a, b) => a + b, 0);
      f.declaredDocs = declaredDocs;
      f.mismatchDocs = declaredDocs - (declaredRow[key] ?? 0) - (declaredRow["und"] ?? 0);
      f.detectedAs = declaredRow;
    }
    if (corpus.tokenizer && t.tokens) {
      f.tokens = t.tokens.tokens;
      f.fertility = tokenFigures(t, t.tokens, corpus.tokenizer);
      const dict = corpus.dictionary?.[key];
      if (dict) f.fertility.dictionary = { entries: dict.main.entries, fertility: dict.main.fertility, continuedWords: dict.main.continued, list: dict.main.list };
    }
    if (corpus.baseline && t.baseline) {
      f.baseline = tokenFigures(t, t.baseline, corpus.baseline);
      const dict = corpus.dictionary?.[key]?.baseline;
      if (dict) f.baseline.dictionary = { entries: dict.entries, fertility: dict.fertility, continuedWords: dict.continued, list: dict.list };
    }
    out[key] = f;
  }
  return out;
}

// src/judge/intervals.ts
var CONFIDENCE = 0.95;
var Z_95 = 1.959963984540054;
var INTERVAL_METHODS = {
  wilson: "Wilson score interval (Wilson, 1927) for a share of documents, at the effective sample size of the shard-stratified sample (documents weighted by shard documents \xF7 measured documents).",
  "wilson-linearized": "Wilson score interval at the effective sample size R(1\u2212R)/Var(R) of a linearized (delta-method) variance of the stratified ratio estimator: documents are the sampled units, each a cluster of its tokens, words, bytes or characters; shards are strata, with finite-population correction.",
  "linearized-normal": "Normal interval R \xB1 1.96\xB7\u221AVar(R) from the same linearized variance, for ratios that are not shares (fertility)."
};
function wilsonInterval(p, n, z = Z_95) {
  if (n === Infinity) return { low: p, high: p };
  if (!(n > 0)) return { low: 0, high: 1 };
  const z2 = z * z;
  const denom = 1 + z2 / n;
  const center = (p + z2 / (2 * n)) / denom;
  const half = z / denom * Math.sqrt(Math.max(0, p * (1 - p) / n + z2 / (4 * n * n)));
  return { low: p === 0 ? 0 : Math.max(0, center - half), high: p === 1 ? 1 : Math.min(1, center + half) };
}
function ratioEstimate(strata, scale = 1) {
  let Y = 0;
  let X = 0;
  for (const s of strata) {
    if (s.n <= 0) continue;
    const w = s.N / s.n;
    Y += w * s.y;
    X += w * s.x;
  }
  if (!(X > 0)) return { estimate: null, variance: 0, effectiveN: 0, strata };
  const R = Y / X;
  let v = 0;
  let kish = 0;
  for (const s of strata) {
    if (s.n <= 0 || s.n >= s.N) continue;
    const n = Math.min(s.N, s.n * scale);
    const f = n / s.N;
    if (f >= 1) continue;
    const meanD2 = Math.max(0, s.yy - 2 * R * s.xy + R * R * s.xx) / s.n;
    v += s.N * s.N * (1 - f) / n * meanD2;
    kish += s.N * s.N * (1 - f) / n * (s.xx / s.n);
  }
  const variance = v / (X * X);
  let effectiveN;
  if (R > 0 && R < 1 && variance > 0) effectiveN = R * (1 - R) / variance;
  else effectiveN = kish > 0 ? X * X / kish : Infinity;
  return { estimate: R, variance, effectiveN, strata };
}
function intervalOf(e, method, offset = 0) {
  if (e.estimate === null) return void 0;
  if (method === "linearized-normal") {
    const half = Z_95 * Math.sqrt(e.variance);
    return { low: e.estimate - half + offset, high: e.estimate + half + offset, method };
  }
  const w = wilsonInterval(Math.min(1, Math.max(0, e.estimate)), e.effectiveN);
  return { low: w.low + offset, high: w.high + offset, method };
}
function intervalAtScale(strata, method, scale, offset = 0) {
  return intervalOf(ratioEstimate(strata, scale), method, offset);
}
function placeInterval(iv, bounds, eps = 1e-12) {
  const lo = bounds.low ?? -Infinity;
  if (iv.low >= lo - eps && iv.high <= bounds.high + eps) return "inside";
  if (iv.high < lo - eps || iv.low > bounds.high + eps) return "outside";
  return "straddles";
}
function scaleToSettle(strata, method, bounds, offset = 0, margin = 0) {
  const full = Math.max(1, ...strata.filter((s) => s.n > 0).map((s) => s.N / s.n));
  const e = ratioEstimate(strata).estimate;
  if (e === null) return null;
  const toward = (b) => b + margin * (e + offset - b);
  const target = { high: toward(bounds.high), ...bounds.low !== void 0 ? { low: toward(bounds.low) } : {} };
  const settled = (scale) => {
    const iv = intervalAtScale(strata, method, scale, offset);
    return iv !== void 0 && (scale >= full ? placeInterval(iv, bounds) !== "straddles" : placeInterval(iv, target) !== "straddles");
  };
  if (settled(1)) return 1;
  if (!settled(full)) return null;
  let lo = 1;
  let hi = full;
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (settled(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}

// src/judge/estimates.ts
var SampledCorpus = class {
  constructor(shards) {
    this.shards = shards;
  }
  shards;
  strata(sums) {
    return this.shards.map((r) => {
      const n = r.sample ? r.sample.docs : measuredDocsOf(r);
      const N = r.sample ? r.sample.of : n;
      return { N, n, ...sums(r) };
    });
  }
  /** Returns the strata of a language's share of the corpus in a unit (tokens: under the main tokenizer; `baseline`: under the baseline). */
  share(key, unit) {
    return this.strata((r) => {
      let x = 0;
      let xx = 0;
      for (const [k, t2] of Object.entries(r.languages)) {
        x += amount(t2, unit);
        xx += amount2(t2, r.sample?.moments[k], unit);
      }
      const t = r.languages[key];
      const y = t ? amount(t, unit) : 0;
      const yy = t ? amount2(t, r.sample?.moments[key], unit) : 0;
      return { y, x, yy, xx, xy: yy };
    });
  }
  /** Returns the strata of a language's purity (expected-script characters ÷ script characters). */
  purity(key) {
    return this.strata((r) => {
      const t = r.languages[key];
      const m = r.sample?.moments[key] ?? emptyMoments();
      return { y: t?.expectedScriptChars ?? 0, x: t?.scriptChars ?? 0, yy: m.expected2, xx: m.scriptChars2, xy: m.expectedScriptChars };
    });
  }
  /** Returns the strata of the share of a language's purity-judged documents below `minPurity`. */
  impure(key, minPurity) {
    return this.strata((r) => {
      const t = r.languages[key];
      return indicator(t ? docsBelowPurity(t.purityHistogram, minPurity) : 0, t?.purityDocs ?? 0);
    });
  }
  /** Returns the strata of the share of documents declaring `key` that the detector labels otherwise. */
  mismatch(key) {
    return this.strata((r) => {
      const row = r.declared[key] ?? {};
      const declared = Object.values(row).reduce((a, b) => a + b, 0);
      return indicator(declared - (row[key] ?? 0) - (row["und"] ?? 0), declared);
    });
  }
  /** Returns the strata of the share of documents with an anomaly in the mask. */
  anomalous(forbidMask) {
    return this.strata((r) => {
      let docs = 0;
      for (const [mask, n] of Object.entries(r.anomalyMasks)) if ((Number(mask) & forbidMask) !== 0) docs += n;
      return indicator(docs, measuredDocsOf(r));
    });
  }
  /** Returns the strata of a language's fertility (word tokens ÷ words) or continued words (continued ÷ words) under the main tokenizer. */
  perWord(key, what) {
    return this.strata((r) => {
      const t = r.languages[key];
      const m = r.sample?.moments[key] ?? emptyMoments();
      if (what === "fertility") return { y: t?.tokens?.wordTokens ?? 0, x: t?.words ?? 0, yy: m.wordTokens2, xx: m.words2, xy: m.wordTokensWords };
      return { y: t?.tokens?.continuedWords ?? 0, x: t?.words ?? 0, yy: m.continued2, xx: m.words2, xy: m.continuedWords };
    });
  }
  /** Returns the strata of a language's word tokens under the main tokenizer ÷ under the baseline (fertility ratio). */
  againstBaseline(key) {
    return this.strata((r) => {
      const t = r.languages[key];
      const m = r.sample?.moments[key] ?? emptyMoments();
      return { y: t?.tokens?.wordTokens ?? 0, x: t?.baseline?.wordTokens ?? 0, yy: m.wordTokens2, xx: m.baselineWordTokens2, xy: m.wordTokensBaseline };
    });
  }
  /** Returns the strata of any document count (x = 1 per measured document): what the sample size is counted in. */
  documents() {
    return this.strata((r) => indicator(0, measuredDocsOf(r)));
  }
};
function intervalFrom(strata, method, offset = 0) {
  return intervalOf(ratioEstimate(strata), method, offset);
}
function measuredDocsOf(r) {
  return Object.values(r.languages).reduce((s, t) => s + t.docs, 0);
}
function indicator(y, x) {
  return { y, x, yy: y, xx: x, xy: y };
}
function amount(t, unit) {
  return unit === "baseline" ? t.baseline?.tokens ?? 0 : amountIn(t, unit);
}
function amount2(t, m, unit) {
  if (unit === "docs") return t.docs;
  if (!m) return 0;
  switch (unit) {
    case "bytes":
      return m.bytes2;
    case "chars":
      return m.chars2;
    case "words":
      return m.words2;
    case "tokens":
      return m.tokens2;
    case "baseline":
      return m.baselineTokens2;
  }
}

// src/judge/rules.ts
var LOCATIONS_PER_RULE = 10;
function signedPoints(off) {
  const r = Math.round(off * 1e3) / 10;
  return `${r > 0 ? "+" : r < 0 ? "\u2212" : "\xB1"}${Math.abs(r).toFixed(1)}`;
}
function pct(x) {
  return x === null ? "n/a" : `${(x * 100).toFixed(1)} %`;
}
function outcome(policy, rule, scope, measured, limit, unit, failed, message, locations = []) {
  const severity = policy.severity[rule] ?? "error";
  const verdict = !failed ? "pass" : severity === "error" ? "fail" : "warn";
  return { rule, scope, measured, limit, unit, severity, verdict, message, locations: locations.slice(0, LOCATIONS_PER_RULE) };
}
function onSample(policy, o, sampled, strata, method, bounds, offset = 0) {
  const iv = intervalOf(ratioEstimate(strata), method, offset);
  if (!iv) return o;
  o.interval = iv;
  const show = (x) => o.unit === "share" ? pct(x) : x.toFixed(3);
  o.message += `; ${CONFIDENCE_LABEL} ${show(iv.low)} \u2013 ${show(iv.high)}`;
  const place = placeInterval(iv, bounds);
  if (place !== "straddles") {
    o.verdict = place === "inside" ? "pass" : o.severity === "error" ? "fail" : "warn";
    return o;
  }
  o.verdict = "uncertain";
  const docs = sampled.documents();
  const all = docs.reduce((n, s) => n + s.N, 0);
  const scale = scaleToSettle(strata, method, bounds, offset, SETTLE_MARGIN);
  const measuredDocs = docs.reduce((n, s) => n + s.n, 0);
  const setting = scale === null ? null : settingAt(policy.sampling, scale, measuredDocs / Math.max(1, all));
  const settleDocs = setting === null ? all : docsUnder(setting, docs);
  o.settle = { docs: settleDocs, sampling: settleDocs >= all ? null : setting };
  o.message += o.settle.sampling === null ? `; uncertain: the interval straddles the limit and only measuring every document settles it` : `; uncertain: the interval straddles the limit; about ${o.settle.docs} measured documents would settle it (sampling: ${"fraction" in o.settle.sampling ? `fraction ${o.settle.sampling.fraction}` : `docs-per-shard ${o.settle.sampling["docs-per-shard"]}`})`;
  return o;
}
var SETTLE_MARGIN = 0.5;
var CONFIDENCE_LABEL = "95 % CI";
function settingAt(spec, scale, realizedRate) {
  if (!spec) return null;
  if ("fraction" in spec) {
    const f = roundUp2(realizedRate * scale);
    return f >= 1 ? null : { fraction: f };
  }
  return { "docs-per-shard": Math.ceil(roundUp2(spec.docsPerShard * scale)) };
}
function docsUnder(setting, docs) {
  let n = 0;
  for (const s of docs) n += "fraction" in setting ? Math.min(s.N, Math.ceil(s.N * setting.fraction)) : Math.min(s.N, setting["docs-per-shard"]);
  return n;
}
function roundUp2(v) {
  const step = 10 ** (Math.floor(Math.log10(v)) - 1);
  return Number((Math.ceil(v / step - 1e-9) * step).toPrecision(2));
}
function judgeRules(policy, corpus, langs, sampled) {
  const out = [];
  const { rules } = policy;
  const n = (x) => sampled ? `\u2248${Math.round(x)}` : `${x}`;
  const broken = [
    ...corpus.shards.filter((s) => s.read.broken).map((s) => ({ path: s.path, line: s.read.broken.afterLine + 1, detail: s.read.broken.message })),
    // Files the globs match but sluice cannot read make the report incomplete; links out of
    // the root and second paths to one file are deliberate skips, reported but not judged.
    ...corpus.skipped.filter((s) => s.reason === "unreadable" || s.reason === "unsupported-format" || s.reason === "not-a-file").map((s) => ({ path: s.path, detail: `${s.reason}: ${s.detail}` }))
  ];
  out.push(
    outcome(
      policy,
      "input",
      "corpus",
      broken.length,
      rules.input.maxBrokenShards,
      "count",
      broken.length > rules.input.maxBrokenShards,
      broken.length === 0 ? corpus.shards.length === 1 ? "the one shard read to the end" : `all ${corpus.shards.length} shards read to the end` : `${broken.length} shard${broken.length === 1 ? "" : "s"} could not be read completely; figures cover only what was read before the break`,
      broken
    )
  );
  if (rules.input.maxRejected !== void 0) {
    const { lines, rejected } = corpus.tally.input;
    const share = ratio(rejected, lines) ?? 0;
    const locs = corpus.shards.flatMap((s) => s.read.rejected.samples.map((r) => ({ path: s.path, line: r.line, detail: `${r.reason}: ${r.detail}` })));
    out.push(
      outcome(
        policy,
        "input",
        "corpus",
        share,
        rules.input.maxRejected,
        "share",
        share > rules.input.maxRejected,
        `${rejected} of ${lines} lines rejected (${pct(share)}; limit ${pct(rules.input.maxRejected)})`,
        locs
      )
    );
  }
  if (rules.mix) {
    const unit = rules.mix.unit;
    for (const spec of policy.languages) {
      if (spec.target === void 0) continue;
      const f = langs[spec.key];
      const share = f ? f.share[unit] ?? 0 : 0;
      const off = share - spec.target;
      const o = outcome(
        policy,
        "mix",
        `language:${spec.key}`,
        share,
        spec.target,
        "share",
        Math.abs(off) > rules.mix.tolerance + 1e-12,
        `${spec.key} is ${pct(share)} of ${unit}, target ${pct(spec.target)} \xB1 ${(rules.mix.tolerance * 100).toFixed(1)} points (${signedPoints(off)} points)`
      );
      o.tolerance = rules.mix.tolerance;
      if (sampled) {
        onSample(
          policy,
          o,
          sampled,
          sampled.share(spec.key, unit),
          unit === "docs" ? "wilson" : "wilson-linearized",
          { low: spec.target - rules.mix.tolerance, high: spec.target + rules.mix.tolerance }
        );
      }
      out.push(o);
    }
    for (const [key, limit] of [["other", rules.mix.maxOther], ["und", rules.mix.maxUndetermined]]) {
      if (limit === void 0) continue;
      const share = langs[key]?.share[unit] ?? 0;
      const what = key === "other" ? "in languages the policy does not list" : "too short or unclear to label";
      const o = outcome(policy, "mix", `language:${key}`, share, limit, "share", share > limit + 1e-12, `${pct(share)} of ${unit} ${what} (limit ${pct(limit)})`);
      if (sampled) onSample(policy, o, sampled, sampled.share(key, unit), unit === "docs" ? "wilson" : "wilson-linearized", { high: limit });
      out.push(o);
    }
  }
  if (rules.script) {
    const { minPurity, maxImpureDocs } = rules.script;
    for (const spec of policy.languages) {
      const f = langs[spec.key];
      if (!f || f.purityDocs === 0) continue;
      const impure = f.impureDocs ?? 0;
      const share = ratio(impure, f.purityDocs) ?? 0;
      const locs = corpus.shards.flatMap(
        (s) => s.samples.impure.filter((x) => x.language === spec.key && x.purity < minPurity).map((x) => ({ path: s.path, line: x.line, detail: `purity ${pct(x.purity)}: ${x.detail}` }))
      );
      const o = outcome(
        policy,
        "script",
        `language:${spec.key}`,
        share,
        maxImpureDocs,
        "share",
        share > maxImpureDocs + 1e-12,
        `${n(impure)} of ${n(f.purityDocs)} ${spec.key} documents have under ${pct(minPurity)} of their letters in ${spec.scripts.join("/")} (${pct(share)}; limit ${pct(maxImpureDocs)})`,
        locs
      );
      if (sampled) onSample(policy, o, sampled, sampled.impure(spec.key, minPurity), "wilson", { high: maxImpureDocs });
      out.push(o);
    }
  }
  if (rules.encoding) {
    const forbid = maskOfKinds(rules.encoding.forbid);
    let docs = 0;
    for (const [mask, n2] of Object.entries(corpus.tally.anomalyMasks)) if ((Number(mask) & forbid) !== 0) docs += n2;
    const total = corpus.tally.input.docs;
    const share = ratio(docs, total) ?? 0;
    const byKind = rules.encoding.forbid.filter((k) => corpus.tally.anomalyDocs[k] > 0).map((k) => `${k} ${n(corpus.tally.anomalyDocs[k])}`);
    const locs = corpus.shards.flatMap(
      (s) => s.samples.anomalous.filter((a) => a.kinds.some((k) => rules.encoding.forbid.includes(k))).map((a) => ({ path: s.path, line: a.line, detail: a.detail }))
    );
    const o = outcome(
      policy,
      "encoding",
      "corpus",
      share,
      rules.encoding.maxAnomalousDocs,
      "share",
      share > rules.encoding.maxAnomalousDocs + 1e-12,
      `${n(docs)} of ${total} documents have forbidden characters or mojibake${byKind.length ? ` (${byKind.join(", ")})` : ""}; limit ${pct(rules.encoding.maxAnomalousDocs)}`,
      locs
    );
    if (sampled) onSample(policy, o, sampled, sampled.anomalous(forbid), "wilson", { high: rules.encoding.maxAnomalousDocs });
    out.push(o);
  }
  if (rules.fertility) {
    const fr = rules.fertility;
    for (const spec of policy.languages) {
      const f = langs[spec.key];
      const main2 = f?.fertility;
      if (!main2 || main2.fertility === null) continue;
      const max = fr.max[spec.key];
      if (max !== void 0) {
        const o = outcome(
          policy,
          "fertility",
          `language:${spec.key}`,
          main2.fertility,
          max,
          "ratio",
          main2.fertility > max,
          `${spec.key}: ${main2.fertility.toFixed(3)} tokens per word under ${main2.tokenizer} (limit ${max})`
        );
        if (sampled) onSample(policy, o, sampled, sampled.perWord(spec.key, "fertility"), "linearized-normal", { high: max });
        out.push(o);
      }
      const maxCont = fr.maxContinued[spec.key];
      if (maxCont !== void 0 && main2.continuedWords !== null) {
        const o = outcome(
          policy,
          "fertility",
          `language:${spec.key}`,
          main2.continuedWords,
          maxCont,
          "share",
          main2.continuedWords > maxCont,
          `${spec.key}: ${pct(main2.continuedWords)} of words split into 2+ tokens under ${main2.tokenizer} (limit ${pct(maxCont)})`
        );
        if (sampled) onSample(policy, o, sampled, sampled.perWord(spec.key, "continued"), "wilson-linearized", { high: maxCont });
        out.push(o);
      }
      const base = f.baseline;
      if (fr.maxRegression !== void 0 && base && base.fertility) {
        const rise = main2.fertility / base.fertility - 1;
        const o = outcome(
          policy,
          "fertility",
          `language:${spec.key}`,
          rise,
          fr.maxRegression,
          "share",
          rise > fr.maxRegression + 1e-12,
          `${spec.key}: fertility ${main2.fertility.toFixed(3)} under ${main2.tokenizer} vs ${base.fertility.toFixed(3)} under ${base.tokenizer} (${rise >= 0 ? "+" : ""}${pct(rise)}; limit +${pct(fr.maxRegression)})`
        );
        if (sampled) onSample(policy, o, sampled, sampled.againstBaseline(spec.key), "linearized-normal", { high: fr.maxRegression }, -1);
        out.push(o);
      }
    }
  }
  if (rules.duplicates && corpus.duplicates) {
    const d = corpus.duplicates;
    const locs = (kind) => d.clusters.filter((c) => c.kind === kind).flatMap((c) => c.copies.map((x) => ({ path: x.path, line: x.line, detail: `copy of ${c.first.path}:${c.first.line}${x.jaccard !== void 0 ? ` (Jaccard \u2248 ${x.jaccard.toFixed(2)})` : ""}` })));
    if (rules.duplicates.maxExact !== void 0) {
      const rate = ratio(d.exactDocs, d.docs) ?? 0;
      out.push(outcome(
        policy,
        "duplicates",
        "corpus",
        rate,
        rules.duplicates.maxExact,
        "share",
        rate > rules.duplicates.maxExact + 1e-12,
        `${d.exactDocs} of ${d.docs} documents are exact copies of an earlier one (${pct(rate)}; limit ${pct(rules.duplicates.maxExact)})`,
        locs("exact")
      ));
    }
    if (rules.duplicates.near.max !== void 0) {
      const rate = ratio(d.nearDocs, d.docs) ?? 0;
      out.push(outcome(
        policy,
        "duplicates",
        "corpus",
        rate,
        rules.duplicates.near.max,
        "share",
        rate > rules.duplicates.near.max + 1e-12,
        `${d.nearDocs} of ${d.docs} documents are near copies (Jaccard \u2265 ${d.parameters.threshold}) of an earlier one (${pct(rate)}; limit ${pct(rules.duplicates.near.max)})`,
        locs("near")
      ));
    }
  }
  if (rules.contamination && corpus.contamination) {
    const docs = corpus.shards.reduce((s, r) => s + (r.contamination?.docs ?? 0), 0);
    const locs = corpus.shards.flatMap((s) => (s.contamination?.samples ?? []).map((x) => ({ path: s.path, line: x.line, detail: `shares a ${corpus.contamination.ngram}-gram with ${x.evalFile}:${x.evalLine}` })));
    out.push(outcome(
      policy,
      "contamination",
      "corpus",
      docs,
      rules.contamination.maxDocs,
      "count",
      docs > rules.contamination.maxDocs,
      `${docs} training document${docs === 1 ? " shares" : "s share"} a ${corpus.contamination.ngram}-word sequence with the evaluation sets (limit ${rules.contamination.maxDocs})`,
      locs
    ));
  }
  return out;
}
function overallVerdict(outcomes) {
  if (outcomes.some((o) => o.verdict === "fail")) return "fail";
  if (outcomes.some((o) => o.verdict === "warn" || o.verdict === "uncertain")) return "warn";
  return "pass";
}

// src/version.ts
var TOOL_VERSION = "0.1.0";

// src/judge/report.ts
function buildReport(policy, measured, cwd = process.cwd()) {
  const isSampled = measured.shards.some((s) => s.sample);
  const sampled = isSampled ? new SampledCorpus(measured.shards) : void 0;
  let corpus = measured;
  if (isSampled) {
    const shards2 = measured.shards.map(scaleShardResult);
    corpus = { ...measured, shards: shards2, tally: mergeShardResults(shards2, policy.languages.map((l) => l.key)) };
  }
  const languages2 = languageFigures(policy, corpus);
  const rules = judgeRules(policy, corpus, languages2, sampled);
  if (sampled) addLanguageIntervals(policy, languages2, sampled, corpus.tokenizer !== void 0);
  const verdict = overallVerdict(rules);
  const mixUnit = policy.rules.mix?.unit ?? (corpus.tokenizer ? "tokens" : "words");
  const totals = { docs: 0, bytes: 0, chars: 0, words: 0 };
  for (const f of Object.values(languages2)) {
    totals.docs += f.docs;
    totals.bytes += f.bytes;
    totals.chars += f.chars;
    totals.words += f.words;
    if (f.tokens !== void 0) totals.tokens = (totals.tokens ?? 0) + f.tokens;
  }
  const shards = corpus.shards.map((s) => {
    const fig = {
      path: s.path,
      lines: s.read.lines,
      docs: s.read.docs,
      empty: s.read.empty,
      rejected: s.read.rejected.count,
      bytes: s.read.bytes,
      languages: Object.fromEntries(Object.entries(s.languages).filter(([, t]) => t.docs > 0).map(([k, t]) => [k, t.docs])),
      rejections: s.read.rejected.samples,
      fromCache: corpus.cached.has(s.path)
    };
    if (s.subset !== void 0) fig.subset = s.subset;
    if (corpus.tokenizer) fig.tokens = Object.values(s.languages).reduce((n, t) => n + (t.tokens?.tokens ?? 0), 0);
    if (s.read.broken) fig.broken = s.read.broken;
    if (s.sample) fig.measuredDocs = s.sample.docs;
    return fig;
  });
  const subsets = {};
  for (const s of corpus.shards) {
    const key = s.subset ?? "(none)";
    const sub = subsets[key] ??= { docs: 0, bytes: 0, words: 0, languages: {} };
    for (const [lang, t] of Object.entries(s.languages)) {
      if (t.docs === 0) continue;
      sub.docs += t.docs;
      sub.bytes += t.bytes;
      sub.words += t.words;
      if (t.tokens) sub.tokens = (sub.tokens ?? 0) + t.tokens.tokens;
      sub.languages[lang] = (sub.languages[lang] ?? 0) + t.docs;
    }
  }
  const report = {
    report: "sluice",
    version: 1,
    tool: { name: "sluice", version: TOOL_VERSION },
    policy: { name: policy.name, file: relative(cwd, policy.file) || policy.file, root: relative(cwd, policy.root) || "." },
    verdict,
    headline: headlineOf(verdict, rules),
    mixUnit,
    totals,
    languages: languages2,
    scripts: corpus.tally.scripts,
    subsets,
    rules,
    input: {
      shards: corpus.shards.length,
      lines: corpus.tally.input.lines,
      docs: corpus.tally.input.docs,
      docLines: corpus.tally.input.docLines,
      empty: corpus.tally.input.empty,
      rejected: { count: corpus.tally.input.rejected, byReason: corpus.tally.input.byReason },
      skipped: corpus.skipped,
      broken: corpus.shards.filter((s) => s.read.broken).map((s) => ({ path: s.path, ...s.read.broken }))
    },
    shards,
    timing: {
      elapsedMs: corpus.elapsedMs,
      megabytesPerSecond: Math.round(corpus.tally.input.bytes / 1e6 / Math.max(corpus.elapsedMs, 1) * 1e3 * 10) / 10,
      cacheHits: corpus.cached.size,
      cacheMisses: corpus.shards.length - corpus.cached.size
    }
  };
  if (corpus.tokenizer) {
    report.tokenizer = { main: corpus.tokenizer.label };
    if (corpus.baseline) {
      report.tokenizer.baseline = corpus.baseline.label;
      if (sampled) {
        const intervals = {};
        for (const [k, t] of Object.entries(corpus.tally.languages)) {
          if (t.docs === 0) continue;
          const iv = intervalFrom(sampled.share(k, "baseline"), "wilson-linearized");
          if (iv) intervals[k] = iv;
        }
        report.tokenizer.mixUnderBaselineIntervals = intervals;
      }
      const baseTotal = Object.values(corpus.tally.languages).reduce((n, t) => n + (t.baseline?.tokens ?? 0), 0);
      const under = {};
      const shift = {};
      for (const [k, t] of Object.entries(corpus.tally.languages)) {
        if (t.docs === 0) continue;
        under[k] = ratio(t.baseline?.tokens ?? 0, baseTotal) ?? 0;
        shift[k] = ((languages2[k]?.share.tokens ?? 0) - under[k]) * 100;
      }
      report.tokenizer.mixUnderBaseline = under;
      report.tokenizer.mixShiftPoints = shift;
    }
  }
  if (corpus.duplicates) {
    const d = corpus.duplicates;
    const bySubset = {};
    for (const s of corpus.shards) {
      const row = d.byShard[s.path];
      if (!row) continue;
      const sub = bySubset[s.subset ?? "(none)"] ??= { docs: 0, exactDocs: 0, nearDocs: 0 };
      sub.docs += row.docs;
      sub.exactDocs += row.exactDocs;
      sub.nearDocs += row.nearDocs;
    }
    report.duplicates = {
      exactDocs: d.exactDocs,
      exactRate: ratio(d.exactDocs, d.docs) ?? 0,
      nearDocs: d.nearDocs,
      nearRate: ratio(d.nearDocs, d.docs) ?? 0,
      tooShortDocs: d.tooShortDocs,
      byLanguage: d.byLanguage,
      bySubset,
      byShard: d.byShard,
      clusters: d.clusters,
      parameters: d.parameters
    };
  }
  if (corpus.contamination) {
    report.contamination = {
      docs: corpus.shards.reduce((s, r) => s + (r.contamination?.docs ?? 0), 0),
      ngram: corpus.contamination.ngram,
      evalFiles: corpus.contamination.evalFiles,
      evalItems: corpus.contamination.evalItems,
      samples: corpus.shards.flatMap((s) => (s.contamination?.samples ?? []).map((x) => ({ path: s.path, line: x.line, detail: `${x.evalFile}:${x.evalLine}` })))
    };
  }
  if (isSampled) {
    report.sampling = samplingFigures(policy, measured, report);
    roundEstimates(report);
  }
  return report;
}
var METHOD_ORDER = ["wilson", "wilson-linearized", "linearized-normal"];
function samplingFigures(policy, measured, report) {
  const first = measured.shards.find((s) => s.sample).sample;
  const { method, setting } = policy.sampling ? describeSampling(policy.sampling) : first;
  const used = /* @__PURE__ */ new Set();
  for (const r of report.rules) if (r.interval) used.add(r.interval.method);
  for (const f of Object.values(report.languages)) {
    const iv = f.intervals;
    if (!iv) continue;
    for (const x of [...Object.values(iv.share), iv.purity, iv.impureDocs, iv.mismatchDocs, iv.fertility, iv.continuedWords]) if (x) used.add(x.method);
  }
  const everyDocument = ["input lines"];
  if (measured.duplicates) everyDocument.push("duplicates");
  if (measured.contamination) everyDocument.push("contamination");
  return {
    method,
    setting,
    measuredDocs: measured.shards.reduce((n, s) => n + (s.sample ? s.sample.docs : s.read.docs), 0),
    docs: measured.tally.input.docs,
    completeShards: measured.shards.filter((s) => !s.sample || s.sample.docs >= s.sample.of).length,
    confidence: CONFIDENCE,
    methods: Object.fromEntries(METHOD_ORDER.filter((m) => used.has(m)).map((m) => [m, INTERVAL_METHODS[m]])),
    everyDocument
  };
}
function addLanguageIntervals(policy, languages2, sampled, hasTokens) {
  for (const f of Object.values(languages2)) {
    const iv = { share: {} };
    for (const unit of ["docs", "bytes", "chars", "words", ...hasTokens ? ["tokens"] : []]) {
      const x = intervalFrom(sampled.share(f.key, unit), unit === "docs" ? "wilson" : "wilson-linearized");
      if (x) iv.share[unit] = x;
    }
    const purity = intervalFrom(sampled.purity(f.key), "wilson-linearized");
    if (purity) iv.purity = purity;
    if (policy.rules.script && f.purityDocs > 0) {
      const x = intervalFrom(sampled.impure(f.key, policy.rules.script.minPurity), "wilson");
      if (x) iv.impureDocs = x;
    }
    if (f.declaredDocs) {
      const x = intervalFrom(sampled.mismatch(f.key), "wilson");
      if (x) iv.mismatchDocs = x;
    }
    if (f.fertility) {
      const fert = intervalFrom(sampled.perWord(f.key, "fertility"), "linearized-normal");
      const cont = intervalFrom(sampled.perWord(f.key, "continued"), "wilson-linearized");
      if (fert) iv.fertility = fert;
      if (cont) iv.continuedWords = cont;
    }
    f.intervals = iv;
  }
}
function roundEstimates(report) {
  const r = Math.round;
  const t = report.totals;
  t.docs = r(t.docs);
  t.bytes = r(t.bytes);
  t.chars = r(t.chars);
  t.words = r(t.words);
  if (t.tokens !== void 0) t.tokens = r(t.tokens);
  t.estimated = true;
  for (const f of Object.values(report.languages)) {
    f.docs = r(f.docs);
    f.bytes = r(f.bytes);
    f.chars = r(f.chars);
    f.words = r(f.words);
    if (f.tokens !== void 0) f.tokens = r(f.tokens);
    f.purityDocs = r(f.purityDocs);
    if (f.impureDocs !== void 0) f.impureDocs = r(f.impureDocs);
    if (f.declaredDocs !== void 0) f.declaredDocs = r(f.declaredDocs);
    if (f.mismatchDocs !== void 0) f.mismatchDocs = r(f.mismatchDocs);
    if (f.detectedAs) f.detectedAs = Object.fromEntries(Object.entries(f.detectedAs).map(([k, n]) => [k, r(n)]));
    for (const tf of [f.fertility, f.baseline]) if (tf) tf.tokens = r(tf.tokens);
  }
  for (const k of Object.keys(report.scripts)) report.scripts[k] = r(report.scripts[k]);
  for (const s of Object.values(report.subsets)) {
    s.docs = r(s.docs);
    s.bytes = r(s.bytes);
    s.words = r(s.words);
    if (s.tokens !== void 0) s.tokens = r(s.tokens);
    for (const k of Object.keys(s.languages)) s.languages[k] = r(s.languages[k]);
  }
  for (const s of report.shards) {
    for (const k of Object.keys(s.languages)) s.languages[k] = r(s.languages[k]);
    if (s.tokens !== void 0) s.tokens = r(s.tokens);
  }
}
function headlineOf(verdict, rules) {
  const failing = rules.filter((r) => r.verdict === "fail");
  const warning = rules.filter((r) => r.verdict === "warn");
  const uncertain = rules.filter((r) => r.verdict === "uncertain");
  const names = (list) => [...new Set(list.map((r) => r.scope === "corpus" ? r.rule : `${r.rule} (${r.scope.replace(/^language:/, "")})`))].join(", ");
  const unsure = uncertain.length ? `${uncertain.length} rule${uncertain.length === 1 ? "" : "s"} uncertain on the sample (a larger sample settles ${uncertain.length === 1 ? "it" : "them"}): ${names(uncertain)}` : "";
  if (verdict === "fail") return `FAIL: ${failing.length} check${failing.length === 1 ? "" : "s"} at error severity failed: ${names(failing)}${unsure ? `; ${unsure}` : ""}`;
  if (verdict === "warn") {
    if (warning.length === 0) return `PASS with warnings: ${unsure}`;
    return `PASS with warnings: ${names(warning)}${unsure ? `; ${unsure}` : ""}`;
  }
  return rules.length === 1 ? "PASS: the one judged check holds" : `PASS: all ${rules.length} judged checks hold`;
}

// src/policy/load.ts
import { readFile, stat } from "node:fs/promises";
import path3 from "node:path";

// src/policy/format.ts
var PLAIN_KEY = /^[A-Za-z0-9_$-]+$/;
function formatPath(path5) {
  let out = "";
  for (const seg of path5) {
    if (typeof seg === "number") out += `[${seg}]`;
    else if (PLAIN_KEY.test(seg)) out += out === "" ? seg : `.${seg}`;
    else out += `[${JSON.stringify(seg)}]`;
  }
  return out;
}
function formatProblem(p) {
  let where2 = p.file;
  if (p.line !== void 0) {
    where2 += `:${p.line}`;
    if (p.column !== void 0) where2 += `:${p.column}`;
  }
  const key = p.path ? ` ${p.path}:` : "";
  const hint = p.suggestion ? ` (${p.suggestion})` : "";
  return `${where2}:${key} ${p.message}${hint}`.replace(/\s*\n\s*/g, " ");
}

// src/policy/parse.ts
import path2 from "node:path";

// src/policy/yaml-doc.ts
import {
  LineCounter,
  parseDocument,
  isAlias,
  isMap,
  isPair,
  isScalar,
  isSeq
} from "yaml";
var MAX_ALIAS_COUNT = 100;
function readPolicyYaml(text) {
  const lineCounter = new LineCounter();
  const source = text.charCodeAt(0) === 65279 ? text.slice(1) : text;
  const doc = parseDocument(source, { lineCounter, uniqueKeys: false, prettyErrors: false });
  const pos = (offset) => {
    const { line, col } = lineCounter.linePos(offset);
    return { line, column: col };
  };
  const errors = doc.errors.map((e) => ({
    position: pos(e.pos[0]),
    path: pathAtOffset(doc, e.pos[0]),
    message: plainMessage(e.message)
  }));
  const warnings = doc.warnings.map((e) => ({
    position: pos(e.pos[0]),
    path: pathAtOffset(doc, e.pos[0]),
    message: plainMessage(e.message)
  }));
  const duplicates = [];
  findDuplicates(doc, doc.contents, [], pos, duplicates);
  let value;
  if (errors.length === 0) {
    try {
      value = doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
    } catch (e) {
      errors.push({ position: { line: 1, column: 1 }, path: [], message: e.message });
    }
  }
  const locate2 = (path5, part = "value") => {
    const found = walk(doc, path5);
    const node = part === "key" ? found.key ?? found.value : found.value ?? found.key;
    const offset = node?.range?.[0];
    return offset === void 0 ? { line: 1, column: 1 } : pos(offset);
  };
  return { value, errors, duplicates, warnings, locate: locate2 };
}
function plainMessage(message) {
  return message.replace(/ at line \d+, column \d+:?[\s\S]*$/, "").trim();
}
function keyText(pair) {
  const k = pair.key;
  if (isScalar(k)) return String(k.value);
  return void 0;
}
function resolved(doc, node) {
  return isAlias(node) ? node.resolve(doc) : node;
}
function walk(doc, path5) {
  let value = resolved(doc, doc.contents);
  let key;
  for (const seg of path5) {
    if (isMap(value)) {
      const pair = value.items.find((p) => keyText(p) === String(seg));
      if (!pair) break;
      key = pair.key ?? void 0;
      const next = resolved(doc, pair.value);
      value = next && next.range && !(isScalar(next) && next.value === null && next.range[0] === next.range[1]) ? next : void 0;
      if (!value) break;
    } else if (isSeq(value) && typeof seg === "number") {
      const item = resolved(doc, value.items[seg]);
      if (!item) break;
      key = void 0;
      value = item;
    } else {
      break;
    }
  }
  return { key, value: value ?? void 0 };
}
function pathAtOffset(doc, offset) {
  const path5 = [];
  let node = doc.contents;
  for (; ; ) {
    if (isMap(node)) {
      const pair = node.items.find((p) => {
        const start = p.key?.range?.[0];
        const end = p.value?.range?.[2] ?? p.key?.range?.[2];
        return start !== void 0 && end !== void 0 && start <= offset && offset <= end;
      });
      const k = pair && keyText(pair);
      if (!pair || k === void 0) return path5;
      path5.push(k);
      node = pair.value;
    } else if (isSeq(node)) {
      const i = node.items.findIndex((it) => {
        const r = it?.range;
        return r != null && r[0] <= offset && offset <= r[2];
      });
      if (i < 0) return path5;
      path5.push(i);
      node = node.items[i];
    } else {
      return path5;
    }
  }
}
function findDuplicates(doc, node, path5, pos, out) {
  if (isMap(node)) {
    const seen = /* @__PURE__ */ new Map();
    for (const pair of node.items) {
      if (!isPair(pair)) continue;
      const k = keyText(pair);
      const start = pair.key?.range?.[0];
      if (k !== void 0 && start !== void 0) {
        const first = seen.get(k);
        if (first) {
          out.push({
            position: pos(start),
            path: [...path5, k],
            message: `duplicate key \`${k}\` (first set on line ${first.line}); a key may appear once per mapping`
          });
        } else {
          seen.set(k, pos(start));
        }
      }
      findDuplicates(doc, pair.value, k === void 0 ? path5 : [...path5, k], pos, out);
    }
  } else if (isSeq(node)) {
    node.items.forEach((item, i) => findDuplicates(doc, item, [...path5, i], pos, out));
  }
}

// schemas/policy.schema.json
var policy_schema_default = {
  $schema: "https://json-schema.org/draft/2020-12/schema",
  title: "sluice policy",
  description: "What a corpus must satisfy to merge: where its shards are, which languages it holds, and the rules a pull request is judged by. Keys are kebab-case.",
  type: "object",
  additionalProperties: false,
  required: ["version", "corpus", "languages"],
  properties: {
    version: {
      description: "Policy format version. This sluice reads version 1; a higher number means the policy was written for a newer sluice.",
      type: "integer",
      const: 1
    },
    name: {
      description: "Name shown in reports. Default: the policy file name without its extension.",
      type: "string",
      minLength: 1
    },
    root: {
      description: "Directory all globs and files are relative to, itself relative to the policy file's directory. Default: the nearest directory above the policy file that holds a `.git` entry, else the policy file's directory.",
      type: "string",
      minLength: 1
    },
    corpus: {
      description: "Where the shards are and how to read them.",
      type: "object",
      additionalProperties: false,
      required: ["include"],
      properties: {
        include: {
          description: "Glob or list of globs (relative to root) matching the shards: .jsonl, .txt, optionally .gz or .zst compressed.",
          type: ["string", "array"],
          minLength: 1,
          minItems: 1,
          items: { type: "string", minLength: 1 },
          examples: [["data/**/*.jsonl.gz"]]
        },
        exclude: {
          description: "Glob or list of globs (relative to root) of files to leave out even when `include` matches them.",
          type: ["string", "array"],
          minLength: 1,
          items: { type: "string", minLength: 1 },
          default: []
        },
        text: {
          description: "Dot path of the text field in JSONL records, e.g. `text` or `meta.body`.",
          type: "string",
          minLength: 1,
          default: "text"
        },
        "declared-language": {
          description: "Dot path of a field in JSONL records that declares the document's language, when the shards carry one; it is compared with the detected language.",
          type: "string",
          minLength: 1
        },
        subset: {
          description: "Pattern with exactly one `{subset}` placeholder that names a shard's subset from its path, e.g. `data/{subset}/**`.",
          type: "string",
          minLength: 1,
          examples: ["data/{subset}/**"]
        },
        encodings: {
          description: "Shards not in UTF-8: glob (relative to root) \u2192 encoding name as iconv-lite knows it (e.g. `windows-1256`). A shard that matches several globs takes the first, in the order written.",
          type: "object",
          additionalProperties: { type: "string", minLength: 1 },
          default: {}
        },
        "max-line-bytes": {
          description: "Lines longer than this many bytes (after decompression) are rejected without being buffered. Default 8 MiB.",
          type: "integer",
          minimum: 1,
          default: 8388608
        }
      }
    },
    languages: {
      description: "The languages the corpus is meant to hold, keyed by ISO 639-1 (`hi`), ISO 639-3 (`hin`) or BCP 47 (`hi-IN`, `sr-Latn`) codes. `other` and `und` are reserved for text in unlisted languages and text too short to label.",
      type: "object",
      minProperties: 1,
      additionalProperties: { $ref: "#/$defs/language" },
      examples: [{ hin: { scripts: ["Devanagari"], target: 0.4 }, eng: { scripts: ["Latin"], target: 0.6 } }]
    },
    detection: {
      description: "Language identification settings.",
      type: "object",
      additionalProperties: false,
      properties: {
        "min-chars": {
          description: "Texts with fewer letters than this are labelled `und` (too short to judge). Default 20.",
          type: "integer",
          minimum: 0,
          default: 20
        }
      }
    },
    tokenizer: {
      $ref: "#/$defs/tokenizer",
      description: "The model's tokenizer: token counts for the mix and fertility are measured with it. Either `builtin` or `file`."
    },
    baseline: {
      $ref: "#/$defs/tokenizer",
      description: "A second tokenizer to compare fertility against (e.g. the one in use before a vocabulary change). Either `builtin` or `file`."
    },
    sampling: {
      description: "Judge a deterministic sample of documents (picked by document hash) instead of all of them. Either `docs-per-shard` or `fraction`.",
      type: "object",
      additionalProperties: false,
      minProperties: 1,
      properties: {
        "docs-per-shard": {
          description: "At most this many documents from each shard.",
          type: "integer",
          minimum: 1
        },
        fraction: {
          description: "This share of each shard's documents, in (0, 1].",
          type: "number",
          exclusiveMinimum: 0,
          maximum: 1
        }
      },
      dependentSchemas: {
        "docs-per-shard": { properties: { fraction: false } }
      }
    },
    rules: {
      description: "What the corpus is judged by. `input` is always judged; the other rules only when listed.",
      type: "object",
      additionalProperties: false,
      properties: {
        input: {
          description: "Input that could not be read: rejected lines and broken shards. Always judged, because a report over broken shards is incomplete.",
          type: "object",
          additionalProperties: false,
          properties: {
            "max-rejected": {
              description: "Highest share of input lines that may be rejected (invalid JSON, bad encoding, missing text field, ...). No limit when absent; rejections are still counted and reported.",
              $ref: "#/$defs/share"
            },
            "max-broken-shards": {
              description: "How many shards may be unreadable or broken (corrupt or truncated compression). Default 0.",
              type: "integer",
              minimum: 0,
              default: 0
            }
          }
        },
        mix: {
          description: "Each language's share of the corpus against its `target`. Needs at least one language with a `target`.",
          type: "object",
          additionalProperties: false,
          properties: {
            unit: {
              description: "What a share is counted in. Default `tokens` when a tokenizer is set, else `words` (UAX #29 word boundaries).",
              enum: ["docs", "bytes", "chars", "words", "tokens"]
            },
            tolerance: {
              description: "Allowed absolute distance between a language's share and its target (0.03 = 3 points). Default 0.03.",
              $ref: "#/$defs/share",
              default: 0.03
            },
            "max-other": {
              description: "Highest share of text in languages the policy does not list (`other`).",
              $ref: "#/$defs/share"
            },
            "max-und": {
              description: "Highest share of text too short or unclear to label (`und`).",
              $ref: "#/$defs/share"
            }
          }
        },
        script: {
          description: "Script purity: the share of a document's letters that are in its language's own scripts.",
          type: "object",
          additionalProperties: false,
          properties: {
            "min-purity": {
              description: "A document whose purity is below this is impure. Default 0.9.",
              $ref: "#/$defs/share",
              default: 0.9
            },
            "max-impure-docs": {
              description: "Highest share of impure documents, per language. Default 0.02.",
              $ref: "#/$defs/share",
              default: 0.02
            }
          }
        },
        encoding: {
          description: "Encoding anomalies in the text: replacement characters, control characters, bidirectional controls, zero-width characters, private-use characters, mojibake.",
          type: "object",
          additionalProperties: false,
          properties: {
            "max-anomalous-docs": {
              description: "Highest share of documents with any forbidden anomaly. Default 0.",
              $ref: "#/$defs/share",
              default: 0
            },
            forbid: {
              description: "Anomaly kinds that make a document anomalous. Default: replacement-char, control-chars, bidi-controls, mojibake. `zero-width` is not in the default because joiners are part of correct spelling in several scripts.",
              type: "array",
              uniqueItems: true,
              items: {
                enum: ["replacement-char", "control-chars", "bidi-controls", "zero-width", "private-use", "mojibake"]
              },
              default: ["replacement-char", "control-chars", "bidi-controls", "mojibake"]
            }
          }
        },
        fertility: {
          description: "Tokenizer fertility (subword tokens per word) and the share of continued words (words split into two or more tokens), per language. Needs `tokenizer`.",
          type: "object",
          additionalProperties: false,
          properties: {
            max: {
              description: "Per language key (as written under `languages`): highest running-text fertility.",
              type: "object",
              additionalProperties: { type: "number", exclusiveMinimum: 0 },
              default: {}
            },
            "max-regression": {
              description: "Highest relative rise of fertility against the base branch or the baseline tokenizer (0.03 = 3 %).",
              type: "number",
              minimum: 0
            },
            "max-continued": {
              description: "Per language key: highest share of continued words.",
              type: "object",
              additionalProperties: { $ref: "#/$defs/share" },
              default: {}
            },
            "word-lists": {
              description: "Per language key: a word list (one entry a line, or a hunspell .dic), relative to root, for dictionary fertility.",
              type: "object",
              additionalProperties: { type: "string", minLength: 1 },
              default: {}
            }
          }
        },
        duplicates: {
          description: "Exact duplicates (hash of normalized text) and near duplicates (MinHash estimate of the Jaccard similarity of word shingles).",
          type: "object",
          additionalProperties: false,
          properties: {
            "max-exact": {
              description: "Highest share of documents that exactly repeat an earlier one.",
              $ref: "#/$defs/share"
            },
            near: {
              description: "Near-duplicate detection settings.",
              type: "object",
              additionalProperties: false,
              properties: {
                threshold: {
                  description: "Estimated Jaccard similarity at or above which two documents are near duplicates, in (0, 1). Default 0.8.",
                  type: "number",
                  exclusiveMinimum: 0,
                  exclusiveMaximum: 1,
                  default: 0.8
                },
                max: {
                  description: "Highest share of documents that nearly repeat another.",
                  $ref: "#/$defs/share"
                },
                shingle: {
                  description: "Words per shingle. Default 5.",
                  type: "integer",
                  minimum: 1,
                  default: 5
                },
                hashes: {
                  description: "MinHash functions per document, 16 to 1024. Default 128. The estimate's standard error is sqrt(J(1-J)/k) for k hashes: below 16 it is too coarse to judge a threshold (common practice), and above 1024 the cost grows with little gain.",
                  type: "integer",
                  minimum: 16,
                  maximum: 1024,
                  default: 128
                }
              }
            },
            punctuation: {
              description: "Exact-duplicate normalization: keep punctuation (default) or strip it before hashing.",
              enum: ["keep", "strip"],
              default: "keep"
            }
          }
        },
        contamination: {
          description: "Training documents that contain text of an evaluation item (n-gram overlap).",
          type: "object",
          additionalProperties: false,
          required: ["eval"],
          properties: {
            eval: {
              description: "Glob or list of globs (relative to root) matching the evaluation sets (.jsonl or .txt).",
              type: ["string", "array"],
              minLength: 1,
              minItems: 1,
              items: { type: "string", minLength: 1 }
            },
            ngram: {
              description: "Words per n-gram; a document sharing any n-gram with an evaluation item is contaminated. Default 13, the length used for the overlap test in Brown et al. (2020).",
              type: "integer",
              minimum: 1,
              default: 13
            },
            "max-docs": {
              description: "Highest number of contaminated documents. Default 0.",
              type: "integer",
              minimum: 0,
              default: 0
            }
          }
        }
      }
    },
    severity: {
      description: "Per rule: `error` blocks the merge, `warn` only reports. A rule not listed is `error`.",
      type: "object",
      additionalProperties: false,
      properties: {
        input: { $ref: "#/$defs/severity" },
        mix: { $ref: "#/$defs/severity" },
        script: { $ref: "#/$defs/severity" },
        encoding: { $ref: "#/$defs/severity" },
        fertility: { $ref: "#/$defs/severity" },
        duplicates: { $ref: "#/$defs/severity" },
        contamination: { $ref: "#/$defs/severity" }
      }
    }
  },
  $defs: {
    share: {
      description: "A share, from 0 to 1 (0.02 = 2 %).",
      type: "number",
      minimum: 0,
      maximum: 1
    },
    severity: {
      description: "`error` blocks the merge; `warn` only reports.",
      enum: ["error", "warn"],
      default: "error"
    },
    language: {
      description: "One language of the corpus. An entry with nothing after the colon takes the defaults.",
      type: ["object", "null"],
      additionalProperties: false,
      properties: {
        scripts: {
          description: "Unicode scripts that count as this language's own, as Script property names (`Devanagari`) or ISO 15924 codes (`Deva`). Optional for common languages and for BCP 47 keys with a script subtag (`sr-Latn`).",
          type: "array",
          minItems: 1,
          uniqueItems: true,
          items: { type: "string", minLength: 1 },
          examples: [["Devanagari"], ["Han", "Hiragana", "Katakana"]]
        },
        target: {
          description: "Target share of the mix, 0 to 1 (0.40 = 40 %). Targets of all languages sum to at most 1.",
          $ref: "#/$defs/share"
        }
      }
    },
    tokenizer: {
      type: "object",
      additionalProperties: false,
      minProperties: 1,
      properties: {
        builtin: {
          description: "An encoding shipped with sluice (from js-tiktoken).",
          enum: ["gpt2", "r50k_base", "p50k_base", "cl100k_base", "o200k_base"]
        },
        file: {
          description: "A tokenizer file relative to root: a Hugging Face `tokenizer.json`, or tiktoken ranks (`.tiktoken`: base64 token and rank per line).",
          type: "string",
          minLength: 1
        },
        format: {
          description: "Format of `file`. Default: from the file name (`.json` \u2192 tokenizer.json, `.tiktoken` \u2192 tiktoken).",
          enum: ["tokenizer.json", "tiktoken"]
        },
        pattern: {
          description: "For tiktoken rank files, which carry no pre-tokenization pattern: the builtin whose pattern to use (e.g. `cl100k_base`), or a JavaScript regular expression (Unicode mode).",
          type: "string",
          minLength: 1
        }
      },
      dependentRequired: {
        format: ["file"],
        pattern: ["file"]
      },
      dependentSchemas: {
        builtin: { properties: { file: false } }
      }
    }
  }
};

// src/policy/policy-validator.generated.ts
import runtime_ucs2length from "ajv/dist/runtime/ucs2length.js";
import runtime_equal from "ajv/dist/runtime/equal.js";
var pick = (m) => typeof m === "function" ? m : m.default;
var validate = validate20;
var schema31 = { "$schema": "https://json-schema.org/draft/2020-12/schema", "title": "sluice policy", "description": "What a corpus must satisfy to merge: where its shards are, which languages it holds, and the rules a pull request is judged by. Keys are kebab-case.", "type": "object", "additionalProperties": false, "required": ["version", "corpus", "languages"], "properties": { "version": { "description": "Policy format version. This sluice reads version 1; a higher number means the policy was written for a newer sluice.", "type": "integer", "const": 1 }, "name": { "description": "Name shown in reports. Default: the policy file name without its extension.", "type": "string", "minLength": 1 }, "root": { "description": "Directory all globs and files are relative to, itself relative to the policy file's directory. Default: the nearest directory above the policy file that holds a `.git` entry, else the policy file's directory.", "type": "string", "minLength": 1 }, "corpus": { "description": "Where the shards are and how to read them.", "type": "object", "additionalProperties": false, "required": ["include"], "properties": { "include": { "description": "Glob or list of globs (relative to root) matching the shards: .jsonl, .txt, optionally .gz or .zst compressed.", "type": ["string", "array"], "minLength": 1, "minItems": 1, "items": { "type": "string", "minLength": 1 }, "examples": [["data/**/*.jsonl.gz"]] }, "exclude": { "description": "Glob or list of globs (relative to root) of files to leave out even when `include` matches them.", "type": ["string", "array"], "minLength": 1, "items": { "type": "string", "minLength": 1 }, "default": [] }, "text": { "description": "Dot path of the text field in JSONL records, e.g. `text` or `meta.body`.", "type": "string", "minLength": 1, "default": "text" }, "declared-language": { "description": "Dot path of a field in JSONL records that declares the document's language, when the shards carry one; it is compared with the detected language.", "type": "string", "minLength": 1 }, "subset": { "description": "Pattern with exactly one `{subset}` placeholder that names a shard's subset from its path, e.g. `data/{subset}/**`.", "type": "string", "minLength": 1, "examples": ["data/{subset}/**"] }, "encodings": { "description": "Shards not in UTF-8: glob (relative to root) \u2192 encoding name as iconv-lite knows it (e.g. `windows-1256`). A shard that matches several globs takes the first, in the order written.", "type": "object", "additionalProperties": { "type": "string", "minLength": 1 }, "default": {} }, "max-line-bytes": { "description": "Lines longer than this many bytes (after decompression) are rejected without being buffered. Default 8 MiB.", "type": "integer", "minimum": 1, "default": 8388608 } } }, "languages": { "description": "The languages the corpus is meant to hold, keyed by ISO 639-1 (`hi`), ISO 639-3 (`hin`) or BCP 47 (`hi-IN`, `sr-Latn`) codes. `other` and `und` are reserved for text in unlisted languages and text too short to label.", "type": "object", "minProperties": 1, "additionalProperties": { "$ref": "#/$defs/language" }, "examples": [{ "hin": { "scripts": ["Devanagari"], "target": 0.4 }, "eng": { "scripts": ["Latin"], "target": 0.6 } }] }, "detection": { "description": "Language identification settings.", "type": "object", "additionalProperties": false, "properties": { "min-chars": { "description": "Texts with fewer letters than this are labelled `und` (too short to judge). Default 20.", "type": "integer", "minimum": 0, "default": 20 } } }, "tokenizer": { "$ref": "#/$defs/tokenizer", "description": "The model's tokenizer: token counts for the mix and fertility are measured with it. Either `builtin` or `file`." }, "baseline": { "$ref": "#/$defs/tokenizer", "description": "A second tokenizer to compare fertility against (e.g. the one in use before a vocabulary change). Either `builtin` or `file`." }, "sampling": { "description": "Judge a deterministic sample of documents (picked by document hash) instead of all of them. Either `docs-per-shard` or `fraction`.", "type": "object", "additionalProperties": false, "minProperties": 1, "properties": { "docs-per-shard": { "description": "At most this many documents from each shard.", "type": "integer", "minimum": 1 }, "fraction": { "description": "This share of each shard's documents, in (0, 1].", "type": "number", "exclusiveMinimum": 0, "maximum": 1 } }, "dependentSchemas": { "docs-per-shard": { "properties": { "fraction": false } } } }, "rules": { "description": "What the corpus is judged by. `input` is always judged; the other rules only when listed.", "type": "object", "additionalProperties": false, "properties": { "input": { "description": "Input that could not be read: rejected lines and broken shards. Always judged, because a report over broken shards is incomplete.", "type": "object", "additionalProperties": false, "properties": { "max-rejected": { "description": "Highest share of input lines that may be rejected (invalid JSON, bad encoding, missing text field, ...). No limit when absent; rejections are still counted and reported.", "$ref": "#/$defs/share" }, "max-broken-shards": { "description": "How many shards may be unreadable or broken (corrupt or truncated compression). Default 0.", "type": "integer", "minimum": 0, "default": 0 } } }, "mix": { "description": "Each language's share of the corpus against its `target`. Needs at least one language with a `target`.", "type": "object", "additionalProperties": false, "properties": { "unit": { "description": "What a share is counted in. Default `tokens` when a tokenizer is set, else `words` (UAX #29 word boundaries).", "enum": ["docs", "bytes", "chars", "words", "tokens"] }, "tolerance": { "description": "Allowed absolute distance between a language's share and its target (0.03 = 3 points). Default 0.03.", "$ref": "#/$defs/share", "default": 0.03 }, "max-other": { "description": "Highest share of text in languages the policy does not list (`other`).", "$ref": "#/$defs/share" }, "max-und": { "description": "Highest share of text too short or unclear to label (`und`).", "$ref": "#/$defs/share" } } }, "script": { "description": "Script purity: the share of a document's letters that are in its language's own scripts.", "type": "object", "additionalProperties": false, "properties": { "min-purity": { "description": "A document whose purity is below this is impure. Default 0.9.", "$ref": "#/$defs/share", "default": 0.9 }, "max-impure-docs": { "description": "Highest share of impure documents, per language. Default 0.02.", "$ref": "#/$defs/share", "default": 0.02 } } }, "encoding": { "description": "Encoding anomalies in the text: replacement characters, control characters, bidirectional controls, zero-width characters, private-use characters, mojibake.", "type": "object", "additionalProperties": false, "properties": { "max-anomalous-docs": { "description": "Highest share of documents with any forbidden anomaly. Default 0.", "$ref": "#/$defs/share", "default": 0 }, "forbid": { "description": "Anomaly kinds that make a document anomalous. Default: replacement-char, control-chars, bidi-controls, mojibake. `zero-width` is not in the default because joiners are part of correct spelling in several scripts.", "type": "array", "uniqueItems": true, "items": { "enum": ["replacement-char", "control-chars", "bidi-controls", "zero-width", "private-use", "mojibake"] }, "default": ["replacement-char", "control-chars", "bidi-controls", "mojibake"] } } }, "fertility": { "description": "Tokenizer fertility (subword tokens per word) and the share of continued words (words split into two or more tokens), per language. Needs `tokenizer`.", "type": "object", "additionalProperties": false, "properties": { "max": { "description": "Per language key (as written under `languages`): highest running-text fertility.", "type": "object", "additionalProperties": { "type": "number", "exclusiveMinimum": 0 }, "default": {} }, "max-regression": { "description": "Highest relative rise of fertility against the base branch or the baseline tokenizer (0.03 = 3 %).", "type": "number", "minimum": 0 }, "max-continued": { "description": "Per language key: highest share of continued words.", "type": "object", "additionalProperties": { "$ref": "#/$defs/share" }, "default": {} }, "word-lists": { "description": "Per language key: a word list (one entry a line, or a hunspell .dic), relative to root, for dictionary fertility.", "type": "object", "additionalProperties": { "type": "string", "minLength": 1 }, "default": {} } } }, "duplicates": { "description": "Exact duplicates (hash of normalized text) and near duplicates (MinHash estimate of the Jaccard similarity of word shingles).", "type": "object", "additionalProperties": false, "properties": { "max-exact": { "description": "Highest share of documents that exactly repeat an earlier one.", "$ref": "#/$defs/share" }, "near": { "description": "Near-duplicate detection settings.", "type": "object", "additionalProperties": false, "properties": { "threshold": { "description": "Estimated Jaccard similarity at or above which two documents are near duplicates, in (0, 1). Default 0.8.", "type": "number", "exclusiveMinimum": 0, "exclusiveMaximum": 1, "default": 0.8 }, "max": { "description": "Highest share of documents that nearly repeat another.", "$ref": "#/$defs/share" }, "shingle": { "description": "Words per shingle. Default 5.", "type": "integer", "minimum": 1, "default": 5 }, "hashes": { "description": "MinHash functions per document, 16 to 1024. Default 128. The estimate's standard error is sqrt(J(1-J)/k) for k hashes: below 16 it is too coarse to judge a threshold (common practice), and above 1024 the cost grows with little gain.", "type": "integer", "minimum": 16, "maximum": 1024, "default": 128 } } }, "punctuation": { "description": "Exact-duplicate normalization: keep punctuation (default) or strip it before hashing.", "enum": ["keep", "strip"], "default": "keep" } } }, "contamination": { "description": "Training documents that contain text of an evaluation item (n-gram overlap).", "type": "object", "additionalProperties": false, "required": ["eval"], "properties": { "eval": { "description": "Glob or list of globs (relative to root) matching the evaluation sets (.jsonl or .txt).", "type": ["string", "array"], "minLength": 1, "minItems": 1, "items": { "type": "string", "minLength": 1 } }, "ngram": { "description": "Words per n-gram; a document sharing any n-gram with an evaluation item is contaminated. Default 13, the length used for the overlap test in Brown et al. (2020).", "type": "integer", "minimum": 1, "default": 13 }, "max-docs": { "description": "Highest number of contaminated documents. Default 0.", "type": "integer", "minimum": 0, "default": 0 } } } } }, "severity": { "description": "Per rule: `error` blocks the merge, `warn` only reports. A rule not listed is `error`.", "type": "object", "additionalProperties": false, "properties": { "input": { "$ref": "#/$defs/severity" }, "mix": { "$ref": "#/$defs/severity" }, "script": { "$ref": "#/$defs/severity" }, "encoding": { "$ref": "#/$defs/severity" }, "fertility": { "$ref": "#/$defs/severity" }, "duplicates": { "$ref": "#/$defs/severity" }, "contamination": { "$ref": "#/$defs/severity" } } } }, "$defs": { "share": { "description": "A share, from 0 to 1 (0.02 = 2 %).", "type": "number", "minimum": 0, "maximum": 1 }, "severity": { "description": "`error` blocks the merge; `warn` only reports.", "enum": ["error", "warn"], "default": "error" }, "language": { "description": "One language of the corpus. An entry with nothing after the colon takes the defaults.", "type": ["object", "null"], "additionalProperties": false, "properties": { "scripts": { "description": "Unicode scripts that count as this language's own, as Script property names (`Devanagari`) or ISO 15924 codes (`Deva`). Optional for common languages and for BCP 47 keys with a script subtag (`sr-Latn`).", "type": "array", "minItems": 1, "uniqueItems": true, "items": { "type": "string", "minLength": 1 }, "examples": [["Devanagari"], ["Han", "Hiragana", "Katakana"]] }, "target": { "description": "Target share of the mix, 0 to 1 (0.40 = 40 %). Targets of all languages sum to at most 1.", "$ref": "#/$defs/share" } } }, "tokenizer": { "type": "object", "additionalProperties": false, "minProperties": 1, "properties": { "builtin": { "description": "An encoding shipped with sluice (from js-tiktoken).", "enum": ["gpt2", "r50k_base", "p50k_base", "cl100k_base", "o200k_base"] }, "file": { "description": "A tokenizer file relative to root: a Hugging Face `tokenizer.json`, or tiktoken ranks (`.tiktoken`: base64 token and rank per line).", "type": "string", "minLength": 1 }, "format": { "description": "Format of `file`. Default: from the file name (`.json` \u2192 tokenizer.json, `.tiktoken` \u2192 tiktoken).", "enum": ["tokenizer.json", "tiktoken"] }, "pattern": { "description": "For tiktoken rank files, which carry no pre-tokenization pattern: the builtin whose pattern to use (e.g. `cl100k_base`), or a JavaScript regular expression (Unicode mode).", "type": "string", "minLength": 1 } }, "dependentRequired": { "format": ["file"], "pattern": ["file"] }, "dependentSchemas": { "builtin": { "properties": { "file": false } } } } } };
var schema34 = { "type": "object", "additionalProperties": false, "minProperties": 1, "properties": { "builtin": { "description": "An encoding shipped with sluice (from js-tiktoken).", "enum": ["gpt2", "r50k_base", "p50k_base", "cl100k_base", "o200k_base"] }, "file": { "description": "A tokenizer file relative to root: a Hugging Face `tokenizer.json`, or tiktoken ranks (`.tiktoken`: base64 token and rank per line).", "type": "string", "minLength": 1 }, "format": { "description": "Format of `file`. Default: from the file name (`.json` \u2192 tokenizer.json, `.tiktoken` \u2192 tiktoken).", "enum": ["tokenizer.json", "tiktoken"] }, "pattern": { "description": "For tiktoken rank files, which carry no pre-tokenization pattern: the builtin whose pattern to use (e.g. `cl100k_base`), or a JavaScript regular expression (Unicode mode).", "type": "string", "minLength": 1 } }, "dependentRequired": { "format": ["file"], "pattern": ["file"] }, "dependentSchemas": { "builtin": { "properties": { "file": false } } } };
var schema33 = { "description": "A share, from 0 to 1 (0.02 = 2 %).", "type": "number", "minimum": 0, "maximum": 1 };
var schema46 = { "description": "`error` blocks the merge; `warn` only reports.", "enum": ["error", "warn"], "default": "error" };
var func1 = Object.prototype.hasOwnProperty;
var func2 = pick(runtime_ucs2length);
var func0 = pick(runtime_equal);
var schema32 = { "description": "One language of the corpus. An entry with nothing after the colon takes the defaults.", "type": ["object", "null"], "additionalProperties": false, "properties": { "scripts": { "description": "Unicode scripts that count as this language's own, as Script property names (`Devanagari`) or ISO 15924 codes (`Deva`). Optional for common languages and for BCP 47 keys with a script subtag (`sr-Latn`).", "type": "array", "minItems": 1, "uniqueItems": true, "items": { "type": "string", "minLength": 1 }, "examples": [["Devanagari"], ["Han", "Hiragana", "Katakana"]] }, "target": { "description": "Target share of the mix, 0 to 1 (0.40 = 40 %). Targets of all languages sum to at most 1.", "$ref": "#/$defs/share" } } };
function validate21(data2, { instancePath = "", parentData, parentDataProperty, rootData = data2, dynamicAnchors = {} } = {}) {
  let vErrors = null;
  let errors = 0;
  const evaluated0 = validate21.evaluated;
  if (evaluated0.dynamicProps) {
    evaluated0.props = void 0;
  }
  if (evaluated0.dynamicItems) {
    evaluated0.items = void 0;
  }
  if (!(data2 && typeof data2 == "object" && !Array.isArray(data2)) && data2 !== null) {
    const err0 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: schema32.type }, message: "must be object,null", schema: schema32.type, parentSchema: schema32, data: data2 };
    if (vErrors === null) {
      vErrors = [err0];
    } else {
      vErrors.push(err0);
    }
    errors++;
  }
  if (data2 && typeof data2 == "object" && !Array.isArray(data2)) {
    for (const key0 in data2) {
      if (!(key0 === "scripts" || key0 === "target")) {
        const err1 = { instancePath, schemaPath: "#/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema32, data: data2 };
        if (vErrors === null) {
          vErrors = [err1];
        } else {
          vErrors.push(err1);
        }
        errors++;
      }
    }
    if (data2.scripts !== void 0) {
      let data0 = data2.scripts;
      if (Array.isArray(data0)) {
        if (data0.length < 1) {
          const err2 = { instancePath: instancePath + "/scripts", schemaPath: "#/properties/scripts/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema32.properties.scripts, data: data0 };
          if (vErrors === null) {
            vErrors = [err2];
          } else {
            vErrors.push(err2);
          }
          errors++;
        }
        const len0 = data0.length;
        for (let i0 = 0; i0 < len0; i0++) {
          let data1 = data0[i0];
          if (typeof data1 === "string") {
            if (func2(data1) < 1) {
              const err3 = { instancePath: instancePath + "/scripts/" + i0, schemaPath: "#/properties/scripts/items/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema32.properties.scripts.items, data: data1 };
              if (vErrors === null) {
                vErrors = [err3];
              } else {
                vErrors.push(err3);
              }
              errors++;
            }
          } else {
            const err4 = { instancePath: instancePath + "/scripts/" + i0, schemaPath: "#/properties/scripts/items/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema32.properties.scripts.items.type, parentSchema: schema32.properties.scripts.items, data: data1 };
            if (vErrors === null) {
              vErrors = [err4];
            } else {
              vErrors.push(err4);
            }
            errors++;
          }
        }
        let i1 = data0.length;
        let j0;
        if (i1 > 1) {
          const indices0 = {};
          for (; i1--; ) {
            let item0 = data0[i1];
            if (typeof item0 !== "string") {
              continue;
            }
            if (typeof indices0[item0] == "number") {
              j0 = indices0[item0];
              const err5 = { instancePath: instancePath + "/scripts", schemaPath: "#/properties/scripts/uniqueItems", keyword: "uniqueItems", params: { i: i1, j: j0 }, message: "must NOT have duplicate items (items ## " + j0 + " and " + i1 + " are identical)", schema: true, parentSchema: schema32.properties.scripts, data: data0 };
              if (vErrors === null) {
                vErrors = [err5];
              } else {
                vErrors.push(err5);
              }
              errors++;
              break;
            }
            indices0[item0] = i1;
          }
        }
      } else {
        const err6 = { instancePath: instancePath + "/scripts", schemaPath: "#/properties/scripts/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema32.properties.scripts.type, parentSchema: schema32.properties.scripts, data: data0 };
        if (vErrors === null) {
          vErrors = [err6];
        } else {
          vErrors.push(err6);
        }
        errors++;
      }
    }
    if (data2.target !== void 0) {
      let data22 = data2.target;
      if (typeof data22 == "number" && isFinite(data22)) {
        if (data22 > 1 || isNaN(data22)) {
          const err7 = { instancePath: instancePath + "/target", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data22 };
          if (vErrors === null) {
            vErrors = [err7];
          } else {
            vErrors.push(err7);
          }
          errors++;
        }
        if (data22 < 0 || isNaN(data22)) {
          const err8 = { instancePath: instancePath + "/target", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data22 };
          if (vErrors === null) {
            vErrors = [err8];
          } else {
            vErrors.push(err8);
          }
          errors++;
        }
      } else {
        const err9 = { instancePath: instancePath + "/target", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data22 };
        if (vErrors === null) {
          vErrors = [err9];
        } else {
          vErrors.push(err9);
        }
        errors++;
      }
    }
  }
  validate21.errors = vErrors;
  return errors === 0;
}
validate21.evaluated = { "props": true, "dynamicProps": false, "dynamicItems": false };
function validate20(data2, { instancePath = "", parentData, parentDataProperty, rootData = data2, dynamicAnchors = {} } = {}) {
  let vErrors = null;
  let errors = 0;
  const evaluated0 = validate20.evaluated;
  if (evaluated0.dynamicProps) {
    evaluated0.props = void 0;
  }
  if (evaluated0.dynamicItems) {
    evaluated0.items = void 0;
  }
  if (data2 && typeof data2 == "object" && !Array.isArray(data2)) {
    if (data2.version === void 0) {
      const err0 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "version" }, message: "must have required property 'version'", schema: schema31.required, parentSchema: schema31, data: data2 };
      if (vErrors === null) {
        vErrors = [err0];
      } else {
        vErrors.push(err0);
      }
      errors++;
    }
    if (data2.corpus === void 0) {
      const err1 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "corpus" }, message: "must have required property 'corpus'", schema: schema31.required, parentSchema: schema31, data: data2 };
      if (vErrors === null) {
        vErrors = [err1];
      } else {
        vErrors.push(err1);
      }
      errors++;
    }
    if (data2.languages === void 0) {
      const err2 = { instancePath, schemaPath: "#/required", keyword: "required", params: { missingProperty: "languages" }, message: "must have required property 'languages'", schema: schema31.required, parentSchema: schema31, data: data2 };
      if (vErrors === null) {
        vErrors = [err2];
      } else {
        vErrors.push(err2);
      }
      errors++;
    }
    for (const key0 in data2) {
      if (!func1.call(schema31.properties, key0)) {
        const err3 = { instancePath, schemaPath: "#/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key0 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31, data: data2 };
        if (vErrors === null) {
          vErrors = [err3];
        } else {
          vErrors.push(err3);
        }
        errors++;
      }
    }
    if (data2.version !== void 0) {
      let data0 = data2.version;
      if (!(typeof data0 == "number" && (!(data0 % 1) && !isNaN(data0)) && isFinite(data0))) {
        const err4 = { instancePath: instancePath + "/version", schemaPath: "#/properties/version/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.version.type, parentSchema: schema31.properties.version, data: data0 };
        if (vErrors === null) {
          vErrors = [err4];
        } else {
          vErrors.push(err4);
        }
        errors++;
      }
      if (1 !== data0) {
        const err5 = { instancePath: instancePath + "/version", schemaPath: "#/properties/version/const", keyword: "const", params: { allowedValue: 1 }, message: "must be equal to constant", schema: 1, parentSchema: schema31.properties.version, data: data0 };
        if (vErrors === null) {
          vErrors = [err5];
        } else {
          vErrors.push(err5);
        }
        errors++;
      }
    }
    if (data2.name !== void 0) {
      let data1 = data2.name;
      if (typeof data1 === "string") {
        if (func2(data1) < 1) {
          const err6 = { instancePath: instancePath + "/name", schemaPath: "#/properties/name/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.name, data: data1 };
          if (vErrors === null) {
            vErrors = [err6];
          } else {
            vErrors.push(err6);
          }
          errors++;
        }
      } else {
        const err7 = { instancePath: instancePath + "/name", schemaPath: "#/properties/name/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.name.type, parentSchema: schema31.properties.name, data: data1 };
        if (vErrors === null) {
          vErrors = [err7];
        } else {
          vErrors.push(err7);
        }
        errors++;
      }
    }
    if (data2.root !== void 0) {
      let data22 = data2.root;
      if (typeof data22 === "string") {
        if (func2(data22) < 1) {
          const err8 = { instancePath: instancePath + "/root", schemaPath: "#/properties/root/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.root, data: data22 };
          if (vErrors === null) {
            vErrors = [err8];
          } else {
            vErrors.push(err8);
          }
          errors++;
        }
      } else {
        const err9 = { instancePath: instancePath + "/root", schemaPath: "#/properties/root/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.root.type, parentSchema: schema31.properties.root, data: data22 };
        if (vErrors === null) {
          vErrors = [err9];
        } else {
          vErrors.push(err9);
        }
        errors++;
      }
    }
    if (data2.corpus !== void 0) {
      let data3 = data2.corpus;
      if (data3 && typeof data3 == "object" && !Array.isArray(data3)) {
        if (data3.include === void 0) {
          const err10 = { instancePath: instancePath + "/corpus", schemaPath: "#/properties/corpus/required", keyword: "required", params: { missingProperty: "include" }, message: "must have required property 'include'", schema: schema31.properties.corpus.required, parentSchema: schema31.properties.corpus, data: data3 };
          if (vErrors === null) {
            vErrors = [err10];
          } else {
            vErrors.push(err10);
          }
          errors++;
        }
        for (const key1 in data3) {
          if (!(key1 === "include" || key1 === "exclude" || key1 === "text" || key1 === "declared-language" || key1 === "subset" || key1 === "encodings" || key1 === "max-line-bytes")) {
            const err11 = { instancePath: instancePath + "/corpus", schemaPath: "#/properties/corpus/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key1 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.corpus, data: data3 };
            if (vErrors === null) {
              vErrors = [err11];
            } else {
              vErrors.push(err11);
            }
            errors++;
          }
        }
        if (data3.include !== void 0) {
          let data4 = data3.include;
          if (typeof data4 !== "string" && !Array.isArray(data4)) {
            const err12 = { instancePath: instancePath + "/corpus/include", schemaPath: "#/properties/corpus/properties/include/type", keyword: "type", params: { type: schema31.properties.corpus.properties.include.type }, message: "must be string,array", schema: schema31.properties.corpus.properties.include.type, parentSchema: schema31.properties.corpus.properties.include, data: data4 };
            if (vErrors === null) {
              vErrors = [err12];
            } else {
              vErrors.push(err12);
            }
            errors++;
          }
          if (typeof data4 === "string") {
            if (func2(data4) < 1) {
              const err13 = { instancePath: instancePath + "/corpus/include", schemaPath: "#/properties/corpus/properties/include/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.include, data: data4 };
              if (vErrors === null) {
                vErrors = [err13];
              } else {
                vErrors.push(err13);
              }
              errors++;
            }
          }
          if (Array.isArray(data4)) {
            if (data4.length < 1) {
              const err14 = { instancePath: instancePath + "/corpus/include", schemaPath: "#/properties/corpus/properties/include/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema31.properties.corpus.properties.include, data: data4 };
              if (vErrors === null) {
                vErrors = [err14];
              } else {
                vErrors.push(err14);
              }
              errors++;
            }
            const len0 = data4.length;
            for (let i0 = 0; i0 < len0; i0++) {
              let data5 = data4[i0];
              if (typeof data5 === "string") {
                if (func2(data5) < 1) {
                  const err15 = { instancePath: instancePath + "/corpus/include/" + i0, schemaPath: "#/properties/corpus/properties/include/items/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.include.items, data: data5 };
                  if (vErrors === null) {
                    vErrors = [err15];
                  } else {
                    vErrors.push(err15);
                  }
                  errors++;
                }
              } else {
                const err16 = { instancePath: instancePath + "/corpus/include/" + i0, schemaPath: "#/properties/corpus/properties/include/items/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.corpus.properties.include.items.type, parentSchema: schema31.properties.corpus.properties.include.items, data: data5 };
                if (vErrors === null) {
                  vErrors = [err16];
                } else {
                  vErrors.push(err16);
                }
                errors++;
              }
            }
          }
        }
        if (data3.exclude !== void 0) {
          let data6 = data3.exclude;
          if (typeof data6 !== "string" && !Array.isArray(data6)) {
            const err17 = { instancePath: instancePath + "/corpus/exclude", schemaPath: "#/properties/corpus/properties/exclude/type", keyword: "type", params: { type: schema31.properties.corpus.properties.exclude.type }, message: "must be string,array", schema: schema31.properties.corpus.properties.exclude.type, parentSchema: schema31.properties.corpus.properties.exclude, data: data6 };
            if (vErrors === null) {
              vErrors = [err17];
            } else {
              vErrors.push(err17);
            }
            errors++;
          }
          if (typeof data6 === "string") {
            if (func2(data6) < 1) {
              const err18 = { instancePath: instancePath + "/corpus/exclude", schemaPath: "#/properties/corpus/properties/exclude/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.exclude, data: data6 };
              if (vErrors === null) {
                vErrors = [err18];
              } else {
                vErrors.push(err18);
              }
              errors++;
            }
          }
          if (Array.isArray(data6)) {
            const len1 = data6.length;
            for (let i1 = 0; i1 < len1; i1++) {
              let data7 = data6[i1];
              if (typeof data7 === "string") {
                if (func2(data7) < 1) {
                  const err19 = { instancePath: instancePath + "/corpus/exclude/" + i1, schemaPath: "#/properties/corpus/properties/exclude/items/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.exclude.items, data: data7 };
                  if (vErrors === null) {
                    vErrors = [err19];
                  } else {
                    vErrors.push(err19);
                  }
                  errors++;
                }
              } else {
                const err20 = { instancePath: instancePath + "/corpus/exclude/" + i1, schemaPath: "#/properties/corpus/properties/exclude/items/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.corpus.properties.exclude.items.type, parentSchema: schema31.properties.corpus.properties.exclude.items, data: data7 };
                if (vErrors === null) {
                  vErrors = [err20];
                } else {
                  vErrors.push(err20);
                }
                errors++;
              }
            }
          }
        }
        if (data3.text !== void 0) {
          let data8 = data3.text;
          if (typeof data8 === "string") {
            if (func2(data8) < 1) {
              const err21 = { instancePath: instancePath + "/corpus/text", schemaPath: "#/properties/corpus/properties/text/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.text, data: data8 };
              if (vErrors === null) {
                vErrors = [err21];
              } else {
                vErrors.push(err21);
              }
              errors++;
            }
          } else {
            const err22 = { instancePath: instancePath + "/corpus/text", schemaPath: "#/properties/corpus/properties/text/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.corpus.properties.text.type, parentSchema: schema31.properties.corpus.properties.text, data: data8 };
            if (vErrors === null) {
              vErrors = [err22];
            } else {
              vErrors.push(err22);
            }
            errors++;
          }
        }
        if (data3["declared-language"] !== void 0) {
          let data9 = data3["declared-language"];
          if (typeof data9 === "string") {
            if (func2(data9) < 1) {
              const err23 = { instancePath: instancePath + "/corpus/declared-language", schemaPath: "#/properties/corpus/properties/declared-language/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties["declared-language"], data: data9 };
              if (vErrors === null) {
                vErrors = [err23];
              } else {
                vErrors.push(err23);
              }
              errors++;
            }
          } else {
            const err24 = { instancePath: instancePath + "/corpus/declared-language", schemaPath: "#/properties/corpus/properties/declared-language/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.corpus.properties["declared-language"].type, parentSchema: schema31.properties.corpus.properties["declared-language"], data: data9 };
            if (vErrors === null) {
              vErrors = [err24];
            } else {
              vErrors.push(err24);
            }
            errors++;
          }
        }
        if (data3.subset !== void 0) {
          let data10 = data3.subset;
          if (typeof data10 === "string") {
            if (func2(data10) < 1) {
              const err25 = { instancePath: instancePath + "/corpus/subset", schemaPath: "#/properties/corpus/properties/subset/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.subset, data: data10 };
              if (vErrors === null) {
                vErrors = [err25];
              } else {
                vErrors.push(err25);
              }
              errors++;
            }
          } else {
            const err26 = { instancePath: instancePath + "/corpus/subset", schemaPath: "#/properties/corpus/properties/subset/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.corpus.properties.subset.type, parentSchema: schema31.properties.corpus.properties.subset, data: data10 };
            if (vErrors === null) {
              vErrors = [err26];
            } else {
              vErrors.push(err26);
            }
            errors++;
          }
        }
        if (data3.encodings !== void 0) {
          let data11 = data3.encodings;
          if (data11 && typeof data11 == "object" && !Array.isArray(data11)) {
            for (const key2 in data11) {
              let data12 = data11[key2];
              if (typeof data12 === "string") {
                if (func2(data12) < 1) {
                  const err27 = { instancePath: instancePath + "/corpus/encodings/" + key2.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/properties/corpus/properties/encodings/additionalProperties/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.corpus.properties.encodings.additionalProperties, data: data12 };
                  if (vErrors === null) {
                    vErrors = [err27];
                  } else {
                    vErrors.push(err27);
                  }
                  errors++;
                }
              } else {
                const err28 = { instancePath: instancePath + "/corpus/encodings/" + key2.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/properties/corpus/properties/encodings/additionalProperties/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.corpus.properties.encodings.additionalProperties.type, parentSchema: schema31.properties.corpus.properties.encodings.additionalProperties, data: data12 };
                if (vErrors === null) {
                  vErrors = [err28];
                } else {
                  vErrors.push(err28);
                }
                errors++;
              }
            }
          } else {
            const err29 = { instancePath: instancePath + "/corpus/encodings", schemaPath: "#/properties/corpus/properties/encodings/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.corpus.properties.encodings.type, parentSchema: schema31.properties.corpus.properties.encodings, data: data11 };
            if (vErrors === null) {
              vErrors = [err29];
            } else {
              vErrors.push(err29);
            }
            errors++;
          }
        }
        if (data3["max-line-bytes"] !== void 0) {
          let data13 = data3["max-line-bytes"];
          if (!(typeof data13 == "number" && (!(data13 % 1) && !isNaN(data13)) && isFinite(data13))) {
            const err30 = { instancePath: instancePath + "/corpus/max-line-bytes", schemaPath: "#/properties/corpus/properties/max-line-bytes/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.corpus.properties["max-line-bytes"].type, parentSchema: schema31.properties.corpus.properties["max-line-bytes"], data: data13 };
            if (vErrors === null) {
              vErrors = [err30];
            } else {
              vErrors.push(err30);
            }
            errors++;
          }
          if (typeof data13 == "number" && isFinite(data13)) {
            if (data13 < 1 || isNaN(data13)) {
              const err31 = { instancePath: instancePath + "/corpus/max-line-bytes", schemaPath: "#/properties/corpus/properties/max-line-bytes/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema31.properties.corpus.properties["max-line-bytes"], data: data13 };
              if (vErrors === null) {
                vErrors = [err31];
              } else {
                vErrors.push(err31);
              }
              errors++;
            }
          }
        }
      } else {
        const err32 = { instancePath: instancePath + "/corpus", schemaPath: "#/properties/corpus/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.corpus.type, parentSchema: schema31.properties.corpus, data: data3 };
        if (vErrors === null) {
          vErrors = [err32];
        } else {
          vErrors.push(err32);
        }
        errors++;
      }
    }
    if (data2.languages !== void 0) {
      let data14 = data2.languages;
      if (data14 && typeof data14 == "object" && !Array.isArray(data14)) {
        if (Object.keys(data14).length < 1) {
          const err33 = { instancePath: instancePath + "/languages", schemaPath: "#/properties/languages/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema31.properties.languages, data: data14 };
          if (vErrors === null) {
            vErrors = [err33];
          } else {
            vErrors.push(err33);
          }
          errors++;
        }
        for (const key3 in data14) {
          if (!validate21(data14[key3], { instancePath: instancePath + "/languages/" + key3.replace(/~/g, "~0").replace(/\//g, "~1"), parentData: data14, parentDataProperty: key3, rootData, dynamicAnchors })) {
            vErrors = vErrors === null ? validate21.errors : vErrors.concat(validate21.errors);
            errors = vErrors.length;
          }
        }
      } else {
        const err34 = { instancePath: instancePath + "/languages", schemaPath: "#/properties/languages/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.languages.type, parentSchema: schema31.properties.languages, data: data14 };
        if (vErrors === null) {
          vErrors = [err34];
        } else {
          vErrors.push(err34);
        }
        errors++;
      }
    }
    if (data2.detection !== void 0) {
      let data16 = data2.detection;
      if (data16 && typeof data16 == "object" && !Array.isArray(data16)) {
        for (const key4 in data16) {
          if (!(key4 === "min-chars")) {
            const err35 = { instancePath: instancePath + "/detection", schemaPath: "#/properties/detection/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key4 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.detection, data: data16 };
            if (vErrors === null) {
              vErrors = [err35];
            } else {
              vErrors.push(err35);
            }
            errors++;
          }
        }
        if (data16["min-chars"] !== void 0) {
          let data17 = data16["min-chars"];
          if (!(typeof data17 == "number" && (!(data17 % 1) && !isNaN(data17)) && isFinite(data17))) {
            const err36 = { instancePath: instancePath + "/detection/min-chars", schemaPath: "#/properties/detection/properties/min-chars/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.detection.properties["min-chars"].type, parentSchema: schema31.properties.detection.properties["min-chars"], data: data17 };
            if (vErrors === null) {
              vErrors = [err36];
            } else {
              vErrors.push(err36);
            }
            errors++;
          }
          if (typeof data17 == "number" && isFinite(data17)) {
            if (data17 < 0 || isNaN(data17)) {
              const err37 = { instancePath: instancePath + "/detection/min-chars", schemaPath: "#/properties/detection/properties/min-chars/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema31.properties.detection.properties["min-chars"], data: data17 };
              if (vErrors === null) {
                vErrors = [err37];
              } else {
                vErrors.push(err37);
              }
              errors++;
            }
          }
        }
      } else {
        const err38 = { instancePath: instancePath + "/detection", schemaPath: "#/properties/detection/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.detection.type, parentSchema: schema31.properties.detection, data: data16 };
        if (vErrors === null) {
          vErrors = [err38];
        } else {
          vErrors.push(err38);
        }
        errors++;
      }
    }
    if (data2.tokenizer !== void 0) {
      let data18 = data2.tokenizer;
      if (data18 && typeof data18 == "object" && !Array.isArray(data18)) {
        if (Object.keys(data18).length < 1) {
          const err39 = { instancePath: instancePath + "/tokenizer", schemaPath: "#/$defs/tokenizer/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema34, data: data18 };
          if (vErrors === null) {
            vErrors = [err39];
          } else {
            vErrors.push(err39);
          }
          errors++;
        }
        for (const key5 in data18) {
          if (!(key5 === "builtin" || key5 === "file" || key5 === "format" || key5 === "pattern")) {
            const err40 = { instancePath: instancePath + "/tokenizer", schemaPath: "#/$defs/tokenizer/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key5 }, message: "must NOT have additional properties", schema: false, parentSchema: schema34, data: data18 };
            if (vErrors === null) {
              vErrors = [err40];
            } else {
              vErrors.push(err40);
            }
            errors++;
          }
        }
        if (data18.builtin !== void 0) {
          let data19 = data18.builtin;
          if (!(data19 === "gpt2" || data19 === "r50k_base" || data19 === "p50k_base" || data19 === "cl100k_base" || data19 === "o200k_base")) {
            const err41 = { instancePath: instancePath + "/tokenizer/builtin", schemaPath: "#/$defs/tokenizer/properties/builtin/enum", keyword: "enum", params: { allowedValues: schema34.properties.builtin.enum }, message: "must be equal to one of the allowed values", schema: schema34.properties.builtin.enum, parentSchema: schema34.properties.builtin, data: data19 };
            if (vErrors === null) {
              vErrors = [err41];
            } else {
              vErrors.push(err41);
            }
            errors++;
          }
        }
        if (data18.file !== void 0) {
          let data20 = data18.file;
          if (typeof data20 === "string") {
            if (func2(data20) < 1) {
              const err42 = { instancePath: instancePath + "/tokenizer/file", schemaPath: "#/$defs/tokenizer/properties/file/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema34.properties.file, data: data20 };
              if (vErrors === null) {
                vErrors = [err42];
              } else {
                vErrors.push(err42);
              }
              errors++;
            }
          } else {
            const err43 = { instancePath: instancePath + "/tokenizer/file", schemaPath: "#/$defs/tokenizer/properties/file/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema34.properties.file.type, parentSchema: schema34.properties.file, data: data20 };
            if (vErrors === null) {
              vErrors = [err43];
            } else {
              vErrors.push(err43);
            }
            errors++;
          }
        }
        if (data18.format !== void 0) {
          let data21 = data18.format;
          if (!(data21 === "tokenizer.json" || data21 === "tiktoken")) {
            const err44 = { instancePath: instancePath + "/tokenizer/format", schemaPath: "#/$defs/tokenizer/properties/format/enum", keyword: "enum", params: { allowedValues: schema34.properties.format.enum }, message: "must be equal to one of the allowed values", schema: schema34.properties.format.enum, parentSchema: schema34.properties.format, data: data21 };
            if (vErrors === null) {
              vErrors = [err44];
            } else {
              vErrors.push(err44);
            }
            errors++;
          }
        }
        if (data18.pattern !== void 0) {
          let data22 = data18.pattern;
          if (typeof data22 === "string") {
            if (func2(data22) < 1) {
              const err45 = { instancePath: instancePath + "/tokenizer/pattern", schemaPath: "#/$defs/tokenizer/properties/pattern/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema34.properties.pattern, data: data22 };
              if (vErrors === null) {
                vErrors = [err45];
              } else {
                vErrors.push(err45);
              }
              errors++;
            }
          } else {
            const err46 = { instancePath: instancePath + "/tokenizer/pattern", schemaPath: "#/$defs/tokenizer/properties/pattern/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema34.properties.pattern.type, parentSchema: schema34.properties.pattern, data: data22 };
            if (vErrors === null) {
              vErrors = [err46];
            } else {
              vErrors.push(err46);
            }
            errors++;
          }
        }
        if (data18.format !== void 0) {
          if (data18.file === void 0) {
            const err47 = { instancePath: instancePath + "/tokenizer", schemaPath: "#/$defs/tokenizer/dependentRequired", keyword: "dependentRequired", params: {
              property: "format",
              missingProperty: "file",
              depsCount: 1,
              deps: "file"
            }, message: "must have property file when property format is present", schema: schema34.dependentRequired, parentSchema: schema34, data: data18 };
            if (vErrors === null) {
              vErrors = [err47];
            } else {
              vErrors.push(err47);
            }
            errors++;
          }
        }
        if (data18.pattern !== void 0) {
          if (data18.file === void 0) {
            const err48 = { instancePath: instancePath + "/tokenizer", schemaPath: "#/$defs/tokenizer/dependentRequired", keyword: "dependentRequired", params: {
              property: "pattern",
              missingProperty: "file",
              depsCount: 1,
              deps: "file"
            }, message: "must have property file when property pattern is present", schema: schema34.dependentRequired, parentSchema: schema34, data: data18 };
            if (vErrors === null) {
              vErrors = [err48];
            } else {
              vErrors.push(err48);
            }
            errors++;
          }
        }
        if (data18.builtin !== void 0) {
          if (data18 && typeof data18 == "object" && !Array.isArray(data18)) {
            if (data18.file !== void 0) {
              const err49 = { instancePath: instancePath + "/tokenizer/file", schemaPath: "#/$defs/tokenizer/dependentSchemas/builtin/properties/file/false schema", keyword: "false schema", params: {}, message: "boolean schema is false", schema: false, parentSchema: schema34.dependentSchemas.builtin.properties.file, data: data18.file };
              if (vErrors === null) {
                vErrors = [err49];
              } else {
                vErrors.push(err49);
              }
              errors++;
            }
          }
        }
      } else {
        const err50 = { instancePath: instancePath + "/tokenizer", schemaPath: "#/$defs/tokenizer/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema34.type, parentSchema: schema34, data: data18 };
        if (vErrors === null) {
          vErrors = [err50];
        } else {
          vErrors.push(err50);
        }
        errors++;
      }
    }
    if (data2.baseline !== void 0) {
      let data24 = data2.baseline;
      if (data24 && typeof data24 == "object" && !Array.isArray(data24)) {
        if (Object.keys(data24).length < 1) {
          const err51 = { instancePath: instancePath + "/baseline", schemaPath: "#/$defs/tokenizer/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema34, data: data24 };
          if (vErrors === null) {
            vErrors = [err51];
          } else {
            vErrors.push(err51);
          }
          errors++;
        }
        for (const key6 in data24) {
          if (!(key6 === "builtin" || key6 === "file" || key6 === "format" || key6 === "pattern")) {
            const err52 = { instancePath: instancePath + "/baseline", schemaPath: "#/$defs/tokenizer/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key6 }, message: "must NOT have additional properties", schema: false, parentSchema: schema34, data: data24 };
            if (vErrors === null) {
              vErrors = [err52];
            } else {
              vErrors.push(err52);
            }
            errors++;
          }
        }
        if (data24.builtin !== void 0) {
          let data25 = data24.builtin;
          if (!(data25 === "gpt2" || data25 === "r50k_base" || data25 === "p50k_base" || data25 === "cl100k_base" || data25 === "o200k_base")) {
            const err53 = { instancePath: instancePath + "/baseline/builtin", schemaPath: "#/$defs/tokenizer/properties/builtin/enum", keyword: "enum", params: { allowedValues: schema34.properties.builtin.enum }, message: "must be equal to one of the allowed values", schema: schema34.properties.builtin.enum, parentSchema: schema34.properties.builtin, data: data25 };
            if (vErrors === null) {
              vErrors = [err53];
            } else {
              vErrors.push(err53);
            }
            errors++;
          }
        }
        if (data24.file !== void 0) {
          let data26 = data24.file;
          if (typeof data26 === "string") {
            if (func2(data26) < 1) {
              const err54 = { instancePath: instancePath + "/baseline/file", schemaPath: "#/$defs/tokenizer/properties/file/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema34.properties.file, data: data26 };
              if (vErrors === null) {
                vErrors = [err54];
              } else {
                vErrors.push(err54);
              }
              errors++;
            }
          } else {
            const err55 = { instancePath: instancePath + "/baseline/file", schemaPath: "#/$defs/tokenizer/properties/file/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema34.properties.file.type, parentSchema: schema34.properties.file, data: data26 };
            if (vErrors === null) {
              vErrors = [err55];
            } else {
              vErrors.push(err55);
            }
            errors++;
          }
        }
        if (data24.format !== void 0) {
          let data27 = data24.format;
          if (!(data27 === "tokenizer.json" || data27 === "tiktoken")) {
            const err56 = { instancePath: instancePath + "/baseline/format", schemaPath: "#/$defs/tokenizer/properties/format/enum", keyword: "enum", params: { allowedValues: schema34.properties.format.enum }, message: "must be equal to one of the allowed values", schema: schema34.properties.format.enum, parentSchema: schema34.properties.format, data: data27 };
            if (vErrors === null) {
              vErrors = [err56];
            } else {
              vErrors.push(err56);
            }
            errors++;
          }
        }
        if (data24.pattern !== void 0) {
          let data28 = data24.pattern;
          if (typeof data28 === "string") {
            if (func2(data28) < 1) {
              const err57 = { instancePath: instancePath + "/baseline/pattern", schemaPath: "#/$defs/tokenizer/properties/pattern/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema34.properties.pattern, data: data28 };
              if (vErrors === null) {
                vErrors = [err57];
              } else {
                vErrors.push(err57);
              }
              errors++;
            }
          } else {
            const err58 = { instancePath: instancePath + "/baseline/pattern", schemaPath: "#/$defs/tokenizer/properties/pattern/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema34.properties.pattern.type, parentSchema: schema34.properties.pattern, data: data28 };
            if (vErrors === null) {
              vErrors = [err58];
            } else {
              vErrors.push(err58);
            }
            errors++;
          }
        }
        if (data24.format !== void 0) {
          if (data24.file === void 0) {
            const err59 = { instancePath: instancePath + "/baseline", schemaPath: "#/$defs/tokenizer/dependentRequired", keyword: "dependentRequired", params: {
              property: "format",
              missingProperty: "file",
              depsCount: 1,
              deps: "file"
            }, message: "must have property file when property format is present", schema: schema34.dependentRequired, parentSchema: schema34, data: data24 };
            if (vErrors === null) {
              vErrors = [err59];
            } else {
              vErrors.push(err59);
            }
            errors++;
          }
        }
        if (data24.pattern !== void 0) {
          if (data24.file === void 0) {
            const err60 = { instancePath: instancePath + "/baseline", schemaPath: "#/$defs/tokenizer/dependentRequired", keyword: "dependentRequired", params: {
              property: "pattern",
              missingProperty: "file",
              depsCount: 1,
              deps: "file"
            }, message: "must have property file when property pattern is present", schema: schema34.dependentRequired, parentSchema: schema34, data: data24 };
            if (vErrors === null) {
              vErrors = [err60];
            } else {
              vErrors.push(err60);
            }
            errors++;
          }
        }
        if (data24.builtin !== void 0) {
          if (data24 && typeof data24 == "object" && !Array.isArray(data24)) {
            if (data24.file !== void 0) {
              const err61 = { instancePath: instancePath + "/baseline/file", schemaPath: "#/$defs/tokenizer/dependentSchemas/builtin/properties/file/false schema", keyword: "false schema", params: {}, message: "boolean schema is false", schema: false, parentSchema: schema34.dependentSchemas.builtin.properties.file, data: data24.file };
              if (vErrors === null) {
                vErrors = [err61];
              } else {
                vErrors.push(err61);
              }
              errors++;
            }
          }
        }
      } else {
        const err62 = { instancePath: instancePath + "/baseline", schemaPath: "#/$defs/tokenizer/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema34.type, parentSchema: schema34, data: data24 };
        if (vErrors === null) {
          vErrors = [err62];
        } else {
          vErrors.push(err62);
        }
        errors++;
      }
    }
    if (data2.sampling !== void 0) {
      let data30 = data2.sampling;
      if (data30 && typeof data30 == "object" && !Array.isArray(data30)) {
        if (Object.keys(data30).length < 1) {
          const err63 = { instancePath: instancePath + "/sampling", schemaPath: "#/properties/sampling/minProperties", keyword: "minProperties", params: { limit: 1 }, message: "must NOT have fewer than 1 properties", schema: 1, parentSchema: schema31.properties.sampling, data: data30 };
          if (vErrors === null) {
            vErrors = [err63];
          } else {
            vErrors.push(err63);
          }
          errors++;
        }
        for (const key7 in data30) {
          if (!(key7 === "docs-per-shard" || key7 === "fraction")) {
            const err64 = { instancePath: instancePath + "/sampling", schemaPath: "#/properties/sampling/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key7 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.sampling, data: data30 };
            if (vErrors === null) {
              vErrors = [err64];
            } else {
              vErrors.push(err64);
            }
            errors++;
          }
        }
        if (data30["docs-per-shard"] !== void 0) {
          let data31 = data30["docs-per-shard"];
          if (!(typeof data31 == "number" && (!(data31 % 1) && !isNaN(data31)) && isFinite(data31))) {
            const err65 = { instancePath: instancePath + "/sampling/docs-per-shard", schemaPath: "#/properties/sampling/properties/docs-per-shard/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.sampling.properties["docs-per-shard"].type, parentSchema: schema31.properties.sampling.properties["docs-per-shard"], data: data31 };
            if (vErrors === null) {
              vErrors = [err65];
            } else {
              vErrors.push(err65);
            }
            errors++;
          }
          if (typeof data31 == "number" && isFinite(data31)) {
            if (data31 < 1 || isNaN(data31)) {
              const err66 = { instancePath: instancePath + "/sampling/docs-per-shard", schemaPath: "#/properties/sampling/properties/docs-per-shard/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema31.properties.sampling.properties["docs-per-shard"], data: data31 };
              if (vErrors === null) {
                vErrors = [err66];
              } else {
                vErrors.push(err66);
              }
              errors++;
            }
          }
        }
        if (data30.fraction !== void 0) {
          let data32 = data30.fraction;
          if (typeof data32 == "number" && isFinite(data32)) {
            if (data32 > 1 || isNaN(data32)) {
              const err67 = { instancePath: instancePath + "/sampling/fraction", schemaPath: "#/properties/sampling/properties/fraction/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema31.properties.sampling.properties.fraction, data: data32 };
              if (vErrors === null) {
                vErrors = [err67];
              } else {
                vErrors.push(err67);
              }
              errors++;
            }
            if (data32 <= 0 || isNaN(data32)) {
              const err68 = { instancePath: instancePath + "/sampling/fraction", schemaPath: "#/properties/sampling/properties/fraction/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema31.properties.sampling.properties.fraction, data: data32 };
              if (vErrors === null) {
                vErrors = [err68];
              } else {
                vErrors.push(err68);
              }
              errors++;
            }
          } else {
            const err69 = { instancePath: instancePath + "/sampling/fraction", schemaPath: "#/properties/sampling/properties/fraction/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema31.properties.sampling.properties.fraction.type, parentSchema: schema31.properties.sampling.properties.fraction, data: data32 };
            if (vErrors === null) {
              vErrors = [err69];
            } else {
              vErrors.push(err69);
            }
            errors++;
          }
        }
        if (data30["docs-per-shard"] !== void 0) {
          if (data30 && typeof data30 == "object" && !Array.isArray(data30)) {
            if (data30.fraction !== void 0) {
              const err70 = { instancePath: instancePath + "/sampling/fraction", schemaPath: "#/properties/sampling/dependentSchemas/docs-per-shard/properties/fraction/false schema", keyword: "false schema", params: {}, message: "boolean schema is false", schema: false, parentSchema: schema31.properties.sampling.dependentSchemas["docs-per-shard"].properties.fraction, data: data30.fraction };
              if (vErrors === null) {
                vErrors = [err70];
              } else {
                vErrors.push(err70);
              }
              errors++;
            }
          }
        }
      } else {
        const err71 = { instancePath: instancePath + "/sampling", schemaPath: "#/properties/sampling/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.sampling.type, parentSchema: schema31.properties.sampling, data: data30 };
        if (vErrors === null) {
          vErrors = [err71];
        } else {
          vErrors.push(err71);
        }
        errors++;
      }
    }
    if (data2.rules !== void 0) {
      let data34 = data2.rules;
      if (data34 && typeof data34 == "object" && !Array.isArray(data34)) {
        for (const key8 in data34) {
          if (!(key8 === "input" || key8 === "mix" || key8 === "script" || key8 === "encoding" || key8 === "fertility" || key8 === "duplicates" || key8 === "contamination")) {
            const err72 = { instancePath: instancePath + "/rules", schemaPath: "#/properties/rules/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key8 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules, data: data34 };
            if (vErrors === null) {
              vErrors = [err72];
            } else {
              vErrors.push(err72);
            }
            errors++;
          }
        }
        if (data34.input !== void 0) {
          let data35 = data34.input;
          if (data35 && typeof data35 == "object" && !Array.isArray(data35)) {
            for (const key9 in data35) {
              if (!(key9 === "max-rejected" || key9 === "max-broken-shards")) {
                const err73 = { instancePath: instancePath + "/rules/input", schemaPath: "#/properties/rules/properties/input/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key9 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.input, data: data35 };
                if (vErrors === null) {
                  vErrors = [err73];
                } else {
                  vErrors.push(err73);
                }
                errors++;
              }
            }
            if (data35["max-rejected"] !== void 0) {
              let data36 = data35["max-rejected"];
              if (typeof data36 == "number" && isFinite(data36)) {
                if (data36 > 1 || isNaN(data36)) {
                  const err74 = { instancePath: instancePath + "/rules/input/max-rejected", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data36 };
                  if (vErrors === null) {
                    vErrors = [err74];
                  } else {
                    vErrors.push(err74);
                  }
                  errors++;
                }
                if (data36 < 0 || isNaN(data36)) {
                  const err75 = { instancePath: instancePath + "/rules/input/max-rejected", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data36 };
                  if (vErrors === null) {
                    vErrors = [err75];
                  } else {
                    vErrors.push(err75);
                  }
                  errors++;
                }
              } else {
                const err76 = { instancePath: instancePath + "/rules/input/max-rejected", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data36 };
                if (vErrors === null) {
                  vErrors = [err76];
                } else {
                  vErrors.push(err76);
                }
                errors++;
              }
            }
            if (data35["max-broken-shards"] !== void 0) {
              let data37 = data35["max-broken-shards"];
              if (!(typeof data37 == "number" && (!(data37 % 1) && !isNaN(data37)) && isFinite(data37))) {
                const err77 = { instancePath: instancePath + "/rules/input/max-broken-shards", schemaPath: "#/properties/rules/properties/input/properties/max-broken-shards/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.rules.properties.input.properties["max-broken-shards"].type, parentSchema: schema31.properties.rules.properties.input.properties["max-broken-shards"], data: data37 };
                if (vErrors === null) {
                  vErrors = [err77];
                } else {
                  vErrors.push(err77);
                }
                errors++;
              }
              if (typeof data37 == "number" && isFinite(data37)) {
                if (data37 < 0 || isNaN(data37)) {
                  const err78 = { instancePath: instancePath + "/rules/input/max-broken-shards", schemaPath: "#/properties/rules/properties/input/properties/max-broken-shards/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema31.properties.rules.properties.input.properties["max-broken-shards"], data: data37 };
                  if (vErrors === null) {
                    vErrors = [err78];
                  } else {
                    vErrors.push(err78);
                  }
                  errors++;
                }
              }
            }
          } else {
            const err79 = { instancePath: instancePath + "/rules/input", schemaPath: "#/properties/rules/properties/input/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.input.type, parentSchema: schema31.properties.rules.properties.input, data: data35 };
            if (vErrors === null) {
              vErrors = [err79];
            } else {
              vErrors.push(err79);
            }
            errors++;
          }
        }
        if (data34.mix !== void 0) {
          let data38 = data34.mix;
          if (data38 && typeof data38 == "object" && !Array.isArray(data38)) {
            for (const key10 in data38) {
              if (!(key10 === "unit" || key10 === "tolerance" || key10 === "max-other" || key10 === "max-und")) {
                const err80 = { instancePath: instancePath + "/rules/mix", schemaPath: "#/properties/rules/properties/mix/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key10 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.mix, data: data38 };
                if (vErrors === null) {
                  vErrors = [err80];
                } else {
                  vErrors.push(err80);
                }
                errors++;
              }
            }
            if (data38.unit !== void 0) {
              let data39 = data38.unit;
              if (!(data39 === "docs" || data39 === "bytes" || data39 === "chars" || data39 === "words" || data39 === "tokens")) {
                const err81 = { instancePath: instancePath + "/rules/mix/unit", schemaPath: "#/properties/rules/properties/mix/properties/unit/enum", keyword: "enum", params: { allowedValues: schema31.properties.rules.properties.mix.properties.unit.enum }, message: "must be equal to one of the allowed values", schema: schema31.properties.rules.properties.mix.properties.unit.enum, parentSchema: schema31.properties.rules.properties.mix.properties.unit, data: data39 };
                if (vErrors === null) {
                  vErrors = [err81];
                } else {
                  vErrors.push(err81);
                }
                errors++;
              }
            }
            if (data38.tolerance !== void 0) {
              let data40 = data38.tolerance;
              if (typeof data40 == "number" && isFinite(data40)) {
                if (data40 > 1 || isNaN(data40)) {
                  const err82 = { instancePath: instancePath + "/rules/mix/tolerance", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data40 };
                  if (vErrors === null) {
                    vErrors = [err82];
                  } else {
                    vErrors.push(err82);
                  }
                  errors++;
                }
                if (data40 < 0 || isNaN(data40)) {
                  const err83 = { instancePath: instancePath + "/rules/mix/tolerance", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data40 };
                  if (vErrors === null) {
                    vErrors = [err83];
                  } else {
                    vErrors.push(err83);
                  }
                  errors++;
                }
              } else {
                const err84 = { instancePath: instancePath + "/rules/mix/tolerance", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data40 };
                if (vErrors === null) {
                  vErrors = [err84];
                } else {
                  vErrors.push(err84);
                }
                errors++;
              }
            }
            if (data38["max-other"] !== void 0) {
              let data41 = data38["max-other"];
              if (typeof data41 == "number" && isFinite(data41)) {
                if (data41 > 1 || isNaN(data41)) {
                  const err85 = { instancePath: instancePath + "/rules/mix/max-other", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data41 };
                  if (vErrors === null) {
                    vErrors = [err85];
                  } else {
                    vErrors.push(err85);
                  }
                  errors++;
                }
                if (data41 < 0 || isNaN(data41)) {
                  const err86 = { instancePath: instancePath + "/rules/mix/max-other", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data41 };
                  if (vErrors === null) {
                    vErrors = [err86];
                  } else {
                    vErrors.push(err86);
                  }
                  errors++;
                }
              } else {
                const err87 = { instancePath: instancePath + "/rules/mix/max-other", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data41 };
                if (vErrors === null) {
                  vErrors = [err87];
                } else {
                  vErrors.push(err87);
                }
                errors++;
              }
            }
            if (data38["max-und"] !== void 0) {
              let data42 = data38["max-und"];
              if (typeof data42 == "number" && isFinite(data42)) {
                if (data42 > 1 || isNaN(data42)) {
                  const err88 = { instancePath: instancePath + "/rules/mix/max-und", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data42 };
                  if (vErrors === null) {
                    vErrors = [err88];
                  } else {
                    vErrors.push(err88);
                  }
                  errors++;
                }
                if (data42 < 0 || isNaN(data42)) {
                  const err89 = { instancePath: instancePath + "/rules/mix/max-und", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data42 };
                  if (vErrors === null) {
                    vErrors = [err89];
                  } else {
                    vErrors.push(err89);
                  }
                  errors++;
                }
              } else {
                const err90 = { instancePath: instancePath + "/rules/mix/max-und", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data42 };
                if (vErrors === null) {
                  vErrors = [err90];
                } else {
                  vErrors.push(err90);
                }
                errors++;
              }
            }
          } else {
            const err91 = { instancePath: instancePath + "/rules/mix", schemaPath: "#/properties/rules/properties/mix/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.mix.type, parentSchema: schema31.properties.rules.properties.mix, data: data38 };
            if (vErrors === null) {
              vErrors = [err91];
            } else {
              vErrors.push(err91);
            }
            errors++;
          }
        }
        if (data34.script !== void 0) {
          let data43 = data34.script;
          if (data43 && typeof data43 == "object" && !Array.isArray(data43)) {
            for (const key11 in data43) {
              if (!(key11 === "min-purity" || key11 === "max-impure-docs")) {
                const err92 = { instancePath: instancePath + "/rules/script", schemaPath: "#/properties/rules/properties/script/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key11 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.script, data: data43 };
                if (vErrors === null) {
                  vErrors = [err92];
                } else {
                  vErrors.push(err92);
                }
                errors++;
              }
            }
            if (data43["min-purity"] !== void 0) {
              let data44 = data43["min-purity"];
              if (typeof data44 == "number" && isFinite(data44)) {
                if (data44 > 1 || isNaN(data44)) {
                  const err93 = { instancePath: instancePath + "/rules/script/min-purity", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data44 };
                  if (vErrors === null) {
                    vErrors = [err93];
                  } else {
                    vErrors.push(err93);
                  }
                  errors++;
                }
                if (data44 < 0 || isNaN(data44)) {
                  const err94 = { instancePath: instancePath + "/rules/script/min-purity", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data44 };
                  if (vErrors === null) {
                    vErrors = [err94];
                  } else {
                    vErrors.push(err94);
                  }
                  errors++;
                }
              } else {
                const err95 = { instancePath: instancePath + "/rules/script/min-purity", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data44 };
                if (vErrors === null) {
                  vErrors = [err95];
                } else {
                  vErrors.push(err95);
                }
                errors++;
              }
            }
            if (data43["max-impure-docs"] !== void 0) {
              let data45 = data43["max-impure-docs"];
              if (typeof data45 == "number" && isFinite(data45)) {
                if (data45 > 1 || isNaN(data45)) {
                  const err96 = { instancePath: instancePath + "/rules/script/max-impure-docs", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data45 };
                  if (vErrors === null) {
                    vErrors = [err96];
                  } else {
                    vErrors.push(err96);
                  }
                  errors++;
                }
                if (data45 < 0 || isNaN(data45)) {
                  const err97 = { instancePath: instancePath + "/rules/script/max-impure-docs", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data45 };
                  if (vErrors === null) {
                    vErrors = [err97];
                  } else {
                    vErrors.push(err97);
                  }
                  errors++;
                }
              } else {
                const err98 = { instancePath: instancePath + "/rules/script/max-impure-docs", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data45 };
                if (vErrors === null) {
                  vErrors = [err98];
                } else {
                  vErrors.push(err98);
                }
                errors++;
              }
            }
          } else {
            const err99 = { instancePath: instancePath + "/rules/script", schemaPath: "#/properties/rules/properties/script/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.script.type, parentSchema: schema31.properties.rules.properties.script, data: data43 };
            if (vErrors === null) {
              vErrors = [err99];
            } else {
              vErrors.push(err99);
            }
            errors++;
          }
        }
        if (data34.encoding !== void 0) {
          let data46 = data34.encoding;
          if (data46 && typeof data46 == "object" && !Array.isArray(data46)) {
            for (const key12 in data46) {
              if (!(key12 === "max-anomalous-docs" || key12 === "forbid")) {
                const err100 = { instancePath: instancePath + "/rules/encoding", schemaPath: "#/properties/rules/properties/encoding/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key12 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.encoding, data: data46 };
                if (vErrors === null) {
                  vErrors = [err100];
                } else {
                  vErrors.push(err100);
                }
                errors++;
              }
            }
            if (data46["max-anomalous-docs"] !== void 0) {
              let data47 = data46["max-anomalous-docs"];
              if (typeof data47 == "number" && isFinite(data47)) {
                if (data47 > 1 || isNaN(data47)) {
                  const err101 = { instancePath: instancePath + "/rules/encoding/max-anomalous-docs", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data47 };
                  if (vErrors === null) {
                    vErrors = [err101];
                  } else {
                    vErrors.push(err101);
                  }
                  errors++;
                }
                if (data47 < 0 || isNaN(data47)) {
                  const err102 = { instancePath: instancePath + "/rules/encoding/max-anomalous-docs", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data47 };
                  if (vErrors === null) {
                    vErrors = [err102];
                  } else {
                    vErrors.push(err102);
                  }
                  errors++;
                }
              } else {
                const err103 = { instancePath: instancePath + "/rules/encoding/max-anomalous-docs", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data47 };
                if (vErrors === null) {
                  vErrors = [err103];
                } else {
                  vErrors.push(err103);
                }
                errors++;
              }
            }
            if (data46.forbid !== void 0) {
              let data48 = data46.forbid;
              if (Array.isArray(data48)) {
                const len2 = data48.length;
                for (let i2 = 0; i2 < len2; i2++) {
                  let data49 = data48[i2];
                  if (!(data49 === "replacement-char" || data49 === "control-chars" || data49 === "bidi-controls" || data49 === "zero-width" || data49 === "private-use" || data49 === "mojibake")) {
                    const err104 = { instancePath: instancePath + "/rules/encoding/forbid/" + i2, schemaPath: "#/properties/rules/properties/encoding/properties/forbid/items/enum", keyword: "enum", params: { allowedValues: schema31.properties.rules.properties.encoding.properties.forbid.items.enum }, message: "must be equal to one of the allowed values", schema: schema31.properties.rules.properties.encoding.properties.forbid.items.enum, parentSchema: schema31.properties.rules.properties.encoding.properties.forbid.items, data: data49 };
                    if (vErrors === null) {
                      vErrors = [err104];
                    } else {
                      vErrors.push(err104);
                    }
                    errors++;
                  }
                }
                let i3 = data48.length;
                let j0;
                if (i3 > 1) {
                  outer0: for (; i3--; ) {
                    for (j0 = i3; j0--; ) {
                      if (func0(data48[i3], data48[j0])) {
                        const err105 = { instancePath: instancePath + "/rules/encoding/forbid", schemaPath: "#/properties/rules/properties/encoding/properties/forbid/uniqueItems", keyword: "uniqueItems", params: { i: i3, j: j0 }, message: "must NOT have duplicate items (items ## " + j0 + " and " + i3 + " are identical)", schema: true, parentSchema: schema31.properties.rules.properties.encoding.properties.forbid, data: data48 };
                        if (vErrors === null) {
                          vErrors = [err105];
                        } else {
                          vErrors.push(err105);
                        }
                        errors++;
                        break outer0;
                      }
                    }
                  }
                }
              } else {
                const err106 = { instancePath: instancePath + "/rules/encoding/forbid", schemaPath: "#/properties/rules/properties/encoding/properties/forbid/type", keyword: "type", params: { type: "array" }, message: "must be array", schema: schema31.properties.rules.properties.encoding.properties.forbid.type, parentSchema: schema31.properties.rules.properties.encoding.properties.forbid, data: data48 };
                if (vErrors === null) {
                  vErrors = [err106];
                } else {
                  vErrors.push(err106);
                }
                errors++;
              }
            }
          } else {
            const err107 = { instancePath: instancePath + "/rules/encoding", schemaPath: "#/properties/rules/properties/encoding/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.encoding.type, parentSchema: schema31.properties.rules.properties.encoding, data: data46 };
            if (vErrors === null) {
              vErrors = [err107];
            } else {
              vErrors.push(err107);
            }
            errors++;
          }
        }
        if (data34.fertility !== void 0) {
          let data50 = data34.fertility;
          if (data50 && typeof data50 == "object" && !Array.isArray(data50)) {
            for (const key13 in data50) {
              if (!(key13 === "max" || key13 === "max-regression" || key13 === "max-continued" || key13 === "word-lists")) {
                const err108 = { instancePath: instancePath + "/rules/fertility", schemaPath: "#/properties/rules/properties/fertility/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key13 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.fertility, data: data50 };
                if (vErrors === null) {
                  vErrors = [err108];
                } else {
                  vErrors.push(err108);
                }
                errors++;
              }
            }
            if (data50.max !== void 0) {
              let data51 = data50.max;
              if (data51 && typeof data51 == "object" && !Array.isArray(data51)) {
                for (const key14 in data51) {
                  let data52 = data51[key14];
                  if (typeof data52 == "number" && isFinite(data52)) {
                    if (data52 <= 0 || isNaN(data52)) {
                      const err109 = { instancePath: instancePath + "/rules/fertility/max/" + key14.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/properties/rules/properties/fertility/properties/max/additionalProperties/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema31.properties.rules.properties.fertility.properties.max.additionalProperties, data: data52 };
                      if (vErrors === null) {
                        vErrors = [err109];
                      } else {
                        vErrors.push(err109);
                      }
                      errors++;
                    }
                  } else {
                    const err110 = { instancePath: instancePath + "/rules/fertility/max/" + key14.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/properties/rules/properties/fertility/properties/max/additionalProperties/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema31.properties.rules.properties.fertility.properties.max.additionalProperties.type, parentSchema: schema31.properties.rules.properties.fertility.properties.max.additionalProperties, data: data52 };
                    if (vErrors === null) {
                      vErrors = [err110];
                    } else {
                      vErrors.push(err110);
                    }
                    errors++;
                  }
                }
              } else {
                const err111 = { instancePath: instancePath + "/rules/fertility/max", schemaPath: "#/properties/rules/properties/fertility/properties/max/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.fertility.properties.max.type, parentSchema: schema31.properties.rules.properties.fertility.properties.max, data: data51 };
                if (vErrors === null) {
                  vErrors = [err111];
                } else {
                  vErrors.push(err111);
                }
                errors++;
              }
            }
            if (data50["max-regression"] !== void 0) {
              let data53 = data50["max-regression"];
              if (typeof data53 == "number" && isFinite(data53)) {
                if (data53 < 0 || isNaN(data53)) {
                  const err112 = { instancePath: instancePath + "/rules/fertility/max-regression", schemaPath: "#/properties/rules/properties/fertility/properties/max-regression/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema31.properties.rules.properties.fertility.properties["max-regression"], data: data53 };
                  if (vErrors === null) {
                    vErrors = [err112];
                  } else {
                    vErrors.push(err112);
                  }
                  errors++;
                }
              } else {
                const err113 = { instancePath: instancePath + "/rules/fertility/max-regression", schemaPath: "#/properties/rules/properties/fertility/properties/max-regression/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema31.properties.rules.properties.fertility.properties["max-regression"].type, parentSchema: schema31.properties.rules.properties.fertility.properties["max-regression"], data: data53 };
                if (vErrors === null) {
                  vErrors = [err113];
                } else {
                  vErrors.push(err113);
                }
                errors++;
              }
            }
            if (data50["max-continued"] !== void 0) {
              let data54 = data50["max-continued"];
              if (data54 && typeof data54 == "object" && !Array.isArray(data54)) {
                for (const key15 in data54) {
                  let data55 = data54[key15];
                  if (typeof data55 == "number" && isFinite(data55)) {
                    if (data55 > 1 || isNaN(data55)) {
                      const err114 = { instancePath: instancePath + "/rules/fertility/max-continued/" + key15.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data55 };
                      if (vErrors === null) {
                        vErrors = [err114];
                      } else {
                        vErrors.push(err114);
                      }
                      errors++;
                    }
                    if (data55 < 0 || isNaN(data55)) {
                      const err115 = { instancePath: instancePath + "/rules/fertility/max-continued/" + key15.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data55 };
                      if (vErrors === null) {
                        vErrors = [err115];
                      } else {
                        vErrors.push(err115);
                      }
                      errors++;
                    }
                  } else {
                    const err116 = { instancePath: instancePath + "/rules/fertility/max-continued/" + key15.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data55 };
                    if (vErrors === null) {
                      vErrors = [err116];
                    } else {
                      vErrors.push(err116);
                    }
                    errors++;
                  }
                }
              } else {
                const err117 = { instancePath: instancePath + "/rules/fertility/max-continued", schemaPath: "#/properties/rules/properties/fertility/properties/max-continued/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.fertility.properties["max-continued"].type, parentSchema: schema31.properties.rules.properties.fertility.properties["max-continued"], data: data54 };
                if (vErrors === null) {
                  vErrors = [err117];
                } else {
                  vErrors.push(err117);
                }
                errors++;
              }
            }
            if (data50["word-lists"] !== void 0) {
              let data56 = data50["word-lists"];
              if (data56 && typeof data56 == "object" && !Array.isArray(data56)) {
                for (const key16 in data56) {
                  let data57 = data56[key16];
                  if (typeof data57 === "string") {
                    if (func2(data57) < 1) {
                      const err118 = { instancePath: instancePath + "/rules/fertility/word-lists/" + key16.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/properties/rules/properties/fertility/properties/word-lists/additionalProperties/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.rules.properties.fertility.properties["word-lists"].additionalProperties, data: data57 };
                      if (vErrors === null) {
                        vErrors = [err118];
                      } else {
                        vErrors.push(err118);
                      }
                      errors++;
                    }
                  } else {
                    const err119 = { instancePath: instancePath + "/rules/fertility/word-lists/" + key16.replace(/~/g, "~0").replace(/\//g, "~1"), schemaPath: "#/properties/rules/properties/fertility/properties/word-lists/additionalProperties/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.rules.properties.fertility.properties["word-lists"].additionalProperties.type, parentSchema: schema31.properties.rules.properties.fertility.properties["word-lists"].additionalProperties, data: data57 };
                    if (vErrors === null) {
                      vErrors = [err119];
                    } else {
                      vErrors.push(err119);
                    }
                    errors++;
                  }
                }
              } else {
                const err120 = { instancePath: instancePath + "/rules/fertility/word-lists", schemaPath: "#/properties/rules/properties/fertility/properties/word-lists/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.fertility.properties["word-lists"].type, parentSchema: schema31.properties.rules.properties.fertility.properties["word-lists"], data: data56 };
                if (vErrors === null) {
                  vErrors = [err120];
                } else {
                  vErrors.push(err120);
                }
                errors++;
              }
            }
          } else {
            const err121 = { instancePath: instancePath + "/rules/fertility", schemaPath: "#/properties/rules/properties/fertility/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.fertility.type, parentSchema: schema31.properties.rules.properties.fertility, data: data50 };
            if (vErrors === null) {
              vErrors = [err121];
            } else {
              vErrors.push(err121);
            }
            errors++;
          }
        }
        if (data34.duplicates !== void 0) {
          let data58 = data34.duplicates;
          if (data58 && typeof data58 == "object" && !Array.isArray(data58)) {
            for (const key17 in data58) {
              if (!(key17 === "max-exact" || key17 === "near" || key17 === "punctuation")) {
                const err122 = { instancePath: instancePath + "/rules/duplicates", schemaPath: "#/properties/rules/properties/duplicates/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key17 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.duplicates, data: data58 };
                if (vErrors === null) {
                  vErrors = [err122];
                } else {
                  vErrors.push(err122);
                }
                errors++;
              }
            }
            if (data58["max-exact"] !== void 0) {
              let data59 = data58["max-exact"];
              if (typeof data59 == "number" && isFinite(data59)) {
                if (data59 > 1 || isNaN(data59)) {
                  const err123 = { instancePath: instancePath + "/rules/duplicates/max-exact", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data59 };
                  if (vErrors === null) {
                    vErrors = [err123];
                  } else {
                    vErrors.push(err123);
                  }
                  errors++;
                }
                if (data59 < 0 || isNaN(data59)) {
                  const err124 = { instancePath: instancePath + "/rules/duplicates/max-exact", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data59 };
                  if (vErrors === null) {
                    vErrors = [err124];
                  } else {
                    vErrors.push(err124);
                  }
                  errors++;
                }
              } else {
                const err125 = { instancePath: instancePath + "/rules/duplicates/max-exact", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data59 };
                if (vErrors === null) {
                  vErrors = [err125];
                } else {
                  vErrors.push(err125);
                }
                errors++;
              }
            }
            if (data58.near !== void 0) {
              let data60 = data58.near;
              if (data60 && typeof data60 == "object" && !Array.isArray(data60)) {
                for (const key18 in data60) {
                  if (!(key18 === "threshold" || key18 === "max" || key18 === "shingle" || key18 === "hashes")) {
                    const err126 = { instancePath: instancePath + "/rules/duplicates/near", schemaPath: "#/properties/rules/properties/duplicates/properties/near/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key18 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.duplicates.properties.near, data: data60 };
                    if (vErrors === null) {
                      vErrors = [err126];
                    } else {
                      vErrors.push(err126);
                    }
                    errors++;
                  }
                }
                if (data60.threshold !== void 0) {
                  let data61 = data60.threshold;
                  if (typeof data61 == "number" && isFinite(data61)) {
                    if (data61 >= 1 || isNaN(data61)) {
                      const err127 = { instancePath: instancePath + "/rules/duplicates/near/threshold", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/threshold/exclusiveMaximum", keyword: "exclusiveMaximum", params: { comparison: "<", limit: 1 }, message: "must be < 1", schema: 1, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.threshold, data: data61 };
                      if (vErrors === null) {
                        vErrors = [err127];
                      } else {
                        vErrors.push(err127);
                      }
                      errors++;
                    }
                    if (data61 <= 0 || isNaN(data61)) {
                      const err128 = { instancePath: instancePath + "/rules/duplicates/near/threshold", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/threshold/exclusiveMinimum", keyword: "exclusiveMinimum", params: { comparison: ">", limit: 0 }, message: "must be > 0", schema: 0, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.threshold, data: data61 };
                      if (vErrors === null) {
                        vErrors = [err128];
                      } else {
                        vErrors.push(err128);
                      }
                      errors++;
                    }
                  } else {
                    const err129 = { instancePath: instancePath + "/rules/duplicates/near/threshold", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/threshold/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema31.properties.rules.properties.duplicates.properties.near.properties.threshold.type, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.threshold, data: data61 };
                    if (vErrors === null) {
                      vErrors = [err129];
                    } else {
                      vErrors.push(err129);
                    }
                    errors++;
                  }
                }
                if (data60.max !== void 0) {
                  let data62 = data60.max;
                  if (typeof data62 == "number" && isFinite(data62)) {
                    if (data62 > 1 || isNaN(data62)) {
                      const err130 = { instancePath: instancePath + "/rules/duplicates/near/max", schemaPath: "#/$defs/share/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1 }, message: "must be <= 1", schema: 1, parentSchema: schema33, data: data62 };
                      if (vErrors === null) {
                        vErrors = [err130];
                      } else {
                        vErrors.push(err130);
                      }
                      errors++;
                    }
                    if (data62 < 0 || isNaN(data62)) {
                      const err131 = { instancePath: instancePath + "/rules/duplicates/near/max", schemaPath: "#/$defs/share/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema33, data: data62 };
                      if (vErrors === null) {
                        vErrors = [err131];
                      } else {
                        vErrors.push(err131);
                      }
                      errors++;
                    }
                  } else {
                    const err132 = { instancePath: instancePath + "/rules/duplicates/near/max", schemaPath: "#/$defs/share/type", keyword: "type", params: { type: "number" }, message: "must be number", schema: schema33.type, parentSchema: schema33, data: data62 };
                    if (vErrors === null) {
                      vErrors = [err132];
                    } else {
                      vErrors.push(err132);
                    }
                    errors++;
                  }
                }
                if (data60.shingle !== void 0) {
                  let data63 = data60.shingle;
                  if (!(typeof data63 == "number" && (!(data63 % 1) && !isNaN(data63)) && isFinite(data63))) {
                    const err133 = { instancePath: instancePath + "/rules/duplicates/near/shingle", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/shingle/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.rules.properties.duplicates.properties.near.properties.shingle.type, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.shingle, data: data63 };
                    if (vErrors === null) {
                      vErrors = [err133];
                    } else {
                      vErrors.push(err133);
                    }
                    errors++;
                  }
                  if (typeof data63 == "number" && isFinite(data63)) {
                    if (data63 < 1 || isNaN(data63)) {
                      const err134 = { instancePath: instancePath + "/rules/duplicates/near/shingle", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/shingle/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.shingle, data: data63 };
                      if (vErrors === null) {
                        vErrors = [err134];
                      } else {
                        vErrors.push(err134);
                      }
                      errors++;
                    }
                  }
                }
                if (data60.hashes !== void 0) {
                  let data64 = data60.hashes;
                  if (!(typeof data64 == "number" && (!(data64 % 1) && !isNaN(data64)) && isFinite(data64))) {
                    const err135 = { instancePath: instancePath + "/rules/duplicates/near/hashes", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/hashes/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.rules.properties.duplicates.properties.near.properties.hashes.type, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.hashes, data: data64 };
                    if (vErrors === null) {
                      vErrors = [err135];
                    } else {
                      vErrors.push(err135);
                    }
                    errors++;
                  }
                  if (typeof data64 == "number" && isFinite(data64)) {
                    if (data64 > 1024 || isNaN(data64)) {
                      const err136 = { instancePath: instancePath + "/rules/duplicates/near/hashes", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/hashes/maximum", keyword: "maximum", params: { comparison: "<=", limit: 1024 }, message: "must be <= 1024", schema: 1024, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.hashes, data: data64 };
                      if (vErrors === null) {
                        vErrors = [err136];
                      } else {
                        vErrors.push(err136);
                      }
                      errors++;
                    }
                    if (data64 < 16 || isNaN(data64)) {
                      const err137 = { instancePath: instancePath + "/rules/duplicates/near/hashes", schemaPath: "#/properties/rules/properties/duplicates/properties/near/properties/hashes/minimum", keyword: "minimum", params: { comparison: ">=", limit: 16 }, message: "must be >= 16", schema: 16, parentSchema: schema31.properties.rules.properties.duplicates.properties.near.properties.hashes, data: data64 };
                      if (vErrors === null) {
                        vErrors = [err137];
                      } else {
                        vErrors.push(err137);
                      }
                      errors++;
                    }
                  }
                }
              } else {
                const err138 = { instancePath: instancePath + "/rules/duplicates/near", schemaPath: "#/properties/rules/properties/duplicates/properties/near/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.duplicates.properties.near.type, parentSchema: schema31.properties.rules.properties.duplicates.properties.near, data: data60 };
                if (vErrors === null) {
                  vErrors = [err138];
                } else {
                  vErrors.push(err138);
                }
                errors++;
              }
            }
            if (data58.punctuation !== void 0) {
              let data65 = data58.punctuation;
              if (!(data65 === "keep" || data65 === "strip")) {
                const err139 = { instancePath: instancePath + "/rules/duplicates/punctuation", schemaPath: "#/properties/rules/properties/duplicates/properties/punctuation/enum", keyword: "enum", params: { allowedValues: schema31.properties.rules.properties.duplicates.properties.punctuation.enum }, message: "must be equal to one of the allowed values", schema: schema31.properties.rules.properties.duplicates.properties.punctuation.enum, parentSchema: schema31.properties.rules.properties.duplicates.properties.punctuation, data: data65 };
                if (vErrors === null) {
                  vErrors = [err139];
                } else {
                  vErrors.push(err139);
                }
                errors++;
              }
            }
          } else {
            const err140 = { instancePath: instancePath + "/rules/duplicates", schemaPath: "#/properties/rules/properties/duplicates/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.duplicates.type, parentSchema: schema31.properties.rules.properties.duplicates, data: data58 };
            if (vErrors === null) {
              vErrors = [err140];
            } else {
              vErrors.push(err140);
            }
            errors++;
          }
        }
        if (data34.contamination !== void 0) {
          let data66 = data34.contamination;
          if (data66 && typeof data66 == "object" && !Array.isArray(data66)) {
            if (data66.eval === void 0) {
              const err141 = { instancePath: instancePath + "/rules/contamination", schemaPath: "#/properties/rules/properties/contamination/required", keyword: "required", params: { missingProperty: "eval" }, message: "must have required property 'eval'", schema: schema31.properties.rules.properties.contamination.required, parentSchema: schema31.properties.rules.properties.contamination, data: data66 };
              if (vErrors === null) {
                vErrors = [err141];
              } else {
                vErrors.push(err141);
              }
              errors++;
            }
            for (const key19 in data66) {
              if (!(key19 === "eval" || key19 === "ngram" || key19 === "max-docs")) {
                const err142 = { instancePath: instancePath + "/rules/contamination", schemaPath: "#/properties/rules/properties/contamination/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key19 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.rules.properties.contamination, data: data66 };
                if (vErrors === null) {
                  vErrors = [err142];
                } else {
                  vErrors.push(err142);
                }
                errors++;
              }
            }
            if (data66.eval !== void 0) {
              let data67 = data66.eval;
              if (typeof data67 !== "string" && !Array.isArray(data67)) {
                const err143 = { instancePath: instancePath + "/rules/contamination/eval", schemaPath: "#/properties/rules/properties/contamination/properties/eval/type", keyword: "type", params: { type: schema31.properties.rules.properties.contamination.properties.eval.type }, message: "must be string,array", schema: schema31.properties.rules.properties.contamination.properties.eval.type, parentSchema: schema31.properties.rules.properties.contamination.properties.eval, data: data67 };
                if (vErrors === null) {
                  vErrors = [err143];
                } else {
                  vErrors.push(err143);
                }
                errors++;
              }
              if (typeof data67 === "string") {
                if (func2(data67) < 1) {
                  const err144 = { instancePath: instancePath + "/rules/contamination/eval", schemaPath: "#/properties/rules/properties/contamination/properties/eval/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.rules.properties.contamination.properties.eval, data: data67 };
                  if (vErrors === null) {
                    vErrors = [err144];
                  } else {
                    vErrors.push(err144);
                  }
                  errors++;
                }
              }
              if (Array.isArray(data67)) {
                if (data67.length < 1) {
                  const err145 = { instancePath: instancePath + "/rules/contamination/eval", schemaPath: "#/properties/rules/properties/contamination/properties/eval/minItems", keyword: "minItems", params: { limit: 1 }, message: "must NOT have fewer than 1 items", schema: 1, parentSchema: schema31.properties.rules.properties.contamination.properties.eval, data: data67 };
                  if (vErrors === null) {
                    vErrors = [err145];
                  } else {
                    vErrors.push(err145);
                  }
                  errors++;
                }
                const len3 = data67.length;
                for (let i4 = 0; i4 < len3; i4++) {
                  let data68 = data67[i4];
                  if (typeof data68 === "string") {
                    if (func2(data68) < 1) {
                      const err146 = { instancePath: instancePath + "/rules/contamination/eval/" + i4, schemaPath: "#/properties/rules/properties/contamination/properties/eval/items/minLength", keyword: "minLength", params: { limit: 1 }, message: "must NOT have fewer than 1 characters", schema: 1, parentSchema: schema31.properties.rules.properties.contamination.properties.eval.items, data: data68 };
                      if (vErrors === null) {
                        vErrors = [err146];
                      } else {
                        vErrors.push(err146);
                      }
                      errors++;
                    }
                  } else {
                    const err147 = { instancePath: instancePath + "/rules/contamination/eval/" + i4, schemaPath: "#/properties/rules/properties/contamination/properties/eval/items/type", keyword: "type", params: { type: "string" }, message: "must be string", schema: schema31.properties.rules.properties.contamination.properties.eval.items.type, parentSchema: schema31.properties.rules.properties.contamination.properties.eval.items, data: data68 };
                    if (vErrors === null) {
                      vErrors = [err147];
                    } else {
                      vErrors.push(err147);
                    }
                    errors++;
                  }
                }
              }
            }
            if (data66.ngram !== void 0) {
              let data69 = data66.ngram;
              if (!(typeof data69 == "number" && (!(data69 % 1) && !isNaN(data69)) && isFinite(data69))) {
                const err148 = { instancePath: instancePath + "/rules/contamination/ngram", schemaPath: "#/properties/rules/properties/contamination/properties/ngram/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.rules.properties.contamination.properties.ngram.type, parentSchema: schema31.properties.rules.properties.contamination.properties.ngram, data: data69 };
                if (vErrors === null) {
                  vErrors = [err148];
                } else {
                  vErrors.push(err148);
                }
                errors++;
              }
              if (typeof data69 == "number" && isFinite(data69)) {
                if (data69 < 1 || isNaN(data69)) {
                  const err149 = { instancePath: instancePath + "/rules/contamination/ngram", schemaPath: "#/properties/rules/properties/contamination/properties/ngram/minimum", keyword: "minimum", params: { comparison: ">=", limit: 1 }, message: "must be >= 1", schema: 1, parentSchema: schema31.properties.rules.properties.contamination.properties.ngram, data: data69 };
                  if (vErrors === null) {
                    vErrors = [err149];
                  } else {
                    vErrors.push(err149);
                  }
                  errors++;
                }
              }
            }
            if (data66["max-docs"] !== void 0) {
              let data70 = data66["max-docs"];
              if (!(typeof data70 == "number" && (!(data70 % 1) && !isNaN(data70)) && isFinite(data70))) {
                const err150 = { instancePath: instancePath + "/rules/contamination/max-docs", schemaPath: "#/properties/rules/properties/contamination/properties/max-docs/type", keyword: "type", params: { type: "integer" }, message: "must be integer", schema: schema31.properties.rules.properties.contamination.properties["max-docs"].type, parentSchema: schema31.properties.rules.properties.contamination.properties["max-docs"], data: data70 };
                if (vErrors === null) {
                  vErrors = [err150];
                } else {
                  vErrors.push(err150);
                }
                errors++;
              }
              if (typeof data70 == "number" && isFinite(data70)) {
                if (data70 < 0 || isNaN(data70)) {
                  const err151 = { instancePath: instancePath + "/rules/contamination/max-docs", schemaPath: "#/properties/rules/properties/contamination/properties/max-docs/minimum", keyword: "minimum", params: { comparison: ">=", limit: 0 }, message: "must be >= 0", schema: 0, parentSchema: schema31.properties.rules.properties.contamination.properties["max-docs"], data: data70 };
                  if (vErrors === null) {
                    vErrors = [err151];
                  } else {
                    vErrors.push(err151);
                  }
                  errors++;
                }
              }
            }
          } else {
            const err152 = { instancePath: instancePath + "/rules/contamination", schemaPath: "#/properties/rules/properties/contamination/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.properties.contamination.type, parentSchema: schema31.properties.rules.properties.contamination, data: data66 };
            if (vErrors === null) {
              vErrors = [err152];
            } else {
              vErrors.push(err152);
            }
            errors++;
          }
        }
      } else {
        const err153 = { instancePath: instancePath + "/rules", schemaPath: "#/properties/rules/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.rules.type, parentSchema: schema31.properties.rules, data: data34 };
        if (vErrors === null) {
          vErrors = [err153];
        } else {
          vErrors.push(err153);
        }
        errors++;
      }
    }
    if (data2.severity !== void 0) {
      let data71 = data2.severity;
      if (data71 && typeof data71 == "object" && !Array.isArray(data71)) {
        for (const key20 in data71) {
          if (!(key20 === "input" || key20 === "mix" || key20 === "script" || key20 === "encoding" || key20 === "fertility" || key20 === "duplicates" || key20 === "contamination")) {
            const err154 = { instancePath: instancePath + "/severity", schemaPath: "#/properties/severity/additionalProperties", keyword: "additionalProperties", params: { additionalProperty: key20 }, message: "must NOT have additional properties", schema: false, parentSchema: schema31.properties.severity, data: data71 };
            if (vErrors === null) {
              vErrors = [err154];
            } else {
              vErrors.push(err154);
            }
            errors++;
          }
        }
        if (data71.input !== void 0) {
          let data72 = data71.input;
          if (!(data72 === "error" || data72 === "warn")) {
            const err155 = { instancePath: instancePath + "/severity/input", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data72 };
            if (vErrors === null) {
              vErrors = [err155];
            } else {
              vErrors.push(err155);
            }
            errors++;
          }
        }
        if (data71.mix !== void 0) {
          let data73 = data71.mix;
          if (!(data73 === "error" || data73 === "warn")) {
            const err156 = { instancePath: instancePath + "/severity/mix", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data73 };
            if (vErrors === null) {
              vErrors = [err156];
            } else {
              vErrors.push(err156);
            }
            errors++;
          }
        }
        if (data71.script !== void 0) {
          let data74 = data71.script;
          if (!(data74 === "error" || data74 === "warn")) {
            const err157 = { instancePath: instancePath + "/severity/script", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data74 };
            if (vErrors === null) {
              vErrors = [err157];
            } else {
              vErrors.push(err157);
            }
            errors++;
          }
        }
        if (data71.encoding !== void 0) {
          let data75 = data71.encoding;
          if (!(data75 === "error" || data75 === "warn")) {
            const err158 = { instancePath: instancePath + "/severity/encoding", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data75 };
            if (vErrors === null) {
              vErrors = [err158];
            } else {
              vErrors.push(err158);
            }
            errors++;
          }
        }
        if (data71.fertility !== void 0) {
          let data76 = data71.fertility;
          if (!(data76 === "error" || data76 === "warn")) {
            const err159 = { instancePath: instancePath + "/severity/fertility", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data76 };
            if (vErrors === null) {
              vErrors = [err159];
            } else {
              vErrors.push(err159);
            }
            errors++;
          }
        }
        if (data71.duplicates !== void 0) {
          let data77 = data71.duplicates;
          if (!(data77 === "error" || data77 === "warn")) {
            const err160 = { instancePath: instancePath + "/severity/duplicates", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data77 };
            if (vErrors === null) {
              vErrors = [err160];
            } else {
              vErrors.push(err160);
            }
            errors++;
          }
        }
        if (data71.contamination !== void 0) {
          let data78 = data71.contamination;
          if (!(data78 === "error" || data78 === "warn")) {
            const err161 = { instancePath: instancePath + "/severity/contamination", schemaPath: "#/$defs/severity/enum", keyword: "enum", params: { allowedValues: schema46.enum }, message: "must be equal to one of the allowed values", schema: schema46.enum, parentSchema: schema46, data: data78 };
            if (vErrors === null) {
              vErrors = [err161];
            } else {
              vErrors.push(err161);
            }
            errors++;
          }
        }
      } else {
        const err162 = { instancePath: instancePath + "/severity", schemaPath: "#/properties/severity/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.properties.severity.type, parentSchema: schema31.properties.severity, data: data71 };
        if (vErrors === null) {
          vErrors = [err162];
        } else {
          vErrors.push(err162);
        }
        errors++;
      }
    }
  } else {
    const err163 = { instancePath, schemaPath: "#/type", keyword: "type", params: { type: "object" }, message: "must be object", schema: schema31.type, parentSchema: schema31, data: data2 };
    if (vErrors === null) {
      vErrors = [err163];
    } else {
      vErrors.push(err163);
    }
    errors++;
  }
  validate20.errors = vErrors;
  return errors === 0;
}
validate20.evaluated = { "props": true, "dynamicProps": false, "dynamicItems": false };

// src/policy/suggest.ts
var MAX_DISTANCE = 2;
var MIN_PREFIX_LENGTH = 4;
var SHORT_KEY_LENGTH = 4;
function editDistance(a, b) {
  if (a === b) return 0;
  const m = a.length;
  const n = b.length;
  let prev2 = new Array(n + 1).fill(0);
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  let cur = new Array(n + 1).fill(0);
  for (let i = 1; i <= m; i++) {
    cur[0] = i;
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let d = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) {
        d = Math.min(d, prev2[j - 2] + 1);
      }
      cur[j] = d;
    }
    [prev2, prev, cur] = [prev, cur, prev2];
  }
  return prev[n];
}
function folded(s) {
  return s.toLowerCase().replace(/[-_\s]/g, "");
}
function sortedLetters(s) {
  return [...s].sort().join("");
}
function nearest(input, candidates) {
  const list = [...candidates];
  const want = folded(input);
  const wantLetters = sortedLetters(want);
  let best;
  let bestDistance = Infinity;
  let bestSameLetters = false;
  for (const candidate of list) {
    if (candidate === input) continue;
    const f = folded(candidate);
    const d = editDistance(want, f);
    const limit = candidate.length <= SHORT_KEY_LENGTH ? 1 : MAX_DISTANCE;
    if (d > limit) continue;
    const sameLetters = sortedLetters(f) === wantLetters;
    if (d < bestDistance || d === bestDistance && sameLetters && !bestSameLetters) {
      best = candidate;
      bestDistance = d;
      bestSameLetters = sameLetters;
    }
  }
  if (best !== void 0) return best;
  for (const candidate of list) {
    const f = folded(candidate);
    if (f.length >= MIN_PREFIX_LENGTH && want.length >= MIN_PREFIX_LENGTH && (want.startsWith(f) || f.startsWith(want))) return candidate;
  }
  return void 0;
}
function didYouMean(candidate) {
  return `did you mean \`${candidate}\`?`;
}

// src/policy/schema-check.ts
var MAX_LISTED_KEYS = 12;
var POLICY_SCHEMA = policy_schema_default;
function policyValidator() {
  return validate;
}
function checkAgainstSchema(value) {
  const validate2 = policyValidator();
  if (validate2(value)) return [];
  const issues = [];
  const seen = /* @__PURE__ */ new Set();
  const wrongType = new Set((validate2.errors ?? []).filter((e) => e.keyword === "type").map((e) => e.instancePath));
  for (const e of validate2.errors ?? []) {
    if (e.keyword !== "type" && wrongType.has(e.instancePath)) continue;
    const issue = issueOf(e, value);
    const id = `${issue.path.join("\0")}${issue.message}`;
    if (seen.has(id)) continue;
    seen.add(id);
    issues.push(issue);
  }
  return issues;
}
function pointerPath(pointer, data2) {
  if (pointer === "") return [];
  const out = [];
  let node = data2;
  for (const raw of pointer.slice(1).split("/")) {
    const seg = raw.replace(/~1/g, "/").replace(/~0/g, "~");
    if (Array.isArray(node)) {
      const i = Number(seg);
      out.push(i);
      node = node[i];
    } else {
      out.push(seg);
      node = node && typeof node === "object" ? node[seg] : void 0;
    }
  }
  return out;
}
function kindOf(value) {
  if (value === null || value === void 0) return "nothing";
  if (Array.isArray(value)) return "a list";
  if (typeof value === "object") return "a mapping";
  if (typeof value === "string") return `the text \`${value}\``;
  if (typeof value === "number") return `the number ${value}`;
  if (typeof value === "boolean") return `\`${value}\``;
  return typeof value;
}
var TYPE_WORDS = {
  object: "a mapping",
  array: "a list",
  string: "a string",
  number: "a number",
  integer: "a whole number",
  boolean: "`true` or `false`",
  null: "empty"
};
function propertyNames(s) {
  const props = s?.properties;
  return props && typeof props === "object" ? Object.keys(props) : [];
}
var keyIndex;
function schemaKeyIndex() {
  if (keyIndex) return keyIndex;
  keyIndex = /* @__PURE__ */ new Map();
  const defs = POLICY_SCHEMA.$defs ?? {};
  const visit = (s, at, depth) => {
    if (!s || depth > 8) return;
    if (typeof s.$ref === "string" && s.$ref.startsWith("#/$defs/")) visit(defs[s.$ref.slice(8)], at, depth + 1);
    for (const [k, sub] of Object.entries(s.properties ?? {})) {
      const list = keyIndex.get(k) ?? [];
      list.push(at);
      keyIndex.set(k, list);
      visit(sub, at ? `${at}.${k}` : k, depth + 1);
    }
  };
  visit(POLICY_SCHEMA, "", 0);
  return keyIndex;
}
function issueOf(e, root) {
  const path5 = pointerPath(e.instancePath, root);
  const p = e.params;
  const data2 = e.data;
  switch (e.keyword) {
    case "additionalProperties": {
      const key = String(p.additionalProperty);
      const valid = propertyNames(e.parentSchema);
      const near = nearest(key, valid);
      let message = `unknown key \`${key}\``;
      let suggestion;
      if (near) {
        suggestion = didYouMean(near);
      } else {
        const elsewhere = schemaKeyIndex().get(key);
        if (elsewhere?.length === 1) {
          suggestion = `\`${key}\` belongs under \`${elsewhere[0] || "the top level"}\``;
        } else if (valid.length > 0 && valid.length <= MAX_LISTED_KEYS) {
          message += `; expected one of ${valid.map((k) => `\`${k}\``).join(", ")}`;
        }
      }
      return { path: [...path5, key], part: "key", message, ...suggestion ? { suggestion } : {} };
    }
    case "required": {
      const key = String(p.missingProperty);
      return { path: [...path5, key], part: "key", message: `missing required key \`${key}\`` };
    }
    case "dependentRequired": {
      return {
        path: [...path5, String(p.property)],
        part: "key",
        message: `\`${String(p.property)}\` is only used together with \`${String(p.missingProperty)}\`; set \`${String(p.missingProperty)}\` too or remove it`
      };
    }
    case "false schema": {
      const m = /\/dependentSchemas\/([^/]+)\//.exec(e.schemaPath);
      const with_ = m ? m[1].replace(/~1/g, "/").replace(/~0/g, "~") : void 0;
      const key = String(path5[path5.length - 1]);
      return {
        path: path5,
        part: "key",
        message: with_ ? `set either \`${with_}\` or \`${key}\`, not both` : `\`${key}\` is not allowed here`
      };
    }
    case "type": {
      const want = [].concat(p.type).map((t) => TYPE_WORDS[t] ?? t);
      let suggestion;
      const numeric = want.includes(TYPE_WORDS.number) || want.includes(TYPE_WORDS.integer);
      if (typeof data2 === "string" && /^\s*\d+(\.\d+)?\s*%\s*$/.test(data2) && numeric) {
        suggestion = `write shares as fractions: \`${Number.parseFloat(data2) / 100}\``;
      } else if (typeof data2 === "string" && numeric && data2.trim() !== "" && Number.isFinite(Number(data2))) {
        suggestion = `write it without quotes: \`${data2.trim()}\``;
      } else if (path5.length === 2 && path5[0] === "languages" && typeof data2 === "number") {
        suggestion = `write \`${String(path5[1])}: { target: ${data2} }\``;
      } else if (typeof data2 === "string" && want.includes("a list") && want.length === 1) {
        suggestion = `write a list: \`[${data2}]\``;
      }
      return { path: path5, part: "value", message: `must be ${want.join(" or ")}, not ${kindOf(data2)}`, ...suggestion ? { suggestion } : {} };
    }
    case "enum": {
      const allowed = p.allowedValues.map(String);
      const near = typeof data2 === "string" ? nearest(data2, allowed) : void 0;
      return {
        path: path5,
        part: "value",
        message: `must be one of ${allowed.map((v) => `\`${v}\``).join(", ")}, not ${kindOf(data2)}`,
        ...near ? { suggestion: didYouMean(near) } : {}
      };
    }
    case "const": {
      return { path: path5, part: "value", message: `must be ${JSON.stringify(p.allowedValue)}, not ${kindOf(data2)}` };
    }
    case "minimum":
    case "maximum":
    case "exclusiveMinimum":
    case "exclusiveMaximum": {
      const cmp = String(p.comparison).replace(">=", "\u2265").replace("<=", "\u2264");
      let suggestion;
      if (e.keyword === "maximum" && p.limit === 1 && typeof data2 === "number" && data2 > 1 && data2 <= 100) {
        suggestion = `shares are fractions of 1: ${data2} % is \`${data2 / 100}\``;
      }
      return { path: path5, part: "value", message: `must be ${cmp} ${String(p.limit)}, not ${String(data2)}`, ...suggestion ? { suggestion } : {} };
    }
    case "minProperties": {
      const names = propertyNames(e.parentSchema);
      const dependent = new Set(Object.keys(e.parentSchema?.dependentRequired ?? {}));
      const primary = names.filter((k) => !dependent.has(k));
      const what = primary.length > 0 && primary.length <= MAX_LISTED_KEYS ? `; set ${primary.map((k) => `\`${k}\``).join(" or ")}` : "";
      return { path: path5, part: "value", message: `must not be empty${what}` };
    }
    case "minItems":
      return { path: path5, part: "value", message: "must not be an empty list" };
    case "minLength":
      return { path: path5, part: "value", message: "must not be empty" };
    case "uniqueItems":
      const item = Array.isArray(data2) ? data2[Number(p.j)] : void 0;
      return { path: path5, part: "value", message: `lists ${item === void 0 ? "an entry" : `\`${String(item)}\``} twice; each may appear once` };
    default:
      return { path: path5, part: "value", message: e.message ?? `fails the \`${e.keyword}\` check` };
  }
}

// src/policy/build.ts
import path from "node:path";
import iconv2 from "iconv-lite";

// src/policy/data/default-scripts.ts
var DEFAULT_SCRIPTS = {
  // Latin
  afr: ["Latin"],
  cat: ["Latin"],
  ceb: ["Latin"],
  ces: ["Latin"],
  cym: ["Latin"],
  dan: ["Latin"],
  deu: ["Latin"],
  ekk: ["Latin"],
  eng: ["Latin"],
  epo: ["Latin"],
  est: ["Latin"],
  eus: ["Latin"],
  fil: ["Latin"],
  fin: ["Latin"],
  fra: ["Latin"],
  gle: ["Latin"],
  glg: ["Latin"],
  hau: ["Latin"],
  hrv: ["Latin"],
  hun: ["Latin"],
  ibo: ["Latin"],
  ind: ["Latin"],
  isl: ["Latin"],
  ita: ["Latin"],
  jav: ["Latin"],
  kmr: ["Latin"],
  lav: ["Latin"],
  lit: ["Latin"],
  lvs: ["Latin"],
  mlt: ["Latin"],
  nld: ["Latin"],
  nno: ["Latin"],
  nob: ["Latin"],
  nor: ["Latin"],
  pol: ["Latin"],
  por: ["Latin"],
  ron: ["Latin"],
  slk: ["Latin"],
  slv: ["Latin"],
  som: ["Latin"],
  spa: ["Latin"],
  sqi: ["Latin"],
  als: ["Latin"],
  sun: ["Latin"],
  swa: ["Latin"],
  swe: ["Latin"],
  swh: ["Latin"],
  tgl: ["Latin"],
  tur: ["Latin"],
  vie: ["Latin"],
  xho: ["Latin"],
  yor: ["Latin"],
  zul: ["Latin"],
  // Arabic
  ara: ["Arabic"],
  arb: ["Arabic"],
  ary: ["Arabic"],
  arz: ["Arabic"],
  apc: ["Arabic"],
  ckb: ["Arabic"],
  fas: ["Arabic"],
  pes: ["Arabic"],
  prs: ["Arabic"],
  pus: ["Arabic"],
  pbu: ["Arabic"],
  pbt: ["Arabic"],
  urd: ["Arabic"],
  pnb: ["Arabic"],
  skr: ["Arabic"],
  // Cyrillic
  bel: ["Cyrillic"],
  bul: ["Cyrillic"],
  kaz: ["Cyrillic"],
  khk: ["Cyrillic"],
  kir: ["Cyrillic"],
  mkd: ["Cyrillic"],
  mon: ["Cyrillic"],
  rus: ["Cyrillic"],
  tat: ["Cyrillic"],
  tgk: ["Cyrillic"],
  ukr: ["Cyrillic"],
  // Other alphabets and abjads
  ell: ["Greek"],
  heb: ["Hebrew"],
  yid: ["Hebrew"],
  ydd: ["Hebrew"],
  hye: ["Armenian"],
  kat: ["Georgian"],
  amh: ["Ethiopic"],
  tir: ["Ethiopic"],
  div: ["Thaana"],
  // Brahmic scripts of South Asia
  hin: ["Devanagari"],
  mar: ["Devanagari"],
  nep: ["Devanagari"],
  npi: ["Devanagari"],
  san: ["Devanagari"],
  mai: ["Devanagari"],
  bho: ["Devanagari"],
  mag: ["Devanagari"],
  ben: ["Bengali"],
  asm: ["Bengali"],
  pan: ["Gurmukhi"],
  guj: ["Gujarati"],
  ori: ["Oriya"],
  ory: ["Oriya"],
  tam: ["Tamil"],
  tel: ["Telugu"],
  kan: ["Kannada"],
  mal: ["Malayalam"],
  sin: ["Sinhala"],
  // Southeast Asia and Tibet
  tha: ["Thai"],
  lao: ["Lao"],
  khm: ["Khmer"],
  mya: ["Myanmar"],
  bod: ["Tibetan"],
  // East Asia
  zho: ["Han"],
  cmn: ["Han"],
  yue: ["Han"],
  wuu: ["Han"],
  jpn: ["Han", "Hiragana", "Katakana"],
  kor: ["Hangul", "Han"]
};
var SCRIPT_CODE_VARIANTS = {
  Hans: ["Han"],
  Hant: ["Han"],
  Hanb: ["Han", "Bopomofo"],
  Jpan: ["Han", "Hiragana", "Katakana"],
  Hrkt: ["Hiragana", "Katakana"],
  Kore: ["Hangul", "Han"],
  Latf: ["Latin"],
  Latg: ["Latin"],
  Cyrs: ["Cyrillic"],
  Aran: ["Arabic"],
  Syre: ["Syriac"],
  Syrj: ["Syriac"],
  Syrn: ["Syriac"],
  Geok: ["Georgian"]
};

// src/policy/languages.ts
import { parse as parseBcp47 } from "bcp-47";

// src/policy/data/iso-639-3.generated.ts
var ISO_639_3_ROWS = "aaa|||i|Ghotuo\naab|||i|Alumu-Tesu\naac|||i|Ari\naad|||i|Amal\naae|||i|Arb\xEBresh\xEB Albanian\naaf|||i|Aranadan\naag|||i|Ambrak\naah|||i|Abu' Arapesh\naai|||i|Arifama-Miniafia\naak|||i|Ankave\naal|||i|Afade\naan|||i|Anamb\xE9\naao|||i|Algerian Saharan Arabic\naap|||i|Par\xE1 Ar\xE1ra\naaq|||i|Eastern Abnaki\naar|aar|aa|i|Afar\naas|||i|Aas\xE1x\naat|||i|Arvanitika Albanian\naau|||i|Abau\naaw|||i|Solong\naax|||i|Mandobo Atas\naaz|||i|Amarasi\naba|||i|Ab\xE9\nabb|||i|Bankon\nabc|||i|Ambala Ayta\nabd|||i|Manide\nabe|||i|Western Abnaki\nabf|||i|Abai Sungai\nabg|||i|Abaga\nabh|||i|Tajiki Arabic\nabi|||i|Abidji\nabj|||i|Aka-Bea\nabk|abk|ab|i|Abkhazian\nabl|||i|Lampung Nyo\nabm|||i|Abanyom\nabn|||i|Abua\nabo|||i|Abon\nabp|||i|Abellen Ayta\nabq|||i|Abaza\nabr|||i|Abron\nabs|||i|Ambonese Malay\nabt|||i|Ambulas\nabu|||i|Abure\nabv|||i|Baharna Arabic\nabw|||i|Pal\nabx|||i|Inabaknon\naby|||i|Aneme Wake\nabz|||i|Abui\naca|||i|Achagua\nacb|||i|\xC1nc\xE1\nacd|||i|Gikyode\nace|ace||i|Achinese\nacf|||i|Saint Lucian Creole French\nach|ach||i|Acoli\naci|||i|Aka-Cari\nack|||i|Aka-Kora\nacl|||i|Akar-Bale\nacm|||i|Mesopotamian Arabic\nacn|||i|Achang\nacp|||i|Eastern Acipa\nacq|||i|Ta'izzi-Adeni Arabic\nacr|||i|Achi\nacs|||i|Acro\xE1\nact|||i|Achterhoeks\nacu|||i|Achuar-Shiwiar\nacv|||i|Achumawi\nacw|||i|Hijazi Arabic\nacx|||i|Omani Arabic\nacy|||i|Cypriot Arabic\nacz|||i|Acheron\nada|ada||i|Adangme\nadb|||i|Atauran\nadd|||i|Lidzonka\nade|||i|Adele\nadf|||i|Dhofari Arabic\nadg|||i|Andegerebinha\nadh|||i|Adhola\nadi|||i|Adi\nadj|||i|Adioukrou\nadl|||i|Galo\nadn|||i|Adang\nado|||i|Abu\nadq|||i|Adangbe\nadr|||i|Adonara\nads|||i|Adamorobe Sign Language\nadt|||i|Adnyamathanha\nadu|||i|Aduge\nadw|||i|Amundava\nadx|||i|Amdo Tibetan\nady|ady||i|Adyghe\nadz|||i|Adzera\naea|||i|Areba\naeb|||i|Tunisian Arabic\naec|||i|Saidi Arabic\naed|||i|Argentine Sign Language\naee|||i|Northeast Pashai\naek|||i|Haeke\nael|||i|Ambele\naem|||i|Arem\naen|||i|Armenian Sign Language\naeq|||i|Aer\naer|||i|Eastern Arrernte\naes|||i|Alsea\naeu|||i|Akeu\naew|||i|Ambakich\naey|||i|Amele\naez|||i|Aeka\nafb|||i|Gulf Arabic\nafd|||i|Andai\nafe|||i|Putukwam\nafg|||i|Afghan Sign Language\nafh|afh||i|Afrihili\nafi|||i|Akrukay\nafk|||i|Nanubae\nafn|||i|Defaka\nafo|||i|Eloyi\nafp|||i|Tapei\nafr|afr|af|i|Afrikaans\nafs|||i|Afro-Seminole Creole\naft|||i|Afitti\nafu|||i|Awutu\nafz|||i|Obokuitai\naga|||i|Aguano\nagb|||i|Legbo\nagc|||i|Agatu\nagd|||i|Agarabi\nage|||i|Angal\nagf|||i|Arguni\nagg|||i|Angor\nagh|||i|Ngelima\nagi|||i|Agariya\nagj|||i|Argobba\nagk|||i|Isarog Agta\nagl|||i|Fembe\nagm|||i|Angaataha\nagn|||i|Agutaynen\nago|||i|Tainae\nagq|||i|Aghem\nagr|||i|Aguaruna\nags|||i|Esimbi\nagt|||i|Central Cagayan Agta\nagu|||i|Aguacateco\nagv|||i|Remontado Dumagat\nagw|||i|Kahua\nagx|||i|Aghul\nagy|||i|Southern Alta\nagz|||i|Mt. Iriga Agta\naha|||i|Ahanta\nahb|||i|Axamb\nahg|||i|Qimant\nahh|||i|Aghu\nahi|||i|Tiagbamrin Aizi\nahk|||i|Akha\nahl|||i|Igo\nahm|||i|Mobumrin Aizi\nahn|||i|\xC0h\xE0n\naho|||i|Ahom\nahp|||i|Aproumu Aizi\nahr|||i|Ahirani\nahs|||i|Ashe\naht|||i|Ahtena\naia|||i|Arosi\naib|||i|Ainu (China)\naic|||i|Ainbai\naid|||i|Alngith\naie|||i|Amara\naif|||i|Agi\naig|||i|Antigua and Barbuda Creole English\naih|||i|Ai-Cham\naii|||i|Assyrian Neo-Aramaic\naij|||i|Lishanid Noshan\naik|||i|Ake\nail|||i|Aimele\naim|||i|Aimol\nain|ain||i|Ainu (Japan)\naio|||i|Aiton\naip|||i|Burumakok\naiq|||i|Aimaq\nair|||i|Airoran\nait|||i|Arikem\naiw|||i|Aari\naix|||i|Aighon\naiy|||i|Ali\naja|||i|Aja (South Sudan)\najg|||i|Aja (Benin)\naji|||i|Aji\xEB\najn|||i|Andajin\najp|||i|South Levantine Arabic\najt|||i|Judeo-Tunisian Arabic\naju|||i|Judeo-Moroccan Arabic\najw|||i|Ajawa\najz|||i|Amri Karbi\naka|aka|ak|m|Akan\nakb|||i|Batak Angkola\nakc|||i|Mpur\nakd|||i|Ukpet-Ehom\nake|||i|Akawaio\nakf|||i|Akpa\nakg|||i|Anakalangu\nakh|||i|Angal Heneng\naki|||i|Aiome\nakj|||i|Aka-Jeru\nakk|akk||i|Akkadian\nakl|||i|Aklanon\nakm|||i|Aka-Bo\nako|||i|Akurio\nakp|||i|Siwu\nakq|||i|Ak\nakr|||i|Araki\naks|||i|Akaselem\nakt|||i|Akolet\naku|||i|Akum\nakv|||i|Akhvakh\nakw|||i|Akwa\nakx|||i|Aka-Kede\naky|||i|Aka-Kol\nakz|||i|Alabama\nala|||i|Alago\nalc|||i|Qawasqar\nald|||i|Alladian\nale|ale||i|Aleut\nalf|||i|Alege\nalh|||i|Alawa\nali|||i|Amaimon\nalj|||i|Alangan\nalk|||i|Alak\nall|||i|Allar\nalm|||i|Amblong\naln|||i|Gheg Albanian\nalo|||i|Larike-Wakasihu\nalp|||i|Alune\nalq|||i|Algonquin\nalr|||i|Alutor\nals|||i|Tosk Albanian\nalt|alt||i|Southern Altai\nalu|||i|'Are'are\nalw|||i|Alaba-K\u2019abeena\nalx|||i|Amol\naly|||i|Alyawarr\nalz|||i|Alur\nama|||i|Amanay\xE9\namb|||i|Ambo\namc|||i|Amahuaca\name|||i|Yanesha'\namf|||i|Hamer-Banna\namg|||i|Amurdak\namh|amh|am|i|Amharic\nami|||i|Amis\namj|||i|Amdang\namk|||i|Ambai\naml|||i|War-Jaintia\namm|||i|Ama (Papua New Guinea)\namn|||i|Amanab\namo|||i|Amo\namp|||i|Alamblak\namq|||i|Amahai\namr|||i|Amarakaeri\nams|||i|Southern Amami-Oshima\namt|||i|Amto\namu|||i|Guerrero Amuzgo\namv|||i|Ambelau\namw|||i|Western Neo-Aramaic\namx|||i|Anmatyerre\namy|||i|Ami\namz|||i|Atampaya\nana|||i|Andaqui\nanb|||i|Andoa\nanc|||i|Ngas\nand|||i|Ansus\nane|||i|X\xE2r\xE2c\xF9\xF9\nanf|||i|Animere\nang|ang||i|Old English (ca. 450-1100)\nanh|||i|Nend\nani|||i|Andi\nanj|||i|Anor\nank|||i|Goemai\nanl|||i|Anu-Hkongso Chin\nanm|||i|Anal\nann|||i|Obolo\nano|||i|Andoque\nanp|anp||i|Angika\nanq|||i|Jarawa (India)\nanr|||i|Andh\nans|||i|Anserma\nant|||i|Antakarinya\nanu|||i|Anuak\nanv|||i|Denya\nanw|||i|Anaang\nanx|||i|Andra-Hus\nany|||i|Anyin\nanz|||i|Anem\naoa|||i|Angolar\naob|||i|Abom\naoc|||i|Pemon\naod|||i|Andarum\naoe|||i|Angal Enen\naof|||i|Bragat\naog|||i|Angoram\naoi|||i|Anindilyakwa\naoj|||i|Mufian\naok|||i|Arh\xF6\naol|||i|Alor\naom|||i|\xD6mie\naon|||i|Bumbita Arapesh\naor|||i|Aore\naos|||i|Taikat\naot|||i|Atong (India)\naou|||i|A'ou\naox|||i|Atorada\naoz|||i|Uab Meto\napb|||i|Sa'a\napc|||i|North Levantine Arabic\napd|||i|Sudanese Arabic\nape|||i|Bukiyip\napf|||i|Pahanan Agta\napg|||i|Ampanang\naph|||i|Athpariya\napi|||i|Apiak\xE1\napj|||i|Jicarilla Apache\napk|||i|Kiowa Apache\napl|||i|Lipan Apache\napm|||i|Mescalero-Chiricahua Apache\napn|||i|Apinay\xE9\napo|||i|Ambul\napp|||i|Apma\napq|||i|A-Pucikwar\napr|||i|Arop-Lokep\naps|||i|Arop-Sissano\napt|||i|Apatani\napu|||i|Apurin\xE3\napv|||i|Alapmunte\napw|||i|Western Apache\napx|||i|Aputai\napy|||i|Apala\xED\napz|||i|Safeyoka\naqc|||i|Archi\naqd|||i|Ampari Dogon\naqg|||i|Arigidi\naqm|||i|Atohwaim\naqn|||i|Northern Alta\naqp|||i|Atakapa\naqr|||i|Arh\xE2\naqt|||i|Angait\xE9\naqz|||i|Akuntsu\nara|ara|ar|m|Arabic\narb|||i|Standard Arabic\narc|arc||i|Official Aramaic (700-300 BCE)\nard|||i|Arabana\nare|||i|Western Arrarnta\narg|arg|an|i|Aragonese\narh|||i|Arhuaco\nari|||i|Arikara\narj|||i|Arapaso\nark|||i|Arikap\xFA\narl|||i|Arabela\narn|arn||i|Mapudungun\naro|||i|Araona\narp|arp||i|Arapaho\narq|||i|Algerian Arabic\narr|||i|Karo (Brazil)\nars|||i|Najdi Arabic\naru|||i|Aru\xE1 (Amazonas State)\narv|||i|Arbore\narw|arw||i|Arawak\narx|||i|Aru\xE1 (Rodonia State)\nary|||i|Moroccan Arabic\narz|||i|Egyptian Arabic\nasa|||i|Asu (Tanzania)\nasb|||i|Assiniboine\nasc|||i|Casuarina Coast Asmat\nase|||i|American Sign Language\nasf|||i|Auslan\nasg|||i|Cishingini\nash|||i|Abishira\nasi|||i|Buruwai\nasj|||i|Sari\nask|||i|Ashkun\nasl|||i|Asilulu\nasm|asm|as|i|Assamese\nasn|||i|Xing\xFA Asurin\xED\naso|||i|Dano\nasp|||i|Algerian Sign Language\nasq|||i|Austrian Sign Language\nasr|||i|Asuri\nass|||i|Ipulo\nast|ast||i|Asturian\nasu|||i|Tocantins Asurini\nasv|||i|Asoa\nasw|||i|Australian Aborigines Sign Language\nasx|||i|Muratayak\nasy|||i|Yaosakor Asmat\nasz|||i|As\nata|||i|Pele-Ata\natb|||i|Zaiwa\natc|||i|Atsahuaca\natd|||i|Ata Manobo\nate|||i|Atemble\natg|||i|Ivbie North-Okpela-Arhe\nati|||i|Atti\xE9\natj|||i|Atikamekw\natk|||i|Ati\natl|||i|Mt. Iraya Agta\natm|||i|Ata\natn|||i|Ashtiani\nato|||i|Atong (Cameroon)\natp|||i|Pudtol Atta\natq|||i|Aralle-Tabulahan\natr|||i|Waimiri-Atroari\nats|||i|Gros Ventre\natt|||i|Pamplona Atta\natu|||i|Reel\natv|||i|Northern Altai\natw|||i|Atsugewi\natx|||i|Arutani\naty|||i|Aneityum\natz|||i|Arta\naua|||i|Asumboa\naub|||i|Alugu\nauc|||i|Waorani\naud|||i|Anuta\naug|||i|Aguna\nauh|||i|Aushi\naui|||i|Anuki\nauj|||i|Awjilah\nauk|||i|Heyo\naul|||i|Aulua\naum|||i|Asu (Nigeria)\naun|||i|Molmo One\nauo|||i|Auyokawa\naup|||i|Makayam\nauq|||i|Anus\naur|||i|Aruek\naut|||i|Austral\nauu|||i|Auye\nauw|||i|Awyi\naux|||i|Aur\xE1\nauy|||i|Awiyaana\nauz|||i|Uzbeki Arabic\nava|ava|av|i|Avaric\navb|||i|Avau\navd|||i|Alviri-Vidari\nave|ave|ae|i|Avestan\navi|||i|Avikam\navk|||i|Kotava\navl|||i|Eastern Egyptian Bedawi Arabic\navm|||i|Angkamuthi\navn|||i|Avatime\navo|||i|Agavotaguerra\navs|||i|Aushiri\navt|||i|Au\navu|||i|Avokaya\navv|||i|Av\xE1-Canoeiro\nawa|awa||i|Awadhi\nawb|||i|Awa (Papua New Guinea)\nawc|||i|Cicipu\nawe|||i|Awet\xED\nawg|||i|Anguthimri\nawh|||i|Awbono\nawi|||i|Aekyom\nawk|||i|Awabakal\nawm|||i|Arawum\nawn|||i|Awngi\nawo|||i|Awak\nawr|||i|Awera\naws|||i|South Awyu\nawt|||i|Arawet\xE9\nawu|||i|Central Awyu\nawv|||i|Jair Awyu\naww|||i|Awun\nawx|||i|Awara\nawy|||i|Edera Awyu\naxb|||i|Abipon\naxe|||i|Ayerrerenge\naxg|||i|Mato Grosso Ar\xE1ra\naxk|||i|Yaka (Central African Republic)\naxl|||i|Lower Southern Aranda\naxm|||i|Middle Armenian\naxx|||i|X\xE2r\xE2gur\xE8\naya|||i|Awar\nayb|||i|Ayizo Gbe\nayc|||i|Southern Aymara\nayd|||i|Ayabadhu\naye|||i|Ayere\nayg|||i|Ginyanga\nayh|||i|Hadrami Arabic\nayi|||i|Leyigha\nayk|||i|Akuku\nayl|||i|Libyan Arabic\naym|aym|ay|m|Aymara\nayn|||i|Sanaani Arabic\nayo|||i|Ayoreo\nayp|||i|North Mesopotamian Arabic\nayq|||i|Ayi (Papua New Guinea)\nayr|||i|Central Aymara\nays|||i|Sorsogon Ayta\nayt|||i|Magbukun Ayta\nayu|||i|Ayu\nayz|||i|Mai Brat\naza|||i|Azha\nazb|||i|South Azerbaijani\nazd|||i|Eastern Durango Nahuatl\naze|aze|az|m|Azerbaijani\nazg|||i|San Pedro Amuzgos Amuzgo\nazj|||i|North Azerbaijani\nazm|||i|Ipalapa Amuzgo\nazn|||i|Western Durango Nahuatl\nazo|||i|Awing\nazt|||i|Faire Atta\nazz|||i|Highland Puebla Nahuatl\nbaa|||i|Babatana\nbab|||i|Bainouk-Gunyu\xF1o\nbac|||i|Badui\nbae|||i|Bar\xE9\nbaf|||i|Nubaca\nbag|||i|Tuki\nbah|||i|Bahamas Creole English\nbaj|||i|Barakai\nbak|bak|ba|i|Bashkir\nbal|bal||m|Baluchi\nbam|bam|bm|i|Bambara\nban|ban||i|Balinese\nbao|||i|Waimaha\nbap|||i|Bantawa\nbar|||i|Bavarian\nbas|bas||i|Basa (Cameroon)\nbau|||i|Bada (Nigeria)\nbav|||i|Vengo\nbaw|||i|Bambili-Bambui\nbax|||i|Bamun\nbay|||i|Batuley\nbba|||i|Baatonum\nbbb|||i|Barai\nbbc|||i|Batak Toba\nbbd|||i|Bau\nbbe|||i|Bangba\nbbf|||i|Baibai\nbbg|||i|Barama\nbbh|||i|Bugan\nbbi|||i|Barombi\nbbj|||i|Ghom\xE1l\xE1'\nbbk|||i|Babanki\nbbl|||i|Bats\nbbm|||i|Babango\nbbn|||i|Uneapa\nbbo|||i|Northern Bobo Madar\xE9\nbbp|||i|West Central Banda\nbbq|||i|Bamali\nbbr|||i|Girawa\nbbs|||i|Bakpinka\nbbt|||i|Mburku\nbbu|||i|Kulung (Nigeria)\nbbv|||i|Karnai\nbbw|||i|Baba\nbbx|||i|Bubia\nbby|||i|Befang\nbca|||i|Central Bai\nbcb|||i|Bainouk-Samik\nbcc|||i|Southern Balochi\nbcd|||i|North Babar\nbce|||i|Bamenyam\nbcf|||i|Bamu\nbcg|||i|Baga Pokur\nbch|||i|Bariai\nbci|||i|Baoul\xE9\nbcj|||i|Bardi\nbck|||i|Bunuba\nbcl|||i|Central Bikol\nbcm|||i|Bannoni\nbcn|||i|Bali (Nigeria)\nbco|||i|Kaluli\nbcp|||i|Bali (Democratic Republic of Congo)\nbcq|||i|Bench\nbcr|||i|Babine\nbcs|||i|Kohumono\nbct|||i|Bendi\nbcu|||i|Awad Bing\nbcv|||i|Shoo-Minda-Nye\nbcw|||i|Bana\nbcy|||i|Bacama\nbcz|||i|Bainouk-Gunyaamolo\nbda|||i|Bayot\nbdb|||i|Basap\nbdc|||i|Ember\xE1-Baud\xF3\nbdd|||i|Bunama\nbde|||i|Bade\nbdf|||i|Biage\nbdg|||i|Bonggi\nbdh|||i|Baka (South Sudan)\nbdi|||i|Burun\nbdj|||i|Bai (South Sudan)\nbdk|||i|Budukh\nbdl|||i|Indonesian Bajau\nbdm|||i|Buduma\nbdn|||i|Baldemu\nbdo|||i|Morom\nbdp|||i|Bende\nbdq|||i|Bahnar\nbdr|||i|West Coast Bajau\nbds|||i|Burunge\nbdt|||i|Bokoto\nbdu|||i|Oroko\nbdv|||i|Bodo Parja\nbdw|||i|Baham\nbdx|||i|Budong-Budong\nbdy|||i|Bandjalang\nbdz|||i|Badeshi\nbea|||i|Beaver\nbeb|||i|Bebele\nbec|||i|Iceve-Maci\nbed|||i|Bedoanas\nbee|||i|Byangsi\nbef|||i|Benabena\nbeg|||i|Belait\nbeh|||i|Biali\nbei|||i|Bekati'\nbej|bej||i|Beja\nbek|||i|Bebeli\nbel|bel|be|i|Belarusian\nbem|bem||i|Bemba (Zambia)\nben|ben|bn|i|Bengali\nbeo|||i|Beami\nbep|||i|Besoa\nbeq|||i|Beembe\nbes|||i|Besme\nbet|||i|Guiberoua B\xE9te\nbeu|||i|Blagar\nbev|||i|Daloa B\xE9t\xE9\nbew|||i|Betawi\nbex|||i|Jur Modo\nbey|||i|Beli (Papua New Guinea)\nbez|||i|Bena (Tanzania)\nbfa|||i|Bari\nbfb|||i|Pauri Bareli\nbfc|||i|Panyi Bai\nbfd|||i|Bafut\nbfe|||i|Betaf\nbff|||i|Bofi\nbfg|||i|Busang Kayan\nbfh|||i|Blafe\nbfi|||i|British Sign Language\nbfj|||i|Bafanji\nbfk|||i|Ban Khor Sign Language\nbfl|||i|Banda-Nd\xE9l\xE9\nbfm|||i|Mmen\nbfn|||i|Bunak\nbfo|||i|Malba Birifor\nbfp|||i|Beba\nbfq|||i|Badaga\nbfr|||i|Bazigar\nbfs|||i|Southern Bai\nbft|||i|Balti\nbfu|||i|Gahri\nbfw|||i|Bondo\nbfx|||i|Bantayanon\nbfy|||i|Bagheli\nbfz|||i|Mahasu Pahari\nbga|||i|Gwamhi-Wuri\nbgb|||i|Bobongko\nbgc|||i|Haryanvi\nbgd|||i|Rathwi Bareli\nbge|||i|Bauria\nbgf|||i|Bangandu\nbgg|||i|Bugun\nbgi|||i|Giangan\nbgj|||i|Bangolan\nbgk|||i|Bit\nbgl|||i|Bo (Laos)\nbgn|||i|Western Balochi\nbgo|||i|Baga Koga\nbgp|||i|Eastern Balochi\nbgq|||i|Bagri\nbgr|||i|Bawm Chin\nbgs|||i|Tagabawa\nbgt|||i|Bughotu\nbgu|||i|Mbongno\nbgv|||i|Warkay-Bipim\nbgw|||i|Bhatri\nbgx|||i|Balkan Gagauz Turkish\nbgy|||i|Benggoi\nbgz|||i|Banggai\nbha|||i|Bharia\nbhb|||i|Bhili\nbhc|||i|Biga\nbhd|||i|Bhadrawahi\nbhe|||i|Bhaya\nbhf|||i|Odiai\nbhg|||i|Binandere\nbhh|||i|Bukharic\nbhi|||i|Bhilali\nbhj|||i|Bahing\nbhl|||i|Bimin\nbhm|||i|Bathari\nbhn|||i|Bohtan Neo-Aramaic\nbho|bho||i|Bhojpuri\nbhp|||i|Bima\nbhq|||i|Tukang Besi South\nbhr|||i|Bara Malagasy\nbhs|||i|Buwal\nbht|||i|Bhattiyali\nbhu|||i|Bhunjia\nbhv|||i|Bahau\nbhw|||i|Biak\nbhx|||i|Bhalay\nbhy|||i|Bhele\nbhz|||i|Bada (Indonesia)\nbia|||i|Badimaya\nbib|||i|Bissa\nbic|||i|Bikaru\nbid|||i|Bidiyo\nbie|||i|Bepour\nbif|||i|Biafada\nbig|||i|Biangai\nbij|||i|Vaghat-Ya-Bijim-Legeri\nbik|bik||m|Bikol\nbil|||i|Bile\nbim|||i|Bimoba\nbin|bin||i|Bini\nbio|||i|Nai\nbip|||i|Bila\nbiq|||i|Bipi\nbir|||i|Bisorio\nbis|bis|bi|i|Bislama\nbit|||i|Berinomo\nbiu|||i|Biete\nbiv|||i|Southern Birifor\nbiw|||i|Kol (Cameroon)\nbix|||i|Bijori\nbiy|||i|Birhor\nbiz|||i|Baloi\nbja|||i|Budza\nbjb|||i|Banggarla\nbjc|||i|Bariji\nbje|||i|Biao-Jiao Mien\nbjf|||i|Barzani Jewish Neo-Aramaic\nbjg|||i|Bidyogo\nbjh|||i|Bahinemo\nbji|||i|Burji\nbjj|||i|Kanauji\nbjk|||i|Barok\nbjl|||i|Bulu (Papua New Guinea)\nbjm|||i|Bajelani\nbjn|||i|Banjar\nbjo|||i|Mid-Southern Banda\nbjp|||i|Fanamaket\nbjr|||i|Binumarien\nbjs|||i|Bajan\nbjt|||i|Balanta-Ganja\nbju|||i|Busuu\nbjv|||i|Bedjond\nbjw|||i|Bakw\xE9\nbjx|||i|Banao Itneg\nbjy|||i|Bayali\nbjz|||i|Baruga\nbka|||i|Kyak\nbkc|||i|Baka (Cameroon)\nbkd|||i|Binukid\nbkf|||i|Beeke\nbkg|||i|Buraka\nbkh|||i|Bakoko\nbki|||i|Baki\nbkj|||i|Pande\nbkk|||i|Brokskat\nbkl|||i|Berik\nbkm|||i|Kom (Cameroon)\nbkn|||i|Bukitan\nbko|||i|Kwa'\nbkp|||i|Boko (Democratic Republic of Congo)\nbkq|||i|Bakair\xED\nbkr|||i|Bakumpai\nbks|||i|Northern Sorsoganon\nbkt|||i|Boloki\nbku|||i|Buhid\nbkv|||i|Bekwarra\nbkw|||i|Bekwel\nbkx|||i|Baikeno\nbky|||i|Bokyi\nbkz|||i|Bungku\nbla|bla||i|Siksika\nblb|||i|Bilua\nblc|||i|Bella Coola\nbld|||i|Bolango\nble|||i|Balanta-Kentohe\nblf|||i|Buol\nblg|||i|Balau\nblh|||i|Kuwaa\nbli|||i|Bolia\nblj|||i|Bolongan\nblk|||i|Pa'o Karen\nbll|||i|Biloxi\nblm|||i|Beli (South Sudan)\nbln|||i|Southern Catanduanes Bikol\nblo|||i|Anii\nblp|||i|Blablanga\nblq|||i|Baluan-Pam\nblr|||i|Blang\nbls|||i|Balaesang\nblt|||i|Tai Dam\nblv|||i|Kibala\nblw|||i|Balangao\nblx|||i|Mag-Indi Ayta\nbly|||i|Notre\nblz|||i|Balantak\nbma|||i|Lame\nbmb|||i|Bembe\nbmc|||i|Biem\nbmd|||i|Baga Manduri\nbme|||i|Limassa\nbmf|||i|Bom-Kim\nbmg|||i|Bamwe\nbmh|||i|Kein\nbmi|||i|Bagirmi\nbmj|||i|Bote-Majhi\nbmk|||i|Ghayavi\nbml|||i|Bomboli\nbmm|||i|Northern Betsimisaraka Malagasy\nbmn|||i|Bina (Papua New Guinea)\nbmo|||i|Bambalang\nbmp|||i|Bulgebi\nbmq|||i|Bomu\nbmr|||i|Muinane\nbms|||i|Bilma Kanuri\nbmt|||i|Biao Mon\nbmu|||i|Somba-Siawari\nbmv|||i|Bum\nbmw|||i|Bomwali\nbmx|||i|Baimak\nbmz|||i|Baramu\nbna|||i|Bonerate\nbnb|||i|Bookan\nbnc|||m|Bontok\nbnd|||i|Banda (Indonesia)\nbne|||i|Bintauna\nbnf|||i|Masiwang\nbng|||i|Benga\nbni|||i|Bangi\nbnj|||i|Eastern Tawbuid\nbnk|||i|Bierebo\nbnl|||i|Boon\nbnm|||i|Batanga\nbnn|||i|Bunun\nbno|||i|Bantoanon\nbnp|||i|Bola\nbnq|||i|Bantik\nbnr|||i|Butmas-Tur\nbns|||i|Bundeli\nbnu|||i|Bentong\nbnv|||i|Bonerif\nbnw|||i|Bisis\nbnx|||i|Bangubangu\nbny|||i|Bintulu\nbnz|||i|Beezen\nboa|||i|Bora\nbob|||i|Aweer\nbod|tib|bo|i|Tibetan\nboe|||i|Mundabli\nbof|||i|Bolon\nbog|||i|Bamako Sign Language\nboh|||i|Boma\nboi|||i|Barbare\xF1o\nboj|||i|Anjam\nbok|||i|Bonjo\nbol|||i|Bole\nbom|||i|Berom\nbon|||i|Bine\nboo|||i|Tiemac\xE8w\xE8 Bozo\nbop|||i|Bonkiman\nboq|||i|Bogaya\nbor|||i|Bor\xF4ro\nbos|bos|bs|i|Bosnian\nbot|||i|Bongo\nbou|||i|Bondei\nbov|||i|Tuwuli\nbow|||i|Rema\nbox|||i|Buamu\nboy|||i|Bodo (Central African Republic)\nboz|||i|Ti\xE9yaxo Bozo\nbpa|||i|Daakaka\nbpd|||i|Banda-Banda\nbpg|||i|Bonggo\nbph|||i|Botlikh\nbpi|||i|Bagupi\nbpj|||i|Binji\nbpk|||i|Orowe\nbpl|||i|Broome Pearling Lugger Pidgin\nbpm|||i|Biyom\nbpn|||i|Dzao Min\nbpo|||i|Anasi\nbpp|||i|Kaure\nbpq|||i|Banda Malay\nbpr|||i|Koronadal Blaan\nbps|||i|Sarangani Blaan\nbpt|||i|Barrow Point\nbpu|||i|Bongu\nbpv|||i|Bian Marind\nbpw|||i|Bo (Papua New Guinea)\nbpx|||i|Palya Bareli\nbpy|||i|Bishnupriya\nbpz|||i|Bilba\nbqa|||i|Tchumbuli\nbqb|||i|Bagusa\nbqc|||i|Boko (Benin)\nbqd|||i|Bung\nbqf|||i|Baga Kaloum\nbqg|||i|Bago-Kusuntu\nbqh|||i|Baima\nbqi|||i|Bakhtiari\nbqj|||i|Bandial\nbqk|||i|Banda-Mbr\xE8s\nbql|||i|Bilakura\nbqm|||i|Wumboko\nbqn|||i|Bulgarian Sign Language\nbqo|||i|Balo\nbqp|||i|Busa\nbqq|||i|Biritai\nbqr|||i|Burusu\nbqs|||i|Bosngun\nbqt|||i|Bamukumbit\nbqu|||i|Boguru\nbqv|||i|Koro Wachi\nbqw|||i|Buru (Nigeria)\nbqx|||i|Baangi\nbqy|||i|Bengkala Sign Language\nbqz|||i|Bakaka\nbra|bra||i|Braj\nbrb|||i|Lave\nbrc|||i|Berbice Creole Dutch\nbrd|||i|Baraamu\nbre|bre|br|i|Breton\nbrf|||i|Bira\nbrg|||i|Baure\nbrh|||i|Brahui\nbri|||i|Mokpwe\nbrj|||i|Bieria\nbrk|||i|Birked\nbrl|||i|Birwa\nbrm|||i|Barambu\nbrn|||i|Boruca\nbro|||i|Brokkat\nbrp|||i|Barapasi\nbrq|||i|Breri\nbrr|||i|Birao\nbrs|||i|Baras\nbrt|||i|Bitare\nbru|||i|Eastern Bru\nbrv|||i|Western Bru\nbrw|||i|Bellari\nbrx|||i|Bodo (India)\nbry|||i|Burui\nbrz|||i|Bilbil\nbsa|||i|Abinomn\nbsb|||i|Brunei Bisaya\nbsc|||i|Bassari\nbse|||i|Wushi\nbsf|||i|Bauchi\nbsg|||i|Bashkardi\nbsh|||i|Kati\nbsi|||i|Bassossi\nbsj|||i|Bangwinji\nbsk|||i|Burushaski\nbsl|||i|Basa-Gumna\nbsm|||i|Busami\nbsn|||i|Barasana-Eduria\nbso|||i|Buso\nbsp|||i|Baga Sitemu\nbsq|||i|Bassa\nbsr|||i|Bassa-Kontagora\nbss|||i|Akoose\nbst|||i|Basketo\nbsu|||i|Bahonsuai\nbsv|||i|Baga Soban\xE9\nbsw|||i|Baiso\nbsx|||i|Yangkam\nbsy|||i|Sabah Bisaya\nbta|||i|Bata\nbtc|||i|Bati (Cameroon)\nbtd|||i|Batak Dairi\nbte|||i|Gamo-Ningi\nbtf|||i|Birgit\nbtg|||i|Gagnoa B\xE9t\xE9\nbth|||i|Biatah Bidayuh\nbti|||i|Burate\nbtj|||i|Bacanese Malay\nbtm|||i|Batak Mandailing\nbtn|||i|Ratagnon\nbto|||i|Rinconada Bikol\nbtp|||i|Budibud\nbtq|||i|Batek\nbtr|||i|Baetora\nbts|||i|Batak Simalungun\nbtt|||i|Bete-Bendi\nbtu|||i|Batu\nbtv|||i|Bateri\nbtw|||i|Butuanon\nbtx|||i|Batak Karo\nbty|||i|Bobot\nbtz|||i|Batak Alas-Kluet\nbua|bua||m|Buriat\nbub|||i|Bua\nbuc|||i|Bushi\nbud|||i|Ntcham\nbue|||i|Beothuk\nbuf|||i|Bushoong\nbug|bug||i|Buginese\nbuh|||i|Younuo Bunu\nbui|||i|Bongili\nbuj|||i|Basa-Gurmana\nbuk|||i|Bugawac\nbul|bul|bg|i|Bulgarian\nbum|||i|Bulu (Cameroon)\nbun|||i|Sherbro\nbuo|||i|Terei\nbup|||i|Busoa\nbuq|||i|Brem\nbus|||i|Bokobaru\nbut|||i|Bungain\nbuu|||i|Budu\nbuv|||i|Bun\nbuw|||i|Bubi\nbux|||i|Boghom\nbuy|||i|Bullom So\nbuz|||i|Bukwen\nbva|||i|Barein\nbvb|||i|Bube\nbvc|||i|Baelelea\nbvd|||i|Baeggu\nbve|||i|Berau Malay\nbvf|||i|Boor\nbvg|||i|Bonkeng\nbvh|||i|Bure\nbvi|||i|Belanda Viri\nbvj|||i|Baan\nbvk|||i|Bukat\nbvl|||i|Bolivian Sign Language\nbvm|||i|Bamunka\nbvn|||i|Buna\nbvo|||i|Bolgo\nbvp|||i|Bumang\nbvq|||i|Birri\nbvr|||i|Burarra\nbvt|||i|Bati (Indonesia)\nbvu|||i|Bukit Malay\nbvv|||i|Baniva\nbvw|||i|Boga\nbvx|||i|Dibole\nbvy|||i|Baybayanon\nbvz|||i|Bauzi\nbwa|||i|Bwatoo\nbwb|||i|Namosi-Naitasiri-Serua\nbwc|||i|Bwile\nbwd|||i|Bwaidoka\nbwe|||i|Bwe Karen\nbwf|||i|Boselewa\nbwg|||i|Barwe\nbwh|||i|Bishuo\nbwi|||i|Baniwa\nbwj|||i|L\xE1\xE1 L\xE1\xE1 Bwamu\nbwk|||i|Bauwaki\nbwl|||i|Bwela\nbwm|||i|Biwat\nbwn|||i|Wunai Bunu\nbwo|||i|Boro (Ethiopia)\nbwp|||i|Mandobo Bawah\nbwq|||i|Southern Bobo Madar\xE9\nbwr|||i|Bura-Pabir\nbws|||i|Bomboma\nbwt|||i|Bafaw-Balong\nbwu|||i|Buli (Ghana)\nbww|||i|Bwa\nbwx|||i|Bu-Nao Bunu\nbwy|||i|Cwi Bwamu\nbwz|||i|Bwisi\nbxa|||i|Tairaha\nbxb|||i|Belanda Bor\nbxc|||i|Molengue\nbxd|||i|Pela\nbxe|||i|Birale\nbxf|||i|Bilur\nbxg|||i|Bangala\nbxh|||i|Buhutu\nbxi|||i|Pirlatapa\nbxj|||i|Bayungu\nbxk|||i|Bukusu\nbxl|||i|Jalkunan\nbxm|||i|Mongolia Buriat\nbxn|||i|Burduna\nbxo|||i|Barikanchi\nbxp|||i|Bebil\nbxq|||i|Beele\nbxr|||i|Russia Buriat\nbxs|||i|Busam\nbxu|||i|China Buriat\nbxv|||i|Berakou\nbxw|||i|Bankagooma\nbxz|||i|Binahari\nbya|||i|Batak\nbyb|||i|Bikya\nbyc|||i|Ubaghara\nbyd|||i|Benyadu'\nbye|||i|Pouye\nbyf|||i|Bete\nbyg|||i|Baygo\nbyh|||i|Bhujel\nbyi|||i|Buyu\nbyj|||i|Bina (Nigeria)\nbyk|||i|Biao\nbyl|||i|Bayono\nbym|||i|Bidjara\nbyn|byn||i|Bilin\nbyo|||i|Biyo\nbyp|||i|Bumaji\nbyq|||i|Basay\nbyr|||i|Baruya\nbys|||i|Burak\nbyt|||i|Berti\nbyv|||i|Medumba\nbyw|||i|Belhariya\nbyx|||i|Qaqet\nbyz|||i|Banaro\nbza|||i|Bandi\nbzb|||i|Andio\nbzc|||i|Southern Betsimisaraka Malagasy\nbzd|||i|Bribri\nbze|||i|Jenaama Bozo\nbzf|||i|Boikin\nbzg|||i|Babuza\nbzh|||i|Mapos Buang\nbzi|||i|Bisu\nbzj|||i|Belize Kriol English\nbzk|||i|Nicaragua Creole English\nbzl|||i|Boano (Sulawesi)\nbzm|||i|Bolondo\nbzn|||i|Boano (Maluku)\nbzo|||i|Bozaba\nbzp|||i|Kemberano\nbzq|||i|Buli (Indonesia)\nbzr|||i|Biri\nbzs|||i|Brazilian Sign Language\nbzt|||i|Brithenig\nbzu|||i|Burmeso\nbzv|||i|Naami\nbzw|||i|Basa (Nigeria)\nbzx|||i|K\u025Bl\u025Bngaxo Bozo\nbzy|||i|Obanliku\nbzz|||i|Evant\ncaa|||i|Chort\xED\ncab|||i|Garifuna\ncac|||i|Chuj\ncad|cad||i|Caddo\ncae|||i|Lehar\ncaf|||i|Southern Carrier\ncag|||i|Nivacl\xE9\ncah|||i|Cahuarano\ncaj|||i|Chan\xE9\ncak|||i|Kaqchikel\ncal|||i|Carolinian\ncam|||i|Cemuh\xEE\ncan|||i|Chambri\ncao|||i|Ch\xE1cobo\ncap|||i|Chipaya\ncaq|||i|Car Nicobarese\ncar|car||i|Galibi Carib\ncas|||i|Tsiman\xE9\ncat|cat|ca|i|Catalan\ncav|||i|Cavine\xF1a\ncaw|||i|Callawalla\ncax|||i|Chiquitano\ncay|||i|Cayuga\ncaz|||i|Canichana\ncbb|||i|Cabiyar\xED\ncbc|||i|Carapana\ncbd|||i|Carijona\ncbg|||i|Chimila\ncbi|||i|Chachi\ncbj|||i|Ede Cabe\ncbk|||i|Chavacano\ncbl|||i|Bualkhaw Chin\ncbn|||i|Nyahkur\ncbo|||i|Izora\ncbq|||i|Tsucuba\ncbr|||i|Cashibo-Cacataibo\ncbs|||i|Cashinahua\ncbt|||i|Chayahuita\ncbu|||i|Candoshi-Shapra\ncbv|||i|Cacua\ncbw|||i|Kinabalian\ncby|||i|Carabayo\nccc|||i|Chamicuro\nccd|||i|Cafundo Creole\ncce|||i|Chopi\nccg|||i|Samba Daka\ncch|||i|Atsam\nccj|||i|Kasanga\nccl|||i|Cutchi-Swahili\nccm|||i|Malaccan Creole Malay\ncco|||i|Comaltepec Chinantec\nccp|||i|Chakma\nccr|||i|Cacaopera\ncda|||i|Choni\ncde|||i|Chenchu\ncdf|||i|Chiru\ncdh|||i|Chambeali\ncdi|||i|Chodri\ncdj|||i|Churahi\ncdm|||i|Chepang\ncdn|||i|Chaudangsi\ncdo|||i|Min Dong Chinese\ncdr|||i|Cinda-Regi-Tiyal\ncds|||i|Chadian Sign Language\ncdy|||i|Chadong\ncdz|||i|Koda\ncea|||i|Lower Chehalis\nceb|ceb||i|Cebuano\nceg|||i|Chamacoco\ncek|||i|Eastern Khumi Chin\ncen|||i|Cen\nces|cze|cs|i|Czech\ncet|||i|Cent\xFA\xFAm\ncey|||i|Ekai Chin\ncfa|||i|Dijim-Bwilim\ncfd|||i|Cara\ncfg|||i|Como Karim\ncfm|||i|Falam Chin\ncga|||i|Changriwa\ncgc|||i|Kagayanen\ncgg|||i|Chiga\ncgk|||i|Chocangacakha\ncha|cha|ch|i|Chamorro\nchb|chb||i|Chibcha\nchc|||i|Catawba\nchd|||i|Highland Oaxaca Chontal\nche|che|ce|i|Chechen\nchf|||i|Tabasco Chontal\nchg|chg||i|Chagatai\nchh|||i|Chinook\nchj|||i|Ojitl\xE1n Chinantec\nchk|chk||i|Chuukese\nchl|||i|Cahuilla\nchm|chm||m|Mari (Russia)\nchn|chn||i|Chinook jargon\ncho|cho||i|Choctaw\nchp|chp||i|Chipewyan\nchq|||i|Quiotepec Chinantec\nchr|chr||i|Cherokee\ncht|||i|Chol\xF3n\nchu|chu|cu|i|Church Slavic\nchv|chv|cv|i|Chuvash\nchw|||i|Chuwabu\nchx|||i|Chantyal\nchy|chy||i|Cheyenne\nchz|||i|Ozumac\xEDn Chinantec\ncia|||i|Cia-Cia\ncib|||i|Ci Gbe\ncic|||i|Chickasaw\ncid|||i|Chimariko\ncie|||i|Cineni\ncih|||i|Chinali\ncik|||i|Chitkuli Kinnauri\ncim|||i|Cimbrian\ncin|||i|Cinta Larga\ncip|||i|Chiapanec\ncir|||i|Tiri\nciw|||i|Chippewa\nciy|||i|Chaima\ncja|||i|Western Cham\ncje|||i|Chru\ncjh|||i|Upper Chehalis\ncji|||i|Chamalal\ncjk|||i|Chokwe\ncjm|||i|Eastern Cham\ncjn|||i|Chenapian\ncjo|||i|Ash\xE9ninka Pajonal\ncjp|||i|Cab\xE9car\ncjs|||i|Shor\ncjv|||i|Chuave\ncjy|||i|Jinyu Chinese\nckb|||i|Central Kurdish\nckh|||i|Chak\nckl|||i|Cibak\nckm|||i|Chakavian\nckn|||i|Kaang Chin\ncko|||i|Anufo\nckq|||i|Kajakse\nckr|||i|Kairak\ncks|||i|Tayo\nckt|||i|Chukot\ncku|||i|Koasati\nckv|||i|Kavalan\nckx|||i|Caka\ncky|||i|Cakfem-Mushere\nckz|||i|Cakchiquel-Quich\xE9 Mixed Language\ncla|||i|Ron\nclc|||i|Chilcotin\ncld|||i|Chaldean Neo-Aramaic\ncle|||i|Lealao Chinantec\nclh|||i|Chilisso\ncli|||i|Chakali\nclj|||i|Laitu Chin\nclk|||i|Idu-Mishmi\ncll|||i|Chala\nclm|||i|Clallam\nclo|||i|Lowland Oaxaca Chontal\nclt|||i|Lautu Chin\nclu|||i|Caluyanun\nclw|||i|Chulym\ncly|||i|Eastern Highland Chatino\ncma|||i|Maa\ncme|||i|Cerma\ncmg|||i|Classical Mongolian\ncmi|||i|Ember\xE1-Cham\xED\ncml|||i|Campalagian\ncmm|||i|Michigamea\ncmn|||i|Mandarin Chinese\ncmo|||i|Central Mnong\ncmr|||i|Mro-Khimi Chin\ncms|||i|Messapic\ncmt|||i|Camtho\ncna|||i|Changthang\ncnb|||i|Chinbon Chin\ncnc|||i|C\xF4\xF4ng\ncng|||i|Northern Qiang\ncnh|||i|Hakha Chin\ncni|||i|Ash\xE1ninka\ncnk|||i|Khumi Chin\ncnl|||i|Lalana Chinantec\ncno|||i|Con\ncnp|||i|Northern Ping Chinese\ncnr|cnr||i|Montenegrin\ncns|||i|Central Asmat\ncnt|||i|Tepetotutla Chinantec\ncnu|||i|Chenoua\ncnw|||i|Ngawn Chin\ncnx|||i|Middle Cornish\ncoa|||i|Cocos Islands Malay\ncob|||i|Chicomuceltec\ncoc|||i|Cocopa\ncod|||i|Cocama-Cocamilla\ncoe|||i|Koreguaje\ncof|||i|Colorado\ncog|||i|Chong\ncoh|||i|Chonyi-Dzihana-Kauma\ncoj|||i|Cochimi\ncok|||i|Santa Teresa Cora\ncol|||i|Columbia-Wenatchi\ncom|||i|Comanche\ncon|||i|Cof\xE1n\ncoo|||i|Comox\ncop|cop||i|Coptic\ncoq|||i|Coquille\ncor|cor|kw|i|Cornish\ncos|cos|co|i|Corsican\ncot|||i|Caquinte\ncou|||i|Wamey\ncov|||i|Cao Miao\ncow|||i|Cowlitz\ncox|||i|Nanti\ncoz|||i|Chochotec\ncpa|||i|Palantla Chinantec\ncpb|||i|Ucayali-Yur\xFAa Ash\xE9ninka\ncpc|||i|Ajy\xEDninka Apurucayali\ncpg|||i|Cappadocian Greek\ncpi|||i|Chinese Pidgin English\ncpn|||i|Cherepon\ncpo|||i|Kpeego\ncps|||i|Capiznon\ncpu|||i|Pichis Ash\xE9ninka\ncpx|||i|Pu-Xian Chinese\ncpy|||i|South Ucayali Ash\xE9ninka\ncqd|||i|Chuanqiandian Cluster Miao\ncra|||i|Chara\ncrb|||i|Island Carib\ncrc|||i|Lonwolwol\ncrd|||i|Coeur d'Alene\ncre|cre|cr|m|Cree\ncrf|||i|Caramanta\ncrg|||i|Michif\ncrh|crh||i|Crimean Tatar\ncri|||i|S\xE3otomense\ncrj|||i|Southern East Cree\ncrk|||i|Plains Cree\ncrl|||i|Northern East Cree\ncrm|||i|Moose Cree\ncrn|||i|El Nayar Cora\ncro|||i|Crow\ncrq|||i|Iyo'wujwa Chorote\ncrr|||i|Carolina Algonquian\ncrs|||i|Seselwa Creole French\ncrt|||i|Iyojwa'ja Chorote\ncrv|||i|Chaura\ncrw|||i|Chrau\ncrx|||i|Carrier\ncry|||i|Cori\ncrz|||i|Cruze\xF1o\ncsa|||i|Chiltepec Chinantec\ncsb|csb||i|Kashubian\ncsc|||i|Catalan Sign Language\ncsd|||i|Chiangmai Sign Language\ncse|||i|Czech Sign Language\ncsf|||i|Cuba Sign Language\ncsg|||i|Chilean Sign Language\ncsh|||i|Asho Chin\ncsi|||i|Coast Miwok\ncsj|||i|Songlai Chin\ncsk|||i|Jola-Kasa\ncsl|||i|Chinese Sign Language\ncsm|||i|Central Sierra Miwok\ncsn|||i|Colombian Sign Language\ncso|||i|Sochiapam Chinantec\ncsp|||i|Southern Ping Chinese\ncsq|||i|Croatia Sign Language\ncsr|||i|Costa Rican Sign Language\ncss|||i|Southern Ohlone\ncst|||i|Northern Ohlone\ncsv|||i|Sumtu Chin\ncsw|||i|Swampy Cree\ncsy|||i|Siyin Chin\ncsz|||i|Coos\ncta|||i|Tataltepec Chatino\nctc|||i|Chetco\nctd|||i|Tedim Chin\ncte|||i|Tepinapa Chinantec\nctg|||i|Chittagonian\ncth|||i|Thaiphum Chin\nctl|||i|Tlacoatzintepec Chinantec\nctm|||i|Chitimacha\nctn|||i|Chhintange\ncto|||i|Ember\xE1-Cat\xEDo\nctp|||i|Western Highland Chatino\ncts|||i|Northern Catanduanes Bikol\nctt|||i|Wayanad Chetti\nctu|||i|Chol\nctz|||i|Zacatepec Chatino\ncua|||i|Cua\ncub|||i|Cubeo\ncuc|||i|Usila Chinantec\ncug|||i|Chungmboko\ncuh|||i|Chuka\ncui|||i|Cuiba\ncuj|||i|Mashco Piro\ncuk|||i|San Blas Kuna\ncul|||i|Culina\ncuo|||i|Cumanagoto\ncup|||i|Cupe\xF1o\ncuq|||i|Cun\ncur|||i|Chhulung\ncut|||i|Teutila Cuicatec\ncuu|||i|Tai Ya\ncuv|||i|Cuvok\ncuw|||i|Chukwa\ncux|||i|Tepeuxila Cuicatec\ncuy|||i|Cuitlatec\ncvg|||i|Chug\ncvn|||i|Valle Nacional Chinantec\ncwa|||i|Kabwa\ncwb|||i|Maindo\ncwd|||i|Woods Cree\ncwe|||i|Kwere\ncwg|||i|Chewong\ncwt|||i|Kuwaataay\ncya|||i|Nopala Chatino\ncyb|||i|Cayubaba\ncym|wel|cy|i|Welsh\ncyo|||i|Cuyonon\nczh|||i|Huizhou Chinese\nczk|||i|Knaanic\nczn|||i|Zenzontepec Chatino\nczo|||i|Min Zhong Chinese\nczt|||i|Zotung Chin\ndaa|||i|Dangal\xE9at\ndac|||i|Dambi\ndad|||i|Marik\ndae|||i|Duupa\ndag|||i|Dagbani\ndah|||i|Gwahatike\ndai|||i|Day\ndaj|||i|Dar Fur Daju\ndak|dak||i|Dakota\ndal|||i|Dahalo\ndam|||i|Damakawa\ndan|dan|da|i|Danish\ndao|||i|Daai Chin\ndaq|||i|Dandami Maria\ndar|dar||i|Dargwa\ndas|||i|Daho-Doo\ndau|||i|Dar Sila Daju\ndav|||i|Taita\ndaw|||i|Davawenyo\ndax|||i|Dayi\ndaz|||i|Dao\ndba|||i|Bangime\ndbb|||i|Deno\ndbd|||i|Dadiya\ndbe|||i|Dabe\ndbf|||i|Edopi\ndbg|||i|Dogul Dom Dogon\ndbi|||i|Doka\ndbj|||i|Ida'an\ndbl|||i|Dyirbal\ndbm|||i|Duguri\ndbn|||i|Duriankere\ndbo|||i|Dulbu\ndbp|||i|Duwai\ndbq|||i|Daba\ndbr|||i|Dabarre\ndbt|||i|Ben Tey Dogon\ndbu|||i|Bondum Dom Dogon\ndbv|||i|Dungu\ndbw|||i|Bankan Tey Dogon\ndby|||i|Dibiyaso\ndcc|||i|Deccan\ndcr|||i|Negerhollands\ndda|||i|Dadi Dadi\nddd|||i|Dongotono\ndde|||i|Doondo\nddg|||i|Fataluku\nddi|||i|West Goodenough\nddj|||i|Jaru\nddn|||i|Dendi (Benin)\nddo|||i|Dido\nddr|||i|Dhudhuroa\ndds|||i|Donno So Dogon\nddw|||i|Dawera-Daweloor\ndec|||i|Dagik\nded|||i|Dedua\ndee|||i|Dewoin\ndef|||i|Dezfuli\ndeg|||i|Degema\ndeh|||i|Dehwari\ndei|||i|Demisa\ndek|||i|Dek\ndel|del||m|Delaware\ndem|||i|Dem\nden|den||m|Slave (Athapascan)\ndep|||i|Pidgin Delaware\ndeq|||i|Dendi (Central African Republic)\nder|||i|Deori\ndes|||i|Desano\ndeu|ger|de|i|German\ndev|||i|Domung\ndez|||i|Dengese\ndga|||i|Southern Dagaare\ndgb|||i|Bunoge Dogon\ndgc|||i|Casiguran Dumagat Agta\ndgd|||i|Dagaari Dioula\ndge|||i|Degenan\ndgg|||i|Doga\ndgh|||i|Dghwede\ndgi|||i|Northern Dagara\ndgk|||i|Dagba\ndgl|||i|Andaandi\ndgn|||i|Dagoman\ndgo|||i|Dogri (individual language)\ndgr|dgr||i|Dogrib\ndgs|||i|Dogoso\ndgt|||i|Ndra'ngith\ndgw|||i|Daungwurrung\ndgx|||i|Doghoro\ndgz|||i|Daga\ndhd|||i|Dhundari\ndhg|||i|Dhangu-Djangu\ndhi|||i|Dhimal\ndhl|||i|Dhalandji\ndhm|||i|Zemba\ndhn|||i|Dhanki\ndho|||i|Dhodia\ndhr|||i|Dhargari\ndhs|||i|Dhaiso\ndhu|||i|Dhurga\ndhv|||i|Dehu\ndhw|||i|Dhanwar (Nepal)\ndhx|||i|Dhungaloo\ndia|||i|Dia\ndib|||i|South Central Dinka\ndic|||i|Lakota Dida\ndid|||i|Didinga\ndif|||i|Dieri\ndig|||i|Digo\ndih|||i|Kumiai\ndii|||i|Dimbong\ndij|||i|Dai\ndik|||i|Southwestern Dinka\ndil|||i|Dilling\ndim|||i|Dime\ndin|din||m|Dinka\ndio|||i|Dibo\ndip|||i|Northeastern Dinka\ndiq|||i|Dimli (individual language)\ndir|||i|Dirim\ndis|||i|Dimasa\ndiu|||i|Diriku\ndiv|div|dv|i|Dhivehi\ndiw|||i|Northwestern Dinka\ndix|||i|Dixon Reef\ndiy|||i|Diuwe\ndiz|||i|Ding\ndja|||i|Djadjawurrung\ndjb|||i|Djinba\ndjc|||i|Dar Daju Daju\ndjd|||i|Djamindjung\ndje|||i|Zarma\ndjf|||i|Djangun\ndji|||i|Djinang\ndjj|||i|Djeebbana\ndjk|||i|Eastern Maroon Creole\ndjm|||i|Jamsay Dogon\ndjn|||i|Jawoyn\ndjo|||i|Jangkang\ndjr|||i|Djambarrpuyngu\ndju|||i|Kapriman\ndjw|||i|Djawi\ndka|||i|Dakpakha\ndkk|||i|Dakka\ndkr|||i|Kuijau\ndks|||i|Southeastern Dinka\ndkx|||i|Mazagway\ndlg|||i|Dolgan\ndlk|||i|Dahalik\ndlm|||i|Dalmatian\ndln|||i|Darlong\ndma|||i|Duma\ndmb|||i|Mombo Dogon\ndmc|||i|Gavak\ndmd|||i|Madhi Madhi\ndme|||i|Dugwor\ndmf|||i|Medefaidrin\ndmg|||i|Upper Kinabatangan\ndmk|||i|Domaaki\ndml|||i|Dameli\ndmm|||i|Dama\ndmo|||i|Kemedzung\ndmr|||i|East Damar\ndms|||i|Dampelas\ndmu|||i|Dubu\ndmv|||i|Dumpas\ndmw|||i|Mudburra\ndmx|||i|Dema\ndmy|||i|Demta\ndna|||i|Upper Grand Valley Dani\ndnd|||i|Daonda\ndne|||i|Ndendeule\ndng|||i|Dungan\ndni|||i|Lower Grand Valley Dani\ndnj|||i|Dan\ndnk|||i|Dengka\ndnn|||i|Dz\xF9\xF9ngoo\ndno|||i|Ndrulo\ndnr|||i|Danaru\ndnt|||i|Mid Grand Valley Dani\ndnu|||i|Danau\ndnv|||i|Danu\ndnw|||i|Western Dani\ndny|||i|Den\xED\ndoa|||i|Dom\ndob|||i|Dobu\ndoc|||i|Northern Dong\ndoe|||i|Doe\ndof|||i|Domu\ndoh|||i|Dong\ndoi|doi||m|Dogri (macrolanguage)\ndok|||i|Dondo\ndol|||i|Doso\ndon|||i|Toura (Papua New Guinea)\ndoo|||i|Dongo\ndop|||i|Lukpa\ndoq|||i|Dominican Sign Language\ndor|||i|Dori'o\ndos|||i|Dogos\xE9\ndot|||i|Dass\ndov|||i|Dombe\ndow|||i|Doyayo\ndox|||i|Bussa\ndoy|||i|Dompo\ndoz|||i|Dorze\ndpp|||i|Papar\ndrb|||i|Dair\ndrc|||i|Minderico\ndrd|||i|Darmiya\ndre|||i|Dolpo\ndrg|||i|Rungus\ndri|||i|C'Lela\ndrl|||i|Paakantyi\ndrn|||i|West Damar\ndro|||i|Daro-Matu Melanau\ndrq|||i|Dura\ndrs|||i|Gedeo\ndrt|||i|Drents\ndru|||i|Rukai\ndry|||i|Darai\ndsb|dsb||i|Lower Sorbian\ndse|||i|Dutch Sign Language\ndsh|||i|Daasanach\ndsi|||i|Disa\ndsl|||i|Danish Sign Language\ndsn|||i|Dusner\ndso|||i|Desiya\ndsq|||i|Tadaksahak\ndta|||i|Daur\ndtb|||i|Labuk-Kinabatangan Kadazan\ndtd|||i|Ditidaht\ndth|||i|Adithinngithigh\ndti|||i|Ana Tinga Dogon\ndtk|||i|Tene Kan Dogon\ndtm|||i|Tomo Kan Dogon\ndtn|||i|Daats\u02BCi\u0301in\ndto|||i|Tommo So Dogon\ndtp|||i|Kadazan Dusun\ndtr|||i|Lotud\ndts|||i|Toro So Dogon\ndtt|||i|Toro Tegu Dogon\ndtu|||i|Tebul Ure Dogon\ndty|||i|Dotyali\ndua|dua||i|Duala\ndub|||i|Dubli\nduc|||i|Duna\ndue|||i|Umiray Dumaget Agta\nduf|||i|Dumbea\ndug|||i|Duruma\nduh|||i|Dungra Bhil\ndui|||i|Dumun\nduk|||i|Uyajitaya\ndul|||i|Alabat Island Agta\ndum|dum||i|Middle Dutch (ca. 1050-1350)\ndun|||i|Dusun Deyah\nduo|||i|Dupaninan Agta\ndup|||i|Duano\nduq|||i|Dusun Malang\ndur|||i|Dii\ndus|||i|Dumi\nduu|||i|Drung\nduv|||i|Duvle\nduw|||i|Dusun Witu\ndux|||i|Duungooma\nduy|||i|Dicamay Agta\nduz|||i|Duli-Gey\ndva|||i|Duau\ndwa|||i|Diri\ndwk|||i|Dawik Kui\ndwr|||i|Dawro\ndws|||i|Dutton World Speedwords\ndwu|||i|Dhuwal\ndww|||i|Dawawa\ndwy|||i|Dhuwaya\ndwz|||i|Dewas Rai\ndya|||i|Dyan\ndyb|||i|Dyaberdyaber\ndyd|||i|Dyugun\ndyg|||i|Villa Viciosa Agta\ndyi|||i|Djimini Senoufo\ndym|||i|Yanda Dom Dogon\ndyn|||i|Dyangadi\ndyo|||i|Jola-Fonyi\ndyu|dyu||i|Dyula\ndyy|||i|Djabugay\ndza|||i|Tunzu\ndze|||i|Djiwarli\ndzg|||i|Dazaga\ndzl|||i|Dzalakha\ndzn|||i|Dzando\ndzo|dzo|dz|i|Dzongkha\neaa|||i|Karenggapa\nebc|||i|Beginci\nebg|||i|Ebughu\nebk|||i|Eastern Bontok\nebo|||i|Teke-Ebo\nebr|||i|Ebri\xE9\nebu|||i|Embu\necr|||i|Eteocretan\necs|||i|Ecuadorian Sign Language\necy|||i|Eteocypriot\neee|||i|E\nefa|||i|Efai\nefe|||i|Efe\nefi|efi||i|Efik\nega|||i|Ega\negl|||i|Emilian\nego|||i|Eggon\negy|egy||i|Egyptian (Ancient)\nehu|||i|Ehueun\neip|||i|Eipomek\neit|||i|Eitiep\neiv|||i|Askopan\neja|||i|Ejamat\neka|eka||i|Ekajuk\neke|||i|Ekit\nekg|||i|Ekari\neki|||i|Eki\nekk|||i|Standard Estonian\nekl|||i|Kol (Bangladesh)\nekm|||i|Elip\neko|||i|Koti\nekp|||i|Ekpeye\nekr|||i|Yace\neky|||i|Eastern Kayah\nele|||i|Elepi\nelh|||i|El Hugeirat\neli|||i|Nding\nelk|||i|Elkei\nell|gre|el|i|Modern Greek (1453-)\nelm|||i|Eleme\nelo|||i|El Molo\nelu|||i|Elu\nelx|elx||i|Elamite\nema|||i|Emai-Iuleha-Ora\nemb|||i|Embaloh\neme|||i|Emerillon\nemg|||i|Eastern Meohang\nemi|||i|Mussau-Emira\nemk|||i|Eastern Maninkakan\nemm|||i|Mamulique\nemn|||i|Eman\nemp|||i|Northern Ember\xE1\nems|||i|Pacific Gulf Yupik\nemu|||i|Eastern Muria\nemw|||i|Emplawas\nemx|||i|Erromintxela\nemy|||i|Epigraphic Mayan\nena|||i|Apali\nenb|||i|Markweeta\nenc|||i|En\nend|||i|Ende\nenf|||i|Forest Enets\neng|eng|en|i|English\nenh|||i|Tundra Enets\nenl|||i|Enlhet\nenm|enm||i|Middle English (1100-1500)\nenn|||i|Engenni\neno|||i|Enggano\nenq|||i|Enga\nenr|||i|Emumu\nenu|||i|Enu\nenv|||i|Enwan (Edu State)\nenw|||i|Enwan (Akwa Ibom State)\nenx|||i|Enxet\neot|||i|Beti (C\xF4te d'Ivoire)\nepi|||i|Epie\nepo|epo|eo|i|Esperanto\nera|||i|Eravallan\nerg|||i|Sie\nerh|||i|Eruwa\neri|||i|Ogea\nerk|||i|South Efate\nero|||i|Horpa\nerr|||i|Erre\ners|||i|Ersu\nert|||i|Eritai\nerw|||i|Erokwanas\nese|||i|Ese Ejja\nesg|||i|Aheri Gondi\nesh|||i|Eshtehardi\nesi|||i|North Alaskan Inupiatun\nesk|||i|Northwest Alaska Inupiatun\nesl|||i|Egypt Sign Language\nesm|||i|Esuma\nesn|||i|Salvadoran Sign Language\neso|||i|Estonian Sign Language\nesq|||i|Esselen\ness|||i|Central Siberian Yupik\nest|est|et|m|Estonian\nesu|||i|Central Yupik\nesy|||i|Eskayan\netb|||i|Etebi\netc|||i|Etchemin\neth|||i|Ethiopian Sign Language\netn|||i|Eton (Vanuatu)\neto|||i|Eton (Cameroon)\netr|||i|Edolo\nets|||i|Yekhee\nett|||i|Etruscan\netu|||i|Ejagham\netx|||i|Eten\netz|||i|Semimi\neus|baq|eu|i|Basque\neve|||i|Even\nevh|||i|Uvbie\nevn|||i|Evenki\newe|ewe|ee|i|Ewe\newo|ewo||i|Ewondo\next|||i|Extremaduran\neya|||i|Eyak\neyo|||i|Keiyo\neza|||i|Ezaa\neze|||i|Uzekwe\nfaa|||i|Fasu\nfab|||i|Fa d'Ambu\nfad|||i|Wagi\nfaf|||i|Fagani\nfag|||i|Finongan\nfah|||i|Baissa Fali\nfai|||i|Faiwol\nfaj|||i|Faita\nfak|||i|Fang (Cameroon)\nfal|||i|South Fali\nfam|||i|Fam\nfan|fan||i|Fang (Equatorial Guinea)\nfao|fao|fo|i|Faroese\nfap|||i|Paloor\nfar|||i|Fataleka\nfas|per|fa|m|Persian\nfat|fat||i|Fanti\nfau|||i|Fayu\nfax|||i|Fala\nfay|||i|Southwestern Fars\nfaz|||i|Northwestern Fars\nfbl|||i|West Albay Bikol\nfcs|||i|Quebec Sign Language\nfer|||i|Feroge\nffi|||i|Foia Foia\nffm|||i|Maasina Fulfulde\nfgr|||i|Fongoro\nfia|||i|Nobiin\nfie|||i|Fyer\nfif|||i|Faifi\nfij|fij|fj|i|Fijian\nfil|fil||i|Filipino\nfin|fin|fi|i|Finnish\nfip|||i|Fipa\nfir|||i|Firan\nfit|||i|Tornedalen Finnish\nfiw|||i|Fiwaga\nfkk|||i|Kirya-Konz\u0259l\nfkv|||i|Kven Finnish\nfla|||i|Kalispel-Pend d'Oreille\nflh|||i|Foau\nfli|||i|Fali\nfll|||i|North Fali\nfln|||i|Flinders Island\nflr|||i|Fuliiru\nfly|||i|Flaaitaal\nfmp|||i|Fe'fe'\nfmu|||i|Far Western Muria\nfnb|||i|Fanbak\nfng|||i|Fanagalo\nfni|||i|Fania\nfod|||i|Foodo\nfoi|||i|Foi\nfom|||i|Foma\nfon|fon||i|Fon\nfor|||i|Fore\nfos|||i|Siraya\nfpe|||i|Fernando Po Creole English\nfqs|||i|Fas\nfra|fre|fr|i|French\nfrc|||i|Cajun French\nfrd|||i|Fordata\nfrk|||i|Frankish\nfrm|frm||i|Middle French (ca. 1400-1600)\nfro|fro||i|Old French (842-ca. 1400)\nfrp|||i|Arpitan\nfrq|||i|Forak\nfrr|frr||i|Northern Frisian\nfrs|frs||i|Eastern Frisian\nfrt|||i|Fortsenal\nfry|fry|fy|i|Western Frisian\nfse|||i|Finnish Sign Language\nfsl|||i|French Sign Language\nfss|||i|Finland-Swedish Sign Language\nfub|||i|Adamawa Fulfulde\nfuc|||i|Pulaar\nfud|||i|East Futuna\nfue|||i|Borgu Fulfulde\nfuf|||i|Pular\nfuh|||i|Western Niger Fulfulde\nfui|||i|Bagirmi Fulfulde\nfuj|||i|Ko\nful|ful|ff|m|Fulah\nfum|||i|Fum\nfun|||i|Fulni\xF4\nfuq|||i|Central-Eastern Niger Fulfulde\nfur|fur||i|Friulian\nfut|||i|Futuna-Aniwa\nfuu|||i|Furu\nfuv|||i|Nigerian Fulfulde\nfuy|||i|Fuyug\nfvr|||i|Fur\nfwa|||i|Fw\xE2i\nfwe|||i|Fwe\ngaa|gaa||i|Ga\ngab|||i|Gabri\ngac|||i|Mixed Great Andamanese\ngad|||i|Gaddang\ngae|||i|Guarequena\ngaf|||i|Gende\ngag|||i|Gagauz\ngah|||i|Alekano\ngai|||i|Borei\ngaj|||i|Gadsup\ngak|||i|Gamkonora\ngal|||i|Galolen\ngam|||i|Kandawo\ngan|||i|Gan Chinese\ngao|||i|Gants\ngap|||i|Gal\ngaq|||i|Gata'\ngar|||i|Galeya\ngas|||i|Adiwasi Garasia\ngat|||i|Kenati\ngau|||i|Mudhili Gadaba\ngaw|||i|Nobonob\ngax|||i|Borana-Arsi-Guji Oromo\ngay|gay||i|Gayo\ngaz|||i|West Central Oromo\ngba|gba||m|Gbaya (Central African Republic)\ngbb|||i|Kaytetye\ngbd|||i|Karajarri\ngbe|||i|Niksek\ngbf|||i|Gaikundi\ngbg|||i|Gbanziri\ngbh|||i|Defi Gbe\ngbi|||i|Galela\ngbj|||i|Bodo Gadaba\ngbk|||i|Gaddi\ngbl|||i|Gamit\ngbm|||i|Garhwali\ngbn|||i|Mo'da\ngbo|||i|Northern Grebo\ngbp|||i|Gbaya-Bossangoa\ngbq|||i|Gbaya-Bozoum\ngbr|||i|Gbagyi\ngbs|||i|Gbesi Gbe\ngbu|||i|Gagadu\ngbv|||i|Gbanu\ngbw|||i|Gabi-Gabi\ngbx|||i|Eastern Xwla Gbe\ngby|||i|Gbari\ngbz|||i|Zoroastrian Dari\ngcc|||i|Mali\ngcd|||i|Ganggalida\ngce|||i|Galice\ngcf|||i|Guadeloupean Creole French\ngcl|||i|Grenadian Creole English\ngcn|||i|Gaina\ngcr|||i|Guianese Creole French\ngct|||i|Colonia Tovar German\ngda|||i|Gade Lohar\ngdb|||i|Pottangi Ollar Gadaba\ngdc|||i|Gugu Badhun\ngdd|||i|Gedaged\ngde|||i|Gude\ngdf|||i|Guduf-Gava\ngdg|||i|Ga'dang\ngdh|||i|Gadjerawang\ngdi|||i|Gundi\ngdj|||i|Gurdjar\ngdk|||i|Gadang\ngdl|||i|Dirasha\ngdm|||i|Laal\ngdn|||i|Umanakaina\ngdo|||i|Ghodoberi\ngdq|||i|Mehri\ngdr|||i|Wipi\ngds|||i|Ghandruk Sign Language\ngdt|||i|Kungardutyi\ngdu|||i|Gudu\ngdx|||i|Godwari\ngea|||i|Geruma\ngeb|||i|Kire\ngec|||i|Gboloo Grebo\nged|||i|Gade\ngef|||i|Gerai\ngeg|||i|Gengle\ngeh|||i|Hutterite German\ngei|||i|Gebe\ngej|||i|Gen\ngek|||i|Ywom\ngel|||i|ut-Ma'in\ngeq|||i|Geme\nges|||i|Geser-Gorom\ngev|||i|Eviya\ngew|||i|Gera\ngex|||i|Garre\ngey|||i|Enya\ngez|gez||i|Geez\ngfk|||i|Patpatar\ngft|||i|Gafat\ngga|||i|Gao\nggb|||i|Gbii\nggd|||i|Gugadj\ngge|||i|Gurr-goni\nggg|||i|Gurgula\nggk|||i|Kungarakany\nggl|||i|Ganglau\nggt|||i|Gitua\nggu|||i|Gagu\nggw|||i|Gogodala\ngha|||i|Ghadam\xE8s\nghc|||i|Hiberno-Scottish Gaelic\nghe|||i|Southern Ghale\nghh|||i|Northern Ghale\nghk|||i|Geko Karen\nghl|||i|Ghulfan\nghn|||i|Ghanongga\ngho|||i|Ghomara\nghr|||i|Ghera\nghs|||i|Guhu-Samane\nght|||i|Kuke\ngia|||i|Kija\ngib|||i|Gibanawa\ngic|||i|Gail\ngid|||i|Gidar\ngie|||i|Ga\u0253ogbo\ngig|||i|Goaria\ngih|||i|Githabul\ngil|gil||i|Gilbertese\ngim|||i|Gimi (Eastern Highlands)\ngin|||i|Hinukh\ngip|||i|Gimi (West New Britain)\ngiq|||i|Green Gelao\ngir|||i|Red Gelao\ngis|||i|North Giziga\ngit|||i|Gitxsan\ngiu|||i|Mulao\ngiw|||i|White Gelao\ngix|||i|Gilima\ngiy|||i|Giyug\ngiz|||i|South Giziga\ngji|||i|Geji\ngjk|||i|Kachi Koli\ngjm|||i|Gunditjmara\ngjn|||i|Gonja\ngjr|||i|Gurindji Kriol\ngju|||i|Gujari\ngka|||i|Guya\ngkd|||i|Mag\u0268 (Madang Province)\ngke|||i|Ndai\ngkn|||i|Gokana\ngko|||i|Kok-Nar\ngkp|||i|Guinea Kpelle\ngku|||i|\u01C2Ungkue\ngla|gla|gd|i|Scottish Gaelic\nglc|||i|Bon Gula\ngld|||i|Nanai\ngle|gle|ga|i|Irish\nglg|glg|gl|i|Galician\nglh|||i|Northwest Pashai\nglj|||i|Gula Iro\nglk|||i|Gilaki\ngll|||i|Garlali\nglo|||i|Galambu\nglr|||i|Glaro-Twabo\nglu|||i|Gula (Chad)\nglv|glv|gv|i|Manx\nglw|||i|Glavda\ngly|||i|Gule\ngma|||i|Gambera\ngmb|||i|Gula'alaa\ngmd|||i|M\xE1ghd\xEC\ngmg|||i|Mag\u0268yi\ngmh|gmh||i|Middle High German (ca. 1050-1500)\ngml|||i|Middle Low German\ngmm|||i|Gbaya-Mbodomo\ngmn|||i|Gimnime\ngmr|||i|Mirning\ngmu|||i|Gumalu\ngmv|||i|Gamo\ngmx|||i|Magoma\ngmy|||i|Mycenaean Greek\ngmz|||i|Mgbolizhia\ngna|||i|Kaansa\ngnb|||i|Gangte\ngnc|||i|Guanche\ngnd|||i|Zulgo-Gemzek\ngne|||i|Ganang\ngng|||i|Ngangam\ngnh|||i|Lere\ngni|||i|Gooniyandi\ngnj|||i|Ngen\ngnk|||i|\u01C1Gana\ngnl|||i|Gangulu\ngnm|||i|Ginuman\ngnn|||i|Gumatj\ngno|||i|Northern Gondi\ngnq|||i|Gana\ngnr|||i|Gureng Gureng\ngnt|||i|Guntai\ngnu|||i|Gnau\ngnw|||i|Western Bolivian Guaran\xED\ngnz|||i|Ganzi\ngoa|||i|Guro\ngob|||i|Playero\ngoc|||i|Gorakor\ngod|||i|Godi\xE9\ngoe|||i|Gongduk\ngof|||i|Gofa\ngog|||i|Gogo\ngoh|goh||i|Old High German (ca. 750-1050)\ngoi|||i|Gobasi\ngoj|||i|Gowlan\ngok|||i|Gowli\ngol|||i|Gola\ngom|||i|Goan Konkani\ngon|gon||m|Gondi\ngoo|||i|Gone Dau\ngop|||i|Yeretuar\ngoq|||i|Gorap\ngor|gor||i|Gorontalo\ngos|||i|Gronings\ngot|got||i|Gothic\ngou|||i|Gavar\ngow|||i|Gorowa\ngox|||i|Gobu\ngoy|||i|Goundo\ngoz|||i|Gozarkhani\ngpa|||i|Gupa-Abawa\ngpe|||i|Ghanaian Pidgin English\ngpn|||i|Taiap\ngqa|||i|Ga'anda\ngqi|||i|Guiqiong\ngqn|||i|Guana (Brazil)\ngqr|||i|Gor\ngqu|||i|Qau\ngra|||i|Rajput Garasia\ngrb|grb||m|Grebo\ngrc|grc||i|Ancient Greek (to 1453)\ngrd|||i|Guruntum-Mbaaru\ngrg|||i|Madi\ngrh|||i|Gbiri-Niragu\ngri|||i|Ghari\ngrj|||i|Southern Grebo\ngrm|||i|Kota Marudu Talantang\ngrn|grn|gn|m|Guarani\ngro|||i|Groma\ngrq|||i|Gorovu\ngrr|||i|Taznatit\ngrs|||i|Gresi\ngrt|||i|Garo\ngru|||i|Kistane\ngrv|||i|Central Grebo\ngrw|||i|Gweda\ngrx|||i|Guriaso\ngry|||i|Barclayville Grebo\ngrz|||i|Guramalum\ngse|||i|Ghanaian Sign Language\ngsg|||i|German Sign Language\ngsl|||i|Gusilay\ngsm|||i|Guatemalan Sign Language\ngsn|||i|Nema\ngso|||i|Southwest Gbaya\ngsp|||i|Wasembo\ngss|||i|Greek Sign Language\ngsw|gsw||i|Swiss German\ngta|||i|Guat\xF3\ngtu|||i|Aghu-Tharnggala\ngua|||i|Shiki\ngub|||i|Guajaj\xE1ra\nguc|||i|Wayuu\ngud|||i|Yocobou\xE9 Dida\ngue|||i|Gurindji\nguf|||i|Gupapuyngu\ngug|||i|Paraguayan Guaran\xED\nguh|||i|Guahibo\ngui|||i|Eastern Bolivian Guaran\xED\nguj|guj|gu|i|Gujarati\nguk|||i|Gumuz\ngul|||i|Sea Island Creole English\ngum|||i|Guambiano\ngun|||i|Mby\xE1 Guaran\xED\nguo|||i|Guayabero\ngup|||i|Gunwinggu\nguq|||i|Ach\xE9\ngur|||i|Farefare\ngus|||i|Guinean Sign Language\ngut|||i|Mal\xE9ku Ja\xEDka\nguu|||i|Yanomam\xF6\nguw|||i|Gun\ngux|||i|Gourmanch\xE9ma\nguz|||i|Gusii\ngva|||i|Guana (Paraguay)\ngvc|||i|Guanano\ngve|||i|Duwet\ngvf|||i|Golin\ngvj|||i|Guaj\xE1\ngvl|||i|Gulay\ngvm|||i|Gurmana\ngvn|||i|Kuku-Yalanji\ngvo|||i|Gavi\xE3o Do Jiparan\xE1\ngvp|||i|Par\xE1 Gavi\xE3o\ngvr|||i|Gurung\ngvs|||i|Gumawana\ngvy|||i|Guyani\ngwa|||i|Mbato\ngwb|||i|Gwa\ngwc|||i|Gawri\ngwd|||i|Gawwada\ngwe|||i|Gweno\ngwf|||i|Gowro\ngwg|||i|Moo\ngwi|gwi||i|Gwich\u02BCin\ngwj|||i|\u01C0Gwi\ngwm|||i|Awngthim\ngwn|||i|Gwandara\ngwr|||i|Gwere\ngwt|||i|Gawar-Bati\ngwu|||i|Guwamu\ngww|||i|Kwini\ngwx|||i|Gua\ngxx|||i|W\xE8 Southern\ngya|||i|Northwest Gbaya\ngyb|||i|Garus\ngyd|||i|Kayardild\ngye|||i|Gyem\ngyf|||i|Gungabula\ngyg|||i|Gbayi\ngyi|||i|Gyele\ngyl|||i|Gayil\ngym|||i|Ng\xE4bere\ngyn|||i|Guyanese Creole English\ngyo|||i|Gyalsumdo\ngyr|||i|Guarayu\ngyy|||i|Gunya\ngza|||i|Ganza\ngzi|||i|Gazi\ngzn|||i|Gane\nhaa|||i|Han\nhab|||i|Hanoi Sign Language\nhac|||i|Gurani\nhad|||i|Hatam\nhae|||i|Eastern Oromo\nhaf|||i|Haiphong Sign Language\nhag|||i|Hanga\nhah|||i|Hahon\nhai|hai||m|Haida\nhaj|||i|Hajong\nhak|||i|Hakka Chinese\nhal|||i|Halang\nham|||i|Hewa\nhan|||i|Hangaza\nhao|||i|Hak\xF6\nhap|||i|Hupla\nhaq|||i|Ha\nhar|||i|Harari\nhas|||i|Haisla\nhat|hat|ht|i|Haitian\nhau|hau|ha|i|Hausa\nhav|||i|Havu\nhaw|haw||i|Hawaiian\nhax|||i|Southern Haida\nhay|||i|Haya\nhaz|||i|Hazaragi\nhba|||i|Hamba\nhbb|||i|Huba\nhbn|||i|Heiban\nhbo|||i|Ancient Hebrew\nhbs||sh|m|Serbo-Croatian\nhbu|||i|Habu\nhca|||i|Andaman Creole Hindi\nhch|||i|Huichol\nhdn|||i|Northern Haida\nhds|||i|Honduras Sign Language\nhdy|||i|Hadiyya\nhea|||i|Northern Qiandong Miao\nheb|heb|he|i|Hebrew\nhed|||i|Herd\xE9\nheg|||i|Helong\nheh|||i|Hehe\nhei|||i|Heiltsuk\nhem|||i|Hemba\nher|her|hz|i|Herero\nhgm|||i|Hai\u01C1om\nhgw|||i|Haigwai\nhhi|||i|Hoia Hoia\nhhr|||i|Kerak\nhhy|||i|Hoyahoya\nhia|||i|Lamang\nhib|||i|Hibito\nhid|||i|Hidatsa\nhif|||i|Fiji Hindi\nhig|||i|Kamwe\nhih|||i|Pamosu\nhii|||i|Hinduri\nhij|||i|Hijuk\nhik|||i|Seit-Kaitetu\nhil|hil||i|Hiligaynon\nhin|hin|hi|i|Hindi\nhio|||i|Tsoa\nhir|||i|Himarim\xE3\nhit|hit||i|Hittite\nhiw|||i|Hiw\nhix|||i|Hixkary\xE1na\nhji|||i|Haji\nhka|||i|Kahe\nhke|||i|Hunde\nhkk|||i|Hunjara-Kaina Ke\nhkn|||i|Mel-Khaonh\nhks|||i|Hong Kong Sign Language\nhla|||i|Halia\nhlb|||i|Halbi\nhld|||i|Halang Doan\nhle|||i|Hlersu\nhlt|||i|Matu Chin\nhlu|||i|Hieroglyphic Luwian\nhma|||i|Southern Mashan Hmong\nhmb|||i|Humburi Senni Songhay\nhmc|||i|Central Huishui Hmong\nhmd|||i|Large Flowery Miao\nhme|||i|Eastern Huishui Hmong\nhmf|||i|Hmong Don\nhmg|||i|Southwestern Guiyang Hmong\nhmh|||i|Southwestern Huishui Hmong\nhmi|||i|Northern Huishui Hmong\nhmj|||i|Ge\nhmk|||i|Maek\nhml|||i|Luopohe Hmong\nhmm|||i|Central Mashan Hmong\nhmn|hmn||m|Hmong\nhmo|hmo|ho|i|Hiri Motu\nhmp|||i|Northern Mashan Hmong\nhmq|||i|Eastern Qiandong Miao\nhmr|||i|Hmar\nhms|||i|Southern Qiandong Miao\nhmt|||i|Hamtai\nhmu|||i|Hamap\nhmv|||i|Hmong D\xF4\nhmw|||i|Western Mashan Hmong\nhmy|||i|Southern Guiyang Hmong\nhmz|||i|Hmong Shua\nhna|||i|Mina (Cameroon)\nhnd|||i|Southern Hindko\nhne|||i|Chhattisgarhi\nhng|||i|Hungu\nhnh|||i|\u01C1Ani\nhni|||i|Hani\nhnj|||i|Hmong Njua\nhnn|||i|Hanunoo\nhno|||i|Northern Hindko\nhns|||i|Caribbean Hindustani\nhnu|||i|Hung\nhoa|||i|Hoava\nhob|||i|Mari (Madang Province)\nhoc|||i|Ho\nhod|||i|Holma\nhoe|||i|Horom\nhoh|||i|Hoby\xF3t\nhoi|||i|Holikachuk\nhoj|||i|Hadothi\nhol|||i|Holu\nhom|||i|Homa\nhoo|||i|Holoholo\nhop|||i|Hopi\nhor|||i|Horo\nhos|||i|Ho Chi Minh City Sign Language\nhot|||i|Hote\nhov|||i|Hovongan\nhow|||i|Honi\nhoy|||i|Holiya\nhoz|||i|Hozo\nhpo|||i|Hpon\nhps|||i|Hawai'i Sign Language (HSL)\nhra|||i|Hrangkhol\nhrc|||i|Niwer Mil\nhre|||i|Hre\nhrk|||i|Haruku\nhrm|||i|Horned Miao\nhro|||i|Haroi\nhrp|||i|Nhirrpi\nhrt|||i|H\xE9rtevin\nhru|||i|Hruso\nhrv|hrv|hr|i|Croatian\nhrw|||i|Warwar Feni\nhrx|||i|Hunsrik\nhrz|||i|Harzani\nhsb|hsb||i|Upper Sorbian\nhsh|||i|Hungarian Sign Language\nhsl|||i|Hausa Sign Language\nhsn|||i|Xiang Chinese\nhss|||i|Harsusi\nhti|||i|Hoti\nhto|||i|Minica Huitoto\nhts|||i|Hadza\nhtu|||i|Hitu\nhtx|||i|Middle Hittite\nhub|||i|Huambisa\nhuc|||i|\u01C2Hua\nhud|||i|Huaulu\nhue|||i|San Francisco Del Mar Huave\nhuf|||i|Humene\nhug|||i|Huachipaeri\nhuh|||i|Huilliche\nhui|||i|Huli\nhuj|||i|Northern Guiyang Hmong\nhuk|||i|Hulung\nhul|||i|Hula\nhum|||i|Hungana\nhun|hun|hu|i|Hungarian\nhuo|||i|Hu\nhup|hup||i|Hupa\nhuq|||i|Tsat\nhur|||i|Halkomelem\nhus|||i|Huastec\nhut|||i|Humla\nhuu|||i|Murui Huitoto\nhuv|||i|San Mateo Del Mar Huave\nhuw|||i|Hukumina\nhux|||i|N\xFCpode Huitoto\nhuy|||i|Hulaul\xE1\nhuz|||i|Hunzib\nhvc|||i|Haitian Vodoun Culture Language\nhve|||i|San Dionisio Del Mar Huave\nhvk|||i|Haveke\nhvn|||i|Sabu\nhvv|||i|Santa Mar\xEDa Del Mar Huave\nhwa|||i|Wan\xE9\nhwc|||i|Hawai'i Creole English\nhwo|||i|Hwana\nhya|||i|Hya\nhye|arm|hy|i|Armenian\nhyw|||i|Western Armenian\niai|||i|Iaai\nian|||i|Iatmul\niar|||i|Purari\niba|iba||i|Iban\nibb|||i|Ibibio\nibd|||i|Iwaidja\nibe|||i|Akpes\nibg|||i|Ibanag\nibh|||i|Bih\nibl|||i|Ibaloi\nibm|||i|Agoi\nibn|||i|Ibino\nibo|ibo|ig|i|Igbo\nibr|||i|Ibuoro\nibu|||i|Ibu\niby|||i|Ibani\nica|||i|Ede Ica\nich|||i|Etkywan\nicl|||i|Icelandic Sign Language\nicr|||i|Islander Creole English\nida|||i|Idakho-Isukha-Tiriki\nidb|||i|Indo-Portuguese\nidc|||i|Idon\nidd|||i|Ede Idaca\nide|||i|Idere\nidi|||i|Idi\nido|ido|io|i|Ido\nidr|||i|Indri\nids|||i|Idesa\nidt|||i|Idat\xE9\nidu|||i|Idoma\nifa|||i|Amganad Ifugao\nifb|||i|Batad Ifugao\nife|||i|If\xE8\niff|||i|Ifo\nifk|||i|Tuwali Ifugao\nifm|||i|Teke-Fuumu\nifu|||i|Mayoyao Ifugao\nify|||i|Keley-I Kallahan\nigb|||i|Ebira\nige|||i|Igede\nigg|||i|Igana\nigl|||i|Igala\nigm|||i|Kanggape\nign|||i|Ignaciano\nigo|||i|Isebe\nigs|||i|Interglossa\nigw|||i|Igwe\nihb|||i|Iha Based Pidgin\nihi|||i|Ihievbe\nihp|||i|Iha\nihw|||i|Bidhawal\niii|iii|ii|i|Sichuan Yi\niin|||i|Thiin\nijc|||i|Izon\nije|||i|Biseni\nijj|||i|Ede Ije\nijn|||i|Kalabari\nijs|||i|Southeast Ijo\nike|||i|Eastern Canadian Inuktitut\niki|||i|Iko\nikk|||i|Ika\nikl|||i|Ikulu\niko|||i|Olulumo-Ikom\nikp|||i|Ikpeshi\nikr|||i|Ikaranggal\niks|||i|Inuit Sign Language\nikt|||i|Inuinnaqtun\niku|iku|iu|m|Inuktitut\nikv|||i|Iku-Gora-Ankwa\nikw|||i|Ikwere\nikx|||i|Ik\nikz|||i|Ikizu\nila|||i|Ile Ape\nilb|||i|Ila\nile|ile|ie|i|Interlingue\nilg|||i|Garig-Ilgar\nili|||i|Ili Turki\nilk|||i|Ilongot\nilm|||i|Iranun (Malaysia)\nilo|ilo||i|Iloko\nilp|||i|Iranun (Philippines)\nils|||i|International Sign\nilu|||i|Ili'uun\nilv|||i|Ilue\nima|||i|Mala Malasar\nimi|||i|Anamgura\niml|||i|Miluk\nimn|||i|Imonda\nimo|||i|Imbongu\nimr|||i|Imroing\nims|||i|Marsian\nimy|||i|Milyan\nina|ina|ia|i|Interlingua (International Auxiliary Language Association)\ninb|||i|Inga\nind|ind|id|i|Indonesian\ning|||i|Degexit'an\ninh|inh||i|Ingush\ninj|||i|Jungle Inga\ninl|||i|Indonesian Sign Language\ninm|||i|Minaean\ninn|||i|Isinai\nino|||i|Inoke-Yate\ninp|||i|I\xF1apari\nins|||i|Indian Sign Language\nint|||i|Intha\ninz|||i|Inese\xF1o\nior|||i|Inor\niou|||i|Tuma-Irumu\niow|||i|Iowa-Oto\nipi|||i|Ipili\nipk|ipk|ik|m|Inupiaq\nipo|||i|Ipiko\niqu|||i|Iquito\niqw|||i|Ikwo\nire|||i|Iresim\nirh|||i|Irarutu\niri|||i|Rigwe\nirk|||i|Iraqw\nirn|||i|Ir\xE1ntxe\nirr|||i|Ir\niru|||i|Irula\nirx|||i|Kamberau\niry|||i|Iraya\nisa|||i|Isabi\nisc|||i|Isconahua\nisd|||i|Isnag\nise|||i|Italian Sign Language\nisg|||i|Irish Sign Language\nish|||i|Esan\nisi|||i|Nkem-Nkum\nisk|||i|Ishkashimi\nisl|ice|is|i|Icelandic\nism|||i|Masimasi\nisn|||i|Isanzu\niso|||i|Isoko\nisr|||i|Israeli Sign Language\nist|||i|Istriot\nisu|||i|Isu (Menchum Division)\nita|ita|it|i|Italian\nitb|||i|Binongan Itneg\nitd|||i|Southern Tidung\nite|||i|Itene\niti|||i|Inlaod Itneg\nitk|||i|Judeo-Italian\nitl|||i|Itelmen\nitm|||i|Itu Mbon Uzo\nito|||i|Itonama\nitr|||i|Iteri\nits|||i|Isekiri\nitt|||i|Maeng Itneg\nitv|||i|Itawit\nitw|||i|Ito\nitx|||i|Itik\nity|||i|Moyadan Itneg\nitz|||i|Itz\xE1\nium|||i|Iu Mien\nivb|||i|Ibatan\nivv|||i|Ivatan\niwk|||i|I-Wak\niwm|||i|Iwam\niwo|||i|Iwur\niws|||i|Sepik Iwam\nixc|||i|Ixcatec\nixl|||i|Ixil\niya|||i|Iyayu\niyo|||i|Mesaka\niyx|||i|Yaka (Congo)\nizh|||i|Ingrian\nizr|||i|Izere\nizz|||i|Izii\njaa|||i|Jamamad\xED\njab|||i|Hyam\njac|||i|Popti'\njad|||i|Jahanka\njae|||i|Yabem\njaf|||i|Jara\njah|||i|Jah Hut\njaj|||i|Zazao\njak|||i|Jakun\njal|||i|Yalahatan\njam|||i|Jamaican Creole English\njan|||i|Jandai\njao|||i|Yanyuwa\njaq|||i|Yaqay\njas|||i|New Caledonian Javanese\njat|||i|Jakati\njau|||i|Yaur\njav|jav|jv|i|Javanese\njax|||i|Jambi Malay\njay|||i|Yan-nhangu\njaz|||i|Jawe\njbe|||i|Judeo-Berber\njbi|||i|Badjiri\njbj|||i|Arandai\njbk|||i|Barikewa\njbn|||i|Nafusi\njbo|jbo||i|Lojban\njbr|||i|Jofotek-Bromnya\njbt|||i|Jabut\xED\njbu|||i|Jukun Takum\njbw|||i|Yawijibaya\njcs|||i|Jamaican Country Sign Language\njct|||i|Krymchak\njda|||i|Jad\njdg|||i|Jadgali\njdt|||i|Judeo-Tat\njeb|||i|Jebero\njee|||i|Jerung\njeh|||i|Jeh\njei|||i|Yei\njek|||i|Jeri Kuo\njel|||i|Yelmek\njen|||i|Dza\njer|||i|Jere\njet|||i|Manem\njeu|||i|Jonkor Bourmataguil\njgb|||i|Ngbee\njge|||i|Judeo-Georgian\njgk|||i|Gwak\njgo|||i|Ngomba\njhi|||i|Jehai\njhs|||i|Jhankot Sign Language\njia|||i|Jina\njib|||i|Jibu\njic|||i|Tol\njid|||i|Bu\njie|||i|Jilbe\njig|||i|Jingulu\njih|||i|sTodsde\njii|||i|Jiiddu\njil|||i|Jilim\njim|||i|Jimi (Cameroon)\njio|||i|Jiamao\njiq|||i|Guanyinqiao\njit|||i|Jita\njiu|||i|Youle Jinuo\njiv|||i|Shuar\njiy|||i|Buyuan Jinuo\njje|||i|Jejueo\njjr|||i|Bankal\njka|||i|Kaera\njkm|||i|Mobwa Karen\njko|||i|Kubo\njkp|||i|Paku Karen\njkr|||i|Koro (India)\njku|||i|Labir\njle|||i|Ngile\njls|||i|Jamaican Sign Language\njma|||i|Dima\njmb|||i|Zumbun\njmc|||i|Machame\njmd|||i|Yamdena\njmi|||i|Jimi (Nigeria)\njml|||i|Jumli\njmn|||i|Makuri Naga\njmr|||i|Kamara\njms|||i|Mashi (Nigeria)\njmw|||i|Mouwase\njmx|||i|Western Juxtlahuaca Mixtec\njna|||i|Jangshung\njnd|||i|Jandavra\njng|||i|Yangman\njni|||i|Janji\njnj|||i|Yemsa\njnl|||i|Rawat\njns|||i|Jaunsari\njob|||i|Joba\njod|||i|Wojenaka\njog|||i|Jogi\njor|||i|Jor\xE1\njos|||i|Jordanian Sign Language\njow|||i|Jowulu\njpa|||i|Jewish Palestinian Aramaic\njpn|jpn|ja|i|Japanese\njpr|jpr||i|Judeo-Persian\njqr|||i|Jaqaru\njra|||i|Jarai\njrb|jrb||m|Judeo-Arabic\njrr|||i|Jiru\njrt|||i|Jorto\njru|||i|Japrer\xEDa\njsl|||i|Japanese Sign Language\njua|||i|J\xFAma\njub|||i|Wannu\njuc|||i|Jurchen\njud|||i|Worodougou\njuh|||i|H\xF5ne\njui|||i|Ngadjuri\njuk|||i|Wapan\njul|||i|Jirel\njum|||i|Jumjum\njun|||i|Juang\njuo|||i|Jiba\njup|||i|Hupd\xEB\njur|||i|Jur\xFAna\njus|||i|Jumla Sign Language\njut|||i|Jutish\njuu|||i|Ju\njuw|||i|W\xE3pha\njuy|||i|Juray\njvd|||i|Javindo\njvn|||i|Caribbean Javanese\njwi|||i|Jwira-Pepesa\njya|||i|Jiarong\njye|||i|Judeo-Yemeni Arabic\njyy|||i|Jaya\nkaa|kaa||i|Kara-Kalpak\nkab|kab||i|Kabyle\nkac|kac||i|Kachin\nkad|||i|Adara\nkae|||i|Ketangalan\nkaf|||i|Katso\nkag|||i|Kajaman\nkah|||i|Kara (Central African Republic)\nkai|||i|Karekare\nkaj|||i|Jju\nkak|||i|Kalanguya\nkal|kal|kl|i|Kalaallisut\nkam|kam||i|Kamba (Kenya)\nkan|kan|kn|i|Kannada\nkao|||i|Xaasongaxango\nkap|||i|Bezhta\nkaq|||i|Capanahua\nkas|kas|ks|i|Kashmiri\nkat|geo|ka|i|Georgian\nkau|kau|kr|m|Kanuri\nkav|||i|Katuk\xEDna\nkaw|kaw||i|Kawi\nkax|||i|Kao\nkay|||i|Kamayur\xE1\nkaz|kaz|kk|i|Kazakh\nkba|||i|Kalarko\nkbb|||i|Kaxui\xE2na\nkbc|||i|Kadiw\xE9u\nkbd|kbd||i|Kabardian\nkbe|||i|Kanju\nkbg|||i|Khamba\nkbh|||i|Cams\xE1\nkbi|||i|Kaptiau\nkbj|||i|Kari\nkbk|||i|Grass Koiari\nkbl|||i|Kanembu\nkbm|||i|Iwal\nkbn|||i|Kare (Central African Republic)\nkbo|||i|Keliko\nkbp|||i|Kabiy\xE8\nkbq|||i|Kamano\nkbr|||i|Kafa\nkbs|||i|Kande\nkbt|||i|Abadi\nkbu|||i|Kabutra\nkbv|||i|Dera (Indonesia)\nkbw|||i|Kaiep\nkbx|||i|Ap Ma\nkby|||i|Manga Kanuri\nkbz|||i|Duhwa\nkca|||i|Khanty\nkcb|||i|Kawacha\nkcc|||i|Lubila\nkcd|||i|Ngk\xE2lmpw Kanum\nkce|||i|Kaivi\nkcf|||i|Ukaan\nkcg|||i|Tyap\nkch|||i|Vono\nkci|||i|Kamantan\nkcj|||i|Kobiana\nkck|||i|Kalanga\nkcl|||i|Kela (Papua New Guinea)\nkcm|||i|Gula (Central African Republic)\nkcn|||i|Nubi\nkco|||i|Kinalakna\nkcp|||i|Kanga\nkcq|||i|Kamo\nkcr|||i|Katla\nkcs|||i|Koenoem\nkct|||i|Kaian\nkcu|||i|Kami (Tanzania)\nkcv|||i|Kete\nkcw|||i|Kabwari\nkcx|||i|Kachama-Ganjule\nkcy|||i|Korandje\nkcz|||i|Konongo\nkda|||i|Worimi\nkdc|||i|Kutu\nkdd|||i|Yankunytjatjara\nkde|||i|Makonde\nkdf|||i|Mamusi\nkdg|||i|Seba\nkdh|||i|Tem\nkdi|||i|Kumam\nkdj|||i|Karamojong\nkdk|||i|Num\xE8\xE8\nkdl|||i|Tsikimba\nkdm|||i|Kagoma\nkdn|||i|Kunda\nkdp|||i|Kaningdon-Nindem\nkdq|||i|Koch\nkdr|||i|Karaim\nkdt|||i|Kuy\nkdu|||i|Kadaru\nkdw|||i|Koneraw\nkdx|||i|Kam\nkdy|||i|Keder\nkdz|||i|Kwaja\nkea|||i|Kabuverdianu\nkeb|||i|K\xE9l\xE9\nkec|||i|Keiga\nked|||i|Kerewe\nkee|||i|Eastern Keres\nkef|||i|Kpessi\nkeg|||i|Tese\nkeh|||i|Keak\nkei|||i|Kei\nkej|||i|Kadar\nkek|||i|Kekch\xED\nkel|||i|Kela (Democratic Republic of Congo)\nkem|||i|Kemak\nken|||i|Kenyang\nkeo|||i|Kakwa\nkep|||i|Kaikadi\nkeq|||i|Kamar\nker|||i|Kera\nkes|||i|Kugbo\nket|||i|Ket\nkeu|||i|Akebu\nkev|||i|Kanikkaran\nkew|||i|West Kewa\nkex|||i|Kukna\nkey|||i|Kupia\nkez|||i|Kukele\nkfa|||i|Kodava\nkfb|||i|Northwestern Kolami\nkfc|||i|Konda-Dora\nkfd|||i|Korra Koraga\nkfe|||i|Kota (India)\nkff|||i|Koya\nkfg|||i|Kudiya\nkfh|||i|Kurichiya\nkfi|||i|Kannada Kurumba\nkfj|||i|Kemiehua\nkfk|||i|Kinnauri\nkfl|||i|Kung\nkfm|||i|Khunsari\nkfn|||i|Kuk\nkfo|||i|Koro (C\xF4te d'Ivoire)\nkfp|||i|Korwa\nkfq|||i|Korku\nkfr|||i|Kachhi\nkfs|||i|Bilaspuri\nkft|||i|Kanjari\nkfu|||i|Katkari\nkfv|||i|Kurmukar\nkfw|||i|Kharam Naga\nkfx|||i|Kullu Pahari\nkfy|||i|Kumaoni\nkfz|||i|Koromf\xE9\nkga|||i|Koyaga\nkgb|||i|Kawe\nkge|||i|Komering\nkgf|||i|Kube\nkgg|||i|Kusunda\nkgi|||i|Selangor Sign Language\nkgj|||i|Gamale Kham\nkgk|||i|Kaiw\xE1\nkgl|||i|Kunggari\nkgm|||i|Karip\xFAna\nkgn|||i|Karingani\nkgo|||i|Krongo\nkgp|||i|Kaingang\nkgq|||i|Kamoro\nkgr|||i|Abun\nkgs|||i|Kumbainggar\nkgt|||i|Somyev\nkgu|||i|Kobol\nkgv|||i|Karas\nkgw|||i|Karon Dori\nkgx|||i|Kamaru\nkgy|||i|Kyerung\nkha|kha||i|Khasi\nkhb|||i|L\xFC\nkhc|||i|Tukang Besi North\nkhd|||i|B\xE4di Kanum\nkhe|||i|Korowai\nkhf|||i|Khuen\nkhg|||i|Khams Tibetan\nkhh|||i|Kehu\nkhj|||i|Kuturmi\nkhk|||i|Halh Mongolian\nkhl|||i|Lusi\nkhm|khm|km|i|Khmer\nkhn|||i|Khandesi\nkho|kho||i|Khotanese\nkhp|||i|Kapori\nkhq|||i|Koyra Chiini Songhay\nkhr|||i|Kharia\nkhs|||i|Kasua\nkht|||i|Khamti\nkhu|||i|Nkhumbi\nkhv|||i|Khvarshi\nkhw|||i|Khowar\nkhx|||i|Kanu\nkhy|||i|Kele (Democratic Republic of Congo)\nkhz|||i|Keapara\nkia|||i|Kim\nkib|||i|Koalib\nkic|||i|Kickapoo\nkid|||i|Koshin\nkie|||i|Kibet\nkif|||i|Eastern Parbate Kham\nkig|||i|Kimaama\nkih|||i|Kilmeri\nkii|||i|Kitsai\nkij|||i|Kilivila\nkik|kik|ki|i|Kikuyu\nkil|||i|Kariya\nkim|||i|Karagas\nkin|kin|rw|i|Kinyarwanda\nkio|||i|Kiowa\nkip|||i|Sheshi Kham\nkiq|||i|Kosadle\nkir|kir|ky|i|Kirghiz\nkis|||i|Kis\nkit|||i|Agob\nkiu|||i|Kirmanjki (individual language)\nkiv|||i|Kimbu\nkiw|||i|Northeast Kiwai\nkix|||i|Khiamniungan Naga\nkiy|||i|Kirikiri\nkiz|||i|Kisi\nkja|||i|Mlap\nkjb|||i|Q'anjob'al\nkjc|||i|Coastal Konjo\nkjd|||i|Southern Kiwai\nkje|||i|Kisar\nkjg|||i|Khmu\nkjh|||i|Khakas\nkji|||i|Zabana\nkjj|||i|Khinalugh\nkjk|||i|Highland Konjo\nkjl|||i|Western Parbate Kham\nkjm|||i|Kh\xE1ng\nkjn|||i|Kunjen\nkjo|||i|Harijan Kinnauri\nkjp|||i|Pwo Eastern Karen\nkjq|||i|Western Keres\nkjr|||i|Kurudu\nkjs|||i|East Kewa\nkjt|||i|Phrae Pwo Karen\nkju|||i|Kashaya\nkjv|||i|Kaikavian Literary Language\nkjx|||i|Ramopa\nkjy|||i|Erave\nkjz|||i|Bumthangkha\nkka|||i|Kakanda\nkkb|||i|Kwerisa\nkkc|||i|Odoodee\nkkd|||i|Kinuku\nkke|||i|Kakabe\nkkf|||i|Kalaktang Monpa\nkkg|||i|Mabaka Valley Kalinga\nkkh|||i|Kh\xFCn\nkki|||i|Kagulu\nkkj|||i|Kako\nkkk|||i|Kokota\nkkl|||i|Kosarek Yale\nkkm|||i|Kiong\nkkn|||i|Kon Keu\nkko|||i|Karko\nkkp|||i|Gugubera\nkkq|||i|Kaeku\nkkr|||i|Kir-Balar\nkks|||i|Giiwo\nkkt|||i|Koi\nkku|||i|Tumi\nkkv|||i|Kangean\nkkw|||i|Teke-Kukuya\nkkx|||i|Kohin\nkky|||i|Guugu Yimidhirr\nkkz|||i|Kaska\nkla|||i|Klamath-Modoc\nklb|||i|Kiliwa\nklc|||i|Kolbila\nkld|||i|Gamilaraay\nkle|||i|Kulung (Nepal)\nklf|||i|Kendeje\nklg|||i|Tagakaulo\nklh|||i|Weliki\nkli|||i|Kalumpang\nklj|||i|Khalaj\nklk|||i|Kono (Nigeria)\nkll|||i|Kagan Kalagan\nklm|||i|Migum\nkln|||m|Kalenjin\nklo|||i|Kapya\nklp|||i|Kamasa\nklq|||i|Rumu\nklr|||i|Khaling\nkls|||i|Kalasha\nklt|||i|Nukna\nklu|||i|Klao\nklv|||i|Maskelynes\nklw|||i|Tado\nklx|||i|Koluwawa\nkly|||i|Kalao\nklz|||i|Kabola\nkma|||i|Konni\nkmb|kmb||i|Kimbundu\nkmc|||i|Southern Dong\nkmd|||i|Majukayang Kalinga\nkme|||i|Bakole\nkmf|||i|Kare (Papua New Guinea)\nkmg|||i|K\xE2te\nkmh|||i|Kalam\nkmi|||i|Kami (Nigeria)\nkmj|||i|Kumarbhag Paharia\nkmk|||i|Limos Kalinga\nkml|||i|Tanudan Kalinga\nkmm|||i|Kom (India)\nkmn|||i|Awtuw\nkmo|||i|Kwoma\nkmp|||i|Gimme\nkmq|||i|Kwama\nkmr|||i|Northern Kurdish\nkms|||i|Kamasau\nkmt|||i|Kemtuik\nkmu|||i|Kanite\nkmv|||i|Karip\xFAna Creole French\nkmw|||i|Komo (Democratic Republic of Congo)\nkmx|||i|Waboda\nkmy|||i|Koma\nkmz|||i|Khorasani Turkish\nkna|||i|Dera (Nigeria)\nknb|||i|Lubuagan Kalinga\nknc|||i|Central Kanuri\nknd|||i|Konda\nkne|||i|Kankanaey\nknf|||i|Mankanya\nkng|||i|Koongo\nkni|||i|Kanufi\nknj|||i|Western Kanjobal\nknk|||i|Kuranko\nknl|||i|Keninjal\nknm|||i|Kanamar\xED\nknn|||i|Konkani (individual language)\nkno|||i|Kono (Sierra Leone)\nknp|||i|Kwanja\nknq|||i|Kintaq\nknr|||i|Kaningra\nkns|||i|Kensiu\nknt|||i|Panoan Katuk\xEDna\nknu|||i|Kono (Guinea)\nknv|||i|Tabo\nknw|||i|Kung-Ekoka\nknx|||i|Kendayan\nkny|||i|Kanyok\nknz|||i|Kalams\xE9\nkoa|||i|Konomala\nkoc|||i|Kpati\nkod|||i|Kodi\nkoe|||i|Kacipo-Balesi\nkof|||i|Kubi\nkog|||i|Cogui\nkoh|||i|Koyo\nkoi|||i|Komi-Permyak\nkok|kok||m|Konkani (macrolanguage)\nkol|||i|Kol (Papua New Guinea)\nkom|kom|kv|m|Komi\nkon|kon|kg|m|Kongo\nkoo|||i|Konzo\nkop|||i|Waube\nkoq|||i|Kota (Gabon)\nkor|kor|ko|i|Korean\nkos|kos||i|Kosraean\nkot|||i|Lagwan\nkou|||i|Koke\nkov|||i|Kudu-Camo\nkow|||i|Kugama\nkoy|||i|Koyukon\nkoz|||i|Korak\nkpa|||i|Kutto\nkpb|||i|Mullu Kurumba\nkpc|||i|Curripaco\nkpd|||i|Koba\nkpe|kpe||m|Kpelle\nkpf|||i|Komba\nkpg|||i|Kapingamarangi\nkph|||i|Kplang\nkpi|||i|Kofei\nkpj|||i|Karaj\xE1\nkpk|||i|Kpan\nkpl|||i|Kpala\nkpm|||i|Koho\nkpn|||i|Kepkiriw\xE1t\nkpo|||i|Ikposo\nkpq|||i|Korupun-Sela\nkpr|||i|Korafe-Yegha\nkps|||i|Tehit\nkpt|||i|Karata\nkpu|||i|Kafoa\nkpv|||i|Komi-Zyrian\nkpw|||i|Kobon\nkpx|||i|Mountain Koiali\nkpy|||i|Koryak\nkpz|||i|Kupsabiny\nkqa|||i|Mum\nkqb|||i|Kovai\nkqc|||i|Doromu-Koki\nkqd|||i|Koy Sanjaq Surat\nkqe|||i|Kalagan\nkqf|||i|Kakabai\nkqg|||i|Khe\nkqh|||i|Kisankasa\nkqi|||i|Koitabu\nkqj|||i|Koromira\nkqk|||i|Kotafon Gbe\nkql|||i|Kyenele\nkqm|||i|Khisa\nkqn|||i|Kaonde\nkqo|||i|Eastern Krahn\nkqp|||i|Kimr\xE9\nkqq|||i|Krenak\nkqr|||i|Kimaragang\nkqs|||i|Northern Kissi\nkqt|||i|Klias River Kadazan\nkqu|||i|Seroa\nkqv|||i|Okolod\nkqw|||i|Kandas\nkqx|||i|Mser\nkqy|||i|Koorete\nkqz|||i|Korana\nkra|||i|Kumhali\nkrb|||i|Karkin\nkrc|krc||i|Karachay-Balkar\nkrd|||i|Kairui-Midiki\nkre|||i|Panar\xE1\nkrf|||i|Koro (Vanuatu)\nkrh|||i|Kurama\nkri|||i|Krio\nkrj|||i|Kinaray-A\nkrk|||i|Kerek\nkrl|krl||i|Karelian\nkrn|||i|Sapo\nkrp|||i|Korop\nkrr|||i|Krung\nkrs|||i|Gbaya (Sudan)\nkrt|||i|Tumari Kanuri\nkru|kru||i|Kurukh\nkrv|||i|Kavet\nkrw|||i|Western Krahn\nkrx|||i|Karon\nkry|||i|Kryts\nkrz|||i|Sota Kanum\nksa|||i|Shuwa-Zamani\nksb|||i|Shambala\nksc|||i|Southern Kalinga\nksd|||i|Kuanua\nkse|||i|Kuni\nksf|||i|Bafia\nksg|||i|Kusaghe\nksh|||i|K\xF6lsch\nksi|||i|Krisa\nksj|||i|Uare\nksk|||i|Kansa\nksl|||i|Kumalu\nksm|||i|Kumba\nksn|||i|Kasiguranin\nkso|||i|Kofa\nksp|||i|Kaba\nksq|||i|Kwaami\nksr|||i|Borong\nkss|||i|Southern Kisi\nkst|||i|Winy\xE9\nksu|||i|Khamyang\nksv|||i|Kusu\nksw|||i|S'gaw Karen\nksx|||i|Kedang\nksy|||i|Kharia Thar\nksz|||i|Kodaku\nkta|||i|Katua\nktb|||i|Kambaata\nktc|||i|Kholok\nktd|||i|Kokata\nkte|||i|Nubri\nktf|||i|Kwami\nktg|||i|Kalkutung\nkth|||i|Karanga\nkti|||i|North Muyu\nktj|||i|Plapo Krumen\nktk|||i|Kaniet\nktl|||i|Koroshi\nktm|||i|Kurti\nktn|||i|Kariti\xE2na\nkto|||i|Kuot\nktp|||i|Kaduo\nktq|||i|Katabaga\nkts|||i|South Muyu\nktt|||i|Ketum\nktu|||i|Kituba (Democratic Republic of Congo)\nktv|||i|Eastern Katu\nktw|||i|Kato\nktx|||i|Kaxarar\xED\nkty|||i|Kango (Bas-U\xE9l\xE9 District)\nktz|||i|Ju\u01C0\u02BChoan\nkua|kua|kj|i|Kuanyama\nkub|||i|Kutep\nkuc|||i|Kwinsu\nkud|||i|'Auhelawa\nkue|||i|Kuman (Papua New Guinea)\nkuf|||i|Western Katu\nkug|||i|Kupa\nkuh|||i|Kushi\nkui|||i|Kuik\xFAro-Kalap\xE1lo\nkuj|||i|Kuria\nkuk|||i|Kepo'\nkul|||i|Kulere\nkum|kum||i|Kumyk\nkun|||i|Kunama\nkuo|||i|Kumukio\nkup|||i|Kunimaipa\nkuq|||i|Karipuna\nkur|kur|ku|m|Kurdish\nkus|||i|Kusaal\nkut|kut||i|Kutenai\nkuu|||i|Upper Kuskokwim\nkuv|||i|Kur\nkuw|||i|Kpagua\nkux|||i|Kukatja\nkuy|||i|Kuuku-Ya'u\nkuz|||i|Kunza\nkva|||i|Bagvalal\nkvb|||i|Kubu\nkvc|||i|Kove\nkvd|||i|Kui (Indonesia)\nkve|||i|Kalabakan\nkvf|||i|Kabalai\nkvg|||i|Kuni-Boazi\nkvh|||i|Komodo\nkvi|||i|Kwang\nkvj|||i|Psikye\nkvk|||i|Korean Sign Language\nkvl|||i|Kayaw\nkvm|||i|Kendem\nkvn|||i|Border Kuna\nkvo|||i|Dobel\nkvp|||i|Kompane\nkvq|||i|Geba Karen\nkvr|||i|Kerinci\nkvt|||i|Lahta Karen\nkvu|||i|Yinbaw Karen\nkvv|||i|Kola\nkvw|||i|Wersing\nkvx|||i|Parkari Koli\nkvy|||i|Yintale Karen\nkvz|||i|Tsakwambo\nkwa|||i|D\xE2w\nkwb|||i|Kwa\nkwc|||i|Likwala\nkwd|||i|Kwaio\nkwe|||i|Kwerba\nkwf|||i|Kwara'ae\nkwg|||i|Sara Kaba Deme\nkwh|||i|Kowiai\nkwi|||i|Awa-Cuaiquer\nkwj|||i|Kwanga\nkwk|||i|Kwakiutl\nkwl|||i|Kofyar\nkwm|||i|Kwambi\nkwn|||i|Kwangali\nkwo|||i|Kwomtari\nkwp|||i|Kodia\nkwr|||i|Kwer\nkws|||i|Kwese\nkwt|||i|Kwesten\nkwu|||i|Kwakum\nkwv|||i|Sara Kaba N\xE1\xE0\nkww|||i|Kwinti\nkwx|||i|Khirwar\nkwy|||i|San Salvador Kongo\nkwz|||i|Kwadi\nkxa|||i|Kairiru\nkxb|||i|Krobu\nkxc|||i|Konso\nkxd|||i|Brunei\nkxf|||i|Manumanaw Karen\nkxh|||i|Karo (Ethiopia)\nkxi|||i|Keningau Murut\nkxj|||i|Kulfa\nkxk|||i|Zayein Karen\nkxm|||i|Northern Khmer\nkxn|||i|Kanowit-Tanjong Melanau\nkxo|||i|Kano\xE9\nkxp|||i|Wadiyara Koli\nkxq|||i|Sm\xE4rky Kanum\nkxr|||i|Koro (Papua New Guinea)\nkxs|||i|Kangjia\nkxt|||i|Koiwat\nkxv|||i|Kuvi\nkxw|||i|Konai\nkxx|||i|Likuba\nkxy|||i|Kayong\nkxz|||i|Kerewo\nkya|||i|Kwaya\nkyb|||i|Butbut Kalinga\nkyc|||i|Kyaka\nkyd|||i|Karey\nkye|||i|Krache\nkyf|||i|Kouya\nkyg|||i|Keyagana\nkyh|||i|Karok\nkyi|||i|Kiput\nkyj|||i|Karao\nkyk|||i|Kamayo\nkyl|||i|Kalapuya\nkym|||i|Kpatili\nkyn|||i|Northern Binukidnon\nkyo|||i|Kelon\nkyp|||i|Kang\nkyq|||i|Kenga\nkyr|||i|Kuru\xE1ya\nkys|||i|Baram Kayan\nkyt|||i|Kayagar\nkyu|||i|Western Kayah\nkyv|||i|Kayort\nkyw|||i|Kudmali\nkyx|||i|Rapoisi\nkyy|||i|Kambaira\nkyz|||i|Kayab\xED\nkza|||i|Western Karaboro\nkzb|||i|Kaibobo\nkzc|||i|Bondoukou Kulango\nkzd|||i|Kadai\nkze|||i|Kosena\nkzf|||i|Da'a Kaili\nkzg|||i|Kikai\nkzi|||i|Kelabit\nkzk|||i|Kazukuru\nkzl|||i|Kayeli\nkzm|||i|Kais\nkzn|||i|Kokola\nkzo|||i|Kaningi\nkzp|||i|Kaidipang\nkzq|||i|Kaike\nkzr|||i|Karang\nkzs|||i|Sugut Dusun\nkzu|||i|Kayupulau\nkzv|||i|Komyandaret\nkzw|||i|Karir\xED-Xoc\xF3\nkzx|||i|Kamarian\nkzy|||i|Kango (Tshopo District)\nkzz|||i|Kalabra\nlaa|||i|Southern Subanen\nlab|||i|Linear A\nlac|||i|Lacandon\nlad|lad||i|Ladino\nlae|||i|Pattani\nlaf|||i|Lafofa\nlag|||i|Langi\nlah|lah||m|Lahnda\nlai|||i|Lambya\nlaj|||i|Lango (Uganda)\nlak|||i|Laka (Nigeria)\nlal|||i|Lalia\nlam|lam||i|Lamba\nlan|||i|Laru\nlao|lao|lo|i|Lao\nlap|||i|Laka (Chad)\nlaq|||i|Qabiao\nlar|||i|Larteh\nlas|||i|Lama (Togo)\nlat|lat|la|i|Latin\nlau|||i|Laba\nlav|lav|lv|m|Latvian\nlaw|||i|Lauje\nlax|||i|Tiwa\nlay|||i|Lama Bai\nlaz|||i|Aribwatsa\nlbb|||i|Label\nlbc|||i|Lakkia\nlbe|||i|Lak\nlbf|||i|Tinani\nlbg|||i|Laopang\nlbi|||i|La'bi\nlbj|||i|Ladakhi\nlbk|||i|Central Bontok\nlbl|||i|Libon Bikol\nlbm|||i|Lodhi\nlbn|||i|Rmeet\nlbo|||i|Laven\nlbq|||i|Wampar\nlbr|||i|Lohorung\nlbs|||i|Libyan Sign Language\nlbt|||i|Lachi\nlbu|||i|Labu\nlbv|||i|Lavatbura-Lamusong\nlbw|||i|Tolaki\nlbx|||i|Lawangan\nlby|||i|Lamalama\nlbz|||i|Lardil\nlcc|||i|Legenyem\nlcd|||i|Lola\nlce|||i|Loncong\nlcf|||i|Lubu\nlch|||i|Luchazi\nlcl|||i|Lisela\nlcm|||i|Tungag\nlcp|||i|Western Lawa\nlcq|||i|Luhu\nlcs|||i|Lisabata-Nuniali\nlda|||i|Kla-Dan\nldb|||i|Du\u0303ya\nldd|||i|Luri\nldg|||i|Lenyima\nldh|||i|Lamja-Dengsa-Tola\nldi|||i|Laari\nldj|||i|Lemoro\nldk|||i|Leelau\nldl|||i|Kaan\nldm|||i|Landoma\nldn|||i|L\xE1adan\nldo|||i|Loo\nldp|||i|Tso\nldq|||i|Lufu\nlea|||i|Lega-Shabunda\nleb|||i|Lala-Bisa\nlec|||i|Leco\nled|||i|Lendu\nlee|||i|Ly\xE9l\xE9\nlef|||i|Lelemi\nleh|||i|Lenje\nlei|||i|Lemio\nlej|||i|Lengola\nlek|||i|Leipon\nlel|||i|Lele (Democratic Republic of Congo)\nlem|||i|Nomaande\nlen|||i|Lenca\nleo|||i|Leti (Cameroon)\nlep|||i|Lepcha\nleq|||i|Lembena\nler|||i|Lenkau\nles|||i|Lese\nlet|||i|Lesing-Gelimi\nleu|||i|Kara (Papua New Guinea)\nlev|||i|Lamma\nlew|||i|Ledo Kaili\nlex|||i|Luang\nley|||i|Lemolang\nlez|lez||i|Lezghian\nlfa|||i|Lefa\nlfn|||i|Lingua Franca Nova\nlga|||i|Lungga\nlgb|||i|Laghu\nlgg|||i|Lugbara\nlgh|||i|Laghuu\nlgi|||i|Lengilu\nlgk|||i|Lingarak\nlgl|||i|Wala\nlgm|||i|Lega-Mwenga\nlgn|||i|T'apo\nlgq|||i|Logba\nlgr|||i|Lengo\nlgt|||i|Pahi\nlgu|||i|Longgu\nlgz|||i|Ligenza\nlha|||i|Laha (Viet Nam)\nlhh|||i|Laha (Indonesia)\nlhi|||i|Lahu Shi\nlhl|||i|Lahul Lohar\nlhm|||i|Lhomi\nlhn|||i|Lahanan\nlhp|||i|Lhokpu\nlhs|||i|Mlahs\xF6\nlht|||i|Lo-Toga\nlhu|||i|Lahu\nlia|||i|West-Central Limba\nlib|||i|Likum\nlic|||i|Hlai\nlid|||i|Nyindrou\nlie|||i|Likila\nlif|||i|Limbu\nlig|||i|Ligbi\nlih|||i|Lihir\nlij|||i|Ligurian\nlik|||i|Lika\nlil|||i|Lillooet\nlim|lim|li|i|Limburgan\nlin|lin|ln|i|Lingala\nlio|||i|Liki\nlip|||i|Sekpele\nliq|||i|Libido\nlir|||i|Liberian English\nlis|||i|Lisu\nlit|lit|lt|i|Lithuanian\nliu|||i|Logorik\nliv|||i|Liv\nliw|||i|Col\nlix|||i|Liabuku\nliy|||i|Banda-Bambari\nliz|||i|Libinza\nlja|||i|Golpa\nlje|||i|Rampi\nlji|||i|Laiyolo\nljl|||i|Li'o\nljp|||i|Lampung Api\nljw|||i|Yirandali\nljx|||i|Yuru\nlka|||i|Lakalei\nlkb|||i|Kabras\nlkc|||i|Kucong\nlkd|||i|Lakond\xEA\nlke|||i|Kenyi\nlkh|||i|Lakha\nlki|||i|Laki\nlkj|||i|Remun\nlkl|||i|Laeko-Libuat\nlkm|||i|Kalaamaya\nlkn|||i|Lakon\nlko|||i|Khayo\nlkr|||i|P\xE4ri\nlks|||i|Kisa\nlkt|||i|Lakota\nlku|||i|Kungkari\nlky|||i|Lokoya\nlla|||i|Lala-Roba\nllb|||i|Lolo\nllc|||i|Lele (Guinea)\nlld|||i|Ladin\nlle|||i|Lele (Papua New Guinea)\nllf|||i|Hermit\nllg|||i|Lole\nllh|||i|Lamu\nlli|||i|Teke-Laali\nllj|||i|Ladji Ladji\nllk|||i|Lelak\nlll|||i|Lilau\nllm|||i|Lasalimu\nlln|||i|Lele (Chad)\nllp|||i|North Efate\nllq|||i|Lolak\nlls|||i|Lithuanian Sign Language\nllu|||i|Lau\nllx|||i|Lauan\nlma|||i|East Limba\nlmb|||i|Merei\nlmc|||i|Limilngan\nlmd|||i|Lumun\nlme|||i|P\xE9v\xE9\nlmf|||i|South Lembata\nlmg|||i|Lamogai\nlmh|||i|Lambichhong\nlmi|||i|Lombi\nlmj|||i|West Lembata\nlmk|||i|Lamkang\nlml|||i|Hano\nlmn|||i|Lambadi\nlmo|||i|Lombard\nlmp|||i|Limbum\nlmq|||i|Lamatuka\nlmr|||i|Lamalera\nlmu|||i|Lamenu\nlmv|||i|Lomaiviti\nlmw|||i|Lake Miwok\nlmx|||i|Laimbue\nlmy|||i|Lamboya\nlna|||i|Langbashe\nlnb|||i|Mbalanhu\nlnd|||i|Lundayeh\nlng|||i|Langobardic\nlnh|||i|Lanoh\nlni|||i|Daantanai'\nlnj|||i|Leningitij\nlnl|||i|South Central Banda\nlnm|||i|Langam\nlnn|||i|Lorediakarkar\nlno|||i|Lango (South Sudan)\nlns|||i|Lamnso'\nlnu|||i|Longuda\nlnw|||i|Lanima\nlnz|||i|Lonzo\nloa|||i|Loloda\nlob|||i|Lobi\nloc|||i|Inonhan\nloe|||i|Saluan\nlof|||i|Logol\nlog|||i|Logo\nloh|||i|Narim\nloi|||i|Loma (C\xF4te d'Ivoire)\nloj|||i|Lou\nlok|||i|Loko\nlol|lol||i|Mongo\nlom|||i|Loma (Liberia)\nlon|||i|Malawi Lomwe\nloo|||i|Lombo\nlop|||i|Lopa\nloq|||i|Lobala\nlor|||i|T\xE9\xE9n\nlos|||i|Loniu\nlot|||i|Otuho\nlou|||i|Louisiana Creole\nlov|||i|Lopi\nlow|||i|Tampias Lobu\nlox|||i|Loun\nloy|||i|Loke\nloz|loz||i|Lozi\nlpa|||i|Lelepa\nlpe|||i|Lepki\nlpn|||i|Long Phuri Naga\nlpo|||i|Lipo\nlpx|||i|Lopit\nlra|||i|Rara Bakati'\nlrc|||i|Northern Luri\nlre|||i|Laurentian\nlrg|||i|Laragia\nlri|||i|Marachi\nlrk|||i|Loarki\nlrl|||i|Lari\nlrm|||i|Marama\nlrn|||i|Lorang\nlro|||i|Laro\nlrr|||i|Southern Yamphu\nlrt|||i|Larantuka Malay\nlrv|||i|Larevat\nlrz|||i|Lemerig\nlsa|||i|Lasgerdi\nlsd|||i|Lishana Deni\nlse|||i|Lusengo\nlsh|||i|Lish\nlsi|||i|Lashi\nlsl|||i|Latvian Sign Language\nlsm|||i|Saamia\nlsn|||i|Tibetan Sign Language\nlso|||i|Laos Sign Language\nlsp|||i|Panamanian Sign Language\nlsr|||i|Aruop\nlss|||i|Lasi\nlst|||i|Trinidad and Tobago Sign Language\nlsv|||i|Sivia Sign Language\nlsy|||i|Mauritian Sign Language\nltc|||i|Late Middle Chinese\nltg|||i|Latgalian\nlth|||i|Thur\nlti|||i|Leti (Indonesia)\nltn|||i|Latund\xEA\nlto|||i|Tsotso\nlts|||i|Tachoni\nltu|||i|Latu\nltz|ltz|lb|i|Luxembourgish\nlua|lua||i|Luba-Lulua\nlub|lub|lu|i|Luba-Katanga\nluc|||i|Aringa\nlud|||i|Ludian\nlue|||i|Luvale\nluf|||i|Laua\nlug|lug|lg|i|Ganda\nlui|lui||i|Luiseno\nluj|||i|Luna\nluk|||i|Lunanakha\nlul|||i|Olu'bo\nlum|||i|Luimbi\nlun|lun||i|Lunda\nluo|luo||i|Luo (Kenya and Tanzania)\nlup|||i|Lumbu\nluq|||i|Lucumi\nlur|||i|Laura\nlus|lus||i|Lushai\nlut|||i|Lushootseed\nluu|||i|Lumba-Yakkha\nluv|||i|Luwati\nluw|||i|Luo (Cameroon)\nluy|||m|Luyia\nluz|||i|Southern Luri\nlva|||i|Maku'a\nlvi|||i|Lavi\nlvk|||i|Lavukaleve\nlvs|||i|Standard Latvian\nlvu|||i|Levuka\nlwa|||i|Lwalu\nlwe|||i|Lewo Eleng\nlwg|||i|Wanga\nlwh|||i|White Lachi\nlwl|||i|Eastern Lawa\nlwm|||i|Laomian\nlwo|||i|Luwo\nlws|||i|Malawian Sign Language\nlwt|||i|Lewotobi\nlwu|||i|Lawu\nlww|||i|Lewo\nlya|||i|Layakha\nlyg|||i|Lyngngam\nlyn|||i|Luyana\nlzh|||i|Literary Chinese\nlzl|||i|Litzlitz\nlzn|||i|Leinong Naga\nlzz|||i|Laz\nmaa|||i|San Jer\xF3nimo Tec\xF3atl Mazatec\nmab|||i|Yutanduchi Mixtec\nmad|mad||i|Madurese\nmae|||i|Bo-Rukul\nmaf|||i|Mafa\nmag|mag||i|Magahi\nmah|mah|mh|i|Marshallese\nmai|mai||i|Maithili\nmaj|||i|Jalapa De D\xEDaz Mazatec\nmak|mak||i|Makasar\nmal|mal|ml|i|Malayalam\nmam|||i|Mam\nman|man||m|Mandingo\nmaq|||i|Chiquihuitl\xE1n Mazatec\nmar|mar|mr|i|Marathi\nmas|mas||i|Masai\nmat|||i|San Francisco Matlatzinca\nmau|||i|Huautla Mazatec\nmav|||i|Sater\xE9-Maw\xE9\nmaw|||i|Mampruli\nmax|||i|North Moluccan Malay\nmaz|||i|Central Mazahua\nmba|||i|Higaonon\nmbb|||i|Western Bukidnon Manobo\nmbc|||i|Macushi\nmbd|||i|Dibabawon Manobo\nmbe|||i|Molale\nmbf|||i|Baba Malay\nmbh|||i|Mangseng\nmbi|||i|Ilianen Manobo\nmbj|||i|Nad\xEBb\nmbk|||i|Malol\nmbl|||i|Maxakal\xED\nmbm|||i|Ombamba\nmbn|||i|Macagu\xE1n\nmbo|||i|Mbo (Cameroon)\nmbp|||i|Malayo\nmbq|||i|Maisin\nmbr|||i|Nukak Mak\xFA\nmbs|||i|Sarangani Manobo\nmbt|||i|Matigsalug Manobo\nmbu|||i|Mbula-Bwazza\nmbv|||i|Mbulungish\nmbw|||i|Maring\nmbx|||i|Mari (East Sepik Province)\nmby|||i|Memoni\nmbz|||i|Amoltepec Mixtec\nmca|||i|Maca\nmcb|||i|Machiguenga\nmcc|||i|Bitur\nmcd|||i|Sharanahua\nmce|||i|Itundujia Mixtec\nmcf|||i|Mats\xE9s\nmcg|||i|Mapoyo\nmch|||i|Maquiritari\nmci|||i|Mese\nmcj|||i|Mvanip\nmck|||i|Mbunda\nmcl|||i|Macaguaje\nmcm|||i|Malaccan Creole Portuguese\nmcn|||i|Masana\nmco|||i|Coatl\xE1n Mixe\nmcp|||i|Makaa\nmcq|||i|Ese\nmcr|||i|Menya\nmcs|||i|Mambai\nmct|||i|Mengisa\nmcu|||i|Cameroon Mambila\nmcv|||i|Minanibai\nmcw|||i|Mawa (Chad)\nmcx|||i|Mpiemo\nmcy|||i|South Watut\nmcz|||i|Mawan\nmda|||i|Mada (Nigeria)\nmdb|||i|Morigi\nmdc|||i|Male (Papua New Guinea)\nmdd|||i|Mbum\nmde|||i|Maba (Chad)\nmdf|mdf||i|Moksha\nmdg|||i|Massalat\nmdh|||i|Maguindanaon\nmdi|||i|Mamvu\nmdj|||i|Mangbetu\nmdk|||i|Mangbutu\nmdl|||i|Maltese Sign Language\nmdm|||i|Mayogo\nmdn|||i|Mbati\nmdp|||i|Mbala\nmdq|||i|Mbole\nmdr|mdr||i|Mandar\nmds|||i|Maria (Papua New Guinea)\nmdt|||i|Mbere\nmdu|||i|Mboko\nmdv|||i|Santa Luc\xEDa Monteverde Mixtec\nmdw|||i|Mbosi\nmdx|||i|Dizin\nmdy|||i|Male (Ethiopia)\nmdz|||i|Suru\xED Do Par\xE1\nmea|||i|Menka\nmeb|||i|Ikobi\nmec|||i|Marra\nmed|||i|Melpa\nmee|||i|Mengen\nmef|||i|Megam\nmeh|||i|Southwestern Tlaxiaco Mixtec\nmei|||i|Midob\nmej|||i|Meyah\nmek|||i|Mekeo\nmel|||i|Central Melanau\nmem|||i|Mangala\nmen|men||i|Mende (Sierra Leone)\nmeo|||i|Kedah Malay\nmep|||i|Miriwoong\nmeq|||i|Merey\nmer|||i|Meru\nmes|||i|Masmaje\nmet|||i|Mato\nmeu|||i|Motu\nmev|||i|Mano\nmew|||i|Maaka\nmey|||i|Hassaniyya\nmez|||i|Menominee\nmfa|||i|Pattani Malay\nmfb|||i|Bangka\nmfc|||i|Mba\nmfd|||i|Mendankwe-Nkwen\nmfe|||i|Morisyen\nmff|||i|Naki\nmfg|||i|Mogofin\nmfh|||i|Matal\nmfi|||i|Wandala\nmfj|||i|Mefele\nmfk|||i|North Mofu\nmfl|||i|Putai\nmfm|||i|Marghi South\nmfn|||i|Cross River Mbembe\nmfo|||i|Mbe\nmfp|||i|Makassar Malay\nmfq|||i|Moba\nmfr|||i|Marrithiyel\nmfs|||i|Mexican Sign Language\nmft|||i|Mokerang\nmfu|||i|Mbwela\nmfv|||i|Mandjak\nmfw|||i|Mulaha\nmfx|||i|Melo\nmfy|||i|Mayo\nmfz|||i|Mabaan\nmga|mga||i|Middle Irish (900-1200)\nmgb|||i|Mararit\nmgc|||i|Morokodo\nmgd|||i|Moru\nmge|||i|Mango\nmgf|||i|Maklew\nmgg|||i|Mpumpong\nmgh|||i|Makhuwa-Meetto\nmgi|||i|Lijili\nmgj|||i|Abureni\nmgk|||i|Mawes\nmgl|||i|Maleu-Kilenge\nmgm|||i|Mambae\nmgn|||i|Mbangi\nmgo|||i|Meta'\nmgp|||i|Eastern Magar\nmgq|||i|Malila\nmgr|||i|Mambwe-Lungu\nmgs|||i|Manda (Tanzania)\nmgt|||i|Mongol\nmgu|||i|Mailu\nmgv|||i|Matengo\nmgw|||i|Matumbi\nmgy|||i|Mbunga\nmgz|||i|Mbugwe\nmha|||i|Manda (India)\nmhb|||i|Mahongwe\nmhc|||i|Mocho\nmhd|||i|Mbugu\nmhe|||i|Besisi\nmhf|||i|Mamaa\nmhg|||i|Margu\nmhi|||i|Ma'di\nmhj|||i|Mogholi\nmhk|||i|Mungaka\nmhl|||i|Mauwake\nmhm|||i|Makhuwa-Moniga\nmhn|||i|M\xF3cheno\nmho|||i|Mashi (Zambia)\nmhp|||i|Balinese Malay\nmhq|||i|Mandan\nmhr|||i|Eastern Mari\nmhs|||i|Buru (Indonesia)\nmht|||i|Mandahuaca\nmhu|||i|Digaro-Mishmi\nmhw|||i|Mbukushu\nmhx|||i|Maru\nmhy|||i|Ma'anyan\nmhz|||i|Mor (Mor Islands)\nmia|||i|Miami\nmib|||i|Atatl\xE1huca Mixtec\nmic|mic||i|Mi'kmaq\nmid|||i|Mandaic\nmie|||i|Ocotepec Mixtec\nmif|||i|Mofu-Gudur\nmig|||i|San Miguel El Grande Mixtec\nmih|||i|Chayuco Mixtec\nmii|||i|Chigmecatitl\xE1n Mixtec\nmij|||i|Abar\nmik|||i|Mikasuki\nmil|||i|Pe\xF1oles Mixtec\nmim|||i|Alacatlatzala Mixtec\nmin|min||i|Minangkabau\nmio|||i|Pinotepa Nacional Mixtec\nmip|||i|Apasco-Apoala Mixtec\nmiq|||i|M\xEDskito\nmir|||i|Isthmus Mixe\nmis|mis||s|Uncoded languages\nmit|||i|Southern Puebla Mixtec\nmiu|||i|Cacaloxtepec Mixtec\nmiw|||i|Akoye\nmix|||i|Mixtepec Mixtec\nmiy|||i|Ayutla Mixtec\nmiz|||i|Coatzospan Mixtec\nmjb|||i|Makalero\nmjc|||i|San Juan Colorado Mixtec\nmjd|||i|Northwest Maidu\nmje|||i|Muskum\nmjg|||i|Tu\nmjh|||i|Mwera (Nyasa)\nmji|||i|Kim Mun\nmjj|||i|Mawak\nmjk|||i|Matukar\nmjl|||i|Mandeali\nmjm|||i|Medebur\nmjn|||i|Ma (Papua New Guinea)\nmjo|||i|Malankuravan\nmjp|||i|Malapandaram\nmjq|||i|Malaryan\nmjr|||i|Malavedan\nmjs|||i|Miship\nmjt|||i|Sauria Paharia\nmju|||i|Manna-Dora\nmjv|||i|Mannan\nmjw|||i|Karbi\nmjx|||i|Mahali\nmjy|||i|Mahican\nmjz|||i|Majhi\nmka|||i|Mbre\nmkb|||i|Mal Paharia\nmkc|||i|Siliput\nmkd|mac|mk|i|Macedonian\nmke|||i|Mawchi\nmkf|||i|Miya\nmkg|||i|Mak (China)\nmki|||i|Dhatki\nmkj|||i|Mokilese\nmkk|||i|Byep\nmkl|||i|Mokole\nmkm|||i|Moklen\nmkn|||i|Kupang Malay\nmko|||i|Mingang Doso\nmkp|||i|Moikodi\nmkq|||i|Bay Miwok\nmkr|||i|Malas\nmks|||i|Silacayoapan Mixtec\nmkt|||i|Vamale\nmku|||i|Konyanka Maninka\nmkv|||i|Mafea\nmkw|||i|Kituba (Congo)\nmkx|||i|Kinamiging Manobo\nmky|||i|East Makian\nmkz|||i|Makasae\nmla|||i|Malo\nmlb|||i|Mbule\nmlc|||i|Cao Lan\nmle|||i|Manambu\nmlf|||i|Mal\nmlg|mlg|mg|m|Malagasy\nmlh|||i|Mape\nmli|||i|Malimpung\nmlj|||i|Miltu\nmlk|||i|Ilwana\nmll|||i|Malua Bay\nmlm|||i|Mulam\nmln|||i|Malango\nmlo|||i|Mlomp\nmlp|||i|Bargam\nmlq|||i|Western Maninkakan\nmlr|||i|Vame\nmls|||i|Masalit\nmlt|mlt|mt|i|Maltese\nmlu|||i|To'abaita\nmlv|||i|Motlav\nmlw|||i|Moloko\nmlx|||i|Malfaxal\nmlz|||i|Malaynon\nmma|||i|Mama\nmmb|||i|Momina\nmmc|||i|Michoac\xE1n Mazahua\nmmd|||i|Maonan\nmme|||i|Mae\nmmf|||i|Mundat\nmmg|||i|North Ambrym\nmmh|||i|Mehin\xE1ku\nmmi|||i|Musar\nmmj|||i|Majhwar\nmmk|||i|Mukha-Dora\nmml|||i|Man Met\nmmm|||i|Maii\nmmn|||i|Mamanwa\nmmo|||i|Mangga Buang\nmmp|||i|Siawi\nmmq|||i|Musak\nmmr|||i|Western Xiangxi Miao\nmmt|||i|Malalamai\nmmu|||i|Mmaala\nmmv|||i|Miriti\nmmw|||i|Emae\nmmx|||i|Madak\nmmy|||i|Migaama\nmmz|||i|Mabaale\nmna|||i|Mbula\nmnb|||i|Muna\nmnc|mnc||i|Manchu\nmnd|||i|Mond\xE9\nmne|||i|Naba\nmnf|||i|Mundani\nmng|||i|Eastern Mnong\nmnh|||i|Mono (Democratic Republic of Congo)\nmni|mni||i|Manipuri\nmnj|||i|Munji\nmnk|||i|Mandinka\nmnl|||i|Tiale\nmnm|||i|Mapena\nmnn|||i|Southern Mnong\nmnp|||i|Min Bei Chinese\nmnq|||i|Minriq\nmnr|||i|Mono (USA)\nmns|||i|Mansi\nmnu|||i|Mer\nmnv|||i|Rennell-Bellona\nmnw|||i|Mon\nmnx|||i|Manikion\nmny|||i|Manyawa\nmnz|||i|Moni\nmoa|||i|Mwan\nmoc|||i|Mocov\xED\nmod|||i|Mobilian\nmoe|||i|Innu\nmog|||i|Mongondow\nmoh|moh||i|Mohawk\nmoi|||i|Mboi\nmoj|||i|Monzombo\nmok|||i|Morori\nmom|||i|Mangue\nmon|mon|mn|m|Mongolian\nmoo|||i|Monom\nmop|||i|Mop\xE1n Maya\nmoq|||i|Mor (Bomberai Peninsula)\nmor|||i|Moro\nmos|mos||i|Mossi\nmot|||i|Bar\xED\nmou|||i|Mogum\nmov|||i|Mohave\nmow|||i|Moi (Congo)\nmox|||i|Molima\nmoy|||i|Shekkacho\nmoz|||i|Mukulu\nmpa|||i|Mpoto\nmpb|||i|Malak Malak\nmpc|||i|Mangarrayi\nmpd|||i|Machinere\nmpe|||i|Majang\nmpg|||i|Marba\nmph|||i|Maung\nmpi|||i|Mpade\nmpj|||i|Martu Wangka\nmpk|||i|Mbara (Chad)\nmpl|||i|Middle Watut\nmpm|||i|Yosond\xFAa Mixtec\nmpn|||i|Mindiri\nmpo|||i|Miu\nmpp|||i|Migabac\nmpq|||i|Mat\xEDs\nmpr|||i|Vangunu\nmps|||i|Dadibi\nmpt|||i|Mian\nmpu|||i|Makur\xE1p\nmpv|||i|Mungkip\nmpw|||i|Mapidian\nmpx|||i|Misima-Panaeati\nmpy|||i|Mapia\nmpz|||i|Mpi\nmqa|||i|Maba (Indonesia)\nmqb|||i|Mbuko\nmqc|||i|Mangole\nmqe|||i|Matepi\nmqf|||i|Momuna\nmqg|||i|Kota Bangun Kutai Malay\nmqh|||i|Tlazoyaltepec Mixtec\nmqi|||i|Mariri\nmqj|||i|Mamasa\nmqk|||i|Rajah Kabunsuwan Manobo\nmql|||i|Mbelime\nmqm|||i|South Marquesan\nmqn|||i|Moronene\nmqo|||i|Modole\nmqp|||i|Manipa\nmqq|||i|Minokok\nmqr|||i|Mander\nmqs|||i|West Makian\nmqt|||i|Mok\nmqu|||i|Mandari\nmqv|||i|Mosimo\nmqw|||i|Murupi\nmqx|||i|Mamuju\nmqy|||i|Manggarai\nmqz|||i|Pano\nmra|||i|Mlabri\nmrb|||i|Marino\nmrc|||i|Maricopa\nmrd|||i|Western Magar\nmre|||i|Martha's Vineyard Sign Language\nmrf|||i|Elseng\nmrg|||i|Mising\nmrh|||i|Mara Chin\nmri|mao|mi|i|Maori\nmrj|||i|Western Mari\nmrk|||i|Hmwaveke\nmrl|||i|Mortlockese\nmrm|||i|Merlav\nmrn|||i|Cheke Holo\nmro|||i|Mru\nmrp|||i|Morouas\nmrq|||i|North Marquesan\nmrr|||i|Maria (India)\nmrs|||i|Maragus\nmrt|||i|Marghi Central\nmru|||i|Mono (Cameroon)\nmrv|||i|Mangareva\nmrw|||i|Maranao\nmrx|||i|Maremgi\nmry|||i|Mandaya\nmrz|||i|Marind\nmsa|may|ms|m|Malay (macrolanguage)\nmsb|||i|Masbatenyo\nmsc|||i|Sankaran Maninka\nmsd|||i|Yucatec Maya Sign Language\nmse|||i|Musey\nmsf|||i|Mekwei\nmsg|||i|Moraid\nmsh|||i|Masikoro Malagasy\nmsi|||i|Sabah Malay\nmsj|||i|Ma (Democratic Republic of Congo)\nmsk|||i|Mansaka\nmsl|||i|Molof\nmsm|||i|Agusan Manobo\nmsn|||i|Vur\xEBs\nmso|||i|Mombum\nmsp|||i|Maritsau\xE1\nmsq|||i|Caac\nmsr|||i|Mongolian Sign Language\nmss|||i|West Masela\nmsu|||i|Musom\nmsv|||i|Maslam\nmsw|||i|Mansoanka\nmsx|||i|Moresada\nmsy|||i|Aruamu\nmsz|||i|Momare\nmta|||i|Cotabato Manobo\nmtb|||i|Anyin Morofo\nmtc|||i|Munit\nmtd|||i|Mualang\nmte|||i|Mono (Solomon Islands)\nmtf|||i|Murik (Papua New Guinea)\nmtg|||i|Una\nmth|||i|Munggui\nmti|||i|Maiwa (Papua New Guinea)\nmtj|||i|Moskona\nmtk|||i|Mbe'\nmtl|||i|Montol\nmtm|||i|Mator\nmtn|||i|Matagalpa\nmto|||i|Totontepec Mixe\nmtp|||i|Wich\xED Lhamt\xE9s Nocten\nmtq|||i|Muong\nmtr|||i|Mewari\nmts|||i|Yora\nmtt|||i|Mota\nmtu|||i|Tututepec Mixtec\nmtv|||i|Asaro'o\nmtw|||i|Southern Binukidnon\nmtx|||i|Tida\xE1 Mixtec\nmty|||i|Nabi\nmua|||i|Mundang\nmub|||i|Mubi\nmuc|||i|Ajumbu\nmud|||i|Mednyj Aleut\nmue|||i|Media Lengua\nmug|||i|Musgu\nmuh|||i|M\xFCnd\xFC\nmui|||i|Musi\nmuj|||i|Mabire\nmuk|||i|Mugom\nmul|mul||s|Multiple languages\nmum|||i|Maiwala\nmuo|||i|Nyong\nmup|||i|Malvi\nmuq|||i|Eastern Xiangxi Miao\nmur|||i|Murle\nmus|mus||i|Creek\nmut|||i|Western Muria\nmuu|||i|Yaaku\nmuv|||i|Muthuvan\nmux|||i|Bo-Ung\nmuy|||i|Muyang\nmuz|||i|Mursi\nmva|||i|Manam\nmvb|||i|Mattole\nmvd|||i|Mamboru\nmve|||i|Marwari (Pakistan)\nmvf|||i|Peripheral Mongolian\nmvg|||i|Yucua\xF1e Mixtec\nmvh|||i|Mulgi\nmvi|||i|Miyako\nmvk|||i|Mekmek\nmvl|||i|Mbara (Australia)\nmvm|||i|Muya\nmvn|||i|Minaveha\nmvo|||i|Marovo\nmvp|||i|Duri\nmvq|||i|Moere\nmvr|||i|Marau\nmvs|||i|Massep\nmvt|||i|Mpotovoro\nmvu|||i|Marfa\nmvv|||i|Tagal Murut\nmvw|||i|Machinga\nmvx|||i|Meoswar\nmvy|||i|Indus Kohistani\nmvz|||i|Mesqan\nmwa|||i|Mwatebu\nmwb|||i|Juwal\nmwc|||i|Are\nmwe|||i|Mwera (Chimwera)\nmwf|||i|Murrinh-Patha\nmwg|||i|Aiklep\nmwh|||i|Mouk-Aria\nmwi|||i|Labo\nmwk|||i|Kita Maninkakan\nmwl|mwl||i|Mirandese\nmwm|||i|Sar\nmwn|||i|Nyamwanga\nmwo|||i|Central Maewo\nmwp|||i|Kala Lagaw Ya\nmwq|||i|M\xFCn Chin\nmwr|mwr||m|Marwari\nmws|||i|Mwimbi-Muthambi\nmwt|||i|Moken\nmwu|||i|Mittu\nmwv|||i|Mentawai\nmww|||i|Hmong Daw\nmwz|||i|Moingi\nmxa|||i|Northwest Oaxaca Mixtec\nmxb|||i|Tezoatl\xE1n Mixtec\nmxc|||i|Manyika\nmxd|||i|Modang\nmxe|||i|Mele-Fila\nmxf|||i|Malgbe\nmxg|||i|Mbangala\nmxh|||i|Mvuba\nmxi|||i|Mozarabic\nmxj|||i|Miju-Mishmi\nmxk|||i|Monumbo\nmxl|||i|Maxi Gbe\nmxm|||i|Meramera\nmxn|||i|Moi (Indonesia)\nmxo|||i|Mbowe\nmxp|||i|Tlahuitoltepec Mixe\nmxq|||i|Juquila Mixe\nmxr|||i|Murik (Malaysia)\nmxs|||i|Huitepec Mixtec\nmxt|||i|Jamiltepec Mixtec\nmxu|||i|Mada (Cameroon)\nmxv|||i|Metlat\xF3noc Mixtec\nmxw|||i|Namo\nmxx|||i|Mahou\nmxy|||i|Southeastern Nochixtl\xE1n Mixtec\nmxz|||i|Central Masela\nmya|bur|my|i|Burmese\nmyb|||i|Mbay\nmyc|||i|Mayeka\nmye|||i|Myene\nmyf|||i|Bambassi\nmyg|||i|Manta\nmyh|||i|Makah\nmyj|||i|Mangayat\nmyk|||i|Mamara Senoufo\nmyl|||i|Moma\nmym|||i|Me'en\nmyo|||i|Anfillo\nmyp|||i|Pirah\xE3\nmyr|||i|Muniche\nmys|||i|Mesmes\nmyu|||i|Munduruk\xFA\nmyv|myv||i|Erzya\nmyw|||i|Muyuw\nmyx|||i|Masaaba\nmyy|||i|Macuna\nmyz|||i|Classical Mandaic\nmza|||i|Santa Mar\xEDa Zacatepec Mixtec\nmzb|||i|Tumzabt\nmzc|||i|Madagascar Sign Language\nmzd|||i|Malimba\nmze|||i|Morawa\nmzg|||i|Monastic Sign Language\nmzh|||i|Wich\xED Lhamt\xE9s G\xFCisnay\nmzi|||i|Ixcatl\xE1n Mazatec\nmzj|||i|Manya\nmzk|||i|Nigeria Mambila\nmzl|||i|Mazatl\xE1n Mixe\nmzm|||i|Mumuye\nmzn|||i|Mazanderani\nmzo|||i|Matipuhy\nmzp|||i|Movima\nmzq|||i|Mori Atas\nmzr|||i|Mar\xFAbo\nmzs|||i|Macanese\nmzt|||i|Mintil\nmzu|||i|Inapang\nmzv|||i|Manza\nmzw|||i|Deg\nmzx|||i|Mawayana\nmzy|||i|Mozambican Sign Language\nmzz|||i|Maiadomu\nnaa|||i|Namla\nnab|||i|Southern Nambiku\xE1ra\nnac|||i|Narak\nnae|||i|Naka'ela\nnaf|||i|Nabak\nnag|||i|Naga Pidgin\nnaj|||i|Nalu\nnak|||i|Nakanai\nnal|||i|Nalik\nnam|||i|Ngan'gityemerri\nnan|||i|Min Nan Chinese\nnao|||i|Naaba\nnap|nap||i|Neapolitan\nnaq|||i|Khoekhoe\nnar|||i|Iguta\nnas|||i|Naasioi\nnat|||i|Ca\u0331hungwa\u0331rya\u0331\nnau|nau|na|i|Nauru\nnav|nav|nv|i|Navajo\nnaw|||i|Nawuri\nnax|||i|Nakwi\nnay|||i|Ngarrindjeri\nnaz|||i|Coatepec Nahuatl\nnba|||i|Nyemba\nnbb|||i|Ndoe\nnbc|||i|Chang Naga\nnbd|||i|Ngbinda\nnbe|||i|Konyak Naga\nnbg|||i|Nagarchal\nnbh|||i|Ngamo\nnbi|||i|Mao Naga\nnbj|||i|Ngarinyman\nnbk|||i|Nake\nnbl|nbl|nr|i|South Ndebele\nnbm|||i|Ngbaka Ma'bo\nnbn|||i|Kuri\nnbo|||i|Nkukoli\nnbp|||i|Nnam\nnbq|||i|Nggem\nnbr|||i|Numana\nnbs|||i|Namibian Sign Language\nnbt|||i|Na\nnbu|||i|Rongmei Naga\nnbv|||i|Ngamambo\nnbw|||i|Southern Ngbandi\nnby|||i|Ningera\nnca|||i|Iyo\nncb|||i|Central Nicobarese\nncc|||i|Ponam\nncd|||i|Nachering\nnce|||i|Yale\nncf|||i|Notsi\nncg|||i|Nisga'a\nnch|||i|Central Huasteca Nahuatl\nnci|||i|Classical Nahuatl\nncj|||i|Northern Puebla Nahuatl\nnck|||i|Na-kara\nncl|||i|Michoac\xE1n Nahuatl\nncm|||i|Nambo\nncn|||i|Nauna\nnco|||i|Sibe\nncq|||i|Northern Katang\nncr|||i|Ncane\nncs|||i|Nicaraguan Sign Language\nnct|||i|Chothe Naga\nncu|||i|Chumburung\nncx|||i|Central Puebla Nahuatl\nncz|||i|Natchez\nnda|||i|Ndasa\nndb|||i|Kenswei Nsei\nndc|||i|Ndau\nndd|||i|Nde-Nsele-Nta\nnde|nde|nd|i|North Ndebele\nndf|||i|Nadruvian\nndg|||i|Ndengereko\nndh|||i|Ndali\nndi|||i|Samba Leko\nndj|||i|Ndamba\nndk|||i|Ndaka\nndl|||i|Ndolo\nndm|||i|Ndam\nndn|||i|Ngundi\nndo|ndo|ng|i|Ndonga\nndp|||i|Ndo\nndq|||i|Ndombe\nndr|||i|Ndoola\nnds|nds||i|Low German\nndt|||i|Ndunga\nndu|||i|Dugun\nndv|||i|Ndut\nndw|||i|Ndobo\nndx|||i|Nduga\nndy|||i|Lutos\nndz|||i|Ndogo\nnea|||i|Eastern Ngad'a\nneb|||i|Toura (C\xF4te d'Ivoire)\nnec|||i|Nedebang\nned|||i|Nde-Gbite\nnee|||i|N\xEAl\xEAmwa-Nixumwak\nnef|||i|Nefamese\nneg|||i|Negidal\nneh|||i|Nyenkha\nnei|||i|Neo-Hittite\nnej|||i|Neko\nnek|||i|Neku\nnem|||i|Nemi\nnen|||i|Nengone\nneo|||i|N\xE1-Meo\nnep|nep|ne|m|Nepali (macrolanguage)\nneq|||i|North Central Mixe\nner|||i|Yahadian\nnes|||i|Bhoti Kinnauri\nnet|||i|Nete\nneu|||i|Neo\nnev|||i|Nyaheun\nnew|new||i|Newari\nnex|||i|Neme\nney|||i|Neyo\nnez|||i|Nez Perce\nnfa|||i|Dhao\nnfd|||i|Ahwai\nnfl|||i|Ayiwo\nnfr|||i|Nafaanra\nnfu|||i|Mfumte\nnga|||i|Ngbaka\nngb|||i|Northern Ngbandi\nngc|||i|Ngombe (Democratic Republic of Congo)\nngd|||i|Ngando (Central African Republic)\nnge|||i|Ngemba\nngg|||i|Ngbaka Manza\nngh|||i|N\u01C1ng\nngi|||i|Ngizim\nngj|||i|Ngie\nngk|||i|Dalabon\nngl|||i|Lomwe\nngm|||i|Ngatik Men's Creole\nngn|||i|Ngwo\nngo|||i|Ngoni\nngp|||i|Ngulu\nngq|||i|Ngurimi\nngr|||i|Engdewu\nngs|||i|Gvoko\nngt|||i|Kriang\nngu|||i|Guerrero Nahuatl\nngv|||i|Nagumi\nngw|||i|Ngwaba\nngx|||i|Nggwahyi\nngy|||i|Tibea\nngz|||i|Ngungwel\nnha|||i|Nhanda\nnhb|||i|Beng\nnhc|||i|Tabasco Nahuatl\nnhd|||i|Chirip\xE1\nnhe|||i|Eastern Huasteca Nahuatl\nnhf|||i|Nhuwala\nnhg|||i|Tetelcingo Nahuatl\nnhh|||i|Nahari\nnhi|||i|Zacatl\xE1n-Ahuacatl\xE1n-Tepetzintla Nahuatl\nnhk|||i|Isthmus-Cosoleacaque Nahuatl\nnhm|||i|Morelos Nahuatl\nnhn|||i|Central Nahuatl\nnho|||i|Takuu\nnhp|||i|Isthmus-Pajapan Nahuatl\nnhq|||i|Huaxcaleca Nahuatl\nnhr|||i|Naro\nnht|||i|Ometepec Nahuatl\nnhu|||i|Noone\nnhv|||i|Temascaltepec Nahuatl\nnhw|||i|Western Huasteca Nahuatl\nnhx|||i|Isthmus-Mecayapan Nahuatl\nnhy|||i|Northern Oaxaca Nahuatl\nnhz|||i|Santa Mar\xEDa La Alta Nahuatl\nnia|nia||i|Nias\nnib|||i|Nakame\nnid|||i|Ngandi\nnie|||i|Niellim\nnif|||i|Nek\nnig|||i|Ngalakgan\nnih|||i|Nyiha (Tanzania)\nnii|||i|Nii\nnij|||i|Ngaju\nnik|||i|Southern Nicobarese\nnil|||i|Nila\nnim|||i|Nilamba\nnin|||i|Ninzo\nnio|||i|Nganasan\nniq|||i|Nandi\nnir|||i|Nimboran\nnis|||i|Nimi\nnit|||i|Southeastern Kolami\nniu|niu||i|Niuean\nniv|||i|Gilyak\nniw|||i|Nimo\nnix|||i|Hema\nniy|||i|Ngiti\nniz|||i|Ningil\nnja|||i|Nzanyi\nnjb|||i|Nocte Naga\nnjd|||i|Ndonde Hamba\nnjh|||i|Lotha Naga\nnji|||i|Gudanji\nnjj|||i|Njen\nnjl|||i|Njalgulgule\nnjm|||i|Angami Naga\nnjn|||i|Liangmai Naga\nnjo|||i|Ao Naga\nnjr|||i|Njerep\nnjs|||i|Nisa\nnjt|||i|Ndyuka-Trio Pidgin\nnju|||i|Ngadjunmaya\nnjx|||i|Kunyi\nnjy|||i|Njyem\nnjz|||i|Nyishi\nnka|||i|Nkoya\nnkb|||i|Khoibu Naga\nnkc|||i|Nkongho\nnkd|||i|Koireng\nnke|||i|Duke\nnkf|||i|Inpui Naga\nnkg|||i|Nekgini\nnkh|||i|Khezha Naga\nnki|||i|Thangal Naga\nnkj|||i|Nakai\nnkk|||i|Nokuku\nnkm|||i|Namat\nnkn|||i|Nkangala\nnko|||i|Nkonya\nnkp|||i|Niuatoputapu\nnkq|||i|Nkami\nnkr|||i|Nukuoro\nnks|||i|North Asmat\nnkt|||i|Nyika (Tanzania)\nnku|||i|Bouna Kulango\nnkv|||i|Nyika (Malawi and Zambia)\nnkw|||i|Nkutu\nnkx|||i|Nkoroo\nnkz|||i|Nkari\nnla|||i|Ngombale\nnlc|||i|Nalca\nnld|dut|nl|i|Dutch\nnle|||i|East Nyala\nnlg|||i|Gela\nnli|||i|Grangali\nnlj|||i|Nyali\nnlk|||i|Ninia Yali\nnll|||i|Nihali\nnlm|||i|Mankiyali\nnlo|||i|Ngul\nnlq|||i|Lao Naga\nnlu|||i|Nchumbulu\nnlv|||i|Orizaba Nahuatl\nnlw|||i|Walangama\nnlx|||i|Nahali\nnly|||i|Nyamal\nnlz|||i|Nal\xF6go\nnma|||i|Maram Naga\nnmb|||i|Big Nambas\nnmc|||i|Ngam\nnmd|||i|Ndumu\nnme|||i|Mzieme Naga\nnmf|||i|Tangkhul Naga (India)\nnmg|||i|Kwasio\nnmh|||i|Monsang Naga\nnmi|||i|Nyam\nnmj|||i|Ngombe (Central African Republic)\nnmk|||i|Namakura\nnml|||i|Ndemli\nnmm|||i|Manangba\nnmn|||i|\u01C3X\xF3\xF5\nnmo|||i|Moyon Naga\nnmp|||i|Nimanbur\nnmq|||i|Nambya\nnmr|||i|Nimbari\nnms|||i|Letemboi\nnmt|||i|Namonuito\nnmu|||i|Northeast Maidu\nnmv|||i|Ngamini\nnmw|||i|Nimoa\nnmx|||i|Nama (Papua New Guinea)\nnmy|||i|Namuyi\nnmz|||i|Nawdm\nnna|||i|Nyangumarta\nnnb|||i|Nande\nnnc|||i|Nancere\nnnd|||i|West Ambae\nnne|||i|Ngandyera\nnnf|||i|Ngaing\nnng|||i|Maring Naga\nnnh|||i|Ngiemboon\nnni|||i|North Nuaulu\nnnj|||i|Nyangatom\nnnk|||i|Nankina\nnnl|||i|Northern Rengma Naga\nnnm|||i|Namia\nnnn|||i|Ngete\nnno|nno|nn|i|Norwegian Nynorsk\nnnp|||i|Wancho Naga\nnnq|||i|Ngindo\nnnr|||i|Narungga\nnnt|||i|Nanticoke\nnnu|||i|Dwang\nnnv|||i|Nugunu (Australia)\nnnw|||i|Southern Nuni\nnny|||i|Nyangga\nnnz|||i|Nda'nda'\nnoa|||i|Woun Meu\nnob|nob|nb|i|Norwegian Bokm\xE5l\nnoc|||i|Nuk\nnod|||i|Northern Thai\nnoe|||i|Nimadi\nnof|||i|Nomane\nnog|nog||i|Nogai\nnoh|||i|Nomu\nnoi|||i|Noiri\nnoj|||i|Nonuya\nnok|||i|Nooksack\nnol|||i|Nomlaki\nnom|||i|Nocam\xE1n\nnon|non||i|Old Norse\nnop|||i|Numanggang\nnoq|||i|Ngongo\nnor|nor|no|m|Norwegian\nnos|||i|Eastern Nisu\nnot|||i|Nomatsiguenga\nnou|||i|Ewage-Notu\nnov|||i|Novial\nnow|||i|Nyambo\nnoy|||i|Noy\nnoz|||i|Nayi\nnpa|||i|Nar Phu\nnpb|||i|Nupbikha\nnpg|||i|Ponyo-Gongwang Naga\nnph|||i|Phom Naga\nnpi|||i|Nepali (individual language)\nnpl|||i|Southeastern Puebla Nahuatl\nnpn|||i|Mondropolon\nnpo|||i|Pochuri Naga\nnps|||i|Nipsan\nnpu|||i|Puimei Naga\nnpx|||i|Noipx\nnpy|||i|Napu\nnqg|||i|Southern Nago\nnqk|||i|Kura Ede Nago\nnql|||i|Ngendelengo\nnqm|||i|Ndom\nnqn|||i|Nen\nnqo|nqo||i|N'Ko\nnqq|||i|Kyan-Karyaw Naga\nnqy|||i|Akyaung Ari Naga\nnra|||i|Ngom\nnrb|||i|Nara\nnrc|||i|Noric\nnre|||i|Southern Rengma Naga\nnrf|||i|J\xE8rriais\nnrg|||i|Narango\nnri|||i|Chokri Naga\nnrk|||i|Ngarla\nnrl|||i|Ngarluma\nnrm|||i|Narom\nnrn|||i|Norn\nnrp|||i|North Picene\nnrr|||i|Norra\nnrt|||i|Northern Kalapuya\nnru|||i|Narua\nnrx|||i|Ngurmbur\nnrz|||i|Lala\nnsa|||i|Sangtam Naga\nnsb|||i|Lower Nossob\nnsc|||i|Nshi\nnsd|||i|Southern Nisu\nnse|||i|Nsenga\nnsf|||i|Northwestern Nisu\nnsg|||i|Ngasa\nnsh|||i|Ngoshie\nnsi|||i|Nigerian Sign Language\nnsk|||i|Naskapi\nnsl|||i|Norwegian Sign Language\nnsm|||i|Sumi Naga\nnsn|||i|Nehan\nnso|nso||i|Pedi\nnsp|||i|Nepalese Sign Language\nnsq|||i|Northern Sierra Miwok\nnsr|||i|Maritime Sign Language\nnss|||i|Nali\nnst|||i|Tase Naga\nnsu|||i|Sierra Negra Nahuatl\nnsv|||i|Southwestern Nisu\nnsw|||i|Navut\nnsx|||i|Nsongo\nnsy|||i|Nasal\nnsz|||i|Nisenan\nntd|||i|Northern Tidung\nnte|||i|Nathembo\nntg|||i|Ngantangarra\nnti|||i|Natioro\nntj|||i|Ngaanyatjarra\nntk|||i|Ikoma-Nata-Isenye\nntm|||i|Nateni\nnto|||i|Ntomba\nntp|||i|Northern Tepehuan\nntr|||i|Delo\nntu|||i|Nat\xFCgu\nntw|||i|Nottoway\nntx|||i|Tangkhul Naga (Myanmar)\nnty|||i|Mantsi\nntz|||i|Natanzi\nnua|||i|Yuanga\nnuc|||i|Nukuini\nnud|||i|Ngala\nnue|||i|Ngundu\nnuf|||i|Nusu\nnug|||i|Nungali\nnuh|||i|Ndunda\nnui|||i|Ngumbi\nnuj|||i|Nyole\nnuk|||i|Nuu-chah-nulth\nnul|||i|Nusa Laut\nnum|||i|Niuafo'ou\nnun|||i|Anong\nnuo|||i|Ngu\xF4n\nnup|||i|Nupe-Nupe-Tako\nnuq|||i|Nukumanu\nnur|||i|Nukuria\nnus|||i|Nuer\nnut|||i|Nung (Viet Nam)\nnuu|||i|Ngbundu\nnuv|||i|Northern Nuni\nnuw|||i|Nguluwan\nnux|||i|Mehek\nnuy|||i|Nunggubuyu\nnuz|||i|Tlamacazapa Nahuatl\nnvh|||i|Nasarian\nnvm|||i|Namiae\nnvo|||i|Nyokon\nnwa|||i|Nawathinehena\nnwb|||i|Nyabwa\nnwc|nwc||i|Classical Newari\nnwe|||i|Ngwe\nnwg|||i|Ngayawung\nnwi|||i|Southwest Tanna\nnwm|||i|Nyamusa-Molo\nnwo|||i|Nauo\nnwr|||i|Nawaru\nnwx|||i|Middle Newar\nnwy|||i|Nottoway-Meherrin\nnxa|||i|Nauete\nnxd|||i|Ngando (Democratic Republic of Congo)\nnxe|||i|Nage\nnxg|||i|Ngad'a\nnxi|||i|Nindi\nnxk|||i|Koki Naga\nnxl|||i|South Nuaulu\nnxm|||i|Numidian\nnxn|||i|Ngawun\nnxo|||i|Ndambomo\nnxq|||i|Naxi\nnxr|||i|Ninggerum\nnxx|||i|Nafri\nnya|nya|ny|i|Nyanja\nnyb|||i|Nyangbo\nnyc|||i|Nyanga-li\nnyd|||i|Nyore\nnye|||i|Nyengo\nnyf|||i|Giryama\nnyg|||i|Nyindu\nnyh|||i|Nyikina\nnyi|||i|Ama (Sudan)\nnyj|||i|Nyanga\nnyk|||i|Nyaneka\nnyl|||i|Nyeu\nnym|nym||i|Nyamwezi\nnyn|nyn||i|Nyankole\nnyo|nyo||i|Nyoro\nnyp|||i|Nyang'i\nnyq|||i|Nayini\nnyr|||i|Nyiha (Malawi)\nnys|||i|Nyungar\nnyt|||i|Nyawaygi\nnyu|||i|Nyungwe\nnyv|||i|Nyulnyul\nnyw|||i|Nyaw\nnyx|||i|Nganyaywana\nnyy|||i|Nyakyusa-Ngonde\nnza|||i|Tigon Mbembe\nnzb|||i|Njebi\nnzd|||i|Nzadi\nnzi|nzi||i|Nzima\nnzk|||i|Nzakara\nnzm|||i|Zeme Naga\nnzs|||i|New Zealand Sign Language\nnzu|||i|Teke-Nzikou\nnzy|||i|Nzakambay\nnzz|||i|Nanga Dama Dogon\noaa|||i|Orok\noac|||i|Oroch\noar|||i|Old Aramaic (up to 700 BCE)\noav|||i|Old Avar\nobi|||i|Obispe\xF1o\nobk|||i|Southern Bontok\nobl|||i|Oblo\nobm|||i|Moabite\nobo|||i|Obo Manobo\nobr|||i|Old Burmese\nobt|||i|Old Breton\nobu|||i|Obulom\noca|||i|Ocaina\noch|||i|Old Chinese\noci|oci|oc|i|Occitan (post 1500)\noco|||i|Old Cornish\nocu|||i|Atzingo Matlatzinca\noda|||i|Odut\nodk|||i|Od\nodt|||i|Old Dutch\nodu|||i|Odual\nofo|||i|Ofo\nofs|||i|Old Frisian\nofu|||i|Efutop\nogb|||i|Ogbia\nogc|||i|Ogbah\noge|||i|Old Georgian\nogg|||i|Ogbogolo\nogo|||i|Khana\nogu|||i|Ogbronuagum\noht|||i|Old Hittite\nohu|||i|Old Hungarian\noia|||i|Oirata\noin|||i|Inebu One\nojb|||i|Northwestern Ojibwa\nojc|||i|Central Ojibwa\nojg|||i|Eastern Ojibwa\noji|oji|oj|m|Ojibwa\nojp|||i|Old Japanese\nojs|||i|Severn Ojibwa\nojv|||i|Ontong Java\nojw|||i|Western Ojibwa\noka|||i|Okanagan\nokb|||i|Okobo\nokd|||i|Okodia\noke|||i|Okpe (Southwestern Edo)\nokg|||i|Koko Babangk\nokh|||i|Koresh-e Rostam\noki|||i|Okiek\nokj|||i|Oko-Juwoi\nokk|||i|Kwamtim One\nokl|||i|Old Kentish Sign Language\nokm|||i|Middle Korean (10th-16th cent.)\nokn|||i|Oki-No-Erabu\noko|||i|Old Korean (3rd-9th cent.)\nokr|||i|Kirike\noks|||i|Oko-Eni-Osayen\noku|||i|Oku\nokv|||i|Orokaiva\nokx|||i|Okpe (Northwestern Edo)\nola|||i|Walungge\nold|||i|Mochi\nole|||i|Olekha\nolk|||i|Olkol\nolm|||i|Oloma\nolo|||i|Livvi\nolr|||i|Olrat\nolt|||i|Old Lithuanian\nolu|||i|Kuvale\noma|||i|Omaha-Ponca\nomb|||i|East Ambae\nomc|||i|Mochica\nomg|||i|Omagua\nomi|||i|Omi\nomk|||i|Omok\noml|||i|Ombo\nomn|||i|Minoan\nomo|||i|Utarmbung\nomp|||i|Old Manipuri\nomr|||i|Old Marathi\nomt|||i|Omotik\nomu|||i|Omurano\nomw|||i|South Tairora\nomx|||i|Old Mon\nona|||i|Ona\nonb|||i|Lingao\none|||i|Oneida\nong|||i|Olo\noni|||i|Onin\nonj|||i|Onjob\nonk|||i|Kabore One\nonn|||i|Onobasulu\nono|||i|Onondaga\nonp|||i|Sartang\nonr|||i|Northern One\nons|||i|Ono\nont|||i|Ontenu\nonu|||i|Unua\nonw|||i|Old Nubian\nonx|||i|Onin Based Pidgin\nood|||i|Tohono O'odham\noog|||i|Ong\noon|||i|\xD6nge\noor|||i|Oorlams\noos|||i|Old Ossetic\nopa|||i|Okpamheri\nopk|||i|Kopkaka\nopm|||i|Oksapmin\nopo|||i|Opao\nopt|||i|Opata\nopy|||i|Ofay\xE9\nora|||i|Oroha\norc|||i|Orma\nore|||i|Orej\xF3n\norg|||i|Oring\norh|||i|Oroqen\nori|ori|or|m|Oriya (macrolanguage)\norm|orm|om|m|Oromo\norn|||i|Orang Kanaq\noro|||i|Orokolo\norr|||i|Oruma\nors|||i|Orang Seletar\nort|||i|Adivasi Oriya\noru|||i|Ormuri\norv|||i|Old Russian\norw|||i|Oro Win\norx|||i|Oro\nory|||i|Odia\norz|||i|Ormu\nosa|osa||i|Osage\nosc|||i|Oscan\nosi|||i|Osing\noso|||i|Ososo\nosp|||i|Old Spanish\noss|oss|os|i|Ossetian\nost|||i|Osatu\nosu|||i|Southern One\nosx|||i|Old Saxon\nota|ota||i|Ottoman Turkish (1500-1928)\notb|||i|Old Tibetan\notd|||i|Ot Danum\note|||i|Mezquital Otomi\noti|||i|Oti\notk|||i|Old Turkish\notl|||i|Tilapa Otomi\notm|||i|Eastern Highland Otomi\notn|||i|Tenango Otomi\notq|||i|Quer\xE9taro Otomi\notr|||i|Otoro\nots|||i|Estado de M\xE9xico Otomi\nott|||i|Temoaya Otomi\notu|||i|Otuke\notw|||i|Ottawa\notx|||i|Texcatepec Otomi\noty|||i|Old Tamil\notz|||i|Ixtenco Otomi\noua|||i|Tagargrent\noub|||i|Glio-Oubi\noue|||i|Oune\noui|||i|Old Uighur\noum|||i|Ouma\novd|||i|Elfdalian\nowi|||i|Owiniga\nowl|||i|Old Welsh\noyb|||i|Oy\noyd|||i|Oyda\noym|||i|Wayampi\noyy|||i|Oya'oya\nozm|||i|Koonzime\npab|||i|Parec\xEDs\npac|||i|Pacoh\npad|||i|Paumar\xED\npae|||i|Pagibete\npaf|||i|Paranaw\xE1t\npag|pag||i|Pangasinan\npah|||i|Tenharim\npai|||i|Pe\npak|||i|Parakan\xE3\npal|pal||i|Pahlavi\npam|pam||i|Pampanga\npan|pan|pa|i|Panjabi\npao|||i|Northern Paiute\npap|pap||i|Papiamento\npaq|||i|Parya\npar|||i|Panamint\npas|||i|Papasena\npat|||i|Papitalai\npau|pau||i|Palauan\npav|||i|Paka\xE1snovos\npaw|||i|Pawnee\npax|||i|Pankarar\xE9\npay|||i|Pech\npaz|||i|Pankarar\xFA\npbb|||i|P\xE1ez\npbc|||i|Patamona\npbe|||i|Mezontla Popoloca\npbf|||i|Coyotepec Popoloca\npbg|||i|Paraujano\npbh|||i|E'\xF1apa Woromaipu\npbi|||i|Parkwa\npbl|||i|Mak (Nigeria)\npbm|||i|Puebla Mazatec\npbn|||i|Kpasam\npbo|||i|Papel\npbp|||i|Badyara\npbr|||i|Pangwa\npbs|||i|Central Pame\npbt|||i|Southern Pashto\npbu|||i|Northern Pashto\npbv|||i|Pnar\npby|||i|Pyu (Papua New Guinea)\npca|||i|Santa In\xE9s Ahuatempan Popoloca\npcb|||i|Pear\npcc|||i|Bouyei\npcd|||i|Picard\npce|||i|Ruching Palaung\npcf|||i|Paliyan\npcg|||i|Paniya\npch|||i|Pardhan\npci|||i|Duruwa\npcj|||i|Parenga\npck|||i|Paite Chin\npcl|||i|Pardhi\npcm|||i|Nigerian Pidgin\npcn|||i|Piti\npcp|||i|Pacahuara\npcw|||i|Pyapun\npda|||i|Anam\npdc|||i|Pennsylvania German\npdi|||i|Pa Di\npdn|||i|Podena\npdo|||i|Padoe\npdt|||i|Plautdietsch\npdu|||i|Kayan\npea|||i|Peranakan Indonesian\npeb|||i|Eastern Pomo\nped|||i|Mala (Papua New Guinea)\npee|||i|Taje\npef|||i|Northeastern Pomo\npeg|||i|Pengo\npeh|||i|Bonan\npei|||i|Chichimeca-Jonaz\npej|||i|Northern Pomo\npek|||i|Penchal\npel|||i|Pekal\npem|||i|Phende\npeo|peo||i|Old Persian (ca. 600-400 B.C.)\npep|||i|Kunja\npeq|||i|Southern Pomo\npes|||i|Iranian Persian\npev|||i|P\xE9mono\npex|||i|Petats\npey|||i|Petjo\npez|||i|Eastern Penan\npfa|||i|P\xE1\xE1fang\npfe|||i|Pere\npfl|||i|Pfaelzisch\npga|||i|Sudanese Creole Arabic\npgd|||i|G\u0101ndh\u0101r\u012B\npgg|||i|Pangwali\npgi|||i|Pagi\npgk|||i|Rerep\npgl|||i|Primitive Irish\npgn|||i|Paelignian\npgs|||i|Pangseng\npgu|||i|Pagu\npgz|||i|Papua New Guinean Sign Language\npha|||i|Pa-Hng\nphd|||i|Phudagi\nphg|||i|Phuong\nphh|||i|Phukha\nphk|||i|Phake\nphl|||i|Phalura\nphm|||i|Phimbi\nphn|phn||i|Phoenician\npho|||i|Phunoi\nphq|||i|Phana'\nphr|||i|Pahari-Potwari\npht|||i|Phu Thai\nphu|||i|Phuan\nphv|||i|Pahlavani\nphw|||i|Phangduwali\npia|||i|Pima Bajo\npib|||i|Yine\npic|||i|Pinji\npid|||i|Piaroa\npie|||i|Piro\npif|||i|Pingelapese\npig|||i|Pisabo\npih|||i|Pitcairn-Norfolk\npii|||i|Pini\npij|||i|Pijao\npil|||i|Yom\npim|||i|Powhatan\npin|||i|Piame\npio|||i|Piapoco\npip|||i|Pero\npir|||i|Piratapuyo\npis|||i|Pijin\npit|||i|Pitta Pitta\npiu|||i|Pintupi-Luritja\npiv|||i|Pileni\npiw|||i|Pimbwe\npix|||i|Piu\npiy|||i|Piya-Kwonci\npiz|||i|Pije\npjt|||i|Pitjantjatjara\npka|||i|Ardham\u0101gadh\u012B Pr\u0101krit\npkb|||i|Pokomo\npkc|||i|Paekche\npkg|||i|Pak-Tong\npkh|||i|Pankhu\npkn|||i|Pakanha\npko|||i|P\xF6koot\npkp|||i|Pukapuka\npkr|||i|Attapady Kurumba\npks|||i|Pakistan Sign Language\npkt|||i|Maleng\npku|||i|Paku\npla|||i|Miani\nplb|||i|Polonombauk\nplc|||i|Central Palawano\npld|||i|Polari\nple|||i|Palu'e\nplg|||i|Pilag\xE1\nplh|||i|Paulohi\npli|pli|pi|i|Pali\nplj|||i|Polci\nplk|||i|Kohistani Shina\npll|||i|Shwe Palaung\npln|||i|Palenquero\nplo|||i|Oluta Popoluca\nplq|||i|Palaic\nplr|||i|Palaka Senoufo\npls|||i|San Marcos Tlacoyalco Popoloca\nplt|||i|Plateau Malagasy\nplu|||i|Palik\xFAr\nplv|||i|Southwest Palawano\nplw|||i|Brooke's Point Palawano\nply|||i|Bolyu\nplz|||i|Paluan\npma|||i|Paama\npmb|||i|Pambia\npmd|||i|Pallanganmiddang\npme|||i|Pwaamei\npmf|||i|Pamona\npmh|||i|M\u0101h\u0101r\u0101\u1E63\u1E6Dri Pr\u0101krit\npmi|||i|Northern Pumi\npmj|||i|Southern Pumi\npmk|||i|Pamlico\npml|||i|Lingua Franca\npmm|||i|Pomo\npmn|||i|Pam\npmo|||i|Pom\npmq|||i|Northern Pame\npmr|||i|Paynamar\npms|||i|Piemontese\npmt|||i|Tuamotuan\npmw|||i|Plains Miwok\npmx|||i|Poumei Naga\npmy|||i|Papuan Malay\npmz|||i|Southern Pame\npna|||i|Punan Bah-Biau\npnb|||i|Western Panjabi\npnc|||i|Pannei\npnd|||i|Mpinda\npne|||i|Western Penan\npng|||i|Pongu\npnh|||i|Penrhyn\npni|||i|Aoheng\npnj|||i|Pinjarup\npnk|||i|Paunaka\npnl|||i|Paleni\npnm|||i|Punan Batu 1\npnn|||i|Pinai-Hagahai\npno|||i|Panobo\npnp|||i|Pancana\npnq|||i|Pana (Burkina Faso)\npnr|||i|Panim\npns|||i|Ponosakan\npnt|||i|Pontic\npnu|||i|Jiongnai Bunu\npnv|||i|Pinigura\npnw|||i|Banyjima\npnx|||i|Phong-Kniang\npny|||i|Pinyin\npnz|||i|Pana (Central African Republic)\npoc|||i|Poqomam\npoe|||i|San Juan Atzingo Popoloca\npof|||i|Poke\npog|||i|Potigu\xE1ra\npoh|||i|Poqomchi'\npoi|||i|Highland Popoluca\npok|||i|Pokang\xE1\npol|pol|pl|i|Polish\npom|||i|Southeastern Pomo\npon|pon||i|Pohnpeian\npoo|||i|Central Pomo\npop|||i|Pwapw\xE2\npoq|||i|Texistepec Popoluca\npor|por|pt|i|Portuguese\npos|||i|Sayula Popoluca\npot|||i|Potawatomi\npov|||i|Upper Guinea Crioulo\npow|||i|San Felipe Otlaltepec Popoloca\npox|||i|Polabian\npoy|||i|Pogolo\nppe|||i|Papi\nppi|||i|Paipai\nppk|||i|Uma\nppl|||i|Pipil\nppm|||i|Papuma\nppn|||i|Papapana\nppo|||i|Folopa\nppp|||i|Pelende\nppq|||i|Pei\npps|||i|San Lu\xEDs Temalacayuca Popoloca\nppt|||i|Pare\nppu|||i|Papora\npqa|||i|Pa'a\npqm|||i|Malecite-Passamaquoddy\nprc|||i|Parachi\nprd|||i|Parsi-Dari\npre|||i|Principense\nprf|||i|Paranan\nprg|||i|Prussian\nprh|||i|Porohanon\npri|||i|Paic\xEE\nprk|||i|Parauk\nprl|||i|Peruvian Sign Language\nprm|||i|Kibiri\nprn|||i|Prasuni\npro|pro||i|Old Proven\xE7al (to 1500)\nprp|||i|Parsi\nprq|||i|Ash\xE9ninka Peren\xE9\nprr|||i|Puri\nprs|||i|Dari\nprt|||i|Phai\npru|||i|Puragi\nprw|||i|Parawen\nprx|||i|Purik\nprz|||i|Providencia Sign Language\npsa|||i|Asue Awyu\npsc|||i|Persian Sign Language\npsd|||i|Plains Indian Sign Language\npse|||i|Central Malay\npsg|||i|Penang Sign Language\npsh|||i|Southwest Pashai\npsi|||i|Southeast Pashai\npsl|||i|Puerto Rican Sign Language\npsm|||i|Pauserna\npsn|||i|Panasuan\npso|||i|Polish Sign Language\npsp|||i|Philippine Sign Language\npsq|||i|Pasi\npsr|||i|Portuguese Sign Language\npss|||i|Kaulong\npst|||i|Central Pashto\npsu|||i|Sauraseni Pr\u0101krit\npsw|||i|Port Sandwich\npsy|||i|Piscataway\npta|||i|Pai Tavytera\npth|||i|Patax\xF3 H\xE3-Ha-H\xE3e\npti|||i|Pindiini\nptn|||i|Patani\npto|||i|Zo'\xE9\nptp|||i|Patep\nptq|||i|Pattapu\nptr|||i|Piamatsina\nptt|||i|Enrekang\nptu|||i|Bambam\nptv|||i|Port Vato\nptw|||i|Pentlatch\npty|||i|Pathiya\npua|||i|Western Highland Purepecha\npub|||i|Purum\npuc|||i|Punan Merap\npud|||i|Punan Aput\npue|||i|Puelche\npuf|||i|Punan Merah\npug|||i|Phuie\npui|||i|Puinave\npuj|||i|Punan Tubu\npum|||i|Puma\npuo|||i|Puoc\npup|||i|Pulabu\npuq|||i|Puquina\npur|||i|Purubor\xE1\npus|pus|ps|m|Pushto\nput|||i|Putoh\npuu|||i|Punu\npuw|||i|Puluwatese\npux|||i|Puare\npuy|||i|Purisime\xF1o\npwa|||i|Pawaia\npwb|||i|Panawa\npwg|||i|Gapapaiwa\npwi|||i|Patwin\npwm|||i|Molbog\npwn|||i|Paiwan\npwo|||i|Pwo Western Karen\npwr|||i|Powari\npww|||i|Pwo Northern Karen\npxm|||i|Quetzaltepec Mixe\npye|||i|Pye Krumen\npym|||i|Fyam\npyn|||i|Poyan\xE1wa\npys|||i|Paraguayan Sign Language\npyu|||i|Puyuma\npyx|||i|Pyu (Myanmar)\npyy|||i|Pyen\npzn|||i|Para Naga\nqua|||i|Quapaw\nqub|||i|Huallaga Hu\xE1nuco Quechua\nquc|||i|K'iche'\nqud|||i|Calder\xF3n Highland Quichua\nque|que|qu|m|Quechua\nquf|||i|Lambayeque Quechua\nqug|||i|Chimborazo Highland Quichua\nquh|||i|South Bolivian Quechua\nqui|||i|Quileute\nquk|||i|Chachapoyas Quechua\nqul|||i|North Bolivian Quechua\nqum|||i|Sipacapense\nqun|||i|Quinault\nqup|||i|Southern Pastaza Quechua\nquq|||i|Quinqui\nqur|||i|Yanahuanca Pasco Quechua\nqus|||i|Santiago del Estero Quichua\nquv|||i|Sacapulteco\nquw|||i|Tena Lowland Quichua\nqux|||i|Yauyos Quechua\nquy|||i|Ayacucho Quechua\nquz|||i|Cusco Quechua\nqva|||i|Ambo-Pasco Quechua\nqvc|||i|Cajamarca Quechua\nqve|||i|Eastern Apur\xEDmac Quechua\nqvh|||i|Huamal\xEDes-Dos de Mayo Hu\xE1nuco Quechua\nqvi|||i|Imbabura Highland Quichua\nqvj|||i|Loja Highland Quichua\nqvl|||i|Cajatambo North Lima Quechua\nqvm|||i|Margos-Yarowilca-Lauricocha Quechua\nqvn|||i|North Jun\xEDn Quechua\nqvo|||i|Napo Lowland Quechua\nqvp|||i|Pacaraos Quechua\nqvs|||i|San Mart\xEDn Quechua\nqvw|||i|Huaylla Wanca Quechua\nqvy|||i|Queyu\nqvz|||i|Northern Pastaza Quichua\nqwa|||i|Corongo Ancash Quechua\nqwc|||i|Classical Quechua\nqwh|||i|Huaylas Ancash Quechua\nqwm|||i|Kuman (Russia)\nqws|||i|Sihuas Ancash Quechua\nqwt|||i|Kwalhioqua-Tlatskanai\nqxa|||i|Chiqui\xE1n Ancash Quechua\nqxc|||i|Chincha Quechua\nqxh|||i|Panao Hu\xE1nuco Quechua\nqxl|||i|Salasaca Highland Quichua\nqxn|||i|Northern Conchucos Ancash Quechua\nqxo|||i|Southern Conchucos Ancash Quechua\nqxp|||i|Puno Quechua\nqxq|||i|Qashqa'i\nqxr|||i|Ca\xF1ar Highland Quichua\nqxs|||i|Southern Qiang\nqxt|||i|Santa Ana de Tusi Pasco Quechua\nqxu|||i|Arequipa-La Uni\xF3n Quechua\nqxw|||i|Jauja Wanca Quechua\nqya|||i|Quenya\nqyp|||i|Quiripi\nraa|||i|Dungmali\nrab|||i|Camling\nrac|||i|Rasawa\nrad|||i|Rade\nraf|||i|Western Meohang\nrag|||i|Logooli\nrah|||i|Rabha\nrai|||i|Ramoaaina\nraj|raj||m|Rajasthani\nrak|||i|Tulu-Bohuai\nral|||i|Ralte\nram|||i|Canela\nran|||i|Riantana\nrao|||i|Rao\nrap|rap||i|Rapanui\nraq|||i|Saam\nrar|rar||i|Rarotongan\nras|||i|Tegali\nrat|||i|Razajerdi\nrau|||i|Raute\nrav|||i|Sampang\nraw|||i|Rawang\nrax|||i|Rang\nray|||i|Rapa\nraz|||i|Rahambuu\nrbb|||i|Rumai Palaung\nrbk|||i|Northern Bontok\nrbl|||i|Miraya Bikol\nrbp|||i|Barababaraba\nrcf|||i|R\xE9union Creole French\nrdb|||i|Rudbari\nrea|||i|Rerau\nreb|||i|Rembong\nree|||i|Rejang Kayan\nreg|||i|Kara (Tanzania)\nrei|||i|Reli\nrej|||i|Rejang\nrel|||i|Rendille\nrem|||i|Remo\nren|||i|Rengao\nrer|||i|Rer Bare\nres|||i|Reshe\nret|||i|Retta\nrey|||i|Reyesano\nrga|||i|Roria\nrge|||i|Romano-Greek\nrgk|||i|Rangkas\nrgn|||i|Romagnol\nrgr|||i|Res\xEDgaro\nrgs|||i|Southern Roglai\nrgu|||i|Ringgou\nrhg|||i|Rohingya\nrhp|||i|Yahang\nria|||i|Riang (India)\nrif|||i|Tarifit\nril|||i|Riang Lang\nrim|||i|Nyaturu\nrin|||i|Nungu\nrir|||i|Ribun\nrit|||i|Ritharrngu\nriu|||i|Riung\nrjg|||i|Rajong\nrji|||i|Raji\nrjs|||i|Rajbanshi\nrka|||i|Kraol\nrkb|||i|Rikbaktsa\nrkh|||i|Rakahanga-Manihiki\nrki|||i|Rakhine\nrkm|||i|Marka\nrkt|||i|Rangpuri\nrkw|||i|Arakwal\nrma|||i|Rama\nrmb|||i|Rembarrnga\nrmc|||i|Carpathian Romani\nrmd|||i|Traveller Danish\nrme|||i|Angloromani\nrmf|||i|Kalo Finnish Romani\nrmg|||i|Traveller Norwegian\nrmh|||i|Murkim\nrmi|||i|Lomavren\nrmk|||i|Romkun\nrml|||i|Baltic Romani\nrmm|||i|Roma\nrmn|||i|Balkan Romani\nrmo|||i|Sinte Romani\nrmp|||i|Rempi\nrmq|||i|Cal\xF3\nrms|||i|Romanian Sign Language\nrmt|||i|Domari\nrmu|||i|Tavringer Romani\nrmv|||i|Romanova\nrmw|||i|Welsh Romani\nrmx|||i|Romam\nrmy|||i|Vlax Romani\nrmz|||i|Marma\nrnd|||i|Ruund\nrng|||i|Ronga\nrnl|||i|Ranglong\nrnn|||i|Roon\nrnp|||i|Rongpo\nrnr|||i|Nari Nari\nrnw|||i|Rungwa\nrob|||i|Tae'\nroc|||i|Cacgia Roglai\nrod|||i|Rogo\nroe|||i|Ronji\nrof|||i|Rombo\nrog|||i|Northern Roglai\nroh|roh|rm|i|Romansh\nrol|||i|Romblomanon\nrom|rom||m|Romany\nron|rum|ro|i|Romanian\nroo|||i|Rotokas\nrop|||i|Kriol\nror|||i|Rongga\nrou|||i|Runga\nrow|||i|Dela-Oenale\nrpn|||i|Repanbitip\nrpt|||i|Rapting\nrri|||i|Ririo\nrro|||i|Waima\nrrt|||i|Arritinngithigh\nrsb|||i|Romano-Serbian\nrsl|||i|Russian Sign Language\nrsm|||i|Miriwoong Sign Language\nrtc|||i|Rungtu Chin\nrth|||i|Ratahan\nrtm|||i|Rotuman\nrts|||i|Yurats\nrtw|||i|Rathawi\nrub|||i|Gungu\nruc|||i|Ruuli\nrue|||i|Rusyn\nruf|||i|Luguru\nrug|||i|Roviana\nruh|||i|Ruga\nrui|||i|Rufiji\nruk|||i|Che\nrun|run|rn|i|Rundi\nruo|||i|Istro Romanian\nrup|rup||i|Macedo-Romanian\nruq|||i|Megleno Romanian\nrus|rus|ru|i|Russian\nrut|||i|Rutul\nruu|||i|Lanas Lobu\nruy|||i|Mala (Nigeria)\nruz|||i|Ruma\nrwa|||i|Rawo\nrwk|||i|Rwa\nrwm|||i|Amba (Uganda)\nrwo|||i|Rawa\nrwr|||i|Marwari (India)\nrxd|||i|Ngardi\nrxw|||i|Karuwali\nryn|||i|Northern Amami-Oshima\nrys|||i|Yaeyama\nryu|||i|Central Okinawan\nrzh|||i|R\u0101zi\u1E25\u012B\nsaa|||i|Saba\nsab|||i|Buglere\nsac|||i|Meskwaki\nsad|sad||i|Sandawe\nsae|||i|Saban\xEA\nsaf|||i|Safaliba\nsag|sag|sg|i|Sango\nsah|sah||i|Yakut\nsaj|||i|Sahu\nsak|||i|Sake\nsam|sam||i|Samaritan Aramaic\nsan|san|sa|i|Sanskrit\nsao|||i|Sause\nsaq|||i|Samburu\nsar|||i|Saraveca\nsas|sas||i|Sasak\nsat|sat||i|Santali\nsau|||i|Saleman\nsav|||i|Saafi-Saafi\nsaw|||i|Sawi\nsax|||i|Sa\nsay|||i|Saya\nsaz|||i|Saurashtra\nsba|||i|Ngambay\nsbb|||i|Simbo\nsbc|||i|Kele (Papua New Guinea)\nsbd|||i|Southern Samo\nsbe|||i|Saliba\nsbf|||i|Chabu\nsbg|||i|Seget\nsbh|||i|Sori-Harengan\nsbi|||i|Seti\nsbj|||i|Surbakhal\nsbk|||i|Safwa\nsbl|||i|Botolan Sambal\nsbm|||i|Sagala\nsbn|||i|Sindhi Bhil\nsbo|||i|Sab\xFCm\nsbp|||i|Sangu (Tanzania)\nsbq|||i|Sileibi\nsbr|||i|Sembakung Murut\nsbs|||i|Subiya\nsbt|||i|Kimki\nsbu|||i|Stod Bhoti\nsbv|||i|Sabine\nsbw|||i|Simba\nsbx|||i|Seberuang\nsby|||i|Soli\nsbz|||i|Sara Kaba\nscb|||i|Chut\nsce|||i|Dongxiang\nscf|||i|San Miguel Creole French\nscg|||i|Sanggau\nsch|||i|Sakachep\nsci|||i|Sri Lankan Creole Malay\nsck|||i|Sadri\nscl|||i|Shina\nscn|scn||i|Sicilian\nsco|sco||i|Scots\nscp|||i|Hyolmo\nscq|||i|Sa'och\nscs|||i|North Slavey\nsct|||i|Southern Katang\nscu|||i|Shumcho\nscv|||i|Sheni\nscw|||i|Sha\nscx|||i|Sicel\nsda|||i|Toraja-Sa'dan\nsdb|||i|Shabak\nsdc|||i|Sassarese Sardinian\nsde|||i|Surubu\nsdf|||i|Sarli\nsdg|||i|Savi\nsdh|||i|Southern Kurdish\nsdj|||i|Suundi\nsdk|||i|Sos Kundi\nsdl|||i|Saudi Arabian Sign Language\nsdn|||i|Gallurese Sardinian\nsdo|||i|Bukar-Sadung Bidayuh\nsdp|||i|Sherdukpen\nsdq|||i|Semandang\nsdr|||i|Oraon Sadri\nsds|||i|Sened\nsdt|||i|Shuadit\nsdu|||i|Sarudu\nsdx|||i|Sibu Melanau\nsdz|||i|Sallands\nsea|||i|Semai\nseb|||i|Shempire Senoufo\nsec|||i|Sechelt\nsed|||i|Sedang\nsee|||i|Seneca\nsef|||i|Cebaara Senoufo\nseg|||i|Segeju\nseh|||i|Sena\nsei|||i|Seri\nsej|||i|Sene\nsek|||i|Sekani\nsel|sel||i|Selkup\nsen|||i|Nanerig\xE9 S\xE9noufo\nseo|||i|Suarmin\nsep|||i|S\xECc\xECt\xE9 S\xE9noufo\nseq|||i|Senara S\xE9noufo\nser|||i|Serrano\nses|||i|Koyraboro Senni Songhai\nset|||i|Sentani\nseu|||i|Serui-Laut\nsev|||i|Nyarafolo Senoufo\nsew|||i|Sewa Bay\nsey|||i|Secoya\nsez|||i|Senthang Chin\nsfb|||i|Langue des signes de Belgique Francophone\nsfe|||i|Eastern Subanen\nsfm|||i|Small Flowery Miao\nsfs|||i|South African Sign Language\nsfw|||i|Sehwi\nsga|sga||i|Old Irish (to 900)\nsgb|||i|Mag-antsi Ayta\nsgc|||i|Kipsigis\nsgd|||i|Surigaonon\nsge|||i|Segai\nsgg|||i|Swiss-German Sign Language\nsgh|||i|Shughni\nsgi|||i|Suga\nsgj|||i|Surgujia\nsgk|||i|Sangkong\nsgm|||i|Singa\nsgp|||i|Singpho\nsgr|||i|Sangisari\nsgs|||i|Samogitian\nsgt|||i|Brokpake\nsgu|||i|Salas\nsgw|||i|Sebat Bet Gurage\nsgx|||i|Sierra Leone Sign Language\nsgy|||i|Sanglechi\nsgz|||i|Sursurunga\nsha|||i|Shall-Zwall\nshb|||i|Ninam\nshc|||i|Sonde\nshd|||i|Kundal Shahi\nshe|||i|Sheko\nshg|||i|Shua\nshh|||i|Shoshoni\nshi|||i|Tachelhit\nshj|||i|Shatt\nshk|||i|Shilluk\nshl|||i|Shendu\nshm|||i|Shahrudi\nshn|shn||i|Shan\nsho|||i|Shanga\nshp|||i|Shipibo-Conibo\nshq|||i|Sala\nshr|||i|Shi\nshs|||i|Shuswap\nsht|||i|Shasta\nshu|||i|Chadian Arabic\nshv|||i|Shehri\nshw|||i|Shwai\nshx|||i|She\nshy|||i|Tachawit\nshz|||i|Syenara Senoufo\nsia|||i|Akkala Sami\nsib|||i|Sebop\nsid|sid||i|Sidamo\nsie|||i|Simaa\nsif|||i|Siamou\nsig|||i|Paasaal\nsih|||i|Zire\nsii|||i|Shom Peng\nsij|||i|Numbami\nsik|||i|Sikiana\nsil|||i|Tumulung Sisaala\nsim|||i|Mende (Papua New Guinea)\nsin|sin|si|i|Sinhala\nsip|||i|Sikkimese\nsiq|||i|Sonia\nsir|||i|Siri\nsis|||i|Siuslaw\nsiu|||i|Sinagen\nsiv|||i|Sumariup\nsiw|||i|Siwai\nsix|||i|Sumau\nsiy|||i|Sivandi\nsiz|||i|Siwi\nsja|||i|Epena\nsjb|||i|Sajau Basap\nsjd|||i|Kildin Sami\nsje|||i|Pite Sami\nsjg|||i|Assangori\nsjk|||i|Kemi Sami\nsjl|||i|Sajalong\nsjm|||i|Mapun\nsjn|||i|Sindarin\nsjo|||i|Xibe\nsjp|||i|Surjapuri\nsjr|||i|Siar-Lak\nsjs|||i|Senhaja De Srair\nsjt|||i|Ter Sami\nsju|||i|Ume Sami\nsjw|||i|Shawnee\nska|||i|Skagit\nskb|||i|Saek\nskc|||i|Ma Manda\nskd|||i|Southern Sierra Miwok\nske|||i|Seke (Vanuatu)\nskf|||i|Sakirabi\xE1\nskg|||i|Sakalava Malagasy\nskh|||i|Sikule\nski|||i|Sika\nskj|||i|Seke (Nepal)\nskm|||i|Kutong\nskn|||i|Kolibugan Subanon\nsko|||i|Seko Tengah\nskp|||i|Sekapan\nskq|||i|Sininkere\nskr|||i|Saraiki\nsks|||i|Maia\nskt|||i|Sakata\nsku|||i|Sakao\nskv|||i|Skou\nskw|||i|Skepi Creole Dutch\nskx|||i|Seko Padang\nsky|||i|Sikaiana\nskz|||i|Sekar\nslc|||i|S\xE1liba\nsld|||i|Sissala\nsle|||i|Sholaga\nslf|||i|Swiss-Italian Sign Language\nslg|||i|Selungai Murut\nslh|||i|Southern Puget Sound Salish\nsli|||i|Lower Silesian\nslj|||i|Salum\xE1\nslk|slo|sk|i|Slovak\nsll|||i|Salt-Yui\nslm|||i|Pangutaran Sama\nsln|||i|Salinan\nslp|||i|Lamaholot\nslq|||i|Salchuq\nslr|||i|Salar\nsls|||i|Singapore Sign Language\nslt|||i|Sila\nslu|||i|Selaru\nslv|slv|sl|i|Slovenian\nslw|||i|Sialum\nslx|||i|Salampasu\nsly|||i|Selayar\nslz|||i|Ma'ya\nsma|sma||i|Southern Sami\nsmb|||i|Simbari\nsmc|||i|Som\nsmd|||i|Sama\nsme|sme|se|i|Northern Sami\nsmf|||i|Auwe\nsmg|||i|Simbali\nsmh|||i|Samei\nsmj|smj||i|Lule Sami\nsmk|||i|Bolinao\nsml|||i|Central Sama\nsmm|||i|Musasa\nsmn|smn||i|Inari Sami\nsmo|smo|sm|i|Samoan\nsmp|||i|Samaritan\nsmq|||i|Samo\nsmr|||i|Simeulue\nsms|sms||i|Skolt Sami\nsmt|||i|Simte\nsmu|||i|Somray\nsmv|||i|Samvedi\nsmw|||i|Sumbawa\nsmx|||i|Samba\nsmy|||i|Semnani\nsmz|||i|Simeku\nsna|sna|sn|i|Shona\nsnb|||i|Sebuyau\nsnc|||i|Sinaugoro\nsnd|snd|sd|i|Sindhi\nsne|||i|Bau Bidayuh\nsnf|||i|Noon\nsng|||i|Sanga (Democratic Republic of Congo)\nsni|||i|Sensi\nsnj|||i|Riverain Sango\nsnk|snk||i|Soninke\nsnl|||i|Sangil\nsnm|||i|Southern Ma'di\nsnn|||i|Siona\nsno|||i|Snohomish\nsnp|||i|Siane\nsnq|||i|Sangu (Gabon)\nsnr|||i|Sihan\nsns|||i|South West Bay\nsnu|||i|Senggi\nsnv|||i|Sa'ban\nsnw|||i|Selee\nsnx|||i|Sam\nsny|||i|Saniyo-Hiyewe\nsnz|||i|Kou\nsoa|||i|Thai Song\nsob|||i|Sobei\nsoc|||i|So (Democratic Republic of Congo)\nsod|||i|Songoora\nsoe|||i|Songomeno\nsog|sog||i|Sogdian\nsoh|||i|Aka\nsoi|||i|Sonha\nsoj|||i|Soi\nsok|||i|Sokoro\nsol|||i|Solos\nsom|som|so|i|Somali\nsoo|||i|Songo\nsop|||i|Songe\nsoq|||i|Kanasi\nsor|||i|Somrai\nsos|||i|Seeku\nsot|sot|st|i|Southern Sotho\nsou|||i|Southern Thai\nsov|||i|Sonsorol\nsow|||i|Sowanda\nsox|||i|Swo\nsoy|||i|Miyobe\nsoz|||i|Temi\nspa|spa|es|i|Spanish\nspb|||i|Sepa (Indonesia)\nspc|||i|Sap\xE9\nspd|||i|Saep\nspe|||i|Sepa (Papua New Guinea)\nspg|||i|Sian\nspi|||i|Saponi\nspk|||i|Sengo\nspl|||i|Selepet\nspm|||i|Akukem\nspn|||i|Sanapan\xE1\nspo|||i|Spokane\nspp|||i|Supyire Senoufo\nspq|||i|Loreto-Ucayali Spanish\nspr|||i|Saparua\nsps|||i|Saposa\nspt|||i|Spiti Bhoti\nspu|||i|Sapuan\nspv|||i|Sambalpuri\nspx|||i|South Picene\nspy|||i|Sabaot\nsqa|||i|Shama-Sambuga\nsqh|||i|Shau\nsqi|alb|sq|m|Albanian\nsqk|||i|Albanian Sign Language\nsqm|||i|Suma\nsqn|||i|Susquehannock\nsqo|||i|Sorkhei\nsqq|||i|Sou\nsqr|||i|Siculo Arabic\nsqs|||i|Sri Lankan Sign Language\nsqt|||i|Soqotri\nsqu|||i|Squamish\nsra|||i|Saruga\nsrb|||i|Sora\nsrc|||i|Logudorese Sardinian\nsrd|srd|sc|m|Sardinian\nsre|||i|Sara\nsrf|||i|Nafi\nsrg|||i|Sulod\nsrh|||i|Sarikoli\nsri|||i|Siriano\nsrk|||i|Serudung Murut\nsrl|||i|Isirawa\nsrm|||i|Saramaccan\nsrn|srn||i|Sranan Tongo\nsro|||i|Campidanese Sardinian\nsrp|srp|sr|i|Serbian\nsrq|||i|Sirion\xF3\nsrr|srr||i|Serer\nsrs|||i|Sarsi\nsrt|||i|Sauri\nsru|||i|Suru\xED\nsrv|||i|Southern Sorsoganon\nsrw|||i|Serua\nsrx|||i|Sirmauri\nsry|||i|Sera\nsrz|||i|Shahmirzadi\nssb|||i|Southern Sama\nssc|||i|Suba-Simbiti\nssd|||i|Siroi\nsse|||i|Balangingi\nssf|||i|Thao\nssg|||i|Seimat\nssh|||i|Shihhi Arabic\nssi|||i|Sansi\nssj|||i|Sausi\nssk|||i|Sunam\nssl|||i|Western Sisaala\nssm|||i|Semnam\nssn|||i|Waata\nsso|||i|Sissano\nssp|||i|Spanish Sign Language\nssq|||i|So'a\nssr|||i|Swiss-French Sign Language\nsss|||i|S\xF4\nsst|||i|Sinasina\nssu|||i|Susuami\nssv|||i|Shark Bay\nssw|ssw|ss|i|Swati\nssx|||i|Samberigi\nssy|||i|Saho\nssz|||i|Sengseng\nsta|||i|Settla\nstb|||i|Northern Subanen\nstd|||i|Sentinel\nste|||i|Liana-Seti\nstf|||i|Seta\nstg|||i|Trieng\nsth|||i|Shelta\nsti|||i|Bulo Stieng\nstj|||i|Matya Samo\nstk|||i|Arammba\nstl|||i|Stellingwerfs\nstm|||i|Setaman\nstn|||i|Owa\nsto|||i|Stoney\nstp|||i|Southeastern Tepehuan\nstq|||i|Saterfriesisch\nstr|||i|Straits Salish\nsts|||i|Shumashti\nstt|||i|Budeh Stieng\nstu|||i|Samtao\nstv|||i|Silt'e\nstw|||i|Satawalese\nsty|||i|Siberian Tatar\nsua|||i|Sulka\nsub|||i|Suku\nsuc|||i|Western Subanon\nsue|||i|Suena\nsug|||i|Suganga\nsui|||i|Suki\nsuj|||i|Shubi\nsuk|suk||i|Sukuma\nsun|sun|su|i|Sundanese\nsuq|||i|Suri\nsur|||i|Mwaghavul\nsus|sus||i|Susu\nsut|||i|Subtiaba\nsuv|||i|Puroik\nsuw|||i|Sumbwa\nsux|sux||i|Sumerian\nsuy|||i|Suy\xE1\nsuz|||i|Sunwar\nsva|||i|Svan\nsvb|||i|Ulau-Suain\nsvc|||i|Vincentian Creole English\nsve|||i|Serili\nsvk|||i|Slovakian Sign Language\nsvm|||i|Slavomolisano\nsvs|||i|Savosavo\nsvx|||i|Skalvian\nswa|swa|sw|m|Swahili (macrolanguage)\nswb|||i|Maore Comorian\nswc|||i|Congo Swahili\nswe|swe|sv|i|Swedish\nswf|||i|Sere\nswg|||i|Swabian\nswh|||i|Swahili (individual language)\nswi|||i|Sui\nswj|||i|Sira\nswk|||i|Malawi Sena\nswl|||i|Swedish Sign Language\nswm|||i|Samosa\nswn|||i|Sawknah\nswo|||i|Shanenawa\nswp|||i|Suau\nswq|||i|Sharwa\nswr|||i|Saweru\nsws|||i|Seluwasan\nswt|||i|Sawila\nswu|||i|Suwawa\nswv|||i|Shekhawati\nsww|||i|Sowa\nswx|||i|Suruah\xE1\nswy|||i|Sarua\nsxb|||i|Suba\nsxc|||i|Sicanian\nsxe|||i|Sighu\nsxg|||i|Shuhi\nsxk|||i|Southern Kalapuya\nsxl|||i|Selian\nsxm|||i|Samre\nsxn|||i|Sangir\nsxo|||i|Sorothaptic\nsxr|||i|Saaroa\nsxs|||i|Sasaru\nsxu|||i|Upper Saxon\nsxw|||i|Saxwe Gbe\nsya|||i|Siang\nsyb|||i|Central Subanen\nsyc|syc||i|Classical Syriac\nsyi|||i|Seki\nsyk|||i|Sukur\nsyl|||i|Sylheti\nsym|||i|Maya Samo\nsyn|||i|Senaya\nsyo|||i|Suoy\nsyr|syr||m|Syriac\nsys|||i|Sinyar\nsyw|||i|Kagate\nsyx|||i|Samay\nsyy|||i|Al-Sayyid Bedouin Sign Language\nsza|||i|Semelai\nszb|||i|Ngalum\nszc|||i|Semaq Beri\nszd|||i|Seru\nsze|||i|Seze\nszg|||i|Sengele\nszl|||i|Silesian\nszn|||i|Sula\nszp|||i|Suabo\nszs|||i|Solomon Islands Sign Language\nszv|||i|Isu (Fako Division)\nszw|||i|Sawai\nszy|||i|Sakizaya\ntaa|||i|Lower Tanana\ntab|||i|Tabassaran\ntac|||i|Lowland Tarahumara\ntad|||i|Tause\ntae|||i|Tariana\ntaf|||i|Tapirap\xE9\ntag|||i|Tagoi\ntah|tah|ty|i|Tahitian\ntaj|||i|Eastern Tamang\ntak|||i|Tala\ntal|||i|Tal\ntam|tam|ta|i|Tamil\ntan|||i|Tangale\ntao|||i|Yami\ntap|||i|Taabwa\ntaq|||i|Tamasheq\ntar|||i|Central Tarahumara\ntas|||i|Tay Boi\ntat|tat|tt|i|Tatar\ntau|||i|Upper Tanana\ntav|||i|Tatuyo\ntaw|||i|Tai\ntax|||i|Tamki\ntay|||i|Atayal\ntaz|||i|Tocho\ntba|||i|Aikan\xE3\ntbc|||i|Takia\ntbd|||i|Kaki Ae\ntbe|||i|Tanimbili\ntbf|||i|Mandara\ntbg|||i|North Tairora\ntbh|||i|Dharawal\ntbi|||i|Gaam\ntbj|||i|Tiang\ntbk|||i|Calamian Tagbanwa\ntbl|||i|Tboli\ntbm|||i|Tagbu\ntbn|||i|Barro Negro Tunebo\ntbo|||i|Tawala\ntbp|||i|Taworta\ntbr|||i|Tumtum\ntbs|||i|Tanguat\ntbt|||i|Tembo (Kitembo)\ntbu|||i|Tubar\ntbv|||i|Tobo\ntbw|||i|Tagbanwa\ntbx|||i|Kapin\ntby|||i|Tabaru\ntbz|||i|Ditammari\ntca|||i|Ticuna\ntcb|||i|Tanacross\ntcc|||i|Datooga\ntcd|||i|Tafi\ntce|||i|Southern Tutchone\ntcf|||i|Malinaltepec Me'phaa\ntcg|||i|Tamagario\ntch|||i|Turks And Caicos Creole English\ntci|||i|W\xE1ra\ntck|||i|Tchitchege\ntcl|||i|Taman (Myanmar)\ntcm|||i|Tanahmerah\ntcn|||i|Tichurong\ntco|||i|Taungyo\ntcp|||i|Tawr Chin\ntcq|||i|Kaiy\ntcs|||i|Torres Strait Creole\ntct|||i|T'en\ntcu|||i|Southeastern Tarahumara\ntcw|||i|Tecpatl\xE1n Totonac\ntcx|||i|Toda\ntcy|||i|Tulu\ntcz|||i|Thado Chin\ntda|||i|Tagdal\ntdb|||i|Panchpargania\ntdc|||i|Ember\xE1-Tad\xF3\ntdd|||i|Tai N\xFCa\ntde|||i|Tiranige Diga Dogon\ntdf|||i|Talieng\ntdg|||i|Western Tamang\ntdh|||i|Thulung\ntdi|||i|Tomadino\ntdj|||i|Tajio\ntdk|||i|Tambas\ntdl|||i|Sur\ntdm|||i|Taruma\ntdn|||i|Tondano\ntdo|||i|Teme\ntdq|||i|Tita\ntdr|||i|Todrah\ntds|||i|Doutai\ntdt|||i|Tetun Dili\ntdv|||i|Toro\ntdx|||i|Tandroy-Mahafaly Malagasy\ntdy|||i|Tadyawan\ntea|||i|Temiar\nteb|||i|Tetete\ntec|||i|Terik\nted|||i|Tepo Krumen\ntee|||i|Huehuetla Tepehua\ntef|||i|Teressa\nteg|||i|Teke-Tege\nteh|||i|Tehuelche\ntei|||i|Torricelli\ntek|||i|Ibali Teke\ntel|tel|te|i|Telugu\ntem|tem||i|Timne\nten|||i|Tama (Colombia)\nteo|||i|Teso\ntep|||i|Tepecano\nteq|||i|Temein\nter|ter||i|Tereno\ntes|||i|Tengger\ntet|tet||i|Tetum\nteu|||i|Soo\ntev|||i|Teor\ntew|||i|Tewa (USA)\ntex|||i|Tennet\ntey|||i|Tulishi\ntez|||i|Tetserret\ntfi|||i|Tofin Gbe\ntfn|||i|Tanaina\ntfo|||i|Tefaro\ntfr|||i|Teribe\ntft|||i|Ternate\ntga|||i|Sagalla\ntgb|||i|Tobilung\ntgc|||i|Tigak\ntgd|||i|Ciwogai\ntge|||i|Eastern Gorkha Tamang\ntgf|||i|Chalikha\ntgh|||i|Tobagonian Creole English\ntgi|||i|Lawunuia\ntgj|||i|Tagin\ntgk|tgk|tg|i|Tajik\ntgl|tgl|tl|i|Tagalog\ntgn|||i|Tandaganon\ntgo|||i|Sudest\ntgp|||i|Tangoa\ntgq|||i|Tring\ntgr|||i|Tareng\ntgs|||i|Nume\ntgt|||i|Central Tagbanwa\ntgu|||i|Tanggu\ntgv|||i|Tingui-Boto\ntgw|||i|Tagwana Senoufo\ntgx|||i|Tagish\ntgy|||i|Togoyo\ntgz|||i|Tagalaka\ntha|tha|th|i|Thai\nthd|||i|Kuuk Thaayorre\nthe|||i|Chitwania Tharu\nthf|||i|Thangmi\nthh|||i|Northern Tarahumara\nthi|||i|Tai Long\nthk|||i|Tharaka\nthl|||i|Dangaura Tharu\nthm|||i|Aheu\nthn|||i|Thachanadan\nthp|||i|Thompson\nthq|||i|Kochila Tharu\nthr|||i|Rana Tharu\nths|||i|Thakali\ntht|||i|Tahltan\nthu|||i|Thuri\nthv|||i|Tahaggart Tamahaq\nthy|||i|Tha\nthz|||i|Tayart Tamajeq\ntia|||i|Tidikelt Tamazight\ntic|||i|Tira\ntif|||i|Tifal\ntig|tig||i|Tigre\ntih|||i|Timugon Murut\ntii|||i|Tiene\ntij|||i|Tilung\ntik|||i|Tikar\ntil|||i|Tillamook\ntim|||i|Timbe\ntin|||i|Tindi\ntio|||i|Teop\ntip|||i|Trimuris\ntiq|||i|Ti\xE9fo\ntir|tir|ti|i|Tigrinya\ntis|||i|Masadiit Itneg\ntit|||i|Tinigua\ntiu|||i|Adasen\ntiv|tiv||i|Tiv\ntiw|||i|Tiwi\ntix|||i|Southern Tiwa\ntiy|||i|Tiruray\ntiz|||i|Tai Hongjin\ntja|||i|Tajuasohn\ntjg|||i|Tunjung\ntji|||i|Northern Tujia\ntjj|||i|Tjungundji\ntjl|||i|Tai Laing\ntjm|||i|Timucua\ntjn|||i|Tonjon\ntjo|||i|Temacine Tamazight\ntjp|||i|Tjupany\ntjs|||i|Southern Tujia\ntju|||i|Tjurruru\ntjw|||i|Djabwurrung\ntka|||i|Truk\xE1\ntkb|||i|Buksa\ntkd|||i|Tukudede\ntke|||i|Takwane\ntkf|||i|Tukumanf\xE9d\ntkg|||i|Tesaka Malagasy\ntkl|tkl||i|Tokelau\ntkm|||i|Takelma\ntkn|||i|Toku-No-Shima\ntkp|||i|Tikopia\ntkq|||i|Tee\ntkr|||i|Tsakhur\ntks|||i|Takestani\ntkt|||i|Kathoriya Tharu\ntku|||i|Upper Necaxa Totonac\ntkv|||i|Mur Pano\ntkw|||i|Teanu\ntkx|||i|Tangko\ntkz|||i|Takua\ntla|||i|Southwestern Tepehuan\ntlb|||i|Tobelo\ntlc|||i|Yecuatla Totonac\ntld|||i|Talaud\ntlf|||i|Telefol\ntlg|||i|Tofanma\ntlh|tlh||i|Klingon\ntli|tli||i|Tlingit\ntlj|||i|Talinga-Bwisi\ntlk|||i|Taloki\ntll|||i|Tetela\ntlm|||i|Tolomako\ntln|||i|Talondo'\ntlo|||i|Talodi\ntlp|||i|Filomena Mata-Coahuitl\xE1n Totonac\ntlq|||i|Tai Loi\ntlr|||i|Talise\ntls|||i|Tambotalo\ntlt|||i|Sou Nama\ntlu|||i|Tulehu\ntlv|||i|Taliabu\ntlx|||i|Khehek\ntly|||i|Talysh\ntma|||i|Tama (Chad)\ntmb|||i|Katbol\ntmc|||i|Tumak\ntmd|||i|Haruai\ntme|||i|Trememb\xE9\ntmf|||i|Toba-Maskoy\ntmg|||i|Ternate\xF1o\ntmh|tmh||m|Tamashek\ntmi|||i|Tutuba\ntmj|||i|Samarokena\ntmk|||i|Northwestern Tamang\ntml|||i|Tamnim Citak\ntmm|||i|Tai Thanh\ntmn|||i|Taman (Indonesia)\ntmo|||i|Temoq\ntmq|||i|Tumleo\ntmr|||i|Jewish Babylonian Aramaic (ca. 200-1200 CE)\ntms|||i|Tima\ntmt|||i|Tasmate\ntmu|||i|Iau\ntmv|||i|Tembo (Motembo)\ntmw|||i|Temuan\ntmy|||i|Tami\ntmz|||i|Tamanaku\ntna|||i|Tacana\ntnb|||i|Western Tunebo\ntnc|||i|Tanimuca-Retuar\xE3\ntnd|||i|Angosturas Tunebo\ntng|||i|Tobanga\ntnh|||i|Maiani\ntni|||i|Tandia\ntnk|||i|Kwamera\ntnl|||i|Lenakel\ntnm|||i|Tabla\ntnn|||i|North Tanna\ntno|||i|Toromono\ntnp|||i|Whitesands\ntnq|||i|Taino\ntnr|||i|M\xE9nik\ntns|||i|Tenis\ntnt|||i|Tontemboan\ntnu|||i|Tay Khang\ntnv|||i|Tangchangya\ntnw|||i|Tonsawang\ntnx|||i|Tanema\ntny|||i|Tongwe\ntnz|||i|Ten'edn\ntob|||i|Toba\ntoc|||i|Coyutla Totonac\ntod|||i|Toma\ntof|||i|Gizrra\ntog|tog||i|Tonga (Nyasa)\ntoh|||i|Gitonga\ntoi|||i|Tonga (Zambia)\ntoj|||i|Tojolabal\ntol|||i|Tolowa\ntom|||i|Tombulu\nton|ton|to|i|Tonga (Tonga Islands)\ntoo|||i|Xicotepec De Ju\xE1rez Totonac\ntop|||i|Papantla Totonac\ntoq|||i|Toposa\ntor|||i|Togbo-Vara Banda\ntos|||i|Highland Totonac\ntou|||i|Tho\ntov|||i|Upper Taromi\ntow|||i|Jemez\ntox|||i|Tobian\ntoy|||i|Topoiyo\ntoz|||i|To\ntpa|||i|Taupota\ntpc|||i|Azoy\xFA Me'phaa\ntpe|||i|Tippera\ntpf|||i|Tarpia\ntpg|||i|Kula\ntpi|tpi||i|Tok Pisin\ntpj|||i|Tapiet\xE9\ntpk|||i|Tupinikin\ntpl|||i|Tlacoapa Me'phaa\ntpm|||i|Tampulma\ntpn|||i|Tupinamb\xE1\ntpo|||i|Tai Pao\ntpp|||i|Pisaflores Tepehua\ntpq|||i|Tukpa\ntpr|||i|Tupar\xED\ntpt|||i|Tlachichilco Tepehua\ntpu|||i|Tampuan\ntpv|||i|Tanapag\ntpw|||i|Tup\xED\ntpx|||i|Acatepec Me'phaa\ntpy|||i|Trumai\ntpz|||i|Tinputz\ntqb|||i|Temb\xE9\ntql|||i|Lehali\ntqm|||i|Turumsa\ntqn|||i|Tenino\ntqo|||i|Toaripi\ntqp|||i|Tomoip\ntqq|||i|Tunni\ntqr|||i|Torona\ntqt|||i|Western Totonac\ntqu|||i|Touo\ntqw|||i|Tonkawa\ntra|||i|Tirahi\ntrb|||i|Terebu\ntrc|||i|Copala Triqui\ntrd|||i|Turi\ntre|||i|East Tarangan\ntrf|||i|Trinidadian Creole English\ntrg|||i|Lish\xE1n Did\xE1n\ntrh|||i|Turaka\ntri|||i|Tri\xF3\ntrj|||i|Toram\ntrl|||i|Traveller Scottish\ntrm|||i|Tregami\ntrn|||i|Trinitario\ntro|||i|Tarao Naga\ntrp|||i|Kok Borok\ntrq|||i|San Mart\xEDn Itunyoso Triqui\ntrr|||i|Taushiro\ntrs|||i|Chicahuaxtla Triqui\ntrt|||i|Tunggare\ntru|||i|Turoyo\ntrv|||i|Taroko\ntrw|||i|Torwali\ntrx|||i|Tringgus-Sembaan Bidayuh\ntry|||i|Turung\ntrz|||i|Tor\xE1\ntsa|||i|Tsaangi\ntsb|||i|Tsamai\ntsc|||i|Tswa\ntsd|||i|Tsakonian\ntse|||i|Tunisian Sign Language\ntsg|||i|Tausug\ntsh|||i|Tsuvan\ntsi|tsi||i|Tsimshian\ntsj|||i|Tshangla\ntsk|||i|Tseku\ntsl|||i|Ts'\xFCn-Lao\ntsm|||i|Turkish Sign Language\ntsn|tsn|tn|i|Tswana\ntso|tso|ts|i|Tsonga\ntsp|||i|Northern Toussian\ntsq|||i|Thai Sign Language\ntsr|||i|Akei\ntss|||i|Taiwan Sign Language\ntst|||i|Tondi Songway Kiini\ntsu|||i|Tsou\ntsv|||i|Tsogo\ntsw|||i|Tsishingini\ntsx|||i|Mubami\ntsy|||i|Tebul Sign Language\ntsz|||i|Purepecha\ntta|||i|Tutelo\nttb|||i|Gaa\nttc|||i|Tektiteko\nttd|||i|Tauade\ntte|||i|Bwanabwana\nttf|||i|Tuotomb\nttg|||i|Tutong\ntth|||i|Upper Ta'oih\ntti|||i|Tobati\nttj|||i|Tooro\nttk|||i|Totoro\nttl|||i|Totela\nttm|||i|Northern Tutchone\nttn|||i|Towei\ntto|||i|Lower Ta'oih\nttp|||i|Tombelala\nttq|||i|Tawallammat Tamajaq\nttr|||i|Tera\ntts|||i|Northeastern Thai\nttt|||i|Muslim Tat\nttu|||i|Torau\nttv|||i|Titan\nttw|||i|Long Wat\ntty|||i|Sikaritai\nttz|||i|Tsum\ntua|||i|Wiarumus\ntub|||i|T\xFCbatulabal\ntuc|||i|Mutu\ntud|||i|Tux\xE1\ntue|||i|Tuyuca\ntuf|||i|Central Tunebo\ntug|||i|Tunia\ntuh|||i|Taulil\ntui|||i|Tupuri\ntuj|||i|Tugutil\ntuk|tuk|tk|i|Turkmen\ntul|||i|Tula\ntum|tum||i|Tumbuka\ntun|||i|Tunica\ntuo|||i|Tucano\ntuq|||i|Tedaga\ntur|tur|tr|i|Turkish\ntus|||i|Tuscarora\ntuu|||i|Tututni\ntuv|||i|Turkana\ntux|||i|Tuxin\xE1wa\ntuy|||i|Tugen\ntuz|||i|Turka\ntva|||i|Vaghua\ntvd|||i|Tsuvadi\ntve|||i|Te'un\ntvk|||i|Southeast Ambrym\ntvl|tvl||i|Tuvalu\ntvm|||i|Tela-Masbuar\ntvn|||i|Tavoyan\ntvo|||i|Tidore\ntvs|||i|Taveta\ntvt|||i|Tutsa Naga\ntvu|||i|Tunen\ntvw|||i|Sedoa\ntvx|||i|Taivoan\ntvy|||i|Timor Pidgin\ntwa|||i|Twana\ntwb|||i|Western Tawbuid\ntwc|||i|Teshenawa\ntwd|||i|Twents\ntwe|||i|Tewa (Indonesia)\ntwf|||i|Northern Tiwa\ntwg|||i|Tereweng\ntwh|||i|Tai D\xF3n\ntwi|twi|tw|i|Twi\ntwl|||i|Tawara\ntwm|||i|Tawang Monpa\ntwn|||i|Twendi\ntwo|||i|Tswapong\ntwp|||i|Ere\ntwq|||i|Tasawaq\ntwr|||i|Southwestern Tarahumara\ntwt|||i|Turiw\xE1ra\ntwu|||i|Termanu\ntww|||i|Tuwari\ntwx|||i|Tewe\ntwy|||i|Tawoyan\ntxa|||i|Tombonuo\ntxb|||i|Tokharian B\ntxc|||i|Tsetsaut\ntxe|||i|Totoli\ntxg|||i|Tangut\ntxh|||i|Thracian\ntxi|||i|Ikpeng\ntxj|||i|Tarjumo\ntxm|||i|Tomini\ntxn|||i|West Tarangan\ntxo|||i|Toto\ntxq|||i|Tii\ntxr|||i|Tartessian\ntxs|||i|Tonsea\ntxt|||i|Citak\ntxu|||i|Kayap\xF3\ntxx|||i|Tatana\ntxy|||i|Tanosy Malagasy\ntya|||i|Tauya\ntye|||i|Kyanga\ntyh|||i|O'du\ntyi|||i|Teke-Tsaayi\ntyj|||i|Tai Do\ntyl|||i|Thu Lao\ntyn|||i|Kombai\ntyp|||i|Thaypan\ntyr|||i|Tai Daeng\ntys|||i|T\xE0y Sa Pa\ntyt|||i|T\xE0y Tac\ntyu|||i|Kua\ntyv|tyv||i|Tuvinian\ntyx|||i|Teke-Tyee\ntyz|||i|T\xE0y\ntza|||i|Tanzanian Sign Language\ntzh|||i|Tzeltal\ntzj|||i|Tz'utujil\ntzl|||i|Talossan\ntzm|||i|Central Atlas Tamazight\ntzn|||i|Tugun\ntzo|||i|Tzotzil\ntzx|||i|Tabriak\nuam|||i|Uamu\xE9\nuan|||i|Kuan\nuar|||i|Tairuma\nuba|||i|Ubang\nubi|||i|Ubi\nubl|||i|Buhi'non Bikol\nubr|||i|Ubir\nubu|||i|Umbu-Ungu\nuby|||i|Ubykh\nuda|||i|Uda\nude|||i|Udihe\nudg|||i|Muduga\nudi|||i|Udi\nudj|||i|Ujir\nudl|||i|Wuzlam\nudm|udm||i|Udmurt\nudu|||i|Uduk\nues|||i|Kioko\nufi|||i|Ufim\nuga|uga||i|Ugaritic\nugb|||i|Kuku-Ugbanh\nuge|||i|Ughele\nugn|||i|Ugandan Sign Language\nugo|||i|Ugong\nugy|||i|Uruguayan Sign Language\nuha|||i|Uhami\nuhn|||i|Damal\nuig|uig|ug|i|Uighur\nuis|||i|Uisai\nuiv|||i|Iyive\nuji|||i|Tanjijili\nuka|||i|Kaburi\nukg|||i|Ukuriguma\nukh|||i|Ukhwejo\nuki|||i|Kui (India)\nukk|||i|Muak Sa-aak\nukl|||i|Ukrainian Sign Language\nukp|||i|Ukpe-Bayobiri\nukq|||i|Ukwa\nukr|ukr|uk|i|Ukrainian\nuks|||i|Urub\xFA-Kaapor Sign Language\nuku|||i|Ukue\nukv|||i|Kuku\nukw|||i|Ukwuani-Aboh-Ndoni\nuky|||i|Kuuk-Yak\nula|||i|Fungwa\nulb|||i|Ulukwumi\nulc|||i|Ulch\nule|||i|Lule\nulf|||i|Usku\nuli|||i|Ulithian\nulk|||i|Meriam Mir\null|||i|Ullatan\nulm|||i|Ulumanda'\nuln|||i|Unserdeutsch\nulu|||i|Uma' Lung\nulw|||i|Ulwa\numa|||i|Umatilla\numb|umb||i|Umbundu\numc|||i|Marrucinian\numd|||i|Umbindhamu\numg|||i|Morrobalama\numi|||i|Ukit\numm|||i|Umon\numn|||i|Makyan Naga\numo|||i|Umot\xEDna\nump|||i|Umpila\numr|||i|Umbugarla\nums|||i|Pendau\numu|||i|Munsee\nuna|||i|North Watut\nund|und||s|Undetermined\nune|||i|Uneme\nung|||i|Ngarinyin\nunk|||i|Enawen\xE9-Naw\xE9\nunm|||i|Unami\nunn|||i|Kurnai\nunr|||i|Mundari\nunu|||i|Unubahe\nunx|||i|Munda\nunz|||i|Unde Kaili\nupi|||i|Umeda\nupv|||i|Uripiv-Wala-Rano-Atchin\nura|||i|Urarina\nurb|||i|Urub\xFA-Kaapor\nurc|||i|Urningangg\nurd|urd|ur|i|Urdu\nure|||i|Uru\nurf|||i|Uradhi\nurg|||i|Urigina\nurh|||i|Urhobo\nuri|||i|Urim\nurk|||i|Urak Lawoi'\nurl|||i|Urali\nurm|||i|Urapmin\nurn|||i|Uruangnirin\nuro|||i|Ura (Papua New Guinea)\nurp|||i|Uru-Pa-In\nurr|||i|Lehalurup\nurt|||i|Urat\nuru|||i|Urumi\nurv|||i|Uruava\nurw|||i|Sop\nurx|||i|Urimo\nury|||i|Orya\nurz|||i|Uru-Eu-Wau-Wau\nusa|||i|Usarufa\nush|||i|Ushojo\nusi|||i|Usui\nusk|||i|Usaghade\nusp|||i|Uspanteco\nuss|||i|us-Saare\nusu|||i|Uya\nuta|||i|Otank\nute|||i|Ute-Southern Paiute\nuth|||i|ut-Hun\nutp|||i|Amba (Solomon Islands)\nutr|||i|Etulo\nutu|||i|Utu\nuum|||i|Urum\nuun|||i|Kulon-Pazeh\nuur|||i|Ura (Vanuatu)\nuuu|||i|U\nuve|||i|West Uvean\nuvh|||i|Uri\nuvl|||i|Lote\nuwa|||i|Kuku-Uwanh\nuya|||i|Doko-Uyanga\nuzb|uzb|uz|m|Uzbek\nuzn|||i|Northern Uzbek\nuzs|||i|Southern Uzbek\nvaa|||i|Vaagri Booli\nvae|||i|Vale\nvaf|||i|Vafsi\nvag|||i|Vagla\nvah|||i|Varhadi-Nagpuri\nvai|vai||i|Vai\nvaj|||i|Sekele\nval|||i|Vehes\nvam|||i|Vanimo\nvan|||i|Valman\nvao|||i|Vao\nvap|||i|Vaiphei\nvar|||i|Huarijio\nvas|||i|Vasavi\nvau|||i|Vanuma\nvav|||i|Varli\nvay|||i|Wayu\nvbb|||i|Southeast Babar\nvbk|||i|Southwestern Bontok\nvec|||i|Venetian\nved|||i|Veddah\nvel|||i|Veluws\nvem|||i|Vemgo-Mabas\nven|ven|ve|i|Venda\nveo|||i|Venture\xF1o\nvep|||i|Veps\nver|||i|Mom Jango\nvgr|||i|Vaghri\nvgt|||i|Vlaamse Gebarentaal\nvic|||i|Virgin Islands Creole English\nvid|||i|Vidunda\nvie|vie|vi|i|Vietnamese\nvif|||i|Vili\nvig|||i|Viemo\nvil|||i|Vilela\nvin|||i|Vinza\nvis|||i|Vishavan\nvit|||i|Viti\nviv|||i|Iduna\nvka|||i|Kariyarra\nvki|||i|Ija-Zuba\nvkj|||i|Kujarge\nvkk|||i|Kaur\nvkl|||i|Kulisusu\nvkm|||i|Kamakan\nvko|||i|Kodeoha\nvkp|||i|Korlai Creole Portuguese\nvkt|||i|Tenggarong Kutai Malay\nvku|||i|Kurrama\nvlp|||i|Valpei\nvls|||i|Vlaams\nvma|||i|Martuyhunira\nvmb|||i|Barbaram\nvmc|||i|Juxtlahuaca Mixtec\nvmd|||i|Mudu Koraga\nvme|||i|East Masela\nvmf|||i|Mainfr\xE4nkisch\nvmg|||i|Lungalunga\nvmh|||i|Maraghei\nvmi|||i|Miwa\nvmj|||i|Ixtayutla Mixtec\nvmk|||i|Makhuwa-Shirima\nvml|||i|Malgana\nvmm|||i|Mitlatongo Mixtec\nvmp|||i|Soyaltepec Mazatec\nvmq|||i|Soyaltepec Mixtec\nvmr|||i|Marenje\nvms|||i|Moksela\nvmu|||i|Muluridyi\nvmv|||i|Valley Maidu\nvmw|||i|Makhuwa\nvmx|||i|Tamazola Mixtec\nvmy|||i|Ayautla Mazatec\nvmz|||i|Mazatl\xE1n Mazatec\nvnk|||i|Vano\nvnm|||i|Vinmavis\nvnp|||i|Vunapu\nvol|vol|vo|i|Volap\xFCk\nvor|||i|Voro\nvot|vot||i|Votic\nvra|||i|Vera'a\nvro|||i|V\xF5ro\nvrs|||i|Varisi\nvrt|||i|Burmbar\nvsi|||i|Moldova Sign Language\nvsl|||i|Venezuelan Sign Language\nvsv|||i|Valencian Sign Language\nvto|||i|Vitou\nvum|||i|Vumbu\nvun|||i|Vunjo\nvut|||i|Vute\nvwa|||i|Awa (China)\nwaa|||i|Walla Walla\nwab|||i|Wab\nwac|||i|Wasco-Wishram\nwad|||i|Wandamen\nwae|||i|Walser\nwaf|||i|Wakon\xE1\nwag|||i|Wa'ema\nwah|||i|Watubela\nwai|||i|Wares\nwaj|||i|Waffa\nwal|wal||i|Wolaytta\nwam|||i|Wampanoag\nwan|||i|Wan\nwao|||i|Wappo\nwap|||i|Wapishana\nwaq|||i|Wagiman\nwar|war||i|Waray (Philippines)\nwas|was||i|Washo\nwat|||i|Kaninuwa\nwau|||i|Waur\xE1\nwav|||i|Waka\nwaw|||i|Waiwai\nwax|||i|Watam\nway|||i|Wayana\nwaz|||i|Wampur\nwba|||i|Warao\nwbb|||i|Wabo\nwbe|||i|Waritai\nwbf|||i|Wara\nwbh|||i|Wanda\nwbi|||i|Vwanji\nwbj|||i|Alagwa\nwbk|||i|Waigali\nwbl|||i|Wakhi\nwbm|||i|Wa\nwbp|||i|Warlpiri\nwbq|||i|Waddar\nwbr|||i|Wagdi\nwbs|||i|West Bengal Sign Language\nwbt|||i|Warnman\nwbv|||i|Wajarri\nwbw|||i|Woi\nwca|||i|Yanom\xE1mi\nwci|||i|Waci Gbe\nwdd|||i|Wandji\nwdg|||i|Wadaginam\nwdj|||i|Wadjiginy\nwdk|||i|Wadikali\nwdu|||i|Wadjigu\nwdy|||i|Wadjabangayi\nwea|||i|Wewaw\nwec|||i|W\xE8 Western\nwed|||i|Wedau\nweg|||i|Wergaia\nweh|||i|Weh\nwei|||i|Kiunum\nwem|||i|Weme Gbe\nweo|||i|Wemale\nwep|||i|Westphalien\nwer|||i|Weri\nwes|||i|Cameroon Pidgin\nwet|||i|Perai\nweu|||i|Rawngtu Chin\nwew|||i|Wejewa\nwfg|||i|Yafi\nwga|||i|Wagaya\nwgb|||i|Wagawaga\nwgg|||i|Wangkangurru\nwgi|||i|Wahgi\nwgo|||i|Waigeo\nwgu|||i|Wirangu\nwgy|||i|Warrgamay\nwha|||i|Sou Upaa\nwhg|||i|North Wahgi\nwhk|||i|Wahau Kenyah\nwhu|||i|Wahau Kayan\nwib|||i|Southern Toussian\nwic|||i|Wichita\nwie|||i|Wik-Epa\nwif|||i|Wik-Keyangan\nwig|||i|Wik Ngathan\nwih|||i|Wik-Me'anha\nwii|||i|Minidien\nwij|||i|Wik-Iiyanh\nwik|||i|Wikalkan\nwil|||i|Wilawila\nwim|||i|Wik-Mungkan\nwin|||i|Ho-Chunk\nwir|||i|Wiraf\xE9d\nwiu|||i|Wiru\nwiv|||i|Vitu\nwiy|||i|Wiyot\nwja|||i|Waja\nwji|||i|Warji\nwka|||i|Kw'adza\nwkb|||i|Kumbaran\nwkd|||i|Wakde\nwkl|||i|Kalanadi\nwkr|||i|Keerray-Woorroong\nwku|||i|Kunduvadi\nwkw|||i|Wakawaka\nwky|||i|Wangkayutyuru\nwla|||i|Walio\nwlc|||i|Mwali Comorian\nwle|||i|Wolane\nwlg|||i|Kunbarlang\nwlh|||i|Welaun\nwli|||i|Waioli\nwlk|||i|Wailaki\nwll|||i|Wali (Sudan)\nwlm|||i|Middle Welsh\nwln|wln|wa|i|Walloon\nwlo|||i|Wolio\nwlr|||i|Wailapa\nwls|||i|Wallisian\nwlu|||i|Wuliwuli\nwlv|||i|Wich\xED Lhamt\xE9s Vejoz\nwlw|||i|Walak\nwlx|||i|Wali (Ghana)\nwly|||i|Waling\nwma|||i|Mawa (Nigeria)\nwmb|||i|Wambaya\nwmc|||i|Wamas\nwmd|||i|Mamaind\xE9\nwme|||i|Wambule\nwmh|||i|Waima'a\nwmi|||i|Wamin\nwmm|||i|Maiwa (Indonesia)\nwmn|||i|Waamwang\nwmo|||i|Wom (Papua New Guinea)\nwms|||i|Wambon\nwmt|||i|Walmajarri\nwmw|||i|Mwani\nwmx|||i|Womo\nwnb|||i|Wanambre\nwnc|||i|Wantoat\nwnd|||i|Wandarang\nwne|||i|Waneci\nwng|||i|Wanggom\nwni|||i|Ndzwani Comorian\nwnk|||i|Wanukaka\nwnm|||i|Wanggamala\nwnn|||i|Wunumara\nwno|||i|Wano\nwnp|||i|Wanap\nwnu|||i|Usan\nwnw|||i|Wintu\nwny|||i|Wanyi\nwoa|||i|Kuwema\nwob|||i|W\xE8 Northern\nwoc|||i|Wogeo\nwod|||i|Wolani\nwoe|||i|Woleaian\nwof|||i|Gambian Wolof\nwog|||i|Wogamusin\nwoi|||i|Kamang\nwok|||i|Longto\nwol|wol|wo|i|Wolof\nwom|||i|Wom (Nigeria)\nwon|||i|Wongo\nwoo|||i|Manombai\nwor|||i|Woria\nwos|||i|Hanga Hundi\nwow|||i|Wawonii\nwoy|||i|Weyto\nwpc|||i|Maco\nwra|||i|Warapu\nwrb|||i|Waluwarra\nwrd|||i|Warduji\nwrg|||i|Warungu\nwrh|||i|Wiradjuri\nwri|||i|Wariyangga\nwrk|||i|Garrwa\nwrl|||i|Warlmanpa\nwrm|||i|Warumungu\nwrn|||i|Warnang\nwro|||i|Worrorra\nwrp|||i|Waropen\nwrr|||i|Wardaman\nwrs|||i|Waris\nwru|||i|Waru\nwrv|||i|Waruna\nwrw|||i|Gugu Warra\nwrx|||i|Wae Rana\nwry|||i|Merwari\nwrz|||i|Waray (Australia)\nwsa|||i|Warembori\nwsg|||i|Adilabad Gondi\nwsi|||i|Wusi\nwsk|||i|Waskia\nwsr|||i|Owenia\nwss|||i|Wasa\nwsu|||i|Wasu\nwsv|||i|Wotapuri-Katarqalai\nwtf|||i|Watiwa\nwth|||i|Wathawurrung\nwti|||i|Berta\nwtk|||i|Watakataui\nwtm|||i|Mewati\nwtw|||i|Wotu\nwua|||i|Wikngenchera\nwub|||i|Wunambal\nwud|||i|Wudu\nwuh|||i|Wutunhua\nwul|||i|Silimo\nwum|||i|Wumbvu\nwun|||i|Bungu\nwur|||i|Wurrugu\nwut|||i|Wutung\nwuu|||i|Wu Chinese\nwuv|||i|Wuvulu-Aua\nwux|||i|Wulna\nwuy|||i|Wauyai\nwwa|||i|Waama\nwwb|||i|Wakabunga\nwwo|||i|Wetamut\nwwr|||i|Warrwa\nwww|||i|Wawa\nwxa|||i|Waxianghua\nwxw|||i|Wardandi\nwya|||i|Wyandot\nwyb|||i|Wangaaybuwan-Ngiyambaa\nwyi|||i|Woiwurrung\nwym|||i|Wymysorys\nwyr|||i|Wayor\xF3\nwyy|||i|Western Fijian\nxaa|||i|Andalusian Arabic\nxab|||i|Sambe\nxac|||i|Kachari\nxad|||i|Adai\nxae|||i|Aequian\nxag|||i|Aghwan\nxai|||i|Kaimb\xE9\nxaj|||i|Ararandew\xE1ra\nxak|||i|M\xE1ku\nxal|xal||i|Kalmyk\nxam|||i|\u01C0Xam\nxan|||i|Xamtanga\nxao|||i|Khao\nxap|||i|Apalachee\nxaq|||i|Aquitanian\nxar|||i|Karami\nxas|||i|Kamas\nxat|||i|Katawixi\nxau|||i|Kauwera\nxav|||i|Xav\xE1nte\nxaw|||i|Kawaiisu\nxay|||i|Kayan Mahakam\nxbb|||i|Lower Burdekin\nxbc|||i|Bactrian\nxbd|||i|Bindal\nxbe|||i|Bigambal\nxbg|||i|Bunganditj\nxbi|||i|Kombio\nxbj|||i|Birrpayi\nxbm|||i|Middle Breton\nxbn|||i|Kenaboi\nxbo|||i|Bolgarian\nxbp|||i|Bibbulman\nxbr|||i|Kambera\nxbw|||i|Kambiw\xE1\nxby|||i|Batjala\nxcb|||i|Cumbric\nxcc|||i|Camunic\nxce|||i|Celtiberian\nxcg|||i|Cisalpine Gaulish\nxch|||i|Chemakum\nxcl|||i|Classical Armenian\nxcm|||i|Comecrudo\nxcn|||i|Cotoname\nxco|||i|Chorasmian\nxcr|||i|Carian\nxct|||i|Classical Tibetan\nxcu|||i|Curonian\nxcv|||i|Chuvantsy\nxcw|||i|Coahuilteco\nxcy|||i|Cayuse\nxda|||i|Darkinyung\nxdc|||i|Dacian\nxdk|||i|Dharuk\nxdm|||i|Edomite\nxdo|||i|Kwandu\nxdy|||i|Malayic Dayak\nxeb|||i|Eblan\nxed|||i|Hdi\nxeg|||i|\u01C1Xegwi\nxel|||i|Kelo\nxem|||i|Kembayan\nxep|||i|Epi-Olmec\nxer|||i|Xer\xE9nte\nxes|||i|Kesawai\nxet|||i|Xet\xE1\nxeu|||i|Keoru-Ahia\nxfa|||i|Faliscan\nxga|||i|Galatian\nxgb|||i|Gbin\nxgd|||i|Gudang\nxgf|||i|Gabrielino-Fernande\xF1o\nxgg|||i|Goreng\nxgi|||i|Garingbal\nxgl|||i|Galindan\nxgm|||i|Dharumbal\nxgr|||i|Garza\nxgu|||i|Unggumi\nxgw|||i|Guwa\nxha|||i|Harami\nxhc|||i|Hunnic\nxhd|||i|Hadrami\nxhe|||i|Khetrani\nxho|xho|xh|i|Xhosa\nxhr|||i|Hernican\nxht|||i|Hattic\nxhu|||i|Hurrian\nxhv|||i|Khua\nxib|||i|Iberian\nxii|||i|Xiri\nxil|||i|Illyrian\nxin|||i|Xinca\nxir|||i|Xiri\xE2na\nxis|||i|Kisan\nxiv|||i|Indus Valley Language\nxiy|||i|Xipaya\nxjb|||i|Minjungbal\nxjt|||i|Jaitmatang\nxka|||i|Kalkoti\nxkb|||i|Northern Nago\nxkc|||i|Kho'ini\nxkd|||i|Mendalam Kayan\nxke|||i|Kereho\nxkf|||i|Khengkha\nxkg|||i|Kagoro\nxki|||i|Kenyan Sign Language\nxkj|||i|Kajali\nxkk|||i|Kaco'\nxkl|||i|Mainstream Kenyah\nxkn|||i|Kayan River Kayan\nxko|||i|Kiorr\nxkp|||i|Kabatei\nxkq|||i|Koroni\nxkr|||i|Xakriab\xE1\nxks|||i|Kumbewaha\nxkt|||i|Kantosi\nxku|||i|Kaamba\nxkv|||i|Kgalagadi\nxkw|||i|Kembra\nxkx|||i|Karore\nxky|||i|Uma' Lasan\nxkz|||i|Kurtokha\nxla|||i|Kamula\nxlb|||i|Loup B\nxlc|||i|Lycian\nxld|||i|Lydian\nxle|||i|Lemnian\nxlg|||i|Ligurian (Ancient)\nxli|||i|Liburnian\nxln|||i|Alanic\nxlo|||i|Loup A\nxlp|||i|Lepontic\nxls|||i|Lusitanian\nxlu|||i|Cuneiform Luwian\nxly|||i|Elymian\nxma|||i|Mushungulu\nxmb|||i|Mbonga\nxmc|||i|Makhuwa-Marrevone\nxmd|||i|Mbudum\nxme|||i|Median\nxmf|||i|Mingrelian\nxmg|||i|Mengaka\nxmh|||i|Kugu-Muminh\nxmj|||i|Majera\nxmk|||i|Ancient Macedonian\nxml|||i|Malaysian Sign Language\nxmm|||i|Manado Malay\nxmn|||i|Manichaean Middle Persian\nxmo|||i|Morerebi\nxmp|||i|Kuku-Mu'inh\nxmq|||i|Kuku-Mangk\nxmr|||i|Meroitic\nxms|||i|Moroccan Sign Language\nxmt|||i|Matbat\nxmu|||i|Kamu\nxmv|||i|Antankarana Malagasy\nxmw|||i|Tsimihety Malagasy\nxmx|||i|Maden\nxmy|||i|Mayaguduna\nxmz|||i|Mori Bawah\nxna|||i|Ancient North Arabian\nxnb|||i|Kanakanabu\nxng|||i|Middle Mongolian\nxnh|||i|Kuanhua\nxni|||i|Ngarigu\nxnk|||i|Nganakarti\nxnm|||i|Ngumbarl\nxnn|||i|Northern Kankanay\nxno|||i|Anglo-Norman\nxnr|||i|Kangri\nxns|||i|Kanashi\nxnt|||i|Narragansett\nxnu|||i|Nukunul\nxny|||i|Nyiyaparli\nxnz|||i|Kenzi\nxoc|||i|O'chi'chi'\nxod|||i|Kokoda\nxog|||i|Soga\nxoi|||i|Kominimung\nxok|||i|Xokleng\nxom|||i|Komo (Sudan)\nxon|||i|Konkomba\nxoo|||i|Xukur\xFA\nxop|||i|Kopar\nxor|||i|Korubo\nxow|||i|Kowaki\nxpa|||i|Pirriya\nxpb|||i|Northeastern Tasmanian\nxpc|||i|Pecheneg\nxpd|||i|Oyster Bay Tasmanian\nxpe|||i|Liberia Kpelle\nxpf|||i|Southeast Tasmanian\nxpg|||i|Phrygian\nxph|||i|North Midlands Tasmanian\nxpi|||i|Pictish\nxpj|||i|Mpalitjanh\nxpk|||i|Kulina Pano\nxpl|||i|Port Sorell Tasmanian\nxpm|||i|Pumpokol\nxpn|||i|Kapinaw\xE1\nxpo|||i|Pochutec\nxpp|||i|Puyo-Paekche\nxpq|||i|Mohegan-Pequot\nxpr|||i|Parthian\nxps|||i|Pisidian\nxpt|||i|Punthamara\nxpu|||i|Punic\nxpv|||i|Northern Tasmanian\nxpw|||i|Northwestern Tasmanian\nxpx|||i|Southwestern Tasmanian\nxpy|||i|Puyo\nxpz|||i|Bruny Island Tasmanian\nxqa|||i|Karakhanid\nxqt|||i|Qatabanian\nxra|||i|Krah\xF4\nxrb|||i|Eastern Karaboro\nxrd|||i|Gundungurra\nxre|||i|Kreye\nxrg|||i|Minang\nxri|||i|Krikati-Timbira\nxrm|||i|Armazic\nxrn|||i|Arin\nxrr|||i|Raetic\nxrt|||i|Aranama-Tamique\nxru|||i|Marriammu\nxrw|||i|Karawa\nxsa|||i|Sabaean\nxsb|||i|Sambal\nxsc|||i|Scythian\nxsd|||i|Sidetic\nxse|||i|Sempan\nxsh|||i|Shamang\nxsi|||i|Sio\nxsj|||i|Subi\nxsl|||i|South Slavey\nxsm|||i|Kasem\nxsn|||i|Sanga (Nigeria)\nxso|||i|Solano\nxsp|||i|Silopi\nxsq|||i|Makhuwa-Saka\nxsr|||i|Sherpa\nxss|||i|Assan\nxsu|||i|Sanum\xE1\nxsv|||i|Sudovian\nxsy|||i|Saisiyat\nxta|||i|Alcozauca Mixtec\nxtb|||i|Chazumba Mixtec\nxtc|||i|Katcha-Kadugli-Miri\nxtd|||i|Diuxi-Tilantongo Mixtec\nxte|||i|Ketengban\nxtg|||i|Transalpine Gaulish\nxth|||i|Yitha Yitha\nxti|||i|Sinicahua Mixtec\nxtj|||i|San Juan Teita Mixtec\nxtl|||i|Tijaltepec Mixtec\nxtm|||i|Magdalena Pe\xF1asco Mixtec\nxtn|||i|Northern Tlaxiaco Mixtec\nxto|||i|Tokharian A\nxtp|||i|San Miguel Piedras Mixtec\nxtq|||i|Tumshuqese\nxtr|||i|Early Tripuri\nxts|||i|Sindihui Mixtec\nxtt|||i|Tacahua Mixtec\nxtu|||i|Cuyamecalco Mixtec\nxtv|||i|Thawa\nxtw|||i|Tawand\xEA\nxty|||i|Yoloxochitl Mixtec\nxua|||i|Alu Kurumba\nxub|||i|Betta Kurumba\nxud|||i|Umiida\nxug|||i|Kunigami\nxuj|||i|Jennu Kurumba\nxul|||i|Ngunawal\nxum|||i|Umbrian\nxun|||i|Unggaranggu\nxuo|||i|Kuo\nxup|||i|Upper Umpqua\nxur|||i|Urartian\nxut|||i|Kuthant\nxuu|||i|Kxoe\nxve|||i|Venetic\nxvi|||i|Kamviri\nxvn|||i|Vandalic\nxvo|||i|Volscian\nxvs|||i|Vestinian\nxwa|||i|Kwaza\nxwc|||i|Woccon\nxwd|||i|Wadi Wadi\nxwe|||i|Xwela Gbe\nxwg|||i|Kwegu\nxwj|||i|Wajuk\nxwk|||i|Wangkumara\nxwl|||i|Western Xwla Gbe\nxwo|||i|Written Oirat\nxwr|||i|Kwerba Mamberamo\nxwt|||i|Wotjobaluk\nxww|||i|Wemba Wemba\nxxb|||i|Boro (Ghana)\nxxk|||i|Ke'o\nxxm|||i|Minkin\nxxr|||i|Korop\xF3\nxxt|||i|Tambora\nxya|||i|Yaygir\nxyb|||i|Yandjibara\nxyj|||i|Mayi-Yapi\nxyk|||i|Mayi-Kulan\nxyl|||i|Yalakalore\nxyt|||i|Mayi-Thakurti\nxyy|||i|Yorta Yorta\nxzh|||i|Zhang-Zhung\nxzm|||i|Zemgalian\nxzp|||i|Ancient Zapotec\nyaa|||i|Yaminahua\nyab|||i|Yuhup\nyac|||i|Pass Valley Yali\nyad|||i|Yagua\nyae|||i|Pum\xE9\nyaf|||i|Yaka (Democratic Republic of Congo)\nyag|||i|Y\xE1mana\nyah|||i|Yazgulyam\nyai|||i|Yagnobi\nyaj|||i|Banda-Yangere\nyak|||i|Yakama\nyal|||i|Yalunka\nyam|||i|Yamba\nyan|||i|Mayangna\nyao|yao||i|Yao\nyap|yap||i|Yapese\nyaq|||i|Yaqui\nyar|||i|Yabarana\nyas|||i|Nugunu (Cameroon)\nyat|||i|Yambeta\nyau|||i|Yuwana\nyav|||i|Yangben\nyaw|||i|Yawalapit\xED\nyax|||i|Yauma\nyay|||i|Agwagwune\nyaz|||i|Lokaa\nyba|||i|Yala\nybb|||i|Yemba\nybe|||i|West Yugur\nybh|||i|Yakha\nybi|||i|Yamphu\nybj|||i|Hasha\nybk|||i|Bokha\nybl|||i|Yukuben\nybm|||i|Yaben\nybn|||i|Yaba\xE2na\nybo|||i|Yabong\nybx|||i|Yawiyo\nyby|||i|Yaweyuha\nych|||i|Chesu\nycl|||i|Lolopo\nycn|||i|Yucuna\nycp|||i|Chepya\nyda|||i|Yanda\nydd|||i|Eastern Yiddish\nyde|||i|Yangum Dey\nydg|||i|Yidgha\nydk|||i|Yoidik\nyea|||i|Ravula\nyec|||i|Yeniche\nyee|||i|Yimas\nyei|||i|Yeni\nyej|||i|Yevanic\nyel|||i|Yela\nyer|||i|Tarok\nyes|||i|Nyankpa\nyet|||i|Yetfa\nyeu|||i|Yerukula\nyev|||i|Yapunda\nyey|||i|Yeyi\nyga|||i|Malyangapa\nygi|||i|Yiningayi\nygl|||i|Yangum Gel\nygm|||i|Yagomi\nygp|||i|Gepo\nygr|||i|Yagaria\nygs|||i|Yol\u014Bu Sign Language\nygu|||i|Yugul\nygw|||i|Yagwoia\nyha|||i|Baha Buyang\nyhd|||i|Judeo-Iraqi Arabic\nyhl|||i|Hlepho Phowa\nyhs|||i|Yan-nha\u014Bu Sign Language\nyia|||i|Yinggarda\nyid|yid|yi|m|Yiddish\nyif|||i|Ache\nyig|||i|Wusa Nasu\nyih|||i|Western Yiddish\nyii|||i|Yidiny\nyij|||i|Yindjibarndi\nyik|||i|Dongshanba Lalo\nyil|||i|Yindjilandji\nyim|||i|Yimchungru Naga\nyin|||i|Riang Lai\nyip|||i|Pholo\nyiq|||i|Miqie\nyir|||i|North Awyu\nyis|||i|Yis\nyit|||i|Eastern Lalu\nyiu|||i|Awu\nyiv|||i|Northern Nisu\nyix|||i|Axi Yi\nyiz|||i|Azhe\nyka|||i|Yakan\nykg|||i|Northern Yukaghir\nyki|||i|Yoke\nykk|||i|Yakaikeke\nykl|||i|Khlula\nykm|||i|Kap\nykn|||i|Kua-nsi\nyko|||i|Yasa\nykr|||i|Yekora\nykt|||i|Kathu\nyku|||i|Kuamasi\nyky|||i|Yakoma\nyla|||i|Yaul\nylb|||i|Yaleba\nyle|||i|Yele\nylg|||i|Yelogu\nyli|||i|Angguruk Yali\nyll|||i|Yil\nylm|||i|Limi\nyln|||i|Langnian Buyang\nylo|||i|Naluo Yi\nylr|||i|Yalarnnga\nylu|||i|Aribwaung\nyly|||i|Ny\xE2layu\nymb|||i|Yambes\nymc|||i|Southern Muji\nymd|||i|Muda\nyme|||i|Yameo\nymg|||i|Yamongeri\nymh|||i|Mili\nymi|||i|Moji\nymk|||i|Makwe\nyml|||i|Iamalele\nymm|||i|Maay\nymn|||i|Yamna\nymo|||i|Yangum Mon\nymp|||i|Yamap\nymq|||i|Qila Muji\nymr|||i|Malasar\nyms|||i|Mysian\nymx|||i|Northern Muji\nymz|||i|Muzi\nyna|||i|Aluo\nynd|||i|Yandruwandha\nyne|||i|Lang'e\nyng|||i|Yango\nynk|||i|Naukan Yupik\nynl|||i|Yangulam\nynn|||i|Yana\nyno|||i|Yong\nynq|||i|Yendang\nyns|||i|Yansi\nynu|||i|Yahuna\nyob|||i|Yoba\nyog|||i|Yogad\nyoi|||i|Yonaguni\nyok|||i|Yokuts\nyol|||i|Yola\nyom|||i|Yombe\nyon|||i|Yongkom\nyor|yor|yo|i|Yoruba\nyot|||i|Yotti\nyox|||i|Yoron\nyoy|||i|Yoy\nypa|||i|Phala\nypb|||i|Labo Phowa\nypg|||i|Phola\nyph|||i|Phupha\nypm|||i|Phuma\nypn|||i|Ani Phowa\nypo|||i|Alo Phola\nypp|||i|Phupa\nypz|||i|Phuza\nyra|||i|Yerakai\nyrb|||i|Yareba\nyre|||i|Yaour\xE9\nyrk|||i|Nenets\nyrl|||i|Nhengatu\nyrm|||i|Yirrk-Mel\nyrn|||i|Yerong\nyro|||i|Yaroam\xEB\nyrs|||i|Yarsun\nyrw|||i|Yarawata\nyry|||i|Yarluyandi\nysc|||i|Yassic\nysd|||i|Samatao\nysg|||i|Sonaga\nysl|||i|Yugoslavian Sign Language\nysn|||i|Sani\nyso|||i|Nisi (China)\nysp|||i|Southern Lolopo\nysr|||i|Sirenik Yupik\nyss|||i|Yessan-Mayo\nysy|||i|Sanie\nyta|||i|Talu\nytl|||i|Tanglang\nytp|||i|Thopho\nytw|||i|Yout Wam\nyty|||i|Yatay\nyua|||i|Yucateco\nyub|||i|Yugambal\nyuc|||i|Yuchi\nyud|||i|Judeo-Tripolitanian Arabic\nyue|||i|Yue Chinese\nyuf|||i|Havasupai-Walapai-Yavapai\nyug|||i|Yug\nyui|||i|Yurut\xED\nyuj|||i|Karkar-Yuri\nyuk|||i|Yuki\nyul|||i|Yulu\nyum|||i|Quechan\nyun|||i|Bena (Nigeria)\nyup|||i|Yukpa\nyuq|||i|Yuqui\nyur|||i|Yurok\nyut|||i|Yopno\nyuw|||i|Yau (Morobe Province)\nyux|||i|Southern Yukaghir\nyuy|||i|East Yugur\nyuz|||i|Yuracare\nyva|||i|Yawa\nyvt|||i|Yavitero\nywa|||i|Kalou\nywg|||i|Yinhawangka\nywl|||i|Western Lalu\nywn|||i|Yawanawa\nywq|||i|Wuding-Luquan Yi\nywr|||i|Yawuru\nywt|||i|Xishanba Lalo\nywu|||i|Wumeng Nasu\nyww|||i|Yawarawarga\nyxa|||i|Mayawali\nyxg|||i|Yagara\nyxl|||i|Yardliyawarra\nyxm|||i|Yinwum\nyxu|||i|Yuyu\nyxy|||i|Yabula Yabula\nyyr|||i|Yir Yoront\nyyu|||i|Yau (Sandaun Province)\nyyz|||i|Ayizi\nyzg|||i|E'ma Buyang\nyzk|||i|Zokhuo\nzaa|||i|Sierra de Ju\xE1rez Zapotec\nzab|||i|Western Tlacolula Valley Zapotec\nzac|||i|Ocotl\xE1n Zapotec\nzad|||i|Cajonos Zapotec\nzae|||i|Yareni Zapotec\nzaf|||i|Ayoquesco Zapotec\nzag|||i|Zaghawa\nzah|||i|Zangwal\nzai|||i|Isthmus Zapotec\nzaj|||i|Zaramo\nzak|||i|Zanaki\nzal|||i|Zauzou\nzam|||i|Miahuatl\xE1n Zapotec\nzao|||i|Ozolotepec Zapotec\nzap|zap||m|Zapotec\nzaq|||i|Alo\xE1pam Zapotec\nzar|||i|Rinc\xF3n Zapotec\nzas|||i|Santo Domingo Albarradas Zapotec\nzat|||i|Tabaa Zapotec\nzau|||i|Zangskari\nzav|||i|Yatzachi Zapotec\nzaw|||i|Mitla Zapotec\nzax|||i|Xadani Zapotec\nzay|||i|Zayse-Zergulla\nzaz|||i|Zari\nzba|||i|Balaibalan\nzbc|||i|Central Berawan\nzbe|||i|East Berawan\nzbl|zbl||i|Blissymbols\nzbt|||i|Batui\nzbw|||i|West Berawan\nzca|||i|Coatecas Altas Zapotec\nzch|||i|Central Hongshuihe Zhuang\nzdj|||i|Ngazidja Comorian\nzea|||i|Zeeuws\nzeg|||i|Zenag\nzeh|||i|Eastern Hongshuihe Zhuang\nzen|zen||i|Zenaga\nzga|||i|Kinga\nzgb|||i|Guibei Zhuang\nzgh|zgh||i|Standard Moroccan Tamazight\nzgm|||i|Minz Zhuang\nzgn|||i|Guibian Zhuang\nzgr|||i|Magori\nzha|zha|za|m|Zhuang\nzhb|||i|Zhaba\nzhd|||i|Dai Zhuang\nzhi|||i|Zhire\nzhn|||i|Nong Zhuang\nzho|chi|zh|m|Chinese\nzhw|||i|Zhoa\nzia|||i|Zia\nzib|||i|Zimbabwe Sign Language\nzik|||i|Zimakani\nzil|||i|Zialo\nzim|||i|Mesme\nzin|||i|Zinza\nziw|||i|Zigula\nziz|||i|Zizilivakan\nzka|||i|Kaimbulawa\nzkb|||i|Koibal\nzkd|||i|Kadu\nzkg|||i|Koguryo\nzkh|||i|Khorezmian\nzkk|||i|Karankawa\nzkn|||i|Kanan\nzko|||i|Kott\nzkp|||i|S\xE3o Paulo Kaing\xE1ng\nzkr|||i|Zakhring\nzkt|||i|Kitan\nzku|||i|Kaurna\nzkv|||i|Krevinian\nzkz|||i|Khazar\nzlj|||i|Liujiang Zhuang\nzlm|||i|Malay (individual language)\nzln|||i|Lianshan Zhuang\nzlq|||i|Liuqian Zhuang\nzma|||i|Manda (Australia)\nzmb|||i|Zimba\nzmc|||i|Margany\nzmd|||i|Maridan\nzme|||i|Mangerr\nzmf|||i|Mfinu\nzmg|||i|Marti Ke\nzmh|||i|Makolkol\nzmi|||i|Negeri Sembilan Malay\nzmj|||i|Maridjabin\nzmk|||i|Mandandanyi\nzml|||i|Matngala\nzmm|||i|Marimanindji\nzmn|||i|Mbangwe\nzmo|||i|Molo\nzmp|||i|Mpuono\nzmq|||i|Mituku\nzmr|||i|Maranunggu\nzms|||i|Mbesa\nzmt|||i|Maringarr\nzmu|||i|Muruwari\nzmv|||i|Mbariman-Gudhinma\nzmw|||i|Mbo (Democratic Republic of Congo)\nzmx|||i|Bomitaba\nzmy|||i|Mariyedi\nzmz|||i|Mbandja\nzna|||i|Zan Gula\nzne|||i|Zande (individual language)\nzng|||i|Mang\nznk|||i|Manangkari\nzns|||i|Mangas\nzoc|||i|Copainal\xE1 Zoque\nzoh|||i|Chimalapa Zoque\nzom|||i|Zou\nzoo|||i|Asunci\xF3n Mixtepec Zapotec\nzoq|||i|Tabasco Zoque\nzor|||i|Ray\xF3n Zoque\nzos|||i|Francisco Le\xF3n Zoque\nzpa|||i|Lachiguiri Zapotec\nzpb|||i|Yautepec Zapotec\nzpc|||i|Choapan Zapotec\nzpd|||i|Southeastern Ixtl\xE1n Zapotec\nzpe|||i|Petapa Zapotec\nzpf|||i|San Pedro Quiatoni Zapotec\nzpg|||i|Guevea De Humboldt Zapotec\nzph|||i|Totomachapan Zapotec\nzpi|||i|Santa Mar\xEDa Quiegolani Zapotec\nzpj|||i|Quiavicuzas Zapotec\nzpk|||i|Tlacolulita Zapotec\nzpl|||i|Lachix\xEDo Zapotec\nzpm|||i|Mixtepec Zapotec\nzpn|||i|Santa In\xE9s Yatzechi Zapotec\nzpo|||i|Amatl\xE1n Zapotec\nzpp|||i|El Alto Zapotec\nzpq|||i|Zoogocho Zapotec\nzpr|||i|Santiago Xanica Zapotec\nzps|||i|Coatl\xE1n Zapotec\nzpt|||i|San Vicente Coatl\xE1n Zapotec\nzpu|||i|Yal\xE1lag Zapotec\nzpv|||i|Chichicapan Zapotec\nzpw|||i|Zaniza Zapotec\nzpx|||i|San Baltazar Loxicha Zapotec\nzpy|||i|Mazaltepec Zapotec\nzpz|||i|Texmelucan Zapotec\nzqe|||i|Qiubei Zhuang\nzra|||i|Kara (Korea)\nzrg|||i|Mirgan\nzrn|||i|Zerenkel\nzro|||i|Z\xE1paro\nzrp|||i|Zarphatic\nzrs|||i|Mairasi\nzsa|||i|Sarasira\nzsk|||i|Kaskean\nzsl|||i|Zambian Sign Language\nzsm|||i|Standard Malay\nzsr|||i|Southern Rincon Zapotec\nzsu|||i|Sukurum\nzte|||i|Elotepec Zapotec\nztg|||i|Xanagu\xEDa Zapotec\nztl|||i|Lapagu\xEDa-Guivini Zapotec\nztm|||i|San Agust\xEDn Mixtepec Zapotec\nztn|||i|Santa Catarina Albarradas Zapotec\nztp|||i|Loxicha Zapotec\nztq|||i|Quioquitani-Quier\xED Zapotec\nzts|||i|Tilquiapan Zapotec\nztt|||i|Tejalapan Zapotec\nztu|||i|G\xFCil\xE1 Zapotec\nztx|||i|Zaachila Zapotec\nzty|||i|Yatee Zapotec\nzua|||i|Zeem\nzuh|||i|Tokano\nzul|zul|zu|i|Zulu\nzum|||i|Kumzari\nzun|zun||i|Zuni\nzuy|||i|Zumaya\nzwa|||i|Zay\nzxx|zxx||s|No linguistic content\nzyb|||i|Yongbei Zhuang\nzyg|||i|Yang Zhuang\nzyj|||i|Youjiang Zhuang\nzyn|||i|Yongnan Zhuang\nzyp|||i|Zyphe Chin\nzza|zza||m|Zaza\nzzj|||i|Zuojiang Zhuang";

// src/policy/data/iso-639-3.ts
var SCOPES = { i: "individual", m: "macrolanguage", s: "special" };
var languages;
function isoLanguages() {
  if (languages) return languages;
  const out = [];
  for (const row of ISO_639_3_ROWS.split("\n")) {
    const [iso6393, iso6392B, iso6391, scope, name] = row.split("|");
    const language = { iso6393, scope: SCOPES[scope], name };
    if (iso6392B) language.iso6392B = iso6392B;
    if (iso6391) language.iso6391 = iso6391;
    out.push(language);
  }
  return languages = out;
}
var tables;
function isoTables() {
  if (tables) return tables;
  const t = { by3: /* @__PURE__ */ new Map(), by1: /* @__PURE__ */ new Map(), by2B: /* @__PURE__ */ new Map(), byName: /* @__PURE__ */ new Map() };
  for (const lang of isoLanguages()) {
    t.by3.set(lang.iso6393, lang);
    if (lang.iso6391) t.by1.set(lang.iso6391, lang);
    if (lang.iso6392B && lang.iso6392B !== lang.iso6393) t.by2B.set(lang.iso6392B, lang);
    const name = lang.name.toLowerCase();
    if (!t.byName.has(name)) t.byName.set(name, lang);
  }
  return tables = t;
}

// src/policy/data/macrolanguages.ts
var MACROLANGUAGE_MEMBERS = {
  aka: ["fat", "twi"],
  ara: [
    "aao",
    "abh",
    "abv",
    "acm",
    "acq",
    "acw",
    "acx",
    "acy",
    "adf",
    "aeb",
    "aec",
    "afb",
    "ajp",
    "apc",
    "apd",
    "arb",
    "arq",
    "ars",
    "ary",
    "arz",
    "auz",
    "avl",
    "ayh",
    "ayl",
    "ayn",
    "ayp",
    "pga",
    "shu",
    "ssh"
  ],
  aym: ["ayc", "ayr"],
  aze: ["azb", "azj"],
  bal: ["bcc", "bgn", "bgp"],
  bik: ["bcl", "bln", "bto", "cts", "fbl", "lbl", "rbl", "ubl"],
  bnc: ["ebk", "lbk", "obk", "rbk", "vbk"],
  bua: ["bxm", "bxr", "bxu"],
  chm: ["mhr", "mrj"],
  cre: ["crj", "crk", "crl", "crm", "csw", "cwd"],
  del: ["umu", "unm"],
  den: ["scs", "xsl"],
  din: ["dib", "dik", "dip", "diw", "dks"],
  doi: ["dgo", "xnr"],
  est: ["ekk", "vro"],
  fas: ["pes", "prs"],
  ful: ["ffm", "fub", "fuc", "fue", "fuf", "fuh", "fui", "fuq", "fuv"],
  gba: ["bdt", "gbp", "gbq", "gmm", "gso", "gya"],
  gon: ["esg", "gno", "wsg"],
  grb: ["gbo", "gec", "grj", "grv", "gry"],
  grn: ["gnw", "gug", "gui", "gun", "nhd"],
  hai: ["hax", "hdn"],
  hbs: ["bos", "cnr", "hrv", "srp"],
  hmn: [
    "cqd",
    "hea",
    "hma",
    "hmc",
    "hmd",
    "hme",
    "hmg",
    "hmh",
    "hmi",
    "hmj",
    "hml",
    "hmm",
    "hmp",
    "hmq",
    "hms",
    "hmw",
    "hmy",
    "hmz",
    "hnj",
    "hrm",
    "huj",
    "mmr",
    "muq",
    "mww",
    "sfm"
  ],
  iku: ["ike", "ikt"],
  ipk: ["esi", "esk"],
  jrb: ["ajt", "aju", "jye", "yhd", "yud"],
  kau: ["kby", "knc", "krt"],
  kln: ["enb", "eyo", "niq", "oki", "pko", "sgc", "spy", "tec", "tuy"],
  kok: ["gom", "knn"],
  kom: ["koi", "kpv"],
  kon: ["kng", "kwy", "ldi"],
  kpe: ["gkp", "xpe"],
  kur: ["ckb", "kmr", "sdh"],
  lah: ["hnd", "hno", "jat", "phr", "pnb", "skr", "xhe"],
  lav: ["ltg", "lvs"],
  luy: ["bxk", "ida", "lkb", "lko", "lks", "lri", "lrm", "lsm", "lto", "lts", "lwg", "nle", "nyd", "rag"],
  man: ["emk", "mku", "mlq", "mnk", "msc", "mwk"],
  mlg: ["bhr", "bmm", "bzc", "msh", "plt", "skg", "tdx", "tkg", "txy", "xmv", "xmw"],
  mon: ["khk", "mvf"],
  msa: [
    "bjn",
    "btj",
    "bve",
    "bvu",
    "coa",
    "dup",
    "hji",
    "ind",
    "jak",
    "jax",
    "kvb",
    "kvr",
    "kxd",
    "lce",
    "lcf",
    "liw",
    "max",
    "meo",
    "mfa",
    "mfb",
    "min",
    "mqg",
    "msi",
    "mui",
    "orn",
    "ors",
    "pel",
    "pse",
    "tmw",
    "urk",
    "vkk",
    "vkt",
    "xmm",
    "zlm",
    "zmi",
    "zsm"
  ],
  mwr: ["dhd", "mtr", "mve", "rwr", "swv", "wry"],
  nep: ["dty", "npi"],
  nor: ["nno", "nob"],
  oji: ["ciw", "ojb", "ojc", "ojg", "ojs", "ojw", "otw"],
  ori: ["ory", "spv"],
  orm: ["gax", "gaz", "hae", "orc"],
  pus: ["pbt", "pbu", "pst"],
  que: [
    "qub",
    "qud",
    "quf",
    "qug",
    "quh",
    "quk",
    "qul",
    "qup",
    "qur",
    "qus",
    "quw",
    "qux",
    "quy",
    "quz",
    "qva",
    "qvc",
    "qve",
    "qvh",
    "qvi",
    "qvj",
    "qvl",
    "qvm",
    "qvn",
    "qvo",
    "qvp",
    "qvs",
    "qvw",
    "qvz",
    "qwa",
    "qwc",
    "qwh",
    "qws",
    "qxa",
    "qxc",
    "qxh",
    "qxl",
    "qxn",
    "qxo",
    "qxp",
    "qxr",
    "qxt",
    "qxu",
    "qxw"
  ],
  raj: ["bgq", "gda", "gju", "hoj", "mup", "wbr"],
  rom: ["rmc", "rmf", "rml", "rmn", "rmo", "rmw", "rmy"],
  sqi: ["aae", "aat", "aln", "als"],
  srd: ["sdc", "sdn", "src", "sro"],
  swa: ["swc", "swh"],
  syr: ["aii", "cld"],
  tmh: ["taq", "thv", "thz", "ttq"],
  uzb: ["uzn", "uzs"],
  yid: ["ydd", "yih"],
  zap: [
    "zaa",
    "zab",
    "zac",
    "zad",
    "zae",
    "zaf",
    "zai",
    "zam",
    "zao",
    "zaq",
    "zar",
    "zas",
    "zat",
    "zav",
    "zaw",
    "zax",
    "zca",
    "zoo",
    "zpa",
    "zpb",
    "zpc",
    "zpd",
    "zpe",
    "zpf",
    "zpg",
    "zph",
    "zpi",
    "zpj",
    "zpk",
    "zpl",
    "zpm",
    "zpn",
    "zpo",
    "zpp",
    "zpq",
    "zpr",
    "zps",
    "zpt",
    "zpu",
    "zpv",
    "zpw",
    "zpx",
    "zpy",
    "zpz",
    "zsr",
    "zte",
    "ztg",
    "ztl",
    "ztm",
    "ztn",
    "ztp",
    "ztq",
    "zts",
    "ztt",
    "ztu",
    "ztx",
    "zty"
  ],
  zha: [
    "zch",
    "zeh",
    "zgb",
    "zgm",
    "zgn",
    "zhd",
    "zhn",
    "zlj",
    "zln",
    "zlq",
    "zqe",
    "zyb",
    "zyg",
    "zyj",
    "zyn",
    "zzj"
  ],
  zho: [
    "cdo",
    "cjy",
    "cmn",
    "cnp",
    "cpx",
    "csp",
    "czh",
    "czo",
    "gan",
    "hak",
    "hsn",
    "lzh",
    "mnp",
    "nan",
    "wuu",
    "yue"
  ],
  zza: ["diq", "kiu"]
};

// src/policy/script-names.generated.ts
var SCRIPT_ALIASES = {
  "Adlam": "Adlam",
  "Adlm": "Adlam",
  "Aghb": "Caucasian_Albanian",
  "Ahom": "Ahom",
  "Anatolian_Hieroglyphs": "Anatolian_Hieroglyphs",
  "Arab": "Arabic",
  "Arabic": "Arabic",
  "Armenian": "Armenian",
  "Armi": "Imperial_Aramaic",
  "Armn": "Armenian",
  "Avestan": "Avestan",
  "Avst": "Avestan",
  "Bali": "Balinese",
  "Balinese": "Balinese",
  "Bamu": "Bamum",
  "Bamum": "Bamum",
  "Bass": "Bassa_Vah",
  "Bassa_Vah": "Bassa_Vah",
  "Batak": "Batak",
  "Batk": "Batak",
  "Beng": "Bengali",
  "Bengali": "Bengali",
  "Berf": "Beria_Erfe",
  "Beria_Erfe": "Beria_Erfe",
  "Bhaiksuki": "Bhaiksuki",
  "Bhks": "Bhaiksuki",
  "Bopo": "Bopomofo",
  "Bopomofo": "Bopomofo",
  "Brah": "Brahmi",
  "Brahmi": "Brahmi",
  "Brai": "Braille",
  "Braille": "Braille",
  "Bugi": "Buginese",
  "Buginese": "Buginese",
  "Buhd": "Buhid",
  "Buhid": "Buhid",
  "Cakm": "Chakma",
  "Canadian_Aboriginal": "Canadian_Aboriginal",
  "Cans": "Canadian_Aboriginal",
  "Cari": "Carian",
  "Carian": "Carian",
  "Caucasian_Albanian": "Caucasian_Albanian",
  "Chakma": "Chakma",
  "Cham": "Cham",
  "Cher": "Cherokee",
  "Cherokee": "Cherokee",
  "Chorasmian": "Chorasmian",
  "Chrs": "Chorasmian",
  "Common": "Common",
  "Copt": "Coptic",
  "Coptic": "Coptic",
  "Cpmn": "Cypro_Minoan",
  "Cprt": "Cypriot",
  "Cuneiform": "Cuneiform",
  "Cypriot": "Cypriot",
  "Cypro_Minoan": "Cypro_Minoan",
  "Cyrillic": "Cyrillic",
  "Cyrl": "Cyrillic",
  "Deseret": "Deseret",
  "Deva": "Devanagari",
  "Devanagari": "Devanagari",
  "Diak": "Dives_Akuru",
  "Dives_Akuru": "Dives_Akuru",
  "Dogr": "Dogra",
  "Dogra": "Dogra",
  "Dsrt": "Deseret",
  "Dupl": "Duployan",
  "Duployan": "Duployan",
  "Egyp": "Egyptian_Hieroglyphs",
  "Egyptian_Hieroglyphs": "Egyptian_Hieroglyphs",
  "Elba": "Elbasan",
  "Elbasan": "Elbasan",
  "Elym": "Elymaic",
  "Elymaic": "Elymaic",
  "Ethi": "Ethiopic",
  "Ethiopic": "Ethiopic",
  "Gara": "Garay",
  "Garay": "Garay",
  "Geor": "Georgian",
  "Georgian": "Georgian",
  "Glag": "Glagolitic",
  "Glagolitic": "Glagolitic",
  "Gong": "Gunjala_Gondi",
  "Gonm": "Masaram_Gondi",
  "Goth": "Gothic",
  "Gothic": "Gothic",
  "Gran": "Grantha",
  "Grantha": "Grantha",
  "Greek": "Greek",
  "Grek": "Greek",
  "Gujarati": "Gujarati",
  "Gujr": "Gujarati",
  "Gukh": "Gurung_Khema",
  "Gunjala_Gondi": "Gunjala_Gondi",
  "Gurmukhi": "Gurmukhi",
  "Guru": "Gurmukhi",
  "Gurung_Khema": "Gurung_Khema",
  "Han": "Han",
  "Hang": "Hangul",
  "Hangul": "Hangul",
  "Hani": "Han",
  "Hanifi_Rohingya": "Hanifi_Rohingya",
  "Hano": "Hanunoo",
  "Hanunoo": "Hanunoo",
  "Hatr": "Hatran",
  "Hatran": "Hatran",
  "Hebr": "Hebrew",
  "Hebrew": "Hebrew",
  "Hira": "Hiragana",
  "Hiragana": "Hiragana",
  "Hluw": "Anatolian_Hieroglyphs",
  "Hmng": "Pahawh_Hmong",
  "Hmnp": "Nyiakeng_Puachue_Hmong",
  "Hung": "Old_Hungarian",
  "Imperial_Aramaic": "Imperial_Aramaic",
  "Inherited": "Inherited",
  "Inscriptional_Pahlavi": "Inscriptional_Pahlavi",
  "Inscriptional_Parthian": "Inscriptional_Parthian",
  "Ital": "Old_Italic",
  "Java": "Javanese",
  "Javanese": "Javanese",
  "Kaithi": "Kaithi",
  "Kali": "Kayah_Li",
  "Kana": "Katakana",
  "Kannada": "Kannada",
  "Katakana": "Katakana",
  "Kawi": "Kawi",
  "Kayah_Li": "Kayah_Li",
  "Khar": "Kharoshthi",
  "Kharoshthi": "Kharoshthi",
  "Khitan_Small_Script": "Khitan_Small_Script",
  "Khmer": "Khmer",
  "Khmr": "Khmer",
  "Khoj": "Khojki",
  "Khojki": "Khojki",
  "Khudawadi": "Khudawadi",
  "Kirat_Rai": "Kirat_Rai",
  "Kits": "Khitan_Small_Script",
  "Knda": "Kannada",
  "Krai": "Kirat_Rai",
  "Kthi": "Kaithi",
  "Lana": "Tai_Tham",
  "Lao": "Lao",
  "Laoo": "Lao",
  "Latin": "Latin",
  "Latn": "Latin",
  "Lepc": "Lepcha",
  "Lepcha": "Lepcha",
  "Limb": "Limbu",
  "Limbu": "Limbu",
  "Lina": "Linear_A",
  "Linb": "Linear_B",
  "Linear_A": "Linear_A",
  "Linear_B": "Linear_B",
  "Lisu": "Lisu",
  "Lyci": "Lycian",
  "Lycian": "Lycian",
  "Lydi": "Lydian",
  "Lydian": "Lydian",
  "Mahajani": "Mahajani",
  "Mahj": "Mahajani",
  "Maka": "Makasar",
  "Makasar": "Makasar",
  "Malayalam": "Malayalam",
  "Mand": "Mandaic",
  "Mandaic": "Mandaic",
  "Mani": "Manichaean",
  "Manichaean": "Manichaean",
  "Marc": "Marchen",
  "Marchen": "Marchen",
  "Masaram_Gondi": "Masaram_Gondi",
  "Medefaidrin": "Medefaidrin",
  "Medf": "Medefaidrin",
  "Meetei_Mayek": "Meetei_Mayek",
  "Mend": "Mende_Kikakui",
  "Mende_Kikakui": "Mende_Kikakui",
  "Merc": "Meroitic_Cursive",
  "Mero": "Meroitic_Hieroglyphs",
  "Meroitic_Cursive": "Meroitic_Cursive",
  "Meroitic_Hieroglyphs": "Meroitic_Hieroglyphs",
  "Miao": "Miao",
  "Mlym": "Malayalam",
  "Modi": "Modi",
  "Mong": "Mongolian",
  "Mongolian": "Mongolian",
  "Mro": "Mro",
  "Mroo": "Mro",
  "Mtei": "Meetei_Mayek",
  "Mult": "Multani",
  "Multani": "Multani",
  "Myanmar": "Myanmar",
  "Mymr": "Myanmar",
  "Nabataean": "Nabataean",
  "Nag_Mundari": "Nag_Mundari",
  "Nagm": "Nag_Mundari",
  "Nand": "Nandinagari",
  "Nandinagari": "Nandinagari",
  "Narb": "Old_North_Arabian",
  "Nbat": "Nabataean",
  "New_Tai_Lue": "New_Tai_Lue",
  "Newa": "Newa",
  "Nko": "Nko",
  "Nkoo": "Nko",
  "Nshu": "Nushu",
  "Nushu": "Nushu",
  "Nyiakeng_Puachue_Hmong": "Nyiakeng_Puachue_Hmong",
  "Ogam": "Ogham",
  "Ogham": "Ogham",
  "Ol_Chiki": "Ol_Chiki",
  "Ol_Onal": "Ol_Onal",
  "Olck": "Ol_Chiki",
  "Old_Hungarian": "Old_Hungarian",
  "Old_Italic": "Old_Italic",
  "Old_North_Arabian": "Old_North_Arabian",
  "Old_Permic": "Old_Permic",
  "Old_Persian": "Old_Persian",
  "Old_Sogdian": "Old_Sogdian",
  "Old_South_Arabian": "Old_South_Arabian",
  "Old_Turkic": "Old_Turkic",
  "Old_Uyghur": "Old_Uyghur",
  "Onao": "Ol_Onal",
  "Oriya": "Oriya",
  "Orkh": "Old_Turkic",
  "Orya": "Oriya",
  "Osage": "Osage",
  "Osge": "Osage",
  "Osma": "Osmanya",
  "Osmanya": "Osmanya",
  "Ougr": "Old_Uyghur",
  "Pahawh_Hmong": "Pahawh_Hmong",
  "Palm": "Palmyrene",
  "Palmyrene": "Palmyrene",
  "Pau_Cin_Hau": "Pau_Cin_Hau",
  "Pauc": "Pau_Cin_Hau",
  "Perm": "Old_Permic",
  "Phag": "Phags_Pa",
  "Phags_Pa": "Phags_Pa",
  "Phli": "Inscriptional_Pahlavi",
  "Phlp": "Psalter_Pahlavi",
  "Phnx": "Phoenician",
  "Phoenician": "Phoenician",
  "Plrd": "Miao",
  "Prti": "Inscriptional_Parthian",
  "Psalter_Pahlavi": "Psalter_Pahlavi",
  "Qaac": "Coptic",
  "Qaai": "Inherited",
  "Rejang": "Rejang",
  "Rjng": "Rejang",
  "Rohg": "Hanifi_Rohingya",
  "Runic": "Runic",
  "Runr": "Runic",
  "Samaritan": "Samaritan",
  "Samr": "Samaritan",
  "Sarb": "Old_South_Arabian",
  "Saur": "Saurashtra",
  "Saurashtra": "Saurashtra",
  "Sgnw": "SignWriting",
  "Sharada": "Sharada",
  "Shavian": "Shavian",
  "Shaw": "Shavian",
  "Shrd": "Sharada",
  "Sidd": "Siddham",
  "Siddham": "Siddham",
  "Sidetic": "Sidetic",
  "Sidt": "Sidetic",
  "SignWriting": "SignWriting",
  "Sind": "Khudawadi",
  "Sinh": "Sinhala",
  "Sinhala": "Sinhala",
  "Sogd": "Sogdian",
  "Sogdian": "Sogdian",
  "Sogo": "Old_Sogdian",
  "Sora": "Sora_Sompeng",
  "Sora_Sompeng": "Sora_Sompeng",
  "Soyo": "Soyombo",
  "Soyombo": "Soyombo",
  "Sund": "Sundanese",
  "Sundanese": "Sundanese",
  "Sunu": "Sunuwar",
  "Sunuwar": "Sunuwar",
  "Sylo": "Syloti_Nagri",
  "Syloti_Nagri": "Syloti_Nagri",
  "Syrc": "Syriac",
  "Syriac": "Syriac",
  "Tagalog": "Tagalog",
  "Tagb": "Tagbanwa",
  "Tagbanwa": "Tagbanwa",
  "Tai_Le": "Tai_Le",
  "Tai_Tham": "Tai_Tham",
  "Tai_Viet": "Tai_Viet",
  "Tai_Yo": "Tai_Yo",
  "Takr": "Takri",
  "Takri": "Takri",
  "Tale": "Tai_Le",
  "Talu": "New_Tai_Lue",
  "Tamil": "Tamil",
  "Taml": "Tamil",
  "Tang": "Tangut",
  "Tangsa": "Tangsa",
  "Tangut": "Tangut",
  "Tavt": "Tai_Viet",
  "Tayo": "Tai_Yo",
  "Telu": "Telugu",
  "Telugu": "Telugu",
  "Tfng": "Tifinagh",
  "Tglg": "Tagalog",
  "Thaa": "Thaana",
  "Thaana": "Thaana",
  "Thai": "Thai",
  "Tibetan": "Tibetan",
  "Tibt": "Tibetan",
  "Tifinagh": "Tifinagh",
  "Tirh": "Tirhuta",
  "Tirhuta": "Tirhuta",
  "Tnsa": "Tangsa",
  "Todhri": "Todhri",
  "Todr": "Todhri",
  "Tolong_Siki": "Tolong_Siki",
  "Tols": "Tolong_Siki",
  "Toto": "Toto",
  "Tulu_Tigalari": "Tulu_Tigalari",
  "Tutg": "Tulu_Tigalari",
  "Ugar": "Ugaritic",
  "Ugaritic": "Ugaritic",
  "Unknown": "Unknown",
  "Vai": "Vai",
  "Vaii": "Vai",
  "Vith": "Vithkuqi",
  "Vithkuqi": "Vithkuqi",
  "Wancho": "Wancho",
  "Wara": "Warang_Citi",
  "Warang_Citi": "Warang_Citi",
  "Wcho": "Wancho",
  "Xpeo": "Old_Persian",
  "Xsux": "Cuneiform",
  "Yezi": "Yezidi",
  "Yezidi": "Yezidi",
  "Yi": "Yi",
  "Yiii": "Yi",
  "Zanabazar_Square": "Zanabazar_Square",
  "Zanb": "Zanabazar_Square",
  "Zinh": "Inherited",
  "Zyyy": "Common",
  "Zzzz": "Unknown"
};

// src/policy/scripts.ts
var NO_LANGUAGE = /* @__PURE__ */ new Set(["Common", "Inherited", "Unknown"]);
function fold(name) {
  return name.trim().toLowerCase().replace(/[\s-]+/g, "_");
}
var index;
function scriptIndex() {
  if (index) return index;
  index = /* @__PURE__ */ new Map();
  for (const [alias, long] of Object.entries(SCRIPT_ALIASES)) index.set(fold(alias), [long]);
  for (const [code, longs] of Object.entries(SCRIPT_CODE_VARIANTS)) {
    if (!index.has(fold(code))) index.set(fold(code), longs);
  }
  return index;
}
function lookUpScript(written) {
  const found = scriptIndex().get(fold(written));
  if (found) {
    const [first] = found;
    if (found.length === 1 && first !== void 0 && NO_LANGUAGE.has(first)) {
      return {
        ok: false,
        message: `\`${written}\` (${first}) is shared by all languages (digits, punctuation, marks) and cannot be a language's own script`
      };
    }
    return { ok: true, scripts: found };
  }
  const longNames = new Set(Object.values(SCRIPT_ALIASES).filter((n) => !NO_LANGUAGE.has(n)));
  const candidates = [...longNames, ...Object.keys(SCRIPT_ALIASES).filter((k) => k.length === 4)];
  const near = nearest(written, candidates);
  const suggestion = near === void 0 ? void 0 : SCRIPT_ALIASES[near] ?? near;
  return {
    ok: false,
    message: `unknown script \`${written}\`; write a Unicode Script name (\`Devanagari\`) or an ISO 15924 code (\`Deva\`)`,
    ...suggestion ? { suggestion: `did you mean \`${suggestion}\`?` } : {}
  };
}

// src/policy/languages.ts
var RESERVED_LANGUAGE_KEYS = {
  other: "text in languages the policy does not list",
  und: "text too short or unclear to label"
};
var NOT_A_CODE = "is not a language code; write ISO 639-1 (`hi`), ISO 639-3 (`hin`) or a BCP 47 tag (`hi-IN`, `sr-Latn`)";
function membersOf(code) {
  return Object.hasOwn(MACROLANGUAGE_MEMBERS, code) ? MACROLANGUAGE_MEMBERS[code] : [];
}
function resolvedOf(lang) {
  if (lang.scope === "special") {
    return { ok: false, message: `\`${lang.iso6393}\` is a special ISO 639 code (${lang.name}), not a language` };
  }
  return { ok: true, iso6393: lang.iso6393, name: lang.name, covers: [lang.iso6393, ...membersOf(lang.iso6393)] };
}
function suggestionForName(key) {
  const { byName } = isoTables();
  const exact = byName.get(key.toLowerCase());
  if (exact) return didYouMean(exact.iso6393);
  if (key.length < 4) return void 0;
  const near = nearest(key, byName.keys());
  const lang = near === void 0 ? void 0 : byName.get(near);
  return lang ? `did you mean \`${lang.iso6393}\` (${lang.name})?` : void 0;
}
function resolvePrimary(code, written) {
  const { by1, by3, by2B } = isoTables();
  const lower = code.toLowerCase();
  if (lower.length === 2) {
    const lang = by1.get(lower);
    if (lang) return resolvedOf(lang);
    return { ok: false, message: `\`${written}\` is not an ISO 639-1 code` };
  }
  if (lower.length === 3) {
    const lang = by3.get(lower);
    if (lang) return resolvedOf(lang);
    const bib = by2B.get(lower);
    if (bib) {
      return {
        ok: false,
        message: `\`${written}\` is an ISO 639-2/B code (${bib.name}); keys use ISO 639-3 codes`,
        suggestion: didYouMean(bib.iso6393)
      };
    }
    return { ok: false, message: `\`${written}\` is not an ISO 639-3 code` };
  }
  return { ok: false, message: `\`${written}\` ${NOT_A_CODE}` };
}
function resolveLanguageKey(key) {
  const lower = key.toLowerCase();
  const reserved = Object.hasOwn(RESERVED_LANGUAGE_KEYS, lower) ? RESERVED_LANGUAGE_KEYS[lower] : void 0;
  if (reserved) {
    return { ok: false, message: `\`${key}\` is reserved: reports use it for ${reserved}` };
  }
  if (/^[A-Za-z]{2,3}$/.test(key)) {
    const r2 = resolvePrimary(key, key);
    if (!r2.ok && !r2.suggestion) {
      const s = suggestionForName(key);
      if (s) return { ...r2, suggestion: s };
    }
    return r2;
  }
  let malformed;
  const tag = parseBcp47(key, {
    normalize: true,
    warning: (reason) => {
      malformed ??= reason;
    }
  });
  const primary = tag.extendedLanguageSubtags[0] ?? tag.language;
  if (malformed || !primary) {
    const s = suggestionForName(key);
    return {
      ok: false,
      message: `\`${key}\` ${NOT_A_CODE}`,
      ...s ? { suggestion: s } : {}
    };
  }
  const r = resolvePrimary(primary, primary);
  if (!r.ok) {
    const suggestion = r.suggestion ?? suggestionForName(primary);
    const message = primary === key ? r.message : `${r.message} (in \`${key}\`)`;
    return { ok: false, message, ...suggestion ? { suggestion } : {} };
  }
  if (tag.script) {
    const s = lookUpScript(tag.script);
    if (!s.ok) {
      return { ok: false, message: `script subtag \`${tag.script}\` in \`${key}\`: ${s.message}`, ...s.suggestion ? { suggestion: s.suggestion } : {} };
    }
    return { ...r, subtagScripts: s.scripts, scriptSubtag: tag.script };
  }
  return r;
}

// src/policy/build.ts
var DEFAULT_MAX_LINE_BYTES = 8 * 1024 * 1024;
var DEFAULT_MIN_CHARS = 20;
var DEFAULT_TOLERANCE = 0.03;
var DEFAULT_MIN_PURITY = 0.9;
var DEFAULT_MAX_IMPURE_DOCS = 0.02;
var DEFAULT_FORBID = ["replacement-char", "control-chars", "bidi-controls", "mojibake"];
var DEFAULT_NEAR = { threshold: 0.8, shingle: 5, hashes: 128 };
var DEFAULT_NGRAM = 13;
var SUM_EPSILON = 1e-9;
var LOOSE_TOLERANCE = 0.5;
var MIN_SENSIBLE_MIN_CHARS = 10;
var MIN_SENSIBLE_NGRAM = 8;
var LOOSE_NEAR_THRESHOLD = 0.5;
var BUILTIN_TOKENIZERS = ["gpt2", "r50k_base", "p50k_base", "cl100k_base", "o200k_base"];
var RULE_NAMES = ["input", "mix", "script", "encoding", "fertility", "duplicates", "contamination"];
var MIX_UNITS = ["docs", "bytes", "chars", "words", "tokens"];
var ANOMALY_KINDS2 = ["replacement-char", "control-chars", "bidi-controls", "zero-width", "private-use", "mojibake"];
function asObj(v) {
  return v !== null && typeof v === "object" && !Array.isArray(v) ? v : void 0;
}
function asNum(v) {
  return typeof v === "number" && Number.isFinite(v) ? v : void 0;
}
function asStr(v) {
  return typeof v === "string" && v.length > 0 ? v : void 0;
}
function asStrList(v) {
  if (typeof v === "string") return v.length > 0 ? [v] : [];
  if (Array.isArray(v)) return v.filter((x) => typeof x === "string" && x.length > 0);
  return void 0;
}
function fmt(n) {
  return String(Math.round(n * 1e6) / 1e6);
}
function buildPolicy(value, opts, sink) {
  const raw = asObj(value) ?? {};
  const files = [];
  const policyDir = path.dirname(opts.file);
  const writtenRoot = asStr(raw.root);
  const root = opts.root ?? (writtenRoot !== void 0 ? path.resolve(policyDir, writtenRoot) : opts.defaultRoot ?? policyDir);
  const corpus = buildCorpus(asObj(raw.corpus) ?? {}, sink);
  const tokenizer = buildTokenizer(raw.tokenizer, ["tokenizer"], root, files, sink);
  const baseline = buildTokenizer(raw.baseline, ["baseline"], root, files, sink);
  if (raw.baseline !== void 0 && raw.tokenizer === void 0) {
    sink.problem(["baseline"], "a baseline is compared against the `tokenizer`, which is not set", { part: "key" });
  }
  if (tokenizer && baseline && JSON.stringify(tokenizer) === JSON.stringify(baseline)) {
    sink.warning(["baseline"], "the baseline is the same tokenizer as `tokenizer`, so every comparison is even", { part: "key" });
  }
  const languages2 = buildLanguages(raw.languages, sink);
  const detection = { minChars: asNum(asObj(raw.detection)?.["min-chars"]) ?? DEFAULT_MIN_CHARS };
  if (detection.minChars < MIN_SENSIBLE_MIN_CHARS) {
    sink.warning(["detection", "min-chars"], `texts of fewer than ${MIN_SENSIBLE_MIN_CHARS} letters cannot be told apart by language; ${detection.minChars} lets guesses count`);
  }
  const sampling = buildSampling(raw.sampling);
  const rules = buildRules(asObj(raw.rules) ?? {}, { languages: languages2, tokenizerSet: raw.tokenizer !== void 0, root, files, sink });
  const severity = buildSeverity(asObj(raw.severity) ?? {}, rules, sink);
  const policy = {
    version: 1,
    file: opts.file,
    name: asStr(raw.name) ?? path.parse(opts.file).name,
    root,
    corpus,
    languages: languages2,
    detection,
    rules,
    severity,
    ...tokenizer ? { tokenizer } : {},
    ...baseline ? { baseline } : {},
    ...sampling ? { sampling } : {}
  };
  return { policy, files };
}
function checkGlob(glob, at, sink) {
  if (path.isAbsolute(glob) || /^[A-Za-z]:[\\/]/.test(glob)) {
    sink.problem(at, `\`${glob}\` is an absolute path; globs are relative to the root`);
  } else if (/(^|\/)\.\.(\/|$)/.test(glob)) {
    sink.problem(at, `\`${glob}\` leaves the root; set \`root\` higher instead`);
  } else if (glob.startsWith("!")) {
    sink.problem(at, `\`${glob}\` starts with \`!\`; list files to leave out under \`corpus.exclude\``);
  }
}
function globList(v, at, sink) {
  const list = asStrList(v) ?? [];
  const single = typeof v === "string";
  list.forEach((g, i) => checkGlob(g, single ? at : [...at, i], sink));
  return list;
}
function isDotPath(s) {
  return s.split(".").every((part) => part.length > 0);
}
function buildCorpus(c, sink) {
  const at = (k) => ["corpus", k];
  const include = globList(c.include, at("include"), sink);
  const exclude = globList(c.exclude, at("exclude"), sink);
  const text = asStr(c.text) ?? "text";
  if (!isDotPath(text)) sink.problem(at("text"), `\`${text}\` is not a dot path such as \`text\` or \`meta.body\``);
  const declared = asStr(c["declared-language"]);
  if (declared !== void 0 && !isDotPath(declared)) {
    sink.problem(at("declared-language"), `\`${declared}\` is not a dot path such as \`lang\` or \`meta.lang\``);
  }
  const subset = asStr(c.subset);
  if (subset !== void 0) {
    const count3 = subset.split("{subset}").length - 1;
    if (count3 !== 1) {
      sink.problem(at("subset"), `must contain \`{subset}\` exactly once, found ${count3 === 0 ? "none" : `${count3} times`}`, {
        ...count3 === 0 ? { suggestion: "for example `data/{subset}/**`" } : {}
      });
    }
  }
  const encodings = [];
  for (const [glob, enc] of Object.entries(asObj(c.encodings) ?? {})) {
    const where2 = ["corpus", "encodings", glob];
    checkGlob(glob, where2, sink);
    if (typeof enc !== "string" || enc.length === 0) continue;
    if (!iconv2.encodingExists(enc)) {
      sink.problem(where2, `unknown encoding \`${enc}\` (encoding names are those iconv-lite knows, e.g. \`windows-1256\`)`, {
        ...encodingSuggestion(enc)
      });
      continue;
    }
    encodings.push({ glob, encoding: enc });
  }
  return {
    include,
    exclude,
    text,
    ...declared !== void 0 ? { declaredLanguage: declared } : {},
    ...subset !== void 0 ? { subset } : {},
    encodings,
    maxLineBytes: asNum(c["max-line-bytes"]) ?? DEFAULT_MAX_LINE_BYTES
  };
}
function encodingSuggestion(enc) {
  const canonical = enc.toLowerCase().replace(/[^a-z0-9]/g, "");
  const names = Object.keys(iconv2.encodings ?? {}).filter((k) => !k.startsWith("_") && !/^\d+$/.test(k));
  const near = nearest(canonical, names);
  return near ? { suggestion: didYouMean(near) } : {};
}
function buildTokenizer(v, at, root, files, sink) {
  const t = asObj(v);
  if (!t) return void 0;
  const builtin = asStr(t.builtin);
  if (builtin !== void 0) {
    return BUILTIN_TOKENIZERS.includes(builtin) ? { kind: "builtin", name: builtin } : void 0;
  }
  const file = asStr(t.file);
  if (file === void 0) return void 0;
  const written = asStr(t.format);
  let format;
  if (written === "tokenizer.json" || written === "tiktoken") format = written;
  else if (written === void 0) {
    if (/\.json$/i.test(file)) format = "tokenizer.json";
    else if (/\.tiktoken$/i.test(file)) format = "tiktoken";
    else {
      sink.problem([...at, "file"], `cannot tell the format of \`${file}\` from its name (.json or .tiktoken)`, {
        suggestion: "set `format: tokenizer.json` or `format: tiktoken`"
      });
      return void 0;
    }
  } else return void 0;
  const pattern = asStr(t.pattern);
  if (format === "tokenizer.json" && pattern !== void 0) {
    sink.problem([...at, "pattern"], "`pattern` is only used with tiktoken rank files; a tokenizer.json carries its own pre-tokenizer", { part: "key" });
  }
  if (format === "tiktoken") {
    if (pattern === void 0) {
      sink.problem([...at, "file"], "tiktoken rank files carry no split pattern; set `pattern` to a builtin whose pattern to use (e.g. `cl100k_base`) or to a regular expression", { part: "key" });
    } else if (!BUILTIN_TOKENIZERS.includes(pattern)) {
      try {
        new RegExp(pattern, "gu");
      } catch (e) {
        const near = nearest(pattern, BUILTIN_TOKENIZERS);
        sink.problem([...at, "pattern"], `neither a builtin name nor a valid regular expression: ${e.message}`, {
          ...near ? { suggestion: didYouMean(near) } : {}
        });
      }
    }
  }
  const absPath = path.resolve(root, file);
  files.push({ path: [...at, "file"], what: "tokenizer file", file, absPath });
  return { kind: "file", file, absPath, format, ...format === "tiktoken" && pattern !== void 0 ? { pattern } : {} };
}
function buildLanguages(v, sink) {
  const out = [];
  const entries = Object.entries(asObj(v) ?? {});
  for (const [key, rawSpec] of entries) {
    const at = ["languages", key];
    const spec = asObj(rawSpec) ?? {};
    const r = resolveLanguageKey(key);
    if (!r.ok) {
      sink.problem(at, r.message, { part: "key", ...r.suggestion ? { suggestion: r.suggestion } : {} });
      continue;
    }
    const scripts = [];
    const writtenScripts = Array.isArray(spec.scripts) ? spec.scripts : void 0;
    writtenScripts?.forEach((s, i) => {
      if (typeof s !== "string" || s.length === 0) return;
      const found = lookUpScript(s);
      if (!found.ok) {
        sink.problem([...at, "scripts", i], found.message, found.suggestion ? { suggestion: found.suggestion } : {});
        return;
      }
      for (const long of found.scripts) if (!scripts.includes(long)) scripts.push(long);
    });
    if (writtenScripts === void 0) {
      const fallback = r.subtagScripts ?? (Object.hasOwn(DEFAULT_SCRIPTS, r.iso6393) ? DEFAULT_SCRIPTS[r.iso6393] : void 0);
      if (fallback) scripts.push(...fallback);
      else {
        sink.problem(at, `no default script for \`${r.iso6393}\` (${r.name}); list its scripts, e.g. \`scripts: [Latin]\``, { part: "key" });
      }
    } else if (r.subtagScripts && scripts.length > 0 && !r.subtagScripts.every((s) => scripts.includes(s))) {
      sink.warning([...at, "scripts"], `the key says \`${r.scriptSubtag}\` (${r.subtagScripts.join(", ")}) but \`scripts\` lists ${scripts.join(", ")}; \`scripts\` is used`);
    }
    const target = asNum(spec.target);
    out.push({
      key,
      iso6393: r.iso6393,
      name: r.name,
      covers: r.covers,
      scripts,
      ...target !== void 0 ? { target } : {}
    });
  }
  for (let j = 0; j < out.length; j++) {
    for (let i = 0; i < j; i++) {
      const a = out[i];
      const b = out[j];
      const shared2 = b.covers.filter((c) => a.covers.includes(c));
      if (shared2.length === 0) continue;
      const same = a.iso6393 === b.iso6393;
      sink.problem(
        ["languages", b.key],
        same ? `\`${b.key}\` and \`${a.key}\` are the same language (\`${a.iso6393}\`); list it once${b.key.includes("-") || a.key.includes("-") ? ", with all its scripts under `scripts`" : ""}` : `\`${b.key}\` overlaps \`${a.key}\`: both cover ${shared2.map((c) => `\`${c}\``).join(", ")}, so a detected label could count under either; keep one`,
        { part: "key" }
      );
    }
  }
  const withTargets = out.filter((l) => l.target !== void 0);
  const sum = withTargets.reduce((s, l) => s + l.target, 0);
  if (sum > 1 + SUM_EPSILON) {
    sink.problem(["languages"], `targets sum to ${fmt(sum)} (${withTargets.map((l) => `${l.key} ${fmt(l.target)}`).join(" + ")}); they may add up to at most 1`, { part: "key" });
  }
  return out;
}
function buildSampling(v) {
  const s = asObj(v);
  if (!s) return void 0;
  const docs = asNum(s["docs-per-shard"]);
  if (docs !== void 0) return { docsPerShard: docs };
  const fraction = asNum(s.fraction);
  if (fraction !== void 0) return { fraction };
  return void 0;
}
function buildRules(r, ctx) {
  const { sink } = ctx;
  const input = asObj(r.input) ?? {};
  const rules = {
    input: {
      ...asNum(input["max-rejected"]) !== void 0 ? { maxRejected: asNum(input["max-rejected"]) } : {},
      maxBrokenShards: asNum(input["max-broken-shards"]) ?? 0
    }
  };
  if (rules.input.maxRejected !== void 0 && rules.input.maxRejected >= LOOSE_TOLERANCE) {
    sink.warning(["rules", "input", "max-rejected"], `${fmt(rules.input.maxRejected)} lets half the input or more be rejected`);
  }
  const mix2 = asObj(r.mix);
  if (mix2) rules.mix = buildMix(mix2, ctx);
  else if (ctx.languages.some((l) => l.target !== void 0)) {
    sink.warning(["languages"], "targets are set but there is no `rules.mix`, so they are not judged", { part: "key" });
  }
  const script = asObj(r.script);
  if (script) {
    rules.script = {
      minPurity: asNum(script["min-purity"]) ?? DEFAULT_MIN_PURITY,
      maxImpureDocs: asNum(script["max-impure-docs"]) ?? DEFAULT_MAX_IMPURE_DOCS
    };
  }
  const encoding = asObj(r.encoding);
  if (encoding) {
    const forbid = Array.isArray(encoding.forbid) ? encoding.forbid.filter((k) => ANOMALY_KINDS2.includes(k)) : [...DEFAULT_FORBID];
    if (Array.isArray(encoding.forbid) && encoding.forbid.length === 0) {
      sink.warning(["rules", "encoding", "forbid"], "forbids nothing, so the encoding rule can never fail");
    }
    rules.encoding = { maxAnomalousDocs: asNum(encoding["max-anomalous-docs"]) ?? 0, forbid: [...new Set(forbid)] };
  }
  const fertility = asObj(r.fertility);
  if (fertility) rules.fertility = buildFertility(fertility, ctx);
  const dup = asObj(r.duplicates);
  if (dup) {
    const near = asObj(dup.near) ?? {};
    const nearMax = asNum(near.max);
    const rule = {
      ...asNum(dup["max-exact"]) !== void 0 ? { maxExact: asNum(dup["max-exact"]) } : {},
      near: {
        threshold: asNum(near.threshold) ?? DEFAULT_NEAR.threshold,
        ...nearMax !== void 0 ? { max: nearMax } : {},
        shingle: asNum(near.shingle) ?? DEFAULT_NEAR.shingle,
        hashes: asNum(near.hashes) ?? DEFAULT_NEAR.hashes
      },
      punctuation: dup.punctuation === "strip" ? "strip" : "keep"
    };
    if (rule.maxExact === void 0 && rule.near.max === void 0) {
      sink.warning(["rules", "duplicates"], "sets neither `max-exact` nor `near.max`, so it only reports", { part: "key" });
    }
    if (rule.near.threshold < LOOSE_NEAR_THRESHOLD) {
      sink.warning(["rules", "duplicates", "near", "threshold"], `${fmt(rule.near.threshold)} counts documents that share little text as near duplicates`);
    }
    rules.duplicates = rule;
  }
  const cont = asObj(r.contamination);
  if (cont) {
    const rule = {
      eval: globList(cont.eval, ["rules", "contamination", "eval"], sink),
      ngram: asNum(cont.ngram) ?? DEFAULT_NGRAM,
      maxDocs: asNum(cont["max-docs"]) ?? 0
    };
    if (rule.ngram < MIN_SENSIBLE_NGRAM) {
      sink.warning(["rules", "contamination", "ngram"], `${rule.ngram}-grams match common phrases, not only copied evaluation text; ${DEFAULT_NGRAM} is the usual length`);
    }
    rules.contamination = rule;
  }
  return rules;
}
function buildMix(mix2, ctx) {
  const { sink, languages: languages2 } = ctx;
  const writtenUnit = asStr(mix2.unit);
  const unit = writtenUnit !== void 0 && MIX_UNITS.includes(writtenUnit) ? writtenUnit : ctx.tokenizerSet ? "tokens" : "words";
  if (unit === "tokens" && !ctx.tokenizerSet) {
    sink.problem(["rules", "mix", "unit"], "counting the mix in `tokens` needs a `tokenizer`", {
      suggestion: "set `tokenizer: { builtin: o200k_base }` (or your own), or use `unit: words`"
    });
  }
  const tolerance = asNum(mix2.tolerance) ?? DEFAULT_TOLERANCE;
  const maxOther = asNum(mix2["max-other"]);
  const maxUnd = asNum(mix2["max-und"]);
  const rule = {
    unit,
    tolerance,
    ...maxOther !== void 0 ? { maxOther } : {},
    ...maxUnd !== void 0 ? { maxUndetermined: maxUnd } : {}
  };
  const withTargets = languages2.filter((l) => l.target !== void 0);
  if (withTargets.length === 0 && languages2.length > 0) {
    sink.problem(["rules", "mix"], "the mix rule needs a `target` on at least one language under `languages`", { part: "key" });
  }
  if (tolerance >= LOOSE_TOLERANCE) {
    sink.warning(["rules", "mix", "tolerance"], `${fmt(tolerance)} lets almost any share pass`);
  }
  if (withTargets.length > 0 && withTargets.length === languages2.length && maxOther !== void 0) {
    const sum = withTargets.reduce((s, l) => s + l.target, 0);
    const room = sum + tolerance * withTargets.length + maxOther + (maxUnd ?? 0);
    if (room < 1 - SUM_EPSILON) {
      sink.warning(
        ["rules", "mix", "max-other"],
        `targets sum to ${fmt(sum)}: with tolerance ${fmt(tolerance)} per language and max-other ${fmt(maxOther)}${maxUnd !== void 0 ? ` and max-und ${fmt(maxUnd)}` : ""} only ${fmt(room)} of the corpus can be accounted for` + (maxUnd !== void 0 ? ", so the mix rule cannot pass" : `; the other ${fmt(1 - room)} would have to be \`und\``)
      );
    }
  }
  return rule;
}
function perLanguage(v, at, ctx, read) {
  const out = {};
  const keys = ctx.languages.map((l) => l.key);
  for (const [key, x] of Object.entries(asObj(v) ?? {})) {
    if (!keys.includes(key)) {
      const r = resolveLanguageKey(key);
      const same = r.ok ? ctx.languages.find((l) => l.iso6393 === r.iso6393 || l.covers.includes(r.iso6393)) : void 0;
      const near = same?.key ?? nearest(key, keys);
      ctx.sink.problem([...at, key], `\`${key}\` is not a language of this policy (keys under \`languages\`: ${keys.map((k) => `\`${k}\``).join(", ") || "none"})`, {
        part: "key",
        ...near ? { suggestion: didYouMean(near) } : {}
      });
      continue;
    }
    const value = read(x, key);
    if (value !== void 0) out[key] = value;
  }
  return out;
}
function buildFertility(f, ctx) {
  const at = ["rules", "fertility"];
  if (!ctx.tokenizerSet) {
    ctx.sink.problem(at, "fertility is measured with the model's tokenizer, and no `tokenizer` is set", {
      part: "key",
      suggestion: "set `tokenizer: { builtin: o200k_base }` or `tokenizer: { file: ... }`"
    });
  }
  const max = perLanguage(f.max, [...at, "max"], ctx, (x) => asNum(x));
  for (const [key, m] of Object.entries(max)) {
    if (m < 1) {
      ctx.sink.warning([...at, "max", key], `${fmt(m)} tokens per word: every word is at least one token unless the tokenizer has multi-word tokens, so this likely always fails`);
    }
  }
  const maxContinued = perLanguage(f["max-continued"], [...at, "max-continued"], ctx, (x) => asNum(x));
  const wordLists = perLanguage(f["word-lists"], [...at, "word-lists"], ctx, (x, key) => {
    const file = asStr(x);
    if (file === void 0) return void 0;
    const absPath = path.resolve(ctx.root, file);
    ctx.files.push({ path: [...at, "word-lists", key], what: "word list", file, absPath });
    return { file, absPath };
  });
  const maxRegression = asNum(f["max-regression"]);
  if (Object.keys(max).length === 0 && Object.keys(maxContinued).length === 0 && maxRegression === void 0) {
    ctx.sink.warning(at, "sets no limit (`max`, `max-continued` or `max-regression`), so it only reports", { part: "key" });
  }
  return { max, ...maxRegression !== void 0 ? { maxRegression } : {}, maxContinued, wordLists };
}
function buildSeverity(s, rules, sinkTo) {
  const out = {};
  for (const [name, level] of Object.entries(s)) {
    if (!RULE_NAMES.includes(name) || level !== "error" && level !== "warn") continue;
    out[name] = level;
    if (rules[name] === void 0) {
      sinkTo.warning(["severity", name], `sets a severity for \`${name}\`, which is not under \`rules\``, { part: "key" });
    }
  }
  return out;
}

// src/policy/parse.ts
var POLICY_VERSION = 1;
function sorted(list) {
  const seen = /* @__PURE__ */ new Set();
  return list.filter((p) => {
    const id = `${p.line}:${p.column}:${p.path}:${p.message}`;
    if (seen.has(id)) return false;
    seen.add(id);
    return true;
  }).sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
}
function parsePolicyDetailed(text, file, opts = {}) {
  const doc = readPolicyYaml(text);
  const problems = [];
  const warnings = [];
  const make = (at, position, message, suggestion) => ({
    file,
    line: position.line,
    column: position.column,
    path: formatPath(at),
    message,
    ...suggestion ? { suggestion } : {}
  });
  const failed = () => ({
    result: { ok: false, problems: sorted(problems), warnings: sorted(warnings) },
    files: [],
    locate: doc.locate
  });
  for (const w of doc.warnings) warnings.push(make(w.path, w.position, w.message));
  for (const e of doc.errors) problems.push(make(e.path, e.position, `YAML syntax: ${e.message}`));
  if (problems.length > 0) return failed();
  for (const d of doc.duplicates) problems.push(make(d.path, d.position, d.message));
  const value = doc.value;
  if (value === null || value === void 0) {
    problems.push(make([], { line: 1, column: 1 }, "the policy is empty; it needs at least `version`, `corpus` and `languages`"));
    return failed();
  }
  if (typeof value !== "object" || Array.isArray(value)) {
    problems.push(make([], doc.locate([]), `the policy must be a mapping of keys (version, corpus, languages, ...), not ${kindOf(value)}`));
    return failed();
  }
  const version = value.version;
  if (typeof version === "number" && Number.isInteger(version) && version > POLICY_VERSION) {
    problems.push(
      make(["version"], doc.locate(["version"]), `this policy is written for a newer sluice (policy version ${version}); this sluice reads version ${POLICY_VERSION}`, "upgrade sluice")
    );
    return failed();
  }
  for (const issue of checkAgainstSchema(value)) {
    problems.push(make(issue.path, doc.locate(issue.path, issue.part), issue.message, issue.suggestion));
  }
  const absFile = path2.resolve(file);
  const built = buildPolicy(
    value,
    {
      file: absFile,
      ...opts.root !== void 0 ? { root: path2.resolve(opts.root) } : {},
      ...opts.defaultRoot !== void 0 ? { defaultRoot: path2.resolve(opts.defaultRoot) } : {}
    },
    {
      problem: (at, message, o = {}) => problems.push(make(at, doc.locate(at, o.part ?? "value"), message, o.suggestion)),
      warning: (at, message, o = {}) => warnings.push(make(at, doc.locate(at, o.part ?? "value"), message, o.suggestion))
    }
  );
  if (problems.length > 0) return failed();
  const policy = built.policy;
  return {
    result: { ok: true, policy, warnings: sorted(warnings) },
    files: built.files.map((f) => ({ ...f, position: doc.locate(f.path, "value") })),
    locate: doc.locate
  };
}

// src/policy/load.ts
async function nearestGitRoot(dir) {
  let at = path3.resolve(dir);
  for (; ; ) {
    try {
      await stat(path3.join(at, ".git"));
      return at;
    } catch {
    }
    const up = path3.dirname(at);
    if (up === at) return void 0;
    at = up;
  }
}
async function kindOfPath(p) {
  try {
    const s = await stat(p);
    return s.isDirectory() ? "dir" : "file";
  } catch (e) {
    const code = e.code;
    return { missing: code === "ENOENT" ? "does not exist" : `cannot be read (${code ?? e.message})` };
  }
}
async function loadPolicy(file, overrides = {}) {
  const absFile = path3.resolve(file);
  let text;
  try {
    text = await readFile(absFile, "utf8");
  } catch (e) {
    const code = e.code;
    const why = code === "ENOENT" ? "no such file" : code === "EISDIR" ? "it is a directory" : e.message;
    return { ok: false, problems: [{ file, path: "", message: `cannot read the policy file: ${why}` }], warnings: [] };
  }
  const policyDir = path3.dirname(absFile);
  const defaultRoot = await nearestGitRoot(policyDir) ?? policyDir;
  const parsed = parsePolicyDetailed(text, file, { ...overrides, defaultRoot });
  if (!parsed.result.ok) return parsed.result;
  const { policy, warnings } = parsed.result;
  const problems = [];
  const rootKind = await kindOfPath(policy.root);
  if (rootKind !== "dir") {
    const why = rootKind === "file" ? "is a file, not a directory" : rootKind.missing;
    if (overrides.root !== void 0) {
      problems.push({ file, path: "root", message: `the root given in place of the policy's (${policy.root}) ${why}` });
    } else {
      const at = parsed.locate(["root"], "value");
      problems.push({ file, line: at.line, column: at.column, path: "root", message: `the root directory ${policy.root} ${why}` });
    }
  }
  for (const ref of parsed.files) {
    const kind = await kindOfPath(ref.absPath);
    if (kind === "file") continue;
    const why = kind === "dir" ? "is a directory, not a file" : kind.missing;
    problems.push({
      file,
      line: ref.position.line,
      column: ref.position.column,
      path: formatPath(ref.path),
      message: `${ref.what} \`${ref.file}\` ${why} (looked for ${ref.absPath}; paths are relative to the root)`
    });
  }
  if (problems.length > 0) return { ok: false, problems, warnings };
  return parsed.result;
}

// src/read/discover.ts
import { realpath, stat as stat2 } from "node:fs/promises";
import { readdir } from "node:fs";
import path4 from "node:path";

// src/read/classify.ts
import iconv3 from "iconv-lite";
import picomatch from "picomatch";
var DEFAULT_ENCODING = "utf-8";
var SUBSET_PLACEHOLDER = "{subset}";
var SUBSET_SENTINEL = "SLUICESUBSETSENTINEL";
var FORMAT_BY_EXTENSION = { jsonl: "jsonl", ndjson: "jsonl", txt: "txt" };
var COMPRESSION_BY_EXTENSION = { gz: "gzip", zst: "zstd", zstd: "zstd" };
function shardKindOf(filePath) {
  const name = filePath.slice(filePath.lastIndexOf("/") + 1).toLowerCase();
  const parts = name.split(".");
  const last = parts.length > 1 ? parts[parts.length - 1] : "";
  const compression = COMPRESSION_BY_EXTENSION[last];
  if (compression !== void 0) {
    const inner = parts.length > 2 ? parts[parts.length - 2] : "";
    const format2 = FORMAT_BY_EXTENSION[inner];
    return format2 !== void 0 ? { format: format2, compression } : { unsupported: inner === "" ? `.${last}` : `.${inner}.${last}` };
  }
  const format = FORMAT_BY_EXTENSION[last];
  return format !== void 0 ? { format, compression: "none" } : { unsupported: last === "" ? "" : `.${last}` };
}
function isLineSplittableEncoding(encoding) {
  if (!iconv3.encodingExists(encoding)) return false;
  const probe = iconv3.encode("a\n{", encoding, { addBOM: false });
  return probe.length === 3 && probe[0] === 97 && probe[1] === 10 && probe[2] === 123;
}
function subsetExtractor(pattern) {
  const count3 = pattern.split(SUBSET_PLACEHOLDER).length - 1;
  if (count3 !== 1) {
    throw new Error(`corpus.subset: pattern \`${pattern}\` must contain \`${SUBSET_PLACEHOLDER}\` exactly once (found ${count3})`);
  }
  const source = picomatch.makeRe(pattern.replace(SUBSET_PLACEHOLDER, SUBSET_SENTINEL), { dot: true }).source;
  if (source.split(SUBSET_SENTINEL).length !== 2) {
    throw new Error(`corpus.subset: pattern \`${pattern}\` could not be compiled around \`${SUBSET_PLACEHOLDER}\``);
  }
  const re = new RegExp(source.replace(SUBSET_SENTINEL, "(?<subset>[^/]+)"));
  return (filePath) => re.exec(filePath)?.groups?.["subset"];
}
function pathClassifier(corpus) {
  const overrides = corpus.encodings.map(({ glob, encoding }) => {
    if (!iconv3.encodingExists(encoding)) {
      throw new Error(`corpus.encodings: glob \`${glob}\` names encoding \`${encoding}\`, which iconv-lite does not know`);
    }
    if (!isLineSplittableEncoding(encoding)) {
      throw new Error(
        `corpus.encodings: glob \`${glob}\` names encoding \`${encoding}\`, which does not keep ASCII bytes as they are; sluice splits lines at byte 0x0A, so convert such shards to UTF-8`
      );
    }
    return { match: picomatch(glob, { dot: true }), encoding };
  });
  const subsetOf = corpus.subset !== void 0 ? subsetExtractor(corpus.subset) : void 0;
  return (filePath) => {
    const kind = shardKindOf(filePath);
    if ("unsupported" in kind) {
      const ext = kind.unsupported === "" ? "no extension" : `extension \`${kind.unsupported}\``;
      return { supported: false, detail: `${ext}; sluice reads .jsonl, .ndjson and .txt, optionally compressed as .gz, .zst or .zstd` };
    }
    const encoding = overrides.find((o) => o.match(filePath))?.encoding ?? DEFAULT_ENCODING;
    const subset = subsetOf?.(filePath);
    return subset !== void 0 ? { supported: true, ...kind, encoding, subset } : { supported: true, ...kind, encoding };
  };
}

// src/read/discover.ts
var RESOLVE_CONCURRENCY = 64;
async function discoverShards(root, corpus) {
  const classify = pathClassifier(corpus);
  for (const pattern of [...corpus.include, ...corpus.exclude]) checkPatternStaysInside(pattern);
  const absRoot = path4.resolve(root);
  const realRoot = await readableRoot(absRoot);
  const skipped = [];
  const lister = directoryLister(absRoot, realRoot, skipped);
  const { default: fg } = await import("fast-glob");
  let entries;
  try {
    entries = await fg(corpus.include, {
      cwd: absRoot,
      ignore: corpus.exclude,
      // dot stays false (fast-glob's default): hidden files and directories (.git, .cache) match only when a glob names them.
      onlyFiles: false,
      // keep FIFOs and broken links, to report them rather than drop them silently
      markDirectories: true,
      followSymbolicLinks: true,
      fs: { readdir: lister }
    });
  } catch (error) {
    throw new Error(`cannot list the corpus under ${absRoot}: ${messageOf(error)}`);
  }
  entries.sort(byCodeUnits);
  const found = [];
  await forEachLimited(entries, RESOLVE_CONCURRENCY, async (rel) => {
    if (rel.endsWith("/")) {
      const dir = rel.slice(0, -1);
      if (!("unsupported" in shardKindOf(dir))) skipped.push({ path: dir, reason: "not-a-file", detail: "a directory, named like a shard" });
      return;
    }
    const abs = path4.join(absRoot, rel);
    let real;
    try {
      real = await realpath(abs);
    } catch (error) {
      skipped.push({ path: rel, reason: "unreadable", detail: `cannot resolve (a broken link?): ${messageOf(error)}` });
      return;
    }
    if (!isInside(realRoot, real)) {
      skipped.push({ path: rel, reason: "link-outside-root", detail: `resolves to ${real}, outside the root ${realRoot}` });
      return;
    }
    let stats;
    try {
      stats = await stat2(real);
    } catch (error) {
      skipped.push({ path: rel, reason: "unreadable", detail: messageOf(error) });
      return;
    }
    if (!stats.isFile()) {
      skipped.push({ path: rel, reason: "not-a-file", detail: `not a regular file (${fileType(stats)})` });
      return;
    }
    found.push({ rel, real, stats, direct: toPosix(path4.relative(realRoot, real)) === rel });
  });
  const shards = [];
  for (const file of chooseOnePathPerFile(found, skipped)) {
    const kind = classify(file.rel);
    if (!kind.supported) {
      skipped.push({ path: file.rel, reason: "unsupported-format", detail: kind.detail });
      continue;
    }
    const shard = {
      path: file.rel,
      absPath: file.real,
      format: kind.format,
      compression: kind.compression,
      encoding: kind.encoding,
      sizeBytes: file.stats.size
    };
    if (kind.subset !== void 0) shard.subset = kind.subset;
    shards.push(shard);
  }
  shards.sort((a, b) => byCodeUnits(a.path, b.path));
  skipped.sort((a, b) => byCodeUnits(a.path, b.path) || byCodeUnits(a.reason, b.reason));
  return { shards, skipped };
}
function chooseOnePathPerFile(found, skipped) {
  const byFile = /* @__PURE__ */ new Map();
  for (const file of found) {
    const key = `${file.stats.dev}:${file.stats.ino}`;
    const group = byFile.get(key);
    if (group === void 0) byFile.set(key, [file]);
    else group.push(file);
  }
  const kept = [];
  for (const group of byFile.values()) {
    group.sort((a, b) => Number(b.direct) - Number(a.direct) || byCodeUnits(a.rel, b.rel));
    const [first, ...others] = group;
    kept.push(first);
    for (const other of others) skipped.push({ path: other.rel, reason: "same-file", detail: `the same file as ${first.rel}, which is read` });
  }
  return kept;
}
function directoryLister(absRoot, realRoot, skipped) {
  const realOf = /* @__PURE__ */ new Map();
  const resolve = (dir) => {
    let real = realOf.get(dir);
    if (real === void 0) {
      real = realpath(dir);
      realOf.set(dir, real);
    }
    return real;
  };
  const list = async (dir) => {
    const rel = toPosix(path4.relative(absRoot, dir));
    let real;
    try {
      real = await resolve(dir);
    } catch (error) {
      skipped.push({ path: rel, reason: "unreadable", detail: `cannot resolve the directory: ${messageOf(error)}` });
      return "skip";
    }
    if (!isInside(realRoot, real)) {
      skipped.push({ path: rel, reason: "link-outside-root", detail: `directory resolves to ${real}, outside the root ${realRoot}; not followed` });
      return "skip";
    }
    for (let up = path4.dirname(dir); isInside(absRoot, up) && up !== dir; up = path4.dirname(up)) {
      if (await resolve(up).catch(() => "") === real) {
        skipped.push({ path: rel, reason: "link-loop", detail: `links back to ${toPosix(path4.relative(absRoot, up)) || "."}, which the walk is inside; not followed` });
        return "skip";
      }
      if (up === absRoot) break;
    }
    return "list";
  };
  const lister = (dir, optionsOrCallback, maybeCallback) => {
    const callback = typeof optionsOrCallback === "function" ? optionsOrCallback : maybeCallback;
    const options = typeof optionsOrCallback === "function" ? {} : optionsOrCallback;
    list(dir).then(
      (decision) => {
        if (decision === "skip") return callback(null, []);
        readdir(dir, options, (error, entries) => {
          if (error === null) return callback(null, entries);
          if (error.code !== "ENOENT") skipped.push({ path: toPosix(path4.relative(absRoot, dir)), reason: "unreadable", detail: `cannot list the directory: ${error.message}` });
          callback(null, []);
        });
      },
      (error) => callback(error, [])
    );
  };
  return lister;
}
async function readableRoot(absRoot) {
  let real;
  let stats;
  try {
    real = await realpath(absRoot);
    stats = await stat2(real);
  } catch (error) {
    throw new Error(`corpus root ${absRoot} cannot be read: ${messageOf(error)}`);
  }
  if (!stats.isDirectory()) throw new Error(`corpus root ${absRoot} is not a directory`);
  await new Promise(
    (resolve, reject) => readdir(real, (error) => error === null ? resolve() : reject(new Error(`corpus root ${absRoot} cannot be listed: ${error.message}`)))
  );
  return real;
}
function checkPatternStaysInside(pattern) {
  const body = pattern.startsWith("!") ? pattern.slice(1) : pattern;
  if (path4.posix.isAbsolute(body) || path4.win32.isAbsolute(body) || body.split("/").includes("..")) {
    throw new Error(`corpus glob \`${pattern}\` leaves the root; globs are relative to the root and may not use \`..\` or absolute paths`);
  }
}
function isInside(root, candidate) {
  return candidate === root || candidate.startsWith(root.endsWith(path4.sep) ? root : root + path4.sep);
}
function fileType(stats) {
  if (stats.isDirectory()) return "a directory";
  if (stats.isFIFO()) return "a FIFO";
  if (stats.isSocket()) return "a socket";
  if (stats.isCharacterDevice() || stats.isBlockDevice()) return "a device";
  return "not a regular file";
}
function toPosix(p) {
  return p.split(path4.sep).join("/");
}
function byCodeUnits(a, b) {
  return a < b ? -1 : a > b ? 1 : 0;
}
async function forEachLimited(items, limit, task) {
  let next = 0;
  const worker = async () => {
    while (next < items.length) await task(items[next++]);
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, worker));
}
function messageOf(error) {
  return error instanceof Error ? error.message : String(error);
}

// src/read/shard.ts
import { isUtf8 as isUtf82 } from "node:buffer";

// src/read/decode.ts
import { isUtf8 } from "node:buffer";
import iconv4 from "iconv-lite";
function firstInvalidUtf8(bytes3) {
  const n = bytes3.length;
  let i = 0;
  while (i < n) {
    const b = bytes3[i];
    if (b < 128) {
      i++;
      continue;
    }
    let lo = 128;
    let hi = 191;
    let need;
    if (b >= 194 && b <= 223) need = 1;
    else if (b === 224) need = 2, lo = 160;
    else if (b === 237) need = 2, hi = 159;
    else if (b >= 225 && b <= 239) need = 2;
    else if (b === 240) need = 3, lo = 144;
    else if (b === 244) need = 3, hi = 143;
    else if (b >= 241 && b <= 243) need = 3;
    else return i;
    if (i + need >= n) return i;
    const b1 = bytes3[i + 1];
    if (b1 < lo || b1 > hi) return i;
    for (let k = 2; k <= need; k++) {
      const bk = bytes3[i + k];
      if (bk < 128 || bk > 191) return i;
    }
    i += need + 1;
  }
  return -1;
}
function lineDecoder(encoding) {
  return isUtf8Name(encoding) ? decodeUtf8Line : legacyLineDecoder(encoding);
}
function isUtf8Name(encoding) {
  return encoding.toLowerCase().replace(/[^a-z0-9]/g, "") === "utf8";
}
function decodeUtf8Line(buf, start, end, clean3) {
  if (clean3) return buf.toString("utf8", start, end);
  const line = buf.subarray(start, end);
  const nul = line.indexOf(0);
  if (nul !== -1) return { reason: "binary", at: nul };
  if (!isUtf8(line)) return { reason: "invalid-encoding", at: firstInvalidUtf8(line) };
  return line.toString("utf8");
}
function legacyLineDecoder(encoding) {
  return (buf, start, end, clean3) => {
    const line = buf.subarray(start, end);
    if (!clean3) {
      const nul = line.indexOf(0);
      if (nul !== -1) return { reason: "binary", at: nul };
    }
    const text = iconv4.decode(line, encoding, { stripBOM: false });
    if (!text.includes("\uFFFD")) return text;
    return { reason: "invalid-encoding", at: firstUndecodableByte(line, encoding) };
  };
}
function firstUndecodableByte(line, encoding) {
  const decoder = iconv4.getDecoder(encoding, { stripBOM: false });
  for (let i = 0; i < line.length; i++) {
    if (decoder.write(line.subarray(i, i + 1)).includes("\uFFFD")) return i;
  }
  return Math.max(0, line.length - 1);
}

// src/read/lines.ts
var NEWLINE = 10;
var CARRIAGE_RETURN = 13;
var LineSplitter = class {
  constructor(sink, options) {
    this.sink = sink;
    this.options = options;
    this.max = options.maxLineBytes;
  }
  sink;
  options;
  max;
  /** Pieces of the unfinished line carried over from earlier chunks (copies, so the producer may reuse its buffers). */
  parts = [];
  carried = 0;
  /** Bytes of the too-long line being skipped, or -1 when not skipping. */
  skipped = -1;
  /** Absolute offset where the carried or skipped line starts. */
  lineOffset = 0;
  /** Absolute offset of the next chunk's first byte. */
  offset = 0;
  /** Returns the bytes fed so far (the decompressed size). */
  get bytes() {
    return this.offset;
  }
  /** Returns the bytes of an unfinished line held or skipped (what a broken stream cuts off). */
  get pendingBytes() {
    return this.skipped >= 0 ? this.skipped : this.carried;
  }
  /** Splits one chunk, handing every line it completes to the sink. */
  write(chunk) {
    const n = chunk.length;
    if (n === 0) return;
    let pos = 0;
    if (this.skipped >= 0) {
      const nl = chunk.indexOf(NEWLINE);
      if (nl === -1) {
        this.skipped += n;
        this.offset += n;
        return;
      }
      this.sink.tooLong(this.skipped + nl, this.lineOffset);
      this.skipped = -1;
      pos = nl + 1;
    } else if (this.carried > 0) {
      const nl = chunk.indexOf(NEWLINE);
      if (nl === -1) {
        if (this.carried + n > this.max) this.startSkipping(this.carried + n);
        else this.carry(Buffer.from(chunk));
        this.offset += n;
        return;
      }
      const length = this.carried + nl;
      if (length > this.max) {
        this.sink.tooLong(length, this.lineOffset);
      } else {
        this.parts.push(chunk.subarray(0, nl));
        const line = Buffer.concat(this.parts, length);
        this.emit(line, 0, length, false, this.lineOffset);
      }
      this.parts = [];
      this.carried = 0;
      pos = nl + 1;
    }
    const last = chunk.lastIndexOf(NEWLINE);
    if (last >= pos) {
      const clean3 = this.options.blockIsClean(chunk.subarray(pos, last));
      const base = this.offset;
      let start = pos;
      while (start <= last) {
        const nl = chunk.indexOf(NEWLINE, start);
        if (nl - start > this.max) this.sink.tooLong(nl - start, base + start);
        else this.emit(chunk, start, nl, clean3, base + start);
        start = nl + 1;
      }
      pos = last + 1;
    }
    if (pos < n) {
      this.lineOffset = this.offset + pos;
      if (n - pos > this.max) this.startSkipping(n - pos);
      else this.carry(Buffer.from(chunk.subarray(pos)));
    }
    this.offset += n;
  }
  /** Hands on the final line when the stream did not end with a newline. */
  end() {
    if (this.skipped >= 0) {
      this.sink.tooLong(this.skipped, this.lineOffset);
      this.skipped = -1;
    } else if (this.carried > 0) {
      const line = Buffer.concat(this.parts, this.carried);
      this.parts = [];
      this.carried = 0;
      this.emit(line, 0, line.length, false, this.lineOffset);
    }
  }
  carry(piece) {
    this.parts.push(piece);
    this.carried += piece.length;
  }
  startSkipping(bytes3) {
    this.parts = [];
    this.carried = 0;
    this.skipped = bytes3;
  }
  emit(buf, start, end, clean3, offset) {
    if (end > start && buf[end - 1] === CARRIAGE_RETURN) end--;
    if (offset === 0 && this.options.stripBom && end - start >= 3 && buf[start] === 239 && buf[start + 1] === 187 && buf[start + 2] === 191) {
      start += 3;
    }
    this.sink.line(buf, start, end, clean3, offset);
  }
};

// src/read/records.ts
var MAX_PARSE_MESSAGE_CHARS = 200;
function dotPathReader(dotPath) {
  const keys = dotPath.split(".");
  if (keys.length === 1) {
    const key = keys[0];
    return (record) => Object.hasOwn(record, key) ? record[key] : void 0;
  }
  return (record) => {
    let value = record;
    for (const key of keys) {
      if (value === null || typeof value !== "object" || !Object.hasOwn(value, key)) return void 0;
      value = value[key];
    }
    return value;
  };
}
function kindOf2(value) {
  if (value === null) return "null";
  if (Array.isArray(value)) return "an array";
  const type = typeof value;
  return type === "object" ? "an object" : `a ${type}`;
}
function recordParser(textField, declaredLanguageField) {
  const textOf = dotPathReader(textField);
  const languageOf = declaredLanguageField !== void 0 ? dotPathReader(declaredLanguageField) : void 0;
  return (line) => {
    let record;
    try {
      record = JSON.parse(line);
    } catch (error) {
      if (line.charCodeAt(0) === 65279) {
        return { reason: "invalid-json", detail: "the line starts with a byte order mark (U+FEFF), as where files were joined end to end; only a shard's first line may have one" };
      }
      const message = error instanceof Error ? error.message : String(error);
      return { reason: "invalid-json", detail: message.length > MAX_PARSE_MESSAGE_CHARS ? `${message.slice(0, MAX_PARSE_MESSAGE_CHARS)}\u2026` : message };
    }
    if (record === null || typeof record !== "object" || Array.isArray(record)) {
      return { reason: "not-an-object", detail: `the line parses to ${kindOf2(record)}, not an object` };
    }
    const text = textOf(record);
    if (text === void 0) return { reason: "missing-text", detail: `no value at \`${textField}\`` };
    if (typeof text !== "string") return { reason: "non-string-text", detail: `\`${textField}\` is ${kindOf2(text)}, not a string` };
    const language = languageOf?.(record);
    return { text, declaredLanguage: typeof language === "string" ? language : void 0 };
  };
}

// src/read/source.ts
import { createReadStream } from "node:fs";
import { open } from "node:fs/promises";
import { createGunzip } from "node:zlib";
import { Decompress } from "fzstd";
var READ_CHUNK_BYTES = 256 * 1024;
var ZSTD_READ_CHUNK_BYTES = 64 * 1024;
function readChunkBytes(ref) {
  return ref.compression === "zstd" ? ZSTD_READ_CHUNK_BYTES : READ_CHUNK_BYTES;
}
var GUNZIP_CHUNK_BYTES = 128 * 1024;
async function textSizeHint(ref) {
  if (ref.compression !== "gzip" || ref.open !== void 0 || ref.sizeBytes < 18) return ref.sizeBytes;
  let handle;
  try {
    handle = await open(ref.absPath, "r");
    const tail = Buffer.alloc(4);
    const { bytesRead } = await handle.read(tail, 0, 4, ref.sizeBytes - 4);
    return bytesRead === 4 ? Math.max(tail.readUInt32LE(0), ref.sizeBytes) : ref.sizeBytes;
  } catch {
    return ref.sizeBytes;
  } finally {
    await handle?.close();
  }
}
async function pumpShard(ref, write, pace) {
  let source;
  try {
    source = ref.open?.() ?? createReadStream(ref.absPath, { highWaterMark: readChunkBytes(ref) });
  } catch (error) {
    return { compressedBytes: 0, error: `cannot open: ${messageOf2(error)}` };
  }
  switch (ref.compression) {
    case "none":
      return pumpPlain(source, write, pace);
    case "gzip":
      return pumpGzip(source, write, pace);
    case "zstd":
      return pumpZstd(source, write, pace);
  }
}
async function pumpPlain(source, write, pace) {
  let compressedBytes = 0;
  const error = await drain(
    source,
    (chunk) => {
      compressedBytes += chunk.length;
      write(chunk);
    },
    pace
  );
  return error === void 0 ? { compressedBytes } : { compressedBytes, error: `read failed: ${error}` };
}
async function pumpGzip(source, write, pace) {
  const gunzip = createGunzip({ chunkSize: GUNZIP_CHUNK_BYTES });
  let failedFirst;
  source.on("error", () => failedFirst ??= "read");
  gunzip.on("error", () => failedFirst ??= "gzip");
  const fed = feedGzip(source, gunzip);
  const error = await drain(gunzip, write, pace);
  await fed;
  const compressedBytes = gunzip.bytesWritten;
  if (error === void 0) return { compressedBytes };
  return { compressedBytes, error: failedFirst === "read" ? `read failed: ${error}` : `gzip: ${error}` };
}
var GZIP_TRAILER_BYTES = 8;
async function feedGzip(source, gunzip) {
  let held = Buffer.alloc(0);
  try {
    for await (const chunk of source) {
      if (gunzip.destroyed) break;
      const bytes3 = typeof chunk === "string" ? Buffer.from(chunk) : chunk;
      const all = held.length === 0 ? bytes3 : Buffer.concat([held, bytes3]);
      if (all.length <= GZIP_TRAILER_BYTES) {
        held = all;
        continue;
      }
      held = Buffer.from(all.subarray(all.length - GZIP_TRAILER_BYTES));
      if (!gunzip.write(all.subarray(0, all.length - GZIP_TRAILER_BYTES))) await drainedOrClosed(gunzip);
    }
  } catch (error) {
    gunzip.destroy(error instanceof Error ? error : new Error(String(error)));
    return;
  }
  if (gunzip.destroyed) return;
  if (held.length > 0) await closedOr(gunzip, (settle) => gunzip.write(held, settle));
  if (!gunzip.destroyed) gunzip.end();
}
function drainedOrClosed(stream) {
  return closedOr(stream, (settle) => stream.once("drain", settle));
}
function closedOr(stream, start) {
  return new Promise((resolve) => {
    if (stream.destroyed) {
      resolve();
      return;
    }
    const settle = () => {
      stream.off("close", settle);
      resolve();
    };
    stream.on("close", settle);
    start(settle);
  });
}
async function pumpZstd(source, write, pace) {
  let compressedBytes = 0;
  let consumerError;
  const decompressor = new Decompress((data2) => {
    if (data2.length === 0) return;
    try {
      write(Buffer.from(data2.buffer, data2.byteOffset, data2.byteLength));
    } catch (error) {
      consumerError = { error };
      throw error;
    }
  });
  const push = (chunk, final) => {
    try {
      decompressor.push(chunk, final);
      return void 0;
    } catch (error) {
      if (consumerError !== void 0) throw consumerError.error;
      return messageOf2(error);
    }
  };
  let broken;
  const readError = await drain(
    source,
    (chunk) => {
      compressedBytes += chunk.length;
      broken = push(chunk, false);
      if (broken !== void 0) throw new StopSignal();
    },
    pace
  );
  if (readError === void 0 && broken === void 0) broken = push(new Uint8Array(0), true);
  if (readError !== void 0) return { compressedBytes, error: `read failed: ${readError}` };
  return broken === void 0 ? { compressedBytes } : { compressedBytes, error: `zstd: ${broken}` };
}
var StopSignal = class extends Error {
};
async function drain(stream, body, pace) {
  const iterator = stream[Symbol.asyncIterator]();
  for (; ; ) {
    let step;
    try {
      step = await iterator.next();
    } catch (error) {
      return messageOf2(error);
    }
    if (step.done) return void 0;
    try {
      body(typeof step.value === "string" ? Buffer.from(step.value) : step.value);
    } catch (error) {
      stream.destroy();
      if (error instanceof StopSignal) return void 0;
      throw error;
    }
    if (pace) {
      try {
        const wait = pace();
        if (wait !== void 0) await wait;
      } catch (error) {
        stream.destroy();
        throw error;
      }
    }
  }
}
function messageOf2(error) {
  return error instanceof Error ? error.message : String(error);
}

// src/read/shard.ts
var BLANK = /^\s*$/;
var OPEN_BRACE = 123;
function emptyAccount() {
  return { lines: 0, docs: 0, docLines: 0, empty: 0, rejected: { count: 0, byReason: {}, samples: [] }, bytes: 0, compressedBytes: 0 };
}
async function readShard(ref, opts, onDocument, pace) {
  const account = emptyAccount();
  const sink = ref.format === "jsonl" ? new JsonlSink(account, opts, onDocument, ref.encoding) : new TextSink(account, opts, onDocument, ref.encoding);
  const utf8 = isUtf8Name(ref.encoding);
  const splitter = new LineSplitter(sink, {
    maxLineBytes: opts.maxLineBytes,
    stripBom: utf8,
    blockIsClean: utf8 ? (block) => block.indexOf(0) === -1 && isUtf82(block) : (block) => block.indexOf(0) === -1
  });
  const { compressedBytes, error } = await pumpShard(ref, (chunk) => splitter.write(chunk), pace ? () => pace(splitter.bytes) : void 0);
  if (error === void 0) {
    splitter.end();
    sink.finish();
  } else {
    sink.finish();
    const pending = splitter.pendingBytes;
    account.broken = {
      afterLine: account.lines,
      message: pending > 0 ? `${error} (${pending} bytes of an unfinished line after line ${account.lines} not counted)` : error
    };
  }
  account.bytes = splitter.bytes;
  account.compressedBytes = compressedBytes;
  return account;
}
var AccountingSink = class {
  constructor(account, opts, onDocument, encoding) {
    this.account = account;
    this.opts = opts;
    this.onDocument = onDocument;
    this.encoding = encoding;
    this.decode = lineDecoder(encoding);
  }
  account;
  opts;
  onDocument;
  encoding;
  decode;
  /** Called once after the last line (also after a break). */
  finish() {
  }
  tooLong(bytes3, _offset) {
    const line = ++this.account.lines;
    this.reject(line, "line-too-long", `line of ${bytes3} bytes is longer than maxLineBytes (${this.opts.maxLineBytes}); skipped unread`);
  }
  reject(line, reason, detail) {
    const rejected = this.account.rejected;
    rejected.count++;
    rejected.byReason[reason] = (rejected.byReason[reason] ?? 0) + 1;
    if (rejected.samples.length < this.opts.maxSamples) rejected.samples.push({ line, reason, detail });
  }
  rejectFault(line, fault, offset) {
    const where2 = `byte ${fault.at} of the line (byte ${offset + fault.at} of the decompressed shard)`;
    if (fault.reason === "binary") this.reject(line, "binary", `NUL byte at ${where2}: binary content, not text`);
    else this.reject(line, "invalid-encoding", `not valid ${this.encoding} at ${where2}`);
  }
};
var JsonlSink = class extends AccountingSink {
  parse;
  constructor(account, opts, onDocument, encoding) {
    super(account, opts, onDocument, encoding);
    this.parse = recordParser(opts.textField, opts.declaredLanguageField);
  }
  line(buf, start, end, clean3, offset) {
    const line = ++this.account.lines;
    const text = this.decode(buf, start, end, clean3);
    if (typeof text !== "string") return this.rejectFault(line, text, offset);
    if (text.length === 0 || text.charCodeAt(0) !== OPEN_BRACE && BLANK.test(text)) {
      this.account.empty++;
      return;
    }
    const record = this.parse(text);
    if ("reason" in record) return this.reject(line, record.reason, record.detail);
    this.account.docs++;
    this.account.docLines++;
    const doc = { line, lineEnd: line, text: record.text };
    if (record.declaredLanguage !== void 0) doc.declaredLanguage = record.declaredLanguage;
    this.onDocument(doc);
  }
};
var TextSink = class extends AccountingSink {
  paragraph = [];
  paragraphBytes = 0;
  paragraphStart = 0;
  line(buf, start, end, clean3, offset) {
    const line = ++this.account.lines;
    const text = this.decode(buf, start, end, clean3);
    if (typeof text !== "string") {
      this.flush();
      return this.rejectFault(line, text, offset);
    }
    if (text.length === 0 || BLANK.test(text)) {
      this.flush();
      this.account.empty++;
      return;
    }
    const bytes3 = end - start;
    if (this.paragraph.length > 0 && this.paragraphBytes + bytes3 > this.opts.maxLineBytes) this.flush();
    if (this.paragraph.length === 0) this.paragraphStart = line;
    this.paragraph.push(text);
    this.paragraphBytes += bytes3 + 1;
  }
  tooLong(bytes3, offset) {
    this.flush();
    super.tooLong(bytes3, offset);
  }
  finish() {
    this.flush();
  }
  flush() {
    const count3 = this.paragraph.length;
    if (count3 === 0) return;
    const doc = { line: this.paragraphStart, lineEnd: this.paragraphStart + count3 - 1, text: this.paragraph.join("\n") };
    this.paragraph = [];
    this.paragraphBytes = 0;
    this.account.docs++;
    this.account.docLines += count3;
    this.onDocument(doc);
  }
};

// src/results/cache.ts
import { createHash as createHash3 } from "node:crypto";
import { mkdir, readFile as readFile2, rename, writeFile } from "node:fs/promises";
import { join } from "node:path";

// src/measure/duplicates/hash.ts
function mix32(h) {
  h ^= h >>> 16;
  h = Math.imul(h, 2246822507);
  h ^= h >>> 13;
  h = Math.imul(h, 3266489909);
  return h ^ h >>> 16;
}
function mix32b(h) {
  h ^= h >>> 16;
  h = Math.imul(h, 2146121005);
  h ^= h >>> 15;
  h = Math.imul(h, 2221713035);
  return h ^ h >>> 16;
}
function fmix32(h) {
  return mix32(h) >>> 0;
}
var EXACT_BASIS_1 = 2166136261 | 0;
var EXACT_BASIS_2 = 1818371886 | 0;
var EXACT_PRIME_1 = 16777619;
var EXACT_PRIME_2 = 1540483477;
function finishExact(h1, h2, length, out) {
  h1 ^= length;
  h2 = h2 + length | 0;
  h1 = h1 + h2 | 0;
  h2 = h2 + h1 | 0;
  h1 = mix32(h1);
  h2 = mix32b(h2);
  h1 = h1 + h2 | 0;
  h2 = h2 + h1 | 0;
  out.exactHigh = h1 >>> 0;
  out.exactLow = h2 >>> 0;
}

// src/measure/kernels/instance.ts
function kernelUnavailable() {
  return typeof WebAssembly === "undefined" ? "this Node.js runs without WebAssembly (started with --jitless?), and the language labeller and token counter run as WebAssembly kernels: run sluice without that flag" : null;
}
function instantiateKernel(base64, env = {}) {
  const unavailable = kernelUnavailable();
  if (unavailable) throw new Error(unavailable);
  const module = new WebAssembly.Module(Buffer.from(base64, "base64"));
  const exports = new WebAssembly.Instance(module, { env }).exports;
  const memory = exports.memory;
  let top = exports.__heap_base.value + 15 & ~15;
  const allocate = (bytes4) => {
    const at = top;
    top = top + bytes4 + 15 & ~15;
    const missing = top - memory.buffer.byteLength;
    if (missing > 0) memory.grow(Math.ceil(missing / 65536));
    return at;
  };
  const place = (array) => {
    const at = allocate(array.byteLength);
    new Uint8Array(memory.buffer, at, array.byteLength).set(new Uint8Array(array.buffer, array.byteOffset, array.byteLength));
    return at;
  };
  let bytes3 = Buffer.from(memory.buffer);
  const writeUtf16 = (at, text, units = text.length) => {
    if (bytes3.buffer !== memory.buffer) bytes3 = Buffer.from(memory.buffer);
    bytes3.write(text, at, units * 2, "utf16le");
  };
  return Object.assign(/* @__PURE__ */ Object.create(null), exports, { allocate, place, writeUtf16 });
}

// src/measure/kernels/duplicates.generated.ts
var WASM_BASE64 = "AGFzbQEAAAABHwVgAX8Bf2ABfwBgAAF/YAZ/f39/f38Bf2ADf39/AX8CEwEDZW52C2FzdHJhbENsYXNzAAADCAcBAgICAwQDBAUBcAEBAQUDAQAiBhECfwFBoIiEAQt/AEGgiIQBCwdxCQZtZW1vcnkCAApzZXRDbGFzc2VzAAELZXhhY3RMZW5ndGgAAglleGFjdEhpZ2gAAwhleGFjdExvdwAEDHNjYW5QcmVwYXJlZAAFBnNrZXRjaAAGDGZpcnN0T3ZlcmxhcAAHC19faGVhcF9iYXNlAwEKlicHDQBBACAANgKAiICAAAsLAEEAKAKEiICAAAsLAEEAKAKIiICAAAsLAEEAKAKMiICAAAulCgETfwJAAkAgAUEBTg0AQcW78oh4IQZBrs6I4wYhB0EAIQhBACEJDAELIAFBfmohCiAAQQRqIQsgAUF/aiEMQQAoAoCIgIAAIQ1Brs6I4wYhB0EAIQlBACEOQQAhD0EAIRBBACERQQAhEkEAIQhBxbvyiHghBkEAIRMDQAJAAkACQAJAAkACQCANIAAgEUEBdGovAQAiFGotAAAiFUECRg0AIBEhFkF/IRcMAQtBACEVQX8hGCARQQFqIhYgAU4NASAAIBZBAXRqLwEAIhdBgPgDcUGAuANHDQEgFEEKdCAXakGAyIBlahCAgICAACEVQQAoAoCIgIAAIQ0LIBVBAUYNASAXIRggFiERCwJAIA5FDQACQCADRQ0AIAUgCUECdGogECATaiIOQRB2IA5zQa3qrP8HbCIOQQ92IA5zQYvNsqN4bCIOQRB2IA5zNgIACyAEIAlBAnRqIA8gE3MiDkEQdiAOc0HrlK+veGwiDkENdiAOc0G13MqVfGwiDkEQdiAOczYCACAJQQFqIQkLQQAhDkEBIRcgFUEDRw0BQQEhEgwCCyAPQcW78oh4IA4bIREgEEGfurEoIA4bIRUCQCASRQ0AAkAgCA0AQQAhCAwBCyAIQQFqIQggB0Egc0GV08feBWwhByAGQSBzQZODgAhsIQYLIBNBACAOGyETIAcgFHNBldPH3gVsIQcgBiAUc0GTg4AIbCEGIBUgFHNB7fjs4AJsIRAgESAUc0GTg4AIbCEPAkACQAJAIBdBf0oNAAJAIBZBAWoiESABSA0AIBYhEQwDCyANIAAgEUEBdGovAQAiFWotAABBAUYNASAWIREMAgsgCEECaiEIIBNBAmohEyAHIBdzQZXTx94FbCEHIAYgF3NBk4OACGwhBiAXIBBzQe347OACbCEQIBcgD3NBk4OACGwhD0EBIQ5BACESIBYhEUEAIRcMAwsgCyAWQQF0aiEOIBYhEQJAA0AgByAVc0GV08feBWwhByAGIBVzQZODgAhsIQYgECAVc0Ht+OzgAmwhECAPIBVzQZODgAhsIQ8gCiARRg0BIBFBAWohESAOLwEAIRUgDkECaiEOIA0gFWotAABBAUYNAAwCCwsgDCERC0EBIQ4gESAWa0EBaiIVIAhqIQggFSATaiETQQAhEkEAIRcMAQsCQCACRQ0AIBVBBEYNAQsCQCASRQ0AAkAgCA0AQQAhCAwBCyAIQQFqIQggB0Egc0GV08feBWwhByAGQSBzQZODgAhsIQYLQQEhFyAHIBRzQZXTx94FbCEHIAYgFHNBk4OACGwhBkEAIRICQAJAIBhBAE4NACAIQQFqIQgMAQsgCEECaiEIIAcgGHNBldPH3gVsIQcgBiAYc0GTg4AIbCEGC0EAIQ4LIBFBAWoiESABSA0ACyAXDQACQCADRQ0AIAUgCUECdGogECATaiIRQRB2IBFzQa3qrP8HbCIRQQ92IBFzQYvNsqN4bCIRQRB2IBFzNgIACyAEIAlBAnRqIA8gE3MiEUEQdiARc0HrlK+veGwiEUENdiARc0G13MqVfGwiEUEQdiARczYCACAJQQFqIQkLQQAgCDYChIiAgABBACAIIAZzIAggB2oiFWoiESAVaiIVQRB2IBVzQa3qrP8HbCIVQQ92IBVzQYvNsqN4bCIVQRB2IBVzIhUgEUEQdiARc0HrlK+veGwiEUENdiARc0G13MqVfGwiEUEQdiARc2oiETYCiIiAgABBACARIBVqNgKMiICAACAJC/4RAwl/AXsDfyABIAIoAgAiA2tBAWohBEEBIQUCQCABIAMgASADSCIGGyIHQQJIDQBBASEFQQEhCAJAIAdBf2oiCUEESQ0AIAlBfHEiCkF8aiILQQJ2QQFqIgVBB3EhCAJAAkAgC0EcTw0A/QwBAAAAAQAAAAEAAAABAAAAIQwMAQsgBUH4////B3EhC/0MAQAAAAEAAAABAAAAAQAAACEMA0AgDP0MgQAchYEAHIWBAByFgQAchf21ASEMIAtBeGoiCw0ACwsCQCAIRQ0AA0AgDP0MkfRFJZH0RSWR9EUlkfRFJf21ASEMIAhBf2oiCA0ACwsgDCAMIAz9DQgJCgsMDQ4PAAAAAAAAAAD9tQEiDCAMIAz9DQQFBgcAAAAAAAAAAAAAAAD9tQH9GwAhBSAJIApGDQEgCkEBciEICyAHIAhrIQgDQCAFQZHpl6oCbCEFIAhBf2oiCA0ACwtBASAEIAYbIQ1BACELAkAgB0EBSA0AIAdBA3EhBAJAAkAgB0F/akEDTw0AQQAhBkEAIQsMAQsgB0F8cSEJQQAhBiAAIQhBACELA0AgCEEMaigCACAIQQhqKAIAIAhBBGooAgAgCCgCACALQZHpl6oCbGpBkemXqgJsakGR6ZeqAmxqQZHpl6oCbGohCyAIQRBqIQggCSAGQQRqIgZHDQALCyAERQ0AIAAgBkECdGohCANAIAgoAgAgC0GR6ZeqAmxqIQsgCEEEaiEIIARBf2oiBA0ACwtBACACKAIMIAdBAnQiBmooAgAiByALcyIIQRB2IAhzQeuUr694bCIIQQ12IAhzQbXcypV8bCIIQRB2IAhzIgQ2ApCIgIAAAkAgDUECSA0AIAAgBmohCkEAIQhBASEGA0AgCEGUiICAAGogCyAAIAhqKAIAIAVsa0GR6ZeqAmwgCiAIaigCAGoiCyAHcyIJQRB2IAlzQeuUr694bCIJQQ12IAlzQbXcypV8bCIJQRB2IAlzNgIAIAhBBGohCCAGQQFqIgYgDUgNAAsLIAIoAhghCSACKAIUIQ4CQAJAAkACQCACKAIEIgBFDQAgCUH/ASAAQQJ0/AsAQQEhDyANQQFIDQIMAQsgDUEATA0CCyADIAEgAyABShsgA2shCEGUiICAACELIAAhDwNAAkACQCAJIARBEHYgAGxBEHZBAnQiBWoiBigCAEF/Sg0AIAZBADYCACAOIAVqIAQ2AgAgD0F/aiEPDAELIAQgDiAFaiIFKAIATg0AIAUgBDYCAAsCQCAIRQ0AIAhBf2ohCCALKAIAIQQgC0EEaiELDAELCyAPQQFIDQBBASEKA0AgCiACKAIITg0BIApBsfPd8XlsIQFBkIiAgAAhCCANIQsDQCAIKAIAIAFzIgRBEHYgBHNB65Svr3hsIgRBDXYgBHNBtdzKlXxsIgRBEHYiBSAEcyEEAkACQCAJIAUgAGxBEHZBAnQiBWoiBygCACIGQQBIDQAgBiAKRw0BIAQgDiAFaiIFKAIATg0BIAUgBDYCAAwBCyAHIAo2AgAgDiAFaiAENgIAIA9Bf2ohDwsgCEEEaiEIIAtBf2oiCw0ACyAKQQFqIQogD0EASg0ACwsgD0UNACAARQ0AQQAhBgNAAkAgCSAGQQJ0IgdqKAIAQX9KDQACQAJAAkAgCSACKAIQIgggBkEHdGooAgAiC0ECdGooAgBBf0oNACAJIAggBkEFdEECdCIEQQRyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQQhyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQQxyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQRByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQRRyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQRhyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQRxyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQSByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQSRyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQShyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQSxyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQTByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQTRyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQThyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQTxyaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQcAAcmooAgAiC0ECdGooAgBBf0oNACAJIAggBEHEAHJqKAIAIgtBAnRqKAIAQX9KDQAgCSAIIARByAByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQcwAcmooAgAiC0ECdGooAgBBf0oNACAJIAggBEHQAHJqKAIAIgtBAnRqKAIAQX9KDQAgCSAIIARB1AByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQdgAcmooAgAiC0ECdGooAgBBf0oNACAJIAggBEHcAHJqKAIAIgtBAnRqKAIAQX9KDQAgCSAIIARB4AByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQeQAcmooAgAiC0ECdGooAgBBf0oNACAJIAggBEHoAHJqKAIAIgtBAnRqKAIAQX9KDQAgCSAIIARB7AByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQfAAcmooAgAiC0ECdGooAgBBf0oNACAJIAggBEH0AHJqKAIAIgtBAnRqKAIAQX9KDQAgCSAIIARB+AByaigCACILQQJ0aigCAEF/Sg0AIAkgCCAEQfwAcmooAgAiC0ECdGooAgBBAE4NAEF/IQsMAQsgC0F/Sg0BCyAGQbHz3fF5bEGx893xeWohBUHXspSbBCEIA0AgBSAIcyEEIAhB95Svr3hqIQggCyAEQa/W074CcyIEQRB2IARzQeuUr694bCIEQQ12IARzQbXcypV8bEEQdiAAbEEQdiIEIAkgBEECdGooAgBBAEgbIgtBAEgNAAsLIA4gB2ogDiALQQJ0aigCADYCAAsgBkEBaiIGIABHDQALCyANC7oKAwd/AXsJfwJAIAIgA0gNAEEBIQZBASEHAkAgA0ECSA0AQQEhCEEBIQYCQAJAIANBf2oiCUEESQ0AIAlBfHEiCkF8aiILQQJ2QQFqIgxBB3EhCAJAAkAgC0EcTw0A/QwBAAAAAQAAAAEAAAABAAAAIQ0MAQsgDEH4////B3EhC/0MAQAAAAEAAAABAAAAAQAAACENA0AgDf0MgQAchYEAHIWBAByFgQAchf21ASENIAtBeGoiCw0ACwsCQCAIRQ0AA0AgDf0MkfRFJZH0RSWR9EUlkfRFJf21ASENIAhBf2oiCA0ACwsgDSANIA39DQgJCgsMDQ4PAAAAAAAAAAD9tQEiDSANIA39DQQFBgcAAAAAAAAAAAAAAAD9tQH9GwAhBiAJIApGDQEgCkEBciEICyADIAhrIQgDQCAGQZHpl6oCbCEGIAhBf2oiCA0ACwtBASEIQQEhBwJAIANBf2oiCUEESQ0AIAlBfHEiCkF8aiILQQJ2QQFqIgxBB3EhCAJAAkAgC0EcTw0A/QwBAAAAAQAAAAEAAAABAAAAIQ0MAQsgDEH4////B3EhC/0MAQAAAAEAAAABAAAAAQAAACENA0AgDf0MIYUpQyGFKUMhhSlDIYUpQ/21ASENIAtBeGoiCw0ACwsCQCAIRQ0AA0AgDf0MLfRRWC30UVgt9FFYLfRRWP21ASENIAhBf2oiCA0ACwsgDSANIA39DQgJCgsMDQ4PAAAAAAAAAAD9tQEiDSANIA39DQQFBgcAAAAAAAAAAAAAAAD9tQH9GwAhByAJIApGDQEgCkEBciEICyADIAhrIQgDQCAHQa3ox8IFbCEHIAhBf2oiCA0ACwtBACEOAkAgA0EBSA0AIANBA3EhCwJAAkAgA0F/akEDTw0AQQAhCUEAIQ4MAQsgA0F8cSEKQQAhCSAAIQhBACEOA0AgCEEMaigCACAIQQhqKAIAIAhBBGooAgAgCCgCACAOQZHpl6oCbGpBkemXqgJsakGR6ZeqAmxqQZHpl6oCbGohDiAIQRBqIQggCiAJQQRqIglHDQALCyALRQ0AIAAgCUECdGohCANAIAgoAgAgDkGR6ZeqAmxqIQ4gCEEEaiEIIAtBf2oiCw0ACwsgBCgCFCEPIAQoAgQhEEF+IQkgASERIAMhDEEAIQtBACESA0ACQCASRQ0AIA4gEkECdCAAakF8aigCACAGbGtBkemXqgJsIAxBAnQgAGpBfGooAgBqIQ4LAkAgDyAOIANzIghBEHYgCHNB65Svr3hsIghBDXYgCHNBtdzKlXxsIghBEHYgCHMiCiAQdiIIQQN2Qfz///8BcWooAgAgCHZBAXFFDQACQAJAIAkgEkF/akcNACALIAEgCUECdGooAgAgB2xrQa3ox8IFbCAMQQJ0IAFqQXxqKAIAaiELDAELQQAhCyADQQFIDQAgESEIIBIhCQNAIAgoAgAgC0Gt6MfCBWxqIQsgCEEEaiEIIAlBAWoiCSAMSA0ACwsCQCAEKAIQIhMgCiAEKAIAIhRxIghBAnRqKAIAIgxBAEgNACALIANqIglBEHYgCXNBreqs/wdsIglBD3YgCXNBi82yo3hsIglBEHYgCXMhFSAEKAIIIRYDQAJAIBYgCEECdCIJaigCACAKRw0AIAQoAgwgCWooAgAgFUcNACAMIAwgBSAMIAVIGyAFQQBIGyEFDAILIBMgCEEBaiAUcSIIQQJ0aigCACIMQX9KDQALCyASIQkgBQ0AQQAPCyARQQRqIREgEkEBaiISIANqIgwgAkwNAAsLIAUL";

// src/measure/kernels/duplicates-kernel.ts
var MAX_SCAN_UNITS = 1 << 20;
var ScanKernel = class {
  kernel;
  textAt = 0;
  textUnits = 0;
  evalTables = /* @__PURE__ */ new WeakMap();
  constructor(classes2, astralClass2) {
    this.kernel = instantiateKernel(WASM_BASE64, { astralClass: astralClass2 });
    this.kernel.setClasses(this.kernel.place(classes2));
  }
  /** Returns empty word buffers (one lane or two). */
  words(lanes) {
    return { capacity: 0, at1: 0, at2: lanes === 2 ? 0 : -1, lane1: new Int32Array(0), lane2: lanes === 2 ? new Int32Array(0) : null, buffer: null };
  }
  /**
   * Scans `text` (prepared, at most MAX_SCAN_UNITS long) into the word buffers and returns its word
   * count; exactLength(), exactHigh() and exactLow() then give its exact hash. The views in `into`
   * are made again here when the memory has grown (see views()).
   */
  scan(text, strip, into) {
    const n = text.length;
    if (n > this.textUnits) {
      this.textUnits = Math.max(n, this.textUnits * 2, 4096);
      this.textAt = this.kernel.allocate(this.textUnits * 2);
    }
    const needed = (n >> 1) + 1;
    if (needed > into.capacity) {
      into.capacity = Math.max(needed, into.capacity * 2, 1024);
      into.at1 = this.kernel.allocate(into.capacity * 4);
      if (into.at2 >= 0) into.at2 = this.kernel.allocate(into.capacity * 4);
      into.buffer = null;
    }
    this.views(into);
    this.kernel.writeUtf16(this.textAt, text);
    return this.kernel.scanPrepared(this.textAt, n, strip ? 1 : 0, into.at2 >= 0 ? 1 : 0, into.at1, into.at2 >= 0 ? into.at2 : 0);
  }
  /** Returns `into` with views of its buffers in the kernel's memory as it is now (made again when it has grown, which detaches views). */
  views(into) {
    const buffer = this.kernel.memory.buffer;
    if (into.buffer !== buffer) {
      into.buffer = buffer;
      into.lane1 = new Int32Array(buffer, into.at1, into.capacity);
      if (into.at2 >= 0) into.lane2 = new Int32Array(buffer, into.at2, into.capacity);
    }
    return into;
  }
  /** Whether a view is of this kernel's memory (word hashes a scan left there). */
  holds(view) {
    return view.buffer === this.kernel.memory.buffer;
  }
  /** Lays a MinHash sketcher's settings and tables out in the kernel's memory (fill rounds: at most 2^31 − 1). */
  sketcher(shingle, hashes, fillRounds, lengthSeed, probes) {
    const seedAt = this.kernel.place(lengthSeed);
    const probesAt = this.kernel.place(probes);
    const valuesAt = this.kernel.allocate(hashes * 4);
    const roundsAt = this.kernel.allocate(hashes * 4);
    const at = this.kernel.place(Int32Array.of(shingle, hashes, fillRounds, seedAt, probesAt, valuesAt, roundsAt));
    return { at, valuesAt, hashes };
  }
  /** Sketches the `count` word hashes at `wordsAt` in this memory (count ≥ 1, from a scan here) into `values`; returns the shingle count. */
  sketch(wordsAt, count3, sketcher, values) {
    const shingles = this.kernel.sketch(wordsAt, count3, sketcher.at);
    values.set(new Int32Array(this.kernel.memory.buffer, sketcher.valuesAt, sketcher.hashes));
    return shingles;
  }
  /** Returns where an evaluation index's table is in the kernel's memory, copying it there the first time (which may grow the memory and detach views). */
  placeEval(table3) {
    let at = this.evalTables.get(table3);
    if (at === void 0) {
      const k = this.kernel;
      const lane1 = k.place(table3.lane1);
      const lane2 = k.place(table3.lane2);
      const item = k.place(table3.item);
      const filter = k.place(table3.filter);
      at = k.place(Int32Array.of(table3.mask, table3.filterShift, lane1, lane2, item, filter));
      this.evalTables.set(table3, at);
    }
    return at;
  }
  /** The first item of the table placed at `table` holding an m-word window of the words at w1At, w2At (two lanes, in this memory), or `best` when lower (-1: none). */
  firstOverlap(w1At, w2At, words, m, table3, best) {
    return this.kernel.firstOverlap(w1At, w2At, words, m, table3, best);
  }
  /** The last scan's exact normal form: its length in code units and its 64-bit hash as two unsigned lanes. */
  exactLength() {
    return this.kernel.exactLength() >>> 0;
  }
  exactHigh() {
    return this.kernel.exactHigh() >>> 0;
  }
  exactLow() {
    return this.kernel.exactLow() >>> 0;
  }
};
var kernel;
function madeScanKernel() {
  return kernel;
}
function scanKernel(classes2, astralClass2) {
  return kernel ??= new ScanKernel(classes2(), astralClass2);
}

// src/measure/duplicates/minhash.ts
var mix32b2 = mix32b;
var ROLL_BASE = 625341585;
var FILL_ROUNDS = 8;
var PROBE_TABLE = 32;
var MAX_KERNEL_ROUNDS = 2147483647;
var MAX_HASHES = 65535;
var Sketcher = class {
  shingle;
  hashes;
  /** The last signature: one 32-bit value per bin, valid until the next call. */
  values;
  rounds;
  shingles;
  lengthSeed;
  fillRounds;
  /** This sketcher's tables in the duplicate kernel's memory, laid out on its first sketch there. */
  inKernel;
  /** `fillRounds` is for experiments (scripts/bench-duplicates.mjs): 1 is plain one-permutation hashing with densification, Infinity fills every bin by rounds. Signatures are comparable only at equal values. */
  constructor(shingle, hashes, fillRounds = FILL_ROUNDS) {
    if (!Number.isInteger(hashes) || hashes < 1 || hashes > MAX_HASHES) throw new RangeError(`hashes must be an integer from 1 to ${MAX_HASHES}, got ${hashes}`);
    if (!Number.isInteger(shingle) || shingle < 1) throw new RangeError(`shingle must be a positive integer, got ${shingle}`);
    if (!(fillRounds >= 1)) throw new RangeError(`fillRounds must be at least 1, got ${fillRounds}`);
    this.shingle = shingle;
    this.hashes = hashes;
    this.fillRounds = fillRounds;
    this.values = new Int32Array(hashes);
    this.rounds = new Int32Array(hashes);
    this.shingles = new Int32Array(1024);
    this.lengthSeed = new Int32Array(shingle + 1);
    for (let m = 0; m <= shingle; m++) this.lengthSeed[m] = mix32b2(1663821227 + m);
  }
  /**
   * Returns the number of shingles of a document given its word hashes (0 when it has no words,
   * and then `values` is untouched), leaving its signature in `values`. A document with fewer
   * words than one shingle gets one shingle made of all its words.
   */
  sketch(words, count3) {
    if (count3 === 0) return 0;
    const kernel5 = madeScanKernel();
    if (kernel5 !== void 0 && this.fillRounds <= MAX_KERNEL_ROUNDS && kernel5.holds(words)) {
      const at = words.byteOffset;
      this.inKernel ??= kernel5.sketcher(this.shingle, this.hashes, this.fillRounds, this.lengthSeed, this.probes());
      return kernel5.sketch(at, count3, this.inKernel, this.values);
    }
    const n = this.shingle;
    const m = count3 < n ? count3 : n;
    const shingleCount = count3 < n ? 1 : count3 - n + 1;
    if (this.shingles.length < shingleCount) this.shingles = new Int32Array(shingleCount * 2);
    const sh = this.shingles;
    let top = 1;
    for (let j = 1; j < m; j++) top = Math.imul(top, ROLL_BASE);
    let h = 0;
    for (let j = 0; j < m; j++) h = Math.imul(h, ROLL_BASE) + words[j] | 0;
    const seed = this.lengthSeed[m];
    sh[0] = mix(h ^ seed);
    for (let i = 1; i < shingleCount; i++) {
      h = Math.imul(h - Math.imul(words[i - 1], top) | 0, ROLL_BASE) + words[i + m - 1] | 0;
      sh[i] = mix(h ^ seed);
    }
    this.fill(sh, shingleCount);
    return shingleCount;
  }
  /** Returns `values` filled with the signature of a set given as `count` 32-bit hashes in `set` (duplicates allowed; count ≥ 1). */
  fill(set, count3) {
    const k = this.hashes;
    const val = this.values;
    const rnd = this.rounds;
    rnd.fill(-1);
    let empty = k;
    for (let i = 0; i < count3; i++) {
      const x = set[i];
      const b = Math.imul(x >>> 16, k) >>> 16;
      const r = rnd[b];
      if (r < 0) {
        rnd[b] = 0;
        val[b] = x;
        empty--;
      } else if (x < val[b]) {
        val[b] = x;
      }
    }
    const rounds = this.fillRounds;
    for (let t = 1; empty > 0 && t < rounds; t++) {
      const ts = Math.imul(t, 2654435761);
      for (let i = 0; i < count3; i++) {
        const x = mix(set[i] ^ ts);
        const b = Math.imul(x >>> 16, k) >>> 16;
        const r = rnd[b];
        if (r < 0) {
          rnd[b] = t;
          val[b] = x;
          empty--;
        } else if (r === t && x < val[b]) {
          val[b] = x;
        }
      }
    }
    if (empty > 0) this.densify();
    return val;
  }
  /**
   * Fills each still-empty bin with the value of the first filled bin along a probe sequence
   * that depends only on the bin (optimal densification, Shrivastava 2017): two sets copy from
   * the same bin exactly when it is the first one filled in both, so agreement stays ∝ Jaccard.
   */
  densify() {
    const k = this.hashes;
    const val = this.values;
    const rnd = this.rounds;
    const probes = this.probes();
    for (let i = 0; i < k; i++) {
      if (rnd[i] >= 0) continue;
      let from = -1;
      for (let a = 0; a < PROBE_TABLE; a++) {
        const j = probes[i * PROBE_TABLE + a];
        if (rnd[j] >= 0) {
          from = j;
          break;
        }
      }
      for (let a = PROBE_TABLE; from < 0; a++) {
        const j = probeBin(i, a, k);
        if (rnd[j] >= 0) from = j;
      }
      val[i] = val[from];
    }
  }
  probeTable;
  /** Returns the first PROBE_TABLE probes of every bin, computed once per sketcher. */
  probes() {
    if (this.probeTable) return this.probeTable;
    const k = this.hashes;
    const t = new Int32Array(k * PROBE_TABLE);
    for (let i = 0; i < k; i++) for (let a = 0; a < PROBE_TABLE; a++) t[i * PROBE_TABLE + a] = probeBin(i, a, k);
    this.probeTable = t;
    return t;
  }
};
function probeBin(bin, attempt, k) {
  const x = mix(Math.imul(bin + 1, 2654435761) ^ Math.imul(attempt + 1, 2246822519) ^ 668265263);
  return Math.imul(x >>> 16, k) >>> 16;
}
function mix(h) {
  h ^= h >>> 16;
  h = Math.imul(h, 2246822507);
  h ^= h >>> 13;
  h = Math.imul(h, 3266489909);
  return h ^ h >>> 16;
}

// src/measure/duplicates/scan.ts
var mix322 = mix32;
var mix32b3 = mix32b;
var finishExact2 = finishExact;
var EXACT_BASIS_12 = EXACT_BASIS_1;
var EXACT_BASIS_22 = EXACT_BASIS_2;
var EXACT_PRIME_12 = EXACT_PRIME_1;
var EXACT_PRIME_22 = EXACT_PRIME_2;
var WORD_CHAR = /^[\p{L}\p{M}\p{N}]$/u;
var PUNCT_CHAR = new RegExp("^\\p{P}$", "u");
var SPACE_CHAR = /^\s$/u;
var CLASS_RUNS = [
  [/[\p{L}\p{M}\p{N}]+/gu, 1],
  [/\s+/gu, 3],
  [new RegExp("\\p{P}+", "gu"), 4]
];
var OTHER = 0;
var WORD = 1;
var HIGH_SURROGATE = 2;
var SPACE = 3;
var PUNCT = 4;
var table;
function classTable() {
  if (table) return table;
  const t = new Uint8Array(65536);
  const units = new Uint16Array(65536);
  for (let c = 0; c < 65536; c++) units[c] = c >= 55296 && c < 57344 ? 0 : c;
  let all = "";
  for (let c = 0; c < 65536; c += 4096) all += String.fromCharCode(...units.subarray(c, c + 4096));
  for (const [re, cls] of CLASS_RUNS) {
    for (const m of all.matchAll(re)) {
      for (let i = m.index, end = m.index + m[0].length; i < end; i++) t[i] = cls;
    }
  }
  for (let c = 55296; c < 56320; c++) t[c] = HIGH_SURROGATE;
  for (let c = 56320; c < 57344; c++) t[c] = OTHER;
  table = t;
  return t;
}
function astralClass(text, i) {
  return classOfAstral(text.slice(i, i + 2));
}
function astralClassOf(codePoint) {
  return classOfAstral(String.fromCodePoint(codePoint));
}
function classOfAstral(cp) {
  if (WORD_CHAR.test(cp)) return WORD;
  if (PUNCT_CHAR.test(cp)) return PUNCT;
  if (SPACE_CHAR.test(cp)) return SPACE;
  return OTHER;
}
function prepareText(text) {
  if (text === lastRaw) return lastPrepared;
  const prepared = text.normalize("NFC").toLowerCase();
  lastRaw = text;
  lastPrepared = prepared;
  return prepared;
}
var lastRaw = null;
var lastPrepared = "";
function wordBuffer(lanes, capacity = 1024) {
  return { lane1: new Int32Array(capacity), lane2: lanes === 2 ? new Int32Array(capacity) : null };
}
function grow(buf) {
  const l1 = new Int32Array(buf.lane1.length * 2);
  l1.set(buf.lane1);
  buf.lane1 = l1;
  if (buf.lane2) {
    const l2 = new Int32Array(buf.lane2.length * 2);
    l2.set(buf.lane2);
    buf.lane2 = l2;
  }
}
function hashWords(prepared, buf) {
  const t = classTable();
  const two = buf.lane2 !== null;
  const n = prepared.length;
  let count3 = 0;
  let inWord = false;
  let h1 = 0;
  let h2 = 0;
  let len = 0;
  for (let i = 0; i < n; i++) {
    const c = prepared.charCodeAt(i);
    let cls = t[c];
    let c2 = -1;
    if (cls === HIGH_SURROGATE) {
      const lo = i + 1 < n ? prepared.charCodeAt(i + 1) : 0;
      if (lo >= 56320 && lo < 57344) {
        cls = astralClass(prepared, i);
        c2 = lo;
        i++;
      } else {
        cls = OTHER;
      }
    }
    if (cls === WORD) {
      if (!inWord) {
        inWord = true;
        h1 = 2166136261;
        h2 = 84696351;
        len = 0;
      }
      h1 = Math.imul(h1 ^ c, 16777619);
      if (two) h2 = Math.imul(h2 ^ c, 739982445);
      len++;
      if (c2 >= 0) {
        h1 = Math.imul(h1 ^ c2, 16777619);
        if (two) h2 = Math.imul(h2 ^ c2, 739982445);
        len++;
        continue;
      }
      const from = i;
      while (i + 1 < n) {
        const d = prepared.charCodeAt(i + 1);
        if (t[d] !== WORD) break;
        h1 = Math.imul(h1 ^ d, 16777619);
        if (two) h2 = Math.imul(h2 ^ d, 739982445);
        i++;
      }
      len += i - from;
    } else if (inWord) {
      inWord = false;
      if (count3 === buf.lane1.length) grow(buf);
      buf.lane1[count3] = mix322(h1 ^ len);
      if (two) buf.lane2[count3] = mix32b3(h2 + len);
      count3++;
    }
  }
  if (inWord) {
    if (count3 === buf.lane1.length) grow(buf);
    buf.lane1[count3] = mix322(h1 ^ len);
    if (two) buf.lane2[count3] = mix32b3(h2 + len);
    count3++;
  }
  return count3;
}
var shared = {
  prepared: null,
  owner: null
};
function sharedWords(prepared) {
  const owner = shared.owner;
  if (shared.prepared !== prepared || owner === null) return null;
  return { lane1: owner.words, lane2: owner.words2, count: owner.wordCount };
}
function duplicateKernel() {
  return scanKernel(classTable, astralClassOf);
}
var DocumentScanner = class {
  /** Code units of the exact normal form (0: empty document). */
  exactLength = 0;
  /** The 64-bit exact hash as two unsigned 32-bit lanes. */
  exactHigh = 0;
  exactLow = 0;
  /** Words found; their hashes are words[0 .. wordCount), valid until the next scan (see the words getter). */
  wordCount = 0;
  /** The buffers of a scan in TypeScript. */
  ownWords = new Int32Array(1024);
  ownWords2;
  /** The buffers of a scan in the kernel (kernels/duplicates.c), made on the first scan; null when this scanner does not use it. */
  kernelWords;
  /** Whether the last scan ran in the kernel (its words are in the kernel's memory). */
  inKernel = false;
  lanes;
  /**
   * `lanes` 2 also hashes each word in contamination's second lane and leaves both lanes for
   * sharedWords: one pass then serves the duplicate index and the contamination check.
   * `kernel` false scans in TypeScript only (the tests compare the two).
   */
  constructor(lanes = 1, kernel5 = true) {
    this.ownWords2 = lanes === 2 ? new Int32Array(1024) : null;
    this.lanes = lanes;
    if (!kernel5) this.kernelWords = null;
  }
  /** The word hashes of the last scan. A view of the kernel's memory is made again when that memory has grown since (which detaches views), so it is always readable. */
  get words() {
    return this.inKernel ? duplicateKernel().views(this.kernelWords).lane1 : this.ownWords;
  }
  /** Second-lane word hashes (as hashWords' lane2), filled only by a two-lane scanner. */
  get words2() {
    return this.inKernel ? duplicateKernel().views(this.kernelWords).lane2 : this.ownWords2;
  }
  /**
   * Scans `prepared` (see prepareText) once, computing both the exact hash of its normal form
   * (see normalizeForExact; punctuation deleted when `strip`) and one hash per word: in the
   * kernel, or here for a text longer than it takes.
   */
  scan(prepared, strip) {
    if (shared.owner === this) shared.prepared = null;
    if (this.kernelWords === null || prepared.length > MAX_SCAN_UNITS) {
      this.scanHere(prepared, strip);
      this.inKernel = false;
    } else {
      const kernel5 = duplicateKernel();
      const into = this.kernelWords ??= kernel5.words(this.lanes);
      this.wordCount = kernel5.scan(prepared, strip, into);
      this.inKernel = true;
      this.exactLength = kernel5.exactLength();
      this.exactHigh = kernel5.exactHigh();
      this.exactLow = kernel5.exactLow();
    }
    if (this.lanes === 2) {
      shared.prepared = prepared;
      shared.owner = this;
    }
  }
  /** The scan in TypeScript: one fused pass, as duplicates.c makes it; classifying each code unit once is most of the cost. */
  scanHere(prepared, strip) {
    const t = classTable();
    let words = this.ownWords;
    let words2 = this.ownWords2;
    const two = words2 !== null;
    let count3 = 0;
    let inWord = false;
    let wh = 0;
    let wh2 = 0;
    let wlen = 0;
    let h1 = EXACT_BASIS_12;
    let h2 = EXACT_BASIS_22;
    let emitted = 0;
    let space = false;
    const n = prepared.length;
    for (let i = 0; i < n; i++) {
      const c = prepared.charCodeAt(i);
      let cls = t[c];
      let lo = -1;
      if (cls === HIGH_SURROGATE) {
        const next = i + 1 < n ? prepared.charCodeAt(i + 1) : 0;
        if (next >= 56320 && next < 57344) {
          cls = astralClass(prepared, i);
          lo = next;
          i++;
        } else {
          cls = OTHER;
        }
      }
      if (cls === WORD) {
        if (!inWord) {
          inWord = true;
          wh = 2166136261 | 0;
          wh2 = 84696351;
          wlen = 0;
        }
        if (space) {
          if (emitted > 0) {
            h1 = Math.imul(h1 ^ 32, EXACT_PRIME_12);
            h2 = Math.imul(h2 ^ 32, EXACT_PRIME_22);
            emitted++;
          }
          space = false;
        }
        wh = Math.imul(wh ^ c, 16777619);
        if (two) wh2 = Math.imul(wh2 ^ c, 739982445);
        h1 = Math.imul(h1 ^ c, EXACT_PRIME_12);
        h2 = Math.imul(h2 ^ c, EXACT_PRIME_22);
        if (lo >= 0) {
          wh = Math.imul(wh ^ lo, 16777619);
          if (two) wh2 = Math.imul(wh2 ^ lo, 739982445);
          h1 = Math.imul(h1 ^ lo, EXACT_PRIME_12);
          h2 = Math.imul(h2 ^ lo, EXACT_PRIME_22);
          wlen += 2;
          emitted += 2;
          continue;
        }
        const from = i;
        while (i + 1 < n) {
          const d = prepared.charCodeAt(i + 1);
          if (t[d] !== WORD) break;
          wh = Math.imul(wh ^ d, 16777619);
          if (two) wh2 = Math.imul(wh2 ^ d, 739982445);
          h1 = Math.imul(h1 ^ d, EXACT_PRIME_12);
          h2 = Math.imul(h2 ^ d, EXACT_PRIME_22);
          i++;
        }
        wlen += i - from + 1;
        emitted += i - from + 1;
        continue;
      } else {
        if (inWord) {
          inWord = false;
          if (count3 === words.length) {
            words = doubled(words);
            if (two) words2 = doubled(words2);
          }
          if (two) words2[count3] = mix32b3(wh2 + wlen);
          words[count3++] = mix322(wh ^ wlen);
        }
        if (cls === SPACE) {
          space = true;
          continue;
        }
        if (strip && cls === PUNCT) continue;
      }
      if (space) {
        if (emitted > 0) {
          h1 = Math.imul(h1 ^ 32, EXACT_PRIME_12);
          h2 = Math.imul(h2 ^ 32, EXACT_PRIME_22);
          emitted++;
        }
        space = false;
      }
      h1 = Math.imul(h1 ^ c, EXACT_PRIME_12);
      h2 = Math.imul(h2 ^ c, EXACT_PRIME_22);
      emitted++;
      if (lo >= 0) {
        h1 = Math.imul(h1 ^ lo, EXACT_PRIME_12);
        h2 = Math.imul(h2 ^ lo, EXACT_PRIME_22);
        emitted++;
      }
    }
    if (inWord) {
      if (count3 === words.length) {
        words = doubled(words);
        if (two) words2 = doubled(words2);
      }
      if (two) words2[count3] = mix32b3(wh2 + wlen);
      words[count3++] = mix322(wh ^ wlen);
    }
    finishExact2(h1, h2, emitted, this);
    this.ownWords = words;
    this.ownWords2 = words2;
    this.wordCount = count3;
    this.exactLength = emitted;
  }
};
function doubled(a) {
  const w = new Int32Array(a.length * 2);
  w.set(a);
  return w;
}
var oneOff = new DocumentScanner();

// src/measure/duplicates/lsh.ts
var MISS_WEIGHT = 0.9;
var STEPS = 200;
var BAND_KEY_BITS = 32;
var WIDTHS = [4, 8, 16, 32];
function signatureBits(rows) {
  for (const w of WIDTHS) if (w * rows >= BAND_KEY_BITS) return w;
  return 32;
}
function rowAgreement(s, bits) {
  if (bits >= 32) return s;
  const c = Math.pow(2, -bits);
  return s + (1 - s) * c;
}
function lshBands(threshold, hashes) {
  if (!(threshold > 0 && threshold <= 1)) throw new RangeError(`threshold must be in (0, 1], got ${threshold}`);
  if (!Number.isInteger(hashes) || hashes < 1) throw new RangeError(`hashes must be a positive integer, got ${hashes}`);
  const key = `${threshold}/${hashes}`;
  const known = chosen.get(key);
  if (known) return { ...known };
  let best = { bands: 1, rows: hashes };
  let bestCost = Infinity;
  const h = 1 / STEPS;
  const q = new Float64Array(STEPS);
  const miss = new Float64Array(STEPS);
  for (let rows = 1; rows <= hashes; rows++) {
    const bits = signatureBits(rows);
    for (let i = 0; i < STEPS; i++) {
      q[i] = Math.pow(rowAgreement((i + 0.5) * h, bits), rows);
      miss[i] = 1;
    }
    for (let bands = 1; bands * rows <= hashes; bands++) {
      let falseArea = 0;
      let missArea = 0;
      for (let i = 0; i < STEPS; i++) {
        const m = miss[i] * (1 - q[i]);
        miss[i] = m;
        if ((i + 0.5) * h < threshold) falseArea += (1 - m) * h;
        else missArea += m * h;
      }
      const cost = (1 - MISS_WEIGHT) * falseArea + MISS_WEIGHT * missArea;
      if (cost < bestCost - 1e-12) {
        bestCost = cost;
        best = { bands, rows };
      }
    }
  }
  chosen.set(key, best);
  return { ...best };
}
var chosen = /* @__PURE__ */ new Map();
function jaccardFromAgreement(agreeing, hashes, bits) {
  const p = agreeing / hashes;
  if (bits >= 32) return p;
  const c = Math.pow(2, -bits);
  const j = (p - c) / (1 - c);
  return j < 0 ? 0 : j > 1 ? 1 : j;
}

// src/measure/duplicates/format.ts
var MAGIC = [83, 76, 68, 88];
var FORMAT_VERSION = 1;
var HEADER_BYTES = 32;
var EXACT_BYTES = 8;
var KIND_EMPTY = 0;
var KIND_WORDLESS = 1;
var KIND_FULL = 2;
function readLocationRecords(bytes3, start, end, documents, visit, fail) {
  let at = start;
  let line = 0;
  const varint = () => {
    let v = 0;
    let scale = 1;
    for (let shift = 0; shift < 49; shift += 7) {
      if (at >= end) fail("location stream ends inside a record");
      const byte = bytes3[at++];
      v += (byte & 127) * scale;
      if (byte < 128) return v;
      scale *= 128;
    }
    return fail("over-long number in the location stream");
  };
  for (let i = 0; i < documents; i++) {
    const z = varint();
    line += z % 2 === 0 ? z / 2 : -(z + 1) / 2;
    visit(i, line, varint());
  }
  if (at !== end) fail(`${end - at} bytes left after the last location record`);
}
function signatureBytes(hashes, bits) {
  return Math.ceil(hashes * bits / 8);
}
function bitsFor(opts) {
  return signatureBits(lshBands(opts.threshold, opts.hashes).rows);
}
function checksum32(bytes3, start, end) {
  let h = 789265437 ^ end - start;
  let i = start;
  for (; i + 3 < end; i += 4) {
    let k2 = bytes3[i] | bytes3[i + 1] << 8 | bytes3[i + 2] << 16 | bytes3[i + 3] << 24;
    k2 = Math.imul(k2, 3432918353);
    k2 = k2 << 15 | k2 >>> 17;
    h ^= Math.imul(k2, 461845907);
    h = h << 13 | h >>> 19;
    h = Math.imul(h, 5) + 3864292196 | 0;
  }
  let k = 0;
  for (let s = 0; i < end; i++, s += 8) k |= bytes3[i] << s;
  h ^= Math.imul(k, 3432918353);
  return fmix32(h);
}
var verified = /* @__PURE__ */ new WeakSet();
function parseIndex(blob, verifyChecksum = true) {
  if (!(blob instanceof Uint8Array)) return { ok: false, reason: "not a byte array" };
  if (blob.length < HEADER_BYTES) return { ok: false, reason: `truncated: ${blob.length} bytes, shorter than the ${HEADER_BYTES}-byte header` };
  for (let i = 0; i < 4; i++) {
    if (blob[i] !== MAGIC[i]) return { ok: false, reason: "not a duplicate index (bad magic bytes)" };
  }
  const view = new DataView(blob.buffer, blob.byteOffset, blob.byteLength);
  const version = view.getUint8(4);
  if (version !== FORMAT_VERSION) return { ok: false, reason: `format version ${version}, this build reads version ${FORMAT_VERSION}` };
  const punct = view.getUint8(5);
  const shingle = view.getUint8(6);
  const bits = view.getUint8(7);
  const hashes = view.getUint16(8, true);
  const threshold = view.getFloat32(12, true);
  const documents = view.getUint32(16, true);
  const streamBytes = view.getUint32(20, true);
  const checksum = view.getUint32(24, true);
  if (punct > 1 || shingle < 1 || hashes < 1 || ![4, 8, 16, 32].includes(bits)) {
    return { ok: false, reason: "corrupt header (parameters out of range)" };
  }
  const sigBytes = signatureBytes(hashes, bits);
  const exactOffset = HEADER_BYTES;
  const signatureOffset = exactOffset + documents * EXACT_BYTES;
  const streamOffset = signatureOffset + documents * sigBytes;
  const expected = streamOffset + streamBytes;
  if (blob.length !== expected) {
    return {
      ok: false,
      reason: blob.length < expected ? `truncated: ${blob.length} bytes, the header announces ${expected} for ${documents} documents` : `${blob.length - expected} unexpected bytes after the ${expected} the header announces`
    };
  }
  if (verifyChecksum && !verified.has(blob)) {
    if (checksum32(blob, HEADER_BYTES, blob.length) !== checksum) return { ok: false, reason: "corrupt: checksum mismatch" };
    verified.add(blob);
  }
  return {
    ok: true,
    layout: {
      formatVersion: version,
      shingle,
      hashes,
      signatureBits: bits,
      punctuation: punct === 1 ? "strip" : "keep",
      threshold,
      documents,
      bytes: blob.length,
      exactOffset,
      signatureOffset,
      signatureBytes: sigBytes,
      streamOffset,
      streamBytes
    }
  };
}
function incompatibility(header, opts) {
  if (header.shingle !== opts.shingle) return `built with ${header.shingle}-word shingles, joined with ${opts.shingle}`;
  if (header.hashes !== opts.hashes) return `built with ${header.hashes} hashes, joined with ${opts.hashes}`;
  if (header.punctuation !== opts.punctuation) return `built with punctuation '${header.punctuation}', joined with '${opts.punctuation}'`;
  const bits = bitsFor(opts);
  if (header.signatureBits !== bits) {
    return `built for threshold ${round(header.threshold)} (${header.signatureBits}-bit values), joined at threshold ${opts.threshold}, which needs ${bits}-bit values`;
  }
  return null;
}
function round(x) {
  return Math.round(x * 1e6) / 1e6;
}
function inspectIndex(blob) {
  const r = parseIndex(blob);
  if (!r.ok) return r;
  const { formatVersion, shingle, hashes, signatureBits: bits, punctuation: punctuation2, threshold, documents, bytes: bytes3 } = r.layout;
  return { ok: true, header: { formatVersion, shingle, hashes, signatureBits: bits, punctuation: punctuation2, threshold, documents, bytes: bytes3 } };
}

// src/measure/duplicates/builder.ts
var MAX_SHINGLE = 255;
var MAX_HASHES2 = 65535;
var MAX_LANGUAGE = (1 << 24) - 1;
function checkOptions(opts) {
  const { shingle, hashes, threshold, punctuation: punctuation2 } = opts;
  if (!Number.isInteger(shingle) || shingle < 1 || shingle > MAX_SHINGLE) {
    throw new RangeError(`duplicates: shingle must be an integer from 1 to ${MAX_SHINGLE} words, got ${shingle}`);
  }
  if (!Number.isInteger(hashes) || hashes < 1 || hashes > MAX_HASHES2) {
    throw new RangeError(`duplicates: hashes must be an integer from 1 to ${MAX_HASHES2}, got ${hashes}`);
  }
  if (typeof threshold !== "number" || !(threshold > 0 && threshold <= 1)) {
    throw new RangeError(`duplicates: threshold must be a number in (0, 1], got ${threshold}`);
  }
  if (punctuation2 !== "keep" && punctuation2 !== "strip") {
    throw new RangeError(`duplicates: punctuation must be 'keep' or 'strip', got ${String(punctuation2)}`);
  }
  return { shingle, hashes, threshold, punctuation: punctuation2 };
}
function duplicateOptionsFrom(rule) {
  return checkOptions({ shingle: rule.near.shingle, hashes: rule.near.hashes, threshold: rule.near.threshold, punctuation: rule.punctuation });
}
var MAX_PAGE_BYTES = 1 << 20;
var Pages = class {
  constructor(record, firstRecords) {
    this.record = record;
    this.data = new Uint8Array(record * firstRecords);
    this.nextPage = this.data.length * 2;
  }
  record;
  full = [];
  fullBytes = 0;
  nextPage;
  /** The page being written, and the write position in it. */
  data;
  at = 0;
  /** Makes room for `bytes` contiguous bytes at data[at]. */
  reserve(bytes3) {
    if (this.at + bytes3 <= this.data.length) return;
    if (this.at > 0) {
      this.full.push(this.data.subarray(0, this.at));
      this.fullBytes += this.at;
    }
    const size = Math.max(bytes3, this.record * Math.max(1, Math.floor(Math.min(this.nextPage, MAX_PAGE_BYTES) / this.record)));
    this.nextPage = Math.min(this.nextPage * 2, MAX_PAGE_BYTES);
    this.data = new Uint8Array(size);
    this.at = 0;
  }
  /** Bytes written in all. */
  get length() {
    return this.fullBytes + this.at;
  }
  /** Appends whole records, page by page. */
  append(src) {
    for (let from = 0; from < src.length; ) {
      let room = Math.floor((this.data.length - this.at) / this.record) * this.record;
      if (room === 0) {
        this.reserve(this.record);
        room = Math.floor((this.data.length - this.at) / this.record) * this.record;
      }
      const n = Math.min(room, src.length - from);
      this.data.set(src.subarray(from, from + n), this.at);
      this.at += n;
      from += n;
    }
  }
  varint(v) {
    this.reserve(10);
    const d = this.data;
    while (v >= 128) {
      d[this.at++] = v % 128 | 128;
      v = Math.floor(v / 128);
    }
    d[this.at++] = v;
  }
  /** Copies everything written into `dest` at `offset`. */
  copyTo(dest, offset) {
    let at = offset;
    for (const page of this.full) {
      dest.set(page, at);
      at += page.length;
    }
    dest.set(this.data.subarray(0, this.at), at);
  }
  /** Returns everything written as one array of its own. */
  toArray() {
    const out = new Uint8Array(this.length);
    this.copyTo(out, 0);
    return out;
  }
};
var DuplicateIndexBuilder = class {
  options;
  signatureBits;
  sigBytes;
  sketcher;
  scanner;
  exact;
  signatures;
  stream;
  documents = 0;
  lastOrdinal = -1;
  lastLine = 0;
  finished = false;
  /**
   * `share.words`: the caller checks each document for contamination right after adding it
   * (findContamination on the same text), so the scan also hashes the words in contamination's
   * second lane and leaves them for it (see sharedWords); the index is the same either way.
   */
  constructor(opts, share = {}) {
    this.options = checkOptions(opts);
    this.scanner = new DocumentScanner(share.words ? 2 : 1);
    this.signatureBits = bitsFor(this.options);
    this.sigBytes = signatureBytes(this.options.hashes, this.signatureBits);
    this.sketcher = new Sketcher(this.options.shingle, this.options.hashes);
    this.exact = new Pages(EXACT_BYTES, 64);
    this.signatures = new Pages(this.sigBytes, 64);
    this.stream = new Pages(1, 256);
  }
  /** Indexes one document; documents must come in increasing ordinal order. */
  add(doc) {
    if (this.finished) throw new Error("DuplicateIndexBuilder: add() after finish()");
    const { ordinal, line, language, text } = doc;
    if (!Number.isInteger(ordinal) || ordinal <= this.lastOrdinal) {
      throw new RangeError(`DuplicateIndexBuilder: ordinal ${ordinal} after ${this.lastOrdinal}; documents must be added in increasing ordinal order`);
    }
    if (!Number.isInteger(line) || line < 0) throw new RangeError(`DuplicateIndexBuilder: line must be a non-negative integer, got ${line} (ordinal ${ordinal})`);
    if (!Number.isInteger(language) || language < 0 || language > MAX_LANGUAGE) {
      throw new RangeError(`DuplicateIndexBuilder: language must be an integer from 0 to ${MAX_LANGUAGE}, got ${language} (ordinal ${ordinal})`);
    }
    if (typeof text !== "string") throw new TypeError(`DuplicateIndexBuilder: text must be a string (ordinal ${ordinal})`);
    this.lastOrdinal = ordinal;
    const prepared = prepareText(text);
    const exact = this.exact;
    exact.reserve(EXACT_BYTES);
    const sigs = this.signatures;
    sigs.reserve(this.sigBytes);
    const sc = this.scanner;
    sc.scan(prepared, this.options.punctuation === "strip");
    let kind = KIND_EMPTY;
    if (sc.exactLength > 0) {
      writeU32(exact.data, exact.at, sc.exactHigh);
      writeU32(exact.data, exact.at + 4, sc.exactLow);
      const count3 = sc.wordCount;
      if (count3 > 0) {
        this.sketcher.sketch(sc.words, count3);
        packSignature(this.sketcher.values, this.signatureBits, sigs.data, sigs.at);
        kind = KIND_FULL;
      } else {
        sigs.data.fill(0, sigs.at, sigs.at + this.sigBytes);
        kind = KIND_WORDLESS;
      }
    } else {
      exact.data.fill(0, exact.at, exact.at + EXACT_BYTES);
      sigs.data.fill(0, sigs.at, sigs.at + this.sigBytes);
    }
    exact.at += EXACT_BYTES;
    sigs.at += this.sigBytes;
    this.writeLocation(line, language * 4 + kind);
    this.documents++;
  }
  /**
   * Returns the documents added so far as a part for another builder's `addPart`; this builder
   * cannot be used afterwards. The part's arrays are its own (transferable to another thread).
   */
  takePart() {
    if (this.finished) throw new Error("DuplicateIndexBuilder: takePart() after finish()");
    this.finished = true;
    return {
      built: this.builtWith(),
      documents: this.documents,
      exact: this.exact.toArray(),
      signatures: this.signatures.toArray(),
      stream: this.stream.toArray()
    };
  }
  /** Appends a part taken from a builder with the same options, as if its documents had been added here one by one. */
  addPart(part) {
    if (this.finished) throw new Error("DuplicateIndexBuilder: addPart() after finish()");
    const { documents, exact, signatures, stream } = part;
    if (part.built !== this.builtWith()) throw new RangeError(`DuplicateIndexBuilder: a part built with other options (${part.built}) than this index (${this.builtWith()})`);
    if (exact.length !== documents * EXACT_BYTES || signatures.length !== documents * this.sigBytes) {
      throw new RangeError(`DuplicateIndexBuilder: a part of ${documents} documents has ${exact.length} exact and ${signatures.length} signature bytes`);
    }
    this.exact.append(exact);
    this.signatures.append(signatures);
    readLocationRecords(
      stream,
      0,
      stream.length,
      documents,
      (_i, line, tag) => this.writeLocation(line, tag),
      (reason) => {
        throw new RangeError(`DuplicateIndexBuilder: a part's ${reason}`);
      }
    );
    this.documents += documents;
    this.lastOrdinal += documents;
  }
  /** Writes a document's location record: its line as a zigzag delta from the previous one, then its tag (language · 4 + kind). */
  writeLocation(line, tag) {
    const delta = line - this.lastLine;
    this.lastLine = line;
    this.stream.varint(delta >= 0 ? delta * 2 : -delta * 2 - 1);
    this.stream.varint(tag);
  }
  builtWith() {
    const o = this.options;
    return `${o.punctuation}/${o.shingle}/${o.hashes}/${this.signatureBits}`;
  }
  /** Returns the number of documents added so far. */
  get size() {
    return this.documents;
  }
  /** Returns the index blob; the builder cannot be used afterwards. */
  finish() {
    if (this.finished) throw new Error("DuplicateIndexBuilder: finish() called twice");
    this.finished = true;
    const n = this.documents;
    const total = HEADER_BYTES + this.exact.length + this.signatures.length + this.stream.length;
    const blob = new Uint8Array(total);
    const view = new DataView(blob.buffer);
    for (let i = 0; i < 4; i++) blob[i] = MAGIC[i];
    view.setUint8(4, FORMAT_VERSION);
    view.setUint8(5, this.options.punctuation === "strip" ? 1 : 0);
    view.setUint8(6, this.options.shingle);
    view.setUint8(7, this.signatureBits);
    view.setUint16(8, this.options.hashes, true);
    view.setFloat32(12, this.options.threshold, true);
    view.setUint32(16, n, true);
    view.setUint32(20, this.stream.length, true);
    let at = HEADER_BYTES;
    this.exact.copyTo(blob, at);
    at += this.exact.length;
    this.signatures.copyTo(blob, at);
    at += this.signatures.length;
    this.stream.copyTo(blob, at);
    view.setUint32(24, checksum32(blob, HEADER_BYTES, total), true);
    return blob;
  }
};
function writeU32(d, at, v) {
  d[at] = v & 255;
  d[at + 1] = v >>> 8 & 255;
  d[at + 2] = v >>> 16 & 255;
  d[at + 3] = v >>> 24;
}
function packSignature(values, bits, d, at) {
  const k = values.length;
  if (bits === 4) {
    let i = 0;
    for (; i + 1 < k; i += 2) d[at++] = values[i] & 15 | (values[i + 1] & 15) << 4;
    if (i < k) d[at] = values[i] & 15;
  } else if (bits === 8) {
    for (let i = 0; i < k; i++) d[at + i] = values[i] & 255;
  } else if (bits === 16) {
    for (let i = 0; i < k; i++) {
      const v = values[i];
      d[at + 2 * i] = v & 255;
      d[at + 2 * i + 1] = v >>> 8 & 255;
    }
  } else {
    for (let i = 0; i < k; i++) writeU32(d, at + 4 * i, values[i]);
  }
}

// src/measure/duplicates/join.ts
var DEFAULT_MAX_CLUSTERS = 20;
var DEFAULT_MAX_COPIES = 10;
var DEFAULT_MAX_BUCKET_COMPARISONS = 64;
var KIND_MASK = 3;
var IN_NEW_SHARD = 1 << 2;
var CLASS_HAS_NEW = 1 << 3;
var CLASS_HAS_EXISTING = 1 << 4;
var NEAR = 1 << 5;
var NEAR_EXISTING = 1 << 6;
var PARTICIPANT = 1 << 7;
var DuplicateIndexError = class extends Error {
  shard;
  reason;
  constructor(shard, reason) {
    super(`duplicate index of ${shard}: ${reason}`);
    this.name = "DuplicateIndexError";
    this.shard = shard;
    this.reason = reason;
  }
};
var NEAR_LINK_BASE = -2;
function linkRep(link, g) {
  const l = link[g];
  return l >= 0 ? l : l <= NEAR_LINK_BASE ? g : -1;
}
function linkNear(link, g) {
  const l = link[g];
  return l <= NEAR_LINK_BASE ? NEAR_LINK_BASE - l : -1;
}
var EQUAL_NIBBLES = new Uint8Array(256);
for (let x = 0; x < 256; x++) EQUAL_NIBBLES[x] = ((x & 15) === 0 ? 1 : 0) + (x >>> 4 === 0 ? 1 : 0);
function joinDuplicates(shards, opts) {
  const options = checkOptions(opts);
  const maxClusters = opts.maxClusters ?? DEFAULT_MAX_CLUSTERS;
  const maxCopies = opts.maxCopies ?? DEFAULT_MAX_COPIES;
  const cap = opts.maxBucketComparisons ?? DEFAULT_MAX_BUCKET_COMPARISONS;
  for (const [name, v] of [["maxClusters", maxClusters], ["maxCopies", maxCopies], ["maxBucketComparisons", cap]]) {
    if (!Number.isInteger(v) || v < 0) throw new RangeError(`joinDuplicates: ${name} must be a non-negative integer, got ${v}`);
  }
  const { bands, rows } = lshBands(options.threshold, options.hashes);
  const bits = signatureBits(rows);
  const k = options.hashes;
  const indexes = [];
  const seen = /* @__PURE__ */ new Set();
  let total = 0;
  let indexBytes = 0;
  for (const { shard, index: index2 } of shards) {
    if (seen.has(shard)) throw new DuplicateIndexError(shard, "shard listed twice");
    seen.add(shard);
    const parsed = parseIndex(index2);
    if (!parsed.ok) throw new DuplicateIndexError(shard, parsed.reason);
    const why = incompatibility(parsed.layout, options);
    if (why) throw new DuplicateIndexError(shard, why);
    indexes.push({ shard, blob: index2, layout: parsed.layout, start: total });
    total += parsed.layout.documents;
    indexBytes += index2.length;
  }
  const n = total;
  const starts2 = new Int32Array(indexes.length + 1);
  indexes.forEach((s, i) => starts2[i] = s.start);
  starts2[indexes.length] = n;
  const newNames = new Set(opts.newShards ?? []);
  const trackExisting = opts.newShards !== void 0;
  const isNew = indexes.map((s) => newNames.has(s.shard));
  const flags = new Uint8Array(n);
  indexes.forEach((s, si) => {
    const newBit = isNew[si] ? IN_NEW_SHARD : 0;
    readLocations(s, (i, _line, _language, kind) => {
      flags[s.start + i] = kind | newBit;
    });
  });
  const views = indexes.map((s) => new DataView(s.blob.buffer, s.blob.byteOffset, s.blob.byteLength));
  const hi = new Int32Array(n);
  indexes.forEach((s, si) => {
    const view = views[si];
    for (let i = 0, at = s.layout.exactOffset; i < s.layout.documents; i++, at += EXACT_BYTES) hi[s.start + i] = view.getInt32(at, true);
  });
  const loOf = (g) => {
    const si = shardOf(starts2, g);
    const s = indexes[si];
    return views[si].getInt32(s.layout.exactOffset + (g - s.start) * EXACT_BYTES + 4, true);
  };
  const order = new Int32Array(n);
  const scratch3 = new Int32Array(n);
  const counts = new Int32Array(65536);
  radixSort(hi, n, order, scratch3, counts);
  const link = new Int32Array(n).fill(-1);
  for (let p = 0; p < n; ) {
    let q = p + 1;
    const h = hi[order[p]];
    while (q < n && hi[order[q]] === h) q++;
    let members = order.subarray(p, q);
    let lows = null;
    if (q - p > 1) {
      const l = Array.from(members, loOf);
      if (l.some((v) => v !== l[0])) {
        const sorted2 = Array.from(members, (g, x) => [l[x], g]).sort((a, b) => a[0] - b[0] || a[1] - b[1]);
        members = sorted2.map((e) => e[1]);
        lows = sorted2.map((e) => e[0]);
      } else lows = l;
    }
    for (let x = 0; x < members.length; ) {
      let y = x + 1;
      if (lows) while (y < members.length && lows[y] === lows[x]) y++;
      let first = -1;
      for (let z = x; z < y; z++) {
        const g = members[z];
        if ((flags[g] & KIND_MASK) === KIND_EMPTY) continue;
        if (first < 0) first = g;
        link[g] = first;
        flags[first] = flags[first] | (flags[g] & IN_NEW_SHARD ? CLASS_HAS_NEW : CLASS_HAS_EXISTING);
      }
      x = y;
    }
    p = q;
  }
  const workingExact = flags.byteLength + hi.byteLength + order.byteLength + scratch3.byteLength + link.byteLength + counts.byteLength;
  const bufA = hi.buffer;
  const bufB = order.buffer;
  const bufC = scratch3.buffer;
  for (let g = 0; g < n; g++) if (link[g] === g && (flags[g] & KIND_MASK) === KIND_FULL) flags[g] = flags[g] | PARTICIPANT;
  const keys = hi;
  const sig = new SignatureReader(indexes, starts2, k, bits);
  let comparedPairs = 0;
  let verifiedPairs = 0;
  let cappedBuckets = 0;
  const threshold = options.threshold;
  for (let band = 0; band < bands; band++) {
    sig.bandKeys(flags, band * rows, rows, keys);
    radixSort(keys, n, order, scratch3, counts);
    for (let p = 0; p < n; ) {
      let q = p + 1;
      const key = keys[order[p]];
      while (q < n && keys[order[q]] === key) q++;
      if (key === 0 || q - p === 1) {
        p = q;
        continue;
      }
      if (q - p > cap + 1) cappedBuckets++;
      for (let x = p + 1; x < q; x++) {
        const i = order[x];
        const fi = flags[i];
        if (fi & NEAR && !(trackExisting && fi & (CLASS_HAS_EXISTING | CLASS_HAS_NEW))) continue;
        const stop2 = Math.max(p, x - cap);
        for (let y = x - 1; y >= stop2; y--) {
          const j = order[y];
          const f = flags[i];
          const fj = flags[j];
          const needNear = (f & NEAR) === 0;
          const wantI = trackExisting && wantsExisting(f) && (fj & CLASS_HAS_EXISTING) !== 0;
          const wantJ = trackExisting && wantsExisting(fj) && (f & CLASS_HAS_EXISTING) !== 0;
          if (!needNear && !wantI && !wantJ) {
            if (!trackExisting) break;
            continue;
          }
          comparedPairs++;
          if (sig.jaccard(i, j) < threshold) continue;
          verifiedPairs++;
          if (needNear) {
            flags[i] = flags[i] | NEAR;
            link[i] = NEAR_LINK_BASE - j;
          }
          if (wantI) flags[i] = flags[i] | NEAR_EXISTING;
          if (wantJ) flags[j] = flags[j] | NEAR_EXISTING;
        }
      }
      p = q;
    }
  }
  const workingBytes = Math.max(
    workingExact,
    flags.byteLength + link.byteLength + bufA.byteLength + bufB.byteLength + bufC.byteLength + counts.byteLength
  );
  const rootOf = new Int32Array(bufA, 0, n);
  const nearSize = new Int32Array(bufB, 0, n).fill(0);
  const exactSize = new Int32Array(bufC, 0, n).fill(0);
  for (let g = 0; g < n; g++) {
    const r = linkRep(link, g);
    if (r >= 0) exactSize[r] = exactSize[r] + 1;
    if (r === g && (flags[g] & KIND_MASK) === KIND_FULL) {
      const j = linkNear(link, g);
      rootOf[g] = j < 0 ? g : rootOf[j];
      nearSize[rootOf[g]] = nearSize[rootOf[g]] + 1;
    } else {
      rootOf[g] = -1;
    }
  }
  const tallyOf = () => ({ docs: 0, emptyDocs: 0, wordlessDocs: 0, exactDocs: 0, nearDocs: 0 });
  const totalTally = tallyOf();
  const perShard = [];
  const perLanguage2 = /* @__PURE__ */ new Map();
  const against = trackExisting ? {
    newShards: [...newNames],
    unknownShards: [...newNames].filter((s) => !seen.has(s)),
    docs: 0,
    exactDocs: 0,
    nearDocs: 0,
    perShard: []
  } : void 0;
  indexes.forEach((s, si) => {
    const st = tallyOf();
    const ag = { shard: s.shard, docs: 0, exactDocs: 0, nearDocs: 0 };
    readLocations(s, (i, _line, language, kind) => {
      const g = s.start + i;
      let lt = perLanguage2.get(language);
      if (!lt) perLanguage2.set(language, lt = tallyOf());
      const r = linkRep(link, g);
      const exact = r >= 0 && r !== g;
      const near = !exact && r === g && (flags[g] & NEAR) !== 0;
      count(st, kind, exact, near);
      count(lt, kind, exact, near);
      count(totalTally, kind, exact, near);
      if (against && isNew[si]) {
        ag.docs++;
        if (r >= 0) {
          const fr = flags[r];
          if (fr & CLASS_HAS_EXISTING) ag.exactDocs++;
          else if (fr & NEAR_EXISTING) ag.nearDocs++;
        }
      }
    });
    perShard.push({ shard: s.shard, ...st });
    if (against && isNew[si]) {
      against.perShard.push(ag);
      against.docs += ag.docs;
      against.exactDocs += ag.exactDocs;
      against.nearDocs += ag.nearDocs;
    }
  });
  let exactClusters = 0;
  let nearClusters = 0;
  const top = new TopClusters(maxClusters);
  for (let g = 0; g < n; g++) {
    if (exactSize[g] >= 2) {
      exactClusters++;
      top.offer(g, exactSize[g], "exact");
    }
    if (nearSize[g] >= 2) {
      nearClusters++;
      top.offer(g, nearSize[g], "near");
    }
  }
  const chosen2 = top.sorted();
  const exactSlot = /* @__PURE__ */ new Map();
  const nearSlot = /* @__PURE__ */ new Map();
  chosen2.forEach((c, idx) => (c.kind === "exact" ? exactSlot : nearSlot).set(c.first, idx));
  const copies = chosen2.map(() => []);
  for (let g = 0; g < n; g++) {
    const r = linkRep(link, g);
    if (r >= 0 && r !== g) {
      const slot = exactSlot.get(r);
      if (slot !== void 0 && copies[slot].length < maxCopies) copies[slot].push(g);
    }
    const t = rootOf[g];
    if (t >= 0 && t !== g) {
      const slot = nearSlot.get(t);
      if (slot !== void 0 && copies[slot].length < maxCopies) copies[slot].push(g);
    }
  }
  const wanted = /* @__PURE__ */ new Set();
  chosen2.forEach((c, idx) => {
    wanted.add(c.first);
    for (const g of copies[idx]) {
      wanted.add(g);
      if (c.kind === "near") wanted.add(linkNear(link, g));
    }
  });
  const where2 = locate(indexes, starts2, wanted);
  const clusters = chosen2.map((c, idx) => ({
    kind: c.kind,
    first: where2.get(c.first),
    size: c.size,
    copies: copies[idx].map((g) => {
      const at = where2.get(g);
      if (c.kind === "exact") return { ...at };
      const of = linkNear(link, g);
      return { ...at, jaccard: round4(sig.jaccard(g, of)), of: where2.get(of) };
    }),
    copiesOmitted: c.size - 1 - copies[idx].length
  }));
  return {
    options,
    total: totalTally,
    exactDocs: totalTally.exactDocs,
    nearDocs: totalTally.nearDocs,
    perShard,
    perLanguage: [...perLanguage2].sort((a, b) => a[0] - b[0]).map(([language, t]) => ({ language, ...t })),
    clusters,
    exactClusters,
    nearClusters,
    clustersOmitted: exactClusters + nearClusters - clusters.length,
    ...against ? { againstExisting: against } : {},
    statistics: {
      bands,
      rows,
      signatureBits: bits,
      comparedPairs,
      verifiedPairs,
      cappedBuckets,
      workingBytes,
      workingBytesPerDocument: n ? round4(workingBytes / n) : 0,
      indexBytes,
      indexBytesPerDocument: n ? round4(indexBytes / n) : 0
    }
  };
}
function count(t, kind, exact, near) {
  t.docs++;
  if (kind === KIND_EMPTY) t.emptyDocs++;
  if (kind === KIND_WORDLESS) t.wordlessDocs++;
  if (exact) t.exactDocs++;
  if (near) t.nearDocs++;
}
function wantsExisting(f) {
  return (f & (CLASS_HAS_NEW | CLASS_HAS_EXISTING | NEAR_EXISTING)) === CLASS_HAS_NEW;
}
function round4(x) {
  return Math.round(x * 1e4) / 1e4;
}
function readLocations(s, visit) {
  const start = s.layout.streamOffset;
  readLocationRecords(
    s.blob,
    start,
    start + s.layout.streamBytes,
    s.layout.documents,
    (i, line, tag) => {
      const kind = tag % 4;
      if (kind > KIND_FULL) throw new DuplicateIndexError(s.shard, `corrupt: unknown document kind ${kind}`);
      visit(i, line, Math.floor(tag / 4), kind);
    },
    (reason) => {
      throw new DuplicateIndexError(s.shard, `corrupt: ${reason}`);
    }
  );
}
function locate(indexes, starts2, wanted) {
  const out = /* @__PURE__ */ new Map();
  const byShard = /* @__PURE__ */ new Map();
  for (const g of wanted) {
    const si = shardOf(starts2, g);
    let set = byShard.get(si);
    if (!set) byShard.set(si, set = /* @__PURE__ */ new Set());
    set.add(g);
  }
  for (const [si, set] of byShard) {
    const s = indexes[si];
    readLocations(s, (i, line, language) => {
      const g = s.start + i;
      if (set.has(g)) out.set(g, { shard: s.shard, line, language });
    });
  }
  return out;
}
function shardOf(starts2, g) {
  let a = 0;
  let b = starts2.length - 2;
  while (a < b) {
    const mid = a + b + 1 >>> 1;
    if (starts2[mid] <= g) a = mid;
    else b = mid - 1;
  }
  while (a + 1 < starts2.length - 1 && starts2[a + 1] <= g) a++;
  return a;
}
function radixSort(keys, n, out, scratch3, counts) {
  counts.fill(0);
  for (let i = 0; i < n; i++) counts[keys[i] & 65535]++;
  let sum = 0;
  for (let d = 0; d < 65536; d++) {
    const c = counts[d];
    counts[d] = sum;
    sum += c;
  }
  for (let i = 0; i < n; i++) scratch3[counts[keys[i] & 65535]++] = i;
  counts.fill(0);
  for (let i = 0; i < n; i++) counts[keys[i] >>> 16]++;
  sum = 0;
  for (let d = 0; d < 65536; d++) {
    const c = counts[d];
    counts[d] = sum;
    sum += c;
  }
  for (let p = 0; p < n; p++) {
    const i = scratch3[p];
    out[counts[keys[i] >>> 16]++] = i;
  }
}
var SignatureReader = class {
  constructor(indexes, starts2, k, bits) {
    this.starts = starts2;
    this.k = k;
    this.bits = bits;
    this.blobs = indexes.map((s) => s.blob);
    this.offsets = indexes.map((s) => s.layout.signatureOffset);
    this.bytes = indexes[0]?.layout.signatureBytes ?? 0;
  }
  starts;
  k;
  bits;
  blobs;
  offsets;
  bytes;
  lastShard = 0;
  /** Returns [blob, byte offset] of global document g's signature. */
  find(g) {
    const st = this.starts;
    let s = this.lastShard;
    if (!(st[s] <= g && g < st[s + 1])) s = this.lastShard = shardOf(st, g);
    return s;
  }
  /** Returns the estimated Jaccard similarity of two documents from their stored values. */
  jaccard(a, b) {
    const sa = this.find(a);
    const oa = this.offsets[sa] + (a - this.starts[sa]) * this.bytes;
    const sb = this.find(b);
    const ob = this.offsets[sb] + (b - this.starts[sb]) * this.bytes;
    const same = agreement(this.blobs[sa], oa, this.blobs[sb], ob, this.bytes, this.k, this.bits);
    return jaccardFromAgreement(same, this.k, this.bits);
  }
  /** Writes into keys[g] the band key (values [first, first + rows)) of every document taking part in near detection, and 0 into the others'. */
  bandKeys(flags, first, rows, keys) {
    const bits = this.bits;
    const nb = this.bytes;
    for (let s = 0; s < this.blobs.length; s++) {
      const blob = this.blobs[s];
      const end = this.starts[s + 1];
      for (let g = this.starts[s], off = this.offsets[s]; g < end; g++, off += nb) {
        keys[g] = flags[g] & PARTICIPANT ? bandKey(blob, off, bits, first, rows) || 1 : 0;
      }
    }
  }
};
function agreement(a, oa, b, ob, bytes3, k, bits) {
  let same = 0;
  if (bits === 4) {
    for (let i = 0; i < bytes3; i++) same += EQUAL_NIBBLES[a[oa + i] ^ b[ob + i]];
    if (k % 2 === 1) same--;
  } else {
    const w = bits / 8;
    for (let i = 0; i < bytes3; i += w) {
      let eq = true;
      for (let j = 0; j < w; j++) if (a[oa + i + j] !== b[ob + i + j]) eq = false;
      if (eq) same++;
    }
  }
  return same;
}
function bandKey(blob, off, bits, first, rows) {
  let h = 1013904242 ^ first;
  for (let v = first; v < first + rows; v++) {
    let x;
    if (bits === 4) x = blob[off + (v >>> 1)] >>> ((v & 1) << 2) & 15;
    else if (bits === 8) x = blob[off + v];
    else if (bits === 16) x = blob[off + 2 * v] | blob[off + 2 * v + 1] << 8;
    else x = blob[off + 4 * v] | blob[off + 4 * v + 1] << 8 | blob[off + 4 * v + 2] << 16 | blob[off + 4 * v + 3] << 24;
    h = Math.imul(h ^ x, 16777619);
    h = h << 13 | h >>> 19;
  }
  h ^= h >>> 16;
  h = Math.imul(h, 2246822507);
  h ^= h >>> 13;
  h = Math.imul(h, 3266489909);
  return h ^ h >>> 16;
}
var TopClusters = class {
  constructor(limit) {
    this.limit = limit;
  }
  limit;
  items = [];
  offer(first, size, kind) {
    if (this.limit === 0) return;
    this.items.push({ first, size, kind });
    if (this.items.length >= 2 * this.limit && this.items.length >= 1024) this.cut();
  }
  sorted() {
    this.cut();
    return this.items;
  }
  cut() {
    this.items.sort((a, b) => b.size - a.size || a.first - b.first || (a.kind === b.kind ? 0 : a.kind === "exact" ? -1 : 1));
    if (this.items.length > this.limit) this.items.length = this.limit;
  }
};

// src/measure/duplicates/contamination.ts
import { createHash as createHash2 } from "node:crypto";
var mix323 = mix32;
var mix32b4 = mix32b;
var DEFAULT_NGRAM2 = 13;
var BASE_1 = 625341585;
var BASE_2 = 1481765933;
var LOAD = 0.5;
var FILTER_BITS_PER_GRAM = 16;
var MAX_FILTER_LOG = 24;
var INDEX_VERSION = 2;
function evalSetId(items, ngram = DEFAULT_NGRAM2) {
  const h = createHash2("sha256");
  h.update(`sluice eval index v${INDEX_VERSION} n=${ngram} items=${items.length}\0`);
  for (const item of items) h.update(`${item.file}\0${item.line}\0${item.text}\0`);
  return h.digest("hex").slice(0, 16);
}
function buildEvalIndex(items, ngram = DEFAULT_NGRAM2) {
  if (!Number.isInteger(ngram) || ngram < 1) throw new RangeError(`contamination: ngram must be a positive integer, got ${ngram}`);
  const buf = wordBuffer(2);
  const grams = [];
  const lengths = /* @__PURE__ */ new Set();
  let total = 0;
  let shortItems = 0;
  let emptyItems = 0;
  items.forEach((item2, idx) => {
    if (typeof item2?.text !== "string") throw new TypeError(`contamination: item ${idx} (${item2?.file}:${item2?.line}) has no text`);
    const words = hashWords(prepareText(item2.text), buf);
    if (words === 0) {
      emptyItems++;
      grams.push({ l1: new Int32Array(0), l2: new Int32Array(0), count: 0 });
      return;
    }
    const m = Math.min(ngram, words);
    if (words < ngram) shortItems++;
    lengths.add(m);
    const count3 = words - m + 1;
    const l1 = new Int32Array(count3);
    const l2 = new Int32Array(count3);
    rollGrams(buf.lane1, buf.lane2, words, m, l1, l2);
    grams.push({ l1, l2, count: count3 });
    total += count3;
  });
  let size = 16;
  while (size * LOAD < total) size *= 2;
  const lane1 = new Int32Array(size);
  const lane2 = new Int32Array(size);
  const item = new Int32Array(size).fill(-1);
  const mask = size - 1;
  let filterLog = 5;
  while (filterLog < MAX_FILTER_LOG && 2 ** filterLog < total * FILTER_BITS_PER_GRAM) filterLog++;
  const filter = new Int32Array(2 ** (filterLog - 5));
  const filterShift = 32 - filterLog;
  let distinct = 0;
  grams.forEach((g, idx) => {
    for (let i = 0; i < g.count; i++) {
      const a = g.l1[i];
      const b = g.l2[i];
      const bit = a >>> filterShift;
      filter[bit >>> 5] |= 1 << (bit & 31);
      let slot = a & mask;
      while (item[slot] >= 0 && !(lane1[slot] === a && lane2[slot] === b)) slot = slot + 1 & mask;
      if (item[slot] < 0) {
        lane1[slot] = a;
        lane2[slot] = b;
        item[slot] = idx;
        distinct++;
      }
    }
  });
  return {
    id: evalSetId(items, ngram),
    ngram,
    items: items.length,
    grams: distinct,
    shortItems,
    emptyItems,
    lengths: [...lengths].sort((a, b) => b - a),
    table: { lane1, lane2, item, mask, filter, filterShift },
    sources: items.map((it) => ({ file: it.file, line: it.line }))
  };
}
function topPower(base, m) {
  let top = 1;
  for (let j = 1; j < m; j++) top = Math.imul(top, base);
  return top;
}
function windowHash(words, from, m, base) {
  let h = 0;
  for (let j = from; j < from + m; j++) h = Math.imul(h, base) + words[j] | 0;
  return h;
}
function slide(h, out, next, top, base) {
  return Math.imul(h - Math.imul(out, top) | 0, base) + next | 0;
}
function rollGrams(w1, w2, count3, m, l1, l2) {
  const top1 = topPower(BASE_1, m);
  const top2 = topPower(BASE_2, m);
  let h1 = windowHash(w1, 0, m, BASE_1);
  let h2 = windowHash(w2, 0, m, BASE_2);
  l1[0] = mix323(h1 ^ m);
  l2[0] = mix32b4(h2 + m);
  for (let i = 1; i + m <= count3; i++) {
    h1 = slide(h1, w1[i - 1], w1[i + m - 1], top1, BASE_1);
    h2 = slide(h2, w2[i - 1], w2[i + m - 1], top2, BASE_2);
    l1[i] = mix323(h1 ^ m);
    l2[i] = mix32b4(h2 + m);
  }
}
var scratch = { buf: wordBuffer(2), scanner: null };
function findContamination(index2, text, kernel5 = true) {
  const prepared = prepareText(text);
  let done = sharedWords(prepared);
  if (done === null && kernel5 && prepared.length <= MAX_SCAN_UNITS) {
    (scratch.scanner ??= new DocumentScanner(2)).scan(prepared, false);
    done = sharedWords(prepared);
  }
  const made = kernel5 ? madeScanKernel() : void 0;
  if (done !== null && made !== void 0 && made.holds(done.lane1)) {
    const w1At = done.lane1.byteOffset;
    const w2At = done.lane2.byteOffset;
    const table3 = made.placeEval(index2.table);
    let found = -1;
    for (const m of index2.lengths) {
      found = made.firstOverlap(w1At, w2At, done.count, m, table3, found);
      if (found === 0) break;
    }
    return found < 0 ? null : { ...index2.sources[found] };
  }
  let w1;
  let w2;
  let words;
  if (done !== null) {
    w1 = done.lane1;
    w2 = done.lane2;
    words = done.count;
  } else {
    const buf = scratch.buf;
    words = hashWords(prepared, buf);
    w1 = buf.lane1;
    w2 = buf.lane2;
  }
  const { lane1, lane2, item, mask, filter, filterShift } = index2.table;
  let best = -1;
  for (const m of index2.lengths) {
    if (words < m) continue;
    const top1 = topPower(BASE_1, m);
    const top2 = topPower(BASE_2, m);
    let h1 = windowHash(w1, 0, m, BASE_1);
    let h2 = 0;
    let h2at = -2;
    for (let i = 0; i + m <= words; i++) {
      if (i > 0) h1 = slide(h1, w1[i - 1], w1[i + m - 1], top1, BASE_1);
      const a = mix323(h1 ^ m);
      const bit = a >>> filterShift;
      if ((filter[bit >>> 5] & 1 << (bit & 31)) === 0) continue;
      h2 = h2at === i - 1 ? slide(h2, w2[i - 1], w2[i + m - 1], top2, BASE_2) : windowHash(w2, i, m, BASE_2);
      h2at = i;
      const b = mix32b4(h2 + m);
      let slot = a & mask;
      for (; ; ) {
        const it = item[slot];
        if (it < 0) break;
        if (lane1[slot] === a && lane2[slot] === b) {
          if (best < 0 || it < best) best = it;
          break;
        }
        slot = slot + 1 & mask;
      }
      if (best === 0) break;
    }
    if (best === 0) break;
  }
  return best < 0 ? null : { ...index2.sources[best] };
}

// src/results/serialize.ts
function storedShardResult(r) {
  const { duplicateIndex, ...rest } = r;
  return duplicateIndex ? { ...rest, duplicateIndex: Buffer.from(duplicateIndex).toString("base64") } : rest;
}
function shardResultFromStored(value) {
  const v = value;
  if (!v || typeof v !== "object" || v.schema !== RESULT_SCHEMA) return void 0;
  const { duplicateIndex, ...rest } = v;
  return duplicateIndex ? { ...rest, duplicateIndex: new Uint8Array(Buffer.from(duplicateIndex, "base64")) } : rest;
}

// src/results/cache.ts
function settingsIdOf(settings) {
  return createHash3("sha256").update(canonicalJson(settings)).digest("hex").slice(0, 16);
}
function canonicalJson(value) {
  return JSON.stringify(value, (_key, v) => {
    if (v && typeof v === "object" && !Array.isArray(v)) {
      return Object.fromEntries(Object.entries(v).sort(([a], [b]) => a < b ? -1 : a > b ? 1 : 0));
    }
    return v;
  });
}
var ResultCache = class {
  constructor(dir) {
    this.dir = dir;
  }
  dir;
  hits = 0;
  misses = 0;
  file(contentId, settingsId) {
    return join(this.dir, `${settingsId}-${contentId}.json`);
  }
  /** Returns the cached result for this content under these settings, or undefined. */
  async get(contentId, settingsId, at) {
    try {
      const r = shardResultFromStored(JSON.parse(await readFile2(this.file(contentId, settingsId), "utf8")));
      if (!r || r.contentId !== contentId || r.settingsId !== settingsId || r.encoding !== at.encoding || r.format !== at.format) {
        this.misses += 1;
        return void 0;
      }
      this.hits += 1;
      if (r.duplicateIndex && !inspectIndex(r.duplicateIndex).ok) {
        this.misses += 1;
        return void 0;
      }
      const moved = { ...r, path: at.path };
      if (at.subset === void 0) delete moved.subset;
      else moved.subset = at.subset;
      return moved;
    } catch {
      this.misses += 1;
      return void 0;
    }
  }
  /** Stores a result; broken shards are never cached, so they are read again next time. */
  async put(result) {
    if (result.read.broken) return;
    await mkdir(this.dir, { recursive: true });
    const target = this.file(result.contentId, result.settingsId);
    const tmp = `${target}.${process.pid}.tmp`;
    await writeFile(tmp, JSON.stringify(storedShardResult(result)));
    await rename(tmp, target);
  }
};

// src/results/scan.ts
import { createHash as createHash4 } from "node:crypto";
import { createReadStream as createReadStream2 } from "node:fs";
import { PassThrough } from "node:stream";
async function contentIdOf(ref) {
  const hash2 = createHash4("sha256");
  const stream = ref.open?.() ?? createReadStream2(ref.absPath);
  for await (const chunk of stream) hash2.update(chunk);
  return hash2.digest("hex");
}
var ShardFold = class {
  constructor(settings, analyzers, cutoff) {
    this.settings = settings;
    this.analyzers = analyzers;
    this.cutoff = cutoff;
    this.tally = new ShardTally(settings.languageKeys);
    this.moments = settings.sampling ? new MomentTally() : void 0;
    this.dup = analyzers.duplicates?.();
    this.contamination = analyzers.contamination ? { docs: 0, samples: [] } : void 0;
    this.languageIndex = new Map(settings.languageKeys.map((k, i) => [k, i]));
    this.otherIndex = settings.languageKeys.length;
    this.unsampledIndex = this.otherIndex + 1;
  }
  settings;
  analyzers;
  cutoff;
  tally;
  moments;
  dup;
  contamination;
  languageIndex;
  otherIndex;
  /** Duplicate-index language of a document not measured: past `other`, named UNSAMPLED_LANGUAGE by the summary. */
  unsampledIndex;
  measured = 0;
  offered = 0;
  ordinal = 0;
  /** While nothing falls under a fraction's cutoff, the smallest-hash document so far, so a small shard still has one measured. */
  fallback;
  failure;
  /** Measures one document into the tallies. */
  measureOne(doc) {
    const m = this.analyzers.measure(doc);
    const tokens = this.analyzers.tokens?.(doc.text);
    this.tally.add(doc.line, m, tokens);
    this.moments?.add(m, tokens);
    this.measured += 1;
    return m;
  }
  /** Folds in the next document; after a failure, documents are ignored. */
  offer(doc) {
    if (this.failure) return;
    try {
      const sampling = this.settings.sampling;
      let language = this.unsampledIndex;
      const hash2 = sampling ? documentHash(doc.text) : 0;
      if (!sampling || hash2 <= this.cutoff) {
        const m = this.measureOne(doc);
        language = this.languageIndex.get(m.language) ?? this.otherIndex;
        this.fallback = void 0;
      } else if (this.measured === 0 && (!this.fallback || hash2 < this.fallback.hash)) {
        this.fallback = { doc, hash: hash2 };
      }
      this.dup?.add({ ordinal: this.ordinal, line: doc.line, language, text: doc.text });
      if (this.contamination) {
        const hit = this.analyzers.contamination(doc.text);
        if (hit) {
          this.contamination.docs += 1;
          if (this.contamination.samples.length < SAMPLES_PER_KIND) {
            this.contamination.samples.push({ line: doc.line, evalFile: hit.file, evalLine: hit.line });
          }
        }
      }
      this.ordinal += 1;
      this.offered += 1;
    } catch (err) {
      this.failure = { line: doc.line, message: `measuring failed at line ${doc.line}: ${err.message}` };
    }
  }
  /** Returns this fold as a batch result (the fold cannot be used afterwards). */
  toBatch() {
    const out = { tally: this.tally.state(), measured: this.measured, offered: this.offered };
    if (this.moments) out.moments = this.moments.state();
    if (this.dup) out.duplicates = this.dup.takePart();
    if (this.contamination) out.contamination = this.contamination;
    if (this.fallback && this.measured === 0) out.fallback = this.fallback;
    if (this.failure) out.failure = this.failure;
    return out;
  }
  /** Folds in the next batch's result, as if its documents had been offered here one by one. */
  absorb(b) {
    if (this.failure) return;
    this.tally.absorb(b.tally);
    if (this.moments && b.moments) this.moments.absorb(b.moments);
    if (this.dup && b.duplicates) this.dup.addPart(b.duplicates);
    if (this.contamination && b.contamination) {
      this.contamination.docs += b.contamination.docs;
      for (const s of b.contamination.samples) {
        if (this.contamination.samples.length < SAMPLES_PER_KIND) this.contamination.samples.push(s);
      }
    }
    if (this.settings.sampling && this.measured === 0) {
      if (b.measured > 0) this.fallback = void 0;
      else if (b.fallback && (!this.fallback || b.fallback.hash < this.fallback.hash)) this.fallback = b.fallback;
    }
    this.measured += b.measured;
    this.offered += b.offered;
    this.ordinal += b.offered;
    if (b.failure) this.failure = b.failure;
  }
  /** Returns the shard's result over everything folded in, with the reader's account of its lines. */
  finish(ref, account, contentId, started) {
    const sampling = this.settings.sampling;
    let usedFallback = false;
    if (sampling && this.measured === 0 && this.fallback && !this.failure) {
      const doc = this.fallback.doc;
      try {
        this.measureOne(doc);
        usedFallback = true;
      } catch (err) {
        this.failure = { line: doc.line, message: `measuring failed at line ${doc.line}: ${err.message}` };
      }
    }
    if (this.failure && !account.broken) account.broken = { afterLine: this.failure.line - 1, message: this.failure.message };
    const tally = this.tally;
    const result = {
      schema: RESULT_SCHEMA,
      path: ref.path,
      format: ref.format,
      compression: ref.compression,
      encoding: ref.encoding,
      sizeBytes: ref.sizeBytes,
      contentId,
      settingsId: this.settings.settingsId,
      read: account,
      languages: tally.languages,
      scripts: tally.scripts,
      anomalyMasks: tally.anomalyMasks,
      anomalyDocs: tally.anomalyDocs,
      declared: tally.declared,
      samples: { impure: tally.impure, anomalous: tally.anomalous, mismatch: tally.mismatch },
      elapsedMs: Math.round(performance.now() - started)
    };
    if (ref.subset !== void 0) result.subset = ref.subset;
    if (this.dup) result.duplicateIndex = this.dup.finish();
    if (this.contamination) result.contamination = this.contamination;
    if (sampling && this.moments) {
      result.sample = { ...describeSampling(sampling), docs: this.measured, of: this.offered, cutoff: this.cutoff, moments: this.moments.moments };
      if (usedFallback) result.sample.fallback = true;
    }
    return result;
  }
};
function hashedWhileRead(ref, hash2) {
  return {
    ...ref,
    open: () => {
      const source = ref.open?.() ?? createReadStream2(ref.absPath, { highWaterMark: readChunkBytes(ref) });
      const tap = new PassThrough();
      source.on("data", (chunk) => hash2.update(chunk));
      source.on("error", (err) => tap.destroy(err));
      source.pipe(tap);
      return tap;
    }
  };
}
async function cutoffOf(ref, settings) {
  const sampling = settings.sampling;
  if (!sampling) return HASH_SPACE;
  if ("fraction" in sampling) return fractionCutoff(sampling.fraction);
  const smallest = new SmallestHashes(sampling.docsPerShard);
  await readShard(ref, settings.read, (doc) => smallest.add(documentHash(doc.text)));
  return smallest.cutoff();
}
async function scanShard(ref, settings, analyzers, onRead) {
  const started = performance.now();
  const cutoff = await cutoffOf(ref, settings);
  const fold2 = new ShardFold(settings, analyzers, cutoff);
  const hash2 = createHash4("sha256");
  const pace = onRead ? (bytes3) => {
    onRead(bytes3);
    return void 0;
  } : void 0;
  const account = await readShard(hashedWhileRead(ref, hash2), settings.read, (doc) => fold2.offer(doc), pace);
  return fold2.finish(ref, account, hash2.digest("hex"), started);
}
function measureBatch(batch, settings, analyzers) {
  const fold2 = new ShardFold(settings, analyzers, batch.cutoff);
  const { lines, texts, declared } = batch;
  for (let i = 0; i < texts.length; i++) {
    const doc = { line: lines[i], lineEnd: lines[i], text: texts[i] };
    const d = declared[i];
    if (d !== null && d !== void 0) doc.declaredLanguage = d;
    fold2.offer(doc);
    if (fold2.failure) break;
  }
  return fold2.toBatch();
}
async function scanShardInBatches(ref, settings, analyzers, measure, plan) {
  const started = performance.now();
  const cutoff = await cutoffOf(ref, settings);
  const fold2 = new ShardFold(settings, analyzers, cutoff);
  const hash2 = createHash4("sha256");
  const pending = [];
  const done = /* @__PURE__ */ new Map();
  let handedOut = 0;
  let absorbed = 0;
  let failed;
  const absorbReady = () => {
    for (let r = done.get(absorbed); r !== void 0; r = done.get(absorbed)) {
      done.delete(absorbed);
      fold2.absorb(r);
      absorbed += 1;
    }
  };
  const handOut = (batch2) => {
    const index2 = handedOut++;
    pending[index2] = measure(batch2).then(
      (r) => {
        done.set(index2, r);
        absorbReady();
      },
      (error) => {
        failed ??= { error };
      }
    );
  };
  let batch = { lines: [], texts: [], declared: [], cutoff };
  let chars = 0;
  const flush = () => {
    if (batch.texts.length === 0) return;
    handOut(batch);
    batch = { lines: [], texts: [], declared: [], cutoff };
    chars = 0;
  };
  const account = await readShard(
    hashedWhileRead(ref, hash2),
    settings.read,
    (doc) => {
      if (fold2.failure || failed) return;
      batch.lines.push(doc.line);
      batch.texts.push(doc.text);
      batch.declared.push(doc.declaredLanguage ?? null);
      chars += doc.text.length;
      if (chars >= plan.batchChars) flush();
    },
    (bytes3) => {
      plan.onRead?.(bytes3);
      if (failed) throw failed.error;
      if (handedOut - absorbed < plan.inFlight) return void 0;
      return pending[absorbed];
    }
  );
  flush();
  await Promise.all(pending);
  if (failed) throw failed.error;
  absorbReady();
  if (absorbed !== handedOut) throw new Error(`${ref.path}: ${handedOut - absorbed} of ${handedOut} batches were not absorbed`);
  return fold2.finish(ref, account, hash2.digest("hex"), started);
}

// src/core/analyzers.ts
import { relative as relative2 } from "node:path";

// src/measure/language.ts
import { parse } from "bcp-47";

// src/measure/language-candidates.ts
var MAJOR_LANGUAGES = {
  // Latin: the most-used Latin-script languages with a franc profile.
  Latin: [
    "eng",
    "spa",
    "fra",
    "deu",
    "por",
    "ita",
    "nld",
    "pol",
    "tur",
    "vie",
    "ind",
    "zlm",
    "ron",
    "ces",
    "hun",
    "swe",
    "fin",
    "dan",
    "hrv",
    "slk",
    "swh",
    "tgl",
    "cat"
  ],
  Devanagari: ["hin", "mar", "npi"],
  Arabic: ["arb", "urd", "pes", "pbu"],
  Cyrillic: ["rus", "ukr", "bel", "bul", "srp", "mkd", "kaz"],
  Hebrew: ["heb", "ydd"],
  Ethiopic: ["amh", "tir"],
  Han: ["cmn", "jpn"],
  // Scripts written by one major language: labelled directly, without a detector.
  Hiragana: ["jpn"],
  Katakana: ["jpn"],
  Hangul: ["kor"],
  Greek: ["ell"],
  Thai: ["tha"],
  Lao: ["lao"],
  Khmer: ["khm"],
  Myanmar: ["mya"],
  Georgian: ["kat"],
  Armenian: ["hye"],
  Bengali: ["ben"],
  Gurmukhi: ["pan"],
  Gujarati: ["guj"],
  Oriya: ["ory"],
  Tamil: ["tam"],
  Telugu: ["tel"],
  Kannada: ["kan"],
  Malayalam: ["mal"],
  Sinhala: ["sin"],
  Tibetan: ["bod"],
  Thaana: ["div"],
  Ol_Chiki: ["sat"],
  Tifinagh: ["zgh"],
  Yi: ["iii"],
  Javanese: ["jav"]
};

// src/measure/language-franc.ts
import { data } from "franc/data.js";

// src/measure/data/franc-scripts.generated.ts
var FRANC_EXPRESSIONS = ["cmn", "Latin", "Cyrillic", "Arabic", "ben", "Devanagari", "jpn", "jav", "kor", "tel", "tam", "guj", "kan", "mal", "Myanmar", "pan", "Ethiopic", "tha", "sin", "ell", "khm", "hye", "sat", "bod", "Hebrew", "kat", "lao", "zgh", "iii", "aii"];
var FRANC_CLASS_MASKS = [0, 2, 524288, 4, 2097152, 16777216, 8, 536870912, 32, 16, 32768, 2048, 1024, 512, 4096, 8192, 262144, 131072, 67108864, 8388608, 16384, 33554432, 256, 65536, 1048576, 4194304, 134217728, 1, 64, 65, 268435456, 128];
var FRANC_RANGE_STARTS = [
  0,
  65,
  91,
  97,
  123,
  170,
  171,
  186,
  187,
  192,
  215,
  216,
  247,
  248,
  697,
  736,
  741,
  880,
  884,
  885,
  888,
  890,
  894,
  895,
  896,
  900,
  901,
  902,
  903,
  904,
  907,
  908,
  909,
  910,
  930,
  931,
  994,
  1008,
  1024,
  1157,
  1159,
  1328,
  1329,
  1367,
  1369,
  1419,
  1421,
  1424,
  1425,
  1480,
  1488,
  1515,
  1519,
  1525,
  1536,
  1541,
  1542,
  1548,
  1549,
  1563,
  1564,
  1567,
  1568,
  1600,
  1601,
  1611,
  1622,
  1648,
  1649,
  1757,
  1758,
  1792,
  1806,
  1807,
  1867,
  1869,
  1872,
  1920,
  2144,
  2155,
  2160,
  2191,
  2192,
  2194,
  2200,
  2274,
  2275,
  2304,
  2385,
  2389,
  2404,
  2406,
  2432,
  2436,
  2437,
  2445,
  2447,
  2449,
  2451,
  2473,
  2474,
  2481,
  2482,
  2483,
  2486,
  2490,
  2492,
  2501,
  2503,
  2505,
  2507,
  2511,
  2519,
  2520,
  2524,
  2526,
  2527,
  2532,
  2534,
  2559,
  2561,
  2564,
  2565,
  2571,
  2575,
  2577,
  2579,
  2601,
  2602,
  2609,
  2610,
  2612,
  2613,
  2615,
  2616,
  2618,
  2620,
  2621,
  2622,
  2627,
  2631,
  2633,
  2635,
  2638,
  2641,
  2642,
  2649,
  2653,
  2654,
  2655,
  2662,
  2679,
  2689,
  2692,
  2693,
  2702,
  2703,
  2706,
  2707,
  2729,
  2730,
  2737,
  2738,
  2740,
  2741,
  2746,
  2748,
  2758,
  2759,
  2762,
  2763,
  2766,
  2768,
  2769,
  2784,
  2788,
  2790,
  2802,
  2809,
  2816,
  2946,
  2948,
  2949,
  2955,
  2958,
  2961,
  2962,
  2966,
  2969,
  2971,
  2972,
  2973,
  2974,
  2976,
  2979,
  2981,
  2984,
  2987,
  2990,
  3002,
  3006,
  3011,
  3014,
  3017,
  3018,
  3022,
  3024,
  3025,
  3031,
  3032,
  3046,
  3067,
  3072,
  3085,
  3086,
  3089,
  3090,
  3113,
  3114,
  3130,
  3132,
  3141,
  3142,
  3145,
  3146,
  3150,
  3157,
  3159,
  3160,
  3163,
  3165,
  3166,
  3168,
  3172,
  3174,
  3184,
  3191,
  3200,
  3213,
  3214,
  3217,
  3218,
  3241,
  3242,
  3252,
  3253,
  3258,
  3260,
  3269,
  3270,
  3273,
  3274,
  3278,
  3285,
  3287,
  3293,
  3295,
  3296,
  3300,
  3302,
  3312,
  3313,
  3316,
  3328,
  3341,
  3342,
  3345,
  3346,
  3397,
  3398,
  3401,
  3402,
  3408,
  3412,
  3428,
  3430,
  3456,
  3457,
  3460,
  3461,
  3479,
  3482,
  3506,
  3507,
  3516,
  3517,
  3518,
  3520,
  3527,
  3530,
  3531,
  3535,
  3541,
  3542,
  3543,
  3544,
  3552,
  3558,
  3568,
  3570,
  3573,
  3585,
  3643,
  3648,
  3676,
  3713,
  3715,
  3716,
  3717,
  3718,
  3723,
  3724,
  3748,
  3749,
  3750,
  3751,
  3774,
  3776,
  3781,
  3782,
  3783,
  3784,
  3791,
  3792,
  3802,
  3804,
  3808,
  3840,
  3912,
  3913,
  3949,
  3953,
  3992,
  3993,
  4029,
  4030,
  4045,
  4046,
  4053,
  4057,
  4059,
  4096,
  4256,
  4294,
  4295,
  4296,
  4301,
  4302,
  4304,
  4347,
  4348,
  4352,
  4608,
  4681,
  4682,
  4686,
  4688,
  4695,
  4696,
  4697,
  4698,
  4702,
  4704,
  4745,
  4746,
  4750,
  4752,
  4785,
  4786,
  4790,
  4792,
  4799,
  4800,
  4801,
  4802,
  4806,
  4808,
  4823,
  4824,
  4881,
  4882,
  4886,
  4888,
  4955,
  4957,
  4989,
  4992,
  5018,
  6016,
  6110,
  6112,
  6122,
  6128,
  6138,
  6624,
  6656,
  7248,
  7296,
  7305,
  7312,
  7355,
  7357,
  7360,
  7424,
  7462,
  7467,
  7468,
  7517,
  7522,
  7526,
  7531,
  7544,
  7545,
  7615,
  7616,
  7680,
  7936,
  7958,
  7960,
  7966,
  7968,
  8006,
  8008,
  8014,
  8016,
  8024,
  8025,
  8026,
  8027,
  8028,
  8029,
  8030,
  8031,
  8062,
  8064,
  8117,
  8118,
  8133,
  8134,
  8148,
  8150,
  8156,
  8157,
  8176,
  8178,
  8181,
  8182,
  8191,
  8305,
  8306,
  8319,
  8320,
  8336,
  8349,
  8486,
  8487,
  8490,
  8492,
  8498,
  8499,
  8526,
  8527,
  8544,
  8585,
  11360,
  11392,
  11520,
  11558,
  11559,
  11560,
  11565,
  11566,
  11568,
  11624,
  11631,
  11633,
  11647,
  11648,
  11671,
  11680,
  11687,
  11688,
  11695,
  11696,
  11703,
  11704,
  11711,
  11712,
  11719,
  11720,
  11727,
  11728,
  11735,
  11736,
  11743,
  11744,
  11776,
  11904,
  11930,
  11931,
  12020,
  12032,
  12246,
  12293,
  12294,
  12295,
  12296,
  12321,
  12330,
  12334,
  12336,
  12344,
  12348,
  12353,
  12439,
  12445,
  12448,
  12449,
  12539,
  12541,
  12544,
  12593,
  12687,
  12784,
  12800,
  12831,
  12896,
  12927,
  13008,
  13055,
  13056,
  13144,
  13312,
  19894,
  19904,
  19968,
  40880,
  40960,
  42125,
  42128,
  42183,
  42560,
  42656,
  42786,
  42888,
  42891,
  42955,
  42960,
  42962,
  42963,
  42964,
  42965,
  42970,
  42994,
  43008,
  43232,
  43264,
  43360,
  43389,
  43392,
  43470,
  43472,
  43482,
  43486,
  43488,
  43519,
  43616,
  43648,
  43777,
  43783,
  43785,
  43791,
  43793,
  43799,
  43808,
  43815,
  43816,
  43823,
  43824,
  43867,
  43868,
  43877,
  43878,
  43882,
  44032,
  55204,
  55216,
  55239,
  55243,
  55292,
  63744,
  64110,
  64112,
  64218,
  64256,
  64263,
  64275,
  64280,
  64285,
  64311,
  64312,
  64317,
  64318,
  64319,
  64320,
  64322,
  64323,
  64325,
  64326,
  64336,
  64451,
  64467,
  64830,
  64832,
  64912,
  64914,
  64968,
  64975,
  64976,
  65008,
  65024,
  65070,
  65072,
  65136,
  65141,
  65142,
  65277,
  65313,
  65339,
  65345,
  65371,
  65382,
  65392,
  65393,
  65438,
  65440,
  65471,
  65474,
  65480,
  65482,
  65488,
  65490,
  65496,
  65498,
  65501,
  65856,
  65935,
  65952,
  65953,
  67456,
  67462,
  67463,
  67505,
  67506,
  67515,
  69216,
  69247,
  69373,
  69376,
  70113,
  70133,
  72448,
  72458,
  73664,
  73714,
  73727,
  73728,
  94178,
  94180,
  94192,
  94194,
  110576,
  110580,
  110581,
  110588,
  110589,
  110591,
  110592,
  110883,
  110898,
  110899,
  110928,
  110931,
  110933,
  110934,
  110948,
  110952,
  119296,
  119366,
  122624,
  122655,
  122661,
  122667,
  122928,
  122990,
  123023,
  123024,
  124896,
  124903,
  124904,
  124908,
  124909,
  124911,
  124912,
  124927,
  126464,
  126468,
  126469,
  126496,
  126497,
  126499,
  126500,
  126501,
  126503,
  126504,
  126505,
  126515,
  126516,
  126520,
  126521,
  126522,
  126523,
  126524,
  126530,
  126531,
  126535,
  126536,
  126537,
  126538,
  126539,
  126540,
  126541,
  126544,
  126545,
  126547,
  126548,
  126549,
  126551,
  126552,
  126553,
  126554,
  126555,
  126556,
  126557,
  126558,
  126559,
  126560,
  126561,
  126563,
  126564,
  126565,
  126567,
  126571,
  126572,
  126579,
  126580,
  126584,
  126585,
  126589,
  126590,
  126591,
  126592,
  126602,
  126603,
  126620,
  126625,
  126628,
  126629,
  126634,
  126635,
  126652,
  126704,
  126706,
  127488,
  127489,
  131072,
  173792,
  173824,
  177978,
  177984,
  178206,
  178208,
  183970,
  183984,
  191457,
  194560,
  195102,
  196608,
  201547,
  201552,
  205744
];
var FRANC_RANGE_CLASSES = [
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  3,
  0,
  3,
  0,
  4,
  0,
  4,
  0,
  4,
  0,
  5,
  0,
  5,
  0,
  5,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  7,
  0,
  7,
  0,
  7,
  6,
  0,
  7,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  8,
  0,
  8,
  0,
  8,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  9,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  12,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  14,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  17,
  0,
  17,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  18,
  0,
  19,
  0,
  19,
  0,
  19,
  0,
  19,
  0,
  19,
  0,
  19,
  0,
  19,
  0,
  20,
  21,
  0,
  21,
  0,
  21,
  0,
  21,
  0,
  21,
  22,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  24,
  0,
  24,
  0,
  24,
  0,
  24,
  0,
  25,
  3,
  0,
  21,
  0,
  21,
  0,
  1,
  2,
  3,
  1,
  2,
  1,
  2,
  1,
  3,
  1,
  2,
  0,
  1,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  2,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  21,
  0,
  21,
  0,
  21,
  0,
  26,
  0,
  26,
  0,
  26,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  3,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  22,
  0,
  27,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  22,
  0,
  28,
  22,
  0,
  22,
  0,
  28,
  0,
  28,
  0,
  29,
  27,
  0,
  29,
  27,
  30,
  0,
  30,
  0,
  3,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  8,
  0,
  22,
  0,
  31,
  0,
  31,
  0,
  31,
  20,
  0,
  20,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  1,
  0,
  1,
  2,
  1,
  0,
  22,
  0,
  22,
  0,
  22,
  0,
  27,
  0,
  27,
  0,
  1,
  0,
  4,
  0,
  5,
  0,
  5,
  0,
  5,
  0,
  5,
  0,
  5,
  0,
  5,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  3,
  0,
  6,
  0,
  6,
  0,
  1,
  0,
  1,
  0,
  28,
  0,
  28,
  0,
  22,
  0,
  22,
  0,
  22,
  0,
  22,
  0,
  22,
  0,
  2,
  0,
  2,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  6,
  0,
  6,
  0,
  16,
  0,
  8,
  0,
  12,
  0,
  12,
  0,
  27,
  0,
  27,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  28,
  0,
  2,
  0,
  1,
  0,
  1,
  0,
  3,
  0,
  3,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  23,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  28,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0,
  27,
  0
];

// src/measure/kernels/franc.generated.ts
var WASM_BASE642 = "AGFzbQEAAAABKAVgB39/f39/f38AYAABf2ACf38Bf2AFf39/f38Bf2AGf39/f39/AX8DBwYAAQICAwQEBQFwAQEBBQMBAAIGDwJ/AUHAqAQLfwBBwKgECwdvCAZtZW1vcnkCAAlzZXRUYWJsZXMAAAtzYW1wbGVGbGFncwABDWNvdW50VHJpZ3JhbXMAAgxjb3VudENsZWFuZWQAAwxjb3VudENsYXNzZXMABAxuZWFyZXN0RGVuc2UABQtfX2hlYXBfYmFzZQMBCuQXBloAQQAgATYChIiAgABBACAANgKAiICAAEEAIAI2AoiIgIAAQQAgAzYCjIiAgABBACAENgKQiICAAEEAIAU2ApSIgIAAQQAgBjYCmIiAgABBAEEANgKciICAAAsLAEEAKAKgiICAAAu1CQETf0EAIQJBASEDAkBBACgCnIiAgAAiBEEBSA0AQQAoApSIgIAAIQVBACgCkIiAgAAhBkEAIQcCQCAEQQRJDQAgBEF8cSIHQXxqIghBAnZBAWoiCUEBcSEKAkACQCAIDQBBACEJDAELIAVBHGohCCAJQf7///8HcSELQQAhCQNAIAhBcGooAgAhDCAIQWxqKAIAIQ0gCEFoaigCACEOIAYgCEFkaigCAEEBdGpBADsBACAGIA5BAXRqQQA7AQAgBiANQQF0akEAOwEAIAYgDEEBdGpBADsBACAIQXxqKAIAIQwgCEF4aigCACENIAgoAgAhDiAGIAhBdGooAgBBAXRqQQA7AQAgBiANQQF0akEAOwEAIAYgDEEBdGpBADsBACAGIA5BAXRqQQA7AQAgCEEgaiEIIAlBCGohCSALQX5qIgsNAAsLAkAgCkUNACAFIAlBAnRqIggoAgwhCSAIKAIIIQsgCCgCBCEMIAYgCCgCAEEBdGpBADsBACAGIAxBAXRqQQA7AQAgBiALQQF0akEAOwEAIAYgCUEBdGpBADsBAAsgBCAHRg0BCyAEIAdrIQkgBSAHQQJ0aiEIA0AgBiAIKAIAQQF0akEAOwEAIAhBBGohCCAJQX9qIgkNAAsLQQBBIDsBsIiAgABBAEEANgKciICAAEEAIQ1BACEGAkACQCABQQFIDQAgAUGAECABQYAQSRshC0EAIQJBACgCgIiAgAAhDkEAIQ1BACEJQQEhA0EBIQwDQCADQQF0QbCIgIAAaiAOIAAvAQAiBkEBdGovAQAiCDsBACAAQQJqIQAgAiAGciECIA0gBkEgckGff2pBGklyIQ0gCSAIRXIhCSAMIAhBIEYiBnFBAXMgA2ohAyAGIQwgC0F/aiILDQALQX8hDiAJDQEgBkEBcyEGCyADQQF0QbCIgIAAakEgOwEAQQAhDgJAIAMgBmoiD0ECSQ0AQSBBACgCjIiAgAAiBmshEEF/IAZ0QX9zIQtBACgClIiAgAAhEUEAKAKQiICAACESQQAoApiIgIAAIRNBACgChIiAgAAhFEEAKAKIiICAACEAQQEhAUEAIQdBfyEGQSAhCEEAIQNBACEOA0AgCCEKAkACQAJAAkAgByIFIAZyQQAgAUEBdEGwiICAAGovAQAiCEGgf2pBfyAIQZ9/akEaSRsgCEEgRhsiB3JBAEgNACAUIAcgBkEbbCAFakEbbGpBAXRqLgEAIQwMAQtBfyEMIAAgCEH3lK+veGxBw/+8jnxqIANBEHQgCnIiBEGx893xeWxzIBB2IgZBA3RqQQRqKAIAIgNFDQEgBkEBdCEJA0ACQCADQf//A3EgCEcNACAAIAlBAnRqKAIAIARHDQAgA0EQdkF/aiEMDAILIAZBAWogC3EiBkEBdCEJIAAgBkEDdGpBBGooAgAiAw0ADAILCyAMIQYgDEF/Sg0BCyATIQYLIBEgDkECdGogDDYCACASIAZBAXRqIgYgBi8BACIGQQFqOwEAIAxBf3NBH3YgBkVxIA5qIQ4gBSEGIAohAyABQQFqIgEgD0cNAAsLQQAgDjYCnIiAgABBACANQQBHQQF0IAJBgAFJcjYCoIiAgAALIA4L8QcBEX9BACECAkBBACgCnIiAgAAiA0EBSA0AQQAoApSIgIAAIQRBACgCkIiAgAAhBUEAIQYCQCADQQRJDQAgA0F8cSIGQXxqIgdBAnZBAWoiCEEBcSEJAkACQCAHDQBBACEIDAELIARBHGohByAIQf7///8HcSEKQQAhCANAIAdBcGooAgAhCyAHQWxqKAIAIQwgB0FoaigCACENIAUgB0FkaigCAEEBdGpBADsBACAFIA1BAXRqQQA7AQAgBSAMQQF0akEAOwEAIAUgC0EBdGpBADsBACAHQXxqKAIAIQsgB0F4aigCACEMIAcoAgAhDSAFIAdBdGooAgBBAXRqQQA7AQAgBSAMQQF0akEAOwEAIAUgC0EBdGpBADsBACAFIA1BAXRqQQA7AQAgB0EgaiEHIAhBCGohCCAKQX5qIgoNAAsLAkAgCUUNACAEIAhBAnRqIgcoAgwhCCAHKAIIIQogBygCBCELIAUgBygCAEEBdGpBADsBACAFIAtBAXRqQQA7AQAgBSAKQQF0akEAOwEAIAUgCEEBdGpBADsBAAsgAyAGRg0BCyADIAZrIQggBCAGQQJ0aiEHA0AgBSAHKAIAQQF0akEAOwEAIAdBBGohByAIQX9qIggNAAsLAkAgAUEDSA0AIAFBfmohCUEgQQAoAoyIgIAAIgVrIQ5BfyAFdEF/cyEMIAAvAQAhA0EAKAKUiICAACEPQQAoApCIgIAAIRBBACgCmIiAgAAhEUEAKAKEiICAACESQQAoAoiIgIAAIQpBAiEHQQAhAkEAIQEDQCADQf//A3EhBQJAAkACQAJAQQAgACABQQFqIgZBAXRqLwEAIgNBoH9qQX8gA0Gff2pBGkkbIANBIEYbIgtBACAFQaB/akF/IAVBn39qQRpJGyAFQSBGGyINckEAIAAgB0EBdGovAQAiCEGgf2pBfyAIQZ9/akEaSRsgCEEgRhsiB3JBAEgNACASIA1BG2wgC2pBG2wgB2pBAXRqLgEAIQ0MAQtBfyENIAogCEH3lK+veGxBw/+8jnxqIAVBEHQgA3IiBEGx893xeWxzIA52IgVBA3RqQQRqKAIAIgdFDQEgBUEBdCELA0ACQCAHQf//A3EgCEcNACAKIAtBAnRqKAIAIARHDQAgB0EQdkF/aiENDAILIAVBAWogDHEiBUEBdCELIAogBUEDdGpBBGooAgAiBw0ADAILCyANIQUgDUF/Sg0BCyARIQULIA8gAkECdGogDTYCACAQIAVBAXRqIgUgBS8BACIFQQFqOwEAIA1Bf3NBH3YgBUVxIAJqIQIgAUEDaiEHIAYhASAGIAlHDQALC0EAIAI2ApyIgIAAIAILpwEBAn8CQCAEQQFIDQAgA0EAIARBAnT8CwALAkAgAUEBTg0AQQAPC0F/IQUCQCAALwEAIgRBgPADcUGAsANGDQAgAEECaiEAQQEhBQJAA0AgAyACIARqLQAAQQJ0aiIEIAQoAgBBAWo2AgAgASAFIgZGDQEgBkEBaiEFIAAvAQAhBCAAQQJqIQAgBEGA8ANxQYCwA0cNAAsLQX9BACAGIAFIGyEFCyAFC6cEBQV/AXsBfwJ7AX8CQCADQQFIDQBBACEGIAVBACADQQJ0/AsAIABBAUgNAEEAKAKQiICAACEHQQAoApSIgIAAIQgDQCACIAEgCCAGQQJ0aigCACIJQQJ0aigCACADbEEBdGohCiAHIAlBAXRq/QgBACELQQAhDCAFIQkDQCAJIAn9AAQA/QwAAAAAAAAAAAAAAAAAAAAAIg0gCyAK/QAAACIO/ZEB/YAB/QzU/tT+1P7U/tT+1P7U/tT+/Y4BIA4gDf0t/VIiDf2nAf2uAf0LBAAgCUEQaiIPIA/9AAQAIA39qAH9rgH9CwQAIApBEGohCiAJQSBqIQkgDEEIaiIMIANIDQALIAZBAWoiBiAARw0ACwtBACEKAkAgBEECSA0AIARBf2oiCUEDcSEPAkACQCAEQX5qQQNPDQBBACEKQQEhCQwBCyAFQRBqIQwgCUF8cSEGQQAhCkEBIQkDQCAJQQNqIgMgCUECaiAJQQFqIAkgCiAMQXRqKAIAIAUgCkECdGooAgBIGyIKIAxBeGooAgAgBSAKQQJ0aigCAEgbIgogDEF8aigCACAFIApBAnRqKAIASBsiCiAMKAIAIAUgCkECdGooAgBIGyEKIAlBBGohCSAMQRBqIQwgAyAGRw0ACwsgD0UNACAFIAlBAnRqIQwDQCAJIAogDCgCACAFIApBAnRqKAIASBshCiAMQQRqIQwgCUEBaiEJIA9Bf2oiDw0ACwsgCgs=";

// src/measure/kernels/franc-kernel.ts
var kernel2;
function francKernel() {
  return kernel2 ??= instantiateKernel(WASM_BASE642);
}

// src/measure/range-table.ts
function lazyRangeTable(starts2, values) {
  let table3;
  return () => table3 ??= rangeTable(starts2, values);
}
function rangeTable(starts2, values) {
  const bmp = new Uint8Array(65536);
  const astralStartList = [];
  const astralValueList = [];
  for (let r = 0; r < starts2.length; r++) {
    const start = starts2[r];
    const end = starts2[r + 1] ?? 1114112;
    const value = values[r];
    if (start < 65536) bmp.fill(value, start, Math.min(end, 65536));
    if (end > 65536) {
      astralStartList.push(Math.max(start, 65536));
      astralValueList.push(value);
    }
  }
  const astralStarts = Int32Array.from(astralStartList);
  const astralValues = Uint8Array.from(astralValueList);
  return {
    bmp,
    astral(cp) {
      let lo = 0;
      let hi = astralStarts.length - 1;
      while (lo < hi) {
        const midpoint = lo + hi + 1 >> 1;
        if (astralStarts[midpoint] <= cp) lo = midpoint;
        else hi = midpoint - 1;
      }
      return astralValues[lo];
    }
  };
}

// src/measure/language-franc.ts
var MAX_LENGTH = 2048;
var MIN_LENGTH = 10;
var DIRECT = 27 * 27 * 27;
var UND = "und";
var francTable = lazyRangeTable(FRANC_RANGE_STARTS, FRANC_RANGE_CLASSES);
function francClasses() {
  return francTable().bmp;
}
function astralFrancClass(cp) {
  return francTable().astral(cp);
}
var classCounts = new Int32Array(FRANC_CLASS_MASKS.length);
var expressionCounts = new Int32Array(FRANC_EXPRESSIONS.length);
var CLASS_EXPRESSIONS = FRANC_CLASS_MASKS.map(
  (mask) => FRANC_EXPRESSIONS.map((_, e) => e).filter((e) => (mask & 1 << e) !== 0)
);
function countClassesByCodePoint(table3, text, end) {
  classCounts.fill(0);
  for (let i = 0; i < end; i++) {
    const unit = text.charCodeAt(i);
    if (unit >= 55296 && unit <= 56319 && i + 1 < end) {
      const low = text.charCodeAt(i + 1);
      if (low >= 56320 && low <= 57343) {
        const cls2 = astralFrancClass((unit - 55296 << 10) + (low - 56320) + 65536);
        classCounts[cls2] = classCounts[cls2] + 1;
        i++;
        continue;
      }
    }
    const cls = table3[unit];
    classCounts[cls] = classCounts[cls] + 1;
  }
}
var classesAt = -1;
var classCountsAt = 0;
function topExpression(kernel5, text, end) {
  const table3 = francClasses();
  if (classesAt < 0) {
    classesAt = kernel5.place(table3);
    classCountsAt = kernel5.allocate(4 * classCounts.length);
  }
  if (kernel5.countClasses(textAt, end, classesAt, classCountsAt, classCounts.length) === 0) {
    classCounts.set(new Int32Array(kernel5.memory.buffer, classCountsAt, classCounts.length));
  } else countClassesByCodePoint(table3, text, end);
  expressionCounts.fill(0);
  for (let c = 1; c < classCounts.length; c++) {
    const n = classCounts[c];
    if (n === 0) continue;
    for (const e of CLASS_EXPRESSIONS[c]) expressionCounts[e] = expressionCounts[e] + n;
  }
  let best = 0;
  for (let e = 1; e < expressionCounts.length; e++) if (expressionCounts[e] > expressionCounts[best]) best = e;
  return { expression: best, count: expressionCounts[best] };
}
var LATIN = FRANC_EXPRESSIONS.indexOf("Latin");
var ASCII_SHORTCUT = (() => {
  const table3 = francClasses();
  for (let u = 0; u < 128; u++) {
    const isLetter = (u | 32) - 97 >>> 0 < 26;
    const mask = FRANC_CLASS_MASKS[table3[u]];
    if (mask !== (isLetter ? 1 << LATIN : 0)) return false;
  }
  return LATIN > 0;
})();
var internBits = 0;
var internTable = new Int32Array(0);
var internCount = 0;
var groupLanguages = /* @__PURE__ */ new Map();
var profiles = /* @__PURE__ */ new Map();
function hash(hi, lo, bits) {
  return (Math.imul(hi, 2654435761) ^ Math.imul(lo + 2135587861, 2246822519)) >>> 32 - bits;
}
function internedId(hi, lo, add) {
  const direct = directIndex(hi >>> 16, hi & 65535, lo);
  if (direct >= 0) {
    if (add && directId[direct] === -1) directId[direct] = internCount++;
    return directId[direct];
  }
  const id = hashedId(hi, lo);
  if (id >= 0 || !add) return id;
  const mask = (1 << internBits) - 1;
  let slot = hash(hi, lo, internBits);
  while (internTable[2 * slot + 1] !== 0) slot = slot + 1 & mask;
  internTable[2 * slot] = hi;
  internTable[2 * slot + 1] = lo | internCount + 1 << 16;
  return internCount++;
}
function hashedId(hi, lo) {
  const mask = (1 << internBits) - 1;
  let slot = hash(hi, lo, internBits);
  for (; ; ) {
    const second = internTable[2 * slot + 1];
    if (second === 0) return -1;
    if ((second & 65535) === lo && internTable[2 * slot] === hi) return (second >>> 16) - 1;
    slot = slot + 1 & mask;
  }
}
function symbolOf(unit) {
  return unit === 32 ? 0 : unit - 97 >>> 0 < 26 ? unit - 96 : -1;
}
function directIndex(a, b, c) {
  const x = symbolOf(a);
  const y = symbolOf(b);
  const z = symbolOf(c);
  return (x | y | z) < 0 ? -1 : (x * 27 + y) * 27 + z;
}
var directId = new Int16Array(DIRECT).fill(-1);
function isTrigramList(model) {
  if (model.length % 4 !== 3) return false;
  for (let i = 0; i < model.length; i++) {
    const c = model.charCodeAt(i);
    if (i % 4 === 3 ? c !== 124 : c === 0 || c === 124) return false;
  }
  return true;
}
function loadProfiles() {
  if (internBits > 0) return;
  let hashed = 0;
  for (const script in data) {
    const languages2 = data[script];
    groupLanguages.set(script, Object.keys(languages2));
    const models = /* @__PURE__ */ new Map();
    for (const language in languages2) {
      const model = languages2[language];
      models.set(language, model);
      if (!isTrigramList(model)) throw new Error(`franc data: the profile of ${language} is not trigrams of three units joined by |`);
      for (let i = 0; i < model.length; i += 4) if (directIndex(model.charCodeAt(i), model.charCodeAt(i + 1), model.charCodeAt(i + 2)) < 0) hashed++;
    }
    profiles.set(script, models);
  }
  internBits = Math.ceil(Math.log2(hashed * 2));
  internTable = new Int32Array(2 << internBits);
  for (const models of profiles.values()) {
    for (const model of models.values()) {
      for (let i = 0; i < model.length; i += 4) internedId(model.charCodeAt(i) << 16 | model.charCodeAt(i + 1), model.charCodeAt(i + 2), true);
    }
  }
  if (internCount >= 32767) throw new Error("franc data: too many trigrams for the 16-bit ids of internTable and directId");
  placeTables();
}
function invert(group, languages2) {
  const key = `${group}\0${languages2.join(",")}`;
  const known = invertedSets.get(key);
  if (known) return known;
  const inverted = invertAnew(group, languages2);
  invertedSets.set(key, inverted);
  return inverted;
}
var invertedSets = /* @__PURE__ */ new Map();
function invertAnew(group, languages2) {
  const models = profiles.get(group);
  const perLanguage2 = languages2.map((language) => {
    const rankOf = /* @__PURE__ */ new Map();
    const model = models.get(language).split("|");
    if (model.length >= 32767) throw new Error(`franc data: the profile of ${language} is too long for the kernel's 16-bit ranks`);
    for (let r = model.length - 1; r >= 0; r--) {
      const t = model[r];
      rankOf.set(internedId(t.charCodeAt(0) << 16 | t.charCodeAt(1), t.charCodeAt(2), false), r);
    }
    return rankOf;
  });
  const stride = Math.max(8, Math.ceil(languages2.length / 8) * 8);
  const rowOf = new Int32Array(internCount);
  let rowCount = 1;
  for (const rankOf of perLanguage2) for (const id of rankOf.keys()) if (rowOf[id] === 0) rowOf[id] = rowCount++;
  const rows = new Int16Array(rowCount * stride);
  perLanguage2.forEach((rankOf, l) => {
    for (const [id, rank2] of rankOf) rows[rowOf[id] * stride + l] = rank2 + 1;
  });
  const kernel5 = francKernel();
  return { languages: languages2, rowOfAt: kernel5.place(rowOf), rowsAt: kernel5.place(rows), stride };
}
var foldedUnit;
var SEPARATOR = 32;
var CARE = 0;
var CAPITAL_SIGMA = 931;
function cleaningTable() {
  if (foldedUnit) return foldedUnit;
  const folded2 = new Uint16Array(65536);
  const space = /\s/;
  for (let u = 1; u < 65536; u++) {
    if (u >= 55296 && u <= 57343) continue;
    const ch = String.fromCharCode(u);
    if (u >= 33 && u <= 64 || space.test(ch)) {
      folded2[u] = SEPARATOR;
      continue;
    }
    const lowered = ch.toLowerCase();
    if (lowered.length === 1 && u !== CAPITAL_SIGMA && lowered !== " " && lowered !== "\0") folded2[u] = lowered.charCodeAt(0);
  }
  return foldedUnit = folded2;
}
var SCRATCH_UNITS = MAX_LENGTH * 2 + 2;
var textAt = 0;
var cleanedAt = 0;
var viewsOf;
var cleaned = new Uint16Array(0);
function kernelWithViews() {
  const kernel5 = francKernel();
  const buffer = kernel5.memory.buffer;
  if (buffer !== viewsOf) {
    viewsOf = buffer;
    cleaned = new Uint16Array(buffer, cleanedAt, SCRATCH_UNITS);
  }
  return kernel5;
}
var distancesAt = 0;
var distancesRoom = 0;
function distancesFor(k) {
  if (k > distancesRoom) {
    distancesAt = francKernel().allocate(4 * k);
    distancesRoom = k;
  }
  return distancesAt;
}
function placeTables() {
  const kernel5 = francKernel();
  const foldedAt = kernel5.place(cleaningTable());
  const directAt = kernel5.place(directId);
  const internAt = kernel5.place(internTable);
  const tallyAt = kernel5.allocate((internCount + 1) * 2);
  const distinctAt = kernel5.allocate(SCRATCH_UNITS * 4);
  textAt = kernel5.allocate(MAX_LENGTH * 2);
  cleanedAt = kernel5.allocate(SCRATCH_UNITS * 2);
  new Uint16Array(kernel5.memory.buffer, tallyAt, internCount + 1).fill(0);
  kernel5.setTables(foldedAt, directAt, internAt, internBits, tallyAt, distinctAt, internCount);
}
function countTrigrams(kernel5, text, end) {
  kernel5.writeUtf16(textAt, text, end);
  const distinct = kernel5.countTrigrams(textAt, end);
  if (distinct >= 0) {
    const flags = kernel5.sampleFlags();
    sampleIsAscii = (flags & 1) !== 0;
    sampleHasAsciiLetter = (flags & 2) !== 0;
    return distinct;
  }
  const n = clean(text, end);
  return kernel5.countCleaned(cleanedAt, n);
}
function clean(text, end) {
  const folded2 = cleaningTable();
  let n = 0;
  cleaned[n++] = 32;
  let pendingSpace = false;
  let units = 0;
  let letter2 = false;
  for (let i = 0; i < end; i++) {
    const unit = text.charCodeAt(i);
    units |= unit;
    if (!letter2) letter2 = (unit | 32) - 97 >>> 0 < 26;
    const f = folded2[unit];
    if (f === SEPARATOR) {
      pendingSpace = n > 1;
      continue;
    }
    if (pendingSpace) {
      cleaned[n++] = 32;
      pendingSpace = false;
    }
    if (f !== CARE) {
      cleaned[n++] = f;
      continue;
    }
    if (unit === CAPITAL_SIGMA) {
      sampleIsAscii = false;
      return cleanNatively(text, end);
    }
    let piece;
    if (unit >= 55296 && unit <= 56319 && i + 1 < end && (text.charCodeAt(i + 1) & 64512) === 56320) {
      piece = text.slice(i, i + 2).toLowerCase();
      i++;
    } else piece = (unit & 63488) === 55296 ? String.fromCharCode(unit) : String.fromCharCode(unit).toLowerCase();
    for (let k = 0; k < piece.length; k++) cleaned[n++] = piece.charCodeAt(k);
  }
  cleaned[n++] = 32;
  sampleIsAscii = units < 128;
  sampleHasAsciiLetter = letter2;
  return n;
}
var sampleIsAscii = false;
var sampleHasAsciiLetter = false;
function cleanNatively(text, end) {
  const value = ` ${text.slice(0, end).replace(/[\u0021-\u0040]+/g, " ").replace(/\s+/g, " ").trim().toLowerCase()} `;
  for (let k = 0; k < value.length; k++) cleaned[k] = value.charCodeAt(k);
  return value.length;
}
function createFrancLabeller(only, minLength = MIN_LENGTH) {
  loadProfiles();
  const allowed = new Set(only);
  const anything = allowed.size === 0;
  const groups = FRANC_EXPRESSIONS.map((expression) => {
    const languages2 = groupLanguages.get(expression);
    if (!languages2) return null;
    return invert(expression, languages2.filter((l) => anything || allowed.has(l)));
  });
  const distances = distancesFor(Math.max(8, ...groups.map((g) => g?.stride ?? 0)));
  const label = (text) => {
    if (!text || text.length < minLength) return UND;
    const end = Math.min(text.length, MAX_LENGTH);
    const kernel5 = kernelWithViews();
    const distinct = countTrigrams(kernel5, text, end);
    const top = sampleIsAscii && ASCII_SHORTCUT ? { expression: sampleHasAsciiLetter ? LATIN : 0, count: sampleHasAsciiLetter ? 1 : 0 } : topExpression(kernel5, text, end);
    const name = FRANC_EXPRESSIONS[top.expression];
    const group = groups[top.expression];
    if (!group) return top.count === 0 || !(anything || allowed.has(name)) ? UND : name;
    const k = group.languages.length;
    if (k === 0) return UND;
    const best = kernel5.nearestDense(distinct, group.rowOfAt, group.rowsAt, group.stride, k, distances);
    return group.languages[best];
  };
  return Object.assign(label, { only: [...only] });
}
function francLanguages() {
  loadProfiles();
  const single = FRANC_EXPRESSIONS.filter((e) => !groupLanguages.has(e));
  return [.../* @__PURE__ */ new Set([...[...groupLanguages.values()].flat(), ...single])];
}

// src/measure/data/scripts.generated.ts
var SCRIPT_NAMES = ["Unknown", "Common", "Inherited", "Adlam", "Ahom", "Anatolian_Hieroglyphs", "Arabic", "Armenian", "Avestan", "Balinese", "Bamum", "Bassa_Vah", "Batak", "Bengali", "Beria_Erfe", "Bhaiksuki", "Bopomofo", "Brahmi", "Braille", "Buginese", "Buhid", "Canadian_Aboriginal", "Carian", "Caucasian_Albanian", "Chakma", "Cham", "Cherokee", "Chorasmian", "Coptic", "Cuneiform", "Cypriot", "Cypro_Minoan", "Cyrillic", "Deseret", "Devanagari", "Dives_Akuru", "Dogra", "Duployan", "Egyptian_Hieroglyphs", "Elbasan", "Elymaic", "Ethiopic", "Garay", "Georgian", "Glagolitic", "Gothic", "Grantha", "Greek", "Gujarati", "Gunjala_Gondi", "Gurmukhi", "Gurung_Khema", "Han", "Hangul", "Hanifi_Rohingya", "Hanunoo", "Hatran", "Hebrew", "Hiragana", "Imperial_Aramaic", "Inscriptional_Pahlavi", "Inscriptional_Parthian", "Javanese", "Kaithi", "Kannada", "Katakana", "Kawi", "Kayah_Li", "Kharoshthi", "Khitan_Small_Script", "Khmer", "Khojki", "Khudawadi", "Kirat_Rai", "Lao", "Latin", "Lepcha", "Limbu", "Linear_A", "Linear_B", "Lisu", "Lycian", "Lydian", "Mahajani", "Makasar", "Malayalam", "Mandaic", "Manichaean", "Marchen", "Masaram_Gondi", "Medefaidrin", "Meetei_Mayek", "Mende_Kikakui", "Meroitic_Cursive", "Meroitic_Hieroglyphs", "Miao", "Modi", "Mongolian", "Mro", "Multani", "Myanmar", "Nabataean", "Nag_Mundari", "Nandinagari", "New_Tai_Lue", "Newa", "Nko", "Nushu", "Nyiakeng_Puachue_Hmong", "Ogham", "Ol_Chiki", "Ol_Onal", "Old_Hungarian", "Old_Italic", "Old_North_Arabian", "Old_Permic", "Old_Persian", "Old_Sogdian", "Old_South_Arabian", "Old_Turkic", "Old_Uyghur", "Oriya", "Osage", "Osmanya", "Pahawh_Hmong", "Palmyrene", "Pau_Cin_Hau", "Phags_Pa", "Phoenician", "Psalter_Pahlavi", "Rejang", "Runic", "Samaritan", "Saurashtra", "Sharada", "Shavian", "Siddham", "Sidetic", "SignWriting", "Sinhala", "Sogdian", "Sora_Sompeng", "Soyombo", "Sundanese", "Sunuwar", "Syloti_Nagri", "Syriac", "Tagalog", "Tagbanwa", "Tai_Le", "Tai_Tham", "Tai_Viet", "Tai_Yo", "Takri", "Tamil", "Tangsa", "Tangut", "Telugu", "Thaana", "Thai", "Tibetan", "Tifinagh", "Tirhuta", "Todhri", "Tolong_Siki", "Toto", "Tulu_Tigalari", "Ugaritic", "Vai", "Vithkuqi", "Wancho", "Warang_Citi", "Yezidi", "Yi", "Zanabazar_Square"];
var SCRIPT_RANGE_STARTS = [
  0,
  65,
  91,
  97,
  123,
  170,
  171,
  186,
  187,
  192,
  215,
  216,
  247,
  248,
  697,
  736,
  741,
  746,
  748,
  768,
  880,
  884,
  885,
  888,
  890,
  894,
  895,
  896,
  900,
  901,
  902,
  903,
  904,
  907,
  908,
  909,
  910,
  930,
  931,
  994,
  1008,
  1024,
  1157,
  1159,
  1328,
  1329,
  1367,
  1369,
  1419,
  1421,
  1424,
  1425,
  1480,
  1488,
  1515,
  1519,
  1525,
  1536,
  1541,
  1542,
  1548,
  1549,
  1563,
  1564,
  1567,
  1568,
  1600,
  1601,
  1611,
  1622,
  1648,
  1649,
  1757,
  1758,
  1792,
  1806,
  1807,
  1867,
  1869,
  1872,
  1920,
  1970,
  1984,
  2043,
  2045,
  2048,
  2094,
  2096,
  2111,
  2112,
  2140,
  2142,
  2143,
  2144,
  2155,
  2160,
  2194,
  2199,
  2274,
  2275,
  2304,
  2385,
  2389,
  2404,
  2406,
  2432,
  2436,
  2437,
  2445,
  2447,
  2449,
  2451,
  2473,
  2474,
  2481,
  2482,
  2483,
  2486,
  2490,
  2492,
  2501,
  2503,
  2505,
  2507,
  2511,
  2519,
  2520,
  2524,
  2526,
  2527,
  2532,
  2534,
  2559,
  2561,
  2564,
  2565,
  2571,
  2575,
  2577,
  2579,
  2601,
  2602,
  2609,
  2610,
  2612,
  2613,
  2615,
  2616,
  2618,
  2620,
  2621,
  2622,
  2627,
  2631,
  2633,
  2635,
  2638,
  2641,
  2642,
  2649,
  2653,
  2654,
  2655,
  2662,
  2679,
  2689,
  2692,
  2693,
  2702,
  2703,
  2706,
  2707,
  2729,
  2730,
  2737,
  2738,
  2740,
  2741,
  2746,
  2748,
  2758,
  2759,
  2762,
  2763,
  2766,
  2768,
  2769,
  2784,
  2788,
  2790,
  2802,
  2809,
  2816,
  2817,
  2820,
  2821,
  2829,
  2831,
  2833,
  2835,
  2857,
  2858,
  2865,
  2866,
  2868,
  2869,
  2874,
  2876,
  2885,
  2887,
  2889,
  2891,
  2894,
  2901,
  2904,
  2908,
  2910,
  2911,
  2916,
  2918,
  2936,
  2946,
  2948,
  2949,
  2955,
  2958,
  2961,
  2962,
  2966,
  2969,
  2971,
  2972,
  2973,
  2974,
  2976,
  2979,
  2981,
  2984,
  2987,
  2990,
  3002,
  3006,
  3011,
  3014,
  3017,
  3018,
  3022,
  3024,
  3025,
  3031,
  3032,
  3046,
  3067,
  3072,
  3085,
  3086,
  3089,
  3090,
  3113,
  3114,
  3130,
  3132,
  3141,
  3142,
  3145,
  3146,
  3150,
  3157,
  3159,
  3160,
  3163,
  3164,
  3166,
  3168,
  3172,
  3174,
  3184,
  3191,
  3200,
  3213,
  3214,
  3217,
  3218,
  3241,
  3242,
  3252,
  3253,
  3258,
  3260,
  3269,
  3270,
  3273,
  3274,
  3278,
  3285,
  3287,
  3292,
  3295,
  3296,
  3300,
  3302,
  3312,
  3313,
  3316,
  3328,
  3341,
  3342,
  3345,
  3346,
  3397,
  3398,
  3401,
  3402,
  3408,
  3412,
  3428,
  3430,
  3456,
  3457,
  3460,
  3461,
  3479,
  3482,
  3506,
  3507,
  3516,
  3517,
  3518,
  3520,
  3527,
  3530,
  3531,
  3535,
  3541,
  3542,
  3543,
  3544,
  3552,
  3558,
  3568,
  3570,
  3573,
  3585,
  3643,
  3647,
  3648,
  3676,
  3713,
  3715,
  3716,
  3717,
  3718,
  3723,
  3724,
  3748,
  3749,
  3750,
  3751,
  3774,
  3776,
  3781,
  3782,
  3783,
  3784,
  3791,
  3792,
  3802,
  3804,
  3808,
  3840,
  3912,
  3913,
  3949,
  3953,
  3992,
  3993,
  4029,
  4030,
  4045,
  4046,
  4053,
  4057,
  4059,
  4096,
  4256,
  4294,
  4295,
  4296,
  4301,
  4302,
  4304,
  4347,
  4348,
  4352,
  4608,
  4681,
  4682,
  4686,
  4688,
  4695,
  4696,
  4697,
  4698,
  4702,
  4704,
  4745,
  4746,
  4750,
  4752,
  4785,
  4786,
  4790,
  4792,
  4799,
  4800,
  4801,
  4802,
  4806,
  4808,
  4823,
  4824,
  4881,
  4882,
  4886,
  4888,
  4955,
  4957,
  4989,
  4992,
  5018,
  5024,
  5110,
  5112,
  5118,
  5120,
  5760,
  5789,
  5792,
  5867,
  5870,
  5881,
  5888,
  5910,
  5919,
  5920,
  5941,
  5943,
  5952,
  5972,
  5984,
  5997,
  5998,
  6001,
  6002,
  6004,
  6016,
  6110,
  6112,
  6122,
  6128,
  6138,
  6144,
  6146,
  6148,
  6149,
  6150,
  6170,
  6176,
  6265,
  6272,
  6315,
  6320,
  6390,
  6400,
  6431,
  6432,
  6444,
  6448,
  6460,
  6464,
  6465,
  6468,
  6480,
  6510,
  6512,
  6517,
  6528,
  6572,
  6576,
  6602,
  6608,
  6619,
  6622,
  6624,
  6656,
  6684,
  6686,
  6688,
  6751,
  6752,
  6781,
  6783,
  6794,
  6800,
  6810,
  6816,
  6830,
  6832,
  6878,
  6880,
  6892,
  6912,
  6989,
  6990,
  7040,
  7104,
  7156,
  7164,
  7168,
  7224,
  7227,
  7242,
  7245,
  7248,
  7296,
  7307,
  7312,
  7355,
  7357,
  7360,
  7368,
  7376,
  7379,
  7380,
  7393,
  7394,
  7401,
  7405,
  7406,
  7412,
  7413,
  7416,
  7418,
  7419,
  7424,
  7462,
  7467,
  7468,
  7517,
  7522,
  7526,
  7531,
  7544,
  7545,
  7615,
  7616,
  7680,
  7936,
  7958,
  7960,
  7966,
  7968,
  8006,
  8008,
  8014,
  8016,
  8024,
  8025,
  8026,
  8027,
  8028,
  8029,
  8030,
  8031,
  8062,
  8064,
  8117,
  8118,
  8133,
  8134,
  8148,
  8150,
  8156,
  8157,
  8176,
  8178,
  8181,
  8182,
  8191,
  8192,
  8204,
  8206,
  8293,
  8294,
  8305,
  8306,
  8308,
  8319,
  8320,
  8335,
  8336,
  8349,
  8352,
  8386,
  8400,
  8433,
  8448,
  8486,
  8487,
  8490,
  8492,
  8498,
  8499,
  8526,
  8527,
  8544,
  8585,
  8588,
  8592,
  9258,
  9280,
  9291,
  9312,
  10240,
  10496,
  11124,
  11126,
  11264,
  11360,
  11392,
  11508,
  11513,
  11520,
  11558,
  11559,
  11560,
  11565,
  11566,
  11568,
  11624,
  11631,
  11633,
  11647,
  11648,
  11671,
  11680,
  11687,
  11688,
  11695,
  11696,
  11703,
  11704,
  11711,
  11712,
  11719,
  11720,
  11727,
  11728,
  11735,
  11736,
  11743,
  11744,
  11776,
  11870,
  11904,
  11930,
  11931,
  12020,
  12032,
  12246,
  12272,
  12293,
  12294,
  12295,
  12296,
  12321,
  12330,
  12334,
  12336,
  12344,
  12348,
  12352,
  12353,
  12439,
  12441,
  12443,
  12445,
  12448,
  12449,
  12539,
  12541,
  12544,
  12549,
  12592,
  12593,
  12687,
  12688,
  12704,
  12736,
  12774,
  12783,
  12784,
  12800,
  12831,
  12832,
  12896,
  12927,
  13008,
  13055,
  13056,
  13144,
  13312,
  19904,
  19968,
  40960,
  42125,
  42128,
  42183,
  42192,
  42240,
  42540,
  42560,
  42656,
  42744,
  42752,
  42786,
  42888,
  42891,
  42973,
  42993,
  43008,
  43053,
  43056,
  43066,
  43072,
  43128,
  43136,
  43206,
  43214,
  43226,
  43232,
  43264,
  43310,
  43311,
  43312,
  43348,
  43359,
  43360,
  43389,
  43392,
  43470,
  43471,
  43472,
  43482,
  43486,
  43488,
  43519,
  43520,
  43575,
  43584,
  43598,
  43600,
  43610,
  43612,
  43616,
  43648,
  43715,
  43739,
  43744,
  43767,
  43777,
  43783,
  43785,
  43791,
  43793,
  43799,
  43808,
  43815,
  43816,
  43823,
  43824,
  43867,
  43868,
  43877,
  43878,
  43882,
  43884,
  43888,
  43968,
  44014,
  44016,
  44026,
  44032,
  55204,
  55216,
  55239,
  55243,
  55292,
  63744,
  64110,
  64112,
  64218,
  64256,
  64263,
  64275,
  64280,
  64285,
  64311,
  64312,
  64317,
  64318,
  64319,
  64320,
  64322,
  64323,
  64325,
  64326,
  64336,
  64830,
  64832,
  64976,
  65008,
  65024,
  65040,
  65050,
  65056,
  65070,
  65072,
  65107,
  65108,
  65127,
  65128,
  65132,
  65136,
  65141,
  65142,
  65277,
  65279,
  65280,
  65281,
  65313,
  65339,
  65345,
  65371,
  65382,
  65392,
  65393,
  65438,
  65440,
  65471,
  65474,
  65480,
  65482,
  65488,
  65490,
  65496,
  65498,
  65501,
  65504,
  65511,
  65512,
  65519,
  65529,
  65534,
  65536,
  65548,
  65549,
  65575,
  65576,
  65595,
  65596,
  65598,
  65599,
  65614,
  65616,
  65630,
  65664,
  65787,
  65792,
  65795,
  65799,
  65844,
  65847,
  65856,
  65935,
  65936,
  65949,
  65952,
  65953,
  66e3,
  66045,
  66046,
  66176,
  66205,
  66208,
  66257,
  66272,
  66273,
  66300,
  66304,
  66340,
  66349,
  66352,
  66379,
  66384,
  66427,
  66432,
  66462,
  66463,
  66464,
  66500,
  66504,
  66518,
  66560,
  66640,
  66688,
  66718,
  66720,
  66730,
  66736,
  66772,
  66776,
  66812,
  66816,
  66856,
  66864,
  66916,
  66927,
  66928,
  66939,
  66940,
  66955,
  66956,
  66963,
  66964,
  66966,
  66967,
  66978,
  66979,
  66994,
  66995,
  67002,
  67003,
  67005,
  67008,
  67060,
  67072,
  67383,
  67392,
  67414,
  67424,
  67432,
  67456,
  67462,
  67463,
  67505,
  67506,
  67515,
  67584,
  67590,
  67592,
  67593,
  67594,
  67638,
  67639,
  67641,
  67644,
  67645,
  67647,
  67648,
  67670,
  67671,
  67680,
  67712,
  67743,
  67751,
  67760,
  67808,
  67827,
  67828,
  67830,
  67835,
  67840,
  67868,
  67871,
  67872,
  67898,
  67903,
  67904,
  67930,
  67968,
  68e3,
  68024,
  68028,
  68048,
  68050,
  68096,
  68100,
  68101,
  68103,
  68108,
  68116,
  68117,
  68120,
  68121,
  68150,
  68152,
  68155,
  68159,
  68169,
  68176,
  68185,
  68192,
  68224,
  68256,
  68288,
  68327,
  68331,
  68343,
  68352,
  68406,
  68409,
  68416,
  68438,
  68440,
  68448,
  68467,
  68472,
  68480,
  68498,
  68505,
  68509,
  68521,
  68528,
  68608,
  68681,
  68736,
  68787,
  68800,
  68851,
  68858,
  68864,
  68904,
  68912,
  68922,
  68928,
  68966,
  68969,
  68998,
  69006,
  69008,
  69216,
  69247,
  69248,
  69290,
  69291,
  69294,
  69296,
  69298,
  69314,
  69320,
  69328,
  69337,
  69370,
  69376,
  69416,
  69424,
  69466,
  69488,
  69514,
  69552,
  69580,
  69600,
  69623,
  69632,
  69710,
  69714,
  69750,
  69759,
  69760,
  69827,
  69837,
  69838,
  69840,
  69865,
  69872,
  69882,
  69888,
  69941,
  69942,
  69960,
  69968,
  70007,
  70016,
  70112,
  70113,
  70133,
  70144,
  70162,
  70163,
  70210,
  70272,
  70279,
  70280,
  70281,
  70282,
  70286,
  70287,
  70302,
  70303,
  70314,
  70320,
  70379,
  70384,
  70394,
  70400,
  70404,
  70405,
  70413,
  70415,
  70417,
  70419,
  70441,
  70442,
  70449,
  70450,
  70452,
  70453,
  70458,
  70459,
  70460,
  70469,
  70471,
  70473,
  70475,
  70478,
  70480,
  70481,
  70487,
  70488,
  70493,
  70500,
  70502,
  70509,
  70512,
  70517,
  70528,
  70538,
  70539,
  70540,
  70542,
  70543,
  70544,
  70582,
  70583,
  70593,
  70594,
  70595,
  70597,
  70598,
  70599,
  70603,
  70604,
  70614,
  70615,
  70617,
  70625,
  70627,
  70656,
  70748,
  70749,
  70754,
  70784,
  70856,
  70864,
  70874,
  71040,
  71094,
  71096,
  71134,
  71168,
  71237,
  71248,
  71258,
  71264,
  71277,
  71296,
  71354,
  71360,
  71370,
  71376,
  71396,
  71424,
  71451,
  71453,
  71468,
  71472,
  71495,
  71680,
  71740,
  71840,
  71923,
  71935,
  71936,
  71943,
  71945,
  71946,
  71948,
  71956,
  71957,
  71959,
  71960,
  71990,
  71991,
  71993,
  71995,
  72007,
  72016,
  72026,
  72096,
  72104,
  72106,
  72152,
  72154,
  72165,
  72192,
  72264,
  72272,
  72355,
  72368,
  72384,
  72441,
  72448,
  72458,
  72544,
  72552,
  72640,
  72674,
  72688,
  72698,
  72704,
  72713,
  72714,
  72759,
  72760,
  72774,
  72784,
  72813,
  72816,
  72848,
  72850,
  72872,
  72873,
  72887,
  72960,
  72967,
  72968,
  72970,
  72971,
  73015,
  73018,
  73019,
  73020,
  73022,
  73023,
  73032,
  73040,
  73050,
  73056,
  73062,
  73063,
  73065,
  73066,
  73103,
  73104,
  73106,
  73107,
  73113,
  73120,
  73130,
  73136,
  73180,
  73184,
  73194,
  73440,
  73465,
  73472,
  73489,
  73490,
  73531,
  73534,
  73563,
  73648,
  73649,
  73664,
  73714,
  73727,
  73728,
  74650,
  74752,
  74863,
  74864,
  74869,
  74880,
  75076,
  77712,
  77811,
  77824,
  78934,
  78944,
  82939,
  82944,
  83527,
  90368,
  90426,
  92160,
  92729,
  92736,
  92767,
  92768,
  92778,
  92782,
  92784,
  92863,
  92864,
  92874,
  92880,
  92910,
  92912,
  92918,
  92928,
  92998,
  93008,
  93018,
  93019,
  93026,
  93027,
  93048,
  93053,
  93072,
  93504,
  93562,
  93760,
  93851,
  93856,
  93881,
  93883,
  93908,
  93952,
  94027,
  94031,
  94088,
  94095,
  94112,
  94176,
  94177,
  94178,
  94180,
  94181,
  94192,
  94199,
  94208,
  101120,
  101590,
  101631,
  101632,
  101663,
  101760,
  101875,
  110576,
  110580,
  110581,
  110588,
  110589,
  110591,
  110592,
  110593,
  110880,
  110883,
  110898,
  110899,
  110928,
  110931,
  110933,
  110934,
  110948,
  110952,
  110960,
  111356,
  113664,
  113771,
  113776,
  113789,
  113792,
  113801,
  113808,
  113818,
  113820,
  113824,
  113828,
  117760,
  118013,
  118016,
  118452,
  118458,
  118481,
  118496,
  118513,
  118528,
  118574,
  118576,
  118599,
  118608,
  118724,
  118784,
  119030,
  119040,
  119079,
  119081,
  119143,
  119146,
  119163,
  119171,
  119173,
  119180,
  119210,
  119214,
  119275,
  119296,
  119366,
  119488,
  119508,
  119520,
  119540,
  119552,
  119639,
  119648,
  119673,
  119808,
  119893,
  119894,
  119965,
  119966,
  119968,
  119970,
  119971,
  119973,
  119975,
  119977,
  119981,
  119982,
  119994,
  119995,
  119996,
  119997,
  120004,
  120005,
  120070,
  120071,
  120075,
  120077,
  120085,
  120086,
  120093,
  120094,
  120122,
  120123,
  120127,
  120128,
  120133,
  120134,
  120135,
  120138,
  120145,
  120146,
  120486,
  120488,
  120780,
  120782,
  120832,
  121484,
  121499,
  121504,
  121505,
  121520,
  122624,
  122655,
  122661,
  122667,
  122880,
  122887,
  122888,
  122905,
  122907,
  122914,
  122915,
  122917,
  122918,
  122923,
  122928,
  122990,
  123023,
  123024,
  123136,
  123181,
  123184,
  123198,
  123200,
  123210,
  123214,
  123216,
  123536,
  123567,
  123584,
  123642,
  123647,
  123648,
  124112,
  124154,
  124368,
  124411,
  124415,
  124416,
  124608,
  124639,
  124640,
  124662,
  124670,
  124672,
  124896,
  124903,
  124904,
  124908,
  124909,
  124911,
  124912,
  124927,
  124928,
  125125,
  125127,
  125143,
  125184,
  125260,
  125264,
  125274,
  125278,
  125280,
  126065,
  126133,
  126209,
  126270,
  126464,
  126468,
  126469,
  126496,
  126497,
  126499,
  126500,
  126501,
  126503,
  126504,
  126505,
  126515,
  126516,
  126520,
  126521,
  126522,
  126523,
  126524,
  126530,
  126531,
  126535,
  126536,
  126537,
  126538,
  126539,
  126540,
  126541,
  126544,
  126545,
  126547,
  126548,
  126549,
  126551,
  126552,
  126553,
  126554,
  126555,
  126556,
  126557,
  126558,
  126559,
  126560,
  126561,
  126563,
  126564,
  126565,
  126567,
  126571,
  126572,
  126579,
  126580,
  126584,
  126585,
  126589,
  126590,
  126591,
  126592,
  126602,
  126603,
  126620,
  126625,
  126628,
  126629,
  126634,
  126635,
  126652,
  126704,
  126706,
  126976,
  127020,
  127024,
  127124,
  127136,
  127151,
  127153,
  127168,
  127169,
  127184,
  127185,
  127222,
  127232,
  127406,
  127462,
  127488,
  127489,
  127491,
  127504,
  127548,
  127552,
  127561,
  127568,
  127570,
  127584,
  127590,
  127744,
  128729,
  128732,
  128749,
  128752,
  128765,
  128768,
  128986,
  128992,
  129004,
  129008,
  129009,
  129024,
  129036,
  129040,
  129096,
  129104,
  129114,
  129120,
  129160,
  129168,
  129198,
  129200,
  129212,
  129216,
  129218,
  129232,
  129241,
  129280,
  129624,
  129632,
  129646,
  129648,
  129661,
  129664,
  129675,
  129678,
  129735,
  129736,
  129737,
  129741,
  129757,
  129759,
  129771,
  129775,
  129785,
  129792,
  129939,
  129940,
  130043,
  131072,
  173792,
  173824,
  178206,
  178208,
  183982,
  183984,
  191457,
  191472,
  192094,
  194560,
  195102,
  196608,
  201547,
  201552,
  210042,
  917505,
  917506,
  917536,
  917632,
  917760,
  918e3
];
var SCRIPT_RANGE_IDS = [
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  16,
  1,
  2,
  47,
  1,
  47,
  0,
  47,
  1,
  47,
  0,
  47,
  1,
  47,
  1,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  28,
  47,
  32,
  2,
  32,
  0,
  7,
  0,
  7,
  0,
  7,
  0,
  57,
  0,
  57,
  0,
  57,
  0,
  6,
  1,
  6,
  1,
  6,
  1,
  6,
  1,
  6,
  1,
  6,
  2,
  6,
  2,
  6,
  1,
  6,
  146,
  0,
  146,
  0,
  146,
  6,
  158,
  0,
  106,
  0,
  106,
  132,
  0,
  132,
  0,
  86,
  0,
  86,
  0,
  146,
  0,
  6,
  0,
  6,
  1,
  6,
  34,
  2,
  34,
  1,
  34,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  13,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  50,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  48,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  121,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  154,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  0,
  157,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  64,
  0,
  85,
  0,
  85,
  0,
  85,
  0,
  85,
  0,
  85,
  0,
  85,
  0,
  85,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  139,
  0,
  159,
  0,
  1,
  159,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  74,
  0,
  160,
  0,
  160,
  0,
  160,
  0,
  160,
  0,
  160,
  0,
  160,
  1,
  160,
  0,
  100,
  43,
  0,
  43,
  0,
  43,
  0,
  43,
  1,
  43,
  53,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  26,
  0,
  26,
  0,
  21,
  109,
  0,
  131,
  1,
  131,
  0,
  147,
  0,
  147,
  55,
  1,
  0,
  20,
  0,
  148,
  0,
  148,
  0,
  148,
  0,
  70,
  0,
  70,
  0,
  70,
  0,
  97,
  1,
  97,
  1,
  97,
  0,
  97,
  0,
  97,
  0,
  21,
  0,
  77,
  0,
  77,
  0,
  77,
  0,
  77,
  0,
  77,
  149,
  0,
  149,
  0,
  104,
  0,
  104,
  0,
  104,
  0,
  104,
  70,
  19,
  0,
  19,
  150,
  0,
  150,
  0,
  150,
  0,
  150,
  0,
  150,
  0,
  2,
  0,
  2,
  0,
  9,
  0,
  9,
  143,
  12,
  0,
  12,
  76,
  0,
  76,
  0,
  76,
  110,
  32,
  0,
  43,
  0,
  43,
  143,
  0,
  2,
  1,
  2,
  1,
  2,
  1,
  2,
  1,
  2,
  1,
  2,
  1,
  0,
  75,
  47,
  32,
  75,
  47,
  75,
  47,
  75,
  32,
  75,
  47,
  2,
  75,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  47,
  0,
  1,
  2,
  1,
  0,
  1,
  75,
  0,
  1,
  75,
  1,
  0,
  75,
  0,
  1,
  0,
  2,
  0,
  1,
  47,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  75,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  18,
  1,
  0,
  1,
  44,
  75,
  28,
  0,
  28,
  43,
  0,
  43,
  0,
  43,
  0,
  161,
  0,
  161,
  0,
  161,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  32,
  1,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  1,
  52,
  1,
  52,
  1,
  52,
  2,
  53,
  1,
  52,
  1,
  0,
  58,
  0,
  2,
  1,
  58,
  1,
  65,
  1,
  65,
  0,
  16,
  0,
  53,
  0,
  1,
  16,
  1,
  0,
  1,
  65,
  53,
  0,
  1,
  53,
  1,
  65,
  1,
  65,
  1,
  52,
  1,
  52,
  173,
  0,
  173,
  0,
  80,
  168,
  0,
  32,
  10,
  0,
  1,
  75,
  1,
  75,
  0,
  75,
  145,
  0,
  1,
  0,
  127,
  0,
  133,
  0,
  133,
  0,
  34,
  67,
  1,
  67,
  130,
  0,
  130,
  53,
  0,
  62,
  0,
  1,
  62,
  0,
  62,
  100,
  0,
  25,
  0,
  25,
  0,
  25,
  0,
  25,
  100,
  151,
  0,
  151,
  91,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  75,
  1,
  75,
  47,
  75,
  1,
  0,
  26,
  91,
  0,
  91,
  0,
  53,
  0,
  53,
  0,
  53,
  0,
  52,
  0,
  52,
  0,
  75,
  0,
  7,
  0,
  57,
  0,
  57,
  0,
  57,
  0,
  57,
  0,
  57,
  0,
  57,
  6,
  1,
  6,
  0,
  6,
  2,
  1,
  0,
  2,
  32,
  1,
  0,
  1,
  0,
  1,
  0,
  6,
  0,
  6,
  0,
  1,
  0,
  1,
  75,
  1,
  75,
  1,
  65,
  1,
  65,
  1,
  53,
  0,
  53,
  0,
  53,
  0,
  53,
  0,
  53,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  79,
  0,
  79,
  0,
  79,
  0,
  79,
  0,
  79,
  0,
  79,
  0,
  79,
  0,
  1,
  0,
  1,
  0,
  1,
  47,
  0,
  1,
  0,
  47,
  0,
  1,
  2,
  0,
  81,
  0,
  22,
  0,
  2,
  1,
  0,
  113,
  0,
  113,
  45,
  0,
  115,
  0,
  167,
  0,
  167,
  116,
  0,
  116,
  0,
  33,
  135,
  123,
  0,
  123,
  0,
  122,
  0,
  122,
  0,
  39,
  0,
  23,
  0,
  23,
  169,
  0,
  169,
  0,
  169,
  0,
  169,
  0,
  169,
  0,
  169,
  0,
  169,
  0,
  169,
  0,
  163,
  0,
  78,
  0,
  78,
  0,
  78,
  0,
  75,
  0,
  75,
  0,
  75,
  0,
  30,
  0,
  30,
  0,
  30,
  0,
  30,
  0,
  30,
  0,
  30,
  59,
  0,
  59,
  125,
  101,
  0,
  101,
  0,
  56,
  0,
  56,
  0,
  56,
  128,
  0,
  128,
  82,
  0,
  82,
  137,
  0,
  94,
  93,
  0,
  93,
  0,
  93,
  68,
  0,
  68,
  0,
  68,
  0,
  68,
  0,
  68,
  0,
  68,
  0,
  68,
  0,
  68,
  0,
  118,
  114,
  0,
  87,
  0,
  87,
  0,
  8,
  0,
  8,
  61,
  0,
  61,
  60,
  0,
  60,
  129,
  0,
  129,
  0,
  129,
  0,
  119,
  0,
  112,
  0,
  112,
  0,
  112,
  54,
  0,
  54,
  0,
  42,
  0,
  42,
  0,
  42,
  0,
  6,
  0,
  172,
  0,
  172,
  0,
  172,
  0,
  6,
  0,
  6,
  0,
  6,
  117,
  0,
  140,
  0,
  120,
  0,
  27,
  0,
  40,
  0,
  17,
  0,
  17,
  0,
  17,
  63,
  0,
  63,
  0,
  141,
  0,
  141,
  0,
  24,
  0,
  24,
  0,
  83,
  0,
  134,
  0,
  139,
  0,
  71,
  0,
  71,
  0,
  99,
  0,
  99,
  0,
  99,
  0,
  99,
  0,
  99,
  0,
  72,
  0,
  72,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  2,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  46,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  166,
  0,
  105,
  0,
  105,
  0,
  162,
  0,
  162,
  0,
  136,
  0,
  136,
  0,
  96,
  0,
  96,
  0,
  97,
  0,
  153,
  0,
  153,
  0,
  100,
  0,
  4,
  0,
  4,
  0,
  4,
  0,
  36,
  0,
  171,
  0,
  171,
  35,
  0,
  35,
  0,
  35,
  0,
  35,
  0,
  35,
  0,
  35,
  0,
  35,
  0,
  35,
  0,
  103,
  0,
  103,
  0,
  103,
  0,
  174,
  0,
  142,
  0,
  21,
  126,
  0,
  34,
  0,
  134,
  0,
  144,
  0,
  144,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  15,
  0,
  88,
  0,
  88,
  0,
  88,
  0,
  89,
  0,
  89,
  0,
  89,
  0,
  89,
  0,
  89,
  0,
  89,
  0,
  89,
  0,
  49,
  0,
  49,
  0,
  49,
  0,
  49,
  0,
  49,
  0,
  49,
  0,
  164,
  0,
  164,
  0,
  84,
  0,
  66,
  0,
  66,
  0,
  66,
  0,
  80,
  0,
  154,
  0,
  154,
  29,
  0,
  29,
  0,
  29,
  0,
  29,
  0,
  31,
  0,
  38,
  0,
  38,
  0,
  5,
  0,
  51,
  0,
  10,
  0,
  98,
  0,
  98,
  0,
  98,
  155,
  0,
  155,
  0,
  11,
  0,
  11,
  0,
  124,
  0,
  124,
  0,
  124,
  0,
  124,
  0,
  124,
  0,
  73,
  0,
  90,
  0,
  14,
  0,
  14,
  0,
  95,
  0,
  95,
  0,
  95,
  0,
  156,
  107,
  52,
  69,
  0,
  52,
  0,
  156,
  69,
  0,
  69,
  156,
  0,
  156,
  0,
  65,
  0,
  65,
  0,
  65,
  0,
  65,
  58,
  65,
  0,
  58,
  0,
  58,
  0,
  65,
  0,
  65,
  0,
  107,
  0,
  37,
  0,
  37,
  0,
  37,
  0,
  37,
  0,
  37,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  2,
  0,
  2,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  2,
  1,
  2,
  1,
  2,
  1,
  2,
  1,
  0,
  47,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  138,
  0,
  138,
  0,
  138,
  0,
  75,
  0,
  75,
  0,
  44,
  0,
  44,
  0,
  44,
  0,
  44,
  0,
  44,
  0,
  32,
  0,
  32,
  0,
  108,
  0,
  108,
  0,
  108,
  0,
  108,
  0,
  165,
  0,
  170,
  0,
  170,
  0,
  102,
  0,
  111,
  0,
  111,
  0,
  152,
  0,
  152,
  0,
  152,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  41,
  0,
  92,
  0,
  92,
  0,
  3,
  0,
  3,
  0,
  3,
  0,
  1,
  0,
  1,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  6,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  58,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  52,
  0,
  1,
  0,
  1,
  0,
  2,
  0
];

// src/measure/script.ts
var FIRST_COUNTED_ID = 3;
var scriptTable = lazyRangeTable(SCRIPT_RANGE_STARTS, SCRIPT_RANGE_IDS);
function bmpScriptIds() {
  return scriptTable().bmp;
}
function astralScriptId(cp) {
  return scriptTable().astral(cp);
}
function scriptProfile(text) {
  const counts = new Int32Array(SCRIPT_NAMES.length);
  const table3 = bmpScriptIds();
  for (let i = 0; i < text.length; i++) {
    const unit = text.charCodeAt(i);
    let id;
    if (unit >= 55296 && unit <= 56319 && i + 1 < text.length) {
      const low = text.charCodeAt(i + 1);
      if (low >= 56320 && low <= 57343) {
        id = astralScriptId((unit - 55296 << 10) + (low - 56320) + 65536);
        i++;
      } else id = table3[unit];
    } else id = table3[unit];
    counts[id] = counts[id] + 1;
  }
  return profileFromCounts(counts);
}
function profileFromCounts(counts) {
  const profile = {};
  for (let id = FIRST_COUNTED_ID; id < counts.length; id++) {
    const n = counts[id];
    if (n > 0) profile[SCRIPT_NAMES[id]] = n;
  }
  return profile;
}
function dominantScriptOf(profile) {
  let best = null;
  let bestCount = 0;
  for (const name in profile) {
    const n = profile[name];
    if (n > bestCount || n === bestCount && best !== null && name < best) {
      best = name;
      bestCount = n;
    }
  }
  return best;
}

// src/measure/language.ts
var OTHER2 = "other";
var UNDETERMINED = "und";
function iso6393Of(code) {
  const c = code.toLowerCase();
  if (c.length === 2) return isoTables().by1.get(c)?.iso6393;
  if (c.length === 3) return isoTables().by2B.get(c)?.iso6393 ?? c;
  return void 0;
}
function createLanguageDetector(languages2, detection) {
  const keyOfLabel = /* @__PURE__ */ new Map();
  for (const spec of languages2) {
    for (const code of [spec.iso6393, ...spec.covers]) if (!keyOfLabel.has(code)) keyOfLabel.set(code, spec.key);
  }
  const keyOfMacrolanguage = /* @__PURE__ */ new Map();
  for (const [macro, members] of Object.entries(MACROLANGUAGE_MEMBERS)) {
    const keys = new Set(members.map((m) => keyOfLabel.get(m)).filter((k) => k !== void 0));
    if (keys.size === 1 && !keyOfLabel.has(macro)) keyOfMacrolanguage.set(macro, [...keys][0]);
  }
  const scriptsOfKey = new Map(languages2.map((spec) => [spec.key, spec.scripts]));
  const keyOfLowerKey = new Map(languages2.map((spec) => [spec.key.toLowerCase(), spec.key]));
  const routes = /* @__PURE__ */ new Map();
  let francKnows;
  const declaredCache = /* @__PURE__ */ new Map();
  const routeOf = (script) => {
    const cached = routes.get(script);
    if (cached !== void 0) return cached;
    const listing = languages2.filter((spec) => spec.scripts.includes(script));
    const candidates = new Set(MAJOR_LANGUAGES[script] ?? []);
    for (const spec of listing) for (const code of [spec.iso6393, ...spec.covers]) candidates.add(code);
    const known = francKnows ??= new Set(francLanguages());
    const labellable = [...candidates].filter((code) => known.has(code));
    let route = null;
    if (labellable.length > 1) route = { labeller: createFrancLabeller(labellable, 1) };
    else if (listing.length > 0) route = { direct: listing[0].iso6393 };
    else if (candidates.size > 0) route = { direct: labellable[0] ?? [...candidates][0] };
    routes.set(script, route);
    return route;
  };
  const labelWith = (route, text) => route === null ? UNDETERMINED : "direct" in route ? route.direct : route.labeller(text);
  const decide = (detected) => ({
    detected,
    language: detected === UNDETERMINED ? UNDETERMINED : keyOfLabel.get(detected) ?? OTHER2
  });
  return {
    detect(text, dominantScript, letters) {
      if (dominantScript === null || letters < detection.minChars) return { detected: UNDETERMINED, language: UNDETERMINED };
      const route = routeOf(dominantScript);
      if (route === null) return { detected: UNDETERMINED, language: OTHER2 };
      let detected = labelWith(route, text);
      if (detected === UNDETERMINED && text.length > MAX_LENGTH) {
        const sampleScript = dominantScriptOf(scriptProfile(text.slice(0, MAX_LENGTH)));
        if (sampleScript !== null && sampleScript !== dominantScript) detected = labelWith(routeOf(sampleScript), text);
      }
      return decide(detected);
    },
    declared(value) {
      const cached = declaredCache.get(value);
      if (cached !== void 0) return cached;
      const trimmed = value.trim();
      let key = keyOfLowerKey.get(trimmed.toLowerCase());
      if (key === void 0) {
        const subtag = parse(trimmed.replace(/_/g, "-"), { forgiving: true }).language;
        const code = subtag ? iso6393Of(subtag) : void 0;
        key = code && (keyOfLabel.get(code) ?? keyOfMacrolanguage.get(code)) || OTHER2;
      }
      if (declaredCache.size < 1e4) declaredCache.set(value, key);
      return key;
    },
    scriptsOf(key) {
      return scriptsOfKey.get(key);
    }
  };
}

// src/measure/data/word-break.generated.ts
var WORD_BREAK_RANGE_STARTS = [
  0,
  34,
  35,
  39,
  40,
  44,
  45,
  46,
  47,
  48,
  58,
  59,
  60,
  65,
  91,
  95,
  96,
  97,
  123,
  169,
  170,
  171,
  173,
  174,
  175,
  181,
  182,
  183,
  184,
  185,
  186,
  187,
  192,
  215,
  216,
  247,
  248,
  728,
  734,
  746,
  748,
  768,
  880,
  885,
  886,
  888,
  890,
  894,
  895,
  896,
  902,
  903,
  904,
  907,
  908,
  909,
  910,
  930,
  931,
  1014,
  1015,
  1154,
  1155,
  1162,
  1328,
  1329,
  1367,
  1369,
  1373,
  1374,
  1375,
  1376,
  1417,
  1418,
  1419,
  1425,
  1470,
  1471,
  1472,
  1473,
  1475,
  1476,
  1478,
  1479,
  1480,
  1488,
  1515,
  1519,
  1523,
  1524,
  1525,
  1536,
  1542,
  1548,
  1550,
  1552,
  1563,
  1564,
  1565,
  1568,
  1611,
  1632,
  1642,
  1643,
  1644,
  1645,
  1646,
  1648,
  1649,
  1748,
  1749,
  1750,
  1757,
  1758,
  1759,
  1765,
  1767,
  1769,
  1770,
  1774,
  1776,
  1786,
  1789,
  1791,
  1792,
  1807,
  1809,
  1810,
  1840,
  1867,
  1869,
  1958,
  1969,
  1970,
  1984,
  1994,
  2027,
  2036,
  2038,
  2040,
  2041,
  2042,
  2043,
  2045,
  2046,
  2048,
  2070,
  2074,
  2075,
  2084,
  2085,
  2088,
  2089,
  2094,
  2112,
  2137,
  2140,
  2144,
  2155,
  2160,
  2184,
  2185,
  2192,
  2194,
  2199,
  2208,
  2250,
  2274,
  2275,
  2308,
  2362,
  2365,
  2366,
  2384,
  2385,
  2392,
  2402,
  2404,
  2406,
  2416,
  2417,
  2433,
  2436,
  2437,
  2445,
  2447,
  2449,
  2451,
  2473,
  2474,
  2481,
  2482,
  2483,
  2486,
  2490,
  2492,
  2493,
  2494,
  2501,
  2503,
  2505,
  2507,
  2510,
  2511,
  2519,
  2520,
  2524,
  2526,
  2527,
  2530,
  2532,
  2534,
  2544,
  2546,
  2556,
  2557,
  2558,
  2559,
  2561,
  2564,
  2565,
  2571,
  2575,
  2577,
  2579,
  2601,
  2602,
  2609,
  2610,
  2612,
  2613,
  2615,
  2616,
  2618,
  2620,
  2621,
  2622,
  2627,
  2631,
  2633,
  2635,
  2638,
  2641,
  2642,
  2649,
  2653,
  2654,
  2655,
  2662,
  2672,
  2674,
  2677,
  2678,
  2689,
  2692,
  2693,
  2702,
  2703,
  2706,
  2707,
  2729,
  2730,
  2737,
  2738,
  2740,
  2741,
  2746,
  2748,
  2749,
  2750,
  2758,
  2759,
  2762,
  2763,
  2766,
  2768,
  2769,
  2784,
  2786,
  2788,
  2790,
  2800,
  2809,
  2810,
  2816,
  2817,
  2820,
  2821,
  2829,
  2831,
  2833,
  2835,
  2857,
  2858,
  2865,
  2866,
  2868,
  2869,
  2874,
  2876,
  2877,
  2878,
  2885,
  2887,
  2889,
  2891,
  2894,
  2901,
  2904,
  2908,
  2910,
  2911,
  2914,
  2916,
  2918,
  2928,
  2929,
  2930,
  2946,
  2947,
  2948,
  2949,
  2955,
  2958,
  2961,
  2962,
  2966,
  2969,
  2971,
  2972,
  2973,
  2974,
  2976,
  2979,
  2981,
  2984,
  2987,
  2990,
  3002,
  3006,
  3011,
  3014,
  3017,
  3018,
  3022,
  3024,
  3025,
  3031,
  3032,
  3046,
  3056,
  3072,
  3077,
  3085,
  3086,
  3089,
  3090,
  3113,
  3114,
  3130,
  3132,
  3133,
  3134,
  3141,
  3142,
  3145,
  3146,
  3150,
  3157,
  3159,
  3160,
  3163,
  3164,
  3166,
  3168,
  3170,
  3172,
  3174,
  3184,
  3200,
  3201,
  3204,
  3205,
  3213,
  3214,
  3217,
  3218,
  3241,
  3242,
  3252,
  3253,
  3258,
  3260,
  3261,
  3262,
  3269,
  3270,
  3273,
  3274,
  3278,
  3285,
  3287,
  3292,
  3295,
  3296,
  3298,
  3300,
  3302,
  3312,
  3313,
  3315,
  3316,
  3328,
  3332,
  3341,
  3342,
  3345,
  3346,
  3387,
  3389,
  3390,
  3397,
  3398,
  3401,
  3402,
  3406,
  3407,
  3412,
  3415,
  3416,
  3423,
  3426,
  3428,
  3430,
  3440,
  3450,
  3456,
  3457,
  3460,
  3461,
  3479,
  3482,
  3506,
  3507,
  3516,
  3517,
  3518,
  3520,
  3527,
  3530,
  3531,
  3535,
  3541,
  3542,
  3543,
  3544,
  3552,
  3558,
  3568,
  3570,
  3572,
  3585,
  3643,
  3648,
  3663,
  3664,
  3674,
  3713,
  3715,
  3716,
  3717,
  3718,
  3723,
  3724,
  3748,
  3749,
  3750,
  3751,
  3774,
  3776,
  3781,
  3782,
  3783,
  3784,
  3791,
  3792,
  3802,
  3804,
  3808,
  3840,
  3841,
  3864,
  3866,
  3872,
  3882,
  3893,
  3894,
  3895,
  3896,
  3897,
  3898,
  3902,
  3904,
  3912,
  3913,
  3949,
  3953,
  3973,
  3974,
  3976,
  3981,
  3992,
  3993,
  4029,
  4038,
  4039,
  4096,
  4160,
  4170,
  4176,
  4240,
  4250,
  4256,
  4294,
  4295,
  4296,
  4301,
  4302,
  4304,
  4347,
  4348,
  4352,
  4608,
  4681,
  4682,
  4686,
  4688,
  4695,
  4696,
  4697,
  4698,
  4702,
  4704,
  4745,
  4746,
  4750,
  4752,
  4785,
  4786,
  4790,
  4792,
  4799,
  4800,
  4801,
  4802,
  4806,
  4808,
  4823,
  4824,
  4881,
  4882,
  4886,
  4888,
  4955,
  4957,
  4960,
  4992,
  5008,
  5024,
  5110,
  5112,
  5118,
  5121,
  5741,
  5743,
  5760,
  5761,
  5787,
  5792,
  5867,
  5870,
  5881,
  5888,
  5906,
  5910,
  5919,
  5938,
  5941,
  5952,
  5970,
  5972,
  5984,
  5997,
  5998,
  6001,
  6002,
  6004,
  6016,
  6100,
  6103,
  6104,
  6108,
  6110,
  6112,
  6122,
  6155,
  6160,
  6170,
  6176,
  6265,
  6272,
  6277,
  6279,
  6313,
  6314,
  6315,
  6320,
  6390,
  6400,
  6431,
  6432,
  6444,
  6448,
  6460,
  6470,
  6480,
  6510,
  6512,
  6517,
  6528,
  6572,
  6576,
  6602,
  6608,
  6619,
  6622,
  6624,
  6656,
  6679,
  6684,
  6688,
  6751,
  6752,
  6781,
  6783,
  6784,
  6794,
  6800,
  6810,
  6816,
  6830,
  6832,
  6878,
  6880,
  6892,
  6912,
  6917,
  6964,
  6981,
  6989,
  6992,
  7002,
  7019,
  7028,
  7040,
  7043,
  7073,
  7086,
  7088,
  7098,
  7142,
  7156,
  7168,
  7204,
  7224,
  7232,
  7242,
  7245,
  7248,
  7258,
  7294,
  7296,
  7307,
  7312,
  7355,
  7357,
  7360,
  7376,
  7379,
  7380,
  7401,
  7405,
  7406,
  7412,
  7413,
  7415,
  7418,
  7419,
  7424,
  7616,
  7680,
  7958,
  7960,
  7966,
  7968,
  8006,
  8008,
  8014,
  8016,
  8024,
  8025,
  8026,
  8027,
  8028,
  8029,
  8030,
  8031,
  8062,
  8064,
  8117,
  8118,
  8125,
  8126,
  8127,
  8130,
  8133,
  8134,
  8141,
  8144,
  8148,
  8150,
  8156,
  8160,
  8173,
  8178,
  8181,
  8182,
  8189,
  8204,
  8208,
  8216,
  8218,
  8228,
  8229,
  8231,
  8232,
  8234,
  8239,
  8240,
  8252,
  8253,
  8255,
  8257,
  8260,
  8261,
  8265,
  8266,
  8276,
  8277,
  8288,
  8293,
  8294,
  8304,
  8305,
  8306,
  8319,
  8320,
  8336,
  8349,
  8400,
  8433,
  8450,
  8451,
  8455,
  8456,
  8458,
  8468,
  8469,
  8470,
  8473,
  8478,
  8482,
  8483,
  8484,
  8485,
  8486,
  8487,
  8488,
  8489,
  8490,
  8494,
  8495,
  8505,
  8506,
  8508,
  8512,
  8517,
  8522,
  8526,
  8527,
  8544,
  8585,
  8596,
  8602,
  8617,
  8619,
  8986,
  8988,
  9e3,
  9001,
  9167,
  9168,
  9193,
  9204,
  9208,
  9211,
  9398,
  9410,
  9411,
  9450,
  9642,
  9644,
  9654,
  9655,
  9664,
  9665,
  9723,
  9727,
  9728,
  9733,
  9742,
  9743,
  9745,
  9746,
  9748,
  9750,
  9752,
  9753,
  9757,
  9758,
  9760,
  9761,
  9762,
  9764,
  9766,
  9767,
  9770,
  9771,
  9774,
  9776,
  9784,
  9787,
  9792,
  9793,
  9794,
  9795,
  9800,
  9812,
  9823,
  9825,
  9827,
  9828,
  9829,
  9831,
  9832,
  9833,
  9851,
  9852,
  9854,
  9856,
  9874,
  9880,
  9881,
  9882,
  9883,
  9885,
  9888,
  9890,
  9895,
  9896,
  9898,
  9900,
  9904,
  9906,
  9917,
  9919,
  9924,
  9926,
  9928,
  9929,
  9934,
  9936,
  9937,
  9938,
  9939,
  9941,
  9961,
  9963,
  9968,
  9974,
  9975,
  9979,
  9981,
  9982,
  9986,
  9987,
  9989,
  9990,
  9992,
  9998,
  9999,
  1e4,
  10002,
  10003,
  10004,
  10005,
  10006,
  10007,
  10013,
  10014,
  10017,
  10018,
  10024,
  10025,
  10035,
  10037,
  10052,
  10053,
  10055,
  10056,
  10060,
  10061,
  10062,
  10063,
  10067,
  10070,
  10071,
  10072,
  10083,
  10085,
  10133,
  10136,
  10145,
  10146,
  10160,
  10161,
  10175,
  10176,
  10548,
  10550,
  11013,
  11016,
  11035,
  11037,
  11088,
  11089,
  11093,
  11094,
  11264,
  11493,
  11499,
  11503,
  11506,
  11508,
  11520,
  11558,
  11559,
  11560,
  11565,
  11566,
  11568,
  11624,
  11631,
  11632,
  11647,
  11648,
  11671,
  11680,
  11687,
  11688,
  11695,
  11696,
  11703,
  11704,
  11711,
  11712,
  11719,
  11720,
  11727,
  11728,
  11735,
  11736,
  11743,
  11744,
  11776,
  11823,
  11824,
  11904,
  11930,
  11931,
  12020,
  12032,
  12246,
  12293,
  12296,
  12321,
  12330,
  12334,
  12336,
  12337,
  12342,
  12344,
  12348,
  12349,
  12350,
  12353,
  12439,
  12441,
  12443,
  12539,
  12540,
  12544,
  12549,
  12592,
  12593,
  12687,
  12704,
  12736,
  12784,
  12831,
  12896,
  12927,
  12951,
  12952,
  12953,
  12954,
  13008,
  13055,
  13056,
  13144,
  13312,
  19904,
  19968,
  42125,
  42128,
  42183,
  42192,
  42238,
  42240,
  42509,
  42512,
  42528,
  42538,
  42540,
  42560,
  42607,
  42611,
  42612,
  42622,
  42623,
  42654,
  42656,
  42736,
  42738,
  42760,
  42973,
  42993,
  43010,
  43011,
  43014,
  43015,
  43019,
  43020,
  43043,
  43048,
  43052,
  43053,
  43072,
  43124,
  43136,
  43138,
  43188,
  43206,
  43216,
  43226,
  43232,
  43250,
  43256,
  43259,
  43260,
  43261,
  43263,
  43264,
  43274,
  43302,
  43310,
  43312,
  43335,
  43348,
  43360,
  43389,
  43392,
  43396,
  43443,
  43457,
  43471,
  43472,
  43482,
  43488,
  43504,
  43514,
  43519,
  43520,
  43561,
  43575,
  43584,
  43587,
  43588,
  43596,
  43598,
  43600,
  43610,
  43616,
  43715,
  43739,
  43744,
  43755,
  43760,
  43762,
  43765,
  43767,
  43777,
  43783,
  43785,
  43791,
  43793,
  43799,
  43808,
  43815,
  43816,
  43823,
  43824,
  43882,
  43888,
  44003,
  44011,
  44012,
  44014,
  44016,
  44026,
  44032,
  55204,
  55216,
  55239,
  55243,
  55292,
  55296,
  57344,
  63744,
  64110,
  64112,
  64218,
  64256,
  64263,
  64275,
  64280,
  64285,
  64286,
  64287,
  64297,
  64298,
  64311,
  64312,
  64317,
  64318,
  64319,
  64320,
  64322,
  64323,
  64325,
  64326,
  64336,
  64434,
  64467,
  64830,
  64848,
  64912,
  64914,
  64968,
  65008,
  65020,
  65024,
  65040,
  65043,
  65044,
  65056,
  65072,
  65075,
  65077,
  65101,
  65104,
  65105,
  65106,
  65107,
  65108,
  65109,
  65110,
  65136,
  65141,
  65142,
  65277,
  65279,
  65280,
  65287,
  65288,
  65292,
  65293,
  65294,
  65295,
  65296,
  65306,
  65307,
  65308,
  65313,
  65339,
  65343,
  65344,
  65345,
  65371,
  65382,
  65438,
  65440,
  65471,
  65474,
  65480,
  65482,
  65488,
  65490,
  65496,
  65498,
  65501,
  65529,
  65532
];
var WORD_BREAK_RANGE_VALUES = [
  0,
  9,
  0,
  8,
  0,
  6,
  0,
  7,
  0,
  3,
  5,
  6,
  0,
  1,
  0,
  4,
  0,
  1,
  0,
  16,
  1,
  0,
  10,
  16,
  0,
  1,
  0,
  5,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  11,
  1,
  10,
  1,
  0,
  1,
  0,
  1,
  6,
  1,
  0,
  1,
  5,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  5,
  1,
  6,
  1,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  2,
  0,
  2,
  1,
  5,
  0,
  3,
  0,
  6,
  0,
  10,
  0,
  10,
  0,
  1,
  10,
  3,
  0,
  3,
  6,
  0,
  1,
  10,
  1,
  0,
  1,
  10,
  3,
  0,
  10,
  1,
  10,
  0,
  10,
  1,
  3,
  1,
  0,
  1,
  0,
  1,
  10,
  1,
  10,
  0,
  1,
  10,
  1,
  0,
  3,
  1,
  10,
  1,
  0,
  6,
  0,
  1,
  0,
  10,
  0,
  1,
  10,
  1,
  10,
  1,
  10,
  1,
  10,
  0,
  1,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  3,
  0,
  10,
  1,
  10,
  3,
  10,
  1,
  10,
  1,
  10,
  1,
  10,
  1,
  10,
  0,
  3,
  0,
  1,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  1,
  0,
  10,
  0,
  1,
  0,
  1,
  10,
  0,
  3,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  3,
  10,
  1,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  10,
  0,
  3,
  0,
  1,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  10,
  0,
  3,
  0,
  1,
  0,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  10,
  0,
  3,
  0,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  10,
  0,
  3,
  0,
  1,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  10,
  0,
  3,
  0,
  1,
  10,
  0,
  10,
  1,
  0,
  1,
  0,
  1,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  1,
  0,
  1,
  10,
  0,
  1,
  10,
  0,
  3,
  0,
  1,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  3,
  0,
  10,
  0,
  11,
  0,
  11,
  0,
  3,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  3,
  0,
  11,
  0,
  1,
  0,
  10,
  0,
  3,
  0,
  10,
  0,
  10,
  0,
  10,
  0,
  10,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  1,
  10,
  0,
  10,
  0,
  10,
  0,
  11,
  3,
  0,
  11,
  3,
  11,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  11,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  10,
  0,
  1,
  10,
  0,
  1,
  10,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  3,
  0,
  10,
  3,
  0,
  1,
  0,
  1,
  10,
  1,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  0,
  3,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  3,
  0,
  11,
  0,
  1,
  10,
  0,
  11,
  0,
  11,
  0,
  10,
  3,
  0,
  3,
  0,
  11,
  0,
  10,
  0,
  10,
  0,
  10,
  1,
  10,
  1,
  0,
  3,
  0,
  10,
  0,
  10,
  1,
  10,
  1,
  3,
  1,
  10,
  0,
  1,
  10,
  0,
  3,
  0,
  1,
  3,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  10,
  1,
  10,
  1,
  10,
  1,
  10,
  1,
  0,
  1,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  7,
  0,
  7,
  0,
  5,
  0,
  10,
  4,
  0,
  16,
  0,
  4,
  0,
  6,
  0,
  16,
  0,
  4,
  0,
  10,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  16,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  17,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  1,
  17,
  1,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  16,
  0,
  1,
  0,
  1,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  1,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  10,
  11,
  16,
  11,
  0,
  11,
  1,
  16,
  0,
  11,
  0,
  10,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  16,
  0,
  16,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  1,
  0,
  1,
  0,
  1,
  3,
  1,
  0,
  1,
  10,
  0,
  10,
  0,
  1,
  10,
  1,
  10,
  0,
  1,
  0,
  1,
  10,
  1,
  10,
  1,
  10,
  1,
  10,
  0,
  10,
  0,
  1,
  0,
  10,
  1,
  10,
  0,
  3,
  0,
  10,
  1,
  0,
  1,
  0,
  1,
  10,
  3,
  1,
  10,
  0,
  1,
  10,
  0,
  11,
  0,
  10,
  1,
  10,
  0,
  1,
  3,
  0,
  11,
  3,
  11,
  0,
  1,
  10,
  0,
  1,
  10,
  1,
  10,
  0,
  3,
  0,
  11,
  0,
  11,
  1,
  10,
  0,
  1,
  10,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  10,
  0,
  10,
  0,
  3,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  1,
  0,
  1,
  0,
  2,
  10,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  0,
  2,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  5,
  0,
  10,
  0,
  4,
  0,
  4,
  6,
  0,
  7,
  0,
  6,
  5,
  0,
  1,
  0,
  1,
  0,
  10,
  0,
  7,
  0,
  6,
  0,
  7,
  0,
  3,
  5,
  6,
  0,
  1,
  0,
  4,
  0,
  1,
  0,
  11,
  10,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  11,
  0,
  10,
  0
];

// src/measure/kernels/words.generated.ts
var WASM_BASE643 = "AGFzbQEAAAABGARgAn9/AGABfwBgAAF/YAZ/f39/f38BfwISAQNlbnYKY2xvc2VyTG9vawAAAwYFAQICAgMEBQFwAQEBBQMBAAIGDwJ/AUGQiAQLfwBBkIgECwdKBwZtZW1vcnkCAAdzZXRJbmZvAAEJc3RvcHBlZEF0AAIFYnl0ZXMAAwVmbGFncwAECXNjYW5Xb3JkcwAFC19faGVhcF9iYXNlAwEKpgwFDQBBACAANgKAiICAAAsLAEEAKAKEiICAAAsLAEEAKAKIiICAAAsLAEEAKAKMiICAAAvxCwEUfyAEQQAgBUECdPwLAEEAQX82AoSIgIAAAkAgAUEASg0AQQBBADYCjIiAgABBAEEANgKIiICAAEEADwsgAUF/aiEGIABBAmohB0EAKAKAiICAACEIQQAhCUEAIQpBACELQQAhDEEAIQ1BACEOQQAhD0EAIRBBACERQQAhEkEAIRNBACEUQQAhFUEAIRYCQANAIBQhFyAIIAAgEUEBdGoiGC8BACIZQQJ0aigCACIFQQx2IRQCQCAFQYDgAkkNAAJAIAVBgIAEcUUNACARQQFIDQAgGEF+ai8BAEGNwABHDQBBACAJNgKIiICAAEEAIBE2AoSIgIAAQQAgCjYCjIiAgABBfw8LIBRBD3EiFEELRw0AQQAgETYChIiAgAAMAgsgBCAFQf8BcUECdGoiGCAYKAIAQQFqNgIAIAVBCHZBA3EhGAJAIAVBgAhxRQ0AIBkgERCAgICAAEEAKAKAiICAACEICyAFIApyIQogGCAJaiEJAkACQAJAAkACQAJAIAwOAwIAAQMLAkAgFEEKRw0AQQEhDCARQQFqIQ4gFyEUDAULAkAgFEF/akEDSw0AQQEhDCARQQFqIQ9BBCEVAkAgFEEERg0AIA8hGEEBIRMMBQsgEkEBaiESIBchFCAPIQ4MBQsgFUF/aiEFAkACQAJAIBRBBUcNACAFQQJJDQELAkAgFEF5akEBSw0AIAVBA0kNAQsCQCAUQQZHDQAgFUEDRg0BCyAUQQlHDQEgFUECRw0BC0ECIQwgEUEBaiIWIRAMBQtBACEMAkAgE0UgEkECSHFFDQAgFyEUDAULAkAgFUEERyAOIA9Mcg0AIBchFAwFCwJAIAJFDQAgAyALQQN0aiIFIA02AgAgBUEEaiAONgIACyALQQFqIQsgFyEUDAQLAkAgFEEKRw0AIBFBAWohFkECIQwgFyEUDAQLAkACQAJAIBVBf2ogFEF/anJBAUsNACAXQXpqDgQAAQEAAQsCQCAUQQJHDQAgFUECRw0AIBdBCUYNAQsgFEEDRw0BIBVBA0cNASAXQQVGDQEgF0EJRg0BC0EBIRMgEUEBaiIYIQ8MAwsCQAJAIBVBAkcNACAXQQhHDQAgECEFIBYgEEYNAUECIRUMAgsgE0UgEkECSHENASAOIQUgFUEERyAOIA9MckUNAQsgBUEASA0AAkAgAkUNACADIAtBA3RqIhggDTYCACAYQQRqIAU2AgALIAtBAWohCwtBACEMAkAgFEF7akF8Tw0AIBchFAwDC0EEIRUgFEEERyETQQEhDEEAIRIgEUEBaiIYIQ8gESENIBRBBEcNASAXIRRBASESIBghDyAYIQ4gESENDAILIBFBAWohGCAVIRQLQQEhDAJAIBggAUgNACAUIRUgFyEUIBghDgwBCwJAAkACQCAIIAAgGEEBdCIZai8BAEECdGooAgAiBUGA6AdxIgwgFEEMdCIVRg0AIAxBgMACRw0BCyAHIBlqIREDQCAEIAVB/wFxQQJ0aiIMIAwoAgBBAWo2AgAgBSAKciEKIAVBCHZBA3EgCWohCSAGIBhGDQIgGEEBaiEYIBEvAQAhBSARQQJqIgwhESAIIAVBAnRqKAIAIgVBgOgHcSIZIBVGDQAgDCERIBlBgMACRg0ACyAYQX9qIRELQQEhDCARQQFqIQ4gFCEVIBchFAwBC0EBIQwgGEEBaiEOIBQhFSAXIRQgGCERCyARQQFqIhEgAUgNAAtBACgChIiAgAAhESAUIRcLQQAgCjYCjIiAgABBACAJNgKIiICAAEF/IQUCQCARQX9KDQAgCyEFAkACQAJAIAxBf2oOAgABAwsCQCATRSASQQJIcUUNACALDwsgFUEERyAOIA9Mcg0BIAsPCwJAIBVBAkcNACAXQQhHDQAgFiEOIBYgEEYNASALDwsCQCATRSASQQJIcUUNACALDwsgFUEERyAOIA9Mcg0AIAsPCwJAIA5BAE4NACALDwsCQCACRQ0AIAMgC0EDdGoiBSANNgIAIAVBBGogDjYCAAsgC0EBaiEFCyAFCw==";

// src/measure/kernels/words-kernel.ts
var MAX_WORD_UNITS = 1 << 20;
var WordKernel = class {
  constructor(info, scripts, closerLook2) {
    this.scripts = scripts;
    this.kernel = instantiateKernel(WASM_BASE643, { closerLook: closerLook2 });
    this.kernel.setInfo(this.kernel.place(new Uint8Array(info.buffer, info.byteOffset, info.byteLength)));
    this.countsAt = this.kernel.allocate(scripts * 4);
  }
  scripts;
  kernel;
  textAt = 0;
  outAt = 0;
  units = 0;
  countsAt;
  buffer = null;
  /** Word offsets of the last scan with `record` (two per word), and characters per Script id; views valid until the next scan. */
  offsets = new Int32Array(0);
  counts = new Int32Array(0);
  /** Scans a text (at most MAX_WORD_UNITS long): the word count, or -1 where the word rules stop (stoppedAt()). */
  scan(text, record) {
    const n = text.length;
    if (n > this.units) {
      this.units = Math.max(n, this.units * 2, 4096);
      this.textAt = this.kernel.allocate(this.units * 2);
      this.outAt = this.kernel.allocate((this.units + 2) * 4);
    }
    const buffer = this.kernel.memory.buffer;
    if (buffer !== this.buffer) {
      this.buffer = buffer;
      this.counts = new Int32Array(buffer, this.countsAt, this.scripts);
    }
    if (this.offsets.buffer !== buffer || this.offsets.byteOffset !== this.outAt) this.offsets = new Int32Array(buffer, this.outAt, this.units + 2);
    this.kernel.writeUtf16(this.textAt, text);
    return this.kernel.scanWords(this.textAt, n, record ? 1 : 0, this.outAt, this.countsAt, this.scripts);
  }
  /** Where the last scan's word rules stopped (its counts cover the text before it). */
  stoppedAt() {
    return this.kernel.stoppedAt();
  }
  /** UTF-8 bytes of the characters the last scan counted. */
  bytes() {
    return this.kernel.bytes() >>> 0;
  }
  /** OR of their table entries. */
  flags() {
    return this.kernel.flags() >>> 0;
  }
};
var kernel3;
function wordKernel(info, scripts, closerLook2) {
  return kernel3 ??= new WordKernel(info(), scripts, closerLook2);
}

// src/measure/words.ts
var OTHER3 = 0;
var ALETTER = 1;
var HEBREW_LETTER = 2;
var NUMERIC = 3;
var EXTEND_NUM_LET = 4;
var MID_LETTER = 5;
var MID_NUM = 6;
var MID_NUM_LET = 7;
var SINGLE_QUOTE = 8;
var DOUBLE_QUOTE = 9;
var IGNORABLE = 10;
var NEEDS_SEGMENTER = 11;
var CLASS_MASK = 15;
var EXTENDED_PICTOGRAPHIC = 16;
var ZWJ = 8205;
var OUT = 0;
var IN = 1;
var PENDING = 2;
var SEGMENTER_LOCALE = "und";
var segmenter;
var classes;
function classTable2() {
  if (classes) return classes;
  const table3 = new Uint8Array(65536);
  for (let r = 0; r < WORD_BREAK_RANGE_STARTS.length; r++) {
    const end = WORD_BREAK_RANGE_STARTS[r + 1] ?? 65536;
    table3.fill(WORD_BREAK_RANGE_VALUES[r], WORD_BREAK_RANGE_STARTS[r], end);
  }
  let probe = "";
  for (let cp = 0; cp < 65536; cp++) {
    const cls = table3[cp] & CLASS_MASK;
    if (cls !== OTHER3 && cls !== NEEDS_SEGMENTER) probe += String.fromCharCode(cp);
  }
  for (const m of probe.matchAll(new RegExp("\\P{Assigned}", "gu"))) {
    const cp = m[0].charCodeAt(0);
    table3[cp] = table3[cp] & ~CLASS_MASK | NEEDS_SEGMENTER;
  }
  classes = table3;
  return table3;
}
function wordSegmenter() {
  segmenter ??= new Intl.Segmenter(SEGMENTER_LOCALE, { granularity: "word" });
  return segmenter;
}
var SCRIPT_BITS = 255;
var UTF8_SHIFT = 8;
var CLOSER_LOOK = 1 << 10;
var MOJIBAKE_LEAD = 1 << 11;
var CLASS_SHIFT = 12;
var RUN_MASK = 31 << CLASS_SHIFT | CLOSER_LOOK;
var IGNORABLE_RUN = IGNORABLE << CLASS_SHIFT;
var infoTable;
function characterInfo() {
  if (infoTable) return infoTable;
  const scripts = bmpScriptIds();
  const words = classTable2();
  const table3 = new Uint32Array(65536);
  for (let cp = 0; cp < 65536; cp++) {
    const lead = cp >= MOJIBAKE_LEAD_FIRST && cp <= MOJIBAKE_LEAD_LAST;
    table3[cp] = scripts[cp] | (cp < 128 ? 1 : cp < 2048 ? 2 : 3) << UTF8_SHIFT | (lead ? MOJIBAKE_LEAD : needsCloserLook(cp) ? CLOSER_LOOK : 0) | words[cp] << CLASS_SHIFT;
  }
  infoTable = table3;
  return table3;
}
var CharacterTally = class {
  /** Characters per Script id (index into SCRIPT_NAMES), Common, Inherited and Unknown included. */
  counts = new Int32Array(SCRIPT_NAMES.length);
  /** UTF-8 bytes of the text (an unpaired surrogate as the 3 bytes of U+FFFD, as Buffer.byteLength counts it). */
  bytes = 0;
  /** Code points. */
  chars = 0;
  /** A new record per text: the measurer hands it on. */
  anomalies = emptyAnomalyCounts();
  marks = emptyMarkCounts();
};
function closerLook(unit, at, anomalies, marks) {
  const kind = anomalyOf(unit, at === 0);
  if (kind !== null) anomalies[kind]++;
  const mark = markOf(unit);
  if (mark !== null) marks[mark]++;
}
function countCharactersFrom(text, from, tally, bytes3, flags) {
  const table3 = characterInfo();
  const { counts, anomalies, marks } = tally;
  const n = text.length;
  let pairs = 0;
  for (let i = from; i < n; i++) {
    const unit = text.charCodeAt(i);
    if (unit >= 55296 && unit <= 56319 && i + 1 < n) {
      const low = text.charCodeAt(i + 1);
      if (low >= 56320 && low <= 57343) {
        const cp = (unit - 55296 << 10) + (low - 56320) + 65536;
        const id2 = astralScriptId(cp);
        counts[id2] = counts[id2] + 1;
        if (cp >= 983040) {
          const kind = anomalyOf(cp, false);
          if (kind !== null) anomalies[kind]++;
        }
        bytes3 += 4;
        pairs++;
        i++;
        continue;
      }
    }
    const info = table3[unit];
    const id = info & SCRIPT_BITS;
    counts[id] = counts[id] + 1;
    bytes3 += info >>> UTF8_SHIFT & 3;
    flags |= info;
    if ((info & CLOSER_LOOK) !== 0) closerLook(unit, i, anomalies, marks);
  }
  finishTally(text, tally, bytes3, n - pairs, flags);
}
function finishTally(text, tally, bytes3, chars, flags) {
  tally.bytes = bytes3;
  tally.chars = chars;
  if ((flags & MOJIBAKE_LEAD) !== 0) tally.anomalies.mojibake = countMojibake(text);
}
var unusedTally = new CharacterTally();
var offsets = new Int32Array(1024);
function scan(text, record, tally) {
  return kernelOn && text.length <= MAX_WORD_UNITS ? scanByKernel(text, record, tally) : scanHere(text, record, tally);
}
var kernelOn = true;
var closerInto = unusedTally;
var closerLookInKernel = (unit, at) => closerLook(unit, at, closerInto.anomalies, closerInto.marks);
function scanByKernel(text, record, tally) {
  const kernel5 = wordKernel(characterInfo, SCRIPT_NAMES.length, closerLookInKernel);
  closerInto = tally ?? unusedTally;
  const count3 = kernel5.scan(text, record);
  if (tally !== null) tally.counts.set(kernel5.counts);
  if (count3 < 0) {
    if (tally !== null) countCharactersFrom(text, kernel5.stoppedAt(), tally, kernel5.bytes(), kernel5.flags());
    return -1;
  }
  if (record) {
    if (offsets.length < count3 * 2) offsets = new Int32Array(Math.max(1024, count3 * 4));
    offsets.set(kernel5.offsets.subarray(0, count3 * 2));
  }
  if (tally !== null) finishTally(text, tally, kernel5.bytes(), text.length, kernel5.flags());
  return count3;
}
function scanHere(text, record, tally) {
  const table3 = characterInfo();
  const into = tally ?? unusedTally;
  const { counts, anomalies, marks } = into;
  const n = text.length;
  let out = offsets;
  let bytes3 = 0;
  let flags = 0;
  let count3 = 0;
  let state = OUT;
  let start = 0;
  let end = 0;
  let coreEnd = 0;
  let midAt = 0;
  let midEnd = 0;
  let last = OTHER3;
  let mid = OTHER3;
  let hasCore = false;
  let connectors = 0;
  for (let i = 0; i < n; i++) {
    const unit = text.charCodeAt(i);
    const info = table3[unit];
    let cls = info >>> CLASS_SHIFT;
    if (cls >= NEEDS_SEGMENTER) {
      if ((cls & EXTENDED_PICTOGRAPHIC) !== 0 && i > 0 && text.charCodeAt(i - 1) === ZWJ) return stop(text, i, tally, bytes3, flags, out);
      cls &= CLASS_MASK;
      if (cls === NEEDS_SEGMENTER) return stop(text, i, tally, bytes3, flags, out);
    }
    const id = info & SCRIPT_BITS;
    counts[id] = counts[id] + 1;
    bytes3 += info >>> UTF8_SHIFT & 3;
    flags |= info;
    if ((info & CLOSER_LOOK) !== 0) closerLook(unit, i, anomalies, marks);
    if (state === IN) {
      if (cls === IGNORABLE) {
        end = i + 1;
        continue;
      }
      if (cls >= ALETTER && cls <= EXTEND_NUM_LET) {
        if (cls === EXTEND_NUM_LET) connectors++;
        else hasCore = true;
        last = cls;
        end = coreEnd = i + 1;
        if (cls === EXTEND_NUM_LET) continue;
      } else {
        const letterBefore = last === ALETTER || last === HEBREW_LETTER;
        if (cls === MID_LETTER && letterBefore || // WB6
        (cls === MID_NUM_LET || cls === SINGLE_QUOTE) && (letterBefore || last === NUMERIC) || // WB6, WB12, WB7a
        cls === MID_NUM && last === NUMERIC || // WB12
        cls === DOUBLE_QUOTE && last === HEBREW_LETTER) {
          state = PENDING;
          mid = cls;
          midAt = midEnd = i + 1;
          continue;
        }
        if (wordLike(last, hasCore, connectors, end > coreEnd)) {
          if (record) out = put(out, count3, start, end);
          count3++;
        }
        state = OUT;
        continue;
      }
    } else {
      if (state === PENDING) {
        if (cls === IGNORABLE) {
          midEnd = i + 1;
          continue;
        }
        const letter2 = cls === ALETTER || cls === HEBREW_LETTER;
        if (letter2 && (last === ALETTER || last === HEBREW_LETTER) && mid !== MID_NUM && mid !== DOUBLE_QUOTE || // WB7
        cls === HEBREW_LETTER && last === HEBREW_LETTER && mid === DOUBLE_QUOTE || // WB7c
        cls === NUMERIC && last === NUMERIC && mid !== MID_LETTER && mid !== DOUBLE_QUOTE) {
          hasCore = true;
          last = cls;
          end = coreEnd = i + 1;
          state = IN;
        } else {
          const e2 = pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors);
          if (e2 >= 0) {
            if (record) out = put(out, count3, start, e2);
            count3++;
          }
          state = OUT;
        }
      }
      if (state === OUT) {
        if (cls < ALETTER || cls > EXTEND_NUM_LET) continue;
        state = IN;
        start = i;
        end = coreEnd = i + 1;
        last = cls;
        hasCore = cls !== EXTEND_NUM_LET;
        connectors = cls === EXTEND_NUM_LET ? 1 : 0;
        if (cls === EXTEND_NUM_LET) continue;
      }
    }
    const same = last << CLASS_SHIFT;
    while (i + 1 < n) {
      const next = table3[text.charCodeAt(i + 1)];
      const run2 = next & RUN_MASK;
      if (run2 !== same && run2 !== IGNORABLE_RUN) break;
      const nextId = next & SCRIPT_BITS;
      counts[nextId] = counts[nextId] + 1;
      bytes3 += next >>> UTF8_SHIFT & 3;
      flags |= next;
      i++;
    }
    end = i + 1;
  }
  const e = state === IN ? wordLike(last, hasCore, connectors, end > coreEnd) ? end : -1 : state === PENDING ? pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors) : -1;
  if (e >= 0) {
    if (record) out = put(out, count3, start, e);
    count3++;
  }
  offsets = out;
  if (tally !== null) finishTally(text, tally, bytes3, n, flags);
  return count3;
}
function stop(text, at, tally, bytes3, flags, out) {
  offsets = out;
  if (tally !== null) countCharactersFrom(text, at, tally, bytes3, flags);
  return -1;
}
function wordLike(last, hasCore, connectors, trailingIgnorables) {
  if (!hasCore && connectors < 2) return false;
  return !(last === EXTEND_NUM_LET && trailingIgnorables);
}
function pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors) {
  if (last === HEBREW_LETTER && mid === SINGLE_QUOTE) return midEnd === midAt ? midEnd : -1;
  return wordLike(last, hasCore, connectors, end > coreEnd) ? end : -1;
}
function put(out, count3, start, end) {
  if (out.length < (count3 + 1) * 2) {
    const grown = new Int32Array(Math.max(1024, out.length * 2));
    grown.set(out);
    out = grown;
  }
  out[count3 * 2] = start;
  out[count3 * 2 + 1] = end;
  return out;
}
var SEGMENTER_PIECE_UNITS = 8192;
var SEGMENTER_MAX_UNITS = 49152;
var FORCED_CUT_CONTEXT = 512;
function isSafeCut(text, p) {
  const unit = text.charCodeAt(p);
  if (unit >= 55296 && unit <= 57343) return false;
  if (/\s/.test(text[p])) return false;
  const cls = classTable2()[unit] & CLASS_MASK;
  if (cls === IGNORABLE) return false;
  const before = text.charCodeAt(p - 1);
  if (before === 32 || before === 10 || before === 12290) return true;
  if (before === 12289 || before === 65292 || before === 65307 || before === 65281 || before === 65311) {
    return cls !== ALETTER && cls !== HEBREW_LETTER && cls !== NUMERIC && cls !== EXTEND_NUM_LET;
  }
  if (before === 46 || before === 44 || before === 59 || before === 33 || before === 63 || before === 58) {
    return unit >= 12352 && unit <= 12543 || unit >= 13312 && unit <= 19903 || unit >= 19968 && unit <= 40959 || unit >= 63744 && unit <= 64255;
  }
  return false;
}
function forcedCut(text, target) {
  const n = text.length;
  for (let at = target; at + FORCED_CUT_CONTEXT < n; at += FORCED_CUT_CONTEXT) {
    const from = Math.max(0, at - FORCED_CUT_CONTEXT);
    const to = Math.min(n, at + 2 * FORCED_CUT_CONTEXT);
    for (const s of wordSegmenter().segment(text.slice(from, to))) {
      const b = from + s.index;
      if (b < at) continue;
      if (b + FORCED_CUT_CONTEXT > to) break;
      return b;
    }
  }
  return n;
}
function segmenterWords(text, onWord, pieceUnits = SEGMENTER_PIECE_UNITS, maxPieceUnits = SEGMENTER_MAX_UNITS) {
  const n = text.length;
  let from = 0;
  while (from < n) {
    let cut = n;
    if (n - from > pieceUnits) {
      const last = Math.min(n, from + maxPieceUnits);
      for (let p = from + pieceUnits; p < last; p++) {
        if (isSafeCut(text, p)) {
          cut = p;
          break;
        }
      }
      if (cut === n && n - from > maxPieceUnits) cut = forcedCut(text, Math.max(from + 1, from + maxPieceUnits - 2 * FORCED_CUT_CONTEXT));
    }
    const piece = from === 0 && cut === n ? text : text.slice(from, cut);
    for (const s of wordSegmenter().segment(piece)) if (s.isWordLike) onWord(from + s.index, from + s.index + s.segment.length);
    from = cut;
  }
}
function countSegmenterWords(text) {
  let count3 = 0;
  segmenterWords(text, () => {
    count3++;
  });
  return count3;
}
var memoText = null;
var memoCount = 0;
var memoOffsets = new Int32Array(1024);
var memoWalks = 0;
function measureText(text, tally) {
  tally.counts.fill(0);
  tally.anomalies = emptyAnomalyCounts();
  tally.marks = emptyMarkCounts();
  return wordsOf2(text, scan(text, true, tally));
}
function wordsOf2(text, fast) {
  if (fast < 0) {
    memoText = null;
    return countSegmenterWords(text);
  }
  if (memoWalks === 0) {
    const spare = memoOffsets;
    memoOffsets = offsets;
    offsets = spare;
  } else {
    memoOffsets = offsets.slice(0, fast * 2);
  }
  memoCount = fast;
  memoText = text;
  return fast;
}
function forEachWord(text, onWord) {
  if (memoText !== null && text === memoText) {
    const found = memoOffsets;
    const fast2 = memoCount;
    memoWalks++;
    try {
      for (let w = 0; w < fast2; w++) onWord(found[w * 2], found[w * 2 + 1]);
    } finally {
      memoWalks--;
    }
    return;
  }
  const fast = scan(text, true, null);
  if (fast >= 0) {
    const found = offsets.slice(0, fast * 2);
    for (let w = 0; w < fast; w++) onWord(found[w * 2], found[w * 2 + 1]);
    return;
  }
  segmenterWords(text, onWord);
}
function wordOffsets(text) {
  if (memoText !== null && text === memoText) return memoOffsets.subarray(0, memoCount * 2);
  const fast = scan(text, true, null);
  return fast < 0 ? null : offsets.slice(0, fast * 2);
}

// src/measure/document.ts
function createMeasurer(settings) {
  const detector = createLanguageDetector(settings.languages, settings.detection);
  const pass = new CharacterTally();
  const { counts } = pass;
  return (doc) => {
    const { text } = doc;
    const words = measureText(text, pass);
    const scripts = {};
    let letters = 0;
    let dominant = 0;
    for (let id = FIRST_COUNTED_ID; id < counts.length; id++) {
      const n = counts[id];
      if (n === 0) continue;
      scripts[SCRIPT_NAMES[id]] = n;
      letters += n;
      if (dominant === 0 || n > counts[dominant]) dominant = id;
    }
    const dominantScript = letters === 0 ? null : SCRIPT_NAMES[dominant];
    const { detected, language } = detector.detect(text, dominantScript, letters);
    const declared = doc.declaredLanguage === void 0 ? void 0 : detector.declared(doc.declaredLanguage);
    const expected = declared !== void 0 && declared !== OTHER2 ? declared : language;
    let purity = null;
    const expectedScripts = expected === OTHER2 || expected === UNDETERMINED ? void 0 : detector.scriptsOf(expected);
    if (expectedScripts !== void 0 && letters > 0) {
      let own = 0;
      for (const name of expectedScripts) own += scripts[name] ?? 0;
      purity = own / letters;
    }
    const measure = {
      bytes: pass.bytes,
      chars: pass.chars,
      words,
      scripts,
      dominantScript,
      detected,
      language,
      purity,
      anomalies: pass.anomalies,
      marks: pass.marks
    };
    if (declared !== void 0) measure.declared = declared;
    return measure;
  };
}

// src/measure/tokens/load.ts
import { createHash as createHash5 } from "node:crypto";
import { readFile as readFile3 } from "node:fs/promises";

// src/measure/tokens/errors.ts
var TokenizerError = class extends Error {
  name = "TokenizerError";
  stage;
  /** The tokenizer file (as given), or the builtin name. */
  file;
  /** 1-based line of a rank file, when the problem is on one line. */
  line;
  constructor(stage, file, message, options = {}) {
    const where2 = options.line === void 0 ? file : `${file}:${options.line}`;
    super(`${where2}: ${message}`, options.cause === void 0 ? void 0 : { cause: options.cause });
    this.stage = stage;
    this.file = file;
    if (options.line !== void 0) this.line = options.line;
  }
};

// src/measure/tokens/hf.ts
import * as hf from "@huggingface/tokenizers";

// src/measure/tokens/cache.ts
var DEFAULT_GENERATION_SIZE = 65536;
var MAX_CACHED_PIECE_LENGTH = 128;
var EMPTY = -1;
function hashRange(text, start, end) {
  let h = 2166136261 | 0;
  for (let i = start; i < end; i++) h = Math.imul(h ^ text.charCodeAt(i), 16777619);
  return h;
}
var Generation = class {
  constructor(capacity) {
    this.capacity = capacity;
    let size = 1;
    while (size < capacity * 2) size *= 2;
    this.mask = size - 1;
    this.slots = new Int32Array(size).fill(EMPTY);
    this.hashes = new Int32Array(size);
  }
  capacity;
  mask;
  slots;
  hashes;
  keys = [];
  values = [];
  find(text, start, end, hash2) {
    const { slots, hashes, keys, mask } = this;
    const length = end - start;
    for (let i = hash2 & mask; ; i = i + 1 & mask) {
      const id = slots[i];
      if (id === EMPTY) return void 0;
      if (hashes[i] === hash2) {
        const key = keys[id];
        if (key.length === length && text.startsWith(key, start)) return this.values[id];
      }
    }
  }
  add(key, hash2, value) {
    const { slots, mask } = this;
    let i = hash2 & mask;
    while (slots[i] !== EMPTY) i = i + 1 & mask;
    slots[i] = this.keys.length;
    this.hashes[i] = hash2;
    this.keys.push(key);
    this.values.push(value);
  }
  get size() {
    return this.keys.length;
  }
  clear() {
    this.slots.fill(EMPTY);
    this.keys = [];
    this.values = [];
  }
};
var PieceCache = class {
  young;
  old;
  hits = 0;
  misses = 0;
  evictions = 0;
  constructor(generationSize = DEFAULT_GENERATION_SIZE) {
    if (!(generationSize >= 1)) throw new RangeError(`cache generation size must be at least 1, got ${generationSize}`);
    this.young = new Generation(generationSize);
    this.old = new Generation(generationSize);
  }
  /** Returns the cached value of text[start, end) with its hash, or undefined (a miss, counted). */
  find(text, start, end, hash2) {
    let value = this.young.find(text, start, end, hash2);
    if (value !== void 0) {
      this.hits++;
      return value;
    }
    value = this.old.find(text, start, end, hash2);
    if (value !== void 0) {
      this.hits++;
      this.add(text.slice(start, end), hash2, value);
      return value;
    }
    this.misses++;
    return void 0;
  }
  /** Returns the cached value of a whole string, or undefined. */
  get(key) {
    return this.find(key, 0, key.length, hashRange(key, 0, key.length));
  }
  /** Stores a value under a key (hash as from hashRange), retiring the young generation when full. */
  add(key, hash2, value) {
    if (key.length > MAX_CACHED_PIECE_LENGTH) return;
    this.young.add(key, hash2, value);
    if (this.young.size >= this.young.capacity) {
      const retired = this.old;
      this.old = this.young;
      retired.clear();
      this.young = retired;
      this.evictions++;
    }
  }
  /** Stores a value under a whole string. */
  set(key, value) {
    this.add(key, hashRange(key, 0, key.length), value);
  }
  /** Returns hit, miss and eviction counts and the entries held. */
  stats() {
    return { hits: this.hits, misses: this.misses, evictions: this.evictions, entries: this.young.size + this.old.size };
  }
};

// src/measure/tokens/hf.ts
var { BPE, ByteLevelPreTokenizer, MetaspacePreTokenizer, ReplacePreTokenizer, SequencePreTokenizer, Unigram, WordPiece } = hf;
var { Tokenizer } = hf;
var REQUIRED_KEYS = ["normalizer", "pre_tokenizer", "post_processor", "decoder"];
function createJsonCounter(json, file, id, generationSize) {
  if (json === null || typeof json !== "object" || Array.isArray(json)) {
    throw new TokenizerError("load", file, "a tokenizer.json must hold a JSON object");
  }
  const config = { ...json };
  const model = config.model;
  if (model === null || typeof model !== "object" || Array.isArray(model)) {
    throw new TokenizerError("load", file, 'no "model" object: not a tokenizer.json');
  }
  if (model.type !== void 0 && !["BPE", "WordPiece", "Unigram"].includes(model.type)) {
    throw new TokenizerError(
      "load",
      file,
      `unknown model type ${JSON.stringify(model.type)} (sluice reads BPE, WordPiece and Unigram)`
    );
  }
  for (const key of REQUIRED_KEYS) if (!(key in config)) config[key] = null;
  if (!("added_tokens" in config)) config.added_tokens = [];
  if (!Array.isArray(config.added_tokens)) throw new TokenizerError("load", file, '"added_tokens" must be a list');
  let tokenizer;
  try {
    tokenizer = new Tokenizer(config, {});
  } catch (cause) {
    throw new TokenizerError("load", file, `cannot build the tokenizer: ${cause.message}`, { cause });
  }
  const lib = tokenizer;
  const kind = kindOf3(lib.model);
  if (kind === null) {
    throw new TokenizerError("load", file, "the model is neither BPE, WordPiece nor Unigram");
  }
  const unknownId = lib.model.unk_token_id ?? null;
  const plan = planFastPath(lib);
  const idOf = (token) => lib.added_tokens_map.get(token)?.id ?? lib.model.tokens_to_ids.get(token) ?? lib.model.unk_token_id;
  const isUnknown = (token) => {
    const tokenId = idOf(token);
    return tokenId === void 0 || tokenId === unknownId;
  };
  const isFusable = (token) => (lib.model.tokens_to_ids.get(token) ?? lib.model.unk_token_id) === lib.model.unk_token_id;
  const wholeText = (text) => {
    const ids = lib.encode(text, { add_special_tokens: false }).ids;
    let unknown = 0;
    for (const tokenId of ids) if (tokenId === void 0 || tokenId === unknownId) unknown++;
    return { tokens: ids.length, unknown };
  };
  let countText = wholeText;
  let stats = () => ({ hits: 0, misses: 0, evictions: 0, entries: 0 });
  if (plan !== null) {
    const cache = new PieceCache(generationSize);
    const firstSectionCache = plan.dependsOnSection ? new PieceCache(generationSize) : cache;
    stats = () => {
      const a = cache.stats();
      if (firstSectionCache === cache) return a;
      const b = firstSectionCache.stats();
      return { hits: a.hits + b.hits, misses: a.misses + b.misses, evictions: a.evictions + b.evictions, entries: a.entries + b.entries };
    };
    const fuse = lib.model.fuse_unk;
    const pieceCount = (piece, sectionIndex) => {
      const store = sectionIndex === 0 ? firstSectionCache : cache;
      const cached = store.get(piece);
      if (cached !== void 0) return cached;
      let parts = [piece];
      for (const stage of plan.rest) parts = stage.pre_tokenize(parts, { section_index: sectionIndex });
      const out = lib.model(parts);
      let unknown = 0;
      for (const token of out) if (isUnknown(token)) unknown++;
      const first = out[0];
      const last = out[out.length - 1];
      const result = {
        tokens: out.length,
        unknown,
        firstFusable: first !== void 0 && isFusable(first),
        lastFusable: last !== void 0 && isFusable(last),
        firstUnknown: first !== void 0 && isUnknown(first),
        lastUnknown: last !== void 0 && isUnknown(last)
      };
      store.set(piece, result);
      return result;
    };
    const countSubsection = (text, sectionIndex, total) => {
      const options = { section_index: sectionIndex };
      let parts = [text];
      for (const stage of plan.head) parts = stage.pre_tokenize(parts, options);
      const pieces = plan.split(parts, options);
      let previous = null;
      for (const piece of pieces) {
        const c = pieceCount(piece, sectionIndex);
        if (c.tokens === 0) continue;
        total.tokens += c.tokens;
        total.unknown += c.unknown;
        if (fuse && previous !== null && previous.lastFusable && c.firstFusable) {
          total.tokens--;
          if (previous.lastUnknown && c.firstUnknown) total.unknown--;
        }
        previous = c;
      }
    };
    countText = (text) => {
      const total = { tokens: 0, unknown: 0 };
      const sections = splitAdded(lib.splitter_unnormalized, lib.added_tokens_map, text);
      for (let i = 0; i < sections.length; i++) {
        const section = sections[i];
        if (section.length === 0) continue;
        if (lib.added_tokens_map.has(section)) {
          total.tokens++;
          if (isUnknown(section)) total.unknown++;
          continue;
        }
        const normalized = lib.normalizer === null ? section : lib.normalizer(section);
        if (normalized.length === 0) continue;
        const subsections = splitAdded(lib.splitter_normalized, lib.added_tokens_map, normalized);
        for (const sub of subsections) {
          if (sub.length === 0) continue;
          if (lib.added_tokens_map.has(sub)) {
            total.tokens++;
            if (isUnknown(sub)) total.unknown++;
            continue;
          }
          countSubsection(sub, i, total);
        }
      }
      return total;
    };
  }
  const guarded = (text) => {
    try {
      return countText(text);
    } catch (cause) {
      throw new TokenizerError("count", file, `cannot encode text: ${cause.message}`, { cause });
    }
  };
  const words = new PieceCache(generationSize);
  return {
    id,
    label: file,
    kind,
    unknownTokenId: unknownId,
    exactFastPath: plan !== null,
    count: guarded,
    countPiece: (piece) => {
      const cached = words.get(piece);
      if (cached !== void 0) return cached;
      const n = guarded(piece).tokens;
      words.set(piece, n);
      return n;
    },
    cacheStats: () => stats()
  };
}
function kindOf3(model) {
  if (model instanceof BPE) return "bpe";
  if (model instanceof WordPiece) return "wordpiece";
  if (model instanceof Unigram) return "unigram";
  return null;
}
function splitAdded(splitter, added, text) {
  const trie = splitter.trie;
  let any = false;
  for (const first in trie) {
    if (text.includes(first)) {
      any = true;
      break;
    }
  }
  if (!any) return text.length === 0 ? [] : [text];
  const sections = splitter.split(text);
  sections.forEach((section, i) => {
    const token = added.get(section);
    if (token === void 0) return;
    if (token.lstrip && i > 0) sections[i - 1] = sections[i - 1].trimEnd();
    if (token.rstrip && i < sections.length - 1) sections[i + 1] = sections[i + 1].trimStart();
  });
  return sections;
}
function isSingleOutput(stage) {
  if (stage instanceof ByteLevelPreTokenizer) return stage.use_regex === false;
  return stage instanceof MetaspacePreTokenizer || stage instanceof ReplacePreTokenizer;
}
function planFastPath(lib) {
  if (lib.remove_space === true || lib.do_lowercase_and_remove_accent === true) return null;
  if (lib.post_processor !== null) {
    const probe = ["a", "b", "c"];
    let out;
    try {
      out = lib.post_processor([...probe], null, false).tokens;
    } catch {
      return null;
    }
    if (!Array.isArray(out) || out.length !== probe.length || out.some((t, i) => t !== probe[i])) return null;
  }
  if (lib.pre_tokenizer === null) return null;
  const stages = [];
  const flatten = (stage) => {
    if (stage instanceof SequencePreTokenizer) {
      for (const inner of stage.tokenizers ?? []) if (inner !== null) flatten(inner);
    } else {
      stages.push(stage);
    }
  };
  flatten(lib.pre_tokenizer);
  const k = stages.findIndex((stage) => !isSingleOutput(stage));
  if (k < 0) return null;
  const splitter = stages[k];
  let rest = stages.slice(k + 1);
  let split = (parts, options) => splitter.pre_tokenize(parts, options);
  if (splitter instanceof ByteLevelPreTokenizer) {
    const bl = splitter;
    const mapper = new ByteLevelPreTokenizer({ ...bl.config, use_regex: false, add_prefix_space: false });
    split = (parts) => parts.flatMap((text) => {
      const t = bl.add_prefix_space && !text.startsWith(" ") ? " " + text : text;
      return t.match(bl.pattern) ?? [];
    });
    rest = [mapper, ...rest];
  }
  const dependsOnSection = rest.some(
    (stage) => stage instanceof MetaspacePreTokenizer && stage.prepend_scheme === "first"
  );
  return { head: stages.slice(0, k), split, rest, dependsOnSection };
}

// src/measure/tokens/patterns.ts
var BUILTIN_NAMES = ["gpt2", "r50k_base", "p50k_base", "cl100k_base", "o200k_base"];
var GPT2 = String.raw`'s|'t|'re|'ve|'m|'ll|'d| ?\p{L}+| ?\p{N}+| ?[^\s\p{L}\p{N}]+|\s+(?!\S)|\s+`;
var CL100K = String.raw`('s|'S|'t|'T|'re|'rE|'Re|'RE|'ve|'vE|'Ve|'VE|'m|'M|'ll|'lL|'Ll|'LL|'d|'D)|[^\r\n\p{L}\p{N}]?\p{L}+|\p{N}{1,3}| ?[^\s\p{L}\p{N}]+[\r\n]*|\s*[\r\n]+|\s+(?!\S)|\s+`;
var O200K_CONTRACTION = String.raw`('s|'S|'t|'T|'re|'rE|'Re|'RE|'ve|'vE|'Ve|'VE|'m|'M|'ll|'lL|'Ll|'LL|'d|'D)?`;
var O200K = String.raw`[^\r\n\p{L}\p{N}]?[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]*[\p{Ll}\p{Lm}\p{Lo}\p{M}]+` + O200K_CONTRACTION + String.raw`|[^\r\n\p{L}\p{N}]?[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]+[\p{Ll}\p{Lm}\p{Lo}\p{M}]*` + O200K_CONTRACTION + String.raw`|\p{N}{1,3}| ?[^\s\p{L}\p{N}]+[\r\n/]*|\s*[\r\n]+|\s+(?!\S)|\s+`;
var BUILTIN_PATTERNS = {
  gpt2: GPT2,
  r50k_base: GPT2,
  p50k_base: GPT2,
  cl100k_base: CL100K,
  o200k_base: O200K
};
var DEFAULT_RANK_FILE_PATTERN = "cl100k_base";
function isBuiltinName(name) {
  return BUILTIN_NAMES.includes(name);
}

// src/measure/kernels/tokens.generated.ts
var WASM_BASE644 = "AGFzbQEAAAABTwpgA39/fwF/YAF/AGAAAX9gAAF8YAR/f39/AX9gAn9/AX9gCn9/f39/f39/f38Bf2AMf39/f39/f39/f39/AXxgAn9/AXxgBX9/f39/AX8CDwEDZW52B3Jlc29sdmUAAAMREAECAwQFAAYCAgcECAIFCQAEBQFwAQEBBQMBAAIGDwJ/AUHAvgQLfwBBwL4ECwe/AQ4GbWVtb3J5AgAKc2V0Q2xhc3NlcwABCXN0b3BwZWRBdAACBnRva2VucwADCHBpZWNlRW5kAAQLY291bnRQaWVjZXMABw5jb250aW51ZWRXb3JkcwAICWxlZnRXb3JkcwAJCndvcmRUb2tlbnMACgptZXJnZUNvdW50AAsMc2Nhbm5lZEJ5dGVzAA0Qc2NhbkJ1aWx0aW5SYW5rcwAOEGZpbGxCdWlsdGluUmFua3MAEAtfX2hlYXBfYmFzZQMBCpVbEA0AQQAgADYCgIqAgAALCwBBACgChIqAgAALCwBBACsDiIqAgAALIgBBACABNgKUioCAAEEAIAA2ApCKgIAAIAMgAhCFgICAAAuGFgEJf0F/IQICQAJAAkACQAJAAkACQAJAAkACQAJAAkAgAEF/ag4CAQACC0EAKAKAioCAACIDQQAoApCKgIAAIgQgAUEBdGovAQAiBWotAAAiAEGAAXENBiAAQcAAcSECAkAgAEEYcSIGRQ0AIAINACABQQBBARCGgICAACIBQX8gAUF/ShsPCwJAIABBAnFFDQBBACgClIqAgAAiBSABQQFqIgAgBSAAShshByABIAFBAmoiAiABIAJKGyIGQQFqIQIgBCAAQQF0aiEAA0AgBiABRg0IAkAgBSABQQFqIgFKDQAgBw8LIAAvAQAhBCAAQQJqIQAgAyAEai0AACIEQQJxDQALIAFBfyAEQRh0QRh1QX9KGw8LAkAgAkUNACABQQEgBkEARxCGgICAACICQX5HDQdBfyECAkAgBUEgRw0AQX8hAkEAKAKUioCAACABQQFqIgVMDQBBfyECIAMgBCAFQQF0ai8BAGotAAAiBkGAAXENCCAFQX8gBkEgcRshAgsgAiABIAJBf0obIAIgAEEgcRsiBUEASA0AQQAoApSKgIAAIgggBSAIIAVKGyECIAQgBUEBdGohBgJAA0AgAiAFRg0BIAVBAWohBSAGLwEAIQcgBkECaiEGIAMgB2otAAAiB0EgcQ0AC0F/IQIgB0EYdEEYdUEASA0IIAVBf2ohAgsCQCACQQBODQBBfw8LIAggAkwNByAEIAJBAXRqIQUCQANAAkACQCAFLwEAIgZBdmoOBAEDAwEACyAGQS9HDQILIAVBAmohBSAIIAJBAWoiAkcNAAsgCCECCyACQX5HDQcLQQAoApSKgIAAIgcgAUwNAgJAIABBBHFFDQAgB0F/aiEGIAFBAXQgBGpBAmohAiABIQACQANAAkAgBiAARw0AIAchAAwCCyAAQQFqIQAgAi8BACEFIAJBAmohAiADIAVqLQAAQQRxDQALCyAAQX9qIQYgACABTA0LIAQgBkEBdGohBCAAIQUDQAJAAkAgBC8BACIDQXZqDgQAAQEAAQsgBSECCyADQQ1GIANBCkZzDQggBEF+aiEEIAVBf2oiBSABTA0MDAALCyABQX9qIQYMCQtBACgCgIqAgAAiBEEAKAKQioCAACIGIAFBAXRqIgAvAQAiBWotAAAiA0GAAXENBQJAIAVBJ0cNAEEAIQJBACgClIqAgAAiByABTA0AAkAgByABQQFqIghMDQAgBiAIQQF0ai8BACECC0ECIQhBACEJAkAgByABQQJqIgpMDQAgBiAKQQF0ai8BACEJCwJAAkAgAkEgaiACIAJBv39qQRpJGyIHQZx/aiICQRBLDQBBASACdEGBhAZxDQELIAlBIGogCSAJQb9/akEaSRshAkEDIQgCQCAHQfIARw0AIAJB5QBGDQELAkAgB0H2AEcNACACQeUARg0BCyAHQewARw0BIAJB7ABHDQELIAggAWoPCwJAIANBAXFFDQBBACgClIqAgAAiAiABIAIgAUobIQIDQCACIAFGDQcgAUEBaiEBIAAvAQAhAyAAQQJqIQAgBCADai0AACIDQQFxDQALIAFBf2pBfyADQRh0QRh1QX9KGw8LAkAgA0ECcUUNAEEAKAKUioCAACIFIAFBAWoiACAFIABKGyEIIAEgAUECaiICIAEgAkobIgdBAWohAiAGIABBAXRqIQADQCAHIAFGDQcCQCAFIAFBAWoiAUoNACAIDwsgAC8BACEDIABBAmohACAEIANqLQAAIgNBAnENAAsgAUF/IANBGHRBGHVBf0obDwsCQAJAIANBwABxDQBBACgClIqAgAAhCAwBC0F/IQICQEEAKAKUioCAACIIIAFBAWoiB0wNAEF/IQIgBCAGIAdBAXRqLwEAai0AACIAQYABcQ0HAkAgAEEBcUUNACAGIAdBAXRqIQAgCCAHIAggB0obIgJBf2ohBQNAIAUgAUYNCSABQQFqIQEgAC8BACEDIABBAmohACAEIANqLQAAIgNBAXENAAsgAUF/IANBGHRBGHVBf0obDwtBfyECIAVBIEcNACAHQX8gAEEgcRshAgsgAiABIAJBf0obIAIgA0EgcRsiAEEASA0AIAggACAIIABKGyECIAYgAEEBdGohBQJAA0AgAiAARg0BIABBAWohACAFLwEAIQcgBUECaiEFIAQgB2otAAAiB0EgcQ0AC0F/IQIgB0EYdEEYdUEASA0HIABBf2ohAgsCQCACQQBODQBBfw8LIAggAkwNBiAGIAJBAXRqIQACQANAAkAgAC8BAEF2ag4EAAICAAILIABBAmohACAIIAJBAWoiAkcNAAsgCCECCyACQX5HDQYLIAggAUwNAgJAIANBBHFFDQAgCEF/aiEFIAFBAXQgBmpBAmohAiABIQACQANAAkAgBSAARw0AIAghAAwCCyAAQQFqIQAgAi8BACEDIAJBAmohAiAEIANqLQAAQQRxDQALCyAAQX9qIQcgACABTA0IIAYgB0EBdGohAyAAIQUDQAJAAkAgAy8BACIEQXZqDgQAAQEAAQsgBSECCyAEQQ1GIARBCkZzDQcgA0F+aiEDIAVBf2oiBSABTA0JDAALCyABQX9qIQcMBgtBACgCgIqAgAAiA0EAKAKQioCAACIFIAFBAXRqLwEAIgZqLQAAIgRBgAFxDQQgASEAIAQhBwJAAkAgBkFgag4IAQUFBQUFBQAFC0EAIQBBACgClIqAgAAiAiABTA0DAkAgAiABQQFqIgZMDQAgBSAGQQF0ai8BACEAC0ECIQZBACEIAkAgAiABQQJqIgdMDQAgBSAHQQF0ai8BACEICwJAAkAgAEGcf2oiAkEQSw0AQQEgAnRBgYQGcQ0BC0EDIQYCQCAAQfIARw0AIAhB5QBGDQELAkAgAEH2AEcNACAIQeUARg0BCyAAQewARw0EIAEhACAEIQcgCEHsAEcNBQsgBiABag8LIAEhACAEIQdBACgClIqAgAAgAUEBaiIGTA0DIAMgBSAGQQF0ai8BAGotAAAiAEGAAXENBCAAIAQgAEEjcSICGyEHIAYgASACGyEADAMLIAFBf2ohBgwGCyABQX9qIQcMAwsgASEAIAQhBwsCQCAHQQFxRQ0AQQAoApSKgIAAIgEgACABIABKGyECIAUgAEEBdGohAQNAIAIgAEYNAiAAQQFqIQAgAS8BACEEIAFBAmohASADIARqLQAAIgRBAXENAAsgAEF/akF/IARBGHRBGHVBf0obDwsCQCAHQQJxRQ0AQQAoApSKgIAAIgEgACABIABKGyECIAUgAEEBdGohAQNAIAIgAEYNAiAAQQFqIQAgAS8BACEEIAFBAmohASADIARqLQAAIgRBAnENAAsgAEF/akF/IARBGHRBGHVBf0obDwtBACgClIqAgAAhCAJAIAdBIHFFDQAgCCAAIAggAEobIQIgBSAAQQF0aiEBA0AgAiAARg0CIABBAWohACABLwEAIQQgAUECaiEBIAMgBGotAAAiBEEgcQ0ACyAAQX9qQX8gBEEYdEEYdUF/ShsPCyABIQICQCAIIAFMDQAgASECIARBBHFFDQAgCEF/aiEGIAFBAXQgBWpBAmohACABIQIDQAJAIAYgAkcNACAIIQIMAgsgAkEBaiECIAAvAQAhBCAAQQJqIQAgAyAEai0AAEEEcQ0ACwsgAiACIAhHIAIgAWtBAUdxayECCyACDwsgASEACyAAIAAgByAAIAFrQQFGGyAIIABGGw8LIAEhAAsgACAAIAYgACABa0EBRhsgByAARhsLsAwBCX8CQAJAAkAgAQ0AQX4hAwwBC0EAKAKUioCAACIEIABBAWoiBSAEIAVKGyIGQX9qIQNBACgCkIqAgAAiByAFQQF0aiEIQQAoAoCKgIAAIQkgACEKAkADQAJAIAMgCkcNACAGIQoMAgsgCkEBaiEKIAgvAQAhCyAIQQJqIQggCSALai0AACILQQhxDQALIAtBGHRBGHVBAE4NAEF/DwtBfyEDIApBAEgNAQJAIAQgCkwNAAJAIAkgByAKQQF0aiIILwEAai0AACILQRBxRQ0AIAQgCiAEIApKGyEDA0AgAyAKRg0DIApBAWohCiAILwEAIQsgCEECaiEIIAkgC2otAAAiC0EQcQ0ACyAKQX9qQX8gC0EYdEEYdUF/ShshAwwCCyALQYABcQ0CC0F+IQMgCkEBdCAHakF+aiEIA0AgCiAFTA0BIApBf2ohCiAILwEAIQsgCEF+aiEIIAkgC2otAABBEHFFDQALIApBAWohAwsCQCACRQ0AIANBfkcNAEEAKAKUioCAACIEIAAgBCAAShshC0EAKAKQioCAACIHIABBAXRqIQhBACgCgIqAgAAhBSAAIQoCQANAIAsgCkYNASAKQQFqIQogCC8BACEJIAhBAmohCCAFIAlqLQAAIglBCHENAAtBfyEDIAlBGHRBGHVBAEgNAiAKQX9qIQsLQX8hAyALQQBIDQECQCAEIAtMDQACQCAFIAcgC0EBdGoiCi8BAGotAAAiCEEQcUUNACAEIAsgBCALShshAwNAIAMgC0YNAyALQQFqIQsgCi8BACEIIApBAmohCiAFIAhqLQAAIghBEHENAAsgC0F/akF/IAhBGHRBGHVBf0obIQMMAgsgCEGAAXENAgtBfiEDIAtBAXQgB2pBfmohCgNAIAsgAEwNASALQX9qIQsgCi8BACEIIApBfmohCiAFIAhqLQAAQRBxRQ0ACyALQQFqIQMLAkAgAUUNACADQX5HDQBBACEIAkACQEEAKAKUioCAACIFIABBAWoiCkwNAEEAKAKAioCAACIJQQAoApCKgIAAIgEgCkEBdGovAQBqLQAAIghBCHENAQtBf0F+IAhBgAFxGyEDDAELIAEgCkEBdGohCCAFIAogBSAKShsiBEF/aiEDIAAhCgJAA0ACQCADIApHDQAgBCEKDAILIApBAWohCiAILwEAIQsgCEECaiEIIAkgC2otAAAiC0EIcQ0ACyALQRh0QRh1QQBODQBBfw8LAkAgCkEATg0AQX8PCyAFIAogBSAKShshAyABIApBAXRqIQgDQCADIApGDQEgCkEBaiEKIAgvAQAhCyAIQQJqIQggCSALai0AACILQRBxDQALIApBf2pBfyALQRh0QRh1QX9KGyEDCwJAIAJFDQAgA0F+Rw0AQQAhCAJAAkBBACgClIqAgAAiBSAATA0AQQAoAoCKgIAAIglBACgCkIqAgAAiASAAQQF0aiIKLwEAai0AACIIQQhxDQELQX9BfiAIQYABcRsPCyAFIAAgBSAAShshCAJAA0AgCCAARg0BIABBAWohACAKLwEAIQsgCkECaiEKIAkgC2otAAAiC0EIcQ0AC0F/IQMgC0EYdEEYdUEASA0CIABBf2ohCAsCQCAIQQBODQBBfw8LIAUgCCAFIAhKGyEDIAEgCEEBdGohCgNAIAMgCEYNASAIQQFqIQggCi8BACELIApBAmohCiAJIAtqLQAAIgtBEHENAAtBfyEDIAtBGHRBGHVBAEgNASAIQX9qIQMLQQAhCiADQQBIDQACQEEAKAKUioCAACIIIANMDQBBACEKQQAoApCKgIAAIgkgA0EBdGovAQBBJ0cNAEEAIQBBACELAkAgCCADQQFqIgpMDQAgCSAKQQF0ai8BACELC0ECIQoCQCAIIANBAmoiBUwNACAJIAVBAXRqLwEAIQALAkAgC0EgaiALIAtBv39qQRpJGyILQZx/aiIIQRBLDQBBASAIdEGBhAZxDQELIABBIGogACAAQb9/akEaSRshCEEDIQoCQCALQfIARw0AIAhB5QBGDQELAkAgC0H2AEcNACAIQeUARg0BC0EDQQAgCEHsAEYbQQAgC0HsAEYbIQoLIAogA2ohAwsgAwv+CAIBfA1/QQAgATYClIqAgABBACAANgKQioCAAEQAAAAAAAAAACEKAkAgAiABTg0ARAAAAAAAAAAAIQoDQAJAIAMgAiILEIWAgIAAIgJBAE4NACALIQIMAgsgAiALayEMQQAoApCKgIAAIQ1BxbvyiHghDgJAIAIgC0wNACAMQQNxIQ9BxbvyiHghDiALIRACQCACIAtBf3NqQQNJDQAgDEF8cSERIA0gC0EBdGohAEHFu/KIeCEOIAshEANAIA4gAC8BAHNBk4OACGwgAEECai8BAHNBk4OACGwgAEEEai8BAHNBk4OACGwgAEEGai8BAHNBk4OACGwhDiAAQQhqIQAgEEEEaiEQIBFBfGoiEQ0ACwsgD0UNACANIBBBAXRqIQADQCAOIAAvAQBzQZODgAhsIQ4gAEECaiEAIA9Bf2oiDw0ACwsCQAJAIAxBEEwNACALIAIgDhCAgICAACERDAELIAggDiAJcSISQQV0aiETAkACQCAHIBJBA3RqIhQoAgAiEUEQdiAMRw0AIBQoAgQgDkcNAAJAAkAgDEEBTg0AQQAhEAwBCyANIAtBAXRqIQBBACEQIBMhDwNAIA8vAQAgAC8BAEcNASAPQQJqIQ8gAEECaiEAIAwgEEEBaiIQRw0ADAMLCyAQIAxGDQELIAsgAiAOEICAgIAAIREgFCAONgIEIBQgESAMQRB0cjYCACAMQQFIDQEgEkEEdCEVQQAhDwJAIAxBCEkNACANIAtBAXRqIRYCQCATIA0gAkEBdGpPDQAgFiAIIAIgFWogC2tBAXRqSQ0BCyAMQXhxIg9BeGoiAEEDdkEBaiIOQQNxIRRBACESAkAgAEEYSQ0AIA5B/P///wNxIRdBACEAQQAhEgNAIBMgAGoiDiAWIABqIhD9AAEA/QsBACAOQRBqIBBBEGr9AAEA/QsBACAOQSBqIBBBIGr9AAEA/QsBACAOQTBqIBBBMGr9AAEA/QsBACAAQcAAaiEAIBJBIGohEiAXQXxqIhcNAAsLAkAgFEUNACANIAsgEmpBAXRqIQAgCCASIBVqQQF0aiEOA0AgDiAA/QABAP0LAQAgAEEQaiEAIA5BEGohDiAUQX9qIhQNAAsLIAwgD0YNAgsgAiAPQX9zaiALayEUAkAgDEEDcSIQRQ0AIA0gDyALakEBdGohACAIIA8gFWpBAXRqIQ4DQCAOIAAvAQA7AQAgAEECaiEAIA5BAmohDiAPQQFqIQ8gEEF/aiIQDQALCyAUQQNJDQEgAiAPayALayEQIAggDyAVakEBdGohACANIAsgD2pBAXRqIQ4DQCAAIA4vAQA7AQAgAEECaiAOQQJqLwEAOwEAIABBBGogDkEEai8BADsBACAAQQZqIA5BBmovAQA7AQAgAEEIaiEAIA5BCGohDiAQQXxqIhANAAwCCwsgEUH//wNxIRELIAUgBEECdCIAaiACNgIAIAYgAGogETYCACAEQQFqIQQgCiARt6AhCiACIAFIDQALC0EAIAo5A4iKgIAAQQAgAjYChIqAgAAgBAsLAEEAKAKYioCAAAsLAEEAKAKcioCAAAvCCwIBfBV/QQAgATYClIqAgABBACAANgKQioCAAAJAAkAgAkEBTg0ARAAAAAAAAAAAIQxBACENQQAhDgwBCyAFQXxqIQ9EAAAAAAAAAAAhDEEAIQ5BACENQQAhEEEAIREDQCADIBBBA3RqIgVBBGohEgJAAkAgBSgCACIFQQFIDQAgACAFQX9qIhNBAXRqLwEAQSBGDQELIAUhEwsgEigCACEUAkACQAJAIBEgBE4NACAPIBFBAnQiEmohBSAGIBJqIRICQANAIAVBBGoiFSgCACIWIBNKDQEgEkEEaiESIBUhBSAEIBFBAWoiEUcNAAsgBCERDAELIBYgFEcNAAJAAkAgEQ0AQQAhBQwBCyAFKAIAIQULIAUgE0cNACASKAIAIRcMAQtBACAUNgKUioCAAAJAIBMgFE4NAEEAIRcCQANAAkAgByATIhgQhYCAgAAiE0F/Sg0AQQAgATYClIqAgAAMAgsgEyAYayEZQQAoApCKgIAAIRpBxbvyiHghEgJAIBMgGEwNACAZQQNxIRVBxbvyiHghEiAYIRYCQCATIBhBf3NqQQNJDQAgGUF8cSEbIBogGEEBdGohBUHFu/KIeCESIBghFgNAIBIgBS8BAHNBk4OACGwgBUECai8BAHNBk4OACGwgBUEEai8BAHNBk4OACGwgBUEGai8BAHNBk4OACGwhEiAFQQhqIQUgFkEEaiEWIBtBfGoiGw0ACwsgFUUNACAaIBZBAXRqIQUDQCASIAUvAQBzQZODgAhsIRIgBUECaiEFIBVBf2oiFQ0ACwsCQAJAIBlBEEwNACAYIBMgEhCAgICAACEcDAELIAkgEiAKcSIdQQV0aiEeAkACQCAIIB1BA3RqIhsoAgAiHEEQdiAZRw0AIBsoAgQgEkcNAAJAAkAgGUEBTg0AQQAhFgwBCyAaIBhBAXRqIQVBACEWIB4hFQNAIBUvAQAgBS8BAEcNASAVQQJqIRUgBUECaiEFIBkgFkEBaiIWRw0ADAMLCyAWIBlGDQELIBggEyASEICAgIAAIRwgGyASNgIEIBsgHCAZQRB0cjYCACAZQQFIDQEgHUEEdCEfQQAhFQJAIBlBCEkNACAaIBhBAXRqISACQCAeIBogE0EBdGpPDQAgICAJIBMgH2ogGGtBAXRqSQ0BCyAZQXhxIhVBeGoiBUEDdkEBaiISQQNxIRtBACEdAkAgBUEYSQ0AIBJB/P///wNxISFBACEFQQAhHQNAIB4gBWoiEiAgIAVqIhb9AAEA/QsBACASQRBqIBZBEGr9AAEA/QsBACASQSBqIBZBIGr9AAEA/QsBACASQTBqIBZBMGr9AAEA/QsBACAFQcAAaiEFIB1BIGohHSAhQXxqIiENAAsLAkAgG0UNACAaIBggHWpBAXRqIQUgCSAdIB9qQQF0aiESA0AgEiAF/QABAP0LAQAgBUEQaiEFIBJBEGohEiAbQX9qIhsNAAsLIBkgFUYNAgsgEyAVQX9zaiAYayEbAkAgGUEDcSIWRQ0AIBogFSAYakEBdGohBSAJIBUgH2pBAXRqIRIDQCASIAUvAQA7AQAgBUECaiEFIBJBAmohEiAVQQFqIRUgFkF/aiIWDQALCyAbQQNJDQEgEyAVayAYayEWIAkgFSAfakEBdGohBSAaIBggFWpBAXRqIRIDQCAFIBIvAQA7AQAgBUECaiASQQJqLwEAOwEAIAVBBGogEkEEai8BADsBACAFQQZqIBJBBmovAQA7AQAgBUEIaiEFIBJBCGohEiAWQXxqIhYNAAwCCwsgHEH//wNxIRwLIBwgF2ohFyATIBRIDQALQQAgATYClIqAgAAgF0F/Sg0CCyALIA1BAnRqIBA2AgAgDUEBaiENDAILQQAhF0EAIAE2ApSKgIAACyAOIBdBAUpqIQ4gDCAXt6AhDAsgEEEBaiIQIAJHDQALC0EAIA02ApyKgIAAQQAgDjYCmIqAgAAgDAuhDgUFfwF7An8DfAF/QQAhBEEAIANBIGoiBTYCoIqAgABBACAFIAMoAgwiBkEDdGoiBzYCpIqAgABBAEEBIAMoAhB0IgNBf2o2ArCKgIAAQQAgB0GAgCBqIgU2AqiKgIAAQQAgBkECdCAFakEEaiIFNgKsioCAAEEAIAUgA0ECdGo2ArSKgIAAAkAgASACTg0AQQAhBQNAAkACQCAAIAFBAXRqLwEAIgNB/wBLDQBBASEEIAUhBgwBCwJAIANB/w9LDQAgBUHAioCAAGogA0EGdkHAAXI6AAAgBUEBaiEGIANBP3FBgH9yIQNBAiEEDAELAkACQCADQYDAAGpB//8DcUH/7wNLDQAgBUHAioCAAGogA0EMdkHgAXI6AAAgBUHBioCAAGogA0EGdkE/cUGAAXI6AAAgBUECaiEGIANBP3FBgH9yIQMMAQsCQCABQQFqIgggAk4NACADQf+3A0sNACAAIAhBAXRqLwEAIgRBgLgDSQ0AIARB/78DSw0AIAVBwIqAgABqIANBCnQgBGoiAUGAyIBlaiIDQRJ2QfABcjoAACAFQcGKgIAAaiADQQx2QT9xQYABcjoAACAFQcKKgIAAaiADQQZ2QT9xQYABcjoAACAFQQNqIQYgAUE/cUGAf3IhA0EEIQQgCCEBDAILIAVBwYqAgABqQb8BOgAAIAVBwIqAgABqQe8BOgAAIAVBAmohBkG9ASEDC0EDIQQLIAZBwIqAgABqIAM6AAAgBCAFaiEFIAFBAWoiASACSA0AC0EBIQQgBUECSQ0AQQAhA0EAIAUQjICAgABEAAAAAAAA8H9iDQAgBUEBaiEEAkACQCAFQQNJDQAgBEF8cSIDQXxqIgFBAnZBAWoiAkEDcSEGAkACQCABQQxPDQD9DAAAAAABAAAAAgAAAAMAAAAhCUEAIQIMAQsgAkH8////B3EhAP0MAAAAAAEAAAACAAAAAwAAACEJQQAhAkHAjoCAACEBA0AgASAJ/QsEACABQTBqIAn9DAwAAAAMAAAADAAAAAwAAAD9rgH9CwQAIAFBIGogCf0MCAAAAAgAAAAIAAAACAAAAP2uAf0LBAAgAUEQaiAJ/QwEAAAABAAAAAQAAAAEAAAA/a4B/QsEACABQcAAaiEBIAn9DBAAAAAQAAAAEAAAABAAAAD9rgEhCSACQRBqIQIgAEF8aiIADQALCwJAIAZFDQAgAkECdEHAjoCAAGohAQNAIAEgCf0LBAAgAUEQaiEBIAn9DAQAAAAEAAAABAAAAAQAAAD9rgEhCSAGQX9qIgYNAAsLIAQgA0YNAQsgA0ECdEHAjoCAAGohAQNAIAEgAzYCACABQQRqIQEgBCADQQFqIgNHDQALC0EBIQQgBUECSQ0AIAVBf2oiCEEBIAhBAUobIgFBAXEhAkEAIQNBAC0AwIqAgAAhBAJAIAVBAkYNACABQf7///8HcSEGQQAhA0HAnoCAACEBA0AgASAHIARB/wFxQQt0IANBwYqAgABqLQAAIgRBA3RyaisDADkDACABQQhqIAcgBEELdCADQcKKgIAAai0AACIEQQN0cmorAwA5AwAgAUEQaiEBIAYgA0ECaiIDRw0ACwsCQCACRQ0AIANBA3RBwJ6AgABqIAcgBEH/AXFBC3QgA0HBioCAAGotAABBA3RyaisDADkDAAtBASEEIAVBAkkNACAFQX5qIQpBACEHIAghAANAAkAgBUECTg0AIAUPCyAAQQNxIQsCQAJAIAogB2tBA08NAEQAAAAAAADwfyEMQX8hBEEAIQMMAQsgAEF8cSECRAAAAAAAAPB/IQxBfyEEQQAhA0HAnoCAACEBA0AgA0EDaiADQQJqIANBAWogAyAEIAErAwAiDSAMYyIGGyABQQhqKwMAIg4gDSAMIAYbIgxjIgQbIAFBEGorAwAiDSAOIAwgBBsiDGMiBBsgAUEYaisDACIOIA0gDCAEGyIMYyIGGyEEIA4gDCAGGyEMIAFBIGohASADQQRqIgMgAkcNAAsLAkAgC0UNACAIQQNxIQYgA0EDdEHAnoCAAGohAQNAIAMgBCABKwMAIg0gDGMiAhshBCANIAwgAhshDCABQQhqIQEgA0EBaiEDIAZBf2oiBg0ACwsCQCAEQQBODQAgBQ8LIARBAnQiA0HEjoCAAGoiAiADQciOgIAAaiILIAUgBGsiAUECdEF8avwKAAAgBEEDdCIGQcCegIAAaiIPIAZByJ6AgABqIAFBA3RBcGr8CgAAAkAgBCAFQX5qTg0AIA8gA0HAjoCAAGooAgAgCygCABCMgICAADkDAAsCQCAERQ0AIARBf2oiA0EDdEHAnoCAAGogA0ECdEHAjoCAAGooAgAgAigCABCMgICAADkDAAsgCEEDaiEIQQEhBCAHQQFqIQcgAEF/aiEAIAVBAkohAyAFQX9qIQUgAw0ACwsgBAvNBAMFfwF8BH9BxbvyiHghAgJAIAEgAEwNACABIABrIgJBA3EhAwJAAkAgAEF/cyABakEDTw0AQcW78oh4IQIgACEEDAELIAJBfHEhBUEAIQZBxbvyiHghAgNAIAIgACAGaiIEQcCKgIAAai0AAHNBk4OACGwgBEHBioCAAGotAABzQZODgAhsIARBwoqAgABqLQAAc0GTg4AIbCAEQcOKgIAAai0AAHNBk4OACGwhAiAFIAZBBGoiBkcNAAsgACAGaiEECyADRQ0AIARBwIqAgABqIQQDQCACIAQtAABzQZODgAhsIQIgBEEBaiEEIANBf2oiAw0ACwtEAAAAAAAA8H8hBwJAQQAoAqyKgIAAIgMgAkEAKAKwioCAACIFcSIGQQJ0aigCACICRQ0AQQAoAqiKgIAAIQgCQAJAIAEgAGsiCUEBSA0AQQAoArSKgIAAIQoDQAJAIAggAkECdGooAgAgCCACQX9qIgtBAnRqKAIAIgJrIAlHDQAgCiACaiEEIAAhAgNAAkAgBC0AACACQcCKgIAAai0AAEYNACABIAJGDQUMAgsgBEEBaiEEIAEgAkEBaiICRw0ADAQLCyADIAZBAWogBXEiBkECdGooAgAiAg0ADAMLCwJAIAlFDQADQCADIAZBAWogBXEiBkECdGooAgANAAwDCwsDQCAIIAJBAnRqKAIAIAggAkF/aiILQQJ0aigCAEYNASADIAZBAWogBXEiBkECdGooAgAiAkUNAgwACwtBACgCoIqAgAAgC0EDdGorAwAhBwsgBwsLAEEAKAK4voCAAAsSACAAIAFBAEEAQQAQj4CAgAALjAkDB38BfAt/AkAgA0UNACADQQA2AgALQQAhBUEAIQYCQAJAIAFBAUgNACAAQQFqIQdBACEGQQAhCEEAIQUDQAJAIAAgCGotAAAiCUEKRg0AAkACQCAJQSFPDQAgCEEBaiEKDAELA0AgByAIaiEJIAhBAWoiCyEIIAktAAAiCUEgSw0ACyALQQFqIQogCyEICwJAIAlBIEYNAEF/DwsCQCAIIAFIDQBBfw8LAkAgACAKai0AACILQVBqQf8BcUEJTQ0AQX8PC0QAAAAAAAAAACEMA0AgDEQAAAAAAAAkQKIgC0H/AXFBUGq3oCEMIAcgCmohCyAKQQFqIgkhCiALLQAAIgtBUGpB/wFxQQpJDQALAkAgCEEBaiAJRw0AQX8PCwJAIAxE////////P0NkRQ0AQX8PCwNAIAAgCWohCiAJQQFqIgshCSAKLQAAIgpBIEsNAAsgC0F/aiEIAkAgCkEgRw0AIAggAU4NAANAIAAgCCINaiEOIA1BAWohCEEAIQkDQCAOIAlqIQogCUEBaiILIQkgCkEBai0AACIKQSBLDQALAkAgCkEgRiIJDQAgCkEKRg0AQX8PCwJAIAtBAUcNAAJAIAlFDQBBfw8LIAAgCGotAAAhCgwCCyAOIAtqIQ8CQAJAAkAgC0F/aiIKQQFIDQBBACEJIA9Bf2otAABBPUcNAiAKQQFLDQFBfw8LQQAhCSALQQFHDQFBfw8LQX8hECAKQQNxDQZBfkF/IA9BfmotAABBPUYbIQkLQX8hECAJIAtqQX9qIglBBG9BAUYNBSAJQQZsIglBCG0hESAJQXlIDQUCQCAERQ0AIAQgBWohEkEAIRNBACEUAkAgEUEDSQ0AIA1BAmohDkEAIQlBACETA0AgEiAJaiIIQQJqIAAgDmoiCi0AAEGAiICAAGosAAAiFEEMdCAKQX9qLQAAQYCIgIAAaiwAACIVQRJ0ciAKQQFqLQAAQYCIgIAAaiwAACIWQQZ0ciAKQQJqLQAAQYCIgIAAaiwAACIXciIKOgAAIAhBAWogCkEIdjoAACAIIApBEHY6AAAgEyAUIBVyIBZyIBdyciETIA5BBGohDiAJQQZqIQogCUEDaiIUIQkgCiARTA0ACyAOQX9qIQgLAkAgESAUTA0AIAAgCGoiCC0AAEGAiICAAGosAAAhCiAIQQFqLQAAQYCIgIAAaiwAACEOQQAhCQJAIBEgFGtBAkciFQ0AIAhBAmotAABBgIiAgABqLAAAIQkLIBIgFGoiCCAOQQx0IApBEnRyIAlBBnRyIhRBEHY6AAAgEyAOIApyciAJciETIBUNACAIQQFqIBRBCHY6AAALIBNBAEgNBgsgESAFaiEFAkACQCACDQAgBkEBaiEGDAELIAIgBkEDdGogDDkDACADIAZBAWoiBkECdGogBTYCAAsCQCAPLQAAIgpBIEcNACAMRAAAAAAAAPA/oCEMIA0gC2oiCCABSA0BCwsgDSALaiEIC0F/IRAgCkH/AXFBCkcNAwsgCEEBaiIIIAFIDQALC0EAIAU2Ari+gIAAIAYhEAsgEAuUBwMLfwF7BH8gAigCDCEDQX4hBAJAIAMgACABIAJBIGoiBSAFIANBA3RqIgZBgIAgaiIHIAcgA0ECdGpBBGoiCEEBIAIoAhB0IglBAnQiCmoiCxCPgICAAEcNAEEAIQFBACgCuL6AgAAgAigCFEcNACAJQX9qIQwgAiADQQF0QQJ0aiENA0AgDSABaiIAQZABav0MAAAAAAAA8H8AAAAAAADwfyIO/QsDACAAQYABaiAO/QsDACAAQfAAaiAO/QsDACAAQeAAaiAO/QsDACAAQdAAaiAO/QsDACAAQcAAaiAO/QsDACAAQTBqIA79CwMAIABBIGogDv0LAwAgAUGAAWoiAUGAgCBHDQALQQAhDyAIQQAgCvwLAAJAIANBAU4NAEF/DwsgAiAJIANBA2xqQQJ0aiIKQaSAIGohEANAQcW78oh4IQACQCAHIA8iBEEBaiIPQQJ0aigCACIRIAcgBEECdGooAgAiEkwNACARIBJrIglBA3EhAkHFu/KIeCEAIBIhAQJAIBEgEkF/c2pBA0kNACASQaSAIGohDSAJQXxxIQlBxbvyiHghAANAIAAgCiANaiIBLQAAc0GTg4AIbCABQQFqLQAAc0GTg4AIbCABQQJqLQAAc0GTg4AIbCABQQNqLQAAc0GTg4AIbCEAIA1BBGohDSAJQXxqIgkNAAsgDUHc/19qIQELIAJFDQAgECABaiEBA0AgACABLQAAc0GTg4AIbCEAIAFBAWohASACQX9qIgINAAsLIBEgEmshCQJAAkAgCCAAIAxxIgJBAnRqIgAoAgAiAUUNAAJAIAlBAUgNACAQIBJqIREDQAJAIAcgAUECdGoiACgCACAAQXxqKAIAIgBrIAlHDQAgECAAaiEAIBEhASAJIQ0DQAJAIAAtAAAgAS0AAEYNACANRQ0IDAILIABBAWohACABQQFqIQEgDUF/aiINDQAMBwsLIAggAkEBaiAMcSICQQJ0aiIAKAIAIgENAAwCCwsCQCAJDQADQCAHIAFBAnRqIgAoAgAgAEF8aigCAEYNBSAIIAJBAWogDHEiAkECdGoiACgCACIBDQALIAAgDzYCAAwCCwNAIAggAkEBaiAMcSICQQJ0aiIAKAIADQALCyAAIA82AgAgCUECRw0AIAYgCyASaiIALQAAQQt0IABBAWotAABBA3RyaiAFIARBA3RqKwMAOQMAC0F/IQQgDyADRw0ACwsgBAsLiAIBAEGACAuAAv////////////////////////////////////////////////////////8+////PzQ1Njc4OTo7PD3/////////AAECAwQFBgcICQoLDA0ODxAREhMUFRYXGBn///////8aGxwdHh8gISIjJCUmJygpKissLS4vMDEyM/////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////////8=";

// src/measure/kernels/tokens-kernel.ts
var KERNEL_PATTERN = { gpt2: 0, cl100k_base: 1, o200k_base: 2 };
var MAX_KERNEL_UNITS = 1 << 18;
var MAX_MERGE_UNITS = 170;
var KEY_UNITS = 16;
var TokenKernel = class {
  kernel;
  /** Capacity of the per-text buffers, in units of text. */
  units = 0;
  textAt = 0;
  endsAt = 0;
  countsAt = 0;
  offsetsAt = 0;
  leftAt = 0;
  /** Length of the loaded text. */
  n = 0;
  buffer = null;
  rankTables = /* @__PURE__ */ new WeakMap();
  resolver = () => {
    throw new Error("token kernel: no text is being counted");
  };
  /** Ends and counts of the loaded text's pieces (views, one entry per unit; valid until the next load). */
  ends = new Int32Array(0);
  counts = new Int32Array(0);
  offsets = new Int32Array(0);
  constructor(classes2) {
    this.kernel = instantiateKernel(WASM_BASE644, {
      resolve: (start, end, hash2) => this.resolver(start, end, hash2)
    });
    this.kernel.setClasses(this.kernel.place(classes2));
  }
  /** Returns where a rank table (ranks.ts's layout, in a SharedArrayBuffer) is in the kernel's memory, copying it there the first time. Call it before load(): the copy may grow the memory. */
  placeRanks(buffer) {
    let at = this.rankTables.get(buffer);
    if (at === void 0) {
      at = this.kernel.place(new Uint8Array(buffer));
      this.rankTables.set(buffer, at);
    }
    return at;
  }
  /**
   * Builds the rank table of a js-tiktoken builtin from its `bpe_ranks` text (ASCII) as
   * ranks.ts's parseBuiltinRanks does, byte for byte, and copies it out to a SharedArrayBuffer
   * that placeRanks then finds already placed. The text stays in the kernel's memory (this runs
   * once a thread, for the main tokenizer and the baseline at most).
   */
  buildRanks(text, layout) {
    const n = text.length;
    if (Buffer.byteLength(text, "utf8") !== n) return { damaged: true };
    const textAt2 = this.kernel.allocate(n + 1);
    const bytes3 = Buffer.from(this.kernel.memory.buffer, textAt2, n + 1);
    bytes3.write(text, "latin1");
    bytes3[n] = 10;
    const count3 = this.kernel.scanBuiltinRanks(textAt2, n);
    if (count3 < 0) return { damaged: true };
    const { header, bytes: size } = layout(count3, this.kernel.scannedBytes());
    const at = this.kernel.allocate(size);
    const memory = this.kernel.memory.buffer;
    new Int32Array(memory, at, header.length).set(header);
    const result = this.kernel.fillBuiltinRanks(textAt2, n, at);
    if (result === -2) return { damaged: true };
    if (result >= 0) return { duplicate: result };
    const table3 = new SharedArrayBuffer(size);
    new Uint8Array(table3).set(new Uint8Array(memory, at, size));
    this.rankTables.set(table3, at);
    return { table: table3 };
  }
  /** The byte-pair token count of the loaded text's [start, end) (at most MAX_MERGE_UNITS units) under the rank table placed at `ranks`. */
  merge(start, end, ranks) {
    return this.kernel.mergeCount(this.textAt, start, end, ranks);
  }
  /** Reserves a cache of `entries` (a power of two) in the kernel's memory, empty. Call it before load(). */
  createCache(entries) {
    if (!(entries >= 1 && (entries & entries - 1) === 0)) throw new RangeError(`token kernel cache: entries must be a power of two, got ${entries}`);
    const slots = this.kernel.allocate(entries * 8);
    const keys = this.kernel.allocate(entries * KEY_UNITS * 2);
    new Uint8Array(this.kernel.memory.buffer, slots, entries * 8).fill(0);
    return { slots, keys, mask: entries - 1 };
  }
  /** Copies a text (at most MAX_KERNEL_UNITS long) into the kernel's memory; the resolver counts the pieces of it that the caches lack. */
  load(text, resolver) {
    const n = text.length;
    if (n + 2 > this.units) {
      this.units = Math.max(n + 2, this.units * 2, 4096);
      this.textAt = this.kernel.allocate(this.units * 2);
      this.endsAt = this.kernel.allocate(this.units * 4);
      this.countsAt = this.kernel.allocate(this.units * 4);
      this.offsetsAt = this.kernel.allocate(this.units * 4);
      this.leftAt = this.kernel.allocate(this.units * 2);
      this.buffer = null;
    }
    const buffer = this.kernel.memory.buffer;
    if (buffer !== this.buffer) {
      this.buffer = buffer;
      this.ends = new Int32Array(buffer, this.endsAt, this.units);
      this.counts = new Int32Array(buffer, this.countsAt, this.units);
      this.offsets = new Int32Array(buffer, this.offsetsAt, this.units);
    }
    this.kernel.writeUtf16(this.textAt, text);
    this.n = n;
    this.resolver = resolver;
  }
  /** Splits the loaded text from `from` under a pattern, writing pieces at ends/counts[first, ...); returns the index after the last one written. */
  count(from, first, pattern, cache) {
    return this.kernel.countPieces(this.textAt, this.n, from, pattern, first, this.endsAt, this.countsAt, cache.slots, cache.keys, cache.mask);
  }
  /** Where the last count() stopped: the text's length, or a piece the kernel cannot decide (a surrogate is involved). */
  stoppedAt() {
    return this.kernel.stoppedAt();
  }
  /** Tokens of the pieces the last count() wrote. */
  tokens() {
    return this.kernel.tokens();
  }
  /** The tokens of each word of the loaded text alone (`offsets`: start and end of each word, in order), given its `pieces` pieces in ends/counts. */
  wordTokens(offsets2, pieces, pattern, cache) {
    const words = offsets2.length >> 1;
    this.offsets.set(offsets2);
    const wordTokens = this.kernel.wordTokens(this.textAt, this.n, words, this.offsetsAt, pieces, this.endsAt, this.countsAt, pattern, cache.slots, cache.keys, cache.mask, this.leftAt);
    const left = new Int32Array(this.kernel.memory.buffer, this.leftAt, this.kernel.leftWords());
    return { wordTokens, continuedWords: this.kernel.continuedWords(), left };
  }
  /** The end of the piece at p of the loaded text, or -1 when a surrogate is involved (for the tests). */
  pieceEnd(p, pattern) {
    return this.kernel.pieceEnd(this.textAt, this.n, p, pattern);
  }
};
var kernel4;
function tokenKernel(classes2) {
  return kernel4 ??= new TokenKernel(classes2());
}

// src/measure/tokens/split.ts
var LETTER = 1;
var NUMBER = 2;
var SPACE2 = 4;
var UPPERISH = 8;
var LOWERISH = 16;
var OTHER4 = 32;
var PREFIX = 64;
var SURROGATE = 128;
var APOSTROPHE = 39;
var SPACE_UNIT = 32;
var SLASH = 47;
var table2;
function unitClasses() {
  if (table2) return table2;
  const classes2 = new Uint8Array(65536);
  const units = new Uint8Array(131072);
  for (let u = 0; u < 65536; u++) {
    if (u >= 55296 && u <= 57343) continue;
    units[2 * u] = u & 255;
    units[2 * u + 1] = u >>> 8;
  }
  const all = new TextDecoder("utf-16le").decode(units);
  const mark = (source, bit) => {
    for (const m of all.matchAll(new RegExp(`(?:${source})+`, "gu"))) {
      for (let u = m.index, end = m.index + m[0].length; u < end; u++) classes2[u] = classes2[u] | bit;
    }
  };
  mark(String.raw`\p{L}`, LETTER);
  mark(String.raw`\p{N}`, NUMBER);
  mark(String.raw`\s`, SPACE2);
  mark(String.raw`[\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]`, UPPERISH);
  mark(String.raw`[\p{Ll}\p{Lm}\p{Lo}\p{M}]`, LOWERISH);
  for (let u = 0; u < 65536; u++) {
    if (u >= 55296 && u <= 57343) {
      classes2[u] = SURROGATE;
      continue;
    }
    const c = classes2[u];
    if ((c & (LETTER | NUMBER | SPACE2)) === 0) classes2[u] = c | OTHER4;
    if ((c & (LETTER | NUMBER)) === 0 && u !== 10 && u !== 13) classes2[u] = classes2[u] | PREFIX;
  }
  return table2 = classes2;
}
function classAt(C, text, i) {
  return i < text.length ? C[text.charCodeAt(i)] : 0;
}
function contraction(text, i, caseless) {
  if (text.charCodeAt(i) !== APOSTROPHE) return 0;
  let a = text.charCodeAt(i + 1);
  let b = text.charCodeAt(i + 2);
  if (caseless) {
    if (a >= 65 && a <= 90) a += 32;
    if (b >= 65 && b <= 90) b += 32;
  }
  if (a === 115 || a === 116 || a === 109 || a === 100) return 2;
  if (a === 114 && b === 101 || a === 118 && b === 101 || a === 108 && b === 108) return 3;
  return 0;
}
function run(C, text, i, mask) {
  const n = text.length;
  while (i < n) {
    const c = C[text.charCodeAt(i)];
    if ((c & mask) === 0) return (c & SURROGATE) === 0 ? i : -1;
    i++;
  }
  return i;
}
function spaceRun(C, text, i) {
  const n = text.length;
  while (i < n && (C[text.charCodeAt(i)] & SPACE2) !== 0) i++;
  return i;
}
function trailing(text, i, slash) {
  for (; ; ) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13 || slash && c === SLASH) i++;
    else return i;
  }
}
function digits(C, text, p) {
  let e = p + 1;
  while (e < p + 3) {
    const d = classAt(C, text, e);
    if ((d & NUMBER) === 0) return (d & SURROGATE) === 0 ? e : -1;
    e++;
  }
  return e;
}
function punctuation(C, text, p, c, slash) {
  let s = -1;
  if (text.charCodeAt(p) === SPACE_UNIT) {
    const d = classAt(C, text, p + 1);
    if ((d & SURROGATE) !== 0) return -1;
    if ((d & OTHER4) !== 0) s = p + 1;
  }
  if (s < 0 && (c & OTHER4) !== 0) s = p;
  if (s < 0) return -2;
  const o = run(C, text, s, OTHER4);
  return o < 0 ? -1 : trailing(text, o, slash);
}
function spaceRunWithNewlines(C, text, p, q) {
  for (let i = q - 1; i >= p; i--) {
    const u = text.charCodeAt(i);
    if (u === 10 || u === 13) return i + 1;
  }
  if (q === text.length || q - p === 1) return q;
  return q - 1;
}
var splitGpt2 = (text, p) => {
  const C = unitClasses();
  const c = C[text.charCodeAt(p)];
  if ((c & SURROGATE) !== 0) return -1;
  if (text.charCodeAt(p) === APOSTROPHE) {
    const len = contraction(text, p, false);
    if (len > 0) return p + len;
  }
  let s = p;
  let k = c;
  if (text.charCodeAt(p) === SPACE_UNIT) {
    const d = classAt(C, text, p + 1);
    if ((d & SURROGATE) !== 0) return -1;
    if ((d & (LETTER | NUMBER | OTHER4)) !== 0) {
      s = p + 1;
      k = d;
    }
  }
  if ((k & LETTER) !== 0) return run(C, text, s, LETTER);
  if ((k & NUMBER) !== 0) return run(C, text, s, NUMBER);
  if ((k & OTHER4) !== 0) return run(C, text, s, OTHER4);
  const q = spaceRun(C, text, p);
  if (q === text.length || q - p === 1) return q;
  return q - 1;
};
function upperThenLower(C, text, s) {
  const u = run(C, text, s, UPPERISH);
  if (u < 0) return -1;
  const next = classAt(C, text, u);
  if ((next & LOWERISH) !== 0) return run(C, text, u, LOWERISH);
  if ((next & SURROGATE) !== 0) return -1;
  for (let j = u - 1; j >= s; j--) if ((C[text.charCodeAt(j)] & LOWERISH) !== 0) return j + 1;
  return -2;
}
function upperAndLower(C, text, s) {
  const first = classAt(C, text, s);
  if ((first & UPPERISH) === 0) return (first & SURROGATE) === 0 ? -2 : -1;
  const u = run(C, text, s, UPPERISH);
  return u < 0 ? -1 : run(C, text, u, LOWERISH);
}
function o200kWord(C, text, p, prefixed, letterish) {
  let e = -2;
  if (prefixed) e = upperThenLower(C, text, p + 1);
  if (e === -2 && letterish) e = upperThenLower(C, text, p);
  if (e === -2 && prefixed) e = upperAndLower(C, text, p + 1);
  if (e === -2 && letterish) e = upperAndLower(C, text, p);
  return e < 0 ? e : e + contraction(text, e, true);
}
var splitO200k = (text, p) => {
  const C = unitClasses();
  const c = C[text.charCodeAt(p)];
  if ((c & SURROGATE) !== 0) return -1;
  const letterish = (c & (UPPERISH | LOWERISH)) !== 0;
  if (letterish && (c & PREFIX) === 0) {
    const e = o200kWord(C, text, p, false, true);
    return e < 0 ? -1 : e;
  }
  if ((c & NUMBER) !== 0) return digits(C, text, p);
  if ((c & PREFIX) !== 0) {
    const e = o200kWord(C, text, p, true, letterish);
    if (e !== -2) return e;
    const o = punctuation(C, text, p, c, true);
    if (o !== -2) return o;
  }
  return spaceRunWithNewlines(C, text, p, spaceRun(C, text, p));
};
var splitCl100k = (text, p) => {
  const C = unitClasses();
  const c = C[text.charCodeAt(p)];
  if ((c & SURROGATE) !== 0) return -1;
  if (text.charCodeAt(p) === APOSTROPHE) {
    const len = contraction(text, p, true);
    if (len > 0) return p + len;
  }
  if ((c & LETTER) !== 0) return run(C, text, p, LETTER);
  if ((c & NUMBER) !== 0) return digits(C, text, p);
  if ((c & PREFIX) !== 0) {
    const d = classAt(C, text, p + 1);
    if ((d & SURROGATE) !== 0) return -1;
    if ((d & LETTER) !== 0) return run(C, text, p + 1, LETTER);
    const o = punctuation(C, text, p, c, false);
    if (o !== -2) return o;
  }
  return spaceRunWithNewlines(C, text, p, spaceRun(C, text, p));
};

// src/measure/tokens/ranks.ts
var NO_RANK = Infinity;
var COUNT = 3;
var SLOT_BITS = 4;
var ARENA_BYTES = 5;
var HEADER_WORDS = 8;
var MAGIC_VALUE = 1936478769;
function ownerHashes(owner) {
  let a = 2166136261 | 0;
  let b = 2654435769 | 0;
  for (let i = 0; i < owner.length; i++) {
    a = Math.imul(a ^ owner.charCodeAt(i), 16777619);
    b = Math.imul(b ^ owner.charCodeAt(i), 1540483477) ^ b >>> 15;
  }
  return [a, b];
}
var MAGIC2 = 0;
var OWNER_1 = 1;
var OWNER_2 = 2;
function stampOwner(header, owner, magic) {
  const [a, b] = ownerHashes(owner);
  header[OWNER_1] = a;
  header[OWNER_2] = b;
  header[MAGIC2] = magic;
}
function ownedBy(buffer, owner, magic, words) {
  if (!(buffer instanceof SharedArrayBuffer) || buffer.byteLength < words * 4) return false;
  const header = new Int32Array(buffer, 0, words);
  const [a, b] = ownerHashes(owner);
  return header[MAGIC2] === magic && header[OWNER_1] === a && header[OWNER_2] === b;
}
function hashBytes(bytes3, start, end) {
  let h = 2166136261 | 0;
  for (let i = start; i < end; i++) h = Math.imul(h ^ bytes3[i], 16777619);
  return h;
}
var RankTable = class _RankTable {
  constructor(buffer) {
    this.buffer = buffer;
    const header = new Int32Array(buffer, 0, HEADER_WORDS);
    const count3 = header[COUNT];
    const slotCount = 1 << header[SLOT_BITS];
    this.mask = slotCount - 1;
    let at = HEADER_WORDS * 4;
    this.ranks = new Float64Array(buffer, at, count3);
    at += count3 * 8;
    this.pairs = new Float64Array(buffer, at, 1 << 16);
    at += (1 << 16) * 8;
    this.offsets = new Int32Array(buffer, at, count3 + 1);
    at += (count3 + 1) * 4;
    this.slots = new Int32Array(buffer, at, slotCount);
    at += slotCount * 4;
    this.arena = new Uint8Array(buffer, at, header[ARENA_BYTES]);
  }
  buffer;
  /** Rank of each two-byte token, indexed by first byte << 8 | second (NO_RANK where there is none). */
  pairs;
  offsets;
  ranks;
  slots;
  mask;
  arena;
  /** Returns the table in `buffer` (from another thread's table, or one the token kernel built) when it was made for the tokenizer `owner`, else null. */
  static attach(buffer, owner) {
    return ownedBy(buffer, owner, MAGIC_VALUE, HEADER_WORDS) ? new _RankTable(buffer) : null;
  }
  /** Builds a table from token bytes (concatenated in `arena`, token i at offsets[i]..offsets[i+1]) and ranks; `duplicate(i)` is called for a token listed before. */
  static build(owner, arena, offsets2, ranks, count3, duplicate) {
    const arenaBytes = offsets2[count3];
    const layout = rankTableLayout(owner, count3, arenaBytes);
    const buffer = new SharedArrayBuffer(layout.bytes);
    new Int32Array(buffer, 0, HEADER_WORDS).set(layout.header);
    const table3 = new _RankTable(buffer);
    table3.ranks.set(ranks.subarray(0, count3));
    table3.offsets.set(offsets2.subarray(0, count3 + 1));
    table3.arena.set(arena.subarray(0, arenaBytes));
    table3.pairs.fill(NO_RANK);
    const { slots, mask } = table3;
    const own = table3.arena;
    for (let i = 0; i < count3; i++) {
      const start = offsets2[i];
      const end = offsets2[i + 1];
      let slot = hashBytes(own, start, end) & mask;
      for (; ; ) {
        const v = slots[slot];
        if (v === 0) {
          slots[slot] = i + 1;
          break;
        }
        if (table3.sameBytes(v - 1, own, start, end)) {
          duplicate(i);
          break;
        }
        slot = slot + 1 & mask;
      }
      if (end - start === 2) table3.pairs[own[start] << 8 | own[start + 1]] = ranks[i];
    }
    return table3;
  }
  sameBytes(token, bytes3, start, end) {
    const from = this.offsets[token];
    if (this.offsets[token + 1] - from !== end - start) return false;
    const arena = this.arena;
    for (let k = 0; k < end - start; k++) if (arena[from + k] !== bytes3[start + k]) return false;
    return true;
  }
  /** Returns the rank of the token whose bytes are bytes[start, end), or NO_RANK. */
  rank(bytes3, start, end) {
    const { slots, mask } = this;
    for (let slot = hashBytes(bytes3, start, end) & mask; ; slot = slot + 1 & mask) {
      const v = slots[slot];
      if (v === 0) return NO_RANK;
      if (this.sameBytes(v - 1, bytes3, start, end)) return this.ranks[v - 1];
    }
  }
  /** Returns the single bytes that are not tokens, as `0x..` strings (a byte-level vocabulary has none). */
  missingBytes() {
    const missing = [];
    const one = new Uint8Array(1);
    for (let b = 0; b < 256; b++) {
      one[0] = b;
      if (this.rank(one, 0, 1) === NO_RANK) missing.push(`0x${b.toString(16).padStart(2, "0")}`);
    }
    return missing;
  }
};
function rankTableLayout(owner, count3, arenaBytes) {
  let bits = 1;
  while (1 << bits < count3 * 2) bits++;
  const header = new Int32Array(HEADER_WORDS);
  header[COUNT] = count3;
  header[SLOT_BITS] = bits;
  header[ARENA_BYTES] = arenaBytes;
  stampOwner(header, owner, MAGIC_VALUE);
  return { header, bytes: HEADER_WORDS * 4 + count3 * 8 + (1 << 16) * 8 + (count3 + 1) * 4 + (1 << bits) * 4 + arenaBytes };
}
var TokenList = class {
  arena = new Uint8Array(1 << 20);
  offsets = new Int32Array(1 << 16);
  ranks = new Float64Array(1 << 16);
  count = 0;
  used = 0;
  /** Makes room for one more token of at most `bytes` bytes. */
  reserve(bytes3) {
    if (this.used + bytes3 > this.arena.length) {
      const a = new Uint8Array(Math.max(this.arena.length * 2, this.used + bytes3));
      a.set(this.arena.subarray(0, this.used));
      this.arena = a;
    }
    if (this.count + 2 > this.offsets.length) {
      const o = new Int32Array(this.offsets.length * 2);
      o.set(this.offsets);
      this.offsets = o;
      const r = new Float64Array(this.ranks.length * 2);
      r.set(this.ranks);
      this.ranks = r;
    }
  }
  /** Ends the token whose bytes were written at used.. with `rank`. */
  close(end, rank2) {
    this.ranks[this.count] = rank2;
    this.count++;
    this.used = end;
    this.offsets[this.count] = end;
  }
};
var BASE64_VALUE = (() => {
  const v = new Int8Array(128).fill(-1);
  const alphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";
  for (let i = 0; i < alphabet.length; i++) v[alphabet.charCodeAt(i)] = i;
  return v;
})();
function decodeBase64(text, start, end, out, at) {
  const length = end - start;
  let pad = 0;
  if (length > 0 && text.charCodeAt(end - 1) === 61) pad = length > 1 && text.charCodeAt(end - 2) === 61 ? 2 : 1;
  if (length === 0 || pad > 0 && length % 4 !== 0 || (length - pad) % 4 === 1) return -1;
  const last = end - pad;
  let bits = 0;
  let held = 0;
  for (let i = start; i < last; i++) {
    const c = text.charCodeAt(i);
    const v = c < 128 ? BASE64_VALUE[c] : -1;
    if (v < 0) return -1;
    bits = bits << 6 | v;
    held += 6;
    if (held >= 8) {
      held -= 8;
      out[at++] = bits >>> held & 255;
    }
  }
  return at;
}
function parseRankFile(text, file, owner = file) {
  const list = new TokenList();
  const lineOf = [];
  const lines = text.split("\n");
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i].endsWith("\r") ? lines[i].slice(0, -1) : lines[i];
    if (line.length === 0) {
      if (i === lines.length - 1) continue;
      throw new TokenizerError("load", file, "empty line in a rank file", { line: i + 1 });
    }
    const parts = line.split(" ");
    if (parts.length !== 2) {
      throw new TokenizerError("load", file, `expected "<base64 token> <rank>", got ${quote(line)}`, { line: i + 1 });
    }
    const [token, rank2] = parts;
    if (token.length === 0 || !BASE64.test(token)) {
      throw new TokenizerError("load", file, `token ${quote(token)} is not base64`, { line: i + 1 });
    }
    if (!RANK.test(rank2) || !Number.isSafeInteger(Number(rank2))) {
      throw new TokenizerError("load", file, `rank ${quote(rank2)} is not a non-negative integer`, { line: i + 1 });
    }
    list.reserve(token.length);
    const end = decodeBase64(token, 0, token.length, list.arena, list.used);
    if (end < 0) throw new TokenizerError("load", file, `token ${quote(token)} is not base64`, { line: i + 1 });
    list.close(end, Number(rank2));
    lineOf.push(i + 1);
  }
  const table3 = RankTable.build(owner, list.arena, list.offsets, list.ranks, list.count, (t) => {
    const raw = lines[lineOf[t] - 1].split(" ")[0];
    throw new TokenizerError("load", file, `token ${quote(raw)} is listed twice`, { line: lineOf[t] });
  });
  requireEveryByte(table3, file);
  return table3;
}
var BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;
var RANK = /^(?:0|[1-9][0-9]*)$/;
function buildBuiltinRanks(bpeRanks, name, owner = `builtin:${name}`) {
  if (kernelUnavailable() !== null) return parseBuiltinRanks(bpeRanks, name, owner);
  const built = tokenKernel(unitClasses).buildRanks(bpeRanks, (count3, arenaBytes) => rankTableLayout(owner, count3, arenaBytes));
  if ("damaged" in built) throw new TokenizerError("load", name, "builtin rank table is damaged");
  if ("duplicate" in built) throw new TokenizerError("load", name, "builtin rank table is damaged (a token is listed twice)");
  const table3 = RankTable.attach(built.table, owner);
  requireEveryByte(table3, name);
  return table3;
}
function parseBuiltinRanks(bpeRanks, name, owner = `builtin:${name}`) {
  const list = new TokenList();
  const n = bpeRanks.length;
  let p = 0;
  while (p < n) {
    let lineEnd = bpeRanks.indexOf("\n", p);
    if (lineEnd < 0) lineEnd = n;
    if (lineEnd > p) {
      const tagEnd = bpeRanks.indexOf(" ", p);
      const rankEnd = tagEnd < 0 || tagEnd >= lineEnd ? -1 : bpeRanks.indexOf(" ", tagEnd + 1);
      const first = Number.parseInt(bpeRanks.slice(tagEnd + 1, rankEnd < 0 || rankEnd > lineEnd ? lineEnd : rankEnd), 10);
      if (tagEnd < 0 || tagEnd >= lineEnd || !Number.isSafeInteger(first)) throw new TokenizerError("load", name, "builtin rank table is damaged");
      let rank2 = first;
      let q = rankEnd < 0 || rankEnd > lineEnd ? lineEnd : rankEnd + 1;
      while (q < lineEnd) {
        let tokenEnd = bpeRanks.indexOf(" ", q);
        if (tokenEnd < 0 || tokenEnd > lineEnd) tokenEnd = lineEnd;
        list.reserve(tokenEnd - q);
        const end = decodeBase64(bpeRanks, q, tokenEnd, list.arena, list.used);
        if (end < 0) throw new TokenizerError("load", name, "builtin rank table is damaged (bad base64)");
        list.close(end, rank2++);
        q = tokenEnd + 1;
      }
    }
    p = lineEnd + 1;
  }
  const table3 = RankTable.build(owner, list.arena, list.offsets, list.ranks, list.count, () => {
    throw new TokenizerError("load", name, "builtin rank table is damaged (a token is listed twice)");
  });
  requireEveryByte(table3, name);
  return table3;
}
function requireEveryByte(table3, file) {
  const missing = table3.missingBytes();
  if (missing.length > 0) {
    const shown = missing.slice(0, 5).join(", ") + (missing.length > 5 ? ", ..." : "");
    throw new TokenizerError(
      "load",
      file,
      `rank table lacks ${missing.length} of the 256 single-byte tokens (${shown}); a byte-level vocabulary needs them all (truncated file?)`
    );
  }
}
function quote(s) {
  return JSON.stringify(s.length > 60 ? `${s.slice(0, 60)}...` : s);
}

// src/measure/tokens/shared-counts.ts
var DEFAULT_SHARED_ENTRIES = 1 << 18;
var UNITS_PER_ENTRY = 16;
var USED = 3;
var UNITS_USED = 4;
var CAPACITY = 5;
var SLOT_BITS2 = 6;
var UNITS = 7;
var HEADER_WORDS2 = 8;
var MAGIC_VALUE2 = 1936474929;
var SLOT_WORDS = 4;
var BUSY = -1;
var SharedPieceCounts = class _SharedPieceCounts {
  constructor(buffer) {
    this.buffer = buffer;
    const header = new Int32Array(buffer, 0, HEADER_WORDS2);
    this.header = header;
    this.capacity = header[CAPACITY];
    this.units = header[UNITS];
    const slotCount = 1 << header[SLOT_BITS2];
    this.mask = slotCount - 1;
    let at = HEADER_WORDS2 * 4;
    this.slots = new Int32Array(buffer, at, slotCount * SLOT_WORDS);
    at += slotCount * SLOT_WORDS * 4;
    this.arena = new Uint16Array(buffer, at, this.units);
  }
  buffer;
  header;
  slots;
  arena;
  /** Slot count − 1. */
  mask;
  capacity;
  units;
  /** Returns an empty table for the tokenizer `owner` holding up to `capacity` pieces (at least 1). */
  static create(owner, capacity = DEFAULT_SHARED_ENTRIES) {
    if (!(Number.isInteger(capacity) && capacity >= 1)) throw new RangeError(`shared count table: capacity must be a positive integer, got ${capacity}`);
    let bits = 1;
    while (1 << bits < capacity * 2) bits++;
    const units = capacity * UNITS_PER_ENTRY;
    const bytes3 = HEADER_WORDS2 * 4 + (1 << bits) * SLOT_WORDS * 4 + units * 2;
    const buffer = new SharedArrayBuffer(bytes3);
    const header = new Int32Array(buffer, 0, HEADER_WORDS2);
    header[CAPACITY] = capacity;
    header[SLOT_BITS2] = bits;
    header[UNITS] = units;
    stampOwner(header, owner, MAGIC_VALUE2);
    return new _SharedPieceCounts(buffer);
  }
  /** Returns the table in `buffer` when it was made for the tokenizer `owner`, else null. */
  static attach(buffer, owner) {
    return ownedBy(buffer, owner, MAGIC_VALUE2, HEADER_WORDS2) ? new _SharedPieceCounts(buffer) : null;
  }
  /** Returns the count of text[start, end) (its hash as from hashRange), or -1 when no thread has added it. */
  find(text, start, end, hash2) {
    const { slots, arena, mask } = this;
    const length = end - start;
    for (let i = hash2 & mask; ; i = i + 1 & mask) {
      const s = i * SLOT_WORDS;
      const meta = Atomics.load(slots, s);
      if (meta === 0) return -1;
      if (meta >>> 16 !== length || slots[s + 1] !== hash2) continue;
      let at = slots[s + 2];
      let k = start;
      while (k < end && arena[at] === text.charCodeAt(k)) {
        at++;
        k++;
      }
      if (k === end) return meta & 65535;
    }
  }
  /** Adds the count of text[start, end); returns false when the table is full (or the piece too long to keep). */
  add(text, start, end, hash2, count3) {
    const length = end - start;
    if (length < 1 || length > MAX_CACHED_PIECE_LENGTH || count3 > 65535 || count3 < 0) return false;
    const header = this.header;
    if (Atomics.load(header, USED) >= this.capacity || Atomics.load(header, UNITS_USED) + length > this.units) return false;
    if (Atomics.add(header, USED, 1) >= this.capacity) return false;
    const at = Atomics.add(header, UNITS_USED, length);
    if (at + length > this.units) return false;
    const { slots, arena, mask } = this;
    for (let k = 0; k < length; k++) arena[at + k] = text.charCodeAt(start + k);
    for (let i = hash2 & mask; ; i = i + 1 & mask) {
      const s = i * SLOT_WORDS;
      if (Atomics.compareExchange(slots, s, 0, BUSY) !== 0) continue;
      slots[s + 1] = hash2;
      slots[s + 2] = at;
      Atomics.store(slots, s, length << 16 | count3);
      return true;
    }
  }
  /** Entries added so far, by every thread (at most the capacity). */
  get size() {
    return Math.min(Atomics.load(this.header, USED), this.capacity);
  }
};

// src/measure/tokens/bpe.ts
var bytes = new Uint8Array(1024);
var starts = new Int32Array(1024);
var pairRank = new Float64Array(1024);
function encodeUtf8(text, start, end) {
  if ((end - start) * 3 > bytes.length) {
    bytes = new Uint8Array((end - start) * 3 * 2);
    starts = new Int32Array(bytes.length + 1);
    pairRank = new Float64Array(bytes.length + 1);
  }
  const out = bytes;
  let n = 0;
  for (let i = start; i < end; i++) {
    const c = text.charCodeAt(i);
    if (c < 128) out[n++] = c;
    else if (c < 2048) {
      out[n++] = 192 | c >> 6;
      out[n++] = 128 | c & 63;
    } else if (c < 55296 || c > 57343) {
      out[n++] = 224 | c >> 12;
      out[n++] = 128 | c >> 6 & 63;
      out[n++] = 128 | c & 63;
    } else {
      const low = i + 1 < end ? text.charCodeAt(i + 1) : 0;
      if (c <= 56319 && low >= 56320 && low <= 57343) {
        const cp = (c - 55296 << 10) + (low - 56320) + 65536;
        out[n++] = 240 | cp >> 18;
        out[n++] = 128 | cp >> 12 & 63;
        out[n++] = 128 | cp >> 6 & 63;
        out[n++] = 128 | cp & 63;
        i++;
      } else {
        out[n++] = 239;
        out[n++] = 191;
        out[n++] = 189;
      }
    }
  }
  return n;
}
var HEAP_MERGE_BYTES = 512;
function bytePairCount(text, start, end, ranks) {
  const n = encodeUtf8(text, start, end);
  const b = bytes;
  if (n <= 1) return n;
  if (ranks.rank(b, 0, n) !== NO_RANK) return 1;
  if (n >= HEAP_MERGE_BYTES) return heapMergeCount(b, n, ranks);
  return scanMergeCount(b, n, ranks);
}
function scanMergeCount(b, n, ranks) {
  const pairs = ranks.pairs;
  const s = starts;
  const pr = pairRank;
  for (let i = 0; i <= n; i++) s[i] = i;
  for (let i = 0; i < n - 1; i++) pr[i] = pairs[b[i] << 8 | b[i + 1]];
  let parts = n;
  while (parts > 1) {
    let best = NO_RANK;
    let at = -1;
    for (let i = 0; i < parts - 1; i++) {
      const r = pr[i];
      if (r < best) {
        best = r;
        at = i;
      }
    }
    if (at < 0) break;
    s.copyWithin(at + 1, at + 2, parts + 1);
    pr.copyWithin(at, at + 1, parts - 1);
    parts--;
    if (at < parts - 1) pr[at] = ranks.rank(b, s[at], s[at + 2]);
    if (at > 0) pr[at - 1] = ranks.rank(b, s[at - 1], s[at + 1]);
  }
  return parts;
}
var nextPart = new Int32Array(0);
var prevPart = new Int32Array(0);
var pairRankOf = new Float64Array(0);
var pairLeft = new Int32Array(0);
var pairMid = new Int32Array(0);
var pairEnd = new Int32Array(0);
var heap = new Int32Array(0);
function heapMergeCount(b, n, ranks) {
  if (nextPart.length < n + 1) {
    nextPart = new Int32Array(n + 1);
    prevPart = new Int32Array(n + 1);
    pairRankOf = new Float64Array(3 * n);
    pairLeft = new Int32Array(3 * n);
    pairMid = new Int32Array(3 * n);
    pairEnd = new Int32Array(3 * n);
    heap = new Int32Array(3 * n);
  }
  const next = nextPart;
  const prev = prevPart;
  const rank2 = pairRankOf;
  const left = pairLeft;
  const h = heap;
  let pairs = 0;
  let size = 0;
  const before = (x, y) => rank2[x] < rank2[y] || rank2[x] === rank2[y] && left[x] < left[y];
  const push = (r, i, j, k) => {
    if (r === NO_RANK) return;
    const e = pairs++;
    rank2[e] = r;
    left[e] = i;
    pairMid[e] = j;
    pairEnd[e] = k;
    let at = size++;
    while (at > 0) {
      const up = at - 1 >> 1;
      if (!before(e, h[up])) break;
      h[at] = h[up];
      at = up;
    }
    h[at] = e;
  };
  const pop = () => {
    const top = h[0];
    const last = h[--size];
    let at = 0;
    for (; ; ) {
      const l = 2 * at + 1;
      if (l >= size) break;
      const c = l + 1 < size && before(h[l + 1], h[l]) ? l + 1 : l;
      if (!before(h[c], last)) break;
      h[at] = h[c];
      at = c;
    }
    if (size > 0) h[at] = last;
    return top;
  };
  for (let i = 0; i < n; i++) {
    next[i] = i + 1;
    prev[i] = i - 1;
  }
  for (let i = 0; i + 1 < n; i++) push(ranks.pairs[b[i] << 8 | b[i + 1]], i, i + 1, i + 2);
  let parts = n;
  while (size > 0) {
    const e = pop();
    const i = left[e];
    const j = pairMid[e];
    const k = pairEnd[e];
    if (prev[i] === -2 || next[i] !== j || next[j] !== k) continue;
    next[i] = k;
    if (k < n) prev[k] = i;
    prev[j] = -2;
    parts--;
    if (k < n) push(ranks.rank(b, i, next[k]), i, k, next[k]);
    const p = prev[i];
    if (p >= 0) push(ranks.rank(b, p, k), p, i, k);
  }
  return parts;
}

// src/measure/tokens/tiktoken.ts
var FRONT_ENTRIES = 16384;
var FRONT_MASK = FRONT_ENTRIES - 1;
var FRONT_UNITS = 8;
var KERNEL_CACHE_ENTRIES = 65536;
function kernelPatternFor(pattern) {
  if (pattern === BUILTIN_PATTERNS.gpt2) return KERNEL_PATTERN.gpt2;
  if (pattern === BUILTIN_PATTERNS.cl100k_base) return KERNEL_PATTERN.cl100k_base;
  if (pattern === BUILTIN_PATTERNS.o200k_base) return KERNEL_PATTERN.o200k_base;
  return null;
}
function splitterFor(pattern) {
  if (pattern === BUILTIN_PATTERNS.gpt2) return splitGpt2;
  if (pattern === BUILTIN_PATTERNS.cl100k_base) return splitCl100k;
  if (pattern === BUILTIN_PATTERNS.o200k_base) return splitO200k;
  return null;
}
function createRankCounter(options) {
  const { ranks, label } = options;
  const split = new RegExp(options.pattern, "gu");
  const sticky = new RegExp(options.pattern, "guy");
  const splitter = options.splitter === false ? null : splitterFor(options.pattern);
  let shared2 = options.shared === void 0 ? SharedPieceCounts.create(options.id) : options.shared;
  let sharedHits = 0;
  const cache = new PieceCache(options.generationSize);
  const words = new PieceCache(options.generationSize);
  const builtinPattern = Object.values(BUILTIN_PATTERNS).includes(options.pattern);
  const frontSlots = new Int32Array(FRONT_ENTRIES * 2);
  const frontKeys = new Uint16Array(FRONT_ENTRIES * FRONT_UNITS);
  let frontHits = 0;
  const countRange = (text, start, end) => {
    const length = end - start;
    if (length > MAX_CACHED_PIECE_LENGTH) return bytePairCount(text, start, end, ranks);
    const hash2 = hashRange(text, start, end);
    if (length <= FRONT_UNITS) {
      const f = hash2 & FRONT_MASK;
      const meta = frontSlots[f * 2];
      if (meta >>> 16 === length && frontSlots[f * 2 + 1] === hash2) {
        let at2 = f * FRONT_UNITS;
        let k = start;
        while (k < end && frontKeys[at2] === text.charCodeAt(k)) {
          at2++;
          k++;
        }
        if (k === end) {
          frontHits++;
          return meta & 65535;
        }
      }
      const n = lookUp(text, start, end, hash2);
      frontSlots[f * 2] = length << 16 | n;
      frontSlots[f * 2 + 1] = hash2;
      const at = f * FRONT_UNITS;
      for (let k = 0; k < length; k++) frontKeys[at + k] = text.charCodeAt(start + k);
      return n;
    }
    return lookUp(text, start, end, hash2);
  };
  const lookUp = (text, start, end, hash2, merge2 = bytePairCount) => {
    if (shared2 !== null) {
      const known = shared2.find(text, start, end, hash2);
      if (known >= 0) {
        sharedHits++;
        return known;
      }
    }
    const cached = cache.find(text, start, end, hash2);
    if (cached !== void 0) return cached;
    const n = merge2(text, start, end, ranks);
    if (shared2 === null || !shared2.add(text, start, end, hash2, n)) cache.add(text.slice(start, end), hash2, n);
    return n;
  };
  const countByRegex = (text, from, pieces) => {
    let tokens = 0;
    split.lastIndex = from;
    let m;
    while ((m = split.exec(text)) !== null) {
      const length = m[0].length;
      if (length === 0) {
        const code = text.charCodeAt(split.lastIndex);
        split.lastIndex += code >= 55296 && code <= 56319 ? 2 : 1;
        continue;
      }
      const n = countRange(text, m.index, m.index + length);
      tokens += n;
      pieces?.push(m.index + length, n);
    }
    return tokens;
  };
  const kernelPattern = splitter === null || options.kernel === false ? null : kernelPatternFor(options.pattern);
  let kernelCache = null;
  let kernelPieces = 0;
  let counting = "";
  let kernelResolved = 0;
  let ranksAt = 0;
  const mergeInKernel = (text, start, end) => end - start <= MAX_MERGE_UNITS ? tokenKernel(unitClasses).merge(start, end, ranksAt) : bytePairCount(text, start, end, ranks);
  const resolve = (start, end, hash2) => {
    kernelResolved++;
    return end - start > MAX_CACHED_PIECE_LENGTH ? mergeInKernel(counting, start, end) : lookUp(counting, start, end, hash2, mergeInKernel);
  };
  const regexPieceEnd = (text, p) => {
    sticky.lastIndex = p;
    return sticky.test(text) && sticky.lastIndex > p ? sticky.lastIndex : -1;
  };
  const countFrom = (text, p, pieces) => {
    let tokens = 0;
    const n = text.length;
    while (p < n) {
      let e = splitter(text, p);
      if (e < 0) e = regexPieceEnd(text, p);
      if (e < 0) return tokens + countByRegex(text, p, pieces);
      const c = countRange(text, p, e);
      tokens += c;
      pieces?.push(e, c);
      p = e;
    }
    return tokens;
  };
  let piecesInKernel = -1;
  const countByKernel = (text, pieces) => {
    const kernel5 = tokenKernel(unitClasses);
    if (kernelCache === null) {
      kernelCache = kernel5.createCache(options.kernelCacheEntries ?? KERNEL_CACHE_ENTRIES);
      ranksAt = kernel5.placeRanks(ranks.buffer);
    }
    counting = text;
    piecesInKernel = -1;
    kernel5.load(text, resolve);
    let tokens = 0;
    const n = text.length;
    let p = 0;
    let k = 0;
    let byRegex = 0;
    while (p < n) {
      k = kernel5.count(p, k, kernelPattern, kernelCache);
      tokens += kernel5.tokens();
      p = kernel5.stoppedAt();
      if (p >= n) break;
      const e = regexPieceEnd(text, p);
      if (e < 0) {
        kernelPieces += k - byRegex;
        pieces?.append(kernel5.ends, kernel5.counts, k);
        return tokens + countByRegex(text, p, pieces);
      }
      const c = countRange(text, p, e);
      kernel5.ends[k] = e;
      kernel5.counts[k] = c;
      k++;
      byRegex++;
      tokens += c;
      p = e;
    }
    kernelPieces += k - byRegex;
    pieces?.append(kernel5.ends, kernel5.counts, k);
    piecesInKernel = k;
    return tokens;
  };
  const measureWords = (text, offsets2) => {
    if (text.length > MAX_KERNEL_UNITS) return null;
    const tokens = guarded(text);
    if (piecesInKernel < 0) return null;
    let got;
    try {
      got = tokenKernel(unitClasses).wordTokens(offsets2, piecesInKernel, kernelPattern, kernelCache);
    } catch (cause) {
      throw new TokenizerError("count", label, `cannot encode text: ${cause.message}`, { cause });
    }
    let { wordTokens, continuedWords } = got;
    for (const w of got.left.slice()) {
      const start = offsets2[w * 2];
      const from = start > 0 && text.charCodeAt(start - 1) === 32 ? start - 1 : start;
      const c = countPiece(text.slice(from, offsets2[w * 2 + 1]));
      wordTokens += c;
      if (c >= 2) continuedWords++;
    }
    return { tokens, unknown: 0, words: offsets2.length >> 1, wordTokens, continuedWords };
  };
  const countText = (text, pieces) => {
    if (splitter === null) return countByRegex(text, 0, pieces);
    if (kernelPattern !== null && text.length <= MAX_KERNEL_UNITS) return countByKernel(text, pieces);
    return countFrom(text, 0, pieces);
  };
  const countPiece = (piece) => {
    const cached = words.get(piece);
    if (cached !== void 0) return cached;
    const n = guarded(piece);
    words.set(piece, n);
    return n;
  };
  const guarded = (text, pieces = null) => {
    try {
      return countText(text, pieces);
    } catch (cause) {
      throw new TokenizerError("count", label, `cannot encode text: ${cause.message}`, { cause });
    }
  };
  return {
    id: options.id,
    label,
    kind: "tiktoken",
    unknownTokenId: null,
    exactFastPath: true,
    count: (text) => ({ tokens: guarded(text), unknown: 0 }),
    countPiece,
    ...kernelPattern !== null ? { measureWords } : {},
    ...builtinPattern ? {
      countWithPieces: (text, pieces) => {
        pieces.reset();
        return { tokens: guarded(text, pieces), unknown: 0 };
      }
    } : {},
    cacheStats: () => {
      const own = cache.stats();
      const kernelHits = kernelPieces - kernelResolved;
      return { ...own, hits: own.hits + sharedHits + frontHits + kernelHits, entries: own.entries + (shared2?.size ?? 0) };
    },
    shareTables: () => ({ counts: shared2?.buffer ?? null, ranks: ranks.buffer }),
    adoptTables: (tables2) => {
      const table3 = tables2.counts === null ? null : SharedPieceCounts.attach(tables2.counts, options.id);
      if (table3 === null) return false;
      shared2 = table3;
      return true;
    }
  };
}

// src/measure/tokens/load.ts
async function importBuiltin(name) {
  switch (name) {
    case "gpt2":
      return (await import("js-tiktoken/ranks/gpt2")).default;
    case "r50k_base":
      return (await import("js-tiktoken/ranks/r50k_base")).default;
    case "p50k_base":
      return (await import("js-tiktoken/ranks/p50k_base")).default;
    case "cl100k_base":
      return (await import("js-tiktoken/ranks/cl100k_base")).default;
    case "o200k_base":
      return (await import("js-tiktoken/ranks/o200k_base")).default;
  }
}
async function loadTokenizer(spec, options = {}) {
  const generationSize = options.cacheGenerationSize;
  const sharedEntries = options.sharedEntries ?? DEFAULT_SHARED_ENTRIES;
  const sharedTable = (id) => sharedEntries > 0 ? SharedPieceCounts.create(id, sharedEntries) : null;
  if (spec.kind === "builtin") {
    const name = spec.name;
    if (!isBuiltinName(name)) {
      throw new TokenizerError("load", name, `unknown builtin tokenizer; the builtins are ${BUILTIN_NAMES.join(", ")}`);
    }
    let data2 = options.deferBuiltin ? void 0 : await importBuiltin(name);
    const id = `builtin:${name}`;
    const counter = lazyCounter(
      id,
      name,
      () => sharedTable(id),
      (shared2, ranks) => {
        if (ranks === null && data2 === void 0) {
          throw new Error(`internal error: ${name}: the ranks were not loaded before the first count (ready() was not awaited)`);
        }
        return createRankCounter({
          id,
          label: name,
          ranks: ranks ?? buildBuiltinRanks(data2.bpe_ranks, name, id),
          // The same string as the module's pat_str (test/measure/tokens-split.test.ts checks it).
          pattern: BUILTIN_PATTERNS[name],
          shared: shared2,
          ...generationSize === void 0 ? {} : { generationSize }
        });
      }
    );
    if (!options.deferBuiltin) return counter;
    return {
      ...counter,
      ready: async () => {
        data2 ??= await importBuiltin(name);
      }
    };
  }
  let bytes3;
  try {
    bytes3 = await readFile3(spec.absPath);
  } catch (cause) {
    const code = cause.code;
    const why = code === "ENOENT" ? `no such file (${spec.absPath})` : `cannot read ${spec.absPath}: ${cause.message}`;
    throw new TokenizerError("load", spec.file, why, { cause });
  }
  const digest = createHash5("sha256").update(bytes3).digest("hex");
  let text;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes3);
  } catch (cause) {
    throw new TokenizerError("load", spec.file, "not valid UTF-8", { cause });
  }
  if (spec.format === "tiktoken") {
    const { pattern, patternId } = resolvePattern(spec.pattern, spec.file);
    const id = `tiktoken:sha256:${digest}:pattern:${patternId}`;
    return createRankCounter({
      id,
      label: spec.file,
      ranks: parseRankFile(text, spec.file, id),
      pattern,
      shared: sharedTable(id),
      ...generationSize === void 0 ? {} : { generationSize }
    });
  }
  if (spec.format === "tokenizer.json") {
    let json;
    try {
      json = JSON.parse(text);
    } catch (cause) {
      throw new TokenizerError("load", spec.file, `not valid JSON: ${cause.message}`, { cause });
    }
    return createJsonCounter(json, spec.file, `tokenizer.json:sha256:${digest}`, generationSize);
  }
  throw new TokenizerError("load", spec.file, `unknown tokenizer format ${JSON.stringify(spec.format)} (expected tokenizer.json or tiktoken)`);
}
function resolvePattern(pattern, file) {
  const name = pattern ?? DEFAULT_RANK_FILE_PATTERN;
  if (isBuiltinName(name)) return { pattern: BUILTIN_PATTERNS[name], patternId: name };
  try {
    new RegExp(name, "gu");
  } catch (cause) {
    throw new TokenizerError("load", file, `split pattern is not a valid regular expression: ${cause.message}`, { cause });
  }
  return { pattern: name, patternId: `sha256:${createHash5("sha256").update(name).digest("hex").slice(0, 16)}` };
}
function lazyCounter(id, label, newTable, make) {
  let real;
  let table3;
  let adoptedRanks = null;
  const tableOf = () => table3 === void 0 ? table3 = newTable() : table3;
  const get = () => real ??= make(tableOf(), adoptedRanks);
  return {
    id,
    label,
    kind: "tiktoken",
    unknownTokenId: null,
    exactFastPath: true,
    count: (text) => get().count(text),
    countPiece: (piece) => get().countPiece(piece),
    countWithPieces: (text, pieces) => get().countWithPieces(text, pieces),
    measureWords: (text, offsets2) => get().measureWords?.(text, offsets2) ?? null,
    cacheStats: () => real ? real.cacheStats() : { hits: 0, misses: 0, evictions: 0, entries: 0 },
    // Handing the tables out builds the counter: a thread that shares is about to count anyway,
    // and the others then take its rank table instead of parsing their own.
    shareTables: () => get().shareTables(),
    adoptTables: (tables2) => {
      if (real) return real.adoptTables(tables2);
      const counts = tables2.counts === null ? null : SharedPieceCounts.attach(tables2.counts, id);
      const ranks = tables2.ranks === null ? null : RankTable.attach(tables2.ranks, id);
      if (counts === null || ranks === null) return false;
      table3 = counts;
      adoptedRanks = ranks;
      return true;
    }
  };
}

// src/measure/tokens/pieces.ts
var INITIAL_PIECES = 4096;
var PieceList = class {
  ends = new Int32Array(INITIAL_PIECES);
  counts = new Int32Array(INITIAL_PIECES);
  length = 0;
  /** Forgets the pieces of the previous text. */
  reset() {
    this.length = 0;
  }
  /** Appends the first `n` pieces of two arrays of ends and counts. */
  append(ends, counts, n) {
    this.reserve(this.length + n);
    this.ends.set(ends.subarray(0, n), this.length);
    this.counts.set(counts.subarray(0, n), this.length);
    this.length += n;
  }
  /** Appends a piece ending at `end` that counts `count` tokens. */
  push(end, count3) {
    if (this.length === this.ends.length) this.reserve(this.length + 1);
    this.ends[this.length] = end;
    this.counts[this.length] = count3;
    this.length++;
  }
  /** Doubles the arrays until they hold `pieces`, keeping what they hold. */
  reserve(pieces) {
    let capacity = this.ends.length;
    while (capacity < pieces) capacity *= 2;
    if (capacity === this.ends.length) return;
    const ends = new Int32Array(capacity);
    ends.set(this.ends.subarray(0, this.length));
    this.ends = ends;
    const counts = new Int32Array(capacity);
    counts.set(this.counts.subarray(0, this.length));
    this.counts = counts;
  }
};

// src/measure/tokens/measure.ts
var SPACE3 = 32;
function measureTokens(counter, text, forEachWord2, wordOffsets2) {
  if (counter.countWithPieces !== void 0) {
    const offsets2 = wordOffsets2?.(text) ?? null;
    const measured = offsets2 === null ? null : counter.measureWords?.(text, offsets2) ?? null;
    if (measured !== null) return measured;
    return offsets2 === null ? measureByPieces(counter, text, forEachWord2) : measureByOffsets(counter, text, offsets2);
  }
  const { tokens, unknown } = counter.count(text);
  let words = 0;
  let wordTokens = 0;
  let continuedWords = 0;
  forEachWord2(text, (start, end) => {
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE3 ? start - 1 : start;
    const n = counter.countPiece(text.slice(from, end));
    words++;
    wordTokens += n;
    if (n >= 2) continuedWords++;
  });
  return { tokens, unknown, words, wordTokens, continuedWords };
}
var scratch2 = new PieceList();
function measureByPieces(counter, text, forEachWord2) {
  const pieces = scratch2;
  const { tokens, unknown } = counter.countWithPieces(text, pieces);
  const { ends, counts, length } = pieces;
  let words = 0;
  let wordTokens = 0;
  let continuedWords = 0;
  let k = 0;
  let last = 0;
  forEachWord2(text, (start, end) => {
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE3 ? start - 1 : start;
    if (from < last) k = 0;
    last = from;
    while (k < length && ends[k] <= from) k++;
    const n = k < length && ends[k] === end && (k === 0 ? 0 : ends[k - 1]) === from ? counts[k] : counter.countPiece(text.slice(from, end));
    words++;
    wordTokens += n;
    if (n >= 2) continuedWords++;
  });
  return { tokens, unknown, words, wordTokens, continuedWords };
}
function measureByOffsets(counter, text, offsets2) {
  const pieces = scratch2;
  const { tokens, unknown } = counter.countWithPieces(text, pieces);
  const { ends, counts, length } = pieces;
  const words = offsets2.length >> 1;
  let wordTokens = 0;
  let continuedWords = 0;
  let k = 0;
  for (let w = 0; w < words; w++) {
    const start = offsets2[w * 2];
    const end = offsets2[w * 2 + 1];
    const from = start > 0 && text.charCodeAt(start - 1) === SPACE3 ? start - 1 : start;
    while (k < length && ends[k] <= from) k++;
    const n = k < length && ends[k] === end && (k === 0 ? 0 : ends[k - 1]) === from ? counts[k] : counter.countPiece(text.slice(from, end));
    wordTokens += n;
    if (n >= 2) continuedWords++;
  }
  return { tokens, unknown, words, wordTokens, continuedWords };
}

// src/measure/tokens/dictionary.ts
import { readFile as readFile4 } from "node:fs/promises";
var WordListError = class extends Error {
  constructor(file, message, line, options) {
    super(`${line === void 0 ? file : `${file}:${line}`}: ${message}`, options);
    this.file = file;
    this.line = line;
  }
  file;
  line;
  name = "WordListError";
};
function dictionaryFertility(counter, words) {
  let entries = 0;
  let tokens = 0;
  let continued = 0;
  for (const word of words) {
    const w = word.trim();
    if (w.length === 0) continue;
    const n = counter.countPiece(" " + w);
    entries++;
    tokens += n;
    if (n >= 2) continued++;
  }
  return {
    entries,
    tokens,
    fertility: entries === 0 ? 0 : tokens / entries,
    continued: entries === 0 ? 0 : continued / entries
  };
}
async function readWordList(file) {
  let bytes3;
  try {
    bytes3 = await readFile4(file);
  } catch (cause) {
    const code = cause.code;
    throw new WordListError(file, code === "ENOENT" ? "no such file" : cause.message, void 0, { cause });
  }
  let text;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes3);
  } catch (cause) {
    throw new WordListError(file, "not valid UTF-8 (sluice reads word lists in UTF-8)", void 0, { cause });
  }
  if (text.charCodeAt(0) === 65279) text = text.slice(1);
  const lines = text.split(/\r?\n/);
  const hunspell = /^\s*\d+\s*$/.test(lines[0] ?? "");
  const words = [];
  for (let i = hunspell ? 1 : 0; i < lines.length; i++) {
    const line = lines[i].trim();
    if (line.length === 0) continue;
    const word = hunspell ? hunspellWord(line) : line;
    if (word.length > 0) words.push(word);
  }
  if (hunspell) {
    const declared = Number(lines[0].trim());
    if (words.length === 0 && declared > 0) throw new WordListError(file, `declares ${declared} entries but has none`, 1);
  }
  return words;
}
function hunspellWord(line) {
  let word = "";
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (c === "\\" && line[i + 1] === "/") {
      word += "/";
      i++;
      continue;
    }
    if (c === "/" || c === "	" || c === " ") break;
    word += c;
  }
  return word;
}

// src/results/duplicates.ts
var CLUSTERS_LISTED = 20;
function joinShardIndexes(shards, options, newShards) {
  const withIndex = shards.filter((s) => s.duplicateIndex !== void 0);
  return joinDuplicates(
    withIndex.map((s) => ({ shard: s.path, index: s.duplicateIndex })),
    { ...options, maxClusters: CLUSTERS_LISTED, ...newShards ? { newShards } : {} }
  );
}
function summarizeDuplicates(f, languageKeys) {
  const langName = (i) => languageKeys[i] ?? "other";
  const byLanguage = {};
  for (const l of f.perLanguage) {
    const row = byLanguage[langName(l.language)] ??= { docs: 0, exactDocs: 0, nearDocs: 0 };
    row.docs += l.docs;
    row.exactDocs += l.exactDocs;
    row.nearDocs += l.nearDocs;
  }
  const byShard = {};
  for (const s of f.perShard) byShard[s.shard] = { docs: s.docs, exactDocs: s.exactDocs, nearDocs: s.nearDocs };
  return {
    docs: f.total.docs,
    exactDocs: f.exactDocs,
    nearDocs: f.nearDocs,
    tooShortDocs: f.total.emptyDocs + f.total.wordlessDocs,
    byLanguage,
    byShard,
    clusters: f.clusters.map((c) => ({
      kind: c.kind,
      first: { path: c.first.shard, line: c.first.line },
      copies: c.copies.map((x) => ({ path: x.shard, line: x.line, ...x.jaccard !== void 0 ? { jaccard: Math.round(x.jaccard * 1e3) / 1e3 } : {} })),
      size: c.size
    })),
    parameters: {
      shingle: f.options.shingle,
      hashes: f.options.hashes,
      bands: f.statistics.bands,
      rows: f.statistics.rows,
      threshold: f.options.threshold
    }
  };
}

// src/core/analyzers.ts
var REJECTION_SAMPLES = 10;
var WARM_UP_TEXT = "A worker measures this sentence once, before its first shard, and keeps nothing of it.";
function readOptionsOf(policy) {
  const opts = { textField: policy.corpus.text, maxLineBytes: policy.corpus.maxLineBytes, maxSamples: REJECTION_SAMPLES };
  if (policy.corpus.declaredLanguage !== void 0) opts.declaredLanguageField = policy.corpus.declaredLanguage;
  return opts;
}
var AnalyzerSetupError = class extends Error {
  name = "AnalyzerSetupError";
};
async function readEvaluation(policy) {
  const rule = policy.rules.contamination;
  if (!rule) return void 0;
  const found = await discoverShards(policy.root, { ...policy.corpus, include: rule.eval, exclude: [] });
  if (found.shards.length === 0) {
    throw new AnalyzerSetupError(`${policy.file}: rules.contamination.eval (${rule.eval.join(", ")}) matched no evaluation files under ${policy.root}`);
  }
  const read = readOptionsOf(policy);
  const items = [];
  for (const ref of found.shards) {
    const account = await readShard(ref, read, (doc) => items.push({ file: ref.path, line: doc.line, text: doc.text }));
    if (account.broken) throw new AnalyzerSetupError(`${ref.path}: evaluation file could not be read to its end: ${account.broken.message}`);
  }
  return { items, files: found.shards.map((s) => s.path) };
}
async function prepareAnalyzers(policy, options = {}) {
  const unavailable = kernelUnavailable();
  if (unavailable) throw new AnalyzerSetupError(unavailable);
  const measure = createMeasurer({ languages: policy.languages, detection: policy.detection });
  const read = readOptionsOf(policy);
  let main2;
  let baseline;
  try {
    const load = { deferBuiltin: options.deferTokenizerData === true };
    if (policy.tokenizer) main2 = await loadTokenizer(policy.tokenizer, load);
    if (policy.baseline) baseline = await loadTokenizer(policy.baseline, load);
  } catch (err) {
    throw new AnalyzerSetupError(`${policy.file}: tokenizer: ${err.message}`);
  }
  const dupRule = policy.rules.duplicates;
  const dupOptions = dupRule ? duplicateOptionsFrom(dupRule) : void 0;
  const contamination = policy.rules.contamination;
  const evaluation = contamination ? options.evaluation ?? await readEvaluation(policy) : void 0;
  const evalItems = evaluation?.items;
  const evalId = contamination && evalItems ? evalSetId(evalItems, contamination.ngram) : void 0;
  const settingsId = settingsIdOf({
    tool: TOOL_VERSION,
    schema: RESULT_SCHEMA,
    languages: policy.languages.map((l) => ({ key: l.key, covers: l.covers, scripts: l.scripts })),
    detection: policy.detection,
    read: { text: read.textField, declared: read.declaredLanguageField ?? null, maxLineBytes: read.maxLineBytes },
    tokenizer: main2?.id ?? null,
    baseline: baseline?.id ?? null,
    duplicates: dupOptions ?? null,
    eval: evalId ?? null,
    // Only when set, so results measured without sampling keep their cache key.
    ...policy.sampling ? { sampling: policy.sampling } : {}
  });
  const analyzers = { measure };
  if (main2) {
    const m = main2;
    const b = baseline;
    analyzers.tokens = (text) => {
      const out = { main: measureTokens(m, text, forEachWord, wordOffsets) };
      if (b) out.baseline = measureTokens(b, text, forEachWord, wordOffsets);
      return out;
    };
  }
  if (dupOptions) analyzers.duplicates = () => new DuplicateIndexBuilder(dupOptions, { words: evalItems !== void 0 });
  if (evalItems && policy.rules.contamination) {
    const items = evalItems;
    const ngram = policy.rules.contamination.ngram;
    let index2;
    analyzers.contamination = (text) => findContamination(index2 ??= buildEvalIndex(items, ngram), text);
  }
  const counters = { main: main2, baseline };
  let loaded;
  const ready = () => loaded ??= (async () => {
    try {
      await main2?.ready?.();
      await baseline?.ready?.();
    } catch (err) {
      throw new AnalyzerSetupError(`${policy.file}: tokenizer: ${err.message}`);
    }
  })();
  return {
    ready,
    sharedCounts() {
      const tables2 = {};
      for (const role of ["main", "baseline"]) {
        try {
          const table3 = counters[role]?.shareTables?.();
          if (table3) tables2[role] = table3;
        } catch (err) {
          if (!(err instanceof TokenizerError)) throw err;
        }
      }
      return tables2;
    },
    adoptCounts(tables2) {
      for (const role of ["main", "baseline"]) {
        const table3 = tables2[role];
        if (table3) counters[role]?.adoptTables?.(table3);
      }
    },
    settingsId,
    ...evaluation ? { evaluation } : {},
    warmUp() {
      analyzers.measure({ text: WARM_UP_TEXT });
      analyzers.duplicates?.().add({ ordinal: 0, line: 1, language: 0, text: WARM_UP_TEXT });
      analyzers.contamination?.(WARM_UP_TEXT);
    },
    scan: { read, languageKeys: policy.languages.map((l) => l.key), settingsId, ...policy.sampling ? { sampling: policy.sampling } : {} },
    analyzers,
    async finish(corpus, newShards) {
      if (main2) corpus.tokenizer = { label: main2.label, hasUnknown: main2.unknownTokenId !== null };
      if (baseline) corpus.baseline = { label: baseline.label, hasUnknown: baseline.unknownTokenId !== null };
      const lists = policy.rules.fertility?.wordLists ?? {};
      if (main2 && Object.keys(lists).length > 0) {
        await ready();
        corpus.dictionary = {};
        for (const [key, list] of Object.entries(lists)) {
          let words;
          try {
            words = await readWordList(list.absPath);
          } catch (err) {
            throw new AnalyzerSetupError(`${policy.file}: rules.fertility.word-lists.${key}: ${err.message}`);
          }
          const shown = relative2(policy.root, list.absPath) || list.file;
          const m = dictionaryFertility(main2, words);
          const entry = { main: { list: shown, ...m } };
          if (baseline) entry.baseline = { list: shown, ...dictionaryFertility(baseline, words) };
          corpus.dictionary[key] = entry;
        }
      }
      if (dupOptions) {
        const findings = joinShardIndexes(corpus.shards, dupOptions, newShards);
        const keys = policy.languages.map((l) => l.key);
        corpus.duplicates = summarizeDuplicates(findings, policy.sampling ? [...keys, "other", UNSAMPLED_LANGUAGE] : keys);
        if (findings.againstExisting) corpus.duplicatesAgainstExisting = findings.againstExisting;
      }
      if (evaluation && policy.rules.contamination) {
        corpus.contamination = { ngram: policy.rules.contamination.ngram, evalFiles: evaluation.files, evalItems: evaluation.items.length };
      }
    }
  };
}

// src/core/check.ts
import { existsSync as existsSync2, opendirSync } from "node:fs";

// src/core/pool.ts
import { existsSync } from "node:fs";
import { availableParallelism } from "node:os";
import { fileURLToPath } from "node:url";
import { Worker } from "node:worker_threads";
var ShardFailure = class extends Error {
  constructor(shard, message) {
    super(`${shard}: ${message}`);
    this.shard = shard;
  }
  shard;
  name = "ShardFailure";
};
function throwIfFaultInjected(path5) {
  if (process.env.SLUICE_FAULT_SHARD && path5 === process.env.SLUICE_FAULT_SHARD) throw new Error("injected fault (SLUICE_FAULT_SHARD)");
}
function workOf(ref) {
  return ref.textBytesHint ?? ref.sizeBytes;
}
function defaultWorkers() {
  return availableParallelism();
}
function canRunWorkers(entry) {
  if (!entry) return false;
  const path5 = typeof entry === "string" && !entry.startsWith("file:") ? entry : fileURLToPath(entry);
  return path5.endsWith(".js") && existsSync(path5);
}
function startWorker(entry, init) {
  const worker = new Worker(typeof entry === "string" && entry.startsWith("file:") ? new URL(entry) : entry, { workerData: init });
  return holdEvents(worker, []);
}
function holdEvents(worker, earlier) {
  const held = [...earlier];
  let handlers;
  const deliver = (event) => {
    if (!handlers) {
      held.push(event);
      return;
    }
    if (event[0] === "message") handlers.message(event[1]);
    else if (event[0] === "error") handlers.error(event[1]);
    else handlers.exit(event[1]);
  };
  worker.on("message", (m) => deliver(["message", m]));
  worker.on("error", (e) => deliver(["error", e]));
  worker.on("exit", (code) => deliver(["exit", code]));
  return {
    worker,
    listen(h) {
      handlers = h;
      for (const event of held.splice(0)) deliver(event);
    }
  };
}
var PRESTARTED = /* @__PURE__ */ Symbol.for("sluice.prestarted-worker");
function takePrestartedWorker(init) {
  const slot = globalThis;
  const pre = slot[PRESTARTED];
  if (!pre) return null;
  delete slot[PRESTARTED];
  const { worker, held } = pre;
  for (const kind of ["message", "error", "exit"]) worker.removeAllListeners(kind);
  const started = holdEvents(worker, held);
  worker.ref();
  worker.postMessage({ type: "init", init });
  return started;
}
function dropPrestartedWorker() {
  const slot = globalThis;
  const pre = slot[PRESTARTED];
  if (!pre) return;
  delete slot[PRESTARTED];
  void pre.worker.terminate();
}
function transferablesOf(r) {
  const d = r.duplicates;
  return d ? [d.exact.buffer, d.signatures.buffer, d.stream.buffer] : [];
}
async function measureInPool(work, init, entry, workers, onResult, here, started = [], shared2 = {}) {
  const shardQueue = work.whole.map((ref, id) => ({ kind: "shard", ref, id })).sort((a, b) => workOf(b.ref) - workOf(a.ref) || a.id - b.id);
  const batchQueue = [];
  const tail = work.tail ?? [];
  let producing = work.split.length > 0 || tail.length > 0;
  const threads = Math.max(1, Math.min(workers, shardQueue.length + (producing ? workers : 0)));
  let onWholeTaken = [];
  const wholeTaken = () => shardQueue.length === 0 || failed ? Promise.resolve() : new Promise((resolve) => onWholeTaken.push(resolve));
  const tellWholeTaken = () => {
    const w = onWholeTaken;
    onWholeTaken = [];
    for (const f of w) f();
  };
  let failed;
  let nextId = shardQueue.length;
  let waiters = [];
  const wake = () => {
    const w = waiters;
    waiters = [];
    for (const f of w) f();
  };
  const fail = (err) => {
    failed ??= err;
    for (const t of batchQueue.splice(0)) t.reject(failed);
    wake();
    tellWholeTaken();
    return failed;
  };
  const take = (main2) => {
    if (failed) return null;
    if (batchQueue.length > 0 && (!main2 || !producing || batchQueue.length > 2 * (threads - 1))) return batchQueue.shift();
    if (shardQueue.length > 0) {
      const task = shardQueue.shift();
      if (shardQueue.length === 0) tellWholeTaken();
      return task;
    }
    return producing || batchQueue.length > 0 ? "wait" : null;
  };
  const all = [];
  if (producing) {
    all.push(
      (async () => {
        const largestFirst = (refs) => [...refs].sort((a, b) => workOf(b) - workOf(a) || (a.path < b.path ? -1 : 1));
        const split = largestFirst(work.split);
        try {
          for (const [i, ref] of [...split, ...largestFirst(tail)].entries()) {
            if (i === split.length) await wholeTaken();
            if (failed) break;
            let result;
            try {
              result = await here.split(
                ref,
                (batch) => new Promise((resolve, reject) => {
                  if (failed) return reject(failed);
                  batchQueue.push({ kind: "batch", ref, batch, resolve, reject });
                  wake();
                })
              );
            } catch (err) {
              throw fail(err instanceof ShardFailure ? err : new ShardFailure(ref.path, `measuring failed: ${err.message}`));
            }
            onResult(result);
          }
        } finally {
          producing = false;
          wake();
        }
      })()
    );
  }
  all.push(
    (async () => {
      for (; ; ) {
        const task = take(true);
        if (task === null) return;
        if (task === "wait") {
          await new Promise((r) => waiters.push(r));
          continue;
        }
        try {
          if (task.kind === "shard") onResult(await here.shard(task.ref));
          else task.resolve(here.batch(task.ref, task.batch));
        } catch (err) {
          const failure = fail(new ShardFailure(task.ref.path, `measuring failed: ${err.message}`));
          if (task.kind === "batch") task.reject(failure);
          throw failure;
        }
        await new Promise((r) => setImmediate(r));
      }
    })()
  );
  const spare = started.splice(0);
  for (const unused of spare.splice(Math.max(0, threads - 1))) void unused.worker.terminate();
  for (let w = 1; w < threads; w++) {
    const thread = spare.shift() ?? takePrestartedWorker(init) ?? startWorker(entry, init);
    all.push(
      new Promise((resolve, reject) => {
        const worker = thread.worker;
        const current = [];
        let done = false;
        let ready = false;
        const finish = (err) => {
          if (done) return;
          done = true;
          void worker.terminate();
          if (err) {
            const failure = fail(err);
            for (const t of current.splice(0)) if (t.kind === "batch") t.reject(failure);
            reject(failure);
          } else resolve();
        };
        const where2 = () => current[0]?.ref.path ?? "(starting a worker)";
        const send = (task) => {
          current.push(task);
          if (task.kind === "batch") {
            worker.postMessage({ type: "batch", id: nextId++, path: task.ref.path, batch: task.batch });
            return;
          }
          const { open: _open, ...ref } = task.ref;
          worker.postMessage({ type: "scan", id: task.id, ref });
        };
        const next = () => {
          if (done || !ready) return;
          if (current.length === 0) {
            const task = take(false);
            if (task === "wait") {
              waiters.push(next);
              return;
            }
            if (task === null) {
              worker.postMessage({ type: "close" });
              return finish();
            }
            send(task);
          }
          if (current.length === 1 && current[0].kind === "batch" && batchQueue.length > 0 && !failed) send(batchQueue.shift());
        };
        const message = (msg) => {
          if (msg.type === "ready") {
            if (msg.settingsId !== init.settingsId) return finish(new ShardFailure(where2(), `worker measured under other settings (${msg.settingsId} \u2260 ${init.settingsId})`));
            ready = true;
            if (shared2.main || shared2.baseline) worker.postMessage({ type: "share", tables: shared2 });
            return next();
          }
          const answered = current[0];
          if (msg.type === "progress") {
            if (answered?.kind === "shard") here.reading?.(answered.ref.path, msg.bytes);
            return;
          }
          if (msg.type === "result" && answered?.kind === "shard") {
            current.shift();
            onResult(msg.result);
            return next();
          }
          if (msg.type === "batch-result" && answered?.kind === "batch") {
            current.shift();
            answered.resolve(msg.result);
            return next();
          }
          const what = msg.type === "error" ? msg.message : `unexpected ${msg.type} message`;
          finish(new ShardFailure(where2(), `measuring failed in a worker: ${what}`));
        };
        thread.listen({
          message,
          error: (err) => finish(new ShardFailure(where2(), `worker crashed: ${err.message}`)),
          exit: (code) => {
            if (!done) finish(new ShardFailure(where2(), `worker exited with code ${code} before finishing`));
          }
        });
      })
    );
  }
  const settled = await Promise.allSettled(all);
  if (failed) throw failed;
  const rejected = settled.find((s) => s.status === "rejected");
  if (rejected) throw rejected.reason;
}

// src/core/check.ts
var CACHE_LOOKUPS_AT_ONCE = 16;
var WORK_PER_WORKER_BYTES = 2 * 1024 * 1024;
var MIN_SPLIT_BYTES = 4 * 1024 * 1024;
var BATCH_CHARS = 1 << 18;
var BATCHES_IN_FLIGHT_PER_THREAD = 8;
function shardsToSplit(shards, workers, minBytes = MIN_SPLIT_BYTES) {
  if (workers <= 1) return /* @__PURE__ */ new Set();
  const total = shards.reduce((n, r) => n + workOf(r), 0);
  const limit = Math.max(minBytes, total / (workers * 4));
  return new Set(shards.filter((r) => workOf(r) >= limit));
}
function tailShards(whole, workers) {
  if (workers <= 1) return /* @__PURE__ */ new Set();
  const smallestFirst = [...whole].sort((a, b) => workOf(a) - workOf(b) || (a.path < b.path ? -1 : 1));
  return new Set(smallestFirst.slice(0, workers));
}
async function mapAtMost(items, limit, fn) {
  const out = new Array(items.length);
  let next = 0;
  const run2 = async () => {
    for (let i = next++; i < items.length; i = next++) out[i] = await fn(items[i]);
  };
  await Promise.all(Array.from({ length: Math.min(limit, items.length) }, run2));
  return out;
}
function withTextHints(refs) {
  return mapAtMost(refs, CACHE_LOOKUPS_AT_ONCE, async (ref) => ({ ...ref, textBytesHint: await textSizeHint(ref) }));
}
var ConfigError = class extends Error {
  name = "ConfigError";
};
async function loadPolicyOrThrow(file, root, onWarning) {
  const loaded = await loadPolicy(file, root !== void 0 ? { root } : void 0);
  if (!loaded.ok) {
    throw new ConfigError(loaded.problems.map(formatProblem).join("\n"));
  }
  for (const w of loaded.warnings) onWarning?.(formatProblem(w));
  return loaded.policy;
}
async function discoverOrThrow(policy) {
  let discovery;
  try {
    discovery = await discoverShards(policy.root, policy.corpus);
  } catch (err) {
    throw new ConfigError(`${policy.file}: ${err.message}`);
  }
  if (discovery.shards.length === 0) throw noShards(policy, discovery.skipped);
  return discovery;
}
function noShards(policy, skipped) {
  return new ConfigError(
    `${policy.file}: no shards matched corpus.include (${policy.corpus.include.join(", ")}) under ${policy.root}` + (skipped.length ? `; ${skipped.length} files matched but were skipped, e.g. ${skipped[0].path} (${skipped[0].reason})` : "")
  );
}
async function setupOrThrow(step) {
  try {
    return await step();
  } catch (err) {
    if (err instanceof AnalyzerSetupError) throw new ConfigError(err.message);
    throw err;
  }
}
async function prepareOrThrow(policy, evaluation) {
  return setupOrThrow(() => prepareAnalyzers(policy, { deferTokenizerData: true, ...evaluation ? { evaluation } : {} }));
}
async function measureCorpus(policy, opts, given = {}) {
  const started = performance.now();
  const discovery = given.discovery ?? await discoverOrThrow(policy);
  if (discovery.shards.length === 0) throw noShards(policy, discovery.skipped);
  const early = [];
  const entry = opts.workerEntry;
  let evaluation;
  if (!given.prepared && canRunWorkers(entry) && !(opts.cacheDir !== null && holdsAnything(opts.cacheDir))) {
    const threads = threadsFor(discovery.shards, opts);
    if (threads > 1) {
      evaluation = await setupOrThrow(() => readEvaluation(policy));
      const init = workerInitOf(policy, "not yet known", evaluation);
      for (let w = 1; w < threads; w++) early.push(takePrestartedWorker(init) ?? startWorker(entry, init));
    }
  }
  try {
    const prepared = given.prepared ?? await prepareOrThrow(policy, evaluation);
    const { results, cached } = await measureShards(policy, discovery.shards, prepared, opts, started, early);
    return await assembleCorpus(policy, prepared, results, cached, discovery.skipped, opts.newShards, started);
  } finally {
    for (const w of early) void w.worker.terminate();
  }
}
function holdsAnything(dir) {
  if (!existsSync2(dir)) return false;
  try {
    const d = opendirSync(dir);
    try {
      return d.readSync() !== null;
    } finally {
      d.closeSync();
    }
  } catch {
    return true;
  }
}
function workerInitOf(policy, settingsId, evaluation) {
  const init = { role: "sluice-shard-worker", policy, settingsId };
  if (evaluation) init.evaluation = evaluation;
  return init;
}
function threadsFor(shards, opts) {
  const diskBytes = shards.reduce((n, r) => n + r.sizeBytes, 0);
  const workers = opts.workers ?? Math.min(defaultWorkers(), Math.max(1, Math.floor(diskBytes / WORK_PER_WORKER_BYTES)));
  if (workers <= 1) return 1;
  return shards.length > 1 || shards.some((r) => r.open !== void 0) || shardsToSplit(shards, workers, opts.minSplitBytes).size > 0 ? workers : 1;
}
async function assembleCorpus(policy, prepared, results, cached, skipped, newShards, started) {
  results.sort((a, b) => a.path < b.path ? -1 : a.path > b.path ? 1 : 0);
  const corpus = {
    shards: results,
    cached,
    skipped,
    tally: mergeShardResults(results, policy.languages.map((l) => l.key)),
    elapsedMs: 0
  };
  await prepared.finish(corpus, newShards);
  corpus.elapsedMs = Math.round(performance.now() - started);
  return corpus;
}
async function measureShards(policy, shards, prepared, opts, started = performance.now(), early = []) {
  const cache = opts.cacheDir ? new ResultCache(opts.cacheDir) : null;
  const results = [];
  const cached = /* @__PURE__ */ new Set();
  const keys = /* @__PURE__ */ new Map();
  let bytes3 = 0;
  const reading = /* @__PURE__ */ new Map();
  const report = () => {
    let inFlight = 0;
    for (const b of reading.values()) inFlight += b;
    opts.onProgress?.({ policy: policy.name, shardsDone: results.length, shards: shards.length, bytes: bytes3 + inFlight, elapsedMs: performance.now() - started });
  };
  const readingAt = (path5, b) => {
    reading.set(path5, b);
    if (opts.onProgress) report();
  };
  const done = (r) => {
    results.push(r);
    bytes3 += r.read.bytes;
    reading.delete(r.path);
    report();
  };
  const todo = [];
  if (!cache) todo.push(...shards);
  else {
    const lookups = await mapAtMost(shards, CACHE_LOOKUPS_AT_ONCE, async (ref) => {
      const contentId = await (opts.contentKey ?? contentIdOf)(ref);
      keys.set(ref.path, contentId);
      return cache.get(contentId, prepared.settingsId, ref);
    });
    shards.forEach((ref, i) => {
      const hit = lookups[i];
      if (hit) {
        cached.add(ref.path);
        done(hit);
      } else todo.push(ref);
    });
  }
  if (todo.length > 0) await setupOrThrow(() => prepared.ready());
  const store = async (r) => {
    const key = keys.get(r.path);
    if (cache && key) await cache.put({ ...r, contentId: key });
  };
  const progressOf = (ref) => opts.onProgress ? (b) => readingAt(ref.path, b) : void 0;
  const workers = threadsFor(todo, opts);
  if (workers > 1 && canRunWorkers(opts.workerEntry)) {
    const files = await withTextHints(todo.filter((r) => r.open === void 0));
    const split = shardsToSplit(files, workers, opts.minSplitBytes);
    const whole = files.filter((r) => !split.has(r));
    const tail = tailShards(whole, workers);
    const init = workerInitOf(policy, prepared.settingsId, prepared.evaluation);
    const pending = [];
    const plan = { batchChars: BATCH_CHARS, inFlight: BATCHES_IN_FLIGHT_PER_THREAD * workers };
    await measureInPool(
      {
        whole: whole.filter((r) => !tail.has(r)),
        split: [...files.filter((r) => split.has(r)), ...todo.filter((r) => r.open !== void 0)],
        tail: whole.filter((r) => tail.has(r))
      },
      init,
      opts.workerEntry,
      workers,
      (r) => {
        done(r);
        pending.push(store(r));
      },
      {
        shard: (ref) => {
          throwIfFaultInjected(ref.path);
          return scanShard(ref, prepared.scan, prepared.analyzers, progressOf(ref));
        },
        reading: readingAt,
        batch: (ref, batch) => {
          throwIfFaultInjected(ref.path);
          return measureBatch(batch, prepared.scan, prepared.analyzers);
        },
        split: (ref, measure) => scanShardInBatches(ref, prepared.scan, prepared.analyzers, measure, {
          ...plan,
          onRead: (b) => readingAt(ref.path, b)
        })
      },
      early,
      prepared.sharedCounts()
    );
    dropPrestartedWorker();
    await Promise.all(pending);
  } else {
    dropPrestartedWorker();
    for (const ref of todo) {
      const r = await scanShard(ref, prepared.scan, prepared.analyzers, progressOf(ref));
      done(r);
      await store(r);
    }
  }
  return { results, cached };
}
async function runCheck(opts) {
  const reports = [];
  for (const file of opts.policies) {
    const policy = await loadPolicyOrThrow(file, opts.root, opts.onWarning);
    const corpus = await measureCorpus(policy, opts);
    reports.push(buildReport(policy, corpus, opts.cwd));
  }
  return reports;
}

// src/core/partition.ts
import { readFile as readFile5 } from "node:fs/promises";

// src/results/partition.ts
import { createHash as createHash6 } from "node:crypto";
var PARTIAL_FORMAT = "sluice-partial";
var PARTIAL_VERSION = 1;
function partitionOf(path5, count3) {
  const h = createHash6("sha256").update(path5).digest();
  return h.readUInt32BE(0) % count3 + 1;
}
function partialToJson(p) {
  return JSON.stringify({ ...p, results: p.results.map(storedShardResult) });
}
function partialFromJson(text) {
  let v;
  try {
    v = JSON.parse(text);
  } catch (err) {
    return { ok: false, reason: `not JSON: ${err.message}` };
  }
  if (v.format !== PARTIAL_FORMAT) return { ok: false, reason: "not a sluice partial result (written by `sluice scan --partition`)" };
  if (v.version !== PARTIAL_VERSION) return { ok: false, reason: `partial format version ${String(v.version)}, this sluice reads ${PARTIAL_VERSION}` };
  const results = [];
  for (const r of v.results ?? []) {
    const parsed = shardResultFromStored(r);
    if (!parsed) return { ok: false, reason: "holds a shard result of another result schema (written by another sluice version)" };
    results.push(parsed);
  }
  return { ok: true, partial: { ...v, results } };
}

// src/core/partition.ts
async function scanPartition(policyFile, index2, count3, opts) {
  if (!Number.isInteger(count3) || count3 < 1 || !Number.isInteger(index2) || index2 < 1 || index2 > count3) {
    throw new ConfigError(`--partition must be I/N with 1 \u2264 I \u2264 N, got ${index2}/${count3}`);
  }
  const started = performance.now();
  const policy = await loadPolicyOrThrow(policyFile, opts.root, opts.onWarning);
  const discovery = await discoverOrThrow(policy);
  const mine = discovery.shards.filter((s) => partitionOf(s.path, count3) === index2);
  const prepared = await prepareOrThrow(policy);
  const { results } = await measureShards(policy, mine, prepared, { ...opts, policies: [policyFile] }, started);
  results.sort((a, b) => a.path < b.path ? -1 : a.path > b.path ? 1 : 0);
  return {
    format: PARTIAL_FORMAT,
    version: PARTIAL_VERSION,
    policy: policy.name,
    settingsId: prepared.settingsId,
    partition: { index: index2, count: count3 },
    shardsInCorpus: discovery.shards.length,
    results,
    skipped: discovery.skipped.filter((s) => partitionOf(s.path, count3) === index2)
  };
}
async function mergePartials(policyFile, partFiles, opts) {
  const started = performance.now();
  const policy = await loadPolicyOrThrow(policyFile, opts.root, opts.onWarning);
  const prepared = await prepareOrThrow(policy);
  if (partFiles.length === 0) throw new ConfigError("merge: no partial result files given");
  const parts = [];
  for (const file of partFiles) {
    let text;
    try {
      text = await readFile5(file, "utf8");
    } catch (err) {
      throw new ConfigError(`${file}: cannot read: ${err.message}`);
    }
    const parsed = partialFromJson(text);
    if (!parsed.ok) throw new ConfigError(`${file}: ${parsed.reason}`);
    if (parsed.partial.settingsId !== prepared.settingsId) {
      throw new ConfigError(`${file}: measured under other settings (${parsed.partial.settingsId}) than ${policy.file} gives now (${prepared.settingsId}): scan it again with this policy and sluice version`);
    }
    parts.push({ file, partial: parsed.partial });
  }
  const count3 = parts[0].partial.partition.count;
  const seen = /* @__PURE__ */ new Map();
  for (const { file, partial } of parts) {
    if (partial.partition.count !== count3) throw new ConfigError(`${file}: partition ${partial.partition.index}/${partial.partition.count}, but ${parts[0].file} is one of ${count3}`);
    const other = seen.get(partial.partition.index);
    if (other) throw new ConfigError(`${file}: partition ${partial.partition.index}/${count3} given twice (also ${other})`);
    seen.set(partial.partition.index, file);
  }
  const missing = Array.from({ length: count3 }, (_, i) => i + 1).filter((i) => !seen.has(i));
  if (missing.length) throw new ConfigError(`merge: partition${missing.length > 1 ? "s" : ""} ${missing.map((i) => `${i}/${count3}`).join(", ")} missing: the report would not cover the corpus`);
  const shardsInCorpus = new Set(parts.map((p) => p.partial.shardsInCorpus));
  const results = parts.flatMap((p) => p.partial.results);
  const skipped = parts.flatMap((p) => p.partial.skipped).sort((a, b) => a.path < b.path ? -1 : 1);
  if (shardsInCorpus.size > 1) throw new ConfigError(`merge: the parts saw different corpora (${[...shardsInCorpus].join(" vs ")} shards): scan all partitions of the same commit`);
  if (results.length !== [...shardsInCorpus][0]) throw new ConfigError(`merge: the parts hold ${results.length} shards, the corpus has ${[...shardsInCorpus][0]}`);
  const corpus = await assembleCorpus(policy, prepared, results, /* @__PURE__ */ new Set(), skipped, opts.newShards, started);
  return buildReport(policy, corpus, opts.cwd);
}

// src/core/worker.ts
import { parentPort, workerData, isMainThread } from "node:worker_threads";
var PROGRESS_STEP_BYTES = 8 * 1024 * 1024;
function isShardWorker() {
  return !isMainThread && workerData?.role === "sluice-shard-worker";
}
async function initOf(port) {
  const given = workerData;
  if (!("pending" in given)) return given;
  return new Promise((resolve) => {
    const first = (msg) => {
      if (msg.type !== "init") return;
      port.off("message", first);
      resolve(msg.init);
    };
    port.on("message", first);
  });
}
async function runShardWorker() {
  const port = parentPort;
  const init = await initOf(port);
  const post = (m) => port.postMessage(m);
  try {
    const prepared = await prepareAnalyzers(init.policy, init.evaluation ? { evaluation: init.evaluation } : {});
    port.on("message", (msg) => {
      if (msg.type === "close") {
        port.close();
        return;
      }
      if (msg.type === "share") {
        prepared.adoptCounts(msg.tables);
        return;
      }
      if (msg.type === "init") return;
      if (msg.type === "batch") {
        try {
          throwIfFaultInjected(msg.path);
          const result = measureBatch(msg.batch, prepared.scan, prepared.analyzers);
          port.postMessage({ type: "batch-result", id: msg.id, result }, transferablesOf(result));
        } catch (err) {
          post({ type: "error", id: msg.id, message: err.message });
        }
        return;
      }
      void (async () => {
        try {
          throwIfFaultInjected(msg.ref.path);
          let told = 0;
          const result = await scanShard(msg.ref, prepared.scan, prepared.analyzers, (bytes3) => {
            if (bytes3 - told < PROGRESS_STEP_BYTES) return;
            told = bytes3;
            post({ type: "progress", id: msg.id, bytes: bytes3 });
          });
          post({ type: "result", id: msg.id, result });
        } catch (err) {
          post({ type: "error", id: msg.id, message: err.message });
        }
      })();
    });
    post({ type: "ready", settingsId: prepared.settingsId });
    try {
      prepared.warmUp();
    } catch {
    }
  } catch (err) {
    post({ type: "error", id: null, message: err.message });
  }
}

// src/render/json.ts
function renderJson(report) {
  return `${JSON.stringify(report, null, 2)}
`;
}

// src/render/bars.ts
var FULL = "\u2588";
var PARTIAL = ["", "\u258F", "\u258E", "\u258D", "\u258C", "\u258B", "\u258A", "\u2589"];
function bar(value, width = 20) {
  const cells = Math.max(0, Math.min(1, value)) * width;
  const whole = Math.floor(cells);
  const eighth = Math.round((cells - whole) * 8);
  return FULL.repeat(whole) + (eighth === 8 ? FULL : PARTIAL[eighth]);
}

// src/render/escape.ts
var MARKDOWN_PUNCT = /[\\`*_{}[\]()#+\-.!|~]/g;
var HTML_SPECIAL = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };
function escapeMarkdown(text) {
  return text.replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g, (c) => `U+${c.codePointAt(0).toString(16).toUpperCase().padStart(4, "0")}`).replace(MARKDOWN_PUNCT, (c) => `\\${c}`).replace(/[&<>"']/g, (c) => HTML_SPECIAL[c]).replace(/@/g, "&#64;").replace(/:\/\//g, "&#58;//").replace(/\r?\n|\r/g, " ");
}
function codePath(path5) {
  const safe = path5.replace(/[\u0000-\u001F\u007F-\u009F\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g, "?").replace(/`/g, "'").replace(/\|/g, "\\|");
  return `\`${safe}\``;
}

// src/render/format.ts
function percent(x) {
  return x === null || x === void 0 ? "\u2013" : `${(x * 100).toFixed(1)} %`;
}
function count2(n) {
  return n === null || n === void 0 ? "\u2013" : n.toLocaleString("en-US");
}
function counted(n, noun, plural = `${noun}s`) {
  return `${count2(n)} ${n === 1 ? noun : plural}`;
}
function fixed(x, digits2 = 2) {
  return x === null || x === void 0 ? "\u2013" : x.toFixed(digits2);
}
function points(x) {
  if (x === null || x === void 0) return "\u2013";
  const r = Math.round(x * 10) / 10;
  return `${r > 0 ? "+" : r < 0 ? "\u2212" : "\xB1"}${Math.abs(r).toFixed(1)} pt`;
}
function bytes2(n) {
  if (n < 1e3) return `${n} B`;
  if (n < 1e6) return `${(n / 1e3).toFixed(1)} kB`;
  if (n < 1e9) return `${(n / 1e6).toFixed(1)} MB`;
  return `${(n / 1e9).toFixed(2)} GB`;
}
function inUnit(x, unit) {
  if (x === null) return "\u2013";
  if (unit === "share") return percent(x);
  if (unit === "count") return count2(x);
  if (unit === "points") return points(x);
  return fixed(x, 3);
}
function limitOf(r) {
  const base = inUnit(r.limit, r.unit);
  return r.tolerance === void 0 ? base : `${base} \xB1${(r.tolerance * 100).toFixed(1)}`;
}
function where(loc) {
  return loc.line === void 0 ? loc.path : `${loc.path}:${loc.line}`;
}
function firstRejections(report, limit) {
  const shown = [];
  for (const s of report.shards) {
    for (const r of s.rejections) {
      if (shown.length >= limit) break;
      shown.push({ path: s.path, line: r.line, reason: r.reason, detail: r.detail });
    }
    if (shown.length >= limit) break;
  }
  return { shown, more: report.input.rejected.count - shown.length };
}

// src/render/markdown.ts
var ICON = { pass: "\u2705", warn: "\u26A0\uFE0F", fail: "\u274C", uncertain: "\u2754" };
var MAX_REJECTIONS_LISTED = 10;
function renderMarkdown(report, opts = {}) {
  const out = [];
  const loc = (path5, line) => {
    const text = codePath(line === void 0 ? path5 : `${path5}:${line}`);
    if (!opts.linkBase) return text;
    const href = `${opts.linkBase}/${path5.split("/").map((seg) => encodeURIComponent(seg).replace(/[()'!*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)).join("/")}${line !== void 0 ? `#L${line}` : ""}`;
    return `[${text}](${href})`;
  };
  out.push(`## ${ICON[report.verdict]} sluice \xB7 ${escapeMarkdown(report.policy.name)}: ${report.verdict.toUpperCase()}`);
  out.push("");
  out.push(`**${escapeMarkdown(report.headline)}**`);
  out.push("");
  const est = report.totals.estimated ? "\u2248" : "";
  out.push(
    `${counted(report.totals.docs, "document")} in ${counted(report.input.shards, "shard")}, ${est}${bytes2(report.totals.bytes)} of text` + (report.totals.tokens !== void 0 ? `, ${est}${count2(report.totals.tokens)} tokens (${escapeMarkdown(report.tokenizer?.main ?? "")})` : "") + `; policy ${codePath(report.policy.file)}.`
  );
  out.push("");
  if (report.sampling) {
    const s = report.sampling;
    out.push(
      `**Sampled:** ${count2(s.measuredDocs)} of ${count2(s.docs)} documents measured (\`${s.method}: ${s.setting}\`; ${count2(s.completeShards)} of ${count2(report.input.shards)} shards in full). Sizes and shares are estimates; a rule fails only when its whole ${Math.round(s.confidence * 100)} % interval is past the limit, and is \u2754 uncertain when the interval straddles it. Computed over every document: ${s.everyDocument.join(", ")}.`
    );
    out.push("");
    for (const [m, text] of Object.entries(s.methods)) out.push(`- \`${m}\`: ${escapeMarkdown(text)}`);
    out.push("");
  }
  const notPassing = report.rules.filter((r) => r.verdict !== "pass");
  const ordered = [...notPassing, ...report.rules.filter((r) => r.verdict === "pass")];
  const withCi = report.sampling !== void 0;
  out.push(`| | rule | scope | measured |${withCi ? " 95 % interval |" : ""} limit | finding |`);
  out.push(`|---|---|---|---:|${withCi ? "---:|" : ""}---:|---|`);
  for (const r of ordered) {
    const ci = withCi ? ` ${r.interval ? `${inUnit(r.interval.low, r.unit)} \u2013 ${inUnit(r.interval.high, r.unit)}` : "exact"} |` : "";
    out.push(`| ${ICON[r.verdict]} | ${r.rule}${r.severity === "warn" ? " (warn)" : ""} | ${escapeMarkdown(r.scope.replace(/^language:/, ""))} | ${inUnit(r.measured, r.unit)} |${ci} ${limitOf(r)} | ${escapeMarkdown(r.message)} |`);
  }
  out.push("");
  for (const r of notPassing) {
    if (r.locations.length === 0) continue;
    out.push(`<details><summary>${ICON[r.verdict]} ${r.rule} \xB7 ${escapeMarkdown(r.scope)}: where</summary>`);
    out.push("");
    for (const l of r.locations) out.push(`- ${loc(l.path, l.line)}${l.detail ? `: ${escapeMarkdown(l.detail)}` : ""}`);
    out.push("");
    out.push("</details>");
    out.push("");
  }
  if (opts.before) out.push(opts.before, "");
  const unit = report.mixUnit;
  out.push(`<details open><summary>Language mix (by ${unit})</summary>`);
  out.push("");
  out.push(`| language | target | share of ${unit} |${withCi ? " 95 % interval |" : ""} | docs | words${report.totals.tokens !== void 0 ? " | tokens" : ""} | purity |`);
  out.push(`|---|---:|---:|${withCi ? "---:|" : ""}---|---:|---:|${report.totals.tokens !== void 0 ? "---:|" : ""}---:|`);
  for (const f of Object.values(report.languages)) {
    if (f.docs === 0 && f.target === void 0) continue;
    const share = f.share[unit] ?? 0;
    out.push(
      `| ${escapeMarkdown(f.key)} | ${percent(f.target)} | ${percent(share)} |${withCi ? ` ${f.intervals?.share[unit] ? `${percent(f.intervals.share[unit].low)} \u2013 ${percent(f.intervals.share[unit].high)}` : "\u2013"} |` : ""} ${bar(share, 16)} | ${count2(f.docs)} | ${count2(f.words)}${report.totals.tokens !== void 0 ? ` | ${count2(f.tokens ?? 0)}` : ""} | ${percent(f.purity)} |`
    );
  }
  out.push("");
  out.push("</details>");
  out.push("");
  const declared = Object.values(report.languages).filter((f) => f.declaredDocs);
  if (declared.length) {
    out.push("<details><summary>Declared vs detected language</summary>");
    out.push("");
    out.push("| declared | documents | detected otherwise | detected as |");
    out.push("|---|---:|---:|---|");
    for (const f of declared) {
      const as = Object.entries(f.detectedAs ?? {}).sort((a, b) => b[1] - a[1]).map(([k, n]) => `${escapeMarkdown(k)} ${count2(n)}`).join(", ");
      out.push(`| ${escapeMarkdown(f.key)} | ${count2(f.declaredDocs)} | ${percent((f.mismatchDocs ?? 0) / (f.declaredDocs ?? 1))} | ${as} |`);
    }
    out.push("");
    out.push("</details>");
    out.push("");
  }
  const withFertility = Object.values(report.languages).filter((f) => f.fertility && f.docs > 0);
  if (withFertility.length > 0) {
    const hasBase = withFertility.some((f) => f.baseline);
    out.push(`<details><summary>Tokenizer: ${escapeMarkdown(report.tokenizer?.main ?? "")}${hasBase ? ` vs ${escapeMarkdown(report.tokenizer?.baseline ?? "")}` : ""}</summary>`);
    out.push("");
    out.push(`| language | fertility | continued words | tokens/word | chars/token | bytes/token | dictionary fertility${hasBase ? " | baseline fertility | change | mix shift" : ""} |`);
    out.push(`|---|---:|---:|---:|---:|---:|---:|${hasBase ? "---:|---:|---:|" : ""}`);
    for (const f of withFertility) {
      const t = f.fertility;
      const b = f.baseline;
      const change = b?.fertility && t.fertility ? t.fertility / b.fertility - 1 : null;
      out.push(
        `| ${escapeMarkdown(f.key)} | ${fixed(t.fertility, 3)} | ${percent(t.continuedWords)} | ${fixed(t.tokensPerWord, 3)} | ${fixed(t.charsPerToken, 2)} | ${fixed(t.bytesPerToken, 2)} | ${t.dictionary ? fixed(t.dictionary.fertility, 3) : "\u2013"}` + (hasBase ? ` | ${fixed(b?.fertility, 3)} | ${change === null ? "\u2013" : `${change >= 0 ? "+" : ""}${percent(change)}`} | ${points(report.tokenizer?.mixShiftPoints?.[f.key])}` : "") + " |"
      );
    }
    out.push("");
    out.push("</details>");
    out.push("");
  }
  if (report.duplicates) {
    const d = report.duplicates;
    out.push(`<details><summary>Duplicates: ${count2(d.exactDocs)} exact (${percent(d.exactRate)}), ${count2(d.nearDocs)} near (${percent(d.nearRate)})</summary>`);
    out.push("");
    out.push(`MinHash over word ${d.parameters.shingle}-grams, ${d.parameters.hashes} hashes, ${d.parameters.bands} bands \xD7 ${d.parameters.rows} rows, Jaccard \u2265 ${d.parameters.threshold}.`);
    out.push("");
    for (const c of d.clusters.slice(0, 10)) {
      out.push(`- ${c.kind} \xD7${c.size}: first ${loc(c.first.path, c.first.line)}; copies ${c.copies.slice(0, 5).map((x) => `${loc(x.path, x.line)}${x.jaccard !== void 0 ? ` (J\u2248${x.jaccard.toFixed(2)})` : ""}`).join(", ")}${c.copies.length > 5 ? ` and ${c.copies.length - 5} more` : ""}`);
    }
    out.push("");
    out.push("</details>");
    out.push("");
  }
  if (report.contamination) {
    const c = report.contamination;
    out.push(`<details><summary>Evaluation overlap: ${counted(c.docs, "training document")} ${c.docs === 1 ? "shares" : "share"} a ${c.ngram}-word sequence with ${counted(c.evalItems, "evaluation item")}</summary>`);
    out.push("");
    for (const s of c.samples) out.push(`- ${loc(s.path, s.line)} overlaps ${codePath(s.detail ?? "")}`);
    out.push("");
    out.push("</details>");
    out.push("");
  }
  const i = report.input;
  out.push(`<details><summary>Input: ${counted(i.lines, "line")} = ${count2(i.docLines)} in documents + ${count2(i.empty)} empty + ${count2(i.rejected.count)} rejected</summary>`);
  out.push("");
  const reasons = Object.entries(i.rejected.byReason);
  if (reasons.length) out.push(`Rejected by reason: ${reasons.map(([r, n]) => `${r} ${count2(n)}`).join(", ")}.`, "");
  for (const b of i.broken) out.push(`- broken: ${loc(b.path)} after line ${b.afterLine}: ${escapeMarkdown(b.message)}`);
  const rejections = firstRejections(report, MAX_REJECTIONS_LISTED);
  for (const r of rejections.shown) out.push(`- rejected: ${loc(r.path, r.line)} ${r.reason}: ${escapeMarkdown(r.detail)}`);
  if (rejections.more > 0) out.push(`- \u2026and ${counted(rejections.more, "more rejected line")} (each shard's first ones are in the JSON report)`);
  for (const s of i.skipped) out.push(`- skipped: ${codePath(s.path)} (${s.reason}): ${escapeMarkdown(s.detail)}`);
  const maxRows = opts.maxShardRows ?? 50;
  out.push("");
  out.push("| shard | subset | lines | docs | empty | rejected | languages |");
  out.push("|---|---|---:|---:|---:|---:|---|");
  for (const s of report.shards.slice(0, maxRows)) {
    out.push(`| ${loc(s.path)} | ${escapeMarkdown(s.subset ?? "")} | ${count2(s.lines)} | ${count2(s.docs)} | ${count2(s.empty)} | ${count2(s.rejected)} | ${escapeMarkdown(Object.entries(s.languages).map(([k, n]) => `${k} ${n}`).join(", "))} |`);
  }
  if (report.shards.length > maxRows) out.push("", `\u2026and ${report.shards.length - maxRows} more shards (all are in the JSON report).`);
  out.push("");
  out.push("</details>");
  out.push("");
  out.push("<sub>sluice does not judge licences, personal data or toxicity: a pass is not a clearance.</sub>");
  return `${out.join("\n")}
`;
}

// src/render/terminal.ts
function renderTerminal(report, opts) {
  const c = (code) => (s) => opts.color ? `\x1B[${code}m${s}\x1B[0m` : s;
  const red = c(31), green = c(32), yellow = c(33), dim = c(2), bold = c(1);
  const paint = { pass: green, warn: yellow, fail: red, uncertain: yellow };
  const mark = { pass: "ok  ", warn: "WARN", fail: "FAIL", uncertain: "??  " };
  const est = report.totals.estimated ? "\u2248" : "";
  const lines = [];
  lines.push(`${bold(`sluice \xB7 ${clean2(report.policy.name)}`)}  ${paint[report.verdict](bold(report.verdict.toUpperCase()))}`);
  lines.push(paint[report.verdict](report.headline));
  lines.push(
    dim(
      `${counted(report.totals.docs, "document")}, ${counted(report.input.shards, "shard")}, ${est}${bytes2(report.totals.bytes)} of text` + (report.totals.tokens !== void 0 ? `, ${est}${count2(report.totals.tokens)} tokens (${report.tokenizer?.main})` : "") + ` \xB7 policy ${report.policy.file}`
    )
  );
  if (report.sampling) lines.push(dim(samplingLine(report)));
  lines.push("");
  const maxLoc = opts.maxLocations ?? 5;
  const ordered = [...report.rules].sort((a, b) => rank(a) - rank(b));
  for (const r of ordered) {
    const scope = r.scope.replace(/^language:/, "");
    lines.push(
      `${paint[r.verdict](mark[r.verdict])} ${r.rule.padEnd(13)} ${clean2(scope).padEnd(10)} ${inUnit(r.measured, r.unit).padStart(9)} ${dim("limit")} ${limitOf(r).padEnd(13)} ${r.verdict === "pass" ? dim(clean2(r.message)) : clean2(r.message)}`
    );
    if (r.verdict !== "pass") {
      for (const l of r.locations.slice(0, maxLoc)) lines.push(`       ${dim("at")} ${clean2(where(l))}${l.detail ? dim(`  ${clean2(l.detail)}`) : ""}`);
      if (r.locations.length > maxLoc) lines.push(dim(`       \u2026${r.locations.length - maxLoc} more locations in the JSON and Markdown reports`));
    }
  }
  lines.push("");
  const unit = report.mixUnit;
  const hasTokens = report.totals.tokens !== void 0;
  lines.push(bold(`Language mix by ${unit}`) + (report.sampling ? dim(`  (estimated; share ${Math.round(report.sampling.confidence * 100)} % interval after it)`) : ""));
  lines.push(dim(`  ${"language".padEnd(9)} ${"target".padStart(7)} ${"share".padStart(7)}  ${"".padEnd(20)} ${"docs".padStart(8)} ${"words".padStart(10)}${hasTokens ? ` ${"tokens".padStart(10)}` : ""} ${"purity".padStart(7)}`));
  for (const f of Object.values(report.languages)) {
    if (f.docs === 0 && f.target === void 0) continue;
    const share = f.share[unit] ?? 0;
    lines.push(
      `  ${clean2(f.key).padEnd(9)} ${percent(f.target).padStart(7)} ${percent(share).padStart(7)}  ${bar(share, 20).padEnd(20)} ${count2(f.docs).padStart(8)} ${count2(f.words).padStart(10)}${hasTokens ? ` ${count2(f.tokens ?? 0).padStart(10)}` : ""} ${percent(f.purity).padStart(7)}` + (f.intervals?.share[unit] ? dim(`  ${percent(f.intervals.share[unit].low)} \u2013 ${percent(f.intervals.share[unit].high)}`) : "")
    );
  }
  const declared = Object.values(report.languages).filter((f) => f.declaredDocs);
  if (declared.length) {
    lines.push("");
    lines.push(bold("Declared vs detected language"));
    for (const f of declared) {
      const as = Object.entries(f.detectedAs ?? {}).sort((a, b) => b[1] - a[1]).map(([k, n]) => `${clean2(k)} ${count2(n)}`).join(", ");
      lines.push(`  ${clean2(f.key).padEnd(9)} ${count2(f.declaredDocs).padStart(7)} declared, ${percent((f.mismatchDocs ?? 0) / (f.declaredDocs ?? 1)).padStart(7)} detected otherwise ${dim(`(${as})`)}`);
    }
  }
  const fert = Object.values(report.languages).filter((f) => f.fertility && f.docs > 0);
  if (fert.length) {
    lines.push("");
    const base = report.tokenizer?.baseline;
    lines.push(bold(`Fertility (subword tokens per word) under ${report.tokenizer?.main}${base ? ` vs ${base}` : ""}`));
    for (const f of fert) {
      const t = f.fertility;
      const b = f.baseline;
      lines.push(
        `  ${clean2(f.key).padEnd(9)} ${fixed(t.fertility, 3).padStart(6)}  continued ${percent(t.continuedWords).padStart(7)}  chars/token ${fixed(t.charsPerToken, 2).padStart(5)}` + (t.dictionary ? `  dictionary ${fixed(t.dictionary.fertility, 3)}` : "") + (b ? dim(`  ${base}: ${fixed(b.fertility, 3)}, mix shift ${points(report.tokenizer?.mixShiftPoints?.[f.key])}`) : "")
      );
    }
  }
  if (report.duplicates) {
    const d = report.duplicates;
    lines.push("");
    lines.push(bold("Duplicates") + dim(`  exact ${count2(d.exactDocs)} (${percent(d.exactRate)}), near ${count2(d.nearDocs)} (${percent(d.nearRate)}), Jaccard \u2265 ${d.parameters.threshold}`));
    for (const cl of d.clusters.slice(0, 5)) {
      lines.push(`  ${cl.kind.padEnd(5)} \xD7${String(cl.size).padEnd(3)} ${clean2(where(cl.first))} ${dim("\u2192")} ${cl.copies.slice(0, 3).map((x) => clean2(where(x))).join(", ")}${cl.copies.length > 3 ? dim(` +${cl.copies.length - 3}`) : ""}`);
    }
  }
  if (report.contamination && report.contamination.docs > 0) {
    lines.push("");
    lines.push(bold("Evaluation overlap") + dim(`  ${counted(report.contamination.docs, "training document")} ${report.contamination.docs === 1 ? "shares" : "share"} a ${report.contamination.ngram}-word sequence with an evaluation item`));
    for (const s of report.contamination.samples.slice(0, 5)) lines.push(`  ${clean2(where(s))} ${dim("overlaps")} ${clean2(s.detail ?? "")}`);
  }
  const i = report.input;
  lines.push("");
  lines.push(
    dim(
      `Input: ${counted(i.lines, "line")} = ${count2(i.docLines)} in ${counted(i.docs, "document")} + ${count2(i.empty)} empty + ${count2(i.rejected.count)} rejected` + (Object.keys(i.rejected.byReason).length ? ` (${Object.entries(i.rejected.byReason).map(([k, n]) => `${k} ${n}`).join(", ")})` : "") + (i.skipped.length ? `; ${counted(i.skipped.length, "file")} skipped` : "") + (i.broken.length ? `; ${counted(i.broken.length, "shard")} broken` : "")
    )
  );
  const shownAbove = report.rules.some((r) => r.rule === "input" && r.unit === "share" && r.verdict !== "pass" && r.locations.length > 0);
  const rejections = shownAbove ? { shown: [], more: 0 } : firstRejections(report, MAX_REJECTIONS_SHOWN);
  for (const r of rejections.shown) lines.push(`       ${dim("at")} ${clean2(where(r))}${dim(`  ${r.reason}: ${clean2(r.detail)}`)}`);
  if (rejections.more > 0) lines.push(dim(`       and ${counted(rejections.more, "more rejected line")} (every shard's first ones are in the JSON report)`));
  lines.push(dim(`${fixed(report.timing.megabytesPerSecond, 1)} MB/s, ${report.timing.elapsedMs} ms, ${counted(report.timing.cacheHits, "shard")} from cache`));
  return `${lines.join("\n")}
`;
}
var MAX_REJECTIONS_SHOWN = 3;
function rank(r) {
  return r.verdict === "fail" ? 0 : r.verdict === "warn" ? 1 : r.verdict === "uncertain" ? 2 : 3;
}
function samplingLine(report) {
  const s = report.sampling;
  return `Sample: ${count2(s.measuredDocs)} of ${count2(s.docs)} documents measured (${s.method} ${s.setting}; ${count2(s.completeShards)} of ${count2(report.input.shards)} shards in full); sizes and shares are estimates with ${Math.round(s.confidence * 100)} % intervals (${Object.keys(s.methods).join(", ")}); ${s.everyDocument.join(", ")} over every document`;
}
function clean2(s) {
  return s.replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u202A-\u202E\u2066-\u2069]/g, (ch) => `U+${ch.codePointAt(0).toString(16).toUpperCase().padStart(4, "0")}`);
}

// src/cli/options.ts
import { parseArgs } from "node:util";
var USAGE = `sluice: a merge gate for the quality of multilingual training corpora

Usage:
  sluice check [--policy] FILE [FILE...] [options]   measure the corpus a policy names and judge it
  sluice scan --policy FILE --partition I/N --out PART.json [options]
                                                     measure partition I of N of the shards (one runner's share)
  sluice merge PART.json [PART.json...] --policy FILE [options]
                                                     merge every partition's result, join duplicates across them, judge

Options for check:
  -p, --policy FILE      policy file (YAML); repeat for several; positional files work too
      --json FILE        write the JSON report (schemas/report.schema.json) to FILE
      --markdown FILE    write the Markdown report to FILE
      --root DIR         judge the shards under DIR instead of the policy's root
      --cache-dir DIR    where per-shard results are cached by content (default .sluice-cache)
      --no-cache         measure every shard again
      --workers N        threads measuring shards (default: one per 2 MB of compressed shards
                         to measure, up to the available cores)
      --split-mb N       with several workers, a shard holding at least N MB of text (and over a
                         quarter of a worker's share) is read once and measured in batches by all
                         of them (default 4; the results are the same either way, only the time changes)
      --color / --no-color   force colour on or off (default: on for a terminal, off when NO_COLOR is set)
  -q, --quiet            print only the verdict line
  -h, --help             this text
  -v, --version          the version

Exit status: 0 the gate passes (warnings allowed), 1 a rule at error severity failed,
2 the run could not be judged (bad policy, no shards matched, unreadable root).
`;
var UsageError = class extends Error {
  name = "UsageError";
};
function parseCli(argv, env, isTTY) {
  const [command, ...rest] = argv;
  if (command === void 0) throw new UsageError("no command given: use `sluice check`, `sluice scan` or `sluice merge`; try `sluice --help`");
  if (command === "-h" || command === "--help" || command === "help") return { command: "help" };
  if (command === "-v" || command === "--version") return { command: "version" };
  if (command !== "check" && command !== "scan" && command !== "merge") throw new UsageError(`unknown command \`${command}\`; try \`sluice --help\``);
  let parsed;
  try {
    parsed = parseArgs({
      args: rest,
      allowPositionals: true,
      options: {
        policy: { type: "string", short: "p", multiple: true },
        json: { type: "string" },
        markdown: { type: "string" },
        root: { type: "string" },
        "cache-dir": { type: "string" },
        "no-cache": { type: "boolean" },
        color: { type: "boolean" },
        "no-color": { type: "boolean" },
        quiet: { type: "boolean", short: "q" },
        help: { type: "boolean", short: "h" },
        workers: { type: "string" },
        "split-mb": { type: "string" },
        partition: { type: "string" },
        out: { type: "string" }
      }
    });
  } catch (err) {
    throw new UsageError(`${err.message}; try \`sluice --help\``);
  }
  const v = parsed.values;
  if (v.help) return { command: "help" };
  let workers;
  if (v.workers !== void 0) {
    workers = Number(v.workers);
    if (!Number.isInteger(workers) || workers < 1) throw new UsageError(`--workers takes a whole number of at least 1, got \`${v.workers}\``);
  }
  let minSplitBytes;
  if (v["split-mb"] !== void 0) {
    const mb = Number(v["split-mb"]);
    if (!Number.isFinite(mb) || mb < 0 || v["split-mb"].trim() === "") throw new UsageError(`--split-mb takes a number of MB of at least 0, got \`${v["split-mb"]}\``);
    minSplitBytes = Math.round(mb * 1024 * 1024);
  }
  const cacheDir = v["no-cache"] ? null : v["cache-dir"] ?? ".sluice-cache";
  const color = v["no-color"] ? false : v.color ? true : isTTY && !("NO_COLOR" in env && env.NO_COLOR !== "");
  if (command === "scan") {
    const m = /^(\d+)\/(\d+)$/.exec(v.partition ?? "");
    if (!m) throw new UsageError("scan needs --partition I/N, e.g. --partition 1/8");
    const [index2, count3] = [Number(m[1]), Number(m[2])];
    if (count3 < 1 || index2 < 1 || index2 > count3) throw new UsageError(`--partition ${v.partition}: I must be between 1 and N`);
    if (!v.out) throw new UsageError("scan needs --out FILE for the partial result");
    const policy = [...v.policy ?? [], ...parsed.positionals];
    if (policy.length !== 1) throw new UsageError("scan takes exactly one --policy");
    const out2 = { command: "scan", policy: policy[0], partition: { index: index2, count: count3 }, out: v.out, cacheDir };
    if (v.root !== void 0) out2.root = v.root;
    if (workers !== void 0) out2.workers = workers;
    if (minSplitBytes !== void 0) out2.minSplitBytes = minSplitBytes;
    return out2;
  }
  if (command === "merge") {
    if (!v.policy || v.policy.length !== 1) throw new UsageError("merge takes exactly one --policy and the partial files as arguments");
    if (parsed.positionals.length === 0) throw new UsageError("merge needs the partial result files written by `sluice scan --partition`");
    const out2 = { command: "merge", policy: v.policy[0], parts: parsed.positionals, cacheDir, color, quiet: v.quiet ?? false };
    if (v.json !== void 0) out2.json = v.json;
    if (v.markdown !== void 0) out2.markdown = v.markdown;
    if (v.root !== void 0) out2.root = v.root;
    return out2;
  }
  const policies = [...v.policy ?? [], ...parsed.positionals];
  if (policies.length === 0) throw new UsageError("no policy file given; usage: sluice check --policy policies/main.yaml");
  const out = { command: "check", policies, cacheDir, color, quiet: v.quiet ?? false };
  if (workers !== void 0) out.workers = workers;
  if (minSplitBytes !== void 0) out.minSplitBytes = minSplitBytes;
  if (v.json !== void 0) out.json = v.json;
  if (v.markdown !== void 0) out.markdown = v.markdown;
  if (v.root !== void 0) out.root = v.root;
  return out;
}

// src/cli/main.ts
async function check(opts) {
  const progress = progressPrinter();
  const reports = await runCheck({
    policies: opts.policies,
    cacheDir: opts.cacheDir,
    ...opts.root !== void 0 ? { root: opts.root } : {},
    onProgress: progress.update,
    onWarning: (m) => process.stderr.write(`warning: ${m}
`),
    workerEntry: import.meta.url,
    ...opts.workers !== void 0 ? { workers: opts.workers } : {},
    ...opts.minSplitBytes !== void 0 ? { minSplitBytes: opts.minSplitBytes } : {}
  });
  progress.clear();
  return emit(reports, opts);
}
async function scan2(opts) {
  const progress = progressPrinter();
  const partial = await scanPartition(opts.policy, opts.partition.index, opts.partition.count, {
    cacheDir: opts.cacheDir,
    ...opts.root !== void 0 ? { root: opts.root } : {},
    ...opts.workers !== void 0 ? { workers: opts.workers } : {},
    ...opts.minSplitBytes !== void 0 ? { minSplitBytes: opts.minSplitBytes } : {},
    onProgress: progress.update,
    onWarning: (m) => process.stderr.write(`warning: ${m}
`),
    workerEntry: import.meta.url
  });
  progress.clear();
  await writeFile2(opts.out, partialToJson(partial));
  const docs = partial.results.reduce((n, r) => n + r.read.docs, 0);
  process.stdout.write(`partition ${opts.partition.index}/${opts.partition.count}: ${partial.results.length} of ${partial.shardsInCorpus} shards, ${docs} documents \u2192 ${opts.out}
`);
  return 0;
}
async function merge(opts) {
  const report = await mergePartials(opts.policy, opts.parts, {
    cacheDir: null,
    ...opts.root !== void 0 ? { root: opts.root } : {},
    onWarning: (m) => process.stderr.write(`warning: ${m}
`)
  });
  return emit([report], opts);
}
async function emit(reports, opts) {
  for (const report of reports) {
    process.stdout.write(opts.quiet ? `${report.headline}
` : renderTerminal(report, { color: opts.color }));
  }
  const single = reports.length === 1;
  const suffixed = (file, name) => single ? file : file.replace(/(\.[^./]+)?$/, (ext) => `.${name}${ext}`);
  for (const report of reports) {
    if (opts.json) await writeFile2(suffixed(opts.json, report.policy.name), renderJson(report));
    if (opts.markdown) await writeFile2(suffixed(opts.markdown, report.policy.name), renderMarkdown(report));
  }
  return reports.some((r) => r.verdict === "fail") ? 1 : 0;
}
function progressPrinter() {
  const tty = process.stderr.isTTY === true;
  let last = 0;
  let shown = false;
  return {
    update(p) {
      if (!tty || p.elapsedMs < 1e3 || p.elapsedMs - last < 200) return;
      last = p.elapsedMs;
      shown = true;
      const rate = p.bytes / 1e6 / (p.elapsedMs / 1e3);
      process.stderr.write(`\r\x1B[K${p.policy}: ${p.shardsDone}/${p.shards} shards, ${(p.bytes / 1e6).toFixed(1)} MB read, ${rate.toFixed(1)} MB/s`);
    },
    clear() {
      if (shown) process.stderr.write("\r\x1B[K");
    }
  };
}
async function main() {
  try {
    const cmd = parseCli(process.argv.slice(2), process.env, process.stdout.isTTY === true);
    if (cmd.command === "help") {
      process.stdout.write(USAGE);
      return 0;
    }
    if (cmd.command === "version") {
      process.stdout.write(`${TOOL_VERSION}
`);
      return 0;
    }
    if (cmd.command === "scan") return await scan2(cmd);
    if (cmd.command === "merge") return await merge(cmd);
    return await check(cmd);
  } catch (err) {
    if (err instanceof UsageError || err instanceof ConfigError || err instanceof ShardFailure) {
      process.stderr.write(`sluice: ${err.message}
`);
      return 2;
    }
    process.stderr.write(`sluice: internal error: ${err.stack ?? String(err)}
`);
    return 2;
  }
}
if (isShardWorker()) void runShardWorker();
else
  void main().then(
    (code) => {
      process.exitCode = code;
    },
    (err) => {
      process.stderr.write(`sluice: internal error: ${err?.stack ?? String(err)}
`);
      process.exitCode = 2;
    }
  );
