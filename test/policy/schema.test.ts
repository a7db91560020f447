// schemas/policy.schema.json is a valid JSON Schema (draft 2020-12) that editors
// can complete from, and it agrees with the typed loader key for key; the
// example policy uses every key and loads.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Ajv2020, type AnySchemaObject } from 'ajv/dist/2020.js';
import { parse as parseYaml } from 'yaml';
import { loadPolicy, formatProblem, parsePolicyText } from '../../src/policy/index.js';
import { buildPolicy } from '../../src/policy/build.js';

const REPO = fileURLToPath(new URL('../../', import.meta.url));
const SCHEMA_FILE = path.join(REPO, 'schemas/policy.schema.json');
const EXAMPLE = path.join(REPO, 'policies/example.yaml');
const ALTERNATIVES = path.join(REPO, 'test/policy/fixtures/alternatives.yaml');
const schema = JSON.parse(readFileSync(SCHEMA_FILE, 'utf8')) as AnySchemaObject;
const defs = schema.$defs as Record<string, AnySchemaObject>;

/** Returns a subschema with a local `$ref` followed (its own keywords win, as siblings of $ref do). */
function deref(s: AnySchemaObject): AnySchemaObject {
  if (typeof s.$ref !== 'string') return s;
  const target = defs[s.$ref.replace('#/$defs/', '')];
  if (!target) throw new Error(`unresolved ${s.$ref}`);
  return { ...deref(target), ...s, $ref: undefined };
}

/** Returns every key path the schema declares; `*` stands for the keys of a map (languages, encodings, per-language limits). */
function schemaPaths(s: AnySchemaObject, at: string[] = [], out = new Set<string>()): Set<string> {
  const d = deref(s);
  for (const [k, sub] of Object.entries((d.properties ?? {}) as Record<string, AnySchemaObject>)) {
    out.add([...at, k].join('.'));
    schemaPaths(sub, [...at, k], out);
  }
  if (d.additionalProperties && typeof d.additionalProperties === 'object') {
    out.add([...at, '*'].join('.'));
    schemaPaths(d.additionalProperties as AnySchemaObject, [...at, '*'], out);
  }
  return out;
}

/** Returns a key path with map keys replaced by `*`, following the schema; undefined when the schema does not have it. */
function normalized(keys: string[]): string | undefined {
  let s: AnySchemaObject | undefined = schema;
  const out: string[] = [];
  for (const k of keys) {
    if (!s) return undefined;
    const d = deref(s);
    const props = (d.properties ?? {}) as Record<string, AnySchemaObject>;
    if (Object.hasOwn(props, k)) {
      out.push(k);
      s = props[k];
    } else if (d.additionalProperties && typeof d.additionalProperties === 'object') {
      out.push('*');
      s = d.additionalProperties as AnySchemaObject;
    } else {
      return undefined;
    }
  }
  return out.join('.');
}

/** Returns a value wrapped so that every key read from any mapping in it is recorded. */
function recording(value: unknown, reads: string[][], at: string[] = []): unknown {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return value;
  return new Proxy(value as Record<string, unknown>, {
    get(target, prop, receiver) {
      const v = Reflect.get(target, prop, receiver);
      if (typeof prop !== 'string') return v;
      reads.push([...at, prop]);
      return recording(v, reads, [...at, prop]);
    },
  });
}

/** Returns the key paths a YAML value holds, map keys normalized by the schema. */
function presentPaths(value: unknown, at: string[] = [], out = new Set<string>()): Set<string> {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return out;
  for (const [k, v] of Object.entries(value)) {
    const n = normalized([...at, k]);
    if (n) out.add(n);
    presentPaths(v, [...at, k], out);
  }
  return out;
}

