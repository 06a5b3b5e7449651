/**
 * Net stoichiometry of every reaction (products − reactants, the third body M
 * left out, hv not a species) as sorted sparse columns, the form the pathway
 * algebra combines.
 */
import type { CompiledMechanism } from "../mechanism/types";
import type { SparseVector } from "./sparseVector";

export function reactionNet(mech: Pick<CompiledMechanism, "reactions">): SparseVector[] {
  return mech.reactions.map((r) => {
    const net = new Map<number, number>();
    for (const t of r.reactants) net.set(t.species, (net.get(t.species) ?? 0) - t.coef);
    for (const t of r.products) net.set(t.species, (net.get(t.species) ?? 0) + t.coef);
    const idx = [...net.keys()].filter((s) => Math.abs(net.get(s)!) > 1e-12).sort((a, b) => a - b);
    return { idx, val: idx.map((s) => net.get(s)!) };
  });
}
