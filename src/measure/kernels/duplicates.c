// The duplicate index's scan of one prepared document (duplicates/scan.ts DocumentScanner),
// compiled to WebAssembly: in one pass over the UTF-16 units, the 64-bit hash of the exact
// normal form (whitespace runs as one space, none at the ends, punctuation dropped when asked)
// and one hash per word, in one lane or two. The arithmetic is scan.ts's, unit for unit, over
// the same class table, so the hashes are the same bits (test/measure/duplicates-kernel.test.ts
// compares the two). An astral code point's class comes from the caller (the imported
// `astralClass`), which asks the engine's Unicode properties.
//
// Build: node scripts/gen-kernels.mjs (clang --target=wasm32, wasm-ld; Debian packages
// clang and lld). The binary is committed as a generated file beside this source.
#include <stdint.h>

typedef uint8_t u8;
typedef uint16_t u16;
typedef int32_t i32;
typedef uint32_t u32;

// Code-unit classes, as scan.ts numbers them.
#define OTHER 0
#define WORD 1
#define HIGH_SURROGATE 2
#define SPACE 3
#define PUNCT 4

// The exact hash's lanes (duplicates/hash.ts).
#define EXACT_BASIS_1 0x811c9dc5u
#define EXACT_BASIS_2 0x6c62272eu
#define EXACT_PRIME_1 0x01000193u
#define EXACT_PRIME_2 0x5bd1e995u
// The word hash's lanes.
#define WORD_BASIS_1 0x811c9dc5u
#define WORD_BASIS_2 0x050c5d1fu
#define WORD_PRIME_1 0x01000193u
#define WORD_PRIME_2 0x2c1b3c6du

// The class (WORD, PUNCT, SPACE or OTHER) of an astral code point.
__attribute__((import_module("env"), import_name("astralClass"))) i32 astralClass(i32 codePoint);

static const u8 *C;
static u32 exactLength;
static u32 exactHigh;
static u32 exactLow;

__attribute__((export_name("setClasses"))) void setClasses(const u8 *classes) { C = classes; }
__attribute__((export_name("exactLength"))) u32 getExactLength(void) { return exactLength; }
__attribute__((export_name("exactHigh"))) u32 getExactHigh(void) { return exactHigh; }
__attribute__((export_name("exactLow"))) u32 getExactLow(void) { return exactLow; }

// MurmurHash3's finalizer and the "lowbias32" one (hash.ts mix32, mix32b).
static inline u32 mix32(u32 h) {
  h ^= h >> 16;
  h *= 0x85ebca6bu;
  h ^= h >> 13;
  h *= 0xc2b2ae35u;
  return h ^ (h >> 16);
}

static inline u32 mix32b(u32 h) {
  h ^= h >> 16;
  h *= 0x7feb352du;
  h ^= h >> 15;
  h *= 0x846ca68bu;
  return h ^ (h >> 16);
}

