/**
 * The run's integrator against analytic solutions: a first-order decay chain
 * A → B → C (Bateman 1910; any kinetics textbook), and the relaxation time of
 * the Chapman system under a fixed sun (Chapman 1930; Brasseur & Solomon,
 * "Aeronomy of the Middle Atmosphere", 3rd ed. 2005, §5.2: Ox obeys
 * d[Ox]/dt = P − a[Ox]² with [O] in equilibrium, so ρ = ([Ox] − [Ox]∞)/([Ox] + [Ox]∞)
 * decays as exp(−t/τ) with τ = [Ox]∞ / (2P); from memory). docs/references.md, Runs.
 */
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { RUN_DEFAULTS, type RunPlan, runConditions, runInThread } from "../../lib/runs";
import { integrateOde, solveSteadyState } from "../../lib/solver";
import { expectClose } from "../helpers/close";

describe("the ROS3 integrator of a run", () => {
  it("follows a first-order decay chain A → B → C to 1e-4 relative (Bateman solution)", () => {
    const k1 = 2e-5;
    const k2 = 5e-5;
    const A0 = 1e10;
    const sys = {
      n: 3,
      autonomous: true,
      rhs(_t: number, y: Float64Array, f: Float64Array) {
        f[0] = -k1 * y[0];
        f[1] = k1 * y[0] - k2 * y[1];
        f[2] = k2 * y[1];
      },
      jacobian(_t: number, _y: Float64Array, J: Float64Array) {
        J.fill(0);
        J[0] = -k1;
        J[3] = k1;
        J[4] = -k2;
        J[7] = k2;
      },
    };
    const t = 86_400;
    const res = integrateOde(sys, [A0, 0, 0], 0, t, { rtol: 1e-6, atol: 1 });
    expect(res.status).toBe("ok");
    const A = A0 * Math.exp(-k1 * t);
    const B = ((A0 * k1) / (k2 - k1)) * (Math.exp(-k1 * t) - Math.exp(-k2 * t));
    expectClose(res.y[0], A, { rel: 1e-4 }, "A");
    expectClose(res.y[1], B, { rel: 1e-4 }, "B");
    expectClose(res.y[0] + res.y[1] + res.y[2], A0, { rel: 1e-12 }, "A + B + C (identity)");
  });

  it("relaxes the Chapman system at 40 km, sun fixed at 30°, with τ = [Ox]∞/(2P) to 1 % (Chapman 1930)", () => {
    const mech = loadBuiltinMechanism("oxygen").mechanism;
    const condition = { altitude_km: 40, latitude_deg: 45, date: "2026-03-20", zenith_deg: 30 };
    const base = { condition, days: 8, options: RUN_DEFAULTS };
    const cond = runConditions(mech, { ...base, initial_cm3: [] }, {}).at(0).cond;
    const ss = solveSteadyState(mech, cond);
    expect(ss.status).toBe("converged");
    const ox = (x: ArrayLike<number>) =>
      x[mech.speciesIndex.O] + x[mech.speciesIndex["O(1D)"]] + x[mech.speciesIndex.O3];
    const oxInf = ox(ss.numberDensity_cm3);
    const P = 2 * ss.rate_cm3s[mech.reactions.findIndex((r) => r.id === "J_O2")];
    const tau_h = oxInf / (2 * P) / 3600;
    // start with 20 % more O3 than the steady state
    const initial = [...ss.numberDensity_cm3];
    initial[mech.speciesIndex.O3] *= 1.2;
    const plan: RunPlan = { ...base, initial_cm3: initial };
    const run = runInThread(mech, { id: "oxygen", title: "oxygen" }, plan);
    expect(run.status).toBe("ok");
    const rho = (h: number) => {
      const x = ox(run.hours.numberDensity_cm3[h]);
      return (x - oxInf) / (x + oxInf);
    };
    // after the fast O/O3 partitioning (first hour), ρ decays exponentially with τ
    const h1 = 2;
    const h2 = Math.min(run.hours.t_h.length - 1, h1 + Math.round(2 * tau_h));
    const fitted_h = (h2 - h1) / Math.log(rho(h1) / rho(h2));
    expect(tau_h).toBeGreaterThan(10);
    // measured: τ = 12.30 h, fitted 12.34 h; O and O(1D) in Ox and the hourly sampling make up the rest
    expectClose(fitted_h, tau_h, { rel: 0.01 }, "relaxation time, h");
  });
});
