/**
 * Convergence at every level from 10 to 60 km and solar zenith angles 0–85°
 * for every built-in mechanism, with O3 held at the climatology and with O3
 * solved, from a cold start. Conditions come from the project's own
 * atmosphere and photolysis modules (see realistic.ts).
 */
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { solveSteadyState } from "../../lib/solver";
import { allNumbers } from "./helpers";
import { realisticConditions } from "./realistic";

const LEVELS = Array.from({ length: 51 }, (_, i) => 10 + i);
const ZENITH = [0, 30, 60, 85];

describe("convergence matrix 10–60 km × zenith 0–85°", () => {
  for (const id of ["oxygen", "oxygen-chlorine", "reference"]) {
    for (const ozone of ["held", "solved"] as const) {
      it(`converges for the ${id} mechanism with O3 ${ozone}`, () => {
        const mech = loadBuiltinMechanism(id).mechanism;
        const failures: string[] = [];
        for (const z of LEVELS) {
          for (const sza of ZENITH) {
            const cond = realisticConditions(mech, z, sza, ozone);
            const s = solveSteadyState(mech, cond);
            const ok = s.status === "converged" && s.residualNorm <= 1e-10 && allNumbers(s).every(Number.isFinite);
            if (!ok) failures.push(`${z} km, ${sza}°: ${s.status} ${s.message}`);
            for (const p of s.pools) {
              const pool = mech.pools.find((q) => q.id === p.pool)!;
              const sum = pool.weights.reduce(
                (a, t) =>
                  a +
                  (s.species.find((q) => q.index === t.species)?.role === "solved"
                    ? t.coef * s.numberDensity_cm3[t.species]
                    : 0),
                0,
              );
              if (Math.abs(sum - p.total_cm3) > 1e-10 * p.total_cm3)
                failures.push(`${z} km, ${sza}°: pool ${p.pool} sum ${sum} ≠ ${p.total_cm3}`);
            }
          }
        }
        expect(failures).toEqual([]);
      });
    }
  }

  it("warm-starts from the neighbouring level to the same answer as a cold start", () => {
    const mech = loadBuiltinMechanism("reference").mechanism;
    const below = solveSteadyState(mech, realisticConditions(mech, 29, 30, "held"));
    const cond = realisticConditions(mech, 30, 30, "held");
    const cold = solveSteadyState(mech, cond);
    const warm = solveSteadyState(mech, cond, { initialState: below.numberDensity_cm3 });
    expect(warm.status).toBe("converged");
    expect(warm.coldStartSteps).toBe(0);
    for (let i = 0; i < mech.species.length; i++) {
      const a = cold.numberDensity_cm3[i];
      const b = warm.numberDensity_cm3[i];
      expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-8 * Math.abs(a) + 1e-30);
    }
  });
});
