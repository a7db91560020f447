// The hot loops of token counting with a tiktoken-style vocabulary (tokens/tiktoken.ts),
// compiled to WebAssembly: splitting a text into the pieces of a builtin split pattern and
// looking each piece's token count up in a direct-mapped cache. A piece the cache does not
// hold is counted by the caller (the imported `resolve`: shared counts, then byte-pair
// merges, which the caller runs here too, `mergeCount`) and kept. The splitters are tokens/split.ts's, unit for unit, over the same
// table of character classes (built there from the engine's own Unicode properties), and
// like them they stop at a surrogate, where the caller lets the regex decide one piece.
// test/measure/tokens-split.test.ts holds these splitters to the patterns as it does the
// TypeScript ones.
// It also builds the rank tables of the builtin tokenizers from js-tiktoken's data
// (fillBuiltinRanks), the bytes ranks.ts's parser builds, faster than that parser on a fresh thread.
//
// Build: node scripts/gen-kernels.mjs (clang --target=wasm32, wasm-ld; Debian packages
// clang and lld). The binary is committed as a generated file beside this source.
#include <stdint.h>

typedef int8_t i8;
typedef uint8_t u8;
typedef uint16_t u16;
typedef int32_t i32;
typedef uint32_t u32;

// Bits of a code unit's class, as split.ts sets them; 0 is "past the end of the text".
#define LETTER 1
#define NUMBER 2
#define SPACE 4
#define UPPERISH 8
#define LOWERISH 16
#define OTHER 32
#define PREFIX 64
#define SURROGATE 128

#define APOSTROPHE 0x27
#define SPACE_UNIT 0x20
#define SLASH 0x2f

// Split patterns, as tokens-kernel.ts numbers them.
#define GPT2 0
#define CL100K 1
#define O200K 2

// Units of a key the cache holds in place; longer pieces are always resolved by the caller.
#define KEY_UNITS 16

// Counts a piece the cache lacks: text[start, end), whose FNV-1a hash is `hash`.
__attribute__((import_module("env"), import_name("resolve"))) i32 resolve(i32 start, i32 end, i32 hash);

static const u8 *C; // class of every BMP code unit (64 KB)
static const u16 *T; // the text being split
static i32 N;        // its length
static i32 stop;     // where the last countPieces stopped
static double total; // tokens of the pieces it found

__attribute__((export_name("setClasses"))) void setClasses(const u8 *classes) { C = classes; }
__attribute__((export_name("stoppedAt"))) i32 stoppedAt(void) { return stop; }
__attribute__((export_name("tokens"))) double tokens(void) { return total; }

static inline u32 unitAt(i32 i) { return i < N ? T[i] : 0; }
static inline u32 classAt(i32 i) { return i < N ? C[T[i]] : 0; }

// Length of a contraction at i ('s 't 're 've 'm 'll 'd), 0 if none; lower-case only unless caseless.
static i32 contraction(i32 i, i32 caseless) {
  if (unitAt(i) != APOSTROPHE) return 0;
  u32 a = unitAt(i + 1);
  u32 b = unitAt(i + 2);
  if (caseless) {
    if (a >= 0x41 && a <= 0x5a) a += 0x20;
    if (b >= 0x41 && b <= 0x5a) b += 0x20;
  }
  if (a == 0x73 || a == 0x74 || a == 0x6d || a == 0x64) return 2; // s t m d
  if ((a == 0x72 && b == 0x65) || (a == 0x76 && b == 0x65) || (a == 0x6c && b == 0x6c)) return 3; // re ve ll
  return 0;
}

// End of a run of units with a bit of `mask` from i, or -1 if the run stops at a surrogate.
static i32 run(i32 i, u32 mask) {
  while (i < N) {
    u32 c = C[T[i]];
    if ((c & mask) == 0) return (c & SURROGATE) == 0 ? i : -1;
    i++;
  }
  return i;
}

// End of the run of \s from i.
static i32 spaceRun(i32 i) {
  while (i < N && (C[T[i]] & SPACE) != 0) i++;
  return i;
}

