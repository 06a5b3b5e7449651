/**
 * The pure-oxygen (Chapman) steady state against its analytic solution.
 *
 * Derivation (the textbook one, e.g. Jacob, "Introduction to Atmospheric
 * Chemistry", Princeton 1999, §10.1 — from memory; also Brasseur & Solomon,
 * "Aeronomy of the Middle Atmosphere", 3rd ed., 2005, §5.2 — from memory):
 * with a = k2[O2][M] (k2 for O + O2 + M), b = k3 (O + O3), J2 = J(O2) and
 * J3 the total O3 photolysis (every O(1D) is quenched to O here),
 *   O3 balance:  a[O] = J3[O3] + b[O][O3]
 *   Ox balance:  2 J2 [O2] = 2 b [O][O3]
 * so exactly [O] = (J3[O3] + J2[O2])/a and J3[O3]² + J2[O2][O3] − a J2[O2]/b = 0.
 * The textbook drops J2[O2] against J3[O3] (O atoms from O2 photolysis are a
 * tiny share of those from O3 photolysis), giving [O]/[O3] = J3/a and
 * [O3] = [O2]·(k2 J2 [M]/(k3 J3))^½, whose relative error is the computed β below.
 */
import { describe, expect, it } from "vitest";
import { effectiveRateConstant } from "../../lib/kinetics";
import { loadBuiltinMechanism } from "../../lib/mechanism";
import type { CompiledMechanism } from "../../lib/mechanism/types";
import { solveSteadyState } from "../../lib/solver";
import type { SolveConditions } from "../../lib/solver/types";
import { expectClose } from "../helpers/close";
import { chapmanMechanism } from "./helpers";

/** Invented round J values and U.S. Standard Atmosphere 1976 T and [M] at 20, 30, 40, 50 km (docs/references.md, Standard atmosphere). */
const LEVELS = [
  { z: 20, T_K: 216.65, M_cm3: 1.849e18, J: { O2: 3e-12, O3_O1D: 5e-5, O3_O: 4.5e-4 } },
  { z: 30, T_K: 226.509, M_cm3: 3.828e17, J: { O2: 5e-11, O3_O1D: 3e-4, O3_O: 5e-4 } },
  { z: 40, T_K: 250.35, M_cm3: 8.308e16, J: { O2: 3e-10, O3_O1D: 3e-3, O3_O: 5.5e-4 } },
  { z: 50, T_K: 270.65, M_cm3: 2.135e16, J: { O2: 1e-9, O3_O1D: 7e-3, O3_O: 6e-4 } },
];

function conditions(l: (typeof LEVELS)[number]): SolveConditions {
  return {
    T_K: l.T_K,
    M_cm3: l.M_cm3,
    J_s: l.J,
    held_cm3: { O2: 0.2095 * l.M_cm3, N2: 0.7808 * l.M_cm3 },
    poolTotals_cm3: {},
  };
}

function analytic(mech: CompiledMechanism, cond: SolveConditions) {
  const env = { T_K: cond.T_K, M_cm3: cond.M_cm3, J_s: cond.J_s };
  const k = (id: string) => effectiveRateConstant(mech.reactions.find((r) => r.id === id)!, env);
  const O2 = cond.held_cm3.O2;
  const a = k(mech === chapman ? "K2" : "Ox1") * O2; // k2[M][O2]; the termolecular law includes [M]
  const b = k(mech === chapman ? "K4" : "Ox2");
  const J2 = cond.J_s.O2;
  const J3 = cond.J_s.O3_O1D + cond.J_s.O3_O;
  const B = J2 * O2;
  const C = (a * J2 * O2) / b;
  const O3 = (2 * C) / (B + Math.sqrt(B * B + 4 * J3 * C)); // stable root of J3 x² + B x − C = 0
  const O = (J3 * O3 + J2 * O2) / a;
  const quench =
    mech === chapman ? k("Q1") * cond.held_cm3.N2 + k("Q2") * O2 : k("Ox3") * cond.held_cm3.N2 + k("Ox4") * O2;
  const O1D = (cond.J_s.O3_O1D * O3) / quench;
  const textbookO3 = Math.sqrt(C / J3);
  const beta = B / (2 * Math.sqrt(J3 * C));
  return { O, O3, O1D, textbookO3, textbookRatio: J3 / a, beta };
}

const chapman = chapmanMechanism();

