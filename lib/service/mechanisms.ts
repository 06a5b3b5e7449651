/**
 * Mechanism uploads and look-ups: validate, content-address, store.
 * Nothing is stored unless the document loads without error.
 */
import { engineLimitWarnings } from "../engine/engineLimits";
import "server-only";
import { z } from "zod";
import type { MechanismSource } from "../engine/mechanism-source";
import { compileSource } from "../engine/mechanism-source";
import { parseWith } from "../engine/request-schema";
import { builtinMechanisms, loadBuiltinMechanism, loadMechanism } from "../mechanism";
import type { CompiledMechanism } from "../mechanism/types";
import { getStore, ID_PATTERN, mechanismContentId } from "../store";
import { notFound } from "./http";

/** Largest mechanism upload accepted, bytes (the loader's own text limit is 2 MiB). */
export const MAX_MECHANISM_BODY = 4 * 1024 * 1024;

const uploadSchema = z
  .object({ text: z.string().min(1, "expected the document text"), format: z.enum(["yaml", "json"]).optional() })
  .strict();

export function summarise(id: string, builtin: boolean, mech: CompiledMechanism, text: string) {
  return {
    id,
    title: mech.title,
    description: mech.description,
    version: mech.version,
    builtin,
    text,
    species: mech.species.map((s) => ({ id: s.id, label: s.label, role: s.role, group: s.group, atoms: s.atoms })),
    reactions: mech.reactions.map((r) => ({
      id: r.id,
      equation: r.equation,
      rate: r.rate,
      uncertainty: r.uncertainty,
      source: r.source,
      note: r.note,
    })),
    pools: mech.pools.map((p) => ({ id: p.id, label: p.label, expression: p.expression, total: p.total })),
    conservation: mech.conservation.map((c) => ({ id: c.id, label: c.label, expression: c.expression })),
    photolysisChannels: mech.photolysisChannels,
    warnings: mech.warnings,
  };
}

/** Body is { text, format? } as JSON, or the document itself (YAML or JSON). */
export async function uploadMechanism(body: string, contentType: string) {
  let text = body;
  let format: "yaml" | "json" | undefined;
  if (contentType.includes("json")) {
    let parsed: unknown;
    try {
      parsed = JSON.parse(body);
    } catch {
      parsed = undefined;
    }
    if (parsed && typeof parsed === "object" && "text" in parsed) {
      const u = parseWith(uploadSchema, parsed);
      text = u.text;
      format = u.format;
    }
  }
  const loaded = loadMechanism(text, { format });
  const id = mechanismContentId(loaded.canonical);
  const fmt = format ?? (/^\s*[{[]/.test(text) ? "json" : "yaml");
  const inserted = await getStore().putMechanism({
    id,
    title: loaded.mechanism.title,
    description: loaded.mechanism.description,
    text,
    format: fmt,
    speciesCount: loaded.mechanism.species.length,
    reactionCount: loaded.mechanism.reactions.length,
    createdAt: new Date().toISOString(),
  });
  const s = summarise(id, false, loaded.mechanism, text);
  return {
    id,
    title: s.title,
    created: inserted,
    summary: {
      species: s.species.length,
      reactions: s.reactions.length,
      pools: s.pools,
      conservation: s.conservation,
      photolysisChannels: s.photolysisChannels,
    },
    warnings: [
      ...loaded.warnings,
      ...engineLimitWarnings(loaded.mechanism).map((message) => ({
        severity: "warning" as const,
        code: "beyond-limit",
        message,
      })),
    ],
  };
}

export async function listMechanisms() {
  const builtins = builtinMechanisms().map((b) => {
    const m = loadBuiltinMechanism(b.id).mechanism;
    return {
      id: b.id,
      title: b.title,
      description: b.description,
      builtin: true,
      speciesCount: m.species.length,
      reactionCount: m.reactions.length,
    };
  });
  const uploads = (await getStore().listMechanisms(50)).map((m) => ({
    id: m.id,
    title: m.title,
    description: m.description,
    builtin: false,
    speciesCount: m.speciesCount,
    reactionCount: m.reactionCount,
    createdAt: m.createdAt,
  }));
  return { mechanisms: [...builtins, ...uploads] };
}

/** The source of a mechanism for the engine, or a 404. */
export async function mechanismSource(id: string): Promise<MechanismSource> {
  if (!ID_PATTERN.test(id)) throw notFound("mechanism", id);
  const builtin = builtinMechanisms().find((b) => b.id === id);
  if (builtin) return { id, title: builtin.title };
  const stored = await getStore().getMechanism(id);
  if (!stored) throw notFound("mechanism", id);
  return { id, title: stored.title, text: stored.text };
}

export async function mechanismDetail(id: string) {
  const src = await mechanismSource(id);
  const mech = compileSource(src);
  const text = src.text ?? loadBuiltinText(id);
  return summarise(id, src.text === undefined, mech, text);
}

function loadBuiltinText(id: string): string {
  return loadBuiltinMechanism(id).text ?? "";
}
