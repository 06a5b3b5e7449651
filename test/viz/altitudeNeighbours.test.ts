import { describe, expect, it } from "vitest";
import type { AnalysisRequest } from "@/lib/engine/types";
import { ALTITUDE_SLIDER, altitudeNeighbours } from "@/lib/viz/altitudeNeighbours";

const at = (altitude_km: number, extra: Partial<AnalysisRequest["condition"]> = {}): AnalysisRequest => ({
  mechanismId: "reference",
  condition: { altitude_km, ...extra },
});
const altitudes = (r: AnalysisRequest[]) => r.map((x) => x.condition.altitude_km);

describe("altitudeNeighbours", () => {
  it("gives the slider's grid points one step below and above, nearest first", () => {
    expect(altitudes(altitudeNeighbours(at(30)))).toEqual([29.5, 30.5]);
    expect(altitudes(altitudeNeighbours(at(0.5)))).toEqual([0, 1]);
  });

  it("stays inside the slider's range", () => {
    expect(altitudes(altitudeNeighbours(at(ALTITUDE_SLIDER.min_km)))).toEqual([0.5]);
    expect(altitudes(altitudeNeighbours(at(ALTITUDE_SLIDER.max_km)))).toEqual([59.5]);
    expect(altitudes(altitudeNeighbours(at(75)))).toEqual([]);
  });

  it("steps an altitude off the grid to the grid points on either side, as the slider does", () => {
    expect(altitudes(altitudeNeighbours(at(30.2)))).toEqual([30, 30.5]);
  });

  it("keeps the rest of the request, with the condition's keys in the same order, so the cache keys match", () => {
    const r: AnalysisRequest = { ...at(20, { T_K: 215, latitude_deg: 70 }), options: { mode: "diurnal" } as never };
    const [below] = altitudeNeighbours(r);
    expect(JSON.stringify(below)).toBe(JSON.stringify({ ...r, condition: { ...r.condition, altitude_km: 19.5 } }));
  });

  it("gives nothing for an altitude that is not a number", () => {
    expect(altitudeNeighbours(at(Number.NaN))).toEqual([]);
  });
});