// Scans t[0, n): writes one hash per word to words (and words2 when `two`), returns the word
// count; exactLength/High/Low hold the exact normal form's length and 64-bit hash. The word
// arrays must hold n / 2 + 1 entries (a word takes a unit and is followed by one that is not).
__attribute__((export_name("scanPrepared"))) i32 scanPrepared(const u16 *t, i32 n, i32 strip, i32 two, u32 *words, u32 *words2) {
  i32 count = 0;
  i32 inWord = 0;
  u32 wh = 0, wh2 = 0, wlen = 0;
  u32 h1 = EXACT_BASIS_1, h2 = EXACT_BASIS_2;
  u32 emitted = 0;
  i32 space = 0; // whitespace seen since the last emitted unit
// One unit into both lanes of the exact hash, and into both lanes of the word's hash.
#define EXACT_UNIT(unit) (h1 = (h1 ^ (unit)) * EXACT_PRIME_1, h2 = (h2 ^ (unit)) * EXACT_PRIME_2)
#define WORD_UNIT(unit) (wh = (wh ^ (unit)) * WORD_PRIME_1, wh2 = (wh2 ^ (unit)) * WORD_PRIME_2)
// One space stands for the whole whitespace run before a unit that is kept, never at the start.
#define PENDING_SPACE()    \
  if (space) {             \
    if (emitted > 0) {     \
      EXACT_UNIT(0x20u);   \
      emitted++;           \
    }                      \
    space = 0;             \
  }
  for (i32 i = 0; i < n; i++) {
    u32 c = t[i];
    u32 cls = C[c];
    i32 lo = -1;
    if (cls == HIGH_SURROGATE) {
      u32 next = i + 1 < n ? t[i + 1] : 0;
      if (next >= 0xdc00 && next < 0xe000) {
        cls = (u32)astralClass((i32)(((c - 0xd800) << 10) + (next - 0xdc00) + 0x10000));
        lo = (i32)next;
        i++;
      } else {
        cls = OTHER;
      }
    }
    if (cls == WORD) {
      if (!inWord) {
        inWord = 1;
        wh = WORD_BASIS_1;
        wh2 = WORD_BASIS_2;
        wlen = 0;
      }
      PENDING_SPACE();
      WORD_UNIT(c);
      EXACT_UNIT(c);
      if (lo >= 0) {
        WORD_UNIT((u32)lo);
        EXACT_UNIT((u32)lo);
        wlen += 2;
        emitted += 2;
        continue;
      }
      // The rest of a run of BMP word units.
      i32 from = i;
      while (i + 1 < n) {
        u32 d = t[i + 1];
        if (C[d] != WORD) break;
        WORD_UNIT(d);
        EXACT_UNIT(d);
        i++;
      }
      wlen += (u32)(i - from + 1);
      emitted += (u32)(i - from + 1);
      continue;
    }
    if (inWord) {
      inWord = 0;
      if (two) words2[count] = mix32b(wh2 + wlen);
      words[count++] = mix32(wh ^ wlen);
    }
    if (cls == SPACE) {
      space = 1;
      continue;
    }
    if (strip && cls == PUNCT) continue;
    PENDING_SPACE();
    EXACT_UNIT(c);
    emitted++;
    if (lo >= 0) {
      EXACT_UNIT((u32)lo);
      emitted++;
    }
  }
  if (inWord) {
    if (two) words2[count] = mix32b(wh2 + wlen);
    words[count++] = mix32(wh ^ wlen);
  }
  // hash.ts finishExact.
  h1 ^= emitted;
  h2 += emitted;
  h1 += h2;
  h2 += h1;
  h1 = mix32(h1);
  h2 = mix32b(h2);
  h1 += h2;
  h2 += h1;
  exactLength = emitted;
  exactHigh = h1;
  exactLow = h2;
  return count;
}

// ---- MinHash signatures of word shingles (duplicates/minhash.ts Sketcher, step for step):
// a polynomial rolling hash per shingle, FILL rounds placing every shingle in one of k bins,
// then optimal densification of the bins still empty. Values compare as signed integers.

#define ROLL_BASE 0x2545f491u
#define PROBE_TABLE 32
// Shingles of the longest text scanned here: a word takes a unit and is followed by another.
#define MAX_SHINGLES ((1 << 20) / 2 + 1)

static i32 shingles[MAX_SHINGLES];

// A sketcher's settings and tables, laid out by the caller: shingle, k, fill rounds, and the
// addresses of its length seeds (shingle + 1), probes (k × PROBE_TABLE), values (k), rounds (k).
typedef struct {
  i32 shingle;
  i32 hashes;
  i32 fillRounds;
  const i32 *lengthSeed;
  const i32 *probes;
  i32 *values;
  i32 *rounds;
} Sketcher;

static inline u32 binOf(u32 x, u32 k) { return ((x >> 16) * k) >> 16; }

static u32 probeBin(u32 bin, u32 attempt, u32 k) {
  u32 x = mix32(((bin + 1) * 0x9e3779b1u) ^ ((attempt + 1) * 0x85ebca77u) ^ 0x27d4eb2fu);
  return binOf(x, k);
}

// Writes the signature of the set of `count` hashes at `set` to the sketcher's values.
static void fill(const Sketcher *s, const i32 *set, i32 count) {
  u32 k = (u32)s->hashes;
  i32 *val = s->values;
  i32 *rnd = s->rounds;
  for (u32 b = 0; b < k; b++) rnd[b] = -1;
  i32 empty = (i32)k;
  for (i32 i = 0; i < count; i++) {
    i32 x = set[i];
    u32 b = binOf((u32)x, k);
    if (rnd[b] < 0) {
      rnd[b] = 0;
      val[b] = x;
      empty--;
    } else if (x < val[b]) {
      val[b] = x;
    }
  }
  for (i32 t = 1; empty > 0 && t < s->fillRounds; t++) {
    u32 ts = (u32)t * 0x9e3779b1u;
    for (i32 i = 0; i < count; i++) {
      i32 x = (i32)mix32((u32)set[i] ^ ts);
      u32 b = binOf((u32)x, k);
      i32 r = rnd[b];
      if (r < 0) {
        rnd[b] = t;
        val[b] = x;
        empty--;
      } else if (r == t && x < val[b]) {
        val[b] = x;
      }
    }
  }
  if (empty == 0) return;
  // Densification: each empty bin copies the first filled bin along its own probe sequence.
  for (u32 i = 0; i < k; i++) {
    if (rnd[i] >= 0) continue;
    i32 from = -1;
    for (u32 a = 0; a < PROBE_TABLE; a++) {
      i32 j = s->probes[i * PROBE_TABLE + a];
      if (rnd[j] >= 0) {
        from = j;
        break;
      }
    }
    for (u32 a = PROBE_TABLE; from < 0; a++) {
      u32 j = probeBin(i, a, k);
      if (rnd[j] >= 0) from = (i32)j;
    }
    val[i] = val[from];
  }
}

