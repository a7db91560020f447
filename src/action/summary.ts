// The job summary: Markdown appended to the file the runner names, shown on the
// run's page. Takes plain values.
import { appendFile } from 'node:fs/promises';

/** Appends Markdown to the job summary file; returns false (and writes nothing) when the runner gave no file. */
export async function writeSummary(file: string | null, markdown: string): Promise<boolean> {
  if (!file) return false;
  await appendFile(file, markdown.endsWith('\n') ? markdown : `${markdown}\n`);
  return true;
}