// End after any \r, \n (and / when `slash`) from i.
static i32 trailing(i32 i, i32 slash) {
  for (;;) {
    u32 c = unitAt(i);
    if (c == 0x0a || c == 0x0d || (slash && c == SLASH)) i++;
    else return i;
  }
}

// \p{N}{1,3} from p (text[p] is a number), or -1 when a surrogate comes within the three.
static i32 digits(i32 p) {
  i32 e = p + 1;
  while (e < p + 3) {
    u32 d = classAt(e);
    if ((d & NUMBER) == 0) return (d & SURROGATE) == 0 ? e : -1;
    e++;
  }
  return e;
}

// ` ?[^\s\p{L}\p{N}]+` from p (class c), then the trailing newlines: the end, -1 at a surrogate, -2 when neither form matches.
static i32 punctuation(i32 p, u32 c, i32 slash) {
  i32 s = -1;
  if (T[p] == SPACE_UNIT) {
    u32 d = classAt(p + 1);
    if ((d & SURROGATE) != 0) return -1;
    if ((d & OTHER) != 0) s = p + 1;
  }
  if (s < 0 && (c & OTHER) != 0) s = p;
  if (s < 0) return -2;
  i32 o = run(s, OTHER);
  return o < 0 ? -1 : trailing(o, slash);
}

// A whitespace run p..q as cl100k_base and o200k_base split it.
static i32 spaceRunWithNewlines(i32 p, i32 q) {
  for (i32 i = q - 1; i >= p; i--) {
    u32 u = T[i];
    if (u == 0x0a || u == 0x0d) return i + 1;
  }
  if (q == N || q - p == 1) return q;
  return q - 1;
}

static i32 splitGpt2(i32 p) {
  u32 c = C[T[p]];
  if ((c & SURROGATE) != 0) return -1;
  if (T[p] == APOSTROPHE) {
    i32 len = contraction(p, 0);
    if (len > 0) return p + len;
  }
  i32 s = p;
  u32 k = c;
  if (T[p] == SPACE_UNIT) {
    u32 d = classAt(p + 1);
    if ((d & SURROGATE) != 0) return -1;
    if ((d & (LETTER | NUMBER | OTHER)) != 0) {
      s = p + 1;
      k = d;
    }
  }
  if ((k & LETTER) != 0) return run(s, LETTER);
  if ((k & NUMBER) != 0) return run(s, NUMBER);
  if ((k & OTHER) != 0) return run(s, OTHER);
  i32 q = spaceRun(p);
  if (q == N || q - p == 1) return q;
  return q - 1;
}

// [\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]*[\p{Ll}\p{Lm}\p{Lo}\p{M}]+ from s, as the regex backtracks: -1 at a surrogate, -2 without a match.
static i32 upperThenLower(i32 s) {
  i32 u = run(s, UPPERISH);
  if (u < 0) return -1;
  u32 next = classAt(u);
  if ((next & LOWERISH) != 0) return run(u, LOWERISH);
  if ((next & SURROGATE) != 0) return -1;
  for (i32 j = u - 1; j >= s; j--)
    if ((C[T[j]] & LOWERISH) != 0) return j + 1;
  return -2;
}

// [\p{Lu}\p{Lt}\p{Lm}\p{Lo}\p{M}]+[\p{Ll}\p{Lm}\p{Lo}\p{M}]* from s: -1 at a surrogate, -2 when text[s] is not upper-ish.
static i32 upperAndLower(i32 s) {
  u32 first = classAt(s);
  if ((first & UPPERISH) == 0) return (first & SURROGATE) == 0 ? -2 : -1;
  i32 u = run(s, UPPERISH);
  return u < 0 ? -1 : run(u, LOWERISH);
}

// The first two alternatives of o200k_base from p, prefix first, with any contraction.
static i32 o200kWord(i32 p, i32 prefixed, i32 letterish) {
  i32 e = -2;
  if (prefixed) e = upperThenLower(p + 1);
  if (e == -2 && letterish) e = upperThenLower(p);
  if (e == -2 && prefixed) e = upperAndLower(p + 1);
  if (e == -2 && letterish) e = upperAndLower(p);
  return e < 0 ? e : e + contraction(e, 1);
}

