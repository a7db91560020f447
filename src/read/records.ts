// One JSONL line to a document's text and declared language, or the reason it is not one.
import type { RejectReason } from './types.js';

/** The fields a JSONL record gives, or why it gives none. */
export type RecordResult =
  | { text: string; declaredLanguage: string | undefined }
  | { reason: Extract<RejectReason, 'invalid-json' | 'not-an-object' | 'missing-text' | 'non-string-text'>; detail: string };

/** Longest JSON.parse message kept in a rejection's detail; V8's messages quote the input and can be long. */
const MAX_PARSE_MESSAGE_CHARS = 200;

/** Returns a function that reads the value at a dot path (`meta.body`) of a parsed record, own properties only, or undefined when any step is missing. */
export function dotPathReader(dotPath: string): (record: object) => unknown {
  const keys = dotPath.split('.');
  if (keys.length === 1) {
    const key = keys[0]!;
    return (record) => (Object.hasOwn(record, key) ? (record as Record<string, unknown>)[key] : undefined);
  }
  return (record) => {
    let value: unknown = record;
    for (const key of keys) {
      if (value === null || typeof value !== 'object' || !Object.hasOwn(value, key)) return undefined;
      value = (value as Record<string, unknown>)[key];
    }
    return value;
  };
}

/** Returns what a JSON value is, for messages: `an array`, `null`, `a number`. */
export function kindOf(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  const type = typeof value;
  return type === 'object' ? 'an object' : `a ${type}`;
}

/** Returns the parser of JSONL lines for a text field and an optional declared-language field (dot paths). */
export function recordParser(textField: string, declaredLanguageField?: string): (line: string) => RecordResult {
  const textOf = dotPathReader(textField);
  const languageOf = declaredLanguageField !== undefined ? dotPathReader(declaredLanguageField) : undefined;
  return (line) => {
    let record: unknown;
    try {
      record = JSON.parse(line);
    } catch (error) {
      // A BOM inside a shard is where files were joined end to end; JSON.parse's own message
      // would quote the invisible character and leave the reader guessing.
      if (line.charCodeAt(0) === 0xfeff) {
        return { reason: 'invalid-json', detail: 'the line starts with a byte order mark (U+FEFF), as where files were joined end to end; only a shard\'s first line may have one' };
      }
      const message = error instanceof Error ? error.message : String(error);
      return { reason: 'invalid-json', detail: message.length > MAX_PARSE_MESSAGE_CHARS ? `${message.slice(0, MAX_PARSE_MESSAGE_CHARS)}…` : message };
    }
    if (record === null || typeof record !== 'object' || Array.isArray(record)) {
      return { reason: 'not-an-object', detail: `the line parses to ${kindOf(record)}, not an object` };
    }
    const text = textOf(record);
    if (text === undefined) return { reason: 'missing-text', detail: `no value at \`${textField}\`` };
    if (typeof text !== 'string') return { reason: 'non-string-text', detail: `\`${textField}\` is ${kindOf(text)}, not a string` };
    const language = languageOf?.(record);
    return { text, declaredLanguage: typeof language === 'string' ? language : undefined };
  };
}
