import { it } from "vitest";
import { POLAR_VORTEX_DEMO } from "@/lib/engine/demoConditions";
import { runAnalysis } from "@/lib/engine/run-analysis";
import { loadBuiltinMechanism } from "@/lib/mechanism";

const reference = loadBuiltinMechanism("reference").mechanism;
it("probe", () => {
  for (const mode of ["instantaneous", "diurnal"] as const) {
    const t0 = performance.now();
    const r = runAnalysis(
      reference,
      { id: "reference", title: "" },
      { mechanismId: "reference", condition: { ...POLAR_VORTEX_DEMO.condition, mode } },
    );
    const ms = performance.now() - t0;
    const nd = (id: string) => r.steadyState.numberDensity_cm3[reference.speciesIndex[id]];
    const cly = r.condition.poolTotals_cm3.Cly;
    console.log(
      mode,
      r.steadyState.status,
      r.steadyState.iterations,
      ms.toFixed(0),
      "sza",
      r.condition.zenith_deg.toFixed(1),
      "ClO",
      (nd("ClO") / cly).toFixed(3),
      "HCl",
      (nd("HCl") / cly).toFixed(3),
      "ClONO2",
      (nd("ClONO2") / cly).toFixed(3),
      "Cl2O2",
      ((2 * nd("Cl2O2")) / cly).toFixed(3),
      r.condition.cloud?.present,
      r.condition.cloud?.frostPoint_K,
    );
    console.log(
      r.cycles.cycles
        .slice(0, 5)
        .map((c) => `${c.family}:${c.share.toFixed(2)}:${c.rateLimitingStep}:${c.id}`)
        .join("\n"),
    );
  }
}, 100000);
