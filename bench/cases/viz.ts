/**
 * View-layer benchmarks: the preset layout, the cytoscape elements and the
 * SVG export of the reference mechanism at 40 km. The analysis is computed
 * once, outside the timed part.
 */
import { runAnalysis } from "../../lib/engine/runAnalysis";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { graphSvg, networkElements, networkLayout, networkLegend } from "../../lib/viz";
import type { MechanismView } from "../../lib/viz/types";
import type { BenchCase } from "../types";

const mech = loadBuiltinMechanism("reference").mechanism;
const view: MechanismView = {
  id: "reference",
  title: mech.title,
  description: mech.description,
  builtin: true,
  species: mech.species.map((s) => ({ id: s.id, label: s.label, role: s.role, group: s.group, atoms: s.atoms })),
  reactions: mech.reactions.map((r) => ({ id: r.id, equation: r.equation, rate: r.rate })),
  pools: [],
};
const result = runAnalysis(
  mech,
  { id: "reference", title: mech.title },
  { mechanismId: "reference", condition: { altitude_km: 40 } },
);
const layout = networkLayout(view);
const elements = networkElements(view, layout, result);

export const cases: BenchCase[] = [
  { name: "viz: networkLayout, reference mechanism", run: () => networkLayout(view) },
  {
    name: "viz: networkElements, reference at 40 km, flux colours",
    run: () => networkElements(view, layout, result, { colorMode: "flux" }),
  },
  {
    name: "viz: networkElements, reference at 40 km, Ox colours",
    run: () => networkElements(view, layout, result, { colorMode: "ox" }),
  },
  { name: "viz: networkLegend, Ox mode", run: () => networkLegend(result, "ox") },
  { name: "viz: graphSvg, reference at 40 km", run: () => graphSvg(elements) },
];
