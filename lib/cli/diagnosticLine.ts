/** A mechanism problem as one line in the form editors and CI logs link to. */
import type { Diagnostic } from "../errors";

/** One problem as a line: `file:line:column: error: path: message [code]`. */
export function diagnosticLine(file: string, d: Diagnostic): string {
  const at = d.line !== undefined ? `${file}:${d.line}:${d.column ?? 1}` : file;
  return `${at}: ${d.severity}: ${d.path ? `${d.path}: ` : ""}${d.message} [${d.code}]`;
}
