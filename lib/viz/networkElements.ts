/**
 * Builds the cytoscape elements of the bipartite network (species nodes,
 * reaction nodes, family frames, consumption and production edges) from the
 * mechanism, its preset layout and the current analysis. Pure and
 * deterministic: same input, same JSON, so the output is snapshot-tested.
 *
 * Encodings: edge colour = the reaction's flux on a log scale (sequential
 * ramp) or its odd-oxygen value (diverging ramp); edge width and reaction-node
 * size = log flux in both modes. Bath gases and O2 are drawn as a stub per
 * reaction (a small label node at the layout's stub spot and a short edge).
 * Only the reactions in `visible` are drawn (see reactionDetail); the
 * positions of the others stay reserved. Rates in molecules cm⁻³ s⁻¹.
 */
import type { AnalysisResult } from "../engine/types";
import { chipWidth, frameTitleWidth } from "./chipWidth";
import { divergingColor } from "./divergingColor";
import { equationView } from "./equationView";
import { familyLabel } from "./familyLabel";
import { familyStyle } from "./familyStyle";
import { frameBoxes } from "./frameBoxes";
import { isolateText } from "./isolateText";
import { stubWidth } from "./labelBox";
import { logScale } from "./logScale";
import { type NetworkLayout, netCoefficients } from "./networkLayout";
import { reactionOxValue } from "./reactionOxValue";
import { sequentialColor } from "./sequentialColor";
import { signedLogScale } from "./signedLogScale";
import type { ColorMode, GraphEdge, GraphElement, GraphNode, MechanismView } from "./types";

export const ELEMENTS_DEFAULTS = {
  /** "flux" (sequential) or "ox" (diverging); default "flux" */
  colorMode: "flux" as ColorMode,
  /** draw held and third-body species and their edges; default true */
  showHeld: true,
  /** thinnest edge of a reaction with flux, px; default 1 */
  minWidth_px: 1,
  /** thickest edge, px; default 9 */
  maxWidth_px: 9,
  /** decades of flux resolved below the largest; default 8 */
  decades: 8,
};

export interface ElementsOptions extends Partial<typeof ELEMENTS_DEFAULTS> {
  /** ids of the reactions drawn; default every reaction of the layout */
  visible?: ReadonlySet<string>;
  /** draw only the species that a drawn reaction touches (for very large mechanisms); default false */
  onlyTouched?: boolean;
}

/** Above this many species the explorer draws only those of the drawn reactions. */
export const LARGE_MECHANISM_SPECIES = 300;

/** Colour of reactions and edges before any analysis exists, or at zero flux. */
export const IDLE_COLOR = "#c9c7c0";

export const speciesNodeId = (id: string) => `s:${id}`;
export const reactionNodeId = (id: string) => `r:${id}`;
export const frameNodeId = (family: string) => `f:${family}`;
export const stubNodeId = (reactionId: string, speciesId: string) => `t:${reactionId}:${speciesId}`;

