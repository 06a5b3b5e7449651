/**
 * The Newton step on the sparse LU gives the steady state of the dense step:
 * every built-in mechanism at 20, 30 and 45 km with O3 held and solved, and
 * an invented open network of 300 solved species (bench/generators). The
 * expected values are the dense solver's, so no outside source applies; the
 * tolerance is the solver's own convergence (|δ ln x| < 1e-9 at the end).
 */
import { describe, expect, it } from "vitest";
import { openNetwork } from "@/bench/generators/openNetwork";
import { resolveCondition, solveConditionsOf } from "@/lib/engine/resolveCondition";
import { loadBuiltinMechanism, loadMechanism } from "@/lib/mechanism";
import type { CompiledMechanism } from "@/lib/mechanism/types";
import { BUILTIN_MECHANISMS } from "@/lib/mechanisms";
import { solveSteadyState } from "@/lib/solver";
import { NEWTON_DEFAULTS } from "@/lib/solver/newtonLog";
import type { SolveConditions } from "@/lib/solver/types";
import { expectClose } from "../helpers/close";

const DENSE = { sparseFromUnknowns: Number.MAX_SAFE_INTEGER };
const SPARSE = { sparseFromUnknowns: 1 };

function expectSameState(mech: CompiledMechanism, cond: SolveConditions): void {
  const dense = solveSteadyState(mech, cond, DENSE);
  const sparse = solveSteadyState(mech, cond, SPARSE);
  expect(dense.status).toBe("converged");
  expect(sparse.status).toBe("converged");
  dense.numberDensity_cm3.forEach((x, i) => {
    expectClose(sparse.numberDensity_cm3[i], x, { rel: 1e-8, abs: 1e-30 }, mech.species[i].id);
  });
}

describe("the sparse Newton step", () => {
  for (const { id } of BUILTIN_MECHANISMS) {
    const mech = loadBuiltinMechanism(id).mechanism;
    for (const ozone of ["held", "solved"] as const) {
      it(`gives the dense step's steady state for ${id} with O3 ${ozone} at 20, 30 and 45 km`, () => {
        for (const altitude_km of [20, 30, 45]) {
          expectSameState(mech, solveConditionsOf(resolveCondition(mech, { altitude_km, ozone })));
        }
      });
    }
  }

  it("gives the dense step's steady state for a generated network of 300 solved species", () => {
    const mech = loadMechanism(openNetwork(300, 1200)).mechanism;
    expect(mech.species.filter((s) => s.role === "solved")).toHaveLength(300);
    expectSameState(mech, solveConditionsOf(resolveCondition(mech, { altitude_km: 30, zenith_deg: 30 })));
  });

  it("is chosen by size, and solves a generated network of 2,000 solved species", () => {
    // the dense step stays for the smallest mechanisms, where it was measured faster (DEVELOPERS.md)
    expect(NEWTON_DEFAULTS.sparseFromUnknowns).toBeGreaterThan(7);
    const mech = loadMechanism(openNetwork(2000, 8000)).mechanism;
    const s = solveSteadyState(mech, solveConditionsOf(resolveCondition(mech, { altitude_km: 30, zenith_deg: 30 })));
    expect(s.status).toBe("converged");
    expect(s.residualNorm).toBeLessThan(1e-10);
  });
});
