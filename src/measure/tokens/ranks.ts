// Byte-level BPE rank tables: the mergeable tokens of a tiktoken-style vocabulary and
// their ranks, held in one SharedArrayBuffer — token bytes in an arena, an open-addressing
// index over them, the ranks, and the ranks of every two-byte token by direct index — so
// that bytePairCount looks a byte range up without making a string of it, and the worker
// threads of a pooled run take the main thread's table instead of parsing their own.
//
// Against the Map<latin1 string, rank> it replaces (o200k_base, 5 alternating rounds in one
// process, tsx, shared 2-core machine under load): parsing js-tiktoken's data took 34-161 ms
// against 107-325 ms, and every worker of a pooled run had parsed it again.

import { kernelUnavailable } from '../kernels/instance.js';
import { tokenKernel } from '../kernels/tokens-kernel.js';
import { TokenizerError } from './errors.js';
import { unitClasses } from './split.js';

/** Rank of "no such token": above every real rank, so it never wins a merge. Ranks are doubles, since a rank file's ranks may pass 2^31. */
export const NO_RANK = Infinity;

// Header words after the owner's (see stampOwner).
const COUNT = 3;
const SLOT_BITS = 4;
const ARENA_BYTES = 5;
const HEADER_WORDS = 8;
const MAGIC_VALUE = 0x736c5231;

/** Returns two 32-bit hashes of a tokenizer id, by which a shared table names its owner. */
function ownerHashes(owner: string): [number, number] {
  let a = 0x811c9dc5 | 0;
  let b = 0x9e3779b9 | 0;
  for (let i = 0; i < owner.length; i++) {
    a = Math.imul(a ^ owner.charCodeAt(i), 0x01000193);
    b = Math.imul(b ^ owner.charCodeAt(i), 0x5bd1e995) ^ (b >>> 15);
  }
  return [a, b];
}

// The first three header words of every shared table (this one and shared-counts.ts): what kind of
// table it is, written last, and the two hashes of the tokenizer it was made for.
const MAGIC = 0;
const OWNER_1 = 1;
const OWNER_2 = 2;

/** Marks a new shared table's header as `magic`'s kind, made for the tokenizer `owner` (the other header words already written). */
export function stampOwner(header: Int32Array, owner: string, magic: number): void {
  const [a, b] = ownerHashes(owner);
  header[OWNER_1] = a;
  header[OWNER_2] = b;
  header[MAGIC] = magic;
}

/** Returns whether `buffer` holds a shared table of `magic`'s kind made for the tokenizer `owner`, with a header of `words` words. */
export function ownedBy(buffer: SharedArrayBuffer, owner: string, magic: number, words: number): boolean {
  if (!(buffer instanceof SharedArrayBuffer) || buffer.byteLength < words * 4) return false;
  const header = new Int32Array(buffer, 0, words);
  const [a, b] = ownerHashes(owner);
  return header[MAGIC] === magic && header[OWNER_1] === a && header[OWNER_2] === b;
}

/** FNV-1a over bytes[start, end). */
function hashBytes(bytes: Uint8Array, start: number, end: number): number {
  let h = 0x811c9dc5 | 0;
  for (let i = start; i < end; i++) h = Math.imul(h ^ bytes[i]!, 0x01000193);
  return h;
}

/** The tokens of a vocabulary and their ranks, looked up by byte range. */
export class RankTable {
  /** Rank of each two-byte token, indexed by first byte << 8 | second (NO_RANK where there is none). */
  readonly pairs: Float64Array;
  private readonly offsets: Int32Array;
  private readonly ranks: Float64Array;
  private readonly slots: Int32Array;
  private readonly mask: number;
  private readonly arena: Uint8Array;

  private constructor(readonly buffer: SharedArrayBuffer) {
    const header = new Int32Array(buffer, 0, HEADER_WORDS);
    const count = header[COUNT]!;
    const slotCount = 1 << header[SLOT_BITS]!;
    this.mask = slotCount - 1;
    let at = HEADER_WORDS * 4;
    this.ranks = new Float64Array(buffer, at, count);
    at += count * 8;
    this.pairs = new Float64Array(buffer, at, 1 << 16);
    at += (1 << 16) * 8;
    this.offsets = new Int32Array(buffer, at, count + 1);
    at += (count + 1) * 4;
    this.slots = new Int32Array(buffer, at, slotCount);
    at += slotCount * 4;
    this.arena = new Uint8Array(buffer, at, header[ARENA_BYTES]!);
  }

