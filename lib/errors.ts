/**
 * Error classes shared by every domain of the science core.
 *
 * Every error carries a machine-readable `code`, a message a chemist can act
 * on, and the `path` of the offending input (e.g. `reactions[12].rate.k0`),
 * with the line and column of the source text when one is known.
 */

export interface ErrorLocation {
  /** Document path of the offending input, e.g. `reactions[3].rate.A`. */
  path?: string;
  /** 1-based line in the source text, when known. */
  line?: number;
  /** 1-based column in the source text, when known. */
  column?: number;
}

export class EngineError extends Error {
  readonly code: string;
  readonly path?: string;
  readonly line?: number;
  readonly column?: number;

  constructor(code: string, message: string, location: ErrorLocation = {}) {
    super(message);
    this.name = "EngineError";
    this.code = code;
    this.path = location.path;
    this.line = location.line;
    this.column = location.column;
  }

  toJSON(): { code: string; message: string; path?: string; line?: number; column?: number } {
    return { code: this.code, message: this.message, path: this.path, line: this.line, column: this.column };
  }
}

/** A mechanism document that cannot be loaded (syntax, schema, balance, limits). */
export class MechanismError extends EngineError {
  /** Every problem found, the first of which is also this error's message. */
  readonly problems: Diagnostic[];
  constructor(problems: Diagnostic[]) {
    const first = problems[0];
    super(first?.code ?? "mechanism", formatDiagnostic(first), first ?? {});
    this.name = "MechanismError";
    this.problems = problems;
  }
}

/** A value outside its allowed range or of the wrong type (conditions, options). */
export class InputError extends EngineError {
  constructor(path: string, message: string, code = "invalid-input") {
    super(code, `${path}: ${message}`, { path });
    this.name = "InputError";
  }
}

/** A soft or hard problem found while reading input, with where it is. */
export interface Diagnostic extends ErrorLocation {
  severity: "error" | "warning";
  code: string;
  message: string;
}

export function formatDiagnostic(d: Diagnostic | undefined): string {
  if (!d) return "unknown problem";
  const where = d.line !== undefined ? ` (line ${d.line}, column ${d.column ?? 1})` : "";
  return `${d.path ? `${d.path}: ` : ""}${d.message}${where}`;
}

/** Longest excerpt of the input an error message quotes, characters. */
export const EXCERPT_MAX = 40;

/**
 * A short, printable excerpt of user input for an error message: at most
 * `max` characters, control characters and backslashes escaped (\n, \u0000),
 * an ellipsis when cut. Input bytes never reach a message raw.
 */
export function safeExcerpt(text: string, max = EXCERPT_MAX): string {
  const cut = text.length > max ? text.slice(0, max) : text;
  return `"${printable(cut.replace(/["\\]/g, (c) => `\\${c}`))}${text.length > max ? "…" : ""}"`;
}

/** Text with its control characters escaped (\n, \t, \u0000), e.g. a parser's message about user input. */
export function printable(text: string): string {
  // biome-ignore lint/suspicious/noControlCharactersInRegex: escaping control characters is the point
  return text.replace(/[\u0000-\u001f\u007f-\u009f]/g, (c) => {
    if (c === "\n") return "\\n";
    if (c === "\t") return "\\t";
    return `\\u${c.charCodeAt(0).toString(16).padStart(4, "0")}`;
  });
}

/** A JSON.parse message without the input V8 echoes into it ('Unexpected token …, "<input>" is not valid JSON'). */
export function jsonParseMessage(e: unknown): string {
  const msg = e instanceof Error ? e.message : String(e);
  const cleaned = msg
    .replace(
      /^Unexpected token (.+?), "[\s\S]*?(?:"\.\.\.|") is not valid JSON$/,
      (_m, tok: string) => `unexpected character ${safeExcerpt(tok.replace(/^'|'$/g, ""), 4)}`,
    )
    .split("\n")[0];
  return printable(cleaned).slice(0, 120);
}
