// What the read stage hands on: shards found, documents split out of them, and an
// account of every input line so that nothing is lost without a count.
import type { Readable } from 'node:stream';

export type ShardFormat = 'jsonl' | 'txt';
export type Compression = 'none' | 'gzip' | 'zstd';

/** Why a line was not turned into a document. */
export type RejectReason =
  | 'invalid-json'        // JSONL line that does not parse
  | 'not-an-object'       // JSONL line that parses to something other than an object
  | 'missing-text'        // no value at the text field's dot path
  | 'non-string-text'     // a value, but not a string
  | 'invalid-encoding'    // bytes that are not valid in the shard's declared encoding
  | 'binary'              // NUL bytes: binary content, not text
  | 'line-too-long';      // longer than corpus.maxLineBytes; skipped without buffering

/** A shard found by discovery, ready to be read. */
export interface ShardRef {
  /** Path relative to the policy root, with forward slashes. Reports use it. */
  path: string;
  absPath: string;
  format: ShardFormat;
  compression: Compression;
  /** Encoding the shard's bytes are decoded with (`utf-8` unless the policy declares another). */
  encoding: string;
  /** Subset name taken from the path by corpus.subset, if it matches. */
  subset?: string;
  /** Size on disk (compressed), bytes. */
  sizeBytes: number;
  /** About how many bytes it decompresses to (see textSizeHint), when known: orders and shares out work, never a figure. */
  textBytesHint?: number;
  /** Opens the raw (still compressed) bytes; defaults to the file at absPath. Lets other sources (a git blob) be read the same way. */
  open?: () => Readable;
  /** Where the object of a Git LFS pointer is looked up (`<git dir>/lfs/objects`) when the bytes turn out to be one: set for shards read from git objects, such as a base commit's. */
  lfsObjects?: string;
}

/** Why a path matched by the globs is not read. */
export type SkipReason =
  | 'link-outside-root'   // a symlink (file or directory) whose real path is outside the real root
  | 'unsupported-format'  // an extension that is not .jsonl/.ndjson/.txt (+ .gz/.zst/.zstd)
  | 'not-a-file'          // a FIFO, socket, device, or a directory named like a shard
  | 'unreadable'          // a broken link, or a directory that cannot be listed
  | 'same-file'           // the same file (device + inode) already read under another path
  | 'link-loop';          // a directory link back to a directory the walk is already inside

/** A file matched by the globs but not read, with the reason. */
export interface SkippedFile {
  path: string;
  reason: SkipReason;
  detail: string;
}

export interface Discovery {
  shards: ShardRef[];
  skipped: SkippedFile[];
}

/** One document split out of a shard. */
export interface RawDocument {
  /** 1-based line where the document starts. */
  line: number;
  /** 1-based line where it ends (same as line for JSONL). */
  lineEnd: number;
  text: string;
  /** Value of the declared-language field, when the policy names one and the record has a string there. */
  declaredLanguage?: string;
}

export interface Rejection {
  line: number;
  reason: RejectReason;
  detail: string;
}

/** Every line of a shard, accounted for: docLines + empty + rejected.count === lines. */
export interface ReadAccount {
  /** Physical lines read (after decompression); a final line without a newline counts. */
  lines: number;
  /** Documents handed on. */
  docs: number;
  /** Lines that are part of a document (JSONL: equals docs; text: the paragraphs' lines). */
  docLines: number;
  /** Blank lines (only whitespace). */
  empty: number;
  rejected: {
    count: number;
    byReason: Partial<Record<RejectReason, number>>;
    /** The first few rejections, with line numbers, for the report. */
    samples: Rejection[];
  };
  /** Bytes after decompression (what the text costs), and on disk. */
  bytes: number;
  compressedBytes: number;
  /** Set when the shard could not be read to its end (corrupt or truncated compression, I/O error): what was read before the break still counts; an unfinished line at the break is not a line (the message gives its bytes). */
  broken?: { afterLine: number; message: string };
}

export interface ReadOptions {
  /** Dot path of the text field (JSONL). */
  textField: string;
  /** Dot path of the declared-language field (JSONL), if any. */
  declaredLanguageField?: string;
  /** Longest line kept, in bytes after decompression (a trailing "\r" counts); a longer line is skipped unread as `line-too-long`. Plain-text paragraphs are also cut into documents of at most this many bytes. */
  maxLineBytes: number;
  /** How many rejections to keep as samples. */
  maxSamples: number;
}
