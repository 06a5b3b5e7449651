import { describe, expect, it } from "vitest";
import { CHIP_HEIGHT_PX, chipWidth } from "@/lib/viz/chipWidth";
import { cycleHighlight } from "@/lib/viz/cycleHighlight";
import { equationView } from "@/lib/viz/equationView";
import { IDLE_COLOR, networkElements } from "@/lib/viz/networkElements";
import { networkLayout } from "@/lib/viz/networkLayout";
import { networkLegend } from "@/lib/viz/networkLegend";
import { networkStyle } from "@/lib/viz/networkStyle";
import type { EdgeData, GraphElement, GraphNode } from "@/lib/viz/types";
import { fixtureMechanism, fixtureResult, scaledResult } from "./fixture";

const layout = networkLayout(fixtureMechanism);
const edges = (els: GraphElement[]) => els.filter((e) => e.group === "edges").map((e) => e.data as EdgeData);
const positions = (els: GraphElement[]) =>
  Object.fromEntries(
    els.filter((e): e is GraphNode => e.group === "nodes" && !!e.position).map((e) => [e.data.id, e.position]),
  );

describe("equationView", () => {
  it("reads coefficients and drops M and hv into flags", () => {
    expect(equationView("2 ClO + M -> Cl2O2 + M")).toEqual({
      reactants: [{ species: "ClO", coef: 2 }],
      products: [{ species: "Cl2O2", coef: 1 }],
      photolysis: false,
      thirdBody: true,
    });
    const j = equationView("O3 + hv -> O(1D) + O2");
    expect(j.photolysis).toBe(true);
    expect(j.products.map((t) => t.species)).toEqual(["O(1D)", "O2"]);
  });

  it("adds up a species written twice on one side", () => {
    expect(equationView("O + O -> O2").reactants).toEqual([{ species: "O", coef: 2 }]);
  });

  it("throws if there is no arrow", () => {
    expect(() => equationView("O + O3")).toThrow(/no arrow/);
  });
});

describe("networkLayout", () => {
  it("is deterministic", () => {
    expect(networkLayout(fixtureMechanism)).toEqual(layout);
  });

  it("places every drawn species and every reaction, and never the third body", () => {
    for (const s of fixtureMechanism.species.filter((s) => s.role !== "third-body" && !["O2", "N2"].includes(s.id)))
      expect(layout.species[s.id]).toBeDefined();
    expect(layout.species.M).toBeUndefined();
    for (const r of fixtureMechanism.reactions) expect(layout.reactions[r.id]).toBeDefined();
  });

  it("gives O2 and N2 a stub beside each reaction that changes them, instead of a chip", () => {
    expect(layout.species.O2).toBeUndefined();
    // O(1D) + N2 -> O + N2 leaves N2 unchanged: no stub; O + O3 -> 2 O2 makes O2: one stub
    expect(layout.stubs.K2).toEqual([]);
    expect(layout.stubs.K3.map((s) => s.speciesId)).toEqual(["O2"]);
    const k3 = networkElements(fixtureMechanism, layout, fixtureResult).filter((e) => e.data.id.includes("K3"));
    expect(k3.map((e) => e.data.id)).toContain("e:K3:out:O2");
    expect(k3.find((e) => e.data.id === "e:K3:out:O2")!.data).toMatchObject({ target: "t:K3:O2", direction: "out" });
  });

  it("keeps reaction nodes off the species chips and apart from each other", () => {
    const rx = Object.values(layout.reactions);
    for (const s of fixtureMechanism.species.filter((x) => layout.species[x.id])) {
      const p = layout.species[s.id];
      for (const r of rx) {
        const inside =
          Math.abs(r.x - p.x) < chipWidth(s.label) / 2 + 10 && Math.abs(r.y - p.y) < CHIP_HEIGHT_PX / 2 + 10;
        expect(inside, `${s.id} vs reaction at ${r.x},${r.y}`).toBe(false);
      }
    }
    for (let i = 0; i < rx.length; i++)
      for (let j = i + 1; j < rx.length; j++)
        expect(Math.hypot(rx[i].x - rx[j].x, rx[i].y - rx[j].y)).toBeGreaterThanOrEqual(24);
  });

  it("keeps each species nearer its own family's centre than any other family's", () => {
    for (const [id, p] of Object.entries(layout.species)) {
      const d = layout.frames.map((f) => ({ f: f.family, d: Math.hypot(f.center.x - p.x, f.center.y - p.y) }));
      d.sort((a, b) => a.d - b.d);
      expect(d[0].f, id).toBe(p.family);
    }
  });

  it("puts odd oxygen in the middle column with ClOx to its lower left", () => {
    const ox = layout.frames.find((f) => f.family === "Ox")!.center;
    const cl = layout.frames.find((f) => f.family === "ClOx")!.center;
    expect(cl.x).toBeLessThan(ox.x);
    expect(cl.y).toBeGreaterThan(ox.y);
  });
});

