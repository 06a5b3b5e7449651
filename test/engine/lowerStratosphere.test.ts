/**
 * The reference mechanism's atmosphere against measured loss partitions: the
 * 24-hour solution with the default climatology, two-stream light and
 * sulfate aerosol. Shares are of the loss that the pathway analysis assigns
 * to cycles (the part below f_min, "unassigned", is left out of both the
 * numerator and the denominator), as measured partitions count the loss of
 * the radical families.
 */
import { describe, expect, it } from "vitest";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisResult, ConditionInput } from "@/lib/engine/types";
import { loadBuiltinMechanism } from "@/lib/mechanism";

const reference = loadBuiltinMechanism("reference").mechanism;
const ref = { id: "reference", title: reference.title };
/** mid-May at 37° N, the season and place of the in-situ radical flights of Wennberg et al. (1994) */
const MAY_37N: Partial<ConditionInput> = { latitude_deg: 37, date: "2026-05-15", mode: "diurnal" };

function analyse(condition: ConditionInput): AnalysisResult {
  return runAnalysis(reference, ref, { mechanismId: "reference", condition });
}

/** HOx, halogen (any family with ClOx or BrOx), NOx and Ox shares of the assigned Ox loss. */
function partition(r: AnalysisResult) {
  const families = r.cycles.budget.byFamily.filter((f) => f.family !== "unassigned");
  const assigned = families.reduce((a, f) => a + f.fraction, 0);
  const share = (test: (family: string) => boolean) =>
    families.filter((f) => test(f.family)).reduce((a, f) => a + f.fraction, 0) / assigned;
  return {
    HOx: share((f) => f === "HOx"),
    halogens: share((f) => /ClOx|BrOx/.test(f)),
    NOx: share((f) => f === "NOx"),
    Ox: share((f) => f === "Ox"),
  };
}

/** NOx/NOy at the reported local time (noon), NOy counting every nitrogen reservoir the mechanism has. */
function noxOverNoy(r: AnalysisResult): number {
  const n = (id: string) => {
    const i = reference.speciesIndex[id];
    return i === undefined ? 0 : r.diurnal!.atLocalTime_cm3[i];
  };
  const noy = ["NO", "NO2", "NO3", "HNO3", "HO2NO2", "ClONO2", "BrONO2"].reduce((a, s) => a + n(s), 0) + 2 * n("N2O5");
  return (n("NO") + n("NO2")) / noy;
}

describe("the lower and middle stratosphere of the reference mechanism (24-hour mode, 37° N, mid-May)", () => {
  for (const aerosol of [5, 10]) {
    it(`splits the 20 km Ox loss as measured with ${aerosol} µm² cm⁻³ of sulfate: HOx 40–60 %, halogens 25–45 %, NOx ≤ 25 % (Wennberg et al. 1994, Science 266, 398)`, () => {
      const r = analyse({ altitude_km: 20, ...MAY_37N, aerosolSurface_um2cm3: aerosol });
      expect(r.steadyState.status).toBe("converged");
      const p = partition(r);
      expect(p.HOx).toBeGreaterThanOrEqual(0.4);
      expect(p.HOx).toBeLessThanOrEqual(0.6);
      expect(p.halogens).toBeGreaterThanOrEqual(0.25);
      expect(p.halogens).toBeLessThanOrEqual(0.45);
      expect(p.NOx).toBeLessThanOrEqual(0.25);
    });
  }

  it("makes NOx the largest family at 25–40 km and HOx above 45 km (common textbook picture, e.g. Brasseur and Solomon 2005, ch. 5; from memory)", () => {
    for (const z of [25, 30, 35, 40]) {
      const p = partition(analyse({ altitude_km: z, ...MAY_37N }));
      expect(p.NOx, `NOx at ${z} km`).toBeGreaterThan(Math.max(p.HOx, p.halogens, p.Ox));
    }
    for (const z of [46, 50]) {
      const p = partition(analyse({ altitude_km: z, ...MAY_37N }));
      expect(p.HOx, `HOx at ${z} km`).toBeGreaterThan(Math.max(p.NOx, p.halogens, p.Ox));
    }
  });

  it("keeps NOx/NOy at 20 km by day within the band of in-situ measurements with aerosol of a few µm² cm⁻³, lower with more aerosol (0.08–0.25, from memory; Fahey et al. 1993, Nature 363, 509)", () => {
    const ratios = [1, 5, 10].map((a) =>
      noxOverNoy(analyse({ altitude_km: 20, ...MAY_37N, aerosolSurface_um2cm3: a })),
    );
    expect(ratios[1]).toBeGreaterThanOrEqual(0.08);
    expect(ratios[1]).toBeLessThanOrEqual(0.25);
    expect(ratios[2]).toBeLessThan(ratios[1]);
    expect(ratios[1]).toBeLessThan(ratios[0]);
  });
});