export function networkElements(
  mech: Pick<MechanismView, "species" | "reactions">,
  layout: NetworkLayout,
  result: AnalysisResult | null,
  options: ElementsOptions = {},
): GraphElement[] {
  const o = { ...ELEMENTS_DEFAULTS, ...options };
  const rates = new Map(result?.steadyState.reactions.map((r) => [r.id, r.rate_cm3s]) ?? []);
  const densities = new Map(result?.steadyState.species.map((s) => [s.id, s.numberDensity_cm3]) ?? []);
  const ox = new Map(result?.cycles.perReaction.map((r) => [r.reactionId, reactionOxValue(r)]) ?? []);
  const flux = logScale([...rates.values()], { decades: o.decades });
  const oxScale = signedLogScale([...ox.values()]);

  const speciesById = new Map(mech.species.map((s) => [s.id, s]));
  const touched = new Set<string>();
  if (options.onlyTouched)
    for (const r of mech.reactions)
      if (!options.visible || options.visible.has(r.id))
        for (const t of [...equationView(r.equation).reactants, ...equationView(r.equation).products])
          touched.add(t.species);
  const shown = mech.species.filter(
    (s) => layout.species[s.id] && (o.showHeld || s.role === "solved") && (!options.onlyTouched || touched.has(s.id)),
  );
  const shownIds = new Set(shown.map((s) => s.id));
  const families = [...new Set(shown.map((s) => layout.species[s.id].family))];
  const frameOrder = layout.frames.map((f) => f.family);
  families.sort((a, b) => frameOrder.indexOf(a) - frameOrder.indexOf(b));

  const nodes: GraphNode[] = families.map((f) => {
    const st = familyStyle(f);
    return {
      group: "nodes",
      data: {
        id: frameNodeId(f),
        kind: "frame",
        family: f,
        label: isolateText(familyLabel(f)),
        minWidth: frameTitleWidth(familyLabel(f)),
        width: 0,
        height: 0,
        fill: st.frame,
        stroke: st.frameInk,
      },
      classes: "frame",
    };
  });
  // titles above the frames, where the layout kept their boxes clear
  const titleBox = new Map(layout.labels.filter((b) => b.kind === "frame").map((b) => [b.id, b]));
  for (const f of families) {
    const b = titleBox.get(frameNodeId(f));
    if (!b) continue;
    nodes.push({
      group: "nodes",
      data: { id: `ft:${f}`, kind: "title", family: f, label: familyLabel(f), ink: familyStyle(f).frameInk },
      position: { x: (b.x0 + b.x1) / 2, y: (b.y0 + b.y1) / 2 },
      classes: "title",
    });
  }
  for (const s of shown) {
    const p = layout.species[s.id];
    const st = familyStyle(p.family);
    const spectator = s.role !== "solved";
    nodes.push({
      group: "nodes",
      data: {
        id: speciesNodeId(s.id),
        kind: "species",
        speciesId: s.id,
        label: isolateText(s.label || s.id),
        family: p.family,
        frame: frameNodeId(p.family),
        role: s.role,
        spectator,
        fill: spectator ? "#ffffff" : st.chip,
        stroke: st.chipStroke,
        ink: "#1f2328",
        numberDensity_cm3: densities.get(s.id) ?? null,
        width: chipWidth(s.label || s.id),
      },
      position: { x: p.x, y: p.y },
      classes: `species${spectator ? " spectator" : ""}`,
    });
  }

  // each frame is a plain node with the box of its chips
  const boxes = frameBoxes(
    nodes.flatMap((n) =>
      n.data.kind === "species" && n.position ? [{ frame: n.data.frame, ...n.position, width: n.data.width }] : [],
    ),
    new Map(nodes.flatMap((n) => (n.data.kind === "frame" ? [[n.data.id, n.data.minWidth] as const] : []))),
  );
  for (const n of nodes) {
    if (n.data.kind !== "frame") continue;
    const b = boxes.get(n.data.id);
    if (!b) continue;
    n.data.width = round(b.x1 - b.x0);
    n.data.height = round(b.y1 - b.y0);
    n.position = { x: round((b.x0 + b.x1) / 2), y: round((b.y0 + b.y1) / 2) };
  }

  const edges: GraphEdge[] = [];
  for (const r of mech.reactions) {
    const pos = layout.reactions[r.id];
    if (!pos || (options.visible && !options.visible.has(r.id))) continue;
    const rate = rates.get(r.id) ?? 0;
    const t = flux.normalize(rate);
    const active = result !== null && t > 0;
    const color = !active
      ? IDLE_COLOR
      : o.colorMode === "flux"
        ? sequentialColor(t)
        : divergingColor(oxScale.normalize(ox.get(r.id) ?? 0));
    const width = active ? round(o.minWidth_px + (o.maxWidth_px - o.minWidth_px) * t) : 0.75;
    nodes.push({
      group: "nodes",
      data: {
        id: reactionNodeId(r.id),
        kind: "reaction",
        reactionId: r.id,
        label: isolateText(r.id),
        equation: r.equation,
        rate_cm3s: rate,
        color,
        size: active ? round(10 + 10 * t) : 9,
      },
      position: { x: pos.x, y: pos.y },
      classes: `reaction${active ? "" : " idle"}`,
    });
    const net = netCoefficients(equationView(r.equation));
    const ends: { sp: string; node: string; c: number }[] = [];
    for (const [sp, c] of net) if (c !== 0 && shownIds.has(sp)) ends.push({ sp, node: speciesNodeId(sp), c });
    for (const stub of o.showHeld ? (layout.stubs[r.id] ?? []) : []) {
      const node = stubNodeId(r.id, stub.speciesId);
      const sp = speciesById.get(stub.speciesId);
      nodes.push({
        group: "nodes",
        data: {
          id: node,
          kind: "stub",
          reactionId: r.id,
          speciesId: stub.speciesId,
          label: sp?.label || stub.speciesId,
          width: stubWidth(sp?.label || stub.speciesId),
        },
        position: { x: stub.x, y: stub.y },
        classes: "stub",
      });
      ends.push({ sp: stub.speciesId, node, c: net.get(stub.speciesId) ?? 0 });
    }
    for (const { sp, node, c } of ends) {
      const direction = c < 0 ? "in" : "out";
      const stub = node.startsWith("t:");
      edges.push({
        group: "edges",
        data: {
          id: `e:${r.id}:${direction}:${sp}`,
          kind: "edge",
          source: direction === "in" ? node : reactionNodeId(r.id),
          target: direction === "in" ? reactionNodeId(r.id) : node,
          reactionId: r.id,
          speciesId: sp,
          direction,
          coef: Math.abs(c),
          rate_cm3s: rate,
          color,
          // a stub is a short tag, so it stays thin whatever the flux
          width: stub ? Math.min(width, 2) : width,
        },
        classes: `flow ${direction}${stub ? " stub-edge" : ""}${active ? "" : " idle"}`,
      });
    }
  }
  return [...nodes, ...edges];
}

const round = (v: number) => Math.round(v * 100) / 100;