describe("networkElements", () => {
  const flux = networkElements(fixtureMechanism, layout, fixtureResult, { colorMode: "flux" });

  it("matches the stored snapshot (elements as data)", () => {
    expect(flux).toMatchSnapshot();
  });

  it("draws one edge per species whose net coefficient is not zero", () => {
    // O(1D) + N2 -> O + N2: N2 is a spectator, so only O(1D) in and O out
    expect(
      edges(flux)
        .filter((e) => e.reactionId === "K2")
        .map((e) => e.id),
    ).toEqual(["e:K2:in:O(1D)", "e:K2:out:O"]);
    // 2 ClO + M -> Cl2O2 + M: coefficient 2 kept, M not drawn
    const c3 = edges(flux).filter((e) => e.reactionId === "C3");
    expect(c3.map((e) => [e.speciesId, e.coef])).toEqual([
      ["ClO", 2],
      ["Cl2O2", 1],
    ]);
  });

  it("connects every edge to nodes that exist", () => {
    const ids = new Set(flux.filter((e) => e.group === "nodes").map((e) => e.data.id));
    for (const e of edges(flux)) {
      expect(ids.has(e.source), e.id).toBe(true);
      expect(ids.has(e.target), e.id).toBe(true);
    }
  });

  it("makes faster reactions wider", () => {
    const w = (rid: string) => edges(flux).find((e) => e.reactionId === rid)!.width;
    expect(w("K1")).toBeGreaterThan(w("C1"));
    expect(w("C1")).toBeGreaterThan(w("C5"));
  });

  it("changes edge colours, not positions or widths, when the colour mode changes", () => {
    const ox = networkElements(fixtureMechanism, layout, fixtureResult, { colorMode: "ox" });
    expect(positions(ox)).toEqual(positions(flux));
    expect(edges(ox).map((e) => e.width)).toEqual(edges(flux).map((e) => e.width));
    const changed = edges(ox).filter((e, i) => e.color !== edges(flux)[i].color);
    expect(changed.length).toBeGreaterThan(edges(ox).length / 2);
  });

  it("colours Ox-destroying reactions orange-side and O2 photolysis blue-side in the ox mode", () => {
    const ox = networkElements(fixtureMechanism, layout, fixtureResult, { colorMode: "ox" });
    const colorOf = (rid: string) => edges(ox).find((e) => e.reactionId === rid)!.color;
    const rgb = (hex: string) => [1, 3, 5].map((i) => Number.parseInt(hex.slice(i, i + 2), 16));
    const [r1, , b1] = rgb(colorOf("C1"));
    expect(r1).toBeGreaterThan(b1);
    const [r2, , b2] = rgb(colorOf("J1"));
    expect(b2).toBeGreaterThan(r2);
  });

  it("keeps every position when the analysis changes (stable layout across altitudes)", () => {
    const other = networkElements(fixtureMechanism, layout, scaledResult(30));
    expect(positions(other)).toEqual(positions(flux));
    expect(edges(other).map((e) => e.width)).not.toEqual(edges(flux).map((e) => e.width));
  });

  it("hides held species and their edges on request, and nothing else moves", () => {
    const bare = networkElements(fixtureMechanism, layout, fixtureResult, { showHeld: false });
    const ids = bare.map((e) => e.data.id);
    expect(ids).not.toContain("s:O2");
    expect(ids).not.toContain("s:CH4");
    expect(ids).not.toContain("f:held");
    expect(edges(bare).some((e) => e.speciesId === "O2")).toBe(false);
    const p = positions(flux);
    for (const [id, q] of Object.entries(positions(bare))) expect(q).toEqual(p[id]);
  });

  it("draws idle grey dashed elements when there is no analysis yet", () => {
    const none = networkElements(fixtureMechanism, layout, null);
    expect(edges(none).every((e) => e.color === IDLE_COLOR && e.rate_cm3s === 0)).toBe(true);
    expect(none.filter((e) => e.group === "edges").every((e) => e.classes.includes("idle"))).toBe(true);
  });
});

