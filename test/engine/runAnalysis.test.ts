import { describe, expect, it } from "vitest";
import { standardAtmosphere } from "@/lib/atmosphere";
import { resolveCondition } from "@/lib/engine/resolveCondition";
import { runAnalysis } from "@/lib/engine/runAnalysis";
import type { AnalysisRequest } from "@/lib/engine/types";
import { InputError } from "@/lib/errors";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { expectClose } from "../helpers/close";

const reference = loadBuiltinMechanism("reference").mechanism;
const ref = { id: "reference", title: reference.title };

function analyse(condition: AnalysisRequest["condition"], mech = reference) {
  return runAnalysis(mech, ref, { mechanismId: "reference", condition });
}

describe("resolving a condition", () => {
  it("takes T, p and [M] from the U.S. Standard Atmosphere 1976 unless overridden", () => {
    const c = resolveCondition(reference, { altitude_km: 30 });
    const std = standardAtmosphere(30);
    expect(c.T_K).toBe(std.T_K);
    expect(c.p_hPa).toBe(std.p_hPa);
    // [M] = p/(k_B T) with the SI-exact Boltzmann constant (SI Brochure, 9th ed.)
    expectClose(c.M_cm3, (std.p_Pa / (1.380649e-23 * std.T_K)) * 1e-6, { rel: 1e-12 });
    const hot = resolveCondition(reference, { altitude_km: 30, T_K: 250 });
    expect(hot.T_K).toBe(250);
    expect(hot.p_hPa).toBe(std.p_hPa);
    expectClose(hot.M_cm3, c.M_cm3 * (std.T_K / 250), { rel: 1e-12 });
  });

  it("names the source of every value it filled in", () => {
    const c = resolveCondition(reference, { altitude_km: 30, T_K: 230, poolTotals: { Cly: 3e-9 } });
    expect(c.sources?.T_K).toBe("given");
    expect(c.sources?.p_hPa).toBe("U.S. Standard Atmosphere 1976");
    expect(c.sources?.Cly).toBe("given");
    expect(c.sources?.CH4).toMatch(/climatology/);
    for (const id of Object.keys(c.held_cm3)) expect(c.sources?.[id], id).toBeTruthy();
  });

  it("gives held amounts and pool totals from the climatology, with user overrides first", () => {
    const c = resolveCondition(reference, { altitude_km: 40, poolTotals: { Cly: 4e-9 }, held: { CH4: 5e-7 } });
    expectClose(c.poolTotals_cm3.Cly, 4e-9 * c.M_cm3, { rel: 1e-12 });
    expectClose(c.held_cm3.CH4, 5e-7 * c.M_cm3, { rel: 1e-12 });
    expect(c.held_cm3.O3).toBeGreaterThan(0);
    expectClose(c.held_cm3.O2 / c.M_cm3, 0.2095, { abs: 5e-4 }, "O2 mole fraction");
  });

  it("uses a zenith angle given directly and computes the sun otherwise", () => {
    expect(resolveCondition(reference, { altitude_km: 30, zenith_deg: 33 }).zenith_deg).toBe(33);
    // Equinox noon at 45°N: the zenith angle is close to the latitude (common practice; declination ≈ 0 on 20 March)
    const noon = resolveCondition(reference, {
      altitude_km: 30,
      latitude_deg: 45,
      date: "2026-03-20",
      localSolarTime_h: 12,
    });
    expect(Math.abs(noon.zenith_deg - 45)).toBeLessThan(1);
  });

  it("recomputes the light under an overhead ozone column given in Dobson units", () => {
    const base = resolveCondition(reference, { altitude_km: 25, zenith_deg: 30 });
    const thin = resolveCondition(reference, {
      altitude_km: 25,
      zenith_deg: 30,
      o3ColumnAbove_DU: base.o3ColumnAbove_DU / 2,
    });
    expect(thin.o3ColumnAbove_DU).toBe(base.o3ColumnAbove_DU / 2);
    expect(thin.sources?.o3Column).toBe("given");
    // Less ozone overhead lets more UV through (Beer–Lambert; common practice): O(1D) production rises, NO2 photolysis (visible) barely moves.
    expect(thin.J_s.O3_O1D).toBeGreaterThan(1.2 * base.J_s.O3_O1D);
    expectClose(thin.J_s.NO2, base.J_s.NO2, { rel: 0.05 });
    // The local O3 amount is not what the column changes.
    expect(thin.held_cm3.O3).toBe(base.held_cm3.O3);
  });

  it("takes the aerosol surface from the background sulfate default unless given, and names its source", () => {
    const c = resolveCondition(reference, { altitude_km: 20 });
    expectClose(c.aerosolSurface_um2cm3 as number, 0.7, { rel: 1e-12 }, "aerosol surface, µm² cm⁻³");
    expect(c.sources?.aerosol).toMatch(/background sulfate/);
    const given = resolveCondition(reference, { altitude_km: 20, aerosolSurface_um2cm3: 12 });
    expect(given.aerosolSurface_um2cm3).toBe(12);
    expect(given.sources?.aerosol).toBe("given");
    // a mechanism without uptake reactions does not list it
    const ox = loadBuiltinMechanism("oxygen").mechanism;
    expect(resolveCondition(ox, { altitude_km: 20 }).sources?.aerosol).toBeUndefined();
  });

  it("throws if an override names an unknown species, pool or photolysis channel", () => {
    expect(() => resolveCondition(reference, { altitude_km: 30, held: { Xx: 1e-9 } })).toThrow(InputError);
    expect(() => resolveCondition(reference, { altitude_km: 30, poolTotals: { Iy: 1e-12 } })).toThrow(
      /unknown pool Iy/,
    );
    expect(() => resolveCondition(reference, { altitude_km: 30, J: { XYZ: 1e-3 } })).toThrow(
      /unknown photolysis channel/,
    );
    expect(() => resolveCondition(reference, { altitude_km: 30, held: { ClO: 1e-9 } })).toThrow(/solved/);
  });
});

