// The JSON view: the report object itself, with a stable key order.
import type { Report } from '../judge/types.js';

/** Returns the report as pretty-printed JSON text (schema: schemas/report.schema.json). */
export function renderJson(report: Report): string {
  return `${JSON.stringify(report, null, 2)}\n`;
}