static i32 splitO200k(i32 p) {
  u32 c = C[T[p]];
  if ((c & SURROGATE) != 0) return -1;
  i32 letterish = (c & (UPPERISH | LOWERISH)) != 0;
  if (letterish && (c & PREFIX) == 0) {
    i32 e = o200kWord(p, 0, 1);
    return e < 0 ? -1 : e;
  }
  if ((c & NUMBER) != 0) return digits(p);
  if ((c & PREFIX) != 0) {
    i32 e = o200kWord(p, 1, letterish);
    if (e != -2) return e;
    i32 o = punctuation(p, c, 1);
    if (o != -2) return o;
  }
  return spaceRunWithNewlines(p, spaceRun(p));
}

static i32 splitCl100k(i32 p) {
  u32 c = C[T[p]];
  if ((c & SURROGATE) != 0) return -1;
  if (T[p] == APOSTROPHE) {
    i32 len = contraction(p, 1);
    if (len > 0) return p + len;
  }
  if ((c & LETTER) != 0) return run(p, LETTER);
  if ((c & NUMBER) != 0) return digits(p);
  if ((c & PREFIX) != 0) {
    u32 d = classAt(p + 1);
    if ((d & SURROGATE) != 0) return -1;
    if ((d & LETTER) != 0) return run(p + 1, LETTER);
    i32 o = punctuation(p, c, 0);
    if (o != -2) return o;
  }
  return spaceRunWithNewlines(p, spaceRun(p));
}

static inline i32 splitAt(i32 pattern, i32 p) {
  return pattern == O200K ? splitO200k(p) : pattern == CL100K ? splitCl100k(p) : splitGpt2(p);
}

// The end of the piece at p of text[0, n) under a pattern, or -1 (for the tests).
__attribute__((export_name("pieceEnd"))) i32 pieceEnd(const u16 *text, i32 n, i32 p, i32 pattern) {
  T = text;
  N = n;
  return splitAt(pattern, p);
}

// The token count of the piece text[p, e), from the cache or, failing it, from the caller.
// The cache: slots[2i] = length << 16 | count (0: empty), slots[2i + 1] = hash, key units at
// keys[i * KEY_UNITS]; `mask` is its entry count − 1. A miss overwrites the entry.
static inline i32 pieceCount(i32 p, i32 e, i32 *slots, u16 *keys, u32 mask) {
  const u16 *text = T;
  i32 length = e - p;
  u32 h = 0x811c9dc5u;
  for (i32 i = p; i < e; i++) h = (h ^ text[i]) * 0x01000193u;
  if (length > KEY_UNITS) return resolve(p, e, (i32)h);
  u32 f = h & mask;
  i32 *slot = slots + 2 * f;
  u16 *key = keys + f * KEY_UNITS;
  if ((u32)slot[0] >> 16 == (u32)length && (u32)slot[1] == h) {
    i32 i = 0;
    while (i < length && key[i] == text[p + i]) i++;
    if (i == length) return slot[0] & 0xffff;
  }
  i32 count = resolve(p, e, (i32)h);
  slot[0] = (length << 16) | count;
  slot[1] = (i32)h;
  for (i32 i = 0; i < length; i++) key[i] = text[p + i];
  return count;
}

// Splits text[from, n) under a pattern, writing each piece's end and token count at ends[k],
// counts[k] from k = first on, and returns the k after the last piece written; stoppedAt() is
// where it stopped (n at the end, or the start of a piece it could not decide: a surrogate is
// involved), tokens() the sum of the counts it wrote. The arrays hold a piece per unit.
__attribute__((export_name("countPieces"))) i32 countPieces(const u16 *text, i32 n, i32 from, i32 pattern, i32 first, i32 *ends, i32 *counts, i32 *slots, u16 *keys, u32 mask) {
  T = text;
  N = n;
  i32 p = from;
  i32 k = first;
  double sum = 0;
  while (p < n) {
    i32 e = splitAt(pattern, p);
    if (e < 0) break;
    i32 count = pieceCount(p, e, slots, keys, mask);
    ends[k] = e;
    counts[k] = count;
    k++;
    sum += count;
    p = e;
  }
  stop = p;
  total = sum;
  return k;
}

