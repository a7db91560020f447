// The measurer's one pass over a document (words.ts scan), compiled to WebAssembly: the
// UAX #29 word rules the fast path implements, with each character's Unicode Script, UTF-8
// length and encoding flags counted on the way, from words.ts's per-character table. The
// state machine is words.ts's, branch for branch, so the words are the same
// (test/measure/words-kernel.test.ts compares the two; the words tests compare both with
// Intl.Segmenter). A character that needs a closer look (an anomaly or mark, encoding.ts)
// is handed to the caller (the imported `closerLook`); where the word rules stop, the
// kernel stops and the caller counts the rest.
//
// Build: node scripts/gen-kernels.mjs (clang --target=wasm32, wasm-ld; Debian packages
// clang and lld). The binary is committed as a generated file beside this source.
#include <stdint.h>

typedef uint16_t u16;
typedef int32_t i32;
typedef uint32_t u32;

// Word_Break classes of words.ts.
#define OTHER 0
#define ALETTER 1
#define HEBREW_LETTER 2
#define NUMERIC 3
#define EXTEND_NUM_LET 4
#define MID_LETTER 5
#define MID_NUM 6
#define MID_NUM_LET 7
#define SINGLE_QUOTE 8
#define DOUBLE_QUOTE 9
#define IGNORABLE 10
#define NEEDS_SEGMENTER 11
#define CLASS_MASK 15
#define EXTENDED_PICTOGRAPHIC 16
#define ZWJ 0x200d

// Bits of the per-character table.
#define SCRIPT_BITS 0xff
#define UTF8_SHIFT 8
#define CLOSER_LOOK (1u << 10)
#define CLASS_SHIFT 12
#define RUN_MASK ((31u << CLASS_SHIFT) | CLOSER_LOOK)
#define IGNORABLE_RUN ((u32)IGNORABLE << CLASS_SHIFT)

// Scanner states.
#define OUT 0
#define IN 1
#define PENDING 2

// Counts the anomaly or mark the unit at `at` is (words.ts closerLook).
__attribute__((import_module("env"), import_name("closerLook"))) void closerLook(i32 unit, i32 at);

static const u32 *INFO; // per BMP code unit
static i32 stop;        // where the word rules stopped, -1 when they did not
static u32 bytes;       // UTF-8 bytes of the characters counted
static u32 flags;       // OR of their table entries

__attribute__((export_name("setInfo"))) void setInfo(const u32 *info) { INFO = info; }
__attribute__((export_name("stoppedAt"))) i32 stoppedAt(void) { return stop; }
__attribute__((export_name("bytes"))) u32 getBytes(void) { return bytes; }
__attribute__((export_name("flags"))) u32 getFlags(void) { return flags; }

// Whether ICU marks a finished segment word-like (words.ts wordLike).
static inline i32 wordLike(u32 last, i32 hasCore, i32 connectors, i32 trailingIgnorables) {
  if (!hasCore && connectors < 2) return 0;
  return !(last == EXTEND_NUM_LET && trailingIgnorables);
}

// The end of a word whose pending Mid character did not join it, or -1 (words.ts pendingEnd).
static inline i32 pendingEnd(i32 end, i32 coreEnd, i32 midAt, i32 midEnd, u32 last, u32 mid, i32 hasCore, i32 connectors) {
  if (last == HEBREW_LETTER && mid == SINGLE_QUOTE) return midEnd == midAt ? midEnd : -1;
  return wordLike(last, hasCore, connectors, end > coreEnd) ? end : -1;
}

