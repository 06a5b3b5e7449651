/**
 * The steady state of large mechanisms: generated open networks
 * (bench/generators/openNetwork.ts) of 60 to 2,000 solved species at 4
 * reactions per species (the size and sparsity of the loader benchmark's
 * documents), solved cold with the sparse LU and, up to 500 species, with the
 * dense LU, to show where the sparse step pays (at 2,000 also cold: the
 * ordering and fill pattern worked out again); and the reference mechanism
 * both ways, to show the small case is no slower.
 */
import { resolveCondition, solveConditionsOf } from "../../lib/engine/resolveCondition";
import { loadBuiltinMechanism, loadMechanism } from "../../lib/mechanism";
import type { CompiledMechanism } from "../../lib/mechanism/types";
import { solveSteadyState } from "../../lib/solver";
import type { SolveConditions } from "../../lib/solver/types";
import { openNetwork } from "../generators/openNetwork";
import type { BenchCase } from "../types";

function conditionsOf(mech: CompiledMechanism): SolveConditions {
  return solveConditionsOf(resolveCondition(mech, { altitude_km: 30, zenith_deg: 30 }));
}

export async function setup(): Promise<BenchCase[]> {
  const cases: BenchCase[] = [];
  const reference = loadBuiltinMechanism("reference").mechanism;
  const refCond = conditionsOf(reference);
  cases.push({
    name: "large: reference steady state (30 km, SZA 30°), dense step",
    run: () => solveSteadyState(reference, refCond),
  });
  cases.push({
    name: "large: reference steady state (30 km, SZA 30°), sparse step",
    run: () => solveSteadyState(reference, refCond, { sparseFromUnknowns: 1 }),
  });
  for (const n of [60, 120, 250, 500, 1000, 2000]) {
    const mech = loadMechanism(openNetwork(n, 4 * n)).mechanism;
    const cond = conditionsOf(mech);
    const s = solveSteadyState(mech, cond);
    const note = `${s.status}, ${s.iterations} iterations (${s.coldStartSteps} pseudo-time)`;
    if (n === 2000)
      cases.push({
        // a shallow copy misses the per-mechanism cache: ordering and pattern are worked out again
        name: `large: ${n} solved species / ${4 * n} reactions, sparse step, cold (structure not cached)`,
        run: () => solveSteadyState({ ...mech }, cond),
        iterations: 3,
        note,
      });
    cases.push({
      name: `large: ${n} solved species / ${4 * n} reactions, sparse step`,
      run: () => solveSteadyState(mech, cond, { sparseFromUnknowns: 1 }),
      iterations: n >= 1000 ? 3 : undefined,
      note,
    });
    if (n <= 500)
      cases.push({
        name: `large: ${n} solved species / ${4 * n} reactions, dense step`,
        run: () => solveSteadyState(mech, cond, { sparseFromUnknowns: Number.MAX_SAFE_INTEGER }),
        iterations: n >= 250 ? 3 : undefined,
        note,
      });
  }
  return cases;
}