// Returns the number of shingles of a document given its `count` word hashes (count ≥ 1, at most
// MAX_SHINGLES), leaving its signature in the sketcher's values.
__attribute__((export_name("sketch"))) i32 sketch(const i32 *words, i32 count, const Sketcher *s) {
  i32 n = s->shingle;
  i32 m = count < n ? count : n;
  i32 shingleCount = count < n ? 1 : count - n + 1;
  u32 top = 1;
  for (i32 j = 1; j < m; j++) top *= ROLL_BASE;
  u32 h = 0;
  for (i32 j = 0; j < m; j++) h = h * ROLL_BASE + (u32)words[j];
  u32 seed = (u32)s->lengthSeed[m];
  shingles[0] = (i32)mix32(h ^ seed);
  for (i32 i = 1; i < shingleCount; i++) {
    h = (h - (u32)words[i - 1] * top) * ROLL_BASE + (u32)words[i + m - 1];
    shingles[i] = (i32)mix32(h ^ seed);
  }
  fill(s, shingles, shingleCount);
  return shingleCount;
}

// ---- Evaluation-set contamination (duplicates/contamination.ts findContamination, step for
// step): every window of m words is hashed in two lanes as it slides; lane 1 goes through the
// index's bitmap prefilter first, lane 2 is brought up to date only for the windows that pass.

#define GRAM_BASE_1 0x2545f491u
#define GRAM_BASE_2 0x5851f42du

// An index of n-grams, laid out by the caller: its table (two key lanes and the first item
// holding each gram, open addressing from the low bits of lane 1) and its prefilter bitmap.
typedef struct {
  u32 mask;
  u32 filterShift;
  const u32 *lane1;
  const u32 *lane2;
  const i32 *item;
  const u32 *filter;
} EvalTable;

static inline u32 topPower(u32 base, i32 m) {
  u32 top = 1;
  for (i32 j = 1; j < m; j++) top *= base;
  return top;
}

static inline u32 windowHash(const u32 *w, i32 from, i32 m, u32 base) {
  u32 h = 0;
  for (i32 j = from; j < from + m; j++) h = h * base + w[j];
  return h;
}

// The first item (lowest index) holding one of the m-word windows of the `words` word hashes in
// lanes w1, w2, or `best` when that is lower (-1: none yet); stops early at item 0.
__attribute__((export_name("firstOverlap"))) i32 firstOverlap(const u32 *w1, const u32 *w2, i32 words, i32 m, const EvalTable *t, i32 best) {
  if (words < m) return best;
  u32 top1 = topPower(GRAM_BASE_1, m);
  u32 top2 = topPower(GRAM_BASE_2, m);
  u32 h1 = windowHash(w1, 0, m, GRAM_BASE_1);
  u32 h2 = 0;
  i32 h2at = -2; // the window h2 belongs to
  for (i32 i = 0; i + m <= words; i++) {
    if (i > 0) h1 = (h1 - w1[i - 1] * top1) * GRAM_BASE_1 + w1[i + m - 1];
    u32 a = mix32(h1 ^ (u32)m);
    u32 bit = a >> t->filterShift;
    if ((t->filter[bit >> 5] & (1u << (bit & 31))) == 0) continue;
    h2 = h2at == i - 1 ? (h2 - w2[i - 1] * top2) * GRAM_BASE_2 + w2[i + m - 1] : windowHash(w2, i, m, GRAM_BASE_2);
    h2at = i;
    u32 b = mix32b(h2 + (u32)m);
    for (u32 slot = a & t->mask;; slot = (slot + 1) & t->mask) {
      i32 it = t->item[slot];
      if (it < 0) break;
      if (t->lane1[slot] == a && t->lane2[slot] == b) {
        if (best < 0 || it < best) best = it;
        break;
      }
    }
    if (best == 0) break;
  }
  return best;
}
