// Script names as a policy writes them (`Devanagari`, `Deva`, `devanagari`,
// `Old Italic`, `Hant`) turned into Unicode Script property long names.
import { SCRIPT_ALIASES } from './script-names.generated.js';
import { SCRIPT_CODE_VARIANTS } from './data/default-scripts.js';
import { nearest } from './suggest.js';

/** Script values that belong to no language (digits, punctuation, combining marks, unassigned). */
const NO_LANGUAGE = new Set(['Common', 'Inherited', 'Unknown']);

/** Returns the form names are compared in: lower case, spaces and hyphens as underscores. */
function fold(name: string): string {
  return name.trim().toLowerCase().replace(/[\s-]+/g, '_');
}

let index: Map<string, readonly string[]> | undefined;

/** Returns folded name or code → long names; built once from the generated alias table and the ISO 15924 variants. */
function scriptIndex(): Map<string, readonly string[]> {
  if (index) return index;
  index = new Map();
  for (const [alias, long] of Object.entries(SCRIPT_ALIASES)) index.set(fold(alias), [long]);
  for (const [code, longs] of Object.entries(SCRIPT_CODE_VARIANTS)) {
    if (!index.has(fold(code))) index.set(fold(code), longs);
  }
  return index;
}

/** Outcome of reading one script name. */
export type ScriptLookup =
  | { ok: true; scripts: readonly string[] }
  | { ok: false; message: string; suggestion?: string };

/** Returns the Unicode long names a written script name or ISO 15924 code stands for, or why it is not one. */
export function lookUpScript(written: string): ScriptLookup {
  const found = scriptIndex().get(fold(written));
  if (found) {
    const [first] = found;
    if (found.length === 1 && first !== undefined && NO_LANGUAGE.has(first)) {
      return {
        ok: false,
        message: `\`${written}\` (${first}) is shared by all languages (digits, punctuation, marks) and cannot be a language's own script`,
      };
    }
    return { ok: true, scripts: found };
  }
  const longNames = new Set(Object.values(SCRIPT_ALIASES).filter((n) => !NO_LANGUAGE.has(n)));
  const candidates = [...longNames, ...Object.keys(SCRIPT_ALIASES).filter((k) => k.length === 4)];
  const near = nearest(written, candidates);
  const suggestion = near === undefined ? undefined : (SCRIPT_ALIASES[near] ?? near);
  return {
    ok: false,
    message: `unknown script \`${written}\`; write a Unicode Script name (\`Devanagari\`) or an ISO 15924 code (\`Deva\`)`,
    ...(suggestion ? { suggestion: `did you mean \`${suggestion}\`?` } : {}),
  };
}
