import { describe, expect, it } from "vitest";
import { parseAnalysisRequest } from "@/lib/engine/requestSchema";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisRequest } from "@/lib/engine/types";
import { InputError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { sensitivitiesCsv, uncertaintyCsv, uncertaintyNotes } from "@/lib/service/csv";
import { bandPolygons, profileShareBands, rankAgainstAltitude } from "@/lib/uncertainty";

const mech = loadBuiltinMechanism("oxygen-chlorine").mechanism;
const ref = { id: "oxygen-chlorine", title: mech.title };
const analyse = (condition: AnalysisRequest["condition"], options: AnalysisRequest["options"]) =>
  runAnalysis(mech, ref, { mechanismId: "oxygen-chlorine", condition, options });

describe("the uncertainty options of an analysis", () => {
  it("add sensitivities and Monte Carlo ranges to the result when asked, and nothing otherwise", () => {
    expect(analyse({ altitude_km: 40 }, {}).uncertainty).toBeUndefined();
    const r = analyse({ altitude_km: 40 }, { sensitivity: true, uncertaintySamples: 12, uncertaintySeed: 4 });
    expect(r.uncertainty?.sensitivity?.status).toBe("ok");
    expect(r.uncertainty?.monteCarlo?.samples).toBe(12);
    expect(r.uncertainty?.monteCarlo?.seed).toBe(4);
    const again = analyse({ altitude_km: 40 }, { uncertaintySamples: 12, uncertaintySeed: 4 });
    expect(again.uncertainty?.monteCarlo?.summaries).toEqual(r.uncertainty?.monteCarlo?.summaries);
    expect(uncertaintyCsv(r).split("\r\n")[0]).toMatch(/^key,kind,label/);
    expect(sensitivitiesCsv(r).split("\r\n").length).toBeGreaterThan(10);
    // without ranges the table is empty and the provenance block says why
    const plain = analyse({ altitude_km: 40 }, {});
    expect(uncertaintyCsv(plain)).toBe("");
    expect(uncertaintyNotes(plain)).toEqual([
      ["note", "no Monte Carlo ranges: request options.uncertaintySamples > 0"],
    ]);
  });

  it("skip both with a warning in the 24-hour mode", () => {
    const r = analyse({ altitude_km: 40, mode: "diurnal" }, { sensitivity: true, uncertaintySamples: 5 });
    expect(r.uncertainty?.sensitivity).toBeUndefined();
    expect(r.uncertainty?.monteCarlo).toBeUndefined();
    expect(r.uncertainty?.warnings.join(" ")).toMatch(/24-hour mode/);
  });

  it("throws if the sample count or the seed is not an allowed integer", () => {
    const body = (options: object) => ({ mechanismId: "oxygen", condition: { altitude_km: 30 }, options });
    expect(parseAnalysisRequest(body({ uncertaintySamples: 100, sensitivity: true })).options?.uncertaintySamples).toBe(
      100,
    );
    expect(() => parseAnalysisRequest(body({ uncertaintySamples: 1.5 }))).toThrow(InputError);
    expect(() => parseAnalysisRequest(body({ uncertaintySamples: 200_000 }))).toThrow(/uncertaintySamples/);
    expect(() => parseAnalysisRequest(body({ uncertaintySeed: -3 }))).toThrow(/uncertaintySeed/);
    expect(() => parseAnalysisRequest(body({ sensitivity: "yes" }))).toThrow(InputError);
  });
});

describe("ranges and sensitivities against altitude", () => {
  const levels = [30, 35, 40].map((z) => {
    const r = analyse({ altitude_km: z }, { sensitivity: true, uncertaintySamples: 10 });
    return {
      altitude_km: z,
      monteCarlo: r.uncertainty?.monteCarlo ?? null,
      report: r.uncertainty?.sensitivity ?? null,
    };
  });

  it("give one band per family with a point at every level, gaps where a level has no range", () => {
    const bands = profileShareBands([...levels, { altitude_km: 45, monteCarlo: null }]);
    const clox = bands.find((b) => b.family === "ClOx");
    expect(clox?.points.map((p) => p.altitude_km)).toEqual([30, 35, 40, 45]);
    expect(clox?.points[3].p05).toBeNull();
    for (const p of clox?.points.slice(0, 3) ?? []) expect(p.p05 as number).toBeLessThanOrEqual(p.p95 as number);
    const polys = bandPolygons(
      clox ?? { family: "", points: [] },
      (s) => s * 100,
      (z) => 100 - z,
    );
    expect(polys.length).toBe(1);
    expect(polys[0].length).toBe(6); // 3 levels up the 5 % curve, 3 down the 95 % curve
  });

  it("rank the rate constants at every level of a profile over the union of the levels' top lists", () => {
    const t = rankAgainstAltitude(levels, "density:ClO", { top: 3 });
    expect(t.altitude_km).toEqual([30, 35, 40]);
    expect(t.parameters.length).toBeGreaterThanOrEqual(3);
    expect(t.coefficients.every((row) => row.length === 3)).toBe(true);
  });
});
