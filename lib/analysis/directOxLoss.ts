/**
 * Direct odd-oxygen loss written from the rate-limiting reactions, the form
 * used in budget studies (e.g. 2k[O][O3] + 2k[NO2][O] + 2k[ClO][O] +
 * 2k[BrO][O] + k[HO2][O3] + k[OH][O3] + k[HO2][O] + k[OH][O] + k[O(1D)][H2O]
 * + 2k[ClO][BrO] + …), computed without any pathway analysis.
 *
 * Rule (this project's): each reaction j is weighed by the odd oxygen it
 * destroys when Ox is counted with the extended weights of oxWeights.ts,
 * w_j = −Σ_i E_i S_ij. With those weights the fast exchanges inside the
 * family (NO + O3 → NO2, NO2 + hv, Cl + O3 → ClO, ClO + NO, reservoir
 * formation and photolysis) weigh 0, so only the rate-limiting steps remain.
 * Reactions that create Ox (w_j < 0) are primary sources and left out when
 * they consume no hydrogen-containing species (O2 + hv, NO + hv, N + O2);
 * the others (HO2 + NO, CH3O2 + NO, HO2NO2 + hv → OH + NO3, …) convert
 * HO2 back to OH inside HOx–NOx null cycles and are counted with their
 * negative weight. L_direct = Σ_j w_j r_j.
 *
 * Units: molecules cm⁻³ s⁻¹.
 */
import type { CompiledMechanism } from "../mechanism/types";
import type { SteadyState } from "../solver/types";
import { oxWeights } from "./oxWeights";
import { reactionNet } from "./reactionNet";
import { weightedSum } from "./sparseVector";
import type { DirectTerm } from "./types";
import { validateState } from "./validateState";

export function directOxWeights(mech: CompiledMechanism): Float64Array {
  const { weights } = oxWeights(mech, "extended");
  const nets = reactionNet(mech);
  return Float64Array.from(
    nets.map((net, j) => {
      const w = -weightedSum(net, weights);
      if (Math.abs(w) < 1e-12) return 0;
      if (w > 0) return w;
      const hydrogenous = mech.reactions[j].reactants.some((t) => (mech.species[t.species].atoms.H ?? 0) > 0);
      return hydrogenous ? w : 0;
    }),
  );
}

export function directOxLoss(
  mech: CompiledMechanism,
  state: Pick<SteadyState, "numberDensity_cm3" | "rate_cm3s">,
): { loss_cm3s: number; terms: DirectTerm[] } {
  validateState(mech, state);
  const w = directOxWeights(mech);
  const terms: DirectTerm[] = [];
  let loss = 0;
  mech.reactions.forEach((r, j) => {
    if (w[j] === 0) return;
    const rate = Math.max(0, state.rate_cm3s[j]);
    const l = w[j] * rate;
    loss += l;
    terms.push({ reactionId: r.id, equation: r.equation, weight: w[j], loss_cm3s: l });
  });
  terms.sort((a, b) => Math.abs(b.loss_cm3s) - Math.abs(a.loss_cm3s));
  return { loss_cm3s: loss, terms };
}
