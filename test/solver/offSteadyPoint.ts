/**
 * A mechanism's system at a point off its steady state (each amount moved by
 * 0.3·sin(i + 1), so that no derivative vanishes by balance), and the net
 * tendency P − L there: what the Jacobian tests differentiate.
 */
import type { CompiledMechanism } from "@/lib/mechanism/types";
import { solveSteadyState } from "@/lib/solver";
import { buildSystem } from "@/lib/solver/buildSystem";
import { effectiveConstants, productionLoss, reactionRates } from "@/lib/solver/massAction";
import { rateConstants } from "@/lib/solver/rateConstants";
import type { SolveConditions } from "@/lib/solver/types";

export function offSteadyPoint(mech: CompiledMechanism, cond: SolveConditions) {
  const sys = buildSystem(mech, cond);
  const kEff = effectiveConstants(sys, rateConstants(mech, cond), new Float64Array(sys.nReactions));
  const n = sys.n;
  const state = solveSteadyState(mech, cond);
  const x0 = Float64Array.from(sys.unknownSpecies, (s, i) => state.numberDensity_cm3[s] * (1 + 0.3 * Math.sin(i + 1)));
  /** P − L at x; `gross` receives P + L */
  function tendency(x: Float64Array, gross?: Float64Array): Float64Array {
    const rates = new Float64Array(sys.nReactions);
    const P = new Float64Array(n);
    const L = new Float64Array(n);
    reactionRates(sys, kEff, x, rates);
    productionLoss(sys, rates, P, L);
    if (gross) for (let i = 0; i < n; i++) gross[i] = P[i] + L[i];
    return P.map((p, i) => p - L[i]);
  }
  return { sys, kEff, n, state, x0, tendency };
}
