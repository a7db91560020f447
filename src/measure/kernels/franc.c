// The hot loops of the franc labeller (language-franc.ts), compiled to WebAssembly:
// counting the profile trigrams of a cleaned sample, scoring the candidates of one script
// group over them, and counting a sample's characters by franc's script class. The tables
// are the labeller's own, laid out by it in this module's memory; the arithmetic is franc's integer arithmetic, as the TypeScript loops
// this replaced did it, unit for unit, so the labels are franc's (the language tests
// compare them with franc).
//
// Build: node scripts/gen-kernels.mjs (clang --target=wasm32, wasm-ld; Debian packages
// clang and lld). The binary is committed as a generated file beside this source.
#include <stdint.h>
#include <wasm_simd128.h>

typedef uint16_t u16;
typedef int16_t i16;
typedef int32_t i32;
typedef uint32_t u32;

#define SEPARATOR 0x20
#define CARE 0
#define MAX_DIFFERENCE 300 // franc's distance for a trigram that a profile lacks

// Tables, set once by setTables (pointers into this memory).
static const u16 *folded;      // per BMP unit: SEPARATOR, CARE or its lower case
static const i16 *directId;    // per a-z/space trigram: interned id or -1
static const i32 *internTable; // open addressing: [2s] = hi, [2s+1] = lo | (id + 1) << 16
static u32 internBits;
static u16 *idTally;           // per interned id: count in this sample; one slot more, for absent trigrams
static u32 absentSlot;         // that slot: the number of interned ids
static i32 *distinctIds;       // ids of this sample, in order of first sight
static i32 counted;            // how many of distinctIds hold set tallies
static i32 flags;              // bit 0: sample all ASCII; bit 1: it has an ASCII letter

__attribute__((export_name("setTables"))) void setTables(const u16 *f, const i16 *d, const i32 *t, u32 bits, u16 *tally, i32 *distinct, u32 ids) {
  folded = f;
  directId = d;
  internTable = t;
  internBits = bits;
  idTally = tally;
  distinctIds = distinct;
  absentSlot = ids;
  counted = 0;
}

__attribute__((export_name("sampleFlags"))) i32 sampleFlags(void) { return flags; }

static inline i32 symbolOf(u32 unit) { return unit == 0x20 ? 0 : (unit - 0x61u) < 26u ? (i32)(unit - 0x60) : -1; }

// The intern table's hash, as language-franc.ts computes it when it builds the table.
static inline i32 hashedId(const i32 *restrict table, u32 bits, u32 hi, u32 lo) {
  u32 mask = (1u << bits) - 1;
  u32 slot = ((hi * 0x9e3779b1u) ^ ((lo + 0x7f4a7c15u) * 0x85ebca77u)) >> (32 - bits);
  for (;;) {
    u32 second = (u32)table[2 * slot + 1];
    if (second == 0) return -1;
    if ((second & 0xffff) == lo && (u32)table[2 * slot] == hi) return (i32)(second >> 16) - 1;
    slot = (slot + 1) & mask;
  }
}

// Counts trigram (a, b, c) and returns the new number of distinct ids. A trigram no profile has
// is counted in the spare slot and never listed; a new id is written every time and kept only
// when new: no branch on a coin flip either way.
static inline i32 tally(u32 a, u32 b, u32 c, i32 sa, i32 sb, i32 sc, i32 distinct) {
  i32 id = (sa | sb | sc) >= 0 ? directId[(sa * 27 + sb) * 27 + sc] : hashedId(internTable, internBits, (a << 16) | b, c);
  u32 slot = id < 0 ? absentSlot : (u32)id;
  u32 n = idTally[slot];
  idTally[slot] = (u16)(n + 1);
  distinctIds[distinct] = id;
  return distinct + ((n == 0) & (id >= 0));
}

/** Sets the tallies of the last count back to 0. */
static void resetCount(void) {
  for (i32 d = 0; d < counted; d++) idTally[distinctIds[d]] = 0;
  counted = 0;
}

/**
 * Cleans the first `end` units at `text` (end <= MAX_SAMPLE) as trigram-utils does and counts
 * the profile trigrams of `' ' + cleaned + ' '`: returns how many distinct ones there are, or
 * -1 if a unit needs care (the caller then cleans and calls countCleaned).
 *
 * Two passes, with no branch at a separator or at an absent trigram: the first writes the cleaned sample
 * (a run of separators kept as one space, none at the start, one at the end) into `compact`,
 * advancing only past units it keeps; the second counts its trigrams, a trigram no profile
 * has in the spare tally slot. The one pass this replaced, with a branch at every separator
 * and at every trigram no profile has, took 1.25x the time (four profiles of labelling the
 * bench corpus's 33,658 samples six times: 5.6 s against 4.5 s in this function); one pass
 * without those branches took longer still (it looks up the dropped separators too). A NUL
 * stands before the leading space: no profile has a trigram with NUL, so (NUL, space, first
 * unit) counts nothing.
 */
