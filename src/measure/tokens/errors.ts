// One error type for everything that can go wrong with a tokenizer, so callers can
// tell "this policy names a tokenizer we cannot use" (stage `load`, stops the run)
// from "this text could not be encoded" (stage `count`, the caller marks the shard broken).

/** Where a tokenizer failed: while loading its file, or while encoding a text. */
export type TokenizerErrorStage = 'load' | 'count';

/** A tokenizer that cannot be loaded, or a text it cannot encode; the message starts with the file (and line). */
export class TokenizerError extends Error {
  override readonly name = 'TokenizerError';
  readonly stage: TokenizerErrorStage;
  /** The tokenizer file (as given), or the builtin name. */
  readonly file: string;
  /** 1-based line of a rank file, when the problem is on one line. */
  readonly line?: number;

  constructor(
    stage: TokenizerErrorStage,
    file: string,
    message: string,
    options: { line?: number; cause?: unknown } = {},
  ) {
    const where = options.line === undefined ? file : `${file}:${options.line}`;
    super(`${where}: ${message}`, options.cause === undefined ? undefined : { cause: options.cause });
    this.stage = stage;
    this.file = file;
    if (options.line !== undefined) this.line = options.line;
  }
}
