/**
 * "How does X become Y here": the dominant flux path between two species on
 * the species–reaction graph. A step X → reaction j → Z carries the fraction
 * φ = (coef_X r_j)/D_X of X's loss; the path maximising Π φ is the shortest
 * path for edge weights −ln φ on reactant edges and 0 on product edges
 * (Dijkstra, graphology-shortest-path). Held species (and the third body)
 * are not passed through, only started from or ended at, since they stand
 * for an unlimited reservoir rather than a flux.
 */
import { DirectedGraph } from "graphology";
import { dijkstra } from "graphology-shortest-path";
import { InputError } from "../errors";
import { ownValue } from "../idRecord";
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import {
  type GraphEdgeAttributes,
  type GraphNodeAttributes,
  speciesNode,
  speciesReactionGraph,
} from "./speciesReactionGraph";

export interface FluxPathOptions {
  /** species ids treated as held (not passed through) besides those whose role is "held"; default none */
  heldSpecies?: string[];
}

export function dominantFluxPath(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "rate_cm3s">,
  fromId: string,
  toId: string,
  options: FluxPathOptions = {},
): { path: string[]; reactions: string[]; fraction: number } | null {
  for (const [name, id] of [
    ["fromId", fromId],
    ["toId", toId],
  ])
    if (ownValue(mech.speciesIndex, id) === undefined)
      throw new InputError(name, `unknown species "${id}": not in mechanism "${mech.title}"`);
  if (!state || state.rate_cm3s?.length !== mech.reactions.length)
    throw new InputError("state.rate_cm3s", `give one rate per reaction (${mech.reactions.length})`);
  if (fromId === toId) return { path: [fromId], reactions: [], fraction: 1 };

  const full = speciesReactionGraph(mech, state);
  const held = new Set(options.heldSpecies ?? []);
  const g = new DirectedGraph<GraphNodeAttributes, GraphEdgeAttributes & { weight: number }>();
  full.forEachNode((n, a) => {
    g.addNode(n, a);
  });
  full.forEachEdge((_e, a, source, target, sa) => {
    if (a.kind === "reactant") {
      if (!(a.fraction > 0)) return;
      if (sa.kind === "species" && source !== speciesNode(fromId)) {
        const sp = mech.species[sa.index];
        if (sp.role !== "solved" || held.has(sp.id)) return;
      }
      g.addEdge(source, target, { ...a, weight: -Math.log(Math.min(1, a.fraction)) });
    } else if (a.flux_cm3s > 0) g.addEdge(source, target, { ...a, weight: 0 });
  });
  const nodes = dijkstra.bidirectional(g, speciesNode(fromId), speciesNode(toId), "weight");
  if (!nodes || nodes.length === 0) return null;
  const path: string[] = [];
  const reactions: string[] = [];
  let w = 0;
  for (let i = 0; i < nodes.length; i++) {
    const a = full.getNodeAttributes(nodes[i]);
    (a.kind === "species" ? path : reactions).push(a.id);
    if (i > 0) w += g.getEdgeAttribute(nodes[i - 1], nodes[i], "weight");
  }
  return { path, reactions, fraction: Math.exp(-w) };
}
