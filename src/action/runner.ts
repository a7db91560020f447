// What the run needs from the runner, as one small interface, and its
// implementation over @actions/core. The run itself never imports @actions/core.
import * as core from '@actions/core';
import type { Annotation } from './annotations.js';

export interface ActionIO {
  info(message: string): void;
  /** A warning for the whole step (shown as an annotation without a file). */
  warning(message: string): void;
  /** A file annotation. */
  annotate(a: Annotation): void;
  setOutput(name: string, value: string): void;
  /** Runs `fn` inside a collapsible log group. */
  group<T>(name: string, fn: () => Promise<T>): Promise<T>;
}

/** Returns the runner's I/O through @actions/core (log commands, GITHUB_OUTPUT). */
export function runnerIO(): ActionIO {
  return {
    info: (m) => core.info(m),
    warning: (m) => core.warning(m),
    annotate: (a) => {
      const props: core.AnnotationProperties = { file: a.file, title: a.title };
      if (a.line !== undefined) props.startLine = a.line;
      if (a.kind === 'error') core.error(a.message, props);
      else core.warning(a.message, props);
    },
    setOutput: (name, value) => core.setOutput(name, value),
    group: (name, fn) => core.group(name, fn),
  };
}
