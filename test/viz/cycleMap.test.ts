import { describe, expect, it } from "vitest";
import { familyOf } from "@/lib/analysis/familyOf";
import { cycleMap, loopFamilies } from "@/lib/viz/cycleMap";
import { cycleMapSvg } from "@/lib/viz/cycleMapSvg";
import { expectClose } from "../helpers/close";
import { fixtureMechanism, fixtureResult } from "./fixture";

// the fixture's cycles and shares are invented round values (test/viz/fixture.ts)
const report = fixtureResult.cycles;
const map = cycleMap(report, fixtureMechanism);
const famOf = new Map(fixtureMechanism.species.map((s) => [s.id, familyOf(s)]));

describe("cycleMap", () => {
  it("draws one loop per cycle, largest Ox loss first, through the families its steps touch", () => {
    expect(map.loops.map((l) => l.cycleId)).toEqual(["C1+C2", "K3", "2C1+C3+C4"]);
    expect(map.loops.map((l) => l.through)).toEqual([["Ox", "ClOx"], ["Ox"], ["Ox", "ClOx"]]);
    expect(map.nodes.map((n) => n.family).sort()).toEqual(["ClOx", "Ox"]);
  });

  it("makes loop widths proportional to the Ox loss (above the thinnest width)", () => {
    const [a, b] = map.loops;
    // fixture: 1.6e6 and 1.2e6 molecules cm⁻³ s⁻¹
    expect(a.width).toBe(12);
    expectClose(b.width / a.width, 1.2 / 1.6, { abs: 5e-3 }, "width ratio");
    // 12 × 1.0e5 / 1.6e6 = 0.75 px is below the thinnest width drawn
    expect(map.loops[2].width).toBe(1);
  });

  it("labels each loop with its share, and the drawn and folded shares add up to the cycles' total (identity)", () => {
    expect(map.loops[0].label.text).toBe("55 %");
    const small = cycleMap(report, fixtureMechanism, { maxLoops: 1 });
    expect(small.loops).toHaveLength(1);
    expect(small.other.count).toBe(2);
    const drawn = small.loops.reduce((a, l) => a + l.share, 0);
    expectClose(
      drawn + small.other.share,
      report.cycles.reduce((a, c) => a + c.share, 0),
      { abs: 5e-13 },
      "shares",
    );
  });

  it("nests loops through the same families so that they do not lie on top of each other", () => {
    const [outer, , inner] = map.loops;
    expect(outer.path).not.toBe(inner.path);
    expect(Math.hypot(outer.label.x - inner.label.x, outer.label.y - inner.label.y)).toBeGreaterThanOrEqual(16);
  });

  it("keeps every node in place when the shares change (stable across altitudes)", () => {
    const halved = { cycles: report.cycles.map((c) => ({ ...c, oxLoss_cm3s: c.oxLoss_cm3s / 2, share: c.share / 2 })) };
    expect(cycleMap(halved, fixtureMechanism).nodes).toEqual(map.nodes);
  });

  it("finds reservoirs among the families a loop passes", () => {
    const step = { reactionId: "x", equation: "ClO + O -> Cl + O2", multiplicity: 1, rate_cm3s: 1 };
    const viaHcl = { steps: [step, { ...step, equation: "Cl + CH4 -> HCl + CH3" }] };
    expect(loopFamilies(viaHcl, famOf)).toEqual(["Ox", "reservoir", "ClOx"]);
  });

  it("draws nothing but the Ox node before an analysis", () => {
    const empty = cycleMap(null, fixtureMechanism);
    expect(empty.loops).toEqual([]);
    expect(empty.nodes.map((n) => n.family)).toEqual(["Ox"]);
  });

  it("throws if maxLoops is not a count", () => {
    expect(() => cycleMap(report, fixtureMechanism, { maxLoops: Number.NaN })).toThrow(/cycleMap: invalid maxLoops/);
  });
});

describe("cycleMapSvg", () => {
  it("matches the stored snapshot", () => {
    expect(cycleMapSvg(map, { title: "fixture" })).toMatchSnapshot();
  });

  it("draws one path per loop and fades the others when one is selected", () => {
    const svg = cycleMapSvg(map, { selected: "K3" });
    expect(svg.match(/<path class="loop"/g)).toHaveLength(3);
    expect(svg.match(/opacity="0.25"/g)).toHaveLength(2);
  });
});
