/** A built-in mechanism as the explorer's views see it (MechanismView), for the viz tests. */
import { loadBuiltinMechanism } from "@/lib/mechanism";
import type { MechanismView } from "@/lib/viz/types";

export function builtinView(id: string): MechanismView {
  const m = loadBuiltinMechanism(id).mechanism;
  return {
    id,
    title: m.title,
    description: m.description,
    builtin: true,
    species: m.species.map((s) => ({ id: s.id, label: s.label, role: s.role, group: s.group, atoms: s.atoms })),
    reactions: m.reactions.map((r) => ({ id: r.id, equation: r.equation, rate: r.rate })),
    pools: [],
  };
}
