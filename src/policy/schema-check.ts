// Structural validation against schemas/policy.schema.json (the same file editors
// use for completion), with ajv's errors turned into problems that name the key
// path and suggest the nearest valid key.
import type { ErrorObject, AnySchemaObject, ValidateFunction } from 'ajv/dist/2020.js';
import schema from '../../schemas/policy.schema.json' with { type: 'json' };
import { validate as precompiled } from './policy-validator.generated.js';
import type { KeyPath } from './format.js';
import { didYouMean, nearest } from './suggest.js';

/** A structural problem before it is given a position: the path, which part of it to point at, and the text. */
export interface SchemaIssue {
  path: KeyPath;
  /** Point at the key itself (unknown keys) or at its value. */
  part: 'key' | 'value';
  message: string;
  suggestion?: string;
}

/** Lists longer than this are not spelled out in "expected one of" messages. */
const MAX_LISTED_KEYS = 12;

/** The policy schema, for tests and tools that need it. */
export const POLICY_SCHEMA = schema as AnySchemaObject;

/**
 * The schema's validator, generated ahead of time by scripts/gen-policy-validator.mjs with ajv
 * (Ajv2020; allErrors: every problem, not only the first; verbose: errors carry their schema, for
 * suggestions; strict; allowUnionTypes). Compiling it at start-up took about a ninth of a warm-cache
 * check (one CPU profile), in every process and worker; test/policy/schema.test.ts checks the file is
 * what the schema gives now.
 */
function policyValidator(): ValidateFunction {
  return precompiled as unknown as ValidateFunction;
}

/** Returns the structural problems of a policy value; an empty list when it matches the schema. */
export function checkAgainstSchema(value: unknown): SchemaIssue[] {
  const validate = policyValidator();
  if (validate(value)) return [];
  const issues: SchemaIssue[] = [];
  const seen = new Set<string>();
  // A value of the wrong type fails its other checks too (`"1"` is neither an integer nor 1): say only the type.
  const wrongType = new Set((validate.errors ?? []).filter((e) => e.keyword === 'type').map((e) => e.instancePath));
  for (const e of validate.errors ?? []) {
    if (e.keyword !== 'type' && wrongType.has(e.instancePath)) continue;
    const issue = issueOf(e, value);
    const id = `${issue.path.join('\u0000')}\u0001${issue.message}`;
    if (seen.has(id)) continue;
    seen.add(id);
    issues.push(issue);
  }
  return issues;
}

/** Returns the key path a JSON pointer names. Array positions become numbers. */
function pointerPath(pointer: string, data: unknown): (string | number)[] {
  if (pointer === '') return [];
  const out: (string | number)[] = [];
  let node = data;
  for (const raw of pointer.slice(1).split('/')) {
    const seg = raw.replace(/~1/g, '/').replace(/~0/g, '~');
    if (Array.isArray(node)) {
      const i = Number(seg);
      out.push(i);
      node = node[i];
    } else {
      out.push(seg);
      node = node && typeof node === 'object' ? (node as Record<string, unknown>)[seg] : undefined;
    }
  }
  return out;
}

/** Returns what a value is, in the words the messages use. */
export function kindOf(value: unknown): string {
  if (value === null || value === undefined) return 'nothing';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'a mapping';
  if (typeof value === 'string') return `the text \`${value}\``;
  if (typeof value === 'number') return `the number ${value}`;
  if (typeof value === 'boolean') return `\`${value}\``;
  return typeof value;
}

const TYPE_WORDS: Record<string, string> = {
  object: 'a mapping',
  array: 'a list',
  string: 'a string',
  number: 'a number',
  integer: 'a whole number',
  boolean: '`true` or `false`',
  null: 'empty',
};

/** Returns the property names a schema object declares. */
function propertyNames(s: unknown): string[] {
  const props = (s as AnySchemaObject | undefined)?.properties;
  return props && typeof props === 'object' ? Object.keys(props) : [];
}

/** Every key path the schema declares, for "this key belongs elsewhere" hints. */
let keyIndex: Map<string, string[]> | undefined;

/** Returns, for each key name in the schema, the paths of the mappings that declare it. */
function schemaKeyIndex(): Map<string, string[]> {
  if (keyIndex) return keyIndex;
  keyIndex = new Map();
  const defs = (POLICY_SCHEMA.$defs ?? {}) as Record<string, AnySchemaObject>;
  const visit = (s: AnySchemaObject | undefined, at: string, depth: number): void => {
    if (!s || depth > 8) return;
    if (typeof s.$ref === 'string' && s.$ref.startsWith('#/$defs/')) visit(defs[s.$ref.slice(8)], at, depth + 1);
    for (const [k, sub] of Object.entries((s.properties ?? {}) as Record<string, AnySchemaObject>)) {
      const list = keyIndex!.get(k) ?? [];
      list.push(at);
      keyIndex!.set(k, list);
      visit(sub, at ? `${at}.${k}` : k, depth + 1);
    }
  };
  visit(POLICY_SCHEMA, '', 0);
  return keyIndex;
}

