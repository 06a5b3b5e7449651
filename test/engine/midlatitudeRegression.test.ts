/**
 * Warm mid-latitude results with no cloud, where the sulfate γ are small,
 * against the numbers this engine gave before the surface chemistry was
 * added (test/fixtures/regression/midlatitude-25-50km.json, measured at
 * commit f17b931: default conditions, 45° N, 20 March, noon; O3 held).
 * Every number density, the Ox loss and the family shares must stay within
 * 1 % (relative; shares absolute). The same check against the reference
 * mechanism as it was then (test/fixtures/regression/reference-1.1.0.yaml),
 * computed now, isolates the mechanism's part from later changes of the
 * light; if the photolysis changes, re-measure the fixture at the commit
 * before the surface chemistry with the new photolysis.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import { loadBuiltinMechanism, loadMechanism } from "@/lib/mechanism";
import { expectClose } from "../helpers/close";

interface Level {
  altitude_km: number;
  mode: "instantaneous" | "diurnal";
  oxLoss_cm3s: number;
  numberDensity_cm3: Record<string, number>;
  families: Record<string, number>;
}
const levels: Level[] = JSON.parse(
  readFileSync(new URL("../fixtures/regression/midlatitude-25-50km.json", import.meta.url), "utf8"),
);
const reference = loadBuiltinMechanism("reference").mechanism;

describe("warm mid-latitude results unchanged by the surface chemistry (within 1 %)", () => {
  it.each(levels.map((l) => [`${l.mode} ${l.altitude_km} km`, l] as const))(
    "%s",
    (_name, level) => {
      const r = runAnalysis(
        reference,
        { id: "reference", title: reference.title },
        { mechanismId: "reference", condition: { altitude_km: level.altitude_km, mode: level.mode } },
      );
      expect(r.steadyState.status).toBe("converged");
      expectClose(r.cycles.budget.loss_cm3s, level.oxLoss_cm3s, { rel: 0.01 }, "Ox loss");
      for (const [id, v] of Object.entries(level.numberDensity_cm3))
        expectClose(r.steadyState.numberDensity_cm3[reference.speciesIndex[id]], v, { rel: 0.01 }, id);
      const now = Object.fromEntries(r.cycles.budget.byFamily.map((f) => [f.family, f.fraction]));
      for (const [family, share] of Object.entries(level.families))
        expectClose(now[family] ?? 0, share, { abs: 0.01 }, family);
    },
    60000,
  );
});

describe("the reference mechanism against its version 1.1.0 (before the surface chemistry), same engine, within 1 %", () => {
  const before = loadMechanism(
    readFileSync(new URL("../fixtures/regression/reference-1.1.0.yaml", import.meta.url), "utf8"),
  ).mechanism;
  it.each([25, 30, 35, 40, 45, 50])(
    "instantaneous %i km",
    (altitude_km) => {
      const run = (m: typeof reference) =>
        runAnalysis(m, { id: "reference", title: m.title }, { mechanismId: "reference", condition: { altitude_km } });
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
