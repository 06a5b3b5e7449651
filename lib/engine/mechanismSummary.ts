/**
 * What the routes show of a compiled mechanism: its species, reactions,
 * pools, conservation relations and warnings, as plain JSON. Computed in an
 * engine worker for an upload (lib/runtime/taskTable.ts "describe-mechanism"), so
 * that compiling a large stored document never holds the main thread.
 */
import type { CompiledMechanism } from "../mechanism/types";

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