/** Returns a problem for one ajv error. */
function issueOf(e: ErrorObject, root: unknown): SchemaIssue {
  const path = pointerPath(e.instancePath, root);
  const p = e.params as Record<string, unknown>;
  const data = e.data;
  switch (e.keyword) {
    case 'additionalProperties': {
      const key = String(p.additionalProperty);
      const valid = propertyNames(e.parentSchema);
      const near = nearest(key, valid);
      let message = `unknown key \`${key}\``;
      let suggestion: string | undefined;
      if (near) {
        suggestion = didYouMean(near);
      } else {
        const elsewhere = schemaKeyIndex().get(key);
        if (elsewhere?.length === 1) {
          suggestion = `\`${key}\` belongs under \`${elsewhere[0] || 'the top level'}\``;
        } else if (valid.length > 0 && valid.length <= MAX_LISTED_KEYS) {
          message += `; expected one of ${valid.map((k) => `\`${k}\``).join(', ')}`;
        }
      }
      return { path: [...path, key], part: 'key', message, ...(suggestion ? { suggestion } : {}) };
    }
    case 'required': {
      const key = String(p.missingProperty);
      return { path: [...path, key], part: 'key', message: `missing required key \`${key}\`` };
    }
    case 'dependentRequired': {
      return {
        path: [...path, String(p.property)],
        part: 'key',
        message: `\`${String(p.property)}\` is only used together with \`${String(p.missingProperty)}\`; set \`${String(p.missingProperty)}\` too or remove it`,
      };
    }
    case 'false schema': {
      // Our schema uses `false` only in dependentSchemas: "with A, B must not be set".
      const m = /\/dependentSchemas\/([^/]+)\//.exec(e.schemaPath);
      const with_ = m ? m[1]!.replace(/~1/g, '/').replace(/~0/g, '~') : undefined;
      const key = String(path[path.length - 1]);
      return {
        path,
        part: 'key',
        message: with_ ? `set either \`${with_}\` or \`${key}\`, not both` : `\`${key}\` is not allowed here`,
      };
    }
    case 'type': {
      const want = ([] as string[]).concat(p.type as string | string[]).map((t) => TYPE_WORDS[t] ?? t);
      let suggestion: string | undefined;
      const numeric = want.includes(TYPE_WORDS.number!) || want.includes(TYPE_WORDS.integer!);
      if (typeof data === 'string' && /^\s*\d+(\.\d+)?\s*%\s*$/.test(data) && numeric) {
        suggestion = `write shares as fractions: \`${Number.parseFloat(data) / 100}\``;
      } else if (typeof data === 'string' && numeric && data.trim() !== '' && Number.isFinite(Number(data))) {
        suggestion = `write it without quotes: \`${data.trim()}\``;
      } else if (path.length === 2 && path[0] === 'languages' && typeof data === 'number') {
        suggestion = `write \`${String(path[1])}: { target: ${data} }\``;
      } else if (typeof data === 'string' && want.includes('a list') && want.length === 1) {
        suggestion = `write a list: \`[${data}]\``;
      }
      return { path, part: 'value', message: `must be ${want.join(' or ')}, not ${kindOf(data)}`, ...(suggestion ? { suggestion } : {}) };
    }
    case 'enum': {
      const allowed = (p.allowedValues as unknown[]).map(String);
      const near = typeof data === 'string' ? nearest(data, allowed) : undefined;
      return {
        path,
        part: 'value',
        message: `must be one of ${allowed.map((v) => `\`${v}\``).join(', ')}, not ${kindOf(data)}`,
        ...(near ? { suggestion: didYouMean(near) } : {}),
      };
    }
    case 'const': {
      return { path, part: 'value', message: `must be ${JSON.stringify(p.allowedValue)}, not ${kindOf(data)}` };
    }
    case 'minimum':
    case 'maximum':
    case 'exclusiveMinimum':
    case 'exclusiveMaximum': {
      const cmp = String(p.comparison).replace('>=', '≥').replace('<=', '≤');
      let suggestion: string | undefined;
      if (e.keyword === 'maximum' && p.limit === 1 && typeof data === 'number' && data > 1 && data <= 100) {
        suggestion = `shares are fractions of 1: ${data} % is \`${data / 100}\``;
      }
      return { path, part: 'value', message: `must be ${cmp} ${String(p.limit)}, not ${String(data)}`, ...(suggestion ? { suggestion } : {}) };
    }
    case 'minProperties': {
      const names = propertyNames(e.parentSchema);
      const dependent = new Set(Object.keys(((e.parentSchema as AnySchemaObject | undefined)?.dependentRequired ?? {}) as object));
      const primary = names.filter((k) => !dependent.has(k));
      const what = primary.length > 0 && primary.length <= MAX_LISTED_KEYS ? `; set ${primary.map((k) => `\`${k}\``).join(' or ')}` : '';
      return { path, part: 'value', message: `must not be empty${what}` };
    }
    case 'minItems':
      return { path, part: 'value', message: 'must not be an empty list' };
    case 'minLength':
      return { path, part: 'value', message: 'must not be empty' };
    case 'uniqueItems':
      const item = Array.isArray(data) ? data[Number(p.j)] : undefined;
      return { path, part: 'value', message: `lists ${item === undefined ? 'an entry' : `\`${String(item)}\``} twice; each may appear once` };
    default:
      return { path, part: 'value', message: e.message ?? `fails the \`${e.keyword}\` check` };
  }
}