static i32 continued; // words of the last wordTokens call counted in two tokens or more
static i32 left;      // words it left to the caller

__attribute__((export_name("continuedWords"))) i32 continuedWords(void) { return continued; }
__attribute__((export_name("leftWords"))) i32 leftWords(void) { return left; }

// The tokens of text[from, end) split as a text of its own, or -1 when a surrogate is involved.
static i32 countAlone(i32 from, i32 end, i32 pattern, i32 *slots, u16 *keys, u32 mask) {
  i32 whole = N;
  N = end; // the splitters read nothing before p, so this is the text from..end alone
  i32 sum = 0;
  for (i32 p = from; p < end;) {
    i32 e = splitAt(pattern, p);
    if (e < 0) {
      sum = -1;
      break;
    }
    sum += pieceCount(p, e, slots, keys, mask);
    p = e;
  }
  N = whole;
  return sum;
}

// Per word of text[0, n) (offsets: start and end of each, in order), the tokens of the word
// alone with the one space before it (U+0020, when there is one), as measure.ts counts them:
// a word whose span is exactly one of the text's pieces (ends, counts, from countPieces) takes
// that piece's count, any other is split alone. Returns the sum; continuedWords() is how many
// took two tokens or more, and leftWords() how many it could not count (a surrogate is
// involved), whose indices it wrote to `leftOut` for the caller.
__attribute__((export_name("wordTokens"))) double wordTokens(const u16 *text, i32 n, i32 words, const i32 *offsets, i32 pieces, const i32 *ends, const i32 *counts, i32 pattern, i32 *slots, u16 *keys, u32 mask, i32 *leftOut) {
  T = text;
  N = n;
  double sum = 0;
  i32 cont = 0;
  i32 nleft = 0;
  i32 k = 0;
  for (i32 w = 0; w < words; w++) {
    i32 start = offsets[2 * w];
    i32 end = offsets[2 * w + 1];
    i32 from = start > 0 && text[start - 1] == SPACE_UNIT ? start - 1 : start;
    while (k < pieces && ends[k] <= from) k++;
    i32 c;
    if (k < pieces && ends[k] == end && (k == 0 ? 0 : ends[k - 1]) == from) c = counts[k];
    else {
      c = countAlone(from, end, pattern, slots, keys, mask);
      if (c < 0) {
        leftOut[nleft++] = w;
        continue;
      }
    }
    sum += c;
    if (c >= 2) cont++;
  }
  continued = cont;
  left = nleft;
  return sum;
}

// ---- Byte-pair merges (tokens/bpe.ts, step for step) over a rank table laid out as ranks.ts
// lays it out: header words, ranks (double) per token, the ranks of two-byte tokens by direct
// index, token offsets into the arena, open-addressing slots (token + 1), the arena of bytes.

#define RANK_COUNT 3
#define RANK_SLOT_BITS 4
#define RANK_HEADER_WORDS 8
#define NO_RANK __builtin_inf()

// Longest piece merged here, in UTF-16 units (at most 510 bytes): the merges scan every pair
// before each merge, O(n²) in the bytes, and the caller merges longer pieces with a heap.
#define MAX_MERGE_UNITS 170

static unsigned char mergeBytes[MAX_MERGE_UNITS * 3];
static i32 mergeStarts[MAX_MERGE_UNITS * 3 + 1];
static double mergeRanks[MAX_MERGE_UNITS * 3 + 1];

// The rank table being merged with, unpacked by mergeCount.
static const double *rankOf;
static const double *pairRankOf;
static const i32 *tokenOffsets;
static const i32 *rankSlots;
static u32 rankMask;
static const unsigned char *arena;

