// What a shard's path says about how to read it: format and compression from the
// extension, encoding from the policy's overrides, subset from the subset pattern.
// Kept apart from discovery so that a shard taken from elsewhere (a git blob of the
// base branch) is classified by exactly the same rules.
import iconv from 'iconv-lite';
import { isLineSplittableEncoding } from '../policy/encodings.js';
import picomatch from 'picomatch';
import type { CorpusSpec } from '../policy/types.js';
import type { Compression, ShardFormat } from './types.js';

/** Encoding used when no override matches: what the corpus contract assumes. */
export const DEFAULT_ENCODING = 'utf-8';

/** The `{subset}` placeholder in corpus.subset. */
const SUBSET_PLACEHOLDER = '{subset}';

/** Stands in for the placeholder while picomatch compiles the pattern; capital letters only, so it passes through to the regex source unchanged. */
const SUBSET_SENTINEL = 'SLUICESUBSETSENTINEL';

const FORMAT_BY_EXTENSION: Record<string, ShardFormat> = { jsonl: 'jsonl', ndjson: 'jsonl', txt: 'txt' };
const COMPRESSION_BY_EXTENSION: Record<string, Compression> = { gz: 'gzip', zst: 'zstd', zstd: 'zstd' };

/** How a path is read, when its extension is one sluice reads. */
export interface ShardKind {
  format: ShardFormat;
  compression: Compression;
}

/** What the path rules say about one shard path. */
export type PathClass =
  | ({ supported: true; encoding: string; subset?: string } & ShardKind)
  | { supported: false; detail: string };

/** Returns the format and compression an extension names (case-insensitive), or null with the extension when sluice does not read it. */
export function shardKindOf(filePath: string): ShardKind | { unsupported: string } {
  const name = filePath.slice(filePath.lastIndexOf('/') + 1).toLowerCase();
  const parts = name.split('.');
  const last = parts.length > 1 ? parts[parts.length - 1]! : '';
  const compression = COMPRESSION_BY_EXTENSION[last];
  if (compression !== undefined) {
    const inner = parts.length > 2 ? parts[parts.length - 2]! : '';
    const format = FORMAT_BY_EXTENSION[inner];
    return format !== undefined ? { format, compression } : { unsupported: inner === '' ? `.${last}` : `.${inner}.${last}` };
  }
  const format = FORMAT_BY_EXTENSION[last];
  return format !== undefined ? { format, compression: 'none' } : { unsupported: last === '' ? '' : `.${last}` };
}


/** Returns a function that extracts the subset segment from a path, or undefined when the path does not match; throws when the pattern has not exactly one `{subset}`. */
export function subsetExtractor(pattern: string): (filePath: string) => string | undefined {
  const count = pattern.split(SUBSET_PLACEHOLDER).length - 1;
  if (count !== 1) {
    throw new Error(`corpus.subset: pattern \`${pattern}\` must contain \`${SUBSET_PLACEHOLDER}\` exactly once (found ${count})`);
  }
  const source = picomatch.makeRe(pattern.replace(SUBSET_PLACEHOLDER, SUBSET_SENTINEL), { dot: true }).source;
  if (source.split(SUBSET_SENTINEL).length !== 2) {
    throw new Error(`corpus.subset: pattern \`${pattern}\` could not be compiled around \`${SUBSET_PLACEHOLDER}\``);
  }
  // A named group: brace alternatives in the rest of the pattern add numbered groups of their own.
  // Wildcards before the placeholder are lazy, so when several segments could be the subset the leftmost wins.
  const re = new RegExp(source.replace(SUBSET_SENTINEL, '(?<subset>[^/]+)'));
  return (filePath) => re.exec(filePath)?.groups?.['subset'];
}

/** Returns the classifier of shard paths for a corpus; throws when an encoding override names an encoding that cannot be read. */
export function pathClassifier(corpus: CorpusSpec): (filePath: string) => PathClass {
  const overrides = corpus.encodings.map(({ glob, encoding }) => {
    if (!iconv.encodingExists(encoding)) {
      throw new Error(`corpus.encodings: glob \`${glob}\` names encoding \`${encoding}\`, which iconv-lite does not know`);
    }
    if (!isLineSplittableEncoding(encoding)) {
      throw new Error(
        `corpus.encodings: glob \`${glob}\` names encoding \`${encoding}\`, which does not keep ASCII bytes as they are; ` +
          'sluice splits lines at byte 0x0A, so convert such shards to UTF-8',
      );
    }
    return { match: picomatch(glob, { dot: true }), encoding };
  });
  const subsetOf = corpus.subset !== undefined ? subsetExtractor(corpus.subset) : undefined;

  return (filePath) => {
    const kind = shardKindOf(filePath);
    if ('unsupported' in kind) {
      const ext = kind.unsupported === '' ? 'no extension' : `extension \`${kind.unsupported}\``;
      return { supported: false, detail: `${ext}; sluice reads .jsonl, .ndjson and .txt, optionally compressed as .gz, .zst or .zstd` };
    }
    const encoding = overrides.find((o) => o.match(filePath))?.encoding ?? DEFAULT_ENCODING;
    const subset = subsetOf?.(filePath);
    return subset !== undefined ? { supported: true, ...kind, encoding, subset } : { supported: true, ...kind, encoding };
  };
}
