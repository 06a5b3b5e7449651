import { describe, expect, it } from "vitest";
import { altitudeAxis, pathSegments, rateAxis, signedAxis } from "@/lib/profiles/series/chartFrame";
import { differenceSeries } from "@/lib/profiles/series/differenceSeries";
import { familyColor } from "@/lib/profiles/series/familyColor";
import { familySplitSeries } from "@/lib/profiles/series/familySplitSeries";
import { lossProfileSeries } from "@/lib/profiles/series/lossProfileSeries";
import { familyStyle } from "@/lib/viz/familyStyle";

// Invented numbers: only the geometry is checked.
const LEVELS = [
  { altitude_km: 20, status: "converged", message: "", loss_cm3s: 2e5 },
  { altitude_km: 30, status: "converged", message: "", loss_cm3s: 3e6 },
  { altitude_km: 40, status: "max-iterations", message: "did not converge", loss_cm3s: null },
  { altitude_km: 50, status: "converged", message: "", loss_cm3s: 8e6 },
];

describe("chart frame", () => {
  it("puts higher altitudes higher on the page (smaller y)", () => {
    const { y, ticks } = altitudeAxis([10, 60], 10, 310);
    expect(y(10)).toBe(310);
    expect(y(60)).toBe(10);
    expect(y(35)).toBe(160);
    expect(ticks.map((t) => t.label)).toEqual(["10", "20", "30", "40", "50", "60"]);
  });

  it("maps rates linearly from zero or by decades, and signed values about a middle zero", () => {
    const lin = rateAxis([2e5, 8e6], 0, 100, "linear");
    expect(lin.x(0)).toBe(0);
    expect(lin.x(5e6)).toBe(50); // nice maximum 1e7 (1, 2, 2.5, 5 × 10ⁿ)
    const log = rateAxis([1e5, 1e7], 0, 100, "log");
    expect(log.x(1e6)).toBe(50);
    expect(log.ticks.map((t) => t.label)).toEqual(["10⁵", "10⁶", "10⁷"]);
    const s = signedAxis([-3e5, 1e6], 0, 200, "linear");
    expect(s.zeroX).toBe(100);
    expect(s.x(0)).toBe(100);
    expect(s.x(-1e6)).toBe(0);
    expect(signedAxis([-1e6, 1e6], 0, 200, "signed-log").x(-1e6)).toBe(0);
  });

  it("splits a line where a point is missing", () => {
    expect(pathSegments([{ x: 0, y: 0 }, { x: 1, y: 1 }, null, { x: 2, y: 2 }])).toEqual(["M0,0 L1,1", "M2,2"]);
  });
});

describe("lossProfileSeries", () => {
  it("draws each side with a gap and a marker at a failed level", () => {
    const s = lossProfileSeries(
      [
        { label: "A", levels: LEVELS },
        { label: "B", levels: LEVELS.map((l) => ({ ...l, loss_cm3s: l.loss_cm3s === null ? null : 2 * l.loss_cm3s })) },
      ],
      "log",
    );
    expect(s.lines.map((l) => l.paths.length)).toEqual([2, 2]);
    expect(s.lines[1].dash).not.toBe(s.lines[0].dash);
    expect(s.failed.map((f) => `${f.side} ${f.altitude_km} ${f.status}`)).toEqual([
      "A 40 max-iterations",
      "B 40 max-iterations",
    ]);
    expect(s).toMatchSnapshot();
  });
});

describe("familySplitSeries", () => {
  it("stacks the family fractions from 0 to 1 and labels each where it is widest", () => {
    const s = familySplitSeries(
      [
        { altitude_km: 20, fraction: { NOx: 0.8, Ox: 0.2 } },
        { altitude_km: 30, fraction: { NOx: 0.6, Ox: 0.3, ClOx: 0.1 } },
        { altitude_km: 40, fraction: null },
        { altitude_km: 50, fraction: { HOx: 0.7, Ox: 0.3 } },
      ],
      ["Ox", "HOx", "NOx", "ClOx"],
    );
    expect(s.areas.map((a) => a.paths.length)).toEqual([2, 2, 2, 2]);
    // the last family's right edge is at 100 % where the fractions sum to 1 (identity)
    const right = s.frame.plot.right;
    expect(s.areas[3].paths[0].startsWith(`M${right},`)).toBe(true);
    expect(s.areas.find((a) => a.family === "NOx")?.maxFraction).toBe(0.8);
    expect(s.areas.find((a) => a.family === "ClOx")?.labelAt).not.toBeNull();
    expect(s.failed.map((f) => f.altitude_km)).toEqual([40]);
    expect(s).toMatchSnapshot();
  });
});

describe("differenceSeries", () => {
  it("draws the total and the largest family changes, the rest summed", () => {
    const s = differenceSeries(
      [
        {
          altitude_km: 20,
          total_cm3s: 1e5,
          byFamily: { NOx: 8e4, Ox: 1e4, ClOx: 5e3, HOx: 3e3, BrOx: 1e3, "ClOx-NOx": 1e3 },
        },
        {
          altitude_km: 30,
          total_cm3s: -2e5,
          byFamily: { NOx: -1e5, Ox: -5e4, ClOx: -3e4, HOx: -1e4, BrOx: -5e3, "ClOx-NOx": -5e3 },
        },
        { altitude_km: 40, total_cm3s: null, byFamily: {} },
      ],
      ["Ox", "HOx", "NOx", "ClOx", "BrOx", "ClOx-NOx"],
      "linear",
      { maxFamilies: 3 },
    );
    expect(s.lines.map((l) => l.key)).toEqual(["total", "NOx", "Ox", "ClOx", "other"]);
    expect(s.lines[4].label).toBe("other families (3)");
    expect(s.lines[0].width).toBeGreaterThan(s.lines[1].width);
    expect(new Set(s.lines.map((l) => l.dash)).size).toBe(5);
  });
});

describe("familyColor", () => {
  it("reuses the explorer's family tints and gives coupled families the first member's frame tint", () => {
    expect(familyColor("ClOx").fill).toBe(familyStyle("ClOx").chip);
    expect(familyColor("ClOx-NOx").fill).toBe(familyStyle("ClOx").frame);
    expect(familyColor("ClOx-NOx").stroke).toBe(familyStyle("NOx").chipStroke);
    expect(familyColor("unassigned").fill).toBe("#e4e2dc");
  });
});
