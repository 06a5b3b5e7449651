/**
 * Net stoichiometry of every reaction (products − reactants, the third body M
 * left out, hv not a species) as sorted sparse columns, the form the pathway
 * algebra combines.
 *
 * The columns depend on the reactions alone, so they are computed once per
 * reactions array and shared (a WeakMap, dropped with the mechanism): an
 * analysis asks for them three times (the direct loss, the Ox scale, the
 * pathway search), a 51-level sweep 153 times. Callers must not change them.
 */
import type { CompiledMechanism } from "../mechanism/types";
import type { SparseVector } from "./sparseVector";

const CACHE = new WeakMap<CompiledMechanism["reactions"], readonly SparseVector[]>();

function computeNets(reactions: CompiledMechanism["reactions"]): SparseVector[] {
  return reactions.map((r) => {
    const net = new Map<number, number>();
    for (const t of r.reactants) net.set(t.species, (net.get(t.species) ?? 0) - t.coef);
    for (const t of r.products) net.set(t.species, (net.get(t.species) ?? 0) + t.coef);
    const idx = [...net.keys()].filter((s) => Math.abs(net.get(s)!) > 1e-12).sort((a, b) => a - b);
    return { idx, val: idx.map((s) => net.get(s)!) };
  });
}

export function reactionNet(mech: Pick<CompiledMechanism, "reactions">): readonly SparseVector[] {
  const cached = CACHE.get(mech.reactions);
  // an array grown or cut in place (a test's hand-built mechanism) is computed afresh
  if (cached && cached.length === mech.reactions.length) return cached;
  const nets = computeNets(mech.reactions);
  CACHE.set(mech.reactions, nets);
  return nets;
}