describe('the policy schema', () => {
  it('is valid JSON Schema 2020-12 and compiles in ajv strict mode', () => {
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    // strict: unknown keywords, ignored keywords and type mistakes are errors, not warnings.
    const ajv = new Ajv2020({ strict: true, allowUnionTypes: true });
    expect(ajv.validateSchema(schema), JSON.stringify(ajv.errors)).toBe(true);
    expect(() => ajv.compile(schema)).not.toThrow();
  });

  it('is checked at run time by a validator generated from the schema as it is now', async () => {
    // The generator's own output, made again here: a schema edit without regenerating fails this test.
    const { generatedValidator } = await import('../../scripts/gen-policy-validator.mjs');
    const file = readFileSync(path.join(path.dirname(fileURLToPath(import.meta.url)), '../../src/policy/policy-validator.generated.ts'), 'utf8');
    expect(file === generatedValidator(), 'run node scripts/gen-policy-validator.mjs').toBe(true);
    // And it reports what ajv compiling the schema at run time reports, error for error.
    const { validate } = (await import('../../src/policy/policy-validator.generated.js')) as unknown as { validate: ((v: unknown) => boolean) & { errors?: unknown } };
    const live = new Ajv2020({ allErrors: true, verbose: true, strict: true, allowUnionTypes: true }).compile(schema);
    const values: unknown[] = [
      parseYaml(readFileSync(path.join(REPO, 'policies/example.yaml'), 'utf8')),
      { version: 1 },
      { version: 2, corpus: { include: 'data/*.jsonl' }, languages: { hin: { target: 2, scripts: ['Devanagari', 7] } }, rules: { mix: { tolerance: -1 } }, extra: true },
      { version: 1, corpus: { include: ['a'] }, languages: {}, sampling: { fraction: 0.5, 'docs-per-shard': 3 }, severity: { mix: 'loud' } },
      'not a mapping',
    ];
    for (const v of values) {
      const a = validate(v);
      const b = live(v);
      expect(a).toBe(b);
      expect(JSON.stringify(validate.errors ?? null)).toBe(JSON.stringify(live.errors ?? null));
    }
  });

  it('describes every property and closes every mapping it lists keys for', () => {
    const undocumented: string[] = [];
    const open: string[] = [];
    const visit = (s: AnySchemaObject, at: string): void => {
      if (s.properties) {
        if (s.additionalProperties !== false) open.push(at || '(top)');
        for (const [k, sub] of Object.entries(s.properties as Record<string, AnySchemaObject>)) {
          const d = deref(sub);
          if (typeof d.description !== 'string' || d.description.length < 10) undocumented.push(`${at}.${k}`);
          visit(sub, `${at}.${k}`);
        }
      }
      if (s.additionalProperties && typeof s.additionalProperties === 'object') visit(s.additionalProperties as AnySchemaObject, `${at}.*`);
      if (typeof s.$ref === 'string') visit(defs[s.$ref.replace('#/$defs/', '')]!, at);
    };
    visit(schema, '');
    expect(undocumented).toEqual([]);
    expect(open).toEqual([]);
  });

  it('gives defaults and enums editors can offer', () => {
    const corpus = (schema.properties as Record<string, AnySchemaObject>).corpus!;
    expect((corpus.properties as Record<string, AnySchemaObject>)['max-line-bytes']!.default).toBe(8 * 1024 * 1024);
    const mix = ((schema.properties as Record<string, AnySchemaObject>).rules!.properties as Record<string, AnySchemaObject>).mix!;
    expect((mix.properties as Record<string, AnySchemaObject>).unit!.enum).toEqual(['docs', 'bytes', 'chars', 'words', 'tokens']);
  });
});