// The rank of the token whose bytes are b[start, end), or NO_RANK (ranks.ts RankTable.rank).
static double rank(const unsigned char *b, i32 start, i32 end) {
  u32 h = 0x811c9dc5u;
  for (i32 i = start; i < end; i++) h = (h ^ b[i]) * 0x01000193u;
  i32 length = end - start;
  for (u32 slot = h & rankMask;; slot = (slot + 1) & rankMask) {
    i32 v = rankSlots[slot];
    if (v == 0) return NO_RANK;
    i32 from = tokenOffsets[v - 1];
    if (tokenOffsets[v] - from != length) continue;
    i32 k = 0;
    while (k < length && arena[from + k] == b[start + k]) k++;
    if (k == length) return rankOf[v - 1];
  }
}

// Writes the UTF-8 bytes of t[start, end) (a lone surrogate as U+FFFD) and returns their count.
static i32 utf8(const u16 *t, i32 start, i32 end) {
  unsigned char *out = mergeBytes;
  i32 n = 0;
  for (i32 i = start; i < end; i++) {
    u32 c = t[i];
    if (c < 0x80) out[n++] = (unsigned char)c;
    else if (c < 0x800) {
      out[n++] = (unsigned char)(0xc0 | (c >> 6));
      out[n++] = (unsigned char)(0x80 | (c & 0x3f));
    } else if (c < 0xd800 || c > 0xdfff) {
      out[n++] = (unsigned char)(0xe0 | (c >> 12));
      out[n++] = (unsigned char)(0x80 | ((c >> 6) & 0x3f));
      out[n++] = (unsigned char)(0x80 | (c & 0x3f));
    } else {
      u32 low = i + 1 < end ? t[i + 1] : 0;
      if (c <= 0xdbff && low >= 0xdc00 && low <= 0xdfff) {
        u32 cp = ((c - 0xd800) << 10) + (low - 0xdc00) + 0x10000;
        out[n++] = (unsigned char)(0xf0 | (cp >> 18));
        out[n++] = (unsigned char)(0x80 | ((cp >> 12) & 0x3f));
        out[n++] = (unsigned char)(0x80 | ((cp >> 6) & 0x3f));
        out[n++] = (unsigned char)(0x80 | (cp & 0x3f));
        i++;
      } else {
        out[n++] = 0xef;
        out[n++] = 0xbf;
        out[n++] = 0xbd;
      }
    }
  }
  return n;
}

// The number of byte-pair tokens of text[start, end) (at most MAX_MERGE_UNITS units) under the
// rank table at `table`: repeatedly merge the adjacent pair of lowest rank, leftmost on ties.
__attribute__((export_name("mergeCount"))) i32 mergeCount(const u16 *text, i32 start, i32 end, const i32 *table) {
  i32 count = table[RANK_COUNT];
  const unsigned char *at = (const unsigned char *)(table + RANK_HEADER_WORDS);
  rankOf = (const double *)at;
  at += count * 8;
  pairRankOf = (const double *)at;
  at += (1 << 16) * 8;
  tokenOffsets = (const i32 *)at;
  at += (count + 1) * 4;
  rankSlots = (const i32 *)at;
  rankMask = (1u << table[RANK_SLOT_BITS]) - 1;
  at += (rankMask + 1) * 4;
  arena = at;

  i32 n = utf8(text, start, end);
  const unsigned char *b = mergeBytes;
  // A piece that is a token is one token even when the merges would not reach it.
  if (n <= 1) return n;
  if (rank(b, 0, n) != NO_RANK) return 1;
  i32 *s = mergeStarts;
  double *pr = mergeRanks;
  for (i32 i = 0; i <= n; i++) s[i] = i;
  for (i32 i = 0; i < n - 1; i++) pr[i] = pairRankOf[(b[i] << 8) | b[i + 1]];
  i32 parts = n;
  while (parts > 1) {
    double best = NO_RANK;
    i32 where = -1;
    for (i32 i = 0; i < parts - 1; i++) {
      if (pr[i] < best) {
        best = pr[i];
        where = i;
      }
    }
    if (where < 0) break;
    // Merge part `where` with part `where + 1`.
    __builtin_memmove(s + where + 1, s + where + 2, (unsigned long)(parts - where - 1) * 4);
    __builtin_memmove(pr + where, pr + where + 1, (unsigned long)(parts - where - 2) * 8);
    parts--;
    if (where < parts - 1) pr[where] = rank(b, s[where], s[where + 2]);
    if (where > 0) pr[where - 1] = rank(b, s[where - 1], s[where + 1]);
  }
  return parts;
}