  /** Returns the table in `buffer` (from another thread's table, or one the token kernel built) when it was made for the tokenizer `owner`, else null. */
  static attach(buffer: SharedArrayBuffer, owner: string): RankTable | null {
    return ownedBy(buffer, owner, MAGIC_VALUE, HEADER_WORDS) ? new RankTable(buffer) : null;
  }

  /** Builds a table from token bytes (concatenated in `arena`, token i at offsets[i]..offsets[i+1]) and ranks; `duplicate(i)` is called for a token listed before. */
  static build(owner: string, arena: Uint8Array, offsets: Int32Array, ranks: Float64Array, count: number, duplicate: (i: number) => void): RankTable {
    const arenaBytes = offsets[count]!;
    const layout = rankTableLayout(owner, count, arenaBytes);
    const buffer = new SharedArrayBuffer(layout.bytes);
    new Int32Array(buffer, 0, HEADER_WORDS).set(layout.header);
    const table = new RankTable(buffer);
    table.ranks.set(ranks.subarray(0, count));
    table.offsets.set(offsets.subarray(0, count + 1));
    table.arena.set(arena.subarray(0, arenaBytes));
    table.pairs.fill(NO_RANK);
    const { slots, mask } = table;
    const own = table.arena;
    for (let i = 0; i < count; i++) {
      const start = offsets[i]!;
      const end = offsets[i + 1]!;
      let slot = hashBytes(own, start, end) & mask;
      for (;;) {
        const v = slots[slot]!;
        if (v === 0) {
          slots[slot] = i + 1;
          break;
        }
        if (table.sameBytes(v - 1, own, start, end)) {
          duplicate(i);
          break;
        }
        slot = (slot + 1) & mask;
      }
      if (end - start === 2) table.pairs[(own[start]! << 8) | own[start + 1]!] = ranks[i]!;
    }
    return table;
  }

  private sameBytes(token: number, bytes: Uint8Array, start: number, end: number): boolean {
    const from = this.offsets[token]!;
    if (this.offsets[token + 1]! - from !== end - start) return false;
    const arena = this.arena;
    for (let k = 0; k < end - start; k++) if (arena[from + k] !== bytes[start + k]) return false;
    return true;
  }

  /** Returns the rank of the token whose bytes are bytes[start, end), or NO_RANK. */
  rank(bytes: Uint8Array, start: number, end: number): number {
    const { slots, mask } = this;
    for (let slot = hashBytes(bytes, start, end) & mask; ; slot = (slot + 1) & mask) {
      const v = slots[slot]!;
      if (v === 0) return NO_RANK;
      if (this.sameBytes(v - 1, bytes, start, end)) return this.ranks[v - 1]!;
    }
  }

  /** Returns the single bytes that are not tokens, as `0x..` strings (a byte-level vocabulary has none). */
  missingBytes(): string[] {
    const missing: string[] = [];
    const one = new Uint8Array(1);
    for (let b = 0; b < 256; b++) {
      one[0] = b;
      if (this.rank(one, 0, 1) === NO_RANK) missing.push(`0x${b.toString(16).padStart(2, '0')}`);
    }
    return missing;
  }
}

/** The header words and size in bytes of the table of `count` tokens of `arenaBytes` bytes in all, made for `owner`: slots for twice the tokens, a power of two. */
export function rankTableLayout(owner: string, count: number, arenaBytes: number): { header: Int32Array; bytes: number } {
  let bits = 1;
  while (1 << bits < count * 2) bits++;
  const header = new Int32Array(HEADER_WORDS);
  header[COUNT] = count;
  header[SLOT_BITS] = bits;
  header[ARENA_BYTES] = arenaBytes;
  stampOwner(header, owner, MAGIC_VALUE);
  return { header, bytes: HEADER_WORDS * 4 + count * 8 + (1 << 16) * 8 + (count + 1) * 4 + (1 << bits) * 4 + arenaBytes };
}

