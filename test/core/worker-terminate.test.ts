// Workers the pool no longer needs are terminated, sometimes while they are still loading
// the bundle (bin/sluice.js starts one before it knows the run). Node 20's V8 aborts the
// whole process when a worker is terminated while an async module's body runs ("Check
// failed: (location_) != nullptr" in SourceTextModule::ExecuteAsyncModule), so the bundles
// must have no top-level await. Before that was removed, the fixture below aborted in 3 of 6
// processes (two at a time, 120 rounds each) on this machine class; measured once, by hand.
import { spawn } from 'node:child_process';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const REPO = join(__dirname, '..', '..');
const FIXTURE = join(REPO, 'test/fixtures/threads/terminate-while-loading.mjs');

/** Runs the fixture in a child process: its exit status and output. */
function terminateWhileLoading(entry: string, rounds: number): Promise<{ code: number | null; signal: string | null; out: string }> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, [FIXTURE, entry, String(rounds)], { cwd: REPO });
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    child.stderr.on('data', (d) => (out += d));
    child.on('close', (code, signal) => resolve({ code, signal, out }));
  });
}

/** Lines of a script's top-level awaits (await expressions and for-await loops outside any function). */
function topLevelAwaits(source: string): number[] {
  const file = ts.createSourceFile('bundle.js', source, ts.ScriptTarget.Latest, false, ts.ScriptKind.JS);
  const lines: number[] = [];
  const visit = (node: ts.Node): void => {
    if (ts.isFunctionLike(node) || ts.isClassStaticBlockDeclaration(node)) return;
    if (ts.isAwaitExpression(node) || (ts.isForOfStatement(node) && node.awaitModifier)) lines.push(file.getLineAndCharacterOfPosition(node.getStart(file)).line + 1);
    ts.forEachChild(node, visit);
  };
  visit(file);
  return lines;
}

describe('workers terminated while loading', () => {
  it('leave the process alive, for both bundles', async () => {
    // Two at a time, as the crash needed a loaded machine to show.
    const runs = await Promise.all([
      terminateWhileLoading('dist/cli.js', 80),
      terminateWhileLoading('dist/cli.js', 80),
      terminateWhileLoading('dist/index.js', 30),
    ]);
    for (const r of runs) {
      expect(r.out, r.out).toMatch(/^survived \d+\n$/);
      expect(r.code).toBe(0);
    }
  }, 120_000);

  it('because no bundle has a top-level await (parsed with the TypeScript compiler)', () => {
    // The Action's chunks too: a worker that imports one (a tokenizer's ranks) may be terminated meanwhile.
    const chunks = readdirSync(join(REPO, 'dist/chunks')).map((f) => `dist/chunks/${f}`);
    expect(chunks.length).toBeGreaterThan(0);
    for (const bundle of ['dist/cli.js', 'dist/index.js', ...chunks]) expect(topLevelAwaits(readFileSync(join(REPO, bundle), 'utf8')), bundle).toEqual([]);
    // The check itself finds one where there is one, and only there.
    expect(topLevelAwaits('const a = 1;\nif (a) await run();\nasync function f() { await g(); }\nfor await (const x of y) {}\n')).toEqual([2, 4]);
  });
});
