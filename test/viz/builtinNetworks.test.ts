/**
 * The network of every built-in mechanism as a first-time reader sees it:
 * labels that never overlap, bath gases as stubs, positions that do not move
 * with the altitude, and a default detail that keeps the reference
 * mechanism's picture small. Snapshots store the layout data (positions,
 * label boxes, hidden counts) at 20, 30 and 40 km.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisResult } from "@/lib/engine/types";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { BUILTIN_MECHANISMS } from "@/lib/mechanisms";
import { cycleMap, shareLabelBox } from "@/lib/viz/cycleMap";
import { intersects, type Rect, rectAround } from "@/lib/viz/labelBox";
import { networkElements } from "@/lib/viz/networkElements";
import { networkLayout } from "@/lib/viz/networkLayout";
import { reactionDetail } from "@/lib/viz/reactionDetail";
import type { GraphNode } from "@/lib/viz/types";
import { builtinView } from "./builtinView";

const ALTITUDES_KM = [20, 30, 40];

const results = new Map<string, AnalysisResult>();
beforeAll(() => {
  for (const { id } of BUILTIN_MECHANISMS) {
    const m = loadBuiltinMechanism(id).mechanism;
    for (const z of ALTITUDES_KM)
      results.set(
        `${id}@${z}`,
        runAnalysis(m, { id, title: m.title }, { mechanismId: id, condition: { altitude_km: z } }),
      );
  }
}, 120_000);

/** Every pair of boxes that share area, as "a × b". */
function clashes(boxes: (Rect & { id: string })[]): string[] {
  const out: string[] = [];
  for (let i = 0; i < boxes.length; i++)
    for (let j = i + 1; j < boxes.length; j++)
      if (intersects(boxes[i], boxes[j])) out.push(`${boxes[i].id} × ${boxes[j].id}`);
  return out;
}

const positions = (els: ReturnType<typeof networkElements>) =>
  new Map(els.filter((e): e is GraphNode => e.group === "nodes" && !!e.position).map((e) => [e.data.id, e.position!]));