// ---- Building the rank table of a js-tiktoken builtin (ranks.ts parseBuiltinRanks, byte for
// byte): its `bpe_ranks` text, in ASCII, is lines of `<tag> <first rank> <base64 token>...`, the
// tokens one space apart and ranked from the first rank on. scanBuiltinRanks counts the tokens
// and their bytes, so that the caller can lay the table out; fillBuiltinRanks writes it. Both take
// the text followed by a newline.

#define RANK_ARENA_BYTES 5

static i32 scanned; // bytes of the tokens the last scanBuiltinRanks found

__attribute__((export_name("scannedBytes"))) i32 scannedBytes(void) { return scanned; }

// base64 value of each byte, -1 for a byte outside the alphabet.
static const i8 BASE64[256] = {
  -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1,
  -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, 62, -1, -1, -1, 63, 52, 53, 54, 55, 56, 57, 58, 59, 60, 61, -1, -1, -1, -1, -1, -1,
  -1, 0,  1,  2,  3,  4,  5,  6,  7,  8,  9,  10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 20, 21, 22, 23, 24, 25, -1, -1, -1, -1, -1,
  -1, 26, 27, 28, 29, 30, 31, 32, 33, 34, 35, 36, 37, 38, 39, 40, 41, 42, 43, 44, 45, 46, 47, 48, 49, 50, 51, -1, -1, -1, -1, -1,
  -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1,
  -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1,
  -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1,
  -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1, -1,
};

// The byte count of the base64 t[start, end), or -1 when its length and padding cannot be
// base64 (ranks.ts decodeBase64's rules: padded to a multiple of 4, or unpadded but never one
// character over; bits after the last whole byte are dropped). Its characters are not looked at.
static i32 tokenBytes(const u8 *t, i32 start, i32 end) {
  i32 length = end - start;
  i32 pad = 0;
  if (length > 0 && t[end - 1] == '=') pad = length > 1 && t[end - 2] == '=' ? 2 : 1;
  if (length == 0 || (pad > 0 && length % 4 != 0) || (length - pad) % 4 == 1) return -1;
  return (length - pad) * 6 / 8;
}

// Decodes the base64 t[start, end), of `bytes` bytes (tokenBytes), to out; returns 0, or -1
// when a character is outside the alphabet.
static i32 decodeToken(const u8 *t, i32 start, i32 bytes, u8 *out) {
  i32 i = start;
  i32 n = 0;
  i32 bad = 0;
  for (; n + 3 <= bytes; n += 3, i += 4) {
    i32 a = BASE64[t[i]], b = BASE64[t[i + 1]], c = BASE64[t[i + 2]], d = BASE64[t[i + 3]];
    bad |= a | b | c | d;
    u32 v = ((u32)a << 18) | ((u32)b << 12) | ((u32)c << 6) | (u32)d;
    out[n] = (u8)(v >> 16);
    out[n + 1] = (u8)(v >> 8);
    out[n + 2] = (u8)v;
  }
  if (n < bytes) {
    // One or two bytes left, in two or three characters.
    i32 a = BASE64[t[i]], b = BASE64[t[i + 1]], c = bytes - n == 2 ? BASE64[t[i + 2]] : 0;
    bad |= a | b | c;
    u32 v = ((u32)a << 18) | ((u32)b << 12) | ((u32)c << 6);
    out[n] = (u8)(v >> 16);
    if (bytes - n == 2) out[n + 1] = (u8)(v >> 8);
  }
  return bad < 0 ? -1 : 0;
}

