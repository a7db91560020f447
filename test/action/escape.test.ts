// Text from the data and from file names reaches the comment only escaped: it
// cannot become an HTML tag, a link, an image or a mention. Checked on the raw
// comment body, with code spans (which GitHub renders literally, CommonMark 0.31
// §6.1 "Code spans") taken out first.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fakeGitHub, newsroomRepo, runBundle, stories, type FakeGitHub } from './harness.js';

const HOSTILE = '<img src=x onerror=alert(1)> @octocat [click](https://evil.example/x) ![pic](https://evil.example/p.png) <!-- **bold** #12';
const HOSTILE_NAME = 'data/eng/@octocat <b>x</b> [x](y).jsonl';

describe('a shard whose name and text carry Markdown, HTML and mentions', () => {
  let api: FakeGitHub;
  let body = '';
  let summary = '';
  beforeAll(async () => {
    api = await fakeGitHub();
    const { repo, base } = newsroomRepo(2);
    const lines = [
      ...stories('eng', 4, 61).trimEnd().split('\n'),
      // Not JSON: the parser's message quotes the line, and the report shows it as a rejection.
      HOSTILE,
      // A story with a right-to-left override and the markup in its text: an encoding finding with a text excerpt.
      JSON.stringify({ text: `The ward council met \u202E ${HOSTILE} on Monday to discuss the bridge over the river.`, lang: 'eng' }),
      // Declared Hindi, written in Latin letters: a script finding with an excerpt.
      JSON.stringify({ text: `${HOSTILE} the council met on Monday and the market was busy with farmers`, lang: 'hin' }),
    ];
    repo.write(HOSTILE_NAME, `${lines.join('\n')}\n`);
    const run = await runBundle({ repo, event: 'pull_request', api, pr: { number: 31, baseSha: base, headSha: repo.commit('Hostile shard') } });
    expect(run.code).toBe(1);
    body = api.comments[0]?.body ?? '';
    summary = run.summary;
  });
  afterAll(() => api.close());

  const outsideCode = (md: string): string => md.replace(/`[^`\n]*`/g, '');

  it('shows the shard and the findings', () => {
    expect(body).toContain('FAIL');
    // The file is listed (in code style) and its findings are located in it.
    expect(body).toContain('`data/eng/@octocat <b>x</b> [x](y).jsonl');
    expect(body).toMatch(/invalid\\?-json/);
    // The data's text did reach the comment, as escaped text (the parser's message quotes the line).
    expect(body).toContain('&lt;img src=x');
    expect(summary).toContain('&lt;img src=x');
  });

  for (const [what, md] of [['comment', () => body], ['summary', () => summary]] as const) {
    it(`leaves no live tag, mention, link or image from the data in the ${what}`, () => {
      const text = outsideCode(md());
      expect(text).not.toMatch(/<img|<b>|<!-- \*\*bold/);
      expect(text).not.toMatch(/@octocat/);
      expect(text).not.toMatch(/\[click\]\(|!\[pic\]\(|\[x\]\(y\)/);
      expect(text).not.toContain('https://evil.example');
      // Link destinations the view writes percent-encode the name, parentheses included for its own links.
      expect(md()).not.toMatch(/\]\([^)\s]*<[^)]*\)/);
      // Tags GitHub would render are only the ones the view writes itself.
      const tags = new Set([...text.matchAll(/<\/?([a-z]+)[\s>]/g)].map((m) => m[1]));
      expect([...tags].sort()).toEqual(['details', 'sub', 'summary']);
      // The only HTML comment is the hidden marker.
      expect([...md().matchAll(/<!--/g)].length).toBe(what === 'comment' ? 1 : 0);
      // Code spans holding data cannot be broken out of: a backtick in data is replaced, so spans pair up line by line.
      for (const line of md().split('\n')) expect((line.match(/`/g) ?? []).length % 2).toBe(0);
    });
  }
});