describe("one analysis", () => {
  it("converges at 40 km, conserves the pool totals and splits the Ox loss into fractions summing to 1", () => {
    const r = analyse({ altitude_km: 40, zenith_deg: 45 });
    expect(r.steadyState.status).toBe("converged");
    for (const pool of r.steadyState.pools) {
      const def = reference.pools.find((p) => p.id === pool.pool)!;
      const sum = def.weights.reduce((s, w) => s + w.coef * r.steadyState.numberDensity_cm3[w.species], 0);
      expectClose(sum, r.condition.poolTotals_cm3[pool.pool], { rel: 1e-9 }, pool.pool);
    }
    const total = r.cycles.budget.byFamily.reduce((s, f) => s + f.fraction, 0);
    expectClose(total, 1, { abs: 1e-9 });
    expect(r.cycles.cycles.length).toBeGreaterThan(3);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity|null,null/);
  });

  it("holds O3 at the climatology by default and solves it on request", () => {
    const held = analyse({ altitude_km: 45, zenith_deg: 30 });
    const solved = analyse({ altitude_km: 45, zenith_deg: 30, ozone: "solved" });
    const iO3 = reference.speciesIndex.O3;
    expectClose(held.steadyState.numberDensity_cm3[iO3], held.condition.held_cm3.O3, { rel: 1e-12 });
    expect(solved.steadyState.status).toBe("converged");
    expect(solved.condition.held_cm3.O3).toBeUndefined();
    // With O3 solved the Ox budget balances in photochemical steady state (common practice: above ~40 km O3 is near photochemical equilibrium)
    expectClose(solved.cycles.budget.production_cm3s, solved.cycles.budget.loss_cm3s, { rel: 1e-3 });
  });

  it("reports a night-time instantaneous solve as a status, not an exception, with no cycles", () => {
    const r = analyse({ altitude_km: 30, zenith_deg: 120 });
    expect(r.steadyState.status).not.toBe("converged");
    expect(r.steadyState.message.length).toBeGreaterThan(5);
    expect(r.cycles.cycles).toEqual([]);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it("reports the 24-hour means and the state at the chosen local time", () => {
    const r = analyse({ altitude_km: 40, latitude_deg: 45, date: "2026-06-21", localSolarTime_h: 0, mode: "diurnal" });
    expect(r.steadyState.status).toBe("converged");
    expect(r.diurnal?.reportAt_h).toBe(0);
    const iO = reference.speciesIndex.O;
    // At local midnight atomic oxygen has gone (no photolysis; common practice), while the 24-hour mean is positive.
    expect(r.diurnal!.atLocalTime_cm3[iO]).toBeLessThan(1e-3 * r.steadyState.numberDensity_cm3[iO]);
    expect(r.cycles.cycles.length).toBeGreaterThan(0);
    expect(r.warnings).toBeUndefined();
    const fixedSun = analyse({ altitude_km: 40, mode: "diurnal", zenith_deg: 30 });
    expect(fixedSun.warnings?.[0]).toMatch(/zenith angle given is not used in the 24-hour mode/);
  });

  it("moves the 24-hour Ox loss at 20 km from NOx towards HOx and the halogens as sulfate aerosol grows (Fahey et al. 1993, Nature 363, 509; from memory: N2O5 hydrolysis)", () => {
    const share = (r: ReturnType<typeof analyse>, f: string) =>
      r.cycles!.budget.byFamily.filter((x) => x.family.split("-").includes(f)).reduce((a, x) => a + x.fraction, 0);
    const runs = [0, 0.7, 5].map((a) => analyse({ altitude_km: 20, mode: "diurnal", aerosolSurface_um2cm3: a }));
    for (const r of runs) expect(r.steadyState.status).toBe("converged");
    const nox = runs.map((r) => share(r, "NOx"));
    const hox = runs.map((r) => share(r, "HOx"));
    expect(nox[1]).toBeLessThan(nox[0]);
    expect(nox[2]).toBeLessThan(nox[1]);
    expect(hox[2]).toBeGreaterThan(hox[0]);
    expect(share(runs[2], "ClOx")).toBeGreaterThan(share(runs[0], "ClOx"));
    // HNO3 takes up the NOx: the reservoir grows while NOy (a conserved pool) stays
    const hno3 = runs.map((r) => r.steadyState.species.find((s) => s.id === "HNO3")!.numberDensity_cm3);
    expect(hno3[2]).toBeGreaterThan(hno3[0]);
  });

  it("is deterministic: the same request gives the same numbers", () => {
    const a = analyse({ altitude_km: 35, zenith_deg: 40 });
    const b = analyse({ altitude_km: 35, zenith_deg: 40 });
    expect(b.steadyState.numberDensity_cm3).toEqual(a.steadyState.numberDensity_cm3);
    expect(b.cycles.budget).toEqual(a.cycles.budget);
  });
});
