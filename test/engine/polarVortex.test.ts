/**
 * The invented cold late-winter vortex parcel (lib/engine/demoConditions.ts)
 * on the reference mechanism: chlorine activated on the cloud particles, and
 * the ClO dimer (Molina and Molina 1987) and ClO–BrO (McElroy et al. 1986)
 * cycles carrying the halogen ozone loss. docs/references.md,
 * "Heterogeneous chemistry".
 */
import { describe, expect, it } from "vitest";
import { POLAR_VORTEX_DEMO } from "@/lib/engine/demoConditions";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisResult, ConditionInput } from "@/lib/engine/types";
import { loadBuiltinMechanism } from "@/lib/mechanism";

const reference = loadBuiltinMechanism("reference").mechanism;
const run = (condition: ConditionInput): AnalysisResult =>
  runAnalysis(reference, { id: "reference", title: reference.title }, { mechanismId: "reference", condition });
const demo = run(POLAR_VORTEX_DEMO.condition);
const n = (r: AnalysisResult, id: string) => r.steadyState.numberDensity_cm3[reference.speciesIndex[id]];
const clyOf = (r: AnalysisResult) => r.condition.poolTotals_cm3.Cly;
/** the dimer cycle: ClO + ClO + M, Cl2O2 + hv, ClOO + M, 2 × (Cl + O3) */
const isDimer = (steps: string[]) => ["ClOx20", "J_Cl2O2", "ClOx27", "ClOx1"].every((s) => steps.includes(s));
const isClOBrO = (steps: string[]) => steps.some((s) => ["BrOx13", "BrOx14", "BrOx15"].includes(s));

describe("invented cold vortex parcel, 19 km, 190 K, ice clouds, sun 78° from the zenith", () => {
  it("converges, finds ice (T below the frost point of 6 ppmv H2O) and is labelled invented", () => {
    expect(POLAR_VORTEX_DEMO.label).toMatch(/invented/);
    expect(demo.steadyState.status).toBe("converged");
    expect(demo.condition.cloud?.present).toBe("ice");
    expect(demo.condition.cloud?.frostPoint_K).toBeGreaterThan(190);
  });

  it("activates chlorine: ClO above 30 % of Cly and HCl below 20 % (common practice); ClO within a factor 3 of the ~1 ppbv measured in activated vortex air (Anderson et al. 1989, J. Geophys. Res. 94, 11465; from memory)", () => {
    const cly = clyOf(demo);
    expect(n(demo, "ClO") / cly).toBeGreaterThan(0.3);
    expect(n(demo, "HCl") / cly).toBeLessThan(0.2);
    const clo_ppbv = (n(demo, "ClO") / demo.condition.M_cm3) * 1e9;
    expect(clo_ppbv).toBeGreaterThan(1 / 3);
    expect(clo_ppbv).toBeLessThan(3);
  });

  it("puts the dimer cycle first, named ClOx, with ClO + ClO + M as its rate-limiting step (Molina and Molina 1987, J. Phys. Chem. 91, 433)", () => {
    const first = demo.cycles.cycles[0];
    expect(isDimer(first.steps.map((s) => s.reactionId))).toBe(true);
    expect(first.family).toBe("ClOx");
    expect(first.rateLimitingStep).toBe("ClOx20");
  });

  it("finds the ClO–BrO cycle by itself, named ClOx-BrOx (McElroy et al. 1986, Nature 321, 759)", () => {
    const clobro = demo.cycles.cycles.filter((c) => isClOBrO(c.steps.map((s) => s.reactionId)));
    expect(clobro.length).toBeGreaterThan(0);
    expect(clobro[0].family).toBe("ClOx-BrOx");
  });

  it("gives the dimer and ClO–BrO cycles more than 80 % of the halogen Ox loss (common practice: about 3/4 and 1/4)", () => {
    const halogen = demo.cycles.cycles.filter((c) => /ClOx|BrOx/.test(c.family));
    const total = halogen.reduce((s, c) => s + c.oxLoss_cm3s, 0);
    const polar = halogen
      .filter((c) => isDimer(c.steps.map((s) => s.reactionId)) || isClOBrO(c.steps.map((s) => s.reactionId)))
      .reduce((s, c) => s + c.oxLoss_cm3s, 0);
    expect(polar / total).toBeGreaterThan(0.8);
  });

  it("leaves chlorine in its reservoirs without particles (the same parcel, no cloud, no sulfate): HCl + ClONO2 above 90 % of Cly", () => {
    const warmFree = run({ ...POLAR_VORTEX_DEMO.condition, cloud: "none", aerosolSurface_um2cm3: 0 });
    expect(warmFree.steadyState.status).toBe("converged");
    const cly = clyOf(warmFree);
    expect((n(warmFree, "HCl") + n(warmFree, "ClONO2")) / cly).toBeGreaterThan(0.9);
  });

  it("converges in the 24-hour mode too, with the dimer cycle first", () => {
    const day = run({ ...POLAR_VORTEX_DEMO.condition, mode: "diurnal" });
    expect(day.steadyState.status).toBe("converged");
    expect(isDimer(day.cycles.cycles[0].steps.map((s) => s.reactionId))).toBe(true);
  }, 60000);

  it("at local midnight (no sunlight, no steady state for the photolysed species) returns the solver's status and a message, never NaN", () => {
    const night = run({ ...POLAR_VORTEX_DEMO.condition, localSolarTime_h: 0 });
    expect(night.steadyState.status).not.toBe("converged");
    expect(night.steadyState.message.length).toBeGreaterThan(10);
    expect(night.steadyState.numberDensity_cm3.every(Number.isFinite)).toBe(true);
    expect(night.steadyState.rate_cm3s.every(Number.isFinite)).toBe(true);
  });
});
