// Dictionary fertility: each entry of a word list tokenized once, so rare words weigh as
// much as frequent ones (running-text fertility weighs them by use). Both are reported.

import { readFile } from 'node:fs/promises';
import type { TokenCounter } from './types.js';

export interface DictionaryFertility {
  /** Entries tokenized (blank entries are skipped). */
  entries: number;
  tokens: number;
  /** tokens / entries, or 0 without entries. */
  fertility: number;
  /** Share of entries of two or more tokens, or 0 without entries. */
  continued: number;
}

/** A word list that cannot be read, naming the file and, where it applies, the line. */
export class WordListError extends Error {
  override readonly name = 'WordListError';
  constructor(
    readonly file: string,
    message: string,
    readonly line?: number,
    options?: { cause?: unknown },
  ) {
    super(`${line === undefined ? file : `${file}:${line}`}: ${message}`, options);
  }
}

/**
 * Returns the dictionary fertility of a word list. Each entry is tokenized with a leading
 * space, as a word occurs mid-sentence, matching how running-text fertility counts words;
 * byte-level BPE would otherwise score the rarer start-of-text form.
 */
export function dictionaryFertility(counter: TokenCounter, words: readonly string[]): DictionaryFertility {
  let entries = 0;
  let tokens = 0;
  let continued = 0;
  for (const word of words) {
    const w = word.trim();
    if (w.length === 0) continue;
    const n = counter.countPiece(' ' + w);
    entries++;
    tokens += n;
    if (n >= 2) continued++;
  }
  return {
    entries,
    tokens,
    fertility: entries === 0 ? 0 : tokens / entries,
    continued: entries === 0 ? 0 : continued / entries,
  };
}

/**
 * Returns the words of a word list file: a plain list (one word a line) or a hunspell
 * .dic (a first line with the entry count, then `word/FLAGS` entries, optionally followed
 * by tab- or space-separated morphological fields). Throws a WordListError naming the file.
 */
export async function readWordList(file: string): Promise<string[]> {
  let bytes: Buffer;
  try {
    bytes = await readFile(file);
  } catch (cause) {
    const code = (cause as NodeJS.ErrnoException).code;
    throw new WordListError(file, code === 'ENOENT' ? 'no such file' : (cause as Error).message, undefined, { cause });
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch (cause) {
    throw new WordListError(file, 'not valid UTF-8 (sluice reads word lists in UTF-8)', undefined, { cause });
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  const lines = text.split(/\r?\n/);
  const hunspell = /^\s*\d+\s*$/.test(lines[0] ?? '');
  const words: string[] = [];
  for (let i = hunspell ? 1 : 0; i < lines.length; i++) {
    const line = lines[i]!.trim();
    if (line.length === 0) continue;
    const word = hunspell ? hunspellWord(line) : line;
    if (word.length > 0) words.push(word);
  }
  if (hunspell) {
    const declared = Number(lines[0]!.trim());
    // The count is a size hint in hunspell, often stale by a few entries; far off means a wrong file.
    if (words.length === 0 && declared > 0) throw new WordListError(file, `declares ${declared} entries but has none`, 1);
  }
  return words;
}

/** The word of a hunspell .dic entry: up to the first unescaped `/` (flags) or whitespace (morphology). */
function hunspellWord(line: string): string {
  let word = '';
  for (let i = 0; i < line.length; i++) {
    const c = line[i]!;
    if (c === '\\' && line[i + 1] === '/') {
      word += '/';
      i++;
      continue;
    }
    if (c === '/' || c === '\t' || c === ' ') break;
    word += c;
  }
  return word;
}
