/**
 * Loads a mechanism document (YAML or its JSON form, docs/mechanism-format.md):
 * parses it with the `yaml` package (v2), checks its shape, compiles it and
 * collects every problem with its document path, line and column. Throws
 * MechanismError with all errors; returns warnings with the mechanism.
 */
import { LineCounter, parseDocument } from "yaml";
import { type Diagnostic, jsonParseMessage, MechanismError, printable } from "../errors";
import { warnBidiControls } from "./bidiControls";
import { canonicalJson } from "./canonicalJson";
import { compileMechanism } from "./compileMechanism";
import { DiagnosticSink } from "./diagnostics";
import { type Locator, lazyLocator, makeLocator } from "./locateInDocument";
import { jsonTooDeep, NESTING_DEFAULTS, type TooDeep, yamlTooDeep } from "./nestingDepth";
import { readDocument } from "./readDocument";
import { findRecursiveAlias } from "./recursiveAlias";
import type { LoadedMechanism, MechanismLimits } from "./types";

export const DEFAULTS: MechanismLimits = {
  maxSpecies: 5_000,
  maxReactions: 20_000,
  maxTextBytes: 4 * 1024 * 1024,
  maxDepth: NESTING_DEFAULTS.maxDepth,
};

export interface LoadMechanismOptions {
  /** "yaml" or "json"; default: JSON when the text starts with "{", else YAML */
  format?: "yaml" | "json";
  /** size limits; default `DEFAULTS` (5,000 species, 20,000 reactions, 4 MiB, 64 levels) */
  limits?: Partial<MechanismLimits>;
}

function utf8Length(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) n += 1;
    else if (c < 0x800) n += 2;
    else if (c >= 0xd800 && c <= 0xdbff) {
      n += 4;
      i++;
    } else n += 3;
  }
  return n;
}

function fail(problems: Diagnostic[]): never {
  throw new MechanismError(problems);
}

/** The refusal of a document nested beyond the limit, before or instead of a parser's stack overflow. */
export function tooDeepDiagnostic(maxDepth: number, at: Pick<TooDeep, "line" | "column">): Diagnostic {
  return {
    severity: "error",
    code: "too-deep",
    message: `the document is nested too deeply: more than ${maxDepth} levels of lists or mappings (a mechanism needs about 5)`,
    line: at.line,
    column: at.column,
  };
}

const isStackOverflow = (e: unknown) => e instanceof RangeError && /call stack/i.test(e.message);

function lineColumnAt(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      start = i + 1;
    }
  }
  return { line, column: offset - start + 1 };
}

/** Parses JSON text; a syntax error gives its line and column. */
function parseJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    const msg = jsonParseMessage(e);
    const m = /position (\d+)/.exec(msg);
    let at: { line: number; column: number } = { line: 1, column: 1 };
    if (m) at = lineColumnAt(text, Number(m[1]));
    else {
      const lc = new LineCounter();
      const doc = parseDocument(text, { lineCounter: lc, prettyErrors: false });
      const err = doc.errors[0];
      if (err) {
        const p = lc.linePos(err.pos[0]);
        at = { line: p.line, column: p.col };
      }
    }
    return fail([{ severity: "error", code: "json-syntax", message: `malformed JSON: ${msg}`, ...at }]);
  }
}

/** Parses, checks and compiles a mechanism document. */
export function loadMechanism(text: string, options: LoadMechanismOptions = {}): LoadedMechanism {
  const limits = { ...DEFAULTS, ...options.limits };
  if (typeof text !== "string") {
    fail([{ severity: "error", code: "type", message: "a mechanism document must be text (YAML or JSON)" }]);
  }
  const bytes = text.length > limits.maxTextBytes / 4 ? utf8Length(text) : text.length;
  if (bytes > limits.maxTextBytes) {
    fail([
      {
        severity: "error",
        code: "too-large",
        message: `the document is ${bytes} bytes, beyond the limit of ${limits.maxTextBytes} bytes`,
        line: 1,
        column: 1,
      },
    ]);
  }
  const format = options.format ?? (/^\s*[{[]/.test(text) ? "json" : "yaml");
  const deep = format === "json" ? jsonTooDeep(text, limits.maxDepth) : yamlTooDeep(text, limits.maxDepth);
  if (deep) fail([tooDeepDiagnostic(limits.maxDepth, deep)]);

  let data: unknown;
  let locate: Locator;
  if (format === "json") {
    data = parseJson(text);
    locate = lazyLocator(text);
  } else {
    const lineCounter = new LineCounter();
    const doc = parseDocument(text, { lineCounter, prettyErrors: false, uniqueKeys: true });
    // the first syntax error is reported: the parser's later ones usually follow from it
    const syntax = doc.errors.slice(0, 1).map((err): Diagnostic => {
      const p = lineCounter.linePos(err.pos[0]);
      const first = err.message.split("\n")[0].replace(/ at line \d+, column \d+.*$/, "");
      return {
        severity: "error",
        code: "yaml-syntax",
        message: `malformed YAML: ${printable(first).slice(0, 160)}`,
        line: p.line,
        column: p.col,
      };
    });
    if (syntax.length) fail(syntax);
    const loop = findRecursiveAlias(doc);
    if (loop) {
      const p = lineCounter.linePos(loop.offset);
      fail([
        {
          severity: "error",
          code: "recursive-alias",
          message: `the alias *${printable(loop.name).slice(0, 40)} stands inside the node its anchor names, which would make the document endless; write the entries out`,
          line: p.line,
          column: p.col,
        },
      ]);
    }
    try {
      data = doc.toJS({ maxAliasCount: 100 });
    } catch (e) {
      if (isStackOverflow(e)) fail([tooDeepDiagnostic(limits.maxDepth, { line: 1, column: 1 })]);
      fail([
        {
          severity: "error",
          code: "yaml-syntax",
          message: `malformed YAML: ${printable(e instanceof Error ? e.message : String(e)).slice(0, 160)}`,
          line: 1,
          column: 1,
        },
      ]);
    }
    locate = makeLocator(doc, lineCounter);
  }

  const sink = new DiagnosticSink();
  warnBidiControls(data, sink);
  const read = readDocument(data, sink, limits);
  // compile even after shape errors, so that one pass reports every problem
  const mechanism = read ? compileMechanism(read, sink) : undefined;
  const diagnostics = sink
    .resolve(locate)
    .map((d, i) => ({ d, i }))
    .sort((a, b) => (a.d.line ?? 0) - (b.d.line ?? 0) || (a.d.column ?? 0) - (b.d.column ?? 0) || a.i - b.i)
    .map(({ d }) => d);
  const errors = diagnostics.filter((d) => d.severity === "error");
  if (errors.length || !mechanism) fail(errors.length ? errors : diagnostics);
  const warnings = diagnostics.filter((d) => d.severity === "warning");
  mechanism.warnings = warnings;
  return { mechanism, canonical: canonicalJson(data), warnings, text };
}