/** Growable token list while parsing. */
class TokenList {
  arena = new Uint8Array(1 << 20);
  offsets = new Int32Array(1 << 16);
  ranks = new Float64Array(1 << 16);
  count = 0;
  used = 0;

  /** Makes room for one more token of at most `bytes` bytes. */
  reserve(bytes: number): void {
    if (this.used + bytes > this.arena.length) {
      const a = new Uint8Array(Math.max(this.arena.length * 2, this.used + bytes));
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
  close(end: number, rank: number): void {
    this.ranks[this.count] = rank;
    this.count++;
    this.used = end;
    this.offsets[this.count] = end;
  }
}

/** base64 alphabet value of each ASCII code, -1 elsewhere. */
const BASE64_VALUE = (() => {
  const v = new Int8Array(128).fill(-1);
  const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';
  for (let i = 0; i < alphabet.length; i++) v[alphabet.charCodeAt(i)] = i;
  return v;
})();

/**
 * Decodes the base64 text[start, end) into out at `at`; returns the end offset, or -1 when it
 * is not base64. Written out because decoding each token with atob or
 * Buffer was most of the parse: it made a string or a buffer per token.
 */
function decodeBase64(text: string, start: number, end: number, out: Uint8Array, at: number): number {
  const length = end - start;
  let pad = 0;
  if (length > 0 && text.charCodeAt(end - 1) === 0x3d) pad = length > 1 && text.charCodeAt(end - 2) === 0x3d ? 2 : 1;
  // Padded to a multiple of 4, or unpadded as atob also takes it; a lone last character is never base64.
  if (length === 0 || (pad > 0 && length % 4 !== 0) || (length - pad) % 4 === 1) return -1;
  const last = end - pad;
  let bits = 0;
  let held = 0;
  for (let i = start; i < last; i++) {
    const c = text.charCodeAt(i);
    const v = c < 128 ? BASE64_VALUE[c]! : -1;
    if (v < 0) return -1;
    bits = (bits << 6) | v;
    held += 6;
    if (held >= 8) {
      held -= 8;
      out[at++] = (bits >>> held) & 0xff;
    }
  }
  // Bits left over after the last whole byte are dropped, as atob and Buffer do.
  return at;
}

/** Returns the rank table of a tiktoken rank file (`<base64 token> <rank>` per line); throws a TokenizerError naming the file and line of the first bad line. */
export function parseRankFile(text: string, file: string, owner: string = file): RankTable {
  const list = new TokenList();
  const lineOf: number[] = [];
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i]!.endsWith('\r') ? lines[i]!.slice(0, -1) : lines[i]!;
    if (line.length === 0) {
      // Only a final newline may leave an empty line; one inside the file means a damaged file.
      if (i === lines.length - 1) continue;
      throw new TokenizerError('load', file, 'empty line in a rank file', { line: i + 1 });
    }
    const parts = line.split(' ');
    if (parts.length !== 2) {
      throw new TokenizerError('load', file, `expected "<base64 token> <rank>", got ${quote(line)}`, { line: i + 1 });
    }
    const [token, rank] = parts as [string, string];
    if (token.length === 0 || !BASE64.test(token)) {
      throw new TokenizerError('load', file, `token ${quote(token)} is not base64`, { line: i + 1 });
    }
    if (!RANK.test(rank) || !Number.isSafeInteger(Number(rank))) {
      throw new TokenizerError('load', file, `rank ${quote(rank)} is not a non-negative integer`, { line: i + 1 });
    }
    list.reserve(token.length);
    const end = decodeBase64(token, 0, token.length, list.arena, list.used);
    if (end < 0) throw new TokenizerError('load', file, `token ${quote(token)} is not base64`, { line: i + 1 });
    list.close(end, Number(rank));
    lineOf.push(i + 1);
  }
  const table = RankTable.build(owner, list.arena, list.offsets, list.ranks, list.count, (t) => {
    const raw = lines[lineOf[t]! - 1]!.split(' ')[0]!;
    throw new TokenizerError('load', file, `token ${quote(raw)} is listed twice`, { line: lineOf[t]! });
  });
  requireEveryByte(table, file);
  return table;
}

const BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;
const RANK = /^(?:0|[1-9][0-9]*)$/;

