/**
 * Which elements a selected catalytic cycle lights up: its reaction nodes,
 * their edges, and the species on those edges. Everything else is dimmed
 * by the view (frames stay half visible to keep the bearings).
 */
import type { CatalyticCycle } from "../analysis/types";
import type { GraphElement } from "./types";

export interface Highlight {
  /** element ids to emphasise */
  on: string[];
  /** element ids to dim */
  off: string[];
}

export function cycleHighlight(
  elements: readonly GraphElement[],
  cycle: Pick<CatalyticCycle, "steps"> | null,
): Highlight {
  if (!cycle) return { on: [], off: [] };
  const steps = new Set(cycle.steps.map((s) => s.reactionId));
  const on = new Set<string>();
  for (const el of elements) {
    const d = el.data;
    if (d.kind === "reaction" && steps.has(d.reactionId)) on.add(d.id);
    if (d.kind === "edge" && steps.has(d.reactionId)) {
      on.add(d.id);
      on.add(d.source);
      on.add(d.target);
    }
  }
  const off = elements.map((e) => e.data.id).filter((id) => !on.has(id));
  return { on: [...on].sort(), off: off.sort() };
}
