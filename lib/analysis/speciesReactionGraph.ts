/**
 * The bipartite species–reaction graph of a mechanism (graphology): a node
 * "s:<id>" per species and "r:<id>" per reaction, an edge species → reaction
 * for every reactant and reaction → species for every product. With a state,
 * edges carry the flux (coefficient × reaction rate, molecules cm⁻³ s⁻¹) and
 * the fraction of flux they carry: of the species' total loss for a reactant
 * edge, of the species' total production for a product edge. Used by the flux
 * path search and reusable by the network view.
 */
import { DirectedGraph } from "graphology";
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";

export interface SpeciesNodeAttributes {
  kind: "species";
  id: string;
  index: number;
  role: string;
}

export interface ReactionNodeAttributes {
  kind: "reaction";
  id: string;
  index: number;
  equation: string;
  /** molecules cm⁻³ s⁻¹; 0 without a state */
  rate_cm3s: number;
}

export type GraphNodeAttributes = SpeciesNodeAttributes | ReactionNodeAttributes;

export interface GraphEdgeAttributes {
  /** "reactant": species → reaction; "product": reaction → species */
  kind: "reactant" | "product";
  coef: number;
  /** coef × rate, molecules cm⁻³ s⁻¹ */
  flux_cm3s: number;
  /** flux over the species' total loss (reactant) or production (product), 0–1 */
  fraction: number;
}

export const speciesNode = (id: string) => `s:${id}`;
export const reactionNode = (id: string) => `r:${id}`;

export function speciesReactionGraph(
  mech: CompiledMechanism,
  state?: Pick<SteadyState, "rate_cm3s">,
): DirectedGraph<GraphNodeAttributes, GraphEdgeAttributes> {
  const g = new DirectedGraph<GraphNodeAttributes, GraphEdgeAttributes>();
  const rate = (j: number) => Math.max(0, state?.rate_cm3s[j] ?? 0);
  const loss = new Float64Array(mech.species.length);
  const prod = new Float64Array(mech.species.length);
  mech.reactions.forEach((r, j) => {
    for (const t of r.reactants) loss[t.species] += t.coef * rate(j);
    for (const t of r.products) prod[t.species] += t.coef * rate(j);
  });
  mech.species.forEach((sp, index) => {
    g.addNode(speciesNode(sp.id), { kind: "species", id: sp.id, index, role: sp.role });
  });
  mech.reactions.forEach((r, index) => {
    const node = reactionNode(r.id);
    g.addNode(node, { kind: "reaction", id: r.id, index, equation: r.equation, rate_cm3s: rate(index) });
    const link = (from: string, to: string, kind: "reactant" | "product", coef: number, total: number) => {
      const flux = coef * rate(index);
      if (g.hasEdge(from, to)) {
        const e = g.getEdgeAttributes(from, to);
        e.coef += coef;
        e.flux_cm3s += flux;
        e.fraction = total > 0 ? e.flux_cm3s / total : 0;
      } else g.addEdge(from, to, { kind, coef, flux_cm3s: flux, fraction: total > 0 ? flux / total : 0 });
    };
    for (const t of r.reactants) {
      const sp = mech.species[t.species];
      link(speciesNode(sp.id), node, "reactant", t.coef, loss[t.species]);
    }
    for (const t of r.products) {
      const sp = mech.species[t.species];
      link(node, speciesNode(sp.id), "product", t.coef, prod[t.species]);
    }
  });
  return g;
}
