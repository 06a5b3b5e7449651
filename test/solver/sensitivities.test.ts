/**
 * Steady-state sensitivities ∂ln[X]/∂ln k against the Chapman analytic
 * exponents (see chapman.test.ts for the derivation; Jacob 1999 §10.1, from
 * memory: [O3] ∝ (k(O+O2+M)/k(O+O3))^½) and against central finite
 * differences of the solver itself on the reference mechanism.
 */
import { describe, expect, it } from "vitest";
import { InputError } from "../../lib/errors";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import { solveSteadyState, steadyStateSensitivities } from "../../lib/solver";
import { expectClose } from "../helpers/close";
import { chapmanMechanism, chlorineMechanism, conditions30km } from "./helpers";
import { realisticConditions } from "./realistic";

describe("steady-state sensitivities", () => {
  it("give the Chapman exponents ±½ for O3 with respect to k(O + O2 + M) and k(O + O3)", () => {
    const mech = chapmanMechanism();
    const cond = conditions30km();
    const s = solveSteadyState(mech, cond);
    const res = steadyStateSensitivities(mech, cond, s, ["O3"]);
    expect(res.status).toBe("ok");
    const j = (id: string) => mech.reactions.findIndex((r) => r.id === id);
    const x = s.numberDensity_cm3[mech.speciesIndex.O3];
    const B = cond.J_s.O2 * cond.held_cm3.O2;
    const J3 = cond.J_s.O3_O1D + cond.J_s.O3_O;
    // exact exponent of the quadratic J3 x² + B x − C = 0 with C ∝ k2/k4: (J3 x + B)/(2 J3 x + B)
    const exact = (J3 * x + B) / (2 * J3 * x + B);
    expectClose(res.coefficients[0][j("K2")], exact, { rel: 1e-8 }, "∂ln O3/∂ln k2");
    expectClose(res.coefficients[0][j("K4")], -exact, { rel: 1e-8 }, "∂ln O3/∂ln k4");
    expectClose(res.coefficients[0][j("K2")], 0.5, { abs: B / (J3 * x) }, "textbook ½");
    // O(1D) quenching does not change O3 (every O(1D) becomes O either way)
    expectClose(res.coefficients[0][j("Q1")], 0, { abs: 1e-10 }, "quenching");
  });

  it("match central finite differences of the solver to 1e-4 on the reference mechanism", () => {
    const mech = loadBuiltinMechanism("reference").mechanism;
    const cond = realisticConditions(mech, 35, 30, "held");
    const tight = { residualTolerance: 1e-13, stepTolerance: 1e-13 };
    const s = solveSteadyState(mech, cond, tight);
    const outputs = ["ClO", "NO2", "OH", "BrO", "HNO3"];
    const res = steadyStateSensitivities(mech, cond, s, outputs);
    expect(res.status).toBe("ok");
    // the five largest rates plus a few chosen reactions
    const byRate = s.rate_cm3s
      .map((r, j) => [r, j])
      .sort((a, b) => b[0] - a[0])
      .slice(0, 5)
      .map((p) => p[1]);
    const picks = [...new Set([...byRate, 10, 40, 80, 120].filter((j) => j < mech.reactions.length))];
    const h = 1e-3;
    for (const j of picks) {
      const mult = (f: number) => mech.reactions.map((_, q) => (q === j ? f : 1));
      const up = solveSteadyState(mech, cond, {
        ...tight,
        rateMultipliers: mult(Math.exp(h)),
        initialState: s.numberDensity_cm3,
      });
      const dn = solveSteadyState(mech, cond, {
        ...tight,
        rateMultipliers: mult(Math.exp(-h)),
        initialState: s.numberDensity_cm3,
      });
      expect(up.status).toBe("converged");
      expect(dn.status).toBe("converged");
      outputs.forEach((id, o) => {
        const i = mech.speciesIndex[id];
        const fd = (Math.log(up.numberDensity_cm3[i]) - Math.log(dn.numberDensity_cm3[i])) / (2 * h);
        expectClose(res.coefficients[o][j], fd, { rel: 1e-4, abs: 1e-6 }, `∂ln ${id}/∂ln k(${mech.reactions[j].id})`);
      });
    }
  });

  it("keep the pool total fixed: the weighted sensitivities of the members sum to zero", () => {
    const mech = chlorineMechanism();
    const cond = conditions30km();
    const s = solveSteadyState(mech, cond);
    const ids = ["Cl", "ClO", "HCl"];
    const res = steadyStateSensitivities(mech, cond, s, ids);
    for (let j = 0; j < mech.reactions.length; j++) {
      // Σ x_i ∂ln x_i = ∂(Σ x_i) = 0
      const sum = ids.reduce((a, id, o) => a + s.numberDensity_cm3[mech.speciesIndex[id]] * res.coefficients[o][j], 0);
      expectClose(sum, 0, { abs: 1e-9 * cond.poolTotals_cm3.Cly }, `reaction ${mech.reactions[j].id}`);
    }
  });

  it("throws if an output is not a species of the mechanism", () => {
    const mech = chapmanMechanism();
    const cond = conditions30km();
    const s = solveSteadyState(mech, cond);
    expect(() => steadyStateSensitivities(mech, cond, s, ["OH"])).toThrow(InputError);
  });
});
