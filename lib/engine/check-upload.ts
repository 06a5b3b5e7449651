/**
 * The checks of an uploaded mechanism document, run in an engine worker so
 * that parsing and validating a large or hostile document never holds the
 * server's main thread: nesting pre-scan, parse, schema, compile, and the
 * refusal of a document with nothing to analyse. The result is plain JSON.
 */
import { type Diagnostic, MechanismError } from "../errors";
import { loadMechanism, missingContent } from "../mechanism";
import { mechanismContentId } from "../store/ids";

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
    warnings: loaded.warnings,
  };
}
