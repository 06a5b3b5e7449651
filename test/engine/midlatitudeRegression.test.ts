/**
 * Warm mid-latitude results with no cloud, where the sulfate γ are small, are
 * not moved by the surface chemistry: the reference mechanism of today against
 * the reference mechanism as it was before the surface chemistry was added
 * (test/fixtures/regression/reference-1.1.0.yaml), both computed now by the same
 * engine and atmosphere (default conditions, 45° N, 20 March, noon; O3 held).
 * The Ox loss and the main radicals and reservoirs must stay within 1 %.
 * (A fixture of numbers measured by an older engine was dropped when the default
 * O3 became the U.S. Standard Atmosphere 1976 profile: it compared atmospheres,
 * not mechanisms.)
 */
import { readFileSync } from "node:fs";
import { describe, it } from "vitest";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisMode } from "@/lib/engine/types";
import { loadBuiltinMechanism, loadMechanism } from "@/lib/mechanism";
import { expectClose } from "../helpers/close";

const reference = loadBuiltinMechanism("reference").mechanism;

describe("the reference mechanism against its version 1.1.0 (before the surface chemistry), same engine, within 1 %", () => {
  const before = loadMechanism(
    readFileSync(new URL("../fixtures/regression/reference-1.1.0.yaml", import.meta.url), "utf8"),
  ).mechanism;
  const cases: Array<[AnalysisMode, number]> = [
    ...[25, 30, 35, 40, 45, 50].map((z): [AnalysisMode, number] => ["instantaneous", z]),
    ["diurnal", 25],
    ["diurnal", 40],
  ];
  it.each(cases)(
    "%s %i km",
    (mode, altitude_km) => {
      const run = (m: typeof reference) =>
        runAnalysis(
          m,
          { id: "reference", title: m.title },
          { mechanismId: "reference", condition: { altitude_km, mode } },
        );
      const now = run(reference);
      const then = run(before);
      expectClose(now.cycles.budget.loss_cm3s, then.cycles.budget.loss_cm3s, { rel: 0.01 }, "Ox loss");
      for (const id of ["O3", "OH", "HO2", "NO", "NO2", "ClO", "HCl", "ClONO2", "BrO"])
        expectClose(
          now.steadyState.numberDensity_cm3[reference.speciesIndex[id]],
          then.steadyState.numberDensity_cm3[before.speciesIndex[id]],
          { rel: 0.01 },
          id,
        );
    },
    60000,
  );
});
