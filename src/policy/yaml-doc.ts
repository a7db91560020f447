// The policy's YAML as a document with positions: every later check names the
// line and column of the key or value it is about, so the YAML tree is kept
// beside the plain value the checks read.
import {
  LineCounter,
  parseDocument,
  isAlias,
  isMap,
  isPair,
  isScalar,
  isSeq,
  type Document,
  type Node,
  type Pair,
} from 'yaml';
import type { KeyPath } from './format.js';

/** Aliases expanded at most this many times: a policy has no need for more, and it stops "billion laughs" inputs. */
const MAX_ALIAS_COUNT = 100;

/** A 1-based line and column in the policy text. */
export interface Position {
  line: number;
  column: number;
}

/** A YAML problem found while parsing: a syntax error or a duplicate key. */
export interface YamlIssue {
  position: Position;
  path: KeyPath;
  message: string;
}

/** The parsed policy: its plain value and a way back from key paths to positions. */
export interface PolicyDocument {
  /** The document as plain data (maps → objects, sequences → arrays). Undefined when syntax errors make it unreliable. */
  value: unknown;
  /** Syntax errors; when there are any, `value` is undefined. */
  errors: YamlIssue[];
  /** Keys set twice in one mapping. */
  duplicates: YamlIssue[];
  /** Parser warnings (unknown tags and the like) that do not stop the run. */
  warnings: YamlIssue[];
  /** Returns where a key path is written: its key (`key`) or its value (`value`), or the nearest enclosing node that exists. */
  locate(path: KeyPath, part?: 'key' | 'value'): Position;
}

type YamlDoc = Document.Parsed;

/** Returns the policy text parsed as YAML, with positions for key paths. */
export function readPolicyYaml(text: string): PolicyDocument {
  const lineCounter = new LineCounter();
  // A leading byte-order mark is not part of the document.
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const doc = parseDocument(source, { lineCounter, uniqueKeys: false, prettyErrors: false });
  const pos = (offset: number): Position => {
    const { line, col } = lineCounter.linePos(offset);
    return { line, column: col };
  };

  const errors = doc.errors.map((e) => ({
    position: pos(e.pos[0]),
    path: pathAtOffset(doc, e.pos[0]),
    message: plainMessage(e.message),
  }));
  const warnings = doc.warnings.map((e) => ({
    position: pos(e.pos[0]),
    path: pathAtOffset(doc, e.pos[0]),
    message: plainMessage(e.message),
  }));
  const duplicates: YamlIssue[] = [];
  findDuplicates(doc, doc.contents, [], pos, duplicates);

  let value: unknown;
  if (errors.length === 0) {
    try {
      value = doc.toJS({ maxAliasCount: MAX_ALIAS_COUNT });
    } catch (e) {
      errors.push({ position: { line: 1, column: 1 }, path: [], message: (e as Error).message });
    }
  }

  const locate = (path: KeyPath, part: 'key' | 'value' = 'value'): Position => {
    const found = walk(doc, path);
    const node = part === 'key' ? (found.key ?? found.value) : (found.value ?? found.key);
    const offset = node?.range?.[0];
    return offset === undefined ? { line: 1, column: 1 } : pos(offset);
  };

  return { value, errors, duplicates, warnings, locate };
}

/** Returns a parser message without the position suffix and source excerpt the library appends (we report positions ourselves). */
function plainMessage(message: string): string {
  return message.replace(/ at line \d+, column \d+:?[\s\S]*$/, '').trim();
}

/** Returns the scalar text of a mapping key, or undefined for complex keys. */
function keyText(pair: Pair): string | undefined {
  const k = pair.key;
  if (isScalar(k)) return String(k.value);
  return undefined;
}

/** Returns the node an alias points to, or the node itself. */
function resolved(doc: YamlDoc, node: unknown): unknown {
  return isAlias(node) ? node.resolve(doc) : node;
}

/** Returns the key and value nodes at a path, stopping at the deepest one that exists. */
function walk(doc: YamlDoc, path: KeyPath): { key?: Node; value?: Node } {
  let value = resolved(doc, doc.contents) as Node | null | undefined;
  let key: Node | undefined;
  for (const seg of path) {
    if (isMap(value)) {
      const pair = value.items.find((p) => keyText(p) === String(seg));
      if (!pair) break;
      key = (pair.key as Node | null) ?? undefined;
      const next = resolved(doc, pair.value) as Node | null;
      // A key without a value (`include:`): point at the key.
      value = next && next.range && !(isScalar(next) && next.value === null && next.range[0] === next.range[1]) ? next : undefined;
      if (!value) break;
    } else if (isSeq(value) && typeof seg === 'number') {
      const item = resolved(doc, value.items[seg]) as Node | undefined;
      if (!item) break;
      key = undefined;
      value = item;
    } else {
      break;
    }
  }
  return { key, value: value ?? undefined };
}

/** Returns the key path of the innermost mapping entry or list item that contains an offset (for syntax errors). */
function pathAtOffset(doc: YamlDoc, offset: number): KeyPath {
  const path: (string | number)[] = [];
  let node: unknown = doc.contents;
  for (;;) {
    if (isMap(node)) {
      const pair = node.items.find((p) => {
        const start = (p.key as Node | null)?.range?.[0];
        const end = (p.value as Node | null)?.range?.[2] ?? (p.key as Node | null)?.range?.[2];
        return start !== undefined && end !== undefined && start <= offset && offset <= end;
      });
      const k = pair && keyText(pair);
      if (!pair || k === undefined) return path;
      path.push(k);
      node = pair.value;
    } else if (isSeq(node)) {
      const i = node.items.findIndex((it) => {
        const r = (it as Node | null)?.range;
        return r != null && r[0] <= offset && offset <= r[2];
      });
      if (i < 0) return path;
      path.push(i);
      node = node.items[i];
    } else {
      return path;
    }
  }
}

/** Collects keys that appear twice in the same mapping, anywhere in the document. */
function findDuplicates(
  doc: YamlDoc,
  node: unknown,
  path: (string | number)[],
  pos: (offset: number) => Position,
  out: YamlIssue[],
): void {
  if (isMap(node)) {
    const seen = new Map<string, Position>();
    for (const pair of node.items) {
      if (!isPair(pair)) continue;
      const k = keyText(pair);
      const start = (pair.key as Node | null)?.range?.[0];
      if (k !== undefined && start !== undefined) {
        const first = seen.get(k);
        if (first) {
          out.push({
            position: pos(start),
            path: [...path, k],
            message: `duplicate key \`${k}\` (first set on line ${first.line}); a key may appear once per mapping`,
          });
        } else {
          seen.set(k, pos(start));
        }
      }
      findDuplicates(doc, pair.value, k === undefined ? path : [...path, k], pos, out);
    }
  } else if (isSeq(node)) {
    node.items.forEach((item, i) => findDuplicates(doc, item, [...path, i], pos, out));
  }
}