describe('schema defaults are the loader defaults', () => {
  it('every `default` in the schema is what the typed policy holds when the key is left out', () => {
    const r = parsePolicyText(
      `version: 1
corpus: { include: x }
languages: { hin: { target: 0.4 } }
detection: {}
tokenizer: { builtin: o200k_base }
rules: { input: {}, mix: {}, script: {}, encoding: {}, fertility: {}, duplicates: { near: {} }, contamination: { eval: x } }
`,
      'defaults.yaml',
    );
    if (!r.ok) throw new Error(r.problems.map(formatProblem).join('\n'));
    const camel = (k: string): string => k.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
    // Keys whose typed form differs from the YAML form.
    const typedKey: Record<string, string> = { 'max-und': 'maxUndetermined' };
    const checked: string[] = [];
    const visit = (s: AnySchemaObject, at: string[]): void => {
      const d = deref(s);
      for (const [k, sub] of Object.entries((d.properties ?? {}) as Record<string, AnySchemaObject>)) {
        const keyPath = [...at, k];
        const def = deref(sub).default;
        // Severity defaults to `error` by being absent; encodings become a list of overrides.
        if (def !== undefined && keyPath[0] !== 'severity' && k !== 'encodings') {
          let v: unknown = r.policy;
          for (const seg of keyPath) v = (v as Record<string, unknown> | undefined)?.[typedKey[seg] ?? camel(seg)];
          expect(v, keyPath.join('.')).toEqual(def);
          checked.push(keyPath.join('.'));
        }
        visit(sub, keyPath);
      }
    };
    visit(schema, []);
    expect(checked.length).toBeGreaterThan(15);
  });
});

describe('schema and typed loader agree key for key', () => {
  const declared = schemaPaths(schema);
  const reads: string[][] = [];
  for (const file of [EXAMPLE, ALTERNATIVES]) {
    const value = parseYaml(readFileSync(file, 'utf8')) as unknown;
    const sink = { problem: () => undefined, warning: () => undefined };
    buildPolicy(recording(value, reads), { file }, sink);
  }
  const readPaths = new Set<string>();
  const unknownReads: string[] = [];
  for (const r of reads) {
    const n = normalized(r);
    if (n === undefined) unknownReads.push(r.join('.'));
    else readPaths.add(n);
  }

  it('every key the loader reads is in the schema', () => {
    expect(unknownReads).toEqual([]);
    expect(readPaths.size).toBeGreaterThan(40);
  });

  it('every key in the schema is read by the loader (none is accepted and then ignored)', () => {
    // `version` is read by parsePolicyText before building (a newer version stops there); the typed Policy's version is the literal 1.
    expect([...declared].filter((p) => !readPaths.has(p) && p !== 'version')).toEqual([]);
  });

  it('the example policy and its alternatives use every key in the schema', () => {
    const present = new Set<string>();
    for (const file of [EXAMPLE, ALTERNATIVES]) presentPaths(parseYaml(readFileSync(file, 'utf8')), [], present);
    expect([...declared].filter((p) => !present.has(p))).toEqual([]);
  });

  it('the alternatives the example shows only in comments are those in the fixture', () => {
    const text = readFileSync(EXAMPLE, 'utf8');
    for (const line of ['tokenizer: { file: tokenizer/tokenizer.json }', 'format: tiktoken, pattern: cl100k_base', 'sampling: { fraction: 0.02 }']) {
      expect(text).toContain(line);
    }
  });
});

describe('policies/example.yaml', () => {
  it('loads without problems or warnings, with a root of its own folder', async () => {
    const r = await loadPolicy(EXAMPLE, { root: path.dirname(EXAMPLE) });
    if (!r.ok) throw new Error(r.problems.map(formatProblem).join('\n'));
    expect(r.warnings.map(formatProblem)).toEqual([]);
    expect(r.policy.name).toBe('newsroom');
    expect(r.policy.languages.map((l) => l.key)).toEqual(['hin', 'eng', 'urd']);
    expect(r.policy.rules.fertility?.wordLists.eng?.absPath).toBe(path.join(REPO, 'policies/lists/eng.txt'));
  });

  it('starts with the yaml-language-server schema line', () => {
    expect(readFileSync(EXAMPLE, 'utf8').split('\n')[0]).toBe('# yaml-language-server: $schema=../schemas/policy.schema.json');
  });
});