/**
 * Returns the rank table of a js-tiktoken builtin, built by the token kernel (tokens.c
 * fillBuiltinRanks), or by parseBuiltinRanks where WebAssembly is missing. The kernel builds the
 * same bytes (test/measure/tokens-ranks.test.ts compares them for every builtin) in about half
 * the time: o200k_base on a fresh thread, five processes of each, one build each, shared 2-core
 * machine: 40-60 ms parsed here (the interpreter's and the optimiser's time more than the
 * work's), 24-28 ms built by the kernel, its copy out to shared memory included. The main
 * thread of every run that counts a token pays it before the first count, and the workers wait
 * for it.
 */
export function buildBuiltinRanks(bpeRanks: string, name: string, owner: string = `builtin:${name}`): RankTable {
  if (kernelUnavailable() !== null) return parseBuiltinRanks(bpeRanks, name, owner);
  const built = tokenKernel(unitClasses).buildRanks(bpeRanks, (count, arenaBytes) => rankTableLayout(owner, count, arenaBytes));
  if ('damaged' in built) throw new TokenizerError('load', name, 'builtin rank table is damaged');
  if ('duplicate' in built) throw new TokenizerError('load', name, 'builtin rank table is damaged (a token is listed twice)');
  const table = RankTable.attach(built.table, owner)!;
  requireEveryByte(table, name);
  return table;
}

/** Returns the rank table of a js-tiktoken builtin (`bpe_ranks`: lines of `<tag> <first rank> <base64 token>...`), parsed here. */
export function parseBuiltinRanks(bpeRanks: string, name: string, owner: string = `builtin:${name}`): RankTable {
  const list = new TokenList();
  const n = bpeRanks.length;
  let p = 0;
  while (p < n) {
    let lineEnd = bpeRanks.indexOf('\n', p);
    if (lineEnd < 0) lineEnd = n;
    if (lineEnd > p) {
      // `<tag> <first rank>` then tokens, one space apart.
      const tagEnd = bpeRanks.indexOf(' ', p);
      const rankEnd = tagEnd < 0 || tagEnd >= lineEnd ? -1 : bpeRanks.indexOf(' ', tagEnd + 1);
      const first = Number.parseInt(bpeRanks.slice(tagEnd + 1, rankEnd < 0 || rankEnd > lineEnd ? lineEnd : rankEnd), 10);
      if (tagEnd < 0 || tagEnd >= lineEnd || !Number.isSafeInteger(first)) throw new TokenizerError('load', name, 'builtin rank table is damaged');
      let rank = first;
      let q = rankEnd < 0 || rankEnd > lineEnd ? lineEnd : rankEnd + 1;
      while (q < lineEnd) {
        let tokenEnd = bpeRanks.indexOf(' ', q);
        if (tokenEnd < 0 || tokenEnd > lineEnd) tokenEnd = lineEnd;
        list.reserve(tokenEnd - q);
        const end = decodeBase64(bpeRanks, q, tokenEnd, list.arena, list.used);
        if (end < 0) throw new TokenizerError('load', name, 'builtin rank table is damaged (bad base64)');
        list.close(end, rank++);
        q = tokenEnd + 1;
      }
    }
    p = lineEnd + 1;
  }
  const table = RankTable.build(owner, list.arena, list.offsets, list.ranks, list.count, () => {
    throw new TokenizerError('load', name, 'builtin rank table is damaged (a token is listed twice)');
  });
  requireEveryByte(table, name);
  return table;
}

/**
 * Byte-level BPE can encode any text only if every single byte is a token. js-tiktoken
 * silently drops (or emits `undefined` for) bytes a table lacks, so such a table would
 * give counts that mean nothing: refuse it.
 */
function requireEveryByte(table: RankTable, file: string): void {
  const missing = table.missingBytes();
  if (missing.length > 0) {
    const shown = missing.slice(0, 5).join(', ') + (missing.length > 5 ? ', ...' : '');
    throw new TokenizerError(
      'load',
      file,
      `rank table lacks ${missing.length} of the 256 single-byte tokens (${shown}); a byte-level vocabulary needs them all (truncated file?)`,
    );
  }
}

function quote(s: string): string {
  return JSON.stringify(s.length > 60 ? `${s.slice(0, 60)}...` : s);
}
