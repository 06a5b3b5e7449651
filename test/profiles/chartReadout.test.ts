import { describe, expect, it } from "vitest";
import {
  type ChartReadout,
  nearestLevel,
  readoutLevels,
  readoutRows,
  readoutSentence,
  stepLevel,
  toggleHidden,
} from "@/lib/profiles/series/chartReadout";
import { type DifferenceLevel, differenceReadout, differenceSeries } from "@/lib/profiles/series/differenceSeries";
import { familySplitReadout } from "@/lib/profiles/series/familySplitSeries";
import { lossProfileReadout, lossProfileSeries } from "@/lib/profiles/series/lossProfileSeries";
import { profileBandReadout } from "@/lib/profiles/series/profileBandSeries";

// Invented numbers: only the lookup and the formatting are checked.
const LEVELS = [
  { altitude_km: 20, status: "converged", message: "", loss_cm3s: 2e5 },
  { altitude_km: 30, status: "converged", message: "", loss_cm3s: 3.25e6 },
  { altitude_km: 40, status: "max-iterations", message: "did not converge", loss_cm3s: null },
  { altitude_km: 50, status: "converged", message: "", loss_cm3s: 8e6 },
];

const loss = lossProfileSeries(
  [
    { label: "A", levels: LEVELS },
    { label: "B", levels: LEVELS.map((l) => ({ ...l, loss_cm3s: l.loss_cm3s === null ? null : 2 * l.loss_cm3s })) },
  ],
  "linear",
);

describe("readout levels", () => {
  it("lists every altitude once, lowest first, at the y where the chart draws it", () => {
    const r = lossProfileReadout(loss);
    expect(r.levels.map((l) => l.altitude_km)).toEqual([20, 30, 40, 50]);
    // the y of a converged level is the y of its point on the line; the failed level's is its marker's
    expect(r.levels[1].y).toBe(loss.lines[0].points[1].y);
    expect(r.levels[2].y).toBe(loss.failed[0].y);
    expect(readoutLevels([], (z) => z)).toEqual([]);
  });

  it("picks the level nearest to the pointer, the higher one on a tie", () => {
    const levels = [
      { altitude_km: 20, y: 300 },
      { altitude_km: 30, y: 200 },
      { altitude_km: 40, y: 100 },
    ];
    expect(nearestLevel(levels, 310)).toBe(0);
    expect(nearestLevel(levels, 240)).toBe(1);
    expect(nearestLevel(levels, 250)).toBe(1);
    expect(nearestLevel(levels, -50)).toBe(2);
    expect(nearestLevel([], 10)).toBe(-1);
  });

  it("throws if the pointer position is not a number", () => {
    expect(() => nearestLevel([{ altitude_km: 20, y: 1 }], Number.NaN)).toThrow(/nearestLevel: y must be/);
  });

  it("steps up and down the levels and stops at either end", () => {
    expect(stepLevel(4, -1, 1)).toBe(0);
    expect(stepLevel(4, -1, -1)).toBe(3);
    expect(stepLevel(4, 1, 1)).toBe(2);
    expect(stepLevel(4, 3, 1)).toBe(3);
    expect(stepLevel(4, 0, -1)).toBe(0);
    expect(stepLevel(4, 1, 5)).toBe(3);
    expect(stepLevel(0, -1, 1)).toBe(-1);
  });
});

