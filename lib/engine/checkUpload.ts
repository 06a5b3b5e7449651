/**
 * The checks of an uploaded mechanism document, run in an engine worker so
 * that a large or hostile body never holds the server's main thread, which
 * only moves the bytes here (transferred, not copied): UTF-8 decoding, the
 * { text, format } wrapper, the nesting pre-scan, parse, schema, compile, and
 * the refusal of a document with nothing to analyse. The result is plain JSON.
 */
import { z } from "zod";
import { type Diagnostic, EngineError, MechanismError } from "../errors";
import { jsonTooDeep, loadMechanism, missingContent, NESTING_DEFAULTS } from "../mechanism";
import { mechanismContentId } from "../store/ids";
import { engineLimitWarnings } from "./engineLimits";
import { parseWith } from "./requestSchema";

export interface UploadCheck {
  /** SHA-256 address of the canonical document, kept inside the store (never an id handed out) */
  contentHash: string;
  format: "yaml" | "json";
  title: string;
  description: string;
  speciesCount: number;
  reactionCount: number;
  pools: { id: string; label?: string; expression: string; total?: unknown }[];
  conservation: { id: string; label?: string; expression: string }[];
  photolysisChannels: string[];
  warnings: Diagnostic[];
}

export const uploadSchema = z
  .object({ text: z.string().min(1, "expected the document text"), format: z.enum(["yaml", "json"]).optional() })
  .strict();

/** The document of an upload body: { text, format? } as JSON, or the document itself (YAML or JSON). */
export function uploadedDocument(body: Uint8Array, contentType: string): { text: string; format?: "yaml" | "json" } {
  const raw = new TextDecoder().decode(body);
  if (!contentType.includes("json")) return { text: raw };
  const deep = jsonTooDeep(raw, NESTING_DEFAULTS.maxDepth);
  if (deep) {
    throw new EngineError(
      "too-deep",
      `the body is nested too deeply: more than ${NESTING_DEFAULTS.maxDepth} levels of brackets (line ${deep.line}, column ${deep.column})`,
      { path: "(body)", line: deep.line, column: deep.column },
    );
  }
  let parsed: unknown;
  try {
    parsed = JSON.parse(raw);
  } catch {
    // not JSON at all: the loader reports it as a document, with its line and column
    return { text: raw };
  }
  if (!parsed || typeof parsed !== "object" || !("text" in parsed)) return { text: raw };
  return parseWith(uploadSchema, parsed);
}

/** Checks an upload body; the document text comes back with the summary, to be stored. */
export function checkUploadBody(body: Uint8Array, contentType: string): UploadCheck & { text: string } {
  const { text, format } = uploadedDocument(body, contentType);
  return { ...checkUpload(text, format), text };
}

export function checkUpload(text: string, format?: "yaml" | "json"): UploadCheck {
  const loaded = loadMechanism(text, { format });
  const missing = missingContent(loaded.mechanism);
  if (missing.length) throw new MechanismError(missing);
  const m = loaded.mechanism;
  return {
    contentHash: mechanismContentId(loaded.canonical),
    format: format ?? (/^\s*[{[]/.test(text) ? "json" : "yaml"),
    title: m.title,
    description: m.description,
    speciesCount: m.species.length,
    reactionCount: m.reactions.length,
    pools: m.pools.map((p) => ({ id: p.id, label: p.label, expression: p.expression, total: p.total })),
    conservation: m.conservation.map((c) => ({ id: c.id, label: c.label, expression: c.expression })),
    photolysisChannels: m.photolysisChannels,
    warnings: [
      ...loaded.warnings,
      ...engineLimitWarnings(m).map((message) => ({ severity: "warning" as const, code: "beyond-limit", message })),
    ],
  };
}