describe("networkStyle", () => {
  it("matches the stored snapshot (style as data)", () => {
    expect(networkStyle()).toMatchSnapshot();
  });

  it("takes every colour and width of the flow from the element data", () => {
    const flow = networkStyle().find((r) => r.selector === "edge.flow")!;
    expect(flow.style["line-color"]).toBe("data(color)");
    expect(flow.style.width).toBe("data(width)");
  });
});

describe("networkLegend", () => {
  it("labels the flux ramp with the decades that the elements use, largest at the right", () => {
    const lg = networkLegend(fixtureResult, "flux");
    expect(lg.unit).toBe("molecules cm⁻³ s⁻¹");
    expect(lg.ticks.at(-1)!.label).toBe("10⁸");
    expect(lg.ticks.at(-1)!.offset).toBe(1);
    const offs = lg.ticks.map((t) => t.offset);
    expect(offs.every((o) => o >= 0 && o <= 1)).toBe(true);
    expect([...offs].sort((a, b) => a - b)).toEqual(offs);
    expect(lg.widths.length).toBeGreaterThanOrEqual(2);
    expect(lg.widths[0].width).toBeLessThan(lg.widths.at(-1)!.width);
  });

  it("names both sides of the odd-oxygen ramp and puts zero in the middle", () => {
    const lg = networkLegend(fixtureResult, "ox");
    expect(lg.lowLabel).toMatch(/produced/);
    expect(lg.highLabel).toMatch(/destroyed/);
    expect(lg.ticks.find((t) => t.label === "0")!.offset).toBe(0.5);
    expect(lg.stops[0].color).not.toBe(lg.stops.at(-1)!.color);
  });
});

describe("cycleHighlight", () => {
  it("lights the cycle's reactions, their edges and species, and dims the rest", () => {
    const cyc = fixtureResult.cycles.cycles[0];
    const h = cycleHighlight(flux(), cyc);
    expect(h.on).toContain("r:C1");
    expect(h.on).toContain("r:C2");
    expect(h.on).toContain("s:ClO");
    expect(h.on).toContain("e:C2:in:ClO");
    expect(h.off).toContain("r:K3");
    expect(h.off).toContain("s:HCl");
    // a partition of all elements
    expect(h.on.length + h.off.length).toBe(flux().length);
    expect(h.on.filter((id) => h.off.includes(id))).toEqual([]);
  });

  it("does nothing when no cycle is selected", () => {
    expect(cycleHighlight(flux(), null)).toEqual({ on: [], off: [] });
  });
});

function flux() {
  return networkElements(fixtureMechanism, layout, fixtureResult);
}

describe("networkElements on a large mechanism", () => {
  it("draws only the species that the drawn reactions touch when asked to", () => {
    const els = networkElements(fixtureMechanism, layout, fixtureResult, {
      visible: new Set(["C1"]),
      onlyTouched: true,
    });
    const species = els.filter((e) => e.data.kind === "species").map((e) => e.data.id);
    // C1: Cl + O3 -> ClO + O2 (O2 is a stub, not a chip)
    expect(species.sort()).toEqual(["s:Cl", "s:ClO", "s:O3"]);
  });
});