describe("readout rows", () => {
  it("gives each shown series' value with its unit, as the site formats numbers", () => {
    const r = lossProfileReadout(loss);
    expect(readoutRows(r, 1).map((row) => `${row.label}: ${row.text}`)).toEqual([
      "A: 3.25 × 10⁶ molecules cm⁻³ s⁻¹",
      "B: 6.5 × 10⁶ molecules cm⁻³ s⁻¹",
    ]);
    expect(readoutRows(r, 1)[0].x).toBe(loss.lines[0].points[1].x);
    expect(readoutRows(r, 2).map((row) => row.text)).toEqual(["failed", "failed"]);
    expect(readoutRows(r, 2)[0].x).toBeUndefined();
    expect(readoutRows(r, 1, new Set(["side-0"])).map((row) => row.label)).toEqual(["B"]);
    expect(readoutRows(r, 9)).toEqual([]);
  });

  it("writes a sentence for the live region", () => {
    const r = lossProfileReadout(loss);
    expect(readoutSentence(r, 0, new Set(["side-1"]))).toBe("20 km: A 2 × 10⁵ molecules cm⁻³ s⁻¹");
    expect(readoutSentence(r, -1)).toBe("");
  });

  it("shows '—' where a series has no point at a level", () => {
    const r: ChartReadout = {
      levels: [
        { altitude_km: 20, y: 10 },
        { altitude_km: 25, y: 5 },
      ],
      series: [{ key: "a", label: "a", unit: "K", format: "number", points: [{ altitude_km: 20, value: 216.65 }] }],
    };
    expect(readoutRows(r, 0)[0].text).toBe("217 K");
    expect(readoutRows(r, 1)[0].text).toBe("—");
  });

  it("reads the split chart as percentages of the families that have any share", () => {
    const r = familySplitReadout(
      [
        { altitude_km: 20, fraction: { NOx: 0.8, Ox: 0.2 } },
        { altitude_km: 30, fraction: null },
        { altitude_km: 40, fraction: { NOx: 0.35, Ox: 0.65 } },
      ],
      ["Ox", "HOx", "NOx"],
    );
    expect(r.series.map((s) => s.key)).toEqual(["Ox", "NOx"]);
    expect(readoutRows(r, 0).map((row) => row.text)).toEqual(["20 %", "80 %"]);
    expect(readoutRows(r, 1).map((row) => row.text)).toEqual(["failed", "failed"]);
    // stacked areas have no single x per family: no marker on the rule
    expect(readoutRows(r, 2).every((row) => row.x === undefined)).toBe(true);
  });

  it("reads the difference chart line by line, with the same keys and labels as the lines", () => {
    const levels: DifferenceLevel[] = [
      { altitude_km: 20, total_cm3s: 1e5, byFamily: { NOx: 8e4, Ox: 1e4, HOx: 1e4 } },
      { altitude_km: 30, total_cm3s: -2e5, byFamily: { NOx: -1.5e5, Ox: -3e4, HOx: -2e4 } },
      { altitude_km: 40, total_cm3s: null, byFamily: {} },
    ];
    const fam = ["Ox", "HOx", "NOx"];
    const s = differenceSeries(levels, fam, "linear", { maxFamilies: 2 });
    const r = differenceReadout(levels, fam, "linear", { maxFamilies: 2 });
    expect(r.series.map((x) => [x.key, x.label])).toEqual(s.lines.map((l) => [l.key, l.label]));
    expect(readoutRows(r, 1).map((row) => row.text)).toEqual([
      "−2 × 10⁵ molecules cm⁻³ s⁻¹",
      "−1.5 × 10⁵ molecules cm⁻³ s⁻¹",
      "−3 × 10⁴ molecules cm⁻³ s⁻¹",
      "−2 × 10⁴ molecules cm⁻³ s⁻¹",
    ]);
    // the total's marker sits on its line: the line passes through (x, y) of the readout
    const total = readoutRows(r, 1)[0];
    expect(s.lines[0].paths[0]).toContain(`${total.x},${r.levels[1].y}`);
    expect(readoutRows(r, 2)[0].text).toBe("failed");
  });
});

describe("legend toggles", () => {
  const keys = ["a", "b", "c"];
  it("hides and shows a series", () => {
    const h1 = toggleHidden(new Set(), "a", keys);
    expect([...h1]).toEqual(["a"]);
    expect([...toggleHidden(h1, "a", keys)]).toEqual([]);
  });

  it("keeps the last shown series", () => {
    const h = toggleHidden(toggleHidden(new Set(), "a", keys), "b", keys);
    expect(toggleHidden(h, "c", keys)).toBe(h);
    expect([...toggleHidden(h, "b", keys)]).toEqual(["a"]);
  });

  it("throws if the key is not a series of the chart", () => {
    expect(() => toggleHidden(new Set(), "z", keys)).toThrow(/toggleHidden: no series "z"/);
  });
});

describe("band readout", () => {
  it("gives each family's median share with its 5–95 % range, and 'failed' where the level failed", () => {
    const r = profileBandReadout([
      {
        family: "ClOx",
        points: [
          { altitude_km: 30, median: 0.62, p05: 0.55, p95: 0.7 },
          { altitude_km: 35, median: null, p05: null, p95: null },
        ],
      },
    ]);
    expect(readoutRows(r, 0)[0].text).toBe("62 % (55 % – 70 %)");
    expect(readoutRows(r, 1)[0].text).toBe("failed");
  });
});
