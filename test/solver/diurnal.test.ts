/**
 * The periodic 24-hour solution. The sun is an invented stand-in: at 45° N at
 * equinox cos(zenith) = cos 45° · cos(hour angle), and every J scales with
 * cos(zenith) above the horizon (not a radiative-transfer model).
 */
import { describe, expect, it } from "vitest";
import { solarZenithAngle } from "../../lib/atmosphere";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { type DiurnalInput, solveDiurnal, solveSteadyState } from "../../lib/solver";
import type { SolveConditions } from "../../lib/solver/types";
import { expectClose } from "../helpers/close";
import { allNumbers, chapmanMechanism, chlorineMechanism, conditions30km } from "./helpers";
import { realisticConditions } from "./realistic";

function sunFollowing(base: SolveConditions, cosLatitude = Math.SQRT1_2, offset = 0): DiurnalInput["conditionsAt"] {
  const noon = cosLatitude + offset;
  return (t_h) => {
    const mu = cosLatitude * Math.cos((Math.PI * (t_h - 12)) / 12) + offset;
    const f = mu > 0 ? mu / noon : 0;
    return { ...base, J_s: Object.fromEntries(Object.entries(base.J_s).map(([k, v]) => [k, v * f])) };
  };
}

describe("24-hour steady state", () => {
  it("equals the instantaneous steady state when nothing changes through the day, from a far start", () => {
    const mech = chapmanMechanism();
    const cond = conditions30km();
    const ss = solveSteadyState(mech, cond);
    const start = ss.numberDensity_cm3.map((v, i) => (mech.species[i].role === "solved" ? v * 0.3 : v));
    const d = solveDiurnal(mech, { conditionsAt: () => cond }, { initialState: start });
    expect(d.status).toBe("converged");
    const o3 = mech.speciesIndex.O3;
    expectClose(d.average.numberDensity_cm3[o3], ss.numberDensity_cm3[o3], { rel: 2e-3 }, "O3");
    expect(d.daysIntegrated).toBeGreaterThan(1);
  });

  it("finds a periodic orbit on which each species' mean production equals its mean loss", () => {
    const mech = chlorineMechanism();
    const d = solveDiurnal(mech, { conditionsAt: sunFollowing(conditions30km()), reportAt_h: 12 });
    expect(d.status).toBe("converged");
    expect(d.periodicityError).toBeLessThanOrEqual(1e-3);
    const replaced = d.average.pools.map((p) => p.replacedEquation);
    for (const sp of d.average.species) {
      if (sp.role !== "solved" || replaced.includes(sp.id)) continue;
      // periodic ⇒ ∫ (P − L) dt = [X](24 h) − [X](0) ≈ 0
      expectClose(sp.production_cm3s, sp.loss_cm3s, { rel: 3e-3, abs: 1e-6 }, `${sp.id} mean P vs L`);
    }
    expect(allNumbers(d).every(Number.isFinite)).toBe(true);
  });

  it("keeps the pool total through the day when no reaction feeds the pool", () => {
    const mech = chlorineMechanism();
    const base = conditions30km();
    const cond = { ...base, held_cm3: { ...base.held_cm3, CFCl3: 0 } };
    const d = solveDiurnal(mech, { conditionsAt: sunFollowing(cond) });
    expect(d.status).toBe("converged");
    const x = d.average.numberDensity_cm3;
    const i = mech.speciesIndex;
    expectClose(x[i.Cl] + x[i.ClO] + x[i.HCl], cond.poolTotals_cm3.Cly, { rel: 1e-6 }, "24-h mean Cly");
    const y = d.atReportTime.numberDensity_cm3;
    expectClose(y[i.Cl] + y[i.ClO] + y[i.HCl], cond.poolTotals_cm3.Cly, { rel: 1e-6 }, "noon Cly");
  });

  it("reports the noon state with more atomic oxygen than the 24-hour mean", () => {
    const mech = chapmanMechanism();
    const d = solveDiurnal(mech, { conditionsAt: sunFollowing(conditions30km()), reportAt_h: 12 });
    const o = mech.speciesIndex.O;
    expect(d.reportAt_h).toBe(12);
    expect(d.atReportTime.numberDensity_cm3[o]).toBeGreaterThan(1.5 * d.average.numberDensity_cm3[o]);
  });

  it("reports at midnight the state the reported day started from when that day did not converge (not the next guess)", () => {
    const mech = chapmanMechanism();
    const cond = conditions30km();
    const ss = solveSteadyState(mech, cond);
    const start = ss.numberDensity_cm3.map((v, i) => (mech.species[i].role === "solved" ? v * 0.3 : v));
    // one day only: not periodic, and the reported midnight state is the start of that day (not the next guess)
    const d = solveDiurnal(
      mech,
      { conditionsAt: sunFollowing(cond), reportAt_h: 0 },
      { initialState: start, maxDays: 1 },
    );
    expect(d.status).toBe("max-iterations");
    const o3 = mech.speciesIndex.O3;
    expectClose(d.atReportTime.numberDensity_cm3[o3], start[o3], { rel: 1e-9 }, "O3 at 0 h");
  });

  it("handles polar night (no sun all day) with finite numbers and the pool kept", () => {
    const mech = chlorineMechanism();
    const cond = conditions30km();
    const d = solveDiurnal(mech, { conditionsAt: () => ({ ...cond, J_s: {} }) });
    expect(["converged", "no-steady-state", "max-iterations"]).toContain(d.status);
    expect(allNumbers(d).every(Number.isFinite)).toBe(true);
    const x = d.average.numberDensity_cm3;
    const i = mech.speciesIndex;
    expectClose(x[i.Cl] + x[i.ClO] + x[i.HCl], cond.poolTotals_cm3.Cly, { rel: 1e-6 }, "Cly");
  });

  it("handles polar day (the sun never sets)", () => {
    const mech = chapmanMechanism();
    const d = solveDiurnal(mech, { conditionsAt: sunFollowing(conditions30km(), 0.3, 0.35) });
    expect(d.status).toBe("converged");
    expect(d.atReportTime.numberDensity_cm3[mech.speciesIndex.O]).toBeGreaterThan(0);
  });

  for (const [z, lat, day] of [
    [30, 45, 80],
    [25, 80, 355],
  ]) {
    it(`converges for the reference mechanism with the project's photolysis at ${z} km, ${lat}° N, day ${day}`, () => {
      const mech = loadBuiltinMechanism("reference").mechanism;
      const d = solveDiurnal(mech, {
        conditionsAt: (t_h) =>
          realisticConditions(
            mech,
            z,
            solarZenithAngle({ latitude_deg: lat, dayOfYear: day, localSolarTime_h: t_h }),
            "held",
          ),
        reportAt_h: 0,
      });
      expect(d.status).toBe("converged");
      expect(allNumbers(d).every(Number.isFinite)).toBe(true);
      for (const p of d.average.pools) {
        const pool = mech.pools.find((q) => q.id === p.pool)!;
        const total = (x: number[]) => pool.weights.reduce((a, t) => a + t.coef * x[t.species], 0);
        // exact at local midnight, where the totals are imposed
        expectClose(total(d.atReportTime.numberDensity_cm3), p.total_cm3, { rel: 1e-10 }, `${p.pool} at midnight`);
        // over the day the pool's external source (here N2O + O(1D), CFC photolysis) adds at most its daily integral
        expect(Math.abs(total(d.average.numberDensity_cm3) - p.total_cm3)).toBeLessThanOrEqual(
          Math.abs(p.externalSource_cm3s) * 86_400 + 1e-9 * p.total_cm3,
        );
      }
    });
  }
});