describe.each(BUILTIN_MECHANISMS.map((m) => m.id))("the %s network", (id) => {
  const mech = builtinView(id);
  const layout = networkLayout(mech);

  it("has no two label boxes that intersect (chips, frame titles, reaction ids, stubs)", () => {
    expect(layout.labels.length).toBeGreaterThan(mech.reactions.length);
    expect(clashes(layout.labels)).toEqual([]);
  });

  it("draws O2 and the bath gases as short stubs beside each reaction, never as one chip", () => {
    expect(layout.species.O2).toBeUndefined();
    expect(layout.species.N2).toBeUndefined();
    const stubs = Object.entries(layout.stubs).flatMap(([rid, list]) => list.map((s) => ({ rid, ...s })));
    expect(stubs.some((s) => s.speciesId === "O2")).toBe(true);
    for (const s of stubs) {
      const r = layout.reactions[s.rid];
      expect(Math.hypot(s.x - r.x, s.y - r.y), `${s.rid}:${s.speciesId}`).toBeLessThan(60);
    }
  });

  it.each(ALTITUDES_KM)("keeps every node where it is at %i km (colours and widths change, not positions)", (z) => {
    const r = results.get(`${id}@${z}`)!;
    const base = positions(networkElements(mech, layout, results.get(`${id}@30`)!));
    const detail = reactionDetail(mech, r);
    for (const [node, p] of positions(networkElements(mech, layout, r, { visible: new Set(detail.shown) })))
      expect(p, node).toEqual(base.get(node));
  });

  it("draws no reaction with zero flux and counts every hidden one", () => {
    for (const z of ALTITUDES_KM) {
      const r = results.get(`${id}@${z}`)!;
      const d = reactionDetail(mech, r);
      const rate = new Map(r.steadyState.reactions.map((x) => [x.id, x.rate_cm3s]));
      expect(d.shown.every((rid) => rate.get(rid)! > 0)).toBe(true);
      expect(d.shown.length + d.hidden).toBe(mech.reactions.length);
    }
  });

  it.each(ALTITUDES_KM)(
    "labels the cycle map at %i km without two share labels or a label and a node overlapping",
    (z) => {
      const map = cycleMap(results.get(`${id}@${z}`)!.cycles, mech);
      const boxes = [
        ...map.loops.map((l) => ({ id: l.cycleId, ...shareLabelBox(l.label, l.label.text) })),
        ...map.nodes.map((n) => ({ id: n.family, ...rectAround(n, n.r, n.r) })),
      ];
      const clashes: string[] = [];
      for (let i = 0; i < boxes.length; i++)
        for (let j = i + 1; j < boxes.length; j++)
          if (intersects(boxes[i], boxes[j])) clashes.push(`${boxes[i].id} × ${boxes[j].id}`);
      expect(clashes).toEqual([]);
    },
  );

  it("matches the stored layout data at 20, 30 and 40 km", () => {
    const rows = [
      ...Object.entries(layout.species).map(([s, p]) => `s:${s} ${p.x},${p.y} ${p.family}`),
      ...Object.entries(layout.reactions).map(([rid, p]) => `r:${rid} ${p.x},${p.y}`),
      ...Object.entries(layout.stubs).flatMap(([rid, l]) => l.map((s) => `t:${rid}:${s.speciesId} ${s.x},${s.y}`)),
      ...layout.labels.map((b) => `box ${b.id} ${b.x0},${b.y0},${b.x1},${b.y1}`),
    ];
    const detail = Object.fromEntries(
      ALTITUDES_KM.map((z) => {
        const d = reactionDetail(mech, results.get(`${id}@${z}`)!);
        return [`${z} km`, { shown: d.shown.length, hidden: d.hidden, zeroFlux: d.zeroFlux }];
      }),
    );
    expect({ layout: rows, detail }).toMatchSnapshot();
  });
});

describe("the default detail of the reference mechanism", () => {
  it("draws at most 40 reactions between 30 and 40 km", () => {
    const mech = builtinView("reference");
    const m = loadBuiltinMechanism("reference").mechanism;
    for (const z of [30, 35, 40]) {
      const r =
        results.get(`reference@${z}`) ??
        runAnalysis(
          m,
          { id: "reference", title: m.title },
          { mechanismId: "reference", condition: { altitude_km: z } },
        );
      const d = reactionDetail(mech, r);
      expect(d.shown.length, `${z} km`).toBeLessThanOrEqual(40);
      expect(d.hidden, `${z} km`).toBeGreaterThan(0);
      // the drawn reactions carry nearly all of the flux: the hidden ones are the slow tail
      expect(d.covered!, `${z} km`).toBeGreaterThan(0.99);
    }
  });
});

describe("a mechanism of 2,000 species (invented, generated here)", () => {
  it("still lays out: every reaction gets a spot, those without room near their species in the lane below", () => {
    const species = Array.from({ length: 2000 }, (_, i) => ({
      id: `X${i}`,
      label: `X${i}`,
      role: "solved" as const,
      atoms: { C: 1 },
    }));
    const reactions = Array.from({ length: 3000 }, (_, i) => ({
      id: `R${i}`,
      equation: `X${i % 2000} + X${(i * 7) % 2000} -> X${(i * 13 + 1) % 2000}`,
      rate: { law: "arrhenius" as const, A: 1e-12, EoverR_K: 0 },
    }));
    const layout = networkLayout({ species, reactions });
    expect(Object.keys(layout.reactions)).toHaveLength(3000);
    const chipsBottom = Math.max(...Object.values(layout.species).map((p) => p.y));
    expect(Object.values(layout.reactions).some((p) => p.y > chipsBottom)).toBe(true);
  }, 60_000);
});
