// Types of scripts/gen-policy-validator.mjs, for the test that checks its output is committed.
/** Returns the generated validator module for the schema now in schemas/. */
export function generatedValidator(): string;
