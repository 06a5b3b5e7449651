/**
 * Collects the problems found while loading a mechanism document, each with
 * its document path (e.g. `reactions[12].rate.k0`). Lines and columns are
 * filled in at the end by a locator, so the many checks stay cheap.
 */
import type { Diagnostic } from "../errors";

export type DocPath = readonly (string | number)[];

/** `["reactions", 12, "rate", "k0"]` → `reactions[12].rate.k0`. */
export function formatPath(path: DocPath): string {
  let s = "";
  for (const seg of path) {
    if (typeof seg === "number") s += `[${seg}]`;
    else s += s === "" ? seg : `.${seg}`;
  }
  return s;
}

export interface PendingDiagnostic {
  severity: "error" | "warning";
  code: string;
  message: string;
  path: DocPath;
  /** point at the key of the last segment instead of its value (unknown keys) */
  atKey?: boolean;
  line?: number;
  column?: number;
}

export class DiagnosticSink {
  readonly items: PendingDiagnostic[] = [];
  error(path: DocPath, code: string, message: string, atKey = false): void {
    this.items.push({ severity: "error", code, message, path, atKey });
  }
  warn(path: DocPath, code: string, message: string, atKey = false): void {
    this.items.push({ severity: "warning", code, message, path, atKey });
  }
  get errorCount(): number {
    let n = 0;
    for (const d of this.items) if (d.severity === "error") n++;
    return n;
  }
  /** Resolves line and column with `locate` and returns plain diagnostics. */
  resolve(locate: (path: DocPath, atKey: boolean) => { line: number; column: number } | undefined): Diagnostic[] {
    return this.items.map((d) => {
      const at = d.line !== undefined ? { line: d.line, column: d.column ?? 1 } : locate(d.path, d.atKey ?? false);
      const out: Diagnostic = { severity: d.severity, code: d.code, message: d.message };
      if (d.path.length > 0) out.path = formatPath(d.path);
      if (at) {
        out.line = at.line;
        out.column = at.column;
      }
      return out;
    });
  }
}