#define MAX_SAMPLE 2048 // language-franc.ts: MAX_LENGTH, franc's sample
static u16 compact[MAX_SAMPLE + 2];
__attribute__((export_name("countTrigrams"))) i32 countTrigrams(const u16 *restrict text, i32 end) {
  resetCount();
  if (end > MAX_SAMPLE) end = MAX_SAMPLE; // the caller's sample is at most this long
  u32 units = 0, letter = 0, care = 0;
  u32 afterSeparator = 1; // so that separators before the first word are dropped
  i32 n = 1;
  compact[0] = 0x20;
  for (i32 i = 0; i < end; i++) {
    u32 unit = text[i];
    units |= unit;
    letter |= ((unit | 0x20) - 0x61u) < 26u;
    u32 c = folded[unit];
    care |= c == CARE;
    u32 separator = c == SEPARATOR;
    compact[n] = (u16)c; // SEPARATOR is the space itself
    n += !(separator & afterSeparator);
    afterSeparator = separator;
  }
  if (care) return -1;
  compact[n] = 0x20;
  n += !afterSeparator;
  i32 distinct = 0;
  u32 a = 0, b = 0x20;
  i32 sa = -1, sb = 0;
  for (i32 p = 1; p < n; p++) {
    u32 c = compact[p];
    i32 sc = symbolOf(c);
    distinct = tally(a, b, c, sa, sb, sc, distinct);
    a = b;
    sa = sb;
    b = c;
    sb = sc;
  }
  counted = distinct;
  flags = (units < 0x80 ? 1 : 0) | (letter ? 2 : 0);
  return distinct;
}

/** Counts the profile trigrams of a sample that language-franc.ts has cleaned (n units, spaces around it included). */
__attribute__((export_name("countCleaned"))) i32 countCleaned(const u16 *restrict cleaned, i32 n) {
  resetCount();
  i32 distinct = 0;
  for (i32 p = 0; p + 2 < n; p++) {
    u32 a = cleaned[p], b = cleaned[p + 1], c = cleaned[p + 2];
    distinct = tally(a, b, c, symbolOf(a), symbolOf(b), symbolOf(c), distinct);
  }
  counted = distinct;
  return distinct;
}

/**
 * Counts the first `end` units at `text` by franc's expression class (`classes`: one byte per
 * BMP unit) into counts[0 .. n); returns -1, with the counts unfinished, at the first
 * surrogate, whose code point the caller classes by range.
 */
__attribute__((export_name("countClasses"))) i32 countClasses(const u16 *restrict text, i32 end, const uint8_t *restrict classes, i32 *restrict counts, i32 n) {
  for (i32 c = 0; c < n; c++) counts[c] = 0;
  for (i32 i = 0; i < end; i++) {
    u32 unit = text[i];
    if ((unit & 0xf800) == 0xd800) return -1;
    counts[classes[unit]]++;
  }
  return 0;
}

/**
 * Scores k languages of one group over the last count's `distinct` trigrams and returns the
 * index of the nearest, the first on a tie. Each language's distance is summed less the 300
 * per distinct trigram that all are charged alike. The group's profiles are laid out densely:
 * rowOf[id] is the row of trigram id (0: a row of zeros, for a trigram no candidate has), and
 * row r holds, at rows[r * stride + l], rank + 1 of the trigram in language l's profile, or 0;
 * eight languages at a time, in 16-bit lanes (counts ≤ 2 × 2048 + 2, ranks < 2^15: every term
 * fits), summed in 32-bit ones.
 */
__attribute__((export_name("nearestDense"))) i32 nearestDense(i32 distinct, const i32 *restrict rowOf, const i16 *restrict rows, i32 stride, i32 k, i32 *restrict distances) {
  for (i32 l = 0; l < stride; l++) distances[l] = 0;
  const v128_t penalty = wasm_i16x8_splat(MAX_DIFFERENCE);
  const v128_t none = wasm_i16x8_splat(0);
  for (i32 d = 0; d < distinct; d++) {
    i32 id = distinctIds[d];
    const i16 *row = rows + rowOf[id] * stride;
    v128_t count = wasm_i16x8_splat((i16)idTally[id]);
    for (i32 v = 0; v < stride; v += 8) {
      v128_t rank = wasm_v128_load(row + v);
      // |count − rank − 1| − 300 where the language has the trigram, 0 where it does not.
      v128_t term = wasm_v128_and(wasm_i16x8_sub(wasm_i16x8_abs(wasm_i16x8_sub(count, rank)), penalty), wasm_i16x8_ne(rank, none));
      v128_t *sum = (v128_t *)(distances + v);
      sum[0] = wasm_i32x4_add(sum[0], wasm_i32x4_extend_low_i16x8(term));
      sum[1] = wasm_i32x4_add(sum[1], wasm_i32x4_extend_high_i16x8(term));
    }
  }
  i32 best = 0;
  for (i32 l = 1; l < k; l++) if (distances[l] < distances[best]) best = l;
  return best;
}
