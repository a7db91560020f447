// Byte-level BPE rank tables: the mergeable tokens of a tiktoken-style vocabulary and
// their ranks, keyed by the token's bytes as a latin1 string (one char per byte), which
// V8 hashes faster than js-tiktoken's comma-joined byte lists.

import { TokenizerError } from './errors.js';

/** Token bytes (latin1 string) → rank. */
export type RankTable = Map<string, number>;

const BASE64 = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/;
const RANK = /^(?:0|[1-9][0-9]*)$/;

// Per rank table, the rank of every two-byte token (index: first byte << 8 | second;
// Infinity where there is none), for bytePairCount's first round of pairs. Filled while
// parsing: building it afterwards from the Map took 32-38 ms for o200k_base (65,536
// lookups or one pass over the entries), about what it saves on a 10 MB corpus.
const pairTables = new WeakMap<RankTable, Float64Array>();

const newPairTable = (): Float64Array => new Float64Array(1 << 16).fill(Infinity);

/** Records a token's rank in a pair table when the token is two bytes long. */
function notePair(table: Float64Array, bytes: string, rank: number): void {
  if (bytes.length === 2) table[(bytes.charCodeAt(0) << 8) | bytes.charCodeAt(1)] = rank;
}

/** Returns the ranks of the two-byte tokens of a table, indexed by first byte << 8 | second (Infinity for none). */
export function pairRanks(ranks: RankTable): Float64Array {
  let table = pairTables.get(ranks);
  if (table === undefined) {
    // A table not made by the parsers below (tests build Maps by hand).
    table = newPairTable();
    for (const [bytes, rank] of ranks) notePair(table, bytes, rank);
    pairTables.set(ranks, table);
  }
  return table;
}

/** Returns the rank table of a tiktoken rank file (`<base64 token> <rank>` per line); throws a TokenizerError naming the file and line of the first bad line. */
export function parseRankFile(text: string, file: string): RankTable {
  const ranks: RankTable = new Map();
  const pairs = newPairTable();
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
    const bytes = Buffer.from(token, 'base64').toString('latin1');
    if (ranks.has(bytes)) {
      throw new TokenizerError('load', file, `token ${quote(token)} is listed twice`, { line: i + 1 });
    }
    ranks.set(bytes, Number(rank));
    notePair(pairs, bytes, Number(rank));
  }
  requireEveryByte(ranks, file);
  pairTables.set(ranks, pairs);
  return ranks;
}

/** Returns the rank table of a js-tiktoken builtin (`bpe_ranks`: lines of `<tag> <first rank> <base64 token>...`). */
export function parseBuiltinRanks(bpeRanks: string, name: string): RankTable {
  const ranks: RankTable = new Map();
  const pairs = newPairTable();
  for (const line of bpeRanks.split('\n')) {
    if (line.length === 0) continue;
    const parts = line.split(' ');
    const first = Number.parseInt(parts[1] ?? '', 10);
    if (!Number.isSafeInteger(first)) throw new TokenizerError('load', name, 'builtin rank table is damaged');
    // atob gives the latin1 string directly: measured on o200k_base (tsx, 2 runs each, shared
    // machine) 184-229 ms for the whole table against 317-359 ms with Buffer.from(...).toString
    // ('latin1'); splitting the lines and filling the Map alone take 135-165 ms. The builtin
    // data is the package's own, so atob's strict base64 should never reject it.
    try {
      for (let i = 2; i < parts.length; i++) {
        const bytes = atob(parts[i]!);
        ranks.set(bytes, first + i - 2);
        notePair(pairs, bytes, first + i - 2);
      }
    } catch (cause) {
      throw new TokenizerError('load', name, 'builtin rank table is damaged (bad base64)', { cause });
    }
  }
  requireEveryByte(ranks, name);
  pairTables.set(ranks, pairs);
  return ranks;
}

/**
 * Byte-level BPE can encode any text only if every single byte is a token. js-tiktoken
 * silently drops (or emits `undefined` for) bytes a table lacks, so such a table would
 * give counts that mean nothing: refuse it.
 */
function requireEveryByte(ranks: RankTable, file: string): void {
  const missing: string[] = [];
  for (let b = 0; b < 256; b++) {
    if (!ranks.has(String.fromCharCode(b))) missing.push(`0x${b.toString(16).padStart(2, '0')}`);
  }
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