// Scans t[0, n): counts characters per Script id into counts[0, scripts) (zeroed first), and
// returns the word count, writing each word's [start, end) to out when `record` (out must hold
// n + 2 entries); or returns -1 where the word rules stop (stoppedAt: the counts cover t[0, it)).
__attribute__((export_name("scanWords"))) i32 scanWords(const u16 *t, i32 n, i32 record, i32 *out, i32 *counts, i32 scripts) {
  __builtin_memset(counts, 0, (unsigned long)scripts * 4);
  u32 b = 0, f = 0;
  i32 count = 0;
  i32 state = OUT;
  i32 start = 0, end = 0, coreEnd = 0, midAt = 0, midEnd = 0;
  u32 last = OTHER, mid = OTHER;
  i32 hasCore = 0, connectors = 0;
  stop = -1;

  for (i32 i = 0; i < n; i++) {
    u32 unit = t[i];
    u32 info = INFO[unit];
    u32 cls = info >> CLASS_SHIFT;
    if (cls >= NEEDS_SEGMENTER) {
      // WB3c (ZWJ × Extended_Pictographic) is not implemented: emoji sequences go to the segmenter.
      if ((cls & EXTENDED_PICTOGRAPHIC) != 0 && i > 0 && t[i - 1] == ZWJ) {
        stop = i;
        break;
      }
      cls &= CLASS_MASK;
      if (cls == NEEDS_SEGMENTER) {
        stop = i;
        break;
      }
    }
    counts[info & SCRIPT_BITS]++;
    b += (info >> UTF8_SHIFT) & 3;
    f |= info;
    if ((info & CLOSER_LOOK) != 0) closerLook((i32)unit, i);

    if (state == IN) {
      if (cls == IGNORABLE) {
        end = i + 1; // WB4
        continue;
      }
      if (cls >= ALETTER && cls <= EXTEND_NUM_LET) {
        if (cls == EXTEND_NUM_LET) connectors++;
        else hasCore = 1;
        last = cls;
        end = coreEnd = i + 1;
        if (cls == EXTEND_NUM_LET) continue;
      } else {
        i32 letterBefore = last == ALETTER || last == HEBREW_LETTER;
        if ((cls == MID_LETTER && letterBefore) ||                                        // WB6
            ((cls == MID_NUM_LET || cls == SINGLE_QUOTE) && (letterBefore || last == NUMERIC)) || // WB6, WB12, WB7a
            (cls == MID_NUM && last == NUMERIC) ||                                        // WB12
            (cls == DOUBLE_QUOTE && last == HEBREW_LETTER)) {                             // WB7b
          state = PENDING;
          mid = cls;
          midAt = midEnd = i + 1;
          continue;
        }
        if (wordLike(last, hasCore, connectors, end > coreEnd)) {
          if (record) {
            out[count * 2] = start;
            out[count * 2 + 1] = end;
          }
          count++;
        }
        state = OUT;
        continue;
      }
    } else {
      if (state == PENDING) {
        if (cls == IGNORABLE) {
          midEnd = i + 1; // WB4
          continue;
        }
        i32 letter = cls == ALETTER || cls == HEBREW_LETTER;
        if ((letter && (last == ALETTER || last == HEBREW_LETTER) && mid != MID_NUM && mid != DOUBLE_QUOTE) || // WB7
            (cls == HEBREW_LETTER && last == HEBREW_LETTER && mid == DOUBLE_QUOTE) ||                       // WB7c
            (cls == NUMERIC && last == NUMERIC && mid != MID_LETTER && mid != DOUBLE_QUOTE)) {              // WB11
          hasCore = 1;
          last = cls;
          end = coreEnd = i + 1;
          state = IN;
        } else {
          i32 e = pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors);
          if (e >= 0) {
            if (record) {
              out[count * 2] = start;
              out[count * 2 + 1] = e;
            }
            count++;
          }
          state = OUT;
        }
      }
      if (state == OUT) {
        if (cls < ALETTER || cls > EXTEND_NUM_LET) continue;
        state = IN;
        start = i;
        end = coreEnd = i + 1;
        last = cls;
        hasCore = cls != EXTEND_NUM_LET;
        connectors = cls == EXTEND_NUM_LET ? 1 : 0;
        if (cls == EXTEND_NUM_LET) continue;
      }
    }

    // The rest of a run of the same letter/digit class and of Extend/Format characters (WB4).
    u32 same = last << CLASS_SHIFT;
    while (i + 1 < n) {
      u32 next = INFO[t[i + 1]];
      u32 run = next & RUN_MASK;
      if (run != same && run != IGNORABLE_RUN) break;
      counts[next & SCRIPT_BITS]++;
      b += (next >> UTF8_SHIFT) & 3;
      f |= next;
      i++;
    }
    end = i + 1;
  }

  bytes = b;
  flags = f;
  if (stop >= 0) return -1;
  i32 e = state == IN ? (wordLike(last, hasCore, connectors, end > coreEnd) ? end : -1)
          : state == PENDING ? pendingEnd(end, coreEnd, midAt, midEnd, last, mid, hasCore, connectors)
          : -1;
  if (e >= 0) {
    if (record) {
      out[count * 2] = start;
      out[count * 2 + 1] = e;
    }
    count++;
  }
  return count;
}
