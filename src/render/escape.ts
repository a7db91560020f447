// Escaping for text that comes from the data or from file names, so that it
// can never become markup, a link, an image, an HTML tag or a mention when the
// Markdown is rendered (on GitHub, in a job summary, in a PR comment).

const MARKDOWN_PUNCT = /[\\`*_{}[\]()#+\-.!|~]/g;
const HTML_SPECIAL: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Returns text that renders literally in GitHub Markdown, on one line (safe inside a table cell). */
export function escapeMarkdown(text: string): string {
  return (
    text
      // Controls and bidi/zero-width characters would make the comment lie about what it says.
      .replace(/[\u0000-\u0008\u000B-\u001F\u007F-\u009F\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g, (c) => `U+${c.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')}`)
      // Backslash escapes first: the entities below contain `#` and `;`, which must stay live.
      .replace(MARKDOWN_PUNCT, (c) => `\\${c}`)
      .replace(/[&<>"']/g, (c) => HTML_SPECIAL[c]!)
      // `@name` would notify a user or team; `#123` would link an issue. Entities render the same glyphs without the side effect.
      .replace(/@/g, '&#64;')
      .replace(/:\/\//g, '&#58;//')
      .replace(/\r?\n|\r/g, ' ')
  );
}

/** Returns a path shown in code style, escaped for a table cell; backticks inside are replaced so the span cannot be broken out of. */
export function codePath(path: string): string {
  const safe = path.replace(/[\u0000-\u001F\u007F-\u009F\u200B-\u200F\u202A-\u202E\u2060-\u2069\uFEFF]/g, '?').replace(/`/g, "'").replace(/\|/g, '\\|');
  return `\`${safe}\``;
}
