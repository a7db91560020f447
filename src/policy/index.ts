// The policy stage: load and validate a policy file into the typed Policy that
// every later stage reads.
export { loadPolicy, nearestGitRoot } from './load.js';
export { parsePolicyText, POLICY_VERSION, type ParseOptions } from './parse.js';
export { formatProblem, formatPath, formatPolicyKeyProblem } from './format.js';
export { resolveLanguageKey } from './languages.js';
export { lookUpScript } from './scripts.js';
export { BUILTIN_TOKENIZERS } from './build.js';
export type * from './types.js';