describe("Chapman steady state", () => {
  for (const level of LEVELS) {
    it(`matches the exact analytic solution to 1e-8 at ${level.z} km (hand-built mechanism)`, () => {
      const cond = conditions(level);
      const s = solveSteadyState(chapman, cond);
      expect(s.status).toBe("converged");
      const ref = analytic(chapman, cond);
      const x = (id: string) => s.numberDensity_cm3[chapman.speciesIndex[id]];
      expectClose(x("O3"), ref.O3, { rel: 1e-8 }, "O3");
      expectClose(x("O"), ref.O, { rel: 1e-8 }, "O");
      expectClose(x("O(1D)"), ref.O1D, { rel: 1e-8 }, "O(1D)");
      // The textbook formulas, to within the term they neglect: [O3]/[O3]textbook = √(1+β²) − β exactly.
      expectClose(x("O3") / ref.textbookO3, Math.sqrt(1 + ref.beta ** 2) - ref.beta, { rel: 1e-8 }, "O3 / textbook");
      expect(ref.beta).toBeLessThan(1e-2);
      // [O]/[O3] = J3/a · (1 + J2[O2]/(J3[O3])): the textbook ratio and the O2-photolysis share it omits
      const J3 = cond.J_s.O3_O1D + cond.J_s.O3_O;
      const share = (cond.J_s.O2 * cond.held_cm3.O2) / (J3 * ref.O3);
      expectClose(x("O") / x("O3"), ref.textbookRatio * (1 + share), { rel: 1e-8 }, "[O]/[O3]");
    });
  }

  it("matches the analytic solution with the built-in oxygen mechanism when O(1D) + O3 is switched off", () => {
    const mech = loadBuiltinMechanism("oxygen").mechanism;
    const multipliers = mech.reactions.map((r) =>
      r.reactants.some((t) => mech.species[t.species].id === "O(1D)") &&
      r.reactants.some((t) => mech.species[t.species].id === "O3")
        ? 0
        : 1,
    );
    expect(multipliers.filter((m) => m === 0)).toHaveLength(2);
    const cond = conditions(LEVELS[1]);
    const s = solveSteadyState(mech, cond, { rateMultipliers: multipliers });
    expect(s.status).toBe("converged");
    const ref = analytic(mech, cond);
    expectClose(s.numberDensity_cm3[mech.speciesIndex.O3], ref.O3, { rel: 1e-8 }, "O3");
    expectClose(s.numberDensity_cm3[mech.speciesIndex.O], ref.O, { rel: 1e-8 }, "O");
  });

  it("gives the same state whatever the initial guess", () => {
    const cond = conditions(LEVELS[2]);
    const cold = solveSteadyState(chapman, cond);
    const ids = ["O", "O(1D)", "O3"];
    for (const factor of [1e-6, 1e-2, 10, 1e4]) {
      const initial_cm3 = Object.fromEntries(
        ids.map((id) => [id, cold.numberDensity_cm3[chapman.speciesIndex[id]] * factor]),
      );
      const warm = solveSteadyState(chapman, cond, { initial_cm3 });
      expect(warm.status).toBe("converged");
      for (const id of ids) {
        expectClose(
          warm.numberDensity_cm3[chapman.speciesIndex[id]],
          cold.numberDensity_cm3[chapman.speciesIndex[id]],
          { rel: 1e-9 },
          `${id} from ×${factor}`,
        );
      }
    }
  });

  it("reports a residual below the tolerance and balanced production and loss", () => {
    const s = solveSteadyState(chapman, conditions(LEVELS[0]));
    expect(s.residualNorm).toBeLessThanOrEqual(1e-10);
    for (const sp of s.species.filter((x) => x.role === "solved")) {
      expectClose(sp.production_cm3s, sp.loss_cm3s, { rel: 1e-9 }, `${sp.id} P vs L`);
      expectClose(
        sp.lifetime_s ?? Number.NaN,
        sp.numberDensity_cm3 / sp.loss_cm3s,
        { rel: 1e-12 },
        `${sp.id} lifetime`,
      );
    }
  });

  it("reports every reaction's rate as k times the product of its reactants", () => {
    const s = solveSteadyState(chapman, conditions(LEVELS[3]));
    chapman.reactions.forEach((r, j) => {
      let expected = s.reactions[j].k;
      for (const t of r.reactants) expected *= s.numberDensity_cm3[t.species] ** t.coef;
      expectClose(s.rate_cm3s[j], expected, { rel: 1e-12 }, r.equation);
      expect(s.reactions[j].rate_cm3s).toBe(s.rate_cm3s[j]);
    });
  });
});