// Walks the lines of t[0, n) (t[n] is a newline, the caller's sentinel); with a table, writes
// each token's bytes, offset and rank. Returns the number of tokens, or -1 when the text is
// damaged. One pass over the bytes: a field ends at the first byte at or below a space, which
// must be a space or a newline.
static i32 walkBuiltinRanks(const u8 *t, i32 n, double *ranks, i32 *offsets, u8 *bytes) {
  i32 count = 0;
  i32 used = 0;
  if (offsets) offsets[0] = 0;
  for (i32 p = 0; p < n; p++) {
    if (t[p] == '\n') continue; // an empty line
    // `<tag> `
    while (t[p] > ' ') p++;
    if (t[p] != ' ' || p >= n) return -1;
    // The first rank: decimal digits (parseInt's, which stops at the first other character).
    i32 q = ++p;
    double rank = 0;
    while (t[q] >= '0' && t[q] <= '9') rank = rank * 10 + (t[q++] - '0');
    if (q == p || rank > 9007199254740991.0) return -1;
    while (t[q] > ' ') q++;
    p = q;
    // ` <token>` until the newline; a space before it ends the line too.
    while (t[p] == ' ' && p < n) {
      i32 s = p + 1;
      i32 e = s;
      while (t[e] > ' ') e++;
      if ((t[e] != ' ' && t[e] != '\n') || (e == s && t[e] == ' ')) return -1;
      if (e == s) {
        p = e;
        break;
      }
      i32 size = tokenBytes(t, s, e);
      if (size < 0 || (bytes && decodeToken(t, s, size, bytes + used) < 0)) return -1;
      used += size;
      if (ranks) {
        ranks[count] = rank;
        offsets[count + 1] = used;
      }
      rank += 1;
      count++;
      p = e;
    }
    if (t[p] != '\n') return -1;
  }
  scanned = used;
  return count;
}

__attribute__((export_name("scanBuiltinRanks"))) i32 scanBuiltinRanks(const u8 *text, i32 n) { return walkBuiltinRanks(text, n, 0, 0, 0); }

// Fills the table at `table` (its header's count, slot bits and arena size set from a scan of the
// same text, the rest zero) as RankTable.build does; returns -1, or -2 when the text is damaged,
// or the index of a token listed twice.
__attribute__((export_name("fillBuiltinRanks"))) i32 fillBuiltinRanks(const u8 *text, i32 n, i32 *table) {
  i32 count = table[RANK_COUNT];
  u8 *at = (u8 *)(table + RANK_HEADER_WORDS);
  double *ranks = (double *)at;
  at += count * 8;
  double *pairs = (double *)at;
  at += (1 << 16) * 8;
  i32 *offsets = (i32 *)at;
  at += (count + 1) * 4;
  i32 *slots = (i32 *)at;
  u32 mask = (1u << table[RANK_SLOT_BITS]) - 1;
  at += (mask + 1) * 4;
  u8 *bytes = at;
  if (walkBuiltinRanks(text, n, ranks, offsets, bytes) != count || scanned != table[RANK_ARENA_BYTES]) return -2;
  for (i32 i = 0; i < 1 << 16; i++) pairs[i] = NO_RANK;
  __builtin_memset(slots, 0, (mask + 1) * 4);
  for (i32 i = 0; i < count; i++) {
    i32 start = offsets[i];
    i32 end = offsets[i + 1];
    u32 h = 0x811c9dc5u;
    for (i32 k = start; k < end; k++) h = (h ^ bytes[k]) * 0x01000193u;
    for (u32 slot = h & mask;; slot = (slot + 1) & mask) {
      i32 v = slots[slot];
      if (v == 0) {
        slots[slot] = i + 1;
        break;
      }
      i32 from = offsets[v - 1];
      if (offsets[v] - from == end - start) {
        i32 k = 0;
        while (k < end - start && bytes[from + k] == bytes[start + k]) k++;
        if (k == end - start) return i;
      }
    }
    if (end - start == 2) pairs[(bytes[start] << 8) | bytes[start + 1]] = ranks[i];
  }
  return -1;
}
