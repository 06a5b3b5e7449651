import { describe, expect, it } from "vitest";
import { profileBandSeries } from "@/lib/profiles/series";
import { bandPolygons, shareBands } from "@/lib/uncertainty";
import type { MonteCarloResult } from "@/lib/uncertainty/types";

// invented bands (not computed): three levels, the top one without a range
const bands = [
  {
    family: "NOx",
    points: [
      { altitude_km: 30, median: 0.6, p05: 0.5, p95: 0.7 },
      { altitude_km: 35, median: 0.5, p05: 0.4, p95: 0.62 },
      { altitude_km: 40, median: null, p05: null, p95: null },
    ],
  },
  {
    family: "ClOx",
    points: [
      { altitude_km: 30, median: 0.1, p05: 0.05, p95: 0.15 },
      { altitude_km: 35, median: 0.2, p05: 0.12, p95: 0.3 },
      { altitude_km: 40, median: 0.3, p05: 0.2, p95: 0.4 },
    ],
  },
];

describe("band chart series", () => {
  it("draw each band up the 5 % curve and down the 95 % curve, split at a level without a range", () => {
    const polys = bandPolygons(
      bands[0],
      (s) => s * 100,
      (z) => 100 - z,
    );
    expect(polys).toEqual([
      [
        [50, 70],
        [40, 65],
        [62, 65],
        [70, 70],
      ],
    ]);
  });

  it("lay out the profile band chart in the profile charts' frame (data snapshot)", () => {
    expect(profileBandSeries(bands)).toMatchSnapshot();
  });

  it("take the budget bands from the family-share outputs only", () => {
    const mc = {
      outputs: [
        { key: "oxLoss", kind: "ox-loss", label: "", unit: "" },
        { key: "share:HOx", kind: "family-share", label: "", unit: "1", family: "HOx" },
      ],
      summaries: [
        { key: "oxLoss", central: 1, median: 1, p05: 1, p95: 1, count: 1, missing: 0 },
        { key: "share:HOx", central: 0.4, median: 0.41, p05: 0.3, p95: 0.5, count: 1, missing: 0 },
      ],
    } as unknown as MonteCarloResult;
    expect(shareBands(mc)).toEqual([{ family: "HOx", central: 0.4, median: 0.41, p05: 0.3, p95: 0.5 }]);
  });
});
